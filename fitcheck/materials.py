"""Materials: the table ``data/materials.csv`` and inline definitions.

A :class:`Material` holds plain floats in core units (MPa, 1/K, t/mm³, °C).
Look one up by name (case-insensitive, with a "did you mean" for a typo) or
build one inline from a mapping of quantities, as a case file does.
"""

from __future__ import annotations

import functools
import math
from collections.abc import Mapping
from dataclasses import dataclass, fields

from . import tables
from .errors import ErrorCollector, InputError, did_you_mean
from .units import number, temperature_c, to_core

TABLE = "materials.csv"


@dataclass(frozen=True)
class Material:
    """Elastic, thermal and strength properties of one material.

    Attributes
    ----------
    name : str
    group : str
        ``steel``, ``cast_iron``, ``sintered_steel``, ``aluminium``, ``copper_alloy``, ``plastic`` ...
    E : float
        Young's modulus [MPa]
    nu : float
        Poisson's ratio [-]
    alpha : float
        Linear expansion coefficient [1/K]
    Rp02 : float
        Yield (0.2 % proof) strength [MPa]
    Rm : float
        Tensile strength [MPa]
    density : float
        [t/mm³] (7.85e-9 for steel)
    max_heating_C : float
        Highest temperature the part may be heated to for shrink fitting [°C]
        (tempering / ageing / softening limit); NaN where none is given.
    pG : float
        Limiting surface pressure under a screw head or nut (VDI 2230) [MPa]; NaN if not given.
    tauB : float
        Shear strength, for thread stripping [MPa]; NaN if not given.
    source : str
    note : str
    sigma_zdW, sigma_bW, tau_tW : float
        Fatigue strengths (tension-compression, rotating bending, torsion) at the reference
        diameter ``dB`` of DIN 743-3:2012 [MPa]; NaN where not given (steels then use the
        standard's ratios to Rm, other materials are outside DIN 743).
    dB : float
        Reference diameter of Rp02, Rm and the fatigue strengths for DIN 743 [mm]; NaN if not given.
    din743_group : str
        Technological size group of DIN 743-2 (``QT``, ``case``, ``structural``); "" if none.
    fatigue_source : str
        Where the fatigue strengths come from.
    """

    name: str
    group: str
    E: float
    nu: float
    alpha: float
    Rp02: float
    Rm: float
    density: float
    max_heating_C: float = math.nan
    pG: float = math.nan
    tauB: float = math.nan
    source: str = "user input"
    note: str = ""
    sigma_zdW: float = math.nan
    sigma_bW: float = math.nan
    tau_tW: float = math.nan
    dB: float = math.nan
    din743_group: str = ""
    fatigue_source: str = ""

    @property
    def is_ductile(self) -> bool:
        return self.group not in ("cast_iron", "plastic") or "ductile" in self.name.lower()


def _f(row, col):
    v = row.get(col, "").strip()
    return float(v) if v else math.nan


@functools.cache
def _table() -> dict[str, Material]:
    out = {}
    for r in tables.read_rows(TABLE):
        m = Material(
            name=r["name"], group=r["group"], E=_f(r, "E_MPa"), nu=_f(r, "nu"),
            alpha=_f(r, "alpha_1e-6_per_K") * 1e-6, Rp02=_f(r, "Rp02_MPa"), Rm=_f(r, "Rm_MPa"),
            density=_f(r, "density_kg_m3") * 1e-12, max_heating_C=_f(r, "max_heating_C"),
            pG=_f(r, "pG_MPa"), tauB=_f(r, "tauB_MPa"), source=r["source"], note=r.get("note", ""),
            sigma_zdW=_f(r, "sigma_zdW_MPa"), sigma_bW=_f(r, "sigma_bW_MPa"), tau_tW=_f(r, "tau_tW_MPa"),
            dB=_f(r, "dB_mm"), din743_group=r.get("din743_group", "") or "",
            fatigue_source=r.get("fatigue_source", "") or "",
        )
        out[m.name.lower()] = m
    return out


def fatigue_mapping(m: Material) -> dict:
    """The DIN 743 fields of a material that are set, as inline keys (for lossless round trips).

    >>> fatigue_mapping(get("C45E"))["sigma_bW"]
    '350.0 MPa'
    """
    out: dict = {}
    for k in ("sigma_zdW", "sigma_bW", "tau_tW"):
        if not math.isnan(getattr(m, k)):
            out[k] = f"{getattr(m, k)!r} MPa"
    if not math.isnan(m.dB):
        out["dB"] = f"{m.dB!r} mm"
    for k in ("din743_group", "fatigue_source"):
        if getattr(m, k):
            out[k] = getattr(m, k)
    return out


def names() -> list[str]:
    """Names of all tabulated materials."""
    return [m.name for m in _table().values()]


def get(name: str, field: str = "material") -> Material:
    """A tabulated material by name (case-insensitive).

    >>> get("C45E").E
    210000.0
    >>> get("C45")
    Traceback (most recent call last):
    ...
    fitcheck.errors.InputError: material: got 'C45'; allowed: a material of data/materials.csv ... (did you mean 'C45E'...?)
    """
    key = str(name).strip().lower()
    try:
        return _table()[key]
    except KeyError:
        allowed = "a material of data/materials.csv or an inline table with E, nu, alpha, Rp02, Rm, density"
        raise InputError(field, name, allowed, did_you_mean(name, names())) from None


_INLINE_KEYS = {
    "name": None, "group": None, "E": "stress", "nu": "nu", "alpha": "expansion", "Rp02": "stress",
    "Rm": "stress", "density": "density", "max_heating": "temp", "pG": "stress", "tauB": "stress",
    "source": None, "note": None,
    "sigma_zdW": "stress", "sigma_bW": "stress", "tau_tW": "stress", "dB": "length",
    "din743_group": None, "fatigue_source": None,
}


def from_mapping(d: Mapping, field: str = "material") -> Material:
    """A material from a name or from an inline mapping of quantities.

    An inline mapping may start from a tabulated material (``base = "C45E"``)
    and override single properties.

    >>> from_mapping({"base": "C45E", "Rp02": "500 MPa"}).Rp02
    500.0
    >>> round(from_mapping({"name": "mine", "E": "70 GPa", "nu": 0.33, "alpha": "23e-6 1/K",
    ...     "Rp02": "250 MPa", "Rm": "300 MPa", "density": "2700 kg/m**3"}).E)
    70000
    """
    if isinstance(d, str):
        return get(d, field)
    if isinstance(d, Material):
        return d
    if not isinstance(d, Mapping):
        raise InputError(field, d, "a material name or a table of properties")
    errs = ErrorCollector()
    base = None
    if "base" in d:
        with errs.field(field):
            base = get(d["base"], "base")
    vals: dict = {} if base is None else {f.name: getattr(base, f.name) for f in fields(Material)}
    if base is not None:
        vals["name"] = d.get("name", f"{base.name} (modified)")
        vals["source"] = d.get("source", f"{base.source}; modified by user")
        if ("Rm" in d or "Rp02" in d) and not any(k in d for k in ("sigma_zdW", "sigma_bW", "tau_tW")):
            # tabulated fatigue strengths belong to the tabulated Rm: fall back to DIN 743-3 ratios
            vals.update(sigma_zdW=math.nan, sigma_bW=math.nan, tau_tW=math.nan,
                        fatigue_source="DIN 743-3:2012 ratios to Rm (base strength changed)")
    for key, v in d.items():
        if key == "base":
            continue
        if key not in _INLINE_KEYS:
            errs.add(InputError(f"{field}.{key}", v, "one of " + ", ".join(_INLINE_KEYS) + ", base",
                                did_you_mean(key, _INLINE_KEYS)))
            continue
        kind = _INLINE_KEYS[key]
        with errs.field(field):
            if kind is None:
                vals[key] = str(v)
            elif kind == "nu":
                vals["nu"] = number(v, "nu", lo=0.0, hi=0.5, hi_open=True)
            elif kind == "temp":
                vals["max_heating_C"] = temperature_c(v, "max_heating")
            elif kind == "expansion":
                vals["alpha"] = to_core(v, "expansion", "alpha", lo=-5e-5, hi=5e-4)
            else:
                vals[key] = to_core(v, kind, key, lo=0.0, lo_open=True)
    vals.setdefault("name", "inline material")
    vals.setdefault("group", "user")
    for req in ("E", "nu", "alpha", "Rp02", "Rm", "density"):
        if req not in vals:
            errs.add(InputError(f"{field}.{req}", None, "a value (required for an inline material)"))
    errs.raise_if_any()
    return Material(**vals)
