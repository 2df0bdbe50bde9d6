"""Physical properties of sea water (and of any other liquid) at the sea surface.

Density from TEOS-10 (via ``gsw``), viscosity from IAPWS 2008 pure water with the
Sharqawy et al. (2010) sea-water correction, surface tension from IAPWS R1-76(2014) with
the Nayar et al. (2014) salinity correction, and the complex microwave permittivity from
:mod:`shortwave.permittivity`.  All at atmospheric pressure.

Every property can be overridden, so the same code serves an oil or a laboratory liquid:
``Water(density=870.0, surface_tension=0.030, kinematic_viscosity=1e-5)`` or
:class:`Liquid`.

References
----------
.. [1] IOC, SCOR and IAPSO (2010). The international thermodynamic equation of seawater
   2010 (TEOS-10). Intergovernmental Oceanographic Commission, Manuals and Guides 56.
.. [2] Huber, M. L. et al. (2009). New international formulation for the viscosity of H2O.
   J. Phys. Chem. Ref. Data 38, 101-125 (IAPWS 2008), Eqs. (11), (12).
.. [3] Sharqawy, M. H., Lienhard, J. H. and Zubair, S. M. (2010). Thermophysical
   properties of seawater: a review of existing correlations and data. Desalination and
   Water Treatment 16, 354-380, Eq. (22).
.. [4] IAPWS R1-76(2014). Revised release on surface tension of ordinary water substance.
.. [5] Nayar, K. G., Panchanathan, D., McKinley, G. H. and Lienhard, J. H. (2014). Surface
   tension of seawater. J. Phys. Chem. Ref. Data 43, 043103, Eq. (6) (IAPWS G14-19).
"""
from __future__ import annotations

import warnings

import numpy as np

from ._checks import ShortwaveInputError, as_float_array, check_positive, check_range

__all__ = ["Water", "Liquid", "SEAWATER", "as_liquid", "ValidityWarning",
           "iapws2008_viscosity", "sharqawy2010_viscosity", "iapws2014_surface_tension",
           "nayar2014_surface_tension", "teos10_density"]

T_CRIT = 647.096  # K, critical temperature of water (IAPWS)
KELVIN = 273.15

# Hard limits: outside these the correlations are meaningless, so we refuse.
HARD_T = (-10.0, 100.0)   # degC
HARD_S = (0.0, 160.0)     # g/kg


class ValidityWarning(UserWarning):
    """A property is evaluated outside the validity range of its correlation."""


def _warn_range(name, arr, low, high, what):
    v = arr[np.isfinite(arr)]
    if v.size and (np.min(v) < low or np.max(v) > high):
        warnings.warn(f"{name} outside the validity range [{low:g}, {high:g}] of {what}; "
                      "values are extrapolated", ValidityWarning, stacklevel=3)


def teos10_density(temperature_c, salinity):
    """In-situ density of sea water at the surface from TEOS-10.

    Parameters
    ----------
    temperature_c : numeric
        In-situ temperature (ITS-90) [degC].
    salinity : numeric
        Absolute salinity S_A [g kg-1].

    Returns
    -------
    numeric
        Density [kg m-3].

    Notes
    -----
    ``gsw.rho_t_exact(SA, t, p=0)`` (TEOS-10 Gibbs function, IOC et al. 2010 [1]_).
    Oceanographic validity: S_A 0-42 g/kg, t -2..40 degC.

    Examples
    --------
    >>> round(float(teos10_density(20.0, 35.0)), 2)
    1024.64
    """
    import gsw
    t = as_float_array("temperature_c", temperature_c)
    s = as_float_array("salinity", salinity)
    return gsw.rho_t_exact(s, t, 0.0)


_H0 = np.array([1.67752, 2.20462, 0.6366564, -0.241605])
# (i, j, H_ij) of IAPWS 2008 Eq. (12), Table 3
_HIJ = [(0, 0, 0.520094), (1, 0, 0.0850895), (2, 0, -1.08374), (3, 0, -0.289555),
        (0, 1, 0.222531), (1, 1, 0.999115), (2, 1, 1.88797), (3, 1, 1.26613),
        (5, 1, 0.120573), (0, 2, -0.281378), (1, 2, -0.906851), (2, 2, -0.772479),
        (3, 2, -0.489837), (4, 2, -0.257040), (0, 3, 0.161913), (1, 3, 0.257399),
        (0, 4, -0.0325372), (3, 4, 0.0698452), (4, 5, 0.00872102), (3, 6, -0.00435673),
        (5, 6, -0.000593264)]


def iapws2008_viscosity(temperature_c, density):
    """Dynamic viscosity of pure water, IAPWS 2008 (industrial form, no critical term).

    Parameters
    ----------
    temperature_c : numeric
        Temperature [degC].
    density : numeric
        Density of pure water at that temperature [kg m-3].

    Returns
    -------
    numeric
        Dynamic viscosity [Pa s].

    Notes
    -----
    Huber et al. (2009) [2]_ Eqs. (10)-(12) with mu_2 = 1.

    Examples
    --------
    >>> round(float(iapws2008_viscosity(25.0, 997.0476)) * 1e3, 4)
    0.89
    """
    tb = (as_float_array("temperature_c", temperature_c) + KELVIN) / T_CRIT
    rb = as_float_array("density", density) / 322.0
    mu0 = 100.0 * np.sqrt(tb) / sum(h / tb**i for i, h in enumerate(_H0))  # Eq. (11)
    x, y = 1.0 / tb - 1.0, rb - 1.0
    s = sum(h * x**i * y**j for i, j, h in _HIJ)
    mu1 = np.exp(rb * s)  # Eq. (12)
    return 1e-6 * mu0 * mu1


def sharqawy2010_viscosity(temperature_c, salinity, pure_water_viscosity=None):
    """Dynamic viscosity of sea water, Sharqawy et al. (2010) Eq. (22).

    Parameters
    ----------
    temperature_c : numeric
        Temperature [degC]; valid 0-180.
    salinity : numeric
        Salinity [g kg-1]; valid 0-150.
    pure_water_viscosity : numeric, optional
        Viscosity of pure water at the same temperature [Pa s]; by default the
        authors' fit to IAPWS 2008 (their Eq. 23).

    Returns
    -------
    numeric
        Dynamic viscosity [Pa s]; stated accuracy +-1.5 %.
    """
    t = as_float_array("temperature_c", temperature_c)
    s = as_float_array("salinity", salinity) / 1000.0
    if pure_water_viscosity is None:
        pure_water_viscosity = 4.2844e-5 + 1.0 / (0.157 * (t + 64.993) ** 2 - 91.296)
    a = 1.541 + 1.998e-2 * t - 9.52e-5 * t**2
    b = 7.974 - 7.561e-2 * t + 4.724e-4 * t**2
    return pure_water_viscosity * (1.0 + a * s + b * s**2)  # Eq. (22)


def iapws2014_surface_tension(temperature_c):
    """Surface tension of pure water against air, IAPWS R1-76(2014).

    Parameters
    ----------
    temperature_c : numeric
        Temperature [degC]; valid from the triple point to the critical point.

    Returns
    -------
    numeric
        Surface tension [N m-1].

    Examples
    --------
    >>> round(float(iapws2014_surface_tension(20.0)) * 1e3, 2)
    72.74
    """
    tau = 1.0 - (as_float_array("temperature_c", temperature_c) + KELVIN) / T_CRIT
    return 235.8e-3 * tau**1.256 * (1.0 - 0.625 * tau)  # IAPWS R1-76(2014) Eq. (1)


def nayar2014_surface_tension(temperature_c, salinity):
    """Surface tension of sea water, Nayar et al. (2014) Eq. (6).

    Parameters
    ----------
    temperature_c : numeric
        Temperature [degC]; data range 1-92.
    salinity : numeric
        Salinity [g kg-1]; data range 0-131.

    Returns
    -------
    numeric
        Surface tension [N m-1].
    """
    t = as_float_array("temperature_c", temperature_c)
    s = as_float_array("salinity", salinity)
    return iapws2014_surface_tension(t) * (1.0 + 3.766e-4 * s + 2.347e-6 * s * t)  # Eq. (6)


class Liquid:
    """A liquid described only by its bulk and surface properties.

    Parameters
    ----------
    density : numeric
        [kg m-3], > 0.
    surface_tension : numeric
        Surface tension against air [N m-1], > 0.
    kinematic_viscosity : numeric, optional
        [m2 s-1], > 0.  Give this or ``dynamic_viscosity``.
    dynamic_viscosity : numeric, optional
        [Pa s], > 0.
    name : str
        Label used in outputs.

    Examples
    --------
    >>> oil = Liquid(density=870.0, surface_tension=0.030, kinematic_viscosity=1e-5)
    >>> round(oil.dynamic_viscosity, 4)
    0.0087
    """

    def __init__(self, density, surface_tension, kinematic_viscosity=None,
                 dynamic_viscosity=None, name="liquid"):
        self.name = name
        self.density = _sc(check_positive("density", density, allow_nan=False, unit="kg m-3"))
        self.surface_tension = _sc(check_positive("surface_tension", surface_tension,
                                                  allow_nan=False, unit="N m-1"))
        if (kinematic_viscosity is None) == (dynamic_viscosity is None):
            raise ShortwaveInputError("give exactly one of kinematic_viscosity or "
                                      "dynamic_viscosity")
        if kinematic_viscosity is not None:
            nu = check_positive("kinematic_viscosity", kinematic_viscosity, allow_nan=False)
            self.kinematic_viscosity = _sc(nu)
            self.dynamic_viscosity = _sc(nu * self.density)
        else:
            mu = check_positive("dynamic_viscosity", dynamic_viscosity, allow_nan=False)
            self.dynamic_viscosity = _sc(mu)
            self.kinematic_viscosity = _sc(mu / self.density)

    def permittivity(self, frequency_hz, model=None):
        """Not known for a generic liquid: raises ``ShortwaveInputError``."""
        raise ShortwaveInputError(f"{self.name}: no microwave permittivity model for this liquid")

    def __repr__(self):
        return (f"{type(self).__name__}(name={self.name!r}, density={self.density!r}, "
                f"surface_tension={self.surface_tension!r}, "
                f"kinematic_viscosity={self.kinematic_viscosity!r})")


def _sc(a):
    a = np.asarray(a, dtype=float)
    return float(a) if a.ndim == 0 else a


class Water(Liquid):
    """Sea water (or fresh water, salinity 0) at the surface, at atmospheric pressure.

    Parameters
    ----------
    temperature_c : numeric
        In-situ temperature [degC].  Correlations are checked for -2..40; outside
        that a :class:`ValidityWarning` names the range; outside -10..100 it is an error.
    salinity : numeric
        Absolute salinity [g kg-1] (practical salinity is close enough for the
        viscosity and tension correlations).  Checked 0..42 (warning), 0..160 (error).
    density, surface_tension, kinematic_viscosity, dynamic_viscosity : numeric, optional
        Override the correlation for that property (same units as :class:`Liquid`).
    name : str, optional
        Label used in outputs.

    Attributes
    ----------
    density : [kg m-3] TEOS-10 (``gsw.rho_t_exact`` at p = 0) [1]_.
    dynamic_viscosity : [Pa s] IAPWS 2008 [2]_ at S = 0, times the Sharqawy et al.
        (2010) Eq. (22) salinity factor [3]_.
    kinematic_viscosity : [m2 s-1] dynamic viscosity / density.
    surface_tension : [N m-1] IAPWS R1-76(2014) [4]_ with the Nayar et al. (2014)
        Eq. (6) salinity factor [5]_.

    Examples
    --------
    >>> w = Water(20.0, 35.0)
    >>> round(w.density, 1), round(w.surface_tension * 1e3, 2)
    (1024.6, 73.81)
    """

    def __init__(self, temperature_c=15.0, salinity=35.0, *, density=None,
                 surface_tension=None, kinematic_viscosity=None, dynamic_viscosity=None,
                 name=None):
        t = check_range("temperature_c", temperature_c, *HARD_T, unit="degC")
        s = check_range("salinity", salinity, *HARD_S, unit="g kg-1")
        _warn_range("temperature_c", t, -2.0, 40.0, "the sea-water property correlations")
        _warn_range("salinity", s, 0.0, 42.0, "TEOS-10 (oceanographic range)")
        self.temperature_c = _sc(t)
        self.salinity = _sc(s)
        self.name = name or ("fresh water" if np.all(s == 0) else "sea water")
        if kinematic_viscosity is not None and dynamic_viscosity is not None:
            raise ShortwaveInputError("give at most one of kinematic_viscosity or "
                                      "dynamic_viscosity")
        rho = (teos10_density(t, s) if density is None
               else check_positive("density", density, allow_nan=False))
        self.density = _sc(rho)
        if surface_tension is None:
            surface_tension = nayar2014_surface_tension(t, s)
        self.surface_tension = _sc(check_positive("surface_tension", surface_tension))
        if kinematic_viscosity is not None:
            nu = check_positive("kinematic_viscosity", kinematic_viscosity)
            self.kinematic_viscosity = _sc(nu)
            self.dynamic_viscosity = _sc(nu * rho)
        else:
            if dynamic_viscosity is None:
                mu_w = iapws2008_viscosity(t, teos10_density(t, 0.0 * s))
                dynamic_viscosity = sharqawy2010_viscosity(t, s, pure_water_viscosity=mu_w)
            mu = check_positive("dynamic_viscosity", dynamic_viscosity)
            self.dynamic_viscosity = _sc(mu)
            self.kinematic_viscosity = _sc(mu / rho)

    def permittivity(self, frequency_hz, model="meissner_wentz2004"):
        """Complex relative permittivity of this water at a microwave frequency.

        Returns ``eps' - 1j * eps''`` with ``eps'' > 0`` (engineering exp(+i omega t)
        convention, as in both source papers).  See :func:`shortwave.permittivity.permittivity`
        for models, validity and references.

        Parameters
        ----------
        frequency_hz : numeric
            Radar frequency [Hz].
        model : str
            ``"meissner_wentz2004"`` (default) or ``"klein_swift1977"``.
        """
        from .permittivity import permittivity
        # Both permittivity models use practical salinity (psu); S_P = S_A * 35 / 35.16504
        # for reference-composition sea water (IOC et al. 2010, Eq. 2.4.1).
        practical = np.asarray(self.salinity) * (35.0 / 35.16504)
        return permittivity(frequency_hz, self.temperature_c, practical, model=model)

    def __repr__(self):
        return (f"Water(temperature_c={self.temperature_c!r}, salinity={self.salinity!r}, "
                f"density={self.density!r}, surface_tension={self.surface_tension!r}, "
                f"kinematic_viscosity={self.kinematic_viscosity!r})")


SEAWATER = Water(15.0, 35.0)
"""Default water: 15 degC, 35 g/kg."""


def as_liquid(water):
    """Return ``water`` or the default :data:`SEAWATER` when it is None."""
    if water is None:
        return SEAWATER
    if not hasattr(water, "density") or not hasattr(water, "surface_tension"):
        raise ShortwaveInputError(f"water: expected a Water or Liquid, got {type(water).__name__}")
    return water
