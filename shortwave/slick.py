"""From film damping to the radar contrast of a slick.

A film raises the damping of the short waves by the damping ratio y(k)
(:mod:`shortwave.films`).  How much the short-wave spectrum, and with it the radar
backscatter, drops inside the slick depends on what else holds the spectrum up.  Three
models (``model=``, keys in :data:`MODELS`):

``"alpers_huhnerfuss1989"``
    Everything except viscous damping is the same inside and outside the slick, and the
    backscatter follows the spectrum at the Bragg wavenumber: contrast = y(k_B)
    (Alpers & Huehnerfuss 1989).  Wind-independent.
``"balance"`` (default)
    Local balance of wind input and dissipation of short-wave action with quadratic
    (n = 1) or other saturation: K = [(beta - 2 Gamma_clean) / (beta_s - 2 Gamma_film)]^(1/n)
    (films.md Sec. 4.3, the structure used by Ermakov and co-workers and by Kudryavtsev
    et al.), with Plant's (1982) wind growth rate beta and the friction velocity from
    Wu's (1982) drag law.  **Bound** (our documented choice): the contrast never exceeds
    the A&H89 value scaled by the wind-input reduction, K <= y r^(-2/n), with
    r = u*_slick/u*.  The bound takes over where wind input falls towards film damping:
    for beta_s <= 2 Gamma_film, the balance alone would predict total suppression
    (K -> infinity); there the short waves inside the slick are no longer wind-sustained and
    are supplied by non-local sources (transfer from longer waves, advection into the
    slick) that the A&H89 equilibrium treats as unchanged by the film.  That equilibrium
    (damping balanced by a supply independent of the spectrum) gives y whatever the
    saturation exponent n, so the bound is y r^(-2/n), not y^(1/n).  The bound is reached
    continuously: for n = 1, r = 1 at beta = 2 (1 + y) Gamma_clean; in general where
    (beta - 2 Gamma_clean) / (r^2 beta - 2 Gamma_film) = y^n r^(-2).
``"two-scale"``
    The clean and film-covered sea through the composite NRCS model of
    :func:`shortwave.radar.nrcs`, with the whole spectrum divided by y(k) (A&H89 at every
    wavenumber; y = 1 below 1 rad m-1): contrast = sigma0_clean / sigma0_slick.  Includes
    tilting, specular and breaking terms; needs a single film (scalar parameters).

Contrasts are linear ratios >= 1 (slick darker) in :func:`contrast`, decibels
10 log10(K) in :func:`contrast_db` (decibels only at the edges).

**Cautions.**  A contrast is a screening estimate, not proof of oil: low-wind areas, natural
films, rain cells, current fronts and internal-wave fronts also darken radar images, and
natural films and mineral oil can give the same contrast.  Decisions rest with trained
observers and the responsible authorities (:data:`CAUTION`).  The Bragg-contrast relations
hold for roughly 20-60 degree incidence (specular return dominates nearer nadir).

References
----------
.. [1] Alpers, W. and Huehnerfuss, H. (1989). The damping of ocean waves by surface films:
   a new look at an old problem. J. Geophys. Res. 94(C5), 6251-6265.
.. [2] Plant, W. J. (1982). A relationship between wind stress and wave slope. J. Geophys.
   Res. 87(C3), 1961-1967 (beta = (0.04 +- 0.02) (u*/c)^2 omega cos phi, the growth rate
   of wave energy and momentum from the wind: checked against the abstract).
.. [3] Wu, J. (1982). Wind-stress coefficients over sea surface from breeze to hurricane.
   J. Geophys. Res. 87(C12), 9704-9706.
.. [4] Kudryavtsev, V., Hauser, D., Caudal, G. and Chapron, B. (2003). A semiempirical
   model of the normalized radar cross-section of the sea surface: 1. Background model.
   J. Geophys. Res. 108(C3), 8054.
.. [5] Cox, C. and Munk, W. (1954). Statistics of the sea surface derived from sun glitter.
   J. Mar. Res. 13, 198-227.
"""
from __future__ import annotations

import warnings

import numpy as np

from . import films as _films
from ._checks import (ShortwaveInputError, as_float_array, check_choice, check_positive,
                      check_range, scalar_or_array)
from .dispersion import angular_frequency, phase_speed
from .water import ValidityWarning, as_liquid

__all__ = ["MODELS", "CAUTION", "PLANT_COEFFICIENT", "wind_growth_rate",
           "alpers_huhnerfuss1989", "balance_contrast", "spectral_contrast", "inverse_spectral_contrast",
           "contrast",
           "contrast_db", "checked_bragg_wavenumber", "damped_spectrum", "damped_curvature",
           "damped_mean_square_slope", "cox_munk1954_slick_mss"]

MODELS = ("balance", "alpers_huhnerfuss1989", "two-scale")
"""Allowed ``model=`` keys of :func:`contrast` / :func:`contrast_db` (see module docstring)."""

SPECTRUM_MODELS = ("balance", "alpers_huhnerfuss1989")
"""Models of the film-damped spectrum (:func:`spectral_contrast`)."""

PLANT_COEFFICIENT = 0.04
"""Plant (1982): beta = 0.04 (u*/c)^2 omega cos(phi), the growth rate of wave energy (and
momentum) from the wind, uncertainty +-0.02 (both as stated in the paper's abstract).
beta is an energy rate: it is compared with 2 Gamma, twice the amplitude damping rate."""

CAUTION = ("Screening estimate, not proof of oil: low-wind areas, natural (biogenic) films "
           "and other ocean features look alike in radar images. Decisions rest with "
           "trained observers and the responsible authorities.")
"""The caution printed with every slick result."""


def checked_bragg_wavenumber(frequency_hz, incidence_deg):
    """Monostatic Bragg wavenumber 2 k_r sin(theta), checked against the film range.

    Parameters
    ----------
    frequency_hz : numeric
        Radar frequency [Hz], > 0.
    incidence_deg : numeric
        Incidence angle from the vertical [degree], in (0, 90).

    Returns
    -------
    numeric
        k_B [rad m-1] (from :func:`shortwave.radar.bragg_wavenumber`).

    Raises
    ------
    ShortwaveInputError
        If k_B falls outside :data:`shortwave.films.K_RANGE`: radar frequencies below
        about 48 MHz / (2 sin theta) (HF) resonate with waves too long for film damping.

    Examples
    --------
    >>> round(float(checked_bragg_wavenumber(9.65e9, 30.0)), 1)
    202.2
    """
    from .radar import bragg_wavenumber as _kb
    f = check_positive("frequency_hz", frequency_hz, unit="Hz")
    th = check_range("incidence_deg", incidence_deg, 0.0, 90.0, inclusive=(False, False),
                     unit="degree")
    kb = np.asarray(_kb(f, th))
    v = kb[np.isfinite(kb)]
    lo, hi = _films.K_RANGE
    if v.size and v.min() < lo:
        raise ShortwaveInputError(
            f"frequency_hz: too low for film damping: the Bragg wavenumber is {v.min():.3g} "
            f"rad m-1, below the valid {lo:g} rad m-1 (radar frequencies of at least "
            f"{299792458.0 * lo / (4 * np.pi * np.sin(np.deg2rad(np.max(th)))) / 1e6:.0f} "
            f"MHz at this incidence)")
    if v.size and v.max() > hi:
        raise ShortwaveInputError(
            f"frequency_hz: too high: Bragg wavenumber {v.max():.4g} rad m-1 exceeds the "
            f"valid {hi:g} rad m-1 of film damping")
    return scalar_or_array(kb)


def wind_growth_rate(k, wind_speed, azimuth_deg=0.0, water=None, ustar_law="wu1982",
                     friction_ratio=1.0):
    """Wind energy growth rate of short waves, Plant (1982).

    Parameters
    ----------
    k : numeric
        Wavenumber [rad m-1], > 0.
    wind_speed : numeric
        U10 [m s-1], > 0.
    azimuth_deg : numeric
        Angle between the wind and the wave direction [degree]; the growth scales with
        |cos|, i.e. the component travelling with the wind (the radar sees both Bragg
        waves, +-k_B).
    water : Water or Liquid, optional
        Sets the phase speed c and frequency omega (clean inviscid dispersion).
    ustar_law : str
        Friction-velocity law of :func:`shortwave.spectrum.friction_velocity`; default
        ``"wu1982"`` (C_D = (0.8 + 0.065 U10) 1e-3, Wu 1982 [3]_).
    friction_ratio : numeric
        u* inside the slick / u* outside, in (0, 1]; 1 keeps the wind input unchanged
        (A&H89 used 0.8).

    Returns
    -------
    numeric
        beta = 0.04 (r u*/c)^2 omega |cos(azimuth)| [s-1] (energy rate; compare with
        2 Gamma).  Plant (1982) [2]_ gives 0.04 +- 0.02 "over a wide range of
        frequencies" (abstract); the range roughly 0.1 < u*/c < 3 is from memory.

    Examples
    --------
    >>> round(float(wind_growth_rate(202.25, 7.0)), 2)
    1.98
    """
    from .spectrum import friction_velocity
    k = check_positive("k", k, unit="rad m-1")
    u = check_positive("wind_speed", wind_speed, unit="m s-1")
    az = np.deg2rad(as_float_array("azimuth_deg", azimuth_deg))
    r = check_range("friction_ratio", friction_ratio, 0.0, 1.0, inclusive=(False, True))
    w = as_liquid(water)
    ustar = np.asarray(friction_velocity(np.where(np.isnan(u), 1.0, u), law=ustar_law))
    ustar = np.where(np.isnan(u), np.nan, ustar)
    c = np.asarray(phase_speed(k, w))
    om = np.asarray(angular_frequency(k, w))
    return scalar_or_array(PLANT_COEFFICIENT * (r * ustar / c) ** 2 * om
                           * np.abs(np.cos(az)))  # Plant (1982)


def _rates(k, film, water, on_failure):
    """Clean and film temporal damping rates (exact roots) at k."""
    g_c = np.asarray(_films.damping_rate(k, None, water))
    g_f = np.asarray(_films.damping_rate(k, film, water, on_failure=on_failure))
    return g_c, g_f


def alpers_huhnerfuss1989(bragg_wavenumber, film, water=None, form="temporal",
                          on_failure="raise"):
    """Slick contrast of Alpers & Huehnerfuss (1989): the damping ratio at k_B.

    Parameters
    ----------
    bragg_wavenumber : numeric
        k_B [rad m-1], within :data:`shortwave.films.K_RANGE`.
    film : Monolayer, OilLayer or str
    water : Water or Liquid, optional
    form : {"temporal", "spatial"}
        Damping ratio form (temporal by default: same k inside and outside).
    on_failure : {"raise", "nan"}
        See :func:`shortwave.films.complex_frequency`.

    Returns
    -------
    numeric
        sigma0_clean / sigma0_slick = y(k_B) [1] (linear; 10 log10 for dB).

    Notes
    -----
    Pure Bragg scattering, backscatter proportional to the spectrum at k_B, local
    equilibrium in which only viscous damping differs inside the slick (A&H89 [1]_; the
    equation number was not checked).  Not for incidences below about 20 degrees.

    Examples
    --------
    >>> from shortwave.films import Monolayer
    >>> from shortwave.water import Water
    >>> round(float(alpers_huhnerfuss1989(202.25, Monolayer(0.025, 1.0), Water(20, 35))), 1)
    10.2
    """
    return _films.damping_ratio(bragg_wavenumber, film, water, form, on_failure=on_failure)


def _balance(g_c, g_f, beta, friction_ratio, exponent):
    """Contrast K and bound flag from rates (arrays broadcast)."""
    r2 = np.asarray(friction_ratio, float) ** 2
    n = np.asarray(exponent, float)
    y = g_f / g_c
    # The bound is the A&H89 ratio y itself (non-local supply balancing viscous damping
    # does not involve the saturation exponent n), times the wind-input reduction
    # r^(-2/n) (the strong-wind limit of the balance); it is not y^(1/n).
    bound = y * r2 ** (-1.0 / n)
    num = beta - 2.0 * g_c                           # films.md Sec. 4.3, Eq. (2)
    den = r2 * beta - 2.0 * g_f
    ok = (num > 0) & (den > 0)
    with np.errstate(divide="ignore", invalid="ignore"):
        ratio = np.where(ok, num / np.where(ok, den, 1.0), np.inf)
    k_bal = ratio ** (1.0 / n)                       # K = [(...)/(...)]^(1/n), Eq. (2)
    capped = k_bal >= bound
    k_lin = np.minimum(k_bal, bound)
    nan = np.isnan(beta) | np.isnan(g_f) | np.isnan(g_c)
    return np.where(nan, np.nan, k_lin), np.where(nan, False, capped)


def balance_contrast(bragg_wavenumber, wind_speed, film, water=None, *, azimuth_deg=0.0,
                     friction_ratio=1.0, exponent=1.0, ustar_law="wu1982",
                     return_bound=False, on_failure="raise"):
    """Slick contrast from the local balance of wind input and dissipation, with a bound.

    Parameters
    ----------
    bragg_wavenumber : numeric
        k_B [rad m-1] (or any wavenumber), within :data:`shortwave.films.K_RANGE`.
    wind_speed : numeric
        U10 [m s-1], > 0.
    film : Monolayer, OilLayer or str
    water : Water or Liquid, optional
    azimuth_deg : numeric
        Wind direction relative to the wave (radar look) [degree]; growth ~ |cos|.
    friction_ratio : numeric
        r = u*_slick / u*, in (0, 1]; default 1 (wind input unchanged); A&H89 used 0.8.
    exponent : numeric
        n of the saturation law N^n ~ (beta - 2 Gamma); 1 (default) for short gravity
        waves, up to about 3 in the capillary range (Kudryavtsev et al. 2003 [4]_).
    ustar_law : str
        See :func:`wind_growth_rate`.
    return_bound : bool
        Also return a boolean array, True where the bound sets the contrast.
    on_failure : {"raise", "nan"}
        See :func:`shortwave.films.complex_frequency`.

    Returns
    -------
    numeric
        K = S_clean / S_slick at k_B [1] (linear), broadcast over all inputs.

    Notes
    -----
    K = min([(beta - 2 Gamma_c) / (r^2 beta - 2 Gamma_f)]^(1/n), y r^(-2/n))
    (films.md Sec. 4.3, Eq. 2, with the bound of the module docstring); beta from
    :func:`wind_growth_rate` (Plant 1982), Gamma from the exact film relation.  Where
    beta <= 2 Gamma_c (waves not wind-sustained even outside the slick) or
    r^2 beta <= 2 Gamma_f, the bound applies.  The bound is the A&H89 ratio y (times
    r^(-2/n)) for every n: with ``exponent=3`` and weak wind the contrast is y, not y^(1/3).

    Examples
    --------
    >>> from shortwave.films import Monolayer
    >>> from shortwave.water import Water
    >>> K = balance_contrast(202.25, [3.0, 7.0, 10.0], Monolayer(0.025, 1.0), Water(20, 35))
    >>> [round(float(10 * np.log10(x)), 1) for x in K]
    [10.1, 8.4, 1.8]
    """
    kb = check_positive("bragg_wavenumber", bragg_wavenumber, unit="rad m-1")
    u = check_positive("wind_speed", wind_speed, unit="m s-1")
    r = check_range("friction_ratio", friction_ratio, 0.0, 1.0, inclusive=(False, True))
    n = check_positive("exponent", exponent)
    g_c, g_f = _rates(kb, film, water, on_failure)
    beta = np.asarray(wind_growth_rate(kb, u, azimuth_deg, water, ustar_law))
    k_lin, capped = _balance(g_c, g_f, beta, r, n)
    k_lin, capped = scalar_or_array(k_lin), scalar_or_array(capped)
    return (k_lin, capped) if return_bound else k_lin


def spectral_contrast(k, wind_speed, film, model="balance", water=None, *, azimuth_deg=0.0,
                      friction_ratio=1.0, exponent=1.0, ustar_law="wu1982",
                      on_failure="raise"):
    """Contrast K(k) = S_clean(k) / S_slick(k) of the wave spectrum over any wavenumbers.

    Parameters
    ----------
    k : numeric
        Wavenumber [rad m-1], > 0.  Outside :data:`shortwave.films.K_RANGE` the film is
        taken to have no effect below 1 rad m-1 (K = 1: film damping is negligible
        against wind input there) and the value at 2e4 rad m-1 is used above (where the
        spectrum is negligible).
    wind_speed : numeric
        U10 [m s-1], > 0 (ignored by ``"alpers_huhnerfuss1989"``).
    film : Monolayer, OilLayer or str
    model : {"balance", "alpers_huhnerfuss1989"}
    water, azimuth_deg, friction_ratio, exponent, ustar_law, on_failure :
        As in :func:`balance_contrast`.

    Returns
    -------
    numeric
        K(k) [1], >= 1 for a damping film.

    Examples
    --------
    >>> K = spectral_contrast([0.5, 100.0], 5.0, "natural")
    >>> float(K[0]), bool(K[1] > 2)
    (1.0, True)
    """
    model = check_choice("model", model, SPECTRUM_MODELS)
    k = check_positive("k", k, unit="rad m-1")
    lo, hi = _films.K_RANGE
    kk = np.clip(np.where(np.isnan(k), lo, k), lo, hi)
    if model == "alpers_huhnerfuss1989":
        g_c, g_f = _rates(kk, film, water, on_failure)
        out = g_f / g_c
    else:
        u = check_positive("wind_speed", wind_speed, unit="m s-1")
        r = check_range("friction_ratio", friction_ratio, 0.0, 1.0, inclusive=(False, True))
        n = check_positive("exponent", exponent)
        g_c, g_f = _rates(kk, film, water, on_failure)
        beta = np.asarray(wind_growth_rate(kk, u, azimuth_deg, water, ustar_law))
        out, _ = _balance(g_c, g_f, beta, r, n)
    out = np.where(k < lo, 1.0, out)
    return scalar_or_array(np.where(np.isnan(k), np.nan, out))


def contrast(film, frequency_hz=None, incidence_deg=None, wind_speed=None, *,
             bragg_wavenumber=None, model="balance", water=None, azimuth_deg=0.0,
             friction_ratio=1.0, exponent=1.0, ustar_law="wu1982", polarization="VV",
             form="temporal", on_failure="raise", radar_options=None):
    """Radar contrast of a slick, sigma0_clean / sigma0_slick (linear, >= 1 when darker).

    Parameters
    ----------
    film : Monolayer, OilLayer or str
        Film or preset name; its parameters may be arrays (e.g. an oil-thickness field),
        except for ``model="two-scale"``.
    frequency_hz : numeric, optional
        Radar frequency [Hz]; give it with ``incidence_deg``, or give ``bragg_wavenumber``.
    incidence_deg : numeric, optional
        Incidence angle [degree], in (0, 90); the Bragg models are meant for 20-60 degrees
        (a ``ValidityWarning`` outside).
    wind_speed : numeric, optional
        U10 [m s-1], > 0; required by ``"balance"`` and ``"two-scale"``.
    bragg_wavenumber : numeric, optional
        k_B [rad m-1] directly (Bragg models only).
    model : str
        One of :data:`MODELS`.
    water : Water or Liquid, optional
    azimuth_deg : numeric
        Wind direction relative to the radar look [degree], 0 = upwind.
    friction_ratio, exponent, ustar_law :
        Balance model, see :func:`balance_contrast`.
    polarization : str
        Two-scale model only (``"VV"`` or ``"HH"``).
    form : {"temporal", "spatial"}
        Damping-ratio form for ``"alpers_huhnerfuss1989"``.
    on_failure : {"raise", "nan"}
        See :func:`shortwave.films.complex_frequency`.
    radar_options : dict, optional
        Extra keywords for :func:`shortwave.radar.nrcs` (two-scale model).

    Returns
    -------
    numeric
        Contrast [1], broadcast over all array inputs.

    Examples
    --------
    >>> from shortwave.films import Monolayer
    >>> from shortwave.water import Water
    >>> c = contrast(Monolayer(0.025, 1.0), 5.405e9, 30.0, model="alpers_huhnerfuss1989",
    ...              water=Water(20, 35))
    >>> round(float(c), 1)
    16.7
    """
    model = check_choice("model", model, MODELS)
    film = _films._film_or_clean(film)
    if film is None:
        raise ShortwaveInputError("film: a film is required for a slick contrast")
    if model == "two-scale":
        return _two_scale(film, frequency_hz, incidence_deg, wind_speed, water, azimuth_deg,
                          polarization, on_failure, radar_options)
    if bragg_wavenumber is None:
        if frequency_hz is None or incidence_deg is None:
            raise ShortwaveInputError("give frequency_hz and incidence_deg, or "
                                      "bragg_wavenumber")
        kb = checked_bragg_wavenumber(frequency_hz, incidence_deg)
        _warn_incidence(incidence_deg)
    else:
        kb = _films._check_k(bragg_wavenumber, "bragg_wavenumber")
    if model == "alpers_huhnerfuss1989":
        return alpers_huhnerfuss1989(kb, film, water, form, on_failure)
    if wind_speed is None:
        raise ShortwaveInputError("wind_speed: required by the balance model")
    return balance_contrast(kb, wind_speed, film, water, azimuth_deg=azimuth_deg,
                            friction_ratio=friction_ratio, exponent=exponent,
                            ustar_law=ustar_law, on_failure=on_failure)



def contrast_db(film, frequency_hz=None, incidence_deg=None, wind_speed=None, **kwargs):
    """Radar contrast of a slick in decibels, 10 log10(sigma0_clean / sigma0_slick) [dB].

    Positive when the slick is darker.  Parameters as in :func:`contrast`.

    Examples
    --------
    >>> from shortwave.films import Monolayer
    >>> from shortwave.water import Water
    >>> round(float(contrast_db(Monolayer(0.025, 1.0), 9.65e9, 30.0, 7.0,
    ...                         water=Water(20, 35))), 1)
    8.4
    """
    c = np.asarray(contrast(film, frequency_hz, incidence_deg, wind_speed, **kwargs))
    with np.errstate(divide="ignore", invalid="ignore"):
        return scalar_or_array(10.0 * np.log10(c))


def _warn_incidence(incidence_deg):
    th = as_float_array("incidence_deg", incidence_deg)
    v = th[np.isfinite(th)]
    if v.size and (v.min() < 20.0 or v.max() > 60.0):
        warnings.warn("incidence_deg outside 20-60 degree: the Bragg-scale contrast models "
                      "assume Bragg scattering (specular return dominates nearer nadir)",
                      ValidityWarning, stacklevel=3)


def inverse_spectral_contrast(k, wind_speed, film, model="alpers_huhnerfuss1989", water=None):
    """Factor multiplying the clean wave spectrum to give the film-covered one, 1 / K(k).

    Parameters
    ----------
    k : numeric
        Wavenumber [rad m-1] (clipped to :data:`shortwave.films.K_RANGE` as in
        :func:`spectral_contrast`).
    wind_speed : numeric
        U10 [m s-1] (used by the balance model).
    film : Monolayer or OilLayer or str
        The film.
    model : {"alpers_huhnerfuss1989", "balance"}
        How damping becomes spectral contrast K(k).
    water : Water, optional
        The sea water.

    Returns
    -------
    numeric
        1 / K(k) in [0, 1] for a damping film [1].  Where the film overdamps the wave (no
        propagating root of the film dispersion relation: thick viscous oil, very short
        waves) the factor is 0: those waves are taken as fully suppressed, and the film
        module's warning says how many wavenumbers that concerned.

    Notes
    -----
    Used as ``spectrum_factor`` of :func:`shortwave.radar.nrcs` for the two-scale contrast
    (``model="two-scale"`` here, and the scene module).

    Examples
    --------
    >>> f = inverse_spectral_contrast(200.0, 5.0, "oleyl-alcohol")
    >>> 0.0 < float(f) < 1.0
    True
    """
    kk = np.asarray(spectral_contrast(k, wind_speed, film, model, water, on_failure="nan"))
    with np.errstate(divide="ignore", invalid="ignore"):
        return np.where(np.isfinite(kk) & (kk > 0), 1.0 / kk, 0.0)


def _two_scale(film, frequency_hz, incidence_deg, wind_speed, water, azimuth_deg,
               polarization, on_failure, radar_options):
    from . import radar
    if frequency_hz is None or incidence_deg is None or wind_speed is None:
        raise ShortwaveInputError("two-scale contrast: give frequency_hz, incidence_deg and "
                                  "wind_speed")
    fields = ([film.thickness, film.viscosity, film.density, film.surface_tension,
               film.interfacial_tension] if isinstance(film, _films.OilLayer) else
              [film.elasticity, film.relaxation_frequency, film.dilational_viscosity,
               film.film_pressure])
    if any(np.ndim(v) for v in fields):
        raise ShortwaveInputError("film: the two-scale contrast needs a single film (scalar "
                                  "parameters); use the balance or A&H89 model for fields")
    checked_bragg_wavenumber(frequency_hz, incidence_deg)   # range check, clear message
    w = water

    def factor(k):
        if on_failure == "raise":
            return 1.0 / np.asarray(spectral_contrast(k, 1.0, film, "alpers_huhnerfuss1989",
                                                      w, on_failure="raise"))
        return inverse_spectral_contrast(k, 1.0, film, "alpers_huhnerfuss1989", w)

    opts = dict(radar_options or {})
    clean = np.asarray(radar.nrcs(frequency_hz, incidence_deg, wind_speed, polarization,
                                  azimuth_deg, "two-scale", water=w, **opts))
    slick = np.asarray(radar.nrcs(frequency_hz, incidence_deg, wind_speed, polarization,
                                  azimuth_deg, "two-scale", water=w, spectrum_factor=factor,
                                  **opts))
    return scalar_or_array(clean / slick)


# ----------------------------------------------------------------------------------------
# Film-damped spectrum and its slopes
# ----------------------------------------------------------------------------------------

def damped_curvature(k, wind_speed, film, model="balance", water=None, *,
                     spectrum_model="elfouhaily1997", spectrum_options=None, **contrast_options):
    """Curvature spectrum B(k) = k^3 S(k) of the film-covered sea [1].

    Parameters
    ----------
    k : numeric
        Wavenumber [rad m-1], > 0.
    wind_speed : numeric
        U10 [m s-1], > 0.
    film : Monolayer, OilLayer or str
    model : {"balance", "alpers_huhnerfuss1989"}
        How the film lowers the spectrum (:func:`spectral_contrast`).
    water : Water or Liquid, optional
        Water for the film damping (the spectrum model uses its own constants unless
        ``spectrum_options`` says otherwise).
    spectrum_model : str
        Clean spectrum, one of :data:`shortwave.spectrum.MODELS`.
    spectrum_options : dict, optional
        Keywords of :func:`shortwave.spectrum.curvature` (``inverse_wave_age``, ...).
    **contrast_options
        ``azimuth_deg``, ``friction_ratio``, ``exponent``, ``ustar_law``, ``on_failure``.

    Returns
    -------
    numeric
        B_clean(k) / K(k) [1].

    Examples
    --------
    >>> b0 = damped_curvature(100.0, 5.0, "natural", model="alpers_huhnerfuss1989")
    >>> from shortwave.spectrum import curvature
    >>> bool(b0 < curvature(100.0, 5.0) / 2)
    True
    """
    from .spectrum import curvature
    b = np.asarray(curvature(k, wind_speed, model=spectrum_model, **(spectrum_options or {})))
    kk = np.asarray(k, float)
    K = np.asarray(spectral_contrast(kk, wind_speed, film, model, water, **contrast_options))
    return scalar_or_array(b / K)


def damped_spectrum(k, wind_speed, film, model="balance", water=None, **options):
    """Omnidirectional elevation spectrum S(k) of the film-covered sea [m3].

    Parameters as in :func:`damped_curvature`; returns S_clean(k) / K(k), the film
    contrast applied to :func:`shortwave.spectrum.omnidirectional`.

    Examples
    --------
    >>> s = damped_spectrum([10.0, 100.0], 7.0, "oleyl-alcohol")
    >>> bool(s[1] < s[0])
    True
    """
    kk = check_positive("k", k, unit="rad m-1")
    return scalar_or_array(np.asarray(damped_curvature(kk, wind_speed, film, model, water,
                                                       **options)) / kk**3)


def damped_mean_square_slope(wind_speed, film, model="balance", water=None, *,
                             k_min=None, k_max=1.0e4, n=2001,
                             spectrum_model="elfouhaily1997", spectrum_options=None,
                             **contrast_options):
    """Mean square slope of the film-damped spectrum, integral of B(k)/K(k) d ln k [1].

    Parameters
    ----------
    wind_speed : numeric
        U10 [m s-1], > 0 (any shape).
    film : Monolayer, OilLayer or str
        A single film (scalar parameters).
    model : {"balance", "alpers_huhnerfuss1989"}
    water : Water or Liquid, optional
    k_min : numeric, optional
        Lower limit [rad m-1]; default k_p / 50 as in
        :func:`shortwave.spectrum.mean_square_slope`.
    k_max : float
        Upper limit [rad m-1] (default 1e4).
    n : int
        Log-uniform integration points.
    spectrum_model, spectrum_options, **contrast_options :
        As in :func:`damped_curvature`.

    Returns
    -------
    numeric
        mss [1], shape of ``wind_speed``.

    Notes
    -----
    Plausibility band: the slick regression of Cox & Munk (1954) [5]_,
    :func:`cox_munk1954_slick_mss` (oil slicks off Hawaii, wind at 12.5 m).

    Examples
    --------
    >>> from shortwave.spectrum import mean_square_slope
    >>> m = damped_mean_square_slope(7.0, "oleyl-alcohol", "alpers_huhnerfuss1989")
    >>> bool(m < mean_square_slope(7.0))
    True
    """
    from .spectrum import DEFAULT_K_MIN_FACTOR, curvature, peak_wavenumber
    u = check_positive("wind_speed", wind_speed, allow_nan=False, unit="m s-1")
    opts = dict(spectrum_options or {})
    if k_min is None:
        k_min = DEFAULT_K_MIN_FACTOR * np.asarray(peak_wavenumber(
            u, opts.get("inverse_wave_age", 0.84)))
    kmin = np.broadcast_to(check_positive("k_min", k_min, unit="rad m-1"), u.shape)
    kmax = float(check_positive("k_max", k_max, unit="rad m-1"))
    if np.any(kmin >= kmax):
        raise ShortwaveInputError("k_max: must be greater than k_min")
    n = int(n)
    if n < 3:
        raise ShortwaveInputError(f"n: at least 3 integration points are needed, got {n}")
    t = np.linspace(0.0, 1.0, n)
    lnk = np.log(kmin)[..., None] + (np.log(kmax) - np.log(kmin))[..., None] * t
    kg = np.exp(lnk)
    b = np.asarray(curvature(kg, u[..., None], model=spectrum_model, **opts))
    K = np.asarray(spectral_contrast(kg, u[..., None], film, model, water,
                                     **contrast_options))
    return scalar_or_array(np.trapezoid(b / K, lnk, axis=-1))


def cox_munk1954_slick_mss(wind_speed_12m):
    """Total mean square slope of a slick-covered sea, Cox & Munk (1954) regression.

    Parameters
    ----------
    wind_speed_12m : numeric
        Wind speed at 12.5 m [m s-1], observed range about 1-14.

    Returns
    -------
    numeric
        sigma^2 = 0.008 + 1.56e-3 U [1]; quoted scatter +-0.004 (from memory).

    Examples
    --------
    >>> round(float(cox_munk1954_slick_mss(10.0)), 4)
    0.0236
    """
    u = check_positive("wind_speed_12m", wind_speed_12m, unit="m s-1")
    return scalar_or_array(0.008 + 1.56e-3 * u)  # Cox & Munk (1954), slick, total
