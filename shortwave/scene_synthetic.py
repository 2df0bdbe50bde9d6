"""The invented coastal scene "Greyhaven Sound", built from code (nothing is downloaded).

Greyhaven Sound is an imaginary bay open to the east and south.  Land lies along the
western and northern edges; the headland Corrow Head reaches out from the western shore
into the bay.  A west-north-westerly wind blows across it, so a low-wind zone forms in the
lee of Corrow Head.  A radar flies north along the western edge and looks east: the
incidence angle grows across the swath, from 20 degrees at the near edge to 45 degrees at
the far edge (flat-earth geometry).  The Mistle slick, an invented film patch, drifts in
open water south-east of the headland.  Sea-surface temperature and salinity vary gently
(a fresher, cooler plume at the head of the bay).

Every number here is invented for demonstration; the scene looks plausible, it is not a
measurement.  Coordinates are distances in kilometres from the scene's south-west corner.
"""
from __future__ import annotations

import numpy as np

__all__ = ["greyhaven_scene", "swath_incidence", "SCENE_NAME", "SIZES"]

SCENE_NAME = "Greyhaven Sound"

SIZES = {"full": (120, 160), "small": (36, 48)}
"""Grid sizes (ny, nx) of the scene: full and small."""

EXTENT_KM = (30.0, 40.0)
"""North-south and west-east extent of the scene [km]."""

WIND_FROM_DEG = 285.0
"""Direction the open-water wind blows from [degree clockwise from north]."""

WIND_SPEED = 9.0
"""Open-water wind speed [m s-1] (U10)."""

ORIGIN = (48.85, -31.60)
"""Latitude and longitude [degree] of the scene's south-west corner: an invented place in
open water, shared with the invented wave-model stations of :mod:`shortwave.synthetic`."""

SENSOR_AZIMUTH_DEG = 270.0
"""Direction from each cell to the radar [degree clockwise from north]: the radar is west
and looks east (look azimuth 90 degrees)."""


def swath_incidence(n_across, near_deg=20.0, far_deg=45.0):
    """Incidence angle across a swath on a flat earth, ground range evenly spaced.

    With the platform at height H, a cell at ground range r is seen at incidence
    atan(r / H).  Ground ranges are evenly spaced between the ranges of the near and far
    edges, so the angle grows a little faster near the near edge.

    Parameters
    ----------
    n_across : int
        Number of cells across the swath, >= 2.
    near_deg, far_deg : float
        Incidence at the first and last cell [degree], each in [0, 89].

    Returns
    -------
    numpy.ndarray
        Incidence angle of each cell across the swath [degree].

    Examples
    --------
    >>> [round(float(a), 1) for a in swath_incidence(3, 20.0, 45.0)]
    [20.0, 34.3, 45.0]
    """
    from ._checks import ShortwaveInputError, check_range
    if int(n_across) < 2:
        raise ShortwaveInputError(f"n_across: need at least 2 cells, got {n_across}")
    near = float(check_range("near_deg", near_deg, 0.0, 89.0, allow_nan=False, unit="degree"))
    far = float(check_range("far_deg", far_deg, 0.0, 89.0, allow_nan=False, unit="degree"))
    r = np.linspace(np.tan(np.deg2rad(near)), np.tan(np.deg2rad(far)), int(n_across))
    return np.rad2deg(np.arctan(r))  # r in units of the platform height


def _land(x, y):
    """Land mask: western and northern shores and the headland Corrow Head."""
    west = x < 3.0 + 0.8 * np.sin(y / 3.1) + 0.5 * np.cos(y / 1.7)
    north = y > 27.0 + 0.7 * np.sin(x / 2.9) - 0.05 * x
    # Corrow Head: a rounded promontory from the west shore, its tip at about (13 km, 17 km)
    head = ((x - 5.0) / 8.0) ** 2 + ((y - 17.0 + 0.1 * (x - 5.0)) / 2.4) ** 2 < 1.0
    return west | north | head


def _wind(x, y, land):
    """Wind speed [m s-1] and from-direction [degree], sheltered behind Corrow Head."""
    to_rad = np.deg2rad(WIND_FROM_DEG + 180.0)            # direction the wind blows to
    ex, ey = np.sin(to_rad), np.cos(to_rad)                # unit vector, east / north
    cx, cy = 9.0, 16.6                                     # body of the headland
    dx, dy = x - cx, y - cy
    along = dx * ex + dy * ey                              # downwind distance
    cross = dx * ey - dy * ex                              # to the right of the wind
    # the lee widens downwind; it holds for about 5 km, then fades over about 12 km
    width = 2.2 + 0.2 * np.clip(along, 0, None)
    lee = np.exp(-np.clip(along - 5.0, 0, None) / 12.0) * np.exp(-(cross / width) ** 2)
    lee = lee * np.clip((along + 4.0) / 3.0, 0.0, 1.0)
    # weaker wind close to the western shore (short fetch), gentle large-scale gradient
    fetch = 1.0 - 0.35 * np.exp(-np.clip(x - 3.0, 0, None) / 3.0)
    gradient = 1.0 + 0.08 * (y - 15.0) / 15.0 + 0.04 * np.sin(x / 6.0)
    speed = WIND_SPEED * fetch * gradient * (1.0 - 0.82 * lee)
    # the flow turns a little around the headland
    direction = (WIND_FROM_DEG + 10.0 * lee * np.tanh(cross / 2.0)) % 360.0
    speed = np.where(land, np.nan, speed)
    direction = np.where(land, np.nan, direction)
    return speed, direction


def _slick(x, y, land):
    """The Mistle slick: film mask and film thickness [m] of an elongated patch."""
    to_rad = np.deg2rad(WIND_FROM_DEG + 180.0 + 20.0)     # drifts right of the wind
    ex, ey = np.sin(to_rad), np.cos(to_rad)
    cx, cy = 26.0, 7.5
    a = (x - cx) * ex + (y - cy) * ey                      # along the drift
    c = (x - cx) * ey - (y - cy) * ex
    # a tapering plume with a ragged edge
    r2 = (a / 6.0) ** 2 + (c / (1.1 + 0.12 * a)) ** 2
    edge = 1.0 + 0.15 * np.sin(3.0 * a) * np.cos(2.0 * c)
    inside = (r2 < edge) & ~land
    # thin sheen (0.3 um) at the edge, a thick core (about 200 um) near the source
    thickness = np.where(inside, 0.3e-6 * (200e-6 / 0.3e-6) ** (np.exp(-2.5 * r2)
                                                               * (a < 1.5)), 0.0)  # [m]
    return inside, thickness


def greyhaven_scene(size="full", *, wind_form="components"):
    """Input dataset of the Greyhaven Sound scene, with CF attributes.

    Parameters
    ----------
    size : {"full", "small"} or (ny, nx)
        Grid size: ``"full"`` is 120 x 160 cells of 250 m, ``"small"`` 36 x 48.
    wind_form : {"components", "speed"}
        Store the wind as ``eastward_wind``/``northward_wind`` or as
        ``wind_speed``/``wind_from_direction``.

    Returns
    -------
    xarray.Dataset
        Variables: the wind (see ``wind_form``) [m s-1, degree], ``incidence_angle``
        [degree], ``sensor_azimuth_angle`` [degree], ``sea_surface_temperature`` [K],
        ``sea_surface_salinity`` [1e-3], ``slick_mask`` (1 inside the Mistle slick),
        ``film_thickness`` [m] and ``land_binary_mask``.  Land cells are NaN in every
        ocean field.  Coordinates ``y``, ``x`` [km] and 2-D ``latitude``, ``longitude``
        [degree] (local flat-earth conversion from :data:`ORIGIN`).

    Examples
    --------
    >>> ds = greyhaven_scene("small")
    >>> dict(ds.sizes)
    {'y': 36, 'x': 48}
    >>> float(ds.incidence_angle.min()), float(ds.incidence_angle.max())
    (20.0, 45.0)
    """
    import xarray as xr
    if isinstance(size, str):
        if size not in SIZES:
            raise ValueError(f"size: unknown {size!r}; choose one of {', '.join(SIZES)} "
                             "or give (ny, nx)")
        ny, nx = SIZES[size]
    else:
        ny, nx = (int(v) for v in size)
    if wind_form not in ("components", "speed"):
        raise ValueError(f"wind_form: unknown {wind_form!r}; choose components or speed")
    ly, lx = EXTENT_KM
    y = (np.arange(ny) + 0.5) * ly / ny
    x = (np.arange(nx) + 0.5) * lx / nx
    xx, yy = np.meshgrid(x, y)
    land = _land(xx, yy)
    speed, wdir = _wind(xx, yy, land)
    inc = np.broadcast_to(swath_incidence(nx, 20.0, 45.0), (ny, nx)).copy()
    sensor_az = np.full((ny, nx), SENSOR_AZIMUTH_DEG)
    sst = 285.6 + 0.9 * (15.0 - yy) / 15.0 + 0.3 * np.tanh((xx - 20.0) / 6.0)
    sss = 33.2 - 2.5 * np.exp(-((xx - 8.0) ** 2 + (yy - 25.0) ** 2) / 30.0)
    plume = np.exp(-((xx - 8.0) ** 2 + (yy - 25.0) ** 2) / 30.0)
    sst = sst - 1.2 * plume
    mask, thick = _slick(xx, yy, land)
    ocean = ~land
    sst = np.where(ocean, sst, np.nan)
    sss = np.where(ocean, sss, np.nan)
    inc_attrs = {"standard_name": "angle_of_incidence", "units": "degree",
                 "long_name": "radar incidence angle from the vertical"}
    coords = {
        "y": ("y", y, {"long_name": "distance north of the scene origin", "units": "km"}),
        "x": ("x", x, {"long_name": "distance east of the scene origin", "units": "km"}),
    }
    data = {}
    if wind_form == "components":
        to = np.deg2rad(wdir + 180.0)
        data["eastward_wind"] = (("y", "x"), speed * np.sin(to),
                                 {"standard_name": "eastward_wind", "units": "m s-1",
                                  "long_name": "eastward wind at 10 m"})
        data["northward_wind"] = (("y", "x"), speed * np.cos(to),
                                  {"standard_name": "northward_wind", "units": "m s-1",
                                   "long_name": "northward wind at 10 m"})
    else:
        data["wind_speed"] = (("y", "x"), speed,
                              {"standard_name": "wind_speed", "units": "m s-1",
                               "long_name": "wind speed at 10 m"})
        data["wind_from_direction"] = (("y", "x"), wdir,
                                       {"standard_name": "wind_from_direction",
                                        "units": "degree", "long_name": "wind from direction"})
    data.update({
        "incidence_angle": (("y", "x"), inc, inc_attrs),
        "sensor_azimuth_angle": (("y", "x"), sensor_az,
                                 {"standard_name": "sensor_azimuth_angle", "units": "degree",
                                  "long_name": "direction from the cell to the radar, "
                                               "clockwise from north"}),
        "sea_surface_temperature": (("y", "x"), sst,
                                    {"standard_name": "sea_surface_temperature",
                                     "units": "K", "long_name": "sea surface temperature"}),
        "sea_surface_salinity": (("y", "x"), sss,
                                 {"standard_name": "sea_surface_salinity", "units": "1e-3",
                                  "long_name": "sea surface salinity"}),
        "slick_mask": (("y", "x"), mask.astype(np.int8),
                       {"long_name": "surface film present (the Mistle slick)",
                        "flag_values": np.array([0, 1], dtype=np.int8),
                        "flag_meanings": "clean film", "units": "1"}),
        "film_thickness": (("y", "x"), np.where(land, np.nan, thick),
                           {"long_name": "thickness of the surface film", "units": "m"}),
        "land_binary_mask": (("y", "x"), land.astype(np.int8),
                             {"standard_name": "land_binary_mask", "units": "1",
                              "long_name": "land (1) or sea (0)"}),
    })
    lat0, lon0 = ORIGIN
    km_per_deg_lat = 111.2                                  # spherical earth, R = 6371 km
    lat = lat0 + yy / km_per_deg_lat
    lon = lon0 + xx / (km_per_deg_lat * np.cos(np.deg2rad(lat0)))
    coords["latitude"] = (("y", "x"), lat, {"standard_name": "latitude",
                                            "units": "degrees_north", "long_name": "latitude"})
    coords["longitude"] = (("y", "x"), lon, {"standard_name": "longitude",
                                             "units": "degrees_east",
                                             "long_name": "longitude"})
    ds = xr.Dataset(data, coords=coords)
    ds.attrs = {
        "title": f"{SCENE_NAME}: invented coastal radar scene",
        "institution": "none (invented demonstration data)",
        "source": "shortwave.scene_synthetic.greyhaven_scene: synthetic fields built "
                  "from code",
        "comment": "Invented place and fields for demonstration; not a measurement. "
                   "Corrow Head shelters a low-wind zone; the Mistle slick is an "
                   "invented film patch.  The radar is west of the scene and looks east.",
        "Conventions": "CF-1.10",
    }
    for name in ds.coords:
        ds[name].encoding["_FillValue"] = None     # CF: no fill value on coordinates
    return ds
