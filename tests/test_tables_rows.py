"""Every data row of every table in data/ is loaded: row counts per file, independent of the loader."""

import csv
import io

import pytest

from fitcheck import tables

# data rows per file, counted in the files themselves (header and "# " comment lines excluded)
ROWS = {
    "bearing_clearance_iso5753.csv": 18, "bearing_seats.csv": 27, "bearing_tolerances_iso492.csv": 25,
    "bearings_iso15.csv": 204, "clearance_holes.csv": 38, "embedding.csv": 6, "iso286_delta.csv": 13,
    "iso286_grade_ranges.csv": 56, "iso286_hole_deviations.csv": 41, "iso286_it_grades.csv": 21,
    "iso286_shaft_deviations.csv": 41, "iso286_special_cases.csv": 9, "materials.csv": 15,
    "preferred_fits.csv": 20, "pressfit_friction.csv": 14, "property_classes.csv": 20,
    "screw_clamped_limits.csv": 6, "screw_friction.csv": 5, "screw_heads.csv": 90,
    "shigley_torque_factors.csv": 6, "threads_metric.csv": 52, "threads_unified.csv": 39,
    "tightening_factors.csv": 10, "washers.csv": 74,
}


def _independent_count(path) -> int:
    text = path.read_text(encoding="utf-8")
    data = "".join(ln for ln in io.StringIO(text)
                   if ln.strip() and not (ln.strip() == "#" or ln.strip().startswith("# ")))
    return sum(1 for _ in csv.reader(io.StringIO(data))) - 1


@pytest.mark.parametrize("path", sorted(tables.data_dir().glob("*.csv")), ids=lambda p: p.name)
def test_every_row_is_loaded(path):
    n = len(tables.read_rows(path.name))
    assert n == _independent_count(path)
    if path.name in ROWS:
        assert n == ROWS[path.name]


def test_numbered_inch_sizes_are_data():
    sizes = [r["size"] for r in tables.read_rows("clearance_holes.csv")]
    assert ["#0", "#1", "#2", "#3", "#4", "#5", "#6", "#8", "#10", "#12"] == [s for s in sizes if s.startswith("#")]
    heads = {r["size"] for r in tables.read_rows("screw_heads.csv") if r["head"] == "socket"}
    assert {"#0", "#4", "#8", "#10"} <= heads


def test_comment_rule():
    assert tables.is_comment("# a comment") and tables.is_comment("#\n")
    assert not tables.is_comment("#10,ASME B18.2.8,5.105,5.232,5.613")
