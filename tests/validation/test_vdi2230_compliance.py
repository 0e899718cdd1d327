"""VDI 2230 Part 1:2015, Section 5.1.2.2 — compliance of the clamped parts (substitute cone/sleeve).

Independent solution: scipy.integrate.quad of dz / (E · π/4 · (D(z)² − dh²)) along the
substitute body (cone of half-angle φ, D(z) = dw + 2 z tan φ, capped at D_A), compared with the
closed forms of the guideline and with the layer-by-layer sum.
"""

import math

import numpy as np
import pytest
from scipy.integrate import quad

from fitcheck.core import vdi2230 as core


def _quad_compliance(lK, layers, dw, dh, DA, tphi, tapped):
    """layers: list of (thickness, E) from the head down."""
    bounds = np.cumsum([0.0] + [t for t, _ in layers])

    def E_at(z):
        i = min(np.searchsorted(bounds, z, side="right") - 1, len(layers) - 1)
        return layers[i][1]

    def integrand(z):
        dist = z if tapped else min(z, lK - z)
        D = min(dw + 2.0 * dist * tphi, DA)
        return 1.0 / (E_at(z) * math.pi / 4.0 * (D * D - dh * dh))

    pts = list(bounds[1:-1]) + ([lK / 2.0] if not tapped else [])
    return quad(integrand, 0.0, lK, points=pts or None, limit=200, epsabs=0, epsrel=1e-11)[0]


CASES = [  # (lK, dw, dh, DA, tapped) — cone, cone+sleeve and sleeve regimes, DSV and ESV
    (20.0, 15.0, 11.0, math.inf, False),
    (20.0, 15.0, 11.0, 22.0, False),
    (20.0, 15.0, 11.0, 14.0, False),
    (12.0, 9.38, 6.6, math.inf, True),
    (12.0, 9.38, 6.6, 16.0, True),
    (40.0, 16.63, 13.5, 30.0, True),
]


@pytest.mark.parametrize("lK, dw, dh, DA, tapped", CASES)
def test_closed_form_equals_integral(lK, dw, dh, DA, tapped):
    tphi = float(core.tan_phi(lK, dw, DA, tapped))
    E = 70000.0
    closed = float(core.clamp_compliance_closed_form(lK, E, dw, dh, DA, tphi, tapped))
    layered = float(np.sum(core.clamp_compliance(np.array([0.0]), np.array([lK]), np.array([E]),
                                                 dw, dh, DA, tphi, tapped)))
    # independent solution: scipy.integrate.quad of the substitute body
    num = _quad_compliance(lK, [(lK, E)], dw, dh, DA if math.isfinite(DA) else 1e300, tphi, tapped)
    assert closed == pytest.approx(num, rel=1e-8)
    assert layered == pytest.approx(num, rel=1e-8)


@pytest.mark.parametrize("tapped", [False, True])
def test_three_layers_of_different_materials(tapped):
    layers = [(2.0, 205000.0), (9.0, 70000.0), (6.0, 110000.0)]
    lK = sum(t for t, _ in layers)
    dw, dh, DA = 12.33, 9.0, 24.0
    tphi = float(core.tan_phi(lK, dw, DA, tapped))
    z_bot = np.cumsum([t for t, _ in layers])
    got = float(np.sum(core.clamp_compliance(z_bot - [t for t, _ in layers], z_bot,
                                             np.array([e for _, e in layers]), dw, dh, DA, tphi, tapped)))
    # independent solution: scipy.integrate.quad layer by layer
    assert got == pytest.approx(_quad_compliance(lK, layers, dw, dh, DA, tphi, tapped), rel=1e-8)


def test_shigley_frustum_is_the_same_integral():
    # Shigley 10th ed. eq. (8-20) is the cone integral with φ = 30°, hole = bolt diameter;
    # independent solution: scipy.integrate.quad
    E, d, t, D = 207000.0, 12.0, 20.0, 18.0
    k = float(core.frustum_stiffness(E, d, t, D))
    num = quad(lambda z: 1.0 / (E * math.pi / 4 * ((D + 2 * z * math.tan(math.pi / 6)) ** 2 - d * d)), 0, t)[0]
    assert 1.0 / k == pytest.approx(num, rel=1e-9)


def test_tan_phi_equations():
    # VDI 2230-1:2015, 5.1.2.2: tan φD = 0.362 + 0.032 ln(βL/2) + 0.153 ln y,
    # tan φE = 0.348 + 0.013 ln βL + 0.193 ln y  (equations evaluated by hand)  # from memory
    # D_A = 18 mm lies below D_A,Gr of both joints, where the equations apply as printed
    bl, y = 20.0 / 15.0, 18.0 / 15.0
    tD = 0.362 + 0.032 * math.log(bl / 2) + 0.153 * math.log(y)
    tE = 0.348 + 0.013 * math.log(bl) + 0.193 * math.log(y)
    assert 18.0 < 15.0 + 20.0 * tD and 18.0 < 15.0 + 2 * 20.0 * tE
    assert float(core.tan_phi(20.0, 15.0, 18.0, False)) == pytest.approx(tD, rel=1e-12)
    assert float(core.tan_phi(20.0, 15.0, 18.0, True)) == pytest.approx(tE, rel=1e-12)


@pytest.mark.parametrize("tapped", [False, True])
def test_outer_diameter_beyond_the_cone_changes_nothing(tapped):
    # once D_A exceeds the cone's limiting diameter the cone never reaches it: tan φ and δP equal
    # the wide plate's, and tan φ never falls as D_A grows (this program's reading of 5.1.2.2)
    lK, dw, dh = 8.0, 9.38, 6.6
    DAs = np.array([10.0, 12.0, 14.0, 16.0, 18.0, 25.0, 60.0, 1e3, math.inf])
    t = core.tan_phi(lK, dw, DAs, tapped)
    assert np.all(np.diff(t) >= -1e-15)
    assert t[-2] == pytest.approx(t[-1], rel=1e-12) and t[-3] == pytest.approx(t[-1], rel=1e-12)
    dP = [core.clamp_compliance_closed_form(lK, 70e3, dw, dh, D, x, tapped) for D, x in zip(DAs, t, strict=True)]
    assert dP[-3] == pytest.approx(dP[-1], rel=1e-12)


@pytest.mark.parametrize("tapped", [False, True])
def test_wide_plate_takes_y_at_the_limiting_diameter(tapped):
    # VDI 2230-1:2015, 5.1.2.2: D_A,Gr = dw + w·lK·tan φ (w = 1 DSV, 2 ESV); for a plate without an
    # outer edge this program takes y = D_A,Gr/dw, a fixed point of the tan φ equation (solved
    # here independently with scipy.optimize.brentq)
    from scipy.optimize import brentq

    lK, dw = 14.0, 9.38
    w = 2.0 if tapped else 1.0
    bl = lK / dw

    def tphi(y):
        return (0.348 + 0.013 * math.log(bl) + 0.193 * math.log(y)) if tapped else \
            (0.362 + 0.032 * math.log(bl / 2) + 0.153 * math.log(y))

    y = brentq(lambda y: 1.0 + w * bl * tphi(y) - y, 1.0, 50.0)
    assert float(core.tan_phi(lK, dw, math.inf, tapped)) == pytest.approx(tphi(y), rel=1e-9)
