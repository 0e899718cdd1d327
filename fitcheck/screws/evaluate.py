"""Evaluation of a screw joint after VDI 2230-1:2015: compliances, preloads, torque and every check.

Part of :mod:`fitcheck.screws`.
"""


from __future__ import annotations

import math
import warnings
from dataclasses import fields

import numpy as np

from .. import threads
from ..checks import Check
from ..core import vdi2230 as core
from ..core import vdi2230_eccentric as ecc
from ..errors import InputError, MethodRangeWarning
from ..materials import Material
from .results import ScrewJointResult
from .schema import (
    _ENGAGEMENT_MARGIN,
    _FATIGUE_SAFETY,
    _NON_STEEL_EMBEDDING,
    _STEEL_WASHER_ALPHA,
    _STEEL_WASHER_E,
    NM_TO_LBF_IN,
    SHEAR_SAFETY,
    SLIP_SAFETY,
    ScrewJointInput,
    _count,
    _default_outer_diameter,
    _hole_diameter,
    _pattern_xy_raw,
)


def _pattern_xy(inp: ScrewJointInput) -> tuple[np.ndarray, np.ndarray]:
    return _pattern_xy_raw(inp.positions, inp.bolt_circle, inp.count)


def _limits_for(mat: Material, what: str) -> tuple[float, float]:
    """(pG, τB) of a material, falling back to the group table; NaN where nothing is known."""
    fb = threads.clamped_limits(mat.group)
    pG = mat.pG if math.isfinite(mat.pG) else (fb[0] if fb else math.nan)
    tau = mat.tauB if math.isfinite(mat.tauB) else (fb[1] * mat.Rm if fb else math.nan)
    if not math.isfinite(mat.pG if what == "pG" else mat.tauB):
        if fb is None:
            raise InputError(f"{what} of {mat.name}", "not tabulated",
                             f"a material with {what} (add '{what}' to an inline material table, "
                             f"e.g. {{base = '{mat.name}', {what} = '300 MPa'}})")
        warnings.warn(f"{mat.name}: no {what} in data/materials.csv; the lower value of its group "
                      f"({mat.group}) from data/screw_clamped_limits.csv is used", MethodRangeWarning,
                      stacklevel=3)
    return pG, tau


def _eccentric(inp, x, y, t, E, l_K, D_A, dh, th, pc, delta_S, delta_P, n, k_head, k_nut, l_shank):
    """The eccentric joint's geometry and load factor, or None for a concentric joint.

    Active when clamp_eccentricity or load_eccentricity is not zero, or for a cover under a tilting
    moment whose interface_depth is given (then the load line defaults to the interface's edge on
    the load side, a = cT/2, the least favourable place inside the strip).
    """
    tilt = inp.tilting_moment > 0 and inp.count >= 3
    s_sym = inp.clamp_eccentricity or 0.0
    a = inp.load_eccentricity
    where = ""
    if tilt:
        i, ang = ecc.tilt_direction(x, y, inp.tilting_moment)
        where = f"screw {i + 1} of {inp.count} ({ang:.0f}° from the pattern's x axis), the most loaded by the tilt"
    if not (s_sym or a):
        if not (tilt and inp.interface_depth is not None):
            if tilt:
                warnings.warn("cover under a tilting moment: its most loaded screw is treated as concentric; "
                              "give interface_depth (and clamp_eccentricity/load_eccentricity) for the eccentric "
                              "joint of VDI 2230-1, which usually raises the load factor and adds bending",
                              MethodRangeWarning, stacklevel=4)
            return None
    c_T = inp.interface_depth
    if a is None:
        a = c_T / 2.0 if tilt else 0.0
    if inp.interface_width is not None:
        b = inp.interface_width
    elif math.isfinite(D_A):
        b = D_A
    else:
        raise InputError("interface_width", None, "the width of the interface strip of this single screw along "
                         "the bending axis (no pattern gives a screw spacing), e.g. '20 mm'")
    I_Bers = float(ecc.substitute_inertia(b, c_T))
    beta_P = ecc.bending_compliance(t, E, I_Bers)
    A_D, I_BT = (float(v) for v in ecc.interface_section(b, c_T, dh, s_sym))
    if A_D <= 0 or I_BT <= 0:
        raise InputError("interface_depth", f"{c_T:g} mm", f"an interface strip ({b:g} mm × {c_T:g} mm) larger "
                         f"than the clearance hole ({dh:g} mm)")
    phi = float(ecc.load_factor_eccentric(n, delta_S, delta_P, beta_P, s_sym, a))
    E_P = l_K / float(np.sum(np.asarray(t) / np.asarray(E)))
    l_ers = ecc.screw_bending_length(
        [k_head * th.d, l_shank, l_K - l_shank, 0.5 * th.d, k_nut * th.d],
        [th.d, th.d, th.d3, th.d3, th.d], th.ds)
    return {"phi": phi, "s": s_sym, "a": a, "b": b, "c_T": c_T, "I_Bers": I_Bers, "beta_P": beta_P,
            "A_D": A_D, "I_BT": I_BT, "E_P": E_P, "l_ers": l_ers, "edges": (c_T / 2.0, -c_T / 2.0),
            "where": where}


def evaluate(inp: ScrewJointInput) -> ScrewJointResult:
    """Evaluate a screw joint: compliances, preloads, torque and every check.

    Parameters
    ----------
    inp : ScrewJointInput

    Returns
    -------
    ScrewJointResult
    """
    for k in ("count", "slip_interfaces"):  # a hand-made input may hold nan, inf or a float
        if getattr(inp, k, None) is not None:
            _count(getattr(inp, k), k)
    with warnings.catch_warnings(record=True) as caught:
        warnings.simplefilter("always")
        res = _evaluate(inp)
    msgs = tuple(dict.fromkeys(str(w.message) for w in caught if issubclass(w.category, MethodRangeWarning)))
    for w in caught:
        warnings.warn_explicit(w.message, w.category, w.filename, w.lineno)
    return ScrewJointResult(**{**{f.name: getattr(res, f.name) for f in fields(res)}, "warnings": msgs})


def _evaluate(inp: ScrewJointInput) -> ScrewJointResult:
    th = threads.thread(inp.thread)
    pc = threads.property_class(inp.property_class, th.d)
    hd = threads.head(inp.head, th.size)
    dh = _hole_diameter(th, inp.hole)
    tapped = inp.joint == "tapped"
    if not inp.layers:
        raise InputError("layers", None, "at least one clamped part")
    if pc.stainless:
        warnings.warn("stainless screws: the fatigue limits of VDI 2230 step R9 are for heat-treated steel "
                      "screws; the value shown is indicative only", MethodRangeWarning, stacklevel=3)
    if inp.head == "countersunk":
        warnings.warn("countersunk head: the cone model and the surface pressure use the head's projected "
                      "bearing diameter; VDI 2230 treats countersunk heads separately", MethodRangeWarning,
                      stacklevel=3)
    if th.d > 40.0:
        warnings.warn("VDI 2230 fatigue limits are given for d ≤ 40 mm", MethodRangeWarning, stacklevel=3)
    if inp.tightening in ("yield_controlled", "angle_controlled"):
        warnings.warn("yield- or angle-controlled tightening: VDI 2230 sets the preload by the screw's yield "
                      "point and designs for FM,min; this program's torque-based checks use FM,zul/αA with "
                      "αA from Table A8 (safe for the clamp load) and do not check the preload beyond FM,zul",
                      MethodRangeWarning, stacklevel=3)
    soft = sorted({m.name for m in [la.material for la in inp.layers]
                   + ([inp.housing_material] if tapped and inp.housing_material is not None else [])
                   if m.group in _NON_STEEL_EMBEDDING})
    if soft:
        warnings.warn("embedding amounts of VDI 2230 Table 5 are for compact steel parts; "
                      f"{', '.join(soft)} is not steel (light and copper alloys settle more, plastics "
                      "creep): the embedding loss shown is a lower estimate", MethodRangeWarning, stacklevel=3)

    # --- stack of clamped parts (washer first, if any)
    t = [la.thickness for la in inp.layers]
    E = [la.material.E for la in inp.layers]
    al = [la.material.alpha for la in inp.layers]
    n_parts = len(t)
    bearing_d, bearing_dh = hd.dw, dh
    w = None
    if inp.washer:
        w = threads.washer(th.size, inp.head)
        t = [w.h, *t]
        E = [_STEEL_WASHER_E, *E]
        al = [_STEEL_WASHER_ALPHA, *al]
        n_parts += 1
        bearing_dh = max(dh, w.d1)
    i_gasket = None
    if inp.gasket is not None:
        # the gasket sits in the interface: above the tapped housing, or below the first part of a
        # through-bolted stack; a stiffness given per screw sets its modulus once the cone is known
        i_gasket = len(t) if tapped else (2 if inp.washer else 1)
        g = inp.gasket
        t.insert(i_gasket, g.thickness)
        E.insert(i_gasket, g.modulus if g.modulus is not None else 1.0)
        al.insert(i_gasket, g.alpha)
        n_parts += 1
    t = np.array(t, float)
    E = np.array(E, float)
    al = np.array(al, float)
    z_bot = np.cumsum(t)
    z_top = z_bot - t
    l_K = float(z_bot[-1])

    # --- pattern and per-screw loads
    x, y = _pattern_xy(inp)
    F_A, F_Q = core.pattern_loads(x, y, inp.axial_force, inp.tilting_moment, inp.transverse_force,
                                  inp.torque_about_axis)
    D_A_given = inp.clamp_outer_diameter if inp.clamp_outer_diameter is not None else _default_outer_diameter(x, y)
    # the substitute body never narrows below the head's bearing face (from_mapping refuses such input)
    D_A = max(D_A_given, hd.dw)

    # --- compliances
    k_head = 0.5 if inp.head == "hex" else 0.4
    if tapped:
        E_M, k_nut = inp.housing_material.E, 0.33
    else:
        E_M, k_nut = pc.E, 0.4
    l_shank = min(inp.shank_length, l_K)
    parts = core.screw_compliance(th.d, th.d3, l_shank, l_K - l_shank, pc.E, E_M, k_head, k_nut)
    delta_S = float(parts[-1])
    tphi = float(core.tan_phi(l_K, hd.dw, D_A, tapped))
    D_A_Gr = float(core.limiting_diameter(hd.dw, l_K, tphi, tapped))
    if i_gasket is not None and inp.gasket.stiffness is not None:
        unit = core.clamp_compliance(z_top, z_bot, np.where(np.arange(t.size) == i_gasket, 1.0, E),
                                     hd.dw, dh, D_A, tphi, tapped, l_K)
        E[i_gasket] = float(unit[i_gasket]) * inp.gasket.stiffness
    delta_P = float(np.sum(core.clamp_compliance(z_top, z_bot, E, hd.dw, dh, D_A, tphi, tapped, l_K)))
    # Shigley's frustum (30°, hole = bolt diameter as in the book) and its exponential fit. A cap screw
    # in a tapped part: effective grip l' = h + d/2 (thick tapped part), two frusta meeting at l'/2, the
    # lower one partly in the tapped part (Shigley, 10th ed., Sec. 8-5, Fig. 8-13 and the text beside it)
    if tapped:
        t_sh = np.append(t, 0.5 * th.d)
        E_sh = np.append(E, inp.housing_material.E)
    else:
        t_sh, E_sh = t, E
    zb_sh = np.cumsum(t_sh)
    l_sh = float(zb_sh[-1])
    d_P_sh = float(np.sum(core.clamp_compliance(zb_sh - t_sh, zb_sh, E_sh, hd.dw, th.d, np.inf,
                                                math.tan(math.radians(30.0)), False, l_sh)))
    E_eq = l_sh / float(np.sum(t_sh / E_sh))
    k_exp = float(core.member_stiffness_exponential(E_eq, th.d, l_sh))
    n = inp.load_introduction
    phi = float(core.load_factor(n, delta_S, delta_P))
    phi_concentric = phi
    ex = _eccentric(inp, x, y, t, E, l_K, D_A, dh, th, pc, delta_S, delta_P, n, k_head, k_nut, l_shank)
    if ex is not None:
        phi = ex["phi"]   # Φen* replaces Φn in every later step (VDI 2230-1:2015, R3)

    # --- embedding
    load = "shear" if F_Q > 0 else "axial"
    f_thread, f_face, f_inter = threads.embedding_amounts(inp.rz, load)
    n_faces = 1 if tapped else 2
    n_inter = (n_parts if tapped else n_parts - 1)
    f_Z = f_thread + n_faces * f_face + n_inter * f_inter
    if inp.gasket is not None:
        f_Z += inp.gasket.settling
    F_Z = float(core.embedding_loss(f_Z, delta_S, delta_P))

    # --- temperature
    alpha_l = float(np.sum(al * t))
    dT_cold = inp.temperature_min - inp.temperature_assembly
    dT_warm = inp.temperature_max - inp.temperature_assembly
    dF_cold = float(core.thermal_preload_change(alpha_l, pc.alpha, l_K, dT_cold, delta_S, delta_P))
    dF_warm = float(core.thermal_preload_change(alpha_l, pc.alpha, l_K, dT_warm, delta_S, delta_P))
    th_loss = max(0.0, -dF_cold, -dF_warm)
    th_gain = max(0.0, dF_cold, dF_warm)

    # --- torque, friction and the scatter of the preload
    mu_G_min, mu_G_max = inp.mu_thread
    mu_K_min, mu_K_max = inp.mu_head
    ds = th.ds
    F_M_zul = float(core.permissible_assembly_preload(th.As, ds, th.d2, th.P, mu_G_min, pc.Rp02,
                                                      inp.utilisation))
    # friction diameter of the head's own bearing face: on the washer (its hole) when there is one
    D_Km = 0.5 * (hd.dw + (bearing_dh if inp.washer else dh))
    M_A = float(core.tightening_torque(F_M_zul, th.P, th.d2, mu_G_min, mu_K_min, D_Km))
    M_A_hi = float(core.tightening_torque(F_M_zul, th.P, th.d2, mu_G_max, mu_K_max, D_Km))
    # the wrench setting: M_A rounded down to a step a torque tool can be set to
    M_set, M_set_lbf_in = _wrench_setting(M_A)
    F_M_set = F_M_zul * M_set / M_A                       # preload of the set torque at the lowest friction
    alpha_mu = float(core.friction_scatter_factor(th.P, th.d2, D_Km, mu_G_min, mu_G_max, mu_K_min, mu_K_max))
    F_at_mu_max = F_M_zul / alpha_mu                      # M_A at the highest friction
    if isinstance(inp.tightening, str):
        alpha_method = threads.tightening_factor(inp.tightening)[1]
    else:
        alpha_method = float(inp.tightening)
    # VDI 2230-1:2015, 5.4.3: αA = FM,max/FM,min. Under one torque the friction range entered alone
    # spreads the preload by α_μ, so the joint scatters by at least α_μ: αA = max(Table A8, α_μ).
    # Applied to every method, because the instruction this program gives is a torque (methods that
    # set the preload otherwise - elongation, tensioning, yield point - are treated on the safe side).
    alpha_A = max(alpha_method, alpha_mu)
    scatter_governs = "friction range" if alpha_mu > alpha_method else "tightening method"
    T_sh = float(core.torque_shigley(threads.shigley_torque_factor("zinc_plated"), F_M_zul, th.d))

    # --- required and permissible preloads
    S_G_req = inp.slip_safety if inp.slip_safety is not None else SLIP_SAFETY[inp.transverse_load]
    F_KQ = F_Q / (inp.slip_interfaces * inp.mu_interface) if F_Q > 0 else 0.0
    F_Kab = 0.0
    if ex is not None:
        F_Kab = max(0.0, *(float(ecc.clamp_to_prevent_opening(F_A, ex["a"], ex["s"], u, ex["A_D"], ex["I_BT"]))
                           for u in ex["edges"]))
    F_K_req = max(inp.clamp_force_required + F_Kab, S_G_req * F_KQ)
    F_M_min = F_K_req + (1.0 - phi) * F_A + F_Z + th_loss
    F_M_max = alpha_A * F_M_min

    # --- service
    F_M_set_min = F_M_set / alpha_A                        # smallest assembly preload of the set torque
    F_KR = F_M_set_min - (1.0 - phi) * F_A - F_Z - th_loss
    F_S_max = F_M_zul + phi * F_A + th_gain
    W_p = math.pi * ds ** 3 / 16.0
    tau = float(core.thread_torque(F_M_zul, th.P, th.d2, mu_G_min)) / W_p
    sig_red = float(core.reduced_stress(F_S_max / th.As, tau, 0.5))
    S_F = pc.Rp02 / sig_red

    # --- slip (R12) and the screw in shear if the joint slips
    S_G = float(core.slip_safety(F_KR, inp.slip_interfaces, inp.mu_interface, F_Q))
    threaded_at_joint = l_shank < l_K
    A_tau = math.pi / 4.0 * (th.d3 if threaded_at_joint else th.d) ** 2
    tau_Q = F_Q / A_tau
    tauB_S = pc.tauB_ratio * pc.Rm
    S_A = tauB_S / tau_Q if tau_Q > 0 else math.inf

    # --- surface pressure: under a washer the load spreads through it with the cone's angle
    first = inp.layers[0].material
    pG, _ = _limits_for(first, "pG")
    if w is not None:
        bearing_d = min(w.d2, hd.dw + 2.0 * w.h * tphi)
    A_p = math.pi / 4.0 * (bearing_d ** 2 - bearing_dh ** 2)
    F_p = max(F_M_zul, F_M_zul - F_Z + phi * F_A + th_gain)
    p = F_p / A_p
    p_nut = pG_nut = math.nan
    if not tapped:
        last = inp.layers[-1].material
        pG_nut, _ = _limits_for(last, "pG")
        nut_dw = threads.head("hex", th.size).dw if ("hex", th.size) in threads._heads() else hd.dw
        p_nut = F_p / (math.pi / 4.0 * (nut_dw ** 2 - dh ** 2))

    # --- engagement (R11)
    L_min = math.nan
    r11 = {}
    if tapped:
        _, tauB_M = _limits_for(inp.housing_material, "tauB")
        es, Td, Td2, TD1, TD2 = (float(v) for v in core.iso965_tolerances(th.d, th.P))
        allowance = inp.engagement_allowance if inp.engagement_allowance is not None else 2.0 * th.P
        r11 = core.engagement_r11(th.As, pc.Rm, tauB_S, tauB_M, th.d, th.P,
                                  d_min=th.d + es - Td, d2_min=th.d2 + es - Td2,
                                  D1_max=th.D1 + TD1, D2_max=th.d2 + TD2, allowance=allowance)
        L_min = r11["m_ges"] * _ENGAGEMENT_MARGIN
        if th.system == "unified":
            warnings.warn("length of engagement of a Unified thread: the shear areas use the ISO 965-1 6g/6H "
                          "tolerance formulas for its diameter and pitch (an estimate of class 2A/2B)",
                          MethodRangeWarning, stacklevel=3)

    # --- eccentric joint: opening limit and bending of the screw
    sig_bend = 0.0
    F_V_min = F_M_set_min - F_Z - th_loss
    F_Aab = math.inf if phi >= 1.0 else max(F_V_min, 0.0) / (1.0 - phi)
    opening_edge = ""
    if ex is not None:
        lims = [float(ecc.opening_limit(max(F_V_min, 0.0), phi, ex["a"], ex["s"], u, ex["A_D"], ex["I_BT"]))
                for u in ex["edges"]]
        F_Aab = min(lims)
        opening_edge = ("the edge on the load side" if lims[0] <= lims[1] else "the edge away from the load")
        if ex["where"]:
            opening_edge += f", at {ex['where']}"
        _, sb = ecc.screw_stress_eccentric(F_A, phi, ex["a"], ex["s"], l_K, ex["l_ers"], pc.E, ex["E_P"],
                                           th.ds, ex["I_Bers"])
        sig_bend = float(sb)

    # --- fatigue (load cycling between 0 and F_A)
    sigma_a = phi * F_A / (2.0 * th.As) + sig_bend / 2.0
    if inp.rolled_after_heat_treatment:
        # mean screw force at the largest preload in service (after embedding): the lower, safe limit
        F_Sm = F_M_zul - F_Z + 0.5 * phi * F_A
        sigma_AS = max(float(core.fatigue_limit_rolled_after(th.d, F_Sm, th.As * pc.Rp02)),
                       float(core.fatigue_limit_rolled_before(th.d)))
    else:
        sigma_AS = float(core.fatigue_limit_rolled_before(th.d))
    S_D = sigma_AS / sigma_a if sigma_a > 0 else math.inf

    method = inp.tightening if isinstance(inp.tightening, str) else f"αA = {alpha_method:g} given"
    instruction = (f"Tighten to {M_set / 1000.0:g} N·m ({M_set_lbf_in:g} lbf·in), {method.replace('_', ' ')}: "
                   f"preload {F_M_set_min / 1000.0:.3g} … {F_M_set / 1000.0:.3g} kN (αA = {alpha_A:.3g}, "
                   f"μG {mu_G_min:g} … {mu_G_max:g}, μK {mu_K_min:g} … {mu_K_max:g})")

    checks = [
        Check("assembly preload", F_M_max, F_M_zul, "<=", "N", "VDI 2230-1:2015, R5–R7",
              f"αA·FM,min with αA = {alpha_A:.3g} ({scatter_governs} governs: Table A8 {alpha_method:g}, "
              f"friction range {alpha_mu:.3g}) against FM,zul at ν = {inp.utilisation:g}"),
        Check("working stress (yield safety)", S_F, 1.0, ">=", "", "VDI 2230-1:2015, R8",
              f"σred,B = {sig_red:.0f} MPa against Rp0.2 = {pc.Rp02:g} MPa"),
        Check("residual clamp load (separation)", F_KR, inp.clamp_force_required, ">=", "N",
              "VDI 2230-1:2015, R2, R13", f"least clamp load left in service at the smallest preload "
              f"FM,set/αA = {F_M_set_min:.0f} N ({scatter_governs} governs αA)"),
    ]
    if F_Q > 0:
        checks.append(Check("slip safety S_G", S_G, S_G_req, ">=", "", "VDI 2230-1:2015, R12",
                            f"S_G = FKR,min·qF·μT/FQ; FQ = {F_Q:.0f} N per screw, μT = {inp.mu_interface:g}, "
                            f"qF = {inp.slip_interfaces}, {inp.transverse_load} transverse load"))
        checks.append(Check("screw shear if the joint slips", S_A, SHEAR_SAFETY, ">=", "",
                            "VDI 2230-1:2015, R12",
                            f"τQ = FQ/Aτ = {tau_Q:.0f} MPa on the {'thread core d3' if threaded_at_joint else 'shank'}"
                            f" against τB = {pc.tauB_ratio:g}·Rm = {tauB_S:.0f} MPa"))
    checks.append(Check("surface pressure under head", p, pG, "<=", "MPa", "VDI 2230-1:2015, R10, Table A9",
                        f"on {first.name}" + (f" under the washer (load spread to {bearing_d:.3g} mm)"
                                              if inp.washer else "")))
    if not tapped:
        checks.append(Check("surface pressure under nut", p_nut, pG_nut, "<=", "MPa",
                            "VDI 2230-1:2015, R10, Table A9", f"on {inp.layers[-1].material.name}"))
    if tapped:
        checks.append(Check("length of engagement", inp.engagement, L_min, ">=", "mm", "VDI 2230-1:2015, R11",
                            f"housing {inp.housing_material.name}: m_eff = {r11['m_eff']:.2f} mm "
                            f"(R_S = {r11['R_S']:.2f}, C1 = {r11['C1']:g}, C2 = {r11['C2']:.3f}, "
                            f"C3 = {r11['C3']:.3f}, {r11['strips']} thread strips first) + "
                            f"{r11['allowance']:.2f} mm countersink and runout"))
    if F_A > 0:
        checks.append(Check("fatigue of the thread", S_D, _FATIGUE_SAFETY, ">=", "", "VDI 2230-1:2015, R9",
                            f"σa = {sigma_a:.1f} MPa against σAS = {sigma_AS:.1f} MPa"
                            + (f" (bending share {sig_bend / 2.0:.1f} MPa)" if ex is not None else "")))
    if ex is not None:
        checks.append(Check("no opening at the loaded edge", F_A, F_Aab, "<=", "N",
                            "VDI 2230-1:2015, 3.2.3, step R2",
                            f"opening limit FAab at FV,min = {F_V_min:.0f} N; opens first at {opening_edge}; "
                            f"Φen* = {phi:.3f} (s_sym = {ex['s']:g} mm, a = {ex['a']:g} mm)"))
    gasket_p = math.nan
    if inp.gasket is not None and inp.gasket.seating_pressure is not None:
        gasket_p = F_KR / (inp.gasket.area / inp.count)
        checks.append(Check("gasket sealing pressure", gasket_p, inp.gasket.seating_pressure, ">=", "MPa",
                            "VDI 2230-1:2015, step R2 (FKP)",
                            f"smallest residual clamp load {F_KR:.0f} N on {inp.gasket.area / inp.count:.0f} "
                            "mm² of gasket per screw"))

    return ScrewJointResult(
        name=inp.name, thread=th.designation, property_class=pc.name, d=th.d, P=th.P, d2=th.d2, d3=th.d3,
        As=th.As, Rp02=pc.Rp02, Rm=pc.Rm, dw=hd.dw, dh=dh, l_K=l_K, D_A=float(D_A), tan_phi=tphi,
        D_A_Gr=D_A_Gr, delta_S=delta_S, delta_P=delta_P, load_introduction=n, load_factor=phi_concentric, F_A=F_A,
        F_Q=F_Q, f_Z=f_Z, F_Z=F_Z, dF_th_cold=dF_cold, dF_th_warm=dF_warm, F_K_required=F_K_req,
        F_KQ_required=F_KQ, alpha_A=alpha_A, F_M_zul=F_M_zul, F_M_min=F_M_min, F_M_max=F_M_max,
        tightening_torque=M_A, tightening_torque_mu_max=M_A_hi, preload_at_mu_max=F_at_mu_max,
        torque_shigley=T_sh, F_KR_min=F_KR, F_S_max=F_S_max, sigma_red_B=sig_red, yield_safety=S_F,
        surface_pressure=p, p_G=pG, surface_pressure_nut=p_nut, p_G_nut=pG_nut,
        engagement=inp.engagement if inp.engagement is not None else math.nan, engagement_min=L_min,
        sigma_a=sigma_a, sigma_AS=sigma_AS, fatigue_safety=S_D, k_frustum_shigley=1.0 / d_P_sh,
        k_exponential_shigley=k_exp, checks=tuple(checks), load_factor_eccentric=phi,
        load_factor_concentric=phi_concentric, bending_stress=sig_bend, opening_force=F_Aab,
        clamp_for_opening=F_Kab, opening_edge=opening_edge,
        beta_P=ex["beta_P"] if ex is not None else 0.0, gasket_pressure=gasket_p,
        alpha_A_method=alpha_method, alpha_A_friction=alpha_mu, scatter_governs=scatter_governs,
        tightening_torque_set=M_set, tightening_torque_set_lbf_in=M_set_lbf_in, preload_set_max=F_M_set,
        preload_set_min=F_M_set_min, tightening_instruction=instruction, slip_safety=S_G,
        slip_safety_required=S_G_req, transverse_load=inp.transverse_load, shear_stress=tau_Q,
        shear_strength=tauB_S, shear_safety=S_A, bearing_diameter_effective=bearing_d,
        engagement_effective_min=r11.get("m_eff", math.nan),
        engagement_allowance=r11.get("allowance", math.nan), strength_ratio=r11.get("R_S", math.nan),
        C1=r11.get("C1", math.nan), C2=r11.get("C2", math.nan), C3=r11.get("C3", math.nan),
        engagement_strips=r11.get("strips", ""), shigley_grip=l_sh)


def _wrench_setting(M_A: float) -> tuple[float, float]:
    """The torque set point [N·mm] and the same in lbf·in: M_A rounded DOWN to a settable step.

    Steps (common practice for torque tools): 0.01 N·m below 1 N·m, 0.05 below 5, 0.1 below 20,
    0.5 below 100, 1 N·m above; lbf·in in steps of 0.1 below 10, 0.5 below 100, 1 above. Rounding
    down keeps the preload at the lowest friction within FM,zul.

    >>> _wrench_setting(9137.0)
    (9100.0, 80.5)
    """
    Nm = M_A / 1000.0
    step = 0.01 if Nm < 1 else 0.05 if Nm < 5 else 0.1 if Nm < 20 else 0.5 if Nm < 100 else 1.0
    set_Nm = math.floor(Nm / step + 1e-9) * step
    set_Nm = round(set_Nm, 2)
    lbf = set_Nm * NM_TO_LBF_IN
    lstep = 0.1 if lbf < 10 else 0.5 if lbf < 100 else 1.0
    set_lbf = round(math.floor(lbf / lstep + 1e-9) * lstep, 1)
    return set_Nm * 1000.0, set_lbf
