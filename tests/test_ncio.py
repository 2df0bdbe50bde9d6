"""NetCDF input/output: opening with clear errors, variable roles, units, atomic writes."""
import math
import os
import stat

import numpy as np
import pytest
import xarray as xr

from shortwave import ncio
from shortwave.ncio import (ROLES, convert_units, find_variable, open_input, parse_chunks,
                            parse_overrides, parse_units, read_role, register_role,
                            units_equivalent, write_netcdf)


# --- open_input ---------------------------------------------------------------------------

@pytest.fixture()
def files(tmp_path):
    ds = xr.Dataset({"a": (("x",), np.arange(5000.0)),
                     "r": (("t", "x"), np.ones((3, 5000)))},
                    coords={"t": [0.0, 1.0, 2.0]})
    out = {}
    for fmt in ("NETCDF4", "NETCDF3_CLASSIC", "NETCDF3_64BIT"):
        p = tmp_path / f"{fmt}.nc"
        ds.to_netcdf(p, format=fmt, unlimited_dims=["t"])
        out[fmt] = p
    return out


@pytest.mark.parametrize("fmt", ["NETCDF4", "NETCDF3_CLASSIC", "NETCDF3_64BIT"])
def test_open_valid_files(files, fmt):
    ds = open_input(files[fmt])
    assert float(ds["a"].sum()) == pytest.approx(sum(range(5000)))
    ds.close()


@pytest.mark.parametrize("fmt", ["NETCDF4", "NETCDF3_CLASSIC", "NETCDF3_64BIT"])
@pytest.mark.parametrize("frac", [0.3, 0.9, 0.999])
def test_truncated_file_is_an_error_naming_it(files, tmp_path, fmt, frac):
    data = files[fmt].read_bytes()
    bad = tmp_path / f"cut_{fmt}.nc"
    bad.write_bytes(data[:int(len(data) * frac)])
    with pytest.raises(ValueError, match="truncated") as exc:
        open_input(bad)
    assert str(bad) in str(exc.value)
    assert "\n" not in str(exc.value)


def test_missing_empty_folder_and_not_netcdf(tmp_path):
    with pytest.raises(FileNotFoundError, match="does not exist"):
        open_input(tmp_path / "nothing.nc")
    empty = tmp_path / "empty.nc"
    empty.write_bytes(b"")
    with pytest.raises(ValueError, match=r"empty\.nc is empty"):
        open_input(empty)
    text = tmp_path / "notes.nc"
    text.write_text("station,hs\nCorrow Bank,1.2\n")
    with pytest.raises(ValueError, match=r"notes\.nc is not a NetCDF file"):
        open_input(text)
    with pytest.raises(OSError, match="folder"):
        open_input(tmp_path)


def test_packed_and_masked_data_are_decoded(tmp_path):
    p = tmp_path / "packed.nc"
    ds = xr.Dataset({"v": (("x",), np.array([0.5, np.nan, 2.0]))})
    ds.to_netcdf(p, encoding={"v": {"dtype": "int16", "scale_factor": 0.01,
                                    "_FillValue": -32768}})
    v = open_input(p)["v"].values
    assert v[0] == pytest.approx(0.5) and np.isnan(v[1]) and v[2] == pytest.approx(2.0)


def test_chunks_need_dask_or_work(files):
    pytest.importorskip("dask")
    ds = open_input(files["NETCDF4"], chunks={"x": -1})
    assert ds["a"].chunks is not None
    assert float(ds["a"].sum()) == pytest.approx(sum(range(5000)))


# --- units ----------------------------------------------------------------------------------

@pytest.mark.parametrize("text", ["m s-1", "m/s", "m.s-1", "m s**-1", "m s^-1", "meter second-1",
                                  "m*s-1"])
def test_speed_spellings(text):
    assert units_equivalent(text, "m s-1")


def test_knots_and_kmh():
    # 1 knot = 1 international nautical mile (1852 m) per hour: BIPM SI Brochure (2019),
    # Table 8 (non-SI units), exact by definition.
    u = xr.DataArray([10.0, 36.0], attrs={"units": "knots"}, name="wind")
    assert convert_units(u, "m s-1").values[0] == pytest.approx(18520.0 / 3600.0, rel=1e-15)
    kmh = xr.DataArray([36.0], attrs={"units": "km/h"}, name="wind")
    assert convert_units(kmh, "m s-1").values[0] == pytest.approx(10.0, rel=1e-15)


def test_temperature_and_angles():
    # T[K] = T[degC] + 273.15: BIPM SI Brochure (2019), Sect. 2.3.1 (exact).
    t = xr.DataArray([15.0], attrs={"units": "degC"}, name="sst")
    assert convert_units(t, "K").values[0] == pytest.approx(288.15, abs=1e-12)
    assert convert_units(xr.DataArray([288.15], attrs={"units": "K"}), "celsius").values[0] \
        == pytest.approx(15.0, abs=1e-12)
    a = xr.DataArray([math.pi], attrs={"units": "radian"}, name="dir")
    assert convert_units(a, "degree").values[0] == pytest.approx(180.0, rel=1e-15)


@pytest.mark.parametrize("text", ["m2 s deg-1", "m2 s degree-1", "m2/Hz/deg", "m^2 Hz-1 deg-1",
                                  "m**2 s degrees**-1"])
def test_per_degree_density_to_per_radian(text):
    # 1 m2 s deg-1 = 180/pi = 57.29578 m2 s rad-1 (reference note spectra.md Sect. 6.4,
    # independent re-computation of the unit definition).
    e = xr.DataArray([1.0], attrs={"units": text}, name="efth")
    assert convert_units(e, "m2 s rad-1").values[0] == pytest.approx(57.29578, rel=1e-7)


def test_unknown_and_incompatible_units_name_the_variable():
    e = xr.DataArray([1.0], attrs={"units": "furlongs"}, name="efth")
    with pytest.raises(ValueError, match=r"'efth'.*'furlongs'"):
        convert_units(e, "m2 s rad-1")
    e = xr.DataArray([1.0], attrs={"units": "m2 s"}, name="efth")     # no per-angle unit
    with pytest.raises(ValueError, match=r"'efth' has units 'm2 s'.*cannot be converted"):
        convert_units(e, "m2 s rad-1")
    with pytest.raises(ValueError, match=r"'efth' has no units"):
        convert_units(xr.DataArray([1.0], name="efth"), "m2 s rad-1")
    lat = xr.DataArray([1.0], attrs={"units": "degrees_north"}, name="dir")
    with pytest.raises(ValueError, match="degrees_north"):
        convert_units(lat, "degree")


def test_parse_units_rejects_malformed():
    for bad in ("m //s", "m /", "(m/s)", ""):
        with pytest.raises(ValueError):
            parse_units(bad)


def test_convert_keeps_dask_lazy():
    da = pytest.importorskip("dask.array")
    x = xr.DataArray(da.ones(10, chunks=5), dims="x", attrs={"units": "knots"}, name="u")
    y = convert_units(x, "m s-1")
    assert y.chunks is not None and y.attrs["units"] == "m s-1"


# --- roles ------------------------------------------------------------------------------------

def _ds():
    return xr.Dataset(
        {"efth": (("time", "freq", "dir"), np.ones((2, 3, 4)),
                  {"standard_name": "sea_surface_wave_directional_variance_spectral_density",
                   "units": "m2 s rad-1"}),
         "mdir": (("time",), [10.0, 20.0], {"standard_name": "sea_surface_wave_from_direction",
                                            "units": "degree"}),
         "WSPD": (("time",), [20.0, 10.0], {"units": "knots"})},
        coords={"freq": ("freq", [0.1, 0.2, 0.3], {"units": "Hz"}),
                "dir": ("dir", [0.0, 90, 180, 270],
                        {"standard_name": "sea_surface_wave_from_direction",
                         "units": "degree"})})


def test_lookup_by_standard_name_prefers_axes():
    ds = _ds()
    assert find_variable(ds, "spectrum").name == "efth"
    assert find_variable(ds, "direction").name == "dir"       # not the mean direction
    assert find_variable(ds, "frequency").name == "freq"      # common name
    assert find_variable(ds, "wind_speed").name == "WSPD"     # case-insensitive name


def test_override_wins_and_is_checked():
    ds = _ds()
    assert find_variable(ds, "direction", ["direction=mdir"]).name == "mdir"
    with pytest.raises(ValueError, match=r"wind_speed.*'U10'.*variables: efth"):
        find_variable(ds, "wind_speed", {"wind_speed": "U10"})
    with pytest.raises(ValueError, match="unknown role 'wnd'"):
        parse_overrides(["wnd=U10"])
    with pytest.raises(ValueError, match="ROLE=NAME"):
        parse_overrides(["wind_speed"])


def test_not_found_names_role_search_and_contents():
    ds = _ds().drop_vars("WSPD")
    with pytest.raises(ValueError) as exc:
        find_variable(ds, "wind_speed")
    msg = str(exc.value)
    for part in ("no wind_speed variable", "standard_name wind_speed", "wspd", "efth",
                 "wind_speed=NAME"):
        assert part in msg


def test_ambiguous_standard_name():
    ds = _ds()
    ds["other"] = ds["efth"] * 2
    with pytest.raises(ValueError, match="several variables.*efth, other"):
        find_variable(ds, "spectrum")


def test_read_role_converts_and_unit_override():
    ds = _ds()
    u = read_role(ds, "wind_speed")
    assert u.attrs["units"] == "m s-1"
    assert float(u[0]) == pytest.approx(20 * 1852 / 3600)
    ds["WSPD"].attrs.pop("units")
    with pytest.raises(ValueError, match="no units"):
        read_role(ds, "wind_speed")
    assert float(read_role(ds, "wind_speed", units="m s-1")[0]) == 20.0


def test_register_role_extends_the_table():
    name = "test_only_foam_fraction"
    assert name not in ROLES
    try:
        register_role(name, (), ("foam",), "1", "foam fraction")
        ds = xr.Dataset({"Foam": (("x",), [0.0, 1.0], {"units": "1"})})
        assert read_role(ds, name).name == "Foam"
    finally:
        ROLES.pop(name, None)


def test_parse_chunks():
    assert parse_chunks("time:10,station:2") == {"time": 10, "station": 2}
    assert parse_chunks("auto") == "auto"
    with pytest.raises(ValueError, match="dim:n"):
        parse_chunks("time=10")


# --- write_netcdf -----------------------------------------------------------------------------

def test_write_refuses_input_and_existing(tmp_path):
    src = tmp_path / "in.nc"
    xr.Dataset({"a": ("x", [1.0])}).to_netcdf(src)
    ds = xr.Dataset({"b": ("x", [2.0])}, attrs={"history": "made"})
    with pytest.raises(ValueError, match="is the input file"):
        write_netcdf(ds, src, inputs=[src], overwrite=True)
    link = tmp_path / "link.nc"
    os.symlink(src, link)
    with pytest.raises(ValueError, match="is the input file"):
        write_netcdf(ds, link, inputs=[src], overwrite=True)
    out = tmp_path / "out.nc"
    write_netcdf(ds, out, inputs=[src], command="shortwave test")
    with pytest.raises(ValueError, match="exists"):
        write_netcdf(ds, out, inputs=[src])
    back = xr.open_dataset(out)
    assert back.attrs["Conventions"] == "CF-1.10"
    assert back.attrs["history"].startswith("made\n")
    assert back.attrs["history"].endswith("shortwave test")
    back.close()
    assert [p.name for p in tmp_path.iterdir() if p.name.startswith(".tmp")] == []


def test_write_is_atomic_on_failure(tmp_path):
    out = tmp_path / "out.nc"
    xr.Dataset({"a": ("x", [1.0])}).to_netcdf(out)
    before = out.read_bytes()
    bad = xr.Dataset({"b": ("x", [2.0])})

    def boom(_delayed):
        raise RuntimeError("interrupted")
    pytest.importorskip("dask")
    with pytest.raises(RuntimeError):
        write_netcdf(bad.chunk(), out, overwrite=True, compute=boom)
    assert out.read_bytes() == before
    assert [p.name for p in tmp_path.iterdir() if p.name.startswith(".tmp")] == []


def test_written_file_gets_usual_permissions(tmp_path):
    old = os.umask(0o022)
    try:
        out = write_netcdf(xr.Dataset({"a": ("x", [1.0])}), tmp_path / "p.nc")
    finally:
        os.umask(old)
    assert stat.S_IMODE(os.stat(out).st_mode) == 0o644


def test_history_line_format():
    line = ncio.history_line("shortwave extend a.nc -o b.nc")
    assert line.endswith(": shortwave extend a.nc -o b.nc") and line[4] == "-"
