"""Radar frequency bands (IEEE Std 521 letter designations) and frequency parsing.

The letter bands and their nominal limits follow Table 1 of IEEE Std 521-2002 (the 2019
revision keeps the same letters).  Each band also carries a *representative* centre
frequency: a value typical of ocean-sensing radars in that band, used as a default when a
user gives only a letter.  It is not the frequency of any particular instrument; pass the
real frequency (``"5.3GHz"``) when it matters.

Band limits are half-open intervals ``[low, high)``: 8.0 GHz is X band, 12.0 GHz is Ku.
The standard gives no rule for frequencies exactly on a boundary; this is our convention.

References
----------
.. [1] IEEE Std 521-2002, IEEE Standard Letter Designations for Radar-Frequency Bands,
   Table 1.  (Revised as IEEE Std 521-2019.)
.. [2] ITU-R Recommendation V.431, Nomenclature of the frequency and wavelength bands
   used in telecommunications (HF 3-30 MHz, VHF 30-300 MHz).
"""
from __future__ import annotations

import re
from dataclasses import dataclass

import numpy as np

from .._checks import ShortwaveInputError, as_float_array, check_positive, scalar_or_array

__all__ = ["SPEED_OF_LIGHT", "Band", "BANDS", "band", "band_letters", "band_of",
           "parse_frequency", "radar_wavelength", "radar_wavenumber"]

SPEED_OF_LIGHT = 299_792_458.0
"""Speed of light in vacuum [m s-1] (exact, SI definition)."""


@dataclass(frozen=True)
class Band:
    """One radar letter band.

    Attributes
    ----------
    letter : str
        The designation as written in IEEE Std 521 (``"C"``, ``"Ku"``, ``"HF"`` ...).
    low_hz, high_hz : float
        Nominal band limits [Hz]; the band is the half-open interval ``[low, high)``.
    centre_hz : float
        A representative centre frequency for ocean work [Hz] (typical of the
        literature; not any instrument's exact frequency).
    note : str
        Where the representative frequency comes from / what it is typical of.
    """

    letter: str
    low_hz: float
    high_hz: float
    centre_hz: float
    note: str = ""

    @property
    def wavelength_m(self):
        """Radar wavelength at the representative centre frequency [m]."""
        return SPEED_OF_LIGHT / self.centre_hz

    def contains(self, frequency_hz):
        """True where ``low_hz <= frequency_hz < high_hz``."""
        f = np.asarray(frequency_hz, dtype=float)
        return scalar_or_array((f >= self.low_hz) & (f < self.high_hz))


_MHZ, _GHZ = 1e6, 1e9

#: The IEEE Std 521-2002 Table 1 bands (nominal limits), with representative centre
#: frequencies for ocean sensing (common practice: typical values used in the literature).
BANDS = (
    Band("HF", 3 * _MHZ, 30 * _MHZ, 13.5 * _MHZ,
         "typical HF ocean radar (ITU allocations 4.4-43 MHz under Resolution 612)"),
    Band("VHF", 30 * _MHZ, 300 * _MHZ, 42 * _MHZ, "low-VHF ocean radar (30-50 MHz)"),
    Band("UHF", 300 * _MHZ, 1000 * _MHZ, 435 * _MHZ, "UHF radiolocation (around 420-450 MHz)"),
    Band("L", 1 * _GHZ, 2 * _GHZ, 1.26 * _GHZ, "L-band SAR (1.215-1.300 GHz)"),
    Band("S", 2 * _GHZ, 4 * _GHZ, 3.2 * _GHZ, "S-band SAR (2.7-3.3 GHz)"),
    Band("C", 4 * _GHZ, 8 * _GHZ, 5.405 * _GHZ, "C-band SAR and scatterometers (5.25-5.41 GHz)"),
    Band("X", 8 * _GHZ, 12 * _GHZ, 9.65 * _GHZ, "X-band SAR (9.6-9.8 GHz)"),
    Band("Ku", 12 * _GHZ, 18 * _GHZ, 13.575 * _GHZ,
         "Ku-band scatterometers and altimeters (13.4-14.0 GHz)"),
    Band("K", 18 * _GHZ, 27 * _GHZ, 24.15 * _GHZ, "K-band radiolocation (24.05-24.25 GHz)"),
    Band("Ka", 27 * _GHZ, 40 * _GHZ, 35.75 * _GHZ, "Ka-band radars and altimeters (35-36 GHz)"),
    Band("V", 40 * _GHZ, 75 * _GHZ, 60 * _GHZ, "mid-band value"),
    Band("W", 75 * _GHZ, 110 * _GHZ, 94 * _GHZ, "W-band radars (94 GHz window)"),
    Band("mm", 110 * _GHZ, 300 * _GHZ, 140 * _GHZ, "millimetre-wave window near 140 GHz"),
)

_BY_KEY = {b.letter.lower(): b for b in BANDS}


def band_letters():
    """Return the known band letters, in frequency order.

    Examples
    --------
    >>> band_letters()[:5]
    ('HF', 'VHF', 'UHF', 'L', 'S')
    """
    return tuple(b.letter for b in BANDS)


def band(letter):
    """Return the :class:`Band` for an IEEE Std 521 letter designation.

    Parameters
    ----------
    letter : str
        Band letter, case-insensitive (``"C"``, ``"ku"``, ``"HF"``).

    Returns
    -------
    Band
        With ``low_hz``, ``high_hz`` [Hz] (IEEE Std 521-2002 Table 1) and a representative
        ``centre_hz`` [Hz].

    Raises
    ------
    ShortwaveInputError
        For an unknown letter; the message lists the known ones.

    Examples
    --------
    >>> b = band("C")
    >>> b.low_hz, b.high_hz, b.centre_hz
    (4000000000.0, 8000000000.0, 5405000000.0)
    >>> band("ku").letter
    'Ku'
    """
    if not isinstance(letter, str):
        raise ShortwaveInputError(f"band: a letter is required, got {letter!r}")
    try:
        return _BY_KEY[letter.strip().lower()]
    except KeyError:
        raise ShortwaveInputError(
            f"band: unknown band letter {letter!r}; known bands (IEEE Std 521): "
            f"{', '.join(band_letters())}") from None


def band_of(frequency_hz):
    """Return the letter of the IEEE Std 521 band containing a frequency.

    Parameters
    ----------
    frequency_hz : float
        Frequency [Hz], > 0.

    Returns
    -------
    str
        The band letter, or ``""`` outside 3 MHz-300 GHz.  Limits are half-open
        ``[low, high)``, so 8 GHz is ``"X"``.

    Examples
    --------
    >>> band_of(5.3e9), band_of(8e9), band_of(13.5e6)
    ('C', 'X', 'HF')
    """
    f = float(check_positive("frequency_hz", frequency_hz, allow_nan=False, unit="Hz"))
    for b in BANDS:
        if b.low_hz <= f < b.high_hz:
            return b.letter
    return ""


_UNITS = {"hz": 1.0, "khz": 1e3, "mhz": 1e6, "ghz": 1e9, "thz": 1e12}
_NUM_UNIT = re.compile(r"^\s*([+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)\s*([a-zA-Z]*)\s*$")


def parse_frequency(value):
    """Turn a band letter, a frequency string or a number into a frequency in Hz.

    Parameters
    ----------
    value : str or float
        A band letter (``"C"`` gives that band's representative centre frequency), a
        string with a unit (``"5.4GHz"``, ``"13.5 MHz"``, ``"1260e6 Hz"``), a bare
        numeric string or a number, both taken as Hz.

    Returns
    -------
    float
        Frequency [Hz], > 0.

    Raises
    ------
    ShortwaveInputError
        Unknown letter or unit, non-positive or non-finite frequency.

    Examples
    --------
    >>> parse_frequency("5.4GHz"), parse_frequency("13.5MHz"), parse_frequency("X")
    (5400000000.0, 13500000.0, 9650000000.0)
    >>> parse_frequency(1.26e9)
    1260000000.0
    """
    if isinstance(value, str):
        text = value.strip()
        m = _NUM_UNIT.match(text)
        if m:
            number, unit = float(m.group(1)), m.group(2).lower()
            if unit and unit not in _UNITS:
                raise ShortwaveInputError(
                    f"frequency: unknown unit {m.group(2)!r} in {value!r}; use Hz, kHz, MHz, "
                    "GHz or a band letter")
            f = number * _UNITS.get(unit, 1.0)
        else:
            if text.lower() not in _BY_KEY:
                raise ShortwaveInputError(
                    f"frequency: cannot read {value!r}; give a band letter "
                    f"({', '.join(band_letters())}) or a frequency such as 5.4GHz or 13.5MHz")
            return band(text).centre_hz
    else:
        arr = as_float_array("frequency", value)
        if arr.ndim != 0:
            raise ShortwaveInputError("frequency: one value is required, got an array")
        f = float(arr)
    if not np.isfinite(f) or f <= 0:
        raise ShortwaveInputError(f"frequency: must be a finite value > 0 Hz, got {value!r}")
    return f


def radar_wavelength(frequency_hz):
    """Radar wavelength lambda = c / f [m] in vacuum (air, to 3e-4).

    Parameters
    ----------
    frequency_hz : numeric
        Radar frequency [Hz], > 0.

    Examples
    --------
    >>> round(float(radar_wavelength(5.405e9)) * 100, 3)
    5.547
    """
    f = check_positive("frequency_hz", frequency_hz, unit="Hz")
    return scalar_or_array(SPEED_OF_LIGHT / f)


def radar_wavenumber(frequency_hz):
    """Electromagnetic wavenumber k_r = 2 pi f / c [rad m-1] (not the Bragg wavenumber).

    Examples
    --------
    >>> round(float(radar_wavenumber(5.405e9)), 2)
    113.28
    """
    f = check_positive("frequency_hz", frequency_hz, unit="Hz")
    return scalar_or_array(2 * np.pi * f / SPEED_OF_LIGHT)
