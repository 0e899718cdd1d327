"""The "Shaft at the hub edge" box on the Press fit and Bearing seats pages (AppTest): wiring only."""

from __future__ import annotations

import tomllib

from fitcheck import case as casefile
from fitcheck import display
from tests.app.shown import tables


def _result(table: str, name: str):
    res = casefile.evaluate(casefile.loads(casefile.demo_text()))
    return next(j.result for j in res.joints if j.table == table and j.name == name)


def _metrics(at) -> dict:
    return {m.label: m.value for m in at.metric}


def test_press_fit_page_shows_the_shaft_safeties(app_test):
    at = app_test("press_fit")
    name = tomllib.loads(casefile.demo_text())["pressfit"][0]["name"]
    sh = _result("pressfit", name).shaft
    m = _metrics(at)
    assert m["Fatigue safety"] == display.num(sh.fatigue_safety, 3)
    assert m["Yield safety"] == display.num(sh.static_safety, 3)
    assert m["Notch factor βσ"] == display.num(sh.notch_factor_bending, 3)
    shown = tables(at)
    loads = next(t for t in shown if "quantity" in t.columns and "loads from" in list(t["quantity"]))
    assert display.show(sh.bending_moment, "torque", "SI") in list(loads["value"])


def test_bearing_page_shows_the_shaft_safeties(app_test):
    at = app_test("bearing_seat")
    sh = _result("bearing", "A-side-6202").shaft
    m = _metrics(at)
    assert m["Fatigue safety"] == display.num(sh.fatigue_safety, 3)
    assert m["Notch factor βτ"] == display.num(sh.notch_factor_torsion, 3)
