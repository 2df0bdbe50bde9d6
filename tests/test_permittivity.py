"""Sea-water microwave permittivity: check tables, reference values, limits, bad input.

Published anchors (Culkin & Smith 1980 conductivity, Malmberg & Maryott 1956 static
permittivity) are rows of the validation table (shortwave/validation/permittivity.py).
Here: the full check tables, the IAPWS R8-97 static dielectric constant (iapws library),
limits of the Debye forms, the sign convention and the behaviour on bad input.

The check tables are from the radar research note, Sec. 5.4 and 6: independent
re-computations of Meissner & Wentz (2004) eqs. (5)-(17) / Table III and Klein & Swift
(1977) eqs. (9), (13)-(21), printed to 2 decimals.  They are regression checks (they
catch a wrong digit or equation), not measurements.
"""
import warnings

import numpy as np
import pytest

from shortwave._checks import ShortwaveInputError
from shortwave.permittivity import (EPSILON_0, MODELS, fresnel_reflectivity_nadir,
                                    ionic_conductivity, klein_swift1977, meissner_wentz2004,
                                    permittivity, relaxation_parameters)
from shortwave.water import ValidityWarning, Water

# The tables appear to have been rounded twice (66.2248 -> 66.225 -> 66.23; the radar note
# prints 66.225 elsewhere), so a value can sit up to 0.0055 from the printed number; a
# wrong digit or coefficient moves it much further.
TOL = 0.006

# (GHz, M&W eps', M&W eps'', K&S eps', K&S eps''), sea water 20 degC, 35 ppt
SEA_20_35 = [
    (1.4, 71.40, 66.70, 72.04, 66.85),
    (1.413, 71.39, 66.19, 72.04, 66.33),
    (5.3, 66.42, 34.41, 66.80, 34.98),
    (5.405, 66.23, 34.39, 66.59, 34.97),
    (9.65, 56.78, 36.78, 56.73, 37.49),
    (10.0, 55.94, 37.00, 55.85, 37.71),
    (13.6, 47.41, 38.45, 47.04, 39.07),
    (35.0, 19.06, 29.63, 18.42, 29.49),
    (37.0, 17.88, 28.62, 17.26, 28.45),
]
# pure water 20 degC
PURE_20 = [
    (1.4, 79.70, 6.18, 79.63, 6.10),
    (5.3, 73.45, 21.42, 73.57, 21.21),
    (10.0, 60.68, 32.79, 61.05, 32.73),
    (13.6, 50.67, 36.47, 51.10, 36.62),
    (35.0, 19.70, 29.18, 19.48, 29.73),
]
# 5.3 GHz, (T, S, M&W eps', eps'', K&S eps', eps'')
T_S_53 = [
    (0.0, 35.0, 61.32, 40.49, 60.05, 41.17),
    (10.0, 35.0, 65.51, 36.66, 65.53, 37.68),
    (29.0, 35.0, 65.74, 33.82, 66.31, 34.23),
    (20.0, 30.0, 67.33, 32.76, 67.71, 33.24),
    (20.0, 40.0, 65.54, 36.02, 65.85, 36.68),
]


def _ks(f, t, s):
    with warnings.catch_warnings():
        warnings.simplefilter("ignore", ValidityWarning)   # tables go beyond 10 GHz
        return klein_swift1977(f, t, s)


@pytest.mark.parametrize("ghz, mw_r, mw_i, ks_r, ks_i", SEA_20_35)
def test_sea_water_table(ghz, mw_r, mw_i, ks_r, ks_i):
    mw = meissner_wentz2004(ghz * 1e9, 20.0, 35.0)
    ks = _ks(ghz * 1e9, 20.0, 35.0)
    assert (mw.real, -mw.imag) == (pytest.approx(mw_r, abs=TOL), pytest.approx(mw_i, abs=TOL))
    assert (ks.real, -ks.imag) == (pytest.approx(ks_r, abs=TOL), pytest.approx(ks_i, abs=TOL))


@pytest.mark.parametrize("ghz, mw_r, mw_i, ks_r, ks_i", PURE_20)
def test_pure_water_table(ghz, mw_r, mw_i, ks_r, ks_i):
    mw = meissner_wentz2004(ghz * 1e9, 20.0, 0.0)
    ks = _ks(ghz * 1e9, 20.0, 0.0)
    assert (mw.real, -mw.imag) == (pytest.approx(mw_r, abs=TOL), pytest.approx(mw_i, abs=TOL))
    assert (ks.real, -ks.imag) == (pytest.approx(ks_r, abs=TOL), pytest.approx(ks_i, abs=TOL))


@pytest.mark.parametrize("t, s, mw_r, mw_i, ks_r, ks_i", T_S_53)
def test_temperature_salinity_table(t, s, mw_r, mw_i, ks_r, ks_i):
    mw = meissner_wentz2004(5.3e9, t, s)
    ks = klein_swift1977(5.3e9, t, s)
    assert (mw.real, -mw.imag) == (pytest.approx(mw_r, abs=TOL), pytest.approx(mw_i, abs=TOL))
    assert (ks.real, -ks.imag) == (pytest.approx(ks_r, abs=TOL), pytest.approx(ks_i, abs=TOL))


def test_intermediate_parameters():
    # radar note Sec. 5.4/5.2, re-computation; printed to 5 significant digits
    p = relaxation_parameters(20.0, 35.0)
    assert p["eps_s"] == pytest.approx(71.803, abs=5e-4)
    assert p["eps_1"] == pytest.approx(5.4931, abs=5e-5)
    assert p["eps_inf"] == pytest.approx(4.3547, abs=5e-5)
    assert p["nu_1_hz"] == pytest.approx(17.840e9, abs=5e5)
    assert p["nu_2_hz"] == pytest.approx(105.80e9, abs=5e6)
    assert p["conductivity"] == pytest.approx(4.7913, abs=5e-5)
    q = relaxation_parameters(20.0, 35.0, model="klein_swift1977")
    assert q["eps_s"] == pytest.approx(72.474, abs=5e-4)
    assert q["tau_s"] == pytest.approx(9.0916e-12, abs=5e-16)
    assert q["conductivity"] == pytest.approx(4.7883, abs=5e-5)
    assert q["eps_inf"] == 4.9


@pytest.mark.parametrize("model, values", [
    ("meissner_wentz2004", [(1.4, 0.6859), (5.3, 0.6371), (9.65, 0.6263), (13.6, 0.6163),
                            (35.0, 0.5533)]),
    ("klein_swift1977", [(1.4, 0.6865), (5.3, 0.6384), (9.65, 0.6275), (13.6, 0.6172),
                         (35.0, 0.5524)])])
def test_nadir_reflectivity_table(model, values):
    # radar note Sec. 6, re-computation: |R(0)|^2 of sea water at 20 degC, 35 ppt
    for ghz, ref in values:
        with warnings.catch_warnings():
            warnings.simplefilter("ignore", ValidityWarning)
            r = fresnel_reflectivity_nadir(permittivity(ghz * 1e9, 20.0, 35.0, model=model))
        assert r == pytest.approx(ref, abs=5.1e-5)


# ---------------------------------------------------------------- published anchors

def test_static_permittivity_of_pure_water_against_iapws_r8_97():
    # iapws 1.5.5 _Dielectric: IAPWS R8-97 static dielectric constant, with the IAPWS-95
    # density at 0.101325 MPa.  M&W use the Stogryn et al. (1995) fit: agreement < 0.02
    pytest.importorskip("iapws")
    from iapws._iapws import _Dielectric
    from iapws.iapws95 import IAPWS95
    t = np.arange(0.0, 41.0, 5.0)
    ref = np.array([_Dielectric(IAPWS95(T=ti + 273.15, P=0.101325).rho, ti + 273.15)
                    for ti in t])
    np.testing.assert_allclose(relaxation_parameters(t, 0.0)["eps_s"], ref, atol=0.03)


def test_static_permittivity_against_malmberg_maryott_1956():
    # Malmberg & Maryott (1956) J. Res. NBS 56, 1: eps = 87.740 - 0.40008 t + 9.398e-4 t^2
    # - 1.410e-6 t^3 (bridge data, 0.1 %; equation verified in a public copy of the paper).
    # M&W within 0.2 over 0-40 degC; K&S (fitted to older data) within 0.7 over 0-30 degC
    t = np.arange(0.0, 41.0, 2.0)
    mm = 87.740 - 0.40008 * t + 9.398e-4 * t**2 - 1.410e-6 * t**3
    np.testing.assert_allclose(relaxation_parameters(t, 0.0)["eps_s"], mm, atol=0.2)
    t30 = t[t <= 30]
    np.testing.assert_allclose(relaxation_parameters(t30, 0.0, "klein_swift1977")["eps_s"],
                               mm[t <= 30], atol=0.7)


def test_conductivity_of_standard_sea_water():
    # Culkin & Smith (1980): 4.2914 S/m at 15 degC, S = 35 (also a validation-table row)
    assert ionic_conductivity(15.0, 35.0) == pytest.approx(4.2914, rel=2e-5)
    assert ionic_conductivity(15.0, 0.0) == 0.0


def test_models_agree_below_x_band():
    # both models describe the same water: below 10 GHz, over 0-29 degC and 30-40 ppt they
    # differ by at most 3.4 % in |eps| (largest at the cold, salty, 10 GHz corner) and by
    # less than 0.003 in nadir reflectivity
    f = np.array([1.0, 1.4, 3.0, 5.3, 7.0, 9.99])[:, None, None] * 1e9
    t, s = np.meshgrid(np.arange(0.0, 30.0), np.arange(30.0, 41.0))
    mw = meissner_wentz2004(f, t, s)
    ks = klein_swift1977(f, t, s)
    assert np.max(np.abs(mw - ks) / np.abs(mw)) < 0.04
    assert np.max(np.abs(fresnel_reflectivity_nadir(mw) - fresnel_reflectivity_nadir(ks))) < 0.003


# ---------------------------------------------------------------- limits and convention

@pytest.mark.parametrize("model", MODELS)
def test_sign_convention_on_a_grid(model):
    f = np.geomspace(0.5e9, 10e9, 7)[:, None, None]
    t, s = np.meshgrid(np.arange(0.0, 30.0, 3.0), np.arange(0.0, 41.0, 5.0))
    eps = permittivity(f, t, s, model=model)
    assert eps.shape == (7,) + t.shape
    assert np.all(eps.imag < 0) and np.all(eps.real > 1)


@pytest.mark.parametrize("model", MODELS)
def test_low_frequency_limits(model):
    # Debye forms: pure water -> static permittivity; sea water -> conduction dominates,
    # -Im eps -> sigma / (omega eps0)
    with pytest.warns(ValidityWarning):
        eps0 = permittivity(1e6, 20.0, 0.0, model=model)
    assert eps0.real == pytest.approx(relaxation_parameters(20.0, 0.0, model)["eps_s"], rel=1e-6)
    with pytest.warns(ValidityWarning):
        eps = permittivity(1e6, 20.0, 35.0, model=model)
    sigma = ionic_conductivity(20.0, 35.0, model)
    assert -eps.imag * 2 * np.pi * 1e6 * EPSILON_0 == pytest.approx(sigma, rel=1e-4)


def test_high_frequency_limit_mw():
    with pytest.warns(ValidityWarning):
        eps = meissner_wentz2004(1e15, 20.0, 0.0)
    assert eps.real == pytest.approx(relaxation_parameters(20.0, 0.0)["eps_inf"], rel=1e-6)


def test_permittivity_decreases_with_frequency():
    f = np.geomspace(0.5e9, 40e9, 50)
    eps = meissner_wentz2004(f, 15.0, 35.0)
    assert np.all(np.diff(eps.real) < 0)


def test_fresnel_reflectivity():
    assert fresnel_reflectivity_nadir(1.0) == 0.0
    eps = meissner_wentz2004(5.3e9, 20.0, 35.0)
    assert fresnel_reflectivity_nadir(np.conj(eps)) == pytest.approx(
        fresnel_reflectivity_nadir(eps), rel=1e-15)             # convention-free
    assert fresnel_reflectivity_nadir(4.0) == pytest.approx(1.0 / 9.0, rel=1e-15)
    assert fresnel_reflectivity_nadir(1e12 - 1e12j) == pytest.approx(1.0, abs=1e-5)
    r = fresnel_reflectivity_nadir(np.array([1.0, 80.0 - 30j, np.nan]))
    assert r.shape == (3,) and np.isnan(r[2]) and 0 < r[1] < 1
    for bad in ("sea", None, np.inf):
        with pytest.raises(ShortwaveInputError, match="eps"):
            fresnel_reflectivity_nadir(bad)


# ---------------------------------------------------------------- API behaviour

def test_dispatcher_and_models():
    assert MODELS == ("meissner_wentz2004", "klein_swift1977")
    assert permittivity(5.3e9, 20.0, 35.0) == meissner_wentz2004(5.3e9, 20.0, 35.0)
    assert (permittivity(5.3e9, 20.0, 35.0, model="Klein_Swift1977")
            == klein_swift1977(5.3e9, 20.0, 35.0))
    with pytest.raises(ShortwaveInputError, match="meissner_wentz2004, klein_swift1977"):
        permittivity(5.3e9, 20.0, 35.0, model="debye")


def test_scalars_in_scalar_out_and_broadcasting():
    e = permittivity(5.3e9, 20.0, 35.0)
    assert np.ndim(e) == 0 and isinstance(complex(e), complex)
    e = permittivity(np.array([1.4e9, 5.3e9, 9.65e9])[:, None], np.array([5.0, 15.0]), 35.0)
    assert e.shape == (3, 2)
    w = Water(np.array([5.0, 15.0]), 35.0)
    np.testing.assert_array_equal(w.permittivity(5.3e9),
                                  permittivity(5.3e9, [5.0, 15.0], 35.0 * 35.0 / 35.16504))


def test_nan_propagates():
    e = permittivity(np.array([5.3e9, np.nan]), 20.0, 35.0)
    assert np.isfinite(e[0]) and np.isnan(e[1])
    assert np.isnan(permittivity(5.3e9, np.nan, 35.0))
    assert np.isnan(permittivity(5.3e9, 20.0, np.nan, model="klein_swift1977"))


@pytest.mark.parametrize("f", [0.0, -5.3e9, np.inf, "C", None])
def test_bad_frequency(f):
    with pytest.raises(ShortwaveInputError, match="frequency_hz"):
        permittivity(f, 20.0, 35.0)


@pytest.mark.parametrize("kwargs, name", [({"temperature_c": 70.0}, "temperature_c"),
                                          ({"temperature_c": -40.0}, "temperature_c"),
                                          ({"salinity": 80.0}, "salinity"),
                                          ({"salinity": -1.0}, "salinity"),
                                          ({"salinity": "salty"}, "salinity")])
def test_far_out_of_range_is_an_error(kwargs, name):
    args = {"temperature_c": 20.0, "salinity": 35.0, **kwargs}
    with pytest.raises(ShortwaveInputError, match=name):
        permittivity(5.3e9, **args)


@pytest.mark.parametrize("model, f, t, s, text", [
    ("meissner_wentz2004", 50e9, 20.0, 35.0, "[0.5, 40] GHz"),
    ("meissner_wentz2004", 0.3e9, 20.0, 35.0, "[0.5, 40] GHz"),
    ("meissner_wentz2004", 5.3e9, 33.0, 35.0, "[-2, 29] degC"),
    ("meissner_wentz2004", 5.3e9, -10.0, 35.0, "[-2, 29] degC"),
    ("meissner_wentz2004", 5.3e9, 20.0, 45.0, "[0, 40] ppt"),
    ("klein_swift1977", 13.6e9, 20.0, 35.0, "[0.5, 10] GHz"),
    ("klein_swift1977", 5.3e9, 35.0, 35.0, "[0, 30] degC"),
])
def test_mildly_out_of_range_warns_naming_the_range(model, f, t, s, text):
    with pytest.warns(ValidityWarning) as rec:
        eps = permittivity(f, t, s, model=model)
    assert any(text in str(w.message) and model in str(w.message) for w in rec)
    assert np.isfinite(eps)


def test_pure_water_has_the_wider_temperature_range():
    with warnings.catch_warnings():
        warnings.simplefilter("error")
        meissner_wentz2004(5.3e9, np.array([-15.0, 35.0]), 0.0)      # pure water: -20..40
        meissner_wentz2004(np.geomspace(0.5e9, 40e9, 5), 15.0, 35.0)
