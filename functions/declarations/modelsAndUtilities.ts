/**
 * Models and utilities: unit conversion, model spec text, parameters, the list of presets, a model
 * in words, and the version.
 * Each function is its JSDoc (read by the metadata plugin into functions.json) plus one line handing
 * the arguments to the shared wrapper; see functions/functions.ts for the conventions of all families.
 */
/* eslint-disable @typescript-eslint/no-explicit-any */
import { definitions as d } from "../definitions.js";
import { callFromSheet } from "../evaluate.js";

/**
 * Converts a value between astronomical units (pc, Mpc, ly, au, erg/s, Lsun, Jy, deg2, ...).
 * @customfunction CONVERT CONVERT
 * @helpurl https://localhost:3000/help.html#CONVERT
 * @example =ZC.CONVERT(1, "Mpc", "Gly")
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
 * @helpurl https://localhost:3000/help.html#MODEL
 * @example =ZC.MODEL("P18-BAO", "H0", 73)
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
 * A parameter or derived value of a model: H0, h, Om, OL, Ok, Or, Ob, w0, wa, Tcmb, Neff, mnu, age_today (Gyr), hubble_time (Gyr), hubble_distance (Mpc), z_eq (cold matter = photons + all neutrinos counted as radiation, as OMEGA("cold")).
 * @customfunction PARAM PARAM
 * @helpurl https://localhost:3000/help.html#PARAM
 * @example =ZC.PARAM("age_today")
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
 * @helpurl https://localhost:3000/help.html#PRESETS
 * @example =ZC.PRESETS()
 * @returns Two columns: name, description.
 */
export function PRESETS(): any[][] {
  return callFromSheet(d.PRESETS, []);
}

/**
 * One line of plain words describing a model, all parameters shown.
 * @customfunction DESCRIBE DESCRIBE
 * @helpurl https://localhost:3000/help.html#DESCRIBE
 * @example =ZC.DESCRIBE("W9-ALL")
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @returns Description text.
 */
export function DESCRIBE(model?: any[][]): any[][] {
  return callFromSheet(d.DESCRIBE, [model]);
}

/**
 * zcell's version and the engine's conventions, for provenance in shared workbooks.
 * @customfunction VERSION VERSION
 * @helpurl https://localhost:3000/help.html#VERSION
 * @example =ZC.VERSION()
 * @returns Version text.
 */
export function VERSION(): any[][] {
  return callFromSheet(d.VERSION, []);
}

/**
 * A value published under one cosmology restated under another, at the source's redshift: "distance" × D_M,to/D_M,from; "luminosity" × (D_L,to/D_L,from)²; "size" × D_A,to/D_A,from; "magnitude" (absolute) + 5 log10(D_L,from/D_L,to); "density" (number density) × (dV/dz)_from/(dV/dz)_to. A value in h-scaled units (Mpc/h, h3 Mpc-3, h-2 Lsun) needs its unit: it is converted with each model's own h and comes back in the same unit.
 * @customfunction RESCALE RESCALE
 * @helpurl https://localhost:3000/help.html#RESCALE
 * @example =ZC.RESCALE(3.2E44, 0.84, "luminosity", "W7-BAO")
 * @param value The published value, in its own unit (a magnitude in mag) (value or range).
 * @param z The source's redshift, > 0 (value or range).
 * @param quantity "distance", "luminosity", "size", "magnitude" or "density" (value or range).
 * @param from_model The cosmology the value was computed under: preset, spec or key/value block (value or range).
 * @param [to_model] The cosmology wanted; blank = workbook's active model.
 * @param [unit] The value's unit; needed when it holds h = H0/100 (e.g. "Mpc/h", "h3 Mpc-3", "h-2 Lsun"); blank = a unit without h.
 * @returns The value under to_model, in the value's unit.
 */
export function RESCALE(value: any[][], z: any[][], quantity: any[][], from_model: any[][], to_model?: any[][], unit?: string): any[][] {
  return callFromSheet(d.RESCALE, [value, z, quantity, from_model, to_model, unit]);
}
