"""Oceanographer: from wave-model spectra to the ripples, and slopes over Greyhaven Sound.

User story: an oceanographer has spectral wave-model output at three (invented) stations of
Greyhaven Sound: Greyhaven Outer, Corrow Bank (in the lee of Corrow Head) and Mistle Point.
The model stops at 0.6 Hz, so its mean square slope is far below what the sea surface
really has.  She extends the spectra with a capillary-gravity tail, compares the slopes
with the Cox & Munk (1954) clean-sea regression, and maps the mean square slope over the
bay from the wind field.

Run:  python examples/oceanographer.py [--output FOLDER] [--small]
"""
import argparse
import os

import numpy as np
import xarray as xr

from shortwave import dispersion, fields, ncio
from shortwave.scene_synthetic import greyhaven_scene
from shortwave.synthetic import STATIONS, greyhaven_spectra, netcdf_encoding
from shortwave.tables import format_table
from shortwave.tail import extend_dataset
from shortwave.water import Water


def cox_munk_clean_total(u125):
    """Cox & Munk (1954) clean-sea total mean square slope, 0.003 + 5.12e-3 U12.5."""
    return 0.003 + 5.12e-3 * np.asarray(u125)


def main(argv=None):
    p = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    p.add_argument("--output", default="greyhaven-oceanographer")
    p.add_argument("--small", action="store_true", help="fewer times (quick look)")
    args = p.parse_args(argv)
    os.makedirs(args.output, exist_ok=True)

    # 1. The water of the bay and its ripples
    water = Water(12.0, 33.0)
    c_min, k_min = dispersion.minimum_phase_speed(water)
    print(f"Greyhaven water (12 degC, 33 g/kg): density {water.density:.1f} kg/m3, "
          f"surface tension {water.surface_tension * 1e3:.1f} mN/m; slowest ripple "
          f"{c_min * 100:.1f} cm/s at {2 * np.pi / k_min * 100:.2f} cm")

    # 2. Wave-model spectra at the stations, extended with the tail
    n_times = 2 if args.small else 8
    spectra = greyhaven_spectra(n_times)
    src = os.path.join(args.output, "stations.nc")
    ncio.write_netcdf(spectra, src, overwrite=True, encoding=netcdf_encoding(spectra),
                      command="examples/oceanographer.py (invented stations)")
    ext = extend_dataset(xr.open_dataset(src), input_name=src)
    out = os.path.join(args.output, "stations_extended.nc")
    ncio.write_netcdf(ext, out, inputs=[src], overwrite=True,
                      command="examples/oceanographer.py")
    print(f"wrote {out}")
    mean = ext.mean("time")
    names = [str(n) for n in ext["station_name"].values] if "station_name" in ext \
        else [s[0] for s in STATIONS]
    u10 = mean["wind_speed"].values
    rows = {"station": names, "U10": u10,
            "Hs": mean["significant_wave_height"].values,
            "mss model part": mean["mean_square_slope_resolved"].values,
            "mss extended": mean["mean_square_slope"].values,
            # U12.5 / U10 = 1.02 for a neutral log profile (reference note spectra.md Sect. 2)
            "Cox-Munk clean": cox_munk_clean_total(1.02 * u10)}
    print()
    print(format_table(rows, units={"U10": "m/s", "Hs": "m"}, digits=3,
                       title="Station means: the tail supplies most of the slope variance"))

    # 3. Mean square slope over the bay from the wind field (no radar needed for it)
    scene = fields.open_scene(greyhaven_scene("small" if args.small else "full"))
    products = fields.scene_products(scene, 5.405e9)
    mss = products["mean_square_slope"]
    u = products["wind_speed"]
    lee = u < 4.0
    print(f"\nMean square slope over the bay: {float(mss.min()):.4f} to "
          f"{float(mss.max()):.4f}; in the lee of Corrow Head (wind < 4 m/s) "
          f"{float(mss.where(lee).mean()):.4f}, in open water (wind > 8 m/s) "
          f"{float(mss.where(u > 8).mean()):.4f}")
    path = os.path.join(args.output, "greyhaven_slopes.nc")
    ncio.write_netcdf(products[["wind_speed", "mean_square_slope"]], path, overwrite=True,
                      command="examples/oceanographer.py")
    print(f"wrote {path}")
    return 0


if __name__ == "__main__":
    raise SystemExit(main())
