/**
 * Values published under one cosmology, restated under another. Everything derived from a redshift
 * and a measured quantity scales with the distances at that redshift: a distance with D_M, a
 * luminosity (from a flux) with D_L², a physical size (from an angle) with D_A, an absolute magnitude
 * by 5 log10 of the D_L ratio, and a number density (a count over a volume) with the inverse of the
 * volume element dV/dz (Hogg 1999, eqs. 16, 18, 21, 28: the distances these ratios are taken of).
 */
import { checkSourceRedshift } from "../checks/redshift.js";
import type { Cosmology } from "./Cosmology.js";

/** What a value to rescale is. */
export const rescaleQuantities = ["distance", "luminosity", "size", "magnitude", "density"] as const;
export type RescaleQuantity = (typeof rescaleQuantities)[number];

/**
 * A value computed under `from` at redshift z, restated under `to`.
 * - distance: × D_M,to / D_M,from (every distance at one z scales alike);
 * - luminosity: × (D_L,to / D_L,from)²;
 * - size: × D_A,to / D_A,from (a proper size from a measured angle);
 * - magnitude: an absolute magnitude, + 5 log10(D_L,from / D_L,to);
 * - density: a number density at z, × (dV/dz)_from / (dV/dz)_to.
 *
 * @param value the published value (any unit: the ratio is dimensionless; magnitudes in mag)
 * @param z the source's redshift, > 0
 * @param quantity what the value is
 * @param from the cosmology it was computed under
 * @param to the cosmology wanted
 * @returns the value under `to`, in the value's own unit
 * @example rescaledValue(1e44, 1, "luminosity", Cosmology.fromSpec("EDS"), Cosmology.fromSpec("EDS; H0=35")) // 4e44 (D_L ∝ 1/H0)
 */
export function rescaledValue(value: number, z: number, quantity: RescaleQuantity, from: Cosmology, to: Cosmology): number {
  if (typeof value !== "number" || !Number.isFinite(value)) throw new RangeError("value must be a finite number");
  checkSourceRedshift(z);
  switch (quantity) {
    case "distance":
      return value * (to.transverseComovingDistanceMpc(z) / from.transverseComovingDistanceMpc(z));
    case "luminosity":
      return value * (to.luminosityDistanceMpc(z) / from.luminosityDistanceMpc(z)) ** 2;
    case "size":
      return value * (to.angularDiameterDistanceMpc(z) / from.angularDiameterDistanceMpc(z));
    case "magnitude":
      return value + 5 * Math.log10(Math.abs(from.luminosityDistanceMpc(z) / to.luminosityDistanceMpc(z)));
    case "density":
      return value * (from.comovingVolumeElementMpc3Sr(z) / to.comovingVolumeElementMpc3Sr(z));
    default:
      throw new TypeError(`unknown quantity "${String(quantity)}": use ${rescaleQuantities.join(", ")}`);
  }
}
