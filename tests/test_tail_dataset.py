"""Tail grafting on NetCDF/xarray datasets: layouts, conventions, wind sources, errors, dask."""
import numpy as np
import pytest

from shortwave.ncio import open_input, write_netcdf
from shortwave.synthetic import (greyhaven_spectra, greyhaven_spectra_grid, netcdf_encoding)
from shortwave.tail import (chunk_plan, count_spectra, extend_dataset, output_encoding,
                            spectrum_parts)

MOMENTS = ("significant_wave_height", "significant_wave_height_resolved", "mean_square_slope",
           "mean_square_slope_upwind", "mean_square_slope_crosswind",
           "mean_square_slope_resolved", "mean_square_slope_tail")


def _same_moments(a, b, rtol=1e-10):
    for name in MOMENTS:
        np.testing.assert_allclose(a[name].values, b[name].values, rtol=rtol, err_msg=name)


@pytest.fixture(scope="module")
def point():
    return greyhaven_spectra(3, dtype="float64")


@pytest.fixture(scope="module")
def point_out(point):
    return extend_dataset(point).compute()


def test_point_layout_keeps_coordinates_and_metadata(point, point_out):
    out = point_out
    assert dict(out["directional_spectrum"].sizes) == {"time": 3, "station": 3,
                                                       "wavenumber": 226, "direction": 36}
    for c in ("time", "station_name", "latitude", "longitude", "height"):
        assert c in out.coords
    assert list(out["station_name"].values) == list(point["station_name"].values)
    assert out["direction"].attrs["standard_name"] == "sea_surface_wave_from_direction"
    assert out["wavenumber"].attrs["units"] == "rad m-1"
    assert out["significant_wave_height"].attrs["standard_name"] == \
        "sea_surface_wave_significant_height"
    assert out["mean_square_slope"].attrs["standard_name"] == \
        "sea_surface_wave_mean_square_slope"
    assert "standard_name" not in out["directional_spectrum"].attrs   # none exists in CF
    assert out.attrs["tail_model"] == "elfouhaily1997"
    assert "wind speed from variable 'wind_speed'" in out.attrs["wind_source"]
    assert "depth from variable 'depth'" in out.attrs["depth_source"]
    assert out.attrs["featureType"] == "timeSeries"        # input attributes kept
    assert np.all(np.isfinite(out["mean_square_slope"].values))


def test_gridded_layout_with_land_cells():
    ds = greyhaven_spectra_grid(2, 3, 4, land=((0, 0), (2, 3)))
    out = extend_dataset(ds)
    assert dict(out["directional_spectrum"].sizes) == {"time": 2, "y": 3, "x": 4,
                                                       "wavenumber": 226, "direction": 36}
    assert out["latitude"].dims == ("y", "x")
    hs = out["significant_wave_height"].values
    assert np.isnan(hs[:, 0, 0]).all() and np.isnan(hs[:, 2, 3]).all()
    assert np.isfinite(hs).sum() == 2 * 12 - 4
    assert np.isnan(out["directional_spectrum"].values[:, 0, 0]).all()
    assert count_spectra(out) == {"spectra": 24, "nan_spectra": 4, "no_wind": 0,
                                  "extended": 20}


def test_direction_round_trips_leave_moments_unchanged(point_out):
    # from <-> to, degree <-> radian axis, per-degree <-> per-radian density, unsorted axis
    variants = [
        greyhaven_spectra(3, dtype="float64", convention="to"),
        greyhaven_spectra(3, dtype="float64", direction_units="radian"),
        greyhaven_spectra(3, dtype="float64", per_degree=True),
        greyhaven_spectra(3, dtype="float64", convention="to", per_degree=True,
                          direction_units="radian"),
    ]
    shuffled = greyhaven_spectra(3, dtype="float64")
    perm = np.random.default_rng(7).permutation(36)
    variants.append(shuffled.isel(direction=perm))
    variants.append(shuffled.isel(frequency=perm))
    for ds in variants:
        _same_moments(extend_dataset(ds), point_out)


def test_packed_and_masked_file(tmp_path):
    ds = greyhaven_spectra(2, dtype="float64")
    ds["spectrum"][0, 1] = np.nan                          # a missing spectrum
    path = tmp_path / "packed.nc"
    write_netcdf(ds, path, encoding=netcdf_encoding(ds, packed=True))
    back = open_input(path)
    assert back["spectrum"].encoding["dtype"] == np.dtype("int16")
    a, b = extend_dataset(back).compute(), extend_dataset(ds).compute()
    ok = np.isfinite(b["significant_wave_height"].values)
    assert not ok[0, 1] and np.isnan(a["significant_wave_height"].values[0, 1])
    # 16-bit packing with one scale factor for the file: quantisation step max(E)/32766,
    # a large relative error in the weak high-frequency bins that carry the slopes
    for name in MOMENTS:
        np.testing.assert_allclose(a[name].values[ok], b[name].values[ok], rtol=1e-2)
    np.testing.assert_allclose(a["significant_wave_height"].values[ok],
                               b["significant_wave_height"].values[ok], rtol=2e-3)
    back.close()


def test_frequency_bounds_are_used(point, point_out):
    ds = greyhaven_spectra(3, dtype="float64", frequency_bounds=True)
    _same_moments(extend_dataset(ds), point_out, rtol=1e-9)
    ds["frequency_bounds"][:] = ds["frequency_bounds"].values * np.array([1.0, 1.01])
    with pytest.raises(ValueError, match="contiguous"):
        extend_dataset(ds)


def test_wind_from_another_file_constant_or_components(point, point_out, tmp_path):
    wind = point[["wind_speed", "wind_direction"]]
    spectra_only = point.drop_vars(["wind_speed", "wind_direction"])
    _same_moments(extend_dataset(spectra_only, wind=wind), point_out)
    # components: u = -U sin(from), v = -U cos(from) (wind blowing from 'from')
    rad = np.deg2rad(point["wind_direction"])
    comp = spectra_only.assign(
        uwnd=(-point["wind_speed"] * np.sin(rad)).assign_attrs(
            standard_name="eastward_wind", units="m s-1"),
        vwnd=(-point["wind_speed"] * np.cos(rad)).assign_attrs(
            standard_name="northward_wind", units="m s-1"))
    _same_moments(extend_dataset(comp), point_out, rtol=1e-9)
    # wind_to_direction is turned around; knots are converted
    to = point.copy()
    to["wind_direction"] = (point["wind_direction"] + 180) % 360
    to["wind_direction"].attrs = {"standard_name": "wind_to_direction", "units": "degree"}
    to["wind_speed"] = point["wind_speed"] * 3600 / 1852
    to["wind_speed"].attrs = {"standard_name": "wind_speed", "units": "knots"}
    _same_moments(extend_dataset(to), point_out, rtol=1e-9)
    # constants for every spectrum
    c = extend_dataset(spectra_only, wind_speed=10.0, wind_direction=270.0)
    assert np.all(c["wind_speed"].values == 10.0)
    assert "10 m s-1 (constant)" in c.attrs["wind_source"]
    # a wind file on other times is refused with the reason
    shifted = wind.assign_coords(time=wind["time"] + np.timedelta64(1, "h"))
    with pytest.raises(ValueError, match="lacks time values"):
        extend_dataset(spectra_only, wind=shifted)


def test_depth_choices(point):
    deep = extend_dataset(point, depth="deep")
    shallow = extend_dataset(point, depth=3.0)
    assert "deep water" in deep.attrs["depth_source"]
    k_deep = deep["seam_wavenumber"].values
    assert np.all(shallow["seam_wavenumber"].values > k_deep)   # k(f) larger in shallow water
    nodepth = extend_dataset(point.drop_vars("depth"))
    assert "no depth" in nodepth.attrs["depth_source"]
    bad = point.copy()
    bad["depth"] = bad["depth"] * -1
    with pytest.raises(ValueError, match=r"depth variable 'depth' has values <= 0"):
        extend_dataset(bad)


@pytest.mark.parametrize("drop, match", [
    ("direction", r"no direction variable .*searched standard_name "
                  r"sea_surface_wave_from_direction"),
    ("frequency", r"no frequency variable"),
    ("spectrum", r"no spectrum variable"),
])
def test_missing_axes_and_spectrum_are_named(point, drop, match):
    if drop == "spectrum":
        ds = point.drop_vars(drop)
    else:      # the spectrum keeps its axis, but no variable describes it
        ds = point.rename({drop: "axis_" + drop}).drop_vars("axis_" + drop)
    with pytest.raises(ValueError, match=match):
        extend_dataset(ds)


def test_missing_wind_is_an_error_with_a_remedy(point):
    ds = point.drop_vars(["wind_speed"])
    with pytest.raises(ValueError, match=r"wind speed is needed.*--wind-speed"):
        extend_dataset(ds)
    ds = point.drop_vars(["wind_direction"])
    with pytest.raises(ValueError, match=r"wind direction is needed.*--wind-direction"):
        extend_dataset(ds)


def test_unknown_units_and_direction_convention(point):
    ds = point.copy()
    ds["spectrum"].attrs["units"] = "m2 s sr-1"
    with pytest.raises(ValueError, match=r"spectrum.*'m2 s sr-1'"):
        extend_dataset(ds)
    assert np.isfinite(extend_dataset(ds, units={"spectrum": "m2 s rad-1"})[
        "significant_wave_height"].values).all()
    ds = point.copy()
    ds["direction"].attrs.pop("standard_name")
    with pytest.raises(ValueError, match="--direction-convention"):
        extend_dataset(ds)
    _same_moments(extend_dataset(ds, direction_convention="from"), extend_dataset(point))


def test_negative_energy_names_the_variable(point):
    ds = point.copy(deep=True)
    ds["spectrum"][1, 2, 20, 4] = -0.5
    with pytest.raises(ValueError, match=r"spectrum: negative variance density"):
        extend_dataset(ds).compute()


def test_negative_wind_names_the_variable(point):
    ds = point.copy(deep=True)
    ds["wind_speed"][0, 0] = -2.0
    with pytest.raises(ValueError, match=r"wind speed 'wind_speed' has negative values"):
        extend_dataset(ds)


def test_dask_chunks_give_the_same_result(point, point_out):
    pytest.importorskip("dask")
    plan = chunk_plan(point.sizes, ["time", "station"], 2)
    assert plan == {"time": 1, "station": 2}
    ds = point.chunk({**plan, "frequency": -1, "direction": -1})
    lazy = extend_dataset(ds)
    assert lazy["directional_spectrum"].chunks is not None
    computed = lazy.compute()
    _same_moments(computed, point_out, rtol=1e-12)
    np.testing.assert_array_equal(computed["directional_spectrum"].values,
                                  point_out["directional_spectrum"].values)


def test_moments_only(point):
    out = extend_dataset(point, keep_spectra=False)
    assert "directional_spectrum" not in out and "wavenumber" not in out.dims
    _same_moments(out, extend_dataset(point))


def test_parts_of_one_spectrum(point):
    p = spectrum_parts(point, ["station_name=Corrow Bank", "time=2031-10-02T03:00"])
    assert p["label"] == "time=2031-10-02T03:00, station_name=Corrow Bank"
    assert np.allclose(p["resolved"] + p["tail"], p["extended"], rtol=1e-5)
    with pytest.raises(ValueError, match="no such value"):
        spectrum_parts(point, ["station_name=Nowhere"])
    with pytest.raises(ValueError, match="neither a dimension"):
        spectrum_parts(point, ["depth=3"])


def test_output_passes_cf_compliance_checker(point, tmp_path):
    """compliance-checker --test cf:1.10 reports no errors (no failed high-priority check)."""
    import json
    import shutil
    import subprocess
    import sys
    exe = shutil.which("compliance-checker") or shutil.which(
        "compliance-checker", path=str(__import__("pathlib").Path(sys.executable).parent))
    if exe is None:
        try:
            import compliance_checker  # noqa: F401
        except ImportError:
            pytest.skip("compliance-checker is not installed (pip install compliance-checker)")
        cmd = [sys.executable, "-m", "compliance_checker"]
    else:
        cmd = [exe]
    inp = tmp_path / "greyhaven.nc"
    ds = greyhaven_spectra(2)
    write_netcdf(ds, inp, encoding=netcdf_encoding(ds))
    out = extend_dataset(open_input(inp), input_name=inp.name)
    path = tmp_path / "extended.nc"
    write_netcdf(out, path, inputs=[inp], encoding=output_encoding(out))
    res = subprocess.run(cmd + ["--test", "cf:1.10", "--format", "json", "--output", "-",
                                str(path)], capture_output=True, text=True, timeout=300)
    report = json.loads(res.stdout)["cf:1.10"]
    failed = [(c["name"], c["msgs"]) for c in report["high_priorities"]
              if c["value"][0] < c["value"][1]]
    assert report["high_count"] == 0 and failed == [], failed
    assert report["scored_points"] > 0
