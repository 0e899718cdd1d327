"""fitcheck in the browser: page set-up and navigation only (pages live in fitcheck/ui/)."""

import streamlit as st

from fitcheck.ui import app

st.set_page_config(page_title="fitcheck — seats, press fits, screws", page_icon=":material/settings:",
                   layout="wide", initial_sidebar_state="expanded")
page = st.navigation(app.pages())
app.frame(page)
try:
    page.run()
finally:
    app.finish()
