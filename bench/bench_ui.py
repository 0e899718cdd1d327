"""Front-end speed in headless Chromium, beside a bare Streamlit page measured in the same run.

Prints, for the app and for a bare one-input Streamlit page served the same way:

* time from starting ``streamlit run`` to the first result in the browser: the animation frame
  in which a metric value is first drawn, read from the browser's clock;
* per page, the median (and largest) time from an input committed with Enter (or a click) to the
  last change of the page before the app is idle and quiet again (the script run finished and the
  page drawn), over ``--n`` new values;
* beside each, the CPU time the Streamlit server process spent and the CPU time of the browser's
  processes (user + system, read from ``/proc/<pid>/stat``): where the work is done, figures a
  loaded machine inflates far less than the wall-clock ones.

Goals (issue 15): median ≤ 250 ms on the press-fit page and ≤ 400 ms on every page; first result
≤ 3 s and within 1.3× of the bare page. Asserts nothing: the figures depend on the machine, so
compare them with the bare page of the same run.

Usage: ``python bench/bench_ui.py [--n 12] [--pages press-fit ...] [--no-bare] [--starts K]``
"""

from __future__ import annotations

import argparse
import os
import socket
import statistics
import subprocess
import sys
import tempfile
import time
import urllib.request
from contextlib import contextmanager
from pathlib import Path

ROOT = Path(__file__).resolve().parents[1]
APP = ROOT / "streamlit_app.py"
CHROMIUM = next((p for p in ("/usr/bin/chromium", "/usr/lib/chromium/chromium") if Path(p).exists()),
                None)
ARGS = ["--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run",
        "--disable-background-networking", "--disable-component-update", "--disable-sync"]
TIMEOUT_S = 300
IDLE = '[data-testid="stApp"][data-test-script-state="notRunning"][data-test-connection-state="CONNECTED"]'

BARE = '''import streamlit as st
x = st.text_input("Value", "1")
st.metric("Echo", x)
'''

#: page address -> (how to interact, control label, values typed in turn[, the input group (a
#: closed expander, whose inputs the browser draws only once it is opened)])
PAGES = {
    "press-fit": ("text", "Torque", [f"{2 + 0.01 * i:.2f} N*m" for i in range(1, 60)]),
    "fit-limits": ("text", "Designation", [f"{20 + i} H7/p6" for i in range(1, 60)]),
    "bearing-seats": ("text", "Axial force", [f"{100 + i} N" for i in range(1, 60)],
                      "Axial location and limits"),
    "housing-screws": ("text", "Axial force", [f"{400 + i} N" for i in range(1, 60)],
                       "Pattern and loads"),
    "lot-study": ("text", "Target probability", [f"{1 + i}e-5" for i in range(1, 60)]),
    "case-verdict": ("units", "", []),
    "case-file": ("text", "Project", [f"Pump {i}" for i in range(1, 60)]),
}

# JavaScript: the time of the last change of the page (any element, attribute or text of the app)
_ARM = """() => {
  const app = document.querySelector('[data-testid="stApp"]');
  window.__last = performance.now();
  if (window.__obs) window.__obs.disconnect();
  window.__obs = new MutationObserver(() => { window.__last = performance.now(); });
  window.__obs.observe(app, {attributes: true, childList: true, subtree: true,
                             characterData: true});
}"""
QUIET_MS = 400  # the page counts as drawn when nothing changed for this long and the app is idle


def _free_port() -> int:
    with socket.socket() as s:
        s.bind(("127.0.0.1", 0))
        return s.getsockname()[1]


def cpu_seconds(pid: int) -> float:
    """User + system CPU time of a process so far [s] (Linux ``/proc``; NaN elsewhere)."""
    try:
        with open(f"/proc/{pid}/stat", encoding="ascii") as f:
            fields = f.read().rsplit(")", 1)[1].split()
        return (int(fields[11]) + int(fields[12])) / os.sysconf("SC_CLK_TCK")
    except (OSError, ValueError, IndexError):
        return float("nan")


def browser_cpu_seconds(exclude: int | None = None) -> float:
    """CPU time so far of this process's descendants (the Playwright driver and Chromium), without
    the process ``exclude`` (the Streamlit server) [s]."""
    try:
        parent = {}
        for d in os.listdir("/proc"):
            if d.isdigit():
                try:
                    with open(f"/proc/{d}/stat", encoding="ascii", errors="replace") as f:
                        parent[int(d)] = int(f.read().rsplit(")", 1)[1].split()[1])
                except (OSError, ValueError, IndexError):
                    continue
    except OSError:
        return float("nan")
    me, total = os.getpid(), 0.0
    for pid in parent:
        p, seen = pid, 0
        while p in parent and p != me and seen < 64:
            p, seen = parent[p], seen + 1
        if p == me and pid != exclude:
            c = cpu_seconds(pid)
            total += 0.0 if c != c else c
    return total


@contextmanager
def served(script: Path):
    """``(base address, start time, server pid)`` of ``streamlit run script``; stopped on exit."""
    port = _free_port()
    log = tempfile.NamedTemporaryFile(prefix="bench_ui_", suffix=".log", delete=False)
    t0 = time.perf_counter()
    proc = subprocess.Popen(
        [sys.executable, "-m", "streamlit", "run", str(script), "--server.headless", "true",
         "--server.port", str(port), "--server.address", "127.0.0.1",
         "--browser.gatherUsageStats", "false", "--server.fileWatcherType", "none"],
        cwd=ROOT, stdout=log, stderr=subprocess.STDOUT, stdin=subprocess.DEVNULL,
        env=dict(os.environ, MPLBACKEND="Agg"))
    base = f"http://127.0.0.1:{port}"
    try:
        while True:
            try:
                with urllib.request.urlopen(base + "/_stcore/health", timeout=1) as r:
                    if r.read().strip() == b"ok":
                        break
            except OSError:
                time.sleep(0.05)
            if time.perf_counter() - t0 > 120:
                raise RuntimeError("streamlit did not start in 120 s")
        yield base, t0, proc.pid
    finally:
        proc.terminate()
        try:
            proc.wait(timeout=10)
        except subprocess.TimeoutExpired:
            proc.kill()
            proc.wait()


#: JavaScript run in the page before its own code: the clock time [ms since the epoch] of the first
#: animation frame in which a metric value is in the page with a box of its own (drawn).
_FIRST_METRIC = """(() => {
  const seen = () => {
    const m = document.querySelector('[data-testid="stMetricValue"]');
    return m && m.getBoundingClientRect().height > 0;
  };
  const obs = new MutationObserver(() => {
    if (window.__firstMetric || !seen()) return;
    obs.disconnect();
    requestAnimationFrame(() => { window.__firstMetric = performance.timeOrigin + performance.now(); });
  });
  document.addEventListener('DOMContentLoaded', () =>
    obs.observe(document, {subtree: true, childList: true, attributes: true}));
})()"""


def first_result(browser, base: str, t0: float, path: str) -> float:
    """Seconds from ``t0`` (``streamlit run`` started) to the frame in which the page first draws
    a metric value, read from the browser's own clock: Playwright's wait for the element polls
    at growing intervals (up to 0.5 s apart), which would round the figure up by as much."""
    page = browser.new_page(viewport={"width": 1400, "height": 2400})
    try:
        page.add_init_script(_FIRST_METRIC)
        epoch_t0 = time.time() - (time.perf_counter() - t0)
        page.goto(f"{base}/{path}", wait_until="commit", timeout=TIMEOUT_S * 1000)
        page.wait_for_function("window.__firstMetric", timeout=TIMEOUT_S * 1000, polling=50)
        return page.evaluate("window.__firstMetric") / 1000.0 - epoch_t0
    finally:
        page.close()


def _textbox(page, label: str, group: str | None = None):
    """The text box labelled ``label``; its group (a closed expander) is opened first."""
    box = page.get_by_role("textbox", name=label, exact=True).first
    if group and not box.is_visible():
        page.get_by_test_id("stExpander").locator("summary").filter(has_text=group).first.click()
    box.wait_for(state="visible")
    return box


def interaction_times(page, how: str, label: str, values: list[str], n: int,
                      pid: int | None = None, group: str | None = None) -> list[tuple[float, float, float]]:
    """``(wall seconds, server CPU seconds, browser CPU seconds)`` from committing a new input to
    the app idle again (and quiet for ``QUIET_MS``), ``n`` times."""
    out = []
    for i in range(n):
        page.evaluate(_ARM)
        cpu0 = cpu_seconds(pid) if pid else float("nan")
        bcpu0 = browser_cpu_seconds(pid)
        if how == "units":
            side = page.get_by_test_id("stSidebar")
            side.get_by_text("inch" if i % 2 == 0 else "SI", exact=True).click()
            t_start = page.evaluate("performance.now()")
        else:
            box = _textbox(page, label, group)
            box.fill(values[i % len(values)])
            # the element is found before the clock starts: Playwright's search of a large page
            # for a labelled text box is the test tool's work, not the app's
            handle = box.element_handle()
            t_start = page.evaluate("performance.now()")
            handle.press("Enter")
        page.wait_for_timeout(50)
        page.wait_for_selector(IDLE, timeout=60_000)
        page.wait_for_function(f"performance.now() - window.__last > {QUIET_MS}",
                               timeout=60_000, polling=50)
        cpu = cpu_seconds(pid) - cpu0 if pid else float("nan")
        bcpu = browser_cpu_seconds(pid) - bcpu0
        out.append(((page.evaluate("window.__last") - t_start) / 1000.0, cpu, bcpu))
    return out


def measure_pages(browser, base: str, n: int, pages: dict,
                  pid: int | None = None) -> dict[str, list[tuple[float, float, float]]]:
    ctx = browser.new_context(viewport={"width": 1400, "height": 2400})
    page = ctx.new_page()
    page.set_default_timeout(60_000)
    res = {}
    try:
        for path, (how, label, values, *group) in pages.items():
            page.goto(f"{base}/{path}", timeout=TIMEOUT_S * 1000)
            page.wait_for_selector(IDLE, timeout=TIMEOUT_S * 1000)
            g = group[0] if group else None
            interaction_times(page, how, label, values, 2, group=g)  # warm-up: first run of the page
            res[path] = interaction_times(page, how, label, values, n, pid, g)
    finally:
        ctx.close()
    return res


def _ms(xs: list[tuple[float, float, float]]) -> str:
    wall = [x[0] for x in xs]
    cpu = statistics.median(x[1] for x in xs)
    bcpu = statistics.median(x[2] for x in xs)
    return (f"median {statistics.median(wall) * 1000:5.0f} ms, largest {max(wall) * 1000:5.0f} ms;"
            f" CPU median: server {cpu * 1000:4.0f} ms, browser {bcpu * 1000:4.0f} ms")


def first_results(browser, bare: Path, k: int) -> None:
    """Start the bare page and the app ``k`` times in turn and print each first result, then the
    median and the largest ratio app / bare (a start's figure varies by ± 0.3 s on a quiet machine
    with the files the server reads, so one pair of starts decides little).

    The app is started twice per round: opened at ``/`` (the address ``streamlit run`` prints,
    which goes on to the fit-limits page) and at ``/press-fit``. A page address costs the browser
    one more round trip before it connects (it first asks for the server's health below the page's
    path, then below ``/``), which the bare page, opened at ``/``, does not pay."""
    ratios: dict[str, list[float]] = {"": [], "press-fit": []}
    for i in range(k):
        with served(bare) as (base, t0, _pid):
            b = first_result(browser, base, t0, "")
        line = f"start {i + 1}/{k}: first result: bare page {b:.2f} s"
        for path in ratios:
            time.sleep(0.5)
            with served(APP) as (base, t0, _pid):
                a = first_result(browser, base, t0, path)
            ratios[path].append(a / b)
            line += f", app /{path} {a:.2f} s ({a / b:.2f}×)"
        print(line, flush=True)
        time.sleep(0.5)
    for path, rs in ratios.items():
        print(f"first result over {k} starts, app at /{path}: median {statistics.median(rs):.2f}×, "
              f"largest {max(rs):.2f}× the bare page (goal ≤ 1.3×)", flush=True)


def main(argv: list[str] | None = None) -> None:
    ap = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    ap.add_argument("--n", type=int, default=12, help="interactions per page (after 2 warm-up)")
    ap.add_argument("--pages", nargs="+", choices=list(PAGES), default=list(PAGES),
                    help="measure only these pages (default: all)")
    ap.add_argument("--no-bare", action="store_true",
                    help="skip the bare page (its figures are then not printed)")
    ap.add_argument("--starts", type=int, default=1, metavar="K",
                    help="start the bare page and the app K times in turn (first result only) "
                    "before the interactions are measured, and print the median and the largest "
                    "ratio (default 1: one start each, with the interactions)")
    args = ap.parse_args(argv)
    if CHROMIUM is None:
        print("Chromium not found (/usr/bin/chromium): nothing measured")
        return
    from playwright.sync_api import sync_playwright

    bare = Path(tempfile.mkdtemp(prefix="bench_ui_")) / "bare_page.py"
    bare.write_text(BARE, encoding="utf-8")
    print(f"Chromium {CHROMIUM}; {args.n} interactions per page after 2 warm-up; "
          f"{os.cpu_count()} CPUs, load average {os.getloadavg()[0]:.1f}", flush=True)
    with sync_playwright() as pw:
        browser = pw.chromium.launch(executable_path=CHROMIUM, headless=True, args=ARGS)
        try:
            if args.starts > 1 and not args.no_bare:
                first_results(browser, bare, args.starts - 1)
            bare_first = bare_cpu = float("nan")
            if not args.no_bare:
                with served(bare) as (base, t0, pid):
                    bare_first = first_result(browser, base, t0, "")
                    bare_cpu = cpu_seconds(pid)
                    bare_times = measure_pages(
                        browser, base, args.n,
                        {"": ("text", "Value", [str(i) for i in range(2, 60)])}, pid)
                print(f"bare page: streamlit run -> first result {bare_first:.2f} s "
                      f"(server CPU {bare_cpu:.2f} s); input -> idle: {_ms(bare_times[''])}",
                      flush=True)
            with served(APP) as (base, t0, pid):
                try:
                    app_first = first_result(browser, base, t0, "press-fit")
                    app_cpu = cpu_seconds(pid)
                except Exception as exc:  # noqa: BLE001 - a timeout is a figure too
                    print(f"app: no first result ({type(exc).__name__}: the press-fit page did "
                          f"not show a result in {TIMEOUT_S} s)")
                    return
                print(f"app: streamlit run -> first result (press-fit page) {app_first:.2f} s, "
                      f"{app_first / bare_first:.2f}× the bare page (goal ≤ 3 s and ≤ 1.3×); "
                      f"server CPU {app_cpu:.2f} s, {app_cpu / bare_cpu:.2f}× the bare page's",
                      flush=True)
                for path, spec in ((p, PAGES[p]) for p in args.pages):
                    try:
                        xs = measure_pages(browser, base, args.n, {path: spec}, pid)[path]
                    except Exception as exc:  # noqa: BLE001
                        print(f"  {path:<20} not measured ({type(exc).__name__})", flush=True)
                        continue
                    goal = 250 if path == "press-fit" else 400
                    print(f"  {path:<20} input -> idle: {_ms(xs)}  (goal median ≤ {goal} ms)",
                          flush=True)
        finally:
            browser.close()
    print(f"load average at the end {os.getloadavg()[0]:.1f}")


if __name__ == "__main__":
    main()
