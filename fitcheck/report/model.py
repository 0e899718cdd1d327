"""The document model of a calculation report: every text already in words, units and the case's system.

:func:`build` turns an evaluated case into a :class:`Report` whose fields are
plain strings (and placed vector charts or PNG bytes for the plots); the HTML template and the PDF
layout only arrange them, so both formats say the same thing.

What an engine adds later appears without a change here: inputs come from the
input's ``to_mapping()`` and are named from the engine's ``KEYS``; method steps
from ``METHOD_NOTES``; checks from ``result.checks`` (a field added to
:class:`~fitcheck.checks.Check` is printed with the check's note); notes from the
result's ``notes``/``warnings``; plots from the engine's registry entry.
"""

from __future__ import annotations

import dataclasses
import datetime as _dt
import math
from collections.abc import Mapping, Sequence
from dataclasses import dataclass, field

from .. import CAUTION, __version__
from ..checks import Check
from ..display import margin_text, show_in, text_in_system
from ..errors import InputError
from . import figures as _figures
from .drawing import DrawingItem, decisions
from .words import input_name, prose, unit_words, value_text

__all__ = ["CheckRow", "DrawingBlock", "InputRow", "Report", "Section", "build"]

DEFERENCE = (
    "This calculation supports, and does not replace, the engineering judgement of a qualified "
    "person. Where it differs from an applicable standard, a local code or regulation, or licensed "
    "professional practice, those govern. Verify critical joints by test on parts made to drawing."
)

SIGNATURE_ROLES = ("Calculated by", "Checked by", "Approved by")

_CHECK_FIELDS = {"name", "value", "limit", "sense", "unit", "reference", "note"}


@dataclass(frozen=True)
class InputRow:
    name: str
    value: str
    source: str = ""


@dataclass(frozen=True)
class CheckRow:
    joint: str
    name: str
    value: str
    limit: str
    margin: str
    passed: bool
    reference: str
    note: str = ""

    @property
    def verdict(self) -> str:
        return "pass" if self.passed else "FAIL"


@dataclass
class DrawingBlock:
    heading: str
    items: list[DrawingItem]
    ok: bool


@dataclass
class Section:
    number: int
    kind: str
    name: str
    inputs: list[InputRow]
    method: list[tuple[str, str]]
    checks: list[CheckRow]
    ok: bool
    notes: list[str]
    figures: list[_figures.Figure] = field(default_factory=list)
    plot_errors: list[str] = field(default_factory=list)

    @property
    def heading(self) -> str:
        return f"{self.kind} “{self.name}”"


@dataclass
class Report:
    """The content of a calculation report, independent of the output format."""

    title: dict[str, str]
    system: str
    drawing: list[DrawingBlock]
    conditions: list[InputRow]
    summary: list[CheckRow]
    sections: list[Section]
    ok: bool
    generated: str
    version: str = __version__
    caution: str = CAUTION
    deference: str = DEFERENCE
    signature_roles: tuple[str, ...] = SIGNATURE_ROLES

    @property
    def doc_title(self) -> str:
        t = self.title
        return " — ".join(x for x in (t.get("project", ""), t.get("part", "")) if x) or "Design case"

    @property
    def verdict(self) -> str:
        return "all checks pass" if self.ok else "at least one check FAILS"

    @property
    def count_line(self) -> str:
        n, j = len(self.summary), len(self.sections)
        return f"{n} check{'s' if n != 1 else ''} on {j} joint{'s' if j != 1 else ''}"

    @property
    def units_line(self) -> str:
        return ("Units: inch system (in, lbf, ksi, lbf·in, °F); inputs as written in the case file "
                "are shown beside their conversion." if self.system == "inch" else
                "Units: SI (mm, µm, N, MPa, N·m, °C).")

    def close(self) -> None:
        """Kept for callers of earlier versions: the plots are PNG bytes, nothing to release."""


# --------------------------------------------------------------------------- pieces

def method_steps(notes) -> list[tuple[str, str]]:
    """``METHOD_NOTES`` of an engine as (step, clause) pairs, whatever shape each note has."""
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


def quantity_text(x, unit: str, system: str) -> str:
    """A check's value or limit in the case's system (``∞`` for an unbounded limit)."""
    try:
        xf = float(x)
    except (TypeError, ValueError):
        return prose(str(x))
    if math.isnan(xf):
        return "n/a"
    if math.isinf(xf):
        return "∞" if xf > 0 else "−∞"
    try:
        return show_in(xf, unit, system)
    except Exception:  # a unit the registry does not know: print it as given
        return f"{xf:.4g} {unit_words(unit)}".strip()


def check_margin(c: Check) -> str:
    m = c.margin
    if math.isinf(m) and m > 0 and float(c.limit) == 0.0:
        return "—"  # a relative margin against a zero limit says nothing
    return margin_text(m)


def check_row(joint: str, c: Check, system: str, names: Mapping[str, str]) -> CheckRow:
    sense = "≥" if c.sense == ">=" else "≤"
    notes = [prose(c.note, names)] if c.note else []
    if dataclasses.is_dataclass(c):
        for f in dataclasses.fields(c):  # fields other helpers add later (state, clause …)
            if f.name in _CHECK_FIELDS:
                continue
            v = getattr(c, f.name, None)
            if v not in (None, "", (), []):
                notes.append(f"{f.name.replace('_', ' ')}: {prose(value_text(v, system), names)}")
    return CheckRow(joint=joint, name=prose(c.name, names),
                    value=quantity_text(c.value, c.unit, system),
                    limit=f"{sense} {quantity_text(c.limit, c.unit, system)}",
                    margin=check_margin(c), passed=bool(c.passed),
                    reference=prose(c.reference, names),
                    note="; ".join(text_in_system(n, system) for n in notes))


def _inputs(jr, case, keys, system: str, names) -> list[InputRow]:
    rows = []
    for k, v in jr.input.to_mapping().items():
        if v is None or k == "name":
            continue
        source = ""
        if k in case.conditions and case.conditions[k] == v:
            source = "shared conditions"
        rows.append(InputRow(input_name(k, keys), value_text(v, system, names), source))
    return rows


def _all_names() -> dict[str, str]:
    """Every key of every engine (and the shared conditions) → its name in words."""
    from ..case import CONDITION_KEYS, ENGINES

    out = {k: input_name(k) for k in CONDITION_KEYS}
    for eng in ENGINES.values():
        try:
            keys = getattr(eng.load(), "KEYS", {})
        except Exception:  # an engine not installed: its keys cannot appear
            continue
        for k in keys:
            out.setdefault(k, input_name(k, keys))
    return out


def _fit_figures(jr):
    """ISO 286 fits a joint states, for the tolerance-zone diagrams: ``[(caption, Fit), …]``."""
    from ..fits import fit as make_fit

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
    r = jr.result
    bore, shaft = getattr(r, "bore_mm", None), getattr(r, "shaft_class", None)
    if isinstance(bore, float | int) and isinstance(shaft, str):
        add(f"Tolerance zone of the inner-ring seat Ø{bore:g} {shaft}", float(bore), shaft=shaft)
    outside, housing = getattr(r, "outside_mm", None), getattr(r, "housing_class", None)
    if isinstance(outside, float | int) and isinstance(housing, str):
        add(f"Tolerance zone of the outer-ring seat Ø{outside:g} {housing}", float(outside),
            hole=housing)
    return out


def _plots(jr, eng, system: str) -> tuple[list[_figures.Figure], list[str]]:
    """The joint's plots: vector charts where :mod:`.charts` has a builder, else matplotlib PNG."""
    from . import charts

    figs, errors = [], []
    try:
        fits = _fit_figures(jr)
    except ImportError:  # the limits engine is not installed: no zone diagrams
        fits = []
    except InputError as exc:
        fits = []
        errors.append(f"tolerance-zone diagram: {exc}")
    for caption, f in fits:
        try:
            figs.append(_figures.from_chart(charts.fit_chart(f, system), caption))
        except Exception as exc:  # a plot must not hide the rest of the report
            errors.append(f"{caption}: {type(exc).__name__}: {exc}")
    specs = getattr(eng, "plots", None)
    # a plot with a chart builder is drawn without importing its matplotlib module
    todo = ([charts.BUILDERS.get(spec) or spec for spec in specs] if specs is not None
            else eng.plot_functions())
    for item in todo:
        if isinstance(item, str):  # "module:function" of a matplotlib plot without a builder
            mod_name, _, fn_name = item.partition(":")
            try:
                import importlib

                item = getattr(importlib.import_module(mod_name), fn_name)
            except (ImportError, AttributeError):  # a missing plot module is skipped
                continue
        name = getattr(item, "plot_name", None) or item.__name__
        caption = name.removeprefix("plot_").replace("_", " ").capitalize()
        try:
            make = item if getattr(item, "plot_name", None) else charts.builder(item)
            if make is not None:
                figs.append(_figures.from_chart(make(jr.result, system), caption))
            else:
                fig, converted = _figures.draw(item, jr.result, system)
                figs.append(_figures.render(fig, caption, system, converted))
        except Exception as exc:  # a plot must not hide the rest of the report
            errors.append(f"{caption}: {type(exc).__name__}: {exc}")
    return figs, errors


def _sources(result, names) -> list[str]:
    """Where a result took a value from (fields named ``*_source``), cited for the reviewer."""
    out = []
    if dataclasses.is_dataclass(result):
        for f in dataclasses.fields(result):
            v = getattr(result, f.name, None)
            if f.name.endswith("source") and isinstance(v, str) and v:
                what = f.name.removesuffix("_source").replace("_", " ")
                what = "friction coefficients" if what == "friction" else what
                out.append(f"Source of the {what}: {prose(v, names)}")
    return out


# --------------------------------------------------------------------------- build

def build(result, *, plots: bool = True, system: str | None = None) -> Report:
    """The report content of an evaluated case (a :class:`~fitcheck.case.DesignCase` is evaluated first).

    ``system`` ("SI" or "inch") overrides the case's own unit system
    (``DesignCase.unit_system``, SI when the case does not state one).
    """
    from ..case import ENGINES, DesignCase, evaluate

    if isinstance(result, DesignCase):
        result = evaluate(result)
    case = result.case
    if system is None:
        system = getattr(case, "unit_system", "SI") or "SI"
    system = "inch" if str(system).lower() == "inch" else "SI"
    names = _all_names()

    title = {k: str(v) for k, v in case.title.to_mapping().items()}
    sections, summary, drawing = [], [], []
    for n, jr in enumerate(result.joints, 1):
        eng = ENGINES[jr.table]
        mod = eng.load()
        keys = getattr(mod, "KEYS", {})
        figs, errs = _plots(jr, eng, system) if plots else ([], [])
        rows = [check_row(jr.name, c, system, names) for c in jr.checks]
        notes = [text_in_system(prose(w, names), system) for w in jr.notes] + _sources(jr.result, names)
        sec = Section(number=n, kind=eng.label, name=jr.name,
                      inputs=_inputs(jr, case, keys, system, names),
                      method=[(prose(s, names), prose(r, names))
                              for s, r in method_steps(getattr(mod, "METHOD_NOTES", ()))],
                      checks=rows, ok=jr.ok, notes=notes,
                      figures=figs, plot_errors=[prose(e, names) for e in errs])
        sections.append(sec)
        summary.extend(rows)
        drawing.append(DrawingBlock(sec.heading, decisions(jr.table, jr.input, jr.result, system),
                                    jr.ok))
    conditions = [InputRow(names.get(k) or input_name(k), value_text(v, system, names))
                  for k, v in case.conditions.items()]
    return Report(title=title, system=system, drawing=drawing, conditions=conditions,
                  summary=summary, sections=sections, ok=result.ok,
                  generated=_dt.datetime.now().strftime("%Y-%m-%d %H:%M"))
