"""Writing case files with a round-trip TOML library (tomlkit); reading stays with :mod:`fitcheck.tomlread`.

Two ways to write:

* :func:`dumps` — TOML text of plain data (a new file);
* :func:`update` — the text of an existing file changed to hold new data, with
  everything the user wrote kept where the data did not change: comments,
  blank lines, key order, quoting and number formats. Only the lines of values
  that changed are rewritten; a removed key disappears, a new one is appended
  to its table.

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
>>> text = 'a = 1  # kept\\nb = "2 mm"   # also kept\\n'
>>> print(update(text, {"a": 1, "b": "3 mm"}), end="")
a = 1  # kept
b = "3 mm"   # also kept

Layout of new text: keys keep their insertion order; within a table plain
values come first, then sub-tables and arrays of tables (TOML requires that
order); a small table of plain values nested in a table is written inline
(``{ base = "C45E", Rp02 = "500 MPa" }``), a larger one as a ``[sub.table]``;
likewise a short array of small tables; ``inf``/``nan`` as TOML's words.
"""

from __future__ import annotations

import datetime as _dt
import math
from collections.abc import Callable, Mapping

import tomlkit
from tomlkit import items as _items

__all__ = ["dumps", "format_key", "format_string", "format_value", "update", "TomlWriteError"]

INLINE_MAX = 88  # longest inline table written on one line before a [sub.table] is used instead


class TomlWriteError(TypeError):
    """A value that TOML cannot hold (e.g. ``None`` or an arbitrary object)."""


# --------------------------------------------------------------------------- values

def _check(v, where: str = "value"):
    """Plain data TOML can hold (numpy scalars become Python numbers); raises for anything else."""
    if isinstance(v, bool | int | float | str | _dt.datetime | _dt.date | _dt.time):
        return v
    if isinstance(v, Mapping):
        out = {}
        for k, x in v.items():
            if not isinstance(k, str):
                raise TomlWriteError(f"TOML keys are strings, got {k!r}")
            out[k] = _check(x, k)
        return out
    if isinstance(v, list | tuple):
        return [_check(x, where) for x in v]
    if hasattr(v, "item") and callable(v.item) and not isinstance(v, Mapping):  # numpy scalar
        return _check(v.item(), where)
    raise TomlWriteError(f"TOML cannot hold {type(v).__name__} value {v!r} ({where})")


def _float(x: float) -> _items.Float:
    if math.isnan(x):
        text = "nan"
    elif math.isinf(x):
        text = "inf" if x > 0 else "-inf"
    else:
        text = repr(float(x))
    return _items.Float(float(x), _items.Trivia(), text)


def _string(s: str) -> _items.String:
    """A TOML basic string with every control character escaped (tomlkit escapes the rest)."""
    return _items.String.from_raw(s, _items.StringType.SLB)


def _plain(v) -> bool:
    if isinstance(v, Mapping):
        return False
    if isinstance(v, list):
        return all(_plain(x) for x in v)
    return True


def _inline_ok(v: Mapping) -> bool:
    return all(_plain(x) for x in v.values()) and len(format_value(v)) <= INLINE_MAX


def _value_item(v):
    """An item for a value written on a ``key = value`` line (arrays and tables inline)."""
    if isinstance(v, bool):
        return tomlkit.item(v)
    if isinstance(v, float):
        return _float(v)
    if isinstance(v, str):
        return _string(v)
    if isinstance(v, Mapping):
        t = tomlkit.inline_table()
        for k, x in v.items():
            t.append(k, _value_item(x))
        return t
    if isinstance(v, list):
        a = tomlkit.array()
        for x in v:
            a.append(_value_item(x))
        return a
    return tomlkit.item(v)


def _is_table_array(v) -> bool:
    return isinstance(v, list) and len(v) > 0 and all(isinstance(x, Mapping) for x in v)


def _fill(container, data: Mapping, top: bool) -> None:
    """Put ``data`` into a tomlkit container: plain values first, then tables and arrays of tables."""
    plain, subs = [], []
    for k, v in data.items():
        if isinstance(v, Mapping) and (top or not _inline_ok(v)):
            subs.append((k, v))
        elif _is_table_array(v) and (top or not (all(_inline_ok(x) for x in v)
                                                 and len(format_value(v)) <= 2 * INLINE_MAX)):
            subs.append((k, v))
        else:
            plain.append((k, v))
    for k, v in plain:
        container.append(k, _value_item(v))
    for k, v in subs:
        if isinstance(v, Mapping):
            t = tomlkit.table()
            _fill(t, v, False)
            container.append(k, t)
        else:
            aot = tomlkit.aot()
            for x in v:
                t = tomlkit.table()
                _fill(t, x, False)
                aot.append(t)
            container.append(k, aot)


def format_string(s: str) -> str:
    """A TOML basic string with every character that needs it escaped.

    >>> format_string('a "b"')
    '"a \\\\"b\\\\""'
    >>> format_string("\\x00\\x7f é") == '"\\\\u0000\\\\u007f é"'
    True
    """
    return _string(s).as_string()


def format_key(key: str) -> str:
    """A key as written in TOML: bare when it can be, quoted otherwise.

    >>> format_key("length"), format_key("gear on shaft"), format_key("")
    ('length', '"gear on shaft"', '""')
    """
    if not isinstance(key, str):
        raise TomlWriteError(f"TOML keys are strings, got {key!r}")
    return tomlkit.key(key).as_string()


def format_value(v) -> str:
    """One value in inline form (scalars, arrays, inline tables).

    >>> format_value([1, 2.5, True, "x", {"a": 1}])
    '[1, 2.5, true, "x", {a = 1}]'
    """
    return _value_item(_check(v)).as_string()


def dumps(doc: Mapping) -> str:
    """TOML text of a mapping (the document's top-level table).

    Raises
    ------
    TomlWriteError
        For a value TOML cannot hold (``None``, an object).
    """
    if not isinstance(doc, Mapping):
        raise TomlWriteError(f"a TOML document is a table (mapping), got {type(doc).__name__}")
    data = _check(doc)
    d = tomlkit.document()
    _fill(d, data, True)
    text = tomlkit.dumps(d)
    return text if not text or text.endswith("\n") else text + "\n"


# --------------------------------------------------------------------------- round trip

def _same(a, b) -> bool:
    return type(a) is type(b) and a == b if not isinstance(a, float) else (
        isinstance(b, float) and (a == b or (math.isnan(a) and math.isnan(b))))


def _unwrap(x):
    return x.unwrap() if hasattr(x, "unwrap") else x


def _sync(container, new: Mapping, same: Callable) -> None:
    """Change a tomlkit table in place so that it holds ``new``, touching only what differs."""
    for k in [k for k in list(container.keys()) if k not in new]:
        del container[k]
    for k, v in new.items():
        if k not in container:
            if isinstance(v, Mapping) and not isinstance(container, _items.InlineTable) \
                    and not _inline_ok(v):
                t = tomlkit.table()
                _fill(t, v, False)
                container[k] = t
            elif _is_table_array(v) and not isinstance(container, _items.InlineTable) \
                    and not all(_inline_ok(x) for x in v):
                aot = tomlkit.aot()
                for x in v:
                    t = tomlkit.table()
                    _fill(t, x, False)
                    aot.append(t)
                container[k] = aot
            else:
                container[k] = _value_item(v)
            continue
        old = container[k]
        if isinstance(v, Mapping) and isinstance(old, _items.Table | _items.InlineTable):
            _sync(old, v, same)
        elif isinstance(old, _items.AoT) and _is_table_array(v):
            _sync_tables(container, k, old, v, same)
        elif (isinstance(old, _items.Array) and isinstance(v, list) and len(old) == len(v)
              and any(isinstance(x, Mapping) for x in v)):
            for i, x in enumerate(v):
                if isinstance(x, Mapping) and isinstance(old[i], _items.InlineTable):
                    _sync(old[i], x, same)
                elif not same(_unwrap(old[i]), x):
                    old[i] = _value_item(x)
        elif not same(_unwrap(old), v):
            container[k] = _aligned(old, _value_item(v))


def _aligned(old, item):
    """The new item with the old one's comment, kept in the same column where it fits."""
    tv_old, tv = getattr(old, "trivia", None), getattr(item, "trivia", None)
    if tv_old is None or tv is None or not tv_old.comment:
        return item
    width = len(old.as_string()) + len(tv_old.comment_ws)
    tv.comment = tv_old.comment
    tv.comment_ws = " " * max(1, width - len(item.as_string()))
    tv.trail = tv_old.trail
    return item


def _sync_tables(container, key, old: _items.AoT, new: list, same: Callable) -> None:
    """An array of tables: entries matched by ``name`` where every entry has one, else by position."""
    olds = list(old.body)
    names_old = [t.get("name") for t in olds]
    names_new = [x.get("name") for x in new]
    by_name = (all(isinstance(n, str) for n in names_old + names_new)
               and len(set(names_old)) == len(names_old))
    if len(new) >= len(olds) and (not by_name or names_new[:len(olds)] == names_old):
        for t, x in zip(olds, new[:len(olds)], strict=True):  # same entries, maybe some added
            _sync(t, x, same)
        for x in new[len(olds):]:
            t = tomlkit.table()
            _fill(t, x, False)
            old.append(t)
        return
    pool = dict(zip(names_old, olds, strict=True)) if by_name else {}
    aot = tomlkit.aot()
    for i, x in enumerate(new):
        t = pool.get(x.get("name")) if by_name else (olds[i] if i < len(olds) else None)
        if t is None:
            t = tomlkit.table()
            _fill(t, x, False)
        else:
            _sync(t, x, same)
        aot.append(t)
    container[key] = aot


def update(text: str, new: Mapping, same: Callable | None = None) -> str:
    """``text`` (TOML) changed to hold the data ``new``, keeping everything else the user wrote.

    ``same(old_value, new_value)`` decides whether a value already says the same
    (default: equal and of the same type); such values keep their text.
    """
    data = _check(new)
    d = tomlkit.parse(text)
    _sync(d, data, same or _same)
    out = tomlkit.dumps(d)
    return out if not out or out.endswith("\n") else out + "\n"
