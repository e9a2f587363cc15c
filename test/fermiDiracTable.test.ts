/**
 * The Fermi–Dirac table shipped in the bundle (core/fermiDiracTable.ts, written by npm run tables) is
 * the quadrature it claims to be: every stored node equals a fresh adaptive Gauss–Kronrod evaluation.
 */
import { describe, expect, test } from "vitest";
import { fermiDiracDensityFactor, fermiDiracGrid, fermiDiracNodesByQuadrature, fermiDiracStoredNodes } from "../core/fermiDirac.js";
import { relativeError } from "./helpers.js";
import { slowFermiDirac } from "./reference/slowCosmology.js";

describe("stored Fermi–Dirac table", () => {
  test("every node (F, dF/ds, d²F/ds²) matches quadrature run now to 1e-15 relative", () => {
    const stored = fermiDiracStoredNodes();
    const fresh = fermiDiracNodesByQuadrature();
    expect(stored.length).toBe(3 * fermiDiracGrid.nodes);
    let worst = 0;
    for (let i = 0; i < stored.length; i++) worst = Math.max(worst, relativeError(stored[i], fresh[i]));
    expect(worst).toBeLessThanOrEqual(1e-15); // bit-equal on the machine that wrote it; libm may differ by an ulp elsewhere
  });

  test.each([
    // y           reference: independent tanh-sinh quadrature (test/reference/slowCosmology.ts, itself to ~1e-11)
    [1e-3,         1e-11],
    [0.37,         1e-11],
    [1,            1e-11],
    [12.5,         1e-11],
    [358,          1e-11],
    [1000,         1e-11],
  ])("F(%d) read from the stored table agrees with an independent quadrature within %d", (y, tol) => {
    expect(relativeError(fermiDiracDensityFactor(y), slowFermiDirac(y))).toBeLessThanOrEqual(tol);
  });
});
