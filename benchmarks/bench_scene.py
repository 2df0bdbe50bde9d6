"""Speed, memory and scale of whole-scene processing (prints figures; asserts nothing).

1. Throughput: a Greyhaven scene of ``--cells`` cells (default 10^6): two-scale NRCS of the
   clean sea plus the slick contrast of a film over every sea cell (two-scale with the film
   factor, i.e. two NRCS evaluations per sea cell), written to NetCDF.  Cells per second,
   and the ratio to the I/O floor: reading the inputs and writing an output of the same
   size and encoding without any computation.
2. Memory: peak resident memory of the lazy (dask, threads) run of a scene of 10 chunks,
   against the lazy run of a scene of one chunk and the eager (one array) run.
3. Scale: a local dask.distributed cluster of 1 and of 2 worker processes (one thread
   each): wall time of the computation alone and with the NetCDF write, and the speed-up.

Each measurement runs in a fresh Python process so that peak memory is its own.  The
machine's load average is printed: other work on the machine slows every figure down.

Run:  python benchmarks/bench_scene.py [--cells N] [--skip-distributed]
"""
import argparse
import json
import os
import subprocess
import sys
import tempfile

CHILD = r"""
import json, resource, sys, time
args = json.loads(sys.argv[1])
mode, src, out = args["mode"], args["src"], args["out"]
res = {}
t0 = time.perf_counter()
if mode == "io-floor":
    import xarray as xr
    from shortwave import ncio
    ds = ncio.open_input(src).load()
    template = ds["eastward_wind"]
    outs = xr.Dataset({f"v{i}": template.copy() + i for i in range(args["n_out"])},
                      coords={c: ds.coords[c] for c in template.coords})
    ncio.write_netcdf(outs, out, overwrite=True)
else:
    from shortwave import fields
    job = dict(frequency_hz=5.405e9, polarization="VV", film="natural", cover="everywhere",
               contrast_model="two-scale")
    client = cluster = None
    compute = True
    if mode == "distributed":
        client, cluster = fields.start_local_cluster(args["workers"])
        t0 = time.perf_counter()                      # cluster start-up not counted
        compute = lambda d: client.compute(d).result()
    if args.get("threads"):
        import dask
        dask.config.set(scheduler="threads", num_workers=args["threads"])
    if args.get("write", True):
        path, products, scan = fields.process_scene(src, out, chunks=args.get("chunks"),
                                                    overwrite=True, compute=compute, **job)
    else:                                             # computation only, kept on workers
        from distributed import wait
        scene = fields.open_scene(src, chunks=args.get("chunks"))
        scan = fields.scan_scene(scene)
        products = fields.scene_products(scene, scan=scan, **job)
        wait(client.persist([v.data for v in products.data_vars.values()]))
    res["n_out"] = len(products.data_vars)
    res["cells"] = scan.cells
    res["sea_cells"] = scan.cells - scan.missing - scan.calm
    if client is not None:
        client.close()
        cluster.close()
res["seconds"] = time.perf_counter() - t0
res["peak_rss_mb"] = resource.getrusage(resource.RUSAGE_SELF).ru_maxrss / 1024.0
print(json.dumps(res))
"""


def run_child(**kw):
    p = subprocess.run([sys.executable, "-c", CHILD, json.dumps(kw)], capture_output=True,
                       text=True)
    if p.returncode != 0:
        raise RuntimeError(p.stderr.strip().splitlines()[-1] if p.stderr else "failed")
    return json.loads(p.stdout.strip().splitlines()[-1])


def _load():
    return "load average %.1f / %.1f / %.1f" % os.getloadavg()


def main(argv=None):
    ap = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    ap.add_argument("--cells", type=float, default=1e6, help="cells in the scene")
    ap.add_argument("--skip-distributed", action="store_true")
    ap.add_argument("--parts", default="1,2,3", help="which measurements, e.g. 1,3")
    args = ap.parse_args(argv)
    parts = {int(p) for p in args.parts.split(",")}
    import numpy as np
    from shortwave.scene_synthetic import greyhaven_scene

    n = int(round(np.sqrt(args.cells)))
    ny, nx = n, n
    chunk_rows = int(np.ceil(ny / 10))
    work = tempfile.mkdtemp(prefix="shortwave-bench-")
    src = os.path.join(work, "scene.nc")
    greyhaven_scene((ny, nx)).to_netcdf(src)
    one = os.path.join(work, "one_chunk.nc")
    greyhaven_scene((chunk_rows, nx)).to_netcdf(one)
    print(f"scene: {ny} x {nx} = {ny * nx:,} cells, input file "
          f"{os.path.getsize(src) / 2**20:.0f} MB; {os.cpu_count()} CPU cores; {_load()}")
    out = os.path.join(work, "out.nc")

    # 1. throughput, eager, and the I/O floor
    if parts & {1, 2}:
        eager = run_child(mode="eager", src=src, out=out)
        floor = run_child(mode="io-floor", src=src, out=os.path.join(work, "floor.nc"),
                          n_out=eager["n_out"])
    if 1 in parts:
        _report_throughput(eager, floor)
    if 2 in parts:
        _report_memory(eager, floor, src, one, out, work, chunk_rows, nx)
    if 3 in parts and not args.skip_distributed:
        _report_distributed(src, out, ny)
    for f in os.listdir(work):
        os.remove(os.path.join(work, f))
    os.rmdir(work)
    return 0


def _report_throughput(eager, floor):
    rate = eager["cells"] / eager["seconds"]
    print(f"\n1. two-scale NRCS + slick contrast (film on all {eager['sea_cells']:,} sea "
          f"cells), eager, one process:")
    print(f"   {eager['seconds']:.1f} s  ->  {rate:,.0f} cells/s "
          f"({eager['sea_cells'] / eager['seconds']:,.0f} sea cells/s)")
    print(f"   I/O floor (read the inputs, write {eager['n_out']} output variables of the "
          f"same size and encoding): {floor['seconds']:.2f} s  ->  the job takes "
          f"{eager['seconds'] / floor['seconds']:.1f} x the I/O floor")


def _report_memory(eager, floor, src, one, out, work, chunk_rows, nx):
    """A scene of 10 chunks against a scene of one chunk (lazy) and the eager run."""
    chunks = {"y": chunk_rows}
    lazy10 = run_child(mode="lazy", src=src, out=out, chunks=chunks, threads=1)
    lazy1 = run_child(mode="lazy", src=one, out=os.path.join(work, "one_out.nc"),
                      chunks=chunks, threads=1)
    lazy10t = run_child(mode="lazy", src=src, out=out, chunks=chunks)
    print(f"\n2. peak resident memory, chunks of {chunk_rows} x {nx} = {chunk_rows * nx:,} "
          "cells:")
    print(f"   lazy, one thread: scene of 10 chunks {lazy10['peak_rss_mb']:.0f} MB "
          f"({lazy10['seconds']:.1f} s), scene of 1 chunk {lazy1['peak_rss_mb']:.0f} MB")
    print(f"   lazy, {os.cpu_count()} threads: scene of 10 chunks "
          f"{lazy10t['peak_rss_mb']:.0f} MB ({lazy10t['seconds']:.1f} s)")
    print(f"   eager (one array of 10 chunks' size): {eager['peak_rss_mb']:.0f} MB;"
          f"  I/O floor process: {floor['peak_rss_mb']:.0f} MB")


def _report_distributed(src, out, ny):
    """Local dask.distributed cluster, 1 and 2 workers."""
    chunks = {"y": -(-ny // 20)}
    res = {}
    for workers in (1, 2):
        for write in (False, True):
            res[workers, write] = run_child(mode="distributed", src=src, out=out,
                                            chunks=chunks, workers=workers, write=write)
    print(f"\n3. local dask.distributed cluster, 20 chunks, one thread per worker "
          f"({_load()}):")
    for write, what in ((False, "computation only"), (True, "with the NetCDF write")):
        a, b = res[1, write]["seconds"], res[2, write]["seconds"]
        print(f"   {what}: 1 worker {a:.1f} s, 2 workers {b:.1f} s  ->  speed-up "
              f"{a / b:.2f}x")


if __name__ == "__main__":
    raise SystemExit(main())
