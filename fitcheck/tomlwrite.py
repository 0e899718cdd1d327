"""A small TOML writer for case files (TOML 1.0; the reading side is :mod:`fitcheck.tomlread`).

It writes what a case file needs — strings, integers, floats, booleans, dates
and times, arrays, inline tables, tables and arrays of tables — and nothing
else. The output parses back with :mod:`tomllib` to the same data:

>>> import tomllib
>>> doc = {"format_version": 1, "title": {"project": 'Pump "A"'},
...        "pressfit": [{"name": "gear", "length": "16 mm"}]}
>>> print(dumps(doc), end="")
format_version = 1
<BLANKLINE>
[title]
project = "Pump \\"A\\""
<BLANKLINE>
[[pressfit]]
name = "gear"
length = "16 mm"
>>> tomllib.loads(dumps(doc)) == doc
True

Rules:

* keys keep their insertion order; within a table, plain values come first,
  then sub-tables and arrays of tables (TOML requires that order);
* a key that is not a bare key (``A-Za-z0-9_-``) is written as a quoted string;
* strings are basic strings with every control character escaped;
* a small table of plain values nested in a table is written inline
  (``{ base = "C45E", Rp02 = "500 MPa" }``), a larger one as a ``[sub.table]``;
  likewise a short array of small tables (``layers = [{ thickness = "6 mm" }]``);
* floats are written with :func:`repr` (shortest form that reads back to the
  same float); ``inf`` and ``nan`` are written as TOML's ``inf``/``nan``.
"""

from __future__ import annotations

import datetime as _dt
import math
import re
from collections.abc import Mapping

__all__ = ["dumps", "format_key", "format_string", "format_value", "TomlWriteError"]

_BARE_KEY = re.compile(r"[A-Za-z0-9_-]+")
_ESCAPES = {"\\": "\\\\", '"': '\\"', "\b": "\\b", "\t": "\\t", "\n": "\\n", "\f": "\\f", "\r": "\\r"}
INLINE_MAX = 88  # longest inline table written on one line before a [sub.table] is used instead


class TomlWriteError(TypeError):
    """A value that TOML cannot hold (e.g. ``None`` or an arbitrary object)."""


def format_string(s: str) -> str:
    """A TOML basic string with every character that needs it escaped.

    >>> format_string('a "b" \\\\ c\\n')
    '"a \\\\"b\\\\" \\\\\\\\ c\\\\n"'
    >>> format_string("\\x00\\x7f é")
    '"\\\\u0000\\\\u007F é"'
    """
    out = []
    for ch in s:
        if ch in _ESCAPES:
            out.append(_ESCAPES[ch])
        elif ord(ch) < 0x20 or ord(ch) == 0x7F:
            out.append(f"\\u{ord(ch):04X}")
        else:
            out.append(ch)
    return '"' + "".join(out) + '"'


def format_key(key: str) -> str:
    """A key as written in TOML: bare when it can be, quoted otherwise.

    >>> format_key("length"), format_key("gear on shaft"), format_key("")
    ('length', '"gear on shaft"', '""')
    """
    if not isinstance(key, str):
        raise TomlWriteError(f"TOML keys are strings, got {key!r}")
    return key if _BARE_KEY.fullmatch(key) else format_string(key)


def _format_float(x: float) -> str:
    if math.isnan(x):
        return "nan"
    if math.isinf(x):
        return "inf" if x > 0 else "-inf"
    text = repr(float(x))
    if "e" not in text and "." not in text:  # pragma: no cover - repr always has one of them
        text += ".0"
    return text


def format_value(v) -> str:
    """One value in inline form (scalars, arrays, inline tables).

    >>> format_value([1, 2.5, True, "x", {"a": 1}])
    '[1, 2.5, true, "x", { a = 1 }]'
    """
    if isinstance(v, bool):
        return "true" if v else "false"
    if isinstance(v, int):
        return str(v)
    if isinstance(v, float):
        return _format_float(v)
    if isinstance(v, str):
        return format_string(v)
    if isinstance(v, _dt.datetime | _dt.date | _dt.time):
        return v.isoformat()
    if isinstance(v, Mapping):
        if not v:
            return "{}"
        return "{ " + ", ".join(f"{format_key(k)} = {format_value(x)}" for k, x in v.items()) + " }"
    if isinstance(v, list | tuple):
        return "[" + ", ".join(format_value(x) for x in v) + "]"
    if hasattr(v, "item") and callable(v.item):  # numpy scalar
        return format_value(v.item())
    raise TomlWriteError(f"TOML cannot hold {type(v).__name__} value {v!r}")


def _is_table_array(v) -> bool:
    return isinstance(v, list | tuple) and len(v) > 0 and all(isinstance(x, Mapping) for x in v)


def _is_plain(v) -> bool:
    """A value that has no tables inside (may be written inline without losing readability)."""
    if isinstance(v, Mapping):
        return False
    if isinstance(v, list | tuple):
        return all(_is_plain(x) for x in v)
    return True


def _inline_ok(v: Mapping) -> bool:
    return all(_is_plain(x) for x in v.values()) and len(format_value(v)) <= INLINE_MAX


def _write_table(lines: list[str], path: list[str], table: Mapping, header: str | None) -> None:
    plain, subtables = [], []
    for k, v in table.items():
        if isinstance(v, Mapping) and not (header is not None and _inline_ok(v)):
            subtables.append((k, v))  # top-level tables always get a header
        elif _is_table_array(v) and not (header is not None and all(_inline_ok(x) for x in v)
                                         and len(format_value(v)) <= 2 * INLINE_MAX):
            subtables.append((k, v))  # short arrays of small tables stay inline
        else:
            plain.append((k, v))
    if header is not None:
        if lines:
            lines.append("")
        lines.append(header)
    for k, v in plain:
        lines.append(f"{format_key(k)} = {format_value(v)}")
    for k, v in subtables:
        sub = [*path, format_key(k)]
        name = ".".join(sub)
        if isinstance(v, Mapping):
            _write_table(lines, sub, v, f"[{name}]")
        else:
            for item in v:
                _write_table(lines, sub, item, f"[[{name}]]")


def dumps(doc: Mapping) -> str:
    """TOML text of a mapping (the document's top-level table).

    Raises
    ------
    TomlWriteError
        For a value TOML cannot hold (``None``, an object).
    """
    if not isinstance(doc, Mapping):
        raise TomlWriteError(f"a TOML document is a table (mapping), got {type(doc).__name__}")
    lines: list[str] = []
    _write_table(lines, [], doc, None)
    return "\n".join(lines) + "\n" if lines else ""
