"""Figure of the curvature spectrum B(k) from the spectral peak to the capillary range."""
from __future__ import annotations

import numpy as np

from . import new_figure, save_figure, wavelength_axis

__all__ = ["curvature_figure"]


def curvature_figure(k, curves, path, *, marks=(), title=None, k_range=None):
    """Write a PNG of curvature spectra B(k) on logarithmic axes.

    Parameters
    ----------
    k : array-like
        Wavenumbers [rad m-1], 1-D increasing.
    curves : sequence of (label, B) pairs
        Curvature spectra [1] on ``k`` (one line each).
    path : str or path-like
        PNG file (written atomically).
    marks : sequence of (label, k_mark) pairs
        Wavenumbers [rad m-1] to mark with a vertical line (e.g. Bragg wavenumbers of
        radar bands); marks outside the plotted range are skipped.
    title : str, optional
        Figure title.
    k_range : (float, float), optional
        Horizontal range [rad m-1]; default the extent of ``k``.

    Returns
    -------
    str
        The path written.
    """
    k = np.asarray(k, dtype=float)
    lo, hi = (float(k[0]), float(k[-1])) if k_range is None else map(float, k_range)
    fig, ax = new_figure(figsize=(7.5, 4.8))
    ymax = 0.0
    for label, b in curves:
        b = np.asarray(b, dtype=float)
        ax.loglog(k, np.where(b > 0, b, np.nan), lw=1.6, label=label)
        if np.any(np.isfinite(b)):
            ymax = max(ymax, float(np.nanmax(b)))
    ymin = ymax * 1e-4 if ymax > 0 else 1e-6
    ax.set_xlim(lo, hi)
    ax.set_ylim(ymin, ymax * 3 if ymax > 0 else 1.0)
    for i, (label, km) in enumerate(marks):
        if lo <= km <= hi:
            ax.axvline(km, color="0.45", lw=0.9, ls=":")
            ax.text(km, ymin * (1.6 + 1.4 * (i % 3)), f" {label}", rotation=90, va="bottom",
                    ha="right", fontsize=8, color="0.25")
    ax.set_xlabel("wavenumber k [rad/m]")
    ax.set_ylabel("curvature spectrum B(k) = k³ S(k)")
    ax.grid(True, which="major", alpha=0.3)
    wavelength_axis(ax)
    if len(curves) > 1 or curves and curves[0][0]:
        ax.legend(fontsize=8, loc="upper left")
    if title:
        ax.set_title(title, fontsize=10)
    return save_figure(fig, path)
