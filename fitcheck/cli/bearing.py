"""``fitcheck bearing 6204 --shaft k5 --housing H7 [--group C3] [--json]`` and
``fitcheck bearing --case case.toml``: seat fits and operating clearance of rolling bearings.

With a designation, one seat is evaluated from the options; with ``--case``
every ``[[bearing]]`` table of the file is, a top-level ``[conditions]`` table
giving defaults for the keys a bearing seat knows (``temperature_inner`` …).
Exit code 0 when every check passes, 1 when a check fails, 2 for bad input.
"""

from __future__ import annotations

import sys
from collections.abc import Mapping

from .. import CAUTION
from ..errors import ErrorCollector, InputError, InputErrors
from . import EXIT_FAILED_CHECK, EXIT_OK, print_json, print_table

COMMAND = "bearing"
HELP = "seat fits, ring stresses and operating radial clearance of a ball bearing (ISO 15/492/5753-1)"

#: JSON keys the command always prints (a stable interface for scripts).
JSON_KEYS = (
    "name", "designation", "bore_mm", "outside_mm", "width_mm", "tolerance_class",
    "shaft_class", "housing_class", "recommended_shaft", "recommended_housing",
    "bore_deviation_um", "outside_deviation_um", "shaft_interference_um", "housing_clearance_um",
    "shaft_interference_operating_um", "housing_interference_operating_um",
    "contact_pressure_inner_MPa", "contact_pressure_outer_MPa", "clearance_group",
    "initial_clearance_um", "fitup_reduction_um", "thermal_reduction_um", "clearance_reduction_um",
    "operating_clearance_um", "operating_clearance_mid_um", "smallest_passing_group", "ring_hoop_stress_max_MPa",
    "housing_hoop_stress_max_MPa", "axial_capacity_inner_N", "axial_capacity_outer_N", "notes",
    "checks", "ok",
    "clearance_state", "clearance_mean_um", "clearance_probable_min_um", "clearance_sigma_um",
    "clearance_probability_below", "clearance_distribution", "clearance_worst_case_um",
    "smallest_group_worst_case", "clearance_states", "temperature_min_C", "temperature_max_C", "headline",
)
JSON_KEYS += ("shaft_fatigue_safety", "shaft_static_safety", "notch_factor_bending", "notch_factor_torsion",
              "shaft_seat")  # DIN 743: the safeties, and the loads and factors behind them

_OPTIONS = {  # option dest -> [[bearing]] key
    "shaft": "shaft", "housing": "housing", "tolerance_class": "tolerance_class",
    "group": "clearance_group", "load": "load", "load_ratio": "load_ratio",
    "load_level": "load_level", "shaft_material": "shaft_material",
    "housing_material": "housing_material", "housing_outer_diameter": "housing_outer_diameter",
    "housing_wall": "housing_wall", "shaft_bore": "shaft_bore", "rz_shaft": "rz_shaft",
    "rz_housing": "rz_housing", "t_inner": "temperature_inner", "t_outer": "temperature_outer",
    "t_shaft": "temperature_shaft", "t_housing": "temperature_housing",
    "t_assembly": "temperature_assembly", "axial_force": "axial_force",
    "axial_location": "axial_location", "clearance_min": "clearance_min",
}
_OPTIONS.update(bending_moment="bending_moment", torque="torque", torque_type="torque_type",  # DIN 743 shaft
                application_factor="application_factor", fatigue_safety="fatigue_safety",
                static_safety="static_safety")


def add_arguments(p) -> None:
    p.add_argument("designation", nargs="?", help="bearing designation after ISO 15, e.g. 6204")
    p.add_argument("--case", metavar="FILE", help="evaluate every [[bearing]] table of a TOML file")
    p.add_argument("--shaft", help="shaft class, e.g. k5, or 'auto' (default)")
    p.add_argument("--housing", help="housing class, e.g. H7, or 'auto' (default)")
    p.add_argument("--class", dest="tolerance_class", help="bearing tolerance class: Normal, 6, 5")
    p.add_argument("--group", help="radial clearance group: C2, N, C3, C4, C5 (default N)")
    p.add_argument("--load", help="rotating_inner (default) or point_inner")
    p.add_argument("--load-ratio", dest="load_ratio", help="P/C")
    p.add_argument("--load-level", dest="load_level", help="light, normal or heavy")
    p.add_argument("--shaft-material", dest="shaft_material", help="material name (default C45E)")
    p.add_argument("--housing-material", dest="housing_material", help="material name (default C45E)")
    p.add_argument("--housing-od", dest="housing_outer_diameter", help="housing outer diameter, e.g. '70 mm'")
    p.add_argument("--housing-wall", dest="housing_wall", help="housing wall thickness, e.g. '6 mm'")
    p.add_argument("--shaft-bore", dest="shaft_bore", help="bore of a hollow shaft, e.g. '8 mm'")
    p.add_argument("--rz-shaft", dest="rz_shaft", help="Rz of the shaft seat, e.g. '2.5 um'")
    p.add_argument("--rz-housing", dest="rz_housing", help="Rz of the housing bore, e.g. '6.3 um'")
    p.add_argument("--t-inner", dest="t_inner", help="inner-ring temperature, e.g. '70 degC'")
    p.add_argument("--t-outer", dest="t_outer", help="outer-ring temperature")
    p.add_argument("--t-shaft", dest="t_shaft", help="shaft temperature (default: inner ring)")
    p.add_argument("--t-housing", dest="t_housing", help="housing temperature (default: outer ring)")
    p.add_argument("--t-assembly", dest="t_assembly", help="assembly temperature (default 20 degC)")
    p.add_argument("--axial-force", dest="axial_force", help="axial force, e.g. '300 N'")
    p.add_argument("--axial-location", dest="axial_location", help="shoulder, circlip or none")
    p.add_argument("--clearance-min", dest="clearance_min", help="smallest operating clearance, e.g. '2 um'")
    p.add_argument("--bending-moment", dest="bending_moment", help="rotating bending moment in the shaft at "
                   "the ring edge, e.g. '5 N*m' (DIN 743 shaft check)")
    p.add_argument("--torque", help="torque in the shaft at the seat, e.g. '10 N*m'")
    p.add_argument("--torque-type", dest="torque_type", help="static, pulsating or alternating (default)")
    p.add_argument("--application-factor", dest="application_factor",
                   help="application factor K_A on every shaft load (default 1.0)")
    p.add_argument("--fatigue-safety", dest="fatigue_safety",
                   help="required safety of the shaft against fatigue at the ring edge (default 1.2)")
    p.add_argument("--static-safety", dest="static_safety",
                   help="required safety of the shaft against yield at the ring edge (default 1.2)")
    p.add_argument("--json", action="store_true", help="print the results as JSON")


def _from_options(args) -> dict:
    m = {"designation": args.designation}
    for dest, key in _OPTIONS.items():
        v = getattr(args, dest, None)
        if v is not None:
            m[key] = v
    return m


def _from_case(path: str) -> list[tuple[str, dict]]:
    from .. import bearings
    from ..tomlread import read_toml

    data = read_toml(path)
    entries = data.get("bearing")
    if entries is None:
        raise InputError(path, "no [[bearing]] table", "a case file with at least one [[bearing]] table")
    if isinstance(entries, Mapping) or not isinstance(entries, list):
        raise InputError("bearing", "a single [bearing] table", "an array of tables: write [[bearing]]")
    cond = data.get("conditions", {})
    if not isinstance(cond, Mapping):
        raise InputError("conditions", type(cond).__name__, "a [conditions] table")
    defaults = {k: v for k, v in cond.items() if k in bearings.KEYS and k != "name"}
    out = []
    for i, e in enumerate(entries):
        if not isinstance(e, Mapping):
            raise InputError(f"bearing[#{i + 1}]", type(e).__name__, "a table of keys")
        name = e.get("name") if isinstance(e.get("name"), str) else f"#{i + 1}"
        out.append((f"bearing[{name}]", {**defaults, **e}))
    return out


def run(args) -> int:
    from .. import bearings

    if args.case and args.designation:
        raise InputError("designation", args.designation, "either a designation or --case, not both")
    if args.case:
        items = _from_case(args.case)
    elif args.designation:
        items = [("bearing", _from_options(args))]
    else:
        raise InputError("designation", None, "a bearing designation (e.g. 6204) or --case FILE")
    errs = ErrorCollector()
    results = []
    for label, mapping in items:
        try:
            results.append(bearings.evaluate(bearings.BearingSeatInput.from_mapping(mapping, label)))
        except (InputError, InputErrors) as exc:
            errs.add(exc)
    errs.raise_if_any()
    ok = all(r.ok for r in results)
    if args.json:
        dicts = [{k: r.to_dict()[k] for k in JSON_KEYS} for r in results]
        if args.case:
            print_json({"ok": ok, "caution": CAUTION, "bearings": dicts})
        else:
            print_json({**dicts[0], "caution": CAUTION})
        return EXIT_OK if ok else EXIT_FAILED_CHECK
    out = sys.stdout
    for r in results:
        _text(r, out)
    out.write(f"CAUTION: {CAUTION}\n")
    return EXIT_OK if ok else EXIT_FAILED_CHECK


def _text(r, out) -> None:
    from ..bearings import summary_rows

    title = f"{r.name + ': ' if r.name else ''}{r.designation}  d {r.bore_mm:g} x D {r.outside_mm:g} " \
            f"x B {r.width_mm:g} mm, class {r.tolerance_class}, shaft {r.shaft_class}, housing " \
            f"{r.housing_class}, clearance {r.clearance_group}"
    out.write(title + "\n")
    out.write(f"load {r.load} ({r.load_level}), {r.housing_group.replace('_', ' ')} housing; "
              f"recommended seats {r.recommended_shaft or '-'} / {r.recommended_housing or '-'} "
              "(DIN 5425-1)\n\n")
    print_table(["quantity", "min", "max", "unit"], summary_rows(r), out)
    out.write(f"\nhoop stress at the inner-ring bore, max: {r.ring_hoop_stress_max_MPa:.0f} MPa\n")
    out.write(f"smallest clearance group that passes: {r.smallest_passing_group or 'none'} (mean clearance; "
              f"in the arithmetic worst case: {r.smallest_group_worst_case or 'none'})\n")
    if r.clearance_state:
        out.write(f"operating clearance, governing state {r.clearance_state}: mean {r.clearance_mean_um:.1f} um, "
                  f"at the maximum probable interference {r.clearance_probable_min_um:.1f} um, "
                  f"sigma {r.clearance_sigma_um:.1f} um ({r.clearance_distribution}), "
                  f"P(< {r.clearance_min_um:g} um) {100 * r.clearance_probability_below:.1f} %, "
                  f"worst case {r.clearance_worst_case_um:.1f} um (information)\n")
    out.write("\n")
    rows = [[c.name, f"{c.value:.4g} {c.unit}", f"{c.sense} {c.limit:.4g} {c.unit}",
             "pass" if c.passed else "FAIL"] for c in r.checks]
    print_table(["check", "value", "limit", "verdict"], rows, out)
    for n in r.notes:
        out.write(f"note: {n}\n")
    out.write(f"\n{'all checks pass' if r.ok else 'a check FAILS'}\n")
    if r.headline:
        out.write(f"verdict: {r.headline}\n")
    out.write("\n")
