"""fitcheck.advice: every check the engines build has its own cause and next step.

No source to cite: the texts are the project's own wording; the tests check the wiring
(each check name of the demo case and of a failing variant finds its rule).
"""

from __future__ import annotations

import tomllib

import pytest

from fitcheck import advice, tomlwrite
from fitcheck import case as casefile
from fitcheck.checks import Check


def _checks(doc):
    res = casefile.evaluate(casefile.loads(tomlwrite.dumps(doc)))
    return [(j.table, c) for j in res.joints for c in j.checks]


def test_every_demo_check_has_its_own_advice():
    for table, c in _checks(tomllib.loads(casefile.demo_text())):
        a = advice.explain(table, c)
        assert "is not at" not in a.cause, (table, c.name)  # not the fall-back text
        assert a.next_step


def test_a_clearance_fit_slips_with_no_contact_pressure_and_sends_to_the_fit_search():
    doc = tomllib.loads(casefile.demo_text())
    pf = doc["pressfit"][0]
    pf.pop("interference_min", None)
    pf.pop("interference_max", None)
    pf["fit"] = "12 mm H7/g6"  # ISO 286: a clearance fit, no contact pressure anywhere
    fails = advice.failing("pressfit", [c for t, c in _checks({**doc, "pressfit": [pf],
                                                               "bearing": [], "screws": []})])
    slip = next(a for a in fails if "slip" in a.check)
    assert slip.cause == "no contact pressure at the loosest fit: the joint slips"
    assert slip.next_step == "search fits"
    assert slip.action == advice.FIT_SEARCH


@pytest.mark.parametrize("table, name, action", [
    ("bearing", "operating radial clearance (tightest pairing)", advice.SEAT_SEARCH),
    ("bearing", "hoop stress at the inner-ring bore", advice.SEAT_SEARCH),
    ("screws", "residual clamp load (separation)", None),
    ("screws", "surface pressure under head", None),
    ("pressfit", "hub yield at tightest fit", advice.FIT_SEARCH),
])
def test_rules_by_name(table, name, action):
    a = advice.explain(table, Check(name, 0.5, 1.0, ">="))
    assert a.action == action and "is not at" not in a.cause


def test_an_unknown_check_states_value_and_limit_sense():
    a = advice.explain("screws", Check("something new", 2.0, 1.0, "<="))
    assert a.cause == "something new is not at most its limit"
    assert advice.failing("screws", [Check("ok", 2.0, 1.0, ">=")]) == []
