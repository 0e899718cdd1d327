"""What a page shows in its tables, read back from an AppTest run for the tests to compare."""

from __future__ import annotations

import pandas as pd

from fitcheck.ui.widgets import read_table_html


def tables(at) -> list[pd.DataFrame]:
    """Every results table of the page: the static HTML tables (``widgets.static_table``) read
    back as text, then any Streamlit table or data frame (input editors, the inch-fit table)."""
    out = []
    for h in at.html:
        if 'class="fc-table"' in h.value:
            rows = read_table_html(h.value)
            out.append(pd.DataFrame(rows[1:], columns=rows[0]))
    out += [d.value for d in [*at.dataframe, *at.table]]
    return out


def chart(el) -> tuple[pd.DataFrame, dict, dict[str, pd.DataFrame]]:
    """A browser chart's main data, its spec, and its named datasets (the reference lines)."""
    import json

    import pyarrow as pa

    from fitcheck.ui.charts import MAIN

    named = {d.name: pa.ipc.open_stream(d.data.data).read_pandas() for d in el.proto.datasets}
    frame = (named.pop(MAIN) if MAIN in named
             else pa.ipc.open_stream(el.proto.data.data).read_pandas())
    return frame, json.loads(el.proto.spec), named


def layer_rows(el) -> list[list[dict]]:
    """The rows of every chart layer that brings data of its own (inline or a named dataset), in
    layer order: the reference lines and the zero line."""
    _, spec, named = chart(el)
    out = []
    for layer in spec.get("layer", []):
        data = layer.get("data")
        if not data:
            continue
        if "values" in data:
            out.append(list(data["values"]))
        else:
            out.append(named[data["name"]].to_dict("records"))
    return out


def open_groups(at, page: str):
    """Open every input group of a joint page (``press_fit``, ``bearing_seat``,
    ``housing_screws``) and rerun: a closed group's widgets are not drawn."""
    import importlib

    from fitcheck.ui import joints

    mod = importlib.import_module(f"fitcheck.ui.{page}")
    for title, _ in mod.fields():
        at.session_state[joints.group_key(mod.PREFIX, title)] = True
    return at.run()
