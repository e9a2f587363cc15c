/**
 * Text read from a workbook is a stranger's: a cell holds up to 32,767 characters, and every number,
 * unit, model spec and position argument reads it on every recalculation. Each reader must take time
 * linear in the text's length, or one crafted cell stalls the shared runtime (a pattern that retries
 * a run of digits or spaces from each of its places is quadratic: a second a cell at Excel's limit).
 */
import { describe, expect, test } from "vitest";
import { parseModelSpec, withChanges } from "../core/model/modelSpec.js";
import { sexagesimalDegrees } from "../core/positions/sexagesimal.js";
import { slashForPer } from "../core/units/unitSuggestions.js";
import { parseUnit } from "../core/units/units.js";
import { definitions } from "../functions/definitions.js";
import { evaluate } from "../functions/evaluate.js";
import { longOverEightShort } from "./linearity.js";

const active = { spec: "P18-CMB", stored: false };
const sheet = (name: string, ...args: unknown[]) => evaluate(definitions[name], args, active);

/** Text of exactly `n` characters: `fill` repeated between a head and a tail (the tail makes every reader fail at the end). */
const crafted = (head: string, fill: string, tail: string) => (n: number) => {
  const room = n - head.length - tail.length;
  return head + fill.repeat(Math.ceil(room / fill.length)).slice(0, room) + tail;
};

let calls = 0;

/** Families of crafted text (our own, after the shapes that stalled a reader: digits, then spaces, before a character that does not fit). */
const digits = crafted("", "1", "x");
const families: [family: string, text: (n: number) => string, read: (text: string) => unknown][] = [
  ["digits in a number argument", digits, (t) => sheet("DIST_LUM", t)],
  ["digits in a column of a whole-column function", digits, (t) => sheet("CHI2_MODULUS", [[t], [t]], [[1], [1]], [[1], [1]])],
  ["digits in a right ascension", digits, (t) => sheet("COORD_DEG", t, "ra")],
  ["digits in CONVERT's value", digits, (t) => sheet("CONVERT", t, "Mpc", "kpc")],
  ["digits in a model spec's value", crafted("H0=", "1", "x; Om=0.3"), (t) => parseModelSpec(t)],
  ["digits and % in a model spec's value", crafted("H0=", "1", "%x; Om=0.3"), (t) => parseModelSpec(t)],
  ["digits in a value of ZC.MODEL", digits, (t) => withChanges(parseModelSpec("P18-CMB"), [["H0", t]])],
  // each call a new text (a count after Om's 0.3), so no model read before answers it from the cache
  ["digits in a model argument", crafted("H0=", "1", "x; Om=0.3"), (t) => sheet("DIST_LUM", 1, `${t}${(calls += 1)}`)],
  ["spaces in a unit", crafted("m", " ", "x"), (t) => parseUnit(t)],
  ["tabs in a unit", crafted("m", "\t", "x"), (t) => parseUnit(t)],
  ["no-break spaces in a unit", crafted("m", "\u00a0", "x"), (t) => parseUnit(t)],
  ["spaces in a unit argument", crafted("m", " ", "x"), (t) => sheet("DIST_LUM", 1, null, t)],
  ["spaces in CONVERT's unit", crafted("m", " ", "x"), (t) => sheet("CONVERT", 1, t, "Mpc")],
  ["spaces around per", crafted("kpc", " ", "per arcsec x"), (t) => parseUnit(t)],
  ["spaces for slashForPer", crafted("m", " ", "x"), (t) => slashForPer(t)],
  ["spaces in a model spec's value", crafted("P18-CMB; H0=7", " ", "0x"), (t) => sheet("DIST_LUM", 1, t)],
  ["many symbols in a unit", crafted("", "m ", "x"), (t) => parseUnit(t)],
  ["many divisions in a unit", crafted("", "Mpc/", "x"), (t) => parseUnit(t)],
  ["spaces in a sexagesimal position", crafted("12", " ", "x"), (t) => sexagesimalDegrees(t, "ra")],
];

describe("reading a stranger's text takes time linear in its length", () => {
  // A shape test, not a speed target (scripts/benchStrangerText.mjs times crafted cells of 32,767
  // characters through the built bundle): test/linearity.ts compares 8 texts of 1,024 characters with
  // one of 8,192; a ratio under 3 leaves room for noise and still fails a quadratic reader by far (about 8).
  test.each(families)("%s: 8 × 1,024 characters against 1 × 8,192", (_family, text, read) => {
    const short = text(1024);
    const long = text(8192);
    expect([short.length, long.length]).toEqual([1024, 8192]);
    expect(longOverEightShort(read, short, long)).toBeLessThan(3);
  });
});
