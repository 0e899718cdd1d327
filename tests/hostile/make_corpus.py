"""Write the corpus of hostile case files (``tests/hostile/cases/*.toml``).

Each file is a small valid case (one press fit, one screw joint) with ONE hostile change, so
``fitcheck check FILE`` must exit with 2 and print exactly one line on stderr. Run
``python tests/hostile/make_corpus.py`` to write the files again after changing the list;
``tests/test_hostile_corpus.py`` reads them. Bytes that TOML text cannot hold (invalid UTF-8,
NUL) are written as bytes.
"""

from __future__ import annotations

from pathlib import Path

HERE = Path(__file__).resolve().parent
OUT = HERE / "cases"

BASE = '''format_version = 1

[title]
project = "Corpus base"
part = "Gearhead"

[conditions]
temperature_max = "60 degC"
speed = "2800 rpm"

[[pressfit]]
name = "gear-on-shaft"
fit = "16 H7/s6"
length = "14 mm"
hub_outer_diameter = "40 mm"
shaft_material = "C45E"
hub_material = "16MnCr5"
torque = "3.2 N*m"
axial_force = "60 N"

[[screws]]
name = "cover-screws"
thread = "M5"
property_class = "8.8"
head = "socket"
joint = "tapped"
layers = [{ thickness = "6 mm", material = "EN AW-6082-T6" }]
engagement = "10 mm"
housing_material = "EN AC-46000"
count = 4
bolt_circle = "72 mm"
axial_force = "600 N"
mu_thread = "B"
'''

LENGTH = 'length = "14 mm"'


def toml_str(s: str) -> str:
    """A TOML basic string holding ``s`` (control characters as \\u escapes)."""
    out = []
    for ch in s:
        if ch in '"\\':
            out.append("\\" + ch)
        elif ord(ch) < 0x20 or ord(ch) == 0x7F:
            out.append(f"\\u{ord(ch):04X}")
        else:
            out.append(ch)
    return '"' + "".join(out) + '"'


def sub(old: str, new: str) -> str:
    assert old in BASE, old
    return BASE.replace(old, new, 1)


def length(v: str) -> str:
    return sub(LENGTH, "length = " + toml_str(v))


CASES: dict[str, str | bytes] = {}

# 1. quantity strings that are expressions, too long, or outside the grammar
UNITS = {
    "power-tower": "9**9**9 mm", "power-tower-4": "9**9**9**9", "power-of-number": "2**100000 mm",
    "caret-power-of-number": "9^9^9 mm", "huge-unit-power": "14 mm**99", "repeated-power": "14 mm**2**2",
    "negative-big-power": "14 mm^-9", "trailing-operator": "14 mm*", "double-operator": "14 */ mm",
    "brackets": "(14) mm", "brackets-unit": "14 (mm)", "square-brackets": "14 [mm]",
    "braces": "14 {mm}", "call": "__import__('os') mm", "semicolon": "14 mm; rm -rf /",
    "hash": "14 mm # x", "long-number": "1" * 200 + " mm", "long-unit-chain": "14 " + "mm*" * 40 + "mm",
    "long-name": "14 m" + "m" * 200, "long-16000": "1" * 16000 + " mm", "long-100000": "x" * 100000,
    "hex": "0x10 mm", "exponent-4-digits": "1e9999 mm", "nan-word": "nan mm", "inf-word": "inf mm",
    "bel": "14 mm\x07", "escape-seq": "14 mm\x1b[31m", "newline": "14\nmm", "tab-cr": "14 mm\r",
    "rlo": "14 mm\u202e", "fullwidth": "\uff11\uff14 mm", "squared-mm": "14 \u339c",
    "empty": "", "blank": "   ", "sign-only": "-", "lone-dot": ". mm", "percent-power": "14 %**2",
    "python-expr": "14*10**9 mm", "comma-decimal": "14,5 mm", "unicode-minus": "\u221214 mm",
    "bidi-isolate": "\u206614 mm", "zero-width": "14\u200bmm", "wrong-kind": "14 kg",
    "offset-as-length": "14 degC", "negative": "-14 mm", "mm-cubed": "14 mm mm mm",
    "undefined-unit": "14 furlongz", "del-char": "14 mm\x7f", "c1-control": "14 mm\x85",
}
for k, v in UNITS.items():
    CASES[f"unit-{k}"] = length(v)
CASES["unit-in-conditions"] = sub('speed = "2800 rpm"', 'speed = "9**9**9 rpm"')
CASES["unit-in-layer"] = sub('thickness = "6 mm"', 'thickness = "6**6**6 mm"')
CASES["unit-in-position"] = sub('count = 4\nbolt_circle = "72 mm"', 'count = 1\npositions = [["9**9**9 mm", "0 mm"]]')
CASES["unit-in-inline-material"] = sub('hub_material = "16MnCr5"', 'hub_material = { base = "C45E", '
                                       'Rp02 = "9**9**9 MPa" }')
CASES["unit-temperature-tower"] = sub('temperature_max = "60 degC"', 'temperature_max = "9**9**9 degC"')

# 2. nesting
CASES["nest-2000-brackets"] = sub(LENGTH, "length = " + "[" * 2000 + "]" * 2000)
CASES["nest-2000-unclosed"] = sub(LENGTH, "length = " + "[" * 2000)
CASES["nest-2000-inline-tables"] = sub(LENGTH, "length = " + "{a = " * 2000 + "1" + "}" * 2000)
CASES["nest-mixed-1000"] = sub(LENGTH, "length = " + "[{a = " * 500 + "1" + "}]" * 500)
CASES["nest-7-levels"] = sub(LENGTH, "length = [[[[[1]]]]]")
CASES["nest-dotted-keys-2000"] = sub(LENGTH, ".".join(['"a"'] * 2000) + " = 1")
CASES["nest-dotted-header-300"] = BASE + "\n[" + " . ".join(["t"] * 300) + "]\nx = 1\n"
CASES["nest-deep-title"] = sub('part = "Gearhead"', "part = " + "[" * 50 + "]" * 50)
CASES["nest-deep-conditions"] = sub('speed = "2800 rpm"', "speed = " + "{a = " * 40 + "1" + "}" * 40)

# 3. sizes and counts
CASES["array-50000"] = sub(LENGTH, "length = [" + ",".join(["1"] * 50000) + "]")
CASES["array-5000-strings"] = sub(LENGTH, "length = [" + ",".join(['"1 mm"'] * 5000) + "]")
CASES["array-17"] = sub(LENGTH, "length = [" + ",".join(["1"] * 17) + "]")
CASES["mu-thread-3"] = sub('mu_thread = "B"', "mu_thread = [0.1, 0.12, 0.14]")
CASES["layers-51"] = sub('layers = [{ thickness = "6 mm", material = "EN AW-6082-T6" }]',
                         "layers = [" + ", ".join(['{ thickness = "1 mm", material = "C45E" }'] * 51) + "]")
CASES["positions-1001"] = sub('bolt_circle = "72 mm"', "positions = [" + ", ".join(
    f'["{i} mm", "0 mm"]' for i in range(1001)) + "]")
CASES["position-triple"] = sub('bolt_circle = "72 mm"', 'positions = [["1 mm", "0 mm", "0 mm"]]')
CASES["joints-101"] = BASE + "".join(
    f'\n[[pressfit]]\nname = "p{i}"\nfit = "16 H7/s6"\nlength = "14 mm"\nhub_outer_diameter = "40 mm"\n'
    'shaft_material = "C45E"\nhub_material = "C45E"\n' for i in range(101))
CASES["keys-80"] = sub(LENGTH, LENGTH + "\n" + "\n".join(f"k{i} = 1" for i in range(80)))
CASES["key-100-chars"] = sub(LENGTH, LENGTH + "\n" + "k" * 100 + " = 1")
CASES["quoted-key-600"] = sub(LENGTH, LENGTH + '\n"' + "k" * 600 + '" = 1')
CASES["headers-20001"] = BASE + "".join(f"\n[t{i}]" for i in range(20001))
CASES["title-600"] = sub('project = "Corpus base"', 'project = "' + "p" * 600 + '"')
CASES["title-501"] = sub('project = "Corpus base"', 'project = "' + "p" * 501 + '"')
CASES["name-101"] = sub('name = "gear-on-shaft"', 'name = "' + "n" * 101 + '"')
CASES["material-101"] = sub('hub_material = "16MnCr5"', 'hub_material = "' + "M" * 101 + '"')
CASES["multiline-string-600"] = sub('project = "Corpus base"', 'project = """' + "p" * 600 + '"""')
CASES["literal-string-600"] = sub('project = "Corpus base"', "project = '" + "p" * 600 + "'")
CASES["long-int-70"] = sub('count = 4', "count = " + "9" * 70)
CASES["long-int-30"] = sub('count = 4', "count = " + "9" * 30)

# 4. numbers, magnitudes, types
CASES["torque-1e300-plain"] = sub('torque = "3.2 N*m"', "torque = 1e300")
CASES["force-1e300-string"] = sub('axial_force = "60 N"', 'axial_force = "1e300 N"')
CASES["force-1e30-kN"] = sub('axial_force = "60 N"', 'axial_force = "1e30 kN"')
CASES["torque-1e20-string"] = sub('torque = "3.2 N*m"', 'torque = "1e20 N*m"')
CASES["nan"] = sub('count = 4', "count = nan")
CASES["inf"] = sub('count = 4', "count = inf")
CASES["minus-inf"] = sub(LENGTH, "length = -inf")
CASES["count-1e300"] = sub('count = 4', "count = 1e300")
CASES["count-float"] = sub('count = 4', "count = 4.5")
CASES["count-zero"] = sub('count = 4', "count = 0")
CASES["slip-interfaces-inf"] = sub('count = 4', "count = 4\nslip_interfaces = inf")
CASES["slip-interfaces-nan"] = sub('count = 4', "count = 4\nslip_interfaces = nan")
CASES["slip-interfaces-1e300"] = sub('count = 4', "count = 4\nslip_interfaces = 1e300")
CASES["count-bool"] = sub('count = 4', "count = true")
CASES["length-bool"] = sub(LENGTH, "length = true")
CASES["length-date"] = sub(LENGTH, "length = 2025-01-01")
CASES["length-table"] = sub(LENGTH, "length = { value = 14 }")
CASES["speed-1e300"] = sub('speed = "2800 rpm"', "speed = 1e300")

# 5. text that reaches people
for k, ch in {"nul": "\x00", "bel": "\x07", "esc": "\x1b", "rlo": "\u202e", "lro": "\u202d",
              "rli": "\u2067", "pdi": "\u2069", "rlm": "\u200f", "zwsp": "\u200b", "bom-inside": "\ufeff",
              "del": "\x7f", "nel": "\x85", "backspace": "\x08", "form-feed": "\x0c", "newline": "\n",
              "alm": "\u061c"}.items():
    CASES[f"name-{k}"] = sub('name = "gear-on-shaft"', "name = " + toml_str("gear" + ch + "shaft"))
for k, ch in {"nul": "\x00", "rlo": "\u202e", "esc": "\x1b", "bel": "\x07"}.items():
    CASES[f"title-{k}"] = sub('project = "Corpus base"', "project = " + toml_str("Pump" + ch + "X"))
CASES["author-rlo"] = sub('part = "Gearhead"', 'part = "Gearhead"\nauthor = ' + toml_str("A\u202eB"))
CASES["material-source-nul"] = sub('hub_material = "16MnCr5"', 'hub_material = { base = "C45E", source = '
                                   + toml_str("x\x00y") + " }")

# 6. structure and encoding
CASES["invalid-toml"] = sub(LENGTH, "length = ")
CASES["not-utf8"] = BASE.encode("utf-8").replace(b'"14 mm"', b'"14 \xff mm"')
CASES["nul-bytes"] = BASE.encode("utf-8") + b"\x00\x00"
CASES["empty-file"] = ""
CASES["bom-only"] = "\ufeff"
CASES["utf16"] = BASE.encode("utf-16")
CASES["no-joints"] = 'format_version = 1\n\n[title]\nproject = "Nothing"\n'
CASES["version-string"] = BASE.replace("format_version = 1", 'format_version = "1"')
CASES["version-99"] = BASE.replace("format_version = 1", "format_version = 99")
CASES["no-version"] = BASE.replace("format_version = 1", "")
CASES["single-table"] = BASE.replace("[[screws]]", "[screws]")
CASES["pressfit-number"] = 'format_version = 1\npressfit = 5\n'
CASES["duplicate-name"] = BASE.replace('name = "cover-screws"', 'name = "gear-on-shaft"')
CASES["unknown-top"] = BASE.replace("format_version = 1", "format_version = 1\nfrobnicate = 1")
CASES["title-array"] = BASE.replace('[title]\nproject = "Corpus base"\npart = "Gearhead"\n',
                                    "title = [1, 2]\n")
CASES["layers-string"] = sub('layers = [{ thickness = "6 mm", material = "EN AW-6082-T6" }]',
                             'layers = "6 mm"')
CASES["duplicate-key"] = sub(LENGTH, LENGTH + '\nlength = "15 mm"')


def main() -> None:
    OUT.mkdir(exist_ok=True)
    for old in OUT.glob("*.toml"):
        old.unlink()
    for i, (name, text) in enumerate(CASES.items(), 1):
        data = text if isinstance(text, bytes) else text.encode("utf-8")
        (OUT / f"{i:03d}-{name}.toml").write_bytes(data)
    print(f"wrote {len(CASES)} files to {OUT}")


if __name__ == "__main__":
    main()
