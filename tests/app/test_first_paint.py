"""A session's first run of the press-fit page draws only its headline, pauses, then draws the page.

AppTest sessions have no browser behind them (no request headers) and read every page in one run;
here ``app._has_browser`` is replaced so that the session counts as a browser's, and the pause is
recorded instead of slept.
"""

from __future__ import annotations

import pytest
from streamlit.testing.v1 import AppTest

from fitcheck.ui import app as ui_app

from .conftest import APP, ROOT


@pytest.fixture
def browser_session(monkeypatch):
    """An AppTest factory whose sessions count as a browser's; ``pauses`` lists the pauses."""
    pauses: list[float] = []
    monkeypatch.chdir(ROOT)
    monkeypatch.setattr(ui_app, "_has_browser", lambda: True)
    monkeypatch.setattr(ui_app, "_pause", pauses.append)

    def make(first_page: str, query: dict | None = None) -> AppTest:
        """An AppTest whose session's first run is on ``first_page`` (AppTest always starts on
        the default page, so that run is forgotten: the session is marked as not seen)."""
        at = AppTest.from_file(str(APP), default_timeout=60)
        if query:
            at.query_params.update(query)
        at.run()
        at.session_state[ui_app.SEEN] = False
        pauses.clear()
        at.switch_page(f"fitcheck/ui/{first_page}.py").run()
        return at

    make.pauses = pauses
    return make


def _whole_page(at: AppTest) -> None:
    assert not at.exception
    assert [sc.label for sc in at.sidebar.get("segmented_control")] == ["Units"]
    assert "Press fit of the case" in [s.label for s in at.selectbox]
    assert at.text_input(key="pf.gear-on-shaft.torque").value  # the inputs
    assert at.session_state[ui_app.HEADLINE_ONLY] is False


def test_a_first_visit_to_the_press_fit_page_pauses_once_then_draws_the_whole_page(browser_session):
    at = browser_session("press_fit")
    assert browser_session.pauses == [ui_app.FIRST_PAINT_PAUSE_S]
    _whole_page(at)
    labels = [m.label for m in at.metric]
    assert "Torque capacity, loosest" in labels and "Checks" in [s.value for s in at.subheader]
    at.text_input(key="pf.gear-on-shaft.torque").set_value("2.5 N*m").run()  # later runs: no pause
    assert browser_session.pauses == [ui_app.FIRST_PAINT_PAUSE_S]
    _whole_page(at)


def test_a_session_that_starts_on_another_page_never_pauses(browser_session):
    at = browser_session("bearing_seat")
    assert browser_session.pauses == []
    assert [sc.label for sc in at.sidebar.get("segmented_control")] == ["Units"]
    at.switch_page("fitcheck/ui/press_fit.py").run()
    assert browser_session.pauses == []
    _whole_page(at)


def test_a_first_visit_that_ends_before_the_headline_still_draws_the_controls(browser_session):
    """A case whose press fit has an input error shows no headline: the run reruns at once and
    the unit switch, the joint picker and the inputs (with the error) are drawn."""
    from fitcheck import case as casefile
    from fitcheck import tomlwrite
    from fitcheck.tomlread import read_toml_bytes
    from fitcheck.ui import state

    doc = read_toml_bytes(casefile.demo_text().encode("utf-8"), "demo")
    joint = next(j for j in doc["pressfit"] if j["name"] == "gear-on-shaft")
    joint["torque"] = "3 kg"
    at = browser_session("press_fit", {"case": state.encode(tomlwrite.dumps(doc))})
    assert browser_session.pauses == []
    assert not at.exception
    assert [sc.label for sc in at.sidebar.get("segmented_control")] == ["Units"]
    assert "Press fit of the case" in [s.label for s in at.selectbox]
    assert at.session_state[ui_app.HEADLINE_ONLY] is False
    assert not at.metric  # no headline: the inputs carry the error


def test_the_bare_address_opens_the_fit_limits_page_headline_first(monkeypatch):
    """``/`` (where ``make app`` lands) goes on to the fit-limits page, whose first run in the
    session is headline-only: the hidden start page does not count as the session's first run."""
    pauses: list[float] = []
    monkeypatch.chdir(ROOT)
    monkeypatch.setattr(ui_app, "_has_browser", lambda: True)
    monkeypatch.setattr(ui_app, "_pause", pauses.append)
    at = AppTest.from_file(str(APP), default_timeout=60).run()
    assert not at.exception
    assert pauses == [ui_app.FIRST_PAINT_PAUSE_S]
    assert [t.value for t in at.title] == ["Fit limits"]
    # the whole page: the inputs, the unit switch and the limits table after the figures
    assert at.text_input(key="fl.text").value
    assert [sc.label for sc in at.sidebar.get("segmented_control")] == ["Units"]
    assert [m.label for m in at.metric][:1] == ["Smallest interference"]
    assert at.session_state[ui_app.HEADLINE_ONLY] is False
