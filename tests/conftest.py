import logging
import os

import pytest
from hypothesis import HealthCheck, settings

os.environ.setdefault("MPLBACKEND", "Agg")

# The suite runs on small shared machines: judge properties by their outcome, never by the clock.
settings.register_profile("fitcheck", deadline=None, suppress_health_check=[HealthCheck.too_slow])
settings.load_profile("fitcheck")
logging.getLogger("streamlit.runtime.scriptrunner_utils.script_run_context").setLevel(logging.ERROR)
logging.getLogger("streamlit.runtime.caching.cache_data_api").setLevel(logging.ERROR)


@pytest.fixture
def cli(capsys):
    """Run the command line in-process: returns (exit_code, stdout, stderr)."""
    from fitcheck.cli import main

    def run(*argv):
        try:
            code = main(list(argv))
        except SystemExit as e:  # argparse
            code = e.code
        out = capsys.readouterr()
        return code, out.out, out.err

    return run
