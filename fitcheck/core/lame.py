"""Thick-walled cylinders (Lamé) and rotating discs: the kernels of press and shrink fits.

Geometry is given by **diameters**; a point inside a wall by its **radius**
``r``. All functions broadcast over their arguments (NumPy arrays or floats)
and work in core units: lengths [mm], stresses and pressures [MPa], Young's
moduli [MPa], density [t/mm³], angular speed [rad/s].

Symbols: ``d`` joint (interface) diameter, ``di`` bore of the shaft (0 = solid
shaft), ``Do`` outer diameter of the hub (``np.inf`` allowed = a hub that is
large compared with the joint). Diameter ratios ``QA = d/Do`` (hub) and
``QI = di/d`` (shaft), as in DIN 7190-1.

Model: both parts are discs in plane stress (σz = 0), linear-elastic,
isotropic, of equal length, with a uniform contact pressure. This is the model
of Shigley (10th ed., sec. 3-16 and 3-17) and of the elastic design in
DIN 7190-1:2017. End effects (pressure peaks at the hub faces) are not
modelled.

References
----------
- Shigley's Mechanical Engineering Design, 10th ed. (Budynas, Nisbett), eqs.
  (3-49) to (3-58): thick-walled cylinders, rotating rings, press and shrink fits.
- Timoshenko & Goodier, Theory of Elasticity, 3rd ed., §§ 28 and 32 (thick
  cylinder, rotating disc).
- DIN 7190-1:2017, Interference fits — Part 1: Calculation and application
  of cylindrical interference fits (elastic range).
"""

from __future__ import annotations

import numpy as np

__all__ = [
    "compliance_hub",
    "compliance_shaft",
    "contact_pressure",
    "hub_stresses",
    "shaft_stresses",
    "hub_radial_displacement",
    "shaft_radial_displacement",
    "hub_outer_diameter_change",
    "shaft_bore_diameter_change",
    "von_mises",
    "tresca",
    "thermal_interference_change",
    "rotating_disc_stresses",
    "rotating_disc_radial_displacement",
    "rotating_hub_bore_displacement",
    "rotating_shaft_surface_displacement",
    "centrifugal_interference_loss",
    "loosening_speed",
]


def _ratio(num, den):
    """num/den with 0/0 -> 0 and x/inf -> 0 (ratios of diameters)."""
    num = np.asarray(num, dtype=float)
    den = np.asarray(den, dtype=float)
    with np.errstate(divide="ignore", invalid="ignore"):
        q = num / den
    return np.where(num == 0.0, 0.0, q)


def _out(x):
    """Return a Python float for 0-d results, the array otherwise."""
    x = np.asarray(x)
    return float(x) if x.ndim == 0 else x


def compliance_hub(d, Do, Eh, nuh):
    """Radial compliance factor of the hub at its bore, K_h = ((1+QA²)/(1−QA²) + ν_h)/E_h [1/MPa].

    The hub bore grows radially by ``u = p·(d/2)·K_h`` under a contact pressure ``p``.

    Parameters
    ----------
    d : float or ndarray
        Joint diameter [mm].
    Do : float or ndarray
        Hub outer diameter [mm]; ``np.inf`` for a very large hub.
    Eh : float or ndarray
        Young's modulus of the hub [MPa].
    nuh : float or ndarray
        Poisson's ratio of the hub [-].

    Returns
    -------
    float or ndarray
        K_h [1/MPa].

    References
    ----------
    Shigley, 10th ed., eq. (3-56), hub (outer member) term.

    Examples
    --------
    >>> round(compliance_hub(20.0, np.inf, 210000.0, 0.3) * 210000.0, 12)
    1.3
    """
    qa2 = _ratio(d, Do) ** 2
    return _out(((1.0 + qa2) / (1.0 - qa2) + nuh) / Eh)


def compliance_shaft(d, di, Es, nus):
    """Radial compliance factor of the shaft at its surface, K_s = ((1+QI²)/(1−QI²) − ν_s)/E_s [1/MPa].

    The shaft surface moves radially inward by ``u = p·(d/2)·K_s``.

    Parameters
    ----------
    d : float or ndarray
        Joint diameter [mm].
    di : float or ndarray
        Shaft bore [mm]; 0 for a solid shaft.
    Es : float or ndarray
        Young's modulus of the shaft [MPa].
    nus : float or ndarray
        Poisson's ratio of the shaft [-].

    Returns
    -------
    float or ndarray
        K_s [1/MPa].

    References
    ----------
    Shigley, 10th ed., eq. (3-56), shaft (inner member) term.

    Examples
    --------
    >>> round(compliance_shaft(20.0, 0.0, 210000.0, 0.3) * 210000.0, 12)
    0.7
    """
    qi2 = _ratio(di, d) ** 2
    return _out(((1.0 + qi2) / (1.0 - qi2) - nus) / Es)


def contact_pressure(delta, d, di, Do, Es, nus, Eh, nuh):
    r"""Contact pressure of a cylindrical interference fit of dissimilar materials.

    .. math::

        p = \frac{\delta}{d\left[\dfrac{1}{E_h}\left(\dfrac{D_o^2+d^2}{D_o^2-d^2}+\nu_h\right)
            + \dfrac{1}{E_s}\left(\dfrac{d^2+d_i^2}{d^2-d_i^2}-\nu_s\right)\right]}

    Parameters
    ----------
    delta : float or ndarray
        Effective **diametral** interference (after smoothing, thermal and
        centrifugal changes) [mm]; a value ≤ 0 (clearance) gives p = 0.
    d : float or ndarray
        Joint diameter [mm].
    di : float or ndarray
        Shaft bore [mm]; 0 = solid shaft.
    Do : float or ndarray
        Hub outer diameter [mm]; ``np.inf`` allowed.
    Es, nus : float or ndarray
        Young's modulus [MPa] and Poisson's ratio [-] of the shaft.
    Eh, nuh : float or ndarray
        Young's modulus [MPa] and Poisson's ratio [-] of the hub.

    Returns
    -------
    float or ndarray
        Contact pressure p ≥ 0 [MPa].

    Notes
    -----
    Shigley writes eq. (3-56) with the radial interference δ_r and the
    interface radius R; with δ = 2·δ_r and d = 2·R it becomes the form above.
    For the same material and a solid shaft it reduces to
    p = E·δ/(2d)·(1 − d²/Do²) (Shigley eq. (3-57) with r_i = 0).
    Plane stress, linear elasticity, no end effects.

    References
    ----------
    Shigley, 10th ed., eqs. (3-56), (3-57); DIN 7190-1:2017 (elastic design).

    Examples
    --------
    Same steel, solid shaft, 20 mm joint, 40 mm hub, 20 µm interference:

    >>> round(contact_pressure(0.020, 20.0, 0.0, 40.0, 210000, 0.3, 210000, 0.3), 3)
    78.75
    >>> contact_pressure(-0.005, 20.0, 0.0, 40.0, 210000, 0.3, 210000, 0.3)
    0.0
    """
    k = compliance_hub(d, Do, Eh, nuh) + compliance_shaft(d, di, Es, nus)
    p = np.asarray(delta, dtype=float) / (np.asarray(d, dtype=float) * k)
    return _out(np.maximum(p, 0.0))


def hub_stresses(p, d, Do, r):
    r"""Radial and tangential stress in the hub wall at radius ``r`` (Lamé, internal pressure).

    .. math::

        \sigma_r = p\,\frac{Q_A^2 - (d/2r)^2}{1-Q_A^2},\qquad
        \sigma_t = p\,\frac{Q_A^2 + (d/2r)^2}{1-Q_A^2},\qquad Q_A = d/D_o

    Parameters
    ----------
    p : float or ndarray
        Contact pressure [MPa].
    d : float or ndarray
        Joint diameter (hub bore) [mm].
    Do : float or ndarray
        Hub outer diameter [mm]; ``np.inf`` allowed.
    r : float or ndarray
        Radius, d/2 ≤ r ≤ Do/2 [mm].

    Returns
    -------
    (sigma_r, sigma_t) : tuple of float or ndarray
        Radial and tangential (hoop) stress [MPa]; tension positive.

    References
    ----------
    Shigley, 10th ed., eq. (3-50) with p_o = 0; eq. (3-58) at the bore.

    Examples
    --------
    >>> sr, st = hub_stresses(100.0, 20.0, 40.0, 10.0)
    >>> round(sr, 9), round(st, 6)
    (-100.0, 166.666667)
    """
    qa2 = _ratio(d, Do) ** 2
    a2 = _ratio(np.asarray(d, dtype=float) / 2.0, r) ** 2
    f = np.asarray(p, dtype=float) / (1.0 - qa2)
    return _out(f * (qa2 - a2)), _out(f * (qa2 + a2))


def shaft_stresses(p, d, di, r):
    r"""Radial and tangential stress in the shaft at radius ``r`` (Lamé, external pressure).

    .. math::

        \sigma_r = -p\,\frac{1-(d_i/2r)^2}{1-Q_I^2},\qquad
        \sigma_t = -p\,\frac{1+(d_i/2r)^2}{1-Q_I^2},\qquad Q_I = d_i/d

    For a solid shaft (``di = 0``) both are −p everywhere.

    Parameters
    ----------
    p : float or ndarray
        Contact pressure [MPa].
    d : float or ndarray
        Joint diameter [mm].
    di : float or ndarray
        Shaft bore [mm]; 0 = solid.
    r : float or ndarray
        Radius, di/2 ≤ r ≤ d/2 [mm].

    Returns
    -------
    (sigma_r, sigma_t) : tuple of float or ndarray
        [MPa]; compression negative.

    References
    ----------
    Shigley, 10th ed., eq. (3-50) with p_i = 0; eq. (3-58) at the surface.

    Examples
    --------
    >>> shaft_stresses(50.0, 20.0, 0.0, 3.0)
    (-50.0, -50.0)
    >>> sr, st = shaft_stresses(50.0, 20.0, 10.0, 5.0)
    >>> round(sr, 9) + 0.0, round(st, 6)
    (0.0, -133.333333)
    """
    qi2 = _ratio(di, d) ** 2
    c2 = _ratio(np.asarray(di, dtype=float) / 2.0, r) ** 2
    f = -np.asarray(p, dtype=float) / (1.0 - qi2)
    return _out(f * (1.0 - c2)), _out(f * (1.0 + c2))


def hub_radial_displacement(p, d, Do, r, Eh, nuh):
    r"""Radial displacement of a point of the hub wall under contact pressure (plane stress).

    .. math:: u = \frac{r}{E_h}\,(\sigma_t - \nu_h\,\sigma_r)

    Parameters
    ----------
    p : float or ndarray
        Contact pressure [MPa].
    d, Do : float or ndarray
        Hub bore and outer diameter [mm].
    r : float or ndarray
        Radius [mm].
    Eh, nuh : float or ndarray
        Young's modulus [MPa], Poisson's ratio [-].

    Returns
    -------
    float or ndarray
        Radial displacement u [mm] (outward positive).

    References
    ----------
    Shigley, 10th ed., eq. (3-53) (plane stress); Timoshenko & Goodier § 28.

    Examples
    --------
    >>> round(hub_radial_displacement(100.0, 20.0, 40.0, 10.0, 210000, 0.3) * 1e3, 4)
    9.3651
    """
    sr, st = hub_stresses(p, d, Do, r)
    return _out(np.asarray(r, dtype=float) / Eh * (st - nuh * np.asarray(sr)))


def shaft_radial_displacement(p, d, di, r, Es, nus):
    r"""Radial displacement of a point of the shaft under contact pressure (plane stress).

    .. math:: u = \frac{r}{E_s}\,(\sigma_t - \nu_s\,\sigma_r)

    Parameters
    ----------
    p : float or ndarray
        Contact pressure [MPa].
    d, di : float or ndarray
        Joint diameter and shaft bore [mm].
    r : float or ndarray
        Radius [mm].
    Es, nus : float or ndarray
        Young's modulus [MPa], Poisson's ratio [-].

    Returns
    -------
    float or ndarray
        Radial displacement u [mm] (negative = inward).

    References
    ----------
    Shigley, 10th ed., eq. (3-53); Timoshenko & Goodier § 28.

    Examples
    --------
    >>> round(shaft_radial_displacement(100.0, 20.0, 0.0, 10.0, 210000, 0.3) * 1e3, 4)
    -3.3333
    """
    sr, st = shaft_stresses(p, d, di, r)
    return _out(np.asarray(r, dtype=float) / Es * (st - nus * np.asarray(sr)))


def hub_outer_diameter_change(p, d, Do, Eh):
    r"""Diametral growth of the hub's outer diameter under contact pressure.

    .. math:: \Delta D_o = \frac{2\,p\,d\,Q_A}{E_h\,(1-Q_A^2)}

    (the outer surface is free, σr = 0, so ΔDo = Do·σt/E_h).

    Parameters
    ----------
    p : float or ndarray
        Contact pressure [MPa].
    d, Do : float or ndarray
        Joint and hub outer diameter [mm]; ``Do = inf`` gives 0.
    Eh : float or ndarray
        Young's modulus of the hub [MPa].

    Returns
    -------
    float or ndarray
        ΔDo [mm] (growth positive).

    References
    ----------
    Shigley, 10th ed., eqs. (3-50), (3-53) at r = r_o; DIN 7190-1:2017 (outer-diameter growth).

    Examples
    --------
    >>> round(hub_outer_diameter_change(100.0, 20.0, 40.0, 210000) * 1e3, 4)
    12.6984
    """
    qa = _ratio(d, Do)
    return _out(2.0 * np.asarray(p, dtype=float) * d * qa / (Eh * (1.0 - qa * qa)))


def shaft_bore_diameter_change(p, d, di, Es):
    r"""Diametral change of a hollow shaft's bore under contact pressure (negative = shrinks).

    .. math:: \Delta d_i = -\frac{2\,p\,d_i}{E_s\,(1-Q_I^2)}

    Parameters
    ----------
    p : float or ndarray
        Contact pressure [MPa].
    d, di : float or ndarray
        Joint diameter and shaft bore [mm]; ``di = 0`` gives 0.
    Es : float or ndarray
        Young's modulus of the shaft [MPa].

    Returns
    -------
    float or ndarray
        Δdi [mm].

    References
    ----------
    Shigley, 10th ed., eqs. (3-50), (3-53) at r = r_i; DIN 7190-1:2017 (bore contraction).

    Examples
    --------
    >>> round(shaft_bore_diameter_change(100.0, 20.0, 10.0, 210000) * 1e3, 4)
    -12.6984
    """
    qi = _ratio(di, d)
    return _out(-2.0 * np.asarray(p, dtype=float) * di / (Es * (1.0 - qi * qi)))


def von_mises(s1, s2, s3=0.0):
    r"""Von Mises equivalent stress of three principal (or normal, shear-free) stresses.

    .. math:: \sigma_v = \sqrt{\tfrac12\left[(\sigma_1-\sigma_2)^2+(\sigma_2-\sigma_3)^2+(\sigma_3-\sigma_1)^2\right]}

    Parameters
    ----------
    s1, s2, s3 : float or ndarray
        Principal stresses [MPa]; ``s3 = 0`` for plane stress.

    Returns
    -------
    float or ndarray
        σ_v [MPa].

    References
    ----------
    Shigley, 10th ed., eq. (5-12).

    Examples
    --------
    >>> round(von_mises(-100.0, 166.66666666666666), 4)
    233.3333
    """
    s1, s2, s3 = (np.asarray(s, dtype=float) for s in (s1, s2, s3))
    return _out(np.sqrt(0.5 * ((s1 - s2) ** 2 + (s2 - s3) ** 2 + (s3 - s1) ** 2)))


def tresca(s1, s2, s3=0.0):
    r"""Tresca equivalent stress: the largest difference of principal stresses.

    .. math:: \sigma_T = \max(|\sigma_1-\sigma_2|, |\sigma_2-\sigma_3|, |\sigma_3-\sigma_1|)

    Parameters
    ----------
    s1, s2, s3 : float or ndarray
        Principal stresses [MPa]; ``s3 = 0`` for plane stress.

    Returns
    -------
    float or ndarray
        σ_T [MPa].

    References
    ----------
    Shigley, 10th ed., sec. 5-4 (maximum-shear-stress theory).

    Examples
    --------
    >>> round(tresca(-100.0, 166.66666666666666), 4)
    266.6667
    """
    s1, s2, s3 = (np.asarray(s, dtype=float) for s in (s1, s2, s3))
    return _out(np.maximum(np.maximum(np.abs(s1 - s2), np.abs(s2 - s3)), np.abs(s3 - s1)))


def thermal_interference_change(d, alpha_s, alpha_h, T_shaft, T_hub, T_ref=20.0):
    r"""Change of the diametral interference when shaft and hub leave the reference temperature.

    .. math:: \Delta\delta = d\,[\alpha_s\,(T_s - T_0) - \alpha_h\,(T_h - T_0)]

    Parameters
    ----------
    d : float or ndarray
        Joint diameter [mm].
    alpha_s, alpha_h : float or ndarray
        Linear expansion coefficients of shaft and hub [1/K].
    T_shaft, T_hub : float or ndarray
        Temperatures of shaft and hub [°C].
    T_ref : float or ndarray
        Temperature at which the interference is given (ISO 1: 20 °C) [°C].

    Returns
    -------
    float or ndarray
        Δδ [mm]; positive = tighter.

    References
    ----------
    DIN 7190-1:2017 (temperature-dependent change of the interference); linear thermal expansion.

    Examples
    --------
    Steel shaft in an aluminium hub, both at 100 °C:

    >>> round(thermal_interference_change(20.0, 11.5e-6, 23e-6, 100.0, 100.0) * 1e3, 3)
    -18.4
    """
    return _out(np.asarray(d, dtype=float) * (alpha_s * (np.asarray(T_shaft) - T_ref)
                                              - alpha_h * (np.asarray(T_hub) - T_ref)))


def rotating_disc_stresses(rho, omega, nu, di, do, r):
    r"""Stresses in a freely rotating annular (or solid) disc of uniform thickness, plane stress.

    .. math::

        \sigma_t = \rho\omega^2\frac{3+\nu}{8}\left(r_i^2+r_o^2+\frac{r_i^2 r_o^2}{r^2}
                   -\frac{1+3\nu}{3+\nu}\,r^2\right),\qquad
        \sigma_r = \rho\omega^2\frac{3+\nu}{8}\left(r_i^2+r_o^2-\frac{r_i^2 r_o^2}{r^2}-r^2\right)

    Parameters
    ----------
    rho : float or ndarray
        Density [t/mm³] (steel 7.85e-9).
    omega : float or ndarray
        Angular speed [rad/s].
    nu : float or ndarray
        Poisson's ratio [-].
    di, do : float or ndarray
        Inner (0 = solid disc) and outer diameter [mm].
    r : float or ndarray
        Radius [mm].

    Returns
    -------
    (sigma_r, sigma_t) : tuple of float or ndarray
        [MPa].

    References
    ----------
    Shigley, 10th ed., eq. (3-55); Timoshenko & Goodier, 3rd ed., § 32, eqs. (c), (d).

    Examples
    --------
    Tangential stress at the bore of a steel ring, 20/40 mm, 10 000 rad/s:

    >>> round(rotating_disc_stresses(7.85e-9, 1e4, 0.3, 20.0, 40.0, 10.0)[1], 3)
    272.787
    """
    ri2 = (np.asarray(di, dtype=float) / 2.0) ** 2
    ro2 = (np.asarray(do, dtype=float) / 2.0) ** 2
    r2 = np.asarray(r, dtype=float) ** 2
    with np.errstate(divide="ignore", invalid="ignore"):
        mixed = np.where(ri2 == 0.0, 0.0, ri2 * ro2 / r2)
    k = rho * np.asarray(omega, dtype=float) ** 2 * (3.0 + nu) / 8.0
    st = k * (ri2 + ro2 + mixed - (1.0 + 3.0 * nu) / (3.0 + nu) * r2)
    sr = k * (ri2 + ro2 - mixed - r2)
    return _out(sr), _out(st)


def rotating_disc_radial_displacement(rho, omega, E, nu, di, do, r):
    r"""Radial displacement of a freely rotating annular (or solid) disc, plane stress.

    .. math:: u = \frac{r}{E}(\sigma_t - \nu\,\sigma_r)

    with the stresses of :func:`rotating_disc_stresses`.

    Parameters
    ----------
    rho, omega, nu, di, do, r
        As in :func:`rotating_disc_stresses`.
    E : float or ndarray
        Young's modulus [MPa].

    Returns
    -------
    float or ndarray
        u [mm] (outward positive).

    References
    ----------
    Timoshenko & Goodier, 3rd ed., § 32; Shigley, 10th ed., eqs. (3-53), (3-55).

    Examples
    --------
    >>> round(rotating_disc_radial_displacement(7.85e-9, 1e4, 210000, 0.3, 20.0, 40.0, 10.0) * 1e3, 4)
    12.9899
    """
    sr, st = rotating_disc_stresses(rho, omega, nu, di, do, r)
    return _out(np.asarray(r, dtype=float) / E * (st - nu * np.asarray(sr)))


def rotating_hub_bore_displacement(rho, omega, Eh, nuh, d, Do):
    r"""Radial growth of the bore of a freely rotating hub (annular disc), plane stress.

    At the free bore σr = 0, so

    .. math:: u_h = \frac{d}{2E_h}\,\frac{\rho\omega^2}{4}\left[(3+\nu_h)\frac{D_o^2}{4}
              + (1-\nu_h)\frac{d^2}{4}\right]

    Parameters
    ----------
    rho : float or ndarray
        Density of the hub [t/mm³].
    omega : float or ndarray
        Angular speed [rad/s].
    Eh, nuh : float or ndarray
        Young's modulus [MPa] and Poisson's ratio [-] of the hub.
    d, Do : float or ndarray
        Hub bore and outer diameter [mm] (``Do = inf`` gives inf for ω > 0).

    Returns
    -------
    float or ndarray
        u_h [mm].

    References
    ----------
    Shigley, 10th ed., eq. (3-55) at r = r_i; Timoshenko & Goodier § 32.

    Examples
    --------
    >>> round(rotating_hub_bore_displacement(7.85e-9, 1e4, 210000, 0.3, 20.0, 40.0) * 1e3, 4)
    12.9899
    """
    d = np.asarray(d, dtype=float)
    w2 = np.asarray(omega, dtype=float) ** 2
    return _out(d / (8.0 * Eh) * rho * w2 * ((3.0 + nuh) * np.asarray(Do, dtype=float) ** 2
                                               + (1.0 - nuh) * d * d) / 4.0)


def rotating_shaft_surface_displacement(rho, omega, Es, nus, di, d):
    r"""Radial growth of the outer surface of a freely rotating (hollow or solid) shaft, plane stress.

    .. math:: u_s = \frac{d}{2E_s}\,\frac{\rho\omega^2}{4}\left[(3+\nu_s)\frac{d_i^2}{4}
              + (1-\nu_s)\frac{d^2}{4}\right]

    Parameters
    ----------
    rho : float or ndarray
        Density of the shaft [t/mm³].
    omega : float or ndarray
        Angular speed [rad/s].
    Es, nus : float or ndarray
        Young's modulus [MPa] and Poisson's ratio [-] of the shaft.
    di, d : float or ndarray
        Shaft bore (0 = solid) and joint diameter [mm].

    Returns
    -------
    float or ndarray
        u_s [mm].

    References
    ----------
    Shigley, 10th ed., eq. (3-55) at r = r_o; Timoshenko & Goodier § 32.

    Examples
    --------
    >>> round(rotating_shaft_surface_displacement(7.85e-9, 1e4, 210000, 0.3, 0.0, 20.0) * 1e3, 5)
    0.65417
    """
    d = np.asarray(d, dtype=float)
    w2 = np.asarray(omega, dtype=float) ** 2
    di = np.asarray(di, dtype=float)
    return _out(d / (8.0 * Es) * rho * w2 * ((3.0 + nus) * di * di + (1.0 - nus) * d * d) / 4.0)


def centrifugal_interference_loss(omega, d, di, Do, Es, nus, rhos, Eh, nuh, rhoh):
    r"""Loss of diametral interference by rotation: twice the free bore growth of the hub minus the shaft's.

    .. math:: \Delta\delta_\omega = 2\,(u_h - u_s)

    Superposing the free rotating discs and the static fit solution is exact
    within the plane-stress, linear-elastic model, so the contact pressure at
    speed is :func:`contact_pressure` of (δ − Δδ_ω) and the stresses add.

    Parameters
    ----------
    omega : float or ndarray
        Angular speed [rad/s].
    d, di, Do : float or ndarray
        Joint diameter, shaft bore, hub outer diameter [mm].
    Es, nus, rhos : float or ndarray
        Shaft modulus [MPa], Poisson's ratio [-], density [t/mm³].
    Eh, nuh, rhoh : float or ndarray
        Hub modulus [MPa], Poisson's ratio [-], density [t/mm³].

    Returns
    -------
    float or ndarray
        Δδ_ω [mm] (positive = looser).

    References
    ----------
    DIN 7190-1:2017 (centrifugal loosening); Shigley, 10th ed., eq. (3-55).

    Examples
    --------
    >>> round(centrifugal_interference_loss(1e4, 20.0, 0.0, 40.0, 210000, 0.3, 7.85e-9,
    ...                                     210000, 0.3, 7.85e-9) * 1e3, 4)
    24.6714
    """
    uh = rotating_hub_bore_displacement(rhoh, omega, Eh, nuh, d, Do)
    us = rotating_shaft_surface_displacement(rhos, omega, Es, nus, di, d)
    return _out(2.0 * (np.asarray(uh) - np.asarray(us)))


def loosening_speed(delta, d, di, Do, Es, nus, rhos, Eh, nuh, rhoh):
    r"""Angular speed at which the contact pressure falls to zero.

    The centrifugal loss grows with ω², so

    .. math:: \omega_L = \sqrt{\frac{\delta}{\Delta\delta_\omega(\omega = 1)}}

    Parameters
    ----------
    delta : float or ndarray
        Effective diametral interference at standstill and operating temperature [mm];
        ≤ 0 gives 0.
    d, di, Do, Es, nus, rhos, Eh, nuh, rhoh
        As in :func:`centrifugal_interference_loss`.

    Returns
    -------
    float or ndarray
        ω_L [rad/s]; ``inf`` where rotation does not loosen the fit.

    References
    ----------
    DIN 7190-1:2017 (loosening speed); Shigley, 10th ed., eq. (3-55).

    Examples
    --------
    >>> round(loosening_speed(0.020, 20.0, 0.0, 40.0, 210000, 0.3, 7.85e-9,
    ...                       210000, 0.3, 7.85e-9), 1)
    9003.6
    """
    c = np.asarray(centrifugal_interference_loss(1.0, d, di, Do, Es, nus, rhos, Eh, nuh, rhoh))
    dl = np.maximum(np.asarray(delta, dtype=float), 0.0)
    with np.errstate(divide="ignore", invalid="ignore"):
        w = np.sqrt(dl / c)
    return _out(np.where(c > 0.0, w, np.inf))
