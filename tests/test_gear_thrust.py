"""A helical gear's axial mesh force belongs to the press fit's thrust demand (slip check).

The axial mesh force of a helical gear, F_a = F_t·tan β with F_t = 2T/d_p and the pitch
(reference) diameter d_p = m_n·z/cos β (Shigley, Mechanical Engineering Design, 10th ed.,
sec. 13-16, eqs. (13-39), (13-40) — from memory), pushes the hub along the shaft in service.
By default (``mesh_thrust = "add"``) its magnitude is added to ``axial_force`` whatever the
directions (the conservative side) before the slip demand √((2T/d)² + F²) of the press fit
(DIN 7190-1:2017, transmissible torque and axial force combined; Shigley, 10th ed., sec. 7-8),
as ``fitcheck.core.pressfit.evaluate`` forms it: ``np.hypot(2·torque/d, axial_force)``.
"""

from __future__ import annotations

import json
import math
import tomllib
import warnings

import pytest

from fitcheck import case as case_mod
from fitcheck import pressfit, study, tomlwrite
from fitcheck.errors import InputError, InputErrors, MethodRangeWarning

LBF = 4.4482216152605  # N per lbf, NIST SP 811 (exact by definition of the pound-force)

# a helical gear pressed on a solid shaft; steel on steel (C45E: E = 210 000 MPa in data/materials.csv)
HELICAL = {"name": "helical", "diameter": "30 mm", "interference_min": "30 um",
           "interference_max": "50 um", "length": "20 mm", "module": "2 mm", "teeth": 40,
           "helix_angle": "20 deg", "shaft_material": "C45E", "hub_material": "C45E",
           "rz_shaft": "4 um", "rz_hub": "6 um", "mu_slip": 0.12, "torque": "100 N*m",
           "axial_force": "300 N"}


def _eval(**over):
    m = {k: v for k, v in {**HELICAL, **over}.items() if v is not None}
    inp = pressfit.PressFitInput.from_mapping(m)
    with warnings.catch_warnings():
        warnings.simplefilter("ignore", MethodRangeWarning)
        return inp, pressfit.evaluate(inp)


def _slip(r):
    return next(c for c in r.checks if c.name == "slip at loosest fit")


# ----------------------------------------------------------------- the hand calculation

def _hand_capacity():
    """Axial capacity at the loosest fit [N], worked by hand (room temperature, standstill)."""
    # hub = the gear's root diameter (ISO 21771:2007 d = m_n·z/cos β; ISO 53:1998 dedendum 1.25·m):
    # D_o = 2·40/cos 20° − 2.5·2 = 85.1342 − 5 = 80.1342 mm
    Do = 2.0 * 40 / math.cos(math.radians(20.0)) - 2.5 * 2.0
    assert Do == pytest.approx(80.1342, abs=1e-4)
    # smoothing 0.8·(Rz_shaft + Rz_hub) = 0.8·(4 + 6) = 8 um (DIN 7190-1:2017): δ_eff = 30 − 8 = 22 um
    delta = 0.030 - 0.8 * (0.004 + 0.006)
    # same material, solid shaft: p = E·δ/(2d)·(1 − (d/D_o)²)  (Shigley, 10th ed., eq. (3-57) with
    # b = 0 and the diametral interference δ = 2·radial)
    # = 210 000·0.022/60·(1 − (30/80.1342)²) = 77.0·(1 − 0.140154) = 66.208 MPa
    p = 210_000.0 * delta / (2.0 * 30.0) * (1.0 - (30.0 / Do) ** 2)
    assert p == pytest.approx(66.208, abs=1e-3)
    # F_cap = p·π·d·L·μ = 66.208·π·30·20·0.12 = 14 975.9 N   (Shigley, 10th ed., sec. 7-8)
    f_cap = p * math.pi * 30.0 * 20.0 * 0.12
    assert f_cap == pytest.approx(14_975.9, abs=0.1)
    return f_cap


def test_helical_gear_seat_slip_demand_by_hand():
    f_cap = _hand_capacity()
    # mesh forces (Shigley, 10th ed., eqs. (13-39), (13-40) — from memory):
    # d_p = m_n·z/cos β = 2·40/cos 20° = 80/0.939693 = 85.1342 mm
    d_p = 2.0 * 40 / math.cos(math.radians(20.0))
    assert d_p == pytest.approx(85.1342, abs=1e-4)
    # F_t = 2T/d_p = 2·100 000/85.1342 = 2349.23 N
    F_t = 2.0 * 100_000.0 / d_p
    assert F_t == pytest.approx(2349.23, abs=0.01)
    # F_a = F_t·tan β = 2349.23·0.363970 = 855.05 N
    F_a = F_t * math.tan(math.radians(20.0))
    assert F_a == pytest.approx(855.05, abs=0.01)
    # axial demand F = 300 + 855.05 = 1155.05 N (magnitudes added: the conservative side)
    F = 300.0 + F_a
    # slip demand √((2T/d)² + F²) = √(6666.67² + 1155.05²) = √(44 444 444 + 1 334 141) = 6765.99 N
    demand = math.hypot(2.0 * 100_000.0 / 30.0, F)
    assert demand == pytest.approx(6765.99, abs=0.01)
    # slip safety = F_cap/demand = 14 975.9/6765.99 = 2.2134
    S = f_cap / demand
    assert S == pytest.approx(2.2134, abs=1e-4)

    inp, r = _eval()
    assert inp.mesh_thrust == "add"
    assert inp.mesh_axial_force() == pytest.approx(F_a, rel=1e-12)
    assert r.axial_force == pytest.approx(F, rel=1e-12)
    assert r.axial_force_given == 300.0 and r.mesh_axial_force == pytest.approx(F_a, rel=1e-12)
    assert r.hub_outer_diameter == pytest.approx(80.1342, abs=1e-4)
    assert r.axial_capacity_min == pytest.approx(f_cap, rel=1e-9)
    assert r.slip_safety_min == pytest.approx(S, rel=1e-9)
    slip = _slip(r)
    assert slip.value == pytest.approx(S, rel=1e-9)
    # the check's note and a result note state the sum with its numbers and the conservative choice
    for text in (slip.note, next(n for n in r.notes if n.startswith("slip check:"))):
        assert "F = axial_force 300 N + |F_a| 855.1 N" in text and "= 1155.05 N" in text
        assert "whatever the directions" in text and "mesh_thrust = 'ignore'" in text
    assert "F_t = 2T/d_p = 2349 N" in slip.note and "d_p = m·z/cos β = 85.134 mm" in slip.note
    assert slip.note.startswith("governing state: ")


def test_ignore_keeps_the_given_axial_force_as_before():
    f_cap = _hand_capacity()
    # axial_force alone: √(6666.67² + 300²) = 6673.41 N; S = 14 975.9/6673.41 = 2.2441
    demand = math.hypot(2.0 * 100_000.0 / 30.0, 300.0)
    assert demand == pytest.approx(6673.41, abs=0.01)
    inp, r = _eval(mesh_thrust="ignore")
    assert r.axial_force == 300.0 and r.slip_safety_min == pytest.approx(f_cap / demand, rel=1e-9)
    assert r.slip_safety_min == pytest.approx(2.2441, abs=1e-4)
    assert r.mesh_axial_force == pytest.approx(855.05, abs=0.01)  # stated, not added
    note = _slip(r).note
    assert "F = axial_force 300 N as given" in note and "|F_a| 855.1 N" in note
    # 'add' asks more of the joint than 'ignore', never less
    assert _eval()[1].slip_safety_min < r.slip_safety_min


def test_spur_gear_unchanged():
    # β = 0: no axial mesh force; D_o = m·(z − 2.5) = 2·37.5 = 75 mm
    # p = 210 000·0.022/60·(1 − (30/75)²) = 77·0.84 = 64.68 MPa; F_cap = 64.68·π·600·0.12 = 14 630.3 N
    # demand √(6666.67² + 300²) = 6673.41 N; S = 2.19229
    inp, r = _eval(helix_angle=None)
    assert inp.mesh_axial_force() == 0.0 and r.mesh_axial_force == 0.0
    assert r.axial_force == 300.0
    assert r.axial_capacity_min == pytest.approx(14_630.3, abs=0.1)
    assert r.slip_safety_min == pytest.approx(14_630.3 / 6673.41, rel=1e-5)
    assert not any(n.startswith("slip check:") for n in (*r.warnings, *r.notes))
    assert _slip(r).note.endswith("demand √((2T/d)² + F²) with T = 100 N·m, F = 300 N")
    assert "mesh_thrust" not in inp.to_mapping()
    # a spur gear gives the same answer with either setting
    assert _eval(helix_angle=None, mesh_thrust="ignore")[1].slip_safety_min == r.slip_safety_min


def test_no_torque_no_mesh_thrust():
    inp, r = _eval(torque=None)
    assert inp.mesh_axial_force() == 0.0 and r.axial_force == 300.0


def test_every_operating_state_uses_the_same_demand():
    over = {"speed": "6000 rpm", "temperature_shaft": "70 degC", "temperature_hub": "50 degC",
            "temperature_min": "-20 degC", "temperature_max": "90 degC"}
    inp, r = _eval(**over)
    demand = math.hypot(2.0 * inp.torque / 30.0, inp.slip_axial_force())
    loosest = r.states[0::2]   # (loosest, tightest) of every state
    assert len(loosest) == 8
    per_state = [c.axial_capacity / demand for c in loosest]
    assert r.slip_safety_min == pytest.approx(min(per_state), rel=1e-9)
    gov = min(loosest, key=lambda c: c.axial_capacity)
    assert r.governing_loose_state == gov.state
    assert _slip(r).note.startswith(f"governing state: {gov.state}; ")
    # the same states with 'ignore': each state's safety scales by the ratio of the demands
    _, r0 = _eval(mesh_thrust="ignore", **over)
    demand0 = math.hypot(2.0 * inp.torque / 30.0, 300.0)
    assert r.slip_safety_min / r0.slip_safety_min == pytest.approx(demand0 / demand, rel=1e-9)
    assert r0.governing_loose_state == r.governing_loose_state


def test_inch_equals_si():
    si_inp, si = _eval()
    inch = {**HELICAL, "diameter": f"{30 / 25.4!r} in", "length": f"{20 / 25.4!r} in",
            "module": f"{2 / 25.4!r} in", "torque": f"{100_000 / LBF / 25.4!r} lbf*in",
            "axial_force": f"{300 / LBF!r} lbf", "interference_min": f"{0.030 / 25.4!r} in",
            "interference_max": f"{0.050 / 25.4!r} in", "rz_shaft": f"{4000 / 25.4!r} uin",
            "rz_hub": f"{6000 / 25.4!r} uin", "helix_angle": f"{math.radians(20.0)!r} rad"}
    inp = pressfit.PressFitInput.from_mapping(inch)
    with warnings.catch_warnings():
        warnings.simplefilter("ignore", MethodRangeWarning)
        r = pressfit.evaluate(inp)
    assert inp.mesh_axial_force() == pytest.approx(si_inp.mesh_axial_force(), rel=1e-9)
    assert r.axial_force == pytest.approx(si.axial_force, rel=1e-9)
    assert r.slip_safety_min == pytest.approx(si.slip_safety_min, rel=1e-9)


def test_study_search_and_band_see_the_same_demand():
    inp, r = _eval()
    assert study.core_arguments(inp)["axial_force"] == pytest.approx(r.axial_force, rel=1e-12)
    band = r.capacity_band(5)
    assert band["required"] == pytest.approx(
        math.hypot(2.0 * inp.torque / 30.0, r.axial_force) * 15.0 * inp.slip_safety, rel=1e-12)
    j = r.to_json()
    json.dumps(j, allow_nan=False)
    assert j["axial_force_required_N"] == pytest.approx(r.axial_force)
    assert j["axial_force_given_N"] == 300.0 and j["mesh_thrust"] == "add"
    assert j["mesh_axial_force_N"] == pytest.approx(855.05, abs=0.01)


@pytest.mark.parametrize("over, match", [
    ({"mesh_thrust": "both"}, "mesh_thrust: got 'both'; allowed: 'add'"),
    ({"mesh_thrust": "ad"}, "did you mean 'add'"),
    ({"mesh_thrust": True}, "mesh_thrust: got True"),
    ({"mesh_thrust": 1}, "mesh_thrust: got 1"),
    ({"mesh_thrust": "ignore", "module": None, "teeth": None, "helix_angle": None,
      "hub_outer_diameter": "60 mm"}, "mesh_thrust.*only with module, teeth and helix_angle"),
])
def test_bad_mesh_thrust_names_field_value_and_allowed(over, match):
    with pytest.raises((InputError, InputErrors), match=match):
        _eval(**over)


@pytest.mark.parametrize("value", ["add", "ignore", " Ignore "])
def test_round_trip_of_the_input_and_the_case_file(value):
    inp, _ = _eval(mesh_thrust=value)
    assert inp.mesh_thrust == value.strip().lower()
    m = inp.to_mapping()
    assert m["mesh_thrust"] == inp.mesh_thrust  # stated for every helical gear, default or not
    assert pressfit.PressFitInput.from_mapping(m) == inp
    doc = {"format_version": 1, "pressfit": [m]}
    c = case_mod.loads(tomlwrite.dumps(doc))
    assert c.pressfits[0] == inp
    text = case_mod.dumps(c)
    assert tomllib.loads(text)["pressfit"][0]["mesh_thrust"] == inp.mesh_thrust
    assert case_mod.loads(text) == c
    res = case_mod.evaluate(c)
    notes = res.joints[0].notes
    assert any("slip check: F = axial_force 300 N" in n for n in notes)


def test_key_is_documented():
    assert "mesh_thrust" in pressfit.KEYS and "'ignore'" in pressfit.KEYS["mesh_thrust"]
    assert any("mesh_thrust" in step for step, _ in pressfit.METHOD_NOTES)


def test_the_shaft_check_counts_the_mesh_thrust_once():
    """The DIN 743 check at the hub edge adds the mesh's axial force to ``axial_force`` with
    ``mesh_thrust = 'add'`` and takes ``axial_force`` alone with ``'ignore'`` (which states that it
    already holds the thrust); the couple F_a·d/2 stays in the bending moment either way."""
    # F_a = F_t·tan β = 2349.23·tan 20° = 855.05 N (test_helical_gear_seat_slip_demand_by_hand);
    # K_A = 1 (default application factor)
    supports = {"bearing_distance_a": "15 mm", "bearing_distance_b": "45 mm"}
    _, added = _eval(**supports)
    _, ignored = _eval(mesh_thrust="ignore", **supports)
    assert added.shaft.mesh_axial == pytest.approx(855.05, abs=0.01)
    assert added.shaft.axial_force == pytest.approx(300.0 + 855.05, abs=0.01)
    assert ignored.shaft.axial_force == 300.0
    assert ignored.shaft.bending_moment == added.shaft.bending_moment  # the couple stays
    assert any("taken as part of the given axial force" in n for n in ignored.shaft.notes)
    assert not any("is added to the shaft's static axial force" in n for n in ignored.shaft.notes)
    # less axial stress with 'ignore': its fatigue safety is never below that of 'add'
    assert ignored.shaft.fatigue_safety >= added.shaft.fatigue_safety
