/**
 * Observed quantities moved into the source's rest frame and back, by the factor 1 + z of the
 * expansion (common practice; the time dilation of light curves is measured in type Ia supernovae,
 * Goldhaber et al. 2001, ApJ 558, 359, from memory):
 *
 * - "wavelength": λ_rest = λ_obs/(1 + z) (a line's wavelength, or a band's);
 * - "frequency": ν_rest = ν_obs (1 + z); a photon energy E = hν moves the same way, and so does an
 *   equivalent width measured in energy (W_E = ∫(1 − F_E/F_c) dE, as X-ray lines are quoted in eV);
 * - "duration": Δt_rest = Δt_obs/(1 + z), the time dilation of a light curve (a rise time, a
 *   period, a decline measured in the observer's days);
 * - "equivalent_width": W_rest = W_obs/(1 + z) (W = ∫(1 − F_λ/F_c) dλ integrates over wavelength a
 *   ratio the redshift leaves unchanged, so it stretches as wavelengths do; in energy it is a "frequency").
 *
 * The factor is the same in any unit, so a value keeps its unit.
 */
import { requireFiniteNumber } from "../checks/numberChecks.js";

/** The quantities, by name. */
export const restFrameQuantities = ["wavelength", "frequency", "duration", "equivalent_width"] as const;
export type RestFrameQuantity = (typeof restFrameQuantities)[number];

/** Whether the quantity grows with 1 + z from the rest frame to the observer (wavelengths and times do, frequencies shrink). */
function stretches(quantity: RestFrameQuantity): boolean {
  switch (quantity) {
    case "wavelength":
    case "duration":
    case "equivalent_width":
      return true;
    case "frequency":
      return false;
    default:
      throw new TypeError(`unknown quantity "${String(quantity)}": use ${restFrameQuantities.join(", ")}`);
  }
}

function requireValue(value: number, quantity: RestFrameQuantity, z: number): void {
  requireFiniteNumber(quantity, value);
  requireFiniteNumber("z", z);
  if (!(z > -1)) throw new RangeError(`z = ${z} must be > −1`);
  if (quantity === "wavelength" || quantity === "frequency" ? !(value > 0) : quantity === "duration" && !(value >= 0)) {
    throw new RangeError(`${quantity} = ${value} must be ${quantity === "duration" ? "≥" : ">"} 0`);
  }
}

/**
 * An observed value in the source's rest frame.
 *
 * @param value the observed value, in any unit of its kind (> 0 for a wavelength or frequency, ≥ 0 for a duration; an equivalent width may have either sign)
 * @param z the source's redshift, > −1
 * @param quantity "wavelength", "frequency", "duration" or "equivalent_width"
 * @returns the rest-frame value, in the unit of `value`
 * @example restFrameValue(6563, 0.1, "wavelength") // ≈ 5966.364 (Hα observed at 6563 Å: 5966 Å in the rest frame)
 */
export function restFrameValue(value: number, z: number, quantity: RestFrameQuantity): number {
  requireValue(value, quantity, z);
  return stretches(quantity) ? value / (1 + z) : value * (1 + z);
}

/**
 * A rest-frame value as the observer sees it (the inverse of `restFrameValue`).
 *
 * @param value the rest-frame value, in any unit of its kind (signs as for `restFrameValue`)
 * @param z the source's redshift, > −1
 * @param quantity "wavelength", "frequency", "duration" or "equivalent_width"
 * @returns the observed value, in the unit of `value`
 * @example observedFrameValue(1.42040575, 0.05, "frequency") // ≈ 1.3527674 (the 21-cm line in GHz at z = 0.05)
 */
export function observedFrameValue(value: number, z: number, quantity: RestFrameQuantity): number {
  requireValue(value, quantity, z);
  return stretches(quantity) ? value * (1 + z) : value / (1 + z);
}
