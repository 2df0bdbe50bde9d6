"""Conversions between spectral representations, and direction conventions.

Representations (variance spectra of the surface elevation; one-sided in k and f):

=====================  ==========================================  ==============
name                   definition                                  unit
=====================  ==========================================  ==============
S(k)                   integral over k of S = variance             m3
F(k, phi) polar        double integral over k, phi of F = variance m3 rad-1
Psi(kx, ky) Cartesian  Psi = F / k; integral dkx dky = variance    m4
B(k), B(k, phi)        k^3 S, k^3 F (curvature / saturation)       1, rad-1
E(f), E(f, theta)      wave-model frequency(-direction) spectra    m2 s, m2 s rad-1
=====================  ==========================================  ==============

**Array shapes.**  Every array function takes leading batch axes (time, station, cell,
...) and the spectral axes last: (..., nf, ntheta) for E(f, theta), (..., nk, nphi) for
F(k, phi), (..., nky, nkx) for Psi.  One-dimensional coordinates (frequency_hz, k,
direction_deg, phi_deg, kx, ky) are shared by the whole batch; ``depth`` may be an array
that broadcasts with the batch axes (one depth per station or cell).

**Frequency <-> wavenumber.**  Variance is conserved, E(f, theta) df = F(k, theta) dk, so
F(k, theta) = E(f, theta) c_g(k) / (2 pi) with k(f) and the group speed c_g from the full
capillary-gravity dispersion relation at the given depth (:mod:`shortwave.dispersion`).
Direction axes are carried unchanged (same convention, same unit).

**Centrosymmetric vs propagating.**  A frozen-surface spectrum (ECKV, radar, optics) has
F(k, phi) = F(k, phi + 180); a wave-model spectrum carries the direction of travel.
:func:`centrosymmetric` folds a propagating spectrum into the frozen form (keeps the
variance and the slope tensor).  The reverse is not unique: :func:`fold_downwind` puts all
the variance into the half-plane within 90 degree of a chosen direction (a documented
choice).

**Direction conventions** (CF: ``*_from_direction`` and ``*_to_direction`` are bearings
clockwise from true north [degree]; wind direction in CF and meteorology is "from"):
θ_to = (θ_from + 180) mod 360; mathematical (counter-clockwise from east) angle
α = (90 - θ_to) mod 360; the angle of a wave from the wind used by the spectrum models is
φ = θ_to,wave - θ_to,wind = θ_to,wave - (wind_from + 180).

References
----------
.. [1] Ardhuin, F. Ocean waves in geosciences (open textbook), chapter "measurement":
   E(k, theta) = E(f, theta) c_g / (2 pi) (variance conservation).
.. [2] CF Standard Name Table, version 83 (2023): sea_surface_wave_from_direction,
   sea_surface_wave_to_direction, wind_from_direction.
"""
from __future__ import annotations

import numpy as np

from .._checks import ShortwaveInputError, as_float_array, check_positive, scalar_or_array
from ..dispersion import GRAVITY, group_speed, wavenumber
from ._common import angle_deg_array
from .moments import _axis, direction_widths

__all__ = ["frequency_to_wavenumber", "wavenumber_to_frequency", "wavenumber_of_frequency",
           "per_degree_to_per_radian", "per_radian_to_per_degree", "reverse_direction",
           "nautical_to_mathematical", "mathematical_to_nautical", "angle_from_wind",
           "polar_to_cartesian", "cartesian_to_polar", "polar_to_omnidirectional",
           "to_curvature", "from_curvature", "centrosymmetric", "fold_downwind",
           "RAD_PER_DEG"]

RAD_PER_DEG = np.pi / 180.0


def _depth_k(frequency_hz, depth, water, gravity):
    f = _axis("frequency_hz", frequency_hz)
    h = check_positive("depth", depth, allow_nan=False, allow_inf=True, unit="m")
    hh = h[..., None] if h.ndim else h
    k = np.asarray(wavenumber(2.0 * np.pi * f, water, hh, gravity), dtype=float)
    cg = np.asarray(group_speed(k, water, hh, gravity), dtype=float)
    return f, k, cg


def wavenumber_of_frequency(frequency_hz, depth=np.inf, water=None, gravity=GRAVITY):
    """Wavenumber k(f) [rad m-1] and group speed c_g [m s-1] of linear waves.

    Parameters
    ----------
    frequency_hz : array_like
        Frequencies [Hz], 1-D, increasing, > 0.
    depth : numeric
        Water depth [m] (``np.inf`` deep water); an array gives one row per depth,
        shape ``depth.shape + (nf,)``.
    water : Water or Liquid, optional
        Liquid (surface tension, density); default sea water 15 degC, 35 g/kg.
    gravity : float
        [m s-2].

    Returns
    -------
    k, c_g : ndarray

    Examples
    --------
    >>> k, cg = wavenumber_of_frequency([0.1])
    >>> round(float(k[0]), 5), round(float(cg[0]), 4)   # deep water at 0.1 Hz
    (0.04026, 7.8039)
    """
    _, k, cg = _depth_k(frequency_hz, depth, water, gravity)
    return k, cg


def frequency_to_wavenumber(E, frequency_hz, direction_deg=None, depth=np.inf, water=None,
                            gravity=GRAVITY):
    """Convert a frequency(-direction) spectrum into a wavenumber(-direction) spectrum.

    Parameters
    ----------
    E : array_like
        E(f, theta) [m2 s rad-1] with shape (..., nf, ntheta), or E(f) [m2 s] with shape
        (..., nf) when ``direction_deg`` is None.  Per-degree densities must be converted
        first (:func:`per_degree_to_per_radian`).
    frequency_hz : array_like
        Frequencies [Hz], 1-D, strictly increasing, > 0.
    direction_deg : array_like, optional
        Directions [degree]; only checked against the shape, carried unchanged.
    depth : numeric
        Water depth [m], > 0, ``np.inf`` (default) for deep water; may be an array that
        broadcasts with the batch axes of ``E``.
    water : Water or Liquid, optional
        Liquid for the capillary-gravity dispersion relation (default sea water).
    gravity : float
        [m s-2].

    Returns
    -------
    F : ndarray
        F(k, theta) [m3 rad-1] (or S(k) [m3]), same shape as ``E``.
    k : ndarray
        Wavenumbers [rad m-1] of the frequency nodes: shape (nf,), or depth.shape + (nf,).

    Notes
    -----
    F(k, theta) = E(f, theta) c_g / (2 pi) (variance conservation, Ardhuin's textbook [1]_
    of the module; pitfall: not c/(2 pi), not the deep-water c_g in shallow water).
    Deep-water gravity waves: F = E sqrt(g/k) / (4 pi).

    Examples
    --------
    >>> F, k = frequency_to_wavenumber([1.0], [0.1])
    >>> round(float(F[0]), 4)   # c_g / (2 pi) at 0.1 Hz, deep water, g = 9.80665
    1.242
    """
    E = as_float_array("E", E)
    f, k, cg = _depth_k(frequency_hz, depth, water, gravity)
    jac = cg / (2.0 * np.pi)                                   # dk/df inverse: df/dk
    if direction_deg is None:
        if E.ndim < 1 or E.shape[-1] != f.size:
            raise ShortwaveInputError(f"E: last axis must match frequency_hz ({f.size}), got "
                                      f"shape {E.shape}")
        return E * jac, k
    th = angle_deg_array("direction_deg", direction_deg)
    if E.ndim < 2 or E.shape[-2:] != (f.size, th.size):
        raise ShortwaveInputError(f"E: trailing axes must be (frequency, direction) = "
                                  f"({f.size}, {th.size}), got shape {E.shape}")
    return E * jac[..., None], k


def wavenumber_to_frequency(F, k, direction_deg=None, depth=np.inf, water=None,
                            gravity=GRAVITY):
    """Convert a wavenumber(-direction) spectrum into a frequency(-direction) spectrum.

    Parameters
    ----------
    F : array_like
        F(k, theta) [m3 rad-1], shape (..., nk, ntheta), or S(k) [m3], shape (..., nk).
    k : array_like
        Wavenumbers [rad m-1], 1-D, strictly increasing, > 0.
    direction_deg : array_like, optional
        Directions [degree], carried unchanged.
    depth, water, gravity :
        As in :func:`frequency_to_wavenumber` (``depth`` scalar or batch-shaped).

    Returns
    -------
    E : ndarray
        E(f, theta) [m2 s rad-1] (or E(f) [m2 s]) = F 2 pi / c_g.
    frequency_hz : ndarray
        f(k) [Hz], shape (nk,) or depth.shape + (nk,).

    Examples
    --------
    >>> E, f = wavenumber_to_frequency([1.2425], [0.040243])
    >>> round(float(E[0]), 3), round(float(f[0]), 4)
    (1.0, 0.1)
    """
    from ..dispersion import angular_frequency
    F = as_float_array("F", F)
    k = _axis("k", k)
    h = check_positive("depth", depth, allow_nan=False, allow_inf=True, unit="m")
    hh = h[..., None] if h.ndim else h
    om = np.asarray(angular_frequency(k, water, hh, gravity), dtype=float)
    cg = np.asarray(group_speed(k, water, hh, gravity), dtype=float)
    jac = 2.0 * np.pi / cg
    if direction_deg is None:
        if F.ndim < 1 or F.shape[-1] != k.size:
            raise ShortwaveInputError(f"F: last axis must match k ({k.size}), got {F.shape}")
        return F * jac, om / (2.0 * np.pi)
    th = angle_deg_array("direction_deg", direction_deg)
    if F.ndim < 2 or F.shape[-2:] != (k.size, th.size):
        raise ShortwaveInputError(f"F: trailing axes must be (wavenumber, direction) = "
                                  f"({k.size}, {th.size}), got shape {F.shape}")
    return F * jac[..., None], om / (2.0 * np.pi)


def per_degree_to_per_radian(E):
    """Directional density per degree -> per radian (multiply by 180/pi = 57.29578).

    Examples
    --------
    >>> round(float(per_degree_to_per_radian(1.0)), 5)
    57.29578
    """
    return scalar_or_array(as_float_array("E", E) / RAD_PER_DEG)


def per_radian_to_per_degree(E):
    """Directional density per radian -> per degree (multiply by pi/180).

    Examples
    --------
    >>> round(float(per_radian_to_per_degree(57.29578)), 5)
    1.0
    """
    return scalar_or_array(as_float_array("E", E) * RAD_PER_DEG)


def reverse_direction(direction_deg):
    """Swap "from" and "to" directions: (theta + 180) mod 360 [degree].

    Examples
    --------
    >>> float(reverse_direction(270.0))   # waves from the west travel to the east
    90.0
    """
    return scalar_or_array(np.mod(angle_deg_array("direction_deg", direction_deg) + 180.0,
                                  360.0))


def nautical_to_mathematical(bearing_deg):
    """Bearing (clockwise from north) -> mathematical angle (counter-clockwise from east).

    Both describe the same ("to") direction: alpha = (90 - bearing) mod 360 [degree].

    Examples
    --------
    >>> float(nautical_to_mathematical(90.0))   # towards east -> +x axis
    0.0
    """
    return scalar_or_array(np.mod(90.0 - angle_deg_array("bearing_deg", bearing_deg), 360.0))


def mathematical_to_nautical(angle_deg):
    """Mathematical angle (counter-clockwise from east) -> bearing (clockwise from north).

    Examples
    --------
    >>> float(mathematical_to_nautical(90.0))   # +y axis -> north
    0.0
    """
    return scalar_or_array(np.mod(90.0 - angle_deg_array("angle_deg", angle_deg), 360.0))


def angle_from_wind(wave_to_deg, wind_from_deg):
    """Angle phi of a wave direction from the downwind direction, in [-180, 180) [degree].

    Parameters
    ----------
    wave_to_deg : numeric
        Bearing towards which the wave travels [degree] (CF sea_surface_wave_to_direction).
    wind_from_deg : numeric
        Bearing the wind comes from [degree] (CF wind_from_direction).

    Returns
    -------
    numeric
        phi = theta_to,wave - (wind_from + 180), wrapped to [-180, 180).  phi is positive
        clockwise (bearing sense); the symmetric models do not depend on its sign.

    Examples
    --------
    >>> float(angle_from_wind(90.0, 270.0))   # west wind, waves going east: downwind
    0.0
    """
    d = angle_deg_array("wave_to_deg", wave_to_deg) - (
        angle_deg_array("wind_from_deg", wind_from_deg) + 180.0)
    return scalar_or_array(np.mod(d + 180.0, 360.0) - 180.0)


def _periodic_index(phi_deg, targets_deg):
    """Indices (into the original axis) and weights for linear interpolation on a circle."""
    phi = np.mod(angle_deg_array("phi_deg", phi_deg), 360.0)
    order = np.argsort(phi)
    ps = phi[order]
    ext_p = np.concatenate([ps[-1:] - 360.0, ps, ps[:1] + 360.0])
    ext_i = np.concatenate([order[-1:], order, order[:1]])
    t = np.mod(targets_deg, 360.0)
    j = np.clip(np.searchsorted(ext_p, t, side="right") - 1, 0, ext_p.size - 2)
    w = (t - ext_p[j]) / (ext_p[j + 1] - ext_p[j])
    return ext_i[j], ext_i[j + 1], w


def _periodic_interp(F, phi_deg, targets_deg):
    """Linear interpolation of F[..., nphi] along a periodic direction axis."""
    i0, i1, w = _periodic_index(phi_deg, targets_deg)
    return F[..., i0] * (1 - w) + F[..., i1] * w


def centrosymmetric(F, phi_deg):
    """Frozen-surface (centrosymmetric) form 1/2 [F(k, phi) + F(k, phi + 180)].

    Parameters
    ----------
    F : array_like
        Directional spectrum, direction axis last (..., nphi), any unit.
    phi_deg : array_like
        Directions [degree], 1-D; phi + 180 is interpolated linearly on the circle (exact
        when the axis contains the opposite directions, e.g. an even number of equal
        steps).

    Returns
    -------
    ndarray
        Same shape and unit; keeps the variance and the slope tensor.

    Examples
    --------
    >>> import numpy as np
    >>> phi = np.arange(0.0, 360.0, 90.0)
    >>> centrosymmetric(np.array([4.0, 0.0, 0.0, 0.0]), phi).tolist()
    [2.0, 0.0, 2.0, 0.0]
    """
    F = as_float_array("F", F)
    phi = angle_deg_array("phi_deg", phi_deg)
    if F.shape[-1:] != phi.shape:
        raise ShortwaveInputError(f"F: last axis must match phi_deg ({phi.size}), got {F.shape}")
    return 0.5 * (F + _periodic_interp(F, phi, phi + 180.0))


def fold_downwind(F, phi_deg, toward_deg=0.0):
    """Propagating form of a centrosymmetric spectrum: all waves travel within 90 degree
    of ``toward_deg`` (one documented choice among many; the reverse is not unique).

    Parameters
    ----------
    F : array_like
        Centrosymmetric directional spectrum, direction axis last.
    phi_deg : array_like
        Directions [degree], 1-D.
    toward_deg : float
        The direction the waves are made to travel towards [degree], same convention.

    Returns
    -------
    ndarray
        2 F where |phi - toward| < 90, F at exactly 90, 0 behind; keeps the variance and
        the slope tensor of a centrosymmetric F on a grid symmetric about ``toward_deg``.

    Examples
    --------
    >>> import numpy as np
    >>> fold_downwind(np.ones(4), np.arange(0.0, 360.0, 90.0)).tolist()
    [2.0, 1.0, 0.0, 1.0]
    """
    F = as_float_array("F", F)
    phi = angle_deg_array("phi_deg", phi_deg)
    if F.shape[-1:] != phi.shape:
        raise ShortwaveInputError(f"F: last axis must match phi_deg ({phi.size}), got {F.shape}")
    d = np.abs(np.mod(phi - float(toward_deg) + 180.0, 360.0) - 180.0)
    factor = np.where(np.isclose(d, 90.0, atol=1e-9), 1.0, np.where(d < 90.0, 2.0, 0.0))
    return F * factor


def polar_to_omnidirectional(F, phi_deg):
    """S(k) = sum over directions of F(k, phi) dphi [m3] (periodic cell widths).

    Examples
    --------
    >>> import numpy as np
    >>> phi = np.arange(0.0, 360.0, 10.0)
    >>> round(float(polar_to_omnidirectional(np.full(36, 1 / (2 * np.pi)), phi)), 12)
    1.0
    """
    F = as_float_array("F", F)
    w = direction_widths(phi_deg)
    if F.shape[-1:] != w.shape:
        raise ShortwaveInputError(f"F: last axis must match phi_deg ({w.size}), got {F.shape}")
    return scalar_or_array(np.sum(F * w, -1))


def to_curvature(spectrum, k, directional=False):
    """Curvature spectrum B = k^3 S (or k^3 F) from S(k) [m3] or F(k, phi) [m3 rad-1].

    ``k`` [rad m-1] runs along the last axis, or the second-to-last when ``directional``.

    Examples
    --------
    >>> float(to_curvature(2.0, 10.0))
    2000.0
    """
    s = as_float_array("spectrum", spectrum)
    k = check_positive("k", k, allow_nan=False, unit="rad m-1")
    return scalar_or_array(s * (k[..., None] if directional and k.ndim else k) ** 3)


def from_curvature(curvature, k, directional=False):
    """S = B / k^3 (or F = B(k, phi) / k^3) from a curvature spectrum.

    Examples
    --------
    >>> float(from_curvature(2000.0, 10.0))
    2.0
    """
    b = as_float_array("curvature", curvature)
    k = check_positive("k", k, allow_nan=False, unit="rad m-1")
    return scalar_or_array(b / (k[..., None] if directional and k.ndim else k) ** 3)


def polar_to_cartesian(F, k, phi_deg, kx, ky):
    """Cartesian spectrum Psi(kx, ky) = F(k, phi)/k [m4] on a (ky, kx) grid.

    Parameters
    ----------
    F : array_like
        Polar spectrum F(k, phi) [m3 rad-1], shape (..., nk, nphi).
    k : array_like
        Wavenumbers [rad m-1], 1-D increasing.
    phi_deg : array_like
        Directions [degree] of the polar grid, measured counter-clockwise from +kx.
    kx, ky : array_like
        1-D Cartesian axes [rad m-1] (any sign).

    Returns
    -------
    ndarray
        Psi, shape (..., nky, nkx); bilinear in (ln k, phi), 0 outside [k_min, k_max]
        and at k = 0.

    Examples
    --------
    >>> import numpy as np
    >>> k = np.geomspace(1, 10, 5); phi = np.arange(0, 360, 45.0)
    >>> F = np.ones((5, 8))
    >>> float(polar_to_cartesian(F, k, phi, [2.0], [0.0])[0, 0])   # F / k
    0.5
    """
    F = as_float_array("F", F)
    k = _axis("k", k)
    phi = angle_deg_array("phi_deg", phi_deg)
    kx = as_float_array("kx", kx)
    ky = as_float_array("ky", ky)
    if F.shape[-2:] != (k.size, phi.size):
        raise ShortwaveInputError(f"F: trailing axes must be (k, phi) = ({k.size}, "
                                  f"{phi.size}), got {F.shape}")
    KX, KY = np.meshgrid(kx, ky)
    kk = np.hypot(KX, KY)
    ang = np.rad2deg(np.arctan2(KY, KX))
    inside = (kk >= k[0]) & (kk <= k[-1])
    lk = np.log(np.where(inside, kk, k[0]))
    j = np.clip(np.searchsorted(np.log(k), lk, side="right") - 1, 0, k.size - 2)
    w = (lk - np.log(k[j])) / (np.log(k[j + 1]) - np.log(k[j]))
    p0, p1, wp = _periodic_index(phi, ang)
    Fk = ((F[..., j, p0] * (1 - wp) + F[..., j, p1] * wp) * (1 - w)
          + (F[..., j + 1, p0] * (1 - wp) + F[..., j + 1, p1] * wp) * w)
    return np.where(inside, Fk / np.where(inside, kk, 1.0), 0.0)


def cartesian_to_polar(Psi, kx, ky, k, phi_deg):
    """Polar spectrum F(k, phi) = k Psi(k cos phi, k sin phi) [m3 rad-1].

    Parameters
    ----------
    Psi : array_like
        Cartesian spectrum [m4], shape (..., nky, nkx).
    kx, ky : array_like
        1-D increasing axes [rad m-1].
    k : array_like
        Target wavenumbers [rad m-1], > 0.
    phi_deg : array_like
        Target directions [degree] counter-clockwise from +kx.

    Returns
    -------
    ndarray
        F, shape (..., nk, nphi); bilinear interpolation, 0 outside the Cartesian grid.

    Examples
    --------
    >>> import numpy as np
    >>> kx = ky = np.linspace(-4, 4, 9)
    >>> P = np.ones((9, 9))
    >>> float(cartesian_to_polar(P, kx, ky, [2.0], [30.0])[0, 0])   # k * Psi
    2.0
    """
    Psi = as_float_array("Psi", Psi)
    kx = _axis("kx", kx, positive=False)
    ky = _axis("ky", ky, positive=False)
    k = _axis("k", k)
    phi = np.deg2rad(angle_deg_array("phi_deg", phi_deg))
    if Psi.shape[-2:] != (ky.size, kx.size):
        raise ShortwaveInputError(f"Psi: trailing axes must be (ky, kx) = ({ky.size}, "
                                  f"{kx.size}), got {Psi.shape}")
    X = k[:, None] * np.cos(phi)[None, :]
    Y = k[:, None] * np.sin(phi)[None, :]
    inside = (X >= kx[0]) & (X <= kx[-1]) & (Y >= ky[0]) & (Y <= ky[-1])
    i = np.clip(np.searchsorted(kx, X, side="right") - 1, 0, kx.size - 2)
    j = np.clip(np.searchsorted(ky, Y, side="right") - 1, 0, ky.size - 2)
    tx = np.clip((X - kx[i]) / (kx[i + 1] - kx[i]), 0, 1)
    ty = np.clip((Y - ky[j]) / (ky[j + 1] - ky[j]), 0, 1)
    v = (Psi[..., j, i] * (1 - tx) * (1 - ty) + Psi[..., j, i + 1] * tx * (1 - ty)
         + Psi[..., j + 1, i] * (1 - tx) * ty + Psi[..., j + 1, i + 1] * tx * ty)
    return np.where(inside, v * k[:, None], 0.0)
