"""ISO 286-2:1988/Cor.1:2006 (Technical Corrigendum 1): the four cells it corrects.

The values were read from the corrigendum's text (the ISO document itself). They are exactly
the kind of cell a table typed from recollection gets wrong; the engine, built on the
ISO 286-1:2010 tables, must give the corrected values.
"""

from fitcheck.fits import zone


def test_a13_over_315_up_to_355():
    # Cor.1:2006, page 8, Table 2: A13 over 315 up to 355 mm, upper "+ 2 000" replaced by "+ 2 090"
    assert zone(340.0, "A13").upper_um == 2090


def test_e8_over_80_up_to_120():
    # Cor.1:2006, page 9, Table 3: E8 over 80 up to 120 mm, upper "+ 125" replaced by "+ 126"
    assert zone(100.0, "E8").upper_um == 126
    assert zone(120.0, "E8").upper_um == 126  # "up to and including"


def test_r10_over_18_up_to_30():
    # Cor.1:2006, page 17, Table 11: R10 over 18 up to 30 mm, upper "− 10" replaced by "− 28"
    assert zone(25.0, "R10").upper_um == -28


def test_f9_over_250_up_to_315():
    # Cor.1:2006, page 26, Table 20: f9 over 250 up to 315 mm, lower "− 185" replaced by "− 186"
    assert zone(300.0, "f9").lower_um == -186
