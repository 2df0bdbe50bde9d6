"""Sea-water properties against reference libraries, standards and published tables.

Printed published values (IAPWS check values, Korson et al. 1969, Millero 1974, EOS-80)
are rows of the validation table (shortwave/validation/water.py, run by
tests/test_validation_table.py).  Here: whole grids against the reference libraries gsw
(TEOS-10) and iapws (IAPWS 2008 viscosity, IAPWS R1-76 surface tension, IAPWS G14-19
sea-water surface tension), the EOS-80 standard, and the behaviour on bad input.
"""
import warnings

import numpy as np
import pytest

from shortwave._checks import ShortwaveInputError
from shortwave.water import (SEAWATER, Liquid, ValidityWarning, Water, as_liquid,
                             iapws2008_viscosity, iapws2014_surface_tension,
                             nayar2014_surface_tension, sharqawy2010_viscosity, teos10_density)

gsw = pytest.importorskip("gsw")

T_GRID = np.linspace(0.0, 30.0, 13)      # degC
S_GRID = np.linspace(0.0, 40.0, 11)      # g/kg
TT, SS = np.meshgrid(T_GRID, S_GRID, indexing="ij")


# ---------------------------------------------------------------- density (TEOS-10, EOS-80)

def test_density_is_gsw_rho_t_exact_at_sea_surface():
    # gsw 3.6 (TEOS-10): in-situ density at sea pressure 0 dbar; checks the call itself
    # (in-situ t, not CT; p in dbar, not Pa or absolute pressure)
    w = Water(TT, SS)
    np.testing.assert_allclose(w.density, gsw.rho_t_exact(SS, TT, 0.0), rtol=1e-13)


def test_density_agrees_with_gsw_75_term_polynomial():
    # gsw 3.6 rho(SA, CT, p): the 75-term polynomial of Roquet et al. (2015), an independent
    # expression of TEOS-10; its stated fit error is far below 1e-5 relative
    w = Water(TT, SS)
    ref = gsw.rho(SS, gsw.CT_from_t(SS, TT, 0.0), 0.0)
    np.testing.assert_allclose(w.density, ref, rtol=2e-6)


def _eos80_one_atmosphere(sp, t68):
    # Millero & Poisson (1981) Deep-Sea Res. 28A, 625, the EOS-80 one-atmosphere equation
    # (coefficients seen in several public transcriptions)
    rho_smow = (999.842594 + 6.793952e-2 * t68 - 9.095290e-3 * t68**2 + 1.001685e-4 * t68**3
                - 1.120083e-6 * t68**4 + 6.536332e-9 * t68**5)
    a = (8.24493e-1 - 4.0899e-3 * t68 + 7.6438e-5 * t68**2 - 8.2467e-7 * t68**3
         + 5.3875e-9 * t68**4)
    b = -5.72466e-3 + 1.0227e-4 * t68 - 1.6546e-6 * t68**2
    return rho_smow + a * sp + b * sp**1.5 + 4.8314e-4 * sp**2


def test_density_agrees_with_eos80_over_the_ocean_range():
    # TEOS-10 replaced EOS-80; with t68 = 1.00024 t90 and S_A = 35.16504/35 S_P the two
    # agree within the EOS-80 standard error of 3.6e-3 kg m-3 (Millero & Poisson 1981);
    # largest difference seen on this grid: 5.5e-3 kg m-3
    sa = gsw.SR_from_SP(SS)
    w = Water(TT, sa)
    np.testing.assert_allclose(w.density, _eos80_one_atmosphere(SS, 1.00024 * TT), atol=0.01)


@pytest.mark.parametrize("t, s, rho", [(20.0, 35.0, 1024.6402), (10.0, 35.0, 1026.8259),
                                       (0.0, 35.0, 1027.9745), (20.0, 0.0, 998.2077)])
def test_density_films_note_table(t, s, rho):
    # gsw 3.6.23 values printed to 8 digits in the films research note, Sec. 5.1 (which
    # used rho(SA, CT_from_t(...), 0)); 75-term vs exact differ by < 2e-6
    assert Water(t, s).density == pytest.approx(rho, rel=2e-6)


def test_teos10_density_helper_matches_water():
    assert teos10_density(12.0, 33.0) == pytest.approx(Water(12.0, 33.0).density, rel=1e-15)


# ---------------------------------------------------------------- viscosity (IAPWS 2008, Sharqawy)

iapws = pytest.importorskip("iapws")


def test_iapws2008_viscosity_matches_iapws_library_on_grid():
    # iapws 1.5.5 _Viscosity(rho, T): IAPWS 2008 without the critical enhancement
    from iapws._iapws import _Viscosity
    t = np.linspace(-5.0, 95.0, 21)
    rho = np.asarray(teos10_density(np.clip(t, -2, 40), 0.0))   # any liquid density will do
    ours = iapws2008_viscosity(t, rho)
    ref = np.array([_Viscosity(r, ti + 273.15) for r, ti in zip(rho, t)])
    np.testing.assert_allclose(ours, ref, rtol=1e-12)


@pytest.mark.parametrize("t", [0.0, 10.0, 20.0, 25.0, 30.0, 40.0])
def test_fresh_water_viscosity_matches_iapws2008_with_iapws95_density(t):
    # Water(t, 0) uses the TEOS-10 density of pure water; IAPWS 2008 is defined with the
    # IAPWS-95 density at 0.101325 MPa (iapws 1.5.5); the densities differ by < 1e-6
    from iapws._iapws import _Viscosity
    from iapws.iapws95 import IAPWS95
    rho = IAPWS95(T=t + 273.15, P=0.101325).rho
    assert Water(t, 0.0).dynamic_viscosity == pytest.approx(_Viscosity(rho, t + 273.15),
                                                            rel=1e-6)


def test_sharqawy_pure_water_fit_reproduces_iapws2008():
    # Sharqawy et al. (2010) Eq. 23 is their fit to IAPWS 2008 (iapws library values):
    # agreement better than 0.05 % over 0-40 degC
    from iapws._iapws import _Viscosity
    from iapws.iapws95 import IAPWS95
    for t in (0.0, 10.0, 20.0, 30.0, 40.0):
        rho = IAPWS95(T=t + 273.15, P=0.101325).rho
        assert sharqawy2010_viscosity(t, 0.0) == pytest.approx(_Viscosity(rho, t + 273.15),
                                                               rel=5e-4)


@pytest.mark.parametrize("t, mu_mpas", [(0.0, 1.90556), (10.0, 1.39677), (20.0, 1.07663),
                                        (25.0, 0.95883), (30.0, 0.86065)])
def test_sharqawy_sea_water_films_note_table(t, mu_mpas):
    # independent re-computation of Sharqawy et al. (2010) Eqs. 22-23 at S = 35 g/kg
    # (films research note, Sec. 5.4; printed to 6 digits)
    assert sharqawy2010_viscosity(t, 35.0) * 1e3 == pytest.approx(mu_mpas, rel=5e-6)


def test_sea_water_viscosity_uses_iapws_pure_water_times_sharqawy_factor():
    from iapws._iapws import _Viscosity
    w = Water(TT, SS)
    mu_w = np.vectorize(lambda t: _Viscosity(float(teos10_density(t, 0.0)), t + 273.15))(TT)
    s = SS / 1000.0
    a = 1.541 + 1.998e-2 * TT - 9.52e-5 * TT**2     # Sharqawy et al. (2010) Eq. 22
    b = 7.974 - 7.561e-2 * TT + 4.724e-4 * TT**2
    np.testing.assert_allclose(w.dynamic_viscosity, mu_w * (1 + a * s + b * s**2), rtol=1e-12)
    np.testing.assert_allclose(w.kinematic_viscosity, w.dynamic_viscosity / w.density,
                               rtol=1e-15)


def test_salt_raises_viscosity_and_cold_raises_viscosity():
    w = Water(TT, SS)
    assert np.all(np.diff(w.dynamic_viscosity, axis=1) > 0)   # with salinity
    assert np.all(np.diff(w.dynamic_viscosity, axis=0) < 0)   # with temperature


# ---------------------------------------------------------------- surface tension

def test_surface_tension_matches_iapws_tension_on_grid():
    # iapws 1.5.5 _Tension(T): IAPWS R1-76(2014), valid 248.15 K (extrapolated) to Tc
    from iapws._iapws import _Tension
    t = np.linspace(-24.9, 370.0, 80)
    ref = np.array([_Tension(ti + 273.15) for ti in t])
    np.testing.assert_allclose(iapws2014_surface_tension(t), ref, rtol=1e-12)


def test_sea_water_surface_tension_matches_iapws_g14_19():
    # iapws 1.5.5 _Tension_SeaWater(T, S[kg/kg]): IAPWS G14-19 = Nayar et al. (2014) Eq. 6
    from iapws.iapws08 import _Tension_SeaWater
    t = np.linspace(2.0, 90.0, 12)
    s = np.linspace(0.0, 130.0, 14)
    tt, ss = np.meshgrid(t, s, indexing="ij")
    ref = np.vectorize(lambda a, b: _Tension_SeaWater(a + 273.15, b / 1000.0))(tt, ss)
    np.testing.assert_allclose(nayar2014_surface_tension(tt, ss), ref, rtol=1e-12)


def test_water_surface_tension_is_nayar_on_iapws():
    w = Water(TT, SS)
    np.testing.assert_allclose(w.surface_tension, nayar2014_surface_tension(TT, SS), rtol=0)
    np.testing.assert_allclose(Water(TT, 0.0).surface_tension,
                               iapws2014_surface_tension(TT), rtol=0)


# ---------------------------------------------------------------- validity and bad input

@pytest.mark.parametrize("kwargs, text", [({"temperature_c": 41.0}, "[-2, 40]"),
                                          ({"temperature_c": -5.0}, "[-2, 40]"),
                                          ({"salinity": 45.0}, "[0, 42]")])
def test_mildly_out_of_range_warns_naming_the_range(kwargs, text):
    with pytest.warns(ValidityWarning, match=text.replace("[", r"\[").replace("]", r"\]")):
        w = Water(**kwargs)
    assert np.isfinite(w.density) and np.isfinite(w.kinematic_viscosity)


@pytest.mark.parametrize("kwargs, name", [({"temperature_c": 150.0}, "temperature_c"),
                                          ({"temperature_c": -30.0}, "temperature_c"),
                                          ({"salinity": 200.0}, "salinity"),
                                          ({"salinity": -1.0}, "salinity"),
                                          ({"temperature_c": "warm"}, "temperature_c"),
                                          ({"salinity": None}, "salinity"),
                                          ({"temperature_c": np.inf}, "temperature_c")])
def test_far_out_of_range_or_not_a_number_is_an_error(kwargs, name):
    with pytest.raises(ShortwaveInputError, match=name):
        Water(**kwargs)


def test_in_range_gives_no_warning():
    with warnings.catch_warnings():
        warnings.simplefilter("error")
        Water(TT, SS)


def test_nan_propagates():
    w = Water(np.array([10.0, np.nan]), 35.0)
    assert np.isfinite(w.density[0]) and np.isnan(w.density[1])
    assert np.isnan(w.surface_tension[1]) and np.isnan(w.kinematic_viscosity[1])


# ---------------------------------------------------------------- overrides, Liquid, arrays

def test_overrides_replace_the_correlations():
    w = Water(20.0, 35.0, density=1000.0, surface_tension=0.05, kinematic_viscosity=2e-6)
    assert (w.density, w.surface_tension, w.kinematic_viscosity) == (1000.0, 0.05, 2e-6)
    assert w.dynamic_viscosity == pytest.approx(2e-3, rel=1e-15)
    w2 = Water(20.0, 35.0, dynamic_viscosity=1.5e-3)
    assert w2.kinematic_viscosity == pytest.approx(1.5e-3 / w2.density, rel=1e-15)


def test_density_override_keeps_dynamic_viscosity_of_the_correlation():
    base = Water(20.0, 35.0)
    w = Water(20.0, 35.0, density=900.0)
    assert w.dynamic_viscosity == pytest.approx(base.dynamic_viscosity, rel=1e-15)
    assert w.kinematic_viscosity == pytest.approx(base.dynamic_viscosity / 900.0, rel=1e-15)


@pytest.mark.parametrize("kwargs", [{"density": -1.0}, {"surface_tension": 0.0},
                                    {"kinematic_viscosity": -1e-6},
                                    {"kinematic_viscosity": 1e-6, "dynamic_viscosity": 1e-3},
                                    {"density": "heavy"}])
def test_bad_overrides_are_errors(kwargs):
    with pytest.raises(ShortwaveInputError):
        Water(20.0, 35.0, **kwargs)


def test_liquid():
    oil = Liquid(density=870.0, surface_tension=0.030, kinematic_viscosity=1e-5, name="oil")
    assert oil.dynamic_viscosity == pytest.approx(8.7e-3, rel=1e-15)
    oil2 = Liquid(870.0, 0.030, dynamic_viscosity=8.7e-3)
    assert oil2.kinematic_viscosity == pytest.approx(1e-5, rel=1e-15)
    with pytest.raises(ShortwaveInputError):
        Liquid(870.0, 0.030)                                # no viscosity
    with pytest.raises(ShortwaveInputError):
        Liquid(np.nan, 0.030, kinematic_viscosity=1e-5)     # NaN refused for a description
    with pytest.raises(ShortwaveInputError, match="permittivity"):
        oil.permittivity(5.3e9)


def test_as_liquid():
    assert as_liquid(None) is SEAWATER
    w = Water(10.0, 30.0)
    assert as_liquid(w) is w
    with pytest.raises(ShortwaveInputError, match="water"):
        as_liquid("sea water")


def test_arrays_broadcast_and_scalars_stay_scalars():
    w = Water(np.array([[0.0], [10.0], [20.0]]), np.array([0.0, 35.0]))
    for name in ("density", "surface_tension", "kinematic_viscosity", "dynamic_viscosity"):
        assert np.shape(getattr(w, name)) == (3, 2)
    s = Water(20.0, 35.0)
    for name in ("density", "surface_tension", "kinematic_viscosity", "dynamic_viscosity"):
        assert isinstance(getattr(s, name), float)


def test_water_permittivity_delegates_with_practical_salinity():
    # Water holds Absolute Salinity; both permittivity models take practical salinity:
    # S_P = S_A * 35 / 35.16504 (IOC et al. 2010, TEOS-10 manual Eq. 2.4.1).
    from shortwave.permittivity import permittivity
    sp = 35.0 * 35.0 / 35.16504
    w = Water(20.0, 35.0)
    assert w.permittivity(5.3e9) == permittivity(5.3e9, 20.0, sp)
    assert (w.permittivity(1.4e9, model="klein_swift1977")
            == permittivity(1.4e9, 20.0, sp, model="klein_swift1977"))
