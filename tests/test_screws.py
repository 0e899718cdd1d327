"""The screw-joint engine: inputs, checks, properties (hypothesis), round trips and the CLI."""

import json
import math

import numpy as np
import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

from fitcheck import CAUTION
from fitcheck.core import vdi2230 as core
from fitcheck.errors import InputError, InputErrors
from fitcheck.screws import KEYS, METHOD_NOTES, ScrewJointInput, evaluate

BASE = {
    "name": "cover", "thread": "M6", "property_class": "8.8", "head": "socket",
    "layers": [{"thickness": "8 mm", "material": "EN AW-6082-T6"}], "engagement": "12 mm",
    "housing_material": "EN AC-46000", "count": 6, "bolt_circle": "80 mm", "axial_force": "3 kN",
    "mu_thread": [0.10, 0.16], "tightening": "torque_wrench_estimated_friction",
}


def joint(**kw):
    m = {**BASE, **kw}
    for k in [k for k, v in m.items() if v is None]:
        del m[k]
    return ScrewJointInput.from_mapping(m)


def test_evaluate_basic_and_consistent():
    r = evaluate(joint())
    # per-screw axial load of a 6-screw pattern under a central force  # exact by statics
    assert r.F_A == pytest.approx(500.0)
    # VDI 2230-1:2015 Table A8, torque wrench with estimated friction: αA = 2.0 (upper end)  # from memory
    assert r.alpha_A == 2.0
    # every figure is recomputed by hand in tests/test_screws_hand.py
    assert r.ok
    assert {c.name for c in r.checks} >= {"assembly preload", "working stress (yield safety)",
                                          "residual clamp load (separation)", "surface pressure under head",
                                          "length of engagement", "fatigue of the thread"}
    assert all(c.reference for c in r.checks)


def test_round_trip_lossless():
    inp = joint(washer=False, transverse_force="400 N", temperature_min="-20 degC", temperature_max="90 degC",
                layers=[{"thickness": "3 mm", "material": "C45E"},
                        {"thickness": "5.5 mm", "material": {"base": "EN AW-7075-T6", "E": "71 GPa"}}])
    again = ScrewJointInput.from_mapping(inp.to_mapping())
    assert again == inp
    assert evaluate(again).to_dict() == evaluate(inp).to_dict()


def test_keys_documented_and_notes():
    assert set(ScrewJointInput.from_mapping(BASE).to_mapping()) <= set(KEYS)
    assert all(isinstance(s, str) and isinstance(c, str) and c for s, c in METHOD_NOTES)


def test_through_bolt_has_nut_pressure_and_no_engagement():
    r = evaluate(joint(joint="through", engagement=None, housing_material=None, head="hex",
                       layers=[{"thickness": "6 mm", "material": "C45E"}, {"thickness": "10 mm", "material": "EN-GJL-250"}]))
    names = [c.name for c in r.checks]
    assert "surface pressure under nut" in names and "length of engagement" not in names


def test_aluminium_cover_steel_screw_thermal_sign():
    r = evaluate(joint(temperature_min="-30 degC", temperature_max="100 degC"))
    # aluminium expands more than steel: preload rises warm, falls cold (VDI 2230-1, 5.4.2.3)
    assert r.dF_th_warm > 0 > r.dF_th_cold
    base = evaluate(joint())
    assert r.F_M_min > base.F_M_min


def test_slip_check_and_failing_joint():
    r = evaluate(joint(transverse_force="30 kN", mu_interface=0.1))
    slip = next(c for c in r.checks if c.name == "slip safety S_G")
    assert not slip.passed and not r.ok
    # VDI 2230-1:2015, R12: S_G = FKR,min·qF·μT/FQ against 1.8 (alternating, the default)
    assert slip.value == pytest.approx(r.F_KR_min * 0.1 / r.F_Q)
    assert slip.limit == 1.8


def test_short_engagement_in_aluminium_fails():
    r = evaluate(joint(engagement="3 mm"))
    c = next(c for c in r.checks if c.name == "length of engagement")
    assert not c.passed and c.limit > 3.0


def test_pattern_loads_bolt_circle():
    # rigid-flange bolt circle: F = FA/n + 4 M/(n D)  (Shigley 10th ed., Sec. 8-12 style statics)
    x = 40 * np.cos(2 * np.pi * np.arange(6) / 6)
    y = 40 * np.sin(2 * np.pi * np.arange(6) / 6)
    FA, FQ = core.pattern_loads(x, y, 6000.0, 480000.0, 600.0, 240000.0)
    assert FA == pytest.approx(1000 + 4 * 480000 / (6 * 80), rel=1e-4)
    assert FQ == pytest.approx(100 + 2 * 240000 / (6 * 80), rel=1e-9)


def test_positions_equal_bolt_circle():
    pos = [[f"{40 * math.cos(a)} mm", f"{40 * math.sin(a)} mm"] for a in 2 * np.pi * np.arange(6) / 6]
    a = evaluate(joint(tilting_moment="60 N*m"))
    b = evaluate(joint(tilting_moment="60 N*m", bolt_circle=None, count=None, positions=pos))
    assert a.F_A == pytest.approx(b.F_A, rel=1e-4)


def test_unit_invariance_inch_equals_mm():
    a = evaluate(joint(engagement="12 mm", bolt_circle="80 mm", axial_force="3 kN"))
    b = evaluate(joint(engagement=f"{12 / 25.4} in", bolt_circle=f"{80 / 25.4} in",
                       axial_force=f"{3000 / 4.4482216152605} lbf"))
    assert b.F_KR_min == pytest.approx(a.F_KR_min, rel=1e-9)
    assert b.engagement == pytest.approx(a.engagement, rel=1e-12)


def test_unified_screw():
    import warnings

    with warnings.catch_warnings(record=True) as caught:
        warnings.simplefilter("always")
        r = evaluate(joint(thread="1/4-20 UNC", property_class="SAE 5", head="socket"))
    # 1/4 in is inside SAE J429's size range: no range warning for the grade
    assert not [w for w in caught if "J429" in str(w.message)]
    assert r.As / 25.4 ** 2 == pytest.approx(0.0318, abs=5e-5)  # ASME B1.1  # from memory


# ---------------------------------------------------------------- bad input

@pytest.mark.parametrize("kw, match", [
    ({"thread": "M6x2"}, "did you mean"),
    ({"thread": "M13"}, "did you mean"),
    ({"engagement": "0.5 mm"}, "at least one pitch"),
    ({"layers": [{"thickness": "0 mm", "material": "C45E"}]}, "thickness"),
    ({"layers": []}, "non-empty"),
    ({"mu_thread": [0.02, 0.1]}, "mu_thread"),
    ({"mu_head": [0.1, 0.7]}, "mu_head"),
    ({"hole": "5.5 mm"}, "larger than the thread"),
    ({"hole": "meduim"}, "did you mean 'medium'"),
    ({"property_class": "8.9"}, "did you mean"),
    ({"head": "hexagon"}, "did you mean 'hex'"),
    ({"tightening": "by_feel"}, "tightening"),
    ({"materail": "C45E"}, "did you mean"),
    ({"housing_material": "AlSi9Cu3"}, "housing_material"),
    ({"count": 6, "bolt_circle": None}, "bolt circle"),
    ({"count": 2, "tilting_moment": "10 N*m"}, "at least 3 screws"),
    ({"temperature_min": "90 degC", "temperature_max": "20 degC"}, "temperature_max"),
    ({"utilisation": 1.2}, "utilisation"),
    ({"layers": [{"thickness": "-2 mm", "material": "C45E"}]}, "thickness"),   # clamp length <= 0
    ({"engagement": "0.9 mm"}, "at least one pitch"),                           # M6: P = 1 mm
    ({"mu_thread": [0.03, 0.12]}, "mu_thread"),                                 # below 0.04
    ({"mu_head": 0.55}, "mu_head"),                                             # above 0.5
    ({"hole": "4 mm"}, "larger than the thread"),
    ({"hole": "6 mm"}, "larger than the thread"),                               # = d is no clearance
    ({"thread": "M5x0.7"}, "did you mean 'M5"),
])
def test_bad_inputs(kw, match):
    with pytest.raises((InputError, InputErrors), match=match):
        joint(**kw)


def test_several_problems_reported_together():
    with pytest.raises(InputErrors) as ei:
        joint(thread="M6x2", mu_thread=[0.01, 0.1], rz="300 um")
    assert len(ei.value.errors) >= 3


# ---------------------------------------------------------------- properties

@settings(max_examples=40, deadline=None)
@given(F=st.floats(100.0, 1e5), k=st.floats(1.1, 5.0), mu=st.floats(0.04, 0.5), muk=st.floats(0.04, 0.5))
def test_torque_linear_in_preload(F, k, mu, muk):
    args = (1.25, 7.188, mu, muk, 10.3)
    assert core.tightening_torque(k * F, *args) == pytest.approx(k * core.tightening_torque(F, *args), rel=1e-12)


@settings(max_examples=40, deadline=None)
@given(E1=st.floats(40e3, 250e3), f=st.floats(1.05, 3.0))
def test_stiffer_clamped_parts_smaller_load_factor(E1, f):
    def phi(E):
        r = evaluate(joint(layers=[{"thickness": "8 mm", "material": {"base": "EN AW-6082-T6", "E": f"{E} MPa"}}]))
        return r.load_factor
    assert phi(E1 * f) < phi(E1)


@settings(max_examples=40, deadline=None)
@given(t=st.floats(2.0, 40.0), s=st.floats(0.05, 0.95), tapped=st.booleans(),
       DA=st.sampled_from([math.inf, 18.0, 30.0]))
def test_splitting_a_layer_leaves_compliance(t, s, tapped, DA):
    dw, dh, E = 12.33, 9.0, 70000.0
    tp = float(core.tan_phi(t, dw, DA, tapped))
    one = core.clamp_compliance(np.array([0.0]), np.array([t]), np.array([E]), dw, dh, DA, tp, tapped).sum()
    two = core.clamp_compliance(np.array([0.0, s * t]), np.array([s * t, t]), np.array([E, E]),
                                dw, dh, DA, tp, tapped).sum()
    assert two == pytest.approx(one, rel=1e-10)


# ---------------------------------------------------------------- CLI

CASE = """
format_version = 1
[conditions]
temperature_min = "-20 degC"
temperature_max = "90 degC"

[[screws]]
name = "cover"
thread = "M6"
property_class = "8.8"
head = "socket"
layers = [{thickness = "8 mm", material = "EN AW-6082-T6"}]
engagement = "12 mm"
housing_material = "EN AC-46000"
count = 6
bolt_circle = "80 mm"
axial_force = "3 kN"
mu_thread = [0.10, 0.16]
"""

JSON_KEYS = {"name", "thread", "stress_area_mm2", "screw_stiffness_N_per_mm", "clamp_stiffness_N_per_mm",
             "load_factor", "preload_permissible_N", "preload_assembly_min_N", "preload_assembly_max_N",
             "tightening_torque_Nm", "embedding_loss_N", "residual_clamp_min_N", "screw_stress_max_MPa",
             "yield_safety", "surface_pressure_MPa", "engagement_min_mm", "fatigue_safety", "checks", "ok"}


def test_cli_json_and_exit_codes(cli, tmp_path):
    p = tmp_path / "case.toml"
    p.write_text(CASE)
    code, out, err = cli("screws", str(p), "--json")
    assert code == 0, err
    data = json.loads(out)
    assert JSON_KEYS <= set(data["joints"][0])
    assert data["ok"] is True and data["caution"] == CAUTION
    # the [conditions] temperatures reached the joint
    assert data["joints"][0]["thermal_change_cold_N"] < 0
    code, out, _ = cli("screws", str(p))
    assert code == 0 and CAUTION in out and "tightening torque" in out
    p.write_text(CASE.replace('"12 mm"', '"2 mm"'))
    assert cli("screws", str(p))[0] == 1
    p.write_text(CASE.replace('"M6"', '"M6x3"'))
    code, _, err = cli("screws", str(p))
    assert code == 2 and "did you mean" in err
    assert cli("screws", str(tmp_path / "missing.toml"))[0] == 2


def test_to_json_strict():
    r = evaluate(joint(axial_force="0 N"))
    d = json.loads(r.to_json())
    assert d["fatigue_safety"] is None and d["ok"] is True


def test_plot_joint_diagram():
    import matplotlib

    matplotlib.use("Agg")
    from matplotlib.figure import Figure

    from fitcheck.plots.screws import plot_joint_diagram

    fig = plot_joint_diagram(evaluate(joint()))
    assert isinstance(fig, Figure) and fig.axes[0].get_xlabel().startswith("elongation")


# ---------------------------------------------------------------- review fixes

def test_washer_moves_the_friction_diameter_to_the_washer_hole():
    # VDI 2230-1:2015, 5.5.1: DKm = (dw + Da)/2 with Da the inner diameter of the bearing face; with a
    # washer the head bears on the washer, whose hole ISO 7092 M6 is 6.4 mm  # from memory
    wide = evaluate(joint(hole="7.5 mm", washer=True))
    plain = evaluate(joint(hole="7.5 mm"))
    mu = 0.10
    t = (0.16 * 1.0 + 0.58 * 5.350 * mu)
    assert wide.tightening_torque / wide.F_M_zul == pytest.approx(t + mu * (9.38 + 7.5) / 4, rel=2e-3)
    assert plain.tightening_torque / plain.F_M_zul == pytest.approx(t + mu * (9.38 + 7.5) / 4, rel=2e-3)
    narrow = evaluate(joint(hole="6.2 mm", washer=True))
    assert narrow.tightening_torque / narrow.F_M_zul == pytest.approx(t + mu * (9.38 + 6.4) / 4, rel=2e-3)


def test_rolled_after_heat_treatment_uses_the_largest_mean_force():
    # VDI 2230-1:2015, R9: σASG = (2 − FSm/F0.2min)·σASV; the safe side is the largest preload in
    # service FM,zul − FZ; never below σASV (rolled before heat treatment)
    r = evaluate(joint(rolled_after_heat_treatment=True))
    F_Sm = r.F_M_zul - r.F_Z + 0.5 * r.load_factor * r.F_A
    sigma_asv = 0.85 * (150 / 6 + 45)
    assert r.sigma_AS == pytest.approx(max(sigma_asv, (2 - F_Sm / (r.As * 640.0)) * sigma_asv), rel=1e-9)
    assert r.sigma_AS >= sigma_asv


def test_warnings_for_methods_outside_the_tables():
    r = evaluate(joint())
    assert any("Table 5" in w for w in r.warnings)          # aluminium parts settle more than steel
    steel = evaluate(joint(layers=[{"thickness": "8 mm", "material": "C45E"}], housing_material="EN-GJL-250"))
    assert not any("Table 5" in w for w in steel.warnings)
    y = evaluate(joint(tightening="yield_controlled"))
    assert y.alpha_A_method == 1.4 and any("yield- or angle-controlled" in w for w in y.warnings)
    # the friction range μ 0.10 … 0.16 alone spreads the preload of one torque by more than 1.4
    assert y.alpha_A == pytest.approx(y.alpha_A_friction) and y.alpha_A_friction > 1.4


def test_cli_text_states_its_basis(cli, tmp_path):
    p = tmp_path / "case.toml"
    p.write_text(CASE)
    code, out, err = cli("screws", str(p))
    assert code == 0
    # the designer sees the set point, αA and the friction range it rests on, the check notes and
    # the method warnings once (in the text, not again on stderr)
    assert "tightening torque MA (set point)" in out and "tightening factor αA" in out
    assert "μG 0.1…0.16" in out and "service -20…90 °C" in out
    assert "surface pressure under head: on EN AW-6082-T6" in out
    assert "warning: embedding amounts" in out and "MethodRangeWarning" not in err


@settings(max_examples=40, deadline=None)
@given(dT=st.floats(1.0, 150.0), aP=st.floats(12e-6, 30e-6), lK=st.floats(2.0, 60.0))
def test_thermal_change_sign_and_linearity(dT, aP, lK):
    # VDI 2230-1:2015, 5.4.2.3: a part that expands more than the steel screw (αP > αS) raises the
    # preload when warm and lowers it when cold, in proportion to ΔT
    warm = core.thermal_preload_change(aP * lK, 11.5e-6, lK, dT, 5e-6, 1e-6)
    cold = core.thermal_preload_change(aP * lK, 11.5e-6, lK, -dT, 5e-6, 1e-6)
    assert warm > 0 > cold
    assert cold == pytest.approx(-warm, rel=1e-12)
    assert core.thermal_preload_change(aP * lK, 11.5e-6, lK, 2 * dT, 5e-6, 1e-6) == pytest.approx(2 * warm)
