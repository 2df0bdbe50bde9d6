"""``shortwave demo`` writes every promised file and prints each one."""
import os

import numpy as np
import pytest

from shortwave import cli
from shortwave.demo import run_demo


@pytest.fixture(scope="module")
def demo_run(tmp_path_factory):
    folder = tmp_path_factory.mktemp("demo")
    import io
    from contextlib import redirect_stdout
    buf = io.StringIO()
    with redirect_stdout(buf):
        status = cli.main(["demo", "--small", "--output", str(folder)])
    return folder, status, buf.getvalue()


def test_demo_exits_zero_and_prints_each_file(demo_run):
    folder, status, out = demo_run
    assert status == 0
    written = [line.split()[1] for line in out.splitlines() if line.startswith("wrote ")]
    assert written, out
    for path in written:
        assert os.path.isfile(path) and os.path.getsize(path) > 0, path
        assert os.path.dirname(os.path.abspath(path)) == os.path.abspath(folder)
    on_disk = {f for f in os.listdir(folder) if not f.startswith(".")}
    assert on_disk == {os.path.basename(p) for p in written}


def test_demo_files_are_what_their_names_say(demo_run):
    folder, _, _ = demo_run
    for name in os.listdir(folder):
        path = os.path.join(folder, name)
        with open(path, "rb") as fh:
            head = fh.read(8)
        if name.endswith(".png"):
            assert head == b"\x89PNG\r\n\x1a\n", name
        elif name.endswith(".nc"):
            assert head[:4] == b"\x89HDF", name
        elif name.endswith(".csv"):
            with open(path) as fh:
                lines = fh.read().splitlines()
            assert len(lines) >= 2 and "," in lines[0], name


def test_demo_dispersion_table_has_the_capillary_minimum(demo_run):
    """Phase speed minimum near 23 cm/s at about 1.7 cm (common practice)."""
    folder, _, _ = demo_run
    data = np.genfromtxt(os.path.join(folder, "dispersion.csv"), delimiter=",", names=True)
    c = data["phase_speed_m_s1"]
    lam = data["wavelength_m"]
    i = int(np.argmin(c))
    assert 0.22 < c[i] < 0.24
    assert 0.01 < lam[i] < 0.03
    # above the minimum group speed exceeds phase speed (capillary side), below it is less
    assert np.all(data["group_speed_m_s1"][lam < 0.01] > c[lam < 0.01])
    assert np.all(data["group_speed_m_s1"][lam > 0.05] < c[lam > 0.05])


def test_demo_refuses_a_file_as_folder(tmp_path):
    f = tmp_path / "plain.txt"
    f.write_text("x")
    with pytest.raises(OSError):
        run_demo(str(f), small=True)
    assert f.read_text() == "x"
