"""``shortwave demo``: run every job on the invented Greyhaven Sound scene.

Builds the scene from code (no downloads), runs the jobs and writes NetCDF files, CSV
tables and PNG figures into one folder, printing each file as it is written.
"""
from __future__ import annotations

import time

NAME = "demo"
HELP = "run every job on the invented Greyhaven Sound scene; write files into one folder"
DESCRIPTION = (
    "Build the invented coastal scene 'Greyhaven Sound' from code (a bay with the headland "
    "Corrow Head sheltering a low-wind zone, a radar swath with incidence 20-45 degrees "
    "across it, the Mistle slick and a few invented wave-model stations), run every "
    "shortwave job on it and write NetCDF, CSV and PNG files into one folder.  Nothing "
    "is downloaded.  Files from an earlier demo run in the same folder are replaced.")


def add_arguments(parser):
    parser.add_argument("--output", "-o", default="shortwave-demo", metavar="FOLDER",
                        help="folder for the files (created if missing)")
    parser.add_argument("--small", action="store_true",
                        help="a smaller scene and fewer points (a quick look)")
    parser.add_argument("--quiet", "-q", action="store_true",
                        help="print only the summary line")


def run(args):
    from ..demo import run_demo

    t0 = time.perf_counter()

    def report(step, products):
        if args.quiet:
            return
        for p in products:
            print(f"wrote {p.path}  ({p.what})")

    products = run_demo(args.output, small=args.small, on_step=report)
    print(f"shortwave demo: {len(products)} files in {args.output} "
          f"({time.perf_counter() - t0:.1f} s)")
    return 0
