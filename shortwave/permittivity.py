"""Complex relative permittivity of sea water at microwave frequencies (0.5-40 GHz).

Two published models, each a function named after its authors:

* :func:`meissner_wentz2004`: double Debye relaxation plus ionic conduction, fitted to
  laboratory data and satellite radiometer observations (Meissner & Wentz 2004 [1]_).
  The default.
* :func:`klein_swift1977`: single Debye relaxation plus ionic conduction, fitted to L- and
  S-band laboratory data (Klein & Swift 1977 [2]_); recommended by its authors below X band.

:func:`permittivity` picks one with ``model=``; the keys are in :data:`MODELS`.

**Sign convention.** Every function returns ``eps' - 1j * eps''`` with ``eps'' > 0``: the
engineering ``exp(+i omega t)`` time dependence of both source papers.  Reflectivities and
radar cross-sections (``|R|^2``, ``|g_pq|^2``) do not depend on this choice, but phases of
polarimetric products do; convert with ``numpy.conj`` when the physics convention
``exp(-i omega t)`` is wanted.

**Units.** Frequency in Hz, temperature in degC, salinity in parts per thousand (the
papers' unit; practical salinity is numerically the same to about 0.5 %, and Absolute
Salinity in g/kg is 0.47 % larger: see :func:`permittivity` Notes).

**Validity and checks.** Frequencies <= 0 Hz, temperatures outside [-25, 60] degC and
salinities outside [0, 60] are refused with :class:`shortwave._checks.ShortwaveInputError`.
Inside those limits but outside the range a model was fitted for, the value is computed
and a :class:`shortwave.water.ValidityWarning` names the range.  NaN propagates to NaN.

References
----------
.. [1] Meissner, T. and Wentz, F. J. (2004). The complex dielectric constant of pure and
   sea water from microwave satellite observations. IEEE Trans. Geosci. Remote Sens.
   42(9), 1836-1849, doi:10.1109/TGRS.2004.831888.  Eqs. (5)-(17), Table III.
.. [2] Klein, L. A. and Swift, C. T. (1977). An improved model for the dielectric constant
   of sea water at microwave frequencies. IEEE Trans. Antennas Propag. AP-25(1), 104-111.
.. [3] Stogryn, A. P., Bull, H. T., Rubayi, K. and Iravanchy, S. (1995). The microwave
   dielectric properties of sea and fresh water. GenCorp Aerojet, Azusa, CA (the
   conductivity fit and pure-water static permittivity adopted by [1]_).
.. [4] Culkin, F. and Smith, N. D. (1980). Determination of the concentration of potassium
   chloride solution having the same electrical conductivity, at 15 C and infinite
   frequency, as standard seawater of salinity 35.0000 ppt (Chlorinity 19.37394 ppt).
   IEEE J. Oceanic Eng. OE-5(1), 22-23.
.. [5] Malmberg, C. G. and Maryott, A. A. (1956). Dielectric constant of water from 0 to
   100 C. J. Res. Natl. Bur. Stand. 56(1), 1-8.
"""
from __future__ import annotations

import warnings

import numpy as np

from ._checks import (ShortwaveInputError, check_choice, check_positive, check_range,
                      scalar_or_array)

__all__ = ["MODELS", "EPSILON_0", "permittivity", "meissner_wentz2004", "klein_swift1977",
           "relaxation_parameters", "ionic_conductivity", "fresnel_reflectivity_nadir"]

MODELS = ("meissner_wentz2004", "klein_swift1977")
"""Keys accepted by ``model=`` in :func:`permittivity`."""

EPSILON_0 = 8.8541878128e-12
"""Vacuum permittivity [F m-1] (CODATA 2018)."""

# 1 / (2 pi eps0) in GHz m S-1: 17.97510, the constant printed in Meissner & Wentz (2004).
_CONDUCTION_GHZ = 1e-9 / (2.0 * np.pi * EPSILON_0)

# Refused outright (the fits are meaningless there).
HARD_TEMPERATURE_C = (-25.0, 60.0)
HARD_SALINITY = (0.0, 60.0)

# Range over which each model was fitted (a ValidityWarning outside).
VALIDITY = {
    # Meissner & Wentz (2004) abstract: sea water -2..29 degC, S 0..40 ppt, up to at least
    # 90 GHz; pure water -20..40 degC.  This package checks the model over 0.5-40 GHz.
    "meissner_wentz2004": {"frequency_hz": (0.5e9, 40e9), "temperature_c": (-2.0, 29.0),
                           "temperature_c_pure": (-20.0, 40.0), "salinity": (0.0, 40.0)},
    # Klein & Swift (1977) abstract: accurate below X band.  Their data cover roughly
    # 0-30 degC and S 4-35 ppt (from memory); pure water follows their S = 0 limit.
    "klein_swift1977": {"frequency_hz": (0.5e9, 10e9), "temperature_c": (0.0, 30.0),
                        "temperature_c_pure": (0.0, 30.0), "salinity": (0.0, 40.0)},
}

# Meissner & Wentz (2004) Table III, pure water (a0..a10) and sea water (b0..b12).
# Verified: every digit agrees with two independent public transcriptions of the table
# (the paper's PDF itself was not opened).
_A = (5.7230, 2.2379e-2, -7.1237e-4, 5.0478, -7.0315e-2, 6.0059e-4,
      3.6143, 2.8841e-2, 1.3652e-1, 1.4825e-3, 2.4166e-4)
_B = (-3.56417e-3, 4.74868e-6, 1.15574e-5, 2.39357e-3, -3.13530e-5, 2.52477e-7,
      -6.28908e-3, 1.76032e-4, -9.22144e-5, -1.99723e-2, 1.81176e-4, -2.04265e-3,
      1.57883e-4)


def _warn(name, low, high, unit, model, bad):
    if np.any(bad):
        warnings.warn(f"{name} outside the validity range [{low:g}, {high:g}] {unit} of "
                      f"{model}; values are extrapolated",
                      _validity_warning(), stacklevel=4)


def _validity_warning():
    from .water import ValidityWarning  # water imports this module lazily: no cycle
    return ValidityWarning


def _inputs(temperature_c, salinity, model):
    t = check_range("temperature_c", temperature_c, *HARD_TEMPERATURE_C, unit="degC")
    s = check_range("salinity", salinity, *HARD_SALINITY, unit="ppt")
    v = VALIDITY[model]
    t_b, s_b = np.broadcast_arrays(t, s)
    with np.errstate(invalid="ignore"):
        lo, hi = v["temperature_c"]
        plo, phi = v["temperature_c_pure"]
        saline = s_b > 0
        bad_t = np.where(saline, (t_b < lo) | (t_b > hi), (t_b < plo) | (t_b > phi))
        _warn("temperature_c", lo, hi, "degC (sea water; pure water "
              f"[{plo:g}, {phi:g}])", model, bad_t)
        slo, shi = v["salinity"]
        _warn("salinity", slo, shi, "ppt", model, (s < slo) | (s > shi))
    return t, s


def _frequency(frequency_hz, model):
    f = check_positive("frequency_hz", frequency_hz, unit="Hz")
    lo, hi = VALIDITY[model]["frequency_hz"]
    with np.errstate(invalid="ignore"):
        _warn("frequency_hz", lo * 1e-9, hi * 1e-9, "GHz", model, (f < lo) | (f > hi))
    return f


def _mw2004_parameters(t, s):
    """Meissner & Wentz (2004) eqs. (6)-(17) on checked arrays; see relaxation_parameters."""
    a, b = _A, _B
    # pure water, M&W eqs. (6)-(10); eps_s from Stogryn et al. (1995)
    eps_s0 = (37088.6 - 82.168 * t) / (421.854 + t)                 # eq. (6)
    eps_10 = a[0] + a[1] * t + a[2] * t**2                          # eq. (7)
    nu_10 = (45.0 + t) / (a[3] + a[4] * t + a[5] * t**2)            # eq. (8) [GHz]
    eps_inf0 = a[6] + a[7] * t                                      # eq. (9)
    nu_20 = (45.0 + t) / (a[8] + a[9] * t + a[10] * t**2)           # eq. (10) [GHz]
    # sea water, M&W eqs. (13)-(17)
    eps_s = eps_s0 * np.exp(b[0] * s + b[1] * s**2 + b[2] * t * s)  # eq. (13)
    nu_1 = nu_10 * (1.0 + s * (b[3] + b[4] * t + b[5] * t**2))      # eq. (14)
    eps_1 = eps_10 * np.exp(b[6] * s + b[7] * s**2 + b[8] * t * s)  # eq. (15)
    nu_2 = nu_20 * (1.0 + s * (b[9] + b[10] * t))                   # eq. (16)
    eps_inf = eps_inf0 * (1.0 + s * (b[11] + b[12] * t))            # eq. (17)
    return {"eps_s": eps_s, "eps_1": eps_1, "eps_inf": eps_inf, "nu_1_hz": nu_1 * 1e9,
            "nu_2_hz": nu_2 * 1e9, "conductivity": _stogryn1995_conductivity(t, s)}


def _stogryn1995_conductivity(t, s):
    """Ionic conductivity [S m-1], Stogryn et al. (1995) as adopted in M&W (2004) eqs. (11)-(12)."""
    sig35 = (2.903602 + 8.607e-2 * t + 4.738817e-4 * t**2 - 2.991e-6 * t**3
             + 4.3047e-9 * t**4)                                     # eq. (11)
    r15 = s * (37.5109 + 5.45216 * s + 1.4409e-2 * s**2) / (1004.75 + 182.283 * s + s**2)
    alpha0 = (6.9431 + 3.2841 * s - 9.9486e-2 * s**2) / (84.850 + 69.024 * s + s**2)
    alpha1 = 49.843 - 0.2276 * s + 0.198e-2 * s**2
    rt_r15 = 1.0 + alpha0 * (t - 15.0) / (alpha1 + t)
    return sig35 * r15 * rt_r15                                     # eq. (12)


def _ks1977_parameters(t, s):
    """Klein & Swift (1977) eqs. on checked arrays; see relaxation_parameters."""
    eps_s = ((87.134 - 1.949e-1 * t - 1.276e-2 * t**2 + 2.491e-4 * t**3)
             * (1.0 + 1.613e-5 * s * t - 3.656e-3 * s + 3.210e-5 * s**2
                - 4.232e-7 * s**3))                                  # K&S eqs. (13)-(15)
    tau = ((1.768e-11 - 6.086e-13 * t + 1.104e-14 * t**2 - 8.111e-17 * t**3)
           * (1.0 + 2.282e-5 * s * t - 7.638e-4 * s - 7.760e-6 * s**2
              + 1.105e-8 * s**3))                                    # K&S eqs. (16)-(18) [s]
    delta = 25.0 - t
    beta = (2.033e-2 + 1.266e-4 * delta + 2.464e-6 * delta**2
            - s * (1.849e-5 - 2.551e-7 * delta + 2.551e-8 * delta**2))
    sig25 = s * (0.182521 - 1.46192e-3 * s + 2.09324e-5 * s**2 - 1.28205e-7 * s**3)
    sigma = sig25 * np.exp(-delta * beta)                           # K&S eqs. (19)-(21)
    return {"eps_s": eps_s, "eps_inf": np.full_like(eps_s, 4.9), "tau_s": tau,
            "conductivity": sigma}


def relaxation_parameters(temperature_c, salinity, model="meissner_wentz2004"):
    """Debye relaxation parameters and ionic conductivity of a permittivity model.

    Parameters
    ----------
    temperature_c : numeric
        Water temperature [degC]; refused outside [-25, 60].
    salinity : numeric
        Salinity [ppt]; refused outside [0, 60].
    model : str
        One of :data:`MODELS`.

    Returns
    -------
    dict of str to numeric
        ``meissner_wentz2004``: ``eps_s`` (static permittivity), ``eps_1`` (intermediate),
        ``eps_inf`` (high-frequency limit) [1], ``nu_1_hz``, ``nu_2_hz`` (the two
        relaxation frequencies) [Hz], ``conductivity`` [S m-1].
        ``klein_swift1977``: ``eps_s``, ``eps_inf`` (= 4.9) [1], ``tau_s`` (relaxation
        time) [s], ``conductivity`` [S m-1].

    Notes
    -----
    ``eps_s`` of pure water (salinity 0) is the static (low-frequency) dielectric constant:
    the value a bridge measurement gives (e.g. Malmberg & Maryott 1956 [5]_).  The
    conductivity is that of the papers: Stogryn et al. (1995) [3]_ for Meissner & Wentz
    (eqs. 11-12), Weyl's fit for Klein & Swift.

    Examples
    --------
    >>> p = relaxation_parameters(15.0, 35.0)
    >>> round(float(p["conductivity"]), 3)   # standard sea water, Culkin & Smith (1980)
    4.291
    >>> round(float(relaxation_parameters(20.0, 0.0)["eps_s"]), 1)
    80.2
    """
    model = check_choice("model", model, MODELS)
    t, s = _inputs(temperature_c, salinity, model)
    t, s = np.broadcast_arrays(t, s)
    p = _mw2004_parameters(t, s) if model == MODELS[0] else _ks1977_parameters(t, s)
    return {k: scalar_or_array(v) for k, v in p.items()}


def ionic_conductivity(temperature_c, salinity, model="meissner_wentz2004"):
    """Ionic (static) conductivity of sea water [S m-1] used by a permittivity model.

    Parameters
    ----------
    temperature_c : numeric
        [degC]; refused outside [-25, 60].
    salinity : numeric
        [ppt]; refused outside [0, 60].
    model : str
        One of :data:`MODELS`.

    Returns
    -------
    numeric
        Conductivity [S m-1]; 0 for pure water.

    Notes
    -----
    Meissner & Wentz (2004) eqs. (11)-(12) (the Stogryn et al. 1995 fit); Klein & Swift
    (1977) eqs. (19)-(21).  Standard sea water (S = 35, 15 degC) has 4.2914 S/m (Culkin &
    Smith 1980 [4]_).

    Examples
    --------
    >>> round(float(ionic_conductivity(15.0, 35.0)), 4)
    4.2914
    """
    return relaxation_parameters(temperature_c, salinity, model)["conductivity"]


def meissner_wentz2004(frequency_hz, temperature_c, salinity):
    """Complex relative permittivity of sea water, Meissner & Wentz (2004) double Debye.

    Parameters
    ----------
    frequency_hz : numeric
        Electromagnetic frequency [Hz], > 0.  Checked 0.5-40 GHz (the paper's fit extends
        to 90 GHz for sea water and 500 GHz for pure water); a ValidityWarning outside.
    temperature_c : numeric
        Water temperature [degC].  Fitted range -2..29 degC for sea water, -20..40 degC for
        pure water (ValidityWarning outside); refused outside [-25, 60].
    salinity : numeric
        Salinity [ppt]; fitted 0-40 (ValidityWarning outside); refused outside [0, 60].

    Returns
    -------
    complex numeric
        ``eps' - 1j * eps''`` with ``eps'' > 0`` (exp(+i omega t) convention), broadcast
        over the inputs.

    Notes
    -----
    M&W (2004) eq. (5), with nu the frequency in GHz:

        eps = (eps_s - eps_1) / (1 + i nu/nu_1) + (eps_1 - eps_inf) / (1 + i nu/nu_2)
              + eps_inf - i sigma / (2 pi eps0 nu)

    Parameters from eqs. (6)-(17) and Table III (see :func:`relaxation_parameters`);
    1/(2 pi eps0) = 17.97510 GHz m S-1.  Verified constants: Table III (a0-a10, b0-b12),
    the Stogryn et al. (1995) static permittivity and conductivity fits agree digit by
    digit with two independent public transcriptions of the paper; the conductivity
    reproduces the Culkin & Smith (1980) standard-sea-water value 4.2914 S/m at 15 degC,
    S = 35.  The paper itself was not opened.

    Examples
    --------
    >>> eps = meissner_wentz2004(5.405e9, 20.0, 35.0)      # C band
    >>> round(float(eps.real), 3), round(float(-eps.imag), 3)
    (66.225, 34.393)
    """
    f = _frequency(frequency_hz, MODELS[0])
    t, s = _inputs(temperature_c, salinity, MODELS[0])
    p = _mw2004_parameters(t, s)
    nu = f * 1e-9                                                   # GHz
    nu1, nu2 = p["nu_1_hz"] * 1e-9, p["nu_2_hz"] * 1e-9
    with np.errstate(invalid="ignore"):                             # NaN in, NaN out
        eps = ((p["eps_s"] - p["eps_1"]) / (1.0 + 1j * nu / nu1)
               + (p["eps_1"] - p["eps_inf"]) / (1.0 + 1j * nu / nu2)
               + p["eps_inf"] - 1j * p["conductivity"] * _CONDUCTION_GHZ / nu)  # eq. (5)
    return scalar_or_array(eps)


def klein_swift1977(frequency_hz, temperature_c, salinity):
    """Complex relative permittivity of sea water, Klein & Swift (1977) single Debye.

    Parameters
    ----------
    frequency_hz : numeric
        Electromagnetic frequency [Hz], > 0.  Recommended by the authors below X band:
        a ValidityWarning outside 0.5-10 GHz.
    temperature_c : numeric
        Water temperature [degC]; ValidityWarning outside 0-30, refused outside [-25, 60].
    salinity : numeric
        Salinity [ppt]; ValidityWarning outside 0-40, refused outside [0, 60].

    Returns
    -------
    complex numeric
        ``eps' - 1j * eps''`` with ``eps'' > 0`` (exp(+i omega t) convention).

    Notes
    -----
    K&S (1977) eq. (9) with Cole-Cole alpha = 0 and eps_inf = 4.9, omega = 2 pi f:

        eps = eps_inf + (eps_s - eps_inf) / (1 + i omega tau) - i sigma / (omega eps0)

    eps_s(T, S), tau(T, S) and sigma(T, S) from their eqs. (13)-(21) (see
    :func:`relaxation_parameters`).  Verified constants: every coefficient agrees with a
    public transcription of the paper's equations (the paper's abstract was read; the
    paper itself was not opened).

    Examples
    --------
    >>> eps = klein_swift1977(1.4e9, 20.0, 35.0)           # L band
    >>> round(float(eps.real), 2), round(float(-eps.imag), 2)
    (72.04, 66.85)
    """
    f = _frequency(frequency_hz, MODELS[1])
    t, s = _inputs(temperature_c, salinity, MODELS[1])
    p = _ks1977_parameters(t, s)
    omega = 2.0 * np.pi * f
    with np.errstate(invalid="ignore"):                             # NaN in, NaN out
        eps = (p["eps_inf"] + (p["eps_s"] - p["eps_inf"]) / (1.0 + 1j * omega * p["tau_s"])
               - 1j * p["conductivity"] / (omega * EPSILON_0))       # eq. (9), alpha = 0
    return scalar_or_array(eps)


_FUNCTIONS = {"meissner_wentz2004": meissner_wentz2004, "klein_swift1977": klein_swift1977}


def permittivity(frequency_hz, temperature_c=15.0, salinity=35.0, model="meissner_wentz2004"):
    """Complex relative permittivity of sea water from the chosen model.

    Parameters
    ----------
    frequency_hz : numeric
        Electromagnetic frequency [Hz], > 0 (0.5-40 GHz is the checked range).
    temperature_c : numeric
        Water temperature [degC].
    salinity : numeric
        Salinity [ppt].
    model : str
        One of :data:`MODELS` (case-insensitive): ``"meissner_wentz2004"`` (default,
        0.5-40 GHz) or ``"klein_swift1977"`` (below about 10 GHz).

    Returns
    -------
    complex numeric
        ``eps' - 1j * eps''`` with ``eps'' > 0`` (engineering exp(+i omega t) convention of
        both papers).

    Notes
    -----
    See :func:`meissner_wentz2004` and :func:`klein_swift1977` for equations, validity and
    which constants were verified.  Salinity: both papers use parts per thousand
    (practical salinity).  Absolute Salinity (g/kg, TEOS-10) is 35.16504/35 times larger;
    passing it instead changes |eps| by up to 0.3 % and the nadir reflectivity by less
    than 4e-4 at 35 ppt (1.4-37 GHz, 0-29 degC).

    Examples
    --------
    >>> eps = permittivity(5.3e9, 20.0, 35.0)
    >>> bool(eps.imag < 0)
    True
    >>> round(float(abs(permittivity(5.3e9, 20.0, 35.0, model="klein_swift1977") - eps)), 1)
    0.7
    """
    model = check_choice("model", model, MODELS)
    return _FUNCTIONS[model](frequency_hz, temperature_c, salinity)


def fresnel_reflectivity_nadir(eps):
    """Power reflection coefficient of a flat surface at normal incidence.

    Parameters
    ----------
    eps : complex numeric
        Complex relative permittivity of the lower medium (either sign convention of the
        imaginary part gives the same result).

    Returns
    -------
    numeric
        ``|R(0)|^2 = |(sqrt(eps) - 1) / (sqrt(eps) + 1)|^2`` [1], between 0 and 1 for a
        passive medium; NaN propagates.

    Notes
    -----
    Fresnel coefficient at normal incidence from air (n = 1), principal square root
    (Re >= 0).  Sea water at C band and 20 degC reflects about 64 % of the incident power.

    Examples
    --------
    >>> round(float(fresnel_reflectivity_nadir(permittivity(5.3e9, 20.0, 35.0))), 4)
    0.6371
    >>> float(fresnel_reflectivity_nadir(1.0))
    0.0
    """
    if eps is None or isinstance(eps, (str, bytes)):
        raise ShortwaveInputError(f"eps: a (complex) number is required, got {eps!r}")
    try:
        e = np.asarray(eps, dtype=complex)
    except (TypeError, ValueError) as exc:
        raise ShortwaveInputError(f"eps: not numeric ({exc})") from None
    if np.any(np.isinf(e)):
        raise ShortwaveInputError("eps: infinite values are not allowed")
    n = np.sqrt(e)                                                  # principal root, Re >= 0
    with np.errstate(invalid="ignore"):                             # NaN in, NaN out
        r = np.abs((n - 1.0) / (n + 1.0)) ** 2
    return scalar_or_array(r)
