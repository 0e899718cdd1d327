"""Simple charts of a report as vector graphics: one small description, two renderers.

A :class:`Chart` holds what a report plot shows (lines, filled areas, boxes, texts,
horizontal and vertical rules, axis labels and limits) in data coordinates. :func:`layout`
places it on a box of a given size in points: margins from the measured widths of the
tick labels, nice tick values, the legend below the plot area (so it never covers data).
The placed primitives are written as inline SVG for the HTML report (:func:`to_svg`) and
as a reportlab Drawing for the PDF (:func:`to_drawing`); text stays text in both (it can be
searched and copied), and nothing is rasterised. Both measure text with the report's font
(DejaVu Sans, shipped with matplotlib).
"""

from __future__ import annotations

import functools
import math
from dataclasses import dataclass, field
from xml.sax.saxutils import escape

__all__ = ["Chart", "layout", "nice_ticks", "to_drawing", "to_svg"]

#: Sizes of the chart's texts [pt] at the chart's nominal size.
TITLE, LABEL, TICK, NOTE, LEGEND = 7.6, 7.0, 6.4, 6.2, 6.2

#: Width and height of a chart [pt]; the PDF prints it at this size, the HTML page larger.
WIDTH, HEIGHT = 360.0, 230.0
SVG_SCALE = 1.75


@dataclass
class Line:
    x: list[float]
    y: list[float]
    color: str = "#1f77b4"
    width: float = 1.2
    dash: tuple[float, ...] = ()
    label: str = ""
    marker: bool = False  # a small dot at each point


@dataclass
class Area:
    """A filled polygon in data coordinates (``fill_between``: upper edge then lower edge)."""

    x: list[float]
    y: list[float]
    color: str
    alpha: float = 0.2
    label: str = ""
    edge: str = ""
    hatch: bool = False


@dataclass
class Rule:
    """A horizontal (``axis="h"``, at a y value) or vertical line across the plot area."""

    axis: str
    at: float
    color: str = "#666666"
    width: float = 0.8
    dash: tuple[float, ...] = ()
    label: str = ""


@dataclass
class Span:
    """A shaded band across the plot area between two x values."""

    lo: float
    hi: float
    color: str
    alpha: float = 0.15
    label: str = ""


@dataclass
class Text:
    x: float
    y: float
    text: str
    size: float = NOTE
    anchor: str = "middle"   # start | middle | end
    valign: str = "baseline"  # bottom | middle | top | baseline
    color: str = "#000000"
    bold: bool = False
    dx: float = 0.0  # offset [pt]
    dy: float = 0.0


@dataclass
class Chart:
    title: str
    xlabel: str = ""
    ylabel: str = ""
    xlim: tuple[float, float] | None = None
    ylim: tuple[float, float] | None = None
    xticks: list[tuple[float, str]] | None = None  # None: nice values; []: none
    yticks: list[tuple[float, str]] | None = None
    grid: str = "both"  # both | y | x | ""
    items: list = field(default_factory=list)

    def add(self, *items):
        self.items.extend(items)
        return self

    def data_limits(self):
        xs, ys = [], []
        for it in self.items:
            if isinstance(it, Line | Area):
                xs += [v for v in it.x if math.isfinite(v)]
                ys += [v for v in it.y if math.isfinite(v)]
            elif isinstance(it, Rule):
                (ys if it.axis == "h" else xs).append(it.at)
            elif isinstance(it, Span):
                xs += [it.lo, it.hi]
            elif isinstance(it, Text):
                xs.append(it.x)
                ys.append(it.y)
        return xs, ys


# --------------------------------------------------------------------------- text and ticks

@functools.cache
def _font(bold: bool = False) -> str:
    from .pdf import FONT, _fonts

    _fonts()
    return FONT + ("-Bold" if bold else "")


def text_width(text: str, size: float, bold: bool = False) -> float:
    """Width of a one-line text in the report's font [pt]."""
    from reportlab.pdfbase.pdfmetrics import stringWidth

    return max((stringWidth(s, _font(bold), size) for s in text.split("\n")), default=0.0)


def tick_label(v: float, step: float) -> str:
    """A tick value with as many decimals as the tick step needs, minus as "−".

    >>> tick_label(-2.5, 2.5), tick_label(0.0015, 0.0005), tick_label(40.0, 10.0)
    ('−2.5', '0.0015', '40')
    """
    digits = 0
    if step > 0:
        m = step / 10 ** math.floor(math.log10(step))
        digits = max(0, -math.floor(math.log10(step)) + (1 if round(m, 6) in (2.5,) else 0))
    s = f"{v:.{digits}f}"
    if float(s) == 0:
        s = s.lstrip("-")
    return s.replace("-", "−")


def nice_ticks(lo: float, hi: float, n: int = 6) -> tuple[list[float], float]:
    """Round tick values within [lo, hi], about ``n`` of them, and their step.

    >>> nice_ticks(0.0, 37.0)[0]
    [0.0, 10.0, 20.0, 30.0]
    >>> nice_ticks(-39.0, 10.0)
    ([-30.0, -20.0, -10.0, 0.0, 10.0], 10.0)
    >>> nice_ticks(-32.9, 92.3)[0]
    [-20.0, 0.0, 20.0, 40.0, 60.0, 80.0]
    """
    if not (math.isfinite(lo) and math.isfinite(hi)) or hi <= lo:
        return [lo], 1.0
    raw = (hi - lo) / max(n - 1, 1)
    e = 10.0 ** math.floor(math.log10(raw))
    # the finest round step that gives at most n + 1 ticks
    step = next(m * e for m in (0.5, 1, 2, 2.5, 5, 10, 20)
                if math.floor(hi / (m * e) + 1e-9) - math.ceil(lo / (m * e) - 1e-9) + 1 <= n + 1)
    first = math.ceil(lo / step - 1e-9)
    out = []
    k = first
    while k * step <= hi + 1e-9 * step:
        out.append(round(k * step, 12) + 0.0)
        k += 1
    return out, step


def _pad_limits(vals, pad=0.05):
    if not vals:
        return 0.0, 1.0
    lo, hi = min(vals), max(vals)
    if hi <= lo:
        d = abs(lo) * 0.1 or 1.0
        return lo - d, hi + d
    d = (hi - lo) * pad
    return lo - d, hi + d


# --------------------------------------------------------------------------- layout

@dataclass
class Placed:
    """Primitives in points, y upwards from the bottom-left corner of the chart."""

    width: float
    height: float
    title: str
    ops: list = field(default_factory=list)


def _legend_rows(entries, avail):
    rows, row, w = [], [], 0.0
    for e in entries:
        ew = 16 + text_width(e.label, LEGEND) + 10
        if row and w + ew > avail:
            rows.append(row)
            row, w = [], 0.0
        row.append((e, ew))
        w += ew
    if row:
        rows.append(row)
    return rows


def layout(ch: Chart, width: float = WIDTH, height: float = HEIGHT) -> Placed:
    """Place a chart on a ``width`` × ``height`` box [pt]."""
    xs, ys = ch.data_limits()
    x0, x1 = ch.xlim if ch.xlim else _pad_limits(xs, 0.03)
    y0, y1 = ch.ylim if ch.ylim else _pad_limits(ys, 0.08)
    if ch.xticks is None:
        tv, st = nice_ticks(x0, x1)
        xticks = [(t, tick_label(t, st)) for t in tv]
    else:
        xticks = [(t, s) for t, s in ch.xticks if x0 <= t <= x1]
    if ch.yticks is None:
        tv, st = nice_ticks(y0, y1, 6)
        yticks = [(t, tick_label(t, st)) for t in tv]
    else:
        yticks = [(t, s) for t, s in ch.yticks if y0 <= t <= y1]

    legend = [it for it in ch.items if getattr(it, "label", "")]
    ytw = max((text_width(s, TICK) for _, s in yticks), default=0.0)
    left = 6 + (LABEL * 1.3 if ch.ylabel else 0) + ytw + 4
    right = 10.0
    avail = width - 12
    rows = _legend_rows(legend, avail)
    xlines = max((s.count("\n") + 1 for _, s in xticks), default=0)
    bottom = (3.5 + xlines * TICK * 1.2 + (LABEL * 1.5 if ch.xlabel else 0)
              + len(rows) * LEGEND * 1.45 + 4)
    title_lines = _wrap(ch.title, TITLE, width - 12, bold=True)
    top = 4 + len(title_lines) * TITLE * 1.25 + 4
    px0, px1, py0, py1 = left, width - right, bottom, height - top

    def X(v):
        return px0 + (v - x0) / (x1 - x0) * (px1 - px0) if x1 > x0 else px0

    def Y(v):
        return py0 + (v - y0) / (y1 - y0) * (py1 - py0) if y1 > y0 else py0

    def clampx(v):
        return min(max(v, px0), px1)

    def clampy(v):
        return min(max(v, py0), py1)

    out = Placed(width, height, ch.title)
    ops = out.ops
    ops.append(("rect", px0, py0, px1 - px0, py1 - py0, "#ffffff", 1.0, "", 0, False))
    grid = "#e3e3e3"
    if ch.grid in ("both", "x"):
        for t, _ in xticks:
            ops.append(("line", [(X(t), py0), (X(t), py1)], grid, 0.4, (), 1.0))
    if ch.grid in ("both", "y"):
        for t, _ in yticks:
            ops.append(("line", [(px0, Y(t)), (px1, Y(t))], grid, 0.4, (), 1.0))
    for it in ch.items:
        if isinstance(it, Span):
            a, b = clampx(X(it.lo)), clampx(X(it.hi))
            ops.append(("rect", a, py0, b - a, py1 - py0, it.color, it.alpha, "", 0, False))
    for it in ch.items:
        if isinstance(it, Area):
            pts = [(clampx(X(a)), clampy(Y(b))) for a, b in zip(it.x, it.y, strict=True)
                   if math.isfinite(a) and math.isfinite(b)]
            if len(pts) >= 3:
                ops.append(("poly", pts, it.color, it.alpha, it.edge or "", 1.0 if it.edge else 0,
                            it.hatch))
    for it in ch.items:
        if isinstance(it, Rule):
            if it.axis == "h":
                if y0 <= it.at <= y1:
                    ops.append(("line", [(px0, Y(it.at)), (px1, Y(it.at))], it.color, it.width,
                                it.dash, 1.0))
            elif x0 <= it.at <= x1:
                ops.append(("line", [(X(it.at), py0), (X(it.at), py1)], it.color, it.width,
                            it.dash, 1.0))
        elif isinstance(it, Line):
            pts = [(clampx(X(a)), clampy(Y(b))) for a, b in zip(it.x, it.y, strict=True)
                   if math.isfinite(a) and math.isfinite(b)]
            if len(pts) >= 2:
                ops.append(("line", pts, it.color, it.width, it.dash, 1.0))
            if it.marker:
                for p in pts:
                    ops.append(("line", [(p[0] - 2.5, p[1]), (p[0] + 2.5, p[1])], it.color,
                                it.width, (), 1.0))
    # frame, ticks and tick labels
    ops.append(("rect", px0, py0, px1 - px0, py1 - py0, "", 0.0, "#333333", 0.6, False))
    for t, s in xticks:
        ops.append(("line", [(X(t), py0), (X(t), py0 - 2.5)], "#333333", 0.5, (), 1.0))
        for k, line in enumerate(s.split("\n")):
            ops.append(("text", X(t), py0 - 3.5 - TICK * (0.78 + 1.2 * k), line, TICK, "middle",
                        "#222222", False, 0))
    for t, s in yticks:
        ops.append(("line", [(px0, Y(t)), (px0 - 2.5, Y(t))], "#333333", 0.5, (), 1.0))
        ops.append(("text", px0 - 4, Y(t) - TICK * 0.35, s, TICK, "end", "#222222", False, 0))
    for it in ch.items:
        if isinstance(it, Text):
            ops.extend(_text_ops(it, X(it.x) + it.dx, Y(it.y) + it.dy))
    # axis labels, title, legend
    y = py0 - 3.5 - xlines * TICK * 1.2  # below the tick labels
    if ch.xlabel:
        ops.append(("text", (px0 + px1) / 2, y - LABEL * 0.95, ch.xlabel, LABEL, "middle",
                    "#000000", False, 0))
        y -= LABEL * 1.5
    if ch.ylabel:
        ops.append(("text", 6 + LABEL * 0.8, (py0 + py1) / 2, ch.ylabel, LABEL, "middle",
                    "#000000", False, 90))
    for k, s in enumerate(title_lines):
        ops.append(("text", width / 2, height - 4 - TITLE * (0.95 + 1.25 * k), s, TITLE, "middle",
                    "#000000", True, 0))
    yl = y - LEGEND * 1.1
    for row in rows:
        x = 6.0
        for e, ew in row:
            ym = yl + LEGEND * 0.35
            if isinstance(e, Area | Span):
                ops.append(("rect", x, ym - 3.2, 13, 6.4, e.color, min(1.0, getattr(e, "alpha", 0.2) * 1.6),
                            "", 0, False))
            else:
                ops.append(("line", [(x, ym), (x + 13, ym)], e.color, max(e.width, 1.0), e.dash,
                            1.0))
            ops.append(("text", x + 16, yl, e.label, LEGEND, "start", "#222222", False, 0))
            x += ew
        yl -= LEGEND * 1.45
    return out


def _wrap(text: str, size: float, avail: float, bold: bool = False) -> list[str]:
    words, lines, cur = text.split(" "), [], ""
    for w in words:
        trial = f"{cur} {w}" if cur else w
        if cur and text_width(trial, size, bold) > avail:
            lines.append(cur)
            cur = w
        else:
            cur = trial
    return lines + [cur] if cur else lines


def _text_ops(t: Text, x: float, y: float):
    lines = t.text.split("\n")
    lead = t.size * 1.2
    block = (len(lines) - 1) * lead
    base = {"bottom": y + 0.24 * t.size + block, "middle": y - 0.35 * t.size + block / 2,
            "top": y - 0.78 * t.size}.get(t.valign, y)
    return [("text", x, base - k * lead, s, t.size, t.anchor, t.color, t.bold, 0)
            for k, s in enumerate(lines)]


# --------------------------------------------------------------------------- renderers

def _hatch_segments(pts, spacing=4.0):
    """45° hatch lines inside a convex polygon (the zone boxes are rectangles)."""
    xs, ys = [p[0] for p in pts], [p[1] for p in pts]
    x0, x1, y0, y1 = min(xs), max(xs), min(ys), max(ys)
    segs = []
    c = x0 - (y1 - y0)
    while c < x1:
        # the line x - y = c - y0 through the box: clip to [x0, x1] × [y0, y1]
        a = max(x0, c)
        ya = y0 + (a - c)
        b = min(x1, c + (y1 - y0))
        yb = y0 + (b - c)
        if b > a:
            segs.append([(a, ya), (b, yb)])
        c += spacing
    return segs


def to_svg(p: Placed, scale: float = SVG_SCALE) -> str:
    """Inline SVG of a placed chart (user texts escaped)."""
    H = p.height

    def f(v):
        return f"{v:.2f}".rstrip("0").rstrip(".")

    out = [f'<svg class="chart" role="img" '
           f'viewBox="0 0 {f(p.width)} {f(H)}" width="{f(p.width * scale)}" '
           f'height="{f(H * scale)}" font-family="DejaVu Sans, Verdana, sans-serif">'
           f"<title>{escape(p.title)}</title>"]
    for op in p.ops:
        kind = op[0]
        if kind == "line":
            _, pts, color, w, dash, _a = op
            d = f' stroke-dasharray="{" ".join(f(x) for x in dash)}"' if dash else ""
            out.append(f'<polyline fill="none" stroke="{color}" stroke-width="{f(w)}"{d} points="'
                       + " ".join(f"{f(x)},{f(H - y)}" for x, y in pts) + '"/>')
        elif kind == "rect":
            _, x, y, w, h, fill, alpha, stroke, sw, _hatch = op
            out.append(f'<rect x="{f(x)}" y="{f(H - y - h)}" width="{f(w)}" height="{f(h)}" '
                       f'fill="{fill or "none"}" fill-opacity="{f(alpha)}" '
                       f'stroke="{stroke or "none"}" stroke-width="{f(sw)}"/>')
        elif kind == "poly":
            _, pts, fill, alpha, stroke, sw, hatch = op
            out.append(f'<polygon fill="{fill}" fill-opacity="{f(alpha)}" stroke="{stroke or "none"}"'
                       f' stroke-width="{f(sw)}" points="'
                       + " ".join(f"{f(x)},{f(H - y)}" for x, y in pts) + '"/>')
            if hatch:
                for s in _hatch_segments(pts):
                    out.append(f'<polyline fill="none" stroke="{fill}" stroke-width="0.5" '
                               f'stroke-opacity="0.7" points="'
                               + " ".join(f"{f(x)},{f(H - y)}" for x, y in s) + '"/>')
        elif kind == "text":
            _, x, y, s, size, anchor, color, bold, rot = op
            b = ' font-weight="bold"' if bold else ""
            tr = f' transform="rotate(-{rot} {f(x)} {f(H - y)})"' if rot else ""
            out.append(f'<text x="{f(x)}" y="{f(H - y)}" font-size="{f(size)}" '
                       f'text-anchor="{anchor}" fill="{color}"{b}{tr}>{escape(s)}</text>')
    out.append("</svg>")
    return "".join(out)


def to_drawing(p: Placed, width: float | None = None):
    """A reportlab Drawing of a placed chart (a platypus flowable), scaled to ``width`` [pt]."""
    from reportlab.graphics.shapes import Drawing, Group, Polygon, PolyLine, Rect, String
    from reportlab.lib.colors import HexColor

    k = (width / p.width) if width else 1.0
    d = Drawing(p.width * k, p.height * k)
    g = Group()
    if k != 1.0:
        g.scale(k, k)
    colors = {}

    def col(c):
        if not c:
            return None
        if c not in colors:
            colors[c] = HexColor(c)
        return colors[c]

    for op in p.ops:
        kind = op[0]
        if kind == "line":
            _, pts, color, w, dash, _a = op
            g.add(PolyLine([v for xy in pts for v in xy], strokeColor=col(color), strokeWidth=w,
                           strokeDashArray=list(dash) or None, strokeLineJoin=1))
        elif kind == "rect":
            _, x, y, w, h, fill, alpha, stroke, sw, _hatch = op
            g.add(Rect(x, y, w, h, fillColor=col(fill), fillOpacity=alpha if fill else None,
                       strokeColor=col(stroke), strokeWidth=sw))
        elif kind == "poly":
            _, pts, fill, alpha, stroke, sw, hatch = op
            g.add(Polygon([v for xy in pts for v in xy], fillColor=col(fill), fillOpacity=alpha,
                          strokeColor=col(stroke), strokeWidth=sw))
            if hatch:
                for s in _hatch_segments(pts):
                    g.add(PolyLine([v for xy in s for v in xy], strokeColor=col(fill),
                                   strokeWidth=0.5, strokeOpacity=0.7))
        elif kind == "text":
            _, x, y, s, size, anchor, color, bold, rot = op
            st = String(0 if rot else x, 0 if rot else y, s, fontName=_font(bold), fontSize=size,
                        fillColor=col(color), textAnchor=anchor)
            if rot:
                sub = Group(st)
                sub.translate(x, y)
                sub.rotate(rot)
                g.add(sub)
            else:
                g.add(st)
    d.add(g)
    return d
