/**
 * The spectral index between two bands, in zcell's sign: α of S_ν ∝ ν^α (so optically thin
 * synchrotron has α ≈ −0.7), α = ln(S1/S2)/ln(ν1/ν2), and its 1σ error to first order from
 * independent errors of the two flux densities (the bands taken as exact). Common practice.
 */
import { requireNonNegative } from "../checks/numberChecks.js";

function checkBands(nu1Hz: number, nu2Hz: number): number {
  requireNonNegative("band1", nu1Hz, "Hz", true);
  requireNonNegative("band2", nu2Hz, "Hz", true);
  const lnRatio = Math.log(nu1Hz / nu2Hz);
  if (lnRatio === 0) throw new RangeError("band1 and band2 are the same frequency: an index needs two different bands");
  return lnRatio;
}

/**
 * α = ln(S1/S2)/ln(ν1/ν2) for S_ν ∝ ν^α.
 * @param flux1 flux density at ν1, > 0 (any unit, the same as flux2)
 * @param nu1Hz first band's frequency [Hz], > 0
 * @param flux2 flux density at ν2, > 0
 * @param nu2Hz second band's frequency [Hz], > 0, ≠ ν1
 * @returns α (dimensionless)
 * @example spectralIndexBetween(10, 1.4e9, 5, 5.6e9) // -0.5 (half the flux at four times the frequency)
 */
export function spectralIndexBetween(flux1: number, nu1Hz: number, flux2: number, nu2Hz: number): number {
  const lnRatio = checkBands(nu1Hz, nu2Hz);
  requireNonNegative("flux_density1", flux1, "", true);
  requireNonNegative("flux_density2", flux2, "", true);
  return Math.log(flux1 / flux2) / lnRatio;
}

/**
 * 1σ error of α = ln(S1/S2)/ln(ν1/ν2) from independent errors of S1 and S2, to first order:
 * σ_α = √((σ1/S1)² + (σ2/S2)²) / |ln(ν1/ν2)|.
 * @param flux1 flux density at ν1, > 0
 * @param nu1Hz first band [Hz], > 0
 * @param flux2 flux density at ν2, > 0 (same unit as flux1)
 * @param nu2Hz second band [Hz], > 0, ≠ ν1
 * @param err1 1σ error of flux1, ≥ 0 (same unit)
 * @param err2 1σ error of flux2, ≥ 0 (same unit)
 * @returns σ_α (dimensionless)
 * @example spectralIndexBetweenError(10, 1.4e9, 5, 5.6e9, 0.3, 0.2) // ≈ 0.036067 (0.05/ln 4: √(0.03² + 0.04²) = 0.05)
 */
export function spectralIndexBetweenError(flux1: number, nu1Hz: number, flux2: number, nu2Hz: number, err1: number, err2: number): number {
  const lnRatio = checkBands(nu1Hz, nu2Hz);
  requireNonNegative("flux_density1", flux1, "", true);
  requireNonNegative("flux_density2", flux2, "", true);
  requireNonNegative("err1", err1);
  requireNonNegative("err2", err2);
  return Math.hypot(err1 / flux1, err2 / flux2) / Math.abs(lnRatio);
}
