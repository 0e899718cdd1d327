"""Properties of the ISO 286 engine (hypothesis): monotonicity, hole/shaft symmetry, fit kinds,
unit invariance and agreement of the vectorised and scalar paths."""

from __future__ import annotations

import math

import numpy as np
import pytest
from hypothesis import assume, given, settings
from hypothesis import strategies as st

from fitcheck.core import iso286
from fitcheck.errors import InputError
from fitcheck.fits import deviations, fit, zone
from fitcheck.tables import size_ranges

BOUNDS = np.unique(np.concatenate(size_ranges("iso286_shaft_deviations.csv")
                                  + size_ranges("iso286_it_grades.csv")))
sizes = st.floats(min_value=0.01, max_value=3150.0, allow_nan=False)
sizes500 = st.floats(min_value=0.01, max_value=500.0, allow_nan=False)
grades = st.integers(min_value=1, max_value=18)




def _classes(feature):
    out = []
    for letter in iso286.all_letters(feature):
        lo, hi = iso286.grade_range(feature, letter)
        out += [f"{letter}{iso286.grade_name(g)}" for g in range(lo, hi + 1)]
    return out


ALL = {"shaft": _classes("shaft"), "hole": _classes("hole")}


@given(sizes, st.integers(min_value=-1, max_value=17))
def test_it_grows_with_grade(d, g):
    a, b = float(iso286.it_um(d, g)), float(iso286.it_um(d, g + 1))
    assume(not math.isnan(a))
    assert b > a


@given(sizes, sizes, grades)
def test_it_grows_with_size(d1, d2, g):
    lo, hi = sorted((d1, d2))
    assert float(iso286.it_um(hi, g)) >= float(iso286.it_um(lo, g))


@given(sizes, st.sampled_from("a b c cd d e ef f fg g h".split()), grades)
def test_holes_a_to_h_mirror_shafts(d, letter, g):
    """EI of holes A … H = −es of shafts a … h (ISO 286-1:2010, 5.3.2.1)."""
    s_up, _, s_ok = deviations(d, f"{letter}{g}", "shaft")
    h_up, h_lo, h_ok = deviations(d, f"{letter.upper()}{g}", "hole")
    assume(bool(s_ok) and bool(h_ok))
    assert float(h_lo) == -float(s_up)


@given(sizes500, st.sampled_from(["js", "h"]), grades)
def test_js_symmetric_and_h_on_zero_line(d, letter, g):
    up, lo, ok = deviations(d, f"{letter}{g}", "shaft")
    assume(bool(ok))
    if letter == "js":
        assert float(up) == -float(lo) and float(up - lo) == float(iso286.it_um(d, g))
    else:
        assert float(up) == 0.0


@given(sizes, st.sampled_from(ALL["hole"]), st.sampled_from(ALL["shaft"]))
@settings(max_examples=300)
def test_fit_kind_agrees_with_signs(d, h, s):
    try:
        f = fit(d, h, s)
    except InputError:
        assume(False)
    cmax = f.hole.upper_um - f.shaft.lower_um
    cmin = f.hole.lower_um - f.shaft.upper_um
    assert (f.clearance_max_um, f.clearance_min_um) == (cmax, cmin)
    assert f.clearance_max_um >= f.clearance_min_um
    expected = "clearance" if cmin >= 0 else "interference" if cmax <= 0 else "transition"
    assert f.kind == expected
    assert f.fit_tolerance_um == pytest.approx(f.hole.it_um + f.shaft.it_um)
    assert f.interference_max_um == -f.clearance_min_um


@given(sizes, st.sampled_from(ALL["shaft"] + ALL["hole"]))
@settings(max_examples=300)
def test_inch_and_mm_nominal_give_same_limits(d, cls):
    inch = d / 25.4
    assume(np.min(np.abs(BOUNDS - d)) > 1e-6)    # a boundary is exact in mm only
    try:
        z_mm = zone(d, cls)
    except InputError:
        with pytest.raises(InputError):
            zone(f"{inch!r} in", cls)
        return
    z_in = zone(f"{inch!r} in", cls)
    assert (z_in.upper_um, z_in.lower_um) == (z_mm.upper_um, z_mm.lower_um)
    assert z_in.max_mm == pytest.approx(z_mm.max_mm, rel=1e-12)


@given(st.lists(st.tuples(st.floats(min_value=0.05, max_value=3300.0, allow_nan=False),
                          st.sampled_from(ALL["shaft"] + ["cd12", "P6", "q7", "h19"])),
                min_size=1, max_size=40))
@settings(max_examples=150)
def test_vectorised_equals_scalar(pairs):
    d = np.array([p[0] for p in pairs])
    c = np.array([p[1] for p in pairs])
    up, lo, ok = deviations(d, c, "shaft")
    for k, (size, cls) in enumerate(pairs):
        if ok[k]:
            z = zone(size, cls)
            assert (z.upper_um, z.lower_um) == (up[k], lo[k])
        else:
            assert math.isnan(up[k]) and math.isnan(lo[k])
            if cls[0].isupper():  # zone() reads an upper-case class as a hole
                continue
            with pytest.raises(InputError):
                zone(size, cls)


def test_vectorised_fast_path_equals_generic_path():
    """The packed-code grouping (> 64 items) and the plain np.unique path agree."""
    rng = np.random.default_rng(7)
    c = np.array(ALL["hole"])[rng.integers(0, len(ALL["hole"]), 500)]
    d = rng.uniform(0.1, 3150.0, 500)
    fast = deviations(d, c, "hole")
    slow = [deviations(d[i], c[i], "hole") for i in range(0, 500, 7)]
    for j, i in enumerate(range(0, 500, 7)):
        for a, b in zip((fast[0][i], fast[1][i], fast[2][i]), slow[j], strict=True):
            assert (a == b) or (np.isnan(a) and np.isnan(b))
