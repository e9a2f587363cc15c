/**
 * The production bundle in a simulated host: dist/functions.js loaded in a bare JS context with only
 * stub `CustomFunctions` and `Office` globals (no DOM), as Excel's custom-functions runtime would.
 */
import { readFileSync } from "node:fs";
import { beforeAll, describe, expect, test } from "vitest";
import { publishedModels } from "./fixtures.js";
import { expectRelative } from "./helpers.js";
import { SlowCosmology } from "./reference/slowCosmology.js";
import { testBuildDir } from "./testBuild.js";
import { HostError, loadBundle, type Registered } from "./reference/hostBundle.js";

const dist = testBuildDir;
// expected values from the independent slow path (test/reference/slowCosmology.ts), not from core/
const wmap9 = new SlowCosmology(publishedModels["W9-ALL"]);
const p18 = new SlowCosmology(publishedModels["P18-BAO"]);
const p18cmb = new SlowCosmology(publishedModels["P18-CMB"]);

const metadata = JSON.parse(readFileSync(`${dist}functions.json`, "utf8")) as {
  functions: { id: string; name: string; parameters: { name: string; optional?: boolean }[] }[];
};

describe("the built functions.js in a bare host", () => {
  let fns: Map<string, Registered>;
  beforeAll(() => {
    fns = loadBundle({ "zcell.activeModel": "W9-ALL" }, 20); // Office reads the settings a little later
  });

  test("registers every function in functions.json, with the metadata's arity", () => {
    // 47 in 0.1.x; 0.2.0 adds REDSHIFT_LIMIT_NU, LUMINOSITY_REST_ERR, SPECTRAL_INDEX, RESCALE, SURFACE_LUM, SURFACE_MAG,
    // DIST_HUBBLE, DIST_VOLUME, SIGMA_CRIT, OVERDENSITY, HALO_RADIUS, HALO_MASS, GROWTH, GROWTH_RATE, SOUND_HORIZON,
    // LUMINOSITY_FUNCTION and CHI2_MODULUS (CHANGELOG.md); 0.3.0 adds COORD_DEG, COORD_TEXT, SEPARATION, COORD_CONVERT,
    // VELOCITY, Z_FROM_VELOCITY, Z_COMBINE, VELOCITY_PECULIAR, REST_FRAME, OBSERVED_FRAME, EXTINCTION, INDEX_BETWEEN,
    // INDEX_BETWEEN_ERR and BRIGHTNESS_TEMP
    expect(metadata.functions.length).toBe(78);
    for (const f of metadata.functions) {
      const fn = fns.get(f.id);
      expect(fn, f.id).toBeTypeOf("function");
      expect(fn!.length, f.id).toBe(f.parameters.length);
      expect(f.name).toBe(f.id);
    }
    expect(fns.size).toBe(metadata.functions.length);
  });

  test("waits for the workbook's settings before computing with its model", async () => {
    const started = Date.now();
    const [[age]] = await fns.get("AGE")!();
    expect(Date.now() - started).toBeGreaterThanOrEqual(10);
    expectRelative(age as number, wmap9.ageGyr(0), 1e-9, "W9-ALL age");
  });

  test.each([
    // function       args                              expected                                  tol     source
    ["DIST_LUM",      [[[1]]],                          wmap9.luminosityDistanceMpc(1),           1e-9,   "slow path (tanh-sinh), W9-ALL of Hinshaw et al. 2013 Table 4: the workbook model"],
    ["DIST_LUM",      [[[1]], [["P18-BAO"]], "Gpc"], p18.luminosityDistanceMpc(1) / 1000,      1e-9,   "slow path, P18-BAO of Planck 2018 VI Table 2, explicit model"],
    ["AGE",           [[[0]], [["P18-BAO"]]],        13.787,                                   2e-4,   "Planck 2018 VI Table 2"],
    ["HUBBLE",        [undefined, [["P18-BAO"]]],    67.66,                                    1e-15,  "Planck 2018 VI Table 2"],
    ["CONVERT",       [[[1]], "pc", "lyr"],             3.2615637771674337,                       1e-15,  "IAU 2015 B2 pc, Julian year"],
    ["MAG_AB",        [[[3630.780547701003]]],          0,                                        1e-12,  "Oke & Gunn 1983 zero point (absolute check)"],
    ["REDSHIFT",      [[[wmap9.comovingDistanceMpc(3)]], "DIST_LOS"], 3,                          1e-9,   "the redshift whose slow-path D_C is given"],
    ["PROPER_SCALE",  [[[1]], [["P18-BAO"]]],        (p18.angularDiameterDistanceMpc(1) * 1000 * Math.PI) / 648000, 1e-9, "slow-path D_A per arcsec in kpc"],
  ])("%s %j", async (name, args, expected, tol, _source) => {
    const [[got]] = await fns.get(name)!(...(args as unknown[]));
    if (expected === 0) expect(Math.abs(got as number)).toBeLessThan(tol);
    else expectRelative(got as number, expected, tol, name);
  });

  test("errors reach the host as its own error values with messages", async () => {
    const [[neg]] = await fns.get("DIST_LUM")!([[-1]]);
    expect(neg).toBeInstanceOf(HostError);
    expect((neg as HostError).code).toBe("#NUM!");
    expect((neg as HostError).message).toMatch(/blueshifted/);
    const [[na]] = await fns.get("REDSHIFT")!([[1e3]], "AGE");
    expect((na as HostError).code).toBe("#N/A");
    const [[bad]] = await fns.get("DIST_LUM")!([["x"]]);
    expect((bad as HostError).code).toBe("#VALUE!");
  });

  test("a 100k-row column of ZC.DIST_LUM computes through the registered function", async () => {
    const n = 100_000;
    const column = Array.from({ length: n }, (_, i) => [(10 * i) / n]);
    let started = performance.now();
    const result = await fns.get("DIST_LUM")!(column, [["P18-BAO"]]);
    const first = performance.now() - started;
    started = performance.now();
    await fns.get("DIST_LUM")!(column, [["P18-BAO"]]);
    const again = performance.now() - started;
    console.log(
      `host simulation: 100k-row ZC.DIST_LUM ${first.toFixed(0)} ms on first use (shared tables and model built), ` +
        `${again.toFixed(0)} ms recalculated (${((again * 1e6) / n).toFixed(0)} ns/row)`,
    );
    expect(result.length).toBe(n);
    for (const i of [0, 1, 777, 50_000, n - 1]) expectRelative(result[i][0] as number, p18.luminosityDistanceMpc(column[i][0]), 1e-9, `row ${i}`);
  });

  test("a 100k-row column of texts where numbers belong: every cell reads its error, one host error value for each distinct message", async () => {
    const n = 100_000;
    const result = await fns.get("DIST_LUM")!(Array.from({ length: n }, (_, i) => [i % 2 ? "abc" : "def"]));
    expect(result.length).toBe(n);
    for (const i of [0, 1, 777, 50_000, n - 1]) {
      const cell = result[i][0] as HostError;
      expect(cell, `row ${i}`).toBeInstanceOf(HostError);
      expect(cell.code).toBe("#VALUE!");
      const message = String(cell.message);
      expect(message.startsWith("ZC.DIST_LUM: z: ") && message.includes(`"${i % 2 ? "abc" : "def"}"`), message).toBe(true);
    }
    expect(new Set(result.map(([cell]) => cell)).size).toBe(2); // was one a cell: 100,000
  });
});

describe("workbook settings that cannot be used", () => {
  test("corrupt settings fall back to the default model, P18-CMB", async () => {
    const fns = loadBundle({ "zcell.activeModel": "H0=; nonsense" });
    const [[age]] = await fns.get("AGE")!();
    expectRelative(age as number, p18cmb.ageGyr(0), 1e-9, "P18-CMB age (slow path)");
  });
});

describe("functions.json", () => {
  test("is the metadata recorded before the declarations were split by family, apart from order", () => {
    // test/fixtures/functions.metadata.json: the build's functions.json sorted by id, recorded when
    // functions.ts was one file; update it (sorted) only when a function is added or changed on purpose
    const sorted = { ...metadata, functions: [...metadata.functions].sort((a, b) => a.id.localeCompare(b.id)) };
    expect(sorted).toEqual(JSON.parse(readFileSync(new URL("./fixtures/functions.metadata.json", import.meta.url), "utf8")));
  });
});
