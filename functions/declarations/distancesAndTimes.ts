/**
 * Distances, times, volumes and redshifts: the luminosity, angular-diameter, comoving and light-travel
 * distances, the distance modulus, look-back time and age, H(z), density parameters, CMB temperature,
 * the critical density, angular scales, comoving volumes, the inverse (ZC.REDSHIFT) and the CMB-frame
 * redshift.
 * Each function is its JSDoc (read by the metadata plugin into functions.json) plus one line handing
 * the arguments to the shared wrapper; see functions/functions.ts for the conventions of all families.
 */
/* eslint-disable @typescript-eslint/no-explicit-any */
import { definitions as d } from "../definitions.js";
import { callFromSheet } from "../evaluate.js";

/**
 * Luminosity distance D_L = (1+z) D_M (Hogg 1999), in Mpc unless a unit is given.
 * @customfunction DIST_LUM DIST_LUM
 * @helpurl https://localhost:3000/help.html#DIST_LUM
 * @example =ZC.DIST_LUM(1)
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
 * @helpurl https://localhost:3000/help.html#DIST_ANG
 * @example =ZC.DIST_ANG(1.5)
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
 * @helpurl https://localhost:3000/help.html#DIST_LOS
 * @example =ZC.DIST_LOS(0.5, , "Mpc/h")
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
 * @helpurl https://localhost:3000/help.html#DIST_TRANS
 * @example =ZC.DIST_TRANS(2, "H0=70; Om=0.3; Ok=0.1")
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
 * @helpurl https://localhost:3000/help.html#DIST_BETWEEN
 * @example =ZC.DIST_BETWEEN(0.35, 1.2)
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
 * @helpurl https://localhost:3000/help.html#DIST_LIGHT
 * @example =ZC.DIST_LIGHT(3, , "Gly")
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
 * @helpurl https://localhost:3000/help.html#MODULUS
 * @example =ZC.MODULUS(0.1)
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
 * @helpurl https://localhost:3000/help.html#LOOKBACK
 * @example =ZC.LOOKBACK(2)
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
 * @helpurl https://localhost:3000/help.html#AGE
 * @example =ZC.AGE()
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
 * @helpurl https://localhost:3000/help.html#HUBBLE
 * @example =ZC.HUBBLE(1)
 * @param [z] Redshift, ≥ 0 (value or range); omitted = today (H0).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [unit] Output unit, default "km/s/Mpc" (e.g. "s-1").
 * @returns H(z) (km/s/Mpc by default).
 */
export function HUBBLE(z?: any[][], model?: any[][], unit?: string): any[][] {
  return callFromSheet(d.HUBBLE, [z, model, unit]);
}

/**
 * Density parameter of one component at z: "matter" (CDM + baryons + massive ν at every z, as Om), "cold" (CDM + baryons: the matter of PARAM("z_eq")), "darkenergy", "curvature", "radiation" (photons + massless ν), "photons" or "neutrinos" (all ν).
 * @customfunction OMEGA OMEGA
 * @helpurl https://localhost:3000/help.html#OMEGA
 * @example =ZC.OMEGA("matter", 1)
 * @param component "matter", "cold", "darkenergy", "curvature", "radiation", "photons" or "neutrinos" (value or range).
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
 * @helpurl https://localhost:3000/help.html#CMB_TEMP
 * @example =ZC.CMB_TEMP(1100)
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
 * @helpurl https://localhost:3000/help.html#CRIT_DENSITY
 * @example =ZC.CRIT_DENSITY(0, , "solMass/Mpc3")
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
 * @helpurl https://localhost:3000/help.html#PROPER_SCALE
 * @example =ZC.PROPER_SCALE(0.5)
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
 * @helpurl https://localhost:3000/help.html#SIZE
 * @example =ZC.SIZE(2.5, 0.8)
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
 * @helpurl https://localhost:3000/help.html#ANGLE
 * @example =ZC.ANGLE(30, 2)
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
 * All-sky comoving volume within redshift z, in Mpc3 unless a unit is given.
 * @customfunction VOLUME VOLUME
 * @helpurl https://localhost:3000/help.html#VOLUME
 * @example =ZC.VOLUME(1, , "Gpc3")
 * @param z Redshift, ≥ 0 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [unit] Output unit, default "Mpc3" (e.g. "Gpc3").
 * @returns Comoving volume (Mpc3 by default).
 */
export function VOLUME(z: any[][], model?: any[][], unit?: string): any[][] {
  return callFromSheet(d.VOLUME, [z, model, unit]);
}

/**
 * Comoving volume between z1 and z2 over a sky area (all sky if omitted), in Mpc3 (area in deg2).
 * @customfunction VOLUME_SHELL VOLUME_SHELL
 * @helpurl https://localhost:3000/help.html#VOLUME_SHELL
 * @example =ZC.VOLUME_SHELL(0.5, 1, 100)
 * @param z1 Inner redshift, ≥ 0 (value or range).
 * @param z2 Outer redshift, ≥ z1 (value or range).
 * @param [area] Sky area, in deg2 by default; omitted = whole sky (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [unit] Output unit, default "Mpc3" (e.g. "Gpc3").
 * @param [area_unit] Unit of area, default "deg2" (e.g. "sr", "arcmin2").
 * @returns Shell volume (Mpc3 by default).
 */
export function VOLUME_SHELL(z1: any[][], z2: any[][], area?: any[][], model?: any[][], unit?: string, area_unit?: string): any[][] {
  return callFromSheet(d.VOLUME_SHELL, [z1, z2, area, model, unit, area_unit]);
}

/**
 * Comoving volume element dV/dz/dΩ = D_H D_M² / E(z), in Mpc3/sr unless a unit is given.
 * @customfunction VOLUME_ELEMENT VOLUME_ELEMENT
 * @helpurl https://localhost:3000/help.html#VOLUME_ELEMENT
 * @example =ZC.VOLUME_ELEMENT(1)
 * @param z Redshift, ≥ 0 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [unit] Output unit, default "Mpc3/sr" (e.g. "Mpc3/deg2").
 * @returns Volume element (Mpc3/sr by default).
 */
export function VOLUME_ELEMENT(z: any[][], model?: any[][], unit?: string): any[][] {
  return callFromSheet(d.VOLUME_ELEMENT, [z, model, unit]);
}

/**
 * Redshift at which a quantity takes a value (inverse): quantity is "DIST_LUM", "DIST_LOS", "DIST_TRANS", "DIST_ANG" (lower branch), "DIST_LIGHT", "MODULUS", "LOOKBACK", "AGE" or "VOLUME".
 * @customfunction REDSHIFT REDSHIFT
 * @helpurl https://localhost:3000/help.html#REDSHIFT
 * @example =ZC.REDSHIFT(10, "LOOKBACK")
 * @param value Value of the quantity, in its default unit unless one is given (value or range).
 * @param quantity Name of the function inverted, e.g. "DIST_LUM".
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [unit] Unit of value; default that of the function inverted (Mpc, Gyr, Mpc3 for VOLUME; MODULUS in mag takes none).
 * @returns Redshift.
 */
export function REDSHIFT(value: any[][], quantity: string, model?: any[][], unit?: string): any[][] {
  return callFromSheet(d.REDSHIFT, [value, quantity, model, unit]);
}

/**
 * Redshift in the CMB frame: corrects a heliocentric redshift for the Sun's motion, 369.82 km/s towards galactic (l, b) = (264.021°, 48.253°) (Planck 2018 CMB dipole).
 * @customfunction REDSHIFT_CMB REDSHIFT_CMB
 * @helpurl https://localhost:3000/help.html#REDSHIFT_CMB
 * @example =ZC.REDSHIFT_CMB(0.05, 150, 20)
 * @param z_helio Heliocentric redshift, > −1 (value or range).
 * @param ra Right ascension (ICRS): a number in angle_unit (deg by default), or sexagesimal text in hours such as "12:30:49.4", "12h30m49.4s" or "12 30 49.4"; keep such text as text in cells (Excel may read 12:30:49.4 typed into a cell as a time of day, a number) (value or range).
 * @param dec Declination (ICRS), −90° … 90°: a number in angle_unit (deg by default), or sexagesimal text in degrees such as "+12:23:28", "-05d07m" or "−05°07′" (value or range).
 * @param [angle_unit] Unit of numbers in ra and dec, default "deg" (e.g. "rad"); "hourangle" makes an ra number hours, and dec then stays in degrees.
 * @returns z_cmb.
 */
export function REDSHIFT_CMB(z_helio: any[][], ra: any[][], dec: any[][], angle_unit?: string): any[][] {
  return callFromSheet(d.REDSHIFT_CMB, [z_helio, ra, dec, angle_unit]);
}
