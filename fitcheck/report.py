"""Calculation reports of a design case, as one self-contained HTML file or a PDF.

A report is what a reviewer signs: a title block with signature and date
lines; the caution and the deference to standards, local codes and licensed
professional practice at the top and at the end; the shared conditions; and
for every joint its inputs with units, the method steps with their standard
clauses or equations, the checks (value, limit, margin, verdict, reference)
and the plots.

Both formats are built from the same :class:`Report` so they always say the
same thing. HTML embeds the plots as base64 PNG and escapes every user string;
PDF is drawn with matplotlib (:class:`~matplotlib.backends.backend_pdf.PdfPages`,
TrueType fonts so the text can be searched and copied).
"""

from __future__ import annotations

import base64
import datetime as _dt
import html
import io
import math
import os
import textwrap
from collections.abc import Mapping, Sequence
from dataclasses import dataclass, field
from pathlib import Path

from . import CAUTION, __version__
from .case import CaseResult, DesignCase, JointResult, evaluate
from .checks import Check
from .errors import InputError
from .safefile import atomic_write
from .units import plain

__all__ = ["Report", "build", "to_html", "to_pdf", "write", "FORMATS"]

FORMATS = (".html", ".htm", ".pdf")

DEFERENCE = (
    "This calculation supports, and does not replace, the engineering judgement of a qualified "
    "person. Where it differs from an applicable standard, a local code or regulation, or licensed "
    "professional practice, those govern. Verify critical joints by test on parts made to drawing."
)

SIGNATURE_ROLES = ("Calculated by", "Checked by", "Approved by")


# --------------------------------------------------------------------------- document model

@dataclass
class JointSection:
    """What the report says about one joint."""

    heading: str
    label: str
    inputs: list[tuple[str, str, str]]      # key, value as given, meaning (with unit)
    method: list[tuple[str, str]]           # step, clause / equation
    checks: list[Check]
    ok: bool
    warnings: list[str]
    figures: list[tuple[str, object]] = field(default_factory=list)  # caption, Figure
    plot_errors: list[str] = field(default_factory=list)


@dataclass
class Report:
    """The content of a calculation report, independent of the output format."""

    title: dict[str, str]
    conditions: list[tuple[str, str]]
    summary: list[tuple[str, str, Check]]    # joint label, kind heading, check
    sections: list[JointSection]
    ok: bool
    generated: str
    version: str = __version__

    def close(self) -> None:
        """Release the figures the report holds (closing any that pyplot manages)."""
        import matplotlib.pyplot as plt

        for s in self.sections:
            for _, fig in s.figures:
                if plt.fignum_exists(getattr(fig, "number", -1)):
                    plt.close(fig)
            s.figures.clear()


def _method_steps(notes) -> list[tuple[str, str]]:
    out = []
    for n in notes or ():
        if isinstance(n, str):
            out.append((n, ""))
        elif isinstance(n, Mapping):
            step = n.get("step") or n.get("text") or n.get("name") or ""
            ref = n.get("reference") or n.get("clause") or n.get("equation") or ""
            out.append((str(step), str(ref)))
        elif isinstance(n, Sequence) and len(n) >= 2:
            out.append((str(n[0]), " ".join(str(x) for x in n[1:] if x)))
        elif hasattr(n, "step"):
            out.append((str(n.step), str(getattr(n, "reference", getattr(n, "clause", "")))))
        else:
            out.append((str(n), ""))
    return out


def format_value(v) -> str:
    """An input value as it reads in a report (inline tables as ``k = v, …``)."""
    if isinstance(v, Mapping):
        return "{" + ", ".join(f"{k} = {format_value(x)}" for k, x in v.items()) + "}"
    if isinstance(v, list | tuple):
        return "[" + ", ".join(format_value(x) for x in v) + "]"
    if isinstance(v, bool):
        return "true" if v else "false"
    if isinstance(v, float):
        return f"{v:.6g}"
    return str(v)


def format_number(x: float, unit: str = "") -> str:
    try:
        xf = float(x)
    except (TypeError, ValueError):
        return str(x)
    if math.isnan(xf):
        return "n/a"
    if math.isinf(xf):
        return ("∞" if xf > 0 else "−∞") + (f" {unit_text(unit)}" if unit else "")
    return plain(xf) + (f" {unit_text(unit)}" if unit else "")


#: How a unit of a :class:`~fitcheck.checks.Check` is printed.
_UNIT_TEXT = {"um": "µm", "degC": "°C", "N*m": "N·m", "N*mm": "N·mm", "delta_degC": "K"}


def unit_text(unit: str) -> str:
    """A check's unit as printed: ``unit_text("um") -> 'µm'``."""
    return _UNIT_TEXT.get(unit, unit)


def format_margin(m: float) -> str:
    if math.isnan(m):
        return "n/a"
    if math.isinf(m):
        return "+∞" if m > 0 else "−∞"
    return f"{m * 100:+.1f} %"


def verdict(c: Check) -> str:
    return "pass" if c.passed else "FAIL"


def _key_meaning(keys, key: str) -> str:
    if isinstance(keys, Mapping):
        v = keys.get(key, "")
        if isinstance(v, Mapping):
            return " ".join(str(x) for x in v.values())
        if isinstance(v, Sequence) and not isinstance(v, str):
            return " — ".join(str(x) for x in v if x)
        return str(v)
    return ""


def _inputs(jr: JointResult, case: DesignCase, keys) -> list[tuple[str, str, str]]:
    rows = []
    for k, v in jr.input.to_mapping().items():
        if v is None or k == "name":
            continue
        meaning = _key_meaning(keys, k)
        if k in case.conditions and case.conditions[k] == v:
            meaning = (meaning + " " if meaning else "") + "(from [conditions])"
        rows.append((k, format_value(v), meaning))
    return rows


def _fits(jr: JointResult) -> list[tuple[str, object]]:
    """ISO 286 fits a joint states, for the tolerance-zone diagrams: ``[(caption, Fit), …]``.

    A press fit names its fit (``fit = "16 H7/s6"``); a bearing seat has a shaft class on
    the bore and a housing class on the outside diameter (single zones).
    """
    from .fits import fit as make_fit

    out, seen = [], set()

    def add(caption, *args, **kw):
        key = (args, tuple(sorted(kw.items())))
        if key not in seen:
            seen.add(key)
            out.append((caption, make_fit(*args, **kw)))

    for obj in (jr.result, jr.input):
        f = getattr(obj, "fit", None)
        if isinstance(f, str) and "/" in f:
            add(f"Tolerance zones of the fit {f}", f)
        elif f is not None and hasattr(f, "designation") and hasattr(f, "hole"):
            seen.add(f.designation)
            out.append((f"Tolerance zones of the fit {f.designation}", f))
    r = jr.result
    bore, shaft = getattr(r, "bore_mm", None), getattr(r, "shaft_class", None)
    if isinstance(bore, float | int) and isinstance(shaft, str):
        add(f"Tolerance zone of the inner-ring seat {bore:g} {shaft}", float(bore), shaft=shaft)
    outside, housing = getattr(r, "outside_mm", None), getattr(r, "housing_class", None)
    if isinstance(outside, float | int) and isinstance(housing, str):
        add(f"Tolerance zone of the outer-ring seat {outside:g} {housing}", float(outside),
            hole=housing)
    return out


def _figures(jr: JointResult, eng) -> tuple[list[tuple[str, object]], list[str]]:
    figs, errors = [], []
    try:
        from .plots.fits import plot_fit

        fits = _fits(jr)
    except ImportError:  # the limits engine is not installed: no zone diagrams
        fits, plot_fit = [], None
    except InputError as exc:
        fits, plot_fit = [], None
        errors.append(f"tolerance-zone diagram: {exc}")
    for caption, f in fits:
        try:
            figs.append((caption, plot_fit(f)))
        except Exception as exc:  # a plot must not hide the rest of the report
            errors.append(f"{caption}: {type(exc).__name__}: {exc}")
    for fn in eng.plot_functions():
        caption = fn.__name__.removeprefix("plot_").replace("_", " ").capitalize()
        try:
            figs.append((caption, fn(jr.result)))
        except Exception as exc:  # a plot must not hide the rest of the report
            errors.append(f"{caption}: {type(exc).__name__}: {exc}")
    return figs, errors


def build(result: CaseResult | DesignCase, *, plots: bool = True) -> Report:
    """The report content of an evaluated case (a :class:`DesignCase` is evaluated first)."""
    if isinstance(result, DesignCase):
        result = evaluate(result)
    case = result.case
    from .case import ENGINES

    title = {k: str(v) for k, v in case.title.to_mapping().items()}
    sections = []
    summary = []
    for jr in result.joints:
        eng = ENGINES[jr.table]
        mod = eng.load()
        figs, errs = _figures(jr, eng) if plots else ([], [])
        sections.append(JointSection(
            heading=f"{eng.label}: {jr.name}", label=jr.label,
            inputs=_inputs(jr, case, getattr(mod, "KEYS", {})),
            method=_method_steps(getattr(mod, "METHOD_NOTES", ())),
            checks=list(jr.checks), ok=jr.ok, warnings=list(jr.notes),
            figures=figs, plot_errors=errs))
        summary.extend((jr.label, eng.label, c) for c in jr.checks)
    return Report(title=title, conditions=[(k, format_value(v)) for k, v in case.conditions.items()],
                  summary=summary, sections=sections, ok=result.ok,
                  generated=_dt.datetime.now().strftime("%Y-%m-%d %H:%M"))


# --------------------------------------------------------------------------- HTML

_CSS = """
body{font-family:"DejaVu Sans",Arial,sans-serif;font-size:10.5pt;color:#111;max-width:60em;margin:2em auto;padding:0 1em}
h1{font-size:17pt;margin:.2em 0}h2{font-size:13pt;border-bottom:2px solid #345;padding-bottom:2px;margin-top:1.6em}
h3{font-size:11pt;margin:1em 0 .3em}
table{border-collapse:collapse;width:100%;margin:.4em 0}
th,td{border:1px solid #999;padding:3px 6px;text-align:left;vertical-align:top}
th{background:#e8ecf0}td.num{text-align:right;white-space:nowrap}
.caution{border:2px solid #a60;background:#fff6e5;padding:.6em .9em;margin:1em 0}
.pass{color:#075;font-weight:bold}.fail{color:#b00;font-weight:bold}
.sign td{height:2.4em}.small{font-size:9pt;color:#444}
figure{margin:.8em 0;page-break-inside:avoid}figure img{max-width:100%}
figcaption{font-size:9pt;color:#333}
@page{size:A4;margin:18mm}
"""


def _e(s) -> str:
    return html.escape(str(s), quote=True)


def _fig_png(fig) -> str:
    buf = io.BytesIO()
    fig.savefig(buf, format="png", dpi=110, bbox_inches="tight")
    return base64.b64encode(buf.getvalue()).decode("ascii")


def _checks_table(rows: list[tuple[str, Check]], with_joint: bool) -> list[str]:
    head = (["Joint"] if with_joint else []) + ["Check", "Value", "Limit", "Margin", "Verdict",
                                                "Reference"]
    out = ["<table><tr>" + "".join(f"<th>{h}</th>" for h in head) + "</tr>"]
    for joint, c in rows:
        cls = "pass" if c.passed else "fail"
        sense = "≥" if c.sense == ">=" else "≤"
        note = f'<br><span class="small">{_e(c.note)}</span>' if c.note else ""
        out.append("<tr>" + (f"<td>{_e(joint)}</td>" if with_joint else "")
                   + f"<td>{_e(c.name)}{note}</td><td class=num>{_e(format_number(c.value, c.unit))}</td>"
                   f"<td class=num>{sense} {_e(format_number(c.limit, c.unit))}</td>"
                   f"<td class=num>{_e(format_margin(c.margin))}</td>"
                   f'<td class="{cls}">{verdict(c)}</td><td>{_e(c.reference)}</td></tr>')
    out.append("</table>")
    return out


def to_html(result: CaseResult | DesignCase | Report) -> str:
    """The report as one self-contained HTML document (plots embedded as base64 PNG)."""
    rep = result if isinstance(result, Report) else build(result)
    t = rep.title
    doc_title = " — ".join(x for x in (t.get("project", ""), t.get("part", "")) if x) or "Design case"
    o = ["<!DOCTYPE html>", '<html lang="en"><head><meta charset="utf-8">',
         f"<title>{_e(doc_title)} — calculation report</title>",
         f"<style>{_CSS}</style></head><body>"]
    o.append(f"<h1>Calculation report: {_e(doc_title)}</h1>")
    o.append("<table>")
    for k in ("project", "part", "revision", "author", "date"):
        o.append(f"<tr><th style='width:12em'>{k.capitalize()}</th><td>{_e(t.get(k, ''))}</td></tr>")
    o.append(f"<tr><th>Program</th><td>fitcheck {_e(rep.version)}, generated {_e(rep.generated)}"
             "</td></tr></table>")
    o.append('<table class="sign"><tr><th style="width:12em">Role</th><th>Name</th>'
             '<th>Signature</th><th style="width:9em">Date</th></tr>')
    o.extend(f"<tr><td>{r}</td><td></td><td></td><td></td></tr>" for r in SIGNATURE_ROLES)
    o.append("</table>")
    o.append(f'<div class="caution"><b>Caution.</b> {_e(CAUTION)}<br>{_e(DEFERENCE)}</div>')
    verdict_all = "all checks pass" if rep.ok else "at least one check FAILS"
    cls = "pass" if rep.ok else "fail"
    o.append("<h2>Summary</h2>")
    o.append(f'<p>{len(rep.summary)} checks on {len(rep.sections)} joints: '
             f'<span class="{cls}">{verdict_all}</span>.</p>')
    o.extend(_checks_table([(j, c) for j, _, c in rep.summary], with_joint=True))
    o.append("<h2>Shared conditions</h2>")
    if rep.conditions:
        o.append("<table><tr><th>Key</th><th>Value</th></tr>")
        o.extend(f"<tr><td>{_e(k)}</td><td>{_e(v)}</td></tr>" for k, v in rep.conditions)
        o.append("</table>")
    else:
        o.append("<p>None given; each joint states its own.</p>")
    for i, s in enumerate(rep.sections, 1):
        o.append(f"<h2>{i}. {_e(s.heading)}</h2>")
        o.append("<h3>Inputs</h3><table><tr><th>Key</th><th>Value</th><th>Meaning</th></tr>")
        o.extend(f"<tr><td>{_e(k)}</td><td>{_e(v)}</td><td>{_e(m)}</td></tr>" for k, v, m in s.inputs)
        o.append("</table>")
        if s.method:
            o.append("<h3>Method</h3><table><tr><th>#</th><th>Step</th><th>Standard clause / "
                     "equation</th></tr>")
            o.extend(f"<tr><td>{n}</td><td>{_e(step)}</td><td>{_e(ref)}</td></tr>"
                     for n, (step, ref) in enumerate(s.method, 1))
            o.append("</table>")
        o.append("<h3>Results</h3>")
        o.extend(_checks_table([(s.label, c) for c in s.checks], with_joint=False))
        v = "all checks pass" if s.ok else "a check FAILS"
        o.append(f'<p>Verdict for {_e(s.label)}: <span class="{"pass" if s.ok else "fail"}">{v}'
                 "</span></p>")
        for w in s.warnings:
            o.append(f'<p class="small">Note: {_e(w)}</p>')
        for w in s.plot_errors:
            o.append(f'<p class="small">Plot not drawn: {_e(w)}</p>')
        for cap, fig in s.figures:
            o.append(f'<figure><img alt="{_e(cap)}" src="data:image/png;base64,{_fig_png(fig)}">'
                     f"<figcaption>{_e(s.label)}: {_e(cap)}</figcaption></figure>")
    o.append("<h2>End of calculation</h2>")
    o.append(f"<p>{len(rep.summary)} checks on {len(rep.sections)} joints: "
             f'<span class="{cls}">{verdict_all}</span>. Signatures: see the title block.</p>')
    o.append(f'<div class="caution"><b>Caution.</b> {_e(CAUTION)}<br>{_e(DEFERENCE)}</div>')
    o.append("</body></html>")
    return "\n".join(o) + "\n"


# --------------------------------------------------------------------------- PDF

_A4 = (8.27, 11.69)  # inches
_MARGIN = 0.7
_LINE = {"h1": 0.34, "h2": 0.3, "h3": 0.24, "body": 0.17, "small": 0.15}
_SIZE = {"h1": 15, "h2": 12, "h3": 10.5, "body": 8.6, "small": 7.6}
_CHAR_W = 0.52  # average glyph width / font size for DejaVu Sans (measured on report text)


class _PdfPages:
    """Flowing text pages drawn with matplotlib onto A4 figures."""

    def __init__(self, pdf, footer: str):
        self.pdf, self.footer, self.fig, self.page = pdf, footer, None, 0
        self.y = 0.0

    def _new_page(self):
        from matplotlib.figure import Figure

        self.finish_page()
        self.fig = Figure(figsize=_A4)
        self.page += 1
        self.y = _A4[1] - _MARGIN

    def finish_page(self):
        if self.fig is not None:
            self.fig.text(_MARGIN / _A4[0], 0.35 / _A4[1], f"{self.footer} — page {self.page}",
                          fontsize=7, color="0.35")
            self.pdf.savefig(self.fig)
            self.fig = None

    def _need(self, h: float):
        if self.fig is None or self.y - h < _MARGIN:
            self._new_page()

    def _text(self, x: float, s: str, style: str, **kw):
        self.fig.text(x / _A4[0], self.y / _A4[1], s, fontsize=_SIZE[style], va="top", **kw)

    def wrap(self, s: str, width_in: float, style: str = "body", bold: bool = False) -> list[str]:
        chars = max(8, int(width_in * 72 / (_SIZE[style] * _CHAR_W * (1.18 if bold else 1.0))))
        lines = []
        for para in str(s).split("\n"):
            lines.extend(textwrap.wrap(para, chars, break_on_hyphens=False) or [""])
        return lines

    def heading(self, s: str, style: str = "h2"):
        lines = self.wrap(s, _A4[0] - 2 * _MARGIN, style, bold=True)
        # keep the heading with what follows it: a table's header row and its first rows
        self._need(_LINE[style] * (len(lines) + 1) + 6 * _LINE["body"])
        self.y -= _LINE[style] * 0.5
        for ln in lines:
            self._text(_MARGIN, ln, style, weight="bold")
            self.y -= _LINE[style]
        self.y -= _LINE[style] * 0.2

    def para(self, s: str, style: str = "body", box: bool = False, keep: bool = False, **kw):
        width = _A4[0] - 2 * _MARGIN - (0.2 if box else 0)
        lines = self.wrap(s, width, style, bold=kw.get("weight") == "bold")
        if keep:
            self._need(_LINE[style] * len(lines))
        for ln in lines:
            self._need(_LINE[style])
            self._text(_MARGIN + (0.1 if box else 0), ln, style, **kw)
            self.y -= _LINE[style]
        self.y -= _LINE[style] * 0.4

    def table(self, headers: list[str] | None, rows: list[list[str]], widths: list[float],
              style: str = "body", colors: list[list[str | None]] | None = None):
        """A ruled table; ``widths`` are fractions of the text width."""
        total = _A4[0] - 2 * _MARGIN
        xs = [_MARGIN]
        for w in widths[:-1]:
            xs.append(xs[-1] + w * total)
        lh = _LINE[style]

        def draw_row(cells, bold=False, row_colors=None):
            wrapped = [self.wrap(c, w * total - 0.08, style) for c, w in zip(cells, widths, strict=True)]
            h = max(len(w) for w in wrapped) * lh + 0.06
            self._need(h + (0 if bold else lh))
            for j, (x, lines) in enumerate(zip(xs, wrapped, strict=True)):
                col = (row_colors[j] if row_colors else None) or "black"
                for k, ln in enumerate(lines):
                    self.fig.text((x + 0.04) / _A4[0], (self.y - 0.03 - k * lh) / _A4[1], ln,
                                  fontsize=_SIZE[style], va="top", color=col,
                                  weight="bold" if bold or col != "black" else "normal")
            self.y -= h
            self.fig.add_artist(_hline(self.y, 0.5 if bold else 0.3))

        self._need(lh * 3)
        self.fig.add_artist(_hline(self.y, 0.5))
        if headers:
            draw_row(headers, bold=True)
        for i, r in enumerate(rows):
            if self.y - lh * 2 < _MARGIN:
                self._new_page()
                self.fig.add_artist(_hline(self.y, 0.5))
                if headers:
                    draw_row(headers, bold=True)
            draw_row(r, row_colors=colors[i] if colors else None)
        self.y -= lh * 0.6

    def image(self, fig, caption: str, max_h: float = 3.9):
        """A plot placed in the text flow (rendered at 150 dpi), with its caption below."""
        import matplotlib.image as mpimg

        buf = io.BytesIO()
        fig.savefig(buf, format="png", dpi=150, bbox_inches="tight")
        buf.seek(0)
        img = mpimg.imread(buf, format="png")
        h_px, w_px = img.shape[:2]
        width = min(_A4[0] - 2 * _MARGIN, w_px / 150)
        height = width * h_px / w_px
        if height > max_h:
            height, width = max_h, max_h * w_px / h_px
        cap_lines = self.wrap(caption, _A4[0] - 2 * _MARGIN, "small")
        self._need(height + _LINE["small"] * (len(cap_lines) + 1))
        ax = self.fig.add_axes([_MARGIN / _A4[0], (self.y - height) / _A4[1], width / _A4[0],
                                height / _A4[1]])
        ax.imshow(img, interpolation="lanczos")
        ax.set_axis_off()
        self.y -= height + 0.05
        for ln in cap_lines:
            self._text(_MARGIN, ln, "small", fontstyle="italic")
            self.y -= _LINE["small"]
        self.y -= _LINE["small"]


def _hline(y: float, lw: float):
    from matplotlib.lines import Line2D

    return Line2D([_MARGIN / _A4[0], 1 - _MARGIN / _A4[0]], [y / _A4[1]] * 2, lw=lw, color="0.3")


def _check_rows(rows, with_joint, notes=True):
    out, colors = [], []
    for joint, c in rows:
        sense = "≥" if c.sense == ">=" else "≤"
        name = c.name + (f" ({c.note})" if c.note and notes else "")
        r = [name, format_number(c.value, c.unit), f"{sense} {format_number(c.limit, c.unit)}",
             format_margin(c.margin), verdict(c), c.reference]
        col = [None, None, None, None, "#075" if c.passed else "#b00", None]
        if with_joint:
            r, col = [joint, *r], [None, *col]
        out.append(r)
        colors.append(col)
    return out, colors


def to_pdf(result: CaseResult | DesignCase | Report, path: str | os.PathLike | io.BufferedIOBase):
    """Write the report as a PDF (text pages and vector plots drawn with matplotlib)."""
    import matplotlib
    from matplotlib.backends.backend_pdf import PdfPages

    rep = result if isinstance(result, Report) else build(result)
    t = rep.title
    doc_title = " — ".join(x for x in (t.get("project", ""), t.get("part", "")) if x) or "Design case"
    footer = f"{doc_title}, rev. {t.get('revision', '-') or '-'}"
    with matplotlib.rc_context({"pdf.fonttype": 42, "ps.fonttype": 42,
                                "font.family": "DejaVu Sans"}), PdfPages(path) as pdf:
        info = pdf.infodict()
        info["Title"] = f"Calculation report: {doc_title}"
        info["Author"] = t.get("author", "")
        info["Creator"] = f"fitcheck {rep.version}"
        w = _PdfPages(pdf, footer)
        w.heading(f"Calculation report: {doc_title}", "h1")
        w.table(None, [[k.capitalize(), t.get(k, "")] for k in
                           ("project", "part", "revision", "author", "date")]
                + [["Program", f"fitcheck {rep.version}, generated {rep.generated}"]], [0.25, 0.75])
        w.table(["Role", "Name", "Signature", "Date"],
                [[r, "\n\n", "", ""] for r in SIGNATURE_ROLES], [0.25, 0.3, 0.3, 0.15])
        w.para("CAUTION. " + CAUTION, box=True, keep=True, weight="bold", color="#840")
        w.para(DEFERENCE, box=True, keep=True)
        w.heading("Summary")
        verdict_all = "all checks pass" if rep.ok else "at least one check FAILS"
        w.para(f"{len(rep.summary)} checks on {len(rep.sections)} joints: {verdict_all}.",
               weight="bold", color="#075" if rep.ok else "#b00")
        rows, colors = _check_rows([(j, c) for j, _, c in rep.summary], True, notes=False)
        w.table(["Joint", "Check", "Value", "Limit", "Margin", "Verdict", "Reference"], rows,
                [0.16, 0.22, 0.11, 0.12, 0.1, 0.07, 0.22], "small", colors)
        w.heading("Shared conditions")
        if rep.conditions:
            w.table(["Key", "Value"], [list(kv) for kv in rep.conditions], [0.35, 0.65])
        else:
            w.para("None given; each joint states its own.")
        for i, s in enumerate(rep.sections, 1):
            w.heading(f"{i}. {s.heading}")
            w.heading("Inputs", "h3")
            w.table(["Key", "Value", "Meaning"], [list(r) for r in s.inputs], [0.25, 0.3, 0.45],
                    "small")
            if s.method:
                w.heading("Method", "h3")
                w.table(["#", "Step", "Standard clause / equation"],
                        [[str(n), st, ref] for n, (st, ref) in enumerate(s.method, 1)],
                        [0.05, 0.55, 0.4], "small")
            w.heading("Results", "h3")
            rows, colors = _check_rows([(s.label, c) for c in s.checks], False)
            w.table(["Check", "Value", "Limit", "Margin", "Verdict", "Reference"], rows,
                    [0.27, 0.13, 0.14, 0.1, 0.08, 0.28], "small", colors)
            w.para(f"Verdict for {s.label}: {'all checks pass' if s.ok else 'a check FAILS'}",
                   weight="bold", color="#075" if s.ok else "#b00")
            for msg in s.warnings:
                w.para("Note: " + msg, "small")
            for msg in s.plot_errors:
                w.para("Plot not drawn: " + msg, "small")
            if s.figures:
                w.heading("Plots", "h3")
            for n, (cap, fig) in enumerate(s.figures, 1):
                w.image(fig, f"Figure {i}.{n}. {s.label}: {cap}")
        w.heading("End of calculation")
        w.para(f"{len(rep.summary)} checks on {len(rep.sections)} joints: {verdict_all}. "
               "Signatures: see the title block on page 1.")
        w.para("CAUTION. " + CAUTION, box=True, keep=True, weight="bold", color="#840")
        w.para(DEFERENCE, box=True, keep=True)
        w.finish_page()


def write(result: CaseResult | DesignCase, path: str | os.PathLike) -> Path:
    """Write the report to ``path``; the format follows the suffix (.html / .htm / .pdf).

    The file is written next to its final place and renamed into it, so a failed
    run never leaves half a report.
    """
    p = Path(path)
    suffix = p.suffix.lower()
    if suffix not in FORMATS:
        raise InputError("output", str(path), "a file name ending in .html, .htm or .pdf")
    if not p.parent.is_dir():
        raise InputError("output", str(path), "a path in an existing folder")
    rep = result if isinstance(result, Report) else build(result)
    try:  # an exclusive temporary file with an unpredictable name, renamed into place
        if suffix == ".pdf":
            atomic_write(p, lambda f: to_pdf(rep, f))
        else:
            atomic_write(p, lambda f: f.write(to_html(rep).encode("utf-8")))
    finally:
        rep.close()
    return p
