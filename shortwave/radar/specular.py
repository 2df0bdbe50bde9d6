"""Near-nadir specular (Kirchhoff, geometric-optics) backscatter and the nadir reflectivity.

Near normal incidence the radar return comes from facets of the long waves whose normals
point at the radar.  For Gaussian slopes with variances s_u^2 (along the wind) and s_c^2
(across), the backscatter is

    sigma0_sp = |R_eff|^2 / (2 s_u s_c cos^4 t)
                * exp[-tan^2 t (cos^2 phi / (2 s_u^2) + sin^2 phi / (2 s_c^2))]

(Barrick 1968; Valenzuela 1978), phi being the look azimuth from the wind axis.  It is the
same for VV and HH and zero for HV.  R(0) = (1 - sqrt(eps)) / (1 + sqrt(eps)) is the
normal-incidence Fresnel coefficient; ``R_eff`` lowers it for the roughness of the scales
shorter than the cut-off (see :func:`effective_reflectivity`).

References
----------
.. [1] Barrick, D. E. (1968). Rough surface scattering based on the specular point
   theory. IEEE Trans. Antennas Propag. AP-16, 449-454.
.. [2] Valenzuela, G. R. (1978). Theories for the interaction of electromagnetic and
   oceanic waves - a review. Boundary-Layer Meteorol. 13, 61-85.
.. [3] Brown, G. S. (1978). Backscattering from a Gaussian-distributed perfectly
   conducting rough surface. IEEE Trans. Antennas Propag. AP-26, 472-482.
"""
from __future__ import annotations

import numpy as np

from .._checks import ShortwaveInputError, as_float_array, check_nonnegative, check_range, \
    scalar_or_array
from .spm import _eps

__all__ = ["fresnel_nadir_reflectivity", "effective_reflectivity", "specular_nrcs"]


def fresnel_nadir_reflectivity(permittivity):
    """Normal-incidence Fresnel power reflectivity |R(0)|^2 of a flat water surface.

    Parameters
    ----------
    permittivity : complex numeric
        Relative permittivity of the water (``eps' - 1j*eps''``; either sign of the
        imaginary part).

    Returns
    -------
    numeric
        |(1 - sqrt(eps)) / (1 + sqrt(eps))|^2, dimensionless, in (0, 1).

    Examples
    --------
    >>> round(float(fresnel_nadir_reflectivity(66.42 - 34.41j)), 4)   # sea water, 5.3 GHz
    0.6371
    """
    root = np.sqrt(_eps(permittivity))  # principal branch
    return scalar_or_array(np.abs((1.0 - root) / (1.0 + root)) ** 2)  # Fresnel, normal incidence


def effective_reflectivity(permittivity, frequency_hz=None, small_scale_height_variance=0.0):
    """Nadir reflectivity reduced by the roughness of the small scales.

    Parameters
    ----------
    permittivity : complex numeric
        Relative permittivity of the water.
    frequency_hz : numeric, optional
        Radar frequency [Hz]; needed when the height variance is non-zero.
    small_scale_height_variance : numeric
        Elevation variance of the waves shorter than the specular cut-off [m2], >= 0.

    Returns
    -------
    numeric
        |R(0)|^2 exp(-4 k_r^2 h^2), dimensionless.

    Notes
    -----
    Coherent (Kirchhoff) reflection from a facet carrying small Gaussian roughness of
    variance h^2 is reduced by the Rayleigh factor exp(-(2 k_r h)^2) at the facet's normal
    incidence (Valenzuela 1978 [2]_; Brown 1978 [3]_; from memory).  Typical values of the
    factor are 0.6-0.8 at C to Ku band for moderate winds.

    Examples
    --------
    >>> round(float(effective_reflectivity(66.42 - 34.41j, 5.3e9, 5e-6)), 3)
    0.498
    """
    r0 = np.asarray(fresnel_nadir_reflectivity(permittivity))
    h2 = check_nonnegative("small_scale_height_variance", small_scale_height_variance,
                           unit="m2")
    if frequency_hz is None:
        if np.any(h2 > 0):
            raise ShortwaveInputError("frequency_hz: required with a non-zero height variance")
        return scalar_or_array(r0 + 0 * h2)
    from .bands import radar_wavenumber
    k = np.asarray(radar_wavenumber(frequency_hz))
    return scalar_or_array(r0 * np.exp(-4.0 * k**2 * h2))  # Rayleigh roughness factor


def specular_nrcs(incidence_deg, mss_upwind, mss_crosswind, reflectivity, azimuth_deg=0.0):
    """Geometric-optics (specular-point) backscatter of Gaussian-sloped long waves.

    Parameters
    ----------
    incidence_deg : numeric
        Incidence angle [degree], in [0, 90).
    mss_upwind, mss_crosswind : numeric
        Slope variances along and across the wind of the waves longer than the
        specular cut-off [dimensionless], > 0.
    reflectivity : numeric
        Effective nadir power reflectivity |R_eff|^2 (see :func:`effective_reflectivity`).
    azimuth_deg : numeric
        Wind direction relative to the look [degree]; 0 = upwind.  The Gaussian term is
        symmetric: upwind and downwind give the same value.

    Returns
    -------
    numeric
        sigma0 [linear], identical for VV and HH.

    Notes
    -----
    sigma0 = pi |R_eff|^2 sec^4 t P(tan t, 0) with a Gaussian slope density P (Barrick
    1968 [1]_; Valenzuela 1978 [2]_).  Isotropic case: |R|^2 sec^4 t / s^2 exp(-tan^2 t /
    s^2) with s^2 = s_u^2 + s_c^2.

    Examples
    --------
    >>> s = specular_nrcs(10.0, 0.015, 0.015, 0.6367)
    >>> round(10 * float(np.log10(s)), 2)
    9.03
    """
    th = np.deg2rad(check_range("incidence_deg", incidence_deg, 0.0, 90.0,
                                inclusive=(True, False), unit="degree"))
    su2 = as_float_array("mss_upwind", mss_upwind)
    sc2 = as_float_array("mss_crosswind", mss_crosswind)
    for n, v in (("mss_upwind", su2), ("mss_crosswind", sc2)):
        if np.any(v[np.isfinite(v)] <= 0):
            raise ShortwaveInputError(f"{n}: must be > 0")
    r = as_float_array("reflectivity", reflectivity)
    phi = np.deg2rad(as_float_array("azimuth_deg", azimuth_deg))
    t2 = np.tan(th) ** 2
    expo = t2 * (np.cos(phi) ** 2 / (2 * su2) + np.sin(phi) ** 2 / (2 * sc2))
    return scalar_or_array(r * np.exp(-expo) / (2 * np.sqrt(su2 * sc2) * np.cos(th) ** 4))
