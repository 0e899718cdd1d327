"""``fitcheck screws case.toml`` — housing-screw joints of a case file after VDI 2230 Part 1:2015."""

from __future__ import annotations

import math
import sys
import warnings
from collections.abc import Mapping

from .. import CAUTION
from ..errors import ErrorCollector, InputError, InputErrors, MethodRangeWarning
from ..screws import KEYS, ScrewJointInput, evaluate
from ..tomlread import read_toml
from . import EXIT_FAILED_CHECK, EXIT_OK, print_json, print_table

COMMAND = "screws"
HELP = "check the [[screws]] joints of a case file (preload, torque, clamp load, pressure, engagement)"

_CONDITION_KEYS = ("temperature_min", "temperature_max", "temperature_assembly")


#: JSON keys of each joint added after version 1 (the older keys keep their names and meaning).
NEW_JSON_KEYS = {
    "tightening_instruction": "one line for the drawing: wrench setting in N·m and lbf·in, method, preload range",
    "tightening_torque_set_Nm": "wrench setting: MA rounded down to a settable step [N·m]",
    "tightening_torque_set_lbf_in": "the same setting in lbf·in, rounded down",
    "preload_set_max_N / preload_set_min_N": "preload of the setting at the lowest friction / divided by αA [N]",
    "tightening_factor_method / tightening_factor_friction": "αA of Table A8 / scatter of the friction range",
    "preload_scatter_governs": "'tightening method' or 'friction range' (tightening_factor is the larger)",
    "slip_safety / slip_safety_required": "S_G = FKR,min·qF·μT/FQ and its limit (R12)",
    "screw_shear_stress_MPa / screw_shear_strength_MPa / screw_shear_safety": "the screw in shear if the joint slips",
    "engagement_effective_min_mm / engagement_allowance_mm": "m_eff of R11 and the countersink/runout allowance",
    "engagement_strength_ratio, engagement_C1/C2/C3, engagement_strips_first": "R11 factors",
    "bearing_diameter_effective_mm": "diameter of the pressure area on the part (under a washer: load spread)",
    "shigley_effective_grip_mm": "Shigley's grip l' = h + d/2 of a tapped joint (comparison only)",
}


def _epilog() -> str:
    import textwrap

    lines = ["keys of a [[screws]] table:"]
    for k, v in KEYS.items():
        lines += textwrap.wrap(v, 100, initial_indent=f"  {k:28s} ", subsequent_indent=" " * 31)
    lines.append("")
    lines.append("JSON keys per joint added to the documented ones (README):")
    for k, v in NEW_JSON_KEYS.items():
        lines += textwrap.wrap(v, 100, initial_indent=f"  {k}: ", subsequent_indent="      ")
    return "\n".join(lines)


def add_arguments(p) -> None:
    import argparse

    p.formatter_class = argparse.RawDescriptionHelpFormatter
    p.epilog = _epilog()
    p.add_argument("case", help="TOML case file with one or more [[screws]] tables")
    p.add_argument("--json", action="store_true", help="print one JSON object")


def load_inputs(data: Mapping, source: str = "case file") -> list[ScrewJointInput]:
    """The :class:`ScrewJointInput` of every ``[[screws]]`` table, ``[conditions]`` temperatures as defaults."""
    tabs = data.get("screws")
    if tabs is None:
        raise InputError(source, "no [[screws]] table", "a case file with at least one [[screws]] table")
    if isinstance(tabs, Mapping):
        tabs = [tabs]
    if not isinstance(tabs, list):
        raise InputError("screws", tabs, "an array of tables [[screws]]")
    cond = data.get("conditions", {})
    if not isinstance(cond, Mapping):
        raise InputError("conditions", cond, "a [conditions] table")
    defaults = {k: cond[k] for k in _CONDITION_KEYS if k in cond}
    errs = ErrorCollector()
    out = []
    for i, t in enumerate(tabs):
        label = f"screws[{t.get('name', i + 1) if isinstance(t, Mapping) else i + 1}]"
        if not isinstance(t, Mapping):
            errs.add(InputError(label, t, "a table of keys: " + ", ".join(KEYS)))
            continue
        try:
            out.append(ScrewJointInput.from_mapping({**defaults, **t}, label))
        except (InputError, InputErrors) as exc:
            errs.add(exc)
    errs.raise_if_any()
    return out


def _f(v: float, digits: int = 4) -> str:
    return "–" if v is None or (isinstance(v, float) and not math.isfinite(v)) else f"{v:.{digits}g}"


def _describe(inp: ScrewJointInput) -> str:
    kind = "tapped into " + inp.housing_material.name if inp.joint == "tapped" and inp.housing_material \
        else "through bolt with nut"
    parts = " + ".join(f"{la.thickness:g} mm {la.material.name}" for la in inp.layers)
    return f"{inp.count} × {inp.thread} {inp.property_class} {inp.head} head, {kind}; clamped: {parts}"


def run(args) -> int:
    data = read_toml(args.case)
    inputs = load_inputs(data, args.case)
    with warnings.catch_warnings():
        # the method-range warnings travel with each result (r.warnings) and are printed below
        warnings.simplefilter("ignore", MethodRangeWarning)
        results = [evaluate(inp) for inp in inputs]
    ok = all(r.ok for r in results)
    if args.json:
        print_json({"joints": [r.to_dict() for r in results], "ok": ok, "caution": CAUTION})
        return EXIT_OK if ok else EXIT_FAILED_CHECK
    out = sys.stdout
    for inp, r in zip(inputs, results, strict=True):
        muG, muK = inp.mu_thread, inp.mu_head
        method = inp.tightening if isinstance(inp.tightening, str) else "given"
        out.write(f"{r.name}: {r.thread} {r.property_class}  (VDI 2230 Part 1:2015)\n")
        out.write(f"  {_describe(inp)}\n")
        service = (f"service {inp.temperature_min:g}…{inp.temperature_max:g} °C"
                   if inp.temperature_min != inp.temperature_max else "no temperature change")
        out.write(f"  μG {muG[0]:g}…{muG[1]:g}, μK {muK[0]:g}…{muK[1]:g}; assembled at "
                  f"{inp.temperature_assembly:g} °C, {service}\n")
        out.write(f"  {r.tightening_instruction}\n\n")
        print_table(["quantity", "value", "unit"], [
            ["tightening torque MA (set point)",
             f"{r.tightening_torque_set / 1000:g} ({r.tightening_torque_set_lbf_in:g} lbf·in)", "N·m"],
            ["  MA for FM,zul at μ min (before rounding down)", _f(r.tightening_torque / 1000, 4), "N·m"],
            ["  gives FM,zul at μ min / preload at μ max (friction only)", f"{_f(r.F_M_zul)} / {_f(r.preload_at_mu_max)}", "N"],
            [f"  tightening factor αA ({method})", f"{r.alpha_A:.3g}", ""],
            [f"    Table A8 / friction range: {r.scatter_governs} governs",
             f"{r.alpha_A_method:g} / {r.alpha_A_friction:.3g}", ""],
            ["  smallest assembly preload FM,set/αA", _f(r.preload_set_min), "N"],
            [f"FM,zul (ν = {inp.utilisation:g}, μG = {muG[0]:g})", _f(r.F_M_zul), "N"],
            ["FM,min needed / αA·FM,min needed", f"{_f(r.F_M_min)} / {_f(r.F_M_max)}", "N"],
            ["Shigley T = K·F·d, K = 0.2 (rough cross-check, not a setting)", _f(r.torque_shigley / 1000, 3), "N·m"],
            ["stress area As", _f(r.As), "mm²"],
            ["screw / clamp stiffness", f"{_f(r.screw_stiffness / 1000)} / {_f(r.clamp_stiffness / 1000)}", "kN/mm"],
            ["load factor Φ (load introduction n)", f"{r.load_factor:.3f} ({r.load_introduction:g})", ""],
            ["axial / transverse load per screw", f"{_f(r.F_A)} / {_f(r.F_Q)}", "N"],
            ["embedding loss FZ", _f(r.F_Z), "N"],
            [f"preload change at {inp.temperature_min:g} / {inp.temperature_max:g} °C",
             f"{_f(r.dF_th_cold)} / {_f(r.dF_th_warm)}", "N"],
            ["residual clamp load FKR,min", _f(r.F_KR_min), "N"],
            ["σred,B / yield safety", f"{_f(r.sigma_red_B)} / {r.yield_safety:.2f}", "MPa / –"],
            ["surface pressure / pG", f"{_f(r.surface_pressure)} / {_f(r.p_G)}", "MPa"],
            ["engagement / minimum (m_eff + allowance, R11)",
             f"{_f(r.engagement)} / {_f(r.engagement_min)} ({_f(r.engagement_effective_min)} + "
             f"{_f(r.engagement_allowance, 3)})", "mm"],
            ["slip safety S_G / required", f"{_f(r.slip_safety, 3)} / {_f(r.slip_safety_required, 3)}", ""],
            ["fatigue σa / σAS", f"{_f(r.sigma_a)} / {_f(r.sigma_AS)}", "MPa"],
        ])
        out.write("\n")
        print_table(["check", "value", "limit", "unit", "verdict", "reference"], [
            [c.name, _f(c.value), f"{c.sense} {_f(c.limit)}", c.unit, "pass" if c.passed else "FAIL",
             c.reference] for c in r.checks])
        for c in r.checks:
            if c.note:
                out.write(f"  {c.name}: {c.note}\n")
        for w in r.warnings:
            out.write(f"warning: {w}\n")
        out.write(f"=> {'all checks pass' if r.ok else 'A CHECK FAILS'}\n\n")
    out.write(f"{CAUTION}\n")
    return EXIT_OK if ok else EXIT_FAILED_CHECK
