/**
 * Flux-limited samples: the largest redshift at which a source stays at or above a survey's flux
 * limit, and the comoving volume within which it would have been seen (V_max of the 1/V_max estimator,
 * Schmidt 1968, ApJ 151, 393).
 *
 * A source of luminosity L (bolometric, or L_ν for a power law S_ν ∝ ν^α) has the observed flux
 * F(z) = L (1+z)^(1+α) / (4π D_L²) (Hogg 1999 eqs. 22–24; α = −1 is the bolometric case). The margin
 * g(u) = ln(F/F_lim) = c + (1+α) u − 2 ln|D_L| in u = ln(1+z) is scanned upward from z = 0 (where it is
 * +∞) and the first crossing of zero is solved by safeguarded Newton with the exact derivative
 * dg/du = (1+α) − 2 (1+z) d ln D_L/dz. Where F rises again at high z (α > 1, or near the antipode
 * of a closed model) the first crossing is the answer.
 */
import { megaparsecM, parsecM } from "../units/constants.js";
import type { Cosmology } from "../distances/Cosmology.js";
import { luminosityDistanceLogSlope } from "../distances/distanceSlopes.js";
import { NoSolutionError } from "../checks/NoSolutionError.js";
import { requireFiniteNumber, requireNonNegative } from "../checks/numberChecks.js";
import { checkRedshift } from "../checks/redshift.js";
import { solveBracketed } from "../numerics/solveBracketed.js";

/** Redshift where the scan ends: the model's tables end at z = 1e8. */
const scanEndRedshift = 1e8;
/** The scan: u = 2^-30 … 1 doubling, then steps of 1/8 in u (features of g are ≳ 1 wide in u). */
const firstU = 2 ** -30;
const linearStepU = 1 / 8;

/** The first z where c + (1+α)u − 2 ln|D_L/Mpc| falls to 0; `limit` names the limit in the message. */
function firstCrossing(model: Cosmology, c: number, alpha: number, limit: string): number {
  const g = (u: number) => c + (1 + alpha) * u - 2 * Math.log(Math.abs(model.luminosityDistanceMpc(Math.expm1(u))));
  const dg = (u: number) => {
    const z = Math.expm1(u);
    return 1 + alpha - 2 * (1 + z) * luminosityDistanceLogSlope(model, z);
  };
  const uEnd = Math.log1p(scanEndRedshift);
  // Where z ≪ 1 the flux falls monotonically (dg/du ≈ −2/z dominates 1+α), so the scan may start at
  // a small z that is still above the limit: half the Euclidean estimate D_H z = √(L/4πF), at most
  // 0.1/(1 + |1+α|). This skips the tiny redshifts whose distances are direct integrals.
  let lo = 0;
  let gLo = Number.POSITIVE_INFINITY;
  const euclidean = Math.exp(c / 2) / model.hubbleDistanceMpc;
  const safe = Math.log1p(Math.min(0.5 * euclidean, 0.1 / (1 + Math.abs(1 + alpha))));
  if (safe > firstU) {
    const gSafe = g(safe);
    if (gSafe > 0) [lo, gLo] = [safe, gSafe];
  }
  let u = lo === 0 ? firstU : lo < 1 ? 2 * lo : lo + linearStepU;
  for (;;) {
    const gu = g(u);
    if (gu <= 0) {
      // Newton from the secant between the last two scan points (the midpoint when g(lo) = +∞)
      const start = Number.isFinite(gLo) ? lo + ((u - lo) * gLo) / (gLo - gu) : 0.5 * (lo + u);
      return Math.expm1(solveBracketed((x) => -g(x), (x) => -dg(x), 0, lo, u, start));
    }
    if (u >= uEnd) break;
    [lo, gLo] = [u, gu];
    u = u < 1 ? 2 * u : Math.min(u + linearStepU, uEnd);
  }
  throw new NoSolutionError(`the source stays ${limit} out to z = 1e8, where this model's tables end`);
}

/**
 * The largest redshift at which a source stays at or above a flux limit (the first crossing).
 *
 * @param model the cosmology
 * @param luminosity bolometric luminosity [W] (alpha = −1), or spectral luminosity L_ν [W Hz⁻¹], > 0
 * @param fluxLimit the limit: bolometric flux [W m⁻²], or flux density [W m⁻² Hz⁻¹], > 0
 * @param alpha spectral index α of S_ν ∝ ν^α; −1 (the default) is the bolometric case
 * @returns z_max > 0
 * @throws NoSolutionError when the flux stays above the limit out to z = 1e8
 * @example limitingRedshift(Cosmology.fromSpec("P18-BAO"), 1e38, 1e-16) // 1.2727
 */
export function limitingRedshift(model: Cosmology, luminosity: number, fluxLimit: number, alpha = -1): number {
  requireNonNegative("luminosity", luminosity, "", true);
  requireNonNegative("flux limit", fluxLimit, "", true);
  requireFiniteNumber("alpha", alpha);
  const c = Math.log(luminosity / fluxLimit / (4 * Math.PI * megaparsecM * megaparsecM));
  return firstCrossing(model, c, alpha, "at or above the flux limit");
}

/**
 * The largest redshift at which a source of absolute magnitude M stays at or brighter than a limiting
 * apparent magnitude: m(z) = M + μ(z) + K(z) ≤ m_lim, with the power-law K-correction
 * K = −2.5 (1+α) log10(1+z) (K = 0 for α = −1, the default).
 *
 * @param model the cosmology
 * @param absoluteMag M [mag]
 * @param magLimit m_lim [mag]
 * @param alpha spectral index α of S_ν ∝ ν^α (default −1: no K-correction)
 * @returns z_max > 0
 * @throws NoSolutionError when the source stays brighter than the limit out to z = 1e8
 * @example limitingRedshiftMag(Cosmology.fromSpec("P18-BAO"), -21, 17.77) // 0.11789
 */
export function limitingRedshiftMag(model: Cosmology, absoluteMag: number, magLimit: number, alpha = -1): number {
  requireFiniteNumber("abs_mag", absoluteMag);
  requireFiniteNumber("mag_limit", magLimit);
  requireFiniteNumber("alpha", alpha);
  // m_lim − m ≥ 0 ⇔ 0.4 ln10 (m_lim − M) − 2 ln(D_L / 10 pc) + (1+α) ln(1+z) ≥ 0
  const c = 0.4 * Math.LN10 * (magLimit - absoluteMag) - 2 * Math.log(megaparsecM / (10 * parsecM));
  return firstCrossing(model, c, alpha, "at or brighter than the magnitude limit");
}

/**
 * V_max: the comoving volume over a sky area between max(z_lo, z_min) and min(z_max, z_hi) (Schmidt
 * 1968), 0 when that range is empty; 1/V_max is the source's weight in a luminosity function. z_min is
 * the source's bright limit: the lowest redshift at which it would enter the sample (0 when the sample
 * has no bright limit).
 *
 * @param model the cosmology
 * @param zMax the source's limiting redshift (faint limit), ≥ 0
 * @param zLo the sample's lower redshift bound, ≥ 0
 * @param zHi the sample's upper redshift bound, ≥ zLo
 * @param areaSr the survey's area [sr], 0 … 4π
 * @param zMin the source's bright-limit redshift, ≥ 0 (default 0)
 * @returns Mpc³; zMax ≥ zHi and zMin ≤ zLo give the whole survey volume between zLo and zHi
 * @example maxVolumeMpc3(Cosmology.fromSpec("P18-BAO"), 2, 0.1, 1, 0.1) // 1.3023e9
 */
export function maxVolumeMpc3(model: Cosmology, zMax: number, zLo: number, zHi: number, areaSr: number, zMin = 0): number {
  checkRedshift(zMax, "z_max");
  checkRedshift(zLo, "z_lo");
  checkRedshift(zHi, "z_hi");
  checkRedshift(zMin, "z_min");
  if (zHi < zLo) throw new RangeError(`z_hi = ${zHi} is below z_lo = ${zLo}`);
  const from = Math.max(zLo, zMin);
  const to = Math.min(zMax, zHi);
  if (to <= from) return 0;
  return model.comovingVolumeShellMpc3(from, to, areaSr);
}
