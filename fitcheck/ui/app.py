"""The page list and the frame every page shares (state, sidebar, caution, address).

``streamlit_app.py`` calls :func:`pages` for ``st.navigation``, :func:`frame`
before the page runs and :func:`finish` after it. Each page is a module of
this package run as a script by Streamlit (it ends with
``if __name__ == "__main__": render()``), so importing it does nothing.
"""

from __future__ import annotations

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


#: Every page, in navigation order. Add a page: write fitcheck/ui/<module>.py with a render()
#: function and the __main__ guard, then add one line here (see DEVELOPERS.md).
PAGES: tuple[PageSpec, ...] = (
    PageSpec("fit_limits", "Fit limits", "fit-limits", ":material/straighten:", "Joints"),
    PageSpec("press_fit", "Press fit", "press-fit", ":material/compress:", "Joints"),
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


def frame() -> None:
    """Before a page: open the working case, draw the sidebar (unit system, case name)."""
    st.html(STYLE)
    state.init()
    ss = st.session_state
    with st.sidebar:
        ss.setdefault("ui.units", state.system())
        st.segmented_control("Units", unitsys.SYSTEMS, key="ui.units", on_change=state.switch_units,
                             required=True, help="Inputs and results in SI (mm, N, MPa, N·m) or "
                             "inch units (in, lbf, ksi, lbf·in). Inputs are rewritten in the "
                             "new units; switching back restores what you typed.")
        title = state.doc().get("title", {})
        if isinstance(title, dict) and title:
            parts = [str(title.get(k, "")) for k in ("project", "part") if title.get(k)]
            rev = title.get("revision")
            st.caption("Open case: **" + " — ".join(widgets.esc(p) for p in parts) + "**"
                       + (f", rev. {widgets.esc(rev)}" if rev else ""))
        st.caption(f"fitcheck {fitcheck.__version__}")


#: Session key: True once a session's first run has ended after its headline (:func:`first_paint`).
FIRST_PAINT = "ui.first_paint"


def first_paint() -> None:
    """Call after a page's verdict and headline figures: on a session's first run, end the run
    there with a full rerun at once, which draws the whole page (inputs, tables, charts).

    A session's first run also loads the table and chart libraries and draws every element kind
    for the first time; ending it after the headline sends the verdict and the figures to the
    browser first, and the rest follows in the next run (already loaded, from the cached result).
    Not without a browser: a headless ``AppTest`` reads a page in one run.
    """
    ss = st.session_state
    # a session without a browser behind it (a headless AppTest has no request headers) draws the
    # whole page in one run
    if ss.get(FIRST_PAINT) or not st.context.headers.get("Host"):
        return
    ss[FIRST_PAINT] = True
    if ss.get(state.NOTICE_SHOWN):  # the next run shows this run's one-off message again
        ss[state.NOTICE] = ss[state.NOTICE_SHOWN]
    state.sync_address()
    st.rerun()


def finish() -> None:
    """After a page: keep the case and the unit system in the address (a reload keeps the work)."""
    state.sync_address()


def heading(title: str, lead: str) -> None:
    """The page heading, its one-line purpose and the caution."""
    from fitcheck.ui import widgets

    st.title(title)
    st.caption(lead)
    widgets.caution()
    widgets.notice()
