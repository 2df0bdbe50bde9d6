"""Speed of the film-damping solvers over many (k, film) pairs.

Prints, for the visco-elastic film relation (temporal and spatial roots) and for the
two-layer oil model: solves per second, Newton iterations per solve (mean and maximum),
the share of inputs that needed continuation in E, and the run time as a multiple of one
NumPy pass over the same arrays (``sqrt(k**2 + e0 * wd)``, a trivial element-wise
expression).  Random inputs: k log-uniform in [1, 2e4] rad/m, E0 log-uniform in
[1e-5, 10] N/m, half of the films with diffusional relaxation (omega_D 0.01-1000 rad/s),
30 % with a surface dilational viscosity.  ``--method continuation`` forces the slow,
always-continued path for comparison.  Nothing is asserted: figures only.

Usage::

    python benchmarks/bench_films.py [--pairs 1000000] [--oil-pairs 20000]
"""
from __future__ import annotations

import argparse
import time

import numpy as np


def _report(label, n, seconds, info, base):
    its = np.asarray(info["iterations"])
    cont = np.asarray(info["continued"])
    print(f"{label:<34s} {n:>9d} pairs  {seconds:7.2f} s  {n / seconds:12.0f} solves/s  "
          f"iterations mean {its.mean():5.2f} max {its.max():4d}  continued "
          f"{100 * cont.mean():5.2f} %  = {seconds / base:7.0f} array passes")


def main(argv=None):
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--pairs", type=int, default=1_000_000)
    parser.add_argument("--oil-pairs", type=int, default=20_000)
    parser.add_argument("--method", choices=("auto", "continuation"), default="auto")
    parser.add_argument("--seed", type=int, default=2024)
    args = parser.parse_args(argv)

    from shortwave import films as F
    from shortwave.dispersion import angular_frequency
    from shortwave.water import Water

    rng = np.random.default_rng(args.seed)
    n = args.pairs
    k = 10 ** rng.uniform(0.0, np.log10(2e4), n)
    e0 = 10 ** rng.uniform(-5, 1, n)
    wd = np.where(rng.random(n) < 0.5, 0.0, 10 ** rng.uniform(-2, 3, n))
    kap = np.where(rng.random(n) < 0.7, 0.0, 10 ** rng.uniform(-8, -3, n))
    film = F.Monolayer(e0, wd, kap)
    water = Water(15.0, 35.0)

    t0 = time.perf_counter()
    for _ in range(5):
        np.sqrt(k**2 + e0 * wd)
    base = (time.perf_counter() - t0) / 5

    print(f"shortwave film damping benchmark, method={args.method}, one array pass "
          f"{base * 1e3:.1f} ms for {n} elements")
    t0 = time.perf_counter()
    _, info = F.complex_frequency(k, film, water, method=args.method, full_output=True)
    _report("temporal root (complex omega)", n, time.perf_counter() - t0, info, base)

    om = np.asarray(angular_frequency(k, water))
    t0 = time.perf_counter()
    _, info = F.complex_wavenumber(om, film, water, method=args.method, full_output=True)
    _report("spatial root (complex k)", n, time.perf_counter() - t0, info, base)

    t0 = time.perf_counter()
    F.damping_ratio(k, film, water)
    dt = time.perf_counter() - t0
    print(f"{'damping ratio (film + clean roots)':<34s} {n:>9d} pairs  {dt:7.2f} s  "
          f"{n / dt:12.0f} ratios/s")

    m = args.oil_pairs
    ko = 10 ** rng.uniform(1.0, 3.0, m)
    h = 10 ** rng.uniform(-7, -3, m)
    oil = F.OilLayer(thickness=h, viscosity=10 ** rng.uniform(-3, -1, m),
                     density=rng.uniform(820, 950, m))
    t0 = time.perf_counter()
    _, info = F.complex_frequency(ko, oil, water, full_output=True, on_failure="nan")
    dt = time.perf_counter() - t0
    _report("oil layer, two-layer model", m, dt, info, base * m / n)
    print(f"    ({np.count_nonzero(info['failed'])} of {m} oil inputs not trackable "
          "(overdamped) -> NaN)")


if __name__ == "__main__":
    main()
