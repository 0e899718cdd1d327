"""Rolling-bearing seats: seat classes, fit of both rings, and the operating radial clearance.

A ball bearing pressed onto its shaft and into its housing loses radial internal
clearance: the inner raceway grows, the outer raceway shrinks, and a warmer inner
ring takes a little more. Too tight and the bearing runs preloaded and hot; too
loose and the loaded ring creeps and wears its seat. A light-alloy housing
loosens its grip on a steel ring as it warms and tightens it when cold.

This module

* looks up a bearing's boundary dimensions (ISO 15), its bore and outside-diameter
  deviations (ISO 492) and its radial internal clearance (ISO 5753-1);
* recommends shaft and housing tolerance classes from the load case (DIN 5425-1);
* evaluates a seat (:func:`evaluate`): interference of both rings from the ISO 286
  classes and the bearing tolerances, smoothing (DIN 7190-1), thick-ring (Lamé)
  contact pressure and raceway deformation, thermal changes, the operating
  clearance with its check, the smallest clearance group that passes, and the
  axial force the seats hold by friction.

Inputs accept pint quantities or strings (``"20 mm"``, ``"80 degC"``); results
are plain floats in core units (mm, N, MPa; seat deviations and clearances in µm).

Examples
--------
>>> b = bearing("6204")
>>> (b.d, b.D, b.B)
(20.0, 47.0, 14.0)
>>> recommend_seats("6204", load="rotating_inner", load_ratio=0.08).shaft
'k5'
"""

from __future__ import annotations

# The package is split along its seams: the bearing tables and seat recommendations, the schema
# and parsing of a seat's input, the evaluation, and the result. Every name other modules and
# tests use stays importable from ``fitcheck.bearings``.
from .catalogue import *  # noqa: F403
from .catalogue import _clearances, _deviation, _group, _groups_at, _tolerance_class  # noqa: F401
from .evaluate import *  # noqa: F403
from .results import *  # noqa: F403
from .schema import *  # noqa: F403

__all__ = [  # noqa: F405
    "Bearing", "BearingSeatInput", "BearingSeatResult", "KEYS", "LOAD_CASES", "LOAD_LEVELS",
    "CLEARANCE_GROUPS", "METHOD_NOTES", "RING_MATERIAL", "SeatRecommendation", "TOLERANCE_CLASSES",
    "bearing", "bore_deviation", "designations", "evaluate", "load_level_from_ratio",
    "outside_deviation", "radial_clearance", "recommend_seats", "ring_material",
]

