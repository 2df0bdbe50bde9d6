"""The demonstration run: every job of shortwave on the invented Greyhaven Sound scenario.

:func:`run_demo` builds the invented coastal scene from code (no downloads, see
:mod:`shortwave.scene_synthetic`), runs each job on it and writes NetCDF files, CSV tables
and PNG figures into one folder.  It returns the list of files written with a one-line
description of each; it prints nothing (the ``shortwave demo`` command does).
"""
from __future__ import annotations

import os
from dataclasses import dataclass

import numpy as np

from . import dispersion
from .tables import format_table
from .water import Water

__all__ = ["Product", "run_demo", "GREYHAVEN_WATER", "demo_steps"]

GREYHAVEN_WATER = dict(temperature_c=12.0, salinity=33.0)
"""Surface water of the invented Greyhaven Sound: 12 degC, 33 g/kg."""


@dataclass(frozen=True)
class Product:
    """One file written by the demo."""

    path: str
    what: str


def _write_text(text, path):
    import tempfile
    folder = os.path.dirname(os.path.abspath(path))
    fd, tmp = tempfile.mkstemp(prefix=".tmp-", suffix=".txt", dir=folder)
    try:
        with os.fdopen(fd, "w", encoding="utf-8", newline="") as fh:
            fh.write(text if text.endswith("\n") else text + "\n")
        os.replace(tmp, path)
    finally:
        if os.path.exists(tmp):
            os.remove(tmp)
    return path


# --------------------------------------------------------------------------------------
# steps: each takes (folder, small) and returns a list of Product
# --------------------------------------------------------------------------------------

def step_dispersion(folder, small=False):
    """Dispersion of capillary-gravity waves in Greyhaven water: CSV table and figure."""
    water = Water(**GREYHAVEN_WATER)
    lam = np.geomspace(1e-3, 1.0, 13 if small else 31)       # wavelength [m]
    k = 2 * np.pi / lam
    omega = np.asarray(dispersion.angular_frequency(k, water))
    c = np.asarray(dispersion.phase_speed(k, water))
    cg = np.asarray(dispersion.group_speed(k, water))
    gamma = np.asarray(dispersion.viscous_damping_rate(k, water))
    cols = {"wavelength": lam, "wavenumber": k, "frequency": omega / (2 * np.pi),
            "phase_speed": c, "group_speed": cg, "viscous_damping_rate": gamma}
    units = {"wavelength": "m", "wavenumber": "rad m-1", "frequency": "Hz",
             "phase_speed": "m s-1", "group_speed": "m s-1", "viscous_damping_rate": "s-1"}
    out = []
    p = os.path.join(folder, "dispersion.csv")
    _write_text(format_table(cols, fmt="csv", units=units), p)
    out.append(Product(p, "dispersion of ripples in Greyhaven water (12 degC, 33 g/kg): "
                          "frequency, phase and group speed, viscous damping"))
    p = os.path.join(folder, "dispersion.png")
    _dispersion_figure(water, p)
    out.append(Product(p, "phase and group speed against wavelength, with the "
                          "phase-speed minimum"))
    return out


def _dispersion_figure(water, path):
    try:
        from .plots import dispersion as dplot
    except ImportError:
        dplot = None
    if dplot is not None and hasattr(dplot, "speeds_figure"):
        return dplot.speeds_figure(water=water, path=path)
    from .plots.maps import speeds_figure
    return speeds_figure(water, path)


STEPS = (("dispersion", step_dispersion),)


def demo_steps():
    """Names of the demo steps, in the order they run."""
    return [name for name, _ in STEPS]


def run_demo(folder="shortwave-demo", *, small=False, on_step=None):
    """Run every demo step and write its files into ``folder``.

    Parameters
    ----------
    folder : str
        Output folder; created if missing.  Files from an earlier demo run are replaced.
    small : bool
        Smaller grids and fewer points (for tests and quick looks).
    on_step : callable, optional
        ``on_step(name, products)`` is called after each step (the command prints there).

    Returns
    -------
    list of Product
        Every file written, with a one-line description.
    """
    folder = os.fspath(folder)
    if os.path.exists(folder) and not os.path.isdir(folder):
        raise OSError(f"output folder {folder} is a file, not a folder")
    os.makedirs(folder, exist_ok=True)
    if not os.access(folder, os.W_OK):
        raise OSError(f"output folder {folder} is not writable")
    products = []
    for name, step in STEPS:
        made = step(folder, small)
        products.extend(made)
        if on_step is not None:
            on_step(name, made)
    return products
