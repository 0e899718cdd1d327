"""Kernels of the bolted-joint calculation after VDI 2230 Part 1:2015, with Shigley's forms beside it.

Plain floats / NumPy arrays in core units (mm, N, MPa, N·mm, K); everything broadcasts.
The calculation steps of VDI 2230 Part 1:2015 are cited by their step numbers R0 … R13
(Section 4.4 of the guideline) and by the section that derives them (5.1 compliances,
5.2 load introduction, 5.4 preload changes, 5.5 assembly).

The substitute deformation body of the clamped parts (a cone of half-angle φ that turns
into a sleeve where it meets the outer diameter D_A) is evaluated as the integral

.. math:: \\delta_P = \\int_0^{l_K} \\frac{dz}{E(z)\\,\\tfrac{\\pi}{4}\\,(D(z)^2 - d_h^2)},

whose closed form for one material is VDI 2230's cone/sleeve formula (Section 5.1.2.2) and,
with φ = 30°, Shigley's frustum, eq. (8-20). Writing it layer by layer gives the stacked-layer
compliance of different materials exactly.
"""

from __future__ import annotations

import numpy as np

__all__ = [
    "D2_FACTOR", "D3_FACTOR", "thread_d2", "thread_d3", "stress_area_metric", "stress_area_unified",
    "stress_diameter", "screw_compliance", "tan_phi", "limiting_diameter", "cone_section_compliance",
    "clamp_compliance", "clamp_compliance_closed_form", "frustum_stiffness",
    "member_stiffness_exponential", "bolt_stiffness_shigley", "load_factor", "embedding_loss",
    "thermal_preload_change", "permissible_assembly_preload", "thread_torque", "tightening_torque",
    "torque_shigley", "reduced_stress", "fatigue_limit_rolled_before", "fatigue_limit_rolled_after",
    "shear_area_internal", "shear_area_external", "min_engagement", "pattern_loads",
    "friction_scatter_factor", "slip_safety", "iso965_tolerances", "shear_area_nut_thread",
    "shear_area_bolt_thread", "nut_dilation_factor", "thread_bending_factors", "engagement_r11",
]

D2_FACTOR = 0.649519  # ISO 724: d2 = d - 0.649519 P  (3/8·√3)
D3_FACTOR = 1.226869  # ISO 898-1 / ISO 68-1: d3 = d - 1.226869 P (root with rounded radius H/6)


# --------------------------------------------------------------------------- thread geometry

def thread_d2(d, P):
    """Pitch diameter of an ISO metric thread.

    .. math:: d_2 = d - 0.649519\\,P

    Parameters
    ----------
    d : float or ndarray — nominal (major) diameter [mm]
    P : float or ndarray — pitch [mm]

    Returns
    -------
    float or ndarray — pitch diameter d2 [mm]

    References
    ----------
    ISO 724:1993, basic dimensions (d2 = d − 0.6495 P).

    >>> round(float(thread_d2(10.0, 1.5)), 3)
    9.026
    """
    return np.asarray(d, float) - D2_FACTOR * np.asarray(P, float)


def thread_d3(d, P):
    """Minor diameter of the external ISO metric thread (root of the screw).

    .. math:: d_3 = d - 1.226869\\,P

    Parameters
    ----------
    d : float or ndarray — nominal diameter [mm]
    P : float or ndarray — pitch [mm]

    Returns
    -------
    float or ndarray — d3 [mm]

    References
    ----------
    ISO 898-1:2013, 9.1.6.1 (d3 = d1 − H/6); ISO 68-1 basic profile.

    >>> round(float(thread_d3(10.0, 1.5)), 3)
    8.16
    """
    return np.asarray(d, float) - D3_FACTOR * np.asarray(P, float)


def stress_diameter(d2, d3):
    """Diameter of the tensile stress area, d_S = (d2 + d3)/2 [mm] (VDI 2230-1:2015, 5.1.1, d0 = dS).

    >>> round(float(stress_diameter(9.026, 8.160)), 3)
    8.593
    """
    return 0.5 * (np.asarray(d2, float) + np.asarray(d3, float))


def stress_area_metric(d2, d3):
    """Nominal tensile stress area of an ISO metric screw.

    .. math:: A_s = \\frac{\\pi}{4}\\left(\\frac{d_2 + d_3}{2}\\right)^2

    Parameters
    ----------
    d2 : float or ndarray — pitch diameter [mm]
    d3 : float or ndarray — minor diameter of the external thread [mm]

    Returns
    -------
    float or ndarray — As [mm²]

    References
    ----------
    ISO 898-1:2013, 9.1.6.1, formula for As,nom.

    >>> round(float(stress_area_metric(9.026, 8.160)), 1)
    58.0
    """
    ds = stress_diameter(d2, d3)
    return np.pi / 4.0 * ds * ds


def stress_area_unified(d, P):
    """Tensile stress area of a Unified inch screw thread.

    .. math:: A_t = 0.7854\\,(d - 0.9743\\,P)^2,\\quad P = 1/n

    Works in any consistent length unit (in → in², mm → mm²).

    Parameters
    ----------
    d : float or ndarray — basic major diameter [mm]
    P : float or ndarray — pitch, 1/threads per length [mm]

    Returns
    -------
    float or ndarray — At [mm²]

    References
    ----------
    ASME B1.1-2019, tensile stress area formula (Appendix B).

    >>> round(float(stress_area_unified(0.25, 1 / 20)), 4)
    0.0318
    """
    d = np.asarray(d, float)
    return 0.7854 * (d - 0.9743 * np.asarray(P, float)) ** 2


# --------------------------------------------------------------------------- compliances

def screw_compliance(d, d3, l_shank, l_thread, E_S, E_M, k_head=0.5, k_nut=0.4):
    """Elastic compliance of a screw made up of its deformation elements.

    .. math::
        \\delta_S = \\frac{l_{SK}}{E_S A_N} + \\frac{l_1}{E_S A_N} + \\frac{l_{Gew}}{E_S A_{d3}}
        + \\frac{l_G}{E_S A_{d3}} + \\frac{l_M}{E_M A_N}

    with l_SK = k_head·d (0.5 d hexagon head, 0.4 d socket head), l_G = 0.5 d (engaged thread),
    l_M = k_nut·d (0.4 d nut of a through-bolted joint, 0.33 d tapped thread), A_N = π d²/4,
    A_d3 = π d3²/4.

    Parameters
    ----------
    d : float or ndarray — nominal diameter [mm]
    d3 : float or ndarray — minor diameter [mm]
    l_shank : float or ndarray — length of the unthreaded shank inside the clamp length [mm]
    l_thread : float or ndarray — free loaded thread length inside the clamp length [mm]
    E_S : float or ndarray — Young's modulus of the screw [MPa]
    E_M : float or ndarray — Young's modulus of the nut or of the tapped part [MPa]
    k_head, k_nut : float or ndarray — l_SK/d and l_M/d [-]

    Returns
    -------
    ndarray — compliances (head, shank, free thread, engaged thread, nut/tapped, total) [mm/N],
    stacked along the first axis.

    References
    ----------
    VDI 2230 Part 1:2015, Section 5.1.1.1 (elastic resilience of the screw), step R3.

    >>> parts = screw_compliance(10.0, 8.160, 0.0, 20.0, 205000.0, 205000.0)
    >>> f"{parts[-1]:.3e}"
    '2.891e-06'
    """
    d = np.asarray(d, float)
    d3 = np.asarray(d3, float)
    AN = np.pi / 4.0 * d * d
    Ad3 = np.pi / 4.0 * d3 * d3
    head = k_head * d / (E_S * AN)
    shank = np.asarray(l_shank, float) / (E_S * AN)
    free = np.asarray(l_thread, float) / (E_S * Ad3)
    engaged = 0.5 * d / (E_S * Ad3)
    nut = k_nut * d / (np.asarray(E_M, float) * AN)
    total = head + shank + free + engaged + nut
    return np.stack(np.broadcast_arrays(head, shank, free, engaged, nut, total))


def tan_phi(l_K, d_w, D_A, tapped):
    """Tangent of the half-angle of the substitute deformation cone.

    .. math::
        \\tan\\varphi_D = 0.362 + 0.032\\ln(\\beta_L/2) + 0.153\\ln y \\quad\\text{(through bolt, DSV)}

        \\tan\\varphi_E = 0.348 + 0.013\\ln\\beta_L + 0.193\\ln y \\quad\\text{(tapped thread, ESV)}

    with β_L = l_K/d_w and y = D'_A/d_w, limited to 1 ≤ y ≤ y_Gr. y_Gr = D_A,Gr/d_w is the fixed
    point of y = 1 + w·β_L·tan φ(y) (w = 1 DSV, 2 ESV): the cone's own limiting diameter. An
    infinite plate takes y_Gr, and so does any D_A beyond D_A,Gr, because the cone never reaches
    that outer edge; without the upper limit ln y would make a 1 m wide plate (tan φ ≈ 1.2) far
    stiffer than the same plate taken as infinite, and the default D_A of a pattern (the screw
    spacing) stiffer than a single screw in a plate. The limit is this program's reading; below
    D_A,Gr the equations are used as printed.

    Parameters
    ----------
    l_K : float or ndarray — clamp length [mm]
    d_w : float or ndarray — outer diameter of the head bearing face [mm]
    D_A : float or ndarray — substitute outer diameter of the clamped parts [mm] (inf: plate)
    tapped : bool or ndarray — True for a tapped thread joint (ESV)

    Returns
    -------
    float or ndarray — tan φ [-]

    References
    ----------
    VDI 2230 Part 1:2015, Section 5.1.2.2, equations for tan φ_D and tan φ_E.

    >>> round(float(tan_phi(20.0, 15.0, 18.0, False)), 4)
    0.3769
    >>> bool(np.isclose(tan_phi(20.0, 15.0, 1000.0, False), tan_phi(20.0, 15.0, np.inf, False)))
    True
    """
    l_K = np.asarray(l_K, float)
    d_w = np.asarray(d_w, float)
    beta = l_K / d_w
    D_A = np.asarray(D_A, float)
    tp = np.asarray(tapped, bool)
    w = np.where(tp, 2.0, 1.0)

    def formula(y):
        return np.where(tp, 0.348 + 0.013 * np.log(beta) + 0.193 * np.log(y),
                        0.362 + 0.032 * np.log(beta / 2.0) + 0.153 * np.log(y))

    # y_Gr: fixed point of y = 1 + w·βL·tanφ(y) (a contraction: dy/dy' = w·βL·0.19/y < 1 here)
    y_gr = np.ones(np.broadcast(beta, tp).shape)
    for _ in range(60):
        y_gr = np.maximum(1.0 + w * beta * formula(y_gr), 1.0)
    y = np.where(np.isfinite(D_A), np.maximum(D_A / d_w, 1.0), np.inf)
    return formula(np.minimum(y, y_gr))


def limiting_diameter(d_w, l_K, tan_ph, tapped):
    """Limiting outer diameter D_A,Gr = d_w + w·l_K·tan φ (w = 1 DSV, w = 2 ESV) [mm].

    Beyond D_A,Gr the clamped part works as a full cone; below it as cone plus sleeve.

    References
    ----------
    VDI 2230 Part 1:2015, Section 5.1.2.2.

    >>> float(limiting_diameter(15.0, 20.0, 0.5, False))
    25.0
    """
    w = np.where(np.asarray(tapped, bool), 2.0, 1.0)
    return np.asarray(d_w, float) + w * np.asarray(l_K, float) * np.asarray(tan_ph, float)


def cone_section_compliance(a, b, d_w, d_h, D_A, tan_ph, E):
    """Compliance of the part of a deformation cone between distances a and b from its bearing face.

    The cone diameter is D(z) = d_w + 2 z tan φ up to D_A, then a sleeve of diameter D_A:

    .. math::
        \\delta = \\frac{1}{E\\pi d_h\\tan\\varphi}\\ln\\frac{(D(a)+d_h)(D(b')-d_h)}{(D(a)-d_h)(D(b')+d_h)}
        + \\frac{4\\,(b - a')}{E\\pi(D_A^2 - d_h^2)}

    with b' = min(b, z_s), a' = max(a, z_s), z_s = (D_A − d_w)/(2 tan φ).

    Parameters
    ----------
    a, b : float or ndarray — distances from the bearing face, 0 ≤ a ≤ b [mm]
    d_w : float or ndarray — bearing-face outer diameter [mm]
    d_h : float or ndarray — hole diameter [mm]
    D_A : float or ndarray — outer diameter of the substitute body [mm] (inf: no sleeve)
    tan_ph : float or ndarray — tan φ [-]
    E : float or ndarray — Young's modulus of the section [MPa]

    Returns
    -------
    float or ndarray — compliance [mm/N]

    References
    ----------
    VDI 2230 Part 1:2015, Section 5.1.2.2 (cone and sleeve); the integral of dz/(E·A(z)).

    >>> f"{float(cone_section_compliance(0.0, 10.0, 15.0, 11.0, np.inf, 0.5, 210000.0)):.4e}"
    '2.5557e-07'
    """
    a = np.asarray(a, float)
    b = np.maximum(np.asarray(b, float), a)
    d_w = np.asarray(d_w, float)
    d_h = np.asarray(d_h, float)
    D_A = np.asarray(D_A, float)
    E = np.asarray(E, float)
    t = np.asarray(tan_ph, float)
    with np.errstate(invalid="ignore", divide="ignore"):
        z_s = np.maximum((D_A - d_w) / (2.0 * t), 0.0)
        b_c = np.clip(b, a, np.maximum(z_s, a))
        Da = d_w + 2.0 * a * t
        Db = d_w + 2.0 * b_c * t
        cone = np.log((Da + d_h) * (Db - d_h) / ((Da - d_h) * (Db + d_h))) / (E * np.pi * d_h * t)
        cone = np.where(b_c > a, cone, 0.0)
        l_sl = np.maximum(b - np.maximum(a, z_s), 0.0)
        sleeve = np.where(l_sl > 0, 4.0 * l_sl / (E * np.pi * (D_A * D_A - d_h * d_h)), 0.0)
    return cone + sleeve


def clamp_compliance(z_top, z_bot, E, d_w, d_h, D_A, tan_ph, tapped, l_K=None):
    """Compliance of stacked clamped layers of different materials (substitute cone and sleeve).

    Layers are given by their top and bottom distances from the head bearing face. For a
    through-bolted joint (DSV) two cones grow from the head and from the nut and meet at l_K/2;
    for a tapped-thread joint (ESV) one cone grows from the head over the whole clamp length.
    Each layer's share is :func:`cone_section_compliance` with its own modulus.

    Parameters
    ----------
    z_top, z_bot : ndarray — layer boundaries from the head bearing face, shape (m,) [mm]
    E : ndarray — Young's modulus of each layer, shape (m,) [MPa]
    d_w : float — bearing-face outer diameter [mm]
    d_h : float — hole diameter [mm]
    D_A : float — substitute outer diameter [mm] (inf for a wide plate)
    tan_ph : float — tan φ [-]
    tapped : bool — tapped-thread joint (ESV)
    l_K : float, optional — clamp length [mm] (default: the last z_bot)

    Returns
    -------
    ndarray — compliance of each layer, shape (m,) [mm/N]; their sum is δ_P.

    References
    ----------
    VDI 2230 Part 1:2015, Section 5.1.2.2 and 5.1.2.3 (several clamped parts of different
    materials: sum of the sections' compliances).

    >>> lay = clamp_compliance(np.array([0.0, 8.0]), np.array([8.0, 20.0]),
    ...                        np.array([210e3, 210e3]), 15.0, 11.0, np.inf, 0.5, False)
    >>> one = clamp_compliance(np.array([0.0]), np.array([20.0]), np.array([210e3]),
    ...                        15.0, 11.0, np.inf, 0.5, False)
    >>> bool(np.isclose(lay.sum(), one.sum()))
    True
    """
    z1 = np.asarray(z_top, float)
    z2 = np.asarray(z_bot, float)
    E = np.asarray(E, float)
    lK = float(z2[-1]) if l_K is None else float(l_K)
    if tapped:
        return cone_section_compliance(z1, z2, d_w, d_h, D_A, tan_ph, E)
    half = 0.5 * lK
    up = cone_section_compliance(np.minimum(z1, half), np.minimum(z2, half), d_w, d_h, D_A, tan_ph, E)
    lo_a = lK - np.maximum(z2, half)
    lo_b = lK - np.maximum(z1, half)
    low = cone_section_compliance(lo_a, lo_b, d_w, d_h, D_A, tan_ph, E)
    return up + low


def clamp_compliance_closed_form(l_K, E_P, d_w, d_h, D_A, tan_ph, tapped):
    """VDI 2230's closed form of δ_P for one material (cone, cone + sleeve, or sleeve).

    .. math::
        D_A \\ge D_{A,Gr}:\\ \\delta_P = \\frac{2\\ln\\left[\\frac{(d_w+d_h)(d_w+w l_K\\tan\\varphi-d_h)}
        {(d_w-d_h)(d_w+w l_K\\tan\\varphi+d_h)}\\right]}{w E_P \\pi d_h \\tan\\varphi}

        d_w < D_A < D_{A,Gr}:\\ \\delta_P = \\frac{\\frac{2}{w d_h\\tan\\varphi}
        \\ln\\left[\\frac{(d_w+d_h)(D_A-d_h)}{(d_w-d_h)(D_A+d_h)}\\right]
        + \\frac{4}{D_A^2-d_h^2}\\left[l_K - \\frac{D_A-d_w}{w\\tan\\varphi}\\right]}{E_P\\pi}

        D_A \\le d_w:\\ \\delta_P = \\frac{4\\,l_K}{E_P\\pi(D_A^2-d_h^2)}

    Parameters
    ----------
    l_K, E_P, d_w, d_h, D_A, tan_ph : float or ndarray — [mm], [MPa], [mm], [mm], [mm], [-]
    tapped : bool or ndarray — ESV (w = 2) or DSV (w = 1)

    Returns
    -------
    float or ndarray — δ_P [mm/N]

    References
    ----------
    VDI 2230 Part 1:2015, Section 5.1.2.2, compliance of the clamped parts.

    >>> f"{float(clamp_compliance_closed_form(20.0, 210e3, 15.0, 11.0, np.inf, 0.5, False)):.4e}"
    '5.1114e-07'
    """
    l_K = np.asarray(l_K, float)
    d_w = np.asarray(d_w, float)
    d_h = np.asarray(d_h, float)
    D_A = np.asarray(D_A, float)
    t = np.asarray(tan_ph, float)
    w = np.where(np.asarray(tapped, bool), 2.0, 1.0)
    D_gr = d_w + w * l_K * t
    with np.errstate(invalid="ignore", divide="ignore"):
        cone = 2.0 * np.log((d_w + d_h) * (D_gr - d_h) / ((d_w - d_h) * (D_gr + d_h))) / (
            w * E_P * np.pi * d_h * t)
        mixed = (2.0 / (w * d_h * t) * np.log((d_w + d_h) * (D_A - d_h) / ((d_w - d_h) * (D_A + d_h)))
                 + 4.0 / (D_A ** 2 - d_h ** 2) * (l_K - (D_A - d_w) / (w * t))) / (E_P * np.pi)
        sleeve = 4.0 * l_K / (E_P * np.pi * (D_A ** 2 - d_h ** 2))
    return np.where(D_A >= D_gr, cone, np.where(D_A > d_w, mixed, sleeve))


def frustum_stiffness(E, d, t, D, alpha_deg=30.0):
    """Stiffness of one conical frustum of a member (Shigley).

    .. math:: k = \\frac{\\pi E d\\tan\\alpha}{\\ln\\dfrac{(2t\\tan\\alpha + D - d)(D + d)}
              {(2t\\tan\\alpha + D + d)(D - d)}}

    which for α = 30° reads k = 0.5774 π E d / ln[(1.155 t + D − d)(D + d)/((1.155 t + D + d)(D − d))].

    Parameters
    ----------
    E : float or ndarray — Young's modulus [MPa]
    d : float or ndarray — bolt (hole) diameter [mm]
    t : float or ndarray — frustum thickness [mm]
    D : float or ndarray — smaller diameter of the frustum [mm]
    alpha_deg : float — cone half-angle [deg]

    Returns
    -------
    float or ndarray — k [N/mm]

    References
    ----------
    Shigley's Mechanical Engineering Design, 10th ed., eq. (8-20).

    >>> round(float(frustum_stiffness(207000.0, 12.0, 20.0, 18.0)) / 1000)
    4470
    """
    ta = np.tan(np.radians(alpha_deg))
    E = np.asarray(E, float)
    d = np.asarray(d, float)
    t = np.asarray(t, float)
    D = np.asarray(D, float)
    return np.pi * E * d * ta / np.log((2 * t * ta + D - d) * (D + d) / ((2 * t * ta + D + d) * (D - d)))


def member_stiffness_exponential(E, d, l_grip, A=0.78952, B=0.62914):
    """Member stiffness from the exponential fit of finite-element results (Wileman et al.).

    .. math:: k_m = E\\,d\\,A\\,\\exp(B\\,d/l)

    Parameters
    ----------
    E : float or ndarray — Young's modulus of the members [MPa]
    d : float or ndarray — bolt diameter [mm]
    l_grip : float or ndarray — grip (clamp) length [mm]
    A, B : float — material constants (Shigley Table 8-8; defaults: general expression)

    Returns
    -------
    float or ndarray — k_m [N/mm]

    References
    ----------
    Shigley's Mechanical Engineering Design, 10th ed., eq. (8-23) and Table 8-8.

    >>> round(float(member_stiffness_exponential(14.5e6, 0.625, 1.5, 0.77871, 0.61616)) / 1e6, 2)
    9.12
    """
    d = np.asarray(d, float)
    return np.asarray(E, float) * d * A * np.exp(B * d / np.asarray(l_grip, float))


def bolt_stiffness_shigley(A_d, A_t, E, l_d, l_t):
    """Bolt stiffness from the unthreaded and threaded lengths in the grip.

    .. math:: k_b = \\frac{A_d A_t E}{A_d l_t + A_t l_d}

    Parameters
    ----------
    A_d : float or ndarray — major-diameter area [mm²]
    A_t : float or ndarray — tensile stress area [mm²]
    E : float or ndarray — Young's modulus [MPa]
    l_d : float or ndarray — unthreaded length in the grip [mm]
    l_t : float or ndarray — threaded length in the grip [mm]

    Returns
    -------
    float or ndarray — k_b [N/mm]

    References
    ----------
    Shigley's Mechanical Engineering Design, 10th ed., eq. (8-17).

    >>> round(float(bolt_stiffness_shigley(113.0, 84.3, 207000.0, 30.0, 15.0)) / 1000, 1)
    466.8
    """
    A_d = np.asarray(A_d, float)
    A_t = np.asarray(A_t, float)
    return A_d * A_t * np.asarray(E, float) / (A_d * np.asarray(l_t, float) + A_t * np.asarray(l_d, float))


# --------------------------------------------------------------------------- forces

def load_factor(n, delta_S, delta_P):
    """Load factor Φ_n = n·δ_P/(δ_S + δ_P): the share of the axial operating load the screw takes.

    Parameters
    ----------
    n : float or ndarray — load introduction factor, 0 < n ≤ 1 [-]
    delta_S : float or ndarray — screw compliance [mm/N]
    delta_P : float or ndarray — clamped-part compliance [mm/N]

    Returns
    -------
    float or ndarray — Φ_n [-]

    References
    ----------
    VDI 2230 Part 1:2015, Section 5.3.1 (load factor) and step R3.

    >>> round(float(load_factor(0.5, 3e-6, 1e-6)), 4)
    0.125
    """
    dS = np.asarray(delta_S, float)
    dP = np.asarray(delta_P, float)
    return np.asarray(n, float) * dP / (dS + dP)


def embedding_loss(f_Z, delta_S, delta_P):
    """Loss of preload by embedding, F_Z = f_Z/(δ_S + δ_P).

    Parameters
    ----------
    f_Z : float or ndarray — total embedding amount [mm]
    delta_S, delta_P : float or ndarray — compliances [mm/N]

    Returns
    -------
    float or ndarray — F_Z [N]

    References
    ----------
    VDI 2230 Part 1:2015, Section 5.4.2.1, step R4.

    >>> round(float(embedding_loss(0.008, 3e-6, 1e-6)))
    2000
    """
    return np.asarray(f_Z, float) / (np.asarray(delta_S, float) + np.asarray(delta_P, float))


def thermal_preload_change(alpha_l_P, alpha_S, l_K, dT, delta_S, delta_P):
    """Change of preload when screw and clamped parts warm or cool uniformly by ΔT from assembly.

    .. math:: \\Delta F_{th} = \\frac{(\\sum_i \\alpha_{P,i} l_i - \\alpha_S l_K)\\,\\Delta T}{\\delta_S + \\delta_P}

    Positive: the preload rises (parts expand more than the screw, e.g. aluminium cover, steel
    screw, warm); negative: it falls. The change of the moduli with temperature is neglected.

    Parameters
    ----------
    alpha_l_P : float or ndarray — Σ α_i·l_i over the clamped layers [mm/K]
    alpha_S : float or ndarray — expansion coefficient of the screw [1/K]
    l_K : float or ndarray — clamp length [mm]
    dT : float or ndarray — temperature change from assembly [K]
    delta_S, delta_P : float or ndarray — compliances [mm/N]

    Returns
    -------
    float or ndarray — ΔF_th [N]

    References
    ----------
    VDI 2230 Part 1:2015, Section 5.4.2.3 (change of preload with temperature), step R4.

    >>> round(float(thermal_preload_change(20 * 23e-6, 11.5e-6, 20.0, 60.0, 3e-6, 1e-6)))
    3450
    """
    num = (np.asarray(alpha_l_P, float) - np.asarray(alpha_S, float) * np.asarray(l_K, float))
    return num * np.asarray(dT, float) / (np.asarray(delta_S, float) + np.asarray(delta_P, float))


def permissible_assembly_preload(A0, d0, d2, P, mu_G, Rp02, nu=0.9):
    """Permissible assembly preload at utilisation ν of the yield strength (tension + torsion).

    .. math::
        F_{M,zul} = \\frac{A_0\\,\\nu\\,R_{p0.2min}}{\\sqrt{1 + 3\\left[\\frac{3}{2}\\frac{d_2}{d_0}
        \\left(\\frac{P}{\\pi d_2} + 1.155\\,\\mu_{G,min}\\right)\\right]^2}}

    i.e. σ_red,M = √(σ_M² + 3 τ_M²) = ν·R_p0.2 with τ_M = M_G/W_p, M_G = F_M·d2/2·(P/(π d2) + 1.155 μ_G),
    W_p = π d0³/16, d0 = d_S and A0 = A_s for a screw without reduced shank.

    Parameters
    ----------
    A0 : float or ndarray — stress cross-section [mm²]
    d0 : float or ndarray — diameter of A0 [mm]
    d2 : float or ndarray — pitch diameter [mm]
    P : float or ndarray — pitch [mm]
    mu_G : float or ndarray — lowest thread friction coefficient [-]
    Rp02 : float or ndarray — minimum 0.2 % proof (yield) strength [MPa]
    nu : float or ndarray — utilisation of the yield strength [-] (0.9 in Table A1)

    Returns
    -------
    float or ndarray — F_M,zul [N]

    References
    ----------
    VDI 2230 Part 1:2015, Section 5.5.1 and step R7 (assembly stress); Table A1 for ν = 0.9.

    >>> round(float(permissible_assembly_preload(36.61, 6.827, 7.188, 1.25, 0.12, 640.0)) / 1000, 1)
    18.6
    """
    d2 = np.asarray(d2, float)
    P = np.asarray(P, float)
    k = 1.5 * d2 / np.asarray(d0, float) * (P / (np.pi * d2) + 1.155 * np.asarray(mu_G, float))
    return np.asarray(A0, float) * np.asarray(nu, float) * np.asarray(Rp02, float) / np.sqrt(1.0 + 3.0 * k * k)


def thread_torque(F, P, d2, mu_G):
    """Thread torque M_G = F·d2/2·(P/(π d2) + 1.155 μ_G) [N·mm] (VDI 2230-1:2015, 5.5.1).

    >>> round(float(thread_torque(10000.0, 1.5, 9.026, 0.12)))
    8642
    """
    d2 = np.asarray(d2, float)
    return np.asarray(F, float) * d2 / 2.0 * (np.asarray(P, float) / (np.pi * d2)
                                                + 1.155 * np.asarray(mu_G, float))


def tightening_torque(F, P, d2, mu_G, mu_K, D_Km):
    """Tightening torque of a preload.

    .. math:: M_A = F_M\\,(0.16\\,P + 0.58\\,d_2\\,\\mu_G + \\mu_K\\,D_{Km}/2)

    Parameters
    ----------
    F : float or ndarray — assembly preload [N]
    P : float or ndarray — pitch [mm]
    d2 : float or ndarray — pitch diameter [mm]
    mu_G : float or ndarray — thread friction coefficient [-]
    mu_K : float or ndarray — head (nut) bearing-face friction coefficient [-]
    D_Km : float or ndarray — effective friction diameter of the bearing face, (d_w + d_h)/2 [mm]

    Returns
    -------
    float or ndarray — M_A [N·mm]

    References
    ----------
    VDI 2230 Part 1:2015, Section 5.5.1, step R13 (also ISO 16047:2005, torque/clamp-force relation).

    >>> round(float(tightening_torque(18622.0, 1.25, 7.188, 0.12, 0.12, 10.315)) / 1000, 1)
    24.6
    """
    return np.asarray(F, float) * (0.16 * np.asarray(P, float) + 0.58 * np.asarray(d2, float) * mu_G
                                   + np.asarray(mu_K, float) * np.asarray(D_Km, float) / 2.0)


def torque_shigley(K, F, d):
    """Tightening torque T = K·F·d [N·mm] (Shigley, 10th ed., eq. (8-27); K from Table 8-15).

    >>> float(torque_shigley(0.2, 10000.0, 10.0))
    20000.0
    """
    return np.asarray(K, float) * np.asarray(F, float) * np.asarray(d, float)


def reduced_stress(sigma, tau, k_tau=1.0):
    """Von Mises equivalent stress of tension and torsion, σ_red = √(σ² + 3 (k_τ τ)²) [MPa].

    k_τ = 1 at assembly; VDI 2230 uses k_τ = 0.5 in service (part of the torsion relaxes).

    References
    ----------
    VDI 2230 Part 1:2015, steps R7 and R8.

    >>> round(float(reduced_stress(300.0, 100.0, 0.5)), 2)
    312.25
    """
    tau = np.asarray(k_tau, float) * np.asarray(tau, float)
    return np.sqrt(np.asarray(sigma, float) ** 2 + 3.0 * tau * tau)


def fatigue_limit_rolled_before(d):
    """Endurance limit (stress amplitude) of screws rolled before heat treatment.

    .. math:: \\sigma_{ASV} = 0.85\\,(150/d + 45)

    Parameters
    ----------
    d : float or ndarray — nominal diameter [mm]

    Returns
    -------
    float or ndarray — σ_ASV [MPa]

    References
    ----------
    VDI 2230 Part 1:2015, step R9 (endurance limit of the thread, rolled before heat treatment;
    valid for d up to 40 mm, high-strength steel screws).

    >>> round(float(fatigue_limit_rolled_before(10.0)), 2)
    51.0
    """
    return 0.85 * (150.0 / np.asarray(d, float) + 45.0)


def fatigue_limit_rolled_after(d, F_Sm, F_02min):
    """Endurance limit of screws rolled after heat treatment, σ_ASG = (2 − F_Sm/F_0.2min)·σ_ASV.

    Parameters
    ----------
    d : float or ndarray — nominal diameter [mm]
    F_Sm : float or ndarray — mean screw force [N]
    F_02min : float or ndarray — minimum yield load A_s·R_p0.2min [N]

    Returns
    -------
    float or ndarray — σ_ASG [MPa]

    References
    ----------
    VDI 2230 Part 1:2015, step R9 (rolled after heat treatment, for 0.3 < F_Sm/F_0.2min < 1).

    >>> round(float(fatigue_limit_rolled_after(10.0, 30000.0, 60000.0)), 2)
    76.5
    """
    return (2.0 - np.asarray(F_Sm, float) / np.asarray(F_02min, float)) * fatigue_limit_rolled_before(d)


# --------------------------------------------------------------------------- length of engagement

def shear_area_internal(d, d2, P, L):
    """Shear area of the internal thread (stripping at the screw's major diameter), basic profile.

    .. math:: A_n = \\pi\\,d\\,\\frac{L}{P}\\left[\\frac{P}{2} + \\tan 30^\\circ\\,(d - d_2)\\right]
              \\;(= 0.875\\,\\pi d L\\text{ for the basic ISO profile})

    Parameters
    ----------
    d : float or ndarray — major diameter of the screw [mm]
    d2 : float or ndarray — pitch diameter [mm]
    P : float or ndarray — pitch [mm]
    L : float or ndarray — length of engagement [mm]

    Returns
    -------
    float or ndarray — A_n [mm²]

    References
    ----------
    FED-STD-H28/2B, Appendix A (thread shear areas, with basic instead of limiting dimensions);
    the classic method of matching the internal thread's strength to the screw's.

    >>> round(float(shear_area_internal(10.0, 9.026, 1.5, 10.0)), 1)
    274.9
    """
    d = np.asarray(d, float)
    P = np.asarray(P, float)
    return np.pi * d * np.asarray(L, float) / P * (P / 2.0 + np.tan(np.pi / 6) * (d - np.asarray(d2, float)))


def shear_area_external(D1, d2, P, L):
    """Shear area of the external thread (stripping at the nut's minor diameter D1), basic profile.

    .. math:: A_s = \\pi\\,D_1\\,\\frac{L}{P}\\left[\\frac{P}{2} + \\tan 30^\\circ\\,(d_2 - D_1)\\right]
              \\;(= 0.75\\,\\pi D_1 L\\text{ for the basic ISO profile})

    Parameters
    ----------
    D1 : float or ndarray — minor diameter of the internal thread, d − 1.082532 P [mm]
    d2 : float or ndarray — pitch diameter [mm]
    P : float or ndarray — pitch [mm]
    L : float or ndarray — length of engagement [mm]

    Returns
    -------
    float or ndarray — A_s [mm²]

    References
    ----------
    FED-STD-H28/2B, Appendix A, with basic dimensions.

    >>> round(float(shear_area_external(8.376, 9.026, 1.5, 10.0)), 1)
    197.4
    """
    D1 = np.asarray(D1, float)
    P = np.asarray(P, float)
    return np.pi * D1 * np.asarray(L, float) / P * (P / 2.0 + np.tan(np.pi / 6) * (np.asarray(d2, float) - D1))


def min_engagement(As, Rm_S, tauB_S, tauB_M, d, d2, P):
    """Shortest length of engagement for which the screw breaks in its free thread before either
    thread strips.

    .. math::
        L_{min} = \\max\\left(\\frac{R_{m,S} A_s}{\\tau_{B,M}\\,a_n},\\;
        \\frac{R_{m,S} A_s}{\\tau_{B,S}\\,a_s}\\right)

    with a_n, a_s the shear areas per unit length of the internal and external thread
    (:func:`shear_area_internal`, :func:`shear_area_external` at L = 1).

    Parameters
    ----------
    As : float or ndarray — tensile stress area [mm²]
    Rm_S : float or ndarray — tensile strength of the screw [MPa]
    tauB_S : float or ndarray — shear strength of the screw material [MPa]
    tauB_M : float or ndarray — shear strength of the nut / housing material [MPa]
    d, d2, P : float or ndarray — thread dimensions [mm]

    Returns
    -------
    ndarray — (L_min, L_internal, L_external) [mm]

    References
    ----------
    FED-STD-H28/2B, Appendix A (length of engagement so the screw fails in tension first); the
    same principle as VDI 2230 Part 1:2015, step R11 (minimum length of engagement), here without
    its thread-bending and nut-dilation factors.

    >>> [round(float(x), 2) for x in min_engagement(58.0, 800.0, 480.0, 180.0, 10.0, 9.026, 1.5)]
    [9.38, 9.38, 4.9]
    """
    D1 = np.asarray(d, float) - 1.082532 * np.asarray(P, float)
    F = np.asarray(As, float) * np.asarray(Rm_S, float)
    L_int = F / (np.asarray(tauB_M, float) * shear_area_internal(d, d2, P, 1.0))
    L_ext = F / (np.asarray(tauB_S, float) * shear_area_external(D1, d2, P, 1.0))
    return np.stack(np.broadcast_arrays(np.maximum(L_int, L_ext), L_int, L_ext))


# --------------------------------------------------------------------------- screw pattern

def pattern_loads(x, y, F_axial, M_tilt, F_transverse, T_axis, n_dir=360):
    """Axial and transverse loads of the most loaded screw of a pattern.

    Axial: F_A,i = F_axial/n + M_tilt·u_i/Σu_j², with u the distance from a tilting axis through the
    pattern's centroid, taken in the worst of ``n_dir`` directions (rigid flange, joint stays
    closed). Transverse: F_Q,i = |F_transverse/n + T·r_i/Σr_j² (perpendicular to r_i)|, for the
    worst direction of F_transverse; its upper bound F_Q/n + T·r_max/Σr² is used.

    Parameters
    ----------
    x, y : ndarray — screw positions relative to any origin, shape (n,) [mm]
    F_axial : float — total axial force (separating the joint) [N]
    M_tilt : float — tilting moment about an axis in the joint plane [N·mm]
    F_transverse : float — total transverse force [N]
    T_axis : float — torque about the pattern axis [N·mm]
    n_dir : int — number of tilting-axis directions tried

    Returns
    -------
    tuple — (F_A max per screw [N], F_Q max per screw [N])

    References
    ----------
    VDI 2230 Part 1:2015, Section 3 (load distribution in multi-bolted joints, rigid-flange
    simplification); Shigley's Mechanical Engineering Design, 10th ed., Sec. 8-12 (shear of a
    bolt group: primary plus secondary shear, r_i/Σr²).

    >>> [round(v, 1) for v in pattern_loads(np.array([50.0, -50.0, 0, 0]), np.array([0, 0, 50.0, -50.0]),
    ...                                     4000.0, 200000.0, 0.0, 100000.0)]
    [3000.0, 500.0]
    """
    x = np.asarray(x, float)
    y = np.asarray(y, float)
    n = x.size
    xc = x - x.mean()
    yc = y - y.mean()
    th = np.linspace(0.0, np.pi, n_dir, endpoint=False)[:, None]
    u = xc[None, :] * np.cos(th) + yc[None, :] * np.sin(th)
    su2 = np.sum(u * u, axis=1, keepdims=True)
    with np.errstate(invalid="ignore", divide="ignore"):
        tilt = np.where(su2 > 1e-12, np.abs(M_tilt) * np.abs(u) / su2, np.where(abs(M_tilt) > 0, np.inf, 0.0))
    FA = F_axial / n + float(np.max(tilt))
    r2 = xc * xc + yc * yc
    sr2 = float(np.sum(r2))
    if sr2 > 1e-12:
        tors = abs(T_axis) * float(np.sqrt(r2.max())) / sr2
    else:
        tors = np.inf if abs(T_axis) > 0 else 0.0
    FQ = abs(F_transverse) / n + tors
    return float(FA), float(FQ)


# --------------------------------------------------------------------------- preload scatter and slip

def friction_scatter_factor(P, d2, D_Km, mu_G_min, mu_G_max, mu_K_min, mu_K_max):
    """Preload scatter from the friction range alone under one tightening torque.

    .. math:: \\alpha_\\mu = \\frac{F_M(\\mu_{min})}{F_M(\\mu_{max})}
              = \\frac{0.16\\,P + 0.58\\,d_2\\,\\mu_{G,max} + \\mu_{K,max} D_{Km}/2}
                     {0.16\\,P + 0.58\\,d_2\\,\\mu_{G,min} + \\mu_{K,min} D_{Km}/2}

    The same torque M_A gives F_M = M_A/(0.16 P + 0.58 d2 μG + μK DKm/2), so the preload at the
    lowest and at the highest friction differ by this ratio. VDI 2230 defines the tightening factor
    as αA = F_M,max/F_M,min (Section 5.4.3); a torque-controlled joint whose friction range is wider
    than the one Table A8 assumes scatters at least by α_μ.

    Parameters
    ----------
    P, d2, D_Km : float or ndarray — pitch, pitch diameter, friction diameter of the bearing face [mm]
    mu_G_min, mu_G_max, mu_K_min, mu_K_max : float or ndarray — friction range of thread and head [-]

    Returns
    -------
    float or ndarray — α_μ ≥ 1 [-]

    References
    ----------
    VDI 2230 Part 1:2015, Section 5.4.3 (αA = F_M,max/F_M,min) and Section 5.5.1, eq. for M_A
    (also ISO 16047:2005).

    >>> round(float(friction_scatter_factor(1.0, 5.35, 7.99, 0.08, 0.20, 0.08, 0.20)), 3)
    2.17
    """
    lo = tightening_torque(1.0, P, d2, mu_G_min, mu_K_min, D_Km)
    hi = tightening_torque(1.0, P, d2, mu_G_max, mu_K_max, D_Km)
    return hi / lo


def slip_safety(F_KR_min, q_F, mu_T, F_Q):
    """Safety against slip of a joint loaded by a transverse force.

    .. math:: S_G = \\frac{F_{KR,min}\\,q_F\\,\\mu_{T,min}}{F_{Q,max}} = \\frac{F_{KR,min}}{F_{KQ,erf}}

    Parameters
    ----------
    F_KR_min : float or ndarray — smallest residual clamp load [N]
    q_F : float or ndarray — number of interfaces transmitting the force [-]
    mu_T : float or ndarray — lowest coefficient of friction of the interfaces [-]
    F_Q : float or ndarray — largest transverse force per screw [N]

    Returns
    -------
    float or ndarray — S_G [-] (inf without transverse force)

    References
    ----------
    VDI 2230 Part 1:2015, step R12 (S_G ≥ 1.2 static, ≥ 1.8 alternating transverse load).

    >>> float(slip_safety(6000.0, 1, 0.1, 400.0))
    1.5
    """
    F_Q = np.asarray(F_Q, float)
    with np.errstate(divide="ignore", invalid="ignore"):
        return np.where(F_Q > 0, np.asarray(F_KR_min, float) * q_F * mu_T / np.where(F_Q > 0, F_Q, 1.0), np.inf)


# --------------------------------------------------------------------------- engagement after R11

def _size_range_mean(d):
    """Geometric mean of the ISO 965-1 diameter range holding d (over 0.99 … up to 45 mm and on) [mm]."""
    edges = np.array([0.99, 1.4, 2.8, 5.6, 11.2, 22.4, 45.0, 90.0, 180.0, 355.0])
    d = np.asarray(d, float)
    i = np.clip(np.searchsorted(edges, d, side="left"), 1, edges.size - 1)
    return np.sqrt(edges[i - 1] * edges[i])


def iso965_tolerances(d, P):
    """Tolerance-position and grade-6 values of the 6g/6H fit of an ISO metric thread.

    From the formulas of ISO 965-1 (the printed tables round them to R40 numbers; the unrounded
    values differ by up to about 3 %):

    .. math::
        es_g = -(15 + 11P)\\;\\mu m,\\quad T_d(6) = 180P^{2/3} - 3.15/\\sqrt{P},\\quad
        T_{d2}(6) = 90 P^{0.4} d_m^{0.1},

        T_{D2}(6) = 1.32\\,T_{d2}(6),\\quad T_{D1}(6) = 433P - 190P^{1.22}\\ (P < 1),\\;
        230 P^{0.7}\\ (P \\ge 1)

    with d_m the geometric mean of the diameter range that holds d (P in mm, values in µm).

    Parameters
    ----------
    d : float or ndarray — nominal diameter [mm]
    P : float or ndarray — pitch [mm]

    Returns
    -------
    tuple of ndarray — (es, Td, Td2, TD1, TD2) [mm]; es ≤ 0 is the upper deviation of the 6g
    external thread; the 6H internal thread has EI = 0.

    References
    ----------
    ISO 965-1:2013, clauses on fundamental deviations (es of g) and tolerance grades (formulas for
    Td, Td2, TD1, TD2) — # from memory.

    >>> [round(float(x) * 1000) for x in iso965_tolerances(4.0, 0.7)]
    [-23, 138, 90, 180, 118]
    """
    d = np.asarray(d, float)
    P = np.asarray(P, float)
    es = -(15.0 + 11.0 * P)
    Td = 180.0 * P ** (2.0 / 3.0) - 3.15 / np.sqrt(P)
    Td2 = 90.0 * P ** 0.4 * _size_range_mean(d) ** 0.1
    TD2 = 1.32 * Td2
    TD1 = np.where(P < 1.0, 433.0 * P - 190.0 * P ** 1.22, 230.0 * P ** 0.7)
    return tuple(np.asarray(x) / 1000.0 for x in (es, Td, Td2, TD1, TD2))


def shear_area_nut_thread(d_min, D2_max, P, m):
    """Shear area of the internal (nut or housing) thread at the screw's smallest major diameter.

    .. math:: A_{SGM} = \\pi\\,d_{min}\\,\\frac{m_{eff}}{P}\\left[\\frac{P}{2}
              + (d_{min} - D_{2,max})\\tan 30^\\circ\\right]

    References
    ----------
    VDI 2230 Part 1:2015, Section 5.5.5.2 (R11), shear area of the nut thread — # from memory.

    >>> round(float(shear_area_nut_thread(10.0, 9.026, 1.5, 1.0)), 2)
    27.49
    """
    d_min = np.asarray(d_min, float)
    P = np.asarray(P, float)
    return np.pi * d_min * np.asarray(m, float) / P * (P / 2.0 + (d_min - np.asarray(D2_max, float))
                                                        * np.tan(np.pi / 6.0))


def shear_area_bolt_thread(D1_max, d2_min, P, m):
    """Shear area of the external (screw) thread at the internal thread's largest minor diameter.

    .. math:: A_{SGS} = \\pi\\,D_{1,max}\\,\\frac{m_{eff}}{P}\\left[\\frac{P}{2}
              + (d_{2,min} - D_{1,max})\\tan 30^\\circ\\right]

    References
    ----------
    VDI 2230 Part 1:2015, Section 5.5.5.2 (R11), shear area of the bolt thread — # from memory.

    >>> round(float(shear_area_bolt_thread(8.376, 9.026, 1.5, 1.0)), 2)
    19.74
    """
    D1 = np.asarray(D1_max, float)
    P = np.asarray(P, float)
    return np.pi * D1 * np.asarray(m, float) / P * (P / 2.0 + (np.asarray(d2_min, float) - D1)
                                                     * np.tan(np.pi / 6.0))


def nut_dilation_factor(s_over_d):
    """Nut dilation factor C1 (the nut's widening under load lowers its stripping strength).

    .. math:: C_1 = 3.8\\,\\frac{s}{d} - \\left(\\frac{s}{d}\\right)^2 - 2.61
              \\quad (1.4 \\le s/d < 1.9),\\qquad C_1 = 1\\quad (s/d \\ge 1.9)

    A tapped hole in a housing has no nut to widen: s/d = ∞ gives C1 = 1.

    References
    ----------
    VDI 2230 Part 1:2015, Section 5.5.5.2 (R11) — # from memory.

    >>> round(float(nut_dilation_factor(1.6)), 3)
    0.91
    >>> float(nut_dilation_factor(np.inf))
    1.0
    """
    r = np.asarray(s_over_d, float)
    with np.errstate(invalid="ignore"):
        c = 3.8 * r - r * r - 2.61
    return np.where(r >= 1.9, 1.0, c)


def thread_bending_factors(R_S):
    """Thread-bending factors C2 (screw thread) and C3 (internal thread) from the strength ratio R_S.

    .. math::
        C_2 = 5.594 - 13.682 R_S + 14.107 R_S^2 - 6.057 R_S^3 + 0.9353 R_S^4\\quad (1 < R_S \\le 2.2),
        \\qquad C_2 = 0.897\\quad (R_S \\le 1)

        C_3 = 0.728 + 1.769 R_S - 2.896 R_S^2 + 1.296 R_S^3\\quad (0.4 < R_S < 1),
        \\qquad C_3 = 0.897\\quad (R_S \\ge 1)

    with R_S = τ_BM·A_SGM/(τ_BS·A_SGS) (internal over external thread). Outside the ranges the
    end values are kept (C2 at R_S = 2.2, C3 at R_S = 0.4).

    References
    ----------
    VDI 2230 Part 1:2015, Section 5.5.5.2 (R11), after Alexander's stripping model — # from memory.

    >>> [round(float(c), 3) for c in thread_bending_factors(1.0)]
    [0.897, 0.897]
    """
    R = np.asarray(R_S, float)
    r2 = np.clip(R, 1.0, 2.2)
    C2 = np.where(R <= 1.0, 0.897, 5.594 - 13.682 * r2 + 14.107 * r2 ** 2 - 6.057 * r2 ** 3 + 0.9353 * r2 ** 4)
    r3 = np.clip(R, 0.4, 1.0)
    C3 = np.where(R >= 1.0, 0.897, 0.728 + 1.769 * r3 - 2.896 * r3 ** 2 + 1.296 * r3 ** 3)
    return C2, C3


def engagement_r11(As, Rm_S, tauB_S, tauB_M, d, P, d_min, d2_min, D1_max, D2_max, s_over_d=np.inf,
                   allowance=0.0):
    """Minimum length of engagement after VDI 2230 R11: the screw breaks before either thread strips.

    Steps: shear areas per mm at the tolerance limits (:func:`shear_area_nut_thread`,
    :func:`shear_area_bolt_thread`); strength ratio R_S = τ_BM·a_SGM/(τ_BS·a_SGS); C1, C2, C3;
    m_eff = R_m·A_s / min(τ_BM·a_SGM·C1·C3, τ_BS·a_SGS·C1·C2); the length to put on the drawing
    m_ges = m_eff + the allowance for the countersink of the hole and the chamfered screw end.
    C2 and C3 are taken at most 1 (see the code comment).

    Parameters
    ----------
    As, Rm_S : float — stress area [mm²], tensile strength of the screw [MPa]
    tauB_S, tauB_M : float — shear strength of screw and internal-thread material [MPa]
    d, P : float — nominal diameter, pitch [mm]
    d_min, d2_min : float — smallest major and pitch diameter of the screw thread [mm]
    D1_max, D2_max : float — largest minor and pitch diameter of the internal thread [mm]
    s_over_d : float — width across flats of a nut over d (inf: tapped hole, C1 = 1) [-]
    allowance : float — countersink and runout allowance added to m_eff [mm]

    Returns
    -------
    dict — a_SGM, a_SGS [mm²/mm], R_S, C1, C2, C3 [-], F_mS [N], m_eff, m_ges [mm], ``strips``
    ('internal' or 'external', the thread that governs)

    References
    ----------
    VDI 2230 Part 1:2015, Section 5.5.5 and step R11 — # from memory.
    """
    a_M = float(shear_area_nut_thread(d_min, D2_max, P, 1.0))
    a_S = float(shear_area_bolt_thread(D1_max, d2_min, P, 1.0))
    R_S = tauB_M * a_M / (tauB_S * a_S)
    C1 = float(nut_dilation_factor(s_over_d))
    # the polynomials give C3 > 1 for R_S < 0.9 and C2 > 1 for R_S > 1.15; a factor that would raise
    # the stripping strength above the shear strength of the area is not taken (conservative; the
    # coefficients are recalled, not read)
    C2, C3 = (min(float(c), 1.0) for c in thread_bending_factors(R_S))
    F_mS = As * Rm_S
    per_M = tauB_M * a_M * C1 * C3
    per_S = tauB_S * a_S * C1 * C2
    m_eff = F_mS / min(per_M, per_S)
    return {"a_SGM": a_M, "a_SGS": a_S, "R_S": R_S, "C1": C1, "C2": C2, "C3": C3, "F_mS": F_mS,
            "m_eff_internal": F_mS / per_M, "m_eff_external": F_mS / per_S, "m_eff": m_eff,
            "allowance": float(allowance), "m_ges": m_eff + float(allowance),
            "strips": "internal" if per_M <= per_S else "external"}
