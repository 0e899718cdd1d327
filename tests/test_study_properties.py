"""Properties of the tolerance study and the fit search (hypothesis).

Common random numbers: with one seed, every setting sees the same sampled lot, so a larger load can
only make more joints slip, and a unit change of the inputs (inch for mm; NIST SP 811: 1 in =
25.4 mm exactly) changes nothing.
"""

import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

from fitcheck.pressfit import PressFitInput
from fitcheck.search import search_fits
from fitcheck.study import run_study

BASE = {"name": "p", "fit": "20 H7/r6", "length": "16 mm", "hub_outer_diameter": "40 mm",
        "shaft_material": "C45E", "hub_material": "C45E", "mu_slip": 0.12}


@given(t1=st.floats(1.0, 30.0), t2=st.floats(1.0, 30.0), seed=st.integers(0, 2**31))
@settings(max_examples=15, deadline=None)
def test_more_torque_never_fewer_slips(t1, t2, seed):
    lo, hi = sorted((t1, t2))
    kw = dict(samples=4000, seed=seed, importance_samples=0, temperature_min=-20.0,
              temperature_max=80.0)
    a = run_study(PressFitInput.from_mapping({**BASE, "torque": f"{lo} N*m"}), **kw)
    b = run_study(PressFitInput.from_mapping({**BASE, "torque": f"{hi} N*m"}), **kw)
    assert b.slip.plain.failures >= a.slip.plain.failures
    # the load does not change the sampled pressures or stresses
    assert a.distribution("hub_stress") == b.distribution("hub_stress")


@given(tighter=st.sampled_from(["20 H7/s6", "20 H7/u6", "20 H7/x6"]), seed=st.integers(0, 2**31))
@settings(max_examples=8, deadline=None)
def test_tighter_fit_never_fewer_yields_than_r6(tighter, seed):
    # r6 < s6 < u6 < x6 at 20 mm in every limit (ISO 286-2:2010, from memory): the same uniform
    # ranks within the zones give larger interferences, so at least as many yield
    kw = dict(samples=4000, seed=seed, importance_samples=0)
    a = run_study(PressFitInput.from_mapping({**BASE, "hub_outer_diameter": "26 mm"}), **kw)
    b = run_study(PressFitInput.from_mapping({**BASE, "fit": tighter, "hub_outer_diameter": "26 mm"}),
                  **kw)
    assert b.yield_.plain.failures >= a.yield_.plain.failures


def test_inch_inputs_give_the_same_study_and_search():
    mm = PressFitInput.from_mapping({**BASE, "torque": "8 N*m"})
    inch = PressFitInput.from_mapping({**BASE, "length": f"{16 / 25.4!r} in",
                                       "hub_outer_diameter": f"{40 / 25.4!r} in",
                                       "torque": f"{8 / 0.1129848290276167!r} lbf*in"})
    kw = dict(samples=5000, seed=2, temperature_min=-20.0, temperature_max=80.0)
    a, b = run_study(mm, **kw), run_study(inch, **kw)
    assert a.slip.plain.failures == b.slip.plain.failures
    for da, db in zip(a.distributions, b.distributions, strict=True):
        assert da.percentile(50.0) == pytest.approx(db.percentile(50.0), rel=1e-6)
    sa, sb = search_fits(mm), search_fits(inch)
    assert [c.fit for c in sa.passing] == [c.fit for c in sb.passing]
