"""Joint diagram of a screw joint: force against elongation of the screw and of the clamped parts."""

from __future__ import annotations

from matplotlib.figure import Figure


def plot_joint_diagram(result, ax=None, *, units: str = "SI") -> Figure:
    """Draw the joint (force–elongation) diagram of a :class:`~fitcheck.screws.ScrewJointResult`.

    The screw line rises with stiffness 1/δS to the smallest preload in service
    F_V = F_M,zul/αA − F_Z − (thermal loss); the clamped parts' line falls from there with 1/δP. The operating
    load F_A is shared: the screw takes Φ·F_A, the clamped parts are relieved by (1 − Φ)·F_A, and
    F_KR is the residual clamp load (VDI 2230-1:2015, Section 3.1, joint diagram). For an eccentric
    joint the load factor is Φen* and the point where the interface starts to open at the loaded
    edge (F_A = F_Aab) is marked.

    Parameters
    ----------
    result : ScrewJointResult
    ax : matplotlib.axes.Axes, optional

    Returns
    -------
    matplotlib.figure.Figure
    """
    if ax is None:
        fig = Figure(figsize=(6.4, 4.2))
        ax = fig.add_subplot(111)
    else:
        fig = ax.figure
    from ._units import scale
    kf, lf = scale("kN", units)
    ke, le = scale("um", units)
    ke = ke * 1000.0                     # mm → µm (or thou)
    # forces are scaled by kf, so that F / 1000 below reads kN (SI) or klbf (inch)
    r = result
    j = r.joint_diagram()
    FV, FA = j["F_V"] * kf, j["F_A"] * kf
    fS, fP = j["f_S"] * ke, j["f_P"] * ke
    ax.plot([0, fS], [0, FV / 1000], color="tab:blue", lw=2, label="screw (1/δS)")
    ax.plot([fS, fS + fP], [FV / 1000, 0], color="tab:orange", lw=2, label="clamped parts (1/δP)")
    # operating state: the screw takes Φ·FA, the clamped parts are relieved by (1 − Φ)·FA
    if FA > 0:
        df, FS, FKR = j["f_A"] * ke, j["F_S"] * kf, j["F_KR"] * kf
        ax.plot([fS, fS + df], [FV / 1000, FS / 1000], color="tab:blue", lw=1, ls="--")
        ax.vlines(fS + df, FKR / 1000, FS / 1000, color="tab:red", lw=2, label=f"FA = {FA / 1000:.2f} {lf}")
        ax.hlines(FKR / 1000, fS, fS + df, color="tab:green", lw=1, ls=":")
        ax.annotate(f"FKR = {FKR / 1000:.2f} {lf}", (fS + df, FKR / 1000), textcoords="offset points",
                    xytext=(6, -12), fontsize=8, color="tab:green")
    F_Aab = j.get("F_Aab", float("inf"))
    if getattr(r, "opening_edge", "") and F_Aab == F_Aab and F_Aab < float("inf"):
        # opening of the interface at the loaded edge (VDI 2230-1:2015, 3.2.3): the screw force there
        phi = r.load_factor_eccentric
        xo, yo = fS + phi * F_Aab * r.delta_S * ke, (FV + phi * F_Aab * kf) / 1000
        ax.plot([fS, xo], [FV / 1000, yo], color="tab:purple", lw=1, ls=":")
        ax.plot([xo], [yo], marker="o", color="tab:purple", ls="none",
                label=f"opening at FAab = {F_Aab * kf / 1000:.2f} {lf}")
    FMz = r.F_M_zul * kf
    ax.axhline(FMz / 1000, color="grey", lw=0.8, ls="--")
    ax.annotate(f"FM,zul = {FMz / 1000:.2f} {lf}", (0, FMz / 1000), textcoords="offset points",
                xytext=(2, 3), fontsize=8, color="grey")
    ax.annotate(f"FV,min = {FV / 1000:.2f} {lf}", (fS, FV / 1000), textcoords="offset points",
                xytext=(-70, 4), fontsize=8)
    ax.set_xlabel(f"elongation / compression [{le}]")
    ax.set_ylabel(f"force [{lf}]")
    phi_used = getattr(r, "load_factor_eccentric", r.load_factor)
    phi_text = (f"Φen* = {phi_used:.3f}" if getattr(r, "opening_edge", "") else f"Φ = {r.load_factor:.3f}")
    ax.set_title(f"Joint diagram: {r.name} ({r.thread} {r.property_class}), {phi_text}")
    ax.set_xlim(left=0)
    top = max(r.F_M_zul, j["F_S"]) * kf
    if getattr(r, "opening_edge", "") and F_Aab < float("inf"):
        top = max(top, FV + r.load_factor_eccentric * F_Aab * kf)
    ax.set_ylim(bottom=0, top=top / 1000 * 1.15)
    ax.legend(fontsize=8, loc="upper right")
    ax.grid(True, alpha=0.3)
    return fig
