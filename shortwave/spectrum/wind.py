"""Wind forcing of the spectrum models: friction velocity, inverse wave age, spectral peak.

The short-wave level of the Elfouhaily et al. (1997) spectrum depends on the friction
velocity u* in air, so the link U10 -> u* matters (about 1.2 % in alpha_m per 1 % in u*
near u* = 0.4 m s-1).  The link is a selectable law (:data:`USTAR_LAWS`):

``"constant-drag"`` (default)
    u* = sqrt(C_D) U10 with C_D = 1.44e-3.  The choice of most public restatements of
    ECKV; not traced to a statement in the paper itself.
``"wu1982"``
    C_D = (0.8 + 0.065 U10) 1e-3 (Wu 1982).
``"wave-age-roughness"``
    Neutral log profile u* = kappa U10 / ln(10 m / z0) with kappa = 0.4 and a wave-age
    dependent roughness z0 = 3.7e-5 (U10^2 / g) Omega^0.9 (a Donelan-type law; from
    memory, not verified against a printed source).

Every function of :mod:`shortwave.spectrum` also accepts ``friction_velocity=`` [m s-1]
to give u* directly.

References
----------
.. [1] Elfouhaily, T., Chapron, B., Katsaros, K. and Vandemark, D. (1997). A unified
   directional spectrum for long and short wind-driven waves. J. Geophys. Res. 102(C7),
   15781-15796, doi:10.1029/97JC00467.
.. [2] Wu, J. (1982). Wind-stress coefficients over sea surface from breeze to hurricane.
   J. Geophys. Res. 87(C12), 9704-9706.
.. [3] Donelan, M. A., Dobson, F. W., Smith, S. D. and Anderson, R. J. (1993). On the
   dependence of sea surface roughness on wave development. J. Phys. Oceanogr. 23,
   2143-2149.
"""
from __future__ import annotations

import warnings

import numpy as np

from .._checks import ShortwaveInputError, as_float_array, check_choice, scalar_or_array
from ..water import ValidityWarning
from ._common import OMEGA_FULL, OMEGA_RANGE, inverse_wave_age_array, wind_speed_array

__all__ = ["USTAR_LAWS", "ECKV_GRAVITY", "DRAG_COEFFICIENT", "VON_KARMAN",
           "friction_velocity", "inverse_wave_age_from_fetch", "peak_wavenumber",
           "wind_speed_at_height"]

USTAR_LAWS = ("constant-drag", "wu1982", "wave-age-roughness")
"""Allowed ``ustar_law`` keys (see the module docstring)."""

ECKV_GRAVITY = 9.81
"""Gravity used with the Elfouhaily et al. (1997) fit [m s-2] (the value of the paper)."""

DRAG_COEFFICIENT = 1.44e-3
"""Neutral 10-m drag coefficient of the ``"constant-drag"`` law [1]."""

VON_KARMAN = 0.4
"""Von Karman constant [1] (common practice)."""

FETCH_SCALE = 2.2e4
"""X0 in Omega_c(X) = 0.84 tanh((X/X0)^0.4)^-0.75, X = g x / U10^2 (ECKV Eq. 37) [1]."""


def friction_velocity(wind_speed, law="constant-drag", inverse_wave_age=OMEGA_FULL,
                      gravity=ECKV_GRAVITY, nan_policy="raise"):
    """Friction velocity in air u* from the 10-m neutral wind speed.

    Parameters
    ----------
    wind_speed : numeric
        U10, neutral wind speed at 10 m [m s-1], > 0.
    law : str
        One of :data:`USTAR_LAWS` (see the module docstring).
    inverse_wave_age : numeric
        Omega = U10 / c_p [1]; used only by ``"wave-age-roughness"``.
    gravity : float
        [m s-2].
    nan_policy : {"raise", "propagate"}
        What to do with NaN wind speeds.

    Returns
    -------
    numeric
        u* [m s-1], broadcast over ``wind_speed`` and ``inverse_wave_age``.

    Notes
    -----
    ``"constant-drag"``: u* = sqrt(1.44e-3) U10.  ``"wu1982"``: u* = sqrt(C_D) U10,
    C_D = (0.8 + 0.065 U10) 1e-3 (Wu 1982, Eq. 3).  ``"wave-age-roughness"``:
    u* = 0.4 U10 / ln(10 / z0), z0 = 3.7e-5 (U10^2/g) Omega^0.9 (from memory).

    Examples
    --------
    >>> round(float(friction_velocity(10.0)), 4)
    0.3795
    >>> round(float(friction_velocity(10.0, law="wu1982")), 4)
    0.3808
    """
    law = check_choice("ustar_law", law, USTAR_LAWS)
    u = wind_speed_array(wind_speed, nan_policy)
    if law == "constant-drag":
        return scalar_or_array(np.sqrt(DRAG_COEFFICIENT) * u)
    if law == "wu1982":
        return scalar_or_array(np.sqrt((0.8 + 0.065 * u) * 1e-3) * u)  # Wu (1982) Eq. 3
    om = inverse_wave_age_array(inverse_wave_age, warn=False)
    z0 = 3.7e-5 * u**2 / gravity * om**0.9  # Donelan-type wave-age roughness (from memory)
    return scalar_or_array(VON_KARMAN * u / np.log(10.0 / z0))


def inverse_wave_age_from_fetch(fetch, wind_speed, gravity=ECKV_GRAVITY, nan_policy="raise"):
    """Inverse wave age of a fetch-limited sea (Elfouhaily et al. 1997, Eq. 37).

    Parameters
    ----------
    fetch : numeric
        Fetch x [m], > 0; ``np.inf`` gives the fully developed 0.84.
    wind_speed : numeric
        U10 [m s-1], > 0.
    gravity : float
        [m s-2].
    nan_policy : {"raise", "propagate"}
        What to do with NaN wind speeds.

    Returns
    -------
    numeric
        Omega_c = 0.84 tanh((X/X0)^0.4)^-0.75 [1], X = g x / U10^2, X0 = 2.2e4.
        A :class:`shortwave.water.ValidityWarning` is given when the result exceeds 5
        (very short fetch), the upper validity limit of the spectrum.

    Examples
    --------
    >>> round(float(inverse_wave_age_from_fetch(100e3, 10.0)), 4)
    1.2032
    """
    x = as_float_array("fetch", fetch)
    if np.any(np.isnan(x)) or np.any(x <= 0):
        raise ShortwaveInputError("fetch: must be > 0 m (np.inf for an unlimited fetch), "
                                  f"got minimum {np.nanmin(x) if x.size else float('nan'):g}")
    u = wind_speed_array(wind_speed, nan_policy)
    xx = np.where(np.isinf(x), 1.0, x)
    X = gravity * xx / u**2
    om = np.where(np.isinf(x), OMEGA_FULL,
                  OMEGA_FULL * np.tanh((X / FETCH_SCALE) ** 0.4) ** -0.75)  # ECKV Eq. 37
    if np.any(om > OMEGA_RANGE[1]):
        warnings.warn(f"fetch gives an inverse wave age above {OMEGA_RANGE[1]:g} (fetch too "
                      "short for the wind); the spectrum is extrapolated", ValidityWarning,
                      stacklevel=2)
    return scalar_or_array(om)


def phase_speed_eckv(k, k_m, gravity=ECKV_GRAVITY):
    """Deep-water capillary-gravity phase speed of ECKV: sqrt(g/k (1 + (k/k_m)^2)) [m s-1]."""
    return np.sqrt(gravity / k * (1.0 + (k / k_m) ** 2))  # ECKV Eq. 24


def peak_wavenumber(wind_speed, inverse_wave_age=OMEGA_FULL, gravity=ECKV_GRAVITY,
                    nan_policy="raise"):
    """Spectral peak wavenumber k_p = Omega^2 g / U10^2 (Elfouhaily et al. 1997).

    Parameters
    ----------
    wind_speed : numeric
        U10 [m s-1], > 0.
    inverse_wave_age : numeric
        Omega = U10 / c_p [1].
    gravity : float
        [m s-2].
    nan_policy : {"raise", "propagate"}
        What to do with NaN wind speeds.

    Returns
    -------
    numeric
        k_p [rad m-1].

    Examples
    --------
    >>> round(float(peak_wavenumber(10.0)), 6)
    0.069219
    """
    u = wind_speed_array(wind_speed, nan_policy)
    om = inverse_wave_age_array(inverse_wave_age, warn=False)
    return scalar_or_array(gravity * om**2 / u**2)


CHARNOCK_CONSTANT = 0.011
"""Charnock constant of z0 = 0.011 u*^2 / g (common practice; Smith 1988's value)."""


def wind_speed_at_height(wind_speed, height, ustar_law="constant-drag",
                         gravity=ECKV_GRAVITY):
    """Neutral wind speed at another height from U10, by the logarithmic profile.

    Parameters
    ----------
    wind_speed : numeric
        U10 [m s-1], > 0.
    height : numeric
        Target height above the sea [m], > 0 (e.g. 12.5 for Cox & Munk, 19.5 for
        Pierson & Moskowitz).
    ustar_law : str
        U10 -> u* law (:data:`USTAR_LAWS`).
    gravity : float
        [m s-2].

    Returns
    -------
    numeric
        U(z) = U10 ln(z/z0) / ln(10/z0) [m s-1], z0 = 0.011 u*^2/g (Charnock).

    Examples
    --------
    >>> round(float(wind_speed_at_height(10.0, 12.5) / 10.0), 3)
    1.02
    """
    from .._checks import check_positive
    z = check_positive("height", height, allow_nan=False, unit="m")
    u = wind_speed_array(wind_speed)
    us = np.asarray(friction_velocity(u, ustar_law, gravity=gravity))
    z0 = CHARNOCK_CONSTANT * us**2 / gravity
    return scalar_or_array(u * np.log(z / z0) / np.log(10.0 / z0))
