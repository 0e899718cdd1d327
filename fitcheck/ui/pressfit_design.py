"""Press-fit page: the choice between the elastic and the elastic-plastic design (DIN 7190-1:2017).

Two small pieces the page calls with one line each: the input group and, in the
elastic-plastic design, the plastic zone of the hub beside the other results. No physics here.
"""

from __future__ import annotations

from fitcheck.ui import unitsys, widgets
from fitcheck.ui.joints import Field


def design_group() -> tuple[str, list]:
    """The input group "Design": elastic or elastic-plastic, and the permitted plastic zone."""
    return ("Design", [Field("design", "Design", ("elastic", "elastic-plastic")), "plastic_zone_limit"])


def show_plastic_zone(r, system: str) -> None:
    """Plastic zone of the hub at the tightest fit (elastic-plastic design only)."""
    if getattr(r, "design", "elastic") != "elastic-plastic":
        return
    depth = (r.plastic_zone_diameter - r.diameter) / 2.0
    widgets.figures([
        ("Plastic zone, Ø", unitsys.show(r.plastic_zone_diameter, "length", system),
         "diameter to which the hub yields at the tightest fit (= bore: elastic hub)"),
        ("Plastic zone, depth", unitsys.show(depth, "length", system),
         "depth of the yielded ring from the hub bore"),
        ("Plastic utilisation", unitsys.num(r.plastic_utilisation, 3),
         "plastic share of the hub wall over the permitted share (≤ 1 passes)"),
    ])
