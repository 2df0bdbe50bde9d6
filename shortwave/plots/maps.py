"""Maps of gridded scene fields and the figures of the demonstration run.

Every function takes values already computed by the core or by :mod:`shortwave.fields`,
draws one figure and writes it as PNG through :func:`shortwave.plots.save_figure`.
"""
from __future__ import annotations

import numpy as np

from . import new_figure, save_figure

__all__ = ["field_map", "scene_panels", "scene_overview", "units_label"]


def _coords(da):
    """Return (x, y, xlabel, ylabel) for a 2-D DataArray (last dim along x)."""
    ydim, xdim = da.dims[-2], da.dims[-1]

    def label(dim):
        c = da.coords.get(dim)
        if c is None:
            return np.arange(da.sizes[dim]), dim
        u = c.attrs.get("units", "")
        name = c.attrs.get("long_name", dim)
        return np.asarray(c.values), f"{name} [{u}]" if u else name
    x, xl = label(xdim)
    y, yl = label(ydim)
    return x, y, xl, yl


def units_label(units):
    """Units for people: the UDUNITS decibel ``0.1 lg(re 1)`` shows as ``dB``.

    Examples
    --------
    >>> units_label("0.1 lg(re 1)"), units_label("m s-1")
    ('dB', 'm s-1')
    """
    u = str(units or "").strip()
    return "dB" if u.replace(" ", "") in ("0.1lg(re1)", "lg(re1)/10") else u


def _draw(ax, da, *, cmap="viridis", vmin=None, vmax=None, title=None, land=None,
          arrows=None):
    """Draw one map panel on ``ax``: field, land, labels, colour bar and ``arrows``."""
    x, y, xl, yl = _coords(da)
    vals = np.ma.masked_invalid(np.asarray(da.values, dtype=float))
    mesh = ax.pcolormesh(x, y, vals, cmap=cmap, vmin=vmin, vmax=vmax, shading="auto")
    if land is not None:
        ax.contourf(x, y, np.asarray(land, dtype=float), levels=[0.5, 1.5],
                    colors=["#c9b99a"])
    ax.set_xlabel(xl)
    ax.set_ylabel(yl)
    ax.set_aspect("equal")
    units = units_label(da.attrs.get("units", ""))
    name = str(title or da.attrs.get("long_name") or da.name or "")
    ax.set_title(name if len(name) < 60 else name[:57] + "...", fontsize=9)
    cb = ax.figure.colorbar(mesh, ax=ax, shrink=0.85)
    cb.set_label(f"[{units}]" if units else "")
    if arrows is not None:
        _quiver(ax, da, *arrows)
    return mesh


def field_map(da, path, *, cmap="viridis", vmin=None, vmax=None, title=None, land=None,
              arrows=None):
    """Map of one 2-D field (NaN cells left blank, land shaded).

    Parameters
    ----------
    da : xarray.DataArray
        Two-dimensional field; its ``long_name`` and ``units`` label the map.
    path : str
        PNG file to write.
    cmap, vmin, vmax : optional
        Colour map and limits.
    title : str, optional
        Overrides the ``long_name``.
    land : array of bool, optional
        Cells to shade as land.
    arrows : (u, v) pair of 2-D arrays, optional
        Vectors drawn on a thinned grid (e.g. the wind).

    Returns
    -------
    str
        The path written.

    Examples
    --------
    >>> import os, tempfile
    >>> import xarray as xr
    >>> da = xr.DataArray(np.arange(12.0).reshape(3, 4), dims=("y", "x"), name="v",
    ...                   attrs={"units": "m s-1", "long_name": "wind speed"})
    >>> os.path.basename(field_map(da, os.path.join(tempfile.mkdtemp(), "v.png")))
    'v.png'
    """
    if da.ndim != 2:
        raise ValueError(f"field_map: {da.name} has {da.ndim} dimensions, need 2")
    fig, ax = new_figure(figsize=(6.4, 5.0))
    _draw(ax, da, cmap=cmap, vmin=vmin, vmax=vmax, title=title, land=land, arrows=arrows)
    return save_figure(fig, path)


def _quiver(ax, da, u, v):
    x, y, _, _ = _coords(da)
    u = np.asarray(u, dtype=float)
    v = np.asarray(v, dtype=float)
    sy = max(1, len(y) // 12)
    sx = max(1, len(x) // 12)
    xx, yy = np.meshgrid(x[::sx], y[::sy])
    ax.quiver(xx, yy, u[::sy, ::sx], v[::sy, ::sx], color="k", alpha=0.6, width=0.003)


def scene_panels(fields, path, *, land=None, suptitle=None, ncols=2):
    """Several maps side by side.

    Parameters
    ----------
    fields : list of (xarray.DataArray, dict)
        Each field with keyword options of :func:`field_map` (``cmap``, ``vmin``, ``vmax``,
        ``title``, ``arrows``).
    path : str
        PNG file to write.
    land : array of bool, optional
        Cells shaded as land on every panel.
    suptitle : str, optional
        Title above the panels.

    Returns
    -------
    str
        The path written.

    Examples
    --------
    >>> import os, tempfile
    >>> import xarray as xr
    >>> da = xr.DataArray(np.ones((3, 4)), dims=("y", "x"), attrs={"units": "1"})
    >>> path = scene_panels([(da, {}), (2 * da, {"cmap": "gray"})],
    ...                     os.path.join(tempfile.mkdtemp(), "p.png"))
    >>> path.endswith("p.png")
    True
    """
    n = len(fields)
    nrows = int(np.ceil(n / ncols))
    fig, axes = new_figure(nrows, ncols, figsize=(5.6 * ncols, 4.6 * nrows), squeeze=False)
    for ax, (da, opts) in zip(axes.ravel(), fields):
        _draw(ax, da, land=land, **opts)
    for ax in axes.ravel()[n:]:
        ax.set_visible(False)
    if suptitle:
        fig.suptitle(suptitle)
    fig.tight_layout()
    return save_figure(fig, path)


def scene_overview(products, path, *, title=None):
    """Maps of a scene's products: wind, NRCS, Bragg wavelength and slick contrast.

    Parameters
    ----------
    products : xarray.Dataset
        Output of :func:`shortwave.fields.scene_products` (2-D fields; for more
        dimensions the first index of the leading ones is shown).
    path : str
        PNG file to write.
    title : str, optional
        Title above the panels (default: the dataset's ``title``).

    Returns
    -------
    str
        The path written.

    Examples
    --------
    >>> import os, tempfile
    >>> from shortwave import fields
    >>> from shortwave.scene_synthetic import greyhaven_scene
    >>> out = fields.scene_products(fields.open_scene(greyhaven_scene((6, 8))), 5.405e9)
    >>> scene_overview(out, os.path.join(tempfile.mkdtemp(), "o.png")).endswith("o.png")
    True
    """
    def two_d(da):
        while da.ndim > 2:
            da = da.isel({da.dims[0]: 0})
        return da

    land = None
    if "wind_speed" in products:
        land = ~np.isfinite(np.asarray(two_d(products["wind_speed"]).values, dtype=float))
    panels = []
    if "wind_speed" in products:
        panels.append((two_d(products["wind_speed"]), {"cmap": "viridis",
                                                       "title": "wind speed U10"}))
    if "sigma0_db" in products:
        panels.append((two_d(products["sigma0_db"]), {"cmap": "gray",
                                                      "title": "NRCS, clean sea [dB]"}))
    if "sigma0_slick_db" in products:
        s = two_d(products["sigma0_db"])
        lo, hi = np.nanpercentile(np.asarray(s.values, dtype=float), [1, 99]) \
            if np.isfinite(s.values).any() else (None, None)
        panels.append((two_d(products["sigma0_slick_db"]),
                       {"cmap": "gray", "vmin": lo, "vmax": hi,
                        "title": "NRCS with the film [dB]"}))
    if "slick_contrast_db" in products:
        panels.append((two_d(products["slick_contrast_db"]),
                       {"cmap": "magma", "title": "slick contrast [dB] (screening estimate)"}))
    elif "bragg_wavelength" in products:
        b = two_d(products["bragg_wavelength"]) * 100.0
        b.attrs = {"units": "cm", "long_name": "Bragg wavelength"}
        panels.append((b, {"cmap": "cividis", "title": "Bragg wavelength [cm]"}))
    if not panels:
        raise ValueError("scene_overview: the dataset has none of the scene products")
    return scene_panels(panels, path, land=land,
                        suptitle=title or products.attrs.get("title"),
                        ncols=2 if len(panels) > 1 else 1)
