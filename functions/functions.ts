/**
 * The ZC.* worksheet functions: each is its JSDoc (read by the metadata plugin to build
 * functions.json) plus one line handing the arguments to the shared wrapper. Arguments marked
 * "range" broadcast: a single value or a range, and a column against a row makes a table.
 * Omitted or blank `model` means the workbook's active cosmology (P18-BAO until one is applied).
 */
/* eslint-disable @typescript-eslint/no-explicit-any */
import { callFromSheet } from "./evaluate.js";
import { definitions as d } from "./definitions.js";

/**
 * Luminosity distance D_L = (1+z) D_M (Hogg 1999), in Mpc unless a unit is given.
 * @customfunction DIST_LUM DIST_LUM
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param z Redshift, ≥ 0 (value or range).
 * @param [model] Cosmology: preset name, model spec, or key/value block; blank = workbook's active model.
 * @param [unit] Output unit, default "Mpc" (e.g. "Gpc", "Gly", "m").
 * @returns Luminosity distance (Mpc by default).
 */
export function DIST_LUM(z: any[][], model?: any[][], unit?: string): any[][] {
  return callFromSheet(d.DIST_LUM, [z, model, unit]);
}

/**
 * Angular-diameter distance D_A = D_M / (1+z), in Mpc unless a unit is given.
 * @customfunction DIST_ANG DIST_ANG
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param z Redshift, ≥ 0 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [unit] Output unit, default "Mpc".
 * @returns Angular-diameter distance (Mpc by default).
 */
export function DIST_ANG(z: any[][], model?: any[][], unit?: string): any[][] {
  return callFromSheet(d.DIST_ANG, [z, model, unit]);
}

/**
 * Line-of-sight comoving distance D_C, in Mpc unless a unit is given.
 * @customfunction DIST_LOS DIST_LOS
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param z Redshift, ≥ 0 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [unit] Output unit, default "Mpc".
 * @returns Line-of-sight comoving distance (Mpc by default).
 */
export function DIST_LOS(z: any[][], model?: any[][], unit?: string): any[][] {
  return callFromSheet(d.DIST_LOS, [z, model, unit]);
}

/**
 * Transverse comoving distance D_M, in Mpc unless a unit is given.
 * @customfunction DIST_TRANS DIST_TRANS
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param z Redshift, ≥ 0 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [unit] Output unit, default "Mpc".
 * @returns Transverse comoving distance (Mpc by default).
 */
export function DIST_TRANS(z: any[][], model?: any[][], unit?: string): any[][] {
  return callFromSheet(d.DIST_TRANS, [z, model, unit]);
}

/**
 * Angular-diameter distance of a source at z2 seen from z1 (lens to source), in Mpc.
 * @customfunction DIST_BETWEEN DIST_BETWEEN
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param z1 Redshift of the observer (e.g. a lens), ≥ 0 (value or range).
 * @param z2 Redshift of the source, ≥ z1 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [unit] Output unit, default "Mpc".
 * @returns Angular-diameter distance from z1 to z2 (Mpc by default).
 */
export function DIST_BETWEEN(z1: any[][], z2: any[][], model?: any[][], unit?: string): any[][] {
  return callFromSheet(d.DIST_BETWEEN, [z1, z2, model, unit]);
}

/**
 * Light-travel distance: c times the look-back time, in Mpc unless a unit is given.
 * @customfunction DIST_LIGHT DIST_LIGHT
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param z Redshift, ≥ 0 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [unit] Output unit, default "Mpc" (e.g. "Gly").
 * @returns Light-travel distance (Mpc by default).
 */
export function DIST_LIGHT(z: any[][], model?: any[][], unit?: string): any[][] {
  return callFromSheet(d.DIST_LIGHT, [z, model, unit]);
}

/**
 * Distance modulus μ = 5 log10(D_L / 10 pc), in magnitudes.
 * @customfunction MODULUS MODULUS
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param z Redshift, > 0 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @returns Distance modulus (mag).
 */
export function MODULUS(z: any[][], model?: any[][]): any[][] {
  return callFromSheet(d.MODULUS, [z, model]);
}

/**
 * Look-back time to redshift z, in Gyr unless a unit is given.
 * @customfunction LOOKBACK LOOKBACK
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param z Redshift, ≥ 0 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [unit] Output unit, default "Gyr" (e.g. "Myr", "yr").
 * @returns Look-back time (Gyr by default).
 */
export function LOOKBACK(z: any[][], model?: any[][], unit?: string): any[][] {
  return callFromSheet(d.LOOKBACK, [z, model, unit]);
}

/**
 * Age of the universe at redshift z (today if z is omitted), in Gyr unless a unit is given.
 * @customfunction AGE AGE
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param [z] Redshift, ≥ 0 (value or range); omitted = today.
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [unit] Output unit, default "Gyr".
 * @returns Age at z (Gyr by default).
 */
export function AGE(z?: any[][], model?: any[][], unit?: string): any[][] {
  return callFromSheet(d.AGE, [z, model, unit]);
}

/**
 * Hubble parameter H(z), in km/s/Mpc unless a unit is given.
 * @customfunction HUBBLE HUBBLE
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param [z] Redshift, ≥ 0 (value or range); omitted = today (H0).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [unit] Output unit, default "km/s/Mpc" (e.g. "s-1").
 * @returns H(z) (km/s/Mpc by default).
 */
export function HUBBLE(z?: any[][], model?: any[][], unit?: string): any[][] {
  return callFromSheet(d.HUBBLE, [z, model, unit]);
}

/**
 * Density parameter of one component at z: "matter" (incl. massive ν), "darkenergy", "curvature", "radiation" (photons + massless ν), "photons" or "neutrinos" (all ν).
 * @customfunction OMEGA OMEGA
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param component "matter", "darkenergy", "curvature", "radiation", "photons" or "neutrinos" (value or range).
 * @param [z] Redshift, ≥ 0 (value or range); omitted = today.
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @returns Density parameter (dimensionless).
 */
export function OMEGA(component: any[][], z?: any[][], model?: any[][]): any[][] {
  return callFromSheet(d.OMEGA, [component, z, model]);
}

/**
 * CMB temperature at redshift z, Tcmb (1+z), in K.
 * @customfunction CMB_TEMP CMB_TEMP
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param [z] Redshift, ≥ 0 (value or range); omitted = today.
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @returns Temperature (K).
 */
export function CMB_TEMP(z?: any[][], model?: any[][]): any[][] {
  return callFromSheet(d.CMB_TEMP, [z, model]);
}

/**
 * Critical density 3H(z)²/(8πG), in kg/m3 unless a unit is given.
 * @customfunction CRIT_DENSITY CRIT_DENSITY
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param [z] Redshift, ≥ 0 (value or range); omitted = today.
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [unit] Output unit, default "kg/m3" (e.g. "solMass/Mpc3", "g/cm3").
 * @returns Critical density (kg/m3 by default).
 */
export function CRIT_DENSITY(z?: any[][], model?: any[][], unit?: string): any[][] {
  return callFromSheet(d.CRIT_DENSITY, [z, model, unit]);
}

/**
 * Proper size per unit angle at z (proper scale), in kpc/arcsec unless a unit is given.
 * @customfunction PROPER_SCALE PROPER_SCALE
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param z Redshift, > 0 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [unit] Output unit, default "kpc/arcsec" (e.g. "Mpc/deg").
 * @returns Proper scale (kpc/arcsec by default).
 */
export function PROPER_SCALE(z: any[][], model?: any[][], unit?: string): any[][] {
  return callFromSheet(d.PROPER_SCALE, [z, model, unit]);
}

/**
 * Proper size subtending an angle at z, in kpc unless a unit is given (angle in arcsec by default).
 * @customfunction SIZE SIZE
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param angle Angle, ≥ 0, in arcsec by default (value or range).
 * @param z Redshift, ≥ 0 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [angle_unit] Unit of angle, default "arcsec".
 * @param [size_unit] Output unit, default "kpc".
 * @returns Proper size (kpc by default).
 */
export function SIZE(angle: any[][], z: any[][], model?: any[][], angle_unit?: string, size_unit?: string): any[][] {
  return callFromSheet(d.SIZE, [angle, z, model, angle_unit, size_unit]);
}

/**
 * Angle subtended by a proper size at z, in arcsec unless a unit is given (size in kpc by default).
 * @customfunction ANGLE ANGLE
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param size Proper size, ≥ 0, in kpc by default (value or range).
 * @param z Redshift, > 0 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [size_unit] Unit of size, default "kpc".
 * @param [angle_unit] Output unit, default "arcsec".
 * @returns Angle (arcsec by default).
 */
export function ANGLE(size: any[][], z: any[][], model?: any[][], size_unit?: string, angle_unit?: string): any[][] {
  return callFromSheet(d.ANGLE, [size, z, model, size_unit, angle_unit]);
}

/**
 * All-sky comoving volume within redshift z, in Gpc3 unless a unit is given.
 * @customfunction VOLUME VOLUME
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param z Redshift, ≥ 0 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [unit] Output unit, default "Gpc3" (e.g. "Mpc3").
 * @returns Comoving volume (Gpc3 by default).
 */
export function VOLUME(z: any[][], model?: any[][], unit?: string): any[][] {
  return callFromSheet(d.VOLUME, [z, model, unit]);
}

/**
 * Comoving volume between z1 and z2 over a sky area (all sky if omitted), in Gpc3 (area in deg2).
 * @customfunction VOLUME_SHELL VOLUME_SHELL
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param z1 Inner redshift, ≥ 0 (value or range).
 * @param z2 Outer redshift, ≥ z1 (value or range).
 * @param [area] Sky area, in deg2 by default; omitted = whole sky (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [unit] Output unit, default "Gpc3".
 * @param [area_unit] Unit of area, default "deg2" (e.g. "sr", "arcmin2").
 * @returns Shell volume (Gpc3 by default).
 */
export function VOLUME_SHELL(z1: any[][], z2: any[][], area?: any[][], model?: any[][], unit?: string, area_unit?: string): any[][] {
  return callFromSheet(d.VOLUME_SHELL, [z1, z2, area, model, unit, area_unit]);
}

/**
 * Comoving volume element dV/dz/dΩ = D_H D_M² / E(z), in Mpc3/sr unless a unit is given.
 * @customfunction VOLUME_ELEMENT VOLUME_ELEMENT
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param z Redshift, ≥ 0 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [unit] Output unit, default "Mpc3/sr" (e.g. "Mpc3/deg2").
 * @returns Volume element (Mpc3/sr by default).
 */
export function VOLUME_ELEMENT(z: any[][], model?: any[][], unit?: string): any[][] {
  return callFromSheet(d.VOLUME_ELEMENT, [z, model, unit]);
}

/**
 * Bolometric luminosity L = 4π D_L² F, in W (flux in W/m2) unless units are given.
 * @customfunction LUMINOSITY LUMINOSITY
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param flux Bolometric flux, ≥ 0, in W/m2 by default (value or range).
 * @param z Redshift, > 0 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [flux_unit] Unit of flux, default "W/m2" (e.g. "erg/s/cm2").
 * @param [lum_unit] Output unit, default "W" (e.g. "erg/s", "Lsun").
 * @returns Luminosity (W by default).
 */
export function LUMINOSITY(flux: any[][], z: any[][], model?: any[][], flux_unit?: string, lum_unit?: string): any[][] {
  return callFromSheet(d.LUMINOSITY, [flux, z, model, flux_unit, lum_unit]);
}

/**
 * Bolometric flux F = L / (4π D_L²), in W/m2 (luminosity in W) unless units are given.
 * @customfunction FLUX FLUX
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param lum Luminosity, ≥ 0, in W by default (value or range).
 * @param z Redshift, > 0 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [lum_unit] Unit of luminosity, default "W" (e.g. "Lsun").
 * @param [flux_unit] Output unit, default "W/m2" (e.g. "erg/s/cm2").
 * @returns Flux (W/m2 by default).
 */
export function FLUX(lum: any[][], z: any[][], model?: any[][], lum_unit?: string, flux_unit?: string): any[][] {
  return callFromSheet(d.FLUX, [lum, z, model, lum_unit, flux_unit]);
}

/**
 * Rest-frame spectral luminosity for a power law S_ν ∝ ν^alpha: 4π D_L² S_ν (1+z)^−(1+alpha), in W/Hz (flux density in Jy).
 * @customfunction LUMINOSITY_NU LUMINOSITY_NU
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param flux_density Observed flux density, ≥ 0, in Jy by default (value or range).
 * @param z Redshift, > 0 (value or range).
 * @param alpha Spectral index of S_ν ∝ ν^alpha, e.g. -0.7 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [in_unit] Unit of flux density, default "Jy" (e.g. "mJy", "uJy").
 * @param [out_unit] Output unit, default "W/Hz" (e.g. "erg/s/Hz").
 * @returns Spectral luminosity (W/Hz by default).
 */
export function LUMINOSITY_NU(flux_density: any[][], z: any[][], alpha: any[][], model?: any[][], in_unit?: string, out_unit?: string): any[][] {
  return callFromSheet(d.LUMINOSITY_NU, [flux_density, z, alpha, model, in_unit, out_unit]);
}

/**
 * K-correction of a power law S_ν ∝ ν^alpha: K = −2.5 (1+alpha) log10(1+z), for M = m − μ − K (mag).
 * @customfunction KCORRECTION KCORRECTION
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param z Redshift, ≥ 0 (value or range).
 * @param alpha Spectral index of S_ν ∝ ν^alpha (value or range).
 * @returns K-correction (mag).
 */
export function KCORRECTION(z: any[][], alpha: any[][]): any[][] {
  return callFromSheet(d.KCORRECTION, [z, alpha]);
}

/**
 * Absolute magnitude M = m − μ − K.
 * @customfunction MAG_ABS MAG_ABS
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param m Apparent magnitude (value or range).
 * @param z Redshift, > 0 (value or range).
 * @param [kcorr] K-correction in mag, default 0 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @returns Absolute magnitude (mag).
 */
export function MAG_ABS(m: any[][], z: any[][], kcorr?: any[][], model?: any[][]): any[][] {
  return callFromSheet(d.MAG_ABS, [m, z, kcorr, model]);
}

/**
 * Apparent magnitude m = M + μ + K.
 * @customfunction MAG_APP MAG_APP
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param M Absolute magnitude (value or range).
 * @param z Redshift, > 0 (value or range).
 * @param [kcorr] K-correction in mag, default 0 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @returns Apparent magnitude (mag).
 */
export function MAG_APP(M: any[][], z: any[][], kcorr?: any[][], model?: any[][]): any[][] {
  return callFromSheet(d.MAG_APP, [M, z, kcorr, model]);
}

/**
 * AB magnitude of a flux density: −2.5 log10(f_ν / 3630.78 Jy).
 * @customfunction MAG_AB MAG_AB
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param flux_density Flux density, > 0, in Jy by default (value or range).
 * @param [unit] Unit of flux density, default "Jy" (e.g. "uJy", "erg/s/cm2/Hz").
 * @returns AB magnitude (mag).
 */
export function MAG_AB(flux_density: any[][], unit?: string): any[][] {
  return callFromSheet(d.MAG_AB, [flux_density, unit]);
}

/**
 * Flux density of an AB magnitude, in Jy unless a unit is given.
 * @customfunction FLUX_AB FLUX_AB
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param m_ab AB magnitude (value or range).
 * @param [unit] Output unit, default "Jy" (e.g. "uJy").
 * @returns Flux density (Jy by default).
 */
export function FLUX_AB(m_ab: any[][], unit?: string): any[][] {
  return callFromSheet(d.FLUX_AB, [m_ab, unit]);
}

/**
 * 1σ error of the luminosity distance from a redshift error, |dD_L/dz| σ_z (first order, exact derivative), in Mpc unless a unit is given.
 * @customfunction DIST_LUM_ERR DIST_LUM_ERR
 * @helpurl https://localhost:3000/help.html#function-reference
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
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param flux Bolometric flux, ≥ 0, in W/m2 by default (value or range).
 * @param flux_err 1σ error of the flux, ≥ 0, in the flux's unit (value or range).
 * @param z Redshift, > 0 (value or range).
 * @param z_err 1σ error of z, ≥ 0 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [flux_unit] Unit of flux and flux_err, default "W/m2" (e.g. "erg/s/cm2").
 * @param [lum_unit] Output unit, default "W" (e.g. "erg/s", "Lsun").
 * @returns Error of the luminosity (W by default).
 */
export function LUMINOSITY_ERR(flux: any[][], flux_err: any[][], z: any[][], z_err: any[][], model?: any[][], flux_unit?: string, lum_unit?: string): any[][] {
  return callFromSheet(d.LUMINOSITY_ERR, [flux, flux_err, z, z_err, model, flux_unit, lum_unit]);
}

/**
 * 1σ error of a spectral luminosity L_ν (as ZC.LUMINOSITY_NU) from independent errors of flux density, z and spectral index (first order).
 * @customfunction LUMINOSITY_NU_ERR LUMINOSITY_NU_ERR
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param flux_density Observed flux density, ≥ 0, in Jy by default (value or range).
 * @param flux_density_err 1σ error of the flux density, ≥ 0, in its unit (value or range).
 * @param z Redshift, > 0 (value or range).
 * @param z_err 1σ error of z, ≥ 0 (value or range).
 * @param alpha Spectral index α of S_ν ∝ ν^α (value or range).
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
 * 1σ error of an absolute magnitude M = m − μ − K from independent errors of m, z and K (first order): √(σ_m² + (dμ/dz σ_z)² + σ_K²).
 * @customfunction MAG_ABS_ERR MAG_ABS_ERR
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param m_err 1σ error of the apparent magnitude, ≥ 0 (value or range).
 * @param z Redshift, > 0 (value or range).
 * @param z_err 1σ error of z, ≥ 0 (value or range).
 * @param [kcorr_err] 1σ error of the K-correction, ≥ 0; blank = 0 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @returns Error of M (mag).
 */
export function MAG_ABS_ERR(m_err: any[][], z: any[][], z_err: any[][], kcorr_err?: any[][], model?: any[][]): any[][] {
  return callFromSheet(d.MAG_ABS_ERR, [m_err, z, z_err, kcorr_err, model]);
}

/**
 * 1σ error of a proper size (as ZC.SIZE) from independent angle and redshift errors (first order), in kpc unless a unit is given.
 * @customfunction SIZE_ERR SIZE_ERR
 * @helpurl https://localhost:3000/help.html#function-reference
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
 * Rest-frame spectral luminosity at another frequency or wavelength, from a flux density observed at one, for a power law S_ν ∝ ν^α: L_ν(rest) = 4πD_L² S_ν (1+z)^−(1+α) (rest/observed)^α.
 * @customfunction LUMINOSITY_REST LUMINOSITY_REST
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param flux_density Flux density observed at `observed`, ≥ 0, in Jy by default (value or range).
 * @param z Redshift, > 0 (value or range).
 * @param alpha Spectral index α of S_ν ∝ ν^α (value or range).
 * @param observed Observed frequency, wavelength or energy, > 0, in band_unit (value or range).
 * @param rest Rest-frame frequency, wavelength or energy wanted, > 0, in band_unit (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [band_unit] Unit of observed and rest, default "GHz" (e.g. "MHz", "Angstrom", "nm", "um", "eV").
 * @param [in_unit] Unit of flux_density, default "Jy".
 * @param [out_unit] Default "W/Hz" (L_ν); a power unit ("W", "erg/s", "Lsun") gives ν L_ν = λ L_λ.
 * @returns L_ν at the rest frequency (W/Hz), or ν L_ν in a power unit.
 */
export function LUMINOSITY_REST(flux_density: any[][], z: any[][], alpha: any[][], observed: any[][], rest: any[][], model?: any[][], band_unit?: string, in_unit?: string, out_unit?: string): any[][] {
  return callFromSheet(d.LUMINOSITY_REST, [flux_density, z, alpha, observed, rest, model, band_unit, in_unit, out_unit]);
}

/**
 * Absolute bolometric magnitude of a luminosity, −2.5 log10(L / 3.0128e28 W) (IAU 2015 Resolution B2).
 * @customfunction MAG_BOL MAG_BOL
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param lum Bolometric luminosity, > 0, in W by default (value or range).
 * @param [unit] Unit of lum, default "W" (e.g. "Lsun", "erg/s").
 * @returns M_bol (mag).
 */
export function MAG_BOL(lum: any[][], unit?: string): any[][] {
  return callFromSheet(d.MAG_BOL, [lum, unit]);
}

/**
 * Bolometric luminosity of an absolute bolometric magnitude, 3.0128e28 W × 10^(−0.4 M_bol) (IAU 2015 Resolution B2).
 * @customfunction LUM_BOL LUM_BOL
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param mag_bol Absolute bolometric magnitude (value or range).
 * @param [unit] Output unit, default "W" (e.g. "Lsun").
 * @returns Luminosity (W by default).
 */
export function LUM_BOL(mag_bol: any[][], unit?: string): any[][] {
  return callFromSheet(d.LUM_BOL, [mag_bol, unit]);
}

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

/**
 * Redshift in the CMB frame: corrects a heliocentric redshift for the Sun's motion, 369.82 km/s towards galactic (l, b) = (264.021°, 48.253°) (Planck 2018 CMB dipole).
 * @customfunction REDSHIFT_CMB REDSHIFT_CMB
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param z_helio Heliocentric redshift, > −1 (value or range).
 * @param ra Right ascension (ICRS), in deg by default (value or range).
 * @param dec Declination (ICRS), −90° … 90°, in deg by default (value or range).
 * @param [angle_unit] Unit of ra and dec, default "deg" (e.g. "rad").
 * @returns z_cmb.
 */
export function REDSHIFT_CMB(z_helio: any[][], ra: any[][], dec: any[][], angle_unit?: string): any[][] {
  return callFromSheet(d.REDSHIFT_CMB, [z_helio, ra, dec, angle_unit]);
}

/**
 * Surface-brightness dimming in magnitudes: 10 log10(1+z) bolometric (Tolman), or 2.5 (3 − α) log10(1+z) per unit frequency at a fixed observed frequency for S_ν ∝ ν^α.
 * @customfunction DIMMING DIMMING
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param z Redshift, ≥ 0 (value or range).
 * @param [alpha] Spectral index α; blank = bolometric (value or range).
 * @returns Dimming (mag).
 */
export function DIMMING(z: any[][], alpha?: any[][]): any[][] {
  return callFromSheet(d.DIMMING, [z, alpha]);
}

/**
 * Redshift at which a quantity takes a value (inverse): quantity is "DIST_LUM", "DIST_LOS", "DIST_TRANS", "DIST_ANG" (lower branch), "DIST_LIGHT", "MODULUS", "LOOKBACK", "AGE" or "VOLUME".
 * @customfunction REDSHIFT REDSHIFT
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param value Value of the quantity, in its default unit unless one is given (value or range).
 * @param quantity Name of the function inverted, e.g. "DIST_LUM".
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [unit] Unit of value; default that of the function inverted (Mpc, Gyr, Gpc3 for VOLUME; MODULUS in mag takes none).
 * @returns Redshift.
 */
export function REDSHIFT(value: any[][], quantity: string, model?: any[][], unit?: string): any[][] {
  return callFromSheet(d.REDSHIFT, [value, quantity, model, unit]);
}

/**
 * Converts a value between astronomical units (pc, Mpc, ly, au, erg/s, Lsun, Jy, deg2, ...).
 * @customfunction CONVERT CONVERT
 * @helpurl https://localhost:3000/help.html#units
 * @param value Value (value or range).
 * @param from Unit of value, e.g. "Mpc".
 * @param to Wanted unit, e.g. "Gly".
 * @param [model] Cosmology for h-scaled units (Mpc/h, (Mpc/h)3, h-1 Msun: h = H0/100); blank = workbook's active model.
 * @returns The value in the wanted unit.
 */
export function CONVERT(value: any[][], from: string, to: string, model?: any[][]): any[][] {
  return callFromSheet(d.CONVERT, [value, from, to, model]);
}

/**
 * Model spec text: a base model changed by key/value pairs, e.g. ZC.MODEL("P18-BAO", "H0", B1); keys H0, Om, OL, Ok, Ob, w0, wa, Tcmb, Neff, mnu.
 * @customfunction MODEL MODEL
 * @helpurl https://localhost:3000/help.html#model-spec
 * @param base Model to start from: preset, spec, key/value block or workbook model; blank = workbook's active model.
 * @param key1 Parameter to change, e.g. "H0" (value or range).
 * @param value1 Its new value (value or range); mnu may be a list as text "0.05,0.01".
 * @param [key2] Second parameter to change.
 * @param [value2] Its new value.
 * @param [key3] Third parameter to change.
 * @param [value3] Its new value.
 * @param [key4] Fourth parameter to change.
 * @param [value4] Its new value.
 * @param [key5] Fifth parameter to change.
 * @param [value5] Its new value.
 * @param [key6] Sixth parameter to change.
 * @param [value6] Its new value.
 * @returns Canonical model spec text (for the model argument of the other functions).
 */
export function MODEL(
  base: any[][], key1: any[][], value1: any[][], key2?: any[][], value2?: any[][], key3?: any[][], value3?: any[][],
  key4?: any[][], value4?: any[][], key5?: any[][], value5?: any[][], key6?: any[][], value6?: any[][],
): any[][] {
  return callFromSheet(d.MODEL, [base, key1, value1, key2, value2, key3, value3, key4, value4, key5, value5, key6, value6]);
}

/**
 * A parameter or derived value of a model: H0, h, Om, OL, Ok, Or, Ob, w0, wa, Tcmb, Neff, mnu, age_today (Gyr), hubble_time (Gyr), hubble_distance (Mpc), z_eq.
 * @customfunction PARAM PARAM
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param name Parameter name, e.g. "age_today" (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @returns The parameter's value.
 */
export function PARAM(name: any[][], model?: any[][]): any[][] {
  return callFromSheet(d.PARAM, [name, model]);
}

/**
 * Table of the parameter sets: the built-in presets with their sources, then the models defined in this workbook.
 * @customfunction PRESETS PRESETS
 * @helpurl https://localhost:3000/help.html#presets
 * @returns Two columns: name, description.
 */
export function PRESETS(): any[][] {
  return callFromSheet(d.PRESETS, []);
}

/**
 * One line of plain words describing a model, all parameters shown.
 * @customfunction DESCRIBE DESCRIBE
 * @helpurl https://localhost:3000/help.html#function-reference
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @returns Description text.
 */
export function DESCRIBE(model?: any[][]): any[][] {
  return callFromSheet(d.DESCRIBE, [model]);
}

/**
 * zcell's version and the engine's conventions, for provenance in shared workbooks.
 * @customfunction VERSION VERSION
 * @helpurl https://localhost:3000/help.html#conventions
 * @returns Version text.
 */
export function VERSION(): any[][] {
  return callFromSheet(d.VERSION, []);
}
