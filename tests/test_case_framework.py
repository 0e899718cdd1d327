"""The case-file framework on its own: TOML writer, registry, validation, atomic save.

A small engine defined here (a pin in a hole, checked against an allowable
force) exercises the registry without depending on the real analyses; the real
engines are tested through the demo case in tests/test_case_engines.py.
"""

from __future__ import annotations

import datetime as dt
import math
import os
import sys
import tomllib
import types
from dataclasses import dataclass

import pytest
from hypothesis import HealthCheck, given, settings
from hypothesis import strategies as st

from fitcheck import case as case_mod
from fitcheck import tomlwrite
from fitcheck.checks import Check
from fitcheck.errors import ErrorCollector, InputError, InputErrors, did_you_mean
from fitcheck.inputlimits import FORMAT_CHARACTERS
from fitcheck.units import temperature_c, to_core

# --------------------------------------------------------------------------- a test engine

KEYS = {"name": "joint name", "length": "engagement length [mm]", "force": "axial force [N]",
        "temperature_max": "highest temperature [degC]", "note": "free text"}


@dataclass(frozen=True)
class PinInput:
    name: str
    length: str
    force: str
    temperature_max: str = "20 degC"
    note: str = ""

    @classmethod
    def from_mapping(cls, m, field=""):
        errs = ErrorCollector()
        vals = {}
        for key in ("name", "length", "force", "temperature_max", "note"):
            if key not in m:
                if key in ("length", "force"):
                    errs.add(InputError(f"{field}.{key}", None, "a value (required)"))
                continue
            v = m[key]
            try:
                if key == "length":
                    to_core(v, "length", f"{field}.{key}", lo=0, lo_open=True, hi=1e4)
                elif key == "force":
                    to_core(v, "force", f"{field}.{key}", lo=0, hi=1e9)
                elif key == "temperature_max":
                    temperature_c(v, f"{field}.{key}", hi=500)
                elif not isinstance(v, str):
                    raise InputError(f"{field}.{key}", v, "a text")
            except InputError as e:
                errs.add(e)
                continue
            vals[key] = v
        errs.raise_if_any()
        return cls(**vals)

    def to_mapping(self):
        return {"name": self.name, "length": self.length, "force": self.force,
                "temperature_max": self.temperature_max, "note": self.note}


@dataclass(frozen=True)
class PinResult:
    checks: list

    @property
    def ok(self):
        return all(c.passed for c in self.checks)


def evaluate(inp):
    f = to_core(inp.force, "force", "force")
    return PinResult([Check("axial force", f, 1000.0, "<=", "N", "test rule 1")])


@pytest.fixture
def pin_engine(monkeypatch):
    mod = types.ModuleType("fitcheck_test_pin_engine")
    mod.KEYS, mod.PinInput, mod.evaluate, mod.METHOD_NOTES = KEYS, PinInput, evaluate, ()
    monkeypatch.setitem(sys.modules, mod.__name__, mod)
    eng = case_mod.Engine("pin", "pressfits", mod.__name__, "PinInput", "Pin")
    monkeypatch.setattr(case_mod, "ENGINES", {"pin": eng})
    return eng


GOOD = """format_version = 1
[title]
project = "Pump"
date = 2025-03-14
[conditions]
temperature_max = "60 degC"
[[pin]]
name = "a"
length = "10 mm"
force = "200 N"
[[pin]]
name = "b"
length = "12 mm"
force = "300 N"
temperature_max = "80 degC"
"""


# --------------------------------------------------------------------------- TOML writer

_keys = st.text(min_size=0, max_size=12)
_scalars = (st.text(max_size=30) | st.integers(-2**63, 2**63 - 1) | st.booleans()
            | st.floats(allow_nan=False, allow_infinity=False) | st.dates())
_values = st.recursive(_scalars, lambda inner: st.lists(inner, max_size=4)
                       | st.dictionaries(_keys, inner, max_size=4), max_leaves=12)


@settings(max_examples=300, deadline=None)
@given(st.dictionaries(_keys, _values, max_size=6))
def test_toml_writer_round_trips_through_tomllib(doc):
    # independent check: the standard library's TOML 1.0 parser reads back the same data
    assert tomllib.loads(tomlwrite.dumps(doc)) == doc


def test_toml_writer_escapes_every_control_character():
    s = "".join(chr(i) for i in range(0x20)) + '\x7f"\\ é ∅ 😀'
    text = tomlwrite.dumps({"s": s})
    assert tomllib.loads(text)["s"] == s
    assert all(ch == "\n" or ord(ch) >= 0x20 for ch in text)  # no raw control characters


def test_toml_writer_layout_of_tables_and_arrays_of_tables():
    doc = {"a": 1, "t": {"x": "1 mm", "m": {"base": "C45E"}},
           "j": [{"name": "p", "sub": {"k": [1, 2]}}, {"name": "q"}]}
    text = tomlwrite.dumps(doc)
    assert "[t]" in text and "[[j]]" in text and 'm = {base = "C45E"}' in text
    assert tomllib.loads(text) == doc


def test_toml_writer_refuses_none_and_objects():
    with pytest.raises(tomlwrite.TomlWriteError):
        tomlwrite.dumps({"x": None})
    with pytest.raises(tomlwrite.TomlWriteError):
        tomlwrite.dumps({"x": object()})


def test_toml_writer_writes_nonfinite_floats_as_toml_words():
    assert tomllib.loads(tomlwrite.dumps({"a": math.inf, "b": -math.inf}))["b"] == -math.inf
    assert math.isnan(tomllib.loads(tomlwrite.dumps({"c": math.nan}))["c"])


# --------------------------------------------------------------------------- loading

def test_load_conditions_are_defaults_and_joints_override(pin_engine):
    c = case_mod.loads(GOOD)
    assert [n for _, n, _ in c.joints()] == ["a", "b"]
    a, b = c.pressfits
    assert a.temperature_max == "60 degC" and b.temperature_max == "80 degC"
    assert c.title.project == "Pump" and c.title.date == dt.date(2025, 3, 14)


def test_every_problem_is_reported_at_once_with_table_key_value_and_allowed(pin_engine):
    text = """format_version = 1
titel = "x"
[conditions]
sped = "3000 rpm"
temperature_min = "90 degC"
temperature_max = "60 degC"
[[pin]]
name = "gear-on-shaft"
lenght = "10 mm"
force = "-5 N"
[[pin]]
name = "gear-on-shaft"
length = "3 kg"
force = "1 N"
"""
    with pytest.raises(InputErrors) as ei:
        case_mod.loads(text)
    msgs = [e.message for e in ei.value.errors]
    joined = "\n".join(msgs)
    assert "titel" in joined and "did you mean 'title'" in joined
    assert "conditions.sped" in joined and "did you mean 'speed'" in joined
    assert "conditions.temperature_min" in joined and "temperature_max" in joined
    assert "pin[gear-on-shaft].lenght" in joined and "did you mean 'length'" in joined
    assert "pin[gear-on-shaft].force: got '-5 N'" in joined
    assert "pin[gear-on-shaft].length: got '3 kg'; allowed: a length" in joined
    assert "already used by pin[gear-on-shaft]" in joined
    assert len(msgs) >= 8


def test_bad_inherited_condition_is_blamed_on_conditions(pin_engine):
    text = GOOD.replace('temperature_max = "60 degC"', 'temperature_max = "600 degC"', 1)
    with pytest.raises(InputError) as ei:
        case_mod.loads(text)
    assert ei.value.field.startswith("conditions.temperature_max")


@pytest.mark.parametrize("version,needle", [(2, "newer fitcheck; this one reads format_version ≤ 1"),
                                            (0, "from 1 to 1"), ('"1"', "whole number")])
def test_format_version_policy(pin_engine, version, needle):
    with pytest.raises(InputError, match=needle):
        case_mod.loads(GOOD.replace("format_version = 1", f"format_version = {version}"))


def test_missing_engine_is_a_clear_input_error_not_import_error(monkeypatch):
    eng = case_mod.Engine("gizmo", "screws", "fitcheck.no_such_engine", "GizmoInput", "Gizmo")
    monkeypatch.setattr(case_mod, "ENGINES", {"gizmo": eng})
    with pytest.raises(InputError, match=r"gizmo engine \(fitcheck.no_such_engine\) is not available"):
        case_mod.loads('format_version = 1\n[[gizmo]]\nname = "x"\n')
    # a file that does not use it still loads
    assert len(case_mod.loads("format_version = 1\n")) == 0


def test_single_table_instead_of_array_is_explained(pin_engine):
    with pytest.raises(InputError, match=r"write \[\[pin\]\]"):
        case_mod.loads('format_version = 1\n[pin]\nname = "x"\nlength = "1 mm"\nforce = "1 N"\n')


# --------------------------------------------------------------------------- writing

_name = st.text(st.characters(blacklist_categories=("Cs", "Cc"), blacklist_characters=FORMAT_CHARACTERS),
                min_size=1, max_size=20).filter(
    lambda s: s.strip() == s and s)
# text a case may hold: no control or bidi-format characters (the loader refuses those)
_text = st.text(st.characters(blacklist_categories=("Cs", "Cc"), blacklist_characters=FORMAT_CHARACTERS),
                max_size=40)


@settings(max_examples=80, deadline=None, suppress_health_check=[HealthCheck.function_scoped_fixture])
@given(names=st.lists(_name, min_size=1, max_size=4, unique=True),
       lengths=st.lists(st.floats(0.01, 5000), min_size=4, max_size=4),
       forces=st.lists(st.floats(0, 1e8), min_size=4, max_size=4),
       temps=st.lists(st.floats(-100, 499), min_size=4, max_size=4),
       units=st.sampled_from([("mm", "N"), ("in", "lbf")]),
       project=_text, note=_text, tmax=st.floats(-100, 500))
def test_case_round_trip_load_dumps_load(pin_engine, names, lengths, forces, temps, units, project,
                                         note, tmax):
    lu, fu = units
    case = case_mod.DesignCase(
        title=case_mod.Title(project=project, author='O\'Neil "QA"', revision="Ω-2"),
        conditions={"temperature_max": f"{tmax!r} degC"},
        pressfits=tuple(PinInput(n, f"{lengths[i] / (25.4 if lu == 'in' else 1)!r} {lu}",
                                 f"{forces[i]!r} {fu}", f"{temps[i]!r} degC", note)
                        for i, n in enumerate(names)),
        names={"pin": tuple(names)})
    text = case_mod.dumps(case)
    again = case_mod.loads(text)
    assert again == case
    assert case_mod.loads(case_mod.dumps(again)) == again


def test_condition_values_are_not_repeated_in_each_joint(pin_engine):
    text = case_mod.dumps(case_mod.loads(GOOD))
    assert text.count("60 degC") == 1 and text.count("80 degC") == 1


def test_save_writes_the_file_and_leaves_no_temp_file(pin_engine, tmp_path):
    c = case_mod.loads(GOOD)
    p = case_mod.save(c, tmp_path / "drive.toml")
    assert case_mod.load(p) == c
    assert sorted(os.listdir(tmp_path)) == ["drive.toml"]


@pytest.mark.parametrize("where", ["replace", "write"])
def test_save_is_atomic_old_file_intact_after_a_crash(pin_engine, tmp_path, monkeypatch, where):
    target = tmp_path / "drive.toml"
    target.write_text(GOOD, encoding="utf-8")
    old = target.read_bytes()
    changed = case_mod.replace(case_mod.loads(GOOD), title=case_mod.Title(project="changed"))

    class Crash(OSError):
        pass

    def boom(*a, **k):
        raise Crash("disk pulled mid-write")

    if where == "replace":
        monkeypatch.setattr(case_mod.os, "replace", boom)
    else:
        real_fdopen = os.fdopen

        def fdopen(fd, *a, **k):
            f = real_fdopen(fd, *a, **k)

            class Half:
                def __enter__(self):
                    return self

                def __exit__(self, *exc):
                    f.close()

                def write(self, data):
                    f.write(data[: len(data) // 2])
                    f.flush()
                    raise Crash("disk full mid-write")

            return Half()

        monkeypatch.setattr(case_mod.os, "fdopen", fdopen)
    with pytest.raises(Crash):
        case_mod.save(changed, target)
    assert target.read_bytes() == old
    assert sorted(os.listdir(tmp_path)) == ["drive.toml"]


def test_save_keeps_the_permissions_of_the_file_it_replaces(pin_engine, tmp_path):
    target = tmp_path / "drive.toml"
    target.write_text(GOOD, encoding="utf-8")
    os.chmod(target, 0o640)
    case_mod.save(case_mod.loads(GOOD), target)
    assert target.stat().st_mode & 0o777 == 0o640


# --------------------------------------------------------------------------- evaluating

def test_evaluate_flattens_checks_with_joint_names_and_orders_by_margin(pin_engine):
    c = case_mod.loads(GOOD.replace('force = "300 N"', 'force = "1200 N"'))
    r = case_mod.evaluate(c)
    assert [(k.joint, k.check.name) for k in r.checks] == [("a", "axial force"), ("b", "axial force")]
    assert not r.ok
    worst = r.by_margin()[0]
    assert worst.joint == "b" and not worst.passed
    # margin of a "<=" check is 1 - value/limit (fitcheck.checks)
    assert worst.margin == pytest.approx(1 - 1200 / 1000)
    assert r.to_dict()["checks"][1]["joint"] == "b"


def test_did_you_mean_is_used_for_top_level_tables(pin_engine):
    with pytest.raises(InputError) as ei:
        case_mod.loads(GOOD + '\n[[pni]]\nname = "x"\n')
    assert did_you_mean("pni", ["pin"]) in ei.value.message
