/**
 * The χ² of a Hubble diagram against a model: χ² = Σ ((μ_i − μ_model(z_i) − offset) / σ_i)². The
 * offset absorbs what a Hubble diagram cannot separate from it (H0 against the absolute magnitude of
 * the standard candle); when it is free, χ² is minimised over it analytically: with
 * Δ_i = μ_i − μ_model(z_i) and w_i = 1/σ_i², the minimum is at the weighted mean Δ̄ = Σ wΔ / Σ w,
 * min χ² = Σ w (Δ − Δ̄)² (= A − B²/C with A = Σ wΔ², B = Σ wΔ, C = Σ w; Goliath et al. 2001, A&A 380, 6).
 * It is summed in that first form, in two passes: A − B²/C cancels when the offset is large (1,000
 * rows of apparent magnitudes, offset near −19 mag: 8e-10 relative) and could fall below 0;
 * Σ w (Δ − Δ̄)² is ≥ 0 and exactly 0 for one row, the weighted mean updated row by row (West 1979,
 * Commun. ACM 22, 532: the first row's mean is that row's Δ exactly).
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
  const free = Number.isNaN(offset);
  const residuals = free ? new Float64Array(z.length) : undefined;
  let fixedSum = 0; // Σ w Δ² with the offset given
  let weights = 0;
  let mean = 0; // the weighted mean of Δ so far, when the offset is free
  for (let i = 0; i < z.length; i++) {
    const s = muErr[i];
    if (!(s > 0 && s < Number.POSITIVE_INFINITY)) throw new RangeError(`mu_err ${i} = ${s} must be > 0 and finite`);
    if (!Number.isFinite(mu[i])) throw new RangeError(`mu ${i} is not a finite number`);
    if (!(z[i] > 0 && z[i] < Number.POSITIVE_INFINITY)) throw new RangeError(`z ${i} = ${z[i]} must be > 0 and finite`);
    const w = 1 / (s * s);
    const d = mu[i] - model.distanceModulusMag(z[i]) - (free ? 0 : offset);
    if (residuals) {
      residuals[i] = d;
      weights += w;
      mean += (w / weights) * (d - mean);
    } else {
      fixedSum += d * d * w;
    }
  }
  if (!residuals) return fixedSum;
  let sum = 0;
  for (let i = 0; i < residuals.length; i++) {
    const s = muErr[i];
    const e = residuals[i] - mean;
    sum += e * e * (1 / (s * s));
  }
  return sum;
}
