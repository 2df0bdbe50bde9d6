"""Damping of short waves by surface films: monolayers, visco-elastic films and oil layers.

Linear waves on deep water whose surface carries a film.  Two kinds of film:

:class:`Monolayer`
    A film described by its complex surface dilational modulus ``E(omega)``
    (Lucassen-type film): purely elastic (``elasticity`` E0), with diffusional
    relaxation (``relaxation_frequency`` omega_D, Lucassen & van den Tempel 1972) and an
    added surface dilational viscosity (``dilational_viscosity`` kappa).  The film also
    lowers the surface tension by its film pressure Pi.
:class:`OilLayer`
    A layer of oil of finite thickness, viscosity, density, surface tension (oil-air) and
    interfacial tension (oil-water): the full linear two-layer problem.  Its thin-layer
    limit is a viscous film (:func:`thin_layer_film`).

**Conventions.**  Fields vary as ``exp(i(k x - omega t))``; water fills z < 0.
Temporal damping: real k, complex ``omega = omega_r - i Gamma``; ``Gamma`` [s-1] is the
amplitude decay rate (energy decays at ``2 Gamma``).  Spatial damping: real omega, complex
``k = k_r + i Delta``; ``Delta`` [m-1] is the amplitude decay rate along the direction of
travel.  Under this ``exp(-i omega t)`` convention a dissipative film has
**Im E <= 0**; papers following Lucassen write ``exp(+i omega t)`` and print the complex
conjugate.  The damping ratio is ``y = Gamma_film / Gamma_clean`` (temporal, same k) or
``Delta_film / Delta_clean`` (spatial, same omega), the clean surface being the same water
without the film, solved exactly (not the leading-order ``2 nu k^2``).

**Dispersion relation** (Lucassen-Reynders & Lucassen 1969; our sign convention)::

    [E k^2 - i omega mu (k + m)] [sigma k^2 + rho g - rho omega^2/k - i omega mu (k + m)]
        + omega^2 mu^2 (k - m)^2 = 0,        m = sqrt(k^2 - i omega rho / mu), Re m > 0

It has two roots near the real axis: the transverse (capillary-gravity, "Laplace") wave
and the longitudinal (Marangoni) wave, which is always strongly damped.  We solve it in
the equivalent form, free of cancellation for small E,

    G = sigma k^2 + rho g - rho omega^2 / k - i omega mu Z = 0,
    Z = [(k + m) E k^2 - 4 i omega mu k m] / [E k^2 - i omega mu (k + m)],

(Z = 4km/(k+m) for a clean surface, Z = k + m for an inextensible film) by Newton's method
with the analytic derivative, starting from the first-order perturbation of the inviscid
wave.  A root is accepted only if it stays within 30 % of the inviscid frequency
(wavenumber): the Marangoni root lies at least about 50 % away.  Otherwise the film
modulus is switched on gradually (``E -> s E``, s from 1e-6 to 1, adaptive steps) from
the clean surface, where the Marangoni root does not exist, so the transverse root is
followed continuously.  If that also fails, :class:`RootTrackingError` is raised; a
wrong root is never returned silently.

Validity: deep water, linear (small slope) waves, continuous film, wavenumbers
``1 <= k <= 2e4 rad m-1`` (:data:`K_RANGE`, roughly 0.5 Hz to a few kHz in sea water).

References
----------
.. [1] Lamb, H. (1932). Hydrodynamics, 6th ed., Cambridge Univ. Press, Art. 348-349
   (clean surface, Gamma = 2 nu k^2) and Art. 351 (inextensible film).
.. [2] Lucassen, J. (1968). Longitudinal capillary waves. Part 1: Theory. Trans. Faraday
   Soc. 64, 2221-2229.
.. [3] Lucassen-Reynders, E. H. and Lucassen, J. (1969). Properties of capillary waves.
   Adv. Colloid Interface Sci. 2, 347-395.
.. [4] Lucassen, J. and van den Tempel, M. (1972). Dynamic measurements of dilational
   properties of a liquid interface. Chem. Eng. Sci. 27, 1283-1291.
.. [5] Cini, R. and Lombardini, P. P. (1978). Damping effect of monolayers on surface
   wave motion in a liquid. J. Colloid Interface Sci. 65, 387-389.
.. [6] Alpers, W. and Huehnerfuss, H. (1989). The damping of ocean waves by surface
   films: a new look at an old problem. J. Geophys. Res. 94(C5), 6251-6265.
.. [7] Jenkins, A. D. and Jacobs, S. J. (1997). Wave damping by a thin layer of viscous
   fluid. Phys. Fluids 9, 1256-1264.
"""
from __future__ import annotations

import dataclasses
from dataclasses import dataclass, field

import numpy as np

from ._checks import (ShortwaveInputError, as_float_array, check_choice, check_nonnegative,
                      check_positive, scalar_or_array)
from .dispersion import GRAVITY, angular_frequency, wavenumber
from .water import Liquid, as_liquid

__all__ = ["Monolayer", "OilLayer", "PRESETS", "film_preset", "preset_names",
           "RootTrackingError", "FORMS", "K_RANGE", "ON_FAILURE",
           "dilational_modulus", "diffusional_modulus", "modulus_from_loss_angle",
           "relaxation_parameters", "thin_layer_film",
           "complex_frequency", "complex_wavenumber", "damping_rate", "damping_ratio",
           "damping_ratio_at_frequency", "inextensible_damping_rate",
           "resonance_elasticity"]

FORMS = ("temporal", "spatial")
"""Allowed ``form`` keys: damping in time at fixed k, or in space at fixed frequency."""

K_RANGE = (1.0, 2.0e4)
"""Valid wavenumbers [rad m-1] of the film-damping solvers.

Below 1 rad m-1 (waves longer than about 6 m, slower than about 0.5 Hz) film damping is
negligible against the other sources and sinks of wave energy and the deep-water,
monolayer picture is not what limits a result; above 2e4 rad m-1 (0.3 mm) the
weak-damping structure the root tracking relies on is lost.  (Common practice for the
lower end; the upper end is our numerical choice.)"""

TRACK_WINDOW = 0.3
"""A transverse root is accepted within this relative distance of the inviscid value."""


class RootTrackingError(RuntimeError):
    """The transverse (capillary-gravity) root could not be followed for some inputs."""


# ----------------------------------------------------------------------------------------
# Film descriptions
# ----------------------------------------------------------------------------------------

def _sc(a):
    a = np.asarray(a, dtype=float)
    return float(a) if a.ndim == 0 else a


@dataclass(frozen=True, eq=False)
class Monolayer:
    """A surface film described by its dilational modulus (Lucassen-type film).

    ``E(omega) = E0 / (1 + sqrt(i omega_D / omega)) - i omega kappa`` under the
    ``exp(-i omega t)`` convention (Im E <= 0 for a dissipative film).  Fields may be
    arrays; they broadcast against each other and against the wavenumbers.

    Parameters
    ----------
    elasticity : numeric
        E0, the limiting (high-frequency, Gibbs) dilational elasticity [N m-1], >= 0.
        0 gives a clean surface (apart from the film pressure).
    relaxation_frequency : numeric
        omega_D = D_b (dc/dGamma_s)^2, the diffusional exchange frequency with the bulk
        [rad s-1], >= 0; 0 for an insoluble (purely elastic) film.
    dilational_viscosity : numeric
        kappa, surface dilational viscosity [N s m-1 = Pa s m], >= 0.
    film_pressure : numeric
        Pi, the lowering of the surface tension by the film [N m-1]; the film-covered
        surface has tension sigma_water - Pi, which must stay > 0.  May be negative for
        an effective film whose tension exceeds that of water.
    name : str
        Label used in outputs.
    source : str
        Where the values come from.
    ranges : dict
        Literature range of each parameter (for presets), ``{field: (low, high)}``.

    Examples
    --------
    >>> film = Monolayer(elasticity=0.025, relaxation_frequency=1.0)
    >>> E = dilational_modulus(2 * np.pi * 5.0, film)
    >>> round(float(E.real) * 1e3, 2), round(float(E.imag) * 1e3, 2)
    (21.92, -2.46)
    """

    elasticity: object = 0.0
    relaxation_frequency: object = 0.0
    dilational_viscosity: object = 0.0
    film_pressure: object = 0.0
    name: str = "film"
    source: str = "user values"
    ranges: dict = field(default_factory=dict)

    def __post_init__(self):
        set_ = object.__setattr__
        set_(self, "elasticity", _sc(check_nonnegative("elasticity", self.elasticity,
                                                       unit="N m-1")))
        set_(self, "relaxation_frequency", _sc(check_nonnegative(
            "relaxation_frequency", self.relaxation_frequency, unit="rad s-1")))
        set_(self, "dilational_viscosity", _sc(check_nonnegative(
            "dilational_viscosity", self.dilational_viscosity, unit="N s m-1")))
        set_(self, "film_pressure", _sc(as_float_array("film_pressure", self.film_pressure)))
        if np.any(np.isinf(self.film_pressure)):
            raise ShortwaveInputError("film_pressure: infinite values are not allowed")

    def replace(self, **changes):
        """Return a copy with some fields changed (``dataclasses.replace``)."""
        return dataclasses.replace(self, **changes)


@dataclass(frozen=True, eq=False)
class OilLayer:
    """A layer of oil of finite thickness floating on the water (two-layer model).

    Parameters
    ----------
    thickness : numeric
        Layer thickness h [m], >= 0.  0 means no oil: the clean water surface.
    viscosity : numeric
        Dynamic viscosity of the oil mu_1 [Pa s], > 0 (1 mPa s = 1 cP).
    density : numeric
        Oil density rho_1 [kg m-3], > 0.
    surface_tension : numeric
        Oil-air surface tension sigma_a [N m-1], > 0.
    interfacial_tension : numeric
        Oil-water interfacial tension sigma_i [N m-1], > 0.
    name, source, ranges :
        As in :class:`Monolayer`.

    Notes
    -----
    Oil fills 0 < z < h, water z < 0, air is neglected; both liquids are viscous and the
    eight boundary conditions (kinematic, normal and tangential stress at the top;
    continuity of velocity and stress, kinematic condition at the interface) give an
    8 x 8 determinant whose zero is the dispersion relation (films.md Sec. 3; the physics
    of Jenkins & Jacobs 1997 [7]_ is its thin-layer limit).

    Examples
    --------
    >>> oil = OilLayer(thickness=1e-5, viscosity=0.0085, density=850.0,
    ...                surface_tension=0.027, interfacial_tension=0.020)
    >>> round(float(oil.viscosity / oil.density * 1e6), 1)   # kinematic, mm2 s-1
    10.0
    """

    thickness: object
    viscosity: object
    density: object = 850.0
    surface_tension: object = 0.027
    interfacial_tension: object = 0.020
    name: str = "oil layer"
    source: str = "user values"
    ranges: dict = field(default_factory=dict)

    def __post_init__(self):
        set_ = object.__setattr__
        set_(self, "thickness", _sc(check_nonnegative("thickness", self.thickness, unit="m")))
        set_(self, "viscosity", _sc(check_positive("viscosity", self.viscosity, unit="Pa s")))
        set_(self, "density", _sc(check_positive("density", self.density, unit="kg m-3")))
        set_(self, "surface_tension", _sc(check_positive("surface_tension",
                                                         self.surface_tension, unit="N m-1")))
        set_(self, "interfacial_tension", _sc(check_positive(
            "interfacial_tension", self.interfacial_tension, unit="N m-1")))

    def replace(self, **changes):
        """Return a copy with some fields changed (``dataclasses.replace``)."""
        return dataclasses.replace(self, **changes)


_MONO_SRC = ("E0 and omega_D: typical of the class, from memory (literature range): inside "
             "the ranges recalled, not verified, from Alpers & Huehnerfuss (1989, JGR 94(C5) "
             "6251, Table 1) and Gade et al. (1998, JGR 103(C2) 3167), whose tables could "
             "not be read")

PRESETS = {
    "oleyl-alcohol": Monolayer(
        elasticity=0.025, relaxation_frequency=1.0, film_pressure=0.031,
        name="oleyl-alcohol",
        source=("synthetic monomolecular slick, oleyl-alcohol type (typical values). "
                + _MONO_SRC + "; film pressure 31 mN/m from the 74 -> 43 mN/m drop measured "
                "at sea by Huehnerfuss, Alpers & Jones (1978, Radio Sci. 13, abstract)"),
        ranges={"elasticity": (0.010, 0.035), "relaxation_frequency": (0.1, 10.0),
                "film_pressure": (0.020, 0.035)}),
    "methyl-palmitate": Monolayer(
        elasticity=0.030, relaxation_frequency=0.1, film_pressure=0.015,
        name="methyl-palmitate",
        source=("synthetic monomolecular slick, methyl-palmitate (PME) type: the most elastic "
                "and least relaxing of the common slick substances (typical values). "
                + _MONO_SRC + "; film pressure typical of slicks, 5-30 mN/m (from memory)"),
        ranges={"elasticity": (0.010, 0.035), "relaxation_frequency": (0.1, 1.0),
                "film_pressure": (0.005, 0.030)}),
    "natural": Monolayer(
        elasticity=0.015, relaxation_frequency=1.0, film_pressure=0.005,
        name="natural",
        source=("natural (biogenic) sea-surface film (typical values): E0 5-30 mN/m, "
                "omega_D 0.1-10 rad/s (from memory, Alpers & Huehnerfuss 1989; Cini, "
                "Lombardini et al. field inversions, abstract only); film pressure a few mN/m"),
        ranges={"elasticity": (0.005, 0.030), "relaxation_frequency": (0.1, 10.0),
                "film_pressure": (0.001, 0.015)}),
    "mineral-oil": Monolayer(
        elasticity=0.010, relaxation_frequency=0.0, film_pressure=0.0,
        name="mineral-oil",
        source=("light mineral oil carrying surface-active impurities, as an effective "
                "elastic film: dilational modulus of order 0.01 N/m with the damping maximum "
                "near 8 Hz (Alpers & Huehnerfuss 1988, JGR 93(C4) 3642, abstract read; the "
                "preset reproduces the maximum at 8.4-9.5 Hz in 20-10 degC sea water), "
                "typical value; film pressure not given by the source, set to 0"),
        ranges={"elasticity": (0.005, 0.020)}),
    # Oil layers: suggested defaults inside the verified property ranges (films.md Sec. 8.5),
    # not measurements; thickness 10 micrometres (a continuous thin film) unless changed.
    "diesel": OilLayer(
        thickness=1e-5, viscosity=0.0025, density=840.0, surface_tension=0.027,
        interfacial_tension=0.025, name="diesel",
        source=("light refined oil, diesel-like (typical values inside published ranges: "
                "API density classes; oil-air tension 24-38 mN/m, Standard Handbook of "
                "Petroleum & Natural Gas Engineering ch. 5; viscosity 2-5 mm2/s, from memory, "
                "Fingas 2000); give your own thickness"),
        ranges={"thickness": (1e-7, 1e-3), "viscosity": (0.0017, 0.0042),
                "density": (830.0, 850.0)}),
    "light-crude": OilLayer(
        thickness=1e-5, viscosity=0.0085, density=850.0, surface_tension=0.027,
        interfacial_tension=0.020, name="light-crude",
        source=("light crude oil (typical values inside published ranges: > 31.1 API; "
                "10.7 mm2/s at 20 C for a 34.2 API crude; oil-air tension 24-38 mN/m); give "
                "your own thickness"),
        ranges={"thickness": (1e-7, 1e-2), "viscosity": (0.002, 0.05),
                "density": (780.0, 870.0)}),
    "medium-crude": OilLayer(
        thickness=1e-4, viscosity=0.090, density=900.0, surface_tension=0.030,
        interfacial_tension=0.022, name="medium-crude",
        source=("medium crude oil (typical values: 22.3-31.1 API, 870-920 kg/m3; viscosity "
                "from memory, Fingas 2000); give your own thickness"),
        ranges={"thickness": (1e-6, 1e-2), "viscosity": (0.02, 0.5),
                "density": (870.0, 920.0)}),
    "heavy-crude": OilLayer(
        thickness=1e-3, viscosity=4.8, density=960.0, surface_tension=0.033,
        interfacial_tension=0.025, name="heavy-crude",
        source=("heavy crude oil (typical values: 10-22.3 API, 920-1000 kg/m3; viscosity "
                "50-50 000 mPa s from memory, Fingas 2000); give your own thickness"),
        ranges={"thickness": (1e-5, 2e-2), "viscosity": (0.05, 50.0),
                "density": (920.0, 1000.0)}),
}
"""Film presets by name: typical values of a class of film, with ranges and sources.

Monolayers (Lucassen-type films): ``oleyl-alcohol``, ``methyl-palmitate``, ``natural``,
``mineral-oil``.  Oil layers (two-layer model): ``diesel``, ``light-crude``,
``medium-crude``, ``heavy-crude``.  The values are typical, not measured for any one
slick; pass your own with :class:`Monolayer` / :class:`OilLayer` or
``film_preset(name, field=value)``."""


def preset_names():
    """Return the names of the film presets, in a stable order.

    Examples
    --------
    >>> preset_names()[:2]
    ('oleyl-alcohol', 'methyl-palmitate')
    """
    return tuple(PRESETS)


def film_preset(name, **changes):
    """Return a film preset by name, optionally with some fields changed.

    Parameters
    ----------
    name : str
        One of :func:`preset_names` (case-insensitive; ``_`` and ``-`` are equivalent).
    **changes
        Fields to override, e.g. ``thickness=5e-6`` for an oil layer.

    Returns
    -------
    Monolayer or OilLayer

    Raises
    ------
    ShortwaveInputError
        Unknown name (the message lists the presets) or a bad field value.

    Examples
    --------
    >>> film_preset("light-crude", thickness=2e-6).thickness
    2e-06
    """
    key = str(name).strip().lower().replace("_", "-")
    if key not in PRESETS:
        raise ShortwaveInputError(f"film: unknown preset {name!r}; choose one of: "
                                  f"{', '.join(PRESETS)}")
    film = PRESETS[key]
    if changes:
        try:
            film = dataclasses.replace(film, **changes)
        except TypeError as exc:
            raise ShortwaveInputError(f"film {key}: {exc}") from None
    return film


# ----------------------------------------------------------------------------------------
# Dilational modulus
# ----------------------------------------------------------------------------------------

def diffusional_modulus(omega, elasticity, relaxation_frequency):
    """Dilational modulus of a film exchanging surfactant with the bulk by diffusion.

    Parameters
    ----------
    omega : numeric
        Angular frequency [rad s-1], > 0 (complex values are accepted: the formula is
        continued analytically, as the temporal solver needs).
    elasticity : numeric
        E0, limiting elasticity [N m-1], >= 0.
    relaxation_frequency : numeric
        omega_D [rad s-1], >= 0.

    Returns
    -------
    complex ndarray or complex
        E [N m-1], with Im E <= 0 (``exp(-i omega t)`` convention).

    Notes
    -----
    Lucassen & van den Tempel (1972) [4]_:
    ``E = E0 (1 + Omega - i Omega) / (1 + 2 Omega + 2 Omega^2)``, ``Omega = sqrt(omega_D /
    (2 omega))``, i.e. ``E = E0 / (1 + sqrt(i omega_D / omega))``.  |E| =
    E0 / sqrt(1 + 2 Omega + 2 Omega^2); the loss angle lies between 0 and 45 degrees.

    Examples
    --------
    >>> E = diffusional_modulus(2.0, 0.025, 4.0)    # Omega = 1
    >>> round(float(E.real) * 1e3, 3), round(float(E.imag) * 1e3, 3)
    (10.0, -5.0)
    """
    om = np.asarray(omega)
    e0 = check_nonnegative("elasticity", elasticity, unit="N m-1")
    wd = check_nonnegative("relaxation_frequency", relaxation_frequency, unit="rad s-1")
    if not np.iscomplexobj(om):
        om = check_positive("omega", om, unit="rad s-1")
    q = np.sqrt(1j * wd / (om + 0j))
    return scalar_or_array(e0 / (1.0 + q))  # Lucassen & van den Tempel (1972)


def dilational_modulus(omega, film):
    """Complex surface dilational modulus E(omega) of a :class:`Monolayer` [N m-1].

    ``E = E0 / (1 + sqrt(i omega_D / omega)) - i omega kappa`` (diffusional relaxation,
    Lucassen & van den Tempel 1972 [4]_, plus the Boussinesq-Scriven surface dilational
    viscosity).  Im E <= 0 under the ``exp(-i omega t)`` convention.

    Parameters
    ----------
    omega : numeric
        Angular frequency [rad s-1], > 0.
    film : Monolayer

    Returns
    -------
    complex

    Examples
    --------
    >>> E = dilational_modulus(10.0, Monolayer(elasticity=0.01, dilational_viscosity=1e-4))
    >>> round(float(E.real), 4), round(float(E.imag), 4)
    (0.01, -0.001)
    """
    if not isinstance(film, Monolayer):
        raise ShortwaveInputError(f"film: a Monolayer is needed, got {type(film).__name__}")
    om = np.asarray(omega)
    if not np.iscomplexobj(om):
        om = check_positive("omega", om, unit="rad s-1")
    e, _ = _modulus(om + 0j, np.asarray(film.elasticity, float),
                    np.asarray(film.relaxation_frequency, float),
                    np.asarray(film.dilational_viscosity, float))
    return scalar_or_array(e)


def _modulus(om, e0, wd, kap):
    """E(omega) and dE/domega for complex omega (principal square root)."""
    q = np.sqrt(1j * wd / om)
    e = e0 / (1.0 + q) - 1j * om * kap
    de = e0 * q / (2.0 * om * (1.0 + q) ** 2) - 1j * kap
    return e, de


def modulus_from_loss_angle(modulus, loss_angle_deg):
    """Complex modulus from a published magnitude and loss angle.

    Parameters
    ----------
    modulus : numeric
        |E| [N m-1], >= 0.
    loss_angle_deg : numeric
        Loss angle theta [degree], 0..90, as in Lucassen's ``E = |E| exp(+i theta)``
        (``exp(+i omega t)`` papers).

    Returns
    -------
    complex
        ``|E| exp(-i theta)`` in our ``exp(-i omega t)`` convention.

    Notes
    -----
    A "phase angle" phi near 180 degrees (tension oscillation against elevation or area
    compression) corresponds to a loss angle 180 - phi; check the definition of the paper
    before converting (films.md Sec. 8.1).

    Examples
    --------
    >>> E = modulus_from_loss_angle(0.014, 4.0)
    >>> round(float(E.real) * 1e3, 2), round(float(E.imag) * 1e3, 2)
    (13.97, -0.98)
    """
    mod = check_nonnegative("modulus", modulus, unit="N m-1")
    th = np.deg2rad(as_float_array("loss_angle_deg", loss_angle_deg))
    if np.any((th < 0) | (th > np.pi / 2)):
        raise ShortwaveInputError("loss_angle_deg: valid range is [0, 90] degree")
    return scalar_or_array(mod * np.exp(-1j * th))


def relaxation_parameters(modulus, loss_angle_deg, omega):
    """Diffusional-model parameters (E0, omega_D) matching |E| and a loss angle at omega.

    Parameters
    ----------
    modulus : numeric
        |E| [N m-1], >= 0.
    loss_angle_deg : numeric
        Loss angle [degree], 0 <= theta < 45 (the diffusional model cannot exceed 45).
    omega : numeric
        Angular frequency at which |E| and theta hold [rad s-1], > 0.

    Returns
    -------
    elasticity : numeric
        E0 = |E| sqrt(1 + 2 Omega + 2 Omega^2) [N m-1].
    relaxation_frequency : numeric
        omega_D = 2 omega Omega^2 [rad s-1], with Omega = tan(theta) / (1 - tan(theta)).

    Notes
    -----
    Inverts :func:`diffusional_modulus` (films.md Sec. 8.1).

    Examples
    --------
    >>> e0, wd = relaxation_parameters(0.014, 4.0, 2 * np.pi)
    >>> round(float(e0) * 1e3, 2), round(float(wd), 4)
    (15.09, 0.071)
    """
    mod = check_nonnegative("modulus", modulus, unit="N m-1")
    th = as_float_array("loss_angle_deg", loss_angle_deg)
    if np.any((th < 0) | (th >= 45)):
        raise ShortwaveInputError("loss_angle_deg: the diffusional model needs 0 <= theta "
                                  "< 45 degree")
    om = check_positive("omega", omega, unit="rad s-1")
    t = np.tan(np.deg2rad(th))
    big = t / (1.0 - t)
    return (scalar_or_array(mod * np.sqrt(1 + 2 * big + 2 * big**2)),
            scalar_or_array(2 * om * big**2))


def thin_layer_film(oil, water=None):
    """The viscous film equivalent to a thin oil layer.

    Parameters
    ----------
    oil : OilLayer
    water : Water or Liquid, optional
        Supplies sigma_water for the film pressure (default sea water, 15 degC, 35 g/kg).

    Returns
    -------
    Monolayer
        ``elasticity = 0``, ``dilational_viscosity = 4 mu_1 h`` and
        ``film_pressure = sigma_water - (sigma_a + sigma_i)`` (the spreading coefficient),
        so that the surface carries E = -4 i omega mu_1 h and tension sigma_a + sigma_i.

    Notes
    -----
    A thin sheet (h much smaller than 1/k and than the oil boundary-layer thickness
    sqrt(2 nu_1 / omega)) resists stretching like a 2-D fluid of dilational viscosity
    4 mu_1 h (the extensional, Trouton-type viscosity of a sheet; films.md Sec. 3, checked
    there against the two-layer model).

    Examples
    --------
    >>> oil = OilLayer(thickness=1e-6, viscosity=1.0)
    >>> round(thin_layer_film(oil).dilational_viscosity * 1e6, 3)
    4.0
    """
    if not isinstance(oil, OilLayer):
        raise ShortwaveInputError(f"oil: an OilLayer is needed, got {type(oil).__name__}")
    w = as_liquid(water)
    return Monolayer(elasticity=0.0,
                     dilational_viscosity=4.0 * np.asarray(oil.viscosity) * oil.thickness,
                     film_pressure=np.asarray(w.surface_tension)
                     - (np.asarray(oil.surface_tension) + oil.interfacial_tension),
                     name=f"{oil.name} (thin-layer limit)", source=oil.source)


# ----------------------------------------------------------------------------------------
# Helper formulas (leading order)
# ----------------------------------------------------------------------------------------

def inextensible_damping_rate(k, water=None):
    """Leading-order temporal damping rate under an inextensible film [s-1].

    Parameters
    ----------
    k : numeric
        Wavenumber [rad m-1], > 0.
    water : Water or Liquid, optional

    Returns
    -------
    numeric
        Gamma_inext = k sqrt(nu omega / 8) (amplitude rate), omega the inviscid frequency.

    Notes
    -----
    Lamb (1932) Art. 351 [1]_; Lucassen (1968) [2]_ (from memory).  The exact root of the
    film relation with E -> infinity lies a few to 10 % higher in y (films.md Sec. 1.4),
    because the exact clean damping is below 2 nu k^2.

    Examples
    --------
    >>> from shortwave.water import Water
    >>> round(float(inextensible_damping_rate(100.0, Water(20, 35))), 4)
    0.2064
    """
    w = as_liquid(water)
    om = np.asarray(angular_frequency(k, w))
    return scalar_or_array(np.asarray(k, float) * np.sqrt(
        np.asarray(w.kinematic_viscosity) * om / 8.0))  # Lamb (1932) Art. 351


def resonance_elasticity(k, water=None):
    """Elasticity at which an elastic film damps waves of wavenumber k most [N m-1].

    Parameters
    ----------
    k : numeric
        Wavenumber [rad m-1], > 0.
    water : Water or Liquid, optional

    Returns
    -------
    numeric
        E_res = 1.37 sqrt(mu rho omega^3) / k^2, where the Marangoni wave resonates with the
        capillary-gravity wave (Lucassen 1968 [2]_; Cini & Lombardini 1978 [5]_; the
        coefficient 1.37 from films.md Sec. 1.5, an independent re-computation).  There,
        y is about twice the inextensible value.

    Examples
    --------
    >>> from shortwave.water import Water
    >>> k = float(wavenumber(2 * np.pi * 10.0, Water(20, 35)))
    >>> round(float(resonance_elasticity(k, Water(20, 35))) * 1e3, 1)   # mN/m at 10 Hz
    10.2
    """
    w = as_liquid(water)
    om = np.asarray(angular_frequency(k, w))
    return scalar_or_array(1.37 * np.sqrt(np.asarray(w.dynamic_viscosity)
                                          * np.asarray(w.density) * om**3)
                           / np.asarray(k, float) ** 2)


# ----------------------------------------------------------------------------------------
# Solvers
# ----------------------------------------------------------------------------------------

def _check_k(k, name="k"):
    k = check_positive(name, k, unit="rad m-1")
    v = k[np.isfinite(k)]
    if v.size and (v.min() < K_RANGE[0] or v.max() > K_RANGE[1]):
        raise ShortwaveInputError(
            f"{name}: valid range for film damping is [{K_RANGE[0]:g}, {K_RANGE[1]:g}] "
            f"rad m-1, got values from {v.min():g} to {v.max():g}")
    return k


def _check_omega(omega, water, name="omega", hz=False):
    """Check an angular frequency (or, with ``hz``, a frequency) against the valid range."""
    x = check_positive(name, omega, unit="Hz" if hz else "rad s-1")
    om = 2 * np.pi * x if hz else x
    w = as_liquid(water)
    lo = np.min(np.asarray(angular_frequency(K_RANGE[0], w)))
    hi = np.max(np.asarray(angular_frequency(K_RANGE[1], w)))
    v = om[np.isfinite(om)]
    if v.size and (v.min() < lo or v.max() > hi):
        side = "below" if v.min() < lo else "above"
        bad = v.min() if side == "below" else v.max()
        scale, unit = (2 * np.pi, "Hz") if hz else (1.0, "rad s-1")
        raise ShortwaveInputError(
            f"{name}: {bad / scale:.4g} {unit} is {side} the valid range of film damping, "
            f"{lo / scale:.3g}..{hi / scale:.4g} {unit} (wavenumbers {K_RANGE[0]:g}.."
            f"{K_RANGE[1]:g} rad m-1)")
    return om


def _newton(step, z, sel, extra, maxiter, tol_rel=1e-10, tol_abs=1e-14):
    """Vectorised Newton iteration z <- z - step(z, sel, extra) on the active elements."""
    z = z.copy()
    n = z.size
    its = np.zeros(n, dtype=np.int64)
    conv = np.zeros(n, dtype=bool)
    act = np.arange(n)
    for _ in range(maxiter):
        if act.size == 0:
            break
        st = step(z[act], sel[act], None if extra is None else extra[act])
        ok = np.isfinite(st)
        zn = z[act] - np.where(ok, st, 0.0)
        z[act] = zn
        its[act] += 1
        done = ok & (np.abs(st) <= np.maximum(tol_rel * np.abs(zn.imag), tol_abs * np.abs(zn)))
        conv[act[done]] = True
        act = act[ok & ~done]
    return z, conv, its


def _track(step, z_start, sel, s_start, ref, sign, jump=0.05, maxsteps=4000,
           tol=(1e-10, 1e-14)):
    """Continue a root from scale s_start to 1 (per element), adaptive log steps.

    ``step(z, sel, s)`` is the Newton step at continuation parameter s.  A step is accepted
    when Newton converges, the root keeps the sign of its imaginary part (``sign``) and it
    moves by at most ``jump * ref``.  Returns (z, ok, iterations).
    """
    n = z_start.size
    z = z_start.copy()
    s = s_start.astype(float).copy()
    ratio = np.full(n, 10 ** 0.25)
    ok = np.ones(n, dtype=bool)
    its = np.zeros(n, dtype=np.int64)
    for _ in range(maxsteps):
        act = np.flatnonzero(ok & (s < 1.0))
        if act.size == 0:
            break
        s_try = np.minimum(s[act] * ratio[act], 1.0)
        zt, conv, it = _newton(step, z[act], sel[act], s_try, maxiter=12, tol_rel=tol[0],
                               tol_abs=tol[1])
        its[act] += it
        good = (conv & (np.sign(zt.imag) == sign) & (np.abs(zt.imag) < zt.real)
                & (np.abs(zt - z[act]) <= jump * ref[act]))
        ga, ba = act[good], act[~good]
        z[ga] = zt[good]
        s[ga] = s_try[good]
        ratio[ga] = np.minimum(ratio[ga] ** 1.5, 10.0)
        ratio[ba] = np.sqrt(ratio[ba])
        ok[ba[ratio[ba] < 1.0 + 1e-5]] = False
    ok &= s >= 1.0
    return z, ok, its


class _FilmProblem:
    """Flattened parameters of the film dispersion relation (1-D arrays)."""

    def __init__(self, x, e0, wd, kap, sig, rho, mu, g):
        self.x, self.e0, self.wd, self.kap = x, e0, wd, kap
        self.sig, self.rho, self.mu, self.g = sig, rho, mu, g

    def z_of(self, om, k, e, i):
        m = np.sqrt(k * k - 1j * om * self.rho[i] / self.mu[i])  # Re m > 0 (principal root)
        ek2 = e * k * k
        num = (k + m) * ek2 - 4j * om * self.mu[i] * k * m
        den = ek2 - 1j * om * self.mu[i] * (k + m)
        return m, num, den

    def step_temporal(self, om, i, s):
        k = self.x[i]
        rho, mu = self.rho[i], self.mu[i]
        e, de = _modulus(om, self.e0[i], self.wd[i], self.kap[i])
        if s is not None:
            e, de = e * s, de * s
        m, num, den = self.z_of(om, k, e, i)
        z = num / den
        g = self.sig[i] * k * k + rho * self.g - rho * om * om / k - 1j * om * mu * z  # Eq. (1)
        dm = -1j * rho / (2.0 * mu * m)
        dnum = dm * e * k * k + (k + m) * de * k * k - 4j * mu * k * m - 4j * om * mu * k * dm
        dden = de * k * k - 1j * mu * (k + m) - 1j * om * mu * dm
        dz = (dnum - z * dden) / den
        dg = -2.0 * rho * om / k - 1j * mu * z - 1j * om * mu * dz
        return g / dg

    def step_spatial(self, k, i, s):
        om = self.x[i]
        rho, mu = self.rho[i], self.mu[i]
        e, _ = _modulus(om + 0j, self.e0[i], self.wd[i], self.kap[i])
        if s is not None:
            e = e * s
        m, num, den = self.z_of(om, k, e, i)
        z = num / den
        g = self.sig[i] * k * k + rho * self.g - rho * om * om / k - 1j * om * mu * z  # Eq. (1)
        dm = k / m
        dnum = (1 + dm) * e * k * k + 2 * (k + m) * e * k - 4j * om * mu * (m + k * dm)
        dden = 2 * e * k - 1j * om * mu * (1 + dm)
        dz = (dnum - z * dden) / den
        dg = 2 * self.sig[i] * k + rho * om * om / (k * k) - 1j * om * mu * dz
        return g / dg

    def guess(self, mode, i, s=None):
        """Inviscid root and its first-order viscous/film correction."""
        rho, mu, sig, g = self.rho[i], self.mu[i], self.sig[i], self.g
        liq = _liquid(rho, sig, mu)
        if mode == "temporal":
            k = self.x[i]
            om0 = np.asarray(angular_frequency(k, liq, gravity=g), dtype=float)
            e, _ = _modulus(om0 + 0j, self.e0[i], self.wd[i], self.kap[i])
            e = e if s is None else e * s
            _, num, den = self.z_of(om0 + 0j, k, e, i)
            return om0, om0 - 1j * k * mu * (num / den) / (2.0 * rho)
        om = self.x[i]
        k0 = np.asarray(wavenumber(om, liq, gravity=g), dtype=float)
        e, _ = _modulus(om + 0j, self.e0[i], self.wd[i], self.kap[i])
        e = e if s is None else e * s
        _, num, den = self.z_of(om, k0 + 0j, e, i)
        dt = 2 * sig * k0 + rho * om * om / (k0 * k0)
        return k0, k0 + 1j * om * mu * (num / den) / dt


def _liquid(rho, sig, mu):
    return Liquid(density=rho, surface_tension=sig, dynamic_viscosity=mu)


def _solve_film(prob, mode, method="auto"):
    """Transverse root of every element of a _FilmProblem.

    Returns (z, iterations, continued, failed); failed elements hold an untracked value.
    """
    n = prob.x.size
    step = prob.step_temporal if mode == "temporal" else prob.step_spatial
    sign = -1.0 if mode == "temporal" else 1.0
    sel = np.arange(n)
    ref, z0 = prob.guess(mode, sel)
    z = np.full(n, complex(np.nan, np.nan))
    its = np.zeros(n, dtype=np.int64)
    todo = np.ones(n, dtype=bool)
    failed = np.zeros(n, dtype=bool)
    if method == "auto":
        z, conv, its = _newton(step, z0, sel, None, maxiter=40)
        good = (conv & (np.sign(z.imag) == sign)
                & (np.abs(z - ref) <= TRACK_WINDOW * ref))
        todo = ~good
    cont = np.flatnonzero(todo)
    if cont.size:
        s0 = np.full(cont.size, 1e-6)
        _, zs = prob.guess(mode, cont, s0)
        zs, conv, it0 = _newton(step, zs, cont, s0, maxiter=40)
        zt, ok, it1 = _track(step, zs, cont, s0, ref[cont], sign)
        ok &= conv & (np.abs(zt - ref[cont]) <= TRACK_WINDOW * ref[cont])
        its[cont] += it0 + it1
        z[cont] = zt
        failed[cont[~ok]] = True
    return z, its, todo, failed


# ---- oil layer --------------------------------------------------------------------------

class _OilProblem:
    """Flattened parameters of the two-layer (oil over water) problem."""

    def __init__(self, x, h, mu1, rho1, sa, si, rho2, mu2, g):
        self.x, self.h, self.mu1, self.rho1 = x, h, mu1, rho1
        self.sa, self.si, self.rho2, self.mu2, self.g = sa, si, rho2, mu2, g

    def matrix(self, om, k, i, h):
        """The 8 x 8 matrix of films.md Sec. 3 for columns (A1, A2, B1, B2, A3, B3, z1, z2)."""
        r1, r2, u1, u2 = self.rho1[i], self.rho2[i], self.mu1[i], self.mu2[i]
        sa, si, g = self.sa[i], self.si[i], self.g
        m1 = np.sqrt(k * k - 1j * om * r1 / u1)
        m2 = np.sqrt(k * k - 1j * om * r2 / u2)
        ek = np.exp(-k * h)
        em = np.exp(-m1 * h)
        n = np.broadcast(om, k).size
        M = np.zeros((n, 8, 8), dtype=complex)
        ik = 1j * k
        # 1. kinematic at the top (z = h): w1 + i omega zeta1 = 0
        M[:, 0, 0] = k
        M[:, 0, 1] = -k * ek
        M[:, 0, 2] = -ik
        M[:, 0, 3] = -ik * em
        M[:, 0, 6] = 1j * om
        # 2. normal stress at the top
        M[:, 1, 0] = -1j * om * r1 + 2 * u1 * k * k
        M[:, 1, 1] = (-1j * om * r1 + 2 * u1 * k * k) * ek
        M[:, 1, 2] = -2j * u1 * k * m1
        M[:, 1, 3] = 2j * u1 * k * m1 * em
        M[:, 1, 6] = r1 * g + sa * k * k
        # 3. no shear stress at the top
        M[:, 2, 0] = 2j * k * k
        M[:, 2, 1] = -2j * k * k * ek
        M[:, 2, 2] = m1 * m1 + k * k
        M[:, 2, 3] = (m1 * m1 + k * k) * em
        # 4. u1 = u2 at z = 0
        M[:, 3, 0] = ik * ek
        M[:, 3, 1] = ik
        M[:, 3, 2] = m1 * em
        M[:, 3, 3] = -m1
        M[:, 3, 4] = -ik
        M[:, 3, 5] = -m2
        # 5. w1 = w2 at z = 0
        M[:, 4, 0] = k * ek
        M[:, 4, 1] = -k
        M[:, 4, 2] = -ik * em
        M[:, 4, 3] = -ik
        M[:, 4, 4] = -k
        M[:, 4, 5] = ik
        # 6. kinematic at the interface
        M[:, 5, 4] = k
        M[:, 5, 5] = -ik
        M[:, 5, 7] = 1j * om
        # 7. normal-stress jump at the interface
        M[:, 6, 0] = (1j * om * r1 - 2 * u1 * k * k) * ek
        M[:, 6, 1] = 1j * om * r1 - 2 * u1 * k * k
        M[:, 6, 2] = 2j * u1 * k * m1 * em
        M[:, 6, 3] = -2j * u1 * k * m1
        M[:, 6, 4] = -1j * om * r2 + 2 * u2 * k * k
        M[:, 6, 5] = -2j * u2 * k * m2
        M[:, 6, 7] = (r2 - r1) * g + si * k * k
        # 8. shear-stress continuity at the interface
        M[:, 7, 0] = 2j * u1 * k * k * ek
        M[:, 7, 1] = -2j * u1 * k * k
        M[:, 7, 2] = u1 * (m1 * m1 + k * k) * em
        M[:, 7, 3] = u1 * (m1 * m1 + k * k)
        M[:, 7, 4] = -2j * u2 * k * k
        M[:, 7, 5] = -u2 * (m2 * m2 + k * k)
        return M

    def _step(self, z, i, s, temporal):
        h = self.h[i] if s is None else self.h[i] * s
        d = 1e-6 * np.abs(z)
        if temporal:
            k = self.x[i]
            M = self.matrix(z, k, i, h)
            dM = (self.matrix(z + d, k, i, h) - self.matrix(z - d, k, i, h)) / (2 * d)[:, None, None]
        else:
            om = self.x[i]
            M = self.matrix(om, z, i, h)
            dM = (self.matrix(om, z + d, i, h) - self.matrix(om, z - d, i, h)) / (2 * d)[:, None, None]
        # equilibrate rows and columns (leaves tr(M^-1 M') unchanged)
        r = 1.0 / np.max(np.abs(M), axis=2, keepdims=True)
        M, dM = M * r, dM * r
        c = 1.0 / np.max(np.abs(M), axis=1, keepdims=True)
        M, dM = M * c, dM * c
        with np.errstate(all="ignore"):
            try:
                X = np.linalg.solve(M, dM)
            except np.linalg.LinAlgError:   # an exactly singular M: we sit on a root
                X = np.linalg.solve(M + 1e-15 * np.eye(8), dM)
            tr = np.trace(X, axis1=1, axis2=2)
            # Newton step on det M (Jacobi's formula); an exactly singular M is a root
            return np.where(np.isfinite(tr), 1.0 / tr, 0.0)

    def step_temporal(self, z, i, s):
        return self._step(z, i, s, True)

    def step_spatial(self, z, i, s):
        return self._step(z, i, s, False)


_OIL_CHUNK = 20000
_OIL_TOL = (1e-8, 1e-13)   # Newton on det M with a finite-difference M': a little looser


def _solve_oil(prob, mode, method="auto"):
    """Surface-mode root of the two-layer problem, tracked from the thin-layer film.

    Returns (z, iterations, continued, failed), processed in chunks to bound memory.
    """
    n = prob.x.size
    out = (np.full(n, complex(np.nan, np.nan)), np.zeros(n, dtype=np.int64),
           np.zeros(n, dtype=bool), np.zeros(n, dtype=bool))
    for a in range(0, n, _OIL_CHUNK):
        sl = np.arange(a, min(n, a + _OIL_CHUNK))
        for arr, val in zip(out, _solve_oil_chunk(prob, mode, sl, method)):
            arr[sl] = val
    return out


def _thin_film_problem(prob, sel, h):
    """The equivalent viscous film (E = -4 i omega mu_1 h, tension sigma_a + sigma_i)."""
    return _FilmProblem(prob.x[sel], np.zeros(sel.size), np.zeros(sel.size),
                        4.0 * prob.mu1[sel] * h, prob.sa[sel] + prob.si[sel],
                        prob.rho2[sel], prob.mu2[sel], prob.g)


def _solve_oil_chunk(prob, mode, sel, method):
    step = prob.step_temporal if mode == "temporal" else prob.step_spatial
    sign = -1.0 if mode == "temporal" else 1.0
    n = sel.size
    h = prob.h[sel]
    ref, _ = _thin_film_problem(prob, sel, h).guess(mode, np.arange(n))
    # The thin-layer film is a good start when h << 1/k and h << the oil boundary layer
    # sqrt(2 nu_1 / omega); thicker layers are reached by continuation in h from there.
    om_r, k_r = (ref, prob.x[sel]) if mode == "temporal" else (prob.x[sel], ref)
    h_thin = 0.05 * np.minimum(1.0 / k_r, np.sqrt(2 * prob.mu1[sel] / prob.rho1[sel] / om_r))
    h0 = np.minimum(h_thin, h)
    s0 = h0 / h
    zf, its, _, failed = _solve_film(_thin_film_problem(prob, sel, h0), mode)
    z, conv, it = _newton(step, zf, sel, s0, maxiter=30, tol_rel=_OIL_TOL[0],
                          tol_abs=_OIL_TOL[1])
    its += it
    failed |= ~conv | (np.abs(z - zf) > 0.05 * ref) | (np.sign(z.imag) != sign)
    cont = ~failed & (s0 < 1.0)
    c = np.flatnonzero(cont)
    if c.size:
        zc, ok, it1 = _track(step, z[c], sel[c], s0[c], ref[c], sign, jump=0.1,
                             tol=_OIL_TOL)
        z[c] = zc
        its[c] += it1
        failed[c[~ok]] = True
    failed |= ~(np.abs(z.imag) < z.real)   # overdamped: no propagating wave
    return z, its, cont, failed


# ---- public solvers ---------------------------------------------------------------------

def _film_or_clean(film):
    if film is None or isinstance(film, (Monolayer, OilLayer)):
        return film
    if isinstance(film, str):
        return film_preset(film)
    raise ShortwaveInputError(f"film: expected None, a preset name, a Monolayer or an "
                              f"OilLayer, got {type(film).__name__}")


ON_FAILURE = ("raise", "nan")
"""What to do where the transverse root cannot be followed: raise
:class:`RootTrackingError` (default) or return NaN there with a ``RuntimeWarning``."""


def _solve(x, film, water, mode, method="auto", on_failure="raise", gravity=GRAVITY):
    """Solve for the transverse root at every x; returns (root array, info dict)."""
    film = _film_or_clean(film)
    method = check_choice("method", method, ("auto", "continuation"))
    on_failure = check_choice("on_failure", on_failure, ON_FAILURE)
    w = as_liquid(water)
    rho, mu, sig_w = (np.asarray(w.density, float), np.asarray(w.dynamic_viscosity, float),
                      np.asarray(w.surface_tension, float))
    if isinstance(film, OilLayer):
        arrs = np.broadcast_arrays(x, film.thickness, film.viscosity, film.density,
                                   film.surface_tension, film.interfacial_tension, rho, mu,
                                   sig_w)
        xf, h, mu1, rho1, sa, si, rho2, mu2, sw = (np.ravel(a).astype(float) for a in arrs)
        nan = np.isnan(xf) | np.isnan(h) | np.isnan(mu1) | np.isnan(rho1) | np.isnan(sa) \
            | np.isnan(si)
        groups = [(~nan & (h == 0), lambda i: _solve_film(_FilmProblem(
                      xf[i], 0 * h[i], 0 * h[i], 0 * h[i], sw[i], rho2[i], mu2[i], gravity),
                      mode, method)),
                  (~nan & (h > 0), lambda i: _solve_oil(_OilProblem(
                      xf[i], h[i], mu1[i], rho1[i], sa[i], si[i], rho2[i], mu2[i], gravity),
                      mode, method))]
    else:
        if film is None:
            film = Monolayer(name="clean")
        arrs = np.broadcast_arrays(x, film.elasticity, film.relaxation_frequency,
                                   film.dilational_viscosity, film.film_pressure, rho, mu,
                                   sig_w)
        xf, e0, wd, kap, pi, rh, mu_, sw = (np.ravel(a).astype(float) for a in arrs)
        sig = sw - pi
        fin = sig[np.isfinite(sig)]
        if fin.size and np.min(fin) <= 0:
            raise ShortwaveInputError(
                f"film_pressure: must be below the surface tension of the water "
                f"({np.min(sw):.4g} N m-1); the film-covered tension would be "
                f"{np.min(fin):.4g} N m-1")
        nan = np.isnan(xf) | np.isnan(e0) | np.isnan(wd) | np.isnan(kap) | np.isnan(sig)
        groups = [(~nan, lambda i: _solve_film(_FilmProblem(
            xf[i], e0[i], wd[i], kap[i], sig[i], rh[i], mu_[i], gravity), mode, method))]
    shape = arrs[0].shape
    n = xf.size
    root = np.full(n, complex(np.nan, np.nan))
    its = np.zeros(n, dtype=np.int64)
    cont = np.zeros(n, dtype=bool)
    failed = np.zeros(n, dtype=bool)
    for mask, solver in groups:
        idx = np.flatnonzero(mask)
        if idx.size:
            root[idx], its[idx], cont[idx], failed[idx] = solver(idx)
    if np.any(failed):
        j = np.flatnonzero(failed)[0]
        what = "k" if mode == "temporal" else "omega"
        msg = (f"film damping: the capillary-gravity root could not be followed for "
               f"{np.count_nonzero(failed)} of {n} inputs (first: {what} = {xf[j]:.6g} "
               f"{'rad m-1' if mode == 'temporal' else 'rad s-1'}, film {_describe(film, j, arrs)}); "
               "the wave is overdamped there or the damping is too strong for the "
               "weak-damping solver")
        if on_failure == "raise":
            raise RootTrackingError(msg)
        import warnings
        warnings.warn(msg + "; NaN returned there", RuntimeWarning, stacklevel=3)
        root[failed] = complex(np.nan, np.nan)
    info = {"iterations": its.reshape(shape), "continued": cont.reshape(shape),
            "failed": failed.reshape(shape)}
    return root.reshape(shape), info


def _describe(film, j, arrs):
    vals = [np.ravel(a)[j] for a in arrs[1:6]]
    if isinstance(film, OilLayer):
        return (f"{film.name!r}: thickness {vals[0]:.3g} m, viscosity {vals[1]:.3g} Pa s, "
                f"density {vals[2]:.4g} kg m-3")
    return (f"{film.name!r}: E0 {vals[0]:.4g} N m-1, omega_D {vals[1]:.4g} rad s-1, "
            f"kappa {vals[2]:.3g} N s m-1")


def complex_frequency(k, film=None, water=None, *, method="auto", on_failure="raise",
                      full_output=False):
    """Complex angular frequency of the capillary-gravity wave at real wavenumber k.

    Parameters
    ----------
    k : numeric
        Wavenumber [rad m-1], within :data:`K_RANGE`.
    film : Monolayer, OilLayer, str or None
        The film (a preset name is accepted); None for the clean surface.
    water : Water or Liquid, optional
        Default sea water, 15 degC, 35 g/kg.
    method : {"auto", "continuation"}
        ``"auto"``: Newton from the first-order estimate, with continuation in E only where
        needed; ``"continuation"``: always switch the film on gradually (slower; the
        reference the fast path is tested against).  Oil layers are always followed
        from their thin-layer limit by continuation in thickness where needed.
    on_failure : {"raise", "nan"}
        Where the root cannot be followed: raise :class:`RootTrackingError` (default), or
        return NaN there and warn (``RuntimeWarning``).
    full_output : bool
        Also return ``{"iterations": ..., "continued": ..., "failed": ...}`` (Newton
        iterations per element, where continuation was used, where tracking failed).

    Returns
    -------
    complex ndarray or complex
        omega = omega_r - i Gamma [rad s-1]; Gamma > 0 is the amplitude damping rate.

    Raises
    ------
    RootTrackingError
        The transverse root could not be followed (never a wrong root silently).

    Notes
    -----
    Roots of Eq. (1) of the module docstring (Lucassen-Reynders & Lucassen 1969 [3]_, in
    the ``exp(-i omega t)`` convention), or of the two-layer determinant for an
    :class:`OilLayer`.  For a clean surface Gamma -> 2 nu k^2 (1 - (nu k^2/omega)^(1/2)/sqrt 2)
    (Lamb 1932 [1]_ and its first correction, films.md Sec. 1.2).

    Examples
    --------
    >>> from shortwave.water import Water
    >>> w = complex_frequency(2 * np.pi / 0.01, water=Water(20.0, 0.0))
    >>> round(float(w.real), 2), round(float(-w.imag), 4)
    (155.65, 0.764)
    """
    k = _check_k(k)
    root, info = _solve(k, film, water, "temporal", method, on_failure)
    out = scalar_or_array(root)
    return (out, info) if full_output else out


def complex_wavenumber(omega, film=None, water=None, *, method="auto", on_failure="raise",
                       full_output=False):
    """Complex wavenumber of the capillary-gravity wave at real angular frequency omega.

    Parameters
    ----------
    omega : numeric
        Angular frequency [rad s-1], > 0, corresponding to wavenumbers in :data:`K_RANGE`
        (roughly 0.5 Hz and up for sea water); lower frequencies raise an error.
    film, water, method, on_failure, full_output :
        As in :func:`complex_frequency`.

    Returns
    -------
    complex ndarray or complex
        k = k_r + i Delta [rad m-1]; Delta > 0 is the spatial amplitude damping rate.

    Examples
    --------
    >>> from shortwave.water import Water
    >>> k = complex_wavenumber(155.65, water=Water(20.0, 0.0))
    >>> round(float(k.real), 1), round(float(k.imag), 3)
    (628.3, 2.476)
    """
    om = _check_omega(omega, water)
    root, info = _solve(om, film, water, "spatial", method, on_failure)
    out = scalar_or_array(root)
    return (out, info) if full_output else out


def damping_rate(k, film=None, water=None, form="temporal", *, on_failure="raise"):
    """Amplitude damping rate of capillary-gravity waves under a film (or clean).

    Parameters
    ----------
    k : numeric
        Wavenumber [rad m-1], within :data:`K_RANGE`.  For ``form="spatial"`` the wave
        frequency is that of the clean inviscid wave of wavenumber k.
    film : Monolayer, OilLayer, str or None
        None for the clean surface.
    water : Water or Liquid, optional
    form : {"temporal", "spatial"}
        ``"temporal"``: Gamma [s-1] at real k; ``"spatial"``: Delta [m-1] at real omega.
    on_failure : {"raise", "nan"}
        See :func:`complex_frequency`.

    Returns
    -------
    numeric
        Gamma [s-1] or Delta [m-1] (amplitude; energy decays twice as fast).

    Examples
    --------
    >>> from shortwave.water import Water
    >>> round(float(damping_rate(628.32, water=Water(20, 0))), 4)   # Lamb: 2 nu k^2 = 0.792
    0.764
    """
    form = check_choice("form", form, FORMS)
    k = _check_k(k)
    if form == "temporal":
        return scalar_or_array(-np.asarray(complex_frequency(
            k, film, water, on_failure=on_failure)).imag)
    om = np.asarray(angular_frequency(k, as_liquid(water)))
    return scalar_or_array(np.asarray(complex_wavenumber(
        om, film, water, on_failure=on_failure)).imag)


def damping_ratio(k, film, water=None, form="temporal", *, on_failure="raise"):
    """Damping ratio y = film damping / clean damping of capillary-gravity waves.

    Parameters
    ----------
    k : numeric
        Wavenumber [rad m-1], within :data:`K_RANGE` (for ``"spatial"``, the frequency is
        that of the clean inviscid wave of wavenumber k).
    film : Monolayer, OilLayer or str
        The film or a preset name (see :data:`PRESETS`).
    water : Water or Liquid, optional
        Default sea water, 15 degC, 35 g/kg.
    form : {"temporal", "spatial"}
        ``Gamma_film(k) / Gamma_clean(k)`` at the same real k (natural for spectra and
        radar contrast) or ``Delta_film(omega) / Delta_clean(omega)`` at the same real
        omega (wave-tank and field experiments).  They agree within a few percent for
        monolayers that do not change the surface tension.
    on_failure : {"raise", "nan"}
        See :func:`complex_frequency`.

    Returns
    -------
    numeric
        y [1], >= about 1.

    Notes
    -----
    Both dampings are exact roots of Eq. (1) (module docstring); the clean one is the same
    water without the film.  The ratio peaks at about twice the inextensible value where
    E k^2 ~ 1.37 sqrt(mu rho omega^3) (Lucassen 1968 [2]_; Cini & Lombardini 1978 [5]_).

    Examples
    --------
    >>> from shortwave.water import Water
    >>> film = Monolayer(elasticity=0.025, relaxation_frequency=1.0)
    >>> round(float(damping_ratio(202.25, film, Water(20, 35))), 1)   # X band, 30 deg
    10.2
    """
    form = check_choice("form", form, FORMS)
    if film is None:
        raise ShortwaveInputError("film: a film is required for a damping ratio")
    k = _check_k(k)
    num = np.asarray(damping_rate(k, film, water, form, on_failure=on_failure))
    den = np.asarray(damping_rate(k, None, water, form))
    return scalar_or_array(num / den)


def damping_ratio_at_frequency(frequency_hz, film, water=None):
    """Spatial damping ratio at a wave frequency, as measured in wave tanks and at sea.

    Parameters
    ----------
    frequency_hz : numeric
        Wave frequency [Hz], > 0; below about 0.5 Hz (wavenumber 1 rad m-1) is an error.
    film : Monolayer, OilLayer or str
    water : Water or Liquid, optional

    Returns
    -------
    numeric
        y(f) = Delta_film(omega) / Delta_clean(omega) [1].

    Examples
    --------
    >>> from shortwave.water import Water
    >>> round(float(damping_ratio_at_frequency(10.0, Monolayer(elasticity=0.010),
    ...                                        Water(20, 35))), 1)
    11.2
    """
    om = _check_omega(frequency_hz, water, name="frequency_hz", hz=True)
    if film is None:
        raise ShortwaveInputError("film: a film is required for a damping ratio")
    num = np.asarray(complex_wavenumber(om, film, water)).imag
    den = np.asarray(complex_wavenumber(om, None, water)).imag
    return scalar_or_array(num / den)
