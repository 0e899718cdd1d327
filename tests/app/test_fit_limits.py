"""The fit-limits page (AppTest): what it shows equals a direct call of fitcheck.fits."""

from __future__ import annotations

import pytest

from fitcheck import fits
from fitcheck.errors import InputError
from fitcheck.ui import unitsys
from fitcheck.ui.widgets import esc
from tests.app.shown import chart, tables

PAGE = "fit_limits"


def _limits(at):
    return next(d for d in tables(at) if "limit" in d.columns)


def _metrics(at):
    return {m.label: m.value for m in at.metric}


def test_opens_on_default_fit_with_library_limits(app_test):
    at = app_test()  # the first page is the fit-limits page
    assert not at.exception
    f = fits.fit("25 mm", "H7", "p6")
    table = _limits(at)
    assert list(table["hole H7 [µm, mm]"][:2]) == [f"{f.hole.upper_um:+g} µm", f"{f.hole.lower_um:+g} µm"]
    assert list(table["shaft p6 [µm, mm]"][:2]) == [f"{f.shaft.upper_um:+g} µm",
                                                    f"{f.shaft.lower_um:+g} µm"]
    assert table["shaft p6 [in]"][2] == f"{f.shaft.to_dict()['max_in']:.5f}"
    m = _metrics(at)
    assert m["Smallest interference"] == unitsys.show(f.interference_min_um, "small_length", "SI")
    assert m["Largest interference"] == unitsys.show(f.interference_max_um, "small_length", "SI")
    assert len(at.get("vega_lite_chart")) == 1  # the zone diagram
    assert any("verify every result by test" in w.value for w in at.warning)


def test_typed_designation_sets_the_picks_and_the_results(app_test):
    at = app_test(PAGE)
    at.text_input(key="fl.text").set_value("40 H7/g6").run()
    assert not at.exception
    f = fits.fit("40 H7/g6")
    assert at.selectbox(key="fl.hole").value == "H7"
    assert at.selectbox(key="fl.shaft").value == "g6"
    assert at.text_input(key="fl.size").value == "40 mm"
    m = _metrics(at)
    assert m["Largest clearance"] == unitsys.show(f.clearance_max_um, "small_length", "SI")
    assert m["Smallest clearance"] == unitsys.show(f.clearance_min_um, "small_length", "SI")
    assert at.subheader[-1].value.startswith("40 H7/g6 — clearance")


def test_picking_a_class_updates_the_designation(app_test):
    at = app_test(PAGE)
    at.selectbox(key="fl.shaft").set_value("k6").run()
    assert not at.exception
    assert at.text_input(key="fl.text").value == "25 mm H7/k6"
    f = fits.fit("25 mm", "H7", "k6")
    assert f.kind == "transition"
    assert _metrics(at)["Largest interference"] == unitsys.show(f.interference_max_um,
                                                                "small_length", "SI")


def test_class_choices_are_the_valid_classes_at_the_size(app_test):
    at = app_test(PAGE)
    at.text_input(key="fl.size").set_value("5 mm").run()
    assert not at.exception
    assert at.selectbox(key="fl.shaft").options[1:] == fits.valid_classes(5.0, "shaft")
    assert at.selectbox(key="fl.hole").options[1:] == fits.valid_classes(5.0, "hole")


def test_preferred_fit_applies_both_classes(app_test):
    at = app_test(PAGE)
    pref = next(p for p in fits.preferred_fits() if p.basis == "hole" and p.fit != "H7/p6")
    box = at.selectbox(key="fl.pref")
    label = next(o for o in box.options if o.startswith(pref.fit + " "))
    box.set_value(label).run()
    assert not at.exception
    hole, shaft = pref.fit.split("/")
    assert at.selectbox(key="fl.hole").value == hole
    assert at.selectbox(key="fl.shaft").value == shaft


@pytest.mark.parametrize("text, field", [("25 H7/P6", "fit"), ("25 zz9", "fit")])
def test_bad_designation_shows_the_library_message(app_test, text, field):
    at = app_test(PAGE)
    at.text_input(key="fl.text").set_value(text).run()
    assert not at.exception
    with pytest.raises(InputError) as exc:
        fits.parse(text)
    assert any(f"**{esc(field)}**" in e.value and esc(exc.value.allowed) in e.value for e in at.error)
    # the results of the last valid fit are cleared
    assert not at.metric and not at.get("vega_lite_chart")
    assert any("Correct the designation" in i.value for i in at.info)


def test_a_negative_size_says_the_size_must_be_positive_and_abc_names_no_other_value(app_test):
    at = app_test(PAGE)
    at.text_input(key="fl.text").set_value("-5 mm H7/p6").run()
    assert not at.exception
    msgs = [e.value for e in at.error]
    assert any(esc("a length > 0 mm") in m and "nominal size" in m for m in msgs), msgs
    assert not at.metric
    at.text_input(key="fl.text").set_value("abc").run()
    msgs = [e.value for e in at.error]
    assert msgs and all("0 mm" not in m for m in msgs), msgs
    assert not at.metric


def _chart_frame(el):
    return chart(el)[0]


def test_the_zone_diagram_is_a_browser_chart_of_the_library_limits(app_test):
    at = app_test(PAGE)
    f = fits.fit("25 mm", "H7", "p6")
    (chart,) = at.get("vega_lite_chart")
    df = _chart_frame(chart)
    assert list(df["zone"]) == ["hole H7", "shaft p6"]
    assert list(df["upper"]) == pytest.approx([f.hole.upper_um, f.shaft.upper_um])
    assert list(df["lower"]) == pytest.approx([f.hole.lower_um, f.shaft.lower_um])
    assert not at.get("image")  # one chart style: no matplotlib picture
    # inch units: the axis reads in thousandths of an inch (1 µm = 0.03937 thousandths)
    at = app_test(PAGE, query={"u": "inch"})
    df = _chart_frame(at.get("vega_lite_chart")[0])
    assert list(df["upper"]) == pytest.approx([f.hole.upper_um / 25.4, f.shaft.upper_um / 25.4])
