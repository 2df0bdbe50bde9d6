"""``shortwave slick``: film damping and the radar contrast of a slick.

For a film (a preset or its parameters, or an oil layer) and a radar (band letter or
frequency, incidence angles), prints the damping ratio at the Bragg wavenumber and the
slick contrast in dB against wind speed, from the Alpers & Huehnerfuss (1989) relation and
from the wind-input/dissipation balance (with its bound), optionally also from the
two-scale backscatter model.  ``--plot`` draws y(k) with the Bragg wavenumbers of the
common bands marked.  Every output carries the caution of :data:`shortwave.slick.CAUTION`.
"""
from __future__ import annotations

import warnings
from functools import partial

import numpy as np

from ..tables import format_table
from ._common import (add_film_arguments, add_format_arguments, add_water_arguments, number,
                      parse_radar, print_table, report_warnings, report_written,
                      water_from_args)

NAME = "slick"
HELP = "film damping ratio and radar slick contrast against wind (screening estimate)"
DESCRIPTION = (
    "Damping of short waves by a surface film and the radar contrast of the slick. Give a "
    "film preset (--film, see --list-films), monolayer parameters (--elasticity, "
    "--relaxation-frequency, ...) or an oil layer (--oil-thickness, --oil-viscosity, ...), "
    "a radar (--radar C, X, L, 5.4GHz ...) and incidence angles. Prints, per radar, "
    "incidence and wind speed: the Bragg wavenumber (rad/m), the damping ratio y at the "
    "Bragg wavenumber (film/clean, temporal), and the contrast 10 log10(sigma0_clean / "
    "sigma0_slick) in dB from Alpers & Huehnerfuss (1989) (= y) and from the balance of "
    "wind input and dissipation (bounded where wind input falls below film damping). "
    "A screening estimate, not proof of oil.")

UNITS = {"radar": "", "frequency": "GHz", "incidence": "deg", "bragg_wavenumber": "rad/m",
         "bragg_wavelength": "cm", "wind_speed": "m/s", "damping_ratio": "1",
         "contrast_ah89": "dB", "contrast_balance": "dB", "balance_bound": "",
         "contrast_two_scale": "dB"}

COMMON_BANDS = ("L", "S", "C", "X", "Ku")
"""Bands whose Bragg wavenumbers are marked on the plot."""


_number = partial(number, positive=True)
"""argparse type: a finite float, > 0 (``nonnegative=True``: >= 0; ``positive=False``: any)."""


def add_arguments(parser):
    film = parser.add_argument_group("film (one of: --film, monolayer parameters, oil layer)")
    film.add_argument("--film", metavar="NAME", default=None,
                      help="film preset (typical values of a class of film); --list-films "
                      "shows them")
    film.add_argument("--list-films", action="store_true",
                      help="list the film presets with their values, ranges and sources")
    add_film_arguments(film)
    parser.add_argument("--radar", nargs="+", default=["C"], metavar="BAND|FREQ",
                        help="radar band letters or frequencies (C, X, L, Ku, 5.4GHz, ...)")
    parser.add_argument("--incidence", nargs="+", type=_number("incidence"), default=[30.0],
                        metavar="DEG", help="incidence angles [degree], 20-60 for Bragg")
    parser.add_argument("--wind", nargs="+", type=_number("wind speed"),
                        default=[2.0, 4.0, 6.0, 8.0, 10.0], metavar="M/S",
                        help="wind speeds U10 [m/s]")
    parser.add_argument("--azimuth", type=_number("azimuth", positive=False), default=0.0,
                        metavar="DEG", help="wind direction relative to the look [degree], "
                        "0 = upwind")
    parser.add_argument("--friction-ratio", type=_number("friction ratio"), default=1.0,
                        metavar="R", help="u* in the slick / u* outside (balance model), "
                        "(0, 1]; 0.8 as in Alpers & Huehnerfuss (1989)")
    parser.add_argument("--exponent", type=_number("exponent"), default=1.0, metavar="N",
                        help="saturation exponent n of the balance model")
    parser.add_argument("--two-scale", action="store_true",
                        help="also compute the contrast with the two-scale backscatter model")
    parser.add_argument("--polarization", default="VV", choices=("VV", "HH"),
                        help="polarisation of the two-scale model")
    add_water_arguments(parser)
    add_format_arguments(parser)
    parser.add_argument("--plot", metavar="FILE.png", default=None,
                        help="also write y(k) with the Bragg wavenumbers of common bands")


def build_film(args):
    """The film described by the command-line options (preset, monolayer or oil layer)."""
    from .. import films as F
    mono = {"elasticity": args.elasticity, "relaxation_frequency": args.relaxation_frequency,
            "dilational_viscosity": args.dilational_viscosity,
            "film_pressure": args.film_pressure}
    oil = {"thickness": args.oil_thickness, "viscosity": args.oil_viscosity,
           "density": args.oil_density, "surface_tension": args.oil_surface_tension,
           "interfacial_tension": args.oil_interfacial_tension}
    mono = {k: v for k, v in mono.items() if v is not None}
    oil = {k: v for k, v in oil.items() if v is not None}
    if mono and oil:
        raise ValueError("give either monolayer parameters or oil-layer parameters, not both")
    if args.film is not None:
        film = F.film_preset(args.film)
        given = oil if isinstance(film, F.OilLayer) else mono
        other = mono if isinstance(film, F.OilLayer) else oil
        if other:
            kind = "an oil layer" if isinstance(film, F.OilLayer) else "a monolayer"
            prefix = "--" if isinstance(film, F.OilLayer) else "--oil-"
            names = ", ".join(prefix + k.replace("_", "-") for k in other)
            raise ValueError(f"--film {args.film} is {kind}; {names} do not apply to it")
        return film.replace(**given) if given else film
    if mono:
        if "elasticity" not in mono:
            raise ValueError("--elasticity is required for a monolayer film")
        return F.Monolayer(name="custom film", **mono)
    if oil:
        missing = [k for k in ("thickness", "viscosity") if k not in oil]
        if missing:
            raise ValueError("an oil layer needs --oil-thickness and --oil-viscosity")
        return F.OilLayer(name="custom oil layer", **oil)
    raise ValueError("no film given: use --film NAME (see --list-films), --elasticity ..., "
                     "or --oil-thickness ... --oil-viscosity ...")


def describe(film):
    """One line describing a film's parameters."""
    from .. import films as F
    if isinstance(film, F.OilLayer):
        return (f"oil layer '{film.name}': thickness {film.thickness:g} m, viscosity "
                f"{film.viscosity:g} Pa s, density {film.density:g} kg/m3, tensions "
                f"oil-air {film.surface_tension * 1e3:g} / oil-water "
                f"{film.interfacial_tension * 1e3:g} mN/m")
    return (f"monolayer '{film.name}': E0 {film.elasticity * 1e3:g} mN/m, omega_D "
            f"{film.relaxation_frequency:g} rad/s, dilational viscosity "
            f"{film.dilational_viscosity:g} N s/m, film pressure "
            f"{film.film_pressure * 1e3:g} mN/m")


def presets_table():
    """Columns describing every film preset (for ``--list-films``)."""
    from .. import films as F
    cols = {"name": [], "kind": [], "values": [], "ranges": [], "source": []}
    for name, film in F.PRESETS.items():
        cols["name"].append(name)
        cols["kind"].append("oil layer" if isinstance(film, F.OilLayer) else "monolayer")
        cols["values"].append(describe(film).split(": ", 1)[1])
        cols["ranges"].append("; ".join(f"{k} {lo:g}-{hi:g}" for k, (lo, hi)
                                        in film.ranges.items()))
        cols["source"].append(film.source)
    return cols


def _radars(values):
    return [parse_radar(v, label=lambda f: f"{f / 1e9:g}GHz") for v in values]


def slick_table(film, radars, incidences, winds, water, *, azimuth=0.0, friction_ratio=1.0,
                exponent=1.0, two_scale=False, polarization="VV"):
    """Columns of the ``slick`` table: one row per radar, incidence and wind speed."""
    from .. import films as F
    from .. import slick as S
    rows = [(lab, f, th, u) for lab, f in radars for th in incidences for u in winds]
    lab = [r[0] for r in rows]
    f = np.array([r[1] for r in rows])
    th = np.array([r[2] for r in rows])
    u = np.array([r[3] for r in rows])
    kb = np.asarray(S.checked_bragg_wavenumber(f, th))
    y = np.asarray(F.damping_ratio(kb, film, water, on_failure="nan"))
    kbal, bound = S.balance_contrast(kb, u, film, water, azimuth_deg=azimuth,
                                     friction_ratio=friction_ratio, exponent=exponent,
                                     return_bound=True, on_failure="nan")
    with np.errstate(divide="ignore", invalid="ignore"):
        cols = {"radar": lab, "frequency": f / 1e9, "incidence": th, "bragg_wavenumber": kb,
                "bragg_wavelength": 200 * np.pi / kb, "wind_speed": u, "damping_ratio": y,
                "contrast_ah89": 10 * np.log10(y),
                "contrast_balance": 10 * np.log10(np.asarray(kbal)),
                "balance_bound": np.where(np.asarray(bound), "yes", "")}
        if two_scale:
            c2 = np.empty(len(rows))
            # one call per radar and incidence, vectorised over the wind speeds
            for key in sorted({(r[1], r[2]) for r in rows}):
                sel = (f == key[0]) & (th == key[1])
                c2[sel] = np.asarray(S.contrast(film, key[0], key[1], u[sel],
                                                model="two-scale", water=water,
                                                azimuth_deg=azimuth,
                                                polarization=polarization,
                                                on_failure="nan"))
            cols["contrast_two_scale"] = 10 * np.log10(c2)
    return cols


def _plot(film, radars, incidence, water, path):
    from .. import films as F
    from ..plots.films import damping_ratio_figure
    from ..radar import band, bragg_wavenumber
    k = np.geomspace(5.0, 3000.0, 240)
    y = np.asarray(F.damping_ratio(k, film, water, on_failure="nan"))
    marks = {}
    for b in COMMON_BANDS:
        marks[f"{b} {incidence:g} deg"] = float(bragg_wavenumber(band(b).centre_hz, incidence))
    high = {f"{lab} {incidence:g} deg": float(bragg_wavenumber(f, incidence))
            for lab, f in radars}
    for key in high:
        marks.pop(key, None)
    return damping_ratio_figure(k, y, path, bragg_marks=marks, highlight=high,
                                title=f"{describe(film)}\n(screening estimate: not proof of "
                                "oil)")


def run(args):
    from .. import slick as S

    if args.list_films:
        cols = presets_table()
        if args.format == "text":
            for i, name in enumerate(cols["name"]):
                print(f"{name} ({cols['kind'][i]}): {cols['values'][i]}")
                if cols["ranges"][i]:
                    print(f"    typical ranges: {cols['ranges'][i]}")
                print(f"    source: {cols['source'][i]}")
            print("Presets are typical of a class of film, not measured for a given slick; "
                  "give your own values with the parameter options.")
        else:
            print(format_table(cols, fmt=args.format))
        return 0

    film = build_film(args)
    radars = _radars(args.radar)
    with warnings.catch_warnings(record=True) as caught:
        warnings.simplefilter("always")
        water = water_from_args(args)
        table = slick_table(film, radars, args.incidence, args.wind, water,
                            azimuth=args.azimuth, friction_ratio=args.friction_ratio,
                            exponent=args.exponent, two_scale=args.two_scale,
                            polarization=args.polarization)
        if any(not (20.0 <= th <= 60.0) for th in args.incidence):
            warnings.warn("incidence outside 20-60 degree: Bragg-scale contrast not valid "
                          "(specular return dominates nearer nadir)")
    report_warnings(NAME, caught, unique=True)

    units = {k: v for k, v in UNITS.items() if k in table}
    header = [f"Slick contrast, {describe(film)}",
              f"water {args.temperature:g} degC, {args.salinity:g} g/kg; wind azimuth "
              f"{args.azimuth:g} deg; balance model: u* ratio {args.friction_ratio:g}, "
              f"n = {args.exponent:g}",
              f"CAUTION: {S.CAUTION}", ""]
    print_table(table, args.format, units=units, digits=4, title="\n".join(header),
                head={"caution": S.CAUTION, "film": describe(film)},
                note=f"shortwave {NAME}: CAUTION: {S.CAUTION}")
    if args.plot:
        path = _plot(film, radars, args.incidence[0], water, args.plot)
        report_written(path, args.format)
    return 0
