"""Bragg resonance: which ocean waves a radar sees, and their Doppler shift.

Geometry (monostatic): the radar looks along the horizontal unit vector ``e_look`` at
incidence ``theta`` from the vertical.  First-order (Bragg) scattering selects the two
surface waves of wavenumber

    K_B = 2 k_r sin(theta),      Lambda_B = lambda / (2 sin theta)

travelling toward the radar (the *advancing* wave, K = -K_B e_look) and away from it (the
*receding* wave, K = +K_B e_look), k_r = 2 pi f / c being the radar wavenumber.  At grazing
incidence (HF ground wave, theta = 90 deg) K_B = 2 k_r: the resonant ocean wave is half the
radar wavelength (Crombie 1955).

Doppler sign convention: **positive Doppler = approaching** the radar.  The radial current
``current`` is the horizontal surface-current component **toward the radar** (positive
toward the radar).  The two first-order lines are

    f_D = +f_B + K_B U_r / (2 pi)   (advancing wave)
    f_D = -f_B + K_B U_r / (2 pi)   (receding wave)

with f_B = omega(K_B) / (2 pi) from the full capillary-gravity dispersion relation at
finite depth, omega^2 = (g K + tau K^3) tanh(K d), tau = surface tension / density of the
water (:mod:`shortwave.dispersion`).  Platform motion is not included.

References
----------
.. [1] Crombie, D. D. (1955). Doppler spectrum of sea echo at 13.56 Mc/s. Nature 175,
   681-682.
.. [2] Wright, J. W. (1966). Backscattering from capillary waves with application to sea
   clutter. IEEE Trans. Antennas Propag. AP-14, 749-754.
.. [3] Barrick, D. E. (1972). First-order theory and analysis of MF/HF/VHF scatter from
   the sea. IEEE Trans. Antennas Propag. AP-20, 2-10.
.. [4] Valenzuela, G. R. (1978). Theories for the interaction of electromagnetic and
   oceanic waves - a review. Boundary-Layer Meteorol. 13, 61-85.
"""
from __future__ import annotations

from typing import NamedTuple

import numpy as np

from .. import dispersion
from .._checks import ShortwaveInputError, as_float_array, check_range, scalar_or_array
from .bands import radar_wavenumber

__all__ = ["bragg_wavenumber", "bragg_wavelength", "ground_wave_bragg_wavenumber",
           "bistatic_bragg_vector", "bistatic_bragg_wavenumber", "BraggWave", "bragg_wave",
           "bragg_frequency", "bragg_lines", "WAVES"]

WAVES = ("advancing", "receding")
"""The two first-order Bragg waves: toward the radar (+ Doppler) and away (- Doppler)."""


def _theta(incidence_deg, name="incidence_deg"):
    """Incidence in radians; valid (0, 90] degrees (90 = grazing, HF ground wave)."""
    th = check_range(name, incidence_deg, 0.0, 90.0, inclusive=(False, True), unit="degree")
    return np.deg2rad(th)


def bragg_wavenumber(frequency_hz, incidence_deg):
    """Monostatic Bragg-resonant ocean wavenumber K_B = 2 k_r sin(theta).

    Parameters
    ----------
    frequency_hz : numeric
        Radar frequency [Hz], > 0.
    incidence_deg : numeric
        Incidence angle from the vertical [degree], in (0, 90]; 90 is grazing (HF ground
        wave).

    Returns
    -------
    numeric
        K_B [rad m-1].

    Notes
    -----
    First-order resonance condition (Wright 1966; Valenzuela 1978 [4]_):
    K_B = 4 pi sin(theta) / lambda.

    Examples
    --------
    >>> round(float(bragg_wavenumber(5.405e9, 30.0)), 2)   # = radar wavenumber at 30 deg
    113.28
    """
    k = np.asarray(radar_wavenumber(frequency_hz))
    return scalar_or_array(2.0 * k * np.sin(_theta(incidence_deg)))  # K_B = 2 k sin(theta)


def bragg_wavelength(frequency_hz, incidence_deg):
    """Monostatic Bragg wavelength Lambda_B = lambda / (2 sin theta) [m].

    Parameters
    ----------
    frequency_hz : numeric
        Radar frequency [Hz], > 0.
    incidence_deg : numeric
        Incidence angle [degree], in (0, 90].

    Examples
    --------
    >>> round(float(bragg_wavelength(5.405e9, 40.0)) * 100, 2)   # cm
    4.31
    >>> round(float(bragg_wavelength(13.5e6, 90.0)), 2)    # HF: half the radar wavelength
    11.1
    """
    return scalar_or_array(2 * np.pi / np.asarray(bragg_wavenumber(frequency_hz, incidence_deg)))


def ground_wave_bragg_wavenumber(frequency_hz):
    """HF ground-wave (grazing) Bragg wavenumber K_B = 2 k_r [rad m-1].

    The resonant ocean wave is half the radar wavelength (Crombie 1955 [1]_).

    Examples
    --------
    >>> round(2 * 3.141592653589793 / float(ground_wave_bragg_wavenumber(13.5e6)), 3)
    11.103
    """
    return bragg_wavenumber(frequency_hz, 90.0)


def bistatic_bragg_vector(frequency_hz, incidence_deg, scattered_incidence_deg,
                          look_azimuth_deg=0.0, scattered_azimuth_deg=180.0):
    """Bistatic first-order Bragg wave vector K_B = k_s,h - k_i,h.

    Parameters
    ----------
    frequency_hz : numeric
        Radar frequency [Hz], > 0.
    incidence_deg : numeric
        Incidence angle of the transmitted wave at the patch [degree], (0, 90].
    scattered_incidence_deg : numeric
        Angle from the vertical of the direction from the patch to the receiver
        [degree], (0, 90].
    look_azimuth_deg : numeric
        Azimuth of the horizontal propagation direction of the incident wave
        (transmitter -> patch) [degree], counter-clockwise from the x axis.
    scattered_azimuth_deg : numeric
        Azimuth of the horizontal direction from the patch to the receiver [degree].
        ``look_azimuth_deg + 180`` is the monostatic case.

    Returns
    -------
    (numeric, numeric)
        The x and y components of the resonant wave vector [rad m-1]; the first-order
        return comes from the two ocean waves +K_B and -K_B.

    Notes
    -----
    Horizontal projections |k_i,h| = k sin(theta_i), |k_s,h| = k sin(theta_s)
    (Valenzuela 1978 [4]_).  Monostatic: K_B = -2 k_i,h, |K_B| = 2 k sin(theta);
    forward specular (k_s,h = k_i,h): K_B = 0.

    Examples
    --------
    >>> kx, ky = bistatic_bragg_vector(5.405e9, 30.0, 30.0)   # monostatic, looking along +x
    >>> round(float(kx), 2), round(float(ky), 6)
    (-113.28, 0.0)
    """
    k = np.asarray(radar_wavenumber(frequency_hz))
    ti = _theta(incidence_deg)
    ts = _theta(scattered_incidence_deg, "scattered_incidence_deg")
    pi_ = np.deg2rad(as_float_array("look_azimuth_deg", look_azimuth_deg))
    ps = np.deg2rad(as_float_array("scattered_azimuth_deg", scattered_azimuth_deg))
    kx = k * (np.sin(ts) * np.cos(ps) - np.sin(ti) * np.cos(pi_))  # K_B = k_s,h - k_i,h
    ky = k * (np.sin(ts) * np.sin(ps) - np.sin(ti) * np.sin(pi_))
    return scalar_or_array(kx), scalar_or_array(ky)


def bistatic_bragg_wavenumber(frequency_hz, bistatic_angle_deg):
    """HF bistatic (grazing) Bragg wavenumber |K_B| = 2 k_r cos(beta / 2).

    Parameters
    ----------
    frequency_hz : numeric
        Radar frequency [Hz], > 0.
    bistatic_angle_deg : numeric
        Bistatic angle beta at the patch between the directions to the transmitter and
        to the receiver [degree], in [0, 180); 0 is monostatic.

    Returns
    -------
    numeric
        |K_B| [rad m-1]; the resonant wave vector lies along the bisector of beta.

    Notes
    -----
    Grazing case of :func:`bistatic_bragg_vector` (both angles 90 deg): with unit vectors
    a (to the transmitter) and b (to the receiver), K_B = k (a + b), whose length is
    2 k cos(beta / 2).

    Examples
    --------
    >>> kb0 = bistatic_bragg_wavenumber(13.5e6, 0.0)
    >>> round(float(bistatic_bragg_wavenumber(13.5e6, 120.0) / kb0), 6)
    0.5
    """
    k = np.asarray(radar_wavenumber(frequency_hz))
    beta = check_range("bistatic_angle_deg", bistatic_angle_deg, 0.0, 180.0,
                       inclusive=(True, False), unit="degree")
    return scalar_or_array(2.0 * k * np.cos(np.deg2rad(beta) / 2.0))  # 2 k cos(beta/2)


class BraggWave(NamedTuple):
    """Properties of the Bragg-resonant ocean wave (intrinsic: no current)."""

    wavenumber: object       #: K_B [rad m-1]
    wavelength: object       #: 2 pi / K_B [m]
    angular_frequency: object  #: omega(K_B) [rad s-1]
    frequency: object        #: omega / 2 pi [Hz]
    period: object           #: 2 pi / omega [s]
    phase_speed: object      #: omega / K_B [m s-1]
    group_speed: object      #: d omega / d K [m s-1]


def bragg_wave(frequency_hz, incidence_deg, water=None, depth=np.inf):
    """Wavelength, frequency, period and speeds of the monostatic Bragg wave.

    Parameters
    ----------
    frequency_hz : numeric
        Radar frequency [Hz], > 0.
    incidence_deg : numeric
        Incidence angle [degree], (0, 90]; 90 for the HF ground wave.
    water : Water or Liquid, optional
        Supplies density and surface tension; default 15 degC, 35 g/kg sea water.
    depth : numeric
        Water depth [m], > 0; ``np.inf`` (default) for deep water.

    Returns
    -------
    BraggWave
        Named tuple of arrays (or floats).

    Notes
    -----
    Full capillary-gravity dispersion at finite depth,
    omega^2 = (g K + sigma/rho K^3) tanh(K d) (Lamb 1932, Art. 267), evaluated at
    K = K_B.  The capillary term raises f_B by 2 % at C band and 30 % at Ku band near 40
    deg; at HF it is below 1e-5 Hz.

    Examples
    --------
    >>> w = bragg_wave(13.5e6, 90.0)
    >>> round(float(w.wavelength), 2), round(float(w.frequency), 4), round(float(w.period), 3)
    (11.1, 0.3749, 2.667)
    """
    kb = np.asarray(bragg_wavenumber(frequency_hz, incidence_deg))
    om = np.asarray(dispersion.angular_frequency(kb, water, depth))
    cg = np.asarray(dispersion.group_speed(kb, water, depth))
    s = scalar_or_array
    return BraggWave(s(kb), s(2 * np.pi / kb), s(om), s(om / (2 * np.pi)),
                     s(2 * np.pi / om), s(om / kb), s(cg))


def bragg_frequency(frequency_hz, incidence_deg, current=0.0, water=None, depth=np.inf,
                    wave="advancing"):
    """Doppler frequency of a first-order Bragg line, with a radial surface current.

    Parameters
    ----------
    frequency_hz : numeric
        Radar frequency [Hz], > 0.
    incidence_deg : numeric
        Incidence angle [degree], (0, 90]; 90 for the HF ground wave (grazing).
    current : numeric
        Horizontal surface current along the look direction [m s-1], **positive toward
        the radar**.  It is the effective current advecting the Bragg waves (a weighted
        mean over a depth of about 1 / (2 K_B)).
    water : Water or Liquid, optional
        Density and surface tension for the dispersion relation; default sea water.
    depth : numeric
        Water depth [m], > 0; ``np.inf`` for deep water.
    wave : {"advancing", "receding"}
        The Bragg wave travelling toward the radar (positive line) or away from it.

    Returns
    -------
    numeric
        Doppler frequency [Hz], **positive = approaching**.

    Notes
    -----
    f_D = +/- omega(K_B) / 2 pi + K_B U_r / 2 pi, i.e. f_D = +/- f_B + 2 sin(theta) U_r /
    lambda (Barrick 1972 [3]_; Valenzuela 1978 [4]_), with the finite-depth
    capillary-gravity omega(K) of :func:`bragg_wave`.  In deep water at HF,
    f_B = sqrt(g f0 / (pi c)) = 0.102 sqrt(f0 [MHz]) Hz (common practice).

    Examples
    --------
    >>> round(float(bragg_frequency(13.5e6, 90.0)), 4)
    0.3749
    >>> round(float(bragg_frequency(13.5e6, 90.0, wave="receding", current=1.0)), 4)
    -0.2849
    """
    key = str(wave).lower() if isinstance(wave, str) else wave
    if key not in WAVES:
        raise ShortwaveInputError(
            f"wave: unknown value {wave!r}; choose one of: {', '.join(WAVES)}")
    kb = np.asarray(bragg_wavenumber(frequency_hz, incidence_deg))
    u = as_float_array("current", current)
    if np.any(np.isinf(u)):
        raise ShortwaveInputError("current: infinite values are not allowed")
    fb = np.asarray(dispersion.angular_frequency(kb, water, depth)) / (2 * np.pi)
    sign = 1.0 if key == "advancing" else -1.0
    return scalar_or_array(sign * fb + kb * u / (2 * np.pi))  # f_D = +/- f_B + K_B U_r / 2 pi


def bragg_lines(frequency_hz, incidence_deg, current=0.0, water=None, depth=np.inf):
    """Both first-order Bragg Doppler lines ``(advancing, receding)`` [Hz].

    See :func:`bragg_frequency` for conventions (positive = approaching; current
    positive toward the radar).

    Examples
    --------
    >>> adv, rec = bragg_lines(5.405e9, 30.0, current=1.0)
    >>> round(float(adv - rec), 1), round(float(adv + rec) / 2, 2)   # 2 f_B, current shift
    (11.1, 18.03)
    """
    adv = bragg_frequency(frequency_hz, incidence_deg, current, water, depth, "advancing")
    rec = bragg_frequency(frequency_hz, incidence_deg, current, water, depth, "receding")
    return adv, rec
