"""shortwave: the short end of the ocean wave spectrum, for radar oceanography.

Capillary-gravity dispersion with real sea-water properties, full-range wind-wave spectra,
Bragg and two-scale radar scattering, visco-elastic film damping and slick contrast, on
scalars, NumPy arrays and gridded NetCDF fields.

SI units inside; angles in degrees at the public interface; radar frequency in Hz.
"""
__version__ = "0.1.0"

from .water import SEAWATER, Liquid, Water  # noqa: E402
from . import dispersion  # noqa: E402

__all__ = ["__version__", "Water", "Liquid", "SEAWATER", "dispersion"]
