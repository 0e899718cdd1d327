"""Display of results for people, in one place for the browser, the CLI and the report.

The unit system (SI or inch): which unit each kind of quantity is shown in; numbers to
3–4 significant digits in plain notation; margins as people read them.

No arithmetic of its own: every conversion goes through the one registry of
:mod:`fitcheck.units` (``quantity``, ``Q_``). Inputs stay strings with units;
switching the system rewrites them in the other system's units and remembers
the text it replaced, so switching back gives the very same text again.
"""

from __future__ import annotations

import math

from fitcheck.units import CORE, Q_, quantity, ureg

SYSTEMS = ("SI", "inch")

#: Display unit of each kind of quantity (keys as in ``fitcheck.units.CORE``) per system.
DISPLAY: dict[str, dict[str, str]] = {
    "length": {"SI": "mm", "inch": "in"},
    "small_length": {"SI": "um", "inch": "in"},
    "force": {"SI": "N", "inch": "lbf"},
    "stress": {"SI": "MPa", "inch": "ksi"},
    "torque": {"SI": "N*m", "inch": "lbf*in"},
    "moment": {"SI": "N*m", "inch": "lbf*in"},
    "speed": {"SI": "rpm", "inch": "rpm"},
    "time": {"SI": "s", "inch": "s"},
    "density": {"SI": "kg/m**3", "inch": "lb/in**3"},
    "expansion": {"SI": "1/K", "inch": "1/delta_degF"},
    "temperature_difference": {"SI": "K", "inch": "delta_degF"},
    "stiffness": {"SI": "N/mm", "inch": "lbf/in"},
    "compliance": {"SI": "mm/N", "inch": "in/lbf"},
    "dimensionless": {"SI": "", "inch": ""},
    "angle": {"SI": "deg", "inch": "deg"},
}

#: Short printed names of units (pint's long names are too wide for a table).
_SYMBOL = {
    "mm": "mm", "in": "in", "um": "µm", "N": "N", "lbf": "lbf", "MPa": "MPa", "ksi": "ksi",
    "N*m": "N·m", "lbf*in": "lbf·in", "rpm": "rpm", "s": "s", "kg/m**3": "kg/m³",
    "lb/in**3": "lb/in³", "1/K": "1/K", "1/delta_degF": "1/°F", "K": "K", "delta_degF": "°F",
    "N/mm": "N/mm", "lbf/in": "lbf/in", "mm/N": "mm/N", "in/lbf": "in/lbf", "deg": "°",
    "degC": "°C", "degF": "°F", "N*mm": "N·mm", "uin": "µin", "psi": "psi", "mm**2": "mm²", "in**2": "in²", "": "",
}

# Input text is rewritten per dimensionality: (SI unit, inch unit).
_INPUT = [
    ("[length]", "mm", "in"),
    ("[force]", "N", "lbf"),
    ("[pressure]", "MPa", "ksi"),
    ("[force] * [length]", "N*m", "lbf*in"),
    ("[mass] / [length] ** 3", "kg/m**3", "lb/in**3"),
    ("[force] / [length]", "N/mm", "lbf/in"),
    ("[length] ** 2", "mm**2", "in**2"),
]
_SMALL = {"um", "micrometer", "micrometre", "micron", "µm", "uin", "microinch"}


def num(x: float, digits: int = 4) -> str:
    """A number with ``digits`` significant digits, in plain notation where that stays readable.

    Never in e-notation and never "-0" (a value that rounds to zero reads "0").

    >>> num(15742.3), num(0.000315, 3), num(-8.268), num(2.0), num(1.5e9), num(-1e-9), num(2e-7)
    ('15740', '0.000315', '-8.268', '2', '1500000000', '-0.000000001', '0.0000002')
    """
    x = float(x)
    if x == 0:
        return "0"
    if not math.isfinite(x):
        return f"{x:g}"
    e = math.floor(math.log10(abs(x)))
    r = round(x, digits - 1 - e)
    dec = max(digits - 1 - e, 0)
    text = f"{r:.{dec}f}"
    if "." in text:
        text = text.rstrip("0").rstrip(".")
    return "0" if text in ("-0", "") else text


def unit_for(kind: str, system: str) -> str:
    """The display unit (pint spelling) of a kind of quantity in a system."""
    return DISPLAY[kind][system if system in SYSTEMS else "SI"]


def symbol(unit: str) -> str:
    """A short printed symbol for a pint unit spelling."""
    return _SYMBOL.get(unit, unit)


def digits_for(unit: str) -> int:
    """Significant digits shown for a unit (inch lengths need more to keep a micrometre)."""
    return 5 if unit in ("in", "lbf*in", "ksi") else 4


def show(value: float | None, kind: str, system: str, digits: int | None = None) -> str:
    """Format a core-unit float in the system's display unit: ``show(25.4, "length", "inch")``."""
    if value is None or not math.isfinite(float(value)):
        return "—"
    unit = unit_for(kind, system)
    if kind == "dimensionless" or unit == CORE.get(kind):
        mag = float(value)
    else:
        mag = float(quantity(float(value), kind, unit).magnitude)
    d = digits if digits is not None else digits_for(unit)
    return f"{num(mag, d)} {symbol(unit)}".strip()


def magnitude(value: float, kind: str, system: str) -> float:
    """A core-unit float expressed in the system's display unit (a plain number)."""
    unit = unit_for(kind, system)
    if kind == "dimensionless" or unit == CORE.get(kind):
        return float(value)
    return float(quantity(float(value), kind, unit).magnitude)


def show_in(value: float, unit: str, system: str, digits: int | None = None) -> str:
    """Format a value given in ``unit`` (a :class:`fitcheck.checks.Check` unit) in the system."""
    if value is None or not math.isfinite(float(value)):
        return "—"
    target = _target_unit(unit, system)
    mag = float(value) if target == unit else float(Q_(float(value), unit).to(target).magnitude)
    d = digits if digits is not None else digits_for(target)
    return f"{num(mag, d)} {symbol(target)}".strip()


def _target_unit(unit: str, system: str) -> str:
    if not unit:
        return unit
    try:
        dim = ureg.Quantity(1.0, unit).dimensionality
    except Exception:  # a unit pint does not know: show as given
        return unit
    if unit in ("degC", "degF"):
        return "degC" if system == "SI" else "degF"
    if dim == ureg.Quantity(1.0, "um").dimensionality and unit in _SMALL:
        return "um" if system == "SI" else "in"
    for d, si, inch in _INPUT:
        if dim == ureg.get_dimensionality(d):
            return si if system == "SI" else inch
    return unit


def convert_text(text: str, system: str) -> str:
    """Rewrite an input string in the units of ``system``; text that is not a quantity is kept.

    Absolute temperatures go between °C and °F; temperature differences
    between K/delta_degC and delta_degF; plain numbers and speeds stay as they are.
    """
    if not isinstance(text, str) or not text.strip():
        return text
    try:
        q = ureg.Quantity(text.strip().replace("·", "*"))
    except Exception:
        return text
    if not hasattr(q, "units") or q.dimensionless:
        return text
    unit = str(q.units)
    target = None
    if q.dimensionality == ureg.get_dimensionality("[temperature]"):
        if unit in ("degree_Celsius", "degree_Fahrenheit"):
            target = "degC" if system == "SI" else "degF"
        elif unit in ("delta_degree_Celsius", "delta_degree_Fahrenheit", "kelvin"):
            target = "K" if system == "SI" else "delta_degF"
            if unit == "kelvin" and system == "SI":
                return text
    elif q.dimensionality == ureg.get_dimensionality("1/[temperature]"):
        target = "1/K" if system == "SI" else "1/delta_degF"
    elif unit in ("micrometer", "microinch"):
        target = "um" if system == "SI" else "uin"
    else:
        for d, si, inch in _INPUT:
            if q.dimensionality == ureg.get_dimensionality(d):
                target = si if system == "SI" else inch
                break
    if target is None:
        return text
    try:
        mag = float(q.to(target).magnitude)
    except Exception:
        return text
    return f"{mag:.6g} {target}"


def show_range(pair, kind: str, system: str, digits: int | None = None) -> str:
    """A (min, max) pair of core-unit floats with the unit once: ``-8.27 … 20 µm``."""
    lo, hi = (float(x) for x in pair)
    if not (math.isfinite(lo) and math.isfinite(hi)):
        return f"{show(lo, kind, system, digits)} … {show(hi, kind, system, digits)}"
    unit = unit_for(kind, system)
    d = digits if digits is not None else digits_for(unit)
    a, b = magnitude(lo, kind, system), magnitude(hi, kind, system)
    return f"{num(a, d)} … {num(b, d)} {symbol(unit)}".strip()


def show_small(value_mm: float, system: str, digits: int | None = None) -> str:
    """A small length held in mm (an interference) shown in µm (SI) or inch."""
    if value_mm is None or not math.isfinite(float(value_mm)):
        return "—"
    target = "um" if system == "SI" else "in"
    mag = float(Q_(float(value_mm), "mm").to(target).magnitude)
    d = digits if digits is not None else digits_for(target)
    return f"{num(mag, d)} {symbol(target)}"


def margin_text(m: float | None, loaded: bool = True) -> str:
    """A check's relative margin as people read it.

    Margins above +999 % read ``> 10×``; an unloaded joint (``loaded=False`` or an
    infinite margin) reads ``no load``; NaN reads ``n/a``.

    >>> margin_text(0.253), margin_text(-0.0004), margin_text(101.4), margin_text(float("inf"))
    ('+25.3 %', '0.0 %', '> 10×', 'no load')
    """
    if m is None:
        return "n/a"
    m = float(m)
    if math.isnan(m):
        return "n/a"
    if not loaded or m == math.inf:
        return "no load"
    if m == -math.inf:
        return "fails (no capacity)"
    if m > 9.99:
        return "> 10×"
    text = f"{m * 100:+.1f} %"
    return "0.0 %" if text in ("+0.0 %", "-0.0 %") else text


_PROSE = (("delta_degC", "K"), ("delta_degF", "°F"), ("degC", "°C"), ("degF", "°F"),
          ("N*mm", "N·mm"), ("N*m", "N·m"), ("lbf*in", "lbf·in"), ("kg/m**3", "kg/m³"),
          ("mm**2", "mm²"), ("in**2", "in²"), ("micrometer", "µm"), ("um", "µm"))


def words(text: str) -> str:
    """Unit spellings of input text as people write them: ``'default 2.5 um'`` -> ``'default 2.5 µm'``.

    Only whole unit words after a number or a space are rewritten (``'sum'`` stays ``'sum'``).

    >>> words("default 20 degC, 2.5 um, 3 N*m")
    'default 20 °C, 2.5 µm, 3 N·m'
    """
    import re

    out = str(text)
    for a, b in _PROSE:
        out = re.sub(r"(?<=[\d\s(])" + re.escape(a) + r"(?![A-Za-z*])", b, out)
    return out
