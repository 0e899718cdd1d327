"""Inch additions in the browser (AppTest, wiring only): the ASME B4.1 section of the
fit-limits page shows what fitcheck.fits.ansi_fit gives; the case page opens the inch demo."""

from __future__ import annotations

from fitcheck import case as casefile
from fitcheck import fits
from fitcheck.ui import state, unitsys


def test_fit_limits_page_offers_ansi_classes(app_test):
    at = app_test("fit_limits")
    assert not at.exception
    at.text_input(key="fl.ansi_size").set_value("0.75 in").run()
    at.selectbox(key="fl.ansi_class").set_value("FN2").run()
    assert not at.exception
    f = fits.ansi_fit("0.75 in", "FN2")
    shown = {m.label: m.value for m in at.metric}
    assert shown["Largest interference"] == unitsys.show(f.interference_max_um, "small_length", "SI")
    assert "FN3" not in at.selectbox(key="fl.ansi_class").options   # FN3 starts over 0.95 in
    assert any("Machinery's Handbook" in c.value for c in at.caption)


def test_case_page_opens_the_inch_demo(app_test):
    at = app_test("case_file")
    at.button(key="cf.demo_inch").click().run()
    assert not at.exception
    assert at.session_state[state.UNITS] == "inch"
    doc = at.session_state[state.DOC]
    assert doc["title"]["project"] == casefile.demo_case(inch=True).title.project
    assert doc["pressfit"][0]["fit"] == "0.750 in FN2"
