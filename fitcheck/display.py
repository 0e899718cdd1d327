"""Display of results for people, in one place for the browser, the CLI and the report.

The unit system (SI or inch): which unit each kind of quantity is shown in; numbers to
3–4 significant digits in plain notation; margins as people read them.

No arithmetic of its own: every conversion goes through the one registry of
:mod:`fitcheck.units` (``quantity``, ``Q_``). Inputs stay strings with units;
switching the system rewrites them in the other system's units and remembers
the text it replaced, so switching back gives the very same text again.
"""

from __future__ import annotations

import functools
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
    from .qparse import quantity_or_none

    q = quantity_or_none(text)  # never pint on text outside the quantity grammar
    if q is None:
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


_SUPERSCRIPT = str.maketrans("0123456789-", "⁰¹²³⁴⁵⁶⁷⁸⁹⁻")


def probability(x: float, digits: int = 3) -> str:
    """A probability for people: plain notation down to 0.0001, smaller ones as "m × 10⁻ⁿ".

    Never e-notation and never "-0"; ``digits`` significant digits; NaN reads "n/a".

    >>> probability(0.0123), probability(2.634e-15), probability(0.0), probability(1e-4)
    ('0.0123', '2.63 × 10⁻¹⁵', '0', '0.0001')
    >>> probability(9.996e-5), probability(float("nan"))
    ('1 × 10⁻⁴', 'n/a')
    """
    x = float(x)
    if x != x:
        return "n/a"
    if x == 0 or not math.isfinite(x) or abs(x) >= 1e-4:
        return num(x, digits)
    e = math.floor(math.log10(abs(x)))
    m = round(x / 10.0 ** e, digits - 1)
    if abs(m) >= 10:
        m, e = m / 10.0, e + 1
    return f"{num(m, digits)} × 10{str(e).translate(_SUPERSCRIPT)}"


def deviation(v: float) -> str:
    """A deviation or clearance with its sign, to 0.001 of its unit; zero reads "0".

    Used on the fit diagrams of the plots and of the report, so both label a zone alike.

    >>> deviation(18.0), deviation(-0.0004), deviation(-12.34567), deviation(0.0)
    ('+18', '0', '-12.346', '0')
    """
    v = round(float(v), 3)
    return f"{v:+g}" if v else "0"


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


# ------------------------------------------------------------------------------------------
# Inch drawing practice: sizes to 0.0001 in (four places), tolerances and small lengths to
# 0.00001 in or in thousandths of an inch, forces to the pound, stresses in psi/ksi,
# temperatures to the degree Fahrenheit.                                    # common practice

def inch_size(value_mm: float) -> str:
    """A size held in mm shown as an inch drawing gives it, four places: ``1.0000 in``.

    >>> inch_size(25.4), inch_size(12.66698)
    ('1.0000 in', '0.4987 in')
    """
    if value_mm is None or not math.isfinite(float(value_mm)):
        return "—"
    return f"{float(Q_(float(value_mm), 'mm').to('in').magnitude):.4f} in"


def thou(value_um: float, signed: bool = False) -> str:
    """A small length held in µm shown in thousandths of an inch (0.01 thou steps).

    >>> thou(48.26), thou(-15.24, signed=True), thou(0.0)
    ('1.9 thou', '-0.6 thou', '0 thou')
    """
    if value_um is None or not math.isfinite(float(value_um)):
        return "—"
    v = round(float(Q_(float(value_um), "um").to("in").magnitude) * 1000.0, 2)
    text = f"{v:+.2f}" if signed else f"{v:.2f}"
    text = text.rstrip("0").rstrip(".") if "." in text else text
    return ("0" if text in ("+0", "-0", "") else text) + " thou"


_PROSE = None
_UNITS_RE = r"(mm|µm|um|N·mm|N·m|N\*m|kN|N|MPa|°C|degC)"
_NUM_RE = r"([-+]?\d+(?:\.\d+)?(?:e[-+]?\d+)?)"


def _prose_re():
    global _PROSE
    if _PROSE is None:
        import re
        _PROSE = (re.compile(rf"(?<![\w.]){_NUM_RE}(\s?(?:…|\.\.\.|to)\s?){_NUM_RE}(\s?){_UNITS_RE}(?![\w²³/·*])"),
                  re.compile(rf"(?<![\w.]){_NUM_RE}(\s?){_UNITS_RE}(?![\w²³/·*])"))
    return _PROSE


def inch_value(v: float, unit: str, column: bool = False) -> tuple[str, str] | None:
    """A printed SI value and its unit in inch practice: ``(number text, unit symbol)``.

    Sizes (mm) to four places of an inch, small lengths (µm, and mm below 0.1) in
    thousandths of an inch, forces in lbf, stresses in ksi (psi below 1 ksi), torques in
    lbf·in, temperatures to the °F; None for a unit this does not convert. With
    ``column=True`` (a table column shares one unit) mm are always inches and MPa always ksi.

    >>> inch_value(25.4, "mm"), inch_value(12.7, "um"), inch_value(100.0, "N·m")
    (('1.0000', 'in'), ('0.5', 'thou'), ('885.1', 'lbf·in'))
    """
    v = float(v)
    if not math.isfinite(v):
        return None
    if unit == "mm":
        if column or abs(v) >= 0.1 or v == 0:
            return inch_size(v)[:-3], "in"
        return thou(v * 1000.0)[:-5], "thou"
    if unit in ("µm", "um"):
        return thou(v)[:-5], "thou"
    if unit in ("N", "kN"):
        return num(float(Q_(v, unit).to("lbf").magnitude), 4), "lbf"
    if unit == "MPa":
        p = float(Q_(v, "MPa").to("psi").magnitude)
        return (num(p / 1000.0, 4), "ksi") if (column or abs(p) >= 1000) else (num(p, 3), "psi")
    if unit in ("N·m", "N·mm", "N*m"):
        return num(float(Q_(v, unit.replace("·", "*")).to("lbf*in").magnitude), 4), "lbf·in"
    if unit in ("°C", "degC"):
        return f"{float(Q_(v, 'degC').to('degF').magnitude):.0f}", "°F"
    return None


def text_in_system(text: str, system: str) -> str:
    """Rewrite the quantities of a printed text ("12.7 mm", "850 N", "45 MPa", "20 °C") in the
    units of ``system``, rounded as an inch drawing or report shows them; SI text is returned as is.

    Only "number unit" pairs (and ranges "a … b unit") are rewritten, so a number printed
    without its unit is never relabelled.

    >>> text_in_system("d = 25.4 mm, δ = 12.7 … 38.1 um, F = 4448.2 N, p = 68.95 MPa at 20 °C", "inch")
    'd = 1.0000 in, δ = 0.5 … 1.5 thou, F = 1000 lbf, p = 10 ksi at 68 °F'
    """
    if system != "inch" or not isinstance(text, str):
        return text
    rng, one = _prose_re()

    def sub_range(m):
        a, b = inch_value(float(m[1]), m[5]), inch_value(float(m[3]), m[5])
        if a is None or b is None or a[1] != b[1]:
            return m[0]
        return f"{a[0]}{m[2]}{b[0]} {a[1]}"

    def sub(m):
        r = inch_value(float(m[1]), m[3])
        return m[0] if r is None else f"{r[0]} {r[1]}"

    return one.sub(sub, rng.sub(sub_range, text))


def table_in_system(headers: list[str], rows: list[list], system: str) -> tuple[list[str], list[list]]:
    """Convert a printed table: columns headed ``name [unit]`` and (value, unit) column pairs.

    >>> table_in_system(["case", "δ [um]"], [["a", "12.7"]], "inch")
    (['case', 'δ [thou]'], [['a', '0.5']])
    """
    import re
    if system != "inch":
        return headers, rows
    headers, rows = list(headers), [list(r) for r in rows]
    for j, h in enumerate(headers):
        m = re.fullmatch(r"(.*)\[(.+)\]\s*", str(h))
        if not m:
            continue
        unit = m[2].strip()
        new_unit = None
        for r in rows:
            cell = str(r[j])
            pair = re.fullmatch(r"\s*([-+]?[\d.]+(?:e[-+]?\d+)?)\s*…\s*([-+]?[\d.]+(?:e[-+]?\d+)?)\s*", cell)
            if pair:
                a, b = (inch_value(float(x), unit, column=True) for x in pair.groups())
                if a is None or b is None:
                    break
                plus = cell.strip().startswith("+")
                pa = "+" if plus and float(pair[1]) >= 0 else ""
                pb = "+" if plus and float(pair[2]) >= 0 else ""
                r[j], new_unit = f"{pa}{a[0]} … {pb}{b[0]}", a[1]
                continue
            try:
                got = inch_value(float(cell.replace("+", "")), unit, column=True)
            except ValueError:
                continue
            if got is None:
                break
            r[j], new_unit = got[0], got[1]
        if new_unit:
            headers[j] = f"{m[1]}[{new_unit}]"
    low = [str(h).strip().lower() for h in headers]
    if "unit" in low and "value" in low:
        iu, iv = low.index("unit"), low.index("value")
        for r in rows:
            try:
                got = inch_value(float(str(r[iv])), str(r[iu]).strip())
            except ValueError:
                continue
            if got is not None:
                r[iv], r[iu] = got
    return headers, rows


_UNIT_WORDS = (("delta_degC", "K"), ("delta_degF", "°F"), ("degC", "°C"), ("degF", "°F"),
          ("N*mm", "N·mm"), ("N*m", "N·m"), ("lbf*in", "lbf·in"), ("kg/m**3", "kg/m³"),
          ("mm**2", "mm²"), ("in**2", "in²"), ("micrometer", "µm"), ("um", "µm"))


def words(text: str) -> str:
    """Unit spellings of input text as people write them: ``'default 2.5 um'`` -> ``'default 2.5 µm'``.

    Only whole unit words after a number or a space are rewritten (``'sum'`` stays ``'sum'``).

    >>> words("default 20 degC, 2.5 um, 3 N*m")
    'default 20 °C, 2.5 µm, 3 N·m'
    """
    return _words(str(text))


@functools.lru_cache(maxsize=4096)
def _words(text: str) -> str:
    # remembered: the pages rewrite the same input descriptions on every rerun
    import re

    out = text
    for a, b in _UNIT_WORDS:
        out = re.sub(r"(?<=[\d\s(])" + re.escape(a) + r"(?![A-Za-z*])", b, out)
    return out
