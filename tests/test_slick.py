"""Slick contrast: A&H89, the bounded wind-input/dissipation balance, the damped spectrum.

Checks against observations are qualitative (films.md Sec. 4.4 and 8.4 give the sources);
the regression table is an independent re-computation of the balance model.
"""
import csv
import os
import warnings

import numpy as np
import pytest

from shortwave import films as F
from shortwave import slick as S
from shortwave._checks import ShortwaveInputError
from shortwave.water import ValidityWarning, Water

REF = os.path.join(os.path.dirname(__file__), "reference")
SEA20 = Water(20.0, 35.0)
SEA15 = Water(15.0, 35.0)
BANDS_HZ = {"L": 1.26e9, "S": 3.2e9, "C": 5.405e9, "X": 9.65e9, "Ku": 13.575e9}


def _rows(name):
    with open(os.path.join(REF, name)) as fh:
        return list(csv.DictReader(line for line in fh if not line.startswith("#")))


# --- A&H89 and the balance model -------------------------------------------------------

def test_ah89_is_the_damping_ratio_at_the_bragg_wavenumber():
    from shortwave.radar import bragg_wavenumber
    film = F.film_preset("natural")
    kb = bragg_wavenumber(9.65e9, 35.0)
    c = S.contrast("natural", 9.65e9, 35.0, model="alpers_huhnerfuss1989", water=SEA15)
    assert c == pytest.approx(F.damping_ratio(kb, film, SEA15), rel=1e-12)
    assert S.contrast_db("natural", 9.65e9, 35.0, model="alpers_huhnerfuss1989",
                         water=SEA15) == pytest.approx(10 * np.log10(c), rel=1e-12)
    assert S.contrast("natural", bragg_wavenumber=kb, model="alpers_huhnerfuss1989",
                      water=SEA15) == pytest.approx(c, rel=1e-12)


@pytest.mark.parametrize("row", _rows("balance_contrast_recomputed.csv"),
                         ids=lambda r: f"{r['band']}-{r['wind_speed']}")
def test_balance_table(row):
    film = F.Monolayer(0.025, 1.0)
    kb, u = float(row["bragg_wavenumber"]), float(row["wind_speed"])
    ah = 10 * np.log10(S.alpers_huhnerfuss1989(kb, film, SEA20))
    assert ah == pytest.approx(float(row["ah89_db"]), abs=0.01)
    k_lin, bound = S.balance_contrast(kb, u, film, SEA20, return_bound=True)
    got = 10 * np.log10(k_lin)
    if row["balance_db"] == "n/a" or float(row["balance_db"]) > ah:
        assert bound and got == pytest.approx(ah, abs=1e-12)      # the documented bound
    else:
        assert not bound
        assert got == pytest.approx(float(row["balance_db"]), abs=0.05)


def test_balance_bound_is_continuous_and_contrast_falls_with_wind():
    # published observations (films.md Sec. 4.4; Gade et al. 1998): contrast falls with wind
    u = np.linspace(1.0, 16.0, 3001)
    for name in ("oleyl-alcohol", "natural", "mineral-oil"):
        for f in BANDS_HZ.values():
            c = np.asarray(S.contrast_db(name, f, 30.0, u, water=SEA15))
            assert np.all(np.diff(c) <= 1e-12), (name, f)
            # no jump where the bound ends: steps shrink with the 0.005 m/s grid
            assert np.max(np.abs(np.diff(c))) < 0.15
    k_lin, bound = S.balance_contrast(202.25, u, "natural", SEA15, return_bound=True)
    assert bound[0] and not bound[-1]
    assert k_lin[-1] == pytest.approx(1.0, abs=0.15)         # strong wind: little contrast


def test_balance_bound_matches_analytic_crossing():
    # n = 1, r = 1: the bound takes over exactly where beta = 2 (1 + y) Gamma_clean
    from shortwave.slick import wind_growth_rate
    kb, film = 202.25, F.Monolayer(0.025, 1.0)
    g_c = F.damping_rate(kb, None, SEA20)
    y = F.damping_ratio(kb, film, SEA20)
    u = np.linspace(3.0, 12.0, 2001)
    beta = np.asarray(wind_growth_rate(kb, u, water=SEA20))
    _, bound = S.balance_contrast(kb, u, film, SEA20, return_bound=True)
    assert np.array_equal(bound, beta <= 2 * (1 + y) * g_c)


@pytest.mark.parametrize("n", [2.0, 3.0])
@pytest.mark.parametrize("r", [1.0, 0.8])
def test_balance_bound_is_the_ah89_ratio_for_any_exponent(n, r):
    # Where wind input no longer sustains the waves in the slick, the bound is the
    # A&H89 equilibrium (damping balanced by a supply independent of the spectrum): the
    # ratio y itself, whatever the saturation exponent n (Alpers & Huehnerfuss 1989;
    # films.md Sec. 4.2-4.3), times the wind-input reduction r^(-2/n).  A bound of
    # y^(1/n) (2.17 instead of 10.19 at X band for n = 3) contradicts the documented model.
    from shortwave.slick import wind_growth_rate
    kb, film = 202.25, F.Monolayer(0.025, 1.0)
    y = F.damping_ratio(kb, film, SEA20)
    k_lin, bound = S.balance_contrast(kb, 2.0, film, SEA20, exponent=n, friction_ratio=r,
                                      return_bound=True)
    assert bound and k_lin == pytest.approx(y * r ** (-2.0 / n), rel=1e-12)
    # away from the bound: films.md Sec. 4.3 Eq. (2) with the energy rates beta and 2 Gamma
    u = 12.0
    g_c, g_f = F.damping_rate(kb, None, SEA20), F.damping_rate(kb, film, SEA20)
    beta = wind_growth_rate(kb, u, water=SEA20)
    k_lin, bound = S.balance_contrast(kb, u, film, SEA20, exponent=n, friction_ratio=r,
                                      return_bound=True)
    assert not bound
    assert k_lin == pytest.approx(((beta - 2 * g_c) / (r * r * beta - 2 * g_f)) ** (1 / n),
                                  rel=1e-12)


def test_balance_bound_is_continuous_for_exponent_three():
    # the bound is reached continuously also for n = 3 (steeply: fine wind grid)
    u = np.linspace(6.5, 6.7, 2001)
    c = 10 * np.log10(np.asarray(S.balance_contrast(202.25, u, F.Monolayer(0.025, 1.0),
                                                    SEA20, exponent=3.0)))
    assert np.all(np.diff(c) <= 1e-12)
    assert np.max(np.abs(np.diff(c))) < 0.15
    assert c[0] == pytest.approx(10 * np.log10(F.damping_ratio(202.25, F.Monolayer(0.025, 1.0),
                                                               SEA20)), abs=1e-9)


def test_wind_input_reduction_and_exponent():
    k1 = S.balance_contrast(113.0, 12.0, "natural", SEA15)
    k08 = S.balance_contrast(113.0, 12.0, "natural", SEA15, friction_ratio=0.8)
    k3 = S.balance_contrast(113.0, 12.0, "natural", SEA15, exponent=3.0)
    assert k08 > k1 > k3 > 1.0
    # strong wind, no film damping left: K -> r^(-2/n)
    clean_like = F.Monolayer(1e-7)
    assert S.balance_contrast(113.0, 25.0, clean_like, SEA15, friction_ratio=0.8) == \
        pytest.approx(1 / 0.64, rel=0.02)


def test_plant_growth_rate():
    # Plant (1982): beta = 0.04 (u*/c)^2 omega cos(phi); u* from Wu (1982)
    from shortwave.dispersion import angular_frequency, phase_speed
    u, k = 8.0, 150.0
    ustar = u * np.sqrt((0.8 + 0.065 * u) * 1e-3)
    expect = 0.04 * (ustar / phase_speed(k, SEA15)) ** 2 * angular_frequency(k, SEA15)
    assert S.wind_growth_rate(k, u, water=SEA15) == pytest.approx(expect, rel=1e-12)
    assert S.wind_growth_rate(k, u, 60.0, water=SEA15) == pytest.approx(expect / 2, rel=1e-12)
    assert S.wind_growth_rate(k, u, 90.0, water=SEA15) == pytest.approx(0.0, abs=1e-15)


# --- qualitative checks against published observations ---------------------------------

@pytest.mark.parametrize("name", ["natural", "mineral-oil"])
@pytest.mark.parametrize("model", ["alpers_huhnerfuss1989", "balance"])
def test_contrast_grows_with_bragg_wavenumber_at_low_wind(name, model):
    # Gade, Alpers, Huehnerfuss et al. (1998, JGR 103(C9) 18851; films.md Sec. 8.4 row 4):
    # over biogenic and quasi-biogenic films at low-to-moderate wind the damping ratio rises
    # monotonically with k_B from L to C to X band.  (Presets of the oleyl-alcohol and
    # methyl-palmitate type peak near C band instead: the Marangoni maximum that these
    # observations did not show.)
    for u in (2.0, 3.0):
        c = [float(S.contrast_db(name, BANDS_HZ[b], 30.0, u, model=model, water=SEA15))
             for b in ("L", "C", "X")]
        assert c[0] < c[1] < c[2]


def test_c_band_peaks_at_larger_incidence_than_ku_for_mineral_oil():
    # Singh, Gray, Hawkins & O'Neil (1986, IEEE TGRS 24(5) 738; films.md Sec. 8.4 row 2):
    # over a mineral-oil spill the C-band depression peaks at a larger incidence than Ku.
    th = np.arange(20.0, 61.0, 1.0)
    for model in ("alpers_huhnerfuss1989", "balance"):
        c = np.asarray(S.contrast_db("mineral-oil", 5.3e9, th, 8.0, model=model, water=SEA15))
        ku = np.asarray(S.contrast_db("mineral-oil", 13.9e9, th, 8.0, model=model,
                                      water=SEA15))
        assert th[np.argmax(c)] > th[np.argmax(ku)]


@pytest.mark.parametrize("incidence", [41.0, 47.0])
def test_oleyl_alcohol_ku_band_contrast_in_published_window(incidence):
    # Huehnerfuss, Alpers & Jones (1978, Radio Sci. 13, abstract): 7.3 +- 3.5 dB at Ku band
    # (13.9 GHz), 41 and 47 deg, 3.5-4.4 m/s over an oleyl-alcohol slick
    for model in ("alpers_huhnerfuss1989", "balance"):
        c = np.asarray(S.contrast_db("oleyl-alcohol", 13.9e9, incidence, [3.5, 4.4],
                                     model=model, water=SEA15))
        assert np.all((c > 3.8) & (c < 10.8))


def test_crude_oil_ku_band_contrast_below_published_maximum():
    # W. Croswell and co-workers, NASA Langley 1979 crude-oil films (films.md Sec. 8.4 row 3,
    # abstract only): Ku band 13.9 GHz, HH, depression up to 14 dB, largest near 30 deg and
    # where the oil was thickest.  An upper plausibility bound for the oil-layer presets.
    h = np.array([1e-6, 1e-5, 1e-4, 1e-3])
    for name in ("light-crude", "medium-crude", "heavy-crude"):
        film = F.film_preset(name, thickness=h)
        c = np.asarray(S.contrast_db(film, 13.9e9, 30.0, model="alpers_huhnerfuss1989",
                                     water=SEA15))
        assert np.all(c <= 14.0) and np.all(np.diff(c) > 0), name   # thicker: darker


# --- film-damped spectrum and Cox & Munk ------------------------------------------------

def _cox_munk_slick():
    rows = _rows("cox_munk1954_slopes.csv")
    r = [x for x in rows if x["surface"] == "slick" and x["component"] == "total"][0]
    return float(r["intercept"]), float(r["slope_s_per_m"]), float(r["rms_scatter"])


@pytest.mark.parametrize("name", ["oleyl-alcohol", "methyl-palmitate"])
def test_damped_mss_in_cox_munk_slick_band(name):
    # Cox & Munk (1954) slick regression (U at 12.5 m; U10 = U12.5 / 1.02), +- the quoted
    # scatter (from memory): the A&H89-damped Elfouhaily spectrum with a monolayer at
    # moderate winds lies in the band.
    a, b, rms = _cox_munk_slick()
    u12 = np.array([5.0, 7.0, 10.0])
    mss = np.asarray(S.damped_mean_square_slope(u12 / 1.02, name, "alpers_huhnerfuss1989"))
    assert np.all(np.abs(mss - (a + b * u12)) <= rms)


def test_damped_mss_between_slick_band_and_clean():
    # every film and model lowers the clean mss, never below the Cox & Munk slick band
    from shortwave.spectrum import mean_square_slope
    a, b, rms = _cox_munk_slick()
    u12 = np.array([3.0, 7.0, 12.0])
    clean = np.asarray(mean_square_slope(u12 / 1.02))
    for name in ("oleyl-alcohol", "natural", "mineral-oil"):
        for model in ("alpers_huhnerfuss1989", "balance"):
            m = np.asarray(S.damped_mean_square_slope(u12 / 1.02, name, model, n=801))
            assert np.all(m < clean) and np.all(m > a + b * u12 - rms)


def test_spectral_contrast_and_damped_spectrum():
    from shortwave.spectrum import omnidirectional
    k = np.array([0.3, 5.0, 50.0, 500.0])
    K = np.asarray(S.spectral_contrast(k, 6.0, "natural", water=SEA15))
    assert K[0] == 1.0 and np.all(K >= 1.0)
    s = np.asarray(S.damped_spectrum(k, 6.0, "natural", water=SEA15))
    np.testing.assert_allclose(s, np.asarray(omnidirectional(k, 6.0)) / K, rtol=1e-12)
    y = np.asarray(S.spectral_contrast(k[1:], 6.0, "natural", "alpers_huhnerfuss1989",
                                       water=SEA15))
    np.testing.assert_allclose(y, F.damping_ratio(k[1:], "natural", SEA15), rtol=1e-12)


# --- two-scale model --------------------------------------------------------------------

def test_two_scale_contrast():
    u = np.array([3.0, 6.0, 10.0])
    c2 = np.asarray(S.contrast_db("oleyl-alcohol", 5.405e9, 35.0, u, model="two-scale",
                                  water=SEA15))
    ah = float(S.contrast_db("oleyl-alcohol", 5.405e9, 35.0, model="alpers_huhnerfuss1989",
                             water=SEA15))
    assert np.all(c2 > 1.0) and np.all(c2 < ah + 1.0)
    with pytest.raises(ShortwaveInputError, match="single film"):
        S.contrast(F.Monolayer(np.array([0.01, 0.02])), 5.405e9, 35.0, 5.0, model="two-scale")


# --- gridded use, broadcasting, bad input -----------------------------------------------

def test_fields_of_wind_bragg_wavenumber_and_thickness():
    rng = np.random.default_rng(3)
    shape = (6, 7)
    u = rng.uniform(1.0, 12.0, shape)
    kb = rng.uniform(80.0, 220.0, shape)
    h = rng.uniform(0.0, 2e-4, shape)
    h[0, 0] = 0.0
    film = F.film_preset("light-crude", thickness=h)
    c = np.asarray(S.contrast_db(film, wind_speed=u, bragg_wavenumber=kb, water=SEA15))
    assert c.shape == shape and np.all(np.isfinite(c))
    assert c[0, 0] == pytest.approx(0.0, abs=1e-12)
    i, j = 3, 4
    one = S.contrast_db(film.replace(thickness=h[i, j]), wind_speed=u[i, j],
                        bragg_wavenumber=kb[i, j], water=SEA15)
    assert c[i, j] == pytest.approx(one, rel=1e-10)


def test_nan_cells_propagate():
    c = np.asarray(S.contrast_db("natural", wind_speed=[5.0, np.nan],
                                 bragg_wavenumber=[100.0, 100.0]))
    assert np.isfinite(c[0]) and np.isnan(c[1])


def test_radar_frequency_below_valid_range_is_an_error():
    with pytest.raises(ShortwaveInputError, match="frequency_hz: too low"):
        S.contrast_db("natural", 13.5e6, 30.0, 5.0)


@pytest.mark.parametrize("kwargs,match", [
    (dict(frequency_hz=5.4e9, incidence_deg=30.0, wind_speed=-3.0), "wind_speed"),
    (dict(frequency_hz=5.4e9, incidence_deg=30.0, wind_speed=5.0, model="magic"),
     "balance, alpers_huhnerfuss1989, two-scale"),
    (dict(frequency_hz=5.4e9, incidence_deg=30.0), "wind_speed: required"),
    (dict(frequency_hz=5.4e9, incidence_deg=95.0, wind_speed=5.0), "incidence_deg"),
    (dict(frequency_hz=5.4e9, incidence_deg=30.0, wind_speed=5.0, friction_ratio=1.5),
     "friction_ratio"),
    (dict(wind_speed=5.0), "bragg_wavenumber"),
])
def test_bad_input(kwargs, match):
    with pytest.raises(ShortwaveInputError, match=match):
        S.contrast_db("natural", **kwargs)


def test_incidence_outside_bragg_range_warns():
    with pytest.warns(ValidityWarning, match="20-60"):
        S.contrast_db("natural", 5.4e9, 10.0, 5.0)
    with warnings.catch_warnings():
        warnings.simplefilter("error")
        S.contrast_db("natural", 5.4e9, 30.0, 5.0)


def test_caution_text():
    assert "not proof of oil" in S.CAUTION
    assert "trained observers" in S.CAUTION and "authorities" in S.CAUTION
