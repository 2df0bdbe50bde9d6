"""Full-range wind-wave spectra: models, spreading, conversions and moments.

Public functions (see :mod:`shortwave.spectrum.core` for the conventions):

* :func:`omnidirectional` S(k) [m3], :func:`curvature` B(k) = k^3 S [1],
  :func:`spreading` Delta(k) [1], :func:`directional` F(k, phi) [m3 rad-1],
  :func:`directional_curvature` B(k, phi) [rad-1], :func:`cartesian` Psi(kx, ky) [m4],
  :func:`mean_square_slope` [1];
  the model is chosen with ``model=`` among :data:`MODELS`.
* One function per published model: :func:`elfouhaily1997` (Elfouhaily et al. 1997),
  :func:`yurovskaya2013` (energy-balance short waves of Kudryavtsev et al. 1999/2003 in
  the 2013 revision); the reference long-wave :func:`pierson_moskowitz1964` E(f).
* Wind forcing: :func:`friction_velocity` (selectable u* law, :data:`USTAR_LAWS`),
  :func:`inverse_wave_age_from_fetch`, :func:`peak_wavenumber`.
* :mod:`shortwave.spectrum.convert`: frequency <-> wavenumber spectra (depth-aware),
  polar <-> Cartesian, curvature, centrosymmetric <-> propagating, direction conventions.
* :mod:`shortwave.spectrum.moments`: variance, Hs and mean square slope of tabulated
  spectra with leading batch axes.

Spectra are one-sided in k (k > 0) and, unless stated, centrosymmetric in direction;
``phi_deg`` is measured from the direction the wind blows towards.
"""
from .core import (COMPONENTS, DEFAULT_K_MAX, DEFAULT_K_MIN_FACTOR, DEFAULT_POINTS, MODELS,
                   cartesian, curvature, directional, directional_curvature, mean_square_slope,
                   mean_square_slope_components, omnidirectional, spreading)
from .models import (ECKV_C_M, ECKV_K_M, elfouhaily1997, elfouhaily1997_curvature,
                     pierson_moskowitz1964)
from .energy_balance import yurovskaya2013
from .spreading import elfouhaily1997_spreading, harmonic_delta, spreading_function
from .wind import (USTAR_LAWS, friction_velocity, inverse_wave_age_from_fetch,
                   peak_wavenumber, wind_speed_at_height)
from . import convert, moments  # noqa: E402

__all__ = ["MODELS", "COMPONENTS", "USTAR_LAWS", "DEFAULT_K_MAX", "DEFAULT_K_MIN_FACTOR",
           "DEFAULT_POINTS", "ECKV_K_M", "ECKV_C_M",
           "omnidirectional", "spreading", "directional", "directional_curvature", "cartesian",
           "curvature", "mean_square_slope", "mean_square_slope_components",
           "elfouhaily1997", "elfouhaily1997_curvature", "elfouhaily1997_spreading",
           "yurovskaya2013", "pierson_moskowitz1964",
           "spreading_function", "harmonic_delta", "friction_velocity",
           "inverse_wave_age_from_fetch", "peak_wavenumber", "wind_speed_at_height", "convert",
           "moments"]
