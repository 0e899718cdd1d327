"""DIN 743:2012 shaft checks against the published sources that could be read for this project.

Sources read, and what each one confirms:

* FKM guideline "Analytical strength assessment of components" (VDMA Verlag; the restating
  article below names no edition — title pages of the 5th ed. 2003 and the 6th ed. 2012 were
  seen, their text not): roughness factor
  ``K_R,σ = 1 − a_R,σ·lg(Rz/µm)·lg(2·R_m/R_m,N,min)`` with ``a_R,σ = 0.22`` and
  ``R_m,N,min = 400 MPa`` for steel (its table of a_R and R_m,N,min lists GS 0.20/400,
  GJS 0.16/400, GJM 0.12/350, GJL 0.06/100, wrought aluminium 0.22/133, cast aluminium
  0.20/133). Read as restated, with that table and a worked example (steel, R_m = 600 MPa,
  machined Rz = 100 µm: K_R = 0.79), in the public know-how article "Surface Roughness
  Factor KR" of quadco.engineering. For steel ``lg(2·R_m/400) = lg(R_m/20) − 1``: the FKM
  factor is the same function as DIN 743-2's K_Fσ, which fitcheck types from memory.
* Lecture notes "Maschinenelemente — Wellen", chapter "Festigkeitsnachweis", Einführung
  (inggo.com, teachnet; the notes' preface names DIN 743:2000-10, the edition before 2012):
  DIN 743 is limited to steel; temperature range −40 °C … 150 °C; corrosion-free surroundings;
  tension/compression, bending and torsion, alone or combined.
* DIN 743-1:2012-12, scope as published with the standard's entry at standards.globalspec.com
  (std/9957550, "DIN 743-1 … Part 1: General", publication date 1 December 2012, 25 pages):
  "The scope of this standard is limited to steel. Welded components are to be considered
  separately, and this standard does not apply to them"; residual stresses are not explicitly
  considered (for hard surfaces they enter globally through the sensitivity factor n and K_V).
  So the 2012 edition keeps the limitation to steel; its temperature range is not in that text
  and stays from memory for 2012.
* Exercise slides "Übung Maschinenelemente — Achsen und Wellen: Tragfähigkeitsnachweis nach
  DIN 743", Stephan Voigt, M.Eng., Hochschule Anhalt (public copy on de.scribd.com, document
  401536256; the edition of DIN 743 is not named in the part that could be read), section 1.1
  "Anwendungsbereich": steel shafts and axles (not welded); −40 °C ≤ ϑ ≤ 150 °C; rotating and
  plane bending are not distinguished; corrosion-free media; the amplitudes of tension/
  compression, bending and torsion are taken as acting at the same time (in phase); limiting
  number of cycles of the fatigue strengths N_G = 10⁷. Its worked example (section 7) could
  not be read.
* FKM research report no. 325 (2015, project 294 II), "Untersuchungen zum Größeneinfluss auf
  die Gestaltfestigkeit / Kerbwirkungszahlen von Welle-Nabe-Verbindungen", publisher's
  abstract (VDMA shop page): the notch factors of press fits rest on rotating-bending tests at
  the reference joint diameter D_F = 40 mm; tests on C45E press fits at D_F = 230 mm
  back-calculate notch factors that agree with DIN 743's conversion to other diameters by K3.

What could not be read: no worked example of a shaft under a press-fitted hub checked after
DIN 743. The standard's own supplement has none: DIN 743 Beiblatt 1:2000-10 (contents read in a
public English copy, scribd.com document 512797066, whose translation says "corrugated shaft" and
"spring slot" for shouldered shaft and keyway) has worked examples of 4.1 a shouldered shaft in
bending and torsion, 4.2 a shaft with a keyway in rotating bending and static torsion, 4.3 an axle
with a shoulder and an undercut in bending; the 2012 edition (DIN's product page for DIN 743 Beiblatt 1,
din.de, wdc-beuth:din21:145487776) only replaces 4.3 by an axle with a retaining-ring groove.
(Beiblatt 1:2012 itself is not openly available; of the machine-elements textbooks
found — Roloff/Matek 16th and 21st ed., Decker "Tabellen und Diagramme" 18th ed.,
Steinhilper/Röper vol. 3 2nd ed. — only front matter and contents were readable; the 2008
draft E DIN 743-1 only up to its contents). The press-fit notch factor βσ = 2.7·(σ_B/1000)^0.43,
βτ = 0.65·βσ, the K1 curves, K2, K3, the DIN 743-3 strength ratios and the safety equations
therefore stay "from memory"; the checks of those are in test_din743_press_fit.py.
"""

from __future__ import annotations

import dataclasses
import math

import numpy as np
import pytest

from fitcheck import materials
from fitcheck.core import din743
from fitcheck.shaft import ShaftLoads, evaluate_seat


def _fkm_kr_steel(rz_um, rm):
    # FKM guideline: K_R,σ = 1 − a_R,σ·lg Rz·lg(2·Rm/Rm,N,min), steel a_R,σ = 0.22,
    # Rm,N,min = 400 MPa (read as restated in quadco.engineering, "Surface Roughness Factor KR")
    return 1.0 - 0.22 * math.log10(rz_um) * math.log10(2.0 * rm / 400.0)


@pytest.mark.parametrize("rm", [400.0, 500.0, 600.0, 700.0, 800.0, 1000.0, 1200.0])
@pytest.mark.parametrize("rz", [1.0, 1.6, 4.0, 6.3, 16.0, 25.0, 100.0, 200.0])
def test_roughness_factor_is_the_fkm_factor_for_steel(rz, rm):
    # DIN 743-2 K_Fσ (from memory) against the FKM form with the published steel constants
    kfs, _ = din743.roughness_factors(rz, rm)
    assert float(kfs) == pytest.approx(_fkm_kr_steel(rz, rm), rel=1e-12)


def test_roughness_factor_printed_example_machined_steel():
    # worked example restating the FKM factor (quadco.engineering, "Surface Roughness Factor KR"):
    # steel, Rm = 600 MPa, machined surface Rz = 100 µm -> K_R = 0.79 (two digits printed)
    kfs, _ = din743.roughness_factors(100.0, 600.0)
    assert round(float(kfs), 2) == 0.79
    # the same through the whole seat chain: d = d_eff = d_B = 16 mm, so K1 = 1 and σ_B(d) = 600 MPa
    r = din743.press_fit_seat(d=16.0, sigma_B_dB=600.0, sigma_S_dB=400.0, d_eff=16.0, rz_um=100.0,
                              moment_amplitude=10_000.0)
    assert float(r["K1"]) == 1.0
    assert round(float(r["KF_sigma"]), 2) == 0.79
    # and through fitcheck.shaft with a steel of Rm = 600 MPa at its reference diameter
    steel600 = dataclasses.replace(materials.get("C45E"), name="steel Rm 600", Rm=600.0, Rp02=400.0)
    res = evaluate_seat(d=16.0, di=0.0, material=steel600, rz_um=100.0,
                        loads=ShaftLoads(bending_moment=10_000.0, torque_type="static"),
                        torque=0.0, axial_force=0.0, temperature=20.0, what="gear hub")
    assert round(res.factors["KF_sigma"], 2) == 0.79
    # a rougher seat can only lower the component fatigue limit
    rough = evaluate_seat(d=16.0, di=0.0, material=steel600, rz_um=200.0,
                          loads=ShaftLoads(bending_moment=10_000.0, torque_type="static"),
                          torque=0.0, axial_force=0.0, temperature=20.0, what="gear hub")
    assert rough.factors["sigma_bWK"] < res.factors["sigma_bWK"]
    assert rough.fatigue_safety < res.fatigue_safety


def test_polished_surface_has_no_roughness_penalty():
    # FKM guideline: K_R = 1 for a polished surface; fitcheck counts Rz below 1 µm as 1 µm
    for rz in (0.1, 0.5, 1.0):
        kfs, kft = din743.roughness_factors(rz, 900.0)
        assert float(kfs) == 1.0 and float(kft) == 1.0


def _temperature_warned(temperature):
    r = evaluate_seat(d=30.0, di=0.0, material=materials.get("C45E"), rz_um=4.0,
                      loads=ShaftLoads(bending_moment=50_000.0, torque_type="static"),
                      torque=50_000.0, axial_force=0.0, temperature=temperature, what="gear hub")
    return any("degC" in w for w in r.warnings)


@pytest.mark.parametrize("t, outside", [(-41.0, True), (-40.0, False), (20.0, False),
                                        (150.0, False), (151.0, True)])
def test_temperature_range_of_din743(t, outside):
    # lecture notes "Maschinenelemente — Wellen", Festigkeitsnachweis, Einführung (inggo.com), and
    # exercise slides "Achsen und Wellen: Tragfähigkeitsnachweis nach DIN 743" (Hochschule Anhalt),
    # section 1.1: DIN 743 applies from −40 °C to 150 °C
    assert bool(din743.validity(30.0, 700.0, t)["temperature"]) is outside
    assert _temperature_warned(t) is outside


def test_din743_is_limited_to_steel():
    # lecture notes "Maschinenelemente — Wellen" (inggo.com), and DIN 743-1:2012-12 scope as published
    # (standards.globalspec.com, std/9957550): DIN 743 is limited to steel. A shaft of
    # a non-steel material without its own fatigue strengths is not checked, and both checks fail.
    alu = materials.get("EN AW-6082-T6")
    r = evaluate_seat(d=20.0, di=0.0, material=alu, rz_um=4.0,
                      loads=ShaftLoads(bending_moment=10_000.0, torque_type="static"),
                      torque=10_000.0, axial_force=0.0, temperature=20.0, what="gear hub")
    assert not r.applicable
    assert all(not c.passed for c in r.checks)
    steel = evaluate_seat(d=20.0, di=0.0, material=materials.get("C45E"), rz_um=4.0,
                          loads=ShaftLoads(bending_moment=10_000.0, torque_type="static"),
                          torque=10_000.0, axial_force=0.0, temperature=20.0, what="gear hub")
    assert steel.applicable and all(c.passed for c in steel.checks)


def test_press_fit_notch_factors_refer_to_a_40mm_joint():
    # FKM report 325 (2015), abstract: press-fit notch factors from tests at D_F = 40 mm
    assert din743.D_BK == 40.0
    sB = np.array([500.0, 700.0, 1000.0])
    bs, bt = din743.press_fit_notch_factors(40.0, sB)
    # at the reference diameter the conversion β(d) = β(d_BK)·K3(d_BK)/K3(d) is the identity
    bs_bk = 2.7 * (sB / 1000.0) ** 0.43          # DIN 743-2:2012, press fit — from memory
    np.testing.assert_allclose(bs, bs_bk, rtol=1e-12)
    np.testing.assert_allclose(bt, 0.65 * bs_bk, rtol=1e-12)


def test_notch_factor_grows_from_the_40mm_joint_to_the_230mm_joint():
    # FKM report 325 (2015), abstract: C45E press fits at D_F = 230 mm agree with DIN 743's K3
    # conversion from the 40 mm reference. K3 falls with the diameter (lg β > 0), so the larger
    # joint has the larger notch factor (less support from the stress gradient). K3 is held at
    # its 150 mm value beyond 150 mm (DIN 743-2 range of K2/K3 — from memory).
    sB = 700.0 * float(din743.k1(230.0))           # C45E at 230 mm (K1 of QT steels — from memory)
    b40, _ = din743.press_fit_notch_factors(40.0, sB)
    b230, _ = din743.press_fit_notch_factors(230.0, sB)
    b150, _ = din743.press_fit_notch_factors(150.0, sB)
    assert float(b230) > float(b40)
    assert float(b230) == pytest.approx(float(b150), rel=1e-12)
    bk = 2.7 * (sB / 1000.0) ** 0.43
    assert float(b230) == pytest.approx(bk * float(din743.k3(40.0, bk)) / float(din743.k3(150.0, bk)),
                                        rel=1e-12)
