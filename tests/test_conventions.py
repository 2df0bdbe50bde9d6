"""Direction and geometry conventions, checked on cases built by hand.

Each case states the geometry in words, the answer reasoned from the definitions, and the
source of the definition:

* CF standard-name table, version 83 (2023-10-17), entries
  - ``sensor_azimuth_angle``: "the horizontal angle between the line of sight from the
    observation point to the sensor and a reference direction at the observation point,
    which is often due north ... measured clockwise positive" -> the bearing from the
    cell to the radar, so the radar looks along sensor_azimuth_angle - 180;
  - ``X_from_direction`` / ``X_to_direction`` (e.g. ``sea_water_velocity_from_direction``):
    "the direction from which the velocity vector of X is coming" / "towards which [it]
    is headed", "a bearing in the usual geographical sense, measured positive clockwise
    from due north" (same wording for ``wind_from_direction``,
    ``sea_surface_wave_from_direction``, ``sea_surface_wave_to_direction``);
  - ``eastward_wind`` / ``northward_wind``: components positive toward east / north,
    i.e. the direction the air moves TO.
* Package convention (DEVELOPERS.md, "Radar geometry"): ``azimuth_deg`` is the wind
  direction relative to the radar look, 0 = upwind (the wind blows toward the radar),
  180 = downwind.
* Reference note radar.md Sec. 2.2 (advancing Bragg wave K = -K_B e_look travels toward
  the radar; Wright 1966, Valenzuela 1978), Sec. 2.5 (f_D = +/- f_B + (2 sin(theta) /
  lambda) U_r, positive Doppler = approaching, U_r positive toward the radar) and
  Sec. 2.6 (1 m/s toward a 5.405 GHz radar at 30 degree shifts both lines by 18.03 Hz).
* Reference note spectra.md Sec. 4.4 (theta_to = theta_from + 180; the wind sea travels
  downwind) and Sec. 4.3 (a 180 degree relabelling of a frozen-surface spectrum keeps
  the slope tensor).
"""
import numpy as np
import pytest
import xarray as xr

from shortwave import dispersion, fields, radar
from shortwave.synthetic import geometric_frequencies, wave_spectra
from shortwave.tail import extend_spectra

C_BAND = 5.405e9
SHAPE = (2, 3)


def _scene(*, wind_from=None, uv=None, sensor_azimuth=None, look_variable=None,
           speed=10.0, incidence=35.0):
    """A uniform scene: wind (speed + from-direction, or u/v), incidence, look geometry."""
    dims = ("y", "x")
    full = lambda v: np.full(SHAPE, float(v))   # noqa: E731
    data = {"incidence_angle": (dims, full(incidence), {"standard_name": "angle_of_incidence",
                                                        "units": "degree"})}
    if uv is None:
        data["wind_speed"] = (dims, full(speed), {"standard_name": "wind_speed",
                                                  "units": "m s-1"})
        data["wind_from_direction"] = (dims, full(wind_from), {
            "standard_name": "wind_from_direction", "units": "degree"})
    else:
        data["u10"] = (dims, full(uv[0]), {"standard_name": "eastward_wind", "units": "m s-1"})
        data["v10"] = (dims, full(uv[1]), {"standard_name": "northward_wind", "units": "m s-1"})
    if sensor_azimuth is not None:
        data["sensor_azimuth_angle"] = (dims, full(sensor_azimuth), {
            "standard_name": "sensor_azimuth_angle", "units": "degree",
            "comment": "bearing from the cell to the radar, clockwise from north"})
    if look_variable is not None:
        data["look_azimuth"] = (dims, full(look_variable), {"units": "degree"})
    return xr.Dataset(data, coords={"y": np.arange(SHAPE[0]) * 1.0,
                                    "x": np.arange(SHAPE[1]) * 1.0})


def _azimuth(ds, **kw):
    a = fields.open_scene(ds, **kw).inputs["wind_azimuth"].values
    assert np.ptp(a) == 0.0
    return float(a.ravel()[0])


# Radar WEST of the cell, looking EAST (radar -> cell bearing 90 degree).  CF v83
# sensor_azimuth_angle is the bearing from the cell to the sensor: 270 degree (west).
LOOK_EAST = 90.0
SENSOR_WEST = 270.0

# (wind_from_direction, expected azimuth, reasoning)
EAST_LOOK_CASES = [
    (90.0, 0.0, "wind from the east blows west, toward the radar: upwind"),
    (270.0, 180.0, "wind from the west blows east, away from the radar: downwind"),
    (0.0, 270.0, "wind from the north blows south, across the look: crosswind"),
    (180.0, 90.0, "wind from the south blows north, across the look: crosswind"),
]


@pytest.mark.parametrize("wind_from, expected, why", EAST_LOOK_CASES)
def test_wind_from_direction_and_sensor_azimuth(wind_from, expected, why):
    """CF v83 wind_from_direction + sensor_azimuth_angle -> package azimuth (see module)."""
    got = _azimuth(_scene(wind_from=wind_from, sensor_azimuth=SENSOR_WEST))
    assert got == pytest.approx(expected, abs=1e-9), why


@pytest.mark.parametrize("wind_from, expected, why", EAST_LOOK_CASES)
def test_look_direction_variable_and_option_agree(wind_from, expected, why):
    """A look-direction variable (radar -> cell) and ``look_azimuth=`` give the same."""
    got_var = _azimuth(_scene(wind_from=wind_from, look_variable=LOOK_EAST))
    got_opt = _azimuth(_scene(wind_from=wind_from), look_azimuth=LOOK_EAST)
    assert got_var == pytest.approx(expected, abs=1e-9), why
    assert got_opt == pytest.approx(expected, abs=1e-9), why


# (eastward, northward) wind [m/s]: CF components point where the air goes.
UV_CASES = [
    ((-10.0, 0.0), 0.0, "u < 0: air moves west, toward the radar in the west: upwind"),
    ((10.0, 0.0), 180.0, "u > 0: air moves east, away from the radar: downwind"),
    ((0.0, -10.0), 270.0, "v < 0: air moves south (wind from the north): crosswind"),
    ((0.0, 10.0), 90.0, "v > 0: air moves north (wind from the south): crosswind"),
]


@pytest.mark.parametrize("uv, expected, why", UV_CASES)
def test_eastward_northward_components(uv, expected, why):
    """CF v83 eastward_wind / northward_wind (direction the air moves TO)."""
    ds = _scene(uv=uv, sensor_azimuth=SENSOR_WEST)
    sc = fields.open_scene(ds)
    assert float(sc.inputs["wind_azimuth"].values.ravel()[0]) == pytest.approx(
        expected, abs=1e-9), why
    np.testing.assert_allclose(sc.inputs["wind_speed"].values, 10.0, rtol=1e-12)


def test_components_and_from_direction_agree_off_axis():
    """Wind from 30 degree (NNE): u = -U sin 30, v = -U cos 30 (CF definitions).  Radar
    south of the cell looking north (sensor bearing 180): azimuth = 30 - 0 = 30."""
    u, v = -10.0 * np.sin(np.deg2rad(30.0)), -10.0 * np.cos(np.deg2rad(30.0))
    a = _azimuth(_scene(uv=(u, v), sensor_azimuth=180.0))
    b = _azimuth(_scene(wind_from=30.0, sensor_azimuth=180.0))
    assert a == pytest.approx(30.0, abs=1e-9)
    assert b == pytest.approx(30.0, abs=1e-9)


def test_rotating_the_whole_geometry_keeps_the_azimuth():
    """Wind and radar turned together by 37 degree: same relative geometry (common
    practice: the azimuth depends only on the difference of the two bearings)."""
    base = _azimuth(_scene(wind_from=90.0, sensor_azimuth=SENSOR_WEST))
    turned = _azimuth(_scene(wind_from=127.0, sensor_azimuth=(SENSOR_WEST + 37.0) % 360))
    assert turned == pytest.approx(base, abs=1e-9)


def test_upwind_scene_cell_has_the_largest_sigma0():
    """Radar looking east; the wind toward the radar gives the largest sigma0, then the
    wind away from it, then crosswind (order upwind > downwind > crosswind of C-band VV
    backscatter: common practice, the observed shape of scatterometer data)."""
    s = {}
    for wind_from, _, _ in EAST_LOOK_CASES:
        p = fields.scene_products(fields.open_scene(
            _scene(wind_from=wind_from, sensor_azimuth=SENSOR_WEST)), C_BAND, "VV")
        s[wind_from] = float(p.sigma0.values.ravel()[0])
    up, down, cross_n, cross_s = s[90.0], s[270.0], s[0.0], s[180.0]
    assert up > down > cross_n
    assert cross_n == pytest.approx(cross_s, rel=1e-9)   # centrosymmetric spreading
    # the scene layer passes the same azimuth to the point model
    assert up == pytest.approx(float(radar.nrcs(C_BAND, 35.0, 10.0, "VV", 0.0)), rel=1e-3)


@pytest.mark.parametrize("pol", ["VV", "HH"])
def test_point_model_azimuth_order(pol):
    """radar.nrcs: 0 (upwind) > 180 (downwind) > 90 (crosswind); common practice."""
    up, cross, down = (float(radar.nrcs(C_BAND, 35.0, 10.0, pol, a)) for a in (0, 90, 180))
    assert up > down > cross


# ---------------------------------------------------------------------------------- tail
F_GRID = geometric_frequencies()
TH = np.arange(5.0, 360.0, 10.0)
MOMENTS = ("hs", "mss", "mss_upwind", "mss_crosswind", "mss_resolved",
           "mss_upwind_resolved", "mss_crosswind_resolved", "mss_tail", "mss_upwind_tail",
           "mss_crosswind_tail")


def test_wind_sea_travelling_downwind_is_steeper_along_the_wind():
    """Wind from the west (270); the wind sea comes FROM the west (spectra.md Sec. 4.4:
    it travels toward theta_from + 180 = east, where the wind blows).  Along-wind mss >
    cross-wind mss for the resolved part, the tail and the total (Cox & Munk 1954:
    upwind slope variance exceeds crosswind)."""
    E = wave_spectra(F_GRID, TH, 10.0, 270.0)
    r = extend_spectra(E, F_GRID, TH, 10.0, 270.0, convention="from", spectra=False)
    for part in ("_resolved", "_tail", ""):
        assert r["mss_upwind" + part] > r["mss_crosswind" + part], part


def test_from_to_relabelling_leaves_everything_unchanged():
    """The same file written with "to" directions (theta_to = theta_from + 180, CF v83
    sea_surface_wave_to_direction) gives identical moments and spectra."""
    E = wave_spectra(F_GRID, TH, 10.0, 30.0)
    a = extend_spectra(E, F_GRID, TH, 10.0, 30.0, convention="from")
    b = extend_spectra(E, F_GRID, np.mod(TH + 180.0, 360.0), 10.0, 30.0, convention="to")
    for key in MOMENTS:
        assert float(b[key]) == pytest.approx(float(a[key]), rel=1e-12), key
    np.testing.assert_allclose(b["spectrum"], a["spectrum"], rtol=1e-6)


def test_tail_lies_along_the_wind_not_its_mirror_image():
    """Wind from 30 degree: the centrosymmetric tail peaks on the 30/210 axis of the file's
    bearings.  A mirrored bearing (counter-clockwise angles) would put it on 330/150."""
    E = wave_spectra(F_GRID, TH, 10.0, 30.0)
    r = extend_spectra(E, F_GRID, TH, 10.0, 30.0, convention="from")
    top = np.asarray(r["spectrum"][-1], float)                  # highest wavenumber cell
    along = top[np.isin(TH, [25.0, 35.0, 205.0, 215.0])]
    mirror = top[np.isin(TH, [325.0, 335.0, 145.0, 155.0])]
    assert along.min() > mirror.max()


def test_tail_follows_the_wind_when_the_waves_do_not():
    """Waves from the north, wind from the east (a 90 degree turn of the wind): the
    resolved slopes lie across the new wind (their along/across values swap), while the
    tail, in local equilibrium with the wind (Elfouhaily et al. 1997), stays steeper
    along the wind."""
    E = wave_spectra(F_GRID, TH, 10.0, 0.0)
    aligned = extend_spectra(E, F_GRID, TH, 10.0, 0.0, spectra=False)
    turned = extend_spectra(E, F_GRID, TH, 10.0, 90.0, spectra=False)
    assert turned["mss_upwind_resolved"] == pytest.approx(
        aligned["mss_crosswind_resolved"], rel=1e-12)
    assert turned["mss_crosswind_resolved"] == pytest.approx(
        aligned["mss_upwind_resolved"], rel=1e-12)
    assert turned["mss_upwind_tail"] > turned["mss_crosswind_tail"]


# --------------------------------------------------------------------------------- Bragg
def test_current_toward_the_radar_raises_both_lines():
    """radar.md Sec. 2.5/2.6: positive Doppler = approaching; 1 m/s toward a 5.405 GHz
    radar at 30 degree raises both lines by 2 sin(30)/lambda = 18.03 Hz; away lowers."""
    adv0, rec0 = radar.bragg_lines(C_BAND, 30.0)
    assert adv0 > 0 > rec0 and adv0 == pytest.approx(-rec0, rel=1e-12)
    adv, rec = radar.bragg_lines(C_BAND, 30.0, current=1.0)
    assert adv - adv0 == pytest.approx(18.03, abs=0.005)
    assert rec - rec0 == pytest.approx(18.03, abs=0.005)
    adv_m, rec_m = radar.bragg_lines(C_BAND, 30.0, current=-1.0)
    assert adv_m < adv0 and rec_m < rec0


def test_bragg_lines_are_the_waves_own_apparent_frequencies():
    """The advancing wave travels toward the radar (radar.md Sec. 2.2), so a current
    toward the radar flows with it (angle 0) and against the receding wave (angle 180);
    the lines are +/- their apparent frequencies (Phillips 1977, Eq. 3.2.4, via
    dispersion.apparent_angular_frequency)."""
    kb = float(radar.bragg_wavenumber(C_BAND, 40.0))
    u = 0.7
    adv, rec = radar.bragg_lines(C_BAND, 40.0, current=u)
    w_adv = float(dispersion.apparent_angular_frequency(kb, u, 0.0))
    w_rec = float(dispersion.apparent_angular_frequency(kb, u, 180.0))
    assert adv == pytest.approx(w_adv / (2 * np.pi), rel=1e-12)
    assert rec == pytest.approx(-w_rec / (2 * np.pi), rel=1e-12)


def test_monostatic_bragg_vector_points_back_toward_the_radar():
    """radar.md Sec. 2.3: K_B = k_s,h - k_i,h = -2 k_i,h in the monostatic case, i.e. along
    -e_look, the direction of travel of the advancing wave (Sec. 2.2)."""
    for look in (0.0, 90.0, 225.0):
        kx, ky = radar.bistatic_bragg_vector(C_BAND, 30.0, 30.0, look, look + 180.0)
        kb = float(radar.bragg_wavenumber(C_BAND, 30.0))
        e = np.array([np.cos(np.deg2rad(look)), np.sin(np.deg2rad(look))])
        np.testing.assert_allclose([kx, ky], -kb * e, atol=1e-9 * kb)


def test_wind_to_direction_decided_by_standard_name_then_name():
    # CF standard-name table v83: wind_from_direction is where the wind comes from,
    # wind_to_direction where it goes. The standard name decides; a variable called
    # "..._to_direction" without a standard name (named with --var) is read as "to"
    # (common practice).
    import xarray as xr
    from shortwave.tail import wind_inputs
    ds = xr.Dataset({"wind_speed": ((), 10.0, {"standard_name": "wind_speed",
                                                "units": "m s-1"}),
                     "wind_to_direction": ((), 90.0, {"units": "degree"})})
    spec = xr.DataArray(1.0)
    _, direction, _ = wind_inputs(ds, spec, overrides={"wind_direction": "wind_to_direction"})
    assert float(direction) == 270.0
    ds["wind_to_direction"].attrs["standard_name"] = "wind_from_direction"
    _, direction, _ = wind_inputs(ds, spec, overrides={"wind_direction": "wind_to_direction"})
    assert float(direction) == 90.0


def test_direction_convention_that_contradicts_the_file_is_refused():
    # CF standard-name table v83: sea_surface_wave_from_direction vs _to_direction.
    # A --direction-convention that contradicts the file's own label is an error, not a
    # silent override (it would rotate every spectrum by 180 degrees).
    import pytest
    from shortwave.synthetic import greyhaven_spectra
    from shortwave.tail import prepare_inputs
    ds = greyhaven_spectra(2)
    dname = [v for v in ds.variables
             if ds[v].attrs.get("standard_name", "").startswith("sea_surface_wave_")
             and ds[v].attrs["standard_name"].endswith("_direction")][0]
    label = ds[dname].attrs["standard_name"].split("_")[-2]        # "from" or "to"
    other = "to" if label == "from" else "from"
    prepare_inputs(ds, direction_convention=label)                  # agreeing: accepted
    with pytest.raises(ValueError, match="direction convention given"):
        prepare_inputs(ds, direction_convention=other)
