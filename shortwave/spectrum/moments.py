"""Moments of tabulated spectra: variance, significant wave height, mean square slope.

Every function takes spectra as arrays with **leading batch axes** (time, station, grid
cell, ...) and the spectral axes last:

========================  ====================================  ======================
representation            array shape                           unit
========================  ====================================  ======================
S(k) omnidirectional      (..., nk)                             m3
F(k, phi) polar           (..., nk, nphi)                       m3 rad-1
B(k), B(k, phi)           as S, F, with ``curvature=True``      1, rad-1
Psi(kx, ky) Cartesian     (..., nky, nkx)                       m4
E(f), E(f, theta)         (..., nf), (..., nf, ntheta)          m2 s, m2 s rad-1
========================  ====================================  ======================

**Bin widths.**  Integrals are sums of value times the width of the cell around each node.
``method="bins"`` (default, the wave-model convention): cell edges halfway between
neighbouring nodes -- geometric means on a geometric grid (x_{i+1}/x_i constant to 1e-6),
arithmetic midpoints otherwise -- and the end cells as wide as their inner half-cell
mirrored, so a geometric grid gets widths x_i (sqrt(r) - 1/sqrt(r)).  ``method="trapezoid"``:
trapezoid weights, exact for the integral between the first and last node.  Explicit
cell edges can be given as ``bounds`` (n + 1 edges, or an (n, 2) array as in CF
``bounds`` variables).  Direction cells are periodic: each direction gets half the
angular distance to each neighbour on the circle (any order, any offset).

**Ranges.**  ``k_min``/``k_max`` keep only the nodes with k_min <= k <= k_max (for a
frequency spectrum, k is k(f) from the dispersion relation at the given depth).

**Directions.**  ``wind_direction_deg`` is the direction of the wind axis in the
convention of the direction axis.  Upwind/crosswind slope variances are even under a
180 degree flip, so "from" vs "to" does not matter here; a 90 degree mix-up (nautical vs
mathematical angles) would swap them.
"""
from __future__ import annotations

import numpy as np

from .._checks import ShortwaveInputError, as_float_array, check_choice, scalar_or_array
from ._common import angle_deg_array

__all__ = ["METHODS", "bin_widths", "direction_widths", "variance",
           "significant_wave_height", "mean_square_slope_from", "slope_covariance",
           "frequency_variance", "frequency_significant_wave_height",
           "frequency_mean_square_slope", "cartesian_variance",
           "cartesian_mean_square_slope", "peak_wavenumber_from"]

METHODS = ("bins", "trapezoid")
"""Allowed ``method=`` keys (see the module docstring)."""

_COMPONENTS = ("total", "upwind", "crosswind")


def _axis(name, x, positive=True):
    arr = as_float_array(name, x)
    if arr.ndim != 1:
        raise ShortwaveInputError(f"{name}: a 1-D axis is required, got shape {arr.shape}")
    if arr.size == 0:
        raise ShortwaveInputError(f"{name}: the axis is empty")
    if not np.all(np.isfinite(arr)):
        raise ShortwaveInputError(f"{name}: the axis has NaN or infinite values")
    if positive and np.any(arr <= 0):
        raise ShortwaveInputError(f"{name}: values must be > 0, got minimum {np.min(arr):g}")
    if arr.size > 1 and np.any(np.diff(arr) <= 0):
        raise ShortwaveInputError(f"{name}: the axis must be strictly increasing "
                                  "(sorted, no repeats)")
    return arr


def bin_widths(x, method="bins", bounds=None, name="k"):
    """Integration weights (cell widths) of a 1-D grid.

    Parameters
    ----------
    x : array_like
        Grid nodes, 1-D, strictly increasing, > 0 (wavenumber [rad m-1] or frequency [Hz]).
    method : {"bins", "trapezoid"}
        See the module docstring.
    bounds : array_like, optional
        Explicit cell edges: n + 1 increasing values, or an (n, 2) array of (lower, upper).
    name : str
        Argument name used in error messages.

    Returns
    -------
    ndarray
        Widths, same unit as ``x``, shape (n,).

    Examples
    --------
    >>> import numpy as np
    >>> f = 0.04 * 1.1 ** np.arange(3)
    >>> np.allclose(bin_widths(f), f * (1.1**0.5 - 1.1**-0.5))
    True
    """
    x = _axis(name, x)
    if bounds is not None:
        b = as_float_array(f"{name} bounds", bounds)
        if b.ndim == 2 and b.shape == (x.size, 2):
            w = b[:, 1] - b[:, 0]
        elif b.ndim == 1 and b.size == x.size + 1:
            w = np.diff(b)
        else:
            raise ShortwaveInputError(f"{name} bounds: expected {x.size + 1} edges or shape "
                                      f"({x.size}, 2), got shape {b.shape}")
        if np.any(~np.isfinite(w)) or np.any(w <= 0):
            raise ShortwaveInputError(f"{name} bounds: cell widths must be > 0")
        return w
    method = check_choice("method", method, METHODS)
    if x.size == 1:
        raise ShortwaveInputError(f"{name}: at least 2 grid points are needed to integrate")
    if method == "trapezoid":
        d = np.diff(x)
        w = np.zeros_like(x)
        w[:-1] += d / 2
        w[1:] += d / 2
        return w
    r = x[1:] / x[:-1]
    if x.size > 2 and np.allclose(r, r[0], rtol=1e-6, atol=0):
        s = np.sqrt(r[0])
        return x * (s - 1.0 / s)          # geometric grid: edges at geometric means
    mid = 0.5 * (x[1:] + x[:-1])
    edges = np.concatenate([[max(x[0] - (mid[0] - x[0]), 0.0)], mid,
                            [x[-1] + (x[-1] - mid[-1])]])
    return np.diff(edges)


def direction_widths(phi_deg):
    """Periodic cell widths of a direction axis [rad].

    Parameters
    ----------
    phi_deg : array_like
        Directions [degree], 1-D, any order and offset, distinct modulo 360.

    Returns
    -------
    ndarray
        Width of each direction's cell [rad] (half the angular distance to each neighbour
        on the circle); they sum to 2 pi.

    Examples
    --------
    >>> import numpy as np
    >>> w = direction_widths(np.arange(7.5, 360, 15))
    >>> bool(np.allclose(w, np.deg2rad(15)))
    True
    """
    phi = angle_deg_array("phi_deg", phi_deg)
    if phi.ndim != 1 or phi.size < 2:
        raise ShortwaveInputError("phi_deg: a 1-D direction axis with at least 2 directions "
                                  "is required")
    p = np.mod(phi, 360.0)
    order = np.argsort(p)
    ps = p[order]
    if np.any(np.diff(ps) <= 1e-9) or (ps[0] + 360.0 - ps[-1]) <= 1e-9:
        raise ShortwaveInputError("phi_deg: directions repeat (modulo 360 degree)")
    nxt = np.roll(ps, -1)
    nxt[-1] += 360.0
    prv = np.roll(ps, 1)
    prv[0] -= 360.0
    w = np.empty_like(ps)
    w[order] = np.deg2rad(0.5 * (nxt - prv))
    return w


def _range_mask(k, k_min, k_max):
    lo = -np.inf if k_min is None else float(k_min)
    hi = np.inf if k_max is None else float(k_max)
    if k_min is not None and not (np.isfinite(lo) and lo > 0):
        raise ShortwaveInputError(f"k_min: must be a finite wavenumber > 0 rad m-1, got {lo:g}")
    if k_max is not None and not hi > 0:
        raise ShortwaveInputError(f"k_max: must be > 0 rad m-1, got {hi:g}")
    if hi <= lo:
        raise ShortwaveInputError(f"k_max: must be greater than k_min ({hi:g} <= {lo:g})")
    m = (k >= lo) & (k <= hi)
    if not np.any(m):
        raise ShortwaveInputError(f"k_min/k_max: no grid wavenumber lies in [{lo:g}, {hi:g}]")
    return m


def _spectrum(name, F, nax):
    F = as_float_array(name, F)
    if F.ndim < nax:
        raise ShortwaveInputError(f"{name}: expected at least {nax} dimensions "
                                  f"(spectral axes last), got shape {F.shape}")
    return F


def _check_len(name, F, axis, n, what):
    if F.shape[axis] != n:
        raise ShortwaveInputError(f"{name}: its {what} axis (axis {axis}) has length "
                                  f"{F.shape[axis]}, but the {what} coordinate has {n}")


def _k_weighted(F, k, phi_deg, k_min, k_max, method, bounds, curvature, power):
    """sum of k^power * F dk [dphi] over the range, for S or polar F (internal)."""
    k = _axis("k", k)
    w = bin_widths(k, method, bounds, "k")
    w = w * _range_mask(k, k_min, k_max)
    kp = k ** (power - 3 if curvature else power)
    if phi_deg is None:
        F = _spectrum("S", F, 1)
        _check_len("S", F, -1, k.size, "wavenumber")
        return np.sum(F * (kp * w), -1), None
    F = _spectrum("F", F, 2)
    wphi = direction_widths(phi_deg)
    _check_len("F", F, -2, k.size, "wavenumber")
    _check_len("F", F, -1, wphi.size, "direction")
    return F, (kp * w, wphi)


def variance(F, k, phi_deg=None, *, k_min=None, k_max=None, method="bins", k_bounds=None,
             curvature=False):
    """Elevation variance (zeroth moment) of a wavenumber spectrum.

    Parameters
    ----------
    F : array_like
        S(k) [m3] with shape (..., nk) when ``phi_deg`` is None, else the polar spectrum
        F(k, phi) [m3 rad-1] with shape (..., nk, nphi).  With ``curvature=True``: B(k) [1]
        or B(k, phi) [rad-1].
    k : array_like
        Wavenumbers [rad m-1], 1-D, strictly increasing, > 0.
    phi_deg : array_like, optional
        Directions [degree], 1-D, covering the circle.
    k_min, k_max : float, optional
        Integration range [rad m-1] (nodes inside are kept).
    method : {"bins", "trapezoid"}
        Wavenumber weights (module docstring).
    k_bounds : array_like, optional
        Explicit wavenumber cell edges.
    curvature : bool
        The input is a curvature spectrum (divided by k^3 here).

    Returns
    -------
    numeric
        Variance [m2], shape of the leading batch axes.

    Examples
    --------
    >>> import numpy as np
    >>> k = np.linspace(0.5, 1.5, 101)
    >>> round(float(variance(np.ones_like(k), k, method="trapezoid")), 6)
    1.0
    """
    r, wts = _k_weighted(F, k, phi_deg, k_min, k_max, method, k_bounds, curvature, 0)
    if wts is None:
        return scalar_or_array(r)
    wk, wphi = wts
    return scalar_or_array(np.einsum("...ij,i,j->...", r, wk, wphi))


def significant_wave_height(F, k, phi_deg=None, **kw):
    """Spectral significant wave height H_m0 = 4 sqrt(variance) [m].

    Parameters are those of :func:`variance`.

    Examples
    --------
    >>> import numpy as np
    >>> k = np.linspace(0.5, 1.5, 101)
    >>> round(float(significant_wave_height(np.ones_like(k), k, method="trapezoid")), 6)
    4.0
    """
    return scalar_or_array(4.0 * np.sqrt(np.asarray(variance(F, k, phi_deg, **kw))))


def _directional_slopes(F, wk, wphi, phi_deg, wind_direction_deg):
    phi = np.deg2rad(angle_deg_array("phi_deg", phi_deg))
    wd = np.deg2rad(as_float_array("wind_direction_deg", wind_direction_deg))
    kint = np.einsum("...ij,i->...j", F, wk)          # integral over k of k^2 F dk
    c2 = np.cos(phi) ** 2 * wphi
    s2 = np.sin(phi) ** 2 * wphi
    cs = np.cos(phi) * np.sin(phi) * wphi
    xx, yy, xy = (np.sum(kint * v, -1) for v in (c2, s2, cs))
    cw, sw = np.cos(wd), np.sin(wd)
    up = xx * cw**2 + yy * sw**2 + 2 * xy * cw * sw  # rotate the slope tensor
    return xx + yy, up, xx, yy, xy


def mean_square_slope_from(F, k, phi_deg=None, k_min=None, k_max=None,
                           wind_direction_deg=0.0, component="total", *, method="bins",
                           k_bounds=None, curvature=False):
    """Mean square slope of a tabulated wavenumber spectrum.

    Parameters
    ----------
    F, k, phi_deg, k_min, k_max, method, k_bounds, curvature :
        As in :func:`variance`.
    wind_direction_deg : numeric
        Direction of the wind axis in the convention of ``phi_deg`` [degree] (0 when phi
        is measured from the wind).  Broadcast with the batch axes.
    component : {"total", "upwind", "crosswind"}
        Total, along the wind axis, or across it; the directional components need
        ``phi_deg``.

    Returns
    -------
    numeric
        mss [1] = sum k^2 F dk dphi (upwind: weight cos^2(phi - wind), crosswind sin^2).

    Examples
    --------
    >>> import numpy as np
    >>> k = np.geomspace(1, 100, 201); phi = np.arange(0, 360, 5.0)
    >>> F = (k**-3)[:, None] * np.ones(phi.size) / (2 * np.pi)   # B = 1, isotropic
    >>> round(float(mean_square_slope_from(F, k, phi, method="trapezoid")), 2)  # ln 100
    4.61
    """
    component = check_choice("component", component, _COMPONENTS)
    r, wts = _k_weighted(F, k, phi_deg, k_min, k_max, method, k_bounds, curvature, 2)
    if wts is None:
        if component != "total":
            raise ShortwaveInputError("component: upwind/crosswind slopes need a directional "
                                      "spectrum (give phi_deg)")
        return scalar_or_array(r)
    total, up, *_ = _directional_slopes(r, wts[0], wts[1], phi_deg, wind_direction_deg)
    return scalar_or_array({"total": total, "upwind": up, "crosswind": total - up}[component])


def slope_covariance(F, k, phi_deg, k_min=None, k_max=None, *, method="bins",
                     k_bounds=None, curvature=False):
    """Slope covariance tensor and the principal axis of the slope ellipse.

    Parameters are those of :func:`variance` (``phi_deg`` required).

    Returns
    -------
    dict
        ``mss_x``, ``mss_y``, ``mss_xy`` [1] along the phi = 0 axis, the phi = 90 axis and
        their covariance; ``major``, ``minor`` [1], the eigenvalues; ``major_direction_deg``
        [degree], the direction of the major axis in the phi convention, in [0, 180).

    Examples
    --------
    >>> import numpy as np
    >>> k = np.geomspace(1, 100, 51); phi = np.arange(0, 360, 10.0)
    >>> F = (k**-3)[:, None] * (1 + 0.5 * np.cos(np.deg2rad(2 * (phi - 30))))
    >>> round(float(slope_covariance(F, k, phi)["major_direction_deg"]), 6)
    30.0
    """
    if phi_deg is None:
        raise ShortwaveInputError("phi_deg: the slope tensor needs a directional spectrum")
    r, (wk, wphi) = _k_weighted(F, k, phi_deg, k_min, k_max, method, k_bounds, curvature, 2)
    _, _, xx, yy, xy = _directional_slopes(r, wk, wphi, phi_deg, 0.0)
    mean, half = 0.5 * (xx + yy), np.sqrt(0.25 * (xx - yy) ** 2 + xy**2)
    ang = np.mod(np.rad2deg(0.5 * np.arctan2(2 * xy, xx - yy)), 180.0)
    out = {"mss_x": xx, "mss_y": yy, "mss_xy": xy, "major": mean + half,
           "minor": mean - half, "major_direction_deg": ang}
    return {key: scalar_or_array(v) for key, v in out.items()}


# --- frequency spectra -------------------------------------------------------------------

def _f_weighted(E, frequency_hz, direction_deg, method, bounds):
    f = _axis("frequency_hz", frequency_hz)
    w = bin_widths(f, method, bounds, "frequency_hz")
    if direction_deg is None:
        E = _spectrum("E", E, 1)
        _check_len("E", E, -1, f.size, "frequency")
        return E, f, w, None
    E = _spectrum("E", E, 2)
    wth = direction_widths(direction_deg)
    _check_len("E", E, -2, f.size, "frequency")
    _check_len("E", E, -1, wth.size, "direction")
    return E, f, w, wth


def frequency_variance(E, frequency_hz, direction_deg=None, *, method="bins", bounds=None):
    """Variance m0 of a frequency spectrum E(f) [m2 s] or E(f, theta) [m2 s rad-1].

    Parameters
    ----------
    E : array_like
        Shape (..., nf) or (..., nf, ntheta); directional densities per radian (convert
        per-degree data with :func:`shortwave.spectrum.convert.per_degree_to_per_radian`).
    frequency_hz : array_like
        Frequencies [Hz], 1-D, increasing, > 0.
    direction_deg : array_like, optional
        Directions [degree].
    method, bounds :
        Frequency weights (module docstring); ``bounds`` = explicit frequency cell edges.

    Returns
    -------
    numeric
        m0 [m2].

    Examples
    --------
    >>> import numpy as np
    >>> f = np.linspace(0.1, 0.2, 11)
    >>> round(float(frequency_variance(np.full(11, 2.0), f, method="trapezoid")), 6)
    0.2
    """
    E, f, w, wth = _f_weighted(E, frequency_hz, direction_deg, method, bounds)
    if wth is None:
        return scalar_or_array(np.sum(E * w, -1))
    return scalar_or_array(np.einsum("...ij,i,j->...", E, w, wth))


def frequency_significant_wave_height(E, frequency_hz, direction_deg=None, **kw):
    """H_m0 = 4 sqrt(m0) [m] of a frequency spectrum (parameters of :func:`frequency_variance`).

    Examples
    --------
    >>> import numpy as np
    >>> f = np.linspace(0.1, 0.2, 11)
    >>> round(float(frequency_significant_wave_height(np.full(11, 2.0), f, method="trapezoid")), 4)
    1.7889
    """
    return scalar_or_array(4.0 * np.sqrt(np.asarray(
        frequency_variance(E, frequency_hz, direction_deg, **kw))))


def frequency_mean_square_slope(E, frequency_hz, direction_deg=None, k_min=None, k_max=None,
                                wind_direction_deg=0.0, component="total", *, depth=np.inf,
                                water=None, method="bins", bounds=None, gravity=None):
    """Mean square slope of a frequency spectrum, with k(f) from the dispersion relation.

    Parameters
    ----------
    E, frequency_hz, direction_deg, method, bounds :
        As in :func:`frequency_variance`.
    k_min, k_max : float, optional
        Wavenumber range [rad m-1]; frequencies whose k(f) lies outside are dropped.
    wind_direction_deg : numeric
        Wind axis in the convention of ``direction_deg`` [degree].
    component : {"total", "upwind", "crosswind"}
    depth : float
        Water depth [m] (``np.inf`` deep water) for k(f).
    water : Water or Liquid, optional
        Liquid for the capillary-gravity dispersion relation (default sea water).
    gravity : float, optional
        [m s-2]; default :data:`shortwave.dispersion.GRAVITY`.

    Returns
    -------
    numeric
        mss [1] = sum k(f)^2 E df dtheta (linear waves).

    Examples
    --------
    >>> import numpy as np
    >>> f = np.array([0.1, 0.2])
    >>> E = np.array([1.0, 0.0])     # all the variance (times the bin width) at 0.1 Hz
    >>> mss = frequency_mean_square_slope(E, f, method="trapezoid")
    >>> round(float(mss / 0.05), 5)   # k(0.1 Hz)^2 = (0.04026 rad/m)^2, deep water
    0.00162
    """
    from ..dispersion import GRAVITY, wavenumber
    component = check_choice("component", component, _COMPONENTS)
    E, f, w, wth = _f_weighted(E, frequency_hz, direction_deg, method, bounds)
    k = np.asarray(wavenumber(2 * np.pi * f, water, depth,
                              GRAVITY if gravity is None else gravity), dtype=float)
    w = w * k**2 * _range_mask(k, k_min, k_max)
    if wth is None:
        if component != "total":
            raise ShortwaveInputError("component: upwind/crosswind slopes need a directional "
                                      "spectrum (give direction_deg)")
        return scalar_or_array(np.sum(E * w, -1))
    total, up, *_ = _directional_slopes(E, w, wth, direction_deg, wind_direction_deg)
    return scalar_or_array({"total": total, "upwind": up, "crosswind": total - up}[component])


# --- Cartesian spectra -------------------------------------------------------------------

def _cartesian(Psi, kx, ky):
    kx = _axis("kx", kx, positive=False)
    ky = _axis("ky", ky, positive=False)
    Psi = _spectrum("Psi", Psi, 2)
    _check_len("Psi", Psi, -1, kx.size, "kx")
    _check_len("Psi", Psi, -2, ky.size, "ky")

    def widths(x):
        if x.size < 2:
            raise ShortwaveInputError("kx/ky: at least 2 points per axis are needed")
        mid = 0.5 * (x[1:] + x[:-1])
        edges = np.concatenate([[2 * x[0] - mid[0]], mid, [2 * x[-1] - mid[-1]]])
        return np.diff(edges)
    return Psi, kx, ky, widths(kx), widths(ky)


def cartesian_variance(Psi, kx, ky):
    """Variance [m2] of a Cartesian spectrum Psi(kx, ky) [m4], shape (..., nky, nkx).

    Cells of half the distance to each neighbour (end cells mirrored); both axes in
    rad m-1, increasing, any sign (a two-sided, full-plane grid).

    Examples
    --------
    >>> import numpy as np
    >>> kx = ky = np.linspace(-1, 1, 21)
    >>> round(float(cartesian_variance(np.ones((21, 21)), kx, ky)), 6)  # area 2.1 x 2.1
    4.41
    """
    Psi, kx, ky, wx, wy = _cartesian(Psi, kx, ky)
    return scalar_or_array(np.einsum("...ij,i,j->...", Psi, wy, wx))


def cartesian_mean_square_slope(Psi, kx, ky, wind_direction_deg=0.0, component="total"):
    """Mean square slope of Psi(kx, ky) [m4]: sum of k^2 Psi dkx dky.

    ``wind_direction_deg`` is the wind axis measured from +kx towards +ky [degree].

    Examples
    --------
    >>> import numpy as np
    >>> kx = ky = np.linspace(-1, 1, 3)
    >>> P = np.zeros((3, 3)); P[1, 2] = 1.0           # one wave along +kx, k = 1
    >>> round(float(cartesian_mean_square_slope(P, kx, ky, component="upwind")), 6)
    1.0
    """
    component = check_choice("component", component, _COMPONENTS)
    Psi, kx, ky, wx, wy = _cartesian(Psi, kx, ky)
    wd = np.deg2rad(as_float_array("wind_direction_deg", wind_direction_deg))
    xx = np.einsum("...ij,i,j->...", Psi, wy, wx * kx**2)
    yy = np.einsum("...ij,i,j->...", Psi, wy * ky**2, wx)
    xy = np.einsum("...ij,i,j->...", Psi, wy * ky, wx * kx)
    up = xx * np.cos(wd) ** 2 + yy * np.sin(wd) ** 2 + 2 * xy * np.cos(wd) * np.sin(wd)
    return scalar_or_array({"total": xx + yy, "upwind": up, "crosswind": xx + yy - up}[component])


def peak_wavenumber_from(S, k):
    """Wavenumber [rad m-1] of the maximum of S(k) along the last axis (grid node).

    Examples
    --------
    >>> round(float(peak_wavenumber_from([1.0, 3.0, 2.0], [0.1, 0.2, 0.3])), 3)
    0.2
    """
    k = _axis("k", k)
    S = _spectrum("S", S, 1)
    _check_len("S", S, -1, k.size, "wavenumber")
    return scalar_or_array(k[np.argmax(S, -1)])
