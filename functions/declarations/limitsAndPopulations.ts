/**
 * Flux limits and populations: the largest redshift at which a source stays above a survey's limit,
 * and the V_max of the 1/V_max estimator.
 * Each function is its JSDoc (read by the metadata plugin into functions.json) plus one line handing
 * the arguments to the shared wrapper; see functions/functions.ts for the conventions of all families.
 */
/* eslint-disable @typescript-eslint/no-explicit-any */
import { definitions as d } from "../definitions.js";
import { callFromSheet } from "../evaluate.js";

/**
 * Largest redshift at which a source stays at or above a flux limit (the first crossing): bolometric, or with alpha a spectral luminosity against a flux-density limit (S_ν = L_ν (1+z)^(1+α) / 4πD_L²).
 * @customfunction REDSHIFT_LIMIT REDSHIFT_LIMIT
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param lum Luminosity, > 0: bolometric (W by default), or L_ν (W/Hz by default) when alpha is given (value or range).
 * @param flux_limit Survey limit, > 0: flux (W/m2 by default), or flux density (Jy by default) when alpha is given (value or range).
 * @param [alpha] Spectral index α of S_ν ∝ ν^α; blank = bolometric (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [lum_unit] Unit of lum, default "W", or "W/Hz" with alpha.
 * @param [flux_unit] Unit of flux_limit, default "W/m2", or "Jy" with alpha (e.g. "erg/s/cm2", "mJy").
 * @returns z_max.
 */
export function REDSHIFT_LIMIT(lum: any[][], flux_limit: any[][], alpha?: any[][], model?: any[][], lum_unit?: string, flux_unit?: string): any[][] {
  return callFromSheet(d.REDSHIFT_LIMIT, [lum, flux_limit, alpha, model, lum_unit, flux_unit]);
}

/**
 * Largest redshift at which a source of absolute magnitude M stays at or brighter than a magnitude limit: M + μ(z) + K(z) ≤ limit, K the power-law K-correction.
 * @customfunction REDSHIFT_LIMIT_MAG REDSHIFT_LIMIT_MAG
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param abs_mag Absolute magnitude M (value or range).
 * @param mag_limit Limiting apparent magnitude (value or range).
 * @param [alpha] Spectral index α for K = −2.5(1+α)log10(1+z); blank = −1 (no K-correction) (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @returns z_max.
 */
export function REDSHIFT_LIMIT_MAG(abs_mag: any[][], mag_limit: any[][], alpha?: any[][], model?: any[][]): any[][] {
  return callFromSheet(d.REDSHIFT_LIMIT_MAG, [abs_mag, mag_limit, alpha, model]);
}

/**
 * V_max of the 1/V_max estimator (Schmidt 1968): comoving volume between z_lo and min(z_max, z_hi) over the survey area, 0 when z_max ≤ z_lo; in Mpc3 unless a unit is given.
 * @customfunction VOLUME_MAX VOLUME_MAX
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param z_max The source's limiting redshift (e.g. from ZC.REDSHIFT_LIMIT), ≥ 0 (value or range).
 * @param z_lo Lower redshift bound of the sample, ≥ 0 (value or range).
 * @param z_hi Upper redshift bound of the sample, ≥ z_lo (value or range).
 * @param [area] Survey area, in deg2 by default; blank = whole sky (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [unit] Output unit, default "Mpc3" (e.g. "Gpc3", "(Mpc/h)3").
 * @param [area_unit] Unit of area, default "deg2" (e.g. "sr").
 * @returns V_max (Mpc3 by default).
 */
export function VOLUME_MAX(z_max: any[][], z_lo: any[][], z_hi: any[][], area?: any[][], model?: any[][], unit?: string, area_unit?: string): any[][] {
  return callFromSheet(d.VOLUME_MAX, [z_max, z_lo, z_hi, area, model, unit, area_unit]);
}
