/**
 * Unit strings in the FITS standard syntax (FITS 4.0, Pence et al. 2010 A&A 524, A42, §4.3): SI
 * prefixes, products with ' ', '.' or '*', division '/', powers as 'cm2', 's-1', 'm**2', 'm^2' or
 * 'm**(-2)', parentheses, and scale factors '10**k'. Recognised units are the IAU/FITS ones the
 * trade uses plus the aliases astronomers type (Lsun, ly, Msun, µJy, ...).
 *
 * Angles are kept as a dimension of their own (rad; sr = rad²) so that 'kpc/arcsec' converts to
 * 'Mpc/rad' but not to 'kpc'. Temperatures are absolute (K) only.
 *
 * h-scaled units: in a unit that also holds a parsec or a solar unit (Mpc/h, h-1 Mpc, (Mpc/h)3,
 * h-3 Mpc3, h-1 Msun, h3 Mpc-3), `h` is the dimensionless h = H0/(100 km/s/Mpc) of a model, as survey
 * work writes it; everywhere else `h` is the hour (FITS). Converting such a unit needs the model's h.
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
  planckConstantJs,
  solarLuminosityW,
  solarMassKg,
  speedOfLightMPerS,
} from "./constants.js";
import { dimensionsOf, dimensionWords, sameDimensions, type Dimensions } from "./dimensionWords.js";
import { caseSlip, nearestUnits, slashForPer } from "./unitSuggestions.js";

/** A parsed unit: value in SI base units = value in this unit × factor. */
export interface Unit {
  /** The text as given. */
  readonly text: string;
  /** SI factor: 1 of this unit = factor × the SI base combination. */
  readonly factor: number;
  /** Exponents of m, kg, s, K, rad. */
  readonly dimensions: Dimensions;
  /** Power of h = H0/100 the unit carries (Mpc/h: −1; h3 Mpc-3: 3); 0 for an ordinary unit. */
  readonly hPower: number;
}

type Definition = { factor: number; dimensions: Dimensions; prefixable: boolean };

const none: Dimensions = [0, 0, 0, 0, 0];
const d = dimensionsOf;

const degree = Math.PI / 180;
const definitions: Record<string, Definition> = {
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
  rad: { factor: 1, dimensions: d(0, 0, 0, 0, 1), prefixable: true },
  deg: { factor: degree, dimensions: d(0, 0, 0, 0, 1), prefixable: false },
  hourangle: { factor: 15 * degree, dimensions: d(0, 0, 0, 0, 1), prefixable: false }, // 1h of right ascension = 15°
  arcmin: { factor: degree / 60, dimensions: d(0, 0, 0, 0, 1), prefixable: false },
  arcsec: { factor: degree / 3600, dimensions: d(0, 0, 0, 0, 1), prefixable: false },
  mas: { factor: degree / 3.6e6, dimensions: d(0, 0, 0, 0, 1), prefixable: false },
  sr: { factor: 1, dimensions: d(0, 0, 0, 0, 2), prefixable: false },
};

/** Spellings astronomers type, mapped to FITS symbols. */
const aliases: Record<string, string> = {
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

const prefixes: Record<string, number> = {
  Y: 1e24, Z: 1e21, E: 1e18, P: 1e15, T: 1e12, G: 1e9, M: 1e6, k: 1e3, h: 1e2, da: 1e1,
  d: 1e-1, c: 1e-2, m: 1e-3, u: 1e-6, n: 1e-9, p: 1e-12, f: 1e-15, a: 1e-18, z: 1e-21, y: 1e-24,
};

function resolveSymbol(symbol: string, whole: string): { factor: number; dimensions: Dimensions } {
  const slip = caseSlip(symbol);
  if (slip) {
    const meant = whole.replace(new RegExp(`(^|[^A-Za-z])${symbol}(?![A-Za-z])`), `$1${slip.meant}`);
    throw new TypeError(`"${whole}" would be ${slip.reads} (units are case-sensitive): did you mean ${meant}?`);
  }
  const name = aliases[symbol] ?? symbol;
  const exact = definitions[name];
  if (exact) return exact;
  for (const prefix of Object.keys(prefixes).sort((x, y) => y.length - x.length)) {
    if (name.startsWith(prefix) && name.length > prefix.length) {
      const def = definitions[name.slice(prefix.length)];
      if (def?.prefixable) return { factor: prefixes[prefix] * def.factor, dimensions: def.dimensions };
    }
  }
  if (symbol === "mag") throw new TypeError(`"${whole}": magnitudes are logarithmic, not a unit to convert`);
  throw new TypeError(`unknown unit "${symbol}" in "${whole}"`);
}

/** Parsed dimensions: m, kg, s, K, rad, then the power of the symbol `h` (hour or little h, decided at the end). */
type Parsed = { factor: number; dimensions: number[] };
const hSymbol = 5;

class UnitParser {
  private i = 0;
  /** The unit holds a parsec or solar unit: `h` is then h = H0/100, not the hour. */
  astronomical = false;
  constructor(private readonly s: string) {}

  parse(): Parsed {
    const result = this.expression();
    if (this.i < this.s.length) this.fail(`unexpected "${this.s[this.i]}"`);
    return result;
  }

  private fail(what: string): never {
    throw new TypeError(`unit "${this.s}": ${what}`);
  }

  private peek(): string {
    return this.s[this.i] ?? "";
  }

  private skipSpaces(): boolean {
    const start = this.i;
    while (this.peek() === " ") this.i++;
    return this.i > start;
  }

  private expression(): Parsed {
    this.skipSpaces();
    let acc = this.term();
    for (;;) {
      const spaced = this.skipSpaces();
      const c = this.peek();
      if (c === "/") {
        this.i++;
        this.skipSpaces();
        const t = this.term();
        acc = { factor: acc.factor / t.factor, dimensions: acc.dimensions.map((x, k) => x - t.dimensions[k]) };
      } else if (c === "." || c === "*" || (spaced && c !== "" && c !== ")")) {
        if (c === "." || c === "*") this.i++;
        this.skipSpaces();
        const t = this.term();
        acc = { factor: acc.factor * t.factor, dimensions: acc.dimensions.map((x, k) => x + t.dimensions[k]) };
      } else {
        return acc;
      }
    }
  }

  private term(): Parsed {
    const c = this.peek();
    let base: Parsed;
    if (c === "(") {
      this.i++;
      base = this.expression();
      this.skipSpaces();
      if (this.peek() !== ")") this.fail("missing )");
      this.i++;
    } else if (this.s.startsWith("10**", this.i) || this.s.startsWith("10^", this.i)) {
      this.i += this.s.startsWith("10**", this.i) ? 4 : 3;
      const k = this.integer();
      return { factor: 10 ** k, dimensions: [...none, 0] };
    } else {
      const m = /^[A-Za-zµμ]+/.exec(this.s.slice(this.i));
      if (!m) this.fail(c === "" ? "a unit is missing" : `unexpected "${c}"`);
      this.i += m[0].length;
      const symbol = m[0].replace(/^[µμ]/, "u");
      if (symbol === "h") {
        base = { factor: 1, dimensions: [...none, 1] };
      } else {
        const def = resolveSymbol(symbol, this.s);
        if (/pc$|^sol/.test(aliases[symbol] ?? symbol)) this.astronomical = true;
        base = { factor: def.factor, dimensions: [...def.dimensions, 0] };
      }
    }
    const power = this.power();
    return power === 1 ? base : { factor: base.factor ** power, dimensions: base.dimensions.map((x) => x * power) };
  }

  private integer(): number {
    const m = /^[+-]?\d+/.exec(this.s.slice(this.i));
    if (!m) this.fail("a whole-number power is expected");
    this.i += m[0].length;
    return Number(m[0]);
  }

  private power(): number {
    if (this.s.startsWith("**", this.i)) this.i += 2;
    else if (this.peek() === "^") this.i += 1;
    else if (!/[-+\d]/.test(this.peek())) return 1;
    if (this.peek() === "(") {
      this.i++;
      const numerator = this.integer();
      let denominator = 1;
      if (this.peek() === "/") {
        this.i++;
        denominator = this.integer();
      }
      if (this.peek() !== ")") this.fail("missing ) after the power");
      this.i++;
      return numerator / denominator;
    }
    return this.integer();
  }
}

const cache = new Map<string, Unit>();

/** What a unit that does not parse was meant to be: the same with "/" for the word "per" when that parses, else the nearest spellings. */
function suggestions(text: string): string[] {
  const slashed = slashForPer(text);
  if (slashed !== undefined) {
    try {
      parseUnit(slashed);
      return [slashed];
    } catch {
      // not a unit either way: the nearest spellings
    }
  }
  return nearestUnits(text);
}

/**
 * Parses a FITS-style unit string.
 *
 * @param text unit text, e.g. "Mpc", "erg/s/cm2", "kpc/arcsec", "km s-1 Mpc-1"
 * @returns the unit with its SI factor and dimensions
 * @throws TypeError for unknown symbols or malformed text
 * @example parseUnit("Mpc").factor // 3.0856775814913673e22
 */
export function parseUnit(text: string): Unit {
  if (typeof text !== "string") throw new TypeError("a unit must be text");
  const hit = cache.get(text);
  if (hit) return hit;
  const trimmed = text.trim();
  if (trimmed === "") throw new TypeError("empty unit");
  const parser = new UnitParser(trimmed);
  let parsed: ReturnType<UnitParser["parse"]>;
  try {
    parsed = parser.parse();
  } catch (e) {
    const near = e instanceof TypeError && !/did you mean|magnitudes/.test(e.message) ? suggestions(trimmed) : [];
    if (near.length === 0) throw e;
    throw new TypeError(`${(e as Error).message}: did you mean ${near.join(" or ")}?`);
  }
  const dims = parsed.dimensions;
  const hPower = dims[hSymbol];
  let factor = parsed.factor;
  if (hPower !== 0 && !parser.astronomical) {
    factor *= 3600 ** hPower; // the hour
    dims[2] += hPower;
  }
  const unit: Unit = {
    text: trimmed,
    factor,
    dimensions: dims.slice(0, hSymbol) as unknown as Dimensions,
    hPower: parser.astronomical ? hPower : 0,
  };
  if (cache.size > 1000) cache.clear();
  cache.set(text, unit);
  return unit;
}

/**
 * What a unit measures, in words.
 * @param text unit text, e.g. "mJy"
 * @returns the kind with its article, e.g. "a flux density"
 * @throws TypeError when the text is not a unit
 * @example unitKind("W/Hz/sr") // "a spectral luminosity per solid angle"
 */
export function unitKind(text: string): string {
  const unit = parseUnit(text);
  return dimensionWords(unit.dimensions, unit.text);
}

/**
 * How a value in one unit becomes a value in another: value_to = value_from × factor × h^hPower, with
 * h = H0/100 of the model when a unit is h-scaled (hPower 0 otherwise).
 *
 * @param from unit text of the input, e.g. "Mpc/h"
 * @param to unit text of the output, e.g. "Mpc"
 * @returns the factor (dimensionless) and the power of h still to apply
 * @throws TypeError when the units have different dimensions or do not parse
 * @example scaledConversion("Mpc/h", "Mpc") // { factor: 1, hPower: -1 }
 */
export function scaledConversion(from: string, to: string): { factor: number; hPower: number } {
  const a = parseUnit(from);
  const b = parseUnit(to);
  if (!sameDimensions(a.dimensions, b.dimensions)) {
    throw new TypeError(
      `cannot convert "${a.text}" (${dimensionWords(a.dimensions, a.text)}) to "${b.text}" (${dimensionWords(b.dimensions, b.text)})`,
    );
  }
  return { factor: a.factor / b.factor, hPower: a.hPower - b.hPower };
}

/**
 * Factor that converts a value in one unit into another: value_to = value_from × factor.
 *
 * @param from unit text of the input, e.g. "Mpc"
 * @param to unit text of the output, e.g. "Gly"
 * @param h h = H0/(100 km/s/Mpc) of the model, needed only when one unit is h-scaled (Mpc/h)
 * @returns the dimensionless factor
 * @throws TypeError when the units have different dimensions (both are named), do not parse, or
 *   one is h-scaled and no h is given
 * @example conversionFactor("Mpc", "kpc") // 1000
 * @example conversionFactor("Mpc/h", "Mpc", 0.7) // 1.4285714285714286
 */
export function conversionFactor(from: string, to: string, h?: number): number {
  const { factor, hPower } = scaledConversion(from, to);
  if (hPower === 0) return factor;
  if (h === undefined) {
    const scaled = parseUnit(from).hPower !== 0 ? from : to;
    throw new TypeError(`"${scaled.trim()}" is in units of h = H0/100: give a model`);
  }
  return factor * h ** hPower;
}

/**
 * Converts a value between compatible units.
 *
 * @param value the number in unit `from`
 * @param from unit text, e.g. "pc"
 * @param to unit text, e.g. "lyr"
 * @param h h = H0/100 of the model, for h-scaled units only
 * @returns the number in unit `to`
 * @example convertUnit(1, "pc", "lyr") // 3.2615637771674337
 */
export function convertUnit(value: number, from: string, to: string, h?: number): number {
  return value * conversionFactor(from, to, h);
}

/**
 * A band given as a frequency, a wavelength or a photon energy, as a frequency: ν = x for a frequency
 * unit, ν = c/λ for a length, ν = E/h_P for an energy (h_P the Planck constant).
 *
 * @param value the band's value in `unit`, > 0
 * @param unit a frequency ("GHz"), wavelength ("Angstrom", "nm", "um") or energy ("eV", "keV") unit
 * @param name the argument's name for messages
 * @returns frequency [Hz]
 * @throws TypeError for a unit of another kind; RangeError unless value > 0 and finite
 * @example frequencyHz(5100, "Angstrom", "rest") // 5.878e14
 */
export function frequencyHz(value: number, unit: string, name: string): number {
  if (!(value > 0 && value < Number.POSITIVE_INFINITY)) throw new RangeError(`${name} = ${value} ${unit.trim()} must be > 0`);
  const u = parseUnit(unit);
  const x = value * u.factor;
  if (sameDimensions(u.dimensions, d(0, 0, -1))) return x;
  if (sameDimensions(u.dimensions, d(1, 0, 0))) return speedOfLightMPerS / x;
  if (sameDimensions(u.dimensions, d(2, 1, -2))) return x / planckConstantJs;
  throw new TypeError(`${name}: "${u.text}" is ${dimensionWords(u.dimensions, u.text)}; use a frequency (GHz), a wavelength (Angstrom, um) or an energy (eV)`);
}

/**
 * A frequency as a band value in `unit`: the inverse of `frequencyHz` (x = ν, c/ν or h_P ν in the unit).
 *
 * @param nuHz frequency [Hz], > 0
 * @param unit a frequency, wavelength or energy unit
 * @returns the band's value in `unit`
 * @throws TypeError for a unit of another kind
 * @example bandInUnit(2.99792458e14, "um") // 1
 */
export function bandInUnit(nuHz: number, unit: string): number {
  const one = frequencyHz(1, unit, "band"); // the frequency of 1 in the unit
  return sameDimensions(parseUnit(unit).dimensions, d(1, 0, 0)) ? one / nuHz : nuHz / one;
}
