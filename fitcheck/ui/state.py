"""The working case of a browser session and how it survives page switches and reloads.

* The working case is a TOML *document* (the mapping a case file parses to) in
  ``st.session_state[DOC]``. Every input widget writes into it, so a value typed
  on one page is there on every other page, in the report and in the download.
* Widget keys are namespaced ``<page>.<joint>.<key>`` (``pf.gear-on-shaft.length``);
  when Streamlit forgets a widget on another page, it is re-made from the document.
* After every run the document is put into the page address (query parameter
  ``case``: zlib + base64url of the TOML text) whenever it differs from the demo,
  so a reload or a bookmarked address brings the work back. The unit system
  (``u``) and the fit on the fit-limits page (``fit``) travel the same way.
* The document is parsed only as TOML (``fitcheck.tomlread``: 1 MiB cap, nothing executed)
  and validated by the case loader ``fitcheck.case``.
"""

from __future__ import annotations

import base64
import binascii
import copy
import threading
import zlib
from collections import OrderedDict
from collections.abc import Iterable

import streamlit as st

from fitcheck import case as casefile
from fitcheck import tomlwrite
from fitcheck.errors import InputError, InputErrors
from fitcheck.tomlread import MAX_BYTES, read_toml_bytes
from fitcheck.ui import unitsys

DOC = "case.doc"            # the working document (dict)
UNITS = "units.system"      # "SI" or "inch"
MEMO = "units.memo"         # text written by a unit switch -> the text it replaced
NOTICE = "case.notice"      # a one-off message (e.g. an address that could not be read)
NOTICE_SHOWN = "case.notice.shown"  # the one-off message this run showed
QP_CASE, QP_UNITS, QP_FIT = "case", "u", "fit"

#: Widget-key prefixes of inputs that mirror the document (cleared when the document is replaced).
DOC_PREFIXES = ("pf.", "br.", "sc.", "cond.", "title.")


# --------------------------------------------------------------------------- encoding

def encode(text: str) -> str:
    """Compact, address-safe form of a TOML text: zlib, then base64url without padding."""
    raw = zlib.compress(text.encode("utf-8"), 9)
    return base64.urlsafe_b64encode(raw).decode("ascii").rstrip("=")


def decode(token: str) -> str:
    """The TOML text back from :func:`encode`; :class:`InputError` when it is not one."""
    try:
        raw = base64.urlsafe_b64decode(token + "=" * (-len(token) % 4))
        d = zlib.decompressobj()
        out = d.decompress(raw, MAX_BYTES + 1)
    except (binascii.Error, ValueError, zlib.error):
        raise InputError("address", "case=…", "a case saved by this program") from None
    if len(out) > MAX_BYTES or d.unconsumed_tail:
        raise InputError("address", "case=…", f"a case of at most {MAX_BYTES} bytes")
    try:
        return out.decode("utf-8")
    except UnicodeDecodeError:
        raise InputError("address", "case=…", "a case saved by this program") from None


#: TOML texts of recent documents by the ``repr`` of the document (writing TOML costs about 10 ms
#: a case; a page asks for the text of the same document several times a run and on every rerun).
_TEXTS: OrderedDict[str, str] = OrderedDict()
_TEXTS_MAX = 256
_TEXTS_LOCK = threading.Lock()


def doc_text(doc: dict) -> str:
    """The document as TOML text (as a case file would hold it, without the header).

    Remembered by the ``repr`` of the document: a document holds only TOML's plain values
    (text, numbers, booleans, dates, lists, tables), whose ``repr`` tells every two apart
    (``1``, ``1.0`` and ``True``; ``'1'`` and ``1``), so equal keys mean equal texts.
    """
    key = repr(doc)
    with _TEXTS_LOCK:
        text = _TEXTS.get(key)
        if text is not None:
            _TEXTS.move_to_end(key)
            return text
    text = tomlwrite.dumps(doc)  # raises for a value TOML cannot hold: nothing is remembered
    with _TEXTS_LOCK:
        _TEXTS[key] = text
        while len(_TEXTS) > _TEXTS_MAX:
            _TEXTS.popitem(last=False)
    return text


@st.cache_data(show_spinner=False)
def demo_doc_text() -> str:
    """The demo case as normalised TOML text (the address stays empty while it is unchanged)."""
    try:
        text = casefile.demo_text()
    except FileNotFoundError:  # an installation without the demo file: an empty case
        text = f"format_version = {casefile.FORMAT_VERSION}\n"
    return doc_text(read_toml_bytes(text.encode("utf-8"), "demo case"))


def demo_doc() -> dict:
    return read_toml_bytes(demo_doc_text().encode("utf-8"), "demo case")


def parse_text(text: str | bytes, source: str = "case file") -> dict:
    """Parse TOML into a document and validate it with the case loader (raises on bad input)."""
    raw = text.encode("utf-8") if isinstance(text, str) else bytes(text)
    doc = read_toml_bytes(raw, source)
    casefile.from_document(doc, source=source)
    return doc


# --------------------------------------------------------------------------- session

def init() -> None:
    """Open the working case once per session: from the address if it holds one, else the demo."""
    ss = st.session_state
    if UNITS not in ss:
        u = st.query_params.get(QP_UNITS, "SI")
        ss[UNITS] = u if u in unitsys.SYSTEMS else "SI"
    if DOC in ss:
        return
    token = st.query_params.get(QP_CASE)
    if token:
        try:
            linked = read_toml_bytes(decode(token).encode("utf-8"), "address")
            casefile.check_limits(linked)  # sizes, counts, control characters: refused whole
            ss[DOC] = linked
            return
        except (InputError, InputErrors) as exc:
            ss[NOTICE] = f"The case in the address could not be read ({exc.message}); the demo is open."
    demo = demo_doc()
    ss.setdefault("cf.source_text", casefile.demo_text())  # saving keeps the demo file's comments
    # the demo is written in SI: an address asking for inch units gets it in inch, like the switch
    ss[DOC] = demo if ss[UNITS] == "SI" else _convert(demo, ss[UNITS], ss.setdefault(MEMO, {}))


def doc() -> dict:
    """The working document (mutable: widgets write into it)."""
    return st.session_state[DOC]


def system() -> str:
    return st.session_state.get(UNITS, "SI")


def replace_doc(new: dict) -> None:
    """Put a new document in place (an upload, the demo) and forget the widgets that mirrored the old."""
    st.session_state[DOC] = copy.deepcopy(new)
    st.session_state[MEMO] = {}
    forget_widgets(DOC_PREFIXES)


def forget_widgets(prefixes: Iterable[str]) -> None:
    prefixes = tuple(prefixes)
    for k in [k for k in st.session_state if isinstance(k, str) and k.startswith(prefixes)]:
        del st.session_state[k]


def sync_address() -> None:
    """Write the working case (when not the demo) and the unit system into the page address."""
    qp = st.query_params
    text = doc_text(doc())
    want = None if text == demo_doc_text() else encode(text)
    if want is None:
        if QP_CASE in qp:
            del qp[QP_CASE]
    elif qp.get(QP_CASE) != want:
        qp[QP_CASE] = want
    if system() == "SI":
        if QP_UNITS in qp:
            del qp[QP_UNITS]
    elif qp.get(QP_UNITS) != system():
        qp[QP_UNITS] = system()


def remember(key: str, value: str | None) -> None:
    """Keep a page value (not part of the case) in the address, e.g. the fit being looked at."""
    qp = st.query_params
    if value is None:
        if key in qp:
            del qp[key]
    elif qp.get(key) != value:
        qp[key] = value


# --------------------------------------------------------------------------- unit switch

def switch_units() -> None:
    """Callback of the unit-system switch: rewrite every input of the case in the new system."""
    ss = st.session_state
    new = ss.get("ui.units", "SI")
    memo: dict = ss.setdefault(MEMO, {})
    ss[UNITS] = new
    ss[DOC] = _convert(ss[DOC], new, memo)
    forget_widgets(DOC_PREFIXES)


def convert(obj):
    """A part of a document written in SI, rewritten in the session's unit system (as the switch)."""
    return _convert(obj, system(), st.session_state.setdefault(MEMO, {}))


def _convert(obj, system_name: str, memo: dict, key: str = ""):
    if isinstance(obj, dict):
        return {k: (v if k in ("name", "title", "format_version")
                    else _convert(v, system_name, memo, k)) for k, v in obj.items()}
    if isinstance(obj, list):
        return [_convert(v, system_name, memo, key) for v in obj]
    if isinstance(obj, str):
        if obj in memo:  # switching back: the text the user had, exactly
            return memo[obj]
        out = unitsys.convert_text(obj, system_name)
        if out != obj:
            memo[out] = obj
        return out
    return obj


# --------------------------------------------------------------------------- joints

def joints(table: str) -> list[dict]:
    """The joint tables of one kind in the working document (the live mappings)."""
    entries = doc().get(table, [])
    return [e for e in entries if isinstance(e, dict)] if isinstance(entries, list) else []


def joint(table: str, name: str) -> dict | None:
    for e in joints(table):
        if e.get("name") == name:
            return e
    return None


def single_joint_doc(table: str, name: str) -> dict:
    """A document holding only the shared parts and one joint (to check it on its own)."""
    d = doc()
    out = {k: v for k, v in d.items() if k in ("format_version", "title", "conditions")}
    entry = joint(table, name)
    out[table] = [entry] if entry is not None else []
    return out


def errors_by_field(exc: InputError | InputErrors) -> list[InputError]:
    return list(exc.errors) if isinstance(exc, InputErrors) else [exc]
