"""Reliability: bad inputs to every command give one clear line, a non-zero exit, no changes.

Table-driven: each case builds its inputs in a fresh folder, runs ``shortwave`` in-process
and checks that

* the exit status is not zero and nothing was printed as a traceback;
* stderr holds exactly one line, which names the problem (a keyword per case);
* no file of the folder changed (SHA-256 before and after) and no file appeared (no
  partial output, no temporary file left behind).
"""
import hashlib
import os
import re
import shutil

import numpy as np
import pytest

from shortwave import cli
from shortwave.scene_synthetic import greyhaven_scene
from shortwave.synthetic import greyhaven_spectra, netcdf_encoding

CASES = []


def case(name, expect, *, status=None):
    """Register a bad-input case: ``expect`` is a regex the error line must match."""
    def deco(build):
        CASES.append(pytest.param(build, expect, status, id=name))
        return build
    return deco


def _scene(path, size=(6, 8), edit=None, **kw):
    ds = greyhaven_scene(size, **kw)
    if edit is not None:
        ds = edit(ds)
    ds.to_netcdf(path)
    return str(path)


def _stations(path, edit=None):
    ds = greyhaven_spectra(1)
    if edit is not None:
        ds = edit(ds)
    ds.to_netcdf(path, encoding=netcdf_encoding(ds))
    return str(path)


def _set(name, values=None, **attrs):
    def edit(ds):
        if values is not None:
            ds[name] = (ds[name].dims, np.asarray(values(ds[name].values), dtype=float),
                        ds[name].attrs)
        ds[name].attrs.update(attrs)
        for k, v in list(attrs.items()):
            if v is None:
                del ds[name].attrs[k]
        return ds
    return edit


# ---------------------------------------------------------------- files that are not scenes
@case("scene-empty-file", r"empty")
def _(d):
    open(d / "in.nc", "wb").close()
    return ["scene", str(d / "in.nc"), "-o", str(d / "out.nc")]


@case("scene-not-netcdf", r"not a NetCDF file")
def _(d):
    (d / "in.nc").write_text("wind,incidence\n5,30\n")
    return ["scene", str(d / "in.nc"), "-o", str(d / "out.nc")]


@case("scene-truncated-netcdf4", r"truncated|damaged")
def _(d):
    src = _scene(d / "full.nc")
    data = open(src, "rb").read()
    (d / "in.nc").write_bytes(data[: len(data) // 2])
    return ["scene", str(d / "in.nc"), "-o", str(d / "out.nc")]


@case("scene-truncated-netcdf3", r"truncated|damaged")
def _(d):
    ds = greyhaven_scene((6, 8))
    ds.to_netcdf(d / "full.nc", format="NETCDF3_64BIT", engine="netcdf4")
    data = open(d / "full.nc", "rb").read()
    (d / "in.nc").write_bytes(data[: len(data) - 500])
    return ["scene", str(d / "in.nc"), "-o", str(d / "out.nc")]


@case("scene-missing-file", r"does not exist")
def _(d):
    return ["scene", str(d / "nowhere.nc"), "-o", str(d / "out.nc")]


@case("scene-input-is-folder", r"folder")
def _(d):
    os.mkdir(d / "in.nc")
    return ["scene", str(d / "in.nc"), "-o", str(d / "out.nc")]


# ---------------------------------------------------------------- missing variables
@case("scene-no-wind", r"no wind found")
def _(d):
    src = _scene(d / "in.nc", edit=lambda ds: ds.drop_vars(["eastward_wind",
                                                            "northward_wind"]))
    return ["scene", src, "-o", str(d / "out.nc")]


@case("scene-wind-speed-without-direction", r"wind direction missing")
def _(d):
    src = _scene(d / "in.nc", wind_form="speed",
                 edit=lambda ds: ds.drop_vars("wind_from_direction"))
    return ["scene", src, "-o", str(d / "out.nc")]


@case("scene-no-incidence", r"no incidence angle")
def _(d):
    src = _scene(d / "in.nc", edit=lambda ds: ds.drop_vars("incidence_angle"))
    return ["scene", src, "-o", str(d / "out.nc")]


@case("scene-no-look-direction", r"look direction missing")
def _(d):
    src = _scene(d / "in.nc", edit=lambda ds: ds.drop_vars("sensor_azimuth_angle"))
    return ["scene", src, "-o", str(d / "out.nc")]


@case("scene-var-names-missing-variable", r"not in the file")
def _(d):
    src = _scene(d / "in.nc")
    return ["scene", src, "-o", str(d / "out.nc"), "--var", "incidence_angle=theta_look"]


@case("scene-var-unknown-role", r"unknown role")
def _(d):
    src = _scene(d / "in.nc")
    return ["scene", src, "-o", str(d / "out.nc"), "--var", "windiness=eastward_wind"]


@case("scene-var-malformed", r"ROLE=NAME")
def _(d):
    src = _scene(d / "in.nc")
    return ["scene", src, "-o", str(d / "out.nc"), "--var", "eastward_wind"]


# ---------------------------------------------------------------- grids and dimensions
@case("scene-wrong-dimension-order", r"not on the grid")
def _(d):
    def edit(ds):
        inc = ds["incidence_angle"].values.T.copy()          # written transposed ...
        ds = ds.drop_vars("incidence_angle")
        ds["incidence_angle"] = (("col", "row"), inc,        # ... under generic names
                                 {"standard_name": "angle_of_incidence", "units": "degree"})
        return ds
    return ["scene", _scene(d / "in.nc", edit=edit), "-o", str(d / "out.nc")]


@case("scene-mismatched-grids", r"not on the grid|do not match")
def _(d):
    def edit(ds):
        sst = ds["sea_surface_temperature"].values[:, :-1]   # one column short
        ds = ds.drop_vars("sea_surface_temperature")
        ds["sea_surface_temperature"] = (("y", "x_sst"), sst,
                                         {"standard_name": "sea_surface_temperature",
                                          "units": "K"})
        return ds
    return ["scene", _scene(d / "in.nc", edit=edit), "-o", str(d / "out.nc")]


# ---------------------------------------------------------------- units
@case("scene-unknown-wind-units", r"eastward_wind.*furlong")
def _(d):
    src = _scene(d / "in.nc", edit=_set("eastward_wind", units="furlongs per fortnight"))
    return ["scene", src, "-o", str(d / "out.nc")]


@case("scene-wind-without-units", r"no units attribute")
def _(d):
    src = _scene(d / "in.nc", edit=_set("northward_wind", units=None))
    return ["scene", src, "-o", str(d / "out.nc")]


@case("scene-incidence-in-metres", r"incidence_angle.*'m'")
def _(d):
    src = _scene(d / "in.nc", edit=_set("incidence_angle", units="m"))
    return ["scene", src, "-o", str(d / "out.nc")]


@case("scene-sst-kelvin-labelled-degC", r"look like kelvin")
def _(d):
    src = _scene(d / "in.nc", edit=_set("sea_surface_temperature", units="degC"))
    return ["scene", src, "-o", str(d / "out.nc")]


@case("scene-unknown-salinity-units", r"sea_surface_salinity.*mol")
def _(d):
    src = _scene(d / "in.nc", edit=_set("sea_surface_salinity", units="mol m-3"))
    return ["scene", src, "-o", str(d / "out.nc")]


# ---------------------------------------------------------------- values
@case("scene-negative-wind", r"wind speed.*cannot be negative")
def _(d):
    src = _scene(d / "in.nc", wind_form="speed",
                 edit=_set("wind_speed", values=lambda v: np.where(np.isfinite(v), v, -3.0)))
    return ["scene", src, "-o", str(d / "out.nc")]


@case("scene-infinite-wind", r"infinite")
def _(d):
    def inf_first(v):
        v = v.copy()
        v[np.isfinite(v)] = np.where(np.arange(np.isfinite(v).sum()) == 0, np.inf,
                                     v[np.isfinite(v)])
        return v
    src = _scene(d / "in.nc", edit=_set("eastward_wind", values=inf_first))
    return ["scene", src, "-o", str(d / "out.nc")]


@case("scene-all-nan-wind", r"every cell is missing")
def _(d):
    src = _scene(d / "in.nc", wind_form="speed",
                 edit=_set("wind_speed", values=lambda v: v * np.nan))
    return ["scene", src, "-o", str(d / "out.nc")]


@case("scene-incidence-above-90", r"incidence.*valid range")
def _(d):
    src = _scene(d / "in.nc", edit=_set("incidence_angle", values=lambda v: v + 50.0))
    return ["scene", src, "-o", str(d / "out.nc")]


@case("scene-incidence-zero", r"incidence.*valid range \(0")
def _(d):
    src = _scene(d / "in.nc", edit=_set("incidence_angle", values=lambda v: v * 0.0))
    return ["scene", src, "-o", str(d / "out.nc")]


@case("scene-swath-out-of-range", r"swath far-edge incidence.*valid range")
def _(d):
    src = _scene(d / "in.nc")
    return ["scene", src, "-o", str(d / "out.nc"), "--swath", "20,95"]


@case("scene-slick-mask-not-binary", r"slick mask.*valid range")
def _(d):
    src = _scene(d / "in.nc", edit=_set("slick_mask", values=lambda v: v * 0 + 3))
    return ["scene", src, "-o", str(d / "out.nc"), "--film", "natural"]


@case("scene-negative-film-thickness", r"film thickness.*valid range")
def _(d):
    src = _scene(d / "in.nc", edit=_set("film_thickness", values=lambda v: v - 1e-6))
    return ["scene", src, "-o", str(d / "out.nc"), "--film", "light-crude"]


# ---------------------------------------------------------------- options
@case("scene-unknown-band", r"band letter")
def _(d):
    return ["scene", _scene(d / "in.nc"), "-o", str(d / "out.nc"), "--radar", "Q"]


@case("scene-hf-radar", r"frequency_hz.*valid range")
def _(d):
    return ["scene", _scene(d / "in.nc"), "-o", str(d / "out.nc"), "--radar", "13.5MHz"]


@case("scene-unknown-film", r"unknown preset")
def _(d):
    return ["scene", _scene(d / "in.nc"), "-o", str(d / "out.nc"), "--film", "tar"]


@case("scene-unknown-model", r"model.*unknown value")
def _(d):
    return ["scene", _scene(d / "in.nc"), "-o", str(d / "out.nc"), "--model", "magic"]


@case("scene-bad-polarization", r"polarization")
def _(d):
    return ["scene", _scene(d / "in.nc"), "-o", str(d / "out.nc"), "--polarization", "XY"]


@case("scene-bad-chunks", r"chunks")
def _(d):
    return ["scene", _scene(d / "in.nc"), "-o", str(d / "out.nc"), "--chunks", "y=4"]


@case("scene-bad-scheduler", r"local:N")
def _(d):
    return ["scene", _scene(d / "in.nc"), "-o", str(d / "out.nc"), "--scheduler", "local:0"]


# ---------------------------------------------------------------- outputs
@case("scene-output-is-input", r"is the input file")
def _(d):
    src = _scene(d / "in.nc")
    return ["scene", src, "-o", src, "--overwrite"]


@case("scene-output-exists", r"exists")
def _(d):
    src = _scene(d / "in.nc")
    (d / "out.nc").write_text("an earlier result")
    return ["scene", src, "-o", str(d / "out.nc")]


@case("scene-output-folder-missing", r"does not exist")
def _(d):
    return ["scene", _scene(d / "in.nc"), "-o", str(d / "no" / "such" / "out.nc")]


@case("scene-output-folder-unwritable", r"not writable")
def _(d):
    src = _scene(d / "in.nc")
    return ["scene", src, "-o", os.path.join(_unwritable_folder(d), "out.nc")]


def _unwritable_folder(d):
    """A folder this process cannot write to: a read-only folder, or /sys as root."""
    import tempfile
    ro = d / "readonly"
    ro.mkdir()
    os.chmod(ro, 0o500)
    for folder in (str(ro), "/sys"):
        try:
            with tempfile.TemporaryFile(dir=folder):
                pass
        except OSError:
            return folder
    pytest.skip("no unwritable folder available (running with full privileges)")


# ---------------------------------------------------------------- the other commands
@case("ripple-negative-wavelength", r"wavelength")
def _(d):
    return ["ripple", "--wavelength", "-0.01"]


@case("ripple-temperature-out-of-range", r"temperature")
def _(d):
    return ["ripple", "--temperature", "150"]


@case("spectrum-negative-wind", r"wind")
def _(d):
    return ["spectrum", "--wind-speed", "-5"]


@case("spectrum-nan-wind", r"wind")
def _(d):
    return ["spectrum", "--wind-speed", "nan"]


@case("spectrum-output-folder-missing", r"does not exist|No such file")
def _(d):
    return ["spectrum", "--wind-speed", "5", "--output", str(d / "no" / "s.nc")]


@case("bragg-unknown-band", r"band letter|unknown band")
def _(d):
    return ["bragg", "--radar", "Q"]


@case("bragg-incidence-out-of-range", r"incidence")
def _(d):
    return ["bragg", "--radar", "C", "--incidence", "95"]


@case("backscatter-incidence-zero", r"incidence")
def _(d):
    return ["backscatter", "--radar", "C", "--incidence", "0"]


@case("backscatter-bad-polarization", r"polariz|polaris")
def _(d):
    return ["backscatter", "--radar", "C", "--polarization", "XY"]


@case("slick-unknown-film", r"unknown preset|tar")
def _(d):
    return ["slick", "--film", "tar"]


@case("slick-negative-wind", r"wind")
def _(d):
    return ["slick", "--film", "natural", "--wind", "-3"]


@case("extend-empty-file", r"empty")
def _(d):
    open(d / "st.nc", "wb").close()
    return ["extend", str(d / "st.nc"), "-o", str(d / "out.nc"), "--wind-speed", "8",
            "--wind-direction", "270"]


@case("extend-not-netcdf", r"not a NetCDF file")
def _(d):
    (d / "st.nc").write_text("frequency,energy\n0.1,2.0\n")
    return ["extend", str(d / "st.nc"), "-o", str(d / "out.nc")]


@case("extend-truncated", r"truncated|damaged")
def _(d):
    src = _stations(d / "full.nc")
    data = open(src, "rb").read()
    (d / "st.nc").write_bytes(data[: len(data) // 3])
    return ["extend", str(d / "st.nc"), "-o", str(d / "out.nc")]


@case("extend-missing-spectrum", r"no spectrum variable")
def _(d):
    return ["extend", _scene(d / "in.nc"), "-o", str(d / "out.nc")]


@case("extend-unknown-spectrum-units", r"spectrum|units")
def _(d):
    src = _stations(d / "st.nc", edit=_set("spectrum", units="furlongs"))
    return ["extend", src, "-o", str(d / "out.nc")]


@case("extend-output-is-input", r"is the input file")
def _(d):
    src = _stations(d / "st.nc")
    return ["extend", src, "-o", src, "--overwrite"]


@case("extend-mismatched-wind-grid", r"wind|station|match|coordinate|dimension|grid")
def _(d):
    src = _stations(d / "st.nc")
    wind = greyhaven_scene((6, 8), wind_form="speed")
    wind.to_netcdf(d / "wind.nc")
    return ["extend", src, "-o", str(d / "out.nc"), "--wind-file", str(d / "wind.nc")]


@case("validate-csv-folder-missing", r"does not exist")
def _(d):
    return ["validate", "--csv", str(d / "no" / "v.csv")]


@case("demo-output-is-a-file", r"is a file")
def _(d):
    (d / "plain.txt").write_text("not a folder")
    return ["demo", "--small", "--output", str(d / "plain.txt")]


@case("unknown-command", r"invalid choice|COMMAND")
def _(d):
    return ["ripples-and-waves"]


# ---------------------------------------------------------------- the test
def _snapshot(folder):
    out = {}
    for root, dirs, files in os.walk(folder):
        for name in dirs + files:
            path = os.path.join(root, name)
            if os.path.isfile(path):
                with open(path, "rb") as fh:
                    out[path] = hashlib.sha256(fh.read()).hexdigest()
            else:
                out[path] = "folder"
    return out


def test_there_are_at_least_thirty_cases():
    assert len(CASES) >= 30


@pytest.mark.parametrize("build, expect, status", CASES)
def test_bad_input(build, expect, status, tmp_path, capsys):
    work = tmp_path / "work"
    work.mkdir()
    argv = build(work)
    capsys.readouterr()
    before = _snapshot(work)
    code = cli.main(argv)
    out, err = capsys.readouterr()
    after = _snapshot(work)
    try:
        lines = [ln for ln in err.splitlines() if ln.strip()]
        assert code != 0, f"exit status 0 for {argv}; stdout: {out[:300]}"
        if status is not None:
            assert code == status
        assert "Traceback" not in err and "Traceback" not in out
        assert len(lines) == 1, f"expected one line on stderr, got: {err!r}"
        assert re.search(expect, lines[0], flags=re.IGNORECASE), lines[0]
        changed = sorted(set(after) ^ set(before)) or [k for k in after
                                                       if after[k] != before.get(k)]
        assert after == before, f"files changed or appeared: {changed}"
    finally:
        for root, dirs, _ in os.walk(work):
            for name in dirs:
                os.chmod(os.path.join(root, name), 0o700)
        shutil.rmtree(work, ignore_errors=True)
