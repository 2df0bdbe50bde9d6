"""Oil layers: the two-layer model, its thin-layer and thick-layer limits."""
import csv
import os

import numpy as np
import pytest

from shortwave import films as F
from shortwave.water import Liquid, Water

REF = os.path.join(os.path.dirname(__file__), "reference")
K3 = 2 * np.pi / 0.03
WATER = Liquid(density=1025.0, dynamic_viscosity=1.08e-3, surface_tension=0.073)


def _rows():
    with open(os.path.join(REF, "two_layer_oil_recomputed.csv")) as fh:
        return list(csv.DictReader(line for line in fh if not line.startswith("#")))


def _half_unit(text):
    return 0.51 * 10.0 ** -len(text.split(".")[1])


@pytest.mark.parametrize("row", _rows(), ids=lambda r: f"mu{r['oil_viscosity_pa_s']}-h{r['thickness_m']}")
def test_two_layer_table(row):
    # independent re-computation of the two-layer model (films.md Sec. 3)
    oil = F.OilLayer(thickness=float(row["thickness_m"]),
                     viscosity=float(row["oil_viscosity_pa_s"]),
                     density=float(row["oil_density"]), surface_tension=0.030,
                     interfacial_tension=0.020)
    om = F.complex_frequency(K3, oil, WATER)
    assert om.real == pytest.approx(float(row["omega_re"]), abs=_half_unit(row["omega_re"]))
    assert -om.imag == pytest.approx(float(row["gamma"]), abs=_half_unit(row["gamma"]))
    if row["film_omega_re"]:
        film = F.complex_frequency(K3, F.thin_layer_film(oil, WATER), WATER)
        assert film.real == pytest.approx(float(row["film_omega_re"]),
                                          abs=_half_unit(row["film_omega_re"]))
        assert -film.imag == pytest.approx(float(row["film_gamma"]),
                                           abs=_half_unit(row["film_gamma"]))
    else:
        clean = F.complex_frequency(K3, None, Liquid(density=1025.0, dynamic_viscosity=1.08e-3,
                                                     surface_tension=0.050))
        assert clean.real == pytest.approx(float(row["clean_omega_re"]),
                                           abs=_half_unit(row["clean_omega_re"]))
        assert -clean.imag == pytest.approx(float(row["clean_gamma"]),
                                            abs=_half_unit(row["clean_gamma"]))


def test_identical_fluids_reduce_to_clean_water():
    # a layer of water on water is no layer: clean surface with tension sigma_a + sigma_i
    k = np.array([20.0, K3, 600.0])
    oil = F.OilLayer(thickness=1e-8, viscosity=1.08e-3, density=1025.0,
                     surface_tension=0.030, interfacial_tension=0.043)
    clean = F.complex_frequency(k, None, WATER)
    # a finite h leaves an O(k h) difference (6e-6 at k = 600)
    np.testing.assert_allclose(F.complex_frequency(k, oil, WATER), clean, rtol=1e-5)
    # ... and the difference vanishes linearly with h (an exact limit, not a coincidence)
    dev = []
    for h in (1e-8, 1e-9):
        oil = oil.replace(thickness=h)
        dev.append(np.asarray(F.damping_rate(k, oil, WATER)) / F.damping_rate(k, None, WATER) - 1)
    np.testing.assert_allclose(dev[0] / dev[1], 10.0, rtol=0.01)
    assert np.all(np.abs(dev[1]) < 1e-5)


def test_thin_viscous_sheet_is_a_film_with_e_minus_4i_omega_mu_h():
    k = np.array([30.0, 100.0, 300.0])
    for mu1, h in [(0.5, 1e-6), (5.0, 1e-7)]:
        oil = F.OilLayer(thickness=h, viscosity=mu1, density=900.0, surface_tension=0.03,
                         interfacial_tension=0.02)
        a = np.asarray(F.damping_rate(k, oil, WATER))
        b = np.asarray(F.damping_rate(k, F.thin_layer_film(oil, WATER), WATER))
        np.testing.assert_allclose(a, b, rtol=5e-3)


def test_thick_layer_tends_to_waves_on_oil():
    # h >> 1/k and h >> the oil boundary layer: the wave no longer feels the water
    oil = F.film_preset("light-crude", thickness=0.05)
    k = np.array([100.0, 300.0, 1000.0])
    oil_only = Liquid(density=oil.density, dynamic_viscosity=oil.viscosity,
                      surface_tension=oil.surface_tension)
    np.testing.assert_allclose(F.complex_frequency(k, oil, Water(20, 35)),
                               F.complex_frequency(k, None, oil_only), rtol=1e-6)


def test_zero_thickness_is_clean_water_and_fields_broadcast():
    w = Water(15, 35)
    h = np.array([[0.0, 1e-6, 1e-4, 1e-3]])
    k = np.array([[50.0], [200.0]])
    y = F.damping_ratio(k, F.film_preset("medium-crude", thickness=h), w)
    assert y.shape == (2, 4)
    np.testing.assert_allclose(y[:, 0], 1.0, rtol=1e-12)
    assert np.all(np.diff(y, axis=1) > 0)      # thicker oil damps more


def test_spatial_and_temporal_oil_roots_obey_gaster():
    # Gaster (1962): Delta = Gamma / c_g at the same (real part of the) wavenumber, with
    # c_g = d Re(omega) / dk of the oil-covered surface; a check between the two solvers.
    w = Water(15, 35)
    oil = F.film_preset("light-crude", thickness=1e-3)
    om = np.array([30.0, 60.0])
    kc = np.asarray(F.complex_wavenumber(om, oil, w))
    kr = kc.real
    dk = 1e-4 * kr
    cg = (np.asarray(F.complex_frequency(kr + dk, oil, w)).real
          - np.asarray(F.complex_frequency(kr - dk, oil, w)).real) / (2 * dk)
    gamma = -np.asarray(F.complex_frequency(kr, oil, w)).imag
    np.testing.assert_allclose(kc.imag, gamma / cg, rtol=0.01)
    ys = np.asarray(F.damping_ratio(kr, oil, w, form="spatial"))
    assert np.all(ys > 1)
