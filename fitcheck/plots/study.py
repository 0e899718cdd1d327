"""Plots of a tolerance study and of a fit search; they never call ``plt.show()``.

* :func:`plot_study_histograms` — histograms of the sampled torque capacity and stresses of a
  :class:`fitcheck.study.StudyResult`, with the required load and the strengths as lines.
* :func:`plot_search_ranking` — the minimum slip safety of the ranked fits of a
  :class:`fitcheck.search.SearchResult` and of the nearest rejected ones.
"""

from __future__ import annotations

import math

import numpy as np
from matplotlib.axes import Axes
from matplotlib.figure import Figure

_BAR = "#4a7a8c"
_LIMIT = ("#b23a3a", "#d08a2c", "#6d5aa0")
_PASS = "#4f8f4a"
_FAIL = "#9a9a9a"

PANELS = ("torque_capacity", "hub_stress", "shaft_stress")


def _draw_hist(ax: Axes, d) -> None:
    edges = np.asarray(d.hist_edges)
    counts = np.asarray(d.hist_counts, dtype=float)
    if edges.size < 2:
        ax.text(0.5, 0.5, "no finite samples", ha="center", va="center", transform=ax.transAxes)
        return
    total = counts.sum()
    share = counts / total * 100.0 if total else counts
    ax.stairs(share, edges, fill=True, color=_BAR, alpha=0.55)
    ax.stairs(share, edges, color=_BAR, lw=1.0)
    lo, hi = edges[0], edges[-1]
    for k, (label, value) in enumerate(d.limits):
        if value is None or not math.isfinite(value) or value <= 0:
            continue
        ax.axvline(value, color=_LIMIT[k % len(_LIMIT)], lw=1.5, ls="--" if k else "-",
                   label=f"{label} {value:.4g}")
        lo, hi = min(lo, value), max(hi, value)
    pad = 0.04 * (hi - lo if hi > lo else 1.0)
    ax.set_xlim(lo - pad, hi + pad)
    unit = f" [{d.unit.replace('*', '·')}]" if d.unit else ""
    ax.set_xlabel(d.label + unit)
    ax.set_ylabel("share of the lot [%]")
    if d.limits:
        ax.legend(fontsize=7, loc="best")


def plot_study_histograms(result, ax=None) -> Figure:
    """Histograms of torque capacity and of hub and shaft stress of a tolerance study.

    Parameters
    ----------
    result : fitcheck.study.StudyResult
    ax : matplotlib Axes or sequence of Axes, optional
        One Axes draws the torque capacity only; a sequence draws the panels
        torque capacity, hub stress, shaft stress into its first (up to three) Axes.
        Without ``ax`` a new figure with three panels is made (not registered with pyplot).

    Returns
    -------
    matplotlib.figure.Figure

    Examples
    --------
    >>> from fitcheck.pressfit import PressFitInput
    >>> from fitcheck.study import run_study
    >>> inp = PressFitInput.from_mapping({"fit": "20 H7/s6", "length": "16 mm",
    ...     "hub_outer_diameter": "40 mm", "shaft_material": "C45E", "hub_material": "C45E",
    ...     "torque": "12 N*m"})
    >>> fig = plot_study_histograms(run_study(inp, samples=2000, importance_samples=0))
    >>> len(fig.axes)
    3
    """
    if ax is None:
        fig = Figure(figsize=(10.5, 3.4), layout="constrained")
        axes = list(fig.subplots(1, 3))
    elif isinstance(ax, Axes):
        fig, axes = ax.figure, [ax]
    else:
        axes = list(ax)[: len(PANELS)]
        fig = axes[0].figure
    for a, key in zip(axes, PANELS, strict=False):
        _draw_hist(a, result.distribution(key))
    title = f"{result.joint}" + (f" — {result.fit}" if result.fit else "")
    title += (f": {result.samples:,} samples; P(slip) ≈ {result.slip.best.p:.2g}, "
              f"P(yield) ≈ {result.yield_.best.p:.2g}")
    fig.suptitle(title, fontsize=9)
    return fig


def plot_search_ranking(result, ax=None, top: int = 15, rejected: int = 5) -> Figure:
    """Ranked chart of candidate fits: minimum slip safety, passing and nearest rejected.

    Bars are the minimum slip safety at the loosest fit (capped for display when no load is
    given), green for the ranked fits (best at the top), grey for the nearest rejected ones
    with the name of their first failing check; a vertical line marks the required slip safety.
    Preferred fits carry a star.

    Parameters
    ----------
    result : fitcheck.search.SearchResult
    ax : matplotlib Axes, optional
    top, rejected : int
        How many ranked and rejected fits to show.

    Returns
    -------
    matplotlib.figure.Figure

    Examples
    --------
    >>> from fitcheck.pressfit import PressFitInput
    >>> from fitcheck.search import search_fits
    >>> inp = PressFitInput.from_mapping({"fit": "20 H7/s6", "length": "16 mm",
    ...     "hub_outer_diameter": "40 mm", "shaft_material": "C45E", "hub_material": "C45E",
    ...     "torque": "20 N*m"})
    >>> fig = plot_search_ranking(search_fits(inp), top=5, rejected=3)
    >>> len(fig.axes[0].patches)
    8
    """
    shown = list(result.passing[:top]) + list(result.rejected[:rejected])
    if ax is None:
        fig = Figure(figsize=(7.0, 0.32 * max(len(shown), 4) + 1.3), layout="constrained")
        ax = fig.add_subplot()
    else:
        fig = ax.figure
    if not shown:
        ax.text(0.5, 0.5, "no candidate fits", ha="center", va="center", transform=ax.transAxes)
        return fig
    req = next((c.limit for c in shown[0].checks if c.name == "slip at loosest fit"), 1.0)
    finite = [c.slip_safety_min for c in shown if math.isfinite(c.slip_safety_min)]
    cap = max(finite + [req]) * 1.15 if finite else 2.0 * req
    vals = [min(c.slip_safety_min, cap) if math.isfinite(c.slip_safety_min) else cap for c in shown]
    y = np.arange(len(shown))[::-1]
    colours = [_PASS if c.ok else _FAIL for c in shown]
    ax.barh(y, vals, color=colours, alpha=0.8, height=0.7)
    labels = []
    for c in shown:
        star = "*" if c.preferred else ""
        labels.append(f"{'#' + str(c.rank) if c.ok else '—'}  {c.hole}/{c.shaft}{star}")
    ax.set_yticks(y, labels, fontsize=8)
    for yi, v, c in zip(y, vals, shown, strict=True):
        if c.ok:
            txt = f" yield safety {min(c.hub_yield_safety, c.shaft_yield_safety):.2f}"
        else:
            name, margin = c.failing[0]
            txt = f" fails: {name} ({margin * 100:+.1f} %)"
        ax.text(v, yi, txt, va="center", ha="left", fontsize=7)
    ax.axvline(req, color=_LIMIT[0], lw=1.3, ls="--", label=f"required slip safety {req:g}")
    ax.set_xlim(0.0, cap * 1.6)
    ax.set_xlabel("minimum slip safety at the loosest fit [-]")
    ax.set_title(f"{result.joint}, {result.nominal_mm:g} mm: {len(result.passing)} of "
                 f"{result.evaluated} admitted fits pass (* preferred)", fontsize=9)
    ax.legend(fontsize=7, loc="lower right")
    return fig
