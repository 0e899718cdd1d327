"""Inch output: plots in inch units, the inch demo, CLI text in both systems.

Conversion factors: NIST SP 811 (1 in = 25.4 mm exactly, 1 lbf = 4.4482216152605 N,
1 psi = 6894.757 Pa); the B4.1 limits drawn are those of tests/validation/test_asme_b41_limits.py.
"""

from __future__ import annotations

import pytest

from fitcheck import case as casefile
from fitcheck import fits
from fitcheck.display import inch_value, table_in_system, text_in_system, thou
from fitcheck.plots import (
    plot_capacity_band,
    plot_clearance_budget,
    plot_fit,
    plot_joint_diagram,
    plot_wall_stresses,
)


@pytest.fixture(scope="module")
def inch_demo():
    return casefile.evaluate(casefile.demo_case(inch=True))


def test_inch_demo_loads_in_inch_and_every_check_passes(inch_demo):
    assert inch_demo.case.unit_system == "inch"
    assert inch_demo.ok
    kinds = {j.table for j in inch_demo.joints}
    assert kinds == {"pressfit", "bearing", "screws"}


def test_plot_fit_in_thousandths():
    # ASME B4.1 FN2 over 0.71 to 0.95 in: hole +0.8/0, shaft +1.9/+1.4 thou (MH27 Table 11)
    ax = plot_fit(fits.fit("0.75 in FN2"), units="inch").axes[0]
    assert "thou" in ax.get_ylabel()
    heights = sorted(round(p.get_height(), 9) for p in ax.patches)
    assert heights == pytest.approx([0.5, 0.8], abs=1e-9)
    ax_si = plot_fit(fits.fit("0.75 in FN2")).axes[0]
    assert "µm" in ax_si.get_ylabel()
    assert sorted(p.get_height() for p in ax_si.patches) == pytest.approx([0.5 * 25.4, 0.8 * 25.4])


def test_every_joint_plot_draws_in_inch_units(inch_demo):
    res = {j.table: j.result for j in inch_demo.joints}
    checks = [(plot_wall_stresses(res["pressfit"], units="inch"), "ksi", "in"),
              (plot_capacity_band(res["pressfit"], units="inch"), "lbf·in", "thou"),
              (plot_clearance_budget(res["bearing"], units="inch"), "thou", None),
              (plot_joint_diagram(res["screws"], units="inch"), "klbf", "thou")]
    for fig, ylab, xlab in checks:
        ax = fig.axes[0]
        assert ylab in ax.get_ylabel()
        if xlab:
            assert xlab in ax.get_xlabel()
    # same drawing, other scale: the capacity band's top in lbf·in equals the SI one × 8.8507
    si = plot_capacity_band(res["pressfit"]).axes[0].lines[0].get_ydata()
    inch = checks[1][0].axes[0].lines[0].get_ydata()
    assert inch.max() == pytest.approx(si.max() * 1000 / 25.4 / 4.4482216152605, rel=1e-9)


def test_inch_rounding_as_a_drawing_shows_it():
    assert inch_value(19.05, "mm") == ("0.7500", "in")
    assert thou(20.32) == "0.8 thou" and thou(-7.62, signed=True) == "-0.3 thou"
    assert inch_value(4448.2216152605, "N") == ("1000", "lbf")
    assert inch_value(6.894757, "MPa") == ("1000", "psi")
    assert inch_value(100.0, "degC") == ("212", "°F")
    assert text_in_system("F = 10 kN", "SI") == "F = 10 kN"
    h, rows = table_in_system(["case", "p [MPa]", "δ [um]"], [["a", "6.894757", "+25.4 … +50.8"]], "inch")
    assert h == ["case", "p [ksi]", "δ [thou]"] and rows == [["a", "1", "+1 … +2"]]


def test_check_verdicts_do_not_depend_on_the_units_of_the_text(cli, tmp_path):
    p = tmp_path / "w.toml"
    p.write_text(casefile.demo_text(inch=True), encoding="utf-8")
    code_si, out_si, _ = cli("check", str(p), "--units", "si")
    code_in, out_in, _ = cli("check", str(p))          # the file says unit_system = "inch"
    assert code_si == code_in == 0
    assert "lbf" in out_in and "lbf" not in out_si
    assert out_si.count(" pass") == out_in.count(" pass")


def test_demo_command_writes_the_inch_demo(cli, tmp_path):
    out = tmp_path / "w.toml"
    code, text, _ = cli("demo", "--inch", "-o", str(out))
    assert code == 0 and "lab winch" in text
    assert out.read_text(encoding="utf-8") == casefile.demo_text(inch=True)
