"""Input checking shared by every module.

Each helper converts its argument to a float ndarray and raises
:class:`ShortwaveInputError` (a ``ValueError``) whose message names the argument,
what was found and what is valid.  NaN is allowed by default and propagates
(documented NaN propagation); pass ``allow_nan=False`` to refuse it.
"""
from __future__ import annotations

import numpy as np

__all__ = ["ShortwaveInputError", "as_float_array", "check_positive", "check_nonnegative",
           "check_range", "check_choice", "scalar_or_array"]


class ShortwaveInputError(ValueError):
    """Bad input to a shortwave function (value, range, unit or choice)."""


def as_float_array(name, value):
    """Return ``value`` as a float ndarray; refuse strings, None and complex input."""
    if value is None:
        raise ShortwaveInputError(f"{name}: a number is required, got None")
    if isinstance(value, (str, bytes)):
        raise ShortwaveInputError(f"{name}: a number is required, got the text {value!r}")
    try:
        arr = np.asarray(value, dtype=float)
    except (TypeError, ValueError) as exc:
        raise ShortwaveInputError(f"{name}: not numeric ({exc})") from None
    return arr


def _finite_part(name, arr, allow_nan):
    if np.any(np.isinf(arr)):
        raise ShortwaveInputError(f"{name}: infinite values are not allowed")
    bad = np.isnan(arr)
    if not allow_nan and np.any(bad):
        raise ShortwaveInputError(f"{name}: NaN values are not allowed")
    return arr[~bad]


def check_positive(name, value, *, allow_nan=True, allow_inf=False, unit=""):
    """Return ``value`` as an array after checking every (non-NaN) element is > 0."""
    arr = as_float_array(name, value)
    vals = arr if allow_inf else _finite_part(name, arr, allow_nan)
    if allow_inf:
        if not allow_nan and np.any(np.isnan(arr)):
            raise ShortwaveInputError(f"{name}: NaN values are not allowed")
        vals = arr[~np.isnan(arr)]
    if np.any(vals <= 0):
        raise ShortwaveInputError(
            f"{name}: must be > 0{(' ' + unit) if unit else ''}, got minimum {np.min(vals):g}")
    return arr


def check_nonnegative(name, value, *, allow_nan=True, unit=""):
    """Return ``value`` as an array after checking every (non-NaN) element is >= 0."""
    arr = as_float_array(name, value)
    vals = _finite_part(name, arr, allow_nan)
    if np.any(vals < 0):
        raise ShortwaveInputError(
            f"{name}: must be >= 0{(' ' + unit) if unit else ''}, got minimum {np.min(vals):g}")
    return arr


def check_range(name, value, low, high, *, inclusive=(True, True), allow_nan=True, unit=""):
    """Return ``value`` as an array after checking low <= value <= high (NaN passes through)."""
    arr = as_float_array(name, value)
    vals = _finite_part(name, arr, allow_nan)
    lo_ok = vals >= low if inclusive[0] else vals > low
    hi_ok = vals <= high if inclusive[1] else vals < high
    if not (np.all(lo_ok) and np.all(hi_ok)):
        lb = "[" if inclusive[0] else "("
        rb = "]" if inclusive[1] else ")"
        u = f" {unit}" if unit else ""
        raise ShortwaveInputError(
            f"{name}: valid range is {lb}{low:g}, {high:g}{rb}{u}, got values from "
            f"{np.min(vals):g} to {np.max(vals):g}")
    return arr


def check_choice(name, value, choices):
    """Return ``value`` if it is one of ``choices`` (case-insensitive for strings)."""
    if isinstance(value, str):
        for c in choices:
            if isinstance(c, str) and value.lower() == c.lower():
                return c
    elif value in choices:
        return value
    raise ShortwaveInputError(
        f"{name}: unknown value {value!r}; choose one of: {', '.join(map(str, choices))}")


def scalar_or_array(result):
    """Return a Python float for 0-d results, the array otherwise."""
    result = np.asarray(result)
    if result.ndim == 0:
        return result[()]
    return result
