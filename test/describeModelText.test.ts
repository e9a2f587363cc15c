/**
 * What ZC.DESCRIBE (and the pane, which shows the same line) says about a model: its geometry and
 * contents in words, every parameter, the radiation and neutrinos, and its age today — and what
 * ZC.VERSION says about the engine's conventions. The texts are zcell's interface (documented in
 * functions/describeModel.ts and the README's ZC.DESCRIBE entry) and are written out here in full;
 * the numbers in them come from closed forms evaluated in this file, never through the core.
 */
import { describe, expect, test } from "vitest";
import { Cosmology, parseModelSpec } from "../core/index.js";
import { describeModel, versionText } from "../functions/describeModel.js";
import packageJson from "../package.json";
import { sheetCalls } from "./sheetCalls.js";

const describeSpec = (spec: string) => describeModel(Cosmology.fromSpec(spec));

// Constants for the closed forms below (written out, not imported from the core)
const mpcM = (648000 / Math.PI) * 149597870700 * 1e6; // pc = 648000/π au (IAU 2015 B2), au exact (IAU 2012 B2)
const gyrS = 365.25 * 86400 * 1e9; // Julian year (IAU)
const hubbleTimeGyr = (H0: number) => mpcM / (H0 * 1e3) / gyrS; // 1/H0
const G = 6.6743e-11; // CODATA 2018
const sigmaSB = 5.670374419e-8; // Stefan–Boltzmann, CODATA 2018 (exact in the 2019 SI)
const cMS = 299792458; // exact (SI)

// Ages today, Gyr, of models without radiation (integrating dt = da / (a H(a)), from memory; standard results):
const ageFlatLambda = (H0: number, Om: number) => hubbleTimeGyr(H0) * (2 / (3 * Math.sqrt(1 - Om))) * Math.asinh(Math.sqrt((1 - Om) / Om)); // flat, matter + Λ
const ageOpenMatter = (H0: number, Om: number) => hubbleTimeGyr(H0) * (1 / (1 - Om) - (Om / (2 * (1 - Om) ** 1.5)) * Math.acosh(2 / Om - 1)); // Λ = 0, Om < 1
const ageClosedMatter = (H0: number, Om: number) => hubbleTimeGyr(H0) * ((Om / (2 * (Om - 1) ** 1.5)) * Math.acos(2 / Om - 1) - 1 / (Om - 1)); // Λ = 0, Om > 1
/** The age as DESCRIBE writes it: 5 significant digits. */
const gyr5 = (t: number) => `${Number(t.toPrecision(5))} Gyr`;

/**
 * Or of photons plus massless neutrinos: Ωγ = 8πG · 4σT⁴ / (3 H0² c³) (a blackbody's energy density
 * 4σT⁴/c over the critical density 3H0²/8πG), and per massless species (Neff/3 each) (7/8)(4/11)^(4/3) Ωγ
 * (the standard neutrino-to-photon ratio, e.g. Planck 2018 VI §7.6; common practice).
 */
function radiationDensity(H0: number, Tcmb: number, Neff: number, masslessSpecies: number): number {
  const H0PerS = (H0 * 1e3) / mpcM;
  const photons = (8 * Math.PI * G * 4 * sigmaSB * Tcmb ** 4) / (3 * H0PerS ** 2 * cMS ** 3);
  return photons * (1 + masslessSpecies * (Neff / 3) * (7 / 8) * (4 / 11) ** (4 / 3));
}

describe("DESCRIBE names the geometry and what the model holds", () => {
  test.each([
    // spec                                  | words after "<spec>: "
    ["H0=70; Om=0.3; OL=0.7",                  "flat: matter + Λ"],
    ["H0=70; Om=0.3; OL=0.6",                  "open: matter + Λ"],            // Ok = 1 − Om − OL = 0.1 > 0
    ["H0=70; Om=0.3; OL=0.8",                  "closed: matter + Λ"],          // Ok = −0.1 < 0
    ["H0=70; Om=0.3; OL=0",                    "open: matter only"],
    ["H0=70; Om=1.2; Ok=-0.2",                 "closed: matter only"],
    ["EDS",                                    "flat: matter only"],
    ["H0=70; Om=0.3; OL=0.7; w0=-0.9",         "flat: matter + w0–wa dark energy"], // w0 ≠ −1 alone
    ["H0=70; Om=0.3; OL=0.7; wa=0.1",          "flat: matter + w0–wa dark energy"], // wa ≠ 0 alone
    ["H0=70; Om=0.3; OL=0.7; w0=-0.9; wa=0.1", "flat: matter + w0–wa dark energy"],
    ["H0=70; Om=0.3; OL=0.7; w0=-1; wa=0",     "flat: matter + Λ"],
    ["P18-BAO",                                "flat: matter + Λ + radiation"],
  ])("%s: %s", (spec, words) => {
    expect(describeSpec(spec).startsWith(`${Cosmology.fromSpec(spec).spec}: ${words}; H0 = `)).toBe(true);
  });
});

describe("DESCRIBE of a model without radiation states every parameter and the age", () => {
  test.each([
    // spec                    | the line, in full                                                                                                                                                        | age from
    ["H0=70; Om=0.3; OL=0.7",    `H0=70; Om=0.3; OL=0.7: flat: matter + Λ; H0 = 70 km/s/Mpc; Om = 0.3 (matter); OL = 0.7; Ok = 0; Or = 0 (no radiation); w0 = -1; wa = 0; no radiation (Tcmb = 0: no photons, no neutrinos); age today ${gyr5(ageFlatLambda(70, 0.3))}`],
    ["H0=70; Om=0.3; OL=0",      `H0=70; Om=0.3; OL=0: open: matter only; H0 = 70 km/s/Mpc; Om = 0.3 (matter); OL = 0; Ok = 0.7; Or = 0 (no radiation); w0 = -1; wa = 0; no radiation (Tcmb = 0: no photons, no neutrinos); age today ${gyr5(ageOpenMatter(70, 0.3))}`],
    ["H0=70; Om=1.2; Ok=-0.2",   `H0=70; Om=1.2; Ok=-0.2: closed: matter only; H0 = 70 km/s/Mpc; Om = 1.2 (matter); OL = 0; Ok = -0.2; Or = 0 (no radiation); w0 = -1; wa = 0; no radiation (Tcmb = 0: no photons, no neutrinos); age today ${gyr5(ageClosedMatter(70, 1.2))}`],
    ["EDS",                      `EDS: flat: matter only; H0 = 70 km/s/Mpc; Om = 1 (matter); OL = 0; Ok = 0; Or = 0 (no radiation); w0 = -1; wa = 0; no radiation (Tcmb = 0: no photons, no neutrinos); age today ${gyr5((2 / 3) * hubbleTimeGyr(70))}`],
  ])("%s", (spec, line) => {
    expect(describeSpec(spec)).toBe(line);
  });

  test("the closed forms behind the ages above agree with known values and limits", () => {
    // guards the closed forms themselves: a typo in one would make the table above check a wrong line
    expect(gyr5(ageFlatLambda(70, 0.3))).toBe("13.467 Gyr"); // H0 t0 = 0.964 for a flat Om = 0.3 (from memory)
    expect(gyr5((2 / 3) * hubbleTimeGyr(70))).toBe("9.3123 Gyr"); // 2/(3H0), Einstein–de Sitter
    expect(ageOpenMatter(70, 1 - 1e-3) / ((2 / 3) * hubbleTimeGyr(70))).toBeCloseTo(1, 3); // the open form tends to EdS as Om → 1 (off by ~(1 − Om)/5)
    expect(ageClosedMatter(70, 1 + 1e-3) / ((2 / 3) * hubbleTimeGyr(70))).toBeCloseTo(1, 3); // and the closed one too
  });

  test("given dark energy parameters are shown as given, and Ob only when the model has one", () => {
    const line = describeSpec("H0=70; Om=0.3; OL=0.7; Ob=0.05; w0=-0.9; wa=0.1");
    expect(line).toContain("; Or = 0 (no radiation); Ob = 0.05; w0 = -0.9; wa = 0.1; no radiation");
    expect(describeSpec("H0=70; Om=0.3; OL=0.7")).not.toContain("Ob");
  });

  test("an age that is not a finite number is said in words", () => {
    // de Sitter (Om = 0, OL = 1): H is constant, the past is infinite; nearly de Sitter: the age integral does not converge numerically
    expect(describeSpec("H0=70; Om=0; OL=1")).toMatch(/; age today infinite \(no big bang\)$/);
    expect(describeSpec("H0=70; Om=0; OL=1; w0=-0.9999999")).toMatch(/; age today not finite to numerical precision \(a past too close to de Sitter\)$/);
  });
});

describe("DESCRIBE of a model with radiation states the CMB temperature, Neff and the neutrinos", () => {
  const escaped = (text: string) => text.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
  const radiationOf = (spec: string) => Number(/; Or = ([\d.e-]+) \(photons \+ massless ν\)/.exec(describeSpec(spec))![1]);

  test.each([
    // spec                                                       | neutrinos in words                                                              | Om words                       | massless species
    ["H0=70; Om=0.3; OL=0.7; Tcmb=2.7255",                          "massless neutrinos",                                                             "Om = 0.3 (matter)",              3],
    ["H0=70; Om=0.3; OL=0.7; Tcmb=2.7255; mnu=0",                   "massless neutrinos",                                                             "Om = 0.3 (matter)",              3], // a zero mass is a massless species
    ["H0=70; Om=0.3; OL=0.7; Tcmb=2.7255; mnu=0.06",                "neutrino masses 0.06 eV (exact Fermi–Dirac; others massless)",                   "Om = 0.3 (matter incl. massive ν)", 2],
    ["H0=70; Om=0.3; OL=0.7; Tcmb=2.7255; mnu=0.06,0.01",           "neutrino masses 0.06, 0.01 eV (exact Fermi–Dirac; others massless)",             "Om = 0.3 (matter incl. massive ν)", 1],
  ])("%s: %s", (spec, neutrinos, matter, massless) => {
    const line = describeSpec(spec);
    expect(line).toContain(`; ${matter}; OL = 0.7; `);
    expect(line.replace(/; age today \d+\.\d+ Gyr$/, "")).toMatch(new RegExp(`; w0 = -1; wa = 0; Tcmb = 2\\.7255 K; Neff = 3\\.046; ${escaped(neutrinos)}$`));
    // Or, 4 significant digits, against the closed form above
    expect(Math.abs(radiationOf(spec) / radiationDensity(70, 2.7255, 3.046, massless) - 1)).toBeLessThan(1e-3);
  });

  test.each([
    // masses as given to the library's constructor (a spec drops zeros; new Cosmology keeps them) | Om words
    [[0.06, 0],   "Om = 0.3 (matter incl. massive ν)"],  // one mass above 0 is enough
    [[0],         "Om = 0.3 (matter)"],                  // a zero mass adds no matter
    [[0, 0, 0],   "Om = 0.3 (matter)"],
  ])("a model built with the masses %j says %s", (mnu, matter) => {
    const m = new Cosmology({ ...parseModelSpec("H0=70; Om=0.3; OL=0.7; Tcmb=2.7255"), mnu });
    expect(describeModel(m)).toContain(`; ${matter}; OL = 0.7; `);
    expect(describeModel(m)).toContain(`; neutrino masses ${mnu.join(", ")} eV (exact Fermi–Dirac; others massless); `);
  });

  test("a model with radiation but no masses does not say its matter includes massive ν", () => {
    expect(describeSpec("H0=70; Om=0.3; OL=0.7; Tcmb=2.7255")).toContain("; Om = 0.3 (matter); ");
  });

  test("a preset with radiation: P18-BAO's line up to its age (Planck 2018 VI Table 2 parameters as zcell ships them)", () => {
    const line = describeSpec("P18-BAO");
    expect(line).toMatch(
      /^P18-BAO: flat: matter \+ Λ \+ radiation; H0 = 67\.66 km\/s\/Mpc; Om = 0\.3111 \(matter incl\. massive ν\); OL = 0\.68\d+; Ok = 0; Or = [\d.e-]+ \(photons \+ massless ν\); Ob = 0\.0489\d+; w0 = -1; wa = 0; Tcmb = 2\.7255 K; Neff = 3\.046; neutrino masses 0\.06 eV \(exact Fermi–Dirac; others massless\); age today 13\.\d+ Gyr$/,
    );
  });
});

describe("DESCRIBE in a sheet describes the model the cell is computed under", () => {
  const { one } = sheetCalls("H0=70; Om=0.3; OL=0.7");
  test.each([
    // model argument                              | the description begins
    [null,                                           "H0=70; Om=0.3; OL=0.7: flat: matter + Λ; "],      // omitted: the workbook's model
    ["",                                             "H0=70; Om=0.3; OL=0.7: flat: matter + Λ; "],      // blank: the same
    ["EDS",                                          "EDS: flat: matter only; "],
    [[["H0", 70], ["Om", 0.3], ["OL", 0.6]],         "H0=70; Om=0.3; OL=0.6: open: matter + Λ; "],      // a key/value block
  ])("model %j", (model, begins) => {
    expect(String(one("DESCRIBE", model)).startsWith(begins)).toBe(true);
  });
});

describe("VERSION states zcell's version and the engine's conventions", () => {
  test("the whole text", () => {
    expect(versionText()).toBe(
      `zcell ${packageJson.version}; distances per Hogg (1999); Om includes massive neutrinos; ` +
        "neutrinos exact Fermi–Dirac with T_ν = (4/11)^(1/3) Tcmb and Neff/3 per species; " +
        "w(a) = w0 + wa(1 − a); constants CODATA 2018 / IAU 2015; relative accuracy ≤ 1e-10 for z ≤ 1e4",
    );
    expect(packageJson.version).toMatch(/^\d+\.\d+\.\d+$/);
  });
});
