"""Subcommands of the ``shortwave`` command, one module each (see :mod:`shortwave.cli`).

``ORDER`` fixes the order in ``shortwave --help``; modules not listed come after.
"""
ORDER = ("demo", "ripple", "spectrum", "bragg", "backscatter", "slick", "extend", "scene",
         "validate")
