"""Inch additions to two pages, kept in one small module the pages call with one line each:

* ``demo_button()`` on the case page: open the inch demo (gearhead of a small lab winch,
  ASME B4.1 fits, UNC screws) and switch the units to inch;
* ``ansi_section(show_fit)`` on the fit-limits page: an ASME B4.1 class of fit (RC, LC, LT,
  LN, FN) at a nominal size, shown with the page's own fit display.

No computation here: the limits come from :func:`fitcheck.fits.ansi_fit`.
"""

from __future__ import annotations

import streamlit as st

from fitcheck import case as casefile
from fitcheck import fits
from fitcheck.errors import InputError
from fitcheck.tomlread import read_toml_bytes
from fitcheck.ui import state, widgets

K_SIZE, K_CLASS = "fl.ansi_size", "fl.ansi_class"


def _open_inch_demo() -> None:
    doc = read_toml_bytes(casefile.demo_text(inch=True).encode("utf-8"), "inch demo case")
    state.replace_doc(doc)
    st.session_state[state.UNITS] = "inch"
    st.session_state["ui.units"] = "inch"
    st.session_state["cf.opened"] = "the inch demo case (gearhead of a small lab winch)"


def demo_button() -> None:
    """A button on the case page that opens the inch demo."""
    st.button("Open the inch demo case", key="cf.demo_inch", on_click=_open_inch_demo,
              help="Replaces the open case with the inch demo (gearhead of a small lab winch: "
              "ASME B4.1 press fits, a ball-bearing seat, 1/4-20 UNC cover screws) and switches "
              "the units to inch. Download your case first to keep it.")


@st.cache_data(show_spinner=False, max_entries=256)
def _ansi_fit(size: str, cls: str) -> fits.Fit:
    return fits.ansi_fit(size, cls)


@st.cache_data(show_spinner=False, max_entries=64)
def _ansi_classes(size: str) -> list[str]:
    from fitcheck.units import to_core
    return fits.ansi_classes(to_core(size, "length", "nominal size", lo=0.0, lo_open=True))


def ansi_section(show_fit, system: str) -> None:
    """An expander with an ASME B4.1 class of fit at a nominal size (inch tables)."""
    ss = st.session_state
    with st.expander("ASME B4.1 inch fits (RC, LC, LT, LN, FN)", expanded=system == "inch"):
        c1, c2 = st.columns([1, 1])
        ss.setdefault(K_SIZE, "1 in")
        with c1:
            st.text_input("Nominal size", key=K_SIZE,
                          help="Basic size with its unit, e.g. '1 in', '0.750 in' or '25.4 mm'; "
                          "the tables run up to 19.69 in.")
        try:
            classes = _ansi_classes(ss[K_SIZE])
        except InputError as e:
            st.error(widgets.error_text(e), icon=":material/error:")
            return
        if ss.get(K_CLASS) not in classes:
            ss[K_CLASS] = "FN2" if "FN2" in classes else (classes[0] if classes else None)
        with c2:
            st.selectbox("Class of fit", classes, key=K_CLASS,
                         help="Classes ASME B4.1 tabulates at this size: running and sliding RC, "
                         "locational clearance LC, transition LT, interference LN, force and shrink FN.")
        if not ss.get(K_CLASS):
            st.info("No ASME B4.1 class is tabulated at this size.")
            return
        try:
            f = _ansi_fit(ss[K_SIZE], ss[K_CLASS])
        except InputError as e:
            st.error(widgets.error_text(e), icon=":material/error:")
            return
        show_fit(f, system)
        st.caption(f"Source: {f.source}. In a case file: `fit = \"{f.designation}\"`.")
