"""Figure of a wave-model spectrum extended with its capillary-gravity tail."""
from __future__ import annotations

import numpy as np

from . import new_figure, save_figure, wavelength_axis

__all__ = ["tail_figure"]


def tail_figure(parts, path, *, title=None):
    """Write a PNG of the curvature spectrum B(k) of one extended spectrum.

    Parameters
    ----------
    parts : dict
        From :func:`shortwave.tail.spectrum_parts`: ``wavenumber`` [rad m-1], curvature
        spectra ``extended``, ``resolved``, ``tail``, ``model`` [1], the frequency nodes
        ``node_wavenumber``/``node_curvature``, ``seam_wavenumber`` [rad m-1],
        ``transition_ratio``, moments and ``label``.
    path : str or path-like
        PNG file (written atomically).
    title : str, optional
        Figure title (default: the selection label).

    Returns
    -------
    str
        The path written.

    Notes
    -----
    Log-log B(k) = k^3 S(k): the wave-model part (converted cell by cell, and point by
    point at the frequency nodes), the tail, their sum, and the pure tail model for
    comparison.  The seam k_s and the transition band [k_s, R k_s] are shaded; the top
    axis gives the wavelength 2 pi / k.

    Examples
    --------
    >>> import os, tempfile
    >>> from shortwave.synthetic import greyhaven_spectra
    >>> from shortwave.tail import spectrum_parts
    >>> p = spectrum_parts(greyhaven_spectra(1))
    >>> out = tail_figure(p, os.path.join(tempfile.mkdtemp(), "tail.png"))
    >>> os.path.getsize(out) > 0
    True
    """
    k = np.asarray(parts["wavenumber"], dtype=float)
    ks = float(parts["seam_wavenumber"])
    ratio = float(parts["transition_ratio"])
    fig, ax = new_figure(figsize=(10.5, 5.0))
    bounds = parts.get("wavenumber_bounds")
    if bounds is not None:       # the cell holding the seam is shared: show it in the sum
        below = np.asarray(bounds)[:, 1] <= ks * (1 + 1e-12)
        above = np.asarray(bounds)[:, 0] >= ks * (1 - 1e-12)
    else:
        below = k <= ks
        above = k >= ks

    def pos(y):
        y = np.asarray(y, dtype=float)
        return np.where(y > 0, y, np.nan)

    ax.axvspan(ks, ratio * ks, color="0.88", zorder=0,
               label=f"transition band [k_s, {ratio:g} k_s]")
    ax.axvline(ks, color="0.45", lw=1.0, ls=":", zorder=1)
    ax.plot(k, pos(parts["model"]), color="0.55", lw=1.2, ls="--",
            label=f"model alone ({parts.get('model_name', 'model')})")
    ax.plot(k, pos(np.where(below, parts["resolved"], np.nan)), color="tab:blue", lw=1.6,
            zorder=3, label="wave-model part (per wavenumber cell)")
    ax.plot(parts["node_wavenumber"], pos(parts["node_curvature"]), "o", ms=3.0,
            color="tab:blue", alpha=0.7, label="wave-model part at its frequencies")
    ax.plot(k, pos(np.where(above, parts["tail"], np.nan)), color="tab:orange", lw=1.6,
            zorder=3, label="tail")
    ax.plot(k, pos(parts["extended"]), color="k", lw=4.5, alpha=0.25, zorder=2,
            label="extended spectrum (sum)")
    ax.set_xscale("log")
    ax.set_yscale("log")
    ymax = np.nanmax(pos(parts["extended"]))
    ax.set_ylim(ymax * 1e-4, ymax * 3.0)
    ax.set_xlim(k[0], k[-1])
    ax.set_xlabel("wavenumber k [rad/m]")
    ax.set_ylabel("curvature spectrum B(k) = k³ S(k)")
    wavelength_axis(ax)
    text = (f"U10 = {parts['wind_speed']:.1f} m/s\n"
            f"Hs = {parts['hs']:.2f} m (wave model {parts['hs_resolved']:.2f} m)\n"
            f"mss: wave model {parts['mss_resolved']:.4f} + tail {parts['mss_tail']:.4f}"
            f" = {parts['mss']:.4f}\n"
            f"along / across wind: {parts['mss_upwind']:.4f} / {parts['mss_crosswind']:.4f}\n"
            f"seam k_s = {ks:.3g} rad/m")
    ax.text(1.02, 0.0, text, transform=ax.transAxes, fontsize=8.5, va="bottom",
            bbox={"facecolor": "white", "alpha": 0.85, "edgecolor": "0.7"})
    ax.legend(loc="upper left", bbox_to_anchor=(1.02, 1.0), fontsize=8, framealpha=0.9)
    ax.set_title(title or f"Extended spectrum: {parts['label']}", fontsize=10)
    ax.grid(True, which="major", alpha=0.3)
    return save_figure(fig, path)
