/**
 * The inverse (redshiftAt) at the edges of what it can answer, against closed forms: the maximum of
 * D_A, the particle horizon, values beyond the tables (z > 1e8), and ages that do not fix z. Each
 * expected value is an exact result of the Friedmann equation for the model named.
 */
import { describe, expect, test } from "vitest";
import { Cosmology } from "../core/distances/Cosmology.js";
import { NoSolutionError } from "../core/checks/NoSolutionError.js";
import { expectRelative, freshModel } from "./helpers.js";

const base = { w0: -1, wa: 0, Tcmb: 0, Neff: 3.046, mnu: [] as number[] };
/** Einstein–de Sitter, H0 = 70: D_C = 2 D_H (1 − (1+z)^−½), D_A = D_C/(1+z), t = (2/3) t_H (1+z)^−3/2 (Hogg 1999 §5). */
const eds = freshModel(() => new Cosmology({ ...base, H0: 70, Om: 1 }));
/** Milne (empty), H0 = 70: D_C = D_H ln(1+z) (Hogg 1999 eq. 16 with Ωk = 1). */
const milne = freshModel(() => new Cosmology({ ...base, H0: 70, Om: 0, OL: 0 }));
const noSolution = (call: () => unknown, message: string) => {
  expect(call).toThrow(NoSolutionError);
  expect(call).toThrow(message);
};

describe("the maximum of D_A (Einstein–de Sitter: at 1+z = 9/4, D_A = (8/27) D_H)", () => {
  test("a value above it names the maximum and where it lies", () => {
    // (8/27) × 4282.7494 Mpc = 1268.96 Mpc at z = 1.25, both exact for EdS
    noSolution(() => eds.redshiftAt("angularDiameterDistance", 2000), "angular-diameter distance 2000 Mpc exceeds its maximum in this model (1268.96 Mpc at z = 1.25)");
  });

  test.each([1.0, 1.2, 1.23, 1.245])("just below the peak the lower branch is found: z = %d", (z) => {
    // between the last node before the peak and the peak itself, where D_A still rises
    const da = eds.angularDiameterDistanceMpc(z);
    expectRelative(eds.redshiftAt("angularDiameterDistance", da), z, z > 1.24 ? 1e-5 : 1e-7, `z = ${z}`);
  });

  test.each([1e-6, 1e-9, 1e-12, 1e-14])("a value within %d of the maximum gives a z below 1.25 whose D_A is that value", (below) => {
    // near the top D_A is flat: z is ill-conditioned, but the answer must stay on the lower branch
    // (z ≤ 1.25) and give back the value asked for (a last node just past the maximum once sent it
    // past the peak: z = 1.25047, D_A 3e-8 too low)
    const value = (8 / 27) * eds.hubbleDistanceMpc * (1 - below);
    const z = eds.redshiftAt("angularDiameterDistance", value);
    expect(z).toBeLessThanOrEqual(1.25);
    expectRelative(eds.angularDiameterDistanceMpc(z), value, 1e-14, `D_A within ${below}`);
    expect(1.25 - z).toBeLessThan(3 * Math.sqrt(below)); // δz ≈ √(2 δD/|D''|), D'' of order 1 here
  });
});

describe("the particle horizon (Einstein–de Sitter: D_C → 2 D_H)", () => {
  test("a distance just inside it, beyond the tables, inverts: 2 D_H (1 − 1e-5) is at z = 1e10 − 1", () => {
    expectRelative(eds.redshiftAt("comovingDistance", 2 * eds.hubbleDistanceMpc * (1 - 1e-5)), 1e10 - 1, 1e-9, "z");
  });

  test("a distance at or past it has no redshift", () => {
    noSolution(() => eds.redshiftAt("comovingDistance", 2 * eds.hubbleDistanceMpc * (1 + 1e-9)), "comoving distance 8565.5 Mpc lies beyond the particle horizon of this model");
  });

  test("Milne has no horizon: 30 D_H is at z = e^30 − 1, far beyond the tables", () => {
    expectRelative(milne.redshiftAt("comovingDistance", 30 * milne.hubbleDistanceMpc), Math.expm1(30), 1e-11, "z");
  });

  test("where the integrals no longer converge (1+z overflows), the inverse says so", () => {
    noSolution(() => milne.redshiftAt("comovingDistance", 800 * milne.hubbleDistanceMpc), "comoving distance 3426200 Mpc: this model's integrals do not converge that far back (z > 1e8)");
  });
});

describe("ages", () => {
  test("an age beyond the tables: EdS t = (2/3) t_H (1+z)^−3/2 at z = 1e9", () => {
    expectRelative(eds.redshiftAt("age", (2 / 3) * eds.hubbleTimeGyr * (1e9 + 1) ** -1.5), 1e9, 1e-9, "z");
  });

  test("a look-back time beyond half the age goes through the age table: EdS t_L = (2/3) t_H (1 − (1+z)^−3/2)", () => {
    for (const z of [3, 30, 3000]) {
      const lookback = (2 / 3) * eds.hubbleTimeGyr * -Math.expm1(-1.5 * Math.log1p(z));
      expectRelative(eds.redshiftAt("lookbackTime", lookback), z, 1e-8, `z = ${z}`);
    }
  });

  test("in de Sitter (an infinite past) an age fixes no redshift", () => {
    const deSitter = new Cosmology({ ...base, H0: 70, Om: 0, OL: 1 });
    noSolution(() => deSitter.redshiftAt("age", 5), "age 5 Gyr: this model has an infinite past, so age does not fix z");
  });

  test("an age above today's names today's age (EdS: (2/3) t_H = 9.31231 Gyr)", () => {
    noSolution(() => eds.redshiftAt("age", 10), "age 10 Gyr exceeds the age of the universe today in this model (9.31231 Gyr)");
  });
});

describe("what an inverse costs: look-ups and exact distances", () => {
  /** Counts the model's table look-ups and exact χ evaluations (the work behind one cell of REDSHIFT). */
  function counting(m: Cosmology): { table: number; exact: number } {
    const counts = { table: 0, exact: 0 };
    const model = m as unknown as Record<string, unknown> & { chiAtU(u: number): number };
    for (const table of [m.chi, m.tau, m.lnAge]) {
      if (!table) continue;
      const value = table.value.bind(table);
      table.value = (x: number) => (counts.table++, value(x));
    }
    const chiAtU = model.chiAtU.bind(m);
    model.chiAtU = (u: number) => (counts.exact++, chiAtU(u));
    return counts;
  }

  test.each([
    // quantity                    value  | first call: look-ups, exact | again (nodes kept): look-ups, exact   (measured)
    ["comovingDistance",           3000,    4,   0,                       4,   0],
    ["comovingDistance",           10,      4,   0,                       4,   0],
    ["lookbackTime",               5,       5,   0,                       5,   0],
    ["lookbackTime",               12,      5,   0,                       5,   0],     // above half the age: by the age table
    ["age",                        1,       3,   0,                       3,   0],
    ["comovingVolume",             1e11,    4,   0,                       4,   0],
    ["luminosityDistance",         6000,    36,  40,                      7,   7],     // node values up to z ≈ 0.9 first
    ["distanceModulus",            44,      37,  41,                      7,   7],
    ["angularDiameterDistance",    1500,    30,  34,                      11,  11],
  ] as const)("%s %d: Newton from the interpolated node costs a few look-ups", (quantity, value, firstTable, firstExact, table, exact) => {
    // P18-BAO; a worse start or bracket costs more: bisection alone would take about 50 steps
    const m = Cosmology.fromSpec("P18-BAO");
    const counts = counting(m);
    const z = m.redshiftAt(quantity, value);
    expect(counts.table).toBeLessThanOrEqual(firstTable);
    expect(counts.exact).toBeLessThanOrEqual(firstExact);
    Object.assign(counts, { table: 0, exact: 0 });
    const again = m.redshiftAt(quantity, value * 0.999);
    expect(Math.abs(again - z)).toBeGreaterThan(0);
    expect(counts.table).toBeLessThanOrEqual(table);
    expect(counts.exact).toBeLessThanOrEqual(exact);
  });
});
