"""Fit search (fitcheck.search): candidates, limits, verdicts and ranking.

Sources: ISO 286-2:2010 tables of limit deviations (through fitcheck.fits, itself checked against
the standard in its own tests; letter t is tabulated only over 24 mm, from memory); the verdicts of
fitcheck.pressfit.evaluate (DIN 7190-1:2017 / Shigley, 10th ed.), which every ranked fit must
reproduce when evaluated on its own.
"""

import math
import warnings

import numpy as np
import pytest

from fitcheck import fits
from fitcheck.errors import InputError
from fitcheck.pressfit import PressFitInput
from fitcheck.pressfit import evaluate as pf_evaluate
from fitcheck.search import candidates, search_fits

BASE = {"name": "pinion", "fit": "20 H7/s6", "length": "16 mm", "hub_outer_diameter": "40 mm",
        "shaft_material": "C45E", "hub_material": "C45E", "torque": "25 N*m",
        "press_force_limit": "40 kN", "temperature_shaft": "60 degC", "temperature_hub": "50 degC",
        "speed": "3000 rpm"}


def _inp(**kw):
    return PressFitInput.from_mapping({**BASE, **kw})


def _alone(inp, cand):
    m = inp.to_mapping()
    m["fit"] = cand.fit
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        return pf_evaluate(PressFitInput.from_mapping(m))


@pytest.fixture(scope="module")
def result():
    return search_fits(_inp())


def test_candidates_are_the_admitted_set():
    c = candidates(20.0)
    pairs = {(h, s) for h, s, _ in c}
    assert len(pairs) == len(c)  # each fit once
    for h, s, b in c:
        assert b in ("hole", "shaft", "hole+shaft")
        if b == "hole":
            assert h in ("H6", "H7", "H8") and int(s.lstrip("abcdefghijklmnopqrstuvwxyz")) in (5, 6, 7)
        if b == "shaft":
            assert s in ("h5", "h6", "h7") and int(h.lstrip("ABCDEFGHIJKLMNOPQRSTUVWXYZ")) in (6, 7, 8)
    # every hole-basis shaft of grade 5-7 that ISO 286 defines at 20 mm is there with H7
    want = {s for s in fits.valid_classes(20.0, "shaft") if s[-1] in "567" and not s[-2].isdigit()}
    assert {s for h, s in pairs if h == "H7"} >= want
    # ISO 286-2: letter t is tabulated only over 24 mm (from memory)
    assert ("H7", "t6") not in pairs
    assert ("H7", "t6") in {(h, s) for h, s, _ in candidates(30.0)}
    assert ("H7", "h6", "hole+shaft") in c


def test_limits_equal_fits_zone_for_sampled_candidates(result):
    every = result.passing + result.rejected
    rng = np.random.default_rng(0)
    for i in rng.choice(len(every), size=25, replace=False):
        c = every[i]
        zh, zs = fits.zone(20.0, c.hole), fits.zone(20.0, c.shaft)
        assert (c.hole_upper_um, c.hole_lower_um) == (zh.upper_um, zh.lower_um)
        assert (c.shaft_upper_um, c.shaft_lower_um) == (zs.upper_um, zs.lower_um)
        f = fits.fit(c.fit)
        assert c.interference_min_um == pytest.approx(f.interference_min_um)
        assert c.interference_max_um == pytest.approx(f.interference_max_um)


def test_every_ranked_fit_passes_on_its_own(result):
    inp = _inp()
    assert len(result.passing) >= 3
    for c in result.passing:
        alone = _alone(inp, c)
        assert alone.ok, c.fit
        assert [x.name for x in alone.checks] == [x.name for x in c.checks]
        for a, b in zip(alone.checks, c.checks, strict=True):
            assert a.passed == b.passed
            assert a.value == pytest.approx(b.value, rel=1e-9) or (math.isinf(a.value) and math.isinf(b.value))
            assert a.limit == pytest.approx(b.limit, rel=1e-12)


def test_rejected_fits_fail_on_their_own_with_the_same_checks(result):
    inp = _inp()
    for c in result.rejected[:15] + result.rejected[-5:]:
        alone = _alone(inp, c)
        assert not alone.ok, c.fit
        assert {n for n, _ in c.failing} == {x.name for x in alone.checks if not x.passed}
        assert all(m < 0 for _, m in c.failing)


def test_ranking_order(result):
    p = result.passing
    assert [c.rank for c in p] == list(range(1, len(p) + 1))
    for a, b in zip(p, p[1:], strict=False):
        assert a.slip_safety_min >= b.slip_safety_min
        if a.slip_safety_min == b.slip_safety_min and b.preferred:
            assert a.preferred
    worst = [c.worst_margin for c in result.rejected]
    assert worst == sorted(worst, reverse=True)
    assert result.evaluated == len(result.passing) + len(result.rejected)


def test_preferred_first_on_ties():
    # without load every fit with contact pressure has infinite slip safety: preferred fits lead
    r = search_fits(_inp(torque="0 N*m", press_force_limit="1000 kN"))
    assert r.passing[0].preferred
    firsts = [c.preferred for c in r.passing]
    assert firsts == sorted(firsts, reverse=True)
    assert any("no torque" in n for n in r.notes)


def test_press_force_limit_rejects_tight_fits():
    loose = search_fits(_inp(press_force_limit="1000 kN"))
    tight = search_fits(_inp(press_force_limit="8 kN"))
    assert len(tight.passing) < len(loose.passing)
    assert any(n == "press-in force" for c in tight.rejected for n, _ in c.failing)
    assert all(c.press_force_max <= 8000.0 for c in tight.passing)


def test_shrink_fit_checks_heating():
    r = search_fits(_inp(assembly="shrink"))
    names = {c.name for c in r.passing[0].checks}
    assert "hub heating temperature" in names and "press-in force" not in names


def test_no_passing_fit_says_so():
    r = search_fits(_inp(torque="2000 N*m"))
    assert not r.ok and not r.passing
    assert r.rejected[0].failing[0][0] == "slip at loosest fit"
    assert any("no admitted fit" in n for n in r.notes)


def test_json(result):
    j = result.to_json(top=3)
    assert len(j["passing"]) == 3 and len(j["nearest_rejected"]) == 3
    assert j["passing"][0]["rank"] == 1 and "caution" in j


def test_bad_inputs():
    with pytest.raises(InputError, match="holes"):
        search_fits(_inp(), holes=("H7", "7H"))
    with pytest.raises(InputError, match="shaft_grades"):
        search_fits(_inp(), shaft_grades=(0,))
    with pytest.raises(InputError, match="admitted set"):
        search_fits(_inp(), holes=(), shafts=())
    with pytest.raises(InputError, match="PressFitInput"):
        search_fits("20 H7/s6")
