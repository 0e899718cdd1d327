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
from fitcheck.errors import InputError

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


def _step_by_step(d, di, sB, sS, s_zdW, s_bW, t_tW, group, d_B, d_eff, rz, k_v, Ma, Tm, Ta, Fm, Mmax, Tmax, Fmax,
                  case):
    """Every output of press_fit_seat, one documented step function after the other (no shared terms)."""
    K1 = din743.k1(d_eff, group) / din743.k1(d_B, group)
    K1y = din743.k1(d_eff, group, "yield") / din743.k1(d_B, group, "yield")
    sB_d = K1 * sB
    bs, bt = din743.press_fit_notch_factors(d, sB_d)
    K2 = din743.k2(d)
    kfs, kft = din743.roughness_factors(rz, sB_d)
    Ksb = din743.total_factor(bs, K2, kfs, k_v)
    Kszd = din743.total_factor(bs, din743.k2(d, tension=True), kfs, k_v)
    Kt = din743.total_factor(bt, K2, kft, k_v)
    s_bWK, s_zdWK, t_tWK = s_bW * K1 / Ksb, s_zdW * K1 / Kszd, t_tW * K1 / Kt
    sba, tta, szm = din743.nominal_stresses(d, di, Ma, Ta, Fm)
    ttm = din743.nominal_stresses(d, di, 0.0, Tm, 0.0)[1]
    smv, tmv = din743.equivalent_mean_stress(szm, 0.0, ttm)
    s_zdFK = K1y * sS
    s_bFK = np.where(di > 0, 1.0, 1.2) * s_zdFK
    t_tFK = s_bFK / np.sqrt(3.0)
    psi_b, psi_zd, psi_t = (din743.psi(w, K1, sB) for w in (s_bWK, s_zdWK, t_tWK))
    term_b = din743.stress_ratio_term(sba, smv, s_bWK, s_bFK, psi_b, case)
    term_t = din743.stress_ratio_term(tta, tmv, t_tWK, t_tFK, psi_t, case)
    sb_max, tt_max, sz_max = din743.nominal_stresses(d, di, np.abs(Mmax), np.abs(Tmax), np.abs(Fmax))
    return {
        "K1": K1, "K1_yield": K1y, "sigma_B_d": sB_d, "beta_sigma": bs, "beta_tau": bt, "K2": K2,
        "KF_sigma": kfs, "KF_tau": kft, "K_sigma_b": Ksb, "K_sigma_zd": Kszd, "K_tau": Kt,
        "sigma_bWK": s_bWK, "sigma_zdWK": s_zdWK, "tau_tWK": t_tWK, "psi_b": psi_b, "psi_zd": psi_zd, "psi_t": psi_t,
        "sigma_ba": sba, "tau_ta": tta, "tau_tm": ttm, "sigma_zdm": szm, "sigma_mv": smv, "tau_mv": tmv,
        "sigma_bFK": s_bFK, "sigma_zdFK": s_zdFK, "tau_tFK": t_tFK,
        "fatigue_safety": din743.fatigue_safety(0.0, term_b, term_t),
        "static_safety": din743.static_safety(sz_max, sb_max, tt_max, s_zdFK, s_bFK, t_tFK),
    }


@pytest.mark.parametrize("case", [1, 2])
@pytest.mark.parametrize("group, d_B, k_v", [("QT", 16.0, 1.0), ("case", 30.0, "array"), ("structural", 16.0, 1.3)])
@pytest.mark.parametrize("chunk", [997, 10**6])
def test_every_output_equals_the_step_functions(monkeypatch, case, group, d_B, k_v, chunk):
    # the chain shares logarithms and reciprocals and writes block by block into its outputs; every
    # output must still be the composition of the documented steps (rounding only), whole-array or blocked
    monkeypatch.setattr(din743, "CHUNK", chunk)
    n = 3 * 997 + 1
    rng = np.random.default_rng(7 + case)
    d = rng.uniform(3.0, 400.0, n)
    d_eff = np.where(rng.uniform(size=n) < 0.5, d, rng.uniform(3.0, 400.0, n))
    di = np.where(rng.uniform(size=n) < 0.5, 0.0, d * rng.uniform(0.0, 0.8, n))
    sB = rng.uniform(300.0, 1400.0, n)
    sS = 0.75 * sB
    s_zdW, s_bW, t_tW = 0.4 * sB, rng.uniform(0.45, 0.55, n) * sB, 0.3 * sB
    rz = rng.uniform(0.2, 40.0, n)
    kv = rng.uniform(1.0, 2.0, n) if k_v == "array" else k_v
    # amplitudes: some zero, some negative (they add nothing to the fatigue term)
    Ma = rng.choice([0.0, -1.0, 1.0, 1.0, 1.0], n) * rng.uniform(1e3, 1e6, n)
    Ta = rng.choice([0.0, 1.0, 1.0], n) * rng.uniform(1e3, 5e5, n)
    Tm = rng.uniform(-5e5, 5e5, n)
    Fm = rng.uniform(-2e4, 2e4, n)
    Mmax = np.abs(Ma) * rng.uniform(1.0, 2.0, n)
    r = din743.press_fit_seat(d=d, di=di, sigma_B_dB=sB, sigma_S_dB=sS, sigma_zdW_dB=s_zdW, sigma_bW_dB=s_bW,
                              tau_tW_dB=t_tW, group=group, d_B=d_B, d_eff=d_eff, rz_um=rz, k_v=kv,
                              moment_amplitude=Ma, torque_mean=Tm, torque_amplitude=Ta, axial_mean=Fm,
                              moment_max=Mmax, mean_stress_case=case)
    ref = _step_by_step(d, di, sB, sS, s_zdW, s_bW, t_tW, group, d_B, d_eff, rz, kv, Ma, Tm, Ta, Fm, Mmax,
                        np.abs(Tm) + Ta, Fm, case)
    assert r.keys() == ref.keys()
    for k, v in ref.items():
        assert np.shape(r[k]) == (n,), k
        np.testing.assert_allclose(r[k], v, rtol=1e-12, atol=0.0, err_msg=k)
    assert np.all(np.isinf(r["fatigue_safety"][(Ma <= 0) & (Ta == 0)]))


@pytest.mark.parametrize("chunk", [997, 10**6])
def test_scalar_inputs_with_the_defaults_equal_the_step_functions(monkeypatch, chunk):
    # the bench's tolerance-study form: one seat, default fatigue strengths (DIN 743-3 ratios), moment sampled
    monkeypatch.setattr(din743, "CHUNK", chunk)
    M = np.random.default_rng(3).uniform(5e3, 3e4, 3 * 997 + 1)
    r = din743.press_fit_seat(d=20.0, sigma_B_dB=700.0, sigma_S_dB=490.0, rz_um=4.0, moment_amplitude=M,
                              torque_mean=6000.0, torque_amplitude=6000.0, axial_mean=300.0)
    ref = _step_by_step(20.0, 0.0, 700.0, 490.0, 280.0, 350.0, 210.0, "QT", 16.0, 20.0, 4.0, 1.0, M, 6000.0,
                        6000.0, 300.0, M, 12000.0, 300.0, 2)
    for k, v in ref.items():
        assert np.shape(r[k]) == np.shape(v), k
        np.testing.assert_allclose(r[k], v, rtol=1e-12, atol=0.0, err_msg=k)


def test_inputs_of_different_shapes_broadcast():
    # a column of diameters against rows of roughness, heat-treatment diameter, axial force and K_V
    d = np.array([[12.0], [25.0], [60.0]])
    rows = dict(rz_um=np.array([0.5, 4.0, 16.0, 40.0]), d_eff=np.array([10.0, 40.0, 80.0, 200.0]),
                axial_mean=np.array([0.0, 300.0, -900.0, 5e3]), k_v=np.array([1.0, 1.2, 1.5, 1.0]))
    common = dict(sigma_B_dB=700.0, sigma_S_dB=490.0, moment_amplitude=1e4, torque_mean=2e4, torque_amplitude=5e3)
    r = din743.press_fit_seat(d=d, **rows, **common)
    for i in range(3):
        for j in range(4):
            rij = din743.press_fit_seat(d=float(d[i, 0]), **{k: float(v[j]) for k, v in rows.items()}, **common)
            for k, v in rij.items():
                assert np.shape(r[k]) == (3, 4), k
                assert r[k][i, j] == pytest.approx(float(v), rel=1e-13), k


# --- outputs=: only the named results, the same numbers as the full chain --------------------------------

def _seat_inputs(n, seed, k_v, d_B):
    """Every input of press_fit_seat as an n-long array (as in the test of every output above)."""
    rng = np.random.default_rng(seed)
    d = rng.uniform(3.0, 400.0, n)
    sB = rng.uniform(300.0, 1400.0, n)
    return dict(d=d, di=np.where(rng.uniform(size=n) < 0.5, 0.0, d * rng.uniform(0.0, 0.8, n)),
                sigma_B_dB=sB, sigma_S_dB=0.75 * sB, sigma_zdW_dB=0.4 * sB,
                sigma_bW_dB=rng.uniform(0.45, 0.55, n) * sB, tau_tW_dB=0.3 * sB, d_B=d_B,
                d_eff=np.where(rng.uniform(size=n) < 0.5, d, rng.uniform(3.0, 400.0, n)),
                rz_um=rng.uniform(0.2, 40.0, n), k_v=rng.uniform(1.0, 2.0, n) if k_v == "array" else k_v,
                moment_amplitude=rng.choice([0.0, -1.0, 1.0, 1.0, 1.0], n) * rng.uniform(1e3, 1e6, n),
                torque_mean=rng.uniform(-5e5, 5e5, n),
                torque_amplitude=rng.choice([0.0, 1.0, 1.0], n) * rng.uniform(1e3, 5e5, n),
                axial_mean=rng.uniform(-2e4, 2e4, n))


def _assert_same_as_full(r, full, names):
    # bit for bit: the chain runs the same operations whatever is asked for
    assert list(r) == [k for k in din743.OUTPUTS if k in set(names)]
    for k in r:
        assert np.shape(r[k]) == np.shape(full[k]), k
        assert np.array_equal(r[k], full[k]), k


SUBSETS = [din743.SAFETIES_AND_NOTCH_FACTORS, ("fatigue_safety",), ("static_safety",),
           ("fatigue_safety", "static_safety"), ("beta_sigma", "beta_tau"), ("beta_tau", "fatigue_safety"),
           ("static_safety", "K2", "sigma_zdm"), ("psi_zd", "sigma_mv"), ("K1_yield", "KF_tau", "tau_mv")]


@pytest.mark.parametrize("names", SUBSETS)
@pytest.mark.parametrize("case, group, d_B, k_v", [(2, "QT", 16.0, 1.0), (1, "case", 30.0, "array"),
                                                   (2, "structural", 16.0, 1.3)])
@pytest.mark.parametrize("chunk", [997, 10**6])
def test_outputs_subset_equals_the_full_chain(monkeypatch, names, case, group, d_B, k_v, chunk):
    monkeypatch.setattr(din743, "CHUNK", chunk)
    kw = _seat_inputs(3 * 997 + 1, 11, k_v, d_B)
    full = din743.press_fit_seat(**kw, group=group, mean_stress_case=case)
    r = din743.press_fit_seat(**kw, group=group, mean_stress_case=case, outputs=names)
    _assert_same_as_full(r, full, names)


@pytest.mark.parametrize("name", din743.OUTPUTS)
@pytest.mark.parametrize("chunk", [997, 10**6])
def test_each_output_alone_equals_the_full_chain(monkeypatch, name, chunk):
    monkeypatch.setattr(din743, "CHUNK", chunk)
    kw = _seat_inputs(3 * 997 + 1, 12, "array", 30.0)
    full = din743.press_fit_seat(**kw)
    _assert_same_as_full(din743.press_fit_seat(**kw, outputs=name), full, (name,))


_PROP_INPUTS = {(k_v, d_B): _seat_inputs(2 * 997 + 5, 13, k_v, d_B) for k_v in (1.0, "array") for d_B in (16.0, 30.0)}


@settings(max_examples=80, deadline=None)
@given(names=st.sets(st.sampled_from(din743.OUTPUTS), min_size=1), k_v=st.sampled_from([1.0, "array"]),
       d_B=st.sampled_from([16.0, 30.0]), case=st.sampled_from([1, 2]), chunk=st.sampled_from([997, 10**6]),
       defaults=st.booleans(), scalar_d=st.booleans())
def test_random_outputs_subset_equals_the_full_chain(names, k_v, d_B, case, chunk, defaults, scalar_d):
    kw = dict(_PROP_INPUTS[(k_v, d_B)])
    if defaults:  # DIN 743-3 ratios for the fatigue strengths, heat treated at the seat diameter
        kw.update(sigma_zdW_dB=None, sigma_bW_dB=None, tau_tW_dB=None, d_eff=None)
    if scalar_d:  # the tolerance-study form: geometry scalar, loads sampled
        kw.update(d=25.0, di=0.0, rz_um=4.0)
    saved = din743.CHUNK
    din743.CHUNK = chunk
    try:
        full = din743.press_fit_seat(**kw, mean_stress_case=case)
        r = din743.press_fit_seat(**kw, mean_stress_case=case, outputs=sorted(names))
    finally:
        din743.CHUNK = saved
    _assert_same_as_full(r, full, names)


def test_outputs_subset_with_scalar_and_differently_shaped_inputs():
    common = dict(sigma_B_dB=700.0, sigma_S_dB=490.0, moment_amplitude=1e4, torque_mean=2e4, torque_amplitude=5e3)
    full = din743.press_fit_seat(d=25.0, **common)
    r = din743.press_fit_seat(d=25.0, **common, outputs=din743.SAFETIES_AND_NOTCH_FACTORS)
    _assert_same_as_full(r, full, din743.SAFETIES_AND_NOTCH_FACTORS)
    assert all(np.ndim(v) == 0 for v in r.values())
    d = np.array([[12.0], [25.0], [60.0]])
    rows = dict(rz_um=np.array([0.5, 4.0, 16.0, 40.0]), axial_mean=np.array([0.0, 300.0, -900.0, 5e3]))
    full = din743.press_fit_seat(d=d, **rows, **common)
    r = din743.press_fit_seat(d=d, **rows, **common, outputs=("static_safety", "beta_tau"))
    _assert_same_as_full(r, full, ("static_safety", "beta_tau"))
    assert r["static_safety"].shape == (3, 4)


def test_outputs_duplicates_and_order_of_the_request():
    r = din743.press_fit_seat(**SEAT, moment_amplitude=1e4, outputs=["static_safety", "beta_sigma", "static_safety"])
    assert list(r) == ["beta_sigma", "static_safety"]


@pytest.mark.parametrize("bad, shown", [(("fatigue_safety", "fatigue_safty"), "fatigue_safty"),
                                        ("safety", "safety"), ((), "()"), (("K1", 3), "3"), (5, "5")])
def test_unknown_outputs_raise_input_error(bad, shown):
    with pytest.raises(InputError) as e:
        din743.press_fit_seat(**SEAT, moment_amplitude=1e4, outputs=bad)
    msg = str(e.value)
    assert msg.startswith("outputs: got") and shown in msg and "allowed:" in msg
    assert "fatigue_safety" in msg and "static_safety" in msg      # what is allowed
    assert isinstance(e.value, ValueError)


def test_unknown_output_suggests_the_name():
    with pytest.raises(InputError, match="did you mean 'fatigue_safety'"):
        din743.press_fit_seat(**SEAT, outputs=["fatigue_safty"])
