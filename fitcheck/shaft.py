"""The shaft at a seat: fatigue and yield at the edge of a pressed hub or bearing ring (DIN 743).

A pressed gear hub or bearing inner ring notches the shaft at the hub edge, where micro-slip
and fretting start fatigue cracks. This module checks that section for every
``[[pressfit]]`` and ``[[bearing]]`` seat after DIN 743-1/-2/-3:2012; the press-fit and
bearing analyses call :func:`evaluate_seat` and append its two checks,
"shaft fatigue at the hub edge" and "shaft yield at the hub edge".

Loads at the seat (keys appended to both tables, see :data:`PRESSFIT_KEYS`,
:data:`BEARING_KEYS`): a rotating bending moment (fully reversed in the rotating shaft), the
torque (static, pulsating or alternating), a static axial force and an application factor;
for a gear seat the bending moment may instead be derived from the mesh forces
(:func:`mesh_forces`, :func:`seat_moment`).

>>> from fitcheck import materials
>>> r = evaluate_seat(d=20.0, di=0.0, material=materials.get("C45E"), rz_um=4.0,
...                   loads=ShaftLoads(bending_moment=20_000.0, torque_type="static"),
...                   torque=20_000.0, axial_force=0.0, temperature=20.0, what="gear hub")
>>> round(r.notch_factor_bending, 2), round(r.fatigue_safety, 2), r.checks[0].name
(2.25, 4.91, 'shaft fatigue at the hub edge')
"""

from __future__ import annotations

import math
from collections.abc import Mapping
from dataclasses import asdict, dataclass, fields

import numpy as np

from .checks import Check
from .core import din743
from .errors import ErrorCollector, InputError, did_you_mean
from .materials import Material
from .units import number, to_core

__all__ = ["BEARING_KEYS", "METHOD_NOTES", "PRESSFIT_KEYS", "ShaftLoads", "ShaftSeatResult",
           "TORQUE_TYPES", "evaluate_seat", "headline_sentence", "is_shaft_check", "json_fields",
           "mesh_forces", "seat_moment"]

TORQUE_TYPES = ("static", "pulsating", "alternating")
NAME_FATIGUE = "shaft fatigue at the hub edge"
NAME_YIELD = "shaft yield at the hub edge"
REF_FATIGUE = ("DIN 743-1:2012 (safety against fatigue, equivalent mean stress, ψ); DIN 743-2:2012 "
               "(press-fit notch factors, K1, K2, K3, K_F, K_V); DIN 743-3:2012 (strengths)")
REF_YIELD = "DIN 743-1:2012 (static proof against permanent deformation); DIN 743-2:2012 (K1, K2F)"
DEFAULT_MIN_SAFETY = 1.2  # DIN 743-1:2012, minimum safety S_min — from memory

_COMMON_KEYS: dict[str, str] = {
    "bending_moment": "bending moment in the shaft at the hub edge, rotating with the shaft so fully "
                      "reversed, e.g. '12 N*m' (default 0; or derived from the gear mesh)",
    "torque_type": "how the torque varies: 'static', 'pulsating' (0 … T) or 'alternating' (−T … T) "
                   "(default alternating, the conservative end)",
    "application_factor": "application factor K_A on every shaft load (default 1.0)",
    "fatigue_safety": "required safety of the shaft against fatigue at the hub edge, DIN 743 (default 1.2)",
    "static_safety": "required safety of the shaft against yield at the hub edge, DIN 743 (default 1.2)",
    "surface_hardening_factor": "surface-hardening factor K_V of the shaft seat, DIN 743-2 (default 1.0, none)",
    "mean_stress_case": "DIN 743-1 mean-stress case: 2 = mean and amplitude grow together (default, "
                        "conservative), 1 = constant mean stress",
}
#: Keys this module adds to ``[[pressfit]]``.
PRESSFIT_KEYS: dict[str, str] = {
    **_COMMON_KEYS,
    "pressure_angle": "normal pressure angle of the gear, for the mesh forces (default 20 deg)",
    "helix_angle": "helix angle β of the gear (default 0 deg, spur), with module (normal module) and teeth: "
                   "the hub's root diameter and the mesh forces",
    "bearing_distance_a": "axial distance from the gear mid-plane to one bearing, e.g. '12 mm' "
                          "(with bearing_distance_b: bending moment from the mesh forces)",
    "bearing_distance_b": "axial distance from the gear mid-plane to the other bearing, e.g. '40 mm'",
    "overhang": "overhung gear: axial distance from the gear mid-plane to the hub edge on the bearing "
                "side, e.g. '7 mm' (bending moment from the mesh forces)",
}
#: Keys this module adds to ``[[bearing]]`` (``torque`` too; ``axial_force`` is the bearing's own).
BEARING_KEYS: dict[str, str] = {
    "torque": "torque in the shaft at the seat, e.g. '5 N*m' (default 0)",
    **_COMMON_KEYS,
}

#: (step, clause) of the shaft check, printed in reports.
METHOD_NOTES: list[tuple[str, str]] = [
    ("Shaft at the hub edge: nominal stresses σ_b = K_A·M/W_b (rotating bending, fully reversed), "
     "τ_t = K_A·T/W_t split into mean and amplitude by the torque type, σ_zd = K_A·F/A (static)",
     "DIN 743-1:2012, nominal stresses"),
    ("Gear seats: F_t = 2T/d, F_r = F_t·tan α_n/cos β, F_a = F_t·tan β with d = m_n·z/cos β; bending "
     "moment at the gear mid-plane of a shaft on two supports (or at the hub edge of an overhung "
     "gear), the axial force's couple added on the unfavourable side",
     "Shigley, 10th ed., eqs. (13-36) to (13-40); beam on two supports"),
    ("Fatigue strengths at the reference diameter: table values or σ_zdW = 0.4·σ_B, σ_bW = 0.5·σ_B, "
     "τ_tW = 0.3·σ_B", "DIN 743-3:2012 — from memory"),
    ("Technological size factor K1(d_eff) for σ_B and σ_S by steel group",
     "DIN 743-2:2012 — from memory"),
    ("Notch factors of the press fit at d_BK = 40 mm: βσ = 2.7·(σ_B(d)/1000)^0.43, βτ = 0.65·βσ; "
     "converted to the seat diameter with K3 (β(d_BK) in place of α)", "DIN 743-2:2012 — from memory"),
    ("Geometric size factor K2(d), roughness factor K_F from the seat's Rz, surface hardening K_V; "
     "Kσ = (βσ/K2 + 1/K_Fσ − 1)/K_V, Kτ likewise", "DIN 743-2:2012 — from memory"),
    ("Component fatigue limits σ_WK = σ_W(d_B)·K1/Kσ; ψ_K = σ_WK/(2·K1·σ_B − σ_WK); equivalent mean "
     "stress σ_mv = √((σ_zdm + σ_bm)² + 3τ_tm²); amplitude strengths σ_ADK (case 2 unless set)",
     "DIN 743-1:2012 — from memory"),
    ("Safety against fatigue S = 1/√((σ_zda/σ_zdADK + σ_ba/σ_bADK)² + (τ_ta/τ_tADK)²) ≥ S_min",
     "DIN 743-1:2012 — from memory"),
    ("Safety against yield with σ_bFK = K1·K2F·σ_S (K2F = 1.2 solid, 1.0 hollow; γF = 1), "
     "τ_tFK = σ_bFK/√3, at the largest loads", "DIN 743-1:2012 — from memory"),
    ("The notch factors assume a conventional press fit with the hub flush with the shaft step (or on "
     "a plain shaft); relief grooves, a hub overhanging the seat or a softer hub edge lower the notch, "
     "a fillet or groove under the hub edge adds its own; none of these is modelled",
     "DIN 743-2:2012, notes to the notch factors of press fits — from memory"),
]

ASSUMPTIONS = ("DIN 743 press-fit notch factors: a conventional press fit, hub flush with the shaft "
               "step (or on a plain shaft); relief grooves, a hub overhanging the seat or a softer "
               "hub edge lower the notch, a fillet or groove under the hub edge is a notch of its "
               "own — none of these is modelled")


@dataclass(frozen=True)
class ShaftLoads:
    """Shaft loads at a seat beyond the joint's own torque and axial force (core units).

    ``bending_moment`` [N·mm] (``None`` = not given), angles [rad], distances [mm].
    ``torque`` [N·mm] is used by bearing seats only (a press fit has its own ``torque``).
    """

    bending_moment: float | None = None
    torque_type: str = "alternating"
    application_factor: float = 1.0
    fatigue_safety: float = DEFAULT_MIN_SAFETY
    static_safety: float = DEFAULT_MIN_SAFETY
    surface_hardening_factor: float = 1.0
    mean_stress_case: int = 2
    pressure_angle: float = math.radians(20.0)
    helix_angle: float = 0.0
    bearing_distance_a: float | None = None
    bearing_distance_b: float | None = None
    overhang: float | None = None
    torque: float | None = None

    @classmethod
    def from_mapping(cls, mapping: Mapping, field: str, errs: ErrorCollector,
                     keys: Mapping[str, str]) -> ShaftLoads:
        """Parse this module's ``keys`` of a joint table; problems go to ``errs``."""
        v: dict = {}

        def parse(key, fn):
            if key in keys and key in mapping and mapping[key] is not None:
                with errs.field(field):
                    v[key] = fn(mapping[key], key)

        parse("bending_moment", lambda x, k: to_core(x, "torque", k, lo=0.0, hi=1e12))
        parse("torque", lambda x, k: to_core(x, "torque", k, lo=0.0, hi=1e12))
        parse("torque_type", _torque_type)
        parse("application_factor", lambda x, k: number(x, k, lo=1.0, hi=10.0))
        parse("fatigue_safety", lambda x, k: number(x, k, lo=1.0, hi=20.0))
        parse("static_safety", lambda x, k: number(x, k, lo=1.0, hi=20.0))
        parse("surface_hardening_factor", lambda x, k: number(x, k, lo=0.5, hi=3.0))
        parse("mean_stress_case", _case)
        parse("pressure_angle", lambda x, k: to_core(x, "angle", k, lo=math.radians(10.0),
                                                      hi=math.radians(35.0)))
        parse("helix_angle", lambda x, k: to_core(x, "angle", k, lo=0.0, hi=math.radians(45.0)))
        for k in ("bearing_distance_a", "bearing_distance_b", "overhang"):
            parse(k, lambda x, kk: to_core(x, "length", kk, lo=0.0, lo_open=True, hi=10_000.0))
        has_ab = [mapping.get(k) is not None for k in ("bearing_distance_a", "bearing_distance_b")]
        if any(has_ab) and not all(has_ab):
            missing = "bearing_distance_b" if has_ab[0] else "bearing_distance_a"
            errs.add(InputError(f"{field}.{missing}", None, "a value (both bearing distances go together)"))
        derive = any(has_ab) or "overhang" in mapping
        if any(has_ab) and "overhang" in mapping:
            errs.add(InputError(f"{field}.overhang", mapping["overhang"],
                                "either the two bearing distances or an overhang, not both"))
        if derive and "bending_moment" in mapping:
            errs.add(InputError(f"{field}.bending_moment", mapping["bending_moment"],
                                "either a bending moment or the gear's bearing distances / overhang, not both"))
        if derive and not ("module" in mapping and "teeth" in mapping):
            errs.add(InputError(f"{field}.module", mapping.get("module"),
                                "module and teeth of the gear (needed to derive the mesh forces)"))
        return cls(**v)

    def to_mapping(self) -> dict:
        """The keys that differ from the defaults, as strings with units (lossless)."""
        out: dict = {}
        for f in fields(self):
            val = getattr(self, f.name)
            if val is None or val == f.default:
                continue
            if f.name in ("bending_moment", "torque"):
                out[f.name] = f"{val!r} N*mm"
            elif f.name in ("pressure_angle", "helix_angle"):
                out[f.name] = f"{val!r} rad"
            elif f.name in ("bearing_distance_a", "bearing_distance_b", "overhang"):
                out[f.name] = f"{val!r} mm"
            else:
                out[f.name] = val
        return out


def _torque_type(x, key):
    s = str(x).strip().lower()
    if s not in TORQUE_TYPES:
        raise InputError(key, x, "'static', 'pulsating' or 'alternating'", did_you_mean(s, TORQUE_TYPES))
    return s


def _case(x, key):
    if isinstance(x, bool) or str(x).strip() not in ("1", "2", "1.0", "2.0"):
        raise InputError(key, x, "1 (constant mean stress) or 2 (mean and amplitude in proportion)")
    return int(float(str(x)))


_PRESSURE_ANGLE_20 = math.radians(20.0)   # standard pressure angle (ISO 53)


def mesh_forces(torque, module, teeth, pressure_angle=_PRESSURE_ANGLE_20, helix_angle=0.0):
    r"""Tangential, radial and axial mesh forces of a spur or helical gear [N].

    Parameters
    ----------
    torque : float or ndarray
        Torque on the gear [N·mm]
    module : float or ndarray
        Normal module m_n [mm]
    teeth : int or ndarray
        Number of teeth z
    pressure_angle, helix_angle : float or ndarray
        Normal pressure angle α_n and helix angle β [rad]

    Returns
    -------
    F_t, F_r, F_a, d : ndarray
        Forces [N] and the pitch diameter d = m_n·z/cos β [mm].

    Notes
    -----
    .. math:: F_t = 2T/d,\quad F_r = F_t\tan\alpha_n/\cos\beta,\quad F_a = F_t\tan\beta

    Examples
    --------
    >>> [round(float(x), 2) for x in mesh_forces(20_000.0, 2.0, 20)]
    [1000.0, 363.97, 0.0, 40.0]

    References
    ----------
    Shigley, Mechanical Engineering Design, 10th ed., eqs. (13-36) (spur) and (13-39), (13-40) (helical).
    """
    cb = np.cos(helix_angle)
    d = np.asarray(module, dtype=float) * np.asarray(teeth, dtype=float) / cb
    ft = 2.0 * np.asarray(torque, dtype=float) / d
    return ft, ft * np.tan(pressure_angle) / cb, ft * np.tan(helix_angle), d


def seat_moment(F_t, F_r, F_a, d, a=None, b=None, overhang=None):
    r"""Resultant bending moment at the gear seat [N·mm] from its mesh forces.

    Parameters
    ----------
    F_t, F_r, F_a : float or ndarray
        Tangential, radial and axial mesh force [N]
    d : float or ndarray
        Pitch diameter [mm] (the axial force acts at d/2)
    a, b : float or ndarray, optional
        Distances from the gear mid-plane to the two bearings [mm] (shaft on two supports)
    overhang : float or ndarray, optional
        Overhung gear: distance from the gear mid-plane to the section checked [mm]

    Notes
    -----
    Two supports, span L = a + b; the moment at the gear mid-plane, the couple
    M_a = F_a·d/2 put on the unfavourable side (its sign depends on hand and direction):

    .. math:: M_r = \frac{F_r\,a\,b + M_a\max(a,b)}{L},\quad M_t = \frac{F_t\,a\,b}{L},\quad
              M = \sqrt{M_r^2 + M_t^2}

    Overhung: M = √((F_r·e + M_a)² + (F_t·e)²) with e the overhang.

    Examples
    --------
    >>> round(float(seat_moment(1000.0, 364.0, 0.0, 40.0, a=20.0, b=20.0)), 1)
    10641.9
    """
    M_a = np.asarray(F_a, dtype=float) * np.asarray(d, dtype=float) / 2.0
    if overhang is not None:
        e = np.asarray(overhang, dtype=float)
        return np.hypot(F_r * e + M_a, F_t * e)
    a = np.asarray(a, dtype=float)
    b = np.asarray(b, dtype=float)
    L = a + b
    return np.hypot((F_r * a * b + M_a * np.maximum(a, b)) / L, F_t * a * b / L)


@dataclass(frozen=True)
class ShaftSeatResult:
    """The shaft at one seat: loads used, DIN 743 factors, safeties and the two checks.

    Moments and torques [N·mm], forces [N], stresses [MPa], lengths [mm], factors [-].
    ``applicable`` is False for a shaft DIN 743 does not cover (then the safeties are NaN).
    """

    what: str
    diameter: float
    bore: float
    material: str
    applicable: bool
    load_source: str
    bending_moment: float
    torque: float
    torque_type: str
    axial_force: float
    application_factor: float
    mesh_tangential: float
    mesh_radial: float
    mesh_axial: float
    pitch_diameter: float
    din743_group: str
    sigma_B_dB: float
    sigma_S_dB: float
    sigma_bW_dB: float
    tau_tW_dB: float
    strength_source: str
    factors: dict
    fatigue_safety: float
    static_safety: float
    fatigue_safety_required: float
    static_safety_required: float
    mean_stress_case: int
    checks: tuple[Check, ...]
    notes: tuple[str, ...]
    warnings: tuple[str, ...] = ()

    @property
    def notch_factor_bending(self) -> float:
        return float(self.factors.get("beta_sigma", math.nan))

    @property
    def notch_factor_torsion(self) -> float:
        return float(self.factors.get("beta_tau", math.nan))

    def loads(self) -> list[tuple[str, float, str]]:
        """Every load used, as (name, value, kind of quantity) for reports and pages."""
        rows = [("bending moment M (rotating)", self.bending_moment, "torque"),
                (f"torque T ({self.torque_type})", self.torque, "torque"),
                ("axial force F (static)", self.axial_force, "force"),
                ("application factor K_A", self.application_factor, "dimensionless")]
        if self.load_source.startswith("gear"):
            rows += [("mesh force F_t", self.mesh_tangential, "force"),
                     ("mesh force F_r", self.mesh_radial, "force"),
                     ("mesh force F_a", self.mesh_axial, "force"),
                     ("pitch diameter d", self.pitch_diameter, "length")]
        return rows

    def to_dict(self) -> dict:
        d = asdict(self)
        d["checks"] = [c.to_dict() for c in self.checks]
        d["notch_factor_bending"] = self.notch_factor_bending
        d["notch_factor_torsion"] = self.notch_factor_torsion
        return d


def json_fields(res: ShaftSeatResult | None) -> dict:
    """The keys ``--json`` of a press fit or bearing seat gains (``None`` when not evaluated)."""
    if res is None:
        return {"shaft_fatigue_safety": None, "shaft_static_safety": None,
                "notch_factor_bending": None, "notch_factor_torsion": None, "shaft_seat": None}

    def clean(x):
        if isinstance(x, float):
            return x if math.isfinite(x) else None
        if isinstance(x, dict):
            return {k: clean(v) for k, v in x.items()}
        if isinstance(x, list | tuple):
            return [clean(v) for v in x]
        return x

    return clean({"shaft_fatigue_safety": res.fatigue_safety, "shaft_static_safety": res.static_safety,
                  "notch_factor_bending": res.notch_factor_bending,
                  "notch_factor_torsion": res.notch_factor_torsion, "shaft_seat": res.to_dict()})


def is_shaft_check(check: Check) -> bool:
    """True for the two checks this module adds ("shaft fatigue/yield at the hub edge")."""
    return check.name in (NAME_FATIGUE, NAME_YIELD)


def headline_sentence(check: Check) -> str:
    """The verdict's sentence for a failing shaft check: what fails, by how much, and what helps
    ("" for the yield check of a shaft DIN 743 does not cover: the fatigue check's sentence says it).

    >>> c = Check(NAME_FATIGUE, 0.9, 1.2, ">=", "", REF_FATIGUE, "")
    >>> headline_sentence(c)[:63]
    'Shaft fatigue at the hub edge: safety 0.9 < 1.2 required (DIN 7'
    """
    if not math.isfinite(check.value):  # both checks refused: one sentence, on the fatigue check
        return ("" if check.name == NAME_YIELD else
                "The shaft at the hub edge is not checked for fatigue and yield (the shaft material is "
                "outside DIN 743). Next: a steel shaft, or the shaft material's fatigue strengths "
                "(sigma_bW, tau_tW, sigma_zdW) inline")
    if check.name == NAME_FATIGUE:
        return (f"Shaft fatigue at the hub edge: safety {check.value:.4g} < {check.limit:g} required "
                "(DIN 743). Next: a larger shaft diameter, a stronger or surface-hardened shaft seat "
                "(surface_hardening_factor), a smaller bending moment at the seat (supports closer to "
                "the load) or a smaller load")
    return (f"Shaft yield at the hub edge under the largest loads: safety {check.value:.4g} < "
            f"{check.limit:g} required (DIN 743). Next: a larger or stronger shaft, or a smaller peak load")


def _applies(m: Material) -> bool:
    return m.group == "steel" or not math.isnan(m.sigma_bW)


def evaluate_seat(*, d: float, di: float, material: Material, rz_um: float, loads: ShaftLoads,
                  torque: float, axial_force: float, temperature: float, what: str,
                  module: float | None = None, teeth: int | None = None,
                  add_mesh_thrust: bool = True) -> ShaftSeatResult:
    """DIN 743 fatigue and static safety of the shaft at one seat (scalar inputs, core units).

    Parameters
    ----------
    d, di : float
        Seat diameter and shaft bore [mm]
    material : Material
        Shaft material
    rz_um : float
        Roughness Rz of the shaft seat [µm]
    loads : ShaftLoads
        Bending moment or gear geometry, torque type, K_A, required safeties
    torque, axial_force : float
        The seat's torque [N·mm] and static axial force [N]
    temperature : float
        Shaft temperature in operation [°C] (for the validity warning)
    what : str
        "gear hub", "bearing ring" ... for the notes
    module, teeth : optional
        Gear data (normal module [mm], teeth) for deriving the mesh forces
    add_mesh_thrust : bool
        Whether the axial mesh force F_a derived from the gear data is added to ``axial_force``
        (default, the conservative side); False when ``axial_force`` already holds it (a press
        fit's ``mesh_thrust = 'ignore'``). Its couple F_a·d/2 in the bending moment stays either way.
    """
    KA = loads.application_factor
    T = KA * torque
    notes: list[str] = []
    warns: list[str] = []
    ft = fr = fa = dw = 0.0
    if loads.bending_moment is not None:
        M, source = KA * loads.bending_moment, "given"
    elif module is not None and teeth is not None and (
            (loads.bearing_distance_a is not None and loads.bearing_distance_b is not None)
            or loads.overhang is not None):
        ft, fr, fa, dw = (float(x) for x in mesh_forces(T, module, teeth, loads.pressure_angle,
                                                        loads.helix_angle))
        if loads.overhang is not None:
            M = float(seat_moment(ft, fr, fa, dw, overhang=loads.overhang))
            source = f"gear mesh, overhung (lever {loads.overhang:g} mm)"
        else:
            M = float(seat_moment(ft, fr, fa, dw, loads.bearing_distance_a, loads.bearing_distance_b))
            source = (f"gear mesh, two supports (a = {loads.bearing_distance_a:g} mm, "
                      f"b = {loads.bearing_distance_b:g} mm)")
        if fa > 0 and add_mesh_thrust:
            notes.append(f"the axial mesh force F_a = {fa:.4g} N is added to the shaft's static axial force "
                         "for the shaft check")
        elif fa > 0:
            notes.append(f"the axial mesh force F_a = {fa:.4g} N is taken as part of the given axial force "
                         "(mesh_thrust = 'ignore'); its couple F_a·d/2 is in the bending moment")
    else:
        M, source = 0.0, "none given"
        if module is not None and teeth is not None and torque > 0:
            warns.append("gear hub (module and teeth) without bending_moment, bearing distances or overhang: "
                         "the shaft check at the hub edge takes no bending moment, although the mesh forces "
                         "of a loaded gear always bend its seat; give bearing_distance_a and "
                         "bearing_distance_b (or overhang) to derive it, or bending_moment")
    F = KA * axial_force + (fa if add_mesh_thrust else 0.0)
    tt = loads.torque_type
    t_mean = {"static": T, "pulsating": T / 2.0, "alternating": 0.0}[tt]
    t_amp = T - t_mean

    m = material
    group = m.din743_group or "case"
    if not _applies(m):
        chk = (Check(NAME_FATIGUE, math.nan, loads.fatigue_safety, ">=", "", REF_FATIGUE,
                     f"not checked: DIN 743 covers steel shafts; {m.name} is {m.group} — give the "
                     "shaft material's fatigue strengths (sigma_bW, tau_tW, sigma_zdW) inline"),
               Check(NAME_YIELD, math.nan, loads.static_safety, ">=", "", REF_YIELD,
                     f"not checked: DIN 743 covers steel shafts; {m.name} is {m.group}"))
        warns.append(f"shaft material {m.name} ({m.group}) is outside DIN 743: the shaft at the "
                     f"{what} edge is not checked (the two shaft checks fail)")
        return ShaftSeatResult(
            what=what, diameter=d, bore=di, material=m.name, applicable=False, load_source=source,
            bending_moment=M, torque=T, torque_type=tt, axial_force=F, application_factor=KA,
            mesh_tangential=ft, mesh_radial=fr, mesh_axial=fa, pitch_diameter=dw, din743_group="",
            sigma_B_dB=m.Rm, sigma_S_dB=m.Rp02, sigma_bW_dB=math.nan, tau_tW_dB=math.nan,
            strength_source="", factors={}, fatigue_safety=math.nan, static_safety=math.nan,
            fatigue_safety_required=loads.fatigue_safety, static_safety_required=loads.static_safety,
            mean_stress_case=loads.mean_stress_case, checks=chk, notes=(ASSUMPTIONS,), warnings=tuple(warns))

    tab = not math.isnan(m.sigma_bW)
    s_zdW = m.sigma_zdW if not math.isnan(m.sigma_zdW) else din743.RATIO_SIGMA_ZDW * m.Rm
    s_bW = m.sigma_bW if tab else din743.RATIO_SIGMA_BW * m.Rm
    t_tW = m.tau_tW if not math.isnan(m.tau_tW) else din743.RATIO_TAU_TW * m.Rm
    src = (m.fatigue_source or "material table") if tab else \
        "DIN 743-3:2012 ratios 0.4/0.5/0.3 of Rm (from memory)"
    dB = m.dB if not math.isnan(m.dB) else 16.0
    r = din743.press_fit_seat(
        d=d, di=di, sigma_B_dB=m.Rm, sigma_S_dB=m.Rp02, sigma_zdW_dB=s_zdW, sigma_bW_dB=s_bW,
        tau_tW_dB=t_tW, group=group, d_B=dB, rz_um=rz_um, k_v=loads.surface_hardening_factor,
        moment_amplitude=M, torque_mean=t_mean, torque_amplitude=t_amp, axial_mean=F,
        moment_max=M, torque_max=T, axial_max=F, mean_stress_case=loads.mean_stress_case)
    fac = {k: float(v) for k, v in r.items()}
    Sf, Ss = fac.pop("fatigue_safety"), fac.pop("static_safety")
    if not m.din743_group:
        notes.append(f"{m.name} has no DIN 743 steel group in data/materials.csv: K1 of case-hardening "
                     "steels (the steepest size curve) is used")
    bad = {k: bool(v) for k, v in din743.validity(d, m.Rm, temperature).items()}
    if bad["diameter"]:
        warns.append(f"seat diameter {d:g} mm outside 7.5 … 150 mm: DIN 743-2's size factors are taken "
                     "at the nearer end of their range")
    if bad["strength"]:
        warns.append(f"tensile strength {m.Rm:g} MPa of {m.name} outside about 400 … 1200 MPa, the range "
                     "behind DIN 743-2's press-fit notch factors (from memory)")
    if bad["temperature"]:
        warns.append(f"shaft temperature {temperature:g} degC outside DIN 743's −40 … 150 degC (from memory)")
    if m.group != "steel":
        warns.append(f"shaft material {m.name} ({m.group}): DIN 743 is written for steels; "
                     "the given fatigue strengths are used as they are")
    load_txt = (f"M = {M / 1000:.4g} N·m ({source}), T = {T / 1000:.4g} N·m {tt}, F = {F:.4g} N"
                + (f", K_A = {KA:g}" if KA != 1 else ""))
    mesh_txt = (f"; mesh forces F_t = {ft:.4g} N, F_r = {fr:.4g} N, F_a = {fa:.4g} N at d = {dw:.4g} mm"
                if source.startswith("gear") else "")
    notes.append(f"shaft loads at the {what} edge (DIN 743): {load_txt}{mesh_txt}")
    notes.append(ASSUMPTIONS)
    f_note = (f"βσ = {fac['beta_sigma']:.3g}, βτ = {fac['beta_tau']:.3g}, K2 = {fac['K2']:.3g}, "
              f"K_Fσ = {fac['KF_sigma']:.3g}, K1 = {fac['K1']:.3g}, Kσ = {fac['K_sigma_b']:.3g}, "
              f"Kτ = {fac['K_tau']:.3g}, σ_bWK = {fac['sigma_bWK']:.4g} MPa, τ_tWK = {fac['tau_tWK']:.4g} MPa; "
              f"{load_txt}; mean-stress case {loads.mean_stress_case}")
    chk = (Check(NAME_FATIGUE, Sf, loads.fatigue_safety, ">=", "", REF_FATIGUE, f"{what} seat: {f_note}"),
           Check(NAME_YIELD, Ss, loads.static_safety, ">=", "", REF_YIELD,
                 f"{what} seat: σ_bFK = {fac['sigma_bFK']:.4g} MPa, τ_tFK = {fac['tau_tFK']:.4g} MPa "
                 f"at the largest loads; {load_txt}"))
    return ShaftSeatResult(
        what=what, diameter=d, bore=di, material=m.name, applicable=True, load_source=source,
        bending_moment=M, torque=T, torque_type=tt, axial_force=F, application_factor=KA,
        mesh_tangential=ft, mesh_radial=fr, mesh_axial=fa, pitch_diameter=dw, din743_group=group,
        sigma_B_dB=m.Rm, sigma_S_dB=m.Rp02, sigma_bW_dB=s_bW, tau_tW_dB=t_tW, strength_source=src,
        factors=fac, fatigue_safety=Sf, static_safety=Ss,
        fatigue_safety_required=loads.fatigue_safety, static_safety_required=loads.static_safety,
        mean_stress_case=loads.mean_stress_case, checks=chk, notes=tuple(notes), warnings=tuple(warns))

