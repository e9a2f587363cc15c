/**
 * Gravitational lensing by a thin lens: the critical surface density
 * Σ_cr = c² D_s / (4π G D_l D_ls) (Schneider, Ehlers & Falco 1992, eq. 5.6; Bartelmann & Schneider 2001,
 * Phys. Rep. 340, 291, eq. 8), with D_l, D_s and D_ls angular-diameter distances (D_ls between the
 * lens and the source, any curvature): mass per physical area at the lens. The comoving Σ_cr, mass per
 * comoving area (the lens plane's area grown by (1+z_l)², as in weak-lensing work that measures ΔΣ in
 * comoving coordinates), is Σ_cr / (1+z_l)².
 */
import { megaparsecM, parsecM, solarMassParameterSI, speedOfLightMPerS } from "../units/constants.js";
import { checkRedshift } from "../checks/redshift.js";
import type { Cosmology } from "../distances/Cosmology.js";

/** Σ_cr per physical or per comoving area at the lens. */
export const lensingCoordinates = ["physical", "comoving"] as const;
export type LensingCoordinates = (typeof lensingCoordinates)[number];

/**
 * Critical surface density of a lens at z_lens for sources at z_source.
 * Computed with G M☉ (IAU 2015 Resolution B3 nominal) so that the result in M☉/pc² owes nothing to G.
 *
 * @param model the cosmology
 * @param zLens lens redshift, > 0
 * @param zSource source redshift, > zLens
 * @param coordinates "physical" (the default: M☉ per physical pc² at the lens) or "comoving" (per comoving pc²,
 *   smaller by (1+z_l)²)
 * @returns Σ_cr [M☉ pc⁻²]
 * @example criticalSurfaceDensityMsunPc2(Cosmology.fromSpec("EDS"), 0.5, 2) // 2804.7
 * @example criticalSurfaceDensityMsunPc2(Cosmology.fromSpec("EDS"), 0.5, 2, "comoving") // 1246.5 (2804.7 / 1.5²)
 */
export function criticalSurfaceDensityMsunPc2(model: Cosmology, zLens: number, zSource: number, coordinates: LensingCoordinates = "physical"): number {
  checkRedshift(zLens, "z_lens");
  checkRedshift(zSource, "z_source");
  if (!(zLens > 0)) throw new RangeError(`z_lens = ${zLens}: a lens needs z > 0`);
  if (!(zSource > zLens)) throw new RangeError(`z_source = ${zSource} must be above z_lens = ${zLens}: the source lies behind the lens`);
  const dl = model.angularDiameterDistanceMpc(zLens) * megaparsecM;
  const ds = model.angularDiameterDistanceMpc(zSource) * megaparsecM;
  const dls = model.angularDiameterDistanceBetweenMpc(zLens, zSource) * megaparsecM;
  if (coordinates !== "physical" && coordinates !== "comoving") throw new TypeError(`unknown coordinates "${String(coordinates)}": use ${lensingCoordinates.join(" or ")}`);
  // Σ/M☉ per m² = c² D_s / (4π GM☉ D_l D_ls); × pc² for per pc²
  const physical = ((speedOfLightMPerS ** 2 * ds) / (4 * Math.PI * solarMassParameterSI * dl * dls)) * parsecM * parsecM;
  return coordinates === "physical" ? physical : physical / (1 + zLens) ** 2;
}
