"""Input groups drawn only when open, and the static HTML tables (wiring only: the values are the
library's, compared with a direct library call)."""

from __future__ import annotations

import tomllib

import pandas as pd

from fitcheck import case as casefile
from fitcheck import tomlwrite
from fitcheck.ui import joints, press_fit, state, unitsys, widgets
from tests.app.shown import open_groups, tables

PF = "gear-on-shaft"


def demo_doc() -> dict:
    return tomllib.loads(casefile.demo_text())


def addr(doc: dict) -> dict:
    return {"case": state.encode(tomlwrite.dumps(doc))}


def keys_of(at) -> set[str]:
    return {w.key for w in at.text_input}


def test_a_closed_group_draws_no_widgets_and_keeps_its_values(app_test):
    at = app_test("press_fit")
    assert not at.exception
    # the first two groups are open, "Materials and surfaces" is closed
    assert f"pf.{PF}.torque" in keys_of(at)
    assert f"pf.{PF}.rz_shaft" not in keys_of(at)
    # an input changed in an open group reaches the results while the other group stays closed
    at.text_input(key=f"pf.{PF}.torque").set_value("2.5 N*m").run()
    doc = demo_doc()
    doc["pressfit"][0]["torque"] = "2.5 N*m"
    r = casefile.evaluate(casefile.loads(tomlwrite.dumps(doc))).joints[0].result
    shown = {m.label: m.value for m in at.metric}
    assert shown["Slip safety, loosest"] == unitsys.num(r.slip_safety_min, 3)
    # opened, the group shows what the document holds, and the edit made meanwhile is kept
    open_groups(at, "press_fit")
    assert at.text_input(key=f"pf.{PF}.rz_shaft").value == "2.5 um"
    assert at.text_input(key=f"pf.{PF}.torque").value == "2.5 N*m"


def test_closing_a_group_loses_no_value(app_test):
    at = open_groups(app_test("press_fit"), "press_fit")
    at.text_input(key=f"pf.{PF}.rz_hub").set_value("4 um").run()
    assert not at.exception
    # close every group, change the torque, open them again: Rz hub is still 4 um
    for title, _ in press_fit.fields():
        at.session_state[joints.group_key("pf", title)] = False
    at.run()
    assert f"pf.{PF}.rz_hub" not in keys_of(at)
    open_groups(at, "press_fit")
    assert at.text_input(key=f"pf.{PF}.rz_hub").value == "4 um"
    doc = demo_doc()
    doc["pressfit"][0]["rz_hub"] = "4 um"
    r = casefile.evaluate(casefile.loads(tomlwrite.dumps(doc))).joints[0].result
    assert {m.label: m.value for m in at.metric}["Pressure, loosest"] == \
        unitsys.show(r.pressure_min, "stress", "SI")


def test_a_group_holding_a_bad_input_opens_with_its_message(app_test):
    doc = demo_doc()
    doc["pressfit"][0]["rz_hub"] = "-3 um"  # in the closed group "Materials and surfaces"
    at = app_test("press_fit", query=addr(doc))
    assert not at.exception
    assert f"pf.{PF}.rz_hub" in keys_of(at)
    assert any("check the inputs" in e.label for e in at.expander)
    assert any(widgets.esc(f"pressfit[{PF}].rz_hub") in e.value for e in at.error)


def test_static_table_escapes_user_text_and_reads_back():
    df = pd.DataFrame({"joint": ["cover <b>4x</b> & co"], "verdict": [widgets.PASS],
                       "margin": [0.5]})
    body = widgets.table_html(df)
    assert "<b>" not in body and "&lt;b&gt;" in body  # shown as typed, never as markup
    assert f'<span class="fc-pass">{widgets.PASS}</span>' in body
    rows = widgets.read_table_html(body)
    assert rows == [["joint", "verdict", "margin"],
                    ["cover <b>4x</b> & co", widgets.PASS, unitsys.num(0.5)]]


def test_a_cell_a_row_did_not_fill_is_empty():
    # rows of checks with and without a note: pandas fills the missing note with NaN
    df = pd.DataFrame([{"check": "a", "note": "with a note"}, {"check": "b"}])
    rows = widgets.read_table_html(widgets.table_html(df))
    assert rows[2] == ["b", ""]
    assert ">nan<" not in widgets.table_html(df)


def test_checks_table_on_the_page_equals_the_library(app_test):
    at = app_test("press_fit")
    r = casefile.evaluate(casefile.demo_case()).joints[0].result
    checks = next(t for t in tables(at) if "check" in t.columns and "reference" in t.columns)
    assert list(checks["check"]) == [c.name for c in r.checks]
    assert list(checks["verdict"]) == [widgets.PASS if c.passed else widgets.FAIL
                                       for c in r.checks]
