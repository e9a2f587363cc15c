/**
 * What a cell shows when a formula's arguments are read: the first bad argument decides, a pole is
 * on the sphere, a result of exactly the most cells is read and one row more is refused, and units
 * typed one place early (in the model's slot) are said so only when that slot holds a unit. The
 * messages are zcell's own (functions/messages.ts), pinned as the interface.
 */
import { describe, expect, test } from "vitest";
import { parseUnit } from "../core/index.js";
import { presets } from "../core/model/presets.js";
import { CellError } from "../functions/cellError.js";
import { definitions } from "../functions/definitions.js";
import { readCall } from "../functions/readArguments.js";
import { sheetCalls } from "./sheetCalls.js";

const { run, one, num, failure } = sheetCalls("P18-CMB");
const said = (name: string, ...args: unknown[]) => {
  const e = failure(name, ...args);
  return { kind: e.kind, message: e.message };
};

describe("two bad arguments in one formula: the first in the signature decides", () => {
  test.each([
    // call                                   kind     message (the message zcell shows, functions/messages.ts, pinned as the interface)
    [["LUMINOSITY", -1, "abc"],               "num",   "ZC.LUMINOSITY: flux = -1 erg/s/cm2 must be ≥ 0 erg/s/cm2"],
    [["LUMINOSITY", "abc", -1],               "value", 'ZC.LUMINOSITY: flux: text "abc" where a number belongs'],
    [["DIST_BETWEEN", "one", "two"],          "value", 'ZC.DIST_BETWEEN: z1: text "one" where a number belongs'],
  ] as [unknown[], string, string][])("%j → %s", ([name, ...args], kind, message) => {
    expect(said(name as string, ...args)).toEqual({ kind, message });
  });
});

describe("a declination of exactly ±90° is a pole, not beyond it", () => {
  // at a pole every right ascension is the same point (spherical geometry, common practice): the
  // result does not depend on ra there
  test.each([90, -90])("REDSHIFT_CMB at dec = %d° is a number, the same for every ra", (dec) => {
    const a = num("REDSHIFT_CMB", 0.01, 10, dec);
    const b = num("REDSHIFT_CMB", 0.01, 250, dec);
    expect(Math.abs(a - b)).toBeLessThan(1e-12);
  });

  test.each([
    // dec         message (functions/messages.ts, pinned as the interface)
    [90.0001,      "ZC.REDSHIFT_CMB: dec = 90.0001° is beyond ±90°: a declination is −90° … +90°"],
    [-90.0001,     "ZC.REDSHIFT_CMB: dec = -90.0001° is beyond ±90°: a declination is −90° … +90°"],
  ])("dec = %d is #NUM!", (dec, message) => {
    expect(said("REDSHIFT_CMB", 0.01, 10, dec)).toEqual({ kind: "num", message });
  });
});

describe("the most cells one call returns (4,194,304: four whole columns)", () => {
  // a column against a row broadcasts to rows × cols; the call is read without computing a cell
  const column = (n: number) => Array.from({ length: n }, (_, i) => [1e-15 * (i + 1)]);
  const row = (n: number) => [Array.from({ length: n }, (_, i) => 0.01 * (i + 1))];
  const active = { spec: "P18-CMB", stored: false };

  test("a column of 2,048 fluxes against a row of 2,048 redshifts (exactly 4,194,304 cells) is read as 2,048 × 2,048", () => {
    const read = readCall(definitions.LUMINOSITY, [column(2048), row(2048)], active);
    expect([read.rows, read.cols, read.rows * read.cols]).toEqual([2048, 2048, 4_194_304]);
  });

  test("one row more (4,196,352 cells) is #VALUE! saying how many and the most", () => {
    expect(() => readCall(definitions.LUMINOSITY, [column(2049), row(2048)], active)).toThrow(
      new CellError("value", "the result would have 4,196,352 cells; at most 4,194,304 are allowed"),
    );
    expect(said("LUMINOSITY", column(2049), row(2048))).toEqual({
      kind: "value",
      message: "ZC.LUMINOSITY: the result would have 4,196,352 cells; at most 4,194,304 are allowed",
    });
  });
});

describe("a unit that does not read, beside the model's slot", () => {
  test.each([
    // model slot           flux_unit     message (functions/messages.ts, pinned as the interface)
    // a unit there, spaces around it: the units sit one place early, quoted without the spaces
    [" erg/s/cm2 ",         "Lsun",       'ZC.LUMINOSITY: model: "erg/s/cm2" is a unit, not a model: units come after the model; leave the model blank for the workbook\'s model (two commas: …, , "erg/s/cm2")'],
    // no unit there: the unit's own problem
    ["nonsense",            "furlongs",   'ZC.LUMINOSITY: flux_unit: unknown unit "furlongs"'],
    ["   ",                 "furlongs",   'ZC.LUMINOSITY: flux_unit: unknown unit "furlongs"'],
    [null,                  "furlongs",   'ZC.LUMINOSITY: flux_unit: unknown unit "furlongs"'],
    [42,                    "furlongs",   'ZC.LUMINOSITY: flux_unit: unknown unit "furlongs"'],
    // a model there: the unit's own problem, the model is not taken for a unit
    ["EDS",                 "Lsun",       'ZC.LUMINOSITY: flux_unit: cannot convert "Lsun" (a luminosity or power) to "erg/s/cm2" (a flux)'],
    ["H0=70; Om=0.3",       "Lsun",       'ZC.LUMINOSITY: flux_unit: cannot convert "Lsun" (a luminosity or power) to "erg/s/cm2" (a flux)'],
  ] as [unknown, string, string][])("model slot %j, flux_unit %j", (slot, unit, message) => {
    expect(said("LUMINOSITY", 1e-13, 0.5, slot, unit)).toEqual({ kind: "value", message });
  });

  test("no preset name, in any case, reads as a unit (so a preset in the model's slot is never taken for units typed early)", () => {
    const names = presets.flatMap((p) => [p.name, p.name.toLowerCase(), p.name[0] + p.name.slice(1).toLowerCase()]);
    const units = names.filter((name) => {
      try {
        parseUnit(name);
        return true;
      } catch {
        return false;
      }
    });
    expect(units).toEqual([]);
  });
});

describe("a block of keys and values is a model only where the model goes", () => {
  test("in the model's slot, H0 and Om beside their values are that model", () => {
    expect(num("DIST_LUM", 0.5, [["H0", 70], ["Om", 0.3]])).toBe(num("DIST_LUM", 0.5, "H0=70; Om=0.3"));
  });

  test("as z, the same shape of block is read cell by cell: keys are text where a number belongs, values are redshifts", () => {
    const cells = run("DIST_LUM", [["H0", 0.5], ["Om", 1]]).map((row) => row.map((c) => (c instanceof CellError ? c.message : c)));
    // the messages zcell shows (functions/messages.ts), pinned as the interface
    expect(cells).toEqual([
      ['ZC.DIST_LUM: z: text "H0" where a number belongs', num("DIST_LUM", 0.5)],
      ['ZC.DIST_LUM: z: text "Om" where a number belongs', num("DIST_LUM", 1)],
    ]);
  });
});

describe("a ZC.MODEL value typed as text is read as typed", () => {
  const shown = (cell: unknown) => (cell instanceof CellError ? `#${cell.kind} ${cell.message}` : cell);
  test.each([
    // value            what the cell shows (functions/messages.ts and the core's model spec reader, pinned as the interface)
    [" 70 ",            "P18-CMB; H0=70"],
    ["7e1",             "P18-CMB; H0=70"],
    [70,                "P18-CMB; H0=70"],
    // more than Excel's largest number (1.8e308, IEEE 754 double): quoted as typed, not as "Infinity"
    ["1e400",           '#value ZC.MODEL: H0: "1e400" is too large a number'],
    ["-1e400",          '#value ZC.MODEL: H0: "-1e400" is too large a number'],
  ] as [unknown, string][])("H0 given %j → %s", (value, expected) => {
    expect(shown(one("MODEL", null, "H0", value))).toBe(expected);
  });
});

describe("megajansky where it is no source's flux density", () => {
  test("LUMINOSITY_NU's out_unit in MJy Mpc2 (a spectral luminosity) is read, not refused as mJy mistyped", () => {
    // 1 MJy Mpc² = 1e6 × 1e-26 W m⁻² Hz⁻¹ × (3.0856775814913673e22 m)² (IAU 2015 B2 for the parsec, IAU: 1 Jy = 1e-26 W m⁻² Hz⁻¹)
    const perMJyMpc2 = 1e-20 * 3.0856775814913673e22 ** 2;
    const inWattPerHertz = num("LUMINOSITY_NU", 1, 0.5, 0, null, null, "W/Hz");
    const inMJyMpc2 = num("LUMINOSITY_NU", 1, 0.5, 0, null, null, "MJy Mpc2");
    expect(Math.abs(inMJyMpc2 / (inWattPerHertz / perMJyMpc2) - 1)).toBeLessThan(1e-12);
  });
});
