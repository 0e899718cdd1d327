"""What the browser front end remembers between reruns, and that it never shows a stale number.

The pages evaluate a joint through a cache keyed on the joint's TOML text
(``fitcheck.ui.joints._evaluate_text``); the TOML text of a document is remembered by the
document's ``repr`` (``fitcheck.ui.state.doc_text``); quantity texts are read once
(``fitcheck.units.to_core``). Each test here fails if a cache hides a changed input.
"""

from __future__ import annotations

import copy
import itertools
import tomllib

import pytest

from fitcheck import case as casefile
from fitcheck import tomlwrite, units
from fitcheck.errors import InputError
from fitcheck.ui import state, unitsys

PF = "gear-on-shaft"
_fresh = itertools.count(1)


def _torque_text() -> str:
    """A torque no other test types, so the engine has not seen it (the cache is per process)."""
    return f"{2.0 + next(_fresh) * 0.000137:.6f} N*m"


@pytest.fixture
def engine_calls(monkeypatch):
    """Counts the calls of the case engine made through the page's evaluation."""
    calls = []
    real = casefile.evaluate

    def counting(case, *a, **k):
        calls.append(case)
        return real(case, *a, **k)

    monkeypatch.setattr(casefile, "evaluate", counting)
    return calls


def test_a_rerun_with_unchanged_inputs_does_not_call_the_engine_again(app_test, engine_calls):
    at = app_test("press_fit")
    key = f"pf.{PF}.torque"
    at.text_input(key=key).set_value(_torque_text()).run()
    assert not at.exception
    n = len(engine_calls)
    assert n >= 1  # the new torque was evaluated
    at.run()
    at.run()
    assert not at.exception
    assert len(engine_calls) == n


def test_a_changed_input_is_evaluated_and_shown(app_test, engine_calls):
    at = app_test("press_fit")
    key = f"pf.{PF}.torque"
    torque = _torque_text()
    before = len(engine_calls)
    at.text_input(key=key).set_value(torque).run()
    assert not at.exception
    assert len(engine_calls) == before + 1
    # the figure shown is the library's own for the new input
    doc = tomllib.loads(casefile.demo_text())
    doc["pressfit"][0]["torque"] = torque
    res = casefile.evaluate(casefile.loads(tomlwrite.dumps(doc)))
    r = next(j.result for j in res.joints if j.name == PF)
    shown = {m.label: m.value for m in at.metric}
    assert shown["Torque required"] == unitsys.show(r.torque, "torque", "SI")
    assert shown["Slip safety, loosest"] == unitsys.num(r.slip_safety_min, 3)
    # and back to a value seen before: the cache answers, with that value's figures
    at.text_input(key=key).set_value("2 N*m").run()
    assert {m.label: m.value for m in at.metric}["Torque required"] == \
        unitsys.show(2000.0, "torque", "SI")


def test_doc_text_follows_a_document_changed_in_place():
    doc = tomllib.loads(casefile.demo_text())
    first = state.doc_text(doc)
    assert first == tomlwrite.dumps(doc)
    doc["pressfit"][0]["torque"] = "3.25 N*m"  # the widgets write into the live document
    second = state.doc_text(doc)
    assert second == tomlwrite.dumps(doc) != first
    assert 'torque = "3.25 N*m"' in second


@pytest.mark.parametrize("a, b", [(1, 1.0), (1, True), ("1", 1), (0.0, -0.0), ([1], ["1"])])
def test_doc_text_tells_values_of_different_types_apart(a, b):
    ta = state.doc_text({"x": copy.deepcopy(a)})
    tb = state.doc_text({"x": copy.deepcopy(b)})
    assert ta == tomlwrite.dumps({"x": a})
    assert tb == tomlwrite.dumps({"x": b})


def test_doc_text_refuses_what_toml_cannot_hold_every_time():
    for _ in range(2):
        with pytest.raises(tomlwrite.TomlWriteError):
            state.doc_text({"x": None})


def test_a_text_read_once_is_still_range_checked_and_named_each_time():
    assert units.to_core("25 mm", "length", "d") == 25.0
    with pytest.raises(InputError, match="shaft diameter"):
        units.to_core("25 mm", "length", "shaft diameter", lo=30.0)
    assert units.to_core("1 in", "length", "d") == 25.4
    assert units.temperature_c("80 degC", "t") == 80.0
    with pytest.raises(InputError, match="hub temperature"):
        units.temperature_c("80 degC", "hub temperature", hi=50.0)
    for field in ("first", "second"):  # a refused text is never remembered
        with pytest.raises(InputError, match=field):
            units.to_core("3 kg", "length", field)
    # the same text in another kind is read for that kind
    assert units.to_core("2 N*m", "torque", "T") == 2000.0
    with pytest.raises(InputError):
        units.to_core("2 N*m", "force", "F")
