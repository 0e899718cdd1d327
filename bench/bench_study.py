"""Benchmark of the tolerance study and the fit search; prints figures, asserts nothing.

1. Vectorised joint evaluations per second (fitcheck.core.pressfit.evaluate on arrays of sampled
   interferences) against a plain-Python loop calling the same engine with one joint at a time.
2. A 10^6-sample tolerance study of the demo gear seat: wall time, and peak memory (tracemalloc
   in a second run, plus the process's maximum resident set size).
3. The fit search over the default admitted set (H6-H8 with shafts IT5-IT7, h5-h7 with holes
   IT6-IT8).

Goals: >= 5e6 joint evaluations/s, >= 50x the scalar loop, 10^6 samples in < 1 s using < 300 MB,
search < 100 ms.
"""

from __future__ import annotations

import resource
import time
import tracemalloc
import warnings

import numpy as np

from fitcheck import case
from fitcheck.core import pressfit as core
from fitcheck.search import search_fits
from fitcheck.study import StudySettings, _Model, core_arguments, run_study


def best_of(fn, repeat=5):
    times = []
    for _ in range(repeat):
        t = time.perf_counter()
        fn()
        times.append(time.perf_counter() - t)
    return min(times)


def main() -> None:
    warnings.simplefilter("ignore")
    dc = case.demo_case() if hasattr(case, "demo_case") else case.load("fitcheck/demo/benchtop_pump.toml")
    inp = dc.pressfits[0]
    args = core_arguments(inp)
    for k in ("_nominal", "_fit", "interference_min", "interference_max"):
        args.pop(k)

    # 1. vectorised against scalar, one engine -------------------------------------------------
    rng = np.random.default_rng(0)
    for n in (20_000, 200_000):
        delta = rng.uniform(0.010, 0.039, n)
        t_vec = best_of(lambda: core.evaluate(interference_min=delta, **args), 7)  # noqa: B023
        print(f"joint evaluations, vectorised, {n:>7,} per call: {n / t_vec:,.0f} /s")
    n = 100_000  # the study's chunk
    delta = rng.uniform(0.010, 0.039, n)
    t_vec = best_of(lambda: core.evaluate(interference_min=delta, **args), 7)
    m = 2_000
    small = delta[:m].tolist()

    def scalar():
        for x in small:
            core.evaluate(interference_min=x, **args)

    t_sc = best_of(scalar, 3)
    rate_vec = n / t_vec
    rate_sc = m / t_sc
    print(f"joint evaluations, vectorised, {n:>7,} per call: {rate_vec:,.0f} /s  (the study's chunk)")
    print(f"joint evaluations, scalar Python loop:         {rate_sc:,.0f} /s")
    print(f"ratio vectorised / scalar:                     {rate_vec / rate_sc:,.0f} x")

    # the study's own sampled evaluation (transforms + engine), per sample
    st = StudySettings(temperature_min=-10.0, temperature_max=60.0)
    model = _Model(inp, st)
    u = np.random.default_rng(1).standard_normal((n, model.dim))
    t_model = best_of(lambda: model.evaluate(u), 5)
    print(f"sampled joints incl. input transforms:       {n / t_model:,.0f} /s")

    # 2. a 10^6-sample study ---------------------------------------------------------------------
    kw = dict(samples=1_000_000, seed=1, target=1e-4, temperature_min=-10.0, temperature_max=60.0)
    run_study(inp, samples=10_000)  # warm caches (tables, imports)
    t_plain = best_of(lambda: run_study(inp, importance_samples=0, **kw), 3)
    t_full = best_of(lambda: run_study(inp, **kw), 3)
    print(f"study, 1e6 samples, plain sampling only:     {t_plain:.3f} s")
    print(f"study, 1e6 samples + FORM + 2e4 importance:  {t_full:.3f} s")
    tracemalloc.start()
    run_study(inp, **kw)
    _, peak = tracemalloc.get_traced_memory()
    tracemalloc.stop()
    rss = resource.getrusage(resource.RUSAGE_SELF).ru_maxrss / 1024.0  # kB on Linux
    print(f"study, 1e6 samples, peak traced memory:      {peak / 2**20:.0f} MB")
    print(f"process maximum resident set size so far:    {rss:.0f} MB")

    # 3. fit search -----------------------------------------------------------------------------
    r = search_fits(inp)
    t_search = best_of(lambda: search_fits(inp), 7)
    print(f"fit search, {r.evaluated} admitted fits, {len(r.passing)} pass: {t_search * 1e3:.1f} ms")


if __name__ == "__main__":
    main()
