"""Sea-water properties compared with published values (density, viscosity, surface tension).

Reference values are printed numbers from standards, handbooks and papers.  Comparisons
with the reference libraries themselves (``gsw``, ``iapws``) over whole grids are in
``tests/test_water.py``.
"""
from __future__ import annotations

from ..water import Water, iapws2008_viscosity, iapws2014_surface_tension
from . import Check

# EOS-80 takes IPTS-68 temperature and practical salinity; TEOS-10 (Water) takes ITS-90
# temperature and Absolute Salinity.  t90 = t68 / 1.00024; S_A = 35.16504/35 * S_P
# (Reference-Composition Salinity, IOC et al. 2010, Eq. 2.4.1).
_T90_OF_T68_5 = 5.0 / 1.00024
_SA_OF_SP_35 = 35.16504

_EOS80 = ("Millero & Poisson (1981) one-atmosphere EOS-80 (UNESCO 1981), check value at "
          "S_P = {s}, t68 = 5 degC, p = 0 (check value from memory; reproduced by the "
          "published EOS-80 polynomial)")
_EOS80_TOL = ("EOS-80 vs TEOS-10: the EOS-80 fit has a standard error of 3.6e-3 kg m-3 "
              "(Millero & Poisson 1981)")

_IAPWS08 = "IAPWS R12-08 (Huber et al. 2009) Table 4 check value at T = {T} K, rho = {r} kg m-3"
_IAPWS08_TOL = "half a unit of the last printed digit (1e-6 uPa s)"
_KORSON = ("Korson, Drost-Hansen & Millero (1969) J. Phys. Chem. 73, 34, Table II "
           "(measured; values seen in a public transcription)")
_KORSON_TOL = "independent capillary-viscometer measurements vs the IAPWS 2008 correlation"
_ST_TOL = ("printed to 0.01 mN/m; the IAPWS equation reproduces the printed table to within "
           "one unit of the last digit")

CHECKS = [
    # --- density (TEOS-10 via gsw) against the earlier international standard EOS-80
    Check("water.density.eos80_s35_t5", "density of sea water, S_P 35, t68 5 degC, p 0",
          "kg m-3", lambda: Water(_T90_OF_T68_5, _SA_OF_SP_35).density, 1027.67547,
          _EOS80.format(s=35), atol=0.004, tolerance_reason=_EOS80_TOL),
    Check("water.density.eos80_s0_t5", "density of pure water (SMOW), t68 5 degC, p 0",
          "kg m-3", lambda: Water(_T90_OF_T68_5, 0.0).density, 999.96675,
          _EOS80.format(s=0), atol=0.004, tolerance_reason=_EOS80_TOL),
    Check("water.density.gsw_t25_sa35.16504",
          "density of standard sea water, S_A 35.16504 g/kg, t 25 degC, p 0", "kg m-3",
          lambda: Water(25.0, 35.16504).density, 1023.3436,
          "gsw 3.6.23 (TEOS-10) rho_t_exact(35.16504, 25, 0), printed to 8 digits",
          atol=5e-5, tolerance_reason="same library; printed to 1e-4 kg m-3"),
    # --- pure-water viscosity, IAPWS 2008
    Check("water.viscosity.iapws2008_t298_r998", "viscosity of water at 298.15 K, 998 kg m-3",
          "Pa s", lambda: iapws2008_viscosity(25.0, 998.0), 889.735100e-6,
          _IAPWS08.format(T=298.15, r=998) + " (also the iapws 1.5.5 docstring value)",
          atol=5e-13, tolerance_reason=_IAPWS08_TOL),
    Check("water.viscosity.iapws2008_t298_r1200", "viscosity of water at 298.15 K, 1200 kg m-3",
          "Pa s", lambda: iapws2008_viscosity(25.0, 1200.0), 1437.649467e-6,
          _IAPWS08.format(T=298.15, r=1200) + " (from memory)",
          atol=5e-13, tolerance_reason=_IAPWS08_TOL),
    Check("water.viscosity.iapws2008_t373_r1000", "viscosity of water at 373.15 K, 1000 kg m-3",
          "Pa s", lambda: iapws2008_viscosity(100.0, 1000.0), 307.883622e-6,
          _IAPWS08.format(T=373.15, r=1000) + " (from memory)",
          atol=5e-13, tolerance_reason=_IAPWS08_TOL),
    Check("water.viscosity.korson1969_t0", "viscosity of pure water at 0 degC, 1 atm", "Pa s",
          lambda: Water(0.0, 0.0).dynamic_viscosity, 1.7916e-3, _KORSON, rtol=0.002,
          tolerance_reason=_KORSON_TOL),
    Check("water.viscosity.korson1969_t20", "viscosity of pure water at 20 degC, 1 atm", "Pa s",
          lambda: Water(20.0, 0.0).dynamic_viscosity, 1.0020e-3, _KORSON, rtol=0.002,
          tolerance_reason=_KORSON_TOL),
    Check("water.viscosity.korson1969_t25", "viscosity of pure water at 25 degC, 1 atm", "Pa s",
          lambda: Water(25.0, 0.0).dynamic_viscosity, 0.8903e-3, _KORSON, rtol=0.002,
          tolerance_reason=_KORSON_TOL),
    # --- sea-water viscosity (Sharqawy et al. 2010 Eq. 22 on IAPWS 2008) against other data
    Check("water.viscosity.millero1974_t25_s40", "viscosity of sea water, 25 degC, S 40",
          "Pa s", lambda: Water(25.0, 40.0).dynamic_viscosity, 0.96541e-3,
          "Millero (1974), The Sea vol. 5, sea-water viscosity correlation, printed check "
          "value at t = 25 degC, S = 40 (seen in a public transcription)",
          rtol=0.015, tolerance_reason="accuracy of Sharqawy et al. (2010) Eq. 22 stated "
          "as +-1.5 %"),
    Check("water.viscosity.dorsey1940_t10_s30", "viscosity of sea water, 10 degC, S 30",
          "Pa s", lambda: Water(10.0, 30.0).dynamic_viscosity, 1.383779e-3,
          "Dorsey (1940) Properties of Ordinary Water-Substance, Table 87, through the "
          "regression of the R package oce (swViscosity(30, 10), within 0.2 % of the table)",
          rtol=0.017, tolerance_reason="Sharqawy et al. (2010) +-1.5 % plus 0.2 % for the "
          "regression of Dorsey's table"),
    # --- surface tension, IAPWS R1-76(2014) and the tables it reproduces
    Check("water.surface_tension.iapws_t0.01", "surface tension of water at 0.01 degC", "N m-1",
          lambda: iapws2014_surface_tension(0.01), 75.65e-3,
          "IAPWS R1-76(2014) Table 1 at 0.01 degC (from memory)",
          atol=1e-5, tolerance_reason=_ST_TOL),
    Check("water.surface_tension.iapws_t20", "surface tension of water at 20 degC", "N m-1",
          lambda: iapws2014_surface_tension(20.0), 72.74e-3,
          "IAPWS R1-76(2014) Table 1 at 20 degC; the same value in Haar, Gallagher & Kell "
          "(1984) NBS/NRC Steam Tables p. 267 (seen in a public transcription)",
          atol=1e-5, tolerance_reason=_ST_TOL),
    Check("water.surface_tension.iapws_t25", "surface tension of water at 25 degC", "N m-1",
          lambda: iapws2014_surface_tension(25.0), 71.97e-3,
          "IAPWS R1-76(2014) Table 1 at 25 degC (from memory)",
          atol=1e-5, tolerance_reason=_ST_TOL),
    Check("water.surface_tension.haar1984_t10", "surface tension of water at 10 degC", "N m-1",
          lambda: Water(10.0, 0.0).surface_tension, 74.22e-3,
          "Haar, Gallagher & Kell (1984) NBS/NRC Steam Tables p. 267 (IAPS table; seen in a "
          "public transcription)", atol=1e-5, tolerance_reason=_ST_TOL),
    Check("water.surface_tension.haar1984_t30", "surface tension of water at 30 degC", "N m-1",
          lambda: Water(30.0, 0.0).surface_tension, 71.20e-3,
          "Haar, Gallagher & Kell (1984) NBS/NRC Steam Tables p. 267 (IAPS table; seen in a "
          "public transcription)", atol=1e-5, tolerance_reason=_ST_TOL),
]
