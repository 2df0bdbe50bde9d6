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
