/**
 * A redshift as a velocity, in the three conventions of the trade (common practice; defined alike in
 * the FITS spectral-coordinate paper, Greisen et al. 2006, A&A 446, 747, §3 and Table 1, from memory),
 * with 1 + z = λ_obs/λ_rest = ν_rest/ν_obs:
 *
 * - "optical": v = c z (the "cz" of redshift surveys);
 * - "radio": v = c (ν_rest − ν_obs)/ν_rest = c z/(1 + z);
 * - "relativistic": the line-of-sight speed of special relativity,
 *   v = c ((1+z)² − 1)/((1+z)² + 1), i.e. 1 + z = √((1 + β)/(1 − β)).
 *
 * None of them is a cosmological recession velocity: at cosmological distances a redshift is not a
 * Doppler shift (Davis & Lineweaver 2004, PASA 21, 97). (1+z)² − 1 is written z(2 + z) so that a small z
 * keeps its digits.
 */
import { requireFiniteNumber } from "../checks/numberChecks.js";
import { speedOfLightKmPerS } from "../units/constants.js";

/** The conventions, the first the default. */
export const dopplerConventions = ["optical", "radio", "relativistic"] as const;
export type DopplerConvention = (typeof dopplerConventions)[number];

function unknown(convention: unknown): never {
  throw new TypeError(`unknown convention "${String(convention)}": use ${dopplerConventions.join(", ")}`);
}

/**
 * The velocity a redshift stands for in a convention.
 *
 * @param z redshift, > −1
 * @param convention "optical" (cz), "radio" (cz/(1+z)) or "relativistic"
 * @returns v [km/s]: optical −c … ∞, radio and relativistic −∞ … c and −c … c
 * @throws RangeError unless z > −1 and finite
 * @example velocityKmPerS(0.01, "optical") // 2997.92458
 * @example velocityKmPerS(1, "relativistic") // ≈ 179875.4748 (0.6 c)
 */
export function velocityKmPerS(z: number, convention: DopplerConvention): number {
  requireFiniteNumber("z", z);
  if (!(z > -1)) throw new RangeError(`z = ${z} must be > −1`);
  switch (convention) {
    case "optical":
      return speedOfLightKmPerS * z;
    case "radio":
      return (speedOfLightKmPerS * z) / (1 + z);
    case "relativistic": {
      const s = z * (2 + z); // (1+z)² − 1
      return (speedOfLightKmPerS * s) / (s + 2);
    }
    default:
      return unknown(convention);
  }
}

/**
 * The redshift of a velocity given in a convention (the inverse of `velocityKmPerS`).
 *
 * @param vKmPerS velocity [km/s]: > −c (optical), < c (radio), between −c and c (relativistic)
 * @param convention "optical", "radio" or "relativistic"
 * @returns z, > −1
 * @throws RangeError for a velocity the convention cannot reach
 * @example redshiftOfVelocity(2997.92458, "optical") // 0.01
 * @example redshiftOfVelocity(179875.4748, "relativistic") // ≈ 1.0000000
 */
export function redshiftOfVelocity(vKmPerS: number, convention: DopplerConvention): number {
  requireFiniteNumber("v", vKmPerS);
  const v = vKmPerS;
  const c = speedOfLightKmPerS;
  // c − v and c + v are taken in km/s, exactly for v near ±c (Sterbenz), before any division
  switch (convention) {
    case "optical":
      if (!(v > -c)) throw new RangeError("v must be above −c (−299792.458 km/s): z = v/c > −1");
      return v / c;
    case "radio":
      if (!(v < c)) throw new RangeError("v must be below c (299792.458 km/s) in the radio convention, v = c z/(1 + z)");
      return v / (c - v);
    case "relativistic": {
      if (!(Math.abs(v) < c)) throw new RangeError("v must be between −c and c (±299792.458 km/s) in the relativistic convention");
      // √((c+v)/(c−v)) − 1 = 2v/(c−v) / (√((c+v)/(c−v)) + 1): no cancellation at small v
      const ratio = (c + v) / (c - v);
      return (2 * v) / (c - v) / (Math.sqrt(ratio) + 1);
    }
    default:
      return unknown(convention);
  }
}
