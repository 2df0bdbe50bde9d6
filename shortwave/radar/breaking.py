"""Non-Bragg backscatter from breaking waves (after Kudryavtsev, Hauser, Caudal & Chapron 2003).

The composite model of Kudryavtsev et al. (2003, "KHCC") adds to the regular (specular +
Bragg) surface a polarisation-independent return from the rough, steep zones of breaking
waves, weighted by the fraction q of the surface they cover:

    sigma0_pp = (sigma0_sp + sigma0_br,pp) (1 - q) + sigma_wb q

* sigma_wb, the cross-section of a breaking zone, is a geometric-optics term for a very
  rough facet of slope variance s_wb^2 plus an incoherent floor:
  sigma_wb = sec^4 t / s_wb^2 exp(-tan^2 t / s_wb^2) + eps_wb / s_wb^2,
  with s_wb^2 = 0.19 and eps_wb = 0.005.
* q follows from the wind input to the waves that break: waves longer than a radar-scale
  cut-off k_wb = k_r / 10 (a breaker must be much longer than the radar wavelength to
  carry a radar-visible breaking zone),
  q = c_q integral_{k < k_wb} integral_phi beta(k, phi) B(k, phi) dphi dln k,
  beta = C_beta (u*/c)^2 cos(phi)|cos(phi)| (only waves with a down-wind component break
  by wind forcing), c_q = 10.5, C_beta = 1.5.

The form and constants above are as we recall them from KHCC 2003 (their section on
non-Bragg scattering); the text of the paper could not be opened while writing this
module, so they are **from memory** and exposed as parameters.  Applied here with the
spectrum chosen in :func:`shortwave.radar.nrcs` (Elfouhaily et al. 1997 by default) instead
of KHCC's own short-wave spectrum, so q is an application of their parameterisation, not
their calibrated value.

**Breaker orientation (our choice, not from KHCC 2003).**  A breaking zone sits on the
forward face of its wave, so a radar sees it best when the breaker travels toward the
radar.  We weight breakers travelling in direction phi_b by 1 + a cos(phi_b - phi_R),
phi_R being the direction toward the radar and ``a`` = ``breaking_asymmetry`` in [0, 1].
This averages to 1 over directions (crosswind keeps the isotropic q) and produces the
observed upwind > crosswind > downwind order; ``a = 0`` restores the isotropic form.

References
----------
.. [1] Kudryavtsev, V., Hauser, D., Caudal, G. and Chapron, B. (2003). A semiempirical
   model of the normalized radar cross-section of the sea surface: 1. Background model.
   J. Geophys. Res. 108(C3), 8054, doi:10.1029/2001JC001003.
.. [2] Phillips, O. M. (1985). Spectral and statistical properties of the equilibrium
   range in wind-generated gravity waves. J. Fluid Mech. 156, 505-531 (breaking-crest
   length distribution).
"""
from __future__ import annotations

import numpy as np

from .._checks import check_positive, check_range, scalar_or_array

__all__ = ["BREAKER_SLOPE_VARIANCE", "BREAKER_REFLECTIVITY", "BREAKING_FRACTION_CONSTANT",
           "WIND_INPUT_CONSTANT", "BREAKER_CUTOFF_RATIO", "breaker_nrcs",
           "wind_input_directional_factors"]

BREAKER_SLOPE_VARIANCE = 0.19
"""s_wb^2, slope variance of a breaking zone (KHCC 2003, from memory)."""
BREAKER_REFLECTIVITY = 0.005
"""eps_wb, incoherent floor of the breaking-zone cross-section (KHCC 2003, from memory)."""
BREAKING_FRACTION_CONSTANT = 10.5
"""c_q in q = c_q int beta B dln k (KHCC 2003, from memory)."""
WIND_INPUT_CONSTANT = 1.5
"""C_beta in beta = C_beta (u*/c)^2 (Kudryavtsev et al. 1999/2003, from memory)."""
BREAKER_CUTOFF_RATIO = 0.1
"""k_wb / k_r: only waves longer than ten radar wavelengths count (KHCC 2003, from memory)."""


def breaker_nrcs(incidence_deg, slope_variance=BREAKER_SLOPE_VARIANCE,
                 floor=BREAKER_REFLECTIVITY):
    """Cross-section of a breaking zone, sigma_wb (polarisation-independent).

    Parameters
    ----------
    incidence_deg : numeric
        Incidence angle [degree], in [0, 90).
    slope_variance : float
        s_wb^2, slope variance of the breaking-zone facets [dimensionless], > 0.
    floor : float
        eps_wb, the incoherent part [dimensionless], >= 0.

    Returns
    -------
    numeric
        sigma_wb [linear].

    Notes
    -----
    sigma_wb = sec^4 t / s_wb^2 exp(-tan^2 t / s_wb^2) + eps_wb / s_wb^2 (Kudryavtsev et
    al. 2003 [1]_, from memory; s_wb^2 = 0.19, eps_wb = 0.005).

    Examples
    --------
    >>> round(float(breaker_nrcs(40.0)), 3)
    0.402
    """
    th = np.deg2rad(check_range("incidence_deg", incidence_deg, 0.0, 90.0,
                                inclusive=(True, False), unit="degree"))
    s2 = float(check_positive("slope_variance", slope_variance, allow_nan=False))
    t2 = np.tan(th) ** 2
    return scalar_or_array(np.exp(-t2 / s2) / (s2 * np.cos(th) ** 4) + floor / s2)  # KHCC


def wind_input_directional_factors(spreading):
    """Direction integrals of the wind input times the spectrum, per unit omnidirectional B.

    With B(k, phi) = B(k) (1 + Delta cos 2 phi) / (2 pi) (centrosymmetric) and the wind
    input cos(phi)|cos(phi)| kept for |phi| < 90 deg, the breaking integrand integrated
    over the breaker direction phi with the orientation weight 1 + a cos(phi - phi_R) is
    B(k) [I0 + a cos(phi_R) I1] with

        I0 = 1/4 + Delta/8,      I1 = 2/(3 pi) + 2 Delta/(5 pi)      [independent algebra]

    Parameters
    ----------
    spreading : numeric
        Delta(k) of the spreading function.

    Returns
    -------
    (numeric, numeric)
        I0, I1 (dimensionless).

    Examples
    --------
    >>> i0, i1 = wind_input_directional_factors(0.0)
    >>> round(float(i0), 4), round(float(i1), 4)
    (0.25, 0.2122)
    """
    d = np.asarray(spreading, dtype=float)
    return scalar_or_array(0.25 + d / 8.0), scalar_or_array((2.0 / 3.0 + 0.4 * d) / np.pi)
