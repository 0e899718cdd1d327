"""The report as one self-contained HTML page, from a Jinja2 template with print CSS.

Autoescaping is on: every user string (title block, joint names, inputs) is
escaped. Plots are embedded as base64 PNG; nothing is fetched from elsewhere.
Printing the page from a browser gives A4 pages with repeated table headers,
headings kept with what follows and page numbers.
"""

from __future__ import annotations

import base64
import functools
import importlib.resources
import re

from markupsafe import Markup, escape

__all__ = ["render"]

_SUB = re.compile(r"(?<![\w])([A-Za-zαβδΔεϑθμνσφτω]{1,3})_([A-Za-z0-9,.]{1,12})(?![\w])")


def subscripts(text) -> Markup:
    """Escape a text and set symbol subscripts (``Rz_shaft`` → Rz<sub>shaft</sub>)."""
    return Markup(_SUB.sub(r"\1<sub>\2</sub>", str(escape(text))))


@functools.cache
def _env():
    import jinja2

    env = jinja2.Environment(
        loader=jinja2.PackageLoader("fitcheck.report", "templates"),
        autoescape=True, trim_blocks=False, lstrip_blocks=False,
        undefined=jinja2.StrictUndefined)
    env.filters["b64"] = lambda b: base64.b64encode(b).decode("ascii")
    env.filters["sub"] = subscripts
    return env


@functools.cache
def _css() -> str:
    return importlib.resources.files("fitcheck.report").joinpath("templates/report.css").read_text(
        "utf-8")


def render(rep) -> str:
    """HTML text of a :class:`~fitcheck.report.model.Report`."""
    text = _env().get_template("report.html.j2").render(r=rep, css=Markup(_css()))
    return text.lstrip() + ("" if text.endswith("\n") else "\n")
