"""ISO 261 / ISO 724 metric threads checked against published table text that was read.

Sources (each value below was read from the page named beside it):

* [ET-724] Engineering ToolBox, "ISO 724 - Metric Threads",
  https://engineeringtoolbox.com/metric-threads-d_777.html — reproduces the ISO 724 (ISO 261)
  coarse-thread table (nominal size, pitch, clearance drill, tap drill, tensile stress area)
  and the start of the fine-thread table (M1.0 x 0.2 ... M2 x 0.25 ...).
* [ET-898] Engineering ToolBox, "Metric Bolts - Minimum Ultimate Tensile and Proof Loads",
  https://www.engineeringtoolbox.com/metric-bolts-minimum-ultimate-tensile-proof-loads-d_2026.html
  — reproduces ISO 898-1 Table 4 (coarse threads: thread, pitch P, As,nom, Fm,min); used here
  only for the pitches of M3.5, M7, M14, M18 and M22.
* [WP] Wikipedia, "ISO metric screw thread", https://en.wikipedia.org/wiki/ISO_metric_screw_thread
  — basic profile of ISO 68-1: H = (√3/2)·P, D_min = D_maj − 2·(5/8)·H ≈ D_maj − 1.082532·P,
  D_p = D_maj − 2·(3/8)·H.

Not found in a source of the allowed kind (standard or faithful reproduction, no maker's
catalogue or calculator page): a table of d2/d3 values and the fine-thread stress areas.
The basic pitch diameter is checked against the profile relation of [WP]; d3 is covered
indirectly by the stress areas As = π/4·((d2 + d3)/2)², which depend on it.
"""

import math

import pytest

from fitcheck import threads

# [ET-724] coarse-thread table, columns "Size", "Pitch", ..., "Tensile Stress Area"
COARSE_PITCH = {
    "M1.6": 0.35, "M2": 0.40, "M2.5": 0.45, "M3": 0.50,   # ISO 724 via [ET-724]
    "M4": 0.70, "M5": 0.80, "M6": 1.00, "M8": 1.25,        # ISO 724 via [ET-724]
    "M10": 1.50, "M12": 1.75, "M14": 2.00, "M16": 2.00,    # ISO 724 via [ET-724]
    "M20": 2.50, "M22": 2.50, "M24": 3.00,                 # ISO 724 via [ET-724]
    "M3.5": 0.60,                                          # ISO 724 via [ET-724] and [ET-898]
    "M7": 1.00, "M18": 2.50,                               # ISO 898-1 Table 4 via [ET-898]
}

# [ET-724] tensile stress area column (the page leaves it empty for M1.6 ... M3.5, M14, M22)
STRESS_AREA = {
    "M4": 8.78, "M5": 14.2, "M6": 20.1, "M8": 36.6, "M10": 58.0,   # ISO 724 / 898-1 via [ET-724]
    "M12": 84.3, "M16": 157, "M20": 245, "M24": 353,               # ISO 724 / 898-1 via [ET-724]
}

# [ET-724] first rows of the fine-thread table: "M 1.6 x 0.2  0.20", "M 2 x 0.25  0.25"
FINE = {"M1.6x0.2": (1.6, 0.20), "M2x0.25": (2.0, 0.25)}


@pytest.mark.parametrize("size, pitch", sorted(COARSE_PITCH.items()))
def test_coarse_pitch(size, pitch):
    t = threads.thread(size)
    assert t.series == "coarse"
    assert t.d == pytest.approx(float(size[1:]))
    assert t.P == pytest.approx(pitch, abs=1e-9)


@pytest.mark.parametrize("size, area", sorted(STRESS_AREA.items()))
def test_coarse_stress_area(size, area):
    # printed to three significant figures: half a unit of the third figure
    half_unit = 0.5 * 10.0 ** (math.floor(math.log10(area)) - 2)
    assert threads.thread(size).As == pytest.approx(area, abs=half_unit + 1e-9)


@pytest.mark.parametrize("designation, dp", sorted(FINE.items()))
def test_fine_thread_pitch(designation, dp):
    d, p = dp
    t = threads.thread(designation)
    assert t.series == "fine"
    assert (t.d, t.P) == (pytest.approx(d), pytest.approx(p))


@pytest.mark.parametrize("designation", sorted({**COARSE_PITCH, **FINE}))
def test_basic_profile_diameters(designation):
    # [WP] ISO 68-1 basic profile: H = sqrt(3)/2 P; D_p = D - 2 (3/8) H; D_min = D - 2 (5/8) H
    t = threads.thread(designation)
    H = math.sqrt(3.0) / 2.0 * t.P
    assert t.d2 == pytest.approx(t.d - 2.0 * 3.0 / 8.0 * H, abs=1e-5)
    assert t.D1 == pytest.approx(t.d - 2.0 * 5.0 / 8.0 * H, abs=1e-5)
