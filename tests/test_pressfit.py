"""Press-fit engine: limiting cases, properties, inputs, checks, CLI and plots."""

import json
import math
import warnings

import numpy as np
import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

from fitcheck import CAUTION, fits
from fitcheck.core import lame
from fitcheck.core.pressfit import OUTPUT_KEYS
from fitcheck.core.pressfit import evaluate as core_evaluate
from fitcheck.errors import InputError, InputErrors, MethodRangeWarning
from fitcheck.pressfit import KEYS, METHOD_NOTES, PressFitInput, default_friction, evaluate

E = 210000.0

BASE = {
    "name": "gear", "fit": "20 H7/s6", "length": "16 mm", "hub_outer_diameter": "40 mm",
    "shaft_material": "C45E", "hub_material": "C45E", "torque": "10 N*m",
}


def _inp(**over):
    m = {**BASE, **over}
    for k in [k for k, v in m.items() if v is None]:
        del m[k]
    return PressFitInput.from_mapping(m)


def _eval(**over):
    with warnings.catch_warnings():
        warnings.simplefilter("ignore", MethodRangeWarning)
        return evaluate(_inp(**over))


# --------------------------------------------------------------------------- limiting cases

def test_same_material_solid_shaft_closed_form():
    # Shigley, 10th ed., eq. (3-57) with r_i = 0: p = E·δ/(2d)·(1 − d²/D²)
    d, D, delta = 30.0, 50.0, 0.03
    p = lame.contact_pressure(delta, d, 0.0, D, E, 0.3, E, 0.3)
    assert p == pytest.approx(E * delta / (2 * d) * (1 - d**2 / D**2), rel=1e-13)


def test_infinite_hub_limit():
    # Do -> inf: hub compliance (1 + nu)/E (Shigley eq. (3-56) with r_o -> inf)
    d, delta = 20.0, 0.02
    p_inf = lame.contact_pressure(delta, d, 0.0, np.inf, E, 0.3, E, 0.3)
    assert p_inf == pytest.approx(E * delta / (2 * d), rel=1e-13)   # same material: E·δ/(2d)
    p_big = lame.contact_pressure(delta, d, 0.0, 1e5, E, 0.3, E, 0.3)
    assert p_big == pytest.approx(p_inf, rel=1e-7)
    sr, st_ = lame.hub_stresses(p_inf, d, np.inf, 2 * d)
    assert (sr, st_) == pytest.approx((-p_inf / 16, p_inf / 16), rel=1e-13)  # (a/r)² = 1/16
    assert lame.hub_outer_diameter_change(p_inf, d, np.inf, E) == 0.0


def test_clearance_gives_zero_pressure_and_failed_slip():
    r = _eval(fit="20 H7/g6")  # ISO 286: clearance fit
    assert r.pressure_min == 0.0 and r.pressure_max == 0.0
    assert r.torque_capacity_min == 0.0 and r.axial_capacity_min == 0.0
    slip = next(c for c in r.checks if c.name == "slip at loosest fit")
    assert not slip.passed and slip.value == 0.0
    # no contact pressure even at standstill: the loosening-speed check fails too, it does not
    # pass as "0 rpm >= 0 rpm"
    speed = next(c for c in r.checks if c.name == "loosening speed")
    assert not speed.passed and "no contact pressure" in speed.note
    assert r.loosening_speed == 0.0
    assert not r.ok


def test_explicit_clearance_never_negative_capacity():
    r = _eval(fit=None, interference_min="-10 um", interference_max="-2 um", diameter="20 mm")
    assert r.torque_capacity_min == 0.0 and r.slip_safety_min == 0.0 and not r.ok


def test_fit_path_equals_explicit_interference():
    f = fits.fit("20 H7/s6")  # ISO 286-2:2010: H7 0/+21, s6 +35/+48 um over 18 up to 24 mm
    assert (f.interference_min_um, f.interference_max_um) == (14.0, 48.0)
    a = _eval()
    b = _eval(fit=None, interference_min="14 um", interference_max="48 um", diameter="20 mm")
    assert a.to_json()["pressure_min_MPa"] == b.to_json()["pressure_min_MPa"]
    assert a.hub_stress_max == b.hub_stress_max


def test_thermal_loosening_of_aluminium_hub():
    # linear expansion: d·(α_s − α_h)·ΔT, steel in EN AW-6082 both at 80 °C
    r_room = _eval(hub_material="EN AW-6082-T6")
    r_hot = _eval(hub_material="EN AW-6082-T6", temperature_shaft="80 degC", temperature_hub="80 degC")
    d_loss = r_room.loosest_operating.effective_interference - r_hot.loosest_operating.effective_interference
    assert d_loss == pytest.approx(20.0 * (23.4e-6 - 11.5e-6) * 60.0, rel=1e-9)
    assert r_hot.pressure_min < r_room.pressure_min


def test_loosening_speed_zeroes_pressure():
    r = _eval(speed="3000 rpm")
    w = r.loosening_speed
    inp = _inp(speed=f"{w * 60 / (2 * math.pi) * (1 - 1e-9)!r} rpm")
    assert evaluate(inp).loosest_operating.pressure == pytest.approx(0.0, abs=1e-5)
    inp = _inp(speed=f"{w * 60 / (2 * math.pi) * 1.01!r} rpm")
    assert evaluate(inp).loosest_operating.pressure == 0.0


def test_shrink_temperature_formula_and_heating_check():
    # hub temperature T0 + (δmax + s)/(α_h·d), joining clearance 0.001·d (common practice)
    r = _eval(assembly="shrink", hub_material="16MnCr5")
    expected = 20.0 + (0.048 + 0.02) / (11.5e-6 * 20.0)
    assert r.shrink_temperature_C == pytest.approx(expected, rel=1e-12)
    heat = next(c for c in r.checks if c.name == "hub heating temperature")
    assert heat.limit == 160.0 and not heat.passed  # case-hardened hub: tempering limit
    cooled = _eval(assembly="shrink", temperature_shaft_cooled="-78 degC")
    assert cooled.shrink_temperature_C == pytest.approx(
        20.0 + (0.068 - 11.5e-6 * 20.0 * 98.0) / (11.5e-6 * 20.0), rel=1e-12)


def test_press_force_formula_and_limit():
    r = _eval(press_force_limit="5 kN", mu_press=0.1)
    expected = r.tightest_assembly.pressure * math.pi * 20.0 * 16.0 * 0.1
    assert r.press_force_max == pytest.approx(expected, rel=1e-12)
    c = next(c for c in r.checks if c.name == "press-in force")
    assert c.passed == (expected <= 5000.0)


def test_combined_torque_and_axial_demand():
    # vector sum of circumferential (2T/d) and axial demand (DIN 7190-1:2017)
    r = _eval(torque="10 N*m", axial_force="800 N", mu_slip=0.1)
    cap = r.axial_capacity_min
    assert r.slip_safety_min == pytest.approx(cap / math.hypot(2 * 10000.0 / 20.0, 800.0), rel=1e-12)


def test_hub_yield_warns_and_fails():
    with pytest.warns(MethodRangeWarning, match="DIN 7190-1"):
        r = evaluate(_inp(fit="20 H7/u6", hub_outer_diameter="24 mm", hub_material="EN AC-46000"))
    assert not next(c for c in r.checks if c.name == "hub yield at tightest fit").passed


def test_brittle_hub_uses_principal_stress_and_rm():
    r = _eval(hub_material="EN-GJL-250")
    c = next(c for c in r.checks if c.name == "hub yield at tightest fit")
    assert c.limit == 2.0  # fracture_safety default (common practice)
    sig_t = r.tightest_assembly.hub_sigma_t_bore
    assert r.hub_yield_safety == pytest.approx(250.0 / sig_t, rel=1e-12)


def test_hollow_shaft_bore_governs():
    r = _eval(shaft_bore="12 mm")
    p = r.tightest_assembly.pressure
    # Shigley eq. (3-50): at the bore σr = 0, σt = −2p/(1 − QI²)
    assert r.shaft_stress_max == pytest.approx(2 * p / (1 - 0.6**2), rel=1e-12)


def test_module_and_teeth_root_diameter_rule():
    a = _eval(hub_outer_diameter=None, module="1.5 mm", teeth=40)
    assert a.hub_outer_diameter == pytest.approx(1.5 * 37.5)
    b = _eval(hub_outer_diameter="56.25 mm")
    assert a.pressure_max == pytest.approx(b.pressure_max, rel=1e-14)


def test_friction_defaults_from_table():
    assert default_friction("steel", "steel", "press")[:2] == (0.08, 0.10)
    r = _eval()
    assert (r.mu_slip, r.mu_press) == (0.08, 0.10)
    with pytest.raises(InputError, match="mu_slip"):
        evaluate(_inp(hub_material={"name": "x", "E": "100 GPa", "nu": 0.3, "alpha": "12e-6 1/K",
                                    "Rp02": "300 MPa", "Rm": "400 MPa", "density": "7000 kg/m**3"}))


# --------------------------------------------------------------------------- properties

@settings(max_examples=60, deadline=None)
@given(k=st.floats(0.1, 10.0), delta=st.floats(1e-3, 0.05), d=st.floats(5.0, 200.0),
       qa=st.floats(0.2, 0.9), qi=st.floats(0.0, 0.8))
def test_pressure_linear_in_interference(k, delta, d, qa, qi):
    p1 = lame.contact_pressure(delta, d, qi * d, d / qa, E, 0.3, 70000.0, 0.33)
    p2 = lame.contact_pressure(k * delta, d, qi * d, d / qa, E, 0.3, 70000.0, 0.33)
    assert p2 == pytest.approx(k * p1, rel=1e-12)


@settings(max_examples=60, deadline=None)
@given(mu=st.floats(0.02, 0.5), k=st.floats(0.2, 2.0))
def test_capacity_proportional_to_friction(mu, k):
    kw = dict(interference_min=0.02, interference_max=0.05, d=25.0, L=20.0, Do=50.0, Es=E, nus=0.3,
              Rps=500.0, Eh=E, nuh=0.3, Rph=500.0)
    a = core_evaluate(mu_slip=mu, **kw)
    b = core_evaluate(mu_slip=k * mu, **kw)
    assert float(b["torque_capacity_min"]) == pytest.approx(k * float(a["torque_capacity_min"]), rel=1e-12)
    assert float(b["axial_capacity_min"]) == pytest.approx(k * float(a["axial_capacity_min"]), rel=1e-12)


@settings(max_examples=60, deadline=None)
@given(d=st.floats(5.0, 100.0), q1=st.floats(1.05, 5.0), q2=st.floats(1.05, 5.0), qi=st.floats(0.0, 0.8))
def test_pressure_monotone_in_hub_diameter(d, q1, q2, qi):
    lo, hi = sorted((q1, q2))
    p_lo = lame.contact_pressure(0.02, d, qi * d, lo * d, E, 0.3, E, 0.3)
    p_hi = lame.contact_pressure(0.02, d, qi * d, hi * d, E, 0.3, E, 0.3)
    assert p_hi >= p_lo * (1 - 1e-14)
    assert p_hi <= lame.contact_pressure(0.02, d, qi * d, np.inf, E, 0.3, E, 0.3) * (1 + 1e-14)


@settings(max_examples=25, deadline=None)
@given(d=st.floats(8.0, 80.0), L=st.floats(5.0, 60.0), qa=st.floats(0.3, 0.8),
       i1=st.floats(5.0, 40.0), di=st.floats(1.0, 40.0))
def test_inch_input_equals_mm_input(d, L, qa, i1, di):
    i2 = i1 + di
    mm = {"interference_min": f"{i1 * d / 20!r} um", "interference_max": f"{i2 * d / 20!r} um",
          "diameter": f"{d!r} mm", "length": f"{L!r} mm", "hub_outer_diameter": f"{d / qa!r} mm"}
    inch = {"interference_min": f"{i1 * d / 20 / 25400!r} in", "interference_max": f"{i2 * d / 20 / 25400!r} in",
            "diameter": f"{d / 25.4!r} in", "length": f"{L / 25.4!r} in",
            "hub_outer_diameter": f"{d / qa / 25.4!r} in"}
    base = {"shaft_material": "AISI 1045", "hub_material": "AISI 4140", "torque": "10 N*m"}
    with warnings.catch_warnings():
        warnings.simplefilter("ignore", MethodRangeWarning)
        a = evaluate(PressFitInput.from_mapping({**base, **mm})).to_json()
        b = evaluate(PressFitInput.from_mapping({**base, **inch, "torque": "88.5074576 lbf*in"})).to_json()
    for key in ("pressure_min_MPa", "pressure_max_MPa", "hub_stress_max_MPa", "press_force_max_N"):
        assert b[key] == pytest.approx(a[key], rel=1e-9)
    assert b["slip_safety_min"] == pytest.approx(a["slip_safety_min"], rel=1e-6)  # lbf·in rounded


# --------------------------------------------------------------------------- inputs

def test_round_trip_mapping():
    for over in ({}, {"assembly": "shrink", "speed": "6000 rpm", "temperature_hub": "70 degC",
                      "temperature_shaft_cooled": "-40 degC", "joining_clearance": "15 um",
                      "press_force_limit": "12 kN", "mu_slip": 0.12, "shaft_bore": "6 mm"},
                 {"fit": None, "interference_min": "12.3 um", "interference_max": "41 um",
                  "diameter": "20 mm", "hub_outer_diameter": None, "module": "1.25 mm", "teeth": 57,
                  "hub_material": {"base": "C45E", "Rp02": "520 MPa"}}):
        inp = _inp(**over)
        assert PressFitInput.from_mapping(inp.to_mapping()) == inp


def test_keys_documented_with_units():
    assert set(KEYS) >= {"name", "fit", "interference_min", "interference_max", "diameter", "length",
                         "shaft_bore", "hub_outer_diameter", "module", "teeth", "shaft_material",
                         "hub_material", "rz_shaft", "rz_hub", "smoothing_factor", "mu_slip", "mu_press",
                         "assembly", "torque", "axial_force", "slip_safety", "speed", "temperature_shaft",
                         "temperature_hub", "temperature_assembly", "joining_clearance", "yield_safety"}
    assert all(isinstance(v, str) and v for v in KEYS.values())
    assert all(len(n) == 2 and all(n) for n in METHOD_NOTES)
    assert set(_inp().to_mapping()) <= set(KEYS)


@pytest.mark.parametrize("over,field,match", [
    ({"hub_outer_diameter": "20 mm"}, "hub_outer_diameter", "larger than the joint diameter"),
    ({"hub_outer_diameter": "15 mm"}, "hub_outer_diameter", "larger than the joint diameter"),
    ({"length": "-3 mm"}, "length", ">= 0.1 mm"),
    ({"length": "1e30 mm"}, "length", "<= 10000 mm"),
    ({"teeth": 420000000000, "hub_outer_diameter": None, "module": "1 mm"}, "teeth", "6 … 10000"),
    ({"length": "2 kg"}, "length", "a length"),
    ({"hub_material": "C45"}, "hub_material", "did you mean 'C45E'"),
    ({"shaft_material": {"base": "C45E", "nu": 0.5}}, "nu", "< 0.5"),
    ({"assembly": "shrnk"}, "assembly", "did you mean 'shrink'"),
    ({"lenght": "16 mm"}, "lenght", "did you mean 'length'"),
    ({"shaft_bore": "25 mm"}, "shaft_bore", "smaller than the joint diameter"),
    ({"fit": "20 H7/q6"}, "fit", "ISO 286"),
    ({"interference_min": "10 um"}, "fit", "not both"),
    ({"fit": None, "interference_min": 18, "interference_max": "40 um", "diameter": "20 mm"},
     "interference_min", "unit"),
    ({"fit": None, "interference_min": "18 mm", "interference_max": "40 um", "diameter": "20 mm"},
     "interference_min", "2 %"),
    ({"fit": None, "interference_min": "40 um", "interference_max": "18 um", "diameter": "20 mm"},
     "interference_min", "<= interference_max"),
    ({"fit": None, "interference_min": "10 um", "interference_max": "20 um"}, "diameter", "diameter"),
    ({"module": "1.5 mm"}, "hub_outer_diameter", "not both"),
    ({"hub_outer_diameter": None, "module": "1 mm", "teeth": 12}, "teeth", "root diameter"),
    ({"slip_safety": 0.8}, "slip_safety", ">= 1"),
    ({"torque": "10 N"}, "torque", "a torque"),
    ({"speed": "-10 rpm"}, "speed", ">= 0"),
])
def test_bad_input_is_a_clear_input_error(over, field, match):
    with pytest.raises((InputError, InputErrors)) as ei:
        _inp(**over)
    errs = ei.value.errors if isinstance(ei.value, InputErrors) else [ei.value]
    hit = [e for e in errs if e.field.split(".")[-1] == field]
    assert hit, [e.message for e in errs]
    assert any(match in e.message for e in hit), [e.message for e in hit]
    assert all(e.field.startswith("pressfit") for e in errs)


def test_all_problems_collected():
    with pytest.raises(InputErrors) as ei:
        _inp(length="-1 mm", hub_material="Steal", torque="3 kg")
    assert len(ei.value.errors) == 3


def test_not_a_mapping():
    with pytest.raises(InputError, match="table"):
        PressFitInput.from_mapping("20 H7/s6")


# --------------------------------------------------------------------------- result

def test_json_keys_and_checks():
    j = _eval(speed="3000 rpm", assembly="shrink").to_json()
    for key in ("name", "pressure_min_MPa", "pressure_max_MPa", "torque_capacity_min_Nm",
                "axial_capacity_min_N", "slip_safety_min", "hub_stress_max_MPa", "shaft_stress_max_MPa",
                "hub_yield_safety", "shaft_yield_safety", "press_force_max_N", "shrink_temperature_C",
                "loosening_speed_rpm", "checks", "ok"):
        assert key in j
    names = {c["name"] for c in j["checks"]}
    assert names == {"slip at loosest fit", "hub yield at tightest fit", "shaft yield at tightest fit",
                     "loosening speed", "hub heating temperature", "shaft fatigue at the hub edge",
                     "shaft yield at the hub edge"}
    assert all(c["reference"] for c in j["checks"])
    json.dumps(j, allow_nan=True)


def test_core_returns_every_key_vectorised():
    n = 1000
    rng = np.random.default_rng(1)
    out = core_evaluate(interference_min=rng.uniform(-0.01, 0.05, n), d=20.0, L=16.0, Do=40.0, Es=E,
                        nus=0.3, Rps=490.0, Eh=E, nuh=0.3, Rph=490.0, mu_slip=0.1, torque=10000.0,
                        omega=500.0)
    assert set(out) == set(OUTPUT_KEYS)
    for k in OUTPUT_KEYS:
        assert np.shape(out[k]) == (n,), k
    assert np.all(out["torque_capacity_min"] >= 0.0)
    assert np.all(out["ok"] <= out["ok_slip"])


# --------------------------------------------------------------------------- CLI and plots

CASE = """
[conditions]
speed = "3000 rpm"
temperature_hub = "30 degC"

[[pressfit]]
name = "output gear"
fit = "20 H7/s6"
length = "16 mm"
module = "1.5 mm"
teeth = 40
shaft_material = "42CrMo4"
hub_material = "C45E"
torque = "12 N*m"
assembly = "shrink"
"""


def test_cli_text_and_json(cli, tmp_path):
    f = tmp_path / "case.toml"
    f.write_text(CASE)
    code, out, err = cli("pressfit", str(f))
    assert code == 0, err
    assert "slip at loosest fit" in out and CAUTION in out
    code, out, _ = cli("pressfit", str(f), "--json")
    data = json.loads(out)
    j = data["pressfits"][0]
    assert j["name"] == "output gear" and data["ok"] is True and data["caution"] == CAUTION
    assert math.isclose(j["loosening_speed_rpm"] > 0, True)
    # [conditions] supplied the hub temperature: same as writing it in the joint
    f2 = tmp_path / "b.toml"
    f2.write_text(CASE.replace('temperature_hub = "30 degC"\n', "").replace(
        'assembly = "shrink"', 'assembly = "shrink"\ntemperature_hub = "30 degC"'))
    _, out2, _ = cli("pressfit", str(f2), "--json")
    assert json.loads(out2)["pressfits"][0]["pressure_min_MPa"] == j["pressure_min_MPa"]


def test_cli_failed_check_and_bad_input(cli, tmp_path):
    f = tmp_path / "fail.toml"
    f.write_text(CASE.replace('"12 N*m"', '"500 N*m"'))
    assert cli("pressfit", str(f))[0] == 1
    f.write_text(CASE.replace('"C45E"', '"C45"'))
    code, out, err = cli("pressfit", str(f))
    assert code == 2 and "did you mean 'C45E'" in err and "Traceback" not in err
    f.write_text("[conditions]\nspeed = '1 rpm'\n")
    assert cli("pressfit", str(f))[0] == 2


def test_plots_return_figures():
    from matplotlib.figure import Figure

    from fitcheck.plots.pressfit import plot_capacity_band, plot_wall_stresses

    r = _eval(speed="8000 rpm", shaft_bore="8 mm")
    for fn in (plot_wall_stresses, plot_capacity_band):
        fig = fn(r)
        assert isinstance(fig, Figure) and fig.axes
    prof = r.wall_profile()
    # the drawn von Mises at the hub bore is the reported one at the governing condition
    assert prof["vm_hub"][0] == pytest.approx(r.hub_stress_max, rel=1e-9)
    t = r.torque_capacity_at(np.array([r.interference_min]))
    assert t[0] == pytest.approx(r.loosest_operating.torque_capacity, rel=1e-9)


def test_blocked_evaluation_equals_direct():
    from fitcheck.core import pressfit as core

    rng = np.random.default_rng(7)
    n = 2 * core.CHUNK + 123
    kw = dict(interference_min=rng.uniform(-0.01, 0.04, n), interference_max=0.05,
              d=rng.uniform(10.0, 30.0, n), L=16.0, Do=60.0, di=rng.uniform(0.0, 5.0, n), Es=E, nus=0.3,
              Rps=490.0, Eh=E, nuh=0.3, Rph=490.0, mu_slip=0.1, omega=rng.uniform(0.0, 900.0, n),
              torque=5000.0, brittle_hub=rng.uniform(size=n) > 0.5, Rmh=250.0)
    blocked = core.evaluate(**kw)
    import inspect

    defaults = {name: p.default for name, p in inspect.signature(core.evaluate).parameters.items()
                if p.default is not inspect.Parameter.empty}
    direct = core._block(**{**defaults, **kw})  # one block, evaluate's defaults
    for k in OUTPUT_KEYS:
        np.testing.assert_array_equal(blocked[k], np.broadcast_to(direct[k], (n,)), err_msg=k)
