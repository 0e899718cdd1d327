"""Calculation reports of a design case, as one self-contained HTML page or a PDF.

A report is what a reviewer signs. Page 1 holds the title block and, joint by
joint, the decisions that go on the drawing ("For the drawing": fits with their
limits of size, press-in force or heating temperature, bearing seat classes and
clearance group, the tightening torque as a wrench setting). Then the
signatures, the caution and the deference to standards, local codes and
licensed professional practice, the summary of every check, the shared
conditions, and for each joint its inputs in words with their units, the method
steps with their clauses, the checks (value, limit, margin, verdict, reference),
notes and plots. The caution ends the report and runs along the foot of every
PDF page.

Both formats come from one document model (:func:`build` → :class:`Report`,
every text already worded and in the case's unit system): HTML from a Jinja2
template with print CSS, PDF from reportlab's platypus layout engine.
"""

from __future__ import annotations

import io
import math
import os
from pathlib import Path

from ..display import margin_text
from ..errors import InputError
from .model import (
    DEFERENCE,
    SIGNATURE_ROLES,
    CheckRow,
    DrawingBlock,
    InputRow,
    Report,
    Section,
    build,
    method_steps,
)
from .words import unit_words

__all__ = ["DEFERENCE", "FORMATS", "SIGNATURE_ROLES", "CheckRow", "DrawingBlock", "InputRow",
           "Report", "Section", "build", "format_margin", "format_number", "to_html", "to_pdf",
           "write"]

FORMATS = (".html", ".htm", ".pdf")

_method_steps = method_steps  # the name earlier callers used


def _report(result) -> Report:
    return result if isinstance(result, Report) else build(result)


def to_html(result) -> str:
    """The report as one self-contained HTML document (plots embedded as base64 PNG)."""
    from .html import render

    return render(_report(result))


def to_pdf(result, path: str | os.PathLike | io.BufferedIOBase) -> None:
    """Write the report as a PDF (reportlab platypus; plots as images) to a path or binary stream."""
    from .pdf import write_pdf

    write_pdf(_report(result), path)


def write(result, path: str | os.PathLike) -> Path:
    """Write the report to ``path``; the format follows the suffix (.html / .htm / .pdf).

    The file is written to an exclusive temporary file next to its final place and renamed
    into it, so a failed run never leaves half a report.
    """
    p = Path(path)
    suffix = p.suffix.lower()
    if suffix not in FORMATS:
        raise InputError("output", str(path), "a file name ending in .html, .htm or .pdf")
    if not p.parent.is_dir():
        raise InputError("output", str(path), "a path in an existing folder")
    from ..safefile import atomic_write

    rep = _report(result)
    # an exclusive temporary file with an unpredictable name, renamed into place
    if suffix == ".pdf":
        atomic_write(p, lambda f: to_pdf(rep, f))
    else:
        atomic_write(p, lambda f: f.write(to_html(rep).encode("utf-8")))
    return p


def format_number(x, unit: str = "") -> str:
    """A value with its printed unit, for the command line (``format_number(2.5, "um")``)."""
    from ..units import plain

    try:
        xf = float(x)
    except (TypeError, ValueError):
        return str(x)
    u = f" {unit_words(unit)}" if unit else ""
    if math.isnan(xf):
        return "n/a"
    if math.isinf(xf):
        return ("∞" if xf > 0 else "−∞") + u
    return plain(xf) + u


def format_margin(m: float) -> str:
    """A margin as people read it (:func:`fitcheck.display.margin_text`)."""
    return margin_text(m)
