"""Widget and display helpers shared by the pages (no physics here: the library decides, we show)."""

from __future__ import annotations

import re
from collections.abc import Iterable, Mapping, Sequence
from typing import TYPE_CHECKING

import streamlit as st

import fitcheck
from fitcheck.errors import InputError
from fitcheck.ui import state, unitsys

if TYPE_CHECKING:  # pandas is imported where a table is made: the first result shows sooner
    import pandas as pd

PASS, FAIL = "✔ holds", "✘ FAILS"
SENSE = {">=": "≥", "<=": "≤"}
_MD = re.compile(r"([\\`*_{}\[\]()<>#+\-.!|~$:=\"'&])")


def esc(text) -> str:
    r"""User text shown literally inside Markdown (``st.markdown``, ``st.error``, labels …).

    Every Markdown, HTML and Streamlit-directive character is escaped with a backslash, so a
    joint name such as ``![x](http://…)`` or ``:red[x]`` shows as typed and adds no image,
    link or colour; line breaks become spaces.

    >>> esc("![x](http://a.b/c.png)")
    '\\!\\[x\\]\\(http\\://a\\.b/c\\.png\\)'
    """
    return _MD.sub(r"\\\1", " ".join(str(text).split()))


# --------------------------------------------------------------------------- page furniture

def caution() -> None:
    """The caution every page carries (``fitcheck.CAUTION``)."""
    st.warning(fitcheck.CAUTION, icon=":material/warning:")


def notice() -> None:
    """A one-off message (``state.NOTICE``), shown on this run only."""
    ss = st.session_state
    msg = ss.pop(state.NOTICE, None)
    ss[state.NOTICE_SHOWN] = msg  # a run ended early by app.first_paint shows it again
    if msg:
        st.info(msg)


# --------------------------------------------------------------------------- inputs bound to the case

INLINE = "(inline table in the case file)"
_INT = re.compile(r"^[+-]?\d+$")
_FLOAT = re.compile(r"^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$")


def _scalar_text(v) -> str:
    if isinstance(v, bool):
        return "true" if v else "false"
    return v if isinstance(v, str) else ("" if v is None else str(v))


def as_text(v) -> str:
    """A document value as the text of an input field (lists as 'a, b' and 'x, y; x, y')."""
    if isinstance(v, dict):
        return INLINE
    if isinstance(v, list):
        if v and all(isinstance(p, list) for p in v):
            return "; ".join(", ".join(_scalar_text(x) for x in p) for p in v)
        return ", ".join(_scalar_text(x) for x in v)
    return _scalar_text(v)


def _number_or_text(t: str):
    if _INT.match(t):
        return int(t)
    if _FLOAT.match(t):
        return float(t)
    return t


def from_text(text: str, old, kind: str = "auto"):
    """A typed text back into a document value.

    ``kind``: "text" keeps text; "bool" gives true/false; "list" reads 'a, b' and
    'x, y; x, y'; "auto" keeps the type the value had (a bare number becomes a
    number when the key was not set).
    """
    t = text.strip()
    if kind == "bool" or isinstance(old, bool):
        low = t.lower()
        return True if low in ("true", "yes", "1") else False if low in ("false", "no", "0") else t
    if kind == "text":
        return t
    if kind == "list" or isinstance(old, list):
        if ";" in t or (isinstance(old, list) and old and all(isinstance(p, list) for p in old)):
            return [[_number_or_text(x.strip()) for x in part.split(",")]
                    for part in t.split(";") if part.strip()]
        if "," in t:
            return [_number_or_text(x.strip()) for x in t.split(",")]
        return _number_or_text(t)
    if isinstance(old, str):
        return t
    return _number_or_text(t)


def pull(entry: dict, wkey: str, key: str, kind: str = "auto") -> None:
    """Before the page is drawn: copy a widget's value into the document, or seed the widget.

    Streamlit holds a changed widget's value in the session before the script
    reruns, so the document (and the results) are up to date before any widget
    is drawn; a widget Streamlit forgot on another page is seeded from the document.
    A value is written back only when its text changed, so the document keeps the
    exact text (and TOML type) it was opened with.
    """
    ss = st.session_state
    if wkey not in ss:
        ss[wkey] = as_text(entry[key]) if key in entry else ""
        return
    v = ss[wkey]
    if not isinstance(v, str):
        if v is not None:
            entry[key] = v
        return
    if v == INLINE and isinstance(entry.get(key), dict):
        return
    if not v.strip():
        entry.pop(key, None)
    elif key not in entry or v != as_text(entry[key]):
        entry[key] = from_text(v, entry.get(key), kind)


def text_field(label: str, wkey: str, help: str | None = None, error: InputError | None = None,
               placeholder: str | None = None) -> None:
    """A text input (a value with its unit) with the library's message for it right below."""
    st.text_input(label, key=wkey, help=help, placeholder=placeholder)
    if error is not None:
        st.error(error_text(error), icon=":material/error:")


def choice_field(label: str, wkey: str, options: Sequence[str], help: str | None = None,
                 error: InputError | None = None, empty: str = "not set") -> None:
    """A selectbox; the empty option ("" = the key is left out of the file) reads ``empty``."""
    ss = st.session_state
    opts = list(options)
    if ss.get(wkey) not in opts:
        if ss.get(wkey):
            opts = [ss[wkey], *opts]  # keep what the file says; the engine names the problem
        else:
            ss[wkey] = opts[0]
    st.selectbox(label, opts, key=wkey, help=help, format_func=lambda o: o if o else empty)
    if error is not None:
        st.error(error_text(error), icon=":material/error:")


def prose(text: str, system: str = "SI") -> str:
    """A sentence of the library in the page's units and unit symbols ("19.8 um" -> "19.8 µm",
    in inch "0.78 thou"); not yet escaped for Markdown."""
    return unitsys.words(unitsys.text_in_system(text, system))


def error_text(e: InputError) -> str:
    """The library's message for one input, as Markdown (user text escaped)."""
    text = f"**{esc(e.field)}**: "
    if e.value is not None and e.value != "":
        text += f"got {esc(repr(e.value))} — "
    text += f"allowed: {esc(e.allowed)}"
    if e.hint:
        text += f" ({esc(e.hint)})"
    return text


def match_errors(errors: Iterable[InputError], label: str, keys: Iterable[str]) -> tuple[dict, list]:
    """Sort the library's errors into those of a key of the joint ``label`` and the rest."""
    by_key: dict[str, InputError] = {}
    rest: list[InputError] = []
    keys = sorted(keys, key=len, reverse=True)
    for e in errors:
        f = e.field
        hit = None
        for k in keys:
            for stem in (f"{label}.{k}", f"conditions.{k}"):
                if f == stem or f.startswith(stem + ".") or f.startswith(stem + "[") \
                        or f.startswith(stem + " "):
                    hit = k
                    break
            if hit:
                break
        if hit and hit not in by_key:
            by_key[hit] = e
        else:
            rest.append(e)
    return by_key, rest


# --------------------------------------------------------------------------- results

def checks_table(checks: Iterable, system: str, joint_of=None) -> pd.DataFrame:
    """Checks as a table: verdict, name, value, limit, margin, reference (values in the unit system).

    ``checks`` are :class:`fitcheck.checks.Check` objects or ``fitcheck.case.CaseCheck``
    (then a joint column is added).
    """
    import pandas as pd

    rows = []
    for c in checks:
        chk = getattr(c, "check", c)
        m = chk.margin
        row = {}
        if hasattr(c, "check"):
            row["joint"] = c.label
        row.update({
            "verdict": PASS if chk.passed else FAIL,
            "check": chk.name,
            "value": unitsys.show_in(chk.value, chk.unit, system),
            "must be": f"{SENSE[chk.sense]} {unitsys.show_in(chk.limit, chk.unit, system)}",
            "margin": unitsys.margin_text(m),
            "reference": chk.reference,
        })
        if chk.note:
            row["note"] = unitsys.words(chk.note)
        rows.append(row)
    return pd.DataFrame(rows)


def show_checks(checks: Sequence, system: str, key: str) -> None:
    df = checks_table(checks, system)
    if df.empty:
        st.info("No checks for this joint.")
        return
    static_table(df, key=key)


#: Verdict cells of a static table, coloured (classes of :data:`fitcheck.ui.app.STYLE`).
VERDICT_CLASS = {PASS: "fc-pass", FAIL: "fc-fail"}


def _cell(v):
    """A cell as shown: numbers the library did not format yet through ``display.num``; a cell a
    row did not fill (None, or NaN from a missing key) is empty."""
    if v is None or (isinstance(v, float) and v != v):
        return ""
    if isinstance(v, bool) or not isinstance(v, int | float):
        return v
    return unitsys.num(v) if isinstance(v, float) else str(v)


#: Cells of at most this many characters are not wrapped (a number and its unit stay together).
SHORT_CELL = 14


def table_html(df: pd.DataFrame) -> str:
    """A static table as HTML: every cell escaped (user text shows as typed), verdicts coloured.

    The class ``fc-table`` marks it (and lets tests read it back with :func:`read_table_html`).
    """
    from html import escape

    head = "".join(f"<th>{escape(str(c))}</th>" for c in df.columns)
    rows = []
    verdict = list(df.columns).index("verdict") if "verdict" in df.columns else -1
    for values in df.itertuples(index=False, name=None):
        cells = []
        for i, v in enumerate(values):
            shown = str(_cell(v))
            text = escape(shown)
            if i == verdict and v in VERDICT_CLASS:
                text = f'<span class="{VERDICT_CLASS[v]}">{text}</span>'
            # a short cell (a value with its unit, "≥ 1.2") keeps on one line; text wraps
            cells.append(f'<td class="fc-nw">{text}</td>' if len(shown) <= SHORT_CELL
                         else f"<td>{text}</td>")
        rows.append("<tr>" + "".join(cells) + "</tr>")
    # the box scrolls sideways on a narrow screen rather than drawing over its neighbours
    return (f'<div class="fc-box"><table class="fc-table"><thead><tr>{head}</tr></thead>'
            f'<tbody>{"".join(rows)}</tbody></table></div>')


def read_table_html(body: str) -> list[list[str]]:
    """The rows of a :func:`table_html` table as text, the header row first (for tests and
    checks of what a page shows)."""
    from html.parser import HTMLParser

    class _Rows(HTMLParser):
        def __init__(self):
            super().__init__()
            self.rows: list[list[str]] = []
            self.cell: list[str] | None = None

        def handle_starttag(self, tag, attrs):
            if tag == "tr":
                self.rows.append([])
            elif tag in ("td", "th"):
                self.cell = []

        def handle_endtag(self, tag):
            if tag in ("td", "th") and self.cell is not None:
                self.rows[-1].append("".join(self.cell))
                self.cell = None

        def handle_data(self, data):
            if self.cell is not None:
                self.cell.append(data)

    p = _Rows()
    p.feed(body)
    return p.rows


def static_table(df: pd.DataFrame, key: str | None = None) -> None:
    """A table that fits the page width and wraps its text columns (no cell cut off; a table too
    wide for its column scrolls sideways in its box); a number not already written as text
    follows ``display.num``.

    Drawn as one HTML element (:func:`table_html`): the browser redraws it far faster on every
    rerun than a data table, and the server sends it without a data-frame conversion.
    """
    del key  # static tables keep no state
    if df.empty:
        return
    st.html(table_html(df))


#: Rows of a long table shown before the rest folds into an expander.
LONG_ROWS = 12


def long_table(df: pd.DataFrame, key: str | None = None, what: str = "rows") -> None:
    """A static table whose first :data:`LONG_ROWS` rows are shown and the rest folded below."""
    static_table(df.iloc[:LONG_ROWS], key=key)
    if len(df) > LONG_ROWS:
        with st.expander(f"All {len(df)} {what}"):
            static_table(df.iloc[LONG_ROWS:], key=None if key is None else f"{key}.rest")


def verdict_banner(ok: bool, worst=None, system: str = "SI", *, checks: Sequence = (),
                   table: str | None = None, name: str | None = None,
                   joint: str | None = None) -> None:
    """Whether every check holds; when not, every failing check with its cause and next step.

    ``checks`` (with ``table`` and ``name`` of the joint) lists the failing ones with the
    library's words (:func:`fitcheck.advice.explain`) and a link that opens the fit search (or
    the seat search) with this joint selected. Without ``checks`` one line names ``worst``.
    ``joint`` (a label such as "pressfit[gear]") heads the banner where several joints are shown.
    """
    from fitcheck import advice

    failing = [c for c in checks if not getattr(c, "check", c).passed]
    if failing and table is not None:
        lines = []
        for c in failing:
            chk = getattr(c, "check", c)
            a = advice.explain(table, chk)
            lines.append(f"- **{esc(chk.name)}**: {_against(chk, system)} — {esc(a.cause)} — "
                         f"*{esc(a.next_step)}*")
        head = ("Does not hold: 1 check fails" if len(failing) == 1 else
                f"Does not hold: {len(failing)} checks fail")
        if joint is not None:
            head = f"**{esc(joint)}** — {head[0].lower()}{head[1:]}"
        st.error(head + "\n\n" + "\n".join(lines), icon=":material/cancel:")
        actions = {advice.explain(table, getattr(c, "check", c)).action for c in failing}
        if name is not None and (advice.FIT_SEARCH in actions or advice.SEAT_SEARCH in actions):
            search_link(table, name, primary=True)
        return
    if worst is None:
        (st.success if ok else st.error)("All checks hold." if ok else "A check fails.")
        return
    chk = getattr(worst, "check", worst)
    where = f"{esc(worst.label)}: " if hasattr(worst, "label") else ""
    mtxt = f" (margin {unitsys.margin_text(chk.margin)})"
    if ok:
        st.success(f"Every check holds. Smallest margin: {where}{esc(chk.name)}{mtxt}.",
                   icon=":material/check_circle:")
    else:
        st.error(f"Does not hold: {where}{esc(chk.name)} — {_against(chk, system)}.",
                 icon=":material/cancel:")


def _against(chk, system: str) -> str:
    return (f"{unitsys.show_in(chk.value, chk.unit, system)} against "
            f"{SENSE[chk.sense]} {unitsys.show_in(chk.limit, chk.unit, system)} "
            f"(margin {unitsys.margin_text(chk.margin)})")


SEARCH_PAGE = "fitcheck/ui/lot_study.py"
QP_SEARCH = "search"   # address parameter: the joint the fit search opens with, "table:name"


def search_link(table: str, name: str, primary: bool = False) -> None:
    """A link to the fit search (press fits) or the seat search (bearings) with this joint chosen."""
    label = "Search fits for this joint" if table == "pressfit" else \
        "Search seat classes for this joint"
    st.page_link(SEARCH_PAGE, label=label, icon=":material/search:",
                 query_params={QP_SEARCH: f"{table}:{name}"},
                 help="Opens the search with this joint selected and runs it.")


def warnings_box(messages: Iterable[str]) -> None:
    msgs = list(messages)
    if msgs:
        st.warning("Outside a method's range of validity:\n\n" + "\n".join(f"- {esc(m)}" for m in msgs))


#: Width of one metric card in a row of figures [px]: three fit the results column of a page.
CARD_WIDTH = 165


def figures(cards: Sequence[tuple[str, str] | tuple[str, str, str | None]],
            width: int = CARD_WIDTH) -> None:
    """Metric cards ``(label, value[, help])`` in one row that wraps to the page width.

    One container instead of a row of columns per three cards: the browser redraws far fewer
    elements on every rerun, and a long label or value wraps instead of being cut off.
    """
    row = st.container(horizontal=True, wrap=True, gap="small")
    for card in cards:
        label, value, *rest = card
        row.metric(label, value, help=rest[0] if rest else None, width=width)


def kv_table(rows: Mapping[str, str] | Sequence[tuple[str, str]], key: str | None = None) -> None:
    import pandas as pd

    items = list(rows.items()) if isinstance(rows, Mapping) else list(rows)
    static_table(pd.DataFrame(items, columns=["quantity", "value"]), key=key)
