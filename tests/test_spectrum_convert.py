"""Conversions between spectral representations and direction conventions."""
import numpy as np
import pytest

import shortwave.spectrum as sp
from shortwave._checks import ShortwaveInputError
from shortwave.spectrum import convert, moments


def test_direction_conventions():
    # CF standard-name table v83: *_from_direction / *_to_direction are bearings clockwise
    # from north; reference note Sect. 6.4 [C]: from 270 -> to 90 -> mathematical 0
    assert convert.reverse_direction(270.0) == 90.0
    assert convert.nautical_to_mathematical(convert.reverse_direction(270.0)) == 0.0
    assert convert.nautical_to_mathematical(0.0) == 90.0          # north is +y
    np.testing.assert_allclose(
        convert.mathematical_to_nautical(convert.nautical_to_mathematical(
            np.array([0.0, 45.0, 200.0, 359.0]))), [0.0, 45.0, 200.0, 359.0])
    # a wave travelling with the wind is at phi = 0, against it at -180 (wrapped)
    assert convert.angle_from_wind(90.0, 270.0) == 0.0
    assert convert.angle_from_wind(270.0, 270.0) == -180.0
    assert convert.angle_from_wind(180.0, 270.0) == 90.0


def test_per_degree_per_radian():
    # reference note Sect. 6.4 [C]: 1 m2 s deg-1 = 57.29578 m2 s rad-1
    assert convert.per_degree_to_per_radian(1.0) == pytest.approx(57.29578, abs=5e-6)
    assert convert.per_radian_to_per_degree(convert.per_degree_to_per_radian(3.0)) == \
        pytest.approx(3.0, rel=1e-15)


def test_frequency_direction_batch_shapes_and_depths():
    # leading batch axes (2 stations x 3 times), trailing (frequency, direction);
    # one depth per station
    f = 0.04 * 1.1 ** np.arange(25)
    th = np.arange(7.5, 360.0, 15.0)
    rng = np.random.default_rng(1)
    E = rng.random((2, 3, f.size, th.size))
    depth = np.array([[8.0], [np.inf]])
    F, k = convert.frequency_to_wavenumber(E, f, th, depth=depth)
    assert F.shape == E.shape and k.shape == (2, 1, f.size)
    kd, cgd = convert.wavenumber_of_frequency(f, np.inf)
    np.testing.assert_allclose(k[1, 0], kd, rtol=1e-12)
    np.testing.assert_allclose(F[1, 2], E[1, 2] * (cgd / (2 * np.pi))[:, None], rtol=1e-12)
    k8, cg8 = convert.wavenumber_of_frequency(f, 8.0)
    np.testing.assert_allclose(F[0, 1], E[0, 1] * (cg8 / (2 * np.pi))[:, None], rtol=1e-12)
    assert np.all(k8 > kd)                       # finite depth shortens the waves
    with pytest.raises(ShortwaveInputError, match="trailing axes"):
        convert.frequency_to_wavenumber(E[..., :5], f, th)
    with pytest.raises(ShortwaveInputError, match="frequency_hz: the axis must be strictly"):
        convert.frequency_to_wavenumber(E, f[::-1], th)
    with pytest.raises(ShortwaveInputError, match="depth: must be > 0"):
        convert.frequency_to_wavenumber(E, f, th, depth=0.0)


def test_variance_conserved_directional_finite_depth():
    # E(f, theta) df dtheta = F(k, theta) dk dtheta (Ardhuin's textbook, ch. measurement):
    # a JONSWAP-like test spectrum, fine frequency grid, depth 15 m
    f = np.geomspace(0.03, 2.0, 3000)
    th = np.arange(0.0, 360.0, 10.0)
    E = (f**-5 * np.exp(-1.25 * (0.1 / f) ** 4))[:, None] * \
        np.cos(np.deg2rad(th - 40.0) / 2) ** 8
    F, k = convert.frequency_to_wavenumber(E, f, th, depth=15.0)
    v_f = moments.frequency_variance(E, f, th, method="trapezoid")
    v_k = moments.variance(F, k, th, method="trapezoid")
    assert v_k == pytest.approx(v_f, rel=1e-5)          # trapezoid in f vs in k


def test_polar_cartesian_round_trip_keeps_moments():
    k = np.geomspace(5.0, 300.0, 300)
    phi = np.arange(0.0, 360.0, 5.0)
    F = sp.directional(k[:, None], phi, 10.0)
    kx = ky = np.linspace(-300, 300, 1201)
    Psi = convert.polar_to_cartesian(F, k, phi, kx, ky)
    # Psi = F / k at a grid point on the +kx axis
    i = np.argmin(np.abs(kx - 50.0)); j = np.argmin(np.abs(ky))
    assert Psi[j, i] == pytest.approx(sp.directional(kx[i], 0.0, 10.0) / kx[i], rel=2e-3)
    # slopes in the Cartesian form agree with the polar form (grid-limited: 1 %)
    inside = moments.mean_square_slope_from(F, k, phi, method="trapezoid")
    cart = moments.cartesian_mean_square_slope(Psi, kx, ky)
    assert cart == pytest.approx(inside, rel=0.01)
    up_p = moments.mean_square_slope_from(F, k, phi, component="upwind", method="trapezoid")
    up_c = moments.cartesian_mean_square_slope(Psi, kx, ky, component="upwind")
    assert up_c == pytest.approx(up_p, rel=0.01)
    back = convert.cartesian_to_polar(Psi, kx, ky, k[100:200], phi)
    np.testing.assert_allclose(back, F[100:200], rtol=0.03)


def test_curvature_helpers():
    k = np.geomspace(1, 100, 5)
    S = sp.omnidirectional(k, 8.0)
    np.testing.assert_allclose(convert.to_curvature(S, k), sp.curvature(k, 8.0), rtol=1e-14)
    np.testing.assert_allclose(convert.from_curvature(convert.to_curvature(S, k), k), S,
                               rtol=1e-14)
    phi = np.arange(0.0, 360.0, 30.0)
    F = sp.directional(k[:, None], phi, 8.0)
    np.testing.assert_allclose(convert.to_curvature(F, k, directional=True),
                               sp.directional_curvature(k[:, None], phi, 8.0), rtol=1e-13)
    np.testing.assert_allclose(convert.polar_to_omnidirectional(F, phi), S, rtol=1e-12)


def test_centrosymmetric_and_fold_keep_variance_and_slopes():
    # reference note Sect. 4.3: symmetrising keeps m0 and the slope tensor; folding a
    # symmetric spectrum downwind keeps them too (the choice documented in fold_downwind)
    k = np.geomspace(0.2, 200, 80)
    phi = np.arange(0.0, 360.0, 10.0)
    prop = (k**-3)[:, None] * np.where(np.cos(np.deg2rad(phi - 20)) > 0,
                                       np.cos(np.deg2rad(phi - 20)) ** 2, 0.0)
    sym = convert.centrosymmetric(prop, phi)
    np.testing.assert_allclose(sym, convert.centrosymmetric(sym, phi), rtol=1e-13)
    for spec in (sym,):
        assert moments.variance(spec, k, phi) == pytest.approx(moments.variance(prop, k, phi),
                                                               rel=1e-12)
        a = moments.slope_covariance(spec, k, phi)
        b = moments.slope_covariance(prop, k, phi)
        for key in ("mss_x", "mss_y", "mss_xy"):
            assert a[key] == pytest.approx(b[key], rel=1e-12)
    F = sp.directional(k[:, None], phi, 10.0)
    down = convert.fold_downwind(F, phi)
    assert moments.variance(down, k, phi) == pytest.approx(moments.variance(F, k, phi),
                                                           rel=1e-12)
    assert np.all(down[:, (phi > 90) & (phi < 270)] == 0)
    c1, c2 = moments.slope_covariance(down, k, phi), moments.slope_covariance(F, k, phi)
    assert c1["mss_x"] == pytest.approx(c2["mss_x"], rel=1e-12)
    assert c1["mss_y"] == pytest.approx(c2["mss_y"], rel=1e-12)


def test_model_cartesian_spectrum():
    # Psi(kx, ky) = F(k, phi)/k; rotating the wind rotates the spectrum
    kx, ky = np.meshgrid(np.linspace(-20, 20, 5), np.linspace(-20, 20, 5))
    P = sp.cartesian(kx, ky, 10.0, wind_direction_deg=30.0)
    k = np.hypot(kx, ky)
    ref = np.where(k > 0, sp.directional(np.where(k > 0, k, 1.0),
                                         np.rad2deg(np.arctan2(ky, kx)) - 30.0, 10.0)
                   / np.where(k > 0, k, 1.0), 0.0)
    np.testing.assert_allclose(P, ref, rtol=1e-13)
    assert P[2, 2] == 0.0
    np.testing.assert_allclose(P, P[::-1, ::-1], rtol=1e-13)   # centrosymmetric
