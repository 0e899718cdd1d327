r"""Fatigue and static strength of a shaft at a press-fitted seat after DIN 743:2012 (vectorised).

Pure functions on floats or NumPy arrays in core units (mm, MPa, µm for roughness);
they broadcast against each other and never branch on array values.

The chain for one seat (:func:`press_fit_seat` runs all of it):

1. material strengths at the reference diameter d_B (DIN 743-3:2012: from the table, or the
   standard's ratios σ_zdW = 0.4·σ_B, σ_bW = 0.5·σ_B, τ_tW = 0.3·σ_B);
2. technological size factor K1(d_eff) for tensile and yield strength (DIN 743-2:2012);
3. notch factors of a press fit βσ, βτ at d_BK = 40 mm as functions of σ_B(d), converted to
   the seat diameter with K3 (DIN 743-2:2012, Table A.1 and eq. for β(d));
4. geometric size factor K2(d), roughness factor K_F, surface-hardening factor K_V and the
   total factors Kσ, Kτ (DIN 743-2:2012);
5. component fatigue limits σ_WK = σ_W(d_B)·K1(d_eff)/Kσ and the mean-stress sensitivity
   ψ_σK (DIN 743-1:2012);
6. equivalent mean stresses σ_mv, τ_mv and the amplitude strengths σ_ADK for constant
   mean stress (case 1) or a constant ratio of mean to amplitude (case 2) (DIN 743-1:2012);
7. safety against fatigue and safety against yield (static) (DIN 743-1:2012).

Clause numbers are given as we recall them from the 2012 edition; every value typed
from recollection rather than read from a copy at hand says ``from memory``.

References
----------
DIN 743-1:2012-12, Tragfähigkeitsberechnung von Wellen und Achsen — Teil 1: Grundlagen
(fatigue safety, equivalent mean stress, ψ, static safety).
DIN 743-2:2012-12, Teil 2: Formzahlen und Kerbwirkungszahlen (notch factors of press fits,
K1, K2, K3, K_F, K_V).
DIN 743-3:2012-12, Teil 3: Werkstoff-Festigkeitswerte (σ_B, σ_S, σ_zdW, σ_bW, τ_tW at d_B).
"""

from __future__ import annotations

import functools
import math

import numpy as np

from ..errors import InputError, did_you_mean
from . import blocks as _blocks
from .blocks import in_blocks

__all__ = [
    "D_BK", "K1_GROUPS", "RATIO_SIGMA_ZDW", "RATIO_SIGMA_BW", "RATIO_TAU_TW",
    "k1", "k2", "k3", "press_fit_notch_factors", "roughness_factors", "total_factor",
    "psi", "equivalent_mean_stress", "stress_ratio_term", "fatigue_safety", "static_safety",
    "nominal_stresses", "press_fit_seat", "validity", "OUTPUTS", "SAFETIES_AND_NOTCH_FACTORS",
]

#: Joints per block of work in :func:`press_fit_seat` (see :mod:`fitcheck.core.blocks`)
CHUNK = _blocks.CHUNK
#: Reference diameter of the tabulated notch factors of press fits [mm] (DIN 743-2:2012); the tests
#: behind them used D_F = 40 mm joints: FKM report 325 (2015, project 294 II), abstract
D_BK = 40.0
#: DIN 743-3:2012 ratios of the fatigue strengths to σ_B(d_B) for steels (from memory)
RATIO_SIGMA_ZDW = 0.4
RATIO_SIGMA_BW = 0.5
RATIO_TAU_TW = 0.3

#: K1(d_eff) groups of DIN 743-2:2012 (technological size factor; all from memory):
#: name → (d_B [mm], slope for σ_B, slope for σ_S, d_eff where the slope ends [mm], d_eff
#: where it starts [mm]). K1 = 1 up to the start, 1 − slope·lg(d_eff/start) up to the end,
#: constant beyond.
K1_GROUPS: dict[str, tuple[float, float, float, float, float]] = {
    # quenched-and-tempered (Vergütungsstähle), nitriding steels: d_B = 16 mm, down to 0.67 (σ_B) at 300 mm
    "QT": (16.0, 0.26, 0.34, 300.0, 16.0),
    # case-hardening steels (Einsatzstähle), core strength: d_B = 16 mm, down to 0.6 at 150 mm
    "case": (16.0, 0.41, 0.41, 150.0, 16.0),
    # structural steels (Baustähle): constant up to 100 mm, 0.89 at 300 mm
    "structural": (16.0, 0.23, 0.23, 300.0, 100.0),
}


def _lg(x):
    return np.log10(x)


def k1(d_eff, group: str = "QT", strength: str = "tensile"):
    r"""Technological size factor K1(d_eff) of DIN 743-2:2012 for σ_B or σ_S.

    Parameters
    ----------
    d_eff : float or ndarray
        Diameter of the part at heat treatment (the raw bar), here usually the seat
        diameter [mm]
    group : str
        ``"QT"`` (quenched and tempered, nitriding steels), ``"case"`` (case-hardening
        steels, core) or ``"structural"`` (structural steels)
    strength : str
        ``"tensile"`` (for σ_B and the fatigue strengths) or ``"yield"`` (for σ_S)

    Returns
    -------
    ndarray
        K1 [-], continuous and non-increasing in d_eff.

    Notes
    -----
    .. math:: K_1 = 1 - a\,\lg(d_{eff}/d_0)\quad (d_0 < d_{eff} \le d_1),

    1 below d_0 and K1(d_1) above d_1. QT: a = 0.26 (σ_B), 0.34 (σ_S), d_0 = d_B = 16 mm,
    d_1 = 300 mm (K1 = 0.67 for σ_B there); case-hardening: a = 0.41 up to 150 mm (0.60);
    structural: a = 0.23 from 100 to 300 mm (0.89) — all from memory.

    Examples
    --------
    >>> float(k1(16.0)), round(float(k1(300.0)), 3), round(float(k1(400.0)), 3)
    (1.0, 0.669, 0.669)

    References
    ----------
    DIN 743-2:2012, technological size influence K1(d_eff) (equations and table for the
    steel groups) — from memory.
    """
    try:
        _, a_t, a_y, d1, d0 = K1_GROUPS[group]
    except KeyError:
        raise ValueError(f"K1 group {group!r}; allowed: {', '.join(K1_GROUPS)}") from None
    a = a_t if strength == "tensile" else a_y
    d = np.clip(np.asarray(d_eff, dtype=float), d0, d1)
    return 1.0 - a * _lg(d / d0)


def k2(d, tension: bool = False):
    r"""Geometric size factor K2(d) of DIN 743-2:2012 (bending and torsion; 1 in tension).

    Parameters
    ----------
    d : float or ndarray
        Shaft diameter at the notch [mm]
    tension : bool
        True for tension/compression (K2 = 1)

    Notes
    -----
    .. math:: K_2(d) = 1 - 0.2\,\frac{\lg(d/7.5\,\mathrm{mm})}{\lg 20},\qquad 7.5 \le d < 150\ \mathrm{mm}

    1 below 7.5 mm and 0.8 from 150 mm on (from memory).

    Examples
    --------
    >>> float(k2(7.5)), round(float(k2(40.0)), 4), float(k2(150.0)), float(k2(40.0, tension=True))
    (1.0, 0.8882, 0.8, 1.0)

    References
    ----------
    DIN 743-2:2012, geometric size influence factor K2(d) — from memory.
    """
    dd = np.clip(np.asarray(d, dtype=float), 7.5, 150.0)
    out = 1.0 - 0.2 * _lg(dd / 7.5) / _lg(20.0)
    return np.ones_like(out) if tension else out


def k3(d, alpha):
    r"""Geometric size factor K3(d) of DIN 743-2:2012 for converting notch factors.

    Parameters
    ----------
    d : float or ndarray
        Diameter [mm]
    alpha : float or ndarray
        Stress concentration factor α (for the tabulated notch factors of press fits and
        keys the standard puts β(d_BK) in its place) [-]

    Notes
    -----
    .. math:: K_3(d) = 1 - 0.2\,\lg\alpha\,\frac{\lg(d/7.5\,\mathrm{mm})}{\lg 20},\qquad 7.5 \le d < 150\ \mathrm{mm}

    1 below 7.5 mm, the 150 mm value above (from memory).

    Examples
    --------
    >>> round(float(k3(40.0, 2.7)), 4)
    0.9518

    References
    ----------
    DIN 743-2:2012, K3 and β(d) = β(d_BK)·K3(d_BK)/K3(d) — from memory.
    """
    dd = np.clip(np.asarray(d, dtype=float), 7.5, 150.0)
    return 1.0 - 0.2 * _lg(np.asarray(alpha, dtype=float)) * _lg(dd / 7.5) / _lg(20.0)


def press_fit_notch_factors(d, sigma_B_d):
    r"""Notch factors βσ, βτ of a shaft under a press-fitted hub, at the seat diameter.

    Parameters
    ----------
    d : float or ndarray
        Seat diameter [mm]
    sigma_B_d : float or ndarray
        Tensile strength of the shaft at its size, σ_B(d) = K1(d_eff)·σ_B(d_B) [MPa]

    Returns
    -------
    beta_sigma, beta_tau : ndarray
        Notch factors for bending (and tension) and for torsion at diameter d [-].

    Notes
    -----
    At the reference diameter d_BK = 40 mm (DIN 743-2:2012, table of notch factors of
    shaft-hub joints, press fit):

    .. math:: \beta_\sigma(d_{BK}) = 2.7\,(\sigma_B(d)/1000\ \mathrm{MPa})^{0.43},\qquad
              \beta_\tau(d_{BK}) = 0.65\,\beta_\sigma(d_{BK})

    and at the seat diameter β(d) = β(d_BK)·K3(d_BK)/K3(d), with β(d_BK) in place of α in K3.
    The values hold for a conventional press fit, the hub flush with the shaft step (or on a
    plain shaft); relief grooves, a hub overhanging the seat or a softened hub edge lower the
    notch, and the standard's notes on these are not modelled (from memory).

    Examples
    --------
    >>> bs, bt = press_fit_notch_factors(40.0, 1000.0)
    >>> round(float(bs), 3), round(float(bt), 3)
    (2.7, 1.755)

    References
    ----------
    DIN 743-2:2012, table of experimentally determined notch factors (press fit, d_BK = 40 mm)
    and the conversion to other diameters with K3 — from memory.
    """
    bs_bk = 2.7 * (np.asarray(sigma_B_d, dtype=float) / 1000.0) ** 0.43
    bt_bk = 0.65 * bs_bk
    bs = bs_bk * k3(D_BK, bs_bk) / k3(d, bs_bk)
    bt = bt_bk * k3(D_BK, bt_bk) / k3(d, bt_bk)
    return bs, bt


def roughness_factors(rz_um, sigma_B_d):
    r"""Surface-roughness factors K_Fσ and K_Fτ of DIN 743-2:2012.

    Parameters
    ----------
    rz_um : float or ndarray
        Mean roughness depth Rz of the shaft surface [µm] (values below 1 µm count as 1 µm)
    sigma_B_d : float or ndarray
        Tensile strength at the shaft's size σ_B(d) [MPa]

    Notes
    -----
    .. math:: K_{F\sigma} = 1 - 0.22\,\lg(R_z/\mu\mathrm{m})\,\left(\lg\frac{\sigma_B(d)}{20\ \mathrm{MPa}} - 1\right),
              \qquad K_{F\tau} = 0.575\,K_{F\sigma} + 0.425

    (DIN 743 form from memory.) K_Fσ is the same function as the FKM guideline's roughness
    factor K_R,σ = 1 − a_R,σ·lg Rz·lg(2·R_m/R_m,N,min) with the published steel constants
    a_R,σ = 0.22, R_m,N,min = 400 MPa (FKM guideline, Analytical strength assessment); checked in
    tests/validation/test_din743_published.py.

    Examples
    --------
    >>> kfs, kft = roughness_factors(1.0, 700.0)
    >>> float(kfs), float(kft)
    (1.0, 1.0)

    References
    ----------
    DIN 743-2:2012, influence factor of the surface roughness — from memory.
    """
    rz = np.maximum(np.asarray(rz_um, dtype=float), 1.0)
    kfs = 1.0 - 0.22 * _lg(rz) * (_lg(np.asarray(sigma_B_d, dtype=float) / 20.0) - 1.0)
    return kfs, 0.575 * kfs + 0.425


def total_factor(beta, k2_d, k_f, k_v=1.0):
    r"""Total influence factor K = (β/K2(d) + 1/K_F − 1)/K_V of DIN 743-2:2012 (Kσ or Kτ).

    Examples
    --------
    >>> float(total_factor(2.0, 1.0, 1.0))
    2.0

    References
    ----------
    DIN 743-2:2012, total influence factor (equation for Kσ, Kτ) — from memory.
    """
    return (np.asarray(beta, dtype=float) / k2_d + 1.0 / np.asarray(k_f, dtype=float) - 1.0) / k_v


def psi(strength_wk, k1_d, sigma_B_dB):
    r"""Mean-stress sensitivity ψ_K = σ_WK/(2·K1(d_eff)·σ_B(d_B) − σ_WK) of DIN 743-1:2012.

    Examples
    --------
    >>> round(float(psi(200.0, 1.0, 700.0)), 4)
    0.1667

    References
    ----------
    DIN 743-1:2012, influence of the mean stress (ψ_σK, ψ_τK) — from memory.
    """
    return strength_wk / (2.0 * k1_d * sigma_B_dB - strength_wk)


def equivalent_mean_stress(sigma_zdm, sigma_bm, tau_tm):
    r"""Equivalent mean stresses σ_mv = √((σ_zdm + σ_bm)² + 3·τ_tm²), τ_mv = σ_mv/√3 (DIN 743-1:2012).

    Examples
    --------
    >>> sm, tm = equivalent_mean_stress(0.0, 0.0, 10.0)
    >>> round(float(sm), 4), round(float(tm), 4)
    (17.3205, 10.0)

    References
    ----------
    DIN 743-1:2012, equivalent mean stresses — from memory.
    """
    s = np.asarray(sigma_zdm, dtype=float) + sigma_bm
    smv = np.sqrt(s * s + 3.0 * np.asarray(tau_tm, dtype=float) ** 2)
    return smv, smv / np.sqrt(3.0)


def stress_ratio_term(amplitude, mean_v, strength_wk, strength_fk, psi_k, case: int = 2):
    r"""σ_a/σ_ADK: amplitude over the component's amplitude strength at its mean stress.

    Parameters
    ----------
    amplitude : float or ndarray
        Stress amplitude σ_a (or τ_a) [MPa]
    mean_v : float or ndarray
        Equivalent mean stress σ_mv (or τ_mv) [MPa]
    strength_wk, strength_fk : float or ndarray
        Component fatigue limit σ_WK and component yield strength σ_FK [MPa]
    psi_k : float or ndarray
        Mean-stress sensitivity ψ_K [-]
    case : int
        1: the mean stress stays constant when the load grows; 2 (default, the more
        conservative): mean and amplitude grow in proportion.

    Notes
    -----
    Case 2: σ_ADK = min(σ_WK/(1 + ψ·σ_mv/σ_a), σ_FK/(1 + σ_mv/σ_a)), hence

    .. math:: \sigma_a/\sigma_{ADK} = \max\left(\frac{\sigma_a + \psi\,\sigma_{mv}}{\sigma_{WK}},
              \frac{\sigma_a + \sigma_{mv}}{\sigma_{FK}}\right)

    Case 1: σ_ADK = min(σ_WK − ψ·σ_mv, σ_FK − σ_mv). A zero amplitude gives 0
    (that stress then adds nothing to the fatigue safety). No division by zero.

    References
    ----------
    DIN 743-1:2012, amplitude strength σ_ADK for case 1 and case 2 — from memory.
    """
    a = np.asarray(amplitude, dtype=float)
    m = np.asarray(mean_v, dtype=float)
    if case == 2:
        t = np.maximum((a + psi_k * m) / strength_wk, (a + m) / strength_fk)
    elif case == 1:
        adk = np.minimum(strength_wk - psi_k * m, strength_fk - m)
        with np.errstate(divide="ignore", invalid="ignore"):
            t = np.where(adk > 0, a / np.where(adk > 0, adk, 1.0), np.inf)
    else:
        raise ValueError(f"mean-stress case {case!r}; allowed: 1 or 2")
    return np.where(a > 0, t, 0.0)


def fatigue_safety(term_zd, term_b, term_t):
    r"""Safety against fatigue S = 1/√((σ_zda/σ_zdADK + σ_ba/σ_bADK)² + (τ_ta/τ_tADK)²).

    The terms are :func:`stress_ratio_term` values; no load gives ``inf``.

    Examples
    --------
    >>> float(fatigue_safety(0.0, 0.5, 0.0))
    2.0

    References
    ----------
    DIN 743-1:2012, safety against fatigue (equation of S) — from memory.
    """
    s = np.asarray(term_zd, dtype=float) + term_b
    t = np.asarray(term_t, dtype=float)
    with np.errstate(divide="ignore"):
        return 1.0 / np.sqrt(s * s + t * t)  # 1/0 = inf: no load


def static_safety(sigma_zd_max, sigma_b_max, tau_t_max, sigma_zdFK, sigma_bFK, tau_tFK):
    r"""Safety against yield S = 1/√((σ_zdmax/σ_zdFK + σ_bmax/σ_bFK)² + (τ_tmax/τ_tFK)²).

    Examples
    --------
    >>> float(static_safety(0.0, 100.0, 0.0, 600.0, 600.0, 346.0))
    6.0

    References
    ----------
    DIN 743-1:2012, safety against permanent deformation (static proof) — from memory.
    """
    return fatigue_safety(np.asarray(sigma_zd_max, dtype=float) / sigma_zdFK,
                          np.asarray(sigma_b_max, dtype=float) / sigma_bFK,
                          np.asarray(tau_t_max, dtype=float) / tau_tFK)


def nominal_stresses(d, di, moment, torque, axial_force):
    r"""Nominal bending, torsion and axial stresses of a solid or hollow round shaft.

    Parameters
    ----------
    d, di : float or ndarray
        Outer diameter and bore (0 = solid) [mm]
    moment, torque : float or ndarray
        Bending moment and torque [N·mm]
    axial_force : float or ndarray
        [N]

    Returns
    -------
    sigma_b, tau_t, sigma_zd : ndarray
        [MPa]: M/W_b with W_b = π(d⁴ − di⁴)/(32 d), T/W_t with W_t = 2 W_b, F/A.

    Examples
    --------
    >>> sb, tt, sz = nominal_stresses(20.0, 0.0, 10000.0, 10000.0, 1000.0)
    >>> round(float(sb), 3), round(float(tt), 3), round(float(sz), 3)
    (12.732, 6.366, 3.183)

    References
    ----------
    DIN 743-1:2012, nominal stresses (W_b, W_t of round sections); Shigley, 10th ed., eqs. (3-26), (3-37).
    """
    d = np.asarray(d, dtype=float)
    di = np.asarray(di, dtype=float)
    wb = np.pi * (d**4 - di**4) / (32.0 * d)
    area = np.pi * (d * d - di * di) / 4.0
    return (np.asarray(moment, dtype=float) / wb, np.asarray(torque, dtype=float) / (2.0 * wb),
            np.asarray(axial_force, dtype=float) / area)


def validity(d, sigma_B_dB, temperature=20.0):
    """Flags of the standard's range of validity (True = outside).

    Returns a dict of boolean arrays: ``diameter`` (notch-factor size conversion defined
    from 7.5 to 150 mm), ``strength`` (press-fit notch factors from tests on steels of
    σ_B about 400 … 1200 MPa) — both from memory — and ``temperature`` (DIN 743 scope
    −40 … +150 °C, as stated for DIN 743:2000 in lecture notes "Maschinenelemente — Wellen",
    Festigkeitsnachweis, inggo.com teachnet; unchanged in 2012 — from memory).

    >>> {k: bool(v) for k, v in validity(20.0, 700.0).items()}
    {'diameter': False, 'strength': False, 'temperature': False}
    """
    d = np.asarray(d, dtype=float)
    s = np.asarray(sigma_B_dB, dtype=float)
    t = np.asarray(temperature, dtype=float)
    return {"diameter": (d < 7.5) | (d > 150.0), "strength": (s < 400.0) | (s > 1200.0),
            "temperature": (t < -40.0) | (t > 150.0)}


#: The results of :func:`press_fit_seat`, in the order of the chain
OUTPUTS = (
    "K1", "K1_yield", "sigma_B_d", "beta_sigma", "beta_tau", "K2", "KF_sigma", "KF_tau",
    "K_sigma_b", "K_sigma_zd", "K_tau", "sigma_bWK", "sigma_zdWK", "tau_tWK", "psi_b", "psi_zd", "psi_t",
    "sigma_ba", "tau_ta", "tau_tm", "sigma_zdm", "sigma_mv", "tau_mv", "sigma_bFK", "sigma_zdFK", "tau_tFK",
    "fatigue_safety", "static_safety",
)
#: The outputs a vectorised consumer (a tolerance study, a search) reads: both safeties and both
#: notch factors; ``press_fit_seat(..., outputs=SAFETIES_AND_NOTCH_FACTORS)``
SAFETIES_AND_NOTCH_FACTORS = ("fatigue_safety", "static_safety", "beta_sigma", "beta_tau")

# the steps of _seat each output needs: k1 = K1, σ_B(d); k1y = K1 for σ_S and the component yield
# strengths; notch = βσ, βτ, K2; rough = K_F; b, zd, t = total factor, σ_WK and ψ of bending,
# tension-compression and torsion; wb = A and 1/W_b; stress = nominal and equivalent mean stresses
_K, _B, _T = {"k1", "notch", "rough"}, {"b"}, {"t"}
_STEPS: dict[str, frozenset] = {k: frozenset(v) for k, v in {
    "K1": {"k1"}, "sigma_B_d": {"k1"}, "K1_yield": {"k1y"},
    "beta_sigma": {"k1", "notch"}, "beta_tau": {"k1", "notch"}, "K2": {"k1", "notch"},
    "KF_sigma": {"k1", "rough"}, "KF_tau": {"k1", "rough"},
    **dict.fromkeys(("K_sigma_b", "sigma_bWK", "psi_b"), _K | _B),
    **dict.fromkeys(("K_sigma_zd", "sigma_zdWK", "psi_zd"), _K | {"zd"}),
    **dict.fromkeys(("K_tau", "tau_tWK", "psi_t"), _K | _T),
    **dict.fromkeys(("sigma_ba", "tau_ta", "tau_tm", "sigma_zdm", "sigma_mv", "tau_mv"), {"wb", "stress"}),
    **dict.fromkeys(("sigma_bFK", "sigma_zdFK", "tau_tFK"), {"k1y"}),
    "fatigue_safety": _K | _B | _T | {"k1y", "wb", "stress", "fatigue"},
    "static_safety": {"k1y", "wb", "static"},
}.items()}
_ALL_STEPS = frozenset().union(*_STEPS.values())


def press_fit_seat(*, d, di=0.0, sigma_B_dB, sigma_S_dB, sigma_zdW_dB=None, sigma_bW_dB=None,
                   tau_tW_dB=None, group="QT", d_B=16.0, d_eff=None, rz_um=1.0, k_v=1.0,
                   moment_amplitude=0.0, torque_mean=0.0, torque_amplitude=0.0, axial_mean=0.0,
                   moment_max=None, torque_max=None, axial_max=None, mean_stress_case=2, outputs=None):
    r"""The whole DIN 743 chain for the shaft at the edge of a press-fitted hub (vectorised).

    Parameters
    ----------
    d, di : float or ndarray
        Seat diameter and shaft bore (0 = solid) [mm]
    sigma_B_dB, sigma_S_dB : float or ndarray
        Tensile and yield strength at the reference diameter d_B [MPa]
    sigma_zdW_dB, sigma_bW_dB, tau_tW_dB : float or ndarray, optional
        Fatigue strengths at d_B (tension-compression, bending, torsion) [MPa];
        ``None``: DIN 743-3 ratios 0.4, 0.5, 0.3 of σ_B(d_B)
    group : str
        K1 group, see :func:`k1`
    d_B : float
        Diameter at which the strengths are given [mm] (16 mm in DIN 743-3 for most steels);
        σ_B(d) = σ_B(d_B)·K1(d_eff)/K1(d_B)
    d_eff : float or ndarray, optional
        Diameter at heat treatment [mm]; ``None`` = d
    rz_um : float or ndarray
        Roughness Rz of the shaft at the seat [µm]
    k_v : float or ndarray
        Surface-hardening factor K_V [-] (1 = none)
    moment_amplitude : float or ndarray
        Rotating bending moment (fully reversed in the shaft) [N·mm]
    torque_mean, torque_amplitude : float or ndarray
        Mean and amplitude of the torque [N·mm]
    axial_mean : float or ndarray
        Static axial force (its stress counts as a tensile mean stress) [N]
    moment_max, torque_max, axial_max : float or ndarray, optional
        Largest loads for the static proof; ``None``: amplitude + mean
    mean_stress_case : int
        1 or 2, see :func:`stress_ratio_term`
    outputs : str or sequence of str, optional
        The results to compute, by name (see Returns; :data:`OUTPUTS` lists them all); ``None``
        (default): all. Only these are materialised, and steps of the chain that feed none of them
        are skipped: for long arrays :data:`SAFETIES_AND_NOTCH_FACTORS` (what a tolerance study
        or a search reads) costs markedly less than all 28. The values are those of the full run,
        bit for bit. An unknown name raises :class:`fitcheck.errors.InputError`.

    Returns
    -------
    dict of ndarray
        ``K1``, ``K1_yield``, ``sigma_B_d``, ``beta_sigma``, ``beta_tau``, ``K2``, ``KF_sigma``,
        ``KF_tau``, ``K_sigma_b``, ``K_sigma_zd``, ``K_tau``, ``sigma_bWK``, ``sigma_zdWK``,
        ``tau_tWK``, ``psi_b``, ``psi_zd``, ``psi_t``, ``sigma_ba``, ``tau_ta``, ``tau_tm``,
        ``sigma_zdm``, ``sigma_mv``, ``tau_mv``, ``sigma_bFK``, ``sigma_zdFK``, ``tau_tFK``,
        ``fatigue_safety``, ``static_safety`` (stresses [MPa], factors [-]), or those of them
        named in ``outputs`` (in this order). A result that depends on an array input has the
        broadcast shape of all array inputs; one that depends on scalars only is a scalar.

    Notes
    -----
    Component yield strengths σ_bFK = K1·K2F·γF·σ_S(d_B), τ_tFK = σ_bFK/√3 with K2F = 1.2
    (solid shaft; 1.0 for a hollow shaft, the conservative end) and γF = 1 (a press fit is
    not one of the standard's circumferential grooves; conservative); σ_zdFK with K2F = 1.

    Examples
    --------
    >>> r = press_fit_seat(d=40.0, sigma_B_dB=1000.0, sigma_S_dB=800.0, group="QT", d_eff=16.0,
    ...                    moment_amplitude=100_000.0)
    >>> round(float(r["beta_sigma"]), 3)
    2.7
    >>> r = press_fit_seat(d=40.0, sigma_B_dB=1000.0, sigma_S_dB=800.0, group="QT", d_eff=16.0,
    ...                    moment_amplitude=100_000.0, outputs=("fatigue_safety", "beta_sigma"))
    >>> list(r), round(float(r["beta_sigma"]), 3)
    (['beta_sigma', 'fatigue_safety'], 2.7)

    References
    ----------
    DIN 743-1/-2/-3:2012 (see the module docstring) — from memory.
    """
    want = _wanted(outputs)
    steps = frozenset().union(*(_STEPS[k] for k in want))
    kw = dict(d=d, di=di, sigma_B_dB=sigma_B_dB, sigma_S_dB=sigma_S_dB, sigma_zdW_dB=sigma_zdW_dB,
              sigma_bW_dB=sigma_bW_dB, tau_tW_dB=tau_tW_dB, d_B=d_B, d_eff=d_eff, rz_um=rz_um, k_v=k_v,
              moment_amplitude=moment_amplitude, torque_mean=torque_mean,
              torque_amplitude=torque_amplitude, axial_mean=axial_mean, moment_max=moment_max,
              torque_max=torque_max, axial_max=axial_max)
    arrays = {k: v for k, v in kw.items() if v is not None and np.ndim(v) > 0}
    if len({np.shape(v) for v in arrays.values()}) > 1:
        # array inputs of different shapes: one broadcast shape for all (views), as the blocks have;
        # the chain works in place on its intermediate arrays
        kw.update(zip(arrays, np.broadcast_arrays(*arrays.values()), strict=True))
    # long arrays in cache-sized blocks (fitcheck.core.blocks): the same numbers, less memory traffic
    return in_blocks(functools.partial(_seat, group=group, mean_stress_case=mean_stress_case, want=want,
                                       steps=steps), kw, CHUNK, full_outputs=False, direct=True)


def _wanted(outputs) -> tuple:
    """The names in ``outputs`` (``None``: all), checked, once each, in the order of :data:`OUTPUTS`."""
    if outputs is None:
        return OUTPUTS
    names = (outputs,) if isinstance(outputs, str) else outputs
    allowed = "None (all) or names out of " + ", ".join(OUTPUTS)
    try:
        names = list(names)
    except TypeError:
        raise InputError("outputs", outputs, allowed) from None
    if not names:
        raise InputError("outputs", outputs, "at least one name out of " + ", ".join(OUTPUTS))
    for n in names:
        if not isinstance(n, str) or n not in _STEPS:
            raise InputError("outputs", n, allowed, did_you_mean(n, OUTPUTS) if isinstance(n, str) else "")
    return tuple(k for k in OUTPUTS if k in names)


_LG7_5, _LG150, _LG20 = math.log10(7.5), math.log10(150.0), math.log10(20.0)
_XBK = (math.log10(D_BK) - _LG7_5) / _LG20          # lg(d_BK/7.5)/lg 20
_U0 = 0.2 * (math.log10(2.7) - 0.43 * 3.0)          # 0.2·(lg 2.7 − 0.43·lg 1000)


def _seat(*, d, di, sigma_B_dB, sigma_S_dB, sigma_zdW_dB, sigma_bW_dB, tau_tW_dB, group, d_B, d_eff,
          rz_um, k_v, moment_amplitude, torque_mean, torque_amplitude, axial_mean, moment_max,
          torque_max, axial_max, mean_stress_case, want=OUTPUTS, steps=_ALL_STEPS, out=None):
    """The chain of :func:`press_fit_seat` on one block of joints (every argument given).

    ``want``: the outputs to return (in the order of :data:`OUTPUTS`); ``steps``: the steps they
    need (:data:`_STEPS`), the others are skipped. ``out``: optional dict of arrays the named
    results are written into (see :func:`fitcheck.core.blocks.in_blocks`, ``direct``).
    """
    # The same equations as the step functions above, arranged for 10⁶-long arrays in a tolerance
    # study: every logarithm taken once (lg d, lg σ_B(d), lg Rz), constants folded, a reciprocal
    # of W_b instead of five divisions by it, each result written once into its output array.
    # A step that feeds no wanted output is skipped; the steps that run are the same operations
    # in the same order whatever is wanted, so every value is that of the full chain, bit for bit.
    # tests/test_din743.py checks the chain against the step functions.
    o = {}.get if out is None else out.get
    if mean_stress_case not in (1, 2):
        raise ValueError(f"mean-stress case {mean_stress_case!r}; allowed: 1 or 2")
    try:
        _, a_t, a_y, d1, d0 = K1_GROUPS[group]
    except KeyError:
        raise ValueError(f"K1 group {group!r}; allowed: {', '.join(K1_GROUPS)}") from None
    r = {}
    d = np.asarray(d, dtype=float)
    di = np.asarray(di, dtype=float)
    sB = np.asarray(sigma_B_dB, dtype=float)
    if "k1" in steps or "k1y" in steps or "notch" in steps:
        # K1(d_eff)/K1(d_B) for σ_B and σ_S (k1)
        lg_d = np.log10(d)
        lg0, lg1 = math.log10(d0), math.log10(d1)
        x1 = np.clip(lg_d if d_eff is None else np.log10(np.asarray(d_eff, dtype=float)), lg0, lg1)
        x1 -= lg0                                                         # lg(d_eff/d0), clipped
        xB = float(np.clip(np.log10(d_B), lg0, lg1) - lg0)
        k1_dB, k1y_dB = (None, None) if xB == 0.0 else (1.0 - a_t * xB, 1.0 - a_y * xB)
    if "k1" in steps:
        if k1_dB is None:  # d_B at or below the start of the slope (the usual 16 mm): K1(d_B) = 1
            K1 = r["K1"] = np.subtract(1.0, a_t * x1, out=o("K1"))
        else:
            K1 = r["K1"] = np.divide(1.0 - a_t * x1, k1_dB, out=o("K1"))
        sB_d = r["sigma_B_d"] = np.multiply(K1, sB, out=o("sigma_B_d"))
        lg_sBd = np.log10(sB_d)
    if "notch" in steps:
        # notch factors at d_BK, lg β(d_BK) = lg 2.7 + 0.43·lg(σ_B(d)/1000), and at d (K3 with
        # β(d_BK) for α) (press_fit_notch_factors, k3); u = 0.2·lg βσ(d_BK)
        u = 0.2 * 0.43 * lg_sBd
        u += _U0
        bs_bk = np.exp(u * (math.log(10.0) / 0.2))  # 10**lg βσ; exp is several times faster than power
        xd = np.clip(lg_d, _LG7_5, _LG150, out=_own(lg_d))
        xd -= _LG7_5
        xd /= _LG20                                                       # lg(d/7.5)/lg 20, clipped
        num = 1.0 - _XBK * u
        den = u * xd
        den = np.subtract(1.0, den, out=_own(den))
        num /= den
        bs = r["beta_sigma"] = np.multiply(bs_bk, num, out=o("beta_sigma"))
        u += 0.2 * math.log10(0.65)                                       # 0.2·lg βτ(d_BK)
        num = (0.65 * _XBK) * u
        num = np.subtract(0.65, num, out=_own(num))                       # 0.65·(1 − 0.2·lg βτ·x_BK)
        den = u * xd
        den = np.subtract(1.0, den, out=_own(den))
        num /= den
        bt = r["beta_tau"] = np.multiply(bs_bk, num, out=o("beta_tau"))
        K2 = r["K2"] = np.subtract(1.0, 0.2 * xd, out=o("K2"))           # k2
    if "rough" in steps:
        # roughness (roughness_factors)
        ln_rz = np.clip(np.asarray(rz_um, dtype=float), 1.0, np.inf)
        ln_rz = np.log(ln_rz, out=_own(ln_rz))
        kfs = lg_sBd - (_LG20 + 1.0)
        kfs *= (-0.22 / math.log(10.0)) * ln_rz
        kfs = r["KF_sigma"] = np.add(1.0, kfs, out=o("KF_sigma"))
        kft = 0.575 * kfs
        kft = r["KF_tau"] = np.add(kft, 0.425, out=o("KF_tau"))
    fat_b, fat_zd, fat_t = "b" in steps, "zd" in steps, "t" in steps
    # total factors (total_factor); K_V = 1 divides by nothing
    kv = None if np.ndim(k_v) == 0 and float(k_v) == 1.0 else np.asarray(k_v, dtype=float)
    if fat_b or fat_zd:
        r_s = 1.0 / kfs
        r_s -= 1.0                                                        # 1/K_Fσ − 1
    if fat_t:
        r_t = 1.0 / kft
        r_t -= 1.0
    if kv is None:
        if fat_zd:
            Kszd = r["K_sigma_zd"] = np.add(bs, r_s, out=o("K_sigma_zd"))
        if fat_b:
            Ksb = bs / K2
            Ksb = r["K_sigma_b"] = np.add(Ksb, r_s, out=o("K_sigma_b"))
        if fat_t:
            Kt = bt / K2
            Kt = r["K_tau"] = np.add(Kt, r_t, out=o("K_tau"))
    else:
        if fat_zd:
            Kszd = r["K_sigma_zd"] = np.divide(bs + r_s, kv, out=o("K_sigma_zd"))
        if fat_b:
            Ksb = bs / K2
            Ksb += r_s
            Ksb = r["K_sigma_b"] = np.divide(Ksb, kv, out=o("K_sigma_b"))
        if fat_t:
            Kt = bt / K2
            Kt += r_t
            Kt = r["K_tau"] = np.divide(Kt, kv, out=o("K_tau"))
    # component fatigue limits and ψ (psi)
    if fat_b or fat_zd or fat_t:
        two_sBd = 2.0 * sB_d
    if fat_b:
        s_bW = RATIO_SIGMA_BW * sB if sigma_bW_dB is None else np.asarray(sigma_bW_dB, dtype=float)
        s_bWK = r["sigma_bWK"] = np.divide(s_bW * K1, Ksb, out=o("sigma_bWK"))
        psi_b = r["psi_b"] = np.divide(s_bWK, two_sBd - s_bWK, out=o("psi_b"))
    if fat_zd:
        s_zdW = RATIO_SIGMA_ZDW * sB if sigma_zdW_dB is None else np.asarray(sigma_zdW_dB, dtype=float)
        s_zdWK = r["sigma_zdWK"] = np.divide(s_zdW * K1, Kszd, out=o("sigma_zdWK"))
        r["psi_zd"] = np.divide(s_zdWK, two_sBd - s_zdWK, out=o("psi_zd"))
    if fat_t:
        t_tW = RATIO_TAU_TW * sB if tau_tW_dB is None else np.asarray(tau_tW_dB, dtype=float)
        t_tWK = r["tau_tWK"] = np.divide(t_tW * K1, Kt, out=o("tau_tWK"))
        psi_t = r["psi_t"] = np.divide(t_tWK, two_sBd - t_tWK, out=o("psi_t"))
    if "k1y" in steps:
        # component yield strengths (static proof)
        sS = np.asarray(sigma_S_dB, dtype=float)
        if k1y_dB is None:
            K1y = r["K1_yield"] = np.subtract(1.0, a_y * x1, out=o("K1_yield"))
        else:
            K1y = r["K1_yield"] = np.divide(1.0 - a_y * x1, k1y_dB, out=o("K1_yield"))
        s_zdFK = r["sigma_zdFK"] = np.multiply(K1y, sS, out=o("sigma_zdFK"))
        s_bFK = r["sigma_bFK"] = np.multiply(np.where(di > 0, 1.0, 1.2), s_zdFK,  # K2F: 1 hollow, 1.2 solid
                                             out=o("sigma_bFK"))
        t_tFK = r["tau_tFK"] = np.divide(s_bFK, np.sqrt(3.0), out=o("tau_tFK"))
    if "wb" in steps:
        # nominal stresses (nominal_stresses): A, and 1/W_b with W_b = π(d⁴ − di⁴)/(32 d) = A·(d² + di²)/(8 d)
        d2 = d * d
        di2 = di * di
        area = d2 - di2
        area *= np.pi / 4.0
        inv_wb = d2 + di2
        inv_wb *= area
        inv_wb = np.divide(8.0 * d, inv_wb, out=_own(inv_wb))
    if "stress" in steps:
        sba = r["sigma_ba"] = np.multiply(moment_amplitude, inv_wb, out=o("sigma_ba"))
        tta = r["tau_ta"] = np.multiply(0.5 * np.asarray(torque_amplitude, dtype=float), inv_wb, out=o("tau_ta"))
        ttm = r["tau_tm"] = np.multiply(0.5 * np.asarray(torque_mean, dtype=float), inv_wb, out=o("tau_tm"))
        szm = r["sigma_zdm"] = np.divide(axial_mean, area, out=o("sigma_zdm"))
        smv = szm * szm
        smv += 3.0 * (ttm * ttm)
        smv = r["sigma_mv"] = np.sqrt(smv, out=o("sigma_mv"))            # equivalent_mean_stress
        tmv = r["tau_mv"] = np.divide(smv, np.sqrt(3.0), out=o("tau_mv"))
    if "static" in steps:
        # static_safety with σ_zdmax/σ_zdFK = |F_max|/(A·σ_zdFK), σ_bmax/σ_bFK = |M_max|·g and
        # τ_tmax/τ_tFK = (√3/2)·|T_max|·g, g = 1/(W_b·σ_bFK)
        m_max = moment_amplitude if moment_max is None else moment_max
        t_max = np.abs(np.asarray(torque_mean, dtype=float)) + torque_amplitude if torque_max is None else torque_max
        f_max = axial_mean if axial_max is None else axial_max
        g = inv_wb / s_bFK
        ss = np.abs(np.asarray(f_max, dtype=float)) / area
        ss /= s_zdFK
        ss += np.abs(np.asarray(m_max, dtype=float)) * g
        ss *= ss
        g *= 0.5 * np.sqrt(3.0) * np.abs(np.asarray(t_max, dtype=float))
        g *= g
        ss += g
        ss = np.sqrt(ss, out=_own(ss))
        with np.errstate(divide="ignore"):  # 1/0 = inf: no load
            r["static_safety"] = np.divide(1.0, ss, out=o("static_safety"))
    if "fatigue" in steps:
        # fatigue_safety (no tension-compression amplitude)
        if mean_stress_case == 2:  # stress_ratio_term, case 2, inlined
            term_b = _ratio_case2(sba, smv, s_bWK, s_bFK, psi_b)
            term_t = _ratio_case2(tta, tmv, t_tWK, t_tFK, psi_t)
        else:
            term_b = stress_ratio_term(sba, smv, s_bWK, s_bFK, psi_b, 1)
            term_t = stress_ratio_term(tta, tmv, t_tWK, t_tFK, psi_t, 1)
        term_b *= term_b
        term_t *= term_t
        term_b += term_t
        sf = np.sqrt(term_b, out=_own(term_b))
        with np.errstate(divide="ignore"):  # 1/0 = inf: no load
            r["fatigue_safety"] = np.divide(1.0, sf, out=o("fatigue_safety"))
    return {k: r[k] for k in want}


def _own(x):
    """``x`` as the ``out`` of an in-place ufunc if it is an array (a scalar result gets a new one)."""
    return x if isinstance(x, np.ndarray) else None


def _ratio_case2(a, m, strength_wk, strength_fk, psi_k):
    """:func:`stress_ratio_term` for case 2 (a fresh array or scalar, 0 where a ≤ 0)."""
    t = psi_k * m
    t += a
    t /= strength_wk
    u = a + m
    u /= strength_fk
    t = np.maximum(t, u, out=_own(t))
    if np.ndim(t) == 0:
        return np.where(a > 0, t, 0.0)
    t[~(a > 0)] = 0.0  # fewer steps than np.where when (as usual) no amplitude is zero
    return t
