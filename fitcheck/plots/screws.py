"""Joint diagram of a screw joint: force against elongation of the screw and of the clamped parts."""

from __future__ import annotations

from matplotlib.figure import Figure


def plot_joint_diagram(result, ax=None) -> Figure:
    """Draw the joint (force–elongation) diagram of a :class:`~fitcheck.screws.ScrewJointResult`.

    The screw line rises with stiffness 1/δS to the smallest preload in service
    F_V = F_M,zul/αA − F_Z − (thermal loss); the clamped parts' line falls from there with 1/δP. The operating
    load F_A is shared: the screw takes Φ·F_A, the clamped parts are relieved by (1 − Φ)·F_A, and
    F_KR is the residual clamp load (VDI 2230-1:2015, Section 3.1, joint diagram).

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
    r = result
    dS, dP = r.delta_S, r.delta_P
    th_loss = max(0.0, -r.dF_th_cold, -r.dF_th_warm)
    FV = max(r.F_M_zul / r.alpha_A - r.F_Z - th_loss, 0.0)
    fS = FV * dS * 1000.0   # µm
    fP = FV * dP * 1000.0
    ax.plot([0, fS], [0, FV / 1000], color="tab:blue", lw=2, label="screw (1/δS)")
    ax.plot([fS, fS + fP], [FV / 1000, 0], color="tab:orange", lw=2, label="clamped parts (1/δP)")
    # operating state: the screw takes Φ·FA, the clamped parts are relieved by (1 − Φ)·FA
    FA = r.F_A
    if FA > 0:
        dF_S = r.load_factor * FA
        df = dF_S * dS * 1000.0
        FS = FV + dF_S
        FKR = FV - (1.0 - r.load_factor) * FA
        ax.plot([fS, fS + df], [FV / 1000, FS / 1000], color="tab:blue", lw=1, ls="--")
        ax.vlines(fS + df, FKR / 1000, FS / 1000, color="tab:red", lw=2, label=f"FA = {FA / 1000:.2f} kN")
        ax.hlines(FKR / 1000, fS, fS + df, color="tab:green", lw=1, ls=":")
        ax.annotate(f"FKR = {FKR / 1000:.2f} kN", (fS + df, FKR / 1000), textcoords="offset points",
                    xytext=(6, -12), fontsize=8, color="tab:green")
    ax.axhline(r.F_M_zul / 1000, color="grey", lw=0.8, ls="--")
    ax.annotate(f"FM,zul = {r.F_M_zul / 1000:.2f} kN", (0, r.F_M_zul / 1000), textcoords="offset points",
                xytext=(2, 3), fontsize=8, color="grey")
    ax.annotate(f"FV,min = {FV / 1000:.2f} kN", (fS, FV / 1000), textcoords="offset points",
                xytext=(-70, 4), fontsize=8)
    ax.set_xlabel("elongation / compression [µm]")
    ax.set_ylabel("force [kN]")
    ax.set_title(f"Joint diagram: {r.name} ({r.thread} {r.property_class}), Φ = {r.load_factor:.3f}")
    ax.set_xlim(left=0)
    ax.set_ylim(bottom=0, top=max(r.F_M_zul, FV + r.load_factor * FA) / 1000 * 1.15)
    ax.legend(fontsize=8, loc="upper right")
    ax.grid(True, alpha=0.3)
    return fig
