"""NetCDF in and out: open and validate inputs, find variables, convert units, write outputs.

Reading
-------
:func:`open_input` opens a NetCDF file (classic, 64-bit offset, CDF-5 or NetCDF-4/HDF5)
with CF decoding (``scale_factor``/``add_offset`` unpacking, ``_FillValue`` and
``missing_value`` masked to NaN), optionally in dask chunks, and turns the usual failures
(missing, empty, not NetCDF, truncated or damaged file) into one-line errors that name the
file.

:func:`find_variable` finds the variable playing a *role* (the wave spectrum, the wind
speed, the frequency axis, ...).  Each role in the module-level table :data:`ROLES` lists
the CF ``standard_name`` values that identify it, common variable names, and the units it
must be convertible to.  Lookup order: an explicit override ``ROLE=NAME`` (always wins: it
is how a user settles a failed or ambiguous lookup), then ``standard_name``, then the
common names.  Other modules add roles by adding entries to :data:`ROLES` (or with
:func:`register_role`).

:func:`convert_units` converts a DataArray to the units of its role (speed, angle,
temperature, length, frequency, spectral densities per degree or per radian and per Hz),
refusing units it does not know or that do not match, naming the variable and the unit
found.  :func:`read_role` does both steps.

Writing
-------
:func:`write_netcdf`: the output goes to a temporary file beside the target and is renamed
over it only when complete (an interrupted write leaves no partial file); an output path
that is one of the inputs is refused; an existing output is replaced only with
``overwrite=True``; ``Conventions`` is set and a line is appended to ``history``.
"""
from __future__ import annotations

import datetime as _dt
import math
import os
import re
import struct
import sys
import tempfile
from typing import NamedTuple

from .metadata import CONVENTIONS

__all__ = ["write_netcdf", "check_output", "same_file", "history_line", "open_input", "Role", "ROLES",
           "register_role", "find_variable", "convert_units", "read_role",
           "parse_overrides", "parse_chunks", "UNITS", "parse_units", "units_equivalent"]


# =========================================================================================
# Writing
# =========================================================================================

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


def _umask():
    mask = os.umask(0o022)
    os.umask(mask)
    return mask


def check_output(path, inputs=(), overwrite=False):
    """Refuse a bad output path, before any work is done; return its folder.

    Parameters
    ----------
    path : str or os.PathLike
        The output file.
    inputs : sequence of path
        Files the data come from: the output may not be any of them.
    overwrite : bool
        Whether an existing output may be replaced.

    Raises
    ------
    ValueError
        Output equal to an input, or existing output without ``overwrite``.
    OSError
        Output is a folder; its folder is missing or not writable (a real probe, so
        read-only mounts are caught too).
    """
    import tempfile as _tempfile
    path = os.fspath(path)
    for src in inputs:
        if src is not None and same_file(path, os.fspath(src)):
            raise ValueError(f"output {path} is the input file {os.fspath(src)}; choose "
                             "another output path")
    if os.path.isdir(path):
        raise OSError(f"output {path} is a folder; give a file name")
    if os.path.exists(path) and not overwrite:
        raise ValueError(f"output {path} exists; pass --overwrite to replace it")
    folder = os.path.dirname(os.path.abspath(path))
    if not os.path.isdir(folder):
        raise OSError(f"output folder {folder} does not exist")
    if not os.access(folder, os.W_OK):
        raise OSError(f"output folder {folder} is not writable")
    try:
        with _tempfile.TemporaryFile(dir=folder):
            pass
    except OSError as exc:
        raise OSError(f"output folder {folder} is not writable ({exc.strerror})") from None
    return folder


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
        it (used to show progress), e.g. ``lambda d: d.compute()``; when nothing in ``ds``
        is a dask array the write is eager and the callable is not used (no dask needed).

    Returns
    -------
    str
        The path written (permissions 0666 less the umask, like any new file).

    Raises
    ------
    ValueError
        Output equal to an input, or existing output without ``overwrite``.
    OSError
        Folder missing or not writable.
    """
    path = os.fspath(path)
    folder = check_output(path, inputs, overwrite)
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
    for name in out.coords:
        # CF 2.5.1: coordinate variables carry no missing values, so no _FillValue
        enc[name] = {"_FillValue": None}
    for name, e in (encoding or {}).items():
        enc[name] = {**enc.get(name, {}), **e}
    fd, tmp = tempfile.mkstemp(prefix=".tmp-" + os.path.basename(path) + "-", suffix=".nc",
                               dir=folder)
    os.close(fd)
    try:
        os.chmod(tmp, 0o666 & ~_umask())   # mkstemp makes 0600; give the usual permissions
        if callable(compute) and _has_dask_arrays(out):
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


def _has_dask_arrays(ds):
    """True when any variable of ``ds`` is backed by a dask array (lazy)."""
    return any(type(v.data).__module__.startswith("dask") for v in ds.variables.values())


# =========================================================================================
# Opening
# =========================================================================================

_HDF5_MAGIC = b"\x89HDF\r\n\x1a\n"
_CLASSIC_MAGIC = (b"CDF\x01", b"CDF\x02", b"CDF\x05")


def _is_url(path):
    return bool(re.match(r"^[a-zA-Z][a-zA-Z0-9+.-]*://", path))


def _classic_expected_size(fh, version):
    """Minimum size [bytes] a classic-format NetCDF file must have, from its header.

    Follows the NetCDF classic format specification (CDF-1, CDF-2 64-bit offset, CDF-5):
    the header lists every variable's shape, type and start offset ``begin``, so the data
    end is max(begin + size) (record variables: over all records).  Returns None when the
    header cannot be parsed (the NetCDF library then reports the problem).
    """
    big = version == 5           # CDF-5: 8-byte counts and sizes
    off64 = version in (2, 5)    # 8-byte offsets
    type_size = {1: 1, 2: 1, 3: 2, 4: 4, 5: 4, 6: 8, 7: 1, 8: 2, 9: 4, 10: 8, 11: 8}

    def read(n):
        b = fh.read(n)
        if len(b) != n:
            raise EOFError
        return b

    def nonneg():
        return struct.unpack(">Q", read(8))[0] if big else struct.unpack(">I", read(4))[0]

    def tag():
        return struct.unpack(">I", read(4))[0]

    def name():
        n = nonneg()
        read(n + (-n % 4))

    def attrs():
        t = tag()
        n = nonneg()
        if t == 0 and n == 0:
            return
        for _ in range(n):
            name()
            typ = tag()
            cnt = nonneg()
            sz = cnt * type_size.get(typ, 1)
            read(sz + (-sz % 4))

    try:
        numrecs = nonneg()
        t = tag()
        ndims = nonneg()
        dims = []
        if not (t == 0 and ndims == 0):
            for _ in range(ndims):
                name()
                dims.append(nonneg())
        attrs()
        t = tag()
        nvars = nonneg()
        ends = []
        rec = []           # (begin, one-record size) of record variables
        for _ in range(nvars if not (t == 0 and nvars == 0) else 0):
            name()
            nd = nonneg()
            ids = [nonneg() for _ in range(nd)]
            attrs()
            typ = tag()
            nonneg()                                     # vsize (redundant)
            begin = struct.unpack(">Q", read(8))[0] if off64 else struct.unpack(">I", read(4))[0]
            shape = [dims[i] for i in ids]
            size = type_size.get(typ, 1)
            if shape and shape[0] == 0:                  # record variable
                for s in shape[1:]:
                    size *= s
                rec.append((begin, size))
            else:
                for s in shape:
                    size *= s
                ends.append(begin + size)
    except (EOFError, struct.error, IndexError):
        return None
    streaming = numrecs in (0xFFFFFFFF, 0xFFFFFFFFFFFFFFFF)
    if rec and numrecs > 0 and not streaming:
        recsize = sum(s + (-s % 4) for _, s in rec) if len(rec) > 1 else rec[0][1]
        for begin, size in rec:
            ends.append(begin + (numrecs - 1) * recsize + size)
    return max(ends) if ends else 0


def open_input(path, chunks=None, *, decode_times=True):
    """Open a NetCDF file as an :class:`xarray.Dataset`, with clear errors.

    Parameters
    ----------
    path : str or os.PathLike
        Local NetCDF file (NetCDF-3 classic/64-bit/CDF-5 or NetCDF-4) or an OPeNDAP URL.
    chunks : dict or str, optional
        Passed to :func:`xarray.open_dataset` to read lazily in dask chunks (e.g.
        ``{"time": 100}`` or ``"auto"``); needs dask.
    decode_times : bool
        Decode CF time coordinates.

    Returns
    -------
    xarray.Dataset
        Lazily loaded; packed variables unpacked and fill values masked to NaN (CF
        decoding).

    Raises
    ------
    OSError
        The file does not exist or is a folder.
    ValueError
        The file is empty, is not NetCDF, is truncated or damaged, or ``chunks`` is asked
        without dask installed.  Every message names the file.

    Examples
    --------
    >>> open_input("/no/such/file.nc")
    Traceback (most recent call last):
    ...
    FileNotFoundError: input file /no/such/file.nc does not exist
    """
    import xarray as xr

    path = os.fspath(path)
    if chunks is not None:
        try:
            import dask  # noqa: F401
        except ImportError:
            raise ValueError(f"reading {path} in chunks needs dask, which is not installed "
                             "(pip install 'shortwave[dask]')") from None
    if not _is_url(path):
        if not os.path.exists(path):
            raise FileNotFoundError(f"input file {path} does not exist")
        if os.path.isdir(path):
            raise IsADirectoryError(f"input {path} is a folder, not a NetCDF file")
        size = os.path.getsize(path)
        if size == 0:
            raise ValueError(f"input file {path} is empty (0 bytes)")
        with open(path, "rb") as fh:
            head = fh.read(8)
            kind = None
            if head[:4] in _CLASSIC_MAGIC:
                kind = "classic"
            elif head == _HDF5_MAGIC:
                kind = "hdf5"
            else:     # HDF5 allows a user block: signature at 512, 1024, 2048, ...
                pos = 512
                while pos < min(size, 1 << 20):
                    fh.seek(pos)
                    if fh.read(8) == _HDF5_MAGIC:
                        kind = "hdf5"
                        break
                    pos *= 2
            if kind is None:
                shown = head.decode("ascii", "replace").strip() or repr(head)
                raise ValueError(f"input file {path} is not a NetCDF file (it starts with "
                                 f"{shown[:16]!r})")
            if kind == "classic":
                fh.seek(4)
                need = _classic_expected_size(fh, head[3])
                if need is None:
                    raise ValueError(f"input file {path} is a damaged or truncated NetCDF "
                                     "file (its header cannot be read)")
                if size < need:
                    raise ValueError(f"input file {path} is truncated: {size} bytes, its "
                                     f"header needs at least {need}")
    try:
        ds = xr.open_dataset(path, engine="netcdf4", chunks=chunks, mask_and_scale=True,
                             decode_times=decode_times)
    except (OSError, RuntimeError, ValueError, IndexError, KeyError) as exc:
        msg = str(exc).strip().splitlines()[0] if str(exc).strip() else type(exc).__name__
        if "HDF error" in msg or "truncat" in msg.lower():
            raise ValueError(f"input file {path} is damaged or truncated ({msg})") from None
        raise ValueError(f"cannot read NetCDF file {path}: {msg}") from None
    return ds


# =========================================================================================
# Units
# =========================================================================================

# Base "dimensions": length m, time s, plane angle rad (kept as a dimension so that a
# per-radian density is never silently read as a per-degree one), temperature K.
_PI = math.pi
UNITS = {
    # symbol: (factor to SI, {dimension: power})
    "m": (1.0, {"m": 1}), "meter": (1.0, {"m": 1}), "meters": (1.0, {"m": 1}),
    "metre": (1.0, {"m": 1}), "metres": (1.0, {"m": 1}),
    "km": (1e3, {"m": 1}), "cm": (1e-2, {"m": 1}), "mm": (1e-3, {"m": 1}),
    "um": (1e-6, {"m": 1}), "micrometre": (1e-6, {"m": 1}), "micrometer": (1e-6, {"m": 1}),
    "s": (1.0, {"s": 1}), "sec": (1.0, {"s": 1}), "second": (1.0, {"s": 1}),
    "seconds": (1.0, {"s": 1}), "min": (60.0, {"s": 1}), "minute": (60.0, {"s": 1}),
    "minutes": (60.0, {"s": 1}), "h": (3600.0, {"s": 1}), "hr": (3600.0, {"s": 1}),
    "hour": (3600.0, {"s": 1}), "hours": (3600.0, {"s": 1}),
    "Hz": (1.0, {"s": -1}), "hz": (1.0, {"s": -1}), "hertz": (1.0, {"s": -1}),
    "rad": (1.0, {"rad": 1}), "radian": (1.0, {"rad": 1}), "radians": (1.0, {"rad": 1}),
    "degree": (_PI / 180, {"rad": 1}), "degrees": (_PI / 180, {"rad": 1}),
    "deg": (_PI / 180, {"rad": 1}), "degree_true": (_PI / 180, {"rad": 1}),
    "degrees_true": (_PI / 180, {"rad": 1}), "\u00b0": (_PI / 180, {"rad": 1}),
    "knot": (1852.0 / 3600.0, {"m": 1, "s": -1}), "knots": (1852.0 / 3600.0, {"m": 1, "s": -1}),
    "kt": (1852.0 / 3600.0, {"m": 1, "s": -1}), "kts": (1852.0 / 3600.0, {"m": 1, "s": -1}),
    "kn": (1852.0 / 3600.0, {"m": 1, "s": -1}),
    "kph": (1000.0 / 3600.0, {"m": 1, "s": -1}), "kmh": (1000.0 / 3600.0, {"m": 1, "s": -1}),
    "1": (1.0, {}),
}
"""Unit symbols known to :func:`parse_units`: symbol -> (factor to SI, dimensions).

1 knot = 1852 m / 3600 s (international nautical mile, common practice); 1 degree =
pi/180 rad.  Extend this dict to teach the reader new symbols.
"""

# Temperatures are affine, so they are handled apart: symbol -> offset to kelvin.
_TEMPERATURE = {"K": 0.0, "kelvin": 0.0, "Kelvin": 0.0, "degK": 0.0, "deg_K": 0.0,
                "degC": 273.15, "deg_C": 273.15, "celsius": 273.15, "Celsius": 273.15,
                "degree_Celsius": 273.15, "degrees_Celsius": 273.15, "degree_C": 273.15,
                "degrees_C": 273.15, "degreesC": 273.15, "\u00b0C": 273.15}

_TOKEN = re.compile(r"^([A-Za-z_\u00b0]+)\^?([+-]?\d+)?$")
_NUMBER = re.compile(r"^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$")


def parse_units(text):
    """Parse a UDUNITS-style unit string.

    Parameters
    ----------
    text : str
        E.g. ``"m s-1"``, ``"m/s"``, ``"knots"``, ``"m2 s rad-1"``, ``"m^2/Hz/deg"``,
        ``"m**2 s degree-1"``, ``"degC"``.  Products by spaces, ``*`` or ``.``; ``/``
        divides by the factor that follows; exponents as ``m2``, ``m^2``, ``m**2``;
        plain numbers are scale factors.

    Returns
    -------
    (factor, dims, offset)
        Value in SI = value * factor + offset; ``dims`` maps ``"m"``, ``"s"``, ``"rad"``,
        ``"K"`` to integer powers.

    Raises
    ------
    ValueError
        An unknown or malformed unit (the message names it).

    Examples
    --------
    >>> f, d, o = parse_units("m2 s deg-1")
    >>> round(f, 4), d
    (57.2958, {'m': 2, 's': 1, 'rad': -1})
    """
    s = str(text).strip()
    if s in _TEMPERATURE:
        return 1.0, {"K": 1}, _TEMPERATURE[s]
    if s == "":
        raise ValueError("empty unit string")
    s = s.replace("**", "^").replace("\u00b7", " ").replace("*", " ")
    s = re.sub(r"(?<=[A-Za-z0-9])\.(?=[A-Za-z])", " ", s)   # "m.s-1" -> "m s-1"
    s = s.replace("/", " / ")
    factor, dims = 1.0, {}
    negate = False
    for tok in s.split():
        if tok == "/":
            if negate:
                raise ValueError(f"malformed unit {text!r}")
            negate = True
            continue
        sign = -1 if negate else 1
        negate = False
        if _NUMBER.match(tok):
            factor *= float(tok) ** sign
            continue
        m = _TOKEN.match(tok)
        if not m or m.group(1) not in UNITS:
            raise ValueError(f"unknown unit {tok!r} in {text!r}")
        f, d = UNITS[m.group(1)]
        p = sign * (int(m.group(2)) if m.group(2) else 1)
        factor *= f ** p
        for key, val in d.items():
            dims[key] = dims.get(key, 0) + val * p
    if negate:
        raise ValueError(f"malformed unit {text!r}")
    return factor, {k: v for k, v in dims.items() if v}, 0.0


def units_equivalent(a, b):
    """True when unit strings ``a`` and ``b`` parse to the same quantity and scale.

    Examples
    --------
    >>> units_equivalent("m/s", "m s-1"), units_equivalent("m s-1", "knots")
    (True, False)
    """
    try:
        fa, da, oa = parse_units(a)
        fb, db, ob = parse_units(b)
    except ValueError:
        return False
    return da == db and math.isclose(fa, fb, rel_tol=1e-12) and oa == ob


def _dims_text(dims):
    if not dims:
        return "dimensionless"
    return " ".join(f"{k}{v if v != 1 else ''}" for k, v in dims.items())


def convert_units(da, target, name=None):
    """Return ``da`` converted to the unit ``target``, with ``units`` set to it.

    Parameters
    ----------
    da : xarray.DataArray
        Data with a ``units`` attribute (lazy dask data stay lazy).
    target : str
        Wanted unit, e.g. ``"m s-1"``, ``"degree"``, ``"K"``, ``"m2 s rad-1"``, ``"s-1"``.
    name : str, optional
        Variable name for error messages (default ``da.name``).

    Returns
    -------
    xarray.DataArray
        Converted values; other attributes kept.  No copy when nothing changes.

    Raises
    ------
    ValueError
        No ``units`` attribute, an unknown unit, or a unit of another kind (e.g. a
        per-degree density to a frequency spectrum without direction), naming the
        variable, the unit found and the unit expected.

    Notes
    -----
    Speeds: m s-1, m/s, knots (1852/3600 m s-1), km/h.  Angles: degree(s), rad(ian).
    Temperatures: K, degC, celsius (T[K] = T[degC] + 273.15).  Spectral densities: any
    product of m, s or Hz, and rad or degree, e.g. m2 s deg-1 -> m2 s rad-1 multiplies by
    180/pi = 57.2958 (reference note spectra.md Sect. 4.3).

    Examples
    --------
    >>> import xarray as xr
    >>> u = xr.DataArray([10.0], attrs={"units": "knots"}, name="wind")
    >>> round(float(convert_units(u, "m s-1")[0]), 4)
    5.1444
    """
    name = name if name is not None else (da.name if da.name is not None else "variable")
    found = da.attrs.get("units")
    if found is None or str(found).strip() == "":
        raise ValueError(f"variable {name!r} has no units attribute; expected units "
                         f"convertible to {target!r}")
    try:
        fs, ds_, os_ = parse_units(found)
    except ValueError as exc:
        raise ValueError(f"variable {name!r}: cannot read its units {found!r} ({exc}); "
                         f"expected units convertible to {target!r}") from None
    try:
        ft, dt, ot = parse_units(target)
    except ValueError as exc:
        raise ValueError(f"convert_units: bad target unit {target!r} ({exc})") from None
    if ds_ != dt:
        raise ValueError(f"variable {name!r} has units {found!r} ({_dims_text(ds_)}), which "
                         f"cannot be converted to {target!r} ({_dims_text(dt)})")
    scale = fs / ft
    shift = (os_ - ot) / ft
    attrs = dict(da.attrs)
    attrs["units"] = target
    if scale == 1.0 and shift == 0.0:
        out = da.copy(deep=False)
    else:
        out = da * scale + shift if shift else da * scale
    out.attrs = attrs
    out.name = da.name
    return out


# =========================================================================================
# Roles: which variable is what
# =========================================================================================

class Role(NamedTuple):
    """How to recognise one input variable.

    Attributes
    ----------
    standard_names : tuple of str
        CF ``standard_name`` values that identify it (exact match).
    names : tuple of str
        Common variable names, in order of preference (exact, then case-insensitive).
    units : str or None
        Unit it is converted to by :func:`read_role`; its kind is the expected kind.
    description : str
        Words for error messages.
    axis : bool
        A 1-D coordinate axis: dimension coordinates are preferred among candidates.
    """

    standard_names: tuple
    names: tuple
    units: str | None
    description: str = ""
    axis: bool = False


ROLES = {
    "spectrum": Role(
        ("sea_surface_wave_directional_variance_spectral_density",),
        ("efth", "spectrum", "spec", "spectra", "directional_spectrum",
         "frequency_direction_spectrum", "energy", "Efth", "E", "density"),
        "m2 s rad-1", "frequency-direction variance spectral density E(f, theta)"),
    "frequency": Role(
        ("wave_frequency", "sea_surface_wave_frequency"),
        ("frequency", "freq", "frequencies", "f", "wave_frequency"),
        "s-1", "wave frequency axis", axis=True),
    "direction": Role(
        ("sea_surface_wave_from_direction", "sea_surface_wave_to_direction"),
        ("direction", "dir", "directions", "theta", "wave_direction"),
        "degree", "wave direction axis", axis=True),
    "wind_speed": Role(
        ("wind_speed",),
        ("wind_speed", "wspd", "u10", "U10", "ws", "wind"),
        "m s-1", "wind speed at 10 m"),
    "wind_direction": Role(
        ("wind_from_direction", "wind_to_direction"),
        ("wind_direction", "wind_from_direction", "wdir", "wind_dir", "wd"),
        "degree", "wind direction"),
    "eastward_wind": Role(
        ("eastward_wind",),
        ("eastward_wind", "uwnd", "u_wind", "u10m"),
        "m s-1", "eastward wind component at 10 m"),
    "northward_wind": Role(
        ("northward_wind",),
        ("northward_wind", "vwnd", "v_wind", "v10m"),
        "m s-1", "northward wind component at 10 m"),
    "depth": Role(
        ("sea_floor_depth_below_sea_surface", "sea_floor_depth_below_mean_sea_level",
         "sea_floor_depth_below_geoid"),
        ("depth", "dpt", "water_depth", "sea_floor_depth", "bathymetry"),
        "m", "water depth (sea floor below the surface, positive down)"),
}
"""Role name -> :class:`Role`.  Add entries (or use :func:`register_role`) for new inputs."""


def register_role(name, standard_names=(), names=(), units=None, description="",
                  axis=False):
    """Add (or replace) a role in :data:`ROLES` and return it.

    Examples
    --------
    >>> r = register_role("air_temperature_example", ("air_temperature",), ("t2m",), "K")
    >>> ROLES["air_temperature_example"].units
    'K'
    >>> del ROLES["air_temperature_example"]
    """
    role = Role(tuple(standard_names), tuple(names), units, description or name, bool(axis))
    ROLES[name] = role
    return role


def parse_overrides(overrides):
    """Normalise overrides to a dict ``role -> variable name``.

    Parameters
    ----------
    overrides : None, dict, or iterable of "ROLE=NAME" strings

    Raises
    ------
    ValueError
        Malformed item or unknown role (the message lists the known roles).

    Examples
    --------
    >>> parse_overrides(["wind_speed=U", "depth=h"])
    {'wind_speed': 'U', 'depth': 'h'}
    """
    if overrides is None:
        return {}
    if isinstance(overrides, dict):
        items = list(overrides.items())
    else:
        if isinstance(overrides, str):
            overrides = [overrides]
        items = []
        for item in overrides:
            if "=" not in str(item):
                raise ValueError(f"variable override {item!r}: expected ROLE=NAME, e.g. "
                                 "wind_speed=U10")
            role, _, var = str(item).partition("=")
            items.append((role.strip(), var.strip()))
    out = {}
    for role, var in items:
        if role not in ROLES:
            raise ValueError(f"variable override {role}={var}: unknown role {role!r}; roles: "
                             f"{', '.join(sorted(ROLES))}")
        if not var:
            raise ValueError(f"variable override {role}=: the variable name is empty")
        out[role] = var
    return out


def _ranked(ds, cands, role):
    """Order candidates: for axes prefer dimension coordinates, then 1-D variables."""
    if role.axis:
        dimcoords = [n for n in cands if n in ds.dims and ds[n].ndim == 1]
        if dimcoords:
            return dimcoords
        one_d = [n for n in cands if ds[n].ndim == 1]
        return one_d or cands
    multi = [n for n in cands if ds[n].ndim >= 2]
    if role.units and "rad-1" in role.units and multi:   # spectra: at least 2-D
        return multi
    return cands


def find_variable(ds, role, overrides=None):
    """Find the variable playing ``role`` in ``ds``.

    Parameters
    ----------
    ds : xarray.Dataset
    role : str
        A key of :data:`ROLES` (e.g. ``"spectrum"``, ``"wind_speed"``, ``"frequency"``).
    overrides : dict or iterable of "ROLE=NAME", optional
        Explicit choices; an override for ``role`` always wins.

    Returns
    -------
    xarray.DataArray
        The variable (data variable or coordinate), named.

    Raises
    ------
    ValueError
        Not found (the message names the role, the standard names and names searched and
        the variables in the file), ambiguous (several variables with a matching
        ``standard_name``), or an override naming a variable that does not exist.

    Examples
    --------
    >>> import xarray as xr
    >>> ds = xr.Dataset({"U": ("t", [5.0], {"standard_name": "wind_speed",
    ...                                      "units": "m s-1"})})
    >>> find_variable(ds, "wind_speed").name
    'U'
    """
    if role not in ROLES:
        raise ValueError(f"unknown role {role!r}; roles: {', '.join(sorted(ROLES))}")
    spec = ROLES[role]
    over = parse_overrides(overrides)
    names = list(ds.variables)
    if role in over:
        var = over[role]
        if var not in ds.variables:
            raise ValueError(f"{role}: the variable {var!r} named by the override {role}={var} "
                             f"is not in the file; variables: {', '.join(names) or 'none'}")
        return ds[var]
    cands = [n for n in names if ds[n].attrs.get("standard_name") in spec.standard_names]
    cands = _ranked(ds, cands, spec)
    if len(cands) == 1:
        return ds[cands[0]]
    if len(cands) > 1:
        raise ValueError(f"{role}: several variables have a matching standard_name "
                         f"({', '.join(cands)}); choose one with {role}=NAME (--var)")
    for exact in (True, False):
        for common in spec.names:
            hits = [n for n in names if (n == common if exact else n.lower() == common.lower())]
            hits = _ranked(ds, hits, spec)
            if hits:
                return ds[hits[0]]
    raise ValueError(
        f"no {role} variable ({spec.description}) found: searched standard_name "
        f"{'/'.join(spec.standard_names) or '-'} and names {', '.join(spec.names) or '-'}; "
        f"variables in the file: {', '.join(names) or 'none'}; name it with {role}=NAME (--var)")


def read_role(ds, role, overrides=None, units=None):
    """Find the variable of ``role`` (:func:`find_variable`) and convert it to the role's units.

    Parameters
    ----------
    ds : xarray.Dataset
    role : str
    overrides : dict or iterable of "ROLE=NAME", optional
    units : str, optional
        Unit to assume instead of the variable's ``units`` attribute (when the file's is
        missing or wrong).

    Returns
    -------
    xarray.DataArray
        In the units of ``ROLES[role].units`` (or unchanged if the role has none).

    Examples
    --------
    >>> import xarray as xr
    >>> ds = xr.Dataset({"wspd": ("t", [10.0], {"units": "knots"})})
    >>> round(float(read_role(ds, "wind_speed")[0]), 3)
    5.144
    """
    da = find_variable(ds, role, overrides)
    if units is not None:
        da = da.copy(deep=False)
        da.attrs = {**da.attrs, "units": units}
    target = ROLES[role].units
    if target is None:
        return da
    label = str(da.name) if da.name == role else f"{da.name} ({role})"
    return convert_units(da, target, label)


def parse_chunks(text):
    """Parse ``"dim:n,dim:n"`` (or ``"auto"``) into an xarray ``chunks`` argument.

    Examples
    --------
    >>> parse_chunks("time:100,station:5")
    {'time': 100, 'station': 5}
    """
    if text is None:
        return None
    text = str(text).strip()
    if text in ("auto", ""):
        return "auto" if text else None
    out = {}
    for part in text.split(","):
        dim, sep, n = part.partition(":")
        try:
            if not sep:
                raise ValueError
            out[dim.strip()] = int(n)
            if out[dim.strip()] < 1 and out[dim.strip()] != -1:
                raise ValueError
        except ValueError:
            raise ValueError(f"chunks {text!r}: expected dim:n[,dim:n...] with n >= 1, or "
                             "auto") from None
    return out
