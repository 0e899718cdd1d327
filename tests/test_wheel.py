"""The built wheel carries the tables and works from a fresh virtual environment.

Builds the wheel (hatchling, without build isolation: no network needed), installs it with
``--no-deps`` into a new venv whose site-packages reach numpy/scipy/pint of the project venv
through a .pth file, and looks up a fit from a directory outside the repository.
"""

from __future__ import annotations

import subprocess
import sys
import sysconfig
import textwrap
from pathlib import Path

import pytest

ROOT = Path(__file__).resolve().parent.parent

pytestmark = pytest.mark.slow


def _run(cmd, cwd=None, timeout=300):
    r = subprocess.run(cmd, cwd=cwd, capture_output=True, text=True, timeout=timeout)
    assert r.returncode == 0, f"{cmd}\nstdout:\n{r.stdout}\nstderr:\n{r.stderr}"
    return r.stdout


def test_wheel_installs_and_finds_its_tables(tmp_path):
    dist = tmp_path / "dist"
    _run([sys.executable, "-m", "build", "--wheel", "--no-isolation", "--outdir", str(dist),
          str(ROOT)], cwd=ROOT)
    wheels = list(dist.glob("fitcheck-*.whl"))
    assert len(wheels) == 1

    venv = tmp_path / "venv"
    _run([sys.executable, "-m", "venv", "--without-pip", str(venv)])
    vpy = venv / "bin" / "python"
    _run([sys.executable, "-m", "pip", "--python", str(vpy), "install", "--no-deps", "--no-index",
          "--quiet", str(wheels[0])])
    site = Path(_run([str(vpy), "-c", "import sysconfig; print(sysconfig.get_paths()['purelib'])"])
                .strip())
    (site / "_project_deps.pth").write_text(sysconfig.get_paths()["purelib"] + "\n")

    outside = tmp_path / "elsewhere"
    outside.mkdir()
    code = textwrap.dedent(f"""
        from pathlib import Path
        import fitcheck, fitcheck.tables
        from fitcheck.fits import fit
        venv = Path({str(venv)!r}).resolve()
        assert Path(fitcheck.__file__).resolve().is_relative_to(venv), fitcheck.__file__
        assert fitcheck.tables.data_dir().resolve().is_relative_to(venv), fitcheck.tables.data_dir()
        assert (fitcheck.tables.data_dir() / "iso286_special_cases.csv").is_file()
        f = fit("25 H7/p6")
        assert (f.shaft.upper_um, f.shaft.lower_um) == (35.0, 22.0), f.shaft
        assert (f.hole.lower_um, f.hole.upper_um) == (0.0, 21.0), f.hole
        print("ok", f.kind)
    """)
    out = _run([str(vpy), "-I", "-c", code], cwd=outside)
    assert out.strip() == "ok interference"
