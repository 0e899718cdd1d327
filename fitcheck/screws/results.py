"""The result of one screw joint: plain floats in core units, the checks and the joint diagram.

Part of :mod:`fitcheck.screws`.
"""


from __future__ import annotations

import json
import math
from dataclasses import dataclass

from ..checks import Check, all_passed


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
    # preload scatter (VDI 2230-1:2015, 5.4.3): the method's αA, the friction range's, which governs
    alpha_A_method: float = math.nan
    alpha_A_friction: float = math.nan
    scatter_governs: str = ""
    # the wrench setting and the preloads it gives
    tightening_torque_set: float = math.nan
    tightening_torque_set_lbf_in: float = math.nan
    preload_set_max: float = math.nan
    preload_set_min: float = math.nan
    tightening_instruction: str = ""
    # slip (R12)
    slip_safety: float = math.nan
    slip_safety_required: float = math.nan
    transverse_load: str = ""
    shear_stress: float = math.nan
    shear_strength: float = math.nan
    shear_safety: float = math.nan
    # surface pressure under a washer: diameter the load spreads to
    bearing_diameter_effective: float = math.nan
    # engagement (R11)
    engagement_effective_min: float = math.nan
    engagement_allowance: float = math.nan
    strength_ratio: float = math.nan
    C1: float = math.nan
    C2: float = math.nan
    C3: float = math.nan
    engagement_strips: str = ""
    shigley_grip: float = math.nan
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
            ``F_V`` smallest preload in service, FM,set/αA − FZ − thermal loss [N] (FM,set: the
            preload of the wrench setting at the lowest friction, FM,zul·M_set/M_A);
            ``f_S``, ``f_P`` elongation of the screw and compression of the clamped parts under
            F_V [mm]; ``F_S`` screw force under load, F_V + Φ·F_A [N]; ``f_A`` added elongation
            Φ·F_A·δS [mm]; ``F_KR`` residual clamp load F_V − (1 − Φ)·F_A [N]; ``F_A`` [N];
            ``F_M_zul`` [N].
        """
        th_loss = max(0.0, -self.dF_th_cold, -self.dF_th_warm)
        F_set = self.preload_set_max if math.isfinite(self.preload_set_max) else self.F_M_zul
        F_V = max(F_set / self.alpha_A - self.F_Z - th_loss, 0.0)
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
            "tightening_factor_method": self.alpha_A_method,
            "tightening_factor_friction": self.alpha_A_friction,
            "preload_scatter_governs": self.scatter_governs,
            "tightening_torque_set_Nm": self.tightening_torque_set / 1000.0,
            "tightening_torque_set_lbf_in": self.tightening_torque_set_lbf_in,
            "preload_set_max_N": self.preload_set_max, "preload_set_min_N": self.preload_set_min,
            "tightening_instruction": self.tightening_instruction,
            "slip_safety": self.slip_safety, "slip_safety_required": self.slip_safety_required,
            "transverse_load": self.transverse_load, "screw_shear_stress_MPa": self.shear_stress,
            "screw_shear_strength_MPa": self.shear_strength, "screw_shear_safety": self.shear_safety,
            "bearing_diameter_effective_mm": self.bearing_diameter_effective,
            "engagement_effective_min_mm": self.engagement_effective_min,
            "engagement_allowance_mm": self.engagement_allowance,
            "engagement_strength_ratio": self.strength_ratio, "engagement_C1": self.C1,
            "engagement_C2": self.C2, "engagement_C3": self.C3,
            "engagement_strips_first": self.engagement_strips,
            "shigley_effective_grip_mm": self.shigley_grip,
        }

    def to_json(self) -> str:
        """:meth:`to_dict` as strict JSON (NaN and infinities become null)."""
        from ..cli import clean_json

        return json.dumps(clean_json(self.to_dict()), allow_nan=False)


