"""``shortwave ripple``: properties of capillary-gravity waves on real sea water.

For a list of wavelengths (or of frequencies) prints wavenumber, frequency, period, phase
and group speed and the viscous (Lamb) damping, in time and in space, for water of given
temperature, salinity and depth.  A header states the water properties used, the minimum
phase speed and the capillary length.  ``--plot`` draws phase and group speed against
wavelength.
"""
from __future__ import annotations

import math
import warnings
from functools import partial

import numpy as np

from ._common import (add_format_arguments, add_water_arguments, number, print_table,
                      report_warnings, report_written, water_from_args)

NAME = "ripple"
HELP = "speeds, frequencies and viscous damping of capillary-gravity waves on sea water"
DESCRIPTION = (
    "Print the properties of linear capillary-gravity waves for given wavelengths (m) or "
    "frequencies (Hz): wavenumber (rad/m), frequency (Hz), period (s), phase and group "
    "speed (m/s), and the viscous amplitude damping of a clean surface (Lamb): temporal "
    "rate 2 nu k^2 (1/s) and spatial rate (1/m).  Water properties come from TEOS-10 "
    "(density), IAPWS (viscosity, surface tension) with sea-water corrections, unless "
    "overridden.  Without --wavelength or --frequency a set from 3 mm to 1 m is used.")

DEFAULT_WAVELENGTHS = (0.003, 0.005, 0.01, 0.017, 0.03, 0.05, 0.1, 0.3, 1.0)
"""Wavelengths [m] shown when none are given: capillary, near the minimum, gravity."""

UNITS = {"wavelength": "m", "wavenumber": "rad/m", "frequency": "Hz", "period": "s",
         "phase_speed": "m/s", "group_speed": "m/s", "damping_rate": "1/s",
         "spatial_damping_rate": "1/m"}


_number = partial(number, positive=True)
"""argparse type: a finite, positive (unless ``positive=False``) float."""


def add_arguments(parser):
    what = parser.add_mutually_exclusive_group()
    what.add_argument("--wavelength", "-l", nargs="+", type=_number("wavelength"),
                      metavar="M", help="wavelengths [m], e.g. 0.017 0.05 (default: 3 mm to 1 m)")
    what.add_argument("--frequency", "-f", nargs="+", type=_number("frequency"),
                      metavar="HZ", help="wave frequencies [Hz], e.g. 5 13.5")
    add_water_arguments(parser, salinity_help="absolute salinity [g/kg]; 0 for fresh water")
    parser.add_argument("--depth", "-d", type=_number("depth", allow_inf=True),
                        default=math.inf, metavar="M",
                        help="water depth [m]; inf for deep water")
    parser.add_argument("--density", type=_number("density"), default=None, metavar="KG/M3",
                        help="override the density [kg/m3]")
    parser.add_argument("--surface-tension", type=_number("surface tension"), default=None,
                        metavar="N/M", help="override the surface tension [N/m] "
                        "(e.g. 0.050 for a surface with a film)")
    parser.add_argument("--viscosity", type=_number("viscosity"), default=None,
                        metavar="M2/S", help="override the kinematic viscosity [m2/s]")
    add_format_arguments(parser)
    parser.add_argument("--plot", metavar="FILE.png", default=None,
                        help="also write phase and group speed against wavelength as PNG")


def ripple_table(water, *, wavelength=None, frequency=None, depth=math.inf):
    """Columns of the ``ripple`` table for wavelengths or frequencies.

    Parameters
    ----------
    water : shortwave.water.Water or Liquid
        The liquid.
    wavelength : array-like, optional
        Wavelengths [m], > 0.  Default :data:`DEFAULT_WAVELENGTHS` when ``frequency`` is
        not given either.
    frequency : array-like, optional
        Wave frequencies [Hz], > 0 (inverted with :func:`shortwave.dispersion.wavenumber`).
    depth : float
        Water depth [m]; ``inf`` for deep water.

    Returns
    -------
    dict of str to ndarray
        ``wavelength``, ``wavenumber``, ``frequency``, ``period``, ``phase_speed``,
        ``group_speed``, ``damping_rate`` (2 nu k^2, Lamb 1932 Art. 348) and
        ``spatial_damping_rate`` (damping_rate / group_speed); units in :data:`UNITS`.

    Examples
    --------
    >>> from shortwave.water import Water
    >>> t = ripple_table(Water(20.0, 0.0), frequency=[13.5])
    >>> round(float(t["wavelength"][0]) * 100, 2)    # cm
    1.71
    """
    from .. import dispersion as d

    if frequency is not None:
        omega = 2.0 * np.pi * np.asarray(frequency, dtype=float)
        k = np.atleast_1d(d.wavenumber(omega, water, depth))
    else:
        lam = np.asarray(DEFAULT_WAVELENGTHS if wavelength is None else wavelength, dtype=float)
        k = 2.0 * np.pi / np.atleast_1d(lam)
    omega = np.atleast_1d(d.angular_frequency(k, water, depth))
    return {
        "wavelength": 2.0 * np.pi / k,
        "wavenumber": k,
        "frequency": omega / (2.0 * np.pi),
        "period": 2.0 * np.pi / omega,
        "phase_speed": np.atleast_1d(d.phase_speed(k, water, depth)),
        "group_speed": np.atleast_1d(d.group_speed(k, water, depth)),
        "damping_rate": np.atleast_1d(d.viscous_damping_rate(k, water)),
        "spatial_damping_rate": np.atleast_1d(d.viscous_spatial_damping_rate(k, water, depth)),
    }


def summary(water, depth=math.inf):
    """Water properties and the deep-water phase-speed minimum, as plain floats.

    Parameters
    ----------
    water : shortwave.water.Water
        The water (scalar properties).
    depth : float
        Water depth [m], reported as given.

    Returns
    -------
    dict of str to float
        temperature_c [degC], salinity [g kg-1], depth [m], density [kg m-3],
        surface_tension [N m-1], kinematic_viscosity [m2 s-1], minimum_phase_speed
        [m s-1], wavenumber_at_minimum [rad m-1], wavelength_at_minimum [m],
        capillary_length [m].

    Examples
    --------
    >>> from shortwave.water import Water
    >>> round(summary(Water(20.0, 0.0))["minimum_phase_speed"], 3)
    0.231
    """
    from .. import dispersion as d

    c_min, k_min = d.minimum_phase_speed(water)
    return {
        "temperature_c": float(water.temperature_c),
        "salinity": float(water.salinity),
        "depth": float(depth),
        "density": float(water.density),
        "surface_tension": float(water.surface_tension),
        "kinematic_viscosity": float(water.kinematic_viscosity),
        "minimum_phase_speed": float(c_min),
        "wavenumber_at_minimum": float(k_min),
        "wavelength_at_minimum": float(2.0 * np.pi / k_min),
        "capillary_length": float(d.capillary_length(water)),
    }


def _title(s):
    depth = "deep water" if math.isinf(s["depth"]) else f"depth {s['depth']:g} m"
    return "\n".join([
        f"Capillary-gravity waves: {s['temperature_c']:g} degC, {s['salinity']:g} g/kg, {depth}",
        f"water: density {s['density']:.2f} kg/m3, surface tension "
        f"{s['surface_tension'] * 1e3:.2f} mN/m, kinematic viscosity "
        f"{s['kinematic_viscosity']:.4g} m2/s",
        f"minimum phase speed {s['minimum_phase_speed'] * 100:.2f} cm/s at wavelength "
        f"{s['wavelength_at_minimum'] * 100:.3f} cm (deep water); capillary length "
        f"{s['capillary_length'] * 1e3:.3f} mm",
        ""])


def run(args):
    with warnings.catch_warnings(record=True) as caught:
        warnings.simplefilter("always")
        water = water_from_args(args, density=args.density,
                                surface_tension=args.surface_tension,
                                kinematic_viscosity=args.viscosity)
        table = ripple_table(water, wavelength=args.wavelength, frequency=args.frequency,
                             depth=args.depth)
        info = summary(water, args.depth)
    report_warnings(NAME, caught)

    # strict JSON has no Infinity: deep water is written as depth null
    water_doc = {**info, "depth": None if math.isinf(info["depth"]) else info["depth"]}
    print_table(table, args.format, units=UNITS, title=_title(info), head={"water": water_doc})

    if args.plot:
        from ..plots.dispersion import speed_curves
        lam = table["wavelength"]
        lo = min(1e-3, float(np.min(lam)) / 1.5)
        hi = max(10.0, float(np.max(lam)) * 1.5)
        path = speed_curves(water, args.plot, depth=args.depth, wavelength_range=(lo, hi),
                            marks=lam)
        report_written(path, args.format)
    return 0
