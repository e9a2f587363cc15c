/** The worksheet functions through the shared wrapper, on plain arrays as Excel passes them. */
import { describe, expect, test } from "vitest";
import {
  abMagnitude,
  Cosmology,
  convertUnit,
  kCorrectionPowerLawMag,
  luminosityW,
  presets,
} from "../core/index.js";
import { CellError } from "../functions/cellError.js";
import { definitions } from "../functions/definitions.js";
import { evaluate, type Cell } from "../functions/evaluate.js";
import { expectRelative } from "./helpers.js";

const active = { spec: "P18-BAO", stored: false };
const run = (name: string, ...args: unknown[]): Cell[][] => evaluate(definitions[name], args, active);
const one = (name: string, ...args: unknown[]): Cell => run(name, ...args)[0][0];
const p18 = Cosmology.fromSpec("P18-BAO");
const wmap9 = Cosmology.fromSpec("W9-ALL");

function expectError(cell: Cell, kind: "value" | "num" | "na", message: RegExp): void {
  expect(cell).toBeInstanceOf(CellError);
  expect((cell as CellError).kind).toBe(kind);
  expect((cell as CellError).message).toMatch(message);
}

describe("broadcasting", () => {
  test("a column of redshifts against a row of models gives a what-if table", () => {
    const zs = [[0.1], [1], [3]];
    const models = [["P18-BAO", "W9-ALL", "H0=70; Om=0.3"]];
    const table = run("DIST_LUM", zs, models);
    expect(table.length).toBe(3);
    expect(table[0].length).toBe(3);
    const concordance = new Cosmology({ H0: 70, Om: 0.3, w0: -1, wa: 0, Tcmb: 0, Neff: 3.046, mnu: [] });
    [p18, wmap9, concordance].forEach((m, c) =>
      zs.forEach(([z], r) => expect(table[r][c]).toBe(m.luminosityDistanceMpc(z))),
    );
  });

  test("equal shapes pair cell by cell and a single cell repeats", () => {
    const r = run("DIST_BETWEEN", [[0.5], [1]], [[2], [3]]);
    expect(r).toEqual([[p18.angularDiameterDistanceBetweenMpc(0.5, 2)], [p18.angularDiameterDistanceBetweenMpc(1, 3)]]);
    expect(run("DIST_BETWEEN", 0.5, [[2, 3]])).toEqual([[p18.angularDiameterDistanceBetweenMpc(0.5, 2), p18.angularDiameterDistanceBetweenMpc(0.5, 3)]]);
  });

  test("ranges that do not fit together give one #VALUE! naming both", () => {
    const r = run("DIST_BETWEEN", [[0.5], [1]], [[2], [3], [4]]);
    expect(r.length).toBe(1);
    expectError(r[0][0], "value", /z1 is 2×1 and z2 is 3×1/);
  });

  test("blank input cells give blank output cells and bad cells their own error; the rest compute", () => {
    const r = run("LOOKBACK", [[1], [null], [""], [-1], ["abc"], [true], [2]]);
    expect(r[0][0]).toBe(p18.lookbackTimeGyr(1));
    expect(r[1][0]).toBe("");
    expect(r[2][0]).toBe("");
    expectError(r[3][0], "num", /blueshifted source needs a redshift-independent distance/);
    expectError(r[4][0], "value", /z: text "abc" where a number belongs/);
    expectError(r[5][0], "value", /z: TRUE where a number belongs/);
    expect(r[6][0]).toBe(p18.lookbackTimeGyr(2));
  });

  test("a huge broadcast is refused rather than allocated", () => {
    const col = Array.from({ length: 3000 }, (_, i) => [i / 1000]);
    const row = [Array.from({ length: 3000 }, () => "P18-BAO")];
    expectError(one("DIST_LUM", col, row), "value", /at most/);
  });
});

describe("the model argument", () => {
  test("omitted or blank is the active model", () => {
    expect(one("AGE")).toBe(p18.ageTodayGyr);
    expect(evaluate(definitions.AGE, [undefined, ""], { spec: "W9-ALL", stored: true })[0][0]).toBe(wmap9.ageTodayGyr);
  });

  test("a two-column key/value block is one model", () => {
    const block = [["H0", 70], ["Om", 0.3], ["OL", 0.7], ["", ""]];
    const m = Cosmology.fromSpec("H0=70; Om=0.3; OL=0.7");
    expect(run("DIST_LUM", [[1], [2]], block)).toEqual([[m.luminosityDistanceMpc(1)], [m.luminosityDistanceMpc(2)]]);
    const withPreset = [["preset", "P18-BAO"], ["H0", 73]];
    expect(one("AGE", 0, withPreset)).toBe(Cosmology.fromSpec("P18-BAO; H0=73").ageTodayGyr);
  });

  test("bad specs give #VALUE! and unphysical models #NUM!, with the core's words", () => {
    expectError(one("DIST_LUM", 1, "PLANK2018"), "value", /model: unknown preset "PLANK2018"/);
    expectError(one("DIST_LUM", 1, "H0=70; Om=0; OL=2"), "num", /model: no big bang/);
    expectError(one("DIST_LUM", 1, 42), "value", /model: model: 42 where text belongs/);
  });
});

describe("units and defaults", () => {
  test.each([
    // function        args                        expected                                                source
    ["DIST_LUM",       [1],                        p18.luminosityDistanceMpc(1),                           "default Mpc"],
    ["DIST_LUM",       [1, "", "Gly"],             convertUnit(p18.luminosityDistanceMpc(1), "Mpc", "Gly"), "unit given"],
    ["LOOKBACK",       [1, "", "Myr"],             p18.lookbackTimeGyr(1) * 1000,                           "Myr"],
    ["PROPER_SCALE",      [1],                        convertUnit(p18.angularDiameterDistanceMpc(1), "Mpc/rad", "kpc/arcsec"), "default kpc/arcsec"],
    ["VOLUME",         [1],                        p18.comovingVolumeMpc3(1) / 1e9,                          "default Gpc3"],
    ["HUBBLE",         [],                         67.66,                                                  "H0 of the preset"],
    ["CRIT_DENSITY",       [0, "", "g/cm3"],           p18.criticalDensityKgM3(0) / 1000,                       "kg/m3 → g/cm3"],
    ["SIZE",           [1, 1],                     convertUnit(p18.angularDiameterDistanceMpc(1) * convertUnit(1, "arcsec", "rad"), "Mpc", "kpc"), "arcsec in, kpc out"],
    ["ANGLE",          [10, 1],                    convertUnit(convertUnit(10, "kpc", "Mpc") / p18.angularDiameterDistanceMpc(1), "rad", "arcsec"), "kpc in, arcsec out"],
    ["VOLUME_SHELL",   [0.5, 1],                   (p18.comovingVolumeMpc3(1) - p18.comovingVolumeMpc3(0.5)) / 1e9, "all sky"],
    ["VOLUME_SHELL",   [0.5, 1, 100],              ((p18.comovingVolumeMpc3(1) - p18.comovingVolumeMpc3(0.5)) / 1e9) * (100 * (Math.PI / 180) ** 2) / (4 * Math.PI), "100 deg2"],
    ["VOLUME_ELEMENT", [1],                        p18.comovingVolumeElementMpc3Sr(1),                      "default Mpc3/sr"],
    ["LUMINOSITY",     [1e-15, 1],                 luminosityW(p18, 1e-15, 1),                              "W/m2 in, W out"],
    ["LUMINOSITY",     [1e-12, 1, "", "erg/s/cm2", "Lsun"], luminosityW(p18, 1e-15, 1) / 3.828e26,         "erg/s/cm2 in, Lsun out"],
    ["FLUX",           [luminosityW(p18, 1e-15, 1), 1], 1e-15,                                             "round trip of LUMINOSITY"],
    ["LUMINOSITY_NU",  [1, 1, -1],                 1e-26 * 4 * Math.PI * (p18.luminosityDistanceMpc(1) * 3.0856775814913673e22) ** 2, "α = −1: no (1+z) factor"],
    ["KCORRECTION",    [1, 0],                     kCorrectionPowerLawMag(1, 0),                             "flat spectrum"],
    ["MAG_ABS",        [20, 1],                    20 - p18.distanceModulusMag(1),                           "K = 0 default"],
    ["MAG_APP",        [-20, 1, 0.3],              -20 + p18.distanceModulusMag(1) + 0.3,                   "K given"],
    ["MAG_AB",         [1, "uJy"],                 abMagnitude(1e-6),                                        "uJy in"],
    ["FLUX_AB",        [23.9, "uJy"],              1e6 * 10 ** (-(23.9 + 48.6) / 2.5) * 1e23,                "uJy out"],
    ["MODULUS",        [1],                        p18.distanceModulusMag(1),                                "mag"],
    ["CMB_TEMP",       [1],                        2.7255 * 2,                                               "Tcmb (1+z)"],
    ["OMEGA",          ["matter"],                 0.3111,                                                   "Om today"],
    ["PARAM",          ["age_today"],              p18.ageTodayGyr,                                       "age today"],
    ["PARAM",          ["z_eq"],                   p18.equalityRedshift,                                     "z_eq"],
    ["CONVERT",        [1, "Mpc", "Gly"],          convertUnit(1, "Mpc", "Gly"),                             "conversion"],
    ["DIST_ANG",       [1],                        p18.angularDiameterDistanceMpc(1),                        "Mpc"],
    ["DIST_LOS",       [1],                        p18.comovingDistanceMpc(1),                               "Mpc"],
    ["DIST_TRANS",     [1],                        p18.transverseComovingDistanceMpc(1),                     "Mpc"],
    ["DIST_LIGHT",     [1],                        p18.lightTravelDistanceMpc(1),                            "Mpc"],
    ["AGE",            [1],                        p18.ageGyr(1),                                            "Gyr"],
  ])("%s %j", (name, args, expected) => {
    const got = one(name, ...(args as unknown[]));
    expect(typeof got, String(got instanceof CellError ? got.message : got)).toBe("number");
    expectRelative(got as number, expected as number, 1e-13, name);
  });

  test("an incompatible unit is #VALUE! naming the argument and both dimensions", () => {
    expectError(one("DIST_LUM", 1, "", "Gyr"), "value", /unit: cannot convert "Mpc" \(length\) to "Gyr" \(time\)/);
    expectError(one("SIZE", 1, 1, "", "kpc"), "value", /angle_unit: cannot convert "kpc" \(length\) to "rad" \(angle\)/);
  });
});

describe("inverse and text functions", () => {
  test("REDSHIFT inverts each quantity, with units, and #N/A beyond its range", () => {
    expectRelative(one("REDSHIFT", p18.luminosityDistanceMpc(2), "DIST_LUM") as number, 2, 1e-12, "DIST_LUM");
    expectRelative(one("REDSHIFT", p18.lookbackTimeGyr(2) * 1000, "lookback", "", "Myr") as number, 2, 1e-10, "LOOKBACK Myr");
    expectRelative(one("REDSHIFT", p18.comovingVolumeMpc3(2) / 1e9, "VOLUME", "", "Gpc3") as number, 2, 1e-12, "VOLUME Gpc3");
    expectError(one("REDSHIFT", 20, "AGE"), "na", /exceeds the age of the universe/);
    expectError(one("REDSHIFT", 1, "SPEED"), "value", /quantity: "SPEED" is not one of/);
  });

  test("MODEL changes a base model by key/value pairs and prints the canonical spec", () => {
    expect(one("MODEL", "P18-BAO", "H0", 73)).toBe("P18-BAO; H0=73");
    expect(one("MODEL", "P18-BAO; H0=70", "h0", 73)).toBe("P18-BAO; H0=73"); // a later value wins
    expect(one("MODEL", "CONCORDANCE", "Ok", 0.1)).toBe("CONCORDANCE; Ok=0.1"); // Ok replaces the flat default
    expect(one("MODEL", "H0=70; Om=0.3", "OL", 0.7, "Tcmb", 2.7255, "mnu", "0.05,0.01")).toBe("H0=70; Om=0.3; OL=0.7; Tcmb=2.7255; mnu=0.05,0.01");
    expect(one("MODEL", null, "H0", 73)).toBe("P18-BAO; H0=73"); // blank base = the workbook's model
    expect(one("MODEL", [["H0", 70], ["Om", 0.3]], "OL", 0.7)).toBe("H0=70; Om=0.3; OL=0.7"); // a key/value block as base
    expect(run("MODEL", "P18-BAO", "H0", [[70], [73]])).toEqual([["P18-BAO; H0=70"], ["P18-BAO; H0=73"]]);
    expectError(one("MODEL", "P18-BAO", "H0", -70), "num", /H0 must be a positive number/);
    expectError(one("MODEL", "P18-BAO", "Omm", 0.3), "value", /unknown key "Omm": use H0, Om/);
    expectError(one("MODEL", "P18-BAO", "H0", 70, "H0", 71), "value", /H0 is given twice/);
    expectError(one("MODEL", "P18-BAO", "H0", 70, null, 0.3), "value", /value2 is given but key2 is blank/);
  });

  test("PRESETS lists every preset with its source; DESCRIBE and VERSION state the assumptions", () => {
    const table = run("PRESETS");
    expect(table.slice(1).map((r) => r[0])).toEqual(presets.map((p) => p.name));
    expect(String(table[1][1])).toBe("H0 67.66, Ωm 0.3111 (incl. one 0.06 eV ν), flat — Planck 2018 VI, A&A 641, A6, Table 2, CMB+lensing+BAO");
    expect(one("DESCRIBE")).toMatch(/^P18-BAO: flat: matter \+ Λ \+ radiation; H0 = 67.66 km\/s\/Mpc; Om = 0.3111 \(matter incl. massive ν\)/);
    expect(one("VERSION")).toMatch(/^zcell \d+\.\d+\.\d+; distances per Hogg \(1999\); Om includes massive neutrinos/);
  });

  test("PARAM reports what a model does not have as an error, not a number", () => {
    expectError(one("PARAM", "Ob", "H0=70; Om=0.3"), "num", /Ob is not given/);
    expectError(one("PARAM", "z_eq", "CONCORDANCE"), "num", /no radiation/);
  });
});

describe("results are clean", () => {
  test("−0 becomes 0 and infinities become #NUM!", () => {
    expect(Object.is(one("KCORRECTION", 0, 0), 0)).toBe(true);
    expectError(one("AGE", 1, "H0=70; Om=0; OL=1"), "num", /not a finite number/);
  });
});

describe("model cache", () => {
  test("keeps at most 64 compiled models and builds a repeated spec once", async () => {
    const { cachedModelCount, modelFor } = await import("../functions/modelCache.js");
    for (let i = 0; i < 100; i++) modelFor(`H0=${60 + i / 10}; Om=0.3`);
    expect(cachedModelCount()).toBe(64);
    const a = modelFor("W7-BAO");
    for (let i = 0; i < 63; i++) modelFor(`H0=${50 + i / 10}; Om=0.3`);
    expect(modelFor("W7-BAO")).toBe(a); // still cached: it was used most recently before the 63 others
    for (let i = 0; i < 64; i++) modelFor(`H0=${40 + i / 10}; Om=0.3`);
    expect(modelFor("W7-BAO")).not.toBe(a); // evicted, rebuilt
  });
});
