"""Calculation reports of the demo case in HTML and PDF, through the library and the CLI.

The PDF is read back with pypdf (an independent reader): the text a reviewer sees must hold
every check and clause, in words and printed units, with no word broken across a line, and
page 1 must hold the decisions for the drawing. Images of every page are written to
``build/test-artefacts/report/`` (or ``$FITCHECK_ARTEFACTS``) for people to look at; nothing
is asserted on pixels.
"""

from __future__ import annotations

import html
import io
import math
import os
import re
import shutil
import subprocess
from pathlib import Path

import markupsafe
import pypdf
import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

from fitcheck import CAUTION, report
from fitcheck import case as case_mod
from fitcheck.report import DEFERENCE, figures

ROOT = Path(__file__).resolve().parent.parent
ARTEFACTS = Path(os.environ.get("FITCHECK_ARTEFACTS", ROOT / "build" / "test-artefacts"))
SNAKE = re.compile(r"(?<![\w./])[a-z]{2,}(?:_[a-z0-9]{2,})+(?![\w])")


@pytest.fixture(scope="module")
def demo_result():
    return case_mod.evaluate(case_mod.demo_case())


@pytest.fixture(scope="module")
def demo_report(demo_result):
    return report.build(demo_result)


@pytest.fixture(scope="module")
def demo_html(demo_report):
    return report.to_html(demo_report)


@pytest.fixture(scope="module")
def demo_pdf(demo_report, tmp_path_factory):
    p = tmp_path_factory.mktemp("pdf") / "demo.pdf"
    report.write(demo_report, p)
    return p


@pytest.fixture(scope="module")
def pdf_pages(demo_pdf):
    return [p.extract_text() for p in pypdf.PdfReader(str(demo_pdf)).pages]


def _method_refs(result):
    refs = set()
    for j in result.joints:
        for step, ref in report.model.method_steps(case_mod.ENGINES[j.table].method_notes()):
            assert step
            if ref:
                refs.add(report.words.prose(ref))
    return refs


def _whole(phrase: str, text: str) -> bool:
    """The phrase is in the text with its words whole (line breaks only where it had spaces)."""
    words = phrase.split()
    return re.search(r"\s+".join(re.escape(w) for w in words), text) is not None


def _html_text(page: str) -> str:
    return html.unescape(re.sub(r"<[^>]+>", " ", re.sub(r"<style.*?</style>", "", page, flags=re.S)))


def _engine_keys():
    keys = set(case_mod.CONDITION_KEYS)
    for eng in case_mod.ENGINES.values():
        keys |= set(eng.keys())
    return {k for k in keys if "_" in k}


def _readable(text: str) -> None:
    assert "degC" not in text and "from memory" not in text.lower()
    assert not re.search(r"\bum\b", text), re.search(r".{40}\bum\b.{20}", text)
    assert "+∞" not in text and "10143" not in text
    assert not SNAKE.findall(text), SNAKE.findall(text)[:10]
    for k in _engine_keys():
        assert not re.search(rf"(?<![\w.]){re.escape(k)}(?!\w)", text), k


# --------------------------------------------------------------------------- PDF

def test_pdf_holds_every_check_and_clause_with_whole_words(demo_result, pdf_pages):
    text = "\n".join(pdf_pages)
    for c in demo_result.checks:
        name = report.words.prose(c.check.name)
        assert _whole(name, text), name
        assert _whole(report.words.prose(c.check.reference), text), c.check.reference
    refs = _method_refs(demo_result)
    assert len(refs) >= 10
    for ref in refs:
        assert _whole(ref, text), ref
    for j in demo_result.joints:  # joint names are never split (they used to break mid-word)
        assert f"“{j.name}”" in text, j.name
    for line in text.splitlines():  # no word ends a line cut before its last letters
        assert not re.search(r"[A-Za-z]-$", line.strip()), line


def test_pdf_text_reads_in_words_and_printed_units(pdf_pages):
    text = "\n".join(pdf_pages)
    _readable(text)
    assert "µm" in text and "°C" in text and "N·m" in text
    assert _whole("— value to be confirmed against the printed standard", text)
    assert _whole("Source of the friction coefficients: μ: DIN 7190-1:2017", text)
    assert "> 10×" in text  # margin of the fatigue check, formatted as in the app
    assert _whole("mean roughness depth Rz of the shaft", text)


def test_pdf_page_one_holds_the_drawing_decisions(pdf_pages):
    first = pdf_pages[0]
    assert "For the drawing" in first
    for piece in ("Ø16 H7/s6", "16.018 mm / 16.000 mm", "16.039 mm / 16.028 mm",  # ISO 286-2
                  "press-in force", "press capacity 20000 N", "Ø15 k5", "15.009 mm / 15.001 mm",
                  "Ø35 H7", "radial internal clearance group", "C4", "4.0 N·m",
                  "tightening method", "αA = 2"):
        assert piece in first, piece


def test_pdf_pages_carry_caution_page_numbers_signatures_and_metadata(demo_pdf, pdf_pages):
    n = len(pdf_pages)
    squash = [re.sub(r"\s+", "", p) for p in pdf_pages]
    for i, p in enumerate(squash, 1):
        assert re.sub(r"\s+", "", CAUTION) in p  # the caution runs along every page
        assert f"page{i}of{n}" in p
    flat = "".join(squash)
    assert re.sub(r"\s+", "", DEFERENCE) in flat
    assert "Calculatedby" in flat and "Approvedby" in flat
    reader = pypdf.PdfReader(str(demo_pdf))
    assert reader.metadata.title.startswith("Calculation report: Benchtop pump")
    fonts = reader.pages[0]["/Resources"]["/Font"]
    subtypes = {fonts[k].get_object()["/Subtype"] for k in fonts}
    assert "/Type3" not in subtypes  # embedded TrueType: searchable text


def test_pdf_repeats_table_headers_and_keeps_headings_with_their_tables(pdf_pages):
    headings = {"Inputs", "Method", "Results", "Plots", "For the drawing",
                "Summary of the checks", "Shared conditions"}
    for i, page in enumerate(pdf_pages, 1):
        lines = [ln.strip() for ln in page.splitlines() if ln.strip()]
        foot = max(k for k, ln in enumerate(lines) if ln.startswith("Caution."))
        body = lines[:foot]
        assert body and body[-1] not in headings, (i, body[-1:])  # no heading left at a page foot
        if any(ln in ("pass", "FAIL") for ln in body):  # a page with rows of a check table ...
            assert "MarginVerdictReference" in re.sub(r"\s+", "", page), i  # ... has its header


def test_pdf_page_images_as_artefacts(demo_pdf):
    out = ARTEFACTS / "report"
    out.mkdir(parents=True, exist_ok=True)
    for old in out.glob("page-*.png"):
        old.unlink()
    if shutil.which("pdftoppm"):
        subprocess.run(["pdftoppm", "-r", "70", "-png", str(demo_pdf), str(out / "page")],
                       check=True, timeout=600)
    else:
        try:
            import pypdfium2 as pdfium
        except ImportError:
            pytest.skip("neither pdftoppm (poppler-utils) nor pypdfium2 to draw the pages")
        for i, page in enumerate(pdfium.PdfDocument(str(demo_pdf)), 1):
            page.render(scale=1).to_pil().save(out / f"page-{i:02d}.png")
    assert len(list(out.glob("page-*.png"))) == len(pypdf.PdfReader(str(demo_pdf)).pages)


# --------------------------------------------------------------------------- HTML

def test_html_is_self_contained_from_the_template(demo_result, demo_html):
    assert demo_html.startswith("<!DOCTYPE html>")
    assert "http://" not in demo_html and "https://" not in demo_html and "<script" not in demo_html
    # press fit: zone diagram + wall stresses + capacity band; each bearing: two seat zones +
    # clearance budget; screws: joint diagram
    assert demo_html.count("<figure><svg ") == 3 + 2 * 3 + 1  # vector charts, inline
    assert "Plot not drawn" not in demo_html
    assert "@media print" in demo_html and "display:table-header-group" in demo_html
    for role in report.SIGNATURE_ROLES:
        assert role in demo_html
    esc = str(markupsafe.escape(CAUTION))
    assert demo_html.count(esc) == 2
    assert demo_html.index("For the drawing") < demo_html.index(esc) < demo_html.index("Summary")
    assert demo_html.count(str(markupsafe.escape(DEFERENCE))) == 2


def test_html_holds_every_check_clause_and_input_in_words(demo_result, demo_html):
    text = _html_text(demo_html)
    _readable(text)
    for c in demo_result.checks:
        assert _whole(report.words.prose(c.check.name), text)
        assert _whole(report.words.prose(c.check.reference), text)
    for ref in _method_refs(demo_result):
        assert _whole(ref, text), ref
    assert "16 H7/s6" in text and "3.2 N·m" in text and "EN AC-46000" in text
    assert "ISO 286 fit" in text and "length of the joint L" in text


def test_html_escapes_every_user_string():
    hostile = '<script>alert("x")</script> & "Q"'
    text = case_mod.demo_text().replace('project = "Benchtop pump BP-20"',
                                        f"project = '{hostile}'")
    text = text.replace('name = "cover-screws"', 'name = "<b>cover</b>"')
    out = report.to_html(report.build(case_mod.loads(text), plots=False))
    assert "<script>" not in out and "<b>cover</b>" not in out
    assert str(markupsafe.escape(hostile)) in out and "&lt;b&gt;cover&lt;/b&gt;" in out
    assert hostile in html.unescape(out)


# --------------------------------------------------------------------------- units

def test_inch_report_gives_limits_in_both_systems(demo_result):
    rep = report.build(demo_result, plots=False, system="inch")
    items = {i.item: i.decision for b in rep.drawing for i in b.items}
    hole = items["hole Ø16 H7"]
    assert "16.018 mm" in hole and "(0.63063 in)" in hole  # 16.018 / 25.4
    rows = {r.name: r for r in rep.summary}
    assert rows["press-in force"].value.endswith("lbf")
    assert rows["operating radial clearance (mean, probable combination)"].value.endswith(" in")
    assert items["tightening torque (wrench setting)"].endswith("lbf·in")
    text = _html_text(report.to_html(rep))
    assert "Units: inch system" in text and "°F" in text


def test_plots_follow_the_unit_system():
    from fitcheck.fits import fit
    from fitcheck.plots.fits import plot_fit

    fig = plot_fit(fit("16 H7/s6"))
    figures.to_system(fig, "inch")
    ax = fig.axes[0]
    assert "[in]" in ax.get_ylabel() and "µm" not in ax.get_ylabel()
    labels = [t.get_text() for t in ax.get_yticklabels()]
    assert any("0.001" in s for s in labels), labels  # 39 µm ≈ 0.0015 in
    assert "+0.00154" in [t.get_text() for t in ax.texts]  # 39 µm written on the zone


def test_margin_texts_as_in_the_app():
    from fitcheck.checks import Check

    assert report.model.check_margin(Check("x", 101.4, 1.0, ">=")) == "> 10×"
    assert report.model.check_margin(Check("x", 5.0, 0.0, ">=")) == "—"
    assert report.format_margin(0.253) == "+25.3 %"


def test_added_check_fields_and_notes_appear_without_changes():
    import dataclasses

    from fitcheck.checks import Check

    @dataclasses.dataclass(frozen=True)
    class StateCheck(Check):
        state: str = ""

    row = report.model.check_row("j", StateCheck("hub yield", 1.3, 1.2, ">=", "", "DIN 7190-1",
                                                 "at rz_shaft", state="hot_start"),
                                 "SI", {})
    assert "hot start" in row.note and "Rz_shaft" in row.note


# --------------------------------------------------------------------------- CLI

def test_report_command_html_and_pdf(cli, tmp_path):
    src = tmp_path / "pump.toml"
    src.write_text(case_mod.demo_text(), encoding="utf-8")
    for name in ("r.html", "r.pdf"):
        code, out, err = cli("report", str(src), "-o", str(tmp_path / name))
        assert code == 0, err
        assert CAUTION in out
    assert (tmp_path / "r.html").read_text(encoding="utf-8").startswith("<!DOCTYPE html>")
    assert (tmp_path / "r.pdf").read_bytes().startswith(b"%PDF")
    assert sorted(p.name for p in tmp_path.iterdir()) == ["pump.toml", "r.html", "r.pdf"]


def test_report_command_refuses_unknown_suffix_and_bad_case(cli, tmp_path):
    src = tmp_path / "pump.toml"
    src.write_text(case_mod.demo_text(), encoding="utf-8")
    code, _, err = cli("report", str(src), "-o", str(tmp_path / "r.docx"))
    assert code == 2 and ".html" in err and "Traceback" not in err
    src.write_text(case_mod.demo_text().replace('thread = "M5"', 'thread = "M4.5"'), encoding="utf-8")
    code, _, err = cli("report", str(src), "-o", str(tmp_path / "r.html"))
    assert code == 2 and "screws[cover-screws].thread" in err
    assert not (tmp_path / "r.html").exists()


def test_report_of_a_failing_case_says_fail_and_exits_1(cli, tmp_path):
    src = tmp_path / "weak.toml"
    src.write_text(case_mod.demo_text().replace('torque = "3.2 N*m"', 'torque = "32 N*m"'),
                   encoding="utf-8")
    code, out, _ = cli("report", str(src), "-o", str(tmp_path / "weak.html"))
    assert code == 1 and "FAILS" in out
    page = (tmp_path / "weak.html").read_text(encoding="utf-8")
    assert 'class="fail">FAIL' in page and "at least one check FAILS" in page


# --------------------------------------------------------------------------- plots as vector charts

def _chart_texts(fig):
    return [op[3] for op in fig.chart.ops if op[0] == "text"]


def test_plots_are_vector_charts_with_the_library_values(demo_report):
    figs = [f for s in demo_report.sections for f in s.figures]
    assert len(figs) == 10 and all(f.chart is not None and f.png == b"" for f in figs)
    zone = figs[0]
    texts = _chart_texts(zone)
    # ISO 286-2:2010, Tables 2 and 3: Ø16 H7 = 0 … +18 µm, s6 (over 14 to 18 mm) = +28 … +39 µm
    for t in ("+18", "0", "+39", "+28", "hole", "H7", "shaft", "s6"):
        assert t in texts, t
    assert "deviation from nominal size [µm]" in texts
    screw = demo_report.sections[-1].figures[0]
    assert any(t.startswith("FM,zul = ") and t.endswith(" kN") for t in _chart_texts(screw))


def test_plot_charts_follow_the_inch_system(demo_result):
    rep = report.build(demo_result, system="inch")
    texts = [t for s in rep.sections for f in s.figures for t in _chart_texts(f)]
    joined = " ".join(texts)
    for unit in ("[thou]", "[ksi]", "[in]", "[lbf·in]", "[klbf]"):
        assert unit in joined, unit
    assert "µm" not in joined and "MPa" not in joined and "N·m" not in joined
    zone = rep.sections[0].figures[0]
    assert "+1.535" in _chart_texts(zone)  # 39 µm = 1.535 thou (1 thou = 25.4 µm exactly)


def test_chart_text_is_searchable_in_the_pdf(pdf_pages):
    text = "\n".join(pdf_pages)
    assert "deviation from nominal size [µm]" in text and "radial clearance [µm]" in text


def test_chart_svg_escapes_user_strings():
    from fitcheck.report import chart

    ch = chart.Chart('<script>alert("x")</script> & j', xlabel="x [mm]")
    ch.add(chart.Line([0.0, 1.0], [0.0, 2.0], label="<b>l</b>"))
    svg = chart.to_svg(chart.layout(ch))
    assert "<script>" not in svg and "<b>" not in svg and "&lt;script&gt;" in svg
    assert chart.to_drawing(chart.layout(ch), 200.0).width == pytest.approx(200.0)


@settings(max_examples=150, deadline=None)
@given(st.floats(-1e6, 1e6), st.floats(1e-6, 1e6))
def test_nice_ticks_are_round_and_inside(lo, span):
    from fitcheck.report.chart import nice_ticks

    hi = lo + span
    ticks, step = nice_ticks(lo, hi)
    assert 1 <= len(ticks) <= 7
    mant = step / 10 ** math.floor(math.log10(step))
    assert any(math.isclose(mant, m, rel_tol=1e-9) for m in (1, 2, 2.5, 5, 10))
    tol = 1e-9 * max(abs(lo), abs(hi), step)
    assert all(lo - tol <= t <= hi + tol for t in ticks)


def test_a_plot_without_chart_builder_is_still_drawn_as_png(demo_result, monkeypatch):
    from fitcheck.report import charts

    spec = "fitcheck.plots.screws:plot_joint_diagram"
    monkeypatch.delitem(charts.BUILDERS, spec)
    rep = report.build(demo_result)
    screw = rep.sections[-1].figures
    assert len(screw) == 1 and screw[0].chart is None and screw[0].png.startswith(b"\x89PNG")
    assert report.to_html(rep).count("data:image/png;base64,") == 1
    buf = io.BytesIO()
    report.to_pdf(rep, buf)
    assert buf.getvalue().startswith(b"%PDF")


def test_charts_of_a_plastic_hub_and_an_opening_joint(demo_result):
    import warnings

    from fitcheck import screws
    from fitcheck.pressfit import PressFitInput
    from fitcheck.pressfit import evaluate as evaluate_pressfit
    from fitcheck.report import chart, charts

    gear = {"name": "alu gear", "interference_min": "90 um", "interference_max": "140 um",
            "diameter": "20 mm", "length": "12 mm", "hub_outer_diameter": "30 mm",
            "shaft_material": "C45E", "hub_material": "EN AW-6082-T6", "torque": "15 N*m",
            "design": "elastic-plastic"}
    cover = dict(demo_result.joints[-1].input.to_mapping(), load_eccentricity="3 mm",
                 interface_depth="14 mm", tilting_moment="40 N*m")
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        pf = evaluate_pressfit(PressFitInput.from_mapping(gear))
        sj = screws.evaluate(screws.ScrewJointInput.from_mapping(cover))
    for system, mm in (("SI", "mm"), ("inch", "in")):
        walls = chart.layout(charts.wall_stresses(pf, system))
        assert any(op[3].startswith("plastic zone to Ø") and op[3].endswith(f"{mm} deep)")
                   for op in walls.ops if op[0] == "text")
        joint = chart.layout(charts.joint_diagram(sj, system))
        assert any(op[3].startswith("opening at FAab = ") for op in joint.ops if op[0] == "text")
        assert "<svg" in chart.to_svg(joint) and chart.to_drawing(walls, 300.0).width == 300.0


def test_gear_seat_inputs_are_named_in_words_and_angles_in_degrees():
    # the input table of an elastic-plastic gear seat with derived shaft loads: every key in words
    # (no name cut at a parenthesis or a colon of its description), angles as a drawing gives them
    text = """format_version = 1
[[pressfit]]
name = "g"
diameter = "20 mm"
interference_min = "40 um"
interference_max = "75 um"
length = "16 mm"
module = "1.5 mm"
teeth = 22
helix_angle = "15 deg"
bearing_distance_a = "15 mm"
bearing_distance_b = "45 mm"
shaft_material = "42CrMo4"
hub_material = "C45E"
torque = "25 N*m"
design = "elastic-plastic"
plastic_zone_limit = 0.25
"""
    rep = report.build(case_mod.evaluate(case_mod.loads(text)), plots=False)
    rows = {r.name: r.value for s in rep.sections for r in s.inputs}
    assert rows["normal module of the gear m"] == "1.5 mm"
    assert rows["permitted plastic-zone share of the hub wall"] == "0.25"
    assert rows["design of the press fit"] == "elastic-plastic"
    assert rows["helix angle β of the gear"] == "15°"
    assert "gear m" not in rows and "elastic-plastic design" not in rows
    page = html.unescape(report.to_html(rep))
    assert "at most permitted plastic-zone share of the hub wall" in page
    assert "fretting fatigue of the shaft" not in page  # it is checked now (DIN 743)


def test_inch_report_gives_the_shaft_loads_and_check_notes_in_inch_units(demo_result):
    # the loads the shaft check used (M, T, F, mesh forces) read in the case's system, as the CLI's
    # --units inch prints them; the demo gear: M = 1.497 N·m, T = 3.2 N·m, F = 60 N
    # (1 lbf·in = 0.112984829 N·m, 1 lbf = 4.4482216 N: NIST SP 811)
    rep = report.build(demo_result, plots=False, system="inch")
    gear = rep.sections[0]
    loads = next(n for n in gear.notes if n.startswith("shaft loads at the hub edge"))
    assert "M = 13.25 lbf·in" in loads and "T = 28.32 lbf·in pulsating" in loads and "F = 13.49 lbf" in loads
    assert "N·m" not in loads and " N," not in loads
    fat = next(r for r in gear.checks if r.name == "shaft fatigue at the hub edge")
    assert "ksi" in fat.note and "MPa" not in fat.note
    si = report.build(demo_result, plots=False, system="SI").sections[0]
    assert any("M = 1.497 N·m" in n for n in si.notes)
