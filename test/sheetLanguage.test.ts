/**
 * The interface speaks the sheet's language: messages name the ZC function and quote values in the
 * unit the user gave (at most 6 significant digits); catalogue input (text numbers, key/value blocks
 * with a header, commas, magnitude flags, h for H0) is handled as a catalogue user expects; fixes
 * found in review (closed-model MODULUS, DESCRIBE wording, one default unit for volumes); models
 * defined in a workbook work by name in any model argument.
 */
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { describe, expect, test } from "vitest";
import { Cosmology, parseUnit } from "../core/index.js";
import type { ActiveModelSetting } from "../functions/activeModel.js";
import { CellError } from "../functions/cellError.js";
import { definitions } from "../functions/definitions.js";
import { evaluate, type Cell } from "../functions/evaluate.js";
import { modelNameProblem, readWorkbookModels } from "../functions/workbookModels.js";
import { expectRelative } from "./helpers.js";
import { SlowCosmology } from "./reference/slowCosmology.js";
import { sheetCalls } from "./sheetCalls.js";
import { testBuildDir } from "./testBuild.js";

const active: ActiveModelSetting = { spec: "P18-BAO", stored: false };
const run = (name: string, ...args: unknown[]): Cell[][] => evaluate(definitions[name], args, active);
const one = (name: string, ...args: unknown[]): Cell => run(name, ...args)[0][0];
const p18 = Cosmology.fromSpec("P18-BAO");

function errorOf(cell: Cell): { kind: string; message: string } {
  expect(cell, String(cell)).toBeInstanceOf(CellError);
  return { kind: (cell as CellError).kind, message: (cell as CellError).message };
}

describe("messages name the function and speak in the user's units", () => {
  // the age today under P18-BAO is 13.7866 Gyr (Planck 2018 VI Table 2 gives 13.787)
  test.each([
    // call                                                     kind    message
    [["REDSHIFT", 20, "LOOKBACK"],                              "na",   "ZC.REDSHIFT: LOOKBACK = 20 Gyr is not below the age of the universe in this model (13.7866 Gyr)"],
    [["REDSHIFT", 2e7, "LOOKBACK", null, "Myr"],                "na",   "ZC.REDSHIFT: LOOKBACK = 20000000 Myr is not below the age of the universe in this model (13786.6 Myr)"],
    [["REDSHIFT", -5, "DIST_LUM", null, "Gpc"],                 "na",   "ZC.REDSHIFT: DIST_LUM = -5 Gpc is negative: no redshift z ≥ 0 has it"],
    [["LUMINOSITY", -99, 1, null, "erg/s/cm2"],                 "num",  "ZC.LUMINOSITY: flux = -99 erg/s/cm2 must be ≥ 0 erg/s/cm2"],
    [["VOLUME_SHELL", 0, 1, 50000, null, null, "deg2"],         "num",  "ZC.VOLUME_SHELL: area = 50000 deg2 is above 41253 deg2 (the whole sky)"],
    [["SIZE", 1e6, 1],                                          "num",  "ZC.SIZE: angle = 1000000 arcsec is above 648000 arcsec (180°)"],
    [["DIST_LUM", -1],                                          "num",  "ZC.DIST_LUM: z = -1 is negative: a blueshifted source needs a redshift-independent distance"],
    [["OMEGA", "m"],                                            "value", 'ZC.OMEGA: component: "m" is not one of matter, cold, darkenergy, curvature, radiation, photons, neutrinos'],
  ])("%j gives #%s with the message %j", (call, kind, message) => {
    const [name, ...args] = call as [string, ...unknown[]];
    expect(errorOf(one(name, ...args))).toEqual({ kind, message });
  });
});

describe("input a catalogue user pastes", () => {
  test("numbers stored as text are read as numbers; other text stays #VALUE!", () => {
    expect(one("DIST_LUM", "0.5")).toBe(one("DIST_LUM", 0.5));
    expect(one("DIST_LUM", " 1.2e-3 ")).toBe(one("DIST_LUM", 1.2e-3));
    expect(run("DIST_LUM", [["0.5"], [" 2 "]])).toEqual(run("DIST_LUM", [[0.5], [2]]));
    expect(errorOf(one("DIST_LUM", "0,5")).message).toBe('ZC.DIST_LUM: z: text "0,5" is not a number: use a point for decimals, 0.5');
  });

  test("a key/value block with a header row is one model; a misspelt key is one error naming it", () => {
    const withHeader = [["param", "value"], ["H0", 70], ["Om", 0.3], ["OL", 0.7]];
    expect(run("DIST_LUM", 1, withHeader)).toEqual(run("DIST_LUM", 1, "H0=70; Om=0.3; OL=0.7"));
    const misspelt = [["H0", 70], ["Omm", 0.3], ["OL", 0.7]];
    const out = run("DIST_LUM", 1, misspelt);
    expect(out).toHaveLength(1);
    expect(errorOf(out[0][0])).toEqual({
      kind: "value",
      message: 'ZC.DIST_LUM: model: unknown key "Omm" in the key/value block: did you mean Om? (the keys are H0, Om, OL, Ok, Ob, w0, wa, Tcmb, Neff, mnu, preset)',
    });
    // two model names side by side are two models, not a block
    expect(run("DIST_LUM", 1, [["P18-BAO", "W9-ALL"]])[0]).toHaveLength(2);
  });

  test("parts separated by commas are told to use ';', with the spec rewritten", () => {
    expect(errorOf(one("DIST_LUM", 1, "H0=70, Om=0.3, OL=0.7")).message).toBe(
      `ZC.DIST_LUM: model: "H0=70, Om=0.3, OL=0.7": separate the parts with ';', e.g. "H0=70; Om=0.3; OL=0.7"`,
    );
  });

  test.each([
    // call                          the flag
    [["MAG_ABS", 99, 1],             99],
    [["MAG_ABS", -99, 1],            -99],
    [["MAG_APP", 99.9, 1],           99.9],
    [["FLUX_AB", 99],                99],
  ])("%j: a magnitude of %d is a missing-value flag (#N/A), not a number", (call, flag) => {
    const [name, ...args] = call as [string, ...unknown[]];
    expect(errorOf(one(name, ...args))).toEqual({ kind: "na", message: `ZC.${name}: ${name === "FLUX_AB" ? "m_ab" : name === "MAG_APP" ? "M" : "m"} = ${flag} is a catalogue's missing-value flag (|magnitude| ≥ 50), not a magnitude` });
  });

  test("H0 typed as h (0.7) is #NUM! with a hint; so is an H0 above 1000", () => {
    expect(errorOf(one("DIST_LUM", 1, "H0=0.7; Om=0.3"))).toEqual({
      kind: "num",
      message: "ZC.DIST_LUM: model: H0 = 0.7 km/s/Mpc is outside 10 … 1000 km/s/Mpc (H0 is in km/s/Mpc: h = 0.7 is H0=70)",
    });
    expect(errorOf(one("DIST_LUM", 1, "H0=7000; Om=0.3")).message).toMatch(/H0 = 7000 km\/s\/Mpc is outside 10 … 1000 km\/s\/Mpc$/);
  });
});

describe("inputs that gave a quiet wrong number or a wrong hint: the whole message each gives now", () => {
  test.each([
    // call                                                         kind     whole message (our own)
    [["DIST_LUM", 1, "P18-CMB, H0=73"],                              "value", `ZC.DIST_LUM: model: "P18-CMB, H0=73": separate the parts with ';', e.g. "P18-CMB; H0=73"`],
    [["DIST_LUM", 1, "H0=70, mnu=0.06,0.01; Om=0.3"],                "value", `ZC.DIST_LUM: model: "H0=70, mnu=0.06,0.01": separate the parts with ';', e.g. "H0=70; mnu=0.06,0.01"`],
    [["DIST_LUM", 1, "H0=73"],                                       "value", `ZC.DIST_LUM: model: Om is required (or start from a preset, e.g. "P18-CMB; H0=73"); to change the workbook's model instead, use ZC.MODEL(, "H0", 73)`],
    [["DIST_LUM", 1, [["H0", 73], ["w0", -0.9]]],                    "value", `ZC.DIST_LUM: model: Om is required (or start from a preset, e.g. "P18-CMB; H0=73; w0=-0.9"); to change the workbook's model instead, use ZC.MODEL(, "H0", 73, "w0", -0.9)`],
    [["DIST_LUM", 1, "Om=0.3; mnu=0.06,0.01"],                       "value", `ZC.DIST_LUM: model: H0 is required (or start from a preset, e.g. "P18-CMB; Om=0.3; mnu=0.06,0.01"); to change the workbook's model instead, use ZC.MODEL(, "Om", 0.3, "mnu", "0.06,0.01")`],
    [["DIST_LUM", 1, "Om=31.5%"],                                    "value", `ZC.DIST_LUM: model: Om: "31.5%" is a percentage: write the fraction, Om=0.315`],
    [["DIST_LUM", 1, "P18-CMB; H0=73%"],                             "value", `ZC.DIST_LUM: model: H0: "73%" is a percentage: write H0 as a plain number`],
    [["MODEL", "P18-CMB", "Ob", "4.9%"],                             "value", `ZC.MODEL: Ob: "4.9%" is a percentage: write the fraction, Ob=0.049`],
    [["DIST_LUM", 1, "P18-CMB; Om=31.5"],                            "num",   "ZC.DIST_LUM: model: Om = 31.5: a density parameter is a fraction (31.5 → 0.315), |Om| ≤ 5"],
    [["DIST_LUM", 1, "H0=70; Om=3"],                                 "num",   "ZC.DIST_LUM: model: Om = 3 makes OL = -2 to stay flat: give OL explicitly if you mean it; 0.3?"],
    [["MODEL", "P18-CMB", "Om", 3],                                  "num",   "ZC.MODEL: Om = 3 makes OL = -2 to stay flat: give OL explicitly if you mean it; 0.3?"],
    [["DIST_LUM", 1, "H0=70; Om=0.3; Ok=0.8"],                       "num",   "ZC.DIST_LUM: model: Om = 0.3 and Ok = 0.8 make OL = -0.1 (1 − Om − Ok − Or): give OL explicitly if you mean it"],
    [["LUMINOSITY", 1e-16, 1, null, "mJy"],                          "value", 'ZC.LUMINOSITY: flux_unit: cannot convert "mJy" (a flux density) to "erg/s/cm2" (a flux): for a flux density use ZC.LUMINOSITY_NU or ZC.LUMINOSITY_REST'],
    [["LUMINOSITY_ERR", 1, 0.1, 1, 0.01, null, "uJy"],               "value", 'ZC.LUMINOSITY_ERR: flux_unit: cannot convert "uJy" (a flux density) to "erg/s/cm2" (a flux): for a flux density use ZC.LUMINOSITY_NU_ERR or ZC.LUMINOSITY_REST_ERR'],
    [["REDSHIFT_LIMIT", 1e24, 1e-16, null, "W/Hz"],                  "value", 'ZC.REDSHIFT_LIMIT: lum_unit: cannot convert "W/Hz" (a spectral luminosity) to "erg/s" (a luminosity or power): for a spectral luminosity use ZC.REDSHIFT_LIMIT_NU'],
    [["LUMINOSITY_NU", 1e-16, 1, -0.7, null, "erg/s/cm2"],           "value", 'ZC.LUMINOSITY_NU: in_unit: cannot convert "erg/s/cm2" (a flux) to "Jy" (a flux density): for a flux use ZC.LUMINOSITY'],
    [["LUMINOSITY", 1e-16, 1, null, null, "W/Hz"],                   "value", 'ZC.LUMINOSITY: lum_unit: cannot convert "erg/s" (a luminosity or power) to "W/Hz" (a spectral luminosity)'],
    [["FLUX", 1e40, 1, null, "W/Hz"],                                "value", 'ZC.FLUX: lum_unit: cannot convert "W/Hz" (a spectral luminosity) to "erg/s" (a luminosity or power)'],
    [["CONVERT", 1, "W/Hz/sr", "W"],                                 "value", 'ZC.CONVERT: cannot convert "W/Hz/sr" (a spectral luminosity per solid angle) to "W" (a luminosity or power)'],
    [["PROPER_SCALE", 1, null, "kpc per arcsec"],                    "value", 'ZC.PROPER_SCALE: unit: unknown unit "per" in "kpc per arcsec": did you mean kpc/arcsec?'],
  ])("%j gives #%s with the message %j", (call, kind, message) => {
    const [name, ...args] = call as [string, ...unknown[]];
    expect(errorOf(sheetCalls("P18-CMB").one(name, ...args))).toEqual({ kind, message });
  });

  test("the ZC.MODEL call the message points to is the workbook's model with those changes", () => {
    expect(sheetCalls("P18-CMB").one("MODEL", null, "H0", 73)).toBe("P18-CMB; H0=73");
    expect(sheetCalls("W9-ALL").one("MODEL", null, "H0", 73, "w0", -0.9)).toBe("W9-ALL; H0=73; w0=-0.9");
  });

  test("a negative OL given explicitly is the model it states (independent slow path)", () => {
    // E(z) = √(3(1+z)³ − 2): Om = 3, OL = −2, flat, no radiation; D_L from the tanh-sinh quadrature of the slow path
    const slow = new SlowCosmology({ H0: 70, Om: 3, OL: -2, w0: -1, wa: 0, Tcmb: 0, Neff: 3.046, mnu: [] });
    expectRelative(one("DIST_LUM", 1, "H0=70; Om=3; OL=-2") as number, slow.luminosityDistanceMpc(1), 1e-10, "D_L(1)");
    // what "H0=70; Om=3" gave before it was refused: the same model, OL = −2 inferred
    expectRelative(slow.luminosityDistanceMpc(1), 3543.2058748719382, 1e-9, "D_L(1) of Om = 3, OL = −2 (zcell 0.2.0, CHANGELOG)");
  });

  test("OL = −Or from radiation alone (Om = 1, flat) is kept: EDS with a CMB is a model", () => {
    const d = one("DIST_LUM", 1, "EDS; Tcmb=2.7255") as number;
    const slow = new SlowCosmology({ H0: 70, Om: 1, w0: -1, wa: 0, Tcmb: 2.7255, Neff: 3.046, mnu: [] });
    expectRelative(d, slow.luminosityDistanceMpc(1), 1e-10, "D_L(1), OL = −Or");
  });
});

describe("fixes found in review", () => {
  const closed = "H0=70; Om=0.2; OL=1.3";
  test("past the antipode of a closed model D_L < 0, and MODULUS, MAG_ABS and MAG_APP use |D_L|", () => {
    // reference: the independent slow path (tanh-sinh quadrature of the same Friedmann equation)
    const slow = new SlowCosmology({ H0: 70, Om: 0.2, OL: 1.3, w0: -1, wa: 0, Tcmb: 0, Neff: 3.046, mnu: [] });
    const dl = slow.luminosityDistanceMpc(100);
    expect(dl).toBeLessThan(0);
    expectRelative(one("DIST_LUM", 100, closed) as number, dl, 1e-10, "D_L");
    const mu = 5 * Math.log10(Math.abs(dl)) + 25; // Hogg 1999 eq. 25 with |D_L|
    expectRelative(one("MODULUS", 100, closed) as number, mu, 1e-12, "μ");
    expectRelative(one("MAG_ABS", 20, 100, 0, closed) as number, 20 - mu, 1e-12, "M");
    expectRelative(one("MAG_APP", -20, 100, 0, closed) as number, -20 + mu, 1e-12, "m");
  });

  test("DESCRIBE says what the model holds", () => {
    expect(one("DESCRIBE", "EDS")).toMatch(/^EDS: flat: matter only; H0 = 70 km\/s\/Mpc; Om = 1 .*; OL = 0; Ok = 0; Or = 0 \(no radiation\);/);
    expect(one("DESCRIBE", "CONCORDANCE")).toMatch(/^CONCORDANCE: flat: matter \+ Λ;/);
    expect(one("DESCRIBE", "H0=70; Om=0.3; OL=0.8; w0=-0.9")).toMatch(/^H0=70; Om=0.3; OL=0.8; w0=-0.9: closed: matter \+ w0–wa dark energy;/);
  });

  test("REDSHIFT of VOLUME reads Mpc3 by default, the unit ZC.VOLUME returns", () => {
    expectRelative(one("REDSHIFT", one("VOLUME", 2), "VOLUME") as number, 2, 1e-12, "round trip");
    expectRelative(one("VOLUME", 2) as number, p18.comovingVolumeMpc3(2), 1e-15, "Mpc3");
  });

  test("OMEGA takes words, in any case", () => {
    expect(one("OMEGA", "Matter")).toBe(one("OMEGA", "matter"));
    expectRelative(one("OMEGA", "MATTER") as number, 0.3111, 1e-15, "Om today (Planck 2018 VI Table 2)");
  });
});

describe("models defined in the workbook", () => {
  const models = readWorkbookModels({ "TEAM-FIDUCIAL": "P18-BAO; H0=70", "Survey_2": "H0=72; Om=0.28; Tcmb=2.7255" });
  const withModels: ActiveModelSetting = { spec: "TEAM-FIDUCIAL", stored: true, models };
  const runIn = (name: string, ...args: unknown[]) => evaluate(definitions[name], args, withModels);

  test("work by name (any case, also as a base with changes) in any model argument, and as the active model", () => {
    expect(models.problems).toEqual([]);
    expect(runIn("DIST_LUM", 1, "TEAM-FIDUCIAL")).toEqual(run("DIST_LUM", 1, "P18-BAO; H0=70"));
    expect(runIn("DIST_LUM", 1, "team-fiducial; Om=0.3")).toEqual(run("DIST_LUM", 1, "P18-BAO; H0=70; Om=0.3"));
    expect(runIn("DIST_LUM", 1)).toEqual(run("DIST_LUM", 1, "P18-BAO; H0=70"));
    expect(runIn("MODEL", "SURVEY_2", "H0", 73)).toEqual([["H0=73; Om=0.28; Tcmb=2.7255"]]);
    expect(errorOf(run("DIST_LUM", 1, "TEAM-FIDUCIAL")[0][0]).message).toMatch(/unknown preset "TEAM-FIDUCIAL"/);
  });

  test("PRESETS lists them after the built-in presets, marked as defined in this workbook", () => {
    const table = runIn("PRESETS");
    expect(table.slice(-2)).toEqual([
      ["TEAM-FIDUCIAL", "defined in this workbook: P18-BAO; H0=70"],
      ["SURVEY_2", "defined in this workbook: H0=72; Om=0.28; Tcmb=2.7255"],
    ]);
  });

  test("a name may not shadow a built-in preset, and a bad stored entry is reported, not used", () => {
    expect(modelNameProblem("p18-bao")).toBe('"P18-BAO" is a built-in preset: choose another name');
    expect(modelNameProblem("my model")).toMatch(/is not a model name/);
    expect(modelNameProblem("TEAM-FIDUCIAL")).toBeUndefined();
    const bad = readWorkbookModels({ "P18-BAO": "H0=70; Om=0.3", GOOD: "W9-ALL", BROKEN: "H0=abc; Om=0.3" });
    expect([...bad.specs.keys()]).toEqual(["GOOD"]);
    expect(bad.problems).toEqual([
      'workbook model "P18-BAO" is a built-in preset: choose another name',
      'workbook model BROKEN: H0: "abc" is not a number',
    ]);
  });
});

describe("no name of another tool's interface reaches a reader", () => {
  const root = fileURLToPath(new URL("..", import.meta.url));
  const oldNames = /PLANCK20\d\d|WMAP[79]|ANG_SCALE|RHO_CRIT|efunc/;

  test.each([
    ["README.md", `${root}README.md`],
    ["functions.js", `${testBuildDir}functions.js`],
    ["taskpane.js", `${testBuildDir}taskpane.js`],
    ["functions.json", `${testBuildDir}functions.json`],
    ["manifest.xml", `${testBuildDir}manifest.xml`],
  ])("%s holds none of the old preset or function names", (_label, file) => {
    expect(readFileSync(file, "utf8")).not.toMatch(oldNames);
  });

  test("functions.json names the new functions and the OMEGA components in words", () => {
    const metadata = JSON.parse(readFileSync(`${testBuildDir}functions.json`, "utf8")) as { functions: { id: string; description: string }[] };
    const ids = metadata.functions.map((f) => f.id);
    expect(ids).toEqual(expect.arrayContaining(["PROPER_SCALE", "CRIT_DENSITY", "MODEL"]));
    const omega = metadata.functions.find((f) => f.id === "OMEGA")!.description;
    expect(omega).toMatch(/"matter".*"darkenergy".*"curvature".*"radiation".*"photons".*"neutrinos"/);
    expect(omega).not.toMatch(/"(m|de|k|r|g|nu)"/);
  });

  test("error messages from hostile input hold no camelCase identifier (unit strings aside)", () => {
    const inputs: unknown[] = [-1, 0, 1e9, "abc", "", true, "H0=70, Om=0.3", "P18-BAO", "H0=0.7; Om=0.3", "H0=70; Om=30", "mpc3", "MJy", "L_sun", 99, [[1, 2]], [[1], [2], [3]]];
    const camel = /\b[a-z]+[A-Z][A-Za-z0-9]*\b/g;
    const seen = new Set<string>();
    for (const def of Object.values(definitions)) {
      for (const a of inputs) for (const b of inputs) {
        const cells = evaluate(def, [a, b, a, b], active).flat();
        for (const cell of cells) if (cell instanceof CellError) seen.add(cell.message);
      }
    }
    expect(seen.size).toBeGreaterThan(50);
    for (const message of seen) {
      expect(message, message).toMatch(/^ZC\.[A-Z0-9_]+: /);
      const identifiers = (message.match(camel) ?? []).filter((token) => {
        try {
          parseUnit(token); // a FITS unit string such as mJy or solMass is the trade's own spelling
          return false;
        } catch {
          return true;
        }
      });
      expect(identifiers, message).toEqual([]);
    }
  });
});
