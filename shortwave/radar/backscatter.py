"""Normalised radar cross-section (NRCS, sigma0) of the wind-roughened sea.

:func:`nrcs` combines, for a radar frequency, incidence, wind speed and wind direction:

* the first-order **Bragg** (small-perturbation) return of the short waves
  (:mod:`shortwave.radar.spm`), averaged over the slopes of the long waves that tilt them
  (**two-scale** model, with polarisation mixing);
* the near-nadir **specular** return of the long waves (:mod:`shortwave.radar.specular`),
  with an effective nadir reflectivity lowered by the small-scale roughness;
* the polarisation-independent **breaking-wave** return (:mod:`shortwave.radar.breaking`),
  weighted by the breaking fraction q:  sigma0 = (sigma_sp + sigma_br)(1 - q) + sigma_wb q
  (Kudryavtsev et al. 2003).

Every spectral quantity comes from one wave-spectrum model of :mod:`shortwave.spectrum`
(``spectrum_model``; Elfouhaily et al. 1997 by default), optionally multiplied by
``spectrum_factor(k)`` (e.g. the damping of a surface film):

================================  ==========================================================
quantity                          spectral input (k_r radar, K_B Bragg wavenumber)
================================  ==========================================================
Bragg level                       F(K_l, phi) at each tilted facet's local Bragg vector
tilt slopes (Bragg part)          slope variances up/cross wind of waves k < k_d = K_B / 4
specular slopes                   slope variances of waves k < k_sp = k_r / 4
effective reflectivity            |R(0)|^2 exp(-4 k_r^2 h^2), h^2 = variance of k > k_sp
breaking fraction q               wind input x curvature of waves k < k_wb = k_r / 10,
                                  the spectrum folded into its propagating (down-wind) form
================================  ==========================================================

The factor multiplies S(k) in all five, so a film lowers the Bragg level, the tilt and
specular slopes, raises the effective reflectivity (smoother small scales) and lowers the
breaking fraction.

**Geometry.**  ``incidence_deg`` from the vertical, in (0, 90); ``azimuth_deg`` is the
wind direction relative to the radar look: 0 = upwind (the wind blows toward the radar),
90 = crosswind, 180 = downwind.

**Speed and memory.**  Spectral quantities are tabulated once per call on a log-uniform
wavenumber grid (64 points per decade, 1e-3 to 3e4 rad m-1) for each distinct wind speed;
with more than :data:`MAX_EXACT_WINDS` distinct winds they are tabulated on a uniform wind
grid of step :data:`WIND_STEP` and interpolated linearly in wind.  The slope average is a
Gauss-Hermite quadrature held as an array axis, evaluated in blocks of cells so memory
stays bounded.

References
----------
.. [1] Valenzuela, G. R. (1978). Theories for the interaction of electromagnetic and
   oceanic waves - a review. Boundary-Layer Meteorol. 13, 61-85.
.. [2] Kudryavtsev, V., Hauser, D., Caudal, G. and Chapron, B. (2003). A semiempirical
   model of the normalized radar cross-section of the sea surface: 1. Background model.
   J. Geophys. Res. 108(C3), 8054, doi:10.1029/2001JC001003.
.. [3] Elfouhaily, T., Chapron, B., Katsaros, K. and Vandemark, D. (1997). A unified
   directional spectrum for long and short wind-driven waves. J. Geophys. Res. 102(C7),
   15781-15796.
"""
from __future__ import annotations

import numpy as np

from .. import dispersion
from .._checks import ShortwaveInputError, as_float_array, check_choice, check_positive, \
    check_range, scalar_or_array
from ..water import as_liquid
from . import breaking as _brk
from .bands import radar_wavenumber
from .spm import _eps, _g_coefficients, _node_counts, check_polarization, microwave_incidence, \
    tilted_bragg_nrcs
from .specular import fresnel_nadir_reflectivity

__all__ = ["MODELS", "nrcs", "nrcs_db", "backscatter_components", "breaking_fraction",
           "to_db", "from_db", "MAX_EXACT_WINDS", "WIND_STEP", "DEFAULT_TILT_NODES"]

MODELS = ("two-scale", "bragg", "tilted-bragg", "specular", "breaking")
"""``model=`` keys of :func:`nrcs`:

``"two-scale"`` (default)  the full composite: (specular + tilted Bragg)(1 - q) + breaking q
``"bragg"``                first-order SPM on a flat mean surface (no tilt)
``"tilted-bragg"``         Bragg averaged over the long-wave slopes, alone
``"specular"``             the near-nadir specular term, alone
``"breaking"``             the breaking-wave term q sigma_wb, alone
"""

MAX_EXACT_WINDS = 256
"""Up to this many distinct wind speeds, spectra are evaluated at each one exactly."""

WIND_STEP = 0.025
"""Wind-grid step [m s-1] used beyond :data:`MAX_EXACT_WINDS` distinct winds."""

DEFAULT_TILT_NODES = (12, 6)
"""Gauss-Hermite nodes along / across the look direction for the slope average."""

_LNK0, _LNK1 = np.log(1e-3), np.log(3e4)
_NK = int(round((_LNK1 - _LNK0) / np.log(10) * 64)) + 1
_LNK = np.linspace(_LNK0, _LNK1, _NK)
_DLNK = _LNK[1] - _LNK[0]
_BLOCK = 2**20   # elements per block in the slope quadrature
_PHI_DEG = np.linspace(0.0, 90.0, 37)   # fold angles of the directional tables [degree]
_DPHI = np.deg2rad(_PHI_DEG[1] - _PHI_DEG[0])


def to_db(value):
    """Convert a linear power ratio to decibels, 10 log10(value).

    Parameters
    ----------
    value : numeric
        Linear value (sigma0 [m2 m-2], a power ratio).

    Returns
    -------
    numeric
        [dB].  Non-positive and NaN inputs give NaN (no warning): a zero cross-section
        has no finite decibel value.

    Examples
    --------
    >>> float(to_db(0.1)), float(to_db(1.0))
    (-10.0, 0.0)
    >>> bool(np.isnan(to_db(0.0)))
    True
    """
    v = as_float_array("value", value)
    pos = v > 0
    out = np.full(v.shape, np.nan)
    np.log10(v, out=out, where=pos)
    return scalar_or_array(np.where(pos, 10.0 * out, np.nan))


def from_db(value_db):
    """Convert decibels to a linear power ratio, 10^(value_db / 10).

    Parameters
    ----------
    value_db : numeric
        [dB]; NaN gives NaN, -inf gives 0.

    Examples
    --------
    >>> float(from_db(-10.0)), round(float(from_db(3.0)), 4)
    (0.1, 1.9953)
    """
    return scalar_or_array(10.0 ** (as_float_array("value_db", value_db) / 10.0))


# --- spectral tables -------------------------------------------------------------------

class _Tables:
    """Spectral quantities per wind row on the log-k grid (internal)."""

    __slots__ = ("winds", "exact", "lnb", "delta", "mss_up", "mss_cross", "height_above",
                 "q0", "q1", "lnb_dir")


def _cumtrapz(y):
    out = np.zeros_like(y)
    out[..., 1:] = np.cumsum(0.5 * (y[..., 1:] + y[..., :-1]), axis=-1) * _DLNK
    return out


def _spectrum_tables(winds, spectrum_model, spectrum_options, spectrum_factor, water):
    from .. import spectrum as _spec
    opts = dict(spectrum_options or {})
    for key, val in opts.items():
        if np.ndim(val) != 0 and key != "water":
            raise ShortwaveInputError(
                f"spectrum_options: {key} must be a single value (the spectrum is tabulated "
                "per wind speed)")
    k = np.exp(_LNK)
    u = winds[:, None]
    model = check_choice("model", spectrum_model, _spec.MODELS)
    b_dir = None
    if model == "elfouhaily1997":
        b = np.asarray(_spec.curvature(k[None, :], u, model=model, **opts), dtype=float)
        d = np.asarray(_spec.spreading(k[None, :], u, model=model, **opts), dtype=float)
    else:
        # the spreading of this model is not of the form (1 + Delta cos 2 phi): tabulate its
        # own folded (centrosymmetric) directional spectrum B_f, instead of the truncated
        # second-harmonic form B (1 + Delta cos 2 phi), which turns negative where
        # Delta > 1; B and Delta are its integrals (trapezoid rule on the fold angles)
        b_f = np.asarray(_spec.directional_curvature(
            k[None, :, None], _PHI_DEG[None, None, :], u[:, :, None], model=model,
            centrosymmetric=True, **opts), dtype=float)
        phi = np.deg2rad(_PHI_DEG)
        b = 4.0 * np.trapezoid(b_f, phi, axis=-1)             # integral over the circle
        harm = 8.0 * np.trapezoid(b_f * np.cos(2.0 * phi), phi, axis=-1)
        d = np.where(b > 0, harm / np.where(b > 0, b, 1.0), 0.0)
        b_dir = 2.0 * np.pi * b_f
    b, d = np.broadcast_arrays(b, d)
    if spectrum_factor is not None:
        fac = np.asarray(spectrum_factor(k), dtype=float)
        try:
            fac = np.broadcast_to(fac, k.shape)
        except ValueError:
            raise ShortwaveInputError("spectrum_factor: must return one value per "
                                      "wavenumber (same shape as its argument)") from None
        if not np.all(np.isfinite(fac)) or np.any(fac < 0):
            raise ShortwaveInputError("spectrum_factor: values must be finite and >= 0")
        b = b * fac
        if b_dir is not None:
            b_dir = b_dir * fac[:, None]
    t = _Tables()
    t.winds = winds
    t.lnb = np.log(np.maximum(b, 1e-300))
    # folded directional curvature times 2 pi on the fold angle grid _PHI_DEG, or None
    # for the Elfouhaily spectrum (exactly B (1 + Delta cos 2 phi))
    t.lnb_dir = None if b_dir is None else np.log(np.maximum(b_dir, 1e-300))
    t.delta = d
    t.mss_up = _cumtrapz(b * (0.5 + 0.25 * d))      # slope variance along the wind below k
    t.mss_cross = _cumtrapz(b * (0.5 - 0.25 * d))   # ... across the wind
    h = b / k**2                                     # S dk = B k^-2 dln k
    t.height_above = _cumtrapz(h[..., ::-1])[..., ::-1]  # variance of waves above k
    # breaking: wind input C_beta (u*/c)^2 times the spectrum folded into its propagating
    # form, direction integrals I0, I1 (breaking.py)
    law = opts.get("ustar_law", "constant-drag")
    if "friction_velocity" in opts:
        ustar = np.full(winds.shape, float(opts["friction_velocity"]))
    else:
        ustar = np.asarray(_spec.friction_velocity(winds, law=law,
                                                   inverse_wave_age=opts.get(
                                                       "inverse_wave_age", 0.84)))
    c = np.asarray(dispersion.phase_speed(k, water))
    beta = _brk.WIND_INPUT_CONSTANT * (ustar[:, None] / c[None, :]) ** 2
    i0, i1 = _brk.wind_input_directional_factors(d)
    t.q0 = _cumtrapz(beta * b * i0)
    t.q1 = _cumtrapz(beta * b * i1)
    return t


def _wind_rows(wind):
    """Return the wind values to tabulate and, per cell, (row, weight)."""
    finite = wind[np.isfinite(wind)]
    if finite.size == 0:
        winds = np.array([10.0])
    else:
        uniq = np.unique(finite)
        if uniq.size <= MAX_EXACT_WINDS:
            winds = uniq
        else:
            # grid anchored at multiples of WIND_STEP, so that the nodes (and results)
            # do not depend on which other winds share the call (e.g. a dask chunk)
            lo = np.floor(uniq[0] / WIND_STEP) * WIND_STEP
            hi = np.ceil(uniq[-1] / WIND_STEP) * WIND_STEP
            n = int(round((hi - lo) / WIND_STEP)) + 1
            winds = lo + WIND_STEP * np.arange(max(n, 2))
            if winds[0] <= 0:   # no node at zero wind: start at the lightest wind
                winds = np.concatenate([uniq[:1], winds[winds > uniq[0]]])
    w = np.where(np.isfinite(wind), wind, winds[0])
    if winds.size == 1:
        return winds, np.zeros(w.shape, dtype=np.intp), np.zeros(w.shape)
    row = np.clip(np.searchsorted(winds, w, side="right") - 1, 0, winds.size - 2)
    frac = np.clip((w - winds[row]) / (winds[row + 1] - winds[row]), 0.0, 1.0)
    return winds, row, frac


def _interp(table, row, frac, lnk):
    """Bilinear interpolation of ``table[row, :]`` in wind (row, frac) and ln k."""
    nw, nk = table.shape
    pos = (lnk - _LNK0) / _DLNK
    i = np.clip(np.floor(pos).astype(np.intp), 0, nk - 2)
    t = np.clip(pos - i, 0.0, 1.0)
    flat = table.ravel()
    base = row * nk + i
    lo = flat[base] * (1 - t) + flat[base + 1] * t
    if nw == 1:
        return lo
    nxt = np.minimum(row + 1, nw - 1) * nk + i
    hi = flat[nxt] * (1 - t) + flat[nxt + 1] * t
    return lo * (1 - frac) + hi * frac


def _fold_angle(angle):
    """Angle from the wind axis folded into [0, pi/2] [rad] (centrosymmetric, mirror)."""
    return np.abs(np.mod(angle + 0.5 * np.pi, np.pi) - 0.5 * np.pi)


def _directional_level(tab, row, frac, lnk, angle):
    """Folded directional curvature times 2 pi, B_f(k, phi) 2 pi [1], at ``angle`` from
    the wind axis [rad]: B (1 + Delta cos 2 phi) for the Elfouhaily spectrum, else
    trilinear interpolation of the model's own table in wind, ln k and angle."""
    if tab.lnb_dir is None:
        return (np.exp(_interp(tab.lnb, row, frac, lnk))
                * (1.0 + _interp(tab.delta, row, frac, lnk) * np.cos(2.0 * angle)))
    nw, nk, nphi = tab.lnb_dir.shape
    pos = _fold_angle(angle) / _DPHI
    j = np.clip(np.floor(pos).astype(np.intp), 0, nphi - 2)
    tj = np.clip(pos - j, 0.0, 1.0)
    posk = (lnk - _LNK0) / _DLNK
    i = np.clip(np.floor(posk).astype(np.intp), 0, nk - 2)
    ti = np.clip(posk - i, 0.0, 1.0)
    flat = tab.lnb_dir.ravel()

    def at_row(r):                    # bilinear in (ln k, angle) on wind row r
        base = (r * nk + i) * nphi + j
        lo = flat[base] * (1 - tj) + flat[base + 1] * tj
        hi = flat[base + nphi] * (1 - tj) + flat[base + nphi + 1] * tj
        return lo * (1 - ti) + hi * ti

    val = at_row(row)
    if nw > 1:
        val = val * (1 - frac) + at_row(np.minimum(row + 1, nw - 1)) * frac
    return np.exp(val)


def _permittivity(frequency_hz, water, permittivity, permittivity_model):
    if permittivity is not None:
        return _eps(permittivity)
    w = as_liquid(water)
    if permittivity_model is None:
        return _eps(w.permittivity(frequency_hz))
    return _eps(w.permittivity(frequency_hz, model=permittivity_model))


def _check_model(model):
    return check_choice("model", model, MODELS)


def backscatter_components(frequency_hz, incidence_deg, wind_speed, polarization="VV",
                           azimuth_deg=0.0, *, spectrum_model="elfouhaily1997",
                           spectrum_options=None, spectrum_factor=None, water=None,
                           permittivity=None, permittivity_model=None, cutoff_ratio=0.25,
                           specular_cutoff_ratio=0.25, reflectivity_factor=None,
                           breaking=True, breaking_asymmetry=1.0,
                           tilt_nodes=DEFAULT_TILT_NODES, min_local_incidence_deg=10.0,
                           parts=("bragg", "tilted-bragg", "specular", "breaking")):
    """Every term of the composite NRCS and the spectral quantities behind it.

    Parameters are those of :func:`nrcs` (``parts`` limits which terms are computed).

    Returns
    -------
    dict of str to numeric
        ``"bragg"`` flat-surface SPM, ``"tilted-bragg"`` slope-averaged Bragg,
        ``"specular"``, ``"breaker_nrcs"`` (sigma_wb), ``"breaking_fraction"`` (q),
        ``"breaking"`` (q sigma_wb), ``"two-scale"`` (the composite), all linear; and
        ``"tilt_mss_upwind"``, ``"tilt_mss_crosswind"`` (k < k_d),
        ``"specular_mss_upwind"``, ``"specular_mss_crosswind"`` (k < k_sp),
        ``"reflectivity"`` (effective |R|^2), ``"bragg_wavenumber"`` [rad m-1].
        Terms not requested in ``parts`` are absent.

    Examples
    --------
    >>> c = backscatter_components(5.405e9, 40.0, 10.0, permittivity=66.2 - 34.4j)
    >>> bool(c["tilted-bragg"] > c["specular"])
    True
    """
    pol = check_polarization(polarization)
    k_r = np.asarray(radar_wavenumber(frequency_hz), dtype=float)
    th = microwave_incidence(incidence_deg)
    u = check_positive("wind_speed", wind_speed, unit="m s-1")
    az = as_float_array("azimuth_deg", azimuth_deg)
    if np.any(np.isinf(az)):
        raise ShortwaveInputError("azimuth_deg: infinite values are not allowed")
    cut = float(check_range("cutoff_ratio", cutoff_ratio, 0.0, 1.0,
                            inclusive=(False, False), allow_nan=False))
    cut_sp = float(check_range("specular_cutoff_ratio", specular_cutoff_ratio, 0.0, 2.0,
                               inclusive=(False, True), allow_nan=False))
    asym = float(check_range("breaking_asymmetry", breaking_asymmetry, 0.0, 1.0,
                             allow_nan=False))
    eps = _permittivity(frequency_hz, water, permittivity, permittivity_model)
    water_l = as_liquid(water)
    f_hz = np.asarray(frequency_hz, dtype=float)
    shape = np.broadcast_shapes(k_r.shape, th.shape, u.shape, az.shape, eps.shape)
    f_hz, k_r, th, u, az, eps = (np.broadcast_to(a, shape).ravel()
                                 for a in (f_hz, k_r, th, u, az, eps))
    winds, row, frac = _wind_rows(u)
    tab = _spectrum_tables(winds, spectrum_model, spectrum_options, spectrum_factor,
                           water_l)
    a = np.deg2rad(az)
    k_b = 2.0 * k_r * np.sin(th)
    out = {"bragg_wavenumber": k_b}

    def slopes(kcut):
        lnk = np.log(kcut)
        return (np.maximum(_interp(tab.mss_up, row, frac, lnk), 0.0),
                np.maximum(_interp(tab.mss_cross, row, frac, lnk), 0.0))

    def bragg_spectrum(rows, fracs, angles):
        def f(kk, direction):
            k2 = kk * kk
            level = _directional_level(tab, rows[:, None], fracs[:, None], np.log(kk),
                                       direction - angles[:, None])
            return level / (k2 * k2) / (2 * np.pi)      # Cartesian F = B(k, phi) / k^4
        return f

    if "bragg" in parts:
        if pol == "HV":
            out["bragg"] = np.zeros(shape).ravel()
        else:
            f_b = _directional_level(tab, row, frac, np.log(k_b), a) / k_b**4 / (2 * np.pi)
            g_hh, g_vv = _g_coefficients(th, eps)
            g = g_vv if pol == "VV" else g_hh
            out["bragg"] = 16 * np.pi * k_r**4 * np.cos(th) ** 4 * np.abs(g) ** 2 * f_b  # SPM
    if "tilted-bragg" in parts or "two-scale" in parts:
        su, sc = slopes(cut * k_b)
        out["tilt_mss_upwind"], out["tilt_mss_crosswind"] = su, sc
        ca, sa = np.cos(a), np.sin(a)
        sxx = su * ca**2 + sc * sa**2          # slope covariance in the radar frame
        syy = su * sa**2 + sc * ca**2
        sxy = (su - sc) * sa * ca
        n1, n2 = _node_counts(tilt_nodes)
        n_nodes = n1 * n2
        step = max(1, _BLOCK // n_nodes)
        res = np.empty(k_r.size)
        for s0 in range(0, k_r.size, step):    # blocks of cells; nodes are an array axis
            sl = slice(s0, s0 + step)
            res[sl] = tilted_bragg_nrcs(
                f_hz[sl], np.rad2deg(th[sl]),
                bragg_spectrum(row[sl], frac[sl], a[sl]),
                (sxx[sl], syy[sl], sxy[sl]), eps[sl], pol, nodes=tilt_nodes,
                min_local_incidence_deg=min_local_incidence_deg)
        out["tilted-bragg"] = res
    if "specular" in parts or "two-scale" in parts:
        k_sp = cut_sp * k_r
        su, sc = slopes(k_sp)
        out["specular_mss_upwind"], out["specular_mss_crosswind"] = su, sc
        r0 = np.asarray(fresnel_nadir_reflectivity(eps))
        if reflectivity_factor is None:
            h2 = np.maximum(_interp(tab.height_above, row, frac, np.log(k_sp)), 0.0)
            refl = r0 * np.exp(-4.0 * k_r**2 * h2)   # Rayleigh roughness factor
        else:
            fac = float(check_range("reflectivity_factor", reflectivity_factor, 0.0, 1.0,
                                    allow_nan=False))
            refl = r0 * fac
        out["reflectivity"] = refl
        ok = (su > 0) & (sc > 0)
        su_s, sc_s = np.where(ok, su, 1.0), np.where(ok, sc, 1.0)
        t2 = np.tan(th) ** 2
        expo = t2 * (np.cos(a) ** 2 / (2 * su_s) + np.sin(a) ** 2 / (2 * sc_s))
        sp = refl * np.exp(-expo) / (2 * np.sqrt(su_s * sc_s) * np.cos(th) ** 4)  # GO term
        out["specular"] = np.where(ok, sp, 0.0) if pol != "HV" else np.zeros(k_r.size)
    if "breaking" in parts or "two-scale" in parts:
        lnk = np.log(_brk.BREAKER_CUTOFF_RATIO * k_r)
        q = _brk.BREAKING_FRACTION_CONSTANT * (
            _interp(tab.q0, row, frac, lnk) + asym * np.cos(a) * _interp(tab.q1, row, frac, lnk))
        q = np.clip(q, 0.0, 1.0)
        swb = np.asarray(_brk.breaker_nrcs(np.rad2deg(th)))
        if pol == "HV":
            swb = np.zeros_like(swb)
        out["breaking_fraction"], out["breaker_nrcs"] = q, swb
        out["breaking"] = q * swb
    if "two-scale" in parts:
        q = out["breaking_fraction"] if breaking else 0.0
        out["two-scale"] = ((out["specular"] + out["tilted-bragg"]) * (1.0 - q)
                            + (out["breaking"] if breaking else 0.0))  # KHCC 2003 sum
    bad = ~np.isfinite(u)
    result = {}
    for key, val in out.items():
        val = np.asarray(val, dtype=float)
        if val.size == bad.size:
            val = np.where(bad, np.nan, val)
        result[key] = scalar_or_array(val.reshape(shape))
    return result


def nrcs(frequency_hz, incidence_deg, wind_speed, polarization="VV", azimuth_deg=0.0,
         model="two-scale", *, spectrum_model="elfouhaily1997", spectrum_options=None,
         spectrum_factor=None, water=None, permittivity=None, permittivity_model=None,
         cutoff_ratio=0.25, specular_cutoff_ratio=0.25, reflectivity_factor=None,
         breaking=True, breaking_asymmetry=1.0, tilt_nodes=DEFAULT_TILT_NODES,
         min_local_incidence_deg=10.0):
    """Normalised radar cross-section sigma0 of the wind-roughened sea (linear).

    Parameters
    ----------
    frequency_hz : numeric
        Radar frequency [Hz], > 0 (microwave: L to Ka band is the tested range).
    incidence_deg : numeric
        Incidence angle from the vertical [degree], in (0, 90) exclusive.
    wind_speed : numeric
        U10, neutral wind speed at 10 m [m s-1], > 0; NaN gives NaN.
    polarization : {"VV", "HH", "HV", "VH"}
        HV (= VH) contains only the tilt-induced Bragg depolarisation; the specular and
        breaking terms are co-polarised only.
    azimuth_deg : numeric
        Wind direction relative to the look [degree]: 0 upwind (wind toward the radar),
        90 crosswind, 180 downwind.
    model : str
        One of :data:`MODELS`; default ``"two-scale"`` (the full composite).
    spectrum_model : str
        Wave spectrum, one of :data:`shortwave.spectrum.MODELS`.
    spectrum_options : dict, optional
        Single-valued options passed to the spectrum (``inverse_wave_age``, ``fetch``,
        ``ustar_law``, ``friction_velocity``, ``water``, ...).
    spectrum_factor : callable, optional
        ``f(k) -> array``: multiplies the elevation spectrum at wavenumber k [rad m-1]
        (e.g. a film's damping); applied to every spectral quantity (see the module
        docstring table).
    water : Water, optional
        Sea water giving the permittivity (default 15 degC, 35 g/kg) and the phase
        speeds of the breaking term.
    permittivity : complex numeric, optional
        Overrides the water's permittivity (``eps' - 1j*eps''``).
    permittivity_model : str, optional
        Permittivity model key of :func:`shortwave.permittivity.permittivity`.
    cutoff_ratio : float
        k_d / K_B, the split between tilting and Bragg scales (default 1/4, after
        Kudryavtsev et al. 2003); sigma0 changes by a few tenths of a dB over [1/5, 1/2]
        at incidences >= 30 deg.
    specular_cutoff_ratio : float
        k_sp / k_r for the slopes of the specular term (default 1/4).
    reflectivity_factor : float, optional
        If given, |R_eff|^2 = factor * |R(0)|^2 (an empirical effective reflectivity);
        by default the Rayleigh factor exp(-4 k_r^2 h^2) of the waves above k_sp.
    breaking : bool
        Include the breaking-wave term in ``"two-scale"``.
    breaking_asymmetry : float
        Breaker-orientation weight in [0, 1] (see :mod:`shortwave.radar.breaking`);
        0 makes the breaking term isotropic.
    tilt_nodes : int or (int, int)
        Gauss-Hermite nodes along / across the look for the slope average.
    min_local_incidence_deg : float
        Facets tilted below this local incidence are left to the specular term [degree].

    Returns
    -------
    numeric
        sigma0 [linear, m2 m-2]; use :func:`to_db` for decibels.

    Notes
    -----
    sigma0 = (sigma_sp + <sigma_br>)(1 - q) + q sigma_wb (Kudryavtsev et al. 2003 [2]_),
    <sigma_br> the Bragg cross-section averaged over the long-wave slopes (Valenzuela
    1978 [1]_).  Known limits: with Elfouhaily et al. (1997) spectra the Bragg +
    tilt level is a few dB below observed C-band VV levels; the breaking and specular
    terms reduce, but do not close, that gap at moderate incidence.

    Examples
    --------
    >>> s_up = nrcs(5.405e9, 40.0, 10.0, "VV", 0.0, permittivity=66.2 - 34.4j)
    >>> s_cross = nrcs(5.405e9, 40.0, 10.0, "VV", 90.0, permittivity=66.2 - 34.4j)
    >>> bool(s_up > s_cross)
    True
    """
    model = _check_model(model)
    comps = backscatter_components(
        frequency_hz, incidence_deg, wind_speed, polarization, azimuth_deg,
        spectrum_model=spectrum_model, spectrum_options=spectrum_options,
        spectrum_factor=spectrum_factor, water=water, permittivity=permittivity,
        permittivity_model=permittivity_model, cutoff_ratio=cutoff_ratio,
        specular_cutoff_ratio=specular_cutoff_ratio, reflectivity_factor=reflectivity_factor,
        breaking=breaking, breaking_asymmetry=breaking_asymmetry, tilt_nodes=tilt_nodes,
        min_local_incidence_deg=min_local_incidence_deg, parts=(model,))
    return comps[model]


def nrcs_db(*args, **kwargs):
    """:func:`nrcs` in decibels, 10 log10(sigma0) [dB] (NaN where sigma0 <= 0).

    Examples
    --------
    >>> bool(nrcs_db(5.405e9, 40.0, 10.0, permittivity=66.2 - 34.4j) < -5.0)
    True
    """
    return to_db(nrcs(*args, **kwargs))


def breaking_fraction(frequency_hz, wind_speed, azimuth_deg=0.0, *,
                      spectrum_model="elfouhaily1997", spectrum_options=None,
                      spectrum_factor=None, water=None, breaking_asymmetry=1.0):
    """Fraction q of the sea surface covered by radar-visible breaking zones.

    Parameters
    ----------
    frequency_hz : numeric
        Radar frequency [Hz] (sets the cut-off k_wb = k_r / 10).
    wind_speed : numeric
        U10 [m s-1], > 0.
    azimuth_deg : numeric
        Wind direction relative to the look [degree], 0 = upwind.
    spectrum_model, spectrum_options, spectrum_factor, water, breaking_asymmetry :
        As in :func:`nrcs`.

    Returns
    -------
    numeric
        q [dimensionless], in [0, 1].

    Notes
    -----
    q = c_q int_{k < k_wb} int beta(k, phi) B(k, phi) w(phi) dphi dln k with
    beta = C_beta (u*/c)^2 cos phi |cos phi| (Kudryavtsev et al. 2003 [2]_; form and
    constants from memory, see :mod:`shortwave.radar.breaking`), B(k, phi) the spectrum
    folded into its propagating form (all waves within 90 deg of down-wind) and w the
    breaker-orientation weight.  An order of magnitude, not a calibrated value.

    Examples
    --------
    >>> q = breaking_fraction(5.405e9, [5.0, 10.0, 15.0])
    >>> bool(q[0] < q[1] < q[2])
    True
    """
    comps = backscatter_components(
        frequency_hz, 45.0, wind_speed, "VV", azimuth_deg, spectrum_model=spectrum_model,
        spectrum_options=spectrum_options, spectrum_factor=spectrum_factor, water=water,
        permittivity=70.0 - 40.0j, breaking_asymmetry=breaking_asymmetry,
        parts=("breaking",))
    return comps["breaking_fraction"]
