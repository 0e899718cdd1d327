"""Press-fit page: the design choice (elastic / elastic-plastic) reaches the library (wiring only)."""

from __future__ import annotations

import tomllib

from fitcheck import case as casefile
from fitcheck import tomlwrite
from fitcheck.ui import unitsys
from tests.app.shown import open_groups

PF = "gear-on-shaft"


def test_elastic_plastic_choice_shows_the_library_plastic_zone(app_test):
    at = open_groups(app_test("press_fit"), "press_fit")  # the group "Design" opens
    assert "Plastic zone, Ø" not in {m.label for m in at.metric}
    at.selectbox(key=f"pf.{PF}.design").set_value("elastic-plastic").run()
    assert not at.exception
    doc = tomllib.loads(casefile.demo_text())
    doc["pressfit"][0]["design"] = "elastic-plastic"
    res = casefile.evaluate(casefile.loads(tomlwrite.dumps(doc)))
    r = next(j.result for j in res.joints if j.table == "pressfit" and j.name == PF)
    shown = {m.label: m.value for m in at.metric}
    assert r.design == "elastic-plastic"
    assert shown["Plastic zone, Ø"] == unitsys.show(r.plastic_zone_diameter, "length", "SI")
    assert shown["Plastic utilisation"] == unitsys.num(r.plastic_utilisation, 3)
