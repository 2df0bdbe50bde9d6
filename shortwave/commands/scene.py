"""``shortwave scene``: Bragg scales, backscatter and slick contrast over a gridded scene."""
from __future__ import annotations

import argparse
import math
import os
import sys
import time
from functools import partial

from ._common import add_film_arguments, number

NAME = "scene"
HELP = "radar products for every cell of a gridded scene (NetCDF in, NetCDF out)"
DESCRIPTION = (
    "Read a gridded scene from NetCDF (wind as speed and direction or as eastward/northward "
    "components; incidence angle as a field or a swath; the radar look direction; "
    "optionally sea-surface temperature and salinity, a slick mask and a film thickness) "
    "and write, per cell: Bragg wavenumber and wavelength, the curvature spectrum at the "
    "Bragg wavenumber, NRCS (linear and dB) without and with the film, the slick contrast "
    "[dB], the damping ratio and the mean square slope.  Variables are found by CF "
    "standard_name, then common names, then --var ROLE=NAME; units are converted (m/s or "
    "knots, degree or radian, K or degC, salinity in g/kg or psu, thickness in m/mm/um).  "
    "Land and missing cells stay NaN and are counted.  Large files: --chunks reads them in "
    "dask chunks, --scheduler sends the work to a dask.distributed cluster.")

ROLES_HELP = ("wind_speed, wind_direction, eastward_wind, northward_wind, incidence_angle, "
              "sensor_azimuth, look_azimuth, sea_surface_temperature, sea_surface_salinity, "
              "slick_mask, film_thickness")


_number = partial(number, named=True)
"""argparse type: a finite float (``positive``: > 0, ``nonnegative``: >= 0)."""


def _pair(text):
    parts = text.replace(":", ",").split(",")
    try:
        vals = tuple(float(p) for p in parts)
    except ValueError:
        raise argparse.ArgumentTypeError(f"expected NEAR,FAR in degrees, got {text!r}") \
            from None
    if len(vals) != 2 or not all(math.isfinite(v) for v in vals):
        raise argparse.ArgumentTypeError(f"expected NEAR,FAR in degrees, got {text!r}")
    return vals


def add_arguments(parser):
    parser.add_argument("input", help="input NetCDF file with the scene")
    parser.add_argument("--output", "-o", required=True, metavar="FILE.nc",
                        help="output NetCDF file (never the input)")
    parser.add_argument("--overwrite", action="store_true",
                        help="replace the output file if it exists")
    parser.add_argument("--radar", default="C", metavar="BAND|FREQ",
                        help="radar band letter (L, S, C, X, Ku, Ka) or frequency (5.4GHz)")
    parser.add_argument("--polarization", default="VV", choices=("VV", "HH", "HV", "VH"),
                        type=str.upper, help="radar polarisation")
    parser.add_argument("--var", action="append", default=[], metavar="ROLE=NAME",
                        help=f"use variable NAME for ROLE (repeatable); roles: {ROLES_HELP}")
    geo = parser.add_argument_group("geometry and water (when the file lacks them)")
    geo.add_argument("--swath", type=_pair, default=None, metavar="NEAR,FAR",
                     help="incidence [degree] at the first and last cell across the swath "
                     "(flat-earth geometry); replaces an incidence variable")
    geo.add_argument("--across", default=None, metavar="DIM",
                     help="dimension across the swath (default: the last one)")
    geo.add_argument("--look-azimuth", type=_number("look azimuth"), default=None,
                     metavar="DEG", help="direction the radar looks, clockwise from north "
                     "[degree] (when the file has no sensor_azimuth_angle)")
    geo.add_argument("--temperature", type=_number("temperature"), default=None,
                     metavar="DEGC", help="water temperature [degC] when the file has no "
                     "sea_surface_temperature (default 15)")
    geo.add_argument("--salinity", type=_number("salinity", nonnegative=True), default=None,
                     metavar="G/KG", help="salinity [g/kg] when the file has none "
                     "(default 35)")
    mod = parser.add_argument_group("models")
    mod.add_argument("--model", default="two-scale",
                     help="backscatter model: two-scale, bragg, tilted-bragg, specular, "
                     "breaking")
    mod.add_argument("--contrast-model", default="two-scale",
                     help="film effect on backscatter: two-scale, balance, "
                     "alpers_huhnerfuss1989")
    mod.add_argument("--min-wind", type=_number("minimum wind", positive=True), default=0.5,
                     metavar="M/S", help="cells with less wind are left NaN (calm)")
    film = parser.add_argument_group(
        "film (optional; the slick mask / film thickness of the file says where it is)")
    film.add_argument("--film", metavar="NAME", default=None,
                      help="film preset (see `shortwave slick --list-films`)")
    film.add_argument("--cover", default="auto", choices=("auto", "mask", "everywhere"),
                      help="where the film is: the file's mask, or every sea cell (a "
                      "what-if map); auto = the mask when there is one")
    add_film_arguments(film, oil_thickness_help="oil layer thickness [m] (a "
                       "film_thickness variable in the file takes precedence)")
    run_ = parser.add_argument_group("running")
    run_.add_argument("--chunks", default=None, metavar="DIM:N,...|auto",
                      help="read in dask chunks and compute lazily (default: auto for "
                      "inputs above 2 million cells, else all at once)")
    run_.add_argument("--scheduler", default=None, metavar="ADDRESS",
                      help="dask.distributed scheduler address (tcp://host:8786), or "
                      "local:N to start a local cluster of N worker processes; implies "
                      "--chunks auto")
    show = run_.add_mutually_exclusive_group()
    show.add_argument("--progress", dest="progress", action="store_true", default=None,
                      help="show progress on stderr (default: when stderr is a terminal)")
    show.add_argument("--quiet", "-q", dest="progress", action="store_false",
                      help="print nothing but errors")
    parser.add_argument("--plot", metavar="FILE.png", default=None,
                        help="also write maps of wind, NRCS and slick contrast")


_FILM_OPTIONS = ("film", "elasticity", "relaxation_frequency", "dilational_viscosity",
                 "film_pressure", "oil_thickness", "oil_viscosity", "oil_density",
                 "oil_surface_tension", "oil_interfacial_tension")


def _film(args):
    if all(getattr(args, k) is None for k in _FILM_OPTIONS):
        return None
    from .slick import build_film
    return build_film(args)


LAZY_CELLS = 2_000_000
"""Scenes with more cells than this are read in dask chunks even without --chunks (when
dask is installed), so that memory stays bounded and progress can be shown."""


def _auto_chunks(path):
    """``"auto"`` for large inputs (more than :data:`LAZY_CELLS` cells) when dask is there."""
    try:
        import dask  # noqa: F401
    except ImportError:
        return None
    from ..ncio import open_input
    with open_input(path) as ds:
        cells = max((int(v.size) for v in ds.data_vars.values()), default=0)
    return "auto" if cells > LAZY_CELLS else None


def _client(address):
    try:
        from dask.distributed import Client
    except ImportError:
        raise ValueError("--scheduler needs dask.distributed, which is not installed "
                         "(pip install 'shortwave[dask]')") from None
    if address.startswith("local:"):
        try:
            n = int(address.split(":", 1)[1])
            if n < 1:
                raise ValueError
        except ValueError:
            raise ValueError(f"--scheduler {address}: expected local:N with N >= 1") \
                from None
        from ..fields import start_local_cluster
        return start_local_cluster(n)
    try:
        return Client(address, timeout="10s"), None
    except (OSError, TimeoutError) as exc:
        raise OSError(f"--scheduler {address}: cannot connect ({exc})") from None


def _computer(progress, client):
    """The ``compute=`` callable of the writer: with a progress display, on a cluster."""
    if client is not None:
        def compute(delayed):
            fut = client.compute(delayed)
            if progress:
                import contextlib
                from dask.distributed import progress as dprogress
                with contextlib.redirect_stdout(sys.stderr):   # the bar goes to stderr
                    dprogress(fut, notebook=False)
                print(file=sys.stderr)
            return fut.result()
        return compute
    if progress:
        def compute(delayed):
            from dask.diagnostics import ProgressBar
            with ProgressBar(minimum=1.0, out=sys.stderr):
                return delayed.compute()
        return compute
    return True


def run(args):
    from .. import fields, ncio, radar
    from ..tables import format_table

    f = radar.parse_frequency(args.radar)
    film = _film(args)
    progress = args.progress if args.progress is not None else sys.stderr.isatty()
    chunks = ncio.parse_chunks(args.chunks) if args.chunks else None
    if not os.path.exists(args.input):
        raise FileNotFoundError(f"input file {args.input} does not exist")
    if args.plot:
        pfolder = os.path.dirname(os.path.abspath(args.plot))
        if not os.path.isdir(pfolder):
            raise OSError(f"--plot: folder {pfolder} does not exist")
        if ncio.same_file(args.plot, args.input):
            raise ValueError("--plot: the figure path is the input file")
    if chunks is None and not args.scheduler:
        chunks = _auto_chunks(args.input)
    client = cluster = None
    if args.scheduler:
        chunks = chunks or "auto"
        client, cluster = _client(args.scheduler)
    t0 = time.perf_counter()
    try:
        path, products, scan = fields.process_scene(
            args.input, args.output, frequency_hz=f, polarization=args.polarization,
            film=film, cover=args.cover, contrast_model=args.contrast_model,
            model=args.model, min_wind_speed=args.min_wind, overrides=args.var,
            chunks=chunks, swath=args.swath, across_dim=args.across,
            look_azimuth=args.look_azimuth, temperature_c=args.temperature,
            salinity=args.salinity, overwrite=args.overwrite,
            compute=_computer(progress, client) if chunks else True)
    finally:
        if client is not None:
            client.close()
        if cluster is not None:
            cluster.close()
    elapsed = time.perf_counter() - t0
    if args.progress is False:
        if args.plot:
            _plot(path, args.plot)
        return 0
    import xarray as xr
    from ..plots.maps import units_label
    with xr.open_dataset(path) as out:
        rows = {"variable": [], "units": [], "min": [], "max": [], "NaN cells": []}
        for name, da in out.data_vars.items():
            vals = da.values
            finite = vals[~(vals != vals)]
            rows["variable"].append(name)
            rows["units"].append(units_label(da.attrs.get("units", "")))
            rows["min"].append(float(finite.min()) if finite.size else float("nan"))
            rows["max"].append(float(finite.max()) if finite.size else float("nan"))
            rows["NaN cells"].append(str(int(vals.size - finite.size)))
    print(format_table(rows, digits=4,
                       title=f"{path}: {scan.cells} cells ({scan.missing} land/missing, "
                             f"{scan.calm} calm below {args.min_wind:g} m/s), "
                             f"radar {f / 1e9:g} GHz {args.polarization}, "
                             f"{elapsed:.1f} s"))
    if film is not None:
        from ..slick import CAUTION
        where = ("on the slick mask / film thickness of the input"
                 if products.attrs.get("film_cover") == "mask"
                 else "over every sea cell (what-if)")
        print(f"film: {film.name}, {where}, {products.attrs.get('cells_film')} cells, "
              f"contrast model {products.attrs.get('contrast_model')}")
        print(CAUTION)
    print(f"wrote {path}")
    if args.plot:
        print(f"wrote {_plot(path, args.plot)}")
    return 0


def _plot(path, png):
    import xarray as xr
    from ..plots.maps import scene_overview
    with xr.open_dataset(path) as out:
        return scene_overview(out.load(), png)
