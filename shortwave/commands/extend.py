"""``shortwave extend``: wave-model spectra in, spectra with the capillary-gravity tail out.

Reads frequency-direction spectra E(f, theta) from a NetCDF file (point or gridded
output of a spectral wave model), converts them to wavenumber-direction spectra at the
water depth, grafts the tail of a full-range spectrum model above a transition band, and
writes the extended spectra with Hs and mean square slopes (resolved part, tail, total;
along and across the wind) to a new CF-1.10 NetCDF file.  Prints a summary table;
``--plot`` draws one chosen spectrum.  See :mod:`shortwave.tail` for the method.
"""
from __future__ import annotations

import os
import sys
import warnings
from functools import partial

import numpy as np

from ._common import add_format_arguments, number, print_table, report_warnings, report_written

NAME = "extend"
HELP = "extend wave-model spectra (NetCDF) with the capillary-gravity tail"
DESCRIPTION = (
    "Read frequency-direction wave spectra E(f, theta) from a NetCDF file, convert them "
    "to wavenumber-direction spectra F(k, theta) at the water depth (variance conserved "
    "bin by bin), keep them up to the highest frequency, and add a model tail blended in "
    "over one octave in wavenumber, out to --k-max (default 2000 rad/m: Ka-band Bragg "
    "waves at any incidence).  Writes a CF-1.10 NetCDF file with the extended spectra, "
    "B(k), Hs and the mean square slope (total, along and across the wind; wave-model "
    "part and tail separately).  Variables are found by CF standard_name, then common "
    "names; name them with --var ROLE=NAME (roles: spectrum, frequency, direction, "
    "wind_speed, wind_direction, eastward_wind, northward_wind, depth).  Spectra per "
    "degree or per radian, frequencies in Hz, directions in degrees or radians, from or "
    "to, sorted or not, packed or not are all read.  NaN spectra (land) stay NaN.")


_number = partial(number, positive=True)
"""argparse type: a finite, positive (unless ``positive=False``) float."""


def _depth(text):
    if text.strip().lower() in ("deep", "inf", "infinite"):
        return "deep"
    return _number("depth")(text)


def _omega(text):
    if text.strip().lower() == "peak":
        return "peak"
    return _number("inverse wave age")(text)


def add_arguments(parser):
    from ..spectrum import MODELS
    from ..tail import K_MAX, POINTS_PER_DECADE, TRANSITION_RATIO
    parser.add_argument("input", metavar="INPUT.nc", help="NetCDF file with E(f, theta)")
    parser.add_argument("--output", "-o", required=True, metavar="OUTPUT.nc",
                        help="NetCDF file to write (never the input)")
    parser.add_argument("--overwrite", action="store_true",
                        help="replace OUTPUT.nc if it exists")
    parser.add_argument("--var", action="append", default=[], metavar="ROLE=NAME",
                        help="name the variable of a role when the standard_name lookup "
                        "fails, e.g. --var spectrum=efth --var wind_speed=U10 (repeatable)")
    parser.add_argument("--units", action="append", default=[], metavar="ROLE=UNIT",
                        help="units to assume for a role whose units attribute is missing "
                        "or wrong, e.g. --units spectrum='m2 s degree-1' (repeatable)")
    parser.add_argument("--direction-convention", choices=("from", "to"), default=None,
                        help="whether the direction axis gives where waves come from or go "
                        "to (only needed when its standard_name does not say)")
    wind = parser.add_argument_group("wind (needed for the tail)")
    wind.add_argument("--wind-file", metavar="FILE.nc", default=None,
                      help="read the wind from this file instead of INPUT (same "
                      "time/station or grid coordinates)")
    wind.add_argument("--wind-speed", type=_number("wind speed", positive=False),
                      default=None, metavar="M/S",
                      help="constant wind speed U10 [m/s] for every spectrum")
    wind.add_argument("--wind-direction", type=_number("wind direction", positive=False),
                      default=None, metavar="DEG",
                      help="constant direction the wind comes from [degree]")
    parser.add_argument("--depth", type=_depth, default=None, metavar="M|deep",
                        help="water depth [m] or 'deep' (default: the file's depth "
                        "variable if any, else deep water)")
    tail = parser.add_argument_group("tail")
    tail.add_argument("--model", choices=MODELS, default="elfouhaily1997",
                      help="spectrum model of the tail")
    tail.add_argument("--inverse-wave-age", type=_omega, default="peak", metavar="peak|X",
                      help="U10/c_p given to the model: 'peak' from each spectrum's peak "
                      "(clipped to 0.84-5), or a number (0.84 = fully developed)")
    tail.add_argument("--k-max", type=_number("k-max"), default=K_MAX, metavar="RAD/M",
                      help="upper wavenumber of the output [rad/m]")
    tail.add_argument("--points-per-decade", type=int, default=POINTS_PER_DECADE,
                      metavar="N", help="output wavenumber cells per decade")
    tail.add_argument("--transition-ratio", type=_number("transition ratio"),
                      default=TRANSITION_RATIO, metavar="R",
                      help="the tail blends into the model over [k_s, R k_s], k_s = k of "
                      "the highest frequency")
    tail.add_argument("--moments-only", action="store_true",
                      help="write only Hs and slopes, not the spectra")
    tail.add_argument("--compress", type=int, default=0, choices=range(10), metavar="0-9",
                      help="zlib level for the extended spectra (0: none, fastest)")
    run = parser.add_argument_group("large files")
    run.add_argument("--chunk-spectra", type=int, default=1000, metavar="N",
                     help="spectra per dask chunk (memory stays bounded by the chunk); "
                     "0 reads everything at once")
    run.add_argument("--chunks", default=None, metavar="DIM:N,...",
                     help="explicit dask chunks instead of --chunk-spectra")
    run.add_argument("--scheduler", default=None, metavar="ADDRESS",
                     help="dask.distributed scheduler address (e.g. tcp://host:8786)")
    run.add_argument("--progress", dest="progress", action="store_true", default=None,
                     help="show a progress bar on stderr (default: when stderr is a "
                     "terminal)")
    run.add_argument("--no-progress", dest="progress", action="store_false",
                     help="never show a progress bar")
    parser.add_argument("--plot", metavar="FILE.png", default=None,
                        help="also draw one spectrum: wave-model part, tail, seam")
    parser.add_argument("--plot-at", action="append", default=[], metavar="DIM=VALUE",
                        help="which spectrum to draw, e.g. --plot-at "
                        "station_name='Corrow Bank' --plot-at time=2031-10-02T06:00 "
                        "(default: the first)")
    add_format_arguments(parser, help="how to print the summary table")


def _units_map(items):
    from ..ncio import ROLES
    out = {}
    for item in items:
        role, sep, unit = str(item).partition("=")
        if not sep or not unit.strip():
            raise ValueError(f"--units {item!r}: expected ROLE=UNIT, e.g. spectrum='m2 s "
                             "degree-1'")
        if role.strip() not in ROLES:
            raise ValueError(f"--units {item!r}: unknown role {role.strip()!r}; roles: "
                             f"{', '.join(sorted(ROLES))}")
        out[role.strip()] = unit.strip()
    return out


SUMMARY_ROWS = (
    ("significant_wave_height_resolved", "Hs, wave-model part", "m"),
    ("significant_wave_height", "Hs, extended", "m"),
    ("mean_square_slope_resolved", "mss, wave-model part", "1"),
    ("mean_square_slope_tail", "mss, tail", "1"),
    ("mean_square_slope", "mss, extended", "1"),
    ("mean_square_slope_upwind", "mss along the wind, extended", "1"),
    ("mean_square_slope_crosswind", "mss across the wind, extended", "1"),
    ("seam_wavenumber", "seam wavenumber k_s", "rad/m"),
    ("inverse_wave_age", "inverse wave age of the tail", "1"),
)


def summary_table(out):
    """Columns (quantity, unit, mean, min, max) over the extended spectra of ``out``.

    Examples
    --------
    >>> from shortwave.synthetic import greyhaven_spectra
    >>> from shortwave.tail import extend_dataset
    >>> t = summary_table(extend_dataset(greyhaven_spectra(2)))
    >>> t["quantity"][0]
    'Hs, wave-model part'
    """
    cols = {"quantity": [], "unit": [], "mean": [], "min": [], "max": []}
    for var, words, unit in SUMMARY_ROWS:
        if var not in out:
            continue
        v = np.asarray(out[var].values, dtype=float).ravel()
        v = v[np.isfinite(v)]
        cols["quantity"].append(words)
        cols["unit"].append(unit)
        for key, fn in (("mean", np.mean), ("min", np.min), ("max", np.max)):
            cols[key].append(float(fn(v)) if v.size else float("nan"))
    return cols


def _compute_with_progress(show):
    def compute(delayed):
        if show:
            from dask.diagnostics import ProgressBar
            with ProgressBar(minimum=1.0, out=sys.stderr):
                delayed.compute()
        else:
            delayed.compute()
    return compute


def run(args):
    from .. import ncio
    from ..tail import (chunk_plan, count_spectra, extend_dataset, output_encoding,
                        prepare_inputs, spectrum_parts, splits_stored_chunks)

    inputs = [args.input] + ([args.wind_file] if args.wind_file else [])
    ncio.check_output(args.output, inputs, args.overwrite)   # refuse before any work
    overrides = ncio.parse_overrides(args.var)
    units = _units_map(args.units)
    if args.points_per_decade < 4:
        raise ValueError(f"--points-per-decade must be >= 4, got {args.points_per_decade}")

    try:
        import dask  # noqa: F401
        have_dask = True
    except ImportError:
        have_dask = False
    explicit = ncio.parse_chunks(args.chunks) if args.chunks else None
    if (explicit or args.scheduler) and not have_dask:
        raise ValueError("--chunks and --scheduler need dask, which is not installed")
    client = None
    if args.scheduler:
        from dask.distributed import Client
        client = Client(args.scheduler)
    caught = []
    try:
        ds = ncio.open_input(args.input, chunks=explicit)
        wind_ds = ncio.open_input(args.wind_file) if args.wind_file else None
        try:
            with warnings.catch_warnings(record=True) as caught:
                warnings.simplefilter("always")
                if explicit is None and have_dask and args.chunk_spectra > 0:
                    inp = prepare_inputs(ds, overrides=overrides, units=units,
                                         direction_convention=args.direction_convention)
                    spec_dims = [inp["frequency_dim"], inp["direction_dim"]]
                    var = ds[inp["name"]]
                    stored = dict(zip(var.dims, var.encoding.get("chunksizes") or ()))
                    plan = chunk_plan(ds.sizes, inp["batch_dims"], args.chunk_spectra,
                                      stored)
                    if splits_stored_chunks(plan, ds.sizes, stored):
                        warnings.warn(
                            f"the file stores {inp['name']!r} in chunks of "
                            f"{tuple(var.encoding['chunksizes'])} along {var.dims}, larger "
                            f"than {args.chunk_spectra} spectra: each is read (and "
                            "decompressed) several times, which is slow; raise "
                            "--chunk-spectra or rewrite the file with smaller chunks")
                    plan.update({d: -1 for d in spec_dims})
                    ds = ds.chunk({d: n for d, n in plan.items() if d in ds.dims})
                    if wind_ds is not None:
                        wind_ds = wind_ds.chunk(
                            {d: n for d, n in plan.items() if d in wind_ds.dims})
                options = dict(overrides=overrides, units=units,
                               direction_convention=args.direction_convention,
                               wind=wind_ds, wind_speed=args.wind_speed,
                               wind_direction=args.wind_direction, depth=args.depth,
                               model=args.model, inverse_wave_age=args.inverse_wave_age,
                               k_max=args.k_max, points_per_decade=args.points_per_decade,
                               transition_ratio=args.transition_ratio)
                out = extend_dataset(ds, keep_spectra=not args.moments_only,
                                     input_name=os.path.basename(args.input),
                                     wind_source=args.wind_file, **options)
                parts = None
                if args.plot:     # one spectrum, cheap: settles a bad choice before the run
                    parts = spectrum_parts(ds, args.plot_at, **options)
                show = args.progress if args.progress is not None else sys.stderr.isatty()
                ncio.write_netcdf(out, args.output, inputs=inputs, overwrite=args.overwrite,
                                  encoding=output_encoding(out, args.compress),
                                  compute=_compute_with_progress(show and have_dask
                                                                 and client is None))
        finally:
            ds.close()
            if wind_ds is not None:
                wind_ds.close()
    finally:
        if client is not None:
            client.close()
    report_warnings(NAME, caught)

    written = ncio.open_input(args.output)
    try:
        counts = count_spectra(written)
        table = summary_table(written)
    finally:
        written.close()
    png = None
    if args.plot:
        from ..plots.tail import tail_figure
        png = tail_figure(parts, args.plot)
    head = (f"{counts['spectra']} spectra from {args.input}: {counts['extended']} extended, "
            f"{counts['nan_spectra']} NaN spectra (kept NaN), {counts['no_wind']} without "
            f"wind (tail NaN); wrote {args.output}")
    print_table(table, args.format, title=head + "\n", note=head,
                head={"counts": counts, "output": args.output})
    if png:
        report_written(png, args.format)
    return 0
