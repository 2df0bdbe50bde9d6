"""Directional spreading of wind-wave spectra.

Convention: the angle ``phi_deg`` of a wave vector is measured from the direction the wind
blows **towards** [degree].  A spreading function D(k, phi) [rad-1] satisfies
integral over phi from 0 to 2 pi of D dphi = 1, so the polar spectrum is
F(k, phi) = S(k) D(k, phi) [m3 rad-1].

The Elfouhaily et al. (1997) spreading is centrosymmetric,
D = (1/(2 pi)) (1 + Delta(k) cos 2 phi), so it describes a frozen surface (optics, radar,
slopes), not the propagation direction of the waves.  The upwind/crosswind ratio function
Delta(k) [1] is also the second angular harmonic of any spreading function,
Delta = 2 integral D cos 2 phi dphi, which is how :func:`harmonic_delta` defines it for a
tabulated spectrum.

References
----------
.. [1] Elfouhaily, T., Chapron, B., Katsaros, K. and Vandemark, D. (1997). A unified
   directional spectrum for long and short wind-driven waves. J. Geophys. Res. 102(C7),
   15781-15796, Eqs. 49 and 57.
"""
from __future__ import annotations

import numpy as np

from .._checks import as_float_array, scalar_or_array
from ._common import OMEGA_FULL, angle_deg_array
from .models import resolve_forcing
from .wind import phase_speed_eckv

__all__ = ["elfouhaily1997_spreading", "spreading_function", "ECKV_A0", "ECKV_AP",
           "harmonic_delta"]

ECKV_A0 = np.log(2.0) / 4.0
"""a_0 = ln 2 / 4 in Delta(k) (ECKV Eq. 57; restatements, see reference note Sect. 9.1d)."""

ECKV_AP = 4.0
"""a_p = 4 in Delta(k) (ECKV Eq. 57)."""

ECKV_AM_COEFF = 0.13
"""a_m = 0.13 u*/c_m in Delta(k) (ECKV Eq. 57)."""


def eckv_delta(k, U, om, ustar, k_m, c_m, g):
    """Upwind/crosswind ratio Delta(k) of ECKV Eq. 57 (internal, no checks)."""
    c = phase_speed_eckv(k, k_m, g)
    cp = phase_speed_eckv(g * om**2 / U**2, k_m, g)
    a_m = ECKV_AM_COEFF * ustar / c_m
    return np.tanh(ECKV_A0 + ECKV_AP * (c / cp) ** 2.5 + a_m * (c_m / c) ** 2.5)  # Eq. 57


def elfouhaily1997_spreading(k, wind_speed, inverse_wave_age=OMEGA_FULL, fetch=None,
                             water=None, *, friction_velocity=None, ustar_law="constant-drag",
                             nan_policy="raise"):
    """Upwind/crosswind ratio function Delta(k) of Elfouhaily et al. (1997).

    Parameters
    ----------
    k : numeric
        Wavenumber [rad m-1], > 0.
    wind_speed, inverse_wave_age, fetch, water, friction_velocity, ustar_law, nan_policy :
        As in :func:`shortwave.spectrum.models.elfouhaily1997`.

    Returns
    -------
    numeric
        Delta(k) [1], between tanh(a_0) = 0.17 and 1.

    Notes
    -----
    Delta(k) = tanh(a_0 + a_p (c/c_p)^2.5 + a_m (c_m/c)^2.5) (ECKV Eq. 57), a_0 = ln 2/4,
    a_p = 4, a_m = 0.13 u*/c_m.  Spreading D = (1/(2 pi)) (1 + Delta cos 2 phi)
    (ECKV Eq. 49, normalised so that its integral over 2 pi is 1).

    Examples
    --------
    >>> round(float(elfouhaily1997_spreading(1.0, 10.0)), 4)
    0.3055
    """
    f = resolve_forcing(k, wind_speed, inverse_wave_age, fetch, water,
                        friction_velocity=friction_velocity, ustar_law=ustar_law,
                        nan_policy=nan_policy)
    return scalar_or_array(eckv_delta(f.k, f.wind_speed, f.omega, f.ustar, f.k_m, f.c_m,
                                      f.gravity))


def spreading_function(phi_deg, delta):
    """Centrosymmetric spreading D(phi) = (1/(2 pi)) (1 + Delta cos 2 phi) [rad-1].

    Parameters
    ----------
    phi_deg : numeric
        Angle of the wave vector from the downwind direction [degree].
    delta : numeric
        Upwind/crosswind ratio Delta [1], -1..1 (broadcast with ``phi_deg``).

    Returns
    -------
    numeric
        D [rad-1]; its integral over phi in [0, 2 pi) is 1 (ECKV Eq. 49).

    Examples
    --------
    >>> round(float(spreading_function(0.0, 0.5)), 4)   # 1.5 / (2 pi)
    0.2387
    """
    phi = np.deg2rad(angle_deg_array("phi_deg", phi_deg))
    d = as_float_array("delta", delta)
    return scalar_or_array((1.0 + d * np.cos(2.0 * phi)) / (2.0 * np.pi))  # ECKV Eq. 49


def harmonic_delta(F, phi_deg, axis=-1):
    """Second angular harmonic Delta = 2 sum(F cos 2 phi dphi) / sum(F dphi) of a tabulated F.

    Parameters
    ----------
    F : array_like
        Polar spectrum (or curvature spectrum) sampled on the direction axis ``axis``.
    phi_deg : array_like
        Directions [degree] from the wind, 1-D, any order, covering the full circle.
    axis : int
        The direction axis of ``F``.

    Returns
    -------
    numeric
        Delta [1]; equals the Delta of a spectrum of the form (1 + Delta cos 2 phi).

    Examples
    --------
    >>> import numpy as np
    >>> phi = np.arange(0.0, 360.0, 10.0)
    >>> round(float(harmonic_delta(1 + 0.3 * np.cos(np.deg2rad(2 * phi)), phi)), 6)
    0.3
    """
    from .moments import direction_widths
    F = np.moveaxis(as_float_array("F", F), axis, -1)
    phi = angle_deg_array("phi_deg", phi_deg)
    w = direction_widths(phi)
    c2 = np.cos(2.0 * np.deg2rad(phi))
    return scalar_or_array(2.0 * np.sum(F * c2 * w, -1) / np.sum(F * w, -1))
