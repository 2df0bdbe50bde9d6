"""Sea-water microwave permittivity compared with published values.

The published anchors are the conductivity of standard sea water and the static dielectric
constant of pure water.  The complex permittivities at radar frequencies are independent
re-computations of the published equations (regression values, not measurements); the full
tables are in ``tests/test_permittivity.py``.
"""
from __future__ import annotations

import warnings

from ..permittivity import (fresnel_reflectivity_nadir, ionic_conductivity, permittivity,
                            relaxation_parameters)
from . import Check

_MM56 = ("Malmberg & Maryott (1956) J. Res. NBS 56(1), 1: eps = 87.740 - 0.40008 t "
         "+ 9.398e-4 t^2 - 1.410e-6 t^3 (bridge measurements, 0.1 %), at t = 20 degC")
_MM56_25 = ("Malmberg & Maryott (1956) J. Res. NBS 56(1), 1: measured 78.30 at 25 degC "
            "(abstract)")
_STATIC_TOL = ("the models use other static-permittivity fits (Stogryn et al. 1995; "
               "Klein & Swift 1977), 0.1-0.3 % apart from Malmberg & Maryott")
_RECOMP_MW = ("independent re-computation of Meissner & Wentz (2004) eqs. (5)-(17), Table "
              "III (regression, not a measurement)")
_RECOMP_KS = ("independent re-computation of Klein & Swift (1977) eqs. (9), (13)-(21) "
              "(regression, not a measurement)")
_RECOMP_TOL = "reference printed to 4 significant digits"
_RECOMP_TOL5 = "reference printed to 5 significant digits"
_C_BAND = 5.405e9


def _static(model, t):
    return relaxation_parameters(t, 0.0, model=model)["eps_s"]


def _quiet(func):
    """Evaluate a model outside its fitted range without the (expected) warning."""
    def run():
        with warnings.catch_warnings():
            warnings.simplefilter("ignore")
            return func()
    return run


CHECKS = [
    Check("permittivity.conductivity.mw2004_standard_seawater",
          "conductivity of standard sea water, S 35, 15 degC (Stogryn et al. 1995 fit in "
          "Meissner & Wentz 2004)", "S m-1",
          lambda: ionic_conductivity(15.0, 35.0, "meissner_wentz2004"), 4.2914,
          "Culkin & Smith (1980) IEEE J. Oceanic Eng. OE-5, 22: 42.914 mS/cm (the PSS-78 "
          "reference conductivity)", rtol=2e-5,
          tolerance_reason="fit vs defining value; half a unit of the 5th digit is 1.2e-5"),
    Check("permittivity.conductivity.ks1977_standard_seawater",
          "conductivity of standard sea water, S 35, 15 degC (Klein & Swift 1977)", "S m-1",
          lambda: ionic_conductivity(15.0, 35.0, "klein_swift1977"), 4.2914,
          "Culkin & Smith (1980) IEEE J. Oceanic Eng. OE-5, 22", rtol=1e-3,
          tolerance_reason="Klein & Swift use an older conductivity fit (Weyl 1964)"),
    Check("permittivity.static.mw2004_pure_20C",
          "static permittivity of pure water at 20 degC (Meissner & Wentz 2004)", "1",
          lambda: _static("meissner_wentz2004", 20.0), 80.10, _MM56, atol=0.3,
          tolerance_reason=_STATIC_TOL),
    Check("permittivity.static.ks1977_pure_20C",
          "static permittivity of pure water at 20 degC (Klein & Swift 1977)", "1",
          lambda: _static("klein_swift1977", 20.0), 80.10, _MM56, atol=0.3,
          tolerance_reason=_STATIC_TOL),
    Check("permittivity.static.mw2004_pure_25C",
          "static permittivity of pure water at 25 degC (Meissner & Wentz 2004)", "1",
          lambda: _static("meissner_wentz2004", 25.0), 78.30, _MM56_25, atol=0.3,
          tolerance_reason=_STATIC_TOL),
    Check("permittivity.mw2004.c_band_real", "Re eps, sea water 20 degC S 35, 5.405 GHz", "1",
          lambda: permittivity(_C_BAND, 20.0, 35.0).real, 66.225, _RECOMP_MW, atol=5e-4,
          tolerance_reason=_RECOMP_TOL5),
    Check("permittivity.mw2004.c_band_loss", "-Im eps, sea water 20 degC S 35, 5.405 GHz", "1",
          lambda: -permittivity(_C_BAND, 20.0, 35.0).imag, 34.393, _RECOMP_MW, atol=5e-4,
          tolerance_reason=_RECOMP_TOL5),
    Check("permittivity.ks1977.l_band_real", "Re eps, sea water 20 degC S 35, 1.4 GHz", "1",
          lambda: permittivity(1.4e9, 20.0, 35.0, "klein_swift1977").real, 72.04, _RECOMP_KS,
          atol=0.005, tolerance_reason=_RECOMP_TOL),
    Check("permittivity.ks1977.l_band_loss", "-Im eps, sea water 20 degC S 35, 1.4 GHz", "1",
          lambda: -permittivity(1.4e9, 20.0, 35.0, "klein_swift1977").imag, 66.85, _RECOMP_KS,
          atol=0.005, tolerance_reason=_RECOMP_TOL),
    Check("permittivity.ks1977.x_band_real",
          "Re eps, sea water 20 degC S 35, 9.65 GHz (Klein & Swift)", "1",
          lambda: permittivity(9.65e9, 20.0, 35.0, "klein_swift1977").real, 56.73, _RECOMP_KS,
          atol=0.005, tolerance_reason=_RECOMP_TOL),
    Check("permittivity.fresnel_nadir.c_band",
          "nadir power reflectivity of sea water, 20 degC S 35, 5.3 GHz (Meissner & Wentz)",
          "1", lambda: fresnel_reflectivity_nadir(permittivity(5.3e9, 20.0, 35.0)), 0.6371,
          "independent re-computation of the Fresnel coefficient with Meissner & Wentz (2004) "
          "(regression, not a measurement)", atol=5e-5, tolerance_reason=_RECOMP_TOL),
    Check("permittivity.fresnel_nadir.ku_band_ks",
          "nadir power reflectivity of sea water, 20 degC S 35, 13.6 GHz (Klein & Swift, "
          "outside its fitted range)", "1",
          _quiet(lambda: fresnel_reflectivity_nadir(
              permittivity(13.6e9, 20.0, 35.0, "klein_swift1977"))), 0.6172,
          "independent re-computation of the Fresnel coefficient with Klein & Swift (1977) "
          "(regression, not a measurement)", atol=5e-5, tolerance_reason=_RECOMP_TOL),
]
