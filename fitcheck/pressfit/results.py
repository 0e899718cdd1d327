"""The result of one press fit: its cases and operating states, the checks, the wall profile and
the JSON fields. Part of :mod:`fitcheck.pressfit`.
"""

from __future__ import annotations

import math
from dataclasses import dataclass, fields

import numpy as np

from .. import shaft as _shaft
from ..checks import Check
from ..core import elastoplastic as _ep
from ..core import lame
from ..materials import Material
from .schema import DEFAULTS, RPM

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
    forces [N], temperatures [°C], speed [rad/s]. ``axial_force`` is the axial force the slip check
    holds: ``axial_force_given`` plus, for a helical gear hub with ``mesh_thrust = 'add'``, the
    mesh's ``mesh_axial_force`` |F_a|.
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
    warnings: tuple[str, ...] = ()  # cautions: outside a method's range, an input to look at
    notes: tuple[str, ...] = ()     # information: the loads used, what the method assumes
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
    axial_force_given: float | None = None  # [N] the input's axial_force (None: = axial_force)
    mesh_axial_force: float = 0.0           # [N] |F_a| of a helical gear hub's mesh, from the torque
    mesh_thrust: str = "add"                # whether mesh_axial_force is in axial_force ('add'/'ignore')

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
            "axial_force_given_N": self.axial_force if self.axial_force_given is None else self.axial_force_given,
            "mesh_axial_force_N": self.mesh_axial_force,
            "mesh_thrust": self.mesh_thrust,
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
            "notes": list(self.notes),
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
