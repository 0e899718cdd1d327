"""Fastener tables: threads, property classes, heads, clearance holes, washers and factors.

Every loader reads its table of ``data/`` once (cached), checks it (headers, the thread
formulas of ISO 724 / ISO 898-1 / ASME B1.1, positive values, contiguous size ranges) and
returns frozen dataclasses of floats in core units (mm, MPa, 1/K). Look-ups by name are
forgiving about case and blanks and answer an unknown name with an
:class:`~fitcheck.errors.InputError` carrying a "did you mean" hint.
"""

from __future__ import annotations

import functools
import math
import re
import warnings
from dataclasses import dataclass

from . import tables
from .core import vdi2230 as core
from .errors import InputError, MethodRangeWarning, did_you_mean
from .tables import TableError

__all__ = [
    "Thread", "PropertyClass", "Head", "Washer", "HEAD_TYPES", "HOLE_SERIES", "thread", "thread_names",
    "property_class", "property_class_names", "head", "clearance_hole", "washer", "tightening_factor",
    "tightening_methods", "embedding_amounts", "friction_class", "shigley_torque_factor",
    "clamped_limits",
]

HEAD_TYPES = ("hex", "socket", "pan", "button", "countersunk")
HOLE_SERIES = ("fine", "medium", "coarse")
#: ASME B18.2.8 names of the inch clearance-hole series, read as the ISO 273 series in the same column.
HOLE_ALIASES = {"close": "fine", "normal": "medium", "loose": "coarse"}


@dataclass(frozen=True)
class Thread:
    """One screw thread in core units.

    Attributes
    ----------
    designation : str — "M10", "M10x1.25", "1/4-20 UNC"
    size : str — the nominal size used by head, hole and washer tables ("M10", "1/4", "#10")
    system : str — "metric" or "unified"
    series : str — "coarse", "fine", "UNC" or "UNF"
    d : float — major (nominal) diameter [mm]
    P : float — pitch [mm]
    d2 : float — pitch diameter [mm]
    d3 : float — minor diameter of the external thread [mm]
    As : float — tensile stress area [mm²]
    """

    designation: str
    size: str
    system: str
    series: str
    d: float
    P: float
    d2: float
    d3: float
    As: float

    @property
    def ds(self) -> float:
        """Diameter of the stress area, √(4 As/π) [mm] (= (d2 + d3)/2 for metric threads)."""
        return math.sqrt(4.0 * self.As / math.pi)

    @property
    def D1(self) -> float:
        """Basic minor diameter of the internal thread, d − 1.082532 P [mm] (ISO 724)."""
        return self.d - 1.082532 * self.P


def _norm(s: str) -> str:
    return re.sub(r"\s+", "", str(s)).upper().replace("×", "X").replace("*", "X")


@functools.cache
def _threads() -> dict[str, Thread]:
    out: dict[str, Thread] = {}
    for r in tables.read_rows("threads_metric.csv"):
        d, P = float(r["d_mm"]), float(r["P_mm"])
        d2, d3 = float(core.thread_d2(d, P)), float(core.thread_d3(d, P))
        As = float(core.stress_area_metric(d2, d3))
        if abs(d2 - float(r["d2_mm"])) > 6e-4 or abs(d3 - float(r["d3_mm"])) > 6e-4 or \
                abs(As - float(r["As_mm2"])) > 1e-3 * As:
            raise TableError(f"threads_metric.csv, {r['designation']}: d2/d3/As disagree with ISO 724 / ISO 898-1")
        size = r["designation"].split("x")[0]
        out[_norm(r["designation"])] = Thread(r["designation"], size, "metric", r["series"], d, P, d2, d3, As)
    for r in tables.read_rows("threads_unified.csv"):
        d, P = float(r["d_mm"]), float(r["P_mm"])
        if abs(d - float(r["d_in"]) * 25.4) > 1e-3 or abs(P * float(r["tpi"]) - 25.4) > 1e-3:
            raise TableError(f"threads_unified.csv, {r['designation']}: inch and mm columns disagree")
        As = float(core.stress_area_unified(d, P))
        if abs(As - float(r["As_mm2"])) > 1e-3 * As:
            raise TableError(f"threads_unified.csv, {r['designation']}: As disagrees with ASME B1.1")
        out[_norm(r["designation"])] = Thread(r["designation"], r["size"], "unified", r["series"], d, P,
                                              float(r["d2_mm"]), float(r["d3_mm"]), As)
    return out


def thread_names() -> list[str]:
    """All thread designations known ("M1.6" … "M24x1", "#0-80 UNF" … "1-12 UNF")."""
    return [t.designation for t in _threads().values()]


_UNIFIED = re.compile(r"^(#\d+|\d+(?:/\d+)?)-(\d+)(UNC|UNF)?$")


def thread(text: str, field: str = "thread") -> Thread:
    """A thread by designation.

    Accepts ``"M5"``, ``"M6x0.75"``, ``"m6 X 0.75"``, ``"#10-24 UNC"``, ``"1/4-20 UNC"`` and, for
    inch threads, the designation without its series (``"1/4-20"``).

    >>> thread("M10").As > 57.9
    True
    >>> thread("1/4-20").designation
    '1/4-20 UNC'
    >>> thread("M7x3")
    Traceback (most recent call last):
    ...
    fitcheck.errors.InputError: thread: got 'M7x3'; allowed: an ISO metric thread M1.6 … M24 (coarse or fine, e.g. 'M6x0.75') or a Unified thread #0 … 1 in (e.g. '1/4-20 UNC') (did you mean 'M7'...?)
    """
    if not isinstance(text, str) or not text.strip():
        raise InputError(field, text, "a thread designation such as 'M6', 'M8x1' or '1/4-20 UNC'")
    key = _norm(text)
    tab = _threads()
    if key in tab:
        return tab[key]
    m = _UNIFIED.match(key)
    if m and not m.group(3):
        for series in ("UNC", "UNF"):
            if key + series in tab:
                return tab[key + series]
    if re.fullmatch(r"M\d+(\.\d+)?X\d+(\.\d+)?", key):  # "M8x1.25" is the coarse thread written in full
        size, pitch = key.split("X")
        t = tab.get(size)
        if t is not None and math.isclose(t.P, float(pitch)):
            return t
    allowed = ("an ISO metric thread M1.6 … M24 (coarse or fine, e.g. 'M6x0.75') or a Unified thread "
               "#0 … 1 in (e.g. '1/4-20 UNC')")
    raise InputError(field, text, allowed, did_you_mean(text, thread_names()))


@dataclass(frozen=True)
class PropertyClass:
    """Strength of a screw material (specified minimum values) and its elastic/thermal data.

    Attributes
    ----------
    name : str — "8.8", "A2-70", "SAE 5"
    standard : str
    Rp02 : float — ReL, Rpf or Rp0.2 (minimum) [MPa]
    Rm : float — minimum tensile strength [MPa]
    Sp : float — proof stress [MPa]
    E : float — Young's modulus [MPa]
    alpha : float — expansion coefficient [1/K]
    material : str
    tauB_ratio : float — shear over tensile strength τB/Rm of the screw (VDI 2230-1:2015, Table 7) [-]
    """

    name: str
    standard: str
    Rp02: float
    Rm: float
    Sp: float
    E: float
    alpha: float
    material: str
    tauB_ratio: float = 0.6

    @property
    def stainless(self) -> bool:
        return self.standard.startswith("ISO 3506")


def _class_key(s: str) -> str:
    k = _norm(s)
    k = re.sub(r"^(SAEJ429|SAE|GRADE|GR)\.?(\d)$", r"SAE\2", k)
    k = re.sub(r"^(ASTM)?A574$", "ASTMA574", k)
    return k


@functools.cache
def _classes() -> dict[str, list[tuple[float, float, PropertyClass]]]:
    out: dict[str, list] = {}
    for r in tables.read_rows("property_classes.csv"):
        pc = PropertyClass(r["class"], r["standard"], float(r["Rp02_MPa"]), float(r["Rm_MPa"]),
                           float(r["Sp_MPa"]), float(r["E_MPa"]), float(r["alpha_1e-6_per_K"]) * 1e-6,
                           r["material"], float(r["tauB_per_Rm"]))
        if not 0 < pc.Sp <= pc.Rp02 < pc.Rm:
            raise TableError(f"property_classes.csv, {pc.name}: expected 0 < Sp <= Rp0.2 < Rm")
        out.setdefault(_class_key(pc.name), []).append((float(r["d_over_mm"]), float(r["d_upto_mm"]), pc))
    for key, ranges in out.items():
        for (_, up, _), (lo, _, _) in zip(ranges, ranges[1:], strict=False):
            if lo != up:
                raise TableError(f"property_classes.csv, {key}: size ranges are not contiguous")
    return out


def property_class_names() -> list[str]:
    """Names of the tabulated property classes and grades."""
    return [v[0][2].name for v in _classes().values()]


def property_class(name: str, d: float, field: str = "property_class") -> PropertyClass:
    """The property class ``name`` for a screw of nominal diameter ``d`` [mm].

    Sizes beyond a class's range are refused. SAE J429 grades start at 1/4 in: a smaller inch
    screw (#0 … #12) with an SAE grade is refused with the choices that do apply — ASTM A574 for
    socket head cap screws, or an ISO 898-1 class chosen knowingly for the material specified.

    >>> property_class("8.8", 20.0).Rp02
    660.0
    >>> property_class("sae 5", 12.7).Sp
    586.1
    >>> property_class("A574", 4.83).Rm
    1241.1
    """
    if not isinstance(name, str):
        name = str(name)
    ranges = _classes().get(_class_key(name))
    if ranges is None:
        raise InputError(field, name, "a property class: " + ", ".join(property_class_names()),
                         did_you_mean(name, property_class_names()))
    for i, (lo, up, pc) in enumerate(ranges):
        if lo < d <= up or (i == 0 and lo - 1e-9 <= d <= up):  # the first range includes its lower end
            return pc
    lo0, up_last = ranges[0][0], ranges[-1][1]
    if d <= lo0 and ranges[0][2].standard.startswith("SAE J429"):
        raise InputError(field, name, f"a grade that covers a {d:g} mm screw: {ranges[0][2].standard} "
                         f"grades start at 1/4 in ({lo0:g} mm); for #0 … #12 socket head cap screws use "
                         "'ASTM A574', otherwise an ISO 898-1 class such as '8.8' for the material "
                         "the drawing specifies")
    if d <= lo0:
        warnings.warn(f"{field}: {ranges[0][2].standard} covers {ranges[0][2].name} from "
                      f"{lo0:g} mm; the values of its smallest size range are used for {d:g} mm",
                      MethodRangeWarning, stacklevel=2)
        return ranges[0][2]
    raise InputError(field, name, f"a class defined for this size: {ranges[0][2].standard} gives "
                     f"{ranges[0][2].name} only up to {up_last:g} mm (the screw is {d:g} mm)")


@dataclass(frozen=True)
class Head:
    """Head of a screw: type, product standard, head diameter dk and bearing diameter dw [mm]."""

    type: str
    standard: str
    dk: float
    dw: float


@functools.cache
def _heads() -> dict[tuple[str, str], Head]:
    out = {}
    for r in tables.read_rows("screw_heads.csv"):
        h = Head(r["head"], r["standard"], float(r["dk_mm"]), float(r["dw_mm"]))
        if r["head"] not in HEAD_TYPES or not (0 < h.dw <= h.dk + 1e-9):
            raise TableError(f"screw_heads.csv, {r['head']} {r['size']}: unknown head or dw > dk")
        out[(r["head"], r["size"])] = h
    return out


def head(kind: str, size: str, field: str = "head") -> Head:
    """Head dimensions for a head type and a nominal size ("M8", "1/4", "#10").

    >>> head("socket", "M8").dw
    12.33
    """
    k = str(kind).strip().lower()
    if k not in HEAD_TYPES:
        raise InputError(field, kind, "one of " + ", ".join(HEAD_TYPES), did_you_mean(kind, HEAD_TYPES))
    h = _heads().get((k, size))
    if h is None:
        sizes = [s for (t, s) in _heads() if t == k]
        raise InputError(field, kind, f"a head type made in size {size}; {k} heads are tabulated for "
                         + ", ".join(sizes))
    return h


@functools.cache
def _holes() -> dict[str, tuple[str, float, float, float]]:
    out = {}
    for r in tables.read_rows("clearance_holes.csv"):
        f, m, c = float(r["fine_mm"]), float(r["medium_mm"]), float(r["coarse_mm"])
        if not (0 < f <= m <= c):
            raise TableError(f"clearance_holes.csv, {r['size']}: expected fine <= medium <= coarse")
        out[r["size"]] = (r["standard"], f, m, c)
    return out


def clearance_hole(size: str, series: str = "medium", field: str = "hole") -> float:
    """Clearance-hole diameter [mm] of ISO 273 (metric) or ASME B18.2.8 (inch) for a size and series.

    The inch series close / normal / loose of ASME B18.2.8 are the columns fine / medium / coarse;
    either name is accepted.

    >>> clearance_hole("M8", "medium")
    9.0
    >>> round(clearance_hole("#8", "normal") / 25.4, 3)
    0.177
    """
    s = str(series).strip().lower()
    s = HOLE_ALIASES.get(s, s)
    if s not in HOLE_SERIES:
        raise InputError(field, series, "fine, medium, coarse (inch: close, normal, loose) or a diameter "
                         "such as '9 mm'", did_you_mean(series, HOLE_SERIES + tuple(HOLE_ALIASES)))
    row = _holes().get(size)
    if row is None:
        raise InputError(field, series, f"an explicit hole diameter (no clearance-hole table for {size})")
    return row[1 + HOLE_SERIES.index(s)]


@dataclass(frozen=True)
class Washer:
    """Plain washer: standard, hole d1, outside d2 and thickness h [mm]."""

    standard: str
    d1: float
    d2: float
    h: float


@functools.cache
def _washers() -> dict[tuple[str, str], Washer]:
    out = {}
    for r in tables.read_rows("washers.csv"):
        w = Washer(r["standard"], float(r["d1_mm"]), float(r["d2_mm"]), float(r["h_mm"]))
        if not (0 < w.d1 < w.d2 and w.h > 0):
            raise TableError(f"washers.csv, {r['standard']} {r['size']}: implausible dimensions")
        out[(r["standard"], r["size"])] = w
    return out


def washer(size: str, head_type: str, field: str = "washer") -> Washer:
    """The plain washer for a size: ISO 7089 (normal) under hex heads, ISO 7092 (small) otherwise;
    inch sizes ASME B18.22.1 Type B, regular series under hex heads, narrow series otherwise.

    >>> washer("M6", "hex").d2
    12.0
    >>> round(washer("#8", "socket").d2 / 25.4, 3)
    0.375
    """
    metric = size.startswith("M")
    if metric:
        std = "ISO 7089" if head_type == "hex" else "ISO 7092"
    else:
        std = "ASME B18.22.1 R" if head_type == "hex" else "ASME B18.22.1 N"
    w = _washers().get((std, size))
    if w is None:
        raise InputError(field, True, f"washer = false (no {std} washer is tabulated for {size}); "
                         "model a washer as a steel layer instead")
    return w


@functools.cache
def _tightening() -> dict[str, tuple[float, float, str]]:
    out = {}
    for r in tables.read_rows("tightening_factors.csv"):
        a, b = float(r["alpha_min"]), float(r["alpha_max"])
        if not (1.0 <= a <= b <= 5.0):
            raise TableError(f"tightening_factors.csv, {r['method']}: expected 1 <= alpha_min <= alpha_max")
        out[r["method"]] = (a, b, r["description"])
    return out


def tightening_methods() -> list[str]:
    """Names of the tightening methods of Table A8."""
    return list(_tightening())


def tightening_factor(method: str, field: str = "tightening") -> tuple[float, float, str]:
    """(αA,min, αA,max, description) of a tightening method (VDI 2230-1:2015, Table A8).

    >>> tightening_factor("torque_wrench_estimated_friction")[:2]
    (1.6, 2.0)
    """
    key = str(method).strip().lower().replace("-", "_").replace(" ", "_")
    tab = _tightening()
    if key not in tab:
        raise InputError(field, method, "a tightening method (" + ", ".join(tab) + ") or the tightening "
                         "factor αA as a number from 1 to 5", did_you_mean(method, tab))
    return tab[key]


@functools.cache
def _embedding():
    rows = tables.read_rows("embedding.csv")
    out = {}
    for r in rows:
        out.setdefault(r["load"], []).append((float(r["rz_over_um"]), float(r["rz_upto_um"]),
                                              float(r["thread_um"]), float(r["head_or_nut_um"]),
                                              float(r["interface_um"])))
    for load, rr in out.items():
        for a, b in zip(rr, rr[1:], strict=False):
            if a[1] != b[0]:
                raise TableError(f"embedding.csv, {load}: Rz ranges are not contiguous")
    return out


def embedding_amounts(rz_um: float, load: str = "axial", field: str = "rz") -> tuple[float, float, float]:
    """Embedding amounts f_Z [mm] (thread, per head/nut bearing face, per inner interface).

    VDI 2230-1:2015, Table 5; Rz is the averaged roughness depth in µm, below 160 µm.

    >>> embedding_amounts(16.0)
    (0.003, 0.003, 0.002)
    """
    for lo, up, th, hd, it in _embedding()[load]:
        if lo <= rz_um < up:
            return th / 1000.0, hd / 1000.0, it / 1000.0
    raise InputError(field, f"{rz_um:g} um", "a roughness Rz from 0 up to (excluding) 160 um "
                     "(VDI 2230-1:2015, Table 5)")


@functools.cache
def _friction() -> dict[str, tuple[float, float, str]]:
    out = {}
    for r in tables.read_rows("screw_friction.csv"):
        a, b = float(r["mu_min"]), float(r["mu_max"])
        if not (0 < a < b):
            raise TableError(f"screw_friction.csv, class {r['class']}: expected mu_min < mu_max")
        out[r["class"]] = (a, b, r["typical"])
    return out


def friction_class(letter: str, field: str = "mu") -> tuple[float, float]:
    """(μ_min, μ_max) of a friction class A … E (VDI 2230-1:2015, Table A5).

    >>> friction_class("B")
    (0.08, 0.16)
    """
    key = str(letter).strip().upper()
    if key not in _friction():
        raise InputError(field, letter, "a friction class A, B, C, D or E, or [min, max] numbers")
    return _friction()[key][:2]


@functools.cache
def _shigley_k() -> dict[str, float]:
    return {r["condition"]: float(r["K"]) for r in tables.read_rows("shigley_torque_factors.csv")}


def shigley_torque_factor(condition: str = "zinc_plated") -> float:
    """Torque factor K of T = K F d (Shigley, 10th ed., Table 8-15).

    >>> shigley_torque_factor("non_plated_black")
    0.3
    """
    tab = _shigley_k()
    if condition not in tab:
        raise InputError("torque_factor", condition, "one of " + ", ".join(tab), did_you_mean(condition, tab))
    return tab[condition]


@functools.cache
def _limits() -> dict[str, tuple[float, float]]:
    return {r["group"]: (float(r["pG_MPa"]), float(r["tauB_per_Rm"]))
            for r in tables.read_rows("screw_clamped_limits.csv")}


def clamped_limits(group: str) -> tuple[float, float] | None:
    """Fallback (pG [MPa], τB/Rm) for a material group, or None when the group is not tabulated.

    >>> clamped_limits("aluminium")
    (140.0, 0.6)
    """
    return _limits().get(group)
