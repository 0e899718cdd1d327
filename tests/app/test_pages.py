"""The joint pages, the case verdict and the case file (AppTest): the wiring only.

What a page shows must equal a direct call of the library on the same case;
bad input shows the library's message by its field; no page raises.
"""

from __future__ import annotations

import copy
import tomllib

import pytest

import fitcheck
from fitcheck import case as casefile
from fitcheck import tomlwrite
from fitcheck.ui import app, state, unitsys
from fitcheck.ui.widgets import esc
from tests.app.shown import chart, layer_rows, open_groups, tables

PAGES = [p.module for p in app.PAGES]


def demo_doc() -> dict:
    return tomllib.loads(casefile.demo_text())


def library_result(doc: dict, table: str, name: str):
    """The library's own result of one joint of a case document."""
    res = casefile.evaluate(casefile.loads(tomlwrite.dumps(doc)))
    return next(j.result for j in res.joints if j.table == table and j.name == name)


def metrics(at) -> dict:
    return {m.label: m.value for m in at.metric}


def errors(at) -> list[str]:
    return [e.value for e in at.error]


# --------------------------------------------------------------------------- every page

@pytest.mark.parametrize("page", PAGES)
def test_every_page_runs_on_the_demo_with_the_caution(app_test, page):
    at = app_test(page)
    assert not at.exception
    assert any(fitcheck.CAUTION in w.value for w in at.warning)
    assert not errors(at)
    # the demo unchanged keeps the address clean
    assert "case" not in at.query_params


def test_navigation_lists_every_page(app_test):
    at = app_test()
    at.switch_page("fitcheck/ui/case_file.py").run()  # raises when a page is not registered
    assert not at.exception
    assert len(app.available()) == len(app.PAGES) == 7


# --------------------------------------------------------------------------- press fit

PF = "gear-on-shaft"


def test_press_fit_shows_the_library_results(app_test):
    at = app_test("press_fit")
    r = library_result(demo_doc(), "pressfit", PF)
    m = metrics(at)
    assert m["Torque capacity, loosest"] == unitsys.show(r.torque_capacity_min, "torque", "SI")
    assert m["Torque required"] == unitsys.show(r.torque, "torque", "SI")
    assert m["Pressure, tightest"] == unitsys.show(r.pressure_max, "stress", "SI")
    assert m["Slip safety, loosest"] == unitsys.num(r.slip_safety_min, 3)
    checks = next(d for d in tables(at) if "check" in d.columns)
    assert list(checks["check"]) == [c.name for c in r.checks]
    capacity, wall = (chart_data(c) for c in at.get("vega_lite_chart"))
    band = r.capacity_band()
    assert capacity[0]["torque"].to_numpy() == pytest.approx(band["torque_capacity"] / 1000.0)
    assert capacity[1] == pytest.approx([band["required"] / 1000.0])  # N·mm -> N·m
    prof = r.wall_profile()
    vm = wall[0][wall[0]["stress component"] == "von Mises σv"]
    assert vm["stress"].max() == pytest.approx(max(prof["vm_hub"].max(), prof["vm_shaft"].max()))


def chart_data(el):
    """A browser chart's data table and the values of its reference lines."""
    frame = chart(el)[0]
    rules = [v["v"] for rows in layer_rows(el) for v in rows]
    return frame, rules


def test_press_fit_input_change_flows_to_the_results(app_test):
    at = app_test("press_fit")
    at.text_input(key=f"pf.{PF}.length").set_value("20 mm").run()
    assert not at.exception
    doc = demo_doc()
    doc["pressfit"][0]["length"] = "20 mm"
    r = library_result(doc, "pressfit", PF)
    assert metrics(at)["Torque capacity, loosest"] == unitsys.show(r.torque_capacity_min,
                                                                   "torque", "SI")
    assert "case" in at.query_params  # the change is kept in the address


def test_press_fit_class_picker_rewrites_the_fit(app_test):
    at = app_test("press_fit")
    at.selectbox(key=f"pf.{PF}.fit.shaft").set_value("u6").run()
    assert not at.exception
    assert at.text_input(key=f"pf.{PF}.fit").value == "16 H7/u6"
    doc = demo_doc()
    doc["pressfit"][0]["fit"] = "16 H7/u6"
    r = library_result(doc, "pressfit", PF)
    assert metrics(at)["Pressure, tightest"] == unitsys.show(r.pressure_max, "stress", "SI")


@pytest.mark.parametrize("key, bad", [("length", "-3 mm"), ("torque", "3 kg"),
                                      ("hub_material", "C46")])
def test_press_fit_bad_input_shows_its_field(app_test, key, bad):
    doc = demo_doc()
    doc["pressfit"][0][key] = bad
    if key.endswith("material"):  # a name not in the list, as from a file
        at = app_test("press_fit", query={"case": state.encode(tomlwrite.dumps(doc))})
    else:
        at = app_test("press_fit")
        at.text_input(key=f"pf.{PF}.{key}").set_value(bad).run()
    assert not at.exception
    with pytest.raises((fitcheck.InputError, fitcheck.InputErrors)) as exc:
        casefile.loads(tomlwrite.dumps(doc))
    errs = exc.value.errors if isinstance(exc.value, fitcheck.InputErrors) else [exc.value]
    e = next(e for e in errs if key in e.field)
    assert any(f"**{esc(e.field)}**" in t and esc(e.allowed) in t for t in errors(at))
    assert not at.metric  # no stale results beside a bad input


# --------------------------------------------------------------------------- bearing seats

def test_bearing_page_shows_the_library_results(app_test):
    at = app_test("bearing_seat")
    r = library_result(demo_doc(), "bearing", "A-side-6202")
    m = metrics(at)
    assert m["Operating clearance"] == unitsys.show_range(r.operating_clearance_um,
                                                          "small_length", "SI", digits=3)
    assert m["Smallest group that passes"] == (r.smallest_passing_group or "none")
    (budget, rules), = (chart_data(c) for c in at.get("vega_lite_chart"))
    tight = budget[budget["pairing"] == "tightest pairing"]
    assert tight["to"].iloc[-1] == pytest.approx(r.operating_clearance_um[0])  # µm in SI
    assert rules == [0.0, pytest.approx(r.clearance_min_um)]


def test_bearing_page_other_joint_and_suggested_seats(app_test):
    at = app_test("bearing_seat")
    at.selectbox(key="br.joint").set_value("B-side-6002").run()
    assert not at.exception
    from fitcheck import bearings

    rec = bearings.recommend_seats("6002", load="rotating_inner", load_ratio=0.03,
                                   housing_material="EN AC-46000")
    assert any(f"shaft **{rec.shaft}**" in md.value for md in at.markdown)
    use = [b for b in at.button if b.key == "br.B-side-6002.use_suggested"]
    if use:  # the demo's choice differs from the suggestion
        use[0].click().run()
        assert not at.exception
        open_groups(at, "bearing_seat")  # a closed input group draws no widgets
        assert at.text_input(key="br.B-side-6002.shaft").value == rec.shaft
        assert at.text_input(key="br.B-side-6002.housing").value == rec.housing


def test_bearing_bad_designation_shows_its_field(app_test):
    doc = demo_doc()
    doc["bearing"][0]["designation"] = "6299X"
    at = app_test("bearing_seat", query={"case": state.encode(tomlwrite.dumps(doc))})
    assert not at.exception
    assert any(f"**{esc('bearing[A-side-6202].designation')}**" in t for t in errors(at))


# --------------------------------------------------------------------------- housing screws

SC = "cover-screws"


def test_screw_page_shows_the_library_results(app_test):
    at = app_test("housing_screws")
    r = library_result(demo_doc(), "screws", SC)
    m = metrics(at)
    assert m["Tightening torque M_A"] == unitsys.show(r.tightening_torque, "torque", "SI")
    assert m["Permissible preload F_M,zul"] == unitsys.show(r.F_M_zul, "force", "SI")
    (diagram, rules), = (chart_data(c) for c in at.get("vega_lite_chart"))
    j = r.joint_diagram()
    kr = diagram[diagram["line"] == "F_KR"]
    assert kr["F"].to_numpy() == pytest.approx([r.F_KR_min] * 2)  # N in SI
    assert rules == [pytest.approx(r.F_M_zul)]
    assert diagram["x"].max() == pytest.approx((j["f_S"] + j["f_P"]) * 1000.0)  # µm in SI


def test_screw_change_and_bad_thread(app_test):
    at = open_groups(app_test("housing_screws"), "housing_screws")
    at.text_input(key=f"sc.{SC}.count").set_value("6").run()
    assert not at.exception
    doc = demo_doc()
    doc["screws"][0]["count"] = 6
    r = library_result(doc, "screws", SC)
    assert metrics(at)["Preload needed F_M,min"] == unitsys.show(r.F_M_min, "force", "SI")
    at.text_input(key=f"sc.{SC}.thread").set_value("M5x9").run()
    assert not at.exception
    assert any(f"**{esc(f'screws[{SC}].thread')}**" in t for t in errors(at))


def test_screw_layer_edit_flows_to_the_document(app_test):
    at = app_test("housing_screws")
    at.session_state[f"sc.{SC}.layers.editor"] = {
        "edited_rows": {0: {"thickness": "8 mm"}}, "added_rows": [], "deleted_rows": []}
    at.run()
    assert not at.exception
    doc = demo_doc()
    doc["screws"][0]["layers"][0]["thickness"] = "8 mm"
    r = library_result(doc, "screws", SC)
    assert metrics(at)["Preload needed F_M,min"] == unitsys.show(r.F_M_min, "force", "SI")


# --------------------------------------------------------------------------- whole case

def test_case_verdict_lists_every_check_worst_first(app_test):
    at = app_test("whole_case")
    res = casefile.evaluate(casefile.demo_case())
    m = metrics(at)
    assert m["Joints"] == str(len(res.joints))
    assert m["Checks"] == str(len(res.checks))
    assert m["Failing checks"] == str(sum(not c.passed for c in res.checks))
    table = next(d for d in tables(at) if "joint" in d.columns
                 and "check" in d.columns)
    ordered = res.by_margin()
    assert list(table["check"]) == [c.check.name for c in ordered]
    assert list(table["joint"]) == [c.label for c in ordered]


def test_case_verdict_keeps_other_joints_when_one_is_bad(app_test):
    at = app_test("press_fit")
    at.text_input(key=f"pf.{PF}.length").set_value("zero").run()
    at.switch_page("fitcheck/ui/whole_case.py").run()
    assert not at.exception
    m = metrics(at)
    assert m["Joints with input problems"] == "1"
    assert m["Joints"] == "4"
    assert any(esc(f"pressfit[{PF}].length") in t for t in errors(at))


# --------------------------------------------------------------------------- state and units

def test_inputs_survive_page_switches_and_a_reload(app_test):
    at = app_test("press_fit")
    at.text_input(key=f"pf.{PF}.torque").set_value("2.5 N*m").run()
    at.switch_page("fitcheck/ui/whole_case.py").run()
    at.switch_page("fitcheck/ui/press_fit.py").run()
    assert at.text_input(key=f"pf.{PF}.torque").value == "2.5 N*m"
    token = at.query_params["case"]
    doc = tomllib.loads(state.decode(token))
    assert doc["pressfit"][0]["torque"] == "2.5 N*m"
    # a new session with the same address (a reload) opens the same case
    again = app_test("press_fit", query={"case": token})
    assert not again.exception
    assert again.text_input(key=f"pf.{PF}.torque").value == "2.5 N*m"


def test_a_broken_address_opens_the_demo_with_a_notice(app_test):
    at = app_test(query={"case": "not-a-case"})
    assert not at.exception
    assert any("could not be read" in i.value for i in at.info)


def test_unit_switch_rewrites_inputs_and_results_and_back(app_test):
    at = app_test("press_fit")
    at.button_group[0].set_value("inch").run()
    assert not at.exception
    r = library_result(demo_doc(), "pressfit", PF)
    m = metrics(at)
    assert m["Torque capacity, loosest"] == unitsys.show(r.torque_capacity_min, "torque", "inch")
    assert m["Torque capacity, loosest"].endswith("lbf·in")
    assert at.text_input(key=f"pf.{PF}.length").value.endswith(" in")
    assert at.query_params.get("u") == "inch"
    at.switch_page("fitcheck/ui/housing_screws.py").run()
    assert metrics(at)["Permissible preload F_M,zul"].endswith("lbf")
    at.button_group[0].set_value("SI").run()
    at.switch_page("fitcheck/ui/press_fit.py").run()
    assert at.text_input(key=f"pf.{PF}.length").value == "14 mm"
    assert "case" not in at.query_params  # the very same case as the demo again


def test_an_inch_address_without_a_case_opens_the_demo_in_inch(app_test):
    at = app_test("press_fit", query={"u": "inch"})
    assert not at.exception
    assert at.text_input(key=f"pf.{PF}.length").value.endswith(" in")
    r = library_result(demo_doc(), "pressfit", PF)
    assert metrics(at)["Torque capacity, loosest"] == unitsys.show(r.torque_capacity_min, "torque",
                                                                   "inch")


# --------------------------------------------------------------------------- case file

def test_case_upload_replaces_the_case(app_test):
    at = app_test("case_file")
    doc = demo_doc()
    doc["title"]["project"] = "Bench pump test"
    doc["pressfit"][0]["torque"] = "2 N*m"
    at.file_uploader[0].upload("mine.toml", tomlwrite.dumps(doc).encode(), "application/toml")
    at.run()
    assert not at.exception
    assert any(esc("Opened mine.toml") in s.value for s in at.success)
    assert at.text_input(key="title.project").value == "Bench pump test"
    at.switch_page("fitcheck/ui/press_fit.py").run()
    assert at.text_input(key=f"pf.{PF}.torque").value == "2 N*m"


def test_bad_upload_is_refused_with_its_problems(app_test):
    at = app_test("case_file")
    doc = demo_doc()
    doc["pressfit"][0]["lenght"] = "14 mm"
    at.file_uploader[0].upload("typo.toml", tomlwrite.dumps(doc).encode(), "application/toml")
    at.run()
    assert not at.exception
    assert any("lenght" in t and "did you mean" in t for t in errors(at))
    assert at.text_input(key="title.project").value == demo_doc()["title"]["project"]
    at.file_uploader[0].set_value(("junk.toml", b"\x00\x01binary", "application/toml")).run()
    assert not at.exception
    assert any(esc("junk.toml") in t for t in errors(at))


def test_download_and_report(app_test):
    at = app_test("case_file")
    keys = {b.key for b in at.get("download_button")}
    assert {"cf.download_toml", "cf.report_html", "cf.report_pdf"} <= keys
    from fitcheck.ui import case_file

    text = state.doc_text(demo_doc())
    html = case_file._report(text, "html").decode()
    res = casefile.evaluate(casefile.loads(text))
    for j in res.joints:  # every joint of the case is in the report
        assert j.name in html
    assert "verify every result by test" in html
    pdf = case_file._report(text, "pdf")
    assert pdf[:5] == b"%PDF-"


def test_title_edit_goes_into_the_case(app_test):
    at = app_test("case_file")
    at.text_input(key="title.revision").set_value("B").run()
    assert not at.exception
    doc = tomllib.loads(state.decode(at.query_params["case"]))
    assert doc["title"]["revision"] == "B"
    expected = copy.deepcopy(demo_doc())
    expected["title"]["revision"] = "B"
    assert doc == expected
