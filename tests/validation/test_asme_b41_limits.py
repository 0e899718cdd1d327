"""ASME B4.1-1967 (R2009) standard fits against their published tables.

Sources (the values below are typed from these printings, never read back from the CSV):

* MH31-8a/8b — Machinery's Handbook, 31st ed., Tables 8a and 8b "American National Standard
  Running and Sliding Fits ANSI/ASME B4.1-1967";
* MH-3 — Machinery's Handbook, Table 3 "American National Standard Running and Sliding Fits
  ANSI B4.1-1967 (R1987)" (an earlier printing with the same values);
* MH-9 — Machinery's Handbook, Table 9 (LC6–LC11) as reproduced on the engineering
  reference page cobanengineering.com "Locational Clearance Limits and Fits" (ANSI B4.1-1967,
  R1987); its LC8 0–0.12 in clearance "1.0 2.0" is a misprint of 1.0 3.6 (1.6 + 2.0);
* MH31-10 — Machinery's Handbook, 31st ed., Table 10 "Transition Locational Fits";
* MH31-12 — Machinery's Handbook, 31st ed., Table 12 "Interference Locational Fits";
* MH27-11 — Machinery's Handbook, 27th ed., Table 11 "ANSI Standard Force and Shrink Fits
  ANSI B4.1-1967 (R1999)", 0–3.94 in; MH31-11 — the same table in the 31st ed. above 4.73 in;
* Mott, Machine Elements in Mechanical Design, 4th ed., Example Problem 13-1 (RC5, 2.00 in).

Known discrepancy: a teaching appendix "Limits and Fits, ANSI/ASME B4.1-1967 (R2004)" prints
RC2 above 9.85 in with g5 = −0.7/−1.6, −0.7/−1.7, −0.8/−1.8 and RC4 above 9.85 in with
f7 = −2.2/−4.2, −2.5/−4.7, −2.8/−5.3; both Machinery's Handbook printings read here give
−0.8/−1.7, −1.0/−2.0, −1.2/−2.2 and −2.5/−4.5, −3.0/−5.2, −4.0/−6.5, which the table keeps.

Limits in thousandths of an inch, as printed (hole upper, hole lower, shaft upper, shaft lower).
"""

from __future__ import annotations

import pytest

from fitcheck import fits
from fitcheck.core import ansi_b41

# (class, nominal size [in], hole upper, hole lower, shaft upper, shaft lower, source)
PUBLISHED = [
    ("RC1", 0.1, 0.2, 0, -0.1, -0.25, "MH-3, RC1, 0–0.12 in"),
    ("RC1", 1.5, 0.4, 0, -0.4, -0.7, "MH-3, RC1, 1.19–1.97 in"),
    ("RC1", 17.0, 1.0, 0, -1.2, -2.0, "MH-3, RC1, 15.75–19.69 in"),
    ("RC2", 0.5, 0.4, 0, -0.25, -0.55, "MH31-8a, RC2, 0.40–0.71 in"),
    ("RC2", 10.0, 1.2, 0, -0.8, -1.7, "MH31-8a, RC2, 9.85–12.41 in"),
    ("RC3", 0.3, 0.6, 0, -0.5, -0.9, "MH31-8a, RC3, 0.24–0.40 in"),
    ("RC3", 2.5, 1.2, 0, -1.2, -1.9, "MH31-8a, RC3, 1.97–3.15 in"),
    ("RC3", 14.0, 2.2, 0, -3.0, -4.4, "MH31-8a, RC3, 12.41–15.75 in"),
    ("RC4", 0.5, 1.0, 0, -0.6, -1.3, "MH31-8a, RC4, 0.40–0.71 in"),
    ("RC4", 1.0, 1.2, 0, -0.8, -1.6, "MH31-8a, RC4, 0.71–1.19 in"),
    ("RC4", 5.0, 2.5, 0, -1.6, -3.2, "MH31-8a, RC4, 4.73–7.09 in"),
    ("RC4", 18.0, 4.0, 0, -4.0, -6.5, "MH31-8a, RC4, 15.75–19.69 in"),
    ("RC5", 2.0, 1.8, 0, -2.5, -3.7, "Mott 4th ed., Example 13-1; MH31-8b, RC5, 1.97–3.15 in"),
    ("RC6", 0.2, 1.2, 0, -0.8, -1.5, "MH31-8b, RC6, 0.12–0.24 in"),
    ("RC7", 0.1, 1.0, 0, -1.0, -1.6, "MH31-8b, RC7, 0–0.12 in"),
    ("RC7", 3.5, 3.5, 0, -5.0, -7.2, "MH31-8b, RC7, 3.15–4.73 in"),
    ("RC8", 0.5, 2.8, 0, -3.5, -5.1, "MH31-8b, RC8, 0.40–0.71 in"),
    ("RC9", 1.0, 5.0, 0, -7.0, -10.5, "MH31-8b, RC9, 0.71–1.19 in"),
    ("RC9", 12.0, 12.0, 0, -18.0, -26.0, "MH31-8b, RC9, 9.85–12.41 in"),
    ("LC6", 0.1, 1.0, 0, -0.3, -0.9, "MH-9, LC6, 0–0.12 in"),
    ("LC6", 1.5, 2.5, 0, -1.0, -2.6, "MH-9, LC6, 1.19–1.97 in"),
    ("LC7", 0.3, 2.2, 0, -1.0, -2.4, "MH-9, LC7, 0.24–0.40 in"),
    ("LC8", 0.8, 3.5, 0, -2.5, -4.5, "MH-9, LC8, 0.71–1.19 in"),
    ("LC9", 0.5, 4.0, 0, -3.5, -6.3, "MH-9, LC9, 0.40–0.71 in"),
    ("LC10", 1.0, 8, 0, -7, -15, "MH-9, LC10, 0.71–1.19 in"),
    ("LC11", 0.2, 7, 0, -6, -13, "MH-9, LC11, 0.12–0.24 in"),
    ("LT1", 0.1, 0.4, 0, 0.12, -0.12, "MH31-10, LT1, 0–0.12 in"),
    ("LT1", 2.0, 1.2, 0, 0.3, -0.3, "MH31-10, LT1, 1.97–3.15 in"),
    ("LT1", 16.0, 2.5, 0, 0.8, -0.8, "MH31-10, LT1, 15.75–19.69 in"),
    ("LT2", 14.0, 3.5, 0, 1.0, -1.0, "MH31-10, LT2, 12.41–15.75 in"),
    ("LT4", 0.3, 0.9, 0, 0.7, 0.1, "MH31-10, LT4, 0.24–0.40 in"),
    ("LT4", 8.0, 2.8, 0, 2.0, 0.2, "MH31-10, LT4, 7.09–9.85 in"),
    ("LT5", 0.1, 0.4, 0, 0.5, 0.25, "MH31-10, LT5, 0–0.12 in"),
    ("LT5", 10.0, 2.0, 0, 2.6, 1.4, "MH31-10, LT5, 9.85–12.41 in"),
    ("LT6", 1.5, 1.0, 0, 1.7, 0.7, "MH31-10, LT6, 1.19–1.97 in"),
    ("LN1", 0.5, 0.4, 0, 0.8, 0.4, "MH31-12, LN1, 0.40–0.71 in"),
    ("LN1", 5.0, 1.0, 0, 1.9, 1.2, "MH31-12, LN1, 4.73–7.09 in"),
    ("LN2", 2.0, 1.2, 0, 2.1, 1.4, "MH31-12, LN2, 1.97–3.15 in"),
    ("LN2", 17.0, 2.5, 0, 4.4, 2.8, "MH31-12, LN2, 15.75–19.69 in"),
    ("LN3", 0.2, 0.5, 0, 0.9, 0.6, "MH31-12, LN3, 0.12–0.24 in"),
    ("LN3", 13.0, 2.2, 0, 5.9, 4.5, "MH31-12, LN3, 12.41–15.75 in"),
    ("FN1", 0.1, 0.25, 0, 0.5, 0.3, "MH27-11, FN1, 0–0.12 in"),
    ("FN1", 2.0, 0.7, 0, 1.8, 1.3, "MH27-11, FN1, 1.97–2.56 in"),
    ("FN1", 12.0, 1.2, 0, 4.9, 4.0, "MH31-11, FN1, 11.03–12.41 in"),
    ("FN2", 1.0, 0.8, 0, 1.9, 1.4, "MH27-11, FN2, 0.95–1.19 in"),
    ("FN2", 3.5, 1.4, 0, 3.7, 2.8, "MH27-11, FN2, 3.15–3.94 in"),
    ("FN2", 8.0, 1.8, 0, 6.2, 5.0, "MH31-11, FN2, 7.88–8.86 in"),
    ("FN3", 1.5, 1.0, 0, 2.6, 2.0, "MH27-11, FN3, 1.19–1.58 in"),
    ("FN3", 10.0, 2.0, 0, 10.2, 9.0, "MH31-11, FN3, 9.85–11.03 in"),
    ("FN4", 0.5, 0.7, 0, 1.8, 1.4, "MH27-11, FN4, 0.40–0.56 in"),
    ("FN4", 6.0, 1.6, 0, 8.0, 7.0, "MH31-11, FN4, 5.52–6.30 in"),
    ("FN4", 19.0, 2.5, 0, 23.6, 22.0, "MH31-11, FN4, 17.72–19.69 in"),
    ("FN5", 0.3, 0.9, 0, 2.0, 1.4, "MH27-11, FN5, 0.24–0.40 in"),
    ("FN5", 14.0, 3.5, 0, 27.2, 25.0, "MH31-11, FN5, 13.98–15.75 in"),
]

# Printed limits of clearance (RC, LC), of fit (LT: −interference … +clearance) and of
# interference (LN, FN: min … max), thousandths of an inch.
# (class, size [in], first printed value, second printed value, source)
PRINTED_FIT = [
    ("RC1", 0.1, 0.1, 0.45, "MH-3, RC1, 0–0.12 in"),
    ("RC2", 13.0, 1.0, 3.4, "MH-3 and MH31-8a, RC2, 12.41–15.75 in"),
    ("RC3", 18.0, 4.0, 8.1, "MH31-8a, RC3, 15.75–19.69 in"),
    ("RC4", 10.0, 2.5, 7.5, "MH31-8a, RC4, 9.85–12.41 in"),
    ("RC5", 0.5, 1.2, 2.9, "MH31-8b, RC5, 0.40–0.71 in"),
    ("RC5", 2.0, 2.5, 5.5, "Mott 4th ed., Example 13-1 (0.0025 … 0.0055 in)"),
    ("RC6", 2.0, 2.5, 7.3, "MH31-8b, RC6, 1.97–3.15 in"),
    ("RC7", 2.0, 4.0, 8.8, "MH31-8b, RC7, 1.97–3.15 in"),
    ("RC8", 0.3, 3.0, 6.6, "MH31-8b, RC8, 0.24–0.40 in"),
    ("RC9", 5.0, 12.0, 28.0, "MH31-8b, RC9, 4.73–7.09 in"),
    ("LC6", 1.0, 0.8, 4.0, "MH-9, LC6, 0.71–1.19 in"),
    ("LC7", 1.0, 1.6, 7.1, "MH-9, LC7, 0.71–1.19 in"),
    ("LC8", 0.5, 2.0, 6.4, "MH-9, LC8, 0.40–0.71 in"),
    ("LC9", 0.3, 3.0, 8.7, "MH-9, LC9, 0.24–0.40 in"),
    ("LC10", 0.5, 6, 20, "MH-9, LC10, 0.40–0.71 in"),
    ("LC11", 1.0, 10, 34, "MH-9, LC11, 0.71–1.19 in"),
    ("LT1", 0.1, -0.12, 0.52, "MH31-10, LT1, 0–0.12 in"),
    ("LT2", 0.3, -0.3, 1.2, "MH31-10, LT2, 0.24–0.40 in"),
    ("LT4", 4.0, -1.5, 2.1, "MH31-10, LT4, 3.15–4.73 in"),
    ("LT5", 12.0, -2.6, 0.6, "MH31-10, LT5, 9.85–12.41 in"),
    ("LT5", 13.0, -3.0, 0.6, "MH31-10, LT5, 12.41–15.75 in"),
    ("LT6", 1.0, -1.4, 0.2, "MH31-10, LT6, 0.71–1.19 in"),
    ("LN1", 0.1, 0.0, 0.45, "MH31-12, LN1, 0–0.12 in"),
    ("LN2", 3.0, 0.2, 2.1, "MH31-12, LN2, 1.97–3.15 in"),
    ("LN3", 16.0, 2.5, 6.6, "MH31-12, LN3, 15.75–19.69 in"),
    ("FN1", 0.1, 0.05, 0.5, "MH27-11, FN1, 0–0.12 in"),
    ("FN2", 2.0, 0.8, 2.7, "MH27-11, FN2, 1.97–2.56 in"),
    ("FN3", 3.0, 1.8, 3.7, "MH27-11, FN3, 2.56–3.15 in"),
    ("FN4", 7.5, 7.2, 10.2, "MH31-11, FN4, 7.09–7.88 in"),
    ("FN5", 18.0, 26.0, 32.5, "MH31-11, FN5, 17.72–19.69 in"),
]


def test_coverage_of_the_published_checks():
    families = {c[:2] for c, *_ in PUBLISHED}
    ranges = {ansi_b41.row_info(s, c)[:2] for c, s, *_ in PUBLISHED}
    assert families == {"RC", "LC", "LT", "LN", "FN"}
    assert 4 * len(PUBLISHED) >= 60 and len(ranges) >= 6


@pytest.mark.parametrize("cls,size,hu,hl,su,sl,source", PUBLISHED,
                         ids=[f"{p[0]}@{p[1]}" for p in PUBLISHED])
def test_limits_as_printed(cls, size, hu, hl, su, sl, source):
    got = [float(v) for v in ansi_b41.limits_thou(size, cls)[:4]]
    assert got == pytest.approx([hu, hl, su, sl], abs=1e-9), source
    assert ansi_b41.row_info(size, cls)[2] == "read", source


@pytest.mark.parametrize("cls,size,a,b,source", PRINTED_FIT, ids=[f"{p[0]}@{p[1]}" for p in PRINTED_FIT])
def test_hole_and_shaft_limits_give_the_printed_fit(cls, size, a, b, source):
    f = fits.fit(f"{size} in {cls}")
    cmin, cmax = f.clearance_min_um / 25.4, f.clearance_max_um / 25.4
    if cls[:2] in ("RC", "LC", "LT"):
        assert (cmin, cmax) == pytest.approx((a, b), abs=1e-9), source
    else:  # interference printed as min … max
        assert (-cmax, -cmin) == pytest.approx((a, b), abs=1e-9), source


def test_mott_example_13_1_limit_sizes():
    # Mott, 4th ed., Example 13-1: RC5 at 2.0000 in — hole 2.0018 / 2.0000, shaft 1.9975 / 1.9963
    f = fits.fit("2.000 in RC5")
    sizes = [f.hole.max_mm / 25.4, f.hole.min_mm / 25.4, f.shaft.max_mm / 25.4, f.shaft.min_mm / 25.4]
    assert sizes == pytest.approx([2.0018, 2.0000, 1.9975, 1.9963], abs=5e-9)


def test_range_bounds_belong_to_the_lower_range():
    # B4.1 ranges read "over … to" (upper bound included): 0.71 in is in 0.40–0.71, also from mm
    assert ansi_b41.row_info(0.71, "RC4")[:2] == (0.40, 0.71)
    f = fits.fit(f"{0.71 * 25.4} mm RC4")
    assert f.hole.upper_um == pytest.approx(1.0 * 25.4)
