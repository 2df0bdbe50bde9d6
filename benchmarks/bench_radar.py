"""Speed of the two-scale NRCS over many (wind, incidence, azimuth) cells.

Prints cells per second for :func:`shortwave.radar.nrcs` (two-scale composite, C band,
VV) and the ratio of its run time to one NumPy pass over the same three arrays
(``sin(incidence) * wind + cos(azimuth)``, a trivial element-wise expression), i.e. how
many "array passes" one NRCS evaluation costs.  The slope average is a quadrature held as
an array axis (12 x 6 nodes by default), evaluated in blocks of cells; there is no Python
loop over cells.  Nothing is asserted: figures only.

Usage::

    python benchmarks/bench_radar.py [--cells 1000000] [--nodes 12 6]
"""
from __future__ import annotations

import argparse
import time

import numpy as np


def main(argv=None):
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--cells", type=int, default=1_000_000)
    parser.add_argument("--nodes", type=int, nargs=2, default=(12, 6))
    parser.add_argument("--seed", type=int, default=2024)
    args = parser.parse_args(argv)

    from shortwave.radar import nrcs
    from shortwave.water import Water

    rng = np.random.default_rng(args.seed)
    n = args.cells
    wind = rng.uniform(2.0, 20.0, n)           # continuous winds: tabulated on a 0.05 m/s grid
    inc = rng.uniform(20.0, 60.0, n)
    az = rng.uniform(0.0, 360.0, n)
    water = Water(15.0, 35.0)
    eps = water.permittivity(5.405e9)

    t0 = time.perf_counter()
    base = np.sin(np.deg2rad(inc)) * wind + np.cos(np.deg2rad(az))
    t_numpy = time.perf_counter() - t0

    t0 = time.perf_counter()
    s = nrcs(5.405e9, inc, wind, "VV", az, water=water, permittivity=eps,
             tilt_nodes=tuple(args.nodes))
    t_nrcs = time.perf_counter() - t0

    few = np.round(wind)                       # 19 distinct winds: exact spectra per wind
    t0 = time.perf_counter()
    nrcs(5.405e9, inc, few, "VV", az, water=water, permittivity=eps,
         tilt_nodes=tuple(args.nodes))
    t_few = time.perf_counter() - t0

    assert np.all(np.isfinite(s)) and base.shape == s.shape
    print(f"cells                       : {n:,}")
    print(f"slope quadrature nodes      : {args.nodes[0]} x {args.nodes[1]}")
    print(f"one NumPy pass              : {t_numpy:.3f} s")
    print(f"two-scale NRCS (continuous) : {t_nrcs:.2f} s = {n / t_nrcs:,.0f} cells/s, "
          f"{t_nrcs / t_numpy:,.0f} x one NumPy pass")
    print(f"two-scale NRCS (19 winds)   : {t_few:.2f} s = {n / t_few:,.0f} cells/s, "
          f"{t_few / t_numpy:,.0f} x one NumPy pass")


if __name__ == "__main__":
    main()
