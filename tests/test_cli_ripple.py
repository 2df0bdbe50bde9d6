"""``shortwave ripple`` through cli.main (in-process) and once through ``python -m``."""
import csv
import io
import json
import subprocess
import sys

import numpy as np
import pytest

from shortwave import dispersion as d
from shortwave.cli import main
from shortwave.commands.ripple import DEFAULT_WAVELENGTHS
from shortwave.water import Water


def run(capsys, *argv):
    code = main(["ripple", *argv])
    out, err = capsys.readouterr()
    return code, out, err


def test_default_text_table(capsys):
    code, out, err = run(capsys)
    assert code == 0 and err == ""
    lines = out.splitlines()
    assert lines[0].startswith("Capillary-gravity waves: 15 degC, 35 g/kg, deep water")
    assert "minimum phase speed" in out and "capillary length" in out
    header = next(i for i, line in enumerate(lines) if line.lstrip().startswith("wavelength"))
    for name in ("wavenumber", "frequency", "period", "phase_speed", "group_speed",
                 "damping_rate", "spatial_damping_rate"):
        assert name in lines[header]
    rows = lines[header + 3:]
    assert len(rows) == len(DEFAULT_WAVELENGTHS)
    assert float(rows[0].split()[0]) == 0.003 and float(rows[-1].split()[0]) == 1.0


def _csv(out):
    return list(csv.DictReader(io.StringIO(out)))


def test_csv_values_match_the_library(capsys):
    code, out, err = run(capsys, "--wavelength", "0.017", "0.05", "--temperature", "20",
                         "--salinity", "0", "--format", "csv")
    assert code == 0 and err == ""
    rows = _csv(out)
    assert len(rows) == 2
    w = Water(20.0, 0.0)
    for row, lam in zip(rows, (0.017, 0.05)):
        k = 2 * np.pi / lam
        assert float(row["wavelength [m]"]) == pytest.approx(lam, rel=1e-7)
        assert float(row["phase_speed [m/s]"]) == pytest.approx(d.phase_speed(k, w), rel=1e-7)
        assert float(row["group_speed [m/s]"]) == pytest.approx(d.group_speed(k, w), rel=1e-7)
        assert float(row["damping_rate [1/s]"]) == pytest.approx(
            d.viscous_damping_rate(k, w), rel=1e-7)
        assert float(row["spatial_damping_rate [1/m]"]) == pytest.approx(
            d.viscous_spatial_damping_rate(k, w), rel=1e-7)
        period, freq = float(row["period [s]"]), float(row["frequency [Hz]"])
        assert period * freq == pytest.approx(1.0, rel=1e-7)


def test_frequency_input_and_depth(capsys):
    code, out, err = run(capsys, "--frequency", "5", "13.5", "--depth", "0.01",
                         "--format", "json")
    assert code == 0 and err == ""
    doc = json.loads(out)
    assert doc["water"]["depth"] == 0.01
    assert doc["units"]["wavenumber"] == "rad/m"
    freqs = [r["frequency"] for r in doc["rows"]]
    assert freqs == pytest.approx([5.0, 13.5], rel=1e-12)
    k = [r["wavenumber"] for r in doc["rows"]]
    np.testing.assert_allclose(d.angular_frequency(np.array(k), Water(15.0, 35.0), 0.01),
                               2 * np.pi * np.array([5.0, 13.5]), rtol=1e-12)


def test_json_is_strict_and_reports_the_water(capsys):
    code, out, _ = run(capsys, "-l", "0.02", "--format", "json")
    assert code == 0
    doc = json.loads(out, parse_constant=lambda c: pytest.fail(f"non-standard JSON {c}"))
    w = Water(15.0, 35.0)
    assert doc["water"]["depth"] is None                     # deep water
    assert doc["water"]["density"] == pytest.approx(w.density, rel=1e-12)
    c_min, k_min = d.minimum_phase_speed(w)
    assert doc["water"]["minimum_phase_speed"] == pytest.approx(c_min, rel=1e-12)
    assert doc["water"]["capillary_length"] == pytest.approx(d.capillary_length(w), rel=1e-12)


def test_overrides_reach_the_table(capsys):
    code, out, _ = run(capsys, "-l", "0.01", "--surface-tension", "0.05", "--density", "1000",
                       "--viscosity", "2e-6", "--format", "json")
    assert code == 0
    doc = json.loads(out)
    assert doc["water"]["surface_tension"] == 0.05
    assert doc["water"]["kinematic_viscosity"] == 2e-6
    k = 2 * np.pi / 0.01
    assert doc["rows"][0]["damping_rate"] == pytest.approx(2 * 2e-6 * k**2, rel=1e-12)
    assert doc["rows"][0]["phase_speed"] == pytest.approx(
        np.sqrt(d.GRAVITY / k + 0.05 / 1000 * k), rel=1e-12)


def test_plot_writes_a_png(capsys, tmp_path):
    path = tmp_path / "figs" / "speeds.png"
    code, out, err = run(capsys, "-l", "0.005", "0.017", "2", "--plot", str(path))
    assert code == 0 and err == ""
    assert path.exists()
    assert path.read_bytes()[:8] == b"\x89PNG\r\n\x1a\n"
    assert str(path) in out


@pytest.mark.parametrize("argv", [["--wavelength", "abc"], ["--wavelength", "-0.01"],
                                  ["--frequency", "0"], ["--depth", "nan"],
                                  ["--temperature", "warm"],
                                  ["--wavelength", "0.01", "--frequency", "5"],
                                  ["--format", "xml"], ["--surface-tension", "-1"]])
def test_bad_input_is_one_line_and_exit_2(capsys, argv):
    code, out, err = run(capsys, *argv)
    assert code == 2
    assert out == ""
    assert len(err.strip().splitlines()) == 1 and "Traceback" not in err


def test_far_out_of_range_water_is_one_line_error(capsys):
    code, out, err = run(capsys, "--temperature", "200")
    assert code == 2
    assert len(err.strip().splitlines()) == 1 and "temperature_c" in err


def test_mildly_out_of_range_water_warns_on_one_line(capsys):
    code, out, err = run(capsys, "-l", "0.01", "--temperature", "42")
    assert code == 0
    lines = err.strip().splitlines()
    assert len(lines) == 1 and "warning" in lines[0] and "[-2, 40]" in lines[0]


def test_python_dash_m_runs():
    proc = subprocess.run([sys.executable, "-m", "shortwave", "ripple", "-l", "0.017",
                           "--format", "csv"], capture_output=True, text=True, timeout=120)
    assert proc.returncode == 0, proc.stderr
    rows = _csv(proc.stdout)
    assert float(rows[0]["wavelength [m]"]) == pytest.approx(0.017)
