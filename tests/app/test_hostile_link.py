"""A hostile ``?case=`` link cannot freeze the server: the real app refuses it at once.

A link carrying a quantity that is an arithmetic expression (``9**9**9 mm``) or a case
nested 2 000 brackets deep must show its error within 1 s of the time a normal page takes,
while ``/_stcore/health`` keeps answering (polled every 0.1 s in a thread throughout).
"""

from __future__ import annotations

import threading
import time
import urllib.request

import pytest

from fitcheck import tomlwrite
from fitcheck.tomlread import read_toml_bytes

FIRST = 60_000  # ms


def _encode(text: str) -> str:
    from fitcheck.ui import state

    return state.encode(text)


def _demo_doc() -> dict:
    from fitcheck import case as casefile

    return read_toml_bytes(casefile.demo_text().encode("utf-8"), "demo")


class Health(threading.Thread):
    """Polls the health endpoint until stopped; keeps every failure and the slowest answer."""

    def __init__(self, base: str):
        super().__init__(daemon=True)
        self.url = base + "/_stcore/health"
        self.stop = threading.Event()
        self.failures: list[str] = []
        self.slowest = 0.0
        self.count = 0

    def run(self):
        while not self.stop.is_set():
            t0 = time.monotonic()
            try:
                with urllib.request.urlopen(self.url, timeout=10) as r:
                    if r.read().strip() != b"ok":
                        self.failures.append("not ok")
            except OSError as exc:
                self.failures.append(repr(exc))
            self.slowest = max(self.slowest, time.monotonic() - t0)
            self.count += 1
            self.stop.wait(0.1)


def _open(page, url: str, wait_idle, text: str | None = None) -> float:
    t0 = time.monotonic()
    page.goto(url, timeout=FIRST)
    if text is None:
        page.get_by_test_id("stMainBlockContainer").get_by_role("heading").first.wait_for(timeout=FIRST)
    else:
        page.get_by_text(text).first.wait_for(timeout=FIRST)
    elapsed = time.monotonic() - t0
    wait_idle(page, FIRST)
    return elapsed


@pytest.mark.browser
def test_hostile_links_are_refused_at_once(page, server, wait_idle):
    health = Health(server)
    health.start()
    try:
        _open(page, f"{server}/press-fit", wait_idle)  # warm the server (imports, caches)
        normal = _open(page, f"{server}/press-fit", wait_idle)

        doc = _demo_doc()
        doc["pressfit"][0]["length"] = "9**9**9 mm"
        link = f"{server}/press-fit?case={_encode(tomlwrite.dumps(doc))}"
        unit = _open(page, link, wait_idle, "a power of a number")

        deep = "format_version = 1\nx = " + "[" * 2000 + "]" * 2000 + "\n"
        link = f"{server}/press-fit?case={_encode(deep)}"
        nested = _open(page, link, wait_idle, "could not be read")
        assert page.get_by_text("nested at most").first.is_visible()
    finally:
        health.stop.set()
        health.join(timeout=20)
    assert unit <= normal + 1.0, (unit, normal)
    assert nested <= normal + 1.0, (nested, normal)
    assert health.count > 0 and not health.failures, health.failures


def _texts(at) -> list[str]:
    return [e.value for e in at.error] + [i.value for i in at.info]


def test_a_link_with_an_expression_shows_the_refusal(app_test):
    doc = _demo_doc()
    doc["pressfit"][0]["length"] = "9**9**9 mm"
    at = app_test("press_fit", query={"case": _encode(tomlwrite.dumps(doc))})
    assert not at.exception
    assert any("a power of a number" in t for t in _texts(at)), _texts(at)


@pytest.mark.parametrize("text, needle", [
    ("format_version = 1\nx = " + "[" * 2000 + "]" * 2000 + "\n", "nested at most"),
    ('format_version = 1\n[title]\nproject = "A\\u202eB"\n', "bidi"),
    ("format_version = 1\n[[pressfit]]\nname = 'a'\nlength = [" + "1," * 5000 + "1]\n",
     "at most 16 items"),
])
def test_a_hostile_link_opens_the_demo_with_a_notice(app_test, text, needle):
    at = app_test(query={"case": _encode(text)})
    assert not at.exception
    assert any("could not be read" in t and needle in t for t in _texts(at)), _texts(at)
