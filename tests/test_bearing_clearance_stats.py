"""Bearing clearance by probable combination: mean verdict, probable range, σ, P, every state.

Sources beside each check; the hand calculation is written out.
"""

from __future__ import annotations

import math
import warnings

import numpy as np
import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

from fitcheck import bearings
from fitcheck.core import clearance_stats as cs
from fitcheck.core import reliability as rel
from fitcheck.errors import MethodRangeWarning


def seat(**kw):
    m = {"designation": "6204", "shaft": "k5", "housing": "H7", **kw}
    with warnings.catch_warnings():
        warnings.simplefilter("ignore", MethodRangeWarning)
        return bearings.evaluate(bearings.BearingSeatInput.from_mapping(m))


def test_6204_k5_H7_group_N_by_hand():
    """6204 (d 20, D 47) on k5 in H7, steel housing, equal temperatures, group N.

    * ISO 492:2014 Normal: bore 0/−10 um, OD 0/−11 um; ISO 286-2:2010: k5 at 18–30 mm +2/+11 um,
      H7 at 30–50 mm 0/+25 um; ISO 5753-1:2009 group N over 18 up to 24 mm: 5…20 um # from memory.
    * Mean interference of the inner seat 6.5 − (−5) = 11.5 um, smoothing 0.8·(2.5 + 1.6) = 3.28 um
      (DIN 7190-1:2017, 6.2) -> 8.22 um; the outer seat is a clearance (−5.5 − 12.5 = −18 um).
    * Raceway growth per um of effective interference (Shigley 10th ed. eq. (3-56), ring as a hub of
      outer diameter d_ie = d + (D − d)/4 = 26.75 mm): k = 2·d·d_ie/(E_r(d_ie² − d²)) / [d·K].
    * Mean clearance 12.5 − k·8.22; maximum probable interference 11.5 + ½·√(10² + 9²) = 18.23 um
      (probable-interference rule; RSS); σ = √((15/6)² + k²((10/6)² + (9/6)²)) (±3σ normal bands);
      P(G < 0) = Φ(−mean/σ).
    Issue figures: mean ≈ +6.3 um (passes), ≈ +1.3 um at max. probable interference, σ ≈ 3 um, P ≈ 2 %.
    """
    d, d_ie, E_r, E_s, nu = 20.0, 26.75, 208000.0, 210000.0, 0.3
    K = ((d_ie**2 + d**2) / (d_ie**2 - d**2) + nu) / E_r + (1 - nu) / E_s
    k = 2 * d * d_ie / (E_r * (d_ie**2 - d**2)) / (d * K) * d
    s = 0.8 * (2.5 + 1.6)
    mean = 12.5 - k * (11.5 - s)
    u_p = 11.5 + 0.5 * math.hypot(10, 9)
    prob = 12.5 - k * (u_p - s)
    sigma = math.sqrt((15 / 6) ** 2 + k**2 * ((10 / 6) ** 2 + (9 / 6) ** 2))
    p = 0.5 * math.erfc(mean / sigma / math.sqrt(2))
    assert mean == pytest.approx(6.3, abs=0.1) and prob == pytest.approx(1.3, abs=0.1)
    assert sigma == pytest.approx(3.0, abs=0.05) and p == pytest.approx(0.02, abs=0.005)

    r = seat()
    assert r.clearance_mean_um == pytest.approx(mean, rel=1e-9)
    assert r.clearance_probable_min_um == pytest.approx(prob, rel=1e-9)
    # quantile integration of the seat term: the smoothing kink lies 3.7σ below the mean
    assert r.clearance_sigma_um == pytest.approx(sigma, rel=2e-3)
    assert r.clearance_probability_below == pytest.approx(p, rel=2e-2)
    assert r.ok and r.checks[0].passed and r.checks[0].value == r.clearance_mean_um
    assert r.clearance_worst_case_um < 0  # the arithmetic worst case stays visible as information
    assert "worst case" in r.checks[0].note and "P(clearance < 0 um)" in r.checks[0].note
    assert not any("slight preload" in n for n in r.notes)  # the probable minimum 1.3 um >= 0
    assert r.headline.startswith("Holds")


def test_probable_minimum_below_the_limit_says_what_to_do():
    r = seat(clearance_min="2 um")  # probable minimum 1.3 um < 2 um, the mean 6.3 um passes
    assert r.ok
    assert any("slight preload" in n and "choose C3" in n for n in r.notes)


@pytest.mark.parametrize("series", ["60", "62"])
def test_recommended_normal_load_seats_pass_in_group_N(series):
    """DIN 5425-1 recommended seats (data/bearing_seats.csv), steel housing, equal temperatures."""
    failing = []
    for des in bearings.designations():
        b = bearings.bearing(des)
        if b.series != series or b.kind != "deep_groove_ball" or b.d < 10:
            continue
        try:
            r = seat(designation=des, shaft="auto", housing="auto", load_level="normal")
        except Exception as exc:  # outside the recommendation table
            if "recommendation" in str(exc):
                continue
            raise
        c = r.checks[0]
        if not c.passed:
            failing.append((des, c.value))
    assert not failing


def test_cold_aluminium_housing_tightens_the_outer_ring():
    """At −10 °C an aluminium housing (α 23.4e-6/K) shrinks onto the steel ring (11.5e-6/K):
    ΔU = D·(α_r − α_h)·(−30 K) = 47·(11.5 − 23.4)e-6·(−30)·1e3 = +16.8 um (DIN 7190-1:2017, 6.4)."""
    warm = seat(housing_material="EN AW-6082-T6")
    cold = seat(housing_material="EN AW-6082-T6", temperature_min="-10 degC")
    st = {x["state"]: x for x in cold.clearance_states}
    c = next(v for k, v in st.items() if k.startswith("lowest ambient -10"))
    m = next(v for k, v in st.items() if k.startswith("mounted"))
    assert c["worst_min"] < m["worst_min"] and c["probable_min"] < m["probable_min"]
    assert c["p_below"] > m["p_below"] and c["distribution_mean"] < m["distribution_mean"]
    assert cold.clearance_state.startswith("lowest ambient -10")
    assert cold.clearance_probability_below > warm.clearance_probability_below
    dU = 47.0 * (11.5e-6 - 23.4e-6) * (-30.0) * 1e3
    assert dU == pytest.approx(16.78, abs=0.005)


def _monte_carlo(group, bore, shaft, od, hous, kw, n, seed, distribution="normal"):
    """The lot-study engine's marginals (fitcheck.core.reliability) sampled and put through the
    same clearance model."""
    rng = np.random.default_rng(seed)

    def draw(lo, hi):
        if distribution == "normal":
            m = rel.Marginal("normal", 0.5 * (lo + hi), (hi - lo) / 6.0)
        else:
            m = rel.Marginal("uniform", lo, hi)
        return m.from_u(rng.standard_normal(n))
    g0 = draw(*group)
    ui = draw(*shaft) - draw(*bore)
    uo = draw(*od) - draw(*hous)
    return cs.clearance(g0, ui, uo, **kw)


@pytest.mark.parametrize("dt_outer,distribution", [(0.0, "normal"), (16.8, "normal"), (16.8, "uniform"),
                                                   (0.0, "uniform")])
def test_distribution_agrees_with_monte_carlo(dt_outer, distribution):
    kw = dict(s_inner=3.28, s_outer=6.32, dt_inner=0.0, dt_outer=dt_outer, k_inner=0.7475, k_outer=0.52)
    tol = dict(group=(5, 20), bore=(-10, 0), shaft=(2, 11), od=(-11, 0), hous=(0, 25))
    r = cs.probable_clearance(tol["group"], tol["bore"], tol["shaft"], tol["od"], tol["hous"], **kw,
                              required_um=0.0, distribution=distribution)
    n = 200_000
    g = _monte_carlo(**tol, kw=kw, n=n, seed=11, distribution=distribution)
    se = g.std() / math.sqrt(n)
    assert r["distribution_mean"] == pytest.approx(g.mean(), abs=5 * se + 0.01)
    assert r["sigma"] == pytest.approx(g.std(), rel=0.01)
    k = int((g < 0).sum())
    lo, hi = rel.clopper_pearson(k, n, 0.999)
    assert lo - 1e-3 <= r["p_below"] <= hi + 1e-3


def test_uniform_option_and_deviation_labels():
    r = seat(clearance_distribution="uniform")
    assert r.clearance_distribution == "uniform" and r.clearance_sigma_um > seat().clearance_sigma_um
    rows = bearings.summary_rows(r)
    assert rows[0][0].endswith("lower / upper") and rows[0][1:3] == ["-10", "0"]
    with pytest.raises(Exception, match="normal"):
        bearings.BearingSeatInput.from_mapping({"designation": "6204", "clearance_distribution": "gauss"})


def test_conditions_temperature_min_reaches_bearing_seats(tmp_path):
    from fitcheck import case as case_mod

    p = tmp_path / "c.toml"
    p.write_text('format_version = 1\n[conditions]\ntemperature_min = "-10 degC"\n\n[[bearing]]\n'
                 'name = "b"\ndesignation = "6204"\nshaft = "k5"\nhousing = "H7"\nhousing_material = "EN AW-6082-T6"\n')
    dc = case_mod.load(p)
    assert dc.bearings[0].temperature_min == -10.0


@settings(max_examples=8, deadline=None)
@given(t_bore=st.floats(5, 20), t_shaft=st.floats(5, 25), up_shaft=st.floats(-10, 30),
       t_od=st.floats(5, 20), t_hous=st.floats(10, 40), lo_hous=st.floats(-30, 10),
       dt_o=st.floats(-10, 25), dt_i=st.floats(-10, 10), distribution=st.sampled_from(["normal", "uniform"]),
       seed=st.integers(0, 2**31))
def test_distribution_agrees_with_monte_carlo_property(t_bore, t_shaft, up_shaft, t_od, t_hous, lo_hous,
                                                       dt_o, dt_i, distribution, seed):
    """Quantile integration against a Monte Carlo of the same marginals (lot-study engine), any bands."""
    kw = dict(s_inner=3.28, s_outer=6.32, dt_inner=dt_i, dt_outer=dt_o, k_inner=0.75, k_outer=0.55)
    tol = dict(group=(5, 20), bore=(-t_bore, 0), shaft=(up_shaft - t_shaft, up_shaft), od=(-t_od, 0),
               hous=(lo_hous, lo_hous + t_hous))
    r = cs.probable_clearance(tol["group"], tol["bore"], tol["shaft"], tol["od"], tol["hous"], **kw,
                              distribution=distribution)
    n = 100_000
    g = _monte_carlo(**tol, kw=kw, n=n, seed=seed, distribution=distribution)
    se = g.std() / math.sqrt(n)
    assert r["distribution_mean"] == pytest.approx(g.mean(), abs=5 * se + 0.02)
    assert r["sigma"] == pytest.approx(g.std(), rel=0.015, abs=0.02)
    lo, hi = rel.clopper_pearson(int((g < 0).sum()), n, 0.999)
    assert lo - 2e-3 <= r["p_below"] <= hi + 2e-3
