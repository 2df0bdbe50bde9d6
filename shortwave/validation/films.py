"""Film damping and slick contrast compared with classical limits and published values.

Regression tables (independent re-computations of the film relation) live in
``tests/reference/`` and are asserted in ``tests/test_films.py``; this table holds the
comparisons with published formulas, limits and observations.
"""
from __future__ import annotations

import numpy as np

from .. import films as F
from .. import slick as S
from ..water import Liquid, Water
from . import Check


def _pure_water_20c():
    # films.md Sec. 6.2 properties: IAPWS-95 density, IAPWS 2008 viscosity, IAPWS R1-76 tension
    return Water(20.0, 0.0, density=998.2072, dynamic_viscosity=1.00160e-3,
                 surface_tension=72.736e-3)


def _sea_20c():
    return Water(20.0, 35.0)


_K_1CM = 2.0 * np.pi / 0.01


def _clean_over_lamb():
    w = _pure_water_20c()
    return F.damping_rate(_K_1CM, None, w) / (2.0 * w.kinematic_viscosity * _K_1CM**2)


def _inextensible_ratio(freq_hz):
    """y(E = 1e4 N/m, i.e. E -> infinity) over the Lamb/Lucassen formula
    sqrt(omega/nu) / (4 sqrt 2 k)."""
    w = _sea_20c()
    om = 2.0 * np.pi * freq_hz
    k = float(F.wavenumber(om, w))
    y = F.damping_ratio_at_frequency(freq_hz, F.Monolayer(elasticity=1e4), w)
    return y / (np.sqrt(om / w.kinematic_viscosity) / (4.0 * np.sqrt(2.0) * k))


def _peak_scan(freq_hz=10.0):
    """Elastic film at one frequency: (y_max / y_inext, E k^2 / sqrt(mu rho omega^3) at peak)."""
    w = _sea_20c()
    om = 2.0 * np.pi * freq_hz
    k = float(F.wavenumber(om, w))
    e = np.geomspace(1e-3, 0.1, 2001)
    y = F.damping_ratio_at_frequency(np.full(e.shape, freq_hz), F.Monolayer(elasticity=e), w)
    i = int(np.argmax(y))
    y_inext = F.damping_ratio_at_frequency(freq_hz, F.Monolayer(elasticity=1e3), w)
    x = e[i] * k**2 / np.sqrt(w.dynamic_viscosity * w.density * om**3)
    return y[i] / y_inext, x


def _identical_fluids():
    """Two-layer model, 0.1 um of water on water, against the clean surface with
    tension sigma_a + sigma_i (films.md Sec. 3)."""
    k = 2.0 * np.pi / 0.03
    water = Liquid(density=1025.0, dynamic_viscosity=1.08e-3, surface_tension=0.073)
    oil = F.OilLayer(thickness=1e-7, viscosity=1.08e-3, density=1025.0,
                     surface_tension=0.030, interfacial_tension=0.020)
    clean = Liquid(density=1025.0, dynamic_viscosity=1.08e-3, surface_tension=0.050)
    return (F.damping_rate(k, oil, water) / F.damping_rate(k, None, clean))


def _thin_sheet():
    """Two-layer model, 1 um of 1 Pa s oil, against the film E = -4 i omega mu h."""
    k = 2.0 * np.pi / 0.03
    water = Liquid(density=1025.0, dynamic_viscosity=1.08e-3, surface_tension=0.073)
    oil = F.OilLayer(thickness=1e-6, viscosity=1.0, density=900.0, surface_tension=0.030,
                     interfacial_tension=0.020)
    return F.damping_rate(k, oil, water) / F.damping_rate(k, F.thin_layer_film(oil, water),
                                                          water)


def _ola_ku_contrast_db():
    """Oleyl-alcohol preset (film pressure 31 mN/m) at Ku band 13.9 GHz, 41 deg, U = 4 m/s."""
    return float(S.contrast_db("oleyl-alcohol", 13.9e9, 41.0, 4.0,
                               model="alpers_huhnerfuss1989", water=Water(15.0, 35.0)))


def _mineral_oil_peak_hz():
    """Frequency of the largest spatial damping ratio of the mineral-oil preset (an elastic
    film, E0 = 0.01 N/m), sea water 15 degC, on a 0.01 Hz grid from 3 to 15 Hz."""
    f = np.linspace(3.0, 15.0, 1201)
    y = F.damping_ratio_at_frequency(f, "mineral-oil", Water(15.0, 35.0))
    return float(f[int(np.argmax(y))])


def _ola_slick_mss(u12):
    return float(S.damped_mean_square_slope(u12 / 1.02, "oleyl-alcohol",
                                            "alpers_huhnerfuss1989"))


CHECKS = [
    Check("films.clean.lamb_1cm",
          "exact clean damping of a 1 cm ripple (E = 0 root) over Lamb's 2 nu k^2, pure "
          "water 20 degC", "1", _clean_over_lamb, 1.0,
          "Lamb (1932) Hydrodynamics Art. 348-349: Gamma = 2 nu k^2 to leading order",
          rtol=0.05, tolerance_reason="the exact root lies below 2 nu k^2 by about "
          "(nu k^2/omega)^(1/2)/sqrt(2), 3.6 % at 1 cm (known higher-order correction)"),
    Check("films.clean.exact_1cm",
          "exact clean temporal damping rate of a 1 cm ripple, pure water 20 degC", "s-1",
          lambda: F.damping_rate(_K_1CM, None, _pure_water_20c()), 0.76396,
          "independent re-computation of the E = 0 case of the Lucassen-Reynders & Lucassen "
          "(1969) relation (films.md Sec. 6.2; regression, not a measurement)", rtol=1e-4,
          tolerance_reason="reference printed to 5 digits"),
    Check("films.inextensible.2Hz",
          "spatial damping ratio for E -> infinity (1e4 N/m) over sqrt(omega/nu)/(4 sqrt2 k), "
          "2 Hz, sea water 20 degC", "1", lambda: _inextensible_ratio(2.0), 1.0,
          "Lamb (1932) Art. 351; Lucassen (1968): inextensible film Gamma = k sqrt(nu omega "
          "/ 8) (from memory)", rtol=0.08, tolerance_reason="leading-order formula; the "
          "exact clean damping is below 2 nu k^2, so the ratio is a few % higher"),
    Check("films.inextensible.10Hz",
          "spatial damping ratio for E -> infinity (1e4 N/m) over sqrt(omega/nu)/(4 sqrt2 k), "
          "10 Hz, sea water 20 degC", "1", lambda: _inextensible_ratio(10.0), 1.0,
          "Lamb (1932) Art. 351; Lucassen (1968): inextensible film Gamma = k sqrt(nu omega "
          "/ 8) (from memory)", rtol=0.12, tolerance_reason="leading-order formula, 9 % "
          "low at 10 Hz (higher-order terms grow with nu k^2/omega)"),
    Check("films.elastic_maximum.ratio_10Hz",
          "maximum over E of the damping ratio of an elastic film / inextensible value, "
          "10 Hz", "1", lambda: _peak_scan(10.0)[0], 2.0,
          "Lucassen (1968); Cini & Lombardini (1978): maximum about twice the inextensible "
          "value (from memory; the maximum itself is in Cini & Lombardini's abstract)",
          rtol=0.03, tolerance_reason="'about twice' is a leading-order statement"),
    Check("films.elastic_maximum.position_10Hz",
          "E k^2 / sqrt(mu rho omega^3) at the damping maximum of an elastic film, 10 Hz",
          "1", lambda: _peak_scan(10.0)[1], 1.37,
          "Lucassen (1968) resonance of longitudinal and transverse waves (from memory); "
          "coefficient 1.37 from an independent re-computation (films.md Sec. 1.5)",
          atol=0.05, tolerance_reason="the peak is flat; 2001-point grid in E"),
    Check("films.oil.identical_fluids",
          "two-layer model with 0.1 um of water on water: damping over the clean value "
          "with tension sigma_a + sigma_i", "1", _identical_fluids, 1.0,
          "limit of the two-layer model (films.md Sec. 3): identical fluids are a clean "
          "surface", rtol=1e-4, tolerance_reason="finite h = 1e-7 m leaves an O(kh) "
          "difference (films.md: 3e-5)"),
    Check("films.oil.thin_viscous_sheet",
          "two-layer model with 1 um of 1 Pa s oil: damping over the film E = -4 i omega "
          "mu h", "1", _thin_sheet, 1.0,
          "thin viscous sheet = dilational viscosity 4 mu h (films.md Sec. 3, "
          "Trouton-type sheet viscosity; thin-layer physics of Jenkins & Jacobs 1997)",
          rtol=2e-3, tolerance_reason="the sheet limit neglects O(h/delta) terms "
          "(films.md table: 0.04 %)"),
    Check("films.diffusional.oleic_acid_E0",
          "E0 of the diffusional model matching |E| = 14 mN/m, loss angle 4 deg", "N m-1",
          lambda: F.relaxation_parameters(0.014, 4.0, 2 * np.pi)[0], 0.01509,
          "independent re-computation of films.md Sec. 8.1 (Lucassen & van den Tempel 1972 "
          "model; the A&H89 value |E| = 14 mN/m, 176 deg, read as a 4 deg loss angle: an "
          "interpretation)", atol=5e-6, tolerance_reason="reference printed to 4 digits"),
    Check("films.mineral_oil.damping_peak_frequency",
          "frequency of the damping maximum of an elastic film with E0 = 0.01 N/m (the "
          "mineral-oil preset), spatial damping ratio, sea water 15 degC", "Hz",
          _mineral_oil_peak_hz, 8.0,
          "Alpers & Huehnerfuss (1988) JGR 93(C4) 3642 (abstract): maximum wave damping "
          "around 8 Hz over a mineral-oil slick (Singh et al. 1986), explained by Marangoni "
          "theory with a dilational modulus of the order of 0.01 N/m", atol=1.5,
          tolerance_reason="the abstract says 'around 8 Hz' and 'of the order of 0.01 N/m'; "
          "the modelled peak moves from 9.5 to 8.4 Hz between 10 and 20 degC water"),
    Check("slick.ah89.xband_30deg",
          "A&H89 contrast y(k_B) for E0 = 25 mN/m, omega_D = 1 rad/s, X band 30 deg, sea "
          "water 20 degC", "1",
          lambda: S.alpers_huhnerfuss1989(202.25, F.Monolayer(0.025, 1.0), _sea_20c()), 10.20,
          "independent re-computation of Alpers & Huehnerfuss (1989) with the film relation "
          "(films.md Sec. 6.4; regression)", rtol=5e-3,
          tolerance_reason="reference printed to 4 digits"),
    Check("slick.oleyl_alcohol.ku_band",
          "A&H89 contrast of the oleyl-alcohol preset at Ku band (13.9 GHz), 41 deg", "dB",
          _ola_ku_contrast_db, 7.3,
          "Huehnerfuss, Alpers & Jones (1978) Radio Sci. 13 (abstract): maximum "
          "7.3 +- 3.5 dB over an oleyl-alcohol slick, 3.5-4.4 m/s", atol=3.5,
          tolerance_reason="published +-1 sigma; preset values are typical, not fitted"),
    Check("slick.cox_munk.slick_mss_7ms",
          "mean square slope of the A&H89-damped Elfouhaily spectrum, oleyl-alcohol preset, "
          "U12.5 = 7 m/s", "1", lambda: _ola_slick_mss(7.0), 0.008 + 1.56e-3 * 7.0,
          "Cox & Munk (1954) slick regression 0.008 + 1.56e-3 U12.5", atol=0.004,
          tolerance_reason="quoted scatter +-0.004 (from memory); plausibility band only"),
    Check("slick.cox_munk.slick_mss_10ms",
          "mean square slope of the A&H89-damped Elfouhaily spectrum, oleyl-alcohol preset, "
          "U12.5 = 10 m/s", "1", lambda: _ola_slick_mss(10.0), 0.008 + 1.56e-3 * 10.0,
          "Cox & Munk (1954) slick regression 0.008 + 1.56e-3 U12.5", atol=0.004,
          tolerance_reason="quoted scatter +-0.004 (from memory); plausibility band only"),
]
