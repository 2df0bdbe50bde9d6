"""The energy-balance short-wave model (Kudryavtsev et al.; Yurovskaya et al. 2013 revision).

Closed forms and the tuning functions are from the ESA CIMR SSS ATBD, Appendix C, which
restates the model (Eqs. C9-C23); table values are independent re-computations of those
equations (the project's reference note on spectra, Sect. 9.2).
"""
import numpy as np
import pytest

import shortwave.spectrum as sp
from shortwave.spectrum import energy_balance as eb
from shortwave.spectrum.models import resolve_forcing
from shortwave.water import Liquid, Water

TABLE_WATER = Liquid(density=1000.0, surface_tension=0.0725, kinematic_viscosity=1.05e-6)


def _setup(water=TABLE_WATER):
    return eb._Setup(resolve_forcing(1.0, 10.0, water=water))


@pytest.mark.parametrize("k, n_ref, alpha_ref", [
    (10, 9.987, 2.841e-3), (50, 5.803, 3.660e-3), (100, 1.601, 1.788e-2),
    (200, 1.040, 5.825e-2), (370, 1.003, 6.587e-2)])
def test_tuning_functions_table(k, n_ref, alpha_ref):
    # independent re-computation of ATBD Eqs. C20-C22 with gamma_s = 7.25e-5 m3 s-2,
    # g = 9.81 (reference note Sect. 9.2 (6)); printed to 4 digits
    n, alpha = _setup().n_alpha(np.float64(k))
    assert n == pytest.approx(n_ref, abs=1e-3)
    assert alpha == pytest.approx(alpha_ref, rel=1e-3)


def test_closed_forms():
    # ATBD Eq. C22: alpha_g = a C_beta^(-1/10) = 2.840e-3, alpha_c = a / C_beta = 0.0667
    assert eb.A_LEVEL * eb.C_BETA_MEAN ** -0.1 == pytest.approx(2.840e-3, abs=5e-7)
    assert eb.A_LEVEL / eb.C_BETA_MEAN == pytest.approx(0.0667, abs=5e-5)
    # k_b = k_gamma / 4 with k_gamma = sqrt(g / gamma_s) = 367.85 (note Sect. 9.2)
    s = _setup()
    assert s.kgam == pytest.approx(367.85, abs=0.01) and s.kb == pytest.approx(91.96, abs=0.01)
    # down-wind level with beta = C_beta (u*/c)^2: B_d = alpha beta^(1/n) = a (u*/c)^(2/n)
    for k in (10.0, 100.0, 400.0):
        n, alpha = s.n_alpha(k)
        x = 0.3
        bd = eb._solve_wind(np.float64(eb.C_BETA_MEAN * x**2), 0.0, alpha, n)
        assert bd == pytest.approx(eb.A_LEVEL * x ** (2 / n), rel=1e-10)


def test_local_balance_solvers():
    # Eq. C9 residual vanishes at the solution, for growth, decay and no input
    rng = np.random.default_rng(3)
    bnu = rng.uniform(-0.02, 0.05, 500)
    q = rng.uniform(0, 1e-4, 500)
    n = rng.uniform(1.0, 10.0, 500)
    alpha = eb.A_LEVEL * eb.C_BETA_MEAN ** (-1 / n)
    b = eb._solve_wind(bnu, q, alpha, n)
    res = bnu * b - b * (b / alpha) ** n + q
    scale = np.abs(bnu * b) + q + b * (b / alpha) ** n
    assert np.all(np.abs(res) <= 1e-9 * scale)
    # Eq. C19 (n = 1, no wind)
    v = rng.uniform(0, 1e-2, 500)
    bpc = eb._solve_pc(v, q, alpha)
    assert np.allclose(-v * bpc - bpc**2 / alpha + q, 0.0, atol=1e-15)
    # asymptotes of Eqs. C14-C16: cross-wind (beta_nu = 0) and up-wind (beta_nu << 0)
    assert eb._solve_wind(0.0, 1e-6, 0.05, 2.0) == pytest.approx(
        0.05 ** (2 / 3) * 1e-6 ** (1 / 3), rel=1e-10)
    assert eb._solve_wind(-0.5, 1e-9, 0.05, 2.0) == pytest.approx(1e-9 / 0.5, rel=1e-6)


def test_model_is_not_centrosymmetric_and_folds():
    k = np.array([30.0, 100.0, 400.0])
    down = sp.directional_curvature(k, 0.0, 10.0, model="yurovskaya2013",
                                    centrosymmetric=False)
    up = sp.directional_curvature(k, 180.0, 10.0, model="yurovskaya2013",
                                  centrosymmetric=False)
    assert np.all(down > up) and np.all(up > 0)      # breaking feeds the up-wind sector
    sym = sp.directional_curvature(k, 0.0, 10.0, model="yurovskaya2013")
    np.testing.assert_allclose(sym, 0.5 * (down + up), rtol=1e-12)


def test_directional_integrates_to_omnidirectional():
    k = np.geomspace(0.5, 3000, 12)
    phi = np.arange(0.0, 360.0, 0.5)
    B = sp.directional_curvature(k[:, None], phi, 10.0, model="yurovskaya2013",
                                 centrosymmetric=False)
    omni = sp.curvature(k, 10.0, model="yurovskaya2013")
    # omni uses 2.5 degree steps on the half circle: about 0.5 % quadrature error
    np.testing.assert_allclose(B.sum(-1) * np.deg2rad(0.5), omni, rtol=6e-3)
    d = sp.spreading(k, 10.0, model="yurovskaya2013")
    harm = 2 * (B * np.cos(2 * np.deg2rad(phi))).sum(-1) * np.deg2rad(0.5) / omni
    # Delta (second harmonic) is more sensitive to the 2.5 degree quadrature: 3 %
    np.testing.assert_allclose(d, harm, rtol=3e-2)


def test_viscosity_sets_capillary_cutoff():
    # colder water is more viscous: stronger damping 4 nu k^2/omega, lower capillaries
    k = np.array([800.0, 1500.0, 3000.0])
    cold = sp.curvature(k, 8.0, model="yurovskaya2013", water=Water(2.0, 35.0))
    warm = sp.curvature(k, 8.0, model="yurovskaya2013", water=Water(28.0, 35.0))
    assert np.all(warm > cold)
    # gravity range barely affected
    g = [sp.curvature(2.0, 8.0, model="yurovskaya2013", water=w)
         for w in (Water(2.0, 35.0), Water(28.0, 35.0))]
    assert g[0] == pytest.approx(g[1], rel=0.02)


def test_shapes_and_model_function():
    k = np.geomspace(0.1, 2000, 7)
    U = np.array([[6.0], [12.0]])
    S = sp.omnidirectional(k, U, model="yurovskaya2013")
    assert S.shape == (2, 7) and np.all(S > 0)
    np.testing.assert_allclose(S[1], sp.yurovskaya2013(k, 12.0), rtol=1e-12)
    # at and below the peak the model is the ECKV long-wave part
    kp = sp.peak_wavenumber(12.0)
    assert sp.curvature(kp, 12.0, model="yurovskaya2013") == pytest.approx(
        sp.elfouhaily1997_curvature(kp, 12.0, part="long"), rel=1e-12)
    # stronger wind, more short waves
    assert sp.curvature(300.0, 12.0, model="yurovskaya2013") > \
        sp.curvature(300.0, 6.0, model="yurovskaya2013")
