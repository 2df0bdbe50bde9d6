"""Moments of tabulated spectra: bin widths, batch axes, representations, errors."""
import numpy as np
import pytest

import shortwave.spectrum as sp
from shortwave._checks import ShortwaveInputError
from shortwave.spectrum import convert, moments


def test_bin_widths():
    # geometric frequency grid: widths f_i (sqrt(X) - 1/sqrt(X)) (reference note Sect. 5,
    # wave-model discretisation, Ardhuin's textbook ch. model_global)
    f = 0.037 * 1.1 ** np.arange(32)
    np.testing.assert_allclose(moments.bin_widths(f), f * (1.1**0.5 - 1.1**-0.5), rtol=1e-12)
    # arithmetic grid: uniform widths; trapezoid: half widths at the ends
    x = np.linspace(1.0, 2.0, 11)
    np.testing.assert_allclose(moments.bin_widths(x), 0.1, rtol=1e-12)
    w = moments.bin_widths(x, "trapezoid")
    assert w[0] == pytest.approx(0.05) and w.sum() == pytest.approx(1.0)
    # irregular grid: cells between midpoints
    np.testing.assert_allclose(moments.bin_widths([1.0, 2.0, 4.5]), [1.0, 1.75, 2.5])
    # explicit CF-style bounds
    np.testing.assert_allclose(moments.bin_widths([1.0, 2.0], bounds=[[0.5, 1.5], [1.5, 3.0]]),
                               [1.0, 1.5])
    np.testing.assert_allclose(moments.bin_widths([1.0, 2.0], bounds=[0.5, 1.5, 3.0]), [1.0, 1.5])


def test_direction_widths_any_order():
    phi = np.array([7.5, 352.5, 22.5, 337.5] + list(np.arange(37.5, 337.5, 15.0)))
    w = moments.direction_widths(phi)
    np.testing.assert_allclose(w, np.deg2rad(15.0), rtol=1e-12)
    w2 = moments.direction_widths([0.0, 90.0, 120.0, 270.0])
    np.testing.assert_allclose(np.rad2deg(w2), [90.0, 60.0, 90.0, 120.0])
    assert w2.sum() == pytest.approx(2 * np.pi)


@pytest.mark.parametrize("call, match", [
    (lambda: moments.variance([1.0, 2.0], [2.0, 1.0]), "k: the axis must be strictly increasing"),
    (lambda: moments.variance([], []), "k: the axis is empty"),
    (lambda: moments.variance([1.0, 2.0], [0.0, 1.0]), "k: values must be > 0"),
    (lambda: moments.variance([1.0, 2.0], [1.0, np.nan]), "k: the axis has NaN"),
    (lambda: moments.variance([1.0, 2.0, 3.0], [1.0, 2.0]), "S: its wavenumber axis"),
    (lambda: moments.variance(np.ones((2, 3)), [1.0, 2.0], [0.0, 90.0, 90.0]),
     "phi_deg: directions repeat"),
    (lambda: moments.variance([1.0, 2.0], [1.0, 2.0], k_min=5.0), "no grid wavenumber"),
    (lambda: moments.variance([1.0, 2.0], [1.0, 2.0], k_min=2.0, k_max=1.0),
     "k_max: must be greater"),
    (lambda: moments.variance([1.0], [1.0]), "at least 2 grid points"),
    (lambda: moments.variance([1.0, 2.0], [1.0, 2.0], method="simpson"), "method: unknown"),
    (lambda: moments.mean_square_slope_from([1.0, 2.0], [1.0, 2.0], component="upwind"),
     "need a directional spectrum"),
    (lambda: moments.bin_widths([1.0, 2.0], bounds=[1.0, 2.0]), "expected 3 edges"),
])
def test_bad_grids_name_the_argument(call, match):
    with pytest.raises(ShortwaveInputError, match=match):
        call()


def test_moments_agree_across_representations():
    # one ECKV spectrum as S(k), F(k, phi), B(k), B(k, phi) and E(f, theta): same Hs and mss
    U = 10.0
    k = np.geomspace(sp.peak_wavenumber(U) / 50, 7400.0, 6001)
    phi = np.arange(0.0, 360.0, 5.0)
    S = sp.omnidirectional(k, U)
    F = sp.directional(k[:, None], phi, U)
    B = sp.curvature(k, U)
    kw = dict(method="trapezoid")
    hs = moments.significant_wave_height(S, k, **kw)
    assert moments.significant_wave_height(F, k, phi, **kw) == pytest.approx(hs, rel=1e-10)
    assert moments.significant_wave_height(B, k, curvature=True, **kw) == \
        pytest.approx(hs, rel=1e-12)
    mss = moments.mean_square_slope_from(S, k, **kw)
    assert mss == pytest.approx(sp.mean_square_slope(U, k_max=7400.0), rel=1e-5)
    assert moments.mean_square_slope_from(B, k, curvature=True, **kw) == \
        pytest.approx(mss, rel=1e-12)
    up = moments.mean_square_slope_from(F, k, phi, component="upwind", **kw)
    assert up == pytest.approx(sp.mean_square_slope(U, k_max=7400.0, component="upwind"),
                               rel=1e-5)
    # the wind axis along phi = 90 swaps upwind and crosswind
    cr = moments.mean_square_slope_from(F, k, phi, wind_direction_deg=90.0,
                                        component="upwind", **kw)
    assert cr == pytest.approx(mss - up, rel=1e-10)
    # frequency form (deep water, the ECKV dispersion is not the project's: compare Hs only)
    E, f = convert.wavenumber_to_frequency(F, k, phi)
    assert moments.frequency_significant_wave_height(E, f, phi, **kw) == \
        pytest.approx(hs, rel=1e-5)


def test_batch_axes():
    U = np.array([[5.0], [10.0], [15.0]])
    k = np.geomspace(0.005, 5000.0, 3001)
    S = sp.omnidirectional(k, U)                          # (3, nk)
    hs = moments.significant_wave_height(S, k, method="trapezoid")
    assert hs.shape == (3,)
    for i in range(3):
        assert hs[i] == pytest.approx(
            moments.significant_wave_height(S[i], k, method="trapezoid"), rel=1e-14)
    phi = np.arange(0.0, 360.0, 15.0)
    F = sp.directional(k[:, None], phi, U[:, :, None])     # (3, nk, nphi)
    up = moments.mean_square_slope_from(F, k, phi, component="upwind",
                                        wind_direction_deg=np.array([0.0, 90.0, 180.0]))
    assert up.shape == (3,)


def test_cos2_spreading_three_to_one():
    # reference note Sect. 6.4 [C: analytic]: D = (2/pi) cos^2 for |theta| < 90 gives
    # mss_along : mss_across = 3 : 1
    k = np.geomspace(1, 10, 50)
    phi = np.arange(0.0, 360.0, 1.0)
    d = np.where(np.cos(np.deg2rad(phi)) > 0, 2 / np.pi * np.cos(np.deg2rad(phi)) ** 2, 0)
    F = (k**-3)[:, None] * d
    up = moments.mean_square_slope_from(F, k, phi, component="upwind")
    cr = moments.mean_square_slope_from(F, k, phi, component="crosswind")
    assert up / cr == pytest.approx(3.0, rel=1e-10)
    axis = moments.slope_covariance(F, k, phi)["major_direction_deg"]
    assert axis == pytest.approx(0.0, abs=1e-9)


def test_frequency_mean_square_slope_components():
    f = np.geomspace(0.05, 1.0, 400)
    th = np.arange(0.0, 360.0, 10.0)
    E = sp.pierson_moskowitz1964(f, 10.0)[:, None] * (
        1 + 0.5 * np.cos(2 * np.deg2rad(th - 30.0))) / (2 * np.pi)
    tot = moments.frequency_mean_square_slope(E, f, th)
    up = moments.frequency_mean_square_slope(E, f, th, wind_direction_deg=30.0,
                                             component="upwind")
    cr = moments.frequency_mean_square_slope(E, f, th, wind_direction_deg=30.0,
                                             component="crosswind")
    assert up + cr == pytest.approx(tot, rel=1e-12)
    assert up / tot == pytest.approx(0.5 + 0.5 / 4, rel=1e-10)   # 1/2 + Delta/4
    # a wavenumber range drops frequencies outside it
    part = moments.frequency_mean_square_slope(E, f, th, k_max=1.0)
    assert 0 < part < tot
