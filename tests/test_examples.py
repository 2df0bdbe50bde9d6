"""Each user-story example runs (small scene) and writes what it says."""
import importlib.util
import os

import pytest

EXAMPLES = os.path.join(os.path.dirname(__file__), os.pardir, "examples")


def _load(name):
    spec = importlib.util.spec_from_file_location(f"example_{name}",
                                                  os.path.join(EXAMPLES, f"{name}.py"))
    mod = importlib.util.module_from_spec(spec)
    spec.loader.exec_module(mod)
    return mod


@pytest.mark.parametrize("name, files, phrases", [
    ("radar_analyst", ["greyhaven_C_VV.nc", "greyhaven_C_HH.nc", "greyhaven_C_VV.png"],
     ["Bragg wavelengths", "wind shadow"]),
    ("slick_analyst", ["greyhaven_C_mineral_oil.nc", "greyhaven_C_heavy_crude.nc",
                       "greyhaven_C_mineral_oil.png"],
     ["Damping ratio", "Mistle slick", "look-alike", "not proof of oil"]),
    ("oceanographer", ["stations.nc", "stations_extended.nc", "greyhaven_slopes.nc"],
     ["slowest ripple", "Cox-Munk", "lee of Corrow Head"]),
])
def test_example_runs(name, files, phrases, tmp_path, capsys):
    out = tmp_path / name
    assert _load(name).main(["--output", str(out), "--small"]) == 0
    text = capsys.readouterr().out
    for f in files:
        assert (out / f).is_file() and (out / f).stat().st_size > 0, f
    for phrase in phrases:
        assert phrase in text, phrase
