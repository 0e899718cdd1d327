"""The report as a PDF, laid out by reportlab's platypus from the same document model as the HTML.

Text flows in paragraphs and tables whose cells wrap on word boundaries (a word
is never split); headings stay with what follows; long tables repeat their
header row on the next page; every page carries the running title, the
caution and "page n of N". Fonts are DejaVu Sans (shipped with matplotlib),
embedded as TrueType, so the text can be searched and copied and µ, °, ≤, σ print.
"""

from __future__ import annotations

import functools
import io
import os
import re
from pathlib import Path
from xml.sax.saxutils import escape

__all__ = ["write_pdf"]

FONT = "FitcheckSans"
_SUB = re.compile(r"(?<![\w])([A-Za-zαβδΔεϑθμνσφτω]{1,3})_([A-Za-z0-9,.]{1,12})(?![\w])")
PASS_COLOR, FAIL_COLOR, CAUTION_COLOR = "#007755", "#bb0000", "#884400"


@functools.cache
def _fonts() -> str:
    """Register DejaVu Sans (regular, bold, italic) once; returns the family name."""
    import importlib.util

    from reportlab.lib.fonts import addMapping
    from reportlab.pdfbase import pdfmetrics
    from reportlab.pdfbase.ttfonts import TTFont

    # matplotlib's data folder, found without importing matplotlib
    spec = importlib.util.find_spec("matplotlib")
    d = Path(next(iter(spec.submodule_search_locations))) / "mpl-data" / "fonts" / "ttf"
    faces = {"": "DejaVuSans.ttf", "-Bold": "DejaVuSans-Bold.ttf",
             "-Oblique": "DejaVuSans-Oblique.ttf", "-BoldOblique": "DejaVuSans-BoldOblique.ttf"}
    for suffix, file in faces.items():
        pdfmetrics.registerFont(TTFont(FONT + suffix, str(d / file)))
    addMapping(FONT, 0, 0, FONT)
    addMapping(FONT, 1, 0, FONT + "-Bold")
    addMapping(FONT, 0, 1, FONT + "-Oblique")
    addMapping(FONT, 1, 1, FONT + "-BoldOblique")
    return FONT


def _x(text, subs: bool = False) -> str:
    """Paragraph markup of a plain text (escaped; symbol subscripts when asked)."""
    t = escape(str(text))
    if subs:
        t = _SUB.sub(r"\1<sub>\2</sub>", t)
    return t.replace("\n", "<br/>")


@functools.cache
def _styles():
    from reportlab.lib import colors
    from reportlab.lib.styles import ParagraphStyle

    f = _fonts()
    base = ParagraphStyle("body", fontName=f, fontSize=8.6, leading=11, splitLongWords=0,
                          embeddedHyphenation=0)
    s = {
        "body": base,
        "small": ParagraphStyle("small", parent=base, fontSize=7.6, leading=9.6),
        "cell": ParagraphStyle("cell", parent=base, fontSize=7.6, leading=9.4),
        "cellb": ParagraphStyle("cellb", parent=base, fontSize=7.6, leading=9.4,
                                fontName=f + "-Bold"),
        "head": ParagraphStyle("head", parent=base, fontSize=7.6, leading=9.4,
                               fontName=f + "-Bold"),
        "num": ParagraphStyle("num", parent=base, fontSize=7.6, leading=9.4, alignment=2),
        "h1": ParagraphStyle("h1", parent=base, fontName=f + "-Bold", fontSize=15, leading=19,
                             spaceAfter=6, keepWithNext=1),
        "h2": ParagraphStyle("h2", parent=base, fontName=f + "-Bold", fontSize=12, leading=15,
                             spaceBefore=10, spaceAfter=4, keepWithNext=1,
                             borderPadding=(0, 0, 2, 0)),
        "h3": ParagraphStyle("h3", parent=base, fontName=f + "-Bold", fontSize=9.8, leading=12.5,
                             spaceBefore=6, spaceAfter=2, keepWithNext=1),
        "caption": ParagraphStyle("caption", parent=base, fontName=f + "-Oblique", fontSize=7.6,
                                  leading=9.6, spaceAfter=6),
        "caution": ParagraphStyle("caution", parent=base, borderColor=colors.HexColor("#aa6600"),
                                  borderWidth=1.2, borderPadding=5,
                                  backColor=colors.HexColor("#fff6e5"), spaceBefore=8,
                                  spaceAfter=10),
        "footer": ParagraphStyle("footer", parent=base, fontSize=6.4, leading=7.8,
                                 textColor=colors.HexColor("#555555")),
    }
    return s


def _p(text, style="cell", subs=False, color=None):
    t = _x(text, subs)
    if color:
        t = f'<font color="{color}">{t}</font>'
    return _Para(t, _styles()[style])


@functools.cache
def _para_class():
    from reportlab.platypus import Paragraph

    class Para(Paragraph):
        """A paragraph that remembers its last wrap: a table wraps each cell when it measures
        the rows, again when it draws them and again when it splits across a page."""

        def wrap(self, availWidth, availHeight):
            if getattr(self, "_wrapped_at", None) == availWidth:
                return self.width, self.height
            out = super().wrap(availWidth, availHeight)
            self._wrapped_at = availWidth
            return out

        def split(self, availWidth, availHeight):
            self._wrapped_at = None
            return super().split(availWidth, availHeight)

    return Para


def _Para(markup, style):
    return _para_class()(markup, style)


class _Cell:
    """A table cell's text before its column width is known: set as a plain string when it
    fits on one line (cheap to measure and draw), else as a wrapping paragraph."""

    __slots__ = ("text", "style", "subs", "color")

    def __init__(self, text, style="cell", subs=False, color=None):
        self.text, self.style, self.subs, self.color = str(text), style, subs, color


_PAD = 3  # left and right padding of a table cell [pt]


def _resolve(cell, col, row, width, cmds):
    """A table cell as a plain string (with its style commands) or a paragraph."""
    if not isinstance(cell, _Cell):
        return cell
    from reportlab.pdfbase.pdfmetrics import stringWidth

    st = _styles()[cell.style]
    text = cell.text
    plain = "\n" not in text and not (cell.subs and _SUB.search(text))
    if plain and stringWidth(text, st.fontName, st.fontSize) <= width - 2 * _PAD - 0.5:
        here = ((col, row), (col, row))
        if st.fontName != FONT:
            cmds.append(("FONTNAME", *here, st.fontName))
        if st.alignment == 2:
            cmds.append(("ALIGN", *here, "RIGHT"))
        if cell.color:
            cmds.append(("TEXTCOLOR", *here, cell.color))
        return text
    return _p(text, cell.style, cell.subs, cell.color)


def _table(head, rows, widths, row_heights=None):
    """A ruled table of word-wrapped cells, header repeated on each page.

    Cells given as :class:`_Cell` that fit their column on one line are set as plain strings
    (all table cells share the font size and leading of the "cell" style)."""
    from reportlab.lib import colors
    from reportlab.platypus import Table, TableStyle

    cell = _styles()["cell"]
    cmds = []
    data = ([[_Cell(h, "head") for h in head]] if head else []) + rows
    data = [[_resolve(c, j, i, widths[j], cmds) for j, c in enumerate(r)]
            for i, r in enumerate(data)]
    t = Table(data, colWidths=widths, repeatRows=1 if head else 0, hAlign="LEFT",
              splitByRow=1, rowHeights=row_heights)
    style = [
        ("GRID", (0, 0), (-1, -1), 0.4, colors.HexColor("#999999")),
        ("VALIGN", (0, 0), (-1, -1), "TOP"),
        ("FONT", (0, 0), (-1, -1), cell.fontName, cell.fontSize, cell.leading),
        ("LEFTPADDING", (0, 0), (-1, -1), _PAD), ("RIGHTPADDING", (0, 0), (-1, -1), _PAD),
        ("TOPPADDING", (0, 0), (-1, -1), 2), ("BOTTOMPADDING", (0, 0), (-1, -1), 3),
    ]
    if head:
        style.append(("BACKGROUND", (0, 0), (-1, 0), colors.HexColor("#e8ecf0")))
    t.setStyle(TableStyle(style + cmds))
    return t


def _check_table(rows, width, with_joint):
    out = []
    for c in rows:
        color = PASS_COLOR if c.passed else FAIL_COLOR
        name = _Cell(c.name)
        if c.note and not with_joint:
            name = _Para(f"{_x(c.name)}<br/><font size='6.8' color='#444444'>"
                         f"{_x(c.note, subs=True)}</font>", _styles()["cell"])
        cells = [name, _Cell(c.value, "num"), _Cell(c.limit, "num"), _Cell(c.margin, "num"),
                 _Cell(c.verdict, "cellb", color=color), _Cell(c.reference)]
        if with_joint:
            cells = [_Cell(c.joint), *cells]
        out.append(cells)
    if with_joint:
        fr = [0.13, 0.23, 0.11, 0.12, 0.09, 0.07, 0.25]
        head = ["Joint", "Check", "Value", "Limit", "Margin", "Verdict", "Reference"]
    else:
        fr = [0.33, 0.12, 0.12, 0.09, 0.07, 0.27]
        head = ["Check", "Value", "Limit", "Margin", "Verdict", "Reference"]
    return _table(head, out, [f * width for f in fr])


def _image(fig, caption, width, heading=None):
    """A plot as a flowable: a vector Drawing for a chart, else the PNG as an image."""
    from reportlab.platypus import Image, KeepTogether

    w_pt = min(width * 0.7, fig.width_px / 120 * 72 * 0.8)
    if fig.chart is not None:
        from .chart import to_drawing

        w_pt = min(width * 0.72, fig.chart.width * 1.0)
        if w_pt * fig.aspect > 230:
            w_pt = 230 / fig.aspect
        img = to_drawing(fig.chart, w_pt)
    else:
        h_pt = w_pt * fig.aspect
        if h_pt > 230:
            h_pt, w_pt = 230, 230 / fig.aspect
        img = Image(io.BytesIO(fig.png), width=w_pt, height=h_pt)
    img.hAlign = "LEFT"
    return KeepTogether(([heading] if heading is not None else []) + [img, _p(caption, "caption")])


def _story(rep, width):
    from reportlab.platypus import PageBreak, Paragraph, Spacer

    st = _styles()
    story = [_p(f"Calculation report: {rep.doc_title}", "h1")]
    t = rep.title
    rows = [[_Cell(k.capitalize(), "cellb"), _Cell(t.get(k, ""))]
            for k in ("project", "part", "revision", "author", "date")]
    rows.append([_Cell("Program", "cellb"),
                 _Cell(f"fitcheck {rep.version}, generated {rep.generated}")])
    story.append(_table(None, rows, [0.18 * width, 0.82 * width]))
    color = PASS_COLOR if rep.ok else FAIL_COLOR
    story.append(Spacer(1, 4))
    story.append(_p(f"{rep.count_line}: {rep.verdict}.", "body", color=color))
    story.append(_p("For the drawing", "h2"))
    story.append(_p("What this calculation hands to the drawing and the assembly instruction, "
                    "joint by joint. " + rep.units_line, "small"))
    for b in rep.drawing:
        story.append(_p(b.heading + ("" if b.ok else " (a check FAILS)"), "h3"))
        if b.items:
            rows = [[_Cell(i.item), _Cell(i.decision, "cellb"), _Cell(i.basis)] for i in b.items]
            story.append(_table(["Item", "Decision", "Basis"], rows,
                                [0.3 * width, 0.33 * width, 0.37 * width]))
        else:
            story.append(_p("No drawing decision from this kind of joint; see its section.",
                            "small"))
    story.append(PageBreak())

    story.append(_p("Review and signatures", "h2"))
    story.append(_table(["Role", "Name", "Signature", "Date"],
                        [[_Cell(r), _Cell(" "), _Cell(" "), _Cell(" ")] for r in rep.signature_roles],
                        [0.22 * width, 0.31 * width, 0.31 * width, 0.16 * width],
                        [None] + [26] * len(rep.signature_roles)))
    story.append(Paragraph(f'<font color="{CAUTION_COLOR}"><b>Caution.</b></font> '
                           f"{_x(rep.caution)}<br/>{_x(rep.deference)}", st["caution"]))
    story.append(_p("Summary of the checks", "h2"))
    story.append(_p(f"{rep.count_line}: {rep.verdict}.", "body", color=color))
    story.append(Spacer(1, 3))
    story.append(_check_table(rep.summary, width, True))
    story.append(_p("Shared conditions", "h2"))
    if rep.conditions:
        story.append(_table(["Condition", "Value"],
                            [[_Cell(c.name, subs=True), _Cell(c.value)] for c in rep.conditions],
                            [0.5 * width, 0.5 * width]))
    else:
        story.append(_p("None given; each joint states its own.", "body"))

    for s in rep.sections:
        story.append(_p(f"{s.number}. {s.heading}", "h2"))
        story.append(_p("Inputs", "h3"))
        story.append(_table(["Input", "Value", "From"],
                            [[_Cell(i.name, subs=True), _Cell(i.value), _Cell(i.source, "small")]
                             for i in s.inputs],
                            [0.42 * width, 0.42 * width, 0.16 * width]))
        if s.method:
            story.append(_p("Method", "h3"))
            story.append(_table(["#", "Step", "Standard clause / equation"],
                                [[_Cell(str(n)), _Cell(step, subs=True), _Cell(ref)]
                                 for n, (step, ref) in enumerate(s.method, 1)],
                                [0.05 * width, 0.6 * width, 0.35 * width]))
        story.append(_p("Results", "h3"))
        story.append(_check_table(s.checks, width, False))
        story.append(Spacer(1, 3))
        story.append(_p(f"Verdict for {s.heading}: "
                        + ("all checks pass." if s.ok else "a check FAILS."), "body",
                        color=PASS_COLOR if s.ok else FAIL_COLOR))
        for n in s.notes:
            story.append(_p("Note: " + n, "small"))
        for e in s.plot_errors:
            story.append(_p("Plot not drawn: " + e, "small"))
        for k, f in enumerate(s.figures, 1):  # the heading travels with the first plot
            story.append(_image(f, f"Figure {s.number}.{k}. {s.heading}: {f.caption}", width,
                                _p("Plots", "h3") if k == 1 else None))
    story.append(_p("End of calculation", "h2"))
    story.append(_p(f"{rep.count_line}: {rep.verdict}. Signatures: see “Review and signatures” "
                    "on page 2.", "body", color=color))
    story.append(Paragraph(f'<font color="{CAUTION_COLOR}"><b>Caution.</b></font> '
                           f"{_x(rep.caution)}<br/>{_x(rep.deference)}", st["caution"]))
    return story


def _numbered_canvas(footer_title: str, caution: str):
    from reportlab.lib.units import mm
    from reportlab.pdfgen import canvas
    from reportlab.platypus import Paragraph

    @functools.cache
    def footer_text(width):  # the caution is laid out once and drawn on every page
        p = Paragraph(f"<b>Caution.</b> {_x(caution)}", _styles()["footer"])
        return p, p.wrap(width, 20 * mm)[1]

    class NumberedCanvas(canvas.Canvas):
        """Draws the running footer with "page n of N" once the page count is known."""

        def __init__(self, *a, **k):
            super().__init__(*a, **k)
            self._saved = []

        def showPage(self):
            self._saved.append(dict(self.__dict__))
            self._startPage()

        def save(self):
            total = len(self._saved)
            for state in self._saved:
                self.__dict__.update(state)
                self._footer(total)
                super().showPage()
            super().save()

        def _footer(self, total):
            w, _ = self._pagesize
            self.saveState()
            self.setStrokeColorRGB(0.6, 0.6, 0.6)
            self.setLineWidth(0.4)
            self.line(16 * mm, 23 * mm, w - 16 * mm, 23 * mm)
            p, h = footer_text(w - 32 * mm)
            p.drawOn(self, 16 * mm, 22 * mm - h)
            self.setFont(FONT, 7)
            self.setFillColorRGB(0.3, 0.3, 0.3)
            self.drawString(16 * mm, 8 * mm, footer_title)
            self.drawRightString(w - 16 * mm, 8 * mm, f"page {self._pageNumber} of {total}")
            self.restoreState()

    return NumberedCanvas


def write_pdf(rep, path: str | os.PathLike | io.BufferedIOBase) -> None:
    """Lay the report out on A4 pages and write it to ``path`` (a file name or a binary stream)."""
    from reportlab import rl_config
    from reportlab.lib.pagesizes import A4
    from reportlab.lib.units import mm
    from reportlab.platypus import SimpleDocTemplate

    rl_config.useA85 = 0  # binary streams: smaller, and the pure-Python ASCII85 encoder is slow
    _fonts()
    t = rep.title
    footer = f"{rep.doc_title}, rev. {t.get('revision', '-') or '-'} — calculation report"
    target = path if hasattr(path, "write") else str(path)
    doc = SimpleDocTemplate(target, pagesize=A4, leftMargin=16 * mm, rightMargin=16 * mm,
                            topMargin=14 * mm, bottomMargin=30 * mm,
                            title=f"Calculation report: {rep.doc_title}",
                            author=t.get("author", ""), creator=f"fitcheck {rep.version}",
                            subject="Calculation report (engineering estimate: verify by test)")
    doc.build(_story(rep, doc.width), canvasmaker=_numbered_canvas(footer, rep.caution))
