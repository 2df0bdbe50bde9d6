"""Wind-wave spectra compared with published slope statistics, spectra and closed forms.

Larger tables (the ECKV re-computation, the Cox & Munk coefficients) are checked in
``tests/test_spectrum*.py`` from ``tests/reference/*.csv``; this table holds one row per
kind of comparison so that ``shortwave validate`` shows them.
"""
from __future__ import annotations

import numpy as np

from .. import spectrum as sp
from ..spectrum import convert, moments
from ..water import Liquid
from . import Check

_CM_SCATTER = 0.004   # +- quoted with the Cox & Munk regressions (from memory)


def _u10_for(height, u_at_height):
    """U10 whose neutral log-profile wind at ``height`` is ``u_at_height``."""
    u10 = u_at_height / 1.02
    for _ in range(8):
        u10 = u10 * u_at_height / float(sp.wind_speed_at_height(u10, height))
    return u10


def _eckv_mss(u125, component="total"):
    return sp.mean_square_slope(_u10_for(12.5, u125), component=component)


def _cox_munk(component, u125):
    a, b = {"total": (0.003, 5.12e-3), "upwind": (0.0, 3.16e-3),
            "crosswind": (0.003, 1.92e-3)}[component]
    return a + b * u125


def _eckv_ratio(u125):
    _, up, cross = sp.mean_square_slope_components(_u10_for(12.5, u125))
    return cross / up


def _eckv_peak_frequency(u10):
    k = np.geomspace(sp.peak_wavenumber(u10) / 50, 1e4, 20001)
    kp = moments.peak_wavenumber_from(sp.omnidirectional(k, u10), k)
    return np.sqrt(9.81 * kp) / (2 * np.pi)


def _eckv_hs(u10):
    k = np.geomspace(sp.peak_wavenumber(u10) / 50, 1e4, 20001)
    return moments.significant_wave_height(sp.omnidirectional(k, u10), k, method="trapezoid")


def _pm_fp(u10):
    return (4 * 0.74 / 5) ** 0.25 * 9.81 / float(sp.wind_speed_at_height(u10, 19.5)) / (2 * np.pi)


def _pm_hs(u10):
    return 2 * np.sqrt(8.1e-3 / 0.74) * float(sp.wind_speed_at_height(u10, 19.5)) ** 2 / 9.81


def _pm_hs_in(domain, depth=np.inf):
    f = np.geomspace(0.02, 3.0, 4000)
    E = sp.pierson_moskowitz1964(f, 10.0)
    if domain == "f":
        return moments.frequency_significant_wave_height(E, f, method="trapezoid")
    S, k = convert.frequency_to_wavenumber(E, f, depth=depth)
    return moments.significant_wave_height(S, k, method="trapezoid")


_GRAVITY_ONLY = Liquid(density=1025.0, surface_tension=1e-12, kinematic_viscosity=1e-6)


def _k_at(f, depth=np.inf):
    return convert.wavenumber_of_frequency([f], depth, _GRAVITY_ONLY, gravity=9.81)[0][0]


def _spreading_integral():
    phi = np.arange(0.0, 360.0, 1.0)
    d = sp.spreading_function(phi, sp.spreading(50.0, 10.0))
    return np.sum(d) * np.deg2rad(1.0)


def _bh_km_ratio():
    am = 1e-2 * (1 + 3 * np.log(np.sqrt(1.44e-3) * 10.0 / 0.23))
    return sp.elfouhaily1997_curvature(370.0, 10.0, part="short") / (am / 2)


def _eckv_mss_10():
    return sp.mean_square_slope(10.0, k_max=7400.0)


CHECKS = [
    Check("spectrum.cox_munk.clean_total.U12.5_5",
          "ECKV mean square slope, fully developed, U12.5 = 5 m/s, vs Cox-Munk clean", "1",
          lambda: _eckv_mss(5.0), _cox_munk("total", 5.0),
          "Cox & Munk (1954) clean-surface regression 0.003 + 5.12e-3 U12.5 (as restated by "
          "Preisendorfer & Mobley 1985)", atol=2 * _CM_SCATTER,
          tolerance_reason="two standard deviations of the photographs about the "
                           "regression (+-0.004, from memory)"),
    Check("spectrum.cox_munk.clean_total.U12.5_10",
          "ECKV mean square slope, fully developed, U12.5 = 10 m/s, vs Cox-Munk clean", "1",
          lambda: _eckv_mss(10.0), _cox_munk("total", 10.0),
          "Cox & Munk (1954) clean-surface regression 0.003 + 5.12e-3 U12.5", atol=2 * _CM_SCATTER,
          tolerance_reason="two standard deviations about the regression (from memory)"),
    Check("spectrum.cox_munk.clean_total.U12.5_14",
          "ECKV mean square slope, fully developed, U12.5 = 14 m/s, vs Cox-Munk clean", "1",
          lambda: _eckv_mss(14.0), _cox_munk("total", 14.0),
          "Cox & Munk (1954) clean-surface regression 0.003 + 5.12e-3 U12.5", atol=2 * _CM_SCATTER,
          tolerance_reason="two standard deviations about the regression (from memory)"),
    Check("spectrum.cox_munk.clean_upwind.U12.5_10",
          "ECKV along-wind mean square slope, U12.5 = 10 m/s", "1",
          lambda: _eckv_mss(10.0, "upwind"), _cox_munk("upwind", 10.0),
          "Cox & Munk (1954) clean-surface regression 3.16e-3 U12.5", atol=2 * _CM_SCATTER,
          tolerance_reason="two standard deviations about the regression (from memory)"),
    Check("spectrum.cox_munk.clean_crosswind.U12.5_10",
          "ECKV cross-wind mean square slope, U12.5 = 10 m/s", "1",
          lambda: _eckv_mss(10.0, "crosswind"), _cox_munk("crosswind", 10.0),
          "Cox & Munk (1954) clean-surface regression 0.003 + 1.92e-3 U12.5",
          atol=2 * _CM_SCATTER,
          tolerance_reason="two standard deviations about the regression (from memory)"),
    Check("spectrum.cox_munk.cross_up_ratio.U12.5_10",
          "ECKV cross-wind / along-wind mss ratio, U12.5 = 10 m/s", "1",
          lambda: _eckv_ratio(10.0), (1.0 + 1 / 1.9) / 2,
          "Cox & Munk (1954), J. Opt. Soc. Am. 44, 838, abstract: along/cross ratio 1.0-1.9",
          atol=(1.0 - 1 / 1.9) / 2,
          tolerance_reason="the published range 0.526-1.0 (centre +- half width)"),
    Check("spectrum.yurovskaya2013.cox_munk.U12.5_10",
          "energy-balance model mss, U12.5 = 10 m/s, vs Cox-Munk clean total", "1",
          lambda: sp.mean_square_slope(_u10_for(12.5, 10.0), model="yurovskaya2013", n=401),
          _cox_munk("total", 10.0),
          "Cox & Munk (1954) clean-surface regression 0.003 + 5.12e-3 U12.5", rtol=0.25,
          tolerance_reason="level constant tuned to mss (CIMR ATBD App. C); model -11 % "
                           "here, -20 % at 14 m/s"),
    Check("spectrum.pierson_moskowitz.peak_frequency.U10_10",
          "ECKV fully developed peak frequency vs Pierson-Moskowitz, U10 = 10 m/s", "Hz",
          lambda: _eckv_peak_frequency(10.0), _pm_fp(10.0),
          "Pierson & Moskowitz (1964): omega_p = (4 beta/5)^(1/4) g/U19.5, beta = 0.74 "
          "(U19.5 by the neutral log profile)", rtol=0.05,
          tolerance_reason="different fits of full development (ECKV Omega = 0.84); wind "
                           "height conversion +-2 %"),
    Check("spectrum.pierson_moskowitz.hs.U10_10",
          "ECKV fully developed Hs vs Pierson-Moskowitz, U10 = 10 m/s", "m",
          lambda: _eckv_hs(10.0), _pm_hs(10.0),
          "Pierson & Moskowitz (1964): Hs = 2 sqrt(alpha/beta) U19.5^2/g, alpha = 8.1e-3",
          rtol=0.20,
          tolerance_reason="ECKV is a JONSWAP-type fit (gamma 1.7 at full development), "
                           "not a fit to PM: measured +10 %"),
    Check("spectrum.pierson_moskowitz.hs_closed_form.U19.5_10",
          "Pierson-Moskowitz Hs by integrating E(f), U19.5 = 10 m/s", "m",
          lambda: _pm_hs_in("f"), 2 * np.sqrt(8.1e-3 / 0.74) * 100 / 9.81,
          "independent re-computation of Pierson & Moskowitz (1964) closed form "
          "Hs = 2 sqrt(alpha/beta) U^2/g", rtol=2e-4,
          tolerance_reason="quadrature 0.02-3 Hz, 4000 points"),
    Check("spectrum.f_to_k.variance.deep",
          "Hs of PM (U19.5 = 10) after conversion to S(k), deep water", "m",
          lambda: _pm_hs_in("k"), 2.1330,
          "independent re-computation (reference note on spectra Sect. 6.2): variance "
          "conservation E(f) df = S(k) dk (Ardhuin, textbook ch. measurement)", atol=1e-3,
          tolerance_reason="printed to 4 decimals; quadrature"),
    Check("spectrum.f_to_k.variance.depth_10m",
          "Hs of PM (U19.5 = 10) after conversion to S(k), depth 10 m", "m",
          lambda: _pm_hs_in("k", 10.0), 2.1330,
          "independent re-computation (reference note on spectra Sect. 6.2): variance "
          "conservation with the finite-depth group speed", atol=1e-3,
          tolerance_reason="printed to 4 decimals; quadrature"),
    Check("spectrum.jacobian.k_0.1Hz_deep",
          "deep-water wavenumber at 0.1 Hz (g = 9.81)", "rad m-1",
          lambda: _k_at(0.1), 0.040243,
          "public ocean-engineering handbook page (k = 0.040243 m-1 at 0.1 Hz), reference "
          "note on spectra Sect. 4.1", atol=5e-7,
          tolerance_reason="half a unit of the last printed digit"),
    Check("spectrum.jacobian.k_0.1Hz_10m",
          "wavenumber at 0.1 Hz in 10 m of water (g = 9.81)", "rad m-1",
          lambda: _k_at(0.1, 10.0), 0.068019,
          "independent re-computation (reference note on spectra Sect. 4.1)", atol=5e-7,
          tolerance_reason="half a unit of the last printed digit"),
    Check("spectrum.eckv.spreading_integral",
          "integral over 2 pi of the ECKV spreading (1 + Delta cos 2 phi)/(2 pi)", "1",
          _spreading_integral, 1.0,
          "Elfouhaily et al. (1997) Eq. 49, normalised (identity)", rtol=1e-12,
          tolerance_reason="exact for a periodic trapezoid rule"),
    Check("spectrum.eckv.bh_at_km",
          "ECKV B_h(k_m) / (alpha_m / 2), U10 = 10 m/s", "1",
          _bh_km_ratio, 0.23 / np.sqrt(2 * 9.81 / 370.0),
          "Elfouhaily et al. (1997) Eqs. 40-41, 44: closed form c_m / c(k_m)", rtol=1e-6,
          tolerance_reason="L_PM J_p = 1 at k_m to 1e-7"),
    Check("spectrum.eckv.mss.U10_10",
          "ECKV mean square slope, U10 = 10 m/s, Omega = 0.84, k_p/50-7400 rad/m", "1",
          _eckv_mss_10, 0.06031,
          "independent re-computation of Elfouhaily et al. (1997) (reference note on "
          "spectra Sect. 6.3)", rtol=5e-4,
          tolerance_reason="printed to 4 digits"),
    Check("spectrum.eckv.fetch_scale",
          "fetch at which g x / U10^2 = X0 for U10 = 10 m/s", "m",
          lambda: sp.wind.FETCH_SCALE * 100.0 / 9.81, 220e3,
          "Ardhuin, open textbook, ch. fetch: X0 corresponds to 220 km at 10 m/s", rtol=0.02,
          tolerance_reason="the textbook rounds to 220 km"),
]
