"""Press and shrink fits of gears, pulleys, hubs and bearing rings on shafts (unit-aware layer).

The question it answers: does the hub, pressed on the shaft, carry its torque
and thrust at the loosest tolerance combination — at operating temperature and
speed — without yielding at the tightest, and what does assembly take
(press-in force, hub heating temperature)?

>>> inp = PressFitInput.from_mapping({
...     "name": "gear", "fit": "20 H7/s6", "length": "16 mm", "hub_outer_diameter": "40 mm",
...     "shaft_material": "C45E", "hub_material": "C45E", "torque": "10 N*m"})
>>> res = evaluate(inp)
>>> res.ok, round(res.pressure_min, 1), round(res.torque_capacity_min / 1000, 1)
(True, 22.7, 18.2)

Method (see :data:`METHOD_NOTES`): Lamé thick-cylinder theory for shaft and hub
in plane stress as used by DIN 7190-1:2017 for the elastic design, with the
smoothing of roughness, the thermal change of the interference and the
centrifugal loosening; the kernels are in :mod:`fitcheck.core.lame` and
:mod:`fitcheck.core.pressfit`. With ``design = "elastic-plastic"`` the hub of
ductile material may yield partly (DIN 7190-1:2017, :mod:`fitcheck.core.elastoplastic`):
it passes while its plastic zone stays within ``plastic_zone_limit`` of the hub wall.
In the elastic design (default) a joint whose hub or shaft would yield is reported as
failing, with a :class:`~fitcheck.errors.MethodRangeWarning`; a yielding shaft fails in both.
"""

from __future__ import annotations

import functools
import math
import warnings
from collections.abc import Mapping
from dataclasses import dataclass, fields

import numpy as np

from . import materials as _materials
from . import shaft as _shaft
from . import tables
from .checks import Check
from .core import elastoplastic as _ep
from .core import lame
from .core import pressfit as _core
from .errors import ErrorCollector, InputError, MethodRangeWarning, did_you_mean
from .materials import Material
from .units import number, temperature_c, to_core

__all__ = ["KEYS", "METHOD_NOTES", "PressFitCase", "PressFitInput", "PressFitResult",
           "default_friction", "evaluate"]

RPM = 2.0 * math.pi / 60.0  # rad/s per rpm

#: Keys of a ``[[pressfit]]`` table: key → meaning with unit and default.
KEYS: dict[str, str] = {
    "name": "name of the joint (text)",
    "fit": "ISO 286 fit, e.g. '20 H7/s6', or ASME B4.1 class, e.g. '1 in FN2'; gives diameter and "
           "interference limits (or give interference_min/interference_max)",
    "interference_min": "smallest diametral interference, e.g. '18 um' (with diameter; negative = clearance)",
    "interference_max": "largest diametral interference, e.g. '48 um'",
    "diameter": "joint diameter, e.g. '20 mm' (needed with explicit interference; else from the fit)",
    "length": "length of the joint (hub width in contact), e.g. '16 mm'",
    "shaft_bore": "bore of a hollow shaft, e.g. '8 mm' (default 0 = solid)",
    "hub_outer_diameter": "outer diameter of the hub, e.g. '40 mm' (or module + teeth)",
    "module": "gear (normal) module, e.g. '1.5 mm': equivalent hub diameter = root diameter "
              "m·z/cos β − 2.5·m + 2·x·m",
    "teeth": "number of teeth z (with module)",
    "shaft_material": "material name of data/materials.csv, or an inline table (E, nu, alpha, Rp02, Rm, density)",
    "hub_material": "material name or inline table, as shaft_material",
    "rz_shaft": "mean roughness depth Rz of the shaft, e.g. '4 um' (default 4 um, ground)",
    "rz_hub": "mean roughness depth Rz of the hub bore, e.g. '6.3 um' (default 6.3 um, reamed/fine-turned)",
    "smoothing_factor": "share of Rz_shaft + Rz_hub lost to smoothing on joining (default 0.8, DIN 7190-1:2017)",
    "mu_slip": "friction coefficient against slip (default by material pair and assembly, data/pressfit_friction.csv)",
    "mu_press": "friction coefficient while pressing in (default as mu_slip)",
    "assembly": "'press' (longitudinal press fit) or 'shrink' (hub heated / shaft cooled); default 'press'",
    "torque": "torque to carry, e.g. '20 N*m' (default 0)",
    "axial_force": "axial force to carry, e.g. '500 N' (default 0)",
    "slip_safety": "required safety against slip (default 1.5, common practice)",
    "speed": "operating speed, e.g. '3000 rpm' (default 0)",
    "temperature_shaft": "operating temperature of the shaft, e.g. '60 degC' (default 20 degC)",
    "temperature_hub": "operating temperature of the hub (default 20 degC)",
    "temperature_assembly": "room temperature at assembly, at which the interference is given (default 20 degC)",
    "temperature_shaft_cooled": "temperature of a cooled shaft at joining a shrink fit, e.g. '-78 degC' "
                                "(default: room temperature, no cooling)",
    "joining_clearance": "clearance wanted when joining a shrink fit (default 0.001·diameter, common practice)",
    "yield_safety": "required safety of hub and shaft against yield, Rp0.2/σ_vM (default 1.2, common practice)",
    "fracture_safety": "required safety of a brittle part (grey cast iron, plastic) against Rm with the "
                       "largest principal stress (default 2.0, common practice)",
    "press_force_limit": "force the press can give, e.g. '20 kN' (optional; checked for 'press' assembly)",
    "design": "'elastic' (default: hub and shaft stay elastic) or 'elastic-plastic' (the hub of ductile "
              "material may yield partly, DIN 7190-1:2017)",
    "plastic_zone_limit": "elastic-plastic design: share of the hub wall thickness the plastic zone may "
                          "reach, (D_pl − d)/(D_o − d) (default 0.3, from memory of DIN 7190-1:2017)",
    "temperature_min": "lowest ambient temperature, e.g. '-10 degC': shaft and hub both at it, at "
                       "standstill and at speed (cold start); also read from [conditions]",
    "temperature_max": "highest ambient temperature, e.g. '70 degC': shaft and hub both at it; also read "
                       "from [conditions]",
    "profile_shift": "profile shift coefficient x of a gear hub given by module + teeth (default 0)",
    "helix_angle": "helix angle β of a gear hub given by module + teeth, e.g. '15 deg' (default 0)",
}
KEYS.update(_shaft.PRESSFIT_KEYS)  # the shaft at the hub edge (DIN 743), fitcheck.shaft

#: (step of the method in words, standard clause or book equation) for the report.
METHOD_NOTES: list[tuple[str, str]] = [
    ("Interference limits from the ISO 286 fit (or as given), at room temperature",
     "ISO 286-1:2010 / ISO 286-2:2010"),
    ("Loss by smoothing of the surfaces on joining: 0.8·(Rz_shaft + Rz_hub) (factor adjustable)",
     "DIN 7190-1:2017, smoothing of the roughness"),
    ("Change of interference at operating temperature: d·[α_s(T_s − T_0) − α_h(T_h − T_0)]",
     "DIN 7190-1:2017, temperature influence"),
    ("Loss of interference by rotation: free bore growth of the rotating hub minus the shaft's, "
     "plane-stress discs", "Shigley, 10th ed., eq. (3-55); Timoshenko & Goodier § 32"),
    ("Contact pressure from the effective interference, dissimilar materials, hollow or solid shaft",
     "Shigley, 10th ed., eqs. (3-56), (3-57); DIN 7190-1:2017 (elastic design)"),
    ("Transmissible torque T = p·π·d²·L·μ/2 and axial force F = p·π·d·L·μ at the loosest case; "
     "safety against slip for the vector sum √((2T/d)² + F²)",
     "Shigley, 10th ed., sec. 7-8; DIN 7190-1:2017"),
    ("Radial and tangential stresses in hub and shaft (Lamé) plus rotation; von Mises (plane stress) "
     "at the hub bore, the shaft surface and a hollow shaft's bore, at the tightest case",
     "Shigley, 10th ed., eqs. (3-50), (3-58), (5-12)"),
    ("Brittle parts (grey cast iron, plastics): largest principal stress against Rm",
     "DIN 7190-1:2017 (brittle hubs) — from memory"),
    ("Speed at which the contact pressure at the loosest case falls to zero",
     "DIN 7190-1:2017, centrifugal loosening"),
    ("Press-in force F_e = p_max·π·d·L·μ_press at room temperature",
     "DIN 7190-1:2017, longitudinal press fits"),
    ("Hub heating temperature T_0 + (δ_max + joining clearance − shaft cooling)/(α_h·d), "
     "against the material's heating limit", "DIN 7190-1:2017, transverse press fits"),
    ("Elastic-plastic design (design = 'elastic-plastic'): ideally elastic-plastic hub on an elastic "
     "shaft, yield σt − σr = (2/√3)·Rp0.2; p = Rp0.2/√3·[1 − (D_pl/D_o)² + 2·ln(D_pl/d)], "
     "δ/d = (2/√3)·Rp0.2/E_h·(D_pl/d)² + p·(K_shaft − (1 − ν_h)/E_h); states of smaller interference "
     "unload elastically; plastic zone within plastic_zone_limit of the hub wall",
     "DIN 7190-1:2017 (elastic-plastic range) — from memory; derived in fitcheck.core.elastoplastic"),
    ("Not implemented: end effects at the hub faces, "
     "fretting fatigue of the shaft", "DIN 7190-1:2017 (elastic-plastic range)"),
]
METHOD_NOTES.extend(_shaft.METHOD_NOTES)

REF_SLIP = "DIN 7190-1:2017 (transmissible torque and axial force); Shigley, 10th ed., sec. 7-8"
REF_HUB = "DIN 7190-1:2017 (elastic design, hub bore); von Mises, Shigley, 10th ed., eq. (5-12)"
REF_SHAFT = "DIN 7190-1:2017 (elastic design, shaft); von Mises, Shigley, 10th ed., eq. (5-12)"
REF_SPEED = "DIN 7190-1:2017 (centrifugal loosening); Shigley, 10th ed., eq. (3-55)"
REF_HEAT = "DIN 7190-1:2017 (transverse press fits); heating limit of data/materials.csv"
REF_PRESS = "DIN 7190-1:2017 (longitudinal press fits, press-in force)"

DESIGNS = ("elastic", "elastic-plastic")
REF_PLASTIC = ("DIN 7190-1:2017 (elastic-plastic hub, extent of the plastic zone) — from memory; "
               "fitcheck.core.elastoplastic")

DEFAULTS = {  # core units
    "shaft_bore": 0.0,
    "rz_shaft": 0.004,        # ground shaft, Rz 4 um — common practice
    "rz_hub": 0.0063,         # reamed / fine-turned bore, Rz 6.3 um — common practice
    "smoothing_factor": 0.8,  # DIN 7190-1:2017
    "assembly": "press",
    "torque": 0.0,
    "axial_force": 0.0,
    "slip_safety": 1.5,       # common practice
    "speed": 0.0,
    "temperature_shaft": 20.0,
    "temperature_hub": 20.0,
    "temperature_assembly": 20.0,
    "yield_safety": 1.2,      # common practice
    "fracture_safety": 2.0,   # common practice for brittle hubs
    "design": "elastic",
    "plastic_zone_limit": 0.3,  # from memory (DIN 7190-1:2017); the failing side of the choice
}
ASSEMBLIES = ("press", "shrink")
MAX_SIZE = 10_000.0       # [mm] plausibility bound of diameters and lengths — common practice
_T_OP = (-100.0, 500.0)       # plausibility bounds of operating temperatures — common practice
_T_ASM = (-200.0, 600.0)      # room temperature at assembly / cooled shaft — common practice


# --------------------------------------------------------------------------- friction table

FRICTION_TABLE = "pressfit_friction.csv"


@functools.cache
def _friction_rows() -> tuple[dict, ...]:
    tables.require_columns(FRICTION_TABLE, ["shaft_group", "hub_group", "assembly", "mu_slip",
                                            "mu_press", "source"])
    rows = []
    for i, r in enumerate(tables.read_rows(FRICTION_TABLE)):
        mu_s, mu_p = float(r["mu_slip"]), float(r["mu_press"])
        if not (0 < mu_s < 1 and 0 < mu_p < 1) or r["assembly"] not in ASSEMBLIES:
            raise tables.TableError(f"{FRICTION_TABLE}, data row {i + 1}: bad friction value or assembly")
        rows.append({**r, "mu_slip": mu_s, "mu_press": mu_p})
    return tuple(rows)


def default_friction(shaft_group: str, hub_group: str, assembly: str) -> tuple[float, float, str] | None:
    """Tabulated (mu_slip, mu_press, source) for a material pair and assembly method, or None.

    >>> default_friction("steel", "steel", "shrink")[:2]
    (0.14, 0.1)
    >>> default_friction("steel", "user", "press") is None
    True
    """
    rows = _friction_rows()
    for a, b in ((shaft_group, hub_group), (hub_group, shaft_group)):
        for r in rows:
            if r["assembly"] == assembly and r["shaft_group"] in (a, "*") and r["hub_group"] in (b, "*"):
                return r["mu_slip"], r["mu_press"], r["source"]
    return None


# --------------------------------------------------------------------------- input

_TO_UNIT = {"mm": 1.0, "um": 1e-3, "N*m": 1e3, "N": 1.0, "MPa": 1.0, "degC": 1.0, "1/K": 1.0,
            "tonne/mm**3": 1.0, "rpm": RPM}
_KIND = {"mm": "length", "um": "length", "N*m": "torque", "N": "force", "MPa": "stress",
         "1/K": "expansion", "tonne/mm**3": "density", "rpm": "speed"}


def _fmt(x: float, unit: str) -> str:
    """A core-unit float as text in ``unit`` that reads back to exactly the same float.

    The shortest number of significant digits that round-trips is used:
    ``_fmt(0.0063, "um") -> '6.3 um'``.
    """
    x = float(x)
    shown = x / _TO_UNIT[unit]
    for n in (6, 9, 12, 15, 17):
        text = f"{shown:.{n}g} {unit}"
        back = temperature_c(text, "t") if unit == "degC" else to_core(text, _KIND[unit], "t")
        if back == x:
            return text
    return f"{shown!r} {unit}"


def _material_mapping(m: Material):
    """A material as its table name (when it is the tabulated one) or a lossless inline table."""
    try:
        if _materials.get(m.name) == m:
            return m.name
    except InputError:
        pass
    out = {"name": m.name, "group": m.group, "E": _fmt(m.E, "MPa"), "nu": m.nu,
           "alpha": _fmt(m.alpha, "1/K"), "Rp02": _fmt(m.Rp02, "MPa"), "Rm": _fmt(m.Rm, "MPa"),
           "density": _fmt(m.density, "tonne/mm**3")}
    if not math.isnan(m.max_heating_C):
        out["max_heating"] = _fmt(m.max_heating_C, "degC")
    for k in ("pG", "tauB"):
        v = getattr(m, k)
        if not math.isnan(v):
            out[k] = _fmt(v, "MPa")
    out["source"] = m.source
    if m.note:
        out["note"] = m.note
    out.update(_materials.fatigue_mapping(m))
    return out


def _needs_unit(v, key: str, example: str) -> None:
    if not isinstance(v, str) and not hasattr(v, "units"):
        raise InputError(key, v, f"a length with its unit, e.g. {example}",
                         "a bare number is ambiguous here (mm or um?)")


@dataclass(frozen=True)
class PressFitInput:
    """Inputs of one press or shrink fit, parsed into core units (mm, N, N·mm, MPa, rad/s, °C).

    Build it with :meth:`from_mapping` from a ``[[pressfit]]`` table (strings with units);
    :meth:`to_mapping` gives the table back (``from_mapping(to_mapping()) == self``).
    ``None`` means "not given": the diameter and interference come from ``fit``,
    the hub diameter from ``module``/``teeth``, friction from the table, the
    joining clearance from 0.001·d.
    """

    name: str = "pressfit"
    fit: str | None = None
    interference_min: float | None = None    # [mm]
    interference_max: float | None = None    # [mm]
    diameter: float | None = None            # [mm]
    length: float = math.nan                 # [mm]
    shaft_bore: float = 0.0                  # [mm]
    hub_outer_diameter: float | None = None  # [mm]
    module: float | None = None              # [mm]
    teeth: int | None = None
    shaft_material: Material | None = None
    hub_material: Material | None = None
    rz_shaft: float = DEFAULTS["rz_shaft"]
    rz_hub: float = DEFAULTS["rz_hub"]
    smoothing_factor: float = DEFAULTS["smoothing_factor"]
    mu_slip: float | None = None
    mu_press: float | None = None
    assembly: str = "press"
    torque: float = 0.0                      # [N·mm]
    axial_force: float = 0.0                 # [N]
    slip_safety: float = DEFAULTS["slip_safety"]
    speed: float = 0.0                       # [rad/s]
    temperature_shaft: float = 20.0          # [°C]
    temperature_hub: float = 20.0            # [°C]
    temperature_assembly: float = 20.0       # [°C]
    temperature_shaft_cooled: float | None = None  # [°C]
    joining_clearance: float | None = None   # [mm]
    yield_safety: float = DEFAULTS["yield_safety"]
    fracture_safety: float = DEFAULTS["fracture_safety"]
    press_force_limit: float | None = None   # [N]
    design: str = "elastic"
    plastic_zone_limit: float = DEFAULTS["plastic_zone_limit"]  # share of the hub wall [-]
    temperature_min: float | None = None     # [°C] lowest ambient (both parts)
    temperature_max: float | None = None     # [°C] highest ambient (both parts)
    profile_shift: float = 0.0               # [-] gear hub
    helix_angle: float = 0.0                 # [rad] gear hub
    shaft_loads: _shaft.ShaftLoads = _shaft.ShaftLoads()  # shaft at the hub edge (DIN 743)

    # ------------------------------------------------------------------ reading
    @classmethod
    def from_mapping(cls, mapping: Mapping, field: str = "pressfit") -> PressFitInput:  # noqa: C901
        """Parse and check a ``[[pressfit]]`` table; every problem is reported at once.

        Raises
        ------
        InputError or InputErrors
            naming ``field.key``, the value and what is allowed.

        Examples
        --------
        >>> PressFitInput.from_mapping({"fit": "20 H7/s6", "length": "16 mm",
        ...     "hub_outer_diameter": "40 mm", "shaft_material": "C45E",
        ...     "hub_material": "C45E"}).resolved_diameter()
        20.0
        >>> PressFitInput.from_mapping({"lenght": "16 mm"})  # doctest: +ELLIPSIS
        Traceback (most recent call last):
        ...
        fitcheck.errors.InputErrors: 6 problems in the input:
          - pressfit.lenght: got '16 mm'; allowed: a key of [[pressfit]]: ... (did you mean 'length'?)
        ...
        """
        if not isinstance(mapping, Mapping):
            raise InputError(field, mapping, "a table of press-fit keys (see fitcheck.pressfit.KEYS)")
        errs = ErrorCollector()
        v: dict = {}
        for key, val in mapping.items():
            if key not in KEYS:
                errs.add(InputError(f"{field}.{key}", val, "a key of [[pressfit]]: " + ", ".join(KEYS),
                                    did_you_mean(key, KEYS)))
        g = mapping.get

        def parse(key, fn):
            if key not in mapping or mapping[key] is None:
                return
            with errs.field(field):
                v[key] = fn(mapping[key], key)

        def length(lo=0.0, lo_open=True, hi=MAX_SIZE):
            return lambda x, k: to_core(x, "length", k, lo=lo, lo_open=lo_open, hi=hi)

        def small(x, k, lo=None):
            _needs_unit(x, k, "'18 um'")
            return to_core(x, "length", k, lo=lo)

        if "name" in mapping:
            v["name"] = str(g("name"))
        parse("fit", lambda x, k: _parse_fit(x, k))
        parse("interference_min", lambda x, k: small(x, k))
        parse("interference_max", lambda x, k: small(x, k))
        parse("diameter", length())
        parse("length", length(lo=0.1, lo_open=False))  # common practice: at least 0.1 mm
        parse("shaft_bore", length(lo=0.0, lo_open=False))
        parse("hub_outer_diameter", length())
        parse("module", length())
        parse("teeth", lambda x, k: _teeth(x, k))
        parse("shaft_material", lambda x, k: _materials.from_mapping(x, k))
        parse("hub_material", lambda x, k: _materials.from_mapping(x, k))
        parse("rz_shaft", lambda x, k: small(x, k, lo=0.0))
        parse("rz_hub", lambda x, k: small(x, k, lo=0.0))
        parse("smoothing_factor", lambda x, k: number(x, k, lo=0.0, hi=2.0))
        parse("mu_slip", lambda x, k: number(x, k, lo=0.0, hi=1.0, lo_open=True))
        parse("mu_press", lambda x, k: number(x, k, lo=0.0, hi=1.0, lo_open=True))
        parse("assembly", lambda x, k: _assembly(x, k))
        parse("torque", lambda x, k: to_core(x, "torque", k, lo=0.0, hi=1e12))
        parse("axial_force", lambda x, k: to_core(x, "force", k, lo=0.0, hi=1e10))
        parse("slip_safety", lambda x, k: number(x, k, lo=1.0, hi=20.0))
        parse("speed", lambda x, k: to_core(x, "speed", k, lo=0.0, hi=200_000 * RPM))
        for key in ("temperature_shaft", "temperature_hub"):
            parse(key, lambda x, k: temperature_c(x, k, lo=_T_OP[0], hi=_T_OP[1]))
        for key in ("temperature_assembly", "temperature_shaft_cooled"):
            parse(key, lambda x, k: temperature_c(x, k, lo=_T_ASM[0], hi=_T_ASM[1]))
        parse("joining_clearance", lambda x, k: small(x, k, lo=0.0))
        parse("yield_safety", lambda x, k: number(x, k, lo=1.0, hi=20.0))
        parse("fracture_safety", lambda x, k: number(x, k, lo=1.0, hi=20.0))
        parse("press_force_limit", lambda x, k: to_core(x, "force", k, lo=0.0, lo_open=True, hi=1e10))
        parse("design", lambda x, k: _design(x, k))
        parse("plastic_zone_limit", lambda x, k: number(x, k, lo=0.0, hi=1.0, lo_open=True))
        for key in ("temperature_min", "temperature_max"):
            parse(key, lambda x, k: temperature_c(x, k, lo=_T_OP[0], hi=_T_OP[1]))
        parse("profile_shift", lambda x, k: number(x, k, lo=-1.0, hi=2.0))   # common practice range
        parse("helix_angle", lambda x, k: to_core(x, "angle", k, lo=0.0, hi=math.radians(45.0)))
        if "temperature_min" in v and "temperature_max" in v and v["temperature_min"] > v["temperature_max"]:
            errs.add(InputError(f"{field}.temperature_min", g("temperature_min"),
                                f"a temperature <= temperature_max ({g('temperature_max')!r})"))
        if ("profile_shift" in mapping or "helix_angle" in mapping) and "module" not in mapping:
            errs.add(InputError(f"{field}.profile_shift" if "profile_shift" in mapping else f"{field}.helix_angle",
                                g("profile_shift", g("helix_angle")), "only with module and teeth (a gear hub)"))

        # ---- required keys and alternatives
        has_fit = "fit" in mapping
        has_int = "interference_min" in mapping or "interference_max" in mapping
        if has_fit and has_int:
            errs.add(InputError(f"{field}.fit", g("fit"), "either fit or interference_min/interference_max, "
                                "not both"))
        elif not has_fit and not has_int:
            errs.add(InputError(f"{field}.fit", None, "a fit such as '20 H7/s6', or interference_min and "
                                "interference_max with diameter"))
        elif has_int:
            for k in ("interference_min", "interference_max"):
                if k not in mapping:
                    errs.add(InputError(f"{field}.{k}", None, "a value (both interference limits are needed)"))
            if "diameter" not in mapping:
                errs.add(InputError(f"{field}.diameter", None, "the joint diameter (needed with explicit "
                                    "interference), e.g. '20 mm'"))
        for k in ("length", "shaft_material", "hub_material"):
            if k not in mapping:
                errs.add(InputError(f"{field}.{k}", None, "a value (required): " + KEYS[k]))
        has_do = "hub_outer_diameter" in mapping
        has_gear = "module" in mapping or "teeth" in mapping
        if has_do and has_gear:
            errs.add(InputError(f"{field}.hub_outer_diameter", g("hub_outer_diameter"),
                                "either hub_outer_diameter or module + teeth, not both"))
        elif not has_do and not has_gear:
            errs.add(InputError(f"{field}.hub_outer_diameter", None,
                                "the hub outer diameter, or module and teeth of a gear"))
        elif has_gear:
            for k in ("module", "teeth"):
                if k not in mapping:
                    errs.add(InputError(f"{field}.{k}", None, "a value (module and teeth go together)"))

        # ---- cross checks on parsed values
        fit_limits = v.pop("fit", None)
        if fit_limits is not None:
            v["fit"] = str(g("fit")).strip()
            d_fit = fit_limits[0]
            if "diameter" in v and abs(v["diameter"] - d_fit) > 1e-9 * d_fit:
                errs.add(InputError(f"{field}.diameter", g("diameter"),
                                    f"the fit's nominal size {d_fit:g} mm (or leave diameter out)"))
        d = v.get("diameter", fit_limits[0] if fit_limits else None)
        imin, imax = v.get("interference_min"), v.get("interference_max")
        if imin is not None and imax is not None and imin > imax:
            errs.add(InputError(f"{field}.interference_min", g("interference_min"),
                                f"a value <= interference_max ({g('interference_max')!r})"))
        if d is not None:
            for k in ("interference_min", "interference_max"):
                if k in v and abs(v[k]) > 0.02 * d:
                    errs.add(InputError(f"{field}.{k}", g(k), f"an interference of at most 2 % of the "
                                        f"diameter ({0.02 * d * 1000:g} um)", "units mixed up (mm for um)?"))
            if "shaft_bore" in v and v["shaft_bore"] >= d:
                errs.add(InputError(f"{field}.shaft_bore", g("shaft_bore"),
                                    f"a bore smaller than the joint diameter ({d:g} mm)"))
            do = v.get("hub_outer_diameter")
            if do is not None and do <= d:
                errs.add(InputError(f"{field}.hub_outer_diameter", g("hub_outer_diameter"),
                                    f"a diameter larger than the joint diameter ({d:g} mm)"))
            if "module" in v and "teeth" in v:
                df = root_diameter(v["module"], v["teeth"], v.get("profile_shift", 0.0),
                                   v.get("helix_angle", 0.0))
                if df <= d:
                    errs.add(InputError(f"{field}.teeth", g("teeth"),
                                        f"a gear whose root diameter m·z/cos β − 2.5·m + 2·x·m exceeds the "
                                        f"bore {d:g} mm (now {df:g} mm)"))
            jc = v.get("joining_clearance")
            if jc is not None and jc > 0.02 * d:
                errs.add(InputError(f"{field}.joining_clearance", g("joining_clearance"),
                                    f"at most 2 % of the diameter ({0.02 * d:g} mm)"))
        hm = v.get("hub_material")
        if v.get("design") == "elastic-plastic" and hm is not None and not hm.is_ductile:
            errs.add(InputError(f"{field}.design", g("design"), "'elastic' for a brittle hub material "
                                f"({hm.name}): the elastic-plastic design needs a ductile hub"))
        for k in ("rz_shaft", "rz_hub"):
            if k in v and v[k] > 0.2:
                errs.add(InputError(f"{field}.{k}", g(k), "a roughness depth of at most 200 um",
                                    "units mixed up?"))
        v["shaft_loads"] = _shaft.ShaftLoads.from_mapping(mapping, field, errs, _shaft.PRESSFIT_KEYS)
        errs.raise_if_any()
        return cls(**v)

    def to_mapping(self) -> dict:
        """The input as a ``[[pressfit]]`` table of strings with units (lossless)."""
        out: dict = {"name": self.name}
        if self.fit is not None:
            out["fit"] = self.fit
        else:
            if self.interference_min is not None:
                out["interference_min"] = _fmt(self.interference_min, "um")
            if self.interference_max is not None:
                out["interference_max"] = _fmt(self.interference_max, "um")
        length_keys = ("diameter", "length", "shaft_bore", "hub_outer_diameter", "module")
        for k in length_keys:
            val = getattr(self, k)
            if val is not None and not (isinstance(val, float) and math.isnan(val)):
                out[k] = _fmt(val, "mm")
        if self.teeth is not None:
            out["teeth"] = self.teeth
        for k in ("shaft_material", "hub_material"):
            m = getattr(self, k)
            if m is not None:
                out[k] = _material_mapping(m)
        out["rz_shaft"] = _fmt(self.rz_shaft, "um")
        out["rz_hub"] = _fmt(self.rz_hub, "um")
        out["smoothing_factor"] = self.smoothing_factor
        for k in ("mu_slip", "mu_press"):
            if getattr(self, k) is not None:
                out[k] = getattr(self, k)
        out["assembly"] = self.assembly
        out["torque"] = _fmt(self.torque, "N*m")
        out["axial_force"] = _fmt(self.axial_force, "N")
        out["slip_safety"] = self.slip_safety
        out["speed"] = _fmt(self.speed, "rpm")
        for k in ("temperature_shaft", "temperature_hub", "temperature_assembly", "temperature_shaft_cooled"):
            if getattr(self, k) is not None:
                out[k] = _fmt(getattr(self, k), "degC")
        if self.joining_clearance is not None:
            out["joining_clearance"] = _fmt(self.joining_clearance, "um")
        out["yield_safety"] = self.yield_safety
        out["fracture_safety"] = self.fracture_safety
        if self.press_force_limit is not None:
            out["press_force_limit"] = _fmt(self.press_force_limit, "N")
        if self.design != "elastic" or self.plastic_zone_limit != DEFAULTS["plastic_zone_limit"]:
            out["design"] = self.design
            out["plastic_zone_limit"] = self.plastic_zone_limit
        for k in ("temperature_min", "temperature_max"):
            if getattr(self, k) is not None:
                out[k] = _fmt(getattr(self, k), "degC")
        if self.profile_shift:
            out["profile_shift"] = self.profile_shift
        if self.helix_angle:
            out["helix_angle"] = f"{self.helix_angle!r} rad"
        out.update(self.shaft_loads.to_mapping())
        return out

    # ------------------------------------------------------------------ derived
    def resolved_diameter(self) -> float:
        """Joint diameter [mm]: as given, or the fit's nominal size."""
        if self.diameter is not None:
            return self.diameter
        return self._limits()[0]

    def _limits(self) -> tuple[float, float, float]:
        """(nominal [mm], interference_min [mm], interference_max [mm])."""
        if self.fit is not None:
            return _parse_fit(self.fit, "fit")
        if self.diameter is None or self.interference_min is None or self.interference_max is None:
            raise InputError("pressfit", self.name, "diameter and both interference limits, or a fit")
        return self.diameter, self.interference_min, self.interference_max

    def resolved_hub_outer_diameter(self) -> tuple[float, str]:
        """Hub outer diameter [mm] and the rule it came from."""
        if self.hub_outer_diameter is not None:
            return self.hub_outer_diameter, "given"
        if self.module is None or self.teeth is None:
            raise InputError("pressfit.hub_outer_diameter", None, "hub_outer_diameter or module + teeth")
        x, beta = self.profile_shift, self.helix_angle
        df = root_diameter(self.module, self.teeth, x, beta)
        if x == 0.0 and beta == 0.0:
            return df, (f"root diameter m·(z − 2.5) = {self.module:g}·({self.teeth} − 2.5) mm "
                        "(standard full-depth teeth, dedendum 1.25·m)")
        return df, (f"root diameter m·z/cos β − 2.5·m + 2·x·m with m = {self.module:g} mm, z = {self.teeth}, "
                    f"β = {math.degrees(beta):g}°, x = {x:g}: {df:.4g} mm (full-depth teeth, dedendum "
                    "1.25·m, ISO 21771:2007)")


def root_diameter(m_n: float, z: int, x: float = 0.0, beta: float = 0.0) -> float:
    """Root diameter of a cylindrical gear [mm]: d_f = m_n·z/cos β − 2·(1.25 − x)·m_n.

    Reference diameter d = m_n·z/cos β and dedendum h_f = (1.25 − x)·m_n of the standard basic
    rack (ISO 53:1998, h_fP = 1.25·m; ISO 21771:2007, d = z·m_n/cos β, profile shift x·m_n).

    >>> root_diameter(2.0, 30)
    55.0
    >>> round(root_diameter(2.0, 30, 0.5, math.radians(20.0)), 4)   # 63.8507 − 5 + 2
    60.8507
    """
    return m_n * z / math.cos(beta) - 2.5 * m_n + 2.0 * x * m_n


def _parse_fit(text, key):
    if not isinstance(text, str):
        raise InputError(key, text, "an ISO 286 fit such as '20 H7/s6' or an ASME B4.1 class such as '1 in FN2'")
    try:
        return _fit_limits(text.strip())
    except InputError as e:
        raise InputError(key, e.value, e.allowed, e.hint) from None


@functools.lru_cache(maxsize=256)
def _fit_limits(text):
    from . import fits  # imported here: the fits engine is a separate module

    f = fits.fit(text)
    if f.hole is None or f.shaft is None:
        raise InputError("fit", text, "a hole and a shaft class, e.g. '20 H7/s6'")
    return (float(f.nominal_mm), float(f.interference_min_um) / 1000.0,
            float(f.interference_max_um) / 1000.0)


def _teeth(x, key):
    if isinstance(x, bool) or not isinstance(x, int | float | str):
        raise InputError(key, x, "a whole number of teeth, 6 … 10000")
    try:
        z = float(x)
    except ValueError:
        raise InputError(key, x, "a whole number of teeth, 6 … 10000") from None
    if not z.is_integer() or z < 6 or z > 10_000:
        raise InputError(key, x, "a whole number of teeth, 6 … 10000")
    return int(z)


def _design(x, key):
    s = str(x).strip().lower()
    if s not in DESIGNS:
        raise InputError(key, x, "'elastic' or 'elastic-plastic'", did_you_mean(s, DESIGNS))
    return s


def _assembly(x, key):
    s = str(x).strip().lower()
    if s not in ASSEMBLIES:
        raise InputError(key, x, "'press' (longitudinal) or 'shrink' (transverse)",
                         did_you_mean(s, ASSEMBLIES))
    return s


# --------------------------------------------------------------------------- result

@dataclass(frozen=True)
class PressFitCase:
    """One tolerance case (loosest or tightest) at one condition (operating or assembly).

    Lengths [mm], stresses [MPa], torque [N·mm], force [N].
    """

    label: str
    interference: float          # measured diametral interference at room temperature [mm]
    effective_interference: float  # after smoothing, temperature and speed [mm]
    pressure: float
    torque_capacity: float
    axial_capacity: float
    hub_sigma_r_bore: float
    hub_sigma_t_bore: float
    hub_von_mises_bore: float
    shaft_sigma_r_surface: float
    shaft_sigma_t_surface: float
    shaft_sigma_t_inner: float   # at a hollow shaft's bore, or at the centre of a solid one
    shaft_von_mises_max: float
    state: str = ""              # operating state, e.g. "cold start at 20 000 rpm"
    speed: float = 0.0           # [rad/s] of the state
    temperature_shaft: float = math.nan  # [°C] of the state
    temperature_hub: float = math.nan    # [°C] of the state

    def to_dict(self) -> dict:
        return {f.name: getattr(self, f.name) for f in fields(self)}


@dataclass(frozen=True)
class PressFitResult:
    """Result of :func:`evaluate`: plain floats in core units plus the named checks.

    Pressures and stresses [MPa], lengths and interferences [mm], torque [N·mm],
    forces [N], temperatures [°C], speed [rad/s].
    """

    name: str
    fit: str | None
    diameter: float
    length: float
    shaft_bore: float
    hub_outer_diameter: float
    hub_outer_rule: str
    interference_min: float
    interference_max: float
    roughness_loss: float
    mu_slip: float
    mu_press: float
    friction_source: str
    assembly: str
    torque: float
    axial_force: float
    speed: float
    temperature_shaft: float
    temperature_hub: float
    temperature_assembly: float
    shaft_material: Material
    hub_material: Material
    loosest_operating: PressFitCase
    tightest_operating: PressFitCase
    loosest_assembly: PressFitCase
    tightest_assembly: PressFitCase
    pressure_min: float
    pressure_max: float
    torque_capacity_min: float
    axial_capacity_min: float
    slip_safety_min: float
    hub_stress_max: float
    hub_tresca_max: float
    shaft_stress_max: float
    shaft_tresca_max: float
    hub_yield_safety: float
    shaft_yield_safety: float
    hub_outer_growth_max: float
    shaft_bore_change_max: float
    press_force_max: float
    shrink_temperature_C: float
    joining_clearance: float
    loosening_speed: float
    governing_tight_condition: str
    checks: tuple[Check, ...]
    warnings: tuple[str, ...] = ()
    design: str = "elastic"
    plastic_zone_diameter: float = math.nan  # [mm] at the tightest case; = diameter while elastic
    plastic_utilisation: float = 0.0         # plastic share of the hub wall / permitted share [-]
    plastic_zone_limit: float = DEFAULTS["plastic_zone_limit"]
    loosest_governing: PressFitCase | None = None   # the state with the smallest pressure
    tightest_governing: PressFitCase | None = None  # the state with the largest hub stress
    states: tuple[PressFitCase, ...] = ()           # loosest and tightest case of every state
    governing_loose_state: str = ""
    governing_tight_state: str = ""
    loosening_state: str = ""
    loosening_note: str = ""                        # "not applicable: …" where no speed loosens it
    temperature_min: float | None = None
    temperature_max: float | None = None
    headline: str = ""
    shaft: _shaft.ShaftSeatResult | None = None  # the shaft at the hub edge (DIN 743)

    @property
    def ok(self) -> bool:
        return bool(self.checks) and all(c.passed for c in self.checks)

    @property
    def loosening_speed_text(self) -> str:
        """The loosening speed as people read it: a speed in rpm, or "not applicable (why)"."""
        if self.loosening_note:
            return self.loosening_note
        if math.isinf(self.loosening_speed):
            return "none (rotation does not loosen this joint)"
        return f"{self.loosening_speed_rpm:.0f} rpm ({self.loosening_state})"

    @property
    def loosening_speed_rpm(self) -> float:
        return self.loosening_speed / RPM

    # ---- profiles for plots -------------------------------------------------------------
    def wall_profile(self, n: int = 60) -> dict:
        """Radial, tangential and von Mises stress through shaft and hub at the tightest case.

        Returns a dict of arrays: ``r_shaft``, ``sr_shaft``, ``st_shaft``, ``vm_shaft``,
        ``r_hub``, ``sr_hub``, ``st_hub``, ``vm_hub`` ([mm], [MPa]).
        """
        case = self.tightest_governing
        if case is None:
            op = self.governing_tight_condition == "operating"
            case = self.tightest_operating if op else self.tightest_assembly
            w = self.speed if op else 0.0
        else:
            w = case.speed
        d, di, Do = self.diameter, self.shaft_bore, self.hub_outer_diameter
        rs = np.linspace(di / 2.0, d / 2.0, n)
        rh = np.linspace(d / 2.0, Do / 2.0, n)
        s, h = self.shaft_material, self.hub_material
        srs, sts = lame.shaft_stresses(case.pressure, d, di, rs)
        a, b = lame.rotating_disc_stresses(s.density, w, s.nu, di, d, rs)
        srs, sts = srs + a, sts + b
        srh, sth = lame.hub_stresses(case.pressure, d, Do, rh)
        d_pl = self.plastic_zone_diameter if self.design == "elastic-plastic" else d
        if d_pl > d:  # partly plastic hub (fitcheck.core.elastoplastic)
            srh, sth = _ep.hub_stresses(self.pressure_max, d_pl, d, Do, rh, self.hub_material.Rp02)
        a, b = lame.rotating_disc_stresses(h.density, w, h.nu, d, Do, rh)
        srh, sth = srh + a, sth + b
        return {"r_shaft": rs, "sr_shaft": srs, "st_shaft": sts, "vm_shaft": lame.von_mises(srs, sts),
                "r_hub": rh, "sr_hub": srh, "st_hub": sth, "vm_hub": lame.von_mises(srh, sth),
                "condition": self.governing_tight_condition, "state": case.state,
                "plastic_zone_diameter": d_pl}

    def torque_capacity_at(self, interference) -> np.ndarray:
        """Torque capacity [N·mm] at operating condition for measured interferences [mm].

        Linear in the interference above the loss by smoothing, temperature and speed; 0 below.
        In the elastic-plastic design the pressure follows the partly plastic hub (first loading).
        """
        lo = self.loosest_governing or self.loosest_operating
        loss = lo.interference - lo.effective_interference
        if self.design == "elastic-plastic":  # first loading of the partly plastic hub
            s, h = self.shaft_material, self.hub_material
            p = np.asarray(_ep.contact_pressure(np.asarray(interference, dtype=float) - loss, self.diameter,
                                                self.shaft_bore, self.hub_outer_diameter, s.E, s.nu, h.E,
                                                h.nu, h.Rp02))
            return p * math.pi * self.diameter**2 * self.length * self.mu_slip / 2.0
        p_per_mm = _pressure_per_mm(self)
        p = np.maximum((np.asarray(interference, dtype=float) - loss) * p_per_mm, 0.0)
        return p * math.pi * self.diameter**2 * self.length * self.mu_slip / 2.0

    def capacity_band(self, n: int = 200) -> dict:
        """Torque capacity across the measured-interference band, for plots and charts.

        Returns a dict: ``interference`` [mm] from a little below the loosest to a little
        above the tightest measured interference (``n`` points), ``torque_capacity`` [N·mm]
        there at operating condition, ``in_band`` (bool, inside the tolerance band),
        ``required`` [N·mm] — the load the slip check needs, torque and thrust combined as an
        equivalent torque √((2T/d)² + F²)·d/2, times the required slip safety — and
        ``slip_safety_required`` [-].
        """
        lo, hi = self.interference_min, self.interference_max
        pad = 0.05 * max(hi - lo, 1e-6)
        x = np.linspace(lo - pad, hi + pad, n)
        slip = next((c for c in self.checks if c.name == "slip at loosest fit"), None)
        s_req = slip.limit if slip is not None else 1.0
        demand = math.hypot(2.0 * self.torque / self.diameter, self.axial_force) * self.diameter / 2.0
        return {"interference": x, "torque_capacity": self.torque_capacity_at(x),
                "in_band": (x >= lo) & (x <= hi), "required": demand * s_req,
                "slip_safety_required": s_req}

    def to_json(self) -> dict:
        """Summary for ``--json`` and reports (units in the key names)."""
        return {
            "name": self.name,
            "fit": self.fit,
            "diameter_mm": self.diameter,
            "length_mm": self.length,
            "shaft_bore_mm": self.shaft_bore,
            "hub_outer_diameter_mm": self.hub_outer_diameter,
            "hub_outer_rule": self.hub_outer_rule,
            "interference_min_um": self.interference_min * 1000.0,
            "interference_max_um": self.interference_max * 1000.0,
            "roughness_loss_um": self.roughness_loss * 1000.0,
            "mu_slip": self.mu_slip,
            "mu_press": self.mu_press,
            "friction_source": self.friction_source,
            "assembly": self.assembly,
            "pressure_min_MPa": self.pressure_min,
            "pressure_max_MPa": self.pressure_max,
            "torque_capacity_min_Nm": self.torque_capacity_min / 1000.0,
            "axial_capacity_min_N": self.axial_capacity_min,
            "torque_required_Nm": self.torque / 1000.0,
            "axial_force_required_N": self.axial_force,
            "slip_safety_min": self.slip_safety_min,
            "hub_stress_max_MPa": self.hub_stress_max,
            "hub_tresca_max_MPa": self.hub_tresca_max,
            "shaft_stress_max_MPa": self.shaft_stress_max,
            "shaft_tresca_max_MPa": self.shaft_tresca_max,
            "hub_yield_safety": self.hub_yield_safety,
            "shaft_yield_safety": self.shaft_yield_safety,
            "hub_outer_growth_max_um": self.hub_outer_growth_max * 1000.0,
            "shaft_bore_change_max_um": self.shaft_bore_change_max * 1000.0,
            "press_force_max_N": self.press_force_max,
            "shrink_temperature_C": self.shrink_temperature_C,
            "joining_clearance_um": self.joining_clearance * 1000.0,
            "loosening_speed_rpm": self.loosening_speed_rpm,
            "governing_tight_condition": self.governing_tight_condition,
            "cases": {k: getattr(self, k).to_dict() for k in
                      ("loosest_operating", "tightest_operating", "loosest_assembly", "tightest_assembly")},
            "checks": [c.to_dict() for c in self.checks],
            "warnings": list(self.warnings),
            "ok": self.ok,
            "design": self.design,
            "plastic_zone_diameter_mm": self.plastic_zone_diameter,
            "plastic_utilisation": self.plastic_utilisation,
            "governing_loose_state": self.governing_loose_state,
            "governing_tight_state": self.governing_tight_state,
            "loosening_state": self.loosening_state,
            "loosening_speed": self.loosening_speed_text,
            "temperature_min_C": self.temperature_min,
            "temperature_max_C": self.temperature_max,
            "states": [c.to_dict() for c in self.states],
            "headline": self.headline,
            **_shaft.json_fields(self.shaft),
        }


def _pressure_per_mm(r: PressFitResult) -> float:
    s, h = r.shaft_material, r.hub_material
    k = lame.compliance_hub(r.diameter, r.hub_outer_diameter, h.E, h.nu) + \
        lame.compliance_shaft(r.diameter, r.shaft_bore, s.E, s.nu)
    return 1.0 / (r.diameter * k)


def _f(x) -> float:
    return float(np.asarray(x))


def _case(label, delta, d, L, di, Do, s: Material, h: Material, mu, loss_rz, Ts, Th, T0, w,
          p=None) -> PressFitCase:
    turning = w > 0.0   # rotation terms only when turning: an infinite hub at standstill gives 0, not 0·inf
    de = delta - loss_rz + lame.thermal_interference_change(d, s.alpha, h.alpha, Ts, Th, T0)
    if turning:
        de = de - lame.centrifugal_interference_loss(w, d, di, Do, s.E, s.nu, s.density, h.E, h.nu, h.density)
    plastic_design = p is not None  # the elastic-plastic design passes the kernel's pressure
    if p is None:
        p = lame.contact_pressure(de, d, di, Do, s.E, s.nu, h.E, h.nu)
    hr, ht = lame.hub_stresses(p, d, Do, d / 2.0)
    if plastic_design and p > _ep.elastic_limit_pressure(d, Do, h.Rp02):  # plastic hub bore
        ht = _ep.KAPPA_DIN * h.Rp02 - p
    sr, st = lame.shaft_stresses(p, d, di, d / 2.0)
    si = lame.shaft_stresses(p, d, di, di / 2.0)[1]
    if turning:
        ht = ht + lame.rotating_disc_stresses(h.density, w, h.nu, d, Do, d / 2.0)[1]
        st = st + lame.rotating_disc_stresses(s.density, w, s.nu, di, d, d / 2.0)[1]
        si = si + lame.rotating_disc_stresses(s.density, w, s.nu, di, d, di / 2.0)[1]
    vm_s = max(_f(lame.von_mises(sr, st)), abs(_f(si)))
    fcap = p * math.pi * d * L * mu
    return PressFitCase(label, delta, _f(de), _f(p), _f(fcap * d / 2.0), _f(fcap), _f(hr), _f(ht),
                        _f(lame.von_mises(hr, ht)), _f(sr), _f(st), _f(si), vm_s,
                        label, float(w), float(Ts), float(Th))


def _rpm_text(w: float) -> str:
    """A speed for people: ``20 000 rpm`` (thin groups of three)."""
    return f"{w / RPM:,.0f} rpm".replace(",", "\u2009")


def state_names(T0: float, Ts: float, Th: float, w: float, tmin: float | None = None,
                tmax: float | None = None) -> list[str]:
    """Names of the operating states in the order of the kernel's state codes (2·k + at speed).

    >>> state_names(20.0, 80.0, 40.0, 20000 * RPM)[:2]
    ['room temperature (20 °C) at standstill', 'cold start at 20\u2009000 rpm (20 °C)']
    """
    temps = _core.state_temperatures(Ts, Th, T0, tmin, tmax)
    spin = _rpm_text(w)
    out = []
    for k, (ts, th) in enumerate(temps):
        if k == 1:
            t = f"shaft {ts:g} °C, hub {th:g} °C" if ts != th else f"{ts:g} °C"
            out += [f"operating temperature ({t}) at standstill", f"operating temperature ({t}) at {spin}"]
        elif k == 0:
            start = f"cold start at {spin}" if ts <= min(Ts, Th) else f"room temperature at {spin}"
            out += [f"room temperature ({ts:g} °C) at standstill", f"{start} ({ts:g} °C)"]
        else:
            what = "lowest ambient" if (k == 2 and tmin is not None) else "highest ambient"
            start = "cold start" if ts <= T0 else "hot running"
            out += [f"{what} {ts:g} °C at standstill", f"{start} at {spin} ({what} {ts:g} °C)"]
    return out


# --------------------------------------------------------------------------- evaluate

def core_arguments(inp: PressFitInput) -> tuple[dict, str, str]:
    """Keyword arguments of :func:`fitcheck.core.pressfit.evaluate` for one input, defaults resolved.

    One place resolves what the input leaves open — friction from the table by material pair
    and assembly, the hub diameter from module and teeth, the joining clearance 0.001·d
    (common practice), the heating limit of the hub material, brittle parts — for
    :func:`evaluate` and for the tolerance study.

    Returns
    -------
    kwargs : dict
        Arguments of the kernel in core units (scalars).
    friction_source : str
        Where the friction coefficients came from.
    hub_rule : str
        How the hub outer diameter was found.
    """
    if not isinstance(inp, PressFitInput):
        raise InputError("pressfit", type(inp).__name__, "a PressFitInput (use PressFitInput.from_mapping)")
    if inp.shaft_material is None or inp.hub_material is None or math.isnan(inp.length):
        raise InputError(f"pressfit[{inp.name}]", inp.name, "length, shaft_material and hub_material")
    d, imin, imax = inp._limits()
    if inp.diameter is not None:
        d = inp.diameter
    Do, do_rule = inp.resolved_hub_outer_diameter()
    s, h = inp.shaft_material, inp.hub_material
    tab = default_friction(s.group, h.group, inp.assembly)
    if inp.mu_slip is None and tab is None:
        raise InputError(f"pressfit[{inp.name}].mu_slip", None,
                         f"a friction coefficient: {FRICTION_TABLE} has none for {s.group} "
                         f"in {h.group} ({inp.assembly})")
    mu_slip = inp.mu_slip if inp.mu_slip is not None else tab[0]
    if inp.mu_press is not None:
        mu_press = inp.mu_press
    elif inp.mu_slip is None and tab is not None:
        mu_press = tab[1]
    else:
        mu_press = mu_slip
    src_parts = ["mu_slip: given" if inp.mu_slip is not None else f"mu_slip: {tab[2]}"]
    if inp.mu_press is not None:
        src_parts.append("mu_press: given")
    elif inp.mu_slip is None:
        src_parts.append(f"mu_press: {FRICTION_TABLE}")
    else:
        src_parts.append("mu_press: = mu_slip")
    T0 = inp.temperature_assembly
    kwargs = dict(
        interference_min=imin, interference_max=imax, d=d, L=inp.length, di=inp.shaft_bore, Do=Do,
        Es=s.E, nus=s.nu, alphas=s.alpha, Rps=s.Rp02, rhos=s.density,
        Eh=h.E, nuh=h.nu, alphah=h.alpha, Rph=h.Rp02, rhoh=h.density,
        mu_slip=mu_slip, mu_press=mu_press, rz_shaft=inp.rz_shaft, rz_hub=inp.rz_hub,
        smoothing=inp.smoothing_factor, torque=inp.torque, axial_force=inp.axial_force,
        slip_safety=inp.slip_safety, omega=inp.speed, T_shaft=inp.temperature_shaft,
        T_hub=inp.temperature_hub, T_assembly=T0,
        joining_clearance=inp.joining_clearance if inp.joining_clearance is not None else 1e-3 * d,
        yield_safety=inp.yield_safety, brittle_shaft=not s.is_ductile, brittle_hub=not h.is_ductile,
        Rms=s.Rm, Rmh=h.Rm, fracture_safety=inp.fracture_safety, shrink=inp.assembly == "shrink",
        max_heating=h.max_heating_C if not math.isnan(h.max_heating_C) else np.inf,
        T_shaft_cooled=inp.temperature_shaft_cooled if inp.temperature_shaft_cooled is not None else T0,
        press_force_limit=inp.press_force_limit if inp.press_force_limit is not None else np.inf,
        T_min=inp.temperature_min, T_max=inp.temperature_max,
        design=inp.design, plastic_limit=inp.plastic_zone_limit)
    return kwargs, "; ".join(src_parts), do_rule


def evaluate(inp: PressFitInput) -> PressFitResult:
    """Evaluate one press or shrink fit: cases, capacities, stresses, assembly and checks.

    Warns with :class:`~fitcheck.errors.MethodRangeWarning` where the elastic method
    does not hold (hub bore or shaft yielding) or a material needs caution.
    """
    kw, friction_source, do_rule = core_arguments(inp)
    d, Do, mu_slip, mu_press = kw["d"], kw["Do"], kw["mu_slip"], kw["mu_press"]
    imin, imax = kw["interference_min"], kw["interference_max"]
    s, h = inp.shaft_material, inp.hub_material
    brittle_s, brittle_h, shrink = kw["brittle_shaft"], kw["brittle_hub"], kw["shrink"]
    max_heat, T0, w, jc = kw["max_heating"], kw["T_assembly"], kw["omega"], kw["joining_clearance"]
    loss_rz = inp.smoothing_factor * (inp.rz_shaft + inp.rz_hub)
    label = f"pressfit[{inp.name}]"
    r = _core.evaluate(**kw)
    r = {k: (_f(v) if np.asarray(v).dtype != bool else bool(v)) for k, v in r.items()}

    args = (d, inp.length, inp.shaft_bore, Do, s, h, mu_slip, loss_rz)
    Ts, Th = inp.temperature_shaft, inp.temperature_hub
    ep = {k: r[k] for k in ("p_min_op", "p_max_op", "p_min_asm", "p_max_asm")} \
        if inp.design == "elastic-plastic" else dict.fromkeys(("p_min_op", "p_max_op", "p_min_asm", "p_max_asm"))
    cases = {
        "loosest_operating": _case("loosest, operating", imin, *args, Ts, Th, T0, w, ep["p_min_op"]),
        "tightest_operating": _case("tightest, operating", imax, *args, Ts, Th, T0, w, ep["p_max_op"]),
        "loosest_assembly": _case("loosest, room temperature, standstill", imin, *args, T0, T0, T0, 0.0,
                                  ep["p_min_asm"]),
        "tightest_assembly": _case("tightest, room temperature, standstill", imax, *args, T0, T0, T0, 0.0,
                                   ep["p_max_asm"]),
    }
    # every operating state: temperature state × (standstill, operating speed)
    tmin, tmax = inp.temperature_min, inp.temperature_max
    names = state_names(T0, Ts, Th, w, tmin, tmax)
    temps = _core.state_temperatures(Ts, Th, T0, tmin, tmax)
    states, by_code = [], {}
    for code, name in enumerate(names):
        ts, th = temps[code // 2]
        ws = w if code % 2 else 0.0
        if code % 2 and w == 0.0:
            continue   # standstill is the only speed
        lo = _case(name, imin, *args, ts, th, T0, ws)
        hi = _case(name, imax, *args, ts, th, T0, ws)
        by_code[code] = (lo, hi)
    if inp.design == "elastic-plastic":
        # the partly plastic hub yields at the largest interference over every state and unloads
        # elastically to the others (the kernel's rule, core/pressfit.py), state by state
        ep_args = (d, inp.shaft_bore, Do, s.E, s.nu, h.E, h.nu, h.Rp02)
        c_p = _f(lame.contact_pressure(1.0, d, inp.shaft_bore, Do, s.E, s.nu, h.E, h.nu))
        for j, delta in ((0, imin), (1, imax)):
            peak = max(pair[j].effective_interference for pair in by_code.values())
            p_pk = _f(_ep.contact_pressure(peak, *ep_args))
            for code, pair in list(by_code.items()):
                c = pair[j]
                p_state = max(p_pk - (peak - c.effective_interference) * c_p, 0.0)
                ts, th = c.temperature_shaft, c.temperature_hub
                new_c = _case(c.label, delta, *args, ts, th, T0, c.speed, p_state)
                by_code[code] = (new_c, pair[1]) if j == 0 else (pair[0], new_c)
    for code in by_code:
        states += list(by_code[code])
    code_lo, code_tight = int(r["state_p_min"]), int(r["state_hub"])
    code_shaft, code_loose = int(r["state_shaft"]), int(r["state_loosening"])
    state_lo, state_tight = names[code_lo], names[code_tight]
    state_shaft = names[code_shaft]
    state_loose = names[code_loose].replace(" at standstill", "")
    loosest_gov, tightest_gov = by_code[code_lo][0], by_code[code_tight][1]
    tight_op = code_tight != 0

    # ---- checks
    rpm = 1.0 / RPM
    hub_req = inp.fracture_safety if brittle_h else inp.yield_safety
    shaft_req = inp.fracture_safety if brittle_s else inp.yield_safety
    hub_basis = "Rm / largest principal stress (brittle)" if brittle_h else "Rp0.2 / von Mises"
    shaft_basis = "Rm / largest principal stress (brittle)" if brittle_s else "Rp0.2 / von Mises"
    load_note = ("no torque or axial force given: only the contact pressure is checked"
                 if inp.torque == 0 and inp.axial_force == 0 else
                 f"demand √((2T/d)² + F²) with T = {inp.torque / 1000:g} N·m, F = {inp.axial_force:g} N")
    # what takes the interference at the governing loosest state [mm]
    loss_th = -_f(lame.thermal_interference_change(d, s.alpha, h.alpha, loosest_gov.temperature_shaft,
                                                   loosest_gov.temperature_hub, T0))
    loss_w = imin - loss_rz + (-loss_th) - loosest_gov.effective_interference
    why_zero = _why_no_pressure(imin, loss_rz, loss_th, loss_w)
    no_pressure_at_rest = by_code[code_loose][0].pressure <= 0
    if r["loosening_speed"] > 0:
        loosening_note = ""
        speed_note = (f"governing state: {state_loose}; speed at which the loosest fit loses all contact "
                      "pressure, against the operating speed")
    elif math.isinf(Do) and not no_pressure_at_rest:
        loosening_note = "not applicable: a hub of infinite outer diameter cannot turn"
        speed_note = loosening_note
    else:
        loosening_note = (f"not applicable: the loosest fit has no contact pressure even at standstill "
                          f"({state_loose})")
        speed_note = loosening_note
    checks = [
        Check("slip at loosest fit", r["slip_safety_min"] if r["p_min"] > 0 else 0.0, inp.slip_safety, ">=",
              "", REF_SLIP, f"governing state: {state_lo}; " + load_note
              + ("" if r["p_min"] > 0 else f"; no contact pressure: {why_zero}")),
        Check("hub yield at tightest fit", r["hub_yield_safety"], hub_req, ">=", "", REF_HUB,
              f"governing state: {state_tight}; safety {hub_basis} at the hub bore") if inp.design == "elastic" else
        plastic_zone_check(r["plastic_zone_diameter_max"], d, Do, inp.plastic_zone_limit),
        Check("shaft yield at tightest fit", r["shaft_yield_safety"], shaft_req, ">=", "", REF_SHAFT,
              f"governing state: {state_shaft}; safety {shaft_basis}, shaft surface and bore/centre"),
        # without contact pressure at standstill the joint holds at no speed at all: 0 rpm is held
        # against at least 1 rpm, so the check fails rather than pass as "0 rpm >= 0 rpm"
        Check("loosening speed", r["loosening_speed"] * rpm,
              max(w * rpm, 1.0) if no_pressure_at_rest else w * rpm, ">=", "rpm", REF_SPEED, speed_note),
    ]
    warns: list[str] = []
    if shrink:
        if math.isfinite(max_heat):
            checks.append(Check("hub heating temperature", r["shrink_temperature"], max_heat, "<=", "degC",
                                REF_HEAT, f"heating limit of {h.name} (tempering / ageing / softening)"))
        else:
            warns.append(f"no heating limit known for {h.name}: the hub temperature "
                         f"{r['shrink_temperature']:.0f} degC is not checked")
    if inp.press_force_limit is not None and not shrink:
        checks.append(Check("press-in force", r["press_force_max"], inp.press_force_limit, "<=", "N",
                            REF_PRESS, "at the tightest fit, room temperature, with mu_press"))

    # ---- method range and material cautions
    if brittle_h and inp.design == "elastic-plastic":
        raise InputError(f"{label}.design", inp.design, f"'elastic' for the brittle hub material {h.name}")
    if r["hub_yield_safety"] < 1.0 and inp.design == "elastic":
        warns.append(f"the hub bore exceeds its {'tensile strength' if brittle_h else 'yield strength'} at the "
                     "tightest fit: the elastic Lamé result no longer holds"
                     + ("" if brittle_h else "; design = 'elastic-plastic' designs a partly yielding hub "
                        "(DIN 7190-1:2017)"))
    if r["shaft_yield_safety"] < 1.0:
        warns.append("the shaft exceeds its yield strength at the tightest fit: the elastic result no longer "
                     "holds; the shaft must stay elastic in both designs (DIN 7190-1:2017)")
    for m, part in ((s, "shaft"), (h, "hub")):
        if m.group == "plastic":
            warns.append(f"{part} material {m.name} creeps: {m.note or 'long-term pressure is lower'}")
        elif not m.is_ductile:
            warns.append(f"{part} material {m.name} is brittle: checked with the largest principal stress "
                         "against Rm")
    if Do / d < 1.2:
        warns.append(f"thin hub (Do/d = {Do / d:.2f}): the hub's own stiffness and the plane-stress model "
                     "become uncertain")
    shaft = _shaft.evaluate_seat(d=d, di=inp.shaft_bore, material=s, rz_um=inp.rz_shaft * 1000.0,
                                 loads=inp.shaft_loads, torque=inp.torque, axial_force=inp.axial_force,
                                 temperature=Ts, what="hub", module=inp.module, teeth=inp.teeth)
    checks.extend(shaft.checks)
    warns.extend(shaft.warnings)
    for msg in warns:
        warnings.warn(f"{label}: {msg}", MethodRangeWarning, stacklevel=2)
    headline = _headline(checks, r, state_lo, state_tight, state_shaft, state_loose, why_zero, w)

    return PressFitResult(
        name=inp.name, fit=inp.fit, diameter=d, length=inp.length, shaft_bore=inp.shaft_bore,
        hub_outer_diameter=Do, hub_outer_rule=do_rule, interference_min=imin, interference_max=imax,
        roughness_loss=loss_rz, mu_slip=mu_slip, mu_press=mu_press, friction_source=friction_source,
        assembly=inp.assembly, torque=inp.torque, axial_force=inp.axial_force, speed=w,
        temperature_shaft=Ts, temperature_hub=Th, temperature_assembly=T0,
        shaft_material=s, hub_material=h, **cases,
        pressure_min=r["p_min"], pressure_max=r["p_max"], torque_capacity_min=r["torque_capacity_min"],
        axial_capacity_min=r["axial_capacity_min"],
        slip_safety_min=r["slip_safety_min"] if r["p_min"] > 0 else 0.0,
        hub_stress_max=r["hub_stress_max"], hub_tresca_max=r["hub_tresca_max"],
        shaft_stress_max=r["shaft_stress_max"], shaft_tresca_max=r["shaft_tresca_max"],
        hub_yield_safety=r["hub_yield_safety"], shaft_yield_safety=r["shaft_yield_safety"],
        hub_outer_growth_max=r["hub_outer_growth_max"], shaft_bore_change_max=r["shaft_bore_change_max"] + 0.0,
        press_force_max=r["press_force_max"], shrink_temperature_C=r["shrink_temperature"],
        joining_clearance=jc, loosening_speed=r["loosening_speed"],
        governing_tight_condition="operating" if tight_op else "assembly",
        checks=tuple(checks), warnings=tuple(warns) + shaft.notes, shaft=shaft,
        design=inp.design, plastic_zone_diameter=r["plastic_zone_diameter_max"],
        plastic_utilisation=r["plastic_utilisation"], plastic_zone_limit=inp.plastic_zone_limit,
        loosest_governing=loosest_gov, tightest_governing=tightest_gov, states=tuple(states),
        governing_loose_state=state_lo, governing_tight_state=state_tight, loosening_state=state_loose,
        loosening_note=loosening_note, temperature_min=tmin, temperature_max=tmax, headline=headline,
    )


def plastic_zone_check(d_pl: float, d: float, Do: float, limit: float) -> Check:
    """The elastic-plastic design's hub check: share of the hub wall that yields at the tightest fit.

    Passes while (D_pl − d)/(Do − d) ≤ ``limit``; the note states the depth of the zone and, beyond
    the limit, by how much it is exceeded.
    """
    share = float(_ep.plastic_share(d_pl, d, Do))
    depth = (d_pl - d) / 2.0
    allowed = limit * (Do - d) / 2.0
    if d_pl <= d:
        note = "the hub stays elastic (no plastic zone)"
    else:
        note = (f"plastic zone Ø {d_pl:.3f} mm: {depth:.3f} mm deep from the bore, "
                f"{share:.0%} of the hub wall; permitted {allowed:.3f} mm ({limit:.0%})")
        if share > limit:
            note += f"; exceeded by {depth - allowed:.3f} mm"
        if d_pl >= Do:
            note += "; the hub is fully plastic"
    return Check("hub plastic zone at tightest fit", share, limit, "<=", "", REF_PLASTIC, note)


def _why_no_pressure(imin: float, loss_rz: float, loss_th: float, loss_w: float) -> str:
    """Which effects take the whole smallest interference (all in mm), for the verdict."""
    parts = [f"smoothing {loss_rz * 1e3:.1f} um"]
    if abs(loss_th) > 1e-7:
        parts.append(f"temperature {loss_th * 1e3:+.1f} um")
    if abs(loss_w) > 1e-7:
        parts.append(f"speed {loss_w * 1e3:+.1f} um")
    if imin <= 0:
        return f"the loosest pairing is a clearance ({-imin * 1e3:.1f} um) before any loss"
    return (f"{', '.join(parts)} take the whole smallest interference of {imin * 1e3:.1f} um, so the "
            "joint slips")


def _headline(checks, r, state_lo, state_tight, state_shaft, state_loose, why_zero, w) -> str:
    """One sentence a reviewer reads first: the verdict, its real cause, and the next step."""
    if all(c.passed for c in checks):
        slip = checks[0]
        return (f"Holds in every operating state: slip safety {slip.value:.3g} (governing: {state_lo}), "
                f"hub yield safety {r['hub_yield_safety']:.3g} (governing: {state_tight}).")
    out = []
    by = {c.name: c for c in checks}
    c = by["slip at loosest fit"]
    if not c.passed:
        if r["p_min"] <= 0:
            nxt = ("an interference fit" if "is a clearance" in why_zero else
                   "a tighter fit, or a material pair that keeps its interference in that state")
            out.append(f"Slips: no contact pressure at the loosest fit ({state_lo}): {why_zero}. Next: "
                       f"{nxt} (fitcheck search lists the fits that pass)")
        else:
            out.append(f"Slips: slip safety {c.value:.3g} < {c.limit:g} at the loosest fit ({state_lo}). "
                       "Next: a tighter fit, a longer hub or a rougher, dry joint (fitcheck search)")
    c = by.get("hub plastic zone at tightest fit")
    if c is not None and not c.passed:
        out.append(f"The hub's plastic zone exceeds its permitted share of the wall ({state_tight}): "
                   f"{c.value:.0%} > {c.limit:.0%}. Next: a looser fit, a thicker hub or a stronger hub material")
    for name, state, part in (("hub yield at tightest fit", state_tight, "hub bore"),
                              ("shaft yield at tightest fit", state_shaft, "shaft")):
        c = by.get(name)
        if c is not None and not c.passed:
            out.append(f"The {part} yields at the tightest fit ({state}): safety {c.value:.3g} < {c.limit:g}. "
                       f"Next: a looser fit, a {'thicker hub' if part == 'hub bore' else 'solid or stronger shaft'}"
                       " or a stronger material")
    c = by["loosening speed"]
    if not c.passed and r["p_min"] > 0:
        out.append(f"Loosens at {c.value:.0f} rpm, below the operating {c.limit:.0f} rpm ({state_loose}). "
                   "Next: a tighter fit or a thicker hub")
    for c in checks[4:]:
        if not c.passed:
            out.append(f"{c.name[0].upper()}{c.name[1:]} {c.value:.4g} {c.unit} exceeds {c.limit:.4g} "
                       f"{c.unit}. Next: {'cool the shaft or a looser fit' if 'heating' in c.name else 'a stronger press or a looser fit'}")
    return "Does not hold. " + " ".join(x.rstrip(".") + "." for x in out)
