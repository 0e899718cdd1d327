"""The decisions a calculation hands to the drawing, one short list per joint.

For each joint the report's first page lists what goes on the drawing or the
assembly instruction:

* a fit: its designation with the limits of size of hole and shaft (in mm and
  in inch for an inch case);
* a press fit: the largest press-in force against the press's capacity, or the
  hub heating temperature of a shrink fit against the material's limit;
* a bearing seat: the shaft and housing classes with their limits of size, the
  bearing's tolerance class and radial clearance group;
* a screw joint: the tightening torque rounded down to a wrench setting, the
  preload range it gives and the tightening method.

A result of another kind of joint may offer its own rows through a method
``drawing_items() -> [(item, decision, basis), …]``; a joint without either says
so and the reader turns to its section.
"""

from __future__ import annotations

import math
from dataclasses import dataclass

from ..display import num, show_in, symbol, unit_for
from .words import prose, value_text

__all__ = ["DrawingItem", "decisions", "wrench_setting"]

MM_PER_IN = 25.4


@dataclass(frozen=True)
class DrawingItem:
    item: str
    decision: str
    basis: str = ""


def _size(mm: float, system: str) -> str:
    text = f"{mm:.3f} mm"
    if system == "inch":
        text += f" ({mm / MM_PER_IN:.5f} in)"
    return text


def _zone_row(zone, what: str, system: str) -> DrawingItem:
    def sgn(x: float, fmt: str) -> str:
        return "0" if x == 0 else format(x, fmt)

    dev = (f"{sgn(zone.upper_um, '+g')} / {sgn(zone.lower_um, '+g')} µm" if system != "inch" else
           f"{sgn(zone.upper_um / 25400, '+.5f')} / {sgn(zone.lower_um / 25400, '+.5f')} in")
    return DrawingItem(f"{what} Ø{zone.nominal_mm:g} {zone.cls}",
                       f"{_size(zone.max_mm, system)} / {_size(zone.min_mm, system)}",
                       f"limits of size (max / min); deviations {dev}; ISO 286-2")


def _fit_rows(designation: str, system: str, joint_result) -> list[DrawingItem]:
    from ..fits import fit as make_fit

    try:
        f = make_fit(designation)
    except Exception as exc:  # a fit system this module does not know: say so, keep the page
        return [DrawingItem("fit", value_text(designation, system), f"limits not listed ({exc})")]
    rows = [DrawingItem("fit", f"Ø{f.designation}", f"{f.kind or ''} fit, ISO 286".strip())]
    rows += [_zone_row(z, w, system) for z, w in ((f.hole, "hole"), (f.shaft, "shaft")) if z]
    return rows


def _check(result, *words):
    for c in getattr(result, "checks", ()):
        if all(w in c.name for w in words):
            return c
    return None


def _press_rows(r, system: str) -> list[DrawingItem]:
    rows = []
    fit = getattr(r, "fit", None)
    if isinstance(fit, str) and "/" in fit:
        rows += _fit_rows(fit, system, r)
    elif getattr(r, "interference_min", None) is not None:
        lo, hi = r.interference_min * 1000.0, r.interference_max * 1000.0
        rows.append(DrawingItem("diametral interference",
                                f"{show_in(lo, 'um', system)} … {show_in(hi, 'um', system)}",
                                "as given in the case"))
    assembly = getattr(r, "assembly", "press")
    if assembly == "shrink":
        t = getattr(r, "shrink_temperature_C", math.nan)
        c = _check(r, "heating")
        limit = f"; material limit {show_in(c.limit, 'degC', system)}" if c and math.isfinite(
            c.limit) else ""
        rows.append(DrawingItem("assembly: shrink fit, heat the hub to at least",
                                show_in(t, "degC", system),
                                f"includes the joining clearance{limit} (DIN 7190-1:2017)"))
    else:
        f = getattr(r, "press_force_max", math.nan)
        c = _check(r, "press-in force")
        if c is not None and math.isfinite(c.limit):
            basis = (f"press capacity {show_in(c.limit, c.unit, system)}: "
                     + ("within it" if c.passed else "EXCEEDS it"))
        else:
            basis = "no press capacity given in the case: choose a press for this force"
        rows.append(DrawingItem("assembly: longitudinal press fit, press-in force up to",
                                show_in(f, "N", system), basis + "; at the tightest fit"))
    return rows


def _bearing_rows(r, system: str) -> list[DrawingItem]:
    from ..fits import zone

    rows = [DrawingItem("bearing", f"{r.designation} ({r.bore_mm:g} × {r.outside_mm:g} × "
                        f"{r.width_mm:g} mm)", f"tolerance class {r.tolerance_class}, ISO 492")]
    for nominal, cls, what in ((r.bore_mm, r.shaft_class, "shaft seat"),
                               (r.outside_mm, r.housing_class, "housing bore")):
        try:
            rows.append(_zone_row(zone(nominal, cls), what, system))
        except Exception:  # a class outside the tables: name it without limits
            rows.append(DrawingItem(what, f"Ø{nominal:g} {cls}", "limits not listed"))
    group = getattr(r, "clearance_group", "")
    smallest = getattr(r, "smallest_passing_group", None)
    basis = "ISO 5753-1"
    if smallest and smallest != group:
        basis += f"; the smallest group that keeps the minimum clearance is {smallest}"
    rows.append(DrawingItem("radial internal clearance group", str(group or "N"), basis))
    return rows


def wrench_setting(torque_nmm: float, system: str = "SI") -> tuple[float, str]:
    """The torque-wrench setting for a computed tightening torque, rounded *down*.

    Rounded down because the computed torque already brings the preload to the
    permitted value at the lowest friction. The step grows with the torque as
    the scales of torque wrenches do (common practice): 0.1 N·m below 10 N·m,
    0.5 N·m below 50 N·m, 1 N·m below 200 N·m, else 5 N·m; in inch units 1 lbf·in
    below 100 lbf·in, 5 lbf·in below 500 lbf·in, else 10 lbf·in.

    Returns the setting in N·mm and its text in the system's unit.

    >>> wrench_setting(4076.5)
    (4000.0, '4.0 N·m')
    >>> wrench_setting(4076.5, "inch")[1]
    '36 lbf·in'
    """
    if system == "inch":
        per = 112.984829  # N·mm per lbf·in (exact by definition of lbf and in)
        x = torque_nmm / per
        step = 1.0 if x < 100 else 5.0 if x < 500 else 10.0
        s = math.floor(x / step + 1e-9) * step
        return s * per, f"{num(s, 6)} lbf·in"
    x = torque_nmm / 1000.0
    step = 0.1 if x < 10 else 0.5 if x < 50 else 1.0 if x < 200 else 5.0
    s = round(math.floor(x / step + 1e-9) * step, 6)
    return s * 1000.0, (f"{s:.1f} N·m" if step < 1 else f"{s:.0f} N·m")


def _screw_rows(r, inp, system: str) -> list[DrawingItem]:
    count = getattr(inp, "count", None) or 1
    rows = [DrawingItem("screws", f"{count} × {r.thread}, property class {r.property_class}",
                        "ISO 898-1 / ASME B1.1 as named")]
    M = float(r.tightening_torque)
    setting, text = wrench_setting(M, system)
    k = setting / M if M > 0 else 0.0
    f_hi = r.F_M_zul * k
    f_lo = getattr(r, "preload_at_mu_max", math.nan) * k
    computed = show_in(M, "N*mm", system)
    rows.append(DrawingItem("tightening torque (wrench setting)", text,
                            f"computed {computed}, rounded down to the wrench scale"))
    rows.append(DrawingItem("assembly preload at this setting",
                            f"{show_in(f_lo, 'N', system)} … {show_in(f_hi, 'N', system)}",
                            "highest … lowest friction; the upper end stays within FM,zul "
                            f"({show_in(r.F_M_zul, 'N', system)})"))
    method = getattr(inp, "tightening", "")
    if isinstance(method, str):
        try:
            from ..threads import tightening_factor

            words = tightening_factor(method)[2]
        except Exception:  # a method text the table does not hold: print it in words
            words = value_text(method)
        basis = f"αA = {r.alpha_A:g} (VDI 2230-1:2015, Table A8)"
    else:
        words, basis = f"tightening factor αA = {float(method):g} as given", "as given in the case"
    mu = getattr(inp, "mu_thread", None)
    if isinstance(mu, tuple | list) and len(mu) == 2:
        basis += f"; thread friction μG {mu[0]:g} … {mu[1]:g}"
    rows.append(DrawingItem("tightening method", prose(words), basis))
    return rows


def decisions(table: str, inp, result, system: str = "SI") -> list[DrawingItem]:
    """The drawing decisions of one joint (empty when its kind has none to give)."""
    own = getattr(result, "drawing_items", None)
    if callable(own):
        return [DrawingItem(*(prose(str(x)) for x in row)) for row in own()]
    try:
        if table == "pressfit":
            return _press_rows(result, system)
        if table == "bearing":
            return _bearing_rows(result, system)
        if table == "screws":
            return _screw_rows(result, inp, system)
    except (AttributeError, TypeError, ValueError) as exc:  # a result of another shape
        return [DrawingItem("drawing decisions", "see the joint's section",
                            f"not gathered here ({exc})")]
    fit = getattr(result, "fit", None)
    if isinstance(fit, str) and "/" in fit:
        return _fit_rows(fit, system, result)
    return []


def unit_label(kind: str, system: str) -> str:
    return symbol(unit_for(kind, system))
