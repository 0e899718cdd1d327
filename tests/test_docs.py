"""The README stays true: its two commands exist, CI runs its test command, every case key is documented."""

import re
from pathlib import Path

import pytest

from fitcheck import bearings, pressfit, screws

ROOT = Path(__file__).resolve().parents[1]
README = (ROOT / "README.md").read_text(encoding="utf-8")


def _section(title: str) -> str:
    start = README.index(title)
    nxt = README.find("\n## ", start + 1)
    sub = README.find("\n### ", start + 1)
    ends = [e for e in (nxt, sub) if e != -1]
    return README[start:min(ends)] if ends else README[start:]


def test_first_paragraph_states_the_job():
    first = README.split("\n\n")[1]
    for word in ("ISO 286", "press fit", "bearing", "screws", "tightening torque", "report"):
        assert word in first


def test_two_commands_are_make_targets_and_ci_runs_the_test_one():
    makefile = (ROOT / "Makefile").read_text()
    assert "make app" in README and "make test" in README
    assert re.search(r"^app:", makefile, re.M) and re.search(r"^test:", makefile, re.M)
    ci = (ROOT / ".ci" / "run").read_text()
    assert "make test" in ci


@pytest.mark.parametrize("mod, title", [(pressfit, "### `[[pressfit]]` keys"),
                                        (bearings, "### `[[bearing]]` keys"),
                                        (screws, "### `[[screws]]` keys")])
def test_every_case_key_is_in_the_readme(mod, title):
    section = _section(title)
    missing = [k for k in mod.KEYS if f"`{k}`" not in section]
    assert not missing, f"README section {title} lacks {missing}"


def test_readme_carries_the_caution():
    assert "Verify every result by test" in README
    assert "licensed professional practice" in README
