"""Property-based fuzz of every public engine and the command line with hostile values.

Each example takes a valid joint of the demo case and replaces one to three of its keys with
values drawn from a mix of valid quantities, boundary values and hostile input (arithmetic
expressions, overlong text, control characters, nan/inf, wrong types, absurd magnitudes).
Only the project's own errors (:class:`fitcheck.errors.FitcheckError`) may come out; a result
that comes out holds no NaN, and no negative capacity, pressure or stiffness.

``FITCHECK_FUZZ_EXAMPLES`` sets the examples per engine (default 300; 2000 when ``CI=true``).
"""

from __future__ import annotations

import contextlib
import dataclasses
import math
import os
import string
import warnings

import pytest
from hypothesis import HealthCheck, given, settings
from hypothesis import strategies as st

from fitcheck import case as casefile
from fitcheck import fits, search
from fitcheck.errors import FitcheckError

_CI = os.environ.get("CI", "").lower() in ("1", "true", "yes")
N = int(os.environ.get("FITCHECK_FUZZ_EXAMPLES", "2000" if _CI else "300"))
FUZZ = settings(max_examples=N, deadline=None, derandomize=True, database=None,
                suppress_health_check=[HealthCheck.too_slow, HealthCheck.filter_too_much])

UNITS = ["mm", "um", "µm", "in", "N", "kN", "lbf", "N*m", "N*mm", "lbf*in", "MPa", "GPa", "psi", "rpm",
         "rad/s", "degC", "°C", "degF", "K", "delta_degC", "1/K", "1/degC", "kg/m**3", "s", "", "kg", "%"]
HOSTILE_TEXT = [
    "9**9**9 mm", "9**9**9**9", "2**1000000", "(1) mm", "1 mm**99", "1 mm**2**2", "__import__('os')",
    "1e9999 mm", "nan mm", "inf mm", "-inf N", "1" * 5000, "x" * 300, "1 mm\x00", "1 mm\u202e",
    "\x1b[31m", "1 mm*", "*", "/", "1 // 2 mm", "1,5 mm", "\u221214 mm", "１４ mm", "1_0 mm", "0x1f mm",
    "1e308 kN", "1e-320 mm", "-0 mm", "+-1 mm", "1 m m m m", "1 " + "m*" * 60 + "m", "", " ", "\t",
]
numbers = st.one_of(
    st.integers(min_value=-10**30, max_value=10**30),
    st.floats(allow_nan=True, allow_infinity=True),
    st.sampled_from([0, -0.0, 1e-300, 5e-324, 1e300, -1, 0.5, 1, 2, 1000, 1001, 2**63]),
)
quantities = st.builds(lambda x, u: f"{x:g} {u}".strip(), st.floats(allow_nan=True, allow_infinity=True),
                       st.sampled_from(UNITS))
texts = st.one_of(
    st.sampled_from(HOSTILE_TEXT),
    st.text(alphabet=string.printable + "µ°²·×Ø\u202e\x00\u200b", max_size=40),
)
scalars = st.one_of(numbers, quantities, texts, st.booleans(), st.none())
values = st.one_of(
    scalars,
    st.lists(scalars, max_size=4),
    st.lists(st.lists(scalars, max_size=3), max_size=3),
    st.dictionaries(st.sampled_from(["E", "nu", "alpha", "Rp02", "Rm", "density", "base", "x"]),
                    scalars, max_size=4),
)
CAPACITIES = ("capacity", "pressure", "stiffness", "compliance", "clamp_force")


def _demo_mapping(table: str) -> tuple[casefile.Engine, dict]:
    dc = casefile.demo_case()
    eng = casefile.ENGINES[table]
    inp = next(i for e, _, i in dc.joints() if e.table == table)
    return eng, {k: v for k, v in inp.to_mapping().items() if v is not None}


def _walk(obj, where="result", seen=None):
    """Every float of a result (dataclasses, tuples, dicts) as (path, value)."""
    seen = set() if seen is None else seen
    if id(obj) in seen:
        return
    seen.add(id(obj))
    if isinstance(obj, bool):
        return
    if isinstance(obj, float):
        yield where, obj
    elif dataclasses.is_dataclass(obj) and not isinstance(obj, type):
        if type(obj).__name__ in ("Material", "Check"):  # checks: see _check_result
            return
        for f in dataclasses.fields(obj):
            yield from _walk(getattr(obj, f.name), f"{where}.{f.name}", seen)
    elif isinstance(obj, tuple | list):
        for i, x in enumerate(obj):
            yield from _walk(x, f"{where}[{i}]", seen)


#: Result fields that are NaN by their documented meaning "not applicable to this joint" (no nut
#: under a tapped screw, no gasket, no engagement in a through-bolted joint).
NOT_APPLICABLE = ("surface_pressure_nut", "p_G_nut", "gasket_pressure", "engagement", "engagement_min")


def _check_result(result) -> None:
    for where, x in _walk(result):
        if where.rsplit(".", 1)[-1] in NOT_APPLICABLE:
            continue
        assert not math.isnan(x), f"{where} is NaN"
        last = where.rsplit(".", 1)[-1]
        if any(w in last for w in CAPACITIES) and math.isfinite(x):
            assert x >= -1e-9 * max(1.0, abs(x)), f"{where} = {x} is negative"
    for chk in getattr(result, "checks", ()):
        assert not math.isnan(chk.limit), chk
        # a value the method cannot give (no contact pressure left) may be NaN, never in a pass
        assert not math.isnan(chk.value) or not chk.passed, chk


def _run_engine(table: str, changes: dict) -> None:
    eng, mapping = _demo_mapping(table)
    mapping.update(changes)
    mod = eng.load()
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        try:
            inp = eng.input_type().from_mapping(mapping, table)
            result = mod.evaluate(inp)
        except FitcheckError:
            return
    _check_result(result)


def _changes(table: str):
    eng = casefile.ENGINES[table]
    keys = [k for k in eng.keys() if k != "name"]
    return st.dictionaries(st.sampled_from(keys), values, min_size=1, max_size=3)


@FUZZ
@given(data=st.data())
def test_pressfit_engine(data):
    _run_engine("pressfit", data.draw(_changes("pressfit")))


@FUZZ
@given(data=st.data())
def test_bearing_engine(data):
    _run_engine("bearing", data.draw(_changes("bearing")))


@FUZZ
@given(data=st.data())
def test_screw_engine(data):
    _run_engine("screws", data.draw(_changes("screws")))


fit_texts = st.one_of(
    texts,
    st.builds(lambda d, h, s: f"{d} {h}/{s}", st.one_of(numbers, texts),
              st.sampled_from(["H7", "H", "h7", "H99", "ZC18", "js6", "X1", "H7 "]),
              st.sampled_from(["s6", "p6", "k", "s99", "a11", "", "s6/s6"])),
)


@FUZZ
@given(text=fit_texts)
def test_fit_engine(text):
    try:
        f = fits.fit(text)
    except FitcheckError:
        return
    _check_result(f)


admitted = st.one_of(scalars, st.lists(scalars, max_size=5), st.text(max_size=3000),
                     st.sampled_from(["9" * 2500, 175.0, None, (5, 6), ("H7",), ("k",), [True]]))


@settings(FUZZ, max_examples=max(N // 4, 50))
@given(holes=admitted, grades=admitted)
def test_fit_search_arguments(holes, grades):
    dc = casefile.demo_case()
    try:
        search.search_fits(dc.pressfits[0], holes=holes, shaft_grades=grades)
    except FitcheckError:
        pass


@settings(FUZZ, max_examples=max(N // 20, 20))
@given(letters=admitted, grades=admitted)
def test_bearing_search_arguments(letters, grades):
    dc = casefile.demo_case()
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        try:
            search.search_bearing_seat(dc.bearings[0], shaft_letters=letters, housing_grades=grades)
        except FitcheckError:
            pass


@settings(FUZZ, max_examples=max(N // 4, 50))
@given(mapping=st.dictionaries(st.sampled_from(["samples", "seed", "target", "rel_err", "confidence",
                                                "importance_samples", "chunk", "x"]),
                               scalars, max_size=4))
def test_study_settings(mapping):
    from fitcheck.study import StudySettings

    try:
        StudySettings.from_mapping(mapping).validate()
    except FitcheckError:
        pass


# --------------------------------------------------------------------------- the command line

COMMANDS = {
    "limits": ["FIT"],
    "pressfit": ["--fit", "--length", "--hub-od", "--torque", "--shaft-material", "--speed"],
    "bearing": ["DESIG", "--shaft", "--housing", "--group", "--t-inner", "--axial-force"],
    "screws": ["THREAD", "--count", "--axial-force", "--layers"],
    "check": ["CASE"],
    "study": ["CASE", "--samples", "--target", "--seed"],
    "search": ["CASE", "--top", "--holes", "--shaft-grades"],
    "report": ["CASE", "-o"],
    "demo": ["-o"],
}
cli_values = st.one_of(
    st.sampled_from(HOSTILE_TEXT + ["5e-324", "1e999", "-1", "0", "nan", "20 H7/s6", "6204", "M5",
                                    "/proc/x.html", "/proc/version", "/", ".", "/nonexistent/x.pdf",
                                    "9" * 5000, "--json", "-", "H7,H8", "5,6,7"]),
    quantities, st.text(alphabet=string.printable, max_size=20),
)


@settings(FUZZ, max_examples=max(N // 4, 50), suppress_health_check=[HealthCheck.function_scoped_fixture, HealthCheck.too_slow, HealthCheck.filter_too_much])
@given(data=st.data())
def test_command_line(data, cli, tmp_path_factory):
    cmd = data.draw(st.sampled_from(sorted(COMMANDS)))
    argv = [cmd]
    case_path = str(tmp_path_factory.getbasetemp() / "fuzz-demo.toml")
    if not os.path.exists(case_path):
        with open(case_path, "w", encoding="utf-8") as f:
            f.write(casefile.demo_text())
    for opt in data.draw(st.lists(st.sampled_from(COMMANDS[cmd]), max_size=3, unique=True)):
        v = data.draw(cli_values)
        if opt == "CASE":
            argv.append(data.draw(st.sampled_from([case_path, v])))
        elif opt.isupper():
            argv.append(v)
        else:
            argv += [opt, v]
    if cmd in ("study",):
        argv += ["--samples", "200"]
    # relative output paths (``demo -o 0``, ``report -o x``) land in a scratch folder, never in the checkout
    with contextlib.chdir(tmp_path_factory.getbasetemp()):
        code, out, err = cli(*argv)
    assert code in (0, 1, 2), (argv, code, err[-2000:])
    assert "Traceback" not in err, (argv, err[-2000:])
    if code == 2:
        assert err.startswith("fitcheck"), (argv, err[-2000:])


def test_study_target_at_the_smallest_float(cli, tmp_path):
    p = tmp_path / "demo.toml"
    p.write_text(casefile.demo_text(), encoding="utf-8")
    code, out, err = cli("study", str(p), "--joint", "gear-on-shaft", "--samples", "1000",
                         "--target", "5e-324")
    assert code in (1, 2) and "Traceback" not in err, err


@pytest.mark.parametrize("target", ["/proc/x.html", "/proc/version.pdf", "DIR.html"])
def test_report_to_an_unwritable_place(cli, tmp_path, target):
    p = tmp_path / "demo.toml"
    p.write_text(casefile.demo_text(), encoding="utf-8")
    if target == "DIR.html":
        (tmp_path / "DIR.html").mkdir()
        target = str(tmp_path / "DIR.html")
    code, out, err = cli("report", str(p), "-o", target)
    assert code == 2 and len(err.splitlines()) == 1, err
