"""Rolling-bearing seats: seat classes, fit of both rings, and the operating radial clearance.

A ball bearing pressed onto its shaft and into its housing loses radial internal
clearance: the inner raceway grows, the outer raceway shrinks, and a warmer inner
ring takes a little more. Too tight and the bearing runs preloaded and hot; too
loose and the loaded ring creeps and wears its seat. A light-alloy housing
loosens its grip on a steel ring as it warms and tightens it when cold.

This module

* looks up a bearing's boundary dimensions (ISO 15), its bore and outside-diameter
  deviations (ISO 492) and its radial internal clearance (ISO 5753-1);
* recommends shaft and housing tolerance classes from the load case (DIN 5425-1);
* evaluates a seat (:func:`evaluate`): interference of both rings from the ISO 286
  classes and the bearing tolerances, smoothing (DIN 7190-1), thick-ring (Lamé)
  contact pressure and raceway deformation, thermal changes, the operating
  clearance with its check, the smallest clearance group that passes, and the
  axial force the seats hold by friction.

Inputs accept pint quantities or strings (``"20 mm"``, ``"80 degC"``); results
are plain floats in core units (mm, N, MPa; seat deviations and clearances in µm).

Examples
--------
>>> b = bearing("6204")
>>> (b.d, b.D, b.B)
(20.0, 47.0, 14.0)
>>> recommend_seats("6204", load="rotating_inner", load_ratio=0.08).shaft
'k5'
"""

from __future__ import annotations

import functools
import json
import math
import warnings
from collections.abc import Mapping
from dataclasses import dataclass, field, fields

import numpy as np

from . import materials, tables
from . import shaft as _shaft
from .checks import Check, all_passed
from .core import bearing as core
from .core import clearance_stats as stats
from .errors import ErrorCollector, InputError, MethodRangeWarning, did_you_mean
from .materials import Material
from .units import number, temperature_c, to_core

__all__ = [
    "Bearing", "BearingSeatInput", "BearingSeatResult", "KEYS", "LOAD_CASES", "LOAD_LEVELS",
    "CLEARANCE_GROUPS", "METHOD_NOTES", "RING_MATERIAL", "SeatRecommendation", "TOLERANCE_CLASSES",
    "bearing", "bore_deviation", "designations", "evaluate", "load_level_from_ratio",
    "outside_deviation", "radial_clearance", "recommend_seats", "ring_material",
]

DIMENSIONS_TABLE = "bearings_iso15.csv"
TOLERANCE_TABLE = "bearing_tolerances_iso492.csv"
CLEARANCE_TABLE = "bearing_clearance_iso5753.csv"
SEATS_TABLE = "bearing_seats.csv"

TOLERANCE_CLASSES = ("Normal", "6", "5")
CLEARANCE_GROUPS = ("C2", "N", "C3", "C4", "C5")
LOAD_CASES = ("rotating_inner", "point_inner")
LOAD_LEVELS = ("light", "normal", "heavy")
AXIAL_LOCATIONS = ("shoulder", "circlip", "none")

#: Split of the load levels by P/C (DIN 5425-1, from memory): light ≤ 0.05 < normal ≤ 0.10 < heavy.
LOAD_LEVEL_LIMITS = (0.05, 0.10)

#: Name of the ring material in data/materials.csv (through-hardened rolling-bearing steel).
RING_MATERIAL = "100Cr6"

#: Defaults of the optional keys.
DEFAULTS = {
    "rz_shaft": 2.5,        # µm, ground seat (common practice)
    "rz_housing": 6.3,      # µm, fine-turned or reamed bore (common practice)
    "rz_ring": 1.6,         # µm, ground bore and outside diameter of a bearing ring (common practice)
    "temperature_assembly": 20.0,  # °C, reference temperature of ISO 286 sizes (ISO 1:2016)
    "friction": None,       # per seat from data/pressfit_friction.csv (DIN 7190-1:2017, press fit, oiled)
    "hoop_stress_limit": 175.0,  # MPa, ≈ 25 ksi for through-hardened rings (common practice, from memory)
}

#: Keys of a ``[[bearing]]`` table with their meaning and unit.
KEYS: dict[str, str] = {
    "name": "name of the seat (text)",
    "designation": "bearing designation after ISO 15, e.g. '6204', '61805', '7205B'",
    "shaft": "ISO 286 shaft class of the inner-ring seat, e.g. 'k5', or 'auto' for the recommendation",
    "housing": "ISO 286 housing class of the outer-ring seat, e.g. 'H7', or 'auto'",
    "tolerance_class": "bearing tolerance class after ISO 492: 'Normal', '6' or '5' (default Normal)",
    "clearance_group": "radial internal clearance group after ISO 5753-1: C2, N, C3, C4, C5 (default N)",
    "load": "load case: 'rotating_inner' (load rotates relative to the inner ring) or 'point_inner' "
            "(load stationary relative to the inner ring) (default rotating_inner)",
    "load_ratio": "equivalent load over dynamic load rating, P/C [-]; sets load_level",
    "load_level": "'light' (P/C <= 0.05), 'normal' (<= 0.10) or 'heavy' (default normal)",
    "shaft_material": "material name of data/materials.csv or an inline table (default C45E)",
    "housing_material": "material name or an inline table (default C45E)",
    "housing_outer_diameter": "outer diameter of the housing around the seat [length] (default: massive)",
    "housing_wall": "wall thickness of the housing around the seat [length] (instead of the diameter)",
    "shaft_bore": "bore of a hollow shaft [length] (default 0, solid)",
    "rz_shaft": "mean roughness depth Rz of the shaft seat [length] (default 2.5 um)",
    "rz_housing": "Rz of the housing bore [length] (default 6.3 um)",
    "rz_ring": "Rz of the ring bore and outside diameter [length] (default 1.6 um)",
    "temperature_inner": "operating temperature of the inner ring [temperature] (default: assembly)",
    "temperature_outer": "operating temperature of the outer ring (default: temperature_inner)",
    "temperature_shaft": "operating temperature of the shaft seat (default: temperature_inner)",
    "temperature_housing": "operating temperature of the housing (default: temperature_outer)",
    "temperature_assembly": "temperature at which the fit limits hold [temperature] (default 20 degC)",
    "axial_force": "axial force the bearing carries [force] (default 0)",
    "axial_location": "how the rings are located axially: 'shoulder', 'circlip' or 'none' (friction only)",
    "clearance_min": "smallest acceptable operating radial clearance [length] (default 0)",
    "friction": "coefficient of friction of both seats for axial slip [-] (default per seat: "
                "data/pressfit_friction.csv, longitudinal press fit, oiled; steel 0.08, aluminium 0.05)",
    "hoop_stress_limit": "permissible hoop stress at the inner-ring bore [stress] (default 175 MPa)",
    "temperature_min": "lowest ambient temperature, all parts at it [temperature] (optional; also read from "
                       "[conditions]): a cold light-alloy housing tightens the outer ring",
    "temperature_max": "highest ambient temperature, all parts at it [temperature] (optional; also read "
                       "from [conditions])",
    "clearance_distribution": "how each tolerance band is spread in the probable clearance: 'normal' "
                              "(±3σ = band, default) or 'uniform'",
}
KEYS.update(_shaft.BEARING_KEYS)  # the shaft at the ring edge (DIN 743), fitcheck.shaft

#: The method step by step, with the clause it follows (printed in reports).
METHOD_NOTES: list[tuple[str, str]] = [
    ("Boundary dimensions d, D, B, r_min of the bearing", "ISO 15:2017, dimension series 18, 19, 00, 10, 02, 03"),
    ("Bore and outside-diameter deviations of the bearing (upper 0, lower negative)",
     "ISO 492:2014, Tables 2-3 (Normal), 4-5 (class 6), 6-7 (class 5)"),
    ("Recommended shaft and housing classes from the load case, load level (P/C) and housing material",
     "DIN 5425-1 recommendation tables"),
    ("Limits of interference of inner ring on shaft and of outer ring in housing, worst-case pairing",
     "ISO 286-1:2010, 3.3; ISO 286-2:2010 deviations"),
    ("Effective interference after smoothing, 0.8 (Rz_seat + Rz_ring), taken off an interference "
     "no further than to contact (a clearance seat keeps its clearance)",
     "DIN 7190-1:2017, 6.2; common practice for the clearance side"),
    ("Thermal change of both seats from the ring, shaft and housing temperatures",
     "DIN 7190-1:2017, 6.4 (free linear expansion)"),
    ("Rings as uniform thick rings: inner ring d..d+(D-d)/4, outer ring D-(D-d)/4..D; Lamé contact "
     "pressure, raceway growth and contraction, hoop stress at the inner-ring bore against 175 MPa "
     "(about 25 ksi, through-hardened rings)",
     "Shigley 10th ed., eqs. (3-50), (3-56); equivalent ring and stress limit: common practice"),
    ("Clearance loss from the inner ring running warmer than the outer ring, alpha*(ti - to)*dm",
     "common practice (bearing-trade handbooks)"),
    ("Operating clearance = initial clearance (ISO 5753-1 group) - fit-up - thermal, in every temperature "
     "state (mounted at room temperature, operating, lowest and highest ambient); the verdict holds the "
     "mean clearance (every tolerance at its mean) of the governing state against the limit",
     "ISO 5753-1:2009, Table 1"),
    ("Probable range: clearance at each seat's maximum probable interference, mean + 1/2*sqrt(T_ring^2 + "
     "T_seat^2), with the group's mean clearance; sigma of the clearance by root sum of squares (each band "
     "+-3 sigma normal, or uniform) and P(clearance < limit); the arithmetic worst case as information",
     "statistical tolerancing (RSS); probable-interference rule of bearing-engineering handbooks "
     "(from memory); fitcheck.core.clearance_stats"),
    ("Ring under circumferential load: interference at the loosest pairing after smoothing and at "
     "operating temperature, else at least at mid-tolerance", "DIN 5425-1; DIN 7190-1:2017, 6.2, 6.4"),
    ("Axial force held by friction where no shoulder or retaining ring is declared, mu*p*pi*d*B, "
     "mu per seat from data/pressfit_friction.csv (oiled longitudinal press fit)", "DIN 7190-1:2017, 7"),
]
METHOD_NOTES.extend(_shaft.METHOD_NOTES)


# --------------------------------------------------------------------------- tables

@dataclass(frozen=True)
class Bearing:
    """Boundary dimensions of a radial ball bearing (ISO 15).

    Attributes
    ----------
    designation : str
    series : str
        Bearing series, e.g. ``"62"``, ``"618"``, ``"72"``.
    kind : str
        ``"deep_groove_ball"`` or ``"angular_contact_ball"``.
    d, D, B : float
        Bore, outside diameter and width [mm]
    r_min : float
        Smallest chamfer dimension [mm]
    """

    designation: str
    series: str
    kind: str
    d: float
    D: float
    B: float
    r_min: float

    @property
    def pitch_diameter(self) -> float:
        """Mean diameter (d + D)/2 [mm], the usual stand-in for the ball-set pitch diameter."""
        return 0.5 * (self.d + self.D)


@functools.cache
def _bearings() -> dict[str, Bearing]:
    tables.require_columns(DIMENSIONS_TABLE, ["designation", "series", "kind", "d_mm", "D_mm",
                                              "B_mm", "r_min_mm"])
    out: dict[str, Bearing] = {}
    for r in tables.read_rows(DIMENSIONS_TABLE):
        b = Bearing(r["designation"].strip(), r["series"].strip(), r["kind"].strip(),
                    float(r["d_mm"]), float(r["D_mm"]), float(r["B_mm"]), float(r["r_min_mm"]))
        if not (0 < b.d < b.D) or b.B <= 0 or b.r_min <= 0:
            raise tables.TableError(f"{DIMENSIONS_TABLE}: implausible row {b}")
        if b.designation.upper() in out:
            raise tables.TableError(f"{DIMENSIONS_TABLE}: duplicate designation {b.designation}")
        out[b.designation.upper()] = b
    return out


def designations() -> list[str]:
    """Every tabulated designation."""
    return [b.designation for b in _bearings().values()]


def bearing(designation: str, field: str = "designation") -> Bearing:
    """A bearing by designation (ISO 15 boundary dimensions).

    Suffixes after a space, '-' or '/' (seals, shields, clearance) are ignored.

    >>> bearing("6205-2Z").D
    52.0
    >>> bearing("6024")
    Traceback (most recent call last):
    ...
    fitcheck.errors.InputError: designation: got '6024'; allowed: ... (did you mean ...?)
    """
    if not isinstance(designation, str) or not designation.strip():
        raise InputError(field, designation, "a bearing designation, e.g. '6204'")
    text = designation.strip().upper()
    table = _bearings()
    if text in table:
        return table[text]
    for sep in (" ", "-", "/"):
        base = text.split(sep)[0]
        if base in table:
            return table[base]
    allowed = ("a designation of data/bearings_iso15.csv (deep-groove 618, 619, 160, 60, 62, 63 and "
               "miniature 68, 69, 60, 62, 63; angular-contact 72..B, 73..B)")
    raise InputError(field, designation, allowed, did_you_mean(text, designations()))


def _checked_ranges(rows, name: str) -> None:
    over = np.array([float(r["over_mm"]) for r in rows])
    upto = np.array([float(r["upto_mm"]) for r in rows])
    if np.any(upto <= over) or np.any(over[1:] != upto[:-1]):
        raise tables.TableError(f"{name}: size ranges are not contiguous and increasing")


@functools.cache
def _tolerances() -> dict[str, tuple[dict, ...]]:
    rows = tables.read_rows(TOLERANCE_TABLE)
    out = {}
    for ring in ("inner", "outer"):
        sub = tuple(r for r in rows if r["ring"] == ring)
        _checked_ranges(sub, TOLERANCE_TABLE)
        for r in sub:
            for cls in ("normal", "class6", "class5"):
                up, lo = r[f"{cls}_upper_um"].strip(), r[f"{cls}_lower_um"].strip()
                if up and (float(up) != 0.0 or float(lo) >= 0.0):
                    raise tables.TableError(f"{TOLERANCE_TABLE}: {ring} {r['over_mm']}: upper must be 0, "
                                            "lower negative")
        out[ring] = sub
    return out


def _tolerance_class(value, field: str = "tolerance_class") -> str:
    text = str(value).strip()
    for c in TOLERANCE_CLASSES:
        if text.lower() in (c.lower(), f"p{c}".lower(), f"class {c}".lower(), f"p{c.lower()}"):
            return c
    if text.lower() in ("p0", "0", "pn"):
        return "Normal"
    raise InputError(field, value, "an ISO 492 tolerance class: Normal, 6 or 5",
                     did_you_mean(text, TOLERANCE_CLASSES))


def _deviation(ring: str, size: float, tolerance_class: str, field: str) -> tuple[float, float]:
    cls = _tolerance_class(tolerance_class)
    col = {"Normal": "normal", "6": "class6", "5": "class5"}[cls]
    for r in _tolerances()[ring]:
        if float(r["over_mm"]) < size <= float(r["upto_mm"]):
            up, lo = r[f"{col}_upper_um"].strip(), r[f"{col}_lower_um"].strip()
            if not up:
                break
            return float(up), float(lo)
    rows = _tolerances()[ring]
    raise InputError(field, size, f"a {'bore' if ring == 'inner' else 'outside diameter'} for which "
                     f"ISO 492 class {cls} is tabulated here (over {rows[0]['over_mm']} up to "
                     f"{rows[-1]['upto_mm']} mm)")


def bore_deviation(d, tolerance_class="Normal") -> tuple[float, float]:
    """Upper and lower deviation of the mean bore diameter Δdmp [µm] (ISO 492:2014).

    >>> bore_deviation(20.0, "Normal")
    (0.0, -10.0)
    >>> bore_deviation("35 mm", "5")
    (0.0, -8.0)
    """
    return _deviation("inner", to_core(d, "length", "d", lo=0, lo_open=True), tolerance_class, "d")


def outside_deviation(D, tolerance_class="Normal") -> tuple[float, float]:
    """Upper and lower deviation of the mean outside diameter ΔDmp [µm] (ISO 492:2014).

    >>> outside_deviation(47.0, "Normal")
    (0.0, -11.0)
    """
    return _deviation("outer", to_core(D, "length", "D", lo=0, lo_open=True), tolerance_class, "D")


@functools.cache
def _clearances() -> tuple[dict, ...]:
    rows = tables.read_rows(CLEARANCE_TABLE)
    _checked_ranges(rows, CLEARANCE_TABLE)
    for r in rows:
        prev = None
        for g in CLEARANCE_GROUPS:
            lo, hi = r[f"{g}_min_um"].strip(), r[f"{g}_max_um"].strip()
            if bool(lo) != bool(hi):
                raise tables.TableError(f"{CLEARANCE_TABLE}: {g} over {r['over_mm']}: min and max")
            if lo:
                if float(hi) <= float(lo) or (prev is not None and float(lo) < prev):
                    raise tables.TableError(f"{CLEARANCE_TABLE}: {g} over {r['over_mm']}: not increasing")
                prev = float(lo)
    return rows


def _group(value, field: str = "clearance_group") -> str:
    text = str(value).strip().upper()
    if text in ("CN", "NORMAL", "C0"):
        text = "N"
    if text not in CLEARANCE_GROUPS:
        raise InputError(field, value, "an ISO 5753-1 clearance group: " + ", ".join(CLEARANCE_GROUPS),
                         did_you_mean(text, CLEARANCE_GROUPS))
    return text


def radial_clearance(d, group="N") -> tuple[float, float]:
    """Smallest and largest radial internal clearance of a deep-groove ball bearing [µm].

    ISO 5753-1:2009, Table 1, by nominal bore d "over … up to and including …".

    >>> radial_clearance(20.0, "N")
    (5.0, 20.0)
    >>> radial_clearance(20.0, "C3")
    (13.0, 28.0)
    """
    g = _group(group)
    size = to_core(d, "length", "d", lo=0, lo_open=True)
    for r in _clearances():
        if float(r["over_mm"]) < size <= float(r["upto_mm"]):
            lo, hi = r[f"{g}_min_um"].strip(), r[f"{g}_max_um"].strip()
            if not lo:
                raise InputError("clearance_group", group, "a group ISO 5753-1 defines for a bore of "
                                 f"{size:g} mm: " + ", ".join(_groups_at(size)))
            return float(lo), float(hi)
    raise InputError("d", d, f"a bore up to {_clearances()[-1]['upto_mm']} mm (ISO 5753-1 table here)")


def _groups_at(d: float) -> list[str]:
    for r in _clearances():
        if float(r["over_mm"]) < d <= float(r["upto_mm"]):
            return [g for g in CLEARANCE_GROUPS if r[f"{g}_min_um"].strip()]
    return []


# --------------------------------------------------------------------------- seat recommendation

def load_level_from_ratio(load_ratio) -> str:
    """Load level from P/C: light ≤ 0.05 < normal ≤ 0.10 < heavy (DIN 5425-1, from memory).

    >>> load_level_from_ratio(0.05), load_level_from_ratio(0.08), load_level_from_ratio(0.2)
    ('light', 'normal', 'heavy')
    """
    r = number(load_ratio, "load_ratio", lo=0.0, lo_open=True, hi=2.0)
    if r <= LOAD_LEVEL_LIMITS[0]:
        return "light"
    return "normal" if r <= LOAD_LEVEL_LIMITS[1] else "heavy"


def housing_group(material: Material) -> str:
    """``"light_alloy"`` for aluminium and magnesium alloys, else ``"steel"`` (steel, cast iron).

    A material of unknown group counts as light alloy when it expands by more than 17e-6/K.
    """
    g = material.group.lower()
    if g in ("aluminium", "aluminum", "magnesium", "light_alloy"):
        return "light_alloy"
    if g in ("steel", "cast_iron", "sintered_steel", "stainless_steel"):
        return "steel"
    return "light_alloy" if material.alpha > 17e-6 else "steel"


@dataclass(frozen=True)
class SeatRecommendation:
    """Recommended ISO 286 classes for the two seats of a bearing."""

    designation: str
    load: str
    load_level: str
    housing_group: str
    shaft: str
    housing: str
    notes: tuple[str, ...] = ()
    reference: str = "DIN 5425-1 recommendation tables (from memory)"


@functools.cache
def _seat_rows() -> tuple[dict, ...]:
    rows = tables.read_rows(SEATS_TABLE)
    keys = {(r["load"], r["level"], r["feature"], r["housing_group"]) for r in rows}
    for k in keys:
        _checked_ranges([r for r in rows if (r["load"], r["level"], r["feature"], r["housing_group"]) == k],
                        SEATS_TABLE)
    return rows


def _seat_row(load, level, feature, group, size) -> dict:
    for r in _seat_rows():
        if (r["load"], r["level"], r["feature"], r["housing_group"]) == (load, level, feature, group) \
                and float(r["over_mm"]) < size <= float(r["upto_mm"]):
            return r
    top = max(float(r["upto_mm"]) for r in _seat_rows() if r["feature"] == feature)
    what = "bore" if feature == "shaft" else "outside diameter"
    raise InputError(feature, "auto", f"a {what} up to {top:g} mm for the recommendation, or a class "
                     "given explicitly")


def _choice(value, allowed, field):
    text = str(value).strip().lower()
    if text not in allowed:
        raise InputError(field, value, "one of " + ", ".join(allowed), did_you_mean(text, allowed))
    return text


def recommend_seats(designation, load="rotating_inner", load_level=None, load_ratio=None,
                    housing_material="C45E") -> SeatRecommendation:
    """Recommended shaft and housing classes for a radial ball bearing (DIN 5425-1).

    Parameters
    ----------
    designation : str or Bearing
    load : str
        ``"rotating_inner"`` (load rotates relative to the inner ring: circumferential load on the
        inner ring) or ``"point_inner"`` (load stationary relative to the inner ring).
    load_level : str, optional
        ``"light"``, ``"normal"`` or ``"heavy"``; default from ``load_ratio``, else normal.
    load_ratio : float, optional
        P/C [-].
    housing_material : str, mapping or Material
        Decides between a steel/cast-iron and a light-alloy housing.

    Examples
    --------
    >>> r = recommend_seats("6204", "rotating_inner", "normal")
    >>> r.shaft, r.housing
    ('k5', 'H7')
    >>> recommend_seats("6204", "point_inner", "normal", housing_material={"base": "C45E",
    ...     "group": "aluminium", "alpha": "23e-6 1/K"}).housing
    'P7'
    """
    b = designation if isinstance(designation, Bearing) else bearing(designation)
    load = _choice(load, LOAD_CASES, "load")
    level = _resolve_level(load_level, load_ratio)
    mat = materials.from_mapping(housing_material, "housing_material")
    group = housing_group(mat)
    rs = _seat_row(load, level, "shaft", "any", b.d)
    rh = _seat_row(load, level, "housing", group, b.D)
    notes = tuple(n for n in (rs["note"].strip(), rh["note"].strip()) if n)
    return SeatRecommendation(b.designation, load, level, group, rs["class"], rh["class"], notes)


def _resolve_level(load_level, load_ratio) -> str:
    level = None if load_level is None else _choice(load_level, LOAD_LEVELS, "load_level")
    if load_ratio is not None:
        from_ratio = load_level_from_ratio(load_ratio)
        if level is not None and level != from_ratio:
            raise InputError("load_level", load_level, f"'{from_ratio}' (load_ratio {load_ratio} gives "
                             f"{from_ratio}) or give only one of load_level, load_ratio")
        level = from_ratio
    return level or "normal"


# --------------------------------------------------------------------------- input

def ring_material() -> Material:
    """The material of the bearing rings: the ``100Cr6`` row of data/materials.csv.

    >>> ring_material().E, ring_material().max_heating_C
    (208000.0, 120.0)
    """
    try:
        return materials.get(RING_MATERIAL)
    except InputError:
        raise tables.TableError(f"data/materials.csv has no row {RING_MATERIAL!r}, the bearing-ring "
                                "steel the bearing-seat engine needs") from None


def _material_mapping(m: Material):
    try:
        if materials.get(m.name) == m:
            return m.name
    except InputError:
        pass
    out = {"name": m.name, "group": m.group, "E": f"{m.E!r} MPa", "nu": m.nu,
           "alpha": f"{m.alpha!r} 1/K", "Rp02": f"{m.Rp02!r} MPa", "Rm": f"{m.Rm!r} MPa",
           "density": f"{m.density!r} tonne/mm**3", "source": m.source, "note": m.note}
    if math.isfinite(m.max_heating_C):
        out["max_heating"] = f"{m.max_heating_C!r} degC"
    for k in ("pG", "tauB"):
        if math.isfinite(getattr(m, k)):
            out[k] = f"{getattr(m, k)!r} MPa"
    out.update(materials.fatigue_mapping(m))
    return out


@dataclass(frozen=True)
class BearingSeatInput:
    """The inputs of one bearing seat, validated and in core units.

    Lengths [mm] except roughness and ``clearance_min`` [µm]; temperatures [°C] (``None`` =
    the documented default, resolved by :func:`evaluate`); force [N]; stress [MPa]. See
    :data:`KEYS` for each field.

    Examples
    --------
    >>> inp = BearingSeatInput.from_mapping({"designation": "6204", "shaft": "k5", "housing": "H7"})
    >>> inp.clearance_group, inp.tolerance_class
    ('N', 'Normal')
    >>> BearingSeatInput.from_mapping(inp.to_mapping()) == inp
    True
    """

    designation: str
    name: str = ""
    shaft: str = "auto"
    housing: str = "auto"
    tolerance_class: str = "Normal"
    clearance_group: str = "N"
    load: str = "rotating_inner"
    load_ratio: float | None = None
    load_level: str | None = None
    shaft_material: Material = field(default_factory=lambda: materials.get("C45E"))
    housing_material: Material = field(default_factory=lambda: materials.get("C45E"))
    housing_outer_diameter: float | None = None
    housing_wall: float | None = None
    shaft_bore: float = 0.0
    rz_shaft: float = DEFAULTS["rz_shaft"]
    rz_housing: float = DEFAULTS["rz_housing"]
    rz_ring: float = DEFAULTS["rz_ring"]
    temperature_inner: float | None = None
    temperature_outer: float | None = None
    temperature_shaft: float | None = None
    temperature_housing: float | None = None
    temperature_assembly: float = DEFAULTS["temperature_assembly"]
    axial_force: float = 0.0
    axial_location: str = "shoulder"
    clearance_min: float = 0.0
    friction: float | None = DEFAULTS["friction"]
    hoop_stress_limit: float = DEFAULTS["hoop_stress_limit"]
    temperature_min: float | None = None
    temperature_max: float | None = None
    clearance_distribution: str = "normal"
    shaft_loads: _shaft.ShaftLoads = _shaft.ShaftLoads()  # shaft at the ring edge (DIN 743)

    @classmethod
    def from_mapping(cls, mapping: Mapping, field: str = "bearing") -> BearingSeatInput:
        """Validate a ``[[bearing]]`` table; every problem is collected and raised together."""
        if not isinstance(mapping, Mapping):
            raise InputError(field, mapping, "a table of bearing-seat keys")
        errs = ErrorCollector()
        vals: dict = {}
        for key in mapping:
            if key not in KEYS:
                errs.add(InputError(f"{field}.{key}", mapping[key], "a key of [[bearing]]: "
                                    + ", ".join(KEYS), did_you_mean(key, KEYS)))
        m = {k: v for k, v in mapping.items() if k in KEYS}

        def take(key, fn):
            if key in m:
                with errs.field(field):
                    vals[key] = fn(m[key], key)

        b = None
        if "designation" not in m:
            errs.add(InputError(f"{field}.designation", None, "a bearing designation, e.g. '6204'"))
        else:
            with errs.field(field):
                b = bearing(m["designation"], "designation")
                vals["designation"] = b.designation
        take("name", lambda v, k: _text(v, k))
        take("shaft", lambda v, k: _seat_class(v, k, "shaft"))
        take("housing", lambda v, k: _seat_class(v, k, "housing"))
        take("tolerance_class", lambda v, k: _tolerance_class(v, k))
        take("clearance_group", lambda v, k: _group(v, k))
        take("load", lambda v, k: _choice(v, LOAD_CASES, k))
        take("load_ratio", lambda v, k: number(v, k, lo=0.0, lo_open=True, hi=2.0))
        take("load_level", lambda v, k: _choice(v, LOAD_LEVELS, k))
        if "load_ratio" in vals and "load_level" in vals:
            with errs.field(field):
                _resolve_level(vals["load_level"], vals["load_ratio"])
        take("shaft_material", lambda v, k: materials.from_mapping(v, k))
        take("housing_material", lambda v, k: materials.from_mapping(v, k))
        take("housing_outer_diameter", lambda v, k: to_core(v, "length", k, lo=0, lo_open=True))
        take("housing_wall", lambda v, k: to_core(v, "length", k, lo=0, lo_open=True))
        if "housing_outer_diameter" in m and "housing_wall" in m:
            errs.add(InputError(f"{field}.housing_wall", m["housing_wall"],
                                "only one of housing_outer_diameter and housing_wall"))
        take("shaft_bore", lambda v, k: to_core(v, "length", k, lo=0))
        for k in ("rz_shaft", "rz_housing", "rz_ring"):
            take(k, lambda v, k: to_core(v, "small_length", k, lo=0, hi=100))
        for k in ("temperature_inner", "temperature_outer", "temperature_shaft",
                  "temperature_housing", "temperature_assembly", "temperature_min", "temperature_max"):
            take(k, _temperature)
        take("clearance_distribution", lambda v, k: _choice(v, stats.DISTRIBUTIONS, k))
        if vals.get("temperature_min", -math.inf) > vals.get("temperature_max", math.inf):
            errs.add(InputError(f"{field}.temperature_min", m["temperature_min"],
                                f"a temperature <= temperature_max ({m['temperature_max']!r})"))
        take("axial_force", lambda v, k: to_core(v, "force", k, lo=0))
        take("axial_location", lambda v, k: _choice(v, AXIAL_LOCATIONS, k))
        take("clearance_min", lambda v, k: to_core(v, "small_length", k, lo=-200, hi=500))
        take("friction", lambda v, k: number(v, k, lo=0.0, lo_open=True, hi=1.0))
        take("hoop_stress_limit", lambda v, k: to_core(v, "stress", k, lo=0, lo_open=True))
        if b is not None:
            if "housing_outer_diameter" in vals and vals["housing_outer_diameter"] <= b.D:
                errs.add(InputError(f"{field}.housing_outer_diameter", m["housing_outer_diameter"],
                                    f"a diameter larger than the bearing's D = {b.D:g} mm"))
            if "shaft_bore" in vals and vals["shaft_bore"] >= b.d:
                errs.add(InputError(f"{field}.shaft_bore", m["shaft_bore"],
                                    f"a bore smaller than the bearing bore d = {b.d:g} mm"))
            for key in ("shaft", "housing"):
                if vals.get(key, "auto") != "auto":
                    size = b.d if key == "shaft" else b.D
                    with errs.field(field):
                        _zone(size, vals[key], key)
        vals["shaft_loads"] = _shaft.ShaftLoads.from_mapping(m, field, errs, _shaft.BEARING_KEYS)
        errs.raise_if_any()
        return cls(**vals)

    def to_mapping(self) -> dict:
        """The keys of a ``[[bearing]]`` table that rebuild this input exactly."""
        out: dict = {}
        for f in fields(self):
            v = getattr(self, f.name)
            if v is None or (f.name == "name" and v == ""):
                continue
            if isinstance(v, _shaft.ShaftLoads):
                out.update(v.to_mapping())
                continue
            if isinstance(v, Material):
                out[f.name] = _material_mapping(v)
            elif f.name in ("housing_outer_diameter", "housing_wall", "shaft_bore"):
                out[f.name] = f"{v!r} mm"
            elif f.name in ("rz_shaft", "rz_housing", "rz_ring", "clearance_min"):
                out[f.name] = f"{v!r} um"
            elif f.name.startswith("temperature_"):
                out[f.name] = f"{v!r} degC"
            elif f.name == "axial_force":
                out[f.name] = f"{v!r} N"
            elif f.name == "hoop_stress_limit":
                out[f.name] = f"{v!r} MPa"
            else:
                out[f.name] = v
        return out


def _temperature(v, k):
    t = temperature_c(v, k)  # absolute zero first, with its own message
    if not -100.0 <= t <= 300.0:  # common practice: plausibility bounds of a bearing seat
        raise InputError(k, v, "a temperature from -100 degC to 300 degC")
    return t


def _text(v, k):
    if not isinstance(v, str):
        raise InputError(k, v, "a text in quotes")
    return v.strip()


def _seat_class(v, k, feature):
    if not isinstance(v, str) or not v.strip():
        raise InputError(k, v, f"an ISO 286 {feature} class, e.g. "
                         f"{'k5' if feature == 'shaft' else 'H7'}, or 'auto'")
    text = v.strip()
    if text.lower() == "auto":
        return "auto"
    letters = text.rstrip("0123456789")
    ok_case = letters.islower() if feature == "shaft" else letters.isupper()
    if not letters or letters == text or not ok_case:
        hint = ("shaft classes are written in lower case (k5), housing classes in upper case (H7)")
        raise InputError(k, v, f"an ISO 286 {feature} class, e.g. "
                         f"{'k5' if feature == 'shaft' else 'H7'}, or 'auto'", hint)
    return text


def _zone(size: float, cls: str, field: str):
    """ISO 286 zone of ``cls`` at ``size``; an InputError naming ``field`` if not defined there."""
    from . import fits

    try:
        return fits.zone(size, cls)
    except InputError as exc:
        hint = "; ".join(x for x in (exc.allowed, exc.hint) if x)
        raise InputError(field, cls, f"an ISO 286 {'shaft' if field == 'shaft' else 'hole'} class "
                         f"defined at {size:g} mm", hint) from None


# --------------------------------------------------------------------------- result

@dataclass(frozen=True)
class BearingSeatResult:
    """Everything :func:`evaluate` finds for one bearing seat.

    Pairs are ``(min, max)``. Interferences and clearances in µm (a positive interference is a
    tight seat, a positive clearance a loose one); pressures and stresses in MPa; forces in N;
    diameters in mm; temperatures in °C.
    """

    name: str
    designation: str
    series: str
    kind: str
    bore_mm: float
    outside_mm: float
    width_mm: float
    tolerance_class: str
    load: str
    load_level: str
    housing_group: str
    shaft_class: str
    housing_class: str
    recommended_shaft: str
    recommended_housing: str
    bore_deviation_um: tuple[float, float]
    outside_deviation_um: tuple[float, float]
    shaft_deviation_um: tuple[float, float]
    housing_deviation_um: tuple[float, float]
    shaft_interference_um: tuple[float, float]
    housing_clearance_um: tuple[float, float]
    smoothing_inner_um: float
    smoothing_outer_um: float
    shaft_interference_effective_um: tuple[float, float]
    housing_interference_effective_um: tuple[float, float]
    thermal_change_inner_um: float
    thermal_change_outer_um: float
    shaft_interference_operating_um: tuple[float, float]
    housing_interference_operating_um: tuple[float, float]
    equivalent_inner_ring_diameter_mm: float
    equivalent_outer_ring_bore_mm: float
    contact_pressure_inner_MPa: tuple[float, float]
    contact_pressure_outer_MPa: tuple[float, float]
    ring_hoop_stress_max_MPa: float
    housing_hoop_stress_max_MPa: float
    clearance_group: str
    initial_clearance_um: tuple[float, float]
    fitup_reduction_um: tuple[float, float]
    clearance_after_fitup_um: tuple[float, float]
    thermal_reduction_um: tuple[float, float]
    ring_temperature_reduction_um: float
    clearance_reduction_um: tuple[float, float]
    operating_clearance_um: tuple[float, float]
    operating_clearance_mid_um: float
    shaft_interference_mid_operating_um: float
    housing_interference_mid_operating_um: float
    clearance_min_um: float
    smallest_passing_group: str | None
    axial_force_N: float
    axial_location: str
    axial_capacity_inner_N: float
    axial_capacity_outer_N: float
    friction_inner: float
    friction_outer: float
    temperature_assembly_C: float
    temperature_inner_C: float
    temperature_outer_C: float
    temperature_shaft_C: float
    temperature_housing_C: float
    notes: tuple[str, ...]
    checks: tuple[Check, ...]
    clearance_state: str = ""                  # the state whose mean clearance is smallest
    clearance_mean_um: float = math.nan        # mean operating clearance there (the verdict)
    clearance_probable_min_um: float = math.nan  # at both seats' maximum probable interference
    clearance_sigma_um: float = math.nan
    clearance_probability_below: float = math.nan  # P(clearance < clearance_min)
    clearance_distribution: str = "normal"
    clearance_worst_case_um: float = math.nan  # arithmetic worst case over every state (information)
    smallest_group_worst_case: str | None = None
    clearance_states: tuple = ()               # per state: dict of state, mean, probable_min, sigma, ...
    temperature_min_C: float | None = None
    temperature_max_C: float | None = None
    headline: str = ""
    shaft: _shaft.ShaftSeatResult | None = None  # the shaft at the ring edge (DIN 743)

    @property
    def ok(self) -> bool:
        """True when every check passes."""
        return all_passed(self.checks)

    def to_dict(self) -> dict:
        d = {f.name: getattr(self, f.name) for f in fields(self) if f.name not in ("checks", "shaft")}
        d["clearance_states"] = [dict(x) for x in self.clearance_states]
        d = {k: list(v) if isinstance(v, tuple) else v for k, v in d.items()}
        d["checks"] = [c.to_dict() for c in self.checks]
        d.update(_shaft.json_fields(self.shaft))
        d["ok"] = self.ok
        return d

    def to_json(self, indent: int | None = 2) -> str:
        """Strict JSON (NaN and infinity become null)."""
        return json.dumps(_clean(self.to_dict()), indent=indent, allow_nan=False)


def _clean(obj):
    if isinstance(obj, float):
        return obj if math.isfinite(obj) else None
    if isinstance(obj, dict):
        return {k: _clean(v) for k, v in obj.items()}
    if isinstance(obj, list | tuple):
        return [_clean(v) for v in obj]
    if isinstance(obj, np.generic):
        return _clean(obj.item())
    return obj


def _pair(a) -> tuple[float, float]:
    a = np.asarray(a, dtype=float)
    return float(a[0]), float(a[1])


# --------------------------------------------------------------------------- analysis

def evaluate(inp: BearingSeatInput) -> BearingSeatResult:
    """Fit, ring deformation and operating clearance of one bearing seat.

    Every temperature state is evaluated (mounted at room temperature, operating, and the lowest
    and highest ambient where given). The clearance verdict holds the *mean* operating clearance
    (every tolerance at its mean) of the governing state against ``clearance_min``; beside it the
    probable range (:func:`fitcheck.core.clearance_stats.probable_clearance`). The arithmetic
    worst case (tightest pairing of both seats, smallest group clearance) stays as information.

    Examples
    --------
    >>> r = evaluate(BearingSeatInput.from_mapping({"designation": "6204", "shaft": "k5",
    ...                                              "housing": "H7"}))
    >>> r.shaft_interference_um, r.housing_clearance_um
    ((2.0, 21.0), (0.0, 36.0))
    >>> [round(x, 1) for x in r.operating_clearance_um], r.smallest_group_worst_case
    ([-8.3, 20.0], 'C4')
    >>> round(r.clearance_mean_um, 1), round(r.clearance_probable_min_um, 1), r.ok
    (6.3, 1.3, True)
    """
    if isinstance(inp, Mapping):
        inp = BearingSeatInput.from_mapping(inp)
    b = bearing(inp.designation)
    ring = ring_material()
    level = _resolve_level(inp.load_level, inp.load_ratio)
    group_h = housing_group(inp.housing_material)
    try:
        rec = recommend_seats(b, inp.load, level, None, inp.housing_material)
    except InputError:
        if "auto" in (inp.shaft, inp.housing):
            raise
        rec = None
    shaft_cls = rec.shaft if inp.shaft == "auto" else inp.shaft
    housing_cls = rec.housing if inp.housing == "auto" else inp.housing
    recommended = (rec.shaft, rec.housing) if rec is not None else ("", "")
    zs = _zone(b.d, shaft_cls, "shaft")
    zh = _zone(b.D, housing_cls, "housing")
    bore_dev = _deviation("inner", b.d, inp.tolerance_class, "designation")
    out_dev = _deviation("outer", b.D, inp.tolerance_class, "designation")
    notes: list[str] = []

    # temperatures [°C]
    ta = inp.temperature_assembly
    ti = ta if inp.temperature_inner is None else inp.temperature_inner
    to = ti if inp.temperature_outer is None else inp.temperature_outer
    tsh = ti if inp.temperature_shaft is None else inp.temperature_shaft
    th = to if inp.temperature_housing is None else inp.temperature_housing
    if ring.max_heating_C == ring.max_heating_C and max(ti, to) > ring.max_heating_C:
        warnings.warn(f"ring temperature above {ring.max_heating_C:g} degC: the ring steel may change "
                      "size (dimensional stability); the clearance figures assume it does not",
                      MethodRangeWarning, stacklevel=2)

    # interference limits [µm] (tolerance, before smoothing)
    ui = np.array(core.fit_limits(zs.upper_um, zs.lower_um, bore_dev[0], bore_dev[1]))
    uo = np.array(core.fit_limits(out_dev[0], out_dev[1], zh.upper_um, zh.lower_um))
    s_i = core.smoothing_um(inp.rz_shaft, inp.rz_ring)
    s_o = core.smoothing_um(inp.rz_housing, inp.rz_ring)
    # mid-tolerance pairing (every part at the middle of its tolerance) appended as a third entry
    ui = np.append(ui, ui.mean())
    uo = np.append(uo, uo.mean())
    ui_eff = np.asarray(core.effective_interference_um(ui, s_i))
    uo_eff = np.asarray(core.effective_interference_um(uo, s_o))
    m_s, m_h = inp.shaft_material, inp.housing_material
    dti = 1000.0 * core.thermal_interference_change(b.d, m_s.alpha, tsh, ring.alpha, ti, ta)
    dto = 1000.0 * core.thermal_interference_change(b.D, ring.alpha, to, m_h.alpha, th, ta)
    ui_op = ui_eff + dti
    uo_op = uo_eff + dto

    # ring deformation (arrays: [min, max, mid] at assembly, then at operating temperature)
    d_ie, D_oe = core.equivalent_ring_diameters(b.d, b.D)
    if inp.housing_outer_diameter is not None:
        Dh = inp.housing_outer_diameter
    elif inp.housing_wall is not None:
        Dh = b.D + 2.0 * inp.housing_wall
    else:
        Dh = math.inf
    di = inp.shaft_bore
    ui_all = np.concatenate([ui_eff, ui_op]) / 1000.0
    uo_all = np.concatenate([uo_eff, uo_op]) / 1000.0
    p_i, grow_i, hoop_i = core.inner_ring_fit(ui_all, b.d, di, d_ie, m_s.E, m_s.nu, ring.E, ring.nu)
    p_o, contr_o = core.outer_ring_fit(uo_all, b.D, D_oe, Dh, ring.E, ring.nu, m_h.E, m_h.nu)
    from .core.lame import hub_stresses

    _, hoop_h = hub_stresses(p_o, b.D, Dh, b.D / 2.0)
    red = 1000.0 * (np.asarray(grow_i) + np.asarray(contr_o))  # [µm]: min, max, mid (assembly); same (op)
    red_fit = red[:2]
    red_ring_t = 1000.0 * core.thermal_clearance_reduction(ring.alpha, ti, to, b.pitch_diameter)
    red_op = red[3:5] + red_ring_t
    red_op_mid = red[5] + red_ring_t
    red_thermal = red_op - red_fit

    # clearance
    kind_dg = b.kind == "deep_groove_ball"
    group = inp.clearance_group
    # raceway change per µm of effective interference (Lamé: linear in the interference)
    k_i = float(np.asarray(core.inner_ring_fit(1e-3, b.d, di, d_ie, m_s.E, m_s.nu, ring.E, ring.nu)[1])) * 1e3
    k_o = float(np.asarray(core.outer_ring_fit(1e-3, b.D, D_oe, Dh, ring.E, ring.nu, m_h.E, m_h.nu)[1])) * 1e3
    states = _seat_states(ta, ti, to, tsh, th, inp.temperature_min, inp.temperature_max)
    tol = dict(inner_ring_um=(bore_dev[1], bore_dev[0]), shaft_um=(float(zs.lower_um), float(zs.upper_um)),
               outer_ring_um=(out_dev[1], out_dev[0]), housing_um=(float(zh.lower_um), float(zh.upper_um)))

    def state_stats(g_pair, st_, full=True):
        _, t_i, t_o, t_s, t_h = st_
        return stats.probable_clearance(
            g_pair, **tol, s_inner=float(s_i), s_outer=float(s_o),
            dt_inner=1000.0 * core.thermal_interference_change(b.d, m_s.alpha, t_s, ring.alpha, t_i, ta),
            dt_outer=1000.0 * core.thermal_interference_change(b.D, ring.alpha, t_o, m_h.alpha, t_h, ta),
            k_inner=k_i, k_outer=k_o,
            ring_thermal_um=1000.0 * core.thermal_clearance_reduction(ring.alpha, t_i, t_o, b.pitch_diameter),
            required_um=inp.clearance_min, distribution=inp.clearance_distribution, full=full)

    if kind_dg:
        g0 = np.array(radial_clearance(b.d, group))
        per_state = [dict(state=st_[0], **state_stats(g0, st_)) for st_ in states]
        gov = min(per_state, key=lambda x: (x["mean"], -x["p_below"]))
        smallest = smallest_wc = None
        for g in _groups_at(b.d):
            gl, gh = radial_clearance(b.d, g)
            quick = [state_stats((gl, gh), st_, full=False) for st_ in states]
            if smallest is None and min(q["mean"] for q in quick) >= inp.clearance_min:
                smallest = g
            if smallest_wc is None and min(q["worst_min"] for q in quick) >= inp.clearance_min:
                smallest_wc = g
    else:
        g0 = np.array([math.nan, math.nan])
        per_state, gov = [], None
        smallest = smallest_wc = None
        notes.append("ISO 5753-1 clearance groups apply to deep-groove ball bearings; an angular-contact "
                     "bearing is set by adjustment: the fit-up and thermal change of its clearance "
                     "(or preload) are given, the operating clearance is not")
        warnings.warn(f"{b.designation}: radial clearance groups are not defined for angular-contact "
                      "bearings; the clearance check is left out", MethodRangeWarning, stacklevel=2)
    after_fit = np.array([g0[0] - red_fit[1], g0[1] - red_fit[0]])
    operating = np.array([g0[0] - red_op[1], g0[1] - red_op[0]])
    operating_mid = float(g0.mean() - red_op_mid)

    # axial retention by friction at the loosest operating pairing
    held_by_friction = inp.axial_location == "none" and inp.axial_force > 0
    mu_notes = notes if held_by_friction else []
    mu_i, mu_o = ((inp.friction, inp.friction) if inp.friction is not None else
                  (_seat_friction(m_s, ring, mu_notes), _seat_friction(ring, m_h, mu_notes)))
    cap_i = core.friction_capacity(float(np.asarray(p_i)[3]), b.d, b.B, mu_i)
    cap_o = core.friction_capacity(float(np.asarray(p_o)[3]), b.D, b.B, mu_o)

    checks: list[Check] = []
    if kind_dg:
        worst_all = min(x["worst_min"] for x in per_state)
        dist = "±3σ normal" if inp.clearance_distribution == "normal" else "uniform"
        checks.append(Check(
            "operating radial clearance (mean, probable combination)", gov["mean"], inp.clearance_min,
            ">=", "um", "ISO 5753-1:2009, Table 1; Lamé ring deformation (Shigley eq. 3-56); statistical "
            "tolerancing (RSS), probable-interference rule of bearing-engineering handbooks",
            f"governing state: {gov['state']}; group {group}, every tolerance at its mean; at the maximum "
            f"probable interference {gov['probable_min']:.1f} um; σ {gov['sigma']:.1f} um ({dist} bands), "
            f"P(clearance < {inp.clearance_min:g} um) = {100 * gov['p_below']:.1f} %; arithmetic worst case "
            f"{worst_all:.1f} um (information); smallest group whose mean passes: "
            f"{smallest or 'none tabulated'}"))
        if gov["probable_min"] < inp.clearance_min:
            notes.append(
                f"the probable minimum clearance ({gov['probable_min']:.1f} um, {gov['state']}) is below "
                f"{inp.clearance_min:g} um: about {100 * gov['p_below']:.1f} % of the bearings of a lot run "
                "with slight preload: acceptable for deep-groove ball bearings at moderate speed; choose "
                f"{_next_group(b.d, group) or 'a larger group'} for a hot inner ring or high speed")
        if operating[0] < inp.clearance_min or worst_all < inp.clearance_min:
            notes.append(_worst_case_note(
                group, smallest_wc, inp.clearance_min, min(float(operating[0]), worst_all), operating_mid,
                red_op[1], float(g0[0]), (shaft_cls, float(zs.upper_um), float(bore_dev[1])),
                (housing_cls, float(zh.lower_um)) if np.asarray(contr_o)[4] > 0 else None,
                b.d, red_op[1] - float(_clearance_min_below(b.d, smallest_wc)) if smallest_wc else None))
    # the other temperature states (lowest / highest ambient): grip of the loosest and stress of the
    # tightest pairing, state by state; (name, thermal change inner, outer) [µm]
    dts = [(st_[0], 1000.0 * core.thermal_interference_change(b.d, m_s.alpha, st_[3], ring.alpha, st_[1], ta),
            1000.0 * core.thermal_interference_change(b.D, ring.alpha, st_[2], m_h.alpha, st_[4], ta))
           for st_ in states]
    hoop_max, hoop_state = float(np.max(hoop_i)), "operating"
    hoop_h_max = float(np.max(hoop_h))
    for name_, dt_i, dt_o in dts:
        hi_ = float(np.asarray(core.inner_ring_fit((ui_eff[1] + dt_i) / 1000.0, b.d, di, d_ie, m_s.E, m_s.nu,
                                                   ring.E, ring.nu)[2]))
        if hi_ > hoop_max:
            hoop_max, hoop_state = hi_, name_
        po_ = core.outer_ring_fit((uo_eff[1] + dt_o) / 1000.0, b.D, D_oe, Dh, ring.E, ring.nu, m_h.E, m_h.nu)[0]
        hoop_h_max = max(hoop_h_max, float(np.asarray(hub_stresses(po_, b.D, Dh, b.D / 2.0)[1])))
    checks.append(Check("hoop stress at the inner-ring bore", hoop_max, inp.hoop_stress_limit, "<=",
                        "MPa", "Lamé, Shigley eq. (3-58); limit: common practice for through-hardened rings "
                        "(about 25 ksi)", f"tightest pairing; governing state: {hoop_state}"))
    if hoop_h_max > 0 and math.isfinite(m_h.Rp02):
        checks.append(Check("hoop stress at the housing bore", hoop_h_max, m_h.Rp02, "<=", "MPa",
                            "Lamé, Shigley eq. (3-58); limit: yield strength Rp0.2 of the housing"))
    rotating = ("inner ring on shaft", ui_eff, ui_op, s_i) if inp.load == "rotating_inner" \
        else ("outer ring in housing", uo_eff, uo_op, s_o)
    # the loosest state of the ring under circumferential load (operating, or a colder / hotter ambient)
    k_rot = 1 if inp.load == "rotating_inner" else 2
    grip_state, grip_dt = "operating", float(rotating[2][0] - rotating[1][0])
    for x in dts:
        if x[k_rot] < grip_dt - 1e-12:
            grip_state, grip_dt = x[0], x[k_rot]
    rotating = (rotating[0], rotating[1], np.asarray(rotating[1]) + grip_dt, rotating[3])
    if rotating[1][0] > 0:
        checks.append(Check(
            f"rotating-load ring keeps its grip at operating temperature ({rotating[0]})",
            float(rotating[2][0]), 0.0, ">=", "um", "DIN 7190-1:2017, 6.4 (thermal change of interference)",
            "loosest pairing, effective interference after smoothing; a ring under circumferential load "
            f"that loses its interference creeps; governing state: {grip_state}"))
    else:
        # the loosest pairing has no grip: hold at least the mid-tolerance pairing to an interference
        checks.append(Check(
            f"rotating-load ring is an interference fit at mid-tolerance ({rotating[0]})",
            float(rotating[2][2]), 0.0, ">=", "um",
            "DIN 5425-1 (ring under circumferential load: interference fit); DIN 7190-1:2017, 6.2, 6.4",
            f"every part at the middle of its tolerance, after smoothing; governing state: {grip_state}"))
        notes.append(f"the loosest pairing of the {rotating[0]} seat has no interference left after "
                     f"smoothing ({float(rotating[2][0]):.1f} um at operating temperature, smoothing "
                     f"{float(rotating[3]):.1f} um); at mid-tolerance it is {float(rotating[2][2]):.1f} um. "
                     "A ring under circumferential load without interference can creep and wear its "
                     "seat: finer seat roughness, a tighter class (it also takes more clearance) or "
                     "measured and paired parts help")
    if held_by_friction:
        for what, cap, mu in (("inner ring on shaft", cap_i, mu_i), ("outer ring in housing", cap_o, mu_o)):
            checks.append(Check(f"axial force held by friction ({what})", float(cap), inp.axial_force,
                                ">=", "N", "DIN 7190-1:2017, 7 (mu p pi d B), loosest pairing",
                                f"no shoulder or retaining ring declared; mu = {mu:g}"))
    if rec is not None and "auto" in (inp.shaft, inp.housing):
        notes.extend(rec.notes)
    shaft = _shaft.evaluate_seat(d=b.d, di=inp.shaft_bore, material=m_s, rz_um=inp.rz_shaft,
                                 loads=inp.shaft_loads, torque=inp.shaft_loads.torque or 0.0,
                                 axial_force=inp.axial_force, temperature=tsh, what="bearing inner ring")
    checks.extend(shaft.checks)
    notes.extend(shaft.notes)
    for msg in shaft.warnings:
        warnings.warn(f"{b.designation}: {msg}", MethodRangeWarning, stacklevel=2)

    return BearingSeatResult(
        name=inp.name, designation=b.designation, series=b.series, kind=b.kind,
        bore_mm=b.d, outside_mm=b.D, width_mm=b.B, tolerance_class=inp.tolerance_class,
        load=inp.load, load_level=level, housing_group=group_h,
        shaft_class=shaft_cls, housing_class=housing_cls,
        recommended_shaft=recommended[0], recommended_housing=recommended[1],
        bore_deviation_um=bore_dev, outside_deviation_um=out_dev,
        shaft_deviation_um=(float(zs.upper_um), float(zs.lower_um)),
        housing_deviation_um=(float(zh.upper_um), float(zh.lower_um)),
        shaft_interference_um=_pair(ui), housing_clearance_um=(float(-uo[1]) + 0.0, float(-uo[0]) + 0.0),
        smoothing_inner_um=float(s_i), smoothing_outer_um=float(s_o),
        shaft_interference_effective_um=_pair(ui_eff),
        housing_interference_effective_um=_pair(uo_eff),
        thermal_change_inner_um=float(dti), thermal_change_outer_um=float(dto),
        shaft_interference_operating_um=_pair(ui_op), housing_interference_operating_um=_pair(uo_op),
        equivalent_inner_ring_diameter_mm=float(d_ie), equivalent_outer_ring_bore_mm=float(D_oe),
        contact_pressure_inner_MPa=_pair(np.asarray(p_i)[3:5]),
        contact_pressure_outer_MPa=_pair(np.asarray(p_o)[3:5]),
        ring_hoop_stress_max_MPa=hoop_max, housing_hoop_stress_max_MPa=hoop_h_max,
        clearance_group=group, initial_clearance_um=_pair(g0),
        fitup_reduction_um=_pair(red_fit), clearance_after_fitup_um=_pair(after_fit),
        thermal_reduction_um=_pair(red_thermal), ring_temperature_reduction_um=float(red_ring_t),
        clearance_reduction_um=_pair(red_op), operating_clearance_um=_pair(operating),
        operating_clearance_mid_um=operating_mid,
        shaft_interference_mid_operating_um=float(ui_op[2]),
        housing_interference_mid_operating_um=float(uo_op[2]),
        clearance_min_um=inp.clearance_min, smallest_passing_group=smallest,
        axial_force_N=inp.axial_force, axial_location=inp.axial_location,
        axial_capacity_inner_N=float(cap_i), axial_capacity_outer_N=float(cap_o),
        friction_inner=float(mu_i), friction_outer=float(mu_o),
        temperature_assembly_C=ta, temperature_inner_C=ti, temperature_outer_C=to,
        temperature_shaft_C=tsh, temperature_housing_C=th,
        notes=tuple(dict.fromkeys(notes)), checks=tuple(checks), shaft=shaft,
        clearance_state=gov["state"] if gov else "", clearance_mean_um=gov["mean"] if gov else math.nan,
        clearance_probable_min_um=gov["probable_min"] if gov else math.nan,
        clearance_sigma_um=gov["sigma"] if gov else math.nan,
        clearance_probability_below=gov["p_below"] if gov else math.nan,
        clearance_distribution=inp.clearance_distribution,
        clearance_worst_case_um=min((x["worst_min"] for x in per_state), default=math.nan),
        smallest_group_worst_case=smallest_wc, clearance_states=tuple(per_state),
        temperature_min_C=inp.temperature_min, temperature_max_C=inp.temperature_max,
        headline=_seat_headline(checks, gov, group, smallest),
    )


def _seat_states(ta, ti, to, tsh, th, tmin, tmax) -> list[tuple]:
    """(name, t_inner, t_outer, t_shaft, t_housing) of every temperature state of a seat [°C]."""
    out = [(f"mounted, room temperature ({ta:g} °C)", ta, ta, ta, ta)]
    if (ti, to, tsh, th) != (ta, ta, ta, ta):
        parts = f"inner ring {ti:g} °C, outer ring {to:g} °C"
        if (tsh, th) != (ti, to):
            parts += f", shaft {tsh:g} °C, housing {th:g} °C"
        out.append((f"operating ({parts})", ti, to, tsh, th))
    for t, what in ((tmin, "lowest"), (tmax, "highest")):
        if t is not None and t != ta:
            out.append((f"{what} ambient {t:g} °C, all parts (at standstill)", t, t, t, t))
    return out


def _next_group(d: float, group: str) -> str | None:
    groups = _groups_at(d)
    i = groups.index(group) if group in groups else -1
    return groups[i + 1] if 0 <= i < len(groups) - 1 else None


def _seat_headline(checks, gov, group, smallest) -> str:
    """One sentence first read: the verdict, its cause and the next step."""
    failing = [c for c in checks if not c.passed]
    if not failing:
        if gov is None:
            return "Every check holds (the operating clearance of an angular-contact bearing is set by adjustment)."
        return (f"Holds: mean operating clearance {gov['mean']:.1f} um ({gov['state']}), "
                f"{100 * gov['p_below']:.1f} % of a lot below the limit.")
    out = []
    for c in failing:
        if c.name.startswith("operating radial clearance"):
            out.append(f"Too little clearance: the mean operating clearance is {c.value:.1f} um against "
                       f"{c.limit:g} um ({gov['state']}). Next: group {smallest or 'larger than tabulated'} "
                       "or a looser shaft or housing class (fitcheck search)")
        elif c.name.startswith("rotating-load ring"):
            out.append(f"The ring under circumferential load may creep ({c.value:.1f} um of interference). "
                       "Next: a tighter class for that seat, finer roughness (fitcheck search)")
        elif c.name.startswith("hoop stress"):
            out.append(f"{c.name[0].upper()}{c.name[1:]} {c.value:.0f} MPa exceeds {c.limit:.0f} MPa. "
                       "Next: a looser class")
        else:
            out.append(f"{c.name[0].upper()}{c.name[1:]} fails ({c.value:.4g} {c.unit} against {c.limit:.4g}). "
                       "Next: a shoulder or retaining ring, or a tighter seat")
    return "Does not hold. " + " ".join(x + "." for x in out)


def _seat_friction(male: Material, female: Material, notes: list) -> float:
    """Friction against axial slip of a pressed-in seat: data/pressfit_friction.csv (press, oiled).

    Where the table has no value for the pair, its lowest press-fit value is used (on the safe side
    for the axial capacity) and a note says so.
    """
    from .pressfit import _friction_rows, default_friction

    row = default_friction(male.group, female.group, "press")
    if row is not None:
        return row[0]
    low = min(r["mu_slip"] for r in _friction_rows() if r["assembly"] == "press")
    notes.append(f"no tabulated friction for {male.name} in {female.name}: the lowest press-fit value "
                 f"{low:g} of data/pressfit_friction.csv is used for the axial capacity (give 'friction')")
    return low


def _clearance_min_below(d: float, group: str) -> float:
    """Smallest clearance [µm] of the group just below ``group`` at bore ``d`` (NaN for the first)."""
    groups = _groups_at(d)
    i = groups.index(group)
    return radial_clearance(d, groups[i - 1])[0] if i > 0 else math.nan


def _worst_case_note(group, smallest, limit, worst, mid, reduction, g_min, shaft, housing, d,
                     below_short) -> str:
    """Why the clearance check fails at the arithmetic worst case, and what passes."""
    cls, upper, bore_lower = shaft
    parts = [f"largest shaft ({cls} {upper:+g} um) in the smallest ring bore ({bore_lower:+g} um)"]
    if housing is not None:
        parts.append(f"smallest housing bore ({housing[0]} {housing[1]:+g} um) on the largest outer ring")
    text = (f"group {group} loses its clearance only in the arithmetic worst case (information; the verdict is "
            f"the mean clearance): {' and '.join(parts)}, with the "
            f"smallest {group} clearance ({g_min:g} um); fit-up and temperature then take {reduction:.1f} um "
            f"and leave {worst:.1f} um (limit {limit:g} um). With every part at mid-tolerance the operating "
            f"clearance is {mid:.1f} um. ")
    if smallest is None:
        return text + ("No tabulated group keeps the limit in the worst case: a looser shaft or housing "
                       "class, or measured and paired parts.")
    text += f"Group {smallest} keeps at least {limit:g} um even in the worst case"
    if below_short is not None and math.isfinite(below_short) and _groups_at(d).index(smallest) > 0:
        prev = _groups_at(d)[_groups_at(d).index(smallest) - 1]
        if prev != group:
            text += f" ({prev} leaves {-below_short:.1f} um)"
    return text + ("; otherwise a looser shaft class, or measured and paired parts. The worst case is "
                   "rare, but a bearing run without clearance is preloaded and runs hot.")


def summary_rows(result: BearingSeatResult) -> list[list[str]]:
    """Rows (quantity, min, max, unit) for a text table of the main results."""
    def fmt(x, digits):
        return f"{x:.{digits}f}" if math.isfinite(x) else "-"

    def pr(p, digits=1):
        return [fmt(p[0], digits), fmt(p[1], digits)]
    return [
        ["bore deviation (ISO 492), lower / upper", *pr(result.bore_deviation_um[::-1], 0), "um"],
        ["outside-diameter deviation (ISO 492), lower / upper", *pr(result.outside_deviation_um[::-1], 0), "um"],
        [f"shaft {result.shaft_class}: interference", *pr(result.shaft_interference_um, 0), "um"],
        [f"housing {result.housing_class}: clearance", *pr(result.housing_clearance_um, 0), "um"],
        ["inner seat, effective interference at operation", *pr(result.shaft_interference_operating_um), "um"],
        ["outer seat, effective interference at operation",
         *pr(result.housing_interference_operating_um), "um"],
        ["contact pressure inner ring", *pr(result.contact_pressure_inner_MPa), "MPa"],
        ["contact pressure outer ring", *pr(result.contact_pressure_outer_MPa), "MPa"],
        [f"initial clearance {result.clearance_group}", *pr(result.initial_clearance_um, 0), "um"],
        ["clearance reduction (fit-up + thermal)", *pr(result.clearance_reduction_um), "um"],
        ["operating clearance", *pr(result.operating_clearance_um), "um"],
        ["operating clearance, every part at mid-tolerance", fmt(result.operating_clearance_mid_um, 1),
         "", "um"],
        ["operating clearance, mean (verdict) / at max. probable interference",
         fmt(result.clearance_mean_um, 1), fmt(result.clearance_probable_min_um, 1), "um"],
    ]



#: Stages of the clearance budget, in order.
BUDGET_STAGES = ("initial", "fit-up", "thermal", "operating")


def clearance_budget(result) -> dict[str, list[float]]:
    """Clearance after each stage of :data:`BUDGET_STAGES` [µm], tightest ("min") and loosest ("max").

    The data of the clearance-budget plot and the browser chart.

    >>> class R:
    ...     initial_clearance_um = (5.0, 20.0); clearance_after_fitup_um = (-8.0, 20.0)
    ...     operating_clearance_um = (-10.0, 19.0)
    >>> clearance_budget(R())["min"]
    [5.0, -8.0, -10.0, -10.0]
    """
    g0, g1, g3 = result.initial_clearance_um, result.clearance_after_fitup_um, result.operating_clearance_um
    return {"min": [g0[0], g1[0], g3[0], g3[0]], "max": [g0[1], g1[1], g3[1], g3[1]]}
