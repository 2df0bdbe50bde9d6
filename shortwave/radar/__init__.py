"""Radar bands, Bragg resonance and Doppler, and the backscatter of the sea surface.

* :mod:`~shortwave.radar.bands`: IEEE Std 521 letter bands, representative centre
  frequencies, :func:`parse_frequency` (``"C"``, ``"5.4GHz"``, ``"13.5MHz"``).
* :mod:`~shortwave.radar.bragg`: Bragg wavenumber (monostatic, bistatic, HF ground wave),
  Bragg wave properties and the first-order Doppler lines with a current and finite depth.
* :mod:`~shortwave.radar.spm`: first-order small-perturbation (Bragg) NRCS, polarisation
  coefficients and the slope-averaged (two-scale) Bragg term.
* :mod:`~shortwave.radar.specular`: near-nadir specular term and nadir Fresnel reflectivity.
* :mod:`~shortwave.radar.breaking`: the breaking-wave (non-Bragg) term.
* :mod:`~shortwave.radar.backscatter`: :func:`nrcs`, the composite sigma0 for a wind, and
  the decibel helpers :func:`to_db` / :func:`from_db`.

Conventions: frequency in Hz, incidence from the vertical in degrees, azimuth of the wind
relative to the look in degrees (0 = upwind), sigma0 linear (m2 m-2), Doppler positive
when approaching, currents positive toward the radar.
"""
from .bands import (BANDS, SPEED_OF_LIGHT, Band, band, band_letters, band_of,
                    parse_frequency, radar_wavelength, radar_wavenumber)
from .bragg import (WAVES, BraggWave, bistatic_bragg_vector, bistatic_bragg_wavenumber,
                    bragg_frequency, bragg_lines, bragg_wave, bragg_wavelength,
                    bragg_wavenumber, ground_wave_bragg_wavenumber)
from .spm import (POLARIZATIONS, polarization_coefficients, spm_nrcs, spm_nrcs_curvature,
                  tilted_bragg_nrcs)
from .specular import effective_reflectivity, fresnel_nadir_reflectivity, specular_nrcs
from .breaking import breaker_nrcs
from .backscatter import (MODELS, backscatter_components, breaking_fraction, from_db, nrcs,
                          nrcs_db, to_db)

__all__ = ["BANDS", "SPEED_OF_LIGHT", "Band", "band", "band_letters", "band_of",
           "parse_frequency", "radar_wavelength", "radar_wavenumber",
           "WAVES", "BraggWave", "bistatic_bragg_vector", "bistatic_bragg_wavenumber",
           "bragg_frequency", "bragg_lines", "bragg_wave", "bragg_wavelength",
           "bragg_wavenumber", "ground_wave_bragg_wavenumber",
           "POLARIZATIONS", "polarization_coefficients", "spm_nrcs", "spm_nrcs_curvature",
           "tilted_bragg_nrcs", "effective_reflectivity", "fresnel_nadir_reflectivity",
           "specular_nrcs", "breaker_nrcs", "MODELS", "backscatter_components",
           "breaking_fraction", "from_db", "nrcs", "nrcs_db", "to_db"]
