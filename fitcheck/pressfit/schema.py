"""The ``[[pressfit]]`` table: keys, method notes, references, defaults, the friction table and the
parsing of a joint's input. Part of :mod:`fitcheck.pressfit` (schema and parsing; evaluation in
:mod:`fitcheck.pressfit.evaluate`, results in :mod:`fitcheck.pressfit.results`).
"""

from __future__ import annotations

import functools
import math
from collections.abc import Mapping
from dataclasses import dataclass

from .. import materials as _materials
from .. import shaft as _shaft
from .. import tables
from ..errors import ErrorCollector, InputError, did_you_mean
from ..materials import Material
from ..units import number, temperature_c, to_core

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
    "mesh_thrust": "helical mesh thrust in the slip check and the shaft check: 'add' (default) "
                   "adds the magnitude of the "
                   "axial mesh force F_a = F_t·tan β (F_t = 2·torque/d_p, pitch diameter "
                   "d_p = m·z/cos β) of a gear hub with helix_angle to axial_force, whatever the "
                   "directions (the conservative side); 'ignore' when axial_force already holds it",
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
    ("Helical gear hub: F in the slip demand is axial_force + |F_a|, F_a = F_t·tan β, "
     "F_t = 2T/d_p, pitch diameter d_p = m_n·z/cos β (mesh_thrust = 'add', the default: magnitudes "
     "added whatever the directions, the conservative side; 'ignore' when axial_force already "
     "holds it), the same in every operating state", "Shigley, 10th ed., eqs. (13-39), (13-40) — from memory"),
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
     "unload elastically; the plastic zone's share (D_pl − d)/(D_o − d) at most plastic_zone_limit",
     "DIN 7190-1:2017 (elastic-plastic range) — from memory; derived in fitcheck.core.elastoplastic"),
    ("Not implemented: the stress peaks of the end effects at the hub faces in the press-fit stresses "
     "(the shaft's notch at the hub edge is checked with DIN 743's press-fit notch factors, below)",
     "DIN 7190-1:2017 (elastic-plastic range)"),
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
MESH_THRUST = ("add", "ignore")   # the helical mesh's axial force in the slip demand (default first)
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
    mesh_thrust: str = "add"                 # 'add' | 'ignore': helical mesh thrust in the slip demand
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
        parse("mesh_thrust", lambda x, k: _mesh_thrust(x, k))
        if "temperature_min" in v and "temperature_max" in v and v["temperature_min"] > v["temperature_max"]:
            errs.add(InputError(f"{field}.temperature_min", g("temperature_min"),
                                f"a temperature <= temperature_max ({g('temperature_max')!r})"))
        if ("profile_shift" in mapping or "helix_angle" in mapping) and "module" not in mapping:
            errs.add(InputError(f"{field}.profile_shift" if "profile_shift" in mapping else f"{field}.helix_angle",
                                g("profile_shift", g("helix_angle")), "only with module and teeth (a gear hub)"))
        if mapping.get("mesh_thrust") is not None and "module" not in mapping:
            errs.add(InputError(f"{field}.mesh_thrust", g("mesh_thrust"),
                                "only with module, teeth and helix_angle (a helical gear hub)"))

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
        if self.helix_angle or self.mesh_thrust != "add":  # stated wherever it acts (the report lists it)
            out["mesh_thrust"] = self.mesh_thrust
        out.update(self.shaft_loads.to_mapping())
        return out

    # ------------------------------------------------------------------ derived
    def mesh_axial_force(self) -> float:
        """Magnitude of the axial mesh force of a helical gear hub from ``torque`` [N] (0 without one).

        |F_a| = F_t·tan β with F_t = 2T/d and the reference (pitch) diameter d = m_n·z/cos β
        (:func:`fitcheck.shaft.mesh_forces`; Shigley, 10th ed., eqs. (13-39), (13-40) — from memory),
        from the joint's own ``torque`` (no application factor: the slip check's torque).

        >>> inp = PressFitInput(module=2.0, teeth=30, helix_angle=math.radians(20.0), torque=50e3)
        >>> round(inp.mesh_axial_force(), 1)      # d = 60/cos 20° = 63.851 mm, F_t = 1566.1 N
        570.0
        """
        if self.module is None or self.teeth is None or self.helix_angle == 0.0 or self.torque == 0.0:
            return 0.0
        fa = _shaft.mesh_forces(self.torque, self.module, self.teeth, helix_angle=self.helix_angle)[2]
        return abs(float(fa))

    def slip_axial_force(self) -> float:
        """The axial force the slip check holds [N]: ``axial_force`` plus, with ``mesh_thrust = 'add'``,
        the helical mesh's |F_a| (magnitudes add whatever the directions: the conservative side)."""
        return self.axial_force + (self.mesh_axial_force() if self.mesh_thrust == "add" else 0.0)

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
    from .. import fits  # imported here: the fits engine is a separate module

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


def _mesh_thrust(x, key):
    s = str(x).strip().lower()
    if isinstance(x, bool) or s not in MESH_THRUST:
        raise InputError(key, x, "'add' (the helical mesh's axial force on top of axial_force, default) or "
                         "'ignore' (axial_force already holds it)", did_you_mean(s, MESH_THRUST))
    return s


def _assembly(x, key):
    s = str(x).strip().lower()
    if s not in ASSEMBLIES:
        raise InputError(key, x, "'press' (longitudinal) or 'shrink' (transverse)",
                         did_you_mean(s, ASSEMBLIES))
    return s
