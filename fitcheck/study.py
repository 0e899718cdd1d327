"""Tolerance study of a press fit: how often does a production lot slip or yield?

Worst-case stacking (:func:`fitcheck.pressfit.evaluate`) puts the loosest
shaft in the largest bore with the lowest friction; it is safe but says nothing
about how often a real lot fails. :func:`run_study` draws the sizes of shaft
and bore within their ISO 286 zones, the friction coefficient, the roughness
depths and the operating temperature from stated distributions, evaluates
every sampled joint with the vectorised core (:func:`fitcheck.core.pressfit.evaluate`),
and reports

* distributions (mean, spread, percentiles, histograms) of contact pressure,
  torque capacity, stresses, safeties and press-in force;
* the probabilities of **slip** (the friction capacity at the sampled fit falls
  below the load: slip safety < 1) and of **yield** (von Mises stress at hub
  bore or shaft above Rp0.2, or for a brittle part the largest principal stress
  above Rm), each with a Clopper–Pearson confidence interval;
* for small probabilities, the first-order reliability index (FORM) and an
  importance-sampling estimate about its design point with its standard error;
* optionally the verdict on a target such as P(slip) ≤ 1e-4 and the number of
  samples plain sampling would need for a given relative error;
* the worst-case (arithmetic) result beside it.

Random inputs (independent; see :class:`StudySettings`)
-------------------------------------------------------
sizes
    ``"uniform"`` over the zone (default), or ``"normal"`` from a process
    capability: σ = T/(6·Cp), the mean moved from the zone centre by
    3σ·(Cp − Cpk) so that Cpk holds, toward the *least-material* limit by
    default (shaft smaller, bore larger: the looser side, conservative for
    slip) or toward the *max-material* limit. With ``inspected=True``
    (default) parts outside the zone are rejected at inspection: the normal is
    truncated to the zone.
friction coefficient μ (against slip)
    lognormal with median = the joint's design value and coefficient of
    variation 0.15 (common practice); the press-in coefficient moves with it
    in proportion (fully correlated).
roughness depths Rz of shaft and bore
    uniform between 0.6·Rz and 1.0·Rz of the drawing value (common practice:
    the drawing states a maximum).
operating temperature
    uniform between the minimum and the maximum given; the hub takes the
    sampled temperature and the shaft keeps the joint's stated excess over the
    hub (``temperature_shaft − temperature_hub``). Without a range the
    temperatures stay at the joint's values.

Loads, geometry and materials are taken as given (deterministic).
"""

from __future__ import annotations

import math
import warnings
from collections.abc import Mapping
from dataclasses import dataclass, field, fields, replace

import numpy as np

from . import CAUTION
from .checks import Check
from .core import lame
from .core import pressfit as _core
from .core import reliability as rel
from .errors import ErrorCollector, InputError, MethodRangeWarning, did_you_mean
from .units import number, temperature_c

__all__ = ["Distribution", "FailureMode", "StudyResult", "StudySettings", "TargetVerdict",
           "core_arguments", "run_study"]

SIZE_MODELS = ("uniform", "normal")
SHIFTS = ("least_material", "max_material")
FRICTION_MODELS = ("lognormal", "normal", "uniform", "constant")
PERCENTILES = (0.01, 0.1, 1.0, 5.0, 50.0, 95.0, 99.0, 99.9, 99.99)
MAX_SAMPLES = 20_000_000
REF_TARGET = "Clopper & Pearson (1934); Melchers & Beck, Structural Reliability, 3rd ed., ch. 3–4"


# --------------------------------------------------------------------------- settings

@dataclass(frozen=True)
class StudySettings:
    """How a tolerance study samples its inputs and what it estimates.

    Attributes
    ----------
    samples : int
        Plain Monte Carlo samples (default 100 000).
    seed : int or None
        Seed of the :class:`numpy.random.Generator` (PCG64); the same seed gives the same result.
    sizes : {"uniform", "normal"}
        Distribution of shaft and bore size within their zones.
    cp, cpk : float
        Process capability for ``sizes="normal"`` (default 1.33 and 1.33 — common practice for a
        capable process); ``0 < cpk <= cp``.
    shift : {"least_material", "max_material"}
        Direction of the mean offset when ``cpk < cp``.
    inspected : bool
        Parts outside their zone are rejected (truncated normal); default True.
    friction : {"lognormal", "normal", "uniform", "constant"}
        Distribution of μ; median (lognormal) or mean = the joint's design value.
    friction_cov : float
        Coefficient of variation of μ (default 0.15, common practice); for ``"uniform"`` the
        half-width is √3·cov·μ (the same standard deviation).
    roughness_low : float
        Lower end of the uniform Rz scatter as a share of the drawing value (default 0.6,
        common practice); 1.0 keeps Rz fixed.
    temperature_min, temperature_max : float or None
        Operating temperature range of the hub [°C]; None = the joint's own temperatures.
    target : float or None
        Target probability for slip and for yield, each (e.g. 1e-4).
    rel_err : float
        Relative error for the plain-sampling sample count (default 0.1).
    confidence : float
        Two-sided confidence level of the intervals (default 0.95).
    importance_samples : int
        Samples of the importance-sampling estimate about the FORM design point (default 20 000;
        0 switches FORM and importance sampling off).
    chunk : int
        Samples evaluated at once (default 100 000): bounds the memory.
    """

    samples: int = 100_000
    seed: int | None = 0
    sizes: str = "uniform"
    cp: float = 1.33          # common practice: a capable process
    cpk: float = 1.33
    shift: str = "least_material"
    inspected: bool = True
    friction: str = "lognormal"
    friction_cov: float = 0.15  # common practice
    roughness_low: float = 0.6  # common practice
    temperature_min: float | None = None
    temperature_max: float | None = None
    target: float | None = None
    rel_err: float = 0.1
    confidence: float = 0.95
    importance_samples: int = 20_000
    chunk: int = rel.DEFAULT_CHUNK

    @classmethod
    def from_mapping(cls, mapping: Mapping, field: str = "study") -> StudySettings:
        """Parse settings given as strings or numbers (CLI, case file, UI); all problems at once."""
        if not isinstance(mapping, Mapping):
            raise InputError(field, mapping, "a table of study settings")
        names = [f.name for f in fields(cls)]
        errs = ErrorCollector()
        v: dict = {}
        for key, val in mapping.items():
            if key not in names:
                errs.add(InputError(f"{field}.{key}", val, "a study setting: " + ", ".join(names),
                                    did_you_mean(key, names)))
                continue
            if val is None:
                continue
            with errs.field(field):
                v[key] = _parse_setting(key, val)
        errs.raise_if_any()
        out = cls(**v)
        out.validate(field)
        return out

    def validate(self, field: str = "study") -> None:
        """Raise :class:`InputError` (or several) for settings out of range."""
        errs = ErrorCollector()

        def bad(key, allowed, hint=""):
            errs.add(InputError(f"{field}.{key}", getattr(self, key), allowed, hint))

        if isinstance(self.samples, bool) or not isinstance(self.samples, int) or \
                not 100 <= self.samples <= MAX_SAMPLES:
            bad("samples", f"a whole number from 100 to {MAX_SAMPLES:,}")
        if self.seed is not None and (isinstance(self.seed, bool) or not isinstance(self.seed, int)
                                      or self.seed < 0):
            bad("seed", "a whole number >= 0 (or none for a fresh random seed)")
        if self.sizes not in SIZE_MODELS:
            bad("sizes", " or ".join(SIZE_MODELS), did_you_mean(str(self.sizes), SIZE_MODELS))
        if not (0.2 <= self.cp <= 10):
            bad("cp", "a process capability from 0.2 to 10")
        if not (0 < self.cpk <= self.cp):
            bad("cpk", f"0 < cpk <= cp ({self.cp:g})")
        if self.shift not in SHIFTS:
            bad("shift", " or ".join(SHIFTS), did_you_mean(str(self.shift), SHIFTS))
        if self.friction not in FRICTION_MODELS:
            bad("friction", ", ".join(FRICTION_MODELS), did_you_mean(str(self.friction), FRICTION_MODELS))
        if not (0 <= self.friction_cov <= 0.5):
            bad("friction_cov", "a coefficient of variation from 0 to 0.5")
        elif self.friction == "uniform" and self.friction_cov > 0.5 / math.sqrt(3):
            bad("friction_cov", "at most 0.288 for a uniform friction scatter (μ stays positive)")
        elif self.friction == "normal" and self.friction_cov > 0.25:
            bad("friction_cov", "at most 0.25 for a normal friction scatter (μ stays positive: "
                "use 'lognormal' for larger scatter)")
        if not (0 < self.roughness_low <= 1):
            bad("roughness_low", "a share of the drawing Rz, 0 < roughness_low <= 1")
        tmin, tmax = self.temperature_min, self.temperature_max
        if (tmin is None) != (tmax is None):
            bad("temperature_min" if tmin is None else "temperature_max",
                "both ends of the operating temperature range (or neither)")
        elif tmin is not None and tmin > tmax:
            bad("temperature_min", f"a temperature <= temperature_max ({tmax:g} degC)")
        if self.target is not None and not (0 < self.target < 0.5):
            bad("target", "a probability 0 < target < 0.5, e.g. 1e-4")
        if not (0 < self.rel_err < 1):
            bad("rel_err", "a relative error 0 < rel_err < 1, e.g. 0.1")
        if not (0.5 <= self.confidence < 1):
            bad("confidence", "a confidence level from 0.5 to below 1, e.g. 0.95")
        if isinstance(self.importance_samples, bool) or not isinstance(self.importance_samples, int) \
                or not (self.importance_samples == 0 or 1000 <= self.importance_samples <= MAX_SAMPLES):
            bad("importance_samples", f"0 (off) or a whole number from 1000 to {MAX_SAMPLES:,}")
        if isinstance(self.chunk, bool) or not isinstance(self.chunk, int) or not \
                1000 <= self.chunk <= 2_000_000:
            bad("chunk", "a whole number from 1000 to 2,000,000")
        errs.raise_if_any()


def _parse_setting(key, val):
    ints = ("samples", "seed", "importance_samples", "chunk")
    if key in ints:
        if isinstance(val, bool):
            raise InputError(key, val, "a whole number")
        try:
            f = float(val)
        except (TypeError, ValueError):
            raise InputError(key, val, "a whole number") from None
        if not math.isfinite(f) or not f.is_integer():
            raise InputError(key, val, "a whole number")
        return int(f)
    if key in ("sizes", "shift", "friction"):
        return str(val).strip().lower().replace("-", "_") if key == "shift" else str(val).strip().lower()
    if key == "inspected":
        if isinstance(val, bool):
            return val
        s = str(val).strip().lower()
        if s in ("true", "yes", "1"):
            return True
        if s in ("false", "no", "0"):
            return False
        raise InputError(key, val, "true or false")
    if key in ("temperature_min", "temperature_max"):
        return temperature_c(val, key, lo=-100.0, hi=500.0)
    return number(val, key)


# --------------------------------------------------------------------------- the joint

def core_arguments(inp) -> dict:
    """Keyword arguments of :func:`fitcheck.core.pressfit.evaluate` for a ``PressFitInput``.

    The same resolution of defaults as :func:`fitcheck.pressfit.evaluate` (friction from the
    table, hub diameter from module and teeth, joining clearance 0.001·d, heating limit of the hub
    material, brittle parts), plus the private keys ``_nominal``, ``_fit`` and the worst-case
    interference limits ``interference_min``/``interference_max`` [mm].
    """
    from . import pressfit as pf

    if not isinstance(inp, pf.PressFitInput):
        raise InputError("joint", type(inp).__name__, "a PressFitInput (fitcheck.pressfit)")
    kwargs, _source, _rule = pf.core_arguments(inp)
    return {**kwargs, "_nominal": kwargs["d"], "_fit": inp.fit}


@dataclass(frozen=True)
class Variable:
    """One random input of the study: its name, unit, marginal and a description."""

    name: str
    unit: str
    marginal: rel.Marginal
    description: str

    def to_dict(self) -> dict:
        m = self.marginal
        lo, hi = m.bounds
        return {"name": self.name, "unit": self.unit, "kind": m.kind, "mean": m.mean, "std": m.std,
                "lower": lo, "upper": hi, "description": self.description}


def _size_marginal(lower_um, upper_um, st: StudySettings, feature: str) -> rel.Marginal:
    if upper_um <= lower_um:
        return rel.Marginal("constant", lower_um)
    if st.sizes == "uniform":
        return rel.Marginal("uniform", lower_um, upper_um)
    mu, sd = rel.normal_from_capability(lower_um, upper_um, st.cp, st.cpk, st.shift, feature)
    if st.inspected:
        return rel.Marginal("truncnormal", mu, sd, lower_um, upper_um)
    return rel.Marginal("normal", mu, sd)


def _friction_marginal(mu: float, st: StudySettings) -> rel.Marginal:
    if st.friction == "constant" or st.friction_cov == 0:
        return rel.Marginal("constant", mu)
    if st.friction == "lognormal":
        return rel.Marginal("lognormal", mu, st.friction_cov)
    if st.friction == "normal":
        return rel.Marginal("normal", mu, st.friction_cov * mu)
    half = math.sqrt(3.0) * st.friction_cov * mu
    return rel.Marginal("uniform", mu - half, mu + half)


class _Model:
    """The sampled joint: maps standard-normal rows to core arguments and evaluates them."""

    def __init__(self, inp, st: StudySettings):
        from . import fits

        self.args = core_arguments(inp)
        a = self.args
        self.nominal = a.pop("_nominal")
        self.fit = a.pop("_fit")
        self.imin, self.imax = a.pop("interference_min"), a.pop("interference_max")
        variables: list[Variable] = []
        if self.fit is not None:
            f = fits.fit(self.fit)
            self.hole_zone, self.shaft_zone = f.hole, f.shaft
            variables.append(Variable("shaft_deviation", "um", _size_marginal(
                f.shaft.lower_um, f.shaft.upper_um, st, "shaft"),
                f"shaft size − nominal, within {f.shaft.cls}"))
            variables.append(Variable("hole_deviation", "um", _size_marginal(
                f.hole.lower_um, f.hole.upper_um, st, "hole"),
                f"bore size − nominal, within {f.hole.cls}"))
        else:
            self.hole_zone = self.shaft_zone = None
            variables.append(Variable("interference", "um", _size_marginal(
                self.imin * 1e3, self.imax * 1e3, st, "shaft"),
                "diametral interference within the given limits (no ISO classes: sampled as one)"))
        self.mu0, self.mu_press0 = a["mu_slip"], a["mu_press"]
        variables.append(Variable("mu_slip", "", _friction_marginal(self.mu0, st),
                                  f"friction coefficient against slip ({st.friction}, design value "
                                  f"{self.mu0:g}); the press-in coefficient moves in proportion"))
        for key, part in (("rz_shaft", "shaft"), ("rz_hub", "hub bore")):
            rz = a[key] * 1e3
            m = rel.Marginal("uniform", st.roughness_low * rz, rz) if st.roughness_low < 1 and rz > 0 \
                else rel.Marginal("constant", rz)
            variables.append(Variable(key, "um", m, f"mean roughness depth Rz of the {part}"))
        self.dT = a["T_shaft"] - a["T_hub"]
        if st.temperature_min is not None:
            m = rel.Marginal("uniform", st.temperature_min, st.temperature_max)
            variables.append(Variable("temperature", "degC", m,
                                      "operating temperature of the hub (uniform in the range); shaft "
                                      f"{self.dT:+g} K from it"))
        else:
            variables.append(Variable("temperature", "degC", rel.Marginal("constant", a["T_hub"]),
                                      "operating temperature of the hub (as given)"))
        self.variables = tuple(variables)
        self.random = tuple(v for v in variables if v.marginal.random)
        self.dim = len(self.random)
        # pressure per unit effective interference (Shigley eq. (3-56)), for a smooth slip limit state
        k = lame.compliance_hub(a["d"], a["Do"], a["Eh"], a["nuh"]) + \
            lame.compliance_shaft(a["d"], a["di"], a["Es"], a["nus"])
        self.c_p = 1.0 / (a["d"] * k)
        self.demand = math.hypot(2.0 * a["torque"] / a["d"], a["axial_force"])

    def values(self, u) -> dict:
        """Physical values of every variable for standard-normal rows ``u`` (m, dim); a fixed
        input is a plain float."""
        out = {}
        j = 0
        for v in self.variables:
            if v.marginal.random:
                out[v.name] = v.marginal.from_u(u[:, j])
                j += 1
            else:
                out[v.name] = float(v.marginal.a)  # a scalar: the core broadcasts it
        return out

    def evaluate(self, u) -> tuple[dict, dict]:
        x = self.values(u)
        if "interference" in x:
            inter = x["interference"] * 1e-3
        else:
            inter = (x["shaft_deviation"] - x["hole_deviation"]) * 1e-3
        mu = x["mu_slip"]
        kw = dict(self.args)
        kw.update(interference_min=inter, interference_max=None, mu_slip=mu,
                  mu_press=mu * (self.mu_press0 / self.mu0), rz_shaft=x["rz_shaft"] * 1e-3,
                  rz_hub=x["rz_hub"] * 1e-3, T_hub=x["temperature"],
                  T_shaft=x["temperature"] + self.dT)
        return _core.evaluate(**kw), x

    # limit states: failure where g <= 0 ------------------------------------------------------
    def g_slip(self, r: dict, x: dict):
        """Slip: friction capacity at the sampled interference below the load (safety < 1).

        Written with the unclipped effective interference so that it stays smooth through zero
        contact pressure; without load, the joint "slips" when it loses all pressure.
        """
        de = np.minimum(r["delta_eff_min_op"], r["delta_eff_min_asm"])
        p_lin = self.c_p * de
        if self.args.get("design") == "elastic-plastic":  # the partly plastic hub's pressure
            p_lin = np.where(de > 0.0, r["p_min"], p_lin)
        if self.demand > 0:
            a = self.args
            return p_lin * (math.pi * a["d"] * a["L"]) * x["mu_slip"] / self.demand - 1.0
        return p_lin  # [MPa]: no pressure left

    def g_yield(self, r: dict):
        """Yield (or fracture of a brittle part): 1 − largest stress/strength ratio."""
        a = self.args
        hub_strength = a["Rmh"] if a["brittle_hub"] else a["Rph"]
        shaft_strength = a["Rms"] if a["brittle_shaft"] else a["Rps"]
        hub = r["hub_stress_max"] / hub_strength if a.get("design", "elastic") == "elastic" else \
            r["plastic_utilisation"] * a["plastic_limit"]  # elastic-plastic: fully plastic hub = 1
        return 1.0 - np.maximum(hub, r["shaft_stress_max"] / shaft_strength)

    def reachable(self, mode: str) -> float | None:
        """Smallest limit-state value over the corners of the input box, or None when an input
        is unbounded (normal, lognormal) and every value can be reached.

        The limit states are monotone in each input (interference, friction, roughness and
        temperature enter linearly or as a positive factor), so their minimum over the box lies at
        a corner; 2**dim rows are evaluated at once.
        """
        if self.dim == 0:
            return None
        # friction enters neither the stresses nor the loss of all pressure (slip without load):
        # there it is left at its median
        skip_mu = mode == "yield" or self.demand == 0
        idx = [j for j, v in enumerate(self.random) if not (skip_mu and v.name == "mu_slip")]
        bounds = [self.random[j].marginal.bounds for j in idx]
        if not idx or not all(math.isfinite(lo) and math.isfinite(hi) for lo, hi in bounds):
            return None
        k = len(idx)
        corners = np.array(np.meshgrid(*[[-40.0, 40.0]] * k, indexing="ij")).reshape(k, -1).T
        u = np.zeros((corners.shape[0], self.dim))
        u[:, idx] = corners  # Φ(±40) maps onto the bounds
        with np.errstate(all="ignore"):
            return float(np.min(self.g_fun(mode)(u)))

    def g_fun(self, mode: str):
        def g(u):
            u = np.atleast_2d(u)
            r, x = self.evaluate(u)
            val = self.g_slip(r, x) if mode == "slip" else self.g_yield(r)
            return np.broadcast_to(val, (u.shape[0],))
        return g


# --------------------------------------------------------------------------- results

#: Sampled quantities: key → (label, unit, core output key, scale to the display unit)
QUANTITIES = {
    "pressure_min": ("contact pressure, loosest condition", "MPa", "p_min", 1.0),
    "pressure_max": ("contact pressure, tightest condition", "MPa", "p_max", 1.0),
    "torque_capacity": ("torque capacity", "N*m", "torque_capacity_min", 1e-3),
    "slip_safety": ("safety against slip", "", "slip_safety_min", 1.0),
    "hub_stress": ("hub bore equivalent stress", "MPa", "hub_stress_max", 1.0),
    "shaft_stress": ("shaft equivalent stress", "MPa", "shaft_stress_max", 1.0),
    "press_force": ("press-in force", "N", "press_force_max", 1.0),
}


@dataclass(frozen=True)
class Distribution:
    """Summary of one sampled quantity, in its display unit.

    ``percentiles`` pairs (percent, value); ``hist_edges``/``hist_counts`` a 60-bin histogram over
    the 0.01 … 99.99 % range (the tails beyond are counted in the end bins); ``limits`` pairs
    (label, value) of lines for a plot (required load, yield strength …).
    """

    key: str
    label: str
    unit: str
    mean: float
    std: float
    min: float
    max: float
    percentiles: tuple
    hist_edges: tuple
    hist_counts: tuple
    limits: tuple = ()

    def percentile(self, q: float) -> float:
        for p, v in self.percentiles:
            if abs(p - q) < 1e-12:
                return v
        raise KeyError(q)

    def histogram(self) -> dict:
        """The histogram as plain data for a chart: one row per bin and the finite limit lines.

        Returns ``{"lo": [...], "hi": [...], "count": [...], "share": [...], "limits": ((label,
        value), ...)}``: bin edges in :attr:`unit`, samples per bin, the share of the lot per bin
        [%] and the limits with a finite positive value (those a plot can draw).

        >>> d = Distribution("x", "x", "MPa", 2.0, 1.0, 1.0, 3.0, (), (1.0, 2.0, 3.0), (1, 3),
        ...                  (("strength", 2.5), ("none", math.inf)))
        >>> h = d.histogram()
        >>> h["share"], h["limits"]
        ([25.0, 75.0], (('strength', 2.5),))
        """
        edges = [float(e) for e in self.hist_edges]
        counts = [int(c) for c in self.hist_counts]
        total = sum(counts)
        return {"lo": edges[:-1], "hi": edges[1:], "count": counts,
                "share": [c / total * 100.0 if total else 0.0 for c in counts],
                "limits": tuple((label, float(v)) for label, v in self.limits
                                if v is not None and math.isfinite(v) and v > 0)}

    def to_dict(self) -> dict:
        return {"key": self.key, "label": self.label, "unit": self.unit, "mean": self.mean,
                "std": self.std, "min": self.min, "max": self.max,
                "percentiles": {f"{p:g}": v for p, v in self.percentiles},
                "limits": {k: v for k, v in self.limits}}


@dataclass(frozen=True)
class FailureMode:
    """Estimates of one failure probability.

    ``plain`` is the plain Monte Carlo estimate with its Clopper–Pearson interval; ``form`` the
    first-order result (None if not run); ``importance`` the importance-sampling estimate about the
    FORM design point (None if not run or FORM found no design point); ``best`` the estimate the
    verdict uses.
    """

    name: str
    definition: str
    plain: rel.Estimate
    form: rel.FormResult | None
    importance: rel.Estimate | None
    best: rel.Estimate
    note: str = ""

    def to_dict(self) -> dict:
        f = self.form
        return {"name": self.name, "definition": self.definition, "plain": self.plain.to_dict(),
                "form": None if f is None else {"beta": f.beta, "p": f.p, "converged": f.converged,
                                                "u_star": list(f.u_star), "alpha": list(f.alpha),
                                                "n_calls": f.n_calls, "note": f.note},
                "importance": None if self.importance is None else self.importance.to_dict(),
                "best": self.best.to_dict(), "note": self.note}


@dataclass(frozen=True)
class TargetVerdict:
    """A failure mode held against a target probability.

    ``upper`` is the upper confidence limit of the best estimate; the target is *met* when it is
    ≤ ``target``. ``plain_samples_at_target`` is the plain-sampling sample count for relative
    error ``rel_err`` (two-sided ``confidence``) at p = target, ``plain_samples_at_estimate`` at
    the estimated p (NaN when p = 0).
    """

    mode: str
    target: float
    estimate: float
    upper: float
    method: str
    met: bool
    rel_err: float
    plain_samples_at_target: float
    plain_samples_at_estimate: float

    def to_dict(self) -> dict:
        return {f.name: getattr(self, f.name) for f in fields(self)}


@dataclass(frozen=True)
class StudyResult:
    """Result of :func:`run_study` (plain floats in display units as named; see each class)."""

    joint: str
    fit: str | None
    settings: StudySettings
    variables: tuple
    samples: int
    distributions: tuple
    slip: FailureMode
    yield_: FailureMode
    fraction_meeting_design_checks: float
    targets: tuple
    worst_case: object            # fitcheck.pressfit.PressFitResult
    checks: tuple
    notes: tuple = ()
    caution: str = field(default=CAUTION, repr=False)

    @property
    def ok(self) -> bool:
        """Targets met when a target is given; otherwise the worst-case verdict."""
        return bool(self.checks) and all(c.passed for c in self.checks)

    def distribution(self, key: str) -> Distribution:
        for d in self.distributions:
            if d.key == key:
                return d
        raise KeyError(key)

    def to_json(self) -> dict:
        return {
            "joint": self.joint, "fit": self.fit,
            "settings": {f.name: getattr(self.settings, f.name) for f in fields(self.settings)},
            "variables": [v.to_dict() for v in self.variables],
            "samples": self.samples,
            "distributions": {d.key: d.to_dict() for d in self.distributions},
            "slip": self.slip.to_dict(), "yield": self.yield_.to_dict(),
            "fraction_meeting_design_checks": self.fraction_meeting_design_checks,
            "targets": [t.to_dict() for t in self.targets],
            "worst_case": self.worst_case.to_json(),
            "checks": [c.to_dict() for c in self.checks],
            "ok": self.ok, "notes": list(self.notes), "caution": self.caution,
        }


# --------------------------------------------------------------------------- the study

def _summary(key, arr, limits) -> Distribution:
    label, unit, _, _ = QUANTITIES[key]
    fin = np.isfinite(arr)
    finite = arr if bool(fin.all()) else arr[fin]
    if finite.size == 0:
        nan = math.nan
        return Distribution(key, label, unit, nan, nan, nan, nan, tuple((q, nan) for q in PERCENTILES),
                            (), (), limits)
    qs = np.percentile(finite, PERCENTILES).astype(np.float64)
    lo, hi = float(qs[0]), float(qs[-1])
    if not hi > lo:
        lo, hi = lo - 0.5 * max(abs(lo), 1e-9), hi + 0.5 * max(abs(hi), 1e-9)
    nb = 60
    edges = np.linspace(lo, hi, nb + 1)
    # equal bins: the bin index by scaling (no sort); the tails go to the end bins
    idx = np.floor((finite - np.float32(lo)) * np.float32(nb / (hi - lo)))
    counts = np.bincount(np.clip(idx, 0, nb - 1).astype(np.intp), minlength=nb)
    return Distribution(key, label, unit, float(finite.mean(dtype=np.float64)),
                        float(finite.std(dtype=np.float64)), float(finite.min()), float(finite.max()),
                        tuple((float(q), float(v)) for q, v in zip(PERCENTILES, qs, strict=True)),
                        tuple(float(e) for e in edges), tuple(int(c) for c in counts), limits)


def _best(plain: rel.Estimate, imp: rel.Estimate | None) -> tuple[rel.Estimate, str]:
    if imp is None:
        return plain, ""
    if plain.failures >= 30:
        diff = abs(plain.p - imp.p)
        if diff > 4.0 * math.hypot(plain.se, imp.se):
            worse = plain if plain.hi >= imp.hi else imp
            return worse, (f"plain sampling ({plain.p:.3g}) and importance sampling ({imp.p:.3g}) "
                           "disagree: the larger upper limit is used")
    if plain.failures == 0 or imp.rel_err < plain.rel_err:
        return imp, ""
    return plain, ""


def _failure_mode(name, definition, model: _Model, k: int, n: int, st: StudySettings,
                  rng) -> FailureMode:
    lo, hi = rel.clopper_pearson(k, n, st.confidence)
    p = k / n
    plain = rel.Estimate("plain", p, math.sqrt(p * (1 - p) / n), lo, hi, n, k, rel._beta_of(p))
    form = imp = None
    note = ""
    reach = model.reachable(name)
    if reach is not None and reach > 0:
        # every input is bounded and no corner of the input box fails: g is monotone in each
        # input, so no sampled joint can fail
        zero = rel.Estimate("bounds", 0.0, 0.0, 0.0, 0.0, 0, 0, math.inf,
                            "no combination of the input bounds fails (corners of the input box)")
        return FailureMode(name, definition, plain, None, None, zero,
                           f"{name} is out of reach: the worst corner of the bounded inputs keeps a "
                           f"margin g = {reach:.3g}, so P({name}) = 0 within the stated distributions")
    if st.importance_samples > 0 and model.dim > 0:
        with np.errstate(all="ignore"):
            form = rel.form(model.g_fun(name), model.dim)
        if form.converged and form.beta > 0:
            imp = rel.importance_sampling(model.g_fun(name), model.dim, form.u_star,
                                          st.importance_samples, rng, chunk=st.chunk,
                                          confidence=st.confidence)
        elif not form.converged:
            note = ("no design point found (failure may be out of reach of the bounded inputs): "
                    "the plain-sampling interval is used")
        else:
            note = "the median joint already fails: plain sampling is used"
    best, why = _best(plain, imp)
    return FailureMode(name, definition, plain, form, imp, best, "; ".join(x for x in (note, why) if x))


def run_study(joint, settings: StudySettings | None = None, **overrides) -> StudyResult:
    """Monte Carlo tolerance study of one press fit.

    Parameters
    ----------
    joint : fitcheck.pressfit.PressFitInput
        The joint (its fit, geometry, materials, loads and conditions).
    settings : StudySettings, optional
        How to sample; keyword ``overrides`` replace single settings
        (``run_study(inp, samples=10**6, seed=3, target=1e-4)``).

    Returns
    -------
    StudyResult

    Notes
    -----
    Plain sampling runs in chunks of ``settings.chunk`` rows of standard-normal variables drawn
    in order from one generator, so the result does not depend on the chunk size. FORM finds the
    most likely slip (and yield) point in standard-normal space; importance sampling about it
    estimates probabilities far below 1/samples with a standard error. Slip and yield are
    physical failures (safety < 1), not the design requirement (safety < required safety).

    References
    ----------
    Melchers & Beck, Structural Reliability Analysis and Prediction, 3rd ed. (2018), ch. 3–4;
    Clopper & Pearson, Biometrika 26 (1934); DIN 7190-1:2017 and Shigley, 10th ed. for the joint
    (see :mod:`fitcheck.pressfit`).

    Examples
    --------
    >>> from fitcheck.pressfit import PressFitInput
    >>> inp = PressFitInput.from_mapping({"fit": "20 H7/s6", "length": "16 mm",
    ...     "hub_outer_diameter": "40 mm", "shaft_material": "C45E", "hub_material": "C45E",
    ...     "torque": "12 N*m"})
    >>> r = run_study(inp, samples=20_000, seed=1, importance_samples=0)
    >>> r.samples, r.worst_case.ok, 0.0 <= r.slip.plain.p < 0.01
    (20000, True, True)
    """
    from . import pressfit as pf

    st = settings if settings is not None else StudySettings()
    if not isinstance(st, StudySettings):
        raise InputError("settings", type(st).__name__, "a StudySettings")
    if overrides:
        names = {f.name for f in fields(StudySettings)}
        for k in overrides:
            if k not in names:
                raise InputError(k, overrides[k], "a study setting: " + ", ".join(sorted(names)),
                                 did_you_mean(k, names))
        st = replace(st, **overrides)
    st.validate()
    with warnings.catch_warnings(record=True) as caught:
        warnings.simplefilter("always", MethodRangeWarning)
        worst = pf.evaluate(joint)
    model = _Model(joint, st)
    rng = np.random.default_rng(st.seed)
    n = st.samples

    store = {k: np.empty(n, dtype=np.float32) for k in QUANTITIES}
    k_slip = k_yield = k_ok = 0
    done = 0
    with np.errstate(all="ignore"):
        for m in rel._chunks(n, st.chunk):
            u = rng.standard_normal((m, model.dim))
            r, x = model.evaluate(u)
            for key, (_, _, src, scale) in QUANTITIES.items():
                store[key][done:done + m] = np.broadcast_to(r[src], (m,)) * scale
            k_slip += int(np.count_nonzero(np.broadcast_to(model.g_slip(r, x) <= 0, (m,))))
            k_yield += int(np.count_nonzero(np.broadcast_to(model.g_yield(r) <= 0, (m,))))
            k_ok += int(np.count_nonzero(np.broadcast_to(_design_ok(r, model.args), (m,))))
            done += m

    a = model.args
    hub_strength = a["Rmh"] if a["brittle_hub"] else a["Rph"]
    shaft_strength = a["Rms"] if a["brittle_shaft"] else a["Rps"]
    limits = {
        "torque_capacity": (("required torque", a["torque"] * 1e-3),
                            ("required × slip safety", a["torque"] * 1e-3 * a["slip_safety"])),
        "slip_safety": (("slip", 1.0), ("required", a["slip_safety"])),
        "hub_stress": (("hub strength", hub_strength),
                       ("strength / required safety", hub_strength / (a["fracture_safety"]
                        if a["brittle_hub"] else a["yield_safety"]))),
        "shaft_stress": (("shaft strength", shaft_strength),),
        "press_force": (("press limit", a["press_force_limit"]),) if math.isfinite(
            a["press_force_limit"]) else (),
    }
    dists = tuple(_summary(k, store[k], limits.get(k, ())) for k in QUANTITIES)
    del store

    slip = _failure_mode("slip", "friction capacity at the sampled fit below the load (slip safety < 1)"
                         if model.demand > 0 else "no contact pressure left (no load given)",
                         model, k_slip, n, st, rng)
    yld = _failure_mode("yield", "equivalent stress at hub bore or shaft above Rp0.2 (brittle part: "
                        "largest principal stress above Rm)" if a.get("design", "elastic") == "elastic" else
                        "hub plastic through its whole wall (elastic-plastic design), or equivalent stress "
                        "in the shaft above Rp0.2 (brittle shaft: largest principal stress above Rm)",
                        model, k_yield, n, st, rng)

    targets = []
    checks: list[Check] = []
    if st.target is not None:
        for fm in (slip, yld):
            b = fm.best
            n_t = rel.plain_samples_needed(st.target, st.rel_err, st.confidence)
            n_e = rel.plain_samples_needed(b.p, st.rel_err, st.confidence) if 0 < b.p < 1 else math.nan
            tv = TargetVerdict(fm.name, st.target, b.p, b.hi, b.method, b.hi <= st.target,
                               st.rel_err, n_t, n_e)
            targets.append(tv)
            checks.append(Check(f"P({fm.name}) upper {st.confidence:.0%} limit", b.hi, st.target, "<=",
                                "", REF_TARGET, f"{b.method} estimate {b.p:.3g}"
                                + ("" if tv.met or b.p > st.target else
                                   "; the estimate is below the target but not yet demonstrated: "
                                   "more samples")))
    else:
        checks = list(worst.checks)

    notes = [f"{w.message}" for w in caught if issubclass(w.category, MethodRangeWarning)]
    notes += [fm.note for fm in (slip, yld) if fm.note]
    if st.target is None:
        notes.append("no target probability given: the verdict is the worst-case result")
    return StudyResult(
        joint=joint.name, fit=model.fit, settings=st, variables=model.variables, samples=n,
        distributions=dists, slip=slip, yield_=yld, fraction_meeting_design_checks=k_ok / n,
        targets=tuple(targets), worst_case=worst, checks=tuple(checks), notes=tuple(notes))


def _design_ok(r: dict, a: dict):
    """Per sample: the design checks of fitcheck.pressfit (required safeties) all hold."""
    ok = (np.where(r["p_min"] > 0, r["slip_safety_min"], 0.0) >= a["slip_safety"])
    hub_req = a["fracture_safety"] if a["brittle_hub"] else a["yield_safety"]
    shaft_req = a["fracture_safety"] if a["brittle_shaft"] else a["yield_safety"]
    hub_ok = r["ok_hub"] if a.get("design") == "elastic-plastic" else r["hub_yield_safety"] >= hub_req
    ok = ok & hub_ok & (r["shaft_yield_safety"] >= shaft_req)
    ok = ok & (r["loosening_speed"] >= a["omega"])
    if a["shrink"]:
        ok = ok & (r["shrink_temperature"] <= a["max_heating"])
    else:
        ok = ok & (r["press_force_max"] <= a["press_force_limit"])
    return ok
