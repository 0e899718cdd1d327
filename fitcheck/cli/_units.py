"""The ``--units si|inch`` option every command has, and the text writer that applies it.

Text output is written in the chosen system; ``--json`` keeps its documented SI keys.
Without the option a command that reads a case file takes the file's ``unit_system``
(default SI).
"""

from __future__ import annotations

import sys

from ..display import text_in_system


def add(parser) -> None:
    """Add ``--units`` to a command's parser."""
    parser.add_argument("--units", type=str.lower, choices=("si", "inch"), default=None,
                        help="units of the text output: si (mm, µm, N, MPa, °C) or inch "
                             "(in, thousandths of an inch, lbf, psi/ksi, °F); JSON keeps SI keys. "
                             "Default: the case file's unit_system, else si")


def system(args, case=None) -> str:
    """'SI' or 'inch': the option if given, else the case's ``unit_system``, else SI."""
    u = getattr(args, "units", None)
    if u:
        return "inch" if u == "inch" else "SI"
    return getattr(case, "unit_system", "SI") if case is not None else "SI"


class Writer:
    """A stdout stand-in that rewrites quantities in the text into the unit system."""

    def __init__(self, system_name: str, out=None):
        self.system = system_name
        self.out = out or sys.stdout

    def write(self, text: str) -> int:
        return self.out.write(text_in_system(text, self.system))

    def flush(self) -> None:
        self.out.flush()

    def __getattr__(self, name):
        return getattr(self.out, name)


def case_system(args) -> str:
    """The ``unit_system`` of the case file a command was given (SI when none or unreadable)."""
    from pathlib import Path

    from ..errors import FitcheckError
    from ..tomlread import read_toml

    for attr in ("case", "cases", "paths", "path", "file", "files", "case_file", "input"):
        v = getattr(args, attr, None)
        for item in (v if isinstance(v, list | tuple) else [v]):
            if isinstance(item, str) and item.endswith(".toml") and Path(item).is_file():
                try:  # the project's bounded reader: a hostile file is refused later by the command
                    u = read_toml(item).get("unit_system", "SI")
                except (OSError, ValueError, FitcheckError):
                    return "SI"
                return "inch" if isinstance(u, str) and u.strip().lower() == "inch" else "SI"
    return "SI"


class redirect:
    """Context manager: ``sys.stdout`` rewritten into a unit system while a command runs."""

    def __init__(self, system_name: str):
        self.system = system_name

    def __enter__(self):
        self._old = sys.stdout
        sys.stdout = Writer(self.system, self._old)
        return sys.stdout

    def __exit__(self, *exc):
        sys.stdout = self._old
        return False
