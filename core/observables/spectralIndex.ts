/**
 * Spectral indices in the conventions of different fields, turned into the one zcell uses:
 * α of S_ν ∝ ν^α (so a synchrotron source has α ≈ −0.7 and a flat spectrum α = 0).
 *
 * - "photon": the X-ray and γ-ray photon index Γ of N(E) ∝ E^−Γ (photons per unit energy): the
 *   energy flux density is E N(E) ∝ E^(1−Γ), so α = 1 − Γ (Γ = 2 is α = −1, flat in ν S_ν).
 * - "lambda": the index β of f_λ ∝ λ^β (optical and infrared): f_ν = f_λ λ²/c ∝ ν^(−β−2), so α = −2 − β.
 * - "radio": the radio habit S_ν ∝ ν^−α, a positive index for a falling spectrum: α = −value.
 *
 * (The relations follow from the definitions: common practice.)
 */
import { requireFiniteNumber } from "../checks/numberChecks.js";

/** The conventions `spectralIndexAlpha` converts from. */
export const spectralIndexConventions = ["photon", "lambda", "radio"] as const;
export type SpectralIndexConvention = (typeof spectralIndexConventions)[number];

/**
 * α of S_ν ∝ ν^α from a spectral index given in another convention.
 * @param value the index as the convention writes it (dimensionless, finite)
 * @param convention "photon" (Γ of N(E) ∝ E^−Γ), "lambda" (β of f_λ ∝ λ^β) or "radio" (S_ν ∝ ν^−value)
 * @returns α (dimensionless)
 * @example spectralIndexAlpha(1.9, "photon") // -0.9
 */
export function spectralIndexAlpha(value: number, convention: SpectralIndexConvention): number {
  requireFiniteNumber("value", value);
  switch (convention) {
    case "photon":
      return 1 - value;
    case "lambda":
      return -2 - value;
    case "radio":
      return -value;
    default:
      throw new TypeError(`unknown convention "${String(convention)}": use photon, lambda or radio`);
  }
}
