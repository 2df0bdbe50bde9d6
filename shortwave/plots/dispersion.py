"""Figures of capillary-gravity dispersion: phase and group speed against wavelength."""
from __future__ import annotations

import numpy as np

from . import new_figure, plain_log_labels, save_figure

__all__ = ["speed_curves"]


def speed_curves(water, path, *, depth=np.inf, wavelength_range=(1e-3, 10.0), marks=None,
                 title=None):
    """Write a PNG of phase and group speed against wavelength, with the minimum marked.

    Parameters
    ----------
    water : shortwave.water.Water or Liquid
        The liquid (density, surface tension).
    path : str or path-like
        PNG file to write (folders are created; written atomically).
    depth : float
        Water depth [m]; ``np.inf`` for deep water.
    wavelength_range : (float, float)
        Smallest and largest wavelength on the logarithmic axis [m].
    marks : array-like, optional
        Wavelengths [m] to mark on the phase-speed curve (e.g. the rows of a table).
    title : str, optional
        Figure title; a description of the water by default.

    Returns
    -------
    str
        The path written.

    Notes
    -----
    The curves come from :func:`shortwave.dispersion.phase_speed` and
    :func:`shortwave.dispersion.group_speed`; the marked minimum is the deep-water
    :func:`shortwave.dispersion.minimum_phase_speed`, where both curves cross.

    Examples
    --------
    >>> import os, tempfile
    >>> from shortwave.water import Water
    >>> path = speed_curves(Water(20.0, 0.0), os.path.join(tempfile.mkdtemp(), "c.png"))
    >>> os.path.getsize(path) > 0
    True
    """
    from .. import dispersion

    lo, hi = (float(v) for v in wavelength_range)
    if not (0 < lo < hi and np.isfinite(hi)):
        raise ValueError(f"wavelength_range: need 0 < low < high, got {wavelength_range}")
    lam = np.geomspace(lo, hi, 500)
    k = 2.0 * np.pi / lam
    c = np.asarray(dispersion.phase_speed(k, water, depth))
    cg = np.asarray(dispersion.group_speed(k, water, depth))
    c_min, k_min = dispersion.minimum_phase_speed(water)
    lam_min = 2.0 * np.pi / float(k_min)

    fig, ax = new_figure(figsize=(7.0, 4.5))
    ax.plot(lam, c, color="tab:blue", lw=2.0, label="phase speed")
    ax.plot(lam, cg, color="tab:orange", lw=1.5, ls="--", label="group speed")
    if lo <= lam_min <= hi:
        ax.plot([lam_min], [float(c_min)], marker="o", ms=7, color="black", ls="none",
                label=f"minimum {float(c_min) * 100:.1f} cm/s at {lam_min * 100:.2f} cm"
                      " (deep water)")
        ax.axvline(lam_min, color="0.6", lw=0.8, ls=":")
    if marks is not None:
        m = np.atleast_1d(np.asarray(marks, dtype=float))
        m = m[np.isfinite(m) & (m >= lo) & (m <= hi)]
        if m.size:
            cm = np.asarray(dispersion.phase_speed(2.0 * np.pi / m, water, depth))
            ax.plot(m, cm, marker="s", ms=5, color="tab:blue", mfc="white", ls="none",
                    label="table rows")
    ax.set_xscale("log")
    ax.set_yscale("log")
    plain_log_labels(ax.xaxis, minor=False)
    plain_log_labels(ax.yaxis)
    ax.set_xlabel("wavelength [m]")
    ax.set_ylabel("speed [m/s]")
    if title is None:
        t = getattr(water, "temperature_c", None)
        s = getattr(water, "salinity", None)
        title = "Capillary-gravity waves"
        if t is not None and s is not None and np.ndim(t) == 0 and np.ndim(s) == 0:
            title += f": {float(t):g} degC, {float(s):g} g/kg"
        title += ", deep water" if np.isinf(depth) else f", depth {depth:g} m"
    ax.set_title(title, fontsize=10)
    ax.grid(True, which="major", alpha=0.4)
    ax.grid(True, which="minor", alpha=0.15)
    ax.legend(fontsize=8, loc="upper center")
    return save_figure(fig, path)
