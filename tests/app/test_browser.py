"""The real app in headless Chromium (Playwright): what a designer does in a day, end to end.

One Streamlit server serves the whole module (fixture ``server``); every test gets
a fresh browser context, i.e. a new session. Values shown are compared with the
library's own results.
"""

from __future__ import annotations

import os
import re
import tomllib

import pytest

from fitcheck import case as casefile
from fitcheck import fits, tomlwrite
from fitcheck.ui import unitsys

from .conftest import IDLE

pytestmark = pytest.mark.browser

#: ms, the first render of a session and a rerun (raise them on a busy machine with
#: FITCHECK_BROWSER_SLOW=<factor>)
SLOW = float(os.environ.get("FITCHECK_BROWSER_SLOW", "1"))
FIRST = int(30_000 * SLOW)
AFTER = int(20_000 * SLOW)


def demo_result(table: str, name: str):
    res = casefile.evaluate(casefile.demo_case())
    return next(j.result for j in res.joints if j.table == table and j.name == name)


def metric_box(pg, label: str):
    return pg.get_by_test_id("stMetric").filter(has=pg.get_by_test_id("stMetricLabel").get_by_text(
        label, exact=True))


def metric_value(pg, label: str) -> str:
    return metric_box(pg, label).get_by_test_id("stMetricValue").inner_text().strip()


def open_page(pg, server, wait_idle, path: str = "") -> None:
    pg.goto(f"{server}/{path}", wait_until="commit", timeout=FIRST)
    wait_idle(pg, FIRST)
    pg.get_by_test_id("stMainBlockContainer").get_by_role("heading").first.wait_for(timeout=FIRST)


def test_opens_on_the_demo_case(page, server, wait_idle):
    open_page(page, server, wait_idle, "press-fit")
    r = demo_result("pressfit", "gear-on-shaft")
    assert page.get_by_role("heading", name="Press fit", exact=True).is_visible()
    assert metric_value(page, "Torque capacity, loosest") == unitsys.show(
        r.torque_capacity_min, "torque", "SI")
    assert page.get_by_text("verify every result by test").first.is_visible()
    assert "case=" not in page.url  # the demo keeps the address clean


def test_changing_a_fit_updates_the_results(page, server, wait_idle):
    open_page(page, server, wait_idle)  # the fit-limits page is the first page
    box = page.get_by_role("textbox", name="Designation", exact=True)
    box.fill("40 H7/g6")
    box.press("Enter")
    page.get_by_text("40 H7/g6 — clearance fit").wait_for(timeout=AFTER)
    wait_idle(page, AFTER)
    f = fits.fit("40 H7/g6")
    assert metric_value(page, "Largest clearance") == unitsys.show(f.clearance_max_um,
                                                                   "small_length", "SI")
    assert "fit=" in page.url


def test_a_reload_keeps_the_inputs(page, server, wait_idle):
    open_page(page, server, wait_idle, "press-fit")
    box = page.get_by_role("textbox", name="Torque", exact=True)
    box.fill("2.5 N*m")
    box.press("Enter")
    page.wait_for_url(re.compile(r"case="), timeout=AFTER)
    wait_idle(page, AFTER)
    page.get_by_text("2.5 N·m").first.wait_for(timeout=AFTER)  # "Torque required"
    page.reload(wait_until="commit", timeout=FIRST)
    wait_idle(page, FIRST)
    box = page.get_by_role("textbox", name="Torque", exact=True)
    box.wait_for(timeout=FIRST)
    assert box.input_value() == "2.5 N*m"
    assert metric_value(page, "Torque required") == "2.5 N·m"


def test_the_unit_switch_changes_the_displayed_units(page, server, wait_idle):
    open_page(page, server, wait_idle, "housing-screws")
    r = demo_result("screws", "cover-screws")
    assert metric_value(page, "Tightening torque M_A") == unitsys.show(r.tightening_torque,
                                                                       "torque", "SI")
    page.get_by_test_id("stSidebar").get_by_text("inch", exact=True).click()
    want = unitsys.show(r.tightening_torque, "torque", "inch")
    # the inputs may read in inch units a moment before the metric cards are drawn again
    metric_box(page, "Tightening torque M_A").get_by_test_id("stMetricValue").get_by_text(
        want, exact=True).wait_for(timeout=AFTER)
    wait_idle(page, AFTER)
    assert metric_value(page, "Tightening torque M_A") == want
    assert metric_value(page, "Permissible preload F_M,zul").endswith("lbf")


def test_a_case_upload_opens_the_case(page, server, wait_idle):
    open_page(page, server, wait_idle, "case-file")
    doc = tomllib.loads(casefile.demo_text())
    doc["title"]["project"] = "Uploaded pump"
    page.locator('input[type="file"]').set_input_files(files=[{
        "name": "uploaded.toml", "mimeType": "application/toml",
        "buffer": tomlwrite.dumps(doc).encode()}])
    page.get_by_text("Opened uploaded.toml").wait_for(timeout=AFTER)
    wait_idle(page, AFTER)
    assert page.get_by_role("textbox", name="Project", exact=True).input_value() == "Uploaded pump"


def test_the_report_downloads(page, server, wait_idle):
    open_page(page, server, wait_idle, "case-file")
    with page.expect_download(timeout=60_000) as dl:
        page.get_by_role("button", name="Report as HTML").click()
    html = open(dl.value.path(), encoding="utf-8").read()
    assert dl.value.suggested_filename.endswith("-report.html")
    assert "verify every result by test" in html
    for name in ("gear-on-shaft", "A-side-6202", "cover-screws"):
        assert name in html
    with page.expect_download(timeout=60_000) as dl:
        page.get_by_role("button", name="Download the case file (.toml)").click()
    text = open(dl.value.path(), encoding="utf-8").read()
    assert casefile.loads(text).title.project == casefile.demo_case().title.project


# --------------------------------------------------------------------------- own cases (issue 15)

#: ms, each step of the longer walk through the workbench (generous: a loaded machine is slow)
LONG = int(120_000 * SLOW)
#: ms without any change of the page that, with the script idle, counts as "the run is drawn"
QUIET_MS = 500

# JavaScript run before the page's own: the time of the last change anywhere in the document
_WATCH = """
window.__last = performance.now();
new MutationObserver(() => { window.__last = performance.now(); }).observe(document, {
  attributes: true, childList: true, subtree: true, characterData: true});
"""
#: Streamlit loads the code of an element kind on its first use and shows a skeleton meanwhile
SKELETON = '[data-testid="stSkeleton"]'
_SETTLED = (f"() => performance.now() - window.__last > {QUIET_MS} && "
            f"document.querySelector('{IDLE}') !== null && "
            f"document.querySelector('{SKELETON}') === null")


def settle(pg, timeout: int = LONG) -> None:
    """Wait until the app is idle (script run finished, connected), every element is drawn (no
    skeleton left while an element's code loads) and the page has not changed for ``QUIET_MS`` —
    no fixed sleep; a slow machine only makes the wait longer."""
    pg.wait_for_function(_SETTLED, timeout=timeout, polling=100)


def act(pg, action, expect=None, timeout: int = LONG) -> None:
    """Do ``action()``, wait for the locator ``expect`` (the new content it brings), then settle.

    The quiet clock restarts at the action, so a script run that has not yet begun is not taken
    for the end of one.
    """
    pg.evaluate("window.__last = performance.now()")
    action()
    if expect is not None:
        expect.first.wait_for(timeout=timeout)
    settle(pg, timeout)


def _nav(pg, title: str) -> None:
    act(pg, lambda: pg.get_by_test_id("stSidebarNav").get_by_text(title, exact=True).click(),
        pg.get_by_role("heading", name=title, exact=True))


def _manage(pg, button: str, name: str | None = None, expect=None) -> None:
    """Open the joint menu of the page and press one of its buttons (after typing a name)."""
    pop = pg.get_by_test_id("stPopoverBody")
    act(pg, lambda: pg.get_by_role("button", name="Add, rename, delete").click(), pop)
    if name is not None:
        box = pop.get_by_role("textbox", name="Name", exact=True)
        box.fill(name)
        act(pg, lambda: box.press("Enter"))
    act(pg, lambda: pop.get_by_role("button", name=button).click(), expect)
    pg.keyboard.press("Escape")


def _download_case(pg):
    with pg.expect_download(timeout=LONG) as dl:
        pg.get_by_role("button", name="Download the case file (.toml)").click()
    return casefile.loads(open(dl.value.path(), encoding="utf-8").read())


def test_build_a_case_from_empty_rename_delete_download_reload(page, server):
    pg = page
    pg.set_default_timeout(LONG)  # clicks and fills too: a loaded machine draws slowly
    pg.add_init_script(_WATCH)
    pg.goto(f"{server}/case-file", wait_until="commit", timeout=LONG)
    pg.get_by_role("heading", name="Case file and report", exact=True).wait_for(timeout=LONG)
    settle(pg)
    act(pg, lambda: pg.get_by_role("button", name="Start a new, empty case").click(),
        pg.get_by_text("a new, empty case"))
    box = pg.get_by_role("textbox", name="Project", exact=True)
    box.fill("Gear hub trial")
    act(pg, lambda: box.press("Enter"))
    assert box.input_value() == "Gear hub trial"
    # one joint of each kind, each evaluated: its results heading names it
    for title, what, heading in (("Press fit", "press fit", "press-fit: "),
                                 ("Bearing seats", "bearing seat", ": shaft "),
                                 ("Housing screws", "screw joint", "screws: ")):
        _nav(pg, title)
        act(pg, lambda w=what: pg.get_by_role("button", name=f"Add a {w}").click(),
            pg.get_by_role("heading").filter(has_text=heading))
        assert pg.get_by_test_id("stMetricValue").count() > 0
    _manage(pg, "Rename", name="cover <b>4x</b>",  # literal text, no markup
            expect=pg.get_by_role("heading").filter(has_text="cover <b>4x</b>: "))
    _nav(pg, "Press fit")
    _manage(pg, "Duplicate", expect=pg.get_by_role("heading").filter(has_text="press-fit-copy: "))
    _manage(pg, "Delete press-fit-copy", expect=pg.get_by_role("heading").filter(
        has_text="press-fit: "))
    assert not pg.get_by_text("press-fit-copy").count()
    _nav(pg, "Case file and report")
    case = _download_case(pg)
    assert case.title.project == "Gear hub trial"
    assert case.names == {"pressfit": ("press-fit",), "bearing": ("bearing",),
                          "screws": ("cover <b>4x</b>",)}
    assert "case=" in pg.url
    pg.evaluate("window.__last = performance.now()")
    pg.reload(wait_until="commit", timeout=LONG)
    pg.get_by_role("heading", name="Case file and report", exact=True).wait_for(timeout=LONG)
    settle(pg)
    assert pg.get_by_role("textbox", name="Project", exact=True).input_value() == "Gear hub trial"
    again = _download_case(pg)  # everything is still there after the reload
    assert again.names == case.names and again.title.project == case.title.project
    assert casefile.evaluate(again).ok == casefile.evaluate(case).ok
    _nav(pg, "Housing screws")
    assert pg.get_by_role("heading").filter(has_text="cover <b>4x</b>: ").count()


def test_a_failing_joint_links_to_the_fit_search_with_it_selected(page, server, wait_idle):
    from fitcheck.ui import state

    doc = tomllib.loads(casefile.demo_text())
    pf = doc["pressfit"][0]
    for k in ("interference_min", "interference_max"):
        pf.pop(k, None)
    pf["fit"] = "12 mm H7/g6"  # ISO 286: a clearance fit, it cannot carry the torque
    open_page(page, server, wait_idle, "press-fit?case=" + state.encode(tomlwrite.dumps(doc)))
    page.get_by_text("no contact pressure at the loosest fit: the joint slips").wait_for(
        timeout=AFTER)
    page.get_by_role("link", name="Search fits for this joint").click()
    page.get_by_role("heading", name="Lot study and fit search", exact=True).wait_for(
        timeout=AFTER)
    page.get_by_text("Passing fits").wait_for(timeout=60_000)  # the search ran on arrival
    wait_idle(page, AFTER)
    # the search ran for the linked joint: its heading names it
    assert page.get_by_role("heading").filter(has_text=pf["name"]).filter(
        has_text="fits at").count()
    assert "case=" in page.url  # the case travels with the session


@pytest.mark.parametrize("path, title", [("fit-limits", "Fit limits"),
                                         ("case-verdict", "Case verdict")])
def test_a_direct_page_address_opens_its_page(page, server, wait_idle, path, title):
    open_page(page, server, wait_idle, path)
    assert page.get_by_role("heading", name=title, exact=True).is_visible()
    assert not page.get_by_text("Page not found").count()
    assert page.url.rstrip("/").endswith(path)


def test_the_first_visit_shows_the_headline_then_the_whole_page(page, server, wait_idle):
    """A session's first run of the press-fit page draws its verdict and headline figures only
    (``app.first_paint``) and reruns after a short pause: the unit switch, the joint picker, the
    inputs, the tables and both charts follow by themselves."""
    page.goto(f"{server}/press-fit", wait_until="commit", timeout=FIRST)
    page.get_by_test_id("stMetricValue").first.wait_for(timeout=FIRST)
    r = demo_result("pressfit", "gear-on-shaft")
    page.get_by_role("textbox", name="Torque", exact=True).wait_for(timeout=FIRST)
    page.get_by_test_id("stVegaLiteChart").nth(1).wait_for(timeout=FIRST)
    wait_idle(page, FIRST)
    assert metric_value(page, "Torque capacity, loosest") == unitsys.show(
        r.torque_capacity_min, "torque", "SI")
    assert page.get_by_role("heading", name="Checks", exact=True).is_visible()
    assert page.get_by_test_id("stVegaLiteChart").count() == 2
    assert page.get_by_test_id("stSidebar").get_by_text("inch", exact=True).is_visible()
    assert page.get_by_text("Press fit of the case").first.is_visible()
    assert page.get_by_text("Search fits for this joint").first.is_visible()


def test_the_bare_address_shows_the_fit_limits_headline_then_the_whole_page(page, server, wait_idle):
    """``/`` opens the fit-limits page; the session's first run there draws the fit's figures only
    and the inputs, the limits table and the zone chart follow by themselves."""
    page.goto(f"{server}/", wait_until="commit", timeout=FIRST)
    page.get_by_test_id("stMetricValue").first.wait_for(timeout=FIRST)
    page.get_by_role("textbox", name="Designation", exact=True).wait_for(timeout=FIRST)
    page.get_by_test_id("stVegaLiteChart").first.wait_for(timeout=FIRST)
    wait_idle(page, FIRST)
    f = fits.fit("25 H7/p6")
    assert metric_value(page, "Smallest interference") == unitsys.show(f.interference_min_um,
                                                                       "small_length", "SI")
    assert page.get_by_role("heading", name="Fit limits", exact=True).is_visible()
    assert page.get_by_test_id("stSidebar").get_by_text("inch", exact=True).is_visible()
    assert "/fit-limits" in page.url
