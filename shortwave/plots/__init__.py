"""Figures for every user-facing result, one module per topic.

Only this package imports matplotlib (with the non-interactive ``Agg`` backend), so the
physics core stays free of plotting.  Every function takes data already computed by the
core, draws one figure and writes it to a PNG path atomically (:func:`save_figure`).
"""
from __future__ import annotations

import os
import tempfile


def new_figure(*args, **kwargs):
    """Return ``(fig, ax)`` from a non-interactive matplotlib figure."""
    import matplotlib
    matplotlib.use("Agg", force=True)
    import matplotlib.pyplot as plt
    return plt.subplots(*args, **kwargs)


def save_figure(fig, path, dpi=120):
    """Write ``fig`` to ``path`` (PNG) atomically, close it and return the path."""
    import matplotlib.pyplot as plt
    path = os.fspath(path)
    folder = os.path.dirname(os.path.abspath(path))
    os.makedirs(folder, exist_ok=True)
    fd, tmp = tempfile.mkstemp(prefix=".tmp-", suffix=".png", dir=folder)
    os.close(fd)
    try:
        fig.savefig(tmp, dpi=dpi, bbox_inches="tight", format="png")
        mask = os.umask(0o022)
        os.umask(mask)
        os.chmod(tmp, 0o666 & ~mask)  # mkstemp makes 0600; give the usual permissions
        os.replace(tmp, path)
    finally:
        plt.close(fig)
        if os.path.exists(tmp):
            os.remove(tmp)
    return path


def minor_label(value, _pos):
    """Label the 2 and 5 minor ticks of a logarithmic axis, leave the others blank.

    Examples
    --------
    >>> minor_label(0.02, None), minor_label(300.0, None), minor_label(0.0, None)
    ('0.02', '', '')
    """
    import numpy as np
    if value <= 0:
        return ""
    mantissa = value / 10.0 ** np.floor(np.log10(value))
    return f"{value:g}" if round(mantissa) in (2, 5) else ""


def plain_log_labels(axis, *, minor=True):
    """Plain numbers (``0.01``, not ``10^-2``) on a logarithmic ``ax.xaxis``/``ax.yaxis``;
    with ``minor`` the 2 and 5 minor ticks are labelled too (:func:`minor_label`).

    Examples
    --------
    >>> fig, ax = new_figure()
    >>> ax.set_yscale("log")
    >>> plain_log_labels(ax.yaxis)
    >>> ax.yaxis.get_major_formatter()(0.01, 0)
    '0.01'
    >>> import matplotlib.pyplot as plt; plt.close(fig)
    """
    from matplotlib.ticker import FuncFormatter
    axis.set_major_formatter(FuncFormatter(lambda v, _pos: f"{v:g}"))
    if minor:
        axis.set_minor_formatter(FuncFormatter(minor_label))


def wavelength_axis(ax, *, label="wavelength [m]", factor=1.0, floor=1e-30):
    """Add a top axis giving the wavelength ``factor * 2 pi / k`` of a wavenumber x axis.

    ``factor`` converts metres to the unit of ``label`` (100 for cm); wavenumbers below
    ``floor`` [rad m-1] are clipped to it.  Returns the secondary axis.

    Examples
    --------
    >>> fig, ax = new_figure()
    >>> top = wavelength_axis(ax, label="wavelength [cm]", factor=100)
    >>> top.get_xlabel()
    'wavelength [cm]'
    >>> import matplotlib.pyplot as plt; plt.close(fig)
    """
    import numpy as np

    def convert(x):        # k [rad/m] -> wavelength, and back (the same map)
        return 2 * np.pi / np.maximum(x, floor) * factor
    top = ax.secondary_xaxis("top", functions=(convert, convert))
    top.set_xlabel(label)
    return top
