"""Time to refuse hostile input: 1 MiB hostile case files and hostile quantity strings.

Run: ``.venv/bin/python bench/bench_hostile.py``. Prints figures; asserts nothing.
Each 1 MiB file is read by ``fitcheck.case.loads`` (what the CLI, an upload and a
``?case=`` link use) in a warm process (engines imported); goal: refused within 1 s.
Each hostile quantity string goes through ``fitcheck.units.to_core``; goal: well under 100 ms.
"""

from __future__ import annotations

import time

from fitcheck import case
from fitcheck.errors import FitcheckError
from fitcheck.units import to_core

MIB = 1 << 20


def _fill(text: str, mark: str, unit: str) -> str:
    """``text`` with ``mark`` replaced by as many ``unit`` as keep it just under 1 MiB."""
    n = (MIB - len(text.encode()) + len(mark) - 16) // len(unit.encode())
    return text.replace(mark, unit * n, 1)


def files() -> dict[str, str]:
    demo = case.demo_text()
    at = 'length = "14 mm"'
    keys = "".join(f"k{i} = 1\n" for i in range(150_000))
    return {
        "one long value": _fill(demo.replace(at, 'length = "@ mm"'), "@", "1"),
        "array of numbers": _fill(demo.replace(at, "length = [@1]"), "@", "1,"),
        "array of strings": _fill(demo.replace(at, 'length = [@"1 mm"]'), "@", '"1 mm",'),
        "nested brackets": _fill("format_version = 1\nx = @", "@", "["),
        "many keys": demo + "\n[[pressfit]]\n" + keys[:MIB - len(demo) - 64].rsplit("\n", 1)[0] + "\n",
        "many tables": _fill("format_version = 1\n@", "@", "[[pressfit]]\n"),
        "dotted key": _fill("format_version = 1\n@a = 1", "@", "a."),
        "long comment + hostile unit": _fill(demo.replace(at, 'length = "9**9**9 mm"') + "#@\n", "@", "x"),
        "many blank lines": _fill(demo + "@", "@", "\n"),
        "long name": _fill(demo.replace('name = "gear-on-shaft"', 'name = "@"'), "@", "n"),
    }


def main() -> None:
    case.loads(case.demo_text())  # import the engines, warm pint
    worst = worst_cpu = 0.0
    print("refusing 1 MiB hostile case files (case.loads, warm process):")
    for label, text in files().items():
        t0, c0 = time.perf_counter(), time.process_time()
        try:
            case.loads(text)
            outcome = "ACCEPTED"
        except FitcheckError as exc:
            outcome = str(exc).splitlines()[0][:60]
        dt, cpu = time.perf_counter() - t0, time.process_time() - c0
        worst = max(worst, dt)
        worst_cpu = max(worst_cpu, cpu)
        print(f"  {label:28s} {len(text.encode()) / MIB:5.2f} MiB  {dt * 1e3:7.1f} ms "
              f"(cpu {cpu * 1e3:6.1f} ms)  {outcome}")
    print(f"  slowest refusal: {worst * 1e3:.0f} ms wall, {worst_cpu * 1e3:.0f} ms cpu (goal < 1000 ms)")
    print("refusing hostile quantity strings (units.to_core):")
    worst = 0.0
    for text in ("9**9**9 mm", "9^9^9 mm", "1" * 16_000 + " mm", "x" * 100_000, "14 mm**2**2",
                 "(14) mm", "14 " + "mm*" * 30 + "mm"):
        t0 = time.perf_counter()
        try:
            to_core(text, "length", "length")
        except FitcheckError:
            pass
        dt = time.perf_counter() - t0
        worst = max(worst, dt)
        print(f"  {text[:24]!r:28s} ({len(text):6d} chars)  {dt * 1e6:8.0f} µs")
    print(f"  slowest: {worst * 1e3:.2f} ms (goal well under 100 ms)")


if __name__ == "__main__":
    main()
