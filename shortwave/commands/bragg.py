"""``shortwave bragg``: the ocean waves a radar resonates with, and their Doppler lines.

For radars (band letters or frequencies) and incidence angles, prints the Bragg
wavelength and wavenumber, the Bragg wave's frequency, period and phase speed (full
capillary-gravity dispersion with the water's surface tension, at the given depth) and
the two first-order Doppler lines with a radial current.  HF/VHF radars (below 300 MHz)
default to grazing incidence (ground wave).  ``--plot`` draws the Bragg wavelength against
incidence, one curve per radar.
"""
from __future__ import annotations

import argparse
import math
import warnings
from functools import partial

import numpy as np

from ._common import (add_format_arguments, add_water_arguments, number, parse_radar,
                      print_table, report_warnings, report_written, water_from_args)

NAME = "bragg"
HELP = "Bragg-resonant ocean waves and Doppler lines for radar bands and incidence angles"
DESCRIPTION = (
    "Bragg scales of radars: for each radar (band letter such as C, X, Ku, HF, or a "
    "frequency such as 5.4GHz, 13.5MHz) and incidence angle (degrees from the vertical; "
    "90 = grazing, the HF ground wave) print the resonant ocean wavelength "
    "lambda/(2 sin theta) [m], wavenumber [rad/m], the Bragg wave's frequency [Hz], "
    "period [s] and phase speed [m/s] from the capillary-gravity dispersion relation of "
    "sea water at the given depth, and the first-order Doppler lines [Hz] (positive = "
    "approaching; --current is the surface current toward the radar, m/s).  Band letters "
    "use a representative centre frequency (not any instrument's).")

DEFAULT_RADARS = ("L", "S", "C", "X", "Ku", "Ka")
DEFAULT_INCIDENCE = (20.0, 30.0, 40.0, 50.0)
GRAZING_BELOW_HZ = 300e6
"""Radars below this frequency default to grazing incidence (90 deg, ground wave)."""

UNITS = {"radar": "", "frequency": "Hz", "incidence": "deg", "radar_wavelength": "m",
         "bragg_wavelength": "m", "bragg_wavenumber": "rad/m", "bragg_frequency": "Hz",
         "period": "s", "phase_speed": "m/s", "doppler_advancing": "Hz",
         "doppler_receding": "Hz"}


_float = partial(number, named=True)
"""argparse type: a finite float (``positive=True``: > 0); errors name the quantity."""


def radar_argument(text):
    """argparse type: a band letter or a frequency string, returned as (label, Hz).

    Examples
    --------
    >>> radar_argument("ku"), radar_argument("13.5MHz")
    (('Ku', 13575000000.0), ('13.5MHz', 13500000.0))
    """
    try:
        return parse_radar(text)
    except ValueError as exc:
        raise argparse.ArgumentTypeError(str(exc)) from None


def angle_values(values, *, low=0.0, high=90.0, closed_high=True, name="--incidence"):
    """Expand angle arguments: numbers, or ranges ``START:STOP:STEP`` (STOP included).

    Returns a 1-D float array [degree]; raises ``ValueError`` with a one-line message.

    Examples
    --------
    >>> angle_values(["20:40:10", "55"]).tolist()
    [20.0, 30.0, 40.0, 55.0]
    """
    out = []
    for text in values:
        parts = str(text).split(":")
        try:
            nums = [float(p) for p in parts]
        except ValueError:
            raise ValueError(f"{name}: not a number or START:STOP:STEP range: {text!r}") from None
        if len(nums) == 1:
            out.append(nums[0])
        elif len(nums) == 3:
            start, stop, step = nums
            if step <= 0 or stop < start:
                raise ValueError(f"{name}: range {text!r} needs STEP > 0 and STOP >= START")
            n = int(math.floor((stop - start) / step + 1e-9)) + 1
            if n > 10000:
                raise ValueError(f"{name}: range {text!r} has too many values ({n})")
            out.extend(start + step * np.arange(n))
        else:
            raise ValueError(f"{name}: use numbers or START:STOP:STEP, got {text!r}")
    arr = np.asarray(out, dtype=float)
    hi_ok = arr <= high if closed_high else arr < high
    if not np.all(np.isfinite(arr)) or np.any(arr <= low) or not np.all(hi_ok):
        rb = "]" if closed_high else ")"
        raise ValueError(f"{name}: angles must be in ({low:g}, {high:g}{rb} degrees, got "
                         f"{', '.join(f'{v:g}' for v in arr)}")
    return arr


def add_arguments(parser):
    parser.add_argument("--radar", "-r", nargs="+", type=radar_argument, default=None,
                        metavar="BAND|FREQ",
                        help="radar band letters or frequencies, e.g. C X 5.4GHz 13.5MHz "
                        f"(default: {' '.join(DEFAULT_RADARS)})")
    parser.add_argument("--incidence", "-i", nargs="+", default=None, metavar="DEG",
                        help="incidence angles from the vertical [deg], numbers or "
                        "START:STOP:STEP; 90 = grazing (default: 20 30 40 50; 90 for "
                        "radars below 300 MHz)")
    parser.add_argument("--current", type=_float("current"), default=0.0, metavar="M/S",
                        help="surface current toward the radar [m/s] (shifts both lines)")
    parser.add_argument("--depth", type=_float("depth", positive=True, allow_inf=True),
                        default=math.inf, metavar="M", help="water depth [m]; inf = deep")
    add_water_arguments(parser, temperature_help="water temperature [degC] (surface tension)",
                        named=True)
    add_format_arguments(parser, shortcuts=True)
    parser.add_argument("--plot", metavar="FILE.png", default=None,
                        help="also write Bragg wavelength against incidence as PNG")


def bragg_table(radars, incidences, water, *, current=0.0, depth=math.inf):
    """Columns of the ``bragg`` table: one row per radar and incidence.

    Parameters
    ----------
    radars : list of (str, float)
        Labels and frequencies [Hz].
    incidences : sequence of float or None
        Incidence angles [deg]; None uses the defaults (grazing below 300 MHz).
    water : Water
    current, depth : float
        Radial current toward the radar [m/s]; depth [m].

    Returns
    -------
    dict of str to list (units in :data:`UNITS`)

    Examples
    --------
    >>> from shortwave.water import Water
    >>> t = bragg_table([("C", 5.405e9)], [30.0], Water(15, 35))
    >>> round(t["bragg_wavelength"][0], 5), round(t["radar_wavelength"][0], 5)
    (0.05547, 0.05547)
    """
    from ..radar import bragg_lines, bragg_wave, radar_wavelength
    cols = {name: [] for name in UNITS}
    for label, f in radars:
        if incidences is None:
            th = np.array([90.0]) if f < GRAZING_BELOW_HZ else np.asarray(DEFAULT_INCIDENCE)
        else:
            th = np.asarray(incidences, dtype=float)
        w = bragg_wave(f, th, water=water, depth=depth)
        adv, rec = bragg_lines(f, th, current=current, water=water, depth=depth)
        n = th.size
        cols["radar"] += [label] * n
        cols["frequency"] += [f] * n
        cols["incidence"] += [float(v) for v in th]
        cols["radar_wavelength"] += [float(radar_wavelength(f))] * n
        for key, val in (("bragg_wavelength", w.wavelength), ("bragg_wavenumber", w.wavenumber),
                         ("bragg_frequency", w.frequency), ("period", w.period),
                         ("phase_speed", w.phase_speed), ("doppler_advancing", adv),
                         ("doppler_receding", rec)):
            cols[key] += [float(v) for v in np.broadcast_to(val, th.shape)]
    return cols


def _title(water, current, depth):
    d = "deep water" if math.isinf(depth) else f"depth {depth:g} m"
    return (f"Bragg scales: sea water {water.temperature_c:g} degC, {water.salinity:g} g/kg, "
            f"{d}; current toward the radar {current:g} m/s (Doppler > 0 = approaching)\n")


def run(args):
    radars = args.radar or [radar_argument(b) for b in DEFAULT_RADARS]
    incid = None if args.incidence is None else angle_values(args.incidence)
    with warnings.catch_warnings(record=True) as caught:
        warnings.simplefilter("always")
        water = water_from_args(args)
        table = bragg_table(radars, incid, water, current=args.current, depth=args.depth)
    report_warnings(NAME, caught)
    head = {"water": {"temperature_c": float(water.temperature_c),
                      "salinity": float(water.salinity),
                      "depth": None if math.isinf(args.depth) else args.depth},
            "current": args.current}
    print_table(table, args.format, units=UNITS, head=head,
                title=_title(water, args.current, args.depth))
    if args.plot:
        from ..plots.radar import bragg_scales_plot
        path = bragg_scales_plot(radars, args.plot, water=water, depth=args.depth,
                                 marks=table)
        report_written(path, args.format)
    return 0
