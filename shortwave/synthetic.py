"""Synthetic wave-model-like spectra for the invented Greyhaven Sound scenario.

Everything here is made up and built from code: the stations ("Greyhaven Outer",
"Corrow Bank", "Mistle Point"), their positions and depths, the winds and the sea states.
The spectra look like the output of a spectral wave model: a frequency-direction variance
density E(f, theta) on a geometric frequency grid (0.035-0.6 Hz, 36 frequencies) and 36
directions, stored with CF standard names, as point output (time, station, frequency,
direction) or gridded output (time, y, x, frequency, direction).

Sea states: a wind sea of JONSWAP shape (Hasselmann et al. 1973) with the fetch laws of
the JONSWAP experiment, limited at full development by the Pierson-Moskowitz (1964)
spectrum, spread in direction with a cos-2s law (Longuet-Higgins et al. 1963) around the
downwind direction, plus (optionally) a narrow swell from the open sea.

References
----------
.. [1] Hasselmann, K. et al. (1973). Measurements of wind-wave growth and swell decay
   during the Joint North Sea Wave Project (JONSWAP). Dtsch. Hydrogr. Z. Suppl. A 8(12).
.. [2] Pierson, W. J. and Moskowitz, L. (1964). A proposed spectral form for fully
   developed wind seas based on the similarity theory of S. A. Kitaigorodskii.
   J. Geophys. Res. 69(24), 5181-5190.
.. [3] Longuet-Higgins, M. S., Cartwright, D. E. and Smith, N. D. (1963). Observations of
   the directional spectrum of sea waves using the motions of a floating buoy. In: Ocean
   Wave Spectra, Prentice-Hall, 111-136.
"""
from __future__ import annotations

import numpy as np

from ._checks import ShortwaveInputError, check_choice, check_positive

__all__ = ["STATIONS", "GRAVITY", "PM_ALPHA", "PM_BETA", "PM_OMEGA_PEAK", "U195_OVER_U10",
           "geometric_frequencies", "jonswap", "cos2s_spreading", "wave_spectra",
           "greyhaven_spectra", "greyhaven_spectra_grid", "netcdf_encoding"]

GRAVITY = 9.81
"""Gravity of the spectral forms [m s-2]."""

PM_ALPHA = 8.1e-3
"""Phillips constant of the Pierson-Moskowitz spectrum (Pierson & Moskowitz 1964)."""

PM_BETA = 0.74
"""beta in exp(-beta (g / (U19.5 omega))^4) of Pierson & Moskowitz (1964)."""

PM_OMEGA_PEAK = (4.0 * PM_BETA / 5.0) ** 0.25
"""omega_p U19.5 / g of Pierson-Moskowitz: (4 beta / 5)^(1/4) = 0.8772."""

U195_OVER_U10 = 1.026
"""U19.5 / U10 used for the Pierson-Moskowitz peak (Mobley, Ocean Optics Web Book)."""

STATIONS = (
    # name, latitude [degree_north], longitude [degree_east], depth [m], fetch [m]
    ("Greyhaven Outer", 48.912, -31.406, 85.0, 250e3),
    ("Corrow Bank", 48.975, -31.228, 12.0, 60e3),
    ("Mistle Point", 49.031, -31.117, 28.0, 18e3),
)
"""Invented stations of Greyhaven Sound: name, latitude, longitude, depth, fetch."""


def geometric_frequencies(f_min=0.035, f_max=0.6, n=36):
    """Geometric frequency grid f_i = f_min X^i reaching f_max, as in spectral wave models.

    Parameters
    ----------
    f_min, f_max : float
        First and last frequency [Hz], 0 < f_min < f_max.
    n : int
        Number of frequencies, >= 2.

    Returns
    -------
    ndarray
        Frequencies [Hz].

    Examples
    --------
    >>> f = geometric_frequencies()
    >>> len(f), round(float(f[1] / f[0]), 4), round(float(f[-1]), 3)
    (36, 1.0846, 0.6)
    """
    check_positive("f_min", f_min, unit="Hz")
    if not (f_max > f_min) or int(n) < 2:
        raise ShortwaveInputError("f_max must exceed f_min and n must be >= 2")
    return f_min * (f_max / f_min) ** (np.arange(int(n)) / (int(n) - 1))


def jonswap(f, wind_speed, fetch=np.inf, gamma=3.3, fully_developed_limit=True):
    """JONSWAP frequency spectrum E(f) of a fetch-limited wind sea.

    Parameters
    ----------
    f : array_like
        Frequencies [Hz], > 0 (trailing axis).
    wind_speed : array_like
        U10 [m s-1], > 0 (broadcast over the leading axes).
    fetch : array_like
        Fetch [m]; ``np.inf`` gives the fully developed Pierson-Moskowitz spectrum.
    gamma : float
        Peak enhancement (3.3 mean JONSWAP); becomes 1 at full development.
    fully_developed_limit : bool
        Never let the peak go below the Pierson-Moskowitz peak frequency (the sea cannot
        grow past full development).

    Returns
    -------
    ndarray
        E(f) [m2 s], one-sided.

    Notes
    -----
    E(f) = alpha g^2 (2 pi)^-4 f^-5 exp(-5/4 (f_p/f)^4) gamma^exp(-(f - f_p)^2 /
    (2 sigma^2 f_p^2)), sigma = 0.07 (f <= f_p), 0.09 above (Hasselmann et al. 1973).
    Fetch laws alpha = 0.076 X^-0.22, f_p U10/g = 3.5 X^-0.33, X = g x / U10^2 (JONSWAP;
    from memory).  Full development: alpha = 8.1e-3, omega_p = 0.8772 g / U19.5,
    U19.5 = 1.026 U10, gamma = 1 (Pierson & Moskowitz 1964).

    Examples
    --------
    >>> f = np.geomspace(0.03, 3.0, 4000)
    >>> E = jonswap(f, 10.0)                      # fully developed
    >>> m0 = np.trapezoid(E, f)
    >>> round(float(4 * np.sqrt(m0)), 3)          # 0.2092 U19.5^2 / g = 2.245 m
    2.245
    """
    f = np.asarray(f, dtype=float)
    u = np.asarray(wind_speed, dtype=float)[..., None]
    x = np.asarray(fetch, dtype=float)[..., None]
    fp_pm = PM_OMEGA_PEAK * GRAVITY / (U195_OVER_U10 * u) / (2 * np.pi)
    with np.errstate(divide="ignore", invalid="ignore"):
        X = GRAVITY * x / u**2
        alpha = np.where(np.isinf(X), PM_ALPHA, 0.076 * X ** -0.22)
        fp = np.where(np.isinf(X), fp_pm, 3.5 * GRAVITY / u * X ** -0.33)
    g = np.broadcast_to(np.asarray(gamma, dtype=float), fp.shape)
    if fully_developed_limit:
        full = fp <= fp_pm
        fp = np.where(full, fp_pm, fp)
        alpha = np.where(full, PM_ALPHA, np.maximum(alpha, PM_ALPHA))
        g = np.where(full | np.isinf(X), 1.0, g)
    sigma = np.where(f <= fp, 0.07, 0.09)
    r = np.exp(-((f - fp) ** 2) / (2 * sigma**2 * fp**2))
    return (alpha * GRAVITY**2 * (2 * np.pi) ** -4 * f**-5
            * np.exp(-1.25 * (fp / f) ** 4) * g**r)


def cos2s_spreading(theta_deg, mean_deg, s):
    """Directional distribution D = cos^2s((theta - mean)/2), normalised on the grid.

    Parameters
    ----------
    theta_deg : array_like
        Direction axis [degree] (trailing axis; any order, uniform spacing assumed).
    mean_deg : array_like
        Mean direction [degree], same convention (broadcast over leading axes).
    s : float or array_like
        Spreading parameter (larger = narrower), > 0.

    Returns
    -------
    ndarray
        D [rad-1] with sum(D) * dtheta = 1 exactly on the grid.

    Examples
    --------
    >>> th = np.arange(0.0, 360.0, 10.0)
    >>> D = cos2s_spreading(th, 90.0, 4.0)
    >>> round(float(D.sum() * np.deg2rad(10.0)), 12), int(th[np.argmax(D)])
    (1.0, 90)
    """
    th = np.deg2rad(np.asarray(theta_deg, dtype=float))
    mean = np.deg2rad(np.asarray(mean_deg, dtype=float))[..., None]
    d = np.cos(0.5 * (th - mean)) ** 2
    d = d ** np.asarray(s, dtype=float)[..., None] if np.ndim(s) else d ** float(s)
    dth = 2 * np.pi / th.shape[-1]
    return d / (d.sum(-1, keepdims=True) * dth)


def wave_spectra(f, theta_deg, wind_speed, wind_from_deg, fetch=np.inf, *, s=8.0,
                 swell_height=0.0, swell_frequency=0.07, swell_from_deg=250.0):
    """Directional spectra E(f, theta) of wind sea plus swell, "from" directions.

    Parameters
    ----------
    f : array_like
        Frequencies [Hz], 1-D.
    theta_deg : array_like
        Directions the waves come from [degree, clockwise from north], 1-D, uniform.
    wind_speed : array_like
        U10 [m s-1], any shape (the leading shape of the result).
    wind_from_deg : array_like
        Direction the wind comes from [degree]; the wind sea comes from there.
    fetch : array_like
        Fetch [m] (``np.inf``: fully developed).
    s : float
        cos-2s spreading parameter of the wind sea.
    swell_height : array_like
        Significant height of the swell [m] (0: none).
    swell_frequency : float
        Peak frequency of the swell [Hz].
    swell_from_deg : array_like
        Direction the swell comes from [degree].

    Returns
    -------
    ndarray
        E [m2 s rad-1], shape wind_speed.shape + (nf, ntheta).

    Examples
    --------
    >>> f = geometric_frequencies(); th = np.arange(5.0, 360.0, 10.0)
    >>> E = wave_spectra(f, th, 10.0, 270.0)
    >>> E.shape
    (36, 36)
    """
    f = np.asarray(f, dtype=float)
    u = np.asarray(wind_speed, dtype=float)
    e_f = jonswap(f, u, fetch)                                    # (..., nf)
    d = cos2s_spreading(theta_deg, np.asarray(wind_from_deg, dtype=float), s)  # (..., nth)
    E = e_f[..., :, None] * d[..., None, :]
    hs = np.asarray(swell_height, dtype=float)
    if np.any(hs > 0):
        width = 0.1 * swell_frequency
        shape = np.exp(-0.5 * ((f - swell_frequency) / width) ** 2)
        shape = shape / np.trapezoid(shape, f)
        m0 = (np.broadcast_to(hs, u.shape) / 4.0) ** 2
        ds = cos2s_spreading(theta_deg, np.broadcast_to(swell_from_deg, u.shape), 40.0)
        E = E + m0[..., None, None] * shape[:, None] * ds[..., None, :]
    return E


def _spectrum_attrs(per_degree):
    return {"standard_name": "sea_surface_wave_directional_variance_spectral_density",
            "long_name": "frequency-direction variance spectral density",
            "units": "m2 s degree-1" if per_degree else "m2 s rad-1"}


def _finish(ds, f, theta, *, convention, per_degree, direction_units, bounds):
    import xarray as xr
    if per_degree:
        ds["spectrum"] = ds["spectrum"] * (np.pi / 180.0)
    ds["spectrum"].attrs = _spectrum_attrs(per_degree)
    fr = xr.DataArray(f, dims="frequency", attrs={"standard_name": "wave_frequency",
                                                   "long_name": "wave frequency",
                                                   "units": "s-1"})
    th = np.asarray(theta, dtype=float)
    if convention == "to":
        th = np.mod(th + 180.0, 360.0)
    units = "degree"
    if direction_units == "radian":
        th = np.deg2rad(th)
        units = "rad"
    words = "come from" if convention == "from" else "travel to"
    dr = xr.DataArray(th, dims="direction",
                      attrs={"standard_name": f"sea_surface_wave_{convention}_direction",
                             "long_name": f"direction the waves {words}", "units": units})
    ds = ds.assign_coords(frequency=fr, direction=dr)
    if bounds:
        r = f[1] / f[0]
        ds["frequency_bounds"] = (("frequency", "nv"),
                                  np.stack([f / np.sqrt(r), f * np.sqrt(r)], -1))
        ds["frequency"].attrs["bounds"] = "frequency_bounds"
    return ds


def greyhaven_spectra(n_times=8, *, start="2031-10-02T00:00", step_hours=3, stations=None,
                      frequencies=None, n_directions=36, direction_offset=5.0,
                      wind_speed=None, wind_from_direction=None, fully_developed=False,
                      swell=True, convention="from", per_degree=False,
                      direction_units="degree", frequency_bounds=False, dtype="float32"):
    """Point output of an (invented) wave model at the Greyhaven Sound stations.

    Parameters
    ----------
    n_times : int
        Number of output times, >= 1.
    start : str
        First time (ISO 8601).
    step_hours : float
        Output interval [h].
    stations : sequence of (name, lat, lon, depth, fetch), optional
        Default :data:`STATIONS`.
    frequencies : array_like, optional
        Frequency grid [Hz]; default :func:`geometric_frequencies` (0.035-0.6 Hz, 36).
    n_directions : int
        Number of directions (uniform).
    direction_offset : float
        First direction [degree] (offset grids are common, e.g. half a bin).
    wind_speed, wind_from_direction : array_like, optional
        U10 [m s-1] and wind-from direction [degree], shape (time, station) or scalars;
        default a made-up passing front (6-15 m s-1, veering from 200 to 290 degree).
    fully_developed : bool
        Unlimited fetch (Pierson-Moskowitz wind sea) and no swell.
    swell : bool
        Add a 1 m swell from the open sea at the outer stations.
    convention : {"from", "to"}
        Direction convention of the direction axis (its standard_name says which).
    per_degree : bool
        Store the density per degree (units "m2 s degree-1") instead of per radian.
    direction_units : {"degree", "radian"}
        Units of the direction axis.
    frequency_bounds : bool
        Add a CF ``bounds`` variable for the frequency axis.
    dtype : str
        Floating type of the spectra.

    Returns
    -------
    xarray.Dataset
        ``spectrum`` (time, station, frequency, direction), ``wind_speed`` and
        ``wind_direction`` (time, station), ``depth``, ``latitude``, ``longitude``,
        ``station_name`` (station); CF attributes.

    Examples
    --------
    >>> ds = greyhaven_spectra(2)
    >>> dict(ds["spectrum"].sizes)
    {'time': 2, 'station': 3, 'frequency': 36, 'direction': 36}
    >>> [str(s) for s in ds["station_name"].values][:2]
    ['Greyhaven Outer', 'Corrow Bank']
    """
    import xarray as xr
    convention = check_choice("convention", convention, ("from", "to"))
    direction_units = check_choice("direction_units", direction_units, ("degree", "radian"))
    if int(n_times) < 1:
        raise ShortwaveInputError(f"n_times: must be >= 1, got {n_times}")
    st = tuple(stations) if stations is not None else STATIONS
    nt, ns = int(n_times), len(st)
    f = geometric_frequencies() if frequencies is None else np.asarray(frequencies, float)
    theta = direction_offset + np.arange(n_directions) * 360.0 / n_directions
    theta = np.mod(theta, 360.0)
    t = np.arange(nt)[:, None] / max(nt - 1, 1)
    shelter = np.linspace(1.0, 0.75, ns)[None, :]
    if wind_speed is None:
        u = (6.0 + 9.0 * np.sin(np.pi * t) ** 2) * shelter
    else:
        u = np.broadcast_to(np.asarray(wind_speed, dtype=float), (nt, ns)).copy()
    if wind_from_direction is None:
        wd = np.mod(200.0 + 90.0 * t + 10.0 * np.arange(ns)[None, :], 360.0)
    else:
        wd = np.broadcast_to(np.asarray(wind_from_direction, dtype=float), (nt, ns)).copy()
    fetch = np.array([s[4] for s in st])[None, :]
    fetch = np.full((nt, ns), np.inf) if fully_developed else np.broadcast_to(fetch, (nt, ns))
    hs_swell = np.zeros((nt, ns)) if (fully_developed or not swell) else \
        np.broadcast_to(np.linspace(1.0, 0.3, ns)[None, :], (nt, ns))
    E = wave_spectra(f, theta, u, wd, fetch, swell_height=hs_swell)
    times = np.datetime64(start, "s") + (np.arange(nt) * step_hours * 3600).astype(
        "timedelta64[s]")
    ds = xr.Dataset(
        {"spectrum": (("time", "station", "frequency", "direction"), E.astype(dtype)),
         "wind_speed": (("time", "station"), u.astype(dtype),
                        {"standard_name": "wind_speed", "long_name": "wind speed at 10 m",
                         "units": "m s-1"}),
         "wind_direction": (("time", "station"), wd.astype(dtype),
                            {"standard_name": "wind_from_direction",
                             "long_name": "direction the wind comes from", "units": "degree"}),
         "depth": (("station",), np.array([s[3] for s in st]),
                   {"standard_name": "sea_floor_depth_below_sea_surface",
                    "long_name": "water depth", "units": "m", "positive": "down"})},
        coords={"time": ("time", times, {"standard_name": "time", "long_name": "time"}),
                "station_name": ("station", np.array([s[0] for s in st], dtype=object),
                                 {"long_name": "station name", "cf_role": "timeseries_id"}),
                "latitude": ("station", np.array([s[1] for s in st]),
                             {"standard_name": "latitude", "long_name": "latitude",
                              "units": "degree_north"}),
                "longitude": ("station", np.array([s[2] for s in st]),
                              {"standard_name": "longitude", "long_name": "longitude",
                               "units": "degree_east"}),
                "height": ((), 10.0, {"standard_name": "height", "long_name": "height of the "
                                      "wind above the sea", "units": "m", "positive": "up"})},
        attrs={"title": "Synthetic wave-model spectra at the Greyhaven Sound stations "
                        "(invented scenario)",
               "institution": "shortwave demonstration data (invented)",
               "source": "shortwave.synthetic: JONSWAP/Pierson-Moskowitz wind sea with "
                         "cos-2s spreading plus swell, built from code",
               "featureType": "timeSeries",
               "comment": "Invented places and sea states; not observations."})
    return _finish(ds, f, theta, convention=convention, per_degree=per_degree,
                   direction_units=direction_units, bounds=frequency_bounds)


def greyhaven_spectra_grid(n_times=2, ny=3, nx=4, *, land=((0, 0),), fully_developed=False,
                           convention="from", per_degree=False, n_directions=36,
                           direction_offset=0.0, dtype="float32"):
    """Gridded output of an (invented) wave model over Greyhaven Sound.

    Parameters
    ----------
    n_times, ny, nx : int
        Sizes of the time, y and x dimensions.
    land : sequence of (j, i)
        Grid cells that are land (all-NaN spectra, NaN wind).
    fully_developed, convention, per_degree, n_directions, direction_offset, dtype :
        As in :func:`greyhaven_spectra`.

    Returns
    -------
    xarray.Dataset
        ``spectrum`` (time, y, x, frequency, direction), ``wind_speed``,
        ``wind_direction`` (time, y, x), ``depth`` (y, x), 2-D ``latitude``/``longitude``.

    Examples
    --------
    >>> ds = greyhaven_spectra_grid(1, 2, 3)
    >>> dict(ds["spectrum"].sizes)
    {'time': 1, 'y': 2, 'x': 3, 'frequency': 36, 'direction': 36}
    """
    import xarray as xr
    f = geometric_frequencies()
    theta = np.mod(direction_offset + np.arange(n_directions) * 360.0 / n_directions, 360.0)
    t = np.arange(n_times)[:, None, None] / max(n_times - 1, 1)
    jj, ii = np.meshgrid(np.arange(ny), np.arange(nx), indexing="ij")
    u = 7.0 + 5.0 * t + 0.5 * ii[None] - 0.3 * jj[None]
    wd = np.broadcast_to(230.0 + 20.0 * t + 2.0 * ii[None], u.shape)
    fetch = np.full(u.shape, np.inf) if fully_developed else 30e3 + 20e3 * ii[None] + 0 * u
    E = wave_spectra(f, theta, u, wd, fetch)
    depth = 10.0 + 15.0 * ii + 5.0 * jj
    u, wd, depth = u.copy(), np.array(wd), depth.astype(float)
    for (j, i) in land:
        E[:, j, i] = np.nan
        u[:, j, i] = np.nan
        wd[:, j, i] = np.nan
        depth[j, i] = np.nan
    lat = 48.9 + 0.02 * jj
    lon = -31.4 + 0.03 * ii
    times = np.datetime64("2031-10-02T00:00", "s") + (np.arange(n_times) * 3600).astype(
        "timedelta64[s]")
    ds = xr.Dataset(
        {"spectrum": (("time", "y", "x", "frequency", "direction"), E.astype(dtype)),
         "wind_speed": (("time", "y", "x"), u.astype(dtype),
                        {"standard_name": "wind_speed", "units": "m s-1",
                         "long_name": "wind speed at 10 m"}),
         "wind_direction": (("time", "y", "x"), wd.astype(dtype),
                            {"standard_name": "wind_from_direction", "units": "degree",
                             "long_name": "direction the wind comes from"}),
         "depth": (("y", "x"), depth, {"standard_name": "sea_floor_depth_below_sea_surface",
                                       "units": "m", "long_name": "water depth"})},
        coords={"time": ("time", times, {"standard_name": "time"}),
                "y": ("y", np.arange(ny) * 2000.0, {"standard_name": "projection_y_coordinate",
                                                    "units": "m", "long_name": "y"}),
                "x": ("x", np.arange(nx) * 2000.0, {"standard_name": "projection_x_coordinate",
                                                    "units": "m", "long_name": "x"}),
                "latitude": (("y", "x"), lat, {"standard_name": "latitude",
                                               "units": "degree_north"}),
                "longitude": (("y", "x"), lon, {"standard_name": "longitude",
                                                "units": "degree_east"})},
        attrs={"title": "Synthetic gridded wave-model spectra over Greyhaven Sound "
                        "(invented scenario)",
               "source": "shortwave.synthetic, built from code",
               "comment": "Invented places and sea states; not observations."})
    return _finish(ds, f, theta, convention=convention, per_degree=per_degree,
                   direction_units="degree", bounds=False)


def netcdf_encoding(ds, packed=False, name="spectrum"):
    """Encoding for writing a synthetic Dataset to NetCDF like a wave model would.

    Parameters
    ----------
    ds : xarray.Dataset
        From :func:`greyhaven_spectra` or :func:`greyhaven_spectra_grid`.
    packed : bool
        Store ``ds[name]`` as short integers with ``scale_factor`` and ``_FillValue``
        (NaN cells become the fill value), as many wave-model files do.
    name : str
        Variable to pack.

    Returns
    -------
    dict
        For :func:`shortwave.ncio.write_netcdf` (``encoding=``): no ``_FillValue`` on
        coordinate variables (CF 2.5.1); the spectra zlib-compressed in HDF5 chunks of one
        output time, and packed if asked.

    Examples
    --------
    >>> enc = netcdf_encoding(greyhaven_spectra(1), packed=True)
    >>> enc["spectrum"]["dtype"], "_FillValue" in enc["frequency"]
    ('int16', True)
    """
    enc = {c: {"_FillValue": None} for c in ds.coords if ds[c].dtype.kind == "f"}
    if "frequency_bounds" in ds:
        enc["frequency_bounds"] = {"_FillValue": None}
    var = ds[name]
    # one output time per HDF5 chunk, as a wave model writes its records
    enc[name] = {"zlib": True, "complevel": 1,
                 "chunksizes": tuple(1 if d == "time" else n for d, n in var.sizes.items())}
    if packed:
        vmax = float(np.nanmax(np.asarray(var)))
        scale = vmax / 32766.0 if vmax > 0 else 1.0
        enc[name].update({"dtype": "int16", "scale_factor": scale, "add_offset": 0.0,
                          "_FillValue": np.int16(-32768)})
    return enc
