/**
 * Dust, two-band spectral indices and radio brightness temperatures: a catalogue's first steps.
 * Each entry: the arguments in the order of the ZC.* signature (built from argumentKinds.ts) and what one
 * cell computes in reference units; the declaration with its JSDoc is in ../declarations/dustAndSpectra.ts.
 */
import {
  angstromM,
  bandInUnit,
  brightnessTemperatureK,
  conversionFactor,
  extinctionLawNamed,
  extinctionMag,
  extinctionRangeAngstrom,
  frequencyHz,
  inRange,
  janskySI,
  NoSolutionError,
  spectralIndexBetween,
  spectralIndexBetweenError,
  speedOfLightMPerS,
  type ExtinctionLaw,
} from "../../core/index.js";
import type { Args, FunctionDef } from "../FunctionDef.js";
import { messages } from "../messages.js";
import { amount, bandUnit, err, givenIn, num, n, textOr, textUnit, textWithDefault, unit } from "./argumentKinds.js";

const positive = (name: string) => num(name, { min: 0, minExclusive: true });

/**
 * How a band value in a unit becomes a frequency [Hz]: a frequency by its factor, a wavelength as
 * c/λ, a photon energy as E/h (as frequencyHz, worked out once per unit text and kept).
 */
const bandConverters = new Map<string, (value: number) => number>();
function toHz(unitText: string, name: string): (value: number) => number {
  let convert = bandConverters.get(unitText);
  if (convert === undefined) {
    const one = frequencyHz(1, unitText, name); // a unit of another kind is refused here, naming the argument
    convert = frequencyHz(2, unitText, name) < one ? (value) => one / value : (value) => value * one;
    if (bandConverters.size >= 64) bandConverters.clear();
    bandConverters.set(unitText, convert);
  }
  return convert;
}

/** A band argument of the cell in the call's band unit (blank: GHz), as a frequency [Hz]. */
const bandHz = (a: Args, name: string) => toHz(textOr(a, bandUnit), bandUnit.name)(n(a, name));

/** The extinction law: blank is Fitzpatrick 1999. */
const law = textWithDefault("law", "Fitzpatrick 1999", {});
/** The unit of EXTINCTION's wavelength: blank is Angstrom. */
const wavelengthUnit = textUnit("wavelength_unit", { typed: "Angstrom" });

/** The law of a cell; the last name read is kept (a column of one law). */
let lastLaw: { text: string; law: ExtinctionLaw } | undefined;
function lawOf(a: Args): ExtinctionLaw {
  const text = textOr(a, law);
  if (lastLaw?.text !== text) lastLaw = { text, law: extinctionLawNamed(text) };
  return lastLaw.law;
}

/** c in Å/s. */
const cAngstromPerS = speedOfLightMPerS / angstromM;
/** Converters of a wavelength argument into Å, by unit text: a length by its factor (exact for Angstrom), a frequency or energy through ν. */
const toAngstrom = new Map<string, (value: number) => number>();
function angstromConverter(unitText: string): (value: number) => number {
  let convert = toAngstrom.get(unitText);
  if (convert === undefined) {
    try {
      const factor = conversionFactor(unitText, "Angstrom");
      convert = (value) => value * factor;
    } catch {
      const hz = toHz(unitText, "wavelength_unit");
      convert = (value) => cAngstromPerS / hz(value);
    }
    if (toAngstrom.size >= 64) toAngstrom.clear();
    toAngstrom.set(unitText, convert);
  }
  return convert;
}

/** Units a wavelength is commonly given in (common practice): far outside a law's range, the one that would put the same number inside it is named. */
const likelyWavelengthUnits = ["um", "nm", "Angstrom"];

/** A_λ of one cell for a given E(B−V): the wavelength in its unit (Angstrom, nm, um, or a frequency or energy); outside the law's range, the range in that unit. */
function extinction(a: Args, ebv: number): number {
  const law = lawOf(a);
  const unitText = textOr(a, wavelengthUnit);
  const given = n(a, "wavelength");
  const angstrom = angstromConverter(unitText)(given);
  if (!inRange(angstrom, law)) {
    const { min, max } = extinctionRangeAngstrom(law);
    const [low, high] = [bandInUnit(frequencyHz(min, "Angstrom", "min"), unitText), bandInUnit(frequencyHz(max, "Angstrom", "max"), unitText)].sort((p, q) => p - q);
    // far outside (a factor 1.5: not a value just past an edge), the unit in which the same number is
    // inside: 5500 given in nm is 1.6 times the upper edge, and 5500 Angstrom is inside (the unit given
    // is never named: the same number in it is the wavelength found outside)
    const far = angstrom < min / 1.5 || angstrom > 1.5 * max;
    const likely = far ? likelyWavelengthUnits.find((u) => inRange(angstromConverter(u)(given), law)) : undefined;
    throw new NoSolutionError(messages.outsideLawRange("wavelength", given, unitText, law, low, high, likely ? { unit: likely, arg: "wavelength_unit (5th argument)" } : undefined));
  }
  return extinctionMag(angstrom, ebv, law, n(a, "r_v"));
}

/** Dust, spectral-index and brightness-temperature functions, in the order of their declarations. */
export const dustAndSpectra: FunctionDef[] = [
  {
    name: "EXTINCTION",
    args: [
      positive("wavelength"), amount("ebv"), law,
      num("r_v", { default: Number.NaN, blankMeansDefault: true, min: 0, minExclusive: true, blank: { words: "3.1, or 4.05 (R′_V) for Calzetti 2000" } }), givenIn(wavelengthUnit, "wavelength"),
    ],
    compute: (a) => extinction(a, n(a, "ebv")),
    // the common range: a column of E(B−V), one per source, at one band
    kernel: { arg: "ebv", of: extinction },
  },
  {
    name: "INDEX_BETWEEN",
    args: [positive("flux_density1"), positive("band1"), positive("flux_density2"), positive("band2"), givenIn(bandUnit, "band1", "band2")],
    compute: (a) => spectralIndexBetween(n(a, "flux_density1"), bandHz(a, "band1"), n(a, "flux_density2"), bandHz(a, "band2")),
  },
  {
    name: "INDEX_BETWEEN_ERR",
    args: [positive("flux_density1"), positive("band1"), positive("flux_density2"), positive("band2"), err("err1"), err("err2"), givenIn(bandUnit, "band1", "band2")],
    compute: (a) => spectralIndexBetweenError(n(a, "flux_density1"), bandHz(a, "band1"), n(a, "flux_density2"), bandHz(a, "band2"), n(a, "err1"), n(a, "err2")),
  },
  {
    name: "BRIGHTNESS_TEMP",
    args: [
      amount("flux_density"), positive("frequency"), positive("major"), positive("minor"), num("z", { default: 0, blankMeansDefault: true }),
      unit("flux_unit", "Jy", "Jy", "flux_density"), givenIn(bandUnit, "frequency"), unit("angle_unit", "rad", "arcsec", ["major", "minor"]),
    ],
    compute: (a) => brightnessTemperatureK(n(a, "flux_density") * janskySI, bandHz(a, "frequency"), n(a, "major"), n(a, "minor"), n(a, "z")),
  },
];
