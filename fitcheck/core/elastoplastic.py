r"""Elastic-plastic press fits: a partly yielding hub on an elastic shaft (DIN 7190-1:2017).

The hub is of ideally elastic-plastic material (yield strength :math:`R_{eA}`, no
hardening), the shaft stays elastic (solid or hollow). Beyond the elastic limit a plastic
zone grows from the hub bore (diameter :math:`D_F = d`) outward to the diameter
:math:`D_{pl}`; outside it the hub stays elastic up to its outer diameter :math:`D_{aA} = D_o`.
Every function broadcasts over its arguments and works in core units: lengths [mm],
stresses and moduli [MPa].

Model and derivation
--------------------
Plane stress (σz = 0), small strains, uniform pressure, parts of equal length, no end
effects — the model of the elastic design (:mod:`fitcheck.core.lame`). Radii: a = d/2,
c = D_pl/2, b = D_o/2; ratios :math:`Q_A = d/D_o`, :math:`\zeta = D_{pl}/d`.

*Yield criterion.* At the hub bore σt > 0 > σr and σz = 0 lies between them. DIN 7190-1
writes the equivalent stress of the hub bore as :math:`\sqrt3\,p/(1-Q_A^2)`, i.e. the
von Mises stress with the difference of the principal stresses,

.. math:: \sigma_t - \sigma_r = k = \kappa\,R_{eA},\qquad \kappa = 2/\sqrt3 \ (\text{DIN 7190-1}),
          \quad \kappa = 1 \ (\text{Tresca}).

*Plastic zone* (a ≤ r ≤ c). Radial equilibrium :math:`d\sigma_r/dr = (\sigma_t-\sigma_r)/r = k/r`
with :math:`\sigma_r(a) = -p` gives :math:`\sigma_r = -p + k\ln(r/a)`, :math:`\sigma_t = \sigma_r + k`.

*Elastic zone* (c ≤ r ≤ b): a Lamé ring under the pressure :math:`p_c = -\sigma_r(c)`, which is at
yield at its bore: :math:`2p_c b^2/(b^2-c^2) = k`, so :math:`p_c = \tfrac{k}{2}(1 - c^2/b^2)`.

*Pressure* from continuity of σr at c:

.. math:: p = \frac{k}{2}\left[1 - \left(\frac{D_{pl}}{D_o}\right)^2 + 2\ln\frac{D_{pl}}{d}\right]
   \qquad\text{(DIN 7190-1:2017, elastic-plastic hub — form from memory)}

At :math:`D_{pl} = d` it is the elastic limit :math:`p = \tfrac{k}{2}(1-Q_A^2) = R_{eA}(1-Q_A^2)/\sqrt3`;
at :math:`D_{pl} = D_o` the fully plastic pressure :math:`p = k\ln(D_o/d)`.

*Displacement.* The flow rule of the yield condition σt − σr = k (plane stress) gives plastic
strains :math:`\varepsilon_r^p = -\varepsilon_t^p`, so the total strains obey
:math:`\varepsilon_r + \varepsilon_t = (1-\nu)(\sigma_r+\sigma_t)/E` and
:math:`d(r u)/dr = r\,(1-\nu_A)(\sigma_r+\sigma_t)/E_A`. Integrating from c (where u follows from
Lamé) to a gives, after simplification, the bore growth

.. math:: \frac{2u_A}{d} = \frac{k}{E_A}\,\zeta^2 - (1-\nu_A)\,\frac{p}{E_A}.

With the elastic shaft (:math:`2u_I/d = -p\,K_I`, :math:`K_I = [(1+Q_I^2)/(1-Q_I^2) - \nu_I]/E_I`)
the effective diametral interference is

.. math:: \frac{\delta}{d} = \frac{k}{E_A}\zeta^2
          + p\left(K_I - \frac{1-\nu_A}{E_A}\right)

(DIN 7190-1:2017 relative interference of the elastic-plastic fit — form from memory;
derived here). At ζ = 1 both formulas join the elastic Lamé result exactly.

*Solution for a given interference.* With :math:`x = \zeta^2`,
:math:`\beta = (E_A K_I - (1-\nu_A))/2` and :math:`\hat\xi = \delta E_A/(d\,k)` the relation is
:math:`h(x) = (1-\beta Q_A^2)\,x + \beta\ln x + \beta - \hat\xi = 0` on :math:`1 \le x \le Q_A^{-2}`,
strictly increasing there (β > −½). For β ≥ 0, h is concave and Newton's method from the
lower bound :math:`x_0 = \hat\xi/(1+\beta(1-Q_A^2))` (ln x ≤ x − 1) climbs monotonically to the root;
for β < 0 it is convex and Newton from the upper bound :math:`x_0 = \hat\xi/(1+\beta(1-Q_A^2))`
descends monotonically. A fixed number of steps keeps the kernel vectorised.

*Unloading.* A hub that yielded at its largest interference unloads elastically: a state of
smaller interference has :math:`p = p_{peak} - (\delta_{peak} - \delta)/(d K)` with the elastic
compliance K of the joint (reverse yielding not modelled).

*Limit of the plastic zone.* DIN 7190-1:2017 limits how far the plastic zone may reach into
the hub wall. fitcheck expresses the extent as the plastic share of the wall thickness,
:math:`(D_{pl} - d)/(D_o - d)`, and checks it against a permitted share (default 0.3,
from memory, on the failing side); ``plastic_utilisation`` is the share divided by the
permitted share (0 = elastic, 1 = at the limit).

Range of validity: ductile hub (no brittle material), elastic shaft, no hardening, monotonic
loading up to the peak state, centrifugal stresses not superposed on the plastic zone.

References
----------
- DIN 7190-1:2017, Interference fits — Part 1: Calculation and design rules for cylindrical
  self-locking pressure joints; elastic-plastic design of the hub (clause on the
  elastic-plastic range) — equations recalled, not read: marked "from memory".
- Timoshenko & Goodier, Theory of Elasticity, 3rd ed., § 28 (Lamé).
- Hearn, Mechanics of Materials 2, 3rd ed., ch. 3 (plastic yielding of thick cylinders:
  partially plastic cylinder, collapse pressure σy·ln(R2/R1) with Tresca) — from memory.
"""

from __future__ import annotations

import numpy as np

__all__ = [
    "KAPPA_DIN", "KAPPA_TRESCA", "NEWTON_STEPS",
    "elastic_limit_pressure", "full_plastic_pressure", "pressure_at_zone",
    "interference_at_zone", "plastic_zone_diameter", "contact_pressure", "peak_pressure",
    "state_pressures",
    "hub_stresses", "plastic_share",
]

KAPPA_DIN = 2.0 / np.sqrt(3.0)  # σt − σr = (2/√3)·ReA at yield: DIN 7190-1 (√3·p/(1 − QA²) at the bore)
KAPPA_TRESCA = 1.0              # Tresca: σt − σr = ReA
NEWTON_STEPS = 5                # Newton steps always taken; more only where not yet converged


def _a(x):
    return np.asarray(x, dtype=float)


def _out(x):
    x = np.asarray(x)
    return float(x) if x.ndim == 0 else x


def _qa2(d, Do):
    d, Do = _a(d), _a(Do)
    return (d / Do) ** 2  # Do = inf gives 0


def _shaft_compliance(d, di, Es, nus):
    qi2 = (_a(di) / _a(d)) ** 2
    return ((1.0 + qi2) / (1.0 - qi2) - nus) / Es


def elastic_limit_pressure(d, Do, Reh, kappa=KAPPA_DIN):
    r"""Contact pressure at which the hub bore starts to yield, :math:`p = \tfrac{\kappa}{2}R_{eA}(1-Q_A^2)`.

    Parameters
    ----------
    d : float or ndarray
        Joint diameter (hub bore) [mm].
    Do : float or ndarray
        Hub outer diameter [mm]; ``np.inf`` allowed.
    Reh : float or ndarray
        Yield strength of the hub [MPa].
    kappa : float
        Yield criterion σt − σr = κ·ReA: 2/√3 (DIN 7190-1, default) or 1 (Tresca) [-].

    Returns
    -------
    float or ndarray
        Pressure [MPa].

    References
    ----------
    DIN 7190-1:2017, permissible pressure of the hub in the elastic range,
    :math:`p = R_{eA}(1-Q_A^2)/\sqrt3` (with the safety 1) — from memory.

    Examples
    --------
    >>> round(elastic_limit_pressure(20.0, 40.0, 300.0), 3)
    129.904
    """
    return _out(0.5 * kappa * _a(Reh) * (1.0 - _qa2(d, Do)))


def full_plastic_pressure(d, Do, Reh, kappa=KAPPA_DIN):
    r"""Contact pressure of the fully plastic hub, :math:`p = \kappa R_{eA}\ln(D_o/d)`.

    Parameters
    ----------
    d, Do : float or ndarray
        Joint and hub outer diameter [mm] (``np.inf`` gives ``inf``).
    Reh : float or ndarray
        Yield strength of the hub [MPa].
    kappa : float
        Yield criterion factor (see :func:`elastic_limit_pressure`) [-].

    Returns
    -------
    float or ndarray
        Pressure [MPa].

    References
    ----------
    DIN 7190-1:2017 (fully plastic hub) — from memory; Hearn, Mechanics of Materials 2, 3rd ed.,
    ch. 3 (collapse pressure σy·ln(R2/R1), Tresca) — from memory.

    Examples
    --------
    >>> round(full_plastic_pressure(20.0, 40.0, 300.0, kappa=1.0), 3)
    207.944
    """
    with np.errstate(divide="ignore"):
        return _out(kappa * _a(Reh) * np.log(_a(Do) / _a(d)))


def pressure_at_zone(Dpl, d, Do, Reh, kappa=KAPPA_DIN):
    r"""Contact pressure for a plastic zone reaching the diameter ``Dpl``.

    .. math:: p = \frac{\kappa R_{eA}}{2}\left[1 - \left(\frac{D_{pl}}{D_o}\right)^2
              + 2\ln\frac{D_{pl}}{d}\right]

    Parameters
    ----------
    Dpl : float or ndarray
        Diameter of the plastic zone, d ≤ Dpl ≤ Do [mm].
    d, Do : float or ndarray
        Joint and hub outer diameter [mm]; ``np.inf`` allowed for Do.
    Reh : float or ndarray
        Yield strength of the hub [MPa].
    kappa : float
        Yield criterion factor [-].

    Returns
    -------
    float or ndarray
        Pressure [MPa].

    References
    ----------
    DIN 7190-1:2017, elastic-plastic hub — from memory; derived in the module docstring.

    Examples
    --------
    >>> round(pressure_at_zone(25.0, 20.0, 40.0, 300.0), 3)
    182.846
    """
    Dpl = _a(Dpl)
    return _out(0.5 * kappa * _a(Reh) * (1.0 - (Dpl / _a(Do)) ** 2 + 2.0 * np.log(Dpl / _a(d))))


def interference_at_zone(Dpl, d, di, Do, Es, nus, Eh, nuh, Reh, kappa=KAPPA_DIN):
    r"""Effective diametral interference that makes the plastic zone reach ``Dpl``.

    .. math:: \delta = d\left[\frac{\kappa R_{eA}}{E_A}\left(\frac{D_{pl}}{d}\right)^2
              + p\left(K_I - \frac{1-\nu_A}{E_A}\right)\right]

    with p from :func:`pressure_at_zone`.

    Parameters
    ----------
    Dpl : float or ndarray
        Diameter of the plastic zone [mm].
    d, di, Do : float or ndarray
        Joint diameter, shaft bore (0 = solid) and hub outer diameter [mm].
    Es, nus, Eh, nuh : float or ndarray
        Young's moduli [MPa] and Poisson's ratios [-] of shaft and hub.
    Reh : float or ndarray
        Yield strength of the hub [MPa].
    kappa : float
        Yield criterion factor [-].

    Returns
    -------
    float or ndarray
        δ [mm].

    References
    ----------
    DIN 7190-1:2017, relative interference of the elastic-plastic fit — from memory; derived
    in the module docstring.

    Examples
    --------
    At Dpl = d it is the elastic interference at the onset of yield:

    >>> from fitcheck.core import lame
    >>> p = elastic_limit_pressure(20.0, 40.0, 300.0)
    >>> d1 = interference_at_zone(20.0, 20.0, 0.0, 40.0, 210000, 0.3, 70000, 0.33, 300.0)
    >>> round(d1 * 1e3, 4), round(p * 20.0 * (lame.compliance_hub(20.0, 40.0, 70000, 0.33)
    ...     + lame.compliance_shaft(20.0, 0.0, 210000, 0.3)) * 1e3, 4)
    (82.7673, 82.7673)
    """
    k = kappa * _a(Reh)
    p = pressure_at_zone(Dpl, d, Do, Reh, kappa)
    z = _a(Dpl) / _a(d)
    return _out(_a(d) * (k / Eh * z * z + _a(p) * (_shaft_compliance(d, di, Es, nus) - (1.0 - nuh) / Eh)))


def plastic_zone_diameter(delta, d, di, Do, Es, nus, Eh, nuh, Reh, kappa=KAPPA_DIN,
                          steps=NEWTON_STEPS):
    r"""Diameter of the plastic zone for an effective diametral interference (inverse of
    :func:`interference_at_zone`).

    Returns ``d`` while the hub stays elastic and ``Do`` once it is fully plastic.

    Parameters
    ----------
    delta : float or ndarray
        Effective diametral interference [mm].
    d, di, Do : float or ndarray
        Joint diameter, shaft bore and hub outer diameter [mm].
    Es, nus, Eh, nuh : float or ndarray
        Young's moduli [MPa] and Poisson's ratios [-] of shaft and hub.
    Reh : float or ndarray
        Yield strength of the hub [MPa].
    kappa : float
        Yield criterion factor [-].
    steps : int
        Newton steps at least; more (up to 60) only while some element still moves by more
        than 1e-13 relative (monotone convergence, see the module docstring).

    Returns
    -------
    float or ndarray
        D_pl [mm].

    Examples
    --------
    >>> d1 = interference_at_zone(25.0, 20.0, 0.0, 40.0, 210000, 0.3, 70000, 0.33, 300.0)
    >>> round(plastic_zone_diameter(d1, 20.0, 0.0, 40.0, 210000, 0.3, 70000, 0.33, 300.0), 9)
    25.0
    """
    d = _a(d)
    qa2 = _qa2(d, Do)
    k = kappa * _a(Reh)
    beta = 0.5 * (Eh * _shaft_compliance(d, di, Es, nus) - (1.0 - nuh))
    xi = _a(delta) * Eh / (d * k)
    alpha = 1.0 - beta * qa2
    if not np.any(xi > alpha + beta):  # h(1) >= 0 everywhere: every hub stays elastic
        return _out(d * np.ones(np.broadcast(xi, alpha).shape))
    with np.errstate(divide="ignore", invalid="ignore"):
        xmax = np.where(qa2 > 0.0, 1.0 / qa2, np.inf)
        x = np.clip(xi / (alpha + beta), 1.0, xmax)
        for i in range(60):
            h = alpha * x + beta * np.log(x) + beta - xi
            x_new = np.clip(x - h / (alpha + beta / x), 1.0, xmax)
            done = i + 1 >= steps and not np.any(np.abs(x_new - x) > 1e-13 * x_new)
            x = x_new
            if done:
                break
    return _out(d * np.sqrt(x))


def contact_pressure(delta, d, di, Do, Es, nus, Eh, nuh, Reh, kappa=KAPPA_DIN):
    r"""Contact pressure of a press fit with an ideally elastic-plastic hub (first loading).

    Elastic (Lamé) below the onset of yield, :func:`pressure_at_zone` of the plastic zone
    above it, the fully plastic pressure κ·ReA·ln(Do/d) beyond; 0 for a clearance.

    Parameters
    ----------
    delta : float or ndarray
        Effective diametral interference [mm].
    d, di, Do : float or ndarray
        Joint diameter, shaft bore and hub outer diameter [mm].
    Es, nus, Eh, nuh : float or ndarray
        Young's moduli [MPa] and Poisson's ratios [-] of shaft and hub.
    Reh : float or ndarray
        Yield strength of the hub [MPa].
    kappa : float
        Yield criterion factor [-].

    Returns
    -------
    float or ndarray
        p ≥ 0 [MPa].

    Examples
    --------
    Steel shaft in an aluminium hub, 20/40 mm, ReA = 300 MPa: yield starts at about 83 µm;

    >>> [round(contact_pressure(x, 20.0, 0.0, 40.0, 210000, 0.3, 70000, 0.33, 300.0), 2)
    ...  for x in (0.050, 0.100, 0.200)]
    [78.48, 153.17, 217.72]
    """
    Dpl = plastic_zone_diameter(delta, d, di, Do, Es, nus, Eh, nuh, Reh, kappa)
    return _out(_pressure(delta, Dpl, d, di, Do, Es, nus, Eh, nuh, Reh, kappa))


def peak_pressure(delta, d, di, Do, Es, nus, Eh, nuh, Reh, kappa=KAPPA_DIN):
    r"""Pressure and plastic zone diameter at a first loading to ``delta`` (one solution).

    The same numbers as :func:`contact_pressure` and :func:`plastic_zone_diameter`, with the
    iterative solution run once for both.

    Returns
    -------
    (p, Dpl) : tuple
        Contact pressure [MPa] and plastic zone diameter [mm].

    Examples
    --------
    >>> p, dpl = peak_pressure(0.100, 20.0, 0.0, 40.0, 210000, 0.3, 70000, 0.33, 300.0)
    >>> round(p, 2), round(dpl, 3)
    (153.17, 21.94)
    """
    Dpl = plastic_zone_diameter(delta, d, di, Do, Es, nus, Eh, nuh, Reh, kappa)
    return _out(_pressure(delta, Dpl, d, di, Do, Es, nus, Eh, nuh, Reh, kappa)), _out(Dpl)


def _pressure(delta, Dpl, d, di, Do, Es, nus, Eh, nuh, Reh, kappa):
    d = _a(d)
    qa2 = _qa2(d, Do)
    c_p = 1.0 / (d * (((1.0 + qa2) / (1.0 - qa2) + nuh) / Eh + _shaft_compliance(d, di, Es, nus)))
    p_el = _a(delta) * c_p
    p_pl = pressure_at_zone(Dpl, d, Do, Reh, kappa)
    return np.maximum(np.where(_a(Dpl) > d, p_pl, p_el), 0.0)


def state_pressures(delta_a, delta_b, d, di, Do, Es, nus, Eh, nuh, Reh, kappa=KAPPA_DIN, first=True):
    r"""Pressures of two states of one joint (e.g. assembly and operation) with a yielding hub.

    The hub yields at the larger interference of the two, :math:`\delta_{peak}`, and unloads
    elastically to the other:

    .. math:: p(\delta) = \max\left(p_{ep}(\delta_{peak}) - \frac{\delta_{peak}-\delta}{d\,K}, 0\right)

    with K the elastic compliance of the joint (Lamé, Shigley eq. (3-56)).

    Parameters
    ----------
    delta_a, delta_b : float or ndarray
        Effective diametral interferences of both states [mm].
    d, di, Do, Es, nus, Eh, nuh, Reh, kappa
        As :func:`contact_pressure`.
    first : bool
        False skips the first-loading pressure of state a (returned as NaN).

    Returns
    -------
    (p_a_first, p_a, p_b, Dpl) : tuple
        Pressure of state a at its first loading (press-in force), pressures of states a and
        b after the peak [MPa], and the plastic zone diameter of the peak [mm].

    Examples
    --------
    Aluminium hub warmed in operation (interference 100 → 60 µm) unloads elastically:

    >>> pa1, pa, pb, dpl = state_pressures(0.100, 0.060, 20.0, 0.0, 40.0, 210000, 0.3,
    ...                                    70000, 0.33, 300.0)
    >>> round(pa1, 2), round(pb, 2), round(contact_pressure(0.060, 20.0, 0.0, 40.0, 210000,
    ...     0.3, 70000, 0.33, 300.0), 2), round(dpl, 3)
    (153.17, 90.39, 94.17, 21.94)
    """
    da, db = _a(delta_a), _a(delta_b)
    peak = np.maximum(da, db)
    Dpl = plastic_zone_diameter(peak, d, di, Do, Es, nus, Eh, nuh, Reh, kappa)
    p_peak = _pressure(peak, Dpl, d, di, Do, Es, nus, Eh, nuh, Reh, kappa)
    d_ = _a(d)
    qa2 = _qa2(d_, Do)
    c_p = 1.0 / (d_ * (((1.0 + qa2) / (1.0 - qa2) + nuh) / Eh + _shaft_compliance(d_, di, Es, nus)))
    pa = np.maximum(p_peak - (peak - da) * c_p, 0.0)
    pb = np.maximum(p_peak - (peak - db) * c_p, 0.0)
    if not first:
        pa_first = np.full(np.shape(pa), np.nan)
    elif np.all(da >= db):  # state a is the peak
        pa_first = np.broadcast_to(p_peak, np.shape(pa))
    else:
        Dpl_a = plastic_zone_diameter(da, d, di, Do, Es, nus, Eh, nuh, Reh, kappa)
        pa_first = _pressure(da, Dpl_a, d, di, Do, Es, nus, Eh, nuh, Reh, kappa)
    return _out(pa_first), _out(pa), _out(pb), _out(Dpl)


def hub_stresses(p, Dpl, d, Do, r, Reh, kappa=KAPPA_DIN):
    r"""Radial and tangential stress in a partly plastic hub at radius ``r``.

    Plastic zone (r ≤ Dpl/2): :math:`\sigma_r = -p + k\ln(2r/d)`, :math:`\sigma_t = \sigma_r + k`.
    Elastic zone: Lamé under the pressure :math:`p_c = \tfrac{k}{2}(1 - D_{pl}^2/D_o^2)` at
    Dpl/2. With ``Dpl = d`` this is the elastic Lamé solution for any p.

    Parameters
    ----------
    p : float or ndarray
        Contact pressure [MPa].
    Dpl : float or ndarray
        Plastic zone diameter [mm] (d = elastic hub).
    d, Do : float or ndarray
        Joint and hub outer diameter [mm].
    r : float or ndarray
        Radius [mm].
    Reh : float or ndarray
        Yield strength of the hub [MPa].
    kappa : float
        Yield criterion factor [-].

    Returns
    -------
    (sigma_r, sigma_t) : tuple of float or ndarray
        [MPa].

    Examples
    --------
    >>> sr, st = hub_stresses(182.846, 25.0, 20.0, 40.0, 10.0, 300.0)
    >>> round(sr, 3), round(st - sr, 3)
    (-182.846, 346.41)
    """
    p, Dpl, d, Do, r = (_a(x) for x in (p, Dpl, d, Do, r))
    k = kappa * _a(Reh)
    plastic = Dpl > d
    c = 0.5 * Dpl
    qa2 = (Dpl / Do) ** 2
    pc = np.where(plastic, 0.5 * k * (1.0 - qa2), p)
    f = pc / (1.0 - qa2)
    with np.errstate(divide="ignore", invalid="ignore"):
        a2 = (c / r) ** 2
    sr_el = f * (qa2 - a2)
    st_el = f * (qa2 + a2)
    with np.errstate(divide="ignore", invalid="ignore"):
        sr_pl = -p + k * np.log(2.0 * r / d)
    inside = plastic & (r < c)
    return _out(np.where(inside, sr_pl, sr_el)), _out(np.where(inside, sr_pl + k, st_el))


def plastic_share(Dpl, d, Do):
    """Plastic share of the hub wall thickness, (Dpl − d)/(Do − d) (0 for Do = inf) [-].

    Examples
    --------
    >>> plastic_share(25.0, 20.0, 40.0)
    0.25
    """
    d = _a(d)
    with np.errstate(divide="ignore", invalid="ignore"):
        s = (_a(Dpl) - d) / (_a(Do) - d)
    return _out(np.where(np.isfinite(_a(Do)), s, 0.0))
