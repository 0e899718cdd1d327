"""Own cases and verdicts at a glance (AppTest): the wiring of issue 15.

Joints are added, duplicated, renamed and deleted on their pages; a failing joint's banner
lists every failing check with the library's cause and next step and links to the fit search;
the numbers shown equal a direct library call and follow the number format
(3–4 significant digits, no e-notation, no "-0", units as people write them).
"""

from __future__ import annotations

import math
import re
import tomllib

import pytest

from fitcheck import advice, tomlwrite
from fitcheck import case as casefile
from fitcheck.search import search_fits
from fitcheck.ui import state, unitsys
from fitcheck.ui.widgets import esc
from tests.app.shown import chart
from tests.app.shown import tables as tables_of

PF = "gear-on-shaft"
#: a displayed number: no e-notation, no "-0", no "nan", no unit spelt as pint writes it
BAD_NUMBER = re.compile(r"\de[+-]?\d|(?<![\d.])-0(?![.\d])|\bum\b|degC|N\*m|lbf\*in|\+inf|∞|\bnan\b",
                        re.IGNORECASE)


def demo_doc() -> dict:
    return tomllib.loads(casefile.demo_text())


def addr(doc: dict) -> dict:
    return {"case": state.encode(tomlwrite.dumps(doc))}


def result_of(doc: dict, table: str, name: str):
    res = casefile.evaluate(casefile.loads(tomlwrite.dumps(doc)))
    return next(j.result for j in res.joints if j.table == table and j.name == name)


def metrics(at) -> dict:
    return {m.label: m.value for m in at.metric}


def failing_doc() -> dict:
    doc = demo_doc()
    pf = doc["pressfit"][0]
    for k in ("interference_min", "interference_max"):
        pf.pop(k, None)
    pf["fit"] = "12 mm H7/g6"  # ISO 286: a clearance fit, no contact pressure
    return doc


# --------------------------------------------------------------------------- own cases

def test_new_empty_case_then_add_a_joint_of_each_kind(app_test):
    at = app_test("case_file")
    at.button(key="cf.new").click().run()
    assert not at.exception
    assert state.doc_text(at.session_state[state.DOC]).strip().startswith("format_version")
    at.text_input(key="title.project").set_value("Gear hub trial").run()
    for page, prefix in (("press_fit", "pf"), ("bearing_seat", "br"),
                         ("housing_screws", "sc")):
        at.switch_page(f"fitcheck/ui/{page}.py").run()
        assert not at.metric  # nothing to show yet
        at.button(key=f"{prefix}.add").click().run()
        assert not at.exception
        assert at.metric  # the new joint is evaluated
    doc = at.session_state[state.DOC]
    assert doc["title"]["project"] == "Gear hub trial"
    assert [e["name"] for e in doc["pressfit"]] == ["press-fit"]
    assert [e["name"] for e in doc["bearing"]] == ["bearing"]
    assert [e["name"] for e in doc["screws"]] == ["screws"]
    casefile.loads(tomlwrite.dumps(doc))  # a valid case file
    assert "case" in at.query_params  # the case is in the address


def test_rename_keeps_the_inputs_and_delete_removes_the_joint(app_test):
    at = app_test("press_fit")
    at.text_input(key=f"pf.{PF}.torque").set_value("3.1 N*m").run()
    at.text_input(key="pf.rename").set_value("hub two").run()
    at.button(key="pf.rename.button").click().run()
    assert not at.exception
    assert at.selectbox(key="pf.joint").value == "hub two"
    assert at.text_input(key="pf.hub two.torque").value == "3.1 N*m"
    doc = at.session_state[state.DOC]
    assert [e["name"] for e in doc["pressfit"]] == ["hub two"]
    assert doc["pressfit"][0]["torque"] == "3.1 N*m"
    assert metrics(at)["Torque required"] == "3.1 N·m"
    at.button(key="pf.duplicate").click().run()
    assert at.selectbox(key="pf.joint").value == "hub two-copy"
    assert at.text_input(key="pf.hub two-copy.torque").value == "3.1 N*m"
    at.button(key="pf.delete").click().run()
    assert not at.exception
    assert [e["name"] for e in at.session_state[state.DOC]["pressfit"]] == ["hub two"]
    at.text_input(key="pf.rename").set_value("hub two").run()  # the name field is the current one
    at.button(key="pf.duplicate").click().run()
    at.text_input(key="pf.rename").set_value("hub two").run()
    at.button(key="pf.rename.button").click().run()  # a name already used is refused
    assert any("Another joint is named" in e.value for e in at.error)


# --------------------------------------------------------------------------- verdicts

def test_failing_banner_lists_every_failing_check_with_cause_and_link(app_test):
    doc = failing_doc()
    at = app_test("press_fit", query=addr(doc))
    assert not at.exception
    r = result_of(doc, "pressfit", PF)
    failing = [c for c in r.checks if not c.passed]
    assert failing
    banner = at.error[0].value
    for a in advice.failing("pressfit", r.checks):
        assert esc(a.check) in banner and esc(a.cause) in banner and esc(a.next_step) in banner
    assert esc("no contact pressure at the loosest fit: the joint slips") in banner
    links = at.get("page_link")
    assert any("lot" in link.proto.page and "search=pressfit" in
               link.proto.query_string.replace("%3A", ":") for link in links), \
        [(link.proto.page, link.proto.query_string) for link in links]


def test_the_fit_search_opens_with_the_linked_joint_and_runs(app_test):
    at = app_test("lot_study", query={"search": f"pressfit:{PF}"})
    assert not at.exception
    assert at.selectbox(key="ls.joint").value == f"press fit: {PF}"
    r = search_fits(casefile.loads(tomlwrite.dumps(demo_doc())).pressfits[0])
    assert any(f"{len(r.passing)} of {r.evaluated} fits" in s.value for s in at.subheader)
    assert "search" not in at.query_params


def test_the_admitted_fit_set_changes_the_search(app_test):
    at = app_test("lot_study", query={"search": f"pressfit:{PF}"})
    at.get("button_group")  # the systems pills
    at.multiselect(key="ls.admit.pressfit.holes").set_value(["H7"]).run()
    at.multiselect(key="ls.admit.pressfit.shafts").set_value([]).run()
    at.button(key="ls.run_search").click().run()
    assert not at.exception
    inp = casefile.loads(tomlwrite.dumps(demo_doc())).pressfits[0]
    r = search_fits(inp, holes=("H7",), shafts=())
    assert any(f"{len(r.passing)} of {r.evaluated} fits" in s.value for s in at.subheader)


def test_press_fit_headline_equals_the_library_and_the_table(app_test):
    at = app_test("press_fit")
    r = result_of(demo_doc(), "pressfit", PF)
    m = metrics(at)
    assert m["Press-in force, largest"] == unitsys.show(r.press_force_max, "force", "SI")
    assert m["Hub heating temperature"] == unitsys.show_in(r.shrink_temperature_C, "degC", "SI")
    cases = next(d for d in tables_of(at)
                 if "loosest, operating" in d.columns)
    # the headline is the governing (loosest) operating state's and equals that column of the table
    column = "loosest, governing state"
    row = dict(zip(cases["quantity"], cases[column], strict=True))
    assert r.loosest_governing.torque_capacity == pytest.approx(r.torque_capacity_min, rel=1e-9)
    assert m["Torque capacity, loosest"] == row["torque capacity"]
    assert m["Pressure, loosest"] == row["contact pressure"]
    helps = {x.label: x.proto.help for x in at.metric}
    assert helps["Torque capacity, loosest"].endswith(r.loosest_governing.label)


def _shown(at) -> list[str]:
    """Every metric, table cell and banner text of the page."""
    shown = [m.value for m in at.metric] + [m.label for m in at.metric]
    for t in tables_of(at):
        shown += [str(v) for v in t.to_numpy().ravel()]
    shown += [e.value for e in [*at.error, *at.success, *at.caption, *at.subheader]]
    return shown


def _run_study_and_search(at) -> None:
    at.number_input(key="ls.samples").set_value(2000).run()
    at.button(key="ls.run_study").click().run()
    at.button(key="ls.run_search").click().run()


@pytest.mark.parametrize("page", ["press_fit", "bearing_seat", "housing_screws", "fit_limits",
                                  "whole_case", "lot_study", "seat_search", "case_file"])
@pytest.mark.parametrize("system", ["SI", "inch"])
def test_every_number_follows_the_format(app_test, page, system):
    doc = failing_doc() if page == "whole_case" else demo_doc()
    query = addr(doc) if page == "whole_case" else {}
    if system == "inch":
        query["u"] = system
    if page == "seat_search":  # the lot-study page with a bearing seat: the seat-class search
        query["search"] = "bearing:A-side-6202"
    at = app_test("lot_study" if page == "seat_search" else page, query=query or None)
    if page == "lot_study":
        _run_study_and_search(at)
    assert not at.exception
    bad = [s for s in _shown(at) if BAD_NUMBER.search(s)]
    assert not bad, bad
    # results are static tables: they wrap, no cell is cut off (editable inputs stay editors)
    assert not [d for d in at.dataframe if not str(d.key).endswith(".editor")]


# --------------------------------------------------------------------------- case verdict page

def failing_bearing_doc() -> dict:
    doc = failing_doc()
    doc["bearing"][0]["shaft"] = "r6"  # ISO 286 r6 on a 6202: the inner ring is overstressed
    return doc


def test_case_verdict_lists_every_failing_check_with_cause_step_and_link(app_test):
    doc = failing_bearing_doc()
    at = app_test("whole_case", query=addr(doc))
    assert not at.exception
    res = casefile.evaluate(casefile.loads(tomlwrite.dumps(doc)))
    failing = [j for j in res.joints if not j.ok]
    assert {j.table for j in failing} == {"pressfit", "bearing"}
    banners = [e.value for e in at.error]
    for j in failing:
        banner = next(b for b in banners if esc(j.label) in b and "does not hold" in b)
        advices = advice.failing(j.table, j.checks)
        assert advices and banner.count("\n- ") == len(advices)
        for a in advices:
            assert esc(a.check) in banner and esc(a.cause) in banner and esc(a.next_step) in banner
        for c in j.checks:
            if not c.passed:  # value, limit and margin as the library gives them
                assert esc(unitsys.margin_text(c.margin)) in banner or \
                    unitsys.margin_text(c.margin) in banner
    # a joint that holds gets no banner of its own
    for j in res.joints:
        if j.ok:
            assert not any(esc(j.label) in b and "does not hold" in b for b in banners)
    links = {(link.proto.page, link.proto.query_string.replace("%3A", ":").replace("%5B", "[")
              .replace("%5D", "]")) for link in at.get("page_link")}
    want = {f"search=pressfit:{PF}", "search=bearing:A-side-6202"}
    got = {q for page, q in links if "lot" in page}
    assert want <= {q.replace("+", " ") for q in got}, links
    assert sorted(link.proto.label for link in at.get("page_link") if "lot" in link.proto.page) \
        == ["Search fits for this joint", "Search seat classes for this joint"]


def test_case_verdict_link_opens_the_seat_search_for_the_bearing(app_test):
    doc = failing_bearing_doc()
    at = app_test("lot_study", query={**addr(doc), "search": "bearing:A-side-6202"})
    assert not at.exception
    assert at.selectbox(key="ls.joint").value == "bearing seat: A-side-6202"
    assert any("bearing 6202" in s.value for s in at.subheader)  # the search ran on arrival


def test_case_verdict_tables_equal_the_library(app_test):
    doc = failing_bearing_doc()
    at = app_test("whole_case", query=addr(doc))
    res = casefile.evaluate(casefile.loads(tomlwrite.dumps(doc)))
    tables = tables_of(at)
    joints_t = next(t for t in tables if "weakest check" in t.columns)
    checks_t = next(t for t in tables if "reference" in t.columns and "joint" in t.columns)
    assert len(checks_t) == sum(len(j.checks) for j in res.joints)
    worst = min(res.checks, key=lambda c: c.margin)
    assert checks_t["check"].iloc[0] == worst.check.name
    assert checks_t["margin"].iloc[0] == unitsys.margin_text(worst.margin)
    assert checks_t["value"].iloc[0] == unitsys.show_in(worst.check.value, worst.check.unit, "SI")
    # full texts, not cut: every reference and note as the library wrote it
    refs = {c.check.reference for c in res.checks}
    assert set(checks_t["reference"]) == refs
    assert set(joints_t["joint"]) == {j.label for j in res.joints}


# --------------------------------------------------------------------------- fit search letters

def test_the_admitted_letters_change_the_search_as_the_library(app_test):
    at = app_test("lot_study", query={"search": f"pressfit:{PF}"})
    at.multiselect(key="ls.admit.pressfit.shaft_letters").set_value(["p", "r", "s"]).run()
    at.multiselect(key="ls.admit.pressfit.hole_letters").set_value(["S"]).run()
    at.button(key="ls.run_search").click().run()
    assert not at.exception
    inp = casefile.loads(tomlwrite.dumps(demo_doc())).pressfits[0]
    r = search_fits(inp, shaft_letters=("p", "r", "s"), hole_letters=("S",))
    assert any(f"{len(r.passing)} of {r.evaluated} fits" in s.value for s in at.subheader)
    shown = [t for t in tables_of(at) if "rank" in t.columns]
    fits_shown = [f for t in shown for f in t["fit"]]
    assert fits_shown == [f"{c.hole}/{c.shaft}" for c in r.passing]
    for f in fits_shown:
        hole, shaft = f.split("/")
        assert (hole.startswith("H") and shaft.rstrip("0123456789") in ("p", "r", "s")) or \
            (shaft.startswith("h") and hole.rstrip("0123456789") == "S")
    # every figure of the ranking as the library gives it, in the number format
    first = shown[0].iloc[0]
    assert first["slip safety, loosest"] == unitsys.num(r.best.slip_safety_min, 3)
    assert first["hub yield safety"] == unitsys.num(r.best.hub_yield_safety, 3)
    rejected = next(t for t in tables_of(at) if "fails (margin)" in t.columns)
    for (_, row), c in zip(rejected.iterrows(), r.rejected, strict=False):
        assert row["fit"] == f"{c.hole}/{c.shaft}"
        for n, m in c.failing:  # the whole text of every failing check, not cut
            assert (f"{n} ({unitsys.margin_text(m)})" if math.isfinite(m) else n) \
                in row["fails (margin)"]


def test_a_joint_name_is_shown_literally(app_test):
    doc = demo_doc()
    doc["screws"][0]["name"] = "![x](http://example.invalid/x.png) :red[y]"
    at = app_test("housing_screws", query=addr(doc))
    assert not at.exception
    texts = [e.value for e in [*at.subheader, *at.markdown, *at.error, *at.success, *at.caption]]
    assert any(esc("![x](http://example.invalid/x.png) :red[y]") in t for t in texts)
    assert not any("](http://example.invalid" in t and "\\]" not in t for t in texts)


# --------------------------------------------------------------------------- charts

def _rule_layers(spec: dict) -> list[dict]:
    out = []
    for layer in spec.get("layer", []):
        out += _rule_layers(layer)
        mark = layer.get("mark", {})
        if isinstance(mark, dict) and mark.get("type") == "rule" and "strokeDash" in \
                layer.get("encoding", {}):
            out.append(layer)
    return out


def _text_on_lines(spec: dict) -> list[dict]:
    """Text marks drawn at a reference line's own data (labels that can overlap)."""
    out = []
    for layer in spec.get("layer", []):
        out += _text_on_lines(layer)
        mark = layer.get("mark", {})
        if isinstance(mark, dict) and mark.get("type") == "text" and "data" in layer:
            out.append(layer)
        if "data" in layer and any(isinstance(sub.get("mark"), dict) and
                                   sub["mark"].get("type") == "text"
                                   for sub in layer.get("layer", [])):
            out.append(layer)
    return out


@pytest.mark.parametrize("page", ["press_fit", "bearing_seat", "housing_screws", "lot_study"])
def test_reference_lines_are_named_in_the_legend_not_over_each_other(app_test, page):
    import json

    at = app_test(page)
    if page == "lot_study":
        at.number_input(key="ls.samples").set_value(2000).run()
        at.button(key="ls.run_study").click().run()
    assert not at.exception
    named = 0
    for el in at.get("vega_lite_chart"):
        _, spec, named_data = chart(el)
        assert not _text_on_lines(spec), el.proto.spec[:300]
        for layer in _rule_layers(spec):
            # the values travel as a named dataset: the spec stays the same when a value changes
            names = list(named_data[layer["data"]["name"]]["t"])
            dash = layer["encoding"]["strokeDash"]
            assert set(names) <= set(dash["scale"]["domain"])  # every line named in the legend
            assert dash["legend"] is not None
            # each name its own dash pattern, so close lines stay apart in the legend
            pats = dash["scale"]["range"]
            assert len({json.dumps(p) for p in pats}) == len(pats)
            named += len(names)
    assert named  # every one of these pages draws at least one reference line


def test_the_fit_ranking_shows_the_plastic_zone_share_in_the_elastic_plastic_design(app_test):
    doc = demo_doc()
    doc["pressfit"][0]["design"] = "elastic-plastic"
    at = app_test("lot_study", query={**addr(doc), "search": f"pressfit:{PF}"})
    at.button(key="ls.run_search").click().run()
    assert not at.exception
    inp = casefile.loads(tomlwrite.dumps(doc)).pressfits[0]
    r = search_fits(inp)
    first = next(t for t in tables_of(at) if "rank" in t.columns).iloc[0]
    assert "hub yield safety" not in first.index
    assert first["hub plastic zone (share of wall)"] == f"{r.best.plastic_zone_share:.0%}"
