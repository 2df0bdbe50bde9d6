"""The demonstration run: every job of shortwave on the invented Greyhaven Sound scenario.

:func:`run_demo` builds the invented coastal scene from code (no downloads, see
:mod:`shortwave.scene_synthetic` and :mod:`shortwave.synthetic`), runs each ``shortwave``
command on it exactly as a user would type it, and writes NetCDF files, CSV tables and PNG
figures into one folder, with a ``README.txt`` listing every file and the command that
made it.  It returns the list of files written with a one-line description of each; it
prints nothing (the ``shortwave demo`` command does).

The scenario: Greyhaven Sound is a bay whose headland, Corrow Head, shelters a low-wind
zone from a west-north-westerly wind; a radar looks east across it at incidence 20-45
degrees; an invented film patch, the Mistle slick, drifts in open water; three invented
wave-model stations (Greyhaven Outer, Corrow Bank, Mistle Point) report spectra.  The
water is 12 degC, 33 g/kg on average.
"""
from __future__ import annotations

import contextlib
import io
import os
import shlex
from dataclasses import dataclass

import numpy as np

__all__ = ["Product", "run_demo", "demo_steps", "GREYHAVEN_WATER", "STEPS", "write_text_atomic"]

GREYHAVEN_WATER = {"temperature_c": 12.0, "salinity": 33.0}
"""Typical surface water of the invented Greyhaven Sound: 12 degC, 33 g/kg."""

_T = ["--temperature", "12", "--salinity", "33"]


@dataclass(frozen=True)
class Product:
    """One file written by the demo: its path, what it holds, and the command behind it."""

    path: str
    what: str
    command: str = ""


def write_text_atomic(text, path):
    """Write ``text`` to ``path`` through a temporary file and a rename; return the path.

    An interrupted write leaves no partial file; the file gets the usual permissions
    (0666 less the umask).

    Examples
    --------
    >>> import os, tempfile
    >>> path = write_text_atomic("one line", os.path.join(tempfile.mkdtemp(), "t.txt"))
    >>> open(path).read().splitlines()
    ['one line']
    """
    import tempfile
    path = os.fspath(path)
    folder = os.path.dirname(os.path.abspath(path))
    if not os.path.isdir(folder):
        raise OSError(f"folder {folder} does not exist")
    if not os.access(folder, os.W_OK):
        raise OSError(f"folder {folder} is not writable")
    fd, tmp = tempfile.mkstemp(prefix=".tmp-", suffix=".txt", dir=folder)
    try:
        with os.fdopen(fd, "w", encoding="utf-8", newline="") as fh:
            fh.write(text if text.endswith("\n") else text + "\n")
        mask = os.umask(0o022)
        os.umask(mask)
        os.chmod(tmp, 0o666 & ~mask)
        os.replace(tmp, path)
    finally:
        if os.path.exists(tmp):
            os.remove(tmp)
    return path


_write_text = write_text_atomic


def _run(argv):
    """Run one ``shortwave`` command in-process; return its stdout, raise on failure."""
    from .cli import main
    out, err = io.StringIO(), io.StringIO()
    with contextlib.redirect_stdout(out), contextlib.redirect_stderr(err):
        status = main(list(argv))
    if status != 0:
        lines = [ln for ln in err.getvalue().splitlines() if ln.strip()]
        raise RuntimeError(f"demo step `shortwave {' '.join(argv)}` failed: "
                           f"{lines[-1] if lines else 'exit status ' + str(status)}")
    return out.getvalue()


def _command_text(argv, folder):
    """The command line as a user would type it from inside the demo folder."""
    rel = [os.path.relpath(a, folder) if os.path.isabs(a) and a.startswith(folder) else a
           for a in argv]
    return "shortwave " + " ".join(shlex.quote(a) for a in rel)


def _csv_only(text):
    """Keep the table lines of a command's CSV output (drop blank lines)."""
    return "\n".join(ln for ln in text.splitlines() if ln.strip())


def _cli_step(folder, argv, outputs, csv_name=None, csv_what=None):
    """Run a command; save its CSV output; return the products (files it wrote)."""
    p = lambda name: os.path.join(folder, name)   # noqa: E731
    argv = [p(a[1:]) if a.startswith("@") else a for a in argv]
    text = _run(argv)
    cmd = _command_text(argv, folder)
    made = []
    if csv_name:
        _write_text(_csv_only(text), p(csv_name))
        made.append(Product(p(csv_name), csv_what, cmd))
    for name, what in outputs:
        made.append(Product(p(name), what, cmd))
    return made


# --------------------------------------------------------------------------------------
# Steps: each takes (folder, small) and returns a list of Product
# --------------------------------------------------------------------------------------

def step_ripples(folder, small=False):
    """Dispersion of ripples in Greyhaven water (``shortwave ripple``)."""
    return _cli_step(folder, ["ripple", *_T, "--format", "csv", "--plot", "@ripples.png"],
                     [("ripples.png", "phase and group speed against wavelength, with the "
                                      "capillary-gravity minimum")],
                     "ripples.csv", "wavelength, frequency, phase and group speed and "
                                    "viscous damping of ripples in 12 degC, 33 g/kg water")


def step_spectra(folder, small=False):
    """Full-range wind-wave spectra for the winds of the scene (``shortwave spectrum``)."""
    return _cli_step(folder, ["spectrum", "--wind-speed", "2", "5", "9", *_T,
                              "--points", "801" if small else "2001",
                              "--output", "@spectra.nc", "--overwrite",
                              "--plot", "@spectra.png", "--bands", "L", "C", "X", "Ku",
                              "--incidence", "20", "45", "--format", "csv"],
                     [("spectra.nc", "full-range spectra S(k), B(k), F(k, phi) for 2, 5 "
                                     "and 9 m/s (lee of Corrow Head, mid-bay, open bay)"),
                      ("spectra.png", "curvature spectra B(k) with the Bragg wavenumbers "
                                      "of L, C, X and Ku band at 20 and 45 degrees")],
                     "spectra.csv", "peak, significant wave height and mean square slopes "
                                    "for 2, 5 and 9 m/s")


def step_bragg(folder, small=False):
    """Bragg scales of four radar bands across the swath (``shortwave bragg``)."""
    return _cli_step(folder, ["bragg", "--radar", "L", "C", "X", "Ku", "--incidence",
                              "20:45:5", *_T, "--format", "csv", "--plot", "@bragg.png"],
                     [("bragg.png", "Bragg wavelength against incidence, L/C/X/Ku band")],
                     "bragg.csv", "Bragg wavelength, wavenumber, frequency and Doppler "
                                  "lines across the swath (20-45 degrees)")


def step_backscatter(folder, small=False):
    """Backscatter of the clean sea across the swath (``shortwave backscatter``)."""
    return _cli_step(folder, ["backscatter", "--radar", "C", "--incidence", "20:45:5",
                              "--wind", "2", "5", "9", "--azimuth", "195",
                              "--polarization", "VV", "HH", *_T, "--format", "csv",
                              "--plot", "@backscatter.png"],
                     [("backscatter.png", "C-band NRCS [dB] against incidence for 2, 5 and "
                                          "9 m/s, VV and HH")],
                     "backscatter.csv", "C-band NRCS across the swath, wind blowing away from "
                                        "the radar, 15 degrees off downwind (azimuth 195)")


def step_slick(folder, small=False):
    """Film damping and slick contrast of the Mistle slick (``shortwave slick``)."""
    argv = ["slick", "--film", "mineral-oil", "--radar", "C", "X", "--incidence", "20",
            "30", "45", "--wind", "2", "4", "6", "8", "10", *_T, "--format", "csv",
            "--plot", "@slick.png"]
    if not small:
        argv.insert(-2, "--two-scale")
    return _cli_step(folder, argv,
                     [("slick.png", "damping ratio y(k) of the Mistle slick (mineral-oil "
                                    "preset) with the Bragg wavenumbers of common bands")],
                     "slick.csv", "damping ratio and slick contrast [dB] of the Mistle "
                                  "slick against wind, C and X band (screening estimate)")


def _station_winds(scene, stations):
    """Wind speed and direction of the scene at the stations (nearest sea cell)."""
    lat = np.asarray(scene["latitude"].values)
    lon = np.asarray(scene["longitude"].values)
    u = np.asarray(scene["eastward_wind"].values)
    v = np.asarray(scene["northward_wind"].values)
    speeds, dirs = [], []
    for _name, la, lo, *_ in stations:
        d = (lat - la) ** 2 + (np.cos(np.deg2rad(la)) * (lon - lo)) ** 2
        d = np.where(np.isfinite(u), d, np.inf)
        j = np.unravel_index(int(np.argmin(d)), d.shape)
        speeds.append(float(np.hypot(u[j], v[j])))
        dirs.append(float(np.rad2deg(np.arctan2(-u[j], -v[j])) % 360.0))
    return np.array(speeds), np.array(dirs)


def step_stations(folder, small=False):
    """Wave-model spectra at the invented stations, extended to the ripples (``extend``)."""
    from . import ncio
    from .scene_synthetic import greyhaven_scene
    from .synthetic import STATIONS, greyhaven_spectra, netcdf_encoding
    scene = greyhaven_scene("small")
    speed, wdir = _station_winds(scene, STATIONS)
    n_times = 2 if small else 4
    ds = greyhaven_spectra(n_times, wind_speed=np.broadcast_to(speed, (n_times, len(speed))),
                           wind_from_direction=np.broadcast_to(wdir, (n_times, len(wdir))))
    src = os.path.join(folder, "stations.nc")
    ncio.write_netcdf(ds, src, overwrite=True, encoding=netcdf_encoding(ds),
                      command="shortwave demo (invented wave-model stations)")
    made = [Product(src, "invented wave-model spectra E(f, theta) at Greyhaven Outer, Corrow "
                         "Bank and Mistle Point, winds taken from the scene",
                    "shortwave demo")]
    if os.path.exists(os.path.join(folder, "stations_extended.nc")):
        os.remove(os.path.join(folder, "stations_extended.nc"))
    made += _cli_step(folder, ["extend", "@stations.nc", "--output", "@stations_extended.nc",
                               "--plot", "@stations_tail.png", "--plot-at",
                               "station_name=Corrow Bank", "--format", "csv"],
                      [("stations_extended.nc", "the station spectra extended with a "
                                                "capillary-gravity tail to 2000 rad/m, with "
                                                "Hs and mean square slopes"),
                       ("stations_tail.png", "Corrow Bank: wave-model part, tail and seam")],
                      "stations_extended.csv", "Hs and mean square slopes per station and "
                                               "time, wave-model part and tail")
    return made


def step_scene(folder, small=False):
    """The gridded scene: inputs, C-band products with the Mistle slick, X-band what-if."""
    from . import ncio
    from .plots.maps import scene_panels
    from .scene_synthetic import greyhaven_scene
    ds = greyhaven_scene("small" if small else "full")
    src = os.path.join(folder, "greyhaven_scene.nc")
    ncio.write_netcdf(ds, src, overwrite=True, command="shortwave demo (invented scene)")
    made = [Product(src, "the invented scene: wind, incidence, look direction, SST, "
                         "salinity, slick mask and film thickness", "shortwave demo")]
    land = ds["land_binary_mask"].values == 1
    u, v = ds["eastward_wind"], ds["northward_wind"]
    speed = np.hypot(u, v).rename("wind_speed")
    speed.attrs = {"long_name": "wind speed at 10 m", "units": "m s-1"}
    um = ds["film_thickness"] * 1e6
    um.attrs = {"long_name": "film thickness (the Mistle slick)", "units": "um"}
    png = os.path.join(folder, "greyhaven_scene.png")
    scene_panels([(speed, {"arrows": (u.values, v.values), "title": "wind: the lee of "
                                                                    "Corrow Head"}),
                  (ds["incidence_angle"], {"cmap": "cividis", "title": "radar incidence "
                                                                        "(radar looks east)"}),
                  (ds["sea_surface_temperature"] - 273.15,
                   {"cmap": "coolwarm", "title": "sea surface temperature [degC]"}),
                  (um, {"cmap": "magma", "title": "the Mistle slick: film thickness"})],
                 png, land=land, suptitle="Greyhaven Sound (invented): scene inputs")
    made.append(Product(png, "maps of the scene inputs", "shortwave demo"))
    for name in ("greyhaven_C.nc", "greyhaven_X_whatif.nc"):
        if os.path.exists(os.path.join(folder, name)):
            os.remove(os.path.join(folder, name))
    made += _cli_step(folder, ["scene", "@greyhaven_scene.nc", "--output", "@greyhaven_C.nc",
                               "--radar", "C", "--polarization", "VV", "--film",
                               "mineral-oil", "--plot", "@greyhaven_C.png", "--quiet"],
                      [("greyhaven_C.nc", "C-band VV products per cell: Bragg scales, NRCS "
                                          "clean and with the Mistle slick, contrast, "
                                          "damping ratio, mean square slope"),
                       ("greyhaven_C.png", "maps: wind, NRCS clean and with the slick, "
                                           "slick contrast")])
    made += _cli_step(folder, ["scene", "@greyhaven_scene.nc", "--output",
                               "@greyhaven_X_whatif.nc", "--radar", "X", "--film", "natural",
                               "--cover", "everywhere", "--contrast-model", "balance",
                               "--plot", "@greyhaven_X_whatif.png", "--quiet"],
                      [("greyhaven_X_whatif.nc", "X-band what-if: a natural film over the "
                                                 "whole bay (how visible would it be where)"),
                       ("greyhaven_X_whatif.png", "maps of the X-band what-if contrast: "
                                                  "strongest in the low-wind lee")])
    return made


def step_validation(folder, small=False):
    """The comparisons with published references (``shortwave validate``)."""
    from .cli import main
    path = os.path.join(folder, "validation.csv")
    argv = ["validate", "--csv", path]
    out, err = io.StringIO(), io.StringIO()
    with contextlib.redirect_stdout(out), contextlib.redirect_stderr(err):
        status = main(argv)
    if status not in (0, 1):
        raise RuntimeError(f"demo step `shortwave validate` failed: {err.getvalue().strip()}")
    first = out.getvalue().splitlines()[0] if out.getvalue() else ""
    return [Product(path, f"model against published references ({first.split(':')[-1].strip()})",
                    _command_text(argv, folder))]


STEPS = (("ripples", step_ripples), ("spectra", step_spectra), ("bragg", step_bragg),
         ("backscatter", step_backscatter), ("slick", step_slick),
         ("stations", step_stations), ("scene", step_scene), ("validation", step_validation))
"""The demo steps, in order: (name, function(folder, small) -> list of Product)."""


def demo_steps():
    """Names of the demo steps, in the order they run.

    Examples
    --------
    >>> demo_steps()[:3]
    ['ripples', 'spectra', 'bragg']
    """
    return [name for name, _ in STEPS]


def _readme(folder, products):
    lines = ["Greyhaven Sound (invented scenario): files written by `shortwave demo`", "",
             "Every number here comes from invented, synthetic inputs built from code.",
             "Slick contrasts are screening estimates, not proof of oil.", ""]
    for p in products:
        lines.append(f"{os.path.basename(p.path)}")
        lines.append(f"    {p.what}")
        if p.command:
            lines.append(f"    made by: {p.command}")
    path = os.path.join(folder, "README.txt")
    _write_text("\n".join(lines), path)
    return Product(path, "this list of files and the commands that made them")


def run_demo(folder="shortwave-demo", *, small=False, on_step=None, steps=None):
    """Run the demo steps and write their files into ``folder``.

    Parameters
    ----------
    folder : str
        Output folder; created if missing.  Files from an earlier demo run are replaced.
    small : bool
        Smaller grids and fewer points (for tests and quick looks).
    on_step : callable, optional
        ``on_step(name, products)`` is called after each step (the command prints there).
    steps : sequence of str, optional
        Run only these steps (names from :func:`demo_steps`).

    Returns
    -------
    list of Product
        Every file written, with a one-line description.

    Raises
    ------
    OSError
        The folder cannot be created or written.
    RuntimeError
        A step failed (the message names the command and its error).

    Examples
    --------
    >>> import tempfile
    >>> made = run_demo(tempfile.mkdtemp(), small=True, steps=["bragg"])
    >>> [os.path.basename(p.path) for p in made]
    ['bragg.csv', 'bragg.png', 'README.txt']
    """
    folder = os.path.abspath(os.fspath(folder))
    if os.path.exists(folder) and not os.path.isdir(folder):
        raise OSError(f"output folder {folder} is a file, not a folder")
    try:
        os.makedirs(folder, exist_ok=True)
    except OSError as exc:
        raise OSError(f"cannot create the output folder {folder}: {exc.strerror}") from None
    if not os.access(folder, os.W_OK):
        raise OSError(f"output folder {folder} is not writable")
    known = demo_steps()
    if steps is not None:
        bad = [s for s in steps if s not in known]
        if bad:
            raise ValueError(f"unknown demo step {bad[0]!r}; steps: {', '.join(known)}")
    products = []
    for name, step in STEPS:
        if steps is not None and name not in steps:
            continue
        made = step(folder, small)
        products.extend(made)
        if on_step is not None:
            on_step(name, made)
    readme = _readme(folder, products)
    products.append(readme)
    if on_step is not None:
        on_step("readme", [readme])
    return products
