"""Input checking and small helpers shared by the spectrum modules (private)."""
from __future__ import annotations

import warnings

import numpy as np

from .._checks import ShortwaveInputError, as_float_array, check_choice, check_positive
from ..water import ValidityWarning

NAN_POLICIES = ("raise", "propagate")
"""Allowed values of ``nan_policy``: refuse NaN wind speeds, or give NaN spectra for them."""

OMEGA_FULL = 0.84
"""Inverse wave age of a fully developed sea, U10 / c_p (Elfouhaily et al. 1997, Sect. 5.1)."""

OMEGA_RANGE = (0.84, 5.0)
"""Validity range of the inverse wave age (Donelan et al. 1985 gamma law, used by ECKV)."""


def wind_speed_array(wind_speed, nan_policy="raise"):
    """Check U10 [m s-1]: > 0 and finite; NaN refused or propagated per ``nan_policy``."""
    policy = check_choice("nan_policy", nan_policy, NAN_POLICIES)
    u = as_float_array("wind_speed", wind_speed)
    if policy == "raise" and np.any(np.isnan(u)):
        raise ShortwaveInputError(
            "wind_speed: NaN values are not allowed (pass nan_policy='propagate' to get NaN "
            "spectra for NaN wind speeds, e.g. land cells)")
    return check_positive("wind_speed", u, unit="m s-1")


def wavenumber_array(k, name="k"):
    """Check a wavenumber array [rad m-1]: non-empty, every element finite and > 0."""
    arr = as_float_array(name, k)
    if arr.size == 0:
        raise ShortwaveInputError(f"{name}: the wavenumber array is empty")
    if np.any(np.isnan(arr)):
        raise ShortwaveInputError(f"{name}: NaN wavenumbers are not allowed")
    return check_positive(name, arr, allow_nan=False, unit="rad m-1")


def wavenumber_grid(k, name="k"):
    """Check a 1-D integration grid [rad m-1]: non-empty, > 0, strictly increasing."""
    arr = wavenumber_array(k, name)
    if arr.ndim != 1:
        raise ShortwaveInputError(f"{name}: a 1-D wavenumber grid is required, got shape "
                                  f"{arr.shape}")
    if arr.size < 2:
        raise ShortwaveInputError(f"{name}: at least 2 wavenumbers are needed, got {arr.size}")
    if np.any(np.diff(arr) <= 0):
        raise ShortwaveInputError(f"{name}: the wavenumber grid must be strictly increasing "
                                  "(sorted, no repeats)")
    return arr


def inverse_wave_age_array(inverse_wave_age, *, warn=True):
    """Check Omega = U10/c_p [1]: > 0 and finite; warn outside [0.84, 5]."""
    om = as_float_array("inverse_wave_age", inverse_wave_age)
    if np.any(np.isnan(om)):
        raise ShortwaveInputError("inverse_wave_age: NaN values are not allowed")
    om = check_positive("inverse_wave_age", om, allow_nan=False)
    if warn:
        lo, hi = OMEGA_RANGE
        if np.any(om < lo * (1 - 1e-9)) or np.any(om > hi * (1 + 1e-9)):
            warnings.warn(
                f"inverse_wave_age outside the validity range [{lo:g}, {hi:g}] of the "
                f"Elfouhaily et al. (1997) fit (got {np.min(om):g} to {np.max(om):g}); "
                "values are extrapolated", ValidityWarning, stacklevel=4)
    return om


def angle_deg_array(name, value):
    """Check an angle array [degree]: finite (NaN refused)."""
    arr = as_float_array(name, value)
    if np.any(~np.isfinite(arr)):
        raise ShortwaveInputError(f"{name}: angles must be finite numbers [degree]")
    return arr
