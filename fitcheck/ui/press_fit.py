"""Page "Press fit": does the hub carry its torque at the loosest fit and stay elastic at the tightest?

Every input of ``fitcheck.pressfit`` (``KEYS``) can be set; the fit classes can be
picked from those ISO 286 defines at the joint diameter. Shows the loosest and
tightest cases, the stresses through the wall, the capacity across the tolerance
band against the required torque, and every check with its margin.
"""

from __future__ import annotations

import streamlit as st

from fitcheck import checks, fits, pressfit
from fitcheck.errors import InputError
from fitcheck.ui import app, charts, joints, pressfit_design, state, unitsys, verdicts, widgets
from fitcheck.ui.joints import Field

TABLE, PREFIX = "pressfit", "pf"


def fields() -> list[tuple[str, list[Field]]]:
    return joints.grouped(pressfit.KEYS, [
        # the first group (open) holds what a joint is checked for; the rest opens on request
        ("Fit, size and load", [Field("fit", "Fit (ISO 286)"), "diameter", "length", "torque",
                                "axial_force", "hub_outer_diameter"]),
        ("Gear, shaft bore and given interference", ["module", "teeth", "shaft_bore",
                                                     "interference_min", "interference_max"]),
        ("Operation", ["speed", "temperature_shaft", "temperature_hub", "temperature_assembly"]),
        ("Materials and surfaces", [Field("shaft_material", material=True),
                                    Field("hub_material", material=True), "rz_shaft", "rz_hub",
                                    "smoothing_factor", "mu_slip", "mu_press"]),
        ("Assembly", [Field("assembly", "Assembly", ("press", "shrink")),
                      "press_force_limit", "temperature_shaft_cooled", "joining_clearance"]),
        ("Required safeties", ["slip_safety", "yield_safety", "fracture_safety"]),
        pressfit_design.design_group(),
    ])


@st.cache_data(show_spinner=False, max_entries=256)
def _parse_fit(text: str):
    d = fits.parse(text)
    return d, fits.valid_classes(d.nominal_mm, "hole"), fits.valid_classes(d.nominal_mm, "shaft")


def _set_class(name: str, size_text: str) -> None:
    ss = st.session_state
    hole = ss.get(f"{PREFIX}.{name}.fit.hole")
    shaft = ss.get(f"{PREFIX}.{name}.fit.shaft")
    text = f"{size_text} {hole}/{shaft}"
    ss[joints.wkey(PREFIX, name, "fit")] = text
    entry = state.joint(TABLE, name)
    if entry is not None:
        entry["fit"] = text


def _class_pickers(name: str, entry: dict) -> None:
    """Hole and shaft class of the fit, offered from the classes valid at its diameter."""
    text = entry.get("fit")
    if not isinstance(text, str):
        return
    try:
        d, holes, shafts = _parse_fit(text)
    except InputError:
        return
    if not (d.hole and d.shaft):
        return
    size_text = text.strip().split(d.hole)[0].strip()
    ss = st.session_state
    kh, ks = f"{PREFIX}.{name}.fit.hole", f"{PREFIX}.{name}.fit.shaft"
    ss[kh], ss[ks] = d.hole, d.shaft
    c = st.columns(2)
    c[0].selectbox("Hole class", holes, key=kh, on_change=_set_class, args=(name, size_text),
                   help="Classes ISO 286 defines at this diameter")
    c[1].selectbox("Shaft class", shafts, key=ks, on_change=_set_class, args=(name, size_text),
                   help="Classes ISO 286 defines at this diameter")


def render() -> None:
    app.heading("Press fit", "Torque and thrust carried at the loosest fit, stresses at the "
                "tightest, and what assembly takes — for a hub pressed or shrunk on a shaft.")
    name = joints.pick_joint(TABLE, PREFIX, "press fit")
    if name is None:
        return
    _workbench(name)


@st.fragment
def _workbench(name: str) -> None:
    """Inputs and results of one joint. An input changed here reruns only this part of the page
    (not the heading, the joint picker or the sidebar); the address is brought up to date here."""
    _body(name)
    state.sync_address()


def _body(name: str) -> None:
    groups = fields()
    entry = joints.bind(TABLE, PREFIX, name, [f for _, fs in groups for f in fs])
    jr, errors, msgs = joints.evaluate(TABLE, name)
    system = state.system()
    left, right = st.columns([2, 3], gap="large")
    # the results column is filled first, so the verdict shows while the inputs are still drawn
    with right:
        if jr is None:
            st.info("Correct the inputs marked with the error sign to see the results.")
        else:
            _summary(jr.result, system, name)
            widgets.warnings_box(msgs)
    with left:
        _class_pickers(name, entry)
        joints.draw_inputs(TABLE, PREFIX, name, groups, pressfit.KEYS, errors, expanded=1)
    if jr is not None:
        _details(jr.result, system, name)


def _summary(r: pressfit.PressFitResult, system: str, name: str) -> None:
    widgets.verdict_banner(r.ok, checks.worst(r.checks), system, checks=r.checks, table=TABLE,
                           name=name)
    if r.ok and not app.headline_only():  # the link follows with the rest of the page
        widgets.search_link(TABLE, name)
    verdicts.pressfit_states(r, system)
    st.subheader(f"{widgets.esc(r.name or 'Joint')}: {widgets.esc(r.fit or 'given interference')}, "
                 f"Ø {unitsys.show(r.diameter, 'length', system)} × "
                 f"{unitsys.show(r.length, 'length', system)}")
    gov = _governing(r, "torque_capacity", r.torque_capacity_min)
    gov_p = _governing(r, "pressure", r.pressure_min)
    as_press = "used" if r.assembly == "press" else "for comparison"
    as_shrink = "used" if r.assembly == "shrink" else "for comparison"
    widgets.figures([
        ("Torque capacity, loosest", unitsys.show(r.torque_capacity_min, "torque", system),
         f"transmissible torque at the loosest fit, governing state: {gov}"),
        ("Torque required", unitsys.show(r.torque, "torque", system)),
        ("Slip safety, loosest", unitsys.num(r.slip_safety_min, 3),
         "capacity over the load (torque and thrust combined)"),
        ("Pressure, loosest", unitsys.show(r.pressure_min, "stress", system),
         f"contact pressure at the loosest fit, governing state: {gov_p}"),
        ("Pressure, tightest", unitsys.show(r.pressure_max, "stress", system),
         "contact pressure at the tightest fit"),
        ("Hub yield safety", unitsys.num(r.hub_yield_safety, 3),
         "Rp0.2 over the largest von Mises stress at the hub bore, tightest fit"),
        ("Shaft yield safety", unitsys.num(r.shaft_yield_safety, 3)),
        ("Loosening speed", unitsys.show(r.loosening_speed, "speed", system, digits=3),
         "speed at which the loosest fit loses all its pressure"),
        ("Press-in force, largest", unitsys.show(r.press_force_max, "force", system),
         f"pressing on at the tightest fit, room temperature ({as_press})"),
        ("Hub heating temperature", unitsys.show_in(r.shrink_temperature_C, "degC", system),
         f"shrinking on: hub temperature for the tightest fit plus the joining clearance "
         f"({as_shrink})"),
    ])
    pressfit_design.show_plastic_zone(r, system)
    app.first_paint()  # a session's first run ends here; the rest follows by itself
    _capacity_chart(r, system, name)


def _governing(r: pressfit.PressFitResult, attr: str, value: float) -> str:
    """The name of the tolerance case (column of the cases table) a headline figure comes from."""
    for case in (r.loosest_governing, r.tightest_governing, r.loosest_operating, r.loosest_assembly,
                 r.tightest_operating, r.tightest_assembly):
        if case is None:
            continue
        if getattr(case, attr) == value:
            return case.label
    return "—"


def _details(r: pressfit.PressFitResult, system: str, name: str) -> None:
    st.subheader("Checks")
    widgets.show_checks(r.checks, system, key=f"{PREFIX}.checks")
    from fitcheck.ui import shaft_box
    shaft_box.render(getattr(r, "shaft", None), system, key=f"{PREFIX}.shaft")
    import pandas as pd  # here, not at the top: the verdict and the figures show before it loads

    st.subheader("Loosest and tightest")
    cases = [r.loosest_operating, r.tightest_operating, r.loosest_assembly, r.tightest_assembly]
    heads = ["loosest, operating", "tightest, operating", "loosest, assembly",
             "tightest, assembly"]
    if r.loosest_governing is not None and r.tightest_governing is not None:
        # the governing operating states first: the headline figures are theirs
        cases = [r.loosest_governing, r.tightest_governing, *cases]
        heads = ["loosest, governing state", "tightest, governing state", *heads]
    rows = [
        ("interference, measured", "interference", "small_length_mm"),
        ("interference, effective", "effective_interference", "small_length_mm"),
        ("contact pressure", "pressure", "stress"),
        ("torque capacity", "torque_capacity", "torque"),
        ("axial capacity", "axial_capacity", "force"),
        ("hub bore, tangential stress", "hub_sigma_t_bore", "stress"),
        ("hub bore, von Mises", "hub_von_mises_bore", "stress"),
        ("shaft, largest von Mises", "shaft_von_mises_max", "stress"),
    ]
    table = {"quantity": [q for q, _, _ in rows]}
    for h, case in zip(heads, cases, strict=True):
        table[h] = [_show_case(getattr(case, attr), kind, system) for _, attr, kind in rows]
    widgets.static_table(pd.DataFrame(table), key=f"{PREFIX}.cases")
    # the cases table takes the page width (seven columns); the other figures and the wall
    # stresses sit side by side below it
    left, right = st.columns([1, 1], gap="large")
    with left:
        st.subheader("Friction, hub and speeds")
        widgets.kv_table([
            ("friction μ slip / press", f"{r.mu_slip:g} / {r.mu_press:g} ({r.friction_source})"),
            ("hub outer diameter used", f"{unitsys.show(r.hub_outer_diameter, 'length', system)}"
                                        f" ({r.hub_outer_rule})"),
            ("loosening speed", unitsys.show(r.loosening_speed, "speed", system)),
            ("operating speed", unitsys.show(r.speed, "speed", system)),
            ("governing tight condition", r.governing_tight_condition),
        ], key=f"{PREFIX}.more")
    with right:
        st.subheader("Stress through the wall")
        _wall_chart(r, system, name)


def _capacity_chart(r: pressfit.PressFitResult, system: str, name: str) -> None:
    """Torque capacity across the tolerance band with the required torque (library data)."""
    import pandas as pd

    b = r.capacity_band()
    fl, ft = charts.factor("small_length", system), charts.factor("torque", system)
    df = pd.DataFrame({"interference": b["interference"] * 1000.0 * fl,
                       "torque": b["torque_capacity"] * ft, "in_band": b["in_band"],
                       "curve": "torque capacity (operating)"})
    charts.lines(df, x="interference", y="torque", series="curve", band="in_band",
                 x_title=charts.label("measured diametral interference", "small_length", system),
                 y_title=charts.label("torque", "torque", system),
                 hrules=[(b["required"] * ft,
                          f"required × slip safety {b['slip_safety_required']:g}")],
                 title="Torque capacity across the tolerance band (shaded)",
                 key=f"{PREFIX}.{name}.capacity_chart")


def _wall_chart(r: pressfit.PressFitResult, system: str, name: str) -> None:
    """Radial, tangential and von Mises stress through shaft and hub at the tightest fit."""
    import pandas as pd

    prof = r.wall_profile()
    fl, fs = charts.factor("length", system), charts.factor("stress", system)
    frames = []
    for part in ("shaft", "hub"):
        for col, text in (("sr", "radial σr"), ("st", "tangential σt"), ("vm", "von Mises σv")):
            frames.append(pd.DataFrame({"r": prof[f"r_{part}"] * fl,
                                        "stress": prof[f"{col}_{part}"] * fs,
                                        "stress component": text, "part": part}))
    rules = [(r.hub_material.Rp02 * fs, f"Rp0.2 hub ({r.hub_material.name})")]
    if r.shaft_material.Rp02 != r.hub_material.Rp02:
        rules.append((r.shaft_material.Rp02 * fs, f"Rp0.2 shaft ({r.shaft_material.name})"))
    cond = "operating" if prof["condition"] == "operating" else "room temperature, standstill"
    charts.lines(pd.concat(frames, ignore_index=True), x="r", y="stress",
                 series="stress component", detail="part", dashed=["von Mises σv"],
                 x_title=charts.label("radius r (shaft | hub)", "length", system),
                 y_title=charts.label("stress", "stress", system), hrules=rules,
                 vrules=[(r.diameter / 2.0 * fl, "joint")],
                 title=f"Tightest fit, {cond}", key=f"{PREFIX}.{name}.wall_chart",
                 colors={"radial σr": "#2b6cb0", "tangential σt": "#d97706",
                         "von Mises σv": "#c53030"})


def _show_case(value: float, kind: str, system: str) -> str:
    if kind == "small_length_mm":  # interferences are in mm in the press-fit results
        return unitsys.show_small(value, system)
    return unitsys.show(value, kind, system)


if __name__ == "__main__":
    render()
