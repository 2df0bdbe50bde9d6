"""Tail grafting core (shortwave.tail.extend_spectra): conservation, seam, slopes, bad input."""
import numpy as np
import pytest

from shortwave._checks import ShortwaveInputError
from shortwave.spectrum.convert import wavenumber_to_frequency
from shortwave.spectrum.moments import frequency_mean_square_slope
from shortwave.synthetic import (PM_ALPHA, PM_BETA, U195_OVER_U10, geometric_frequencies,
                                 jonswap, wave_spectra)
from shortwave.tail import (K_MAX, TAIL_MODELS, extend_spectra, frequency_edges, transition_weight,
                            wavenumber_grid)

F36 = geometric_frequencies()                    # 0.035-0.6 Hz, 36 frequencies
TH36 = np.arange(5.0, 360.0, 10.0)               # offset direction axis


def _variance(F, bounds, th):
    dk = bounds[:, 1] - bounds[:, 0]
    return np.einsum("...kj,k->...", np.asarray(F, float), dk) * np.deg2rad(360 / th.size)


def _u125(u10):
    """U10 -> U12.5 by the neutral log profile (Charnock z0; common practice)."""
    from shortwave.spectrum import wind_speed_at_height
    return float(wind_speed_at_height(u10, 12.5))


# --- variance of the resolved part through the conversion --------------------------------

@pytest.mark.parametrize("depth", [np.inf, 10.0, 3.0])
def test_resolved_variance_conserved_exactly(depth):
    E = wave_spectra(F36, TH36, 9.0, 240.0, 80e3, swell_height=0.8)
    r = extend_spectra(E, F36, TH36, 9.0, 240.0, depth, parts=True)
    m0_file = np.sum(E.sum(-1) * np.diff(frequency_edges(F36))) * np.deg2rad(10.0)
    m0_k = _variance(r["resolved_spectrum"], r["wavenumber_bounds"], TH36)
    assert m0_k == pytest.approx(m0_file, rel=1e-12)
    assert r["hs_resolved"] == pytest.approx(4 * np.sqrt(m0_file), rel=1e-12)
    # the whole output spectrum carries resolved + tail variance
    assert _variance(r["spectrum"], r["wavenumber_bounds"], TH36) == pytest.approx(
        (r["hs"] / 4) ** 2, rel=1e-6)


@pytest.mark.parametrize("depth", [np.inf, 10.0])
def test_pierson_moskowitz_hs_survives_the_conversion(depth):
    # Pierson & Moskowitz (1964): alpha = 8.1e-3, beta = 0.74, so that
    # Hs = 2 sqrt(alpha/beta) U19.5^2 / g = 0.2092 U19.5^2 / g = 2.1330 m at U19.5 = 10 m/s
    # (closed form; reference note spectra.md Sect. 6.2 lists 2.1330 for deep water and
    # for h = 10 m after conversion).  Tolerance 0.3 %: the frequency grid (400 geometric
    # bins, 0.03-3 Hz) and g = 9.81 vs 9.80665 in the closed form.
    assert 2 * np.sqrt(PM_ALPHA / PM_BETA) == pytest.approx(0.2092, abs=1e-4)
    f = np.geomspace(0.03, 3.0, 400)
    u10 = 10.0 / U195_OVER_U10
    E = jonswap(f, u10)[:, None] * np.full(4, 1 / (2 * np.pi))
    th = np.array([0.0, 90.0, 180.0, 270.0])
    r = extend_spectra(E, f, th, u10, 0.0, depth, parts=True, k_max=1e4)
    hs_k = 4 * np.sqrt(_variance(r["resolved_spectrum"], r["wavenumber_bounds"], th))
    assert hs_k == pytest.approx(2.1330, rel=3e-3)


def test_resolved_slopes_match_the_frequency_moments():
    # the resolved mss is sum k(f)^2 E df dtheta with the file's own bin widths:
    # cross-check with shortwave.spectrum.moments (same definition, other code path)
    E = wave_spectra(F36, TH36, 11.0, 300.0, 120e3)
    r = extend_spectra(E, F36, TH36, 11.0, 300.0)
    for comp, key in (("total", "mss_resolved"), ("upwind", "mss_upwind_resolved"),
                      ("crosswind", "mss_crosswind_resolved")):
        ref = frequency_mean_square_slope(E, F36, TH36, wind_direction_deg=300.0,
                                          component=comp)
        assert r[key] == pytest.approx(ref, rel=1e-10)


def test_true_bin_widths_of_a_geometric_grid_and_cf_bounds():
    f = F36
    x = f[1] / f[0]
    edges = frequency_edges(f)
    # geometric grid: width f_i (sqrt(X) - 1/sqrt(X)) (reference note spectra.md Sect. 5)
    assert np.allclose(np.diff(edges), f * (np.sqrt(x) - 1 / np.sqrt(x)), rtol=1e-12)
    # explicit CF bounds are used as given
    b = np.stack([edges[:-1], edges[1:]], -1)
    b[24, 1] = b[25, 0] = 0.5 * (f[24] + f[25])      # near the peak
    E = wave_spectra(f, TH36, 8.0, 0.0)
    r1 = extend_spectra(E, f, TH36, 8.0, 0.0)
    r2 = extend_spectra(E, f, TH36, 8.0, 0.0, frequency_bounds=b)
    widths = b[:, 1] - b[:, 0]
    m0 = np.sum(E.sum(-1) * widths) * np.deg2rad(10.0)
    assert r2["hs_resolved"] == pytest.approx(4 * np.sqrt(m0), rel=1e-12)
    assert r2["hs_resolved"] != pytest.approx(r1["hs_resolved"], rel=1e-5)
    with pytest.raises(ShortwaveInputError, match="contiguous"):
        bad = b.copy()
        bad[3, 1] *= 0.99
        extend_spectra(E, f, TH36, 8.0, 0.0, frequency_bounds=bad)


# --- the seam ----------------------------------------------------------------------------

def _cell_curvature(r):
    return np.asarray(r["curvature"], float)


def test_curvature_is_continuous_at_the_seam_and_resolved_part_kept():
    E = wave_spectra(F36, TH36, 12.0, 90.0, 200e3)
    r = extend_spectra(E, F36, TH36, 12.0, 90.0, parts=True)
    k, B, ks = r["wavenumber"], _cell_curvature(r), r["seam_wavenumber"]
    below = r["wavenumber_bounds"][:, 1] <= ks
    above = r["wavenumber_bounds"][:, 0] >= ks
    # cells fully below the seam hold exactly the resolved spectrum
    assert np.allclose(np.asarray(r["spectrum"])[below],
                       r["resolved_spectrum"][below].astype(np.float32), rtol=1e-6)
    # the resolved cells do not depend on the tail model's wind at all
    r2 = extend_spectra(E, F36, TH36, 4.0, 0.0)
    assert np.array_equal(np.asarray(r["spectrum"])[below], np.asarray(r2["spectrum"])[below])
    # continuity: last cell below, the cell holding the seam, first cell above
    i = np.flatnonzero(below)[-1]
    trio = B[i:i + 3]
    assert np.max(trio) / np.min(trio) - 1 < 0.01
    # steps between neighbouring cells stay small across the whole transition band
    band = (k > ks / 1.2) & (k < 2.2 * ks)
    jumps = np.abs(np.diff(np.log(B[band])))
    assert jumps.max() < 0.03
    assert above.sum() > 0


@pytest.mark.parametrize("model", TAIL_MODELS)
def test_above_the_band_the_tail_is_the_chosen_model(model):
    from shortwave import spectrum
    E = wave_spectra(F36, TH36, 10.0, 200.0)
    r = extend_spectra(E, F36, TH36, 10.0, 200.0, parts=True, transition_ratio=2.0,
                       model=model, points_per_decade=10)
    lo = r["wavenumber_bounds"][:, 0]
    far = lo >= 2.0 * r["seam_wavenumber"]
    assert np.allclose(np.asarray(r["spectrum"])[far], r["model_spectrum"][far], rtol=2e-6,
                       atol=0)
    # and the model spectrum is the spectrum module's directional form, phi from downwind
    k = r["wavenumber"][far][::5]
    phi = np.mod(TH36 + 180.0 - (200.0 + 180.0), 360.0)     # wave "to" minus wind "to"
    ref = spectrum.directional(k[:, None], phi[None, :], 10.0, model=model,
                               inverse_wave_age=r["inverse_wave_age"])
    assert np.allclose(r["model_spectrum"][far][::5], ref, rtol=1e-9)


def test_transition_weight_shape():
    k = np.geomspace(1.0, 4.0, 101)
    w = transition_weight(k, 1.0, 2.0)
    assert w[0] == 0.0 and np.all(w[k >= 2.0] == 1.0) and np.all(np.diff(w) >= 0)
    assert transition_weight(2**0.5, 1.0, 2.0) == pytest.approx(0.5, abs=1e-12)


# --- slopes against Cox & Munk -----------------------------------------------------------

@pytest.mark.parametrize("u10", [5.0, 10.0, 14.0])
def test_mss_of_extended_fully_developed_sea_within_cox_munk_scatter(u10):
    # Cox & Munk (1954), clean surface, wind at 12.5 m: total 0.003 + 5.12e-3 U,
    # upwind 3.16e-3 U, crosswind 0.003 + 1.92e-3 U (coefficients as in the reference note
    # spectra.md Sect. 2, checked there against public restatements).  "Within the
    # scatter": |model - fit| <= 2 x 0.004, the rms scatter of the observations about the
    # fit quoted with the laws (from memory, not verified).  Fully developed sea:
    # Pierson-Moskowitz wind sea, cos-2s spreading, 0.035-0.6 Hz, 36 directions.
    E = wave_spectra(F36, TH36, u10, 250.0)
    r = extend_spectra(E, F36, TH36, u10, 250.0)
    u = _u125(u10)
    assert r["mss"] == pytest.approx(0.003 + 5.12e-3 * u, abs=0.008)
    assert r["mss_upwind"] == pytest.approx(3.16e-3 * u, abs=0.008)
    assert r["mss_crosswind"] == pytest.approx(0.003 + 1.92e-3 * u, abs=0.008)
    assert r["mss_upwind"] > r["mss_crosswind"]
    # the wave-model part alone falls far short: 15-30 % of Cox-Munk at full development
    # (reference note spectra.md pitfall 14)
    cm = 0.003 + 5.12e-3 * u
    assert r["mss_resolved"] < 0.30 * cm
    assert r["mss_resolved"] < cm - 0.008
    assert r["mss"] == pytest.approx(r["mss_resolved"] + r["mss_tail"], rel=1e-12)


def test_model_spectrum_fed_as_resolved_part_is_reproduced():
    # Feed the ECKV directional spectrum itself (converted to E(f, theta) with the
    # project's f <-> k conversion) as the "wave-model" part: the extended mss must equal
    # the model's own mss up to k_max (shortwave.spectrum.mean_square_slope), apart from
    # the k^-3 bridge inside the transition band (< 1 %).  Guards against factor-2
    # errors in the directional normalisation and the f -> k Jacobian.
    from shortwave import spectrum
    u = 10.0
    k = np.geomspace(0.02, 1.58, 300)
    phi = np.arange(0.0, 360.0, 10.0)
    F = np.asarray(spectrum.directional(k[:, None], phi[None, :], u))
    E, f = wavenumber_to_frequency(F, k, phi)
    theta = np.mod(phi + 90.0 + 180.0, 360.0)     # wind from 90: downwind bearing 270
    r = extend_spectra(E, f, theta, u, 90.0, convention="to", inverse_wave_age=0.84)
    ref = spectrum.mean_square_slope(u, k_min=float(k[0]), k_max=r["wavenumber_bounds"][-1, 1])
    assert r["mss"] == pytest.approx(ref, rel=0.01)
    up = spectrum.mean_square_slope(u, k_min=float(k[0]), k_max=2000.0, component="upwind")
    assert r["mss_upwind"] == pytest.approx(up, rel=0.01)


# --- directions --------------------------------------------------------------------------

def test_from_to_and_unsorted_directions_leave_moments_unchanged():
    E = wave_spectra(F36, TH36, 9.0, 30.0, 50e3, swell_height=1.0, swell_from_deg=300.0)
    ref = extend_spectra(E, F36, TH36, 9.0, 30.0, convention="from")
    to = extend_spectra(E, F36, np.mod(TH36 + 180, 360), 9.0, 30.0, convention="to")
    perm = np.random.default_rng(3).permutation(TH36.size)
    shuffled = extend_spectra(E[:, perm], F36, TH36[perm] - 360.0, 9.0, 30.0)
    for key in ("hs", "mss", "mss_upwind", "mss_crosswind", "mss_tail", "mss_resolved"):
        assert to[key] == pytest.approx(ref[key], rel=1e-12)
        assert shuffled[key] == pytest.approx(ref[key], rel=1e-12)


def test_a_quarter_turn_of_the_wind_swaps_the_slope_components():
    # a 90 degree error (nautical vs mathematical angles) swaps upwind and crosswind
    # (reference note spectra.md pitfall 7): check that the code is sensitive to it
    E = wave_spectra(F36, TH36, 10.0, 0.0)
    a = extend_spectra(E, F36, TH36, 10.0, 0.0)
    b = extend_spectra(np.roll(E, 9, axis=-1), F36, TH36, 10.0, 90.0)
    assert b["mss_upwind"] == pytest.approx(a["mss_upwind"], rel=1e-9)
    assert a["mss_upwind_resolved"] > 1.5 * a["mss_crosswind_resolved"]


# --- batches, NaN, bad input -------------------------------------------------------------

def test_batch_equals_one_by_one_across_blocks():
    u = np.array([[6.0, 9.0, 12.0], [15.0, 7.5, 4.0]])
    wd = np.array([[0.0, 45.0, 90.0], [180.0, 270.0, 330.0]])
    h = np.array([np.inf, 12.0, 30.0])
    E = wave_spectra(F36, TH36, u, wd, 60e3)
    r = extend_spectra(E, F36, TH36, u, wd, h, block=2)
    for i in range(2):
        for j in range(3):
            one = extend_spectra(E[i, j], F36, TH36, u[i, j], wd[i, j], h[j])
            assert r["mss"][i, j] == pytest.approx(one["mss"], rel=1e-12)
            assert np.array_equal(r["spectrum"][i, j], one["spectrum"])


def test_nan_spectra_and_missing_wind():
    E = wave_spectra(F36, TH36, np.array([8.0, 8.0, 8.0, 8.0]), 0.0)
    E[1] = np.nan                     # land point
    E[2, 5, 7] = np.nan               # one missing value: the spectrum is unusable
    u = np.array([8.0, 8.0, 8.0, np.nan])
    r = extend_spectra(E, F36, TH36, u, 0.0)
    assert np.isfinite(r["hs"][0]) and np.all(np.isfinite(r["spectrum"][0]))
    for i in (1, 2):
        assert np.isnan(r["hs"][i]) and np.isnan(r["hs_resolved"][i])
        assert np.all(np.isnan(r["spectrum"][i]))
    assert np.isnan(r["hs"][3]) and np.isfinite(r["hs_resolved"][3])
    assert np.isfinite(r["mss_resolved"][3])


def test_calm_wind_fades_the_tail_out():
    E = wave_spectra(F36, TH36, 6.0, 0.0)
    r = extend_spectra(E, F36, TH36, 0.0, 0.0, parts=True)
    far = r["wavenumber_bounds"][:, 0] >= 2 * r["seam_wavenumber"]
    assert np.all(np.asarray(r["spectrum"])[far] == 0)
    assert 0 < r["mss_tail"] < 0.01


def test_negative_energy_is_refused_tiny_rounding_is_not():
    E = wave_spectra(F36, TH36, 8.0, 0.0)
    bad = E.copy()
    bad[20, 3] = -0.01
    with pytest.raises(ShortwaveInputError, match=r"efth: negative variance density -0\.01"):
        extend_spectra(bad, F36, TH36, 8.0, 0.0, name="efth")
    ok = E.copy()
    ok[20, 3] = -1e-9 * E.max()
    assert np.isfinite(extend_spectra(ok, F36, TH36, 8.0, 0.0)["mss"])


@pytest.mark.parametrize("kwargs, match", [
    ({"wind_speed": -1.0}, "wind_speed: must be >= 0"),
    ({"depth": 0.0}, "depth: must be > 0"),
    ({"k_max": 2.0}, "k_max"),
    ({"model": "nonsense"}, "model: unknown value"),
    ({"transition_ratio": 1.0}, "transition_ratio"),
    ({"points_per_decade": 2}, "points_per_decade"),
    ({"inverse_wave_age": "young"}, "inverse_wave_age"),
])
def test_bad_arguments(kwargs, match):
    E = wave_spectra(F36, TH36, 8.0, 0.0)
    args = {"wind_speed": 8.0, "wind_direction_deg": 0.0}
    args.update({k: kwargs.pop(k) for k in list(kwargs) if k in args})
    with pytest.raises(ShortwaveInputError, match=match):
        extend_spectra(E, F36, TH36, args["wind_speed"], args["wind_direction_deg"], **kwargs)


def test_shape_and_axis_errors():
    E = wave_spectra(F36, TH36, 8.0, 0.0)
    with pytest.raises(ShortwaveInputError, match="trailing axes"):
        extend_spectra(E[:, :-1], F36, TH36, 8.0, 0.0)
    with pytest.raises(ShortwaveInputError, match="strictly increasing"):
        extend_spectra(E[::-1], F36[::-1], TH36, 8.0, 0.0)
    with pytest.raises(ShortwaveInputError, match="does not broadcast"):
        extend_spectra(E[None].repeat(3, 0), F36, TH36, [1.0, 2.0], 0.0)


def test_default_k_max_covers_ka_band_bragg_waves():
    # IEEE Std 521-2019: Ka band 27-40 GHz.  Bragg: k_B = 2 k_radar sin(incidence) <=
    # 2 k_radar (first-order Bragg resonance, e.g. Valenzuela 1978).
    from shortwave.radar.bands import band, radar_wavenumber
    ka = band("Ka")
    assert ka.high_hz == pytest.approx(40e9)
    assert K_MAX >= 2 * float(radar_wavenumber(ka.high_hz))
    E = wave_spectra(F36, TH36, 8.0, 0.0)
    r = extend_spectra(E, F36, TH36, 8.0, 0.0)
    assert r["wavenumber_bounds"][-1, 1] == pytest.approx(K_MAX)


def test_wavenumber_grid():
    e, c = wavenumber_grid(0.01, 1000.0, 40)
    assert c.size == 200 and e[0] == 0.01 and e[-1] == pytest.approx(1000.0)
    assert np.allclose(np.diff(np.log10(e)), 0.025)
