"""``fitcheck check``: the demo passes, failures exit 1, and every malformed file exits 2.

The malformed corpus is generated here from the demo case (one defect per file)
plus files that are not case files at all. Each must give exit code 2, a clear
message on stderr naming the problem, nothing on stdout and never a traceback.
"""

from __future__ import annotations

import json

import pytest

from fitcheck import CAUTION
from fitcheck import case as case_mod

DEMO = case_mod.demo_text()


def mutate(old: str, new: str, count: int = 1) -> str:
    assert old in DEMO, f"the demo no longer contains {old!r}"  # keeps the corpus meaningful
    return DEMO.replace(old, new, count)


# (id, file content, text the error message must contain)
CORPUS: list[tuple[str, str | bytes, str]] = [
    ("empty-file", b"", "empty file"),
    ("only-blank-lines", b"  \n\n\t\n", "empty file"),
    ("binary-garbage", bytes(range(256)) * 8, "not UTF-8"),
    ("nul-bytes", b"format_version = 1\n\x00\x00\x00", "binary data"),
    ("toml-unclosed-header", DEMO + "\n[[pressfit]\nname = 'x'\n", "invalid TOML"),
    ("toml-unterminated-string", mutate('project = "Benchtop pump BP-20"', 'project = "Benchtop'),
     "invalid TOML"),
    ("toml-duplicate-key", mutate("format_version = 1", "format_version = 1\nformat_version = 1"),
     "invalid TOML"),
    ("two-mebibyte-file", DEMO + "#" + "x" * (2 << 20) + "\n", "1 MiB"),
    ("future-format-version", mutate("format_version = 1", "format_version = 2"),
     "written by a newer fitcheck; this one reads format_version ≤ 1"),
    ("missing-format-version", mutate("format_version = 1", ""), "format_version"),
    ("format-version-as-text", mutate("format_version = 1", 'format_version = "1"'), "whole number"),
    ("format-version-zero", mutate("format_version = 1", "format_version = 0"), "format_version"),
    ("unknown-table", mutate("[[screws]]", "[[screw]]"), "did you mean 'screws'"),
    ("unknown-joint-key", mutate('length = "14 mm"', 'lenght = "14 mm"'),
     "pressfit[gear-on-shaft].lenght"),
    ("unknown-title-key", mutate('author = "Demo designer"', 'autor = "Demo designer"'),
     "did you mean 'author'"),
    ("unknown-condition", mutate('speed = "2800 rpm"', 'sped = "2800 rpm"'), "did you mean 'speed'"),
    ("duplicate-joint-names", mutate('name = "B-side-6002"', 'name = "A-side-6202"'),
     "already used by bearing[A-side-6202]"),
    ("missing-joint-name", mutate('name = "cover-screws"', ""), "screws[#1].name"),
    ("length-in-kilograms", mutate('length = "14 mm"', 'length = "14 kg"'),
     "pressfit[gear-on-shaft].length"),
    ("length-not-a-number", mutate('length = "14 mm"', 'length = "fourteen mm"'),
     "pressfit[gear-on-shaft].length"),
    ("negative-length", mutate('length = "14 mm"', 'length = "-14 mm"'),
     "pressfit[gear-on-shaft].length"),
    ("absurd-length", mutate('length = "14 mm"', 'length = "1e30 mm"'),
     "pressfit[gear-on-shaft].length"),
    ("teeth-as-text", mutate("teeth = 42", 'teeth = "many"'), "pressfit[gear-on-shaft].teeth"),
    ("torque-nan", mutate('torque = "3.2 N*m"', "torque = nan"), "finite"),
    ("torque-nan-text", mutate('torque = "3.2 N*m"', 'torque = "nan N*m"'),
     "pressfit[gear-on-shaft].torque"),
    ("speed-inf", mutate('speed = "2800 rpm"', "speed = inf"), "finite"),
    ("speed-in-millimetres", mutate('speed = "2800 rpm"', 'speed = "2800 mm"'), "conditions.speed"),
    ("absurd-temperature", mutate('temperature_max = "60 degC"', 'temperature_max = "5000 degC"'),
     "conditions.temperature_max"),
    ("below-absolute-zero", mutate('temperature_min = "-10 degC"', 'temperature_min = "-300 degC"'),
     "conditions.temperature_min"),
    ("min-above-max", mutate('temperature_min = "-10 degC"', 'temperature_min = "90 degC"'),
     "temperature_max"),
    ("title-as-number", mutate('project = "Benchtop pump BP-20"', "project = 42"), "title.project"),
    ("title-as-array", mutate("[title]", "title = [1, 2]\n[old_title]"), "title"),
    ("single-table-not-array", mutate("[[screws]]", "[screws]"), "write [[screws]]"),
    ("joint-entry-is-a-number", "format_version = 1\npressfit = [1, 2]\n", "pressfit[#1]"),
    ("bool-for-a-factor", mutate("slip_safety = 1.5", "slip_safety = true"),
     "pressfit[gear-on-shaft].slip_safety"),
    ("unknown-fit-class", mutate('fit = "16 H7/s6"', 'fit = "16 H7/zz9"'),
     "pressfit[gear-on-shaft].fit"),
    ("unknown-bearing", mutate('designation = "6202"', 'designation = "6299X"'),
     "bearing[A-side-6202].designation"),
    ("missing-bearing-designation", mutate('designation = "6002"', ""),
     "bearing[B-side-6002].designation"),
    ("unknown-thread", mutate('thread = "M5"', 'thread = "M4.5"'), "screws[cover-screws].thread"),
    ("unknown-property-class", mutate('property_class = "8.8"', 'property_class = "9.9"'),
     "screws[cover-screws].property_class"),
    ("unknown-material", mutate('hub_material = "16MnCr5"', 'hub_material = "16MnCr"'),
     "did you mean"),
    ("conditions-as-text", mutate("format_version = 1", 'format_version = 1\nconditions = "hot"')
     .replace("[conditions]", "[more_conditions]"), "[conditions] table"),
    ("absurd-torque", mutate('torque = "3.2 N*m"', 'torque = "1e30 N*m"'),
     "pressfit[gear-on-shaft].torque"),
    ("tiny-length", mutate('length = "14 mm"', 'length = "1e-30 mm"'),
     "pressfit[gear-on-shaft].length"),
    ("absurd-layer-thickness", mutate('thickness = "6 mm"', 'thickness = "6e9 mm"'),
     "screws[cover-screws].layers[0].thickness"),
    ("absurd-tooth-count", mutate("teeth = 42", "teeth = 420000000000"),
     "pressfit[gear-on-shaft].teeth"),
]


def test_corpus_is_large_enough():
    assert len(CORPUS) >= 30
    assert len({c[0] for c in CORPUS}) == len(CORPUS)


@pytest.mark.parametrize("content,needle", [c[1:] for c in CORPUS], ids=[c[0] for c in CORPUS])
def test_malformed_case_exits_2_with_a_clear_message(cli, tmp_path, content, needle):
    p = tmp_path / "bad.toml"
    if isinstance(content, bytes):
        p.write_bytes(content)
    else:
        p.write_text(content, encoding="utf-8")
    code, out, err = cli("check", str(p))
    assert code == 2, err
    assert needle in err
    assert out == ""
    assert "Traceback" not in err and err.startswith("fitcheck: ")


def test_every_problem_of_a_file_is_listed(cli, tmp_path):
    text = (DEMO.replace('length = "14 mm"', 'lenght = "14 mm"')
            .replace('thread = "M5"', 'thread = "M4.5"')
            .replace('speed = "2800 rpm"', 'speed = "2800 mm"')
            .replace('name = "B-side-6002"', 'name = "A-side-6202"'))
    p = tmp_path / "bad.toml"
    p.write_text(text, encoding="utf-8")
    code, _, err = cli("check", str(p))
    assert code == 2
    for needle in ("lenght", "thread", "conditions.speed", "already used"):
        assert needle in err
    assert err.count("\n  - ") >= 4


def test_problems_of_several_files_name_each_file(cli, tmp_path):
    a, b = tmp_path / "a.toml", tmp_path / "b.toml"
    a.write_text(DEMO.replace('thread = "M5"', 'thread = "M4.5"'), encoding="utf-8")
    b.write_text(DEMO.replace("format_version = 1", "format_version = 7"), encoding="utf-8")
    code, _, err = cli("check", str(a), str(b))
    assert code == 2
    assert f"{a}.screws[cover-screws].thread" in err and f"{b}.format_version" in err


def test_missing_file_and_empty_glob_exit_2(cli, tmp_path):
    code, _, err = cli("check", str(tmp_path / "nope.toml"))
    assert code == 2 and "existing TOML file" in err
    code, _, err = cli("check", str(tmp_path / "*.toml"))
    assert code == 2 and "glob" in err


# --------------------------------------------------------------------------- good cases

@pytest.fixture
def demo_file(tmp_path):
    p = tmp_path / "benchtop_pump.toml"
    p.write_text(DEMO, encoding="utf-8")
    return p


def test_demo_passes_and_lists_every_check(cli, demo_file):
    expected = case_mod.evaluate(case_mod.demo_case())
    code, out, err = cli("check", str(demo_file))
    assert code == 0, err
    assert err == ""
    for c in expected.checks:
        line = next(ln for ln in out.splitlines() if ln.startswith(c.label) and c.check.name in ln)
        assert line.rstrip().endswith("pass")
    assert len(expected.checks) >= 12
    assert f"{len(expected.checks)} checks: every check passes" in out
    assert CAUTION in out


def test_demo_json(cli, demo_file):
    code, out, _ = cli("check", str(demo_file), "--json")
    assert code == 0
    data = json.loads(out)
    assert data["ok"] is True and data["caution"] == CAUTION
    checks = data["cases"][0]["checks"]
    assert len(checks) == len(case_mod.evaluate(case_mod.demo_case()).checks)
    assert {c["kind"] for c in checks} == {"pressfit", "bearing", "screws"}
    assert all(c["passed"] for c in checks)


def test_a_failing_check_exits_1_and_says_fail(cli, tmp_path):
    p = tmp_path / "weak.toml"
    # ten times the torque: the press fit must slip
    p.write_text(DEMO.replace('torque = "3.2 N*m"', 'torque = "32 N*m"'), encoding="utf-8")
    code, out, _ = cli("check", str(p))
    assert code == 1
    slip = next(ln for ln in out.splitlines() if "slip at loosest fit" in ln)
    assert slip.rstrip().endswith("FAIL")
    assert "FAIL" in out and CAUTION in out


def test_several_files_and_a_glob(cli, tmp_path, demo_file):
    (tmp_path / "second.toml").write_text(DEMO, encoding="utf-8")
    code, out, _ = cli("check", str(tmp_path / "*.toml"))
    assert code == 0
    n = len(case_mod.evaluate(case_mod.demo_case()).checks)
    assert f"{2 * n} checks: every check passes" in out
    assert "second.toml" in out and "benchtop_pump.toml" in out


# --------------------------------------------------------------------------- demo command

def test_demo_command_writes_and_refuses_to_overwrite(cli, tmp_path):
    p = tmp_path / "pump.toml"
    code, out, _ = cli("demo", "-o", str(p))
    assert code == 0 and p.read_text(encoding="utf-8") == DEMO and CAUTION in out
    p.write_text("mine", encoding="utf-8")
    code, _, err = cli("demo", "-o", str(p))
    assert code == 2 and "--force" in err and p.read_text(encoding="utf-8") == "mine"
    code, _, _ = cli("demo", "-o", str(p), "--force")
    assert code == 0 and p.read_text(encoding="utf-8") == DEMO
    assert sorted(x.name for x in tmp_path.iterdir()) == ["pump.toml"]


def test_demo_command_prints_with_dash(cli):
    code, out, _ = cli("demo", "-o", "-")
    assert code == 0 and out == DEMO
