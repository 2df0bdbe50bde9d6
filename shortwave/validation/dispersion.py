"""Capillary-gravity dispersion compared with facts of the trade and published values.

Identities and limits (deep/shallow water, c = c_g at the minimum, inverse round trips) are
asserted in ``tests/test_dispersion.py``.
"""
from __future__ import annotations

import numpy as np

from .. import dispersion as d
from ..water import Water
from . import Check

_C_LIGHT = 299792458.0  # m s-1 (SI definition)


def _clean_water():
    return Water(20.0, 0.0)


def _hf_bragg_frequency():
    # grazing HF radar at 13.5 MHz: the Bragg wave has half the radio wavelength,
    # K_B = 2 k0 = 4 pi f0 / c (Crombie 1955); its deep-water frequency
    k_bragg = 4.0 * np.pi * 13.5e6 / _C_LIGHT
    return d.angular_frequency(k_bragg) / (2.0 * np.pi)


CHECKS = [
    Check("dispersion.minimum_phase_speed.clean_20C",
          "minimum phase speed of capillary-gravity waves, clean water 20 degC", "m s-1",
          lambda: d.minimum_phase_speed(_clean_water())[0], 0.23,
          "common practice (about 23 cm/s)", rtol=0.025,
          tolerance_reason="quoted to two significant digits"),
    Check("dispersion.minimum_phase_speed_wavelength.clean_20C",
          "wavelength at the phase-speed minimum, clean water 20 degC", "m",
          lambda: 2.0 * np.pi / d.minimum_phase_speed(_clean_water())[1], 0.017,
          "common practice (about 1.7 cm)", rtol=0.03,
          tolerance_reason="quoted to two significant digits"),
    Check("dispersion.capillary_length.clean_20C", "capillary length of water at 20 degC", "m",
          lambda: d.capillary_length(_clean_water()), 2.7e-3,
          "common practice (about 2.7 mm)", rtol=0.02,
          tolerance_reason="quoted to two significant digits"),
    Check("dispersion.deep_water_wavelength.T10s",
          "deep-water wavelength of a 10 s gravity wave (rule L0 = 1.56 T^2)", "m",
          lambda: 2.0 * np.pi / d.wavenumber(2.0 * np.pi / 10.0), 156.0,
          "common practice (L0 = g T^2 / 2 pi = 1.56 T^2 m)", rtol=0.002,
          tolerance_reason="the rule's coefficient is rounded to 3 digits (1.5613)"),
    Check("dispersion.hf_bragg_frequency.13.5MHz",
          "deep-water frequency of the HF Bragg wave at 13.5 MHz (rule 0.102 sqrt(f0 MHz))",
          "Hz", _hf_bragg_frequency, 0.102 * np.sqrt(13.5),
          "common practice (first-order HF Bragg lines at +-0.102 sqrt(f0 in MHz) Hz)",
          rtol=0.002, tolerance_reason="the rule's coefficient is rounded to 3 digits "
          "(0.10204)"),
    Check("dispersion.lamb_damping.clean_20C_1cm",
          "viscous amplitude damping rate 2 nu k^2 of a 1 cm ripple, clean water 20 degC",
          "s-1", lambda: d.viscous_damping_rate(2.0 * np.pi / 0.01, _clean_water()), 0.79225,
          "independent re-computation of Lamb (1932) Art. 348 with IAPWS 2008 viscosity "
          "and TEOS-10 density (regression, not a measurement)", rtol=5e-4,
          tolerance_reason="reference printed to 5 digits and computed with IAPWS-95 "
          "instead of TEOS-10 density (4e-7 relative)"),
]
