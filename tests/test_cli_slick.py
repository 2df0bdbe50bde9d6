"""The ``shortwave slick`` subcommand, run in-process."""
import csv
import io
import json

import numpy as np
import pytest

from shortwave import films as F
from shortwave import slick as S
from shortwave.cli import main
from shortwave.water import Water


def run(capsys, *argv):
    code = main(["slick", *argv])
    out, err = capsys.readouterr()
    return code, out, err


def test_text_table_with_caution_header(capsys):
    code, out, err = run(capsys, "--film", "oleyl-alcohol", "--radar", "C", "X",
                         "--incidence", "30", "--wind", "2", "6", "10")
    assert code == 0
    assert "CAUTION: " + S.CAUTION in out
    lines = [ln for ln in out.splitlines() if ln.strip().startswith(("C ", "X "))]
    assert len(lines) == 6
    # the numbers are those of the library
    kb = S.checked_bragg_wavenumber(9.65e9, 30.0)
    y = F.damping_ratio(kb, "oleyl-alcohol", Water(15.0, 35.0))
    assert f"{y:.4g}" in out


def test_json_has_caution_field_and_values(capsys):
    code, out, _ = run(capsys, "--film", "natural", "--radar", "5.4GHz", "--wind", "4", "8",
                       "--format", "json")
    assert code == 0
    doc = json.loads(out)
    assert doc["caution"] == S.CAUTION
    rows = doc["rows"]
    assert [r["wind_speed"] for r in rows] == [4.0, 8.0]
    expect = S.contrast_db("natural", 5.4e9, 30.0, [4.0, 8.0], water=Water(15.0, 35.0))
    np.testing.assert_allclose([r["contrast_balance"] for r in rows], expect, rtol=1e-9)
    assert rows[0]["contrast_balance"] >= rows[1]["contrast_balance"]


def test_csv_clean_and_caution_on_stderr(capsys):
    code, out, err = run(capsys, "--elasticity", "0.02", "--relaxation-frequency", "2",
                         "--radar", "L", "--incidence", "25", "35", "--format", "csv")
    assert code == 0
    assert "CAUTION" in err and "CAUTION" not in out
    rows = list(csv.DictReader(io.StringIO(out)))
    assert len(rows) == 10 and rows[0]["radar"] == "L"


def test_oil_layer_options_and_plot(capsys, tmp_path):
    png = tmp_path / "y.png"
    code, out, _ = run(capsys, "--film", "light-crude", "--oil-thickness", "5e-4",
                       "--radar", "X", "--wind", "3", "--plot", str(png))
    assert code == 0 and png.stat().st_size > 1000
    assert "thickness 0.0005 m" in out
    code, out, _ = run(capsys, "--oil-thickness", "1e-4", "--oil-viscosity", "0.05",
                       "--oil-density", "880", "--wind", "5")
    assert code == 0 and "custom oil layer" in out


def test_two_scale_column(capsys):
    code, out, _ = run(capsys, "--film", "natural", "--wind", "5", "--two-scale",
                       "--format", "json")
    assert code == 0
    assert json.loads(out)["rows"][0]["contrast_two_scale"] > 0


def test_list_films(capsys):
    code, out, _ = run(capsys, "--list-films")
    assert code == 0
    for name in F.PRESETS:
        assert name in out
    assert "typical" in out


@pytest.mark.parametrize("argv,match", [
    (["--film", "olive"], "choose one of: oleyl-alcohol"),
    (["--radar", "C"], "no film given"),
    (["--film", "natural", "--radar", "HF"], "too low for film damping"),
    (["--film", "natural", "--radar", "13.5MHz"], "too low for film damping"),
    (["--film", "natural", "--oil-thickness", "1e-3"], "do not apply"),
    (["--oil-thickness=-1e-3", "--oil-viscosity", "0.1"], "must be >= 0"),
    (["--elasticity", "-0.01"], "must be >= 0"),
    (["--oil-thickness", "1e-3"], "--oil-viscosity"),
    (["--film", "natural", "--wind", "0"], "wind speed must be > 0"),
    (["--film", "natural", "--radar", "Q"], "Q"),
])
def test_errors_are_one_line(capsys, argv, match):
    code, out, err = run(capsys, *argv)
    assert code == 2
    assert match in err and len(err.strip().splitlines()) == 1
    assert "Traceback" not in err


def test_untrackable_cells_are_reported(capsys):
    code, out, err = run(capsys, "--film", "heavy-crude", "--oil-thickness", "0.01",
                         "--radar", "Ka", "C", "--wind", "5")
    assert code == 0
    assert "could not be followed" in err
    assert "nan" in out


def test_two_scale_contrast_of_a_thick_oil_layer(capsys):
    # thick viscous oil overdamps the shortest waves; those count as fully suppressed
    # (factor 0) instead of failing the whole two-scale computation
    from shortwave.cli import main
    code = main(["slick", "--film", "heavy-crude", "--radar", "C", "--incidence", "30",
                 "--wind", "3", "6", "--two-scale", "--format", "csv"])
    out = capsys.readouterr().out
    assert code == 0
    rows = [ln.split(",") for ln in out.strip().splitlines() if ln and ln[0].isalpha()]
    header = rows[0]
    col = [i for i, h in enumerate(header) if h.startswith("contrast_two_scale")][0]
    vals = [float(r[col]) for r in rows[1:]]
    assert len(vals) == 2 and all(v > 0 for v in vals)
