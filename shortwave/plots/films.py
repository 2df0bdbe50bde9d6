"""Figures of film damping: the damping ratio y(k) with the radar Bragg wavenumbers marked."""
from __future__ import annotations

import numpy as np

from . import new_figure, save_figure, wavelength_axis

__all__ = ["damping_ratio_figure"]


def damping_ratio_figure(k, ratio, path, *, bragg_marks=None, highlight=None, title=None,
                         series_label="y(k)", extra=None):
    """Write a PNG of the damping ratio against wavenumber, Bragg wavenumbers marked.

    Parameters
    ----------
    k : array-like
        Wavenumbers [rad m-1], increasing.
    ratio : array-like
        Damping ratio y(k) [1] at ``k`` (NaN points are left out).
    path : str or path-like
        PNG file to write (written atomically).
    bragg_marks : dict of str to float, optional
        Label -> Bragg wavenumber [rad m-1], drawn as vertical lines (e.g. the common
        radar bands at one incidence).
    highlight : dict of str to float, optional
        Label -> Bragg wavenumber [rad m-1] drawn stronger (the radar asked for).
    title : str, optional
    series_label : str
        Legend label of the main curve.
    extra : dict of str to array-like, optional
        Further curves ``label -> y`` on the same ``k`` (e.g. the spatial form).

    Returns
    -------
    str
        The path written.

    Examples
    --------
    >>> import os, tempfile
    >>> k = np.geomspace(5, 2000, 50)
    >>> p = damping_ratio_figure(k, 1 + k / 100, os.path.join(tempfile.mkdtemp(), "y.png"),
    ...                          bragg_marks={"C 30": 113.3})
    >>> os.path.getsize(p) > 0
    True
    """
    k = np.asarray(k, dtype=float)
    y = np.asarray(ratio, dtype=float)
    fig, ax = new_figure(figsize=(7.0, 4.2))
    ax.plot(k, y, color="tab:blue", lw=2, label=series_label)
    for lab, yy in (extra or {}).items():
        ax.plot(k, np.asarray(yy, float), lw=1.2, ls="--", label=lab)
    ymax = np.nanmax(y) if np.any(np.isfinite(y)) else 2.0
    for marks, style in ((bragg_marks or {}, dict(color="0.55", lw=0.9, ls=":")),
                         (highlight or {}, dict(color="tab:red", lw=1.6, ls="-"))):
        for lab, kb in marks.items():
            if not (np.isfinite(kb) and k.min() <= kb <= k.max()):
                continue
            ax.axvline(kb, **style)
            ax.text(kb, 0.98, f"{lab} ", rotation=90, va="top", ha="right", fontsize=8,
                    color=style["color"], transform=ax.get_xaxis_transform())
    ax.axhline(1.0, color="0.3", lw=0.8)
    ax.set_xscale("log")
    ax.set_xlabel("wavenumber k [rad/m]")
    ax.set_ylabel("damping ratio y = film / clean")
    ax.set_ylim(0.0, ymax * 1.45)
    ax.grid(True, which="both", alpha=0.25)
    ax.legend(loc="center left", fontsize=8)
    wavelength_axis(ax, label="wavelength [cm]", factor=100, floor=1e-9)
    if title:
        ax.set_title(title, fontsize=9, pad=28)
    return save_figure(fig, path)
