"""Front-end timings: server-side script time per interaction on the press-fit page, and the time
from ``streamlit run`` to the first rendered result in headless Chromium.

Goals: < 150 ms per interaction (AppTest rerun), < 4 s to the first result. Prints both figures;
asserts nothing.
"""

from __future__ import annotations

import logging
import os
import socket
import statistics
import subprocess
import sys
import tempfile
import time
import urllib.request
from pathlib import Path

ROOT = Path(__file__).resolve().parents[1]
APP = ROOT / "streamlit_app.py"
CHROMIUM = next((p for p in ("/usr/bin/chromium", "/usr/lib/chromium/chromium") if Path(p).exists()),
                None)
ARGS = ["--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run",
        "--disable-background-networking", "--disable-component-update", "--disable-sync"]
IDLE = '[data-testid="stApp"][data-test-script-state="notRunning"]'


def interaction_times(n: int = 20, repeat: bool = False) -> list[float]:
    """Seconds per rerun after changing one input of the press-fit page.

    Every value new (``repeat=False``: evaluation and plots redone), or two values in turn
    (``repeat=True``: the cached results and plot images are reused).
    """
    from streamlit.testing.v1 import AppTest

    logging.getLogger("streamlit").setLevel(logging.ERROR)
    os.chdir(ROOT)
    at = AppTest.from_file(str(APP), default_timeout=60).run()
    at.switch_page("fitcheck/ui/press_fit.py").run()
    key = "pf.gear-on-shaft.torque"
    values = [f"{2 + 0.1 * (i % 2 if repeat else i):.1f} N*m" for i in range(n)]
    out = []
    for v in values:
        at.text_input(key=key).set_value(v)
        t0 = time.perf_counter()
        at.run()
        out.append(time.perf_counter() - t0)
        assert not at.exception, at.exception
    return out


def first_result_time() -> float | None:
    """Seconds from starting ``streamlit run`` to the press-fit page's first metric in Chromium."""
    if CHROMIUM is None:
        print("Chromium not found: time to first result not measured")
        return None
    from playwright.sync_api import sync_playwright

    with socket.socket() as s:
        s.bind(("127.0.0.1", 0))
        port = s.getsockname()[1]
    log = tempfile.NamedTemporaryFile(prefix="bench_ui_", suffix=".log", delete=False)
    with sync_playwright() as pw:
        browser = pw.chromium.launch(executable_path=CHROMIUM, headless=True, args=ARGS)
        try:
            page = browser.new_page(viewport={"width": 1400, "height": 2000})
            t0 = time.perf_counter()
            proc = subprocess.Popen(
                [sys.executable, "-m", "streamlit", "run", str(APP), "--server.headless", "true",
                 "--server.port", str(port), "--server.address", "127.0.0.1",
                 "--browser.gatherUsageStats", "false"],
                cwd=ROOT, stdout=log, stderr=subprocess.STDOUT, stdin=subprocess.DEVNULL)
            try:
                base = f"http://127.0.0.1:{port}"
                while True:
                    try:
                        with urllib.request.urlopen(base + "/_stcore/health", timeout=1) as r:
                            if r.read().strip() == b"ok":
                                break
                    except OSError:
                        time.sleep(0.05)
                    if time.perf_counter() - t0 > 60:
                        raise RuntimeError("streamlit did not start in 60 s")
                t_health = time.perf_counter() - t0
                page.goto(base + "/press-fit")
                page.get_by_test_id("stMetricValue").first.wait_for(timeout=60_000)
                t_first = time.perf_counter() - t0
                page.wait_for_selector(IDLE, timeout=60_000)
                t_idle = time.perf_counter() - t0
            finally:
                proc.terminate()
                try:
                    proc.wait(timeout=10)
                except subprocess.TimeoutExpired:
                    proc.kill()
        finally:
            browser.close()
    print(f"  server healthy after {t_health:.2f} s; whole page idle after {t_idle:.2f} s")
    return t_first


def main() -> None:
    for repeat, what in ((False, "new value each time"), (True, "values seen before, cached")):
        warm = interaction_times(repeat=repeat)[2:]
        print(f"press-fit page, script time per interaction, {what} (AppTest rerun, "
              f"{len(warm)} runs): median {statistics.median(warm) * 1000:.0f} ms, "
              f"max {max(warm) * 1000:.0f} ms (goal < 150 ms)")
    t = first_result_time()
    if t is not None:
        print(f"streamlit run -> first press-fit result in Chromium: {t:.2f} s (goal < 4 s)")


if __name__ == "__main__":
    main()
