"""Bragg resonance, Bragg wave properties and first-order Doppler.

External anchors: Crombie (1955) half-wavelength resonance at grazing; the HF rule
0.102 sqrt(f0 [MHz]) Hz (Barrick 1972; common practice).  Tables in tests/reference are
independent re-computations of the Bragg condition and of Lamb's (1932) dispersion
relation (regression checks, named in each file's header).
"""
import csv
import math
import pathlib

import numpy as np
import pytest

from shortwave._checks import ShortwaveInputError
from shortwave.radar import (SPEED_OF_LIGHT, bistatic_bragg_vector, bistatic_bragg_wavenumber,
                             bragg_frequency, bragg_lines, bragg_wave, bragg_wavelength,
                             bragg_wavenumber, ground_wave_bragg_wavenumber)
from shortwave.water import Liquid, Water

REF = pathlib.Path(__file__).parent / "reference"
TAU = Liquid(density=1000.0, surface_tension=0.0725, kinematic_viscosity=1e-6)  # tau 7.25e-5
GRAVITY_ONLY = Liquid(density=1000.0, surface_tension=1e-30, kinematic_viscosity=1e-6)


def _rows(name):
    with open(REF / name) as fh:
        return list(csv.DictReader(line for line in fh if not line.startswith("#")))


def test_bragg_wavelength_table():
    # independent re-computation of Lambda_B = lambda / (2 sin theta) (bragg_resonance_recomputed.csv)
    for r in _rows("bragg_resonance_recomputed.csv"):
        lam = bragg_wavelength(float(r["frequency_hz"]), float(r["incidence_deg"])) * 100
        assert lam == pytest.approx(float(r["bragg_wavelength_cm"]), abs=0.0051)


def test_bragg_frequency_table_capillary_and_gravity():
    # same file: deep-water f_B with tau = 7.25e-5 and with gravity only
    n = 0
    for r in _rows("bragg_resonance_recomputed.csv"):
        if not r["bragg_frequency_hz"]:
            continue
        f, th = float(r["frequency_hz"]), float(r["incidence_deg"])
        assert bragg_frequency(f, th, water=TAU) == pytest.approx(
            float(r["bragg_frequency_hz"]), abs=0.0051)
        assert bragg_frequency(f, th, water=GRAVITY_ONLY) == pytest.approx(
            float(r["bragg_frequency_gravity_hz"]), abs=0.0051)
        n += 1
    assert n == 20


def test_capillary_term_matters_from_x_band_up():
    # the note's warning: from X band the capillary term is large (Ku 45 deg: +48 %)
    ku = bragg_frequency(13.575e9, 45.0, water=TAU) / bragg_frequency(13.575e9, 45.0,
                                                                      water=GRAVITY_ONLY)
    assert ku > 1.4


def test_bragg_wavelength_equals_radar_wavelength_at_30deg():
    # Lambda_B = lambda / (2 sin 30) = lambda (common practice), every band
    f = np.array([1.26e9, 3.2e9, 5.405e9, 9.65e9, 13.575e9, 35.75e9])
    np.testing.assert_allclose(bragg_wavelength(f, 30.0), SPEED_OF_LIGHT / f, rtol=1e-14)


def test_crombie_half_wavelength_at_grazing():
    # Crombie (1955): resonance with ocean waves of half the radar wavelength
    f = np.array([4.5e6, 13.56e6, 25e6, 42e6])
    np.testing.assert_allclose(bragg_wavelength(f, 90.0), SPEED_OF_LIGHT / f / 2, rtol=1e-14)
    np.testing.assert_allclose(ground_wave_bragg_wavenumber(f), bragg_wavenumber(f, 90.0))


def test_hf_table_and_rule():
    # hf_bragg_recomputed.csv (Lamb 1932 at K_B = 2 k_r, finite depth) and the HF rule
    # 0.102 sqrt(f0 [MHz]) Hz (Barrick 1972; common practice) within 0.1 %
    for r in _rows("hf_bragg_recomputed.csv"):
        f = float(r["frequency_mhz"]) * 1e6
        w = bragg_wave(f, 90.0, water=GRAVITY_ONLY)
        assert w.wavelength == pytest.approx(float(r["bragg_wavelength_m"]), abs=0.006)
        assert w.wavenumber == pytest.approx(float(r["bragg_wavenumber"]), abs=6e-5)
        assert w.frequency == pytest.approx(float(r["f_deep_hz"]), abs=6e-5)
        rule = 0.102 * math.sqrt(float(r["frequency_mhz"]))
        assert rule == pytest.approx(float(r["rule_hz"]), abs=6e-5)
        assert bragg_frequency(f, 90.0) == pytest.approx(rule, rel=1e-3)   # default sea water
        for col, depth in (("f_depth10_hz", 10.0), ("f_depth20_hz", 20.0)):
            if r[col]:
                assert bragg_frequency(f, 90.0, water=GRAVITY_ONLY, depth=depth) == \
                    pytest.approx(float(r[col]), abs=6e-5)


def test_hf_exact_coefficient():
    # sqrt(g f0 / (pi c)) = 0.10204 sqrt(f0 [MHz]) (algebra of the deep-water gravity limit)
    coeff = math.sqrt(9.80665 * 1e6 / (math.pi * SPEED_OF_LIGHT))
    assert coeff == pytest.approx(0.10204, abs=5e-6)
    assert bragg_frequency(16e6, 90.0, water=GRAVITY_ONLY) == pytest.approx(coeff * 4, rel=1e-12)


def test_doppler_current_shift_and_sign_convention():
    # f_D = +/- f_B + 2 sin(theta) U_r / lambda; positive = approaching, U_r toward radar
    adv0, rec0 = bragg_lines(5.405e9, 30.0)
    adv, rec = bragg_lines(5.405e9, 30.0, current=1.0)
    assert adv0 > 0 and rec0 == pytest.approx(-adv0)
    assert adv - adv0 == pytest.approx(18.03, abs=0.005)   # radar note Sec. 2.6
    assert rec - rec0 == pytest.approx(adv - adv0, rel=1e-12)
    hf = bragg_frequency(13.5e6, 90.0, current=-0.5) - bragg_frequency(13.5e6, 90.0)
    assert hf == pytest.approx(-0.5 * 0.0901, abs=5e-5)
    # the Doppler of a Bragg wave equals its own frequency seen by a fixed observer
    kb = bragg_wavenumber(9.65e9, 40.0)
    w = bragg_wave(9.65e9, 40.0)
    assert bragg_frequency(9.65e9, 40.0, current=0.3) == pytest.approx(
        w.frequency + kb * 0.3 / (2 * np.pi), rel=1e-12)


def test_depth_lowers_the_hf_bragg_frequency():
    f = bragg_frequency(4.5e6, 90.0, depth=np.array([5.0, 10.0, 20.0, np.inf]))
    assert np.all(np.diff(f) > 0)


def test_bragg_wave_properties_consistent():
    w = bragg_wave(np.array([1.26e9, 5.405e9, 35.75e9]), 35.0, water=Water(20, 35))
    np.testing.assert_allclose(w.phase_speed, w.wavelength / w.period, rtol=1e-12)
    np.testing.assert_allclose(w.angular_frequency, 2 * np.pi * w.frequency, rtol=1e-14)
    # Ku 35-45 deg Bragg waves sit near the phase-speed minimum (about 0.23 m/s,
    # common practice for clean water)
    c = bragg_wave(13.575e9, np.array([35.0, 40.0, 45.0]), water=TAU).phase_speed
    assert np.all(np.abs(c - 0.231) < 0.003)
    assert np.all(w.group_speed > 0)


def test_bistatic_vector_reduces_to_monostatic_and_specular():
    kx, ky = bistatic_bragg_vector(5.405e9, 35.0, 35.0, 30.0, 210.0)
    kb = bragg_wavenumber(5.405e9, 35.0)
    assert math.hypot(kx, ky) == pytest.approx(kb, rel=1e-12)
    assert math.atan2(ky, kx) == pytest.approx(math.radians(210.0 - 360.0), abs=1e-12)
    kx, ky = bistatic_bragg_vector(5.405e9, 35.0, 35.0, 30.0, 30.0)   # forward specular
    assert abs(kx) < 1e-9 and abs(ky) < 1e-9


def test_bistatic_grazing_magnitude():
    # |K_B| = 2 k cos(beta/2) equals the general vector at theta_i = theta_s = 90 deg
    beta = np.array([0.0, 30.0, 90.0, 150.0])
    kx, ky = bistatic_bragg_vector(13.5e6, 90.0, 90.0, 0.0, 180.0 - beta)
    np.testing.assert_allclose(np.hypot(kx, ky), bistatic_bragg_wavenumber(13.5e6, beta),
                               rtol=1e-12)
    assert bistatic_bragg_wavenumber(13.5e6, 0.0) == pytest.approx(
        ground_wave_bragg_wavenumber(13.5e6), rel=1e-15)


def test_arrays_broadcast_and_nan_propagates():
    k = bragg_wavenumber(np.array([[5e9], [1e10]]), np.array([20.0, 30.0, np.nan]))
    assert k.shape == (2, 3) and np.isnan(k[:, 2]).all()
    f = bragg_frequency(5e9, 30.0, current=np.array([0.0, np.nan]))
    assert np.isfinite(f[0]) and np.isnan(f[1])


@pytest.mark.parametrize("theta", [0.0, -10.0, 90.5, 180.0])
def test_bad_incidence(theta):
    with pytest.raises(ShortwaveInputError, match="incidence_deg"):
        bragg_wavenumber(5e9, theta)


def test_bad_inputs():
    with pytest.raises(ShortwaveInputError, match="frequency_hz"):
        bragg_wavenumber(-5e9, 30.0)
    with pytest.raises(ShortwaveInputError, match="wave"):
        bragg_frequency(5e9, 30.0, wave="sideways")
    with pytest.raises(ShortwaveInputError, match="depth"):
        bragg_frequency(5e6, 90.0, depth=-3.0)
    with pytest.raises(ShortwaveInputError, match="bistatic_angle_deg"):
        bistatic_bragg_wavenumber(5e6, 180.0)
    with pytest.raises(ShortwaveInputError, match="current"):
        bragg_frequency(5e6, 90.0, current=np.inf)
