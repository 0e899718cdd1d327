"""Run every benchmark script in bench/ one after the other and let each print its figures."""

import pathlib
import runpy
import sys

here = pathlib.Path(__file__).parent
for script in sorted(here.glob("bench_*.py")):
    print(f"== {script.name}", flush=True)
    sys.argv = [str(script)]
    runpy.run_path(str(script), run_name="__main__")
