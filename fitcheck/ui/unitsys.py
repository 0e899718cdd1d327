"""The front end's unit system lives in :mod:`fitcheck.display` (no Streamlit in it), so the
CLI and the report format numbers exactly as the browser does. This name stays for the pages."""

import sys

from fitcheck import display

sys.modules[__name__] = display
