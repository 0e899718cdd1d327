"""Time the calculation report of the demo case (goals: PDF ≤ 2 s, HTML ≤ 1 s).

Each format is timed from the evaluated case to the finished file, plots included,
as `fitcheck report` makes it; the build of the document model (which draws the plots)
is also shown alone. Wall time and this process's CPU time are printed: on a loaded
machine the CPU time is the fairer figure. Prints only; asserts nothing.
"""

import io
import time
import warnings

from fitcheck import case as case_mod
from fitcheck import report


def _time(fn, n=3):
    best_wall = best_cpu = float("inf")
    for _ in range(n):
        w, c = time.perf_counter(), time.process_time()
        fn()
        best_wall = min(best_wall, time.perf_counter() - w)
        best_cpu = min(best_cpu, time.process_time() - c)
    return best_wall, best_cpu


def main() -> None:
    warnings.simplefilter("ignore")
    result = case_mod.evaluate(case_mod.demo_case())
    report.to_pdf(result, io.BytesIO())  # warm: fonts, tables, templates, matplotlib
    rows = [
        ("document model (plots drawn)", lambda: report.build(result)),
        ("HTML from the evaluated case", lambda: report.to_html(result)),
        ("PDF from the evaluated case", lambda: report.to_pdf(result, io.BytesIO())),
    ]
    rep = report.build(result)
    rows += [("HTML from the model", lambda: report.to_html(rep)),
             ("PDF from the model", lambda: report.to_pdf(rep, io.BytesIO()))]
    for label, fn in rows:
        wall, cpu = _time(fn)
        print(f"{label:32s} {wall:7.3f} s wall  {cpu:7.3f} s CPU")
    buf = io.BytesIO()
    report.to_pdf(rep, buf)
    print(f"PDF size {len(buf.getvalue()) / 1024:.0f} KiB; HTML size "
          f"{len(report.to_html(rep)) / 1024:.0f} KiB; goals: PDF <= 2 s, HTML <= 1 s")


if __name__ == "__main__":
    main()
