"""ISO 5753-1:2009, Rolling bearings — Internal clearance — Part 1: Radial internal
clearance for radial bearings, Table 1 (deep-groove ball bearings with cylindrical bore).

Radial internal clearance groups C2, N, C3, C4, C5 by nominal bore d ("over … up to and
including …"), in µm. Values typed from memory of the printed table (``# from memory``).
"""

import pytest

from fitcheck.bearings import bearing, radial_clearance
from fitcheck.errors import InputError

# (d, group, min, max) [mm, µm]
CASES = [
    (8, "C2", 0, 7), (8, "N", 2, 13), (8, "C3", 8, 23), (8, "C4", 14, 29),
    # ISO 5753-1:2009, Table 1, over 6 up to 10 mm # from memory
    (15, "C2", 0, 9), (15, "N", 3, 18), (15, "C3", 11, 25), (15, "C4", 18, 33),
    # ISO 5753-1:2009, Table 1, over 10 up to 18 mm # from memory
    (20, "C2", 0, 10), (20, "N", 5, 20), (20, "C3", 13, 28), (20, "C4", 20, 36),
    # ISO 5753-1:2009, Table 1, over 18 up to 24 mm # from memory
    (25, "C2", 1, 11), (25, "N", 5, 20), (25, "C3", 13, 28), (25, "C4", 23, 41),
    # ISO 5753-1:2009, Table 1, over 24 up to 30 mm # from memory
    (35, "C2", 1, 11), (35, "N", 6, 20), (35, "C3", 15, 33), (35, "C4", 28, 46),
    # ISO 5753-1:2009, Table 1, over 30 up to 40 mm # from memory
    (45, "C2", 1, 11), (45, "N", 6, 23), (45, "C3", 18, 36), (45, "C4", 30, 51),
    # ISO 5753-1:2009, Table 1, over 40 up to 50 mm # from memory
    (60, "C2", 1, 15), (60, "N", 8, 28), (60, "C3", 23, 43), (60, "C4", 38, 61),
    # ISO 5753-1:2009, Table 1, over 50 up to 65 mm # from memory
    (70, "C2", 1, 15), (70, "N", 10, 30), (70, "C3", 25, 51), (70, "C4", 46, 71),
    # ISO 5753-1:2009, Table 1, over 65 up to 80 mm # from memory
    (100, "C2", 1, 18), (100, "N", 12, 36), (100, "C3", 30, 58), (100, "C4", 53, 84),
    # ISO 5753-1:2009, Table 1, over 80 up to 100 mm # from memory
    (20, "C5", 28, 48),   # ISO 5753-1:2009, Table 1, over 18 up to 24 mm # from memory
    (50, "C5", 45, 73),   # ISO 5753-1:2009, Table 1, over 40 up to 50 mm # from memory
]


@pytest.mark.parametrize(("d", "group", "lo", "hi"), CASES)
def test_radial_clearance(d, group, lo, hi):
    assert radial_clearance(d, group) == (lo, hi)


def test_groups_overlap_and_rise():
    # ISO 5753-1:2009, Table 1: each group starts above the previous one's start (structure)
    for d in (8, 15, 20, 25, 35, 45, 60, 70, 90, 110, 150, 200, 240):
        mins = [radial_clearance(d, g)[0] for g in ("C2", "N", "C3", "C4", "C5")]
        assert mins == sorted(mins)


def test_c4_not_defined_for_small_bores():
    # ISO 5753-1:2009, Table 1: no C4/C5 values up to 6 mm # from memory
    with pytest.raises(InputError, match="C2, N, C3"):
        radial_clearance(bearing("625").d, "C4")


def test_normal_group_aliases():
    assert radial_clearance(20, "CN") == radial_clearance(20, "N")
