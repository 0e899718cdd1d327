"""Bearing-seat engine: recommendation, fit analysis, clearance reduction, thermal effects, errors."""

import math

import numpy as np
import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

from fitcheck import bearings
from fitcheck.bearings import BearingSeatInput, bearing, evaluate, recommend_seats
from fitcheck.core import bearing as core
from fitcheck.errors import InputError, InputErrors

# An aluminium housing alloy held inline (the inline-material path; the tabulated housing alloy
# EN AC-46000 is tested below): E 70 GPa, nu 0.33, alpha 23e-6/K — typical wrought aluminium,
# Shigley 10th ed., Table A-5 # from memory
ALU = {"name": "Al alloy", "group": "aluminium", "E": "70 GPa", "nu": 0.33, "alpha": "23e-6 1/K",
       "Rp02": "240 MPa", "Rm": "290 MPa", "density": "2700 kg/m**3"}


def seat(**kw):
    return evaluate(BearingSeatInput.from_mapping({"designation": "6204", "shaft": "k5",
                                                   "housing": "H7", **kw}))


# --------------------------------------------------------------------------- recommendation

@pytest.mark.parametrize(("des", "load", "level", "shaft", "housing"), [
    ("6204", "rotating_inner", "light", "j6", "H7"),    # DIN 5425-1, circumferential load, light, 18-100 # from memory
    ("6204", "rotating_inner", "normal", "k5", "H7"),   # DIN 5425-1, circumferential load, normal, 18-100 # from memory
    ("6204", "rotating_inner", "heavy", "m5", "H7"),    # DIN 5425-1, circumferential load, heavy, 18-100 # from memory
    ("625", "rotating_inner", "normal", "js5", "H7"),   # DIN 5425-1, normal load, d <= 10 mm # from memory
    ("6204", "point_inner", "normal", "h6", "N7"),      # DIN 5425-1, point load on inner ring # from memory
    ("6204", "point_inner", "light", "h6", "M7"),       # DIN 5425-1, circumferential load on outer ring # from memory
])
def test_recommendation_steel_housing(des, load, level, shaft, housing):
    r = recommend_seats(des, load, level)
    assert (r.shaft, r.housing) == (shaft, housing)


def test_light_alloy_housing_one_class_tighter():
    # common practice: a light-alloy housing takes a tighter class than steel (loosens warm)
    steel = recommend_seats("6204", "point_inner", "normal")
    alu = recommend_seats("6204", "point_inner", "normal", housing_material=ALU)
    assert (steel.housing, alu.housing) == ("N7", "P7")
    assert alu.housing_group == "light_alloy"


def test_load_ratio_split():
    # DIN 5425-1 (from memory): light P/C <= 0.05, normal <= 0.10, heavy above
    assert recommend_seats("6204", load_ratio=0.05).load_level == "light"
    assert recommend_seats("6204", load_ratio=0.0501).load_level == "normal"
    assert recommend_seats("6204", load_ratio=0.10).load_level == "normal"
    assert recommend_seats("6204", load_ratio=0.11).load_level == "heavy"


def test_auto_uses_recommendation_and_override_wins():
    r = evaluate(BearingSeatInput.from_mapping({"designation": "6204", "load_level": "heavy"}))
    assert (r.shaft_class, r.housing_class) == ("m5", "H7")
    r = evaluate(BearingSeatInput.from_mapping({"designation": "6204", "load_level": "heavy",
                                                "shaft": "k5"}))
    assert (r.shaft_class, r.recommended_shaft) == ("k5", "m5")


# --------------------------------------------------------------------------- seat limits

def test_fit_limits_from_iso286_and_iso492():
    r = seat()
    # ISO 286-2:2010, k5 over 18 up to 30 mm: +11/+2 µm; H7 over 30 up to 50 mm: +25/0 µm # from memory
    # ISO 492:2014 Normal: bore 18-30 mm 0/-10 µm, outside 30-50 mm 0/-11 µm # from memory
    assert r.shaft_interference_um == (2.0, 21.0)       # 11 - (-10) = 21; 2 - 0 = 2
    assert r.housing_clearance_um == (0.0, 36.0)        # 25 - (-11) = 36; 0 - 0 = 0
    assert r.bore_deviation_um == (0.0, -10.0)
    assert r.outside_deviation_um == (0.0, -11.0)


def test_smoothing_din7190():
    # DIN 7190-1:2017, 6.2: G = 0.8 (Rz_i + Rz_a)
    r = seat(rz_shaft="4 um", rz_ring="2 um")
    assert r.smoothing_inner_um == pytest.approx(0.8 * (4 + 2))
    assert r.shaft_interference_effective_um[1] == pytest.approx(21 - 4.8)


# --------------------------------------------------------------------------- ring deformation

def test_hand_calculation_6204_k5():
    """Shigley 10th ed., eq. (3-56) and the thick-ring displacement, written out by hand."""
    r = seat()
    # 1. tightest pairing: 21 µm (ISO 286 k5 + ISO 492 Normal), smoothing 0.8 (2.5 + 1.6) = 3.28 µm
    delta = (21.0 - 0.8 * (2.5 + 1.6)) / 1000.0          # 0.01772 mm
    # 2. equivalent inner ring: d = 20, d_ie = 20 + (47 - 20)/4 = 26.75 mm (rule stated in the module)
    d, d_ie = 20.0, 26.75
    # 3. compliances: ring 100Cr6 E 208 GPa, nu 0.3; shaft C45E E 210 GPa, nu 0.3 (solid)
    k_ring = ((d_ie**2 + d**2) / (d_ie**2 - d**2) + 0.3) / 208000.0   # (1115.5625/315.5625 + 0.3)/E
    k_shaft = (1.0 - 0.3) / 210000.0
    p = delta / (d * (k_ring + k_shaft))                              # ≈ 40.70 MPa
    assert p == pytest.approx(40.695, abs=0.005)                      # hand arithmetic, 5 digits
    # 4. raceway growth of a ring under internal pressure: 2 p d² d_ie / (E (d_ie² − d²))
    growth_um = 1000.0 * 2.0 * p * d**2 * d_ie / (208000.0 * (d_ie**2 - d**2))
    assert growth_um == pytest.approx(13.27, abs=0.01)
    # 5. hoop stress at the bore: p (d_ie² + d²)/(d_ie² − d²)
    hoop = p * (d_ie**2 + d**2) / (d_ie**2 - d**2)
    assert hoop == pytest.approx(143.9, abs=0.1)
    # the engine: outer ring has clearance (H7), so the whole loss comes from the inner ring
    assert r.contact_pressure_inner_MPa[1] == pytest.approx(p, rel=1e-9)
    assert r.fitup_reduction_um[1] == pytest.approx(growth_um, rel=1e-9)
    assert r.ring_hoop_stress_max_MPa == pytest.approx(hoop, rel=1e-9)
    # 6. operating clearance, group N 5 … 20 µm (ISO 5753-1 18-24 mm # from memory)
    assert r.operating_clearance_um[0] == pytest.approx(5.0 - growth_um, rel=1e-9)


@pytest.mark.parametrize("des", ["6204", "6205", "6206", "6005", "6010", "6210", "61805",
                                 "16004", "6304"])
def test_rule_of_thumb_70_to_90_percent(des):
    # common practice: a solid steel shaft passes roughly 70 … 90 % of the effective
    # interference on to the inner raceway
    b = bearing(des)
    d_ie, _ = core.equivalent_ring_diameters(b.d, b.D)
    delta = 0.015
    _, growth, _ = core.inner_ring_fit(delta, b.d, 0.0, d_ie, 210000.0, 0.3, 208000.0, 0.3)
    assert 0.70 <= growth / delta <= 0.90


def test_hollow_shaft_passes_less():
    # Shigley eq. (3-56): a bored shaft is more compliant, so the ring expands less
    solid, hollow = seat(), seat(shaft_bore="12 mm")
    assert hollow.fitup_reduction_um[1] < solid.fitup_reduction_um[1]


def test_outer_ring_contraction_against_independent_solution():
    # independent solution: scipy solve_bvp of d/dr[(1/r) d(r u)/dr] = 0 in both parts, plane stress
    from scipy.integrate import solve_bvp

    E1, nu1, E2, nu2 = 208000.0, 0.3, 70000.0, 0.33
    a, b, c = 40.25 / 2, 47.0 / 2, 70.0 / 2     # ring bore (equivalent), seat, housing outer radius
    delta_r = 0.010 / 2                          # radial interference [mm]

    def sr(u, du, r, E, nu):
        return E / (1 - nu**2) * (du + nu * u / r)

    def solve(E, nu, r0, r1, u_bc):
        def f(r, y):
            return np.vstack([y[1], -y[1] / r + y[0] / r**2])
        x = np.linspace(r0, r1, 50)
        return solve_bvp(f, lambda ya, yb: u_bc(ya, yb), x, np.zeros((2, x.size)), tol=1e-10)

    # unknown contact pressure p: find it so that u_housing(b) - u_ring(b) = delta_r
    from scipy.optimize import brentq

    def gap(p):
        ring = solve(E1, nu1, a, b, lambda ya, yb: [sr(ya[0], ya[1], a, E1, nu1),
                                                    sr(yb[0], yb[1], b, E1, nu1) + p])
        hous = solve(E2, nu2, b, c, lambda ya, yb: [sr(ya[0], ya[1], b, E2, nu2) + p,
                                                    sr(yb[0], yb[1], c, E2, nu2)])
        return hous.sol(b)[0] - ring.sol(b)[0] - delta_r, ring
    p = brentq(lambda p: gap(p)[0], 0.1, 200.0, xtol=1e-12)
    contraction_bvp = -2 * gap(p)[1].sol(a)[0]
    p_k, contraction = core.outer_ring_fit(0.010, 47.0, 40.25, 70.0, E1, nu1, E2, nu2)
    assert p_k == pytest.approx(p, rel=1e-5)
    assert contraction == pytest.approx(contraction_bvp, rel=1e-5)


@settings(max_examples=60, deadline=None)
@given(st.floats(0.0, 0.06), st.floats(0.0, 0.06), st.sampled_from(["6204", "6010", "61805", "6304"]))
def test_reduction_monotone_in_interference(d1, d2, des):
    b = bearing(des)
    d_ie, D_oe = core.equivalent_ring_diameters(b.d, b.D)
    lo, hi = sorted((d1, d2))
    g_lo = core.inner_ring_fit(lo, b.d, 0.0, d_ie, 210e3, 0.3, 208e3, 0.3)[1]
    g_hi = core.inner_ring_fit(hi, b.d, 0.0, d_ie, 210e3, 0.3, 208e3, 0.3)[1]
    c_lo = core.outer_ring_fit(lo, b.D, D_oe, np.inf, 208e3, 0.3, 210e3, 0.3)[1]
    c_hi = core.outer_ring_fit(hi, b.D, D_oe, np.inf, 208e3, 0.3, 210e3, 0.3)[1]
    assert g_lo <= g_hi and c_lo <= c_hi
    assert g_hi <= hi + 1e-15   # the raceway never grows by more than the interference


def test_tighter_class_takes_more_clearance():
    red = [seat(shaft=c).fitup_reduction_um[1] for c in ("j6", "k5", "m5", "n6")]
    assert red == sorted(red)


# --------------------------------------------------------------------------- thermal

def test_ring_temperature_difference():
    # common practice: clearance loss alpha (ti - to) dm, dm = (20 + 47)/2 = 33.5 mm
    r = seat(temperature_inner="60 degC", temperature_outer="50 degC", housing="G7")
    assert r.ring_temperature_reduction_um == pytest.approx(11.5e-6 * 10 * 33.5 * 1000)


@settings(max_examples=40, deadline=None)
@given(st.floats(25.0, 110.0), st.sampled_from(["6204", "6005", "61905", "6304"]))
def test_aluminium_housing_loosens_warm(t, des):
    inp = {"designation": des, "shaft": "k5", "housing": "N7", "housing_material": ALU,
           "temperature_inner": f"{t} degC", "temperature_outer": f"{t} degC"}
    r = evaluate(BearingSeatInput.from_mapping(inp))
    assert r.thermal_change_outer_um < 0
    assert r.housing_interference_operating_um[0] < r.housing_interference_effective_um[0]
    cold = evaluate(BearingSeatInput.from_mapping({**inp, "temperature_inner": "-20 degC",
                                                   "temperature_outer": "-20 degC"}))
    assert cold.thermal_change_outer_um > 0


def test_aluminium_housing_loses_grip_warm_check():
    # 6204 in P7 (ISO 286-2: -42/-17 µm over 30 up to 50 mm # from memory), Al housing,
    # circumferential load on the outer ring: 47 mm × (23 - 11.5)e-6/K × 60 K = 32.4 µm lost
    inp = {"designation": "6204", "load": "point_inner", "shaft": "h6", "housing": "P7",
           "housing_material": ALU, "housing_wall": "8 mm", "rz_housing": "1.6 um"}
    cold = evaluate(BearingSeatInput.from_mapping(inp))
    warm = evaluate(BearingSeatInput.from_mapping({**inp, "temperature_inner": "80 degC"}))
    assert warm.thermal_change_outer_um == pytest.approx(-47 * 11.5e-6 * 60 * 1000)
    grip = [c for c in warm.checks if c.name.startswith("rotating-load ring")]
    assert grip and not grip[0].passed
    grip_cold = [c for c in cold.checks if c.name.startswith("rotating-load ring")]
    assert grip_cold and grip_cold[0].passed


def test_steel_shaft_same_expansion_no_change():
    r = seat(temperature_inner="70 degC")
    # shaft and ring both about 11.5e-6/K: no thermal change of the inner seat
    assert abs(r.thermal_change_inner_um) < 1e-9


# --------------------------------------------------------------------------- verdicts

def test_smallest_group_passes_and_the_one_below_fails():
    r = seat(clearance_min="2 um", temperature_inner="50 degC", temperature_outer="40 degC")
    g = r.smallest_passing_group
    assert g in bearings.CLEARANCE_GROUPS
    ok = seat(clearance_group=g, clearance_min="2 um", temperature_inner="50 degC",
              temperature_outer="40 degC")
    assert ok.checks[0].passed
    i = bearings.CLEARANCE_GROUPS.index(g)
    if i > 0:
        below = seat(clearance_group=bearings.CLEARANCE_GROUPS[i - 1], clearance_min="2 um",
                     temperature_inner="50 degC", temperature_outer="40 degC")
        assert not below.checks[0].passed


def test_clearance_fit_gives_zero_pressure_and_no_negative_capacity():
    r = seat(shaft="g6", axial_location="none", axial_force="100 N")
    assert r.contact_pressure_inner_MPa == (0.0, 0.0)
    assert r.axial_capacity_inner_N == 0.0
    held = [c for c in r.checks if c.name.startswith("axial force held")]
    assert len(held) == 2 and not held[0].passed


def test_axial_retention_by_friction():
    # DIN 7190-1:2017, 7: F = mu p pi d B at the loosest pairing
    r = seat(shaft="n6", housing="N7", axial_location="none", axial_force="50 N")
    p = r.contact_pressure_inner_MPa[0]
    # DIN 7190-1:2017, friction table: steel/steel longitudinal press fit, oiled, 0.08 # from memory
    assert r.friction_inner == 0.08
    assert r.axial_capacity_inner_N == pytest.approx(0.08 * p * math.pi * 20 * 14)
    assert not any(c.name.startswith("axial") for c in seat(axial_force="50 N").checks)
    given = seat(shaft="n6", housing="N7", axial_location="none", axial_force="50 N", friction=0.1)
    assert given.axial_capacity_inner_N == pytest.approx(0.1 * p * math.pi * 20 * 14)


def test_seat_friction_follows_the_housing_material():
    # DIN 7190-1:2017, friction table: steel/light alloy longitudinal press fit, oiled, 0.05 # from memory
    r = seat(housing="P7", housing_material="EN AC-46000", axial_location="none", axial_force="50 N")
    assert (r.friction_inner, r.friction_outer) == (0.08, 0.05)
    p = r.contact_pressure_outer_MPa[0]
    assert r.axial_capacity_outer_N == pytest.approx(0.05 * p * math.pi * 47 * 14)


def test_angular_contact_warns_and_skips_clearance():
    from fitcheck.errors import MethodRangeWarning

    with pytest.warns(MethodRangeWarning, match="angular-contact"):
        r = evaluate(BearingSeatInput.from_mapping({"designation": "7205B", "shaft": "k5",
                                                    "housing": "J7"}))
    assert not any(c.name.startswith("operating radial") for c in r.checks)
    assert math.isnan(r.operating_clearance_um[0])
    assert '"operating_clearance_um": [\n    null' in r.to_json()


# --------------------------------------------------------------------------- inputs

def test_round_trip_with_inline_material():
    inp = BearingSeatInput.from_mapping({
        "name": "A-side", "designation": "6005", "shaft": "k5", "housing": "auto",
        "housing_material": ALU, "housing_outer_diameter": "70 mm", "temperature_inner": "65 degC",
        "temperature_housing": "55 degC", "axial_force": "120 N", "axial_location": "circlip",
        "clearance_min": "1 um", "load_ratio": 0.07, "tolerance_class": "6", "clearance_group": "C3"})
    assert BearingSeatInput.from_mapping(inp.to_mapping()) == inp
    assert set(inp.to_mapping()) <= set(bearings.KEYS)


def test_inch_equals_mm():
    # NIST SP 811: 1 in = 25.4 mm exactly
    a = seat(housing_outer_diameter="2.75 in", shaft_bore="0.25 in", housing="N7")
    b = seat(housing_outer_diameter="69.85 mm", shaft_bore="6.35 mm", housing="N7")
    assert a.operating_clearance_um == pytest.approx(b.operating_clearance_um, rel=1e-12)


def test_unknown_designation_did_you_mean():
    with pytest.raises(InputError, match="did you mean '6204'"):
        bearing("6204X2")
    with pytest.raises(InputError, match="did you mean"):
        BearingSeatInput.from_mapping({"designation": "62O5"})


def test_shaft_class_not_defined_at_that_size():
    # ISO 286-1:2010, Table 2: fundamental deviation cd only up to 10 mm # from memory
    with pytest.raises(InputError, match="shaft.*defined at 20 mm"):
        BearingSeatInput.from_mapping({"designation": "6204", "shaft": "cd6"})


def test_negative_kelvin_rejected():
    with pytest.raises(InputError, match="absolute zero"):
        BearingSeatInput.from_mapping({"designation": "6204", "temperature_inner": "-5 K"})


def test_all_problems_collected_with_field_names():
    with pytest.raises(InputErrors) as e:
        BearingSeatInput.from_mapping({"designation": "6204", "shaft": "K5", "housng": "H7",
                                       "clearance_group": "C9", "load_ratio": 0.02,
                                       "load_level": "heavy"}, "bearing[A]")
    fields = {x.field for x in e.value.errors}
    assert {"bearing[A].shaft", "bearing[A].housng", "bearing[A].clearance_group",
            "bearing[A].load_level"} <= fields
    assert any("did you mean 'housing'" in x.message for x in e.value.errors)


def test_housing_diameter_must_exceed_D():
    with pytest.raises(InputError, match="larger than the bearing's D = 47"):
        BearingSeatInput.from_mapping({"designation": "6204", "housing_outer_diameter": "45 mm"})


# --------------------------------------------------------------------------- review additions

def test_ring_material_is_the_table_row():
    from fitcheck import materials

    ring = bearings.ring_material()
    assert ring == materials.get("100Cr6")
    # through-hardened bearing steel: E 208 GPa, nu 0.3, alpha 11.5e-6/K (typical values # from memory)
    assert (ring.E, ring.nu, ring.alpha) == (208000.0, 0.3, pytest.approx(11.5e-6, rel=1e-12))
    assert ring.max_heating_C == 120.0  # heating for mounting: about 120 degC at most # common practice


def test_tabulated_aluminium_housing_alloy():
    # EN AC-46000 (AlSi9Cu3(Fe) die casting) from data/materials.csv is a light-alloy housing:
    # DIN 5425-1 rows for light alloy, one class tighter than steel (common practice)
    r = seat(housing="auto", housing_material="EN AC-46000", temperature_inner="60 degC")
    assert r.housing_group == "light_alloy" and r.housing_class == "J7"
    # the warm housing opens its bore: 47 mm x (21.0 - 11.5)e-6/K x 40 K
    assert r.thermal_change_outer_um == pytest.approx(-47 * (21.0 - 11.5) * 1e-6 * 40 * 1000, rel=1e-9)


def test_smoothing_never_widens_a_clearance():
    # DIN 7190-1:2017, 6.2: smoothing is lost interference; a seat with clearance has no contact,
    # so its clearance stays as the tolerances give it (H7 0/+25 with the outer ring 0/-11 um)
    r = seat()
    assert r.housing_interference_effective_um == (-36.0, 0.0)
    assert r.shaft_interference_effective_um[0] == 0.0   # 2 um interference < 3.28 um smoothing


def test_worst_case_clearance_explained_with_passing_group():
    """6204 k5/H7, group N: the arithmetic worst case loses all clearance; the note says why and what passes."""
    r = seat()
    d, d_ie, E_r, E_s = 20.0, 26.75, 208000.0, 210000.0

    def growth_um(u_um):  # Shigley 10th ed., eq. (3-56) and the ring's bore-pressure growth, by hand
        k = ((d_ie**2 + d**2) / (d_ie**2 - d**2) + 0.3) / E_r + (1 - 0.3) / E_s
        p = u_um / 1000.0 / (d * k)
        return 1000.0 * 2 * p * d**2 * d_ie / (E_r * (d_ie**2 - d**2))

    smoothing = 0.8 * (2.5 + 1.6)                       # DIN 7190-1:2017, 6.2
    worst = 5.0 - growth_um(21.0 - smoothing)           # ISO 5753-1 N over 18 up to 24 mm: 5 ... 20 # from memory
    mid = 12.5 - growth_um((2.0 + 21.0) / 2 - smoothing)
    assert r.operating_clearance_um[0] == pytest.approx(worst, rel=1e-9)
    assert r.operating_clearance_mid_um == pytest.approx(mid, rel=1e-9)
    assert worst < 0 < mid
    # C3 (13 ... 28 um) misses by a fraction of a micrometre, C4 (20 ... 36 um) passes # from memory
    assert 13.0 - growth_um(21.0 - smoothing) < 0 < 20.0 - growth_um(21.0 - smoothing)
    assert r.smallest_group_worst_case == "C4"
    assert r.smallest_passing_group == "N"   # the verdict is the mean clearance (probable combination)
    note = next(n for n in r.notes if n.startswith("group N loses its clearance only in the arithmetic worst case"))
    assert "k5 +11 um" in note and "-10 um" in note and "Group C4" in note and "C3 leaves -0.3 um" in note
    assert f"{mid:.1f} um" in note
    clearance = next(c for c in r.checks if c.name.startswith("operating radial clearance"))
    assert clearance.passed and clearance.value == pytest.approx(mid, rel=1e-9)
    assert "worst case -8.3 um (information)" in clearance.note


def test_loose_rotating_ring_fails_at_mid_tolerance():
    # ISO 286-2:2010, h6 over 18 up to 30 mm: 0/-13 um # from memory; with the bore 0/-10 um the
    # seat is -13 ... +10 um, -1.5 um at mid-tolerance: a ring under circumferential load creeps
    r = seat(shaft="h6")
    grip = next(c for c in r.checks if c.name.startswith("rotating-load ring is an interference fit"))
    assert grip.value == pytest.approx(-1.5) and not grip.passed and not r.ok
    assert any("can creep" in n for n in r.notes)
