"""Evaluation of a bearing seat in every temperature state, the clearance verdict by probable
combination, and the tables for output. Part of :mod:`fitcheck.bearings`.
"""

from __future__ import annotations

import math
import warnings
from collections.abc import Mapping

import numpy as np

from .. import shaft as _shaft
from ..checks import Check
from ..core import bearing as core
from ..core import clearance_stats as stats
from ..errors import InputError, MethodRangeWarning
from ..materials import Material
from .catalogue import (
    _deviation,
    _groups_at,
    _resolve_level,
    bearing,
    housing_group,
    radial_clearance,
    recommend_seats,
)
from .results import BearingSeatResult, _pair
from .schema import BearingSeatInput, _zone, ring_material

# --------------------------------------------------------------------------- analysis

def evaluate(inp: BearingSeatInput) -> BearingSeatResult:
    """Fit, ring deformation and operating clearance of one bearing seat.

    Every temperature state is evaluated (mounted at room temperature, operating, and the lowest
    and highest ambient where given). The clearance verdict holds the *mean* operating clearance
    (every tolerance at its mean) of the governing state against ``clearance_min``; beside it the
    probable range (:func:`fitcheck.core.clearance_stats.probable_clearance`). The arithmetic
    worst case (tightest pairing of both seats, smallest group clearance) stays as information.

    Examples
    --------
    >>> r = evaluate(BearingSeatInput.from_mapping({"designation": "6204", "shaft": "k5",
    ...                                              "housing": "H7"}))
    >>> r.shaft_interference_um, r.housing_clearance_um
    ((2.0, 21.0), (0.0, 36.0))
    >>> [round(x, 1) for x in r.operating_clearance_um], r.smallest_group_worst_case
    ([-8.3, 20.0], 'C4')
    >>> round(r.clearance_mean_um, 1), round(r.clearance_probable_min_um, 1), r.ok
    (6.3, 1.3, True)
    """
    if isinstance(inp, Mapping):
        inp = BearingSeatInput.from_mapping(inp)
    b = bearing(inp.designation)
    ring = ring_material()
    level = _resolve_level(inp.load_level, inp.load_ratio)
    group_h = housing_group(inp.housing_material)
    try:
        rec = recommend_seats(b, inp.load, level, None, inp.housing_material)
    except InputError:
        if "auto" in (inp.shaft, inp.housing):
            raise
        rec = None
    shaft_cls = rec.shaft if inp.shaft == "auto" else inp.shaft
    housing_cls = rec.housing if inp.housing == "auto" else inp.housing
    recommended = (rec.shaft, rec.housing) if rec is not None else ("", "")
    zs = _zone(b.d, shaft_cls, "shaft")
    zh = _zone(b.D, housing_cls, "housing")
    bore_dev = _deviation("inner", b.d, inp.tolerance_class, "designation")
    out_dev = _deviation("outer", b.D, inp.tolerance_class, "designation")
    notes: list[str] = []

    # temperatures [°C]
    ta = inp.temperature_assembly
    ti = ta if inp.temperature_inner is None else inp.temperature_inner
    to = ti if inp.temperature_outer is None else inp.temperature_outer
    tsh = ti if inp.temperature_shaft is None else inp.temperature_shaft
    th = to if inp.temperature_housing is None else inp.temperature_housing
    if ring.max_heating_C == ring.max_heating_C and max(ti, to) > ring.max_heating_C:
        warnings.warn(f"ring temperature above {ring.max_heating_C:g} degC: the ring steel may change "
                      "size (dimensional stability); the clearance figures assume it does not",
                      MethodRangeWarning, stacklevel=2)

    # interference limits [µm] (tolerance, before smoothing)
    ui = np.array(core.fit_limits(zs.upper_um, zs.lower_um, bore_dev[0], bore_dev[1]))
    uo = np.array(core.fit_limits(out_dev[0], out_dev[1], zh.upper_um, zh.lower_um))
    s_i = core.smoothing_um(inp.rz_shaft, inp.rz_ring)
    s_o = core.smoothing_um(inp.rz_housing, inp.rz_ring)
    # mid-tolerance pairing (every part at the middle of its tolerance) appended as a third entry
    ui = np.append(ui, ui.mean())
    uo = np.append(uo, uo.mean())
    ui_eff = np.asarray(core.effective_interference_um(ui, s_i))
    uo_eff = np.asarray(core.effective_interference_um(uo, s_o))
    m_s, m_h = inp.shaft_material, inp.housing_material
    dti = 1000.0 * core.thermal_interference_change(b.d, m_s.alpha, tsh, ring.alpha, ti, ta)
    dto = 1000.0 * core.thermal_interference_change(b.D, ring.alpha, to, m_h.alpha, th, ta)
    ui_op = ui_eff + dti
    uo_op = uo_eff + dto

    # ring deformation (arrays: [min, max, mid] at assembly, then at operating temperature)
    d_ie, D_oe = core.equivalent_ring_diameters(b.d, b.D)
    if inp.housing_outer_diameter is not None:
        Dh = inp.housing_outer_diameter
    elif inp.housing_wall is not None:
        Dh = b.D + 2.0 * inp.housing_wall
    else:
        Dh = math.inf
    di = inp.shaft_bore
    ui_all = np.concatenate([ui_eff, ui_op]) / 1000.0
    uo_all = np.concatenate([uo_eff, uo_op]) / 1000.0
    p_i, grow_i, hoop_i = core.inner_ring_fit(ui_all, b.d, di, d_ie, m_s.E, m_s.nu, ring.E, ring.nu)
    p_o, contr_o = core.outer_ring_fit(uo_all, b.D, D_oe, Dh, ring.E, ring.nu, m_h.E, m_h.nu)
    from ..core.lame import hub_stresses

    _, hoop_h = hub_stresses(p_o, b.D, Dh, b.D / 2.0)
    red = 1000.0 * (np.asarray(grow_i) + np.asarray(contr_o))  # [µm]: min, max, mid (assembly); same (op)
    red_fit = red[:2]
    red_ring_t = 1000.0 * core.thermal_clearance_reduction(ring.alpha, ti, to, b.pitch_diameter)
    red_op = red[3:5] + red_ring_t
    red_op_mid = red[5] + red_ring_t
    red_thermal = red_op - red_fit

    # clearance
    kind_dg = b.kind == "deep_groove_ball"
    group = inp.clearance_group
    # raceway change per µm of effective interference (Lamé: linear in the interference)
    k_i = float(np.asarray(core.inner_ring_fit(1e-3, b.d, di, d_ie, m_s.E, m_s.nu, ring.E, ring.nu)[1])) * 1e3
    k_o = float(np.asarray(core.outer_ring_fit(1e-3, b.D, D_oe, Dh, ring.E, ring.nu, m_h.E, m_h.nu)[1])) * 1e3
    states = _seat_states(ta, ti, to, tsh, th, inp.temperature_min, inp.temperature_max)
    tol = dict(inner_ring_um=(bore_dev[1], bore_dev[0]), shaft_um=(float(zs.lower_um), float(zs.upper_um)),
               outer_ring_um=(out_dev[1], out_dev[0]), housing_um=(float(zh.lower_um), float(zh.upper_um)))

    def state_stats(g_pair, st_, full=True):
        _, t_i, t_o, t_s, t_h = st_
        return stats.probable_clearance(
            g_pair, **tol, s_inner=float(s_i), s_outer=float(s_o),
            dt_inner=1000.0 * core.thermal_interference_change(b.d, m_s.alpha, t_s, ring.alpha, t_i, ta),
            dt_outer=1000.0 * core.thermal_interference_change(b.D, ring.alpha, t_o, m_h.alpha, t_h, ta),
            k_inner=k_i, k_outer=k_o,
            ring_thermal_um=1000.0 * core.thermal_clearance_reduction(ring.alpha, t_i, t_o, b.pitch_diameter),
            required_um=inp.clearance_min, distribution=inp.clearance_distribution, full=full)

    if kind_dg:
        g0 = np.array(radial_clearance(b.d, group))
        per_state = [dict(state=st_[0], **state_stats(g0, st_)) for st_ in states]
        gov = min(per_state, key=lambda x: (x["mean"], -x["p_below"]))
        smallest = smallest_wc = None
        for g in _groups_at(b.d):
            gl, gh = radial_clearance(b.d, g)
            quick = [state_stats((gl, gh), st_, full=False) for st_ in states]
            if smallest is None and min(q["mean"] for q in quick) >= inp.clearance_min:
                smallest = g
            if smallest_wc is None and min(q["worst_min"] for q in quick) >= inp.clearance_min:
                smallest_wc = g
    else:
        g0 = np.array([math.nan, math.nan])
        per_state, gov = [], None
        smallest = smallest_wc = None
        notes.append("ISO 5753-1 clearance groups apply to deep-groove ball bearings; an angular-contact "
                     "bearing is set by adjustment: the fit-up and thermal change of its clearance "
                     "(or preload) are given, the operating clearance is not")
        warnings.warn(f"{b.designation}: radial clearance groups are not defined for angular-contact "
                      "bearings; the clearance check is left out", MethodRangeWarning, stacklevel=2)
    after_fit = np.array([g0[0] - red_fit[1], g0[1] - red_fit[0]])
    operating = np.array([g0[0] - red_op[1], g0[1] - red_op[0]])
    operating_mid = float(g0.mean() - red_op_mid)

    # axial retention by friction at the loosest operating pairing
    held_by_friction = inp.axial_location == "none" and inp.axial_force > 0
    mu_notes = notes if held_by_friction else []
    mu_i, mu_o = ((inp.friction, inp.friction) if inp.friction is not None else
                  (_seat_friction(m_s, ring, mu_notes), _seat_friction(ring, m_h, mu_notes)))
    cap_i = core.friction_capacity(float(np.asarray(p_i)[3]), b.d, b.B, mu_i)
    cap_o = core.friction_capacity(float(np.asarray(p_o)[3]), b.D, b.B, mu_o)

    checks: list[Check] = []
    if kind_dg:
        worst_all = min(x["worst_min"] for x in per_state)
        dist = "±3σ normal" if inp.clearance_distribution == "normal" else "uniform"
        checks.append(Check(
            "operating radial clearance (mean, probable combination)", gov["mean"], inp.clearance_min,
            ">=", "um", "ISO 5753-1:2009, Table 1; Lamé ring deformation (Shigley eq. 3-56); statistical "
            "tolerancing (RSS), probable-interference rule of bearing-engineering handbooks",
            f"governing state: {gov['state']}; group {group}, every tolerance at its mean; at the maximum "
            f"probable interference {gov['probable_min']:.1f} um; σ {gov['sigma']:.1f} um ({dist} bands), "
            f"P(clearance < {inp.clearance_min:g} um) = {100 * gov['p_below']:.1f} %; arithmetic worst case "
            f"{worst_all:.1f} um (information); smallest group whose mean passes: "
            f"{smallest or 'none tabulated'}"))
        if gov["probable_min"] < inp.clearance_min:
            notes.append(
                f"the probable minimum clearance ({gov['probable_min']:.1f} um, {gov['state']}) is below "
                f"{inp.clearance_min:g} um: about {100 * gov['p_below']:.1f} % of the bearings of a lot run "
                "with slight preload: acceptable for deep-groove ball bearings at moderate speed; choose "
                f"{_next_group(b.d, group) or 'a larger group'} for a hot inner ring or high speed")
        if operating[0] < inp.clearance_min or worst_all < inp.clearance_min:
            notes.append(_worst_case_note(
                group, smallest_wc, inp.clearance_min, min(float(operating[0]), worst_all), operating_mid,
                red_op[1], float(g0[0]), (shaft_cls, float(zs.upper_um), float(bore_dev[1])),
                (housing_cls, float(zh.lower_um)) if np.asarray(contr_o)[4] > 0 else None,
                b.d, red_op[1] - float(_clearance_min_below(b.d, smallest_wc)) if smallest_wc else None))
    # the other temperature states (lowest / highest ambient): grip of the loosest and stress of the
    # tightest pairing, state by state; (name, thermal change inner, outer) [µm]
    dts = [(st_[0], 1000.0 * core.thermal_interference_change(b.d, m_s.alpha, st_[3], ring.alpha, st_[1], ta),
            1000.0 * core.thermal_interference_change(b.D, ring.alpha, st_[2], m_h.alpha, st_[4], ta))
           for st_ in states]
    hoop_max, hoop_state = float(np.max(hoop_i)), "operating"
    hoop_h_max = float(np.max(hoop_h))
    for name_, dt_i, dt_o in dts:
        hi_ = float(np.asarray(core.inner_ring_fit((ui_eff[1] + dt_i) / 1000.0, b.d, di, d_ie, m_s.E, m_s.nu,
                                                   ring.E, ring.nu)[2]))
        if hi_ > hoop_max:
            hoop_max, hoop_state = hi_, name_
        po_ = core.outer_ring_fit((uo_eff[1] + dt_o) / 1000.0, b.D, D_oe, Dh, ring.E, ring.nu, m_h.E, m_h.nu)[0]
        hoop_h_max = max(hoop_h_max, float(np.asarray(hub_stresses(po_, b.D, Dh, b.D / 2.0)[1])))
    checks.append(Check("hoop stress at the inner-ring bore", hoop_max, inp.hoop_stress_limit, "<=",
                        "MPa", "Lamé, Shigley eq. (3-58); limit: common practice for through-hardened rings "
                        "(about 25 ksi)", f"tightest pairing; governing state: {hoop_state}"))
    if hoop_h_max > 0 and math.isfinite(m_h.Rp02):
        checks.append(Check("hoop stress at the housing bore", hoop_h_max, m_h.Rp02, "<=", "MPa",
                            "Lamé, Shigley eq. (3-58); limit: yield strength Rp0.2 of the housing"))
    rotating = ("inner ring on shaft", ui_eff, ui_op, s_i) if inp.load == "rotating_inner" \
        else ("outer ring in housing", uo_eff, uo_op, s_o)
    # the loosest state of the ring under circumferential load (operating, or a colder / hotter ambient)
    k_rot = 1 if inp.load == "rotating_inner" else 2
    grip_state, grip_dt = "operating", float(rotating[2][0] - rotating[1][0])
    for x in dts:
        if x[k_rot] < grip_dt - 1e-12:
            grip_state, grip_dt = x[0], x[k_rot]
    rotating = (rotating[0], rotating[1], np.asarray(rotating[1]) + grip_dt, rotating[3])
    if rotating[1][0] > 0:
        checks.append(Check(
            f"rotating-load ring keeps its grip at operating temperature ({rotating[0]})",
            float(rotating[2][0]), 0.0, ">=", "um", "DIN 7190-1:2017, 6.4 (thermal change of interference)",
            "loosest pairing, effective interference after smoothing; a ring under circumferential load "
            f"that loses its interference creeps; governing state: {grip_state}"))
    else:
        # the loosest pairing has no grip: hold at least the mid-tolerance pairing to an interference
        checks.append(Check(
            f"rotating-load ring is an interference fit at mid-tolerance ({rotating[0]})",
            float(rotating[2][2]), 0.0, ">=", "um",
            "DIN 5425-1 (ring under circumferential load: interference fit); DIN 7190-1:2017, 6.2, 6.4",
            f"every part at the middle of its tolerance, after smoothing; governing state: {grip_state}"))
        notes.append(f"the loosest pairing of the {rotating[0]} seat has no interference left after "
                     f"smoothing ({float(rotating[2][0]):.1f} um at operating temperature, smoothing "
                     f"{float(rotating[3]):.1f} um); at mid-tolerance it is {float(rotating[2][2]):.1f} um. "
                     "A ring under circumferential load without interference can creep and wear its "
                     "seat: finer seat roughness, a tighter class (it also takes more clearance) or "
                     "measured and paired parts help")
    if held_by_friction:
        for what, cap, mu in (("inner ring on shaft", cap_i, mu_i), ("outer ring in housing", cap_o, mu_o)):
            checks.append(Check(f"axial force held by friction ({what})", float(cap), inp.axial_force,
                                ">=", "N", "DIN 7190-1:2017, 7 (mu p pi d B), loosest pairing",
                                f"no shoulder or retaining ring declared; mu = {mu:g}"))
    if rec is not None and "auto" in (inp.shaft, inp.housing):
        notes.extend(rec.notes)
    shaft = _shaft.evaluate_seat(d=b.d, di=inp.shaft_bore, material=m_s, rz_um=inp.rz_shaft,
                                 loads=inp.shaft_loads, torque=inp.shaft_loads.torque or 0.0,
                                 axial_force=inp.axial_force, temperature=tsh, what="bearing inner ring")
    checks.extend(shaft.checks)
    notes.extend(shaft.notes)
    for msg in shaft.warnings:
        warnings.warn(f"{b.designation}: {msg}", MethodRangeWarning, stacklevel=2)

    return BearingSeatResult(
        name=inp.name, designation=b.designation, series=b.series, kind=b.kind,
        bore_mm=b.d, outside_mm=b.D, width_mm=b.B, tolerance_class=inp.tolerance_class,
        load=inp.load, load_level=level, housing_group=group_h,
        shaft_class=shaft_cls, housing_class=housing_cls,
        recommended_shaft=recommended[0], recommended_housing=recommended[1],
        bore_deviation_um=bore_dev, outside_deviation_um=out_dev,
        shaft_deviation_um=(float(zs.upper_um), float(zs.lower_um)),
        housing_deviation_um=(float(zh.upper_um), float(zh.lower_um)),
        shaft_interference_um=_pair(ui), housing_clearance_um=(float(-uo[1]) + 0.0, float(-uo[0]) + 0.0),
        smoothing_inner_um=float(s_i), smoothing_outer_um=float(s_o),
        shaft_interference_effective_um=_pair(ui_eff),
        housing_interference_effective_um=_pair(uo_eff),
        thermal_change_inner_um=float(dti), thermal_change_outer_um=float(dto),
        shaft_interference_operating_um=_pair(ui_op), housing_interference_operating_um=_pair(uo_op),
        equivalent_inner_ring_diameter_mm=float(d_ie), equivalent_outer_ring_bore_mm=float(D_oe),
        contact_pressure_inner_MPa=_pair(np.asarray(p_i)[3:5]),
        contact_pressure_outer_MPa=_pair(np.asarray(p_o)[3:5]),
        ring_hoop_stress_max_MPa=hoop_max, housing_hoop_stress_max_MPa=hoop_h_max,
        clearance_group=group, initial_clearance_um=_pair(g0),
        fitup_reduction_um=_pair(red_fit), clearance_after_fitup_um=_pair(after_fit),
        thermal_reduction_um=_pair(red_thermal), ring_temperature_reduction_um=float(red_ring_t),
        clearance_reduction_um=_pair(red_op), operating_clearance_um=_pair(operating),
        operating_clearance_mid_um=operating_mid,
        shaft_interference_mid_operating_um=float(ui_op[2]),
        housing_interference_mid_operating_um=float(uo_op[2]),
        clearance_min_um=inp.clearance_min, smallest_passing_group=smallest,
        axial_force_N=inp.axial_force, axial_location=inp.axial_location,
        axial_capacity_inner_N=float(cap_i), axial_capacity_outer_N=float(cap_o),
        friction_inner=float(mu_i), friction_outer=float(mu_o),
        temperature_assembly_C=ta, temperature_inner_C=ti, temperature_outer_C=to,
        temperature_shaft_C=tsh, temperature_housing_C=th,
        notes=tuple(dict.fromkeys(notes)), checks=tuple(checks), shaft=shaft,
        clearance_state=gov["state"] if gov else "", clearance_mean_um=gov["mean"] if gov else math.nan,
        clearance_probable_min_um=gov["probable_min"] if gov else math.nan,
        clearance_sigma_um=gov["sigma"] if gov else math.nan,
        clearance_probability_below=gov["p_below"] if gov else math.nan,
        clearance_distribution=inp.clearance_distribution,
        clearance_worst_case_um=min((x["worst_min"] for x in per_state), default=math.nan),
        smallest_group_worst_case=smallest_wc, clearance_states=tuple(per_state),
        temperature_min_C=inp.temperature_min, temperature_max_C=inp.temperature_max,
        headline=_seat_headline(checks, gov, group, smallest),
    )


def _seat_states(ta, ti, to, tsh, th, tmin, tmax) -> list[tuple]:
    """(name, t_inner, t_outer, t_shaft, t_housing) of every temperature state of a seat [°C]."""
    out = [(f"mounted, room temperature ({ta:g} °C)", ta, ta, ta, ta)]
    if (ti, to, tsh, th) != (ta, ta, ta, ta):
        parts = f"inner ring {ti:g} °C, outer ring {to:g} °C"
        if (tsh, th) != (ti, to):
            parts += f", shaft {tsh:g} °C, housing {th:g} °C"
        out.append((f"operating ({parts})", ti, to, tsh, th))
    for t, what in ((tmin, "lowest"), (tmax, "highest")):
        if t is not None and t != ta:
            out.append((f"{what} ambient {t:g} °C, all parts (at standstill)", t, t, t, t))
    return out


def _next_group(d: float, group: str) -> str | None:
    groups = _groups_at(d)
    i = groups.index(group) if group in groups else -1
    return groups[i + 1] if 0 <= i < len(groups) - 1 else None


def _seat_headline(checks, gov, group, smallest) -> str:
    """One sentence first read: the verdict, its cause and the next step."""
    failing = [c for c in checks if not c.passed]
    if not failing:
        if gov is None:
            return "Every check holds (the operating clearance of an angular-contact bearing is set by adjustment)."
        return (f"Holds: mean operating clearance {gov['mean']:.1f} um ({gov['state']}), "
                f"{100 * gov['p_below']:.1f} % of a lot below the limit.")
    out = []
    for c in failing:
        if c.name.startswith("operating radial clearance"):
            out.append(f"Too little clearance: the mean operating clearance is {c.value:.1f} um against "
                       f"{c.limit:g} um ({gov['state']}). Next: group {smallest or 'larger than tabulated'} "
                       "or a looser shaft or housing class (fitcheck search)")
        elif c.name.startswith("rotating-load ring"):
            out.append(f"The ring under circumferential load may creep ({c.value:.1f} um of interference). "
                       "Next: a tighter class for that seat, finer roughness (fitcheck search)")
        elif _shaft.is_shaft_check(c):
            out += [x for x in (_shaft.headline_sentence(c),) if x]
        elif c.name.startswith("hoop stress"):
            out.append(f"{c.name[0].upper()}{c.name[1:]} {c.value:.0f} MPa exceeds {c.limit:.0f} MPa. "
                       "Next: a looser class")
        else:
            out.append(f"{c.name[0].upper()}{c.name[1:]} fails ({c.value:.4g} {c.unit} against {c.limit:.4g}). "
                       "Next: a shoulder or retaining ring, or a tighter seat")
    return "Does not hold. " + " ".join(x + "." for x in out)


def _seat_friction(male: Material, female: Material, notes: list) -> float:
    """Friction against axial slip of a pressed-in seat: data/pressfit_friction.csv (press, oiled).

    Where the table has no value for the pair, its lowest press-fit value is used (on the safe side
    for the axial capacity) and a note says so.
    """
    from ..pressfit import _friction_rows, default_friction

    row = default_friction(male.group, female.group, "press")
    if row is not None:
        return row[0]
    low = min(r["mu_slip"] for r in _friction_rows() if r["assembly"] == "press")
    notes.append(f"no tabulated friction for {male.name} in {female.name}: the lowest press-fit value "
                 f"{low:g} of data/pressfit_friction.csv is used for the axial capacity (give 'friction')")
    return low


def _clearance_min_below(d: float, group: str) -> float:
    """Smallest clearance [µm] of the group just below ``group`` at bore ``d`` (NaN for the first)."""
    groups = _groups_at(d)
    i = groups.index(group)
    return radial_clearance(d, groups[i - 1])[0] if i > 0 else math.nan


def _worst_case_note(group, smallest, limit, worst, mid, reduction, g_min, shaft, housing, d,
                     below_short) -> str:
    """Why the clearance check fails at the arithmetic worst case, and what passes."""
    cls, upper, bore_lower = shaft
    parts = [f"largest shaft ({cls} {upper:+g} um) in the smallest ring bore ({bore_lower:+g} um)"]
    if housing is not None:
        parts.append(f"smallest housing bore ({housing[0]} {housing[1]:+g} um) on the largest outer ring")
    text = (f"group {group} loses its clearance only in the arithmetic worst case (information; the verdict is "
            f"the mean clearance): {' and '.join(parts)}, with the "
            f"smallest {group} clearance ({g_min:g} um); fit-up and temperature then take {reduction:.1f} um "
            f"and leave {worst:.1f} um (limit {limit:g} um). With every part at mid-tolerance the operating "
            f"clearance is {mid:.1f} um. ")
    if smallest is None:
        return text + ("No tabulated group keeps the limit in the worst case: a looser shaft or housing "
                       "class, or measured and paired parts.")
    text += f"Group {smallest} keeps at least {limit:g} um even in the worst case"
    if below_short is not None and math.isfinite(below_short) and _groups_at(d).index(smallest) > 0:
        prev = _groups_at(d)[_groups_at(d).index(smallest) - 1]
        if prev != group:
            text += f" ({prev} leaves {-below_short:.1f} um)"
    return text + ("; otherwise a looser shaft class, or measured and paired parts. The worst case is "
                   "rare, but a bearing run without clearance is preloaded and runs hot.")


def summary_rows(result: BearingSeatResult) -> list[list[str]]:
    """Rows (quantity, min, max, unit) for a text table of the main results."""
    def fmt(x, digits):
        return f"{x:.{digits}f}" if math.isfinite(x) else "-"

    def pr(p, digits=1):
        return [fmt(p[0], digits), fmt(p[1], digits)]
    return [
        ["bore deviation (ISO 492), lower / upper", *pr(result.bore_deviation_um[::-1], 0), "um"],
        ["outside-diameter deviation (ISO 492), lower / upper", *pr(result.outside_deviation_um[::-1], 0), "um"],
        [f"shaft {result.shaft_class}: interference", *pr(result.shaft_interference_um, 0), "um"],
        [f"housing {result.housing_class}: clearance", *pr(result.housing_clearance_um, 0), "um"],
        ["inner seat, effective interference at operation", *pr(result.shaft_interference_operating_um), "um"],
        ["outer seat, effective interference at operation",
         *pr(result.housing_interference_operating_um), "um"],
        ["contact pressure inner ring", *pr(result.contact_pressure_inner_MPa), "MPa"],
        ["contact pressure outer ring", *pr(result.contact_pressure_outer_MPa), "MPa"],
        [f"initial clearance {result.clearance_group}", *pr(result.initial_clearance_um, 0), "um"],
        ["clearance reduction (fit-up + thermal)", *pr(result.clearance_reduction_um), "um"],
        ["operating clearance", *pr(result.operating_clearance_um), "um"],
        ["operating clearance, every part at mid-tolerance", fmt(result.operating_clearance_mid_um, 1),
         "", "um"],
        ["operating clearance, mean (verdict) / at max. probable interference",
         fmt(result.clearance_mean_um, 1), fmt(result.clearance_probable_min_um, 1), "um"],
    ]



#: Stages of the clearance budget, in order.
BUDGET_STAGES = ("initial", "fit-up", "thermal", "operating")


def clearance_budget(result) -> dict[str, list[float]]:
    """Clearance after each stage of :data:`BUDGET_STAGES` [µm], tightest ("min") and loosest ("max").

    The data of the clearance-budget plot and the browser chart.

    >>> class R:
    ...     initial_clearance_um = (5.0, 20.0); clearance_after_fitup_um = (-8.0, 20.0)
    ...     operating_clearance_um = (-10.0, 19.0)
    >>> clearance_budget(R())["min"]
    [5.0, -8.0, -10.0, -10.0]
    """
    g0, g1, g3 = result.initial_clearance_um, result.clearance_after_fitup_um, result.operating_clearance_um
    return {"min": [g0[0], g1[0], g3[0], g3[0]], "max": [g0[1], g1[1], g3[1], g3[1]]}
