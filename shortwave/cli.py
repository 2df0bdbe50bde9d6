"""The ``shortwave`` command line.

Each subcommand lives in its own module under :mod:`shortwave.commands` and exposes

``NAME``            the subcommand word,
``HELP``            a one-line summary,
``add_arguments(parser)``  to declare its options,
``run(args) -> int``       to do the work (returns the exit status).

:func:`main` finds the modules, builds the parser and turns every expected failure
(bad input, missing file, unreadable NetCDF) into one line on stderr and exit status 2,
never a traceback.
"""
from __future__ import annotations

import argparse
import importlib
import pkgutil
import sys

from . import __version__

EXIT_USAGE = 2


def _command_modules():
    from . import commands
    mods = []
    for info in sorted(pkgutil.iter_modules(commands.__path__), key=lambda m: m.name):
        if info.name.startswith("_"):
            continue
        mods.append(importlib.import_module(f"{commands.__name__}.{info.name}"))
    order = getattr(commands, "ORDER", ())
    rank = {name: i for i, name in enumerate(order)}
    return sorted(mods, key=lambda m: (rank.get(m.NAME, len(rank)), m.NAME))


class _Parser(argparse.ArgumentParser):
    """argparse parser whose usage errors are a single line."""

    def error(self, message):  # noqa: D401 - argparse API
        raise _UsageError(f"{self.prog}: {message}")


class _UsageError(Exception):
    pass


def build_parser():
    """Return the top-level argument parser with every subcommand attached."""
    parser = _Parser(
        prog="shortwave",
        description="Short ocean waves (capillary-gravity ripples) for radar oceanography: "
        "dispersion, full-range wind-wave spectra, Bragg scattering and backscatter, "
        "film damping and slick contrast, on values, arrays and NetCDF fields.",
    )
    parser.add_argument("--version", action="version", version=f"shortwave {__version__}")
    sub = parser.add_subparsers(dest="command", metavar="COMMAND", parser_class=_Parser)
    for mod in _command_modules():
        p = sub.add_parser(mod.NAME, help=mod.HELP, description=getattr(mod, "DESCRIPTION", mod.HELP),
                           formatter_class=argparse.ArgumentDefaultsHelpFormatter)
        mod.add_arguments(p)
        p.set_defaults(_run=mod.run)
    return parser


def main(argv=None) -> int:
    """Run the ``shortwave`` command; return the exit status (0 on success)."""
    parser = build_parser()
    try:
        args = parser.parse_args(argv)
    except _UsageError as exc:
        print(str(exc).splitlines()[0], file=sys.stderr)
        return EXIT_USAGE
    if not getattr(args, "_run", None):
        parser.print_help()
        return EXIT_USAGE
    import warnings
    try:
        with warnings.catch_warnings():
            warnings.simplefilter("default")
            return int(args._run(args) or 0)
    except KeyboardInterrupt:
        print("shortwave: interrupted", file=sys.stderr)
        return 130
    except (ValueError, OSError, KeyError, RuntimeError) as exc:
        msg = str(exc).strip().splitlines()[0] if str(exc).strip() else type(exc).__name__
        print(f"shortwave {args.command}: error: {msg}", file=sys.stderr)
        return EXIT_USAGE


if __name__ == "__main__":  # pragma: no cover
    sys.exit(main())
