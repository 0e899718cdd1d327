"""Size, count and nesting limits of case files, checked before anything is parsed.

A case file is a small document: a title block, a few shared conditions and at most
:data:`MAX_JOINTS` joints of each kind, each a table of the keys its engine knows.
A hostile file (a megabyte-long value, an array of 50 000 items, 2 000 nested
brackets, text with control characters) is refused by three linear passes, each
stopping at the first limit crossed, so refusal takes a fixed small time per byte:

1. :func:`scan_text` on the TOML text, before :mod:`tomllib`: bracket nesting,
   number of values, length of every string and bare token;
2. :func:`check_tree` on the parsed document: nesting of tables and arrays,
   nan/inf (iterative, no recursion);
3. :func:`check_case` on a case document, before any value is read: keys per table,
   joints per kind, items per array and characters per text, field by field as the
   schema (the engines' ``KEYS``) allows, and no control or bidi characters in text.

The limits follow the schema: the deepest thing a case holds is an inline material
in a clamped layer of a screw joint (six levels: document, ``[[screws]]`` array,
joint table, ``layers`` array, layer table, material table).
"""

from __future__ import annotations

import math
import re
import unicodedata
from collections.abc import Iterable, Mapping

from .errors import InputError

#: Levels of tables and arrays a case document may have (the document itself is level 1).
MAX_DEPTH = 6
#: Brackets ``[`` / ``{`` open at once in the text (a value one level under the document).
MAX_BRACKETS = MAX_DEPTH - 1
#: Values (``=`` and ``,``) and opened tables/arrays a case file may hold in all.
MAX_VALUES = 20_000
#: Lines of a case file (comments and blank lines included).
MAX_LINES = 50_000
#: Joints of one kind in one case.
MAX_JOINTS = 100
#: Longest text anywhere in a file (a title-block entry, a material's source note).
MAX_TEXT = 500
#: Longest key, and longest bare token (a number, a date, a true/false).
MAX_KEY = 64
#: Longest joint name and longest text value of a joint or condition (quantities, names of materials,
#: fits, threads); quantity strings are further limited by :data:`fitcheck.qparse.MAX_CHARS`.
MAX_NAME = 100
MAX_VALUE_TEXT = 100
#: Items of the arrays the schema has (key → most items; ``key[]`` for the arrays inside it).
ARRAY_ITEMS: dict[str, int] = {
    "positions": 1000,      # one [x, y] per screw; count ≤ 1000
    "positions[]": 2,
    "layers": 50,           # clamped parts of one screw joint (common practice: far beyond any drive)
    "mu_thread": 2,         # [min, max]
    "mu_head": 2,
}
#: Items of an array the schema does not describe (it is refused later with the engine's words).
DEFAULT_ITEMS = 16
#: Unknown keys a table may hold beyond the keys it knows before it is refused as a whole
#: (each is reported with a "did you mean" by the loader).
SPARE_KEYS = 16
#: Keys of an inline table the schema does not enumerate here (an inline material has 14).
DEFAULT_KEYS = 32
#: Texts of the title block and of inline materials may be longer than other values.
LONG_TEXT_KEYS = frozenset({"project", "part", "revision", "author", "date", "source", "note"})

_TOKEN = re.compile(r'''"""|\'\'\'|"[^"\\\n]*(?:\\.[^"\\\n]*)*"?|'[^'\n]*'?|#[^\n]*|[\[\]{},=.]'''
                    r'''|[^\s\[\]{},="'#]{''' + str(MAX_KEY + 1) + ",}")

# Control characters (C0, DEL, C1) and the invisible format characters that reorder or hide text.
FORMAT_CHARACTERS = "\u061c\u200b\u200c\u200d\u200e\u200f\u202a\u202b\u202c\u202d\u202e\u2060\u2066\u2067\u2068\u2069\ufeff"
_BAD_CHARS = re.compile("[\x00-\x1f\x7f-\x9f" + FORMAT_CHARACTERS + "]")


def _line(text: str, pos: int) -> int:
    return text.count("\n", 0, pos) + 1


def scan_text(text: str, source: str = "case file") -> None:  # noqa: C901 - one linear scanner
    """Refuse TOML text that is too deep, too long or holds too many values, before parsing it.

    The scan skips comments and strings as TOML defines them and stops at the first limit
    crossed. ``tomllib`` itself recurses once per bracket, so deep nesting must be caught here.

    >>> scan_text("x = " + "[" * 3000)
    Traceback (most recent call last):
    ...
    fitcheck.errors.InputError: case file: got 'brackets nested 6 deep at line 1'; allowed: tables and arrays nested at most 6 levels deep (as the case-file format uses)
    """
    lines = text.count("\n") + 1
    if lines > MAX_LINES:
        raise InputError(source, f"{lines} lines", f"a case file of at most {MAX_LINES} lines")
    depth = values = dots = 0
    pos, n = 0, len(text)
    while pos < n:
        m = _TOKEN.search(text, pos)
        if m is None:
            return
        tok = m.group()
        last, pos = pos, m.end()
        c = tok[0]
        if c == ".":  # parts of a dotted key (or the point of a number): tomllib is quadratic in them
            dots = 1 if "\n" in text[last:m.start()] else dots + 1
            if dots >= MAX_DEPTH:
                raise InputError(source, f"a dotted key of more than {MAX_DEPTH} parts at line "
                                 f"{_line(text, m.start())}", f"tables and arrays nested at most "
                                 f"{MAX_DEPTH} levels deep (as the case-file format uses)")
            continue
        if c in "[]{},=":
            dots = 0
        if c in "[{":
            depth += 1
            values += 1
            if depth > MAX_BRACKETS:
                raise InputError(source, f"brackets nested {depth} deep at line {_line(text, m.start())}",
                                 f"tables and arrays nested at most {MAX_DEPTH} levels deep "
                                 "(as the case-file format uses)")
        elif c in "]}":
            depth = max(depth - 1, 0)
        elif c in ",=":
            values += 1
        elif c == "#":
            continue
        elif tok in ('"""', "'''"):
            end = text.find(tok, pos)
            while end != -1 and tok == '"""' and _escaped(text, end):
                end = text.find(tok, end + 1)
            if end == -1:
                return  # unterminated: tomllib says where
            if end - pos > MAX_TEXT:
                raise _too_long(text, m.start(), end - pos, source)
            pos = end + 3
        elif c in "\"'":
            if len(tok) - 2 > MAX_TEXT:
                raise _too_long(text, m.start(), len(tok) - 2, source)
        else:  # a bare token longer than any key, number or date
            raise InputError(source, f"a bare word or number of {len(tok)}+ characters at line "
                             f"{_line(text, m.start())}", f"keys and numbers of at most {MAX_KEY} characters")
        if values > MAX_VALUES:
            raise InputError(source, f"more than {MAX_VALUES} values (at line {_line(text, m.start())})",
                             f"a case file of at most {MAX_VALUES} values "
                             f"(at most {MAX_JOINTS} joints of each kind)")


def _escaped(text: str, i: int) -> bool:
    k = i
    while k > 0 and text[k - 1] == "\\":
        k -= 1
    return (i - k) % 2 == 1


def _too_long(text: str, start: int, length: int, source: str) -> InputError:
    return InputError(source, f"a text of {length} characters at line {_line(text, start)}",
                      f"texts of at most {MAX_TEXT} characters")


def check_tree(doc, source: str = "case file") -> None:
    """Refuse a parsed document nested deeper than :data:`MAX_DEPTH` or holding nan/inf.

    Iterative (no recursion), each node visited once.
    """
    stack: list[tuple[object, str, int]] = [(doc, "", 1)]
    while stack:
        obj, where, depth = stack.pop()
        if isinstance(obj, dict):
            items: Iterable = ((f"{where}.{k}" if where else str(k), v) for k, v in obj.items())
        elif isinstance(obj, list):
            items = ((f"{where}[{i}]", v) for i, v in enumerate(obj))
        else:
            if isinstance(obj, float) and not math.isfinite(obj):
                raise InputError(where or source, obj, "a finite number (nan and inf are not accepted)")
            continue
        if depth > MAX_DEPTH:
            raise InputError(where or source, "a table or array nested "
                             f"{depth} levels deep", f"tables and arrays nested at most {MAX_DEPTH} levels "
                             "deep (as the case-file format uses)")
        stack.extend((v, w, depth + 1) for w, v in items)


def bad_character(text: str) -> str | None:
    """The first control or bidi-format character of ``text`` as ``U+XXXX name``, or ``None``."""
    m = _BAD_CHARS.search(text)
    if m is None:
        return None
    ch = m.group()
    return f"U+{ord(ch):04X} {unicodedata.name(ch, 'control character')}"


def check_text(value: str, field: str, limit: int) -> None:
    """Refuse a text longer than ``limit`` or holding a control or bidi-format character."""
    if len(value) > limit:
        raise InputError(field, value, f"a text of at most {limit} characters")
    bad = bad_character(value)
    if bad is not None:
        raise InputError(field, value, "printable text without control or bidi-format characters",
                         f"it holds {bad}")


def check_case(data: Mapping, tables: Mapping[str, Iterable[str]], top: Iterable[str],
               title_keys: Iterable[str], condition_keys: Iterable[str]) -> list[InputError]:
    """Every count, length and character limit a case document breaks, before any value is read.

    ``tables`` maps each joint table name to the keys its engine knows; ``top``, ``title_keys``
    and ``condition_keys`` are the keys allowed at the top, in ``[title]`` and in ``[conditions]``.
    One error per offending field; the walk is linear in the size of the document.
    """
    errs: list[InputError] = []
    top = tuple(top)
    _keys(data, "", len(top), errs)
    for key, v in data.items():
        if key in tables:
            keys = tuple(tables[key])
            if isinstance(v, list):
                if len(v) > MAX_JOINTS:
                    errs.append(InputError(key, v, f"at most {MAX_JOINTS} [[{key}]] joints in one case"))
                    continue
                for i, entry in enumerate(v):
                    if isinstance(entry, Mapping):
                        name = entry.get("name")
                        label = f"{key}[#{i + 1}]"
                        if isinstance(name, str) and len(name) <= MAX_NAME and bad_character(name) is None:
                            label = f"{key}[{name.strip()}]"
                        _values(entry, label, len(keys), errs)
        elif key == "title" and isinstance(v, Mapping):
            _values(v, "title", len(tuple(title_keys)), errs)
        elif key == "conditions" and isinstance(v, Mapping):
            _values(v, "conditions", max(len(tuple(condition_keys)), DEFAULT_KEYS), errs)
        elif key not in top and isinstance(v, list | dict):
            _values({key: v}, "", len(top), errs)
        elif isinstance(v, str):
            _leaf(key, v, key, errs)
    return errs


def _keys(table: Mapping, where: str, most: int, errs: list[InputError]) -> bool:
    long = [k for k in table if len(str(k)) > MAX_KEY]
    for k in long[:1]:
        errs.append(InputError(f"{where}.{k}" if where else str(k), "a key of "
                               f"{len(str(k))} characters", f"keys of at most {MAX_KEY} characters"))
    if len(table) > most + SPARE_KEYS:
        errs.append(InputError(where or "case file", f"a table of {len(table)} keys",
                               f"at most {most} keys (the keys this table knows)"))
        return False
    return not long


def _values(table: Mapping, where: str, most: int, errs: list[InputError]) -> None:
    """Check a table's keys and every value under it (iteratively)."""
    if not _keys(table, where, most, errs):
        return
    stack: list[tuple[str, object, str]] = [
        (str(k), v, f"{where}.{k}" if where else str(k)) for k, v in table.items()]
    while stack:
        key, v, fld = stack.pop()
        if isinstance(v, list):
            most_items = ARRAY_ITEMS.get(key, DEFAULT_ITEMS)
            if len(v) > most_items:
                errs.append(InputError(fld, v, f"an array of at most {most_items} items"))
                continue
            stack.extend((f"{key}[]", x, f"{fld}[{i}]") for i, x in enumerate(v))
        elif isinstance(v, Mapping):
            if _keys(v, fld, DEFAULT_KEYS, errs):
                stack.extend((str(k), x, f"{fld}.{k}") for k, x in v.items())
        elif isinstance(v, str):
            _leaf(key, v, fld, errs)


def _leaf(key: str, v: str, fld: str, errs: list[InputError]) -> None:
    limit = MAX_TEXT if key in LONG_TEXT_KEYS else (MAX_NAME if key == "name" else MAX_VALUE_TEXT)
    try:
        check_text(v, fld, limit)
    except InputError as exc:
        errs.append(exc)
