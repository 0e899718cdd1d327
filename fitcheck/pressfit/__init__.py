"""Press and shrink fits of gears, pulleys, hubs and bearing rings on shafts (unit-aware layer).

The question it answers: does the hub, pressed on the shaft, carry its torque
and thrust at the loosest tolerance combination — at operating temperature and
speed — without yielding at the tightest, and what does assembly take
(press-in force, hub heating temperature)?

>>> inp = PressFitInput.from_mapping({
...     "name": "gear", "fit": "20 H7/s6", "length": "16 mm", "hub_outer_diameter": "40 mm",
...     "shaft_material": "C45E", "hub_material": "C45E", "torque": "10 N*m"})
>>> res = evaluate(inp)
>>> res.ok, round(res.pressure_min, 1), round(res.torque_capacity_min / 1000, 1)
(True, 22.7, 18.2)

Method (see :data:`METHOD_NOTES`): Lamé thick-cylinder theory for shaft and hub
in plane stress as used by DIN 7190-1:2017 for the elastic design, with the
smoothing of roughness, the thermal change of the interference and the
centrifugal loosening; the kernels are in :mod:`fitcheck.core.lame` and
:mod:`fitcheck.core.pressfit`. With ``design = "elastic-plastic"`` the hub of
ductile material may yield partly (DIN 7190-1:2017, :mod:`fitcheck.core.elastoplastic`):
it passes while its plastic zone stays within ``plastic_zone_limit`` of the hub wall.
In the elastic design (default) a joint whose hub or shaft would yield is reported as
failing, with a :class:`~fitcheck.errors.MethodRangeWarning`; a yielding shaft fails in both.
"""

from __future__ import annotations

# The package is split along its seams: schema and parsing, evaluation, results. Every name other
# modules and tests use stays importable from ``fitcheck.pressfit``.
from .evaluate import (  # noqa: F401
    NAME_PLASTIC_ZONE,
    _case,
    _headline,
    _why_no_pressure,
    core_arguments,
    evaluate,
    plastic_zone_check,
    state_names,
)
from .results import PressFitCase, PressFitResult, _f, _pressure_per_mm  # noqa: F401
from .schema import (  # noqa: F401
    ASSEMBLIES,
    DEFAULTS,
    DESIGNS,
    FRICTION_TABLE,
    KEYS,
    MAX_SIZE,
    METHOD_NOTES,
    REF_HEAT,
    REF_HUB,
    REF_PLASTIC,
    REF_PRESS,
    REF_SHAFT,
    REF_SLIP,
    REF_SPEED,
    RPM,
    PressFitInput,
    _friction_rows,
    default_friction,
    root_diameter,
)

__all__ = ["KEYS", "METHOD_NOTES", "PressFitCase", "PressFitInput", "PressFitResult",
           "default_friction", "evaluate"]

