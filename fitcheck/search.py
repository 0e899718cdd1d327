"""Fit search: the best ISO 286 fit class for one press-fit joint.

For a joint (geometry, materials, loads, conditions) :func:`search_fits` takes
every admitted hole-basis and shaft-basis combination that ISO 286 defines at
the joint's size, evaluates all of them in **one** vectorised call of
:func:`fitcheck.core.pressfit.evaluate` with the checks of
:func:`fitcheck.pressfit.evaluate` (slip at the loosest fit, hub and shaft
yield at the tightest, loosening speed, press-in force or hub heating limit),
ranks the fits that pass and says why the nearest rejected ones fail.

Admitted set (default)
----------------------
* hole basis: holes H6, H7, H8 with every shaft letter at IT5, IT6, IT7;
* shaft basis: shafts h5, h6, h7 with every hole letter at IT6, IT7, IT8;

each only where ISO 286-2 defines the class at the size; a fit reached from
both bases (H7/h6) is listed once. ``shaft_letters`` and ``hole_letters`` narrow the
mating classes to some deviation letters (e.g. only the interference letters p … u).

Ranking
-------
Passing fits are ordered by the largest minimum slip safety (at the loosest
fit) — all of them already meet the required yield safety — then preferred
fits first (ANSI B4.2 list, :func:`fitcheck.fits.preferred_fits`), then the
larger yield safety, then the designation. Rejected fits are ordered by their
worst margin (the nearest to passing first) and carry the names and margins of
the checks they fail.
"""

from __future__ import annotations

import itertools
import math
import re
import warnings
from collections.abc import Iterable, Mapping
from dataclasses import dataclass, field, fields

import numpy as np

from . import CAUTION, fits
from .checks import Check
from .core import pressfit as _core
from .errors import InputError
from .pressfit import (
    NAME_PLASTIC_ZONE,
    REF_HEAT,
    REF_HUB,
    REF_PRESS,
    REF_SHAFT,
    REF_SLIP,
    REF_SPEED,
    plastic_zone_check,
)

__all__ = ["BearingSearchResult", "Candidate", "SearchResult", "SeatCandidate", "candidates",
           "search_bearing_seat", "search_fits"]

DEFAULT_HOLES = ("H6", "H7", "H8")
DEFAULT_SHAFT_GRADES = (5, 6, 7)
DEFAULT_SHAFTS = ("h5", "h6", "h7")
DEFAULT_HOLE_GRADES = (6, 7, 8)
RPM = 2.0 * math.pi / 60.0
_CLASS_RE = re.compile(r"^([A-Za-z]{1,2})(\d{1,2})$")

#: The check names of fitcheck.pressfit, so that verdicts read the same.
CHECK_NAMES = ("slip at loosest fit", "hub yield at tightest fit", "shaft yield at tightest fit",
               "loosening speed", "hub heating temperature", "press-in force")


def _grade(cls: str) -> int:
    m = _CLASS_RE.match(cls)
    return int(m.group(2)) if m else -99


def _letter(cls: str) -> str:
    m = _CLASS_RE.match(cls)
    return m.group(1) if m else ""


def _letters(name: str, seq, feature: str) -> tuple[str, ...] | None:
    """Admitted deviation letters of the mating ``feature`` ("shaft" or "hole"); ``None`` = every one.

    Letters are read in the case of the feature (shafts lower case, holes upper case), so
    ``("P", "s")`` given as hole letters means P and S; a letter ISO 286 does not know is refused.

    >>> _letters("shaft_letters", ["p", "R", "p"], "shaft")
    ('p', 'r')
    """
    if seq is None:
        return None
    from .core import iso286

    known = iso286.all_letters(feature)
    out = []
    for x in _admitted(name, seq, "letter"):
        t = x.strip().lower() if feature == "shaft" else x.strip().upper()
        if t not in known:
            raise InputError(name, x, f"ISO 286 {feature} letters: {', '.join(known)}")
        out.append(t)
    return tuple(dict.fromkeys(out))


#: Most items of one admitted list (letters, classes or grades) of a search.
MAX_ADMITTED = 100
_ADMITTED = {
    "class": ("tolerance classes such as ('H7', 'H8') or ('h6',)", r"^\s*[A-Za-z]{1,2}\d{1,2}\s*$"),
    "letter": ("deviation letters such as ('k', 'm', 'js')", r"^\s*[A-Za-z]{1,2}\s*$"),
    "grade": ("tolerance grades, whole numbers from 1 to 18, such as (5, 6)", None),
}


def _admitted(name: str, seq, kind: str) -> tuple:
    """An admitted list of a search as a tuple without repeats; :class:`InputError` for anything else.

    A text, a number or ``None`` is not a list (a text would be read letter by letter), and a
    list of more than :data:`MAX_ADMITTED` items is refused before any is evaluated.

    >>> _admitted("shaft_grades", [6, 5, 6], "grade")
    (6, 5)
    """
    what, pattern = _ADMITTED[kind]
    if isinstance(seq, str | bytes | Mapping) or not isinstance(seq, Iterable):
        raise InputError(name, seq, f"a list of {what}")
    items = list(itertools.islice(iter(seq), MAX_ADMITTED + 1))
    if len(items) > MAX_ADMITTED:
        raise InputError(name, f"more than {MAX_ADMITTED} items", f"at most {MAX_ADMITTED} {what}")
    for x in items:
        if kind == "grade":
            ok = isinstance(x, int | np.integer) and not isinstance(x, bool) and 1 <= x <= 18
        else:
            ok = isinstance(x, str) and re.match(pattern, x) is not None
        if not ok:
            raise InputError(name, x, what)
    return tuple(dict.fromkeys(int(x) if kind == "grade" else x for x in items))


def candidates(nominal_mm: float, holes=DEFAULT_HOLES, shaft_grades=DEFAULT_SHAFT_GRADES,
               shafts=DEFAULT_SHAFTS, hole_grades=DEFAULT_HOLE_GRADES, shaft_letters=None,
               hole_letters=None) -> list[tuple[str, str, str]]:
    """The admitted (hole, shaft, basis) combinations ISO 286 defines at ``nominal_mm``.

    Parameters
    ----------
    nominal_mm : float
        Nominal size [mm].
    holes : sequence of str
        Basis holes of the hole-basis set (``H6``, ``H7``, ``H8``).
    shaft_grades : sequence of int
        Grades of the mating shafts (every letter) in the hole-basis set.
    shafts : sequence of str
        Basis shafts of the shaft-basis set (``h5``, ``h6``, ``h7``).
    hole_grades : sequence of int
        Grades of the mating holes (every letter) in the shaft-basis set.
    shaft_letters : sequence of str or None
        Deviation letters of the mating shafts in the hole-basis set (``None``: every letter).
    hole_letters : sequence of str or None
        Deviation letters of the mating holes in the shaft-basis set (``None``: every letter).

    Returns
    -------
    list of (hole, shaft, basis)
        ``basis`` is ``"hole"``, ``"shaft"`` or ``"hole+shaft"`` for a fit in both sets.

    Examples
    --------
    >>> c = candidates(20.0)
    >>> ("H7", "s6", "hole") in c, ("S7", "h6", "shaft") in c, ("H7", "h6", "hole+shaft") in c
    (True, True, True)
    >>> sorted({s for _, s, b in candidates(20.0, holes=("H7",), shafts=(),
    ...         shaft_letters=("p", "s"), shaft_grades=(6,))})
    ['p6', 's6']
    """
    d = float(nominal_mm)
    shaft_ok = fits.valid_classes(d, "shaft")
    hole_ok = fits.valid_classes(d, "hole")
    out: dict[tuple[str, str], str] = {}
    for h in holes:
        if h not in hole_ok:
            continue
        for s in shaft_ok:
            if _grade(s) in shaft_grades and (shaft_letters is None or _letter(s) in shaft_letters):
                out[(h, s)] = "hole"
    for s in shafts:
        if s not in shaft_ok:
            continue
        for h in hole_ok:
            if _grade(h) in hole_grades and (hole_letters is None or _letter(h) in hole_letters):
                out[(h, s)] = "hole+shaft" if out.get((h, s)) == "hole" else "shaft"
    return [(h, s, b) for (h, s), b in out.items()]


@dataclass(frozen=True)
class Candidate:
    """One evaluated fit.

    Deviations [µm], interferences [µm] (measured, before smoothing), pressures [MPa],
    torque capacity [N·m], forces [N], temperatures [°C].
    """

    fit: str
    hole: str
    shaft: str
    basis: str
    preferred: bool
    hole_upper_um: float
    hole_lower_um: float
    shaft_upper_um: float
    shaft_lower_um: float
    interference_min_um: float
    interference_max_um: float
    pressure_min: float
    pressure_max: float
    torque_capacity_min: float
    slip_safety_min: float
    hub_yield_safety: float
    shaft_yield_safety: float
    press_force_max: float
    shrink_temperature: float
    checks: tuple
    rank: int = 0

    @property
    def ok(self) -> bool:
        return bool(self.checks) and all(c.passed for c in self.checks)

    @property
    def failing(self) -> tuple:
        """The failing checks as (name, margin)."""
        return tuple((c.name, c.margin) for c in self.checks if not c.passed)

    @property
    def worst_margin(self) -> float:
        return min(c.margin for c in self.checks)

    @property
    def plastic_zone_share(self) -> float | None:
        """Elastic-plastic design: the hub's plastic zone as a share of its wall at the tightest fit
        (the value its hub check judges); ``None`` in the elastic design."""
        return next((c.value for c in self.checks if c.name == NAME_PLASTIC_ZONE), None)

    def to_dict(self) -> dict:
        d = {f.name: getattr(self, f.name) for f in fields(self) if f.name != "checks"}
        d["ok"] = self.ok
        d["checks"] = [c.to_dict() for c in self.checks]
        d["failing"] = [{"name": n, "margin": m} for n, m in self.failing]
        return d


@dataclass(frozen=True)
class SearchResult:
    """Result of :func:`search_fits`: ranked passing fits and the nearest rejected ones."""

    joint: str
    nominal_mm: float
    evaluated: int
    passing: tuple          # Candidate, ranked (rank 1 = best)
    rejected: tuple         # Candidate, nearest to passing first
    admitted: dict          # the admitted set (holes, shaft_grades, shafts, hole_grades)
    notes: tuple = ()
    caution: str = field(default=CAUTION, repr=False)

    @property
    def best(self) -> Candidate | None:
        return self.passing[0] if self.passing else None

    @property
    def ok(self) -> bool:
        """True when at least one admitted fit passes every check."""
        return bool(self.passing)

    def to_json(self, top: int | None = None) -> dict:
        k = len(self.passing) if top is None else top
        return {"joint": self.joint, "nominal_mm": self.nominal_mm, "evaluated": self.evaluated,
                "passing_count": len(self.passing), "rejected_count": len(self.rejected),
                "passing": [c.to_dict() for c in self.passing[:k]],
                "nearest_rejected": [c.to_dict() for c in self.rejected[:k]],
                "admitted": {k2: list(v) for k2, v in self.admitted.items()},
                "ok": self.ok, "notes": list(self.notes), "caution": self.caution}


def _arrays(args: dict, hole_up, hole_lo, sh_up, sh_lo) -> dict:
    kw = dict(args)
    kw["interference_min"] = (sh_lo - hole_up) * 1e-3
    kw["interference_max"] = (sh_up - hole_lo) * 1e-3
    with np.errstate(all="ignore"):
        return _core.evaluate(**kw)


def _checks_for(i: int, r: dict, a: dict, shrink: bool, press_limit_given: bool) -> tuple[Check, ...]:
    """The named checks of candidate ``i``, as :func:`fitcheck.pressfit.evaluate` builds them."""
    hub_req = a["fracture_safety"] if a["brittle_hub"] else a["yield_safety"]
    shaft_req = a["fracture_safety"] if a["brittle_shaft"] else a["yield_safety"]
    p_min = float(r["p_min"][i])
    out = [
        Check(CHECK_NAMES[0], float(r["slip_safety_min"][i]) if p_min > 0 else 0.0, a["slip_safety"],
              ">=", "", REF_SLIP, "" if p_min > 0 else "no contact pressure (clearance)"),
        Check(CHECK_NAMES[1], float(r["hub_yield_safety"][i]), hub_req, ">=", "", REF_HUB)
        if a.get("design", "elastic") == "elastic" else  # elastic-plastic design: the hub's plastic zone
        plastic_zone_check(float(r["plastic_zone_diameter_max"][i]), a["d"], a["Do"], a["plastic_limit"]),
        Check(CHECK_NAMES[2], float(r["shaft_yield_safety"][i]), shaft_req, ">=", "", REF_SHAFT),
        Check(CHECK_NAMES[3], float(r["loosening_speed"][i]) / RPM, a["omega"] / RPM, ">=", "rpm",
              REF_SPEED),
    ]
    if shrink and math.isfinite(a["max_heating"]):
        out.append(Check(CHECK_NAMES[4], float(r["shrink_temperature"][i]), a["max_heating"], "<=",
                         "degC", REF_HEAT))
    if press_limit_given and not shrink:
        out.append(Check(CHECK_NAMES[5], float(r["press_force_max"][i]), a["press_force_limit"], "<=",
                         "N", REF_PRESS))
    return tuple(out)


def search_fits(joint, *, holes=DEFAULT_HOLES, shaft_grades=DEFAULT_SHAFT_GRADES,
                shafts=DEFAULT_SHAFTS, hole_grades=DEFAULT_HOLE_GRADES,
                systems=("iso",), shaft_letters=None, hole_letters=None) -> SearchResult:
    """Evaluate every admitted fit for a press-fit joint and rank those that pass.

    Parameters
    ----------
    joint : fitcheck.pressfit.PressFitInput
        The joint; its own fit (or interference) is replaced by each candidate, its diameter is
        the nominal size.
    holes, shaft_grades, shafts, hole_grades
        The admitted set (see :func:`candidates`).
    shaft_letters, hole_letters : sequence of str or None
        Deviation letters of the mating shafts (hole basis) and holes (shaft basis); ``None``
        (default) admits every letter ISO 286 defines at the size. Read in the feature's case.
    systems : tuple of {"iso", "ansi"}
        Search the ISO 286 fits of the admitted set, the ASME B4.1 classes of fit tabulated at
        the size (RC, LC, LT, LN, FN; basis ``"ANSI B4.1"``, fit written ``"1 in FN2"``), or both.

    Returns
    -------
    SearchResult

    Notes
    -----
    The checks are those of :func:`fitcheck.pressfit.evaluate` with the same required safeties;
    each is decided on arrays over all candidates at once, and the named :class:`Check` objects
    are then built per candidate from those arrays.

    Examples
    --------
    >>> from fitcheck.pressfit import PressFitInput
    >>> inp = PressFitInput.from_mapping({"fit": "20 H7/s6", "length": "16 mm",
    ...     "hub_outer_diameter": "40 mm", "shaft_material": "C45E", "hub_material": "C45E",
    ...     "torque": "20 N*m"})
    >>> r = search_fits(inp)
    >>> r.evaluated > 100, r.best.ok, r.best.slip_safety_min >= 1.5
    (True, True, True)
    """
    from .study import core_arguments

    a = core_arguments(joint)
    d = a.pop("_nominal")
    a.pop("_fit")
    a.pop("interference_min")
    a.pop("interference_max")
    holes, shafts = _admitted("holes", holes, "class"), _admitted("shafts", shafts, "class")
    shaft_grades = _admitted("shaft_grades", shaft_grades, "grade")
    hole_grades = _admitted("hole_grades", hole_grades, "grade")
    shaft_letters = _letters("shaft_letters", shaft_letters, "shaft")
    hole_letters = _letters("hole_letters", hole_letters, "hole")
    for name, seq in (("holes", holes), ("shafts", shafts)):
        for c in seq:
            if not isinstance(c, str) or not _CLASS_RE.match(c.strip()):
                raise InputError(name, c, "tolerance classes such as 'H7' (holes) or 'h6' (shafts)")
    for name, seq in (("shaft_grades", shaft_grades), ("hole_grades", hole_grades)):
        for g in seq:
            if isinstance(g, bool) or not isinstance(g, int) or not 1 <= g <= 18:
                raise InputError(name, g, "tolerance grades, whole numbers from 1 to 18")
    systems = (systems,) if isinstance(systems, str) else tuple(systems)
    if not systems or any(x not in ("iso", "ansi") for x in systems):
        raise InputError("systems", list(systems), "'iso', 'ansi' or both")
    cands = candidates(d, holes, shaft_grades, shafts, hole_grades, shaft_letters,
                       hole_letters) if "iso" in systems else []
    ansi = fits.ansi_classes(d) if "ansi" in systems and d / 25.4 <= 19.69 else []
    if not cands and not ansi:
        raise InputError("admitted set", f"{list(holes)} / {list(shafts)}",
                         f"at least one hole/shaft combination ISO 286 defines at {d:g} mm"
                         + (" or an ASME B4.1 class tabulated there" if "ansi" in systems else ""))
    hs = np.array([c[0] for c in cands], dtype=object)
    ss = np.array([c[1] for c in cands], dtype=object)
    h_up, h_lo, h_ok = fits.deviations(np.full(hs.shape, d), hs.astype(str), "hole")
    s_up, s_lo, s_ok = fits.deviations(np.full(ss.shape, d), ss.astype(str), "shaft")
    if ansi:  # ASME B4.1 classes: tabulated hole and shaft limits of the class at the size
        from .core import ansi_b41
        a_hu, a_hl, a_su, a_sl, a_ok = fits.ansi_deviations(np.full(len(ansi), d), np.array(ansi, dtype=object))
        tab = ansi_b41.table()
        cands = cands + [(tab[n].hole, tab[n].shaft or f"{n} shaft", f"ANSI B4.1 {n}") for n in ansi]
        h_up, h_lo, h_ok = (np.concatenate([x, y]) for x, y in ((h_up, a_hu), (h_lo, a_hl), (h_ok, a_ok)))
        s_up, s_lo, s_ok = (np.concatenate([x, y]) for x, y in ((s_up, a_su), (s_lo, a_sl), (s_ok, a_ok)))
    keep = h_ok & s_ok
    r = _arrays(a, h_up[keep], h_lo[keep], s_up[keep], s_lo[keep])
    n = int(np.count_nonzero(keep))
    r = {k: np.broadcast_to(v, (n,)) for k, v in r.items()}
    cands = [c for c, k in zip(cands, keep, strict=True) if k]
    h_up, h_lo, s_up, s_lo = h_up[keep], h_lo[keep], s_up[keep], s_lo[keep]

    shrink = bool(a["shrink"])
    press_given = math.isfinite(a["press_force_limit"])
    # the shaft at the hub edge (DIN 743) does not depend on the fit: the same checks for every candidate
    from .pressfit.evaluate import shaft_at_hub_edge
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        shaft_checks = tuple(shaft_at_hub_edge(joint, d).checks)
    preferred = {p.fit for p in fits.preferred_fits()}

    # verdicts on arrays (the same comparisons as the Check objects)
    hub_req = a["fracture_safety"] if a["brittle_hub"] else a["yield_safety"]
    shaft_req = a["fracture_safety"] if a["brittle_shaft"] else a["yield_safety"]
    slip_v = np.where(r["p_min"] > 0, r["slip_safety_min"], 0.0)
    hub_ok = r["ok_hub"] if a.get("design") == "elastic-plastic" else r["hub_yield_safety"] >= hub_req
    ok = (slip_v >= a["slip_safety"]) & hub_ok & \
        (r["shaft_yield_safety"] >= shaft_req) & (r["loosening_speed"] / RPM >= a["omega"] / RPM)
    if shrink and math.isfinite(a["max_heating"]):
        ok &= r["shrink_temperature"] <= a["max_heating"]
    if press_given and not shrink:
        ok &= r["press_force_max"] <= a["press_force_limit"]
    ok &= all(c.passed for c in shaft_checks)

    def label(c) -> str:  # "H7/s6", or the B4.1 class "FN2"
        return c[2][len("ANSI B4.1 "):] if c[2].startswith("ANSI B4.1 ") else f"{c[0]}/{c[1]}"

    def make(i: int) -> Candidate:
        h, s, b = cands[i]
        name = label(cands[i])
        fit = f"{round(d / 25.4, 9):g} in {name}" if b.startswith("ANSI") else f"{d:g} {h}/{s}"
        return Candidate(
            fit=fit, hole=h, shaft=s, basis=b, preferred=name in preferred,
            hole_upper_um=float(h_up[i]), hole_lower_um=float(h_lo[i]),
            shaft_upper_um=float(s_up[i]), shaft_lower_um=float(s_lo[i]),
            interference_min_um=float(s_lo[i] - h_up[i]), interference_max_um=float(s_up[i] - h_lo[i]),
            pressure_min=float(r["p_min"][i]), pressure_max=float(r["p_max"][i]),
            torque_capacity_min=float(r["torque_capacity_min"][i]) * 1e-3,
            slip_safety_min=float(slip_v[i]), hub_yield_safety=float(r["hub_yield_safety"][i]),
            shaft_yield_safety=float(r["shaft_yield_safety"][i]),
            press_force_max=float(r["press_force_max"][i]),
            shrink_temperature=float(r["shrink_temperature"][i]),
            checks=_checks_for(i, r, a, shrink, press_given) + shaft_checks)

    pas = np.flatnonzero(ok)
    rej = np.flatnonzero(~ok)
    yield_min = np.minimum(r["hub_yield_safety"] / hub_req, r["shaft_yield_safety"] / shaft_req)
    names = [label(c) for c in cands]
    order = sorted(pas, key=lambda i: (-slip_v[i], names[i] not in preferred, -yield_min[i], names[i]))
    passing = tuple(_ranked(make(i), k + 1) for k, i in enumerate(order))
    rejected_all = [make(i) for i in rej]
    rejected_all.sort(key=lambda c: (-c.worst_margin, not c.preferred, c.fit))
    notes = []
    if a["torque"] == 0 and a["axial_force"] == 0:
        notes.append("no torque or axial force given: slip safety is infinite for every fit with "
                     "contact pressure, so the ranking falls to preferred fits and yield safety")
    if not passing:
        notes.append("no admitted fit passes every check: see the nearest rejected fits")
    return SearchResult(joint=joint.name, nominal_mm=d, evaluated=n, passing=passing,
                        rejected=tuple(rejected_all),
                        admitted={"holes": tuple(holes), "shaft_grades": tuple(shaft_grades),
                                  "shafts": tuple(shafts), "hole_grades": tuple(hole_grades),
                                  "shaft_letters": _all_if_none(shaft_letters, "shaft"),
                                  "hole_letters": _all_if_none(hole_letters, "hole"),
                                  "systems": systems},
                        notes=tuple(notes))


def _all_if_none(letters, feature: str) -> tuple[str, ...]:
    from .core import iso286

    return iso286.all_letters(feature) if letters is None else tuple(letters)


def _ranked(c: Candidate, rank: int) -> Candidate:
    from dataclasses import replace

    return replace(c, rank=rank)


# --------------------------------------------------------------------------- bearing seats

#: Default seat classes tried for a rolling bearing: shafts g … r at IT5/IT6 and housings
#: G … P at IT6/IT7, the range of the usual seat recommendations (DIN 5425-1) — common practice.
BEARING_SHAFT_LETTERS = ("g", "h", "j", "js", "k", "m", "n", "p", "r")
BEARING_SHAFT_GRADES = (5, 6)
BEARING_HOUSING_LETTERS = ("G", "H", "J", "JS", "K", "M", "N", "P")
BEARING_HOUSING_GRADES = (6, 7)


@dataclass(frozen=True)
class SeatCandidate:
    """One bearing-seat class tried with the other seat as given; ``checks`` from the bearing engine."""

    seat: str               # "shaft" or "housing"
    cls: str
    shaft: str
    housing: str
    recommended: bool
    operating_clearance_um: tuple
    checks: tuple
    grip_um: float          # effective interference of the rotating-load ring, loosest pairing
    rank: int = 0

    @property
    def ok(self) -> bool:
        return bool(self.checks) and all(c.passed for c in self.checks)

    @property
    def grips(self) -> bool:
        """The ring under circumferential load keeps an interference at the loosest pairing."""
        return self.grip_um > 0

    @property
    def failing(self) -> tuple:
        return tuple((c.name, c.margin) for c in self.checks if not c.passed)

    @property
    def worst_margin(self) -> float:
        return min(c.margin for c in self.checks) if self.checks else -math.inf

    def to_dict(self) -> dict:
        return {"seat": self.seat, "class": self.cls, "shaft": self.shaft, "housing": self.housing,
                "recommended": self.recommended, "rank": self.rank, "ok": self.ok,
                "grip_um": self.grip_um, "grips": self.grips,
                "operating_clearance_um": list(self.operating_clearance_um),
                "worst_margin": self.worst_margin,
                "checks": [c.to_dict() for c in self.checks],
                "failing": [{"name": n, "margin": m} for n, m in self.failing]}


@dataclass(frozen=True)
class BearingSearchResult:
    """Shaft classes tried with the housing as given, and housing classes with the shaft as given."""

    joint: str
    designation: str
    shaft_given: str
    housing_given: str
    shafts: tuple           # SeatCandidate, passing ranked first, then rejected (nearest first)
    housings: tuple
    notes: tuple = ()
    caution: str = field(default=CAUTION, repr=False)

    @property
    def ok(self) -> bool:
        return any(c.ok for c in self.shafts) and any(c.ok for c in self.housings)

    def to_json(self, top: int | None = None) -> dict:
        def part(items):
            p = [c for c in items if c.ok]
            r = [c for c in items if not c.ok]
            k = len(items) if top is None else top
            return {"passing": [c.to_dict() for c in p[:k]],
                    "nearest_rejected": [c.to_dict() for c in r[:k]]}

        return {"joint": self.joint, "designation": self.designation,
                "shaft_given": self.shaft_given, "housing_given": self.housing_given,
                "shaft_seat": part(self.shafts), "housing_seat": part(self.housings),
                "ok": self.ok, "notes": list(self.notes), "caution": self.caution}


def _finite_worst(c) -> float:
    """The worst finite margin of the failing checks (a check against a zero limit has an
    infinite margin and does not order candidates)."""
    finite = [m for _, m in c.failing if math.isfinite(m)]
    return min(finite) if finite else 0.0


def _grip_um(load: str, r) -> float:
    """Effective interference (after smoothing) of the ring under circumferential load at the
    loosest pairing [µm]; <= 0 means that ring may creep (DIN 5425-1; DIN 7190-1:2017 smoothing)."""
    pair = r.shaft_interference_effective_um if load == "rotating_inner" \
        else r.housing_interference_effective_um
    return float(pair[0])


def search_bearing_seat(joint, *, shaft_letters=BEARING_SHAFT_LETTERS,
                        shaft_grades=BEARING_SHAFT_GRADES, housing_letters=BEARING_HOUSING_LETTERS,
                        housing_grades=BEARING_HOUSING_GRADES) -> BearingSearchResult:
    """Try the shaft and housing classes of a rolling-bearing seat with all the engine's checks.

    Each shaft class is evaluated with the housing class as given and each housing class with the
    shaft class as given, by :func:`fitcheck.bearings.evaluate` (operating radial clearance at
    the tightest pairing, hoop stresses, grip of the rotating-load ring, axial friction capacity),
    plus the check that the ring under circumferential load is an interference fit at the loosest
    pairing (:func:`_creep_check`).
    The verdict of each class is the bearing engine's. The bearing engine evaluates one seat per
    call, so this is a loop over a few dozen classes, not one vectorised call. Passing classes are
    ranked: those whose ring under circumferential load keeps an interference at the loosest
    pairing first (a loose one may creep, DIN 5425-1), ordered by the worst check margin (the most
    robust first); then the others, the nearest to gripping first; on ties the recommended class
    (DIN 5425-1 table of the bearing engine) first. Rejected classes follow: the fewest failing
    checks first, then the smallest finite shortfall.

    Parameters
    ----------
    joint : fitcheck.bearings.BearingSeatInput
    shaft_letters, shaft_grades, housing_letters, housing_grades
        The classes tried (only those ISO 286 defines at the bearing's bore / outside diameter).

    Returns
    -------
    BearingSearchResult
    """
    import dataclasses
    import warnings

    from . import bearings

    if not isinstance(joint, bearings.BearingSeatInput):
        raise InputError("joint", type(joint).__name__, "a BearingSeatInput (fitcheck.bearings)")
    shaft_letters = _admitted("shaft_letters", shaft_letters, "letter")
    housing_letters = _admitted("housing_letters", housing_letters, "letter")
    shaft_grades = _admitted("shaft_grades", shaft_grades, "grade")
    housing_grades = _admitted("housing_grades", housing_grades, "grade")
    b = bearings.bearing(joint.designation)
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        base = bearings.evaluate(joint)
    shaft0, housing0 = base.shaft_class, base.housing_class
    rec_s, rec_h = base.recommended_shaft, base.recommended_housing

    def tried(size, letters, grades, feature):
        ok = set(fits.valid_classes(size, feature))
        return [f"{L}{g}" for L in letters for g in grades if f"{L}{g}" in ok]

    def run(seat, classes):
        out = []
        for c in classes:
            s, h = (c, housing0) if seat == "shaft" else (shaft0, c)
            with warnings.catch_warnings():
                warnings.simplefilter("ignore")
                r = bearings.evaluate(dataclasses.replace(joint, shaft=s, housing=h))
            out.append(SeatCandidate(seat, c, s, h, c == (rec_s if seat == "shaft" else rec_h),
                                     tuple(r.operating_clearance_um), tuple(r.checks),
                                     _grip_um(joint.load, r)))
        good = sorted((c for c in out if c.ok),
                      key=lambda c: (not c.grips, -c.worst_margin if c.grips else -c.grip_um,
                                     not c.recommended, c.cls))
        bad = sorted((c for c in out if not c.ok), key=lambda c: (len(c.failing), -_finite_worst(c),
                                                                   c.cls))
        return tuple(dataclasses.replace(c, rank=k + 1) for k, c in enumerate(good)) + tuple(bad)

    shafts = run("shaft", tried(b.d, shaft_letters, shaft_grades, "shaft"))
    housings = run("housing", tried(b.D, housing_letters, housing_grades, "hole"))
    notes = ["each seat is varied with the other seat as given; the operating clearance depends on "
             "both, so re-run with the chosen class to confirm"]
    if not any(c.ok and c.grips for c in shafts + housings if
               c.seat == ("shaft" if joint.load == "rotating_inner" else "housing")):
        notes.append("no passing class keeps the ring under circumferential load an interference fit "
                     "at the loosest pairing after smoothing: it may creep; finer seat roughness, "
                     "a tighter tolerance class of the bearing, or selective pairing help")
    return BearingSearchResult(joint=joint.name or joint.designation, designation=joint.designation,
                               shaft_given=shaft0, housing_given=housing0, shafts=shafts,
                               housings=housings, notes=tuple(notes))
