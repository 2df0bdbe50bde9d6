"""Slick analyst: how dark should the Mistle slick look, and could it be a look-alike?

User story: a dark elongated patch, the (invented) Mistle slick, shows up south-east of
Corrow Head in a C-band image of Greyhaven Sound.  The analyst wants to know how much a
film of a given kind damps the Bragg waves at C and X band, what radar contrast to expect
at the winds of the day, how the contrast inside the patch compares with the darkening of
the wind shadow behind the headland, and what a thick oil layer would look like instead.

A contrast is a screening estimate, not proof of oil: low-wind areas and natural films
look alike.  Decisions rest with trained observers and the responsible authorities.

Run:  python examples/slick_analyst.py [--output FOLDER] [--small]
"""
import argparse
import os

import numpy as np
import xarray as xr

from shortwave import fields, films, radar, slick
from shortwave.plots.maps import scene_overview
from shortwave.scene_synthetic import greyhaven_scene
from shortwave.tables import format_table
from shortwave.water import Water

WATER = Water(12.0, 33.0)                   # Greyhaven surface water
PRESETS = ("natural", "oleyl-alcohol", "mineral-oil")


def main(argv=None):
    p = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    p.add_argument("--output", default="greyhaven-slick-analyst")
    p.add_argument("--small", action="store_true", help="a small scene (quick look)")
    args = p.parse_args(argv)
    os.makedirs(args.output, exist_ok=True)

    # 1. Damping ratio at the Bragg wavenumber, C and X band at 30 degrees
    rows = {"film": [], "C: y(k_B)": [], "X: y(k_B)": []}
    for name in PRESETS:
        rows["film"].append(name)
        for letter in ("C", "X"):
            kb = radar.bragg_wavenumber(radar.band(letter).centre_hz, 30.0)
            rows[f"{letter}: y(k_B)"].append(float(films.damping_ratio(kb, name, WATER)))
    print(format_table(rows, digits=3, title="Damping ratio of the Bragg waves, 30 deg"))

    # 2. Expected contrast against wind (balance of wind input and film damping)
    winds = np.array([2.0, 4.0, 6.0, 8.0, 10.0])
    rows = {"wind": winds}
    for name in PRESETS:
        rows[name] = slick.contrast_db(name, radar.band("C").centre_hz, 30.0, winds,
                                       water=WATER)
    print()
    print(format_table(rows, units={"wind": "m/s", **{n: "dB" for n in PRESETS}}, digits=3,
                       title="C-band contrast at 30 deg, balance model (screening estimate)"))

    # 3. The scene: the Mistle slick as a mineral-oil film, C band VV
    src = os.path.join(args.output, "greyhaven_scene.nc")
    greyhaven_scene("small" if args.small else "full").to_netcdf(src)
    out = os.path.join(args.output, "greyhaven_C_mineral_oil.nc")
    if os.path.exists(out):
        os.remove(out)
    fields.process_scene(src, out, frequency_hz=radar.band("C").centre_hz,
                         film="mineral-oil")
    ds = xr.open_dataset(out).load()
    inside = ds.film_cover == 1
    column_median = ds.sigma0_db.where(~inside).median("y")
    slick_drop = (ds.sigma0_slick_db - column_median).where(inside)
    lee = (ds.wind_speed < 4.0) & ~inside
    lee_drop = (ds.sigma0_db - column_median).where(lee)
    print(f"\nMistle slick: {int(inside.sum())} cells, contrast "
          f"{float(ds.slick_contrast_db.where(inside).min()):.1f} to "
          f"{float(ds.slick_contrast_db.where(inside).max()):.1f} dB; darker than open water "
          f"of the same incidence by {-float(slick_drop.median()):.1f} dB (median).")
    print(f"Wind shadow of Corrow Head (wind < 4 m/s): {int(lee.sum())} cells, darker by "
          f"{-float(lee_drop.median()):.1f} dB (median), with no film at all: a look-alike.")
    print(f"Mean square slope in the slick {float(ds.mean_square_slope_slick.where(inside).mean()):.4f}"
          f" against {float(ds.mean_square_slope.where(inside).mean()):.4f} clean "
          "(Cox & Munk 1954 measured 2-3 times less under artificial slicks).")
    png = scene_overview(ds, os.path.join(args.output, "greyhaven_C_mineral_oil.png"))
    print(f"wrote {png}")

    # 4. What a thick oil layer would give, with the film thickness of the scene
    out2 = os.path.join(args.output, "greyhaven_C_heavy_crude.nc")
    if os.path.exists(out2):
        os.remove(out2)
    fields.process_scene(src, out2, frequency_hz=radar.band("C").centre_hz,
                         film="heavy-crude")
    oil = xr.open_dataset(out2).load()
    h = oil.film_thickness.where(oil.film_cover == 1)
    for lo, hi, what in ((0.0, 1e-6, "sheen below 1 um"), (1e-6, 50e-6, "1-50 um"),
                         (50e-6, 1.0, "thick core above 50 um")):
        sel = (h >= lo) & (h < hi)
        if bool(sel.any()):
            print(f"heavy crude, {what}: {int(sel.sum())} cells, contrast "
                  f"{float(oil.slick_contrast_db.where(sel).mean()):.1f} dB (mean)")
    print("\n" + slick.CAUTION)
    return 0


if __name__ == "__main__":
    raise SystemExit(main())
