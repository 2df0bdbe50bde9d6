"""Film damping: the visco-elastic film relation, its limits, root tracking and bad input.

Published limits (Lamb 1932; Lucassen 1968; Cini & Lombardini 1978) are also rows of the
validation table (shortwave/validation/films.py); here they are swept over ranges.
"""
import csv
import os
import warnings

import numpy as np
import pytest

from shortwave import films as F
from shortwave._checks import ShortwaveInputError
from shortwave.dispersion import angular_frequency, wavenumber
from shortwave.water import Water

REF = os.path.join(os.path.dirname(__file__), "reference")
SEA20 = Water(20.0, 35.0)
PURE20 = Water(20.0, 0.0, density=998.2072, dynamic_viscosity=1.00160e-3,
               surface_tension=72.736e-3)


def _rows(name):
    with open(os.path.join(REF, name)) as fh:
        return list(csv.DictReader(line for line in fh if not line.startswith("#")))


def _lucassen_d(k, om, e, water, sigma=None):
    """Eq. (1) of films.md Sec. 1.3 in its original, un-rearranged form."""
    rho, mu = water.density, water.dynamic_viscosity
    sig = water.surface_tension if sigma is None else sigma
    m = np.sqrt(k * k - 1j * om * rho / mu)
    return ((e * k**2 - 1j * om * mu * (k + m))
            * (sig * k**2 + rho * 9.80665 - rho * om**2 / k - 1j * om * mu * (k + m))
            + om**2 * mu**2 * (k - m) ** 2)


# --- clean surface ----------------------------------------------------------------------

@pytest.mark.parametrize("row", _rows("lamb_clean_damping_recomputed.csv"),
                         ids=lambda r: r["wavelength_m"])
def test_clean_damping_matches_recomputed_table(row):
    # independent re-computation of Lamb's exact relation (films.md Sec. 6.2)
    k = 2 * np.pi / float(row["wavelength_m"])
    gamma = F.damping_rate(k, None, PURE20)
    delta = F.damping_rate(k, None, PURE20, form="spatial")
    digits = len(row["gamma_exact_per_s"].split(".")[1])
    assert gamma == pytest.approx(float(row["gamma_exact_per_s"]), abs=0.51 * 10.0**-digits)
    d_digits = len(row["delta_exact_per_m"].split(".")[1])
    assert delta == pytest.approx(float(row["delta_exact_per_m"]), abs=0.51 * 10.0**-d_digits)


def test_clean_damping_tends_to_lamb_with_known_correction():
    # Lamb (1932) Art. 348: Gamma -> 2 nu k^2; first correction -(nu k^2/omega)^(1/2)/sqrt 2
    # (films.md Sec. 1.2, expansion fitted to the exact relation)
    k = np.geomspace(2.0, 3000.0, 40)
    nu = PURE20.kinematic_viscosity
    eps = nu * k**2 / np.asarray(angular_frequency(k, PURE20))
    ratio = np.asarray(F.damping_rate(k, None, PURE20)) / (2 * nu * k**2)
    assert np.all(ratio < 1.0) and np.all(ratio > 0.9)
    np.testing.assert_allclose(ratio, 1 - np.sqrt(eps / 2), atol=3 * eps.max())


def test_elasticity_zero_reproduces_clean_exactly():
    k = np.array([5.0, 50.0, 500.0])
    clean = F.complex_frequency(k, None, SEA20)
    zero = F.complex_frequency(k, F.Monolayer(elasticity=0.0), SEA20)
    np.testing.assert_allclose(zero, clean, rtol=1e-13)


def test_root_satisfies_original_relation():
    # the rearranged Newton form and Eq. (1) share their roots
    k = np.array([20.0, 120.0, 400.0])
    e0, wd = 0.02, 3.0
    om = F.complex_frequency(k, F.Monolayer(e0, wd), SEA20)
    e = F.diffusional_modulus(om, e0, wd)
    scale = np.abs(_lucassen_d(k, np.real(om), 0 * e, SEA20)) + (SEA20.density * om.real**2 / k) ** 2
    assert np.all(np.abs(_lucassen_d(k, om, e, SEA20)) / scale < 1e-10)


# --- regression against the re-computed damping-ratio table ---------------------------

@pytest.mark.parametrize("row", _rows("lucassen_film_damping_recomputed.csv"),
                         ids=lambda r: f"E{r['elasticity_n_per_m']}-wD{r['relaxation_frequency_rad_s']}-f{r['frequency_hz']}")
def test_damping_ratio_table(row):
    film = F.Monolayer(float(row["elasticity_n_per_m"]), float(row["relaxation_frequency_rad_s"]))
    y = F.damping_ratio_at_frequency(float(row["frequency_hz"]), film, SEA20)
    assert y == pytest.approx(float(row["damping_ratio"]), abs=0.051)


def test_damping_ratio_table_vectorised_over_films():
    rows = _rows("lucassen_film_damping_recomputed.csv")
    film = F.Monolayer(np.array([float(r["elasticity_n_per_m"]) for r in rows]),
                       np.array([float(r["relaxation_frequency_rad_s"]) for r in rows]))
    f = np.array([float(r["frequency_hz"]) for r in rows])
    y = F.damping_ratio_at_frequency(f, film, SEA20)
    np.testing.assert_allclose(y, [float(r["damping_ratio"]) for r in rows], atol=0.051)


# --- limits: inextensible film and the resonance maximum ---------------------------------

@pytest.mark.parametrize("freq,y_exact", [(2, 39.65), (5, 10.84), (10, 5.61), (20, 4.07)])
def test_inextensible_limit(freq, y_exact):
    # Lamb (1932) Art. 351 / Lucassen (1968): y_inext = sqrt(omega/nu)/(4 sqrt2 k); the exact
    # root lies 2-10 % higher.  E = 10 N/m against films.md Sec. 1.4 (re-computation).
    om = 2 * np.pi * freq
    k = float(wavenumber(om, SEA20))
    y10 = F.damping_ratio_at_frequency(freq, F.Monolayer(elasticity=10.0), SEA20)
    assert y10 == pytest.approx(y_exact, abs=0.006)
    y3, y4 = F.damping_ratio_at_frequency(np.array([freq, freq]),
                                          F.Monolayer(np.array([1e3, 1e4])), SEA20)
    assert y4 == pytest.approx(y3, rel=3e-3)          # saturated: E -> infinity
    assert y4 <= y3 <= y10 * 1.0001                   # approached from above
    formula = np.sqrt(om / SEA20.kinematic_viscosity) / (4 * np.sqrt(2) * k)
    assert 1.0 < y4 / formula < 1.12


def test_temporal_inextensible_rate_against_formula():
    k = np.geomspace(5.0, 1000.0, 20)
    g = np.asarray(F.damping_rate(k, F.Monolayer(elasticity=100.0), SEA20))
    g0 = np.asarray(F.inextensible_damping_rate(k, SEA20))
    assert np.all(np.abs(g / g0 - 1) < 0.12)


@pytest.mark.parametrize("freq", [3.0, 6.0, 12.0])
def test_elastic_maximum_twice_inextensible(freq):
    # Lucassen (1968); Cini & Lombardini (1978): y_max ~ 2 y_inext at E k^2 ~ 1.37
    # sqrt(mu rho omega^3) (coefficient: films.md Sec. 1.5 re-computation)
    om = 2 * np.pi * freq
    k = float(wavenumber(om, SEA20))
    e = np.geomspace(1e-3, 1.0, 1201)
    y = F.damping_ratio_at_frequency(np.full(e.size, freq), F.Monolayer(e), SEA20)
    i = int(np.argmax(y))
    assert 0 < i < e.size - 1
    y_inext = F.damping_ratio_at_frequency(freq, F.Monolayer(1e3), SEA20)
    assert y[i] / y_inext == pytest.approx(2.0, rel=0.03)
    x = e[i] * k**2 / np.sqrt(SEA20.dynamic_viscosity * SEA20.density * om**3)
    assert x == pytest.approx(1.37, abs=0.06)
    e_res = F.resonance_elasticity(k, SEA20)
    assert e[i] == pytest.approx(e_res, rel=0.05)


def test_spatial_and_temporal_ratios_agree_for_monolayers():
    # films.md Sec. 6.3 (iv): within a few % when the film does not change sigma
    # (the film also changes Re k and c_g, more so at short waves)
    k = np.geomspace(10.0, 2000.0, 30)
    film = F.Monolayer(0.02, 1.0)
    yt = np.asarray(F.damping_ratio(k, film, SEA20))
    ys = np.asarray(F.damping_ratio(k, film, SEA20, form="spatial"))
    assert np.all(np.abs(ys / yt - 1) < 0.06)
    assert np.all(np.abs(ys / yt - 1)[k < 500] < 0.04)


def test_gaster_relation_for_weak_damping():
    # Delta = Gamma / c_g for weak damping (Gaster 1962; films.md Sec. 1.6)
    from shortwave.dispersion import group_speed
    k = 2 * np.pi / 0.01
    g = F.damping_rate(k, None, PURE20)
    d = F.damping_rate(k, None, PURE20, form="spatial")
    assert d == pytest.approx(g / group_speed(k, PURE20), rel=2e-3)


# --- dilational modulus models ----------------------------------------------------------

def test_diffusional_modulus_properties():
    om = np.geomspace(0.1, 1e3, 50)
    e = F.diffusional_modulus(om, 0.03, 5.0)
    w = np.sqrt(5.0 / (2 * om))
    np.testing.assert_allclose(np.abs(e), 0.03 / np.sqrt(1 + 2 * w + 2 * w**2), rtol=1e-12)
    phase = np.degrees(np.angle(e))
    assert np.all((phase <= 0) & (phase > -45))       # Im E <= 0, loss angle < 45 deg
    assert np.abs(F.diffusional_modulus(1e9, 0.03, 5.0)) == pytest.approx(0.03, rel=1e-4)
    assert np.abs(F.diffusional_modulus(1e-6, 0.03, 5.0)) < 0.03 * 1e-3


def test_dilational_modulus_combines_models():
    film = F.Monolayer(0.02, 2.0, dilational_viscosity=3e-5)
    om = 40.0
    e = F.dilational_modulus(om, film)
    assert e == pytest.approx(F.diffusional_modulus(om, 0.02, 2.0) - 1j * om * 3e-5, rel=1e-12)
    assert e.imag < 0


def test_relaxation_parameters_round_trip():
    # films.md Sec. 8.1: (E0, omega_D, omega) -> (|E|, theta) -> (E0, omega_D), 1e-12
    e0, wd, om = 0.027, 0.7, 2 * np.pi * 3.0
    e = F.diffusional_modulus(om, e0, wd)
    back = F.relaxation_parameters(np.abs(e), -np.degrees(np.angle(e)), om)
    assert back[0] == pytest.approx(e0, rel=1e-12)
    assert back[1] == pytest.approx(wd, rel=1e-12)
    assert F.modulus_from_loss_angle(np.abs(e), -np.degrees(np.angle(e))) == pytest.approx(e)


def test_surface_viscosity_damps_more_than_clean():
    k = np.array([50.0, 200.0, 800.0])
    y = np.asarray(F.damping_ratio(k, F.Monolayer(0.0, dilational_viscosity=1e-4), SEA20))
    assert np.all(y > 1.0)


def test_film_pressure_lowers_tension():
    k = 300.0
    plain = F.complex_frequency(k, F.Monolayer(0.0), SEA20)
    pressed = F.complex_frequency(k, F.Monolayer(0.0, film_pressure=0.03), SEA20)
    from shortwave.water import Liquid
    low = Liquid(density=SEA20.density, dynamic_viscosity=SEA20.dynamic_viscosity,
                 surface_tension=SEA20.surface_tension - 0.03)
    assert pressed.real < plain.real
    assert pressed == pytest.approx(F.complex_frequency(k, None, low), rel=1e-12)


# --- root tracking ----------------------------------------------------------------------

def test_fast_path_agrees_with_continuation_over_wide_ranges():
    rng = np.random.default_rng(7)
    n = 3000
    k = 10 ** rng.uniform(0, 4.3, n)
    film = F.Monolayer(10 ** rng.uniform(-5, 1, n),
                       np.where(rng.random(n) < 0.5, 0.0, 10 ** rng.uniform(-2, 3, n)),
                       np.where(rng.random(n) < 0.7, 0.0, 10 ** rng.uniform(-8, -3, n)))
    a = np.asarray(F.complex_frequency(k, film, SEA20))
    b = np.asarray(F.complex_frequency(k, film, SEA20, method="continuation"))
    assert np.all(np.abs(a - b) <= 1e-7 * np.abs(b.imag))
    om = np.asarray(angular_frequency(k, SEA20))
    a = np.asarray(F.complex_wavenumber(om, film, SEA20))
    b = np.asarray(F.complex_wavenumber(om, film, SEA20, method="continuation"))
    assert np.all(np.abs(a - b) <= 1e-7 * np.abs(b.imag))


def test_transverse_root_is_not_the_marangoni_root():
    # At the resonance both roots exist; Newton started at the longitudinal estimate
    # omega = (E k^2 / sqrt(mu rho))^(2/3) exp(-i pi/6) lands on the Marangoni root, which
    # satisfies Eq. (1) too but is strongly damped and far from the capillary-gravity wave.
    from scipy.optimize import newton
    k = 200.0
    e = float(F.resonance_elasticity(k, SEA20))
    om0 = float(angular_frequency(k, SEA20))
    mar0 = (e * k**2 / np.sqrt(SEA20.dynamic_viscosity * SEA20.density)) ** (2 / 3) \
        * np.exp(-1j * np.pi / 6)
    marangoni = newton(lambda w: _lucassen_d(k, w, e, SEA20), mar0, tol=1e-12, maxiter=100)
    assert abs(_lucassen_d(k, marangoni, e, SEA20)) < 1e-8 * abs(_lucassen_d(k, om0, 0, SEA20))
    assert -marangoni.imag > 0.3 * marangoni.real
    ours = F.complex_frequency(k, F.Monolayer(e), SEA20)
    assert abs(ours - om0) < 0.05 * om0
    assert abs(marangoni - om0) > F.TRACK_WINDOW * om0


def test_overdamped_layer_is_reported_not_returned():
    oil = F.film_preset("heavy-crude", thickness=1e-2)
    with pytest.raises(F.RootTrackingError, match="could not be followed"):
        F.complex_frequency(np.array([20.0, 1000.0]), oil, SEA20)
    with pytest.warns(RuntimeWarning, match="NaN returned"):
        out = F.complex_frequency(np.array([20.0, 1000.0]), oil, SEA20, on_failure="nan")
    assert np.isfinite(out[0]) and np.isnan(out[1])


def test_viscous_liquid_outside_weak_damping_is_reported():
    from shortwave.water import Liquid
    syrup = Liquid(density=1300.0, surface_tension=0.07, kinematic_viscosity=1e-3)
    with pytest.raises(F.RootTrackingError):
        F.damping_rate(5000.0, F.Monolayer(0.02), syrup)


def test_full_output_reports_iterations():
    root, info = F.complex_frequency(np.array([30.0, 300.0]), F.Monolayer(0.02), SEA20,
                                     full_output=True)
    assert info["iterations"].shape == (2,) and np.all(info["iterations"] >= 2)
    assert not np.any(info["failed"])


# --- broadcasting, NaN, bad input -------------------------------------------------------

def test_broadcasts_over_k_and_film_parameters():
    k = np.array([50.0, 100.0, 200.0])[:, None]
    film = F.Monolayer(np.array([0.005, 0.01, 0.02, 0.04]))
    y = F.damping_ratio(k, film, SEA20)
    assert y.shape == (3, 4)
    for i in range(3):
        for j in range(4):
            assert y[i, j] == pytest.approx(
                F.damping_ratio(float(k[i, 0]), F.Monolayer(float(film.elasticity[j])), SEA20),
                rel=1e-10)


def test_scalar_in_scalar_out_and_nan_propagates():
    assert isinstance(F.damping_ratio(100.0, F.Monolayer(0.02)), float)
    y = F.damping_ratio(np.array([100.0, np.nan]), F.Monolayer(0.02))
    assert np.isfinite(y[0]) and np.isnan(y[1])
    y = F.damping_ratio(100.0, F.Monolayer(np.array([0.02, np.nan])))
    assert np.isfinite(y[0]) and np.isnan(y[1])


@pytest.mark.parametrize("kwargs,match", [
    (dict(elasticity=-0.01), "elasticity: must be >= 0"),
    (dict(elasticity=0.01, relaxation_frequency=-1), "relaxation_frequency"),
    (dict(elasticity=0.01, dilational_viscosity=-1e-5), "dilational_viscosity"),
])
def test_monolayer_rejects_negative_values(kwargs, match):
    with pytest.raises(ShortwaveInputError, match=match):
        F.Monolayer(**kwargs)


@pytest.mark.parametrize("kwargs,match", [
    (dict(thickness=-1e-6, viscosity=0.01), "thickness: must be >= 0"),
    (dict(thickness=1e-6, viscosity=-0.01), "viscosity: must be > 0"),
    (dict(thickness=1e-6, viscosity=0.01, density=-900.0), "density"),
    (dict(thickness=1e-6, viscosity=0.01, interfacial_tension=0.0), "interfacial_tension"),
])
def test_oil_layer_rejects_bad_values(kwargs, match):
    with pytest.raises(ShortwaveInputError, match=match):
        F.OilLayer(**kwargs)


def test_unknown_preset_lists_names():
    with pytest.raises(ShortwaveInputError) as exc:
        F.film_preset("olive-oil")
    for name in F.PRESETS:
        assert name in str(exc.value)


def test_presets_are_labelled_and_in_range():
    for name, film in F.PRESETS.items():
        assert "typical" in film.source
        for field, (lo, hi) in film.ranges.items():
            assert lo <= getattr(film, field) <= hi, (name, field)
    assert F.film_preset("LIGHT_CRUDE", thickness=3e-6).thickness == 3e-6
    with pytest.raises(ShortwaveInputError):
        F.film_preset("natural", thickness=1e-6)       # not a field of a monolayer


def test_frequency_below_valid_range_is_an_error():
    with pytest.raises(ShortwaveInputError, match="frequency_hz: 0.1 Hz is below the valid"):
        F.damping_ratio_at_frequency(0.1, F.Monolayer(0.02))
    with pytest.raises(ShortwaveInputError, match="omega: .* is below the valid range"):
        F.complex_wavenumber(0.5, F.Monolayer(0.02))
    with pytest.raises(ShortwaveInputError, match="valid range for film damping"):
        F.damping_ratio(0.2, F.Monolayer(0.02))
    with pytest.raises(ShortwaveInputError, match="valid range for film damping"):
        F.damping_rate(5e4)


def test_other_bad_inputs():
    with pytest.raises(ShortwaveInputError, match="film_pressure"):
        F.damping_ratio(100.0, F.Monolayer(0.01, film_pressure=0.08))
    with pytest.raises(ShortwaveInputError, match="form"):
        F.damping_ratio(100.0, F.Monolayer(0.01), form="sideways")
    with pytest.raises(ShortwaveInputError, match="film"):
        F.damping_ratio(100.0, 42)
    with pytest.raises(ShortwaveInputError, match="film"):
        F.damping_ratio(100.0, None)
    with pytest.raises(ShortwaveInputError, match="on_failure"):
        F.damping_rate(100.0, on_failure="ignore")
    with pytest.raises(ShortwaveInputError, match="loss_angle"):
        F.relaxation_parameters(0.01, 50.0, 10.0)


def test_preset_name_accepted_as_film():
    assert F.damping_ratio(100.0, "natural") == pytest.approx(
        F.damping_ratio(100.0, F.PRESETS["natural"]), rel=1e-14)
    with warnings.catch_warnings():
        warnings.simplefilter("error")
        F.damping_ratio(np.geomspace(1, 2e4, 50), "mineral-oil")
