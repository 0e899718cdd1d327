"""The front end's unit system lives in :mod:`fitcheck.display` (no Streamlit in it), so the
CLI and the report format numbers exactly as the browser does. This name stays for the pages."""

from fitcheck.display import *  # noqa: F403
from fitcheck.display import _INPUT, _SMALL, _SYMBOL, _target_unit  # noqa: F401
