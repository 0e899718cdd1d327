"""``fitcheck pressfit CASE.toml [--json]``: evaluate every ``[[pressfit]]`` table of a file.

A top-level ``[conditions]`` table supplies ``speed``, ``temperature_shaft``,
``temperature_hub`` and ``temperature_assembly`` to every joint that does not set
them itself. Prints, per joint, the loosest and tightest cases, the assembly
figures and the checks, then the caution. Exit code 0 when every check passes,
1 when a check fails, 2 on bad input (every problem listed on stderr).
"""

from __future__ import annotations

import math
import sys
import warnings
from collections.abc import Mapping

from .. import CAUTION
from ..errors import ErrorCollector, InputError, InputErrors, MethodRangeWarning
from ..tomlread import read_toml
from . import EXIT_FAILED_CHECK, EXIT_OK, print_json, print_table

COMMAND = "pressfit"
HELP = "press and shrink fits: slip at the loosest fit, yield at the tightest, press force, heating"

CONDITION_DEFAULTS = ("speed", "temperature_shaft", "temperature_hub", "temperature_assembly")


def add_arguments(p) -> None:
    p.add_argument("case", metavar="CASE", help="TOML file with one or more [[pressfit]] tables")
    p.add_argument("--json", action="store_true", help="print the results as JSON")


def load_inputs(data: Mapping, source: str = "case file") -> list:
    """The :class:`~fitcheck.pressfit.PressFitInput` of every ``[[pressfit]]`` table (all errors at once)."""
    from ..pressfit import PressFitInput

    tables = data.get("pressfit")
    if tables is None:
        raise InputError(source, "no [[pressfit]] table", "a file with at least one [[pressfit]] table")
    if isinstance(tables, Mapping):
        tables = [tables]
    if not isinstance(tables, list):
        raise InputError("pressfit", type(tables).__name__, "an array of tables [[pressfit]]")
    cond = data.get("conditions", {})
    if not isinstance(cond, Mapping):
        raise InputError("conditions", type(cond).__name__, "a [conditions] table")
    defaults = {k: cond[k] for k in CONDITION_DEFAULTS if k in cond}
    errs = ErrorCollector()
    out = []
    for i, t in enumerate(tables):
        if not isinstance(t, Mapping):
            errs.add(InputError(f"pressfit[{i + 1}]", type(t).__name__, "a table of press-fit keys"))
            continue
        name = str(t.get("name", f"pressfit-{i + 1}"))
        mapping = {**defaults, **t, "name": name}
        try:
            out.append(PressFitInput.from_mapping(mapping, f"pressfit[{name}]"))
        except (InputError, InputErrors) as exc:
            errs.add(exc)
    errs.raise_if_any()
    return out


def _g(x, digits=4) -> str:
    if x is None or (isinstance(x, float) and not math.isfinite(x)):
        return "—" if x is None or math.isnan(x) else ("∞" if x > 0 else "−∞")
    return f"{x:.{digits}g}"


def _print_joint(r, out) -> None:
    head = f"Press fit '{r.name}'" + (f" — {r.fit}" if r.fit else "")
    out.write(f"\n{head}\n{'=' * len(head)}\n")
    bore = f"hollow shaft, bore {_g(r.shaft_bore)} mm" if r.shaft_bore > 0 else "solid shaft"
    out.write(f"d = {_g(r.diameter)} mm, L = {_g(r.length)} mm, {bore}, "
              f"hub Do = {_g(r.hub_outer_diameter)} mm ({r.hub_outer_rule})\n")
    out.write(f"shaft {r.shaft_material.name}, hub {r.hub_material.name}; assembly: {r.assembly}; "
              f"mu_slip {_g(r.mu_slip)}, mu_press {_g(r.mu_press)} ({r.friction_source})\n")
    out.write(f"interference {_g(r.interference_min * 1e3)} … {_g(r.interference_max * 1e3)} um, "
              f"smoothing loss {_g(r.roughness_loss * 1e3)} um\n\n")
    rows = []
    gov = tuple(c for c in (getattr(r, "loosest_governing", None), getattr(r, "tightest_governing", None)) if c)
    gov = tuple(type(c)(**{**c.to_dict(), "label": f"{k}: {c.state}"}) for k, c in
                zip(("GOVERNING loosest", "GOVERNING tightest"), gov, strict=False))
    for c in (r.loosest_operating, r.tightest_operating, r.loosest_assembly, r.tightest_assembly, *gov):
        rows.append([c.label, _g(c.interference * 1e3), _g(c.effective_interference * 1e3), _g(c.pressure),
                     _g(c.torque_capacity / 1e3), _g(c.axial_capacity), _g(c.hub_von_mises_bore),
                     _g(c.shaft_von_mises_max)])
    print_table(["case", "δ [um]", "δ eff [um]", "p [MPa]", "T cap [N·m]", "F cap [N]",
                 "hub σv bore [MPa]", "shaft σv [MPa]"], rows, out)
    out.write("\n")
    print_table(["quantity", "value", "unit"], [
        ["slip safety at loosest fit", _g(r.slip_safety_min), ""],
        ["hub yield safety (tightest)", _g(r.hub_yield_safety), ""],
        ["shaft yield safety (tightest)", _g(r.shaft_yield_safety), ""],
        ["hub outer diameter growth", _g(r.hub_outer_growth_max * 1e3), "um"],
        ["press-in force (tightest, mu_press)", _g(r.press_force_max / 1e3), "kN"],
        ["hub temperature for shrinking" + ("" if r.assembly == "shrink" else " (if shrunk instead)"),
         _g(r.shrink_temperature_C), "degC"],
        ["loosening speed (loosest)", "not applicable" if getattr(r, "loosening_note", "")
         else _g(r.loosening_speed_rpm), "" if getattr(r, "loosening_note", "") else "rpm"],
    ] + ([["hub plastic zone Ø (tightest; depth " + _g((r.plastic_zone_diameter - r.diameter) / 2.0)
           + " mm)", _g(r.plastic_zone_diameter), "mm"],
          ["plastic utilisation (share of wall / permitted)", _g(r.plastic_utilisation), ""]]
         if getattr(r, "design", "elastic") == "elastic-plastic" else []), out)
    out.write("\n")
    rows = [[c.name, f"{_g(c.value)} {c.unit}".strip(), f"{c.sense} {_g(c.limit)} {c.unit}".strip(),
             "pass" if c.passed else "FAIL", c.reference] for c in r.checks]
    print_table(["check", "value", "limit", "verdict", "reference"], rows, out)
    for c in r.checks:
        if not c.passed and c.note:
            out.write(f"{c.name} fails: {c.note}\n")
    for w in r.warnings:
        out.write(f"caution: {w}\n")
    for n in getattr(r, "notes", ()):
        out.write(f"note: {n}\n")
    out.write(f"verdict: {'all checks pass' if r.ok else 'a check fails'}\n")
    if getattr(r, "headline", ""):
        out.write(f"{r.headline}\n")


def run(args) -> int:
    from ..pressfit import evaluate

    data = read_toml(args.case)
    inputs = load_inputs(data, str(args.case))
    with warnings.catch_warnings():
        warnings.simplefilter("ignore", MethodRangeWarning)  # shown from result.warnings instead
        results = [evaluate(inp) for inp in inputs]
    ok = all(r.ok for r in results)
    if args.json:
        print_json({"pressfits": [r.to_json() for r in results], "ok": ok, "caution": CAUTION})
    else:
        out = sys.stdout
        for r in results:
            _print_joint(r, out)
        out.write(f"\n{CAUTION}\n")
    return EXIT_OK if ok else EXIT_FAILED_CHECK
