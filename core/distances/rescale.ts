/**
 * Values published under one cosmology, restated under another. Everything derived from a redshift
 * and a measured quantity scales with the distances at that redshift: a distance with D_M, a
 * luminosity (from a flux) with D_L², a physical size (from an angle) with D_A, an absolute magnitude
 * by 5 log10 of the D_L ratio, and a number density (a count over a volume) with the inverse of the
 * volume element dV/dz (Hogg 1999, eqs. 16, 18, 21, 28: the distances these ratios are taken of).
 *
 * A value quoted in h-scaled units (1000 h⁻¹ Mpc, 3e-3 h³ Mpc⁻³, 1e10 h⁻² L☉) carries a power p of
 * h = H0/100: the physical value is value × h^p under the model it was computed in. It is restated
 * in physical units with h of `from`, rescaled, and given back in the same h-scaled unit with h of `to`.
 */
import { quoted } from "../checks/quoted.js";
import { checkSourceRedshift } from "../checks/redshift.js";
import { parseUnit, type Unit } from "../units/units.js";
import type { Cosmology } from "./Cosmology.js";

/** What a value to rescale is. */
export const rescaleQuantities = ["distance", "luminosity", "size", "magnitude", "density"] as const;
export type RescaleQuantity = (typeof rescaleQuantities)[number];

/** What the unit of each quantity must measure: its dimensions (m, kg, s, K, rad) and their name. */
const unitDimensions: Record<Exclude<RescaleQuantity, "magnitude">, { dims: number[][]; what: string; example: string }> = {
  distance: { dims: [[1, 0, 0, 0, 0]], what: "a length", example: "Mpc/h" },
  size: { dims: [[1, 0, 0, 0, 0]], what: "a length", example: "h-1 kpc" },
  luminosity: { dims: [[2, 1, -3, 0, 0], [2, 1, -2, 0, 0]], what: "a luminosity (power, or power per Hz)", example: "h-2 Lsun" },
  density: { dims: [[-3, 0, 0, 0, 0]], what: "a number per volume", example: "h3 Mpc-3" },
};

/** The power of h a value's unit carries, after checking that the unit fits the quantity. */
function hPowerOf(unitText: string, quantity: RescaleQuantity): number {
  if (quantity === "magnitude") {
    if (unitText.trim() === "mag") return 0;
    throw new TypeError(`a magnitude takes no unit (got ${quoted(unitText)}); for M − 5 log10 h add 5 log10 h of from_model first`);
  }
  const expected = unitDimensions[quantity];
  if (!expected) return 0;
  let unit: Unit;
  try {
    unit = parseUnit(unitText);
  } catch (e) {
    throw new TypeError(`unit: ${(e as Error).message}`); // the argument named, as every unit message does
  }
  if (!expected.dims.some((d) => d.every((x, i) => Math.abs(x - unit.dimensions[i]) < 1e-12))) {
    const hour = /(^|[\s.*/(])h(?![A-Za-z])/.test(unitText) && unit.hPower === 0;
    const hint = hour ? `; h next to units without pc or a solar unit is the hour: write e.g. "${expected.example}"` : ` (e.g. "${expected.example}")`;
    throw new TypeError(`unit ${quoted(unitText)} does not measure ${expected.what}, as a ${quantity} needs${hint}`);
  }
  return unit.hPower;
}

/**
 * A value computed under `from` at redshift z, restated under `to`.
 * - distance: × D_M,to / D_M,from (every distance at one z scales alike);
 * - luminosity: × (D_L,to / D_L,from)²;
 * - size: × D_A,to / D_A,from (a proper size from a measured angle);
 * - magnitude: an absolute magnitude, + 5 log10(D_L,from / D_L,to);
 * - density: a number density at z, × (dV/dz)_from / (dV/dz)_to.
 *
 * @param value the published value (magnitudes in mag)
 * @param z the source's redshift, > 0
 * @param quantity what the value is
 * @param from the cosmology it was computed under
 * @param to the cosmology wanted
 * @param unit the value's unit (FITS text), needed only when it is h-scaled ("Mpc/h", "h3 Mpc-3",
 *   "h-2 Lsun"); omitted or "": a unit without h (the ratios are dimensionless)
 * @returns the value under `to`, in the value's own unit (an h-scaled unit with h of `to`)
 * @example rescaledValue(1e44, 1, "luminosity", Cosmology.fromSpec("EDS"), Cosmology.fromSpec("EDS; H0=35")) // 4e44 (D_L ∝ 1/H0)
 * @example rescaledValue(1000, 1, "distance", Cosmology.fromSpec("EDS"), Cosmology.fromSpec("EDS; H0=35"), "Mpc/h") // 1000 (D_M h does not depend on H0)
 */
export function rescaledValue(value: number, z: number, quantity: RescaleQuantity, from: Cosmology, to: Cosmology, unit = ""): number {
  if (!Number.isFinite(value)) throw new RangeError("value must be a finite number"); // Number.isFinite is false for a non-number too
  checkSourceRedshift(z);
  const power = unit.trim() === "" ? 0 : hPowerOf(unit, quantity);
  return rescaledPhysical(value * from.h ** power, z, quantity, from, to) / to.h ** power;
}

/** rescaledValue for a value in a unit without h. */
function rescaledPhysical(value: number, z: number, quantity: RescaleQuantity, from: Cosmology, to: Cosmology): number {
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
