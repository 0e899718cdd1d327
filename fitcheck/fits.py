"""ISO 286 limits and fits: designations, tolerance zones and fits (unit-aware layer).

>>> f = fit("25 H7/p6")
>>> f.hole.upper_um, f.hole.lower_um, f.shaft.upper_um, f.shaft.lower_um, f.kind
(21.0, 0.0, 35.0, 22.0, 'interference')

The numbers come from :mod:`fitcheck.core.iso286`, which reads the tables in
``data/iso286_*.csv`` (ISO 286-1:2010, ISO 286-2:2010). Fit kinds follow the
definitions of ISO 286-1:2010, 3.4.1: a clearance fit has the smallest hole at
least as large as the largest shaft, an interference fit the largest hole at
most as large as the smallest shaft; anything else is a transition fit.
"""

from __future__ import annotations

import math
import re
from dataclasses import dataclass

import numpy as np

from .core import ansi_b41 as _a
from .core import iso286 as _k
from .errors import InputError, did_you_mean
from .tables import read_rows
from .units import to_core

MM_PER_IN = 25.4

__all__ = ["Designation", "Fit", "PreferredFit", "Zone", "ansi_classes", "ansi_deviations", "ansi_fit",
           "deviations", "fit", "parse", "preferred_fits", "valid_classes", "zone"]

_DESIG_RE = re.compile(
    r"""^\s*(?:[Øø⌀∅]|dia\.?)?\s*
        (?P<num>\d+(?:\.\d*)?|\.\d+)
        (?:\s*(?P<unit>mm|inches|inch|in|")(?=\s|/|$))?
        \s*(?P<rest>.*?)\s*$""", re.X)
_TOKEN_RE = re.compile(r"^([A-Za-z]{1,2})(\d{1,2})$")
_EXAMPLE = ("a nominal size and one or two classes, e.g. '25 H7/p6', '25 H7', '25 p6' or '1 in H7/h6', "
            "or an ASME B4.1 class, e.g. '1 in FN2'")


@dataclass(frozen=True)
class Designation:
    """A parsed fit or class designation such as ``"25 H7/p6"``.

    Attributes
    ----------
    nominal_mm : float
        Nominal size [mm] (converted from inch when ``inch``).
    hole, shaft : str or None
        Hole class (``"H7"``) and shaft class (``"p6"``), None when absent.
    inch : bool
        The nominal size was given in inch.
    text : str
        The text as given.
    ansi : str or None
        An ASME B4.1 class of fit (``"FN2"``) instead of ISO 286 classes.
    """

    nominal_mm: float
    hole: str | None
    shaft: str | None
    inch: bool
    text: str
    ansi: str | None = None


@dataclass(frozen=True)
class Zone:
    """A tolerance zone: one class at one nominal size.

    Attributes
    ----------
    feature : str
        ``"hole"`` or ``"shaft"``.
    cls : str
        The class, e.g. ``"H7"``.
    letter : str
        Fundamental-deviation letter, e.g. ``"H"``.
    grade : int
        Tolerance grade (IT01 → −1, IT0 → 0).
    nominal_mm : float
        Nominal size [mm].
    upper_um, lower_um : float
        Upper and lower limit deviations (es/ES, ei/EI) [µm].
    max_mm, min_mm : float
        Upper and lower limit sizes [mm].
    it_um : float
        Standard tolerance of the grade at this size [µm].
    """

    feature: str
    cls: str
    letter: str
    grade: int
    nominal_mm: float
    upper_um: float
    lower_um: float
    max_mm: float
    min_mm: float
    it_um: float

    @property
    def tolerance_um(self) -> float:
        """Width of the zone, upper − lower [µm]."""
        return self.upper_um - self.lower_um

    def to_dict(self) -> dict:
        """Plain dictionary for JSON: class, deviations [µm], limit sizes [mm] and [in]."""
        return {
            "class": self.cls,
            "feature": self.feature,
            "upper_um": self.upper_um,
            "lower_um": self.lower_um,
            "max_mm": self.max_mm,
            "min_mm": self.min_mm,
            "it_um": self.it_um,
            "upper_in": round(self.upper_um / 1000.0 / MM_PER_IN, 10),
            "lower_in": round(self.lower_um / 1000.0 / MM_PER_IN, 10),
            "max_in": round(self.max_mm / MM_PER_IN, 10),
            "min_in": round(self.min_mm / MM_PER_IN, 10),
        }


@dataclass(frozen=True)
class Fit:
    """A hole and a shaft zone at one nominal size (or a single zone).

    ``clearance_max_um`` = hole upper − shaft lower, ``clearance_min_um`` =
    hole lower − shaft upper; negative clearance is interference. For a single
    zone, ``kind`` is None and the clearance values are NaN.
    """

    nominal_mm: float
    hole: Zone | None
    shaft: Zone | None
    kind: str | None
    clearance_max_um: float
    clearance_min_um: float
    mean_clearance_um: float
    fit_tolerance_um: float
    system: str = "ISO 286"
    ansi_class: str | None = None
    source: str = "ISO 286-1:2010 / ISO 286-2:2010 tables (data/iso286_*.csv)"
    from_memory: bool = False

    @property
    def interference_min_um(self) -> float:
        """Smallest interference = −largest clearance [µm]."""
        return -self.clearance_max_um

    @property
    def interference_max_um(self) -> float:
        """Largest interference = −smallest clearance [µm]."""
        return -self.clearance_min_um

    @property
    def designation(self) -> str:
        if self.ansi_class:
            return f"{_a_size(self.nominal_mm):g} in {self.ansi_class}"
        classes = "/".join(z.cls for z in (self.hole, self.shaft) if z is not None)
        return f"{self.nominal_mm:g} {classes}"

    def to_dict(self) -> dict:
        """Plain dictionary for JSON (NaN for values a single zone does not have)."""
        return {
            "designation": self.designation,
            "nominal_mm": self.nominal_mm,
            "nominal_in": self.nominal_mm / MM_PER_IN,
            "hole": self.hole.to_dict() if self.hole else None,
            "shaft": self.shaft.to_dict() if self.shaft else None,
            "kind": self.kind,
            "clearance_max_um": self.clearance_max_um,
            "clearance_min_um": self.clearance_min_um,
            "mean_clearance_um": self.mean_clearance_um,
            "fit_tolerance_um": self.fit_tolerance_um,
            "interference_min_um": self.interference_min_um,
            "interference_max_um": self.interference_max_um,
            "clearance_max_in": round(self.clearance_max_um / 1000.0 / MM_PER_IN, 10),
            "clearance_min_in": round(self.clearance_min_um / 1000.0 / MM_PER_IN, 10),
            "system": self.system,
            "ansi_class": self.ansi_class,
            "source": self.source,
            "from_memory": self.from_memory,
        }


@dataclass(frozen=True)
class PreferredFit:
    """One preferred fit: basis (``"hole"``/``"shaft"``), fit (``"H7/p6"``), its customary name."""

    basis: str
    fit: str
    description: str
    source: str
    note: str = ""


# ------------------------------------------------------------------------------------------
def _class_hint(token: str, feature: str) -> str:
    """A did-you-mean hint for a class token that is wrong for ``feature``."""
    m = _TOKEN_RE.match(token)
    if not m:
        return ""
    letter, grade = m.groups()
    fixed = letter.upper() if feature == "hole" else letter.lower()
    if (feature, fixed) in _k.tables().grade_range:
        return f"did you mean {fixed + grade!r}?"
    hint = did_you_mean(letter, _k.all_letters(feature))
    return hint


def _check_class(token: str, feature: str, field: str, text: str) -> str:
    """Syntax and letter check of one class token (size-independent)."""
    info = _k.class_info(token, feature)
    if info.reason in (_k.OK, _k.GRADE_OUT_OF_RANGE):
        if info.reason == _k.GRADE_OUT_OF_RANGE:
            raise InputError(field, text, _allowed(feature),
                             _k.explain(info.reason, 1.0, token, feature))
        return token
    if info.reason == _k.WRONG_FEATURE:
        where = "hole position (first)" if feature == "hole" else "shaft position (after '/')"
        raise InputError(field, text, _allowed(feature),
                         f"{token!r} in the {where} is a {'shaft' if feature == 'hole' else 'hole'} "
                         f"class; {_class_hint(token, feature)}")
    reason = _k.explain(info.reason, 1.0, token, feature)
    hint = _class_hint(token, feature) if info.reason == _k.BAD_LETTER else ""
    raise InputError(field, text, _allowed(feature), reason + (f"; {hint}" if hint else ""))


def _allowed(feature: str) -> str:
    if feature == "hole":
        return "a hole class: upper-case letter A … ZC and grade, e.g. H7"
    return "a shaft class: lower-case letter a … zc and grade, e.g. p6"


def parse(text: str) -> Designation:
    """Read a designation such as ``"25 H7/p6"``, ``"Ø25 H7"``, ``"0.9843 in H7/p6"``.

    The nominal size comes first (mm unless followed by ``in``), then a hole
    class (upper case), a shaft class (lower case) or both as ``hole/shaft``.

    Raises
    ------
    InputError
        For anything else, with the reason and a did-you-mean hint.

    Examples
    --------
    >>> parse("Ø25 H7/p6")
    Designation(nominal_mm=25.0, hole='H7', shaft='p6', inch=False, text='Ø25 H7/p6', ansi=None)
    >>> parse("1 in h6").nominal_mm
    25.4
    >>> parse("25 H7/P6")
    Traceback (most recent call last):
    ...
    fitcheck.errors.InputError: fit: got '25 H7/P6'; allowed: a shaft class: lower-case letter a … zc and grade, e.g. p6 ('P6' in the shaft position (after '/') is a hole class; did you mean 'p6'?)
    """
    field = "fit"
    if not isinstance(text, str):
        raise InputError(field, text, _EXAMPLE)
    m = _DESIG_RE.match(text.replace(",", ".") if re.fullmatch(r"\s*\d+,\d+.*", text) else text)
    if not m:
        raise InputError(field, text, _EXAMPLE)
    unit = (m["unit"] or "mm").lower()
    inch = unit in ("in", "inch", "inches", '"')
    value = float(m["num"])
    nominal = value * MM_PER_IN if inch else value
    rest = m["rest"]
    if not rest:
        raise InputError(field, text, _EXAMPLE, "no tolerance class after the nominal size")
    if re.fullmatch(r"(?i)(RC|LC|LT|LN|FN)\s*\d{1,2}", rest):
        cls = _a.normalise(rest)
        if cls is None:
            raise InputError(field, text, "an ASME B4.1 class: RC1–RC9, LC1–LC11, LT1–LT6, LN1–LN3, FN1–FN5")
        return Designation(nominal, None, None, inch, text, cls)
    parts = [p.strip() for p in re.split(r"\s*/\s*", rest)]
    if len(parts) > 2 or any(not p for p in parts) or not all(_TOKEN_RE.match(p) for p in parts):
        hint = ""
        if re.fullmatch(r"[A-Za-z]{1,2}\d{1,2}\s+[A-Za-z]{1,2}\d{1,2}", rest):
            hint = f"write the pair with a slash: {'/'.join(rest.split())!r}"
        elif re.fullmatch(r"[A-Za-z]+", rest):
            hint = "a class needs a grade number, e.g. H7"
        raise InputError(field, text, _EXAMPLE, hint)
    hole = shaft = None
    if len(parts) == 2:
        a, b = parts
        if a[0].islower() and b[0].isupper():
            raise InputError(field, text, "hole class first, then shaft class, e.g. 'H7/p6'",
                             f"did you mean {b + '/' + a!r}?")
        hole = _check_class(a, "hole", field, text)
        shaft = _check_class(b, "shaft", field, text)
    else:
        tok = parts[0]
        feature = "hole" if tok[0].isupper() else "shaft"
        if tok[:2].lower() == "js" and tok[:2] not in ("js", "JS"):
            raise InputError(field, text, "JS (hole) or js (shaft)",
                             f"did you mean {'JS' + tok[2:]!r} or {'js' + tok[2:]!r}?")
        if len(re.match(r"[A-Za-z]+", tok)[0]) == 2 and not (tok[:2].isupper() or tok[:2].islower()):
            raise InputError(field, text, "a class written all upper case (hole) or all lower case (shaft)",
                             f"did you mean {tok.upper()!r} or {tok.lower()!r}?")
        if feature == "hole":
            hole = _check_class(tok, "hole", field, text)
        else:
            shaft = _check_class(tok, "shaft", field, text)
    if len(parts) == 2:
        for tok in parts:
            if len(re.match(r"[A-Za-z]+", tok)[0]) == 2 and not (tok[:2].isupper() or tok[:2].islower()):
                raise InputError(field, text, "classes written all upper case (hole) or all lower case (shaft)")
    return Designation(nominal, hole, shaft, inch, text)


def _nominal_mm(nominal, field: str = "nominal size") -> float:
    d = to_core(nominal, "length", field, lo=0.0, lo_open=True)
    if d > _k.MAX_SIZE_MM:
        raise InputError(field, nominal, "a nominal size over 0 up to 3150 mm",
                         "sizes above 3150 mm are outside ISO 286")
    return d


def zone(nominal, cls: str, *, js_round: bool = False) -> Zone:
    """The tolerance zone of class ``cls`` at a nominal size.

    Parameters
    ----------
    nominal : float, str or pint.Quantity
        Nominal size: a float in mm, or ``"25 mm"``, ``"0.984 in"``, a quantity.
    cls : str
        Class; upper case is a hole (``"H7"``), lower case a shaft (``"p6"``).
    js_round : bool, optional
        Apply the permitted rounding of odd IT for js7 … js11 (see
        :func:`fitcheck.core.iso286.limits_um`).

    Raises
    ------
    InputError
        Naming the reason when the standard does not define the class there.

    Examples
    --------
    >>> z = zone("25 mm", "p6")
    >>> z.upper_um, z.lower_um, round(z.max_mm, 3), round(z.min_mm, 3)
    (35.0, 22.0, 25.035, 25.022)
    >>> zone(25, "cd7")
    Traceback (most recent call last):
    ...
    fitcheck.errors.InputError: shaft class: got 'cd7 at 25 mm'; allowed: a class ISO 286 defines at that size (letter cd is tabulated only up to 10 mm)
    """
    d = _nominal_mm(nominal)
    if not isinstance(cls, str) or not cls.strip():
        raise InputError("class", cls, "a tolerance class such as 'H7' or 'p6'")
    cls = cls.strip()
    feature = "hole" if cls[0].isupper() else "shaft"
    _check_class(cls, feature, f"{feature} class", cls)
    up, lo, why = _k.limits_um(d, cls, feature, js_round=js_round)
    if int(why) != _k.OK:
        raise InputError(f"{feature} class", f"{cls} at {d:g} mm",
                         "a class ISO 286 defines at that size",
                         _k.explain(int(why), d, cls, feature))
    letter, grade = _k.split_class(cls)
    up, lo = float(up), float(lo)
    return Zone(feature, cls, letter, grade, d, up, lo, d + up / 1000.0, d + lo / 1000.0,
                float(_k.it_um(d, grade)))


def _kind(cmax: float, cmin: float) -> str:
    if cmin >= 0:
        return "clearance"
    if cmax <= 0:
        return "interference"
    return "transition"


def fit(text_or_nominal, hole: str | None = None, shaft: str | None = None, *,
        js_round: bool = False) -> Fit:
    """Limits of a fit: ``fit("25 H7/p6")`` or ``fit(25.0, "H7", "p6")``.

    A single class (``fit("25 H7")``, ``fit(25, shaft="p6")``) gives a Fit with
    one zone and ``kind=None``.

    Examples
    --------
    >>> f = fit(25.0, "H7", "g6")
    >>> f.kind, f.clearance_max_um, f.clearance_min_um
    ('clearance', 41.0, 7.0)
    >>> fit("50 H7/k6").kind
    'transition'
    """
    if isinstance(text_or_nominal, str) and hole is None and shaft is None:
        des = parse(text_or_nominal)
        if des.ansi:
            return ansi_fit(des.nominal_mm, des.ansi)
        d, hole, shaft = des.nominal_mm, des.hole, des.shaft
    else:
        d = _nominal_mm(text_or_nominal)
        if hole is None and shaft is None:
            raise InputError("fit", text_or_nominal, _EXAMPLE, "no tolerance class given")
        if hole is not None and (not isinstance(hole, str) or not hole.strip()[:1].isupper()):
            raise InputError("hole class", hole, _allowed("hole"), _class_hint(str(hole), "hole"))
        if shaft is not None and (not isinstance(shaft, str) or not shaft.strip()[:1].islower()):
            raise InputError("shaft class", shaft, _allowed("shaft"), _class_hint(str(shaft), "shaft"))
    zh = zone(d, hole, js_round=js_round) if hole else None
    zs = zone(d, shaft, js_round=js_round) if shaft else None
    if zh is not None and zs is not None:
        cmax = zh.upper_um - zs.lower_um
        cmin = zh.lower_um - zs.upper_um
        return Fit(d, zh, zs, _kind(cmax, cmin), cmax, cmin, (cmax + cmin) / 2.0, cmax - cmin)
    nan = math.nan
    return Fit(d, zh, zs, None, nan, nan, nan, nan)


def deviations(nominal_mm, classes, feature: str, *, js_round: bool = False,
               reasons: bool = False):
    """Limit deviations of many (size, class) pairs at once, vectorised.

    Parameters
    ----------
    nominal_mm : float or array_like
        Nominal sizes [mm] (plain numbers: this is the fast path).
    classes : str or array_like of str
        Classes, broadcast against ``nominal_mm``.
    feature : {"hole", "shaft"}
    js_round : bool, optional
        See :func:`zone`.
    reasons : bool, optional
        Also return the reason codes (:mod:`fitcheck.core.iso286`).

    Returns
    -------
    upper_um, lower_um : ndarray
        Limit deviations [µm], NaN where undefined.
    ok : ndarray of bool
        True where the standard defines the class at the size.

    Examples
    --------
    >>> up, lo, ok = deviations([25.0, 25.0, 5.0], ["p6", "h6", "cd7"], "shaft")
    >>> up.tolist(), ok.tolist()
    ([35.0, 0.0, -46.0], [True, True, True])
    """
    if feature not in ("hole", "shaft"):
        raise InputError("feature", feature, "'hole' or 'shaft'", did_you_mean(str(feature), ["hole", "shaft"]))
    up, lo, why = _k.limits_um(nominal_mm, classes, feature, js_round=js_round)
    ok = why == _k.OK
    return (up, lo, ok, why) if reasons else (up, lo, ok)


def valid_classes(nominal_mm, feature: str) -> list[str]:
    """Every class ISO 286 defines for ``feature`` at the size, in the order letters then grades.

    >>> valid_classes(25.0, "hole")[:3]
    ['A9', 'A10', 'A11']
    """
    if feature not in ("hole", "shaft"):
        raise InputError("feature", feature, "'hole' or 'shaft'", did_you_mean(str(feature), ["hole", "shaft"]))
    return _k.valid_classes(_nominal_mm(nominal_mm), feature)


def preferred_fits() -> list[PreferredFit]:
    """The preferred hole-basis and shaft-basis fits (data/preferred_fits.csv).

    >>> [p.fit for p in preferred_fits() if p.basis == "hole"][:3]
    ['H11/c11', 'H9/d9', 'H8/f7']
    """
    return [PreferredFit(r["basis"], r["fit"], r["description"], r["source"], r.get("note", ""))
            for r in read_rows("preferred_fits.csv")]


# ------------------------------------------------------------------------------------------
# ASME B4.1 (inch) standard fits
UM_PER_THOU = 25.4  # 0.001 in = 25.4 µm exactly (NIST SP 811)


def _a_size(nominal_mm: float) -> float:
    """Nominal size in inch, rounded to 1e-9 in so "0.71 in" stays in the range "to 0.71"."""
    return round(float(nominal_mm) / MM_PER_IN, 9)


def _grade(sym: str) -> int:
    m = re.search(r"(\d+)$", sym or "")
    return int(m[1]) if m else 0


def ansi_fit(nominal, cls: str) -> Fit:
    """Limits of an ASME B4.1 standard fit: ``ansi_fit("1 in", "FN2")``.

    Parameters
    ----------
    nominal : float, str or pint.Quantity
        Nominal (basic) size: a float in mm, or ``"1 in"``, ``"25.4 mm"``, a quantity.
    cls : str
        Class of fit: RC1 … RC9, LC1 … LC11, LT1 … LT6, LN1 … LN3, FN1 … FN5.

    Returns
    -------
    Fit
        Hole and shaft zones with their limit deviations in µm (the tables' thousandths
        of an inch × 25.4), ``system = "ASME B4.1"``, ``ansi_class`` and the ``source``
        of the table row; ``from_memory`` is True where the row was typed from
        recollection rather than read from a printed table.

    Examples
    --------
    >>> f = ansi_fit("1 in", "FN2")
    >>> f.designation, f.kind, round(f.interference_min_um, 2), round(f.interference_max_um, 2)
    ('1 in FN2', 'interference', 15.24, 48.26)
    >>> ansi_fit("25 in", "RC4")
    Traceback (most recent call last):
    ...
    fitcheck.errors.InputError: fit: got '25 in RC4'; allowed: a nominal size over 0 to 19.69 in (ASME B4.1's ABC-agreed tables end at 19.69 in (500.126 mm))
    """
    name = _a.normalise(cls) if isinstance(cls, str) else None
    if name is None:
        raise InputError("fit", cls, "an ASME B4.1 class: RC1–RC9, LC1–LC11, LT1–LT6, LN1–LN3, FN1–FN5",
                         did_you_mean(str(cls).upper().replace(" ", ""), _a.all_classes()))
    d = to_core(nominal, "length", "nominal size", lo=0.0, lo_open=True)
    size = _a_size(d)
    hu, hl, su, sl, why = (float(v) if i < 4 else int(v)
                           for i, v in enumerate(_a.limits_thou(size, name)))
    if why != _a.OK:
        allowed = (f"a nominal size over 0 to {_a.MAX_SIZE_IN} in" if why == _a.SIZE_TOO_LARGE
                   else f"a size at which {name} is tabulated")
        raise InputError("fit", f"{size:g} in {name}", allowed, _a.explain(why, size, name))
    t = _a.table()[name]
    over, upto, status, source = _a.row_info(size, name)
    zones = []
    for feature, sym, up, lo in (("hole", t.hole, hu, hl), ("shaft", t.shaft, su, sl)):
        up_um, lo_um = round(up * UM_PER_THOU, 6), round(lo * UM_PER_THOU, 6)
        label = sym or f"{name} {feature}"
        zones.append(Zone(feature, label, re.match(r"[A-Za-z]*", sym)[0] if sym else "", _grade(sym), d,
                          up_um, lo_um, round(d + up_um / 1000.0, 9), round(d + lo_um / 1000.0, 9),
                          round(up_um - lo_um, 6)))
    zh, zs = zones
    cmax = round(zh.upper_um - zs.lower_um, 6)
    cmin = round(zh.lower_um - zs.upper_um, 6)
    src = f"{source}, {name}, over {over:g} to {upto:g} in"
    if status == "memory":
        src += " (row typed from memory: not yet checked against the printed table)"
    return Fit(d, zh, zs, _kind(cmax, cmin), cmax, cmin, round((cmax + cmin) / 2.0, 6), round(cmax - cmin, 6),
               "ASME B4.1", name, src, status == "memory")


def ansi_deviations(nominal_mm, classes):
    """Hole and shaft limits of ASME B4.1 classes for many (size, class) pairs, vectorised.

    Parameters
    ----------
    nominal_mm : float or array_like
        Nominal sizes [mm] (plain numbers).
    classes : str or array_like of str
        B4.1 class names, broadcast against ``nominal_mm``.

    Returns
    -------
    hole_upper_um, hole_lower_um, shaft_upper_um, shaft_lower_um : ndarray
        Limits [µm], NaN where undefined.
    ok : ndarray of bool

    Examples
    --------
    >>> hu, hl, su, sl, ok = ansi_deviations([25.4, 25.4], ["FN2", "RC4"])
    >>> [round(v, 2) for v in su.tolist()], ok.tolist()
    ([48.26, -20.32], [True, True])
    """
    size = np.round(np.asarray(nominal_mm, dtype=float) / MM_PER_IN, 9)
    hu, hl, su, sl, why = _a.limits_thou(size, classes)
    return hu * UM_PER_THOU, hl * UM_PER_THOU, su * UM_PER_THOU, sl * UM_PER_THOU, why == _a.OK


def ansi_classes(nominal_mm=None) -> list[str]:
    """The ASME B4.1 classes of fit (all, or those tabulated at a nominal size in mm).

    >>> ansi_classes()[-1], "FN3" in ansi_classes(12.7)
    ('FN5', False)
    """
    if nominal_mm is None:
        return _a.all_classes()
    return _a.valid_classes(_a_size(_nominal_mm(nominal_mm)))
