"""``shortwave validate``: every comparison of the models with published references.

Prints the table that the test-suite asserts (:mod:`shortwave.validation`): quantity,
model value, reference value, unit, tolerance, source and pass/fail.  ``--csv FILE``
writes the same table as CSV.  The exit status is 1 when any check fails, 0 otherwise.
"""
from __future__ import annotations

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


def results_table(results, reasons=False):
    """Return the validation results as ordered columns for :func:`format_table`.

    With ``reasons`` a last column gives why each tolerance was chosen.
    """
    rows = [r.row() for r in results]
    cols = {c: [row[c] for row in rows] for c in COLUMNS}
    if reasons:
        cols["tolerance_reason"] = [r.check.tolerance_reason for r in results]
        cols["error"] = [r.error for r in results]
    return cols


def _num(v):
    try:
        return f"{float(v):.6g}"
    except (TypeError, ValueError):
        return str(v)


def text_report(results):
    """The results for people: grouped by topic, three lines per comparison."""
    lines = []
    topic = None
    for r in results:
        c = r.check
        if c.topic != topic:
            topic = c.topic
            lines += ["", f"== {topic} =="]
        row = r.row()
        lines.append(f"{row['result'].upper():5s} {c.id}")
        lines.append(f"      {c.quantity}: model {_num(r.model)}, reference "
                     f"{_num(c.reference)} {c.unit} ({row['tolerance']})")
        lines.append(f"      source: {c.source}")
        if r.error:
            lines.append(f"      error: {r.error}")
    return "\n".join(lines)


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
        from ..demo import write_text_atomic
        try:
            write_text_atomic(format_table(results_table(results, reasons=True), fmt="csv",
                                           digits=7) + "\n",
                              args.csv)
        except OSError as exc:
            raise OSError(f"--csv: {exc}") from None
    shown = [r for r in results if not r.passed] if args.failed_only else results
    n_fail = sum(not r.passed for r in results)
    title = (f"{len(results)} comparisons with published references: "
             f"{len(results) - n_fail} pass, {n_fail} fail")
    if args.format == "text":
        print(title)
        print(text_report(shown))
    else:
        print(format_table(results_table(shown), fmt=args.format, digits=5))
    if args.csv and args.format == "text":
        print(f"wrote {args.csv}")
    return 1 if n_fail else 0
