/**
 * What one cell of an argument may hold and what the function makes of it: number text, spaces,
 * booleans, blanks against omitted arguments, the domain checked in the user's unit, texts and
 * choices, keys and values of ZC.MODEL, a unit or a model one place off, and a unit or a scalar text
 * given as a range. The messages are zcell's own (functions/messages.ts), pinned as the interface;
 * model parameters are the presets' (P18-CMB: Planck 2018 VI, A&A 641, A6, Table 2).
 */
import { describe, expect, test } from "vitest";
import { sheetCalls } from "./sheetCalls.js";

const { num, one, failure } = sheetCalls("P18-CMB");
const said = (name: string, ...args: unknown[]) => {
  const e = failure(name, ...args);
  return { kind: e.kind, message: e.message };
};
type Row = [call: unknown[], kind: "value" | "num" | "na", message: string];
const errors = (rows: Row[]) =>
  test.each(rows)("%j → #%s %s", ([name, ...args], kind, message) => {
    expect(said(name as string, ...args)).toEqual({ kind, message });
  });

describe("numbers as text, and what is no number", () => {
  test("number text with spaces around it is the number (as Excel's own functions read it)", () => {
    expect(num("DIST_LUM", " 0.5 ")).toBe(num("DIST_LUM", 0.5));
    // a position given as number text is a number in the argument's unit (degrees), not hours
    expect(num("COORD_DEG", " 12.5 ", "ra")).toBe(12.5);
    // 12:30 hours of right ascension = 187.5° (15° an hour, common practice)
    expect(num("COORD_DEG", "12:30", "ra")).toBe(187.5);
  });

  errors([
    [["DIST_LUM", "0,5"],                  "value", 'ZC.DIST_LUM: z: text "0,5" is not a number: use a point for decimals, 0.5'],
    [["DIST_LUM", true],                   "value", "ZC.DIST_LUM: z: TRUE where a number belongs"],
    [["DIST_LUM", false],                  "value", "ZC.DIST_LUM: z: FALSE where a number belongs"],
    [["DIST_LUM", Number.POSITIVE_INFINITY], "num", "ZC.DIST_LUM: z: not a finite number"],
    [["DIST_LUM", "1e999"],                "num",   "ZC.DIST_LUM: z: not a finite number"],
    [["DIST_LUM", "Infinity"],             "value", 'ZC.DIST_LUM: z: text "Infinity" where a number belongs'],
    [["DIST_LUM", { errorCode: "#N/A" }],  "value", "ZC.DIST_LUM: z: the input cell holds an error"],
    [["DIST_LUM", null],                   "value", "ZC.DIST_LUM: z is required"],
  ]);

  test("a blank cell given for a required number is a blank result, not an error", () => {
    expect(one("DIST_LUM", "")).toBe("");
  });
});

describe("the domain of a number, in the unit the user gave", () => {
  test("the whole sky exactly is allowed; a square degree more is above it, quoted in square degrees", () => {
    // 4π sr = 41,252.96 deg² (IAU: 1 rad = 180/π deg)
    expect(num("VOLUME_SHELL", 0.1, 0.2, 4 * Math.PI, null, null, "sr")).toBe(num("VOLUME_SHELL", 0.1, 0.2));
  });

  errors([
    [["VOLUME_SHELL", 0.1, 0.2, 50000, null, null, "deg2"],     "num", "ZC.VOLUME_SHELL: area = 50000 deg2 is above 41253 deg2 (the whole sky)"],
    [["VOLUME_SHELL", 0.1, 0.2, 12.6, null, null, "sr"],        "num", "ZC.VOLUME_SHELL: area = 12.6 sr is above 12.5664 sr (the whole sky)"],
    [["VOLUME_SHELL", 0.1, 0.2, -1, null, null, "deg2"],        "num", "ZC.VOLUME_SHELL: area = -1 deg2 must be ≥ 0 deg2"],
    [["Z_COMBINE", -1, 0.1],                                    "num", "ZC.Z_COMBINE: z1 = -1 must be > -1"],
    [["MAG_ABS", 50, 0.5],                                      "na",  "ZC.MAG_ABS: m = 50 is a catalogue's missing-value flag (|magnitude| ≥ 50), not a magnitude"],
    [["REDSHIFT_CMB", 0.01, "12h", 95],                         "num", "ZC.REDSHIFT_CMB: dec = 95° is beyond ±90°: a declination is −90° … +90°"],
    [["REDSHIFT_CMB", 0.01, "12h", "+95:00:00"],                "num", 'ZC.REDSHIFT_CMB: dec: "+95:00:00" is beyond ±90°: a declination is −90° … +90°'],
    [["REDSHIFT_CMB", 0.01, 0, -2, "rad"],                      "num", "ZC.REDSHIFT_CMB: dec = -2 rad is beyond ±90°: a declination is −90° … +90°"],
  ]);

  test("hourangle applies to the right ascension; the declination beside it stays in degrees", () => {
    // 12 hours = 180°; the declination 10 is 10° either way
    expect(num("REDSHIFT_CMB", 0.01, 12, 10, "hourangle")).toBeCloseTo(num("REDSHIFT_CMB", 0.01, 180, 10), 15);
    expect(num("REDSHIFT_CMB", 0.01, " 12 ", "10", "hourangle")).toBeCloseTo(num("REDSHIFT_CMB", 0.01, "12h", " 10 "), 15);
  });
});

describe("texts and choices", () => {
  test("a choice is matched whatever its case and spaces", () => {
    // h of P18-CMB: H0 = 67.36 → h = 0.6736
    expect(num("PARAM", " h ", "P18-CMB")).toBe(0.6736);
  });

  errors([
    [["OMEGA", 5],                  "value", "ZC.OMEGA: component: 5 where text belongs"],
    [["OMEGA", " mater "],          "value", 'ZC.OMEGA: component: "mater" is not one of matter, cold, darkenergy, curvature, radiation, photons, neutrinos'],
    [["OMEGA", { errorCode: "#N/A" }], "value", "ZC.OMEGA: component: the input cell holds an error"],
    [["MODEL", "P18-CMB", 5, 0.3],  "value", "ZC.MODEL: key1: 5 where text belongs"],
    // the key as the user wrote it, spaces aside
    [["MODEL", "P18-CMB", " Om ", null], "value", 'ZC.MODEL: key1 "Om" has no value1'],
    [["MODEL", "P18-CMB", "Om", true],   "value", "ZC.MODEL: value1: TRUE where a number belongs"],
    [["MODEL", "P18-CMB", "Om", { errorCode: "#N/A" }], "value", "ZC.MODEL: value1: the input cell holds an error"],
  ]);

  test("ZC.MODEL's values: number text is a number, other text passes to the model (a list of masses)", () => {
    expect(one("MODEL", "P18-CMB", "Om", " 0.3 ")).toBe("P18-CMB; Om=0.3");
    expect(one("MODEL", "P18-CMB", "mnu", "0.06,0.01")).toBe("P18-CMB; mnu=0.06,0.01");
    expect(one("MODEL", "P18-CMB", "Om", 0.3)).toBe("P18-CMB; Om=0.3");
    expect(said("MODEL", "P18-CMB", "Om", "abc")).toEqual({ kind: "value", message: 'ZC.MODEL: Om: "abc" is not a number' });
  });
});

describe("a unit or a model one place off", () => {
  const unitInModel = (fn: string, unit: string) =>
    `ZC.${fn}: model: "${unit}" is a unit, not a model: units come after the model; leave the model blank for the workbook's model (two commas: …, , "${unit}")`;
  errors([
    [["DIST_LUM", 0.5, "Gpc"],                       "value", unitInModel("DIST_LUM", "Gpc")],
    [["DIST_LUM", 0.5, " Gpc "],                     "value", unitInModel("DIST_LUM", "Gpc")],
    // the unit in the model's slot, the next unit in the flux's: the model's slot is named
    [["LUMINOSITY", 1e-13, 0.5, " erg/s/cm2 ", "W"], "value", unitInModel("LUMINOSITY", "erg/s/cm2")],
    // the model is the first argument
    [["SOUND_HORIZON", "Mpc", "xyz"],                "value", unitInModel("SOUND_HORIZON", "Mpc")],
    // a model slot that is blank, or holds a model: the unit's own problem
    [["LUMINOSITY", 1e-13, 0.5, "  ", "W"],          "value", 'ZC.LUMINOSITY: flux_unit: cannot convert "W" (a luminosity or power) to "erg/s/cm2" (a flux)'],
    [["LUMINOSITY", 1e-13, 0.5, "P18-CMB", "W"],     "value", 'ZC.LUMINOSITY: flux_unit: cannot convert "W" (a luminosity or power) to "erg/s/cm2" (a flux)'],
    [["SOUND_HORIZON", null, "xyz"],                 "value", 'ZC.SOUND_HORIZON: unit: unknown unit "xyz"'],
    // a model where a unit belongs
    [["LUMINOSITY", 1e-13, 0.5, null, "P18-CMB"],    "value", 'ZC.LUMINOSITY: flux_unit: "P18-CMB" is a model, not a unit: the model comes before the units (check the order of the arguments)'],
    [["CONVERT", 1, "Mpc", "P18-CMB"],               "value", 'ZC.CONVERT: to: "P18-CMB" is a model, not a unit: the model comes before the units (check the order of the arguments)'],
    [["CONVERT", 1, "Mpc", "xyz"],                   "value", 'ZC.CONVERT: to: unknown unit "xyz"'],
  ]);

  test("a blank model, or one of spaces, is the workbook's model", () => {
    expect(num("DIST_LUM", 0.5, "   ")).toBe(num("DIST_LUM", 0.5, "P18-CMB"));
    expect(num("DIST_LUM", 0.5, " P18-CMB ")).toBe(num("DIST_LUM", 0.5, "P18-CMB"));
  });
});

describe("a unit or a scalar text given as a range", () => {
  errors([
    [["DIST_LUM", 0.5, null, [["Mpc", "Gpc"]]],   "value", "ZC.DIST_LUM: unit must be one cell: it applies to the whole result (for several, one formula each)"],
    [["CONVERT", 1, [["Mpc", "kpc"]], "pc"],      "value", "ZC.CONVERT: from must be one cell: it applies to the whole result (for several, one formula each)"],
    [["CONVERT", 1, [[null]], "kpc"],             "value", "ZC.CONVERT: from is required"],
    [["CONVERT", 1, "Mpc", null],                 "value", "ZC.CONVERT: to is required"],
    [["RESCALE", 1, 0.5, "distance", null],       "value", "ZC.RESCALE: from_model is required"],
  ]);

  test("one cell of a range is the unit or text it holds", () => {
    // 1 Gpc = 1000 Mpc, 1 Mpc = 1000 kpc (FITS prefixes)
    expect(num("DIST_LUM", 0.5, null, [["Gpc"]])).toBeCloseTo(num("DIST_LUM", 0.5) / 1000, 12);
    expect(num("CONVERT", 1, [[" Mpc "]], "kpc")).toBe(1000);
  });
});
