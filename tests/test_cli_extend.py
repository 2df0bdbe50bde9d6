"""``shortwave extend`` end to end, in-process: files in, files out, one-line errors."""
import json

import numpy as np
import pytest
import xarray as xr

from shortwave.cli import main
from shortwave.ncio import write_netcdf
from shortwave.synthetic import greyhaven_spectra, netcdf_encoding


@pytest.fixture()
def spectra_file(tmp_path):
    ds = greyhaven_spectra(4)
    ds["spectrum"][1, 2] = np.nan                  # a missing spectrum
    path = tmp_path / "greyhaven_spectra.nc"
    write_netcdf(ds, path, encoding=netcdf_encoding(ds, packed=True))
    return path


def _one_line_error(capsys):
    err = capsys.readouterr().err.strip()
    assert err.startswith("shortwave extend: error:") and "\n" not in err
    assert "Traceback" not in err
    return err


def test_extend_writes_file_summary_and_figure(spectra_file, tmp_path, capsys):
    out = tmp_path / "extended.nc"
    png = tmp_path / "corrow.png"
    rc = main(["extend", str(spectra_file), "-o", str(out), "--plot", str(png),
               "--plot-at", "station_name=Corrow Bank", "--no-progress"])
    text = capsys.readouterr().out
    assert rc == 0
    assert "12 spectra from" in text and "11 extended, 1 NaN spectra" in text
    assert "mss, tail" in text and f"wrote {png}" in text
    assert png.stat().st_size > 10_000
    ds = xr.open_dataset(out)
    assert np.isnan(ds["significant_wave_height"].values[1, 2])
    assert np.isnan(ds["directional_spectrum"].values[1, 2]).all()
    assert np.isfinite(ds["mean_square_slope"].values).sum() == 11
    assert ds.attrs["Conventions"] == "CF-1.10"
    assert "shortwave" in ds.attrs["history"].splitlines()[-1]
    assert ds.attrs["input_file"] == spectra_file.name
    ds.close()


def test_json_summary_moments_only_and_chunks(spectra_file, tmp_path, capsys):
    pytest.importorskip("dask")
    out = tmp_path / "m.nc"
    rc = main(["extend", str(spectra_file), "-o", str(out), "--format", "json",
               "--moments-only", "--chunk-spectra", "2", "--no-progress"])
    doc = json.loads(capsys.readouterr().out)
    assert rc == 0
    assert doc["counts"] == {"spectra": 12, "nan_spectra": 1, "no_wind": 0, "extended": 11}
    names = [r["quantity"] for r in doc["rows"]]
    assert "mss, extended" in names
    ds = xr.open_dataset(out)
    assert "directional_spectrum" not in ds
    ds.close()
    # chunked and unchunked runs agree
    out2 = tmp_path / "m2.nc"
    assert main(["extend", str(spectra_file), "-o", str(out2), "--moments-only",
                 "--chunk-spectra", "0", "--format", "csv"]) == 0
    a, b = xr.open_dataset(out), xr.open_dataset(out2)
    np.testing.assert_allclose(a["mean_square_slope"].values, b["mean_square_slope"].values,
                               rtol=1e-12)
    a.close()
    b.close()


def test_progress_bar_goes_to_stderr(spectra_file, tmp_path, capsys, monkeypatch):
    pytest.importorskip("dask")
    import shortwave.commands.extend as cmd
    seen = []
    real = cmd._compute_with_progress
    monkeypatch.setattr(cmd, "_compute_with_progress", lambda show: (seen.append(show),
                                                                      real(show))[1])
    assert main(["extend", str(spectra_file), "-o", str(tmp_path / "p.nc"),
                 "--progress"]) == 0
    assert seen == [True]
    assert main(["extend", str(spectra_file), "-o", str(tmp_path / "q.nc")]) == 0
    assert seen[-1] is False          # stderr is not a terminal under pytest


def test_constant_wind_and_wind_file(spectra_file, tmp_path, capsys):
    ds = xr.open_dataset(spectra_file)
    wind = ds[["wind_speed", "wind_direction"]].load()
    ds.drop_vars(["wind_speed", "wind_direction"]).to_netcdf(tmp_path / "nowind.nc")
    wind.to_netcdf(tmp_path / "wind.nc")
    ds.close()
    rc = main(["extend", str(tmp_path / "nowind.nc"), "-o", str(tmp_path / "a.nc")])
    err = _one_line_error(capsys)
    assert rc == 2 and "wind speed is needed" in err and "--wind-speed" in err
    assert main(["extend", str(tmp_path / "nowind.nc"), "-o", str(tmp_path / "a.nc"),
                 "--wind-file", str(tmp_path / "wind.nc")]) == 0
    assert main(["extend", str(tmp_path / "nowind.nc"), "-o", str(tmp_path / "b.nc"),
                 "--wind-speed", "12", "--wind-direction", "250", "--depth", "deep"]) == 0
    b = xr.open_dataset(tmp_path / "b.nc")
    assert np.all(b["wind_speed"].values == 12.0)
    assert b.attrs["depth_source"] == "deep water"
    b.close()


def test_errors_are_one_line(spectra_file, tmp_path, capsys):
    assert main(["extend", str(spectra_file), "-o", str(spectra_file), "--overwrite"]) == 2
    assert "is the input file" in _one_line_error(capsys)
    out = tmp_path / "o.nc"
    out.write_bytes(b"old")
    assert main(["extend", str(spectra_file), "-o", str(out)]) == 2
    assert "exists; pass --overwrite" in _one_line_error(capsys)
    assert main(["extend", str(tmp_path / "none.nc"), "-o", str(tmp_path / "x.nc")]) == 2
    assert "does not exist" in _one_line_error(capsys)
    bad = tmp_path / "half.nc"
    bad.write_bytes(spectra_file.read_bytes()[:5000])
    assert main(["extend", str(bad), "-o", str(tmp_path / "x.nc")]) == 2
    assert "truncated" in _one_line_error(capsys)
    assert main(["extend", str(spectra_file), "-o", str(tmp_path / "x.nc"),
                 "--var", "spectrum=efth"]) == 2
    assert "'efth'" in _one_line_error(capsys)
    assert main(["extend", str(spectra_file), "-o", str(tmp_path / "x.nc"),
                 "--units", "spectrum=furlongs"]) == 2
    assert "furlongs" in _one_line_error(capsys)
    assert main(["extend", str(spectra_file), "-o", str(tmp_path / "x.nc"),
                 "--plot", str(tmp_path / "p.png"), "--plot-at", "station=7"]) == 2
    assert "out of range" in _one_line_error(capsys)
    assert not (tmp_path / "x.nc").exists()      # refused before the run
    assert main(["extend", str(spectra_file), "-o", str(tmp_path / "y.nc"),
                 "--k-max", "1.5"]) == 2
    assert "k_max" in _one_line_error(capsys)


def test_negative_energy_in_file_is_named(tmp_path, capsys):
    ds = greyhaven_spectra(2)
    ds["spectrum"][0, 0, 10, 3] = -1.0
    p = tmp_path / "neg.nc"
    write_netcdf(ds, p, encoding=netcdf_encoding(ds))
    assert main(["extend", str(p), "-o", str(tmp_path / "o.nc"), "--no-progress"]) == 2
    err = _one_line_error(capsys)
    assert "spectrum: negative variance density -1" in err
    assert not (tmp_path / "o.nc").exists()


def test_help_mentions_units_and_roles(capsys):
    with pytest.raises(SystemExit):
        main(["extend", "--help"])
    text = capsys.readouterr().out
    assert "--wind-speed" in text and "ROLE=NAME" in text and "rad/m" in text


def test_distributed_scheduler_address(spectra_file, tmp_path, capsys):
    distributed = pytest.importorskip("distributed")
    cluster = distributed.LocalCluster(n_workers=1, threads_per_worker=2, processes=False,
                                       dashboard_address=":0")
    try:
        out = tmp_path / "dist.nc"
        rc = main(["extend", str(spectra_file), "-o", str(out), "--scheduler",
                   cluster.scheduler_address, "--chunk-spectra", "4"])
    finally:
        cluster.close()
    assert rc == 0
    ref = tmp_path / "local.nc"
    assert main(["extend", str(spectra_file), "-o", str(ref), "--chunk-spectra", "0"]) == 0
    a, b = xr.open_dataset(out), xr.open_dataset(ref)
    np.testing.assert_allclose(a["mean_square_slope"].values, b["mean_square_slope"].values,
                               rtol=1e-12)
    a.close()
    b.close()
