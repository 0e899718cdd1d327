"""Plots of a press-fit result: wall stresses and the torque-capacity band.

Both take a :class:`fitcheck.pressfit.PressFitResult`, draw on ``ax`` (or a new
figure) and return the Figure; they never call ``plt.show()``.
"""

from __future__ import annotations

from matplotlib.figure import Figure

from ._units import scale


def _axes(ax, size=(6.4, 4.0)):
    if ax is None:
        fig = Figure(figsize=size, layout="constrained")
        return fig, fig.add_subplot()
    return ax.figure, ax


def plot_wall_stresses(result, ax=None, *, units: str = "SI") -> Figure:
    """Radial, tangential and von Mises stress through shaft and hub walls at the tightest case.

    The governing condition (room temperature at standstill, or operating with
    temperature and centrifugal stresses) is the one with the larger stress at the hub bore.
    """
    fig, ax = _axes(ax)
    prof = result.wall_profile()
    kr, lr = scale("mm", units)
    ks, ls_ = scale("MPa", units)
    prof = {k: (v * (kr if k.startswith("r_") else ks) if hasattr(v, "shape") else v) for k, v in prof.items()}
    for part, ls in (("shaft", "-"), ("hub", "-")):
        r = prof[f"r_{part}"]
        kw = {"label": None} if part == "hub" else {}
        ax.plot(r, prof[f"sr_{part}"], ls, color="tab:blue", **({"label": "radial σr"} if part == "shaft" else kw))
        ax.plot(r, prof[f"st_{part}"], ls, color="tab:orange",
                **({"label": "tangential σt"} if part == "shaft" else kw))
        ax.plot(r, prof[f"vm_{part}"], "--", color="tab:red",
                **({"label": "von Mises σv"} if part == "shaft" else kw))
    ax.axvline(result.diameter / 2.0 * kr, color="0.4", lw=0.8)
    ax.axhline(0.0, color="0.6", lw=0.6)
    h, s = result.hub_material, result.shaft_material
    ax.axhline(h.Rp02 * ks, color="tab:red", lw=0.6, ls=":", label=f"Rp0.2 hub ({h.name})")
    if s.Rp02 != h.Rp02:
        ax.axhline(s.Rp02 * ks, color="tab:purple", lw=0.6, ls=":", label=f"Rp0.2 shaft ({s.name})")
    ax.set_xlim(0.0, result.hub_outer_diameter / 2.0 * kr)
    ax.set_xlabel(f"radius r [{lr}]  (shaft | hub)")
    ax.set_ylabel(f"stress [{ls_}]")
    cond = "operating" if prof["condition"] == "operating" else "room temperature, standstill"
    ax.set_title(f"{result.name}: wall stresses at the tightest fit ({cond})", fontsize=10)
    ax.legend(fontsize=8, loc="best")
    ax.grid(True, lw=0.3)
    return fig


def plot_capacity_band(result, ax=None, *, units: str = "SI") -> Figure:
    """Torque capacity across the interference band (loosest → tightest) at operating condition.

    The line marks the required torque × slip safety; where the band lies
    below it the joint can slip.
    """
    fig, ax = _axes(ax)
    band = result.capacity_band()
    kx, lx = scale("um", units)
    kt, lt = scale("N*m", units)
    x, inside = band["interference"] * 1000.0 * kx, band["in_band"]
    t = band["torque_capacity"] / 1000.0 * kt
    ax.plot(x, t, color="tab:blue", label="torque capacity (operating)")
    ax.fill_between(x[inside], 0.0, t[inside], color="tab:blue", alpha=0.15, label="tolerance band")
    ax.axhline(band["required"] / 1000.0 * kt, color="tab:red", ls="--",
               label=f"required × slip safety {band['slip_safety_required']:g}")
    ax.set_xlabel(f"measured diametral interference [{lx}]")
    ax.set_ylabel(f"torque [{lt}]")
    ax.set_title(f"{result.name}: torque capacity across the interference band", fontsize=10)
    ax.legend(fontsize=8, loc="upper left")
    ax.grid(True, lw=0.3)
    ax.set_ylim(bottom=0.0)
    return fig
