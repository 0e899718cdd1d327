"""Elastic-plastic design of press fits: kernel properties and the `design` key of [[pressfit]].

Equations: DIN 7190-1:2017, elastic-plastic hub (forms from memory, derived in
fitcheck.core.elastoplastic); the numerical check is tests/validation/test_elastoplastic_numerical.py.
"""

import json
import math
import warnings

import numpy as np
import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

from fitcheck.core import elastoplastic as ep
from fitcheck.core import pressfit as core
from fitcheck.errors import FitcheckError
from fitcheck.pressfit import PressFitInput, evaluate

ALU_GEAR = {"name": "alu gear", "interference_min": "90 um", "interference_max": "140 um",
            "diameter": "20 mm", "length": "12 mm", "hub_outer_diameter": "30 mm",
            "shaft_material": "C45E", "hub_material": "EN AW-6082-T6", "torque": "15 N*m"}


def _eval(mapping):
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        return evaluate(PressFitInput.from_mapping(mapping))


@settings(max_examples=150, deadline=None)
@given(qa=st.floats(0.05, 0.95), qi=st.floats(0.0, 0.8), Re=st.floats(50.0, 1200.0),
       Eh=st.sampled_from([45000.0, 70000.0, 110000.0, 210000.0]), nuh=st.floats(0.25, 0.42),
       Es=st.sampled_from([70000.0, 210000.0, 600000.0]))
def test_pressure_is_monotone_in_the_interference(qa, qi, Re, Eh, nuh, Es):
    d = 30.0
    args = (d, qi * d, d / qa, Es, 0.3, Eh, nuh, Re)
    top = 1.5 * ep.interference_at_zone(d / qa, *args)
    x = np.linspace(-0.1 * top, top, 400)
    p = ep.contact_pressure(x, *args)
    assert np.all(np.diff(p) >= -1e-9 * p.max())
    Dpl = ep.plastic_zone_diameter(x, *args)
    assert np.all(np.diff(Dpl) >= 0.0)
    assert p.max() <= ep.full_plastic_pressure(d, d / qa, Re) * (1 + 1e-9)
    # below the onset of yield it is the elastic (Lamé) pressure
    assert np.all(Dpl[x < ep.interference_at_zone(d, *args) * (1 - 1e-9)] == d)


def test_infinite_hub_never_becomes_fully_plastic():
    args = (20.0, 0.0, np.inf, 210000.0, 0.3, 70000.0, 0.33, 260.0)
    Dpl = ep.plastic_zone_diameter(np.array([0.05, 0.2, 1.0]), *args)
    assert np.all(np.isfinite(Dpl)) and Dpl[0] == 20.0 and Dpl[2] > Dpl[1] > 20.0
    assert ep.plastic_share(Dpl, 20.0, np.inf)[2] == 0.0


def test_unloading_is_elastic_from_the_peak():
    args = (20.0, 0.0, 30.0, 210000.0, 0.3, 70000.0, 0.33, 260.0)
    p_first, p_a, p_b, Dpl = ep.state_pressures(0.14, 0.10, *args)
    assert p_first == p_a == pytest.approx(ep.contact_pressure(0.14, *args))
    c_p = 1.0 / (20.0 * ((1.3 / 0.5 * 0 + (1 + 4 / 9) / (1 - 4 / 9) + 0.33) / 70000.0 + 0.7 / 210000.0))
    assert p_b == pytest.approx(p_a - 0.04 * c_p, rel=1e-12)
    assert p_b < ep.contact_pressure(0.10, *args)  # below the loading curve: less grip (conservative)
    assert Dpl == pytest.approx(ep.plastic_zone_diameter(0.14, *args))
    # the later state is the peak: first loading at a, the larger pressure at b
    p_first, p_a, p_b, Dpl = ep.state_pressures(0.10, 0.14, *args)
    assert p_first == pytest.approx(ep.contact_pressure(0.10, *args)) and p_a < p_first
    assert p_b == pytest.approx(ep.contact_pressure(0.14, *args))


def test_kernel_elastic_design_unchanged_and_plastic_branch_vectorised():
    kw = dict(interference_min=np.array([0.03, 0.09]), interference_max=np.array([0.06, 0.14]), d=20.0,
              L=12.0, Do=30.0, Es=210000.0, nus=0.3, Rps=490.0, Eh=70000.0, nuh=0.33, Rph=260.0,
              alphah=23.4e-6, mu_slip=0.12, torque=15000.0)
    el = core.evaluate(**kw)
    pl = core.evaluate(**kw, design="elastic-plastic")
    assert np.all(el["plastic_zone_diameter_max"] == 20.0) and np.all(el["plastic_utilisation"] == 0.0)
    # first joint stays elastic: both designs agree
    for k in ("p_min", "p_max", "torque_capacity_min", "press_force_max", "hub_stress_max"):
        assert pl[k][0] == pytest.approx(el[k][0], rel=1e-12)
    # second joint yields: less pressure, a plastic zone, the hub judged by its zone
    assert pl["p_max"][1] < el["p_max"][1] and pl["plastic_zone_diameter_max"][1] > 20.0
    assert not el["ok_hub"][1]
    share = ep.plastic_share(pl["plastic_zone_diameter_max"][1], 20.0, 30.0)
    assert pl["plastic_utilisation"][1] == pytest.approx(share / 0.3)
    assert pl["ok_hub"][1] == (share <= 0.3)


def test_partly_yielding_hub_passes_inside_the_permitted_zone_and_states_its_depth():
    m = dict(ALU_GEAR, interference_min="70 um", interference_max="100 um", design="elastic-plastic")
    r = _eval(m)
    el = _eval(dict(m, design="elastic"))
    assert not next(c for c in el.checks if c.name == "hub yield at tightest fit").passed
    c = next(c for c in r.checks if c.name == "hub plastic zone at tightest fit")
    assert c.passed and 0.0 < c.value <= 0.3
    depth = (r.plastic_zone_diameter - 20.0) / 2.0
    assert f"{depth:.3f} mm deep" in c.note
    assert r.ok, [x for x in r.checks if not x.passed]
    assert 0.0 < r.plastic_utilisation <= 1.0
    assert r.pressure_max < el.pressure_max


def test_hub_beyond_the_permitted_zone_fails_saying_by_how_much():
    r = _eval(dict(ALU_GEAR, design="elastic-plastic"))
    c = next(c for c in r.checks if c.name == "hub plastic zone at tightest fit")
    assert not c.passed and not r.ok
    over = (r.plastic_zone_diameter - 20.0) / 2.0 - 0.3 * 5.0
    assert f"exceeded by {over:.3f} mm" in c.note
    assert r.plastic_utilisation > 1.0
    # a larger permitted share passes the same hub
    r2 = _eval(dict(ALU_GEAR, design="elastic-plastic", plastic_zone_limit=0.7))
    assert next(c for c in r2.checks if c.name == "hub plastic zone at tightest fit").passed


def test_yielding_shaft_fails_in_both_designs():
    m = dict(ALU_GEAR, hub_material="42CrMo4", shaft_material="EN AW-6082-T6", shaft_bore="16 mm",
             hub_outer_diameter="60 mm")
    for design in ("elastic", "elastic-plastic"):
        r = _eval(dict(m, design=design))
        shaft = next(c for c in r.checks if c.name == "shaft yield at tightest fit")
        assert not shaft.passed and not r.ok


def test_json_fields_and_round_trip():
    r = _eval(ALU_GEAR)
    j = r.to_json()
    assert j["design"] == "elastic" and j["plastic_zone_diameter_mm"] == 20.0 and j["plastic_utilisation"] == 0.0
    inp = PressFitInput.from_mapping(dict(ALU_GEAR, design="elastic-plastic", plastic_zone_limit=0.5))
    assert PressFitInput.from_mapping(inp.to_mapping()) == inp
    j = _eval(inp.to_mapping()).to_json()
    json.dumps(j)
    assert j["design"] == "elastic-plastic" and j["plastic_zone_diameter_mm"] > 20.0


def test_bad_design_inputs_are_refused():
    with pytest.raises(FitcheckError, match="elastic-plastic"):
        PressFitInput.from_mapping(dict(ALU_GEAR, design="plastic"))
    with pytest.raises(FitcheckError, match="ductile hub"):
        PressFitInput.from_mapping(dict(ALU_GEAR, design="elastic-plastic", hub_material="EN-GJL-250"))
    with pytest.raises(FitcheckError, match="plastic_zone_limit"):
        PressFitInput.from_mapping(dict(ALU_GEAR, plastic_zone_limit=1.5))


def test_operating_temperature_unloads_the_yielded_hub():
    m = dict(ALU_GEAR, interference_min="70 um", interference_max="100 um", design="elastic-plastic",
             temperature_hub="90 degC", temperature_shaft="90 degC")
    r = _eval(m)
    hi, lo = r.tightest_operating, r.loosest_operating
    # aluminium grows more than steel: less interference in operation, elastic unloading from the
    # yielded assembly state (the loosest fit stays elastic here: 61.8 um < 75.4 um onset)
    assert hi.effective_interference < r.tightest_assembly.effective_interference
    assert hi.pressure < ep.contact_pressure(hi.effective_interference, 20.0, 0.0, 30.0, 210000, 0.3, 70000,
                                             0.33, 260.0)
    assert r.pressure_max == pytest.approx(r.tightest_assembly.pressure)
    assert r.pressure_min == pytest.approx(min(lo.pressure, r.loosest_assembly.pressure))


def test_study_and_search_use_the_chosen_design():
    from fitcheck.search import search_fits
    from fitcheck.study import run_study

    m = dict(ALU_GEAR, interference_min="70 um", interference_max="100 um", design="elastic-plastic")
    inp = PressFitInput.from_mapping(m)
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        st_pl = run_study(inp, samples=4000, seed=3, importance_samples=0)
        st_el = run_study(PressFitInput.from_mapping(dict(m, design="elastic")), samples=4000, seed=3,
                          importance_samples=0)
    assert st_pl.fraction_meeting_design_checks > st_el.fraction_meeting_design_checks
    assert st_pl.yield_.plain.p < st_el.yield_.plain.p
    g = PressFitInput.from_mapping({k: v for k, v in m.items() if not k.startswith("interference")
                                    and k != "diameter"} | {"fit": "20 H7/x6"})
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        s_pl = search_fits(g)
        s_el = search_fits(PressFitInput.from_mapping(dict(g.to_mapping(), design="elastic")))
    assert len(s_pl.passing) > len(s_el.passing)
    names = {c.name for c in s_pl.passing[0].checks}
    assert "hub plastic zone at tightest fit" in names
    assert math.isfinite(s_pl.passing[0].checks[0].value)


def test_wall_stress_chart_shows_the_plastic_zone():
    from fitcheck.plots.pressfit import plot_wall_stresses

    r = _eval(dict(ALU_GEAR, design="elastic-plastic"))
    prof = r.wall_profile(200)
    inside = prof["r_hub"] < r.plastic_zone_diameter / 2.0
    k = 2.0 / math.sqrt(3.0) * 260.0
    assert np.allclose((prof["st_hub"] - prof["sr_hub"])[inside], k, rtol=1e-9)  # at yield in the zone
    assert np.all((prof["st_hub"] - prof["sr_hub"])[~inside] <= k * (1 + 1e-9))
    fig = plot_wall_stresses(r)
    labels = [t.get_text() for t in fig.axes[0].get_legend().get_texts()]
    assert any(t.startswith(f"plastic zone to Ø {r.plastic_zone_diameter:.2f} mm") for t in labels)
    el = plot_wall_stresses(_eval(ALU_GEAR))
    assert not any("plastic zone" in t.get_text() for t in el.axes[0].get_legend().get_texts())


def test_report_shows_the_plastic_zone_check():
    from fitcheck import case as case_mod
    from fitcheck import report

    lines = ["format_version = 1", "[[pressfit]]"] + [f'{k} = "{v}"' for k, v in ALU_GEAR.items()] + ['design = "elastic-plastic"']
    res = case_mod.evaluate(case_mod.loads("\n".join(lines) + "\n"))
    html = report.to_html(report.build(res, plots=False))
    assert "hub plastic zone at tightest fit" in html and "exceeded by" in html
    assert "Elastic-plastic design" in html


def test_cli_json_carries_the_design_fields(cli, tmp_path):
    m = dict(ALU_GEAR, interference_min="70 um", interference_max="100 um", design="elastic-plastic")
    f = tmp_path / "alu.toml"
    f.write_text("\n".join(["format_version = 1", "[[pressfit]]"] + [f'{k} = "{v}"' for k, v in m.items()])
                 + "\n", encoding="utf-8")
    code, out, err = cli("pressfit", str(f), "--json")
    assert code == 0, err
    j = json.loads(out)["pressfits"][0]
    r = _eval(m)
    assert j["design"] == "elastic-plastic"
    assert j["plastic_zone_diameter_mm"] == pytest.approx(r.plastic_zone_diameter) and r.plastic_zone_diameter > 20
    assert j["plastic_utilisation"] == pytest.approx(r.plastic_utilisation)
    code, out, _ = cli("pressfit", str(f))
    assert "hub plastic zone at tightest fit" in out and "hub plastic zone Ø (tightest; depth" in out


def test_outer_diameter_growth_of_a_yielded_hub():
    # the elastic ring outside the zone is at yield at D_pl: sigma_t(Do) = k·(D_pl/Do)² (Lamé)
    r = _eval(dict(ALU_GEAR, design="elastic-plastic"))
    k = 2.0 / math.sqrt(3.0) * 260.0
    assert r.hub_outer_growth_max == pytest.approx(30.0 * k * (r.plastic_zone_diameter / 30.0) ** 2 / 70000.0)
    sr, st = ep.hub_stresses(r.pressure_max, r.plastic_zone_diameter, 20.0, 30.0, 15.0, 260.0)
    assert r.hub_outer_growth_max == pytest.approx(30.0 * st / 70000.0, rel=1e-9)


def test_passing_elastic_plastic_headline_states_the_plastic_zone_not_an_elastic_yield_safety():
    # a partly yielding hub has an elastic "yield safety" below 1 by design: the verdict quotes the
    # plastic zone's share of the wall against its permitted share instead
    inp = PressFitInput.from_mapping({
        "name": "ep", "diameter": "20 mm", "interference_min": "40 um", "interference_max": "75 um",
        "length": "16 mm", "hub_outer_diameter": "30 mm", "shaft_material": "42CrMo4",
        "hub_material": "C45E", "torque": "25 N*m", "design": "elastic-plastic"})
    r = evaluate(inp)
    zone = next(c for c in r.checks if c.name == "hub plastic zone at tightest fit")
    assert r.ok and zone.value > 0 and r.hub_yield_safety < 1.0
    assert f"hub plastic zone {zone.value:.0%} of the wall (permitted 30%)" in r.headline
    assert "hub yield safety" not in r.headline


def test_study_names_the_yield_limit_state_of_the_chosen_design():
    from fitcheck.study import run_study

    m = dict(ALU_GEAR, interference_min="70 um", interference_max="100 um", design="elastic-plastic")
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        pl = run_study(PressFitInput.from_mapping(m), samples=2000, seed=1, importance_samples=0)
        el = run_study(PressFitInput.from_mapping(dict(m, design="elastic")), samples=2000, seed=1,
                       importance_samples=0)
    assert "hub plastic through its whole wall" in pl.yield_.definition
    assert "hub bore" not in pl.yield_.definition
    assert el.yield_.definition.startswith("equivalent stress at hub bore")


def test_search_table_shows_the_plastic_zone_share_in_the_elastic_plastic_design(cli, tmp_path):
    m = {k: v for k, v in ALU_GEAR.items() if not k.startswith("interference") and k != "diameter"}
    m |= {"fit": "20 H7/x6", "design": "elastic-plastic"}
    f = tmp_path / "alu.toml"
    f.write_text("\n".join(["format_version = 1", "[[pressfit]]"] + [f'{k} = "{v}"' for k, v in m.items()])
                 + "\n", encoding="utf-8")
    code, out, err = cli("search", str(f), "--holes", "H7", "--shaft-grades", "6", "--top", "3")
    assert "hub plastic zone (share of wall)" in out and "hub safety" not in out
    from fitcheck.search import search_fits
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        best = search_fits(PressFitInput.from_mapping(m), holes=("H7",), shaft_grades=(6,)).passing[0]
    share = next(c.value for c in best.checks if c.name == "hub plastic zone at tightest fit")
    row = next(ln for ln in out.splitlines() if ln.startswith("1 "))
    assert f" {share:.0%} " in row
    f.write_text(f.read_text(encoding="utf-8").replace('"elastic-plastic"', '"elastic"')
                 .replace('"15 N*m"', '"2 N*m"'), encoding="utf-8")
    code, out, err = cli("search", str(f), "--holes", "H7", "--shaft-grades", "6", "--top", "3")
    assert "hub safety" in out and "plastic zone" not in out
