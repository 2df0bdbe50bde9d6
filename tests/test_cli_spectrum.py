"""``shortwave spectrum`` through cli.main (in-process)."""
import csv
import io
import json

import numpy as np
import pytest

import shortwave.spectrum as sp
from shortwave.cli import main


def run(capsys, *argv):
    code = main(["spectrum", *argv])
    out, err = capsys.readouterr()
    return code, out, err


def _csv(out):
    return list(csv.DictReader(io.StringIO(out)))


def test_text_table(capsys):
    code, out, err = run(capsys, "-u", "10")
    assert code == 0 and err == ""
    assert out.startswith("Wind-wave spectrum, model elfouhaily1997, inverse wave age 0.84")
    for name in ("significant_wave_height", "mean_square_slope_upwind", "peak_wavenumber"):
        assert name in out


def test_csv_values_match_library(capsys):
    code, out, _ = run(capsys, "-u", "5", "10", "--format", "csv")
    assert code == 0
    rows = _csv(out)
    assert [float(r["wind_speed [m/s]"]) for r in rows] == [5.0, 10.0]
    r = rows[1]
    assert float(r["mean_square_slope [1]"]) == pytest.approx(sp.mean_square_slope(10.0),
                                                              rel=1e-6)
    assert float(r["mean_square_slope_upwind [1]"]) + float(
        r["mean_square_slope_crosswind [1]"]) == pytest.approx(
        float(r["mean_square_slope [1]"]), rel=1e-6)
    assert float(r["peak_wavenumber [rad/m]"]) == pytest.approx(0.069219, abs=1e-6)
    # Hs of the fully developed ECKV spectrum at 10 m/s, k_p/50..1e4 (independent
    # re-computation, reference note Sect. 6.3: 2.6332 m over k_p/50..7400)
    assert float(r["significant_wave_height [m]"]) == pytest.approx(2.6332, rel=1e-3)


def test_fetch_and_json(capsys):
    code, out, _ = run(capsys, "-u", "10", "--fetch", "100", "--format", "json")
    assert code == 0
    doc = json.loads(out)
    assert doc["model"] == "elfouhaily1997"
    row = doc["rows"][0]
    # ECKV Eq. 37, reference note Sect. 1.7: Omega(10 m/s, 100 km) = 1.2032
    assert row["inverse_wave_age"] == pytest.approx(1.2032, abs=5e-5)
    assert doc["units"]["mean_square_slope"] == "1"


def test_second_model(capsys):
    code, out, _ = run(capsys, "-u", "10", "--model", "yurovskaya2013", "--points", "401",
                       "--format", "csv")
    assert code == 0
    r = _csv(out)[0]
    assert float(r["mean_square_slope [1]"]) == pytest.approx(
        sp.mean_square_slope(10.0, model="yurovskaya2013", n=401), rel=1e-6)


def test_netcdf_and_plot(capsys, tmp_path):
    import xarray as xr
    nc, png = tmp_path / "spec.nc", tmp_path / "b.png"
    code, out, err = run(capsys, "-u", "7", "12", "--output", str(nc), "--plot", str(png),
                         "--bands", "C", "Ku", "--incidence", "30", "45", "--directions", "36")
    assert code == 0, err
    assert f"wrote {nc}" in out and f"wrote {png}" in out
    assert png.read_bytes()[:8] == b"\x89PNG\r\n\x1a\n"
    with xr.open_dataset(nc) as ds:
        assert ds.attrs["Conventions"] == "CF-1.10" and "history" in ds.attrs
        assert ds["omnidirectional_spectrum"].attrs["units"] == "m3"
        assert ds["directional_spectrum"].attrs["units"] == "m3 rad-1"
        assert ds["significant_wave_height"].attrs["standard_name"] == \
            "sea_surface_wave_significant_height"
        assert ds["directional_spectrum"].shape == (2, 2001, 36)
        k = ds["wavenumber"].values
        # the file's F(k, phi) integrates over direction to S(k) and B = k^3 S
        F = ds["directional_spectrum"].values
        S = ds["omnidirectional_spectrum"].values
        np.testing.assert_allclose(F.sum(-1) * np.deg2rad(10.0), S, rtol=1e-10, atol=1e-290)
        np.testing.assert_allclose(ds["curvature_spectrum"].values, S * k**3, rtol=1e-12)
        hs = 4 * np.sqrt(np.trapezoid(S[1], k))
        assert hs == pytest.approx(float(ds["significant_wave_height"][1]), rel=1e-3)
    # no silent overwrite
    code, _, err = run(capsys, "-u", "7", "--output", str(nc))
    assert code == 2 and "exists" in err and len(err.strip().splitlines()) == 1
    code, _, _ = run(capsys, "-u", "7", "--output", str(nc), "--overwrite")
    assert code == 0


@pytest.mark.parametrize("argv, match", [
    (["-u", "0"], "wind speed must be > 0"),
    (["-u", "nan"], "wind speed must be finite"),
    (["-u", "-4"], "wind speed must be > 0"),
    (["-u", "10", "--fetch", "0"], "fetch must be > 0"),
    (["-u", "10", "--inverse-wave-age", "-1"], "inverse wave age must be > 0"),
    (["-u", "10", "--fetch", "10", "--inverse-wave-age", "2"], "not allowed with argument"),
    (["-u", "10", "--k-min", "100", "--k-max", "10"], "--k-max: must exceed --k-min"),
    (["-u", "10", "--points", "5"], "--points: at least 11"),
    (["-u", "10", "--plot", "x.png", "--bands", "Q"], "frequency: cannot read 'Q'"),
    (["-u", "10", "--model", "pm"], "invalid choice"),
    ([], "required"),
])
def test_bad_input_one_line(capsys, tmp_path, monkeypatch, argv, match):
    monkeypatch.chdir(tmp_path)
    code, out, err = run(capsys, *argv)
    assert code == 2
    assert match in err and len(err.strip().splitlines()) == 1
    assert "Traceback" not in err


def test_validity_warning(capsys):
    code, out, err = run(capsys, "-u", "10", "--inverse-wave-age", "7")
    assert code == 0
    assert err.count("warning: inverse_wave_age outside the validity range") == 1
