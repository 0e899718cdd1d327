"""Clearance budget of a bearing seat: initial clearance, fit-up loss, thermal change, operating clearance."""

from __future__ import annotations

import math

from matplotlib.figure import Figure

from ..bearings import clearance_budget

_MIN = "#b5472f"   # tightest pairing (smallest clearance)
_MAX = "#3b6ea5"   # loosest pairing (largest clearance)
_LIMIT = "#444444"



def plot_clearance_budget(result, ax=None, *, units: str = "SI") -> Figure:
    """Waterfall of the radial clearance [µm]: initial → fit-up → thermal → operating.

    Two waterfalls side by side: the tightest pairing (smallest clearance, the one the
    clearance check uses) and the loosest. The initial and operating bars stand on zero;
    the fit-up and thermal bars float between the levels before and after. The user's
    limit (``clearance_min``) is a dashed line. Never calls ``plt.show()``.

    Parameters
    ----------
    result : fitcheck.bearings.BearingSeatResult
    ax : matplotlib.axes.Axes, optional
        Draw into these axes; otherwise a new figure (not registered with pyplot).

    Returns
    -------
    matplotlib.figure.Figure

    Examples
    --------
    >>> from fitcheck.bearings import BearingSeatInput, evaluate
    >>> r = evaluate(BearingSeatInput.from_mapping({"designation": "6204", "shaft": "k5",
    ...     "housing": "H7", "clearance_group": "C3"}))
    >>> fig = plot_clearance_budget(r)
    >>> len(fig.axes[0].patches)
    8
    """
    if ax is None:
        fig = Figure(figsize=(6.0, 3.8), layout="constrained")
        ax = fig.add_subplot()
    else:
        fig = ax.figure
    from ._units import scale
    k, lab = scale("um", units)
    steps = {key: [v * k for v in vals] for key, vals in clearance_budget(result).items()}
    width = 0.36
    finite = all(math.isfinite(v) for s in steps.values() for v in s)
    for k, (key, color, label) in enumerate((("min", _MIN, "tightest pairing"),
                                             ("max", _MAX, "loosest pairing"))):
        s = steps[key] if finite else [0.0] * 4
        x0 = -width / 2 + k * width
        bars = [(0.0, s[0]), (s[0], s[1]), (s[1], s[2]), (0.0, s[3])]
        for i, (a, b) in enumerate(bars):
            alpha = 1.0 if i in (0, 3) else 0.55
            ax.bar(i + x0, b - a, width=width * 0.95, bottom=a, color=color, alpha=alpha,
                   label=label if i == 0 else None)
            ax.annotate(f"{s[i]:.2f}" if units == "inch" else f"{s[i]:.1f}", (i + x0, max(a, b)), ha="center", va="bottom", fontsize=7,
                        xytext=(0, 2), textcoords="offset points")
        ax.plot([i + x0 for i in range(4)], s, color=color, lw=0.8, ls=":", marker="_")
    ax.margins(y=0.15)
    ax.axhline(0.0, color=_LIMIT, lw=0.8)
    lim = getattr(result, "clearance_min_um", 0.0) * k
    if lim:
        ax.axhline(lim, color=_LIMIT, lw=1.0, ls="--", label=f"limit {lim:.3g} {lab}")
    ax.set_xticks(range(4), [f"initial\n{getattr(result, 'clearance_group', '')}", "fit-up",
                             "thermal", "operating"])
    ax.set_ylabel(f"radial clearance [{lab}]")
    name = getattr(result, "name", "") or getattr(result, "designation", "")
    ax.set_title(f"Clearance budget {name}".strip() + ("" if finite else " (no clearance group)"),
                 fontsize=10)
    ax.legend(fontsize=8, loc="best")
    return fig
