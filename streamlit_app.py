"""fitcheck in the browser: page set-up and navigation only (pages live in fitcheck/ui/)."""

import streamlit as st

from fitcheck.ui import app

st.set_page_config(page_title="fitcheck", layout="wide")
app.run()
