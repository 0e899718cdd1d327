"""``fitcheck study CASE.toml --joint NAME --samples N [--seed S] [--target 1e-4] [--json]``.

Monte Carlo tolerance study of one ``[[pressfit]]`` joint of a case file (see
:mod:`fitcheck.study`): distributions of pressure, torque capacity and stresses,
probabilities of slip and yield with confidence intervals, FORM and importance
sampling for small probabilities, the worst case beside them. The operating
temperature range comes from ``--t-min``/``--t-max`` or the case's
``[conditions] temperature_min``/``temperature_max``.

Exit code: with ``--target``, 0 when both P(slip) and P(yield) are shown to be at
most the target (upper confidence limit), 1 otherwise; without a target, the
worst-case verdict (0 pass, 1 a check fails). 2 for bad input.
"""

from __future__ import annotations

import sys

from .. import CAUTION
from ..errors import InputError, did_you_mean
from . import EXIT_FAILED_CHECK, EXIT_OK, print_json, print_table

COMMAND = "study"
HELP = "tolerance study of a press fit: probabilities of slip and yield of a production lot"


def add_arguments(p) -> None:
    p.add_argument("case", metavar="CASE", help="design-case file (TOML) with [[pressfit]] tables")
    p.add_argument("--joint", metavar="NAME", help="name of the [[pressfit]] joint (needed when the "
                   "file has more than one)")
    p.add_argument("--samples", default="100000", metavar="N", help="plain Monte Carlo samples "
                   "(default 100000)")
    p.add_argument("--seed", default="0", metavar="S", help="random seed (default 0; same seed, same result)")
    p.add_argument("--target", metavar="P", help="target probability for slip and for yield, e.g. 1e-4")
    p.add_argument("--rel-err", default="0.1", metavar="E", help="relative error for the sample-count "
                   "estimate (default 0.1)")
    p.add_argument("--confidence", default="0.95", metavar="C", help="confidence level (default 0.95)")
    p.add_argument("--sizes", default="uniform", metavar="MODEL",
                   help="size distribution within the zones: uniform (default) or normal")
    p.add_argument("--cp", default="1.33", help="process capability Cp for --sizes normal (default 1.33)")
    p.add_argument("--cpk", help="process capability Cpk (default = Cp: centred)")
    p.add_argument("--shift", default="least_material", metavar="DIR",
                   help="mean shift when Cpk < Cp: least_material (default) or max_material")
    p.add_argument("--no-inspection", action="store_true",
                   help="parts outside their zone are not sorted out (untruncated normal sizes)")
    p.add_argument("--friction", default="lognormal", metavar="MODEL",
                   help="friction scatter: lognormal (default), normal, uniform or constant")
    p.add_argument("--friction-cov", default="0.15", metavar="V",
                   help="coefficient of variation of the friction coefficient (default 0.15)")
    p.add_argument("--roughness-low", default="0.6", metavar="F",
                   help="Rz scatters uniformly between F·Rz and Rz (default 0.6)")
    p.add_argument("--t-min", metavar="T", help="lowest operating temperature, e.g. '-10 degC'")
    p.add_argument("--t-max", metavar="T", help="highest operating temperature, e.g. '70 degC'")
    p.add_argument("--importance-samples", default="20000", metavar="N",
                   help="importance-sampling samples about the FORM design point (0 = off)")
    p.add_argument("--plot", metavar="FILE.png", help="also save the histograms as an image")
    p.add_argument("--json", action="store_true", help="print the result as JSON")


def select_joint(path: str, name: str | None, command: str, kinds=("pressfit",)):
    """The joint named ``name`` in a case file: ``(input, case, table)``.

    ``kinds`` are the case-file tables the command works on (``"pressfit"``, ``"bearing"``);
    an unknown name is an input error with a "did you mean".
    """
    from .. import case as case_mod

    dc = case_mod.load(path)
    joints = {n: (inp, eng.table) for eng, n, inp in dc.joints() if eng.table in kinds}
    others = [n for eng, n, _ in dc.joints() if eng.table not in kinds]
    what = " or ".join(f"[[{k}]]" for k in kinds)
    if name is None:
        if len(joints) == 1:
            inp, table = next(iter(joints.values()))
            return inp, dc, table
        if not joints:
            raise InputError(path, f"no {what} table", f"a case with a {what} joint for "
                             f"'fitcheck {command}'")
        raise InputError("--joint", None, "one of: " + ", ".join(joints),
                         "the file holds several joints; name one with --joint")
    if name not in joints:
        hint = did_you_mean(name, list(joints) + others)
        if name in others:
            hint = f"'{name}' is not a {what} joint, which 'fitcheck {command}' works on"
        raise InputError("--joint", name, f"the name of a {what} joint: " + (", ".join(joints)
                         or "(none in this file)"), hint)
    inp, table = joints[name]
    return inp, dc, table


def _settings(args, dc):
    from ..study import StudySettings

    m = {"samples": args.samples, "seed": args.seed, "target": args.target, "rel_err": args.rel_err,
         "confidence": args.confidence, "sizes": args.sizes, "cp": args.cp,
         "cpk": args.cpk if args.cpk is not None else args.cp, "shift": args.shift,
         "inspected": not args.no_inspection, "friction": args.friction,
         "friction_cov": args.friction_cov, "roughness_low": args.roughness_low,
         "importance_samples": args.importance_samples}
    tmin, tmax = args.t_min, args.t_max
    if tmin is None and tmax is None:
        tmin = dc.conditions.get("temperature_min")
        tmax = dc.conditions.get("temperature_max")
    m["temperature_min"], m["temperature_max"] = tmin, tmax
    return StudySettings.from_mapping(m, "study")


def _p(x) -> str:
    if x != x:  # nan
        return "n/a"
    return "0" if x == 0 else f"{x:.3g}"


def _marginal_text(v) -> str:
    m = v.marginal
    u = f" {v.unit}" if v.unit else ""
    if not m.random:
        return f"fixed {m.a:.4g}{u}"
    if m.kind == "uniform":
        return f"uniform {m.a:.4g} … {m.b:.4g}{u}"
    if m.kind == "normal":
        return f"normal mean {m.a:.4g}, sd {m.b:.3g}{u}"
    if m.kind == "truncnormal":
        return f"normal μ {m.a:.4g}, σ {m.b:.3g}{u}, truncated to {m.c:.4g} … {m.d:.4g}"
    return f"lognormal median {m.a:.4g}, cov {m.b:.3g}"


def print_study(r, out=None) -> None:
    """The text report of a :class:`~fitcheck.study.StudyResult`."""
    out = out or sys.stdout
    st = r.settings
    head = f"Tolerance study '{r.joint}'" + (f" — {r.fit}" if r.fit else "")
    out.write(f"{head}\n{'=' * len(head)}\n")
    out.write(f"{r.samples:,} samples, seed {st.seed}; sizes {st.sizes}"
              + (f" (Cp {st.cp:g}, Cpk {st.cpk:g}, shift toward {st.shift.replace('_', ' ')}, "
                 f"{'inspected: truncated to the zones' if st.inspected else 'not inspected'})"
                 if st.sizes == "normal" else " over the zones") + "\n\n")
    out.write("Random inputs\n")
    print_table(["input", "distribution", "meaning"],
                [[v.name, _marginal_text(v), v.description] for v in r.variables], out)
    out.write("\nDistributions (percentiles of the lot)\n")
    qs = (0.1, 1.0, 50.0, 99.0, 99.9)
    rows = []
    for d in r.distributions:
        rows.append([d.label, d.unit or "-"] + [f"{d.percentile(q):.4g}" for q in qs]
                    + [f"{d.mean:.4g}"])
    print_table(["quantity", "unit"] + [f"{q:g} %" for q in qs] + ["mean"], rows, out)
    out.write("\nFailure probabilities\n")
    rows = []
    for fm in (r.slip, r.yield_):
        pl = fm.plain
        f = fm.form
        imp = fm.importance
        rows.append([fm.name, f"{pl.failures}/{pl.n} = {_p(pl.p)}", f"{_p(pl.lo)} … {_p(pl.hi)}",
                     "—" if f is None else (f"β {f.beta:.3g}, {_p(f.p)}" + ("" if f.converged else " (?)")),
                     "—" if imp is None else f"{_p(imp.p)} ± {_p(imp.se)}",
                     f"{fm.best.method}: {_p(fm.best.p)} (≤ {_p(fm.best.hi)})"])
    print_table(["mode", "plain sampling", f"{st.confidence:.0%} interval", "FORM",
                 "importance sampling", "used"], rows, out)
    for fm in (r.slip, r.yield_):
        out.write(f"  {fm.name}: {fm.definition}\n")
    out.write(f"  share of the lot meeting every design check (required safeties): "
              f"{r.fraction_meeting_design_checks:.6g}\n")
    if r.targets:
        out.write("\nTarget\n")
        rows = [[t.mode, f"{t.target:g}", _p(t.estimate), _p(t.upper), t.method,
                 "met" if t.met else "NOT MET", f"{t.plain_samples_at_target:,.0f}"]
                for t in r.targets]
        print_table(["mode", "target", "estimate", "upper limit", "method", "verdict",
                     f"plain samples for ±{st.rel_err:.0%}"], rows, out)
    w = r.worst_case
    out.write("\nWorst case (arithmetic stacking of the limits, design values)\n")
    from ..report import format_margin, format_number

    print_table(["check", "value", "limit", "margin", "verdict"],
                [[c.name, format_number(c.value, c.unit), format_number(c.limit, c.unit),
                  format_margin(c.margin), "pass" if c.passed else "FAIL"] for c in w.checks], out)
    out.write(f"\nVerdict: {'PASS' if r.ok else 'FAIL'} "
              f"({'targets' if r.targets else 'worst case; no --target given'})\n")
    for n in r.notes:
        out.write(f"note: {n}\n")
    out.write(f"\nCaution: {CAUTION}\n")


def run(args) -> int:
    from ..study import run_study

    inp, dc, _table = select_joint(args.case, args.joint, COMMAND)
    st = _settings(args, dc)
    r = run_study(inp, st)
    if args.plot:
        from ..plots.study import plot_study_histograms

        fig = plot_study_histograms(r)
        try:
            fig.savefig(args.plot, dpi=120)
        except (OSError, ValueError) as exc:
            raise InputError("--plot", args.plot, "a writable image path ending in .png, .pdf or .svg",
                             str(exc)) from None
        finally:
            import matplotlib.pyplot as plt

            plt.close(fig)
    if args.json:
        print_json(r.to_json())
    else:
        print_study(r)
    return EXIT_OK if r.ok else EXIT_FAILED_CHECK
