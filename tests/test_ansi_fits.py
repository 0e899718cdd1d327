"""ASME B4.1 fits: properties of the table and the API, and inch/SI invariance of verdicts.

Sources: the table's own definition of its limits of clearance (ASME B4.1-1967, footnote a of
the tables: the printed pairs result from applying the standard tolerance limits), the exact
inch (NIST SP 811: 1 in = 25.4 mm), and the published values in
tests/validation/test_asme_b41_limits.py.
"""

from __future__ import annotations

import math

import numpy as np
import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

from fitcheck import fits, pressfit
from fitcheck.core import ansi_b41
from fitcheck.errors import InputError

CLASSES = ansi_b41.all_classes()


def test_every_class_of_the_standard_is_tabulated_up_to_19_69_in():
    t = ansi_b41.table()
    assert sorted(t) == sorted(CLASSES) and len(CLASSES) == 9 + 11 + 6 + 3 + 5
    for name, c in t.items():
        assert c.upto_in[-1] == 19.69
        assert len(c.upto_in) <= (25 if name.startswith("FN") else 13)


@settings(max_examples=200, deadline=None)
@given(st.sampled_from(CLASSES), st.floats(0.001, 19.69))
def test_hole_and_shaft_limits_give_the_tabulated_fit(cls, size):
    t = ansi_b41.table()[cls]
    k = int(ansi_b41.range_index(size, cls))
    if k < 0:
        with pytest.raises(InputError, match="tabulated only"):
            fits.ansi_fit(f"{size!r} in", cls)
        return
    f = fits.ansi_fit(f"{size!r} in", cls)
    assert f.clearance_min_um == pytest.approx(t.clearance_min[k] * 25.4, abs=1e-6)
    assert f.clearance_max_um == pytest.approx(t.clearance_max[k] * 25.4, abs=1e-6)
    assert f.hole.lower_um == 0.0                       # basic-hole system
    fam = cls[:2]
    if fam in ("RC", "LC"):
        assert f.kind == "clearance"
    elif fam in ("LN", "FN"):
        assert f.kind == "interference"
    else:
        assert f.kind in ("transition", "interference")


@settings(max_examples=100, deadline=None)
@given(st.sampled_from(CLASSES), st.floats(0.01, 19.69))
def test_inch_and_mm_nominal_sizes_give_the_same_limits(cls, size):
    if int(ansi_b41.range_index(size, cls)) < 0:
        return
    a = fits.fit(f"{size!r} in {cls}")
    b = fits.fit(f"{size * 25.4!r} mm {cls}")
    assert (a.hole.upper_um, a.shaft.upper_um, a.shaft.lower_um) == \
        pytest.approx((b.hole.upper_um, b.shaft.upper_um, b.shaft.lower_um), abs=1e-9)


def test_designations():
    for text in ("1 in FN2", "1.000 in FN2", "Ø1 in FN2", '1" FN2', "1 in fn2", "1 inch FN 2"):
        f = fits.fit(text)
        assert (f.ansi_class, f.designation, f.system) == ("FN2", "1 in FN2", "ASME B4.1")
    assert fits.fit("Ø0.5 in RC4").designation == "0.5 in RC4"
    with pytest.raises(InputError, match="RC1–RC9"):
        fits.fit("1 in RC10")
    with pytest.raises(InputError, match="19.69"):
        fits.fit("20 in FN2")
    with pytest.raises(InputError, match="FN3 is tabulated only over 0.95"):
        fits.fit("0.5 in FN3")


def test_vectorised_lookup_equals_the_scalar_one():
    sizes = np.array([3.0, 12.7, 25.4, 100.0, 480.0])
    cls = np.array(["RC1", "LC5", "FN2", "LT3", "LN3"], dtype=object)
    hu, hl, su, sl, ok = fits.ansi_deviations(sizes, cls)
    for i in range(len(sizes)):
        f = fits.ansi_fit(float(sizes[i]), cls[i])
        assert (hu[i], su[i], sl[i]) == pytest.approx((f.hole.upper_um, f.shaft.upper_um, f.shaft.lower_um))
    assert ok.all()


def test_json_keys_are_the_iso_keys_plus_inches():
    iso = fits.fit("25 H7/p6").to_dict()
    ansi = fits.fit("1 in FN2").to_dict()
    assert set(iso) == set(ansi)
    assert set(iso["hole"]) == set(ansi["hole"])
    assert ansi["shaft"]["upper_in"] == pytest.approx(0.0019, abs=1e-12)


def _joint(fit=None, system="inch", **over):
    if system == "inch":
        m = {"fit": fit, "length": "0.75 in", "hub_outer_diameter": "2.25 in",
             "shaft_material": "C45E", "hub_material": "C45E", "rz_shaft": "63 uin",
             "rz_hub": "125 uin", "torque": "300 lbf*in", "axial_force": "50 lbf",
             "speed": "1750 rpm", "temperature_shaft": "140 degF", "temperature_hub": "122 degF",
             "temperature_assembly": "68 degF"}
    else:
        m = {"fit": fit, "length": "19.05 mm", "hub_outer_diameter": "57.15 mm",
             "shaft_material": "C45E", "hub_material": "C45E", "rz_shaft": "1.6002 um",
             "rz_hub": "3.175 um", "torque": f"{300 * 0.1129848290276167!r} N*m",
             "axial_force": f"{50 * 4.4482216152605!r} N", "speed": "1750 rpm",
             "temperature_shaft": "60 degC", "temperature_hub": "50 degC", "temperature_assembly": "20 degC"}
    m.update(over)
    return pressfit.PressFitInput.from_mapping({k: v for k, v in m.items() if v is not None})


@pytest.mark.filterwarnings("ignore::fitcheck.errors.MethodRangeWarning")
@pytest.mark.parametrize("cls", ["FN1", "FN2", "FN3", "FN4", "FN5", "LN3"])
def test_inch_and_si_inputs_of_one_joint_give_the_same_verdicts(cls):
    a = pressfit.evaluate(_joint(f"1 in {cls}", "inch"))
    f = fits.fit(f"1 in {cls}")
    b = pressfit.evaluate(_joint(None, "SI", diameter="25.4 mm",
                                 interference_min=f"{f.interference_min_um!r} um",
                                 interference_max=f"{f.interference_max_um!r} um"))
    c = pressfit.evaluate(_joint(f"25.4 mm {cls}", "SI"))
    for other in (b, c):
        assert [k.passed for k in a.checks] == [k.passed for k in other.checks]
        for x, y in zip(a.checks, other.checks, strict=True):
            assert x.name == y.name
            if math.isfinite(x.value):
                assert x.value == pytest.approx(y.value, rel=1e-9)


# --- command line and case files ----------------------------------------------------------
def _cli(capsys, *argv):
    from fitcheck.cli import main
    code = main(list(argv))
    out = capsys.readouterr()
    return code, out.out, out.err


def test_cli_limits_json_and_text(capsys):
    import json
    code, out, _ = _cli(capsys, "limits", "1 in FN2", "--json")
    d = json.loads(out)
    assert code == 0 and d["ansi_class"] == "FN2" and d["shaft"]["upper_um"] == pytest.approx(48.26)
    assert d["shaft"]["upper_in"] == pytest.approx(0.0019)
    code, out, _ = _cli(capsys, "limits", "1 in FN2", "--units", "inch")
    assert "+1.9" in out and "1.0019" in out and "thou" in out and "Machinery's Handbook" in out
    code, out, _ = _cli(capsys, "limits", "--ansi")
    assert code == 0 and "FN5" in out


def test_every_command_has_the_units_option(capsys):
    from fitcheck.cli import _commands, build_parser
    parser = build_parser()
    for mod in _commands():
        args = parser.parse_args([mod.COMMAND, "--units", "inch"] + (["x.toml"] if mod.COMMAND in (
            "check", "pressfit", "screws", "search", "study") else []) + (
            ["-o", "x.html", "x.toml"] if mod.COMMAND == "report" else []))
        assert args.units == "inch"
    with pytest.raises(SystemExit) as e:
        _cli(capsys, "limits", "25 H7", "--units", "metric")
    assert e.value.code == 2 and "--units" in capsys.readouterr().err


def test_pressfit_text_in_inch_units(tmp_path, capsys):
    from fitcheck.case import demo_text
    p = tmp_path / "d.toml"
    p.write_text(demo_text(), encoding="utf-8")
    _, si, _ = _cli(capsys, "pressfit", str(p))
    _, inch, _ = _cli(capsys, "pressfit", str(p), "--units", "inch")
    assert "N·m" in si and "lbf·in" in inch and "MPa" not in inch.split("check")[0]
    assert "d = 0.6299 in" in inch      # 16 mm to four places of an inch


def test_case_unit_system_key():
    from fitcheck import case
    text = case.demo_text()
    assert case.loads(text).unit_system == "SI"
    c = case.loads(text.replace("format_version = 1", 'format_version = 1\nunit_system = "inch"'))
    assert c.unit_system == "inch"
    assert case.loads(case.dumps(c)).unit_system == "inch"
    with pytest.raises(Exception, match="unit_system"):
        case.loads(text.replace("format_version = 1", 'format_version = 1\nunit_system = "imperial"'))


@pytest.mark.filterwarnings("ignore::fitcheck.errors.MethodRangeWarning")
def test_fit_search_over_ansi_classes_agrees_with_evaluating_each_fit():
    from fitcheck.search import search_fits
    joint = _joint("1 in FN2", "inch")
    r = search_fits(joint, systems=("ansi",))
    assert r.evaluated == len(fits.ansi_classes(25.4))
    assert all(c.basis.startswith("ANSI B4.1") for c in r.passing + r.rejected)
    for c in r.passing[:3] + r.rejected[:3]:
        own = pressfit.evaluate(_joint(c.fit, "inch"))
        assert own.ok == (c in r.passing), c.fit
    both = search_fits(joint, systems=("iso", "ansi"))
    assert both.evaluated == search_fits(joint).evaluated + r.evaluated
    with pytest.raises(InputError, match="systems"):
        search_fits(joint, systems=("jis",))
