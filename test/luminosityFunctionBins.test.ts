/**
 * The binned 1/V_max luminosity function (Schmidt 1968; Felten 1976): which bin a value falls in (the
 * low edge belongs to the bin, the top edge to the last bin), Φ = Σ 1/V_max / Δ and σ_Φ = √(Σ 1/V_max²) / Δ
 * written out for a few invented sources.
 */
import { expect, test } from "vitest";
import { binnedLuminosityFunction } from "../core/index.js";

const tol = 1e-15; // relative: a sum of two or three terms

function expectBins(actual: ReturnType<typeof binnedLuminosityFunction>, expected: [count: number, phi: number, phiError: number][]): void {
  expect(actual.map((b) => b.count)).toEqual(expected.map(([count]) => count));
  actual.forEach((bin, i) => {
    const [, phi, phiError] = expected[i];
    expect(Math.abs(bin.phi - phi), `phi of bin ${i}`).toBeLessThanOrEqual(tol * phi);
    expect(Math.abs(bin.phiError - phiError), `phiError of bin ${i}`).toBeLessThanOrEqual(tol * phiError);
  });
}

test("a value on an inner edge counts in the bin above, one on the top edge in the last bin, one outside in none", () => {
  // invented sources: 42.1 in [42, 42.5); 42.5 and 43 in [42.5, 43]; 41.9 and 43.1 outside
  const bins = binnedLuminosityFunction([42.1, 42.5, 43, 41.9, 43.1], [1e6, 2e6, 4e6, 1e5, 1e5], [42, 42.5, 43]);
  expectBins(bins, [
    // N | Φ = Σ 1/V_max / Δ           | σ_Φ = √(Σ 1/V_max²) / Δ  (the estimator's definition, file comment)
    [1,   1e-6 / 0.5,                  1e-6 / 0.5],
    [2,   (1 / 2e6 + 1 / 4e6) / 0.5,   Math.sqrt(1 / 2e6 ** 2 + 1 / 4e6 ** 2) / 0.5],
  ]);
  expect(bins.map((b) => [b.low, b.high])).toEqual([[42, 42.5], [42.5, 43]]);
});

test("values spread over five bins of unequal width each land in their own bin, edges included from below", () => {
  const edges = [-24, -23, -22.5, -21, -20, -18]; // magnitudes, invented
  const values = [-23.5, -23, -22.5, -22, -21, -20.5, -20, -18, -19];
  const vMax = [1e7, 2e7, 5e6, 4e6, 1e6, 2e6, 8e5, 5e5, 1e5];
  const bins = binnedLuminosityFunction(values, vMax, edges);
  const inv = (v: number): number => 1 / v;
  expectBins(bins, [
    [1, inv(1e7) / 1,                       inv(1e7) / 1],
    [1, inv(2e7) / 0.5,                     inv(2e7) / 0.5],
    [2, (inv(5e6) + inv(4e6)) / 1.5,        Math.hypot(inv(5e6), inv(4e6)) / 1.5],
    [2, (inv(1e6) + inv(2e6)) / 1,          Math.hypot(inv(1e6), inv(2e6)) / 1],
    [3, (inv(8e5) + inv(5e5) + inv(1e5)) / 2, Math.hypot(inv(8e5), inv(5e5), inv(1e5)) / 2],
  ]);
});

test("an empty bin has N = Φ = σ = 0", () => {
  const bins = binnedLuminosityFunction([1.5], [10], [0, 1, 2]);
  expect(bins[0]).toEqual({ low: 0, high: 1, count: 0, phi: 0, phiError: 0 });
  expect(bins[1]).toEqual({ low: 1, high: 2, count: 1, phi: 0.1, phiError: 0.1 });
});
