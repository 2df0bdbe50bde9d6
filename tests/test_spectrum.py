"""Spectrum models and the public spectrum API: variant decisions, closed forms, shapes, errors.

Sources are named beside each check.  "independent re-computation of ECKV eq. N" marks
regression values from another implementation of the same equations (the project's
reference note on spectra, Sect. 6.3), not measurements.
"""
import csv
from decimal import Decimal
import math
import pathlib
import warnings

import numpy as np
import pytest

import shortwave.spectrum as sp
from shortwave._checks import ShortwaveInputError
from shortwave.spectrum import models, wind
from shortwave.spectrum.spreading import ECKV_A0
from shortwave.water import ValidityWarning, Water

REF = pathlib.Path(__file__).parent / "reference"


def _last_unit(text):
    """One unit of the last printed digit of a number written as text."""
    return 10.0 ** Decimal(text).as_tuple().exponent


def _rows(name):
    with open(REF / name) as fh:
        return list(csv.DictReader(line for line in fh if not line.startswith("#")))


# --- the variant decisions of the reference note (Sect. 1.9), each tested --------------

def test_spreading_integrates_to_one():
    # ECKV Eq. 49 normalised to unit integral over 2 pi (reference note Sect. 1.9: a
    # published restatement once carried a spurious factor 2).  Periodic trapezoid on a
    # uniform grid integrates cos 2 phi exactly: rtol 1e-12 (identity).
    phi = np.arange(0.0, 360.0, 1.0)
    k = np.geomspace(0.05, 3000.0, 40)[:, None]
    delta = sp.spreading(k, 10.0)
    D = sp.spreading_function(phi, delta)
    np.testing.assert_allclose(np.sum(D, -1) * np.deg2rad(1.0), 1.0, rtol=1e-12)
    # and the directional spectrum integrates over phi to S(k)
    F = sp.directional(k, phi, 10.0)
    np.testing.assert_allclose(np.sum(F, -1) * np.deg2rad(1.0),
                               sp.omnidirectional(k[:, 0], 10.0), rtol=1e-12)


def test_short_wave_part_carries_lpm_jp():
    # ECKV Eq. 41 with the factor L_PM J_p (reference note Sect. 1.9, recommendation):
    # B_h / (1/2 alpha_m c_m/c exp(-(k/k_m - 1)^2/4)) must equal L_PM J_p of Eqs. 2-3.
    U, om = 10.0, 2.0
    k = np.array([0.3, 0.5, 1.0, 3.0, 100.0])
    bh = sp.elfouhaily1997_curvature(k, U, om, part="short")
    ustar = math.sqrt(1.44e-3) * U
    am = 1e-2 * (1 + 3 * math.log(ustar / 0.23))
    c = np.sqrt(9.81 / k * (1 + (k / 370.0) ** 2))
    kp = 9.81 * om**2 / U**2
    lpm = np.exp(-1.25 * (kp / k) ** 2)
    gamma = 1.7 + 6 * math.log10(om)
    sig = 0.08 * (1 + 4 / om**3)
    jp = gamma ** np.exp(-((np.sqrt(k / kp) - 1) ** 2) / (2 * sig**2))
    np.testing.assert_allclose(bh / (0.5 * am * 0.23 / c * np.exp(-0.25 * (k / 370 - 1) ** 2)),
                               lpm * jp, rtol=1e-12)


def test_variance_is_finite_and_independent_of_lower_limit():
    # Consequence of the L_PM J_p factor (reference note Sect. 1.9): without it the
    # variance diverges as k -> 0; with it the lower limit k_p/50 or k_p/5000 is the same.
    kp = sp.peak_wavenumber(10.0)
    out = []
    for lo in (kp / 50, kp / 5000):
        k = np.geomspace(lo, 7400.0, 40001)
        out.append(sp.moments.variance(sp.omnidirectional(k, 10.0), k, method="trapezoid"))
    assert out[0] == pytest.approx(out[1], rel=1e-6)


def test_gamma_uses_log10():
    # Donelan et al. (1985) gamma = 1.7 + 6 log10(Omega) (reference note Sect. 1.9): at
    # Omega = 5, gamma = 5.89382 (log10), not 11.36 (ln).  At k = k_p, Gamma = 1 and
    # B_l = 1/2 alpha_p exp(-5/4) gamma; identity, rtol 1e-12.
    U, om = 10.0, 5.0
    kp = 9.81 * om**2 / U**2
    bl = sp.elfouhaily1997_curvature(kp, U, om, part="long")
    gamma = bl / (0.5 * 6e-3 * om**0.5 * math.exp(-1.25))
    assert gamma == pytest.approx(1.7 + 6 * math.log10(5.0), rel=1e-12)
    assert gamma == pytest.approx(5.89382, abs=5e-6)  # reference note Sect. 6.3 [C]


def test_alpha_m_clamped_at_light_wind():
    # ECKV Eq. 44 is negative below u* = c_m/e = 0.0846 m/s (U10 < 2.23 m/s with
    # C_D = 1.44e-3); clamped at 0 (reference note Sect. 1.4 and pitfall 9).
    k = np.geomspace(0.1, 3000, 50)
    assert np.all(sp.elfouhaily1997_curvature(k, 2.0, part="short") == 0.0)
    assert np.all(sp.elfouhaily1997_curvature(k, 2.0) >= 0.0)
    assert np.all(sp.elfouhaily1997_curvature(k[k > 1], 3.0, part="short") > 0.0)
    assert np.all(models.eckv_alpha_m(np.array([0.01, 0.05, 0.08])) == 0.0)


def test_short_wave_curvature_at_km_is_half_alpha_m():
    # Closed form (reference note Sect. 1.4): B_h(k_m) = 1/2 alpha_m c_m / c(k_m), and
    # c(k_m) = sqrt(2 g / k_m); L_PM J_p = 1 there to 1e-7.
    ustar = math.sqrt(1.44e-3) * 10.0
    am = 1e-2 * (1 + 3 * math.log(ustar / 0.23))
    assert am == pytest.approx(0.025021, abs=5e-7)      # reference note Sect. 6.3 [C]
    bh = sp.elfouhaily1997_curvature(370.0, 10.0, part="short")
    assert bh == pytest.approx(0.5 * am * 0.23 / math.sqrt(2 * 9.81 / 370.0), rel=1e-6)
    assert bh == pytest.approx(am / 2, rel=2e-3)


def test_alpha_p_exponent_option():
    # alpha_p = 6e-3 Omega^0.55 (Donelan et al. 1985) instead of ^0.5 (ECKV Eq. 34): at
    # U10 = 10, Omega = 0.84, Hs lower by 0.4 % (reference note Sect. 6.3 [C]).
    k = np.geomspace(sp.peak_wavenumber(10.0) / 50, 7400, 20001)
    h = [sp.moments.significant_wave_height(sp.omnidirectional(k, 10.0, alpha_p_exponent=e),
                                            k, method="trapezoid") for e in (0.5, 0.55)]
    assert h[1] / h[0] == pytest.approx(0.996, abs=1e-3)


# --- independent re-computations of ECKV (reference note Sect. 6.3) --------------------

@pytest.mark.parametrize("row", _rows("elfouhaily1997_recomputed_spectrum.csv"),
                         ids=lambda r: f"k={r['k']}")
def test_eckv_spectral_values(row):
    # independent re-computation of ECKV eqs. 24, 31-32, 40-41, 44, 57 (note Sect. 6.3)
    k = float(row["k"])
    bl = sp.elfouhaily1997_curvature(k, 10.0, part="long")
    bh = sp.elfouhaily1997_curvature(k, 10.0, part="short")
    for got, text in ((bl, row["B_l"]), (bh, row["B_h"]), (bl + bh, row["B"]),
                      (sp.spreading(k, 10.0), row["Delta"])):
        if float(text) == 0.0:
            assert got < 1e-20
        else:
            # one unit of the last printed digit: the note rounds B and its parts separately
            assert got == pytest.approx(float(text), abs=_last_unit(text))
    assert sp.curvature(k, 10.0) == pytest.approx(bl + bh, rel=1e-14)


@pytest.mark.parametrize("row", _rows("elfouhaily1997_recomputed_moments.csv"),
                         ids=lambda r: f"U{r['U10']}-Om{r['Omega']}")
def test_eckv_integrated_values(row):
    # independent re-computation of ECKV (note Sect. 6.3): k_p/50 .. 20 k_m
    U, om = float(row["U10"]), float(row["Omega"])
    kp = sp.peak_wavenumber(U, om)
    k = np.geomspace(kp / 50, 7400.0, 20001)
    hs = sp.moments.significant_wave_height(sp.omnidirectional(k, U, inverse_wave_age=om), k,
                                            method="trapezoid")
    assert hs == pytest.approx(float(row["Hs"]), rel=5e-4)
    t, u, c = sp.mean_square_slope_components(U, k_max=7400.0, inverse_wave_age=om)
    assert t == pytest.approx(float(row["mss"]), rel=5e-4)
    assert u == pytest.approx(float(row["mss_up"]), rel=5e-4)
    assert c == pytest.approx(float(row["mss_cross"]), rel=5e-4)


def test_eckv_scalars_and_directional_density():
    # independent re-computation of ECKV (note Sect. 6.3)
    assert sp.peak_wavenumber(10.0) == pytest.approx(0.069219, abs=5e-7)
    # psi(k, 0) = S/k (1 + Delta)/(2 pi) [m4]: 1.1737e-3 at k = 1, 1.5561e-11 at k = 100
    assert sp.directional(1.0, 0.0, 10.0) / 1.0 == pytest.approx(1.1737e-3, rel=1e-4)
    assert sp.directional(100.0, 0.0, 10.0) / 100.0 == pytest.approx(1.5561e-11, rel=1e-4)
    # sigma(0.84) = 0.61990, sigma(5) = 0.08256: recover sigma from the peak width
    for om, sig in ((0.84, 0.61990), (5.0, 0.08256)):
        assert 0.08 * (1 + 4 / om**3) == pytest.approx(sig, abs=5e-6)


def test_fetch_law_table():
    # ECKV Eq. 37, X0 = 2.2e4 (verified in Ardhuin's textbook, ch. fetch); table values:
    # independent re-computation (reference note Sect. 1.7)
    cases = [(10, 10e3, 2.1795, 0.4660), (10, 50e3, 1.4138, 0.1961),
             (10, 100e3, 1.2032, 0.1420), (10, 1000e3, 0.8739, 0.0749),
             (5, 10e3, 1.4953, 0.8774), (20, 100e3, 1.6911, 0.0701)]
    for U, x, om, kp in cases:
        got = sp.inverse_wave_age_from_fetch(x, U)
        assert got == pytest.approx(om, abs=5e-5)
        assert sp.peak_wavenumber(U, got) == pytest.approx(kp, abs=5e-5)
    assert sp.inverse_wave_age_from_fetch(np.inf, 10.0) == 0.84
    # fetch= in the spectrum functions equals the explicit Omega
    k = np.geomspace(0.1, 1000, 7)
    om = sp.inverse_wave_age_from_fetch(50e3, 10.0)
    np.testing.assert_allclose(sp.omnidirectional(k, 10.0, fetch=50e3),
                               sp.omnidirectional(k, 10.0, inverse_wave_age=om), rtol=1e-14)


def test_friction_velocity_laws():
    # reference note Sect. 1.5 table (independent re-computation; laws: C_D = 1.44e-3,
    # Wu 1982, wave-age roughness z0 = 3.7e-5 U^2/g Omega^0.9 from memory)
    table = {3: (0.114, 0.095, 0.094), 5: (0.190, 0.168, 0.171), 10: (0.379, 0.381, 0.387),
             15: (0.569, 0.632, 0.630), 20: (0.759, 0.917, 0.893)}
    for U, refs in table.items():
        for law, ref in zip(sp.USTAR_LAWS, refs):
            assert sp.friction_velocity(U, law) == pytest.approx(ref, abs=6e-4)
    # the law changes the spectrum only through u*: friction_velocity= reproduces it
    k = np.geomspace(1, 1000, 5)
    np.testing.assert_allclose(sp.curvature(k, 10.0, ustar_law="wu1982"),
                               sp.curvature(k, 10.0, friction_velocity=sp.friction_velocity(
                                   10.0, "wu1982")), rtol=1e-14)


def test_wind_speed_at_height():
    # reference note Sect. 2 [C]: U12.5/U10 = 1.017, 1.020, 1.022 at U10 = 5, 10, 15
    # (log profile, Charnock z0 = 0.011 u*^2/g)
    got = sp.wind_speed_at_height(np.array([5.0, 10.0, 15.0]), 12.5) / [5.0, 10.0, 15.0]
    np.testing.assert_allclose(got, [1.017, 1.020, 1.022], atol=1.5e-3)


def test_water_sets_capillary_constants():
    # with a Water, k_m = sqrt(rho g / sigma) and c_m = sqrt(2 g / k_m) (note Sect. 1.2)
    w = Water(20.0, 35.0)
    km = math.sqrt(w.density * 9.81 / w.surface_tension)
    bh = sp.elfouhaily1997_curvature(km, 10.0, water=w, part="short")
    cm = math.sqrt(2 * 9.81 / km)
    am = 1e-2 * (1 + 3 * math.log(math.sqrt(1.44e-3) * 10 / cm))
    assert bh == pytest.approx(am / 2, rel=1e-6)


# --- public API: shapes, broadcasting, symmetry -----------------------------------------

def test_broadcasting_k_against_wind():
    k = np.geomspace(0.05, 2000, 11)
    U = np.array([5.0, 10.0, 15.0])
    S = sp.omnidirectional(k, U[:, None])
    assert S.shape == (3, 11)
    for i, u in enumerate(U):
        np.testing.assert_allclose(S[i], sp.omnidirectional(k, u), rtol=1e-14)
    om = np.array([0.84, 1.5, 3.0])
    assert sp.spreading(k, U[:, None], inverse_wave_age=om[:, None]).shape == (3, 11)
    assert isinstance(sp.omnidirectional(1.0, 10.0), float)


def test_directional_symmetry_and_curvature():
    k = np.geomspace(0.1, 2000, 9)[:, None]
    phi = np.array([0.0, 30.0, 90.0, 150.0])
    F = sp.directional(k, phi, 10.0)
    np.testing.assert_allclose(F, sp.directional(k, phi + 180.0, 10.0), rtol=1e-13)
    np.testing.assert_allclose(F, sp.directional(k, -phi, 10.0), rtol=1e-13)
    np.testing.assert_allclose(sp.directional_curvature(k, phi, 10.0), k**3 * F, rtol=1e-13)
    np.testing.assert_allclose(sp.curvature(k, 10.0), k**3 * sp.omnidirectional(k, 10.0),
                               rtol=1e-14)
    with pytest.raises(ShortwaveInputError, match="propagating"):
        sp.directional(1.0, 0.0, 10.0, centrosymmetric=False)


def test_mean_square_slope_vectorised():
    U = np.array([[3.0, 7.0, 11.0], [5.0, 9.0, 14.0]])
    t = sp.mean_square_slope(U)
    assert t.shape == (2, 3)
    assert t[1, 1] == pytest.approx(sp.mean_square_slope(9.0), rel=1e-14)
    tot, up, cr = sp.mean_square_slope_components(U)
    np.testing.assert_allclose(up + cr, tot, rtol=1e-14)
    assert sp.mean_square_slope(10.0, component="upwind") == \
        sp.mean_square_slope_components(10.0)[1]
    # the integral over a range is additive
    a = sp.mean_square_slope(10.0, k_min=0.01, k_max=50.0, n=4001)
    b = sp.mean_square_slope(10.0, k_min=50.0, k_max=1e4, n=4001)
    c = sp.mean_square_slope(10.0, k_min=0.01, k_max=1e4, n=8001)
    assert a + b == pytest.approx(c, rel=1e-5)
    # default grid converged: 2001 vs 20001 points
    assert sp.mean_square_slope(10.0) == pytest.approx(sp.mean_square_slope(10.0, n=20001),
                                                       rel=1e-5)


def test_nan_policy():
    U = np.array([5.0, np.nan, 10.0])
    with pytest.raises(ShortwaveInputError, match="wind_speed: NaN"):
        sp.omnidirectional(1.0, U)
    S = sp.omnidirectional(1.0, U, nan_policy="propagate")
    assert np.isnan(S[1]) and np.all(np.isfinite(S[[0, 2]]))
    m = sp.mean_square_slope(U, nan_policy="propagate")
    assert np.isnan(m[1]) and m[2] == pytest.approx(sp.mean_square_slope(10.0), rel=1e-14)
    m2 = sp.mean_square_slope(U, model="yurovskaya2013", nan_policy="propagate", n=201)
    assert np.isnan(m2[1]) and np.all(np.isfinite(m2[[0, 2]]))


# --- bad input ----------------------------------------------------------------------------

@pytest.mark.parametrize("kwargs, match", [
    (dict(k=1.0, wind_speed=0.0), "wind_speed: must be > 0"),
    (dict(k=1.0, wind_speed=-3.0), "wind_speed: must be > 0"),
    (dict(k=1.0, wind_speed=np.inf), "wind_speed: infinite"),
    (dict(k=1.0, wind_speed="ten"), "wind_speed: a number is required"),
    (dict(k=[], wind_speed=10.0), "k: the wavenumber array is empty"),
    (dict(k=[1.0, -1.0], wind_speed=10.0), "k: must be > 0"),
    (dict(k=[1.0, 0.0], wind_speed=10.0), "k: must be > 0"),
    (dict(k=[1.0, np.nan], wind_speed=10.0), "k: NaN"),
    (dict(k=1.0, wind_speed=10.0, inverse_wave_age=0.0), "inverse_wave_age: must be > 0"),
    (dict(k=1.0, wind_speed=10.0, inverse_wave_age=np.nan), "inverse_wave_age: NaN"),
    (dict(k=1.0, wind_speed=10.0, model="jonswap"), "model: unknown value 'jonswap'; "
                                                    "choose one of: elfouhaily1997"),
    (dict(k=1.0, wind_speed=10.0, fetch=0.0), "fetch: must be > 0"),
    (dict(k=1.0, wind_speed=10.0, fetch=1e4, inverse_wave_age=2.0), "fetch or inverse_wave"),
    (dict(k=1.0, wind_speed=10.0, ustar_law="charnock"), "ustar_law: unknown"),
    (dict(k=1.0, wind_speed=10.0, nan_policy="omit"), "nan_policy: unknown"),
    (dict(k=1.0, wind_speed=10.0, colour="red"), "colour: not an option"),
    (dict(k=1.0, wind_speed=10.0, model="yurovskaya2013", alpha_p_exponent=0.55),
     "alpha_p_exponent: not an option of model 'yurovskaya2013'"),
])
def test_bad_input(kwargs, match):
    with pytest.raises(ShortwaveInputError, match=match):
        sp.omnidirectional(**kwargs)


def test_bad_slope_arguments():
    with pytest.raises(ShortwaveInputError, match="component: unknown"):
        sp.mean_square_slope(10.0, component="diagonal")
    with pytest.raises(ShortwaveInputError, match="k_max: must be greater than k_min"):
        sp.mean_square_slope(10.0, k_min=100.0, k_max=10.0)
    with pytest.raises(ShortwaveInputError, match="k_min: must be > 0"):
        sp.mean_square_slope(10.0, k_min=-1.0)
    with pytest.raises(ShortwaveInputError, match="n: at least 3"):
        sp.mean_square_slope(10.0, n=2)
    with pytest.raises(ShortwaveInputError, match="wind_speed: NaN"):
        sp.mean_square_slope([10.0, np.nan])


def test_inverse_wave_age_validity_warning():
    with pytest.warns(ValidityWarning, match=r"inverse_wave_age outside the validity range"):
        sp.omnidirectional(1.0, 10.0, inverse_wave_age=6.0)
    with pytest.warns(ValidityWarning, match=r"inverse wave age above 5"):
        sp.inverse_wave_age_from_fetch(10.0, 20.0)
    with warnings.catch_warnings():
        warnings.simplefilter("error")
        sp.omnidirectional(1.0, 10.0, inverse_wave_age=[0.84, 5.0])


def test_eckv_delta_limits():
    # Delta -> tanh(a0 + ...) stays within (tanh(ln2/4), 1]; near the peak ~1 (note Sect. 1.6)
    k = np.geomspace(1e-3, 1e5, 400)
    d = sp.spreading(k, 10.0)
    assert np.all(d > math.tanh(math.log(2) / 4) - 1e-12) and np.all(d <= 1.0)
    assert ECKV_A0 == pytest.approx(0.17329, abs=5e-6)
    assert wind.FETCH_SCALE == 2.2e4
