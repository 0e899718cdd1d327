"""ASME B1.1 (Unified inch screw threads) — tensile stress areas At = 0.7854·(d − 0.9743/n)².

Printed values of the standard's thread-data table (in²), as recalled: # from memory. They are
rounded to three or four significant figures; Shigley's Mechanical Engineering Design, 10th ed.,
Table 8-2, reprints the same areas.
"""

import pytest

from fitcheck import threads

# ASME B1.1, tensile stress area At [in²]  # from memory (also Shigley 10th ed., Table 8-2)
AT_IN2 = {
    "#4-40 UNC": 0.00604, "#6-32 UNC": 0.00909, "#8-32 UNC": 0.0140, "#10-24 UNC": 0.0175,
    "#10-32 UNF": 0.0200, "1/4-20 UNC": 0.0318, "1/4-28 UNF": 0.0364, "5/16-18 UNC": 0.0524,
    "3/8-16 UNC": 0.0775, "3/8-24 UNF": 0.0878, "1/2-13 UNC": 0.1419, "1/2-20 UNF": 0.1599,
    "5/8-11 UNC": 0.226, "3/4-10 UNC": 0.334, "1-8 UNC": 0.606, "1-12 UNF": 0.663,
}


@pytest.mark.parametrize("designation, area_in2", sorted(AT_IN2.items()))
def test_tensile_stress_area(designation, area_in2):
    at_in2 = threads.thread(designation).As / 25.4 ** 2
    # The printed areas carry 3-4 figures; the formula gives #4-40: 0.006033 (printed 0.00604) and
    # 1/2-20: 0.15995 (printed 0.1599): tolerance half a unit of the last printed figure, at least 0.15 %.
    text = f"{area_in2:.6g}"
    half_digit = 0.5 * 10.0 ** -len(text.split(".")[1])
    assert at_in2 == pytest.approx(area_in2, abs=max(half_digit, 0.0015 * area_in2))


def test_series_inferred_and_pitch():
    # ASME B1.1: 1/4-20 is the coarse (UNC) series, 1/4-28 the fine (UNF)  # from memory
    assert threads.thread("1/4-20").series == "UNC"
    assert threads.thread("1/4-28").series == "UNF"
    assert threads.thread("#10-32 UNF").P == pytest.approx(25.4 / 32)
