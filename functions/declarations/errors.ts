/**
 * Uncertainties: first-order propagation of independent 1σ errors through the distance and
 * photometry functions, with exact derivatives.
 * Each function is its JSDoc (read by the metadata plugin into functions.json) plus one line handing
 * the arguments to the shared wrapper; see functions/functions.ts for the conventions of all families.
 */
/* eslint-disable @typescript-eslint/no-explicit-any */
import { definitions as d } from "../definitions.js";
import { callFromSheet } from "../evaluate.js";

/**
 * 1σ error of the luminosity distance from a redshift error, |dD_L/dz| σ_z (first order, exact derivative), in Mpc unless a unit is given.
 * @customfunction DIST_LUM_ERR DIST_LUM_ERR
 * @helpurl https://localhost:3000/help.html#DIST_LUM_ERR
 * @example =ZC.DIST_LUM_ERR(0.5, 0.002)
 * @param z Redshift, ≥ 0 (value or range).
 * @param z_err 1σ error of z, ≥ 0 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [unit] Output unit, default "Mpc" (e.g. "Mpc/h").
 * @returns Error of D_L (Mpc by default).
 */
export function DIST_LUM_ERR(z: any[][], z_err: any[][], model?: any[][], unit?: string): any[][] {
  return callFromSheet(d.DIST_LUM_ERR, [z, z_err, model, unit]);
}

/**
 * 1σ error of a bolometric luminosity from independent flux and redshift errors (first order): σ_L/L = √((σ_F/F)² + (2σ_z dlnD_L/dz)²).
 * @customfunction LUMINOSITY_ERR LUMINOSITY_ERR
 * @helpurl https://localhost:3000/help.html#LUMINOSITY_ERR
 * @example =ZC.LUMINOSITY_ERR(1E-13, 5E-15, 0.5, 0.002)
 * @param flux Bolometric flux, ≥ 0, in erg/s/cm2 by default (value or range).
 * @param flux_err 1σ error of the flux, ≥ 0, in the flux's unit (value or range).
 * @param z Redshift, > 0 (value or range).
 * @param z_err 1σ error of z, ≥ 0 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [flux_unit] Unit of flux and flux_err, default "erg/s/cm2" (e.g. "W/m2").
 * @param [lum_unit] Output unit, default "erg/s" (e.g. "W", "Lsun").
 * @returns Error of the luminosity (erg/s by default).
 */
export function LUMINOSITY_ERR(flux: any[][], flux_err: any[][], z: any[][], z_err: any[][], model?: any[][], flux_unit?: string, lum_unit?: string): any[][] {
  return callFromSheet(d.LUMINOSITY_ERR, [flux, flux_err, z, z_err, model, flux_unit, lum_unit]);
}

/**
 * 1σ error of a spectral luminosity L_ν (as ZC.LUMINOSITY_NU) from independent errors of flux density, z and spectral index (first order).
 * @customfunction LUMINOSITY_NU_ERR LUMINOSITY_NU_ERR
 * @helpurl https://localhost:3000/help.html#LUMINOSITY_NU_ERR
 * @example =ZC.LUMINOSITY_NU_ERR(0.012, 0.001, 0.8, 0.005, -0.7, 0.1)
 * @param flux_density Observed flux density, ≥ 0 (value or range), in Jy unless in_unit says otherwise (catalogues in mJy: give "mJy").
 * @param flux_density_err 1σ error of the flux density, ≥ 0 (value or range), in Jy unless in_unit says otherwise (catalogues in mJy: give "mJy").
 * @param z Redshift, > 0 (value or range).
 * @param z_err 1σ error of z, ≥ 0 (value or range).
 * @param alpha Spectral index: S_ν ∝ ν^alpha; synchrotron ≈ −0.7; other conventions via ZC.SPECTRAL_INDEX (value or range).
 * @param [alpha_err] 1σ error of α, ≥ 0; blank = 0 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [in_unit] Unit of flux_density and its error, default "Jy" (e.g. "mJy").
 * @param [out_unit] Output unit, default "W/Hz".
 * @returns Error of L_ν (W/Hz by default).
 */
export function LUMINOSITY_NU_ERR(flux_density: any[][], flux_density_err: any[][], z: any[][], z_err: any[][], alpha: any[][], alpha_err?: any[][], model?: any[][], in_unit?: string, out_unit?: string): any[][] {
  return callFromSheet(d.LUMINOSITY_NU_ERR, [flux_density, flux_density_err, z, z_err, alpha, alpha_err, model, in_unit, out_unit]);
}

/**
 * 1σ error of an absolute magnitude M = m − μ − K from independent errors of m, z and K (first order): √(σ_m² + (d(μ + K)/dz σ_z)² + σ_K²); K's slope enters when alpha is given.
 * @customfunction MAG_ABS_ERR MAG_ABS_ERR
 * @helpurl https://localhost:3000/help.html#MAG_ABS_ERR
 * @example =ZC.MAG_ABS_ERR(0.05, 0.3, 0.01)
 * @param m_err 1σ error of the apparent magnitude, ≥ 0; ±99 (|value| ≥ 50) is a missing-value flag, #N/A (value or range).
 * @param z Redshift, > 0 (value or range).
 * @param z_err 1σ error of z, ≥ 0 (value or range).
 * @param [kcorr_err] 1σ error of the K-correction, ≥ 0; blank = 0 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [alpha] Spectral index of the power-law K-correction used (as ZC.KCORRECTION): S_ν ∝ ν^alpha; synchrotron ≈ −0.7; other conventions via ZC.SPECTRAL_INDEX; blank = K taken as fixed in z (value or range).
 * @returns Error of M (mag).
 */
export function MAG_ABS_ERR(m_err: any[][], z: any[][], z_err: any[][], kcorr_err?: any[][], model?: any[][], alpha?: any[][]): any[][] {
  return callFromSheet(d.MAG_ABS_ERR, [m_err, z, z_err, kcorr_err, model, alpha]);
}

/**
 * 1σ error of a proper size (as ZC.SIZE) from independent angle and redshift errors (first order), in kpc unless a unit is given.
 * @customfunction SIZE_ERR SIZE_ERR
 * @helpurl https://localhost:3000/help.html#SIZE_ERR
 * @example =ZC.SIZE_ERR(2.5, 0.2, 0.8, 0.01)
 * @param angle Angle, ≥ 0, in arcsec by default (value or range).
 * @param angle_err 1σ error of the angle, ≥ 0, in the angle's unit (value or range).
 * @param z Redshift, ≥ 0 (value or range).
 * @param z_err 1σ error of z, ≥ 0 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [angle_unit] Unit of angle and angle_err, default "arcsec".
 * @param [size_unit] Output unit, default "kpc".
 * @returns Error of the size (kpc by default).
 */
export function SIZE_ERR(angle: any[][], angle_err: any[][], z: any[][], z_err: any[][], model?: any[][], angle_unit?: string, size_unit?: string): any[][] {
  return callFromSheet(d.SIZE_ERR, [angle, angle_err, z, z_err, model, angle_unit, size_unit]);
}

/**
 * 1σ error of a rest-frame spectral luminosity at another frequency (as ZC.LUMINOSITY_REST) from independent errors of flux density, z and spectral index (first order); the α term is ln(rest / ((1+z) observed)) σ_α.
 * @customfunction LUMINOSITY_REST_ERR LUMINOSITY_REST_ERR
 * @helpurl https://localhost:3000/help.html#LUMINOSITY_REST_ERR
 * @example =ZC.LUMINOSITY_REST_ERR(2.5, 0.2, 1.1, 0.01, -0.7, 0.1, 3, 1.4, , , "mJy")
 * @param flux_density Flux density at the observed band (the argument observed), ≥ 0 (value or range), in Jy unless in_unit says otherwise (catalogues in mJy: give "mJy").
 * @param flux_density_err 1σ error of the flux density, ≥ 0 (value or range), in Jy unless in_unit says otherwise (catalogues in mJy: give "mJy").
 * @param z Redshift, > 0 (value or range).
 * @param z_err 1σ error of z, ≥ 0 (value or range).
 * @param alpha Spectral index: S_ν ∝ ν^alpha; synchrotron ≈ −0.7; other conventions via ZC.SPECTRAL_INDEX (value or range).
 * @param alpha_err 1σ error of alpha, ≥ 0 (value or range).
 * @param observed Observed frequency, wavelength or energy, > 0, in band_unit (value or range).
 * @param rest Rest-frame frequency, wavelength or energy, > 0, in band_unit (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [band_unit] Unit of observed and rest, default "GHz" (e.g. "MHz", "um", "keV").
 * @param [in_unit] Unit of flux_density and its error, default "Jy" (e.g. "mJy").
 * @param [out_unit] Default "W/Hz" (error of L_ν); a power unit ("W", "erg/s", "Lsun") gives the error of ν L_ν.
 * @returns Error of the rest-frame L_ν (W/Hz by default).
 */
export function LUMINOSITY_REST_ERR(flux_density: any[][], flux_density_err: any[][], z: any[][], z_err: any[][], alpha: any[][], alpha_err: any[][], observed: any[][], rest: any[][], model?: any[][], band_unit?: string, in_unit?: string, out_unit?: string): any[][] {
  return callFromSheet(d.LUMINOSITY_REST_ERR, [flux_density, flux_density_err, z, z_err, alpha, alpha_err, observed, rest, model, band_unit, in_unit, out_unit]);
}
