/**
 * The χ² of a Hubble diagram against a model: χ² = Σ ((μ_i − μ_model(z_i) − offset) / σ_i)². The
 * offset absorbs what a Hubble diagram cannot separate from it (H0 against the absolute magnitude of
 * the standard candle); when it is free, χ² is minimised over it analytically: with
 * Δ_i = μ_i − μ_model(z_i), A = Σ Δ²/σ², B = Σ Δ/σ², C = Σ 1/σ², min χ² = A − B²/C at offset = B/C
 * (Goliath et al. 2001, A&A 380, 6).
 */
import type { Cosmology } from "../distances/Cosmology.js";

/**
 * χ² of distance moduli against a model.
 * @param model the cosmology
 * @param z redshifts, > 0
 * @param mu distance moduli [mag]
 * @param muErr their 1σ errors [mag], > 0
 * @param offset a fixed offset in μ [mag]; NaN (the default) minimises over it
 * @returns χ² (dimensionless)
 * @throws RangeError naming the index (from 0) of a bad entry
 * @example hubbleDiagramChi2(Cosmology.fromSpec("EDS"), [1], [44], [0.1], 0) // 24.755 (((44 − 43.5025)/0.1)²)
 */
export function hubbleDiagramChi2(model: Cosmology, z: ArrayLike<number>, mu: ArrayLike<number>, muErr: ArrayLike<number>, offset = Number.NaN): number {
  if (z.length !== mu.length || z.length !== muErr.length) throw new RangeError(`z, mu and mu_err have ${z.length}, ${mu.length} and ${muErr.length} entries`);
  let a = 0;
  let b = 0;
  let c = 0;
  for (let i = 0; i < z.length; i++) {
    const s = muErr[i];
    if (!(s > 0 && s < Number.POSITIVE_INFINITY)) throw new RangeError(`mu_err ${i} = ${s} must be > 0 and finite`);
    if (!Number.isFinite(mu[i])) throw new RangeError(`mu ${i} is not a finite number`);
    if (!(z[i] > 0 && z[i] < Number.POSITIVE_INFINITY)) throw new RangeError(`z ${i} = ${z[i]} must be > 0 and finite`);
    const w = 1 / (s * s);
    const d = mu[i] - model.distanceModulusMag(z[i]) - (Number.isNaN(offset) ? 0 : offset);
    a += d * d * w;
    b += d * w;
    c += w;
  }
  return Number.isNaN(offset) ? (c > 0 ? a - (b * b) / c : 0) : a;
}
