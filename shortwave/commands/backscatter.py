"""``shortwave backscatter``: sea-surface NRCS against incidence for winds and polarisations.

For one radar, a set of incidence angles, wind speeds, wind directions and polarisations,
prints sigma0 (linear and dB) from the composite model of :func:`shortwave.radar.nrcs`
(specular + slope-averaged Bragg + breaking by default), optionally with each term.
``--plot`` draws sigma0 [dB] against incidence, one curve per wind and polarisation.
"""
from __future__ import annotations

import warnings

import numpy as np

from ._common import (add_format_arguments, add_water_arguments, print_table,
                      report_warnings, report_written, water_from_args)
from .bragg import _float, angle_values, radar_argument

NAME = "backscatter"
HELP = "sea-surface radar cross-section (sigma0) against incidence for winds and polarisations"
DESCRIPTION = (
    "Normalised radar cross-section sigma0 of the wind-roughened sea for one radar (band "
    "letter or frequency), incidence angles (degrees from the vertical, in (0, 90)), wind "
    "speeds U10 (m/s), wind directions relative to the look (--azimuth, degrees: 0 = "
    "upwind, i.e. wind blowing toward the radar; 180 = downwind) and polarisations.  "
    "Default model: specular term + Bragg scattering averaged over the long-wave slopes "
    "(two-scale) + breaking waves (Kudryavtsev et al. 2003), with the Elfouhaily et al. "
    "(1997) spectrum and the Meissner & Wentz (2004) sea-water permittivity.  Known "
    "limit: such models sit a few dB below observed C-band VV levels.")

DEFAULT_INCIDENCE = ("5:70:5",)
DEFAULT_WINDS = (5.0, 10.0, 15.0)

UNITS = {"radar": "", "frequency": "Hz", "wind_speed": "m/s", "azimuth": "deg",
         "polarization": "", "incidence": "deg", "sigma0": "1", "sigma0_db": "dB",
         "specular_db": "dB", "bragg_db": "dB", "tilted_bragg_db": "dB",
         "breaking_db": "dB", "breaking_fraction": "1"}


def _polarization(text):
    import argparse
    key = str(text).upper()
    if key not in ("VV", "HH", "HV", "VH"):
        raise argparse.ArgumentTypeError(
            f"unknown polarization {text!r}; choose VV, HH, HV or VH")
    return key


def add_arguments(parser):
    from ..radar import MODELS
    from ..spectrum import MODELS as SPECTRA
    parser.add_argument("--radar", "-r", type=radar_argument, default="C",
                        metavar="BAND|FREQ", help="radar band letter or frequency, e.g. C, "
                        "X, Ku, 5.4GHz")
    parser.add_argument("--incidence", "-i", nargs="+", default=list(DEFAULT_INCIDENCE),
                        metavar="DEG", help="incidence angles [deg] in (0, 90), numbers or "
                        "START:STOP:STEP (STOP included)")
    parser.add_argument("--wind", "-w", nargs="+", type=_float("wind", positive=True),
                        default=list(DEFAULT_WINDS), metavar="M/S",
                        help="wind speeds U10 [m/s]")
    parser.add_argument("--azimuth", "-a", nargs="+", type=_float("azimuth"), default=[0.0],
                        metavar="DEG", help="wind direction relative to the look [deg]: "
                        "0 upwind, 90 crosswind, 180 downwind")
    parser.add_argument("--polarization", "-p", nargs="+", type=_polarization,
                        default=["VV", "HH"], metavar="POL", help="VV, HH, HV (= VH)")
    parser.add_argument("--model", choices=MODELS, default="two-scale",
                        help="two-scale = full composite; or one term alone")
    parser.add_argument("--spectrum", choices=SPECTRA, default=SPECTRA[0],
                        help="wave spectrum model")
    parser.add_argument("--inverse-wave-age", type=_float("inverse wave age", positive=True),
                        default=None, metavar="OMEGA",
                        help="U10/c_p of the sea (0.84 = fully developed)")
    parser.add_argument("--fetch", type=_float("fetch", positive=True), default=None,
                        metavar="M", help="fetch [m] instead of --inverse-wave-age")
    add_water_arguments(parser, temperature_help="water temperature [degC] (permittivity)",
                        salinity_help="salinity [g/kg] (permittivity)", named=True)
    parser.add_argument("--cutoff-ratio", type=_float("cutoff ratio", positive=True),
                        default=0.25, metavar="R",
                        help="k_d / k_Bragg: waves longer than this tilt the Bragg facets")
    parser.add_argument("--no-breaking", action="store_true",
                        help="leave the breaking-wave term out of the two-scale sum")
    parser.add_argument("--components", action="store_true",
                        help="add columns for each term (specular, Bragg flat and tilted, "
                        "breaking) and the breaking fraction")
    add_format_arguments(parser, shortcuts=True)
    parser.add_argument("--plot", metavar="FILE.png", default=None,
                        help="also write sigma0 [dB] against incidence as PNG")


def backscatter_table(radar, incidences, winds, azimuths, polarizations, *, water,
                      model="two-scale", components=False, **options):
    """Columns of the ``backscatter`` table: one row per wind, azimuth, polarisation, angle.

    Each (polarisation) is one vectorised :func:`shortwave.radar.backscatter_components`
    call over all winds, azimuths and incidences.

    Examples
    --------
    >>> from shortwave.water import Water
    >>> t = backscatter_table(("C", 5.405e9), [40.0], [10.0], [0.0], ["VV", "HH"],
    ...                       water=Water(15, 35))
    >>> t["polarization"], bool(t["sigma0_db"][0] > t["sigma0_db"][1])
    (['VV', 'HH'], True)
    """
    from ..radar import backscatter_components, to_db
    label, f = radar
    th = np.asarray(incidences, dtype=float)
    u = np.asarray(winds, dtype=float)
    az = np.asarray(azimuths, dtype=float)
    U, A, T = np.meshgrid(u, az, th, indexing="ij")
    parts = ("two-scale", "bragg") if components else (model,)
    if components and model not in parts:
        parts = parts + (model,)
    cols = {name: [] for name in UNITS}
    if not components:
        for key in ("specular_db", "bragg_db", "tilted_bragg_db", "breaking_db",
                    "breaking_fraction"):
            cols.pop(key)
    for pol in polarizations:
        c = backscatter_components(f, T, U, pol, A, water=water, parts=parts, **options)
        s = np.asarray(c[model]).ravel()
        n = s.size
        cols["radar"] += [label] * n
        cols["frequency"] += [f] * n
        cols["wind_speed"] += list(U.ravel())
        cols["azimuth"] += list(A.ravel())
        cols["polarization"] += [pol] * n
        cols["incidence"] += list(T.ravel())
        cols["sigma0"] += list(s)
        cols["sigma0_db"] += list(np.asarray(to_db(s)).ravel())
        if components:
            for key, name in (("specular", "specular_db"), ("bragg", "bragg_db"),
                              ("tilted-bragg", "tilted_bragg_db"), ("breaking", "breaking_db")):
                cols[name] += list(np.asarray(to_db(c[key])).ravel())
            cols["breaking_fraction"] += list(np.asarray(c["breaking_fraction"]).ravel())
    return cols


def run(args):
    th = angle_values(args.incidence, high=90.0, closed_high=False)
    spectrum_options = {}
    if args.fetch is not None and args.inverse_wave_age is not None:
        raise ValueError("give either --fetch or --inverse-wave-age, not both")
    if args.fetch is not None:
        spectrum_options["fetch"] = args.fetch
    if args.inverse_wave_age is not None:
        spectrum_options["inverse_wave_age"] = args.inverse_wave_age
    if not 0 < args.cutoff_ratio < 1:
        raise ValueError(f"--cutoff-ratio: must be in (0, 1), got {args.cutoff_ratio:g}")
    pols = list(dict.fromkeys("HV" if p == "VH" else p for p in args.polarization))
    with warnings.catch_warnings(record=True) as caught:
        warnings.simplefilter("always")
        water = water_from_args(args)
        table = backscatter_table(args.radar, th, args.wind, args.azimuth, pols, water=water,
                                  model=args.model, components=args.components,
                                  spectrum_model=args.spectrum,
                                  spectrum_options=spectrum_options,
                                  cutoff_ratio=args.cutoff_ratio,
                                  breaking=not args.no_breaking)
    report_warnings(NAME, caught, unique=True)
    label, f = args.radar
    title = (f"sigma0 of the sea, radar {label} ({f / 1e9:g} GHz), model {args.model}, "
             f"spectrum {args.spectrum}; water {args.temperature:g} degC, "
             f"{args.salinity:g} g/kg; azimuth 0 = upwind\n")
    print_table(table, args.format, units=UNITS, title=title,
                head={"model": args.model, "spectrum": args.spectrum,
                      "water": {"temperature_c": args.temperature,
                                "salinity": args.salinity}})
    if args.plot:
        from ..plots.radar import backscatter_plot
        path = backscatter_plot(table, args.plot, title=title.strip())
        report_written(path, args.format)
    return 0
