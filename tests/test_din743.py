"""DIN 743 kernel (fitcheck.core.din743): properties, broadcasting and edge cases.

Values of the standard itself are checked in tests/validation/test_din743_press_fit.py.
"""

from __future__ import annotations

import math

import numpy as np
import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

from fitcheck.core import din743

SEAT = dict(d=25.0, sigma_B_dB=700.0, sigma_S_dB=490.0, group="QT", rz_um=4.0)


@settings(max_examples=150, deadline=None)
@given(M=st.floats(1e3, 1e7), k=st.floats(0.05, 20.0))
def test_fatigue_safety_inverse_to_moment_under_pure_reversed_bending(M, k):
    # no mean stress: S = σ_bWK/σ_ba, so S·M is constant (DIN 743-1:2012, fatigue safety)
    s1 = din743.press_fit_seat(**SEAT, moment_amplitude=M)["fatigue_safety"]
    s2 = din743.press_fit_seat(**SEAT, moment_amplitude=k * M)["fatigue_safety"]
    assert float(s1) / float(s2) == pytest.approx(k, rel=1e-12)


@pytest.mark.parametrize("fn", [lambda d: din743.k2(d), lambda d: din743.k1(d, "QT"),
                                lambda d: din743.k1(d, "QT", "yield"), lambda d: din743.k1(d, "case"),
                                lambda d: din743.k1(d, "structural")])
def test_size_factors_continuous_and_monotone(fn):
    d = np.linspace(1.0, 500.0, 200_001)
    k = fn(d)
    assert np.all(np.diff(k) <= 1e-15)                    # non-increasing in d
    assert np.max(np.abs(np.diff(k))) < 1e-4               # no jump (steps of 0.0025 mm)
    assert k[0] == 1.0 and 0.5 < k[-1] < 1.0


@settings(max_examples=100, deadline=None)
@given(d=st.floats(7.5, 150.0), x=st.floats(1e-9, 1e-6))
def test_k2_continuous_at_every_point(d, x):
    assert abs(float(din743.k2(d + x)) - float(din743.k2(d))) < 1e-6


def test_k2_and_k1_range_ends():
    # the formula meets the constant ends: K2(150) = 0.8, K1(QT, 300) = 0.67 (DIN 743-2:2012) — from memory
    assert float(din743.k2(150.0)) == pytest.approx(0.8, abs=1e-12)
    assert float(din743.k1(300.0, "QT")) == pytest.approx(0.67, abs=0.002)
    assert float(din743.k1(150.0, "case")) == pytest.approx(0.60, abs=0.002)


def test_broadcasting_matches_scalar_calls():
    d = np.array([12.0, 25.0, 60.0])
    M = np.array([5e3, 4e4, 3e5])
    r = din743.press_fit_seat(d=d, sigma_B_dB=700.0, sigma_S_dB=490.0, moment_amplitude=M,
                              torque_mean=2e4, axial_mean=500.0)
    for i in range(3):
        ri = din743.press_fit_seat(d=d[i], sigma_B_dB=700.0, sigma_S_dB=490.0, moment_amplitude=M[i],
                                   torque_mean=2e4, axial_mean=500.0)
        for k in ("fatigue_safety", "static_safety", "beta_sigma", "K_tau"):
            assert r[k][i] == pytest.approx(float(ri[k]), rel=1e-13)


def test_no_load_gives_infinite_safety_without_warnings():
    with np.errstate(all="raise"):
        r = din743.press_fit_seat(**SEAT)
    assert math.isinf(float(r["fatigue_safety"])) and math.isinf(float(r["static_safety"]))


def test_static_torque_alone_does_not_fatigue():
    # a static torque is a mean stress only: no amplitude, no fatigue term (DIN 743-1:2012)
    r = din743.press_fit_seat(**SEAT, torque_mean=50_000.0)
    assert math.isinf(float(r["fatigue_safety"])) and math.isfinite(float(r["static_safety"]))


def test_mean_stress_lowers_fatigue_safety_and_case2_is_conservative():
    base = din743.press_fit_seat(**SEAT, moment_amplitude=60_000.0)["fatigue_safety"]
    c2 = din743.press_fit_seat(**SEAT, moment_amplitude=60_000.0, torque_mean=80_000.0)["fatigue_safety"]
    c1 = din743.press_fit_seat(**SEAT, moment_amplitude=60_000.0, torque_mean=80_000.0,
                               mean_stress_case=1)["fatigue_safety"]
    assert float(c2) < float(base) and float(c2) <= float(c1) < float(base)


def test_notch_factors_grow_with_strength_and_size():
    b1, _ = din743.press_fit_notch_factors(25.0, 500.0)
    b2, _ = din743.press_fit_notch_factors(25.0, 1000.0)
    b3, _ = din743.press_fit_notch_factors(80.0, 1000.0)
    assert float(b1) < float(b2) < float(b3)


def test_bad_group_and_case_raise():
    with pytest.raises(ValueError, match="K1 group"):
        din743.k1(20.0, "cast")
    with pytest.raises(ValueError, match="mean-stress case"):
        din743.stress_ratio_term(1.0, 1.0, 100.0, 300.0, 0.1, case=3)


@settings(max_examples=60, deadline=None)
@given(d=st.floats(3.0, 400.0), de=st.floats(3.0, 400.0), sB=st.floats(300.0, 1400.0), rz=st.floats(0.2, 40.0),
       group=st.sampled_from(sorted(din743.K1_GROUPS)), dB=st.floats(8.0, 60.0))
def test_whole_chain_equals_the_step_functions(d, de, sB, rz, group, dB):
    # press_fit_seat shares its logarithms; it must equal the composition of the documented steps
    r = din743.press_fit_seat(d=d, sigma_B_dB=sB, sigma_S_dB=0.7 * sB, group=group, d_B=dB, d_eff=de,
                              rz_um=rz, moment_amplitude=1e4, torque_amplitude=5e3)
    K1 = din743.k1(de, group) / din743.k1(dB, group)
    bs, bt = din743.press_fit_notch_factors(d, K1 * sB)
    kfs, kft = din743.roughness_factors(rz, K1 * sB)
    Ks = din743.total_factor(bs, din743.k2(d), kfs)
    Kt = din743.total_factor(bt, din743.k2(d), kft)
    assert float(r["K1"]) == pytest.approx(float(K1), rel=1e-12)
    assert float(r["beta_sigma"]) == pytest.approx(float(bs), rel=1e-12)
    assert float(r["beta_tau"]) == pytest.approx(float(bt), rel=1e-12)
    assert float(r["K_sigma_b"]) == pytest.approx(float(Ks), rel=1e-12)
    assert float(r["K_tau"]) == pytest.approx(float(Kt), rel=1e-12)
    assert float(r["psi_b"]) == pytest.approx(float(din743.psi(r["sigma_bWK"], K1, sB)), rel=1e-12)
