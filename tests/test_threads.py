"""Fastener look-ups: thread parsing, ISO 724 dimensions, classes, heads, holes, washers, factors."""

import pytest

from fitcheck import threads
from fitcheck.errors import InputError

# ISO 724:1993, basic dimensions: d2 (pitch) and D1 (minor, internal) [mm]  # from memory
ISO724 = {
    "M3": (2.675, 2.459), "M4": (3.545, 3.242), "M5": (4.480, 4.134), "M6": (5.350, 4.917),
    "M8": (7.188, 6.647), "M10": (9.026, 8.376), "M12": (10.863, 10.106), "M16": (14.701, 13.835),
    "M20": (18.376, 17.294), "M24": (22.051, 20.752), "M8x1": (7.350, 6.917), "M10x1.25": (9.188, 8.647),
    "M12x1.5": (11.026, 10.376),
}
# ISO 898-1 / DIN 13-1: minor diameter of the external thread d3 [mm]  # from memory
D3 = {"M6": 4.773, "M8": 6.466, "M10": 8.160, "M12": 9.853, "M16": 13.546, "M20": 16.933, "M24": 20.319}


@pytest.mark.parametrize("name, dims", sorted(ISO724.items()))
def test_iso724_d2_and_D1(name, dims):
    t = threads.thread(name)
    assert t.d2 == pytest.approx(dims[0], abs=6e-4)
    assert t.D1 == pytest.approx(dims[1], abs=6e-4)


@pytest.mark.parametrize("name, d3", sorted(D3.items()))
def test_d3(name, d3):
    assert threads.thread(name).d3 == pytest.approx(d3, abs=6e-4)


@pytest.mark.parametrize("text, designation", [
    ("M5", "M5"), ("m6 x 0.75", "M6x0.75"), ("M6X0.75", "M6x0.75"), ("M8x1.25", "M8"),
    ("#10-24 UNC", "#10-24 UNC"), ("#10-24", "#10-24 UNC"), ("1/4-20 unc", "1/4-20 UNC"),
    ("1/4-28", "1/4-28 UNF"), ("1-8 UNC", "1-8 UNC"),
])
def test_thread_parsing(text, designation):
    assert threads.thread(text).designation == designation


def test_unknown_thread_suggests():
    with pytest.raises(InputError, match="did you mean 'M6'"):
        threads.thread("M6x2")
    with pytest.raises(InputError, match="thread"):
        threads.thread("")


def test_table_coverage():
    names = threads.thread_names()
    for size in ("M1.6", "M2", "M2.5", "M3", "M4", "M5", "M6", "M8", "M10", "M12", "M16", "M20", "M24"):
        assert size in names
    assert "#0-80 UNF" in names and "1-12 UNF" in names and "#1-64 UNC" in names


def test_property_class_names_and_inch_grades():
    for name in ("4.6", "4.8", "5.6", "5.8", "6.8", "8.8", "9.8", "10.9", "12.9", "A2-70", "A4-70",
                 "A4-80", "SAE 2", "SAE 5", "SAE 8"):
        assert threads.property_class(name, 10.0).name == name
    # SAE J429: grade 5, 1/4 to 1 in: proof 85 ksi, yield 92 ksi, tensile 120 ksi  # from memory
    g5 = threads.property_class("grade 5", 12.7)
    assert (g5.Sp, g5.Rp02, g5.Rm) == pytest.approx((85 * 6.894757, 92 * 6.894757, 120 * 6.894757), abs=0.06)
    # SAE J429 grade 8: proof 120 ksi, tensile 150 ksi  # from memory
    assert threads.property_class("SAE8", 20.0).Sp == pytest.approx(120 * 6.894757, abs=0.06)
    # #10 is below the J429 range (1/4 in and up): refused, naming the grade that applies
    with pytest.raises(InputError, match="ASTM A574"):
        threads.property_class("SAE 5", 4.83)
    with pytest.raises(InputError, match="did you mean"):
        threads.property_class("8.9", 10.0)


def test_iso3506_stainless():
    # ISO 3506-1: A2-70 Rm 700, Rp0.2 450; A4-80 Rm 800, Rp0.2 600 MPa  # from memory
    a2 = threads.property_class("a2-70", 8.0)
    a4 = threads.property_class("A4-80", 8.0)
    assert (a2.Rm, a2.Rp02, a4.Rm, a4.Rp02) == (700, 450, 800, 600)
    assert a2.stainless


def test_heads_holes_washers():
    # ISO 4762: dk max M8 = 13 mm; ISO 4017: s = 13 mm for M8  # from memory
    assert threads.head("socket", "M8").dk == 13.0
    assert threads.head("hex", "M8").dk == 13.0
    assert threads.head("hex", "M8").dw < 13.0
    # ISO 273: M8 fine 8.4, medium 9, coarse 10 mm  # from memory
    assert [threads.clearance_hole("M8", s) for s in ("fine", "medium", "coarse")] == [8.4, 9.0, 10.0]
    # ISO 7089 M8: 8.4 x 16 x 1.6; ISO 7092 M8: 8.4 x 15 x 1.6  # from memory
    assert threads.washer("M8", "hex") == threads.Washer("ISO 7089", 8.4, 16.0, 1.6)
    assert threads.washer("M8", "socket").d2 == 15.0
    with pytest.raises(InputError, match="pan heads are tabulated"):
        threads.head("pan", "M16")
    with pytest.raises(InputError, match="did you mean 'socket'"):
        threads.head("sockethead", "M8")


def test_factors_and_embedding():
    # VDI 2230-1:2015 Table A8: torque wrench, friction estimated: 1.6 … 2.0  # from memory
    assert threads.tightening_factor("torque wrench estimated friction")[:2] == (1.6, 2.0)
    # Table A8: yield- and angle-controlled 1.2 … 1.4, hydraulic tensioning 1.2 … 1.6, impact wrench
    # with adjustment 2.5 … 4  # from memory
    assert threads.tightening_factor("yield_controlled")[:2] == (1.2, 1.4)
    assert threads.tightening_factor("angle_controlled")[:2] == (1.2, 1.4)
    assert threads.tightening_factor("hydraulic_tensioning")[:2] == (1.2, 1.6)
    assert threads.tightening_factor("impact_wrench_adjusted")[:2] == (2.5, 4.0)
    with pytest.raises(InputError, match="did you mean"):
        threads.tightening_factor("torque_wrench")
    # VDI 2230-1:2015 Table 5: Rz < 10, axial: thread 3, head 2.5, interface 1.5 um  # from memory
    assert threads.embedding_amounts(6.3, "axial") == (0.003, 0.0025, 0.0015)
    assert threads.embedding_amounts(63.0, "shear") == (0.003, 0.0065, 0.0035)
    with pytest.raises(InputError, match="160"):
        threads.embedding_amounts(200.0)
    # VDI 2230-1:2015 Table A5: friction class B 0.08 … 0.16  # from memory
    assert threads.friction_class("b") == (0.08, 0.16)
