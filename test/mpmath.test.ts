/**
 * 30-digit checks with the reference arbitrary-precision library (Debian python3-mpmath): the exact
 * Fermi–Dirac factor and distances/times on a dozen model × redshift points, at ≤ 1e-11 (two of them
 * with massive neutrinos, evaluated at 20 digits since each E(z) then holds a quadrature).
 */
import { describe, expect, test } from "vitest";
import { Cosmology } from "../core/distances/Cosmology.js";
import { fermiDiracDensityFactor } from "../core/model/fermiDirac.js";
import type { ModelParameters } from "../core/model/ModelParameters.js";
import { testModels } from "./fixtures.js";
import { relativeError } from "./helpers.js";
import { referenceAvailable, runPythonReference } from "./reference/python.js";
import { onFirstUse } from "./requirements.js";

const ys = [1e-3, 0.3, 1, 3.7, 12, 358, 2000];
const points: [string, number][] = [
  ["flat ΛCDM, no radiation", 0.7],
  ["flat ΛCDM, no radiation", 1100],
  ["open, radiation, massless ν", 2],
  ["open, radiation, massless ν", 3e4],
  ["open w0–wa, no radiation", 0.05],
  ["open w0–wa, no radiation", 9],
  ["flat ΛCDM, no radiation", 3e6],
  ["open, radiation, massless ν", 1e-5],
  ["open w0–wa, no radiation", 400],
  ["flat ΛCDM, no radiation", 0.01],
  ["flat ΛCDM + radiation + 0.06 eV ν", 1],
  ["closed, radiation, three massive ν", 40],
];

type Reply = { fermi: number[]; results: Record<string, { dc: number; lookback: number; age: number }> };

describe.runIf(referenceAvailable("mpmath", "python3-mpmath"))("30-digit reference (python3-mpmath)", () => {
  const cases = points.map(([name, z], i) => {
    const p: ModelParameters = testModels[name];
    return { id: String(i), H0: p.H0, Om: p.Om, OL: p.OL ?? null, w0: p.w0, wa: p.wa, Tcmb: p.Tcmb, Neff: p.Neff, mnu: p.mnu, z };
  });
  const reply = onFirstUse(() => runPythonReference<Reply>("mpmath_reference.py", { fermi: ys, cases }));

  test("F(y) to 1e-11", () => {
    const errors = ys.map((y, k) => relativeError(fermiDiracDensityFactor(y), reply().fermi[k]));
    console.log(`mpmath: worst F(y) error ${Math.max(...errors).toExponential(1)}`);
    ys.forEach((y, k) => expect(errors[k], `y=${y}`).toBeLessThanOrEqual(1e-11));
  });

  test.each(points.map(([name, z], i) => ({ name, z, i })))("$name at z = $z: D_C, look-back and age to 1e-11", ({ name, z, i }) => {
    const m = new Cosmology(testModels[name]);
    const r = reply().results[String(i)];
    const errors = [relativeError(m.comovingDistanceMpc(z), r.dc), relativeError(m.lookbackTimeGyr(z), r.lookback), relativeError(m.ageGyr(z), r.age)];
    console.log(`mpmath, ${name} z=${z}: D_C ${errors[0].toExponential(1)} t_L ${errors[1].toExponential(1)} age ${errors[2].toExponential(1)}`);
    expect(relativeError(m.comovingDistanceMpc(z), r.dc), "D_C").toBeLessThanOrEqual(1e-11);
    expect(relativeError(m.lookbackTimeGyr(z), r.lookback), "look-back").toBeLessThanOrEqual(1e-11);
    expect(relativeError(m.ageGyr(z), r.age), "age").toBeLessThanOrEqual(1e-11);
  });
});
