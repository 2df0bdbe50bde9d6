"""Speed of the spectrum models and of the moments over many spectra.

Prints points (or spectra) per second and the run time as a multiple of one NumPy pass over
an array of the same size (``k * 1.5 + cos(phi)``, a trivial element-wise expression):

1. :func:`shortwave.spectrum.directional` (Elfouhaily et al. 1997) on N random (k, phi)
   points, k log-uniform in [0.01, 5000] rad/m, each with its own wind speed 3-20 m/s;
2. :func:`shortwave.spectrum.mean_square_slope_components` for M wind speeds (the
   integral is a trailing log-k axis of 2001 points: M x 2001 spectral values);
3. moments (Hs and the three slopes) of M tabulated wave-model-like spectra E(f, theta)
   with 32 frequencies x 24 directions, converted to wavenumber first;
4. the energy-balance model (``yurovskaya2013``): directional values on N/10 points and
   slopes of M/100 spectra (it solves an energy balance on an internal grid per wind).

Nothing is asserted: figures only.

Usage::

    python benchmarks/bench_spectrum.py [--points 1000000] [--spectra 10000]
"""
from __future__ import annotations

import argparse
import time

import numpy as np


def _best(fn, repeat=3):
    best = np.inf
    out = None
    for _ in range(repeat):
        t0 = time.perf_counter()
        out = fn()
        best = min(best, time.perf_counter() - t0)
    return best, out


def _line(label, n, unit, seconds, base):
    print(f"{label:<58s} {n:>9d} {unit:<7s} {seconds:8.3f} s  {n / seconds:13.0f} {unit}/s"
          f"  = {seconds / base:8.1f} array passes")


def main(argv=None):
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--points", type=int, default=1_000_000)
    parser.add_argument("--spectra", type=int, default=10_000)
    parser.add_argument("--seed", type=int, default=2024)
    args = parser.parse_args(argv)

    import shortwave.spectrum as sp
    from shortwave.spectrum import convert, moments

    rng = np.random.default_rng(args.seed)
    n = args.points
    k = 10 ** rng.uniform(-2, np.log10(5000.0), n)
    phi = rng.uniform(0, 360, n)
    u = rng.uniform(3, 20, n)
    base, _ = _best(lambda: k * 1.5 + np.cos(phi))
    print(f"one NumPy pass over {n} points: {base * 1e3:.2f} ms")
    t, _ = _best(lambda: sp.directional(k, phi, u))
    _line("ECKV directional F(k, phi), one wind per point", n, "points", t, base)
    t, _ = _best(lambda: sp.directional(k, phi, 10.0))
    _line("ECKV directional F(k, phi), one wind for all", n, "points", t, base)

    m = args.spectra
    winds = rng.uniform(3, 20, m)
    npts = sp.DEFAULT_POINTS
    big = rng.random((m, npts))
    base_m, _ = _best(lambda: big * 1.5 + np.cos(big))
    print(f"one NumPy pass over {m} x {npts} values: {base_m * 1e3:.1f} ms")
    t, _ = _best(lambda: sp.mean_square_slope_components(winds), repeat=1)
    _line(f"ECKV total/upwind/crosswind mss ({npts} k per spectrum)", m, "spectra", t, base_m)

    # tabulated wave-model-like spectra: 32 geometric frequencies, 24 directions
    f = 0.037 * 1.1 ** np.arange(32)
    th = np.arange(7.5, 360, 15.0)
    E = (sp.pierson_moskowitz1964(f, winds[:, None] * 1.05)[..., None]
         * (np.cos(np.deg2rad(th) / 2) ** 4 / np.sum(np.cos(np.deg2rad(th) / 2) ** 4)
            / np.deg2rad(15.0)))
    base_e, _ = _best(lambda: E * 1.5 + np.cos(E))
    print(f"one NumPy pass over {m} x 32 x 24 values: {base_e * 1e3:.2f} ms")

    def tab():
        F, kk = convert.frequency_to_wavenumber(E, f, th, depth=30.0)
        hs = moments.significant_wave_height(F, kk, th)
        mss = [moments.mean_square_slope_from(F, kk, th, component=c, wind_direction_deg=0.0)
               for c in ("total", "upwind", "crosswind")]
        return hs, mss
    t, _ = _best(tab)
    _line("f->k conversion + Hs + 3 slopes of E(f, theta) 32x24", m, "spectra", t, base_e)

    n2 = max(n // 10, 1)
    t, _ = _best(lambda: sp.directional(k[:n2], phi[:n2], 10.0, model="yurovskaya2013"),
                 repeat=1)
    _line("energy-balance directional F(k, phi), one wind", n2, "points", t, base * n2 / n)
    m2 = max(m // 100, 1)
    t, _ = _best(lambda: sp.mean_square_slope_components(winds[:m2], model="yurovskaya2013",
                                                         n=401), repeat=1)
    _line("energy-balance mss (401 k per spectrum)", m2, "spectra", t, base_m * m2 / m)


if __name__ == "__main__":
    main()
