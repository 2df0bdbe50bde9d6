"""``shortwave backscatter`` in-process: table, components, formats, plot, errors."""
import csv
import io
import json

import pytest

from shortwave.cli import main
from shortwave.radar import nrcs, to_db
from shortwave.water import Water


def run(capsys, *argv):
    code = main(["backscatter", *argv])
    out = capsys.readouterr()
    return code, out.out, out.err


def test_csv_matches_the_library(capsys):
    code, out, _ = run(capsys, "--radar", "C", "--incidence", "30", "45", "--wind", "8",
                       "--polarization", "VV", "HH", "--azimuth", "0", "90", "--csv")
    assert code == 0
    rows = list(csv.DictReader(io.StringIO(out)))
    assert len(rows) == 2 * 2 * 2
    water = Water(15.0, 35.0)
    for r in rows:
        ref = nrcs(5.405e9, float(r["incidence [deg]"]), 8.0, r["polarization"],
                   float(r["azimuth [deg]"]), water=water)
        assert float(r["sigma0 [1]"]) == pytest.approx(ref, rel=1e-6)
        assert float(r["sigma0_db [dB]"]) == pytest.approx(to_db(ref), abs=1e-5)


def test_text_table_and_physics(capsys):
    code, out, _ = run(capsys, "--incidence", "25:55:10", "--wind", "5", "12", "--json")
    assert code == 0
    doc = json.loads(out)
    rows = doc["rows"]
    vv = {(r["wind_speed"], r["incidence"]): r["sigma0_db"] for r in rows
          if r["polarization"] == "VV"}
    hh = {(r["wind_speed"], r["incidence"]): r["sigma0_db"] for r in rows
          if r["polarization"] == "HH"}
    for th in (25.0, 35.0, 45.0, 55.0):
        assert vv[(12.0, th)] > vv[(5.0, th)]           # rises with wind
        assert vv[(12.0, th)] >= hh[(12.0, th)]         # VV above HH
    assert vv[(12.0, 25.0)] > vv[(12.0, 55.0)]          # falls with incidence
    assert doc["units"]["sigma0_db"] == "dB" and doc["model"] == "two-scale"


def test_components_and_options(capsys):
    code, out, _ = run(capsys, "--incidence", "40", "--wind", "10", "--polarization", "HH",
                       "--components", "--fetch", "50000", "--no-breaking", "--csv")
    assert code == 0
    r = next(csv.DictReader(io.StringIO(out)))
    for col in ("specular_db [dB]", "bragg_db [dB]", "tilted_bragg_db [dB]", "breaking_db [dB]",
                "breaking_fraction [1]"):
        assert col in r
    # without breaking the sum is specular + tilted Bragg
    total = 10 ** (float(r["specular_db [dB]"]) / 10) + 10 ** (float(r["tilted_bragg_db [dB]"]) / 10)
    assert float(r["sigma0 [1]"]) == pytest.approx(total, rel=1e-5)
    code, out, _ = run(capsys, "--incidence", "40", "--wind", "10", "--model", "bragg", "--csv",
                       "--polarization", "vh")
    assert code == 0 and float(next(csv.DictReader(io.StringIO(out)))["sigma0 [1]"]) == 0.0


def test_plot(capsys, tmp_path):
    png = tmp_path / "nrcs.png"
    code, out, _ = run(capsys, "--incidence", "10:60:10", "--wind", "5", "10",
                       "--azimuth", "0", "180", "--plot", str(png), "--format", "csv")
    assert code == 0 and png.stat().st_size > 10000
    assert png.read_bytes()[:4] == b"\x89PNG"


@pytest.mark.parametrize("argv,match", [
    (["--radar", "Zz"], "band letter"),
    (["--incidence", "0"], "incidence"),
    (["--incidence", "90"], "incidence"),
    (["--wind", "-3"], "wind"),
    (["--wind", "0"], "wind"),
    (["--polarization", "RL"], "polarization"),
    (["--model", "nope"], "model"),
    (["--cutoff-ratio", "2"], "cutoff"),
    (["--fetch", "1e4", "--inverse-wave-age", "2"], "fetch"),
])
def test_errors_are_one_line(capsys, argv, match):
    code, out, err = run(capsys, *argv)
    assert code == 2 and out == ""
    assert len(err.strip().splitlines()) == 1 and match in err and "Traceback" not in err
