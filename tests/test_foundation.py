"""The shared edges: unit parsing, error messages, table loading, checks."""

import math

import pytest
from hypothesis import given
from hypothesis import strategies as st

from fitcheck import checks, tables, units
from fitcheck.errors import ErrorCollector, InputError, InputErrors, did_you_mean


def test_inch_is_exactly_25_4_mm():
    # NIST SP 811 (2008), Appendix B.8: 1 in = 2.54 cm exactly
    assert units.to_core("1 in", "length", "d") == pytest.approx(25.4, rel=1e-15)


def test_torque_and_stress_core_units():
    assert units.to_core("30 N*m", "torque", "T") == pytest.approx(30000.0)
    assert units.to_core("1 ksi", "stress", "s") == pytest.approx(6.894757, rel=1e-6)  # NIST SP 811 B.8
    assert units.to_core("1 lbf", "force", "F") == pytest.approx(4.448222, rel=1e-6)  # NIST SP 811 B.8


def test_rpm_to_rad_per_s():
    assert units.to_core("60 rpm", "speed", "n") == pytest.approx(2 * math.pi)


def test_steel_density_core_unit():
    assert units.to_core("7850 kg/m**3", "density", "rho") == pytest.approx(7.85e-9)


@pytest.mark.parametrize("bad", ["3 kg", "abc mm", "", "nan mm", "inf mm", True, None, [1]])
def test_bad_length_names_field(bad):
    with pytest.raises(InputError, match="^joint_length: got"):
        units.to_core(bad, "length", "joint_length")


def test_range_message():
    with pytest.raises(InputError, match="> 0 mm"):
        units.to_core("-2 mm", "length", "L", lo=0, lo_open=True)


def test_temperatures():
    assert units.temperature_c("212 degF", "t") == pytest.approx(100.0)
    with pytest.raises(InputError, match="absolute zero"):
        units.temperature_c("-1 K", "t")


@given(st.floats(min_value=1e-3, max_value=1e4))
def test_mm_inch_roundtrip(x):
    assert units.to_core(f"{x / 25.4!r} in", "length", "d") == pytest.approx(x, rel=1e-12)


def test_did_you_mean():
    assert "C45E" in did_you_mean("c45", ["C45E", "AlSi9Cu3"])
    assert did_you_mean("zzzz", ["C45E"]) == ""


def test_collector_gathers_all():
    c = ErrorCollector()
    for k in ("a", "b"):
        with c.field("tab"):
            raise InputError(k, 1, "2")
    with pytest.raises(InputErrors) as ei:
        c.raise_if_any()
    assert [e.field for e in ei.value.errors] == ["tab.a", "tab.b"]


def test_check_margin_and_verdict():
    c = checks.Check("slip", 1.5, 2.0, ">=")
    assert not c.passed and c.margin == pytest.approx(-0.25)
    d = checks.Check("stress", 100.0, 200.0, "<=")
    assert d.passed and d.margin == pytest.approx(0.5)
    assert not checks.Check("x", float("nan"), 1.0, ">=").passed


def test_range_index_over_upto():
    # ISO 286-1:2010, 5.3: size ranges are "over ... up to and including ..."
    assert int(tables.range_index("iso286_it_grades.csv", 3.0)) == 0
    assert int(tables.range_index("iso286_it_grades.csv", 3.0 + 1e-9)) == 1
    assert int(tables.range_index("iso286_it_grades.csv", 0.0)) == -1
    assert int(tables.range_index("iso286_it_grades.csv", 3150.0)) == 20
    assert int(tables.range_index("iso286_it_grades.csv", 3150.1)) == -1
