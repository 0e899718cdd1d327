"""Page "Case verdict": every joint of the working case on one screen, worst margin first.

Each joint is checked and evaluated on its own (``fitcheck.case``), so one joint
with a bad input does not hide the verdicts of the others; it is listed with its
input problems instead.
"""

from __future__ import annotations

import math

import pandas as pd
import streamlit as st

from fitcheck import case as casefile
from fitcheck.case import CaseCheck
from fitcheck.ui import app, joints, state, unitsys, widgets

PAGE_OF = {"pressfit": "press_fit", "bearing": "bearing_seat", "screws": "housing_screws"}


def evaluate_all():
    """``(joint results, {label: [InputError]}, {label: [warnings]})`` of the whole working case."""
    results, problems, notes = [], {}, {}
    for table in casefile.ENGINES:
        for name in joints.names(table):
            jr, errs, msgs = joints.evaluate(table, name)
            label = casefile.joint_label(table, name)
            if jr is None:
                problems[label] = errs
            else:
                results.append(jr)
            if msgs:
                notes[label] = msgs
    return results, problems, notes


def render() -> None:
    app.heading("Case verdict", "Every joint of the open case at once: the weakest check "
                "first.")
    system = state.system()
    results, problems, notes = evaluate_all()
    checks = sorted((CaseCheck(j.name, j.table, c) for j in results for c in j.checks),
                    key=lambda c: (c.margin, c.label, c.check.name))
    n_joints = len(results) + len(problems)
    if n_joints == 0:
        st.info("The open case has no joints. Add them on the pages *Press fit*, *Bearing seats* "
                "and *Housing screws*, or open a case file on the page *Case file and report*.")
        return
    failed = [c for c in checks if not c.passed]
    ok = bool(checks) and not failed and not problems
    worst = checks[0] if checks else None
    if problems and not failed:
        st.error(f"{len(problems)} joint(s) cannot be checked until their inputs are corrected: "
                 + ", ".join(widgets.esc(p) for p in problems) + ". Of the others, every check holds.",
                 icon=":material/cancel:")
    else:
        widgets.verdict_banner(ok, worst, system)
    c = st.columns(4)
    c[0].metric("Joints", n_joints)
    c[1].metric("Checks", len(checks))
    c[2].metric("Failing checks", len(failed))
    c[3].metric("Joints with input problems", len(problems))

    _failing_joints(results, system)

    if problems:
        st.subheader("Joints that cannot be checked")
        for label, errs in problems.items():
            with st.container(border=True):
                st.markdown(f"**{widgets.esc(label)}** — correct these inputs on its page:")
                for e in errs:
                    st.error(widgets.error_text(e), icon=":material/error:")

    st.subheader("Joints, weakest first")
    rows = []
    for j in sorted(results, key=lambda j: min((c.margin for c in j.checks), default=math.inf)):
        w = min(j.checks, key=lambda c: c.margin) if j.checks else None
        rows.append({
            "joint": j.label,
            "kind": casefile.ENGINES[j.table].label,
            "verdict": widgets.PASS if j.ok else widgets.FAIL,
            "weakest check": w.name if w else "—",
            "margin": "—" if w is None else unitsys.margin_text(w.margin),
            "checks failing": sum(not c.passed for c in j.checks),
        })
    widgets.static_table(pd.DataFrame(rows), key="cv.joints")

    st.subheader("All checks, worst margin first")
    widgets.static_table(widgets.checks_table(checks, system), key="cv.checks")
    for label, msgs in notes.items():
        widgets.warnings_box([f"{label}: {m}" for m in msgs])


def _weakest(j) -> float:
    return min((c.margin for c in j.checks), default=math.inf)


def _failing_joints(results, system: str) -> None:
    """Every failing joint with each failing check, the library's cause and next step
    (:mod:`fitcheck.advice`) and, for press fits and bearing seats, the link that opens the fit
    (or seat) search with that joint selected."""
    bad = sorted((j for j in results if not j.ok), key=_weakest)
    if not bad:
        return
    st.subheader("Failing joints: why, and what to try")
    for j in bad:
        widgets.verdict_banner(False, None, system, checks=j.checks, table=j.table, name=j.name,
                               joint=j.label)


if __name__ == "__main__":
    render()
