/**
 * Sexagesimal positions, read and written: a right ascension in hours, minutes and seconds of time
 * ("12:30:49.4", "12h30m49.4s", "12 30 49.4") and a declination in degrees, arcminutes and arcseconds
 * ("+12:23:28", "-05d07m", "−05°07′"), as catalogues print them (common practice).
 *
 * Reading: one to three fields, each but the last a whole number, separated by ":", spaces or the marks
 * h, m, s (hours) and d or °, m, ′ or ', s, ″ or " or '' (degrees); the minus may be "-" or "−"
 * (U+2212). A right ascension is hours unless its first field is marked d or ° (degrees); a
 * declination is always degrees. Minutes and seconds must be below 60, hours of right ascension below
 * 24, degrees of longitude below 360 and a latitude within ±90°. A single unmarked field is a decimal
 * number of degrees, in a right ascension too (as a number there is degrees): "12h" is 12 hours.
 * Writing rounds once, on the last digit, so it never shows 60 seconds.
 */
import { requireFiniteNumber } from "../checks/numberChecks.js";
import { quoted } from "../checks/quoted.js";

/**
 * What an angle is: "ra" (right ascension: hours unless marked in degrees, 0 … 24h), "dec"
 * (declination, −90° … 90°), "lon" and "lat" (a longitude and a latitude of another frame, in degrees).
 */
export type AnglePart = "ra" | "dec" | "lon" | "lat";

const colon = 58;
const space = 32;
const tab = 9;
const dot = 46;
const plus = 43;
const hyphenMinus = 45;
const minusSign = 0x2212;
const apostrophe = 39;
const quote = 34;
const degreeSign = 0xb0;
const prime = 0x2032;
const doublePrime = 0x2033;

/** Marks that may follow each field: [hours or degrees, minutes, seconds]. */
function markOf(code: number, field: number): "h" | "d" | "field" | undefined {
  if (field === 0) {
    if (code === 104) return "h"; // h
    if (code === 100 || code === degreeSign) return "d"; // d, °
    return undefined;
  }
  if (field === 1) return code === 109 || code === prime || code === apostrophe ? "field" : undefined; // m ′ '
  return code === 115 || code === doublePrime || code === quote ? "field" : undefined; // s ″ "
}

const twoSigns = "has two signs: give one + or − before the first field";

/** A digit or a decimal point: where a field may start. */
function isNumberStart(code: number): boolean {
  return (code >= 48 && code <= 57) || code === dot;
}

/** 10^k for the digits after a point (exact doubles). */
const powersOfTen = [1, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15];

/** The index after any spaces or tabs from `i`. */
function skipSpaces(text: string, i: number): number {
  while (i < text.length && (text.charCodeAt(i) === space || text.charCodeAt(i) === tab)) i++;
  return i;
}

function fail(name: string, text: string, what: string): never {
  throw new TypeError(`${name}: ${quoted(text.trim())} ${what}`);
}

/** The character at `i` as a person sees it (both halves of a surrogate pair). */
function characterAt(text: string, i: number): string {
  return String.fromCodePoint(text.codePointAt(i)!);
}

function hint(part: AnglePart): string {
  switch (part) {
    case "ra":
      return "write hours as 12:30:49.4, 12h30m49.4s or 12 30 49.4, or give degrees as a number";
    case "dec":
      return "write degrees as +12:23:28, -05d07m or −05°07′, or give a number";
    default:
      return "write degrees as 123:45:06 or 123d45m06s, or give a number";
  }
}

/**
 * Reads a sexagesimal (or decimal) angle.
 *
 * @param text the angle as text, e.g. "12:30:49.4" (a right ascension in hours) or "−05°07′" (degrees)
 * @param part "ra" (hours unless marked d or °), "dec", "lon" or "lat" (degrees)
 * @param name the argument's name for messages (default: the part)
 * @returns the angle [deg]: a right ascension or longitude in [0, 360), a declination or latitude in [−90, 90]
 * @throws TypeError naming the field at fault: text that is not an angle, two signs, minutes or
 *   seconds ≥ 60, hours ≥ 24, a signed right ascension; RangeError for a declination or latitude beyond ±90°
 * @example sexagesimalDegrees("12:30:49.4", "ra") // ≈ 187.7058333333
 * @example sexagesimalDegrees("−05°07′", "dec") // ≈ -5.1166666667
 */
export function sexagesimalDegrees(text: string, part: AnglePart, name: string = part): number {
  if (typeof text !== "string") throw new TypeError(`${name} must be text`);
  // no closures here: a captured variable would live on the heap, and each call would allocate one
  const n = text.length;
  let i = skipSpaces(text, 0);
  let negative = false;
  let signed = false;
  let c = text.charCodeAt(i);
  if (c === plus || c === hyphenMinus || c === minusSign) {
    signed = true;
    negative = c !== plus;
    i = skipSpaces(text, i + 1);
    c = text.charCodeAt(i);
    if (c === plus || c === hyphenMinus || c === minusSign) fail(name, text, twoSigns);
  }
  let f0 = 0; // hours or degrees
  let f1 = 0; // minutes
  let f2 = 0; // seconds
  let count = 0;
  let inHours = part === "ra";
  let decimals = false;
  let marked = false;
  while (i < n) {
    if (count === 3) fail(name, text, `has more than three fields; ${hint(part)}`);
    if (decimals) fail(name, text, `has decimals before its last field; ${hint(part)}`);
    // one field: digits, optionally a point and more digits
    const start = i;
    let whole = 0;
    let digits = 0;
    let fraction = 0;
    let fractionDigits = 0;
    for (; i < n; i++) {
      const d = text.charCodeAt(i) - 48;
      if (d < 0 || d > 9) break;
      whole = whole * 10 + d;
      digits++;
    }
    if (i < n && text.charCodeAt(i) === dot) {
      decimals = true;
      for (i++; i < n; i++) {
        const d = text.charCodeAt(i) - 48;
        if (d < 0 || d > 9) break;
        fraction = fraction * 10 + d;
        fractionDigits++;
      }
    }
    if (digits + fractionDigits === 0) {
      const at = text.charCodeAt(i);
      if (at === plus || at === hyphenMinus || at === minusSign) fail(name, text, signed ? twoSigns : "has a sign inside it: give one + or − before the first field");
      fail(name, text, i < n ? `has "${characterAt(text, i)}" where a number belongs; ${hint(part)}` : `ends without a number; ${hint(part)}`);
    }
    // exact for up to 15 digits: an exact integer over an exact power of ten, rounded once (IEEE 754)
    const value =
      digits + fractionDigits <= 15 ? (fractionDigits === 0 ? whole : (whole * powersOfTen[fractionDigits] + fraction) / powersOfTen[fractionDigits]) : Number(text.slice(start, i));
    if (count === 0) f0 = value;
    else if (count === 1) f1 = value;
    else f2 = value;
    const fieldEnd = i;
    i = skipSpaces(text, i);
    // what follows the field: its mark, a colon, a space before the next field, or the end
    if (i < n) {
      const code = text.charCodeAt(i);
      const twoApostrophes = count === 2 && code === apostrophe && text.charCodeAt(i + 1) === apostrophe; // '' for seconds
      const mark = twoApostrophes ? "field" : markOf(code, count);
      if (mark !== undefined) {
        marked = true;
        i = skipSpaces(text, i + (twoApostrophes ? 2 : 1));
        if (count === 0) {
          if (mark === "h" && part !== "ra") fail(name, text, `is in hours: a ${part === "dec" ? "declination" : "latitude or longitude"} is in degrees (use d or °, or colons)`);
          inHours = mark === "h";
        }
      } else if (code === colon) {
        i = skipSpaces(text, i + 1);
        if (i === n) fail(name, text, `ends with ":"; ${hint(part)}`);
      } else if (i === fieldEnd || !isNumberStart(code)) {
        if (code === plus || code === hyphenMinus || code === minusSign) fail(name, text, signed ? twoSigns : "has a sign inside it: give one + or − before the first field");
        fail(name, text, `has "${characterAt(text, i)}" where ${["h, d, °", "m, ′ or '", "s, ″ or \""][count]}, ":" or a space belongs; ${hint(part)}`);
      }
    }
    count++;
  }
  if (count === 0) fail(name, text, `is not an angle; ${hint(part)}`);
  if (count === 1 && !marked) {
    // a single unmarked number is decimal degrees
    inHours = false;
  }
  if (part === "ra" && signed) fail(name, text, "has a sign: a right ascension is 0h … 24h with no sign");
  if (f1 >= 60) fail(name, text, `has ${inHours ? "minutes" : "arcminutes"} ${f1}: minutes and seconds must be below 60`);
  if (f2 >= 60) fail(name, text, `has ${inHours ? "seconds" : "arcseconds"} ${f2}: minutes and seconds must be below 60`);
  // in seconds first (an exact whole number plus the seconds, rounded once), then one division
  const seconds = f0 * 3600 + f1 * 60 + f2;
  if (part === "ra" || part === "lon") {
    if (inHours && f0 >= 24) fail(name, text, `has hours ${f0}: a right ascension is below 24h (mark degrees with d or °)`);
    const degrees = inHours ? seconds / 240 : seconds / 3600;
    if (!(degrees < 360)) fail(name, text, `is ${degrees}°: a ${part === "ra" ? "right ascension" : "longitude"} is below 360°`);
    if (part === "lon" && negative) return degrees === 0 ? 0 : 360 - degrees;
    return degrees;
  }
  const magnitude = seconds / 3600;
  if (magnitude > 90) throw new RangeError(`${name}: ${quoted(text.trim())} is beyond ±90°: a ${part === "dec" ? "declination" : "latitude"} is −90° … +90°`);
  return negative ? -magnitude : magnitude;
}

/** Digits after the seconds' point by default: 0.01 s of RA (0.15″ cos δ) and 0.1″ of Dec are about alike (common practice in catalogues). */
const defaultDecimals: Record<"ra" | "dec", number> = { ra: 2, dec: 1 };

/**
 * Writes an angle in sexagesimal text: a right ascension as "HH:MM:SS.ss" (hours), a declination as
 * "±DD:MM:SS.s" (degrees, the sign always written). The angle is rounded once, on its last digit, and
 * carried upwards, so seconds and minutes never show 60 (23:59:59.999 with two decimals is
 * 00:00:00.00: a right ascension wraps to 0h).
 *
 * @param degrees the angle [deg]: a right ascension any finite value (taken modulo 360°), a declination −90 … 90
 * @param part "ra" or "dec"
 * @param decimals digits after the seconds' point, a whole number 0 … 9; default 2 for "ra", 1 for "dec"
 * @returns the text
 * @throws RangeError for a declination beyond ±90° or decimals outside 0 … 9 or not whole
 * @example sexagesimalText(187.7058333333, "ra") // "12:30:49.40"
 * @example sexagesimalText(-5.1166666667, "dec") // "-05:07:00.0"
 */
export function sexagesimalText(degrees: number, part: "ra" | "dec", decimals: number = defaultDecimals[part]): string {
  requireFiniteNumber("degrees", degrees);
  requireFiniteNumber("decimals", decimals);
  if (!(decimals >= 0 && decimals <= 9 && Math.floor(decimals) === decimals)) throw new RangeError(`decimals = ${decimals} must be a whole number 0 … 9`);
  const scale = 10 ** decimals;
  let sign = "";
  let units: number; // of the last digit shown: 10^−decimals seconds of time (ra) or of arc (dec)
  if (part === "ra") {
    const turn = 86_400 * scale;
    units = Math.round((((degrees % 360) + 360) % 360) * 240 * scale);
    if (units >= turn) units -= turn;
  } else {
    if (Math.abs(degrees) > 90) throw new RangeError(`degrees = ${degrees} is beyond ±90°: a declination is −90 … 90`);
    units = Math.round(Math.abs(degrees) * 3600 * scale);
    sign = degrees < 0 && units > 0 ? "-" : "+";
  }
  const fraction = units % scale;
  const seconds = Math.floor(units / scale);
  const two = (x: number) => (x < 10 ? `0${x}` : String(x));
  const text = `${sign}${two(Math.floor(seconds / 3600))}:${two(Math.floor(seconds / 60) % 60)}:${two(seconds % 60)}`;
  return decimals === 0 ? text : `${text}.${String(fraction).padStart(decimals, "0")}`;
}
