"""Writing output files safely: exclusive, unpredictable temporary names, then an atomic rename.

A report or a case is first written to a temporary file in the target's folder, created
with ``O_CREAT | O_EXCL`` under a random name (:func:`tempfile.mkstemp`), so nothing
planted beside the target (a symbolic link, a file with the name a previous run used)
is ever opened or overwritten; the finished file is then renamed over the target, so a
failed run leaves neither half a file nor a temporary one.
"""

from __future__ import annotations

import os
import tempfile
from collections.abc import Callable
from pathlib import Path
from typing import BinaryIO

from .errors import InputError


def atomic_write(path: str | os.PathLike, write: Callable[[BinaryIO], object]) -> Path:
    """Call ``write(f)`` on a new exclusive temporary file and rename it to ``path``.

    The file gets the permissions a plain new file would get (``0o666`` less the umask),
    or those of the file it replaces.

    >>> import tempfile, pathlib
    >>> d = pathlib.Path(tempfile.mkdtemp())
    >>> atomic_write(d / "a.txt", lambda f: f.write(b"hello")).read_bytes()
    b'hello'
    >>> sorted(p.name for p in d.iterdir())
    ['a.txt']
    """
    target = Path(path)
    if target.is_dir():
        raise InputError("output", str(path), "a file name, not a folder")
    folder = target.parent if str(target.parent) else Path(".")
    if not folder.is_dir():
        raise InputError("output", str(path), "a path in an existing folder")
    try:
        fd, tmp = tempfile.mkstemp(prefix=f".{target.name}.", suffix=".tmp", dir=folder)
    except OSError as exc:
        raise InputError("output", str(path), "a path in a folder this user may write to",
                         exc.strerror or type(exc).__name__) from None
    try:
        with os.fdopen(fd, "wb") as f:
            write(f)
            f.flush()
            os.fsync(f.fileno())
        try:
            mode = target.stat().st_mode & 0o777
        except FileNotFoundError:
            umask = os.umask(0)
            os.umask(umask)
            mode = 0o666 & ~umask
        os.chmod(tmp, mode)
        os.replace(tmp, target)
    except BaseException:
        try:
            os.unlink(tmp)
        except FileNotFoundError:
            pass
        raise
    return target
