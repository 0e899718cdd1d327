"""Elastic-plastic press fit: a hand calculation written out step by step, and the limits of the method.

No published worked example of an elastic-plastic press fit could be read for this project, so
the check is a hand calculation with the equations of DIN 7190-1:2017 for the partly plastic hub
(forms recalled — from memory — and derived in fitcheck.core.elastoplastic from equilibrium,
the yield condition σt − σr = (2/√3)·ReA and Lamé). Each intermediate value below was worked
with a pocket calculator to six digits; the tolerance (1e-4) matches those digits.

Joint: solid steel shaft (E = 210 000 MPa, ν = 0.30) in an aluminium hub EN AW-6082-T6
(E = 70 000 MPa, ν = 0.33, Rp0.2 = 260 MPa), d = 20 mm, Do = 30 mm, effective interference
δ = 120 µm.
"""

import math

import numpy as np
import pytest

from fitcheck.core import elastoplastic as ep
from fitcheck.core import lame

ARGS = (20.0, 0.0, 30.0, 210000.0, 0.30, 70000.0, 0.33, 260.0)


def test_hand_calculation_step_by_step():
    d, Do, Re, delta = 20.0, 30.0, 260.0, 0.120
    # 1. Q_A = d/Do = 0.666667, Q_A² = 0.444444
    # 2. k = (2/√3)·ReA = 300.222 MPa
    # 3. onset of yield: p_el = k/2·(1 − Q_A²) = 150.111·0.555556 = 83.3950 MPa
    assert ep.elastic_limit_pressure(d, Do, Re) == pytest.approx(83.3950, rel=1e-4)
    # 4. K_A = ((1 + Q_A²)/(1 − Q_A²) + ν_A)/E_A = (2.6 + 0.33)/70000 = 4.18571e-5 1/MPa
    #    K_I = (1 − ν_I)/E_I = 3.33333e-6 1/MPa
    #    δ_el = p_el·d·(K_A + K_I) = 83.3950·20·4.51905e-5 = 0.0753733 mm < δ: the hub yields
    assert ep.interference_at_zone(d, *ARGS) == pytest.approx(0.0753733, rel=1e-4)
    assert ep.interference_at_zone(d, *ARGS) == pytest.approx(
        83.3950 * d * (lame.compliance_hub(d, Do, 70000.0, 0.33) + lame.compliance_shaft(d, 0.0, 210000.0, 0.3)),
        rel=1e-4)
    # 5. fully plastic: p_full = k·ln(Do/d) = 300.222·0.405465 = 121.730 MPa,
    #    δ_full/d = k/E_A·2.25 + p_full·(K_I − (1 − ν_A)/E_A) = 0.00964999 − 0.000759359 = 0.00889063,
    #    δ_full = 0.177813 mm > δ: the zone stays inside the hub
    assert ep.full_plastic_pressure(d, Do, Re) == pytest.approx(121.730, rel=1e-4)
    assert ep.interference_at_zone(Do, *ARGS) == pytest.approx(0.177813, rel=1e-4)
    # 6. β = (E_A·K_I − (1 − ν_A))/2 = (0.233333 − 0.67)/2 = −0.218333
    #    ξ = δ·E_A/(d·k) = 8400/6004.44 = 1.39896; α = 1 − β·Q_A² = 1.09704
    #    solve 1.09704·x − 0.218333·ln x − 0.218333 = 1.39896 for x = (D_pl/d)²:
    #      x = 1.56: 1.61429 (0.00301 low); slope 1.09704 − 0.218333/1.56 = 0.957077
    #      x = 1.56 + 0.00301/0.957077 = 1.56314 (residual < 1e-5)
    #    D_pl = d·√x = 20·1.25026 = 25.0051 mm
    Dpl = ep.plastic_zone_diameter(delta, *ARGS)
    assert (Dpl / d) ** 2 == pytest.approx(1.56314, rel=1e-4)
    assert Dpl == pytest.approx(25.0051, rel=1e-4)
    # 7. p = k/2·(1 − Q_A²·x + ln x) = 150.111·(1 − 0.694729 + 0.446698) = 112.879 MPa
    #    (the elastic formula would give 0.12/(20·4.51905e-5) = 132.772 MPa)
    assert ep.contact_pressure(delta, *ARGS) == pytest.approx(112.879, rel=1e-4)
    assert lame.contact_pressure(delta, 20.0, 0.0, 30.0, 210000.0, 0.3, 70000.0, 0.33) == pytest.approx(
        132.772, rel=1e-4)
    # 8. depth of the zone (D_pl − d)/2 = 2.50257 mm = 50.05 % of the 5 mm wall
    assert ep.plastic_share(Dpl, d, Do) == pytest.approx(0.500515, rel=1e-4)
    # 9. stresses at the bore: σr = −p, σt = k − p = 187.343 MPa; at D_pl the elastic ring is at yield
    sr, st = ep.hub_stresses(ep.contact_pressure(delta, *ARGS), Dpl, d, Do, np.array([10.0, Dpl / 2 * (1 - 1e-12), Dpl / 2]), Re)
    assert sr[0] == pytest.approx(-112.879, rel=1e-5)
    assert st[0] == pytest.approx(187.343, rel=1e-4)
    assert st[1] - sr[1] == pytest.approx(300.222, rel=1e-4)
    assert st[2] - sr[2] == pytest.approx(300.222, rel=1e-4)   # continuous across the boundary
    assert sr[2] == pytest.approx(sr[1], rel=1e-6)


@pytest.mark.parametrize("qa", [0.2, 0.5, 0.8])
@pytest.mark.parametrize("hub", [(70000.0, 0.33), (210000.0, 0.30)])
def test_onset_of_yield_equals_the_elastic_result(qa, hub):
    d, Do, Re = 25.0, 25.0 / qa, 300.0
    args = (d, 5.0, Do, 210000.0, 0.3, *hub, Re)
    d_el = ep.interference_at_zone(d, *args)
    p_lame = lame.contact_pressure(d_el, d, 5.0, Do, 210000.0, 0.3, *hub)
    # DIN 7190-1: elastic limit of the hub ReA·(1 − QA²)/√3
    assert p_lame == pytest.approx(Re * (1 - qa * qa) / math.sqrt(3.0), rel=1e-12)
    for x in (d_el * (1 - 1e-9), d_el, d_el * (1 + 1e-9)):
        assert ep.contact_pressure(x, *args) == pytest.approx(p_lame, rel=1e-8)
    assert ep.plastic_zone_diameter(d_el * (1 - 1e-9), *args) == d


@pytest.mark.parametrize("qa", [0.3, 0.5, 0.7, 0.9])
def test_fully_plastic_pressure_between_tresca_and_von_mises_bounds(qa):
    d, Re = 20.0, 280.0
    Do = d / qa
    lo = Re * math.log(Do / d)                      # Tresca (Hearn, Mechanics of Materials 2, ch. 3)
    hi = 2.0 / math.sqrt(3.0) * Re * math.log(Do / d)  # von Mises, plane strain
    for kappa in (ep.KAPPA_DIN, ep.KAPPA_TRESCA):
        args = (d, 0.0, Do, 210000.0, 0.3, 110000.0, 0.34, Re)
        p = ep.contact_pressure(10 * ep.interference_at_zone(Do, *args, kappa=kappa), *args, kappa=kappa)
        assert lo * (1 - 1e-12) <= p <= hi * (1 + 1e-12)
        assert ep.plastic_zone_diameter(1e3 * ep.interference_at_zone(Do, *args, kappa=kappa), *args,
                                        kappa=kappa) == pytest.approx(Do, rel=1e-12)
    assert ep.full_plastic_pressure(d, Do, Re) == pytest.approx(hi, rel=1e-12)
    assert ep.full_plastic_pressure(d, Do, Re, kappa=ep.KAPPA_TRESCA) == pytest.approx(lo, rel=1e-12)
