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

import copy
import re
import warnings
from collections.abc import Mapping, Sequence
from dataclasses import dataclass

import streamlit as st

from fitcheck import case as casefile
from fitcheck import materials
from fitcheck.errors import InputError, InputErrors
from fitcheck.tomlread import read_toml_bytes
from fitcheck.ui import app, state, unitsys, widgets

AS_IN_FILE = "(as in the case file)"


@dataclass(frozen=True)
class Field:
    key: str
    label: str = ""
    options: tuple[str, ...] = ()     # a choice among these (free text when empty)
    material: bool = False            # a material name or an inline table from the file
    kind: str = "auto"                # how typed text is stored: auto, text, bool, list


#: Words of key names written as the trade writes them in a label.
_WORDS = {"mu": "μ", "rz": "Rz", "rp02": "Rp0.2", "od": "OD", "id": "ID"}


def label_of(key: str) -> str:
    """A key name as a label: ``mu_slip`` -> "μ slip", ``rz_shaft`` -> "Rz shaft"."""
    words = [_WORDS.get(w, w) for w in key.split("_")]
    text = " ".join(words)
    return text[:1].upper() + text[1:] if words[0] not in _WORDS.values() else text


def default_of(description: str) -> str | None:
    """The default a KEYS description states, e.g. '(default 2.5 um)' -> 'default 2.5 um'."""
    m = re.search(r"\((default[^()]*)\)", description)
    return m.group(1) if m else None


def _empty(description: str) -> str:
    d = default_of(description)
    return f"({unitsys.words(d)})" if d else "(not set)"


def _empty_for(key: str, description: str) -> str:
    inherited = _inherited(key)
    return f"({inherited})" if inherited else _empty(description)


def wkey(prefix: str, name: str, key: str) -> str:
    return f"{prefix}.{name}.{key}"


def names(table: str) -> list[str]:
    return [str(e.get("name")) for e in state.joints(table) if e.get("name")]


NEW_NAMES = {"pressfit": "press-fit", "bearing": "bearing", "screws": "screws"}


def pick_joint(table: str, prefix: str, what: str) -> str | None:
    """A selector of the joints of one kind in the case, with add, duplicate, rename and delete.

    None when the case has none (then only "add" is offered).
    """
    ns = names(table)
    key = f"{prefix}.joint"
    if not ns:
        st.info(f"The open case has no {what}. Add one here, or open a case file that has one "
                "(page *Case file and report*).")
        st.button(f"Add a {what}", key=f"{prefix}.add", icon=":material/add:", type="primary",
                  on_click=add_joint, args=(table, prefix))
        return None
    stored = st.session_state.get(f"{key}.value")
    if st.session_state.get(key) not in ns:
        st.session_state[key] = stored if stored in ns else ns[0]
    if app.headline_only():  # the picker follows with the rest of the page
        return st.session_state[key]
    c = st.columns([3, 2], vertical_alignment="bottom")
    chosen = c[0].selectbox(f"{what.capitalize()} of the case", ns, key=key)
    st.session_state[f"{key}.value"] = chosen
    with c[1].popover("Add, rename, delete", icon=":material/edit:", width="stretch"):
        _manage(table, prefix, what, chosen)
    return chosen


def _manage(table: str, prefix: str, what: str, name: str) -> None:
    ss = st.session_state
    a, b = st.columns(2)
    a.button(f"New {what}", key=f"{prefix}.add", icon=":material/add:", width="stretch",
             on_click=add_joint, args=(table, prefix),
             help="Adds a joint of this kind with the demo's inputs, to be edited.")
    b.button("Duplicate", key=f"{prefix}.duplicate", icon=":material/content_copy:",
             width="stretch", on_click=duplicate_joint, args=(table, prefix, name),
             help="Adds a copy of this joint with all its inputs.")
    rk = f"{prefix}.rename"
    if ss.get(f"{rk}.of") != name:  # a fresh field for each joint
        ss[rk], ss[f"{rk}.of"] = name, name
    st.text_input("Name", key=rk, help="Renaming keeps every input of the joint.")
    st.button("Rename", key=f"{prefix}.rename.button", on_click=rename_joint,
              args=(table, prefix, name), icon=":material/drive_file_rename_outline:")
    msg = ss.pop(f"{prefix}.manage.error", None)
    if msg:
        st.error(msg, icon=":material/error:")
    st.divider()
    st.button(f"Delete {widgets.esc(name)}", key=f"{prefix}.delete", icon=":material/delete:",
              on_click=delete_joint, args=(table, prefix, name), type="primary",
              help="Removes this joint from the case (download the case first to keep it).")


def _unique(base: str, taken: Sequence[str]) -> str:
    if base not in taken:
        return base
    i = 2
    while f"{base}-{i}" in taken:
        i += 1
    return f"{base}-{i}"


def _select(prefix: str, name: str) -> None:
    ss = st.session_state
    ss[f"{prefix}.joint"] = name
    ss[f"{prefix}.joint.value"] = name


def _entries(table: str) -> list:
    doc = state.doc()
    entries = doc.get(table)
    if not isinstance(entries, list):
        entries = doc[table] = []
    return entries


def template(table: str) -> dict:
    """The inputs a new joint of a kind starts with: the demo case's first joint of that kind."""
    for e in state.demo_doc().get(table, []):
        if isinstance(e, dict):
            out = copy.deepcopy(e)
            out.pop("name", None)
            return out
    return {}


def add_joint(table: str, prefix: str) -> None:
    name = _unique(NEW_NAMES.get(table, table), names(table))
    entry = {"name": name, **template(table)}
    if state.system() != "SI":  # the demo is written in SI: rewrite it as the unit switch does
        entry = state.convert(entry)
    _entries(table).append(entry)
    _select(prefix, name)


def duplicate_joint(table: str, prefix: str, name: str) -> None:
    entry = state.joint(table, name)
    if entry is None:
        return
    new = _unique(f"{name}-copy", names(table))
    copied = copy.deepcopy(entry)
    copied["name"] = new
    _entries(table).insert(_entries(table).index(entry) + 1, copied)
    _move_widgets(prefix, name, new, keep=True)
    _select(prefix, new)


def rename_joint(table: str, prefix: str, name: str) -> None:
    ss = st.session_state
    new = " ".join(str(ss.get(f"{prefix}.rename", "")).split())
    entry = state.joint(table, name)
    if entry is None or new == name:
        return
    if not new:
        ss[f"{prefix}.manage.error"] = "A joint needs a name."
        return
    if new in names(table):
        ss[f"{prefix}.manage.error"] = f"Another joint is named {widgets.esc(new)}."
        return
    entry["name"] = new
    _move_widgets(prefix, name, new)
    ss[f"{prefix}.rename.of"] = new
    _select(prefix, new)


def delete_joint(table: str, prefix: str, name: str) -> None:
    entries = _entries(table)
    entry = state.joint(table, name)
    if entry is None:
        return
    entries.remove(entry)
    if not entries:
        state.doc().pop(table, None)
    _forget(prefix, name)
    rest = names(table)
    if rest:
        _select(prefix, rest[0])


def _own_keys(prefix: str, name: str) -> list[str]:
    """Session keys of one joint's widgets (``<prefix>.<name>.<key>``), not of a joint whose name
    merely starts with ``name.``."""
    head = f"{prefix}.{name}."
    others = [n for n in names_all(prefix) if n != name and n.startswith(name + ".")]
    out = []
    for k in list(st.session_state):
        if isinstance(k, str) and k.startswith(head):
            if any(k.startswith(f"{prefix}.{o}.") for o in others):
                continue
            out.append(k)
    return out


def names_all(prefix: str) -> list[str]:
    table = {"pf": "pressfit", "br": "bearing", "sc": "screws"}.get(prefix)
    return names(table) if table else []


def _move_widgets(prefix: str, old: str, new: str, keep: bool = False) -> None:
    ss = st.session_state
    for k in _own_keys(prefix, old):
        nk = f"{prefix}.{new}." + k[len(f"{prefix}.{old}."):]
        if nk.endswith(("_chart", ".button", ".use_suggested", ".editor")):
            continue  # charts, buttons and table editors are made anew (from the document)
        try:
            ss[nk] = ss[k]
        except Exception:  # noqa: BLE001 - a widget value Streamlit will not let us set
            continue
        if not keep:
            del ss[k]


def _forget(prefix: str, name: str) -> None:
    for k in _own_keys(prefix, name):
        del st.session_state[k]


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
    ss = st.session_state
    for i, (title, fs) in enumerate(groups):
        bad = any(f.key in by_key for f in fs)
        gk = group_key(prefix, title)
        if bad:
            ss[gk] = True  # a group holding an error opens, so the message is seen
        group = st.expander(title + (" — check the inputs" if bad else ""), expanded=i < expanded,
                            icon=":material/error:" if bad else None, key=gk, on_change="rerun")
        if not group.open:
            # a closed group's widgets are not drawn at all (the page reruns faster). Their
            # values live in the document (``bind`` took them in before); the session forgets
            # the widgets, so they are seeded from the document again when the group opens
            for f in fs:
                ss.pop(wkey(prefix, name, f.key), None)
            continue
        with group:
            cols = st.columns(2)
            for j, f in enumerate(fs):
                with cols[j % 2]:
                    _draw(prefix, name, f, keys.get(f.key, ""), by_key.get(f.key))
    for e in rest:
        st.error(widgets.error_text(e), icon=":material/error:")


def group_key(prefix: str, title: str) -> str:
    """Session key of an input group's open/closed state on a page (shared by the page's joints)."""
    return f"ui.group.{prefix}.{title}"


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
    description = unitsys.words(description)
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
                           placeholder=unitsys.words(inherited or default_of(description) or "")
                           or None)


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
