"""Charts drawn in the browser (Vega-Lite) from data the library computes.

The report draws the same quantities with matplotlib (``fitcheck.plots``); in the
app a chart rendered by the browser keeps a page interaction fast (a matplotlib
PNG costs 100 ms or more of server time each). This module only arranges data
that the library returns and converts it to the display unit system; it
computes nothing of its own.
"""

from __future__ import annotations

from collections.abc import Mapping, Sequence
from typing import TYPE_CHECKING

import streamlit as st

from fitcheck.ui import unitsys

if TYPE_CHECKING:  # pandas is imported where a chart is drawn: the first result shows sooner
    import pandas as pd

#: Chart axes of small lengths in inch units read in thousandths of an inch (0.0012 in -> 1.2).
THOU = "0.001 in"
ZONE_COLORS = ("#3b6ea5", "#b5472f")


def factor(kind: str, system: str) -> float:
    """Axis magnitude of one core unit of ``kind`` (all chart quantities are linear).

    Small lengths in inch units are plotted in thousandths of an inch (see :data:`THOU`).
    """
    f = unitsys.magnitude(1.0, kind, system)
    return f * 1000.0 if (kind == "small_length" and system == "inch") else f


def label(text: str, kind: str, system: str) -> str:
    """Axis title with the axis unit, e.g. ``"stress [MPa]"``, ``"interference [0.001 in]"``."""
    if kind == "small_length" and system == "inch":
        return f"{text} [{THOU}]"
    return f"{text} [{unitsys.symbol(unitsys.unit_for(kind, system))}]"


def small_factor(system: str) -> tuple[float, str]:
    """Axis magnitude of one µm and the axis unit's name (µm, or thousandths of an inch)."""
    return factor("small_length", system), ("µm" if system != "inch" else THOU)


def _color(colors: Mapping[str, str] | None, present) -> dict:
    """A colour scale listing only the series drawn (legend entries = lines on the chart)."""
    if not colors:
        return {}
    shown = [k for k in colors if k in set(present)]
    return {"scale": {"domain": shown, "range": [colors[k] for k in shown]}}


def zones(df: pd.DataFrame, *, y_title: str, colors: Mapping[str, str], key: str, title: str = "",
          height: int = 300) -> None:
    """Tolerance zones as floating bars from ``lower`` to ``upper`` beside the zero line."""
    enc = {
        "x": {"field": "zone", "type": "nominal", "title": None, "sort": None,
              "axis": {"labelAngle": 0}},
        "y": {"field": "lower", "type": "quantitative", "title": y_title},
        "y2": {"field": "upper"},
        "color": {"field": "zone", "type": "nominal", "title": None, "legend": None,
                  **_color(colors, df["zone"])},
        "tooltip": [{"field": "zone", "type": "nominal"},
                    {"field": "upper", "type": "quantitative", "format": ".4~g",
                     "title": "upper deviation"},
                    {"field": "lower", "type": "quantitative", "format": ".4~g",
                     "title": "lower deviation"}],
    }
    layers = [{"mark": {"type": "bar", "opacity": 0.8, "width": {"band": 0.5}}, "encoding": enc},
              {"mark": {"type": "text", "dy": -7, "fontSize": 11},
               "encoding": {"x": enc["x"], "y": {"field": "upper", "type": "quantitative"},
                            "text": {"field": "upper", "type": "quantitative",
                                     "format": "+.4~g"}}},
              {"mark": {"type": "text", "dy": 12, "fontSize": 11},
               "encoding": {"x": enc["x"], "y": {"field": "lower", "type": "quantitative"},
                            "text": {"field": "lower", "type": "quantitative",
                                     "format": "+.4~g"}}},
              {"data": {"values": [{"v": 0.0, "t": "zero line (nominal size)"}]},
               "mark": {"type": "rule", "color": "#555555", "strokeWidth": 1.5},
               "encoding": {"y": {"field": "v", "type": "quantitative"}}}]
    spec = {"height": height, "layer": layers,
            "config": CONFIG}
    if title:
        spec["title"] = {"text": title, "fontSize": 13, "anchor": "start"}
    _draw(df, spec, key)


def lines(df: pd.DataFrame, *, x: str, y: str, series: str, x_title: str, y_title: str,
          detail: str | None = None, dashed: Sequence[str] = (), hrules: Sequence[tuple] = (),
          vrules: Sequence[tuple] = (), band: str | None = None, key: str, height: int = 320,
          title: str = "", colors: Mapping[str, str] | None = None) -> None:
    """Lines of ``y`` over ``x`` coloured by ``series``; optional reference lines and a shaded band.

    ``colors`` maps series names to colours (and fixes the legend order).

    ``hrules`` / ``vrules`` are ``(value, text)`` pairs; ``band`` names a boolean column whose
    true rows are shaded down to zero; series named in ``dashed`` are drawn dashed.
    """
    enc = {
        "x": {"field": x, "type": "quantitative", "title": x_title},
        "y": {"field": y, "type": "quantitative", "title": y_title},
        "color": {"field": series, "type": "nominal", "title": None,
                  "legend": {"orient": "bottom", "columns": 3, "labelLimit": 260},
                  **_color(colors, df[series])},
        "tooltip": [{"field": series, "type": "nominal"},
                    {"field": x, "type": "quantitative", "format": ".4~g", "title": x_title},
                    {"field": y, "type": "quantitative", "format": ".4~g", "title": y_title}],
    }
    if detail:
        enc["detail"] = {"field": detail, "type": "nominal"}
    if dashed:
        enc["strokeDash"] = {"condition": {"test": {"field": series, "oneOf": list(dashed)},
                                           "value": [6, 3]}, "value": [1, 0]}
    layers: list[dict] = []
    if band:
        layers.append({"transform": [{"filter": {"field": band, "equal": True}}],
                       "mark": {"type": "area", "opacity": 0.15, "color": "#2b6cb0"},
                       "encoding": {"x": enc["x"], "y": enc["y"]}})
    layers.append({"mark": {"type": "line", "strokeWidth": 2}, "encoding": enc})
    rule_layers, datasets = _rules(hrules, vrules)
    layers += rule_layers
    spec = {"height": height, "layer": layers, "config": CONFIG}
    if title:
        spec["title"] = {"text": title, "fontSize": 13, "anchor": "start"}
    _draw(df, spec, key, datasets)


#: Dash patterns of the reference lines, one per line (they tell the lines apart in the legend).
RULE_DASHES = ([5, 3], [10, 3], [2, 2], [10, 3, 2, 3], [6, 2, 2, 2, 2, 2], [1, 3])
RULE_COLOR = "#b83232"


def _rules(hrules: Sequence[tuple] = (), vrules: Sequence[tuple] = ()) -> tuple[list[dict], dict]:
    """Reference lines across the chart (``(value, text)`` pairs: ``hrules`` at a y value,
    ``vrules`` at an x value), named in a legend of their own: ``(layers, datasets)``.

    The names go into the legend (each line with its own dash pattern) rather than beside the
    lines, so lines close together never have their labels drawn over each other. The values
    travel as named datasets (``spec["datasets"]``), not inside the spec: a changed value (a new
    required torque) then changes only the data, and the browser updates the drawn chart instead
    of building it anew.
    """
    import pandas as pd

    names = list(dict.fromkeys(str(t) for _, t in [*hrules, *vrules]))
    dash = {"field": "t", "type": "nominal", "title": None,
            "scale": {"domain": names,
                      "range": [RULE_DASHES[i % len(RULE_DASHES)] for i in range(len(names))]},
            "legend": {"orient": "bottom", "labelLimit": 320, "symbolType": "stroke",
                       "symbolStrokeColor": RULE_COLOR, "symbolStrokeWidth": 1.5}}
    out, data = [], {}
    for axis, rules in (("y", hrules), ("x", vrules)):
        if rules:
            name = f"rules_{axis}"
            data[name] = pd.DataFrame({"v": [float(v) for v, _ in rules],
                                       "t": [str(t) for _, t in rules]})
            out.append({
                "data": {"name": name},
                "mark": {"type": "rule", "color": RULE_COLOR, "strokeWidth": 1.5},
                "encoding": {
                    axis: {"field": "v", "type": "quantitative"}, "strokeDash": dash,
                    "tooltip": [{"field": "t", "type": "nominal", "title": "line"},
                                {"field": "v", "type": "quantitative", "format": ".4~g"}]}})
    return out, data


#: Chart style: light grid; the legends below the plot stacked one above the other (the series,
#: then the reference lines), so a long legend is never cut at the chart's right edge.
CONFIG = {"axis": {"grid": True, "gridOpacity": 0.4},
          "legend": {"layout": {"bottom": {"direction": "vertical", "anchor": "start"}}}}

#: Name of a chart's main data among its named datasets.
MAIN = "table"


def _draw(df: pd.DataFrame, spec: dict, key: str, datasets: Mapping | None = None) -> None:
    """Draw a chart; its main data travels as the named dataset :data:`MAIN` beside the
    reference lines' datasets (the browser draws a chart whose data are all named; the spec
    then stays the same from one rerun to the next while values change)."""
    spec = dict(spec, data={"name": MAIN}, datasets={MAIN: df, **(datasets or {})})
    st.vega_lite_chart(spec=spec, width="stretch", key=key)


def waterfall(df: pd.DataFrame, *, stage: str, group: str, start: str, end: str, y_title: str,
              order: Sequence[str], hrules: Sequence[tuple] = (), key: str, height: int = 300,
              title: str = "", colors: Mapping[str, str] | None = None) -> None:
    """Floating bars from ``start`` to ``end`` per ``stage`` (in ``order``), side by side per ``group``."""
    enc = {
        "x": {"field": stage, "type": "nominal", "sort": list(order), "title": None,
              "axis": {"labelAngle": 0}},
        "xOffset": {"field": group, "type": "nominal"},
        "y": {"field": start, "type": "quantitative", "title": y_title},
        "y2": {"field": end},
        "color": {"field": group, "type": "nominal", "title": None,
                  "legend": {"orient": "bottom"}, **_color(colors, df[group])},
        "tooltip": [{"field": group, "type": "nominal"}, {"field": stage, "type": "nominal"},
                    {"field": end, "type": "quantitative", "format": ".3~f",
                     "title": "clearance after"}],
    }
    layers = [{"mark": {"type": "bar", "opacity": 0.85}, "encoding": enc},
              {"mark": {"type": "text", "dy": -6, "fontSize": 10},
               "encoding": {"x": enc["x"], "xOffset": enc["xOffset"],
                            "y": {"field": "top", "type": "quantitative"},
                            "text": {"field": end, "type": "quantitative", "format": ".1f"}}},
              {"data": {"values": [{"v": 0.0}]}, "mark": {"type": "rule", "color": "#555555"},
               "encoding": {"y": {"field": "v", "type": "quantitative"}}}]
    rule_layers, datasets = _rules(hrules)
    layers += rule_layers
    spec = {"height": height, "layer": layers, "transform": [
        {"calculate": f"max(datum['{start}'], datum['{end}'])", "as": "top"}]}
    if title:
        spec["title"] = {"text": title, "fontSize": 13, "anchor": "start"}
    _draw(df, spec, key, datasets)


def unit_factor(unit: str, system: str) -> tuple[float, str]:
    """Display magnitude of one ``unit`` (a result's own unit, e.g. ``"MPa"``) and the display
    unit's symbol in ``system`` (``(0.145…, "ksi")`` for MPa in inch units)."""
    from fitcheck.units import Q_

    target = unitsys._target_unit(unit, system)  # the unit the tables of the system use
    f = 1.0 if target == unit else float(Q_(1.0, unit).to(target).magnitude)
    if system == "inch" and target == "in" and unit in ("um", "micrometer", "µm"):
        return f * 1000.0, THOU  # small lengths read in thousandths of an inch
    return f, unitsys.symbol(target)


def histogram(hist: Mapping, *, x_title: str, scale: float = 1.0, key: str, height: int = 220,
              title: str = "", y_title: str = "share of the lot [%]") -> None:
    """Bars of a histogram the library computed (``Distribution.histogram()``) with its limits.

    ``scale`` converts the bin edges and limit values to the display unit.
    """
    import pandas as pd

    df = pd.DataFrame({"lo": [v * scale for v in hist["lo"]], "hi": [v * scale for v in hist["hi"]],
                       "share": list(hist["share"]), "count": list(hist["count"])})
    enc = {
        "x": {"field": "lo", "type": "quantitative", "title": x_title,
              "scale": {"zero": False}},
        "x2": {"field": "hi"},
        "y": {"field": "share", "type": "quantitative", "title": y_title},
        "y2": {"datum": 0},
        "tooltip": [{"field": "lo", "type": "quantitative", "format": ".4~g", "title": "from"},
                    {"field": "hi", "type": "quantitative", "format": ".4~g", "title": "to"},
                    {"field": "count", "type": "quantitative", "title": "samples"},
                    {"field": "share", "type": "quantitative", "format": ".3~g",
                     "title": "share [%]"}],
    }
    layers: list[dict] = [{"mark": {"type": "bar", "color": "#4a7a8c", "opacity": 0.75,
                                    "binSpacing": 0}, "encoding": enc}]
    rule_layers, datasets = _rules(vrules=[(value * scale, text) for text, value in hist["limits"]])
    layers += rule_layers
    if hist["limits"]:
        height += 40  # the legend of the lines below the chart keeps the bars their height
    spec = {"height": height, "layer": layers, "config": CONFIG}
    if title:
        spec["title"] = {"text": title, "fontSize": 13, "anchor": "start"}
    _draw(df, spec, key, datasets)
