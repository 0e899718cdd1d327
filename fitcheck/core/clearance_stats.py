r"""Operating radial clearance of a rolling bearing by probable (statistical) combination.

The worst-case stack of ring, seat and clearance-group tolerances (ISO 286-1:2010, 3.3,
arithmetic) is a combination almost no bearing of a lot meets: the largest shaft in the smallest
ring bore *and* the smallest internal clearance of the group. Bearing-engineering practice sizes
the clearance on the *probable* interference instead; this module gives the figures.

Model (every tolerance an independent random variable, centred in its band)
------------------------------------------------------------------------------
Operating clearance, in µm, for group clearance G₀ and the two seat interferences U_i (inner
ring on shaft), U_o (outer ring in housing), as in :mod:`fitcheck.core.bearing`::

    G = G₀ − k_i·⟨eff(U_i, s_i) + ΔU_i⟩ − k_o·⟨eff(U_o, s_o) + ΔU_o⟩ − ΔG_T

with ``eff`` the interference after smoothing s (DIN 7190-1:2017, 6.2; a clearance keeps its
clearance), ΔU the thermal change of the seat (DIN 7190-1:2017, 6.4), ⟨x⟩ = max(x, 0),
k the raceway change per µm of effective interference (Lamé, linear; Shigley 10th ed.
eq. (3-56)) and ΔG_T the clearance taken by a warmer inner ring.

* **Mean** clearance: every tolerance at its mean (the verdict).
* **Maximum probable interference** of a seat: mean + ½·√(T_ring² + T_seat²) — the
  root-sum-square half band of the two tolerances (bearing-engineering handbooks' probable
  interference; statistical tolerancing, e.g. Fortini, *Dimensioning for Interchangeable
  Manufacture*, 1967, ch. 4 — from memory). The clearance there is taken with the group's mean
  clearance.
* **Distribution**: each tolerance band T as a normal distribution with ±3σ = the band
  (σ = T/6, default) or as uniform over the band (σ = T/√12). The clearance's variance is the
  sum of the independent terms' variances (root sum of squares); where a seat is tight
  throughout it is k²·(σ_ring² + σ_seat²). Since a seat takes clearance only while it is tight,
  the terms are integrated over quantile nodes of each seat's interference (exact for the
  piecewise-linear model up to the node spacing), and P(G < required) is summed over them
  with the group's distribution function.

References
----------
ISO 286-1:2010, 3.3 (limits of fit); ISO 5753-1:2009 (clearance groups);
DIN 7190-1:2017, 6.2, 6.4; statistical tolerancing / root sum of squares (RSS): Shigley,
Mechanical Engineering Design, 10th ed., sec. 1-14 (statistical considerations) and ISO 286-1
for the bands; the probable-interference rule of bearing-engineering handbooks (e.g. Harris &
Kotzalas, *Rolling Bearing Analysis*, 5th ed., ch. on fitting practice — from memory).
"""

from __future__ import annotations

import math

import numpy as np

__all__ = ["DISTRIBUTIONS", "sigma_of_band", "seat_term", "clearance", "probable_clearance"]

DISTRIBUTIONS = ("normal", "uniform")


def sigma_of_band(band_um, distribution: str = "normal"):
    """Standard deviation [µm] of a tolerance band of width ``band_um``.

    Normal with ±3σ filling the band: σ = T/6; uniform over the band: σ = T/√12.

    >>> sigma_of_band(6.0), round(sigma_of_band(12.0, "uniform"), 4)
    (1.0, 3.4641)
    """
    if distribution not in DISTRIBUTIONS:
        raise ValueError(f"distribution must be one of {DISTRIBUTIONS}, got {distribution!r}")
    t = np.asarray(band_um, dtype=float)
    out = t / 6.0 if distribution == "normal" else t / math.sqrt(12.0)
    return float(out) if out.ndim == 0 else out


def seat_term(u_um, smoothing_um, thermal_um, k):
    """Clearance taken by one seat [µm]: k·⟨U − min(s, ⟨U⟩) + ΔU⟩ (vectorised).

    >>> round(seat_term(11.5, 3.28, 0.0, 0.75), 6)
    6.165
    >>> seat_term(-18.0, 6.32, 0.0, 0.5)
    0.0
    """
    u = np.asarray(u_um, dtype=float)
    eff = u - np.minimum(smoothing_um, np.maximum(u, 0.0)) + thermal_um
    out = np.multiply(k, np.maximum(eff, 0.0))
    return float(out) if np.ndim(out) == 0 else out


def clearance(g0_um, u_inner_um, u_outer_um, *, s_inner, s_outer, dt_inner, dt_outer, k_inner, k_outer,
              ring_thermal_um=0.0):
    """Operating radial clearance [µm] for given group clearance and seat interferences (vectorised).

    >>> round(clearance(12.5, 11.5, -18.0, s_inner=3.28, s_outer=6.32, dt_inner=0.0, dt_outer=0.0,
    ...                 k_inner=0.75, k_outer=0.5), 3)
    6.335
    """
    out = (np.asarray(g0_um, dtype=float) - seat_term(u_inner_um, s_inner, dt_inner, k_inner)
           - seat_term(u_outer_um, s_outer, dt_outer, k_outer) - ring_thermal_um)
    return float(out) if np.ndim(out) == 0 else out


_NODES_NORMAL = 512   # quantile-midpoint nodes of a seat's normal interference
_NODES_UNIFORM = 32   # per uniform part: 32 × 32 nodes of (seat − ring)


def _seat_nodes(ring_lo, ring_hi, seat_lo, seat_hi, distribution):
    """Equal-weight nodes of the interference U = seat − ring [µm] (male − female handled by caller).

    Normal: U ~ N(mean, σ_ring² + σ_seat²), sampled at the quantile midpoints (k + ½)/n;
    uniform: every pair of midpoints of the two uniform parts (the trapezoidal sum).
    """
    from scipy.special import ndtri

    if distribution == "normal":
        mu = 0.5 * (seat_lo + seat_hi) - 0.5 * (ring_lo + ring_hi)
        sd = math.hypot(sigma_of_band(ring_hi - ring_lo), sigma_of_band(seat_hi - seat_lo))
        q = (np.arange(_NODES_NORMAL) + 0.5) / _NODES_NORMAL
        return mu + sd * ndtri(q)
    q = (np.arange(_NODES_UNIFORM) + 0.5) / _NODES_UNIFORM
    seat = seat_lo + (seat_hi - seat_lo) * q
    ring = ring_lo + (ring_hi - ring_lo) * q
    return (seat[:, None] - ring[None, :]).ravel()


def _group_cdf(x, g_lo, g_hi, distribution):
    """P(G₀ ≤ x) of the group clearance: normal ±3σ in the band, or uniform over it."""
    from scipy.special import ndtr

    if g_hi <= g_lo:
        return (np.asarray(x) >= g_lo).astype(float)
    if distribution == "normal":
        return ndtr((np.asarray(x) - 0.5 * (g_lo + g_hi)) / sigma_of_band(g_hi - g_lo))
    return np.clip((np.asarray(x) - g_lo) / (g_hi - g_lo), 0.0, 1.0)


def probable_clearance(group_um, inner_ring_um, shaft_um, outer_ring_um, housing_um, *,
                       s_inner, s_outer, dt_inner, dt_outer, k_inner, k_outer, ring_thermal_um=0.0,
                       required_um=0.0, distribution="normal", full=True) -> dict:
    """Mean, probable minimum, σ and P(clearance < required) of the operating clearance.

    Parameters
    ----------
    group_um : (min, max)
        Radial internal clearance of the group before mounting (ISO 5753-1) [µm].
    inner_ring_um, shaft_um : (lower, upper)
        Deviations of the ring bore (ISO 492) and of the shaft seat (ISO 286) [µm].
    outer_ring_um, housing_um : (lower, upper)
        Deviations of the ring's outside diameter and of the housing bore [µm].
    s_inner, s_outer
        Smoothing of the two seats [µm] (DIN 7190-1:2017, 6.2).
    dt_inner, dt_outer
        Thermal change of the seats' interference in the state evaluated [µm].
    k_inner, k_outer
        Raceway change per µm of effective interference [-] (Lamé; linear).
    ring_thermal_um
        Clearance taken by the inner ring running warmer than the outer ring [µm].
    required_um
        Smallest acceptable operating clearance [µm].
    distribution : "normal" or "uniform"
        How each tolerance band is distributed.
    full : bool
        False leaves out the distribution (``sigma``, ``p_below``, ``distribution_mean`` NaN):
        a quick look at the mean and the worst case, e.g. for every clearance group.

    Returns
    -------
    dict with ``mean`` (every tolerance at its mean: the verdict), ``distribution_mean`` (the
    expected value of the distribution; equal to ``mean`` where both seats stay on one side of
    their kinks), ``probable_min`` (at both seats' maximum probable interference and the
    group's mean clearance), ``sigma``, ``p_below`` (P(clearance < required)),
    ``worst_min`` and ``worst_max`` (arithmetic worst case, information),
    ``u_inner_probable_max``, ``u_outer_probable_max`` [µm], ``distribution``.

    Examples
    --------
    6204 on k5 in H7, group N, steel housing, equal temperatures (ISO 492 bore 0/−10, OD 0/−11;
    ISO 286 k5 +2/+11, H7 0/+25 at 47 mm; ISO 5753-1 N 5…20 µm):

    >>> r = probable_clearance((5, 20), (-10, 0), (2, 11), (-11, 0), (0, 25), s_inner=3.28,
    ...                        s_outer=6.32, dt_inner=0, dt_outer=0, k_inner=0.7475, k_outer=0.5)
    >>> round(r["mean"], 1), round(r["probable_min"], 1), round(r["sigma"], 1), round(r["p_below"], 3)
    (6.4, 1.3, 3.0, 0.017)
    """
    g = np.asarray(group_um, dtype=float)
    bore, shaft = np.asarray(inner_ring_um, dtype=float), np.asarray(shaft_um, dtype=float)
    od, hous = np.asarray(outer_ring_um, dtype=float), np.asarray(housing_um, dtype=float)
    # interference = male − female: inner seat shaft − bore, outer seat OD − housing bore
    u_i = shaft.mean() - bore.mean()
    u_o = od.mean() - hous.mean()
    t_ri, t_si = float(np.ptp(bore)), float(np.ptp(shaft))
    t_ro, t_ho = float(np.ptp(od)), float(np.ptp(hous))
    kw = dict(s_inner=s_inner, s_outer=s_outer, dt_inner=dt_inner, dt_outer=dt_outer,
              k_inner=k_inner, k_outer=k_outer, ring_thermal_um=ring_thermal_um)
    mean = clearance(g.mean(), u_i, u_o, **kw)
    u_i_p = u_i + 0.5 * math.hypot(t_ri, t_si)
    u_o_p = u_o + 0.5 * math.hypot(t_ro, t_ho)
    probable = clearance(g.mean(), u_i_p, u_o_p, **kw)
    worst_min = clearance(g[0], shaft[1] - bore[0], od[1] - hous[0], **kw)
    worst_max = clearance(g[1], shaft[0] - bore[1], od[0] - hous[1], **kw)
    if not full:
        return {"mean": float(mean), "probable_min": float(probable), "worst_min": float(worst_min),
                "worst_max": float(worst_max), "sigma": math.nan, "p_below": math.nan,
                "distribution_mean": math.nan, "distribution": distribution}
    # the distribution: G = G₀ − H_i(U_i) − H_o(U_o) − ΔG_T with independent G₀, U_i, U_o; the
    # seat terms are piecewise linear (smoothing, no pull from a clearance), so their moments and
    # P(G < required) are integrated over quantile nodes, not linearised
    u_in = _seat_nodes(bore[0], bore[1], shaft[0], shaft[1], distribution)
    u_on = _seat_nodes(hous[0], hous[1], od[0], od[1], distribution)
    h_i = np.asarray(seat_term(u_in, s_inner, dt_inner, k_inner), dtype=float)
    h_o = np.asarray(seat_term(u_on, s_outer, dt_outer, k_outer), dtype=float)
    sg = sigma_of_band(float(np.ptp(g)), distribution)
    dist_mean = float(g.mean() - h_i.mean() - h_o.mean() - ring_thermal_um)
    sigma = math.sqrt(sg**2 + h_i.var() + h_o.var())
    hi_u, hi_w = np.unique(h_i, return_counts=True)
    ho_u, ho_w = np.unique(h_o, return_counts=True)
    cdf = _group_cdf(required_um + ring_thermal_um + hi_u[:, None] + ho_u[None, :], g[0], g[1],
                     distribution)
    p_below = float((hi_w[:, None] * ho_w[None, :] * cdf).sum() / (h_i.size * h_o.size))
    return {"mean": float(mean), "probable_min": float(probable), "sigma": sigma, "p_below": p_below,
            "distribution_mean": dist_mean,
            "worst_min": float(worst_min), "worst_max": float(worst_max),
            "u_inner_mean": float(u_i), "u_outer_mean": float(u_o),
            "u_inner_probable_max": float(u_i_p), "u_outer_probable_max": float(u_o_p),
            "distribution": distribution}
