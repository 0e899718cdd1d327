"""The eccentrically clamped and eccentrically loaded joint, VDI 2230 Part 1:2015.

Sources:
- VDI 2230 Part 1:2015, 3.2.2 (eccentrically clamped single-bolted joint), 3.2.3 (one-sided opening of
  the interface), 5.1.2.3 (bending compliance, δP*, δP**), 5.3.1 (load factor Φen*), step R2 (F_Kab),
  step R9 (σ_SAb). The equation forms are recalled, not read (# from memory); no worked example of the
  guideline could be read here, so every figure below is a hand calculation written out step by step,
  and the closed forms are checked against independent numerical solutions of the same linear model
  (numpy / scipy), as the guideline derives them.
"""

from __future__ import annotations

import math
import warnings

import numpy as np
import pytest
from hypothesis import given, settings
from hypothesis import strategies as st
from scipy.optimize import brentq

from fitcheck import screws
from fitcheck.core import vdi2230_eccentric as ecc

COVER = {"thread": "M6", "property_class": "8.8", "head": "socket",
         "layers": [{"thickness": "8 mm", "material": "EN AW-6082-T6"}], "engagement": "12 mm",
         "housing_material": "EN AC-46000", "count": 6, "bolt_circle": "80 mm",
         "axial_force": "3 kN", "mu_thread": [0.10, 0.16], "mu_head": [0.10, 0.16]}


def _run(**extra):
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")   # the light-alloy embedding warning of every cover here
        return screws.evaluate(screws.ScrewJointInput.from_mapping({**COVER, **extra}))


def _same(a, b):
    if isinstance(a, float) and isinstance(b, float) and math.isnan(a) and math.isnan(b):
        return True
    return a == b


# --------------------------------------------------------------------------- concentric limit

def test_zero_eccentricities_reproduce_the_concentric_joint_key_by_key():
    r0 = _run()
    r1 = _run(clamp_eccentricity="0 mm", load_eccentricity="0 mm")
    d0, d1 = r0.to_dict(), r1.to_dict()
    assert d0.keys() == d1.keys()
    differing = [k for k in d0 if not _same(d0[k], d1[k])]
    assert differing == []
    assert d1["load_factor_eccentric"] == d1["load_factor"]
    assert d1["bending_stress_MPa"] == 0.0
    assert not any(c["name"] == "no opening at the loaded edge" for c in d1["checks"])


# --------------------------------------------------------------------------- hand calculation

def test_load_factor_hand_calculation():
    # δS = 1.0e-6 mm/N, δP = 2.0e-6 mm/N, strip b = 20 mm, cT = 12 mm, lK = 8 mm of E = 70 000 MPa
    I_Bers = 20.0 * 12.0 ** 3 / 12.0                 # = 2880 mm⁴
    beta_P = 8.0 / (70000.0 * I_Bers)                # = 3.968e-8 1/(N·mm)
    s, a, n = 2.0, 5.0, 0.5
    dPs = 2.0e-6 + s * s * beta_P                    # δP*  = 2.1587e-6
    dPss = 2.0e-6 + a * s * beta_P                   # δP** = 2.3968e-6
    phi = n * dPss / (1.0e-6 + dPs)                  # Φen* = 0.37941
    assert I_Bers == 2880.0
    assert ecc.bending_compliance([8.0], [70000.0], I_Bers) == pytest.approx(beta_P, rel=1e-12)
    assert float(ecc.load_factor_eccentric(n, 1.0e-6, 2.0e-6, beta_P, s, a)) == pytest.approx(phi, rel=1e-12)
    assert phi == pytest.approx(0.37941, abs=5e-5)
    # concentric: n·δP/(δS + δP) = 0.5·2/3
    assert float(ecc.load_factor_eccentric(n, 1.0e-6, 2.0e-6, beta_P, 0.0, 0.0)) == pytest.approx(1 / 3)


def test_opening_limit_hand_calculation():
    # strip 20 × 12 mm less a 6.4 mm hole at s = 2 mm; edge u = 6 mm on the load side
    A_hole = math.pi / 4 * 6.4 ** 2                              # 32.170 mm²
    A_D = 20 * 12 - A_hole                                       # 207.830 mm²
    I_BT = 20 * 12 ** 3 / 12 - math.pi * 6.4 ** 4 / 64 - A_hole * 2.0 ** 2   # 2880 − 82.35 − 128.68
    A, Ib = (float(v) for v in ecc.interface_section(20.0, 12.0, 6.4, 2.0))
    assert A == pytest.approx(A_D, rel=1e-12) and Ib == pytest.approx(I_BT, rel=1e-12)
    assert I_BT == pytest.approx(2668.97, abs=0.01)
    F_V, phi, a, s, u = 4000.0, 0.3, 5.0, 2.0, 6.0
    lever = (a - s) * u / (I_BT / A_D + s * u)                   # 18/(12.842 + 12) = 0.72457
    F_Aab = F_V / ((1 - phi) + lever)                            # 4000/1.42457 = 2807.9 N
    assert lever == pytest.approx(0.72457, abs=1e-4)
    assert float(ecc.opening_limit(F_V, phi, a, s, u, A_D, I_BT)) == pytest.approx(F_Aab, rel=1e-12)
    assert F_Aab == pytest.approx(2807.9, abs=0.2)
    # at the opening limit the residual clamp load equals the clamp load needed against opening
    F_KR = F_V - (1 - phi) * F_Aab
    assert float(ecc.clamp_to_prevent_opening(F_Aab, a, s, u, A_D, I_BT)) == pytest.approx(F_KR, rel=1e-9)


def test_screw_bending_stress_vdi_form_equals_beam_form():
    # VDI 2230-1:2015 step R9 (from memory):
    # σSAb = [1 + (1/Φ − s/a)·(lK/lers)·(ES/EP)·π·a·dS³/(8·IBers)]·Φ·FA/AS
    F_A, phi, a, s, l_K, l_ers, E_S, E_P, d_S, I_B = 800.0, 0.32, 5.0, 2.0, 8.0, 12.0, 205000.0, 70000.0, 5.06, 2880.0
    A_S = math.pi / 4 * d_S ** 2
    vdi = (1 + (1 / phi - s / a) * (l_K / l_ers) * (E_S / E_P) * math.pi * a * d_S ** 3 / (8 * I_B)) * phi * F_A / A_S
    ax, bend = ecc.screw_stress_eccentric(F_A, phi, a, s, l_K, l_ers, E_S, E_P, d_S, I_B)
    assert float(ax + bend) == pytest.approx(vdi, rel=1e-12)
    # beam theory: rotation γ = FA·(a − s·Φ)·lK/(EP·IBers); σb = γ·ES·dS/(2·lers)
    gamma = F_A * (a - s * phi) * l_K / (E_P * I_B)
    assert float(bend) == pytest.approx(gamma * E_S * d_S / (2 * l_ers), rel=1e-12)


# --------------------------------------------------------------------------- independent solutions

def _phi_numeric(n, dS, dP, bP, s, a):
    """Solve screw + clamped beam under FA = 1 as a linear system (no closed form used).

    Unknowns: screw force change X, body shortening w at the symmetry axis, body rotation θ.
    Body: w = δP·N, θ = βP·M with N = X − 1 (compression positive) and M = X·s − 1·a;
    compatibility at the screw: elongation X·δS equals the body's relief −(w + θ·s).
    For n < 1 the load acts over n·lK: the body's relief counts n times (VDI's n·Φ).
    """
    # X·δS + (δP·(X − 1) + βP·(X·s − a)·s) = 0  written as a matrix system in (X, w, θ)
    A = np.array([[dS, 1.0, s],
                  [-dP, 1.0, 0.0],
                  [-bP * s, 0.0, 1.0]])
    b = np.array([0.0, -dP, -bP * a])
    X = np.linalg.solve(A, b)[0]
    return n * X


@settings(max_examples=60, deadline=None)
@given(st.floats(0.2, 1.0), st.floats(2e-7, 5e-6), st.floats(2e-7, 5e-6), st.floats(1e-9, 2e-7),
       st.floats(-3.0, 3.0), st.floats(0.0, 8.0))
def test_load_factor_equals_linear_system_solution(n, dS, dP, bP, s, a):
    # independent solution: numpy.linalg.solve on compatibility and equilibrium of the linear model
    ref = _phi_numeric(n, dS, dP, bP, s, a)
    assert float(ecc.load_factor_eccentric(n, dS, dP, bP, s, a)) == pytest.approx(ref, rel=1e-9, abs=1e-12)


def test_opening_limit_equals_root_of_numerically_integrated_interface_pressure():
    # independent solution: the interface strip (b × cT less the hole) on a fine grid gives A and I by
    # summation; the pressure at the edge, N/A + M·u/I, is driven to zero by scipy.optimize.brentq
    b, c, dh, s, a = 24.0, 14.0, 6.6, 1.5, 5.5
    F_V, phi = 5200.0, 0.27
    h = 0.01
    xs = np.arange(-c / 2 + h / 2, c / 2, h)
    ys = np.arange(-b / 2 + h / 2, b / 2, h)
    X, Y = np.meshgrid(xs, ys)
    solid = (X - s) ** 2 + Y ** 2 > (dh / 2) ** 2
    A = solid.sum() * h * h
    xc = (X * solid).sum() * h * h / A          # centroid shift by the hole (neglected in the closed form)
    Ib = (((X - xc) ** 2) * solid).sum() * h * h
    u = c / 2

    def edge_pressure(F_A):
        F_S = F_V + phi * F_A
        N = F_S - F_A                      # compression through the interface
        M = F_S * (s - xc) - F_A * (a - xc)  # moment about the centroid, compressing the +x side
        return N / A + M * (u - xc) / Ib

    F_num = brentq(edge_pressure, 0.0, 1e6)
    A_c, I_c = (float(v) for v in ecc.interface_section(b, c, dh, s))
    F_closed = float(ecc.opening_limit(F_V, phi, a, s, u, A_c, I_c))
    # the closed form neglects the centroid shift of the hole: agreement within 1.5 %
    assert F_closed == pytest.approx(F_num, rel=0.015)


# --------------------------------------------------------------------------- properties

@settings(max_examples=60, deadline=None)
@given(st.floats(0.5, 4.0), st.floats(0.5, 6.0))
def test_load_on_the_clamping_side_raises_the_load_factor(s, a):
    # screw and load on the same side of the symmetry axis (a·s > 0): Φen* above the concentric Φn
    n, dS, dP, bP = 0.5, 1.2e-6, 1.8e-6, 4e-8
    a = max(a, s)
    assert float(ecc.load_factor_eccentric(n, dS, dP, bP, s, a)) > n * dP / (dS + dP)


@settings(max_examples=60, deadline=None)
@given(st.floats(0.0, 6.0), st.floats(0.01, 1.0))
def test_opening_force_falls_as_the_load_eccentricity_grows(a, da):
    A_D, I_BT = ecc.interface_section(20.0, 14.0, 6.6, 1.0)
    lo = float(ecc.opening_limit(5000.0, 0.25, a + da, 1.0, 7.0, A_D, I_BT))
    hi = float(ecc.opening_limit(5000.0, 0.25, a, 1.0, 7.0, A_D, I_BT))
    assert lo < hi


def test_opening_force_of_the_joint_falls_as_the_load_eccentricity_grows():
    limits = [_run(load_eccentricity=f"{a} mm", interface_depth="14 mm").opening_force for a in (1, 3, 5, 6.5)]
    assert all(x > y for x, y in zip(limits, limits[1:], strict=False))


@pytest.mark.parametrize("kind", [{"gasket_modulus": "300 MPa"}, {"gasket_stiffness": "50000 N/mm"}])
def test_a_gasket_lowers_the_clamped_parts_stiffness(kind):
    r0 = _run()
    r1 = _run(gasket_thickness="0.5 mm", **kind)
    assert r1.clamp_stiffness < r0.clamp_stiffness
    assert r1.l_K == pytest.approx(r0.l_K + 0.5)


def test_gasket_stiffness_given_per_screw_is_that_layers_compliance():
    # the layer's modulus is set so that its cone section has compliance 1/c: removing it again
    # the layer's compliance is k/E: two moduli give the rest of the stack as δ_rest = (E1·δ1 − E2·δ2)/(E1 − E2)
    r_g = _run(gasket_thickness="0.5 mm", gasket_stiffness="50000 N/mm")
    r_1 = _run(gasket_thickness="0.5 mm", gasket_modulus="1000 MPa")
    r_2 = _run(gasket_thickness="0.5 mm", gasket_modulus="4000 MPa")
    rest = (1000.0 * r_1.delta_P - 4000.0 * r_2.delta_P) / (1000.0 - 4000.0)
    assert r_g.delta_P - rest == pytest.approx(1 / 50000.0, rel=1e-6)


def test_gasket_settling_adds_to_embedding_and_sealing_is_checked():
    r0 = _run(gasket_thickness="0.5 mm", gasket_modulus="300 MPa")
    r1 = _run(gasket_thickness="0.5 mm", gasket_modulus="300 MPa", gasket_settling="30 um",
              gasket_seating_pressure="40 MPa", gasket_area="3000 mm**2")
    assert r1.f_Z == pytest.approx(r0.f_Z + 0.030)
    seal = next(c for c in r1.checks if c.name == "gasket sealing pressure")
    # residual clamp load on a sixth of the sealed area
    assert seal.value == pytest.approx(r1.F_KR_min / 500.0)
    assert not seal.passed          # 40 MPa is more than these screws keep on the gasket


# --------------------------------------------------------------------------- the analysis

def test_cover_under_tilt_uses_the_eccentric_model_and_names_the_edge():
    r = _run(tilting_moment="40 N*m", interface_depth="14 mm")
    # screw on the strip's centre line (s_sym = 0): Φen* = Φn, but the load at a = cT/2 bends the screw
    assert r.load_factor_eccentric == pytest.approx(r.load_factor, rel=1e-12)
    assert r.bending_stress > 0
    r1 = _run(tilting_moment="40 N*m", interface_depth="14 mm", clamp_eccentricity="1.5 mm")
    assert r1.load_factor_eccentric > r1.load_factor
    assert r1.opening_force > r.opening_force   # the screw nearer the loaded edge holds it shut longer
    chk = next(c for c in r.checks if c.name == "no opening at the loaded edge")
    assert "screw" in r.opening_edge and "load side" in r.opening_edge
    assert r.opening_edge in chk.note
    # the fatigue check carries the bending share
    fat = next(c for c in r.checks if c.name == "fatigue of the thread")
    assert r.sigma_a == pytest.approx(r.load_factor_eccentric * r.F_A / (2 * r.As) + r.bending_stress / 2)
    assert "bending share" in fat.note


def test_cover_under_tilt_without_interface_depth_warns_and_stays_concentric():
    with warnings.catch_warnings(record=True) as caught:
        warnings.simplefilter("always")
        r = screws.evaluate(screws.ScrewJointInput.from_mapping({**COVER, "tilting_moment": "40 N*m"}))
    assert any("tilting moment" in str(w.message) for w in caught)
    assert r.opening_edge == ""


def test_eccentric_joint_needs_an_interface_depth_and_a_screw_inside_the_core():
    from fitcheck.errors import InputError
    with pytest.raises(InputError, match="interface_depth"):
        screws.ScrewJointInput.from_mapping({**COVER, "load_eccentricity": "4 mm"})
    with pytest.raises(InputError, match="core of the interface"):
        screws.ScrewJointInput.from_mapping({**COVER, "clamp_eccentricity": "3 mm", "interface_depth": "12 mm"})
    with pytest.raises(InputError, match="gasket_modulus"):
        screws.ScrewJointInput.from_mapping({**COVER, "gasket_thickness": "0.5 mm"})


def test_inch_and_si_eccentric_inputs_agree():
    r_si = _run(clamp_eccentricity="1 mm", load_eccentricity="5.08 mm", interface_depth="12.7 mm")
    r_in = _run(clamp_eccentricity=f"{1 / 25.4!r} in", load_eccentricity="0.2 in", interface_depth="0.5 in")
    assert r_in.load_factor_eccentric == pytest.approx(r_si.load_factor_eccentric, rel=1e-9)
    assert r_in.opening_force == pytest.approx(r_si.opening_force, rel=1e-9)


def test_round_trip_of_the_new_keys():
    inp = screws.ScrewJointInput.from_mapping({**COVER, "clamp_eccentricity": "1 mm", "load_eccentricity": "5 mm",
                                               "interface_depth": "14 mm", "interface_width": "30 mm",
                                               "gasket_thickness": "0.4 mm", "gasket_stiffness": "60000 N/mm",
                                               "gasket_settling": "15 um"})
    back = screws.ScrewJointInput.from_mapping(inp.to_mapping())
    assert back == inp


def test_cli_json_carries_the_eccentric_keys(tmp_path):
    import json
    import subprocess
    import sys
    case = tmp_path / "cover.toml"
    case.write_text('format_version = 1\n[[screws]]\nname = "cover"\nthread = "M6"\nproperty_class = "8.8"\n'
                    'head = "socket"\nlayers = [{thickness = "8 mm", material = "EN AW-6082-T6"}]\n'
                    'engagement = "12 mm"\nhousing_material = "EN AC-46000"\ncount = 6\nbolt_circle = "80 mm"\n'
                    'axial_force = "3 kN"\ntilting_moment = "40 N*m"\ninterface_depth = "14 mm"\n'
                    'clamp_eccentricity = "1.5 mm"\n', encoding="utf-8")
    out = subprocess.run([sys.executable, "-m", "fitcheck", "screws", str(case), "--json"],
                         capture_output=True, text=True, timeout=120)
    assert out.returncode in (0, 1), out.stderr
    data = json.loads(out.stdout)
    joint = data[0] if isinstance(data, list) else data["joints"][0] if "joints" in data else data
    for key in ("load_factor_eccentric", "bending_stress_MPa", "opening_force_N"):
        assert isinstance(joint[key], float)
    assert joint["load_factor_eccentric"] > joint["load_factor"]
    assert any(c["name"] == "no opening at the loaded edge" for c in joint["checks"])
