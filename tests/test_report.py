"""Calculation reports of the demo case in HTML and PDF, through the library and the CLI."""

from __future__ import annotations

import html
import re

import pypdf
import pytest

from fitcheck import CAUTION, report
from fitcheck import case as case_mod
from fitcheck.report import DEFERENCE


@pytest.fixture(scope="module")
def demo_result():
    return case_mod.evaluate(case_mod.demo_case())


@pytest.fixture(scope="module")
def demo_html(demo_result):
    return report.to_html(demo_result)


@pytest.fixture(scope="module")
def demo_pdf(demo_result, tmp_path_factory):
    p = tmp_path_factory.mktemp("pdf") / "demo.pdf"
    report.write(demo_result, p)
    return p


def _method_refs(result):
    refs = set()
    for j in result.joints:
        for step, ref in report._method_steps(case_mod.ENGINES[j.table].method_notes()):
            assert step
            if ref:
                refs.add(ref)
    return refs


def _squash(s: str) -> str:
    return re.sub(r"\s+", "", s)


def test_html_holds_every_check_and_every_cited_clause(demo_result, demo_html):
    assert demo_result.ok
    for c in demo_result.checks:
        assert html.escape(c.check.name) in demo_html
        assert c.check.reference and html.escape(c.check.reference) in demo_html
    refs = _method_refs(demo_result)
    assert len(refs) >= 10
    for ref in refs:
        assert html.escape(ref) in demo_html, ref


def test_html_is_self_contained_with_plots_signatures_and_caution(demo_result, demo_html):
    assert demo_html.startswith("<!DOCTYPE html>")
    assert "http://" not in demo_html and "https://" not in demo_html and "<script" not in demo_html
    # press fit: zone diagram + wall stresses + capacity band; each bearing: two seat zones +
    # clearance budget; screws: joint diagram
    assert demo_html.count("data:image/png;base64,") == 3 + 2 * 3 + 1
    assert "Plot not drawn" not in demo_html
    for role in report.SIGNATURE_ROLES:
        assert role in demo_html
    esc = html.escape(CAUTION)
    assert demo_html.count(esc) == 2
    assert demo_html.index(esc) < demo_html.index("Summary") < demo_html.rindex(esc)
    assert demo_html.count(html.escape(DEFERENCE)) == 2
    # inputs with units, from to_mapping
    assert "16 H7/s6" in demo_html and "3.2 N*m" in demo_html and "EN AC-46000" in demo_html


def test_html_escapes_every_user_string():
    hostile = '<script>alert("x")</script> & "Q"'
    text = case_mod.demo_text().replace('project = "Benchtop pump BP-20"',
                                        f"project = '{hostile}'")
    text = text.replace('name = "cover-screws"', 'name = "<b>cover</b>"')
    out = report.to_html(case_mod.loads(text))
    assert "<script>" not in out and "<b>cover</b>" not in out
    assert html.escape(hostile) in out and "&lt;b&gt;cover&lt;/b&gt;" in out


def test_pdf_opens_and_its_text_holds_every_check(demo_result, demo_pdf):
    reader = pypdf.PdfReader(str(demo_pdf))
    assert len(reader.pages) > 0
    text = "\n".join(p.extract_text() for p in reader.pages)
    flat = _squash(text)
    for c in demo_result.checks:
        assert _squash(c.check.name) in flat, c.check.name
        assert _squash(c.check.reference) in flat, c.check.reference
    for ref in _method_refs(demo_result):
        assert _squash(ref) in flat, ref
    assert _squash(CAUTION) in flat and flat.count(_squash(CAUTION)) == 2
    assert "Calculatedby" in flat and "Approvedby" in flat
    assert reader.metadata.title.startswith("Calculation report: Benchtop pump")


def test_pdf_text_is_truetype(demo_pdf):
    reader = pypdf.PdfReader(str(demo_pdf))
    fonts = reader.pages[0]["/Resources"]["/Font"]
    subtypes = {fonts[k].get_object()["/Subtype"] for k in fonts}
    assert "/Type3" not in subtypes  # pdf.fonttype = 42: TrueType, searchable text


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
