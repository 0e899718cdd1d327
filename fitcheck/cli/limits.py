"""``fitcheck limits "25 H7/p6"`` — ISO 286 limit deviations, limit sizes and fit kind."""

from __future__ import annotations

import sys

from .. import CAUTION
from ..display import inch_size, thou
from ..errors import InputError
from ..fits import fit, preferred_fits
from . import EXIT_OK, print_json, print_table
from ._units import system as units_system

COMMAND = "limits"
HELP = ("ISO 286 or ASME B4.1 limits and limit sizes of a class or fit, "
        "e.g. \"25 H7/p6\", \"1 in FN2\"")


def add_arguments(p) -> None:
    p.add_argument("designation", nargs="*",
                   help="nominal size and class(es): '25 H7/p6', '25 H7', '1 in h6', "
                        "or an ASME B4.1 class: '1 in FN2', 'Ø0.5 in RC4'")
    p.add_argument("--json", action="store_true", help="print one JSON object")
    p.add_argument("--preferred", action="store_true",
                   help="list the preferred hole-basis and shaft-basis fits")
    p.add_argument("--ansi", action="store_true",
                   help="list the ASME B4.1 classes of fit (RC, LC, LT, LN, FN)")
    p.add_argument("--js-round", action="store_true",
                   help="round odd IT down for js7…js11/JS7…JS11 (permitted by ISO 286-1)")


def _um(v: float) -> str:
    return f"{v:+g}" if v else "0"


def run(args) -> int:
    out = sys.stdout
    if getattr(args, "ansi", False):
        return _print_ansi_classes(args, out)
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
    system = units_system(args)
    _print_fit(f, system, out)
    out.write(f"\n{CAUTION}\n")
    return EXIT_OK


def _print_fit(f, system: str, out) -> None:
    """The limits table of a fit in the chosen unit system (inch: in and thousandths)."""
    inch = system == "inch"
    what = "ASME B4.1" if f.ansi_class else "ISO 286"
    nominal = f"{f.nominal_mm / 25.4:.4f} in" if inch else f"{f.nominal_mm:g} mm = {f.nominal_mm / 25.4:.4f} in"
    out.write(f"{what} limits for {f.designation} (nominal {nominal})\n\n")
    rows = []
    for z in (f.hole, f.shaft):
        if z is None:
            continue
        if inch:
            rows.append([z.feature, z.cls, thou(z.upper_um, True)[:-5], thou(z.lower_um, True)[:-5],
                         thou(z.it_um)[:-5], inch_size(z.max_mm)[:-3], inch_size(z.min_mm)[:-3]])
        else:
            rows.append([z.feature, z.cls, _um(z.upper_um), _um(z.lower_um), f"{z.it_um:g}",
                         f"{z.max_mm:.4f}", f"{z.min_mm:.4f}",
                         f"{z.max_mm / 25.4:.5f}", f"{z.min_mm / 25.4:.5f}"])
    if inch:
        print_table(["feature", "class", "upper thou", "lower thou", "tol. thou", "max in", "min in"],
                    rows, out)
    else:
        print_table(["feature", "class", "upper µm", "lower µm", "IT µm", "max mm", "min mm",
                     "max in", "min in"], rows, out)
    if f.kind is not None:
        if inch:
            out.write(f"\n{f.kind} fit: clearance {thou(f.clearance_min_um, True)[:-5]} … "
                      f"{thou(f.clearance_max_um, True)} (negative = interference), "
                      f"mean {thou(f.mean_clearance_um, True)}, fit tolerance {thou(f.fit_tolerance_um)}\n")
        else:
            out.write(f"\n{f.kind} fit: clearance {f.clearance_min_um:+g} … {f.clearance_max_um:+g} µm "
                      f"(negative = interference), mean {f.mean_clearance_um:+g} µm, "
                      f"fit tolerance {f.fit_tolerance_um:g} µm\n")
    out.write(f"source: {f.source}\n")


def _print_ansi_classes(args, out) -> int:
    from ..core import ansi_b41

    rows = []
    for name in ansi_b41.all_classes():
        t = ansi_b41.table()[name]
        fam = ansi_b41.FAMILIES[name[:2]][1]
        memory = sum(s == "memory" for s in t.status)
        rows.append([name, fam, t.hole, t.shaft or "—", f"{t.over_in[0]:g}–{t.upto_in[-1]:g}",
                     f"{memory}/{len(t.status)}" if memory else "0"])
    if args.json:
        print_json({"ansi_classes": [dict(zip(["class", "family", "hole", "shaft", "sizes_in",
                                                "rows_from_memory"], r, strict=True)) for r in rows],
                    "caution": CAUTION})
        return EXIT_OK
    print_table(["class", "family", "hole", "shaft", "sizes in", "rows from memory"], rows, out)
    out.write("source: ASME B4.1-1967 (R2009) as reproduced in Machinery's Handbook (data/SOURCES.md)\n"
              f"\n{CAUTION}\n")
    return EXIT_OK
