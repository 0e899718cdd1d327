"""Named verdicts shared by every analysis.

An analysis returns its results together with a list of :class:`Check`; the
CLI, the report and the browser show the same objects, so a verdict is decided
in exactly one place.
"""

from __future__ import annotations

import math
from dataclasses import asdict, dataclass


@dataclass(frozen=True)
class Check:
    """One pass/fail verdict.

    Attributes
    ----------
    name : str
        Short name, e.g. ``"slip at loosest fit"``.
    value : float
        The computed value (e.g. a safety factor, a stress) in ``unit``.
    limit : float
        The limit it is held against, in ``unit``.
    sense : str
        ``">="`` when the value must reach the limit (safety factors, clamp
        loads), ``"<="`` when it must stay below it (stresses, pressures).
    unit : str
        Display unit of value and limit ("" for factors).
    reference : str
        The clause, table or equation the check follows.
    note : str
        An optional sentence shown with the verdict.
    """

    name: str
    value: float
    limit: float
    sense: str
    unit: str = ""
    reference: str = ""
    note: str = ""

    def __post_init__(self) -> None:
        if self.sense not in (">=", "<="):
            raise ValueError(f"Check.sense must be '>=' or '<=', got {self.sense!r}")

    @property
    def passed(self) -> bool:
        v, lim = self.value, self.limit
        if v is None or (isinstance(v, float) and math.isnan(v)):
            return False
        return v >= lim if self.sense == ">=" else v <= lim

    @property
    def margin(self) -> float:
        """Relative margin: >0 passes, <0 fails; ``value/limit - 1`` or ``1 - value/limit``."""
        v, lim = float(self.value), float(self.limit)
        if math.isnan(v):
            return -math.inf
        if lim == 0:
            if self.sense == ">=":
                return math.inf if v > 0 else (0.0 if v == 0 else -math.inf)
            return math.inf if v < 0 else (0.0 if v == 0 else -math.inf)
        return (v / lim - 1.0) if self.sense == ">=" else (1.0 - v / lim)

    def to_dict(self) -> dict:
        d = asdict(self)
        d["passed"] = self.passed
        d["margin"] = _finite_or_none(self.margin)
        d["value"] = _finite_or_none(self.value)
        d["limit"] = _finite_or_none(self.limit)
        return d


def _finite_or_none(x):
    try:
        xf = float(x)
    except (TypeError, ValueError):
        return None
    return xf if math.isfinite(xf) else None


def all_passed(checks) -> bool:
    """True when every check passes (and there is at least one)."""
    checks = list(checks)
    return bool(checks) and all(c.passed for c in checks)


def worst(checks) -> Check | None:
    """The check with the smallest margin."""
    checks = list(checks)
    return min(checks, key=lambda c: c.margin) if checks else None
