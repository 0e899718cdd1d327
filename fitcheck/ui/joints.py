"""One joint of the working case on a page: its inputs as widgets, checked and evaluated by the library.

Every kind of joint (``[[pressfit]]``, ``[[bearing]]``, ``[[screws]]``) is edited the
same way:

1. :func:`bind` copies changed widget values into the working document (or seeds
   widgets Streamlit forgot on another page);
2. :func:`evaluate` checks that one joint with the case loader and evaluates it
   (cached on the joint's TOML text), returning the result or the input errors;
3. :func:`draw_inputs` draws the widgets, grouped, each with its own error right below.

The widgets are keyed ``<prefix>.<joint name>.<key>`` so a value survives page switches.
"""

from __future__ import annotations

import re
import warnings
from collections.abc import Mapping, Sequence
from dataclasses import dataclass

import streamlit as st

from fitcheck import case as casefile
from fitcheck import materials
from fitcheck.errors import InputError, InputErrors
from fitcheck.tomlread import read_toml_bytes
from fitcheck.ui import state, widgets

AS_IN_FILE = "(as in the case file)"


@dataclass(frozen=True)
class Field:
    key: str
    label: str = ""
    options: tuple[str, ...] = ()     # a choice among these (free text when empty)
    material: bool = False            # a material name or an inline table from the file
    kind: str = "auto"                # how typed text is stored: auto, text, bool, list


def label_of(key: str) -> str:
    return key.replace("_", " ").capitalize()


def default_of(description: str) -> str | None:
    """The default a KEYS description states, e.g. '(default 2.5 um)' -> 'default 2.5 um'."""
    m = re.search(r"\((default[^()]*)\)", description)
    return m.group(1) if m else None


def _empty(description: str) -> str:
    d = default_of(description)
    return f"({d})" if d else "(not set)"


def _empty_for(key: str, description: str) -> str:
    inherited = _inherited(key)
    return f"({inherited})" if inherited else _empty(description)


def wkey(prefix: str, name: str, key: str) -> str:
    return f"{prefix}.{name}.{key}"


def names(table: str) -> list[str]:
    return [str(e.get("name")) for e in state.joints(table) if e.get("name")]


def pick_joint(table: str, prefix: str, what: str) -> str | None:
    """A selector of the joints of one kind in the case; None when the case has none."""
    ns = names(table)
    if not ns:
        st.info(f"The open case has no {what}. Open a case file that has one "
                f"(page *Case file and report*) or restore the demo there.")
        return None
    key = f"{prefix}.joint"
    stored = st.session_state.get(f"{key}.value")
    if st.session_state.get(key) not in ns:
        st.session_state[key] = stored if stored in ns else ns[0]
    chosen = st.selectbox(f"{what.capitalize()} of the case", ns, key=key)
    st.session_state[f"{key}.value"] = chosen
    return chosen


def bind(table: str, prefix: str, name: str, fields: Sequence[Field]) -> dict:
    """Bring the widget values of one joint into the working document (see module docstring)."""
    entry = state.joint(table, name)
    if entry is None:
        return {}
    ss = st.session_state
    for f in fields:
        k = wkey(prefix, name, f.key)
        if f.material:
            current = entry.get(f.key)
            if k in ss:
                v = ss[k]
                if v and v != AS_IN_FILE:
                    entry[f.key] = v
                elif not v:
                    entry.pop(f.key, None)
            else:
                ss[k] = AS_IN_FILE if isinstance(current, Mapping) else (current or "")
        else:
            widgets.pull(entry, k, f.key, f.kind)
    return entry


def _error_tuple(e: InputError) -> tuple:
    return (e.field, e.value, e.allowed, e.hint)


@st.cache_data(show_spinner=False, max_entries=128)
def _evaluate_text(text: str) -> tuple[object | None, list[tuple], list[str]]:
    """Check and evaluate a one-joint case given as TOML text (pickle-safe result)."""
    doc = read_toml_bytes(text.encode("utf-8"), "case")
    with warnings.catch_warnings(record=True) as caught:
        warnings.simplefilter("always")
        try:
            case = casefile.from_document(doc)
            result = casefile.evaluate(case)
        except (InputError, InputErrors) as exc:
            return None, [_error_tuple(e) for e in state.errors_by_field(exc)], []
    msgs = list(dict.fromkeys(str(w.message) for w in caught
                              if not issubclass(w.category, DeprecationWarning)))
    return result, [], msgs


def evaluate(table: str, name: str):
    """``(JointResult or None, [InputError], [warning texts])`` of one joint of the working case."""
    text = state.doc_text(state.single_joint_doc(table, name))
    result, errs, msgs = _evaluate_text(text)
    joint = result.joints[0] if result is not None and result.joints else None
    if joint is not None:
        msgs = list(dict.fromkeys([*msgs, *joint.warnings]))
    return joint, [InputError(*t) for t in errs], msgs


def draw_inputs(table: str, prefix: str, name: str, groups: Sequence[tuple[str, Sequence[Field]]],
                keys: Mapping[str, str], errors: Sequence[InputError], expanded: int = 1) -> None:
    """The grouped input widgets of one joint, each error beside its field; others at the end."""
    label = casefile.joint_label(table, name)
    all_keys = [f.key for _, fs in groups for f in fs]
    by_key, rest = widgets.match_errors(errors, label, all_keys)
    for i, (title, fs) in enumerate(groups):
        bad = any(f.key in by_key for f in fs)
        with st.expander(title + (" — check the inputs" if bad else ""), expanded=(i < expanded) or bad,
                         icon=":material/error:" if bad else None):
            cols = st.columns(2)
            for j, f in enumerate(fs):
                with cols[j % 2]:
                    _draw(prefix, name, f, keys.get(f.key, ""), by_key.get(f.key))
    for e in rest:
        st.error(widgets.error_text(e), icon=":material/error:")


def _inherited(key: str) -> str | None:
    """The value a joint takes from the case's [conditions] when it does not state its own."""
    cond = state.doc().get("conditions", {})
    if isinstance(cond, Mapping) and key in cond:
        return f"from the case conditions: {widgets.as_text(cond[key])}"
    return None


def _draw(prefix: str, name: str, f: Field, description: str, error: InputError | None) -> None:
    k = wkey(prefix, name, f.key)
    lab = f.label or label_of(f.key)
    inherited = _inherited(f.key)
    if inherited:
        description = f"{description} — left empty, the joint takes the shared condition"
    if f.material:
        opts = list(materials.names())
        if st.session_state.get(k) == AS_IN_FILE:
            opts = [AS_IN_FILE, *opts]
        widgets.choice_field(lab, k, ["", *opts] if st.session_state.get(k) == "" else opts,
                             help=description, error=error, empty=_empty_for(f.key, description))
    elif f.options:
        opts = list(f.options)
        if st.session_state.get(k, "") == "":
            opts = ["", *opts]
        widgets.choice_field(lab, k, opts, help=description, error=error,
                             empty=_empty_for(f.key, description))
    else:
        widgets.text_field(lab, k, help=description, error=error,
                           placeholder=inherited or default_of(description))


def grouped(keys: Mapping[str, str], groups: Sequence[tuple[str, Sequence[str | Field]]],
            more: str = "More inputs") -> list[tuple[str, list[Field]]]:
    """Groups of fields from key names (or Fields); KEYS not named in a group go to ``more``."""
    out, seen = [], set()
    for title, items in groups:
        fs = []
        for it in items:
            f = it if isinstance(it, Field) else Field(it)
            if f.key in keys:
                fs.append(f)
                seen.add(f.key)
        if fs:
            out.append((title, fs))
    left = [Field(k) for k in keys if k not in seen and k != "name"]
    if left:
        out.append((more, left))
    return out
