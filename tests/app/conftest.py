"""Fixtures of the front-end tests: AppTest runs of the app, and the real app in headless Chromium.

The browser fixtures use Playwright's sync API directly (no downloaded browser):
Debian's Chromium is launched with ``executable_path``. Without Chromium the
browser tests are skipped with a message, except under ``CI=true``, where a
missing Chromium fails them.
"""

from __future__ import annotations

import os
import shutil
import socket
import subprocess
import sys
import time
import urllib.request
from pathlib import Path

import pytest

ROOT = Path(__file__).resolve().parents[2]
APP = ROOT / "streamlit_app.py"
CHROMIUM_CANDIDATES = ("/usr/bin/chromium", "/usr/lib/chromium/chromium", "/usr/bin/chromium-browser")
CHROMIUM_ARGS = ["--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run",
                 "--disable-background-networking", "--disable-component-update", "--disable-sync"]
IDLE = '[data-testid="stApp"][data-test-script-state="notRunning"][data-test-connection-state="CONNECTED"]'


# --------------------------------------------------------------------------- AppTest

@pytest.fixture
def app_test(monkeypatch):
    """A factory: ``app_test(page=None, query=None)`` -> an AppTest of streamlit_app.py after its
    first run, switched to ``page`` (a module name in fitcheck/ui/) and run again."""
    from streamlit.testing.v1 import AppTest

    monkeypatch.chdir(ROOT)

    def make(page: str | None = None, query: dict | None = None):
        at = AppTest.from_file(str(APP), default_timeout=60)
        if query:
            at.query_params.update(query)
        at.run()
        if page is not None:
            at.switch_page(f"fitcheck/ui/{page}.py").run()
        return at

    return make


# --------------------------------------------------------------------------- browser

def chromium_path() -> str | None:
    for p in CHROMIUM_CANDIDATES:
        if Path(p).is_file() and os.access(p, os.X_OK):
            return p
    found = shutil.which("chromium")
    return found


def _free_port() -> int:
    with socket.socket() as s:
        s.bind(("127.0.0.1", 0))
        return s.getsockname()[1]


@pytest.fixture(scope="session")
def chromium():
    path = chromium_path()
    if path is None:
        if os.environ.get("CI", "").lower() in ("1", "true", "yes"):
            pytest.fail("Chromium is missing under CI: install Debian's chromium package "
                        "(apt-get install chromium); the browser tests are mandatory in CI")
        pytest.skip("Chromium is not installed (/usr/bin/chromium); browser tests skipped. "
                    "Install Debian's chromium package to run them (mandatory when CI=true).")
    return path


@pytest.fixture(scope="session")
def server(tmp_path_factory):
    """The real app served on a free local port; yields its base address."""
    port = _free_port()
    log = tmp_path_factory.mktemp("streamlit") / "server.log"
    env = dict(os.environ, MPLBACKEND="Agg", PYTHONUNBUFFERED="1")
    with open(log, "wb") as out:
        proc = subprocess.Popen(
            [sys.executable, "-m", "streamlit", "run", str(APP), "--server.headless", "true",
             "--server.port", str(port), "--server.address", "127.0.0.1",
             "--browser.gatherUsageStats", "false"],
            cwd=ROOT, stdout=out, stderr=subprocess.STDOUT, stdin=subprocess.DEVNULL, env=env)
    base = f"http://127.0.0.1:{port}"
    try:
        deadline = time.monotonic() + 60
        while True:
            if proc.poll() is not None:
                pytest.fail(f"streamlit exited with {proc.returncode}:\n{log.read_text()[-3000:]}")
            try:
                with urllib.request.urlopen(base + "/_stcore/health", timeout=2) as r:
                    if r.read().strip() == b"ok":
                        break
            except OSError:
                pass
            if time.monotonic() > deadline:
                pytest.fail(f"streamlit did not answer in 60 s:\n{log.read_text()[-3000:]}")
            time.sleep(0.2)
        yield base
    finally:
        proc.terminate()
        try:
            proc.wait(timeout=10)
        except subprocess.TimeoutExpired:
            proc.kill()
            proc.wait(timeout=10)


@pytest.fixture(scope="session")
def browser(chromium):
    from playwright.sync_api import sync_playwright

    with sync_playwright() as pw:
        b = pw.chromium.launch(executable_path=chromium, headless=True, args=CHROMIUM_ARGS)
        try:
            yield b
        finally:
            b.close()


@pytest.fixture
def page(browser, server):
    """A fresh browser context and page (tall viewport: Streamlit scrolls in its own container)."""
    ctx = browser.new_context(viewport={"width": 1400, "height": 2400}, accept_downloads=True)
    pg = ctx.new_page()
    pg.set_default_timeout(int(30_000 * float(os.environ.get("FITCHECK_BROWSER_SLOW", "1"))))
    try:
        yield pg
    finally:
        ctx.close()


@pytest.fixture(scope="session")
def wait_idle():
    """``wait_idle(page, timeout_ms)``: wait until the app has finished its run and is connected."""

    def wait(pg, timeout: float = 30_000) -> None:
        pg.wait_for_selector(IDLE, timeout=timeout)

    return wait
