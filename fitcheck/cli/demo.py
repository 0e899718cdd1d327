"""``fitcheck demo [--inch] [-o FILE] [--force]``: write a demo design case.

The SI demo is the gearhead of a benchtop pump (``benchtop_pump.toml``); ``--inch`` writes
the gearhead of a small lab winch in inch units with ASME B4.1 fits and UNC screws
(``lab_winch.toml``). ``-o -`` prints it. An existing file is never overwritten without
``--force``.
"""

from __future__ import annotations

import sys
from pathlib import Path

from .. import CAUTION
from . import EXIT_OK

COMMAND = "demo"
HELP = "write a demo design case to start from (benchtop-pump gearhead; --inch: lab-winch gearhead in inch)"


def add_arguments(p) -> None:
    p.add_argument("--inch", action="store_true",
                   help="the inch demo: gearhead of a small lab winch (ASME B4.1 fits, UNC screws)")
    p.add_argument("-o", "--output", default=None, metavar="FILE",
                   help="where to write it (default: benchtop_pump.toml, with --inch lab_winch.toml; "
                        "'-' prints it)")
    p.add_argument("--force", action="store_true", help="overwrite an existing file")


def run(args) -> int:
    from ..case import demo_text
    from ..errors import InputError

    inch = bool(getattr(args, "inch", False))
    text = demo_text(inch)
    if args.output is None:
        args.output = "lab_winch.toml" if inch else "benchtop_pump.toml"
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
    what = ("the gearhead of a small lab winch, inch units" if inch
            else "the gearhead of a benchtop pump")
    sys.stdout.write(f"wrote {out}: {what} (invented example values)\n"
                     f"next: fitcheck check {out}   or   fitcheck report {out} -o report.html\n\n"
                     f"CAUTION: {CAUTION}\n")
    return EXIT_OK
