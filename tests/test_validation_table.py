"""Run every comparison of the validation table (shortwave.validation).

The sources are named in each Check; ``shortwave validate`` prints the same table.
"""
import pytest

from shortwave.validation import all_checks, evaluate

CHECKS = all_checks()


@pytest.mark.parametrize("check", CHECKS, ids=[c.id for c in CHECKS])
def test_reference_check(check):
    result = evaluate(check)
    assert not result.error, result.error
    assert result.passed, (
        f"{check.quantity}: model {result.model:.6g} vs reference {check.reference:.6g} "
        f"{check.unit} ({check.source}; rtol={check.rtol}, atol={check.atol})")


def test_table_is_not_empty():
    assert len(CHECKS) >= 5
