"""VDI 2230 Part 1:2015, step R11 (Section 5.5.5): minimum length of engagement, written out step by step.

For M4 and M5 8.8 socket head screws in die-cast EN AC-46000 and for M6 8.8 in C45E, every step of
R11 is recomputed here with plain ``math`` from the printed equations — tolerance limits of the 6g/6H
fit (ISO 965-1), shear areas at those limits, the strength ratio R_S, the factors C1, C2, C3, the
effective engagement m_eff and the length for the drawing m_ges = m_eff + allowance — and compared
with the engine. The R11 equations and the ISO 965-1 values are typed from recollection of the
printed standards (# from memory). The engine uses the ISO 965-1 formulas unrounded; the printed
tables round them to R40 numbers, which moves m_eff by well under 2 % (checked below).
"""

import math
import warnings

import pytest

from fitcheck.core import vdi2230 as core
from fitcheck.screws import ScrewJointInput, evaluate

TAN30 = math.tan(math.radians(30.0))

# ISO 965-1, tables of 6g/6H limits: (es of g, Td(6), Td2(6), TD1(6), TD2(6)) in µm  # from memory
ISO965_PRINTED = {
    (4.0, 0.7): (-22, 140, 90, 180, 118),
    (5.0, 0.8): (-24, 150, 95, 200, 125),
    (6.0, 1.0): (-26, 180, 112, 236, 150),
}


def _r11_by_hand(d, P, tauBM, tauBS, Rm, tol_um):
    es, Td, Td2, TD1, TD2 = (x / 1000.0 for x in tol_um)
    d2 = d - 0.649519 * P                                   # ISO 724
    d3 = d - 1.226869 * P                                   # ISO 898-1, 9.1.6.1
    D1 = d - 1.082532 * P                                   # ISO 724
    As = math.pi / 4 * ((d2 + d3) / 2) ** 2
    d_min, d2_min = d + es - Td, d2 + es - Td2              # screw 6g at its smallest
    D1_max, D2_max = D1 + TD1, d2 + TD2                     # internal thread 6H at its largest
    # VDI 2230-1:2015, 5.5.5.2: shear areas per mm of engagement
    a_SGM = math.pi * d_min / P * (P / 2 + (d_min - D2_max) * TAN30)
    a_SGS = math.pi * D1_max / P * (P / 2 + (d2_min - D1_max) * TAN30)
    R_S = tauBM * a_SGM / (tauBS * a_SGS)                   # strength ratio
    C1 = 1.0                                                # tapped hole: no nut dilation
    if R_S <= 1:
        C2 = 0.897
    else:
        r = min(R_S, 2.2)
        C2 = 5.594 - 13.682 * r + 14.107 * r ** 2 - 6.057 * r ** 3 + 0.9353 * r ** 4
    if R_S >= 1:
        C3 = 0.897
    else:
        r = max(R_S, 0.4)
        C3 = 0.728 + 1.769 * r - 2.896 * r ** 2 + 1.296 * r ** 3
    C2, C3 = min(C2, 1.0), min(C3, 1.0)                     # this program: never above 1
    F_mS = Rm * As
    m_eff = F_mS / min(tauBM * a_SGM * C1 * C3, tauBS * a_SGS * C1 * C2)
    return dict(R_S=R_S, C1=C1, C2=C2, C3=C3, m_eff=m_eff, m_ges=m_eff + 2 * P)


def _engine(thread, housing):
    m = {"thread": thread, "property_class": "8.8", "head": "socket",
         "layers": [{"thickness": "6 mm", "material": "C45E"}], "engagement": "30 mm", "housing_material": housing}
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        return evaluate(ScrewJointInput.from_mapping(m))


# τB: EN AC-46000 0.6·Rm = 0.6·240 = 144 MPa; C45E 0.6·700 = 420 MPa (data/materials.csv, VDI 2230-1
# Table A9 ratios); screw 8.8: τB/Rm = 0.65 (VDI 2230-1:2015, Table 7)  # from memory
CASES = [("M4", 4.0, 0.7, "EN AC-46000", 144.0), ("M5", 5.0, 0.8, "EN AC-46000", 144.0),
         ("M6", 6.0, 1.0, "C45E", 420.0)]


@pytest.mark.parametrize("thread, d, P, housing, tauBM", CASES)
def test_r11_step_by_step(thread, d, P, housing, tauBM):
    r = _engine(thread, housing)
    tol = tuple(float(x) * 1000 for x in core.iso965_tolerances(d, P))   # the formulas the engine uses
    hand = _r11_by_hand(d, P, tauBM, 0.65 * 800.0, 800.0, tol)
    assert r.strength_ratio == pytest.approx(hand["R_S"], rel=1e-9)
    assert (r.C1, r.C2, r.C3) == pytest.approx((hand["C1"], hand["C2"], hand["C3"]), rel=1e-9)
    assert r.engagement_effective_min == pytest.approx(hand["m_eff"], rel=1e-9)
    assert r.engagement_min == pytest.approx(hand["m_ges"], rel=1e-9)
    # with the values ISO 965-1 prints (rounded to R40) the effective length moves by < 2 %
    printed = _r11_by_hand(d, P, tauBM, 0.65 * 800.0, 800.0, ISO965_PRINTED[(d, P)])
    assert r.engagement_effective_min == pytest.approx(printed["m_eff"], rel=0.02)


def test_which_thread_strips_and_which_factor_acts():
    # aluminium housing: the internal thread is the weaker (R_S < 1), C3 acts; steel housing with an
    # 8.8 screw: R_S > 1, the screw thread governs and C2 acts (VDI 2230-1:2015, 5.5.5.2)
    assert _engine("M4", "EN AC-46000").engagement_strips == "internal"
    steel = _engine("M6", "C45E")
    assert steel.strength_ratio > 1 and steel.engagement_strips == "external" and steel.C2 < 1


def test_iso965_formulas_against_printed_limits():
    # ISO 965-1 prints the formula values rounded to R40: within 3 % or 2 µm of the printed cells
    for (d, P), printed in ISO965_PRINTED.items():
        got = [float(x) * 1000 for x in core.iso965_tolerances(d, P)]
        for g, p in zip(got, printed, strict=True):
            assert abs(g - p) <= max(2.0, 0.03 * abs(p)), (d, P, got, printed)


def test_m4_in_die_cast_aluminium_is_no_longer_short():
    # The basic-profile method (FED-STD-H28/2B areas, τB = 0.7·Rm = 168 MPa, no factors) gave 3.80 mm for
    # M4 8.8 in EN AC-46000; adding only the thread-runout allowance already gives about 4.2 mm. R11 in
    # full (tolerance limits, C3, allowance) must ask for more than both.
    basic = float(core.min_engagement(8.78, 800.0, 480.0, 168.0, 4.0, 4.0 - 0.649519 * 0.7, 0.7)[0])
    assert basic == pytest.approx(3.80, abs=0.01)
    r = _engine("M4", "EN AC-46000")
    assert r.engagement_min > 4.2 and r.engagement_effective_min > basic
