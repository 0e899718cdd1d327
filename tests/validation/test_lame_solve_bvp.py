"""Lamé closed forms against an independent numerical solution of the axisymmetric elasticity problem.

Independent solution: scipy.integrate.solve_bvp on the plane-stress displacement equation

    d/dr [ (1/r) d(r·u)/dr ] = −(1 − ν²)·ρ·ω²·r / E

in shaft and hub, with σr = E/(1 − ν²)·(u' + ν·u/r), free inner surface of the shaft,
free outer surface of the hub, and at the joint u_h − u_s = δ/2 and σr continuous
(Timoshenko & Goodier, Theory of Elasticity, 3rd ed., §§ 28 and 32). No closed form enters
the numerical solution. With the substitution r = exp(s) the equation becomes
u_ss − u = −k·exp(3s), which has no singular point; a solid shaft is modelled by a pin-hole
of 10⁻⁴·d, whose effect on the joint is of order (10⁻⁴)² — far below the 1e-6 tolerance.
"""

import numpy as np
import pytest
from scipy.integrate import solve_bvp

from fitcheck.core import lame

STEEL = (210000.0, 0.30, 7.85e-9)
ALU = (70000.0, 0.33, 2.70e-9)
BRONZE = (110000.0, 0.34, 8.80e-9)
CAST = (110000.0, 0.26, 7.25e-9)


def _solve_fit(delta, d, di, Do, shaft, hub, omega=0.0):
    """Contact pressure and stress functions from solve_bvp (no closed form used)."""
    Es, nus, rhos = shaft
    Eh, nuh, rhoh = hub
    c = max(di / 2.0, 1e-4 * d / 2.0)
    R, b = d / 2.0, Do / 2.0
    s0, s1, s2 = np.log(c), np.log(R), np.log(b)
    Ls, Lh = s1 - s0, s2 - s1
    ks = (1 - nus**2) * rhos * omega**2 / Es
    kh = (1 - nuh**2) * rhoh * omega**2 / Eh

    def f(t, y):  # y = [u_s, du_s/ds, u_h, du_h/ds], t in [0, 1] for both parts
        ss = s0 + t * Ls
        sh = s1 + t * Lh
        return np.vstack([Ls * y[1], Ls * (y[0] - ks * np.exp(3 * ss)),
                          Lh * y[3], Lh * (y[2] - kh * np.exp(3 * sh))])

    def sig_r(E, nu, r, u, us):  # us = du/ds = r du/dr
        return E / (1 - nu**2) * (us + nu * u) / r

    def bc(ya, yb):
        return np.array([
            sig_r(Es, nus, c, ya[0], ya[1]),                                  # free shaft bore
            sig_r(Eh, nuh, b, yb[2], yb[3]),                                  # free hub outside
            ya[2] - yb[0] - delta / 2.0,                                      # u_h - u_s = delta/2
            sig_r(Eh, nuh, R, ya[2], ya[3]) - sig_r(Es, nus, R, yb[0], yb[1]),  # sigma_r continuous
        ])

    t = np.linspace(0.0, 1.0, 401)
    sol = solve_bvp(f, bc, t, np.zeros((4, t.size)), tol=1e-10, max_nodes=200000)
    assert sol.success, sol.message

    def shaft_at(r):
        tt = (np.log(r) - s0) / Ls
        u, us = sol.sol(tt)[0], sol.sol(tt)[1]
        sr = Es / (1 - nus**2) * (us + nus * u) / r
        st = Es / (1 - nus**2) * (u / r + nus * us / r)
        return sr, st, u

    def hub_at(r):
        tt = (np.log(r) - s1) / Lh
        u, us = sol.sol(tt)[2], sol.sol(tt)[3]
        sr = Eh / (1 - nuh**2) * (us + nuh * u) / r
        st = Eh / (1 - nuh**2) * (u / r + nuh * us / r)
        return sr, st, u

    p = -hub_at(np.array([R]))[0][0]
    return p, shaft_at, hub_at


# (delta, d, di, Do, shaft, hub): >= 5 geometries incl. hollow shafts and dissimilar materials
GEOMETRIES = [
    (0.020, 20.0, 0.0, 40.0, STEEL, STEEL),      # solid steel in steel
    (0.035, 35.0, 0.0, 60.0, STEEL, ALU),        # steel shaft, aluminium hub
    (0.030, 30.0, 15.0, 55.0, STEEL, STEEL),     # hollow shaft
    (0.050, 50.0, 30.0, 120.0, STEEL, CAST),     # hollow shaft in a cast-iron hub
    (0.012, 12.0, 0.0, 16.0, STEEL, BRONZE),     # thin bronze ring
    (0.040, 62.0, 50.0, 72.0, ALU, STEEL),       # thin hollow aluminium shaft, thin steel ring
]


@pytest.mark.parametrize("delta,d,di,Do,shaft,hub", GEOMETRIES)
def test_contact_pressure_matches_numerical_solution(delta, d, di, Do, shaft, hub):
    p_num, _, _ = _solve_fit(delta, d, di, Do, shaft, hub)
    # independent solution: scipy.integrate.solve_bvp on the axisymmetric displacement ODE
    di_eff = di if di > 0 else 1e-4 * d  # the numerical model's pin-hole, see module docstring
    p = lame.contact_pressure(delta, d, di_eff, Do, shaft[0], shaft[1], hub[0], hub[1])
    assert p == pytest.approx(p_num, rel=1e-6)
    if di == 0:  # the pin-hole changes a solid shaft's pressure by far less than 1e-6
        p_solid = lame.contact_pressure(delta, d, 0.0, Do, shaft[0], shaft[1], hub[0], hub[1])
        assert p_solid == pytest.approx(p_num, rel=1e-6)


@pytest.mark.parametrize("delta,d,di,Do,shaft,hub", GEOMETRIES)
def test_wall_stresses_and_displacements_match(delta, d, di, Do, shaft, hub):
    p_num, shaft_at, hub_at = _solve_fit(delta, d, di, Do, shaft, hub)
    p = lame.contact_pressure(delta, d, di, Do, shaft[0], shaft[1], hub[0], hub[1])
    rh = np.linspace(d / 2, Do / 2, 7)
    sr_n, st_n, u_n = hub_at(rh)
    sr, st = lame.hub_stresses(p, d, Do, rh)
    scale = abs(p_num)
    # independent solution: scipy.integrate.solve_bvp on the axisymmetric displacement ODE
    np.testing.assert_allclose(sr, sr_n, rtol=0, atol=1e-6 * scale)
    np.testing.assert_allclose(st, st_n, rtol=1e-6, atol=1e-6 * scale)
    np.testing.assert_allclose(lame.hub_radial_displacement(p, d, Do, rh, hub[0], hub[1]), u_n,
                               rtol=1e-6)
    growth = lame.hub_outer_diameter_change(p, d, Do, hub[0])
    assert growth == pytest.approx(2 * u_n[-1], rel=1e-6)
    if di > 0:
        rs = np.linspace(di / 2, d / 2, 7)
        sr_n, st_n, u_n = shaft_at(rs)
        sr, st = lame.shaft_stresses(p, d, di, rs)
        np.testing.assert_allclose(sr, sr_n, rtol=0, atol=1e-6 * scale)
        np.testing.assert_allclose(st, st_n, rtol=1e-6)
        np.testing.assert_allclose(lame.shaft_radial_displacement(p, d, di, rs, shaft[0], shaft[1]),
                                   u_n, rtol=1e-6)
        assert lame.shaft_bore_diameter_change(p, d, di, shaft[0]) == pytest.approx(2 * u_n[0], rel=1e-6)


@pytest.mark.parametrize("delta,d,di,Do,shaft,hub", GEOMETRIES[:4])
def test_rotating_fit_superposition_matches_numerical_solution(delta, d, di, Do, shaft, hub):
    omega = 1500.0  # rad/s, about 14 300 rpm
    p_num, _, hub_at = _solve_fit(delta, d, di, Do, shaft, hub, omega=omega)
    di_eff = di if di > 0 else 1e-4 * d
    loss = lame.centrifugal_interference_loss(omega, d, di_eff, Do, shaft[0], shaft[1], shaft[2],
                                              hub[0], hub[1], hub[2])
    p = lame.contact_pressure(delta - loss, d, di_eff, Do, shaft[0], shaft[1], hub[0], hub[1])
    # independent solution: scipy.integrate.solve_bvp with the centrifugal body force
    assert p == pytest.approx(p_num, rel=1e-6)
    # hoop stress at the hub bore = Lamé + free rotating disc (superposition)
    st_n = hub_at(np.array([d / 2]))[1][0]
    st = lame.hub_stresses(p, d, Do, d / 2)[1] + lame.rotating_disc_stresses(
        hub[2], omega, hub[1], d, Do, d / 2)[1]
    assert st == pytest.approx(st_n, rel=1e-6)


def _solve_free_disc(rho, omega, E, nu, di, do):
    a = max(di / 2, 1e-4 * do / 2)
    s0, s1 = np.log(a), np.log(do / 2)
    L = s1 - s0
    k = (1 - nu**2) * rho * omega**2 / E

    def f(t, y):
        return np.vstack([L * y[1], L * (y[0] - k * np.exp(3 * (s0 + t * L)))])

    def bc(ya, yb):
        return np.array([(ya[1] + nu * ya[0]), (yb[1] + nu * yb[0])])

    t = np.linspace(0, 1, 201)
    sol = solve_bvp(f, bc, t, np.zeros((2, t.size)), tol=1e-10, max_nodes=100000)
    assert sol.success

    def at(r):
        u, us = sol.sol((np.log(r) - s0) / L)
        return E / (1 - nu**2) * (us + nu * u) / r, E / (1 - nu**2) * (u + nu * us) / r, u

    return at


@pytest.mark.parametrize("di,do", [(20.0, 40.0), (10.0, 100.0), (40.0, 48.0)])
def test_free_rotating_disc_matches_numerical_solution(di, do):
    rho, omega, E, nu = 7.85e-9, 2000.0, 210000.0, 0.3
    at = _solve_free_disc(rho, omega, E, nu, di, do)
    r = np.linspace(di / 2, do / 2, 9)
    sr_n, st_n, u_n = at(r)
    sr, st = lame.rotating_disc_stresses(rho, omega, nu, di, do, r)
    scale = np.max(np.abs(st_n))
    # independent solution: scipy.integrate.solve_bvp with the centrifugal body force
    np.testing.assert_allclose(sr, sr_n, rtol=0, atol=1e-6 * scale)
    np.testing.assert_allclose(st, st_n, rtol=1e-6)
    np.testing.assert_allclose(lame.rotating_disc_radial_displacement(rho, omega, E, nu, di, do, r),
                               u_n, rtol=1e-6)


def test_solid_rotating_disc_against_timoshenko_closed_form():
    # Timoshenko & Goodier, 3rd ed., § 32: solid disc, sigma_r = sigma_t = (3+nu)/8·rho·w²·b² at the
    # centre; at the rim sigma_r = 0 and sigma_t = (1-nu)/4·rho·w²·b²
    rho, omega, nu, b = 7.85e-9, 3000.0, 0.3, 50.0
    base = rho * omega**2 * b**2
    sr0, st0 = lame.rotating_disc_stresses(rho, omega, nu, 0.0, 2 * b, 0.0)
    assert sr0 == pytest.approx((3 + nu) / 8 * base, rel=1e-12)
    assert st0 == pytest.approx((3 + nu) / 8 * base, rel=1e-12)
    srb, stb = lame.rotating_disc_stresses(rho, omega, nu, 0.0, 2 * b, b)
    assert srb == pytest.approx(0.0, abs=1e-12 * base)
    assert stb == pytest.approx((1 - nu) / 4 * base, rel=1e-12)
    # solid disc from solve_bvp (pin-hole 1e-4·b): stress at mid-radius
    at = _solve_free_disc(rho, omega, 210000.0, nu, 0.0, 2 * b)
    sr_n, st_n, _ = at(np.array([b / 2]))
    sr, st = lame.rotating_disc_stresses(rho, omega, nu, 0.0, 2 * b, b / 2)
    assert sr == pytest.approx(sr_n[0], rel=1e-6)
    assert st == pytest.approx(st_n[0], rel=1e-6)


def test_thin_ring_rotating_hoop_stress():
    # Shigley, 10th ed., sec. 3-15: a thin rotating ring has sigma_t -> rho·w²·r² (limit of eq. 3-55)
    rho, omega, r = 7.85e-9, 1000.0, 100.0
    st = lame.rotating_disc_stresses(rho, omega, 0.3, 2 * r * (1 - 1e-5), 2 * r * (1 + 1e-5), r)[1]
    assert st == pytest.approx(rho * omega**2 * r**2, rel=1e-4)


# ---- the whole-joint kernel at speed, against the same independent solution -----------------

@pytest.mark.parametrize("delta,d,di,Do,shaft,hub", GEOMETRIES[:4])
def test_joint_kernel_stresses_at_speed_match_numerical_solution(delta, d, di, Do, shaft, hub):
    from fitcheck.core.pressfit import evaluate

    omega = 1500.0  # rad/s
    di_eff = di if di > 0 else 1e-4 * d  # the numerical model's pin-hole (module docstring)
    r = evaluate(interference_min=delta, interference_max=delta, d=d, L=20.0, di=di_eff, Do=Do,
                 Es=shaft[0], nus=shaft[1], rhos=shaft[2], Rps=1e4, Eh=hub[0], nuh=hub[1],
                 rhoh=hub[2], Rph=1e4, mu_slip=0.1, smoothing=0.0, omega=omega)
    # independent solution: scipy.integrate.solve_bvp, at standstill and at speed; the kernel
    # reports the tighter of the two (von Mises at the hub bore) and the shaft's largest
    vm_hub, vm_shaft = [], []
    for w in (0.0, omega):
        _, shaft_at, hub_at = _solve_fit(delta, d, di, Do, shaft, hub, omega=w)
        sr, st, _ = hub_at(np.array([d / 2]))
        vm_hub.append(float(np.sqrt(sr[0] ** 2 + st[0] ** 2 - sr[0] * st[0])))
        if di > 0:  # the pin-hole of a 'solid' shaft carries a stress concentration: hollow only
            sr, st, _ = shaft_at(np.array([di / 2, d / 2]))
            vm_shaft.append(float(np.max(np.sqrt(sr**2 + st**2 - sr * st))))
    assert float(r["hub_stress_max"]) == pytest.approx(max(vm_hub), rel=1e-6)
    if di > 0:
        assert float(r["shaft_stress_max"]) == pytest.approx(max(vm_shaft), rel=1e-6)
    p_num_op = _solve_fit(delta, d, di, Do, shaft, hub, omega=omega)[0]
    assert float(r["p_min_op"]) == pytest.approx(p_num_op, rel=1e-6)


@pytest.mark.parametrize("delta,d,di,Do,shaft,hub", GEOMETRIES[:4])
def test_loosening_speed_zeroes_the_numerical_pressure(delta, d, di, Do, shaft, hub):
    di_eff = di if di > 0 else 1e-4 * d
    w = lame.loosening_speed(delta, d, di_eff, Do, shaft[0], shaft[1], shaft[2], hub[0], hub[1], hub[2])
    p0 = _solve_fit(delta, d, di, Do, shaft, hub)[0]
    # independent solution: scipy.integrate.solve_bvp with the centrifugal body force at the
    # speed the closed form names: the contact pressure is zero there (linear, may go negative)
    p_w = _solve_fit(delta, d, di, Do, shaft, hub, omega=w)[0]
    assert abs(p_w) <= 1e-6 * p0
    p_below = _solve_fit(delta, d, di, Do, shaft, hub, omega=0.9 * w)[0]
    assert p_below == pytest.approx(p0 * (1 - 0.81), rel=1e-5)  # the loss grows with omega²
