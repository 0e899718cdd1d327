"""Design-case files: a whole drive's joints in one TOML file.

A case file holds a title block, the shared operating conditions and any
number of named joints, one array of tables per kind of joint::

    format_version = 1

    [title]
    project = "Benchtop pump"
    part = "Gearhead"
    revision = "B"
    author = "A. Designer"
    date = 2025-03-14

    [conditions]
    temperature_min = "-10 degC"
    temperature_max = "70 degC"
    speed = "2800 rpm"

    [[pressfit]]
    name = "gear-on-shaft"
    ...

    [[bearing]]
    name = "A-side"
    ...

    [[screws]]
    name = "cover"
    ...

Each joint table is handed to its engine's ``from_mapping``; keys of
``[conditions]`` that an engine knows (``speed``, ``temperature_*`` …) are its
defaults, and a joint may override them. :func:`load` / :func:`loads` check the
whole file and report every problem at once (:class:`~fitcheck.errors.InputErrors`);
:func:`save` writes atomically; :func:`evaluate` runs every joint.

The kinds of joint are listed in :data:`ENGINES`, a registry resolved lazily:
an engine module is imported only when a file uses its table, and a missing
engine is a clear input error, not an ``ImportError``.
"""

from __future__ import annotations

import dataclasses
import datetime as _dt
import functools
import importlib
import importlib.resources
import math
import os
import warnings
from collections.abc import Iterator, Mapping
from dataclasses import dataclass, field
from pathlib import Path
from types import ModuleType

from . import tomlwrite
from .checks import Check
from .errors import ErrorCollector, FitcheckError, InputError, InputErrors, did_you_mean
from .tomlread import MAX_BYTES, read_toml, read_toml_bytes
from .units import temperature_c, to_core

FORMAT_VERSION = 1
"""The newest case-file format this program reads and the one it writes."""

__all__ = [
    "CaseCheck", "CaseResult", "DesignCase", "ENGINES", "Engine", "EngineUnavailable",
    "FORMAT_VERSION", "JointResult", "Title", "demo_case", "demo_text", "document_text", "dumps",
    "engine",
    "evaluate", "load", "loads", "save",
]


# --------------------------------------------------------------------------- registry

class EngineUnavailable(FitcheckError):
    """An engine named in the registry cannot be imported or lacks part of the engine contract."""


@dataclass(frozen=True)
class Engine:
    """One kind of joint a case file may hold.

    Attributes
    ----------
    table : str
        The case-file table name (``[[pressfit]]``).
    attr : str
        The :class:`DesignCase` attribute holding the inputs (``pressfits``).
    module : str
        The analysis module; it must define ``KEYS``, ``evaluate``, ``METHOD_NOTES``
        and the input class.
    input_class : str
        Name of the input dataclass in ``module`` (``from_mapping``, ``to_mapping``).
    label : str
        Heading used in reports ("Press fit").
    plots : tuple of str
        ``"module:function"`` plot functions taking the engine's result.
    """

    table: str
    attr: str
    module: str
    input_class: str
    label: str
    plots: tuple[str, ...] = ()

    def load(self) -> ModuleType:
        """Import the engine module and check that it follows the contract."""
        try:
            mod = importlib.import_module(self.module)
        except ImportError as exc:
            raise EngineUnavailable(
                f"the {self.label.lower()} engine ({self.module}) is not available in this "
                f"installation, so [[{self.table}]] tables cannot be read ({exc})") from None
        missing = [n for n in (self.input_class, "KEYS", "evaluate") if not hasattr(mod, n)]
        if missing:
            raise EngineUnavailable(
                f"the {self.label.lower()} engine ({self.module}) lacks {', '.join(missing)}")
        return mod

    def input_type(self) -> type:
        return getattr(self.load(), self.input_class)

    def keys(self) -> tuple[str, ...]:
        """The keys a joint table of this kind may hold (``name`` included)."""
        keys = tuple(self.load().KEYS)
        return keys if "name" in keys else ("name", *keys)

    def method_notes(self) -> tuple:
        return tuple(getattr(self.load(), "METHOD_NOTES", ()))

    def plot_functions(self) -> list:
        """The plot functions that exist (a missing plot module is skipped, not an error)."""
        out = []
        for spec in self.plots:
            mod_name, _, fn = spec.partition(":")
            try:
                out.append(getattr(importlib.import_module(mod_name), fn))
            except (ImportError, AttributeError):
                continue
        return out


ENGINES: dict[str, Engine] = {
    "pressfit": Engine("pressfit", "pressfits", "fitcheck.pressfit", "PressFitInput", "Press fit",
                       ("fitcheck.plots.pressfit:plot_wall_stresses",
                        "fitcheck.plots.pressfit:plot_capacity_band")),
    "bearing": Engine("bearing", "bearings", "fitcheck.bearings", "BearingSeatInput",
                      "Bearing seat", ("fitcheck.plots.bearings:plot_clearance_budget",)),
    "screws": Engine("screws", "screws", "fitcheck.screws", "ScrewJointInput", "Screw joint",
                     ("fitcheck.plots.screws:plot_joint_diagram",)),
}
"""Table name → engine. Add an entry (and a :class:`DesignCase` field named ``attr``) to plug in a
new kind of joint; see DEVELOPERS.md, "Case files and reports"."""


def engine(table: str) -> Engine:
    """The registry entry of a table name, with a "did you mean" for a typo."""
    try:
        return ENGINES[table]
    except KeyError:
        raise InputError("table", table, "one of " + ", ".join(ENGINES),
                         did_you_mean(table, ENGINES)) from None


# --------------------------------------------------------------------------- the case

TITLE_KEYS = ("project", "part", "revision", "author", "date")


@dataclass(frozen=True)
class Title:
    """The title block of a calculation: what it is about, who made it, when."""

    project: str = ""
    part: str = ""
    revision: str = ""
    author: str = ""
    date: str | _dt.date = ""

    def to_mapping(self) -> dict:
        return {k: getattr(self, k) for k in TITLE_KEYS if getattr(self, k) != ""}


#: Shared operating conditions understood by the case file itself (others an engine knows are
#: passed through to it): key → (kind, lower, upper) in core units, with the kind "temperature"
#: for absolute temperatures in °C.
CONDITION_KEYS: dict[str, tuple[str, float, float]] = {
    "temperature_min": ("temperature", -100.0, 500.0),      # common practice: plausibility bounds
    "temperature_max": ("temperature", -100.0, 500.0),      # common practice
    "temperature_shaft": ("temperature", -100.0, 500.0),    # common practice
    "temperature_hub": ("temperature", -100.0, 500.0),      # common practice
    "temperature_housing": ("temperature", -100.0, 500.0),  # common practice
    "temperature_inner": ("temperature", -100.0, 500.0),    # common practice (bearing inner ring)
    "temperature_outer": ("temperature", -100.0, 500.0),    # common practice (bearing outer ring)
    "temperature_assembly": ("temperature", -200.0, 600.0),  # common practice (LN2 cooling … heating)
    "speed": ("speed", 0.0, 200_000 * 2 * math.pi / 60),    # common practice: up to 200 000 rpm
}


@dataclass(frozen=True)
class DesignCase:
    """A design case: title block, shared conditions and the joints of one drive.

    ``pressfits``, ``bearings`` and ``screws`` are tuples of engine inputs
    (``PressFitInput``, ``BearingSeatInput``, ``ScrewJointInput``); ``names``
    holds the joint names in the same order, one tuple per table. ``conditions``
    keeps the ``[conditions]`` values as written.
    """

    title: Title = field(default_factory=Title)
    conditions: dict = field(default_factory=dict)
    pressfits: tuple = ()
    bearings: tuple = ()
    screws: tuple = ()
    names: dict = field(default_factory=dict)
    format_version: int = FORMAT_VERSION
    unit_system: str = "SI"
    #: The TOML text the case was read from (None for a case built in code). Saving writes the
    #: changes into this text, so the user's comments, key order and formatting stay.
    source_text: str | None = field(default=None, compare=False, repr=False)

    def joints(self) -> Iterator[tuple[Engine, str, object]]:
        """Every joint as ``(engine, name, input)`` in file order by kind."""
        for eng in ENGINES.values():
            inputs = getattr(self, eng.attr, ())
            names = self.names.get(eng.table, ())
            for i, inp in enumerate(inputs):
                yield eng, _joint_name(inp, names, i, eng.table), inp

    def __len__(self) -> int:
        return sum(len(getattr(self, e.attr, ())) for e in ENGINES.values())


def _joint_name(inp, names, i, table) -> str:
    name = getattr(inp, "name", None)
    if isinstance(name, str) and name:
        return name
    if i < len(names):
        return names[i]
    return f"{table}-{i + 1}"


def joint_label(table: str, name: str) -> str:
    """How a joint is named in messages and tables: ``pressfit[gear-on-shaft]``."""
    return f"{table}[{name}]"


# --------------------------------------------------------------------------- reading

def load(path: str | os.PathLike) -> DesignCase:
    """Read and validate a case file (at most 1 MiB); every problem is reported at once."""
    data = read_toml(path)
    case = from_document(data, source=str(path))
    return dataclasses.replace(case, source_text=Path(path).read_text(encoding="utf-8-sig"))


def loads(text: str | bytes, source: str = "case file") -> DesignCase:
    """Validate a case given as TOML text or bytes."""
    raw = text.encode("utf-8", errors="surrogatepass") if isinstance(text, str) else bytes(text)
    if isinstance(text, str) and len(raw) > MAX_BYTES:
        raise InputError(source, f"{len(raw)} bytes", f"a file of at most {MAX_BYTES} bytes (1 MiB)")
    try:
        data = read_toml_bytes(raw, source)
    except UnicodeEncodeError:  # pragma: no cover - lone surrogates in a str
        raise InputError(source, "text with invalid characters", "UTF-8 TOML text") from None
    case = from_document(data, source=source)
    return dataclasses.replace(case, source_text=raw.decode("utf-8-sig"))


def from_document(data: Mapping, source: str = "case file") -> DesignCase:
    """Validate an already parsed TOML document (a mapping) into a :class:`DesignCase`."""
    errs = ErrorCollector()
    if not isinstance(data, Mapping):
        raise InputError(source, type(data).__name__, "a TOML table")
    _check_version(data, source)

    allowed_top = ("format_version", "unit_system", "title", "conditions", *ENGINES)
    _check_limits(data, allowed_top)
    for key in data:
        if key not in allowed_top:
            errs.add(InputError(key, _show(data[key]), "a top-level key or table: "
                                + ", ".join(allowed_top), did_you_mean(key, allowed_top)))

    title = _read_title(data.get("title", {}), errs)
    unit_system = _read_unit_system(data.get("unit_system", "SI"), errs)

    # the engines this file uses (imported lazily, only these)
    used: dict[str, Engine] = {}
    for table, eng in ENGINES.items():
        if table in data:
            try:
                eng.load()
                used[table] = eng
            except EngineUnavailable as exc:
                errs.add(InputError(f"[[{table}]]", f"{_count(data[table])} table(s)",
                                    "a kind of joint this installation can check", str(exc)))

    engine_keys = {t: e.keys() for t, e in used.items()}
    conditions = _read_conditions(data.get("conditions", {}), engine_keys, errs)

    inputs: dict[str, list] = {e.attr: [] for e in ENGINES.values()}
    names: dict[str, tuple[str, ...]] = {}
    seen: dict[str, str] = {}
    for table, eng in used.items():
        entries = data[table]
        if isinstance(entries, Mapping):
            errs.add(InputError(table, "a single [" + table + "] table",
                                f"an array of tables: write [[{table}]] (one per joint)"))
            continue
        if not isinstance(entries, list):
            errs.add(InputError(table, _show(entries), f"an array of tables [[{table}]]"))
            continue
        cls = eng.input_type()
        keys = engine_keys[table]
        got_names = []
        for i, entry in enumerate(entries):
            label = joint_label(table, f"#{i + 1}")
            if not isinstance(entry, Mapping):
                errs.add(InputError(label, _show(entry), "a table of keys (name = ..., ...)"))
                continue
            name = entry.get("name")
            if not isinstance(name, str) or not name.strip():
                errs.add(InputError(f"{label}.name", name, "a non-empty name for the joint, "
                                    "e.g. name = \"gear-on-shaft\""))
                name = None
            else:
                name = name.strip()
                label = joint_label(table, name)
                if name in seen:
                    errs.add(InputError(f"{label}.name", name, "a name not used by another joint "
                                        "of the case", f"already used by {seen[name]}"))
                else:
                    seen[name] = label
            mapping = {}
            for key, value in entry.items():
                if key not in keys:
                    errs.add(InputError(f"{label}.{key}", _show(value), f"a key of [[{table}]]: "
                                        + ", ".join(keys), did_you_mean(key, keys)))
                elif key != "name" or "name" in eng.load().KEYS:
                    mapping[key] = value
            if name is not None and "name" in eng.load().KEYS:
                mapping["name"] = name
            inherited = {k: v for k, v in conditions.items() if k in keys and k not in entry}
            scope = [e for k, v in mapping.items() for e in _scope_errors(f"{label}.{k}", v)]
            errs.errors.extend(scope)
            mapping = {**inherited, **mapping}
            try:
                inp = cls.from_mapping(mapping, label)
            except (InputError, InputErrors) as exc:
                flagged = {e.field for e in scope}
                for e in exc.errors if isinstance(exc, InputErrors) else [exc]:
                    if e.field not in flagged:
                        errs.add(_blame_conditions(e, label, inherited))
                continue
            if scope:
                continue
            inputs[eng.attr].append(inp)
            got_names.append(name or f"{table}-{i + 1}")
        names[table] = tuple(got_names)

    errs.raise_if_any()
    return DesignCase(title=title, conditions=conditions, names=names, unit_system=unit_system,
                      **{k: tuple(v) for k, v in inputs.items()})


def check_limits(data: Mapping) -> None:
    """Refuse a parsed case document whose counts, lengths or characters exceed what the schema
    allows (:mod:`fitcheck.inputlimits`), before any value is read; the loader does this first."""
    _check_limits(data, ("format_version", "unit_system", "title", "conditions", *ENGINES))


def _check_limits(data: Mapping, allowed_top: tuple[str, ...]) -> None:
    """Counts, lengths and characters as the schema allows, before any value is read."""
    from .inputlimits import DEFAULT_KEYS, check_case

    tables = {}
    for table, eng in ENGINES.items():
        if table in data:
            try:
                tables[table] = eng.keys()
            except EngineUnavailable:  # reported by the loader; no schema to count against
                tables[table] = ("name", *(f"_{i}" for i in range(DEFAULT_KEYS)))
    known = set(CONDITION_KEYS)
    for keys in tables.values():
        known.update(keys)
    errs = check_case(data, tables, allowed_top, TITLE_KEYS, known)
    if len(errs) == 1:
        raise errs[0]
    if errs:
        raise InputErrors(errs)


#: Values of the top-level key ``unit_system``: the units of the report, plots and CLI text.
UNIT_SYSTEMS = ("SI", "inch")


def _read_unit_system(v, errs: ErrorCollector) -> str:
    """``unit_system = "SI" | "inch"`` (case-insensitive; "si", "Inch" accepted and normalised)."""
    if isinstance(v, str):
        for u in UNIT_SYSTEMS:
            if v.strip().lower() == u.lower():
                return u
    errs.add(InputError("unit_system", _show(v), "'SI' or 'inch'",
                        did_you_mean(str(v), list(UNIT_SYSTEMS))))
    return "SI"


def _check_version(data: Mapping, source: str) -> None:
    if "format_version" not in data:
        raise InputError("format_version", None, f"format_version = {FORMAT_VERSION} at the top of "
                         "the file (every case file states the format it is written in)")
    v = data["format_version"]
    if isinstance(v, bool) or not isinstance(v, int):
        raise InputError("format_version", _show(v), f"a whole number; this fitcheck reads "
                         f"format_version ≤ {FORMAT_VERSION}")
    if v > FORMAT_VERSION:
        raise InputError("format_version", v, f"format_version ≤ {FORMAT_VERSION}",
                         f"the file was written by a newer fitcheck; this one reads "
                         f"format_version ≤ {FORMAT_VERSION}: update fitcheck to read it")
    if v < 1:
        raise InputError("format_version", v, f"a format_version from 1 to {FORMAT_VERSION}")


def _read_title(t, errs: ErrorCollector) -> Title:
    if not isinstance(t, Mapping):
        errs.add(InputError("title", _show(t), "a [title] table with " + ", ".join(TITLE_KEYS)))
        return Title()
    vals = {}
    for key, v in t.items():
        if key not in TITLE_KEYS:
            errs.add(InputError(f"title.{key}", _show(v), "one of " + ", ".join(TITLE_KEYS),
                                did_you_mean(key, TITLE_KEYS)))
        elif key == "date" and isinstance(v, _dt.date) and not isinstance(v, _dt.datetime):
            vals[key] = v
        elif not isinstance(v, str):
            what = "a text or a TOML date (date = 2025-03-14)" if key == "date" else "a text in quotes"
            errs.add(InputError(f"title.{key}", _show(v), what))
        elif len(v) > 500:
            errs.add(InputError(f"title.{key}", f"{len(v)} characters", "at most 500 characters"))
        else:
            vals[key] = v
    return Title(**vals)


def _read_conditions(c, engine_keys: Mapping[str, tuple[str, ...]], errs: ErrorCollector) -> dict:
    if not isinstance(c, Mapping):
        errs.add(InputError("conditions", _show(c), "a [conditions] table"))
        return {}
    known = dict.fromkeys(CONDITION_KEYS)
    for keys in engine_keys.values():
        known.update(dict.fromkeys(k for k in keys if k != "name"))
    out, parsed = {}, {}
    for key, v in c.items():
        if key not in known:
            errs.add(InputError(f"conditions.{key}", _show(v), "a shared condition: "
                                + ", ".join(CONDITION_KEYS) + " (or a key the joints' engines know)",
                                did_you_mean(key, known)))
            continue
        spec = CONDITION_KEYS.get(key)
        if spec is not None:
            kind, lo, hi = spec
            try:
                if isinstance(v, bool) or not isinstance(v, str | int | float):
                    raise InputError(key, _show(v), "a value with a unit, e.g. '80 degC' or '3000 rpm'")
                if kind == "temperature":
                    parsed[key] = temperature_c(v, key, lo=lo, hi=hi)
                else:
                    parsed[key] = to_core(v, kind, key, lo=lo, hi=hi)
            except InputError as exc:
                errs.add(exc, "conditions")
                continue
        out[key] = v
    tmin, tmax = parsed.get("temperature_min"), parsed.get("temperature_max")
    if tmin is not None and tmax is not None and tmin > tmax:
        errs.add(InputError("conditions.temperature_min", c["temperature_min"],
                            f"a temperature ≤ temperature_max ({c['temperature_max']!r})"))
    return out


#: Magnitudes no joint of a compact drive can have, in core units: a value outside is taken
#: for a slip of the unit or the exponent, whatever the engine would make of it
#: (common practice: the bounds are three or more orders of magnitude beyond any such drive).
SCOPE_LIMITS: dict[str, tuple[str, float, float]] = {
    "[length]": ("mm", 1e-6, 1e4),                      # 1 nm … 10 m (zero allowed)
    "[mass] * [length] / [time] ** 2": ("N", 0.0, 1e8),  # force up to 100 MN
    "[mass] * [length] ** 2 / [time] ** 2": ("N*mm", 0.0, 1e10),  # torque up to 10 MN·m
    "[mass] / [length] / [time] ** 2": ("MPa", 0.0, 1e6),  # stress up to 1 TPa
    "1 / [time]": ("rpm", 0.0, 1e6),
    "[temperature]": ("degC", -273.15, 2000.0),
}
PLAIN_NUMBER_LIMIT = 1e9


def _scope_errors(fld: str, v) -> list[InputError]:
    """Values whose magnitude is absurd for a compact drive (units or exponent mixed up)."""
    if isinstance(v, Mapping):
        return [e for k, x in v.items() for e in _scope_errors(f"{fld}.{k}", x)]
    if isinstance(v, list):
        return [e for i, x in enumerate(v) for e in _scope_errors(f"{fld}[{i}]", x)]
    if isinstance(v, bool):
        return []
    if isinstance(v, int | float):
        if math.isfinite(v) and abs(v) > PLAIN_NUMBER_LIMIT:
            return [InputError(fld, v, f"a number of magnitude ≤ {PLAIN_NUMBER_LIMIT:g}",
                               "absurd for a compact drive: exponent mixed up?")]
        return []
    if not isinstance(v, str) or not v.strip()[:1].lstrip("+-.").isdigit():
        return []
    reading = _scope_reading(v)
    if reading is None:
        return []
    unit, lo, hi, x = reading
    if not math.isfinite(x):
        return []
    if unit == "degC":
        bad = x > hi
        allowed = f"a temperature ≤ {hi:g} degC"
    else:
        bad = abs(x) > hi or (lo > 0 and x != 0 and abs(x) < lo)
        allowed = (f"a magnitude from {lo:g} to {hi:g} {unit}" if lo > 0 else
                   f"a magnitude ≤ {hi:g} {unit}")
    if bad:
        return [InputError(fld, v, allowed, "absurd for a compact drive: unit or exponent mixed up?")]
    return []


@functools.lru_cache(maxsize=4096)
def _scope_reading(v: str) -> tuple[str, float, float, float] | None:
    """``(unit, lo, hi, value in unit)`` of a quantity text whose kind :data:`SCOPE_LIMITS` bounds,
    else None (remembered: the browser checks the same texts after every input)."""
    from .qparse import quantity_or_none

    try:
        q = quantity_or_none(v)
        if q is None:  # text outside the quantity grammar: the engine refuses it in its own words
            return None
        spec = SCOPE_LIMITS.get(str(q.dimensionality))
        if spec is None:
            return None
        unit, lo, hi = spec
        return unit, lo, hi, float(q.to(unit).magnitude)
    except Exception:  # text pint cannot read: the engine reports it with its own words
        return None


def _blame_conditions(e: InputError, label: str, inherited: Mapping) -> InputError:
    """Name ``[conditions]`` as the source of a bad value a joint inherited from it."""
    for key in inherited:
        if e.field == f"{label}.{key}" or e.field.startswith(f"{label}.{key}."):
            rest = e.field[len(label) + 1:]
            return InputError(f"conditions.{rest} (as used by {label})", e.value, e.allowed, e.hint)
    if not e.field.startswith(label):
        return e.within(label)
    return e


def _show(v):
    """A short form of a value for an error message."""
    if isinstance(v, Mapping):
        return "a table"
    if isinstance(v, list):
        return f"an array of {len(v)}"
    if isinstance(v, str) and len(v) > 80:
        return v[:77] + "..."
    return v


def _count(v) -> int:
    return len(v) if isinstance(v, list) else 1


# --------------------------------------------------------------------------- writing

def to_document(case: DesignCase) -> dict:
    """The case as a plain TOML document (what :func:`dumps` writes)."""
    doc: dict = {"format_version": FORMAT_VERSION}
    if getattr(case, "unit_system", "SI") != "SI":
        doc["unit_system"] = case.unit_system
    title = case.title.to_mapping()
    if title:
        doc["title"] = title
    if case.conditions:
        doc["conditions"] = dict(case.conditions)
    for eng, name, inp in case.joints():
        full = {"name": name}
        full.update((k, v) for k, v in inp.to_mapping().items() if k != "name" and v is not None)
        short = {k: v for k, v in full.items()
                 if not (k in case.conditions and _same_value(case.conditions[k], v))}
        if short != full and not _reads_back(eng, name, inp, short, case.conditions):
            short = full
        doc.setdefault(eng.table, []).append(short)
    return doc


def _same_value(a, b) -> bool:
    """Equal as written, or the same quantity in other words ("55 degC" and "55.0 degC")."""
    if a == b:
        return True
    if not (isinstance(a, str) and isinstance(b, str)):
        return False
    from .qparse import quantity_or_none

    try:
        qa, qb = quantity_or_none(a), quantity_or_none(b)
        if qa is None or qb is None:
            return False
        return qa.dimensionality == qb.dimensionality and math.isclose(
            float(qa.to(qb.units).magnitude), float(qb.magnitude), rel_tol=1e-12, abs_tol=1e-12)
    except Exception:  # pint raises several unrelated types for text it cannot read
        return False


def _reads_back(eng: Engine, name: str, inp, table: Mapping, conditions: Mapping) -> bool:
    """True when a joint table without its inherited keys reads back to the same input."""
    keys = eng.keys()
    mapping = {k: v for k, v in table.items() if k != "name" or "name" in eng.load().KEYS}
    inherited = {k: v for k, v in conditions.items() if k in keys and k not in table}
    try:
        with warnings.catch_warnings():
            warnings.simplefilter("ignore")
            return eng.input_type().from_mapping({**inherited, **mapping},
                                                 joint_label(eng.table, name)) == inp
    except (InputError, InputErrors):
        return False


HEADER = ("# fitcheck design case (format_version 1). Engineering estimate: verify by test;\n"
          "# the applicable standards, local codes and licensed professional practice govern.\n")


def dumps(case: DesignCase) -> str:
    """The case as TOML text; :func:`loads` of it gives an equal case.

    A case read from a file (``case.source_text``) is written as that text with
    only the changed values rewritten: comments, blank lines, key order and the
    user's spelling of every unchanged value stay (:func:`fitcheck.tomlwrite.update`).
    A new case gets a header with the caution and the layout of
    :func:`fitcheck.tomlwrite.dumps`.

    Raises
    ------
    InputError, InputErrors
        When the text would not load back as this very case (a value :func:`load`
        refuses, or one that would read back differently): nothing is written then.
    """
    if case.source_text is not None:
        text = tomlwrite.update(case.source_text, _document_against(case), same=_same_written)
    else:
        text = HEADER + tomlwrite.dumps(to_document(case))
    _verify(case, text)
    return text


def document_text(doc: Mapping, source_text: str | None = None, header: str = HEADER) -> str:
    """TOML text of a case document (the mapping a case file parses to), as the browser saves it.

    The document is checked as :func:`load` checks a file first: a value the loader refuses
    raises (:class:`~fitcheck.errors.InputErrors`) and nothing is produced. With the text
    the document was read from (``source_text``) only the changed values are rewritten in it;
    otherwise a new text begins with ``header``.
    """
    from_document(doc, source="the case to be saved")
    if source_text is not None:
        try:
            text = tomlwrite.update(source_text, doc, same=_same_written)
        except Exception:  # text that is no longer TOML: write the document afresh
            text = header + tomlwrite.dumps(doc)
    else:
        text = header + tomlwrite.dumps(doc)
    from_document(read_toml_bytes(text.encode("utf-8"), "the case to be saved"))
    return text


def _verify(case: DesignCase, text: str) -> None:
    """Refuse a text that does not load back as ``case`` (so it is never written)."""
    again = loads(text, source="the case to be saved")
    if again != case:
        diff = [f.name for f in dataclasses.fields(case)
                if f.compare and getattr(again, f.name) != getattr(case, f.name)]
        raise InputError("case", ", ".join(diff) or "the case",
                         "values that read back unchanged from the case file",
                         "the case holds a value the file cannot express; nothing was written")


def _same_written(a, b) -> bool:
    """Two values of a case file say the same (the text of ``a`` is then kept)."""
    if isinstance(a, bool) or isinstance(b, bool):
        return a is b
    if isinstance(a, int | float) and isinstance(b, int | float):
        return float(a) == float(b)
    return _same_value(a, b)


def _document_against(case: DesignCase) -> dict:
    """The document to write for a case read from a file: the file's own values wherever they still hold.

    Title and conditions take the file's text for values that are the same quantity;
    each joint table keeps its own keys and values and changes only those that no
    longer read back to the joint's input (smallest change: every changed key is
    tried back at its old value, or left out, and kept so when the joint reads the same).
    """
    import tomllib

    new = to_document(case)
    try:
        old = tomllib.loads(case.source_text or "")
    except tomllib.TOMLDecodeError:
        return new
    for k, v in old.items():  # top-level keys this writer does not produce (kept as they are)
        if k not in new and k not in ENGINES and k not in ("title", "conditions", "format_version"):
            new[k] = v
    if isinstance(old.get("format_version"), int):
        new["format_version"] = old["format_version"]
    for part in ("title", "conditions"):
        o, n = old.get(part), new.get(part)
        if isinstance(o, Mapping) and isinstance(n, Mapping):
            new[part] = {k: (o[k] if k in o and _same_written(o[k], v) else v) for k, v in n.items()}
    conditions = case.conditions
    for eng, name, inp in case.joints():
        olds = old.get(eng.table)
        if not isinstance(olds, list):
            continue
        entry = next((e for e in olds if isinstance(e, Mapping)
                      and isinstance(e.get("name"), str) and e["name"].strip() == name), None)
        if entry is None:
            continue
        entries = new[eng.table]
        for i, e in enumerate(entries):
            if e.get("name") == name:
                entries[i] = _smallest_change(eng, name, inp, dict(entry), conditions)
    return new


def _smallest_change(eng: Engine, name: str, inp, old: dict, conditions: Mapping) -> dict:
    if _reads_back(eng, name, inp, old, conditions):
        return old
    full = {"name": old.get("name", name)}
    full.update((k, v) for k, v in inp.to_mapping().items() if k != "name" and v is not None)
    cand, changed = dict(old), []
    for k, v in full.items():
        if k in old and _same_written(old[k], v):
            continue
        if k not in old and k in conditions and _same_written(conditions[k], v):
            continue
        cand[k] = v
        changed.append(k)
    for k in old:
        if k not in full:
            del cand[k]
            changed.append(k)
    if not _reads_back(eng, name, inp, cand, conditions):
        return full
    for k in changed:
        trial = dict(cand)
        if k in old:
            trial[k] = old[k]
        else:
            trial.pop(k, None)
        if _reads_back(eng, name, inp, trial, conditions):
            cand = trial
    order = [k for k in old if k in cand] + [k for k in cand if k not in old]
    return {k: cand[k] for k in order}


def save(case: DesignCase, path: str | os.PathLike) -> Path:
    """Write the case to ``path`` atomically.

    The text goes to an exclusive temporary file in the same folder, is flushed to disk and
    then renamed over ``path`` (:func:`fitcheck.safefile.atomic_write`); a crash or an error at
    any point leaves the old file as it was and no temporary file behind.
    """
    from .safefile import atomic_write

    data = dumps(case).encode("utf-8")  # checked: it loads back as this case, or nothing is written
    return atomic_write(path, lambda f: f.write(data))


# --------------------------------------------------------------------------- evaluating

@dataclass(frozen=True)
class JointResult:
    """One joint's result within a case."""

    table: str
    name: str
    input: object
    result: object
    warnings: tuple[str, ...] = ()

    @property
    def label(self) -> str:
        return joint_label(self.table, self.name)

    @property
    def checks(self) -> tuple[Check, ...]:
        return tuple(self.result.checks)

    @property
    def ok(self) -> bool:
        return bool(self.result.ok)

    def _texts(self, *attrs: str, caught: bool) -> tuple[str, ...]:
        out = list(self.warnings) if caught else []
        for attr in attrs:
            extra = getattr(self.result, attr, ())
            if isinstance(extra, str):
                extra = (extra,)
            out.extend(str(x) for x in (extra or ()))
        return tuple(dict.fromkeys(out))

    @property
    def notes(self) -> tuple[str, ...]:
        """Warnings given while evaluating and the notes and warnings the result carries."""
        return self._texts("warnings", "notes", caught=True)

    @property
    def cautions(self) -> tuple[str, ...]:
        """The warnings alone: given while evaluating, and the result's ``warnings`` (outside a
        method's range, an input to look at)."""
        return self._texts("warnings", caught=True)

    @property
    def information(self) -> tuple[str, ...]:
        """The result's ``notes`` alone (the loads used, what a method assumes, a worst case shown
        for information), without the warnings."""
        cautions = set(self.cautions)
        return tuple(n for n in self._texts("notes", caught=False) if n not in cautions)


@dataclass(frozen=True)
class CaseCheck:
    """A check together with the joint it belongs to."""

    joint: str
    table: str
    check: Check

    @property
    def label(self) -> str:
        return joint_label(self.table, self.joint)

    @property
    def passed(self) -> bool:
        return self.check.passed

    @property
    def margin(self) -> float:
        return self.check.margin

    def to_dict(self) -> dict:
        return {"joint": self.joint, "kind": self.table, **self.check.to_dict()}


@dataclass(frozen=True)
class CaseResult:
    """Every joint's result of a case, and the case's checks flattened with joint names."""

    case: DesignCase
    joints: tuple[JointResult, ...]

    @property
    def checks(self) -> tuple[CaseCheck, ...]:
        return tuple(CaseCheck(j.name, j.table, c) for j in self.joints for c in j.checks)

    @property
    def ok(self) -> bool:
        """True when the case has at least one check and every check passes."""
        checks = self.checks
        return bool(checks) and all(c.passed for c in checks) and all(j.ok for j in self.joints)

    def by_margin(self) -> list[CaseCheck]:
        """The checks ordered worst margin first (failures lead)."""
        return sorted(self.checks, key=lambda c: (c.margin, c.label, c.check.name))

    def worst(self) -> CaseCheck | None:
        ordered = self.by_margin()
        return ordered[0] if ordered else None

    @property
    def warnings(self) -> list[str]:
        """Every joint's warnings, each led by the joint's label (its notes: :attr:`notes`)."""
        return [f"{j.label}: {w}" for j in self.joints for w in j.cautions]

    @property
    def notes(self) -> list[str]:
        """Every joint's notes (information, not warnings), each led by the joint's label."""
        return [f"{j.label}: {n}" for j in self.joints for n in j.information]

    def to_dict(self) -> dict:
        return {
            "title": {k: str(v) for k, v in self.case.title.to_mapping().items()},
            "ok": self.ok,
            "checks": [c.to_dict() for c in self.checks],
            "warnings": self.warnings,
            "notes": self.notes,
        }


def evaluate(case: DesignCase) -> CaseResult:
    """Evaluate every joint of the case.

    Warnings an engine gives (e.g. :class:`~fitcheck.errors.MethodRangeWarning`) are kept with
    the joint; input errors an engine finds while evaluating are gathered and raised together.
    """
    errs = ErrorCollector()
    out = []
    for eng, name, inp in case.joints():
        mod = eng.load()
        with warnings.catch_warnings(record=True) as caught:
            warnings.simplefilter("always")
            try:
                result = mod.evaluate(inp)
            except (InputError, InputErrors) as exc:
                label = joint_label(eng.table, name)
                for e in exc.errors if isinstance(exc, InputErrors) else [exc]:
                    errs.add(e if e.field.startswith(label) else e.within(label))
                continue
        msgs = tuple(dict.fromkeys(str(w.message) for w in caught
                                   if not issubclass(w.category, DeprecationWarning)))
        out.append(JointResult(eng.table, name, inp, result, msgs))
    errs.raise_if_any()
    return CaseResult(case, tuple(out))


# --------------------------------------------------------------------------- demo

DEMO_RESOURCE = "benchtop_pump.toml"
INCH_DEMO_RESOURCE = "lab_winch.toml"


def demo_text(inch: bool = False) -> str:
    """The demo case file as TOML text: the gearhead of a benchtop pump (SI), or with
    ``inch=True`` the gearhead of a small lab winch in inch units (ASME B4.1 fits, UNC screws)."""
    name = INCH_DEMO_RESOURCE if inch else DEMO_RESOURCE
    return importlib.resources.files("fitcheck.demo").joinpath(name).read_text("utf-8")


def demo_case(inch: bool = False) -> DesignCase:
    """The demo case (invented, realistic values); ``inch=True`` for the lab-winch gearhead in inch."""
    name = INCH_DEMO_RESOURCE if inch else DEMO_RESOURCE
    return loads(demo_text(inch), source=f"fitcheck/demo/{name}")


def replace(case: DesignCase, **changes) -> DesignCase:
    """A copy of the case with some fields changed (``dataclasses.replace``), checked as :func:`load` checks a file.

    The copy is written to TOML text and read back; a value the loader refuses
    raises here (:class:`~fitcheck.errors.InputError` / ``InputErrors`` naming the
    field), so a case that :func:`save` could write is always one :func:`load` reads.
    """
    new = dataclasses.replace(case, **changes)
    dumps(new)  # raises for a value load refuses or one the file cannot express
    return new
