"""Press-fit verdicts over every operating state, temperature units in coefficients, limits.

Sources are named beside each check; hand calculations are written out.
"""

from __future__ import annotations

import math
import warnings

import numpy as np
import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

from fitcheck import case as case_mod
from fitcheck import materials
from fitcheck.errors import MethodRangeWarning
from fitcheck.pressfit import RPM, PressFitInput, evaluate, root_diameter
from fitcheck.units import to_core

GEAR = {"name": "gear", "fit": "20 H7/s6", "length": "16 mm", "hub_outer_diameter": "40 mm",
        "shaft_material": "C45E", "hub_material": "C45E", "torque": "10 N*m"}
HOT = {**GEAR, "speed": "20000 rpm", "temperature_shaft": "80 degC", "temperature_hub": "40 degC"}


def _eval(m):
    with warnings.catch_warnings():
        warnings.simplefilter("ignore", MethodRangeWarning)
        return evaluate(PressFitInput.from_mapping(m))


# --------------------------------------------------------------------------- the reproduction

def test_cold_start_at_full_speed_governs_hand_calculation():
    """20 H7/s6, L 16, hub Ø40, C45E/C45E, 10 N·m, 20 000 rpm, shaft 80 °C, hub 40 °C.

    Hand calculation (every figure below is computed here from the textbook formulas):
    * ISO 286-2:2010 Tables: H7 at 18–30 mm 0/+21 um; s6 at 18–24 mm +35/+48 um -> δ_min = 14 um.
    * Smoothing DIN 7190-1:2017: 0.8·(Rz 4 + Rz 6.3) = 8.24 um -> 5.76 um at room temperature.
    * Same material, solid shaft (Shigley 10th ed. eq. (3-56)): p = E·δ·(1 − Q²)/(2d), Q = d/Do.
    * Rotating discs (Shigley eq. (3-55)): hub-bore hoop stress ρω²/4·[(3+ν)ro² + (1−ν)ri²],
      solid-shaft surface ρω²/4·(1−ν)R²; the bore grows d·(σt_hub − σt_shaft)/E
      = d·ρω²(3+ν)ro²/(4E).
    * Operating temperature (DIN 7190-1): d·α·[(80 − 20) − (40 − 20)] = +9.2 um: tighter, so the
      cold start at full speed (room temperature, 20 000 rpm) is the loosest state.
    * Torque capacity p·π·d²·L·μ/2 with μ = 0.08 (data/pressfit_friction.csv, steel/steel press).
    """
    E, nu, rho, alpha = 210000.0, 0.30, 7.85e-9, 11.5e-6    # data/materials.csv, C45E
    d, Do, L, mu = 20.0, 40.0, 16.0, 0.08
    delta = 0.014 - 0.8 * (0.004 + 0.0063)
    Q2 = (d / Do) ** 2
    w = 20000 * 2 * math.pi / 60
    loss_w = d * rho * w**2 * (3 + nu) * (Do / 2) ** 2 / (4 * E)
    assert loss_w * 1e3 == pytest.approx(1.082, abs=1e-3)
    p_cold = E * (delta - loss_w) * (1 - Q2) / (2 * d)
    s_slip = p_cold * math.pi * d**2 * L * mu / 2 / 10000.0
    n_loose = 20000 * math.sqrt(delta / loss_w)
    assert d * alpha * (60 - 20) * 1e3 == pytest.approx(9.2)
    # the figures: p_min ≈ 18.4 MPa, slip safety ≈ 1.48, loosening speed ≈ 46 100 rpm
    assert p_cold == pytest.approx(18.4, abs=0.05) and s_slip == pytest.approx(1.48, abs=0.005)
    assert n_loose == pytest.approx(46100, rel=2e-3)

    r = _eval(HOT)
    assert r.pressure_min == pytest.approx(p_cold, rel=1e-9)
    assert r.slip_safety_min == pytest.approx(s_slip, rel=1e-9)
    assert r.loosening_speed_rpm == pytest.approx(n_loose, rel=1e-9)
    assert r.governing_loose_state.startswith("cold start at 20") and "rpm" in r.governing_loose_state
    slip = next(c for c in r.checks if c.name == "slip at loosest fit")
    assert not slip.passed and "cold start at 20" in slip.note
    # the headline figures are the governing state's figures and equal the table's
    assert r.loosest_governing.pressure == pytest.approx(r.pressure_min, rel=1e-12)
    assert r.loosest_governing.torque_capacity == pytest.approx(r.torque_capacity_min, rel=1e-12)
    assert "Slips" in r.headline and "cold start" in r.headline and "search" in r.headline
    js = r.to_json()
    assert js["governing_loose_state"] == r.governing_loose_state
    assert js["pressure_min_MPa"] == r.pressure_min and len(js["states"]) == 8


def test_temperature_min_from_conditions_reaches_press_fits(tmp_path):
    """[conditions] temperature_min reaches a press fit. A shaft that expands more than its hub
    (α_s 17e-6/K in C45E, 11.5e-6/K) loosens in the cold. Hand check (DIN 7190-1:2017, temperature
    influence): δ(−30 °C) = 14 − 8.24 + 20 mm·(17 − 11.5)e-6/K·(−50 K)·1e3 = 0.26 um;
    p = E·δ·(1 − Q²)/(2d) (Shigley eq. (3-56), equal E and ν) = 1.02 MPa."""
    text = """format_version = 1

[conditions]
temperature_min = "-30 degC"
temperature_max = "70 degC"

[[pressfit]]
name = "pin"
fit = "20 H7/s6"
length = "16 mm"
hub_outer_diameter = "40 mm"
shaft_material = { base = "C45E", name = "warm-growing shaft", alpha = "17e-6 1/K" }
hub_material = "C45E"
torque = "1 N*m"
"""
    p = tmp_path / "c.toml"
    p.write_text(text)
    dc = case_mod.load(p)
    assert dc.pressfits[0].temperature_min == -30.0
    with warnings.catch_warnings():
        warnings.simplefilter("ignore", MethodRangeWarning)
        r = case_mod.evaluate(dc).joints[0].result
    assert r.temperature_min == -30.0 and r.temperature_max == 70.0
    assert r.governing_loose_state == "lowest ambient -30 °C at standstill"
    delta = 0.014 - 0.00824 + 20.0 * (17e-6 - 11.5e-6) * (-30 - 20)
    assert delta * 1e3 == pytest.approx(0.26)
    assert r.pressure_min == pytest.approx(210000.0 * delta * 0.75 / 40.0, rel=1e-9)


def test_clearance_fit_reads_not_applicable_and_names_the_cause():
    r = _eval({**GEAR, "fit": "20 H7/g6"})
    speed = next(c for c in r.checks if c.name == "loosening speed")
    assert math.isfinite(speed.value) and speed.note.startswith("not applicable")
    assert r.loosening_speed_text.startswith("not applicable")
    assert r.to_json()["loosening_speed"].startswith("not applicable")
    assert "clearance" in r.headline and "search" in r.headline


def test_loses_interference_headline_names_smoothing_temperature_speed():
    # 20 H7/r6: ISO 286-2 r6 at 18-30 +28/+41 -> δ_min 7 um < smoothing 8.24 um: no pressure at all
    r = _eval({**GEAR, "fit": "20 H7/r6"})
    assert r.pressure_min == 0.0 and "smoothing 8.2 um" in r.headline and "slips" in r.headline


def test_infinite_hub_at_standstill_is_finite():
    """A massive hub (Do → ∞): Q = 0, p = E·δ/(2d) for equal materials (Shigley eq. (3-56))."""
    inp = PressFitInput.from_mapping(GEAR)
    inp = PressFitInput(**{**inp.__dict__, "hub_outer_diameter": math.inf})
    with warnings.catch_warnings():
        warnings.simplefilter("error", RuntimeWarning)
        warnings.simplefilter("ignore", MethodRangeWarning)
        r = evaluate(inp)
    js = r.to_json()
    for c in r.checks:
        assert math.isfinite(c.value), c
    for case in r.states:
        assert all(math.isfinite(getattr(case, k)) for k in ("pressure", "hub_von_mises_bore",
                                                             "shaft_von_mises_max"))
    assert r.pressure_min == pytest.approx(210000.0 * 0.00576 / 40.0, rel=1e-9)
    assert js["loosening_speed"].startswith("not applicable")


def test_gear_root_diameter_with_profile_shift_and_helix():
    """ISO 21771:2007: d = z·m_n/cos β; ISO 53:1998 basic rack dedendum 1.25·m_n; shift +x·m_n."""
    assert root_diameter(2.0, 30) == pytest.approx(2.0 * 30 - 2.5 * 2.0)
    beta = math.radians(15.0)
    inp = PressFitInput.from_mapping({**{k: v for k, v in GEAR.items() if k != "hub_outer_diameter"},
                                      "module": "1.5 mm", "teeth": 40, "profile_shift": 0.3,
                                      "helix_angle": "15 deg"})
    hand = 1.5 * 40 / math.cos(beta) - 2.5 * 1.5 + 2 * 0.3 * 1.5
    assert inp.resolved_hub_outer_diameter()[0] == pytest.approx(hand, rel=1e-12)
    assert PressFitInput.from_mapping(inp.to_mapping()) == inp


# --------------------------------------------------------------------------- temperature units

UNITS = {"1/K": 1.0, "1/degC": 1.0, "1/delta_degC": 1.0, "1/degF": 5.0 / 9.0, "1/°C": 1.0}


@pytest.mark.parametrize("unit,scale", list(UNITS.items()))
def test_expansion_units_are_per_degree(unit, scale):
    """13e-6 1/degF = 23.4e-6 1/K (1 °F step = 5/9 K); an offset unit never scales a coefficient."""
    value = 23.4e-6 * scale
    assert to_core(f"{value!r} {unit}", "expansion", "alpha") == pytest.approx(23.4e-6, rel=1e-12)
    assert to_core("13e-6 1/degF", "expansion", "alpha") == pytest.approx(23.4e-6, rel=1e-12)


def test_aluminium_hub_with_alpha_per_degC_loses_pressure_when_hot():
    """Steel shaft in an aluminium hub at 100 °C: Δδ = d·(α_s − α_h)·80 K = 20·(11.5 − 23.4)e-6·80
    = −19.0 um > the 5.76 um left after smoothing (DIN 7190-1:2017): no pressure, the joint fails.
    Heating temperature for shrinking (DIN 7190-1): 20 + (48 + 20) um/(23.4e-6·20 mm) = 165.3 °C."""
    al = {"base": "EN AW-6082-T6", "name": "Al inline", "alpha": "23.4e-6 1/degC"}
    r = _eval({**GEAR, "hub_material": al, "temperature_shaft": "100 degC",
               "temperature_hub": "100 degC", "assembly": "shrink", "mu_slip": 0.1})
    assert r.pressure_min == 0.0 and not r.ok
    assert r.shrink_temperature_C == pytest.approx(20 + 0.068 / (23.4e-6 * 20), rel=1e-9)


_ALPHA = st.floats(5e-6, 30e-6)


@settings(max_examples=40, deadline=None)
@given(a_s=_ALPHA, a_h=_ALPHA, t=st.floats(-40, 150), which=st.sampled_from(["1/degC", "1/degF",
                                                                               "1/delta_degC"]))
def test_pressfit_results_invariant_under_expansion_units(a_s, a_h, t, which):
    def mat(a, unit):
        v = a * (5.0 / 9.0) if unit == "1/degF" else a
        return {"base": "C45E", "name": "m", "alpha": f"{v!r} {unit}"}
    base = {**GEAR, "temperature_shaft": f"{t} degC", "temperature_hub": f"{t / 2} degC",
            "temperature_min": "-20 degC", "speed": "3000 rpm"}
    r1 = _eval({**base, "shaft_material": mat(a_s, "1/K"), "hub_material": mat(a_h, "1/K")})
    r2 = _eval({**base, "shaft_material": mat(a_s, which), "hub_material": mat(a_h, which)})
    for k in ("pressure_min", "pressure_max", "slip_safety_min", "hub_yield_safety", "loosening_speed"):
        assert getattr(r2, k) == pytest.approx(getattr(r1, k), rel=1e-9, abs=1e-12)


def test_screws_and_bearings_read_expansion_units_alike():
    """Screws (VDI 2230 thermal preload change) and bearing seats take materials.from_mapping."""
    from fitcheck import bearings, screws
    from tests.test_screws import BASE

    out = []
    for unit, v in (("1/K", 23.4e-6), ("1/degC", 23.4e-6), ("1/degF", 13e-6)):
        layer = {"thickness": "8 mm", "material": {"base": "EN AW-6082-T6", "name": "al",
                                                    "alpha": f"{v!r} {unit}"}}
        with warnings.catch_warnings():
            warnings.simplefilter("ignore", MethodRangeWarning)
            s = screws.evaluate(screws.ScrewJointInput.from_mapping(
                {**BASE, "layers": [layer], "temperature_min": "-20 degC", "temperature_max": "90 degC"}))
            b = bearings.evaluate(bearings.BearingSeatInput.from_mapping(
                {"designation": "6204", "shaft": "k5", "housing": "H7", "temperature_inner": "60 degC",
                 "housing_material": {"base": "EN AW-6082-T6", "name": "al", "alpha": f"{v!r} {unit}"}}))
        out.append((s.dF_th_cold, s.dF_th_warm, b.thermal_change_outer_um))
    assert out[0][2] != 0.0 and out[0][0] != 0.0
    for o in out[1:]:
        assert o == pytest.approx(out[0], rel=1e-9)


def test_material_alpha_per_degC_gives_the_tabulated_value():
    m = materials.from_mapping({"base": "EN AW-6082-T6", "name": "x", "alpha": "23.4e-6 1/degC"}, "m")
    assert m.alpha == pytest.approx(materials.get("EN AW-6082-T6").alpha, rel=1e-12)


# --------------------------------------------------------------------------- every state

@settings(max_examples=60, deadline=None)
@given(ts=st.floats(-40, 150), th=st.floats(-40, 150), rpm=st.floats(0, 30000),
       tmin=st.floats(-60, 20), tmax=st.floats(20, 120), fit=st.sampled_from(["20 H7/s6", "20 H7/u6",
                                                                              "20 H7/p6"]),
       hub=st.sampled_from(["C45E", "EN AW-6082-T6"]))
def test_governing_loosest_pressure_never_exceeds_a_single_state(ts, th, rpm, tmin, tmax, fit, hub):
    """The kernel's p_min against every state's pressure from the Lamé functions, state by state."""
    r = _eval({**GEAR, "fit": fit, "hub_material": hub, "temperature_shaft": f"{ts} degC",
               "temperature_hub": f"{th} degC", "speed": f"{rpm} rpm",
               "temperature_min": f"{tmin} degC", "temperature_max": f"{tmax} degC"})
    loose = r.states[0::2]
    assert len(loose) == (8 if r.speed > 0 else 4)  # a speed that underflows to 0 rad/s is standstill
    for c in loose:
        assert r.pressure_min <= c.pressure + 1e-9
    assert min(c.pressure for c in loose) == pytest.approx(r.pressure_min, abs=1e-9)
    assert r.pressure_max == pytest.approx(max(c.pressure for c in r.states[1::2]), abs=1e-9)
    assert r.loosest_governing.state == r.governing_loose_state


def test_kernel_state_codes_and_old_keys():
    from fitcheck.core.pressfit import evaluate as core

    out = core(interference_min=np.array([0.014, 0.014]), interference_max=0.048, d=20.0, L=16.0,
               Do=40.0, Es=210e3, nus=0.3, Rps=490.0, Eh=210e3, nuh=0.3, Rph=490.0, mu_slip=0.08,
               rz_shaft=0.004, rz_hub=0.0063, omega=20000 * RPM, T_shaft=80.0, T_hub=40.0,
               T_min=np.array([-20.0, 20.0]))
    # (code 5 = T_min at speed) is loosest where T_min = -20 °C; else the cold start (code 1)
    assert list(out["state_p_min"]) == [1, 1]  # equal α: a uniform temperature leaves δ unchanged
    assert out["p_min_asm"][0] > out["p_min"][0]


def test_report_shows_governing_state_and_clearance_verdict():
    """The report takes checks and their notes generically: the governing state and the bearing's
    clearance verdict by probable combination reach it."""
    from fitcheck import report

    text = ('format_version = 1\n[conditions]\ntemperature_min = "-10 degC"\n\n'
            '[[pressfit]]\nname = "gear"\nfit = "20 H7/s6"\nlength = "16 mm"\nhub_outer_diameter = "40 mm"\n'
            'shaft_material = "C45E"\nhub_material = "C45E"\ntorque = "10 N*m"\nspeed = "20000 rpm"\n'
            'temperature_shaft = "80 degC"\ntemperature_hub = "40 degC"\n\n'
            '[[bearing]]\nname = "b"\ndesignation = "6204"\nshaft = "k5"\nhousing = "H7"\n')
    dc = case_mod.loads(text)
    with warnings.catch_warnings():
        warnings.simplefilter("ignore", MethodRangeWarning)
        html = report.to_html(case_mod.evaluate(dc))
    assert "cold start at 20" in html
    assert "mean, probable combination" in html and "maximum probable interference" in html


def test_gasket_expansion_reads_per_degree():
    """The gasket's expansion coefficient (VDI 2230 thermal preload change) takes 1/degC and 1/degF
    as per degree, like every other coefficient."""
    from fitcheck import screws
    from tests.test_screws import BASE

    vals = [screws.ScrewJointInput.from_mapping({**BASE, "gasket_thickness": "0.5 mm",
                                                 "gasket_modulus": "300 MPa", "gasket_alpha": a}).gasket.alpha
            for a in ("60e-6 1/K", "60e-6 1/degC", f"{60e-6 * 5 / 9!r} 1/degF")]
    assert vals == pytest.approx([60e-6] * 3, rel=1e-12)
