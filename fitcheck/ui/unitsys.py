"""The front end's unit system lives in :mod:`fitcheck.display` (no Streamlit in it), so the
CLI and the report format numbers exactly as the browser does. This name stays for the pages:
it re-exports every name of :mod:`fitcheck.display` (a plain module, so doctest collection
imports it like any other)."""

from fitcheck.display import *  # noqa: F403
from fitcheck.display import _target_unit  # noqa: F401  (used by the charts)
