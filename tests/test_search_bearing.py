"""Seat search for rolling bearings (fitcheck.search.search_bearing_seat).

Wiring and ranking only: the verdict of every class is fitcheck.bearings.evaluate's (ISO 492,
ISO 5753-1, Lamé ring deformation), re-checked here by evaluating each class on its own; the
classes tried are those ISO 286-2 defines at the bearing's bore and outside diameter (ISO 15
dimensions: 6204 is 20 x 47 x 14 mm, from memory).
"""

import dataclasses
import warnings

import pytest

from fitcheck import bearings, fits
from fitcheck.errors import InputError
from fitcheck.search import search_bearing_seat

BASE = {"name": "output-6204", "designation": "6204", "shaft": "k5", "housing": "H7",
        "load": "rotating_inner", "load_ratio": 0.06, "rz_shaft": "0.8 um", "rz_housing": "1.6 um",
        "clearance_group": "C4"}


@pytest.fixture(scope="module")
def joint():
    return bearings.BearingSeatInput.from_mapping(BASE)


@pytest.fixture(scope="module")
def result(joint):
    return search_bearing_seat(joint)


def _alone(joint, c):
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        return bearings.evaluate(dataclasses.replace(joint, shaft=c.shaft, housing=c.housing))


def test_classes_are_defined_at_the_bearing_sizes(result):
    b = bearings.bearing("6204")
    assert (b.d, b.D) == (20.0, 47.0)  # ISO 15, 6204: 20 x 47 x 14 mm (from memory)
    for c in result.shafts:
        assert c.housing == result.housing_given
        assert fits.zone(b.d, c.shaft).feature == "shaft"
    for c in result.housings:
        assert c.shaft == result.shaft_given
        assert fits.zone(b.D, c.housing).feature == "hole"
    assert {c.cls for c in result.shafts} >= {"h5", "j6", "k5", "k6", "m5", "m6", "n6"}


def test_each_verdict_is_the_engines(joint, result):
    for c in result.shafts + result.housings:
        alone = _alone(joint, c)
        assert alone.ok == c.ok, c.cls
        assert [x.name for x in alone.checks] == [x.name for x in c.checks]
        assert c.grip_um == pytest.approx(alone.shaft_interference_effective_um[0])


def test_ranking_puts_gripping_seats_first(result):
    ranked = [c for c in result.shafts if c.ok]
    assert ranked and [c.rank for c in ranked] == list(range(1, len(ranked) + 1))
    grips = [c.grips for c in ranked]
    assert grips == sorted(grips, reverse=True)  # all gripping classes before the loose ones
    assert ranked[0].grips and ranked[0].cls == "k5"  # fine-ground k5 seat keeps its interference
    rejected_counts = [len(c.failing) for c in result.shafts if not c.ok]
    assert rejected_counts == sorted(rejected_counts)


def test_bad_joint():
    with pytest.raises(InputError, match="BearingSeatInput"):
        search_bearing_seat({"designation": "6204"})


def test_cli_bearing_search(cli, tmp_path):
    p = tmp_path / "b.toml"
    p.write_text('format_version = 1\n\n[[bearing]]\nname = "output-6204"\ndesignation = "6204"\n'
                 'shaft = "k5"\nhousing = "H7"\nload = "rotating_inner"\nload_ratio = 0.06\n'
                 'rz_shaft = "0.8 um"\nrz_housing = "1.6 um"\nclearance_group = "C4"\n', encoding="utf-8")
    code, out, err = cli("search", str(p), "--top", "3")
    assert code == 0, err
    assert "Seat search 'output-6204'" in out and "Caution:" in out
    code, out, err = cli("search", str(p), "--json")
    assert code == 0 and '"shaft_seat"' in out
