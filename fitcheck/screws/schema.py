"""The ``[[screws]]`` table: its keys, the method notes, and the parsing of a joint's input.

Part of :mod:`fitcheck.screws` (schema and parsing; evaluation in :mod:`fitcheck.screws.evaluate`,
results in :mod:`fitcheck.screws.results`).
"""


from __future__ import annotations

import math
import warnings
from collections.abc import Mapping
from dataclasses import dataclass, field, fields

import numpy as np

from .. import materials, threads
from ..errors import ErrorCollector, InputError, MethodRangeWarning, did_you_mean
from ..materials import Material
from ..units import number, temperature_c, to_core

#: Plausible range of thread and head friction coefficients accepted as input.
MU_RANGE = (0.04, 0.5)

#: Keys of a ``[[screws]]`` table and what each means (with its unit).
KEYS: dict[str, str] = {
    "name": "name of the joint (text)",
    "thread": "thread designation: 'M6', 'M8x1', '#10-24 UNC', '1/4-20 UNC' (ISO 261 / ASME B1.1)",
    "property_class": "property class or grade: 4.6 … 12.9 (ISO 898-1), A2-70, A4-70, A4-80 (ISO 3506-1), "
                      "'SAE 2', 'SAE 5', 'SAE 8' (SAE J429, 1/4 in and up), 'ASTM A574' (inch socket head cap "
                      "screws, #0 and up)",
    "head": "head type: hex (ISO 4017), socket (ISO 4762), pan (ISO 7045), button (ISO 7380-1), "
            "countersunk (ISO 10642); default hex",
    "hole": "clearance hole: fine, medium, coarse (ISO 273; inch sizes ASME B18.2.8 close, normal, loose — either "
            "name) or a diameter such as '6.6 mm'; default medium",
    "washer": "plain washer under the head (ISO 7089 with hex heads, ISO 7092 otherwise; inch: ASME B18.22.1 Type B "
              "regular / narrow): true/false; default false",
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
    "transverse_load": "kind of transverse load for the slip safety: 'static' or 'alternating' (VDI 2230-1:2015, "
                       "R12); default 'alternating' (the safe side)",
    "slip_safety": "required safety against slip S_G; default 1.2 for a static, 1.8 for an alternating "
                   "transverse load (VDI 2230-1:2015, R12)",
    "engagement_allowance": "length added to the effective engagement m_eff for the countersink of the tapped "
                            "hole and the chamfered screw end [length]; default 2 pitches",
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

#: Required safety against slip by kind of transverse load (VDI 2230-1:2015, step R12).
SLIP_SAFETY = {"static": 1.2, "alternating": 1.8}
#: Required safety of the screw against shearing off if the joint slips (VDI 2230-1:2015, R12).
SHEAR_SAFETY = 1.1
NM_TO_LBF_IN = 1000.0 / (4.4482216152605 * 25.4)   # N·m → lbf·in (NIST SP 811)

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
     "of the pattern, never below the head's bearing diameter dw (a pattern whose heads would overlap is "
     "refused). Effect of the cap: beyond DA,Gr δP is the full cone's; without the cap tan φ and the "
     "clamp stiffness would keep growing with D_A: Φ would fall (the cap is safe for screw force and "
     "fatigue) while the embedding loss and the clamped parts' share of FA would grow (the cap gives a "
     "few per cent more FKR,min: unsafe side, stated)",
     "VDI 2230-1:2015, 5.1.2.2–5.1.2.3"),
    ("Shigley's frustum (30°) and the exponential fit of the member stiffness are computed alongside "
     "for comparison only; a tapped joint as Shigley's cap screw: effective grip l' = h + d/2 (tapped part "
     "at least d thick), two frusta meeting at l'/2, the lower one partly in the housing",
     "Shigley, 10th ed., Sec. 8-5, eqs. (8-20), (8-23)"),
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
    ("Required clamp load FKerf = max(required clamp load, S_G·FQ/(qF·μT)); FM,min = FKerf + (1 − Φ)·FA + "
     "FZ + thermal loss; FM,max = αA·FM,min", "VDI 2230-1:2015, steps R1, R2, R5, R6, R12"),
    ("Preload scatter: αA = FM,max/FM,min. One torque gives FM(μmin)/FM(μmax) = α_μ = (0.16 P + 0.58 d2 "
     "μG,max + μK,max DKm/2)/(0.16 P + 0.58 d2 μG,min + μK,min DKm/2); the scatter used is "
     "αA = max(αA of Table A8, α_μ), so the smallest preload FM,set/αA never exceeds the preload of the "
     "same torque at the highest friction; the result says which of the two governs",
     "VDI 2230-1:2015, 5.4.3, 5.5.1, Table A8; ISO 16047"),
    ("Permissible assembly preload FM,zul = A0·ν·Rp0.2/√(1 + 3[3/2·d2/d0·(P/(π d2) + 1.155 μG,min)]²), "
     "d0 = dS; check FM,max ≤ FM,zul", "VDI 2230-1:2015, 5.5.1, step R7; Table A1"),
    ("Tightening torque MA = FM,zul·(0.16 P + 0.58 d2 μG,min + μK,min·DKm/2), DKm = (dw + dh)/2 "
     "(with a washer: the washer's hole); the wrench setting is MA rounded DOWN to a settable step "
     "(0.05 N·m below 5 N·m, 0.1 below 20, 0.5 below 100, 1 above; lbf·in likewise) and every preload "
     "after it is scaled by M_set/MA; one instruction 'Tighten to X N·m (Y lbf·in)' with method and "
     "preload range. Shigley's T = K·F·d (K = 0.2) is a rough cross-check only, not a setting",
     "VDI 2230-1:2015, step R13; ISO 16047; Shigley, 10th ed., eq. (8-27), Table 8-15"),
    ("Working stress: FS,max = FM,zul + Φ·FA + thermal gain; σred,B = √(σ² + 3(kτ·τ)²) with kτ = 0.5; "
     "yield safety Rp0.2/σred,B ≥ 1", "VDI 2230-1:2015, step R8"),
    ("Residual clamp load FKR,min = FM,set/αA − (1 − Φ)·FA − FZ − thermal loss ≥ required clamp load "
     "(≥ 0: no separation)", "VDI 2230-1:2015, step R13 (R2)"),
    ("Slip: S_G = FKR,min·qF·μT/FQ ≥ 1.2 (static) or 1.8 (alternating transverse load, the default); "
     "the screw in shear if the joint slips: τQ = FQ/Aτ (Aτ = π d3²/4 when the thread reaches the "
     "interface, else the shank) against τB = (τB/Rm)·Rm (Table 7), safety ≥ 1.1",
     "VDI 2230-1:2015, step R12, Table 7"),
    ("Surface pressure p = max(FM,zul, FV,max + Φ·FA + thermal gain)/Ap, Ap = π/4·(dw² − dh²) under the "
     "head; under a washer the load spreads through it with the deformation cone's angle: "
     "Ap = π/4·(min(dW, dw + 2 hS tan φ)² − dh²), not the whole washer; under the nut of a through bolt; "
     "against p_G of the material touched", "VDI 2230-1:2015, step R10, 5.1.2 (cone angle), Table A9"),
    ("Length of engagement in a tapped housing: shear areas of the internal thread (at d min, D2 max) and "
     "of the screw thread (at D1 max, d2 min) with the 6g/6H limits of ISO 965-1; strength ratio R_S; "
     "nut dilation C1 (1 in a tapped hole), thread bending C2 (screw) and C3 (internal thread), each "
     "taken ≤ 1; m_eff = Rm·As/min(τBM·ASGM·C1·C3, τBS·ASGS·C1·C2) per mm; the length for the "
     "drawing m_ges = m_eff + allowance for the countersink and the chamfered screw end (default 2 P, "
     "key engagement_allowance); τB of the housing, τB/Rm of the screw from Table 7; Unified threads "
     "use the ISO 965-1 formulas for their d and P (an estimate of class 2A/2B); nuts of matching class "
     "(ISO 898-2) are not checked", "VDI 2230-1:2015, 5.5.5, step R11; ISO 965-1"),
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
    transverse_load: str = "alternating"
    slip_safety: float | None = None
    engagement_allowance: float | None = None
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
            series = threads.HOLE_SERIES + tuple(threads.HOLE_ALIASES)
            if isinstance(h, str) and h.strip().lower() in series:
                v["hole"] = h.strip().lower()
            elif isinstance(h, str) and h.strip().isalpha():
                errs.add(InputError(f"{field}.hole", h, "fine, medium, coarse (inch: close, normal, loose) or a "
                                    "diameter such as '6.6 mm'", did_you_mean(h, series)))
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
        v["transverse_load"] = get("transverse_load", _load_kind, "alternating")
        v["slip_safety"] = get("slip_safety", lambda x, k: number(x, k, lo=1.0, hi=10.0))
        v["engagement_allowance"] = get("engagement_allowance",
                                        lambda x, k: to_core(x, "length", k, lo=0.0, hi=100.0))
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
        out["transverse_load"] = self.transverse_load
        if self.slip_safety is not None:
            out["slip_safety"] = self.slip_safety
        if self.engagement_allowance is not None:
            out["engagement_allowance"] = f"{self.engagement_allowance!r} mm"
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


def _load_kind(x, k):
    kind = str(x).strip().lower()
    if kind not in SLIP_SAFETY:
        raise InputError(k, x, "'static' or 'alternating'", did_you_mean(kind, SLIP_SAFETY))
    return kind


def _count(x, k):
    if isinstance(x, bool) or not isinstance(x, int | float) or not 1 <= x <= 1000 or x != int(x):
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
    if da is not None and da < hd.dw:
        errs.add(InputError(f"{field}.clamp_outer_diameter", m.get("clamp_outer_diameter"),
                            f"a diameter not below the head's bearing diameter dw = {hd.dw:g} mm (the substitute "
                            "body carries the whole bearing face)"))
    # screws of a pattern must not stand closer than their heads (or washers) are wide
    count = v.get("count") or 1
    if count >= 2 and (v.get("bolt_circle") is not None or v.get("positions") is not None):
        x, y = _pattern_xy_raw(v.get("positions"), v.get("bolt_circle"), count)
        gap = _default_outer_diameter(x, y)
        width, what = hd.dk, f"head diameter dk = {hd.dk:g} mm"
        if v.get("washer"):
            try:
                w = threads.washer(th.size, v["head"])
                if w.d2 > width:
                    width, what = w.d2, f"washer outside diameter {w.d2:g} mm"
            except InputError:
                pass
        if gap < width:
            key = "positions" if v.get("positions") is not None else "bolt_circle"
            errs.add(InputError(f"{field}.{key}", m.get(key), f"screws at least one {what} apart (the "
                                f"heads would overlap: the closest two are {gap:.3g} mm apart)"))




def _pattern_xy_raw(positions, bolt_circle, count) -> tuple[np.ndarray, np.ndarray]:
    if positions is not None:
        p = np.array(positions, float)
        return p[:, 0], p[:, 1]
    if bolt_circle is not None and count > 1:
        ang = 2.0 * np.pi * np.arange(count) / count
        r = bolt_circle / 2.0
        return r * np.cos(ang), r * np.sin(ang)
    return np.zeros(count), np.zeros(count)

def _default_outer_diameter(x, y) -> float:
    if x.size < 2:
        return math.inf
    dx = x[:, None] - x[None, :]
    dy = y[:, None] - y[None, :]
    dist = np.hypot(dx, dy)
    dist[np.diag_indices(x.size)] = np.inf
    return float(dist.min())


METHOD_NOTES += [(f"{step} (where the joint is eccentric or has a gasket)", ref)
                 for step, ref in ECCENTRIC_NOTES + GASKET_NOTES]
