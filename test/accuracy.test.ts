/**
 * The fast path (tables) against the independent slow path (test/reference/slowCosmology.ts, tanh-sinh
 * quadrature of the same equations): relative error ≤ 1e-10 over z ∈ [1e-6, 1e4] and ≤ 1e-8 up to 1e7
 * for every kind of model (accuracy target of the engine).
 */
import { describe, expect, test } from "vitest";
import { Cosmology } from "../core/distances/Cosmology.js";
import { distanceQuantities, testModels } from "./fixtures.js";
import { logRedshifts, relativeError } from "./helpers.js";
import { SlowCosmology } from "./reference/slowCosmology.js";

const inner = logRedshifts(-6, 4, 2); // 21 redshifts, 2 a decade
const outer = [1e5, 1e6, 1e7];
const ranges = [
  // label        redshifts     tolerance (engine target)
  { label: "1e-6…1e4", zs: inner, tol: 1e-10 },
  { label: "1e5…1e7",  zs: outer, tol: 1e-8 },
];

const quantities = distanceQuantities;
type Quantity = (typeof quantities)[number];

describe.each(Object.entries(testModels))("fast path matches the slow path: %s", (name, params) => {
  const fast = new Cosmology(params);
  const slow = new SlowCosmology(params);
  const slowValue = (q: Quantity, z: number): number => slow[q](z);

  test.each(ranges)("over z = $label, every distance, time and volume within $tol", ({ label: _label, zs, tol }) => {
    const worst: Record<string, number> = {};
    for (const q of quantities) {
      worst[q] = 0;
      for (const z of zs) worst[q] = Math.max(worst[q], relativeError(fast[q](z), slowValue(q, z)));
    }
    console.log(`${name} ${_label}: ${quantities.map((q) => `${q}=${worst[q].toExponential(1)}`).join(" ")}`);
    for (const q of quantities) expect(worst[q], `${q} over ${_label}`).toBeLessThanOrEqual(tol);
  });
});
