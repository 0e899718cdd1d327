"""Fit search narrowed to some deviation letters (``shaft_letters``, ``hole_letters``).

Checked against a direct enumeration: every class "<letter><grade>" that ISO 286-2 defines at the
size (fitcheck.fits.zone, itself checked against ISO 286-2:2010 in tests/validation) is tried one
by one, independently of the search's own enumeration. A narrowed search must hold exactly those
fits, each with the same figures as in the unrestricted search.
"""

import json

import pytest

from fitcheck import case, fits
from fitcheck.errors import InputError
from fitcheck.pressfit import PressFitInput
from fitcheck.search import candidates, search_fits

BASE = {"name": "pinion", "fit": "20 H7/s6", "length": "16 mm", "hub_outer_diameter": "40 mm",
        "shaft_material": "C45E", "hub_material": "C45E", "torque": "25 N*m",
        "press_force_limit": "40 kN"}


def _defined(size: float, letters, grades) -> set[str]:
    """Classes ISO 286 defines at ``size``, by trying each letter and grade on its own."""
    out = set()
    for L in letters:
        for g in grades:
            try:
                fits.zone(size, f"{L}{g}")
            except InputError:
                continue
            out.add(f"{L}{g}")
    return out


@pytest.fixture(scope="module")
def joint():
    return PressFitInput.from_mapping(BASE)


@pytest.fixture(scope="module")
def full(joint):
    return search_fits(joint)


def test_shaft_letters_equal_direct_enumeration(joint, full):
    letters, grades = ("n", "p", "r", "s", "t"), (5, 6, 7)
    r = search_fits(joint, holes=("H7",), shafts=(), shaft_letters=letters, shaft_grades=grades)
    got = {c.shaft for c in r.passing + r.rejected}
    want = _defined(20.0, letters, grades)
    assert got == want
    assert "t6" not in want  # ISO 286-2: t is tabulated only over 24 mm (from memory)
    assert {c.hole for c in r.passing + r.rejected} == {"H7"}
    assert r.evaluated == len(want)
    assert r.admitted["shaft_letters"] == letters
    # narrowing only filters: every fit keeps the figures and verdict of the full search
    by_fit = {c.fit: c for c in full.passing + full.rejected}
    for c in r.passing + r.rejected:
        f = by_fit[c.fit]
        assert (c.slip_safety_min, c.hub_yield_safety, c.ok) == (
            f.slip_safety_min, f.hub_yield_safety, f.ok)
    # ranks are renumbered within the narrowed set, in the full search's order
    order = [c.fit for c in full.passing if c.fit in {x.fit for x in r.passing}]
    assert [c.fit for c in r.passing] == order
    assert [c.rank for c in r.passing] == list(range(1, len(r.passing) + 1))


def test_hole_letters_equal_direct_enumeration(joint):
    letters, grades = ("N", "P", "R", "S", "U"), (6, 7)
    r = search_fits(joint, holes=(), shafts=("h6",), hole_letters=letters, hole_grades=grades)
    assert {c.hole for c in r.passing + r.rejected} == _defined(20.0, letters, grades)
    assert {c.shaft for c in r.passing + r.rejected} == {"h6"}


def test_letters_in_either_case_and_every_letter_by_default(joint, full):
    a = search_fits(joint, holes=("H7",), shafts=(), shaft_letters=("P", "s"), shaft_grades=(6,))
    assert {c.shaft for c in a.passing + a.rejected} == {"p6", "s6"}
    assert a.admitted["shaft_letters"] == ("p", "s")
    assert full.admitted["shaft_letters"][:3] == ("a", "b", "c")  # None: every letter
    every = search_fits(joint, shaft_letters=full.admitted["shaft_letters"],
                        hole_letters=full.admitted["hole_letters"])
    assert [c.fit for c in every.passing] == [c.fit for c in full.passing]


def test_candidates_letters():
    c = candidates(20.0, holes=("H7",), shaft_grades=(6,), shafts=("h6",), hole_grades=(7,),
                   shaft_letters=("k", "js"), hole_letters=("K",))
    assert sorted((h, s) for h, s, _ in c) == [("H7", "js6"), ("H7", "k6"), ("K7", "h6")]


@pytest.mark.parametrize("kw, match", [
    ({"shaft_letters": "prs"}, "shaft_letters"),          # a text is not a list
    ({"shaft_letters": ("q",)}, "shaft letters"),          # no letter q in ISO 286
    ({"hole_letters": ("P7",)}, "hole_letters"),           # a class, not a letter
    ({"shaft_letters": ("p",) * 101}, "at most 100"),
    ({"shaft_letters": ("a",), "shafts": ()}, "admitted set"),  # nothing left to try at 20 mm?
])
def test_bad_letters(joint, kw, match):
    if kw.get("shaft_letters") == ("a",):
        # 'a' at IT5-7 is not tabulated (ISO 286-2 gives a only from IT9, from memory)
        assert not _defined(20.0, ("a",), (5, 6, 7))
    with pytest.raises(InputError, match=match):
        search_fits(PressFitInput.from_mapping(BASE), **kw)


CASE = """format_version = 1
[[pressfit]]
name = "pinion"
fit = "20 H7/s6"
length = "16 mm"
hub_outer_diameter = "40 mm"
shaft_material = "C45E"
hub_material = "C45E"
torque = "25 N*m"
"""


def test_cli_letters_equal_library(cli, tmp_path):
    p = tmp_path / "d.toml"
    p.write_text(CASE, encoding="utf-8")
    code, out, err = cli("search", str(p), "--shaft-letters", "p,r,s", "--hole-letters", "S",
                         "--top", "50", "--json")
    assert code in (0, 1), err
    j = json.loads(out)
    r = search_fits(case.load(p).pressfits[0], shaft_letters=("p", "r", "s"), hole_letters=("S",))
    assert [c["fit"] for c in j["passing"]] == [c.fit for c in r.passing]
    assert j["admitted"]["shaft_letters"] == ["p", "r", "s"]
    assert j["admitted"]["hole_letters"] == ["S"]
    code, out, err = cli("search", str(p), "--shaft-letters", "p,r,s")
    assert "with shafts p, r, s IT5/6/7" in out
    code, _, err = cli("search", str(p), "--shaft-letters", "p,q")
    assert code == 2 and "shaft_letters" in err and "Traceback" not in err
