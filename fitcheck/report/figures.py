"""Plots of a report: drawn once, in the case's unit system, kept for both formats.

A plot with a chart builder (:mod:`fitcheck.report.charts`) is kept as a placed vector chart
(inline SVG in the HTML, a reportlab Drawing in the PDF); any other plot function's matplotlib
figure is kept as PNG bytes.

The plot functions of :mod:`fitcheck.plots` draw in SI units. A plot function
that takes a ``system`` argument is asked for the case's system directly; for the
others an inch case gets its axes relabelled here: the axis label's unit in
brackets (``[µm]``, ``[mm]``, ``[MPa]``, ``[N·m]``, ``[kN]``, ``[N]``) is replaced,
ticks are put at round values of the new unit, and the plain numbers written on
those axes (bar values, zone deviations) and the quantities in titles and legends
are converted with the same factor.
"""

from __future__ import annotations

import inspect
import io
import math
import re
from dataclasses import dataclass

from ..display import num

__all__ = ["Figure", "from_chart", "render", "to_system"]

DPI = 120


@dataclass(frozen=True)
class Figure:
    caption: str
    png: bytes
    width_px: int
    height_px: int
    chart: object = None  # a placed vector chart (fitcheck.report.chart.Placed), else None

    @property
    def aspect(self) -> float:
        return self.height_px / self.width_px if self.width_px else 0.75

    @property
    def svg(self) -> str:
        """Inline SVG of a vector chart ("" for a PNG plot)."""
        if self.chart is None:
            return ""
        from .chart import to_svg

        return to_svg(self.chart)


def from_chart(chart, caption: str) -> Figure:
    """A report figure of a :class:`~fitcheck.report.chart.Chart` (placed once, at its nominal size)."""
    from .chart import SVG_SCALE, layout

    placed = layout(chart)
    return Figure(caption, b"", int(round(placed.width * SVG_SCALE)),
                  int(round(placed.height * SVG_SCALE)), placed)


#: SI unit as printed in a label → (inch unit printed, factor SI → inch).
_INCH = {
    "µm": ("in", 1 / 25400.0),
    "mm": ("in", 1 / 25.4),
    "MPa": ("ksi", 1 / 6.894757293168361),
    "N·m": ("lbf·in", 8.850745793490558),
    "kN": ("lbf", 224.80894309971047),
    "N": ("lbf", 0.22480894309971047),
}
_LABEL_UNIT = re.compile(r"\[(µm|mm|MPa|N·m|kN|N)\]")
_QTY = re.compile(r"([+\-−]?\d+(?:\.\d+)?)\s?(µm|mm|MPa|N·m|kN|N)(?![\w·])")
_PLAIN = re.compile(r"\s*[+\-−]?\d+(?:\.\d+)?\s*")


_RANGE = re.compile(r"([+\-−]?\d+(?:\.\d+)?)(\s*…\s*)(?=[+\-−]?\d+(?:\.\d+)?\s?(µm|mm|MPa|N·m|kN|N)(?![\w·]))")


def _convert_quantities(text: str) -> str:
    """Quantities in a label converted to inch units; ``a … b µm`` converts both ends.

    >>> _convert_quantities("clearance -39 … -10 µm")
    'clearance -0.001535 in … -0.0003937 in'
    """
    text = _RANGE.sub(lambda m: f"{m.group(1)} {m.group(3)}{m.group(2)}", text)

    def repl(m: re.Match) -> str:
        unit, f = _INCH[m.group(2)]
        x = float(m.group(1).replace("−", "-")) * f
        sign = "+" if m.group(1).startswith("+") else ""
        return f"{sign}{num(x, 4)} {unit}"

    return _QTY.sub(repl, text)


def _relabel_axis(ax, axis: str) -> float | None:
    get_label = ax.get_xlabel if axis == "x" else ax.get_ylabel
    m = _LABEL_UNIT.search(get_label())
    if not m:
        return None
    unit, f = _INCH[m.group(1)]
    lo, hi = ax.get_xlim() if axis == "x" else ax.get_ylim()
    from matplotlib.ticker import MaxNLocator

    ticks = [t for t in MaxNLocator(nbins=6).tick_values(lo * f, hi * f)
             if min(lo, hi) * f - 1e-12 <= t <= max(lo, hi) * f + 1e-12]
    labels = [num(t, 4) for t in ticks]
    if axis == "x":
        ax.set_xticks([t / f for t in ticks], labels)
        ax.set_xlabel(_LABEL_UNIT.sub(f"[{unit}]", get_label()))
    else:
        ax.set_yticks([t / f for t in ticks], labels)
        ax.set_ylabel(_LABEL_UNIT.sub(f"[{unit}]", get_label()))
    return f


def to_system(fig, system: str) -> None:
    """Show an SI plot in the case's unit system (only "inch" changes anything)."""
    if system != "inch":
        return
    for ax in fig.axes:
        _relabel_axis(ax, "x")
        fy = _relabel_axis(ax, "y")
        for t in ax.texts:
            s = t.get_text()
            if fy is not None and _PLAIN.fullmatch(s):
                x = float(s.strip().replace("−", "-")) * fy
                t.set_text(("+" if s.strip().startswith("+") else "") + num(x, 3))
            else:
                t.set_text(_convert_quantities(s))
        ax.set_title(_convert_quantities(ax.get_title()))
        leg = ax.get_legend()
        if leg is not None:
            for t in leg.get_texts():
                t.set_text(_convert_quantities(t.get_text()))


def draw(fn, result, system: str):
    """Call a plot function, asking it for the unit system when it takes one."""
    try:
        params = inspect.signature(fn).parameters
    except (TypeError, ValueError):
        params = {}
    for name in ("system", "unit_system"):
        if name in params:
            return fn(result, **{name: system}), True
    return fn(result), False


def render(fig, caption: str, system: str = "SI", converted: bool = False) -> Figure:
    """PNG bytes of a matplotlib figure (closed afterwards when pyplot manages it)."""
    if not converted:
        to_system(fig, system)
    if fig.get_layout_engine() is None:
        fig.set_layout_engine("constrained")  # labels inside the figure: nothing clipped
    buf = io.BytesIO()
    fig.savefig(buf, format="png", dpi=DPI)
    w, h = (int(round(x * DPI)) for x in fig.get_size_inches())
    try:
        import matplotlib.pyplot as plt

        if plt.fignum_exists(getattr(fig, "number", -1)):
            plt.close(fig)
    except ImportError:  # pragma: no cover - matplotlib is a dependency
        pass
    return Figure(caption, buf.getvalue(), w, h)


def is_finite(x) -> bool:
    try:
        return math.isfinite(float(x))
    except (TypeError, ValueError):
        return False
