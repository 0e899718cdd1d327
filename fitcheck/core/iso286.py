"""ISO 286 limits and fits: vectorised kernels on the tables in ``data/iso286_*.csv``.

Everything the standard tabulates is read from the tables; this module only
applies the rules the standard states in words:

* a tolerance class is a fundamental-deviation letter plus a grade
  (ISO 286-1:2010, 3.2.8);
* for shafts a … h the fundamental deviation is the upper deviation ``es`` and
  ``ei = es − IT``; for j … zc it is ``ei`` and ``es = ei + IT``; holes the same
  with ``EI``/``ES`` (ISO 286-1:2010, 5.3 and Figures 7–8);
* js/JS lie symmetrically, ``±IT/2``; the standard permits rounding an odd IT
  down to the even value for js7 … js11 (``round_odd_it`` rule, applied only
  when asked because it is a permission, not a requirement);
* holes K, M, N up to IT8 and P … ZC up to IT7, 0 … 500 mm: ES = tabulated
  value + Δ (``add_delta`` rules); special cases and exclusions from the
  footnotes (``data/iso286_special_cases.csv``).

Grades are coded as integers: IT01 → −1, IT0 → 0, IT1 … IT18 → 1 … 18.

Undefined combinations give NaN and a reason code (:data:`OK` = 0 where
defined); :func:`explain` turns a code into a sentence.
"""

from __future__ import annotations

import functools
import re
from dataclasses import dataclass

import numpy as np

from ..tables import TableError, column, range_index, read_rows, require_columns, size_ranges

IT_TABLE = "iso286_it_grades.csv"
SHAFT_TABLE = "iso286_shaft_deviations.csv"
HOLE_TABLE = "iso286_hole_deviations.csv"
DELTA_TABLE = "iso286_delta.csv"
RANGE_TABLE = "iso286_grade_ranges.csv"
RULE_TABLE = "iso286_special_cases.csv"

#: Grade names in order; the integer code of a grade is its index − 1.
GRADE_NAMES = ("01", "0") + tuple(str(g) for g in range(1, 19))
GRADE_CODES = {name: i - 1 for i, name in enumerate(GRADE_NAMES)}
MAX_SIZE_MM = 3150.0

# reason codes ------------------------------------------------------------------------------
OK = 0
SIZE_NOT_POSITIVE = 1
SIZE_TOO_LARGE = 2
SIZE_NOT_FINITE = 3
BAD_SYNTAX = 4
BAD_LETTER = 5
WRONG_FEATURE = 6
BAD_GRADE = 7
GRADE_OUT_OF_RANGE = 8
NOT_AT_SIZE = 9
IT_NOT_AT_SIZE = 10
#: Codes from EXCLUDED_BASE + k name exclusion rule k of the special-case table.
EXCLUDED_BASE = 100

REASONS = {
    OK: "defined",
    SIZE_NOT_POSITIVE: "the nominal size must be greater than 0 mm",
    SIZE_TOO_LARGE: "sizes above 3150 mm are outside ISO 286",
    SIZE_NOT_FINITE: "the nominal size is not a finite number",
    BAD_SYNTAX: "not a tolerance class (letter code and grade, e.g. H7 or p6)",
    BAD_LETTER: "not an ISO 286 letter",
    WRONG_FEATURE: "a class of the other feature (holes upper case, shafts lower case)",
    BAD_GRADE: "not an ISO 286 grade (01, 0, 1 … 18)",
    GRADE_OUT_OF_RANGE: "grade outside the range ISO 286-2 tabulates for the letter",
    NOT_AT_SIZE: "not tabulated at this nominal size",
    IT_NOT_AT_SIZE: "standard tolerance not tabulated at this nominal size",
}

_CLASS_RE = re.compile(r"^([A-Za-z]{1,2})(\d{1,2})$")
_COL_RE = re.compile(r"^(?P<letter>[A-Za-z]+?)(?P<spec>\d+(?:_\d+)?|_le\d+|_gt\d+|_other)?"
                     r"_(?P<dev>es|ei|ES|EI)_um$")


def grade_code(name: str) -> int:
    """Integer code of a grade name: ``"01"`` → −1, ``"0"`` → 0, ``"7"`` → 7.

    >>> grade_code("01"), grade_code("0"), grade_code("7")
    (-1, 0, 7)
    """
    try:
        return GRADE_CODES[str(name).strip()]
    except KeyError:
        raise ValueError(f"{name!r} is not an ISO 286 grade") from None


def grade_name(code: int) -> str:
    """Inverse of :func:`grade_code`: −1 → ``"01"``.

    >>> grade_name(-1), grade_name(11)
    ('01', '11')
    """
    return GRADE_NAMES[int(code) + 1]


@dataclass(frozen=True)
class _Column:
    index: int          # row of _Tables.fd
    gmin: int
    gmax: int
    upper: bool         # True: the column holds es/ES; False: ei/EI
    name: str


@dataclass(frozen=True)
class _Rule:
    rule: str
    feature: str
    letters: tuple[str, ...]
    gmin: int
    gmax: int
    over: float
    upto: float
    value: float
    note: str
    source: str

    def matches(self, feature: str, letter: str, grade: int) -> bool:
        return ((self.feature in ("any", feature))
                and ("*" in self.letters or letter in self.letters)
                and self.gmin <= grade <= self.gmax)


@dataclass(frozen=True)
class _Tables:
    it: np.ndarray                       # (ranges, 20): IT01, IT0, IT1 … IT18 [µm]
    it_over: np.ndarray
    it_upto: np.ndarray
    fd: np.ndarray                       # (columns, ranges) fundamental deviations [µm]
    fd_over: np.ndarray
    fd_upto: np.ndarray
    columns: dict                        # (feature, letter) -> tuple[_Column, ...]
    delta: np.ndarray                    # (ranges, grades) Δ [µm]
    delta_grades: tuple[int, ...]
    grade_range: dict                    # (feature, letter) -> (gmin, gmax)
    letters: dict                        # feature -> tuple of letters in table order
    rules: tuple[_Rule, ...]


def _grade_span(spec: str | None) -> tuple[int, int]:
    lo, hi = -1, 18
    if spec is None:
        return lo, hi
    if spec.startswith("_le"):
        return lo, int(spec[3:])
    if spec.startswith("_gt"):
        return int(spec[3:]) + 1, hi
    if spec == "_other":
        return lo, hi  # resolved by lookup order: explicit columns first
    a, _, b = spec.partition("_")
    return int(a), int(b or a)


@functools.cache
def tables() -> _Tables:
    """Load and check the ISO 286 tables once (cached)."""
    require_columns(IT_TABLE, ["over_mm", "upto_mm"] + [f"IT{g}_um" for g in GRADE_NAMES])
    it_over, it_upto = size_ranges(IT_TABLE)
    it = np.column_stack([column(IT_TABLE, f"IT{g}_um") for g in GRADE_NAMES])
    with np.errstate(invalid="ignore"):
        if np.any(np.diff(it, axis=1) <= 0) or np.any(np.diff(it, axis=0) < 0):
            raise TableError(f"{IT_TABLE}: IT values must grow with grade and with size")
    if it_upto[-1] != MAX_SIZE_MM:
        raise TableError(f"{IT_TABLE}: the last range must end at {MAX_SIZE_MM:g} mm")

    fd_over, fd_upto = size_ranges(SHAFT_TABLE)
    h_over, h_upto = size_ranges(HOLE_TABLE)
    if not (np.array_equal(fd_over, h_over) and np.array_equal(fd_upto, h_upto)):
        raise TableError("shaft and hole deviation tables must share their size ranges")

    fd_rows, columns = [], {}
    for feature, name in (("shaft", SHAFT_TABLE), ("hole", HOLE_TABLE)):
        heads = [h for h in read_rows(name)[0] if h not in ("over_mm", "upto_mm")]
        parsed = []
        for h in heads:
            m = _COL_RE.match(h)
            if not m:
                raise TableError(f"{name}: column {h!r} is not <letter>[grades]_<es|ei|ES|EI>_um")
            parsed.append((h, m["letter"], m["spec"], m["dev"]))
        for h, letter, spec, dev in parsed:
            if (feature == "shaft") != letter.islower() or (dev in ("es", "ei")) != letter.islower():
                raise TableError(f"{name}: column {h!r} has the wrong case for a {feature}")
            gmin, gmax = _grade_span(spec)
            col = _Column(len(fd_rows), gmin, gmax, dev in ("es", "ES"), h)
            fd_rows.append(column(name, h))
            cols = columns.setdefault((feature, letter), [])
            cols.append(col)
            cols.sort(key=lambda c: "_other_" in c.name)  # explicit grade columns win
    fd = np.vstack(fd_rows)

    d_over, d_upto = size_ranges(DELTA_TABLE)
    d_heads = [h for h in read_rows(DELTA_TABLE)[0] if h.startswith("delta_IT")]
    delta_grades = tuple(grade_code(h[len("delta_IT"):-len("_um")]) for h in d_heads)
    delta = np.column_stack([column(DELTA_TABLE, h) for h in d_heads])

    require_columns(RANGE_TABLE, ["feature", "letter", "grade_min", "grade_max"])
    grade_range, letters = {}, {"shaft": [], "hole": []}
    for r in read_rows(RANGE_TABLE):
        key = (r["feature"], r["letter"])
        grade_range[key] = (grade_code(r["grade_min"]), grade_code(r["grade_max"]))
        letters[r["feature"]].append(r["letter"])
    for feature in ("shaft", "hole"):
        for letter in letters[feature]:
            if letter.lower() != "js" and (feature, letter) not in columns:
                raise TableError(f"{RANGE_TABLE}: {feature} letter {letter!r} has no deviation column")

    require_columns(RULE_TABLE, ["rule", "feature", "letters", "grade_min", "grade_max",
                                 "over_mm", "upto_mm", "value_um", "note", "source"])
    rules = []
    for r in read_rows(RULE_TABLE):
        if r["rule"] not in ("add_delta", "round_odd_it", "override", "exclude"):
            raise TableError(f"{RULE_TABLE}: unknown rule {r['rule']!r}")
        rules.append(_Rule(r["rule"], r["feature"], tuple(r["letters"].split()),
                           grade_code(r["grade_min"]), grade_code(r["grade_max"]),
                           float(r["over_mm"]), float(r["upto_mm"]),
                           float(r["value_um"]) if r["value_um"].strip() else np.nan,
                           r["note"], r["source"]))
    return _Tables(it, it_over, it_upto, fd, fd_over, fd_upto,
                   {k: tuple(v) for k, v in columns.items()}, delta, delta_grades, grade_range,
                   {k: tuple(v) for k, v in letters.items()}, tuple(rules))


# ------------------------------------------------------------------------------------------
def it_um(size_mm, grade) -> np.ndarray:
    """Standard tolerance IT [µm] of a grade at a nominal size, from ISO 286-1 Table 1.

    Parameters
    ----------
    size_mm : float or ndarray
        Nominal size [mm]; ranges read "over … up to and including …".
    grade : int or ndarray of int
        Grade code (IT01 → −1, IT0 → 0, IT7 → 7).

    Returns
    -------
    ndarray
        IT [µm]; NaN outside 0 < size ≤ 3150 mm, for unknown grades and where the
        table has no value (IT01 and IT0 above 500 mm).

    Notes
    -----
    The values are those the standard tabulates (computed there from
    :math:`i = 0.45\\sqrt[3]{D} + 0.001 D` [µm] and rounded per its own rule);
    nothing is recomputed here.

    References
    ----------
    ISO 286-1:2010, Table 1 (IT1 … IT18) and Annex A, Table A.1 (IT01, IT0).

    Examples
    --------
    >>> float(it_um(25.0, 7)), float(it_um(30.0, 7)), float(it_um(30.01, 7))
    (21.0, 21.0, 25.0)
    """
    t = tables()
    size = np.asarray(size_mm, dtype=float)
    g = np.asarray(grade)
    i = range_index(IT_TABLE, size)
    col = g.astype(int) + 1
    good = (i >= 0) & (col >= 0) & (col < t.it.shape[1])
    out = t.it[np.where(good, i, 0), np.where(good, col, 0)]
    return np.where(good, out, np.nan)


def split_class(cls: str) -> tuple[str, int]:
    """Letter and grade code of a class string: ``"H7"`` → ``("H", 7)``, ``"h01"`` → ``("h", -1)``.

    Raises ValueError for text that is not letter(s) followed by a grade.

    >>> split_class("js6"), split_class("ZC11")
    (('js', 6), ('ZC', 11))
    """
    m = _CLASS_RE.match(str(cls).strip())
    if not m:
        raise ValueError(f"{cls!r} is not a tolerance class")
    return m[1], grade_code(m[2])


@dataclass(frozen=True)
class ClassInfo:
    """Size-independent facts about one class string (the per-class part of a look-up)."""

    cls: str
    feature: str
    letter: str
    grade: int
    reason: int          # OK, or a size-independent reason the class is undefined
    column: int          # row of the fundamental-deviation array, −1 for js/JS or undefined
    upper: bool          # the fundamental deviation is the upper one
    symmetric: bool      # js / JS
    delta_col: int       # column of the Δ table, −1 when Δ is not added
    delta_over: float
    delta_upto: float
    round_odd: bool      # js/JS rounding permitted for this grade


@functools.cache
def class_info(cls: str, feature: str, js_round: bool = False) -> ClassInfo:
    """Facts about class ``cls`` as a ``feature`` ("hole" or "shaft"), cached.

    >>> class_info("p6", "shaft").upper
    False
    >>> class_info("P6", "shaft").reason == WRONG_FEATURE
    True
    """
    t = tables()
    bad = dict(feature=feature, grade=0, column=-1, upper=False, symmetric=False, delta_col=-1,
               delta_over=0.0, delta_upto=0.0, round_odd=False)
    m = _CLASS_RE.match(str(cls).strip())
    if not m:
        return ClassInfo(cls=str(cls), letter="", reason=BAD_SYNTAX, **bad)
    letter, gname = m[1], m[2]
    if (feature, letter) not in t.grade_range:
        other = "hole" if feature == "shaft" else "shaft"
        code = WRONG_FEATURE if (other, letter) in t.grade_range else BAD_LETTER
        return ClassInfo(cls=str(cls), letter=letter, reason=code, **bad)
    if gname not in GRADE_CODES:
        return ClassInfo(cls=str(cls), letter=letter, reason=BAD_GRADE, **bad)
    grade = GRADE_CODES[gname]
    gmin, gmax = t.grade_range[(feature, letter)]
    bad["grade"] = grade
    if not gmin <= grade <= gmax:
        return ClassInfo(cls=str(cls), letter=letter, reason=GRADE_OUT_OF_RANGE, **bad)
    symmetric = letter.lower() == "js"
    col, upper = -1, False
    if not symmetric:
        for c in t.columns[(feature, letter)]:
            if c.gmin <= grade <= c.gmax:
                col, upper = c.index, c.upper
                break
        if col < 0:
            return ClassInfo(cls=str(cls), letter=letter, reason=GRADE_OUT_OF_RANGE, **bad)
    delta_col, d_over, d_upto, round_odd = -1, 0.0, 0.0, False
    for r in t.rules:
        if not r.matches(feature, letter, grade):
            continue
        if r.rule == "add_delta" and delta_col < 0:
            if grade not in t.delta_grades:
                raise TableError(f"{DELTA_TABLE} has no Δ for grade {gname} ({cls})")
            delta_col, d_over, d_upto = t.delta_grades.index(grade), r.over, r.upto
        elif r.rule == "round_odd_it" and js_round and symmetric:
            round_odd = True
    return ClassInfo(str(cls), feature, letter, grade, OK, col, upper, symmetric, delta_col,
                     d_over, d_upto, round_odd)


def _pack_codes(classes: np.ndarray) -> tuple[np.ndarray, np.ndarray]:
    """Unique class strings and the inverse index, fast for fixed-width ASCII arrays."""
    if classes.dtype.kind == "U" and 0 < classes.dtype.itemsize // 4 <= 8 and classes.size > 64:
        n = classes.dtype.itemsize // 4
        chars = np.ascontiguousarray(classes).view(np.uint32).reshape(classes.size, n)
        if chars.max(initial=0) < 128:
            packed = np.zeros(classes.size, dtype=np.uint64)
            for k in range(n):  # loop over characters (≤ 8), not over elements
                packed |= chars[:, k].astype(np.uint64) << np.uint64(7 * k)
            ukeys, first, inv = np.unique(packed, return_index=True, return_inverse=True)
            return classes.reshape(-1)[first], inv.reshape(-1)
    uniq, inv = np.unique(classes.astype(str).reshape(-1), return_inverse=True)
    return uniq, inv.reshape(-1)


def limits_um(size_mm, classes, feature: str, *, js_round: bool = False):
    """Upper and lower limit deviations [µm] of tolerance classes at nominal sizes.

    Vectorised: ``size_mm`` and ``classes`` broadcast against each other; each
    distinct class is resolved once and the table values are gathered with
    array indexing.

    Parameters
    ----------
    size_mm : float or ndarray
        Nominal size [mm].
    classes : str or array_like of str
        Tolerance classes, e.g. ``"H7"`` or ``["p6", "h6"]``; holes upper case,
        shafts lower case.
    feature : {"hole", "shaft"}
        Which feature the classes describe.
    js_round : bool, optional
        Round odd IT values down for js7 … js11 / JS7 … JS11 (permitted by
        ISO 286-1:2010, not required). Default False: ±IT/2 as printed.

    Returns
    -------
    upper, lower : ndarray
        Limit deviations es/ES and ei/EI [µm]; NaN where undefined.
    reason : ndarray of int
        :data:`OK` where defined, else a reason code (see :func:`explain`).

    Notes
    -----
    .. math::

        ei = es - IT \\; (a \\dots h), \\quad es = ei + IT \\; (j \\dots zc),
        \\quad ES = ES_{tab} + \\Delta \\; (K, M, N \\le IT8;\\; P \\dots ZC \\le IT7)

    References
    ----------
    ISO 286-1:2010, 5.3 (fundamental deviations), Tables 2–3 and their
    footnotes; ISO 286-2:2010 (grade ranges per letter).

    Examples
    --------
    >>> up, lo, why = limits_um(25.0, ["H7", "K7", "S6"], "hole")
    >>> up.tolist(), lo.tolist(), why.tolist()
    ([21.0, 6.0, -31.0], [0.0, -15.0, -44.0], [0, 0, 0])
    """
    if feature not in ("hole", "shaft"):
        raise ValueError(f"feature must be 'hole' or 'shaft', not {feature!r}")
    t = tables()
    size_b, cls_b = np.broadcast_arrays(np.asarray(size_mm, dtype=float), np.asarray(classes))
    shape = size_b.shape
    size = size_b.reshape(-1)
    uniq, inv = _pack_codes(cls_b.reshape(-1) if cls_b.size else cls_b.reshape(-1).astype(str))
    infos = [class_info(str(c), feature, js_round) for c in uniq]
    n = len(infos)

    def per_class(attr, dtype):
        return np.array([getattr(ci, attr) for ci in infos], dtype=dtype).reshape(n)

    c_reason = per_class("reason", np.int16)[inv]
    c_grade = per_class("grade", np.int64)[inv]
    c_col = per_class("column", np.int64)[inv]
    c_upper = per_class("upper", bool)[inv]
    c_sym = per_class("symmetric", bool)[inv]
    c_dcol = per_class("delta_col", np.int64)[inv]
    c_dover = per_class("delta_over", float)[inv]
    c_dupto = per_class("delta_upto", float)[inv]
    c_round = per_class("round_odd", bool)[inv]

    reason = np.zeros(size.shape, dtype=np.int16)
    finite = np.isfinite(size)
    reason[~finite] = SIZE_NOT_FINITE
    with np.errstate(invalid="ignore"):
        reason[finite & (size <= 0)] = SIZE_NOT_POSITIVE
        reason[finite & (size > MAX_SIZE_MM)] = SIZE_TOO_LARGE
    reason = np.where(reason == OK, c_reason, reason)

    it = it_um(size, c_grade)
    i_fd = range_index(SHAFT_TABLE, size)
    ok_fd = (i_fd >= 0) & (c_col >= 0)
    fd = np.where(ok_fd, t.fd[np.where(c_col >= 0, c_col, 0), np.where(i_fd >= 0, i_fd, 0)], np.nan)

    # Δ rule: add Δ of the class's grade where a rule says so, inside its size range
    with np.errstate(invalid="ignore"):
        use_d = (c_dcol >= 0) & (size > c_dover) & (size <= c_dupto)
    if use_d.any():
        i_d = range_index(DELTA_TABLE, size)
        use_d &= i_d >= 0
        dlt = t.delta[np.where(use_d, i_d, 0), np.where(use_d, c_dcol, 0)]
        fd = np.where(use_d, fd + dlt, fd)

    # footnote rules that depend on class and size
    for k, r in enumerate(t.rules):
        if r.rule not in ("override", "exclude"):
            continue
        hit_cls = np.array([ci.reason == OK and r.matches(feature, ci.letter, ci.grade)
                            for ci in infos], dtype=bool).reshape(n)
        if not hit_cls.any():
            continue
        with np.errstate(invalid="ignore"):
            hit = hit_cls[inv] & (size > r.over) & (size <= r.upto)
        if r.rule == "override":
            fd = np.where(hit, r.value, fd)
        else:
            reason = np.where(hit & (reason == OK), EXCLUDED_BASE + k, reason)

    # symmetric classes: ±IT/2, optionally with an odd IT rounded down
    half = it / 2.0
    with np.errstate(invalid="ignore"):
        odd = c_round & (np.mod(it, 2.0) == 1.0)
    half = np.where(odd, (it - 1.0) / 2.0, half)
    upper = np.where(c_sym, half, np.where(c_upper, fd, fd + it))
    lower = np.where(c_sym, -half, np.where(c_upper, fd - it, fd))

    reason = np.where((reason == OK) & np.isnan(it), IT_NOT_AT_SIZE, reason)
    reason = np.where((reason == OK) & np.isnan(upper), NOT_AT_SIZE, reason)
    bad = reason != OK
    upper = np.where(bad, np.nan, upper)
    lower = np.where(bad, np.nan, lower)
    return upper.reshape(shape), lower.reshape(shape), reason.reshape(shape).astype(np.int16)


def fundamental_deviation_um(size_mm, letter: str, grade: int, feature: str):
    """Fundamental deviation [µm] of a letter at a grade (the deviation nearest the zero line).

    Parameters
    ----------
    size_mm : float or ndarray
        Nominal size [mm].
    letter : str
        Fundamental-deviation letter (``"p"``, ``"K"``); not js/JS (symmetric,
        no fundamental deviation of its own).
    grade : int
        Grade code (IT01 → −1).
    feature : {"hole", "shaft"}

    Returns
    -------
    value : ndarray
        es/ES or ei/EI [µm], Δ included where the standard adds it; NaN where undefined.
    which : str
        ``"upper"`` or ``"lower"``.
    reason : ndarray of int

    References
    ----------
    ISO 286-1:2010, 5.3, Tables 2 and 3.

    Examples
    --------
    >>> v, which, _ = fundamental_deviation_um(25.0, "K", 7, "hole")
    >>> float(v), which
    (6.0, 'upper')
    """
    cls = f"{letter}{grade_name(grade)}"
    info = class_info(cls, feature)
    up, lo, why = limits_um(size_mm, cls, feature)
    which = "upper" if info.upper else "lower"
    return (up if info.upper else lo), which, why


def letter_extent(feature: str, letter: str, grade: int | None = None) -> tuple[float, float]:
    """Size span (over, up to) in which the column used for a class has values [mm].

    >>> letter_extent("shaft", "cd")
    (0.0, 10.0)
    >>> letter_extent("shaft", "t")
    (24.0, 3150.0)
    """
    t = tables()
    cols = t.columns.get((feature, letter), ())
    if letter.lower() == "js":
        return 0.0, MAX_SIZE_MM
    chosen = [c for c in cols if grade is None or c.gmin <= grade <= c.gmax][:1] if grade is not None \
        else list(cols)
    spans = []
    for c in chosen:
        good = np.flatnonzero(np.isfinite(t.fd[c.index]))
        if good.size:
            spans.append((float(t.fd_over[good[0]]), float(t.fd_upto[good[-1]])))
    if not spans:
        return (np.nan, np.nan)
    return min(s[0] for s in spans), max(s[1] for s in spans)


def explain(reason: int, size_mm: float, cls: str, feature: str) -> str:
    """One sentence saying why ``cls`` is undefined at ``size_mm`` (reason from :func:`limits_um`).

    >>> explain(NOT_AT_SIZE, 25.0, "cd7", "shaft")
    'letter cd is tabulated only up to 10 mm'
    >>> explain(GRADE_OUT_OF_RANGE, 25.0, "p14", "shaft")
    'grade 14 of p is outside ISO 286-2 (p3…p10)'
    """
    t = tables()
    reason = int(reason)
    if reason >= EXCLUDED_BASE:
        return t.rules[reason - EXCLUDED_BASE].note
    try:
        letter, grade = split_class(cls)
    except ValueError:
        letter, grade = "", None
    if reason == BAD_LETTER:
        m = re.match(r"^([A-Za-z]+)", str(cls).strip())
        shown = m[1] if m else str(cls)
        return (f"{shown!r} is not an ISO 286 letter; allowed: "
                + ", ".join(t.letters[feature]))
    if reason == WRONG_FEATURE:
        if feature == "shaft":
            return f"{cls!r} is a hole class (upper case); shaft classes are lower case, e.g. {cls.lower()!r}"
        return f"{cls!r} is a shaft class (lower case); hole classes are upper case, e.g. {cls.upper()!r}"
    if reason == BAD_SYNTAX:
        return f"{cls!r} is not a tolerance class (a letter code and a grade, e.g. H7 or p6)"
    if reason == BAD_GRADE:
        g = re.sub(r"^[A-Za-z]+", "", str(cls).strip())
        return f"grade {g} is not an ISO 286 grade (01, 0, 1 … 18)"
    if reason == GRADE_OUT_OF_RANGE:
        gmin, gmax = t.grade_range[(feature, letter)]
        return (f"grade {grade_name(grade)} of {letter} is outside ISO 286-2 "
                f"({letter}{grade_name(gmin)}…{letter}{grade_name(gmax)})")
    if reason == NOT_AT_SIZE:
        only_col = len(t.columns.get((feature, letter), ())) <= 1
        over, upto = letter_extent(feature, letter, None if only_col else grade)
        what = f"letter {letter}" if only_col else cls
        if size_mm > upto:
            return f"{what} is tabulated only up to {upto:g} mm"
        if size_mm <= over:
            return f"{what} is tabulated only for sizes over {over:g} mm"
        return f"{what} is not tabulated at {size_mm:g} mm"
    if reason == IT_NOT_AT_SIZE:
        ok = np.isfinite(t.it[:, grade + 1])
        upto = float(t.it_upto[np.flatnonzero(ok)[-1]])
        return f"IT{grade_name(grade)} is tabulated only up to {upto:g} mm"
    if reason == SIZE_TOO_LARGE:
        return "sizes above 3150 mm are outside ISO 286"
    return REASONS.get(reason, f"undefined (reason {reason})")


def valid_classes(size_mm: float, feature: str) -> list[str]:
    """Every class ISO 286 defines for ``feature`` at ``size_mm``, letters then grades.

    >>> "H7" in valid_classes(25.0, "hole"), "cd7" in valid_classes(25.0, "shaft")
    (True, False)
    """
    t = tables()
    cands = [f"{letter}{grade_name(g)}" for letter in t.letters[feature]
             for g in range(t.grade_range[(feature, letter)][0],
                            t.grade_range[(feature, letter)][1] + 1)]
    if not cands:
        return []
    _, _, why = limits_um(np.full(len(cands), float(size_mm)), np.array(cands), feature)
    return [c for c, w in zip(cands, why, strict=True) if w == OK]


def all_letters(feature: str) -> tuple[str, ...]:
    """Letters of ``feature`` in the standard's order (a … zc or A … ZC).

    >>> all_letters("shaft")[:4]
    ('a', 'b', 'c', 'cd')
    """
    return tables().letters[feature]


def grade_range(feature: str, letter: str) -> tuple[int, int]:
    """(lowest, highest) grade code ISO 286-2 tabulates for a letter.

    >>> grade_range("shaft", "p")
    (3, 10)
    """
    return tables().grade_range[(feature, letter)]
