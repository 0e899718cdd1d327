"""Statistics kernels of fitcheck.core.reliability against exact results and scipy.

Sources: Clopper & Pearson (1934) for the exact binomial interval (cross-checked with
scipy.stats.binomtest); Hasofer & Lind (1974) and Melchers & Beck, Structural Reliability
Analysis and Prediction, 3rd ed. (2018), ch. 3-4 for FORM and importance sampling; the
linear-normal limit state, whose failure probability is exactly Phi(-beta).
"""

import math

import numpy as np
import pytest
from hypothesis import given, settings
from hypothesis import strategies as st
from scipy import integrate, stats

from fitcheck.core import reliability as rel

# ----------------------------------------------------------------------------- Clopper-Pearson


@pytest.mark.parametrize("k,n", [(0, 10), (1, 10), (5, 10), (10, 10), (3, 1000), (0, 10**6),
                                 (17, 2 * 10**5)])
@pytest.mark.parametrize("conf", [0.9, 0.95, 0.99])
def test_clopper_pearson_equals_scipy_binomtest(k, n, conf):
    # independent solution: scipy.stats.binomtest(...).proportion_ci(method="exact")
    ci = stats.binomtest(k, n).proportion_ci(confidence_level=conf, method="exact")
    lo, hi = rel.clopper_pearson(k, n, conf)
    assert lo == pytest.approx(ci.low, rel=1e-7, abs=1e-300)
    assert hi == pytest.approx(ci.high, rel=1e-7)


def test_clopper_pearson_zero_failures_closed_form():
    # Clopper & Pearson (1934): for k = 0 the upper limit solves (1 - p)^n = alpha/2
    n, conf = 5000, 0.95
    lo, hi = rel.clopper_pearson(0, n, conf)
    assert lo == 0.0
    assert hi == pytest.approx(1 - 0.025 ** (1 / n), rel=1e-10)


def test_clopper_pearson_vectorised():
    lo, hi = rel.clopper_pearson(np.array([0, 2, 9]), np.array([9, 9, 9]))
    assert lo.shape == hi.shape == (3,)
    assert lo[0] == 0 and hi[2] == 1 and lo[1] < 2 / 9 < hi[1]


# ----------------------------------------------------------------------------- sample counts


@pytest.mark.parametrize("p", [1e-2, 1e-4, 1e-6])
@pytest.mark.parametrize("delta", [0.05, 0.2])
def test_plain_samples_needed_meets_relative_error(p, delta):
    # Melchers & Beck (2018) sec. 3.3: Var(p_hat) = p(1 - p)/n
    n = rel.plain_samples_needed(p, delta, None)
    assert math.sqrt(p * (1 - p) / n) / p <= delta
    assert math.sqrt(p * (1 - p) / (n - 1)) / p > delta * (1 - 1e-9)  # the smallest such n
    z = stats.norm.ppf(0.975)
    n95 = rel.plain_samples_needed(p, delta, 0.95)
    assert z * math.sqrt(p * (1 - p) / n95) <= delta * p * (1 + 1e-12)


def test_plain_samples_needed_rejects_bad_input():
    with pytest.raises(ValueError):
        rel.plain_samples_needed(0.0, 0.1)
    with pytest.raises(ValueError):
        rel.plain_samples_needed(1e-3, 0.0)


# ----------------------------------------------------------------------------- marginals


@pytest.mark.parametrize("m", [
    rel.Marginal("uniform", -3.0, 11.0),
    rel.Marginal("normal", 0.12, 0.015),
    rel.Marginal("truncnormal", 5.0, 2.0, 1.0, 12.0),
    rel.Marginal("truncnormal", 0.0, 1.0, -1.0, 0.5),
    rel.Marginal("lognormal", 0.12, 0.2),
])
def test_marginal_transform_matches_scipy_ppf(m):
    # independent solution: scipy.stats ppf at Phi(u)
    u = np.linspace(-4.0, 4.0, 41)
    assert np.allclose(m.from_u(u), m.frozen.ppf(stats.norm.cdf(u)), rtol=1e-9, atol=1e-12)


def test_lognormal_cov_is_the_given_one():
    # E and Var of a lognormal: mean = m exp(s^2/2), cov^2 = exp(s^2) - 1
    m = rel.Marginal("lognormal", 0.1, 0.25)
    assert m.std / m.mean == pytest.approx(0.25, rel=1e-12)


def test_marginal_bad_parameters():
    with pytest.raises(ValueError):
        rel.Marginal("uniform", 2.0, 1.0)
    with pytest.raises(ValueError):
        rel.Marginal("normal", 0.0, -1.0)
    with pytest.raises(ValueError):
        rel.Marginal("weibull", 1.0, 1.0)


@given(lo=st.floats(-50, 50), width=st.floats(0.5, 60), cp=st.floats(0.3, 3.0),
       frac=st.floats(0.01, 1.0), toward=st.sampled_from(["least_material", "max_material"]),
       feature=st.sampled_from(["shaft", "hole"]))
@settings(max_examples=60, deadline=None)
def test_capability_normal_reproduces_cp_and_cpk(lo, width, cp, frac, toward, feature):
    # ISO 22514-2 definitions (from memory): Cp = T/(6 sigma), Cpk = min(U - mu, mu - L)/(3 sigma)
    up = lo + width
    cpk = frac * cp
    mu, sd = rel.normal_from_capability(lo, up, cp, cpk, toward, feature)
    assert width / (6 * sd) == pytest.approx(cp, rel=1e-9)
    assert min(up - mu, mu - lo) / (3 * sd) == pytest.approx(cpk, rel=1e-9, abs=1e-9)
    centre = 0.5 * (lo + up)
    tighter = (mu > centre) if feature == "shaft" else (mu < centre)
    if cpk < cp * (1 - 1e-9):
        assert tighter == (toward == "max_material")


# ----------------------------------------------------------------------------- FORM


def test_form_linear_normal_is_exact():
    # linear limit state g = beta - a.u with |a| = 1: P = Phi(-beta) exactly (Hasofer & Lind 1974)
    a = np.array([0.6, -0.48, 0.64])
    r = rel.form(lambda u: 3.7 - u @ a, 3)
    assert r.converged
    assert r.beta == pytest.approx(3.7, rel=1e-6)
    assert r.p == pytest.approx(stats.norm.sf(3.7), rel=1e-5)
    assert np.allclose(r.alpha, a, atol=1e-5)


def test_form_curved_limit_state_design_point():
    # g = b - u1 + k u2^2 with k < 1/(2b): the nearest point of g = 0 is (b, 0), so beta = b
    # (geometry of the parabola: distance^2 = (b + k t^2)^2 + t^2 grows with t)
    r = rel.form(lambda u: 2.5 - u[:, 0] + 0.1 * u[:, 1] ** 2, 2, u0=[0.3, 0.7])
    assert r.converged
    assert r.beta == pytest.approx(2.5, rel=1e-5)
    assert abs(r.u_star[1]) < 1e-3


def test_form_negative_beta_when_median_fails():
    r = rel.form(lambda u: -1.0 + u[:, 0], 1)
    assert r.beta == pytest.approx(-1.0, rel=1e-6)
    assert r.p == pytest.approx(stats.norm.cdf(1.0), rel=1e-6)


# ----------------------------------------------------------------------------- sampling


def _resistance_load(u):
    """R lognormal (median 10, cov 0.1), S normal (6, 1): g = R - S."""
    r = rel.marginal_from_u(u[:, 0], "lognormal", 10.0, 0.1)
    s = rel.marginal_from_u(u[:, 1], "normal", 6.0, 1.0)
    return r - s


def _exact_resistance_load():
    # independent numerical solution: P(R <= S) = integral of F_R(s) f_S(s) ds (scipy.integrate.quad)
    fr = stats.lognorm(math.sqrt(math.log1p(0.01)), scale=10.0)
    val, _ = integrate.quad(lambda s: fr.cdf(s) * stats.norm.pdf(s, 6.0, 1.0), 0.0, 20.0,
                            epsabs=1e-14, epsrel=1e-10, limit=200)
    return val


def test_importance_sampling_exact_linear_normal_small_probability():
    # linear-normal limit state: P = Phi(-4.5) = 3.4e-6, far below what plain sampling reaches
    a = np.array([0.8, 0.6])
    g = lambda u: 4.5 - u @ a  # noqa: E731
    f = rel.form(g, 2)
    e = rel.importance_sampling(g, 2, f.u_star, 40_000, np.random.default_rng(11))
    exact = stats.norm.sf(4.5)
    assert e.rel_err < 0.03
    assert abs(e.p - exact) < 4 * e.se
    assert e.lo < exact < e.hi or abs(e.p - exact) < 3 * e.se


def test_importance_sampling_against_exact_integral_non_normal():
    exact = _exact_resistance_load()  # about 1.6e-3
    assert 1e-4 < exact < 1e-2
    f = rel.form(_resistance_load, 2)
    e = rel.importance_sampling(_resistance_load, 2, f.u_star, 50_000, np.random.default_rng(5))
    assert abs(e.p - exact) < 4 * e.se
    assert e.rel_err < 0.03
    # FORM itself is close for this mildly curved limit state
    assert f.p == pytest.approx(exact, rel=0.15)


def test_importance_sampling_against_plain_sampling_where_affordable():
    exact = _exact_resistance_load()
    rng = np.random.default_rng(123)
    plain = rel.plain_sampling(_resistance_load, 2, 2_000_000, rng)
    f = rel.form(_resistance_load, 2)
    imp = rel.importance_sampling(_resistance_load, 2, f.u_star, 50_000, rng)
    assert abs(plain.p - imp.p) < 4 * math.hypot(plain.se, imp.se)
    assert plain.lo < exact < plain.hi or abs(plain.p - exact) < 3 * plain.se
    assert imp.rel_err < plain.rel_err  # 40x fewer samples, still the smaller error


def test_plain_sampling_seeded_reproducible_and_chunk_independent():
    g = lambda u: 2.0 - u[:, 0] - 0.3 * u[:, 1]  # noqa: E731
    a = rel.plain_sampling(g, 2, 100_001, np.random.default_rng(7), chunk=100_001)
    b = rel.plain_sampling(g, 2, 100_001, np.random.default_rng(7), chunk=977)
    c = rel.plain_sampling(g, 2, 100_001, np.random.default_rng(8))
    assert a == b
    assert a.failures != c.failures or a.p != c.p or a == c  # a different seed is a different draw
    assert rel.plain_sampling(g, 2, 100_001, np.random.default_rng(7)) == a


def test_importance_sampling_chunk_independent():
    g = lambda u: 3.0 - u[:, 0]  # noqa: E731
    a = rel.importance_sampling(g, 1, [3.0], 30_000, np.random.default_rng(3), chunk=30_000)
    b = rel.importance_sampling(g, 1, [3.0], 30_000, np.random.default_rng(3), chunk=1_001)
    assert a.failures == b.failures
    assert a.p == pytest.approx(b.p, rel=1e-12)
    assert a.se == pytest.approx(b.se, rel=1e-9)


def test_dkw_band_holds_for_uniform_sample():
    # Massart (1990): P(sup |F_n - F| > eps) <= 2 exp(-2 n eps^2); with alpha = 1e-6 this holds
    n = 20_000
    x = np.sort(np.random.default_rng(99).random(n))
    i = np.arange(1, n + 1)
    dmax = max(np.max(i / n - x), np.max(x - (i - 1) / n))
    assert dmax < rel.dkw_epsilon(n, 1e-6)
    assert rel.dkw_epsilon(n, 1e-6) == pytest.approx(math.sqrt(math.log(2e6) / (2 * n)))
