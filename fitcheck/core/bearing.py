"""Kernels of the rolling-bearing seat: fit limits, smoothing, ring deformation, thermal terms.

Plain floats / NumPy arrays in core units (mm, MPa, N, K); deviations and
interferences of the seat are in µm where the name says ``_um``. Every function
broadcasts over its arguments. Sign convention: an *interference* is positive
when the male part (shaft, or outer ring in its housing) is larger than the
female part (inner-ring bore, or housing bore); a clearance is a negative
interference.

The rings are modelled as thick cylinders of uniform wall (Lamé), with the
raceway replaced by an equivalent diameter (:func:`equivalent_ring_diameters`);
the deformation kernels are those of :mod:`fitcheck.core.lame`.
"""

from __future__ import annotations

import numpy as np

from .lame import (
    contact_pressure,
    hub_outer_diameter_change,
    hub_stresses,
    shaft_bore_diameter_change,
)

#: Fraction of the ring section height (D - d)/2 by which the equivalent uniform ring reaches
#: beyond the seat: inner ring d + f·(D − d), outer ring D − f·(D − d).
RACEWAY_FRACTION = 0.25

#: Smoothing factor on the sum of the two mean roughness depths Rz (DIN 7190-1:2017, 6.2).
SMOOTHING_FACTOR = 0.8


def _out(x):
    """A Python float for 0-d results, the array otherwise."""
    x = np.asarray(x, dtype=float)
    return float(x) if x.ndim == 0 else x


def fit_limits(male_upper_um, male_lower_um, female_upper_um, female_lower_um):
    """Smallest and largest interference of a male part in a female part.

    .. math:: U_{min} = a_{m,lo} - a_{f,up}, \\qquad U_{max} = a_{m,up} - a_{f,lo}

    Parameters
    ----------
    male_upper_um, male_lower_um : float or ndarray
        Upper and lower deviation of the male part (shaft; outer ring) from the common nominal size [µm]
    female_upper_um, female_lower_um : float or ndarray
        Upper and lower deviation of the female part (inner-ring bore; housing bore) [µm]

    Returns
    -------
    (U_min, U_max) : tuple of float or ndarray
        Interference at the loosest and at the tightest pairing [µm]; negative = clearance.

    Notes
    -----
    Worst-case (arithmetic) combination of the limits, ISO 286-1:2010, 3.3 (fit, clearance,
    interference). A bearing bore or outside diameter lies below nominal (ISO 492:2014: upper
    deviation 0), so its lower deviation tightens a shaft seat and loosens a housing seat.

    Examples
    --------
    >>> fit_limits(11, 2, 0, -10)   # k5 shaft (18..30 mm) in a Normal-class bore of 20 mm
    (2.0, 21.0)
    """
    return (_out(np.subtract(male_lower_um, female_upper_um, dtype=float)),
            _out(np.subtract(male_upper_um, female_lower_um, dtype=float)))


def smoothing_um(rz_a_um, rz_b_um, factor=SMOOTHING_FACTOR):
    """Loss of interference by smoothing of the roughness peaks when the parts are joined.

    .. math:: G = 0.8\\,(R_{z,a} + R_{z,b})

    Parameters
    ----------
    rz_a_um, rz_b_um : float or ndarray
        Mean roughness depth Rz of the two joined surfaces [µm]
    factor : float
        Smoothing factor [-]; 0.8 after DIN 7190-1:2017.

    Returns
    -------
    float or ndarray
        Smoothing [µm], to be subtracted from a measured (tolerance) interference.

    References
    ----------
    DIN 7190-1:2017, 6.2 (smoothing of the surfaces, "Glättung").

    Examples
    --------
    >>> round(smoothing_um(4.0, 2.5), 6)
    5.2
    """
    return _out(factor * (np.asarray(rz_a_um, dtype=float) + np.asarray(rz_b_um, dtype=float)))


def effective_interference_um(u_um, smoothing):
    """Interference left after smoothing; a seat with clearance keeps its clearance.

    .. math:: U_{eff} = U - \\min\\left(G,\\ \\max(U, 0)\\right)

    Parameters
    ----------
    u_um : float or ndarray
        Interference from the tolerance limits [µm]; negative = clearance
    smoothing : float or ndarray
        Smoothing G of the two surfaces, :func:`smoothing_um` [µm]

    Returns
    -------
    float or ndarray
        Effective interference [µm].

    Notes
    -----
    DIN 7190-1:2017, 6.2 subtracts the smoothing from the interference of a press fit. Peaks are
    flattened only where the parts are pressed together, and no further than to bare contact: a
    seat with clearance keeps its clearance (no contact, nothing is flattened) and an interference
    smaller than G ends at zero, not at a clearance. Common practice for the clearance side; it
    keeps the tightest case (smallest operating clearance, a cold light-alloy housing closing on
    its ring) on the safe side.

    Examples
    --------
    >>> effective_interference_um(21.0, 3.28), effective_interference_um(2.0, 3.28)
    (17.72, 0.0)
    >>> effective_interference_um(-36.0, 6.32)
    -36.0
    """
    u = np.asarray(u_um, dtype=float)
    return _out(u - np.minimum(np.asarray(smoothing, dtype=float), np.maximum(u, 0.0)))


def thermal_interference_change(d, alpha_male, t_male, alpha_female, t_female, t_ref):
    """Change of a seat's interference when the parts leave the temperature they were fitted at.

    .. math:: \\Delta U = d\\,[\\alpha_m (t_m - t_0) - \\alpha_f (t_f - t_0)]

    Parameters
    ----------
    d : float or ndarray
        Seat diameter [mm]
    alpha_male, alpha_female : float or ndarray
        Linear expansion coefficients of the male and the female part [1/K]
    t_male, t_female : float or ndarray
        Operating temperatures of the two parts [°C]
    t_ref : float or ndarray
        Temperature at which the fit limits hold (assembly, 20 °C for ISO 286 sizes) [°C]

    Returns
    -------
    float or ndarray
        Change of interference [mm]; negative = the seat loosens.

    Notes
    -----
    Free linear expansion of both parts (DIN 7190-1:2017, 6.4); a steel ring in a warm aluminium
    housing loosens (α_Al ≈ 23e-6/K > α_steel ≈ 11.5e-6/K) and tightens when cold.

    Examples
    --------
    >>> round(thermal_interference_change(47.0, 11.5e-6, 60.0, 23e-6, 60.0, 20.0) * 1000, 2)
    -21.62
    """
    return _out(np.asarray(d, dtype=float) * (np.multiply(alpha_male, np.subtract(t_male, t_ref))
                                              - np.multiply(alpha_female, np.subtract(t_female, t_ref))))


def equivalent_ring_diameters(d, D, fraction=RACEWAY_FRACTION):
    """Equivalent outer diameter of the inner ring and bore of the outer ring as uniform thick rings.

    .. math:: d_{ie} = d + f\\,(D - d), \\qquad D_{oe} = D - f\\,(D - d), \\qquad f = 0.25

    Parameters
    ----------
    d, D : float or ndarray
        Bore and outside diameter of the bearing [mm]
    fraction : float
        Share of the diametral section height (D − d) given to each ring [-]

    Returns
    -------
    (d_ie, D_oe) : tuple
        Equivalent inner-ring outer diameter and outer-ring bore [mm]

    Notes
    -----
    Common practice: the raceway of a deep-groove ball bearing lies at about d + 0.2·(D − d)
    (inner) and D − 0.2·(D − d) (outer) at the groove bottom, the shoulders stiffen the ring, and
    a uniform ring reaching a quarter of the section height, d + (D − d)/4, stands for it. With a
    solid steel shaft the inner raceway then grows by d/d_ie ≈ 0.7 … 0.85 of the effective
    interference, the figure the trade uses as a rule of thumb (70 … 90 %).

    Examples
    --------
    >>> equivalent_ring_diameters(20.0, 47.0)
    (26.75, 40.25)
    """
    d = np.asarray(d, dtype=float)
    D = np.asarray(D, dtype=float)
    h = fraction * (D - d)
    return _out(d + h), _out(D - h)


def inner_ring_fit(delta, d, di, d_ie, Es, nus, Er, nur):
    """Contact pressure, raceway growth and bore hoop stress of an inner ring pressed on a shaft.

    The inner ring is the hub of a Lamé pair: bore d, outer diameter d_ie.

    .. math::
        p = \\frac{\\delta}{d\\left[\\frac{1}{E_r}\\left(\\frac{d_{ie}^2+d^2}{d_{ie}^2-d^2}+\\nu_r\\right)
            + \\frac{1}{E_s}\\left(\\frac{d^2+d_i^2}{d^2-d_i^2}-\\nu_s\\right)\\right]},\\quad
        \\Delta d_{ie} = \\frac{2 p\\, d^2 d_{ie}}{E_r (d_{ie}^2 - d^2)},\\quad
        \\sigma_t(d/2) = p\\,\\frac{d_{ie}^2 + d^2}{d_{ie}^2 - d^2}

    Parameters
    ----------
    delta : float or ndarray
        Effective diametral interference [mm]; ≤ 0 gives zero pressure
    d : float or ndarray
        Bearing bore = seat diameter [mm]
    di : float or ndarray
        Bore of a hollow shaft, 0 for solid [mm]
    d_ie : float or ndarray
        Equivalent inner-ring outer diameter [mm]
    Es, nus : float or ndarray
        Young's modulus [MPa] and Poisson's ratio [-] of the shaft
    Er, nur : float or ndarray
        Young's modulus [MPa] and Poisson's ratio [-] of the ring

    Returns
    -------
    (p, growth, sigma_t) : tuple
        Contact pressure [MPa], growth of the raceway diameter [mm], tangential (hoop) stress at
        the ring bore [MPa].

    References
    ----------
    Shigley, Mechanical Engineering Design, 10th ed., eqs. (3-50), (3-56) (press fits);
    DIN 7190-1:2017, 6 (elastic design).

    Examples
    --------
    >>> p, g, s = inner_ring_fit(0.0158, 20.0, 0.0, 26.75, 208e3, 0.3, 208e3, 0.3)
    >>> round(g / 0.0158, 4)   # same material, solid shaft: growth/interference = d/d_ie
    0.7477
    """
    p = contact_pressure(delta, d, di, d_ie, Es, nus, Er, nur)
    growth = hub_outer_diameter_change(p, d, d_ie, Er)
    _, sigma_t = hub_stresses(p, d, d_ie, np.asarray(d, dtype=float) / 2.0)
    return _out(p), _out(growth), _out(sigma_t)


def outer_ring_fit(delta, D, D_oe, Dh, Er, nur, Eh, nuh):
    """Contact pressure and raceway contraction of an outer ring pressed into a housing.

    The outer ring is the hollow shaft of a Lamé pair (outer diameter D, bore D_oe); the housing is
    the hub (bore D, outer diameter Dh, ``np.inf`` for a massive housing).

    .. math::
        \\Delta D_{oe} = -\\frac{2 p\\, D^2 D_{oe}}{E_r (D^2 - D_{oe}^2)}

    Parameters
    ----------
    delta : float or ndarray
        Effective diametral interference [mm]; ≤ 0 gives zero pressure
    D : float or ndarray
        Bearing outside diameter = seat diameter [mm]
    D_oe : float or ndarray
        Equivalent outer-ring bore [mm]
    Dh : float or ndarray
        Housing outer diameter [mm] (``np.inf`` allowed)
    Er, nur : float or ndarray
        Young's modulus [MPa] and Poisson's ratio [-] of the ring
    Eh, nuh : float or ndarray
        Young's modulus [MPa] and Poisson's ratio [-] of the housing

    Returns
    -------
    (p, contraction) : tuple
        Contact pressure [MPa] and reduction of the raceway diameter [mm] (positive = smaller).

    References
    ----------
    Shigley, Mechanical Engineering Design, 10th ed., eqs. (3-50), (3-56);
    Timoshenko & Goodier, Theory of Elasticity, 3rd ed., § 28 (thick cylinder, external pressure).

    Examples
    --------
    >>> p, c = outer_ring_fit(0.0, 47.0, 40.25, np.inf, 208e3, 0.3, 210e3, 0.3)
    >>> p, c
    (0.0, 0.0)
    """
    p = contact_pressure(delta, D, D_oe, Dh, Er, nur, Eh, nuh)
    contraction = -np.asarray(shaft_bore_diameter_change(p, D, D_oe, Er), dtype=float)
    return _out(p), _out(contraction)


def thermal_clearance_reduction(alpha_ring, t_inner, t_outer, dm):
    """Loss of radial internal clearance when the inner ring runs warmer than the outer ring.

    .. math:: \\Delta G_T = \\alpha\\,(t_i - t_o)\\,d_m, \\qquad d_m \\approx (d + D)/2

    Parameters
    ----------
    alpha_ring : float or ndarray
        Expansion coefficient of the ring and ball steel [1/K]
    t_inner, t_outer : float or ndarray
        Temperatures of the inner and the outer ring [°C]; the balls are taken at their mean
    dm : float or ndarray
        Pitch diameter of the ball set [mm]

    Returns
    -------
    float or ndarray
        Reduction of the radial clearance [mm] (negative = the clearance grows).

    Notes
    -----
    Free expansion of outer raceway D_o, inner raceway d_i and balls D_w = (D_o − d_i)/2 at the
    mean ring temperature: ΔG = α[D_o(t_o − t_0) − d_i(t_i − t_0) − (D_o − d_i)((t_i + t_o)/2 − t_0)]
    = −α (t_i − t_o)(D_o + d_i)/2; the assembly temperature t_0 drops out. Common practice
    (bearing-trade handbooks) writes the same with d_m = (d + D)/2.

    Examples
    --------
    >>> round(thermal_clearance_reduction(11.5e-6, 30.0, 20.0, 34.0) * 1000, 3)
    3.91
    """
    return _out(np.multiply(alpha_ring, np.subtract(t_inner, t_outer)) * np.asarray(dm, dtype=float))


def friction_capacity(p, d, B, mu):
    """Axial force a seat can carry by friction alone.

    .. math:: F_{ax} = \\mu\\, p\\, \\pi\\, d\\, B

    Parameters
    ----------
    p : float or ndarray
        Contact pressure [MPa]
    d : float or ndarray
        Seat diameter [mm]
    B : float or ndarray
        Seat (ring) width [mm]
    mu : float or ndarray
        Coefficient of friction for slip [-]

    Returns
    -------
    float or ndarray
        Transmissible axial force [N].

    References
    ----------
    DIN 7190-1:2017, 7 (transmissible axial force of an interference fit).

    Examples
    --------
    >>> round(friction_capacity(20.0, 20.0, 14.0, 0.1), 1)
    1759.3
    """
    return _out(np.multiply(mu, p) * np.pi * np.asarray(d, dtype=float) * np.asarray(B, dtype=float))
