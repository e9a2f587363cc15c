/**
 * What a mistyped unit was probably meant to be. Units are case-sensitive (FITS Standard 4.0, §4.3:
 * "mpc" is a milliparsec), so a spelling of a common astronomical unit in the wrong case that still
 * parses would silently scale a result by huge factors: those few are refused outright (`caseSlip`).
 * Spellings the trade uses that FITS does not ("micron", "AA", "A" for the ångström) are refused with
 * the FITS symbol (`tradeSpelling`). Any other unit that does not parse gets the nearest spellings
 * astronomers use (`nearestUnits`), or the same with "/" where the word "per" was typed (`slashForPer`).
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

/** What a trade spelling that FITS does not read is, and the FITS symbol to write (none when it depends on what was meant). */
type TradeSpelling = { reads: string; write?: string };

const forAngstrom: TradeSpelling = { reads: "is not FITS for the ångström", write: "Angstrom" };
const forMicrometre: TradeSpelling = { reads: "is not FITS for the micrometre", write: "um" };
const forHours: TradeSpelling = { reads: "is not a FITS unit: write h for hours of time, or hourangle for hours of right ascension" };

/**
 * Symbols astronomers type that FITS does not read (FITS Standard 4.0 §4.3, Table 3: "A" is the
 * ampere, the ångström is "Angstrom", the micrometre "um", the hour "h"), with what to write instead.
 */
const tradeSpellings: ReadonlyMap<string, TradeSpelling> = new Map([
  ["A", { reads: "is the ampere in FITS, not the ångström", write: "Angstrom" }],
  ["AA", forAngstrom],
  // a Map of strings, not an object's keys: a minifier writes a key as a bare identifier, and a
  // non-ASCII identifier is a syntax error in a bundle a host reads in another encoding than UTF-8
  ["\u00c5", forAngstrom], // Å, Latin capital A with ring above
  ["\u212b", forAngstrom], // Å, the ångström sign
  ["Angstroms", forAngstrom],
  ["angstroms", forAngstrom],
  ["micron", forMicrometre],
  ["microns", forMicrometre],
  // square angles as the trade writes them (common practice); FITS writes a power after the symbol
  ["sqdeg", { reads: "is not FITS for the square degree", write: "deg2" }],
  ["sqdegs", { reads: "is not FITS for the square degree", write: "deg2" }],
  ["sqarcmin", { reads: "is not FITS for the square arcminute", write: "arcmin2" }],
  ["sqarcsec", { reads: "is not FITS for the square arcsecond", write: "arcsec2" }],
  // kilometres per second as the trade writes it (common practice)
  ["kms", { reads: "is not FITS for kilometres per second", write: "km/s" }],
  ["hour", forHours],
  ["hours", forHours],
  ["hr", forHours],
  ["hrs", forHours],
]);

/**
 * What a symbol that FITS does not read was meant to be, when it is a spelling of the trade.
 * @param symbol one unit symbol as typed, e.g. "micron"
 * @returns what it is (words that follow the quoted symbol) and the FITS symbol to write, or undefined
 * @example tradeSpelling("micron")?.write // "um"
 */
export function tradeSpelling(symbol: string): TradeSpelling | undefined {
  return tradeSpellings.get(symbol);
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

/** How many times "/" occurs in a text. */
function slashes(text: string): number {
  let count = 0;
  for (let i = text.indexOf("/"); i >= 0; i = text.indexOf("/", i + 1)) count++;
  return count;
}

/**
 * The known spellings nearest to a unit that does not parse: first those equal to it up to case,
 * spaces, underscores and "ergs", then those within two edits; at most two, with a FITS synonym.
 * A spelling with another number of "/" is never offered: it would drop or add a whole unit
 * ("erg/s/cm2/X" is not near "erg/s/cm2").
 * @param text the unit as typed, e.g. "ergs/s/cm2"
 * @returns suggestions, best first (empty when nothing is near)
 * @example nearestUnits("L_sun") // ["Lsun", "solLum"]
 */
export function nearestUnits(text: string): string[] {
  if (text.length > 100) return []; // no unit is that long: not searched (nor loosened)
  const typed = loose(text.trim());
  if (typed === "" || typed.length > 40) return [];
  const candidates = commonUnits.filter((u) => slashes(u) === slashes(text));
  let found = candidates.filter((u) => loose(u) === typed);
  if (found.length === 0) {
    const scored = candidates
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
  // split on the word alone, then trim the pieces: spaces around it are dropped in one pass (a
  // pattern with \s* on both sides of the word retries every run of spaces from each of its places)
  const pieces = text.split(/\bper\b/i);
  return pieces.length === 1 ? undefined : pieces.map((piece) => piece.trim()).join("/");
}
