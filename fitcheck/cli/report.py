"""``fitcheck report CASE.toml -o report.html|report.pdf``: a calculation report to sign.

The format follows the suffix of ``-o``. Exit code 0 when every check passes,
1 when a check fails (the report is still written and says so), 2 on bad input.
"""

from __future__ import annotations

import sys
from pathlib import Path

from .. import CAUTION
from ..errors import InputError
from . import EXIT_FAILED_CHECK, EXIT_OK

COMMAND = "report"
HELP = "write a calculation report (HTML or PDF, chosen by the suffix of -o) of a design case"


def add_arguments(p) -> None:
    p.add_argument("case", metavar="CASE", help="design-case file (TOML)")
    p.add_argument("-o", "--output", required=True, metavar="FILE",
                   help="report file: name.html (one self-contained file) or name.pdf")


def run(args) -> int:
    from .. import case as case_mod
    from .. import report

    out = Path(args.output)
    if out.suffix.lower() not in report.FORMATS:
        raise InputError("-o/--output", args.output, "a file name ending in .html, .htm or .pdf")
    case = case_mod.load(args.case)
    if getattr(args, "units", None):  # --units overrides the file's unit_system for the report
        case = case_mod.replace(case, unit_system="inch" if args.units == "inch" else "SI")
    result = case_mod.evaluate(case)
    path = report.write(result, out)
    verdict = "every check passes" if result.ok else "at least one check FAILS"
    sys.stdout.write(f"wrote {path} ({len(result.checks)} checks: {verdict})\n\n"
                     f"CAUTION: {CAUTION}\n")
    return EXIT_OK if result.ok else EXIT_FAILED_CHECK
