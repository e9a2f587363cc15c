/**
 * Population statistics over whole columns: the binned 1/V_max luminosity function and the χ² of a
 * Hubble diagram. The samples are invented (made up for the tests, not measurements); expected values
 * are the sums written out independently here, and a numerical minimisation over the offset.
 */
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { CellError } from "../functions/cellError.js";
import { sheetCalls } from "./sheetCalls.js";
import { expectRelative } from "./helpers.js";

const { run } = sheetCalls("P18-CMB");
const col = (xs: unknown[]) => xs.map((x) => [x]);

// an INVENTED sample of eight sources: log10 L [erg/s] and V_max [Mpc3]
const logL = [42.05, 42.31, 42.48, 42.52, 42.9, 43.2, 43.45, 44.7];
const vMax = [2.1e6, 3.5e6, 4.2e6, 5e6, 9.8e6, 2.2e7, 3.1e7, 8e7];
const edges = [42, 42.5, 43, 43.5, 44];

describe("LUMINOSITY_FUNCTION: binned 1/V_max (Schmidt 1968; Felten 1976)", () => {
  test("each bin's N, Φ = Σ(1/V_max)/Δ and σ_Φ = √Σ(1/V_max²)/Δ, summed independently; values outside the bins ignored", () => {
    const table = run("LUMINOSITY_FUNCTION", col(logL), col(vMax), col(edges));
    expect(table.length).toBe(4);
    for (let b = 0; b < 4; b++) {
      const [low, high] = [edges[b], edges[b + 1]];
      const inBin = logL.map((x, i) => [x, vMax[i]]).filter(([x]) => x >= low && x < high);
      const sum = inBin.reduce((s, [, v]) => s + 1 / v, 0);
      const sum2 = inBin.reduce((s, [, v]) => s + 1 / v ** 2, 0);
      expect(table[b].slice(0, 3)).toEqual([low, high, inBin.length]);
      expectRelative(table[b][3] as number, sum / 0.5, 1e-14, `Φ bin ${b}`);
      expectRelative(table[b][4] as number, Math.sqrt(sum2) / 0.5, 1e-14, `σ bin ${b}`);
    }
    expect(table[3].slice(2)).toEqual([0, 0, 0]); // 43.5–44 is empty (44.7 lies outside every bin)
  });

  test("a value on an inner edge counts in the bin above; the top edge belongs to the last bin", () => {
    const table = run("LUMINOSITY_FUNCTION", col([42.5, 43]), col([1e6, 1e6]), col([42, 42.5, 43]));
    expect(table.map((r) => r[2])).toEqual([0, 2]);
  });

  test("blank rows are skipped; a non-positive V_max is #NUM! naming its row", () => {
    const withBlank = run("LUMINOSITY_FUNCTION", col([42.1, "", 42.2]), col([1e6, "", 2e6]), col([42, 43, ""]));
    expectRelative(withBlank[0][3] as number, (1 / 1e6 + 1 / 2e6) / 1, 1e-14, "blank row skipped");
    const bad = run("LUMINOSITY_FUNCTION", col([42.1, 42.2, 42.3]), col([1e6, -5, 2e6]), col(edges))[0][0] as CellError;
    expect(bad.kind).toBe("num");
    expect(bad.message).toBe("ZC.LUMINOSITY_FUNCTION: v_max in row 2 of the range: -5 must be > 0 and finite");
    const half = run("LUMINOSITY_FUNCTION", col([42.1, 42.2]), col([1e6, ""]), col(edges))[0][0] as CellError;
    expect(half.message).toBe("ZC.LUMINOSITY_FUNCTION: v_max in row 2 of the range: blank where the other columns of the row hold values");
    const edgesDown = run("LUMINOSITY_FUNCTION", col([42.1]), col([1e6]), col([43, 42]))[0][0] as CellError;
    expect(edgesDown.message).toBe("ZC.LUMINOSITY_FUNCTION: edges: edges must increase: edge 1 = 42 is not above 43");
    const unequal = run("LUMINOSITY_FUNCTION", col([42.1, 42.2]), col([1e6]), col(edges))[0][0] as CellError;
    expect(unequal.message).toBe("ZC.LUMINOSITY_FUNCTION: values has 2 cells and v_max has 1: give columns of the same length");
  });
});

describe("CHI2_MODULUS: a Hubble diagram against a model", () => {
  // INVENTED supernova-like sample: z, μ [mag], σ_μ [mag]
  const z = [0.02, 0.05, 0.11, 0.3, 0.52, 0.8, 1.1];
  const muModel = z.map((zz) => run("MODULUS", zz)[0][0] as number);
  const scatter = [0.05, -0.12, 0.08, 0.02, -0.07, 0.11, -0.03];
  const mu = muModel.map((m, i) => m + 0.2 + scatter[i]); // a constant offset of 0.2 mag plus scatter
  const err = [0.1, 0.12, 0.1, 0.15, 0.14, 0.18, 0.2];
  const chi2At = (offset: number) => mu.reduce((s, m, i) => s + ((m - muModel[i] - offset) / err[i]) ** 2, 0);

  test("a fixed offset: the sum written out with ZC.MODULUS row by row", () => {
    for (const offset of [0, 0.2, -0.5]) {
      expectRelative(run("CHI2_MODULUS", col(z), col(mu), col(err), "", offset)[0][0] as number, chi2At(offset), 1e-12, `offset ${offset}`);
    }
  });

  test("a blank offset is the minimum over it: A − B²/C (Goliath et al. 2001) equals a golden-section search", () => {
    let [lo, hi] = [-2, 2];
    const g = (Math.sqrt(5) - 1) / 2;
    for (let k = 0; k < 200; k++) {
      const a = hi - g * (hi - lo);
      const b = lo + g * (hi - lo);
      if (chi2At(a) < chi2At(b)) hi = b;
      else lo = a;
    }
    const minimum = chi2At((lo + hi) / 2);
    expectRelative(run("CHI2_MODULUS", col(z), col(mu), col(err))[0][0] as number, minimum, 1e-10, "analytic minimum");
    expect(minimum).toBeLessThan(chi2At(0.2)); // the best offset beats the true one on a scattered sample
  });

  test("a model in the sheet: a what-if over models compares χ² (the sample favours P18-CMB over EDS)", () => {
    const p18 = run("CHI2_MODULUS", col(z), col(mu), col(err), "P18-CMB")[0][0] as number;
    const eds = run("CHI2_MODULUS", col(z), col(mu), col(err), "EDS")[0][0] as number;
    expect(eds).toBeGreaterThan(p18 + 10);
  });

  test("one row with the offset minimised is exactly 0: the offset takes up the whole residual", () => {
    expect(run("CHI2_MODULUS", 0.657, 34.78, 0.18)[0][0]).toBe(0); // 0.3.0 before this fix: -4.55e-13
    for (const [zz, m, e] of [[0.01, 33.2, 0.05], [1.5, 45.1, 0.3], [0.3, 21.7, 0.12]]) expect(run("CHI2_MODULUS", zz, m, e)[0][0], `z = ${zz}`).toBe(0);
  });

  test("with the offset minimised: Σ w (Δ − Δ̄)² written out in two passes (weighted mean first), to 1e-12 (or the rounding of μ), never negative (300 random invented samples, offsets up to ±25 mag as for apparent magnitudes)", () => {
    // Δ_i = μ_i − ZC.MODULUS(z_i), w_i = 1/σ_i²; min over the offset of Σ w (Δ − offset)² is at the
    // weighted mean Δ̄ (the least-squares mean, common practice)
    const row = fc.tuple(fc.double({ min: 0.005, max: 3, noNaN: true }), fc.double({ min: -0.5, max: 0.5, noNaN: true }), fc.double({ min: 0.01, max: 1, noNaN: true }));
    fc.assert(
      fc.property(fc.double({ min: -25, max: 25, noNaN: true }), fc.array(row, { minLength: 2, maxLength: 30 }), (offset, rows) => {
        const zz = rows.map((r) => r[0]);
        const mus = rows.map((r) => (run("MODULUS", r[0])[0][0] as number) + offset + r[1]);
        const errs = rows.map((r) => r[2]);
        const delta = mus.map((m, i) => m - (run("MODULUS", zz[i])[0][0] as number));
        const w = errs.map((e) => 1 / (e * e));
        const mean = delta.reduce((s, d, i) => s + w[i] * d, 0) / w.reduce((s, x) => s + x, 0);
        const direct = delta.reduce((s, d, i) => s + w[i] * (d - mean) ** 2, 0);
        const chi2 = run("CHI2_MODULUS", col(zz), col(mus), col(errs))[0][0] as number;
        expect(chi2).toBeGreaterThanOrEqual(0);
        // below 1e-12 of the sum, or below what the rounding of μ itself (4 ulp of the largest) leaves in it
        const floor = w.reduce((s, x) => s + x, 0) * (4 * Number.EPSILON * Math.max(...mus.map(Math.abs))) ** 2;
        expect(Math.abs(chi2 - direct), `offset ${offset}, ${rows.length} rows: ${chi2} against ${direct}`).toBeLessThanOrEqual(1e-12 * direct + floor);
      }),
      { numRuns: 300, seed: 20260611 },
    );
  });

  test("a non-positive error is #NUM! naming its row; a range for the model is refused", () => {
    const bad = run("CHI2_MODULUS", col(z.slice(0, 3)), col(mu.slice(0, 3)), col([0.1, 0, 0.1]))[0][0] as CellError;
    expect(bad.message).toBe("ZC.CHI2_MODULUS: mu_err in row 2 of the range: 0 must be > 0 and finite");
    const range = run("CHI2_MODULUS", col(z.slice(0, 2)), col(mu.slice(0, 2)), col(err.slice(0, 2)), [["P18-CMB"], ["EDS"]])[0][0] as CellError;
    expect(range.message).toBe("ZC.CHI2_MODULUS: model must be one cell here (the other arguments are whole columns)");
  });
});
