"""Shared test settings: non-interactive plotting, no network."""
import os

os.environ.setdefault("MPLBACKEND", "Agg")
