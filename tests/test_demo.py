"""``shortwave demo`` runs every job on the invented scene and writes what it promises."""
import io
import os
from contextlib import redirect_stdout

import numpy as np
import pytest
import xarray as xr

from shortwave import cli
from shortwave.demo import demo_steps, run_demo


@pytest.fixture(scope="module")
def demo_run(tmp_path_factory):
    folder = tmp_path_factory.mktemp("demo")
    buf = io.StringIO()
    with redirect_stdout(buf):
        status = cli.main(["demo", "--small", "--output", str(folder)])
    return folder, status, buf.getvalue()


def test_demo_exits_zero_and_prints_each_file(demo_run):
    folder, status, out = demo_run
    assert status == 0, out
    written = [line.split()[1] for line in out.splitlines() if line.startswith("wrote ")]
    assert len(written) >= 20
    for path in written:
        assert os.path.isfile(path) and os.path.getsize(path) > 0, path
        assert os.path.dirname(os.path.abspath(path)) == os.path.abspath(folder)
    on_disk = set(os.listdir(folder))
    assert on_disk == {os.path.basename(p) for p in written}    # no temporary files left
    assert f"{len(written)} files in" in out.splitlines()[-1]


def test_demo_runs_every_job(demo_run):
    folder, _, _ = demo_run
    with open(os.path.join(folder, "README.txt")) as fh:
        readme = fh.read()
    for command in ("ripple", "spectrum", "bragg", "backscatter", "slick", "extend",
                    "scene", "validate"):
        assert f"made by: shortwave {command} " in readme, command
    for name in os.listdir(folder):
        if name != "README.txt":
            assert name in readme, name
    assert demo_steps()[0] == "ripples" and "scene" in demo_steps()


def test_demo_files_are_what_their_names_say(demo_run):
    folder, _, _ = demo_run
    kinds = {".png": 0, ".nc": 0, ".csv": 0}
    for name in os.listdir(folder):
        path = os.path.join(folder, name)
        with open(path, "rb") as fh:
            head = fh.read(8)
        ext = os.path.splitext(name)[1]
        if ext == ".png":
            assert head == b"\x89PNG\r\n\x1a\n", name
        elif ext == ".nc":
            assert head[:4] == b"\x89HDF", name
            with xr.open_dataset(path) as ds:
                assert ds.attrs.get("Conventions") == "CF-1.10", name
                assert ds.attrs.get("history"), name
        elif ext == ".csv":
            with open(path) as fh:
                lines = fh.read().splitlines()
            assert len(lines) >= 2 and "," in lines[0], name
            assert len({ln.count(",") for ln in lines[:1]}) == 1
        kinds[ext] = kinds.get(ext, 0) + 1
    assert kinds[".png"] >= 8 and kinds[".nc"] >= 6 and kinds[".csv"] >= 6


def test_demo_ripple_table_has_the_capillary_minimum(demo_run):
    """Phase-speed minimum about 23 cm/s at about 1.7 cm wavelength (common practice)."""
    folder, _, _ = demo_run
    data = np.genfromtxt(os.path.join(folder, "ripples.csv"), delimiter=",", names=True)
    c = data[data.dtype.names[4]]
    lam = data[data.dtype.names[0]]
    i = int(np.argmin(c))
    assert 0.22 < c[i] < 0.24 and lam[i] == pytest.approx(0.017)


def test_demo_scene_tells_its_story(demo_run):
    """The lee of Corrow Head is darker; a film there is more visible (balance model)."""
    folder, _, _ = demo_run
    with xr.open_dataset(os.path.join(folder, "greyhaven_C.nc")) as c, \
            xr.open_dataset(os.path.join(folder, "greyhaven_X_whatif.nc")) as x:
        u = c.wind_speed.values
        s = c.sigma0_db.values
        # along each column (same incidence) the backscatter follows the wind
        cols = [i for i in range(u.shape[1]) if np.isfinite(u[:, i]).sum() > 5]
        r_col = [np.corrcoef(u[np.isfinite(u[:, i]), i], s[np.isfinite(u[:, i]), i])[0, 1]
                 for i in cols]
        assert np.median(r_col) > 0.8
        assert int(c.attrs["cells_film"]) > 0
        assert float(c.slick_contrast_db.where(c.film_cover == 1).min()) > 1.0
        ok = np.isfinite(x.slick_contrast_db.values) & np.isfinite(x.wind_speed.values)
        r = np.corrcoef(x.wind_speed.values[ok], x.slick_contrast_db.values[ok])[0, 1]
        assert r < -0.3


def test_demo_refuses_a_file_as_folder(tmp_path):
    f = tmp_path / "plain.txt"
    f.write_text("x")
    with pytest.raises(OSError):
        run_demo(str(f), small=True)
    assert f.read_text() == "x"


def test_demo_unknown_step(tmp_path):
    with pytest.raises(ValueError, match="unknown demo step"):
        run_demo(str(tmp_path), steps=["nonsense"])
