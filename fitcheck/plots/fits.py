"""Tolerance-zone diagram of a fit: zero line at the nominal size, zones as boxes in µm."""

from __future__ import annotations

import math

from matplotlib.figure import Figure
from matplotlib.patches import Rectangle

from ..display import deviation as _fmt
from ._units import scale

_HOLE = "#3b6ea5"
_SHAFT = "#c9822b"


def plot_fit(fit, ax=None, *, units: str = "SI") -> Figure:
    """Draw the hole and shaft tolerance zones of ``fit`` (a :class:`fitcheck.fits.Fit`).

    The zero line is the nominal size; each zone is a box from its lower to
    its upper deviation [µm; thousandths of an inch with ``units="inch"``], labelled with its
    class and deviations. With
    ``ax`` given, draws into it and returns its figure; otherwise makes a new
    figure (not registered with pyplot, so nothing needs closing).

    Examples
    --------
    >>> from fitcheck.fits import fit
    >>> fig = plot_fit(fit("25 H7/p6"))
    >>> len(fig.axes[0].patches)
    2
    """
    if ax is None:
        fig = Figure(figsize=(5.0, 3.6), layout="constrained")
        ax = fig.add_subplot()
    else:
        fig = ax.figure
    k_um, u_lab = scale("um", units)
    zones = [(z, col) for z, col in ((fit.hole, _HOLE), (fit.shaft, _SHAFT)) if z is not None]
    lo = min([0.0] + [z.lower_um * k_um for z, _ in zones])
    hi = max([0.0] + [z.upper_um * k_um for z, _ in zones])
    span = max(hi - lo, 1.0 * k_um)
    width, gap = 1.0, 0.6
    for k, (z, col) in enumerate(zones):
        x = gap + k * (width + gap)
        up, low = z.upper_um * k_um, z.lower_um * k_um
        ax.add_patch(Rectangle((x, low), width, up - low,
                               facecolor=col, edgecolor=col, alpha=0.35, lw=1.5,
                               hatch="//" if z.feature == "hole" else None))
        ax.text(x + width / 2, up + 0.03 * span, _fmt(up), ha="center", va="bottom", fontsize=8)
        ax.text(x + width / 2, low - 0.03 * span, _fmt(low), ha="center", va="top", fontsize=8)
        ax.text(x + width / 2, (up + low) / 2, f"{z.feature}\n{z.cls}",
                ha="center", va="center", fontsize=9, weight="bold")
    right = gap + len(zones) * (width + gap)
    ax.axhline(0.0, color="0.2", lw=1.0)
    nominal = f"{fit.nominal_mm / 25.4:.4f} in" if units == "inch" else f"{fit.nominal_mm:g} mm"
    ax.text(right, 0.0, f" {nominal}", va="center", ha="left", fontsize=8)
    ax.set_xlim(0.0, right + 1.2)
    ax.set_ylim(lo - 0.18 * span, hi + 0.18 * span)
    ax.set_xticks([])
    ax.set_ylabel(f"deviation from nominal size [{u_lab}]")
    title = getattr(fit, "ansi_class", None) or ""
    title = (title + " " if title else "") + " / ".join(z.cls for z, _ in zones)
    if fit.kind is not None and math.isfinite(fit.clearance_max_um):
        title += (f" — {fit.kind}, clearance {_fmt(fit.clearance_min_um * k_um)} … "
                  f"{_fmt(fit.clearance_max_um * k_um)} {u_lab}")
    ax.set_title(f"Ø{nominal if units == 'inch' else f'{fit.nominal_mm:g}'} {title}", fontsize=9)
    ax.grid(axis="y", color="0.9", lw=0.6)
    return fig
