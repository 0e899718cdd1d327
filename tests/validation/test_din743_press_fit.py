"""DIN 743-1/-2/-3:2012 — the standard's own values for a shaft under a press-fitted hub.

Source: DIN 743-1:2012-12 (fatigue and static safety, equivalent mean stress, ψ),
DIN 743-2:2012-12 (notch factors of press fits at d_BK = 40 mm, K1, K2, K3, K_F),
DIN 743-3:2012-12 (strength ratios). No copy of the standard was at hand: every value
below is typed from recollection of the printed equations and is marked ``# from memory``.
The published worked examples of DIN 743 Beiblatt 1 (keyed shaft, grooved axle) could not
be read here and are not reproduced; the checks below are the standard's own anchor values
and a complete hand calculation of one press-fit seat written out from the equations.
"""

from __future__ import annotations

import math

import pytest

from fitcheck.core import din743


def test_press_fit_notch_factor_at_reference_diameter():
    # DIN 743-2:2012, table of notch factors, press fit, d_BK = 40 mm:
    # βσ = 2.7·(σ_B/1000)^0.43, βτ = 0.65·βσ — from memory
    for sB, bs in ((1000.0, 2.7), (500.0, 2.7 * 0.5**0.43), (800.0, 2.7 * 0.8**0.43)):
        b_s, b_t = din743.press_fit_notch_factors(40.0, sB)
        assert float(b_s) == pytest.approx(bs, rel=1e-12)
        assert float(b_t) == pytest.approx(0.65 * bs, rel=1e-12)


def test_k2_printed_points():
    # DIN 743-2:2012, K2(d) = 1 − 0.2·lg(d/7.5)/lg 20 (7.5 … 150 mm), 1 below, 0.8 above — from memory
    assert float(din743.k2(7.5)) == 1.0
    assert float(din743.k2(5.0)) == 1.0
    assert float(din743.k2(30.0)) == pytest.approx(1 - 0.2 * math.log10(4.0) / math.log10(20.0), rel=1e-12)
    assert float(din743.k2(150.0)) == pytest.approx(0.8, abs=1e-12)
    assert float(din743.k2(400.0)) == pytest.approx(0.8, abs=1e-12)


def test_roughness_factor_equation():
    # DIN 743-2:2012: K_Fσ = 1 − 0.22·lg Rz·(lg(σ_B(d)/20) − 1); K_Fτ = 0.575·K_Fσ + 0.425 — from memory
    kfs, kft = din743.roughness_factors(6.3, 700.0)
    exp = 1 - 0.22 * math.log10(6.3) * (math.log10(700 / 20) - 1)
    assert float(kfs) == pytest.approx(exp, rel=1e-12)
    assert float(kft) == pytest.approx(0.575 * exp + 0.425, rel=1e-12)


def test_hand_calculation_c45e_30mm_press_fit():
    """A 30 mm C45E shaft under a pressed hub, M = 150 N·m rotating, T = 200 N·m static.

    Every step from the printed equations with plain ``math`` (DIN 743:2012 — from memory).
    """
    d, sB, sS, rz = 30.0, 700.0, 490.0, 6.3        # C45E at d_B = 16 mm (DIN 743-3) — from memory
    M, T = 150e3, 200e3                            # [N·mm]
    # 1. K1 (QT steel, σ_B and σ_S)
    K1 = 1 - 0.26 * math.log10(d / 16)
    K1y = 1 - 0.34 * math.log10(d / 16)
    sBd = K1 * sB
    # 2. notch factors at 40 mm and at d
    bs40 = 2.7 * (sBd / 1000) ** 0.43
    bt40 = 0.65 * bs40

    def K3(dd, a):
        return 1 - 0.2 * math.log10(a) * math.log10(dd / 7.5) / math.log10(20)

    bs = bs40 * K3(40, bs40) / K3(d, bs40)
    bt = bt40 * K3(40, bt40) / K3(d, bt40)
    # 3. K2, K_F, total factors
    K2 = 1 - 0.2 * math.log10(d / 7.5) / math.log10(20)
    KFs = 1 - 0.22 * math.log10(rz) * (math.log10(sBd / 20) - 1)
    KFt = 0.575 * KFs + 0.425
    Ks = bs / K2 + 1 / KFs - 1
    Kt = bt / K2 + 1 / KFt - 1
    # 4. component fatigue limits and ψ
    sbWK = 0.5 * sB * K1 / Ks
    ttWK = 0.3 * sB * K1 / Kt
    psi_b = sbWK / (2 * K1 * sB - sbWK)
    # 5. stresses, equivalent mean stress (static torque), case 2
    Wb = math.pi * d**3 / 32
    sba = M / Wb
    ttm = T / (2 * Wb)
    smv = math.sqrt(3) * ttm
    sbFK = K1y * 1.2 * sS
    sbADK = min(sbWK / (1 + psi_b * smv / sba), sbFK / (1 + smv / sba))
    S_fatigue = sbADK / sba                        # τ_ta = 0: only the bending term
    # 6. static
    ttFK = K1y * 1.2 * sS / math.sqrt(3)
    S_static = 1 / math.sqrt((sba / sbFK) ** 2 + (ttm / ttFK) ** 2)

    r = din743.press_fit_seat(d=d, sigma_B_dB=sB, sigma_S_dB=sS, group="QT", rz_um=rz,
                              moment_amplitude=M, torque_mean=T)
    assert float(r["beta_sigma"]) == pytest.approx(bs, rel=1e-12)
    assert float(r["beta_tau"]) == pytest.approx(bt, rel=1e-12)
    assert float(r["K_sigma_b"]) == pytest.approx(Ks, rel=1e-12)
    assert float(r["K_tau"]) == pytest.approx(Kt, rel=1e-12)
    assert float(r["tau_tWK"]) == pytest.approx(ttWK, rel=1e-12)
    assert float(r["fatigue_safety"]) == pytest.approx(S_fatigue, rel=1e-12)
    assert float(r["static_safety"]) == pytest.approx(S_static, rel=1e-12)
    # the figures worked by hand (pocket calculator, 4 digits): K1 = 0.9290, σ_B(d) = 650.3 MPa,
    # βσ(40) = 2.244, K3(40) = 0.9608, K3(30) = 0.9675, βσ = 2.228, K2 = 0.9074, K_Fσ = 0.9100,
    # Kσ = 2.554, σ_bWK = 127.3 MPa, ψ = 0.1085, σ_ba = 56.59 MPa, σ_mv = 65.34 MPa,
    # σ_bADK = 113.1 MPa, S = 2.00; σ_bFK = 533.4, τ_tFK = 308.0 MPa, S_static = 6.17
    assert round(bs, 3) == 2.228 and round(K2, 4) == 0.9074 and round(Ks, 2) == 2.55
    assert round(S_fatigue, 2) == 2.00 and round(S_static, 2) == 6.17
