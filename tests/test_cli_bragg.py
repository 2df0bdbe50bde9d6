"""``shortwave bragg`` in-process: tables, formats, plot and one-line errors."""
import csv
import io
import json
import math

import pytest

from shortwave.cli import main

C_LIGHT = 299792458.0


def run(capsys, *argv):
    code = main(["bragg", *argv])
    out = capsys.readouterr()
    return code, out.out, out.err


def test_default_table_covers_bands_and_angles(capsys):
    code, out, _ = run(capsys)
    assert code == 0
    for letter in ("L", "S", "C", "X", "Ku", "Ka"):
        assert f"\n{letter:>5}  " in out
    assert "bragg_wavelength" in out and "[m]" in out


def test_csv_values_follow_the_bragg_condition(capsys):
    code, out, _ = run(capsys, "--radar", "C", "5.3GHz", "--incidence", "20:40:10", "--csv")
    assert code == 0
    rows = list(csv.DictReader(io.StringIO(out)))
    assert [r["radar"] for r in rows] == ["C"] * 3 + ["5.3GHz"] * 3
    for r in rows:
        f, th = float(r["frequency [Hz]"]), math.radians(float(r["incidence [deg]"]))
        assert float(r["bragg_wavelength [m]"]) == pytest.approx(
            C_LIGHT / f / (2 * math.sin(th)), rel=1e-7)
    # at 30 deg the Bragg wavelength is the radar wavelength (common practice)
    r30 = rows[1]
    assert float(r30["bragg_wavelength [m]"]) == pytest.approx(
        float(r30["radar_wavelength [m]"]), rel=1e-7)


def test_hf_defaults_to_grazing_with_current_and_depth(capsys):
    code, out, _ = run(capsys, "--radar", "13.5MHz", "--current", "1", "--json")
    assert code == 0
    doc = json.loads(out)
    row = doc["rows"][0]
    assert row["incidence"] == 90.0
    assert row["bragg_wavelength"] == pytest.approx(C_LIGHT / 13.5e6 / 2, rel=1e-9)   # Crombie 1955
    assert row["bragg_frequency"] == pytest.approx(0.102 * math.sqrt(13.5), rel=1e-3)  # HF rule
    shift = (row["doppler_advancing"] + row["doppler_receding"]) / 2
    assert shift == pytest.approx(2 * 13.5e6 / C_LIGHT, rel=1e-9)
    assert doc["units"]["doppler_advancing"] == "Hz" and doc["water"]["depth"] is None
    code, out, _ = run(capsys, "--radar", "4.5MHz", "--depth", "10", "--json")
    shallow = json.loads(out)["rows"][0]["bragg_frequency"]
    assert shallow < 0.102 * math.sqrt(4.5) * 0.99


def test_plot(capsys, tmp_path):
    png = tmp_path / "bragg.png"
    code, out, _ = run(capsys, "--radar", "X", "Ku", "--plot", str(png))
    assert code == 0 and png.stat().st_size > 10000
    assert png.read_bytes()[:8] == b"\x89PNG\r\n\x1a\n" and str(png) in out


@pytest.mark.parametrize("argv,match", [
    (["--radar", "Q"], "band letter"),
    (["--radar", "5 parsecs"], "unit"),
    (["--radar=-5GHz"], "> 0"),
    (["--incidence", "0"], "incidence"),
    (["--incidence", "95"], "incidence"),
    (["--incidence", "40:20:5"], "incidence"),
    (["--depth", "-3"], "depth"),
    (["--format", "xml"], "format"),
])
def test_errors_are_one_line(capsys, argv, match):
    code, out, err = run(capsys, *argv)
    assert code == 2 and out == ""
    assert len(err.strip().splitlines()) == 1 and match in err
    assert "Traceback" not in err
