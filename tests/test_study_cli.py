"""The ``fitcheck study`` and ``fitcheck search`` commands and the study/search plots.

Wiring only: the command output equals a direct library call (fitcheck.study.run_study,
fitcheck.search.search_fits); exit codes 0/1/2; the caution is printed.
"""

import json
import textwrap

import pytest
from matplotlib.figure import Figure

from fitcheck import CAUTION, case
from fitcheck.plots.study import plot_search_ranking, plot_study_histograms
from fitcheck.search import search_fits
from fitcheck.study import StudySettings, run_study

CASE = textwrap.dedent("""\
    format_version = 1

    [conditions]
    temperature_min = "-20 degC"
    temperature_max = "80 degC"

    [[pressfit]]
    name = "pinion"
    fit = "20 H7/r6"
    length = "16 mm"
    hub_outer_diameter = "40 mm"
    shaft_material = "C45E"
    hub_material = "C45E"
    mu_slip = 0.12
    torque = "8 N*m"

    [[pressfit]]
    name = "pulley"
    fit = "20 H7/s6"
    length = "16 mm"
    hub_outer_diameter = "40 mm"
    shaft_material = "C45E"
    hub_material = "C45E"
    mu_slip = 0.12
    torque = "4 N*m"
""")


@pytest.fixture
def case_file(tmp_path):
    p = tmp_path / "drive.toml"
    p.write_text(CASE, encoding="utf-8")
    return p


def test_study_json_equals_library_call(cli, case_file):
    code, out, err = cli("study", str(case_file), "--joint", "pinion", "--samples", "20000",
                         "--seed", "5", "--target", "1e-4", "--json")
    j = json.loads(out)
    inp = next(p for p in case.load(case_file).pressfits if p.name == "pinion")
    r = run_study(inp, StudySettings(samples=20000, seed=5, target=1e-4, temperature_min=-20.0,
                                     temperature_max=80.0))
    assert j["slip"]["plain"]["failures"] == r.slip.plain.failures
    assert j["distributions"]["torque_capacity"]["mean"] == pytest.approx(
        r.distribution("torque_capacity").mean, rel=1e-12)
    assert j["slip"]["best"]["p"] == pytest.approx(r.slip.best.p, rel=1e-12)
    assert code == (0 if r.ok else 1) == 1  # P(slip) of a few 1e-3 misses 1e-4
    assert j["caution"] == CAUTION


def test_study_text_has_caution_and_verdict(cli, case_file):
    code, out, err = cli("study", str(case_file), "--joint", "pulley", "--samples", "5000",
                         "--target", "1e-3")
    assert code == 0, err
    assert "Failure probabilities" in out and "Worst case" in out
    assert CAUTION in out


def test_study_without_target_follows_worst_case(cli, case_file):
    code, out, _ = cli("study", str(case_file), "--joint", "pulley", "--samples", "2000")
    inp = next(p for p in case.load(case_file).pressfits if p.name == "pulley")
    assert code == (0 if run_study(inp, samples=2000).worst_case.ok else 1)
    assert "no --target given" in out


@pytest.mark.parametrize("argv,match", [
    (["--joint", "pinoin"], "did you mean 'pinion'"),
    ([], "several"),
    (["--joint", "pinion", "--samples", "ten"], "samples"),
    (["--joint", "pinion", "--cp", "1", "--cpk", "2"], "cpk"),
    (["--joint", "pinion", "--sizes", "gauss"], "sizes"),
    (["--joint", "pinion", "--t-min", "-10 degC"], "temperature"),
])
def test_study_bad_input_exit_2(cli, case_file, argv, match):
    code, out, err = cli("study", str(case_file), *argv)
    assert code == 2
    assert match in err
    assert "Traceback" not in err


def test_study_missing_file_exit_2(cli, tmp_path):
    code, _, err = cli("study", str(tmp_path / "nope.toml"), "--joint", "x")
    assert code == 2 and "nope.toml" in err


def test_study_plot_file(cli, case_file, tmp_path):
    png = tmp_path / "h.png"
    code, _, err = cli("study", str(case_file), "--joint", "pulley", "--samples", "2000",
                       "--plot", str(png))
    assert code in (0, 1), err
    assert png.stat().st_size > 1000


def test_search_json_equals_library_call(cli, case_file):
    code, out, err = cli("search", str(case_file), "--joint", "pinion", "--top", "4", "--json")
    assert code == 0, err
    j = json.loads(out)
    inp = next(p for p in case.load(case_file).pressfits if p.name == "pinion")
    r = search_fits(inp)
    assert [c["fit"] for c in j["passing"]] == [c.fit for c in r.passing[:4]]
    assert [c["fit"] for c in j["nearest_rejected"]] == [c.fit for c in r.rejected[:4]]
    assert j["evaluated"] == r.evaluated


def test_search_text(cli, case_file):
    code, out, _ = cli("search", str(case_file), "--joint", "pulley", "--top", "3")
    assert code == 0
    assert "Ranked fits" in out and "Nearest rejected" in out and "Caution:" in out
    assert "the joint's own fit H7/s6" in out


def test_search_none_passing_exit_1(cli, tmp_path):
    p = tmp_path / "heavy.toml"
    p.write_text(CASE.replace('torque = "8 N*m"', 'torque = "2000 N*m"'), encoding="utf-8")
    code, out, _ = cli("search", str(p), "--joint", "pinion")
    assert code == 1
    assert "no admitted fit" in out


@pytest.mark.parametrize("argv,match", [
    (["--joint", "pulle"], "did you mean 'pulley'"),
    (["--joint", "pulley", "--top", "0"], "--top"),
    (["--joint", "pulley", "--holes", "H7,7H"], "holes"),
    (["--joint", "pulley", "--shaft-grades", "5,x"], "--shaft-grades"),
])
def test_search_bad_input_exit_2(cli, case_file, argv, match):
    code, _, err = cli("search", str(case_file), *argv)
    assert code == 2
    assert match in err


def test_plots_return_figures(case_file):
    inp = next(p for p in case.load(case_file).pressfits if p.name == "pinion")
    fig = plot_study_histograms(run_study(inp, samples=3000, importance_samples=0))
    assert isinstance(fig, Figure) and len(fig.axes) == 3
    # the limit line of the required torque is drawn on the torque panel
    xs = [ln.get_xdata()[0] for ln in fig.axes[0].lines]
    assert any(abs(x - 8.0) < 1e-9 for x in xs)
    r = search_fits(inp)
    fig2 = plot_search_ranking(r, top=6, rejected=4)
    assert isinstance(fig2, Figure)
    assert len(fig2.axes[0].patches) == 10
    labels = [t.get_text() for t in fig2.axes[0].get_yticklabels()]
    assert labels[0].startswith("#1") and r.passing[0].shaft in labels[0]
