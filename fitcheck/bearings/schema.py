"""The ``[[bearing]]`` table: keys, method notes and the parsing of a seat's input. Part of
:mod:`fitcheck.bearings`.
"""

from __future__ import annotations

import math
from collections.abc import Mapping
from dataclasses import dataclass, field, fields

from .. import materials, tables
from .. import shaft as _shaft
from ..core import clearance_stats as stats
from ..errors import ErrorCollector, InputError, did_you_mean
from ..materials import Material
from ..units import number, temperature_c, to_core
from .catalogue import (
    AXIAL_LOCATIONS,
    DEFAULTS,
    LOAD_CASES,
    LOAD_LEVELS,
    RING_MATERIAL,
    _choice,
    _group,
    _resolve_level,
    _tolerance_class,
    bearing,
)

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
        take("housing_wall", lambda v, k: to_core(v, "length", k, lo=0.1, hi=1e4))  # a real wall
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
    from .. import fits

    try:
        return fits.zone(size, cls)
    except InputError as exc:
        hint = "; ".join(x for x in (exc.allowed, exc.hint) if x)
        raise InputError(field, cls, f"an ISO 286 {'shaft' if field == 'shaft' else 'hole'} class "
                         f"defined at {size:g} mm", hint) from None
