"""Tolerance study (fitcheck.study) against exact distributions and independent estimates.

Sources: ISO 286-2:2010 limit deviations (H7, s6, s7 over 18 up to 30 mm, from memory, cross-checked
with fitcheck.fits); Shigley, Mechanical Engineering Design, 10th ed., eq. (3-56) for the contact
pressure; the distribution of a sum of independent uniforms (triangular / trapezoidal) and of
normals; the Dvoretzky-Kiefer-Wolfowitz inequality (Massart 1990) for the sampling error of an
empirical CDF; Clopper & Pearson (1934); Melchers & Beck, Structural Reliability Analysis and
Prediction, 3rd ed. (2018), ch. 3-4.
"""

import math

import numpy as np
import pytest
from scipy import stats

from fitcheck import fits, materials
from fitcheck.core import reliability as rel
from fitcheck.errors import InputError, InputErrors
from fitcheck.pressfit import PressFitInput
from fitcheck.pressfit import evaluate as pf_evaluate
from fitcheck.study import StudySettings, run_study

# ISO 286-2:2010, over 18 up to 30 mm (from memory): H7 +21/0, s6 +48/+35, s7 +56/+35 [um]
H7 = (21.0, 0.0)
S6 = (48.0, 35.0)
S7 = (56.0, 35.0)


def _joint(fit="20 H7/s6", torque="12 N*m", **extra):
    m = {"name": "test-gear", "fit": fit, "length": "16 mm", "hub_outer_diameter": "40 mm",
         "shaft_material": "C45E", "hub_material": "C45E", "torque": torque, "mu_slip": 0.12}
    m.update(extra)
    return PressFitInput.from_mapping(m)


def _shigley_cp(d, Do, E, nu):
    """Contact pressure per mm of diametral interference, solid shaft, equal materials.

    Shigley, 10th ed., eq. (3-56) with delta = diametral/2 and R = d/2:
    p = delta_d / (d [ (1/E)((Do^2 + d^2)/(Do^2 - d^2) + nu) + (1/E)(1 - nu) ]).
    """
    return 1.0 / (d * ((1 / E) * ((Do**2 + d**2) / (Do**2 - d**2) + nu) + (1 / E) * (1 - nu)))


# deterministic except for the sizes: friction fixed, Rz fixed, temperatures as given
FIXED = dict(friction="constant", roughness_low=1.0, importance_samples=0)


def test_iso_limits_used_by_the_study():
    f = fits.fit("20 H7/s6")
    assert (f.hole.upper_um, f.hole.lower_um) == H7
    assert (f.shaft.upper_um, f.shaft.lower_um) == S6
    assert (fits.zone(20, "s7").upper_um, fits.zone(20, "s7").lower_um) == S7


def _check_cdf(dist, cdf, n, alpha=1e-6):
    """Percentiles and histogram of ``dist`` against the exact ``cdf`` within the DKW band."""
    eps = rel.dkw_epsilon(n, alpha) + 1.0 / n
    for q, v in dist.percentiles:
        assert abs(cdf(v) - q / 100.0) <= eps, (q, v, cdf(v))
    edges = np.asarray(dist.hist_edges)
    counts = np.asarray(dist.hist_counts)
    # the end bins also hold the clipped tails beyond the 0.01 % and 99.99 % points
    below = (dist.percentiles[0][0] / 100.0)
    cum = below + np.concatenate([[0.0], np.cumsum(counts)]) / n - below * (np.arange(61) > 0)
    inner = slice(1, 60)
    assert np.max(np.abs(cum[inner] - cdf(edges[inner]))) <= eps + below


def test_pressure_of_equal_width_zones_is_triangular():
    # H7/s7: hole and shaft zones both 21 um wide, uniform sizes -> interference triangular
    # on [ei - ES, es - EI] = [14, 56] um with its mode in the middle
    n = 200_000
    r = run_study(_joint("20 H7/s7"), samples=n, seed=4, **FIXED)
    c_p = _shigley_cp(20.0, 40.0, 210000.0, 0.3)  # Shigley eq. (3-56)
    loss = 0.8 * (4.0 + 6.3)                      # DIN 7190-1:2017 smoothing, default Rz 4 and 6.3 um
    lo_um, hi_um = S7[1] - H7[0], S7[0] - H7[1]
    tri = stats.triang(0.5, loc=lo_um, scale=hi_um - lo_um)
    _check_cdf(r.distribution("pressure_min"), lambda p: tri.cdf(np.asarray(p) / c_p * 1e3 + loss), n)
    # the same pressure distribution at the tightest condition (no temperature, no speed)
    assert r.distribution("pressure_max").percentile(50.0) == pytest.approx(
        r.distribution("pressure_min").percentile(50.0), rel=1e-6)


def test_pressure_of_unequal_zones_is_trapezoidal():
    # H7/s6: widths 21 and 13 um; the sum of two uniforms has a trapezoidal density rising over
    # the narrower width, flat, then falling: scipy.stats.trapezoid(c, d, loc, scale)
    n = 200_000
    r = run_study(_joint("20 H7/s6"), samples=n, seed=5, **FIXED)
    c_p = _shigley_cp(20.0, 40.0, 210000.0, 0.3)
    loss = 0.8 * (4.0 + 6.3)
    w_h, w_s = H7[0] - H7[1], S6[0] - S6[1]
    lo_um = S6[1] - H7[0]
    trap = stats.trapezoid(min(w_h, w_s) / (w_h + w_s), max(w_h, w_s) / (w_h + w_s), loc=lo_um,
                           scale=w_h + w_s)
    _check_cdf(r.distribution("pressure_min"), lambda p: trap.cdf(np.asarray(p) / c_p * 1e3 + loss), n)
    # torque capacity T = p pi d^2 L mu / 2 (Shigley 10th ed., sec. 7-8): a linear image of p
    k = math.pi * 20.0**2 * 16.0 * 0.12 / 2.0 * 1e-3  # N*m per MPa
    _check_cdf(r.distribution("torque_capacity"),
               lambda t: trap.cdf(np.asarray(t) / k / c_p * 1e3 + loss), n)


def test_normal_sizes_from_capability_give_a_normal_pressure():
    # sizes normal with sigma = T/(6 Cp), mean shifted by 3 sigma (Cp - Cpk) toward least material;
    # not truncated (inspected = False): interference normal, mean mu_s - mu_h, var s_s^2 + s_h^2
    n = 100_000
    cp, cpk = 1.0, 0.8
    r = run_study(_joint("20 H7/s6"), samples=n, seed=6, sizes="normal", cp=cp, cpk=cpk,
                  inspected=False, **FIXED)
    sig_h, sig_s = (H7[0] - H7[1]) / 6 / cp, (S6[0] - S6[1]) / 6 / cp
    mu_h = 0.5 * sum(H7) + 3 * sig_h * (cp - cpk)   # the bore at least material is larger
    mu_s = 0.5 * sum(S6) - 3 * sig_s * (cp - cpk)   # the shaft at least material is smaller
    c_p = _shigley_cp(20.0, 40.0, 210000.0, 0.3)
    loss = 0.8 * (4.0 + 6.3)
    nd = stats.norm(mu_s - mu_h - loss, math.hypot(sig_h, sig_s))
    d = r.distribution("pressure_min")
    # a clearance (p clipped to 0) carries the mass nd.cdf(0) ~ 1e-6 at p = 0, where the CDF of
    # the clipped pressure equals nd.cdf(0) as well: the normal CDF holds for every p >= 0
    assert nd.cdf(0.0) < 1e-4
    _check_cdf(d, lambda p: nd.cdf(np.asarray(p) / c_p * 1e3), n)


def test_inspected_lot_stays_inside_the_zones():
    r = run_study(_joint("20 H7/s6"), samples=50_000, seed=7, sizes="normal", cp=0.7, cpk=0.5,
                  **FIXED)
    c_p = _shigley_cp(20.0, 40.0, 210000.0, 0.3)
    loss = 0.8 * (4.0 + 6.3)
    d = r.distribution("pressure_min")
    assert d.min >= c_p * ((S6[1] - H7[0]) - loss) * 1e-3 * (1 - 1e-6)
    assert d.max <= c_p * ((S6[0] - H7[1]) - loss) * 1e-3 * (1 + 1e-6)


# ----------------------------------------------------------------------------- probabilities


def _linear_normal_joint():
    """Sizes normal (untruncated), everything else fixed: slip safety linear in a normal."""
    return _joint("20 H7/s6", torque="7 N*m")


def test_slip_probability_exact_linear_normal():
    # slip when c_p (delta - loss) pi d L mu / (2T/d) < 1 with delta normal: P = Phi(-beta)
    inp = _linear_normal_joint()
    cp = 0.6
    r = run_study(inp, samples=2000, seed=8, sizes="normal", cp=cp, cpk=cp, inspected=False,
                  friction="constant", roughness_low=1.0, importance_samples=20_000)
    c_p = _shigley_cp(20.0, 40.0, 210000.0, 0.3)
    loss = 0.8 * (4.0 + 6.3) * 1e-3
    d_needed = (2 * 7000.0 / 20.0) / (c_p * math.pi * 20.0 * 16.0 * 0.12) + loss  # [mm]
    mean = (0.5 * sum(S6) - 0.5 * sum(H7)) * 1e-3
    sd = math.hypot((H7[0] - H7[1]) / 6 / cp, (S6[0] - S6[1]) / 6 / cp) * 1e-3
    beta = (mean - d_needed) / sd
    exact = stats.norm.sf(beta)
    assert 1e-6 < exact < 1e-3  # a small probability, far beyond 2000 plain samples
    assert r.slip.form.converged
    assert r.slip.form.beta == pytest.approx(beta, rel=1e-5)
    imp = r.slip.importance
    assert abs(imp.p - exact) < 4 * imp.se
    assert imp.rel_err < 0.05
    assert r.slip.best.method == "importance"


def test_importance_sampling_agrees_with_plain_where_affordable():
    # a joint with P(slip) of a few 1e-3: 400 000 plain samples resolve it to about 3 %
    inp = _joint("20 H7/r6", torque="8 N*m")
    r = run_study(inp, samples=400_000, seed=9, temperature_min=-20.0, temperature_max=80.0,
                  importance_samples=30_000)
    plain, imp = r.slip.plain, r.slip.importance
    assert 1e-3 < plain.p < 2e-2, plain
    assert imp is not None and r.slip.form.converged
    assert abs(plain.p - imp.p) < 4 * math.hypot(plain.se, imp.se)
    # the Clopper-Pearson interval of the plain estimate equals scipy's exact binomial interval
    ci = stats.binomtest(plain.failures, plain.n).proportion_ci(0.95, method="exact")
    assert (plain.lo, plain.hi) == pytest.approx((ci.low, ci.high), rel=1e-7)


def test_target_verdict_and_sample_count():
    inp = _joint("20 H7/r6", torque="8 N*m")
    r = run_study(inp, samples=20_000, seed=10, temperature_min=-20.0, temperature_max=80.0,
                  target=1e-4, rel_err=0.1)
    slip = next(t for t in r.targets if t.mode == "slip")
    # Melchers & Beck (2018) sec. 3.3: n = z^2 (1 - p) / (delta^2 p) for a half-width delta p
    z = stats.norm.ppf(0.975)
    assert slip.plain_samples_at_target == pytest.approx(z**2 * (1 - 1e-4) / (0.01 * 1e-4), abs=1)
    assert slip.met == (slip.upper <= 1e-4)
    assert not r.ok  # a probability of about 5e-3 misses 1e-4
    assert [c.name for c in r.checks] == ["P(slip) upper 95% limit", "P(yield) upper 95% limit"]


def test_yield_out_of_reach_is_zero_with_bounded_inputs():
    # with bounded inputs and a hub that stays elastic at every corner, P(yield) = 0 exactly
    r = run_study(_joint("20 H7/s6"), samples=5000, seed=1, target=1e-4)
    assert r.worst_case.hub_yield_safety > 1.0
    assert r.yield_.best.method == "bounds"
    assert r.yield_.best.p == 0.0 and r.yield_.plain.failures == 0


def test_yield_probability_when_the_fit_is_too_tight():
    # a thin steel hub on x6: the tightest joints yield; plain and importance estimates agree
    inp = _joint("20 H7/x6", hub_outer_diameter="26 mm")
    r = run_study(inp, samples=200_000, seed=12, importance_samples=20_000)
    plain, imp = r.yield_.plain, r.yield_.importance
    assert r.worst_case.hub_yield_safety < 1.0
    assert 0.01 < plain.p < 0.5
    assert imp is not None
    assert abs(plain.p - imp.p) < 4 * math.hypot(plain.se, imp.se)
    # friction does not enter the stresses: the design point has no friction component
    assert r.yield_.form.u_star[2] == pytest.approx(0.0, abs=1e-6)


# ----------------------------------------------------------------------------- reproducibility


def test_seeded_study_is_reproducible_and_chunk_independent():
    inp = _joint("20 H7/r6", torque="8 N*m")
    kw = dict(samples=30_001, seed=3, temperature_min=-20.0, temperature_max=80.0,
              importance_samples=5_000)
    a = run_study(inp, chunk=30_001, **kw)
    b = run_study(inp, chunk=1_000, **kw)
    c = run_study(inp, chunk=30_001, **kw)
    d = run_study(inp, chunk=30_001, **{**kw, "seed": 4})
    assert a.distributions == b.distributions == c.distributions
    assert a.slip.plain == b.slip.plain
    assert a.slip.importance.p == pytest.approx(b.slip.importance.p, rel=1e-12)
    assert a.slip.importance == c.slip.importance
    assert a.distributions != d.distributions


def test_worst_case_is_the_pressfit_result():
    inp = _joint("20 H7/s6")
    r = run_study(inp, samples=1000, seed=0, importance_samples=0)
    assert r.worst_case.to_json() == pf_evaluate(inp).to_json()
    assert r.ok == pf_evaluate(inp).ok  # no target: the verdict is the worst case


def test_study_percentiles_bracket_worst_case():
    # the sampled torque capacity never falls below the worst case at the loosest fit when
    # roughness and friction are fixed at their design values and the temperature as given
    inp = _joint("20 H7/s6")
    r = run_study(inp, samples=50_000, seed=2, **FIXED)
    w = r.worst_case
    d = r.distribution("torque_capacity")
    assert d.min >= w.torque_capacity_min * 1e-3 * (1 - 1e-6)
    assert r.distribution("hub_stress").max <= w.hub_stress_max * (1 + 1e-6)


def test_json_is_complete():
    r = run_study(_joint(), samples=2000, seed=0)
    j = r.to_json()
    for key in ("settings", "variables", "distributions", "slip", "yield", "worst_case", "checks",
                "caution"):
        assert key in j
    assert j["slip"]["plain"]["n"] == 2000


# ----------------------------------------------------------------------------- bad input


def test_bad_settings_are_input_errors():
    with pytest.raises(InputError, match="samples"):
        StudySettings.from_mapping({"samples": "many"})
    with pytest.raises(InputError, match="did you mean 'samples'"):
        StudySettings.from_mapping({"sampels": 1000})
    with pytest.raises(InputError, match="cpk"):
        StudySettings.from_mapping({"cp": 1.0, "cpk": 1.5})
    with pytest.raises(InputError, match="temperature_max"):
        StudySettings.from_mapping({"temperature_min": "-10 degC"})
    with pytest.raises(InputErrors):
        StudySettings.from_mapping({"sizes": "gaussian", "shift": "up", "target": 2.0})
    with pytest.raises(InputError, match="did you mean 'normal'"):
        StudySettings(sizes="normall").validate()


def test_bad_joint_and_override_are_input_errors():
    with pytest.raises(InputError, match="PressFitInput"):
        run_study({"fit": "20 H7/s6"})
    with pytest.raises(InputError, match="did you mean 'seed'"):
        run_study(_joint(), seeed=3)
    with pytest.raises(InputError, match="samples"):
        run_study(_joint(), samples=10)


def test_material_table_values_used():
    m = materials.get("C45E")
    assert (m.E, m.nu) == (210000.0, 0.3)  # the values _shigley_cp is given above


def test_loss_of_pressure_without_load_exact_trapezoid():
    # H7/n6 at 20 mm: ISO 286-2:2010 n6 over 18 up to 30 mm +28/+15 um (from memory); with no load,
    # "slip" is the loss of all contact pressure, delta <= smoothing loss, delta trapezoidal
    n6 = (28.0, 15.0)
    assert (fits.zone(20, "n6").upper_um, fits.zone(20, "n6").lower_um) == n6
    n = 200_000
    r = run_study(_joint("20 H7/n6", torque="0 N*m"), samples=n, seed=13, **FIXED)
    loss = 0.8 * (4.0 + 6.3)
    w_h, w_s = H7[0] - H7[1], n6[0] - n6[1]
    trap = stats.trapezoid(min(w_h, w_s) / (w_h + w_s), max(w_h, w_s) / (w_h + w_s),
                           loc=n6[1] - H7[0], scale=w_h + w_s)
    exact = trap.cdf(loss)
    assert 0.05 < exact < 0.5
    lo, hi = rel.clopper_pearson(r.slip.plain.failures, n, 0.999)
    assert lo < exact < hi
    assert r.slip.definition.startswith("no contact pressure")
