"""Page "Lot study and fit search" (AppTest): what it shows equals a direct library call.

The physics is checked where it lives (tests of fitcheck.study and fitcheck.search);
here only the wiring: the settings reach ``run_study`` as set, the probabilities,
percentiles and histograms shown are the library's, the ranked fits are
``search_fits``'s, a chosen fit goes into the working case, and a bad setting
shows the library's own message by its field.
"""

from __future__ import annotations

import copy
import tomllib

import pytest

import fitcheck
from fitcheck import case as casefile
from fitcheck import tomlwrite
from fitcheck.search import search_bearing_seat, search_fits
from fitcheck.study import StudySettings, run_study
from fitcheck.ui import unitsys
from fitcheck.ui.widgets import esc
from tests.app.shown import chart, layer_rows, tables

PAGE = "lot_study"
PF = "gear-on-shaft"
BR = "A-side-6202"


def demo_doc() -> dict:
    return tomllib.loads(casefile.demo_text())


def joint_input(doc: dict, table: str, name: str):
    dc = casefile.loads(tomlwrite.dumps(doc))
    return next(inp for eng, n, inp in dc.joints() if eng.table == table and n == name)


def metrics(at) -> dict:
    return {m.label: m.value for m in at.metric}


def _frame_by_columns(at, column: str):
    """The first table of the page that has ``column``."""
    return next(d for d in tables(at) if column in d.columns)


def _long_frame(at, column: str, keep=lambda df: True):
    """A long table shown in parts (its first rows, the rest folded below), joined again."""
    import pandas as pd

    parts = [d for d in tables(at) if column in d.columns
             and keep(d)]
    return pd.concat(parts, ignore_index=True)


def p_text(x: float) -> str:  # how the page prints a probability: 3 significant digits
    from fitcheck.display import probability

    return probability(x, 3)


def chart_frame(el):
    frame, spec, _ = chart(el)
    return frame, spec


# --------------------------------------------------------------------------- page

def test_page_runs_with_the_caution_and_waits_for_the_button(app_test):
    at = app_test(PAGE)
    assert not at.exception
    assert any(fitcheck.CAUTION in w.value for w in at.warning)
    assert not at.error
    assert not at.metric  # a study runs only on request
    # the temperature range comes from the case conditions
    assert at.text_input(key="ls.temperature_min").value == "-10 degC"
    assert at.text_input(key="ls.temperature_max").value == "60 degC"
    assert "case" not in at.query_params


def test_run_study_shows_the_library_result(app_test):
    at = app_test(PAGE)
    at.number_input(key="ls.samples").set_value(2000)
    at.number_input(key="ls.seed").set_value(7)
    at.number_input(key="ls.friction_cov").set_value(0.3)
    at.button(key="ls.run_study").click().run()
    assert not at.exception
    r = run_study(joint_input(demo_doc(), "pressfit", PF),
                  StudySettings(samples=2000, seed=7, friction_cov=0.3, temperature_min=-10.0,
                                temperature_max=60.0, target=1e-4))
    m = metrics(at)
    assert m["P(slip)"] == p_text(r.slip.best.p)
    assert m["P(yield)"] == p_text(r.yield_.best.p)
    assert m["Slip safety, loosest"] == unitsys.num(r.worst_case.slip_safety_min, 3)
    probs = _frame_by_columns(at, "plain sampling")
    assert list(probs["plain sampling"]) == [
        f"{fm.plain.failures:,} of {fm.plain.n:,} = {p_text(fm.plain.p)}" for fm in (r.slip, r.yield_)]
    targets = _frame_by_columns(at, "estimate")
    assert list(targets["estimate"]) == [p_text(t.estimate) for t in r.targets]
    assert any(f"{t.plain_samples_at_target:,.0f}" in v for t in r.targets
               for v in targets.iloc[:, -1])
    pct = _frame_by_columns(at, "50 %")
    d = r.distribution("torque_capacity")
    row = pct[pct["quantity"] == d.label].iloc[0]
    assert row["50 %"] == unitsys.show_in(d.percentile(50.0), "N*m", "SI")
    # the first histogram is the library's torque-capacity histogram with the required torque
    hist, spec = chart_frame(at.get("vega_lite_chart")[0])
    assert list(hist["count"]) == list(d.hist_counts)
    assert hist["lo"].to_numpy() == pytest.approx(d.hist_edges[:-1])
    rules = [v["v"] for rows in layer_rows(at.get("vega_lite_chart")[0]) for v in rows]
    assert rules == pytest.approx([v for _, v in d.limits])


def test_a_changed_setting_hides_the_old_result(app_test):
    at = app_test(PAGE)
    at.number_input(key="ls.samples").set_value(1000)
    at.button(key="ls.run_study").click().run()
    assert "P(slip)" in metrics(at)
    at.number_input(key="ls.seed").set_value(3).run()
    assert "P(slip)" not in metrics(at)
    assert any("Run study" in i.value for i in at.info)


@pytest.mark.parametrize("changes, field", [
    ({"ls.samples": 0}, "samples"),
    ({"ls.sizes": "normal", "ls.cpk": 1.6}, "cpk"),
    ({"ls.temperature_max": ""}, "temperature_max"),
])
def test_bad_setting_shows_the_library_message(app_test, changes, field):
    at = app_test(PAGE)
    for key, value in changes.items():
        if key == "ls.sizes":
            at.radio(key=key).set_value(value).run()
        elif key.startswith("ls.temperature"):
            at.text_input(key=key).set_value(value).run()
        else:
            at.number_input(key=key).set_value(value).run()
    assert not at.exception
    given = {"samples": 100_000, "temperature_min": "-10 degC", "temperature_max": "60 degC"}
    given.update({k.removeprefix("ls."): v for k, v in changes.items()})
    given = {k: (v if v != "" else None) for k, v in given.items()}
    with pytest.raises((fitcheck.InputError, fitcheck.InputErrors)) as exc:
        StudySettings.from_mapping(given, "study")
    errs = exc.value.errors if isinstance(exc.value, fitcheck.InputErrors) else [exc.value]
    e = next(e for e in errs if e.field == f"study.{field}")
    assert any(f"**{esc(e.field)}**" in t.value and esc(e.allowed) in t.value for t in at.error)
    assert at.button(key="ls.run_study").disabled


def test_settings_survive_a_page_switch(app_test):
    at = app_test(PAGE)
    at.number_input(key="ls.samples").set_value(5000).run()
    at.switch_page("fitcheck/ui/press_fit.py").run()
    at.switch_page("fitcheck/ui/lot_study.py").run()
    assert at.number_input(key="ls.samples").value == 5000


# --------------------------------------------------------------------------- fit search

def test_search_fits_ranks_as_the_library(app_test):
    at = app_test(PAGE)
    at.button(key="ls.run_search").click().run()
    assert not at.exception
    r = search_fits(joint_input(demo_doc(), "pressfit", PF))
    passing = _long_frame(at, "rank")
    assert list(passing["fit"]) == [f"{c.hole}/{c.shaft}" for c in r.passing]
    assert passing["slip safety, loosest"].iloc[0] == unitsys.num(r.best.slip_safety_min, 3)
    rejected = _frame_by_columns(at, "fails (margin)")
    first = r.rejected[0]
    assert rejected["fit"].iloc[0] == f"{first.hole}/{first.shaft}"
    assert first.failing[0][0] in rejected["fails (margin)"].iloc[0]


def test_taking_a_fit_writes_it_into_the_case(app_test):
    at = app_test(PAGE)
    at.button(key="ls.run_search").click().run()
    r = search_fits(joint_input(demo_doc(), "pressfit", PF))
    pick = r.passing[1]
    fit = f"{pick.hole}/{pick.shaft}"
    at.selectbox(key="ls.take").set_value(fit).run()
    at.button(key="ls.take.button").click().run()
    assert not at.exception
    assert at.session_state["case.doc"]["pressfit"][0]["fit"] == f"16 {fit}"
    assert any(f"16 {fit}" in s.value for s in at.success)
    assert "case" in at.query_params  # the changed case is kept in the address
    # the search stays on screen and marks the fit now in the case
    passing = _long_frame(at, "rank")
    assert "in the case" in passing.loc[passing["fit"] == fit, "note"].iloc[0]
    at.switch_page("fitcheck/ui/press_fit.py").run()
    assert at.text_input(key=f"pf.{PF}.fit").value == f"16 {fit}"
    doc = demo_doc()
    doc["pressfit"][0]["fit"] = f"16 {fit}"
    res = casefile.evaluate(casefile.loads(tomlwrite.dumps(doc)))
    pf = next(j.result for j in res.joints if j.table == "pressfit")
    assert metrics(at)["Pressure, tightest"] == unitsys.show(pf.pressure_max, "stress", "SI")


def test_bearing_seat_search_and_take(app_test):
    at = app_test(PAGE)
    at.selectbox(key="ls.joint").set_value(f"bearing seat: {BR}").run()
    assert not at.tabs  # no lot study for a bearing seat
    at.button(key="ls.run_search").click().run()
    assert not at.exception
    r = search_bearing_seat(joint_input(demo_doc(), "bearing", BR))
    shafts = _long_frame(at, "class", lambda df: df["class"].str.islower().all())
    assert list(shafts["class"]) == [c.cls for c in r.shafts]
    assert shafts["rank"].map(type).nunique() == 1  # one type a column: Arrow converts it cleanly
    good = [c.cls for c in r.housings if c.ok and c.cls != r.housing_given]
    if not good:
        pytest.skip("no other passing housing class for the demo bearing")
    at.selectbox(key="ls.take.housing").set_value(good[0]).run()
    at.button(key="ls.take.housing.button").click().run()
    entry = next(b for b in at.session_state["case.doc"]["bearing"] if b["name"] == BR)
    assert entry["housing"] == good[0]


def test_bad_joint_sends_the_user_to_its_page(app_test):
    from fitcheck.ui import state

    doc = copy.deepcopy(demo_doc())
    doc["pressfit"][0]["length"] = "-3 mm"
    at = app_test(PAGE, query={"case": state.encode(tomlwrite.dumps(doc))})
    assert not at.exception
    assert any("Press fit" in e.value for e in at.error)
    assert any("length" in e.value for e in at.error)
    assert all(b.key != "ls.run_study" for b in at.button)
