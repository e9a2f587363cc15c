/**
 * The reader's contract for a declaration (FunctionDef.ts), on declarations made up to reach what the
 * shipped functions combine in one way only: a minimum quoted in the unit the user gave, a
 * declination beside an "hourangle" right ascension whatever the angle unit's default, and text units
 * that compute converts itself quoted in the domain's messages (MAG_AB). Messages are zcell's own
 * (functions/messages.ts), pinned as the interface; unit factors follow FITS 4.0 (Pence et al.
 * 2010, Table 3 prefixes, Table 4: 1 deg = π/180 rad).
 */
import { describe, expect, test } from "vitest";
import { CellError } from "../functions/cellError.js";
import { evaluate, type Cell, type FunctionDef } from "../functions/evaluate.js";
import { sheetCalls } from "./sheetCalls.js";

const active = { spec: "P18-CMB", stored: false };
const shown = (c: Cell) => (c instanceof CellError ? `#${c.kind} ${c.message}` : c);
const call = (def: FunctionDef, ...args: unknown[]) => shown(evaluate(def, args, active)[0][0]);

describe("a minimum other than zero, in the unit given", () => {
  // a length of at least 1 Mpc, given in the unit the user chooses
  const def: FunctionDef = {
    name: "AT_LEAST_MPC",
    args: [
      { kind: "number", name: "size", min: 1, max: { value: 1000, what: "a Gpc" } },
      { kind: "unit", name: "size_unit", unit: "Mpc", default: "Mpc", applies: "size" },
    ],
    compute: (a) => a.size as number,
  };
  test.each([
    // size   unit     shown
    [500,    "kpc",   "#num ZC.AT_LEAST_MPC: size = 500 kpc must be ≥ 1000 kpc"],
    [0.5,    "Mpc",   "#num ZC.AT_LEAST_MPC: size = 0.5 Mpc must be ≥ 1 Mpc"],
    [2,      "Gpc",   "#num ZC.AT_LEAST_MPC: size = 2 Gpc is above 1 Gpc (a Gpc)"],
    [1,      "Gpc",   1000],
    [1000,   "kpc",   1],
  ])("%j %s → %j", (size, unit, expected) => {
    expect(call(def, size, unit)).toBe(expected);
  });
});

describe("a maximum without a minimum, in a range", () => {
  // at most 10, nothing below: every cell of a range is checked against the maximum alone
  const def: FunctionDef = {
    name: "AT_MOST_TEN",
    args: [{ kind: "number", name: "x", max: { value: 10, what: "ten" } }],
    compute: (a) => a.x as number,
  };
  test("each cell is checked, in a column as in one cell", () => {
    expect(evaluate(def, [[[-5], [10], [11]]], active).map(([c]) => shown(c))).toEqual([-5, 10, "#num ZC.AT_MOST_TEN: x = 11 is above 10 (ten)"]);
    expect(call(def, 11)).toBe("#num ZC.AT_MOST_TEN: x = 11 is above 10 (ten)");
  });
});

describe("hourangle is for the right ascension", () => {
  // the angle unit's default is radians here: a declination beside an hourangle ra is still in degrees
  const def: FunctionDef = {
    name: "DEC_OF",
    args: [
      { kind: "number", name: "ra", sexagesimal: "ra" },
      { kind: "number", name: "dec", sexagesimal: "dec", min: -90, max: { value: 90, what: "the pole, 90°" } },
      { kind: "unit", name: "angle_unit", unit: "deg", default: "rad", applies: ["ra", "dec"] },
    ],
    compute: (a) => `${a.ra} ${a.dec}`,
  };
  test.each([
    // ra    dec    unit          ra, dec in degrees
    [12,     10,    "hourangle",  "180 10"],
    [12,     "10",  "hourangle",  "180 10"],
    [180,    10,    "deg",        "180 10"],
  ])("(%j, %j, %s) → %s", (ra, dec, unit, expected) => {
    expect(call(def, ra, dec, unit)).toBe(expected);
  });

  test("a column of declinations beside an hourangle ra is in degrees too", () => {
    const cells = evaluate(def, [12, [[10], [-20]], "hourangle"], active).map(([c]) => shown(c));
    expect(cells).toEqual(["180 10", "180 -20"]);
  });
});

describe("a text unit quoted by the domain's messages", () => {
  const { failure } = sheetCalls("P18-CMB");
  test.each([
    // args                                       message
    [[-1],                                        "ZC.MAG_AB: flux_density = -1 Jy must be > 0 Jy"],       // blank: the unit it means, typed
    [[-1, "mJy"],                                 "ZC.MAG_AB: flux_density = -1 mJy must be > 0 mJy"],
    [[-1, " mJy "],                               "ZC.MAG_AB: flux_density = -1 mJy must be > 0 mJy"],
    [[1, "erg/s/cm2/Angstrom", -5],               "ZC.MAG_AB: wavelength = -5 Angstrom must be > 0 Angstrom"], // a fixed unit
    [[1, "xyz"],                                  'ZC.MAG_AB: unit: unknown unit "xyz"'],
    [[1, "P18-CMB"],                              'ZC.MAG_AB: unit: "P18-CMB" is a model, not a unit: the model comes before the units (check the order of the arguments)'],
  ])("MAG_AB(%j)", (args, message) => {
    expect(failure("MAG_AB", ...args).message).toBe(message);
  });

  test("a band unit given in MHz quotes the band in MHz", () => {
    expect(failure("INDEX_BETWEEN", 1, -1, 2, 3, "MHz").message).toBe("ZC.INDEX_BETWEEN: band1 = -1 MHz must be > 0 MHz");
    expect(failure("INDEX_BETWEEN", 1, -1, 2, 3).message).toBe("ZC.INDEX_BETWEEN: band1 = -1 GHz must be > 0 GHz");
  });
});
