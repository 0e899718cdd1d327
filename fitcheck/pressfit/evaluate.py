"""Evaluation of one press or shrink fit over every operating state, its checks and its headline.
Part of :mod:`fitcheck.pressfit`.
"""

from __future__ import annotations

import math
import warnings

import numpy as np

from .. import shaft as _shaft
from ..checks import Check
from ..core import elastoplastic as _ep
from ..core import lame
from ..core import pressfit as _core
from ..errors import InputError, MethodRangeWarning
from ..materials import Material
from .results import PressFitCase, PressFitResult, _f
from .schema import (
    FRICTION_TABLE,
    REF_HEAT,
    REF_HUB,
    REF_PLASTIC,
    REF_PRESS,
    REF_SHAFT,
    REF_SLIP,
    REF_SPEED,
    RPM,
    PressFitInput,
    default_friction,
)


def _case(label, delta, d, L, di, Do, s: Material, h: Material, mu, loss_rz, Ts, Th, T0, w,
          p=None) -> PressFitCase:
    turning = w > 0.0   # rotation terms only when turning: an infinite hub at standstill gives 0, not 0·inf
    de = delta - loss_rz + lame.thermal_interference_change(d, s.alpha, h.alpha, Ts, Th, T0)
    if turning:
        de = de - lame.centrifugal_interference_loss(w, d, di, Do, s.E, s.nu, s.density, h.E, h.nu, h.density)
    plastic_design = p is not None  # the elastic-plastic design passes the kernel's pressure
    if p is None:
        p = lame.contact_pressure(de, d, di, Do, s.E, s.nu, h.E, h.nu)
    hr, ht = lame.hub_stresses(p, d, Do, d / 2.0)
    if plastic_design and p > _ep.elastic_limit_pressure(d, Do, h.Rp02):  # plastic hub bore
        ht = _ep.KAPPA_DIN * h.Rp02 - p
    sr, st = lame.shaft_stresses(p, d, di, d / 2.0)
    si = lame.shaft_stresses(p, d, di, di / 2.0)[1]
    if turning:
        ht = ht + lame.rotating_disc_stresses(h.density, w, h.nu, d, Do, d / 2.0)[1]
        st = st + lame.rotating_disc_stresses(s.density, w, s.nu, di, d, d / 2.0)[1]
        si = si + lame.rotating_disc_stresses(s.density, w, s.nu, di, d, di / 2.0)[1]
    vm_s = max(_f(lame.von_mises(sr, st)), abs(_f(si)))
    fcap = p * math.pi * d * L * mu
    return PressFitCase(label, delta, _f(de), _f(p), _f(fcap * d / 2.0), _f(fcap), _f(hr), _f(ht),
                        _f(lame.von_mises(hr, ht)), _f(sr), _f(st), _f(si), vm_s,
                        label, float(w), float(Ts), float(Th))


def _rpm_text(w: float) -> str:
    """A speed for people: ``20 000 rpm`` (thin groups of three)."""
    return f"{w / RPM:,.0f} rpm".replace(",", "\u2009")


def state_names(T0: float, Ts: float, Th: float, w: float, tmin: float | None = None,
                tmax: float | None = None) -> list[str]:
    """Names of the operating states in the order of the kernel's state codes (2·k + at speed).

    >>> state_names(20.0, 80.0, 40.0, 20000 * RPM)[:2]
    ['room temperature (20 °C) at standstill', 'cold start at 20\u2009000 rpm (20 °C)']
    """
    temps = _core.state_temperatures(Ts, Th, T0, tmin, tmax)
    spin = _rpm_text(w)
    out = []
    for k, (ts, th) in enumerate(temps):
        if k == 1:
            t = f"shaft {ts:g} °C, hub {th:g} °C" if ts != th else f"{ts:g} °C"
            out += [f"operating temperature ({t}) at standstill", f"operating temperature ({t}) at {spin}"]
        elif k == 0:
            start = f"cold start at {spin}" if ts <= min(Ts, Th) else f"room temperature at {spin}"
            out += [f"room temperature ({ts:g} °C) at standstill", f"{start} ({ts:g} °C)"]
        else:
            what = "lowest ambient" if (k == 2 and tmin is not None) else "highest ambient"
            start = "cold start" if ts <= T0 else "hot running"
            out += [f"{what} {ts:g} °C at standstill", f"{start} at {spin} ({what} {ts:g} °C)"]
    return out


# --------------------------------------------------------------------------- evaluate

def core_arguments(inp: PressFitInput) -> tuple[dict, str, str]:
    """Keyword arguments of :func:`fitcheck.core.pressfit.evaluate` for one input, defaults resolved.

    One place resolves what the input leaves open — friction from the table by material pair
    and assembly, the hub diameter from module and teeth, the joining clearance 0.001·d
    (common practice), the heating limit of the hub material, brittle parts — for
    :func:`evaluate` and for the tolerance study.

    Returns
    -------
    kwargs : dict
        Arguments of the kernel in core units (scalars).
    friction_source : str
        Where the friction coefficients came from.
    hub_rule : str
        How the hub outer diameter was found.
    """
    if not isinstance(inp, PressFitInput):
        raise InputError("pressfit", type(inp).__name__, "a PressFitInput (use PressFitInput.from_mapping)")
    if inp.shaft_material is None or inp.hub_material is None or math.isnan(inp.length):
        raise InputError(f"pressfit[{inp.name}]", inp.name, "length, shaft_material and hub_material")
    d, imin, imax = inp._limits()
    if inp.diameter is not None:
        d = inp.diameter
    Do, do_rule = inp.resolved_hub_outer_diameter()
    s, h = inp.shaft_material, inp.hub_material
    tab = default_friction(s.group, h.group, inp.assembly)
    if inp.mu_slip is None and tab is None:
        raise InputError(f"pressfit[{inp.name}].mu_slip", None,
                         f"a friction coefficient: {FRICTION_TABLE} has none for {s.group} "
                         f"in {h.group} ({inp.assembly})")
    mu_slip = inp.mu_slip if inp.mu_slip is not None else tab[0]
    if inp.mu_press is not None:
        mu_press = inp.mu_press
    elif inp.mu_slip is None and tab is not None:
        mu_press = tab[1]
    else:
        mu_press = mu_slip
    src_parts = ["mu_slip: given" if inp.mu_slip is not None else f"mu_slip: {tab[2]}"]
    if inp.mu_press is not None:
        src_parts.append("mu_press: given")
    elif inp.mu_slip is None:
        src_parts.append(f"mu_press: {FRICTION_TABLE}")
    else:
        src_parts.append("mu_press: = mu_slip")
    T0 = inp.temperature_assembly
    kwargs = dict(
        interference_min=imin, interference_max=imax, d=d, L=inp.length, di=inp.shaft_bore, Do=Do,
        Es=s.E, nus=s.nu, alphas=s.alpha, Rps=s.Rp02, rhos=s.density,
        Eh=h.E, nuh=h.nu, alphah=h.alpha, Rph=h.Rp02, rhoh=h.density,
        mu_slip=mu_slip, mu_press=mu_press, rz_shaft=inp.rz_shaft, rz_hub=inp.rz_hub,
        smoothing=inp.smoothing_factor, torque=inp.torque, axial_force=inp.slip_axial_force(),
        slip_safety=inp.slip_safety, omega=inp.speed, T_shaft=inp.temperature_shaft,
        T_hub=inp.temperature_hub, T_assembly=T0,
        joining_clearance=inp.joining_clearance if inp.joining_clearance is not None else 1e-3 * d,
        yield_safety=inp.yield_safety, brittle_shaft=not s.is_ductile, brittle_hub=not h.is_ductile,
        Rms=s.Rm, Rmh=h.Rm, fracture_safety=inp.fracture_safety, shrink=inp.assembly == "shrink",
        max_heating=h.max_heating_C if not math.isnan(h.max_heating_C) else np.inf,
        T_shaft_cooled=inp.temperature_shaft_cooled if inp.temperature_shaft_cooled is not None else T0,
        press_force_limit=inp.press_force_limit if inp.press_force_limit is not None else np.inf,
        T_min=inp.temperature_min, T_max=inp.temperature_max,
        design=inp.design, plastic_limit=inp.plastic_zone_limit)
    return kwargs, "; ".join(src_parts), do_rule


def evaluate(inp: PressFitInput) -> PressFitResult:
    """Evaluate one press or shrink fit: cases, capacities, stresses, assembly and checks.

    Warns with :class:`~fitcheck.errors.MethodRangeWarning` where the elastic method
    does not hold (hub bore or shaft yielding) or a material needs caution.
    """
    kw, friction_source, do_rule = core_arguments(inp)
    d, Do, mu_slip, mu_press = kw["d"], kw["Do"], kw["mu_slip"], kw["mu_press"]
    imin, imax = kw["interference_min"], kw["interference_max"]
    s, h = inp.shaft_material, inp.hub_material
    brittle_s, brittle_h, shrink = kw["brittle_shaft"], kw["brittle_hub"], kw["shrink"]
    max_heat, T0, w, jc = kw["max_heating"], kw["T_assembly"], kw["omega"], kw["joining_clearance"]
    loss_rz = inp.smoothing_factor * (inp.rz_shaft + inp.rz_hub)
    label = f"pressfit[{inp.name}]"
    r = _core.evaluate(**kw)
    r = {k: (_f(v) if np.asarray(v).dtype != bool else bool(v)) for k, v in r.items()}

    args = (d, inp.length, inp.shaft_bore, Do, s, h, mu_slip, loss_rz)
    Ts, Th = inp.temperature_shaft, inp.temperature_hub
    ep = {k: r[k] for k in ("p_min_op", "p_max_op", "p_min_asm", "p_max_asm")} \
        if inp.design == "elastic-plastic" else dict.fromkeys(("p_min_op", "p_max_op", "p_min_asm", "p_max_asm"))
    cases = {
        "loosest_operating": _case("loosest, operating", imin, *args, Ts, Th, T0, w, ep["p_min_op"]),
        "tightest_operating": _case("tightest, operating", imax, *args, Ts, Th, T0, w, ep["p_max_op"]),
        "loosest_assembly": _case("loosest, room temperature, standstill", imin, *args, T0, T0, T0, 0.0,
                                  ep["p_min_asm"]),
        "tightest_assembly": _case("tightest, room temperature, standstill", imax, *args, T0, T0, T0, 0.0,
                                   ep["p_max_asm"]),
    }
    # every operating state: temperature state × (standstill, operating speed)
    tmin, tmax = inp.temperature_min, inp.temperature_max
    names = state_names(T0, Ts, Th, w, tmin, tmax)
    temps = _core.state_temperatures(Ts, Th, T0, tmin, tmax)
    states, by_code = [], {}
    for code, name in enumerate(names):
        ts, th = temps[code // 2]
        ws = w if code % 2 else 0.0
        if code % 2 and w == 0.0:
            continue   # standstill is the only speed
        lo = _case(name, imin, *args, ts, th, T0, ws)
        hi = _case(name, imax, *args, ts, th, T0, ws)
        by_code[code] = (lo, hi)
    if inp.design == "elastic-plastic":
        # the partly plastic hub yields at the largest interference over every state and unloads
        # elastically to the others (the kernel's rule, core/pressfit.py), state by state
        ep_args = (d, inp.shaft_bore, Do, s.E, s.nu, h.E, h.nu, h.Rp02)
        c_p = _f(lame.contact_pressure(1.0, d, inp.shaft_bore, Do, s.E, s.nu, h.E, h.nu))
        for j, delta in ((0, imin), (1, imax)):
            peak = max(pair[j].effective_interference for pair in by_code.values())
            p_pk = _f(_ep.contact_pressure(peak, *ep_args))
            for code, pair in list(by_code.items()):
                c = pair[j]
                p_state = max(p_pk - (peak - c.effective_interference) * c_p, 0.0)
                ts, th = c.temperature_shaft, c.temperature_hub
                new_c = _case(c.label, delta, *args, ts, th, T0, c.speed, p_state)
                by_code[code] = (new_c, pair[1]) if j == 0 else (pair[0], new_c)
    for code in by_code:
        states += list(by_code[code])
    code_lo, code_tight = int(r["state_p_min"]), int(r["state_hub"])
    code_shaft, code_loose = int(r["state_shaft"]), int(r["state_loosening"])
    state_lo, state_tight = names[code_lo], names[code_tight]
    state_shaft = names[code_shaft]
    state_loose = names[code_loose].replace(" at standstill", "")
    loosest_gov, tightest_gov = by_code[code_lo][0], by_code[code_tight][1]
    tight_op = code_tight != 0

    # ---- checks
    rpm = 1.0 / RPM
    hub_req = inp.fracture_safety if brittle_h else inp.yield_safety
    shaft_req = inp.fracture_safety if brittle_s else inp.yield_safety
    hub_basis = "Rm / largest principal stress (brittle)" if brittle_h else "Rp0.2 / von Mises"
    shaft_basis = "Rm / largest principal stress (brittle)" if brittle_s else "Rp0.2 / von Mises"
    F_slip, thrust_note = slip_thrust(inp)
    load_note = ("no torque or axial force given: only the contact pressure is checked"
                 if inp.torque == 0 and F_slip == 0 else
                 f"demand √((2T/d)² + F²) with T = {inp.torque / 1000:g} N·m, "
                 + (thrust_note if thrust_note else f"F = {F_slip:g} N"))
    # what takes the interference at the governing loosest state [mm]
    loss_th = -_f(lame.thermal_interference_change(d, s.alpha, h.alpha, loosest_gov.temperature_shaft,
                                                   loosest_gov.temperature_hub, T0))
    loss_w = imin - loss_rz + (-loss_th) - loosest_gov.effective_interference
    why_zero = _why_no_pressure(imin, loss_rz, loss_th, loss_w)
    no_pressure_at_rest = by_code[code_loose][0].pressure <= 0
    if r["loosening_speed"] > 0:
        loosening_note = ""
        speed_note = (f"governing state: {state_loose}; speed at which the loosest fit loses all contact "
                      "pressure, against the operating speed")
    elif math.isinf(Do) and not no_pressure_at_rest:
        loosening_note = "not applicable: a hub of infinite outer diameter cannot turn"
        speed_note = loosening_note
    else:
        loosening_note = (f"not applicable: the loosest fit has no contact pressure even at standstill "
                          f"({state_loose})")
        speed_note = loosening_note
    checks = [
        Check("slip at loosest fit", r["slip_safety_min"] if r["p_min"] > 0 else 0.0, inp.slip_safety, ">=",
              "", REF_SLIP, f"governing state: {state_lo}; " + load_note
              + ("" if r["p_min"] > 0 else f"; no contact pressure: {why_zero}")),
        Check("hub yield at tightest fit", r["hub_yield_safety"], hub_req, ">=", "", REF_HUB,
              f"governing state: {state_tight}; safety {hub_basis} at the hub bore") if inp.design == "elastic" else
        plastic_zone_check(r["plastic_zone_diameter_max"], d, Do, inp.plastic_zone_limit),
        Check("shaft yield at tightest fit", r["shaft_yield_safety"], shaft_req, ">=", "", REF_SHAFT,
              f"governing state: {state_shaft}; safety {shaft_basis}, shaft surface and bore/centre"),
        # without contact pressure at standstill the joint holds at no speed at all: 0 rpm is held
        # against at least 1 rpm, so the check fails rather than pass as "0 rpm >= 0 rpm"
        Check("loosening speed", r["loosening_speed"] * rpm,
              max(w * rpm, 1.0) if no_pressure_at_rest else w * rpm, ">=", "rpm", REF_SPEED, speed_note),
    ]
    warns: list[str] = []
    if shrink:
        if math.isfinite(max_heat):
            checks.append(Check("hub heating temperature", r["shrink_temperature"], max_heat, "<=", "degC",
                                REF_HEAT, f"heating limit of {h.name} (tempering / ageing / softening)"))
        else:
            warns.append(f"no heating limit known for {h.name}: the hub temperature "
                         f"{r['shrink_temperature']:.0f} degC is not checked")
    if inp.press_force_limit is not None and not shrink:
        checks.append(Check("press-in force", r["press_force_max"], inp.press_force_limit, "<=", "N",
                            REF_PRESS, "at the tightest fit, room temperature, with mu_press"))

    # ---- method range and material cautions
    if brittle_h and inp.design == "elastic-plastic":
        raise InputError(f"{label}.design", inp.design, f"'elastic' for the brittle hub material {h.name}")
    if r["hub_yield_safety"] < 1.0 and inp.design == "elastic":
        warns.append(f"the hub bore exceeds its {'tensile strength' if brittle_h else 'yield strength'} at the "
                     "tightest fit: the elastic Lamé result no longer holds"
                     + ("" if brittle_h else "; design = 'elastic-plastic' designs a partly yielding hub "
                        "(DIN 7190-1:2017)"))
    if r["shaft_yield_safety"] < 1.0:
        warns.append("the shaft exceeds its yield strength at the tightest fit: the elastic result no longer "
                     "holds; the shaft must stay elastic in both designs (DIN 7190-1:2017)")
    for m, part in ((s, "shaft"), (h, "hub")):
        if m.group == "plastic":
            warns.append(f"{part} material {m.name} creeps: {m.note or 'long-term pressure is lower'}")
        elif not m.is_ductile:
            warns.append(f"{part} material {m.name} is brittle: checked with the largest principal stress "
                         "against Rm")
    if Do / d < 1.2:
        warns.append(f"thin hub (Do/d = {Do / d:.2f}): the hub's own stiffness and the plane-stress model "
                     "become uncertain")
    shaft = shaft_at_hub_edge(inp, d)
    checks.extend(shaft.checks)
    warns.extend(shaft.warnings)
    for msg in warns:
        warnings.warn(f"{label}: {msg}", MethodRangeWarning, stacklevel=2)
    headline = _headline(checks, r, state_lo, state_tight, state_shaft, state_loose, why_zero, w)

    return PressFitResult(
        name=inp.name, fit=inp.fit, diameter=d, length=inp.length, shaft_bore=inp.shaft_bore,
        hub_outer_diameter=Do, hub_outer_rule=do_rule, interference_min=imin, interference_max=imax,
        roughness_loss=loss_rz, mu_slip=mu_slip, mu_press=mu_press, friction_source=friction_source,
        assembly=inp.assembly, torque=inp.torque, axial_force=F_slip, speed=w,
        temperature_shaft=Ts, temperature_hub=Th, temperature_assembly=T0,
        shaft_material=s, hub_material=h, **cases,
        pressure_min=r["p_min"], pressure_max=r["p_max"], torque_capacity_min=r["torque_capacity_min"],
        axial_capacity_min=r["axial_capacity_min"],
        slip_safety_min=r["slip_safety_min"] if r["p_min"] > 0 else 0.0,
        hub_stress_max=r["hub_stress_max"], hub_tresca_max=r["hub_tresca_max"],
        shaft_stress_max=r["shaft_stress_max"], shaft_tresca_max=r["shaft_tresca_max"],
        hub_yield_safety=r["hub_yield_safety"], shaft_yield_safety=r["shaft_yield_safety"],
        hub_outer_growth_max=r["hub_outer_growth_max"], shaft_bore_change_max=r["shaft_bore_change_max"] + 0.0,
        press_force_max=r["press_force_max"], shrink_temperature_C=r["shrink_temperature"],
        joining_clearance=jc, loosening_speed=r["loosening_speed"],
        governing_tight_condition="operating" if tight_op else "assembly",
        checks=tuple(checks),
        warnings=tuple(warns),
        notes=((f"slip check: {thrust_note}",) if thrust_note else ()) + shaft.notes,
        shaft=shaft,
        design=inp.design, plastic_zone_diameter=r["plastic_zone_diameter_max"],
        plastic_utilisation=r["plastic_utilisation"], plastic_zone_limit=inp.plastic_zone_limit,
        loosest_governing=loosest_gov, tightest_governing=tightest_gov, states=tuple(states),
        governing_loose_state=state_lo, governing_tight_state=state_tight, loosening_state=state_loose,
        loosening_note=loosening_note, temperature_min=tmin, temperature_max=tmax, headline=headline,
        axial_force_given=inp.axial_force, mesh_axial_force=inp.mesh_axial_force(),
        mesh_thrust=inp.mesh_thrust,
    )


def slip_thrust(inp: PressFitInput) -> tuple[float, str]:
    """The axial force the slip check holds [N] and, for a helical gear hub, the sentence saying how.

    With ``mesh_thrust = 'add'`` (default) the axial mesh force |F_a| = F_t·tan β is added to
    ``axial_force`` as a magnitude, whatever the directions of both (the side that fails the joint);
    with ``'ignore'`` the user states that ``axial_force`` already holds it. The same demand acts in
    every operating state (the kernel's demand does not depend on the state).

    >>> from fitcheck.pressfit import PressFitInput
    >>> inp = PressFitInput(module=2.0, teeth=30, helix_angle=math.radians(20.0), torque=50e3,
    ...                     axial_force=100.0)
    >>> F, note = slip_thrust(inp)
    >>> round(F, 1), note[:50]
    (670.0, 'F = axial_force 100 N + |F_a| 570 N of the helical')
    """
    fa = inp.mesh_axial_force()
    F = inp.slip_axial_force()
    if fa == 0.0:
        return F, ""
    ft, _, _, d = (float(x) for x in _shaft.mesh_forces(inp.torque, inp.module, inp.teeth,
                                                        helix_angle=inp.helix_angle))
    mesh = (f"|F_a| {fa:.4g} N of the helical mesh (F_a = F_t·tan β, "
            f"F_t = 2T/d_p = {ft:.4g} N, pitch diameter d_p = m·z/cos β = {d:.5g} mm, "
            f"β = {math.degrees(inp.helix_angle):.4g}°)")
    if inp.mesh_thrust == "add":
        return F, (f"F = axial_force {inp.axial_force:.6g} N + {mesh} = {F:.6g} N: magnitudes added "
                   "whatever the directions, the conservative side (mesh_thrust = 'ignore' if "
                   "axial_force already holds it)")
    return F, (f"F = axial_force {inp.axial_force:.6g} N as given: mesh_thrust = 'ignore' states that it "
               f"already holds the {mesh}")


#: Name of the elastic-plastic design's hub check (read back by the verdict and the fit search).
NAME_PLASTIC_ZONE = "hub plastic zone at tightest fit"


def plastic_zone_check(d_pl: float, d: float, Do: float, limit: float) -> Check:
    """The elastic-plastic design's hub check: share of the hub wall that yields at the tightest fit.

    Passes while (D_pl − d)/(Do − d) ≤ ``limit``; the note states the depth of the zone and, beyond
    the limit, by how much it is exceeded.
    """
    share = float(_ep.plastic_share(d_pl, d, Do))
    depth = (d_pl - d) / 2.0
    allowed = limit * (Do - d) / 2.0
    if d_pl <= d:
        note = "the hub stays elastic (no plastic zone)"
    else:
        note = (f"plastic zone Ø {d_pl:.3f} mm: {depth:.3f} mm deep from the bore, "
                f"{share:.0%} of the hub wall; permitted {allowed:.3f} mm ({limit:.0%})")
        if share > limit:
            note += f"; exceeded by {depth - allowed:.3f} mm"
        if d_pl >= Do:
            note += "; the hub is fully plastic"
    return Check(NAME_PLASTIC_ZONE, share, limit, "<=", "", REF_PLASTIC, note)


def _why_no_pressure(imin: float, loss_rz: float, loss_th: float, loss_w: float) -> str:
    """Which effects take the whole smallest interference (all in mm), for the verdict."""
    parts = [f"smoothing {loss_rz * 1e3:.1f} um"]
    if abs(loss_th) > 1e-7:
        parts.append(f"temperature {loss_th * 1e3:+.1f} um")
    if abs(loss_w) > 1e-7:
        parts.append(f"speed {loss_w * 1e3:+.1f} um")
    if imin <= 0:
        return f"the loosest pairing is a clearance ({-imin * 1e3:.1f} um) before any loss"
    return (f"{', '.join(parts)} take the whole smallest interference of {imin * 1e3:.1f} um, so the "
            "joint slips")


def _headline(checks, r, state_lo, state_tight, state_shaft, state_loose, why_zero, w) -> str:
    """One sentence a reviewer reads first: the verdict, its real cause, and the next step."""
    if all(c.passed for c in checks):
        slip = checks[0]
        zone = next((c for c in checks if c.name == NAME_PLASTIC_ZONE), None)
        hub = (f"hub yield safety {r['hub_yield_safety']:.3g}" if zone is None else
               f"hub plastic zone {zone.value:.0%} of the wall (permitted {zone.limit:.0%})")
        return (f"Holds in every operating state: slip safety {slip.value:.3g} (governing: {state_lo}), "
                f"{hub} (governing: {state_tight}).")
    out = []
    by = {c.name: c for c in checks}
    c = by["slip at loosest fit"]
    if not c.passed:
        if r["p_min"] <= 0:
            nxt = ("an interference fit" if "is a clearance" in why_zero else
                   "a tighter fit, or a material pair that keeps its interference in that state")
            out.append(f"Slips: no contact pressure at the loosest fit ({state_lo}): {why_zero}. Next: "
                       f"{nxt} (fitcheck search lists the fits that pass)")
        else:
            out.append(f"Slips: slip safety {c.value:.3g} < {c.limit:g} at the loosest fit ({state_lo}). "
                       "Next: a tighter fit, a longer hub or a rougher, dry joint (fitcheck search)")
    c = by.get(NAME_PLASTIC_ZONE)
    if c is not None and not c.passed:
        out.append(f"The hub's plastic zone exceeds its permitted share of the wall ({state_tight}): "
                   f"{c.value:.0%} > {c.limit:.0%}. Next: a looser fit, a thicker hub or a stronger hub material")
    for name, state, part in (("hub yield at tightest fit", state_tight, "hub bore"),
                              ("shaft yield at tightest fit", state_shaft, "shaft")):
        c = by.get(name)
        if c is not None and not c.passed:
            out.append(f"The {part} yields at the tightest fit ({state}): safety {c.value:.3g} < {c.limit:g}. "
                       f"Next: a looser fit, a {'thicker hub' if part == 'hub bore' else 'solid or stronger shaft'}"
                       " or a stronger material")
    c = by["loosening speed"]
    if not c.passed and r["p_min"] > 0:
        out.append(f"Loosens at {c.value:.0f} rpm, below the operating {c.limit:.0f} rpm ({state_loose}). "
                   "Next: a tighter fit or a thicker hub")
    for c in checks[4:]:
        if not c.passed and _shaft.is_shaft_check(c):
            out += [x for x in (_shaft.headline_sentence(c),) if x]
        elif not c.passed:
            out.append(f"{c.name[0].upper()}{c.name[1:]} {c.value:.4g} {c.unit} exceeds {c.limit:.4g} "
                       f"{c.unit}. Next: {'cool the shaft or a looser fit' if 'heating' in c.name else 'a stronger press or a looser fit'}")
    return "Does not hold. " + " ".join(x.rstrip(".") + "." for x in out)


def shaft_at_hub_edge(inp: PressFitInput, d: float):
    """The shaft at the hub edge (DIN 743, :func:`fitcheck.shaft.evaluate_seat`) of a press fit of
    diameter ``d`` [mm]; it does not depend on the fit, so the fit search adds it to every candidate."""
    return _shaft.evaluate_seat(d=d, di=inp.shaft_bore, material=inp.shaft_material,
                                rz_um=inp.rz_shaft * 1000.0, loads=inp.shaft_loads, torque=inp.torque,
                                axial_force=inp.axial_force, temperature=inp.temperature_shaft, what="hub",
                                module=inp.module, teeth=inp.teeth,
                                add_mesh_thrust=inp.mesh_thrust == "add")
