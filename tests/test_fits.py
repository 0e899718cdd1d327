"""The ISO 286 fits API: parsing, zones, fits, errors, valid classes, preferred fits, CLI, plot."""

from __future__ import annotations

import json
import math

import matplotlib.pyplot as plt
import numpy as np
import pytest

import fitcheck
from fitcheck.errors import InputError
from fitcheck.fits import (
    Designation,
    Fit,
    deviations,
    fit,
    parse,
    preferred_fits,
    valid_classes,
    zone,
)
from fitcheck.plots.fits import plot_fit
from fitcheck.units import Q_

# ---------------------------------------------------------------- parsing


@pytest.mark.parametrize("text, nominal, hole, shaft, inch", [
    ("25 H7/p6", 25.0, "H7", "p6", False),
    ("25H7/p6", 25.0, "H7", "p6", False),
    ("Ø25 H7/p6", 25.0, "H7", "p6", False),
    ("⌀25 H7 / p6", 25.0, "H7", "p6", False),
    ("25 H7", 25.0, "H7", None, False),
    ("25 p6", 25.0, None, "p6", False),
    ("0.9843 in H7/p6", 0.9843 * 25.4, "H7", "p6", True),
    ("25 mm H7/p6", 25.0, "H7", "p6", False),
    ("1 in h6", 25.4, None, "h6", True),
    ("12.5 JS7", 12.5, "JS7", None, False),
    ("40 js6", 40.0, None, "js6", False),
    ("8 ZC11/zc11", 8.0, "ZC11", "zc11", False),
])
def test_parse_accepts(text, nominal, hole, shaft, inch):
    d = parse(text)
    assert isinstance(d, Designation)
    assert d.nominal_mm == pytest.approx(nominal, rel=1e-12)
    assert (d.hole, d.shaft, d.inch, d.text) == (hole, shaft, inch, text)


def test_fit_forms_agree():
    a = fit("25 H7/p6")
    b = fit(25.0, "H7", "p6")
    c = fit("25 mm", "H7", "p6")
    d = fit(Q_(25, "mm"), hole="H7", shaft="p6")
    assert a == b == c == d


def test_fit_values_h7_p6():
    # ISO 286-2:2010, H7 and p6 over 18 up to 30 mm — from memory
    f = fit("25 H7/p6")
    assert (f.hole.upper_um, f.hole.lower_um, f.shaft.upper_um, f.shaft.lower_um) == (21, 0, 35, 22)
    assert f.kind == "interference"
    assert (f.clearance_max_um, f.clearance_min_um) == (-1, -35)
    assert (f.interference_min_um, f.interference_max_um) == (1, 35)
    assert f.mean_clearance_um == -18
    assert f.fit_tolerance_um == 21 + 13
    assert f.hole.max_mm == pytest.approx(25.021) and f.shaft.min_mm == pytest.approx(25.022)


@pytest.mark.parametrize("text, kind", [
    ("25 H7/g6", "clearance"),        # ISO 286-1:2010, 3.4.1.1 clearance fit
    ("25 H7/h6", "clearance"),        # smallest clearance zero counts as clearance (3.4.1.1)
    ("25 H7/k6", "transition"),
    ("25 H7/n6", "transition"),
    ("25 H7/s6", "interference"),
    ("25 H7/u6", "interference"),
])
def test_fit_kind(text, kind):
    assert fit(text).kind == kind


def test_single_zone_fit():
    f = fit("25 H7")
    assert f.shaft is None and f.kind is None and math.isnan(f.clearance_max_um)
    d = f.to_dict()
    assert d["hole"]["class"] == "H7" and d["shaft"] is None and d["kind"] is None


def test_zone_fields_and_units():
    z = zone("0.984251968503937 in", "H7")  # 25 mm
    assert (z.feature, z.cls, z.letter, z.grade) == ("hole", "H7", "H", 7)
    assert z.nominal_mm == pytest.approx(25.0)
    assert z.it_um == 21 and z.tolerance_um == 21
    d = z.to_dict()
    assert set(d) >= {"class", "upper_um", "lower_um", "max_mm", "min_mm", "max_in", "min_in"}
    assert d["max_in"] == pytest.approx(25.021 / 25.4)
    assert zone(Q_(25, "mm"), "h01").grade == -1


def test_fit_to_dict_is_json():
    d = fit("25 H7/p6").to_dict()
    text = json.dumps(d, allow_nan=False)
    back = json.loads(text)
    assert back["kind"] == "interference" and back["shaft"]["upper_um"] == 35
    assert back["nominal_mm"] == 25.0


def test_frozen():
    f = fit("25 H7/p6")
    with pytest.raises(AttributeError):
        f.kind = "clearance"  # type: ignore[misc]
    assert isinstance(f, Fit)


# ---------------------------------------------------------------- vectorised path


def test_deviations_marks_undefined():
    up, lo, ok, why = deviations([25.0, 25.0, 0.5, 4000.0, 25.0, 25.0],
                                 ["p6", "cd7", "a11", "h6", "P6", "q6"], "shaft", reasons=True)
    assert ok.tolist() == [True, False, False, False, False, False]
    assert np.isnan(up[1:]).all() and np.isnan(lo[1:]).all()
    assert (why[1:] != 0).all()


def test_deviations_broadcasts_single_class():
    up, lo, ok = deviations(np.array([2.0, 25.0, 600.0]), "H7", "hole")
    assert up.tolist() == [10, 21, 70]  # ISO 286-2:2010, H7 — from memory
    assert ok.all()


def test_deviations_bad_feature():
    with pytest.raises(InputError, match="hole"):
        deviations(25.0, "H7", "bore")


# ---------------------------------------------------------------- valid classes, preferred fits


def test_valid_classes_order_and_content():
    holes = valid_classes(25.0, "hole")
    assert holes[:5] == ["A9", "A10", "A11", "A12", "A13"]
    assert "H7" in holes and "CD7" not in holes and "J9" not in holes
    for cls in holes:  # every listed class resolves
        zone(25.0, cls)
    shafts = valid_classes(2.0, "shaft")
    assert "cd7" in shafts and "t6" not in shafts
    assert "a11" not in valid_classes(0.8, "shaft")       # ISO 286-1:2010, footnote a, b ≤ 1 mm
    assert "a11" in valid_classes(1.2, "shaft")
    assert "h14" not in valid_classes(0.8, "shaft")       # ISO 286-1:2010, IT14 … IT18 not ≤ 1 mm


def test_preferred_fits():
    pf = preferred_fits()
    hole = [p.fit for p in pf if p.basis == "hole"]
    shaft = [p.fit for p in pf if p.basis == "shaft"]
    # ANSI B4.2-1978, preferred fits — from memory
    assert hole == ["H11/c11", "H9/d9", "H8/f7", "H7/g6", "H7/h6", "H7/k6", "H7/n6", "H7/p6",
                    "H7/s6", "H7/u6"]
    assert shaft == ["C11/h11", "D9/h9", "F8/h7", "G7/h6", "H7/h6", "K7/h6", "N7/h6", "P7/h6",
                     "S7/h6", "U7/h6"]
    assert pf[0].description == "loose running" and pf[-1].description == "force"
    assert all(p.source for p in pf)
    for p in pf:  # each resolves; running fits are clearance, drive/force are interference
        f = fit(f"25 {p.fit}")
        if "running" in p.description or p.description == "sliding":
            assert f.kind == "clearance"
        if p.description in ("medium drive", "force"):
            assert f.kind == "interference"


# ---------------------------------------------------------------- errors

BAD = [
    ("25 Q7/p6", "'Q' is not an ISO 286 letter; allowed: A, B"),
    ("25 H7/P6", "did you mean 'p6'"),
    ("25 h7/p6", "did you mean 'H7'"),
    ("25 p6/H7", "did you mean 'H7/p6'"),
    ("25 H7 p6", "slash"),
    ("H7/p6", "nominal size"),
    ("25", "no tolerance class"),
    ("25 cd7", "letter cd is tabulated only up to 10 mm"),
    ("4000 H7", "sizes above 3150 mm are outside ISO 286"),
    ("25 p14", r"grade 14 of p is outside ISO 286-2 \(p3…p10\)"),
    ("25 Js7", "did you mean 'JS7' or 'js7'"),
    ("-3 H7", "nominal size"),
    ("0 H7", "greater than 0|> 0"),
    ("25 H", "needs a grade"),
    ("25 H7/p6/k6", "allowed"),
    ("0.5 a11", "a and b are not used for nominal sizes up to 1 mm"),
    ("0.5 N9", "N above IT8 is not used for nominal sizes up to 1 mm"),
    ("0.5 h14", "IT14 to IT18 are not used for nominal sizes up to 1 mm"),
    ("600 K9", "K9 is tabulated only up to 500 mm"),
    ("20 t6", "letter t is tabulated only for sizes over 24 mm"),
    ("5 j8", "j8 is tabulated only up to 3 mm"),
    ("25 H19", "grade 19 is not an ISO 286 grade"),
    ("25 J9", r"grade 9 of J is outside ISO 286-2 \(J6…J8\)"),
    ("600 H01", "IT01 is tabulated only up to 500 mm"),
    ("25 kq6", "not an ISO 286 letter"),
    ("twenty H7", "allowed"),
    ("25 Hx", "allowed"),
    ("25 Cd7", "did you mean"),
]


@pytest.mark.parametrize("text, match", BAD, ids=[b[0] for b in BAD])
def test_bad_designations_raise_input_error(text, match):
    with pytest.raises(InputError, match=match):
        fit(text)


@pytest.mark.parametrize("text, match", BAD, ids=[b[0] for b in BAD])
def test_bad_designations_on_the_command_line(cli, text, match):
    code, out, err = cli("limits", text)
    assert code == 2
    assert err.count("\n") == 1 and err.strip()
    assert "Traceback" not in err and out == ""


@pytest.mark.parametrize("args, match", [
    ((25.0, "h7", None), "did you mean 'H7'"),
    ((25.0, None, "P6"), "did you mean 'p6'"),
    ((25.0, None, None), "no tolerance class"),
    (("25 kg", "H7", None), "length"),
    ((float("nan"), "H7", None), "finite"),
])
def test_fit_argument_errors(args, match):
    with pytest.raises(InputError, match=match):
        fit(*args)


def test_zone_rejects_non_string_class():
    with pytest.raises(InputError):
        zone(25.0, 7)  # type: ignore[arg-type]


# ---------------------------------------------------------------- command line


def test_cli_table(cli):
    code, out, err = cli("limits", "25 H7/p6")
    assert code == 0 and err == ""
    assert "H7" in out and "p6" in out and "+35" in out and "+22" in out and "+21" in out
    assert "interference" in out and "in" in out
    assert fitcheck.CAUTION in out


def test_cli_json(cli):
    code, out, _ = cli("limits", "25 H7/p6", "--json")
    assert code == 0
    d = json.loads(out)
    assert d["nominal_mm"] == 25.0 and d["kind"] == "interference"
    assert (d["hole"]["class"], d["hole"]["upper_um"], d["hole"]["lower_um"]) == ("H7", 21, 0)
    assert (d["shaft"]["max_mm"], d["shaft"]["min_mm"]) == (pytest.approx(25.035), pytest.approx(25.022))
    assert (d["clearance_max_um"], d["clearance_min_um"]) == (-1, -35)


def test_cli_words_joined_and_single_zone(cli):
    code, out, _ = cli("limits", "25", "p6", "--json")
    d = json.loads(out)
    assert code == 0 and d["shaft"]["upper_um"] == 35 and d["hole"] is None


def test_cli_preferred(cli):
    code, out, _ = cli("limits", "--preferred")
    assert code == 0 and "H7/u6" in out and "U7/h6" in out and "force" in out
    assert fitcheck.CAUTION in out
    code, out, _ = cli("limits", "--preferred", "--json")
    assert len(json.loads(out)["preferred_fits"]) == 20


def test_cli_without_designation(cli):
    code, out, err = cli("limits")
    assert code == 2 and "Traceback" not in err and err.count("\n") == 1


# ---------------------------------------------------------------- plot


def test_plot_fit_new_figure_and_given_axes():
    before = plt.get_fignums()
    fig = plot_fit(fit("25 H7/p6"))
    assert plt.get_fignums() == before          # not registered with pyplot
    ax = fig.axes[0]
    texts = " ".join(t.get_text() for t in ax.texts)
    assert "H7" in texts and "p6" in texts and "+35" in texts and "+22" in texts
    lo, hi = ax.get_ylim()
    assert lo < 0 < 35 < hi
    fig2, ax2 = plt.subplots()
    try:
        assert plot_fit(fit("25 H7"), ax=ax2) is fig2
        assert len(ax2.patches) == 1
        assert plt.fignum_exists(fig2.number)   # the caller's figure stays open
    finally:
        plt.close(fig2)
