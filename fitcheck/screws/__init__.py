"""Housing screws: preload, tightening torque and the checks of a bolted joint (VDI 2230 Part 1:2015).

A cover or flange clamped to a (light-alloy) housing by a few screws. The input is a
:class:`ScrewJointInput` (from a ``[[screws]]`` case-file table or built in code); :func:`evaluate`
returns a :class:`ScrewJointResult` of plain floats in core units (mm, N, MPa, N·mm) with its
:class:`~fitcheck.checks.Check` list:

* assembly preload: the largest preload αA·F_M,min must not exceed F_M,zul (ν·Rp0.2 under tension
  and torsion);
* working stress under the operating load (yield safety ≥ 1);
* residual clamp load against separation (and a required clamp load) and against transverse slip;
* surface pressure under the head (and nut) against the clamped material's limiting pressure p_G;
* length of engagement in a tapped housing (the screw must break before the internal thread strips);
* fatigue of the thread under the alternating share of the axial load.

The screw pattern (count on a bolt circle, or given positions) distributes axial force, tilting
moment, transverse force and torque about the axis; the most loaded screw is checked.

>>> inp = ScrewJointInput.from_mapping({"thread": "M6", "property_class": "8.8", "head": "socket",
...     "layers": [{"thickness": "8 mm", "material": "EN AW-6082-T6"}], "engagement": "12 mm",
...     "housing_material": "EN AC-46000", "count": 6, "bolt_circle": "80 mm",
...     "axial_force": "3 kN", "mu_thread": [0.10, 0.16], "mu_head": [0.10, 0.16],
...     "tightening": "torque_wrench_estimated_friction"})
>>> r = evaluate(inp)
>>> round(r.tightening_torque / 1000, 1)   # N·m
9.1
>>> r.ok
True
"""

from __future__ import annotations

# The package is split along its seams: schema and parsing, evaluation, results. Every name other
# modules and tests use stays importable from ``fitcheck.screws``.
from .evaluate import (  # noqa: F401
    _eccentric,
    _evaluate,
    _limits_for,
    _pattern_xy,
    _wrench_setting,
    evaluate,
)
from .results import ScrewJointResult
from .schema import (  # noqa: F401
    ECCENTRIC_NOTES,
    GASKET_NOTES,
    KEYS,
    METHOD_NOTES,
    MU_RANGE,
    NM_TO_LBF_IN,
    SHEAR_SAFETY,
    SLIP_SAFETY,
    Gasket,
    Layer,
    ScrewJointInput,
    _default_outer_diameter,
    _pattern_xy_raw,
)

__all__ = ["KEYS", "METHOD_NOTES", "Layer", "Gasket", "ScrewJointInput", "ScrewJointResult", "evaluate",
           "MU_RANGE"]
