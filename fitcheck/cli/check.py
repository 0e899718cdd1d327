"""``fitcheck check CASE.toml [MORE.toml | GLOB ...] [--json]``: every check of one or more cases.

Prints one table of every check (joint, check, value, limit, margin, verdict)
and the caution. Exit code 0 when every check passes, 1 when a check fails,
2 when an input is invalid (every problem of every file listed on stderr).
"""

from __future__ import annotations

import glob
import sys
from pathlib import Path

from .. import CAUTION
from ..errors import ErrorCollector, InputError, InputErrors
from . import EXIT_FAILED_CHECK, EXIT_OK, print_json, print_table

COMMAND = "check"
HELP = "check every joint of one or more design-case files and print one summary table"


def add_arguments(p) -> None:
    p.add_argument("cases", nargs="+", metavar="CASE",
                   help="case files (TOML) or glob patterns such as 'cases/*.toml'")
    p.add_argument("--json", action="store_true", help="print the results as JSON")


def expand(patterns: list[str]) -> list[Path]:
    """Files named or matched by glob patterns, in the given order, without repeats."""
    out: list[Path] = []
    for pat in patterns:
        if Path(pat).exists() or not glob.has_magic(pat):
            found = [pat]
        else:
            found = sorted(glob.glob(pat, recursive=True))
            if not found:
                raise InputError("case", pat, "a case file or a glob pattern matching at least one")
        for f in found:
            p = Path(f)
            if p not in out:
                out.append(p)
    return out


def load_all(paths: list[Path]):
    """Load and evaluate every case; problems of all files are raised together."""
    from .. import case as case_mod

    errs = ErrorCollector()
    results = []
    for p in paths:
        try:
            dc = case_mod.load(p)
            if not len(dc):
                raise InputError(str(p), "a case with no joints", "at least one joint table: "
                                 + ", ".join(f"[[{t}]]" for t in case_mod.ENGINES))
            results.append((p, case_mod.evaluate(dc)))
        except (InputError, InputErrors) as exc:
            items = exc.errors if isinstance(exc, InputErrors) else [exc]
            prefix = str(p) if len(paths) > 1 else ""
            for e in items:
                errs.add(e if not prefix or e.field.startswith(prefix) else e.within(prefix))
    if errs.errors:
        raise InputErrors(errs.errors)
    return results


def _fmt(x, unit=""):
    from ..report import format_number

    return format_number(x, unit)


def run(args) -> int:
    from ..report import format_margin

    results = load_all(expand(args.cases))
    ok = all(r.ok for _, r in results)
    if args.json:
        print_json({"ok": ok, "caution": CAUTION,
                    "cases": [{"file": str(p), **r.to_dict()} for p, r in results]})
        return EXIT_OK if ok else EXIT_FAILED_CHECK
    many = len(results) > 1
    headers = (["case"] if many else []) + ["joint", "check", "value", "limit", "margin", "verdict"]
    rows = []
    n_fail = n = 0
    for p, r in results:
        for c in r.checks:
            k = c.check
            row = [c.label, k.name, _fmt(k.value, k.unit), f"{k.sense} {_fmt(k.limit, k.unit)}",
                   format_margin(k.margin), "pass" if k.passed else "FAIL"]
            rows.append(([p.name] if many else []) + row)
            n += 1
            n_fail += not k.passed
    out = sys.stdout
    for p, r in results:
        t = r.case.title
        head = " / ".join(x for x in (t.project, t.part, f"rev. {t.revision}" if t.revision else "")
                          if x)
        out.write(f"{p}: {head}\n" if head else f"{p}\n")
    out.write("\n")
    print_table(headers, rows)
    out.write("\n")
    for p, r in results:
        worst = r.worst()
        if worst is not None:
            out.write(f"{p.name}: worst margin {format_margin(worst.margin)} — "
                      f"{worst.label}, {worst.check.name}\n")
        for w in r.warnings:
            out.write(f"{p.name}: warning: {w}\n")
        for note in r.notes:
            out.write(f"{p.name}: note: {note}\n")
    verdict = "every check passes" if ok else f"{n_fail} of {n} checks FAIL"
    out.write(f"{n} checks: {verdict}.\n\nCAUTION: {CAUTION}\n")
    return EXIT_OK if ok else EXIT_FAILED_CHECK

