"""The capacity band the plots and the browser chart draw agrees with the checks it illustrates."""

import math

import pytest

from fitcheck import pressfit

BASE = {"name": "band", "fit": "20 H7/s6", "length": "16 mm", "hub_outer_diameter": "40 mm",
        "shaft_material": "C45E", "hub_material": "C45E", "torque": "10 N*m", "speed": "3000 rpm",
        "temperature_shaft": "40 degC", "temperature_hub": "40 degC"}


def _result(**over):
    return pressfit.evaluate(pressfit.PressFitInput.from_mapping({**BASE, **over}))


def test_band_ends_are_the_loosest_and_tightest_operating_cases():
    r = _result()
    assert r.torque_capacity_at(r.interference_min) == pytest.approx(r.loosest_operating.torque_capacity)
    assert r.torque_capacity_at(r.interference_max) == pytest.approx(r.tightest_operating.torque_capacity)
    b = r.capacity_band()
    assert b["in_band"].any() and not b["in_band"].all()
    assert b["interference"][b["in_band"]].min() >= r.interference_min


def test_required_line_is_torque_times_required_safety():
    r = _result()
    b = r.capacity_band()
    assert b["required"] == pytest.approx(10_000.0 * 1.5)  # 10 N·m × default slip safety 1.5


def test_required_line_combines_torque_and_thrust():
    # equivalent torque of the friction demand: √((2T/d)² + F²)·d/2
    r = _result(axial_force="1500 N")
    b = r.capacity_band()
    assert b["required"] == pytest.approx(math.hypot(2 * 10_000.0 / 20.0, 1500.0) * 10.0 * 1.5)
    # where the loosest capacity meets the line, the slip safety equals the required one
    ratio = r.loosest_operating.torque_capacity / (b["required"] / 1.5)
    assert ratio == pytest.approx(r.slip_safety_min, rel=1e-9)  # operating is the loosest case here
