"""A small box "Shaft at the hub edge" for the Press fit and Bearing seats pages.

Shows what :mod:`fitcheck.shaft` computed for one seat (DIN 743): the two safeties, the notch
factors and every load used. No arithmetic here; the pages call :func:`render` with the
result's ``shaft`` attribute.
"""

from __future__ import annotations

import streamlit as st

from fitcheck import display
from fitcheck.ui import widgets


def render(res, system: str, key: str, notes: bool = True) -> None:
    """Draw the box for one :class:`fitcheck.shaft.ShaftSeatResult` (nothing if ``None``)."""
    if res is None:
        return
    with st.container(border=True):
        st.markdown("**Shaft at the hub edge (DIN 743)**")
        widgets.figures([
            ("Fatigue safety", display.num(res.fatigue_safety, 3),
             f"required ≥ {res.fatigue_safety_required:g}"),
            ("Yield safety", display.num(res.static_safety, 3),
             f"required ≥ {res.static_safety_required:g}"),
            ("Notch factor βσ", display.num(res.notch_factor_bending, 3),
             "press fit, bending, at the seat diameter"),
            ("Notch factor βτ", display.num(res.notch_factor_torsion, 3),
             "press fit, torsion, at the seat diameter"),
        ], width=160)
        rows = [(name, display.show(v, kind, system) if kind != "dimensionless" else display.num(v, 3))
                for name, v, kind in res.loads()]
        rows.append(("loads from", res.load_source))
        widgets.kv_table(rows, key=key)
        if notes and res.notes:
            st.caption("  \n".join("• " + n for n in res.notes))
