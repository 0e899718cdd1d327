"""Axis units of the plots: SI (mm, µm, N, N·m, MPa) or inch (in, thousandths of an inch,
lbf, lbf·in, ksi). Factors come from the one registry of :mod:`fitcheck.units`."""

from __future__ import annotations

import functools

from ..units import Q_

#: kind → (SI label, inch label, inch unit in pint spelling, SI unit)
_KINDS = {
    "um": ("µm", "thou", "in", "um", 1000.0),
    "mm": ("mm", "in", "in", "mm", 1.0),
    "N": ("N", "lbf", "lbf", "N", 1.0),
    "kN": ("kN", "klbf", "lbf", "kN", 0.001),
    "N*m": ("N·m", "lbf·in", "lbf*in", "N*m", 1.0),
    "MPa": ("MPa", "ksi", "ksi", "MPa", 1.0),
}


@functools.cache
def scale(kind: str, units: str = "SI") -> tuple[float, str]:
    """Factor from the SI value of ``kind`` to the plotted value, and the axis label unit.

    >>> k, label = scale("um", "inch")
    >>> round(k * 25.4, 12), label, scale("MPa", "SI")
    (1.0, 'thou', (1.0, 'MPa'))
    """
    si_label, inch_label, inch_unit, si_unit, mult = _KINDS[kind]
    if units != "inch":
        return 1.0, si_label
    return float(Q_(1.0, si_unit).to(inch_unit).magnitude) * mult, inch_label
