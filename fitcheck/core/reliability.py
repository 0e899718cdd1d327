"""Statistics kernels for tolerance studies: random inputs, failure probabilities, their errors.

Everything here is generic: a *limit-state function* ``g`` maps an ``(n, d)``
array of independent standard-normal variables ``u`` to ``n`` values, with
``g <= 0`` meaning failure. Physical inputs are obtained from ``u`` by the
isoprobabilistic (Rosenblatt) transform of each marginal, ``x = F⁻¹(Φ(u))``,
so that plain sampling, importance sampling and FORM all work in the same
space. No pint, no I/O; plain floats and NumPy arrays.

Contents
--------
* :class:`Marginal` and :func:`marginal_from_u` — uniform, normal, truncated
  normal, lognormal and constant marginals from standard-normal variables.
* :func:`clopper_pearson` — exact binomial confidence interval.
* :func:`plain_samples_needed` — sample count of plain Monte Carlo for a
  target relative error.
* :func:`plain_sampling`, :func:`importance_sampling` — chunked estimators of
  P(g <= 0) with standard errors.
* :func:`form` — first-order reliability method (Hasofer–Lind reliability
  index by constrained minimisation with :func:`scipy.optimize.minimize`).
* :func:`dkw_epsilon` — distribution-free bound on the error of an empirical
  CDF, used by the tests of sampled distributions.

References
----------
.. [CP] C. J. Clopper, E. S. Pearson, "The use of confidence or fiducial limits
   illustrated in the case of the binomial", Biometrika 26 (1934) 404–413.
.. [HL] A. M. Hasofer, N. C. Lind, "Exact and invariant second-moment code
   format", J. Eng. Mech. Div. ASCE 100 (1974) 111–121.
.. [MB] R. E. Melchers, A. T. Beck, Structural Reliability Analysis and
   Prediction, 3rd ed., Wiley 2018: ch. 3 (Monte Carlo, importance sampling
   about the design point), ch. 4 (FORM, Rosenblatt transform).
.. [DKW] A. Dvoretzky, J. Kiefer, J. Wolfowitz, Ann. Math. Statist. 27 (1956)
   642–669, with the tight constant of P. Massart, Ann. Probab. 18 (1990)
   1269–1283.
"""

from __future__ import annotations

import math
from collections.abc import Callable
from dataclasses import dataclass

import numpy as np
from scipy import optimize, special, stats

#: Default chunk of samples evaluated at once: bounds the memory of a study.
DEFAULT_CHUNK = 100_000

#: Marginal kinds and the meaning of their parameters (a, b, c, d).
KINDS = {
    "constant": "value a",
    "uniform": "lower a, upper b",
    "normal": "mean a, standard deviation b",
    "truncnormal": "mean a, standard deviation b of the parent normal, truncated to [c, d]",
    "lognormal": "median a, coefficient of variation b (of the lognormal itself)",
}


def marginal_from_u(u, kind: str, a: float, b: float = 0.0, c: float = -math.inf,
                    d: float = math.inf):
    """Transform standard-normal values into values of one marginal distribution.

    .. math:: x = F^{-1}\\left(\\Phi(u)\\right)

    Parameters
    ----------
    u : float or ndarray
        Standard-normal variables [-].
    kind : str
        One of :data:`KINDS`.
    a, b, c, d : float
        Parameters as listed in :data:`KINDS`, in the unit of ``x``
        (the lognormal's ``b`` is dimensionless).

    Returns
    -------
    ndarray
        Values with the same shape as ``u`` [unit of the parameters].

    Notes
    -----
    Uniform: ``x = a + (b - a)·Φ(u)``. Truncated normal: ``x = a + b·Φ⁻¹(Φ(α) +
    Φ(u)(Φ(β) − Φ(α)))`` with ``α = (c − a)/b``, ``β = (d − a)/b``. Lognormal with
    median ``m`` and coefficient of variation ``v``: ``σ_ln = √ln(1 + v²)``,
    ``x = m·exp(σ_ln·u)``. The transform is monotone increasing, so a quantile
    of ``u`` is the same quantile of ``x``.

    References
    ----------
    Melchers & Beck (2018), sec. 4.5 (Rosenblatt transform) [MB]_.

    Examples
    --------
    >>> float(marginal_from_u(0.0, "uniform", 10.0, 20.0))
    15.0
    >>> round(float(marginal_from_u(1.0, "normal", 5.0, 2.0)), 12)
    7.0
    >>> round(float(marginal_from_u(0.0, "lognormal", 0.12, 0.2)), 12)
    0.12
    """
    u = np.asarray(u, dtype=float)
    if kind == "constant":
        return np.full_like(u, a)
    if kind == "uniform":
        return a + (b - a) * special.ndtr(u)
    if kind == "normal":
        return a + b * u
    if kind == "truncnormal":
        lo = special.ndtr((c - a) / b) if math.isfinite(c) else 0.0
        hi = special.ndtr((d - a) / b) if math.isfinite(d) else 1.0
        pr = lo + special.ndtr(u) * (hi - lo)
        # keep strictly inside (0, 1) so that ndtri stays finite at the tails
        pr = np.clip(pr, np.nextafter(lo, 1.0), np.nextafter(hi, 0.0))
        return np.clip(a + b * special.ndtri(pr), c, d)
    if kind == "lognormal":
        s = math.sqrt(math.log1p(b * b))
        return a * np.exp(s * u)
    raise ValueError(f"unknown marginal kind {kind!r}; known: {', '.join(KINDS)}")


@dataclass(frozen=True)
class Marginal:
    """One random input: its kind and parameters (see :data:`KINDS`).

    Examples
    --------
    >>> m = Marginal("uniform", 2.0, 4.0)
    >>> round(m.mean, 12), round(m.std, 6)
    (3.0, 0.57735)
    >>> m.bounds
    (2.0, 4.0)
    """

    kind: str
    a: float
    b: float = 0.0
    c: float = -math.inf
    d: float = math.inf

    def __post_init__(self) -> None:
        if self.kind not in KINDS:
            raise ValueError(f"unknown marginal kind {self.kind!r}; known: {', '.join(KINDS)}")
        if self.kind == "uniform" and not self.b >= self.a:
            raise ValueError("uniform marginal needs upper >= lower")
        if self.kind in ("normal", "truncnormal", "lognormal") and not self.b > 0:
            raise ValueError(f"{self.kind} marginal needs a positive second parameter")
        if self.kind == "truncnormal" and not self.d > self.c:
            raise ValueError("truncated normal needs upper > lower")
        if self.kind == "lognormal" and not self.a > 0:
            raise ValueError("lognormal marginal needs a positive median")

    def from_u(self, u):
        """``F⁻¹(Φ(u))`` for this marginal (see :func:`marginal_from_u`)."""
        return marginal_from_u(u, self.kind, self.a, self.b, self.c, self.d)

    @property
    def random(self) -> bool:
        """False for a constant (or a zero-width uniform), which needs no random variable."""
        return not (self.kind == "constant" or (self.kind == "uniform" and self.a == self.b))

    @property
    def frozen(self):
        """The equivalent :mod:`scipy.stats` frozen distribution (for checks and moments)."""
        if self.kind == "constant" or (self.kind == "uniform" and self.a == self.b):
            return stats.uniform(loc=self.a, scale=0.0)
        if self.kind == "uniform":
            return stats.uniform(loc=self.a, scale=self.b - self.a)
        if self.kind == "normal":
            return stats.norm(loc=self.a, scale=self.b)
        if self.kind == "truncnormal":
            return stats.truncnorm((self.c - self.a) / self.b, (self.d - self.a) / self.b,
                                   loc=self.a, scale=self.b)
        s = math.sqrt(math.log1p(self.b ** 2))
        return stats.lognorm(s, scale=self.a)

    @property
    def mean(self) -> float:
        if not self.random:
            return float(self.a)
        return float(self.frozen.mean())

    @property
    def std(self) -> float:
        if not self.random:
            return 0.0
        return float(self.frozen.std())

    @property
    def bounds(self) -> tuple[float, float]:
        """Support of the marginal (infinite for normal and lognormal tails)."""
        if not self.random:
            return (float(self.a), float(self.a))
        if self.kind == "uniform":
            return (float(self.a), float(self.b))
        if self.kind == "truncnormal":
            return (float(self.c), float(self.d))
        if self.kind == "lognormal":
            return (0.0, math.inf)
        return (-math.inf, math.inf)


def normal_from_capability(lower: float, upper: float, cp: float, cpk: float,
                           toward: str = "least_material", feature: str = "shaft"):
    """Mean and standard deviation of a size from its zone and process capability.

    .. math::
        T = U - L, \\quad \\sigma = \\frac{T}{6\\,C_p}, \\quad
        |\\mu - m| = 3\\sigma\\,(C_p - C_{pk}), \\quad m = \\frac{U + L}{2}

    so that ``min(U − μ, μ − L) / (3σ) = Cpk``.

    Parameters
    ----------
    lower, upper : float
        Limits of the zone [any length unit; µm in fitcheck].
    cp, cpk : float
        Process capability indices, ``0 < cpk <= cp`` [-].
    toward : {"least_material", "max_material"}
        Direction of the mean shift. Least material: shaft smaller, bore
        larger (a looser fit: conservative for slip). Max material: shaft
        larger, bore smaller (a tighter fit: conservative for yield and for
        press force).
    feature : {"shaft", "hole"}
        Which feature the zone belongs to (decides the sign of the shift).

    Returns
    -------
    (mean, std) : tuple of float
        [unit of the limits]

    References
    ----------
    ISO 22514-2:2017, capability indices Cp = (U − L)/(6σ),
    Cpk = min(U − μ, μ − L)/(3σ) (from memory).

    Examples
    --------
    >>> normal_from_capability(0.0, 12.0, 1.0, 1.0)
    (6.0, 2.0)
    >>> normal_from_capability(0.0, 12.0, 1.0, 0.5, "least_material", "shaft")
    (3.0, 2.0)
    >>> normal_from_capability(0.0, 12.0, 1.0, 0.5, "least_material", "hole")
    (9.0, 2.0)
    """
    if not (cp > 0 and 0 < cpk <= cp):
        raise ValueError("need cp > 0 and 0 < cpk <= cp")
    if upper <= lower:
        raise ValueError("need upper > lower")
    if toward not in ("least_material", "max_material"):
        raise ValueError("toward must be 'least_material' or 'max_material'")
    if feature not in ("shaft", "hole"):
        raise ValueError("feature must be 'shaft' or 'hole'")
    width = upper - lower
    sigma = width / (6.0 * cp)
    offset = 3.0 * sigma * (cp - cpk)
    # a shaft at least material is small, a hole at least material is large
    sign = -1.0 if (toward == "least_material") == (feature == "shaft") else 1.0
    return (0.5 * (upper + lower) + sign * offset, sigma)


def clopper_pearson(k, n, confidence: float = 0.95):
    """Exact (Clopper–Pearson) two-sided confidence interval of a binomial proportion.

    .. math::
        p_{lo} = B^{-1}\\left(\\tfrac{1-\\gamma}{2}; k, n-k+1\\right), \\quad
        p_{hi} = B^{-1}\\left(\\tfrac{1+\\gamma}{2}; k+1, n-k\\right)

    with :math:`B^{-1}` the beta quantile, ``p_lo = 0`` for ``k = 0`` and
    ``p_hi = 1`` for ``k = n``.

    Parameters
    ----------
    k : int or ndarray
        Number of failures observed [-].
    n : int or ndarray
        Number of trials [-].
    confidence : float
        Two-sided confidence level γ [-].

    Returns
    -------
    (lo, hi) : tuple of float or ndarray
        Confidence limits of the probability [-].

    References
    ----------
    Clopper & Pearson (1934) [CP]_; same as
    ``scipy.stats.binomtest(k, n).proportion_ci(method="exact")``.

    Examples
    --------
    >>> lo, hi = clopper_pearson(0, 1000)
    >>> lo, round(float(hi), 6)
    (0.0, 0.003682)
    >>> [round(float(x), 4) for x in clopper_pearson(5, 10)]
    [0.1871, 0.8129]
    """
    k = np.asarray(k, dtype=float)
    n = np.asarray(n, dtype=float)
    alpha = 1.0 - confidence
    with np.errstate(invalid="ignore"):
        lo = np.where(k > 0, stats.beta.ppf(alpha / 2, np.maximum(k, 1e-300), n - k + 1), 0.0)
        hi = np.where(k < n, stats.beta.ppf(1 - alpha / 2, k + 1, np.maximum(n - k, 1e-300)), 1.0)
    if lo.ndim == 0:
        return float(lo), float(hi)
    return lo, hi


def plain_samples_needed(p: float, rel_err: float, confidence: float | None = 0.95) -> float:
    """Samples plain Monte Carlo needs to estimate a probability ``p`` to a relative error.

    With ``confidence`` given, the half-width of the normal-approximation
    interval is held to ``rel_err·p``; with ``confidence=None``, the
    coefficient of variation of the estimate is:

    .. math::
        n = \\frac{z^2 (1 - p)}{\\delta^2 p} \\quad\\text{or}\\quad
        n = \\frac{1 - p}{\\delta^2 p}

    Parameters
    ----------
    p : float
        The probability to be estimated [-].
    rel_err : float
        Relative error δ [-], e.g. 0.1.
    confidence : float or None
        Two-sided confidence level of the half-width [-].

    Returns
    -------
    float
        Sample count (rounded up) [-]; ``inf`` when ``p`` is so small that the count
        exceeds the largest float.

    References
    ----------
    Melchers & Beck (2018), sec. 3.3, variance of the crude Monte Carlo
    estimator Var = p(1 − p)/n [MB]_.

    Examples
    --------
    >>> plain_samples_needed(1e-4, 0.1, None)
    999900.0
    >>> plain_samples_needed(1e-4, 0.1)
    3841075.0
    """
    if not (0 < p < 1) or not rel_err > 0:
        raise ValueError("need 0 < p < 1 and rel_err > 0")
    z2 = 1.0 if confidence is None else stats.norm.ppf(0.5 + confidence / 2) ** 2
    n = z2 * (1 - p) / (rel_err ** 2 * p) - 1e-9
    return float(math.ceil(n)) if math.isfinite(n) else math.inf  # p near 5e-324: beyond any count


def dkw_epsilon(n: int, alpha: float = 1e-3) -> float:
    """Half-width of a distribution-free confidence band of an empirical CDF.

    .. math:: P\\left(\\sup_x |F_n(x) - F(x)| > \\varepsilon\\right) \\le 2 e^{-2 n \\varepsilon^2}
       \\;\\Rightarrow\\; \\varepsilon = \\sqrt{\\ln(2/\\alpha) / (2n)}

    Parameters
    ----------
    n : int
        Sample count [-].
    alpha : float
        Probability that the band is exceeded [-].

    Returns
    -------
    float
        ε [-].

    References
    ----------
    Dvoretzky–Kiefer–Wolfowitz inequality with Massart's constant [DKW]_.

    Examples
    --------
    >>> round(dkw_epsilon(10_000, 0.05), 5)
    0.01358
    """
    return math.sqrt(math.log(2.0 / alpha) / (2.0 * n))


# --------------------------------------------------------------------------------------
# estimators of P(g <= 0)


@dataclass(frozen=True)
class Estimate:
    """An estimated failure probability.

    Attributes
    ----------
    method : str
        ``"plain"``, ``"importance"`` or ``"form"``.
    p : float
        Estimate of P(g <= 0) [-].
    se : float
        Standard error of the estimate [-] (0 for FORM, which has no sampling error).
    lo, hi : float
        Confidence limits [-] (Clopper–Pearson for plain sampling, normal
        approximation for importance sampling, equal to ``p`` for FORM).
    n : int
        Samples used (limit-state evaluations for FORM) [-].
    failures : int
        Samples in the failure domain [-].
    beta : float
        Reliability index −Φ⁻¹(p) [-].
    note : str
    """

    method: str
    p: float
    se: float
    lo: float
    hi: float
    n: int
    failures: int
    beta: float
    note: str = ""

    @property
    def rel_err(self) -> float:
        """Coefficient of variation of the estimate (inf when p = 0)."""
        return self.se / self.p if self.p > 0 else math.inf

    def to_dict(self) -> dict:
        return {"method": self.method, "p": self.p, "se": self.se, "lo": self.lo, "hi": self.hi,
                "n": self.n, "failures": self.failures, "beta": self.beta,
                "rel_err": self.rel_err, "note": self.note}


def _beta_of(p: float) -> float:
    return float(-special.ndtri(p)) if 0 < p < 1 else (math.inf if p <= 0 else -math.inf)


def _chunks(n: int, chunk: int):
    done = 0
    while done < n:
        m = min(chunk, n - done)
        yield m
        done += m


def plain_sampling(g: Callable, dim: int, n: int, rng: np.random.Generator,
                   chunk: int = DEFAULT_CHUNK, confidence: float = 0.95) -> Estimate:
    """Crude Monte Carlo estimate of P(g(U) <= 0), U standard normal in ``dim`` dimensions.

    Parameters
    ----------
    g : callable
        Limit-state function, ``(m, dim) ndarray -> (m,) ndarray`` [-].
    dim : int
        Number of standard-normal variables [-].
    n : int
        Number of samples [-].
    rng : numpy.random.Generator
        Source of randomness; rows are drawn in order, so the result does not
        depend on ``chunk``.
    chunk : int
        Samples evaluated at once (bounds memory) [-].
    confidence : float
        Level of the Clopper–Pearson interval [-].

    Returns
    -------
    Estimate

    References
    ----------
    Melchers & Beck (2018), sec. 3.3 [MB]_; Clopper & Pearson (1934) [CP]_.

    Examples
    --------
    >>> rng = np.random.default_rng(1)
    >>> e = plain_sampling(lambda u: 1.0 - u[:, 0], 1, 100_000, rng)
    >>> abs(e.p - 0.158655) < 4 * e.se
    True
    """
    if n < 1:
        raise ValueError("n must be >= 1")
    k = 0
    for m in _chunks(n, chunk):
        u = rng.standard_normal((m, dim))
        k += int(np.count_nonzero(np.asarray(g(u)) <= 0))
    p = k / n
    lo, hi = clopper_pearson(k, n, confidence)
    return Estimate("plain", p, math.sqrt(p * (1 - p) / n), lo, hi, n, k, _beta_of(p))


def importance_sampling(g: Callable, dim: int, center, n: int, rng: np.random.Generator,
                        chunk: int = DEFAULT_CHUNK, confidence: float = 0.95) -> Estimate:
    """Importance-sampling estimate of P(g(U) <= 0) with the density shifted to ``center``.

    Samples are drawn from N(c, I) and weighted by the likelihood ratio

    .. math::
        w(u) = \\frac{\\varphi(u)}{\\varphi(u - c)} = \\exp\\left(-u\\cdot c + \\tfrac12 c\\cdot c\\right),
        \\qquad \\hat p = \\frac1n \\sum I[g(u_i) \\le 0]\\, w(u_i),
        \\qquad SE = \\sqrt{\\frac{\\overline{(I w)^2} - \\hat p^2}{n - 1}}

    Parameters
    ----------
    g : callable
        Limit-state function, ``(m, dim) ndarray -> (m,) ndarray`` [-].
    dim : int
        Number of standard-normal variables [-].
    center : array_like
        Shift of the sampling density, normally the FORM design point [-].
    n : int
        Number of samples [-].
    rng : numpy.random.Generator
        Source of randomness (rows drawn in order: independent of ``chunk``).
    chunk : int
        Samples evaluated at once [-].
    confidence : float
        Level of the normal-approximation interval ``p ± z·SE`` (clipped at 0) [-].

    Returns
    -------
    Estimate

    Notes
    -----
    Unbiased for any ``center``; efficient when ``center`` is the most likely
    failure point (the design point), where about half of the samples fail.
    Sums are accumulated chunk by chunk in a fixed order, so the result does
    not depend on ``chunk`` beyond floating-point summation order.

    References
    ----------
    Melchers & Beck (2018), sec. 3.4, importance sampling about the design
    point [MB]_.

    Examples
    --------
    >>> rng = np.random.default_rng(2)
    >>> e = importance_sampling(lambda u: 4.0 - u[:, 0], 1, [4.0], 20_000, rng)
    >>> abs(e.p / 3.167124e-05 - 1) < 4 * e.rel_err < 0.1   # Φ(−4)
    True
    """
    c = np.asarray(center, dtype=float).reshape(dim)
    if n < 2:
        raise ValueError("n must be >= 2")
    half_cc = 0.5 * float(c @ c)
    s1 = 0.0
    s2 = 0.0
    k = 0
    for m in _chunks(n, chunk):
        u = rng.standard_normal((m, dim)) + c
        fail = np.asarray(g(u)) <= 0
        w = np.exp(-(u[fail] @ c) + half_cc)
        s1 += float(w.sum())
        s2 += float((w * w).sum())
        k += int(w.size)
    p = s1 / n
    var = max(s2 / n - p * p, 0.0) / (n - 1)
    se = math.sqrt(var)
    z = float(stats.norm.ppf(0.5 + confidence / 2))
    return Estimate("importance", p, se, max(p - z * se, 0.0), min(p + z * se, 1.0), n, k,
                    _beta_of(p), f"density shifted to the design point, |c| = {math.sqrt(2 * half_cc):.3g}")


@dataclass(frozen=True)
class FormResult:
    """Result of the first-order reliability method.

    Attributes
    ----------
    beta : float
        Hasofer–Lind reliability index, signed (negative when the mean point fails) [-].
    p : float
        First-order probability Φ(−β) [-].
    u_star : tuple of float
        Design point (most likely failure point) in standard-normal space [-].
    alpha : tuple of float
        Direction cosines u*/β (sensitivities) [-].
    converged : bool
    n_calls : int
        Limit-state evaluations (rows) used [-].
    note : str
    """

    beta: float
    p: float
    u_star: tuple
    alpha: tuple
    converged: bool
    n_calls: int
    note: str = ""

    def estimate(self) -> Estimate:
        return Estimate("form", self.p, 0.0, self.p, self.p, self.n_calls, 0, self.beta,
                        "first-order approximation" + (f"; {self.note}" if self.note else ""))


def _grad(g, u, h=1e-6):
    """Value and forward-difference gradient of g at one point (one vectorised call)."""
    d = u.size
    pts = np.vstack([u, u + h * np.eye(d)])
    vals = np.asarray(g(pts), dtype=float)
    return vals[0], (vals[1:] - vals[0]) / h


def form(g: Callable, dim: int, u0=None, *, tol: float = 1e-6, max_iter: int = 100) -> FormResult:
    """First-order reliability: the Hasofer–Lind index of a limit state in standard-normal space.

    .. math::
        \\beta = \\min_{g(u) = 0} \\lVert u \\rVert, \\qquad p_F \\approx \\Phi(-\\beta)

    solved as a constrained minimisation (SLSQP of :func:`scipy.optimize.minimize`)
    started from a few Hasofer–Lind–Rackwitz–Fiessler steps.

    Parameters
    ----------
    g : callable
        Limit-state function, ``(m, dim) ndarray -> (m,) ndarray``, failure
        where ``g <= 0`` [-].
    dim : int
        Number of standard-normal variables [-].
    u0 : array_like, optional
        Start point (default: the origin) [-].
    tol : float
        Tolerance on the constraint (relative to |g(0)|) and on β [-].
    max_iter : int
        Iteration limit of the optimiser [-].

    Returns
    -------
    FormResult

    Notes
    -----
    Exact for a limit state linear in ``u``; for a curved one it is the
    first-order estimate, which importance sampling about ``u*`` corrects.
    The sign of β is that of ``g(0)``: β < 0 means the median point already
    fails.

    References
    ----------
    Hasofer & Lind (1974) [HL]_; Melchers & Beck (2018), sec. 4.4 [MB]_.

    Examples
    --------
    >>> r = form(lambda u: 3.0 - (u[:, 0] + u[:, 1]) / np.sqrt(2.0), 2)
    >>> round(r.beta, 6), r.converged
    (3.0, True)
    """
    u = np.zeros(dim) if u0 is None else np.asarray(u0, dtype=float).reshape(dim).copy()
    calls = 0
    g0 = float(np.asarray(g(np.zeros((1, dim))))[0])
    calls += 1
    scale = abs(g0) if g0 != 0 else 1.0

    def gs(x):
        return np.asarray(g(np.atleast_2d(x)), dtype=float) / scale

    # HL-RF steps: u_{k+1} = (grad·u_k - g(u_k)) grad / |grad|^2
    for _ in range(20):
        val, gr = _grad(gs, u)
        calls += dim + 1
        nrm2 = float(gr @ gr)
        if not np.isfinite(nrm2) or nrm2 == 0:
            break
        new = (float(gr @ u) - val) / nrm2 * gr
        if not np.all(np.isfinite(new)) or float(np.linalg.norm(new)) > 40:
            break
        done = np.linalg.norm(new - u) < 1e-4 * max(1.0, np.linalg.norm(new)) and abs(val) < tol
        u = new
        if done:
            break

    counter = {"n": 0}

    def con(x):
        counter["n"] += 1
        return float(gs(x)[0])

    def con_jac(x):
        counter["n"] += dim + 1
        return _grad(gs, np.asarray(x, dtype=float))[1]

    res = optimize.minimize(lambda x: 0.5 * float(x @ x), u, jac=lambda x: x, method="SLSQP",
                            constraints=[{"type": "eq", "fun": con, "jac": con_jac}],
                            options={"ftol": 1e-10, "maxiter": max_iter})
    calls += counter["n"]
    ustar = np.asarray(res.x, dtype=float)
    if not np.all(np.isfinite(ustar)):
        ustar = u
    # optimality (KKT) of the design point, checked independently of the optimiser's flag:
    # on the limit state, and the gradient of g parallel to u*
    val, gr = _grad(gs, ustar)
    calls += dim + 1
    resid = abs(float(val))
    nu, ng = float(np.linalg.norm(ustar)), float(np.linalg.norm(gr))
    cos = abs(float(ustar @ gr)) / (nu * ng) if nu > 0 and ng > 0 else 0.0
    converged = resid < 1e-5 and (1.0 - cos) < 1e-5
    note = "" if converged else (f"design point not found ({res.message}); constraint residual "
                                 f"{resid:.2g}, alignment {cos:.6f}")
    b = float(np.linalg.norm(ustar))
    beta = b if g0 > 0 else -b
    alpha = tuple(float(x) for x in (ustar / b if b > 0 else ustar))
    return FormResult(beta, float(special.ndtr(-beta)), tuple(float(x) for x in ustar), alpha,
                      converged, calls, note)
