"""Kernels of the eccentrically clamped and eccentrically loaded single-bolted joint (VDI 2230-1:2015).

Plain floats / NumPy arrays in core units (mm, N, MPa, N·mm); everything broadcasts.

Geometry and signs (VDI 2230-1:2015, Section 3.2.2 and Figure 3.2.x): a coordinate x runs across
the interface, perpendicular to the axis about which the joint bends, with its origin on the axis
of symmetry of the interface (the centroid line of the substitute deformation body). The edge at
risk of opening, point U, lies at x = u > 0. The screw axis lies at x = s_sym, the line of action
of the axial working load F_A at x = a; both are signed in the same coordinate. A load on the
opening side of the screw (a > s_sym) is the usual cover case: the housing wall pulls the cover
inside the screw line and the interface opens at the wall side.

The clamped parts are a beam of axial compliance δP (force on the symmetry axis) and bending
compliance β_P = l_K/(E_P·I_Bers). A force F on the body at x = e shortens it at x = ξ by
F·(δP + e·ξ·β_P). Compatibility of the screw with the body at x = s_sym gives the eccentric
compliances and the load factor

.. math:: \\delta_P^{*} = \\delta_P + s_{sym}^2\\,\\beta_P,\\qquad
          \\delta_P^{**} = \\delta_P + a\\,s_{sym}\\,\\beta_P,\\qquad
          \\Phi_{en}^{*} = n\\,\\frac{\\delta_P^{**}}{\\delta_S + \\delta_P^{*}}

(VDI 2230-1:2015, eqs. (5.1/..) and (5.3/..), step R3 — equation numbers from memory; the
derivation above is the guideline's own linear model and is what the tests check).

The interface pressure under the residual clamp load F_KR and the moment of the forces about
the symmetry axis is linear in x (beam theory); it reaches zero at U when

.. math:: F_{KR} = F_{Kab} = F_A\\,\\frac{(a - s_{sym})\\,u}{I_{BT}/A_D + s_{sym}\\,u}

(VDI 2230-1:2015, step R2, F_Kab, from memory), and with F_KR = F_V − (1 − Φ_en*)·F_A the
opening limit of the working load is

.. math:: F_{Aab} = \\frac{F_V}{(1 - \\Phi_{en}^{*}) + (a - s_{sym})\\,u/(I_{BT}/A_D + s_{sym}\\,u)}.

The screw is bent through the rotation of the clamped parts; before opening, its bending stress
is (VDI 2230-1:2015, 5.5.x, step R9, σ_SAb, from memory)

.. math:: \\sigma_{SAb} = \\Big[1 + \\Big(\\frac{1}{\\Phi_{en}^{*}} - \\frac{s_{sym}}{a}\\Big)
          \\frac{l_K}{l_{ers}}\\frac{E_S}{E_P}\\frac{\\pi\\,a\\,d_S^3}{8\\,I_{Bers}}\\Big]
          \\frac{\\Phi_{en}^{*}F_A}{A_S},

the axial share Φ_en*·F_A/A_S plus the bending share F_A·(a − s_sym·Φ_en*)·(l_K/l_ers)·
(E_S/E_P)·d_S/(2·I_Bers), which is how :func:`screw_stress_eccentric` writes it (finite at a = 0).
"""

from __future__ import annotations

import numpy as np

__all__ = [
    "interface_section", "substitute_inertia", "bending_compliance", "eccentric_compliances",
    "load_factor_eccentric", "clamp_to_prevent_opening", "opening_limit", "screw_bending_length",
    "screw_stress_eccentric", "tilt_direction",
]


def interface_section(b, c_T, d_h, s_sym=0.0):
    """Area and second moment of the interface strip of one screw.

    A rectangle of width ``b`` (along the bending axis) and depth ``c_T`` (across it, in the
    direction of x), less the clearance hole of diameter ``d_h`` whose axis lies at ``s_sym`` from
    the rectangle's centre line.

    .. math:: A_D = b\\,c_T - \\tfrac{\\pi}{4} d_h^2,\\qquad
              I_{BT} = \\tfrac{b\\,c_T^3}{12} - \\tfrac{\\pi d_h^4}{64} - \\tfrac{\\pi}{4} d_h^2 s_{sym}^2

    (VDI 2230-1:2015, 5.1.2.3: interface area A_D and its moment of inertia I_BT; the small shift
    of the centroid by the hole is neglected.)

    Parameters
    ----------
    b : float or ndarray — width of the interface strip along the bending axis [mm]
    c_T : float or ndarray — depth of the interface across the bending axis [mm]
    d_h : float or ndarray — clearance-hole diameter [mm]
    s_sym : float or ndarray — distance of the screw axis from the strip's centre line [mm]

    Returns
    -------
    tuple — (A_D [mm²], I_BT [mm⁴])

    >>> [round(float(v), 1) for v in interface_section(20.0, 12.0, 5.5, 0.0)]
    [216.2, 2835.1]
    """
    b, c_T, d_h, s = (np.asarray(v, float) for v in (b, c_T, d_h, s_sym))
    hole = np.pi / 4.0 * d_h ** 2
    A_D = b * c_T - hole
    I_BT = b * c_T ** 3 / 12.0 - np.pi * d_h ** 4 / 64.0 - hole * s ** 2
    return A_D, I_BT


def substitute_inertia(b, c_T):
    """Second moment I_Bers of the clamped parts' substitute body in bending.

    .. math:: I_{Bers} = \\frac{b\\,c_T^3}{12}

    The prismatic body of the interface strip, as VDI 2230-1:2015, 5.1.2.3 takes it where the
    deformation body fills the strip (the narrower cone under the head is not subtracted: a stiffer
    body, which lowers the bending share of the screw stress for a > s_sym only by the cone's share;
    the result says so).

    Parameters
    ----------
    b : float or ndarray — width of the strip along the bending axis [mm]
    c_T : float or ndarray — depth across the bending axis [mm]

    Returns
    -------
    float or ndarray — I_Bers [mm⁴]

    >>> float(substitute_inertia(20.0, 12.0))
    2880.0
    """
    return np.asarray(b, float) * np.asarray(c_T, float) ** 3 / 12.0


def bending_compliance(thickness, E, I_Bers):
    """Bending compliance β_P of a stack of clamped layers.

    .. math:: \\beta_P = \\sum_i \\frac{l_i}{E_i\\,I_{Bers}}

    (VDI 2230-1:2015, 5.1.2.3, β_P = l_K/(E_P·I_Bers), summed layer by layer.)

    Parameters
    ----------
    thickness : array_like — layer thicknesses [mm]
    E : array_like — layer moduli [MPa]
    I_Bers : float — substitute second moment [mm⁴]

    Returns
    -------
    float — β_P [1/(N·mm)]

    >>> f"{bending_compliance([8.0], [70000.0], 2880.0):.3e}"
    '3.968e-08'
    """
    t = np.asarray(thickness, float)
    e = np.asarray(E, float)
    return float(np.sum(t / e)) / float(I_Bers)


def eccentric_compliances(delta_P, beta_P, s_sym, a):
    """δP* and δP** of the eccentrically clamped, eccentrically loaded joint.

    .. math:: \\delta_P^{*} = \\delta_P + s_{sym}^2\\beta_P,\\qquad
              \\delta_P^{**} = \\delta_P + a\\,s_{sym}\\,\\beta_P

    (VDI 2230-1:2015, 5.1.2.3, from memory.)

    Parameters
    ----------
    delta_P : float or ndarray — concentric compliance of the clamped parts [mm/N]
    beta_P : float or ndarray — bending compliance [1/(N·mm)]
    s_sym : float or ndarray — screw axis from the symmetry axis [mm]
    a : float or ndarray — load line from the symmetry axis [mm]

    Returns
    -------
    tuple — (δP* [mm/N], δP** [mm/N])

    >>> [f"{v:.3e}" for v in eccentric_compliances(2e-6, 4e-8, 3.0, 6.0)]
    ['2.360e-06', '2.720e-06']
    """
    dP, bP, s, a = (np.asarray(v, float) for v in (delta_P, beta_P, s_sym, a))
    return dP + s * s * bP, dP + a * s * bP


def load_factor_eccentric(n, delta_S, delta_P, beta_P, s_sym, a):
    """Load factor Φ_en* of the eccentrically clamped and loaded joint.

    .. math:: \\Phi_{en}^{*} = n\\,\\frac{\\delta_P + a\\,s_{sym}\\,\\beta_P}
                                      {\\delta_S + \\delta_P + s_{sym}^2\\,\\beta_P}

    (VDI 2230-1:2015, 5.3.1, step R3, from memory; with s_sym = a = 0 it is the concentric
    Φ_n = n·δP/(δS + δP).)

    Parameters
    ----------
    n : float or ndarray — load introduction factor [-]
    delta_S : float or ndarray — screw compliance [mm/N]
    delta_P : float or ndarray — concentric clamped-part compliance [mm/N]
    beta_P : float or ndarray — bending compliance of the clamped parts [1/(N·mm)]
    s_sym : float or ndarray — screw axis from the symmetry axis [mm]
    a : float or ndarray — load line from the symmetry axis [mm]

    Returns
    -------
    float or ndarray — Φ_en* [-]

    >>> round(float(load_factor_eccentric(0.5, 1e-6, 2e-6, 4e-8, 3.0, 6.0)), 4)
    0.4048
    """
    dps, dpss = eccentric_compliances(delta_P, beta_P, s_sym, a)
    return np.asarray(n, float) * dpss / (np.asarray(delta_S, float) + dps)


def clamp_to_prevent_opening(F_A, a, s_sym, u, A_D, I_BT, M_B=0.0):
    """Least residual clamp load F_Kab that keeps the interface closed at the edge U.

    .. math:: F_{Kab} = F_A\\,\\frac{(a - s_{sym})\\,u}{I_{BT}/A_D + s_{sym}\\,u}
                        + M_B\\,\\frac{u\\,A_D}{I_{BT} + s_{sym}\\,u\\,A_D}

    (VDI 2230-1:2015, step R2, from memory; the linear interface pressure of beam theory set to
    zero at U.) Negative values mean the load presses U shut; they are returned as they are.

    Parameters
    ----------
    F_A : float or ndarray — axial working load of the screw [N]
    a, s_sym, u : float or ndarray — load line, screw axis and opening edge from the symmetry axis [mm]
    A_D : float or ndarray — interface area [mm²]
    I_BT : float or ndarray — interface second moment [mm⁴]
    M_B : float or ndarray — working bending moment at the interface (opening U positive) [N·mm]

    Returns
    -------
    float or ndarray — F_Kab [N]

    >>> round(float(clamp_to_prevent_opening(1000.0, 6.0, 0.0, 10.0, 200.0, 2400.0)), 1)
    5000.0
    """
    F_A, a, s, u, A, Ib, M = (np.asarray(v, float) for v in (F_A, a, s_sym, u, A_D, I_BT, M_B))
    return F_A * (a - s) * u / (Ib / A + s * u) + M * u * A / (Ib + s * u * A)


def opening_limit(F_V, phi_en, a, s_sym, u, A_D, I_BT):
    """Working load F_Aab at which the interface starts to open at the edge U.

    Setting the residual clamp load F_V − (1 − Φ_en*)·F_A equal to F_Kab(F_A):

    .. math:: F_{Aab} = \\frac{F_V}{(1 - \\Phi_{en}^{*}) + (a - s_{sym})\\,u/(I_{BT}/A_D + s_{sym}\\,u)}

    (VDI 2230-1:2015, 3.2.3 and step R2, from memory.) With a = s_sym it is the separation limit
    F_V/(1 − Φ) of the concentric joint.

    Parameters
    ----------
    F_V : float or ndarray — preload in service [N]
    phi_en : float or ndarray — load factor Φ_en* [-]
    a, s_sym, u : float or ndarray — load line, screw axis, opening edge from the symmetry axis [mm]
    A_D : float or ndarray — interface area [mm²]
    I_BT : float or ndarray — interface second moment [mm⁴]

    Returns
    -------
    float or ndarray — F_Aab [N] (inf where the load never opens U)

    >>> round(float(opening_limit(6000.0, 0.2, 6.0, 0.0, 10.0, 200.0, 2400.0)), 1)
    1034.5
    """
    F_V, phi, a, s, u, A, Ib = (np.asarray(v, float) for v in (F_V, phi_en, a, s_sym, u, A_D, I_BT))
    k = (1.0 - phi) + (a - s) * u / (Ib / A + s * u)
    with np.errstate(divide="ignore"):
        return np.where(k > 0, F_V / np.where(k > 0, k, 1.0), np.inf)


def screw_bending_length(lengths, diameters, d_ref):
    """Substitute bending length l_ers of the screw.

    The bending compliance of the screw's elements in series, referred to the cross-section of
    diameter ``d_ref``:

    .. math:: \\frac{l_{ers}}{I_{ers}} = \\sum_i \\frac{l_i}{I_i},\\qquad I = \\frac{\\pi d^4}{64}
              \\;\\Rightarrow\\; l_{ers} = \\sum_i l_i\\,(d_{ref}/d_i)^4

    (VDI 2230-1:2015, 5.1.1.2, bending compliance of the screw, from memory; the same elastic
    lengths as the axial compliance of 5.1.1.1.)

    Parameters
    ----------
    lengths : array_like — elastic lengths of the elements [mm]
    diameters : array_like — their diameters [mm]
    d_ref : float — reference diameter (the stress diameter d_S) [mm]

    Returns
    -------
    float — l_ers [mm]

    >>> round(screw_bending_length([3.0, 8.0, 3.0], [6.0, 4.77, 6.0], 5.06), 2)
    13.17
    """
    ln = np.asarray(lengths, float)
    dn = np.asarray(diameters, float)
    return float(np.sum(ln * (float(d_ref) / dn) ** 4))


def screw_stress_eccentric(F_A, phi_en, a, s_sym, l_K, l_ers, E_S, E_P, d_S, I_Bers):
    """Axial plus bending stress added to the screw by the working load (joint still closed).

    .. math:: \\sigma_{SAb} = \\frac{\\Phi_{en}^{*}F_A}{A_S}
              + F_A\\,(a - s_{sym}\\Phi_{en}^{*})\\,\\frac{l_K}{l_{ers}}\\frac{E_S}{E_P}
                \\frac{d_S}{2\\,I_{Bers}},\\qquad A_S = \\tfrac{\\pi}{4}d_S^2

    identical to VDI 2230-1:2015's σ_SAb (step R9, from memory) after multiplying out; the second
    term is the screw bent through the clamped parts' rotation over its bending length.

    Parameters
    ----------
    F_A : float or ndarray — axial working load [N]
    phi_en : float or ndarray — load factor Φ_en* [-]
    a, s_sym : float or ndarray — load line and screw axis from the symmetry axis [mm]
    l_K : float — clamp length [mm]
    l_ers : float — substitute bending length of the screw [mm]
    E_S, E_P : float — moduli of screw and clamped parts [MPa]
    d_S : float — stress diameter [mm]
    I_Bers : float — substitute second moment of the clamped parts [mm⁴]

    Returns
    -------
    tuple — (axial share [MPa], bending share [MPa]); σ_SAb is their sum

    >>> [round(float(v), 2) for v in screw_stress_eccentric(1000.0, 0.25, 6.0, 0.0, 8.0, 11.0,
    ...                                                     205000.0, 70000.0, 5.06, 2880.0)]
    [12.43, 11.23]
    """
    F_A, phi, a, s = (np.asarray(v, float) for v in (F_A, phi_en, a, s_sym))
    A_S = np.pi / 4.0 * float(d_S) ** 2
    axial = phi * F_A / A_S
    bend = F_A * (a - s * phi) * (l_K / l_ers) * (E_S / E_P) * float(d_S) / (2.0 * I_Bers)
    return axial, np.abs(bend)


def tilt_direction(x, y, M_tilt, n_dir=360):
    """Which screw a tilting moment loads most, and the direction of its edge.

    The same rigid-flange distribution as :func:`fitcheck.core.vdi2230.pattern_loads`
    (F_i = M·u_i/Σu², worst tilting axis through the centroid). Returns the index of the most
    loaded screw and the angle [deg] of its position seen from the centroid: the interface opens
    first on that side (VDI 2230-1:2015, Section 3, rigid-flange simplification).

    Parameters
    ----------
    x, y : ndarray — screw positions [mm]
    M_tilt : float — tilting moment [N·mm]
    n_dir : int — number of axis directions tried

    Returns
    -------
    tuple — (index, angle [deg])

    >>> tilt_direction(np.array([40.0, 0.0, -40.0, 0.0]), np.array([0.0, 40.0, 0.0, -40.0]), 1e5)
    (0, 0.0)
    """
    x = np.asarray(x, float)
    y = np.asarray(y, float)
    xc, yc = x - x.mean(), y - y.mean()
    th = np.linspace(0.0, np.pi, n_dir, endpoint=False)[:, None]
    u = xc[None, :] * np.cos(th) + yc[None, :] * np.sin(th)
    su2 = np.sum(u * u, axis=1, keepdims=True)
    with np.errstate(invalid="ignore", divide="ignore"):
        share = np.where(su2 > 1e-12, abs(M_tilt) * u / su2, 0.0)
    k = int(np.argmax(share))
    i = int(np.unravel_index(k, share.shape)[1])
    ang = float(np.degrees(np.arctan2(yc[i], xc[i]))) % 360.0
    return i, round(ang, 6)
