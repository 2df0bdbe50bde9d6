"""NetCDF in and out: open and validate inputs, write CF-1.10 outputs atomically.

Writing rules: the output goes to a temporary file beside the target and is renamed over
it only when complete (an interrupted write leaves no partial file); an output path that
is one of the inputs is refused; an existing output is replaced only with
``overwrite=True``; ``Conventions`` is set and a line is appended to ``history``.
"""
from __future__ import annotations

import datetime as _dt
import os
import sys
import tempfile

from .metadata import CONVENTIONS

__all__ = ["write_netcdf", "same_file", "history_line"]


def same_file(a, b):
    """True when paths ``a`` and ``b`` name the same file (resolving links)."""
    try:
        if os.path.exists(a) and os.path.exists(b):
            return os.path.samefile(a, b)
    except OSError:
        pass
    return os.path.realpath(a) == os.path.realpath(b)


def history_line(command=None):
    """One ``history`` line: UTC time stamp, then the command (default: this process's argv)."""
    now = _dt.datetime.now(_dt.timezone.utc).strftime("%Y-%m-%dT%H:%M:%SZ")
    if command is None:
        command = " ".join(["shortwave"] + sys.argv[1:]) if sys.argv else "shortwave"
    return f"{now}: {command}"


def write_netcdf(ds, path, *, inputs=(), overwrite=False, command=None, encoding=None,
                 compute=True):
    """Write an xarray Dataset to NetCDF-4 atomically, with CF global attributes.

    Parameters
    ----------
    ds : xarray.Dataset
        What to write.  Its ``history`` attribute (if any, e.g. copied from an input) is
        kept and a new line is appended.
    path : str or os.PathLike
        Target file.
    inputs : sequence of path
        Files the data came from: writing over any of them is refused.
    overwrite : bool
        Replace an existing ``path``; otherwise an existing file is an error.
    command : str, optional
        Text for the ``history`` line (default: the command line).
    encoding : dict, optional
        Per-variable encoding passed to ``to_netcdf``; float variables get zlib compression
        by default.
    compute : bool or callable
        ``True`` writes now.  A callable receives the delayed write (dask) and must compute
        it (used to show progress), e.g. ``lambda d: d.compute()``.

    Returns
    -------
    str
        The path written.

    Raises
    ------
    ValueError
        Output equal to an input, or existing output without ``overwrite``.
    OSError
        Folder missing or not writable.
    """
    path = os.fspath(path)
    for src in inputs:
        if src is not None and same_file(path, os.fspath(src)):
            raise ValueError(f"output {path} is the input file; choose another output path")
    if os.path.exists(path) and not overwrite:
        raise ValueError(f"output {path} exists; pass overwrite (--overwrite) to replace it")
    folder = os.path.dirname(os.path.abspath(path))
    if not os.path.isdir(folder):
        raise OSError(f"output folder {folder} does not exist")
    if not os.access(folder, os.W_OK):
        raise OSError(f"output folder {folder} is not writable")
    out = ds.copy(deep=False)
    out.attrs = dict(ds.attrs)
    out.attrs["Conventions"] = CONVENTIONS
    old = out.attrs.get("history", "")
    line = history_line(command)
    out.attrs["history"] = f"{old}\n{line}" if old else line
    enc = {}
    for name, var in out.data_vars.items():
        if var.dtype.kind == "f":
            enc[name] = {"zlib": True, "complevel": 4}
    for name, e in (encoding or {}).items():
        enc[name] = {**enc.get(name, {}), **e}
    fd, tmp = tempfile.mkstemp(prefix=".tmp-" + os.path.basename(path) + "-", suffix=".nc",
                               dir=folder)
    os.close(fd)
    try:
        if callable(compute):
            delayed = out.to_netcdf(tmp, engine="netcdf4", format="NETCDF4", encoding=enc,
                                    compute=False)
            compute(delayed)
        else:
            out.to_netcdf(tmp, engine="netcdf4", format="NETCDF4", encoding=enc)
        os.replace(tmp, path)
    finally:
        if os.path.exists(tmp):
            os.remove(tmp)
    return path
