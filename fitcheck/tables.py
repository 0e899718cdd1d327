"""Loaders for the standard tables in ``data/``.

Each table is a CSV file whose header names the unit of every numeric column
(``es_um``, ``As_mm2``); its source is named in ``data/SOURCES.md``. Tables are
read once and cached. In a source checkout they come from the top-level
``data/`` folder; in an installed wheel from ``fitcheck/data`` (the build copies
them there).
"""

from __future__ import annotations

import csv
import functools
import importlib.resources
from pathlib import Path

import numpy as np

from .errors import FitcheckError


class TableError(FitcheckError):
    """A data table is missing or malformed (a packaging or editing fault, not user input)."""


def data_dir() -> Path:
    """The folder that holds the tables, for a checkout or an installed wheel."""
    packaged = importlib.resources.files("fitcheck") / "data"
    try:
        p = Path(str(packaged))
        if p.is_dir():
            return p
    except TypeError:  # pragma: no cover - zipped installs are not supported
        pass
    repo = Path(__file__).resolve().parent.parent / "data"
    if repo.is_dir():
        return repo
    raise TableError("the data tables were not found (neither fitcheck/data nor ./data)")


def is_comment(line: str) -> bool:
    """True for a comment line of a data table: ``#`` then a blank or the end of the line.

    >>> is_comment("# Clearance holes [mm]"), is_comment("#"), is_comment("#10,ASME B18.2.8,5.105")
    (True, True, False)
    """
    s = line.strip()
    return s.startswith("#") and (len(s) == 1 or s[1].isspace())


@functools.cache
def read_rows(name: str) -> tuple[dict[str, str], ...]:
    """All rows of ``data/<name>`` as dictionaries of strings (cached).

    Blank lines and comment lines are skipped. A comment line starts with ``#`` followed by a
    blank (or nothing): ``# source ...``. A data row may begin with ``#`` followed by anything else,
    so the numbered inch sizes (``#0,ASME B18.2.8,...``, ``#10-24 UNC``) are data, never comments.
    """
    path = data_dir() / name
    if not path.is_file():
        raise TableError(f"table {name!r} not found in {path.parent}")
    with path.open(newline="", encoding="utf-8") as f:
        lines = [ln for ln in f if ln.strip() and not is_comment(ln)]
    reader = csv.DictReader(lines)
    rows = tuple(dict(r) for r in reader)
    if not rows:
        raise TableError(f"table {name!r} is empty")
    for i, r in enumerate(rows):
        if None in r or any(v is None for v in r.values()):
            raise TableError(f"table {name!r}, data row {i + 1}: wrong number of cells")
    return rows


def column(name: str, col: str, *, dtype=float) -> np.ndarray:
    """One column of a table as an array; empty cells become NaN (float columns)."""
    rows = read_rows(name)
    if col not in rows[0]:
        raise TableError(f"table {name!r} has no column {col!r}")
    if dtype is float:
        return np.array([float(r[col]) if r[col].strip() else np.nan for r in rows])
    return np.array([r[col] for r in rows], dtype=object)


def require_columns(name: str, cols: list[str]) -> None:
    """Raise :class:`TableError` unless the table has every column in ``cols``."""
    have = set(read_rows(name)[0])
    missing = [c for c in cols if c not in have]
    if missing:
        raise TableError(f"table {name!r} lacks columns {missing}")


def size_ranges(name: str) -> tuple[np.ndarray, np.ndarray]:
    """``over_mm`` and ``upto_mm`` of a size-range table, checked contiguous and increasing.

    ISO 286 ranges read "over ... up to and including ..."; the first range
    starts at 0 (over 0).
    """
    over = column(name, "over_mm")
    upto = column(name, "upto_mm")
    if np.any(upto <= over) or np.any(over[1:] != upto[:-1]):
        raise TableError(f"table {name!r}: size ranges are not contiguous and increasing")
    return over, upto


def range_index(name: str, size_mm) -> np.ndarray:
    """Index of the range "over a up to and including b" that holds each size, -1 outside.

    >>> int(range_index("iso286_it_grades.csv", 30.0))
    4
    >>> int(range_index("iso286_it_grades.csv", 30.0001))
    5
    """
    over, upto = size_ranges(name)
    x = np.asarray(size_mm, dtype=float)
    idx = np.searchsorted(upto, x, side="left")
    ok = (x > over[0]) & (x <= upto[-1]) & np.isfinite(x)
    return np.where(ok, np.minimum(idx, len(upto) - 1), -1)
