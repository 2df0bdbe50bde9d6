"""Capillary-gravity dispersion, with finite depth, viscosity and currents.

Linear waves on the free surface of a liquid of density rho, surface tension sigma and
kinematic viscosity nu, over a flat bottom at depth h:

    omega^2 = (g k + sigma k^3 / rho) tanh(k h)            (Lamb 1932, Art. 267)

Wavenumbers k are in rad m-1, angular frequencies omega in rad s-1, speeds in m s-1,
depth in m (``np.inf`` for deep water, the default).  NaN inputs propagate to NaN outputs;
zero, negative or infinite wavenumbers, frequencies and depths raise
:class:`shortwave._checks.ShortwaveInputError` naming the argument.

References
----------
.. [1] Lamb, H. (1932). Hydrodynamics, 6th ed. Cambridge University Press,
   Art. 267 (capillary-gravity waves) and Art. 348-349 (viscous damping).
.. [2] Phillips, O. M. (1977). The Dynamics of the Upper Ocean, 2nd ed., Eq. (3.2.4)
   (Doppler shift of the intrinsic frequency by a uniform current).
"""
from __future__ import annotations

import numpy as np

from ._checks import as_float_array, check_positive, scalar_or_array
from .water import as_liquid

__all__ = ["GRAVITY", "angular_frequency", "phase_speed", "group_speed", "wavenumber",
           "minimum_phase_speed", "capillary_length", "viscous_damping_rate",
           "viscous_spatial_damping_rate", "apparent_angular_frequency", "wavelength"]

GRAVITY = 9.80665
"""Standard acceleration of gravity [m s-2] (CGPM 1901, common practice)."""


def _depth(depth):
    return check_positive("depth", depth, allow_inf=True, unit="m")


def _tension_ratio(water):
    w = as_liquid(water)
    return np.asarray(w.surface_tension) / np.asarray(w.density)


def angular_frequency(k, water=None, depth=np.inf, gravity=GRAVITY):
    """Angular frequency of a linear capillary-gravity wave.

    Parameters
    ----------
    k : numeric
        Wavenumber [rad m-1], > 0.
    water : Water or Liquid, optional
        The liquid; default :data:`shortwave.water.SEAWATER` (15 degC, 35 g/kg).
    depth : numeric
        Water depth [m], > 0; ``np.inf`` (default) for deep water.
    gravity : float
        Acceleration of gravity [m s-2].

    Returns
    -------
    numeric
        omega [rad s-1].

    Notes
    -----
    omega^2 = (g k + sigma k^3 / rho) tanh(k h), Lamb (1932) Art. 267 [1]_.

    Examples
    --------
    >>> from shortwave.water import Water
    >>> round(float(angular_frequency(2 * 3.14159265 / 0.017, Water(20, 0))), 1)
    85.5
    """
    k = check_positive("k", k, unit="rad m-1")
    h = _depth(depth)
    th = np.where(np.isinf(h), 1.0, np.tanh(k * np.where(np.isinf(h), 1.0, h)))
    return scalar_or_array(np.sqrt((gravity * k + _tension_ratio(water) * k**3) * th))


def phase_speed(k, water=None, depth=np.inf, gravity=GRAVITY):
    """Phase speed c = omega / k [m s-1] of a capillary-gravity wave (see :func:`angular_frequency`).

    Examples
    --------
    >>> round(float(phase_speed(0.1)), 2)   # 63 m wavelength, deep water
    9.9
    """
    k = check_positive("k", k, unit="rad m-1")
    return scalar_or_array(angular_frequency(k, water, depth, gravity) / k)


def group_speed(k, water=None, depth=np.inf, gravity=GRAVITY):
    """Group speed c_g = d omega / d k [m s-1] of a capillary-gravity wave.

    Notes
    -----
    Differentiating omega^2 = (g k + T k^3) tanh(kh), with T = sigma/rho:
    c_g = [(g + 3 T k^2) tanh(kh) + (g k + T k^3) h sech^2(kh)] / (2 omega).
    Deep water: c_g = (g + 3 T k^2) / (2 omega); c_g = c at the phase-speed minimum.

    Examples
    --------
    >>> round(float(group_speed(0.1) / phase_speed(0.1)), 3)
    0.5
    """
    k = check_positive("k", k, unit="rad m-1")
    h = _depth(depth)
    t = _tension_ratio(water)
    om = np.asarray(angular_frequency(k, water, depth, gravity))
    deep = np.isinf(h)
    kh = k * np.where(deep, 1.0, h)
    th = np.where(deep, 1.0, np.tanh(kh))
    # h sech^2(kh); -> 0 in deep water (written to avoid inf * 0)
    hsech2 = np.where(deep | (kh > 350), 0.0, np.where(deep, 0.0, h) / np.cosh(np.minimum(kh, 350)) ** 2)
    cg = ((gravity + 3 * t * k**2) * th + (gravity * k + t * k**3) * hsech2) / (2 * om)
    return scalar_or_array(cg)


def wavelength(k):
    """Wavelength 2 pi / k [m] for wavenumber k [rad m-1]."""
    return scalar_or_array(2 * np.pi / check_positive("k", k, unit="rad m-1"))


def wavenumber(omega, water=None, depth=np.inf, gravity=GRAVITY, *, rtol=1e-13, maxiter=100):
    """Wavenumber of a capillary-gravity wave of given angular frequency (inverse dispersion).

    omega(k) increases monotonically with k for any depth, so the root is unique.  It is
    found by Newton's method safeguarded by bisection in a bracket that always contains
    the root, vectorised over all elements; robust through the capillary-gravity
    transition and in very shallow water.

    Parameters
    ----------
    omega : numeric
        Angular frequency [rad s-1], > 0.
    water, depth, gravity :
        As in :func:`angular_frequency`.
    rtol : float
        Relative tolerance on k.
    maxiter : int
        Iteration limit; ``RuntimeError`` if any element has not converged.

    Returns
    -------
    numeric
        k [rad m-1].

    Examples
    --------
    >>> k = wavenumber(2 * 3.141592653589793 * 13.5)   # 13.5 Hz ripple
    >>> round(float(2 * 3.141592653589793 / k) * 100, 2)   # wavelength in cm
    1.71
    """
    omega = check_positive("omega", omega, unit="rad s-1")
    h = _depth(depth)
    t = _tension_ratio(water)
    om, h, t = np.broadcast_arrays(omega, h, t)
    om = om.astype(float).copy()
    # NaN in omega, depth or the liquid's properties -> NaN out (solve a dummy there)
    nan = np.isnan(om) | np.isnan(h) | np.isnan(t)
    om[nan] = 1.0
    h = np.where(nan, np.inf, h)
    t = np.where(nan, 7e-5, t)
    deep = np.isinf(h)
    hh = np.where(deep, 1.0, h)
    # Deep-water root lies in [min(a, b)/2, min(a, b)] with a = w^2/g, b = (w^2/T)^(1/3);
    # finite depth only increases k (tanh <= 1), and tanh(x) >= x / (1 + x) bounds it above.
    a = om**2 / gravity
    b = np.cbrt(om**2 / t)
    lo = 0.5 * np.minimum(a, b)
    hi_shallow = np.where(deep, 0.0, om / np.sqrt(gravity * hh) + 1.0 / hh)
    hi = np.maximum(np.minimum(a, b), hi_shallow) * 4.0

    def f_df(k):
        kh = k * hh
        th = np.where(deep, 1.0, np.tanh(kh))
        s2 = np.where(deep | (kh > 350), 0.0, 1.0 / np.cosh(np.minimum(kh, 350)) ** 2)
        p = gravity * k + t * k**3
        f = p * th - om**2
        df = (gravity + 3 * t * k**2) * th + p * hh * s2
        return f, df

    # make sure hi really brackets (cheap, normally zero passes)
    for _ in range(60):
        fh, _ = f_df(hi)
        short = fh < 0
        if not np.any(short):
            break
        hi = np.where(short, hi * 4.0, hi)
    k = np.sqrt(lo * hi)
    for _ in range(maxiter):
        f, df = f_df(k)
        lo = np.where(f < 0, k, lo)
        hi = np.where(f > 0, k, hi)
        knew = k - f / df
        bad = ~((knew >= lo) & (knew <= hi))  # inclusive: a converged k stays put
        knew = np.where(bad, np.sqrt(lo * hi), knew)
        done = np.abs(knew - k) <= rtol * knew
        k = knew
        if np.all(done):
            break
    else:
        raise RuntimeError("wavenumber: inverse dispersion did not converge")
    k = np.where(nan, np.nan, k)
    return scalar_or_array(k)


def minimum_phase_speed(water=None, gravity=GRAVITY):
    """Minimum phase speed of capillary-gravity waves in deep water, and where it occurs.

    Returns
    -------
    c_min : numeric
        (4 g sigma / rho)^(1/4) [m s-1].
    k_min : numeric
        sqrt(rho g / sigma) [rad m-1]; there, phase speed equals group speed.

    Notes
    -----
    Set dc/dk = 0 in c^2 = g/k + T k (Lamb 1932, Art. 267).  Clean water at 20 degC:
    about 23 cm/s at a wavelength of about 1.7 cm (common practice).

    Examples
    --------
    >>> from shortwave.water import Water
    >>> c, k = minimum_phase_speed(Water(20.0, 0.0))
    >>> round(float(c), 3), round(float(2 * 3.14159265 / k), 4)
    (0.231, 0.0171)
    """
    t = _tension_ratio(water)
    return scalar_or_array((4 * gravity * t) ** 0.25), scalar_or_array(np.sqrt(gravity / t))


def capillary_length(water=None, gravity=GRAVITY):
    """Capillary length sqrt(sigma / (rho g)) [m] (about 2.7 mm for sea water)."""
    return scalar_or_array(np.sqrt(_tension_ratio(water) / gravity))


def viscous_damping_rate(k, water=None):
    """Temporal amplitude damping rate of a wave on a clean viscous surface.

    Parameters
    ----------
    k : numeric
        Wavenumber [rad m-1], > 0.
    water : Water or Liquid, optional
        Supplies the kinematic viscosity nu.

    Returns
    -------
    numeric
        Gamma = 2 nu k^2 [s-1]: amplitude decays as exp(-Gamma t); energy decays at 2 Gamma.

    Notes
    -----
    Lamb (1932) Art. 348-349 [1]_, leading order in nu k^2 / omega.  The exact root of the
    viscous dispersion relation is lower by a relative (nu k^2/omega)^(1/2) / sqrt(2),
    i.e. a few percent for centimetre waves (see :mod:`shortwave.films` for the exact root).

    Examples
    --------
    >>> from shortwave.water import Water
    >>> round(float(viscous_damping_rate(370.0, Water(20, 0))), 3)
    0.275
    """
    k = check_positive("k", k, unit="rad m-1")
    return scalar_or_array(2.0 * np.asarray(as_liquid(water).kinematic_viscosity) * k**2)


def viscous_spatial_damping_rate(k, water=None, depth=np.inf, gravity=GRAVITY):
    """Spatial amplitude damping rate Gamma / c_g [m-1] on a clean viscous surface.

    Parameters
    ----------
    k : numeric
        Wavenumber [rad m-1], > 0.
    water : Water or Liquid, optional
        Supplies nu, rho and sigma.
    depth : numeric
        Water depth [m]; enters only through the group speed.

    Returns
    -------
    numeric
        Delta [m-1]: amplitude decays as exp(-Delta x) along the direction of travel.

    Notes
    -----
    Gaster's (1962) transformation Delta = Gamma / c_g for weak damping, with the
    deep-water surface rate Gamma = 2 nu k^2.  In shallow water the bottom boundary layer
    adds damping that is not included here.

    Examples
    --------
    >>> from shortwave.water import Water
    >>> round(float(viscous_spatial_damping_rate(370.0, Water(20, 0))), 2)
    1.18
    """
    return scalar_or_array(np.asarray(viscous_damping_rate(k, water))
                           / np.asarray(group_speed(k, water, depth, gravity)))


def apparent_angular_frequency(k, current_speed=0.0, current_angle_deg=0.0, water=None,
                               depth=np.inf, gravity=GRAVITY):
    """Angular frequency seen by a fixed observer when a uniform current carries the wave.

    Parameters
    ----------
    k : numeric
        Wavenumber [rad m-1], > 0.
    current_speed : numeric
        Current speed [m s-1] (any sign).
    current_angle_deg : numeric
        Angle between the current and the direction of wave travel [degree];
        0 means the current flows with the wave.

    Returns
    -------
    numeric
        omega_apparent = omega(k) + k U cos(angle) [rad s-1] (Phillips 1977, Eq. 3.2.4 [2]_).

    Examples
    --------
    >>> round(float(apparent_angular_frequency(1.0, 0.5) - angular_frequency(1.0)), 3)
    0.5
    """
    u = as_float_array("current_speed", current_speed)
    ang = np.deg2rad(as_float_array("current_angle_deg", current_angle_deg))
    om = np.asarray(angular_frequency(k, water, depth, gravity))
    return scalar_or_array(om + np.asarray(k, dtype=float) * u * np.cos(ang))
