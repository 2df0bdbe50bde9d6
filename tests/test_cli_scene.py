"""The ``scene`` command end to end: NetCDF in, NetCDF (and PNG) out."""
import os

import numpy as np
import pytest
import xarray as xr

from shortwave import cli
from shortwave.scene_synthetic import greyhaven_scene


@pytest.fixture()
def scene_file(tmp_path):
    path = tmp_path / "greyhaven.nc"
    greyhaven_scene((12, 16)).to_netcdf(path)
    return path


def test_scene_writes_products_table_and_maps(scene_file, tmp_path, capsys):
    out, png = tmp_path / "out.nc", tmp_path / "maps.png"
    status = cli.main(["scene", str(scene_file), "-o", str(out), "--radar", "X",
                       "--polarization", "hh", "--film", "natural", "--plot", str(png)])
    text = capsys.readouterr().out
    assert status == 0
    assert f"wrote {out}" in text and f"wrote {png}" in text
    for name in ("sigma0_db", "slick_contrast_db", "bragg_wavelength", "mean_square_slope"):
        assert name in text
    assert "not proof of oil" in text
    with xr.open_dataset(out) as ds:
        assert ds.attrs["polarization"] == "HH" and ds.attrs["radar_band"] == "X"
        assert ds.sigma0.attrs["polarization"] == "HH"
        assert ds.attrs["film"] == "natural"
    with open(png, "rb") as fh:
        assert fh.read(8) == b"\x89PNG\r\n\x1a\n"


def test_quiet_prints_nothing(scene_file, tmp_path, capsys):
    status = cli.main(["scene", str(scene_file), "-o", str(tmp_path / "o.nc"), "--quiet"])
    out, err = capsys.readouterr()
    assert status == 0 and out == "" and err == ""


def test_overrides_swath_and_look_direction_on_the_command_line(tmp_path, capsys):
    ds = greyhaven_scene((6, 8), wind_form="speed").drop_vars(
        ["incidence_angle", "sensor_azimuth_angle"])
    ds = ds.rename({"wind_speed": "U", "wind_from_direction": "D"})
    for v in ("U", "D"):
        ds[v].attrs.pop("standard_name")
    ds["U"].attrs["units"] = "knots"
    src = tmp_path / "odd.nc"
    ds.to_netcdf(src)
    out = tmp_path / "out.nc"
    status = cli.main(["scene", str(src), "-o", str(out), "--var", "wind_speed=U",
                       "--var", "wind_direction=D", "--swath", "20,45",
                       "--look-azimuth", "90", "--quiet"])
    assert status == 0, capsys.readouterr().err
    with xr.open_dataset(out) as res:
        np.testing.assert_allclose(res.wind_speed.values, ds["U"].values * 1852 / 3600,
                                   rtol=1e-12)
        inc = res.incidence_angle.values
        assert np.nanmin(inc) == pytest.approx(20.0) and np.nanmax(inc) == pytest.approx(45.0)


def test_existing_output_needs_overwrite(scene_file, tmp_path, capsys):
    out = tmp_path / "o.nc"
    assert cli.main(["scene", str(scene_file), "-o", str(out), "-q"]) == 0
    first = os.path.getmtime(out)
    assert cli.main(["scene", str(scene_file), "-o", str(out), "-q"]) == 2
    assert "exists" in capsys.readouterr().err
    assert cli.main(["scene", str(scene_file), "-o", str(out), "-q", "--overwrite"]) == 0
    assert os.path.getmtime(out) >= first


def test_chunks_give_the_same_file(scene_file, tmp_path):
    pytest.importorskip("dask")
    a, b = tmp_path / "a.nc", tmp_path / "b.nc"
    assert cli.main(["scene", str(scene_file), "-o", str(a), "-q"]) == 0
    assert cli.main(["scene", str(scene_file), "-o", str(b), "--chunks", "y:4,x:8",
                     "--progress"]) == 0
    with xr.open_dataset(a) as x, xr.open_dataset(b) as y:
        for name in ("bragg_wavenumber", "mean_square_slope", "wind_azimuth"):
            np.testing.assert_array_equal(x[name].values, y[name].values)
        np.testing.assert_allclose(x.sigma0.values, y.sigma0.values, rtol=5e-3)


def test_interrupted_run_leaves_no_output(scene_file, tmp_path, monkeypatch, capsys):
    pytest.importorskip("dask")
    from shortwave.commands import scene as cmd

    def interrupted(progress, client):
        def compute(delayed):
            raise KeyboardInterrupt
        return compute
    monkeypatch.setattr(cmd, "_computer", interrupted)
    before = sorted(os.listdir(tmp_path))
    status = cli.main(["scene", str(scene_file), "-o", str(tmp_path / "o.nc"),
                       "--chunks", "y:4"])
    assert status == 130
    assert "interrupted" in capsys.readouterr().err
    assert sorted(os.listdir(tmp_path)) == before


def test_local_cluster_of_one_worker(scene_file, tmp_path, capsys):
    pytest.importorskip("distributed")
    a, b = tmp_path / "a.nc", tmp_path / "b.nc"
    assert cli.main(["scene", str(scene_file), "-o", str(a), "-q"]) == 0
    status = cli.main(["scene", str(scene_file), "-o", str(b), "-q", "--scheduler",
                       "local:1", "--chunks", "y:6"])
    assert status == 0, capsys.readouterr().err
    with xr.open_dataset(a) as x, xr.open_dataset(b) as y:
        np.testing.assert_array_equal(x.bragg_wavelength.values, y.bragg_wavelength.values)
        np.testing.assert_allclose(x.sigma0.values, y.sigma0.values, rtol=5e-3)


def test_large_inputs_are_read_in_chunks(scene_file, monkeypatch):
    pytest.importorskip("dask")
    from shortwave.commands import scene as cmd
    assert cmd._auto_chunks(str(scene_file)) is None          # 192 cells: all at once
    monkeypatch.setattr(cmd, "LAZY_CELLS", 100)
    assert cmd._auto_chunks(str(scene_file)) == "auto"
