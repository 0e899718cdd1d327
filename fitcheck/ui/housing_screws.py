"""Page "Housing screws": thread, class, head, clamped layers, loads and pattern (VDI 2230-1).

Shows the permissible assembly preload, the tightening torque and its range over
the friction band, every check with its margin and the joint diagram.
"""

from __future__ import annotations

import copy

import streamlit as st

from fitcheck import checks, materials, screws, threads
from fitcheck.ui import app, charts, joints, state, unitsys, widgets
from fitcheck.ui.joints import Field

TABLE, PREFIX = "screws", "sc"
LAYERS = "layers"


def fields() -> list[tuple[str, list[Field]]]:
    return joints.grouped({k: v for k, v in screws.KEYS.items() if k != LAYERS}, [
        ("Screw", [Field("thread", "Thread", kind="text"),
                   Field("property_class", "Property class", tuple(threads.property_class_names()),
                         kind="text"),
                   Field("head", "Head", threads.HEAD_TYPES),
                   Field("hole", "Clearance hole", kind="text"),
                   Field("washer", "Washer under the head", ("true", "false"), kind="bool"),
                   Field("joint", "Joint", ("tapped", "through"))]),
        ("Clamped parts", ["engagement", Field("housing_material", material=True), "rz",
                           "shank_length", "clamp_outer_diameter"]),
        ("Pattern and loads", ["count", "bolt_circle", Field("positions", kind="list"),
                               "axial_force", "transverse_force", "tilting_moment",
                               "torque_about_axis", "clamp_force_required"]),
        ("Friction and tightening", [
            Field("tightening", "Tightening method", tuple(threads.tightening_methods())),
            Field("mu_thread", "Thread friction μG", kind="list"),
            Field("mu_head", "Head friction μK", kind="list"),
            "mu_interface", "slip_interfaces", "utilisation", "load_introduction"]),
        ("Eccentric joint and gasket", ["clamp_eccentricity", "load_eccentricity", "interface_depth",
                                        "interface_width", "gasket_thickness", "gasket_modulus",
                                        "gasket_stiffness", "gasket_settling", "gasket_seating_pressure",
                                        "gasket_area", "gasket_alpha"]),
        ("Temperatures and fatigue", ["temperature_assembly", "temperature_min", "temperature_max",
                                      Field("rolled_after_heat_treatment",
                                            "Rolled after heat treatment", ("true", "false"),
                                            kind="bool")]),
    ])


# --------------------------------------------------------------------------- clamped layers

def _layer_keys(name: str) -> tuple[str, str]:
    return f"{PREFIX}.{name}.layers.base", f"{PREFIX}.{name}.layers.editor"


def _layer_rows(layers) -> list[dict]:
    rows = []
    for layer in layers if isinstance(layers, list) else []:
        if not isinstance(layer, dict):
            continue
        mat = layer.get("material")
        rows.append({"thickness": widgets.as_text(layer.get("thickness", "")),
                     "material": mat if isinstance(mat, str) else widgets.INLINE})
    return rows


def bind_layers(name: str, entry: dict) -> None:
    """Apply the edits of the layer table (held by Streamlit) to the document before evaluating."""
    ss = st.session_state
    base_key, ed_key = _layer_keys(name)
    if ed_key not in ss or base_key not in ss:
        ss[base_key] = copy.deepcopy(entry.get(LAYERS, []))
        return
    base = ss[base_key] if isinstance(ss[base_key], list) else []
    edits = ss[ed_key]
    rows = [dict(r, _i=i) for i, r in enumerate(_layer_rows(base))]
    for i, change in (edits.get("edited_rows") or {}).items():
        if int(i) < len(rows):
            rows[int(i)].update(change)
    deleted = {int(i) for i in edits.get("deleted_rows") or []}
    rows = [r for r in rows if r["_i"] not in deleted]
    rows += [dict(r, _i=None) for r in edits.get("added_rows") or []]
    layers = []
    for r in rows:
        thickness = str(r.get("thickness") or "").strip()
        mat = r.get("material") or ""
        if not thickness and not mat:
            continue
        layer = {"thickness": thickness} if thickness else {}
        if mat == widgets.INLINE and r["_i"] is not None:
            layer["material"] = base[r["_i"]].get("material")
        elif mat:
            layer["material"] = mat
        layers.append(layer)
    if layers != entry.get(LAYERS):
        if layers:
            entry[LAYERS] = layers
        else:
            entry.pop(LAYERS, None)


def draw_layers(name: str, errors) -> None:
    base_key, ed_key = _layer_keys(name)
    base = st.session_state.get(base_key, [])
    import pandas as pd  # here, not at the top: the verdict and the figures show before it loads

    df = pd.DataFrame(_layer_rows(base), columns=["thickness", "material"])
    st.markdown("**Clamped layers** (from under the head down)")
    st.data_editor(df, key=ed_key, num_rows="dynamic", hide_index=True, width="stretch",
                   column_config={
                       "thickness": st.column_config.TextColumn("thickness", required=True,
                                                                help="with its unit, e.g. '6 mm'"),
                       "material": st.column_config.SelectboxColumn(
                           "material", options=[*materials.names(), widgets.INLINE], required=True),
                   })
    for e in errors:
        st.error(widgets.error_text(e), icon=":material/error:")


# --------------------------------------------------------------------------- page

def render() -> None:
    app.heading("Housing screws", "Preload, tightening torque and the checks of a screwed "
                "joint after VDI 2230-1: cover or flange screws tapped into a housing or "
                "through-bolted.")
    name = joints.pick_joint(TABLE, PREFIX, "screw joint")
    if name is None:
        return
    groups = fields()
    entry = joints.bind(TABLE, PREFIX, name, [f for _, fs in groups for f in fs])
    bind_layers(name, entry)
    jr, errors, msgs = joints.evaluate(TABLE, name)
    system = state.system()
    label = f"{TABLE}[{name}]"
    layer_errors = [e for e in errors if e.field.startswith(f"{label}.{LAYERS}")]
    others = [e for e in errors if e not in layer_errors]
    left, right = st.columns([2, 3], gap="large")
    with left:
        draw_layers(name, layer_errors)
        joints.draw_inputs(TABLE, PREFIX, name, groups, screws.KEYS, others)
    if jr is None:
        with right:
            st.info("Correct the inputs marked with the error sign to see the results.")
        return
    r = jr.result
    with right:
        _summary(r, system, name)
        widgets.warnings_box(msgs)
    _details(r, system, name)


def _summary(r: screws.ScrewJointResult, system: str, name: str) -> None:
    widgets.verdict_banner(r.ok, checks.worst(r.checks), system, checks=r.checks, table=TABLE,
                           name=name)
    st.subheader(f"{widgets.esc(r.name or 'Joint')}: {widgets.esc(r.thread)} – "
                 f"{widgets.esc(r.property_class)}")
    st.markdown(f"**{widgets.esc(unitsys.words(r.tightening_instruction))}**")
    f = lambda x: unitsys.show(x, "force", system)  # noqa: E731
    c = st.columns(3)
    c[0].metric("Permissible preload F_M,zul", f(r.F_M_zul),
                help="assembly preload at the chosen yield utilisation (VDI 2230-1, R7)")
    c[1].metric("Tightening torque M_A", unitsys.show(r.tightening_torque, "torque", system),
                help="wrench setting that gives F_M,zul at the smallest friction")
    c[2].metric("Tightening factor αA", unitsys.num(r.alpha_A, 3))
    c = st.columns(3)
    c[0].metric("Preload needed F_M,min", f(r.F_M_min),
                help="required clamp load plus losses (embedding, temperature, load share)")
    c[1].metric("Largest preload αA·F_M,min", f(r.F_M_max))
    c[2].metric("Residual clamp load", f(r.F_KR_min),
                help="least clamp load left in service at the smallest preload")
    _joint_chart(r, system, name)


def _joint_chart(r: screws.ScrewJointResult, system: str, name: str) -> None:
    """Joint diagram (VDI 2230) of the most loaded screw from the library's corner points."""
    j = r.joint_diagram()
    fx = charts.factor("small_length", system) * 1000.0  # mm -> µm -> display
    fy = charts.factor("force", system)
    fS, fP, fA = j["f_S"], j["f_P"], j["f_A"]
    lines = [("screw", [(0.0, 0.0), (fS, j["F_V"])]),
             ("clamped parts", [(fS, j["F_V"]), (fS + fP, 0.0)])]
    if j["F_A"] > 0:
        lines += [("screw under F_A", [(fS, j["F_V"]), (fS + fA, j["F_S"])]),
                  ("F_A", [(fS + fA, j["F_KR"]), (fS + fA, j["F_S"])]),
                  ("F_KR", [(fS, j["F_KR"]), (fS + fA, j["F_KR"])])]
    import pandas as pd

    df = pd.DataFrame([{"line": n, "x": x * fx, "F": y * fy} for n, pts in lines for x, y in pts])
    charts.lines(df, x="x", y="F", series="line", detail="line",
                 dashed=["screw under F_A", "F_KR"],
                 x_title=charts.label("elongation / compression", "small_length", system),
                 y_title=charts.label("force", "force", system),
                 hrules=[(j["F_M_zul"] * fy, "F_M,zul")],
                 title=f"Joint diagram at the smallest preload in service, Φ = {r.load_factor:.3f}",
                 key=f"{PREFIX}.{name}.joint_chart",
                 colors={"screw": "#2b6cb0", "clamped parts": "#d97706",
                         "screw under F_A": "#6b46c1", "F_A": "#c53030", "F_KR": "#2f855a"})


def _details(r: screws.ScrewJointResult, system: str, name: str) -> None:
    st.subheader("Checks")
    widgets.show_checks(r.checks, system, key=f"{PREFIX}.checks")
    f = lambda x: unitsys.show(x, "force", system)  # noqa: E731
    t = lambda x: unitsys.show(x, "torque", system)  # noqa: E731
    s = lambda x: unitsys.show(x, "stress", system)  # noqa: E731
    L = lambda x: unitsys.show(x, "length", system)  # noqa: E731
    left, right = st.columns(2, gap="large")
    with left:
        st.subheader("Preload and torque")
        widgets.kv_table([
            ("tightening torque range for F_M,zul (μ min … μ max)",
             f"{t(r.tightening_torque)} … {t(r.tightening_torque_mu_max)}"),
            ("preload from M_A at the largest friction", f(r.preload_at_mu_max)),
            ("tightening torque, Shigley T = K·F·d (comparison)", t(r.torque_shigley)),
            ("axial load on the most loaded screw F_A", f(r.F_A)),
            ("transverse load per screw F_Q", f(r.F_Q)),
            ("required clamp load F_K,erf", f(r.F_K_required)),
            ("embedding loss F_Z", f(r.F_Z)),
            ("thermal change of preload, cold / warm", f"{f(r.dF_th_cold)} / {f(r.dF_th_warm)}"),
            ("largest screw force F_S,max", f(r.F_S_max)),
        ], key=f"{PREFIX}.preload")
    with right:
        st.subheader("Screw and joint")
        widgets.kv_table([
            ("stress area A_s", unitsys.show_in(r.As, "mm**2", system)),
            ("pitch P", L(r.P)),
            ("head bearing diameter d_w / hole d_h", f"{L(r.dw)} / {L(r.dh)}"),
            ("clamp length l_K", L(r.l_K)),
            ("load factor Φn / eccentric Φen*", f"{unitsys.num(r.load_factor, 3)} / "
                                                f"{unitsys.num(r.load_factor_eccentric, 3)}"),
            ("bending stress in the screw σ_b / opening limit F_Aab",
             f"{s(r.bending_stress)} / {f(r.opening_force)}"),
            ("load introduction factor n", unitsys.num(r.load_introduction, 3)),
            ("screw stress under load σ_red", s(r.sigma_red_B)),
            ("surface pressure under head / limit p_G", f"{s(r.surface_pressure)} / {s(r.p_G)}"),
            ("length of engagement / least needed", f"{L(r.engagement)} / {L(r.engagement_min)}"),
            ("stress amplitude σ_a / fatigue limit σ_AS", f"{s(r.sigma_a)} / {s(r.sigma_AS)}"),
        ], key=f"{PREFIX}.joint")


if __name__ == "__main__":
    render()
