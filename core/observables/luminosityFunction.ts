/**
 * The binned luminosity (or mass) function by the 1/V_max estimator (Schmidt 1968, ApJ 151, 393; the
 * binned form of Felten 1976, ApJ 207, 700): in each bin of width Δ, Φ = Σ 1/V_max,i / Δ and its
 * Poisson error σ_Φ = √(Σ 1/V_max,i²) / Δ, per unit of the binned quantity (per dex for log10 L, per
 * mag for magnitudes) per unit volume (per Mpc³ when V_max is in Mpc³).
 */

/** One bin of the estimate. */
export interface LuminosityFunctionBin {
  low: number;
  high: number;
  /** Sources in the bin. */
  count: number;
  /** Φ = Σ 1/V_max / Δ. */
  phi: number;
  /** σ_Φ = √(Σ 1/V_max²) / Δ. */
  phiError: number;
}

/**
 * Bins sources by value and sums their 1/V_max weights. A value in [low, high) counts in that bin (the
 * last bin includes its high edge); a value outside all bins is ignored; an empty bin has N = Φ = σ = 0.
 * @param values each source's binned quantity (e.g. log10 L), finite
 * @param vMax each source's V_max, > 0 (the same length as values)
 * @param edges bin edges, strictly increasing, at least two
 * @returns one entry per bin
 * @throws RangeError naming the index (from 0) of a bad V_max or edge
 * @example binnedLuminosityFunction([42.1, 42.3, 42.7], [1e6, 2e6, 4e6], [42, 42.5, 43])[0].phi // 3e-6 ((1/1e6 + 1/2e6) / 0.5)
 */
export function binnedLuminosityFunction(values: ArrayLike<number>, vMax: ArrayLike<number>, edges: ArrayLike<number>): LuminosityFunctionBin[] {
  if (values.length !== vMax.length) throw new RangeError(`values has ${values.length} entries and v_max ${vMax.length}`);
  if (edges.length < 2) throw new RangeError("edges needs at least two values (one bin)");
  for (let i = 0; i < edges.length; i++) {
    if (!Number.isFinite(edges[i])) throw new RangeError(`edge ${i} is not a finite number`);
    if (i > 0 && !(edges[i] > edges[i - 1])) throw new RangeError(`edges must increase: edge ${i} = ${edges[i]} is not above ${edges[i - 1]}`);
  }
  const bins = Array.from({ length: edges.length - 1 }, (_, i) => ({ low: edges[i], high: edges[i + 1], count: 0, sum: 0, sum2: 0 }));
  const bottom = edges[0];
  const top = edges[edges.length - 1];
  for (let i = 0; i < values.length; i++) {
    const x = values[i];
    const v = vMax[i];
    if (!(v > 0 && v < Number.POSITIVE_INFINITY)) throw new RangeError(`v_max ${i} = ${v} must be > 0 and finite`);
    if (!Number.isFinite(x)) throw new RangeError(`value ${i} is not a finite number`);
    if (x < bottom || x > top) continue;
    // the bin with low ≤ x < high (binary search; the top edge belongs to the last bin)
    let lo = 0;
    let hi = bins.length - 1;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if (x >= bins[mid].low) lo = mid;
      else hi = mid - 1;
    }
    const bin = bins[lo];
    bin.count++;
    bin.sum += 1 / v;
    bin.sum2 += 1 / (v * v);
  }
  return bins.map(({ low, high, count, sum, sum2 }) => ({ low, high, count, phi: sum / (high - low), phiError: Math.sqrt(sum2) / (high - low) }));
}
