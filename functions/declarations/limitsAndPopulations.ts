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
 * Largest redshift at which a source of bolometric luminosity L stays at or above a bolometric flux limit (the first crossing of L / 4πD_L² = limit).
 * @customfunction REDSHIFT_LIMIT REDSHIFT_LIMIT
 * @helpurl https://localhost:3000/help.html#REDSHIFT_LIMIT
 * @example =ZC.REDSHIFT_LIMIT(1E44, 1E-15)
 * @param lum Bolometric luminosity, > 0, in erg/s by default (value or range).
 * @param flux_limit Survey's bolometric flux limit, > 0, in erg/s/cm2 by default (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [lum_unit] Unit of lum, default "erg/s" (e.g. "W", "Lsun").
 * @param [flux_unit] Unit of flux_limit, default "erg/s/cm2" (e.g. "W/m2").
 * @returns z_max.
 */
export function REDSHIFT_LIMIT(lum: any[][], flux_limit: any[][], model?: any[][], lum_unit?: string, flux_unit?: string): any[][] {
  return callFromSheet(d.REDSHIFT_LIMIT, [lum, flux_limit, model, lum_unit, flux_unit]);
}

/**
 * Largest redshift at which a power-law source of spectral luminosity L_ν stays at or above a flux-density limit: S_ν = L_ν (1+z)^(1+α) / 4πD_L² (the first crossing).
 * @customfunction REDSHIFT_LIMIT_NU REDSHIFT_LIMIT_NU
 * @helpurl https://localhost:3000/help.html#REDSHIFT_LIMIT_NU
 * @example =ZC.REDSHIFT_LIMIT_NU(1E24, 0.0001, -0.7)
 * @param lum_nu Spectral luminosity L_ν at the observed frequency (as ZC.LUMINOSITY_NU gives it), > 0, in W/Hz by default (value or range).
 * @param flux_density_limit Survey's flux-density limit, > 0 (value or range), in Jy unless flux_unit says otherwise (catalogues in mJy: give "mJy").
 * @param alpha Spectral index: S_ν ∝ ν^alpha; synchrotron ≈ −0.7; other conventions via ZC.SPECTRAL_INDEX (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [lum_unit] Unit of lum_nu, default "W/Hz" (e.g. "erg/s/Hz").
 * @param [flux_unit] Unit of flux_density_limit, default "Jy" (e.g. "mJy", "uJy").
 * @returns z_max.
 */
export function REDSHIFT_LIMIT_NU(lum_nu: any[][], flux_density_limit: any[][], alpha: any[][], model?: any[][], lum_unit?: string, flux_unit?: string): any[][] {
  return callFromSheet(d.REDSHIFT_LIMIT_NU, [lum_nu, flux_density_limit, alpha, model, lum_unit, flux_unit]);
}

/**
 * Largest redshift at which a source of absolute magnitude M stays at or brighter than a magnitude limit: M + μ(z) + K(z) ≤ limit, K the power-law K-correction.
 * @customfunction REDSHIFT_LIMIT_MAG REDSHIFT_LIMIT_MAG
 * @helpurl https://localhost:3000/help.html#REDSHIFT_LIMIT_MAG
 * @example =ZC.REDSHIFT_LIMIT_MAG(-21, 24.5)
 * @param abs_mag Absolute magnitude M (value or range).
 * @param mag_limit Limiting apparent magnitude (value or range).
 * @param [alpha] Spectral index for K = −2.5(1+alpha)log10(1+z): S_ν ∝ ν^alpha; synchrotron ≈ −0.7; other conventions via ZC.SPECTRAL_INDEX; blank = −1 (no K-correction) (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @returns z_max.
 */
export function REDSHIFT_LIMIT_MAG(abs_mag: any[][], mag_limit: any[][], alpha?: any[][], model?: any[][]): any[][] {
  return callFromSheet(d.REDSHIFT_LIMIT_MAG, [abs_mag, mag_limit, alpha, model]);
}

/**
 * V_max of the 1/V_max estimator (Schmidt 1968): comoving volume over the survey area between max(z_lo, z_min) and min(z_max, z_hi), 0 when that range is empty; in Mpc3 unless a unit is given.
 * @customfunction VOLUME_MAX VOLUME_MAX
 * @helpurl https://localhost:3000/help.html#VOLUME_MAX
 * @example =ZC.VOLUME_MAX(1.3, 0.05, 3, 50)
 * @param z_max The source's limiting redshift at the faint limit (e.g. from ZC.REDSHIFT_LIMIT), ≥ 0 (value or range).
 * @param z_lo Lower redshift bound of the sample, ≥ 0 (value or range).
 * @param z_hi Upper redshift bound of the sample, ≥ z_lo (value or range).
 * @param area Survey area, required, in deg2 by default (value or range).
 * @param [z_min] The source's bright limit: the lowest redshift at which it would enter the sample; blank = 0 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [unit] Output unit, default "Mpc3" (e.g. "Gpc3", "(Mpc/h)3").
 * @param [area_unit] Unit of area, default "deg2" (e.g. "sr").
 * @returns V_max (Mpc3 by default).
 */
export function VOLUME_MAX(z_max: any[][], z_lo: any[][], z_hi: any[][], area: any[][], z_min?: any[][], model?: any[][], unit?: string, area_unit?: string): any[][] {
  return callFromSheet(d.VOLUME_MAX, [z_max, z_lo, z_hi, area, z_min, model, unit, area_unit]);
}

/**
 * Binned luminosity (or mass) function by 1/V_max (Schmidt 1968; Felten 1976): one row per bin, five columns: bin low, bin high, N, Φ = Σ(1/V_max)/Δbin, σ_Φ = √Σ(1/V_max²)/Δbin; per unit of values (per dex for log10 L, per mag for magnitudes) per unit of V_max's volume (Mpc3 from ZC.VOLUME_MAX).
 * @customfunction LUMINOSITY_FUNCTION LUMINOSITY_FUNCTION
 * @helpurl https://localhost:3000/help.html#LUMINOSITY_FUNCTION
 * @example =ZC.LUMINOSITY_FUNCTION({42.1;42.4;42.8;43.2}, {3E5;1.2E6;6.8E6;6E7}, {42;42.5;43;43.5})
 * @param values Each source's binned quantity, e.g. log10 L (range).
 * @param v_max Each source's V_max, > 0, e.g. from ZC.VOLUME_MAX (range of the same size).
 * @param edges Bin edges, increasing, in the scale of values (log10 edges for log10 L) (range); values outside them are ignored; at most 1,000 bins (#VALUE! beyond); no value within the edges is #N/A.
 * @returns A table that spills: low, high, N, Φ, σ_Φ per bin.
 */
export function LUMINOSITY_FUNCTION(values: any[][], v_max: any[][], edges: any[][]): any[][] {
  return callFromSheet(d.LUMINOSITY_FUNCTION, [values, v_max, edges]);
}

/**
 * χ² of a Hubble diagram against a model, Σ((μ − μ_model(z) − offset)/σ)²; a blank offset is minimised over analytically (the H0–M degeneracy: χ² = A − B²/C, Goliath et al. 2001). What Solver or a what-if table over models minimises.
 * @customfunction CHI2_MODULUS CHI2_MODULUS
 * @helpurl https://localhost:3000/help.html#CHI2_MODULUS
 * @example =ZC.CHI2_MODULUS({0.03;0.11;0.27;0.48}, {35.9;38.8;40.9;42.3}, {0.15;0.12;0.13;0.12})
 * @param z Redshifts, > 0 (range).
 * @param mu Distance moduli, mag (range of the same size).
 * @param mu_err Their 1σ errors, > 0, mag (range of the same size).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [offset] A fixed offset in μ (mag); blank = the best one (analytic minimum).
 * @returns χ².
 */
export function CHI2_MODULUS(z: any[][], mu: any[][], mu_err: any[][], model?: any[][], offset?: any[][]): any[][] {
  return callFromSheet(d.CHI2_MODULUS, [z, mu, mu_err, model, offset]);
}
