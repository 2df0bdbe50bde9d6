"""Wave-model spectra extended with the capillary-gravity tail, compared with references.

The extended spectra are synthetic fully developed seas as a wave model would write them
(Pierson-Moskowitz wind sea, cos-2s spreading, 36 geometric frequencies 0.035-0.6 Hz, 36
directions; :mod:`shortwave.synthetic`), extended with :func:`shortwave.tail.extend_spectra`
(default Elfouhaily et al. 1997 tail).  Their slopes are compared with Cox & Munk (1954);
the conversion of the resolved part with the Pierson-Moskowitz closed form.
"""
from __future__ import annotations

import numpy as np

from .. import spectrum as sp
from ..synthetic import U195_OVER_U10, geometric_frequencies, jonswap, wave_spectra
from ..tail import extend_spectra
from . import Check

_CM_SCATTER = 0.004   # +- quoted with the Cox & Munk regressions (from memory)
_THETA = np.arange(5.0, 360.0, 10.0)


def _u10_for(u125):
    """U10 whose neutral log-profile wind at 12.5 m is ``u125`` (Cox & Munk's height)."""
    u10 = u125 / 1.02
    for _ in range(8):
        u10 = u10 * u125 / float(sp.wind_speed_at_height(u10, 12.5))
    return u10


def _cox_munk(component, u125):
    a, b = {"total": (0.003, 5.12e-3), "upwind": (0.0, 3.16e-3),
            "crosswind": (0.003, 1.92e-3)}[component]
    return a + b * u125


def _extended(u125, key):
    u10 = _u10_for(u125)
    f = geometric_frequencies()
    E = wave_spectra(f, _THETA, u10, 250.0)
    return float(extend_spectra(E, f, _THETA, u10, 250.0)[key])


def _pm_hs_after_conversion(depth):
    f = np.geomspace(0.03, 3.0, 400)
    u10 = 10.0 / U195_OVER_U10                                  # U19.5 = 10 m/s
    th = np.array([0.0, 90.0, 180.0, 270.0])
    E = jonswap(f, u10)[:, None] * np.full(4, 1 / (2 * np.pi))
    r = extend_spectra(E, f, th, u10, 0.0, depth, parts=True, k_max=1e4)
    dk = np.diff(r["wavenumber_bounds"], axis=-1)[:, 0]
    m0 = np.sum(r["resolved_spectrum"].sum(-1) * dk) * np.pi / 2
    return 4 * np.sqrt(m0)


def _pm_resolved_mss_below_1hz():
    f = geometric_frequencies(0.03, 0.98, 60)       # upper bin edge close to 1 Hz
    u10 = 10.0 / U195_OVER_U10
    E = jonswap(f, u10)[:, None] * np.full(4, 1 / (2 * np.pi))
    r = extend_spectra(E, f, np.array([0.0, 90.0, 180.0, 270.0]), u10, 0.0)
    return float(r["mss_resolved"])


_CM_SOURCE = ("Cox & Munk (1954) clean-surface regression {} (U at 12.5 m; restated by "
              "Preisendorfer & Mobley 1985)")
_CM_REASON = ("two standard deviations of the photographs about the regression (+-0.004, "
              "from memory)")

CHECKS = [
    Check("tail.cox_munk.clean_total.U12.5_5",
          "mss of a fully developed wave-model spectrum (0.6 Hz) extended with the tail, "
          "U12.5 = 5 m/s, vs Cox-Munk clean", "1",
          lambda: _extended(5.0, "mss"), _cox_munk("total", 5.0),
          _CM_SOURCE.format("0.003 + 5.12e-3 U"), atol=2 * _CM_SCATTER,
          tolerance_reason=_CM_REASON),
    Check("tail.cox_munk.clean_total.U12.5_10",
          "mss of an extended fully developed spectrum, U12.5 = 10 m/s, vs Cox-Munk clean",
          "1", lambda: _extended(10.0, "mss"), _cox_munk("total", 10.0),
          _CM_SOURCE.format("0.003 + 5.12e-3 U"), atol=2 * _CM_SCATTER,
          tolerance_reason=_CM_REASON),
    Check("tail.cox_munk.clean_total.U12.5_14",
          "mss of an extended fully developed spectrum, U12.5 = 14 m/s, vs Cox-Munk clean",
          "1", lambda: _extended(14.0, "mss"), _cox_munk("total", 14.0),
          _CM_SOURCE.format("0.003 + 5.12e-3 U"), atol=2 * _CM_SCATTER,
          tolerance_reason=_CM_REASON),
    Check("tail.cox_munk.clean_upwind.U12.5_10",
          "along-wind mss of an extended fully developed spectrum, U12.5 = 10 m/s", "1",
          lambda: _extended(10.0, "mss_upwind"), _cox_munk("upwind", 10.0),
          _CM_SOURCE.format("3.16e-3 U"), atol=2 * _CM_SCATTER,
          tolerance_reason=_CM_REASON),
    Check("tail.cox_munk.clean_crosswind.U12.5_10",
          "cross-wind mss of an extended fully developed spectrum, U12.5 = 10 m/s", "1",
          lambda: _extended(10.0, "mss_crosswind"), _cox_munk("crosswind", 10.0),
          _CM_SOURCE.format("0.003 + 1.92e-3 U"), atol=2 * _CM_SCATTER,
          tolerance_reason=_CM_REASON),
    Check("tail.resolved_fraction.U12.5_10",
          "mss of the wave-model part alone (f < 0.6 Hz) as a fraction of Cox-Munk clean, "
          "U12.5 = 10 m/s", "1",
          lambda: _extended(10.0, "mss_resolved") / _cox_munk("total", 10.0), 0.225,
          "independent re-computation (reference note on spectra, pitfall 14): 15-30 % of "
          "Cox & Munk (1954) for spectra cut at 0.5-1 Hz", atol=0.075,
          tolerance_reason="the stated range 0.15-0.30 (centre +- half width)"),
    Check("tail.f_to_k.pm_hs.deep",
          "Hs of Pierson-Moskowitz (U19.5 = 10 m/s) after the bin-by-bin f -> k mapping, "
          "deep water", "m",
          lambda: _pm_hs_after_conversion(np.inf), 2 * np.sqrt(8.1e-3 / 0.74) * 100 / 9.81,
          "Pierson & Moskowitz (1964), closed form Hs = 2 sqrt(alpha/beta) U19.5^2/g with "
          "alpha = 8.1e-3, beta = 0.74", rtol=3e-3,
          tolerance_reason="400 geometric frequency bins 0.03-3 Hz"),
    Check("tail.f_to_k.pm_hs.depth_10m",
          "Hs of Pierson-Moskowitz (U19.5 = 10 m/s) after the f -> k mapping, depth 10 m",
          "m", lambda: _pm_hs_after_conversion(10.0), 2 * np.sqrt(8.1e-3 / 0.74) * 100 / 9.81,
          "Pierson & Moskowitz (1964) closed form; variance conservation E(f) df = F(k) dk "
          "at any depth (Ardhuin, textbook ch. measurement)", rtol=3e-3,
          tolerance_reason="400 geometric frequency bins 0.03-3 Hz"),
    Check("tail.pm_resolved_mss.below_1Hz",
          "mss of Pierson-Moskowitz (U19.5 = 10 m/s) resolved up to 1 Hz, deep water", "1",
          _pm_resolved_mss_below_1hz, 0.01448,
          "independent re-computation of Pierson & Moskowitz (1964) (reference note on "
          "spectra Sect. 4.2)", rtol=0.01,
          tolerance_reason="60 geometric bins, upper edge 1.0 Hz; node k(f)^2 weights"),
]
