"""Bearing tables (ISO 15 dimensions, ISO 492 tolerances, ISO 5753-1 clearance groups, DIN 5425-1
seat recommendations) and their loaders. Part of :mod:`fitcheck.bearings`.
"""

from __future__ import annotations

import functools
from dataclasses import dataclass

import numpy as np

from .. import materials, tables
from ..errors import InputError, did_you_mean
from ..materials import Material
from ..units import number, to_core

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
