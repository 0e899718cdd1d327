"""Plots as library functions: ``plot_*(result, ax=None) -> matplotlib.figure.Figure``.

One module per topic; they never call ``plt.show()`` and work without a display.
Shared by the report and the browser front end.
"""

from .bearings import plot_clearance_budget
from .fits import plot_fit
from .pressfit import plot_capacity_band, plot_wall_stresses
from .screws import plot_joint_diagram
from .study import plot_search_ranking, plot_study_histograms

__all__ = ["plot_capacity_band", "plot_clearance_budget", "plot_fit", "plot_joint_diagram",
           "plot_search_ranking", "plot_study_histograms", "plot_wall_stresses"]
