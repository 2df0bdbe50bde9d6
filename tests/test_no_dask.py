"""The eager paths must run without dask (an optional extra).

dask is hidden from a fresh interpreter (``sys.modules["dask"] = None`` makes ``import dask``
fail and ``importlib.util.find_spec("dask")`` return None, as when it is not installed), so
this test runs even where dask is installed (as it is with the ``test`` extra).
"""
import subprocess
import sys
import textwrap

SCRIPT = textwrap.dedent("""
    import sys
    for name in ("dask", "distributed"):
        sys.modules[name] = None
    from shortwave.cli import main
    sys.exit(main(["demo", "--small", "--output", sys.argv[1]]))
""")


def test_demo_runs_without_dask(tmp_path):
    out = tmp_path / "demo"
    proc = subprocess.run([sys.executable, "-c", SCRIPT, str(out)], capture_output=True,
                          text=True, timeout=600)
    assert proc.returncode == 0, proc.stderr[-2000:]
    written = sorted(p.name for p in out.iterdir())
    assert "stations_extended.nc" in written and "greyhaven_C.nc" in written, written
