"""Capillary-gravity dispersion: limits, identities, inverse, damping, bad input.

Facts of the trade (minimum phase speed ~23 cm/s at ~1.7 cm, L0 = 1.56 T^2, the HF Bragg
rule) are rows of the validation table (shortwave/validation/dispersion.py).
"""
import numpy as np
import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

from shortwave import dispersion as d
from shortwave._checks import ShortwaveInputError
from shortwave.water import Liquid, Water

G = d.GRAVITY
SEA = Water(15.0, 35.0)
CLEAN = Water(20.0, 0.0)
TAU = SEA.surface_tension / SEA.density          # kinematic surface tension [m3 s-2]
DEPTHS = np.array([1e-3, 1e-2, 0.1, 1.0, 10.0, 100.0, 1e3, np.inf])


# ---------------------------------------------------------------- limits and identities

def test_deep_water_is_the_closed_form():
    # identity: omega^2 = g k + (sigma/rho) k^3 (Lamb 1932, Art. 267)
    k = np.geomspace(1e-4, 1e6, 301)
    np.testing.assert_allclose(d.angular_frequency(k, SEA) ** 2, G * k + TAU * k**3,
                               rtol=1e-13)


def test_large_kh_equals_deep_water():
    k = np.geomspace(1e-2, 1e5, 50)
    h = 60.0 / k                                   # kh = 60: tanh = 1 to double precision
    np.testing.assert_allclose(d.angular_frequency(k, SEA, h), d.angular_frequency(k, SEA),
                               rtol=1e-13)
    np.testing.assert_allclose(d.group_speed(k, SEA, h), d.group_speed(k, SEA), rtol=1e-12)


def test_shallow_water_limit():
    # kh -> 0: c = c_g = sqrt(g h); corrections (kh)^2/6 and T k^2/g are < 2e-9 here
    h = np.array([0.1, 1.0, 10.0, 100.0])
    k = 1e-4 / h
    np.testing.assert_allclose(d.phase_speed(k, SEA, h), np.sqrt(G * h), rtol=1e-8)
    np.testing.assert_allclose(d.group_speed(k, SEA, h), np.sqrt(G * h), rtol=1e-8)


def test_deep_gravity_and_capillary_group_speed_limits():
    # c_g / c -> 1/2 for gravity waves, 3/2 for capillary waves (deep water)
    assert d.group_speed(1e-3, SEA) / d.phase_speed(1e-3, SEA) == pytest.approx(0.5, rel=1e-9)
    assert d.group_speed(1e7, SEA) / d.phase_speed(1e7, SEA) == pytest.approx(1.5, rel=1e-7)


@pytest.mark.parametrize("depth", DEPTHS)
def test_group_speed_is_the_derivative_of_omega(depth):
    k = np.geomspace(1e-3, 1e5, 200)
    dk = k * 1e-6
    num = (d.angular_frequency(k + dk, SEA, depth)
           - d.angular_frequency(k - dk, SEA, depth)) / (2 * dk)
    np.testing.assert_allclose(d.group_speed(k, SEA, depth), num, rtol=1e-7)


def test_minimum_phase_speed_identities():
    c_min, k_min = d.minimum_phase_speed(SEA)
    assert c_min == pytest.approx((4 * G * TAU) ** 0.25, rel=1e-14)
    assert k_min == pytest.approx(np.sqrt(G / TAU), rel=1e-14)
    assert d.phase_speed(k_min, SEA) == pytest.approx(c_min, rel=1e-14)
    assert d.group_speed(k_min, SEA) == pytest.approx(c_min, rel=1e-12)     # c_g = c there
    assert d.capillary_length(SEA) == pytest.approx(1.0 / k_min, rel=1e-14)


@pytest.mark.parametrize("depth", DEPTHS)
def test_phase_speed_never_below_the_minimum(depth):
    k = np.geomspace(1e-4, 1e7, 4001)
    c_min, _ = d.minimum_phase_speed(SEA)
    c = d.phase_speed(k, SEA, depth)
    if np.isinf(depth):
        assert np.all(c >= c_min * (1 - 1e-14))
    else:                                          # finite depth only slows the waves down
        assert np.all(c <= d.phase_speed(k, SEA) * (1 + 1e-14))


def test_clean_water_minimum_against_films_note():
    # independent re-computation (films research note Sec. 1.1, IAPWS-95 density and
    # IAPWS R1-76 tension at 20 degC): c_min 23.122 cm/s, lambda_m 1.7127 cm, f 13.50 Hz;
    # sea water S_A 35: 23.056 cm/s, 1.7030 cm
    c, k = d.minimum_phase_speed(CLEAN)
    assert c == pytest.approx(0.23122, abs=5e-6)
    assert 2 * np.pi / k == pytest.approx(0.017127, abs=5e-7)
    assert d.angular_frequency(k, CLEAN) / (2 * np.pi) == pytest.approx(13.50, abs=0.005)
    c, k = d.minimum_phase_speed(Water(20.0, 35.0))
    assert c == pytest.approx(0.23056, abs=5e-6)
    assert 2 * np.pi / k == pytest.approx(0.017030, abs=5e-7)


# films research note Sec. 6.2: clean water at 20 degC (independent re-computation with
# IAPWS-95 density 998.2072, IAPWS 2008 viscosity 1.00160 mPa s, IAPWS tension 72.736 mN/m)
# columns: wavelength [cm], f [Hz], c [cm/s], c_g [cm/s], 2 nu k^2 [1/s], exact root [1/s]
FILMS_6_2 = [
    (0.5, 63.05, 31.52, 44.81, 3.1690, 3.0270),
    (1.0, 24.78, 24.78, 30.87, 0.79225, 0.76396),
    (1.72, 13.44, 23.12, 23.07, 0.26780, 0.26025),
    (3.0, 8.31, 24.92, 18.58, 0.08803, 0.08622),
    (5.0, 5.91, 29.53, 17.87, 0.03169, 0.03123),
    (10.0, 4.01, 40.08, 21.18, 0.00792, 0.00785),
    (20.0, 2.80, 56.08, 28.45, 0.00198, 0.00197),
]


@pytest.mark.parametrize("lam_cm, f, c, cg, lamb, exact", FILMS_6_2)
def test_clean_water_table(lam_cm, f, c, cg, lamb, exact):
    k = 2 * np.pi / (lam_cm / 100)
    assert d.angular_frequency(k, CLEAN) / (2 * np.pi) == pytest.approx(f, abs=0.006)
    assert d.phase_speed(k, CLEAN) * 100 == pytest.approx(c, abs=0.006)
    assert d.group_speed(k, CLEAN) * 100 == pytest.approx(cg, abs=0.006)
    gamma = d.viscous_damping_rate(k, CLEAN)
    assert gamma == pytest.approx(lamb, rel=3e-3)       # printed to 3-5 digits
    # the exact root of the viscous dispersion relation lies below 2 nu k^2 by the
    # relative amount sqrt(eps / 2), eps = nu k^2 / omega (films note Sec. 1.2)
    eps = CLEAN.kinematic_viscosity * k**2 / d.angular_frequency(k, CLEAN)
    assert gamma * (1 - np.sqrt(eps / 2)) == pytest.approx(exact, rel=3e-3)


def test_damping_identities():
    k = np.geomspace(1.0, 1e4, 30)
    gamma = d.viscous_damping_rate(k, SEA)
    np.testing.assert_allclose(gamma, 2 * SEA.kinematic_viscosity * k**2, rtol=1e-15)
    np.testing.assert_allclose(d.viscous_spatial_damping_rate(k, SEA),
                               gamma / d.group_speed(k, SEA), rtol=1e-15)
    np.testing.assert_allclose(d.viscous_spatial_damping_rate(k, SEA, 0.5),
                               gamma / d.group_speed(k, SEA, 0.5), rtol=1e-15)


def test_wavelength_and_doppler():
    assert d.wavelength(2 * np.pi) == pytest.approx(1.0, rel=1e-15)
    k = np.array([10.0, 100.0, 1000.0])
    om = d.angular_frequency(k, SEA)
    np.testing.assert_allclose(d.apparent_angular_frequency(k, 0.0, 0.0, SEA), om, rtol=1e-15)
    np.testing.assert_allclose(d.apparent_angular_frequency(k, 0.3, 0.0, SEA), om + 0.3 * k,
                               rtol=1e-15)
    np.testing.assert_allclose(d.apparent_angular_frequency(k, 0.3, 180.0, SEA), om - 0.3 * k,
                               rtol=1e-13)
    np.testing.assert_allclose(d.apparent_angular_frequency(k, 0.3, 90.0, SEA), om, rtol=1e-13)


# ---------------------------------------------------------------- inverse dispersion

def test_inverse_round_trip_over_all_frequencies_and_depths():
    omega = np.geomspace(1e-3, 1e4, 300)[:, None]
    k = d.wavenumber(omega, SEA, DEPTHS[None, :])
    assert k.shape == (300, DEPTHS.size)
    np.testing.assert_allclose(d.angular_frequency(k, SEA, DEPTHS[None, :]),
                               np.broadcast_to(omega, k.shape), rtol=1e-12)


def test_inverse_round_trip_from_wavenumber():
    k = np.geomspace(1e-5, 1e6, 200)[:, None]
    om = d.angular_frequency(k, SEA, DEPTHS[None, :])
    np.testing.assert_allclose(d.wavenumber(om, SEA, DEPTHS[None, :]),
                               np.broadcast_to(k, om.shape), rtol=1e-11)


def test_inverse_with_array_of_waters():
    w = Water(np.array([0.0, 15.0, 30.0]), np.array([0.0, 35.0, 40.0]))
    omega = 2 * np.pi * 13.5
    k = d.wavenumber(omega, w)
    np.testing.assert_allclose(d.angular_frequency(k, w), omega, rtol=1e-12)


@settings(max_examples=150, deadline=None)
@given(k1=st.floats(1e-5, 1e6), ratio=st.floats(1.0001, 100.0),
       depth=st.one_of(st.just(np.inf), st.floats(1e-4, 1e4)))
def test_omega_increases_with_k(k1, ratio, depth):
    assert d.angular_frequency(k1 * ratio, SEA, depth) > d.angular_frequency(k1, SEA, depth)
    assert d.group_speed(k1, SEA, depth) > 0


@settings(max_examples=150, deadline=None)
@given(omega=st.floats(1e-3, 1e4), depth=st.one_of(st.just(np.inf), st.floats(1e-3, 1e4)),
       tension=st.floats(1e-3, 0.1), density=st.floats(500.0, 2000.0))
def test_round_trip_property(omega, depth, tension, density):
    liquid = Liquid(density, tension, kinematic_viscosity=1e-6)
    k = d.wavenumber(omega, liquid, depth)
    assert d.angular_frequency(k, liquid, depth) == pytest.approx(omega, rel=1e-12)


@settings(max_examples=50, deadline=None)
@given(n=st.integers(1, 5), m=st.integers(1, 5))
def test_broadcasting_shapes(n, m):
    k = np.geomspace(1.0, 1e3, n)[:, None]
    h = np.geomspace(0.01, 10.0, m)[None, :]
    for f in (d.angular_frequency, d.phase_speed, d.group_speed):
        assert np.shape(f(k, SEA, h)) == (n, m)
    assert np.shape(d.wavenumber(k, SEA, h)) == (n, m)
    assert np.shape(d.viscous_spatial_damping_rate(k, SEA, h)) == (n, m)


def test_scalars_in_scalars_out():
    for value in (d.angular_frequency(100.0), d.phase_speed(100.0), d.group_speed(100.0),
                  d.wavenumber(10.0), d.viscous_damping_rate(100.0), d.capillary_length(),
                  d.minimum_phase_speed()[0], d.wavelength(1.0),
                  d.viscous_spatial_damping_rate(100.0),
                  d.apparent_angular_frequency(100.0, 0.1)):
        assert np.ndim(value) == 0
        float(value)


def test_default_water_is_sea_water():
    assert d.angular_frequency(300.0) == d.angular_frequency(300.0, SEA)


def test_override_surface_tension_moves_the_minimum():
    # a surface film lowers the tension: c_min ~ sigma^(1/4), k_min ~ sigma^(-1/2)
    slick = Water(15.0, 35.0, surface_tension=SEA.surface_tension / 2)
    c0, k0 = d.minimum_phase_speed(SEA)
    c1, k1 = d.minimum_phase_speed(slick)
    assert c1 / c0 == pytest.approx(0.5 ** 0.25, rel=1e-14)
    assert k1 / k0 == pytest.approx(2 ** 0.5, rel=1e-14)


# ---------------------------------------------------------------- bad input

@pytest.mark.parametrize("func", [d.angular_frequency, d.phase_speed, d.group_speed,
                                  d.viscous_damping_rate, d.wavelength])
@pytest.mark.parametrize("k", [0.0, -1.0, np.inf, "ten", None, [1.0, -2.0]])
def test_bad_wavenumber(func, k):
    with pytest.raises(ShortwaveInputError, match="k"):
        func(k)


@pytest.mark.parametrize("omega", [0.0, -3.0, np.inf, "fast"])
def test_bad_angular_frequency(omega):
    with pytest.raises(ShortwaveInputError, match="omega"):
        d.wavenumber(omega)


@pytest.mark.parametrize("depth", [0.0, -1.0, "deep"])
def test_bad_depth(depth):
    with pytest.raises(ShortwaveInputError, match="depth"):
        d.angular_frequency(1.0, depth=depth)
    with pytest.raises(ShortwaveInputError, match="depth"):
        d.wavenumber(1.0, depth=depth)


def test_bad_water():
    with pytest.raises(ShortwaveInputError, match="water"):
        d.angular_frequency(1.0, water="sea")


def test_nan_propagates():
    assert np.isnan(d.angular_frequency(np.nan))
    assert np.isnan(d.group_speed(np.nan))
    k = d.wavenumber(np.array([1.0, np.nan]))
    assert np.isfinite(k[0]) and np.isnan(k[1])
    assert np.isnan(d.wavenumber(1.0, depth=np.nan))
    k = d.wavenumber(np.array([1.0, 2.0]), depth=np.array([np.nan, 1.0]))
    assert np.isnan(k[0]) and np.isfinite(k[1])
    assert np.isnan(d.wavenumber(1.0, Water(np.nan, 35.0)))
