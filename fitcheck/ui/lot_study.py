"""Page "Lot study and fit search": how often a production lot slips or yields, and which fit to use.

For a ``[[pressfit]]`` joint of the working case: the tolerance study of
:func:`fitcheck.study.run_study` (sizes, friction, roughness and temperature
sampled; probabilities of slip and yield with their intervals and the method
behind them; a target verdict; percentiles and histograms; the worst case beside
it) and the fit search of :func:`fitcheck.search.search_fits` (ranked passing
fits, the nearest rejected ones, a button that puts a chosen fit into the case).
For a ``[[bearing]]`` seat: the seat-class search of
:func:`fitcheck.search.search_bearing_seat`.

Both run on request only (a study with 10⁶ samples takes a second or more) and are
cached on the joint's TOML text and the settings. No physics here: the page
turns widget values into the library's settings and shows what it returns.
"""

from __future__ import annotations

import math

import pandas as pd
import streamlit as st

from fitcheck import case as casefile
from fitcheck import checks, fits, study
from fitcheck.core import iso286
from fitcheck.errors import InputError, InputErrors
from fitcheck.search import (
    BEARING_HOUSING_GRADES,
    BEARING_HOUSING_LETTERS,
    BEARING_SHAFT_GRADES,
    BEARING_SHAFT_LETTERS,
    DEFAULT_HOLE_GRADES,
    DEFAULT_HOLES,
    DEFAULT_SHAFT_GRADES,
    DEFAULT_SHAFTS,
    search_bearing_seat,
    search_fits,
)
from fitcheck.tomlread import read_toml_bytes
from fitcheck.ui import app, charts, joints, state, unitsys, widgets

PREFIX = "ls"
SAVED = f"{PREFIX}.saved"          # settings kept across page switches (Streamlit drops widgets)
STUDY_RUN = f"{PREFIX}.study.run"  # (joint text, settings) of the last "Run study"
SEARCH_RUN = f"{PREFIX}.search.run"  # joint text of the last "Search"
TAKEN = f"{PREFIX}.taken"          # one-off message after a fit went into the case
MAX_SAMPLES = 1_000_000            # in the browser (the library allows more, e.g. from the CLI)
KINDS = {"pressfit": "press fit", "bearing": "bearing seat"}
METHODS = {"plain": "plain sampling", "importance": "importance sampling about the FORM design "
           "point", "form": "FORM (first order)", "bounds": "bounds of the inputs: out of reach"}
SIZES = {"uniform": "uniform over the zone", "normal": "normal from Cp / Cpk"}
SHIFTS = {"least_material": "toward least material (looser: the slip side)",
          "max_material": "toward maximum material (tighter: the yield side)"}
FRICTION = {"lognormal": "lognormal", "normal": "normal", "uniform": "uniform",
            "constant": "constant (no scatter)"}
SHOWN_PERCENTILES = (0.1, 1.0, 5.0, 50.0, 95.0, 99.0, 99.9)
HISTOGRAMS = ("torque_capacity", "slip_safety", "hub_stress", "shaft_stress", "pressure_min",
              "press_force")


# --------------------------------------------------------------------------- library calls (cached)

def _errs(exc: InputError | InputErrors) -> list[tuple]:
    return [(e.field, e.value, e.allowed, e.hint) for e in state.errors_by_field(exc)]


def _joint_input(text: str, table: str):
    """The engine input of the one joint in a one-joint case text (raises on bad input)."""
    dc = casefile.from_document(read_toml_bytes(text.encode("utf-8"), "case"))
    return dc.pressfits[0] if table == "pressfit" else dc.bearings[0]


@st.cache_data(show_spinner=False, max_entries=64)
def _check_joint(text: str, table: str) -> list[tuple]:
    """The input errors of the joint (empty when it reads)."""
    try:
        _joint_input(text, table)
    except (InputError, InputErrors) as exc:
        return _errs(exc)
    return []


@st.cache_data(show_spinner=False, max_entries=32)
def _study(text: str, settings: tuple) -> tuple[study.StudyResult | None, list[tuple]]:
    try:
        inp = _joint_input(text, "pressfit")
        return study.run_study(inp, study.StudySettings.from_mapping(dict(settings), "study")), []
    except (InputError, InputErrors) as exc:
        return None, _errs(exc)


@st.cache_data(show_spinner=False, max_entries=64)
def _search(text: str, table: str, admitted: tuple = ()):
    try:
        inp = _joint_input(text, table)
        kw = dict(admitted)
        return (search_fits(inp, **kw) if table == "pressfit" else
                search_bearing_seat(inp, **kw)), []
    except (InputError, InputErrors) as exc:
        return None, _errs(exc)


def _settings_errors(settings: tuple) -> list[InputError]:
    try:
        study.StudySettings.from_mapping(dict(settings), "study")
    except (InputError, InputErrors) as exc:
        return state.errors_by_field(exc)
    return []


# --------------------------------------------------------------------------- the page

def render() -> None:
    app.heading("Lot study and fit search",
                "How often a production lot of a press fit slips or yields when sizes, friction, "
                "roughness and temperature scatter — and which ISO 286 fit (or bearing seat "
                "class) passes every check.")
    _arrival()
    chosen = _pick()
    if chosen is None:
        return
    table, name = chosen
    text = state.doc_text(state.single_joint_doc(table, name))
    bad = [InputError(*t) for t in _check_joint(text, table)]
    if bad:
        page = "Press fit" if table == "pressfit" else "Bearing seats"
        st.error(f"This joint has input errors; correct them on the page *{page}* first.",
                 icon=":material/error:")
        for e in bad:
            st.error(widgets.error_text(e), icon=":material/error:")
        return
    msg = st.session_state.pop(TAKEN, None)
    if msg:
        st.success(msg, icon=":material/check_circle:")
    if table == "pressfit":
        tab_study, tab_search = st.tabs(["Lot study", "Fit search"],
                                        default=st.session_state.get(TAB))
        with tab_study:
            _study_section(name, text)
        with tab_search:
            _fit_search_section(name, text)
    else:
        _seat_search_section(name, text)


TAB = f"{PREFIX}.tab"  # the tab opened first (the fit search after a link from a joint page)


def _arrival() -> None:
    """Coming from a joint page's link (address ``?search=pressfit:<name>``): select that joint,
    open its search and run it."""
    qp = st.query_params
    token = qp.get(widgets.QP_SEARCH)
    if token is None:
        return
    del qp[widgets.QP_SEARCH]
    table, _, name = token.partition(":")
    if table not in KINDS or name not in joints.names(table):
        st.warning(f"The case has no {KINDS.get(table, 'joint')} named {widgets.esc(name)}.")
        return
    ss = st.session_state
    label = f"{KINDS[table]}: {name}"
    ss[f"{PREFIX}.joint"] = ss[f"{PREFIX}.joint.value"] = label
    ss[TAB] = "Fit search"
    ss[SEARCH_RUN] = _token(state.doc_text(state.single_joint_doc(table, name)), table)


def _pick() -> tuple[str, str] | None:
    """A selector over the press fits and bearing seats of the case."""
    options = [(t, n) for t in KINDS for n in joints.names(t)]
    if not options:
        st.info("The open case has no press fit and no bearing seat. Open a case file that has "
                "one (page *Case file and report*) or restore the demo there.")
        return None
    ss = st.session_state
    key = f"{PREFIX}.joint"
    labels = [f"{KINDS[t]}: {n}" for t, n in options]
    stored = ss.get(f"{key}.value")
    if ss.get(key) not in labels:
        ss[key] = stored if stored in labels else labels[0]
    label = st.selectbox("Joint of the case", labels, key=key,
                         help="Press fits get the lot study and the fit search; bearing seats "
                         "the search over seat classes.")
    ss[f"{key}.value"] = label
    return options[labels.index(label)]


# --------------------------------------------------------------------------- lot study

def _default_temperature(key: str) -> str:
    cond = state.doc().get("conditions", {})
    v = cond.get(key) if isinstance(cond, dict) else None
    return widgets.as_text(v) if v is not None else ""


#: Study settings shown on the page and their first values (StudySettings' own defaults; the
#: temperature range from the case conditions).
DEFAULTS = {"samples": 100_000, "seed": 0, "target": "1e-4", "sizes": "uniform", "cp": 1.33,
            "cpk": 1.33, "shift": "least_material", "inspected": True, "friction": "lognormal",
            "friction_cov": 0.15, "temperature_min": None, "temperature_max": None,
            "roughness_low": 0.6, "confidence": 0.95, "rel_err": 0.1, "importance_samples": 20_000}


def _seed_settings() -> None:
    """Give every setting widget its value before it is drawn: the one kept from an earlier visit
    (Streamlit forgets widgets of other pages) or the default."""
    ss = st.session_state
    saved = ss.get(SAVED, {})
    for key, default in DEFAULTS.items():
        k = f"{PREFIX}.{key}"
        if k not in ss:
            if key in saved:
                ss[k] = saved[key]
            elif key.startswith("temperature_"):
                ss[k] = _default_temperature(key)
            else:
                ss[k] = default


def _current_settings() -> tuple:
    """The settings as (key, value) pairs for ``StudySettings.from_mapping`` (empty text = none)."""
    ss = st.session_state
    out = []
    for key in DEFAULTS:
        v = ss[f"{PREFIX}.{key}"]
        if isinstance(v, str):
            v = v.strip() or None
        out.append((key, v))
    return tuple(out)


def _keep() -> None:
    ss = st.session_state
    ss[SAVED] = {key: ss[f"{PREFIX}.{key}"] for key in DEFAULTS}


def _settings_widgets(errors: dict[str, InputError]) -> None:
    """The study settings as widgets (seeded by :func:`_seed_settings`), each error below its field."""
    ss = st.session_state

    def err(key):
        if key in errors:
            st.error(widgets.error_text(errors[key]), icon=":material/error:")

    c = st.columns(3)
    with c[0]:
        st.number_input("Samples", min_value=0, max_value=MAX_SAMPLES, step=10_000,
                        key="ls.samples",
                        help="Joints drawn at random (plain Monte Carlo), 100 to 1 000 000. "
                        "Probabilities far below 1/samples come from FORM and importance "
                        "sampling.")
        err("samples")
    with c[1]:
        st.number_input("Random seed", min_value=0, step=1, key="ls.seed",
                        help="The same seed gives the same lot, so a result can be repeated.")
        err("seed")
    with c[2]:
        st.text_input("Target probability", key="ls.target",
                      placeholder="none: the verdict is the worst case",
                      help="Largest acceptable probability of slip and of yield, each (e.g. 1e-4). "
                      "Met when the upper confidence limit is at or below it. Empty: no target.")
        err("target")

    st.markdown("**Sizes of shaft and bore**")
    c = st.columns([3, 2, 2, 4])
    with c[0]:
        st.radio("Size model", list(SIZES), key="ls.sizes", format_func=SIZES.get,
                 help="How shaft and bore sizes spread over their ISO 286 zones: evenly, or a "
                 "normal distribution from the process capability.")
        err("sizes")
    normal = ss[f"{PREFIX}.sizes"] == "normal"
    with c[1]:
        st.number_input("Cp", min_value=0.0, max_value=20.0, step=0.01, format="%.2f",
                        key="ls.cp", disabled=not normal,
                        help="Process capability: zone width over six standard deviations.")
        err("cp")
    with c[2]:
        st.number_input("Cpk", min_value=0.0, max_value=20.0, step=0.01, format="%.2f",
                        key="ls.cpk", disabled=not normal,
                        help="Capability to the nearer limit; Cpk < Cp moves the mean off the zone "
                        "centre. 0 < Cpk ≤ Cp.")
        err("cpk")
    with c[3]:
        st.selectbox("Mean shifted", list(SHIFTS), key="ls.shift",
                     format_func=SHIFTS.get, disabled=not normal,
                     help="Direction of the mean offset when Cpk < Cp.")
        err("shift")
        st.checkbox("Parts outside the zone sorted out at inspection", key="ls.inspected",
                    disabled=not normal, help="The normal is cut off at the zone limits.")

    st.markdown("**Friction and operating temperature**")
    c = st.columns(4)
    with c[0]:
        st.selectbox("Friction scatter", list(FRICTION), key="ls.friction",
                     format_func=FRICTION.get,
                     help="Distribution of the friction coefficient; its median (lognormal) or "
                     "mean is the joint's design value.")
        err("friction")
    with c[1]:
        st.number_input("Friction CoV", min_value=0.0, max_value=1.0, step=0.01, format="%.2f",
                        key="ls.friction_cov",
                        help="Coefficient of variation of the friction coefficient (standard "
                        "deviation over mean); 0.15 is common practice.")
        err("friction_cov")
    with c[2]:
        st.text_input("Lowest operating temperature", key="ls.temperature_min",
                      placeholder="the joint's own temperatures",
                      help="Hub temperature range, sampled uniformly; the shaft keeps its "
                      "stated excess over the hub. Taken from the case conditions when they give "
                      "one; clear both ends to keep the joint's own temperatures.")
        err("temperature_min")
    with c[3]:
        st.text_input("Highest operating temperature", key="ls.temperature_max",
                      placeholder="the joint's own temperatures",
                      help="Upper end of the hub temperature range, e.g. '60 degC'.")
        err("temperature_max")

    with st.expander("More settings", expanded=any(k in errors for k in (
            "roughness_low", "confidence", "rel_err", "importance_samples"))):
        c = st.columns(4)
        with c[0]:
            st.number_input("Lowest Rz, share of the drawing value", min_value=0.0,
                            max_value=1.0, step=0.05, format="%.2f",
                            key="ls.roughness_low",
                            help="Rz of shaft and bore spreads evenly between this share of the "
                            "drawing value and the drawing value; 1 keeps Rz fixed.")
            err("roughness_low")
        with c[1]:
            st.number_input("Confidence level", min_value=0.0, max_value=1.0, step=0.01,
                            format="%.3f", key="ls.confidence",
                            help="Two-sided level of the probability intervals.")
            err("confidence")
        with c[2]:
            st.number_input("Relative error for the sample count", min_value=0.0,
                            max_value=1.0, step=0.05, format="%.2f", key="ls.rel_err",
                            help="The plain-sampling sample count is given for this relative "
                            "error of the estimate.")
            err("rel_err")
        with c[3]:
            st.number_input("Importance samples", min_value=0, max_value=MAX_SAMPLES, step=1000,
                            key="ls.importance_samples",
                            help="Samples about the FORM design point for small probabilities; "
                            "0 switches FORM and importance sampling off.")
            err("importance_samples")
    _keep()


def _settings_error_map(settings: tuple) -> tuple[dict[str, InputError], list[InputError]]:
    by_key, rest = {}, []
    names = {k for k, _ in settings}
    for e in _settings_errors(settings):
        key = e.field.removeprefix("study.").split(".")[0].split("[")[0]
        if key in names and key not in by_key:
            by_key[key] = e
        else:
            rest.append(e)
    return by_key, rest


def _study_section(name: str, text: str) -> None:
    ss = st.session_state
    _seed_settings()
    settings = _current_settings()  # Streamlit holds a changed value before the rerun
    by_key, rest = _settings_error_map(settings)
    with st.container(border=True):
        _settings_widgets(by_key)
        for e in rest:
            st.error(widgets.error_text(e), icon=":material/error:")
        run = st.button("Run study", key=f"{PREFIX}.run_study", type="primary",
                        disabled=bool(by_key or rest), icon=":material/casino:",
                        help="Draw the lot and estimate the probabilities (on request: a large "
                        "study takes a few seconds).")
    key = (text, settings)
    if run:
        ss[STUDY_RUN] = key
    if ss.get(STUDY_RUN) != key:
        if STUDY_RUN in ss:
            st.info("The joint or the settings changed since the last run: press **Run study** "
                    "for results that match them.")
        else:
            st.info("Set the scatter of the lot and press **Run study**.")
        return
    with st.spinner("Sampling the lot …"):
        r, errs = _study(text, settings)
    if r is None:
        for t in errs:
            st.error(widgets.error_text(InputError(*t)), icon=":material/error:")
        return
    _study_results(r, state.system(), name)


def p_text(x: float) -> str:
    """A probability as shown on the page: three significant digits, 0 as 0."""
    if x != x:
        return "n/a"
    return unitsys.probability(x, 3)


def _study_results(r: study.StudyResult, system: str, name: str) -> None:
    s = r.settings
    st.subheader(f"{widgets.esc(r.joint)}: {widgets.esc(r.fit or 'given interference')} — {r.samples:,} samples, "
                 f"seed {s.seed}")
    if r.targets:
        worst = checks.worst(r.checks)  # the smallest margin
        ok = r.ok
        text = ("Both targets are met" if ok else "A target is not met") + \
            f": P(slip) and P(yield), upper {s.confidence:.0%} limits against {p_text(s.target)}" \
            + ("" if ok else f" — {worst.name} {p_text(worst.value)}") + "."
        (st.success if ok else st.error)(text, icon=":material/check_circle:" if ok
                                         else ":material/cancel:")
    lot, wc = st.columns([3, 2], gap="large")
    with lot:
        st.markdown("**The lot (sampled)**")
        c = st.columns(3)
        for col, fm, label in ((c[0], r.slip, "P(slip)"), (c[1], r.yield_, "P(yield)")):
            b = fm.best
            col.metric(label, p_text(b.p), help=fm.definition)
            col.caption(f"{s.confidence:.0%} interval {p_text(b.lo)} … {p_text(b.hi)}  \n"
                        f"by {METHODS.get(b.method, b.method)}")
        c[2].metric("Lot passing all checks", f"{unitsys.num(r.fraction_meeting_design_checks * 100, 5)} %",
                    help="Share of the sampled joints meeting every check with its required "
                    "safety (slip safety, yield safety, speed, assembly).")
    with wc:
        w = r.worst_case
        st.markdown("**Worst case (limits stacked)**")
        c = st.columns(2)
        c[0].metric("Slip safety, loosest", unitsys.num(w.slip_safety_min, 3))
        c[1].metric("Torque capacity, loosest", unitsys.show(w.torque_capacity_min, "torque",
                                                             system))
        c = st.columns(2)
        c[0].metric("Hub yield safety, tightest", unitsys.num(w.hub_yield_safety, 3))
        c[1].metric("Shaft yield safety, tightest", unitsys.num(w.shaft_yield_safety, 3))
        widgets.verdict_banner(w.ok, min(w.checks, key=lambda c: c.margin) if w.checks else None,
                               system)
        st.caption("Loosest shaft in the largest bore with the lowest friction, and the reverse, "
                   "at the joint's own temperatures: safe, but silent on how often a lot fails.")
    st.markdown("**Failure probabilities**")
    _probability_table(r)
    if r.targets:
        _target_table(r)
    st.markdown("**Percentiles of the lot**")
    _percentile_table(r, system)
    st.markdown("**Histograms** (the tails beyond 0.01 % and 99.99 % fall in the end bins)")
    cols = st.columns(2)
    for i, key in enumerate(HISTOGRAMS):
        d = r.distribution(key)
        if not d.hist_edges:
            continue
        f, sym = charts.unit_factor(d.unit, system) if d.unit else (1.0, "")
        with cols[i % 2]:
            charts.histogram(_named_limits(d.histogram(), r), x_title=d.label + (f" [{sym}]" if sym else ""),
                             scale=f, key=f"{PREFIX}.{name}.hist.{key}", title=d.label)
    with st.expander("Random inputs of the study"):
        widgets.static_table(pd.DataFrame([{"input": v.name, "distribution": _marginal_text(v, system),
                                            "meaning": v.description} for v in r.variables]),
                             key=f"{PREFIX}.variables")
    for n in r.notes:
        st.caption(f"Note: {widgets.esc(widgets.prose(n, state.system()))}")


def _named_limits(hist: dict, r: study.StudyResult) -> dict:
    """The strength lines named by the material value they are (Rp0.2 or Rm of which material)."""
    w = r.worst_case
    names = {}
    for part, m in (("hub", w.hub_material), ("shaft", w.shaft_material)):
        names.setdefault(f"{part} strength", {})
        names[f"{part} strength"][m.Rp02] = f"Rp0.2 {part} ({m.name})"
        names[f"{part} strength"][m.Rm] = f"Rm {part} ({m.name})"
    limits = tuple((names.get(t, {}).get(v, t), v) for t, v in hist["limits"])
    return {**hist, "limits": limits}


def _probability_table(r: study.StudyResult) -> None:
    s = r.settings
    rows = []
    for fm in (r.slip, r.yield_):
        pl, f, imp = fm.plain, fm.form, fm.importance
        rows.append({
            "mode": fm.name,
            "plain sampling": f"{pl.failures:,} of {pl.n:,} = {p_text(pl.p)}",
            f"{s.confidence:.0%} interval": f"{p_text(pl.lo)} … {p_text(pl.hi)}",
            "FORM": "—" if f is None else (f"β = {unitsys.num(f.beta, 3)}, p = {p_text(f.p)}"
                                           + ("" if f.converged else " (not converged)")),
            "importance sampling": "—" if imp is None else f"{p_text(imp.p)} ± {p_text(imp.se)}",
            "used": f"{METHODS.get(fm.best.method, fm.best.method)}",
        })
    widgets.static_table(pd.DataFrame(rows), key=f"{PREFIX}.probabilities")


def _target_table(r: study.StudyResult) -> None:
    s = r.settings
    rows = [{"mode": t.mode, "estimate": p_text(t.estimate),
             f"upper {s.confidence:.0%} limit": p_text(t.upper), "target": p_text(t.target),
             "verdict": widgets.PASS if t.met else widgets.FAIL,
             f"plain samples for ±{s.rel_err:.0%} at the target":
                 f"{t.plain_samples_at_target:,.0f}"} for t in r.targets]
    widgets.static_table(pd.DataFrame(rows), key=f"{PREFIX}.targets")
    need = max(t.plain_samples_at_target for t in r.targets)
    if need > r.samples:
        st.caption(f"Plain sampling alone would need about {need:,.0f} samples to resolve the "
                   f"target to ±{s.rel_err:.0%}; this run has {r.samples:,} — the smaller "
                   "probabilities come from FORM and importance sampling (see *used*).")


def _percentile_table(r: study.StudyResult, system: str) -> None:
    rows = []
    for d in r.distributions:
        row = {"quantity": d.label}
        for q in SHOWN_PERCENTILES:
            row[f"{q:g} %"] = unitsys.show_in(d.percentile(q), d.unit, system)
        row["mean"] = unitsys.show_in(d.mean, d.unit, system)
        rows.append(row)
    widgets.static_table(pd.DataFrame(rows), key=f"{PREFIX}.percentiles")


def _marginal_text(v, system: str) -> str:
    m = v.marginal

    def q(x):
        return unitsys.show_in(x, v.unit, system) if v.unit else unitsys.num(x, 4)

    if not m.random:
        return f"fixed {q(m.a)}"
    if m.kind == "uniform":
        return f"uniform {q(m.a)} … {q(m.b)}"
    if m.kind == "normal":
        return f"normal, mean {q(m.a)}, standard deviation {unitsys.num(m.b, 3)} {v.unit}".strip()
    if m.kind == "truncnormal":
        return (f"normal, mean {q(m.a)}, standard deviation {unitsys.num(m.b, 3)} {v.unit}, "
                f"cut off at {q(m.c)} … {q(m.d)}")
    return f"lognormal, median {q(m.a)}, CoV {unitsys.num(m.b, 3)}"


# --------------------------------------------------------------------------- fit search

def _current_classes(entry: dict | None) -> tuple[str | None, str | None, str | None]:
    """(hole, shaft, size text) of the joint's fit, or Nones when it gives an interference."""
    text = entry.get("fit") if entry else None
    if not isinstance(text, str):
        return None, None, None
    try:
        d = fits.parse(text)
    except InputError:
        return None, None, None
    if not (d.hole and d.shaft):
        return None, None, None
    return d.hole, d.shaft, text.strip().split(d.hole)[0].strip()


def _take_fit(name: str, hole: str, shaft: str, nominal_mm: float) -> None:
    """Write the chosen fit into the joint of the working case (as the press-fit class pickers do)."""
    entry = state.joint("pressfit", name)
    if entry is None:
        return
    ss = st.session_state
    size = _current_classes(entry)[2] or f"{nominal_mm:g}"
    text = f"{size} {hole}/{shaft}"
    entry["fit"] = text
    ss[joints.wkey("pf", name, "fit")] = text
    dropped = [k for k in ("interference_min", "interference_max") if k in entry]
    for k in dropped:  # a fit replaces explicit interference limits
        entry.pop(k)
        ss[joints.wkey("pf", name, k)] = ""
    ss[SEARCH_RUN] = _token(state.doc_text(state.single_joint_doc("pressfit", name)), "pressfit")
    ss[TAKEN] = (f"Fit **{widgets.esc(text)}** is now the fit of *{widgets.esc(name)}* in the case"
                 + (" (its interference limits were removed)" if dropped else "")
                 + "; the page *Press fit* shows it.")


ADMIT = f"{PREFIX}.admit"   # the admitted fit set, kept across page switches
BASES = {"hole": "hole basis", "shaft": "shaft basis"}
FIT_SET = {"bases": ["hole", "shaft"], "holes": list(DEFAULT_HOLES),
           "shaft_grades": list(DEFAULT_SHAFT_GRADES), "shafts": list(DEFAULT_SHAFTS),
           "hole_grades": list(DEFAULT_HOLE_GRADES),
           "shaft_letters": list(iso286.all_letters("shaft")),
           "hole_letters": list(iso286.all_letters("hole"))}
SEAT_SET = {"shaft_letters": list(BEARING_SHAFT_LETTERS), "shaft_grades": list(BEARING_SHAFT_GRADES),
            "housing_letters": list(BEARING_HOUSING_LETTERS),
            "housing_grades": list(BEARING_HOUSING_GRADES)}
GRADES = list(range(4, 12))
HOLE_BASES = ["H5", "H6", "H7", "H8", "H9", "H10", "H11"]
SHAFT_BASES = ["h4", "h5", "h6", "h7", "h8", "h9", "h10", "h11"]
SHAFT_LETTERS = ["a", "b", "c", "cd", "d", "e", "ef", "f", "fg", "g", "h", "j", "js", "k", "m",
                 "n", "p", "r", "s", "t", "u", "v", "x", "y", "z"]


def _admitted(table: str) -> dict:
    """The admitted set of the search as the library's keyword arguments (from the widgets)."""
    ss = st.session_state
    defaults = FIT_SET if table == "pressfit" else SEAT_SET
    saved = ss.setdefault(ADMIT, {})
    out = {}
    for k, v in defaults.items():
        wk = f"{ADMIT}.{table}.{k}"
        if wk not in ss:
            ss[wk] = list(saved.get((table, k), v))
        saved[(table, k)] = list(ss[wk])
        out[k] = tuple(ss[wk])
    if table == "pressfit":
        bases = out.pop("bases")
        if "hole" not in bases:
            out["holes"] = ()
        if "shaft" not in bases:
            out["shafts"] = ()
    return out


def _admitted_widgets(table: str) -> None:
    """The admitted fit set: bases, basis classes, grades (and letters of bearing seats)."""
    k = f"{ADMIT}.{table}"
    with st.expander("Fits admitted to the search", icon=":material/tune:"):
        if table == "pressfit":
            st.pills("Systems", list(BASES), key=f"{k}.bases", selection_mode="multi",
                     format_func=BASES.get, help="Hole-basis fits (H with the shaft letters "
                     "chosen), shaft-basis fits (h with the hole letters chosen), or both.")
            c = st.columns(2)
            c[0].multiselect("Basis holes", HOLE_BASES, key=f"{k}.holes")
            c[0].multiselect("Shaft grades (IT) with them", GRADES, key=f"{k}.shaft_grades")
            c[0].multiselect("Shaft letters with them", FIT_SET["shaft_letters"],
                             key=f"{k}.shaft_letters",
                             help="Deviation letters of the shafts mated with the basis holes "
                             "(e.g. only p … u for interference fits).")
            c[1].multiselect("Basis shafts", SHAFT_BASES, key=f"{k}.shafts")
            c[1].multiselect("Hole grades (IT) with them", GRADES, key=f"{k}.hole_grades")
            c[1].multiselect("Hole letters with them", FIT_SET["hole_letters"],
                             key=f"{k}.hole_letters",
                             help="Deviation letters of the holes mated with the basis shafts.")
        else:
            c = st.columns(2)
            c[0].multiselect("Shaft letters", SHAFT_LETTERS, key=f"{k}.shaft_letters")
            c[0].multiselect("Shaft grades (IT)", GRADES, key=f"{k}.shaft_grades")
            c[1].multiselect("Housing letters", [x.upper() for x in SHAFT_LETTERS],
                             key=f"{k}.housing_letters")
            c[1].multiselect("Housing grades (IT)", GRADES, key=f"{k}.housing_grades")
        st.caption("Only the classes ISO 286 defines at the joint's size are tried.")


def _token(text: str, table: str) -> str:
    """What a search result depends on: the joint's text and the admitted set."""
    return text + "\n# admitted " + repr(sorted(_admitted(table).items()))


def _search_button(label: str, text: str) -> bool:
    ss = st.session_state
    if st.button(label, key=f"{PREFIX}.run_search", type="primary", icon=":material/search:"):
        ss[SEARCH_RUN] = text
    if ss.get(SEARCH_RUN) != text:
        if SEARCH_RUN in ss:
            st.info(f"The joint or the admitted fits changed since the last search: press "
                    f"**{label}** again.")
        return False
    return True


def _fit_search_section(name: str, text: str) -> None:
    st.caption("Hole-basis fits (basis holes with shafts of the letters and grades chosen) "
               "and shaft-basis fits (basis shafts with holes of the letters and grades chosen) that ISO 286 "
               "defines at the joint's size, with the checks and required safeties of the "
               "press-fit page.")
    admitted = _admitted("pressfit")  # seeds the widgets first
    _admitted_widgets("pressfit")
    if not (admitted["holes"] and admitted["shaft_grades"] and admitted["shaft_letters"]) and \
            not (admitted["shafts"] and admitted["hole_grades"] and admitted["hole_letters"]):
        st.info("Admit at least one basis class with one grade and one letter to search.")
        return
    if not _search_button("Search fits", _token(text, "pressfit")):
        return
    r, errs = _search(text, "pressfit", tuple(sorted(admitted.items())))
    if r is None:
        for t in errs:
            st.error(widgets.error_text(InputError(*t)), icon=":material/error:")
        return
    system = state.system()
    entry = state.joint("pressfit", name)
    hole, shaft, _ = _current_classes(entry)
    own = f"{hole}/{shaft}" if hole else None
    st.subheader(f"{widgets.esc(r.joint)}: {len(r.passing)} of {r.evaluated} fits at "
                 f"Ø {unitsys.show(r.nominal_mm, 'length', system)} pass every check")
    if own:
        rank = next((c.rank for c in r.passing if f"{c.hole}/{c.shaft}" == own), None)
        rej = next((c for c in r.rejected if f"{c.hole}/{c.shaft}" == own), None)
        if rank:
            st.caption(f"The joint's own fit {widgets.esc(own)} ranks #{rank} of {len(r.passing)}.")
        elif rej:
            st.caption(f"The joint's own fit {widgets.esc(own)} fails: {widgets.esc(_failing(rej))}.")
    if r.passing:
        shrink = (entry or {}).get("assembly") == "shrink"
        rows = []
        for c in r.passing:
            marks = (["★ preferred"] if c.preferred else []) + \
                (["● in the case"] if f"{c.hole}/{c.shaft}" == own else [])
            row = {"rank": c.rank, "fit": f"{c.hole}/{c.shaft}", "basis": c.basis,
                   "note": ", ".join(marks),
                   "interference": _range(c.interference_min_um, c.interference_max_um, "um",
                                          system),
                   "slip safety, loosest": unitsys.num(c.slip_safety_min, 3),
                   **({"hub plastic zone (share of wall)": f"{c.plastic_zone_share:.0%}"}
                      if c.plastic_zone_share is not None else  # elastic-plastic design
                      {"hub yield safety": unitsys.num(c.hub_yield_safety, 3)}),
                   "shaft yield safety": unitsys.num(c.shaft_yield_safety, 3)}
            if shrink:
                row["hub heating to"] = unitsys.show_in(c.shrink_temperature, "degC", system)
            else:
                row["press-in force, largest"] = unitsys.show_in(c.press_force_max, "N", system)
            row["pressure"] = _range(c.pressure_min, c.pressure_max, "MPa", system)
            rows.append(row)
        st.markdown("**Passing fits** (largest slip safety at the loosest fit first; "
                    "★ preferred fit)")
        widgets.long_table(pd.DataFrame(rows), key=f"{PREFIX}.passing", what="passing fits")
        _take_picker(name, r, own)
    if r.rejected:
        rows = [{"fit": f"{c.hole}/{c.shaft}", "note": "★ preferred" if c.preferred else "",
                 "interference": _range(c.interference_min_um, c.interference_max_um, "um",
                                        system),
                 "slip safety, loosest": unitsys.num(c.slip_safety_min, 3),
                 "fails (margin)": _failing(c)} for c in r.rejected[:10]]
        st.markdown("**Nearest rejected fits** (the nearest to passing first)")
        widgets.static_table(pd.DataFrame(rows), key=f"{PREFIX}.rejected")
    for n in r.notes:
        st.caption(f"Note: {widgets.esc(widgets.prose(n, state.system()))}")


def _take_picker(name: str, r, own: str | None) -> None:
    ss = st.session_state
    labels = {f"{c.hole}/{c.shaft}": c for c in r.passing}
    key = f"{PREFIX}.take"
    if ss.get(key) not in labels:
        ss[key] = next(iter(labels))
    c = st.columns([2, 3], vertical_alignment="bottom")
    chosen = c[0].selectbox("Fit to use", list(labels), key=key,
                            format_func=lambda f: f"#{labels[f].rank} {f}"
                            + (" ★" if labels[f].preferred else ""),
                            help="A passing fit to put into the joint of the case.")
    cand = labels[chosen]
    c[1].button("Use this fit in the case", key=f"{PREFIX}.take.button", disabled=chosen == own,
                on_click=_take_fit, args=(name, cand.hole, cand.shaft, r.nominal_mm),
                icon=":material/input:",
                help="Writes the fit into the joint of the working case; the page *Press fit* "
                "then evaluates it.")


def _failing(c) -> str:
    parts = []
    for n, m in c.failing:
        parts.append(f"{n} ({unitsys.margin_text(m)})" if math.isfinite(m) else n)
    return "; ".join(parts)


def _range(lo: float, hi: float, unit: str, system: str) -> str:
    a, b = unitsys.show_in(lo, unit, system), unitsys.show_in(hi, unit, system)
    sym = b.split(" ", 1)[1] if " " in b else ""
    return f"{a.split(' ', 1)[0]} … {b}" if sym and a.endswith(sym) else f"{a} … {b}"


# --------------------------------------------------------------------------- bearing seats

def _take_seat(name: str, seat: str, cls: str) -> None:
    entry = state.joint("bearing", name)
    if entry is None:
        return
    entry[seat] = cls
    st.session_state[joints.wkey("br", name, seat)] = cls
    st.session_state[SEARCH_RUN] = _token(state.doc_text(state.single_joint_doc("bearing", name)),
                                          "bearing")
    st.session_state[TAKEN] = (f"Seat class **{widgets.esc(cls)}** is now the {seat} seat of *{widgets.esc(name)}* in the "
                               "case; the page *Bearing seats* shows it.")


def _seat_search_section(name: str, text: str) -> None:
    st.caption("Each shaft class (the letters and grades admitted) with the housing as given, and "
               "each housing class with the shaft as given, checked by the bearing-seat engine. "
               "The lot study covers press fits.")
    admitted = _admitted("bearing")  # seeds the widgets first
    _admitted_widgets("bearing")
    if not (admitted["shaft_letters"] and admitted["shaft_grades"]) and \
            not (admitted["housing_letters"] and admitted["housing_grades"]):
        st.info("Admit at least one letter with one grade to search.")
        return
    if not _search_button("Search seat classes", _token(text, "bearing")):
        return
    r, errs = _search(text, "bearing", tuple(sorted(admitted.items())))
    if r is None:
        for t in errs:
            st.error(widgets.error_text(InputError(*t)), icon=":material/error:")
        return
    st.subheader(f"{widgets.esc(r.joint)}: bearing {widgets.esc(r.designation)}, given shaft {r.shaft_given}, "
                 f"housing {r.housing_given}")
    for seat, items, given in (("shaft", r.shafts, r.shaft_given),
                               ("housing", r.housings, r.housing_given)):
        rows = [{"rank": str(c.rank) if c.ok else "—", "class": c.cls,  # one type a column
                 "recommended": "★" if c.recommended else "",
                 "in the case": "●" if c.cls == given else "",
                 "operating clearance": _range(*c.operating_clearance_um, "um", state.system()),
                 "ring grip, loosest": unitsys.show_in(c.grip_um, "um", state.system())
                 + ("" if c.grips else " (may creep)"),
                 "verdict": widgets.PASS if c.ok else widgets.FAIL,
                 "fails (margin)": _failing(c)} for c in items]
        st.markdown(f"**{seat.capitalize()} classes** ({'housing' if seat == 'shaft' else 'shaft'}"
                    " as given; passing ranked first; ★ recommended)")
        widgets.long_table(pd.DataFrame(rows), key=f"{PREFIX}.{seat}s", what=f"{seat} classes")
        good = [c.cls for c in items if c.ok]
        if good:
            ss, key = st.session_state, f"{PREFIX}.take.{seat}"
            if ss.get(key) not in good:
                ss[key] = good[0]
            c = st.columns([2, 3], vertical_alignment="bottom")
            chosen = c[0].selectbox(f"{seat.capitalize()} class to use", good, key=key)
            c[1].button(f"Use this {seat} class in the case", key=f"{key}.button",
                        disabled=chosen == given, on_click=_take_seat, args=(name, seat, chosen),
                        icon=":material/input:")
    for n in r.notes:
        st.caption(f"Note: {widgets.esc(widgets.prose(n, state.system()))}")


if __name__ == "__main__":
    render()
