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
import { quoted, quotedText } from "../checks/quoted.js";
import { planckConstantJs, speedOfLightMPerS } from "./constants.js";
import { dimensionsOf, dimensionWords, sameDimensions, type Dimensions } from "./dimensionWords.js";
import { caseSlip, nearestUnits, slashForPer, tradeSpelling } from "./unitSuggestions.js";
import { aliases, definitions, none, prefixes, prefixesLongestFirst } from "./unitSymbols.js";

const d = dimensionsOf;

/** A parsed unit: value in SI base units = value in this unit × factor. */
export interface Unit {
  /** The text as given. */
  readonly text: string;
  /** SI factor: 1 of this unit = factor × the SI base combination (angles in radians). */
  readonly factor: number;
  /**
   * The same factor with angles counted in degrees (1 rad = 180/π): equal to `factor` for a unit
   * without angles. Conversions use it, so that the ratio of two angle units defined in degrees is
   * exact (hourangle/deg = 15, deg/arcsec = 3600).
   */
  readonly factorDeg: number;
  /** Exponents of m, kg, s, K, rad. */
  readonly dimensions: Dimensions;
  /** Power of h = H0/100 the unit carries (Mpc/h: −1; h3 Mpc-3: 3); 0 for an ordinary unit. */
  readonly hPower: number;
}

/** Parentheses a unit may nest (FITS sets no limit; (Mpc/h)3 needs one). */
const maxNesting = 16;
/** Digits a power or a scale factor's exponent may have (10**-26 has two). */
const maxPowerDigits = 3;
/** The power of h = H0/100 a unit carries at most (h3 Mpc-3, a number density). */
const maxHPower = 3;

/** Parsed dimensions: m, kg, s, K, rad, then the power of the symbol `h` (hour or little h, decided at the end). */
type Parsed = { factor: number; dimensions: number[] };
const hSymbol = 5;

/** A letter of a unit symbol: ASCII letters, the micro sign and Greek mu, and Å (read to be refused with its fix). */
function isSymbolLetter(code: number): boolean {
  return (code >= 65 && code <= 90) || (code >= 97 && code <= 122) || code === 0xb5 || code === 0x3bc || code === 0xc5 || code === 0x212b;
}

function isDigit(code: number): boolean {
  return code >= 48 && code <= 57;
}

/** After `h`: "_" and any number ("h_70"), or a decimal number ("h0.7"), a survey's h scaled to H0 = 70. */
const surveyH = /(_)([\d.]+)|()(\d*\.\d+)/y;
/** The number after "h/" ("0.7" of "h/0.7"). */
const surveyNumber = /[\d.]+/y;

class UnitParser {
  private i = 0;
  private depth = 0;
  /** The unit holds a parsec or solar unit: `h` is then h = H0/100, not the hour. */
  astronomical = false;
  /** The message thrown already says how to write the unit: no suggestion is added to it. */
  fixed = false;
  constructor(private readonly s: string) {}

  parse(): Parsed {
    const result = this.expression();
    if (this.i < this.s.length) this.unexpected();
    return result;
  }

  private fail(what: string, fixed = false): never {
    this.fixed = fixed;
    throw new TypeError(`${quoted(this.s)}: ${what}`);
  }

  /** The character at the parser's place is not what the syntax allows there. */
  private unexpected(): never {
    const c = this.s.codePointAt(this.i)!;
    if (this.i > 0 && isDigit(this.s.charCodeAt(this.i - 1)) && (isSymbolLetter(c) || c === 40)) {
      // FITS 4.0 §4.3: a power ends its factor, so a symbol glued to it ("h-1Msun") needs a separator
      const spaced = `${this.s.slice(0, this.i)} ${this.s.slice(this.i)}`;
      this.fail(`put a space after the power, as in ${quoted(spaced)}`, true);
    }
    this.fail(`unexpected "${String.fromCodePoint(c)}"`);
  }

  private peek(): string {
    return this.s[this.i] ?? "";
  }

  private skipSpaces(): boolean {
    const start = this.i;
    while (this.s.charCodeAt(this.i) === 32) this.i++;
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
      if (++this.depth > maxNesting) this.fail(`parentheses nested more than ${maxNesting} deep`);
      this.i++;
      base = this.expression();
      this.skipSpaces();
      if (this.peek() !== ")") this.fail("missing )");
      this.i++;
      this.depth--;
    } else if (this.s.startsWith("10**", this.i) || this.s.startsWith("10^", this.i)) {
      this.i += this.s.startsWith("10**", this.i) ? 4 : 3;
      const k = this.integer();
      return { factor: 10 ** k, dimensions: [...none, 0] };
    } else {
      const start = this.i;
      while (this.i < this.s.length && isSymbolLetter(this.s.charCodeAt(this.i))) this.i++;
      if (this.i === start) {
        if (c === "") this.fail("a unit is missing");
        if (this.i === 0) this.reciprocal();
        if (isDigit(c.charCodeAt(0)) && /(?:^|[^A-Za-z])h *\/ *$/.test(this.s.slice(Math.max(0, start - 8), start))) {
          // "h/0.7": h in units of 0.7, i.e. H0/70
          surveyNumber.lastIndex = start;
          const value = surveyNumber.exec(this.s)![0];
          this.failSurveyH(`h/${value}`, Number(value));
        }
        this.unexpected();
      }
      const typed = this.s.slice(start, this.i);
      const symbol = typed.replace(/^[µμ]/, "u");
      if (symbol === "h") {
        this.hSurveyNotation();
        if (isDigit(this.s.charCodeAt(this.i))) this.hWithDigits(start);
        base = { factor: 1, dimensions: [...none, 1] };
      } else {
        const def = this.resolve(symbol, typed, start);
        if (/pc$|^sol/.test(aliases[symbol] ?? symbol)) this.astronomical = true;
        base = { factor: def.factor, dimensions: [...def.dimensions, 0] };
      }
    }
    const power = this.power();
    return power === 1 ? base : { factor: base.factor ** power, dimensions: base.dimensions.map((x) => x * power) };
  }

  /** A whole unit written as a reciprocal, "1/Gyr" or "/Gyr": refused with the power that reads, "Gyr-1". */
  private reciprocal(): void {
    const match = /^(?:1 *)?\/ *([A-Za-z]+)$/.exec(this.s);
    if (!match) return;
    const power = `${match[1]}-1`;
    try {
      parseUnit(power);
    } catch {
      return; // not a unit either way: the parse message
    }
    this.fail(`write the reciprocal as a power, ${quoted(power)}`, true);
  }

  /**
   * `h` followed by "_" ("h_70") or by a decimal number ("h0.7"): a survey's h scaled to H0 = 70,
   * which zcell does not read (its h is H0/100), refused with the same fix as h70.
   */
  private hSurveyNotation(): void {
    surveyH.lastIndex = this.i;
    const match = surveyH.exec(this.s);
    if (!match) return;
    const underscore = match[1] !== undefined;
    const value = underscore ? match[2] : match[4];
    this.failSurveyH(`h${underscore ? "_" : ""}${value}`, Number(value));
  }

  /**
   * A survey's h refused (zcell's h is H0/100): `written` as typed, `scale` the number in it, an H0
   * ("h_70": H0/70) or, below 10, a fraction of 100 km/s/Mpc ("h0.7", "h/0.7": H0/70).
   */
  private failSurveyH(written: string, scale: number): never {
    const per = scale < 10 ? 100 * scale : scale;
    if (per === 100) this.fail(`zcell's h is already H0/100: write h alone, as in Mpc/h (${quoted(written)} is not a unit zcell reads)`, true);
    const as = Number.isFinite(per) && per > 0 && per !== 100 ? ` = H0/${Number(per.toPrecision(6))}` : "";
    this.fail(
      `zcell's h is H0/100 (as in Mpc/h), and ${quoted(written)}${as} is not a unit zcell reads: give the values in a unit without h (e.g. Mpc) and the model`,
      true,
    );
  }

  /** `h` followed at once by digits: a power of h up to 3 ("h3 Mpc-3"); h70 or h100 is the survey notation H0/70, H0/100, which zcell does not read as such. */
  private hWithDigits(start: number): void {
    let end = this.i;
    while (isDigit(this.s.charCodeAt(end))) end++;
    const digits = this.s.slice(this.i, end);
    if (Number(digits) <= maxHPower) return;
    const written = `h${quotedText(digits)}`;
    if (digits === "100") {
      const meant = `${this.s.slice(0, start)}h${this.s.slice(end)}`;
      this.fail(`zcell's h is already H0/100, and "h100" would be h to the power 100: write ${quoted(meant)}`, true);
    }
    this.fail(
      `zcell's h is H0/100 (as in Mpc/h), and "${written}" would be h to the power ${quotedText(digits)}; ${written} = H0/${quotedText(digits)} is not a unit zcell reads: give the values in a unit without h (e.g. Mpc) and the model`,
      true,
    );
  }

  /** A symbol's definition (with a prefix, an alias), or the reason it has none: a case slip, a trade spelling, a magnitude, unknown. */
  private resolve(symbol: string, typed: string, start: number): { factor: number; dimensions: Dimensions } {
    const whole = this.s;
    // "sq.deg", "sq deg": the trade's square degree in two symbols, read as one trade spelling
    const square = symbol === "sq" ? /^[. *]?(deg|arcmin|arcsec)s?(?![A-Za-z\d^*])/.exec(whole.slice(start + 2, start + 12)) : null;
    const length = square ? 2 + square[0].length : typed.length;
    const replaced = (by: string) => `${whole.slice(0, start)}${by}${whole.slice(start + length)}`;
    const slip = caseSlip(symbol);
    if (slip) {
      this.fixed = true;
      throw new TypeError(`${quoted(whole)} would be ${slip.reads} (units are case-sensitive): did you mean ${quotedText(replaced(slip.meant))}?`);
    }
    const name = aliases[symbol] ?? symbol;
    const exact = definitions[name];
    if (exact) return exact;
    for (const prefix of prefixesLongestFirst) {
      if (name.startsWith(prefix) && name.length > prefix.length) {
        const def = definitions[name.slice(prefix.length)];
        if (def?.prefixable) return { factor: prefixes[prefix] * def.factor, dimensions: def.dimensions };
      }
    }
    // "kms" alone, not "kms-1" (a power follows: km s-1 is meant, and "km/s-1" would not be it)
    const glued = typed === "kms" && /^[-+\d^*]/.test(whole.slice(start + 3, start + 4)) ? "kms-" : typed;
    const trade = tradeSpelling(square ? `sq${square[1]}` : glued);
    if (trade) {
      this.fixed = true;
      const spelled = whole.slice(start, start + length);
      const what = `${quoted(spelled)} ${trade.reads}${trade.write === undefined ? "" : `: write ${quoted(replaced(trade.write))}`}`;
      throw new TypeError(spelled === whole ? what : `${quoted(whole)}: ${what}`);
    }
    if (symbol === "mag") {
      this.fixed = true;
      throw new TypeError(`${quoted(whole)}: magnitudes are logarithmic, not a unit to convert`);
    }
    throw new TypeError(typed === whole ? `unknown unit ${quoted(typed)}` : `unknown unit ${quoted(typed)} in ${quoted(whole)}`);
  }

  private integer(): number {
    const start = this.i;
    if (this.peek() === "+" || this.peek() === "-") this.i++;
    const digitsFrom = this.i;
    while (isDigit(this.s.charCodeAt(this.i))) this.i++;
    if (this.i === digitsFrom) this.fail("a whole-number power is expected");
    if (this.i - digitsFrom > maxPowerDigits) this.fail(`a power has at most ${maxPowerDigits} digits`);
    return Number(this.s.slice(start, this.i));
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
 * @throws TypeError for unknown symbols or malformed text, quoting it (at most 40 characters) with
 *   the fix when one is known (a case slip, a trade spelling such as "micron", h70, a power glued to
 *   the next symbol) or the nearest spellings
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
    const near = e instanceof TypeError && !parser.fixed ? suggestions(trimmed) : [];
    if (near.length === 0) throw e;
    throw new TypeError(`${(e as Error).message}: did you mean ${near.join(" or ")}?`);
  }
  const dims = parsed.dimensions;
  const hPower = dims[hSymbol];
  let factorDeg = parsed.factor;
  if (hPower !== 0 && !parser.astronomical) {
    factorDeg *= 3600 ** hPower; // the hour
    dims[2] += hPower;
  }
  if (parser.astronomical && Math.abs(hPower) > maxHPower) {
    throw new TypeError(`${quoted(trimmed)}: h to the power ${hPower}: h-scaled units carry h to a power from -${maxHPower} to ${maxHPower} (h3 Mpc-3)`);
  }
  const angles = dims[4];
  const unit: Unit = {
    text: trimmed,
    factor: angles === 0 ? factorDeg : factorDeg * (Math.PI / 180) ** angles,
    factorDeg,
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
      `cannot convert ${quoted(a.text)} (${dimensionWords(a.dimensions, a.text)}) to ${quoted(b.text)} (${dimensionWords(b.dimensions, b.text)})`,
    );
  }
  return { factor: a.factorDeg / b.factorDeg, hPower: a.hPower - b.hPower };
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
    throw new TypeError(`${quoted(scaled.trim())} is in units of h = H0/100: give a model`);
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
  if (!(value > 0 && value < Number.POSITIVE_INFINITY)) throw new RangeError(`${name} = ${value} ${quotedText(unit.trim())} must be > 0`);
  const u = parseUnit(unit);
  const x = value * u.factor;
  if (sameDimensions(u.dimensions, d(0, 0, -1))) return x;
  if (sameDimensions(u.dimensions, d(1, 0, 0))) return speedOfLightMPerS / x;
  if (sameDimensions(u.dimensions, d(2, 1, -2))) return x / planckConstantJs;
  throw new TypeError(`${name}: ${quoted(u.text)} is ${dimensionWords(u.dimensions, u.text)}; use a frequency (GHz), a wavelength (Angstrom, um) or an energy (eV)`);
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
