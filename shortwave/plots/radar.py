"""Figures for radar results: Bragg scales against incidence, sigma0 against incidence."""
from __future__ import annotations

import numpy as np

from . import new_figure, plain_log_labels, save_figure

__all__ = ["bragg_scales_plot", "backscatter_plot"]


def bragg_scales_plot(radars, path, *, water=None, depth=np.inf, marks=None, title=None):
    """Write a PNG of Bragg wavelength (left) and Bragg frequency (right) against incidence.

    Parameters
    ----------
    radars : list of (str, float)
        Labels and radar frequencies [Hz].
    path : str or path-like
        PNG to write (atomically).
    water : Water, optional
        Water for the dispersion relation (Bragg frequency).
    depth : float
        Water depth [m].
    marks : dict, optional
        A ``bragg`` table (columns ``radar``, ``incidence``, ``bragg_wavelength``) whose
        rows are marked on the curves.
    title : str, optional

    Returns
    -------
    str
        The path written.
    """
    from ..radar import bragg_wave
    fig, (ax1, ax2) = new_figure(1, 2, figsize=(10, 4.2))
    th = np.linspace(5.0, 90.0, 171)
    for label, f in radars:
        w = bragg_wave(f, th, water=water, depth=depth)
        line, = ax1.semilogy(th, w.wavelength, label=f"{label} ({_flabel(f)})")
        ax2.semilogy(th, w.frequency, color=line.get_color())
        if marks is not None:
            sel = [i for i, r in enumerate(marks["radar"]) if r == label]
            ax1.plot([marks["incidence"][i] for i in sel],
                     [marks["bragg_wavelength"][i] for i in sel], "o",
                     color=line.get_color(), ms=4)
    ax1.set_xlabel("incidence angle [deg]")
    ax1.set_ylabel("Bragg wavelength [m]")
    ax2.set_xlabel("incidence angle [deg]")
    ax2.set_ylabel("Bragg wave frequency [Hz]")
    for ax in (ax1, ax2):
        ax.grid(True, which="both", alpha=0.3)
        ax.set_xlim(0, 90)
        plain_log_labels(ax.yaxis)
    ax1.legend(fontsize=8)
    fig.tight_layout(rect=(0, 0, 1, 0.94))
    fig.suptitle(title or "Bragg-resonant ocean waves: wavelength lambda/(2 sin theta) and "
                 "frequency (capillary-gravity dispersion)", fontsize=10)
    return save_figure(fig, path)


def _flabel(f):
    return f"{f / 1e9:g} GHz" if f >= 1e9 else f"{f / 1e6:g} MHz"


def backscatter_plot(table, path, *, title=None):
    """Write a PNG of sigma0 [dB] against incidence from a ``backscatter`` table.

    One curve per (wind speed, azimuth, polarisation); colour = wind, line style =
    polarisation (VV solid, HH dashed, HV dotted), marker = azimuth when several.

    Parameters
    ----------
    table : dict
        Columns ``wind_speed``, ``azimuth``, ``polarization``, ``incidence``,
        ``sigma0_db`` (as built by :func:`shortwave.commands.backscatter.backscatter_table`).
    path : str or path-like
        PNG to write (atomically).
    title : str, optional

    Returns
    -------
    str
        The path written.
    """
    fig, ax = new_figure(figsize=(7.5, 5))
    wind = np.asarray(table["wind_speed"], dtype=float)
    az = np.asarray(table["azimuth"], dtype=float)
    pol = np.asarray(table["polarization"])
    th = np.asarray(table["incidence"], dtype=float)
    db = np.asarray(table["sigma0_db"], dtype=float)
    winds = sorted(set(wind.tolist()))
    azimuths = sorted(set(az.tolist()))
    styles = {"VV": "-", "HH": "--", "HV": ":"}
    markers = ["", "o", "s", "^", "v", "d"]
    colors = [f"C{i}" for i in range(10)]
    for iw, u in enumerate(winds):
        for ia, a in enumerate(azimuths):
            for p in styles:
                sel = (wind == u) & (az == a) & (pol == p)
                if not np.any(sel):
                    continue
                order = np.argsort(th[sel])
                label = f"{u:g} m/s {p}" + (f", az {a:g} deg" if len(azimuths) > 1 else "")
                ax.plot(th[sel][order], db[sel][order], styles[p],
                        marker=markers[ia % len(markers)] if len(azimuths) > 1 else "",
                        ms=3, color=colors[iw % len(colors)], label=label)
    ax.set_xlabel("incidence angle [deg]")
    ax.set_ylabel("sigma0 [dB]")
    ax.grid(True, alpha=0.3)
    ax.legend(fontsize=7, ncol=2)
    ax.set_title(title or "sea-surface backscatter", fontsize=9)
    return save_figure(fig, path)
