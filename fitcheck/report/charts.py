"""The report's plots as :class:`~fitcheck.report.chart.Chart` descriptions, in the case's units.

Each builder shows what the matplotlib function of the same name in :mod:`fitcheck.plots`
shows (same data, same lines, same labels), drawn as vector graphics by
:mod:`fitcheck.report.chart`. Quantities are converted with :func:`fitcheck.plots._units.scale`
(inch case: thou, in, lbf, lbf·in, ksi). A plot function without a builder here is still
drawn by matplotlib (see :func:`builder`).
"""

from __future__ import annotations

import math

import numpy as np

from ..display import deviation
from ..plots._units import scale
from .chart import Area, Chart, Line, Rule, Span, Text

__all__ = ["BUILDERS", "builder", "fit_chart"]

_BLUE, _ORANGE, _RED, _GREEN, _PURPLE = "#1f77b4", "#ff7f0e", "#d62728", "#2ca02c", "#9467bd"


def _fmt(v: float) -> str:
    return deviation(v).replace("-", "−")


def _num(v: float, fmt: str) -> str:
    return format(v, fmt).replace("-", "−")


def fit_chart(fit, system: str = "SI") -> Chart:
    """Tolerance zones of a fit (as :func:`fitcheck.plots.fits.plot_fit`)."""
    k_um, u_lab = scale("um", system)
    zones = [(z, c) for z, c in ((fit.hole, "#3b6ea5"), (fit.shaft, "#c9822b")) if z is not None]
    lo = min([0.0] + [z.lower_um * k_um for z, _ in zones])
    hi = max([0.0] + [z.upper_um * k_um for z, _ in zones])
    span = max(hi - lo, 1.0 * k_um)
    width, gap = 1.0, 0.6
    nominal = f"{fit.nominal_mm / 25.4:.4f} in" if system == "inch" else f"{fit.nominal_mm:g} mm"
    title = getattr(fit, "ansi_class", None) or ""
    title = (title + " " if title else "") + " / ".join(z.cls for z, _ in zones)
    if fit.kind is not None and math.isfinite(fit.clearance_max_um):
        title += (f" — {fit.kind}, clearance {_fmt(fit.clearance_min_um * k_um)} … "
                  f"{_fmt(fit.clearance_max_um * k_um)} {u_lab}")
    right = gap + len(zones) * (width + gap)
    ch = Chart(f"Ø{nominal if system == 'inch' else f'{fit.nominal_mm:g}'} {title}",
               ylabel=f"deviation from nominal size [{u_lab}]", xlim=(0.0, right + 1.4),
               ylim=(lo - 0.2 * span, hi + 0.2 * span), xticks=[], grid="y")
    for i, (z, col) in enumerate(zones):
        x = gap + i * (width + gap)
        up, low = z.upper_um * k_um, z.lower_um * k_um
        ch.add(Area([x, x + width, x + width, x], [low, low, up, up], col, 0.35, edge=col,
                    hatch=z.feature == "hole"),
               Text(x + width / 2, up, _fmt(up), valign="bottom", dy=2),
               Text(x + width / 2, low, _fmt(low), valign="top", dy=-2),
               Text(x + width / 2, (up + low) / 2, f"{z.feature}\n{z.cls}", valign="middle",
                    bold=True, size=7.0))
    ch.add(Rule("h", 0.0, "#333333", 1.0),
           Text(right, 0.0, f" {nominal}", anchor="start", valign="bottom", dy=2))
    return ch


def wall_stresses(result, system: str = "SI") -> Chart:
    """As :func:`fitcheck.plots.pressfit.plot_wall_stresses`."""
    prof = result.wall_profile()
    kr, lr = scale("mm", system)
    ks, ls_ = scale("MPa", system)
    cond = "operating" if prof["condition"] == "operating" else "room temperature, standstill"
    ch = Chart(f"{result.name}: wall stresses at the tightest fit ({cond})",
               xlabel=f"radius r [{lr}]  (shaft | hub)", ylabel=f"stress [{ls_}]")
    for part in ("shaft", "hub"):
        r = list(np.asarray(prof[f"r_{part}"], float) * kr)
        first = part == "shaft"
        for key, col, dash, label in (("sr", _BLUE, (), "radial σr"),
                                      ("st", _ORANGE, (), "tangential σt"),
                                      ("vm", _RED, (4, 2), "von Mises σv")):
            ch.add(Line(r, list(np.asarray(prof[f"{key}_{part}"], float) * ks), col, 1.2, dash,
                        label if first else ""))
    ch.add(Rule("v", result.diameter / 2.0 * kr, "#666666", 0.8))
    d_pl = prof.get("plastic_zone_diameter", result.diameter)
    if d_pl > result.diameter:
        ch.add(Span(result.diameter / 2.0 * kr, d_pl / 2.0 * kr, _RED, 0.12,
                    f"plastic zone to Ø {d_pl * kr:.4g} {lr} "
                    f"({(d_pl - result.diameter) / 2.0 * kr:.3g} {lr} deep)"))
    ch.add(Rule("h", 0.0, "#999999", 0.6))
    h, s = result.hub_material, result.shaft_material
    ch.add(Rule("h", h.Rp02 * ks, _RED, 0.7, (1, 1.5), f"Rp0.2 hub ({h.name})"))
    if s.Rp02 != h.Rp02:
        ch.add(Rule("h", s.Rp02 * ks, _PURPLE, 0.7, (1, 1.5), f"Rp0.2 shaft ({s.name})"))
    xs, ys = ch.data_limits()
    pad = 0.06 * (max(ys) - min(ys) or 1.0)
    ch.xlim = (0.0, result.hub_outer_diameter / 2.0 * kr)
    ch.ylim = (min(ys) - pad, max(ys) + pad)
    return ch


def capacity_band(result, system: str = "SI") -> Chart:
    """As :func:`fitcheck.plots.pressfit.plot_capacity_band`."""
    band = result.capacity_band()
    kx, lx = scale("um", system)
    kt, lt = scale("N*m", system)
    x = np.asarray(band["interference"], float) * 1000.0 * kx
    t = np.asarray(band["torque_capacity"], float) / 1000.0 * kt
    inside = np.asarray(band["in_band"], bool)
    req = band["required"] / 1000.0 * kt
    ch = Chart(f"{result.name}: torque capacity across the interference band",
               xlabel=f"measured diametral interference [{lx}]", ylabel=f"torque [{lt}]")
    ch.add(Line(list(x), list(t), _BLUE, 1.3, (), "torque capacity (operating)"))
    xi, ti = list(x[inside]), list(t[inside])
    if len(xi) >= 2:
        ch.add(Area(xi + xi[::-1], ti + [0.0] * len(xi), _BLUE, 0.15, "tolerance band"))
    ch.add(Rule("h", req, _RED, 1.0, (4, 2),
                f"required × slip safety {band['slip_safety_required']:g}"))
    finite = [v for v in list(t) + [req] if math.isfinite(v)]
    ch.ylim = (0.0, max(finite) * 1.08 if finite and max(finite) > 0 else 1.0)
    return ch


def clearance_budget(result, system: str = "SI") -> Chart:
    """As :func:`fitcheck.plots.bearings.plot_clearance_budget`."""
    from ..bearings import clearance_budget as budget

    k, lab = scale("um", system)
    steps = {key: [v * k for v in vals] for key, vals in budget(result).items()}
    finite = all(math.isfinite(v) for s in steps.values() for v in s)
    name = getattr(result, "name", "") or getattr(result, "designation", "")
    ch = Chart(f"Clearance budget {name}".strip() + ("" if finite else " (no clearance group)"),
               ylabel=f"radial clearance [{lab}]", grid="y",
               xticks=[(0, f"initial\n{getattr(result, 'clearance_group', '')}"), (1, "fit-up"),
                       (2, "thermal"), (3, "operating")], xlim=(-0.6, 3.6))
    width = 0.36
    for j, (key, color, label) in enumerate((("min", "#b5472f", "tightest pairing"),
                                             ("max", "#3b6ea5", "loosest pairing"))):
        s = steps[key] if finite else [0.0] * 4
        x0 = -width / 2 + j * width
        bars = [(0.0, s[0]), (s[0], s[1]), (s[1], s[2]), (0.0, s[3])]
        for i, (a, b) in enumerate(bars):
            xa, xb = i + x0 - width * 0.475, i + x0 + width * 0.475
            ch.add(Area([xa, xb, xb, xa], [a, a, b, b], color, 1.0 if i in (0, 3) else 0.55,
                        label if i == 0 else ""),
                   Text(i + x0, max(a, b), _num(s[i], ".2f" if system == "inch" else ".1f"),
                        valign="bottom", dy=2, size=5.8))
        ch.add(Line([i + x0 for i in range(4)], s, color, 0.8, (1, 1.5), marker=True))
    ch.add(Rule("h", 0.0, "#444444", 0.8))
    lim = getattr(result, "clearance_min_um", 0.0) * k
    if lim:
        ch.add(Rule("h", lim, "#444444", 1.0, (4, 2), f"limit {lim:.3g} {lab}"))
    xs, ys = ch.data_limits()
    pad = 0.15 * ((max(ys) - min(ys)) or 1.0)
    ch.ylim = (min(ys) - pad, max(ys) + pad)
    return ch


def joint_diagram(result, system: str = "SI") -> Chart:
    """As :func:`fitcheck.plots.screws.plot_joint_diagram`."""
    r = result
    kf, lf = scale("kN", system)
    ke, le = scale("um", system)
    ke *= 1000.0
    j = r.joint_diagram()
    FV, FA = j["F_V"] * kf / 1000, j["F_A"] * kf / 1000
    fS, fP = j["f_S"] * ke, j["f_P"] * ke
    phi_used = getattr(r, "load_factor_eccentric", r.load_factor)
    phi_text = (f"Φen* = {phi_used:.3f}" if getattr(r, "opening_edge", "")
                else f"Φ = {r.load_factor:.3f}")
    ch = Chart(f"Joint diagram: {r.name} ({r.thread} {r.property_class}), {phi_text}",
               xlabel=f"elongation / compression [{le}]", ylabel=f"force [{lf}]")
    ch.add(Line([0, fS], [0, FV], _BLUE, 2.0, (), "screw (1/δS)"),
           Line([fS, fS + fP], [FV, 0], _ORANGE, 2.0, (), "clamped parts (1/δP)"))
    if FA > 0:
        df, FS, FKR = j["f_A"] * ke, j["F_S"] * kf / 1000, j["F_KR"] * kf / 1000
        ch.add(Line([fS, fS + df], [FV, FS], _BLUE, 1.0, (4, 2)),
               Line([fS + df, fS + df], [FKR, FS], _RED, 2.0, (), f"FA = {FA:.2f} {lf}"),
               Line([fS, fS + df], [FKR, FKR], _GREEN, 1.0, (1, 1.5)),
               Text(fS + df, FKR, f"FKR = {FKR:.2f} {lf}", anchor="start", valign="top", dx=4,
                    dy=-2, color=_GREEN))
    F_Aab = j.get("F_Aab", float("inf"))
    top = max(r.F_M_zul, j["F_S"]) * kf
    if getattr(r, "opening_edge", "") and F_Aab == F_Aab and F_Aab < float("inf"):
        phi = r.load_factor_eccentric
        xo, yo = fS + phi * F_Aab * r.delta_S * ke, (FV * 1000 + phi * F_Aab * kf) / 1000
        ch.add(Line([fS, xo], [FV, yo], _PURPLE, 1.0, (1, 1.5)),
               Line([xo], [yo], _PURPLE, 1.5, (), f"opening at FAab = {F_Aab * kf / 1000:.2f} {lf}",
                    marker=True))
        top = max(top, FV * 1000 + phi * F_Aab * kf)
    FMz = r.F_M_zul * kf / 1000
    ch.add(Rule("h", FMz, "#808080", 0.8, (4, 2)),
           Text(0, FMz, f"FM,zul = {FMz:.2f} {lf}", anchor="start", valign="bottom", dx=3, dy=2,
                color="#808080"),
           Text(fS, FV, f"FV,min = {FV:.2f} {lf}", anchor="end", valign="bottom", dx=-3, dy=3))
    xs, _ = ch.data_limits()
    ch.xlim = (0.0, max(xs) * 1.05 if xs and max(xs) > 0 else 1.0)
    ch.ylim = (0.0, top / 1000 * 1.15 if top > 0 else 1.0)
    return ch


#: "module:function" of a matplotlib plot → the builder of the same plot as a Chart.
BUILDERS = {
    "fitcheck.plots.pressfit:plot_wall_stresses": wall_stresses,
    "fitcheck.plots.pressfit:plot_capacity_band": capacity_band,
    "fitcheck.plots.bearings:plot_clearance_budget": clearance_budget,
    "fitcheck.plots.screws:plot_joint_diagram": joint_diagram,
}


for _spec, _fn in BUILDERS.items():
    _fn.plot_name = _spec.partition(":")[2]  # the caption of the plot it stands for


def builder(fn):
    """The chart builder standing for a matplotlib plot function, or None."""
    return BUILDERS.get(f"{getattr(fn, '__module__', '')}:{getattr(fn, '__name__', '')}")
