/** Identities, limits and symmetries that hold for every model, checked on every test model. */
import { describe, expect, test } from "vitest";
import { speedOfLightKmPerS, megaparsecKm, secondsPerGyr } from "../core/units/constants.js";
import { Cosmology, type InvertibleQuantity } from "../core/distances/Cosmology.js";
import { NoSolutionError } from "../core/checks/NoSolutionError.js";
import { testModels } from "./fixtures.js";
import { SlowCosmology, slowFermiDirac } from "./reference/slowCosmology.js";
import { expectRelative, logRedshifts, freshModel } from "./helpers.js";
import type { ModelParameters } from "../core/model/ModelParameters.js";

/** ΛCDM defaults without radiation, for the models written out below. */
const lcdmParameters = { w0: -1, wa: 0, Tcmb: 0, Neff: 3.046, mnu: [] as number[] };

const zs = logRedshifts(-6, 4, 4);
/** The whole documented domain of the inverse, 1e-8 ≤ z ≤ 1e8, and the top of the tables (z = 1e8) closely. */
const wholeDomain = [...logRedshifts(-8, 8, 4), 5e7, 9e7, 9.9e7, 9.99e7, 9.999e7];

const forward: Record<InvertibleQuantity, (m: Cosmology, z: number) => number> = {
  comovingDistance: (m, z) => m.comovingDistanceMpc(z),
  transverseComovingDistance: (m, z) => m.transverseComovingDistanceMpc(z),
  luminosityDistance: (m, z) => m.luminosityDistanceMpc(z),
  angularDiameterDistance: (m, z) => m.angularDiameterDistanceMpc(z),
  lightTravelDistance: (m, z) => m.lightTravelDistanceMpc(z),
  distanceModulus: (m, z) => m.distanceModulusMag(z),
  lookbackTime: (m, z) => m.lookbackTimeGyr(z),
  age: (m, z) => m.ageGyr(z),
  comovingVolume: (m, z) => m.comovingVolumeMpc3(z),
};

describe.each(Object.entries(testModels))("identities: %s", (_name, params) => {
  // a fresh model for every test (see freshModel): mutation testing then runs each test against the
  // mutants of model building and table growth it exercises
  const m = freshModel(() => new Cosmology(params));

  test("inverse redshifts round-trip to |Δz| ≤ 1e-9 (1+z) above the double-precision floor, 1e-8 ≤ z ≤ 1e8", () => {
    for (const [q, f] of Object.entries(forward) as [InvertibleQuantity, (m: Cosmology, z: number) => number][]) {
      for (const z of wholeDomain) {
        if (q === "age" && !Number.isFinite(m.ageTodayGyr)) continue; // an infinite past: age does not fix z
        if (q === "angularDiameterDistance" || q === "transverseComovingDistance") {
          // lower branch only: below the maximum of D_A (or of D_M in a closed model)
          const h = 1e-4 * (1 + z);
          if (f(m, z + h) <= f(m, z)) continue;
        }
        const v = f(m, z);
        const back = m.redshiftAt(q, v);
        // The value itself is known to 1 ulp; where the quantity flattens (look-back and age at high z,
        // volumes and distances near a horizon) that alone moves z by ε|Q| / |dQ/dz|.
        const dz = 1e-6 * (1 + z);
        const slope = Math.abs(f(m, z + dz) - f(m, z)) / dz;
        // Beyond half the age, look-back (and light travel) is inverted through the ln-age table while
        // the forward value comes from the τ table: the two agree to ~1e-14 of the value, not to 1 ulp.
        const agreement = q === "lookbackTime" || q === "lightTravelDistance" ? 3e-14 : 8e-16;
        const floor = (agreement * Math.abs(v)) / slope;
        expect(Math.abs(back - z), `${q} at z=${z}: got ${back}`).toBeLessThanOrEqual(1e-9 * (1 + z) + floor);
      }
    }
  });

  test("D_L = (1+z)² D_A (Etherington reciprocity; Hogg 1999 eq. 21)", () => {
    for (const z of zs) expectRelative(m.luminosityDistanceMpc(z), (1 + z) ** 2 * m.angularDiameterDistanceMpc(z), 3e-15, `z=${z}`);
  });

  test("z → 0: D ≈ cz/H0 and t_L ≈ z/H0 (Hubble law)", () => {
    const z = 1e-9;
    expectRelative(m.comovingDistanceMpc(z), (speedOfLightKmPerS * z) / m.H0, 2e-9, "D_C");
    expectRelative(m.lookbackTimeGyr(z), (megaparsecKm / m.H0 / secondsPerGyr) * z, 2e-9, "t_L");
    expect(m.comovingDistanceMpc(0)).toBe(0);
    expect(m.comovingVolumeMpc3(0)).toBe(0);
  });

  test("distances and look-back grow and the age falls with z", () => {
    let last = { dc: -1, dl: -1, tl: -1, age: Number.POSITIVE_INFINITY, v: -1 };
    for (const z of logRedshifts(-6, 6, 20)) {
      const now = {
        dc: m.comovingDistanceMpc(z),
        dl: m.luminosityDistanceMpc(z),
        tl: m.lookbackTimeGyr(z),
        age: m.ageGyr(z),
        v: m.comovingVolumeMpc3(z),
      };
      expect(now.dc, `D_C at ${z}`).toBeGreaterThan(last.dc);
      expect(now.dl, `D_L at ${z}`).toBeGreaterThan(last.dl);
      expect(now.tl, `t_L at ${z}`).toBeGreaterThan(last.tl);
      expect(now.age, `age at ${z}`).toBeLessThan(last.age);
      expect(now.v, `V at ${z}`).toBeGreaterThan(last.v);
      last = now;
    }
  });

  test("age today − age(z) = look-back time(z)", () => {
    for (const z of zs) {
      expect(Math.abs(m.ageTodayGyr - m.ageGyr(z) - m.lookbackTimeGyr(z))).toBeLessThan(1e-12 * m.ageTodayGyr);
    }
  });

  test("light-travel distance = c × look-back time", () => {
    const cMpcPerGyr = (speedOfLightKmPerS * secondsPerGyr) / megaparsecKm;
    for (const z of zs) expectRelative(m.lightTravelDistanceMpc(z), cMpcPerGyr * m.lookbackTimeGyr(z), 1e-14, `z=${z}`);
  });

  test("D_A12 from z1 = 0 is D_A, and the volume element is dV/dz/(4π)", () => {
    for (const z of [0.01, 0.5, 2, 10]) {
      expectRelative(m.angularDiameterDistanceBetweenMpc(0, z), m.angularDiameterDistanceMpc(z), 1e-15, `z=${z}`);
      const h = 1e-5 * z;
      const dvdz = (m.comovingVolumeMpc3(z + h) - m.comovingVolumeMpc3(z - h)) / (2 * h);
      expectRelative(m.comovingVolumeElementMpc3Sr(z) * 4 * Math.PI, dvdz, 1e-8, `dV/dz at ${z}`);
    }
  });

  test("density parameters of each component follow their own scaling (slow path's components, not the engine's)", () => {
    const slow = new SlowCosmology(params);
    for (const z of [0, 0.5, 3, 1100, 1e6]) {
      const a = 1 + z;
      const e2 = slow.E(z) ** 2;
      const massiveNu = slow.y0.reduce((s, y) => s + slow.onuSpecies * a ** 4 * slowFermiDirac(y / a), 0);
      const de = slow.ol * Math.pow(a, 3 * (1 + params.w0 + params.wa)) * Math.exp((-3 * params.wa * z) / a);
      // matter: cold (1+z)³ plus the massive ν with their Fermi–Dirac density; radiation (1+z)⁴; curvature (1+z)²
      expectRelative(m.densityParameter("matter", z), (slow.ocold * a ** 3 + massiveNu) / e2, 1e-9, `matter z=${z}`);
      expectRelative(m.densityParameter("radiation", z) || 1, (slow.or * a ** 4) / e2 || 1, 1e-9, `radiation z=${z}`);
      expect(Math.abs(m.densityParameter("curvature", z) - (slow.ok * a * a) / e2), `curvature z=${z}`).toBeLessThan(1e-12);
      expect(Math.abs(m.densityParameter("darkenergy", z) - de / e2), `dark energy z=${z}`).toBeLessThan(1e-12);
      // photons alone (1+z)⁴, and all neutrinos: the massless species (1+z)⁴ plus the massive ones
      const masslessNu = (3 - slow.y0.length) * slow.onuSpecies * a ** 4;
      expectRelative(m.densityParameter("photons", z) || 1, (slow.ogamma * a ** 4) / e2 || 1, 1e-9, `photons z=${z}`);
      expectRelative(m.densityParameter("neutrinos", z) || 1, (masslessNu + massiveNu) / e2 || 1, 1e-9, `neutrinos z=${z}`);
      expectRelative(m.densityParameter("cold", z), (slow.ocold * a ** 3) / e2, 1e-9, `cold z=${z}`);
    }
    expectRelative(m.densityParameter("matter", 0), params.Om, 1e-15, "Om");
  });

  test("values past the range of a quantity have no redshift", () => {
    expect(() => m.redshiftAt("lookbackTime", m.ageTodayGyr * 1.01)).toThrow(NoSolutionError);
    expect(() => m.redshiftAt("age", m.ageTodayGyr * 1.01)).toThrow(NoSolutionError);
    expect(() => m.redshiftAt("luminosityDistance", -1)).toThrow(NoSolutionError);
  });
});

describe.each(Object.entries(testModels))("tables that grow as they are read: %s", (_name, params) => {
  // The tables grow one unit of ln(1+z) at a time from z = 0 (core/distances/distanceTables.ts), and
  // the age table from the exact age at the top of each unit: a value must not depend on what was
  // asked before it. Expected values: the same model asked in another order (identity).
  const zs = [0.5, 3, 1e3, 2e7, 1e8];
  const quantities = ["luminosityDistanceMpc", "lookbackTimeGyr", "ageGyr", "comovingVolumeMpc3"] as const;
  test("every value is the same, to the last bit, whether asked first, after z = 1e8, or in reverse order", () => {
    for (const q of quantities) {
      const first = zs.map((z) => new Cosmology(params)[q](z));
      const grown = new Cosmology(params);
      grown[q](1e8);
      const reverse = new Cosmology(params);
      const backwards = [...zs].reverse().map((z) => reverse[q](z)).reverse();
      expect(zs.map((z) => grown[q](z)), q).toEqual(first);
      expect(backwards, q).toEqual(first);
    }
  });

  test("inverses are the same whether the tables have grown or not", () => {
    for (const [q, f] of [["luminosityDistance", 5000], ["age", 1], ["lookbackTime", 2], ["angularDiameterDistance", 1000]] as const) {
      const fresh = new Cosmology(params);
      const grown = new Cosmology(params);
      grown.ageGyr(1e8);
      grown.luminosityDistanceMpc(1e8);
      const inverse = (m: Cosmology) => {
        try {
          return m.redshiftAt(q, f);
        } catch (e) {
          return (e as Error).message;
        }
      };
      expect(inverse(fresh), q).toBe(inverse(grown));
    }
  });
});

describe("a model whose E² could vanish is checked in full when made", () => {
  // E² is a sum of terms; with none negative it cannot vanish (core/model/ExpansionRate.ts cannotBounce),
  // otherwise the tables are built, and E² > 0 checked at every node, as the model is made.
  //   parameters                                        bounce possible   why (common practice: the terms of E²)
  const cases: [string, ModelParameters, boolean][] = [
    ["flat ΛCDM + radiation + 0.06 eV ν",            testModels["flat ΛCDM + radiation + 0.06 eV ν"], false],
    ["open w0–wa",                                      testModels["open w0–wa, no radiation"],           false],
    ["closed (Ωk < 0)",                                 testModels["closed, radiation, three massive ν"], true],
    ["negative Λ",                                      { ...lcdmParameters, H0: 70, Om: 1.2, OL: -0.2 },   true],
    ["de Sitter (only Λ: nothing that does not fall)", { ...lcdmParameters, H0: 70, Om: 0, OL: 1 },          true],
  ];
  test.each(cases)("%s", (_name, params, couldBounce) => {
    expect(new Cosmology(params).expansion.cannotBounce()).toBe(!couldBounce);
  });

  test("a bounce far beyond the first values asked for is still refused as the model is made", () => {
    // Ωm = 0.001, ΩΛ = 1.2 (closed): E² = 0.001(1+z)³ − 0.201(1+z)² + 1.2 turns negative near z ≈ 1.5
    // and positive again near z ≈ 200 (the cubic's roots), so no big bang: the error must come at once.
    expect(() => new Cosmology({ ...lcdmParameters, H0: 70, Om: 0.001, OL: 1.2 })).toThrow(/no big bang/);
  });
});

describe("angular-diameter distance has a maximum", () => {
  const m = freshModel(() => Cosmology.fromSpec("P18-BAO"));
  test("the lower branch is returned below the maximum, and values above it have no solution", () => {
    let zPeak = 0;
    let peak = 0;
    for (let z = 1; z < 2.5; z += 1e-3) {
      const da = m.angularDiameterDistanceMpc(z);
      if (da > peak) [peak, zPeak] = [da, z];
    }
    const zLow = m.redshiftAt("angularDiameterDistance", 0.9 * peak);
    expect(zLow).toBeLessThan(zPeak);
    expectRelative(m.angularDiameterDistanceMpc(zLow), 0.9 * peak, 1e-13, "lower branch");
    expect(() => m.redshiftAt("angularDiameterDistance", peak * 1.001)).toThrow(/exceeds its maximum/);
  });
});

describe("neutrino edge cases against the slow path", () => {
  // the slow path (test/reference/slowCosmology.ts) integrates the Fermi–Dirac factor by tanh-sinh
  // quadrature at every point, with no table: it shares no code with the engine's neutrino handling
  const lcdm = { w0: -1, wa: 0, Tcmb: 2.7255, Neff: 3.046 };
  test.each([
    // model                                                                  why
    [{ ...lcdm, H0: 70, Om: 0.35, mnu: [0.6] },                               "a heavy species: ln y above the Fermi–Dirac table (y > e⁷) at low z"],
    [{ ...lcdm, H0: 70, Om: 0.3, mnu: [0.06] },                               "a light species: ln y below the table (y < e⁻¹⁰) beyond z ≈ 8e6"],
    [{ ...lcdm, H0: 70, Om: 0.3, Neff: 10, mnu: [0.1, 0.1, 0.1] },            "many relativistic species, all three massive"],
  ])("%j: distances and look-back within 1e-9 from z = 0.1 to 1e8 (%s)", (params) => {
    const m = new Cosmology(params);
    const slow = new SlowCosmology(params);
    for (const z of [0.1, 1, 10, 1e3, 1e5, 1e7, 5e7, 1e8]) {
      expectRelative(m.comovingDistanceMpc(z), slow.comovingDistanceMpc(z), 1e-9, `D_C z=${z}`);
      expectRelative(m.expansionRate(z), slow.E(z), 1e-10, `E z=${z}`);
    }
  });

  test("without radiation, massless species listed as masses of 0 change nothing (EdS: D_C = 2 D_H (1 − (1+z)^−½))", () => {
    const m = new Cosmology({ ...lcdmParameters, H0: 70, Om: 1, mnu: [0, 0] });
    for (const z of [0.5, 3, 1e4, 1e8]) expectRelative(m.comovingDistanceMpc(z), 2 * m.hubbleDistanceMpc * -Math.expm1(-0.5 * Math.log1p(z)), 1e-12, `z=${z}`);
  });

  test("with radiation, a species listed with a mass of 0 is a massless one (counted in Ω_r, not in Ω_m)", () => {
    // the core takes masses ≥ 0 (the spec parser drops zeros before, so only a caller of the core
    // gives one): mnu = [0.06, 0, 0] is one massive species and two massless ones, as mnu = [0.06]
    const listed = new Cosmology({ ...lcdm, H0: 67.66, Om: 0.3111, mnu: [0.06, 0, 0] });
    const one = new Cosmology({ ...lcdm, H0: 67.66, Om: 0.3111, mnu: [0.06] });
    // Ω_r = Ω_γ (1 + (2/3) N_eff (7/8)(4/11)^{4/3}): two of the three species massless, each (7/8)(4/11)^{4/3}
    // of the photons' density per unit of N_eff/3 (the relic-neutrino temperature T_ν = (4/11)^{1/3} T_γ; common practice)
    expectRelative(listed.Or, listed.Ogamma * (1 + (2 / 3) * 3.046 * (7 / 8) * (4 / 11) ** (4 / 3)), 1e-12, "Ω_r");
    expect(listed.OnuMassive).toBe(one.OnuMassive);
    for (const z of [0, 1, 1e3, 1e6]) {
      expect(listed.expansionRate(z), `E z=${z}`).toBe(one.expansionRate(z));
      expect(listed.densityParameter("radiation", z), `Ω_r(z) z=${z}`).toBe(one.densityParameter("radiation", z));
    }
  });
});
