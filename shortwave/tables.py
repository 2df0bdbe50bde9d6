"""Tables for people and for programs: aligned text, CSV and JSON.

Used by every subcommand so that all tables look alike.
"""
from __future__ import annotations

import csv
import io
import json
import math

import numpy as np

__all__ = ["format_table", "FORMATS"]

FORMATS = ("text", "csv", "json")


def _cell(v, digits):
    if isinstance(v, str):
        return v
    if v is None:
        return ""
    try:
        fv = float(v)
    except (TypeError, ValueError):
        return str(v)
    if math.isnan(fv):
        return "nan"
    if fv == 0 or (1e-3 <= abs(fv) < 1e6):
        return f"{fv:.{digits}g}"
    return f"{fv:.{digits - 1}e}"


def format_table(columns, *, fmt="text", units=None, digits=5, title=None):
    """Format a table given as an ordered mapping ``name -> sequence``.

    Parameters
    ----------
    columns : dict of str to sequence
        Column name to values; all columns have the same length.
    fmt : {"text", "csv", "json"}
        Aligned text for people, CSV or JSON (a list of records) for programs.
    units : dict of str to str, optional
        Units shown under the header (text), in the header as ``name [unit]`` (CSV),
        or as a ``units`` object (JSON).
    digits : int
        Significant digits for floats in text and CSV.
    title : str, optional
        A line printed above a text table (ignored for CSV/JSON).

    Returns
    -------
    str
    """
    units = units or {}
    names = list(columns)
    cols = [list(np.ravel(np.asarray(columns[n], dtype=object))) for n in names]
    nrow = len(cols[0]) if cols else 0
    if any(len(c) != nrow for c in cols):
        raise ValueError("format_table: columns have different lengths")
    if fmt == "json":
        def conv(v):
            if isinstance(v, (str, type(None))):
                return v
            try:
                fv = float(v)
            except (TypeError, ValueError):
                return str(v)
            return None if math.isnan(fv) else fv
        records = [{n: conv(c[i]) for n, c in zip(names, cols)} for i in range(nrow)]
        return json.dumps({"units": {n: units.get(n, "") for n in names}, "rows": records},
                          indent=1)
    if fmt == "csv":
        buf = io.StringIO()
        w = csv.writer(buf, lineterminator="\n")
        w.writerow([f"{n} [{units[n]}]" if units.get(n) else n for n in names])
        for i in range(nrow):
            w.writerow([_cell(c[i], digits + 3) for c in cols])
        return buf.getvalue().rstrip("\n")
    if fmt != "text":
        raise ValueError(f"format: unknown {fmt!r}; choose one of {', '.join(FORMATS)}")
    body = [[_cell(c[i], digits) for c in cols] for i in range(nrow)]
    head = [names, [f"[{units.get(n, '')}]" if units.get(n) else "" for n in names]]
    widths = [max(len(r[j]) for r in head + body) for j in range(len(names))]
    lines = [] if title is None else [title]
    for r in head:
        lines.append("  ".join(s.rjust(w) for s, w in zip(r, widths)).rstrip())
    lines.append("  ".join("-" * w for w in widths))
    for r in body:
        lines.append("  ".join(s.rjust(w) for s, w in zip(r, widths)))
    return "\n".join(lines)
