"""The press-fit page offers ``mesh_thrust`` among "More inputs" (from ``pressfit.KEYS``) and shows
what the library computes with it (wiring only: values compared with a direct library call)."""

from __future__ import annotations

import tomllib

from fitcheck import case as casefile
from fitcheck import tomlwrite
from fitcheck.ui import state, unitsys
from tests.app.shown import open_groups

PF = "gear-on-shaft"


def _helical_doc() -> dict:
    doc = tomllib.loads(casefile.demo_text())
    doc["pressfit"][0]["helix_angle"] = "15 deg"   # the demo's spur gear made helical
    return doc


def _slip_shown(at) -> str:
    return {m.label: m.value for m in at.metric}["Slip safety, loosest"]


def _library(doc) -> float:
    return casefile.evaluate(casefile.loads(tomlwrite.dumps(doc))).joints[0].result.slip_safety_min


def test_mesh_thrust_is_an_input_of_the_page_and_reaches_the_result(app_test):
    doc = _helical_doc()
    at = open_groups(app_test("press_fit", query={"case": state.encode(tomlwrite.dumps(doc))}),
                     "press_fit")
    assert not at.exception
    key = f"pf.{PF}.mesh_thrust"
    assert key in {w.key for w in at.text_input}
    added = _slip_shown(at)
    assert added == unitsys.num(_library(doc), 3)
    at.text_input(key=key).set_value("ignore").run()
    assert not at.exception
    doc["pressfit"][0]["mesh_thrust"] = "ignore"
    assert _slip_shown(at) == unitsys.num(_library(doc), 3) != added   # 2.28 against 2.24
