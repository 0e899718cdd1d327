"""``fitcheck limits "25 H7/p6"`` — ISO 286 limit deviations, limit sizes and fit kind."""

from __future__ import annotations

import sys

from .. import CAUTION
from ..errors import InputError
from ..fits import fit, preferred_fits
from . import EXIT_OK, print_json, print_table

COMMAND = "limits"
HELP = "ISO 286 limit deviations and limit sizes of a class or fit, e.g. \"25 H7/p6\""


def add_arguments(p) -> None:
    p.add_argument("designation", nargs="*",
                   help="nominal size and class(es): '25 H7/p6', '25 H7', '1 in h6'")
    p.add_argument("--json", action="store_true", help="print one JSON object")
    p.add_argument("--preferred", action="store_true",
                   help="list the preferred hole-basis and shaft-basis fits")
    p.add_argument("--js-round", action="store_true",
                   help="round odd IT down for js7…js11/JS7…JS11 (permitted by ISO 286-1)")


def _um(v: float) -> str:
    return f"{v:+g}" if v else "0"


def run(args) -> int:
    out = sys.stdout
    if args.preferred:
        rows = preferred_fits()
        if args.json:
            print_json({"preferred_fits": [vars(r) for r in rows], "caution": CAUTION})
            return EXIT_OK
        print_table(["basis", "fit", "name", "use"],
                    [[r.basis, r.fit, r.description, r.note] for r in rows])
        out.write(f"source: {rows[0].source}\n\n{CAUTION}\n")
        return EXIT_OK
    text = " ".join(args.designation).strip()
    if not text:
        raise InputError("designation", "", "a nominal size and class(es), e.g. '25 H7/p6', "
                         "or --preferred")
    f = fit(text, js_round=args.js_round)
    if args.json:
        d = f.to_dict()
        d["caution"] = CAUTION
        print_json(d)
        return EXIT_OK
    out.write(f"ISO 286 limits for {f.designation} (nominal {f.nominal_mm:g} mm = "
              f"{f.nominal_mm / 25.4:.4f} in)\n\n")
    rows = []
    for z in (f.hole, f.shaft):
        if z is None:
            continue
        rows.append([z.feature, z.cls, _um(z.upper_um), _um(z.lower_um), f"{z.it_um:g}",
                     f"{z.max_mm:.4f}", f"{z.min_mm:.4f}",
                     f"{z.max_mm / 25.4:.5f}", f"{z.min_mm / 25.4:.5f}"])
    print_table(["feature", "class", "upper µm", "lower µm", "IT µm", "max mm", "min mm",
                 "max in", "min in"], rows)
    if f.kind is not None:
        out.write(f"\n{f.kind} fit: clearance {f.clearance_min_um:+g} … {f.clearance_max_um:+g} µm "
                  f"(negative = interference), mean {f.mean_clearance_um:+g} µm, "
                  f"fit tolerance {f.fit_tolerance_um:g} µm\n")
    out.write("source: ISO 286-1:2010 / ISO 286-2:2010 tables (data/iso286_*.csv)\n")
    out.write(f"\n{CAUTION}\n")
    return EXIT_OK
