"""Hostile case files: each is refused with exit code 2 and exactly one line on stderr.

The corpus (``tests/hostile/cases``, written by ``tests/hostile/make_corpus.py``) holds one
hostile change per file: quantity strings that are expressions or too long, deep nesting,
oversized values and arrays, nan/inf and absurd magnitudes, control and bidi characters in
names and the title block, broken encodings and structures. A guard alarm turns a hang into
a failure instead of a stuck suite.
"""

from __future__ import annotations

import signal
import subprocess
import sys
from pathlib import Path

import pytest

from fitcheck import case as casefile
from fitcheck.errors import InputError

CASES = sorted((Path(__file__).parent / "hostile" / "cases").glob("*.toml"))
ROOT = Path(__file__).resolve().parents[1]


@pytest.fixture
def no_hang():
    """Fail (instead of hanging the suite) when a refusal takes more than 20 s."""
    def alarm(signum, frame):
        raise AssertionError("no answer within 20 s: a hang")

    old = signal.signal(signal.SIGALRM, alarm)
    signal.alarm(20)
    try:
        yield
    finally:
        signal.alarm(0)
        signal.signal(signal.SIGALRM, old)


def test_the_corpus_is_large_enough():
    assert len(CASES) >= 100


@pytest.mark.parametrize("path", CASES, ids=[p.stem for p in CASES])
def test_refused_with_one_line(path, cli, no_hang):
    code, out, err = cli("check", str(path))
    assert code == 2, (out, err)
    lines = err.splitlines()
    assert len(lines) == 1, err
    assert lines[0].startswith("fitcheck: ")
    assert "Traceback" not in err
    assert len(lines[0]) < 1000  # a cut value, never the whole hostile text


@pytest.mark.parametrize("path", CASES, ids=[p.stem for p in CASES])
def test_refused_by_the_loader_as_input_error(path, no_hang):
    """The library refuses the same files with its own error (the browser pages use this path)."""
    try:
        dc = casefile.loads(path.read_bytes(), source=path.name)
    except InputError as exc:
        assert exc.field and exc.allowed
        return
    except Exception as exc:  # InputErrors is the only other allowed type
        assert type(exc).__name__ == "InputErrors", repr(exc)
        return
    assert len(dc) == 0 or pytest.fail(f"{path.name} was accepted")


def test_a_file_over_one_mebibyte_is_refused(tmp_path, cli):
    p = tmp_path / "big.toml"
    p.write_text("format_version = 1\n#" + "x" * (1 << 20) + "\n", encoding="utf-8")
    code, _, err = cli("check", str(p))
    assert code == 2 and len(err.splitlines()) == 1 and "1 MiB" in err


def test_a_byte_order_mark_is_read_past(tmp_path, cli):
    p = tmp_path / "bom.toml"
    p.write_bytes(b"\xef\xbb\xbf" + casefile.demo_text().encode("utf-8"))
    assert casefile.load(p) == casefile.demo_case()
    code, out, err = cli("check", str(p))
    assert code in (0, 1) and not err


@pytest.mark.parametrize("name", ["nest-2000-brackets", "unit-power-tower", "array-50000",
                                  "name-rlo", "not-utf8"])
def test_a_real_process_exits_2_with_one_line(name):
    path = next(p for p in CASES if p.stem.endswith(name))
    r = subprocess.run([sys.executable, "-m", "fitcheck", "check", str(path)], capture_output=True,
                       text=True, timeout=120, cwd=ROOT)
    assert r.returncode == 2, r.stderr[-2000:]
    assert len(r.stderr.splitlines()) == 1 and "Traceback" not in r.stderr
