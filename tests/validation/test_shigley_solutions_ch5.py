"""Budynas & Nisbett, Shigley's Mechanical Engineering Design, Solutions Manual, Chapter 5.

Two worked press-fit solutions, read in a stored copy of the printed manual (chapter 5, p. 139):

* Problem 5-35 — steel tubes 25/50/75 mm (inner member hollow), diametral interference 0.02 mm,
  E = 207 GPa, Shigley eq. (3-57): p = 19.41 MPa; inner member at the interface σt = −32.35 MPa,
  σr = −19.41 MPa, von Mises 28.20 MPa; outer member σt = 50.47 MPa, von Mises 62.48 MPa.
* Part (b) of the problem before it — a solid inner member, 1 in in a 1.5 in ring, diametral
  interference 0.0005 in, E = 30 Mpsi: p = 4167 psi; outer member σt = 10 830 psi, von Mises
  13 410 psi; inner member σt = σr = −4167 psi, von Mises 4167 psi.

The manual multiplies its rounded pressure (four digits) by the Lamé factors, so its stresses carry
that rounding (up to 0.03 %) besides their own last digit: the engine's exact values are held to
the printed ones within that, and the manual's own chain, started from the printed pressure,
reproduces each printed digit. Smoothing is set to zero (the manual neglects roughness).
The inch problem goes through the unit-aware layer in inch and psi (NIST SP 811: 1 in = 25.4 mm,
1 psi = 6.894757e-3 MPa).
"""

import warnings

import pytest

from fitcheck.core import lame
from fitcheck.errors import MethodRangeWarning
from fitcheck.pressfit import PressFitInput, evaluate

PSI = 6.894757e-3  # MPa per psi, NIST SP 811


def _steel(E):
    return {"name": "steel", "group": "steel", "E": E, "nu": 0.3, "alpha": "11.5e-6 1/K",
            "Rp02": "400 MPa", "Rm": "600 MPa", "density": "7850 kg/m**3"}


def _run(**m):
    inp = PressFitInput.from_mapping({"length": "20 mm", "smoothing_factor": 0.0, **m})
    with warnings.catch_warnings():
        warnings.simplefilter("ignore", MethodRangeWarning)
        return evaluate(inp)


def test_problem_5_35_hollow_inner_member():
    r = _run(interference_min="0.02 mm", interference_max="0.02 mm", diameter="50 mm",
             shaft_bore="25 mm", hub_outer_diameter="75 mm",
             shaft_material=_steel("207 GPa"), hub_material=_steel("207 GPa"))
    c = r.tightest_assembly
    # Shigley solutions manual, ch. 5, problem 5-35: p = 19.41 MPa
    assert c.pressure == pytest.approx(19.41, abs=0.005)
    # problem 5-35: inner member sigma_t = -32.35, sigma_r = -19.41, von Mises 28.20 MPa
    assert c.shaft_sigma_t_surface == pytest.approx(-32.35, rel=5e-4)
    assert c.shaft_sigma_r_surface == pytest.approx(-19.41, abs=0.005)
    vm_inner = lame.von_mises(c.shaft_sigma_r_surface, c.shaft_sigma_t_surface)
    assert vm_inner == pytest.approx(28.20, rel=5e-4)
    # problem 5-35: outer member sigma_t = 50.47, von Mises 62.48 MPa
    assert c.hub_sigma_t_bore == pytest.approx(50.47, rel=5e-4)
    assert c.hub_von_mises_bore == pytest.approx(62.48, rel=5e-4)
    # the manual's chain from its rounded pressure gives each printed stress digit
    p = 19.41
    st_i = lame.shaft_stresses(p, 50.0, 25.0, 25.0)[1]
    st_o = lame.hub_stresses(p, 50.0, 75.0, 25.0)[1]
    assert round(st_i, 2) == -32.35 and round(st_o, 2) == 50.47
    # ... and its von Mises figures from its rounded stresses (Shigley eq. (5-13))
    assert round(lame.von_mises(-p, -32.35), 2) == 28.20
    assert round(lame.von_mises(-p, 50.47), 2) == 62.48


def test_problem_before_5_35_part_b_solid_inner_member_in_inch():
    r = _run(interference_min="0.0005 in", interference_max="0.0005 in", diameter="1 in",
             hub_outer_diameter="1.5 in", shaft_material=_steel("30e6 psi"),
             hub_material=_steel("30e6 psi"))
    c = r.tightest_assembly
    # Shigley solutions manual, ch. 5, part (b) before problem 5-35: p = 4167 psi
    assert c.pressure / PSI == pytest.approx(4167.0, abs=0.5)
    # outer member sigma_t = 10 830 psi, von Mises 13 410 psi (four digits printed)
    assert c.hub_sigma_t_bore / PSI == pytest.approx(10830.0, abs=5.0)
    assert c.hub_von_mises_bore / PSI == pytest.approx(13410.0, abs=5.0)
    # inner member: sigma_t = sigma_r = -4167 psi, von Mises 4167 psi
    assert c.shaft_sigma_t_surface / PSI == pytest.approx(-4167.0, abs=0.5)
    assert c.shaft_von_mises_max / PSI == pytest.approx(4167.0, abs=0.5)
    assert r.shaft_stress_max / PSI == pytest.approx(4167.0, abs=0.5)
