/**
 * The shared Fermi–Dirac table, computed by one fixed exp-sinh rule and stored in the bundle, is the
 * integral it claims to be: every node equals an adaptive Gauss–Kronrod evaluation of the same
 * integrals, and the stored nodes are the rule's.
 */
import { describe, expect, test } from "vitest";
import { fermiDiracDensityFactor, fermiDiracGrid, fermiDiracNodesByQuadrature, fermiDiracNodesByRule } from "../core/model/fermiDirac.js";
import { fermiDiracNodes } from "../core/model/fermiDiracNodes.js";
import { relativeError } from "./helpers.js";
import { slowFermiDirac } from "./reference/slowCosmology.js";

describe("Fermi–Dirac table by the fixed rule", () => {
  test("every node (F, dF/ds, d²F/ds²) matches adaptive quadrature to 2e-15 relative", () => {
    const stored = fermiDiracNodes;
    const fresh = fermiDiracNodesByQuadrature();
    expect(stored.length).toBe(3 * fermiDiracGrid.nodes);
    let worst = 0;
    for (let i = 0; i < stored.length; i++) worst = Math.max(worst, relativeError(stored[i], fresh[i]));
    // a few ulps: the adaptive reference is itself asked for 1e-15 (measured worst 1.1e-15)
    expect(worst).toBeLessThanOrEqual(2e-15);
  });

  test("the stored nodes are the rule's, digit for digit (else run npm run tables)", () => {
    expect(fermiDiracNodes).toEqual(Array.from(fermiDiracNodesByRule()));
  });

  test.each([
    // y           reference: independent tanh-sinh quadrature (test/reference/slowCosmology.ts, itself to ~1e-11)
    [1e-3,         1e-11],
    [0.37,         1e-11],
    [1,            1e-11],
    [12.5,         1e-11],
    [358,          1e-11],
    [1000,         1e-11],
  ])("F(%d) read from the table agrees with an independent quadrature within %d", (y, tol) => {
    expect(relativeError(fermiDiracDensityFactor(y), slowFermiDirac(y))).toBeLessThanOrEqual(tol);
  });
});
