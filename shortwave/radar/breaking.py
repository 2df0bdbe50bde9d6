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

**Provenance of each constant (none could be checked against the printed paper).**  The
text of KHCC 2003 and of its restatements (Kudryavtsev et al. 2005, JGR 110, C07016;
Yurovsky et al. 2019, Remote Sens.) could not be opened while this module was reviewed:
only their abstracts were readable.  They confirm the structure -- a polarisation-
independent ("non-polarized") breaker term sigma_wb times the breaker footprint fraction,
added to the Bragg and specular returns of the regular surface, with sigma_wb compared to
a geometric-optics model of breaker backscatter (abstracts of KHCC 2003, Kudryavtsev et
al. 2005 and Yurovsky et al. 2019) -- but give no constants.  So:

* s_wb^2 = 0.19 (slope variance of a breaking zone): from memory (KHCC 2003).
* eps_wb = 0.005 (ratio of the vertical to the horizontal scale of a breaking zone):
  from memory (KHCC 2003).
* the form of sigma_wb (geometric optics of a very rough facet plus a floor): from
  memory (KHCC 2003); only its identities (nadir value (1 + eps_wb)/s_wb^2, grazing
  limit eps_wb/s_wb^2) are tested.
* c_q = 10.5: from memory (KHCC 2003).
* k_wb = k_r/10: from memory (KHCC 2003).
* C_beta = 1.5: from memory and **doubtful**.  In Kudryavtsev's framework the growth
  rate in units of omega includes rho_a/rho_w and is of order 0.03-0.04 (u*/c)^2 (the
  mean growth-rate constant C_beta = 0.03 of the ATBD restatement, spectra research note
  Sec. 9.2; Plant 1982, from memory), which with c_q = 10.5 would make q about 40 times
  smaller and the breaking term negligible at C band.  Only the product c_q C_beta
  matters: treat q as an order of magnitude (about 1 % at C band, 10 m/s, the order of
  the whitecap coverage at that wind, from memory), not a calibrated value.

The constants are module constants (s_wb^2 and eps_wb also parameters of
:func:`breaker_nrcs`).  Applied here with the
spectrum chosen in :func:`shortwave.radar.nrcs` (Elfouhaily et al. 1997 by default)
instead of KHCC's own short-wave spectrum, so q is an application of their
parameterisation, not their calibrated value.

**Centrosymmetric spectra (a factor 2).**  KHCC's spectrum carries the propagation
direction: nearly all the short-gravity-wave variance travels with a down-wind component.
A centrosymmetric (frozen-surface) spectrum such as Elfouhaily et al. (1997) puts half of
it in the up-wind half-plane.  Integrating cos(phi)|cos(phi)| against the symmetric
spectrum over |phi| < 90 deg would count only half of the waves, and over the full
circle it gives zero.  The spectrum is therefore first folded into its propagating form
(all waves within 90 deg of down-wind, 2 B(k, phi) there and 0 behind; spectra research
note Sec. 4.3, :func:`shortwave.spectrum.convert.fold_downwind`), which keeps the variance
and the slope tensor.

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
"""s_wb^2, slope variance of a breaking zone (KHCC 2003; from memory, not verified)."""
BREAKER_REFLECTIVITY = 0.005
"""eps_wb, ratio of the vertical to the horizontal scale of a breaking zone, giving the
floor eps_wb/s_wb^2 of sigma_wb (KHCC 2003; from memory, not verified)."""
BREAKING_FRACTION_CONSTANT = 10.5
"""c_q in q = c_q int beta B dphi dln k (KHCC 2003; from memory, not verified)."""
WIND_INPUT_CONSTANT = 1.5
"""C_beta in beta = C_beta (u*/c)^2 cos(phi)|cos(phi)| (Kudryavtsev et al. 1999/2003;
from memory, not verified, and doubtful: see the module docstring)."""
BREAKER_CUTOFF_RATIO = 0.1
"""k_wb / k_r: only waves longer than ten radar wavelengths count (KHCC 2003; from
memory, not verified)."""


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
    """Direction integrals of the wind input times the folded spectrum, per unit B(k).

    The centrosymmetric spectrum B(k, phi) = B(k) (1 + Delta cos 2 phi) / (2 pi) is first
    folded into its propagating form, 2 B(k, phi) for |phi| < 90 deg and 0 behind (see
    the module docstring).  With the wind input cos(phi)|cos(phi)| and the breaker
    orientation weight 1 + a cos(phi - phi_R), the integral over the breaker direction
    phi is B(k) [I0 + a cos(phi_R) I1] with

        I0 = 1/2 + Delta/4,      I1 = 4/(3 pi) + 4 Delta/(5 pi)      [independent algebra]

    Parameters
    ----------
    spreading : numeric
        Delta(k) of the spreading function.

    Returns
    -------
    (numeric, numeric)
        I0, I1 (dimensionless).

    Notes
    -----
    I0 is exact for any folded spreading (it is half the along-wind slope fraction
    1/2 + Delta/4 of the full circle, doubled by the fold); I1 assumes the
    (1 + Delta cos 2 phi) form.

    Examples
    --------
    >>> i0, i1 = wind_input_directional_factors(0.0)
    >>> round(float(i0), 4), round(float(i1), 4)
    (0.5, 0.4244)
    """
    d = np.asarray(spreading, dtype=float)
    return (scalar_or_array(0.5 + d / 4.0),                       # 2 (1/4 + Delta/8)
            scalar_or_array((4.0 / 3.0 + 0.8 * d) / np.pi))        # 2 (2/3 + 2 Delta/5)/pi
