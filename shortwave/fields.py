"""Whole radar scenes on a grid or swath: Bragg scales, backscatter and slick contrast per cell.

A *scene* is a set of gridded inputs (an :class:`xarray.Dataset`, usually read from a
NetCDF file): the wind (speed and direction, or eastward and northward components), the
radar incidence angle (a field, or a swath geometry), the radar look direction, and
optionally sea-surface temperature and salinity, a slick mask and a film (oil) thickness.
:func:`open_scene` finds these variables, converts their units and checks them;
:func:`scene_products` computes, per cell,

====================================  =======================================================
output                                what
====================================  =======================================================
``bragg_wavenumber``, ``_wavelength`` K_B = 2 k_r sin(theta) [rad m-1], 2 pi / K_B [m]
``bragg_curvature``                   B(K_B) = K_B^3 S(K_B), the spectral level at Bragg [1]
``sigma0``, ``sigma0_db``             NRCS of the clean sea (linear with the CF standard
                                      name, and dB)
``mean_square_slope``                 total slope variance of the clean spectrum [1]
``sigma0_slick``, ``sigma0_slick_db`` NRCS with the film (where there is a film)
``slick_contrast_db``                 10 log10(sigma0 / sigma0_slick) [dB]
``damping_ratio``                     film damping / clean damping at K_B [1]
``mean_square_slope_slick``           slope variance of the film-damped spectrum [1]
====================================  =======================================================

and :func:`process_scene` does the whole job from file to file (:func:`shortwave.ncio.
write_netcdf`: CF-1.10 attributes, atomic write, input never overwritten).

**Same code, small or large.**  The per-cell work is one NumPy kernel applied with
:func:`xarray.apply_ufunc` (``dask="parallelized"``): on NumPy inputs it runs at once; on
dask-chunked inputs (``open_scene(..., chunks=...)``) it builds a lazy graph that runs
chunk by chunk, on the local threads or on a ``dask.distributed`` cluster.  Memory is
bounded by the chunk size: the kernel never builds a (cells x wavenumbers) array; quantities
that need an integral over the spectrum (mean square slope, the radar model's slope
statistics) are tabulated on a grid of wind speeds and interpolated per cell.

**Missing cells.**  Land and missing cells (NaN in any needed input) stay NaN in every
output and are counted (``cells_missing`` attribute); cells with wind below
``min_wind_speed`` are NaN too (``cells_calm``): the spectrum models are not meant for
calm water.

Library code: no printing.  Progress display belongs to the caller (``compute=`` of
:func:`process_scene`).
"""
from __future__ import annotations

import math
import os
from dataclasses import dataclass, field

import numpy as np

from . import ncio
from ._checks import ShortwaveInputError, check_choice

__all__ = ["Scene", "open_scene", "scene_products", "process_scene", "scene_summary",
           "scan_scene", "start_local_cluster",
           "FILM_COVERS", "CONTRAST_MODELS", "FIELD_METADATA", "FREQUENCY_RANGE_HZ",
           "swath_incidence_field", "SCENE_ROLES"]

FREQUENCY_RANGE_HZ = (0.5e9, 40e9)
"""Radar frequencies accepted for scenes [Hz]: the range of the sea-water permittivity
models (Meissner & Wentz 2004) and of the microwave backscatter model."""

CONTRAST_MODELS = ("two-scale", "balance", "alpers_huhnerfuss1989")
"""How the film changes the backscatter (``contrast_model=``):

``"two-scale"`` (default)   sigma0_slick from the backscatter model with the whole wave
                            spectrum divided by the film's damping ratio y(k)
                            (Alpers & Huehnerfuss 1989 at every wavenumber)
``"balance"``               sigma0_slick = sigma0 / K, K the wind-input/dissipation balance
                            contrast at the Bragg wavenumber (:func:`shortwave.slick.
                            balance_contrast`)
``"alpers_huhnerfuss1989"`` sigma0_slick = sigma0 / y(K_B)
"""

from .metadata import DB_UNITS  # noqa: E402  UDUNITS decibel
"""Units written for decibel outputs: the UDUNITS form of the decibel of a ratio, which
CF checkers accept (plain ``dB`` is not a UDUNITS unit); ``long_name`` says decibels."""

FILM_COVERS = ("auto", "mask", "everywhere")
"""Where the film is (``cover=``): ``"mask"`` the cells of the slick mask / positive film
thickness; ``"everywhere"`` every sea cell (a what-if map of how visible the film would
be); ``"auto"`` the mask when the scene has one, else everywhere."""

# ---------------------------------------------------------------------------------------
# Roles of scene inputs (added to the reader's table, shortwave.ncio.ROLES)
# ---------------------------------------------------------------------------------------

SCENE_ROLES = {
    "incidence_angle": ncio.Role(
        ("angle_of_incidence", "sensor_zenith_angle"),
        ("incidence_angle", "incidence", "incidence_deg", "inc", "inc_angle", "theta",
         "theta_inc"),
        "degree", "radar incidence angle from the vertical"),
    "sensor_azimuth": ncio.Role(
        ("sensor_azimuth_angle",),
        ("sensor_azimuth_angle", "sensor_azimuth"),
        "degree", "direction from the cell to the radar, clockwise from north"),
    "look_azimuth": ncio.Role(
        (),
        ("look_azimuth", "look_direction", "radar_look_azimuth", "look_angle_azimuth"),
        "degree", "direction the radar looks (radar to cell), clockwise from north"),
    "sea_surface_temperature": ncio.Role(
        ("sea_surface_temperature", "sea_surface_skin_temperature",
         "sea_surface_foundation_temperature", "sea_water_temperature"),
        ("sea_surface_temperature", "sst", "SST", "analysed_sst", "temperature", "temp"),
        "K", "sea surface temperature"),
    "sea_surface_salinity": ncio.Role(
        ("sea_surface_salinity", "sea_water_salinity", "sea_water_practical_salinity",
         "sea_water_absolute_salinity"),
        ("sea_surface_salinity", "sss", "SSS", "salinity", "sal", "salt"),
        None, "sea surface salinity"),
    "slick_mask": ncio.Role(
        (),
        ("slick_mask", "film_mask", "oil_mask", "slick", "mask_slick"),
        None, "slick mask (1 where a surface film is present, 0 elsewhere)"),
    "film_thickness": ncio.Role(
        (),
        ("film_thickness", "oil_thickness", "slick_thickness", "thickness"),
        None, "thickness of the surface film or oil layer"),
}
for _name, _role in SCENE_ROLES.items():
    ncio.ROLES.setdefault(_name, _role)

_SALINITY_UNITS = {"1e-3": 1.0, "0.001": 1.0, "1.e-3": 1.0, "10-3": 1.0, "psu": 1.0, "PSU": 1.0,
                   "pss": 1.0, "PSS-78": 1.0, "pss-78": 1.0, "ppt": 1.0, "g kg-1": 1.0,
                   "g/kg": 1.0, "g kg^-1": 1.0, "‰": 1.0, "permil": 1.0, "1": 1.0,
                   "kg kg-1": 1e3, "kg/kg": 1e3}
"""Salinity units accepted and their factor to g/kg (practical salinity taken as g/kg,
which the water-property correlations and the permittivity models accept)."""

_THICKNESS_UNITS = {"m": 1.0, "meter": 1.0, "meters": 1.0, "metre": 1.0, "metres": 1.0,
                    "cm": 1e-2, "mm": 1e-3, "um": 1e-6, "µm": 1e-6, "μm": 1e-6,
                    "micrometer": 1e-6, "micrometers": 1e-6, "micrometre": 1e-6,
                    "micrometres": 1e-6, "micron": 1e-6, "microns": 1e-6, "nm": 1e-9}
"""Film-thickness units accepted and their factor to metres."""

FIELD_METADATA = {}
"""Kept for compatibility: scene attributes now live in
:data:`shortwave.metadata.OUTPUT_METADATA`."""


def _metadata(name):
    from .metadata import OUTPUT_METADATA
    meta = OUTPUT_METADATA.get(name) or FIELD_METADATA.get(name)
    return dict(meta) if meta else {}


# ---------------------------------------------------------------------------------------
# Reading
# ---------------------------------------------------------------------------------------

@dataclass
class Scene:
    """Inputs of a scene, found, converted and aligned on one grid.

    Attributes
    ----------
    inputs : xarray.Dataset
        ``wind_speed`` [m s-1], ``wind_azimuth`` [degree, 0 = upwind], ``incidence_angle``
        [degree], and when present ``temperature_c`` [degC], ``salinity`` [g kg-1],
        ``slick_mask`` [0/1], ``film_thickness`` [m].  NumPy or dask arrays.
    names : dict
        Role -> where it came from (variable name in the file, or a description).
    attrs : dict
        Global attributes of the input.
    path : str or None
        Input file.
    coords : dict
        Coordinates of the input wind field (dimension, auxiliary such as 2-D latitude
        and longitude, and scalar ones such as time), kept on the outputs.
    grid_mapping : xarray.DataArray or None
        The CF grid-mapping variable of the input wind, if any.
    """

    inputs: object
    names: dict
    attrs: dict = field(default_factory=dict)
    path: str | None = None
    coords: dict = field(default_factory=dict)
    grid_mapping: object = None

    @property
    def dims(self):
        return self.inputs["wind_speed"].dims

    @property
    def shape(self):
        return self.inputs["wind_speed"].shape

    @property
    def ncells(self):
        return int(np.prod(self.shape)) if self.shape else 1

    @property
    def is_lazy(self):
        return any(_is_dask(v.data) for v in self.inputs.data_vars.values())

    @property
    def has_film_field(self):
        return "slick_mask" in self.inputs or "film_thickness" in self.inputs


def _is_dask(data):
    return type(data).__module__.startswith("dask")


def _find(ds, role, overrides):
    """The variable of ``role``, or None when absent (other errors propagate)."""
    over = ncio.parse_overrides(overrides)
    if role in over:
        return ncio.find_variable(ds, role, over)
    try:
        return ncio.find_variable(ds, role, over)
    except ValueError as exc:
        if str(exc).startswith("no "):
            return None
        raise


def _convert(da, role, target):
    name = str(da.name) if str(da.name) == role else f"{da.name} ({role})"
    return ncio.convert_units(da, target, name)


def _convert_table(da, role, table, target):
    units = da.attrs.get("units")
    if units is None:
        raise ValueError(f"variable {da.name!r} ({role}) has no units attribute; expected "
                         f"{target} or one of: {', '.join(sorted(table))}")
    key = str(units).strip()
    if key not in table:
        raise ValueError(f"variable {da.name!r} ({role}) has units {units!r}, which cannot be "
                         f"converted to {target} (known: {', '.join(sorted(table))})")
    factor = table[key]
    return da * factor if factor != 1.0 else da


def swath_incidence_field(template, near_deg, far_deg, across_dim=None):
    """Incidence angle of a flat-earth swath, varying across one dimension of a grid.

    Ground range is evenly spaced across ``across_dim`` between the ranges of the near
    and far edges, so ``tan(theta)`` varies linearly (platform height cancels).

    Parameters
    ----------
    template : xarray.DataArray
        A field on the scene grid (gives dimensions and sizes).
    near_deg, far_deg : float
        Incidence at the first and last index along ``across_dim`` [degree], in (0, 90).
    across_dim : str, optional
        Dimension across the swath (default: the last dimension of ``template``).

    Returns
    -------
    xarray.DataArray
        Incidence [degree] along ``across_dim`` (1-D; broadcasts over the grid).

    Examples
    --------
    >>> import xarray as xr
    >>> t = xr.DataArray(np.zeros((2, 3)), dims=("y", "x"))
    >>> [round(float(v), 1) for v in swath_incidence_field(t, 20.0, 45.0).values]
    [20.0, 34.3, 45.0]
    """
    import xarray as xr
    from .scene_synthetic import swath_incidence
    from ._checks import check_range
    dim = across_dim or (template.dims[-1] if template.dims else None)
    if dim is None or dim not in template.dims:
        raise ShortwaveInputError(f"across_dim: {dim!r} is not a dimension of the scene "
                                  f"({', '.join(template.dims) or 'none'})")
    for name, v in (("swath near-edge incidence", near_deg),
                    ("swath far-edge incidence", far_deg)):
        check_range(name, v, 0.0, 90.0, inclusive=(False, False), allow_nan=False,
                    unit="degree")
    n = template.sizes[dim]
    if n < 2:
        vals = np.array([float(near_deg)])
    else:
        vals = swath_incidence(n, near_deg, far_deg)
    coords = {dim: template.coords[dim]} if dim in template.coords else {}
    return xr.DataArray(vals, dims=(dim,), coords=coords, name="incidence_angle",
                        attrs={"units": "degree"})


def open_scene(source, *, overrides=None, chunks=None, swath=None, across_dim=None,
               look_azimuth=None, temperature_c=None, salinity=None):
    """Find, convert and align the inputs of a scene.

    Parameters
    ----------
    source : str, os.PathLike or xarray.Dataset
        NetCDF file or dataset.
    overrides : dict or iterable of "ROLE=NAME", optional
        Explicit variable for a role (``--var``); roles: ``wind_speed``,
        ``wind_direction``, ``eastward_wind``, ``northward_wind``, ``incidence_angle``,
        ``sensor_azimuth``, ``look_azimuth``, ``sea_surface_temperature``,
        ``sea_surface_salinity``, ``slick_mask``, ``film_thickness``.
    chunks : dict or "auto", optional
        Read lazily in dask chunks (files only; a dataset is used as it is).
    swath : (float, float), optional
        Near and far incidence [degree]: the incidence follows a flat-earth swath across
        ``across_dim`` instead of an incidence variable.
    across_dim : str, optional
        Dimension across the swath (default: the last dimension of the wind).
    look_azimuth : float, optional
        Direction the radar looks, from radar to scene [degree clockwise from north];
        used when the file has no ``sensor_azimuth_angle`` / look-azimuth variable.
    temperature_c, salinity : float, optional
        Constant water temperature [degC] and salinity [g kg-1] when the file has none
        (default 15 degC and 35 g/kg, the package's default sea water).

    Returns
    -------
    Scene

    Raises
    ------
    ValueError
        Missing or ambiguous variables, units that cannot be converted, fields on
        different grids, bad values (negative wind, incidence outside (0, 90) degree,
        infinite values, mask values other than 0/1, ...); the message names the
        variable and what was found.

    Notes
    -----
    The wind direction relative to the look, ``wind_azimuth = wind_from_direction -
    look_azimuth`` with ``look_azimuth = sensor_azimuth_angle - 180`` (the radar looks
    from itself toward the cell), follows the package convention of
    :func:`shortwave.radar.nrcs`: 0 when the wind comes from the direction the radar
    looks at, i.e. blows toward the radar (upwind); 180 when it blows away (downwind).

    Examples
    --------
    >>> from shortwave.scene_synthetic import greyhaven_scene
    >>> scene = open_scene(greyhaven_scene("small"))
    >>> sorted(scene.inputs.data_vars)[:3]
    ['film_thickness', 'incidence_angle', 'salinity']
    """
    import xarray as xr
    path = None
    if isinstance(source, xr.Dataset):
        ds = source
    else:
        path = os.fspath(source)
        ds = ncio.open_input(path, chunks=chunks)
    over = ncio.parse_overrides(overrides)
    names = {}

    def label(da, role):
        return f"{da.name} ({role})"

    # --- wind --------------------------------------------------------------------------
    speed = _find(ds, "wind_speed", over)
    wdir = _find(ds, "wind_direction", over)
    u = _find(ds, "eastward_wind", over)
    v = _find(ds, "northward_wind", over)
    use_components = (u is not None and v is not None
                      and ("eastward_wind" in over or speed is None or wdir is None))
    if use_components:
        if u.name == v.name:
            raise ValueError(f"eastward_wind and northward_wind are the same variable "
                             f"{u.name!r}")
        uu = _convert(u, "eastward_wind", "m s-1")
        vv = _convert(v, "northward_wind", "m s-1")
        _check_same_grid([(uu, "eastward_wind"), (vv, "northward_wind")])
        wind = np.hypot(uu, vv)
        wind_from = (np.rad2deg(np.arctan2(-uu, -vv))) % 360.0
        names["wind"] = f"{u.name} + {v.name}"
        wind_src = [(u, "eastward_wind"), (v, "northward_wind")]
    elif speed is not None:
        if wdir is None:
            raise ValueError(f"wind direction missing: the file has the wind speed "
                             f"{speed.name!r} but no wind_from_direction (or eastward/"
                             "northward components); name it with --var wind_direction=NAME")
        wind = _convert(speed, "wind_speed", "m s-1")
        wd = _convert(wdir, "wind_direction", "degree")
        # the CF standard name decides "from" or "to"; the variable name only when the
        # variable has no standard name (same rule as tail.wind_inputs)
        sn = wdir.attrs.get("standard_name")
        if sn == "wind_to_direction" or (not sn and "to_direction" in str(wdir.name)):
            wd = wd + 180.0
        wind_from = wd % 360.0
        names["wind"] = f"{speed.name} + {wdir.name}"
        wind_src = [(speed, "wind_speed"), (wdir, "wind_direction")]
    else:
        raise ValueError(
            "no wind found: need wind_speed and wind_from_direction, or eastward_wind and "
            "northward_wind (by CF standard_name, common names, or --var ROLE=NAME); "
            f"variables in the input: {', '.join(map(str, ds.data_vars)) or 'none'}")
    if wind.ndim == 0:
        raise ValueError("the wind is a single value, not a field; use the backscatter "
                         "command for single values")
    grid = [(w, r) for w, r in wind_src]

    # --- incidence ---------------------------------------------------------------------
    if swath is not None:
        near, far = swath
        inc = swath_incidence_field(wind, near, far, across_dim)
        names["incidence_angle"] = f"swath {near:g}-{far:g} degree across {inc.dims[0]}"
    else:
        inc_v = _find(ds, "incidence_angle", over)
        if inc_v is None:
            raise ValueError("no incidence angle: the input has no angle_of_incidence "
                             "variable (or incidence_angle, incidence, inc); name it with "
                             "--var incidence_angle=NAME or give the swath with --swath "
                             "NEAR,FAR")
        inc = _convert(inc_v, "incidence_angle", "degree")
        names["incidence_angle"] = inc_v.name
        grid.append((inc_v, "incidence_angle"))

    # --- look direction ----------------------------------------------------------------
    sens = _find(ds, "sensor_azimuth", over)
    look = _find(ds, "look_azimuth", over) if sens is None else None
    if sens is not None:
        sensor_az = _convert(sens, "sensor_azimuth", "degree")
        names["look"] = f"{sens.name} (direction to the radar)"
        grid.append((sens, "sensor_azimuth"))
    elif look is not None:
        sensor_az = _convert(look, "look_azimuth", "degree") + 180.0
        names["look"] = f"{look.name} (look direction)"
        grid.append((look, "look_azimuth"))
    elif look_azimuth is not None:
        la = float(look_azimuth)
        if not math.isfinite(la):
            raise ShortwaveInputError(f"look_azimuth: must be a finite angle, got {la}")
        sensor_az = xr.DataArray(la + 180.0)
        names["look"] = f"look azimuth {la:g} degree (constant)"
    else:
        raise ValueError("radar look direction missing: give --look-azimuth DEG (direction "
                         "the radar looks, clockwise from north) or a sensor_azimuth_angle "
                         "variable")
    # the radar looks along sensor_azimuth - 180; upwind (0) when the wind comes from the
    # direction the radar looks at, i.e. blows toward the radar
    azimuth = (wind_from - sensor_az + 180.0) % 360.0

    # --- water -------------------------------------------------------------------------
    data = {"wind_speed": wind, "wind_azimuth": azimuth, "incidence_angle": inc}

    def field_or_constant(key, role, convert, constant=None, unit=""):
        """data[key] from the file's variable of ``role``, else from ``constant``."""
        var = _find(ds, role, over)
        if var is not None:
            data[key] = convert(var)
            names[role] = var.name
            grid.append((var, role))
        elif constant is not None:
            data[key] = xr.DataArray(float(constant))
            names[role] = f"{float(constant):g} {unit} (constant)"

    field_or_constant("temperature_c", "sea_surface_temperature",
                      lambda da: _convert(da, "sea_surface_temperature", "K") - 273.15,
                      temperature_c, "degC")
    field_or_constant("salinity", "sea_surface_salinity",
                      lambda da: _convert_table(da, "sea_surface_salinity", _SALINITY_UNITS,
                                                "g kg-1"),
                      salinity, "g/kg")

    # --- film --------------------------------------------------------------------------
    field_or_constant("slick_mask", "slick_mask", lambda da: da.astype(float))
    field_or_constant("film_thickness", "film_thickness",
                      lambda da: _convert_table(da, "film_thickness", _THICKNESS_UNITS, "m"))

    _check_same_grid(grid)
    ref = wind_src[0][0]
    keep = {name: c.variable for name, c in ref.coords.items()
            if set(c.dims) <= set(wind.dims)}
    gm = None
    gm_name = ref.attrs.get("grid_mapping")
    if isinstance(gm_name, str) and gm_name in ds.variables:
        gm = ds[gm_name].reset_coords(drop=True).variable
        gm = (gm_name, gm)
    clean = {}
    for key, da in data.items():
        da = da.copy(deep=False) if hasattr(da, "copy") else da
        da.attrs = {}
        clean[key] = da.reset_coords(drop=True) if hasattr(da, "reset_coords") else da
    inputs = xr.Dataset(clean)
    for dim in inputs.dims:
        if dim in ds.coords and dim not in inputs.coords:
            inputs = inputs.assign_coords({dim: ds.coords[dim]})
    return Scene(inputs=inputs, names=names, attrs=dict(ds.attrs), path=path, coords=keep,
                 grid_mapping=gm)


def _check_same_grid(items):
    """All fields must lie on one grid: their dimensions a subset of the largest's."""
    ref, ref_role = max(items, key=lambda it: it[0].ndim)
    for da, role in items:
        extra = [d for d in da.dims if d not in ref.dims]
        if extra:
            raise ValueError(
                f"variable {da.name!r} ({role}) has dimensions ({', '.join(da.dims)}), not "
                f"on the grid of {ref.name!r} ({ref_role}: {', '.join(ref.dims)}); the "
                "fields must share dimension names (rename or transpose the file)")
        for d in da.dims:
            if da.sizes[d] != ref.sizes[d]:
                raise ValueError(
                    f"variable {da.name!r} ({role}) has {da.sizes[d]} points along {d!r}, "
                    f"{ref.name!r} ({ref_role}) has {ref.sizes[d]}: the grids do not match")
            if d in da.coords and d in ref.coords:
                a, b = np.asarray(da[d].values), np.asarray(ref[d].values)
                if a.shape != b.shape or not np.array_equal(a, b):
                    raise ValueError(
                        f"variable {da.name!r} ({role}) and {ref.name!r} ({ref_role}) have "
                        f"different {d!r} coordinates: the grids do not match")


# ---------------------------------------------------------------------------------------
# Checking
# ---------------------------------------------------------------------------------------

_LIMITS = {
    # key: (low, high, inclusive, what)
    "wind_speed": (0.0, 100.0, (True, True), "m s-1"),
    "incidence_angle": (0.0, 90.0, (False, False), "degree"),
    "temperature_c": (-5.0, 45.0, (True, True), "degC"),
    "salinity": (0.0, 50.0, (True, True), "g kg-1"),
    "slick_mask": (0.0, 1.0, (True, True), ""),
    "film_thickness": (0.0, 0.05, (True, True), "m"),
}


@dataclass
class ScanResult:
    """Counts from :func:`scan_scene`."""

    cells: int
    missing: int
    calm: int
    film_cells: int
    stats: dict


_INPUT_KEYS = ("wind_speed", "wind_azimuth", "incidence_angle", "temperature_c", "salinity",
               "slick_mask", "film_thickness")


def _aligned_inputs(scene):
    """Inputs broadcast to the scene grid, in one dimension order; dask chunks shared.

    Returns ``(keys, arrays)``: DataArrays that are all NumPy-backed or all dask-backed
    with identical chunks (so that per-chunk work sees matching blocks).
    """
    import xarray as xr
    ins = scene.inputs
    keys = [k for k in _INPUT_KEYS if k in ins]
    arrays = list(xr.broadcast(*[ins[k] for k in keys]))
    dims = arrays[0].dims
    arrays = [a if a.dims == dims else a.transpose(*dims) for a in arrays]
    lazy = [a for a in arrays if _is_dask(a.data)]
    if lazy:
        ref = dict(zip(lazy[0].dims, lazy[0].chunks))
        arrays = [a if (_is_dask(a.data) and dict(zip(a.dims, a.chunks)) == ref)
                  else a.chunk(ref) for a in arrays]
    return keys, arrays


def _block_stats(keys, min_wind, *blocks):
    """Statistics of one block of the inputs: per input min, max, inf and finite counts,
    and the counts of missing, calm and film cells (a flat float array)."""
    arrs = dict(zip(keys, (np.asarray(b, dtype=float) for b in blocks)))
    out = []
    valid = np.ones(arrs["wind_speed"].shape, bool)
    for k in ("wind_speed", "wind_azimuth", "incidence_angle", "temperature_c", "salinity"):
        if k in arrs:
            valid &= np.isfinite(arrs[k])
    calm = valid & (arrs["wind_speed"] < min_wind)
    film = np.zeros(valid.shape, bool)
    if "slick_mask" in arrs:
        film |= arrs["slick_mask"] > 0.5
        if "film_thickness" in arrs:
            film &= ~(arrs["film_thickness"] <= 0)
    elif "film_thickness" in arrs:
        film |= arrs["film_thickness"] > 0
    film &= valid & ~calm
    out += [float((~valid).sum()), float(calm.sum()), float(film.sum())]
    for k in keys:
        v = arrs[k]
        fin = np.isfinite(v)
        out += [float(v[fin].min()) if fin.any() else np.nan,
                float(v[fin].max()) if fin.any() else np.nan,
                float(np.isinf(v).sum()), float(fin.sum())]
    return np.array(out)


def _combine_stats(keys, rows):
    rows = np.atleast_2d(np.asarray(rows, dtype=float))
    got = {"missing": rows[:, 0].sum(), "calm": rows[:, 1].sum(), "film": rows[:, 2].sum()}
    for i, k in enumerate(keys):
        c = 3 + 4 * i
        mins, maxs = rows[:, c], rows[:, c + 1]
        got[f"{k}.min"] = float(np.nanmin(mins)) if np.isfinite(mins).any() else np.nan
        got[f"{k}.max"] = float(np.nanmax(maxs)) if np.isfinite(maxs).any() else np.nan
        got[f"{k}.inf"] = rows[:, c + 2].sum()
        got[f"{k}.finite"] = rows[:, c + 3].sum()
    return got


def scan_scene(scene, min_wind_speed=0.5):
    """Check every input's values and count missing, calm and film cells.

    One pass over the inputs: block by block when they are dask arrays (one small task
    per chunk, a single ``dask.compute``).  Raises a
    :class:`~shortwave._checks.ShortwaveInputError` naming the input variable for infinite
    values, negative wind, incidence outside (0, 90) degree, implausible temperature or
    salinity (often a unit mix-up), mask values other than 0/1 and negative thickness.

    Returns
    -------
    ScanResult
        ``cells``, ``missing`` (NaN in a needed input: land), ``calm`` (wind below
        ``min_wind_speed`` [m s-1]), ``film_cells`` and per-input statistics.

    Examples
    --------
    >>> from shortwave.scene_synthetic import greyhaven_scene
    >>> scan = scan_scene(open_scene(greyhaven_scene((6, 8))))
    >>> scan.cells, scan.missing
    (48, 14)
    """
    keys, arrays = _aligned_inputs(scene)
    if _is_dask(arrays[0].data):
        import dask
        darrs = [a.data for a in arrays]
        tasks = [dask.delayed(_block_stats)(keys, min_wind_speed,
                                            *[d.blocks[idx] for d in darrs])
                 for idx in np.ndindex(*darrs[0].numblocks)]
        rows = dask.compute(*tasks)
    else:
        rows = [_block_stats(keys, min_wind_speed, *[a.values for a in arrays])]
    got = _combine_stats(keys, rows)
    for key in keys:
        src = _source_name(scene, key)
        if got[f"{key}.inf"] > 0:
            raise ShortwaveInputError(f"{src}: infinite values are not allowed "
                                      f"({int(got[f'{key}.inf'])} cells)")
        if key in _LIMITS and got[f"{key}.finite"] > 0:
            lo, hi, inclusive, unit = _LIMITS[key]
            mn, mx = got[f"{key}.min"], got[f"{key}.max"]
            bad_lo = mn < lo if inclusive[0] else mn <= lo
            bad_hi = mx > hi if inclusive[1] else mx >= hi
            if bad_lo or bad_hi:
                lb = "[" if inclusive[0] else "("
                rb = "]" if inclusive[1] else ")"
                hint = _hint(key, mn, mx)
                u = f" {unit}" if unit else ""
                raise ShortwaveInputError(
                    f"{src}: values from {mn:g} to {mx:g}{u} are outside the valid range "
                    f"{lb}{lo:g}, {hi:g}{rb}{u}{hint}")
    if got["wind_speed.finite"] == 0:
        raise ShortwaveInputError(f"{_source_name(scene, 'wind_speed')}: every cell is "
                                  "missing (NaN): nothing to compute")
    cells = scene.ncells
    return ScanResult(cells=cells, missing=int(got["missing"]), calm=int(got["calm"]),
                      film_cells=int(got.get("film", 0)), stats=got)


def _source_name(scene, key):
    role = {"wind_speed": "wind", "wind_azimuth": "wind", "temperature_c":
            "sea_surface_temperature", "salinity": "sea_surface_salinity"}.get(key, key)
    where = scene.names.get(role)
    what = {"wind_speed": "wind speed", "wind_azimuth": "wind direction relative to the look",
            "temperature_c": "sea surface temperature", "salinity": "sea surface salinity",
            "incidence_angle": "incidence angle", "slick_mask": "slick mask",
            "film_thickness": "film thickness"}.get(key, key)
    return f"{what} (from {where})" if where else what


def _hint(key, mn, mx):
    if key == "temperature_c" and mn > 200:
        return "; the values look like kelvin: check the units attribute"
    if key == "temperature_c" and mx < -200:
        return "; the values look like degC labelled as K: check the units attribute"
    if key == "salinity" and mx < 0.05:
        return "; the values look like kg/kg: check the units attribute"
    if key == "incidence_angle" and mx < 1.6 and mx > 0:
        return "; the values look like radians: check the units attribute"
    if key == "wind_speed" and mn < 0:
        return "; a wind speed cannot be negative"
    if key == "film_thickness" and mx > 0.05:
        return "; check the units attribute (m expected, um/mm accepted)"
    return ""


# ---------------------------------------------------------------------------------------
# The per-cell kernel
# ---------------------------------------------------------------------------------------

MSS_WIND_STEP = 0.02
"""Wind step [m s-1] of the lattice on which the mean square slope is tabulated and then
interpolated linearly per cell.  The lattice is anchored at multiples of the step, so the
result of a cell does not depend on how the scene is split into chunks."""

MSS_SLICK_WIND_STEP = 0.1
"""Wind step [m s-1] of the lattice for the film-covered mean square slope."""

_MSS_POINTS = 801


def _wind_lattice(u, step):
    """Lattice nodes (multiples of ``step``, all > 0) spanning the winds ``u``."""
    lo = max(1, int(np.floor(float(np.min(u)) / step)))
    hi = max(lo + 1, int(np.ceil(float(np.max(u)) / step)))
    return np.arange(lo, hi + 1) * step


_CACHE = {}
_CACHE_LIMIT = 64


def _cache_for(key):
    """A process-level memo (per worker process under dask.distributed) for tables that
    every chunk would otherwise recompute: they depend on the film, the water, the model
    and a wind node, never on the cells."""
    if key not in _CACHE:
        if len(_CACHE) >= _CACHE_LIMIT:
            _CACHE.pop(next(iter(_CACHE)))
        _CACHE[key] = {}
    return _CACHE[key]


def _film_key(film):
    fields_ = [f.name for f in __import__("dataclasses").fields(film)
               if f.name not in ("name", "source", "ranges")]
    return (type(film).__name__, film.name) + tuple(
        float(np.asarray(getattr(film, f))) for f in fields_)


def _water_key(water):
    return (float(water.temperature_c), float(water.salinity)) if water is not None else None


def _node_table(key, grid, step, compute):
    """Values at lattice nodes ``grid`` (multiples of ``step``), computing only new ones."""
    memo = _cache_for(key)
    ids = np.rint(np.asarray(grid) / step).astype(np.int64)
    todo = [i for i in ids.tolist() if i not in memo]
    if todo:
        vals = np.asarray(compute(np.array(todo, dtype=float) * step), dtype=float)
        memo.update(zip(todo, vals.tolist()))
    return np.array([memo[i] for i in ids.tolist()])


def _film_factor(film, water):
    """Spectrum factor 1 / y(k) of a film for :func:`shortwave.radar.nrcs` (memoised).

    Where the film overdamps the wave (no propagating root of the film dispersion
    relation: thick viscous oil, very short waves) the factor is 0: the film suppresses
    those waves entirely.
    """
    memo = _cache_for(("film factor", _film_key(film), _water_key(water)))

    def factor(k):
        key = (k.shape, float(k.flat[0]), float(k.flat[-1]))
        if key not in memo:
            memo[key] = _inverse_contrast(k, 1.0, film, "alpers_huhnerfuss1989", water)
        return memo[key]
    return factor


def _inverse_contrast(k, wind_speed, film, model, water):
    """1 / K(k) of :func:`shortwave.slick.spectral_contrast`, 0 where the wave is overdamped."""
    import warnings
    from . import slick
    with warnings.catch_warnings():   # overdamped short waves are expected: factor 0 there
        warnings.filterwarnings("ignore", message="film damping", category=RuntimeWarning)
        return slick.inverse_spectral_contrast(k, wind_speed, film, model, water)


def _damped_mss(winds, film, model, water, spectrum_model, n=None):
    """Mean square slope of the film-damped spectrum at the winds ``winds`` [1].

    The integral of B(k) / K(k) over ln k from k_p/50 to 1e4 rad m-1, the limits of
    :func:`shortwave.spectrum.mean_square_slope`; overdamped waves contribute nothing.
    """
    from .spectrum import DEFAULT_K_MIN_FACTOR, curvature, peak_wavenumber
    n = n or _MSS_POINTS
    u = np.asarray(winds, dtype=float)
    kmin = DEFAULT_K_MIN_FACTOR * np.asarray(peak_wavenumber(u, 0.84))
    t = np.linspace(0.0, 1.0, n)
    lnk = np.log(kmin)[:, None] + (np.log(1.0e4) - np.log(kmin))[:, None] * t
    kg = np.exp(lnk)
    b = np.asarray(curvature(kg, u[:, None], model=spectrum_model))
    fac = _inverse_contrast(kg, u[:, None], film, model, water)
    return np.trapezoid(b * fac, lnk, axis=-1)


def _film_classes(film, thickness, per_decade):
    """Group cells by film: one class for a monolayer, log-thickness classes for oil."""
    from .films import OilLayer
    if not isinstance(film, OilLayer) or thickness is None:
        return [(film, np.ones(np.shape(thickness) if thickness is not None else (), bool),
                 None)]
    h = np.asarray(thickness, dtype=float)
    pos = h > 0
    code = np.full(h.shape, -10**9, dtype=np.int64)
    code[pos] = np.round(np.log10(h[pos]) * per_decade).astype(np.int64)
    out = []
    for c in np.unique(code[pos]):
        sel = code == c
        out.append((film.replace(thickness=float(10.0 ** (c / per_decade))), sel,
                    float(10.0 ** (c / per_decade))))
    return out


class _Kernel:
    """The per-cell computation, applied to NumPy blocks (picklable for dask workers)."""

    def __init__(self, frequency_hz, polarization, model, spectrum_model, film,
                 contrast_model, cover, min_wind_speed, water, keys, thickness_per_decade):
        self.f = float(frequency_hz)
        self.pol = polarization
        self.model = model
        self.spectrum_model = spectrum_model
        self.film = film
        self.contrast_model = contrast_model
        self.cover = cover
        self.min_wind = float(min_wind_speed)
        self.water = water
        self.keys = tuple(keys)
        self.per_decade = int(thickness_per_decade)

    @property
    def outputs(self):
        out = ["bragg_wavenumber", "bragg_curvature", "sigma0", "mean_square_slope"]
        if self.film is not None:
            out += ["film_cover", "sigma0_slick", "damping_ratio", "mean_square_slope_slick"]
        return out

    def __call__(self, *arrays):
        from . import radar, spectrum
        from .permittivity import permittivity
        from .water import Water
        arrs = dict(zip(self.keys, np.broadcast_arrays(*[np.asarray(a, dtype=float)
                                                         for a in arrays])))
        shape = arrs["wind_speed"].shape
        flat = {k: v.ravel() for k, v in arrs.items()}
        u = flat["wind_speed"]
        inc = flat["incidence_angle"]
        az = flat["wind_azimuth"]
        t_c = flat.get("temperature_c", np.full(u.shape, self.water.temperature_c))
        sal = flat.get("salinity", np.full(u.shape, self.water.salinity))
        ok = (np.isfinite(u) & np.isfinite(inc) & np.isfinite(az) & np.isfinite(t_c)
              & np.isfinite(sal) & (u >= self.min_wind))
        res = {name: np.full(u.shape, np.nan) for name in self.outputs}
        idx = np.flatnonzero(ok)
        if idx.size:
            uu, ii, aa, tt, ss = u[idx], inc[idx], az[idx], t_c[idx], sal[idx]
            kb = np.asarray(radar.bragg_wavenumber(self.f, ii), dtype=float)
            res["bragg_wavenumber"][idx] = kb
            res["bragg_curvature"][idx] = spectrum.curvature(kb, uu, model=self.spectrum_model)
            eps = np.asarray(permittivity(self.f, tt, ss))           # per-cell permittivity
            sig = np.asarray(radar.nrcs(self.f, ii, uu, self.pol, aa, self.model,
                                        spectrum_model=self.spectrum_model, water=self.water,
                                        permittivity=eps), dtype=float)
            res["sigma0"][idx] = sig
            grid = _wind_lattice(uu, MSS_WIND_STEP)
            mss = _node_table(("mss", self.spectrum_model), grid, MSS_WIND_STEP,
                              lambda w: spectrum.mean_square_slope(
                                  w, model=self.spectrum_model, n=_MSS_POINTS))
            res["mean_square_slope"][idx] = np.interp(uu, grid, mss)
            if self.film is not None:
                self._film(res, idx, flat, kb, uu, ii, aa, tt, ss, eps, sig, Water)
        return tuple(res[name].reshape(shape) for name in self.outputs)

    def _film(self, res, idx, flat, kb, uu, ii, aa, tt, ss, eps, sig, Water):
        from . import films, radar, slick
        n = idx.size
        if self.cover == "everywhere":
            on = np.ones(n, bool)
        else:
            on = np.zeros(n, bool)
            if "slick_mask" in flat:
                on |= flat["slick_mask"][idx] > 0.5
            if "film_thickness" in flat:
                h = flat["film_thickness"][idx]
                on = (on & ~(h <= 0)) if "slick_mask" in flat else (on | (h > 0))
        thick = flat.get("film_thickness")
        thick = thick[idx] if thick is not None else None
        if isinstance(self.film, films.OilLayer) and thick is not None:
            on &= np.nan_to_num(thick, nan=0.0) > 0
        cover = np.where(on, 1.0, 0.0)
        res["film_cover"][idx] = cover
        slick_sig = sig.copy()
        ratio = np.ones(n)
        mss_s = res["mean_square_slope"][idx].copy()
        cells = np.flatnonzero(on)
        if cells.size:
            oil = isinstance(self.film, films.OilLayer) and thick is not None
            tk = thick[cells] if oil else None
            film_cells = self.film.replace(thickness=tk) if oil else self.film
            w_cells = Water(tt[cells], ss[cells])
            # per cell, exact: damping ratio at K_B and the Bragg-level contrast models
            ratio[cells] = np.asarray(films.damping_ratio(kb[cells], film_cells, w_cells,
                                                          on_failure="nan"))
            if self.contrast_model != "two-scale":
                kk = np.asarray(slick.contrast(
                    film_cells, bragg_wavenumber=kb[cells], wind_speed=uu[cells],
                    model=self.contrast_model, water=w_cells, azimuth_deg=aa[cells],
                    on_failure="nan"))
                slick_sig[cells] = sig[cells] / kk
            mss_model = "balance" if self.contrast_model == "balance" else \
                "alpers_huhnerfuss1989"
            # per film class (one film for a monolayer, thickness classes for oil): the
            # quantities that integrate over the spectrum need a single film
            for film_c, sel, _h in _film_classes(self.film, tk, self.per_decade):
                c = cells[sel] if tk is not None else cells
                if c.size == 0:
                    continue
                if self.contrast_model == "two-scale":
                    slick_sig[c] = radar.nrcs(
                        self.f, ii[c], uu[c], self.pol, aa[c], self.model,
                        spectrum_model=self.spectrum_model, water=self.water,
                        permittivity=eps[c],
                        spectrum_factor=_film_factor(film_c, self.water))
                grid = _wind_lattice(uu[c], MSS_SLICK_WIND_STEP)
                m = _node_table(("mss film", _film_key(film_c), _water_key(self.water),
                                 mss_model, self.spectrum_model), grid, MSS_SLICK_WIND_STEP,
                                lambda w, f=film_c: _damped_mss(w, f, mss_model, self.water,
                                                                self.spectrum_model))
                mss_s[c] = np.interp(uu[c], grid, m)
        res["sigma0_slick"][idx] = slick_sig
        res["damping_ratio"][idx] = np.where(on, ratio, np.nan)
        res["mean_square_slope_slick"][idx] = mss_s


# ---------------------------------------------------------------------------------------
# Products
# ---------------------------------------------------------------------------------------

def _mean_water(scene, scan):
    from .water import Water
    st = scan.stats if scan is not None else {}

    def mid(key, default):
        if f"{key}.min" in st and np.isfinite(st[f"{key}.min"]):
            return 0.5 * (st[f"{key}.min"] + st[f"{key}.max"])
        return default
    return Water(mid("temperature_c", 15.0), mid("salinity", 35.0))


def scene_products(scene, frequency_hz, polarization="VV", film=None, *, cover="auto",
                   contrast_model="two-scale", model="two-scale",
                   spectrum_model="elfouhaily1997", min_wind_speed=0.5,
                   thickness_classes_per_decade=20, scan=None):
    """Per-cell Bragg scales, backscatter and (with a film) slick contrast of a scene.

    Parameters
    ----------
    scene : Scene
        From :func:`open_scene`.
    frequency_hz : float
        Radar frequency [Hz], within :data:`FREQUENCY_RANGE_HZ` (0.5-40 GHz).
    polarization : {"VV", "HH", "HV", "VH"}
        Radar polarisation.
    film : Monolayer, OilLayer, str or None
        The film (a :mod:`shortwave.films` object or preset name).  None: no film
        outputs.  An oil-layer film takes its thickness per cell from the scene's
        ``film_thickness`` when there is one.
    cover : {"auto", "mask", "everywhere"}
        Where the film is (:data:`FILM_COVERS`).
    contrast_model : str
        One of :data:`CONTRAST_MODELS` (default ``"two-scale"``).
    model : str
        Backscatter model, one of :data:`shortwave.radar.MODELS` (default two-scale).
    spectrum_model : str
        Wave spectrum, one of :data:`shortwave.spectrum.MODELS`.
    min_wind_speed : float
        Cells with less wind [m s-1] are left NaN (calm) and counted.
    thickness_classes_per_decade : int
        Oil thickness is grouped in classes of this many per decade (20: 12 % steps) for
        the two-scale film computation.
    scan : ScanResult, optional
        From :func:`scan_scene` (computed here when not given).

    Returns
    -------
    xarray.Dataset
        The outputs listed in the module docstring, on the scene grid (lazy when the
        inputs are), with CF attributes, the input coordinates, and global attributes
        describing the computation (models, radar, film, cell counts).

    Notes
    -----
    Film damping ratios use each cell's water (temperature, salinity); the two-scale
    film factor and the breaking-wave phase speeds use the scene's mid-range water;
    the permittivity uses each cell's water (Meissner & Wentz 2004).

    Examples
    --------
    >>> from shortwave.scene_synthetic import greyhaven_scene
    >>> scene = open_scene(greyhaven_scene((6, 8)))
    >>> out = scene_products(scene, 5.405e9, "VV")
    >>> round(float(out.bragg_wavelength.min()), 4)   # C band at 45 degrees [m]
    0.0392
    """
    import xarray as xr
    from . import __version__, radar
    from ._checks import check_range
    from .films import Monolayer, OilLayer, film_preset
    from .radar.spm import check_polarization

    f = float(check_range("frequency_hz", frequency_hz, *FREQUENCY_RANGE_HZ,
                          allow_nan=False, unit="Hz"))
    pol = check_polarization(polarization)
    model = check_choice("model", model, radar.MODELS)
    contrast_model = check_choice("contrast_model", contrast_model, CONTRAST_MODELS)
    cover = check_choice("cover", cover, FILM_COVERS)
    from .spectrum import MODELS as SPECTRUM_MODELS
    spectrum_model = check_choice("spectrum_model", spectrum_model, SPECTRUM_MODELS)
    mw = float(min_wind_speed)
    if not (math.isfinite(mw) and mw > 0):
        raise ShortwaveInputError(f"min_wind_speed: must be > 0 m s-1, got {min_wind_speed}")
    if isinstance(film, str):
        film = film_preset(film)
    if film is not None and not isinstance(film, (Monolayer, OilLayer)):
        raise ShortwaveInputError(f"film: expected a preset name, Monolayer or OilLayer, got "
                                  f"{type(film).__name__}")
    if film is None and scene.has_film_field:
        pass   # the mask is kept as an input echo; no film outputs without a film
    if cover == "auto":
        cover = "mask" if scene.has_film_field else "everywhere"
    if cover == "mask" and film is not None and not scene.has_film_field:
        raise ShortwaveInputError("cover: 'mask' needs a slick_mask or film_thickness "
                                  "variable in the scene; use cover='everywhere'")
    if (film is not None and "film_thickness" in scene.inputs
            and not isinstance(film, OilLayer) and "slick_mask" not in scene.inputs):
        raise ShortwaveInputError(
            f"film: {film.name!r} is a monomolecular film, but the scene gives a film "
            "thickness; choose an oil-layer preset (diesel, light-crude, medium-crude, "
            "heavy-crude) or add a slick mask")
    if scan is None:
        scan = scan_scene(scene, mw)
    water = _mean_water(scene, scan)
    ins = scene.inputs
    keys, arrays = _aligned_inputs(scene)
    kernel = _Kernel(f, pol, model, spectrum_model, film, contrast_model, cover, mw,
                     water, keys, thickness_classes_per_decade)
    names = kernel.outputs
    outs = xr.apply_ufunc(kernel, *arrays, output_core_dims=[[] for _ in names],
                          dask="parallelized", output_dtypes=[float] * len(names),
                          keep_attrs=False)
    if len(names) == 1:
        outs = (outs,)
    res = dict(zip(names, outs))
    data = {}
    data["wind_speed"] = arrays[keys.index("wind_speed")]
    data["wind_azimuth"] = arrays[keys.index("wind_azimuth")]
    data["incidence_angle"] = arrays[keys.index("incidence_angle")]
    data["bragg_wavenumber"] = res["bragg_wavenumber"]
    data["bragg_wavelength"] = 2 * np.pi / res["bragg_wavenumber"]
    data["bragg_curvature"] = res["bragg_curvature"]
    data["sigma0"] = res["sigma0"]
    data["sigma0_db"] = 10.0 * np.log10(res["sigma0"].where(res["sigma0"] > 0))
    data["mean_square_slope"] = res["mean_square_slope"]
    if film is not None:
        data["film_cover"] = res["film_cover"]
        data["sigma0_slick"] = res["sigma0_slick"]
        data["sigma0_slick_db"] = 10.0 * np.log10(
            res["sigma0_slick"].where(res["sigma0_slick"] > 0))
        data["slick_contrast_db"] = 10.0 * np.log10(
            (res["sigma0"] / res["sigma0_slick"]).where(res["sigma0_slick"] > 0))
        data["damping_ratio"] = res["damping_ratio"]
        data["mean_square_slope_slick"] = res["mean_square_slope_slick"]
        if "film_thickness" in ins and isinstance(film, OilLayer):
            data["film_thickness"] = arrays[keys.index("film_thickness")]
    out = xr.Dataset({k: v.rename(k) for k, v in data.items()})
    for name in out.data_vars:
        out[name].attrs = _metadata(name)
        if name.startswith("sigma0"):
            out[name].attrs["polarization"] = pol
    for name, coord in ins.coords.items():
        out = out.assign_coords({name: coord})
    for name, var in scene.coords.items():
        if name not in out.coords:
            out = out.assign_coords({name: var})
    for name in out.data_vars:
        if name.endswith("_db"):
            # UDUNITS has no "dB"; decibels of a ratio are "0.1 lg(re 1)" (CF 1.10 Sect. 3.1)
            out[name].attrs["units"] = DB_UNITS
            out[name].attrs["long_name"] = out[name].attrs.get("long_name", name)
    if scene.grid_mapping is not None:
        gm_name, gm_var = scene.grid_mapping
        out[gm_name] = gm_var
        for name in list(out.data_vars):
            if name != gm_name and out[name].ndim >= 2:
                out[name].attrs["grid_mapping"] = gm_name
    wl = float(radar.radar_wavelength(f))
    out = out.assign_coords(
        radar_frequency=xr.DataArray(f, attrs=_metadata("radar_frequency")),
        radar_wavelength=xr.DataArray(wl, attrs=_metadata("radar_wavelength")))
    attrs = {k: v for k, v in scene.attrs.items()
             if k not in ("Conventions", "history", "_NCProperties")}
    if "history" in scene.attrs:
        attrs["history"] = scene.attrs["history"]
    if "source" in scene.attrs:
        attrs["input_source"] = scene.attrs["source"]
    if scene.path:
        attrs["input_file"] = os.path.basename(scene.path)
    band = radar.band_of(f)
    attrs.update({
        "title": (f"{scene.attrs['title']}: radar products" if scene.attrs.get("title")
                  else "shortwave radar scene products"),
        "source": f"shortwave {__version__} (shortwave.fields.scene_products)",
        "radar_frequency_hz": f,
        "radar_band": band or "none",
        "polarization": pol,
        "backscatter_model": model,
        "spectrum_model": spectrum_model,
        "min_wind_speed_m_s": mw,
        "cells_total": scan.cells,
        "cells_missing": scan.missing,
        "cells_calm": scan.calm,
        "inputs": "; ".join(f"{k}: {v}" for k, v in scene.names.items()),
        "references": ("Elfouhaily et al. 1997 JGR 102(C7) 15781 (spectrum); Valenzuela 1978 "
                       "and Kudryavtsev et al. 2003 JGR 108(C3) 8054 (two-scale NRCS); "
                       "Meissner and Wentz 2004 (permittivity); Alpers and Huehnerfuss 1989 "
                       "JGR 94(C5) 6251 (film damping and slick contrast)"),
    })
    if film is not None:
        from .slick import CAUTION
        attrs.update({
            "film": film.name,
            "film_parameters": _film_text(film),
            "film_source": film.source,
            "film_cover": cover,
            "contrast_model": contrast_model,
            "cells_film": (scan.film_cells if cover == "mask"
                           else scan.cells - scan.missing - scan.calm),
            "comment": CAUTION,
        })
    out.attrs = attrs
    for name in out.coords:
        if name in out.dims or not np.issubdtype(out[name].dtype, np.floating):
            out[name].encoding["_FillValue"] = None
    return out


def _film_text(film):
    from .films import OilLayer
    if isinstance(film, OilLayer):
        fields = ("thickness", "viscosity", "density", "surface_tension",
                  "interfacial_tension")
        units = ("m", "Pa s", "kg m-3", "N m-1", "N m-1")
    else:
        fields = ("elasticity", "relaxation_frequency", "dilational_viscosity",
                  "film_pressure")
        units = ("N m-1", "rad s-1", "N s m-1", "N m-1")
    return ", ".join(f"{f} {getattr(film, f):g} {u}" for f, u in zip(fields, units))


def scene_summary(products):
    """Short dict of what a products dataset holds (cell counts, ranges), for reports.

    Computes only small reductions (min / max of a few variables).

    Examples
    --------
    >>> from shortwave.scene_synthetic import greyhaven_scene
    >>> out = scene_products(open_scene(greyhaven_scene((6, 8))), 5.405e9)
    >>> scene_summary(out)["cells_missing"]
    14
    """
    out = {k: products.attrs.get(k) for k in ("cells_total", "cells_missing", "cells_calm",
                                              "cells_film") if k in products.attrs}
    for name in ("sigma0_db", "slick_contrast_db", "bragg_wavelength"):
        if name in products:
            da = products[name]
            out[f"{name}.min"] = float(da.min())
            out[f"{name}.max"] = float(da.max())
    return out


def process_scene(source, output, *, frequency_hz, polarization="VV", film=None,
                  cover="auto", contrast_model="two-scale", model="two-scale",
                  spectrum_model="elfouhaily1997", min_wind_speed=0.5, overrides=None,
                  chunks=None, swath=None, across_dim=None, look_azimuth=None,
                  temperature_c=None, salinity=None, overwrite=False, compute=True,
                  command=None):
    """Read a scene file, compute its products and write them to a NetCDF file.

    Parameters
    ----------
    source : str or xarray.Dataset
        Input NetCDF file (or dataset).
    output : str
        Output NetCDF file; never one of the inputs; replaced only with ``overwrite``.
    compute : bool or callable
        ``True`` computes during the write; a callable receives the delayed write (dask)
        and must compute it (e.g. under a progress display or on a cluster).
    command : str, optional
        Text for the ``history`` line.
    Other parameters
        As in :func:`open_scene` and :func:`scene_products`.

    Returns
    -------
    (str, xarray.Dataset, ScanResult)
        The path written, the (lazy) products, and the input counts.

    Examples
    --------
    >>> import os, tempfile
    >>> from shortwave.scene_synthetic import greyhaven_scene
    >>> folder = tempfile.mkdtemp()
    >>> src = os.path.join(folder, "scene.nc")
    >>> greyhaven_scene((6, 8)).to_netcdf(src)
    >>> path, out, scan = process_scene(src, os.path.join(folder, "out.nc"),
    ...                                 frequency_hz=5.405e9, film="natural")
    >>> out.sigma0.attrs["standard_name"]
    'surface_backwards_scattering_coefficient_of_radar_wave'
    """
    scene = open_scene(source, overrides=overrides, chunks=chunks, swath=swath,
                       across_dim=across_dim, look_azimuth=look_azimuth,
                       temperature_c=temperature_c, salinity=salinity)
    inputs = [scene.path] if scene.path else []
    _check_output(output, inputs, overwrite)
    scan = scan_scene(scene, min_wind_speed)
    products = scene_products(scene, frequency_hz, polarization, film, cover=cover,
                              contrast_model=contrast_model, model=model,
                              spectrum_model=spectrum_model, min_wind_speed=min_wind_speed,
                              scan=scan)
    path = ncio.write_netcdf(products, output, inputs=inputs, overwrite=overwrite,
                             command=command, compute=compute,
                             encoding=_chunk_encoding(products))
    return path, products, scan


def _chunk_encoding(ds):
    """NetCDF chunk sizes equal to the dask chunks of each lazy variable.

    Each dask chunk then fills whole compressed HDF5 chunks, so writing it needs no
    read-modify-write of chunks shared with other tasks (much faster under
    dask.distributed, and less memory).
    """
    enc = {}
    for name, var in ds.data_vars.items():
        if var.ndim and _is_dask(var.data):
            enc[name] = {"chunksizes": tuple(int(c[0]) for c in var.chunks)}
    return enc


def start_local_cluster(n_workers, threads_per_worker=1):
    """Start a local ``dask.distributed`` cluster suited to scene work; return (client, cluster).

    Worker processes are started without the ``MALLOC_TRIM_THRESHOLD_`` environment
    variable that ``distributed`` sets by default: with it, glibc returns every freed
    block to the system at once, and this NumPy-heavy per-cell code runs 2 to 3 times
    slower (measured with :file:`benchmarks/bench_scene.py`).

    Parameters
    ----------
    n_workers : int
        Worker processes, >= 1.
    threads_per_worker : int
        Threads per worker.

    Returns
    -------
    (dask.distributed.Client, dask.distributed.LocalCluster)
        Close both when done.

    Examples
    --------
    >>> client, cluster = start_local_cluster(2)        # doctest: +SKIP
    >>> client.close(); cluster.close()                  # doctest: +SKIP
    """
    import logging

    import dask.config
    from dask.distributed import Client, LocalCluster
    n = int(n_workers)
    if n < 1:
        raise ShortwaveInputError(f"n_workers: need at least 1 worker, got {n_workers}")
    env = dict(dask.config.get("distributed.nanny.pre-spawn-environ", {}) or {})
    env.pop("MALLOC_TRIM_THRESHOLD_", None)
    with dask.config.set({"distributed.nanny.pre-spawn-environ": env}):
        cluster = LocalCluster(n_workers=n, threads_per_worker=int(threads_per_worker),
                               processes=True, dashboard_address=":0",
                               silence_logs=logging.ERROR)
    return Client(cluster), cluster


def _check_output(output, inputs, overwrite):
    """Refuse a bad output early, before any computation (:func:`shortwave.ncio.check_output`)."""
    ncio.check_output(output, inputs, overwrite)
