"""ISO 15:2017, Rolling bearings — Radial bearings — Boundary dimensions, general plan.

Boundary dimensions d × D × B and the smallest chamfer r_s min of deep-groove ball
bearings (dimension series 18, 19, 00, 10, 02, 03 and the miniature sizes) and of
single-row angular-contact ball bearings 72..B / 73..B, which share the boundary
dimensions of dimension series 02 and 03. Every value is typed from memory of the
general-plan tables (dimension series columns), hence ``# from memory`` beside each.
"""

import pytest

from fitcheck.bearings import bearing

# (designation, d, D, B, r_min) [mm]
CASES = [
    ("623", 3, 10, 4, 0.15),     # ISO 15:2017, diameter series 2, d = 3 # from memory
    ("625", 5, 16, 5, 0.3),      # ISO 15:2017, diameter series 2, d = 5 # from memory
    ("608", 8, 22, 7, 0.3),      # ISO 15:2017, dimension series 10, d = 8 # from memory
    ("635", 5, 19, 6, 0.3),      # ISO 15:2017, diameter series 3, d = 5 # from memory
    ("684", 4, 9, 2.5, 0.1),     # ISO 15:2017, dimension series 18 (miniature), d = 4 # from memory
    ("688", 8, 16, 4, 0.2),      # ISO 15:2017, dimension series 18, d = 8 # from memory
    ("696", 6, 15, 5, 0.2),      # ISO 15:2017, dimension series 19, d = 6 # from memory
    ("699", 9, 20, 6, 0.3),      # ISO 15:2017, dimension series 19, d = 9 # from memory
    ("61804", 20, 32, 7, 0.3),   # ISO 15:2017, dimension series 18, d = 20 # from memory
    ("61810", 50, 65, 7, 0.3),   # ISO 15:2017, dimension series 18, d = 50 # from memory
    ("61905", 25, 42, 9, 0.3),   # ISO 15:2017, dimension series 19, d = 25 # from memory
    ("61908", 40, 62, 12, 0.6),  # ISO 15:2017, dimension series 19, d = 40 # from memory
    ("16004", 20, 42, 8, 0.3),   # ISO 15:2017, dimension series 00, d = 20 # from memory
    ("16010", 50, 80, 10, 0.6),  # ISO 15:2017, dimension series 00, d = 50 # from memory
    ("6000", 10, 26, 8, 0.3),    # ISO 15:2017, dimension series 10, d = 10 # from memory
    ("6005", 25, 47, 12, 0.6),   # ISO 15:2017, dimension series 10, d = 25 # from memory
    ("6010", 50, 80, 16, 1.0),   # ISO 15:2017, dimension series 10, d = 50 # from memory
    ("6200", 10, 30, 9, 0.6),    # ISO 15:2017, dimension series 02, d = 10 # from memory
    ("6204", 20, 47, 14, 1.0),   # ISO 15:2017, dimension series 02, d = 20 # from memory
    ("6208", 40, 80, 18, 1.1),   # ISO 15:2017, dimension series 02, d = 40 # from memory
    ("6220", 100, 180, 34, 2.1),  # ISO 15:2017, dimension series 02, d = 100 # from memory
    ("6304", 20, 52, 15, 1.1),   # ISO 15:2017, dimension series 03, d = 20 # from memory
    ("6310", 50, 110, 27, 2.0),  # ISO 15:2017, dimension series 03, d = 50 # from memory
    ("6320", 100, 215, 47, 3.0),  # ISO 15:2017, dimension series 03, d = 100 # from memory
    ("7205B", 25, 52, 15, 1.0),  # ISO 15:2017, dimension series 02 (angular contact), d = 25 # from memory
    ("7308B", 40, 90, 23, 1.5),  # ISO 15:2017, dimension series 03 (angular contact), d = 40 # from memory
]


@pytest.mark.parametrize(("designation", "d", "D", "B", "r_min"), CASES)
def test_boundary_dimensions(designation, d, D, B, r_min):
    b = bearing(designation)
    assert (b.d, b.D, b.B, b.r_min) == (d, D, B, r_min)


def test_bore_code_times_five():
    # ISO 15:2017, bore codes 04 … 96: d = 5 × code (common practice of the designation system)
    for code in range(4, 21):
        assert bearing(f"62{code:02d}").d == 5 * code
        assert bearing(f"60{code:02d}").d == 5 * code


def test_angular_contact_shares_series_02_03():
    # ISO 15:2017: 72 and 73 use the boundary dimensions of dimension series 02 and 03 # from memory
    for code in ("00", "04", "10", "20"):
        a, b = bearing(f"72{code}B"), bearing(f"62{code}")
        assert (a.d, a.D, a.B) == (b.d, b.D, b.B)
        a, b = bearing(f"73{code}B"), bearing(f"63{code}")
        assert (a.d, a.D, a.B) == (b.d, b.D, b.B)
