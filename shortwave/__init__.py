"""shortwave: the short end of the ocean wave spectrum, for radar oceanography.

Capillary-gravity dispersion with real sea-water properties, full-range wind-wave spectra,
Bragg and two-scale radar scattering, visco-elastic film damping and slick contrast, on
scalars, NumPy arrays and gridded NetCDF fields.

SI units inside; angles in degrees at the public interface; radar frequency in Hz.

Topic modules: :mod:`shortwave.water`, :mod:`shortwave.permittivity`,
:mod:`shortwave.dispersion`, :mod:`shortwave.spectrum`, :mod:`shortwave.radar`,
:mod:`shortwave.films`, :mod:`shortwave.slick`; files and scenes in
:mod:`shortwave.ncio`, :mod:`shortwave.tail` and :mod:`shortwave.fields`.
"""
__version__ = "0.1.0"

from .water import SEAWATER, Liquid, Water  # noqa: E402
from . import dispersion, permittivity, spectrum, radar, films, slick  # noqa: E402

__all__ = ["__version__", "Water", "Liquid", "SEAWATER", "dispersion", "permittivity",
           "spectrum", "radar", "films", "slick"]
