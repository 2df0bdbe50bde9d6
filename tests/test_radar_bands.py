"""Radar letter bands (IEEE Std 521-2002 Table 1) and frequency parsing."""
import csv
import pathlib

import numpy as np
import pytest

from shortwave._checks import ShortwaveInputError
from shortwave.radar import (BANDS, SPEED_OF_LIGHT, band, band_letters, band_of,
                             parse_frequency, radar_wavelength, radar_wavenumber)

REF = pathlib.Path(__file__).parent / "reference"


def _rows(name):
    with open(REF / name) as fh:
        return list(csv.DictReader(line for line in fh if not line.startswith("#")))


def test_band_limits_match_ieee521_table1():
    # IEEE Std 521-2002 Table 1 (tests/reference/ieee521_2002_bands.csv); exact.
    rows = _rows("ieee521_2002_bands.csv")
    assert [r["letter"] for r in rows] == list(band_letters())
    for r in rows:
        b = band(r["letter"])
        assert b.low_hz == float(r["low_hz"]) and b.high_hz == float(r["high_hz"])


def test_bands_are_contiguous_and_centres_inside():
    for lo, hi in zip(BANDS[:-1], BANDS[1:]):
        assert lo.high_hz == hi.low_hz
    for b in BANDS:
        assert b.low_hz <= b.centre_hz < b.high_hz
        assert b.contains(b.centre_hz)
        assert b.wavelength_m == pytest.approx(SPEED_OF_LIGHT / b.centre_hz, rel=1e-15)


def test_boundaries_are_half_open():
    # our documented convention: [low, high)
    assert band_of(8e9) == "X" and band_of(np.nextafter(8e9, 0)) == "C"
    assert band_of(12e9) == "Ku" and band_of(18e9) == "K" and band_of(27e9) == "Ka"
    assert band_of(1e6) == "" and band_of(400e9) == ""


def test_band_lookup_is_case_insensitive():
    assert band("ku") is band("Ku") and band(" c ").letter == "C"
    assert band("KA").letter == "Ka" and band("hf").letter == "HF"


def test_unknown_band_lists_known_letters():
    with pytest.raises(ShortwaveInputError, match="known bands.*HF.*Ku.*Ka"):
        band("Q")
    with pytest.raises(ShortwaveInputError):
        band(5)


@pytest.mark.parametrize("text,hz", [("5.4GHz", 5.4e9), ("5.4 GHz", 5.4e9),
                                     ("13.5MHz", 13.5e6), ("1260e6 Hz", 1.26e9),
                                     ("9.65e9", 9.65e9), ("500 kHz", 5e5), ("5400mhz", 5.4e9),
                                     ("C", 5.405e9), ("ku", 13.575e9), ("HF", 13.5e6)])
def test_parse_frequency(text, hz):
    assert parse_frequency(text) == pytest.approx(hz, rel=1e-15)


def test_parse_frequency_numbers():
    assert parse_frequency(1.26e9) == 1.26e9
    assert parse_frequency(np.float64(5e9)) == 5e9


@pytest.mark.parametrize("bad", ["-5GHz", "0Hz", "5 parsecs", "Z", "", "nan", "inf GHz",
                                 -1.0, 0.0, float("nan"), [1e9, 2e9]])
def test_parse_frequency_rejects(bad):
    with pytest.raises(ShortwaveInputError):
        parse_frequency(bad)


def test_radar_wavelength_and_wavenumber():
    assert radar_wavelength(5.405e9) == pytest.approx(0.05547, abs=5e-6)   # 5.547 cm (note Sec. 2.6)
    f = np.array([13.5e6, 1.26e9, 35.75e9])
    np.testing.assert_allclose(radar_wavenumber(f) * radar_wavelength(f), 2 * np.pi,
                               rtol=1e-15)
    with pytest.raises(ShortwaveInputError, match="frequency_hz"):
        radar_wavelength(-5e9)
