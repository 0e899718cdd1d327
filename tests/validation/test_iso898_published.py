"""ISO 898-1 property classes checked against published table text that was read.

Sources (each value below was read from the page named beside it):

* [ET-898] Engineering ToolBox, "Metric Bolts - Minimum Ultimate Tensile and Proof Loads",
  https://www.engineeringtoolbox.com/metric-bolts-minimum-ultimate-tensile-proof-loads-d_2026.html
  — reproduces ISO 898-1 Table 4, "Minimum ultimate tensile loads, coarse threads":
  thread, pitch, nominal stress area As,nom [mm²] and Fm,min = As,nom × Rm,min [N] for the
  classes 4.6, 4.8, 5.6, 5.8, 6.8, 8.8, 9.8, 10.9, 12.9 (no 9.8 column beyond M16).
  Column order established from the rows themselves: M3, 5.03 mm² gives 2010/5.03 = 400,
  2110/5.03 = 420, 2510 → 500, 2620 → 520, 3020 → 600, 4020 → 800, 4530 → 900,
  5230 → 1040, 6140 → 1220 MPa.
* [RM] RoyMech, "Strength of metric bolts", http://roymech.co.uk/Useful_Tables/Screws/Strength.htm
  — "in accordance with BS 3692:2001 and BS EN ISO 898-1:1999": lower yield stress ReL and
  stress at permanent set Rp0.2 per class, printed "nominal/minimum" where they differ.
* [SN] schrauben-normen.de, "Festigkeitsklassen", http://www.schrauben-normen.de/festigkeitsklassen.html
  — row "Spannung u. Prüfkraft Sp" (stress under proof load) per class after ISO 898-1.

Cells left out because the page contradicts its own neighbours (As,nom × Rm of the same row
and column): [ET-898] M12 / 9.8 printed 75 200 (84.3 × 900 = 75 870) and M20 / 10.9 printed
250 000 (245 × 1040 = 254 800). [RM] prints the minimum tensile strength of 10.9 and 12.9 as
1000 and 1200 (the nominal values; the Fm column of [ET-898] gives 1040 and 1220) and the 12.9
yield pair garbled ("1080/100"): those cells are not used. [SN] prints ReL = 220 for 4.6
against 240 in [RM]: not used; its Sp row agrees with the rest and is used.

Not found in a source of the allowed kind: the proof-load tables (Tables 5 and 7) and the
fine-thread stress areas; the proof stress Sp is checked directly instead.
"""

import math

import pytest

from fitcheck import threads
from fitcheck.errors import InputError

CLASSES = ("4.6", "4.8", "5.6", "5.8", "6.8", "8.8", "9.8", "10.9", "12.9")

# [ET-898] ISO 898-1 Table 4: thread -> (P [mm], As,nom [mm²], Fm,min per class in CLASSES [N]);
# None = no cell (9.8 beyond M16) or a cell left out (see the module docstring)
TABLE4 = {
    "M3": (0.50, 5.03, (2010, 2110, 2510, 2620, 3020, 4020, 4530, 5230, 6140)),
    "M3.5": (0.60, 6.78, (2710, 2850, 3390, 3530, 4070, 5420, 6100, 7050, 8270)),
    "M4": (0.70, 8.78, (3510, 3690, 4390, 4570, 5270, 7020, 7900, 9130, 10700)),
    "M5": (0.80, 14.2, (5680, 5960, 7100, 7380, 8520, 11350, 12800, 14800, 17300)),
    "M6": (1.00, 20.1, (8040, 8440, 10000, 10400, 12100, 16100, 18100, 20900, 24500)),
    "M7": (1.00, 28.9, (11600, 12100, 14400, 15000, 17300, 23100, 26000, 30100, 35300)),
    "M8": (1.25, 36.6, (14600, 15400, 18300, 19000, 22000, 29200, 32900, 38100, 44600)),
    "M10": (1.50, 58.0, (23200, 24400, 29000, 30200, 34800, 46400, 52200, 60300, 70800)),
    "M12": (1.75, 84.3, (33700, 35400, 42200, 43800, 50600, 67400, None, 87700, 103000)),
    "M14": (2.00, 115, (46000, 48300, 57500, 59800, 69000, 92000, 104000, 120000, 140000)),
    "M16": (2.00, 157, (62800, 65900, 78500, 81600, 94000, 125000, 141000, 163000, 192000)),
    "M18": (2.50, 192, (76800, 80600, 96000, 99800, 115000, 159000, None, 200000, 234000)),
    "M20": (2.50, 245, (98000, 103000, 122000, 127000, 147000, 203000, None, None, 299000)),
    "M22": (2.50, 303, (121000, 127000, 152000, 158000, 182000, 252000, None, 315000, 370000)),
    "M24": (3.00, 353, (141000, 148000, 176000, 184000, 212000, 293000, None, 367000, 431000)),
}

ULTIMATE = [(size, cls, load) for size, (_, _, loads) in TABLE4.items()
            for cls, load in zip(CLASSES, loads, strict=True) if load is not None]


def _unit(x: float) -> float:
    """One unit of the third significant figure of x."""
    return 10.0 ** (math.floor(math.log10(x)) - 2)


@pytest.mark.parametrize("size", sorted(TABLE4))
def test_pitch_and_nominal_stress_area(size):
    pitch, as_nom, _ = TABLE4[size]  # ISO 898-1:2013, Table 4 via [ET-898]
    t = threads.thread(size)
    assert t.P == pytest.approx(pitch, abs=1e-9)
    assert t.As == pytest.approx(as_nom, abs=0.5 * _unit(as_nom) + 1e-9)


@pytest.mark.parametrize("size, cls, load", ULTIMATE)
def test_minimum_ultimate_tensile_load(size, cls, load):
    # ISO 898-1:2013, Table 4 via [ET-898]: Fm,min = As,nom x Rm,min, printed to three
    # significant figures but not always to the nearest (M5 8.8 = 14.2 x 800 = 11 360, printed
    # 11 350; M16 6.8 = 157 x 600 = 94 200, printed 94 000; M16 8.8 = 125 600, printed
    # 125 000; M6 5.8 = 10 452, printed 10 400): within 0.6 % -- Rm of neighbouring classes
    # differ by 3.75 % or more (8.8 800 / 830, 4.6 400 / 4.8 420, 10.9 1040 / 1000 nominal)
    t = threads.thread(size)
    as_nom = TABLE4[size][1]
    assert as_nom * threads.property_class(cls, t.d).Rm == pytest.approx(load, rel=0.006)


def test_class_9_8_has_no_cell_beyond_m16():
    # ISO 898-1:2013, Table 4 via [ET-898]: the 9.8 column stops at M16
    assert threads.property_class("9.8", 16.0).Rm == 900
    with pytest.raises(InputError):
        threads.property_class("9.8", 18.0)


# [RM] BS EN ISO 898-1:1999: minimum ReL (4.6 ... 6.8) or Rp0.2 (8.8 ... 10.9) [MPa]
YIELD = [
    ("4.6", 10.0, 240), ("4.8", 10.0, 340), ("5.6", 10.0, 300), ("5.8", 10.0, 420),
    ("6.8", 10.0, 480), ("8.8", 16.0, 640), ("8.8", 20.0, 660), ("9.8", 10.0, 720),
    ("10.9", 10.0, 940),
]


@pytest.mark.parametrize("cls, d, rp", YIELD)
def test_minimum_yield_or_proof_strength(cls, d, rp):
    # ISO 898-1 via [RM]; 8.8: "640" for d <= 16 mm, "640/660" (nominal/min) for d > 16 mm
    assert threads.property_class(cls, d).Rp02 == rp


# [SN] stress under proof load Sp [MPa]; 8.8 read as the d <= 16 mm value (580)
PROOF_STRESS = {"4.6": 225, "4.8": 310, "5.6": 280, "5.8": 380, "6.8": 440, "8.8": 580,
                "9.8": 650, "10.9": 830, "12.9": 970}


@pytest.mark.parametrize("cls, sp", sorted(PROOF_STRESS.items()))
def test_stress_under_proof_load(cls, sp):
    # ISO 898-1 via [SN]
    pc = threads.property_class(cls, 10.0)
    assert pc.Sp == sp
    assert pc.Sp < pc.Rp02 < pc.Rm
