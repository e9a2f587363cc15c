/** Values published in papers and standards, and rules of thumb of the trade. */
import { describe, expect, test } from "vitest";
import { abZeroPointJy, solarLuminosityW } from "../core/units/constants.js";
import { Cosmology } from "../core/distances/Cosmology.js";
import { findPreset, presets } from "../core/model/presets.js";
import { abFluxDensityJy, abMagnitude, bolometricAbsoluteMagnitude, fluxWm2 } from "../core/observables/photometry.js";
import { expectRelative } from "./helpers.js";
import { sheetCalls } from "./sheetCalls.js";
import { modelNameProblem } from "../functions/workbookModels.js";

describe("Planck 2018 (A&A 641, A6, Table 2)", () => {
  // Posterior means, so compared at 2e-4 (ages) and 1e-3 (z_eq) relative.
  test.each([
    // preset           age [Gyr]  z_eq   source
    ["P18-BAO",      13.787,    3387,  "Planck 2018 VI Table 2, TT,TE,EE+lowE+lensing+BAO"],
    ["P18-CMB",   13.797,    3402,  "Planck 2018 VI Table 2, TT,TE,EE+lowE+lensing"],
  ])("%s: age today %d Gyr, z_eq %d", (name, age, zeq) => {
    const m = Cosmology.fromSpec(name);
    expectRelative(m.ageTodayGyr, age, 2e-4, "age");
    expectRelative(m.equalityRedshift, zeq, 1e-3, "z_eq");
  });
});

describe("IAU 2015 B2/B3 and the AB system", () => {
  test("the nominal Sun (3.828e26 W) has M_bol = 4.74 (IAU 2015 Resolution B2)", () => {
    expect(Math.abs(bolometricAbsoluteMagnitude(solarLuminosityW) - 4.74)).toBeLessThan(5e-5);
  });
  test("AB magnitude 0 is 3630.78 Jy (Oke & Gunn 1983, m_AB = −2.5 log f_ν − 48.60)", () => {
    expectRelative(abZeroPointJy, 3630.78, 2e-6, "zero point");
    expect(Math.abs(abMagnitude(3630.780547701003))).toBeLessThan(1e-12);
    // 1 µJy is m_AB = 23.90 (−2.5 log10(1e-29) − 48.60; common practice)
    expect(Math.abs(abMagnitude(1e-6) - 23.9)).toBeLessThan(1e-12);
  });
  test("AB magnitude and flux density are inverse", () => {
    for (const m of [-5, 0, 12.3, 31]) expectRelative(abMagnitude(abFluxDensityJy(m)), m, 1e-14, `m=${m}`);
  });
});

describe("rules of thumb (common practice, no source)", () => {
  test("the universe is about 14 Gyr old in every CMB preset", () => {
    for (const name of ["P18-BAO", "P18-CMB", "P15-EXT", "W9-ALL", "W7-BAO"]) {
      const age = Cosmology.fromSpec(name).ageTodayGyr;
      expect(age, name).toBeGreaterThan(13.4);
      expect(age, name).toBeLessThan(14.2);
    }
  });
  test("bolometric flux falls by (1+z)² beyond the inverse square of D_M (energy and arrival rate each ÷ (1+z))", () => {
    const m = Cosmology.fromSpec("P18-BAO");
    const mpc = 3.0856775814913673e22; // m per Mpc (IAU 2015 B2 derived; cross-check of constants)
    for (const z of [0.1, 1, 5]) {
      const dm = m.transverseComovingDistanceMpc(z) * mpc;
      const l = 1e38;
      expectRelative(fluxWm2(m, l, z), l / (4 * Math.PI * dm * dm) / (1 + z) ** 2, 1e-14, `z=${z}`);
    }
  });
});

describe("DESI DR2 presets (DESI Collaboration 2025, arXiv:2503.14738)", () => {
  test.each([
    // preset        | H0    | Om     | w0      | wa     — the values the issue supplied, from memory and unverified (the paper's table could not be read)
    ["DESI2-CMB",     68.17,  0.3027,  -1,       0],
    ["DESI2-CMB-PP",  67.51,  0.3114,  -0.838,   -0.62],
    ["DESI2-CMB-U3",  65.91,  0.3275,  -0.667,   -1.09],
    ["DR2-CMB-DY5",   66.74,  0.3191,  -0.752,   -0.86],
  ])("%s: H0 %d, Om %d, w0 %d, wa %d, flat, and its description says the values are not yet checked", (name, H0, Om, w0, wa) => {
    const m = Cosmology.fromSpec(name);
    expect([m.H0, m.Om, m.parameters.w0, m.parameters.wa, m.Ok]).toEqual([H0, Om, w0, wa, 0]);
    // Ob assumed from Ωb h² = 0.02242 (Planck 2018 VI Table 2), with the preset's own h
    expect(m.Ob * m.h ** 2).toBeCloseTo(0.02242, 12);
    const description = findPreset(name)!.description;
    expect(description).toContain("arXiv:2503.14738");
    expect(description).toContain("not yet checked against the paper's table");
  });

  test.each([
    // name saved by 0.1 / 0.2 | read as      (the rename of 0.3.0, CHANGELOG)
    ["DR2-CMB",                  "DESI2-CMB"],
    ["DR2-CMB-PP",               "DESI2-CMB-PP"],
    ["dr2-cmb-u3",               "DESI2-CMB-U3"],
    ["DR2-CMB-DY5; H0=70",       "DESI2-CMB-DY5; H0=70"],
  ])("a workbook's old name %s still reads, as the same parameters, and is written %s", (old, spec) => {
    const m = Cosmology.fromSpec(old);
    expect(m.spec).toBe(spec);
    expect(m.parameters).toEqual(Cosmology.fromSpec(spec).parameters);
    expect(findPreset(old.split(";")[0])!.description).toContain(`called ${old.split(";")[0].toUpperCase()} in zcell 0.2`);
  });

  test("a workbook saved with an old name: its formulas, its stored model and DESCRIBE give the new name", () => {
    const sheet = sheetCalls("DR2-CMB-PP"); // the workbook's stored model, as 0.2 wrote it
    expect(sheet.one("DESCRIBE")).toMatch(/^DESI2-CMB-PP: flat: matter \+ w0–wa dark energy \+ radiation; H0 = 67\.51 km\/s\/Mpc/);
    expect(sheet.one("DESCRIBE", "DR2-CMB")).toMatch(/^DESI2-CMB: /);
    expect(sheet.num("DIST_LUM", 1, "DR2-CMB")).toBe(sheet.num("DIST_LUM", 1, "DESI2-CMB"));
    expect(modelNameProblem("dr2-cmb")).toBe('"DR2-CMB" is a built-in preset: choose another name'); // an old name is still taken
  });

  test("the list of presets and its message name only the new names", () => {
    expect(presets.map((p) => p.name).filter((n) => n.includes("DESI2"))).toEqual(["DESI2-CMB", "DESI2-CMB-PP", "DESI2-CMB-U3", "DESI2-CMB-DY5"]);
    expect(presets.some((p) => p.name.startsWith("DR2"))).toBe(false);
  });
});
