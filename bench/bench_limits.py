"""Throughput of the vectorised ISO 286 look-up: deviations() on 10⁶ (size, class) pairs in one call.

Run: ``.venv/bin/python bench/bench_limits.py``. Prints figures; asserts nothing.
"""

from __future__ import annotations

import time

import numpy as np

from fitcheck.core import iso286
from fitcheck.fits import deviations

N = 1_000_000


def main() -> None:
    rng = np.random.default_rng(286)
    pool = np.array(iso286.valid_classes(40.0, "shaft"))   # every shaft class defined at 40 mm
    sizes = rng.uniform(1.0, 500.0, N)
    classes = pool[rng.integers(0, len(pool), N)]
    deviations(sizes[:1000], classes[:1000], "shaft")       # load tables, warm caches
    best = np.inf
    for _ in range(3):
        t0 = time.perf_counter()
        up, lo, ok = deviations(sizes, classes, "shaft")
        best = min(best, time.perf_counter() - t0)
    print(f"deviations(): {N:,} (size, class) pairs over {len(pool)} shaft classes, 1 … 500 mm")
    print(f"  best of 3: {best * 1e3:.0f} ms  ->  {N / best:,.0f} look-ups per second "
          f"(goal >= 1,000,000/s); defined: {ok.mean():.1%}")
    one = np.full(N, "H7")
    t0 = time.perf_counter()
    deviations(sizes, one, "hole")
    dt = time.perf_counter() - t0
    print(f"  single class H7: {dt * 1e3:.0f} ms  ->  {N / dt:,.0f} look-ups per second")


if __name__ == "__main__":
    main()
