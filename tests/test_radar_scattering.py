"""First-order SPM, the tilted-facet average, the specular term and the breaker terms.

External anchors: the perfect-conductor and normal-incidence limits of the SPM
coefficients (Wright 1968; Valenzuela 1978); the nadir Fresnel reflectivity of sea water
(about 0.64 at C band, common practice).  The numeric tables are independent
re-computations of the stated equations from the radar research note (Sec. 3.5, 4.4,
4.5): regression checks, not measurements.
"""
import numpy as np
import pytest

from shortwave._checks import ShortwaveInputError
from shortwave.permittivity import permittivity
from shortwave.radar import (breaker_nrcs, effective_reflectivity, fresnel_nadir_reflectivity,
                             polarization_coefficients, radar_wavenumber, specular_nrcs,
                             spm_nrcs, spm_nrcs_curvature, tilted_bragg_nrcs, to_db)
from shortwave.radar.breaking import wind_input_directional_factors

EPS_C = 66.225 - 34.393j   # MW2004, 20 degC, 35, 5.405 GHz (radar note Sec. 3.5)
B0 = 0.005


def flat_b(k, direction):
    return B0 / k**4


# radar note Sec. 3.5: theta, |g_HH|^2, |g_VV|^2, sigma_VV dB, sigma_HH dB (B = 0.005)
SPM_TABLE = [(20, 0.6543, 0.9905, -0.52, -2.32), (30, 0.6763, 1.6548, -6.31, -10.19),
             (40, 0.7075, 3.2484, -9.87, -16.49), (50, 0.7479, 7.4847, -12.34, -22.35),
             (60, 0.7977, 21.0140, -14.36, -28.56)]


@pytest.mark.parametrize("theta,ghh2,gvv2,vv,hh", SPM_TABLE)
def test_spm_table(theta, ghh2, gvv2, vv, hh):
    g_hh, g_vv = polarization_coefficients(theta, EPS_C)
    assert abs(g_hh) ** 2 == pytest.approx(ghh2, abs=6e-5)
    assert abs(g_vv) ** 2 == pytest.approx(gvv2, abs=6e-4)
    assert to_db(spm_nrcs_curvature(theta, B0, EPS_C, "VV")) == pytest.approx(vv, abs=0.006)
    assert to_db(spm_nrcs_curvature(theta, B0, EPS_C, "HH")) == pytest.approx(hh, abs=0.006)


def test_spm_other_bands():
    # radar note Sec. 3.5 (30 / 40 deg, MW2004 permittivities)
    for eps, vals in ((71.47 - 73.03j, (0.7288, 0.7559, 1.8253, 3.6202)),
                      (56.78 - 36.78j, (0.6667, 0.6986, 1.6237, 3.1803)),
                      (47.47 - 38.44j, (0.6576, 0.6901, 1.5942, 3.1155))):
        g30, g40 = polarization_coefficients(np.array([30.0, 40.0]), eps)
        np.testing.assert_allclose(np.abs(g30) ** 2, vals[:2], atol=2e-4)
        np.testing.assert_allclose(np.abs(g40) ** 2, vals[2:], atol=2e-3)


def test_two_forms_of_spm_agree():
    # 16 pi k^4 cos^4 |g|^2 F == pi |g|^2 cot^4 B with F = B / K_B^4 (algebra)
    th = np.array([25.0, 40.0, 55.0])
    kb = 2 * radar_wavenumber(9.65e9) * np.sin(np.deg2rad(th))
    for pol in ("VV", "HH"):
        np.testing.assert_allclose(spm_nrcs(9.65e9, th, B0 / kb**4, EPS_C, pol),
                                   spm_nrcs_curvature(th, B0, EPS_C, pol), rtol=1e-8)   # slopes cut at 6 sd


def test_perfect_conductor_limits():
    # Wright (1968) / Valenzuela (1978): g_HH -> 1, g_VV -> (1 + sin^2)/cos^2
    th = np.array([10.0, 20.0, 30.0, 40.0, 50.0, 60.0])
    g_hh, g_vv = polarization_coefficients(th, 1e14 - 1e14j)
    s2, c2 = np.sin(np.deg2rad(th)) ** 2, np.cos(np.deg2rad(th)) ** 2
    np.testing.assert_allclose(g_hh, 1.0, atol=1e-6)
    np.testing.assert_allclose(g_vv, (1 + s2) / c2, rtol=1e-6)
    # radar note: perfect-conductor |g_VV|^2 at 20..60 deg
    np.testing.assert_allclose(np.abs(g_vv[1:]) ** 2,
                               [1.6001, 2.7778, 5.7993, 14.7498, 48.9996], rtol=1e-5)


def test_normal_incidence_and_conjugation():
    for eps in (EPS_C, 20 - 30j, 80 - 5j):
        g_hh, g_vv = polarization_coefficients(0.0, eps)
        assert g_hh == pytest.approx(g_vv, rel=1e-14)
        r0 = fresnel_nadir_reflectivity(eps)
        assert abs(g_hh) ** 2 < 1 and r0 < 1
        a = polarization_coefficients(35.0, eps)
        b = polarization_coefficients(35.0, np.conj(eps))
        assert abs(a[0]) == pytest.approx(abs(b[0]), rel=1e-13)
        assert abs(a[1]) == pytest.approx(abs(b[1]), rel=1e-13)
        assert fresnel_nadir_reflectivity(np.conj(eps)) == pytest.approx(r0, rel=1e-13)


def test_pure_bragg_polarization_ratio_grows_with_incidence():
    # radar note Sec. 3.5: about 4 dB at 30 deg to about 14 dB at 60 deg
    pr = [to_db(spm_nrcs_curvature(t, B0, EPS_C, "VV") / spm_nrcs_curvature(t, B0, EPS_C, "HH"))
          for t in (30, 40, 50, 60)]
    assert np.all(np.diff(pr) > 0)
    assert pr[0] == pytest.approx(3.89, abs=0.01) and pr[-1] == pytest.approx(14.21, abs=0.01)


def test_nadir_reflectivity_of_sea_water():
    # about 0.64 at C band (common practice); note Sec. 6 re-computations at 20 degC, 35
    for f, r in ((1.4e9, 0.6859), (5.3e9, 0.6371), (9.65e9, 0.6263), (13.6e9, 0.6163),
                 (35e9, 0.5533)):
        assert fresnel_nadir_reflectivity(permittivity(f, 20.0, 35.0)) == pytest.approx(
            r, abs=2e-4)


# radar note Sec. 4.4: theta, VV two-scale dB, HH two-scale dB (64 x 64 nodes)
TILT_TABLE = [(40, -9.54, -15.04), (50, -12.23, -20.98), (60, -14.35, -26.90)]


@pytest.mark.parametrize("theta,vv,hh", TILT_TABLE)
def test_two_scale_table(theta, vv, hh):
    for pol, ref in (("VV", vv), ("HH", hh)):
        s = tilted_bragg_nrcs(5.405e9, theta, flat_b, (0.01, 0.01, 0.0), EPS_C, pol, nodes=64)
        assert to_db(s) == pytest.approx(ref, abs=0.006)


def test_two_scale_30deg_without_facet_cut():
    # note Sec. 4.4 at 30 deg (-5.32 / -8.05 dB) keeps every facet; ours with a 0-deg cut
    for pol, ref in (("VV", -5.32), ("HH", -8.05)):
        s = tilted_bragg_nrcs(5.405e9, 30.0, flat_b, (0.01, 0.01, 0.0), EPS_C, pol, nodes=64,
                              min_local_incidence_deg=0.0)
        assert to_db(s) == pytest.approx(ref, abs=0.006)


def test_tilting_raises_hh_more_than_vv():
    th = np.array([30.0, 40.0, 50.0, 60.0])
    gain = {}
    for pol in ("VV", "HH"):
        gain[pol] = to_db(tilted_bragg_nrcs(5.405e9, th, flat_b, (0.01, 0.01, 0.0), EPS_C, pol)
                          / spm_nrcs_curvature(th, B0, EPS_C, pol))
    assert np.all(gain["HH"] > gain["VV"] + 0.9)


def test_zero_slopes_give_flat_spm_and_no_cross_pol():
    th = np.array([25.0, 45.0])
    for pol in ("VV", "HH"):
        np.testing.assert_allclose(
            tilted_bragg_nrcs(5.405e9, th, flat_b, (0.0, 0.0, 0.0), EPS_C, pol),
            spm_nrcs_curvature(th, B0, EPS_C, pol), rtol=1e-8)   # slopes cut at 6 sd
    assert np.all(tilted_bragg_nrcs(5.405e9, th, flat_b, (0.0, 0.0, 0.0), EPS_C, "HV") == 0)
    hv = tilted_bragg_nrcs(5.405e9, th, flat_b, (0.01, 0.01, 0.0), EPS_C, "VH")
    assert np.all(hv > 0)
    assert np.all(hv < tilted_bragg_nrcs(5.405e9, th, flat_b, (0.01, 0.01, 0.0), EPS_C, "HH"))


def test_tilt_quadrature_converges():
    s = [tilted_bragg_nrcs(13.575e9, 25.0, flat_b, (0.02, 0.012, 0.004), EPS_C, "HH",
                           nodes=n) for n in ((12, 6), (16, 8), 48)]
    assert abs(to_db(s[0] / s[2])) < 0.05 and abs(to_db(s[1] / s[2])) < 0.02


def test_slope_covariance_rotation_is_consistent():
    # an anisotropic Bragg spectrum and slope ellipse rotated together by the same angle
    # give the same sigma0 as when both are described in rotated axes
    def spec(rot):
        return lambda k, d: B0 / k**4 * (1 + 0.4 * np.cos(2 * (d - rot)))
    su, sc = 0.02, 0.008
    out = []
    for rot in (0.0, np.deg2rad(30.0)):
        c, s = np.cos(rot), np.sin(rot)
        cov = (su * c**2 + sc * s**2, su * s**2 + sc * c**2, (su - sc) * s * c)
        out.append(tilted_bragg_nrcs(5.405e9, 40.0, spec(rot), cov, EPS_C, "VV", nodes=32))
    mirrored = []
    for rot in (np.deg2rad(30.0), np.deg2rad(-30.0)):
        c, s = np.cos(rot), np.sin(rot)
        cov = (su * c**2 + sc * s**2, su * s**2 + sc * c**2, (su - sc) * s * c)
        mirrored.append(tilted_bragg_nrcs(5.405e9, 40.0, spec(rot), cov, EPS_C, "VV", nodes=32))
    assert mirrored[0] == pytest.approx(mirrored[1], rel=1e-10)   # mirror symmetry
    assert out[0] != pytest.approx(out[1], rel=1e-3)              # azimuth does matter


# radar note Sec. 4.5: isotropic s^2, |R|^2 = 0.6367: dB at 0, 5, 10, 15 deg
GO_TABLE = [(0.02, (15.03, 13.43, 8.54, 0.04)), (0.03, (13.27, 12.23, 9.03, 3.48)),
            (0.04, (12.02, 11.25, 8.91, 4.83))]


@pytest.mark.parametrize("s2,vals", GO_TABLE)
def test_specular_table(s2, vals):
    got = to_db(specular_nrcs(np.array([0.0, 5.0, 10.0, 15.0]), s2 / 2, s2 / 2, 0.6367))
    np.testing.assert_allclose(got, vals, atol=0.006)


def test_specular_anisotropy_and_symmetry():
    up = specular_nrcs(12.0, 0.02, 0.01, 0.6, azimuth_deg=0.0)
    cross = specular_nrcs(12.0, 0.02, 0.01, 0.6, azimuth_deg=90.0)
    down = specular_nrcs(12.0, 0.02, 0.01, 0.6, azimuth_deg=180.0)
    assert up > cross and up == pytest.approx(down, rel=1e-12)
    # at nadir the value is |R|^2 / (2 s_u s_c) whatever the azimuth
    assert specular_nrcs(0.0, 0.02, 0.01, 0.6, 37.0) == pytest.approx(
        0.6 / (2 * np.sqrt(0.02 * 0.01)), rel=1e-12)


def test_effective_reflectivity():
    r0 = fresnel_nadir_reflectivity(EPS_C)
    assert effective_reflectivity(EPS_C) == pytest.approx(r0)
    k = radar_wavenumber(5.405e9)
    assert effective_reflectivity(EPS_C, 5.405e9, 4e-6) == pytest.approx(
        r0 * np.exp(-4 * k**2 * 4e-6), rel=1e-12)
    with pytest.raises(ShortwaveInputError):
        effective_reflectivity(EPS_C, None, 1e-6)


def test_breaker_nrcs_form():
    # sec^4 / s^2 exp(-tan^2 / s^2) + eps / s^2 (KHCC 2003, from memory)
    assert breaker_nrcs(0.0) == pytest.approx((1 + 0.005) / 0.19, rel=1e-12)
    th = np.array([20.0, 40.0, 60.0, 80.0])
    s = breaker_nrcs(th)
    assert np.all(np.diff(s) < 0) and s[-1] == pytest.approx(0.005 / 0.19, rel=0.01)


def test_wind_input_direction_integrals():
    # The centrosymmetric spectrum (1 + Delta cos 2 phi) / (2 pi) is first folded into its
    # propagating form (spectra research note Sec. 4.3; shortwave.spectrum.convert.
    # fold_downwind: 2 F within 90 deg of down-wind, 0 behind), then the wind input
    # cos(phi)|cos(phi)| and the orientation weight (1 + a cos phi) are integrated over the
    # full circle numerically: independent re-computation of the closed forms I0 + a I1.
    # Integrating the unfolded symmetric spectrum over |phi| < 90 deg (the former
    # closed forms 1/4 + Delta/8, ...) counts only half of the waves.
    from shortwave.spectrum.convert import fold_downwind
    phi_deg = np.linspace(-180.0, 180.0, 720001)[:-1]
    phi = np.deg2rad(phi_deg)
    dphi = phi[1] - phi[0]
    for delta in (0.0, 0.3, 0.9):
        sym = (1 + delta * np.cos(2 * phi)) / (2 * np.pi)
        prop = fold_downwind(sym, phi_deg, 0.0)
        assert np.sum(prop) * dphi == pytest.approx(1.0, rel=1e-9)   # variance kept
        wind_input = np.cos(phi) * np.abs(np.cos(phi))
        i0 = np.sum(wind_input * prop) * dphi
        i1 = np.sum(wind_input * prop * np.cos(phi)) * dphi
        a, b = wind_input_directional_factors(delta)
        assert a == pytest.approx(i0, rel=1e-6) and b == pytest.approx(i1, rel=1e-6)
        # the unfolded symmetric spectrum over the full circle gives no net wind input
        assert abs(np.sum(wind_input * sym) * dphi) < 1e-12


# --- exact-geometry re-computation of the tilted-facet average -------------------------

def _facet_average_reference(f, theta_deg, spec, cov, eps, pol, cut_deg=10.0, n=241):
    """Two-scale average by brute force with 3-D facet vectors (independent of spm.py).

    For each facet normal N = (-s_x, -s_y, 1)/|.|: local incidence cos = -k_i.N; the
    polarisation rotation from the global (h, v) to the facet's (h_l, v_l) basis by dot
    products (h_l = k_i x N); the local Bragg wave vector from the component of the
    incident wave vector in the facet plane, k_i - (k_i.N) N, whose horizontal direction
    selects the spectrum; trapezoid rule over +-6 standard deviations of the Gaussian
    slopes.  Independent re-computation of Valenzuela (1968; 1978 Eq. 9).
    """
    k = radar_wavenumber(f)
    th = np.deg2rad(theta_deg)
    chol = np.linalg.cholesky(np.array([[cov[0], cov[2]], [cov[2], cov[1]]]))
    z = np.linspace(-6.0, 6.0, n)
    z1, z2 = np.meshgrid(z, z, indexing="ij")
    w = np.exp(-0.5 * (z1**2 + z2**2)) / (2 * np.pi) * (z[1] - z[0]) ** 2
    sx = chol[0, 0] * z1
    sy = chol[1, 0] * z1 + chol[1, 1] * z2
    ki = np.array([np.sin(th), 0.0, -np.cos(th)])        # radar at -x looking along +x
    h = np.cross(ki, [0.0, 0.0, 1.0])
    h /= np.linalg.norm(h)
    v = np.cross(h, ki)
    nrm = np.stack([-sx, -sy, np.ones_like(sx)], -1)
    nrm /= np.linalg.norm(nrm, axis=-1, keepdims=True)
    cos_l = -(nrm @ ki)
    hl = np.cross(ki, nrm)
    hl /= np.linalg.norm(hl, axis=-1, keepdims=True)
    c_rot, s_rot = hl @ h, hl @ v
    g_hh, g_vv = polarization_coefficients(np.rad2deg(np.arccos(cos_l)), eps)
    coef = {"VV": c_rot**2 * g_vv + s_rot**2 * g_hh, "HH": c_rot**2 * g_hh + s_rot**2 * g_vv,
            "HV": c_rot * s_rot * (g_vv - g_hh)}[pol]
    in_plane = ki - (nrm @ ki)[..., None] * nrm
    direction = np.arctan2(in_plane[..., 1], in_plane[..., 0])
    sin_l = np.sqrt(1.0 - cos_l**2)
    sigma = 16 * np.pi * k**4 * cos_l**4 * np.abs(coef) ** 2 * spec(2 * k * sin_l, direction)
    keep = (th - np.arctan(sx) >= np.deg2rad(cut_deg)) & (cos_l > 0)
    return np.sum(np.where(keep, sigma, 0.0) * w)


def test_tilted_facet_average_matches_exact_geometry_for_oblique_wind():
    # A strongly anisotropic Bragg spectrum and slope ellipse along an axis 45 deg from
    # the look direction: the cross-look component of the local Bragg vector matters.
    # With its sign reversed (the tilted Bragg vector 2k (sin(t - psi), +cos(t - psi)
    # sin delta)) the average was 28 % (VV) to 58 % (HH) too high here.
    rot = np.deg2rad(45.0)

    def spec(k, d):
        return B0 / k**4 * (1 + 0.8 * np.cos(2 * (d - rot)))
    su, sc = 0.03, 0.005
    c, s = np.cos(rot), np.sin(rot)
    cov = (su * c**2 + sc * s**2, su * s**2 + sc * c**2, (su - sc) * s * c)
    for pol, tol in (("VV", 0.005), ("HH", 0.005), ("HV", 0.01)):
        ref = _facet_average_reference(5.405e9, 40.0, spec, cov, EPS_C, pol)
        got = tilted_bragg_nrcs(5.405e9, 40.0, spec, cov, EPS_C, pol, nodes=48)
        assert got == pytest.approx(ref, rel=tol)   # quadrature and in-plane |K_l| only


def test_bad_scattering_inputs():
    with pytest.raises(ShortwaveInputError, match="polarization"):
        spm_nrcs(5e9, 30.0, 1e-9, EPS_C, "RR")
    with pytest.raises(ShortwaveInputError, match="polarization"):
        spm_nrcs(5e9, 30.0, 1e-9, EPS_C, "HV")     # first-order cross-pol is zero: refuse
    for theta in (0.0, 90.0, -5.0, 95.0):
        with pytest.raises(ShortwaveInputError, match="incidence_deg"):
            spm_nrcs_curvature(theta, B0, EPS_C)
        with pytest.raises(ShortwaveInputError, match="incidence_deg"):
            tilted_bragg_nrcs(5e9, theta, flat_b, (0.01, 0.01, 0.0), EPS_C)
    with pytest.raises(ShortwaveInputError, match="permittivity"):
        polarization_coefficients(30.0, 0.5 + 0j)
    with pytest.raises(ShortwaveInputError, match="s_xx"):
        tilted_bragg_nrcs(5e9, 30.0, flat_b, (-0.01, 0.01, 0.0), EPS_C)
    with pytest.raises(ShortwaveInputError, match="mss_upwind"):
        specular_nrcs(10.0, 0.0, 0.01, 0.6)
    with pytest.raises(ShortwaveInputError, match="frequency_hz"):
        spm_nrcs(-5e9, 30.0, 1e-9, EPS_C)
