"""The page list and the frame every page shares (state, sidebar, caution, address).

``streamlit_app.py`` calls :func:`pages` for ``st.navigation``, :func:`frame`
before the page runs and :func:`finish` after it. Each page is a module of
this package run as a script by Streamlit (it ends with
``if __name__ == "__main__": render()``), so importing it does nothing.
"""

from __future__ import annotations

import time
from dataclasses import dataclass
from pathlib import Path

import streamlit as st

import fitcheck
from fitcheck.ui import state, unitsys, widgets

HERE = Path(__file__).parent


@dataclass(frozen=True)
class PageSpec:
    module: str      # file in fitcheck/ui/ (without .py)
    title: str       # shown in the navigation and as the page heading
    url_path: str    # the page's address
    icon: str
    section: str
    #: a session whose first run opens this page sees the verdict and headline figures first
    #: (:func:`first_paint`, called by the page)
    headline_first: bool = False


#: Every page, in navigation order. Add a page: write fitcheck/ui/<module>.py with a render()
#: function and the __main__ guard, then add one line here (see DEVELOPERS.md).
PAGES: tuple[PageSpec, ...] = (
    PageSpec("fit_limits", "Fit limits", "fit-limits", ":material/straighten:", "Joints",
             headline_first=True),
    PageSpec("press_fit", "Press fit", "press-fit", ":material/compress:", "Joints",
             headline_first=True),
    PageSpec("bearing_seat", "Bearing seats", "bearing-seats", ":material/radio_button_checked:",
             "Joints"),
    PageSpec("housing_screws", "Housing screws", "housing-screws", ":material/hardware:", "Joints"),
    PageSpec("lot_study", "Lot study and fit search", "lot-study", ":material/query_stats:",
             "Studies"),
    PageSpec("whole_case", "Case verdict", "case-verdict", ":material/fact_check:", "Case"),
    PageSpec("case_file", "Case file and report", "case-file", ":material/description:", "Case"),
)


def available() -> list[PageSpec]:
    """The pages whose module is present (all of them in a complete installation)."""
    return [p for p in PAGES if (HERE / f"{p.module}.py").is_file()]


def pages() -> dict[str, list]:
    """``st.Page`` objects by section, for ``st.navigation``.

    The address without a page (``/``) is a hidden page that opens the first page under its own
    address, so every page, the first included, opens from its direct address (``/fit-limits``).
    """
    out: dict[str, list] = {"": [st.Page(_start, title="fitcheck", url_path="start", default=True,
                                         visibility="hidden")]}
    for p in available():
        out.setdefault(p.section, []).append(
            st.Page(HERE / f"{p.module}.py", title=p.title, url_path=p.url_path, icon=p.icon))
    return out


def _start() -> None:
    """The bare address: go on to the first page, keeping the address's parameters (case, units)."""
    first = available()[0]
    st.switch_page(HERE / f"{first.module}.py", query_params=dict(st.query_params))


#: Metric cards wrap a long value or label instead of cutting it off; static tables wrap text.
STYLE = """<style>
[data-testid="stMetricValue"] > div, [data-testid="stMetricLabel"] > div,
[data-testid="stMetricLabel"] p {white-space: normal !important; overflow: visible !important;
  text-overflow: clip !important; overflow-wrap: anywhere;}
[data-testid="stMetricValue"] {font-size: 1.55rem; line-height: 1.25;}
[data-testid="stTable"] td, [data-testid="stTable"] th {white-space: normal; overflow-wrap: anywhere;}
table.fc-table {width: 100%; border-collapse: collapse; font-size: 0.875rem; margin-bottom: 0.5rem;}
table.fc-table th, table.fc-table td {border: 1px solid rgba(49, 51, 63, 0.1); padding: 0.25rem 0.5rem;
  text-align: left; vertical-align: top; white-space: normal; overflow-wrap: break-word;
  word-break: normal; hyphens: none;}
table.fc-table td.fc-nw {white-space: nowrap;} div.fc-box {overflow-x: auto; max-width: 100%;}
table.fc-table th {font-weight: 400; color: rgba(49, 51, 63, 0.6);}
.fc-pass {color: #177233; font-weight: 600;} .fc-fail {color: #bd2b2b; font-weight: 600;}
</style>"""


def frame(page=None) -> None:
    """Before a page: open the working case, draw the sidebar (unit system, case name).

    ``page`` is the ``st.Page`` about to run (from ``st.navigation``): on a session's first run
    of a page that shows its headline first, this run draws no more than the headline
    (:func:`headline_only`)."""
    st.html(STYLE)
    state.init()
    ss = st.session_state
    _plan_first_paint(page)
    ss.setdefault("ui.units", state.system())
    with st.sidebar:
        if not headline_only():  # the unit switch follows with the rest of the page
            st.segmented_control("Units", unitsys.SYSTEMS, key="ui.units",
                                 on_change=state.switch_units, required=True,
                                 help="Inputs and results in SI (mm, N, MPa, N·m) or inch units "
                                 "(in, lbf, ksi, lbf·in). Inputs are rewritten in the new units; "
                                 "switching back restores what you typed.")
        title = state.doc().get("title", {})
        if isinstance(title, dict) and title:
            parts = [str(title.get(k, "")) for k in ("project", "part") if title.get(k)]
            rev = title.get("revision")
            st.caption("Open case: **" + " — ".join(widgets.esc(p) for p in parts) + "**"
                       + (f", rev. {widgets.esc(rev)}" if rev else ""))
        st.caption(f"fitcheck {fitcheck.__version__}")


#: Session key: set by a session's first run (:func:`frame`).
SEEN = "ui.first_run_done"
#: Session key: True while this run is a session's first run that draws only the headline.
HEADLINE_ONLY = "ui.headline_only"
#: Pause [s] between a headline-only run and the run that draws the whole page. The whole page
#: imports the table and chart libraries and sends about forty elements (≈ 0.5 s of server CPU,
#: then as much browser work); started at once, it competed with the browser still loading and
#: drawing the headline's elements, and the figures showed 0.2-0.7 s later.
FIRST_PAINT_PAUSE_S = 0.25


def _plan_first_paint(page) -> None:
    """Decide, at the top of each run, whether it draws only the headline: a session's first run
    (with a browser behind it: a headless ``AppTest`` has no request headers and reads a page in
    one run) of a page whose :class:`PageSpec` says ``headline_first``. The bare address's hidden
    start page draws nothing and does not count: the page it opens is the session's first."""
    ss = st.session_state
    url = getattr(page, "url_path", None)
    spec = next((p for p in PAGES if p.url_path == url), None)
    if spec is None:
        ss[HEADLINE_ONLY] = False
        return
    first = not ss.get(SEEN)
    ss[SEEN] = True
    ss[HEADLINE_ONLY] = bool(first and spec.headline_first and _has_browser())


_pause = time.sleep  # the pause after a headline-only run (a test records it instead)


def _has_browser() -> bool:
    """Whether a browser is behind this session (a headless ``AppTest`` sends no headers)."""
    return bool(st.context.headers.get("Host"))


def headline_only() -> bool:
    """True when this run draws only the page's verdict and headline figures (a session's first
    run of a ``headline_first`` page): controls that are not needed to read them (the unit switch,
    the joint picker, links) are left to the next run, which follows by itself."""
    return bool(st.session_state.get(HEADLINE_ONLY))


def first_paint() -> None:
    """Call after a page's verdict and headline figures: in a headline-only run
    (:func:`headline_only`) the run ends here and, after a short pause, reruns in full (inputs,
    tables, charts); otherwise nothing happens.

    A session's first run also imports the library and draws every element kind for the first
    time. Ending it after the headline sends the verdict and the figures to the browser first,
    with only the element kinds they need; the pause (:data:`FIRST_PAINT_PAUSE_S`) leaves the
    server and the processor to the browser while it loads and draws them, and the rest follows
    in the next run (the result is cached).
    """
    ss = st.session_state
    if not ss.get(HEADLINE_ONLY):
        return
    ss[HEADLINE_ONLY] = False
    if ss.get(state.NOTICE_SHOWN):  # the next run shows this run's one-off message again
        ss[state.NOTICE] = ss[state.NOTICE_SHOWN]
    state.sync_address()
    _pause(FIRST_PAINT_PAUSE_S)
    st.rerun()


def finish() -> None:
    """After a page: keep the case and the unit system in the address (a reload keeps the work).

    A headline-only run whose page ended before its headline (an input error, a case without a
    joint of the page's kind) reruns at once, so the controls it left out are drawn."""
    ss = st.session_state
    if ss.get(HEADLINE_ONLY):
        ss[HEADLINE_ONLY] = False
        st.rerun()
    state.sync_address()


def heading(title: str, lead: str) -> None:
    """The page heading, its one-line purpose and the caution."""
    from fitcheck.ui import widgets

    st.title(title)
    st.caption(lead)
    widgets.caution()
    widgets.notice()
