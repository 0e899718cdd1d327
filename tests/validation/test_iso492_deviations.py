"""ISO 492:2014, Rolling bearings — Radial bearings — Geometrical product specifications
(GPS) and tolerance values.

Deviation of the mean bore diameter in a single plane, Δdmp (inner ring, by d), and of
the mean outside diameter, ΔDmp (outer ring, by D), for tolerance classes Normal, 6 and 5
(Tables 2 … 7). The upper deviation is 0 in every class. Values typed from memory of the
printed tables (``# from memory``).
"""

import pytest

from fitcheck.bearings import bore_deviation, outside_deviation

# (d inside the range, class, lower deviation [µm])
BORE = [
    (5.0, "Normal", -8),    # ISO 492:2014, Table 2, over 2.5 up to 10 mm # from memory
    (15.0, "Normal", -8),   # ISO 492:2014, Table 2, over 10 up to 18 mm # from memory
    (20.0, "Normal", -10),  # ISO 492:2014, Table 2, over 18 up to 30 mm # from memory
    (30.0, "Normal", -10),  # ISO 492:2014, Table 2, over 18 up to 30 mm (upper limit) # from memory
    (40.0, "Normal", -12),  # ISO 492:2014, Table 2, over 30 up to 50 mm # from memory
    (60.0, "Normal", -15),  # ISO 492:2014, Table 2, over 50 up to 80 mm # from memory
    (100.0, "Normal", -20),  # ISO 492:2014, Table 2, over 80 up to 120 mm # from memory
    (150.0, "Normal", -25),  # ISO 492:2014, Table 2, over 120 up to 180 mm # from memory
    (20.0, "6", -8),        # ISO 492:2014, Table 4, over 18 up to 30 mm # from memory
    (45.0, "6", -10),       # ISO 492:2014, Table 4, over 30 up to 50 mm # from memory
    (70.0, "6", -12),       # ISO 492:2014, Table 4, over 50 up to 80 mm # from memory
    (90.0, "6", -15),       # ISO 492:2014, Table 4, over 80 up to 120 mm # from memory
    (12.0, "5", -5),        # ISO 492:2014, Table 6, over 10 up to 18 mm # from memory
    (25.0, "5", -6),        # ISO 492:2014, Table 6, over 18 up to 30 mm # from memory
    (35.0, "5", -8),        # ISO 492:2014, Table 6, over 30 up to 50 mm # from memory
    (65.0, "5", -9),        # ISO 492:2014, Table 6, over 50 up to 80 mm # from memory
]

# (D inside the range, class, lower deviation [µm])
OUTSIDE = [
    (16.0, "Normal", -8),   # ISO 492:2014, Table 3, over 6 up to 18 mm # from memory
    (26.0, "Normal", -9),   # ISO 492:2014, Table 3, over 18 up to 30 mm # from memory
    (47.0, "Normal", -11),  # ISO 492:2014, Table 3, over 30 up to 50 mm # from memory
    (52.0, "Normal", -13),  # ISO 492:2014, Table 3, over 50 up to 80 mm # from memory
    (90.0, "Normal", -15),  # ISO 492:2014, Table 3, over 80 up to 120 mm # from memory
    (140.0, "Normal", -18),  # ISO 492:2014, Table 3, over 120 up to 150 mm # from memory
    (160.0, "Normal", -25),  # ISO 492:2014, Table 3, over 150 up to 180 mm # from memory
    (47.0, "6", -9),        # ISO 492:2014, Table 5, over 30 up to 50 mm # from memory
    (62.0, "6", -11),       # ISO 492:2014, Table 5, over 50 up to 80 mm # from memory
    (100.0, "6", -13),      # ISO 492:2014, Table 5, over 80 up to 120 mm # from memory
    (47.0, "5", -7),        # ISO 492:2014, Table 7, over 30 up to 50 mm # from memory
    (80.0, "5", -9),        # ISO 492:2014, Table 7, over 50 up to 80 mm # from memory
    (110.0, "5", -10),      # ISO 492:2014, Table 7, over 80 up to 120 mm # from memory
]


@pytest.mark.parametrize(("d", "cls", "lower"), BORE)
def test_bore_deviation(d, cls, lower):
    assert bore_deviation(d, cls) == (0.0, lower)


@pytest.mark.parametrize(("D", "cls", "lower"), OUTSIDE)
def test_outside_deviation(D, cls, lower):
    assert outside_deviation(D, cls) == (0.0, lower)


def test_range_boundary_is_up_to_and_including():
    # ISO 492:2014, Table 2: "over 18 up to 30": 30 mm belongs to the lower range # from memory
    assert bore_deviation(30.0)[1] == -10
    assert bore_deviation(30.001)[1] == -12


def test_classes_tighten():
    # ISO 492:2014: class 5 ⊂ class 6 ⊂ Normal at every size (structure of the standard)
    for d in (5, 15, 25, 40, 60, 100, 150, 200, 300):
        n, six, five = (bore_deviation(d, c)[1] for c in ("Normal", "6", "5"))
        assert n < six < five < 0
    for D in (10, 25, 40, 70, 100, 140, 170, 220, 300):
        n, six, five = (outside_deviation(D, c)[1] for c in ("Normal", "6", "5"))
        assert n < six < five < 0


def test_inch_nominal_same_as_mm():
    # NIST SP 811: 1 in = 25.4 mm; a bore given in inches is looked up at its mm size
    assert bore_deviation("1 in") == bore_deviation(25.4)
