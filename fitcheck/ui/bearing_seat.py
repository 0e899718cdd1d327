"""Page "Bearing seats": designation and load case, suggested seat classes, clearance budget.

Every input of ``fitcheck.bearings`` (``KEYS``) can be set; the seat classes
suggested for the load case (DIN 5425-1) are shown beside the chosen ones, and the
operating radial clearance is traced from the initial clearance through fit-up
and thermal losses.
"""

from __future__ import annotations

import math

import streamlit as st

from fitcheck import bearings, checks
from fitcheck.errors import InputError
from fitcheck.ui import app, charts, joints, state, unitsys, verdicts, widgets
from fitcheck.ui.joints import Field

TABLE, PREFIX = "bearing", "br"


def fields() -> list[tuple[str, list[Field]]]:
    return joints.grouped(bearings.KEYS, [
        ("Bearing and load", [
            Field("designation", "Designation (ISO 15)", tuple(bearings.designations())),
            Field("load", "Load case", bearings.LOAD_CASES),
            Field("load_level", "Load level", bearings.LOAD_LEVELS),
            Field("load_ratio", "Load ratio P/C"),
            Field("tolerance_class", "Tolerance class (ISO 492)", bearings.TOLERANCE_CLASSES),
            Field("clearance_group", "Clearance group (ISO 5753-1)", bearings.CLEARANCE_GROUPS)]),
        ("Seats", [Field("shaft", "Shaft seat class"), Field("housing", "Housing seat class"),
                   "rz_shaft", "rz_housing", "rz_ring"]),
        ("Shaft and housing", [Field("shaft_material", material=True),
                               Field("housing_material", material=True),
                               "housing_outer_diameter", "housing_wall", "shaft_bore"]),
        ("Temperatures", ["temperature_assembly", "temperature_inner", "temperature_outer",
                          "temperature_shaft", "temperature_housing"]),
        ("Axial location and limits", [
            "axial_force", Field("axial_location", "Axial location", bearings.AXIAL_LOCATIONS),
            "friction", "clearance_min", "hoop_stress_limit"]),
    ])


def _use_suggested(name: str, shaft: str, housing: str) -> None:
    entry = state.joint(TABLE, name)
    if entry is None:
        return
    entry["shaft"], entry["housing"] = shaft, housing
    ss = st.session_state
    ss[joints.wkey(PREFIX, name, "shaft")] = shaft
    ss[joints.wkey(PREFIX, name, "housing")] = housing


def render() -> None:
    app.heading("Bearing seats", "Seat classes of a rolling bearing on its shaft and in its "
                "housing, and the radial clearance left in operation.")
    name = joints.pick_joint(TABLE, PREFIX, "bearing seat")
    if name is None:
        return
    groups = fields()
    entry = joints.bind(TABLE, PREFIX, name, [f for _, fs in groups for f in fs])
    jr, errors, msgs = joints.evaluate(TABLE, name)
    system = state.system()
    left, right = st.columns([2, 3], gap="large")
    with left:
        joints.draw_inputs(TABLE, PREFIX, name, groups, bearings.KEYS, errors)
    with right:
        _suggestion(name, entry)
        if jr is None:
            st.info("Correct the inputs marked with the error sign to see the results.")
            return
        _results(jr.result, system, name)
        widgets.warnings_box(msgs)
    _details(jr.result, system, name)


def _suggestion(name: str, entry: dict) -> None:
    try:
        rec = bearings.recommend_seats(entry.get("designation", ""),
                                       load=entry.get("load", "rotating_inner"),
                                       load_level=entry.get("load_level"),
                                       load_ratio=entry.get("load_ratio"),
                                       housing_material=entry.get("housing_material", "C45E"))
    except InputError:
        return  # the field errors already say what is wrong
    with st.container(border=True):
        st.markdown(f"**Suggested seats** for {widgets.esc(rec.designation)}, {rec.load.replace('_', ' ')} "
                    f"load, {rec.load_level} level, {rec.housing_group} housing: "
                    f"shaft **{rec.shaft}**, housing **{rec.housing}**")
        for n in rec.notes:
            st.caption(widgets.esc(n))
        st.caption(rec.reference)
        chosen = (entry.get("shaft", "auto"), entry.get("housing", "auto"))
        if chosen != (rec.shaft, rec.housing):
            st.button("Use the suggested seats", key=f"{PREFIX}.{name}.use_suggested",
                      on_click=_use_suggested, args=(name, rec.shaft, rec.housing))


def _results(r: bearings.BearingSeatResult, system: str, name: str) -> None:
    widgets.verdict_banner(r.ok, checks.worst(r.checks), system, checks=r.checks, table=TABLE,
                           name=name)
    if r.ok:
        widgets.search_link(TABLE, name)
    st.subheader(f"{widgets.esc(r.designation)}: shaft {widgets.esc(r.shaft_class)}, "
                 f"housing {widgets.esc(r.housing_class)}")
    verdicts.bearing_clearance(r, system)
    c = st.columns(2)
    c[0].metric("Operating clearance", unitsys.show_range(r.operating_clearance_um, "small_length",
                                                          system, digits=3),
                help="radial internal clearance in operation, tightest … loosest pairing")
    c[1].metric("Smallest group that passes", r.smallest_passing_group or "none",
                help="ISO 5753-1 clearance group whose operating clearance stays above the limit")
    c = st.columns(2)
    c[0].metric("Inner ring interference", unitsys.show_range(r.shaft_interference_um,
                                                              "small_length", system),
                help="ring bore on its shaft seat, smallest … largest, before smoothing")
    c[1].metric("Outer ring clearance", unitsys.show_range(r.housing_clearance_um, "small_length",
                                                           system),
                help="ring in its housing bore, smallest … largest (negative: interference)")
    _budget_chart(r, system, name)


def _budget_chart(r: bearings.BearingSeatResult, system: str, name: str) -> None:
    """Radial clearance from initial through fit-up and thermal to operating (library steps)."""
    steps = bearings.clearance_budget(r)
    if not all(math.isfinite(v) for s in steps.values() for v in s):
        st.caption("No clearance budget: ISO 5753-1 groups do not apply to this bearing type.")
        return
    f = charts.factor("small_length", system)  # the steps are in µm, the core unit of small lengths
    rows = []
    for key, group in (("min", "tightest pairing"), ("max", "loosest pairing")):
        s = steps[key]
        for stage, a, b in zip(bearings.BUDGET_STAGES, (0.0, s[0], s[1], 0.0), s, strict=True):
            rows.append({"stage": stage, "pairing": group, "from": a * f, "to": b * f})
    lim = r.clearance_min_um * f
    import pandas as pd  # here, not at the top: the verdict and the figures show before it loads

    charts.waterfall(pd.DataFrame(rows), stage="stage", group="pairing", start="from", end="to",
                     order=bearings.BUDGET_STAGES, y_title=charts.label("radial clearance", "small_length", system),
                     hrules=[(lim, "limit")] if lim else [],
                     colors={"tightest pairing": "#b5472f", "loosest pairing": "#3b6ea5"},
                     title=f"Clearance budget, group {r.clearance_group}",
                     key=f"{PREFIX}.{name}.budget_chart")


def _details(r: bearings.BearingSeatResult, system: str, name: str) -> None:
    um = lambda p: unitsys.show_range(p, "small_length", system)  # noqa: E731
    st.subheader("Checks")
    widgets.show_checks(r.checks, system, key=f"{PREFIX}.checks")
    for n in r.notes:
        st.caption("• " + widgets.esc(widgets.prose(n, system)))
    from fitcheck.ui import shaft_box
    shaft_box.render(getattr(r, "shaft", None), system, key=f"{PREFIX}.shaft", notes=False)
    st.subheader("Clearance budget")
    widgets.kv_table([
        (f"initial clearance, group {r.clearance_group}", um(r.initial_clearance_um)),
        ("loss at fit-up", um(r.fitup_reduction_um)),
        ("after fit-up", um(r.clearance_after_fitup_um)),
        ("thermal loss", um(r.thermal_reduction_um)),
        ("operating clearance", um(r.operating_clearance_um)),
        ("contact pressure, inner ring", unitsys.show_range(r.contact_pressure_inner_MPa, "stress",
                                                            system)),
        ("contact pressure, outer ring", unitsys.show_range(r.contact_pressure_outer_MPa, "stress",
                                                            system)),
    ], key=f"{PREFIX}.budget")


if __name__ == "__main__":
    render()
