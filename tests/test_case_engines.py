"""Case files with the real engines: lossless round trip, atomic save, demo case.

The hypothesis test varies the demo case over valid key values (lengths in mm
and inch, forces, torques, temperatures, names and title texts with quotes,
backslashes and unicode), writes it with fitcheck's own TOML writer, reads it,
and checks that load → dumps → loads gives the same case.
"""

from __future__ import annotations

import tomllib

import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

from fitcheck import case as case_mod
from fitcheck import tomlwrite
from fitcheck.inputlimits import FORMAT_CHARACTERS

DEMO_DOC = tomllib.loads(case_mod.demo_text())

# text a case may hold: no control or bidi-format characters (the loader refuses those)
_txt = st.text(st.characters(blacklist_categories=("Cs", "Cc"), blacklist_characters=FORMAT_CHARACTERS),
               max_size=30)
_name = st.text(st.characters(blacklist_categories=("Cs", "Cc", "Zl", "Zp"),
                              blacklist_characters=FORMAT_CHARACTERS), min_size=1,
                max_size=16).map(str.strip).filter(bool)


def _length(lo, hi):
    # a length as a string in mm or inch (ISO 80000 / NIST SP 811: 1 in = 25.4 mm exactly)
    return st.tuples(st.floats(lo, hi), st.sampled_from(["mm", "in"])).map(
        lambda t: f"{t[0] / 25.4!r} in" if t[1] == "in" else f"{t[0]!r} mm")


@st.composite
def demo_variants(draw):
    doc = tomllib.loads(case_mod.demo_text())
    doc["title"]["project"] = draw(_txt)
    doc["title"]["author"] = draw(_txt) + ' "QA" \\ Ø'
    doc["title"]["date"] = draw(st.dates() | st.just("14 March 2025"))
    names = draw(st.lists(_name, min_size=4, max_size=4, unique=True))
    joints = [*doc["pressfit"], *doc["bearing"], *doc["screws"]]
    for j, n in zip(joints, names, strict=True):
        j["name"] = n
    pf = doc["pressfit"][0]
    pf["length"] = draw(_length(6.0, 30.0))
    pf["torque"] = f"{draw(st.floats(0, 8)):.6g} N*m"
    pf["axial_force"] = f"{draw(st.floats(0, 500))!r} N"
    c = doc["conditions"]
    for key in ("temperature_shaft", "temperature_hub", "temperature_inner", "temperature_outer",
                "temperature_housing"):
        c[key] = f"{draw(st.floats(-20, 120))!r} degC"
    c["temperature_min"] = f"{draw(st.floats(-40, -1))!r} degC"
    c["temperature_max"] = f"{draw(st.floats(0, 150))!r} degC"
    c["speed"] = f"{draw(st.floats(0, 20000)):.5g} rpm"
    doc["bearing"][0]["housing_wall"] = draw(_length(2.0, 20.0))
    sc = doc["screws"][0]
    sc["layers"][0]["thickness"] = draw(_length(2.0, 20.0))
    sc["axial_force"] = f"{draw(st.floats(0, 5000))!r} N"
    if draw(st.booleans()):  # a joint overriding a shared condition
        doc["bearing"][1]["temperature_inner"] = f"{draw(st.floats(-20, 120))!r} degC"
    return doc


@settings(max_examples=40, deadline=None)
@given(demo_variants())
def test_round_trip_load_dumps_load_gives_the_same_case(doc):
    case = case_mod.loads(tomlwrite.dumps(doc))
    text = case_mod.dumps(case)
    again = case_mod.loads(text)
    assert again == case
    assert case_mod.dumps(again) == text  # a fixed point after one write
    assert again.title == case.title and [n for _, n, _ in again.joints()] == [
        j["name"] for t in ("pressfit", "bearing", "screws") for j in doc[t]]


def test_demo_case_round_trip_and_evaluation_agree():
    case = case_mod.demo_case()
    again = case_mod.loads(case_mod.dumps(case))
    assert again == case
    a, b = case_mod.evaluate(case), case_mod.evaluate(again)
    assert [(c.label, c.check) for c in a.checks] == [(c.label, c.check) for c in b.checks]


def test_demo_case_has_the_joints_of_the_gearhead():
    case = case_mod.demo_case()
    assert (len(case.pressfits), len(case.bearings), len(case.screws)) == (1, 2, 1)
    assert case.title.project and case.title.author and case.title.date
    r = case_mod.evaluate(case)
    assert r.ok
    assert {c.table for c in r.checks} == {"pressfit", "bearing", "screws"}
    # sensible margins: every check passes by at least 10 %
    assert min(c.margin for c in r.checks) >= 0.10
    assert r.by_margin()[0].margin == min(c.margin for c in r.checks)


def test_demo_text_is_package_data():
    import importlib.resources

    res = importlib.resources.files("fitcheck.demo").joinpath("benchtop_pump.toml")
    assert res.is_file() and res.read_text(encoding="utf-8") == case_mod.demo_text()


def test_save_and_load_the_demo(tmp_path):
    p = case_mod.save(case_mod.demo_case(), tmp_path / "drive.toml")
    assert case_mod.load(p) == case_mod.demo_case()


def test_save_crash_keeps_the_old_demo_file(tmp_path, monkeypatch):
    p = tmp_path / "drive.toml"
    p.write_text(case_mod.demo_text(), encoding="utf-8")
    changed = case_mod.replace(case_mod.demo_case(), title=case_mod.Title(project="changed"))

    def boom(*a, **k):
        raise OSError("power cut")

    monkeypatch.setattr(case_mod.os, "replace", boom)
    with pytest.raises(OSError, match="power cut"):
        case_mod.save(changed, p)
    assert p.read_text(encoding="utf-8") == case_mod.demo_text()
    assert [x.name for x in tmp_path.iterdir()] == ["drive.toml"]


def test_conditions_reach_every_engine_and_joints_override():
    case = case_mod.demo_case()
    text = case_mod.demo_text().replace(
        'name = "B-side-6002"', 'name = "B-side-6002"\ntemperature_inner = "80 degC"')
    hot = case_mod.loads(text)
    assert hot.bearings[0] == case.bearings[0]
    assert hot.bearings[1] != case.bearings[1]
    assert hot.bearings[1].temperature_inner == pytest.approx(80.0)
    assert case.bearings[1].temperature_inner == pytest.approx(55.0)  # from [conditions]
    # screws read temperature_min/max of [conditions]
    assert case_mod.dumps(case).count('temperature_min = "-10 degC"') == 1
    cold = case_mod.loads(case_mod.demo_text().replace('temperature_min = "-10 degC"',
                                                       'temperature_min = "-30 degC"'))
    assert cold.screws[0] != case.screws[0]


def test_result_to_dict_names_every_joint():
    d = case_mod.evaluate(case_mod.demo_case()).to_dict()
    assert d["ok"] is True
    assert {c["joint"] for c in d["checks"]} == {"gear-on-shaft", "A-side-6202", "B-side-6002",
                                                  "cover-screws"}
