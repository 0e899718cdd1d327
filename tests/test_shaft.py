"""The shaft at a seat (fitcheck.shaft): loads, mesh forces, hooks in press fits and bearing seats."""

from __future__ import annotations

import json
import math
import warnings

import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

from fitcheck import bearings, case, materials, pressfit, shaft
from fitcheck.errors import InputError, InputErrors, MethodRangeWarning

GEAR = {"name": "g", "fit": "25 H7/s6", "length": "20 mm", "module": "2 mm", "teeth": 40,
        "shaft_material": "C45E", "hub_material": "C45E", "torque": "60 N*m"}


def test_mesh_forces_helical_gear_on_two_supports_by_hand():
    # Shigley, 10th ed., eqs. (13-39), (13-40): helical gear m_n = 3 mm, z = 30, α_n = 20°, β = 15°,
    # T = 150 N·m; a = 40 mm, b = 80 mm. Worked by hand (pocket calculator):
    # d = 3·30/cos 15° = 90/0.965926 = 93.175 mm; F_t = 2·150 000/93.175 = 3219.8 N
    # F_r = 3219.8·tan 20°/cos 15° = 3219.8·0.363970/0.965926 = 1213.3 N; F_a = 3219.8·tan 15° = 862.7 N
    # M_a = 862.7·46.59 = 40 191 N·mm; ab/L = 3200/120 = 26.667 mm
    # M_r = 1213.3·26.667 + 40 191·80/120 = 32 355 + 26 794 = 59 149 N·mm; M_t = 3219.8·26.667 = 85 861 N·mm
    # M = √(59 149² + 85 861²) = 104 263 N·mm
    ft, fr, fa, d = shaft.mesh_forces(150e3, 3.0, 30, math.radians(20), math.radians(15))
    assert float(d) == pytest.approx(93.175, abs=0.001)
    assert float(ft) == pytest.approx(3219.8, abs=0.1)
    assert float(fr) == pytest.approx(1213.3, abs=0.1)
    assert float(fa) == pytest.approx(862.7, abs=0.1)
    M = shaft.seat_moment(ft, fr, fa, d, a=40.0, b=80.0)
    assert float(M) == pytest.approx(104_263, rel=2e-4)
    # overhung: lever 10 mm → √((1213.3·10 + 40 191)² + (3219.8·10)²) = √(52 324² + 32 198²) = 61 437
    assert float(shaft.seat_moment(ft, fr, fa, d, overhang=10.0)) == pytest.approx(61_437, rel=2e-4)


def test_spur_gear_symmetric_supports_matches_simple_beam():
    # spur gear midway between bearings: M = F·L/4 with F = F_t/cos α (Shigley, Table A-9, case 1)
    ft, fr, fa, d = shaft.mesh_forces(50e3, 2.0, 25, math.radians(20), 0.0)
    M = shaft.seat_moment(ft, fr, fa, d, a=30.0, b=30.0)
    assert float(M) == pytest.approx(float(ft) / math.cos(math.radians(20)) * 60.0 / 4.0, rel=1e-12)


def test_pressfit_gains_shaft_keys_checks_and_json():
    inp = pressfit.PressFitInput.from_mapping({**GEAR, "torque_type": "pulsating",
                                               "bearing_distance_a": "30 mm", "bearing_distance_b": "50 mm",
                                               "helix_angle": "12 deg"})
    r = pressfit.evaluate(inp)
    names = [c.name for c in r.checks]
    assert "shaft fatigue at the hub edge" in names and "shaft yield at the hub edge" in names
    j = r.to_json()
    for k in ("shaft_fatigue_safety", "shaft_static_safety", "notch_factor_bending", "notch_factor_torsion"):
        assert isinstance(j[k], float) and j[k] > 0
    json.dumps(j, allow_nan=False)
    assert r.shaft.load_source.startswith("gear mesh, two supports")
    assert r.shaft.mesh_axial > 0 and r.shaft.axial_force == pytest.approx(r.shaft.mesh_axial)
    assert any("hub flush with the shaft step" in n for n in r.notes)  # information, not a warning
    assert not any("hub flush with the shaft step" in w for w in r.warnings)
    assert pressfit.PressFitInput.from_mapping(inp.to_mapping()) == inp


def test_pressfit_shaft_check_fails_when_overloaded():
    r = pressfit.evaluate(pressfit.PressFitInput.from_mapping({**GEAR, "bending_moment": "400 N*m"}))
    fat = next(c for c in r.checks if c.name == "shaft fatigue at the hub edge")
    assert not fat.passed and not r.ok


def test_bearing_seat_gains_shaft_checks_and_round_trips():
    inp = bearings.BearingSeatInput.from_mapping({"designation": "6205", "shaft": "k5", "housing": "H7",
                                                  "bending_moment": "15 N*m", "torque": "40 N*m",
                                                  "torque_type": "static", "application_factor": 1.25})
    r = bearings.evaluate(inp)
    j = json.loads(r.to_json())
    assert j["shaft_fatigue_safety"] > 0 and j["notch_factor_bending"] > 1
    assert j["shaft_seat"]["torque"] == pytest.approx(1.25 * 40e3)
    assert bearings.BearingSeatInput.from_mapping(inp.to_mapping()) == inp
    assert {"shaft fatigue at the hub edge", "shaft yield at the hub edge"} <= {c.name for c in r.checks}


def test_bad_shaft_inputs_name_their_field():
    with pytest.raises((InputError, InputErrors), match="torque_type"):
        pressfit.PressFitInput.from_mapping({**GEAR, "torque_type": "pulsing"})
    with pytest.raises((InputError, InputErrors), match="bearing_distance_b"):
        pressfit.PressFitInput.from_mapping({**GEAR, "bearing_distance_a": "20 mm"})
    with pytest.raises((InputError, InputErrors), match="bending_moment"):
        pressfit.PressFitInput.from_mapping({**GEAR, "bending_moment": "5 N*m", "overhang": "8 mm"})
    with pytest.raises((InputError, InputErrors), match="application_factor"):
        bearings.BearingSeatInput.from_mapping({"designation": "6204", "application_factor": 0.5})
    with pytest.raises((InputError, InputErrors), match="module"):
        pressfit.PressFitInput.from_mapping({**{k: v for k, v in GEAR.items() if k not in ("module", "teeth")},
                                             "hub_outer_diameter": "60 mm", "overhang": "8 mm"})


def test_non_steel_shaft_is_not_passed_silently():
    m = {**GEAR, "shaft_material": "EN AW-7075-T6", "bending_moment": "1 N*m"}
    with warnings.catch_warnings():
        warnings.simplefilter("ignore", MethodRangeWarning)
        r = pressfit.evaluate(pressfit.PressFitInput.from_mapping(m))
    fat = next(c for c in r.checks if c.name == "shaft fatigue at the hub edge")
    assert not fat.passed and "steel" in fat.note


def _si_inch(d_mm, L_mm, T_Nmm, M_Nmm, F_N, a_mm, b_mm):
    lbf = 4.4482216152605  # NIST SP 811: 1 lbf = 4.448 221 615 260 5 N
    common = {"name": "x", "interference_min": "20 um", "interference_max": "40 um", "module": "2 mm",
              "teeth": 60, "shaft_material": "42CrMo4", "hub_material": "C45E", "torque_type": "pulsating"}
    si = {**common, "diameter": f"{d_mm!r} mm", "length": f"{L_mm!r} mm", "torque": f"{T_Nmm / 1000!r} N*m",
          "axial_force": f"{F_N!r} N", "bearing_distance_a": f"{a_mm!r} mm", "bearing_distance_b": f"{b_mm!r} mm"}
    inch = {**common, "diameter": f"{d_mm / 25.4!r} in", "length": f"{L_mm / 25.4!r} in",
            "torque": f"{T_Nmm / lbf / 25.4!r} lbf*in", "axial_force": f"{F_N / lbf!r} lbf",
            "bearing_distance_a": f"{a_mm / 25.4!r} in", "bearing_distance_b": f"{b_mm / 25.4!r} in"}
    return si, inch


@settings(max_examples=25, deadline=None)
@given(d=st.floats(15.0, 60.0), L=st.floats(10.0, 40.0), T=st.floats(1e3, 3e5), F=st.floats(0.0, 5e3),
       a=st.floats(10.0, 100.0), b=st.floats(10.0, 100.0))
def test_inch_and_si_inputs_give_the_same_safeties(d, L, T, F, a, b):
    si, inch = _si_inch(d, L, T, 0.0, F, a, b)
    with warnings.catch_warnings():
        warnings.simplefilter("ignore", MethodRangeWarning)
        r1 = pressfit.evaluate(pressfit.PressFitInput.from_mapping(si)).shaft
        r2 = pressfit.evaluate(pressfit.PressFitInput.from_mapping(inch)).shaft
    assert r2.fatigue_safety == pytest.approx(r1.fatigue_safety, rel=1e-9)
    assert r2.static_safety == pytest.approx(r1.static_safety, rel=1e-9)
    assert r2.notch_factor_bending == pytest.approx(r1.notch_factor_bending, rel=1e-9)


def test_hand_calculation_demo_gear_seat():
    """Demo "gear-on-shaft": 16 H7/s6, C45E shaft, spur gear m = 1 mm, z = 42, T = 3.2 N·m pulsating,
    F = 60 N, bearings 12 mm and 40 mm from the gear, Rz 2.5 µm. Each step from DIN 743:2012 (from memory)."""
    res = case.evaluate(case.demo_case())
    jr = next(j for j in res.joints if j.name == "gear-on-shaft")
    sh = jr.result.shaft
    # loads: d_w = 42 mm, F_t = 2·3200/42 = 152.38 N, F_r = F_t·tan 20° = 55.46 N, F_a = 0
    dw = 1.0 * 42
    Ft = 2 * 3200 / dw
    Fr = Ft * math.tan(math.radians(20))
    ab_L = 12 * 40 / 52                                        # 9.2308 mm
    M = math.hypot(Fr * ab_L, Ft * ab_L)                       # 1496.9 N·mm
    assert sh.bending_moment == pytest.approx(M, rel=1e-12) and round(M, 1) == 1496.9
    # stresses: W_b = π·16³/32 = 402.12 mm³
    Wb = math.pi * 16**3 / 32
    sba = M / Wb                                               # 3.722 MPa
    tta = ttm = 3200 / 2 / (2 * Wb)                            # pulsating: τ_a = τ_m = 1.989 MPa
    szm = 60 / (math.pi * 16**2 / 4)                           # 0.2984 MPa
    # C45E (QT) at d = d_B = 16 mm: K1 = 1, σ_B(d) = 700 MPa
    bs40 = 2.7 * 0.7**0.43                                     # 2.316
    bt40 = 0.65 * bs40

    def K3(d, a):
        return 1 - 0.2 * math.log10(a) * math.log10(d / 7.5) / math.log10(20)

    bs = bs40 * K3(40, bs40) / K3(16, bs40)
    bt = bt40 * K3(40, bt40) / K3(16, bt40)
    K2 = 1 - 0.2 * math.log10(16 / 7.5) / math.log10(20)     # 0.9495
    KFs = 1 - 0.22 * math.log10(2.5) * (math.log10(700 / 20) - 1)
    KFt = 0.575 * KFs + 0.425
    Ks = bs / K2 + 1 / KFs - 1
    Kt = bt / K2 + 1 / KFt - 1
    sbWK, ttWK = 350 / Ks, 210 / Kt                            # DIN 743-3 table values of C45E
    psib, psit = sbWK / (1400 - sbWK), ttWK / (1400 - ttWK)
    smv = math.sqrt(szm**2 + 3 * ttm**2)
    tmv = smv / math.sqrt(3)
    sbFK, ttFK = 1.2 * 490, 1.2 * 490 / math.sqrt(3)
    term_b = max((sba + psib * smv) / sbWK, (sba + smv) / sbFK)
    term_t = max((tta + psit * tmv) / ttWK, (tta + tmv) / ttFK)
    S = 1 / math.hypot(term_b, term_t)
    S_static = 1 / math.hypot(szm / 490 + sba / sbFK, 2 * tta / ttFK)
    assert sh.notch_factor_bending == pytest.approx(bs, rel=1e-12)
    assert sh.fatigue_safety == pytest.approx(S, rel=1e-12)
    assert sh.static_safety == pytest.approx(S_static, rel=1e-12)
    # pocket-calculator figures: βσ(40) = 2.316, K3(40) = 0.9592, K3(16) = 0.9816, βσ = 2.263, S ≈ 30, S_static ≈ 73
    assert round(bs, 3) == 2.263 and round(S) == 30 and round(S_static) == 73


def test_materials_carry_din743_strengths():
    m = materials.get("C45E")
    # DIN 743-3:2012 ratios on σ_B = 700 MPa — from memory
    assert (m.sigma_zdW, m.sigma_bW, m.tau_tW, m.dB, m.din743_group) == (280.0, 350.0, 210.0, 16.0, "QT")
    mod = materials.from_mapping({"base": "C45E", "Rm": "800 MPa"})
    assert math.isnan(mod.sigma_bW)  # a changed Rm drops the tabulated fatigue strengths


def test_failing_shaft_checks_get_their_own_verdict_sentence():
    # the verdict of a failing shaft check names the check and the safeties and advises on the shaft,
    # not on the press or the seat's axial location (which do not change the shaft's fatigue safety)
    r = pressfit.evaluate(pressfit.PressFitInput.from_mapping({**GEAR, "bending_moment": "400 N*m"}))
    fat = next(c for c in r.checks if c.name == "shaft fatigue at the hub edge")
    assert not fat.passed
    assert f"Shaft fatigue at the hub edge: safety {fat.value:.4g} < 1.2 required" in r.headline
    assert "press" not in r.headline.split("Shaft fatigue")[1] and "exceeds" not in r.headline
    b = bearings.evaluate(bearings.BearingSeatInput.from_mapping(
        {"designation": "6204", "shaft": "k5", "housing": "H7", "bending_moment": "150 N*m"}))
    bfat = next(c for c in b.checks if c.name == "shaft fatigue at the hub edge")
    assert not bfat.passed and "Shaft fatigue at the hub edge: safety" in b.headline
    assert "retaining ring" not in b.headline
    y = bearings.evaluate(bearings.BearingSeatInput.from_mapping(
        {"designation": "6204", "shaft": "k5", "housing": "H7", "bending_moment": "600 N*m",
         "torque_type": "static"}))
    assert any(c.name == "shaft yield at the hub edge" and not c.passed for c in y.checks)
    assert "Shaft yield at the hub edge under the largest loads" in y.headline


def test_non_steel_shaft_verdict_says_not_checked():
    m = {**GEAR, "shaft_material": "EN AW-7075-T6", "bending_moment": "1 N*m"}
    with warnings.catch_warnings():
        warnings.simplefilter("ignore", MethodRangeWarning)
        r = pressfit.evaluate(pressfit.PressFitInput.from_mapping(m))
    assert r.headline.count("not checked") == 1 and "fatigue and yield" in r.headline and "sigma_bW" in r.headline


_GEAR_TOML = """format_version = 1
[[pressfit]]
name = "g"
fit = "25 H7/s6"
length = "20 mm"
module = "2 mm"
teeth = 40
shaft_material = "C45E"
hub_material = "C45E"
torque = "60 N*m"
"""


@pytest.mark.parametrize("line, field, shown, allowed", [
    ('module = "-2 mm"', "pressfit[g].module", "'-2 mm'", "a length > 0 mm"),
    ('helix_angle = "95 deg"', "pressfit[g].helix_angle", "'95 deg'", "an angle >= 0 deg and <= 45 deg"),
    ('pressure_angle = "50 deg"', "pressfit[g].pressure_angle", "'50 deg'", "an angle >= 10 deg and <= 35 deg"),
    ('design = "plastic"', "pressfit[g].design", "'plastic'", "'elastic' or 'elastic-plastic'"),
    ('bending_moment = "abc"', "pressfit[g].bending_moment", "'abc'", "a torque, e.g. '30 N*m'"),
    ('bending_moment = "5 m"', "pressfit[g].bending_moment", "'5 m'", "a torque, e.g. '30 N*m'"),
    ('application_factor = "abc"', "pressfit[g].application_factor", "'abc'", "a number, e.g. '1.25'"),
    ('torque_type = "pulsing"', "pressfit[g].torque_type", "'pulsing'", "'static', 'pulsating' or 'alternating'"),
    ('mean_stress_case = 3', "pressfit[g].mean_stress_case", "3", "1 (constant mean stress) or 2"),
    ('fatigue_safety = 0.5', "pressfit[g].fatigue_safety", "0.5", "a number >= 1 and <= 20"),
])
def test_bad_shaft_and_gear_keys_exit_2_naming_field_value_and_what_is_allowed(cli, tmp_path, line, field,
                                                                                shown, allowed):
    f = tmp_path / "bad.toml"
    key = line.split(" = ")[0]
    lines = [ln for ln in _GEAR_TOML.splitlines() if not ln.startswith(key + " = ")] + [line]
    f.write_text("\n".join(lines) + "\n", encoding="utf-8")
    for cmd in ("pressfit", "check"):
        code, out, err = cli(cmd, str(f))
        assert code == 2 and "Traceback" not in err
        msg = next(ln for ln in err.splitlines() if field in ln)
        assert f"{field}: got {shown}; allowed: {allowed}" in msg
        assert sum(field + ":" in ln for ln in err.splitlines()) == 1  # each problem listed once


def test_bad_shaft_loads_on_the_bearing_command_line(cli):
    code, out, err = cli("bearing", "6204", "--bending-moment", "abc")
    assert code == 2 and "bending_moment: got 'abc'; allowed: a torque" in err and "Traceback" not in err
    code, out, err = cli("bearing", "6204", "--torque-type", "pulsing")
    assert code == 2 and "torque_type" in err and "did you mean 'pulsating'" in err


def test_verdict_sentence_never_rounds_a_failing_safety_up_to_its_limit():
    c = shaft.Check(shaft.NAME_FATIGUE, 1.198, 1.2, ">=", "", shaft.REF_FATIGUE, "")
    assert not c.passed and "safety 1.198 < 1.2 required" in shaft.headline_sentence(c)


def test_bearing_command_line_sets_the_shaft_check_and_prints_its_loads(cli):
    # K_A = 1.5 on M = 40 N·m: the shaft check uses 60 N·m; the required fatigue safety is the one given
    code, out, err = cli("bearing", "6204", "--shaft", "k5", "--housing", "H7", "--bending-moment", "40 N*m",
                         "--application-factor", "1.5", "--fatigue-safety", "2.5", "--json")
    j = json.loads(out)
    assert j["shaft_seat"]["bending_moment"] == pytest.approx(60_000.0)
    fat = next(c for c in j["checks"] if c["name"] == "shaft fatigue at the hub edge")
    assert fat["limit"] == 2.5 and fat["passed"] == (j["shaft_fatigue_safety"] >= 2.5)
    code, out, err = cli("bearing", "6204", "--static-safety", "0.8")
    assert code == 2 and "static_safety: got '0.8'; allowed: a number >= 1" in err


def test_loaded_gear_seat_without_bending_data_is_warned_about():
    # a meshing gear always bends its seat: a gear hub (module, teeth) with a torque but neither a
    # bending moment nor the bearing distances gets M = 0 in the shaft check, and a warning says so
    with warnings.catch_warnings(record=True) as caught:
        warnings.simplefilter("always")
        r = pressfit.evaluate(pressfit.PressFitInput.from_mapping(GEAR))
    assert r.shaft.bending_moment == 0.0 and r.shaft.load_source == "none given"
    msg = "without bending_moment, bearing distances or overhang"
    assert any(msg in w for w in r.warnings) and any(msg in str(w.message) for w in caught)
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        for extra in ({"bending_moment": "5 N*m"}, {"bearing_distance_a": "20 mm", "bearing_distance_b": "30 mm"}):
            r2 = pressfit.evaluate(pressfit.PressFitInput.from_mapping({**GEAR, **extra}))
            assert not any(msg in w for w in r2.warnings)
