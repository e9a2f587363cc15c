/** The worksheet functions through the shared wrapper, on plain arrays as Excel passes them. */
import { describe, expect, test } from "vitest";
import {
  Cosmology,
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
    expectError(one("DIST_LUM", 1, 42), "value", /^ZC.DIST_LUM: model: 42 where text belongs$/);
  });
});

// Independent expected values: closed forms of Einstein–de Sitter (EDS: H0 = 70, Om = 1, no radiation),
// the empty Milne model and de Sitter (Hogg 1999, astro-ph/9905116, eqs. 14–28 with E(z) = (1+z)^1.5,
// 1+z and 1), evaluated here from the constants written out, never through the core.
const cKmS = 299792.458; // exact (SI)
const mpcM = (648000 / Math.PI) * 149597870700 * 1e6; // pc = 648000/π au (IAU 2015 B2), au exact (IAU 2012 B2)
const gyrS = 365.25 * 86400 * 1e9; // Julian year (IAU)
const lyM = 299792458 * 365.25 * 86400; // light year: c × Julian year (IAU)
const arcsecRad = Math.PI / (180 * 3600);
const G = 6.6743e-11; // CODATA 2018
const dH = cKmS / 70; // Mpc, Hubble distance for H0 = 70
const tH = mpcM / 70e3 / gyrS; // Gyr, Hubble time 1/H0
const edsDC = (z: number) => 2 * dH * (1 - 1 / Math.sqrt(1 + z));
const edsDL = (z: number) => (1 + z) * edsDC(z);
const edsDA = (z: number) => edsDC(z) / (1 + z);
const edsV = (z: number) => (4 * Math.PI * edsDC(z) ** 3) / 3;
const modulus = (dlMpc: number) => 5 * Math.log10((dlMpc * 1e6) / 10);
const lumW = (fluxWm2: number, dlMpc: number) => 4 * Math.PI * (dlMpc * mpcM) ** 2 * fluxWm2;

describe("units and defaults", () => {
  test.each([
    // function        args                               expected                                           source of the expected value
    ["DIST_LUM",       [1, "EDS"],                        edsDL(1),                                          "EdS D_L = 2 D_H (1+z − √(1+z)), Hogg eq. 21; default Mpc"],
    ["DIST_LUM",       [1, "EDS", "Gly"],                 (edsDL(1) * mpcM) / (1e9 * lyM),                   "the same in Gly (IAU light year)"],
    ["LOOKBACK",       [3, "EDS", "Myr"],                 (2 / 3) * tH * (1 - 4 ** -1.5) * 1000,              "EdS t_L = (2/3) t_H (1 − (1+z)^−1.5), Hogg eq. 30; Myr"],
    ["PROPER_SCALE",   [1.25, "EDS"],                     edsDA(1.25) * 1000 * arcsecRad,                    "D_A per arcsec, default kpc/arcsec"],
    ["VOLUME",         [1, "EDS"],                        edsV(1),                                           "flat V_C = (4π/3) D_M³, Hogg eq. 29; default Mpc3"],
    ["HUBBLE",         [],                                67.66,                                             "H0 of P18-BAO, Planck 2018 VI Table 2 (last column)"],
    ["HUBBLE",         [3, "EDS"],                        70 * 4 ** 1.5,                                     "EdS H = H0 (1+z)^1.5"],
    ["CRIT_DENSITY",   [0, "EDS", "g/cm3"],               (3 * (70e3 / mpcM) ** 2) / (8 * Math.PI * G) / 1000, "3H0²/(8πG), CODATA 2018 G; kg/m3 → g/cm3"],
    ["SIZE",           [1, 1.25, "EDS"],                  edsDA(1.25) * arcsecRad * 1000,                    "ℓ = D_A θ: arcsec in, kpc out"],
    ["ANGLE",          [10, 1.25, "EDS"],                 10 / 1000 / edsDA(1.25) / arcsecRad,               "θ = ℓ/D_A: kpc in, arcsec out"],
    ["VOLUME_SHELL",   [0.5, 1, "", "EDS"],               edsV(1) - edsV(0.5),                               "all sky when the area is blank; default Mpc3"],
    ["VOLUME_SHELL",   [0.5, 1, 100, "EDS"],              (edsV(1) - edsV(0.5)) * (100 * (Math.PI / 180) ** 2) / (4 * Math.PI), "100 deg2 of 4π sr"],
    ["VOLUME_ELEMENT", [1, "EDS"],                        (dH * edsDC(1) ** 2) / 2 ** 1.5,                   "dV/dz/dΩ = D_H D_M²/E, Hogg eq. 28; Mpc3/sr"],
    ["LUMINOSITY",     [1e-15, 1, "EDS"],                 lumW(1e-18, edsDL(1)) * 1e7,                       "L = 4π D_L² F with the EdS D_L (not D_A); erg/s/cm2 in (1e-3 W/m2), erg/s out (1e-7 W)"],
    ["LUMINOSITY",     [1e-15, 1, "EDS", "W/m2", "W"],    lumW(1e-15, edsDL(1)),                             "the same in SI, units given"],
    ["LUMINOSITY",     [1e-12, 1, "EDS", "erg/s/cm2", "Lsun"], lumW(1e-15, edsDL(1)) / 3.828e26,             "erg/s/cm2 in, Lsun out (IAU 2015 B3 nominal L☉)"],
    ["FLUX",           [1e38, 2, "EDS"],                  (1e31 / (4 * Math.PI * (edsDL(2) * mpcM) ** 2)) * 1e3, "F = L/(4π D_L²); erg/s in, erg/s/cm2 out"],
    ["LUMINOSITY_NU",  [1, 1, -1, "EDS"],                 1e-26 * 4 * Math.PI * (edsDL(1) * mpcM) ** 2,      "1 Jy = 1e-26 W/m2/Hz; α = −1: no (1+z) factor"],
    ["LUMINOSITY_NU",  [1, 1, 0.5, "EDS"],                1e-26 * 4 * Math.PI * (edsDL(1) * mpcM) ** 2 * 2 ** -1.5, "(1+z)^−(1+α), Hogg eq. 23 for S_ν ∝ ν^α"],
    ["KCORRECTION",    [1, 0],                            -2.5 * Math.log10(2),                              "K = −2.5(1+α) log10(1+z), Hogg et al. 2002 eq. 13"],
    ["KCORRECTION",    [3, 0.5],                          -3.75 * Math.log10(4),                             "the same, α = 0.5, z = 3"],
    ["MAG_ABS",        [20, 1, "", "EDS"],                20 - modulus(edsDL(1)),                            "M = m − μ, K = 0 by default"],
    ["MAG_APP",        [-20, 1, 0.3, "EDS"],              -20 + modulus(edsDL(1)) + 0.3,                     "m = M + μ + K, K given"],
    ["MAG_AB",         [1, "uJy"],                        -2.5 * Math.log10(1e-6 * 1e-23) - 48.6,            "m_AB = −2.5 log10(f_ν / erg s−1 cm−2 Hz−1) − 48.60, Oke & Gunn 1983"],
    ["FLUX_AB",        [23.9, "uJy"],                     1e6 * 10 ** (-(23.9 + 48.6) / 2.5) * 1e23,         "the inverse of that definition, in µJy"],
    ["MODULUS",        [1, "EDS"],                        modulus(edsDL(1)),                                 "μ = 5 log10(D_L / 10 pc), Hogg eq. 25"],
    ["CMB_TEMP",       [1],                               2.7255 * 2,                                        "Tcmb (1+z), Tcmb = 2.7255 K (Fixsen 2009)"],
    ["OMEGA",          ["matter"],                        0.3111,                                            "Om of P18-BAO, Planck 2018 VI Table 2 (last column)"],
    ["OMEGA",          ["matter", 1, "H0=70; Om=0.3"],    (0.3 * 8) / (0.3 * 8 + 0.7),                       "Ωm(z) = Om(1+z)³/E², flat, no radiation"],
    ["PARAM",          ["age_today", "EDS"],              (2 / 3) * tH,                                      "EdS age (2/3) t_H"],
    ["CONVERT",        [1, "Mpc", "Gly"],                 mpcM / (1e9 * lyM),                                "IAU pc and light year"],
    ["DIST_ANG",       [1.25, "EDS"],                     edsDA(1.25),                                       "EdS D_A at its maximum, Hogg eq. 18"],
    ["DIST_LOS",       [3, "EDS"],                        dH,                                                "EdS D_C(3) = 2 D_H (1 − 1/2) = D_H"],
    ["DIST_TRANS",     [1, "H0=70; Om=0; OL=0"],          (dH * 1 * 1.5) / 2,                                "Milne D_M = D_H z(1 + z/2)/(1+z)"],
    ["DIST_LIGHT",     [1, "H0=70; Om=0; OL=1"],          dH * Math.LN2,                                     "de Sitter: c t_L = D_H ln(1+z)"],
    ["AGE",            [1, "EDS"],                        (2 / 3) * tH * 2 ** -1.5,                          "EdS t(z) = (2/3) t_H (1+z)^−1.5"],
  ])("%s %j", (name, args, expected) => {
    const got = one(name, ...(args as unknown[]));
    expect(typeof got, String(got instanceof CellError ? got.message : got)).toBe("number");
    expectRelative(got as number, expected as number, 1e-10, name); // 1e-10: the engine's documented accuracy
  });

  test("an incompatible unit is #VALUE! naming the argument and both dimensions", () => {
    expectError(one("DIST_LUM", 1, "", "Gyr"), "value", /unit: cannot convert "Mpc" \(a length\) to "Gyr" \(a time\)/);
    expectError(one("SIZE", 1, 1, "", "kpc"), "value", /angle_unit: cannot convert "kpc" \(a length\) to "arcsec" \(an angle\)/);
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
    expectError(one("MODEL", "P18-BAO", "Omm", 0.3), "value", /unknown key "Omm": did you mean Om\? \(the keys are H0, Om/);
    expectError(one("MODEL", "P18-BAO", "H0", 70, "H0", 71), "value", /H0 is given twice/);
    expectError(one("MODEL", "P18-BAO", "H0", 70, null, 0.3), "value", /value2 is given but key2 is blank/);
  });

  test("PRESETS lists every preset with its source; DESCRIBE and VERSION state the assumptions", () => {
    const table = run("PRESETS");
    expect(table.slice(1).map((r) => r[0])).toEqual(presets.map((p) => p.name));
    expect(String(table[1][1])).toBe("H0 67.36, Ωm 0.3153 (incl. one 0.06 eV ν), flat — Planck 2018 VI, A&A 641, A6, Table 2, CMB+lensing"); // P18-CMB, the default, first
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
