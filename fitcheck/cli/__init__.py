"""Command line: ``fitcheck <command> ...``.

Each command lives in its own module of this package and defines

* ``COMMAND`` — the sub-command name,
* ``HELP`` — one line of help,
* ``add_arguments(parser)`` — its options,
* ``run(args) -> int`` — the exit code (0 all checks pass, 1 a check fails, 2 bad input).

Modules are found automatically, so adding a command never edits this file.
Errors the user can cause (:class:`~fitcheck.errors.FitcheckError`) are
printed as one line on stderr with exit code 2; no traceback reaches the user.
"""

from __future__ import annotations

import argparse
import importlib
import json
import math
import pkgutil
import sys

from ..errors import FitcheckError, InputErrors
from . import _units

EXIT_OK, EXIT_FAILED_CHECK, EXIT_BAD_INPUT = 0, 1, 2


class _Parser(argparse.ArgumentParser):
    def error(self, message):  # one line, exit 2
        sys.stderr.write(f"fitcheck: error: {message} (see 'fitcheck {self._cmd} --help')\n"
                         if getattr(self, "_cmd", "") else f"fitcheck: error: {message}\n")
        raise SystemExit(EXIT_BAD_INPUT)


def _commands():
    mods = []
    for info in pkgutil.iter_modules(__path__):
        if info.name.startswith("_"):
            continue
        mod = importlib.import_module(f"{__name__}.{info.name}")
        if hasattr(mod, "COMMAND") and hasattr(mod, "run"):
            mods.append(mod)
    return sorted(mods, key=lambda m: m.COMMAND)


def build_parser() -> argparse.ArgumentParser:
    from .. import __version__

    parser = _Parser(prog="fitcheck", description=(
        "Seat fits, press fits, bearing seats and housing screws of compact geared drives. "
        "Engineering estimates: verify by test and follow the applicable standards, local codes "
        "and licensed professional practice."))
    parser.add_argument("--version", action="version", version=f"fitcheck {__version__}")
    sub = parser.add_subparsers(dest="command", metavar="COMMAND", parser_class=_Parser)
    for mod in _commands():
        p = sub.add_parser(mod.COMMAND, help=mod.HELP, description=mod.HELP)
        p._cmd = mod.COMMAND
        mod.add_arguments(p)
        _units.add(p)
        p.set_defaults(_run=mod.run)
    return parser


def main(argv: list[str] | None = None) -> int:
    parser = build_parser()
    args = parser.parse_args(argv)
    if not getattr(args, "_run", None):
        parser.print_help()
        return EXIT_BAD_INPUT
    try:
        sysname = _units.system(args) if getattr(args, "units", None) else _units.case_system(args)
        if sysname == "inch" and not getattr(args, "json", False):
            with _units.redirect(sysname):
                return int(args._run(args))
        return int(args._run(args))
    except InputErrors as exc:  # one problem on one line; several as a list
        msg = exc.errors[0].message if len(exc.errors) == 1 else exc.message
        sys.stderr.write(f"fitcheck: {msg}\n")
        return EXIT_BAD_INPUT
    except FitcheckError as exc:
        sys.stderr.write(f"fitcheck: {_one_line(str(exc))}\n")
        return EXIT_BAD_INPUT
    except BrokenPipeError:
        return EXIT_OK
    except OSError as exc:  # a file that cannot be read or written: a folder, /proc, no permission
        where = f"{exc.filename}: " if getattr(exc, "filename", None) else ""
        sys.stderr.write(f"fitcheck: {where}{exc.strerror or type(exc).__name__} "
                         "(a readable input file and a writable output path are needed)\n")
        return EXIT_BAD_INPUT
    except KeyboardInterrupt:
        return 130


def _one_line(text: str) -> str:
    """An error message on one line (an engine's message may hold a newline)."""
    return " ".join(text.split("\n"))


def clean_json(obj):
    """Replace NaN/inf by None recursively so the output is strict JSON."""
    if isinstance(obj, float):
        return obj if math.isfinite(obj) else None
    if isinstance(obj, dict):
        return {k: clean_json(v) for k, v in obj.items()}
    if isinstance(obj, list | tuple):
        return [clean_json(v) for v in obj]
    if hasattr(obj, "item") and callable(obj.item):  # numpy scalar
        return clean_json(obj.item())
    return obj


def print_json(obj) -> None:
    """Print ``obj`` as indented, strict JSON."""
    sys.stdout.write(json.dumps(clean_json(obj), indent=2, allow_nan=False) + "\n")


def print_table(headers: list[str], rows: list[list], out=None) -> None:
    """Print a plain text table with aligned columns."""
    out = out or sys.stdout
    system = getattr(out, "system", None) or getattr(sys.stdout, "system", None)
    if system == "inch":
        from ..display import table_in_system, text_in_system
        headers, rows = table_in_system(headers, rows, system)
        rows = [[text_in_system(str(c), system) for c in r] for r in rows]
    cells = [[str(h) for h in headers]] + [[str(c) for c in r] for r in rows]
    widths = [max(len(r[i]) for r in cells) for i in range(len(headers))]
    for j, r in enumerate(cells):
        out.write("  ".join(c.ljust(w) for c, w in zip(r, widths, strict=True)).rstrip() + "\n")
        if j == 0:
            out.write("  ".join("-" * w for w in widths) + "\n")
