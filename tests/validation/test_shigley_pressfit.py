"""Shigley's Mechanical Engineering Design, 10th ed. (Budynas, Nisbett): press and shrink fits.

* Example 3-15 — two steel tubes 40/45/50 mm shrunk together, diametral interference 0.062 mm,
  E = 207 GPa: p = 15.8 MPa, tangential stress −135 MPa in the inner tube and 151 MPa in the
  outer tube at the interface (printed to three digits).            # from memory
* Example 7-7 — gear on a shaft, 35 H7/s6, hub outer diameter 60 mm, length 50 mm, both steel
  (E = 207 GPa), μ = 0.3: δ = 0.018 … 0.059 mm, p_min = 35.1 MPa, p_max = 115.1 MPa, torque
  1013 N·m (from the rounded p_min); gear σt = 233.8 MPa, σr = −115.1 MPa at the bore,
  von Mises 307.8 MPa, n = 600/307.8 = 1.95; shaft von Mises 115.1 MPa, n = 390/115.1 = 3.39.
                                                                   # from memory
Shigley neglects surface roughness: these checks use smoothing = 0. The tolerances match the
digits printed; the book rounds intermediate values (Example 7-7 computes the torque from the
rounded p_min = 35.1 MPa; the exact value is 1014 N·m, 0.1 % off, within the tolerance used).
"""

import numpy as np
import pytest

from fitcheck.core import lame
from fitcheck.core.pressfit import evaluate

E_STEEL = 207000.0  # Shigley, 10th ed., Table A-5, carbon steel 207 GPa


def test_example_3_15_shrunk_tubes():
    d, di, Do, delta = 45.0, 40.0, 50.0, 0.062
    p = lame.contact_pressure(delta, d, di, Do, E_STEEL, 0.292, E_STEEL, 0.292)
    # Shigley, 10th ed., Example 3-15: p = 15.8 MPa                          # from memory
    assert p == pytest.approx(15.8, abs=0.05)
    # same material: Poisson's ratio cancels (Shigley eq. (3-57))
    assert p == pytest.approx(lame.contact_pressure(delta, d, di, Do, E_STEEL, 0.0, E_STEEL, 0.0),
                              rel=1e-12)
    st_inner = lame.shaft_stresses(p, d, di, d / 2)[1]
    st_outer = lame.hub_stresses(p, d, Do, d / 2)[1]
    # Shigley, 10th ed., Example 3-15: sigma_it = -135 MPa, sigma_ot = 151 MPa  # from memory
    # the book multiplies its rounded p = 15.8 MPa (exact 15.796) by the Lamé factors, so the
    # printed stresses carry that rounding (0.03 %) plus their own: 0.5 % tolerance
    assert st_inner == pytest.approx(-135.0, rel=5e-3)
    assert st_outer == pytest.approx(151.0, rel=5e-3)
    # and the book's own chain from the rounded pressure reproduces both printed figures
    assert round(float(lame.shaft_stresses(15.8, d, di, d / 2)[1])) == -135
    assert round(float(lame.hub_stresses(15.8, d, Do, d / 2)[1])) == 151


@pytest.fixture
def example_7_7():
    # Shigley, 10th ed., Example 7-7: 35 H7/s6, ISO 286-2: H7 0/+25 um, s6 +43/+59 um
    return evaluate(interference_min=0.043 - 0.025, interference_max=0.059, d=35.0, L=50.0,
                    Do=60.0, Es=E_STEEL, nus=0.3, Rps=390.0, Eh=E_STEEL, nuh=0.3, Rph=600.0,
                    mu_slip=0.3, smoothing=0.0, yield_safety=1.0)


def test_example_7_7_pressures(example_7_7):
    r = example_7_7
    # Shigley, 10th ed., Example 7-7: p_min = 35.1 MPa, p_max = 115.1 MPa   # from memory
    assert float(r["p_min"]) == pytest.approx(35.1, abs=0.05)
    assert float(r["p_max"]) == pytest.approx(115.1, abs=0.05)


def test_example_7_7_stresses_and_safeties(example_7_7):
    r = example_7_7
    # Shigley, 10th ed., Example 7-7: gear sigma_t = 233.8 MPa, sigma_r = -115.1 MPa   # from memory
    assert float(r["hub_sigma_t_bore"]) == pytest.approx(233.8, abs=0.1)
    assert float(r["hub_sigma_r_bore"]) == pytest.approx(-115.1, abs=0.05)
    # von Mises 307.8 MPa, n = 1.95 (gear); shaft 115.1 MPa, n = 3.39          # from memory
    assert float(r["hub_stress_max"]) == pytest.approx(307.8, abs=0.3)
    assert float(r["hub_yield_safety"]) == pytest.approx(1.95, abs=0.005)
    assert float(r["shaft_stress_max"]) == pytest.approx(115.1, abs=0.05)
    assert float(r["shaft_yield_safety"]) == pytest.approx(3.39, abs=0.005)


def test_example_7_7_torque(example_7_7):
    # Shigley, 10th ed., Example 7-7, sec. 7-8: T = (pi/2)·f·p·l·d² = 1013 N·m  # from memory
    t = float(example_7_7["torque_capacity_min"]) / 1000.0
    assert t == pytest.approx(1013.0, rel=2e-3)
    # the same formula written out, with the book's rounded pressure
    assert np.pi / 2 * 0.3 * 35.1 * 50.0 * 35.0**2 / 1000 == pytest.approx(1013.0, abs=0.5)
