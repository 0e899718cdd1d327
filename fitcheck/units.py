"""The one unit registry of fitcheck and the parsing helpers used at the edges.

Inputs may be pint quantities, strings such as ``"25 mm"``, ``"0.984 in"``,
``"30 N*m"``, ``"80 degC"``, ``"12000 rpm"``, or plain numbers (taken to be in
core units). The numeric core works on plain floats in the coherent set

=========  ==========================
quantity   core unit
=========  ==========================
length     mm
force      N
stress     MPa (= N/mm²)
torque     N·mm
time       s
speed      rad/s
temp.      °C absolute, K difference
density    t/mm³ (coherent with mm, N, s)
=========  ==========================

Pint costs about a hundred times a float operation, so quantities are
stripped once, here, and never enter a vectorised kernel.
"""

from __future__ import annotations

import math
import re
from numbers import Real

import numpy as np
import pint

from .errors import InputError


def _registry() -> pint.UnitRegistry:
    # pint's parsed-definitions cache (in the user's cache folder) cuts start-up from about
    # 0.25 s to 0.02 s; without a writable cache folder the registry is built from its text.
    try:
        return pint.UnitRegistry(autoconvert_offset_to_baseunit=True, cache_folder=":auto:")
    except Exception:  # pragma: no cover - read-only home, unusual file systems
        return pint.UnitRegistry(autoconvert_offset_to_baseunit=True)


ureg = _registry()
ureg.define("micrometre = 1e-6 m = um = µm = micron")
pint.set_application_registry(ureg)
Q_ = ureg.Quantity

#: Core unit of each kind of quantity the library parses.
CORE: dict[str, str] = {
    "length": "mm",
    "small_length": "um",
    "force": "N",
    "stress": "MPa",
    "torque": "N*mm",
    "moment": "N*mm",
    "speed": "rad/s",
    "time": "s",
    "density": "tonne/mm**3",
    "expansion": "1/K",
    "temperature_difference": "K",
    "stiffness": "N/mm",
    "compliance": "mm/N",
    "dimensionless": "",
    "angle": "rad",
    "area": "mm**2",
}

_DIMS = {
    "length": "[length]",
    "small_length": "[length]",
    "force": "[force]",
    "stress": "[pressure]",
    "torque": "[force] * [length]",
    "moment": "[force] * [length]",
    "speed": "1 / [time]",
    "time": "[time]",
    "density": "[mass] / [length] ** 3",
    "expansion": "1 / [temperature]",
    "temperature_difference": "[temperature]",
    "stiffness": "[force] / [length]",
    "compliance": "[length] / [force]",
    "dimensionless": "",
    "angle": "",
    "area": "[length] ** 2",
}

_EXAMPLES = {
    "length": "'25 mm' or '0.984 in'",
    "small_length": "'12 um' or '0.0005 in'",
    "force": "'1500 N' or '340 lbf'",
    "stress": "'355 MPa' or '51 ksi'",
    "torque": "'30 N*m' or '265 lbf*in'",
    "moment": "'30 N*m' or '265 lbf*in'",
    "speed": "'12000 rpm' or '1257 rad/s'",
    "time": "'3 s'",
    "density": "'7850 kg/m**3'",
    "expansion": "'11.5e-6 1/K'",
    "temperature_difference": "'60 K' or '60 delta_degC'",
    "stiffness": "'250000 N/mm'",
    "compliance": "'4e-6 mm/N'",
    "dimensionless": "'1.25'",
    "angle": "'30 deg'",
    "area": "'1800 mm**2' or '2.8 in**2'",
}


def _parse(value, field: str, kind: str | None = None):
    """``value`` as a pint quantity, or a plain float for a bare number; ``kind`` names, in the
    message for a text pint cannot read, what the field takes (with its own example)."""
    if isinstance(value, pint.Quantity):
        if value._REGISTRY is not ureg:
            value = Q_(value.magnitude, str(value.units))
        return value
    if isinstance(value, str):
        from .qparse import parse  # the restricted grammar: pint never evaluates an expression

        if kind is None:
            return parse(value, field)
        return parse(value, field, f"{_article(kind)}, e.g. {_EXAMPLES[kind]}")
    if isinstance(value, bool):
        raise InputError(field, value, "a number with a unit, not true/false")
    if isinstance(value, Real | np.floating | np.integer):
        return float(value)
    raise InputError(field, value, "a number or a string with a unit, e.g. '25 mm'")


#: Kinds whose unit holds a temperature *difference* (a coefficient per kelvin, a temperature rise):
#: an offset unit written in them (°C, °F, °Ré) means its degree, never a point on its scale.
_DELTA_KINDS = frozenset({"expansion", "temperature_difference"})
_OFFSET_UNITS = {"degree_Celsius": "delta_degree_Celsius", "degree_Fahrenheit": "delta_degree_Fahrenheit",
                 "degree_Reaumur": "delta_degree_Reaumur"}
_NAME = re.compile(r"(?<![\w.])[^\W\d][\w°]*|°[A-Za-z]+|℃|℉")


def _offset_as_delta(value):
    """``value`` with every offset temperature unit replaced by its degree (``degC`` -> ``delta_degC``).

    A coefficient of expansion in ``1/degC`` is 1 per degree Celsius: the same size as ``1/K``.
    pint reads ``"23.4e-6 1/degC"`` as 1/(an absolute temperature of 1 °C = 274.15 K) and gives
    8.5e-8/K; ``"13e-6 1/degF"`` likewise. Here the units are rewritten before pint sees them, so
    ``1/K``, ``1/degC``, ``1/delta_degC`` and ``1/degF`` (× 5/9) all give the same coefficient.

    >>> _offset_as_delta("23.4e-6 1/degC")
    '23.4e-6 1/delta_degree_Celsius'
    >>> _offset_as_delta("60 °F")
    '60 delta_degree_Fahrenheit'
    """
    if isinstance(value, pint.Quantity):
        units = value._units
        if any(name in _OFFSET_UNITS for name in units):
            new = units
            for name, exp in units.items():
                if name in _OFFSET_UNITS:
                    new = new.remove([name]).add(_OFFSET_UNITS[name], exp)
            return Q_(value.magnitude, new)
        return value
    if not isinstance(value, str):
        return value

    def swap(m):
        tok = m.group(0).replace("℃", "degC").replace("℉", "degF")
        try:
            names = ureg.parse_unit_name(tok)
        except Exception:  # pint raises several types on odd names
            return m.group(0)
        if len(names) == 1 and names[0][1] in _OFFSET_UNITS and not names[0][0]:
            return _OFFSET_UNITS[names[0][1]]
        return m.group(0)
    return _NAME.sub(swap, value)


def to_core(value, kind: str, field: str, *, lo: float | None = None, hi: float | None = None,
            lo_open: bool = False, hi_open: bool = False) -> float:
    """Parse one scalar input into a float in the core unit of ``kind``.

    Parameters
    ----------
    value : str, pint.Quantity or number
        The input; a bare number is taken as already in the core unit.
    kind : str
        A key of :data:`CORE` (``"length"``, ``"force"``, ...).
    field : str
        The input's name, used in error messages.
    lo, hi : float, optional
        Allowed range in core units; ``lo_open``/``hi_open`` make a bound strict.

    Returns
    -------
    float
        The value in the core unit of ``kind``.

    Examples
    --------
    >>> to_core("1 in", "length", "d")
    25.4
    >>> round(to_core("30 N*m", "torque", "T"), 6)
    30000.0
    >>> to_core("3 kg", "length", "d")
    Traceback (most recent call last):
    ...
    fitcheck.errors.InputError: d: got '3 kg'; allowed: a length, e.g. '25 mm' or '0.984 in'
    """
    if kind not in CORE:
        raise KeyError(kind)
    key = (value, kind) if type(value) is str else None
    out = _READ.get(key) if key is not None else None
    if out is None:
        out = _convert(value, kind, field)
        if key is not None:
            _remember(key, out)
    _check_range(out, value, kind, field, lo, hi, lo_open, hi_open)
    return out


#: Texts already read, by (text, kind): the float in the core unit before any range check.
#: Reading a text with pint costs about 0.1 ms (a case has about 100 of them, and the browser
#: checks the case again after every input); the same text always reads to the same float.
_READ: dict[tuple[str, str], float] = {}
_READ_MAX = 4096


def _remember(key: tuple[str, str], out: float) -> None:
    if len(_READ) >= _READ_MAX:
        _READ.clear()
    _READ[key] = out


def _convert(value, kind: str, field: str) -> float:
    """``value`` read and converted to the core unit of ``kind`` (no range check)."""
    q = _parse(_offset_as_delta(value) if kind in _DELTA_KINDS else value, field, kind)
    if isinstance(q, float):
        return q
    try:
        if kind in ("dimensionless", "angle") and q.dimensionless:
            return float(q.to(CORE[kind]).magnitude) if kind == "angle" else float(q.to("").magnitude)
        return float(q.to(CORE[kind]).magnitude)
    except pint.DimensionalityError:
        raise InputError(field, value, f"{_article(kind)}, e.g. {_EXAMPLES[kind]}") from None
    except Exception:
        raise InputError(field, value, f"{_article(kind)}, e.g. {_EXAMPLES[kind]}") from None


def _article(kind: str) -> str:
    name = kind.replace("_", " ")
    if kind == "small_length":
        name = "length"
    if kind == "dimensionless":
        name = "number"
    return ("an " if name[0] in "aeiou" else "a ") + name


#: Largest magnitude of a load any joint of a compact drive can see, in core units: a larger
#: value is a slip of the unit or the exponent (common practice: the same bounds as the case
#: loader's plausibility limits, ``fitcheck.case.SCOPE_LIMITS``).
MAGNITUDE_LIMITS: dict[str, float] = {"force": 1e8, "torque": 1e10, "moment": 1e10}


def _check_range(out, value, kind, field, lo, hi, lo_open, hi_open):
    if not math.isfinite(out):
        raise InputError(field, value, "a finite number")
    most = MAGNITUDE_LIMITS.get(kind)
    if most is not None and abs(out) > most and (hi is None or hi > most or lo is None or lo < -most):
        raise InputError(field, value, f"{_article(kind)} of magnitude ≤ {most:g} {CORE[kind]}",
                         "absurd for a compact drive: unit or exponent mixed up?")
    unit = CORE[kind]
    bad_lo = lo is not None and (out <= lo if lo_open else out < lo)
    bad_hi = hi is not None and (out >= hi if hi_open else out > hi)
    if bad_lo or bad_hi:
        # angles are kept in radians but written and read in degrees
        show = (lambda x: f"{round(math.degrees(x), 6):g} deg") if kind == "angle" else \
            (lambda x: f"{x:g} {unit}".rstrip())
        parts = []
        if lo is not None:
            parts.append(f"{'>' if lo_open else '>='} {show(lo)}")
        if hi is not None:
            parts.append(f"{'<' if hi_open else '<='} {show(hi)}")
        raise InputError(field, value, f"{_article(kind)} " + " and ".join(parts))


ABSOLUTE_ZERO_C = -273.15


def temperature_c(value, field: str, *, lo: float = ABSOLUTE_ZERO_C, hi: float | None = None) -> float:
    """Parse an absolute temperature into °C.

    Strings and quantities may be in degC, degF or K; a bare number is °C.

    >>> temperature_c("80 degC", "t")
    80.0
    >>> round(temperature_c("300 K", "t"), 2)
    26.85
    >>> temperature_c("-5 K", "t")
    Traceback (most recent call last):
    ...
    fitcheck.errors.InputError: t: got '-5 K'; allowed: a temperature above absolute zero (-273.15 degC = 0 K)
    """
    key = (value, "degC") if type(value) is str else None
    out = _READ.get(key) if key is not None else None
    if out is None:
        q = _parse(value, field)
        if isinstance(q, float):
            out = q
        else:
            try:
                out = float(q.to("degC").magnitude)
            except Exception:
                raise InputError(field, value, "a temperature, e.g. '80 degC', '176 degF' or '353 K'") from None
        if key is not None:
            _remember(key, out)
    if not math.isfinite(out):
        raise InputError(field, value, "a finite temperature")
    if out <= ABSOLUTE_ZERO_C + 1e-9 or out < lo:
        raise InputError(field, value, "a temperature above absolute zero (-273.15 degC = 0 K)"
                         if lo == ABSOLUTE_ZERO_C else f"a temperature >= {lo:g} degC")
    if hi is not None and out > hi:
        raise InputError(field, value, f"a temperature <= {hi:g} degC")
    return out


def number(value, field: str, *, lo: float | None = None, hi: float | None = None,
           lo_open: bool = False, hi_open: bool = False) -> float:
    """Parse a dimensionless number (a friction coefficient, a factor).

    >>> number("0.12", "mu")
    0.12
    >>> number(0.7, "mu", lo=0.0, hi=0.5)
    Traceback (most recent call last):
    ...
    fitcheck.errors.InputError: mu: got 0.7; allowed: a number >= 0 and <= 0.5
    """
    return to_core(value, "dimensionless", field, lo=lo, hi=hi, lo_open=lo_open, hi_open=hi_open)


def quantity(value: float, kind: str, to: str | None = None):
    """Put a unit back on a core-unit float: ``quantity(25.4, "length", "in")`` -> 1 inch."""
    q = Q_(value, CORE[kind])
    return q.to(to) if to else q


def plain(x: float, digits: int = 4) -> str:
    """A number to ``digits`` significant figures, in plain notation from 1e-4 up to 1e7.

    Engineers read ``42880 rpm`` faster than ``4.288e+04 rpm``; very small and very
    large values keep the exponent.

    >>> plain(42876.5), plain(4.2876), plain(0.012345), plain(2.5e8), plain(0.0)
    ('42880', '4.288', '0.01235', '2.5e+08', '0')
    """
    xf = float(x)
    if xf == 0.0 or not math.isfinite(xf):
        return f"{xf:g}"
    a = abs(xf)
    if not 1e-4 <= a < 1e7:
        return f"{xf:.{digits}g}"
    exp = math.floor(math.log10(a))
    decimals = max(0, digits - 1 - exp)
    rounded = round(xf, decimals if decimals else digits - 1 - exp)
    text = f"{rounded:.{decimals}f}"
    if "." in text:
        text = text.rstrip("0").rstrip(".")
    return text


def fmt(value: float, unit: str, digits: int = 4) -> str:
    """Format a core-unit float with its unit for display: ``fmt(12.5, "mm") -> '12.5 mm'``."""
    if value is None or (isinstance(value, float) and not math.isfinite(value)):
        return f"{value} {unit}".strip()
    return f"{plain(value, digits)} {unit}".strip()
