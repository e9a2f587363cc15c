/**
 * What a mistyped unit was probably meant to be. Units are case-sensitive (FITS Standard 4.0, §4.3:
 * "mpc" is a milliparsec), so a spelling of a common astronomical unit in the wrong case that still
 * parses would silently scale a result by huge factors: those few are refused outright (`caseSlip`).
 * Any other unit that does not parse gets the nearest spellings astronomers use (`nearestUnits`), or
 * the same with "/" where the word "per" was typed (`slashForPer`).
 */
import { editDistance } from "./editDistance.js";

/** Symbols that parse but are almost surely a trade unit in the wrong case: symbol → what was meant. */
const caseSlips: Readonly<Record<string, { meant: string; reads: string }>> = {
  mpc: { meant: "Mpc", reads: "milliparsecs" },
  myr: { meant: "Myr", reads: "milliyears" },
  ma: { meant: "Ma", reads: "milliyears (milli-annum)" },
};

/**
 * When `symbol` is a trade unit in the wrong case that would still parse, what was meant.
 * @param symbol one unit symbol as typed, e.g. "mpc"
 * @returns the meant symbol and what the typed one reads as, or undefined
 * @example caseSlip("mpc")?.meant // "Mpc"
 */
export function caseSlip(symbol: string): { meant: string; reads: string } | undefined {
  return Object.hasOwn(caseSlips, symbol) ? caseSlips[symbol] : undefined;
}

/** Whole units as astronomers write them, in the order a suggestion prefers them (common practice). */
const commonUnits = [
  "Mpc", "kpc", "Gpc", "pc", "Mpc/h", "Mpc3", "Gpc3", "Mpc3/sr", "ly", "Gyr", "Myr", "kyr", "yr",
  "erg/s", "erg/s/cm2", "W", "W/m2", "W/Hz", "erg/s/Hz", "Lsun", "solLum", "Msun", "solMass",
  "Jy", "mJy", "uJy", "nJy", "GHz", "MHz", "keV", "eV", "Angstrom", "nm", "um",
  "deg", "deg2", "arcsec", "arcmin", "arcmin2", "sr", "rad", "kpc/arcsec", "km/s/Mpc", "K", "kg/m3", "Msun/pc2",
];
/** FITS names beside the astronomers' spelling, offered together. */
const sameUnit: Readonly<Record<string, string>> = { Lsun: "solLum", solLum: "Lsun", Msun: "solMass", solMass: "Msun" };

/** Lower case without spaces, underscores or a plural s on erg. */
function loose(text: string): string {
  return text.toLowerCase().replace(/[\s_]/g, "").replace(/ergs/g, "erg");
}

/**
 * The known spellings nearest to a unit that does not parse: first those equal to it up to case,
 * spaces, underscores and "ergs", then those within two edits; at most two, with a FITS synonym.
 * @param text the unit as typed, e.g. "ergs/s/cm2"
 * @returns suggestions, best first (empty when nothing is near)
 * @example nearestUnits("L_sun") // ["Lsun", "solLum"]
 */
export function nearestUnits(text: string): string[] {
  const typed = loose(text.trim());
  if (typed === "" || typed.length > 40) return [];
  let found = commonUnits.filter((u) => loose(u) === typed);
  if (found.length === 0) {
    const scored = commonUnits
      .map((u) => ({ u, d: editDistance(typed, loose(u)) }))
      .filter(({ d }) => d <= Math.min(2, Math.floor(typed.length / 2)));
    const best = Math.min(...scored.map(({ d }) => d));
    found = scored.filter(({ d }) => d === best).map(({ u }) => u);
  }
  const out: string[] = [];
  for (const u of found) for (const v of [u, sameUnit[u]]) if (v !== undefined && !out.includes(v)) out.push(v);
  return out.slice(0, 2);
}

/**
 * A unit with the word "per" typed for "/" ("kpc per arcsec"), written with "/"; FITS has no "per".
 * @param text the unit as typed
 * @returns the text with each "per" (a word of its own) as "/", or undefined when it has none
 * @example slashForPer("kpc per arcsec") // "kpc/arcsec"
 */
export function slashForPer(text: string): string | undefined {
  const slashed = text.replace(/\s*\bper\b\s*/gi, "/");
  return slashed === text ? undefined : slashed.trim();
}
