r"""Vectorised whole-joint evaluation of a cylindrical press or shrink fit.

:func:`evaluate` takes plain floats or NumPy arrays (they broadcast against
each other; a tolerance study passes 10⁶-long arrays of sampled interferences
or dimensions) in core units and returns a ``dict`` of arrays. No pint, no
Python loop over joints.

Arguments of :func:`evaluate` (all keyword-only; units in brackets)
--------------------------------------------------------------------
interference_min, interference_max
    Measured diametral interference of the loosest and tightest combination at
    ``T_assembly`` [mm] (negative = clearance). ``interference_max=None`` takes
    ``interference_min`` (one sampled interference per joint).
d, L
    Joint diameter and joint (hub) length [mm].
di, Do
    Shaft bore (0 = solid) and hub outer diameter (``np.inf`` allowed) [mm].
Es, nus, alphas, Rps, rhos
    Shaft: Young's modulus [MPa], Poisson's ratio [-], expansion [1/K],
    0.2 % proof strength [MPa], density [t/mm³].
Eh, nuh, alphah, Rph, rhoh
    Hub, the same.
mu_slip, mu_press
    Friction coefficient for slip under load and for pressing in [-].
rz_shaft, rz_hub, smoothing
    Mean roughness depths [mm] and the smoothing factor [-]; the interference
    is reduced by ``smoothing·(rz_shaft + rz_hub)`` (DIN 7190-1:2017: 0.8).
torque, axial_force, slip_safety
    Load to be carried [N·mm], [N], and the required safety against slip [-].
omega
    Operating speed [rad/s].
T_shaft, T_hub, T_assembly
    Operating temperatures of shaft and hub and the room / assembly temperature
    at which the interference is given [°C].
joining_clearance
    Clearance wanted at the moment of joining a shrink fit [mm]; ``None`` = 0.001·d.
yield_safety
    Required safety of the hub bore and of the shaft against yield [-].
brittle_shaft, brittle_hub, Rms, Rmh, fracture_safety
    For brittle materials (grey cast iron, plastics) the largest principal
    stress is held against the tensile strength Rm [MPa] with ``fracture_safety`` [-].
shrink
    True for a shrink (transverse) fit: the heating limit applies; False for a
    longitudinal press fit.
max_heating, T_shaft_cooled
    Highest permitted hub temperature [°C] (``np.inf`` = no limit) and the
    temperature of a cooled shaft at joining [°C] (``None`` = ``T_assembly``).
press_force_limit
    Force the press can give [N] (``np.inf`` = no limit).
design, plastic_limit
    ``"elastic"`` (default) or ``"elastic-plastic"``: the hub of ductile material may yield
    partly (:mod:`fitcheck.core.elastoplastic`, DIN 7190-1:2017); its plastic zone may reach
    ``plastic_limit`` (share of the hub wall thickness, default 0.3) [-].
T_min, T_max
    Lowest and highest ambient temperature of the drive [°C] (``None`` = not given): two more
    temperature states with shaft and hub both at it (cold start, hot soak).

Operating states
----------------
Every temperature state of :func:`state_temperatures` (room temperature of assembly, operating
temperature, ``T_min``, ``T_max``) is combined with standstill and the operating speed. The
loosest case is the smallest pressure over all of them, the tightest the largest stress; the
``state_*`` keys give the code 2·k + (1 at speed) of the state that governs.

Returned keys (arrays broadcast to the common shape; stresses [MPa], forces [N],
torques [N·mm], temperatures [°C], speeds [rad/s], interferences [mm])
--------------------------------------------------------------------------------
``delta_eff_min_op``, ``delta_eff_max_op``, ``delta_eff_min_asm``, ``delta_eff_max_asm``
    effective diametral interference at operating (temperature and speed) and
    at assembly condition (room temperature, standstill);
``p_min_op``, ``p_max_op``, ``p_min_asm``, ``p_max_asm``, ``p_min``, ``p_max``
    contact pressures; ``p_min``/``p_max`` the governing (smallest / largest) over every operating state;
``torque_capacity_min``, ``axial_capacity_min``, ``slip_safety_min``
    at ``p_min``, the safety for the vector sum of circumferential and axial friction demand;
``hub_sigma_r_bore``, ``hub_sigma_t_bore``, ``hub_stress_max``, ``hub_tresca_max``,
``shaft_stress_max``, ``shaft_tresca_max``, ``hub_yield_safety``, ``shaft_yield_safety``
    at the tightest case (the larger of assembly and operating condition);
    ``*_stress_max`` is von Mises (plane stress) or, for a brittle part, the largest principal stress;
``hub_outer_growth_max``, ``shaft_bore_change_max``
    diametral changes at ``p_max_asm``;
``press_force_max``, ``shrink_temperature``, ``loosening_speed``;
``state_p_min``, ``state_p_max``, ``state_hub``, ``state_shaft``, ``state_loosening``
    integer code of the governing state (see *Operating states*; the loosening speed names the
    temperature state, code 2·k);
``ok_slip``, ``ok_hub``, ``ok_shaft``, ``ok_speed``, ``ok_heating``, ``ok_press``, ``ok``
    check booleans (elastic-plastic design: ``ok_hub`` = plastic zone within its limit);
``plastic_zone_diameter_max``, ``plastic_utilisation``
    diameter of the hub's plastic zone at the tightest case [mm] (= d while elastic) and its
    share of the hub wall divided by the permitted share [-] (0 in the elastic design).

References
----------
DIN 7190-1:2017 (elastic design of cylindrical interference fits); Shigley,
10th ed., eqs. (3-49) to (3-58), sec. 7-8 (torque of a press fit,
T = (π/2)·f·p·l·d²).
"""

from __future__ import annotations

import numpy as np

from . import blocks as _blocks
from . import elastoplastic as _ep
from .blocks import in_blocks

__all__ = ["evaluate", "OUTPUT_KEYS"]

CHUNK = _blocks.CHUNK  # joints per block (see fitcheck.core.blocks)

OUTPUT_KEYS = (
    "delta_eff_min_op", "delta_eff_max_op", "delta_eff_min_asm", "delta_eff_max_asm",
    "p_min_op", "p_max_op", "p_min_asm", "p_max_asm", "p_min", "p_max",
    "torque_capacity_min", "axial_capacity_min", "slip_safety_min",
    "hub_sigma_r_bore", "hub_sigma_t_bore", "hub_stress_max", "hub_tresca_max",
    "shaft_stress_max", "shaft_tresca_max", "hub_yield_safety", "shaft_yield_safety",
    "hub_outer_growth_max", "shaft_bore_change_max",
    "press_force_max", "shrink_temperature", "loosening_speed",
    "ok_slip", "ok_hub", "ok_shaft", "ok_speed", "ok_heating", "ok_press", "ok",
    "plastic_zone_diameter_max", "plastic_utilisation",
    "state_p_min", "state_p_max", "state_hub", "state_shaft", "state_loosening",
)


def _safe_div(num, den):
    """num/den with x/0 -> inf (x > 0) and 0/0 -> inf, as a safety factor of an unloaded part."""
    with np.errstate(divide="ignore", invalid="ignore"):
        q = num / den
    return np.where(den > 0.0, q, np.inf)


def evaluate(*, interference_min, interference_max=None, d, L, di=0.0, Do,
             Es, nus, alphas=11.5e-6, Rps, rhos=7.85e-9,
             Eh, nuh, alphah=11.5e-6, Rph, rhoh=7.85e-9,
             mu_slip, mu_press=None, rz_shaft=0.0, rz_hub=0.0, smoothing=0.8,
             torque=0.0, axial_force=0.0, slip_safety=1.5, omega=0.0,
             T_shaft=20.0, T_hub=20.0, T_assembly=20.0, joining_clearance=None,
             yield_safety=1.2, brittle_shaft=False, brittle_hub=False, Rms=np.inf, Rmh=np.inf,
             fracture_safety=2.0, shrink=False, max_heating=np.inf, T_shaft_cooled=None,
             press_force_limit=np.inf, T_min=None, T_max=None, design="elastic",
             plastic_limit=0.3) -> dict:
    r"""Evaluate press or shrink fits: pressures, capacities, stresses, safeties, assembly and checks.

    See the module docstring for every argument and returned key with its unit.

    Notes
    -----
    * Effective interference: δ_eff = δ − s·(Rz_s + Rz_h) + d·[α_s(T_s − T_0) − α_h(T_h − T_0)]
      − 2(u_h − u_s)(ω), the last term the free centrifugal bore growth of hub and shaft.
    * p from Lamé (Shigley eq. (3-56)); T = p·π·d²·L·μ/2, F = p·π·d·L·μ (Shigley sec. 7-8);
      combined demand √((2T/d)² + F²) against p·π·d·L·μ (DIN 7190-1).
    * Stresses: Lamé plus the rotating-disc stresses (Shigley eq. (3-55)); von Mises in plane
      stress. DIN 7190-1 writes the hub's equivalent stress at the bore as √3·p/(1 − Q_A²);
      the plane-stress value used here is larger by the factor √(1 + Q_A⁴/3) (conservative).
    * Press-in force F_e = p_max·π·d·L·μ_press at assembly condition.
    * Hub temperature for shrinking: T_0 + (δ_max + s_joint − α_s·d·(T_0 − T_cool))/(α_h·d), with
      the measured (not smoothed) largest interference.
    * Loosening speed: ω at which p at the loosest interference is 0, the lowest over the
      temperature states.

    Examples
    --------
    Shigley, 10th ed., Example 7-7 (35 H7/s6 gear on a steel shaft, hub Ø 60, L = 50):

    >>> r = evaluate(interference_min=0.018, interference_max=0.059, d=35.0, L=50.0, Do=60.0,
    ...              Es=207000, nus=0.3, Rps=390, Eh=207000, nuh=0.3, Rph=600, mu_slip=0.3,
    ...              smoothing=0.0)
    >>> round(float(r["p_min"]), 1), round(float(r["p_max"]), 1)
    (35.1, 115.1)
    >>> round(float(r["torque_capacity_min"]) / 1e3)
    1014
    """
    # long arrays in cache-sized blocks (fitcheck.core.blocks): the same numbers, about twice as fast
    return in_blocks(_block, dict(locals()), CHUNK)


def state_temperatures(T_shaft, T_hub, T_assembly, T_min=None, T_max=None) -> list[tuple]:
    """(shaft, hub) temperature of each temperature state, in the order of the state codes.

    0 room temperature of assembly (both parts at ``T_assembly``), 1 operating temperature
    (``T_shaft``, ``T_hub``), then 2 both parts at the lowest ambient ``T_min`` and 3 both at the
    highest ``T_max`` where given. Each is evaluated at standstill and at operating speed: the state
    code is ``2·k + 1`` at speed, ``2·k`` at standstill.

    >>> state_temperatures(80.0, 40.0, 20.0, -10.0)
    [(20.0, 20.0), (80.0, 40.0), (-10.0, -10.0)]
    """
    out = [(T_assembly, T_assembly), (T_shaft, T_hub)]
    if T_min is not None:
        out.append((T_min, T_min))
    if T_max is not None:
        out.append((T_max, T_max))
    return out


def _pick(cur, new, cur_state, code, *, smaller):
    """(state, value) of the governing state so far: ``new`` replaces ``cur`` where strictly
    smaller (``smaller=True``) or larger; on a tie the earlier state is kept."""
    if cur is None:
        return np.full(np.shape(new), code), new
    better = new < cur if smaller else new > cur
    return np.where(better, code, cur_state), np.where(better, new, cur)


def _o(a, *others):
    """``a`` as the ``out=`` of an operation on ``a`` and ``others`` when it is an array of the
    result's shape, else None (a new result)."""
    if isinstance(a, np.ndarray) and a.flags.writeable and a.shape == np.broadcast(a, *others).shape:
        return a
    return None


def _own(x):
    """A writable float64 (or int) array of its own holding ``x`` (for in-place updates)."""
    return np.array(x, copy=True)


def _fits(cur, better, new):
    """True when ``cur`` can take ``new`` where ``better`` in place (no broadcasting beyond it)."""
    return (isinstance(cur, np.ndarray) and cur.flags.writeable
            and np.broadcast(cur, better, new).shape == cur.shape)


def _pick_into(cur, new, cur_state, code, *, smaller):
    """:func:`_pick` updating ``cur`` and ``cur_state`` in place where the shapes allow."""
    if cur is None:
        return np.full(np.shape(new), code), _own(new)
    better = np.less(new, cur) if smaller else np.greater(new, cur)
    if _fits(cur, better, new) and _fits(cur_state, better, code):
        np.copyto(cur, new, where=better)
        np.copyto(cur_state, code, where=better)
        return cur_state, cur
    return np.where(better, code, cur_state), np.where(better, new, cur)


def _running_max(values):
    """Elementwise maximum of a list of arrays (as ``np.maximum.reduce``, without stacking them)."""
    out = np.maximum(values[0], values[1]) if len(values) > 1 else np.array(values[0], dtype=np.float64)
    for v in values[2:]:
        out = np.maximum(out, v, out=_o(out, v))
    return out


def _first_loading(delta, peak, p_peak, ep_args):
    """Elastic-plastic pressure at the first loading to ``delta`` (:func:`elastoplastic.contact_pressure`).

    Where ``delta`` is the peak interference the peak pressure is that value already; the
    iterative solution runs only on the joints where ``delta`` lies below the peak.
    """
    below = delta != peak
    if not np.any(below):
        return p_peak
    shape = np.shape(below)
    if np.ndim(below) != 1 or np.shape(p_peak) != shape or not all(
            np.ndim(a) == 0 or np.shape(a) == shape for a in (delta, *ep_args)):
        return _ep.contact_pressure(delta, *ep_args)
    out = np.array(p_peak, dtype=np.float64)
    sub = [a[below] if np.ndim(a) else a for a in (delta, *ep_args)]
    out[below] = _ep.contact_pressure(*sub)
    return out


def _block(*, interference_min, interference_max, d, L, di, Do, Es, nus, alphas, Rps, rhos,
           Eh, nuh, alphah, Rph, rhoh, mu_slip, mu_press, rz_shaft, rz_hub, smoothing,
           torque, axial_force, slip_safety, omega, T_shaft, T_hub, T_assembly,
           joining_clearance, yield_safety, brittle_shaft, brittle_hub, Rms, Rmh,
           fracture_safety, shrink, max_heating, T_shaft_cooled, press_force_limit,
           T_min, T_max, design="elastic", plastic_limit=0.3) -> dict:
    """One block of :func:`evaluate`: every argument given (evaluate holds the defaults)."""
    f64 = np.float64
    dmin = np.asarray(interference_min, dtype=f64)
    dmax = dmin if interference_max is None else np.asarray(interference_max, dtype=f64)
    d = np.asarray(d, dtype=f64)
    di = np.asarray(di, dtype=f64)
    Do = np.asarray(Do, dtype=f64)
    if mu_press is None:
        mu_press = mu_slip
    if joining_clearance is None:
        joining_clearance = 1e-3 * d
    if T_shaft_cooled is None:
        T_shaft_cooled = T_assembly

    # ---- geometry-only factors (cheap when geometry is scalar) --------------------------
    qa = d / Do                               # Do = inf gives 0
    qa2 = qa * qa
    qi = di / d
    qi2 = qi * qi
    th = (1.0 + qa2) / (1.0 - qa2)            # hub: sigma_t / p at the bore
    ts_f = (1.0 + qi2) / (1.0 - qi2)          # shaft: -sigma_t / p at the surface
    k = (th + nuh) / Eh + (ts_f - nus) / Es     # Shigley eq. (3-56), per unit d
    c_p = 1.0 / (d * k)                       # p = c_p * delta_eff  [MPa/mm]
    hollow = di > 0.0
    g_in = np.where(hollow, 2.0 / (1.0 - qi2), 1.0)  # shaft: |sigma_t| / p at bore (or centre)

    # ---- rotation: stresses per unit omega² at the free surfaces (Shigley eq. (3-55)) -----
    R2 = 0.25 * d * d
    c2 = 0.25 * di * di
    kh_bore = 0.25 * rhoh * ((3.0 + nuh) * (0.25 * Do * Do) + (1.0 - nuh) * R2)   # hub, r = r_i
    ks_surf = 0.25 * rhos * ((3.0 + nus) * c2 + (1.0 - nus) * R2)                # shaft, r = r_o
    ks_in = np.where(hollow, 0.25 * rhos * ((3.0 + nus) * R2 + (1.0 - nus) * c2),
                     0.125 * rhos * (3.0 + nus) * R2)                            # bore or centre
    # diametral loss per unit omega²: 2·(u_h − u_s), u = (d/2)·sigma_t/E at a free surface
    c_rot = d * (kh_bore / Eh - ks_surf / Es)

    # ---- interference changes -------------------------------------------------------------
    loss_rz = smoothing * (np.asarray(rz_shaft, dtype=f64) + np.asarray(rz_hub, dtype=f64))
    w2 = np.asarray(omega, dtype=f64) ** 2
    spinning = w2 > 0.0
    # rotation terms only where the joint turns: an infinite hub (Do = inf) at standstill is 0, not 0·inf
    with np.errstate(invalid="ignore"):
        d_w = np.where(spinning, w2 * c_rot, 0.0)
        rot_hub_bore = np.where(spinning, w2 * kh_bore, 0.0)
    de_min_asm = dmin - loss_rz
    de_max_asm = dmax - loss_rz

    rot_sh_surf = np.where(spinning, w2 * ks_surf, 0.0)
    rot_sh_in = np.where(spinning, w2 * ks_in, 0.0)
    brittle_h = np.any(brittle_hub)
    plastic = design == "elastic-plastic"

    # ---- every operating state: temperature state k × (standstill, operating speed) ----------
    temps = state_temperatures(T_shaft, T_hub, T_assembly, T_min, T_max)
    states = []                               # (code, k, moving, loosest δ_eff, tightest δ_eff)
    de_min_ths = []
    for k, (ts, th_k) in enumerate(temps):
        d_th = d * (alphas * (np.asarray(ts, dtype=f64) - T_assembly)
                    - alphah * (np.asarray(th_k, dtype=f64) - T_assembly))
        de_min_th = de_min_asm + d_th
        de_min_ths.append(de_min_th)
        for j, moving in enumerate((False, True)):
            dw = d_w if moving else 0.0
            states.append((2 * k + j, k, moving, de_min_th - dw, de_max_asm + d_th - dw))
    if plastic:  # partly plastic hub, DIN 7190-1:2017 (core/elastoplastic.py): the hub yields at the
        # largest interference over every state and unloads elastically to each other state
        ep_args = (d, di, Do, Es, nus, Eh, nuh, Rph)
        peak_lo = _running_max([s[3] for s in states])
        peak_hi = _running_max([s[4] for s in states])
        p_pk_lo, _dl = _ep.peak_pressure(peak_lo, *ep_args)
        p_pk_hi, d_pl = _ep.peak_pressure(peak_hi, *ep_args)
        set_lo = np.maximum(peak_lo - p_pk_lo / c_p, 0.0)   # permanent set of the yielded bore
        k_h = _ep.KAPPA_DIN * Rph
        p_el = _ep.elastic_limit_pressure(d, Do, Rph)

        def press(de, peak, p_pk):
            return np.maximum(p_pk - (peak - de) * c_p, 0.0)
    else:
        d_pl = d
        set_lo = 0.0

    p_lo = p_hi = hub_eq = hub_p = hub_st = shaft_eq = shaft_tr = w_loose = None
    p_lo_state = p_hi_state = hub_state = shaft_state = loose_state = None
    p_min_op = p_max_op = de_min_op = de_max_op = None
    for k, de_min_th in enumerate(de_min_ths):
        de_free = de_min_th - set_lo if plastic else de_min_th
        with np.errstate(divide="ignore", invalid="ignore"):
            wl = np.sqrt(np.maximum(de_free, 0.0) / c_rot)
        wl = np.where(c_rot > 0.0, wl, np.where(de_free > 0.0, np.inf, 0.0))
        wl = np.where(np.isnan(wl), 0.0, wl)   # Do = inf: an infinite hub cannot turn
        loose_state, w_loose = _pick(w_loose, wl, loose_state, 2 * k, smaller=True)
    brittle_s = np.any(brittle_shaft)
    # The state loop works in place (out=, copyto) on a few arrays per state: the same
    # arithmetic, operation for operation, as the textbook form in the comments, so every
    # result is bit for bit that of the plain expressions.
    for code, k, moving, de_lo, de_hi in states:
        if plastic:
            p_l = press(de_lo, peak_lo, p_pk_lo)
            p_h = press(de_hi, peak_hi, p_pk_hi)
        else:                                 # p = max(δ·c_p, 0)
            p_l = np.multiply(de_lo, c_p)
            p_l = np.maximum(p_l, 0.0, out=_o(p_l))
            p_h = np.multiply(de_hi, c_p)
            p_h = np.maximum(p_h, 0.0, out=_o(p_h))
        if k == 1 and moving:
            de_min_op, de_max_op, p_min_op, p_max_op = de_lo, de_hi, p_l, p_h
        p_lo_state, p_lo = _pick_into(p_lo, p_l, p_lo_state, code, smaller=True)
        p_hi_state, p_hi = _pick_into(p_hi, p_h, p_hi_state, code, smaller=False)
        # hub bore at the tightest interference of this state: sr = −p, st = p·th (+ rotation);
        # von Mises √(sr² + st² − sr·st) = √(p² + st² + p·st) exactly (sign changes are exact)
        if plastic:
            st = np.where(p_h > p_el, k_h - p_h, p_h * th)
        else:
            st = np.multiply(p_h, th)
        rot = rot_hub_bore if moving else 0.0
        st = np.add(st, rot, out=_o(st, rot))
        pp = np.multiply(p_h, p_h)
        vm = np.multiply(st, st)
        vm = np.add(pp, vm, out=_o(vm, pp))
        tmp = np.multiply(p_h, st)
        vm = np.add(vm, tmp, out=_o(vm, tmp))
        vm = np.sqrt(vm, out=_o(vm))
        eq = np.where(brittle_hub, st, vm) if brittle_h else vm
        if hub_eq is None:
            hub_eq, hub_p, hub_st = _own(eq), _own(p_h), _own(st)
            hub_state = np.full(np.shape(eq), code)
        else:
            better = np.greater(eq, hub_eq)
            if _fits(hub_eq, better, eq) and _fits(hub_p, better, p_h) and _fits(hub_st, better, st):
                np.copyto(hub_eq, eq, where=better)
                np.copyto(hub_p, p_h, where=better)
                np.copyto(hub_st, st, where=better)
                np.copyto(hub_state, code, where=better)
            else:
                hub_eq, hub_p, hub_st = (np.where(better, eq, hub_eq), np.where(better, p_h, hub_p),
                                         np.where(better, st, hub_st))
                hub_state = np.where(better, code, hub_state)
        # shaft: inner point (bore or centre; sigma_r = 0 or = sigma_t) and surface, sr_s = −p;
        # von Mises √(p² + st_s² + p·st_s), Tresca max(|st_s + p|, |st_s|, p)
        st_in = np.subtract(rot_sh_in if moving else 0.0, np.multiply(p_h, g_in))
        st_s = np.subtract(rot_sh_surf if moving else 0.0, np.multiply(p_h, ts_f))
        vm_s = np.multiply(st_s, st_s)
        vm_s = np.add(pp, vm_s, out=_o(vm_s, pp))
        tmp = np.multiply(p_h, st_s)
        vm_s = np.add(vm_s, tmp, out=_o(vm_s, tmp))
        vm_s = np.sqrt(vm_s, out=_o(vm_s))
        a_in = np.abs(st_in)
        s_vm = np.maximum(a_in, vm_s, out=_o(vm_s, a_in))
        tr_s = np.add(st_s, p_h)
        tr_s = np.abs(tr_s, out=_o(tr_s))
        a_s = np.abs(st_s)
        tr_s = np.maximum(tr_s, a_s, out=_o(tr_s, a_s))
        tr_s = np.maximum(tr_s, p_h, out=_o(tr_s, p_h))
        s_tr = np.maximum(a_in, tr_s, out=_o(tr_s, a_in))
        if brittle_s:
            s_eq = np.where(brittle_shaft, np.maximum(np.maximum(st_in, st_s), 0.0), s_vm)
        else:
            s_eq = s_vm
        if shaft_tr is None:
            shaft_tr = _own(s_tr)
        elif shaft_tr.shape == np.broadcast(shaft_tr, s_tr).shape:
            np.maximum(shaft_tr, s_tr, out=shaft_tr)
        else:
            shaft_tr = np.maximum(shaft_tr, s_tr)
        shaft_state, shaft_eq = _pick_into(shaft_eq, s_eq, shaft_state, code, smaller=False)
    hub_sr = -hub_p
    de_min_asm_out = de_min_asm
    if plastic:
        # unloaded room-temperature pressure of the loosest fit; first loading of the tightest
        # at assembly (it gives the press-in force)
        p_min_asm = press(de_min_asm, peak_lo, p_pk_lo)
        p_max_asm = _first_loading(de_max_asm, peak_hi, p_pk_hi, ep_args)
    else:
        p_min_asm = np.maximum(de_min_asm * c_p, 0.0)
        p_max_asm = np.maximum(de_max_asm * c_p, 0.0)
    p_min, p_max = p_lo, p_hi
    hub_tr = hub_st - hub_sr                  # sigma_t >= 0 >= sigma_r at the bore

    # ---- capacity at the loosest case -------------------------------------------------------
    area_mu = np.pi * d * L * mu_slip          # friction force per unit pressure [N/MPa]
    f_cap = p_min * area_mu
    t_cap = f_cap * (0.5 * d)
    demand = np.hypot(2.0 * np.asarray(torque, dtype=f64) / d, np.asarray(axial_force, dtype=f64))
    with np.errstate(divide="ignore", invalid="ignore"):
        s_slip = f_cap / demand
    s_slip = np.where(demand > 0.0, s_slip, np.where(f_cap > 0.0, np.inf, 0.0))

    hub_strength = np.where(brittle_hub, Rmh, Rph)
    shaft_strength = np.where(brittle_shaft, Rms, Rps)
    hub_req = np.where(brittle_hub, fracture_safety, yield_safety)
    shaft_req = np.where(brittle_shaft, fracture_safety, yield_safety)
    s_hub = _safe_div(hub_strength, hub_eq)
    s_shaft = _safe_div(shaft_strength, shaft_eq)

    # ---- deformations, assembly, loosening ------------------------------------------------------
    hub_growth = 2.0 * p_max_asm * d * qa / (Eh * (1.0 - qa2))
    bore_change = -2.0 * p_max_asm * di / (Es * (1.0 - qi2))
    if design == "elastic-plastic":  # yielded hub: outer ring at yield, sigma_t(Do) = k·(D_pl/Do)²
        hub_growth = np.where((d_pl > d) & (p_max_asm >= p_max),
                              _ep.KAPPA_DIN * Rph * d_pl * d_pl / (Do * Eh), hub_growth)
    f_press = p_max_asm * (np.pi * d * L * mu_press)
    cool = alphas * d * (np.asarray(T_assembly, dtype=f64) - T_shaft_cooled)
    t_shrink = T_assembly + (dmax + joining_clearance - cool) / (alphah * d)

    ok_slip = (s_slip >= slip_safety) & (p_min > 0.0)
    ok_hub = s_hub >= hub_req
    if design == "elastic-plastic":
        util = _ep.plastic_share(d_pl, d, Do) / plastic_limit
        ok_hub = np.where(brittle_hub, ok_hub, util <= 1.0)
    else:
        util = np.zeros_like(s_hub)
    ok_shaft = s_shaft >= shaft_req
    ok_speed = (w_loose > np.sqrt(w2)) | ~spinning
    ok_heating = np.logical_not(shrink) | (t_shrink <= max_heating)
    ok_press = shrink | (f_press <= press_force_limit)
    ok = ok_slip & ok_hub & ok_shaft & ok_speed & ok_heating & ok_press

    out = {
        "delta_eff_min_op": de_min_op, "delta_eff_max_op": de_max_op,
        "delta_eff_min_asm": de_min_asm_out, "delta_eff_max_asm": de_max_asm,
        "p_min_op": p_min_op, "p_max_op": p_max_op, "p_min_asm": p_min_asm, "p_max_asm": p_max_asm,
        "p_min": p_min, "p_max": p_max,
        "torque_capacity_min": t_cap, "axial_capacity_min": f_cap, "slip_safety_min": s_slip,
        "hub_sigma_r_bore": hub_sr, "hub_sigma_t_bore": hub_st,
        "hub_stress_max": hub_eq, "hub_tresca_max": hub_tr,
        "shaft_stress_max": shaft_eq, "shaft_tresca_max": shaft_tr,
        "hub_yield_safety": s_hub, "shaft_yield_safety": s_shaft,
        "hub_outer_growth_max": hub_growth, "shaft_bore_change_max": bore_change,
        "press_force_max": f_press, "shrink_temperature": t_shrink, "loosening_speed": w_loose,
        "ok_slip": ok_slip, "ok_hub": ok_hub, "ok_shaft": ok_shaft, "ok_speed": ok_speed,
        "ok_heating": ok_heating, "ok_press": ok_press, "ok": ok,
        "plastic_zone_diameter_max": d_pl + 0.0 * p_max, "plastic_utilisation": util,
        "state_p_min": p_lo_state, "state_p_max": p_hi_state, "state_hub": hub_state,
        "state_shaft": shaft_state, "state_loosening": loose_state,
    }
    return out
