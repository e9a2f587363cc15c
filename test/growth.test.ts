/**
 * Linear growth with massive neutrinos in the trade's two limits ("smooth": the source is CDM +
 * baryons; "clustering": it adds the neutrinos' ρ − 3P), checked against an independent integration
 * (test/reference/growth_reference.py: another form of the equation, another Runge–Kutta scheme, another
 * start, its own neutrino integrals; Debian python3-mpmath), against the values an outside integration
 * gave in issue 28, and for independence from where the integration starts.
 */
import { describe, expect, test } from "vitest";
import { Cosmology } from "../core/distances/Cosmology.js";
import { growthFactor, growthRate, growthStartedAt, type GrowthNeutrinos } from "../core/observables/growth.js";
import { relativeError } from "./helpers.js";
import { referenceAvailable, runPythonReference } from "./reference/python.js";
import { onFirstUse } from "./requirements.js";
import { sheetCalls } from "./sheetCalls.js";

const { num, failure } = sheetCalls("P18-CMB");
const conventions: GrowthNeutrinos[] = ["smooth", "clustering"];

// Σm_ν = 0, 0.06 and 0.3 eV on the P18-CMB background (one massive species, as the preset)
const models: [id: string, spec: string][] = [
  ["massless", "P18-CMB; mnu=0"],
  ["0.06 eV", "P18-CMB"],
  ["0.3 eV", "P18-CMB; mnu=0.3"],
];
const zs = [0, 0.01, 0.1, 0.3, 0.5, 1, 2, 3, 5, 10, 20, 50, 100, 200, 500, 1000, 2000, 5000, 1e4];

type Reply = Record<string, Record<GrowthNeutrinos, { d: number[]; f: number[] }>>;

describe.runIf(referenceAvailable("mpmath", "python3-mpmath"))("against an independent integration (test/reference/growth_reference.py)", () => {
  const reply = onFirstUse(() =>
    runPythonReference<Reply>("growth_reference.py", {
      models: models.map(([id, spec]) => {
        const p = Cosmology.fromSpec(spec).parameters;
        return { id, H0: p.H0, Om: p.Om, Tcmb: p.Tcmb, Neff: p.Neff, mnu: p.mnu };
      }),
      z: zs,
      conventions,
    }),
  );

  test.each(models.flatMap(([id, spec]) => conventions.map((c) => [id, spec, c] as const)))(
    "%s (%s), %s: D(z)/D(0) and f for 0 ≤ z ≤ 1e4 to 1e-6",
    (id, spec, convention) => {
      const m = Cosmology.fromSpec(spec);
      const ref = reply()[id][convention];
      let worst = 0;
      zs.forEach((z, k) => {
        const eD = relativeError(growthFactor(m, z, convention), ref.d[k]);
        const eF = relativeError(growthRate(m, z, convention), ref.f[k]);
        worst = Math.max(worst, eD, eF);
        expect(eD, `D at z = ${z}`).toBeLessThanOrEqual(1e-6);
        expect(eF, `f at z = ${z}`).toBeLessThanOrEqual(1e-6);
      });
      console.log(`growth ${id} ${convention}: worst relative difference ${worst.toExponential(1)}`);
    },
  );
});

// dark energy that is not negligible at a = 1e-8 but fades into the past: the integration starts earlier
const darkEnergyModels: [id: string, spec: string][] = [
  ["w0=-0.05", "P18-CMB; w0=-0.05"],
  ["w0=0", "P18-CMB; w0=0"],
  ["w0=-0.5, wa=0.5", "P18-CMB; w0=-0.5; wa=0.5"],
  ["w0=0.2", "P18-CMB; w0=0.2"],
  ["no radiation, w0=-0.1", "H0=70; Om=0.3; w0=-0.1"],
];

describe.runIf(referenceAvailable("mpmath", "python3-mpmath"))("dark energy that matters early on, against the independent integration (test/reference/growth_reference.py)", () => {
  const zsHigh = [...zs, 99999];
  const reply = onFirstUse(() =>
    runPythonReference<Reply>("growth_reference.py", {
      models: darkEnergyModels.map(([id, spec]) => {
        const p = Cosmology.fromSpec(spec).parameters;
        return { id, H0: p.H0, Om: p.Om, Tcmb: p.Tcmb, Neff: p.Neff, mnu: p.mnu, w0: p.w0, wa: p.wa };
      }),
      z: zsHigh,
      conventions: ["smooth"],
    }),
  );

  test.each(darkEnergyModels)("%s (%s): D(z)/D(0) and f for 0 ≤ z ≤ 99999 to 1e-6", (id, spec) => {
    const ref = reply()[id].smooth;
    zsHigh.forEach((z, k) => {
      expect(relativeError(num("GROWTH", z, spec), ref.d[k]), `D at z = ${z}`).toBeLessThanOrEqual(1e-6);
      expect(relativeError(num("GROWTH_RATE", z, spec), ref.f[k]), `f at z = ${z}`).toBeLessThanOrEqual(1e-6);
    });
  });
});

describe("the two neutrino conventions", () => {
  test("are the same without massive neutrinos, bit for bit", () => {
    const m = Cosmology.fromSpec("P18-CMB; mnu=0");
    for (const z of [0, 1, 100, 1e4]) {
      expect(growthFactor(m, z, "clustering")).toBe(growthFactor(m, z, "smooth"));
      expect(growthRate(m, z, "clustering")).toBe(growthRate(m, z, "smooth"));
    }
  });

  test.each([
    // convention   | quantity      | value  | quoted to
    ["clustering",    "GROWTH",       0.0015131, 5e-8],
    ["clustering",    "GROWTH_RATE",  0.8362,    5e-5],
    ["smooth",        "GROWTH",       0.0015329, 5e-8],
  ])("P18-CMB at z = 1000, %s: %s = %d as the outside integration quoted in issue 28 (to its last digit)", (convention, fn, value, half) => {
    expect(Math.abs(num(fn as string, 1000, "P18-CMB", convention) - (value as number))).toBeLessThanOrEqual(half as number);
  });

  test("smooth neutrinos slow the growth: D(z)/D(0) is larger at every z > 0, and f smaller today (they add to H but not to the source)", () => {
    const m = Cosmology.fromSpec("P18-CMB; mnu=0.3");
    for (const z of [0.5, 10, 1000]) expect(growthFactor(m, z, "smooth")).toBeGreaterThan(growthFactor(m, z, "clustering"));
    expect(growthRate(m, 0, "smooth")).toBeLessThan(growthRate(m, 0, "clustering"));
  });

  test("a blank or omitted neutrinos argument is smooth; the choice is case-insensitive; another word is #VALUE! naming the choices", () => {
    expect(num("GROWTH", 3)).toBe(num("GROWTH", 3, null, "smooth"));
    expect(num("GROWTH", 3, null, "")).toBe(num("GROWTH", 3, null, "smooth"));
    expect(num("GROWTH_RATE", 3, null, "Clustering")).toBe(growthRate(Cosmology.fromSpec("P18-CMB"), 3, "clustering"));
    const cell = failure("GROWTH", 3, null, "free-streaming");
    expect(cell.kind).toBe("value");
    expect(cell.message).toBe('ZC.GROWTH: neutrinos: "free-streaming" is not one of smooth, clustering');
  });
});

describe("independence from where the integration starts", () => {
  test.each([
    // start a | tolerance: the starting mode leaves out the neutrinos' mass, ~(m/T_ν)² a² of their density
    [1e-6,       2e-6],   // measured 8.9e-7 (f at z = 99999, 0.3 eV, clustering), 2e-9 (smooth)
    [1e-7,       2e-8],   // measured 8.8e-9
    [1e-10,      2e-10],  // measured 8.9e-11: the start at 1e-8 is that close to the limit
    [1e-12,      2e-10],
  ])("a start at a = %d gives D and f within %d of the start at 1e-8, for z ≤ 99999, both conventions", (startA, tol) => {
    const m = Cosmology.fromSpec("P18-CMB; mnu=0.3");
    for (const convention of conventions) {
      for (const z of [0, 10, 1000, 1e4, 99999]) {
        const other = growthStartedAt(m, z, convention, startA);
        expect(relativeError(other.d, growthFactor(m, z, convention)), `D, ${convention}, z = ${z}`).toBeLessThanOrEqual(tol);
        expect(relativeError(other.f, growthRate(m, z, convention)), `f, ${convention}, z = ${z}`).toBeLessThanOrEqual(tol);
      }
    }
  });

  test("a start inside the range asked for is refused", () => {
    expect(() => growthStartedAt(Cosmology.fromSpec("EDS"), 1e4, "smooth", 1e-3)).toThrow(/must lie before z = 10000/);
  });

  test.each([
    // spec                     | whole message (our rule: dark energy ≤ 1e-6 of H² by a = 1e-30). The shares
    // are Ω_DE(a = 1e-30) written out: ρ_DE ∝ a^(−3(1+w0+wa)) exp(−3 wa (1 − a)) (Linder 2003 eq. 3) against
    // Ω_m a⁻³ + Ω_rad a⁻⁴ with every neutrino relativistic (88.13%, 40.25%, 0.007378%: /usr/bin/python3 with
    // the constants of test/reference/growth_reference.py)
    ["H0=70; Om=0.3; w0=0.2",     "linear growth needs matter to dominate H² early on (this model has no radiation), but its dark energy grows into the past as fast as matter or faster: w0 + wa = 0.2 (matter: 0)"],
    ["P18-CMB; w0=0.4",           "linear growth needs matter and radiation to dominate H² early on, but in this model dark energy grows into the past as fast as radiation or faster: w0 + wa = 0.4 (radiation: 1/3)"],
    ["P18-CMB; w0=0.3",           "linear growth needs matter and radiation to dominate H² early on, but in this model dark energy fades into the past too slowly: w0 + wa = 0.3 (radiation: 1/3), and it is still 88.1% of H² at a = 1e-30"],
    ["P18-CMB; w0=-0.5; wa=0.8",  "linear growth needs matter and radiation to dominate H² early on, but in this model dark energy fades into the past too slowly: w0 + wa = 0.3 (radiation: 1/3), and it is still 40.2% of H² at a = 1e-30"],
    ["H0=70; Om=0.3; w0=-0.05",   "linear growth needs matter to dominate H² early on (this model has no radiation), but its dark energy fades into the past too slowly: w0 + wa = -0.05 (matter: 0), and it is still 0.00738% of H² at a = 1e-30"],
  ])("%s is #NUM! naming the reason", (spec, message) => {
    const cell = failure("GROWTH", 1, spec);
    expect(cell.kind).toBe("num");
    expect(cell.message).toBe(`ZC.GROWTH: ${message}`);
  });

  test("the limit the help states: w0 + wa up to about 0.22 with P18-CMB's radiation, about −0.07 without radiation", () => {
    // Ω_DE/Ω_rad = (Ω_Λ/Ω_rad) a^(1 − 3w) ≤ 1e-6 at a = 1e-30 gives w ≤ 0.224 for Ω_Λ/Ω_rad ≈ 7.5e3;
    // Ω_DE/Ω_m = (Ω_Λ/Ω_m) a^(−3w) ≤ 1e-6 gives w ≤ −0.071 for Ω_Λ/Ω_m = 7/3 (the rule written out)
    expect(num("GROWTH", 1, "P18-CMB; w0=0.22")).toBeGreaterThan(0.5);
    expect(failure("GROWTH", 1, "P18-CMB; w0=0.23").kind).toBe("num");
    expect(num("GROWTH", 1, "H0=70; Om=0.3; w0=-0.075")).toBeGreaterThan(0.5);
    expect(failure("GROWTH", 1, "H0=70; Om=0.3; w0=-0.065").kind).toBe("num");
  });

  test("curvature is no such problem: an almost empty open model without radiation grows almost not at all today", () => {
    // Ω_k a / Ω_m = 1e-5 at a = 1e-8; D is nearly constant today
    expect(num("GROWTH_RATE", 0, "H0=70; Om=0.001; OL=0")).toBeLessThan(0.01);
  });

  test("without matter nothing grows, whatever dark energy does: D = 1 and f = 0 (the equation's source is 0)", () => {
    for (const spec of ["H0=70; Om=0; OL=0.5; w0=-0.2", "H0=70; Om=0; OL=1; w0=0.5; Tcmb=2.7255"]) {
      for (const z of [0, 3, 1000]) {
        expect(num("GROWTH", z, spec), spec).toBe(1);
        expect(num("GROWTH_RATE", z, spec), spec).toBe(0);
      }
    }
  });

  test("the start is a = 1e-8 wherever dark energy is below 1e-6 of H² there (P18-CMB and every preset: results as before, bit for bit), else the first power of ten below where it is", () => {
    // P18-CMB; w0=0: Ω_DE/Ω_r = 0.685/9.1e-5 a (ρ_DE ∝ a⁻³, ρ_r ∝ a⁻⁴) is 7.4e-5 at 1e-8, 7.4e-7 at 1e-10
    const m = Cosmology.fromSpec("P18-CMB; w0=0");
    for (const z of [0, 1000, 99999]) {
      expect(growthFactor(m, z)).toBe(growthStartedAt(m, z, "smooth", 1e-10).d);
      expect(growthRate(m, z)).toBe(growthStartedAt(m, z, "smooth", 1e-10).f);
    }
    const p18 = Cosmology.fromSpec("P18-CMB");
    expect(growthFactor(p18, 1000)).toBe(growthStartedAt(p18, 1000, "smooth", 1e-8).d);
  });
});
