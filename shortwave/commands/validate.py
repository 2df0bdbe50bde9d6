"""``shortwave validate``: every comparison of the models with published references.

Prints the table that the test-suite asserts (:mod:`shortwave.validation`): quantity,
model value, reference value, unit, tolerance, source and pass/fail.  ``--csv FILE``
writes the same table as CSV.  The exit status is 1 when any check fails, 0 otherwise.
"""
from __future__ import annotations

import os

from ..tables import FORMATS, format_table

NAME = "validate"
HELP = "compare the models with published reference values (the table the tests use)"
DESCRIPTION = (
    "Run every comparison of the models with published references, standards and "
    "reference libraries, and print quantity, model value, reference value, unit, "
    "tolerance, source and pass/fail.  The test-suite runs exactly these rows.  Exit "
    "status 1 when any row fails.")

COLUMNS = ("id", "quantity", "model", "reference", "unit", "tolerance", "source", "result")


def add_arguments(parser):
    parser.add_argument("--topic", default=None,
                        help="only the checks of one topic (e.g. water, radar, films)")
    parser.add_argument("--csv", metavar="FILE", default=None,
                        help="also write the table as CSV to FILE")
    parser.add_argument("--format", choices=FORMATS, default="text",
                        help="how to print the table")
    parser.add_argument("--failed-only", action="store_true",
                        help="print only the rows that fail")


def results_table(results):
    """Return the validation results as ordered columns for :func:`format_table`."""
    rows = [r.row() for r in results]
    return {c: [row[c] for row in rows] for c in COLUMNS}


def write_text_atomic(text, path):
    """Write ``text`` to ``path`` through a temporary file and a rename; return the path."""
    import tempfile
    path = os.fspath(path)
    folder = os.path.dirname(os.path.abspath(path))
    if not os.path.isdir(folder):
        raise OSError(f"--csv: folder {folder} does not exist")
    if not os.access(folder, os.W_OK):
        raise OSError(f"--csv: folder {folder} is not writable")
    fd, tmp = tempfile.mkstemp(prefix=".tmp-", suffix=".csv", dir=folder)
    try:
        with os.fdopen(fd, "w", encoding="utf-8", newline="") as fh:
            fh.write(text)
        os.replace(tmp, path)
    finally:
        if os.path.exists(tmp):
            os.remove(tmp)
    return path


def run(args):
    from ..validation import all_checks, evaluate
    checks = all_checks()
    if args.topic is not None:
        topics = sorted({c.topic for c in checks})
        if args.topic not in topics:
            raise ValueError(f"--topic: unknown topic {args.topic!r}; choose one of: "
                             f"{', '.join(topics)}")
        checks = [c for c in checks if c.topic == args.topic]
    results = [evaluate(c) for c in checks]
    if args.csv:
        write_text_atomic(format_table(results_table(results), fmt="csv", digits=7) + "\n",
                           args.csv)
    shown = [r for r in results if not r.passed] if args.failed_only else results
    n_fail = sum(not r.passed for r in results)
    title = (f"{len(results)} comparisons with published references: "
             f"{len(results) - n_fail} pass, {n_fail} fail")
    print(format_table(results_table(shown), fmt=args.format, digits=5,
                       title=title if args.format == "text" else None))
    if args.csv and args.format == "text":
        print(f"wrote {args.csv}")
    return 1 if n_fail else 0
