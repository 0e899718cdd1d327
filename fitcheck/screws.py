"""Housing screws: preload, tightening torque and the checks of a bolted joint (VDI 2230 Part 1:2015).

A cover or flange clamped to a (light-alloy) housing by a few screws. The input is a
:class:`ScrewJointInput` (from a ``[[screws]]`` case-file table or built in code); :func:`evaluate`
returns a :class:`ScrewJointResult` of plain floats in core units (mm, N, MPa, N·mm) with its
:class:`~fitcheck.checks.Check` list:

* assembly preload: the largest preload αA·F_M,min must not exceed F_M,zul (ν·Rp0.2 under tension
  and torsion);
* working stress under the operating load (yield safety ≥ 1);
* residual clamp load against separation (and a required clamp load) and against transverse slip;
* surface pressure under the head (and nut) against the clamped material's limiting pressure p_G;
* length of engagement in a tapped housing (the screw must break before the internal thread strips);
* fatigue of the thread under the alternating share of the axial load.

The screw pattern (count on a bolt circle, or given positions) distributes axial force, tilting
moment, transverse force and torque about the axis; the most loaded screw is checked.

>>> inp = ScrewJointInput.from_mapping({"thread": "M6", "property_class": "8.8", "head": "socket",
...     "layers": [{"thickness": "8 mm", "material": "EN AW-6082-T6"}], "engagement": "12 mm",
...     "housing_material": "EN AC-46000", "count": 6, "bolt_circle": "80 mm",
...     "axial_force": "3 kN", "mu_thread": [0.10, 0.16], "mu_head": [0.10, 0.16],
...     "tightening": "torque_wrench_estimated_friction"})
>>> r = evaluate(inp)
>>> round(r.tightening_torque / 1000, 1)   # N·m
9.1
>>> r.ok
True
"""

from __future__ import annotations

import json
import math
import warnings
from collections.abc import Mapping
from dataclasses import dataclass, field, fields

import numpy as np

from . import materials, threads
from .checks import Check, all_passed
from .core import vdi2230 as core
from .core import vdi2230_eccentric as ecc
from .errors import ErrorCollector, InputError, MethodRangeWarning, did_you_mean
from .materials import Material
from .units import number, temperature_c, to_core

__all__ = ["KEYS", "METHOD_NOTES", "Layer", "ScrewJointInput", "ScrewJointResult", "evaluate",
           "MU_RANGE"]

#: Plausible range of thread and head friction coefficients accepted as input.
MU_RANGE = (0.04, 0.5)

#: Keys of a ``[[screws]]`` table and what each means (with its unit).
KEYS: dict[str, str] = {
    "name": "name of the joint (text)",
    "thread": "thread designation: 'M6', 'M8x1', '#10-24 UNC', '1/4-20 UNC' (ISO 261 / ASME B1.1)",
    "property_class": "property class or grade: 4.6 … 12.9 (ISO 898-1), A2-70, A4-70, A4-80 (ISO 3506-1), "
                      "'SAE 2', 'SAE 5', 'SAE 8' (SAE J429)",
    "head": "head type: hex (ISO 4017), socket (ISO 4762), pan (ISO 7045), button (ISO 7380-1), "
            "countersunk (ISO 10642); default hex",
    "hole": "clearance hole: fine, medium, coarse (ISO 273) or a diameter such as '6.6 mm'; default medium",
    "washer": "plain washer under the head (ISO 7089 with hex heads, ISO 7092 otherwise): true/false; default false",
    "joint": "'tapped' (screw in a tapped housing, VDI ESV) or 'through' (bolt and nut, DSV); default tapped",
    "layers": "clamped parts from the head down: array of {thickness = '8 mm', material = 'EN AW-6082-T6'} "
              "(material: a name of data/materials.csv or an inline table)",
    "engagement": "length of thread engagement in the tapped housing [length]; required for joint = 'tapped'",
    "housing_material": "material of the tapped housing (name or inline table); required for joint = 'tapped'",
    "count": "number of screws in the pattern; default 1",
    "bolt_circle": "diameter of the bolt circle [length]; screws evenly spaced",
    "positions": "screw positions as [[x, y], …] [length], instead of bolt_circle",
    "axial_force": "axial operating force on the whole joint, separating the parts [force]; default 0",
    "tilting_moment": "tilting moment about an axis in the joint plane [moment]; default 0",
    "transverse_force": "transverse (shear) force on the whole joint [force]; default 0",
    "torque_about_axis": "torque about the pattern's axis, carried by friction [torque]; default 0",
    "clamp_force_required": "clamp load each screw must keep, e.g. for sealing [force]; default 0",
    "mu_thread": "thread friction μG as [min, max] or a friction class letter A…E (VDI 2230 Table A5); default 'B'",
    "mu_head": "head bearing-face friction μK as [min, max] or a class letter; default as mu_thread",
    "mu_interface": "friction coefficient μT of the interfaces against slip; default 0.1",
    "slip_interfaces": "number qF of interfaces that transmit the transverse load; default 1",
    "tightening": "tightening method (VDI 2230 Table A8), e.g. 'torque_wrench_estimated_friction', or αA as "
                  "a number; default 'torque_wrench_estimated_friction'",
    "utilisation": "utilisation ν of the yield strength at assembly; default 0.9",
    "load_introduction": "load introduction factor n (0 < n ≤ 1); default 0.5",
    "rz": "averaged roughness Rz of the contact faces for embedding [small length]; default '16 um'",
    "temperature_min": "lowest operating temperature; default temperature_assembly",
    "temperature_max": "highest operating temperature; default temperature_assembly",
    "temperature_assembly": "temperature at assembly; default 20 degC",
    "shank_length": "unthreaded shank inside the clamp length [length]; default 0 (threaded to the head)",
    "clamp_outer_diameter": "outer diameter D_A of the clamped parts' substitute body [length]; default the "
                            "screw spacing of the pattern (a single screw: a wide plate)",
    "rolled_after_heat_treatment": "thread rolled after heat treatment (higher fatigue limit): true/false; "
                                   "default false",
    "clamp_eccentricity": "eccentric clamping s_sym: distance of the screw axis from the centre line of the "
                          "interface strip, positive towards the load side [length]; default 0 (VDI 2230-1 "
                          "eccentric joint, step R3)",
    "load_eccentricity": "eccentric loading a: distance of the axial load's line of action from the centre line "
                         "of the interface strip, on the load side [length]; default 0, or half the interface "
                         "depth (the load at the interface's edge) for a cover under tilt with "
                         "interface_depth given",
    "interface_depth": "depth c_T of the interface strip across the bending axis, e.g. the width of the "
                       "flange land [length]; required for an eccentric joint",
    "interface_width": "width b of the interface strip of one screw along the bending axis [length]; default "
                       "the screw spacing of the pattern (clamp_outer_diameter)",
    "gasket_thickness": "thickness of a flat gasket or seal in the interface [length]; no gasket unless given",
    "gasket_modulus": "compression modulus of the gasket [stress], e.g. '400 MPa' (or give gasket_stiffness)",
    "gasket_stiffness": "load–deflection stiffness of the gasket under one screw [stiffness], e.g. '80000 N/mm'",
    "gasket_settling": "settling (creep relaxation) of the gasket in service [small length], added to embedding; "
                       "default 0 um",
    "gasket_seating_pressure": "least surface pressure the gasket needs to seal [stress]; checked against the "
                               "smallest residual clamp load when given",
    "gasket_area": "sealed (gasket) area of the whole cover [area], e.g. '1800 mm**2'; shared by the screws",
    "gasket_alpha": "thermal expansion coefficient of the gasket [1/K]; default 0 (not counted)",
}

#: Calculation steps in words with the clause or equation they follow, for the report.
METHOD_NOTES: list[tuple[str, str]] = [
    ("Thread dimensions d2 = d − 0.649519 P, d3 = d − 1.226869 P; stress area As = π/4·((d2 + d3)/2)² "
     "(inch: At = 0.7854·(d − 0.9743/n)²)", "ISO 724; ISO 898-1:2013, 9.1.6.1; ASME B1.1"),
    ("Screw compliance δS from its elements: head (lSK = 0.5 d hexagon, 0.4 d socket and other heads), "
     "unthreaded shank, free loaded thread, engaged thread (lG = 0.5 d) and nut (lM = 0.4 d) or tapped "
     "housing (lM = 0.33 d, with the housing's modulus)", "VDI 2230-1:2015, 5.1.1, step R3"),
    ("Clamped-part compliance δP: substitute deformation cone with tan φ for through-bolted (DSV) or tapped "
     "(ESV) joints from βL = lK/dw and y = D'A/dw, turning into a sleeve at D_A; summed layer by layer with "
     "each layer's modulus. y is limited to the cone's own limiting diameter DA,Gr (fixed point of "
     "y = 1 + w·βL·tan φ): a wide plate, or any D_A beyond DA,Gr, takes that value (this program's "
     "reading; the printed equations grow without bound in ln y); by default D_A is the screw spacing "
     "of the pattern",
     "VDI 2230-1:2015, 5.1.2.2–5.1.2.3"),
    ("Shigley's frustum (30°) and the exponential fit of the member stiffness are computed alongside "
     "for comparison only", "Shigley, 10th ed., eqs. (8-20), (8-23)"),
    ("Load factor Φn = n·δP/(δS + δP); load introduction factor n = 0.5 unless given (estimate for a "
     "load introduced inside the clamped parts; n = 1 under the head, smaller when introduced near the "
     "interface)", "VDI 2230-1:2015, 5.2.2 and 5.3.1, step R3"),
    ("Embedding fZ from Table 5 (thread + head/nut faces + inner interfaces, by roughness Rz and "
     "load direction); FZ = fZ/(δS + δP). Table 5 is for compact steel parts: light-alloy, copper-alloy "
     "and plastic parts settle more (a warning says so)", "VDI 2230-1:2015, 5.4.2.1, Table 5, step R4"),
    ("Change of preload with uniform temperature change from assembly to the cold and warm ends: "
     "ΔFth = (Σ αP,i·li − αS·lK)·ΔT/(δS + δP); moduli taken at room temperature",
     "VDI 2230-1:2015, 5.4.2.3, step R4"),
    ("Most loaded screw of the pattern: FA = Faxial/n + Mtilt·u/Σu² (rigid flange, worst tilting axis "
     "through the centroid), FQ = Ftrans/n + T·rmax/Σr²", "VDI 2230-1:2015, 3.x (rigid-flange model); "
     "Shigley, 10th ed., Sec. 8-12"),
    ("Required clamp load FKerf = max(required clamp load, FQ/(qF·μT)); FM,min = FKerf + (1 − Φ)·FA + "
     "FZ + thermal loss; FM,max = αA·FM,min with αA from the tightening method",
     "VDI 2230-1:2015, steps R1, R2, R5, R6; Table A8"),
    ("Permissible assembly preload FM,zul = A0·ν·Rp0.2/√(1 + 3[3/2·d2/d0·(P/(π d2) + 1.155 μG,min)]²), "
     "d0 = dS; check FM,max ≤ FM,zul", "VDI 2230-1:2015, 5.5.1, step R7; Table A1"),
    ("Tightening torque MA = FM,zul·(0.16 P + 0.58 d2 μG,min + μK,min·DKm/2), DKm = (dw + dh)/2; the "
     "(with a washer: the washer's hole); the preload this torque gives at the highest friction is "
     "reported; Shigley's T = K·F·d (K = 0.2) "
     "as a cross-check", "VDI 2230-1:2015, step R13; ISO 16047; Shigley, 10th ed., eq. (8-27), Table 8-15"),
    ("Working stress: FS,max = FM,zul + Φ·FA + thermal gain; σred,B = √(σ² + 3(kτ·τ)²) with kτ = 0.5; "
     "yield safety Rp0.2/σred,B ≥ 1", "VDI 2230-1:2015, step R8"),
    ("Residual clamp load FKR,min = FM,zul/αA − (1 − Φ)·FA − FZ − thermal loss ≥ required clamp load "
     "(≥ 0: no separation) and ≥ FQ/(qF·μT) (no slip)", "VDI 2230-1:2015, steps R12 and R13 (R2)"),
    ("Surface pressure p = max(FM,zul, FV,max + Φ·FA + thermal gain)/Ap, Ap = π/4·(dw² − dh²) under the "
     "head (with a washer: its outside diameter on the part), and under the nut of a through bolt, "
     "against p_G of the material touched", "VDI 2230-1:2015, step R10, Table A9"),
    ("Length of engagement in a tapped housing: internal-thread shear area 0.875·π·d·L and external "
     "0.75·π·D1·L (basic profile) against the screw's breaking load Rm·As; τB of the housing, "
     "τB = 0.6·Rm for the screw (common practice); nuts of matching class (ISO 898-2) are not checked",
     "FED-STD-H28/2B, App. A; principle of VDI 2230-1:2015, step R11"),
    ("Fatigue: σa = Φ·FA/(2 As) (load cycling between 0 and FA) against σASV = 0.85·(150/d + 45) MPa "
     "(rolled before heat treatment) or σASG = (2 − FSm/F0.2min)·σASV, not below σASV (rolled after; "
     "FSm = FM,zul − FZ + Φ·FA/2, the largest mean force in service); safety ≥ 1.2",
     "VDI 2230-1:2015, step R9"),
]

#: Method steps of the eccentric joint and of a gasket, added to a report when they apply.
ECCENTRIC_NOTES: list[tuple[str, str]] = [
    ("Eccentric joint: clamped parts as a beam of bending compliance βP = Σ li/(Ei·IBers), IBers = b·cT³/12 "
     "(interface strip of width b and depth cT; the narrower cone under the head is not subtracted); "
     "δP* = δP + s_sym²·βP, δP** = δP + a·s_sym·βP; Φen* = n·δP**/(δS + δP*) replaces Φn in every step",
     "VDI 2230-1:2015, 3.2.2, 5.1.2.3, 5.3.1, step R3"),
    ("Opening at the loaded edge U (u = cT/2 on the load side, also the far edge): interface area AD and "
     "moment IBT of the strip less the hole; FKab = FA·(a − s_sym)·u/(IBT/AD + s_sym·u) is added to the "
     "required clamp load; opening limit FAab = FV,min/((1 − Φen*) + (a − s_sym)·u/(IBT/AD + s_sym·u)) "
     "with FV,min the smallest preload in service; check FA ≤ FAab",
     "VDI 2230-1:2015, 3.2.3, step R2"),
    ("Bending of the screw through the clamped parts' rotation: σSAb = Φen*·FA/AS + FA·(a − s_sym·Φen*)·"
     "(lK/lers)·(ES/EP)·dS/(2·IBers), lers = Σ li·(dS/di)⁴ over the screw's elastic lengths; the stress "
     "amplitude of the fatigue check is σSAb/2 (load cycling between 0 and FA); valid while the joint "
     "stays closed", "VDI 2230-1:2015, 5.1.1.2, 5.5.x, step R9"),
]

GASKET_NOTES: list[tuple[str, str]] = [
    ("Gasket: a layer of the clamped stack at the interface (tapped: above the housing; through: below the "
     "first part) with its compression modulus in the deformation cone, or with the modulus that makes "
     "its cone section as compliant as the load–deflection stiffness given; its settling is added to "
     "the embedding fZ; sealing: FKR,min/(A/n) ≥ the seating pressure, A the sealed area of the cover",
     "VDI 2230-1:2015, 5.1.2.2 (layered clamped parts), 5.4.2.1 (embedding), step R2 (FKP)"),
]

_STEEL_WASHER_E = 205000.0       # MPa, steel washer 200 HV (common practice)
_STEEL_WASHER_ALPHA = 11.5e-6    # 1/K (common practice)
_TAU_RATIO_SCREW = 0.6           # τB/Rm of screw steels (common practice; VDI 2230-1 Table A9 ~0.6)
_FATIGUE_SAFETY = 1.2            # VDI 2230-1:2015, R9: SD ≥ 1.2
_ENGAGEMENT_MARGIN = 1.0         # L must reach L_min itself (the screw's Rm·As already bounds it)
_NON_STEEL_EMBEDDING = ("aluminium", "copper_alloy", "plastic", "magnesium")  # Table 5 is for steel


@dataclass(frozen=True)
class Layer:
    """One clamped part: thickness [mm], its material, and the material as given (for round trips)."""

    thickness: float
    material: Material
    spec: object = field(compare=False, default=None)


@dataclass(frozen=True)
class Gasket:
    """A flat gasket or seal in the interface, in core units.

    Attributes: thickness [mm]; modulus [MPa] or stiffness [N/mm per screw] (one of the two);
    settling [mm]; seating_pressure [MPa] with area [mm², the whole cover's sealed area];
    alpha [1/K].
    """

    thickness: float
    modulus: float | None = None
    stiffness: float | None = None
    settling: float = 0.0
    seating_pressure: float | None = None
    area: float | None = None
    alpha: float = 0.0

    def to_mapping(self) -> dict:
        """The ``gasket_*`` keys of a ``[[screws]]`` table (strings with units)."""
        out: dict = {"gasket_thickness": f"{self.thickness!r} mm"}
        if self.modulus is not None:
            out["gasket_modulus"] = f"{self.modulus!r} MPa"
        if self.stiffness is not None:
            out["gasket_stiffness"] = f"{self.stiffness!r} N/mm"
        out["gasket_settling"] = f"{self.settling * 1000.0!r} um"
        if self.seating_pressure is not None:
            out["gasket_seating_pressure"] = f"{self.seating_pressure!r} MPa"
        if self.area is not None:
            out["gasket_area"] = f"{self.area!r} mm**2"
        out["gasket_alpha"] = f"{self.alpha!r} 1/K"
        return out


_GASKET_KEYS = ("thickness", "modulus", "stiffness", "settling", "seating_pressure", "area", "alpha")


def _gasket_keys(m, get, field, errs) -> Gasket | None:
    """The ``gasket_*`` keys as a :class:`Gasket`, or None when no gasket is given."""
    given = [k for k in _GASKET_KEYS if f"gasket_{k}" in m]
    if not given:
        return None
    if "thickness" not in given:
        errs.add(InputError(f"{field}.gasket_thickness", None, "the gasket's thickness, e.g. '0.5 mm' "
                            f"(gasket_{given[0]} is given)"))
        return None
    if ("modulus" in given) == ("stiffness" in given):
        errs.add(InputError(f"{field}.gasket_modulus", m.get("gasket_modulus", m.get("gasket_stiffness")),
                            "either gasket_modulus (e.g. '400 MPa') or gasket_stiffness (per screw, e.g. "
                            "'80000 N/mm'): exactly one of the two"))
        return None
    kinds = {"thickness": ("length", dict(lo=0.0, lo_open=True, hi=50.0)),
             "modulus": ("stress", dict(lo=0.0, lo_open=True, hi=5e5)),
             "stiffness": ("stiffness", dict(lo=0.0, lo_open=True, hi=1e9)),
             "settling": ("small_length", dict(lo=0.0, hi=2000.0)),
             "seating_pressure": ("stress", dict(lo=0.0, lo_open=True, hi=1e4)),
             "area": ("area", dict(lo=0.0, lo_open=True, hi=1e8)),
             "alpha": ("expansion", dict(lo=-1e-3, hi=1e-3))}
    g = {k: get(f"gasket_{k}", lambda x, key, kind=kinds[k][0], kw=kinds[k][1]: to_core(x, kind, key, **kw))
         for k in given}
    if any(v is None for v in g.values()):
        return None
    if "seating_pressure" in g and "area" not in g:
        errs.add(InputError(f"{field}.gasket_area", None, "the sealed area of the cover (e.g. '1800 mm**2') "
                            "to check gasket_seating_pressure"))
        return None
    return Gasket(g["thickness"], g.get("modulus"), g.get("stiffness"), g.get("settling", 0.0) / 1000.0,
                  g.get("seating_pressure"), g.get("area"), g.get("alpha", 0.0))


def _eccentric_keys(m, v, get, field, errs) -> None:
    """Parse the keys of the eccentric joint and refuse geometry the method does not cover."""
    for key in ("clamp_eccentricity", "load_eccentricity"):
        v[key] = get(key, lambda x, k: to_core(x, "length", k, lo=-1e4, hi=1e4))
    for key in ("interface_depth", "interface_width"):
        v[key] = get(key, lambda x, k: to_core(x, "length", k, lo=0.0, lo_open=True, hi=1e5))
    if v["load_eccentricity"] is not None and v["load_eccentricity"] < 0:
        errs.add(InputError(f"{field}.load_eccentricity", m.get("load_eccentricity"),
                            "a distance ≥ 0 (the load side defines the positive direction)"))
    eccentric = bool(v["clamp_eccentricity"]) or bool(v["load_eccentricity"])
    if eccentric and v["interface_depth"] is None:
        errs.add(InputError(f"{field}.interface_depth", None, "the depth of the interface strip across the "
                            "bending axis (e.g. the flange land, '12 mm'), needed by the eccentric joint"))
        return
    c = v["interface_depth"]
    if c is None:
        return
    for key in ("clamp_eccentricity", "load_eccentricity"):
        e = v[key]
        if e is not None and abs(e) >= c / 2.0:
            errs.add(InputError(f"{field}.{key}", m.get(key), f"a distance inside the interface strip, "
                                f"|e| < interface_depth/2 = {c / 2.0:g} mm"))
    s = v["clamp_eccentricity"] or 0.0
    if abs(s) > c / 6.0:
        errs.add(InputError(f"{field}.clamp_eccentricity", m.get("clamp_eccentricity"),
                            f"a screw axis inside the core of the interface, |s_sym| ≤ interface_depth/6 = "
                            f"{c / 6.0:g} mm (further out the preload alone opens the far edge, and the "
                            "eccentric model of VDI 2230-1 no longer applies)"))


def _mat_spec_out(spec, mat: Material):
    if isinstance(spec, Mapping):
        return dict(spec)
    return mat.name


@dataclass(frozen=True)
class ScrewJointInput:
    """Input of one screw joint, in core units (mm, N, N·mm, °C).

    Build it with :meth:`from_mapping` (units parsed, every key validated) rather than directly.
    """

    name: str = "screws"
    thread: str = "M6"
    property_class: str = "8.8"
    head: str = "hex"
    hole: str | float = "medium"
    washer: bool = False
    joint: str = "tapped"
    layers: tuple[Layer, ...] = ()
    engagement: float | None = None
    housing_material: Material | None = None
    housing_spec: object = field(compare=False, default=None)
    count: int = 1
    bolt_circle: float | None = None
    positions: tuple[tuple[float, float], ...] | None = None
    axial_force: float = 0.0
    tilting_moment: float = 0.0
    transverse_force: float = 0.0
    torque_about_axis: float = 0.0
    clamp_force_required: float = 0.0
    mu_thread: tuple[float, float] = (0.08, 0.16)
    mu_head: tuple[float, float] = (0.08, 0.16)
    mu_interface: float = 0.1
    slip_interfaces: int = 1
    tightening: str | float = "torque_wrench_estimated_friction"
    utilisation: float = 0.9
    load_introduction: float = 0.5
    rz: float = 16.0
    temperature_min: float = 20.0
    temperature_max: float = 20.0
    temperature_assembly: float = 20.0
    shank_length: float = 0.0
    clamp_outer_diameter: float | None = None
    rolled_after_heat_treatment: bool = False
    clamp_eccentricity: float | None = None
    load_eccentricity: float | None = None
    interface_depth: float | None = None
    interface_width: float | None = None
    gasket: Gasket | None = None

    # ------------------------------------------------------------------ parsing
    @classmethod
    def from_mapping(cls, mapping: Mapping, field: str = "screws") -> ScrewJointInput:
        """Parse and validate a ``[[screws]]`` table (quantities as strings or pint quantities).

        Every problem is collected; one raises :class:`~fitcheck.errors.InputError`, several
        :class:`~fitcheck.errors.InputErrors`, each naming ``field.key``.
        """
        if not isinstance(mapping, Mapping):
            raise InputError(field, mapping, "a table of screw-joint keys")
        errs = ErrorCollector()
        for key in mapping:
            if key not in KEYS:
                errs.add(InputError(f"{field}.{key}", mapping[key], "a key of [[screws]]: " + ", ".join(KEYS),
                                    did_you_mean(key, KEYS)))
        m = mapping
        v: dict = {}

        def get(key, parse, default=None):
            if key not in m:
                return default
            try:
                return parse(m[key], key)
            except InputError as exc:
                errs.add(exc, field)
                return default

        v["name"] = str(m.get("name", "screws"))
        th = get("thread", lambda x, k: threads.thread(x, k))
        if "thread" not in m:
            errs.add(InputError(f"{field}.thread", None, "a thread designation such as 'M6' or '1/4-20 UNC'"))
        if th is not None:
            v["thread"] = th.designation
        pc_name = m.get("property_class", "8.8")
        if th is not None:
            with warnings.catch_warnings():
                warnings.simplefilter("ignore", MethodRangeWarning)
                pc = get("property_class", lambda x, k: threads.property_class(str(x), th.d, k))
            if pc is not None:
                v["property_class"] = pc.name
            elif "property_class" not in m:
                v["property_class"] = pc_name
        head = str(m.get("head", "hex")).strip().lower()
        if head not in threads.HEAD_TYPES:
            errs.add(InputError(f"{field}.head", m.get("head"), "one of " + ", ".join(threads.HEAD_TYPES),
                                did_you_mean(head, threads.HEAD_TYPES)))
        else:
            v["head"] = head
            if th is not None:
                get("head", lambda x, k: threads.head(head, th.size, k))
        if "hole" in m:
            h = m["hole"]
            if isinstance(h, str) and h.strip().lower() in threads.HOLE_SERIES:
                v["hole"] = h.strip().lower()
            elif isinstance(h, str) and h.strip().isalpha():
                errs.add(InputError(f"{field}.hole", h, "fine, medium, coarse or a diameter such as '6.6 mm'",
                                    did_you_mean(h, threads.HOLE_SERIES)))
            else:
                dh = get("hole", lambda x, k: to_core(x, "length", k, lo=0.0, lo_open=True))
                if dh is not None:
                    v["hole"] = dh
        if th is not None and "hole" in v and not isinstance(v["hole"], str) and v["hole"] <= th.d:
            errs.add(InputError(f"{field}.hole", m["hole"], f"a clearance hole larger than the thread's "
                                f"nominal diameter {th.d:g} mm"))
        v["washer"] = get("washer", _bool, False)
        if v["washer"] and th is not None and "head" in v:
            get("washer", lambda x, k: threads.washer(th.size, v["head"], k))
        joint = str(m.get("joint", "tapped")).strip().lower()
        if joint not in ("tapped", "through"):
            errs.add(InputError(f"{field}.joint", m.get("joint"), "'tapped' or 'through'",
                                did_you_mean(joint, ("tapped", "through"))))
        v["joint"] = joint
        v["layers"] = _layers(m.get("layers"), field, errs)
        v["engagement"] = get("engagement", lambda x, k: to_core(x, "length", k, lo=0.0, lo_open=True))
        if joint == "tapped":
            if v["engagement"] is None and "engagement" not in m:
                errs.add(InputError(f"{field}.engagement", None, "the length of engagement in the tapped "
                                    "housing, e.g. '12 mm' (required for joint = 'tapped')"))
            if "housing_material" not in m:
                errs.add(InputError(f"{field}.housing_material", None, "the material of the tapped housing "
                                    "(a name of data/materials.csv or an inline table)"))
        if th is not None and v["engagement"] is not None and v["engagement"] < th.P:
            errs.add(InputError(f"{field}.engagement", m["engagement"], f"at least one pitch "
                                f"({th.P:g} mm) of engaged thread"))
        if "housing_material" in m:
            try:
                v["housing_material"] = materials.from_mapping(m["housing_material"], "housing_material")
                v["housing_spec"] = m["housing_material"]
            except InputError as exc:
                errs.add(exc, field)
            except Exception as exc:  # InputErrors from an inline table
                if hasattr(exc, "errors"):
                    errs.add(exc, field)
                else:
                    raise
        v["count"] = get("count", _count, 1)
        v["bolt_circle"] = get("bolt_circle", lambda x, k: to_core(x, "length", k, lo=0.0, lo_open=True))
        v["positions"] = get("positions", _positions)
        if v["positions"] is not None and "count" in m and v["count"] != len(v["positions"]):
            errs.add(InputError(f"{field}.count", m["count"], f"the number of positions ({len(v['positions'])})"))
        if v["positions"] is not None:
            v["count"] = len(v["positions"])
            if v["bolt_circle"] is not None:
                errs.add(InputError(f"{field}.positions", "positions and bolt_circle", "one of the two"))
        for key, kind in (("axial_force", "force"), ("tilting_moment", "moment"),
                          ("transverse_force", "force"), ("torque_about_axis", "torque"),
                          ("clamp_force_required", "force")):
            v[key] = get(key, lambda x, k, kind=kind: to_core(x, kind, k, lo=0.0), 0.0)
        if v["count"] and v["count"] > 1 and v["bolt_circle"] is None and v["positions"] is None:
            errs.add(InputError(f"{field}.bolt_circle", None, "a bolt circle or positions for a pattern of "
                                f"{v['count']} screws"))
        if (v["tilting_moment"] or v["torque_about_axis"]) and (v["count"] or 1) < 2:
            errs.add(InputError(f"{field}.count", m.get("count", 1), "at least 2 screws on a bolt circle or "
                                "at given positions to carry a tilting moment or a torque"))
        if v["tilting_moment"] and (v["count"] or 1) >= 2:
            xx, yy = _pattern_xy_raw(v.get("positions"), v.get("bolt_circle"), v["count"])
            pts = np.column_stack([xx - xx.mean(), yy - yy.mean()])
            if pts.shape[0] < 3 or np.linalg.matrix_rank(pts, tol=1e-9 * max(1.0, float(np.abs(pts).max()))) < 2:
                errs.add(InputError(f"{field}.tilting_moment", m.get("tilting_moment"), "no tilting moment "
                                    "unless at least 3 screws not on one line carry it"))
        v["mu_thread"] = get("mu_thread", _mu, (0.08, 0.16))
        v["mu_head"] = get("mu_head", _mu, v["mu_thread"])
        v["mu_interface"] = get("mu_interface", lambda x, k: number(x, k, lo=0.0, lo_open=True, hi=1.0), 0.1)
        v["slip_interfaces"] = get("slip_interfaces", _count, 1)
        v["tightening"] = get("tightening", _tightening, "torque_wrench_estimated_friction")
        v["utilisation"] = get("utilisation", lambda x, k: number(x, k, lo=0.0, lo_open=True, hi=1.0), 0.9)
        v["load_introduction"] = get("load_introduction",
                                     lambda x, k: number(x, k, lo=0.0, lo_open=True, hi=1.0), 0.5)
        v["rz"] = get("rz", lambda x, k: to_core(x, "small_length", k, lo=0.0, hi=160.0, hi_open=True), 16.0)
        ta = get("temperature_assembly", lambda x, k: temperature_c(x, k, lo=-200.0, hi=600.0), 20.0)
        v["temperature_assembly"] = ta
        v["temperature_min"] = get("temperature_min", lambda x, k: temperature_c(x, k, lo=-200.0, hi=600.0), ta)
        v["temperature_max"] = get("temperature_max", lambda x, k: temperature_c(x, k, lo=-200.0, hi=600.0), ta)
        if v["temperature_min"] > v["temperature_max"]:
            errs.add(InputError(f"{field}.temperature_min", m.get("temperature_min"),
                                "a temperature not above temperature_max"))
        v["shank_length"] = get("shank_length", lambda x, k: to_core(x, "length", k, lo=0.0), 0.0)
        lk = sum(la.thickness for la in v["layers"])
        if v["layers"] and v["shank_length"] > lk:
            errs.add(InputError(f"{field}.shank_length", m.get("shank_length"),
                                f"a shank length not above the clamp length ({lk:g} mm)"))
        v["clamp_outer_diameter"] = get("clamp_outer_diameter",
                                        lambda x, k: to_core(x, "length", k, lo=0.0, lo_open=True))
        v["rolled_after_heat_treatment"] = get("rolled_after_heat_treatment", _bool, False)
        _eccentric_keys(m, v, get, field, errs)
        v["gasket"] = _gasket_keys(m, get, field, errs)
        if th is not None and "head" in v:
            _geometry_checks(th, v, m, field, errs)
        errs.raise_if_any()
        return cls(**{k: val for k, val in v.items() if k in {f.name for f in fields(cls)}})

    def to_mapping(self) -> dict:
        """The input as a ``[[screws]]`` table (strings with units); ``from_mapping`` reads it back equal."""
        out: dict = {"name": self.name, "thread": self.thread, "property_class": self.property_class,
                     "head": self.head,
                     "hole": self.hole if isinstance(self.hole, str) else f"{self.hole!r} mm",
                     "washer": self.washer, "joint": self.joint,
                     "layers": [{"thickness": f"{la.thickness!r} mm",
                                 "material": _mat_spec_out(la.spec, la.material)} for la in self.layers]}
        if self.engagement is not None:
            out["engagement"] = f"{self.engagement!r} mm"
        if self.housing_material is not None:
            out["housing_material"] = _mat_spec_out(self.housing_spec, self.housing_material)
        if self.positions is not None:
            out["positions"] = [[f"{x!r} mm", f"{y!r} mm"] for x, y in self.positions]
        else:
            out["count"] = self.count
            if self.bolt_circle is not None:
                out["bolt_circle"] = f"{self.bolt_circle!r} mm"
        out.update({
            "axial_force": f"{self.axial_force!r} N", "tilting_moment": f"{self.tilting_moment!r} N*mm",
            "transverse_force": f"{self.transverse_force!r} N",
            "torque_about_axis": f"{self.torque_about_axis!r} N*mm",
            "clamp_force_required": f"{self.clamp_force_required!r} N",
            "mu_thread": list(self.mu_thread), "mu_head": list(self.mu_head),
            "mu_interface": self.mu_interface, "slip_interfaces": self.slip_interfaces,
            "tightening": self.tightening, "utilisation": self.utilisation,
            "load_introduction": self.load_introduction, "rz": f"{self.rz!r} um",
            "temperature_min": f"{self.temperature_min!r} degC",
            "temperature_max": f"{self.temperature_max!r} degC",
            "temperature_assembly": f"{self.temperature_assembly!r} degC",
            "shank_length": f"{self.shank_length!r} mm",
            "rolled_after_heat_treatment": self.rolled_after_heat_treatment,
        })
        if self.clamp_outer_diameter is not None:
            out["clamp_outer_diameter"] = f"{self.clamp_outer_diameter!r} mm"
        for key in ("clamp_eccentricity", "load_eccentricity", "interface_depth", "interface_width"):
            if getattr(self, key) is not None:
                out[key] = f"{getattr(self, key)!r} mm"
        if self.gasket is not None:
            out.update(self.gasket.to_mapping())
        return out


def _bool(x, k):
    if not isinstance(x, bool):
        raise InputError(k, x, "true or false")
    return x


def _count(x, k):
    if isinstance(x, bool) or not isinstance(x, int | float) or x != int(x) or not 1 <= x <= 1000:
        raise InputError(k, x, "a whole number from 1 to 1000")
    return int(x)


def _positions(x, k):
    if not isinstance(x, list | tuple) or not x:
        raise InputError(k, x, "a list of [x, y] positions, e.g. [['30 mm', '0 mm'], ['-30 mm', '0 mm']]")
    out = []
    for i, p in enumerate(x):
        if not isinstance(p, list | tuple) or len(p) != 2:
            raise InputError(f"{k}[{i}]", p, "a pair [x, y]")
        out.append((to_core(p[0], "length", f"{k}[{i}]"), to_core(p[1], "length", f"{k}[{i}]")))
    if len(set(out)) != len(out):
        raise InputError(k, x, "distinct positions (two screws at the same place)")
    return tuple(out)


def _mu(x, k):
    lo, hi = MU_RANGE
    if isinstance(x, str) and len(x.strip()) == 1 and x.strip().isalpha():
        a, b = threads.friction_class(x, k)
        return (max(a, lo), min(b, hi))
    vals = list(x) if isinstance(x, list | tuple) else [x]
    if len(vals) not in (1, 2):
        raise InputError(k, x, "[min, max] friction coefficients or a friction class A … E")
    nums = tuple(number(val, k, lo=lo, hi=hi) for val in vals)
    if len(nums) == 1:
        nums = (nums[0], nums[0])
    if nums[0] > nums[1]:
        raise InputError(k, x, "[min, max] with min ≤ max")
    return nums


def _tightening(x, k):
    if isinstance(x, bool):
        raise InputError(k, x, "a tightening method name or αA as a number from 1 to 5")
    if isinstance(x, int | float):
        return number(x, k, lo=1.0, hi=5.0)
    threads.tightening_factor(x, k)
    return str(x).strip().lower().replace("-", "_").replace(" ", "_")


def _layers(x, field, errs) -> tuple[Layer, ...]:
    if x is None:
        errs.add(InputError(f"{field}.layers", None, "an array of clamped parts "
                            "[{thickness = '8 mm', material = 'EN AW-6082-T6'}, …]"))
        return ()
    if not isinstance(x, list | tuple) or not x:
        errs.add(InputError(f"{field}.layers", x, "a non-empty array of {thickness, material} tables"))
        return ()
    out = []
    for i, la in enumerate(x):
        where = f"{field}.layers[{i}]"
        if not isinstance(la, Mapping):
            errs.add(InputError(where, la, "a table {thickness = '8 mm', material = 'C45E'}"))
            continue
        bad = [k for k in la if k not in ("thickness", "material")]
        for k in bad:
            errs.add(InputError(f"{where}.{k}", la[k], "thickness or material", did_you_mean(k, ("thickness", "material"))))
        t = mat = None
        try:
            t = to_core(la.get("thickness"), "length", "thickness", lo=0.0, lo_open=True) \
                if "thickness" in la else None
            if t is None:
                errs.add(InputError(f"{where}.thickness", None, "a thickness > 0, e.g. '8 mm'"))
        except InputError as exc:
            errs.add(exc, where)
        if "material" not in la:
            errs.add(InputError(f"{where}.material", None, "a material name or inline table"))
        else:
            try:
                mat = materials.from_mapping(la["material"], "material")
            except InputError as exc:
                errs.add(exc, where)
            except Exception as exc:
                if hasattr(exc, "errors"):
                    errs.add(exc, where)
                else:
                    raise
        if t is not None and mat is not None:
            out.append(Layer(t, mat, la["material"]))
    return tuple(out)


def _hole_diameter(th: threads.Thread, hole) -> float:
    return threads.clearance_hole(th.size, hole) if isinstance(hole, str) else float(hole)


def _geometry_checks(th, v, m, field, errs) -> None:
    try:
        hd = threads.head(v["head"], th.size)
    except InputError:
        return
    hole = v.get("hole", "medium")
    try:
        dh = _hole_diameter(th, hole)
    except InputError as exc:
        errs.add(exc, field)
        return
    if dh <= th.d:
        if isinstance(hole, str):
            errs.add(InputError(f"{field}.hole", hole, f"a hole larger than the thread ({th.d:g} mm)"))
        return
    if dh >= hd.dw:
        errs.add(InputError(f"{field}.hole", m.get("hole", hole), f"a hole smaller than the head's bearing "
                            f"diameter dw = {hd.dw:g} mm"))
    da = v.get("clamp_outer_diameter")
    if da is not None and da <= dh:
        errs.add(InputError(f"{field}.clamp_outer_diameter", m.get("clamp_outer_diameter"),
                            f"a diameter larger than the hole ({dh:g} mm)"))


# ---------------------------------------------------------------------------- result

@dataclass(frozen=True)
class ScrewJointResult:
    """Result of one screw joint, plain floats in core units (N, mm, MPa, N·mm, mm/N)."""

    name: str
    thread: str
    property_class: str
    d: float
    P: float
    d2: float
    d3: float
    As: float
    Rp02: float
    Rm: float
    dw: float
    dh: float
    l_K: float
    D_A: float
    tan_phi: float
    D_A_Gr: float
    delta_S: float
    delta_P: float
    load_introduction: float
    load_factor: float
    F_A: float
    F_Q: float
    f_Z: float
    F_Z: float
    dF_th_cold: float
    dF_th_warm: float
    F_K_required: float
    F_KQ_required: float
    alpha_A: float
    F_M_zul: float
    F_M_min: float
    F_M_max: float
    tightening_torque: float
    tightening_torque_mu_max: float
    preload_at_mu_max: float
    torque_shigley: float
    F_KR_min: float
    F_S_max: float
    sigma_red_B: float
    yield_safety: float
    surface_pressure: float
    p_G: float
    surface_pressure_nut: float
    p_G_nut: float
    engagement: float
    engagement_min: float
    sigma_a: float
    sigma_AS: float
    fatigue_safety: float
    k_frustum_shigley: float
    k_exponential_shigley: float
    checks: tuple[Check, ...]
    warnings: tuple[str, ...] = ()
    load_factor_eccentric: float = math.nan
    load_factor_concentric: float = math.nan
    bending_stress: float = 0.0
    opening_force: float = math.inf
    clamp_for_opening: float = 0.0
    opening_edge: str = ""
    beta_P: float = 0.0
    gasket_pressure: float = math.nan

    @property
    def ok(self) -> bool:
        return all_passed(self.checks)

    @property
    def screw_stiffness(self) -> float:
        return 1.0 / self.delta_S

    @property
    def clamp_stiffness(self) -> float:
        return 1.0 / self.delta_P

    def joint_diagram(self) -> dict[str, float]:
        """Corner points of the joint diagram at the smallest preload in service.

        VDI 2230-1:2015, Section 3.1 (joint diagram): the screw line rises with 1/δS, the
        clamped parts' line falls with 1/δP from the preload F_V; under the axial load F_A
        the screw takes Φ·F_A and the clamped parts are relieved by (1 − Φ)·F_A.

        Returns
        -------
        dict
            ``F_V`` smallest preload in service, FM,zul/αA − FZ − thermal loss [N];
            ``f_S``, ``f_P`` elongation of the screw and compression of the clamped parts under
            F_V [mm]; ``F_S`` screw force under load, F_V + Φ·F_A [N]; ``f_A`` added elongation
            Φ·F_A·δS [mm]; ``F_KR`` residual clamp load F_V − (1 − Φ)·F_A [N]; ``F_A`` [N];
            ``F_M_zul`` [N].
        """
        th_loss = max(0.0, -self.dF_th_cold, -self.dF_th_warm)
        F_V = max(self.F_M_zul / self.alpha_A - self.F_Z - th_loss, 0.0)
        phi = self.load_factor_eccentric if math.isfinite(self.load_factor_eccentric) else self.load_factor
        dF_S = phi * self.F_A
        return {"F_V": F_V, "f_S": F_V * self.delta_S, "f_P": F_V * self.delta_P,
                "F_S": F_V + dF_S, "f_A": dF_S * self.delta_S,
                "F_KR": F_V - (1.0 - phi) * self.F_A, "F_A": self.F_A,
                "F_M_zul": self.F_M_zul, "F_Aab": self.opening_force}

    def to_dict(self) -> dict:
        """Every figure under a name with its unit, the checks and the verdict (JSON-ready)."""
        return {
            "name": self.name, "thread": self.thread, "property_class": self.property_class,
            "stress_area_mm2": self.As, "pitch_mm": self.P, "bearing_diameter_mm": self.dw,
            "hole_diameter_mm": self.dh, "clamp_length_mm": self.l_K,
            "clamp_outer_diameter_mm": self.D_A, "cone_tan_phi": self.tan_phi,
            "limiting_diameter_mm": self.D_A_Gr,
            "screw_stiffness_N_per_mm": self.screw_stiffness,
            "clamp_stiffness_N_per_mm": self.clamp_stiffness,
            "load_introduction": self.load_introduction, "load_factor": self.load_factor,
            "axial_load_per_screw_N": self.F_A, "transverse_load_per_screw_N": self.F_Q,
            "embedding_um": self.f_Z * 1000.0, "embedding_loss_N": self.F_Z,
            "thermal_change_cold_N": self.dF_th_cold, "thermal_change_warm_N": self.dF_th_warm,
            "clamp_required_N": self.F_K_required, "tightening_factor": self.alpha_A,
            "preload_permissible_N": self.F_M_zul, "preload_assembly_min_N": self.F_M_min,
            "preload_assembly_max_N": self.F_M_max,
            "tightening_torque_Nm": self.tightening_torque / 1000.0,
            "tightening_torque_mu_max_Nm": self.tightening_torque_mu_max / 1000.0,
            "preload_at_mu_max_N": self.preload_at_mu_max,
            "tightening_torque_shigley_Nm": self.torque_shigley / 1000.0,
            "residual_clamp_min_N": self.F_KR_min, "screw_force_max_N": self.F_S_max,
            "screw_stress_max_MPa": self.sigma_red_B, "yield_safety": self.yield_safety,
            "surface_pressure_MPa": self.surface_pressure, "surface_pressure_limit_MPa": self.p_G,
            "surface_pressure_nut_MPa": self.surface_pressure_nut,
            "engagement_mm": self.engagement, "engagement_min_mm": self.engagement_min,
            "stress_amplitude_MPa": self.sigma_a, "fatigue_limit_MPa": self.sigma_AS,
            "fatigue_safety": self.fatigue_safety,
            "clamp_stiffness_shigley_frustum_N_per_mm": self.k_frustum_shigley,
            "clamp_stiffness_shigley_exponential_N_per_mm": self.k_exponential_shigley,
            "load_factor_eccentric": self.load_factor_eccentric,
            "bending_stress_MPa": self.bending_stress, "opening_force_N": self.opening_force,
            "clamp_for_opening_N": self.clamp_for_opening, "opening_edge": self.opening_edge,
            "gasket_pressure_MPa": self.gasket_pressure,
            "warnings": list(self.warnings),
            "checks": [c.to_dict() for c in self.checks], "ok": self.ok,
        }

    def to_json(self) -> str:
        """:meth:`to_dict` as strict JSON (NaN and infinities become null)."""
        from .cli import clean_json

        return json.dumps(clean_json(self.to_dict()), allow_nan=False)


# ---------------------------------------------------------------------------- evaluation

def _pattern_xy_raw(positions, bolt_circle, count) -> tuple[np.ndarray, np.ndarray]:
    if positions is not None:
        p = np.array(positions, float)
        return p[:, 0], p[:, 1]
    if bolt_circle is not None and count > 1:
        ang = 2.0 * np.pi * np.arange(count) / count
        r = bolt_circle / 2.0
        return r * np.cos(ang), r * np.sin(ang)
    return np.zeros(count), np.zeros(count)


def _pattern_xy(inp: ScrewJointInput) -> tuple[np.ndarray, np.ndarray]:
    return _pattern_xy_raw(inp.positions, inp.bolt_circle, inp.count)


def _default_outer_diameter(x, y) -> float:
    if x.size < 2:
        return math.inf
    dx = x[:, None] - x[None, :]
    dy = y[:, None] - y[None, :]
    dist = np.hypot(dx, dy)
    dist[np.diag_indices(x.size)] = np.inf
    return float(dist.min())


def _limits_for(mat: Material, what: str) -> tuple[float, float]:
    """(pG, τB) of a material, falling back to the group table; NaN where nothing is known."""
    fb = threads.clamped_limits(mat.group)
    pG = mat.pG if math.isfinite(mat.pG) else (fb[0] if fb else math.nan)
    tau = mat.tauB if math.isfinite(mat.tauB) else (fb[1] * mat.Rm if fb else math.nan)
    if not math.isfinite(mat.pG if what == "pG" else mat.tauB):
        if fb is None:
            raise InputError(f"{what} of {mat.name}", "not tabulated",
                             f"a material with {what} (add '{what}' to an inline material table, "
                             f"e.g. {{base = '{mat.name}', {what} = '300 MPa'}})")
        warnings.warn(f"{mat.name}: no {what} in data/materials.csv; the lower value of its group "
                      f"({mat.group}) from data/screw_clamped_limits.csv is used", MethodRangeWarning,
                      stacklevel=3)
    return pG, tau


def _eccentric(inp, x, y, t, E, l_K, D_A, dh, th, pc, delta_S, delta_P, n, k_head, k_nut, l_shank):
    """The eccentric joint's geometry and load factor, or None for a concentric joint.

    Active when clamp_eccentricity or load_eccentricity is not zero, or for a cover under a tilting
    moment whose interface_depth is given (then the load line defaults to the interface's edge on
    the load side, a = cT/2, the least favourable place inside the strip).
    """
    tilt = inp.tilting_moment > 0 and inp.count >= 3
    s_sym = inp.clamp_eccentricity or 0.0
    a = inp.load_eccentricity
    where = ""
    if tilt:
        i, ang = ecc.tilt_direction(x, y, inp.tilting_moment)
        where = f"screw {i + 1} of {inp.count} ({ang:.0f}° from the pattern's x axis), the most loaded by the tilt"
    if not (s_sym or a):
        if not (tilt and inp.interface_depth is not None):
            if tilt:
                warnings.warn("cover under a tilting moment: its most loaded screw is treated as concentric; "
                              "give interface_depth (and clamp_eccentricity/load_eccentricity) for the eccentric "
                              "joint of VDI 2230-1, which usually raises the load factor and adds bending",
                              MethodRangeWarning, stacklevel=4)
            return None
    c_T = inp.interface_depth
    if a is None:
        a = c_T / 2.0 if tilt else 0.0
    if inp.interface_width is not None:
        b = inp.interface_width
    elif math.isfinite(D_A):
        b = D_A
    else:
        raise InputError("interface_width", None, "the width of the interface strip of this single screw along "
                         "the bending axis (no pattern gives a screw spacing), e.g. '20 mm'")
    I_Bers = float(ecc.substitute_inertia(b, c_T))
    beta_P = ecc.bending_compliance(t, E, I_Bers)
    A_D, I_BT = (float(v) for v in ecc.interface_section(b, c_T, dh, s_sym))
    if A_D <= 0 or I_BT <= 0:
        raise InputError("interface_depth", f"{c_T:g} mm", f"an interface strip ({b:g} mm × {c_T:g} mm) larger "
                         f"than the clearance hole ({dh:g} mm)")
    phi = float(ecc.load_factor_eccentric(n, delta_S, delta_P, beta_P, s_sym, a))
    E_P = l_K / float(np.sum(np.asarray(t) / np.asarray(E)))
    l_ers = ecc.screw_bending_length(
        [k_head * th.d, l_shank, l_K - l_shank, 0.5 * th.d, k_nut * th.d],
        [th.d, th.d, th.d3, th.d3, th.d], th.ds)
    return {"phi": phi, "s": s_sym, "a": a, "b": b, "c_T": c_T, "I_Bers": I_Bers, "beta_P": beta_P,
            "A_D": A_D, "I_BT": I_BT, "E_P": E_P, "l_ers": l_ers, "edges": (c_T / 2.0, -c_T / 2.0),
            "where": where}


def evaluate(inp: ScrewJointInput) -> ScrewJointResult:
    """Evaluate a screw joint: compliances, preloads, torque and every check.

    Parameters
    ----------
    inp : ScrewJointInput

    Returns
    -------
    ScrewJointResult
    """
    with warnings.catch_warnings(record=True) as caught:
        warnings.simplefilter("always")
        res = _evaluate(inp)
    msgs = tuple(dict.fromkeys(str(w.message) for w in caught if issubclass(w.category, MethodRangeWarning)))
    for w in caught:
        warnings.warn_explicit(w.message, w.category, w.filename, w.lineno)
    return ScrewJointResult(**{**{f.name: getattr(res, f.name) for f in fields(res)}, "warnings": msgs})


def _evaluate(inp: ScrewJointInput) -> ScrewJointResult:
    th = threads.thread(inp.thread)
    pc = threads.property_class(inp.property_class, th.d)
    hd = threads.head(inp.head, th.size)
    dh = _hole_diameter(th, inp.hole)
    tapped = inp.joint == "tapped"
    if not inp.layers:
        raise InputError("layers", None, "at least one clamped part")
    if pc.stainless:
        warnings.warn("stainless screws: the fatigue limits of VDI 2230 step R9 are for heat-treated steel "
                      "screws; the value shown is indicative only", MethodRangeWarning, stacklevel=3)
    if inp.head == "countersunk":
        warnings.warn("countersunk head: the cone model and the surface pressure use the head's projected "
                      "bearing diameter; VDI 2230 treats countersunk heads separately", MethodRangeWarning,
                      stacklevel=3)
    if th.d > 40.0:
        warnings.warn("VDI 2230 fatigue limits are given for d ≤ 40 mm", MethodRangeWarning, stacklevel=3)
    if inp.tightening in ("yield_controlled", "angle_controlled"):
        warnings.warn("yield- or angle-controlled tightening: VDI 2230 sets the preload by the screw's yield "
                      "point and designs for FM,min; this program's torque-based checks use FM,zul/αA with "
                      "αA from Table A8 (safe for the clamp load) and do not check the preload beyond FM,zul",
                      MethodRangeWarning, stacklevel=3)
    soft = sorted({m.name for m in [la.material for la in inp.layers]
                   + ([inp.housing_material] if tapped and inp.housing_material is not None else [])
                   if m.group in _NON_STEEL_EMBEDDING})
    if soft:
        warnings.warn("embedding amounts of VDI 2230 Table 5 are for compact steel parts; "
                      f"{', '.join(soft)} is not steel (light and copper alloys settle more, plastics "
                      "creep): the embedding loss shown is a lower estimate", MethodRangeWarning, stacklevel=3)

    # --- stack of clamped parts (washer first, if any)
    t = [la.thickness for la in inp.layers]
    E = [la.material.E for la in inp.layers]
    al = [la.material.alpha for la in inp.layers]
    n_parts = len(t)
    bearing_d, bearing_dh = hd.dw, dh
    if inp.washer:
        w = threads.washer(th.size, inp.head)
        t = [w.h, *t]
        E = [_STEEL_WASHER_E, *E]
        al = [_STEEL_WASHER_ALPHA, *al]
        n_parts += 1
        bearing_d, bearing_dh = w.d2, max(dh, w.d1)
    i_gasket = None
    if inp.gasket is not None:
        # the gasket sits in the interface: above the tapped housing, or below the first part of a
        # through-bolted stack; a stiffness given per screw sets its modulus once the cone is known
        i_gasket = len(t) if tapped else (2 if inp.washer else 1)
        g = inp.gasket
        t.insert(i_gasket, g.thickness)
        E.insert(i_gasket, g.modulus if g.modulus is not None else 1.0)
        al.insert(i_gasket, g.alpha)
        n_parts += 1
    t = np.array(t, float)
    E = np.array(E, float)
    al = np.array(al, float)
    z_bot = np.cumsum(t)
    z_top = z_bot - t
    l_K = float(z_bot[-1])

    # --- pattern and per-screw loads
    x, y = _pattern_xy(inp)
    F_A, F_Q = core.pattern_loads(x, y, inp.axial_force, inp.tilting_moment, inp.transverse_force,
                                  inp.torque_about_axis)
    D_A = inp.clamp_outer_diameter if inp.clamp_outer_diameter is not None else _default_outer_diameter(x, y)

    # --- compliances
    k_head = 0.5 if inp.head == "hex" else 0.4
    if tapped:
        E_M, k_nut = inp.housing_material.E, 0.33
    else:
        E_M, k_nut = pc.E, 0.4
    l_shank = min(inp.shank_length, l_K)
    parts = core.screw_compliance(th.d, th.d3, l_shank, l_K - l_shank, pc.E, E_M, k_head, k_nut)
    delta_S = float(parts[-1])
    tphi = float(core.tan_phi(l_K, hd.dw, D_A, tapped))
    D_A_Gr = float(core.limiting_diameter(hd.dw, l_K, tphi, tapped))
    if i_gasket is not None and inp.gasket.stiffness is not None:
        unit = core.clamp_compliance(z_top, z_bot, np.where(np.arange(t.size) == i_gasket, 1.0, E),
                                     hd.dw, dh, D_A, tphi, tapped, l_K)
        E[i_gasket] = float(unit[i_gasket]) * inp.gasket.stiffness
    delta_P = float(np.sum(core.clamp_compliance(z_top, z_bot, E, hd.dw, dh, D_A, tphi, tapped, l_K)))
    # Shigley's frustum (30°, hole = bolt diameter as in the book) and its exponential fit
    d_P_sh = float(np.sum(core.clamp_compliance(z_top, z_bot, E, hd.dw, th.d, D_A if math.isfinite(D_A)
                                                else np.inf, math.tan(math.radians(30.0)), tapped, l_K)))
    E_eq = l_K / float(np.sum(t / E))
    k_exp = float(core.member_stiffness_exponential(E_eq, th.d, l_K))
    n = inp.load_introduction
    phi = float(core.load_factor(n, delta_S, delta_P))
    phi_concentric = phi
    ex = _eccentric(inp, x, y, t, E, l_K, D_A, dh, th, pc, delta_S, delta_P, n, k_head, k_nut, l_shank)
    if ex is not None:
        phi = ex["phi"]   # Φen* replaces Φn in every later step (VDI 2230-1:2015, R3)

    # --- embedding
    load = "shear" if F_Q > 0 else "axial"
    f_thread, f_face, f_inter = threads.embedding_amounts(inp.rz, load)
    n_faces = 1 if tapped else 2
    n_inter = (n_parts if tapped else n_parts - 1)
    f_Z = f_thread + n_faces * f_face + n_inter * f_inter
    if inp.gasket is not None:
        f_Z += inp.gasket.settling
    F_Z = float(core.embedding_loss(f_Z, delta_S, delta_P))

    # --- temperature
    alpha_l = float(np.sum(al * t))
    dT_cold = inp.temperature_min - inp.temperature_assembly
    dT_warm = inp.temperature_max - inp.temperature_assembly
    dF_cold = float(core.thermal_preload_change(alpha_l, pc.alpha, l_K, dT_cold, delta_S, delta_P))
    dF_warm = float(core.thermal_preload_change(alpha_l, pc.alpha, l_K, dT_warm, delta_S, delta_P))
    th_loss = max(0.0, -dF_cold, -dF_warm)
    th_gain = max(0.0, dF_cold, dF_warm)

    # --- required and permissible preloads
    F_KQ = F_Q / (inp.slip_interfaces * inp.mu_interface) if F_Q > 0 else 0.0
    F_Kab = 0.0
    if ex is not None:
        F_Kab = max(0.0, *(float(ecc.clamp_to_prevent_opening(F_A, ex["a"], ex["s"], u, ex["A_D"], ex["I_BT"]))
                           for u in ex["edges"]))
    F_K_req = max(inp.clamp_force_required + F_Kab, F_KQ)
    if isinstance(inp.tightening, str):
        alpha_A = threads.tightening_factor(inp.tightening)[1]
    else:
        alpha_A = float(inp.tightening)
    F_M_min = F_K_req + (1.0 - phi) * F_A + F_Z + th_loss
    F_M_max = alpha_A * F_M_min
    mu_G_min, mu_G_max = inp.mu_thread
    mu_K_min, mu_K_max = inp.mu_head
    ds = th.ds
    F_M_zul = float(core.permissible_assembly_preload(th.As, ds, th.d2, th.P, mu_G_min, pc.Rp02,
                                                      inp.utilisation))
    # friction diameter of the head's own bearing face: on the washer (its hole) when there is one
    D_Km = 0.5 * (hd.dw + (bearing_dh if inp.washer else dh))
    M_A = float(core.tightening_torque(F_M_zul, th.P, th.d2, mu_G_min, mu_K_min, D_Km))
    M_A_hi = float(core.tightening_torque(F_M_zul, th.P, th.d2, mu_G_max, mu_K_max, D_Km))
    F_at_mu_max = F_M_zul * M_A / M_A_hi
    T_sh = float(core.torque_shigley(threads.shigley_torque_factor("zinc_plated"), F_M_zul, th.d))

    # --- service
    F_KR = F_M_zul / alpha_A - (1.0 - phi) * F_A - F_Z - th_loss
    F_S_max = F_M_zul + phi * F_A + th_gain
    W_p = math.pi * ds ** 3 / 16.0
    tau = float(core.thread_torque(F_M_zul, th.P, th.d2, mu_G_min)) / W_p
    sig_red = float(core.reduced_stress(F_S_max / th.As, tau, 0.5))
    S_F = pc.Rp02 / sig_red

    # --- surface pressure
    first = inp.layers[0].material
    pG, _ = _limits_for(first, "pG") if not inp.washer else _limits_for(first, "pG")
    A_p = math.pi / 4.0 * (bearing_d ** 2 - bearing_dh ** 2)
    F_p = max(F_M_zul, F_M_zul - F_Z + phi * F_A + th_gain)
    p = F_p / A_p
    p_nut = pG_nut = math.nan
    if not tapped:
        last = inp.layers[-1].material
        pG_nut, _ = _limits_for(last, "pG")
        nut_dw = threads.head("hex", th.size).dw if ("hex", th.size) in threads._heads() else hd.dw
        p_nut = F_p / (math.pi / 4.0 * (nut_dw ** 2 - dh ** 2))

    # --- engagement
    L_min = math.nan
    if tapped:
        _, tauB_M = _limits_for(inp.housing_material, "tauB")
        L_min = float(core.min_engagement(th.As, pc.Rm, _TAU_RATIO_SCREW * pc.Rm, tauB_M,
                                          th.d, th.d2, th.P)[0]) * _ENGAGEMENT_MARGIN

    # --- eccentric joint: opening limit and bending of the screw
    sig_bend = 0.0
    F_V_min = F_M_zul / alpha_A - F_Z - th_loss
    F_Aab = math.inf if phi >= 1.0 else max(F_V_min, 0.0) / (1.0 - phi)
    opening_edge = ""
    if ex is not None:
        lims = [float(ecc.opening_limit(max(F_V_min, 0.0), phi, ex["a"], ex["s"], u, ex["A_D"], ex["I_BT"]))
                for u in ex["edges"]]
        F_Aab = min(lims)
        opening_edge = ("the edge on the load side" if lims[0] <= lims[1] else "the edge away from the load")
        if ex["where"]:
            opening_edge += f", at {ex['where']}"
        _, sb = ecc.screw_stress_eccentric(F_A, phi, ex["a"], ex["s"], l_K, ex["l_ers"], pc.E, ex["E_P"],
                                           th.ds, ex["I_Bers"])
        sig_bend = float(sb)

    # --- fatigue (load cycling between 0 and F_A)
    sigma_a = phi * F_A / (2.0 * th.As) + sig_bend / 2.0
    if inp.rolled_after_heat_treatment:
        # mean screw force at the largest preload in service (after embedding): the lower, safe limit
        F_Sm = F_M_zul - F_Z + 0.5 * phi * F_A
        sigma_AS = max(float(core.fatigue_limit_rolled_after(th.d, F_Sm, th.As * pc.Rp02)),
                       float(core.fatigue_limit_rolled_before(th.d)))
    else:
        sigma_AS = float(core.fatigue_limit_rolled_before(th.d))
    S_D = sigma_AS / sigma_a if sigma_a > 0 else math.inf

    checks = [
        Check("assembly preload", F_M_max, F_M_zul, "<=", "N", "VDI 2230-1:2015, R5–R7",
              f"αA·FM,min with αA = {alpha_A:g} against FM,zul at ν = {inp.utilisation:g}"),
        Check("working stress (yield safety)", S_F, 1.0, ">=", "", "VDI 2230-1:2015, R8",
              f"σred,B = {sig_red:.0f} MPa against Rp0.2 = {pc.Rp02:g} MPa"),
        Check("residual clamp load (separation)", F_KR, inp.clamp_force_required, ">=", "N",
              "VDI 2230-1:2015, R2, R13", "least clamp load left in service at the smallest preload"),
    ]
    if F_Q > 0:
        checks.append(Check("residual clamp load (slip)", F_KR, F_KQ, ">=", "N", "VDI 2230-1:2015, R12",
                            f"FQ = {F_Q:.0f} N per screw, μT = {inp.mu_interface:g}, qF = {inp.slip_interfaces}"))
    checks.append(Check("surface pressure under head", p, pG, "<=", "MPa", "VDI 2230-1:2015, R10, Table A9",
                        f"on {first.name}" + (" under the washer" if inp.washer else "")))
    if not tapped:
        checks.append(Check("surface pressure under nut", p_nut, pG_nut, "<=", "MPa",
                            "VDI 2230-1:2015, R10, Table A9", f"on {inp.layers[-1].material.name}"))
    if tapped:
        checks.append(Check("length of engagement", inp.engagement, L_min, ">=", "mm",
                            "FED-STD-H28/2B App. A; VDI 2230-1:2015, R11",
                            f"housing {inp.housing_material.name}"))
    if F_A > 0:
        checks.append(Check("fatigue of the thread", S_D, _FATIGUE_SAFETY, ">=", "", "VDI 2230-1:2015, R9",
                            f"σa = {sigma_a:.1f} MPa against σAS = {sigma_AS:.1f} MPa"
                            + (f" (bending share {sig_bend / 2.0:.1f} MPa)" if ex is not None else "")))
    if ex is not None:
        checks.append(Check("no opening at the loaded edge", F_A, F_Aab, "<=", "N",
                            "VDI 2230-1:2015, 3.2.3, step R2",
                            f"opening limit FAab at FV,min = {F_V_min:.0f} N; opens first at {opening_edge}; "
                            f"Φen* = {phi:.3f} (s_sym = {ex['s']:g} mm, a = {ex['a']:g} mm)"))
    gasket_p = math.nan
    if inp.gasket is not None and inp.gasket.seating_pressure is not None:
        gasket_p = F_KR / (inp.gasket.area / inp.count)
        checks.append(Check("gasket sealing pressure", gasket_p, inp.gasket.seating_pressure, ">=", "MPa",
                            "VDI 2230-1:2015, step R2 (FKP)",
                            f"smallest residual clamp load {F_KR:.0f} N on {inp.gasket.area / inp.count:.0f} "
                            "mm² of gasket per screw"))

    return ScrewJointResult(
        name=inp.name, thread=th.designation, property_class=pc.name, d=th.d, P=th.P, d2=th.d2, d3=th.d3,
        As=th.As, Rp02=pc.Rp02, Rm=pc.Rm, dw=hd.dw, dh=dh, l_K=l_K, D_A=float(D_A), tan_phi=tphi,
        D_A_Gr=D_A_Gr, delta_S=delta_S, delta_P=delta_P, load_introduction=n, load_factor=phi_concentric, F_A=F_A,
        F_Q=F_Q, f_Z=f_Z, F_Z=F_Z, dF_th_cold=dF_cold, dF_th_warm=dF_warm, F_K_required=F_K_req,
        F_KQ_required=F_KQ, alpha_A=alpha_A, F_M_zul=F_M_zul, F_M_min=F_M_min, F_M_max=F_M_max,
        tightening_torque=M_A, tightening_torque_mu_max=M_A_hi, preload_at_mu_max=F_at_mu_max,
        torque_shigley=T_sh, F_KR_min=F_KR, F_S_max=F_S_max, sigma_red_B=sig_red, yield_safety=S_F,
        surface_pressure=p, p_G=pG, surface_pressure_nut=p_nut, p_G_nut=pG_nut,
        engagement=inp.engagement if inp.engagement is not None else math.nan, engagement_min=L_min,
        sigma_a=sigma_a, sigma_AS=sigma_AS, fatigue_safety=S_D, k_frustum_shigley=1.0 / d_P_sh,
        k_exponential_shigley=k_exp, checks=tuple(checks), load_factor_eccentric=phi,
        load_factor_concentric=phi_concentric, bending_stress=sig_bend, opening_force=F_Aab,
        clamp_for_opening=F_Kab, opening_edge=opening_edge,
        beta_P=ex["beta_P"] if ex is not None else 0.0, gasket_pressure=gasket_p)


METHOD_NOTES += [(f"{step} (where the joint is eccentric or has a gasket)", ref)
                 for step, ref in ECCENTRIC_NOTES + GASKET_NOTES]
