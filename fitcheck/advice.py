"""Why a check fails and what to try next, in the designer's words.

One place for the cause and the next step of every failing check, so the browser,
the CLI and the report say the same. The texts follow the checks of
:mod:`fitcheck.pressfit`, :mod:`fitcheck.bearings` and :mod:`fitcheck.screws` (matched
by the words of the check's name, so a name that gains a suffix still matches);
a check not listed here gets a plain statement of value against limit.

``action`` names the tool that helps: ``"fit_search"`` (search ISO 286 fits for a press
fit), ``"seat_search"`` (search the seat classes of a bearing) or ``None``.

No arithmetic: the numbers come from the :class:`fitcheck.checks.Check`.

>>> from fitcheck.checks import Check
>>> a = explain("pressfit", Check("slip at loosest fit", 0.0, 1.5, ">="))
>>> a.cause, a.next_step, a.action
('no contact pressure at the loosest fit: the joint slips', 'search fits', 'fit_search')
"""

from __future__ import annotations

from dataclasses import dataclass

__all__ = ["Advice", "explain", "failing"]

FIT_SEARCH, SEAT_SEARCH = "fit_search", "seat_search"


@dataclass(frozen=True)
class Advice:
    check: str          # the check's name
    cause: str          # what goes wrong, in words
    next_step: str      # what to try
    action: str | None  # "fit_search", "seat_search" or None


# (table, words all in the check name, cause, next step, action); first match wins
_RULES: tuple[tuple[str, tuple[str, ...], str, str, str | None], ...] = (
    *((t, ("shaft fatigue",), "bending and torque at the edge of the seat exceed the shaft's fatigue "
       "strength with the notch of the press fit (DIN 743)", "a larger shaft diameter, a stronger or "
       "surface-hardened shaft, a relief groove at the seat edge, or lower loads", None)
      for t in ("pressfit", "bearing")),
    *((t, ("yield", "edge"), "the peak loads at the edge of the seat exceed the shaft's yield "
       "strength (DIN 743)", "a larger shaft diameter or a stronger shaft material", None)
      for t in ("pressfit", "bearing")),
    ("pressfit", ("plastic zone",), "the hub yields deeper into its wall than the design permits",
     "a looser fit, a thicker hub or a stronger hub material — search fits", FIT_SEARCH),
    ("pressfit", ("slip",), "the loosest fit carries less than the torque and thrust times the "
     "required slip safety: the joint may slip",
     "a tighter fit, a longer hub or rougher, dry surfaces — search fits", FIT_SEARCH),
    ("pressfit", ("hub", "yield"), "the tightest fit stresses the hub bore beyond its required "
     "safety", "a looser fit, a thicker hub or a stronger hub material — search fits", FIT_SEARCH),
    ("pressfit", ("shaft", "yield"), "the tightest fit stresses the shaft beyond its required "
     "safety", "a looser fit, a solid shaft or a stronger shaft material — search fits",
     FIT_SEARCH),
    ("pressfit", ("loosening",), "the hub's expansion at speed frees the loosest fit below the "
     "operating speed", "a tighter fit or a thicker hub — search fits", FIT_SEARCH),
    ("pressfit", ("heating",), "shrinking on needs a hub temperature above the heating limit of "
     "its material", "a looser fit, a cooled shaft, or pressing on — search fits", FIT_SEARCH),
    ("pressfit", ("press-in",), "the tightest fit needs more press-in force than the press gives",
     "a looser fit, shrinking on, or a larger press — search fits", FIT_SEARCH),
    ("bearing", ("clearance",), "fit-up and thermal losses leave less radial clearance than the "
     "minimum in operation", "a larger clearance group or a looser seat — search seat classes",
     SEAT_SEARCH),
    ("bearing", ("hoop",), "the seat interference stresses the ring or the housing beyond its "
     "limit", "a looser seat class or a thicker housing — search seat classes", SEAT_SEARCH),
    ("bearing", ("grip",), "the ring under circumferential load loses its interference in "
     "operation: it can creep", "a tighter seat class or finer seat roughness — search seat "
     "classes", SEAT_SEARCH),
    ("bearing", ("interference",), "the ring under circumferential load has no interference at "
     "mid-tolerance: it can creep", "a tighter seat class or finer seat roughness — search seat "
     "classes", SEAT_SEARCH),
    ("bearing", ("friction",), "friction at the loosest pairing does not hold the axial force",
     "a shoulder or a retaining ring (axial location), or a tighter seat — search seat classes",
     SEAT_SEARCH),
    ("screws", ("preload",), "tightening to the preload needed overloads the screw at assembly",
     "a higher property class, a larger thread or a more precise tightening method", None),
    ("screws", ("working", "stress"), "the screw yields under preload and working load",
     "a larger thread or a higher property class", None),
    ("screws", ("separation",), "the clamp load left in service is below the required clamp "
     "load: the joint opens", "more or larger screws, or more preload (property class, "
     "tightening method)", None),
    ("screws", ("shear",), "if the joint slips, the screws are loaded in shear beyond their "
     "strength", "more or larger screws, more preload, or a dowel pin or fitted bolt to carry the "
     "shear", None),
    ("screws", ("slip",), "friction in the interface does not carry the transverse load",
     "more screws, more preload, or a dowel pin to carry the shear", None),
    ("screws", ("surface", "pressure"), "the head or nut presses into the clamped part beyond "
     "its limiting surface pressure", "a hardened washer or a larger bearing face", None),
    ("screws", ("engagement",), "the tapped thread is shorter than the housing material needs",
     "a deeper thread, a thread insert, or a through bolt with a nut", None),
    ("screws", ("opening",), "the eccentric working load lifts the joint at its loaded edge",
     "more preload, screws nearer the load line, or a stiffer (wider) interface", None),
    ("screws", ("gasket",), "the clamp load left on the gasket is below its sealing pressure",
     "more preload or more screws, or a gasket with a lower seating pressure", None),
    ("screws", ("fatigue",), "the alternating stress in the thread exceeds its endurance limit",
     "more preload, a longer (more elastic) screw, or a thread rolled after heat treatment", None),
)


def explain(table: str, check) -> Advice:
    """Cause and next step of a (failing) check of a joint of kind ``table``.

    ``check`` is a :class:`fitcheck.checks.Check` (or anything with ``name``, ``value``,
    ``limit``, ``sense``, ``note``).
    """
    name = str(check.name)
    low = name.lower()
    for tab, words, cause, step, action in _RULES:
        if tab == table and all(w in low for w in words):
            if table == "pressfit" and "slip" in words and _no_pressure(check):
                cause = "no contact pressure at the loosest fit: the joint slips"
                step = "search fits"
            return Advice(name, cause, step, action)
    sense = "at least" if check.sense == ">=" else "at most"
    action = {"pressfit": FIT_SEARCH, "bearing": SEAT_SEARCH}.get(table)
    return Advice(name, f"{name} is not {sense} its limit",
                  "revise the inputs of this check" + (" — search fits" if action == FIT_SEARCH
                                                       else " — search seat classes"
                                                       if action == SEAT_SEARCH else ""), action)


def _no_pressure(check) -> bool:
    note = str(getattr(check, "note", "") or "").lower()
    return "no contact pressure" in note or float(check.value) == 0.0


def failing(table: str, checks) -> list[Advice]:
    """:func:`explain` for every failing check, in the order given."""
    return [explain(table, c) for c in checks if not c.passed]
