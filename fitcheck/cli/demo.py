"""``fitcheck demo [-o FILE] [--force]``: write the demo design case (a benchtop-pump gearhead).

Without ``-o`` the file is ``benchtop_pump.toml`` in the current folder; ``-o -``
prints it. An existing file is never overwritten without ``--force``.
"""

from __future__ import annotations

import sys
from pathlib import Path

from .. import CAUTION
from . import EXIT_OK

COMMAND = "demo"
HELP = "write the demo design case (gearhead of a benchtop pump) to start from"


def add_arguments(p) -> None:
    p.add_argument("-o", "--output", default="benchtop_pump.toml", metavar="FILE",
                   help="where to write it (default: benchtop_pump.toml; '-' prints it)")
    p.add_argument("--force", action="store_true", help="overwrite an existing file")


def run(args) -> int:
    from ..case import demo_text
    from ..errors import InputError

    text = demo_text()
    if args.output == "-":
        sys.stdout.write(text)
        return EXIT_OK
    out = Path(args.output)
    if out.exists() and not args.force:
        raise InputError("-o/--output", str(out), "a file that does not exist yet",
                         "add --force to overwrite it")
    if not out.parent.is_dir():
        raise InputError("-o/--output", str(out), "a path in an existing folder")
    tmp = out.with_name(f".{out.name}.tmp")
    try:
        tmp.write_text(text, encoding="utf-8")
        tmp.replace(out)
    finally:
        if tmp.exists():
            tmp.unlink()
    sys.stdout.write(f"wrote {out}: the gearhead of a benchtop pump (invented example values)\n"
                     f"next: fitcheck check {out}   or   fitcheck report {out} -o report.html\n\n"
                     f"CAUTION: {CAUTION}\n")
    return EXIT_OK
