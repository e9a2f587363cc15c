/**
 * Velocities, redshifts and the rest frame: a redshift as a velocity and back (optical, radio,
 * relativistic conventions), two redshifts composed, a peculiar velocity, and observed wavelengths,
 * frequencies, durations and equivalent widths moved into the source's frame and back.
 * Each function is its JSDoc (read by the metadata plugin into functions.json) plus one line handing
 * the arguments to the shared wrapper; see functions/functions.ts for the conventions of all families.
 */
/* eslint-disable @typescript-eslint/no-explicit-any */
import { definitions as d } from "../definitions.js";
import { callFromSheet } from "../evaluate.js";

/**
 * The velocity a redshift stands for, in km/s unless a unit is given: "optical" v = cz (the default, as redshift surveys quote it), "radio" v = cz/(1+z), "relativistic" v = c((1+z)² − 1)/((1+z)² + 1). A Doppler convention, not a cosmological recession velocity.
 * @customfunction VELOCITY VELOCITY
 * @helpurl https://localhost:3000/help.html#VELOCITY
 * @example =ZC.VELOCITY(0.01)
 * @param z Redshift, > −1 (value or range).
 * @param [convention] "optical" (default), "radio" or "relativistic" (value or range).
 * @param [unit] Output unit, default "km/s" (e.g. "m/s").
 * @returns Velocity, km/s by default.
 */
export function VELOCITY(z: any[][], convention?: any[][], unit?: string): any[][] {
  return callFromSheet(d.VELOCITY, [z, convention, unit]);
}

/**
 * The redshift of a velocity given in a convention (the inverse of VELOCITY): "optical" z = v/c (the default), "radio" z = v/(c − v), "relativistic" 1 + z = √((c + v)/(c − v)).
 * @customfunction Z_FROM_VELOCITY Z_FROM_VELOCITY
 * @helpurl https://localhost:3000/help.html#Z_FROM_VELOCITY
 * @example =ZC.Z_FROM_VELOCITY(4500)
 * @param v Velocity, km/s by default: > −c (optical), < c (radio), between −c and c (relativistic) (value or range).
 * @param [convention] "optical" (default), "radio" or "relativistic" (value or range).
 * @param [unit] Unit of v, default "km/s" (e.g. "m/s").
 * @returns Redshift.
 */
export function Z_FROM_VELOCITY(v: any[][], convention?: any[][], unit?: string): any[][] {
  return callFromSheet(d.Z_FROM_VELOCITY, [v, convention, unit]);
}

/**
 * Two redshifts in turn composed into one: (1 + z1)(1 + z2) − 1 (e.g. a cosmological redshift and a peculiar or heliocentric correction).
 * @customfunction Z_COMBINE Z_COMBINE
 * @helpurl https://localhost:3000/help.html#Z_COMBINE
 * @example =ZC.Z_COMBINE(0.1, 0.001)
 * @param z1 First redshift, > −1 (value or range).
 * @param z2 Second redshift, > −1 (value or range).
 * @returns The combined redshift.
 */
export function Z_COMBINE(z1: any[][], z2: any[][]): any[][] {
  return callFromSheet(d.Z_COMBINE, [z1, z2]);
}

/**
 * Peculiar velocity v = c (z_obs − z_cosmo)/(1 + z_cosmo), in km/s unless a unit is given (Davis & Scrimgeour 2014: from 1 + z_obs = (1 + z_cosmo)(1 + z_pec); not c z_obs − c z_cosmo, which is (1 + z_cosmo) times too large).
 * @customfunction VELOCITY_PECULIAR VELOCITY_PECULIAR
 * @helpurl https://localhost:3000/help.html#VELOCITY_PECULIAR
 * @example =ZC.VELOCITY_PECULIAR(0.101, 0.1)
 * @param z_obs Observed redshift (CMB frame for motion relative to the Hubble flow), > −1 (value or range).
 * @param z_cosmo Cosmological redshift of the source's distance, > −1 (value or range).
 * @param [unit] Output unit, default "km/s".
 * @returns Peculiar velocity, km/s by default; positive is away from us.
 */
export function VELOCITY_PECULIAR(z_obs: any[][], z_cosmo: any[][], unit?: string): any[][] {
  return callFromSheet(d.VELOCITY_PECULIAR, [z_obs, z_cosmo, unit]);
}

/**
 * An observed value in the source's rest frame: "wavelength" λ/(1+z), "frequency" ν(1+z) (also a photon energy E = hν in keV or eV, and an equivalent width in energy), "duration" Δt/(1+z) (the time dilation of a light curve), "equivalent_width" W/(1+z) (in wavelength units). The value keeps its unit.
 * @customfunction REST_FRAME REST_FRAME
 * @helpurl https://localhost:3000/help.html#REST_FRAME
 * @example =ZC.REST_FRAME(7200, 0.1, "wavelength")
 * @param value Observed value: a wavelength or frequency > 0, a duration ≥ 0, an equivalent width of either sign (value or range).
 * @param z Redshift of the source, > −1 (value or range).
 * @param quantity "wavelength", "frequency", "duration" or "equivalent_width" (value or range).
 * @param [unit] Unit of value and result (the same: 1+z has none), checked against the quantity: Angstrom, nm, um for lengths, GHz, MHz or keV, eV for frequencies, d, s for durations; blank = not checked.
 * @returns The rest-frame value, in the unit of value.
 */
export function REST_FRAME(value: any[][], z: any[][], quantity: any[][], unit?: string): any[][] {
  return callFromSheet(d.REST_FRAME, [value, z, quantity, unit]);
}

/**
 * A rest-frame value as observed (the inverse of REST_FRAME): "wavelength" λ(1+z), "frequency" ν/(1+z) (also a photon energy in keV or eV), "duration" Δt(1+z) (time dilation), "equivalent_width" W(1+z). The value keeps its unit.
 * @customfunction OBSERVED_FRAME OBSERVED_FRAME
 * @helpurl https://localhost:3000/help.html#OBSERVED_FRAME
 * @example =ZC.OBSERVED_FRAME(1.4, 0.05, "frequency", "GHz")
 * @param value Rest-frame value: a wavelength or frequency > 0, a duration ≥ 0, an equivalent width of either sign (value or range).
 * @param z Redshift of the source, > −1 (value or range).
 * @param quantity "wavelength", "frequency", "duration" or "equivalent_width" (value or range).
 * @param [unit] Unit of value and result (the same), checked against the quantity: Angstrom, nm, um, GHz, MHz, keV, eV, d, s; blank = not checked.
 * @returns The observed value, in the unit of value.
 */
export function OBSERVED_FRAME(value: any[][], z: any[][], quantity: any[][], unit?: string): any[][] {
  return callFromSheet(d.OBSERVED_FRAME, [value, z, quantity, unit]);
}
