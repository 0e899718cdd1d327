"""Elastic-plastic hub (fitcheck.core.elastoplastic) against an independent numerical solution.

Independent solution (no closed form of the module enters it): the elastic, perfectly plastic
thick cylinder under the yield condition σt − σr = κ·ReA (κ = 2/√3, DIN 7190-1:2017; κ = 1,
Tresca), plane stress, on an elastic shaft.

* elastic zone of the hub, c ≤ r ≤ b: scipy.integrate.solve_bvp on the plane-stress
  displacement equation u_ss − u = 0 (r = eˢ; Timoshenko & Goodier, 3rd ed., § 28) with a free
  outer surface σr(b) = 0 and yield at its inner radius, σt − σr = κ·ReA at r = c;
* plastic zone, a ≤ r ≤ c: scipy.integrate.solve_ivp on radial equilibrium dσr/dr = (σt − σr)/r
  with σt − σr = κ·ReA, and on the kinematics of the flow rule of that yield condition
  (εr^p = −εt^p): d(r·u)/dr = r·(1 − ν)(σr + σt)/E, both started from the elastic zone at r = c;
* shaft: solve_bvp on the same displacement equation with σr = −p at its surface and a free bore
  (a solid shaft as a pin-hole of 10⁻⁴·d, as in test_lame_solve_bvp.py);
* the elastic–plastic boundary c is found by scipy.optimize.brentq so that 2·(u_hub − u_shaft)
  at the joint equals the interference.

The closed form must agree to 1e-4 (relative) in pressure and plastic-zone diameter over a
grid of Q_A = d/D_o, interference and yield strength.
"""

import numpy as np
import pytest
from scipy.integrate import solve_bvp, solve_ivp
from scipy.optimize import brentq

from fitcheck.core import elastoplastic as ep
from fitcheck.core import lame

STEEL = (210000.0, 0.30)
ALU = (70000.0, 0.33)
BRONZE = (110000.0, 0.34)


def _ring_bvp(r_in, r_out, E, nu, bc_in, bc_out):
    """Plane-stress ring: returns u(r_in), u_s(r_in), u(r_out), u_s(r_out) (u_s = r·du/dr)."""
    s0, s1 = np.log(r_in), np.log(r_out)
    L = s1 - s0

    def f(t, y):
        return np.vstack([L * y[1], L * y[0]])

    def bc(ya, yb):
        return np.array([bc_in(r_in, ya[0], ya[1]), bc_out(r_out, yb[0], yb[1])])

    t = np.linspace(0.0, 1.0, 41)
    sol = solve_bvp(f, bc, t, np.zeros((2, t.size)), tol=1e-10, max_nodes=100000)
    assert sol.success, sol.message
    return sol.y[0, 0], sol.y[1, 0], sol.y[0, -1], sol.y[1, -1]


def _sig_r(E, nu, r, u, us):
    return E / (1 - nu**2) * (us + nu * u) / r


def _sig_t(E, nu, r, u, us):
    return E / (1 - nu**2) * (u + nu * us) / r


def numerical_fit(delta, d, di, Do, shaft, hub, Re, kappa):
    """(p, Dpl) of the elastic-plastic fit from the numerical solution; None if the hub stays elastic."""
    Es, nus = shaft
    Eh, nuh = hub
    a, b = d / 2.0, Do / 2.0
    k = kappa * Re

    def hub_state(c):
        # elastic zone: sigma_r(b) = 0, sigma_t - sigma_r = k at c
        uc, usc, _, _ = _ring_bvp(
            c, b, Eh, nuh,
            lambda r, u, us: (_sig_t(Eh, nuh, r, u, us) - _sig_r(Eh, nuh, r, u, us)) / k - 1.0,
            lambda r, u, us: _sig_r(Eh, nuh, r, u, us) / k)
        src = _sig_r(Eh, nuh, c, uc, usc)
        if c - a < 1e-12 * a:
            return -src, uc
        sol = solve_ivp(lambda r, y: [k / r, r * (1 - nuh) * (2 * y[0] + k) / Eh],
                        (c, a), [src, c * uc], rtol=1e-12, atol=1e-14)
        sr_a, ru_a = sol.y[:, -1]
        return -sr_a, ru_a / a

    # shaft: linear elastic, so one solution under a unit pressure serves every p
    ri = max(di / 2.0, 1e-4 * a)
    _, _, u_unit, _ = _ring_bvp(ri, a, Es, nus, lambda r, u, us: _sig_r(Es, nus, r, u, us),
                                lambda r, u, us: _sig_r(Es, nus, r, u, us) + 1.0)

    def shaft_u(p):
        return p * u_unit

    def residual(c):
        p, uh = hub_state(c)
        return 2.0 * (uh - shaft_u(p)) - delta

    lo, hi = a * (1 + 1e-10), b * (1 - 1e-9)
    if residual(lo) >= 0.0:
        return None
    c = brentq(residual, lo, hi, xtol=1e-13 * b, rtol=1e-13)
    return hub_state(c)[0], 2.0 * c


CASES = []
for qa in (0.35, 0.55, 0.75):
    for frac in (0.15, 0.5, 0.85):
        for Re, hub in ((120.0, ALU), (280.0, BRONZE), (650.0, STEEL)):
            CASES.append((qa, frac, Re, hub, 0.0))
CASES += [(0.5, 0.5, 280.0, ALU, 0.5), (0.6, 0.3, 400.0, STEEL, 0.7), (0.4, 0.7, 200.0, BRONZE, 0.3)]


GRID = [(*c, ep.KAPPA_DIN) for c in CASES] + [(*c, ep.KAPPA_TRESCA) for c in CASES[::4]]


@pytest.mark.parametrize("qa,frac,Re,hub,qi,kappa", GRID)
def test_closed_form_matches_numerical_solution(qa, frac, Re, hub, qi, kappa):
    d = 30.0
    Do, di = d / qa, qi * d
    args = (d, di, Do, *STEEL, *hub, Re)
    # interference between the onset of yield and the fully plastic hub (frac of the way in Dpl)
    Dpl_target = d * (Do / d) ** frac
    delta = ep.interference_at_zone(Dpl_target, *args, kappa=kappa)
    num = numerical_fit(delta, d, di, Do, STEEL, hub, Re, kappa)
    assert num is not None
    p_num, Dpl_num = num
    p = ep.contact_pressure(delta, *args, kappa=kappa)
    Dpl = ep.plastic_zone_diameter(delta, *args, kappa=kappa)
    assert p == pytest.approx(p_num, rel=1e-4)
    assert Dpl == pytest.approx(Dpl_num, rel=1e-4)


@pytest.mark.parametrize("qa,Re,hub", [(0.5, 300.0, ALU), (0.7, 500.0, STEEL)])
def test_elastic_hub_is_found_elastic_by_the_numerical_solution(qa, Re, hub):
    d = 20.0
    Do = d / qa
    p_el = ep.elastic_limit_pressure(d, Do, Re)
    delta = 0.9 * p_el * d * (lame.compliance_hub(d, Do, *hub) + lame.compliance_shaft(d, 0.0, *STEEL))
    assert numerical_fit(delta, d, 0.0, Do, STEEL, hub, Re, ep.KAPPA_DIN) is None
    assert ep.plastic_zone_diameter(delta, d, 0.0, Do, *STEEL, *hub, Re) == d
    assert ep.contact_pressure(delta, d, 0.0, Do, *STEEL, *hub, Re) == pytest.approx(
        lame.contact_pressure(delta, d, 0.0, Do, *STEEL, *hub), rel=1e-12)
