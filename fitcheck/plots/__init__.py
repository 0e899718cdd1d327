"""Plots as library functions: ``plot_*(result, ax=None) -> matplotlib.figure.Figure``.

One module per topic; they never call ``plt.show()`` and work without a display.
Shared by the report and the browser front end.
"""
