"""``shortwave spectrum``: the full-range wind-wave spectrum for a wind, and its moments.

For one or more wind speeds (U10) and a fetch or an inverse wave age, prints the peak,
significant wave height and mean square slopes (total, along and across the wind) over a
stated wavenumber range; optionally writes the spectra to NetCDF (S(k), B(k), Delta(k),
F(k, phi), with CF attributes) and a PNG of the curvature spectrum B(k) from the peak to
about 5000 rad/m, with the Bragg wavenumbers of radar bands marked on request.
"""
from __future__ import annotations

import sys
import warnings
from functools import partial

import numpy as np

from ._common import (add_format_arguments, add_water_arguments, number, print_table,
                      report_warnings, report_written, water_from_args)

NAME = "spectrum"
HELP = "full-range wind-wave spectrum for a wind: moments, NetCDF and a curvature plot"
DESCRIPTION = (
    "Compute the wind-wave spectrum over the whole wavenumber range, from the spectral "
    "peak to capillary ripples, for wind speeds U10 (m/s, neutral, 10 m) and a fetch or an "
    "inverse wave age U10/c_p (0.84 = fully developed, valid 0.84-5).  Prints the peak, "
    "significant wave height 4 sqrt(variance) and the mean square slope, total and along/"
    "across the wind, integrated from --k-min (default k_p/50) to --k-max (rad/m).  "
    "Spectra are one-sided in k and centrosymmetric in direction (frozen surface); "
    "direction is measured from the downwind direction.  --output writes S(k) [m3], "
    "B(k) = k^3 S [1], Delta(k) and F(k, phi) [m3 rad-1] to NetCDF; --plot draws B(k); "
    "--bands marks the Bragg wavenumbers 2 k_radar sin(incidence) of radar bands.")

UNITS = {"wind_speed": "m/s", "inverse_wave_age": "1", "friction_velocity": "m/s",
         "peak_wavenumber": "rad/m", "peak_wavelength": "m", "peak_period": "s",
         "significant_wave_height": "m", "mean_square_slope": "1",
         "mean_square_slope_upwind": "1", "mean_square_slope_crosswind": "1",
         "k_min": "rad/m", "k_max": "rad/m"}

PLOT_K_MAX = 5000.0
"""Upper end of the curvature plot [rad m-1]."""


_number = partial(number, positive=True)
"""argparse type: a finite, positive (unless ``positive=False``) float."""


def add_arguments(parser):
    from ..spectrum import DEFAULT_K_MAX, DEFAULT_POINTS, MODELS, USTAR_LAWS
    parser.add_argument("--wind-speed", "-u", nargs="+", type=_number("wind speed"),
                        required=True, metavar="M/S",
                        help="wind speed U10 [m/s] (neutral, 10 m); several give one row each")
    sea = parser.add_mutually_exclusive_group()
    sea.add_argument("--fetch", type=_number("fetch", allow_inf=True), default=None,
                     metavar="KM", help="fetch [km]; gives the inverse wave age "
                     "(Elfouhaily et al. 1997 Eq. 37); inf = fully developed")
    sea.add_argument("--inverse-wave-age", type=_number("inverse wave age"), default=0.84,
                     metavar="OMEGA", help="U10/c_p; 0.84 fully developed, valid 0.84-5")
    parser.add_argument("--model", choices=MODELS, default="elfouhaily1997",
                        help="spectrum model")
    parser.add_argument("--ustar-law", choices=USTAR_LAWS, default="constant-drag",
                        help="friction velocity from U10 (constant-drag: C_D = 1.44e-3)")
    parser.add_argument("--k-min", type=_number("k-min"), default=None, metavar="RAD/M",
                        help="lower limit of the slope integrals [rad/m] (default k_p/50)")
    parser.add_argument("--k-max", type=_number("k-max"), default=DEFAULT_K_MAX,
                        metavar="RAD/M", help="upper limit of the slope integrals [rad/m]")
    parser.add_argument("--points", type=int, default=DEFAULT_POINTS, metavar="N",
                        help="log-uniform wavenumbers of the integrals and the file")
    add_water_arguments(parser, temperature_default=None,
                        temperature_help="water temperature [degC]; sets surface tension "
                        "(and viscosity for yurovskaya2013).  Default: the model's own "
                        "constants (elfouhaily1997: k_m = 370 rad/m; yurovskaya2013: 15 degC)",
                        salinity_help="absolute salinity [g/kg], used with --temperature")
    parser.add_argument("--directions", type=int, default=72, metavar="N",
                        help="number of directions of F(k, phi) in the NetCDF file")
    parser.add_argument("--output", "-o", metavar="FILE.nc", default=None,
                        help="write the spectra and moments to this NetCDF file")
    parser.add_argument("--overwrite", action="store_true",
                        help="replace an existing --output file")
    parser.add_argument("--plot", metavar="FILE.png", default=None,
                        help="write the curvature spectrum B(k) (peak to 5000 rad/m) as PNG")
    parser.add_argument("--bands", nargs="+", default=(), metavar="BAND",
                        help="mark Bragg wavenumbers on the plot: band letters (L C X Ku) "
                        "or frequencies (5.4GHz)")
    parser.add_argument("--incidence", type=_number("incidence"), nargs="+", default=[40.0],
                        metavar="DEG", help="incidence angles [degree] of the Bragg marks")
    add_format_arguments(parser)


def compute(args):
    """Compute the spectra and moments for the parsed arguments (dict of arrays)."""
    from .. import spectrum as sp
    from ..spectrum import moments

    if args.points < 11:
        raise ValueError(f"--points: at least 11 are needed, got {args.points}")
    if args.directions < 4 or args.directions % 2:
        raise ValueError(f"--directions: an even number >= 4 is needed, got {args.directions}")
    U = np.asarray(args.wind_speed, dtype=float)
    water = None if args.temperature is None else water_from_args(args)
    if args.fetch is not None:
        om = np.atleast_1d(sp.inverse_wave_age_from_fetch(args.fetch * 1e3, U))
    else:
        om = np.full(U.shape, args.inverse_wave_age)
    kw = dict(model=args.model, inverse_wave_age=om, water=water, ustar_law=args.ustar_law)
    kp = np.atleast_1d(sp.peak_wavenumber(U, om))
    kmin = kp / 50.0 if args.k_min is None else np.full(U.shape, args.k_min)
    if np.any(args.k_max <= kmin):
        raise ValueError(f"--k-max: must exceed --k-min ({args.k_max:g} rad/m)")
    t, up, cr = (np.atleast_1d(v) for v in sp.mean_square_slope_components(
        U, k_min=kmin, k_max=args.k_max, n=args.points, **kw))
    # one common log-uniform grid for the file, the plot and the variance
    k = np.geomspace(min(float(np.min(kp)) / 50.0, float(np.min(kmin))),
                     max(args.k_max, PLOT_K_MAX), args.points)
    S = np.atleast_2d(sp.omnidirectional(k, U[:, None], **{**kw, "inverse_wave_age": om[:, None]}))
    inside = (k[None, :] >= kmin[:, None]) & (k[None, :] <= args.k_max)
    hs = 4.0 * np.sqrt(np.trapezoid(np.where(inside, S, 0.0), k, axis=-1))
    us = np.atleast_1d(sp.friction_velocity(U, args.ustar_law, om, gravity=9.81))
    omega_p = np.sqrt(9.81 * kp * (1 + (kp / 370.0) ** 2))
    table = {"wind_speed": U, "inverse_wave_age": om, "friction_velocity": us,
             "peak_wavenumber": kp, "peak_wavelength": 2 * np.pi / kp,
             "peak_period": 2 * np.pi / omega_p, "significant_wave_height": hs,
             "mean_square_slope": t, "mean_square_slope_upwind": up,
             "mean_square_slope_crosswind": cr, "k_min": kmin,
             "k_max": np.full(U.shape, args.k_max)}
    return {"table": table, "k": k, "S": S, "water": water, "kw": kw, "om": om,
            "moments": moments}


def _dataset(args, res):
    import xarray as xr

    from .. import __version__
    from .. import spectrum as sp
    from ..metadata import apply_metadata

    k, S, kw, om = res["k"], res["S"], res["kw"], res["om"]
    U = res["table"]["wind_speed"]
    phi = np.arange(args.directions) * 360.0 / args.directions
    F = np.asarray(sp.directional(k[None, :, None], phi, U[:, None, None],
                                  **{**kw, "inverse_wave_age": om[:, None, None]}))
    delta = np.asarray(sp.spreading(k, U[:, None], **{**kw, "inverse_wave_age": om[:, None]}))
    t = res["table"]
    ds = xr.Dataset(
        {"omnidirectional_spectrum": (("wind_speed", "wavenumber"), S),
         "curvature_spectrum": (("wind_speed", "wavenumber"), S * k**3),
         "spreading_ratio": (("wind_speed", "wavenumber"), delta),
         "directional_spectrum": (("wind_speed", "wavenumber", "direction"), F),
         "inverse_wave_age": ("wind_speed", t["inverse_wave_age"]),
         "friction_velocity": ("wind_speed", t["friction_velocity"]),
         "peak_wavenumber": ("wind_speed", t["peak_wavenumber"]),
         "significant_wave_height": ("wind_speed", t["significant_wave_height"]),
         "mean_square_slope": ("wind_speed", t["mean_square_slope"]),
         "mean_square_slope_upwind": ("wind_speed", t["mean_square_slope_upwind"]),
         "mean_square_slope_crosswind": ("wind_speed", t["mean_square_slope_crosswind"])},
        coords={"wind_speed": U, "wavenumber": k, "direction": phi})
    apply_metadata(ds)
    local = {  # outputs without an entry in shortwave.metadata (no CF standard name exists)
        "spreading_ratio": {"long_name": "upwind/crosswind ratio function Delta(k) of the "
                            "directional spreading", "units": "1",
                            "comment": "F(k, phi) = S(k) (1 + Delta cos 2 phi) / (2 pi)"},
        "inverse_wave_age": {"long_name": "inverse wave age U10 / c_p", "units": "1"},
        "friction_velocity": {"long_name": "friction velocity in air", "units": "m s-1"},
        "peak_wavenumber": {"long_name": "wavenumber of the spectral peak",
                            "units": "rad m-1"},
    }
    for name, attrs in local.items():
        if not ds[name].attrs:
            ds[name].attrs = attrs
    ds["direction"].attrs["comment"] = ("angle of the wave vector from the direction the wind "
                                        "blows towards; the spectrum is centrosymmetric")
    rng = (f"slopes and Hs integrated over k_min..{args.k_max:g} rad m-1 "
           "(k_min per wind in the table: default k_p/50)")
    ds.attrs = {
        "title": "Full-range wind-wave spectrum (wavenumber domain)",
        "source": f"shortwave {__version__}, model {args.model}",
        "references": {"elfouhaily1997": "Elfouhaily et al. (1997) J. Geophys. Res. 102(C7) "
                                         "15781-15796",
                       "yurovskaya2013": "Kudryavtsev et al. (1999, 2003); Yurovskaya et al. "
                                         "(2013) J. Geophys. Res. Oceans 118, 4380-4394; joined "
                                         "to Elfouhaily et al. (1997)"}[args.model],
        "model": args.model,
        "ustar_law": args.ustar_law,
        "comment": ("Wavenumber spectra have no CF standard name: S(k), B(k) and F(k, phi) "
                    "carry long_name and units only.  One-sided in k; F(k, phi) is "
                    "centrosymmetric (frozen surface), so half of its variance travels "
                    "against the wind.  " + rng),
    }
    if args.fetch is not None:
        ds.attrs["fetch_km"] = float(args.fetch)
    if res["water"] is not None:
        ds.attrs["water_temperature_degC"] = float(args.temperature)
        ds.attrs["water_salinity_g_per_kg"] = float(args.salinity)
    return ds


def _marks(args):
    from ..radar import bragg_wavenumber, parse_frequency
    marks = []
    for token in args.bands:
        f = parse_frequency(token)
        for inc in args.incidence:
            marks.append((f"{token} {inc:g}°", float(bragg_wavenumber(f, inc))))
    return marks


def run(args):
    with warnings.catch_warnings(record=True) as caught:
        warnings.simplefilter("always")
        res = compute(args)
        ds = _dataset(args, res) if args.output else None
        marks = _marks(args) if args.plot else []
    report_warnings(NAME, caught, unique=True)
    if args.bands and not args.plot:
        print(f"shortwave {NAME}: warning: --bands only marks the --plot figure",
              file=sys.stderr)
    table = res["table"]
    sea = (f"fetch {args.fetch:g} km" if args.fetch is not None
           else f"inverse wave age {args.inverse_wave_age:g}")
    title = (f"Wind-wave spectrum, model {args.model}, {sea}, u* law {args.ustar_law}\n"
             "Hs = 4 sqrt(variance); slopes integrated from k_min to k_max; "
             "upwind/crosswind = along/across the wind axis\n")
    print_table(table, args.format, units=UNITS, title=title,
                head={"model": args.model, "ustar_law": args.ustar_law})
    if args.output:
        from ..ncio import write_netcdf
        path = write_netcdf(ds, args.output, overwrite=args.overwrite,
                            encoding={c: {"_FillValue": None} for c in ds.coords})
        report_written(path, args.format)
    if args.plot:
        from ..plots.spectrum import curvature_figure
        k = res["k"]
        lo = float(np.min(table["peak_wavenumber"]))
        curves = [(f"U10 = {u:g} m/s, Ω = {o:.3g}", s * k**3)
                  for u, o, s in zip(table["wind_speed"], table["inverse_wave_age"], res["S"])]
        path = curvature_figure(k, curves, args.plot, marks=marks, k_range=(lo, PLOT_K_MAX),
                                title=f"Curvature spectrum, {args.model}")
        report_written(path, args.format)
    return 0
