"""Inch fasteners: ASME B18.2.8 clearance holes, ASME B18.22.1 plain washers, ASTM A574 socket head cap
screws, and a #8-32 cover checked the way a new user would write it.

Sources (values in inches as the standards print them, recalled rather than read: # from memory):
ASME B18.2.8-1999 (R2005), Table 1, clearance holes for inch bolts and screws, close / normal / loose fit;
ASME B18.22.1-1965 (R2008), Table 1, Type B plain washers, narrow (N) and regular (R) series;
ASTM A574-17, Table 2 (tensile 180 ksi up to 1/2 in, 170 ksi above) and Table 3 (proof-load stress).
"""

import warnings

import pytest

from fitcheck import threads
from fitcheck.screws import ScrewJointInput, evaluate

IN = 25.4

# ASME B18.2.8, Table 1: size: (close, normal, loose) [in]  # from memory
HOLES = {"#0": (0.067, 0.070, 0.076), "#2": (0.094, 0.096, 0.104), "#4": (0.120, 0.125, 0.136),
         "#6": (0.147, 0.150, 0.161), "#8": (0.173, 0.177, 0.194), "#10": (0.201, 0.206, 0.221),
         "1/4": (0.266, 0.281, 0.312), "1/2": (0.531, 0.562, 0.625)}

# ASME B18.22.1, Type B: size: (inside, outside, thickness) [in]  # from memory
WASHERS_N = {"#4": (0.125, 0.250, 0.032), "#8": (0.188, 0.375, 0.040), "#10": (0.203, 0.406, 0.040),
             "1/4": (0.281, 0.500, 0.063), "1/2": (0.531, 0.875, 0.063)}
WASHERS_R = {"#10": (0.203, 0.562, 0.040), "1/4": (0.281, 0.734, 0.063), "1/2": (0.531, 1.250, 0.100)}


@pytest.mark.parametrize("size, values", HOLES.items())
def test_clearance_holes(size, values):
    for series, alias, v in zip(("fine", "medium", "coarse"), ("close", "normal", "loose"), values, strict=True):
        assert threads.clearance_hole(size, series) / IN == pytest.approx(v, abs=5e-4)
        assert threads.clearance_hole(size, alias) == threads.clearance_hole(size, series)


@pytest.mark.parametrize("size, values", WASHERS_N.items())
def test_narrow_washers_under_socket_heads(size, values):
    w = threads.washer(size, "socket")
    assert (w.d1 / IN, w.d2 / IN, w.h / IN) == pytest.approx(values, abs=5e-4)
    assert w.standard == "ASME B18.22.1 N"


@pytest.mark.parametrize("size, values", WASHERS_R.items())
def test_regular_washers_under_hex_heads(size, values):
    w = threads.washer(size, "hex")
    assert (w.d1 / IN, w.d2 / IN, w.h / IN) == pytest.approx(values, abs=5e-4)


def test_every_unified_size_has_hole_and_washer():
    for name in threads.thread_names():
        t = threads.thread(name)
        if t.system != "unified":
            continue
        assert threads.clearance_hole(t.size, "medium") > t.d
        for head in ("hex", "socket"):
            w = threads.washer(t.size, head)
            assert t.d < w.d1 < w.d2


def test_astm_a574():
    # ASTM A574: tensile 180 ksi (≤ 1/2 in), 170 ksi (> 1/2 in); 1 ksi = 6.894757 MPa  # from memory
    assert threads.property_class("ASTM A574", 0.19 * IN).Rm == pytest.approx(180 * 6.894757, abs=0.1)
    assert threads.property_class("A574", 0.625 * IN).Rm == pytest.approx(170 * 6.894757, abs=0.1)


def test_sae_grade_below_quarter_inch_names_the_choices():
    with pytest.raises(Exception, match="ASTM A574"):
        ScrewJointInput.from_mapping({"thread": "#8-32", "property_class": "SAE 5", "head": "socket",
                                      "layers": [{"thickness": "3 mm", "material": "EN AW-6082-T6"}],
                                      "engagement": "8 mm", "housing_material": "EN AC-46000"})


@pytest.mark.parametrize("extra", [{}, {"washer": True}, {"hole": "close"}, {"property_class": "ASTM A574"}])
def test_number_8_cover_as_a_new_user_writes_it(extra):
    # four #8-32 socket head cap screws in an aluminium cover: no hole diameter typed
    m = {"thread": "#8-32 UNC", "head": "socket", "layers": [{"thickness": "3 mm", "material": "EN AW-6082-T6"}],
         "engagement": "10 mm", "housing_material": "EN AC-46000", "count": 4, "bolt_circle": "2.5 in",
         "axial_force": "100 lbf", **extra}
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        r = evaluate(ScrewJointInput.from_mapping(m))
    expect = 0.173 if extra.get("hole") == "close" else 0.177   # close / normal fit (B18.2.8, #8)
    assert r.dh / IN == pytest.approx(expect, abs=5e-4)
    assert "lbf·in" in r.tightening_instruction
