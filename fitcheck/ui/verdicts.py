"""Governing operating state and the clearance verdict by probable combination, for the pages.

Small and self-contained so the pages call it with one line. Computes nothing: it shows the
fields of :class:`fitcheck.pressfit.PressFitResult` and :class:`fitcheck.bearings.BearingSeatResult`.
"""

from __future__ import annotations

import math

import streamlit as st

from fitcheck import display
from fitcheck.ui import widgets


def pressfit_states(r, system: str = "SI") -> None:
    """The verdict's cause and next step, and the state governing each side of the joint."""
    lines = []
    if getattr(r, "headline", ""):
        lines.append(widgets.esc(widgets.prose(r.headline, system)))
    if getattr(r, "governing_loose_state", ""):
        lines.append(f"Loosest: {r.governing_loose_state} · tightest (hub): "
                     f"{r.governing_tight_state} · loosening speed: {r.loosening_speed_text}")
    if lines:
        st.caption("  \n".join(lines))  # one element: a rerun redraws fewer


def bearing_clearance(r, system: str) -> None:
    """Mean clearance (the verdict), the probable range and P(clearance < limit), with its state."""
    if getattr(r, "headline", ""):
        st.caption(widgets.esc(widgets.prose(r.headline, system)))
    if not math.isfinite(getattr(r, "clearance_mean_um", math.nan)):
        return

    def um(x):
        return display.show_small(x / 1000.0, system)
    c = st.columns(3)
    c[0].metric("Mean operating clearance", um(r.clearance_mean_um),
                help=f"every tolerance at its mean; the verdict. Governing state: {r.clearance_state}")
    c[1].metric("At max. probable interference", um(r.clearance_probable_min_um),
                help="each seat at mean + ½·√(T_ring² + T_seat²), the group at its mean clearance")
    c[2].metric(f"P(clearance < {um(r.clearance_min_um)})", f"{100 * r.clearance_probability_below:.1f} %",
                help=f"σ {um(r.clearance_sigma_um)} ({r.clearance_distribution} bands); worst case "
                     f"{um(r.clearance_worst_case_um)} (information)")
