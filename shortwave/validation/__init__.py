"""Comparisons of the models with published references: one table for tests and report.

Every topic module in this package (``water``, ``spectrum``, ``radar``, ``films``, ...)
defines ``CHECKS``: a list of :class:`Check`.  The test-suite runs every check
(``tests/test_validation_table.py``) and ``shortwave validate`` prints and writes the same
table, so the report shows exactly what the tests assert.
"""
from __future__ import annotations

import importlib
import pkgutil
from dataclasses import dataclass, field
from typing import Callable

import numpy as np

__all__ = ["Check", "Result", "all_checks", "run_checks"]


@dataclass(frozen=True)
class Check:
    """One comparison of a model value with a reference value.

    Attributes
    ----------
    id : str
        Short unique identifier (used as test id), e.g. ``"water.density.t20s35"``.
    quantity : str
        What is compared, in words, with the conditions.
    unit : str
        Unit of the values.
    compute : callable
        ``compute() -> float``: the model value.
    reference : float
        The reference value.
    source : str
        Where the reference comes from: authors, year, table/equation; or
        ``"common practice"``; or ``"from memory"``; or ``"independent re-computation of ..."``.
    rtol, atol : float
        Pass when ``|model - reference| <= atol + rtol * |reference|``.
    tolerance_reason : str
        Why this tolerance.
    """

    id: str
    quantity: str
    unit: str
    compute: Callable[[], float]
    reference: float
    source: str
    rtol: float = 0.0
    atol: float = 0.0
    tolerance_reason: str = ""
    topic: str = field(default="", compare=False)


@dataclass(frozen=True)
class Result:
    check: Check
    model: float
    passed: bool
    error: str = ""

    def row(self):
        c = self.check
        tol = []
        if c.rtol:
            tol.append(f"rtol {c.rtol:g}")
        if c.atol:
            tol.append(f"atol {c.atol:g}")
        return {"id": c.id, "quantity": c.quantity, "unit": c.unit,
                "model": self.model, "reference": c.reference,
                "tolerance": " + ".join(tol) or "exact", "source": c.source,
                "result": "pass" if self.passed else ("ERROR" if self.error else "FAIL")}


def all_checks():
    """Return every registered :class:`Check`, from every topic module, in a stable order."""
    out = []
    for info in sorted(pkgutil.iter_modules(__path__), key=lambda m: m.name):
        if info.name.startswith("_"):
            continue
        mod = importlib.import_module(f"{__name__}.{info.name}")
        for c in getattr(mod, "CHECKS", []):
            out.append(c if c.topic else Check(**{**c.__dict__, "topic": info.name}))
    ids = [c.id for c in out]
    dup = {i for i in ids if ids.count(i) > 1}
    if dup:
        raise RuntimeError(f"duplicate validation check ids: {sorted(dup)}")
    return out


def evaluate(check):
    """Run one check and return its :class:`Result`."""
    try:
        model = float(check.compute())
    except Exception as exc:  # reported, not hidden: the row shows ERROR
        return Result(check, float("nan"), False, f"{type(exc).__name__}: {exc}")
    ok = bool(np.isfinite(model) and abs(model - check.reference)
              <= check.atol + check.rtol * abs(check.reference))
    return Result(check, model, ok)


def run_checks(topic=None):
    """Evaluate all checks (optionally of one topic) and return the results."""
    return [evaluate(c) for c in all_checks() if topic is None or c.topic == topic]
