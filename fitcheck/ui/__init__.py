"""The browser front end: one module per Streamlit page plus shared state and widget helpers.

Pages read widgets, call the library and show its results; no formulas live
here. ``streamlit_app.py`` configures the page and runs ``st.navigation`` over
:data:`fitcheck.ui.app.PAGES`.
"""
