"""The result of one bearing seat. Part of :mod:`fitcheck.bearings`.
"""

from __future__ import annotations

import json
import math
from dataclasses import dataclass, fields

import numpy as np

from .. import shaft as _shaft
from ..checks import Check, all_passed

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
