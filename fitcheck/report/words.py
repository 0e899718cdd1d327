"""Readable text for reports: input keys in words with symbols, values with printed units, sources.

Everything a report prints passes through here, so that a reviewer reads words
("joint diameter d") instead of the case file's keys (``diameter``), printed
units (µm, °C, N·m) instead of the parser's spellings (``um``, ``degC``,
``N*m``), and "value to be confirmed against the printed standard" where the
program's tables carry a value typed from recollection.

Names come from the engines' own key tables (``KEYS`` of each analysis module):
the description up to its first example or comment is the name. A few keys
whose description starts with the allowed values instead get a name from
:data:`NAMES`; symbols come from :data:`SYMBOLS`. A key another module adds later
is therefore named without any change here.
"""

from __future__ import annotations

import math
import re
from collections.abc import Mapping

from ..display import convert_text, num

__all__ = ["CONFIRM", "cite", "input_name", "prose", "symbol_for", "unit_words", "value_text",
           "words_of"]

CONFIRM = "value to be confirmed against the printed standard"

#: Names for keys whose description does not start with one (it lists allowed values first).
NAMES: dict[str, str] = {
    "name": "name",
    "assembly": "assembly method",
    "joint": "kind of joint",
    "shaft_material": "shaft material",
    "hub_material": "hub material",
    "housing_material": "housing material",
    "load_level": "load level",
    "fit": "ISO 286 fit",
    "temperature_min": "lowest operating temperature",
    "temperature_max": "highest operating temperature",
    "temperature_shaft": "operating temperature of the shaft",
    "temperature_hub": "operating temperature of the hub",
    "temperature_housing": "operating temperature of the housing",
    "temperature_inner": "operating temperature of the inner ring",
    "temperature_outer": "operating temperature of the outer ring",
    "temperature_assembly": "temperature at assembly",
    "speed": "operating speed",
    "unit_system": "unit system of the case",
    "module": "normal module of the gear",
    "design": "design of the press fit",
    "plastic_zone_limit": "permitted plastic-zone share of the hub wall",
    "overhang": "overhang of the gear from the hub edge",
    "bending_moment": "rotating bending moment in the shaft at the hub edge",
}

#: Symbols printed beside the names (the trade's symbols: DIN 7190, VDI 2230, ISO 286).
SYMBOLS: dict[str, str] = {
    "interference_min": "U_min", "interference_max": "U_max", "diameter": "d", "length": "L",
    "shaft_bore": "d_i", "hub_outer_diameter": "D_a", "module": "m", "teeth": "z",
    "rz_shaft": "Rz_shaft", "rz_hub": "Rz_hub", "rz_housing": "Rz_housing", "rz_ring": "Rz_ring",
    "rz": "Rz", "mu_slip": "μ", "mu_press": "μ_e", "torque": "T", "axial_force": "F_ax",
    "speed": "n", "temperature_shaft": "ϑ_shaft", "temperature_hub": "ϑ_hub",
    "temperature_assembly": "ϑ_0", "temperature_min": "ϑ_min", "temperature_max": "ϑ_max",
    "temperature_inner": "ϑ_inner", "temperature_outer": "ϑ_outer",
    "temperature_housing": "ϑ_housing", "slip_safety": "S_slip", "yield_safety": "S_F",
    "fracture_safety": "S_B", "press_force_limit": "F_press", "load_ratio": "P/C",
    "clearance_min": "s_min", "friction": "μ", "hoop_stress_limit": "σ_t,perm",
    "housing_wall": "t", "housing_outer_diameter": "D_housing", "engagement": "m_eff",
    "count": "n_S", "bolt_circle": "d_bc", "tilting_moment": "M_B", "transverse_force": "F_Q",
    "torque_about_axis": "M_t", "clamp_force_required": "F_K,req", "mu_thread": "μ_G",
    "mu_head": "μ_K", "mu_interface": "μ_T", "slip_interfaces": "q_F", "tightening": "α_A",
    "utilisation": "ν", "load_introduction": "n",
    "clamp_outer_diameter": "D_A", "smoothing_factor": "k_smooth",
    "joining_clearance": "Δd_join", "temperature_shaft_cooled": "ϑ_shaft,cooled",
    "bending_moment": "M_b", "helix_angle": "β", "pressure_angle": "α_n", "application_factor": "K_A",
    "surface_hardening_factor": "K_V", "bearing_distance_a": "a", "bearing_distance_b": "b",
    "overhang": "e",
}

#: Printed spellings of units (the parser's spelling → the trade's).
_UNITS = [
    (r"delta_degC", "K"), (r"delta_degF", "°F"), (r"degC", "°C"), (r"degF", "°F"),
    (r"N\*mm", "N·mm"), (r"N\*m", "N·m"), (r"kN\*m", "kN·m"), (r"lbf\*in", "lbf·in"),
    (r"lbf\*ft", "lbf·ft"), (r"mm\*\*2", "mm²"), (r"in\*\*2", "in²"), (r"mm\*\*3", "mm³"),
    (r"kg/m\*\*3", "kg/m³"), (r"lb/in\*\*3", "lb/in³"), (r"uin", "µin"), (r"um", "µm"),
    (r"micrometer", "µm"), (r"1/K", "1/K"),
]
_UNIT_RE = [(re.compile(r"(?<![A-Za-z_])" + pat + r"(?![A-Za-z_])"), rep) for pat, rep in _UNITS]

_MEMORY = re.compile(r"\s*(?:[#(,;]\s*|—\s*|-\s+)?(?:typed\s+)?from memory\)?", re.IGNORECASE)
_CSV = re.compile(r"(?:data/)?([A-Za-z0-9]+(?:_[A-Za-z0-9]+)*)\.csv\b")
_SNAKE = re.compile(r"(?<![\w.])([a-z]{2,}[a-z0-9]*(?:_[a-z0-9]+)+)(?![\w(])")


def unit_words(text: str) -> str:
    """Parser unit spellings in a text replaced by printed units.

    >>> unit_words("2.5 um at 55 degC, 3.2 N*m, 20 delta_degC")
    '2.5 µm at 55 °C, 3.2 N·m, 20 K'
    """
    for rx, rep in _UNIT_RE:
        text = rx.sub(rep, text)
    return text


def cite(text: str) -> str:
    """A source as a report cites it: a value typed from recollection is marked for confirmation.

    >>> cite("DIN 7190-1:2017, friction table # from memory")
    'DIN 7190-1:2017, friction table — value to be confirmed against the printed standard'
    >>> cite("DIN 5425-1 recommendation tables (from memory)")
    'DIN 5425-1 recommendation tables — value to be confirmed against the printed standard'
    """
    return _MEMORY.sub(" — " + CONFIRM, str(text))


def _table_name(m: re.Match) -> str:
    return "fitcheck table “" + m.group(1).replace("_", " ") + "”"


def prose(text: str, names: Mapping[str, str] | None = None) -> str:
    """Free text of an engine (notes, check notes, sources) as a report prints it.

    Units get their printed spelling, values from recollection are marked for
    confirmation, data files are named in words and a snake_case key becomes
    its name in words.

    >>> prose("at the tightest fit, with mu_press; mu_slip: pressfit_friction.csv # from memory")
    'at the tightest fit, with μ_e; μ: fitcheck table “pressfit friction” — value to be confirmed \
against the printed standard'
    """
    text = cite(unit_words(str(text)))
    text = _CSV.sub(_table_name, text)

    def repl(m: re.Match) -> str:
        key = m.group(1)
        if key in SYMBOLS:
            return SYMBOLS[key]
        if names and key in names:
            return names[key]
        return key.replace("_", " ")

    return _SNAKE.sub(repl, text)


def words_of(description: str) -> str:
    """The name at the head of a key's description in an engine's ``KEYS`` table.

    >>> words_of("smallest diametral interference, e.g. '18 um' (with diameter)")
    'smallest diametral interference'
    >>> words_of("outer diameter of the housing around the seat [length] (default: massive)")
    'outer diameter of the housing around the seat'
    """
    d = str(description).strip()
    d = re.split(r",\s*e\.g\.|;|:\s|\s\(|\s\[|,\s*default|\.\s", d, maxsplit=1)[0]
    return d.strip(" ,.")


def symbol_for(key: str) -> str:
    return SYMBOLS.get(key, "")


def input_name(key: str, keys: Mapping | None = None) -> str:
    """An input key in words with its symbol: ``"joint diameter d"``.

    >>> input_name("diameter", {"diameter": "joint diameter, e.g. '20 mm'"})
    'joint diameter d'
    >>> input_name("some_new_key")
    'some new key'
    """
    name = NAMES.get(key)
    if name is None and keys is not None:
        desc = keys.get(key)
        if isinstance(desc, Mapping):
            desc = desc.get("meaning") or desc.get("text") or next(iter(desc.values()), "")
        elif isinstance(desc, list | tuple):
            desc = next((x for x in desc if isinstance(x, str) and x), "")
        if isinstance(desc, str) and desc:
            name = words_of(desc)
            if name.startswith("'") or not name:
                name = None
    if name is None:
        name = key.replace("_", " ")
    name = unit_words(name)
    sym = symbol_for(key)
    if sym and not re.search(r"(?<!\w)" + re.escape(sym) + r"(?!\w)", name):
        name = f"{name} {sym}"
    return name


def _number(x: float) -> str:
    if isinstance(x, bool):
        return "yes" if x else "no"
    if isinstance(x, int):
        return str(x)
    if not math.isfinite(x):
        return "∞" if x > 0 else ("−∞" if x < 0 else "n/a")
    return num(x, 6)


_RADIANS = re.compile(r"([-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?)\s*rad")


def value_text(v, system: str = "SI", names: Mapping[str, str] | None = None) -> str:
    """An input value as a report prints it, in the case's unit system.

    Quantities keep the text the user wrote when it is already in the system
    (units printed as µm, °C, N·m); in an inch case a metric value is shown in
    inch units with the value as written beside it. Keywords lose their
    underscores; inline tables read ``name = value, …``.

    >>> value_text("2.5 um"), value_text("rotating_inner"), value_text(True)
    ('2.5 µm', 'rotating inner', 'yes')
    >>> value_text([0.08, 0.12])
    '0.08 … 0.12'
    >>> value_text("0.2617993877991494 rad")
    '15°'
    """
    if isinstance(v, Mapping):
        return ", ".join(f"{(names or {}).get(k, str(k).replace('_', ' '))} = "
                         f"{value_text(x, system, names)}" for k, x in v.items())
    if isinstance(v, list | tuple):
        if len(v) == 2 and all(isinstance(x, int | float) and not isinstance(x, bool) for x in v):
            return f"{_number(v[0])} … {_number(v[1])}"
        parts = [value_text(x, system, names) for x in v]
        if v and all(isinstance(x, Mapping) for x in v):
            return "; ".join(f"({i}) {p}" for i, p in enumerate(parts, 1))
        return "[" + ", ".join(parts) + "]"
    if isinstance(v, bool | int | float):
        return _number(v)
    text = str(v)
    rad = _RADIANS.fullmatch(text.strip())
    if rad:  # angles are stored in radians (lossless); a drawing gives them in degrees
        return f"{num(math.degrees(float(rad.group(1))), 6)}°"
    if system == "inch":
        conv = convert_text(text, "inch")
        if conv != text:
            return f"{unit_words(conv)} ({unit_words(text)} as written)"
    if re.fullmatch(r"[a-z][a-z0-9]*(_[a-z0-9]+)+", text):
        return text.replace("_", " ")
    return unit_words(text)
