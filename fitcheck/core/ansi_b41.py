"""ANSI/ASME B4.1 standard fits (inch): vectorised look-up of the tabulated limits.

ASME B4.1-1967 (reaffirmed), "Preferred Limits and Fits for Cylindrical Parts",
tabulates for each class of fit — running and sliding RC1 … RC9, locational
clearance LC1 … LC11, locational transition LT1 … LT6, locational interference
LN1 … LN3, force and shrink FN1 … FN5 — the hole and shaft limits (added
algebraically to the basic size) and the resulting limits of clearance or
interference, in thousandths of an inch, per nominal size range "over … to"
(the upper bound included). The tables are basic-hole: the lower hole limit is 0.

This module holds no value of its own: everything comes from
``data/ansi_b41_fits.csv``, which :func:`table` reads once and checks

* the header, the class names (two letters of the five families and the class
  number the standard defines), a known status (``read`` or ``memory``);
* per class, size ranges that increase without gaps and end at 19.69 in
  (the ABC-agreed part of the tables);
* hole lower limit 0, upper limits above lower limits;
* the limits of clearance: ``clearance_min = hole_lower − shaft_upper`` and
  ``clearance_max = hole_upper − shaft_lower`` (B4.1 tables, footnote a: the pairs
  "represent minimum and maximum amounts of clearance [interference] resulting
  from application of standard tolerance limits"); negative clearance is
  interference.

Units: sizes in inch, limits in thousandths of an inch ("thou") — the units the
standard prints. The unit-aware layer (:mod:`fitcheck.fits`) converts to mm and µm.

>>> hu, hl, su, sl, why = limits_thou(1.0, "FN2")
>>> float(hu), float(hl), float(su), float(sl), int(why)
(0.8, 0.0, 1.9, 1.4, 0)

References
----------
ASME B4.1-1967 (R2009), Tables 1–5 (standard fits); reproduced in Machinery's
Handbook (27th ed., Tables 7–11; 31st ed., Tables 8a–12).
"""

from __future__ import annotations

import functools
import re
from dataclasses import dataclass

import numpy as np

from ..tables import TableError, read_rows

TABLE = "ansi_b41_fits.csv"
COLUMNS = ["class", "over_in", "upto_in", "hole", "shaft", "hole_upper_thou", "hole_lower_thou",
           "shaft_upper_thou", "shaft_lower_thou", "clearance_min_thou", "clearance_max_thou",
           "status", "source"]
#: The classes the standard defines, per family, with the family's name.
FAMILIES = {
    "RC": (9, "running and sliding fit"),
    "LC": (11, "locational clearance fit"),
    "LT": (6, "locational transition fit"),
    "LN": (3, "locational interference fit"),
    "FN": (5, "force or shrink fit"),
}
MAX_SIZE_IN = 19.69
MM_PER_IN = 25.4

# reason codes (0 = defined)
OK = 0
SIZE_NOT_POSITIVE = 1
SIZE_TOO_LARGE = 2
SIZE_NOT_FINITE = 3
UNKNOWN_CLASS = 4
NOT_AT_SIZE = 5

_CLASS_RE = re.compile(r"^(RC|LC|LT|LN|FN)\s*(\d{1,2})$", re.I)


def normalise(name: str) -> str | None:
    """``"fn 2"`` → ``"FN2"``; None when ``name`` is not a B4.1 class name.

    >>> normalise("fn 2"), normalise("RC10"), normalise("H7")
    ('FN2', None, None)
    """
    if not isinstance(name, str):
        return None
    m = _CLASS_RE.match(name.strip())
    if not m:
        return None
    fam, n = m[1].upper(), int(m[2])
    if not 1 <= n <= FAMILIES[fam][0]:
        return None
    return f"{fam}{n}"


def all_classes() -> list[str]:
    """Every class of the standard in the order of its tables.

    >>> all_classes()[:3], len(all_classes())
    (['RC1', 'RC2', 'RC3'], 34)
    """
    return [f"{f}{i}" for f, (n, _) in FAMILIES.items() for i in range(1, n + 1)]


@dataclass(frozen=True)
class ClassTable:
    """The rows of one class, as arrays over its size ranges (inch, thou)."""

    name: str
    hole: str
    shaft: str
    over_in: np.ndarray
    upto_in: np.ndarray
    hole_upper: np.ndarray
    hole_lower: np.ndarray
    shaft_upper: np.ndarray
    shaft_lower: np.ndarray
    clearance_min: np.ndarray
    clearance_max: np.ndarray
    status: tuple[str, ...]
    source: tuple[str, ...]


def _f(r: dict, col: str, name: str, i: int) -> float:
    try:
        return float(r[col])
    except ValueError:
        raise TableError(f"table {name!r}, data row {i + 1}: {col} is not a number ({r[col]!r})") from None


@functools.cache
def table() -> dict[str, ClassTable]:
    """Read and check ``data/ansi_b41_fits.csv`` once; a :class:`ClassTable` per class."""
    rows = read_rows(TABLE)
    missing = [c for c in COLUMNS if c not in rows[0]]
    if missing:
        raise TableError(f"table {TABLE!r} lacks columns {missing}")
    grouped: dict[str, list[tuple[int, dict]]] = {}
    for i, r in enumerate(rows):
        name = normalise(r["class"])
        if name is None or name != r["class"]:
            raise TableError(f"table {TABLE!r}, data row {i + 1}: unknown class {r['class']!r}")
        if r["status"] not in ("read", "memory"):
            raise TableError(f"table {TABLE!r}, data row {i + 1}: status must be 'read' or 'memory'")
        grouped.setdefault(name, []).append((i, r))
    out = {}
    for name in all_classes():
        if name not in grouped:
            raise TableError(f"table {TABLE!r}: class {name} has no rows")
        part = grouped[name]
        num = {c: np.array([_f(r, c, TABLE, i) for i, r in part]) for c in COLUMNS[1:3] + COLUMNS[5:11]}
        over, upto = num["over_in"], num["upto_in"]
        if np.any(upto <= over) or np.any(over[1:] != upto[:-1]) or upto[-1] != MAX_SIZE_IN:
            raise TableError(f"table {TABLE!r}, {name}: size ranges must increase without gaps "
                             f"up to {MAX_SIZE_IN} in")
        if {r["hole"] for _, r in part} != {part[0][1]["hole"]} or \
                {r["shaft"] for _, r in part} != {part[0][1]["shaft"]}:
            raise TableError(f"table {TABLE!r}, {name}: one hole and one shaft symbol per class")
        hu, hl, su, sl = (num[c] for c in ("hole_upper_thou", "hole_lower_thou",
                                           "shaft_upper_thou", "shaft_lower_thou"))
        if np.any(hl != 0.0) or np.any(hu <= hl) or np.any(su <= sl):
            raise TableError(f"table {TABLE!r}, {name}: basic-hole limits expected "
                             "(hole lower 0, upper > lower)")
        cmin, cmax = num["clearance_min_thou"], num["clearance_max_thou"]
        bad = ~np.isclose(cmin, hl - su, atol=1e-9) | ~np.isclose(cmax, hu - sl, atol=1e-9)
        if np.any(bad):
            k = int(np.argmax(bad))
            raise TableError(f"table {TABLE!r}, {name} over {over[k]:g} to {upto[k]:g} in: limits of "
                             "clearance do not follow from the hole and shaft limits")
        out[name] = ClassTable(name, part[0][1]["hole"], part[0][1]["shaft"], over, upto,
                               hu, hl, su, sl, cmin, cmax,
                               tuple(r["status"] for _, r in part), tuple(r["source"] for _, r in part))
    return out


def range_index(size_in, name: str) -> np.ndarray:
    """Row of ``name`` whose range "over a to b" holds each size; −1 outside its ranges."""
    t = table()[name]
    x = np.asarray(size_in, dtype=float)
    idx = np.searchsorted(t.upto_in, x, side="left")
    ok = (x > t.over_in[0]) & (x <= t.upto_in[-1]) & np.isfinite(x)
    return np.where(ok, np.minimum(idx, len(t.upto_in) - 1), -1)


def limits_thou(size_in, classes):
    """Hole and shaft limits of B4.1 classes at nominal sizes, vectorised.

    Parameters
    ----------
    size_in : float or array_like
        Nominal (basic) sizes [in].
    classes : str or array_like of str
        Class names such as ``"FN2"``, broadcast against ``size_in``.

    Returns
    -------
    hole_upper, hole_lower, shaft_upper, shaft_lower : ndarray
        Limits [thousandths of an inch], NaN where undefined.
    reason : ndarray of int
        :data:`OK` where the table defines the class at the size, else a code
        (:func:`explain`).

    Examples
    --------
    >>> r = limits_thou([0.5, 2.0, 25.0], ["RC4", "LN2", "FN2"])
    >>> r[2].tolist(), r[4].tolist()
    ([-0.6, 2.1, nan], [0, 0, 2])
    """
    x, c = np.broadcast_arrays(np.asarray(size_in, dtype=float), np.asarray(classes, dtype=object))
    shape = x.shape
    x, c = x.ravel(), c.ravel()
    out = np.full((4, x.size), np.nan)
    why = np.zeros(x.size, dtype=int)
    why = np.where(~np.isfinite(x), SIZE_NOT_FINITE,
                   np.where(x <= 0, SIZE_NOT_POSITIVE, np.where(x > MAX_SIZE_IN, SIZE_TOO_LARGE, OK)))
    tabs = table()
    names = np.array([normalise(str(v)) or "" for v in c], dtype=object)
    why = np.where((names == "") & (why == OK), UNKNOWN_CLASS, why)
    for name in set(names.tolist()) - {""}:
        sel = (names == name) & (why == OK)
        if not sel.any():
            continue
        t = tabs[name]
        idx = range_index(x[sel], name)
        hit = idx >= 0
        j = np.where(hit, idx, 0)
        vals = np.stack([t.hole_upper[j], t.hole_lower[j], t.shaft_upper[j], t.shaft_lower[j]])
        out[:, sel] = np.where(hit, vals, np.nan)
        why[sel] = np.where(hit, OK, NOT_AT_SIZE)
    return (*(a.reshape(shape) for a in out), why.reshape(shape))


def explain(code: int, size_in: float, name: str) -> str:
    """The reason code of :func:`limits_thou` as a sentence."""
    if code == SIZE_NOT_POSITIVE:
        return "the nominal size must be above 0"
    if code == SIZE_TOO_LARGE:
        return f"ASME B4.1's ABC-agreed tables end at {MAX_SIZE_IN} in ({MAX_SIZE_IN * MM_PER_IN:g} mm)"
    if code == SIZE_NOT_FINITE:
        return "the nominal size must be a finite number"
    if code == UNKNOWN_CLASS:
        return f"{name!r} is not a class of ASME B4.1 (RC1–RC9, LC1–LC11, LT1–LT6, LN1–LN3, FN1–FN5)"
    if code == NOT_AT_SIZE:
        t = table()[normalise(name)]
        return (f"{t.name} is tabulated only over {t.over_in[0]:g} to {t.upto_in[-1]:g} in "
                f"(not at {size_in:g} in)")
    return ""


def row_info(size_in: float, name: str) -> tuple[float, float, str, str]:
    """Range bounds, status and source of the row that holds one size (scalar helper)."""
    t = table()[name]
    k = int(range_index(size_in, name))
    if k < 0:
        raise TableError(f"{name} has no row at {size_in:g} in")
    return float(t.over_in[k]), float(t.upto_in[k]), t.status[k], t.source[k]


def valid_classes(size_in: float) -> list[str]:
    """Every class the tables define at a size, in table order.

    >>> "FN3" in valid_classes(0.5), "FN3" in valid_classes(1.0)
    (False, True)
    """
    return [n for n in all_classes() if int(range_index(size_in, n)) >= 0]
