"""Pieces shared by the ``shortwave`` subcommands: option types, option blocks, output.

:mod:`shortwave.cli` skips modules whose name starts with ``_``, so this is not a command.
"""
from __future__ import annotations

import argparse
import json
import math
import sys

from ..tables import FORMATS, format_table

FORMAT_HELP = "aligned text for people, csv or json for programs"


def number(kind, *, positive=False, nonnegative=False, allow_inf=False, named=False):
    """argparse type: a finite float, optionally > 0 or >= 0, with a one-line error.

    Parameters
    ----------
    kind : str
        What the number is, used in the error messages.
    positive, nonnegative : bool
        Require > 0, or >= 0 (``nonnegative`` wins when both are given).
    allow_inf : bool
        Accept ``inf`` (positive infinity only), e.g. for a deep-water depth.
    named : bool
        Start the "not a number" message with ``kind``.

    Examples
    --------
    >>> number("depth", positive=True, allow_inf=True)("inf")
    inf
    >>> number("depth", positive=True)("-1")
    Traceback (most recent call last):
    ...
    argparse.ArgumentTypeError: depth must be > 0, got '-1'
    """
    def convert(text):
        try:
            v = float(text)
        except ValueError:
            what = f"{kind}: not a number" if named else "not a number"
            raise argparse.ArgumentTypeError(f"{what}: {text!r}") from None
        if math.isnan(v) or (math.isinf(v) and not (allow_inf and v > 0)):
            raise argparse.ArgumentTypeError(f"{kind} must be finite, got {text!r}")
        if nonnegative:
            if v < 0:
                raise argparse.ArgumentTypeError(f"{kind} must be >= 0, got {text!r}")
        elif positive and v <= 0:
            raise argparse.ArgumentTypeError(f"{kind} must be > 0, got {text!r}")
        return v
    convert.__name__ = kind
    return convert


def add_water_arguments(parser, *, temperature_default=15.0,
                        temperature_help="water temperature [degC]",
                        salinity_help="absolute salinity [g/kg]", named=False):
    """Add ``--temperature/-t`` [degC] and ``--salinity/-s`` [g/kg] (default 35)."""
    parser.add_argument("--temperature", "-t", type=number("temperature", named=named),
                        default=temperature_default, metavar="DEGC", help=temperature_help)
    parser.add_argument("--salinity", "-s", type=number("salinity", named=named),
                        default=35.0, metavar="G/KG", help=salinity_help)


def add_format_arguments(parser, *, shortcuts=False, help=FORMAT_HELP):
    """Add ``--format {text,csv,json}`` and, with ``shortcuts``, ``--csv`` and ``--json``."""
    parser.add_argument("--format", choices=FORMATS, default="text", help=help)
    if shortcuts:
        parser.add_argument("--csv", action="store_const", const="csv", dest="format",
                            help="same as --format csv")
        parser.add_argument("--json", action="store_const", const="json", dest="format",
                            help="same as --format json")


def add_film_arguments(group, *, oil_thickness_help="oil layer thickness [m] (with an oil "
                       "preset: overrides its thickness)"):
    """Add the film-parameter options (monolayer and oil layer) to an argparse group.

    The film itself is built from them by :func:`shortwave.commands.slick.build_film`;
    ``--film`` (the preset name) is added by each command with its own help.
    """
    def num(kind, **kw):
        return number(kind, positive=not kw.get("nonnegative"), **kw)
    group.add_argument("--elasticity", type=num("elasticity", nonnegative=True),
                       metavar="N/M", default=None,
                       help="monolayer dilational elasticity E0 [N/m], e.g. 0.025")
    group.add_argument("--relaxation-frequency", type=num("relaxation frequency",
                                                          nonnegative=True),
                       metavar="RAD/S", default=None,
                       help="diffusional relaxation frequency omega_D [rad/s] (0: insoluble)")
    group.add_argument("--dilational-viscosity", type=num("dilational viscosity",
                                                          nonnegative=True),
                       metavar="N.S/M", default=None,
                       help="surface dilational viscosity [N s/m]")
    group.add_argument("--film-pressure", type=number("film pressure"),
                       metavar="N/M", default=None,
                       help="lowering of the surface tension by the film [N/m]")
    group.add_argument("--oil-thickness", type=num("oil thickness", nonnegative=True),
                       metavar="M", default=None, help=oil_thickness_help)
    group.add_argument("--oil-viscosity", type=num("oil viscosity"),
                       metavar="PA.S", default=None, help="oil dynamic viscosity [Pa s]")
    group.add_argument("--oil-density", type=num("oil density"), metavar="KG/M3",
                       default=None, help="oil density [kg/m3] (default 850)")
    group.add_argument("--oil-surface-tension", type=num("oil surface tension"),
                       metavar="N/M", default=None,
                       help="oil-air surface tension [N/m] (default 0.027)")
    group.add_argument("--oil-interfacial-tension", type=num("oil interfacial tension"),
                       metavar="N/M", default=None,
                       help="oil-water interfacial tension [N/m] (default 0.020)")


def water_from_args(args, **overrides):
    """The :class:`shortwave.water.Water` of ``--temperature`` and ``--salinity``."""
    from ..water import Water
    return Water(args.temperature, args.salinity, **overrides)


def frequency_label(f):
    """A short label for a frequency [Hz]: ``5.4GHz``, ``13.5MHz`` or ``50Hz``."""
    if f >= 1e9:
        return f"{f / 1e9:g}GHz"
    if f >= 1e6:
        return f"{f / 1e6:g}MHz"
    return f"{f:g}Hz"


def parse_radar(text, *, label=frequency_label):
    """``(label, Hz)`` of a band letter or a frequency string (``ValueError`` if neither).

    A band letter keeps its canonical spelling; a frequency is labelled by ``label(Hz)``.
    """
    from ..radar import band, parse_frequency
    f = parse_frequency(text)
    try:
        name = band(text).letter
    except ValueError:
        name = label(f)
    return name, f


def report_warnings(command, caught, *, unique=False):
    """Print caught warnings on stderr, one line each (``unique``: each text once)."""
    messages = [str(w.message) for w in caught]
    if unique:
        messages = list(dict.fromkeys(messages))
    for msg in messages:
        print(f"shortwave {command}: warning: {msg}", file=sys.stderr)


def print_table(table, fmt, *, units=None, title=None, head=None, note=None, digits=5):
    """Print ``table`` on stdout as text, CSV or JSON.

    ``title`` heads the text table, ``head`` entries come first in the JSON document, and
    ``note`` goes to stderr before a CSV table; ``digits`` are those of the text table.
    """
    if fmt == "json":
        doc = json.loads(format_table(table, fmt="json", units=units))
        print(json.dumps({**(head or {}), **doc}, indent=1))
    elif fmt == "csv":
        if note is not None:
            print(note, file=sys.stderr)
        print(format_table(table, fmt="csv", units=units))
    else:
        print(format_table(table, fmt="text", units=units, digits=digits, title=title))


def info_stream(fmt):
    """Where notes such as "wrote FILE" go: stdout for text, stderr for csv/json."""
    return sys.stderr if fmt != "text" else sys.stdout


def report_written(path, fmt):
    """Print ``wrote PATH`` (on stderr when stdout carries csv or json)."""
    print(f"wrote {path}", file=info_stream(fmt))
