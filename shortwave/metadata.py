"""The one table of output-variable metadata, used by every NetCDF writer.

Each entry maps an output variable name (the glossary name used by functions, CLI flags
and files alike) to its CF attributes.  ``standard_name`` appears only where an exact
match exists in the CF standard-name table (version 83 was checked); wavenumber spectra,
damping ratios and slick contrasts have none, so they carry ``long_name``, ``units`` and a
``comment`` naming the model.

Writers call :func:`apply_metadata` after computing, so input metadata never leaks onto
outputs (xarray's ``apply_ufunc(..., keep_attrs=False)`` first, then this table).
"""
from __future__ import annotations

__all__ = ["OUTPUT_METADATA", "apply_metadata", "CONVENTIONS", "DB_UNITS"]

CONVENTIONS = "CF-1.10"

DB_UNITS = "0.1 lg(re 1)"
"""UDUNITS spelling of the decibel of a ratio (UDUNITS has no ``dB``; CF 1.10 Sect. 3.1)."""

OUTPUT_METADATA = {
    # --- coordinates and inputs --------------------------------------------------------
    "wavenumber": {"long_name": "ocean surface wavenumber", "units": "rad m-1"},
    "wave_frequency": {"standard_name": "wave_frequency", "long_name": "wave frequency",
                       "units": "s-1"},
    "direction": {"long_name": "direction of wave travel relative to the wind",
                  "units": "degree"},
    "wind_speed": {"standard_name": "wind_speed", "long_name": "wind speed at 10 m (neutral)",
                   "units": "m s-1"},
    "wind_from_direction": {"standard_name": "wind_from_direction",
                            "long_name": "wind from direction", "units": "degree"},
    "incidence_angle": {"standard_name": "angle_of_incidence",
                        "long_name": "radar incidence angle from the vertical",
                        "units": "degree"},
    "radar_frequency": {"standard_name": "radiation_frequency", "long_name": "radar frequency",
                        "units": "s-1"},
    "radar_wavelength": {"standard_name": "radiation_wavelength",
                         "long_name": "radar wavelength", "units": "m"},
    "sea_surface_temperature": {"standard_name": "sea_surface_temperature",
                                "long_name": "sea surface temperature", "units": "K"},
    "sea_surface_salinity": {"standard_name": "sea_surface_salinity",
                             "long_name": "sea surface salinity", "units": "1e-3"},
    # --- spectra -----------------------------------------------------------------------
    "omnidirectional_spectrum": {
        "long_name": "omnidirectional wavenumber spectrum of surface elevation S(k)",
        "units": "m3",
        "comment": "one-sided; integral over wavenumber equals elevation variance"},
    "directional_spectrum": {
        "long_name": "wavenumber-direction spectrum of surface elevation F(k, phi)",
        "units": "m3 rad-1",
        "comment": "integral over wavenumber and direction equals elevation variance"},
    "curvature_spectrum": {
        "long_name": "omnidirectional curvature (saturation) spectrum B(k) = k^3 S(k)",
        "units": "1"},
    "frequency_direction_spectrum": {
        "standard_name": "sea_surface_wave_directional_variance_spectral_density",
        "long_name": "frequency-direction spectrum of surface elevation E(f, theta)",
        "units": "m2 s rad-1"},
    "spreading_ratio": {"long_name": "directional spreading ratio Delta(k) of the "
                                     "centrosymmetric spectrum", "units": "1"},
    "inverse_wave_age": {"long_name": "inverse wave age U10 / c_p", "units": "1"},
    "friction_velocity": {"long_name": "friction velocity in air", "units": "m s-1"},
    "peak_wavenumber": {"long_name": "wavenumber at the spectral peak", "units": "rad m-1"},
    # --- moments -----------------------------------------------------------------------
    "significant_wave_height": {"standard_name": "sea_surface_wave_significant_height",
                                "long_name": "significant wave height 4 sqrt(m0)",
                                "units": "m"},
    "mean_square_slope": {"standard_name": "sea_surface_wave_mean_square_slope",
                          "long_name": "mean square slope (total)", "units": "1"},
    "mean_square_slope_upwind": {"standard_name": "sea_surface_mean_square_upwave_slope",
                                 "long_name": "mean square slope along the wind",
                                 "units": "1",
                                 "comment": "axis taken along the wind direction (the CF "
                                            "name refers to the up-wave axis; for wind "
                                            "seas the two coincide)"},
    "mean_square_slope_crosswind": {
        "standard_name": "sea_surface_mean_square_crosswave_slope",
        "long_name": "mean square slope across the wind", "units": "1"},
    # --- radar -------------------------------------------------------------------------
    "bragg_wavenumber": {"long_name": "Bragg-resonant ocean wavenumber", "units": "rad m-1"},
    "bragg_wavelength": {"long_name": "Bragg-resonant ocean wavelength", "units": "m"},
    "bragg_curvature": {"long_name": "curvature spectrum B(k) at the Bragg wavenumber",
                        "units": "1"},
    "sigma0": {"standard_name": "surface_backwards_scattering_coefficient_of_radar_wave",
               "long_name": "normalized radar cross section of the sea (linear)",
               "units": "1"},
    "sigma0_db": {"long_name": "normalized radar cross section of the sea in decibels",
                  "units": DB_UNITS},
    "sigma0_slick": {
        "standard_name": "surface_backwards_scattering_coefficient_of_radar_wave",
        "long_name": "normalized radar cross section with the surface film (linear)",
        "units": "1"},
    "sigma0_slick_db": {"long_name": "normalized radar cross section with the surface film "
                                     "in decibels", "units": DB_UNITS},
    # --- films -------------------------------------------------------------------------
    "damping_ratio": {"long_name": "damping ratio of short waves, film over clean surface",
                      "units": "1"},
    "slick_contrast_db": {
        "long_name": "radar contrast of the film: clean over film-covered backscatter",
        "units": DB_UNITS,
        "comment": "screening estimate, not proof of oil; natural films and low wind look "
                   "alike; decisions rest with trained observers and the responsible "
                   "authorities"},
    # --- extended wave-model spectra (tail) and scenes ----------------------------
    'significant_wave_height_resolved': {'long_name': 'significant wave height 4 sqrt(m0) of the wave-model (resolved) spectrum', 'units': 'm'},
    'mean_square_slope_resolved': {'long_name': 'mean square slope of the wave-model (resolved) spectrum', 'units': '1', 'comment': "sum of k(f)^2 E(f, theta) df dtheta over the file's frequencies"},
    'mean_square_slope_upwind_resolved': {'long_name': 'mean square slope along the wind of the wave-model (resolved) spectrum', 'units': '1'},
    'mean_square_slope_crosswind_resolved': {'long_name': 'mean square slope across the wind of the wave-model (resolved) spectrum', 'units': '1'},
    'mean_square_slope_tail': {'long_name': 'mean square slope of the tail above seam_wavenumber', 'units': '1'},
    'mean_square_slope_upwind_tail': {'long_name': 'mean square slope along the wind of the tail above seam_wavenumber', 'units': '1'},
    'mean_square_slope_crosswind_tail': {'long_name': 'mean square slope across the wind of the tail above seam_wavenumber', 'units': '1'},
    'seam_wavenumber': {'long_name': 'wavenumber where the resolved spectrum ends and the tail begins (k of the highest frequency bin edge)', 'units': 'rad m-1'},
    'wavenumber_bounds': {'units': 'rad m-1'},
    'depth': {'standard_name': 'sea_floor_depth_below_sea_surface', 'long_name': 'water depth used for the dispersion relation', 'units': 'm'},
    'wind_azimuth': {'long_name': 'wind direction relative to the radar look (0 = wind blowing toward the radar)', 'units': 'degree'},
    'mean_square_slope_slick': {'long_name': 'mean square slope of the film-covered sea (total)', 'units': '1'},
    'film_cover': {'long_name': 'surface film taken as present in the computation (1 film, 0 clean)', 'units': '1'},
    'film_thickness': {'long_name': 'thickness of the surface film or oil layer', 'units': 'm'},
}


def apply_metadata(ds, names=None):
    """Set attributes of variables in ``ds`` from :data:`OUTPUT_METADATA` (in place).

    Existing attributes of those variables are replaced, so no input metadata leaks.
    Variables not in the table are left alone.  Returns ``ds``.
    """
    for name in (names or list(ds.variables)):
        meta = OUTPUT_METADATA.get(name)
        if meta is not None and name in ds.variables:
            ds[name].attrs = dict(meta)
    return ds
