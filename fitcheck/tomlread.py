"""Safe reading of TOML files (case files): size cap, no code execution, clear errors.

TOML is parsed with the standard library's :mod:`tomllib`, which only builds
data; nothing in a file is ever executed. Before parsing, the text is scanned for
nesting, value counts and text lengths beyond what a case file holds
(:mod:`fitcheck.inputlimits`), so a hostile file is refused in time linear in its size.
A UTF-8 byte-order mark at the start is read past.
"""

from __future__ import annotations

import tomllib
from pathlib import Path

from .errors import InputError
from .inputlimits import check_tree, scan_text

MAX_BYTES = 1 << 20  # 1 MiB


def read_toml_bytes(raw: bytes, source: str = "case file") -> dict:
    """Parse TOML from bytes; every failure is an :class:`InputError` naming ``source``."""
    if len(raw) > MAX_BYTES:
        raise InputError(source, f"{len(raw)} bytes", f"a file of at most {MAX_BYTES} bytes (1 MiB)")
    if not raw.strip():
        raise InputError(source, "an empty file", "a TOML case file with at least 'format_version'")
    try:
        text = raw.decode("utf-8")
    except UnicodeDecodeError as exc:
        raise InputError(source, f"bytes that are not UTF-8 text (at byte {exc.start})",
                         "a UTF-8 TOML text file") from None
    if "\x00" in text:
        raise InputError(source, "binary data (NUL bytes)", "a UTF-8 TOML text file")
    text = text.removeprefix("\ufeff")  # a UTF-8 byte-order mark, as some editors write: read past it
    scan_text(text, source)  # nesting, count and length limits, before tomllib recurses or loops
    try:
        data = tomllib.loads(text)
    except tomllib.TOMLDecodeError as exc:
        raise InputError(source, "invalid TOML", "TOML syntax (https://toml.io)", str(exc)) from None
    except (RecursionError, ValueError) as exc:  # pragma: no cover - scan_text refuses these first
        raise InputError(source, "TOML that cannot be read", "a case file as fitcheck writes it",
                         type(exc).__name__) from None
    check_tree(data, source)
    return data


def read_toml(path: str | Path) -> dict:
    """Read and parse a TOML file from disk (at most 1 MiB)."""
    p = Path(path)
    if not p.is_file():
        raise InputError("file", str(path), "an existing TOML file")
    size = p.stat().st_size
    if size > MAX_BYTES:
        raise InputError(str(path), f"{size} bytes", f"a file of at most {MAX_BYTES} bytes (1 MiB)")
    return read_toml_bytes(p.read_bytes(), str(path))
