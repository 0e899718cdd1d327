"""``fitcheck search CASE.toml --joint NAME [--top K] [--json]``: the best ISO fit for a joint.

For a ``[[pressfit]]`` joint, evaluates every admitted hole-basis and shaft-basis
fit at the joint's size (see :func:`fitcheck.search.search_fits`), prints the
ranked passing fits and the nearest rejected ones with the checks they fail.
For a ``[[bearing]]`` seat, tries the shaft classes with the housing as given and
the housing classes with the shaft as given (:func:`fitcheck.search.search_bearing_seat`).
Exit code 0 when at least one candidate passes (for a bearing: on both seats),
1 when none does, 2 for bad input.
"""

from __future__ import annotations

import math
import sys

from .. import CAUTION
from ..errors import InputError
from . import EXIT_FAILED_CHECK, EXIT_OK, print_json, print_table
from .study import select_joint

COMMAND = "search"
HELP = ("search the ISO 286 fits of a press fit (or the seat classes of a bearing): rank those "
        "that pass, say why others fail")


def add_arguments(p) -> None:
    p.add_argument("case", metavar="CASE", help="design-case file (TOML) with [[pressfit]] tables")
    p.add_argument("--joint", metavar="NAME", help="name of the [[pressfit]] joint (needed when the "
                   "file has more than one)")
    p.add_argument("--top", default="10", metavar="K", help="how many ranked and rejected fits to "
                   "show (default 10)")
    p.add_argument("--holes", default="H6,H7,H8", metavar="LIST",
                   help="basis holes of the hole-basis set (default H6,H7,H8)")
    p.add_argument("--shaft-grades", default="5,6,7", metavar="LIST",
                   help="grades of the shafts mated with them (default 5,6,7)")
    p.add_argument("--shafts", default="h5,h6,h7", metavar="LIST",
                   help="basis shafts of the shaft-basis set (default h5,h6,h7)")
    p.add_argument("--hole-grades", default="6,7,8", metavar="LIST",
                   help="grades of the holes mated with them (default 6,7,8)")
    p.add_argument("--shaft-letters", default="", metavar="LIST",
                   help="deviation letters of the shafts mated with the basis holes, e.g. "
                        "'p,r,s' (default: every letter)")
    p.add_argument("--hole-letters", default="", metavar="LIST",
                   help="deviation letters of the holes mated with the basis shafts, e.g. "
                        "'P,R,S' (default: every letter)")
    p.add_argument("--fits", type=str.lower, choices=("iso", "ansi", "both"), default="iso",
                   help="which fits to search: the ISO 286 admitted set (default), the ASME B4.1 "
                        "classes (RC, LC, LT, LN, FN) tabulated at the size, or both")
    p.add_argument("--plot", metavar="FILE.png", help="also save the ranking chart as an image")
    p.add_argument("--json", action="store_true", help="print the result as JSON")


def _classes(text: str, option: str) -> tuple[str, ...]:
    items = tuple(t.strip() for t in str(text).split(",") if t.strip())
    return items


def _letter_list(text: str) -> tuple[str, ...] | None:
    """Letters separated by commas; empty text = every letter (``None``)."""
    items = _classes(text, "")
    return items or None


def _grades(text: str, option: str) -> tuple[int, ...]:
    out = []
    for t in str(text).split(","):
        t = t.strip().upper().removeprefix("IT")
        if not t:
            continue
        if not (t.isascii() and t.isdigit()) or len(t) > 2:
            raise InputError(option, text, "grades separated by commas, e.g. '5,6,7'")
        out.append(int(t))
    return tuple(out)


def _top(text) -> int:
    try:
        k = int(str(text))
    except ValueError:
        raise InputError("--top", text, "a whole number from 1 to 500") from None
    if not 1 <= k <= 500:
        raise InputError("--top", text, "a whole number from 1 to 500")
    return k


def print_search(r, k: int, current: str | None = None, out=None) -> None:
    """The text report of a :class:`~fitcheck.search.SearchResult`."""
    out = out or sys.stdout
    head = f"Fit search '{r.joint}' — {r.nominal_mm:g} mm"
    out.write(f"{head}\n{'=' * len(head)}\n")
    a = r.admitted
    systems = a.get("systems", ("iso",))
    iso = (f"holes {', '.join(a['holes'])} with shafts{_of(a, 'shaft')} "
           f"IT{'/'.join(map(str, a['shaft_grades']))}; "
           f"shafts {', '.join(a['shafts'])} with holes{_of(a, 'hole')} "
           f"IT{'/'.join(map(str, a['hole_grades']))}")
    admitted = "; ".join(([iso] if "iso" in systems else [])
                         + (["ASME B4.1 classes RC, LC, LT, LN, FN tabulated at the size"]
                            if "ansi" in systems else []))
    out.write(f"admitted: {admitted}; "
              f"{r.evaluated} fits defined at this size, {len(r.passing)} pass every check\n\n")
    if r.passing:
        out.write("Ranked fits (largest minimum slip safety first; * preferred)\n")
        rows = []
        # elastic-plastic design: the hub is judged by its plastic zone, not by an elastic yield safety
        plastic = r.passing[0].plastic_zone_share is not None
        for c in r.passing[:k]:
            hub = f"{c.plastic_zone_share:.0%}" if plastic else f"{c.hub_yield_safety:.3g}"
            rows.append([c.rank, _name(c) + ("*" if c.preferred else ""), c.basis,
                         f"{c.interference_min_um:+g} … {c.interference_max_um:+g}",
                         f"{c.slip_safety_min:.3g}", hub,
                         f"{c.shaft_yield_safety:.3g}", f"{c.press_force_max / 1000:.3g}",
                         f"{c.pressure_min:.3g} … {c.pressure_max:.3g}"])
        print_table(["rank", "fit", "basis", "interference [um]", "slip safety",
                     "hub plastic zone (share of wall)" if plastic else "hub safety",
                     "shaft safety", "press force [kN]", "pressure [MPa]"], rows, out)
    if r.rejected:
        out.write("\nNearest rejected fits (failing checks and their margins)\n")
        rows = []
        for c in r.rejected[:k]:
            why = "; ".join(f"{n} {m * 100:+.1f} %" for n, m in c.failing)
            rows.append([_name(c) + ("*" if c.preferred else ""),
                         f"{c.interference_min_um:+g} … {c.interference_max_um:+g}", why])
        print_table(["fit", "interference [um]", "fails"], rows, out)
    if current:
        cur = current.split()[-1] if " " in current else current
        found = [c for c in r.passing if f"{c.hole}/{c.shaft}" == cur]
        if found:
            out.write(f"\nthe joint's own fit {cur} ranks #{found[0].rank} of {len(r.passing)}\n")
        else:
            rej = [c for c in r.rejected if f"{c.hole}/{c.shaft}" == cur]
            if rej:
                why = "; ".join(f"{n} {m * 100:+.1f} %" for n, m in rej[0].failing)
                out.write(f"\nthe joint's own fit {cur} fails: {why}\n")
    for n in r.notes:
        out.write(f"note: {n}\n")
    out.write(f"\nCaution: {CAUTION}\n")


def _of(admitted: dict, feature: str) -> str:
    """' p, r, s' when the search admitted only some letters of ``feature``, else ''."""
    from ..core import iso286

    letters = tuple(admitted.get(f"{feature}_letters", ()))
    return "" if not letters or letters == iso286.all_letters(feature) else f" {', '.join(letters)}"


def run(args) -> int:
    from ..search import search_fits

    inp, _dc, table = select_joint(args.case, args.joint, COMMAND, ("pressfit", "bearing"))
    k = _top(args.top)
    if table == "bearing":
        return _run_bearing(inp, k, args)
    r = search_fits(inp, holes=_classes(args.holes, "--holes"),
                    shaft_grades=_grades(args.shaft_grades, "--shaft-grades"),
                    shafts=_classes(args.shafts, "--shafts"),
                    hole_grades=_grades(args.hole_grades, "--hole-grades"),
                    shaft_letters=_letter_list(getattr(args, "shaft_letters", "")),
                    hole_letters=_letter_list(getattr(args, "hole_letters", "")),
                    systems={"iso": ("iso",), "ansi": ("ansi",), "both": ("iso", "ansi")}[
                        getattr(args, "fits", "iso")])
    if args.plot:
        import matplotlib.pyplot as plt

        from ..plots.study import plot_search_ranking

        fig = plot_search_ranking(r, top=k, rejected=min(k, 5))
        try:
            fig.savefig(args.plot, dpi=120)
        except (OSError, ValueError) as exc:
            raise InputError("--plot", args.plot, "a writable image path ending in .png, .pdf or .svg",
                             str(exc)) from None
        finally:
            plt.close(fig)
    if args.json:
        print_json({**r.to_json(top=k), "joint_fit": inp.fit})
    else:
        print_search(r, k, inp.fit)
    return EXIT_OK if r.ok else EXIT_FAILED_CHECK


def print_bearing_search(r, k: int, out=None) -> None:
    """The text report of a :class:`~fitcheck.search.BearingSearchResult`."""
    out = out or sys.stdout
    head = f"Seat search '{r.joint}' — bearing {r.designation} (given: shaft {r.shaft_given}, " \
           f"housing {r.housing_given})"
    out.write(f"{head}\n{'=' * len(head)}\n")
    for label, items in (("Shaft classes (housing as given)", r.shafts),
                         ("Housing classes (shaft as given)", r.housings)):
        out.write(f"\n{label}\n")
        rows = []
        good = [c for c in items if c.ok][:k]
        bad = [c for c in items if not c.ok][:k]
        for c in good + bad:
            why = "; ".join(f"{n} {m * 100:+.1f} %" for n, m in c.failing)
            rows.append([c.rank if c.ok else "—", c.cls + ("*" if c.recommended else ""),
                         f"{c.operating_clearance_um[0]:.3g} … {c.operating_clearance_um[1]:.3g}",
                         f"{c.grip_um:+.3g}" + ("" if c.grips else " (may creep)"),
                         f"{c.worst_margin * 100:+.1f} %" if math.isfinite(c.worst_margin) else "—",
                         why or "pass"])
        print_table(["rank", "class", "operating clearance [um]", "rotating ring grip [um]",
                     "worst margin", "verdict"], rows, out)
    out.write("(* recommended seat class of the bearing tables)\n")
    for n in r.notes:
        out.write(f"note: {n}\n")
    out.write(f"\nCaution: {CAUTION}\n")


def _run_bearing(inp, k: int, args) -> int:
    from ..search import search_bearing_seat

    if args.plot:
        raise InputError("--plot", args.plot, "a press-fit joint (the ranking chart is drawn for "
                         "press fits only)")
    r = search_bearing_seat(inp)
    if args.json:
        print_json(r.to_json(top=k))
    else:
        print_bearing_search(r, k)
    return EXIT_OK if r.ok else EXIT_FAILED_CHECK


def _name(c) -> str:
    """How a candidate is named in the tables: 'H7/s6', or 'FN2 (H7/s6)' for an ASME B4.1 class."""
    if c.basis.startswith("ANSI"):
        return f"{c.basis.split()[-1]} ({c.hole}/{c.shaft})"
    return f"{c.hole}/{c.shaft}"
