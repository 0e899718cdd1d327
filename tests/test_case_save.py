"""Saving a case keeps what the user wrote, and never writes a value the loader refuses.

Round trip through tomlkit (fitcheck.tomlwrite.update): a commented case file loaded,
edited in one value and saved differs from the original in that value's line only.
"""

from __future__ import annotations

import dataclasses
import difflib
import tomllib

import pytest

from fitcheck import case as case_mod
from fitcheck import tomlwrite
from fitcheck.errors import InputError, InputErrors

COMMENTED = case_mod.demo_text().replace(
    "[[bearing]]\n", "# --- the two bearings ---\n[[bearing]]\n", 1).replace(
    'teeth = 42', 'teeth = 42   # z')


def _changed_lines(a: str, b: str) -> list[str]:
    return [ln for ln in difflib.unified_diff(a.splitlines(), b.splitlines(), lineterm="", n=0)
            if ln[:1] in "+-" and not ln.startswith(("+++", "---"))]


def test_unchanged_case_saves_as_the_very_same_text(tmp_path):
    p = tmp_path / "pump.toml"
    p.write_text(COMMENTED, encoding="utf-8")
    case_mod.save(case_mod.load(p), p)
    assert p.read_text(encoding="utf-8") == COMMENTED


@pytest.mark.parametrize("table, field, value, old_line, new_line", [
    ("pressfits", "torque", 4000.0, 'torque = "3.2 N*m"', 'torque = "4 N*m"'),
    ("screws", "count", 6, "count = 4", "count = 6"),
])
def test_one_edited_value_changes_only_its_line(tmp_path, table, field, value, old_line, new_line):
    p = tmp_path / "pump.toml"
    p.write_text(COMMENTED, encoding="utf-8")
    case = case_mod.load(p)
    joints = getattr(case, table)
    edited = case_mod.replace(case, **{table: (dataclasses.replace(joints[0], **{field: value}),
                                               *joints[1:])})
    case_mod.save(edited, p)
    after = p.read_text(encoding="utf-8")
    diff = _changed_lines(COMMENTED, after)
    assert len(diff) == 2, diff
    assert diff[0].startswith("-" + old_line) and diff[1].startswith("+" + new_line)
    # the comment of the line stays, in its column
    old_full = next(ln for ln in COMMENTED.splitlines() if ln.startswith(old_line))
    new_full = next(ln for ln in after.splitlines() if ln.startswith(new_line))
    if "#" in old_full:
        assert new_full.index("#") == old_full.index("#")
        assert new_full.split("#", 1)[1] == old_full.split("#", 1)[1]
    assert case_mod.load(p) == edited


def test_title_edit_keeps_comments_and_order():
    case = case_mod.loads(COMMENTED)
    edited = case_mod.replace(case, title=dataclasses.replace(case.title, revision="B"))
    text = case_mod.dumps(edited)
    assert _changed_lines(COMMENTED, text) == ['-revision = "A"', '+revision = "B"']
    assert "# --- the two bearings ---" in text


def test_a_changed_condition_leaves_the_joints_as_they_were_read():
    # the joints hold the values they inherited when read: the file says so explicitly
    case = case_mod.loads(COMMENTED)
    edited = case_mod.replace(case, conditions={**case.conditions, "speed": "3000 rpm"})
    text = case_mod.dumps(edited)
    assert '+speed = "3000 rpm"' in _changed_lines(COMMENTED, text)
    assert case_mod.loads(text) == edited
    assert case_mod.loads(text).pressfits[0] == case.pressfits[0]


def test_removing_a_joint_keeps_the_others_and_their_comments():
    case = case_mod.loads(COMMENTED)
    edited = case_mod.replace(case, bearings=case.bearings[1:],
                              names={**case.names, "bearing": case.names["bearing"][1:]})
    text = case_mod.dumps(edited)
    assert "A-side-6202" not in text and "B-side-6002" in text
    assert "# 15 x 32 x 9 mm, floating bearing at the motor end" in text
    assert case_mod.loads(text) == edited


def test_replace_refuses_what_load_refuses():
    case = case_mod.demo_case()
    with pytest.raises((InputError, InputErrors), match="temperature_min"):
        case_mod.replace(case, conditions={**case.conditions, "temperature_min": "banana"})
    with pytest.raises((InputError, InputErrors), match=r"title\.project|at most 500 characters"):
        case_mod.replace(case, title=case_mod.Title(project="x" * 600))
    with pytest.raises((InputError, InputErrors), match="temperature_min"):  # min above max
        case_mod.replace(case, conditions={**case.conditions, "temperature_min": "90 degC"})


def test_save_never_writes_a_refused_value(tmp_path):
    p = tmp_path / "pump.toml"
    p.write_text(COMMENTED, encoding="utf-8")
    case = case_mod.load(p)
    bad = dataclasses.replace(case, conditions={**case.conditions, "speed": "2800 furlongs"})
    with pytest.raises((InputError, InputErrors)):
        case_mod.save(bad, p)
    assert p.read_text(encoding="utf-8") == COMMENTED
    assert [x.name for x in tmp_path.iterdir()] == ["pump.toml"]


def test_document_text_for_the_browser_keeps_comments_and_refuses_bad_values():
    doc = tomllib.loads(COMMENTED)
    doc["pressfit"][0]["length"] = "15 mm"
    text = case_mod.document_text(doc, COMMENTED)
    assert _changed_lines(COMMENTED, text)[1].startswith('+length = "15 mm"')
    assert "# gear face width = hub length" in text
    doc["pressfit"][0]["length"] = "fifteen"
    with pytest.raises((InputError, InputErrors), match="length"):
        case_mod.document_text(doc, COMMENTED)
    fresh = case_mod.document_text(tomllib.loads(case_mod.demo_text()))
    assert fresh.startswith("# fitcheck design case")


def test_update_adds_and_removes_keys_in_their_tables():
    text = '# head\n[t]\na = 1  # one\nb = 2\n\n[[j]]\nname = "p"\nx = "1 mm" # x\n'
    out = tomlwrite.update(text, {"t": {"a": 1, "c": 3}, "j": [{"name": "p", "x": "2 mm"},
                                                              {"name": "q"}]})
    assert tomllib.loads(out) == {"t": {"a": 1, "c": 3}, "j": [{"name": "p", "x": "2 mm"},
                                                                {"name": "q"}]}
    assert "# head" in out and "a = 1  # one" in out and 'x = "2 mm" # x' in out
    assert "b = 2" not in out
