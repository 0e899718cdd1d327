"""Page "Case file and report": open and save the TOML case, edit the title block, get the report.

An upload is read only as TOML through ``fitcheck.tomlread`` (1 MiB cap, nothing
executed) and checked by the case loader before it replaces the working case;
a file with problems is listed with every problem and opened only on request.
"""

from __future__ import annotations

import io
import re

import streamlit as st

import fitcheck
from fitcheck import case as casefile
from fitcheck import report
from fitcheck.errors import InputError, InputErrors
from fitcheck.tomlread import read_toml_bytes
from fitcheck.ui import app, inch, state, widgets

TITLE_KEYS = casefile.TITLE_KEYS
PENDING = "cf.pending"      # a parsed upload with problems, waiting for "open anyway"
SEEN = "cf.seen"            # file id of the last upload handled
SOURCE = "cf.source_text"   # the text of the opened file (its comments are kept on saving)


def case_text() -> str:
    """The working case as a case file: the opened file with the changed values rewritten
    (its comments kept), or a header with the caution and the TOML. Raises for a value the
    case loader refuses, so such a case is never saved."""
    head = "\n".join("# " + line for line in _wrap("fitcheck design case. " + fitcheck.CAUTION))
    return casefile.document_text(state.doc(), st.session_state.get(SOURCE), head + "\n")


def _wrap(text: str, width: int = 96) -> list[str]:
    lines, cur = [], ""
    for word in text.split():
        if len(cur) + len(word) + 1 > width:
            lines.append(cur)
            cur = word
        else:
            cur = f"{cur} {word}".strip()
    return [*lines, cur] if cur else lines


def file_stem() -> str:
    t = state.doc().get("title", {})
    parts = [str(t.get(k, "")) for k in ("project", "part", "revision")] if isinstance(t, dict) else []
    stem = "-".join(p for p in parts if p) or "case"
    return re.sub(r"[^A-Za-z0-9._-]+", "_", stem).strip("_")[:80] or "case"


@st.cache_data(show_spinner=False, max_entries=8)
def _report(text: str, fmt: str) -> bytes:
    """The report of a case text as HTML or PDF bytes (cached: the same case gives the same file)."""
    case = casefile.loads(text)
    rep = report.build(casefile.evaluate(case))
    try:
        if fmt == "html":
            return report.to_html(rep).encode("utf-8")
        buf = io.BytesIO()
        report.to_pdf(rep, buf)
        return buf.getvalue()
    finally:
        rep.close()


def report_bytes(fmt: str) -> bytes:
    return _report(state.doc_text(state.doc()), fmt)


def _handle_upload(upload) -> None:
    ss = st.session_state
    if upload is None or ss.get(SEEN) == upload.file_id:
        return
    ss[SEEN] = upload.file_id
    raw = upload.getvalue()
    try:
        doc = read_toml_bytes(raw, upload.name)
    except InputError as e:
        ss["cf.upload_errors"] = [e]
        ss.pop(PENDING, None)
        return
    try:
        casefile.from_document(doc, source=upload.name)
    except (InputError, InputErrors) as exc:
        ss["cf.upload_errors"] = state.errors_by_field(exc)
        ss[PENDING] = doc
        ss["cf.pending_text"] = raw.decode("utf-8")
        return
    state.replace_doc(doc)
    ss[SOURCE] = raw.decode("utf-8")
    ss.pop("cf.upload_errors", None)
    ss.pop(PENDING, None)
    ss["cf.opened"] = upload.name


def _open_pending() -> None:
    ss = st.session_state
    doc = ss.pop(PENDING, None)
    if doc is not None:
        state.replace_doc(doc)
        ss[SOURCE] = ss.pop("cf.pending_text", None)
        ss.pop("cf.upload_errors", None)
        ss["cf.opened"] = "the uploaded file (with the problems marked on the joint pages)"


def _new_case() -> None:
    """An empty case: the format version and a title block to fill in, no joints."""
    state.replace_doc({"format_version": casefile.FORMAT_VERSION,
                       "title": {k: "" for k in ("project", "part")}})
    st.session_state["cf.opened"] = "a new, empty case: fill in its title block and add joints " \
        "on the pages Press fit, Bearing seats and Housing screws"


def _restore_demo() -> None:
    state.replace_doc(state.demo_doc())
    st.session_state[SOURCE] = casefile.demo_text()
    st.session_state["cf.opened"] = "the demo case"


def render() -> None:
    app.heading("Case file and report", "Open or save the design case as a TOML file, fill in "
                "the title block, and download the calculation report.")
    ss = st.session_state
    left, right = st.columns(2, gap="large")
    with left:
        st.subheader("Open a case file")
        upload = st.file_uploader("Case file (.toml, at most 1 MB)", type=["toml"],
                                  key="cf.upload", help="Read as TOML only and checked before it "
                                  "replaces the open case; nothing in the file is executed.")
        _handle_upload(upload)
        if ss.get("cf.opened"):
            st.success(f"Opened {widgets.esc(ss.pop('cf.opened'))}.")
        for e in ss.get("cf.upload_errors", []):
            st.error(widgets.error_text(e), icon=":material/error:")
        if ss.get(PENDING) is not None:
            st.button("Open it anyway and correct it here", key="cf.open_anyway",
                      on_click=_open_pending)
        st.button("Start a new, empty case", key="cf.new", on_click=_new_case,
                  icon=":material/note_add:", help="Replaces the open case with an empty one "
                  "(title block only). Download your case first to keep it.")
        st.button("Restore the demo case", key="cf.demo", on_click=_restore_demo,
                  help="Replaces the open case with the demo (gearhead of a benchtop pump). "
                  "Download your case first to keep it.")
        inch.demo_button()  # the inch demo (fitcheck/ui/inch.py)
        st.subheader("Save the case")
        try:
            text = case_text()
        except (InputError, InputErrors) as exc:
            st.warning("The case file can be saved once these inputs are corrected:")
            for e in state.errors_by_field(exc):
                st.error(widgets.error_text(e), icon=":material/error:")
        else:
            st.download_button("Download the case file (.toml)", text,
                               file_name=f"{file_stem()}.toml", mime="application/toml",
                               key="cf.download_toml", icon=":material/download:")
            with st.expander("Case file text"):
                st.code(text, language="toml")
        st.subheader("Calculation report")
        _report_buttons()
    with right:
        st.subheader("Title block")
        title = state.doc().setdefault("title", {})
        if not isinstance(title, dict):
            st.error("The title block of this case is not a table; it is kept as it is.")
        else:
            for k in TITLE_KEYS:
                wk = f"title.{k}"
                widgets.pull(title, wk, k)
                st.text_input(k.capitalize(), key=wk,
                              help="date: e.g. 2025-03-14" if k == "date" else None)
            if not title:
                state.doc().pop("title", None)
        _conditions()


def _conditions() -> None:
    st.subheader("Shared conditions")
    st.caption("Defaults every joint takes unless it states its own value.")
    doc = state.doc()
    cond = doc.get("conditions", {})
    if not isinstance(cond, dict):
        return
    keys = list(dict.fromkeys([*casefile.CONDITION_KEYS, *cond]))
    errors = []
    try:
        casefile.from_document({k: v for k, v in doc.items()
                                if k in ("format_version", "conditions")})
    except (InputError, InputErrors) as exc:
        errors = state.errors_by_field(exc)
    by_key, _ = widgets.match_errors(errors, "conditions", keys)
    cols = st.columns(2)
    for i, k in enumerate(keys):
        wk = f"cond.{k}"
        widgets.pull(cond, wk, k)
        with cols[i % 2]:
            widgets.text_field(k.replace("_", " ").capitalize(), wk, error=by_key.get(k))
    if cond:
        doc["conditions"] = cond
    else:
        doc.pop("conditions", None)


def _report_buttons() -> None:
    text = state.doc_text(state.doc())
    try:
        casefile.loads(text)
    except (InputError, InputErrors) as exc:
        st.warning("The report needs a case without input problems:")
        for e in state.errors_by_field(exc):
            st.error(widgets.error_text(e), icon=":material/error:")
        return
    st.caption("The report carries the inputs, the method with its clauses, every check, the "
               "plots, the caution and signature lines.")
    c = st.columns(2)
    stem = file_stem()
    c[0].download_button("Report as HTML", lambda: _report(text, "html"),
                         file_name=f"{stem}-report.html", mime="text/html", key="cf.report_html",
                         icon=":material/article:", type="primary")
    c[1].download_button("Report as PDF", lambda: _report(text, "pdf"),
                         file_name=f"{stem}-report.pdf", mime="application/pdf",
                         key="cf.report_pdf", icon=":material/picture_as_pdf:", type="primary")


if __name__ == "__main__":
    render()
