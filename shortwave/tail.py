"""Graft the capillary-gravity tail onto wave-model spectra.

A spectral wave model resolves the sea surface only up to its highest frequency (typically
0.4-1 Hz, wavelengths of a few metres).  Radar, optics and slope statistics need the
whole spectrum, down to millimetre ripples: the mean square slope of a wave-model spectrum
is only 15-30 % of the Cox & Munk (1954) value in a fully developed sea (reference note
``spectra.md``, pitfall 14).  This module converts frequency-direction spectra E(f, theta)
into wavenumber-direction spectra F(k, theta), keeps the resolved part and adds a model
tail above it, out to a wavenumber that covers Ka-band Bragg scales.

Method (all spectra of a batch at once, NumPy only)
---------------------------------------------------
1. **Resolved part, f -> k.**  The variance of each frequency bin, E(f_i, theta) df_i with
   the true bin widths (CF bounds, or the geometric/arithmetic cell edges of the grid), is
   placed on the wavenumber interval [k(f_lo), k(f_hi)] given by the capillary-gravity
   dispersion relation at the water depth (:func:`shortwave.spectrum.convert.\
wavenumber_of_frequency`), with a k^-3 shape inside the interval (constant curvature, the
   saturation-range form).  This is variance conservation, E(f, theta) df = F(k, theta) dk
   (Ardhuin's textbook, chapter "measurement"), done bin by bin: the variance of every bin
   and direction is conserved exactly, at any depth.
2. **Seam.**  The resolved spectrum ends at k_s = k(upper edge of the highest frequency
   bin).  Its curvature level there is that of the top bin, B_s(theta) = k^3 F, constant
   over the bin by construction.
3. **Tail** (k > k_s).  Over the transition band [k_s, R k_s] (R = ``transition_ratio``,
   default 2, i.e. one octave in k, about half an octave in frequency) the tail blends
   from the resolved level continued as a saturation range, B_s(theta) k^-3 (the k^-3 /
   f^-5 diagnostic tail of wave models), into the chosen model spectrum F_model(k, phi):

       F_tail(k, theta) = (1 - w) B_s(theta) k^-3 + w F_model(k, phi),
       w = (1 - cos(pi x)) / 2,  x = ln(k / k_s) / ln R  clipped to [0, 1],

   with phi the angle of theta from the downwind direction.  Above R k_s the tail is the
   model spectrum.  The curvature spectrum is therefore continuous at k_s (both sides equal
   B_s) and across the band, the resolved part is kept unchanged below k_s, and nothing is
   counted twice.
4. **Output** on a log-uniform wavenumber grid (``points_per_decade`` cells per decade)
   from k of the lowest frequency in deep water to ``k_max`` (default :data:`K_MAX`):
   cell averages of F(k, theta) [m3 rad-1]; and per spectrum the significant wave height
   and the mean square slope (total, along and across the wind), for the resolved part
   (sum of k(f)^2 E df dtheta on the file's own grid), the tail, and their sum.

Conventions: directions in degrees, in the convention of the file ("from" or "to"; a
180 degree flip leaves every slope moment unchanged); wind direction is where the wind
comes *from* (CF ``wind_from_direction``).  The tail is the model's centrosymmetric
(frozen-surface) form, as radar and slope statistics use it; the resolved part keeps the
direction of travel of the wave model.

Bad input: NaN anywhere in a spectrum gives NaN outputs for that spectrum (counted by the
callers); NaN wind gives NaN tail and totals (resolved moments are kept); negative
variance densities (beyond rounding of packed data), negative wind speeds, non-positive
depths raise :class:`shortwave._checks.ShortwaveInputError`.  NaN depth means deep water.

References
----------
.. [1] Cox, C. and Munk, W. (1954). Measurement of the roughness of the sea surface from
   photographs of the sun's glitter. J. Opt. Soc. Am. 44(11), 838-850.
.. [2] Elfouhaily, T., Chapron, B., Katsaros, K. and Vandemark, D. (1997). A unified
   directional spectrum for long and short wind-driven waves. J. Geophys. Res. 102(C7),
   15781-15796.
.. [3] Ardhuin, F. Ocean waves in geosciences (open textbook), chapter "measurement"
   (E(k, theta) = E(f, theta) c_g / 2 pi) and chapter "model_global" (geometric frequency
   grids, bin widths, diagnostic tails).
.. [4] IEEE Std 521-2019, IEEE Standard Letter Designations for Radar-Frequency Bands
   (Ka band: 27-40 GHz).
"""
from __future__ import annotations

import numpy as np

from ._checks import ShortwaveInputError, as_float_array, check_choice
from .spectrum import MODELS as SPECTRUM_MODELS
from .spectrum.convert import angle_from_wind, wavenumber_of_frequency
from .spectrum.moments import direction_widths

__all__ = ["K_MAX", "POINTS_PER_DECADE", "TRANSITION_RATIO", "INVERSE_WAVE_AGE_RANGE",
           "TAIL_MODELS", "OUTPUTS", "frequency_edges", "wavenumber_grid",
           "transition_weight", "peak_inverse_wave_age", "extend_spectra",
           "prepare_inputs", "wind_inputs", "depth_input", "extend_dataset",
           "count_spectra", "chunk_plan", "splits_stored_chunks", "output_encoding",
           "spectrum_parts", "TAIL_METADATA"]

K_MAX = 2000.0
"""Default upper wavenumber of the extended spectra [rad m-1].

Bragg scattering selects k_B = 2 k_radar sin(incidence) <= 2 k_radar.  At 40 GHz, the
upper edge of the Ka band (IEEE Std 521: 27-40 GHz), 2 k_radar = 1677 rad m-1, so 2000
rad m-1 covers Ka-band Bragg waves at every incidence angle.
"""

POINTS_PER_DECADE = 40
"""Default number of output wavenumber cells per decade (cell ratio 1.059)."""

TRANSITION_RATIO = 2.0
"""Default width R of the transition band [k_s, R k_s] (one octave in wavenumber)."""

INVERSE_WAVE_AGE_RANGE = (0.84, 5.0)
"""Clip range of the inverse wave age estimated from the spectral peak (ECKV validity)."""

TAIL_MODELS = tuple(SPECTRUM_MODELS)
"""Allowed ``model=`` keys: the spectrum models of :mod:`shortwave.spectrum`."""

_HARMONIC_MODELS = ("elfouhaily1997",)
# Models whose directional form is exactly S(k) (1 + Delta(k) cos 2 phi) / (2 pi)
# (ECKV Eq. 49): built from omnidirectional() and spreading() on the (k) grid, 36 times
# cheaper than evaluating directional() on the (k, phi) grid.  Other models use
# directional().

OUTPUTS = ("spectrum", "curvature", "hs", "hs_resolved", "mss", "mss_upwind",
           "mss_crosswind", "mss_resolved", "mss_upwind_resolved", "mss_crosswind_resolved",
           "mss_tail", "mss_upwind_tail", "mss_crosswind_tail", "seam_wavenumber",
           "inverse_wave_age")
"""Per-spectrum results of :func:`extend_spectra` (keys of its result besides the grid)."""

_GRAVITY_ECKV = 9.81   # gravity of the ECKV fit, for c_p = g / (2 pi f_p) (deep water)


# -----------------------------------------------------------------------------------------
# Grids
# -----------------------------------------------------------------------------------------

def _check_axis(name, x):
    x = as_float_array(name, x)
    if x.ndim != 1 or x.size < 2:
        raise ShortwaveInputError(f"{name}: a 1-D axis with at least 2 values is needed, got "
                                  f"shape {x.shape}")
    if not np.all(np.isfinite(x)) or np.any(x <= 0):
        raise ShortwaveInputError(f"{name}: values must be finite and > 0")
    if np.any(np.diff(x) <= 0):
        raise ShortwaveInputError(f"{name}: values must be strictly increasing (sorted, no "
                                  "repeats)")
    return x


def frequency_edges(frequency_hz, bounds=None, rtol=1e-4):
    """Cell edges of a frequency grid (the true bin widths of wave-model output).

    Parameters
    ----------
    frequency_hz : array_like
        Frequencies [Hz], 1-D, strictly increasing, > 0.
    bounds : array_like, optional
        CF bounds, shape (nf, 2) (contiguous cells) or nf + 1 edges [Hz].
    rtol : float
        Tolerance on the ratio f_{i+1}/f_i for recognising a geometric grid (files often
        store frequencies rounded to a few digits).

    Returns
    -------
    ndarray
        nf + 1 edges [Hz].  Geometric grid f_{i+1} = X f_i: edges at geometric means,
        f_i / sqrt(X) and f_i sqrt(X), i.e. widths f_i (sqrt(X) - 1/sqrt(X)) (common
        practice of spectral wave models; reference note Sect. 5).  Otherwise arithmetic
        midpoints, end cells mirrored.

    Examples
    --------
    >>> e = frequency_edges([0.1, 0.11, 0.121])
    >>> [round(float(v), 5) for v in e]
    [0.09535, 0.10488, 0.11537, 0.12691]
    """
    f = _check_axis("frequency_hz", frequency_hz)
    if bounds is not None:
        b = as_float_array("frequency bounds", bounds)
        if b.ndim == 2 and b.shape == (f.size, 2):
            lo, hi = np.minimum(b[:, 0], b[:, 1]), np.maximum(b[:, 0], b[:, 1])
            if not np.allclose(lo[1:], hi[:-1], rtol=1e-6, atol=0):
                raise ShortwaveInputError("frequency bounds: the cells are not contiguous "
                                          "(upper edge of one cell must be the lower edge "
                                          "of the next)")
            edges = np.concatenate([lo, hi[-1:]])
        elif b.ndim == 1 and b.size == f.size + 1:
            edges = b
        else:
            raise ShortwaveInputError(f"frequency bounds: expected shape ({f.size}, 2) or "
                                      f"{f.size + 1} edges, got {b.shape}")
        if np.any(np.diff(edges) <= 0) or edges[0] <= 0 or np.any(edges[:-1] > f) \
                or np.any(edges[1:] < f):
            raise ShortwaveInputError("frequency bounds: edges must be increasing, > 0 and "
                                      "enclose each frequency")
        return edges
    r = f[1:] / f[:-1]
    if f.size > 2 and np.allclose(r, r.mean(), rtol=rtol, atol=0):
        mid = np.sqrt(f[1:] * f[:-1])
        s = np.sqrt(r.mean())
        return np.concatenate([[f[0] / s], mid, [f[-1] * s]])
    mid = 0.5 * (f[1:] + f[:-1])
    lo = f[0] - (mid[0] - f[0])
    if lo <= 0:
        lo = f[0] * f[0] / mid[0]
    return np.concatenate([[lo], mid, [f[-1] + (f[-1] - mid[-1])]])


def wavenumber_grid(k_min, k_max=K_MAX, points_per_decade=POINTS_PER_DECADE):
    """Log-uniform output wavenumber cells.

    Parameters
    ----------
    k_min : float
        First edge [rad m-1], > 0.
    k_max : float
        Last edge [rad m-1], > k_min.
    points_per_decade : int
        Cells per decade (>= 4); the cell count is rounded up.

    Returns
    -------
    edges : ndarray
        n + 1 edges [rad m-1], first k_min, last k_max.
    centres : ndarray
        n geometric cell centres sqrt(edge_j edge_{j+1}) [rad m-1].

    Examples
    --------
    >>> e, c = wavenumber_grid(1.0, 100.0, 10)
    >>> len(c), round(float(c[0]), 4)
    (20, 1.122)
    """
    k_min = float(k_min)
    k_max = float(k_max)
    if not (np.isfinite(k_min) and k_min > 0):
        raise ShortwaveInputError(f"k_min: must be > 0 rad m-1, got {k_min:g}")
    if not (np.isfinite(k_max) and k_max > k_min):
        raise ShortwaveInputError(f"k_max: must be finite and greater than {k_min:g} rad m-1 "
                                  f"(the lowest resolved wavenumber), got {k_max:g}")
    ppd = int(points_per_decade)
    if ppd < 4:
        raise ShortwaveInputError(f"points_per_decade: must be >= 4, got {points_per_decade}")
    n = int(np.ceil(ppd * np.log10(k_max / k_min) - 1e-9))
    n = max(n, 2)
    edges = np.geomspace(k_min, k_max, n + 1)
    return edges, np.sqrt(edges[:-1] * edges[1:])


def transition_weight(k, k_seam, ratio=TRANSITION_RATIO):
    """Weight w of the model spectrum in the transition band (raised cosine in ln k).

    Parameters
    ----------
    k : array_like
        Wavenumbers [rad m-1].
    k_seam : array_like
        Seam wavenumber k_s [rad m-1] (broadcast with ``k``).
    ratio : float
        Band width R > 1: w = 0 at k_s, w = 1 from R k_s on.

    Returns
    -------
    ndarray
        w = (1 - cos(pi x))/2, x = ln(k/k_s)/ln R clipped to [0, 1] [1].

    Examples
    --------
    >>> [float(v) for v in transition_weight([1.0, 2 ** 0.5, 2.0, 4.0], 1.0, 2.0)]
    [0.0, 0.5, 1.0, 1.0]
    """
    r = float(ratio)
    if not r > 1.0:
        raise ShortwaveInputError(f"transition_ratio: must be > 1, got {ratio}")
    x = np.clip(np.log(np.asarray(k, dtype=float) / np.asarray(k_seam, dtype=float))
                / np.log(r), 0.0, 1.0)
    return np.round(0.5 * (1.0 - np.cos(np.pi * x)), 15)


def peak_inverse_wave_age(E, frequency_hz, direction_widths_rad, wind_speed,
                          limits=INVERSE_WAVE_AGE_RANGE):
    """Inverse wave age Omega = U10 / c_p from the peak of each resolved spectrum.

    Parameters
    ----------
    E : array_like
        E(f, theta) [m2 s rad-1], shape (n, nf, ntheta).
    frequency_hz : array_like
        Frequencies [Hz], (nf,).
    direction_widths_rad : array_like
        Direction cell widths [rad], (ntheta,).
    wind_speed : array_like
        U10 [m s-1], (n,).
    limits : (float, float)
        Clip range (the model's validity range; a swell peak gives Omega < 0.84, which is
        read as a fully developed wind sea).

    Returns
    -------
    ndarray
        Omega [1], (n,); c_p = g / (2 pi f_p) (deep water, g = 9.81 as in ECKV), f_p the
        frequency node of the maximum of E(f) = sum E dtheta.

    Examples
    --------
    >>> E = np.zeros((1, 3, 2)); E[0, 1] = 1.0
    >>> round(float(peak_inverse_wave_age(E, [0.1, 0.15, 0.2], [np.pi, np.pi], [10.0])[0]), 3)
    0.961
    """
    E = np.asarray(E, dtype=float)
    ef = np.einsum("nij,j->ni", np.nan_to_num(E), np.asarray(direction_widths_rad, float))
    fp = np.asarray(frequency_hz, dtype=float)[np.argmax(ef, axis=-1)]
    om = np.asarray(wind_speed, dtype=float) * 2 * np.pi * fp / _GRAVITY_ECKV  # U / c_p
    return np.clip(om, limits[0], limits[1])


# -----------------------------------------------------------------------------------------
# Core: NumPy, vectorised over the spectra of a batch
# -----------------------------------------------------------------------------------------

def _row_locate(edges_rows, targets):
    """For each row r of increasing ``edges_rows`` (n, m), the index j with
    edges[r, j] <= t < edges[r, j + 1] for every target t (nt,), as (n, nt); -1 below and
    m - 1 at or above the last edge.  One searchsorted on a flattened, row-offset array."""
    n, m = edges_rows.shape
    le = np.log(edges_rows)
    lt = np.log(targets)
    span = float(max(le.max(), lt.max()) - min(le.min(), lt.min())) + 1.0
    off = (np.arange(n) * span)[:, None]
    flat = (le + off).ravel()
    pos = np.searchsorted(flat, (lt[None, :] + off).ravel(), side="right").reshape(n, -1)
    return pos - (np.arange(n) * m)[:, None] - 1


def _model_directional(k, theta_to_deg, wind_speed, wind_from_deg, omega, model, water, kw):
    """Model F(k, phi) [m3 rad-1] on (n, nc) wavenumbers and (nth,) directions."""
    from . import spectrum
    from .spectrum.spreading import spreading_function
    phi = angle_from_wind(theta_to_deg[None, :], wind_from_deg[:, None])       # (n, nth)
    if model in _HARMONIC_MODELS:
        s = np.asarray(spectrum.omnidirectional(k, wind_speed[:, None], model=model,
                                                inverse_wave_age=omega[:, None],
                                                water=water, **kw))
        d = np.asarray(spectrum.spreading(k, wind_speed[:, None], model=model,
                                          inverse_wave_age=omega[:, None], water=water,
                                          **kw))
        return s[..., None] * np.asarray(spreading_function(phi[:, None, :], d[..., None]))
    return np.asarray(spectrum.directional(k[..., None], phi[:, None, :],
                                           wind_speed[:, None, None], model=model,
                                           inverse_wave_age=omega[:, None, None],
                                           water=water, **kw))


def extend_spectra(E, frequency_hz, direction_deg, wind_speed, wind_direction_deg,
                   depth=np.inf, *, convention="from", frequency_bounds=None, k_max=K_MAX,
                   points_per_decade=POINTS_PER_DECADE, wavenumber_edges=None,
                   transition_ratio=TRANSITION_RATIO, model="elfouhaily1997",
                   inverse_wave_age="peak", water=None, parts=False, spectra=True,
                   negative_tolerance=1e-6, block=64, name="E", **model_kw):
    """Extend frequency-direction spectra with a capillary-gravity tail (module docstring).

    Parameters
    ----------
    E : array_like
        E(f, theta) [m2 s rad-1], shape (..., nf, ntheta); leading axes are spectra
        (time, station, grid cell...).  Per-degree densities must be converted first.
    frequency_hz : array_like
        Frequencies [Hz], 1-D, strictly increasing, > 0.
    direction_deg : array_like
        Directions [degree], 1-D, distinct modulo 360, any order and offset.
    wind_speed : array_like
        U10 [m s-1], >= 0 (0: calm, the tail fades out over the transition band),
        broadcast to the leading shape; NaN gives NaN tails.
    wind_direction_deg : array_like
        Direction the wind comes from [degree] (CF ``wind_from_direction``).
    depth : array_like
        Water depth [m], > 0; ``np.inf`` (default) or NaN for deep water.
    convention : {"from", "to"}
        Convention of ``direction_deg`` (CF sea_surface_wave_from/to_direction).
    frequency_bounds : array_like, optional
        CF frequency bounds (see :func:`frequency_edges`).
    k_max : float
        Upper end of the output grid [rad m-1] (default :data:`K_MAX`, Ka band).
    points_per_decade : int
        Output grid resolution.
    wavenumber_edges : array_like, optional
        Explicit output cell edges [rad m-1] instead of the default grid; must start at or
        below the lowest resolved wavenumber.
    transition_ratio : float
        R > 1: the transition band is [k_s, R k_s].
    model : str
        Tail model, one of :data:`TAIL_MODELS`.
    inverse_wave_age : "peak" or float or array_like
        Omega = U10/c_p of the model: ``"peak"`` estimates it from the peak of each
        resolved spectrum (:func:`peak_inverse_wave_age`), or give values (0.84 = fully
        developed).
    water : Water or Liquid, optional
        Liquid for the dispersion relation and the model (default sea water and the
        model's fixed capillary constants).
    parts : bool
        Also return the resolved and tail parts of the output spectrum, and the pure
        model spectrum, on the output grid (for figures).
    spectra : bool
        Return the extended spectra and curvature spectra (False: only the per-spectrum
        values, less memory).
    negative_tolerance : float
        Densities below -tolerance * max(E) of their spectrum are an error; smaller
        negative values (rounding of packed data) are set to 0.
    block : int
        Spectra processed together (bounds the temporary memory: about 0.3 MB each).
    name : str
        Name of the spectrum in error messages.
    **model_kw
        Options of the spectrum model (e.g. ``ustar_law``).

    Returns
    -------
    dict
        ``wavenumber`` (nk,) cell centres and ``wavenumber_bounds`` (nk, 2) [rad m-1];
        ``spectrum`` F(k, theta) [m3 rad-1] (..., nk, ntheta), float32, cell averages;
        ``curvature`` B(k) = k^3 S(k) [1] (..., nk); ``hs``, ``hs_resolved`` [m];
        ``mss``, ``mss_upwind``, ``mss_crosswind`` and the same with ``_resolved`` and
        ``_tail`` [1]; ``seam_wavenumber`` k_s [rad m-1]; ``inverse_wave_age`` [1];
        with ``parts``: ``resolved_spectrum``, ``tail_spectrum``, ``model_spectrum``
        (..., nk, ntheta) [m3 rad-1].

    Raises
    ------
    ShortwaveInputError
        Shapes, axes, negative densities, negative wind speeds, non-positive depths,
        unknown model, k_max below the transition band.

    Examples
    --------
    >>> from shortwave.synthetic import geometric_frequencies, wave_spectra
    >>> f = geometric_frequencies(); th = np.arange(5.0, 360.0, 10.0)
    >>> E = wave_spectra(f, th, 10.0, 270.0)           # fully developed, U10 = 10 m/s
    >>> r = extend_spectra(E, f, th, 10.0, 270.0)
    >>> round(float(r["hs"]), 2), round(float(r["mss_resolved"]), 4), round(float(r["mss"]), 3)
    (2.25, 0.0109, 0.056)
    """
    model = check_choice("model", model, TAIL_MODELS)
    convention = check_choice("convention", convention, ("from", "to"))
    E = as_float_array(name, E)
    f = _check_axis("frequency_hz", frequency_hz)
    th = as_float_array("direction_deg", direction_deg)
    if th.ndim != 1:
        raise ShortwaveInputError("direction_deg: a 1-D axis is needed")
    dth = direction_widths(th)                                            # [rad]
    nf, nth = f.size, th.size
    if E.ndim < 2 or E.shape[-2:] != (nf, nth):
        raise ShortwaveInputError(f"{name}: trailing axes must be (frequency, direction) = "
                                  f"({nf}, {nth}), got shape {E.shape}")
    batch = E.shape[:-2]

    def _batch(arg, value):
        a = as_float_array(arg, value)
        try:
            return np.broadcast_to(a, batch).ravel()
        except ValueError:
            raise ShortwaveInputError(f"{arg}: shape {a.shape} does not broadcast to the "
                                      f"spectra's leading shape {batch}") from None

    U = _batch("wind_speed", wind_speed)
    WD = _batch("wind_direction_deg", wind_direction_deg)
    H = _batch("depth", depth)
    if np.any(U < 0):
        raise ShortwaveInputError(f"wind_speed: must be >= 0 m s-1, got minimum "
                                  f"{np.nanmin(U):g}")
    if np.any(H <= 0):
        raise ShortwaveInputError(f"depth: must be > 0 m (np.inf for deep water), got minimum "
                                  f"{np.nanmin(H):g}")
    H = np.where(np.isnan(H), np.inf, H)
    n = int(np.prod(batch)) if batch else 1
    E2 = E.reshape(n, nf, nth)
    fe = frequency_edges(f, frequency_bounds)
    df = np.diff(fe)
    theta_to = np.mod(th + (180.0 if convention == "from" else 0.0), 360.0)
    ratio = float(transition_ratio)
    if not ratio > 1.0:
        raise ShortwaveInputError(f"transition_ratio: must be > 1, got {transition_ratio}")

    # output grid (shared by all spectra): deep water gives the smallest k(f)
    k_deep_lo = float(wavenumber_of_frequency([fe[0]], np.inf, water)[0][0])
    if wavenumber_edges is None:
        K, Kc = wavenumber_grid(k_deep_lo, k_max, points_per_decade)
    else:
        K = _check_axis("wavenumber_edges", wavenumber_edges)
        if K[0] > k_deep_lo * (1 + 1e-12):
            raise ShortwaveInputError(f"wavenumber_edges: must start at or below the lowest "
                                      f"resolved wavenumber {k_deep_lo:g} rad m-1, got "
                                      f"{K[0]:g}")
        Kc = np.sqrt(K[:-1] * K[1:])
    nk = Kc.size
    dK = np.diff(K)

    # k of the frequency edges and nodes, per distinct depth
    uh, inv = np.unique(H, return_inverse=True)
    ke_u = np.asarray(wavenumber_of_frequency(fe, uh, water)[0]).reshape(uh.size, nf + 1)
    kn_u = np.asarray(wavenumber_of_frequency(f, uh, water)[0]).reshape(uh.size, nf)
    k_seam_u = ke_u[:, -1]
    if np.any(ratio * k_seam_u > K[-1]):
        raise ShortwaveInputError(
            f"k_max: the output grid ends at {K[-1]:g} rad m-1, below the end of the "
            f"transition band {ratio * k_seam_u.max():g} rad m-1; raise k_max")

    out = {"wavenumber": Kc, "wavenumber_bounds": np.stack([K[:-1], K[1:]], -1)}
    spec_out = np.full((n, nk, nth) if spectra else (0, nk, nth), np.nan, dtype=np.float32)
    curv_out = np.full((n, nk) if spectra else (0, nk), np.nan)
    res = {key: np.full(n, np.nan) for key in OUTPUTS[2:]}
    if parts:
        part_arrays = {key: np.full((n, nk, nth), np.nan) for key in
                       ("resolved_spectrum", "tail_spectrum", "model_spectrum")}

    for start in range(0, n, max(int(block), 1)):
        sl = slice(start, min(start + max(int(block), 1), n))
        e = np.array(E2[sl], dtype=float)
        m = e.shape[0]
        u, wd, iu = U[sl], WD[sl], inv[sl]
        spec_ok = np.all(np.isfinite(e), axis=(1, 2))
        wind_ok = np.isfinite(u) & np.isfinite(wd)
        e = np.where(spec_ok[:, None, None], e, 0.0)
        emax = np.max(e, axis=(1, 2))
        bad = e < -float(negative_tolerance) * emax[:, None, None]
        if np.any(bad):
            r, i, j = np.argwhere(bad)[0]
            raise ShortwaveInputError(
                f"{name}: negative variance density {e[r, i, j]:g} (spectrum {start + r} of "
                f"the batch, frequency {f[i]:g} Hz, direction {th[j]:g} degree); variance "
                "spectra must be >= 0")
        e = np.maximum(e, 0.0)
        ke, kn = ke_u[iu], kn_u[iu]                                   # (m, nf+1), (m, nf)
        V = e * df[None, :, None]                                     # variance per rad
        # --- resolved part on the output cells: cumulative variance, k^-3 inside bins
        C = np.concatenate([np.zeros((m, 1, nth)), np.cumsum(V, axis=1)], axis=1)
        j = np.clip(_row_locate(ke, K), 0, nf - 1)                    # (m, nk+1)
        rows = np.arange(m)[:, None]
        a, b = ke[rows, j], ke[rows, j + 1]
        frac = np.clip((a**-2 - K[None, :] ** -2) / (a**-2 - b**-2), 0.0, 1.0)  # step 1
        Cout = C[rows, j] + frac[..., None] * V[rows, j]              # (m, nk+1, nth)
        Cout = np.where((K[None, :] <= ke[:, :1])[..., None], 0.0, Cout)
        Cout = np.where((K[None, :] >= ke[:, -1:])[..., None], C[:, -1:, :], Cout)
        Vres = np.diff(Cout, axis=1)                                  # (m, nk, nth)
        del Cout, C
        # --- seam: curvature level of the top bin, B_s(theta) = V / integral k^-3 dk
        ks = ke[:, -1]
        itop = 0.5 * (ke[:, -2] ** -2 - ks**-2)
        Bs = V[:, -1, :] / itop[:, None]                              # (m, nth) [rad-1]
        # --- tail cells: columns from the first cell that reaches above any seam
        j0 = int(np.searchsorted(K, ks.min(), side="right") - 1)
        j0 = min(max(j0, 0), nk - 1)
        lo = np.maximum(K[None, j0:-1], ks[:, None])
        hi = K[None, j0 + 1:]
        width = np.maximum(hi - lo, 0.0)                              # (m, nc)
        keval = np.where(width > 0, np.sqrt(np.maximum(lo, 1e-300) * hi), Kc[None, j0:])
        w = transition_weight(keval, ks[:, None], ratio)
        ucalc = np.where(wind_ok & (u > 0), u, 1.0)
        wdc = np.where(wind_ok, wd, 0.0)
        if isinstance(inverse_wave_age, str):
            check_choice("inverse_wave_age", inverse_wave_age, ("peak",))
            om = peak_inverse_wave_age(e, f, dth, ucalc)
        else:
            om = np.broadcast_to(as_float_array("inverse_wave_age", inverse_wave_age),
                                 batch).ravel()[sl]
        Fm = _model_directional(keval, theta_to, ucalc, wdc, om, model, water, model_kw)
        Fm = np.where((wind_ok & (u > 0))[:, None, None], Fm, 0.0)
        Ft = (1.0 - w)[..., None] * Bs[:, None, :] * keval[..., None] ** -3 \
            + w[..., None] * Fm           # step 3: k^-3 bridge blended into the model
        Vt = Ft * width[..., None]
        if spectra:
            F = Vres.copy()
            F[:, j0:, :] += Vt
            F /= dK[None, :, None]
        # --- moments
        cos2 = np.cos(np.deg2rad(th[None, :] - wd[:, None])) ** 2 * dth[None, :]  # (m, nth)
        m0_res = np.einsum("mij,j->m", V, dth)
        kv = np.einsum("mij,mi->mj", V, kn**2)                        # sum k^2 V over f
        mss_res = kv @ dth
        up_res = np.sum(kv * cos2, -1)
        m0_t = np.einsum("mcj,j->m", Vt, dth)
        kt = np.einsum("mcj,mc->mj", Vt, keval**2)
        mss_t = kt @ dth
        up_t = np.sum(kt * cos2, -1)
        full = spec_ok & wind_ok
        nanif = lambda x, ok: np.where(ok, x, np.nan)  # noqa: E731
        res["hs_resolved"][sl] = nanif(4.0 * np.sqrt(m0_res), spec_ok)
        res["mss_resolved"][sl] = nanif(mss_res, spec_ok)
        okd = spec_ok & np.isfinite(wd)
        res["mss_upwind_resolved"][sl] = nanif(up_res, okd)
        res["mss_crosswind_resolved"][sl] = nanif(mss_res - up_res, okd)
        res["hs"][sl] = nanif(4.0 * np.sqrt(m0_res + m0_t), full)
        res["mss"][sl] = nanif(mss_res + mss_t, full)
        res["mss_upwind"][sl] = nanif(up_res + up_t, full)
        res["mss_crosswind"][sl] = nanif(mss_res + mss_t - up_res - up_t, full)
        res["mss_tail"][sl] = nanif(mss_t, full)
        res["mss_upwind_tail"][sl] = nanif(up_t, full)
        res["mss_crosswind_tail"][sl] = nanif(mss_t - up_t, full)
        res["seam_wavenumber"][sl] = ks
        res["inverse_wave_age"][sl] = nanif(om, full)
        if spectra:
            spec_out[sl] = np.where(full[:, None, None], F, np.nan)
            curv_out[sl] = nanif(Kc[None, :] ** 3 * np.einsum("mkj,j->mk", F, dth),
                                 full[:, None])
            del F
        if parts:
            part_arrays["resolved_spectrum"][sl] = nanif(Vres / dK[None, :, None],
                                                         spec_ok[:, None, None])
            tail = np.zeros_like(Vres)
            tail[:, j0:, :] = Vt
            part_arrays["tail_spectrum"][sl] = nanif(tail / dK[None, :, None],
                                                     full[:, None, None])
            kk = np.broadcast_to(Kc[None, :], (m, nk))
            part_arrays["model_spectrum"][sl] = nanif(
                _model_directional(kk, theta_to, ucalc, wdc, om, model, water, model_kw),
                full[:, None, None])
    if spectra:
        out["spectrum"] = spec_out.reshape(batch + (nk, nth))
        out["curvature"] = curv_out.reshape(batch + (nk,))
    for key, v in res.items():
        out[key] = v.reshape(batch) if batch else v[0]
    if parts:
        for key, v in part_arrays.items():
            out[key] = v.reshape(batch + (nk, nth))
    return out


# -----------------------------------------------------------------------------------------
# NetCDF / xarray layer (imports xarray lazily; the core above is NumPy only)
# -----------------------------------------------------------------------------------------

_OUT_NAMES = {
    "spectrum": "directional_spectrum", "curvature": "curvature_spectrum",
    "hs": "significant_wave_height", "hs_resolved": "significant_wave_height_resolved",
    "mss": "mean_square_slope", "mss_upwind": "mean_square_slope_upwind",
    "mss_crosswind": "mean_square_slope_crosswind",
    "mss_resolved": "mean_square_slope_resolved",
    "mss_upwind_resolved": "mean_square_slope_upwind_resolved",
    "mss_crosswind_resolved": "mean_square_slope_crosswind_resolved",
    "mss_tail": "mean_square_slope_tail", "mss_upwind_tail": "mean_square_slope_upwind_tail",
    "mss_crosswind_tail": "mean_square_slope_crosswind_tail",
    "seam_wavenumber": "seam_wavenumber", "inverse_wave_age": "inverse_wave_age"}

TAIL_METADATA = {
    'directional_spectrum': {'long_name': 'wavenumber-direction spectrum of surface elevation F(k, theta): resolved wave-model part extended with a capillary-gravity tail', 'units': 'm3 rad-1', 'comment': 'cell averages over the wavenumber cells (wavenumber_bounds); the double integral over wavenumber and direction equals the elevation variance; below seam_wavenumber the wave-model spectrum with its direction of travel, above it the tail model (centrosymmetric for elfouhaily1997)'},
    'curvature_spectrum': {'long_name': 'omnidirectional curvature (saturation) spectrum B(k) = k^3 S(k) of the extended spectrum', 'units': '1'},
    'significant_wave_height': {'standard_name': 'sea_surface_wave_significant_height', 'long_name': 'significant wave height 4 sqrt(m0) of the extended spectrum', 'units': 'm'},
    'inverse_wave_age': {'long_name': 'inverse wave age U10/c_p given to the tail model', 'units': '1'},
}
"""Wording of the ``extend`` outputs where the generic entry of
:data:`shortwave.metadata.OUTPUT_METADATA` is less precise (the spectra are *extended*);
applied after that table.  Everything else lives in that one table."""


def _direction_convention(dvar, given):
    sn = dvar.attrs.get("standard_name", "")
    if sn == "sea_surface_wave_from_direction":
        conv = "from"
    elif sn == "sea_surface_wave_to_direction":
        conv = "to"
    else:
        conv = None
    if given is not None:
        given = check_choice("direction_convention", given, ("from", "to"))
        if conv is not None and conv != given:
            raise ValueError(
                f"direction axis {dvar.name!r} is labelled {sn!r} but the direction "
                f"convention given is {given!r}; fix the file's standard_name or drop "
                "--direction-convention")
        return given
    if conv is None:
        raise ValueError(
            f"direction axis {dvar.name!r} has no standard_name saying whether waves come "
            "from or travel to its directions (sea_surface_wave_from_direction / "
            "sea_surface_wave_to_direction); give the convention (--direction-convention "
            "from|to)")
    return conv


def prepare_inputs(ds, *, overrides=None, units=None, direction_convention=None):
    """Find the spectrum and its axes in ``ds``; sort and convert them.

    Parameters
    ----------
    ds : xarray.Dataset
        Wave-model output (any layout: (time, station, f, theta), (time, y, x, f, theta),
        (node, f, theta), ...).
    overrides : dict or iterable of "ROLE=NAME", optional
        Explicit variable names for the roles ``spectrum``, ``frequency``, ``direction``.
    units : dict, optional
        ``role -> unit`` to assume instead of a missing or wrong ``units`` attribute.
    direction_convention : {"from", "to"}, optional
        Needed when the direction axis has no from/to standard_name.

    Returns
    -------
    dict
        ``spectrum`` (DataArray [m2 s rad-1], frequency and direction last and sorted),
        ``frequency`` [Hz] and ``direction`` [degree, 0-360) (NumPy), ``frequency_bounds``
        or None, ``frequency_dim``, ``direction_dim``, ``convention``, ``name`` (the
        spectrum variable), ``batch_dims``.

    Raises
    ------
    ValueError
        Missing variables (named, with what was searched), unknown units, axes that are
        not dimensions of the spectrum, repeated frequencies or directions.
    """
    from .ncio import convert_units, find_variable, parse_overrides, read_role
    over = parse_overrides(overrides)
    units = dict(units or {})
    spec = read_role(ds, "spectrum", over, units.get("spectrum"))
    name = spec.name
    fvar = find_variable(ds, "frequency", over)
    dvar = find_variable(ds, "direction", over)
    for role, var in (("frequency", fvar), ("direction", dvar)):
        if var.ndim != 1 or var.dims[0] not in spec.dims:
            raise ValueError(f"{role} variable {var.name!r} (dimensions {var.dims}) is not an "
                             f"axis of the spectrum {name!r} (dimensions {spec.dims})")
    fdim, ddim = fvar.dims[0], dvar.dims[0]
    if fdim == ddim:
        raise ValueError(f"frequency {fvar.name!r} and direction {dvar.name!r} share the "
                         f"dimension {fdim!r}")
    conv = _direction_convention(dvar, direction_convention)
    if "frequency" in units:
        fvar = fvar.copy(deep=False)
        fvar.attrs = {**fvar.attrs, "units": units["frequency"]}
    if "direction" in units:
        dvar = dvar.copy(deep=False)
        dvar.attrs = {**dvar.attrs, "units": units["direction"]}
    f_hz = convert_units(fvar, "s-1", f"{fvar.name} (frequency)")
    f = np.asarray(f_hz.values, dtype=float)
    th = np.mod(np.asarray(convert_units(dvar, "degree", f"{dvar.name} (direction)").values,
                           dtype=float), 360.0)
    if not np.all(np.isfinite(f)) or np.any(f <= 0):
        raise ValueError(f"frequency {fvar.name!r}: values must be finite and > 0")
    if not np.all(np.isfinite(th)):
        raise ValueError(f"direction {dvar.name!r}: values must be finite")
    bounds = None
    bname = fvar.attrs.get("bounds")
    if bname and bname in ds.variables:
        scale = float(np.asarray(f_hz.values)[0] / np.asarray(fvar.values, float)[0])
        b = np.asarray(ds[bname].values, dtype=float) * scale
        if b.ndim == 2 and b.shape[1] != 2 and b.shape[0] == 2:
            b = b.T
        bounds = b
    fo = np.argsort(f, kind="stable")
    do = np.argsort(th, kind="stable")
    if np.any(np.diff(f[fo]) <= 0):
        raise ValueError(f"frequency {fvar.name!r}: repeated values")
    ths = th[do]
    if np.any(np.diff(ths) <= 1e-9) or ths[0] + 360.0 - ths[-1] <= 1e-9:
        raise ValueError(f"direction {dvar.name!r}: repeated directions (modulo 360 degree)")
    if np.any(fo != np.arange(f.size)):
        spec = spec.isel({fdim: fo})
        if bounds is not None:
            bounds = bounds[fo]
    if np.any(do != np.arange(th.size)):
        spec = spec.isel({ddim: do})
    batch = [d for d in spec.dims if d not in (fdim, ddim)]
    spec = spec.transpose(*batch, fdim, ddim)
    spec = spec.drop_vars([c for c in (fdim, ddim) if c in spec.coords])
    return {"spectrum": spec, "frequency": f[fo], "direction": ths,
            "frequency_bounds": bounds, "frequency_dim": fdim, "direction_dim": ddim,
            "convention": conv, "name": name, "batch_dims": batch}


def _align(da, spec, what):
    """Select ``da`` at the spectrum's coordinates; refuse dimensions the spectrum lacks."""
    for d in list(da.dims):
        if d not in spec.dims:
            if da.sizes[d] == 1:
                da = da.isel({d: 0}, drop=True)
                continue
            raise ValueError(f"{what} {da.name!r} has the dimension {d!r} that the spectra do "
                             f"not have (spectra dimensions: {spec.dims})")
        if d in da.indexes and d in spec.indexes:
            if not da.indexes[d].equals(spec.indexes[d]):
                try:
                    da = da.sel({d: spec.indexes[d]})
                except KeyError:
                    missing = spec.indexes[d].difference(da.indexes[d])
                    raise ValueError(f"{what} {da.name!r} lacks {d} values of the spectra "
                                     f"(e.g. {missing[0]!s})") from None
        elif da.sizes[d] != spec.sizes[d]:
            raise ValueError(f"{what} {da.name!r} has {da.sizes[d]} values along {d!r}, the "
                             f"spectra {spec.sizes[d]}")
    return da.drop_vars([c for c in da.coords if c not in da.dims], errors="ignore")


def wind_inputs(ds, spec, *, wind=None, wind_speed=None, wind_direction=None,
                overrides=None, units=None, source="input file"):
    """Wind speed U10 [m s-1] and wind-from direction [degree] for each spectrum.

    Parameters
    ----------
    ds : xarray.Dataset
        The spectra's file.
    spec : xarray.DataArray
        The spectra (for alignment).
    wind : xarray.Dataset, optional
        Another file holding the wind (searched instead of ``ds``).
    wind_speed, wind_direction : float, optional
        Constants [m s-1], [degree from]; they take precedence over files.
    overrides, units :
        As in :func:`prepare_inputs` (roles ``wind_speed``, ``wind_direction``,
        ``eastward_wind``, ``northward_wind``).
    source : str
        Words naming where the wind is searched, for messages and provenance.

    Returns
    -------
    (speed, direction, provenance)
        DataArrays (dims a subset of the spectra's) and a text.

    Raises
    ------
    ValueError
        Wind not found (naming what was searched) or not aligned with the spectra;
        negative speeds.

    Notes
    -----
    Lookup: the roles ``wind_speed`` and ``wind_direction`` (``wind_to_direction`` is
    turned into "from" by adding 180 degree); else ``eastward_wind``/``northward_wind``:
    speed = hypot(u, v), from-direction = atan2(-u, -v) in degrees (common practice).  A
    direction variable found by name only (no standard_name) is read as "from", the
    meteorological convention.
    """
    import xarray as xr

    from .ncio import parse_overrides, read_role
    over = parse_overrides(overrides)
    units = dict(units or {})
    src = wind if wind is not None else ds
    prov = []

    def role(r):
        try:
            return read_role(src, r, over, units.get(r))
        except ValueError as exc:
            if r in over or not str(exc).startswith(f"no {r} variable"):
                raise             # an override that fails, or unknown units: say so
            return None

    speed = direction = None
    if wind_speed is not None:
        speed = xr.DataArray(float(wind_speed), name="wind_speed")
        prov.append(f"wind speed {float(wind_speed):g} m s-1 (constant)")
    if wind_direction is not None:
        direction = xr.DataArray(float(wind_direction) % 360.0, name="wind_direction")
        prov.append(f"wind from {float(wind_direction) % 360.0:g} degree (constant)")
    if speed is None:
        speed = role("wind_speed")
        if speed is not None:
            prov.append(f"wind speed from variable {speed.name!r} of the {source}")
    if direction is None:
        direction = role("wind_direction")
        if direction is not None:
            prov.append(f"wind direction from variable {direction.name!r} of the {source}")
            sn = direction.attrs.get("standard_name")   # same rule as fields.read_scene
            if sn == "wind_to_direction" or (not sn and "to_direction" in str(direction.name)):
                direction = (direction + 180.0) % 360.0
    if speed is None or direction is None:
        u, v = role("eastward_wind"), role("northward_wind")
        if u is not None and v is not None:
            if speed is None:
                speed = np.hypot(u, v).rename("wind_speed")
                prov.append(f"wind speed from components {u.name!r}, {v.name!r} of the "
                            f"{source}")
            if direction is None:
                direction = (np.degrees(np.arctan2(-u, -v)) % 360.0).rename("wind_direction")
                prov.append(f"wind direction from components {u.name!r}, {v.name!r} of "
                            f"the {source}")
    from .ncio import ROLES
    for what, val, role_name, opt in (
            ("wind speed", speed, "wind_speed", "--wind-speed VALUE"),
            ("wind direction", direction, "wind_direction", "--wind-direction DEGREES")):
        if val is None:
            r = ROLES[role_name]
            raise ValueError(
                f"{what} is needed for the tail but was not found in the {source}: searched "
                f"standard_name {'/'.join(r.standard_names)}, names {', '.join(r.names)}, "
                f"and eastward_wind/northward_wind components; variables there: "
                f"{', '.join(map(str, src.variables)) or 'none'}; give {opt}, --wind-file "
                f"FILE or --var {role_name}=NAME")
    speed = _align(speed, spec, "wind speed")
    direction = _align(direction, spec, "wind direction")
    smin = float(speed.min()) if speed.size else 0.0
    if smin < 0:
        raise ValueError(f"wind speed {speed.name!r} has negative values (minimum {smin:g} "
                         "m s-1)")
    return speed, direction, "; ".join(prov)


def depth_input(ds, spec, depth=None, *, overrides=None, units=None):
    """Water depth [m] for each spectrum: a constant, ``"deep"``, or the file's variable.

    Parameters
    ----------
    ds : xarray.Dataset
    spec : xarray.DataArray
    depth : None, float, or "deep"
        None: the ``depth`` role of the file if present, else deep water.
    overrides, units :
        As in :func:`prepare_inputs`.

    Returns
    -------
    (depth, provenance) : (xarray.DataArray, str)
        NaN or inf mean deep water.

    Raises
    ------
    ValueError
        Depths <= 0 (naming the variable and the minimum found).
    """
    import xarray as xr

    from .ncio import parse_overrides, read_role
    over = parse_overrides(overrides)
    if isinstance(depth, str) and depth.strip().lower() in ("deep", "inf", "infinite"):
        return xr.DataArray(np.inf, name="depth"), "deep water"
    if depth is not None:
        d = float(depth)
        if not d > 0:
            raise ValueError(f"depth: must be > 0 m or 'deep', got {depth}")
        return xr.DataArray(d, name="depth"), f"depth {d:g} m (constant)"
    try:
        da = read_role(ds, "depth", over, (units or {}).get("depth"))
    except ValueError:
        if "depth" in over:
            raise
        return xr.DataArray(np.inf, name="depth"), "deep water (no depth in the input file)"
    da = _align(da, spec, "depth")
    vmin = float(da.min()) if da.size else np.nan
    if np.isfinite(vmin) and vmin <= 0:
        raise ValueError(f"depth variable {da.name!r} has values <= 0 (minimum {vmin:g} m); "
                         "depths must be positive down (sea floor below the surface)")
    return da, f"depth from variable {da.name!r} of the input file (NaN read as deep water)"


def chunk_plan(sizes, batch_dims, spectra_per_chunk=1000, stored=None):
    """Dask chunks holding about ``spectra_per_chunk`` spectra, spectral axes whole.

    Parameters
    ----------
    sizes : mapping
        Dimension sizes.
    batch_dims : sequence of str
        Dimensions along which spectra are stacked (outermost first).
    spectra_per_chunk : int
        Target number of spectra per chunk (>= 1).
    stored : mapping, optional
        Chunk sizes of the spectra in the file (HDF5 chunks, ``encoding["chunksizes"]``).
        Reading a part of a compressed stored chunk decompresses all of it, so the plan
        is aligned to them: whole stored chunks when that stays within 4 times the
        target, multiples of them otherwise.

    Returns
    -------
    dict
        ``dim -> chunk size`` for the batch dims (innermost whole while they fit).

    Examples
    --------
    >>> chunk_plan({"time": 1000, "station": 10}, ["time", "station"], 1000)
    {'time': 100, 'station': 10}
    >>> chunk_plan({"time": 1000, "station": 10}, ["time", "station"], 1000,
    ...            stored={"time": 128, "station": 10})
    {'time': 128, 'station': 10}
    """
    target = max(int(spectra_per_chunk), 1)
    out = {}
    inner = 1
    for d in reversed(list(batch_dims)):
        n = int(sizes[d])
        if inner * n <= target:
            out[d] = n
            inner *= n
        else:
            out[d] = max(1, target // inner)
            inner *= out[d]
    if stored:
        aligned = {}
        for d in batch_dims:
            c = int(stored.get(d, 1) or 1)
            n = int(sizes[d])
            if out[d] >= n or c <= 1:
                aligned[d] = out[d]
            elif out[d] < c:
                aligned[d] = min(c, n)
            else:
                aligned[d] = out[d] // c * c
        if int(np.prod([aligned[d] for d in batch_dims])) <= 4 * target:
            out = aligned
    return {d: out[d] for d in batch_dims}


def splits_stored_chunks(plan, sizes, stored):
    """True when the dask chunks of ``plan`` cut through stored (HDF5) chunks.

    Examples
    --------
    >>> splits_stored_chunks({"time": 100}, {"time": 1000}, {"time": 500})
    True
    """
    for d, n in plan.items():
        c = int((stored or {}).get(d, 1) or 1)
        if c > 1 and n < int(sizes[d]) and n % c:
            return True
    return False


def extend_dataset(ds, *, overrides=None, units=None, direction_convention=None, wind=None,
                   wind_speed=None, wind_direction=None, depth=None, model="elfouhaily1997",
                   inverse_wave_age="peak", k_max=K_MAX, points_per_decade=POINTS_PER_DECADE,
                   transition_ratio=TRANSITION_RATIO, water=None, keep_spectra=True,
                   input_name=None, wind_source=None, **model_kw):
    """Extend the spectra of a wave-model Dataset with a capillary-gravity tail.

    Parameters
    ----------
    ds : xarray.Dataset
        Wave-model output; dask-backed (chunked) datasets give a lazy result.
    overrides, units, direction_convention :
        See :func:`prepare_inputs`.
    wind, wind_speed, wind_direction :
        See :func:`wind_inputs`.
    depth : None, float or "deep"
        See :func:`depth_input`.
    model, inverse_wave_age, k_max, points_per_decade, transition_ratio, water, **model_kw :
        See :func:`extend_spectra`.
    keep_spectra : bool
        Include the extended spectra and curvature spectra (else only the moments).
    input_name : str, optional
        Name of the input file for the provenance attributes.
    wind_source : str, optional
        Name of the wind file for messages and provenance.

    Returns
    -------
    xarray.Dataset
        ``directional_spectrum`` (..., wavenumber, direction) [m3 rad-1],
        ``curvature_spectrum`` (..., wavenumber) [1], significant wave heights and mean
        square slopes (total, upwind, crosswind; ``_resolved`` and ``_tail``), the wind
        and depth used, ``seam_wavenumber``, ``inverse_wave_age``; the input coordinates
        (time, station, latitude, ...) and global attributes, CF attributes from
        :data:`shortwave.metadata.OUTPUT_METADATA` and :data:`TAIL_METADATA`, and the
        method and parameters as global attributes.

    Examples
    --------
    >>> from shortwave.synthetic import greyhaven_spectra
    >>> out = extend_dataset(greyhaven_spectra(2))
    >>> dict(out["directional_spectrum"].sizes)
    {'time': 2, 'station': 3, 'wavenumber': 226, 'direction': 36}
    """
    import xarray as xr

    from . import __version__
    from .metadata import apply_metadata
    model = check_choice("model", model, TAIL_MODELS)
    inp = prepare_inputs(ds, overrides=overrides, units=units,
                         direction_convention=direction_convention)
    spec = inp["spectrum"]
    speed, wdir, wind_prov = wind_inputs(
        ds, spec, wind=wind, wind_speed=wind_speed, wind_direction=wind_direction,
        overrides=overrides, units=units,
        source=f"wind file {wind_source}" if wind_source else
        ("wind dataset" if wind is not None else "input file"))
    dep, depth_prov = depth_input(ds, spec, depth, overrides=overrides, units=units)
    f, th, conv = inp["frequency"], inp["direction"], inp["convention"]
    fdim, ddim = inp["frequency_dim"], inp["direction_dim"]
    kw = dict(convention=conv, frequency_bounds=inp["frequency_bounds"], k_max=k_max,
              points_per_decade=points_per_decade, transition_ratio=transition_ratio,
              model=model, inverse_wave_age=inverse_wave_age, water=water,
              name=inp["name"], **model_kw)
    if not isinstance(inverse_wave_age, str):
        kw["inverse_wave_age"] = float(inverse_wave_age)
    # grid of the output (same for every block): computed once here
    probe = extend_spectra(np.zeros((1, f.size, th.size)), f, th, 10.0, 0.0,
                           **{**kw, "inverse_wave_age": 0.84})
    k, kb = probe["wavenumber"], probe["wavenumber_bounds"]
    keys = list(OUTPUTS) if keep_spectra else list(OUTPUTS[2:])

    def block(E, U, WD, H):
        r = extend_spectra(E, f, th, U, WD, H, spectra=keep_spectra, **kw)
        return tuple(r[key] for key in keys)

    core_out = {"spectrum": ["wavenumber", ddim], "curvature": ["wavenumber"]}
    dtypes = {"spectrum": np.float32}
    results = xr.apply_ufunc(
        block, spec, speed, wdir, dep,
        input_core_dims=[[fdim, ddim], [], [], []],
        output_core_dims=[core_out.get(key, []) for key in keys],
        dask="parallelized",
        output_dtypes=[dtypes.get(key, np.float64) for key in keys],
        dask_gufunc_kwargs=({"output_sizes": {"wavenumber": k.size}} if keep_spectra
                            else None),
        keep_attrs=False)
    out = xr.Dataset({_OUT_NAMES[key]: r for key, r in zip(keys, results)})
    # coordinates: the input's that live on the spectra's other dimensions
    batch = set(inp["batch_dims"])
    coords = {c: ds.coords[c] for c in ds.coords
              if set(ds.coords[c].dims) <= batch and c not in (fdim, ddim)}
    out = out.assign_coords(coords)
    if keep_spectra:
        out = out.assign_coords(wavenumber=("wavenumber", k), **{ddim: (ddim, th)})
        out["wavenumber_bounds"] = (("wavenumber", "bounds"), kb)
    out["wind_speed"] = speed.astype(float).broadcast_like(out["significant_wave_height"])
    out["wind_from_direction"] = wdir.astype(float).broadcast_like(
        out["significant_wave_height"])
    if dep.ndim:
        out["depth"] = dep.astype(float)
    names = list(out.variables)
    apply_metadata(out, names)
    for name, attrs in TAIL_METADATA.items():
        if name in out.variables:
            out[name].attrs = dict(attrs)
    if keep_spectra:
        out["wavenumber"].attrs["bounds"] = "wavenumber_bounds"
        out[ddim].attrs = {
            "standard_name": f"sea_surface_wave_{conv}_direction",
            "long_name": ("direction the waves come from" if conv == "from" else
                          "direction the waves travel to") + ", clockwise from north",
            "units": "degree"}
    for c in coords:
        out[c].attrs = dict(ds.coords[c].attrs)
        out[c].encoding = dict(ds.coords[c].encoding)
    for name in out.data_vars:
        out[name].encoding = {}
    src = input_name or ds.encoding.get("source", "dataset")
    attrs = dict(ds.attrs)
    attrs.pop("Conventions", None)
    mdesc = {"elfouhaily1997": "Elfouhaily et al. (1997), J. Geophys. Res. 102(C7), "
                               "15781-15796"}.get(model, model)
    attrs.update({
        "title": f"Wave-model spectra extended with a capillary-gravity tail ({model})",
        "source": f"shortwave {__version__} extend, from {src}",
        "references": "Tail model: " + mdesc + "; f -> k: variance conservation with the "
                      "capillary-gravity dispersion relation; Cox and Munk (1954), J. Opt. "
                      "Soc. Am. 44, 838-850, for slope checks",
        "comment": "Resolved spectrum kept below seam_wavenumber (each frequency bin mapped "
                   "to its wavenumber interval, variance conserved, k^-3 inside the bin); "
                   f"tail blended from the resolved level continued as k^-3 into the model "
                   f"spectrum over [k_s, {float(transition_ratio):g} k_s] (raised cosine in "
                   "ln k), model alone above.",
        "tail_model": model,
        "tail_transition_ratio": float(transition_ratio),
        "tail_inverse_wave_age": (inverse_wave_age if isinstance(inverse_wave_age, str)
                                  else float(inverse_wave_age)),
        "wavenumber_max": float(kb[-1, 1]),
        "wavenumber_points_per_decade": int(points_per_decade),
        "input_file": str(src),
        "input_spectrum_variable": str(inp["name"]),
        "wind_source": wind_prov,
        "depth_source": depth_prov,
    })
    if model_kw:
        attrs["tail_model_options"] = ", ".join(f"{a}={b}" for a, b in model_kw.items())
    out.attrs = attrs
    return out


def count_spectra(out):
    """Counts for a summary: spectra, NaN input spectra, spectra without wind.

    Parameters
    ----------
    out : xarray.Dataset
        Result of :func:`extend_dataset` (computed or written and reopened).

    Returns
    -------
    dict
        ``spectra``, ``nan_spectra`` (NaN in the input spectrum), ``no_wind`` (valid
        spectrum but NaN wind), ``extended``.

    Examples
    --------
    >>> from shortwave.synthetic import greyhaven_spectra_grid
    >>> count_spectra(extend_dataset(greyhaven_spectra_grid(1, 2, 2)))
    {'spectra': 4, 'nan_spectra': 1, 'no_wind': 0, 'extended': 3}
    """
    hs = np.asarray(out["significant_wave_height"].values)
    hr = np.asarray(out["significant_wave_height_resolved"].values)
    nan_in = int(np.sum(np.isnan(hr)))
    no_wind = int(np.sum(np.isnan(hs) & ~np.isnan(hr)))
    return {"spectra": int(hs.size), "nan_spectra": nan_in, "no_wind": no_wind,
            "extended": int(np.sum(np.isfinite(hs)))}


def output_encoding(out, complevel=0):
    """NetCDF encoding for :func:`extend_dataset` outputs.

    Parameters
    ----------
    out : xarray.Dataset
    complevel : int
        zlib level 0-9 of the (large) extended spectra; 0 (default) stores them
        uncompressed, which is several times faster to write (single-precision spectra
        compress by only about a third).  With compression, HDF5 chunks hold one spectrum
        each, so dask chunks never split them.  Small variables always get zlib level 1.

    Returns
    -------
    dict
        For :func:`shortwave.ncio.write_netcdf`: float32 spectra; no ``_FillValue`` on
        coordinates and bounds (CF 2.5.1: coordinates have no missing values).

    Examples
    --------
    >>> from shortwave.synthetic import greyhaven_spectra
    >>> enc = output_encoding(extend_dataset(greyhaven_spectra(1)), complevel=4)
    >>> enc["directional_spectrum"]["chunksizes"]
    (1, 1, 226, 36)
    """
    level = int(complevel)
    if not 0 <= level <= 9:
        raise ValueError(f"complevel: must be 0-9, got {complevel}")
    enc = {}
    for name, var in out.data_vars.items():
        if var.dtype.kind == "f":
            enc[name] = {"zlib": True, "complevel": 1}
    if "directional_spectrum" in out:
        var = out["directional_spectrum"]
        spec = {"dtype": "float32", "zlib": level > 0, "complevel": level}
        if level > 0:
            spec.update(shuffle=True,
                        chunksizes=tuple(1 if d not in ("wavenumber", var.dims[-1]) else n
                                         for d, n in var.sizes.items()))
        enc["directional_spectrum"] = spec
    for name in list(out.coords) + ["wavenumber_bounds"]:
        if name in out.variables and out[name].dtype.kind == "f":
            enc[name] = {**enc.get(name, {}), "_FillValue": None}
    return enc


def _select_positions(ds, spec, batch_dims, select):
    """Positions along the batch dims from ``DIM=VALUE`` or ``COORD=VALUE`` selections."""
    pos = {}
    for item in (select or []):
        if "=" not in str(item):
            raise ValueError(f"selection {item!r}: expected DIM=VALUE, e.g. "
                             "station_name='Corrow Bank' or time=2031-10-02T06:00")
        key, _, val = str(item).partition("=")
        key, val = key.strip(), val.strip().strip("'\"")
        if key in batch_dims:
            dim, coord = key, (ds.coords[key] if key in ds.coords else None)
        elif (key in ds.coords and ds.coords[key].ndim == 1
              and ds.coords[key].dims[0] in batch_dims):
            dim, coord = ds.coords[key].dims[0], ds.coords[key]
        else:
            raise ValueError(f"selection {key}={val}: {key!r} is neither a dimension of the "
                             f"spectra ({', '.join(batch_dims)}) nor a coordinate along one")
        n = spec.sizes[dim]
        found = None
        if coord is not None:
            values = coord.values
            if np.issubdtype(values.dtype, np.datetime64):
                try:
                    t = np.datetime64(val)
                    found = int(np.argmin(np.abs(values - t.astype(values.dtype))))
                except ValueError:
                    found = None
            else:
                hits = [i for i, v in enumerate(values) if str(v) == val]
                if not hits:
                    try:
                        hits = [i for i, v in enumerate(values) if float(v) == float(val)]
                    except (TypeError, ValueError):
                        hits = []
                found = hits[0] if hits else None
        if found is None:
            try:
                found = int(val)
            except ValueError:
                raise ValueError(f"selection {key}={val}: no such value along {dim!r}") from None
            if not -n <= found < n:
                raise ValueError(f"selection {key}={val}: position out of range 0..{n - 1}")
            found %= n
        pos[dim] = found
    for d in batch_dims:
        pos.setdefault(d, 0)
    return pos


def spectrum_parts(ds, select=None, *, overrides=None, units=None, direction_convention=None,
                   wind=None, wind_speed=None, wind_direction=None, depth=None,
                   model="elfouhaily1997", inverse_wave_age="peak", k_max=K_MAX,
                   points_per_decade=POINTS_PER_DECADE, transition_ratio=TRANSITION_RATIO,
                   water=None, **model_kw):
    """The extension of one chosen spectrum, split into its parts (for a figure).

    Parameters
    ----------
    ds : xarray.Dataset
        Wave-model output.
    select : iterable of "DIM=VALUE", optional
        Which spectrum: a dimension or a 1-D coordinate along it (e.g.
        ``station_name=Corrow Bank``, ``time=2031-10-02T06:00`` (nearest), ``station=2``);
        unspecified dimensions take their first position.
    Other parameters :
        As in :func:`extend_dataset`.

    Returns
    -------
    dict
        ``wavenumber`` and ``wavenumber_bounds`` [rad m-1]; curvature spectra B(k) [1] of
        the ``extended`` spectrum,
        its ``resolved`` and ``tail`` parts and the pure ``model``; ``node_wavenumber``
        and ``node_curvature``: the resolved spectrum converted point by point at the
        frequency nodes (:func:`shortwave.spectrum.convert.frequency_to_wavenumber`);
        ``seam_wavenumber``, ``transition_ratio``; the scalar moments of
        :func:`extend_spectra`; ``wind_speed``; ``label`` describing the selection.

    Raises
    ------
    ValueError
        Bad selection, or the chosen spectrum is NaN or has no wind.

    Examples
    --------
    >>> from shortwave.synthetic import greyhaven_spectra
    >>> p = spectrum_parts(greyhaven_spectra(2), ["station_name=Corrow Bank"])
    >>> p["label"]
    'time=2031-10-02T00:00, station_name=Corrow Bank'
    """
    from .spectrum.convert import frequency_to_wavenumber, polar_to_omnidirectional
    inp = prepare_inputs(ds, overrides=overrides, units=units,
                         direction_convention=direction_convention)
    spec = inp["spectrum"]
    speed, wdir, _ = wind_inputs(ds, spec, wind=wind, wind_speed=wind_speed,
                                 wind_direction=wind_direction, overrides=overrides,
                                 units=units)
    dep, _ = depth_input(ds, spec, depth, overrides=overrides, units=units)
    pos = _select_positions(ds, spec, inp["batch_dims"], select)
    sub = {d: pos[d] for d in inp["batch_dims"]}
    e = np.asarray(spec.isel(sub).values, dtype=float)

    def pick(da):
        return float(np.asarray(da.isel({d: pos[d] for d in da.dims}).values))

    u, wd, h = pick(speed), pick(wdir), pick(dep)
    labels = []
    for d in inp["batch_dims"]:
        names = [c for c in ds.coords if ds.coords[c].dims == (d,)]
        name = next((c for c in names if c != d), names[0] if names else None)
        if name is None:
            labels.append(f"{d}={pos[d]}")
        else:
            v = ds.coords[name].values[pos[d]]
            if np.issubdtype(np.asarray(v).dtype, np.datetime64):
                v = np.datetime_as_string(v, unit="m")
            labels.append(f"{name}={v}")
    label = ", ".join(labels)
    if not np.all(np.isfinite(e)):
        raise ValueError(f"the selected spectrum ({label}) has NaN values (land or missing "
                         "data); choose another")
    if not (np.isfinite(u) and np.isfinite(wd)):
        raise ValueError(f"the selected spectrum ({label}) has no wind")
    f, th = inp["frequency"], inp["direction"]
    r = extend_spectra(e, f, th, u, wd, h, convention=inp["convention"],
                       frequency_bounds=inp["frequency_bounds"], k_max=k_max,
                       points_per_decade=points_per_decade,
                       transition_ratio=transition_ratio, model=model,
                       inverse_wave_age=inverse_wave_age, water=water, parts=True,
                       name=inp["name"], **model_kw)
    k = r["wavenumber"]

    def curv(F):
        return k**3 * np.asarray(polar_to_omnidirectional(F, th))

    Fn, kn = frequency_to_wavenumber(e, f, th, depth=h if np.isfinite(h) else np.inf,
                                     water=water)
    out = {key: r[key] for key in OUTPUTS[2:]}
    out.update({"wavenumber": k, "wavenumber_bounds": r["wavenumber_bounds"],
                "extended": np.asarray(r["curvature"]),
                "resolved": curv(r["resolved_spectrum"]), "tail": curv(r["tail_spectrum"]),
                "model": curv(r["model_spectrum"]), "node_wavenumber": np.asarray(kn),
                "node_curvature": np.asarray(kn) ** 3 * np.asarray(
                    polar_to_omnidirectional(Fn, th)),
                "transition_ratio": float(transition_ratio), "wind_speed": u,
                "model_name": model, "label": label})
    return out
