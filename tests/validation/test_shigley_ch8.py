"""Shigley's Mechanical Engineering Design, chapter 8 — bolt and member stiffness.

Printed numbers of the worked solutions to the chapter-8 problems in the solutions manual of
Budynas & Nisbett, Shigley's Mechanical Engineering Design, 8th ed. (Chapter 8, pp. 211–221):
bolt stiffness eq. (8-17), frustum stiffness eq. (8-20), frusta in series eq. (8-18), and the
exponential fit eq. (8-23) with the constants of Table 8-8. The same equations carry these
numbers in the 10th edition. Each value is printed to four significant figures. No copy of the
manual was at hand when these were typed: every number is recalled (# from memory); the
equations reproduce all of them to their printed digits, which is what the tests check.
"""

import pytest

from fitcheck.core import vdi2230 as core


def _series(*k):
    return 1.0 / sum(1.0 / x for x in k)


def test_bolt_stiffness_m12():
    # Shigley 8th ed. solutions, problem 8-20: kb = 113(84.3)(207)/(113(15) + 84.3(30)) = 466.8 MN/m  # from memory
    assert core.bolt_stiffness_shigley(113.0, 84.3, 207000.0, 30.0, 15.0) / 1000 == pytest.approx(466.8, abs=0.05)
    # problem 8-23: ld = 10 mm, lt = 16 mm -> kb = 744 MN/m
    assert core.bolt_stiffness_shigley(113.0, 84.3, 207000.0, 10.0, 16.0) / 1000 == pytest.approx(744, abs=0.5)


def test_three_frusta_m12_steel_on_cast_iron():
    # Shigley 8th ed. solutions, problem 8-22: upper t = 20, E = 207 GPa, D = 18 -> 4470 MN/m;  # from memory
    # central t = 2.5, D = 41.09, E = 100 GPa -> 52 230 MN/m; lower t = 22.5, D = 18 -> 2074 MN/m;
    # km = 1379 MN/m
    k1 = core.frustum_stiffness(207000.0, 12.0, 20.0, 18.0) / 1000
    k2 = core.frustum_stiffness(100000.0, 12.0, 2.5, 41.09) / 1000
    k3 = core.frustum_stiffness(100000.0, 12.0, 22.5, 18.0) / 1000
    assert k1 == pytest.approx(4470, rel=5e-4)
    assert k2 == pytest.approx(52230, rel=5e-4)
    assert k3 == pytest.approx(2074, rel=5e-4)
    assert _series(k1, k2, k3) == pytest.approx(1379, rel=5e-4)


def test_three_frusta_m10():
    # Shigley 8th ed. solutions, p. 221: d = 10, D = 15: top E = 207, t = 20 -> 3503 MN/m;  # from memory
    # middle E = 96, D = 38.09, t = 2.5 -> 44 044 MN/m; bottom E = 96, t = 22.5 -> 1567 MN/m; km = 1057
    k1 = core.frustum_stiffness(207000.0, 10.0, 20.0, 15.0) / 1000
    k2 = core.frustum_stiffness(96000.0, 10.0, 2.5, 38.09) / 1000
    k3 = core.frustum_stiffness(96000.0, 10.0, 22.5, 15.0) / 1000
    assert (k1, k2, k3) == pytest.approx((3503, 44044, 1567), rel=5e-4)
    assert _series(k1, k2, k3) == pytest.approx(1057, rel=5e-4)


def test_four_frusta_half_inch():
    # Shigley 8th ed. solutions, p. 215 (1/2 in bolt, lbf/in with E in Mpsi): D = 0.75, t = 0.5,  # from memory
    # E = 30 -> 33.30 Mlbf/in; D = 1.327, t = 0.11, E = 14.5 -> 173.8; D = 0.860, t = 0.515,
    # E = 14.5 -> 21.47; D = 0.75, t = 0.095, E = 30 -> 97.27; km = 10.79 Mlbf/in
    d = 0.5
    ks = [core.frustum_stiffness(30e6, d, 0.5, 0.75), core.frustum_stiffness(14.5e6, d, 0.11, 1.327),
          core.frustum_stiffness(14.5e6, d, 0.515, 0.860), core.frustum_stiffness(30e6, d, 0.095, 0.75)]
    assert [k / 1e6 for k in ks] == pytest.approx([33.30, 173.8, 21.47, 97.27], rel=1e-3)
    assert _series(*ks) / 1e6 == pytest.approx(10.79, rel=1e-3)


def test_half_inch_frusta_and_bolt_stiffness_problem_8_25():
    # Shigley 8th ed. solutions, problem 8-25: kb = 0.1419(30)/0.845 = 5.04 Mlbf/in;  # from memory
    # frustum D = 0.75, t = 0.4225, E = 30 -> 36.14 Mlbf/in; D = 0.75, t = 0.25, E = 14.5 -> 23.49
    assert core.bolt_stiffness_shigley(0.19635, 0.1419, 30.0, 0.0, 0.845) == pytest.approx(5.04, abs=0.005)
    assert core.frustum_stiffness(30e6, 0.5, 0.4225, 0.75) / 1e6 == pytest.approx(36.14, rel=1e-3)
    assert core.frustum_stiffness(14.5e6, 0.5, 0.25, 0.75) / 1e6 == pytest.approx(23.49, rel=1e-3)


def test_exponential_fit_problem_8_19():
    # Shigley 8th ed. solutions, problem 8-19, eq. (8-23), Table 8-8: d = 0.625 in, l = 1.5 in;  # from memory
    # grey cast iron A = 0.77871, B = 0.61616, E = 14.5 Mpsi -> 9.12 Mlbf/in;
    # steel A = 0.78715, B = 0.62873, E = 30 Mpsi -> 19.18 Mlbf/in; two halves in series: 12.4 Mlbf/in
    kci = core.member_stiffness_exponential(14.5e6, 0.625, 1.5, 0.77871, 0.61616)
    kst = core.member_stiffness_exponential(30e6, 0.625, 1.5, 0.78715, 0.62873)
    assert kci / 1e6 == pytest.approx(9.12, abs=0.005)
    assert kst / 1e6 == pytest.approx(19.18, abs=0.005)
    assert _series(2 * kci, 2 * kst) / 1e6 == pytest.approx(12.4, abs=0.05)


def test_torque_factor_relation():
    # Shigley 10th ed., eq. (8-27) T = K Fi d with K = 0.2 (Table 8-15, condition not stated)
    from fitcheck import threads

    assert threads.shigley_torque_factor("zinc_plated") == 0.20
    assert core.torque_shigley(0.2, 10000.0, 12.0) == pytest.approx(24000.0)
