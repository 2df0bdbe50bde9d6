"""Whole scenes: finding variables, units, conventions, per-cell physics, files.

External references used here (named beside each test):
* the knot, 1852 m per hour (BIPM, The International System of Units, 9th ed. 2019,
  Table 8), and 0 degC = 273.15 K (same brochure, Sect. 2.3.1);
* the monostatic Bragg condition Lambda = lambda / (2 sin theta) (Wright 1966, IEEE Trans.
  Antennas Propag. AP-14, 749; Valenzuela 1978, Boundary-Layer Meteorol. 13, 61) with the
  exact speed of light 299 792 458 m/s (SI definition);
* CF-1.10 conventions, checked with the IOOS compliance-checker (cf:1.10 suite), whose
  bundled CF standard-name table verifies ``standard_name`` values and canonical units.
Everything else compares a scene cell with the package's own point functions
(consistency of the gridded layer, not physics).
"""
import hashlib
import os

import numpy as np
import pytest
import xarray as xr

from shortwave import fields, films, radar, spectrum
from shortwave.permittivity import permittivity
from shortwave.scene_synthetic import greyhaven_scene
from shortwave.water import Water

C_BAND = 5.405e9


@pytest.fixture(scope="module")
def small():
    return greyhaven_scene((12, 16))


@pytest.fixture(scope="module")
def products(small):
    scene = fields.open_scene(small)
    return fields.scene_products(scene, C_BAND, "VV", film="mineral-oil")


def _uniform(shape=(3, 4), *, speed=8.0, wind_from=90.0, look=90.0, inc=35.0):
    ny, nx = shape
    dims = ("y", "x")
    f = lambda v: np.full(shape, float(v))   # noqa: E731
    return xr.Dataset({
        "wind_speed": (dims, f(speed), {"standard_name": "wind_speed", "units": "m s-1"}),
        "wind_from_direction": (dims, f(wind_from), {"standard_name": "wind_from_direction",
                                                     "units": "degree"}),
        "incidence_angle": (dims, f(inc), {"standard_name": "angle_of_incidence",
                                           "units": "degree"}),
        "sensor_azimuth_angle": (dims, f((look + 180.0) % 360.0),
                                 {"standard_name": "sensor_azimuth_angle", "units": "degree"}),
    }, coords={"y": np.arange(ny) * 1.0, "x": np.arange(nx) * 1.0})


# ------------------------------------------------------------------------ finding variables
def test_roles_found_by_standard_name_then_common_name_then_override(small):
    by_std = fields.open_scene(small)
    assert by_std.names["incidence_angle"] == "incidence_angle"
    renamed = small.rename({"incidence_angle": "inc", "eastward_wind": "uwnd",
                            "northward_wind": "vwnd"})
    for v in ("inc", "uwnd", "vwnd"):
        renamed[v].attrs.pop("standard_name")
    by_name = fields.open_scene(renamed)
    assert by_name.names["incidence_angle"] == "inc"
    odd = small.rename({"incidence_angle": "look_angle_x"})
    odd["look_angle_x"].attrs.pop("standard_name")
    with pytest.raises(ValueError, match="no incidence angle"):
        fields.open_scene(odd)
    by_override = fields.open_scene(odd, overrides=["incidence_angle=look_angle_x"])
    for key in ("wind_speed", "incidence_angle"):
        np.testing.assert_array_equal(by_override.inputs[key].values,
                                      by_std.inputs[key].values)


def test_speed_direction_and_components_give_the_same_scene():
    comp = fields.open_scene(greyhaven_scene((6, 8), wind_form="components"))
    spd = fields.open_scene(greyhaven_scene((6, 8), wind_form="speed"))
    for key in ("wind_speed", "wind_azimuth"):
        np.testing.assert_allclose(comp.inputs[key].values, spd.inputs[key].values,
                                   rtol=1e-12, atol=1e-9, equal_nan=True)


# ------------------------------------------------------------------------ units
def test_knots_give_the_same_products_as_metres_per_second():
    """1 kn = 1852 m / 3600 s (BIPM SI brochure, 9th ed., Table 8)."""
    base = _uniform(speed=8.0)
    kn = base.copy()
    kn["wind_speed"] = base["wind_speed"] * 3600.0 / 1852.0
    kn["wind_speed"].attrs = {"standard_name": "wind_speed", "units": "knots"}
    a = fields.scene_products(fields.open_scene(base), C_BAND)
    b = fields.scene_products(fields.open_scene(kn), C_BAND)
    np.testing.assert_allclose(b.wind_speed.values, 8.0, rtol=1e-12)
    np.testing.assert_allclose(b.sigma0.values, a.sigma0.values, rtol=1e-12)


def test_radians_kelvin_psu_and_micrometres_are_converted(small):
    """0 degC = 273.15 K (BIPM SI brochure 2.3.1); 1 degree = pi/180 rad."""
    ds = small.copy()
    ds["incidence_angle"] = np.deg2rad(small["incidence_angle"])
    ds["incidence_angle"].attrs = {"standard_name": "angle_of_incidence", "units": "rad"}
    ds["sea_surface_temperature"] = small["sea_surface_temperature"] - 273.15
    ds["sea_surface_temperature"].attrs = {"standard_name": "sea_surface_temperature",
                                           "units": "degC"}
    ds["sea_surface_salinity"].attrs["units"] = "psu"
    ds["film_thickness"] = small["film_thickness"] * 1e6
    ds["film_thickness"].attrs = {"units": "um"}
    a = fields.open_scene(small).inputs
    b = fields.open_scene(ds).inputs
    for key in ("incidence_angle", "temperature_c", "salinity", "film_thickness"):
        np.testing.assert_allclose(b[key].values, a[key].values, rtol=1e-12, atol=1e-12,
                                   equal_nan=True)
    np.testing.assert_allclose(np.nanmean(a["temperature_c"].values),
                               np.nanmean(small["sea_surface_temperature"].values) - 273.15)


def test_unconvertible_units_are_refused_naming_variable_and_unit():
    ds = _uniform()
    ds["wind_speed"].attrs["units"] = "Pa"
    with pytest.raises(ValueError, match=r"wind_speed.*'Pa'"):
        fields.open_scene(ds)


# ------------------------------------------------------------------------ conventions
@pytest.mark.parametrize("wind_from, look, expected", [
    (90.0, 90.0, 0.0),      # wind comes from where the radar looks: blows toward it
    (270.0, 90.0, 180.0),   # blows away from the radar
    (0.0, 90.0, 270.0),
    (180.0, 0.0, 180.0),
])
def test_wind_azimuth_relative_to_the_look(wind_from, look, expected):
    """Package convention: 0 = upwind (wind blowing toward the radar), 180 = downwind."""
    sc = fields.open_scene(_uniform(wind_from=wind_from, look=look))
    np.testing.assert_allclose(sc.inputs["wind_azimuth"].values, expected, atol=1e-9)


def test_look_azimuth_option_and_wind_to_direction():
    ds = _uniform(wind_from=90.0).drop_vars("sensor_azimuth_angle")
    a = fields.open_scene(ds, look_azimuth=90.0).inputs["wind_azimuth"].values
    np.testing.assert_allclose(a, 0.0, atol=1e-9)
    to = ds.rename({"wind_from_direction": "wind_to_direction"})
    to["wind_to_direction"] = to["wind_to_direction"] * 0 + 270.0   # blowing toward west
    to["wind_to_direction"].attrs = {"standard_name": "wind_to_direction", "units": "degree"}
    b = fields.open_scene(to, look_azimuth=90.0).inputs["wind_azimuth"].values
    np.testing.assert_allclose(b, 0.0, atol=1e-9)


def test_upwind_backscatter_exceeds_crosswind():
    """Upwind-crosswind modulation of C-band VV sigma0 (common practice)."""
    up = fields.scene_products(fields.open_scene(_uniform(wind_from=90.0)), C_BAND)
    cross = fields.scene_products(fields.open_scene(_uniform(wind_from=0.0)), C_BAND)
    assert np.all(up.sigma0.values > cross.sigma0.values)


def test_swath_geometry():
    ds = _uniform((2, 5)).drop_vars("incidence_angle")
    sc = fields.open_scene(ds, swath=(20.0, 45.0))
    inc = np.broadcast_to(sc.inputs["incidence_angle"].values, (5,))
    assert inc[0] == pytest.approx(20.0) and inc[-1] == pytest.approx(45.0)
    t = np.tan(np.deg2rad(inc))       # flat earth: evenly spaced ground range
    np.testing.assert_allclose(np.diff(t), np.diff(t)[0], rtol=1e-12)
    sc_y = fields.open_scene(ds, swath=(45.0, 20.0), across_dim="y")
    assert sc_y.inputs["incidence_angle"].dims == ("y",)


def test_transposed_fields_are_matched_by_dimension_name(small):
    ds = small.copy()
    ds["incidence_angle"] = small["incidence_angle"].transpose("x", "y")
    a = fields.open_scene(small)
    b = fields.open_scene(ds)
    pa = fields.scene_products(a, C_BAND)
    pb = fields.scene_products(b, C_BAND)
    np.testing.assert_array_equal(pa.sigma0.transpose("y", "x").values,
                                  pb.sigma0.transpose("y", "x").values)


# ------------------------------------------------------------------------ per-cell physics
def test_bragg_wavelength_follows_the_bragg_condition(products):
    """Lambda_B = c / (2 f sin theta): Wright (1966); c = 299 792 458 m/s exactly (SI)."""
    inc = products.incidence_angle.values
    expect = 299792458.0 / (2 * C_BAND * np.sin(np.deg2rad(inc)))
    got = products.bragg_wavelength.values
    ok = np.isfinite(got)
    assert ok.sum() > 50
    np.testing.assert_allclose(got[ok], expect[ok], rtol=1e-12)


def test_cells_agree_with_point_calls(small, products):
    ws = products.wind_speed.values
    cells = np.argwhere(np.isfinite(ws))[::37][:5]
    for j, i in cells:
        u = float(ws[j, i])
        inc = float(products.incidence_angle[j, i])
        az = float(products.wind_azimuth[j, i])
        t = float(small.sea_surface_temperature[j, i]) - 273.15
        s = float(small.sea_surface_salinity[j, i])
        kb = float(radar.bragg_wavenumber(C_BAND, inc))
        assert float(products.bragg_wavenumber[j, i]) == pytest.approx(kb, rel=1e-12)
        assert float(products.bragg_curvature[j, i]) == pytest.approx(
            float(spectrum.curvature(kb, u)), rel=1e-12)
        # the radar model tabulates its spectra on a 0.025 m/s wind grid for many cells
        # (shortwave.radar.backscatter.WIND_STEP): a few tenths of a percent
        point = float(radar.nrcs(C_BAND, inc, u, "VV", az,
                                 permittivity=permittivity(C_BAND, t, s)))
        assert float(products.sigma0[j, i]) == pytest.approx(point, rel=5e-3)
        # mean square slope interpolated on a 0.02 m/s wind lattice
        assert float(products.mean_square_slope[j, i]) == pytest.approx(
            float(spectrum.mean_square_slope(u)), rel=1e-3)
    film = films.film_preset("mineral-oil")
    inside = np.argwhere(products.film_cover.values == 1)
    assert inside.size
    for j, i in inside[:3]:
        kb = float(products.bragg_wavenumber[j, i])
        w = Water(float(small.sea_surface_temperature[j, i]) - 273.15,
                  float(small.sea_surface_salinity[j, i]))
        assert float(products.damping_ratio[j, i]) == pytest.approx(
            float(films.damping_ratio(kb, film, w)), rel=1e-9)


def test_film_changes_only_the_covered_cells(products):
    cover = products.film_cover.values
    contrast = products.slick_contrast_db.values
    assert np.all(contrast[cover == 0] == 0.0)
    assert np.all(contrast[cover == 1] > 1.0)
    assert np.all(products.mean_square_slope_slick.values[cover == 1]
                  < products.mean_square_slope.values[cover == 1])
    np.testing.assert_array_equal(np.isnan(contrast), np.isnan(products.sigma0.values))


def test_contrast_models_against_the_slick_module(small):
    """A&H89 in a scene = damping ratio at the Bragg wavenumber (Alpers & Huehnerfuss 1989)."""
    sc = fields.open_scene(small)
    out = fields.scene_products(sc, C_BAND, film="natural", cover="everywhere",
                                contrast_model="alpers_huhnerfuss1989")
    ok = np.isfinite(out.sigma0.values)
    np.testing.assert_allclose(10 ** (out.slick_contrast_db.values[ok] / 10),
                               out.damping_ratio.values[ok], rtol=1e-9)


def test_oil_thickness_field_is_used_per_cell():
    ds = greyhaven_scene((24, 32))
    sc = fields.open_scene(ds)
    out = fields.scene_products(sc, C_BAND, film="heavy-crude", contrast_model="balance")
    h = ds.film_thickness.values
    cover = out.film_cover.values == 1
    assert cover.sum() > 5
    thick, thin = cover & (h > 50e-6), cover & (h < 1e-6)
    assert thick.any() and thin.any()
    y = out.damping_ratio.values
    assert np.nanmin(y[thick]) > np.nanmax(y[thin])
    j, i = np.argwhere(cover)[0]
    film = films.film_preset("heavy-crude", thickness=float(h[j, i]))
    w = Water(float(ds.sea_surface_temperature[j, i]) - 273.15,
              float(ds.sea_surface_salinity[j, i]))
    assert y[j, i] == pytest.approx(float(films.damping_ratio(
        float(out.bragg_wavenumber[j, i]), film, w)), rel=1e-9)


def test_missing_and_calm_cells_stay_nan_and_are_counted():
    ds = greyhaven_scene((12, 16), wind_form="speed")
    land = ds.land_binary_mask.values == 1
    calm = np.zeros(land.shape, bool)
    calm[-1, -3:] = True
    ds["wind_speed"] = ds["wind_speed"].where(~calm, 0.2)
    sc = fields.open_scene(ds)
    out = fields.scene_products(sc, C_BAND, film="natural")
    assert out.attrs["cells_missing"] == int(land.sum())
    assert out.attrs["cells_calm"] == int((calm & ~land).sum())
    for name in ("sigma0", "sigma0_db", "bragg_wavelength", "slick_contrast_db",
                 "mean_square_slope"):
        v = out[name].values
        assert np.all(np.isnan(v[land | calm])), name
        assert np.all(np.isfinite(v[~land & ~calm])), name


# ------------------------------------------------------------------------ lazy and eager
def test_dask_chunks_give_the_eager_result(small):
    pytest.importorskip("dask")
    eager = fields.scene_products(fields.open_scene(small), C_BAND, film="mineral-oil")
    lazy_in = small.chunk({"y": 5, "x": 7})
    lazy = fields.scene_products(fields.open_scene(lazy_in), C_BAND, film="mineral-oil")
    assert type(lazy.sigma0.data).__module__.startswith("dask")
    lazy = lazy.compute()
    for name in eager.data_vars:
        a, b = eager[name].values, lazy[name].values
        np.testing.assert_array_equal(np.isnan(a), np.isnan(b))
        # the radar model's wind tabulation depends on the winds of each chunk
        rtol = 5e-3 if name.startswith(("sigma0", "slick")) else 1e-12
        np.testing.assert_allclose(b, a, rtol=rtol, atol=5e-3 if "db" in name else 0,
                                   equal_nan=True, err_msg=name)


# ------------------------------------------------------------------------ files
def _sha(path):
    with open(path, "rb") as fh:
        return hashlib.sha256(fh.read()).hexdigest()


@pytest.fixture(scope="module")
def written(tmp_path_factory):
    d = tmp_path_factory.mktemp("scene")
    src = d / "in.nc"
    ds = greyhaven_scene((12, 16))
    ds.attrs["history"] = "2031-10-02T00:00:00Z: invented by the test"
    ds.to_netcdf(src)
    before = _sha(src)
    out, products, scan = fields.process_scene(str(src), str(d / "out.nc"),
                                               frequency_hz=C_BAND, film="mineral-oil")
    return src, out, before, scan


@pytest.mark.filterwarnings("ignore::DeprecationWarning")
def test_output_passes_the_cf_1_10_checker(written):
    """CF-1.10 (cfconventions.org) via the IOOS compliance-checker, no errors allowed."""
    pytest.importorskip("compliance_checker")
    from compliance_checker.runner import CheckSuite, ComplianceChecker
    import io
    import contextlib
    _, out, _, _ = written
    CheckSuite.load_all_available_checkers()
    buf = io.StringIO()
    with contextlib.redirect_stdout(buf):
        passed, errors = ComplianceChecker.run_checker(
            out, ["cf:1.10"], verbose=0, criteria="normal", output_filename="-",
            output_format="text")
    assert not errors
    assert passed, buf.getvalue()[-3000:]


def test_output_keeps_input_coordinates_attributes_and_history(written):
    src, out, before, scan = written
    assert _sha(src) == before                      # the input is untouched
    with xr.open_dataset(out) as ds, xr.open_dataset(src) as inp:
        for c in ("x", "y", "latitude", "longitude"):
            np.testing.assert_array_equal(ds[c].values, inp[c].values)
            assert ds[c].attrs.get("units") == inp[c].attrs.get("units")
        assert ds.attrs["institution"] == inp.attrs["institution"]
        hist = ds.attrs["history"].splitlines()
        assert hist[0] == inp.attrs["history"] and len(hist) == 2
        assert ds.sigma0.attrs["standard_name"] == \
            "surface_backwards_scattering_coefficient_of_radar_wave"
        assert ds.sigma0.attrs["units"] == "1"
        assert "standard_name" not in ds.sigma0_db.attrs
        assert ds.wind_speed.attrs["standard_name"] == "wind_speed"   # from the table
        assert float(ds.radar_wavelength) == pytest.approx(299792458.0 / C_BAND)
        assert ds.attrs["cells_missing"] == scan.missing
        assert np.isnan(ds.sigma0.values).sum() == scan.missing + scan.calm


def test_interrupted_write_leaves_no_file(tmp_path):
    pytest.importorskip("dask")
    src = tmp_path / "in.nc"
    greyhaven_scene((6, 8)).to_netcdf(src)
    before = sorted(os.listdir(tmp_path))

    def interrupt(delayed):
        raise KeyboardInterrupt
    with pytest.raises(KeyboardInterrupt):
        fields.process_scene(str(src), str(tmp_path / "out.nc"), frequency_hz=C_BAND,
                             chunks={"y": 3}, compute=interrupt)
    assert sorted(os.listdir(tmp_path)) == before


def test_never_writes_over_the_input(tmp_path):
    src = tmp_path / "in.nc"
    greyhaven_scene((6, 8)).to_netcdf(src)
    before = _sha(src)
    with pytest.raises(ValueError, match="is the input file"):
        fields.process_scene(str(src), str(src), frequency_hz=C_BAND, overwrite=True)
    assert _sha(src) == before


def test_lazy_output_is_chunked_like_the_computation(tmp_path):
    pytest.importorskip("dask")
    import netCDF4
    src = tmp_path / "in.nc"
    greyhaven_scene((12, 16)).to_netcdf(src)
    out, _, _ = fields.process_scene(str(src), str(tmp_path / "out.nc"), frequency_hz=C_BAND,
                                     chunks={"y": 4})
    with netCDF4.Dataset(out) as nc:
        assert nc["sigma0"].chunking() == [4, 16]
        assert nc["sigma0"].filters()["zlib"]
