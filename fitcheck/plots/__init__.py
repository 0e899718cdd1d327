"""Plots as library functions: ``plot_*(result, ax=None) -> matplotlib.figure.Figure``.

One module per topic; they never call ``plt.show()`` and work without a display.
Shared by the report and the browser front end. The functions are imported on first use
(PEP 562), so importing :mod:`fitcheck.plots._units` alone does not import matplotlib.
"""

import importlib

_WHERE = {"plot_clearance_budget": "bearings", "plot_fit": "fits",
          "plot_capacity_band": "pressfit", "plot_wall_stresses": "pressfit",
          "plot_joint_diagram": "screws", "plot_search_ranking": "study",
          "plot_study_histograms": "study"}

__all__ = sorted(_WHERE)


def __getattr__(name):
    if name in _WHERE:
        return getattr(importlib.import_module(f".{_WHERE[name]}", __name__), name)
    raise AttributeError(f"module {__name__!r} has no attribute {name!r}")


def __dir__():
    return sorted(list(globals()) + list(_WHERE))
