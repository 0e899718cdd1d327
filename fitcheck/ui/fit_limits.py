"""Page "Fit limits": an ISO 286 fit by designation or by picking size and classes.

Shows the limit deviations and limit sizes in mm and inch, the fit's largest
and smallest clearance (negative: interference), the tolerance-zone diagram and
the preferred fits. Classes are offered only where ISO 286 defines them at the
size (``fitcheck.fits.valid_classes``).
"""

from __future__ import annotations

import re

import streamlit as st

from fitcheck import fits
from fitcheck.errors import InputError
from fitcheck.ui import app, charts, inch, state, unitsys, widgets
from fitcheck.units import to_core

DEFAULT = {"size": "25 mm", "hole": "H7", "shaft": "p6"}
STORE = "fl.value"          # {size, hole, shaft}: survives page switches
NONE = "—"                  # no class on this side (a single zone)
K_TEXT, K_SIZE, K_HOLE, K_SHAFT, K_PREF = "fl.text", "fl.size", "fl.hole", "fl.shaft", "fl.pref"


@st.cache_data(show_spinner=False, max_entries=256)
def _fit(size: str, hole: str | None, shaft: str | None) -> fits.Fit:
    return fits.fit(size, hole, shaft)


@st.cache_data(show_spinner=False, max_entries=256)
def _classes(size_mm: float, feature: str) -> list[str]:
    return fits.valid_classes(size_mm, feature)


@st.cache_data(show_spinner=False)
def _preferred() -> list[fits.PreferredFit]:
    return fits.preferred_fits()


def designation(v: dict) -> str:
    classes = "/".join(c for c in (v.get("hole"), v.get("shaft")) if c and c != NONE)
    return f"{v['size']} {classes}".strip()


_SIZE_FIRST = re.compile(r"^\s*([-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?\s*[A-Za-z\"]*)\s+\S")


_BARE = re.compile(r"^[-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?$")


def _from_designation(text: str) -> dict:
    """Size and classes from a typed designation (``fits.parse`` decides what is valid).

    When the designation does not read and it starts with a size that is not a positive length,
    the message is the one about the size (``'-5 mm H7/p6'``: the size must be > 0).
    """
    try:
        d = fits.parse(text)
    except InputError:
        m = _SIZE_FIRST.match(text or "")
        if m:
            size = m.group(1).strip()
            if _BARE.match(size):  # a bare number is a size in mm (ISO 286)
                size += " mm"
            to_core(size, "length", "nominal size", lo=0.0, lo_open=True)
        raise
    size = (unitsys.show(d.nominal_mm, "length", "inch", digits=6) if d.inch
            else f"{d.nominal_mm:g} mm")
    return {"size": size, "hole": d.hole or NONE, "shaft": d.shaft or NONE}


def _stored() -> dict:
    ss = st.session_state
    if STORE not in ss:
        v = dict(DEFAULT)
        text = st.query_params.get(state.QP_FIT)
        if text:
            try:
                v = _from_designation(text)
            except InputError:
                pass
        ss[STORE] = v
    return ss[STORE]


def _on_text() -> None:
    ss = st.session_state
    try:
        ss[STORE] = _from_designation(ss[K_TEXT])
        ss.pop("fl.text_error", None)
    except InputError as e:
        ss["fl.text_error"] = e
        return
    for k in (K_SIZE, K_HOLE, K_SHAFT, K_PREF):
        ss.pop(k, None)


def _on_pick() -> None:
    ss = st.session_state
    v = ss[STORE]
    v.update(size=ss.get(K_SIZE, v["size"]), hole=ss.get(K_HOLE, v["hole"]),
             shaft=ss.get(K_SHAFT, v["shaft"]))
    ss[K_TEXT] = designation(v)
    ss.pop("fl.text_error", None)


def _on_pref() -> None:
    ss = st.session_state
    choice = ss.get(K_PREF)
    if not choice or "/" not in choice:
        return
    hole, shaft = choice.split()[0].split("/")
    v = ss[STORE]
    v.update(hole=hole, shaft=shaft)
    ss[K_TEXT] = designation(v)
    ss.pop(K_HOLE, None)
    ss.pop(K_SHAFT, None)
    ss.pop("fl.text_error", None)


def _pref_label(p: fits.PreferredFit) -> str:
    return f"{p.fit}  ({p.basis} basis: {p.description})"


def render() -> None:
    app.heading("Fit limits", "ISO 286 limit deviations and limit sizes of a hole, a shaft or a "
                "fit; classes offered are those the standard defines at the size.")
    ss = st.session_state
    v = _stored()
    system = state.system()
    ss.setdefault(K_TEXT, designation(v))
    ss.setdefault(K_SIZE, v["size"])

    size_error = None
    holes = shafts = []
    try:
        size_mm = to_core(ss[K_SIZE], "length", "nominal size", lo=0.0, lo_open=True)
        holes = _classes(size_mm, "hole")
        shafts = _classes(size_mm, "shaft")
    except InputError as e:
        size_error = e
    prefs = _preferred()
    left, right = st.columns([1, 2], gap="large")
    with left:
        if not app.headline_only():  # the inputs follow with the rest of the page
            _inputs(v, size_error, holes, shafts, prefs)
    v = ss[STORE]
    state.remember(state.QP_FIT, None if v == DEFAULT else designation(v))

    with right:
        hole = v["hole"] if v["hole"] != NONE else None
        shaft = v["shaft"] if v["shaft"] != NONE else None
        if ss.get("fl.text_error") is not None:
            st.info("Correct the designation to see the limits.")
        elif size_error is not None:
            st.info("Enter a valid nominal size to see the limits.")
        elif hole is None and shaft is None:
            st.info("Pick a hole class, a shaft class or both.")
        else:
            try:
                f = _fit(v["size"], hole, shaft)
            except InputError as e:
                st.error(widgets.error_text(e), icon=":material/error:")
            else:
                _show_fit(f, system)
    inch.ansi_section(_show_fit, system)  # ASME B4.1 classes (fitcheck/ui/inch.py)
    import pandas as pd  # here, not at the top: the figures show before it loads

    with st.expander("Preferred fits", expanded=False):
        widgets.static_table(pd.DataFrame([{"basis": p.basis, "fit": p.fit, "use": p.description,
                                            "source": p.source} for p in prefs]), key="fl.pref_table")


def _inputs(v: dict, size_error, holes: list[str], shafts: list[str],
            prefs: list[fits.PreferredFit]) -> None:
    ss = st.session_state
    st.subheader("The fit")
    st.text_input("Designation", key=K_TEXT, on_change=_on_text,
                  help="Nominal size, hole class and/or shaft class, e.g. '25 H7/p6', "
                  "'40 k6', '1 in H7/g6'. Press Enter to apply.")
    if ss.get("fl.text_error") is not None:
        st.error(widgets.error_text(ss["fl.text_error"]), icon=":material/error:")
    st.caption("…or pick:")
    st.text_input("Nominal size", key=K_SIZE, on_change=_on_pick,
                  help="A length with its unit: '25 mm' or '0.984 in' (a bare number is mm).")
    if size_error is not None:
        st.error(widgets.error_text(size_error), icon=":material/error:")
    c1, c2 = st.columns(2)
    with c1:
        _class_select("Hole class", K_HOLE, [NONE, *holes], v["hole"])
    with c2:
        _class_select("Shaft class", K_SHAFT, [NONE, *shafts], v["shaft"])
    st.selectbox("Preferred fits", [_pref_label(p) for p in prefs], key=K_PREF, index=None,
                 placeholder="apply a preferred fit…", on_change=_on_pref,
                 help="Preferred hole-basis and shaft-basis fits; picking one sets both classes.")


def _class_select(label: str, key: str, options: list[str], current: str) -> None:
    ss = st.session_state
    if key not in ss:
        ss[key] = current if current in options else NONE
    elif ss[key] not in options:
        ss[key] = NONE
    st.selectbox(label, options, key=key, on_change=_on_pick)


def _show_fit(f: fits.Fit, system: str) -> None:
    st.subheader(f"{widgets.esc(f.designation)}" + (f" — {f.kind} fit" if f.kind else ""))
    show = lambda um: unitsys.show(um, "small_length", system)  # noqa: E731
    if f.kind is not None:
        c = st.columns(3)
        if f.kind == "clearance":
            c[0].metric("Largest clearance", show(f.clearance_max_um),
                        help="hole upper limit − shaft lower limit")
            c[1].metric("Smallest clearance", show(f.clearance_min_um),
                        help="hole lower limit − shaft upper limit")
        elif f.kind == "interference":
            c[0].metric("Smallest interference", show(f.interference_min_um),
                        help="shaft lower limit − hole upper limit")
            c[1].metric("Largest interference", show(f.interference_max_um),
                        help="shaft upper limit − hole lower limit")
        else:
            c[0].metric("Largest clearance", show(f.clearance_max_um),
                        help="hole upper limit − shaft lower limit")
            c[1].metric("Largest interference", show(f.interference_max_um),
                        help="shaft upper limit − hole lower limit")
        c[2].metric("Fit tolerance", show(f.fit_tolerance_um),
                    help="sum of the hole and shaft tolerances")
    app.first_paint()  # a session's first run ends here; the rest follows by itself
    import pandas as pd

    zones = [z for z in (f.hole, f.shaft) if z is not None]
    dicts = [z.to_dict() for z in zones]
    table = {"limit": ["upper deviation", "lower deviation", "largest size", "smallest size",
                       "tolerance (IT)"]}
    for z, d in zip(zones, dicts, strict=True):
        table[f"{z.feature} {z.cls} [µm, mm]"] = [
            f"{d['upper_um']:+g} µm", f"{d['lower_um']:+g} µm", f"{d['max_mm']:.3f} mm",
            f"{d['min_mm']:.3f} mm", f"{d['it_um']:g} µm"]
    for z, d in zip(zones, dicts, strict=True):
        table[f"{z.feature} {z.cls} [in]"] = [
            f"{d['upper_in']:+.5f}", f"{d['lower_in']:+.5f}", f"{d['max_in']:.5f}",
            f"{d['min_in']:.5f}", f"{unitsys.magnitude(d['it_um'], 'small_length', 'inch'):.5f}"]
    widgets.static_table(pd.DataFrame(table), key="fl.limits")
    _zone_chart(f, system)


def _zone_chart(f: fits.Fit, system: str) -> None:
    """The tolerance zones of hole and shaft about the zero line (limits from the library)."""
    import pandas as pd

    fu, unit = charts.small_factor(system)
    rows = [{"zone": f"{z.feature} {z.cls}", "lower": z.lower_um * fu, "upper": z.upper_um * fu}
            for z in (f.hole, f.shaft) if z is not None]
    colors = {r["zone"]: charts.ZONE_COLORS[i] for i, r in enumerate(rows)}
    charts.zones(pd.DataFrame(rows), y_title=f"deviation from the nominal size [{unit}]",
                 colors=colors, title=f"Tolerance zones, {f.designation}", key="fl.zones")


if __name__ == "__main__":
    render()
