"""``fitcheck bearing``: JSON keys, text output with the caution, exit codes, case files."""

import json

from fitcheck import CAUTION

REQUIRED = ["designation", "bore_mm", "outside_mm", "width_mm", "bore_deviation_um",
            "outside_deviation_um", "shaft_interference_um", "housing_clearance_um",
            "clearance_group", "initial_clearance_um", "clearance_reduction_um",
            "operating_clearance_um", "ring_hoop_stress_max_MPa", "checks", "ok"]


def test_json_keys_and_pass(cli):
    code, out, _ = cli("bearing", "6204", "--shaft", "k5", "--housing", "H7", "--group", "C4", "--json")
    d = json.loads(out)
    assert code == 0 and d["ok"] is True
    for k in REQUIRED:
        assert k in d
    assert d["designation"] == "6204" and d["bore_mm"] == 20.0
    assert d["shaft_interference_um"] == [2.0, 21.0]     # ISO 286 k5 18-30, ISO 492 Normal # from memory
    assert d["initial_clearance_um"] == [20.0, 36.0]     # ISO 5753-1 C4 over 18 up to 24 mm # from memory
    assert d["caution"] == CAUTION


def test_failing_check_exit_1(cli):
    code, out, _ = cli("bearing", "6204", "--shaft", "n6", "--housing", "H7", "--group", "C2", "--json")
    assert code == 1 and json.loads(out)["ok"] is False


def test_text_output_has_caution(cli):
    code, out, _ = cli("bearing", "6204", "--shaft", "k5", "--housing", "H7")
    assert code == 0   # group N passes on the mean clearance; the tightest pairing is information
    assert "CAUTION:" in out and "operating clearance" in out and "C4" in out
    # the failure is explained: arithmetic worst case, mid-tolerance clearance, the group that passes
    assert "loses its clearance only in the arithmetic worst case" in out and "Group C4 keeps" in out
    assert "every part at mid-tolerance" in out
    code, out, _ = cli("bearing", "6204", "--shaft", "k5", "--housing", "H7", "--json")
    d = json.loads(out)
    assert d["operating_clearance_mid_um"] > 0 > d["operating_clearance_um"][0]


def test_bad_inputs_exit_2(cli):
    code, _, err = cli("bearing", "6024", "--shaft", "k5")
    assert code == 2 and "did you mean" in err and "Traceback" not in err
    code, _, err = cli("bearing", "6204", "--shaft", "cd6")
    assert code == 2 and "defined at 20 mm" in err
    code, _, err = cli("bearing", "6204", "--t-inner", "-5 K")
    assert code == 2 and "absolute zero" in err
    code, _, err = cli("bearing")
    assert code == 2


def test_case_file_with_conditions(cli, tmp_path):
    f = tmp_path / "case.toml"
    f.write_text('''format_version = 1
[conditions]
temperature_inner = "60 degC"
temperature_outer = "50 degC"

[[bearing]]
name = "A-side"
designation = "6204"
shaft = "k5"
housing = "H7"
clearance_group = "C4"

[[bearing]]
name = "B-side"
designation = "6005"
shaft = "auto"
housing = "auto"
load_level = "light"
clearance_group = "C3"
temperature_inner = "40 degC"
''', encoding="utf-8")
    code, out, _ = cli("bearing", "--case", str(f), "--json")
    d = json.loads(out)
    names = [b["name"] for b in d["bearings"]]
    assert names == ["A-side", "B-side"]
    a, b = d["bearings"]
    assert code in (0, 1) and d["ok"] == (code == 0)
    # [conditions] default used by A, overridden by B: alpha (ti - to) dm = 11.5e-6 × 10 K × 33.5 mm
    assert a["thermal_reduction_um"][1] > 0
    assert b["shaft_class"] == "j6" and b["recommended_shaft"] == "j6"   # DIN 5425-1 light # from memory


def test_case_file_errors_name_the_table(cli, tmp_path):
    f = tmp_path / "bad.toml"
    f.write_text('format_version = 1\n[[bearing]]\nname = "X"\ndesignation = "6204"\nshaft = "q5"\n',
                 encoding="utf-8")
    code, _, err = cli("bearing", "--case", str(f))
    assert code == 2 and "bearing[X].shaft" in err
