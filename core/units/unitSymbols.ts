/**
 * The unit symbols zcell reads, for the FITS unit parser (units.ts): each symbol's factor into the SI
 * base units and its dimensions (FITS 4.0 §4.3, Pence et al. 2010 A&A 524, A42, with the IAU
 * values of constants.ts), the spellings astronomers type mapped to FITS symbols, and the SI prefixes.
 */
import {
  angstromM,
  auM,
  electronVoltJ,
  ergJ,
  janskySI,
  julianYearS,
  lightYearM,
  parsecM,
  solarLuminosityW,
  solarMassKg,
} from "./constants.js";
import { dimensionsOf, type Dimensions } from "./dimensionWords.js";

/** A unit's definition: its factor into the base units, with angles in degrees (1 rad = 180/π deg). */
export type Definition = { factor: number; dimensions: Dimensions; prefixable: boolean };

export const none: Dimensions = [0, 0, 0, 0, 0];
const d = dimensionsOf;

/** One radian in degrees. */
const radianDeg = 180 / Math.PI;
export const definitions: Record<string, Definition> = {
  m: { factor: 1, dimensions: d(1, 0, 0), prefixable: true },
  g: { factor: 1e-3, dimensions: d(0, 1, 0), prefixable: true },
  s: { factor: 1, dimensions: d(0, 0, 1), prefixable: true },
  min: { factor: 60, dimensions: d(0, 0, 1), prefixable: false },
  // h, the hour (3600 s), is read by the parser: in an h-scaled unit it is h = H0/100 instead
  d: { factor: 86_400, dimensions: d(0, 0, 1), prefixable: false },
  yr: { factor: julianYearS, dimensions: d(0, 0, 1), prefixable: true },
  a: { factor: julianYearS, dimensions: d(0, 0, 1), prefixable: true },
  Hz: { factor: 1, dimensions: d(0, 0, -1), prefixable: true },
  J: { factor: 1, dimensions: d(2, 1, -2), prefixable: true },
  erg: { factor: ergJ, dimensions: d(2, 1, -2), prefixable: false },
  eV: { factor: electronVoltJ, dimensions: d(2, 1, -2), prefixable: true },
  Angstrom: { factor: angstromM, dimensions: d(1, 0, 0), prefixable: false },
  W: { factor: 1, dimensions: d(2, 1, -3), prefixable: true },
  Jy: { factor: janskySI, dimensions: d(0, 1, -2), prefixable: true },
  pc: { factor: parsecM, dimensions: d(1, 0, 0), prefixable: true },
  au: { factor: auM, dimensions: d(1, 0, 0), prefixable: false },
  AU: { factor: auM, dimensions: d(1, 0, 0), prefixable: false },
  lyr: { factor: lightYearM, dimensions: d(1, 0, 0), prefixable: true },
  solLum: { factor: solarLuminosityW, dimensions: d(2, 1, -3), prefixable: false },
  solMass: { factor: solarMassKg, dimensions: d(0, 1, 0), prefixable: false },
  K: { factor: 1, dimensions: d(0, 0, 0, 1), prefixable: true },
  // angles in degrees (FITS 4.0 Table 5: deg, arcmin, arcsec, mas; the hour angle is 15°)
  rad: { factor: radianDeg, dimensions: d(0, 0, 0, 0, 1), prefixable: true },
  deg: { factor: 1, dimensions: d(0, 0, 0, 0, 1), prefixable: false },
  hourangle: { factor: 15, dimensions: d(0, 0, 0, 0, 1), prefixable: false }, // 1h of right ascension = 15°
  arcmin: { factor: 1 / 60, dimensions: d(0, 0, 0, 0, 1), prefixable: false },
  arcsec: { factor: 1 / 3600, dimensions: d(0, 0, 0, 0, 1), prefixable: false },
  mas: { factor: 1 / 3.6e6, dimensions: d(0, 0, 0, 0, 1), prefixable: false },
  sr: { factor: radianDeg * radianDeg, dimensions: d(0, 0, 0, 0, 2), prefixable: false },
};

/** Spellings astronomers type, mapped to FITS symbols. */
export const aliases: Record<string, string> = {
  ly: "lyr",
  Gly: "Glyr",
  Mly: "Mlyr",
  kly: "klyr",
  Lsun: "solLum",
  Msun: "solMass",
  arcsecond: "arcsec",
  arcminute: "arcmin",
  angstrom: "Angstrom",
};

export const prefixes: Record<string, number> = {
  Y: 1e24, Z: 1e21, E: 1e18, P: 1e15, T: 1e12, G: 1e9, M: 1e6, k: 1e3, h: 1e2, da: 1e1,
  d: 1e-1, c: 1e-2, m: 1e-3, u: 1e-6, n: 1e-9, p: 1e-12, f: 1e-15, a: 1e-18, z: 1e-21, y: 1e-24,
};
/** The prefixes, longest first ("da" before "d"). */
export const prefixesLongestFirst = Object.keys(prefixes).sort((x, y) => y.length - x.length);
