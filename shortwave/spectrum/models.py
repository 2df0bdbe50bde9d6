"""Full-range wind-wave spectrum models, one function per published model.

Every model function returns the **omnidirectional elevation spectrum** S(k) [m3]
(one-sided in k, integral over k from 0 to infinity = elevation variance [m2]).  The
curvature (saturation) spectrum is B(k) = k^3 S(k) [1].  Directional forms are in
:mod:`shortwave.spectrum.spreading` and :mod:`shortwave.spectrum`.

Broadcasting: ``k``, ``wind_speed``, ``inverse_wave_age`` (or ``fetch``) and
``friction_velocity`` broadcast against each other with NumPy rules.  For one spectrum per
wind speed on a common k grid, pass ``wind_speed[:, None]`` and ``k[None, :]``.

References
----------
.. [1] Elfouhaily, T., Chapron, B., Katsaros, K. and Vandemark, D. (1997). A unified
   directional spectrum for long and short wind-driven waves. J. Geophys. Res. 102(C7),
   15781-15796, doi:10.1029/97JC00467 ("ECKV").
.. [2] Donelan, M. A., Hamilton, J. and Hui, W. H. (1985). Directional spectra of
   wind-generated waves. Phil. Trans. R. Soc. Lond. A 315, 509-562.
"""
from __future__ import annotations

import numpy as np

from .._checks import ShortwaveInputError, check_choice, scalar_or_array
from ..water import as_liquid
from ._common import OMEGA_FULL, inverse_wave_age_array, wavenumber_array, wind_speed_array
from .wind import (ECKV_GRAVITY, friction_velocity as _ustar, inverse_wave_age_from_fetch,
                   phase_speed_eckv)

__all__ = ["elfouhaily1997", "elfouhaily1997_curvature", "ECKV_K_M", "ECKV_C_M",
           "ECKV_PARTS", "pierson_moskowitz1964", "PM_ALPHA", "PM_BETA"]

ECKV_K_M = 370.0
"""k_m, wavenumber of the phase-speed minimum used in the ECKV fit [rad m-1] (ECKV Eq. 24)."""

ECKV_C_M = 0.23
"""c_m, minimum phase speed used in the ECKV fit [m s-1] (ECKV Sect. 5.2.2)."""

ECKV_PARTS = ("total", "long", "short")
"""``part=`` keys of :func:`elfouhaily1997`: B_l + B_h, the long-wave B_l or the short-wave B_h."""


class Forcing:
    """Resolved, broadcast inputs of a spectrum model (internal).

    Attributes: ``k`` [rad m-1], ``wind_speed`` [m s-1], ``omega`` (inverse wave age),
    ``ustar`` [m s-1], ``k_m`` [rad m-1], ``c_m`` [m s-1], ``gravity`` [m s-2].
    """

    __slots__ = ("k", "wind_speed", "omega", "ustar", "k_m", "c_m", "gravity", "water")


def resolve_forcing(k, wind_speed, inverse_wave_age=OMEGA_FULL, fetch=None, water=None, *,
                    friction_velocity=None, ustar_law="constant-drag", nan_policy="raise",
                    gravity=ECKV_GRAVITY, need_k=True):
    """Check and broadcast the common inputs of every spectrum model (internal).

    ``fetch`` (if given) replaces ``inverse_wave_age`` by ECKV Eq. 37; giving both a fetch
    and a non-default inverse wave age is an error.  With ``water=None`` the capillary
    constants are the fixed k_m = 370 rad m-1, c_m = 0.23 m s-1 of the fit; with a
    :class:`shortwave.Water`, k_m = sqrt(rho g / sigma) and c_m = sqrt(2 g / k_m).
    """
    f = Forcing()
    u = wind_speed_array(wind_speed, nan_policy)
    if fetch is not None:
        if np.any(np.asarray(inverse_wave_age, dtype=float) != OMEGA_FULL):
            raise ShortwaveInputError("give either fetch or inverse_wave_age, not both")
        om = np.asarray(inverse_wave_age_from_fetch(fetch, u, gravity, nan_policy="propagate"))
        om = np.where(np.isnan(om), OMEGA_FULL, om)  # NaN wind -> NaN spectrum anyway
    else:
        om = inverse_wave_age_array(inverse_wave_age)
    if friction_velocity is not None:
        from .._checks import check_positive
        us = check_positive("friction_velocity", friction_velocity, unit="m s-1")
    else:
        us = np.asarray(_ustar(u, ustar_law, om, gravity, nan_policy="propagate"))
    if water is None:
        km, cm = ECKV_K_M, ECKV_C_M
    else:
        w = as_liquid(water)
        km = np.sqrt(np.asarray(w.density) * gravity / np.asarray(w.surface_tension))
        cm = np.sqrt(2.0 * gravity / km)
    if need_k:
        k = wavenumber_array(k)
        f.k, f.wind_speed, f.omega, f.ustar = np.broadcast_arrays(k, u, om, us)
    else:
        f.k = None
        f.wind_speed, f.omega, f.ustar = np.broadcast_arrays(u, om, us)
    f.k_m, f.c_m, f.gravity, f.water = km, cm, float(gravity), water
    return f


def eckv_parts(k, U, om, ustar, k_m, c_m, g, alpha_p_exponent=0.5):
    """Long- and short-wave curvature spectra B_l, B_h of ECKV [1] (internal, no checks)."""
    k0 = g / U**2
    kp = k0 * om**2                                   # k_p = k_0 Omega^2
    c = phase_speed_eckv(k, k_m, g)
    cp = phase_speed_eckv(kp, k_m, g)                 # c_p = c(k_p), full dispersion
    sq = np.sqrt(k / kp)
    lpm = np.exp(-1.25 * (kp / k) ** 2)               # ECKV Eq. 2, Pierson-Moskowitz shape
    gamma = np.where(om <= 1.0, 1.7, 1.7 + 6.0 * np.log10(np.maximum(om, 1.0)))  # Eq. 3, log10
    sigma = 0.08 * (1.0 + 4.0 * om**-3)               # ECKV Eq. 3
    jp = gamma ** np.exp(-((sq - 1.0) ** 2) / (2.0 * sigma**2))  # ECKV Eq. 3, J_p
    alpha_p = 6e-3 * om**alpha_p_exponent             # ECKV Eq. 34
    fp = lpm * jp * np.exp(-om / np.sqrt(10.0) * (sq - 1.0))  # ECKV Eq. 32
    b_l = 0.5 * alpha_p * cp / c * fp                 # ECKV Eq. 31
    ln_u = np.log(ustar / c_m)
    alpha_m = 1e-2 * (1.0 + np.where(ustar <= c_m, 1.0, 3.0) * ln_u)  # ECKV Eq. 44
    alpha_m = np.maximum(alpha_m, 0.0)                # clamp: < 0 below u* = c_m / e
    fm = lpm * jp * np.exp(-0.25 * (k / k_m - 1.0) ** 2)  # ECKV Eq. 41 (with L_PM J_p)
    b_h = 0.5 * alpha_m * c_m / c * fm                # ECKV Eq. 40
    return b_l, b_h


def eckv_alpha_m(ustar, c_m=ECKV_C_M):
    """Generalised Phillips-Kitaigorodskii constant alpha_m of ECKV Eq. 44, clamped at 0."""
    ln_u = np.log(np.asarray(ustar, dtype=float) / c_m)
    return np.maximum(1e-2 * (1.0 + np.where(ustar <= c_m, 1.0, 3.0) * ln_u), 0.0)


def elfouhaily1997_curvature(k, wind_speed, inverse_wave_age=OMEGA_FULL, fetch=None,
                             water=None, *, part="total", friction_velocity=None,
                             ustar_law="constant-drag", alpha_p_exponent=0.5,
                             nan_policy="raise"):
    """Omnidirectional curvature spectrum B(k) = k^3 S(k) of Elfouhaily et al. (1997).

    Parameters are those of :func:`elfouhaily1997`.

    Returns
    -------
    numeric
        B [1]: ``part="total"`` B_l + B_h, ``"long"`` B_l, ``"short"`` B_h.

    Examples
    --------
    >>> round(float(elfouhaily1997_curvature(370.0, 10.0)), 5)   # close to alpha_m / 2
    0.0125
    """
    part = check_choice("part", part, ECKV_PARTS)
    f = resolve_forcing(k, wind_speed, inverse_wave_age, fetch, water,
                        friction_velocity=friction_velocity, ustar_law=ustar_law,
                        nan_policy=nan_policy)
    b_l, b_h = eckv_parts(f.k, f.wind_speed, f.omega, f.ustar, f.k_m, f.c_m, f.gravity,
                          alpha_p_exponent)
    out = {"total": b_l + b_h, "long": b_l, "short": b_h}[part]
    return scalar_or_array(out)


def elfouhaily1997(k, wind_speed, inverse_wave_age=OMEGA_FULL, fetch=None, water=None, *,
                   part="total", friction_velocity=None, ustar_law="constant-drag",
                   alpha_p_exponent=0.5, nan_policy="raise"):
    """Omnidirectional elevation spectrum of Elfouhaily, Chapron, Katsaros & Vandemark (1997).

    The unified spectrum for long and short wind waves, deep water, centrosymmetric:
    S(k) = k^-3 [B_l(k) + B_h(k)], a JONSWAP-type long-wave curvature spectrum B_l and a
    capillary-gravity short-wave curvature spectrum B_h, both parameterised by the inverse
    wave age Omega = U10/c_p and (B_h) the friction velocity u*.

    Parameters
    ----------
    k : numeric
        Wavenumber [rad m-1], > 0 (any shape; broadcast with the other inputs).
    wind_speed : numeric
        U10, neutral wind speed at 10 m [m s-1], > 0.
    inverse_wave_age : numeric
        Omega = U10/c_p [1]; 0.84 (default) is a fully developed sea.  Valid 0.84-5; a
        :class:`shortwave.water.ValidityWarning` outside; <= 0 or NaN is an error.
    fetch : numeric, optional
        Fetch [m]; when given, Omega comes from ECKV Eq. 37 (do not also give Omega).
    water : Water or Liquid, optional
        None (default): the fixed capillary constants of the fit, k_m = 370 rad m-1 and
        c_m = 0.23 m s-1.  A liquid: k_m = sqrt(rho g/sigma), c_m = sqrt(2 g/k_m).
    part : {"total", "long", "short"}
        Return the whole spectrum or only its long-wave or short-wave part.
    friction_velocity : numeric, optional
        u* in air [m s-1]; overrides ``ustar_law``.
    ustar_law : str
        U10 -> u* law, one of :data:`shortwave.spectrum.wind.USTAR_LAWS`; default
        ``"constant-drag"`` (C_D = 1.44e-3).
    alpha_p_exponent : float
        Exponent of Omega in alpha_p = 6e-3 Omega^x: 0.5 (ECKV Eq. 34, default) or 0.55
        (Donelan et al. 1985).
    nan_policy : {"raise", "propagate"}
        ``"raise"`` (default): a NaN wind speed is an error; ``"propagate"``: NaN winds
        give NaN spectra (for gridded fields with land cells).

    Returns
    -------
    numeric
        S(k) [m3], one-sided omnidirectional; integral over k = elevation variance [m2].

    Notes
    -----
    Equations (numbers as quoted by public restatements; the printed paper was not
    available, see ``reference/spectra.md`` Sect. 1 and 9):

    * k_p = Omega^2 g/U10^2, c(k) = sqrt(g/k (1 + (k/k_m)^2)) (Eq. 24), c_p = c(k_p).
    * B_l = 1/2 alpha_p (c_p/c) F_p (Eq. 31); F_p = L_PM J_p exp(-Omega/sqrt(10)
      (sqrt(k/k_p) - 1)) (Eq. 32); L_PM = exp(-5/4 (k_p/k)^2); J_p = gamma^Gamma,
      Gamma = exp(-(sqrt(k/k_p) - 1)^2 / (2 sigma^2)); gamma = 1.7 (Omega <= 1),
      1.7 + 6 log10(Omega) (1 < Omega < 5) (Donelan et al. 1985; log10, not ln);
      sigma = 0.08 (1 + 4 Omega^-3); alpha_p = 6e-3 Omega^0.5 (Eq. 34).
    * B_h = 1/2 alpha_m (c_m/c) F_m (Eq. 40); F_m = L_PM J_p exp(-1/4 (k/k_m - 1)^2)
      (Eq. 41; the factor L_PM J_p keeps the variance finite); alpha_m = 1e-2
      (1 + ln(u*/c_m)) for u* <= c_m, 1e-2 (1 + 3 ln(u*/c_m)) above (Eq. 44), clamped
      at 0 (it is negative for u* < c_m/e, U10 below about 2.2 m s-1).
    * Gravity g = 9.81 m s-2, as in the fit.  Deep water only.

    Examples
    --------
    >>> round(float(elfouhaily1997(1.0, 10.0)), 5)   # S = B at k = 1 rad/m
    0.00565
    """
    return scalar_or_array(
        np.asarray(elfouhaily1997_curvature(
            k, wind_speed, inverse_wave_age, fetch, water, part=part,
            friction_velocity=friction_velocity, ustar_law=ustar_law,
            alpha_p_exponent=alpha_p_exponent, nan_policy=nan_policy))
        / np.asarray(k, dtype=float) ** 3)


PM_ALPHA = 8.1e-3
"""Phillips constant alpha of the Pierson-Moskowitz (1964) spectrum [1]."""
PM_BETA = 0.74
"""beta of the Pierson-Moskowitz (1964) spectrum [1]; omega_0 = g / U19.5."""


def pierson_moskowitz1964(frequency_hz, wind_speed_19p5, gravity=9.81):
    """Pierson-Moskowitz (1964) fully developed frequency spectrum E(f).

    Parameters
    ----------
    frequency_hz : numeric
        Frequency f [Hz], > 0.
    wind_speed_19p5 : numeric
        Wind speed at 19.5 m above the sea [m s-1], > 0 (the height of the original fit;
        U19.5 is about 1.026 U10 to 1.07 U10 depending on the profile assumed).
    gravity : float
        [m s-2].

    Returns
    -------
    numeric
        E(f) [m2 s], one-sided: E(f) = 2 pi E(omega), with
        E(omega) = alpha g^2 omega^-5 exp(-beta (omega_0/omega)^4), alpha = 8.1e-3,
        beta = 0.74, omega_0 = g/U19.5.

    Notes
    -----
    Closed forms: Hs = 4 sqrt(m0) = 2 sqrt(alpha/beta) U19.5^2/g = 0.2092 U19.5^2/g;
    peak omega_p = (4 beta/5)^(1/4) g/U19.5 = 0.8772 g/U19.5.

    References
    ----------
    Pierson, W. J. and Moskowitz, L. (1964). A proposed spectral form for fully developed
    wind seas based on the similarity theory of S. A. Kitaigorodskii. J. Geophys. Res.
    69(24), 5181-5190.

    Examples
    --------
    >>> round(float(pierson_moskowitz1964(0.137, 10.0)), 3)   # near the peak
    2.974
    """
    from .._checks import check_positive
    f = check_positive("frequency_hz", frequency_hz, allow_nan=False, unit="Hz")
    u = check_positive("wind_speed_19p5", wind_speed_19p5, allow_nan=False, unit="m s-1")
    om = 2.0 * np.pi * f
    e_om = PM_ALPHA * gravity**2 * om**-5 * np.exp(-PM_BETA * (gravity / u / om) ** 4)
    return scalar_or_array(2.0 * np.pi * e_om)
