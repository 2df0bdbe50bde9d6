"""Speed and memory of ``shortwave extend`` (wave-model spectra + capillary-gravity tail).

Prints, for a file of N spectra (36 frequencies x 36 directions, float32, zlib level 1,
invented Greyhaven Sound stations):

* the I/O floor: seconds to read the file with xarray and write the same data to a new
  NetCDF file;
* ``shortwave extend`` end to end (file to file, in-process): seconds, spectra per second
  and the ratio to the I/O floor, with the extended spectra in the output and with
  ``--moments-only``;
* peak resident memory of fresh processes running ``extend`` on files of N and 4 N
  spectra with the same chunk size (bounded by the chunk, not by the file) and, for
  contrast, without chunks.

Nothing is asserted: figures only.  Usage::

    python benchmarks/bench_tail.py [--spectra 10000] [--chunk-spectra 1000] [--keep DIR]
"""
from __future__ import annotations

import argparse
import os
import subprocess
import sys
import tempfile
import time

import numpy as np


def make_file(path, n_spectra):
    """Write N synthetic point spectra (time x 3 stations) like a wave model would."""
    from shortwave.ncio import write_netcdf
    from shortwave.synthetic import greyhaven_spectra, netcdf_encoding
    n_times = int(np.ceil(n_spectra / 3))
    parts = []
    step = 2000
    import xarray as xr
    for start in range(0, n_times, step):   # build in slices to keep this script light
        nt = min(step, n_times - start)
        u = 5.0 + 10.0 * np.abs(np.sin(0.013 * (start + np.arange(nt))))[:, None] * [1, .9, .8]
        wd = np.mod(200.0 + 0.7 * (start + np.arange(nt)), 360.0)[:, None] * [1, 1, 1]
        ds = greyhaven_spectra(nt, wind_speed=u, wind_from_direction=wd,
                               start=str(np.datetime64("2031-10-02T00:00") +
                                         np.timedelta64(start, "h")), step_hours=1)
        parts.append(ds)
    ds = xr.concat(parts, dim="time", data_vars="minimal", coords="minimal",
                   compat="override")
    enc = netcdf_encoding(ds)        # float32, zlib 1, one output time per HDF5 chunk
    write_netcdf(ds, path, encoding=enc, overwrite=True, command="bench_tail make_file")
    return ds.sizes["time"] * ds.sizes["station"]


def io_floor(src, dst):
    """Seconds to read ``src`` with xarray and write the same data to ``dst``."""
    import xarray as xr
    t0 = time.perf_counter()
    ds = xr.open_dataset(src)
    ds.load()
    ds.to_netcdf(dst)
    ds.close()
    return time.perf_counter() - t0


def run_extend(src, dst, *extra):
    import contextlib
    import io
    from shortwave.cli import main
    t0 = time.perf_counter()
    with contextlib.redirect_stdout(io.StringIO()):
        rc = main(["extend", src, "-o", dst, "--overwrite", "--no-progress", *extra])
    dt = time.perf_counter() - t0
    if rc != 0:
        raise SystemExit(f"extend failed with status {rc}")
    return dt


def peak_memory(src, dst, *extra):
    """Peak RSS [MiB] of a fresh Python process running extend (and its own baseline).

    Linux VmHWM of /proc/self/status (the high-water mark of this process image;
    ru_maxrss would include the parent's memory copied at fork).
    """
    code = (
        "import io, contextlib\n"
        "def hwm():\n"
        "    for line in open('/proc/self/status'):\n"
        "        if line.startswith('VmHWM:'):\n"
        "            return int(line.split()[1]) / 1024\n"
        "import shortwave.tail, shortwave.ncio, shortwave.cli, xarray, dask.array\n"
        "import shortwave.commands.extend, shortwave.plots.tail\n"
        "base = hwm()\n"
        "from shortwave.cli import main\n"
        "with contextlib.redirect_stdout(io.StringIO()):\n"
        f"    rc = main(['extend', {src!r}, '-o', {dst!r}, '--overwrite', '--no-progress',"
        f" *{list(extra)!r}])\n"
        "print(rc, base, hwm())\n")
    res = subprocess.run([sys.executable, "-c", code], capture_output=True, text=True,
                         check=False)
    if res.returncode != 0:
        raise SystemExit(res.stderr)
    rc, base, peak = res.stdout.split()[-3:]
    return float(base), float(peak)


def main(argv=None):
    p = argparse.ArgumentParser(description=__doc__.split("\n\n")[0])
    p.add_argument("--spectra", type=int, default=10_000)
    p.add_argument("--chunk-spectra", type=int, default=1000)
    p.add_argument("--keep", default=None, help="folder for the files (default: temporary)")
    p.add_argument("--skip-memory", action="store_true")
    a = p.parse_args(argv)
    folder = a.keep or tempfile.mkdtemp(prefix="bench_tail_")
    os.makedirs(folder, exist_ok=True)
    src = os.path.join(folder, "spectra.nc")
    n = make_file(src, a.spectra)
    mb = os.path.getsize(src) / 2**20
    print(f"input: {n} spectra x 36 frequencies x 36 directions, {mb:.1f} MiB "
          f"({os.cpu_count()} CPUs, chunks of {a.chunk_spectra} spectra)")

    floor = min(io_floor(src, os.path.join(folder, f"copy{i}.nc")) for i in range(2))
    print(f"I/O floor (xarray read + write of the same data): {floor:.2f} s")
    chunk = ["--chunk-spectra", str(a.chunk_spectra)]
    rows = []
    for label, extra in (("extend, spectra + moments", chunk),
                         ("extend, spectra zlib level 1", chunk + ["--compress", "1"]),
                         ("extend --moments-only", chunk + ["--moments-only"]),
                         ("extend, no chunks (in memory)", ["--chunk-spectra", "0"])):
        dst = os.path.join(folder, "out.nc")
        dt = min(run_extend(src, dst, *extra) for _ in range(2))
        out_mb = os.path.getsize(dst) / 2**20
        rows.append((label, dt, n / dt, dt / floor, out_mb))
    print(f"{'run':34s} {'seconds':>8s} {'spectra/s':>10s} {'x floor':>8s} {'output MiB':>11s}")
    for label, dt, rate, ratio, out_mb in rows:
        print(f"{label:34s} {dt:8.2f} {rate:10.0f} {ratio:8.1f} {out_mb:11.1f}")

    if not a.skip_memory:
        big = os.path.join(folder, "spectra_x4.nc")
        n4 = make_file(big, 4 * a.spectra)
        mb4 = os.path.getsize(big) / 2**20
        print("\npeak resident memory of a fresh process (MiB; baseline = after imports):")
        print(f"{'input':34s} {'file MiB':>9s} {'baseline':>9s} {'peak':>8s} {'peak-base':>10s}")
        small = ["--chunk-spectra", str(max(a.chunk_spectra // 4, 1))]
        for label, path, size, extra in (
                (f"{n} spectra, chunks {a.chunk_spectra}", src, mb, chunk),
                (f"{n4} spectra, chunks {a.chunk_spectra}", big, mb4, chunk),
                (f"{n4} spectra, chunks {small[1]}", big, mb4, small),
                (f"{n} spectra, no chunks", src, mb, ["--chunk-spectra", "0"]),
                (f"{n4} spectra, no chunks", big, mb4, ["--chunk-spectra", "0"])):
            base, peak = peak_memory(path, os.path.join(folder, "mem.nc"), *extra)
            print(f"{label:34s} {size:9.1f} {base:9.0f} {peak:8.0f} {peak - base:10.0f}")
        out_chunk = a.chunk_spectra * 226 * 36 * 4 / 2**20
        print(f"(one output chunk of extended spectra: {out_chunk:.0f} MiB in float32)")
    if not a.keep:
        import shutil
        shutil.rmtree(folder, ignore_errors=True)
    return 0


if __name__ == "__main__":
    sys.exit(main())
