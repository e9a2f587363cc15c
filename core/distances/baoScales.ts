/**
 * The distances baryon acoustic oscillation measurements are quoted in, each divided by the sound
 * horizon r_d: D_M (the transverse comoving distance), D_H(z) = c / H(z), and the volume-averaged
 * D_V(z) = [z D_M² D_H(z)]^(1/3) (Eisenstein et al. 2005, ApJ 633, 560, eq. 2).
 */
import { speedOfLightKmPerS } from "../units/constants.js";
import { checkRedshift } from "../checks/redshift.js";
import type { Cosmology } from "./Cosmology.js";

/**
 * The Hubble distance at z, D_H(z) = c / H(z).
 * @param model the cosmology
 * @param z redshift ≥ 0
 * @returns Mpc
 * @example hubbleDistanceAtMpc(Cosmology.fromSpec("EDS"), 3) // 535.34 (c/H0 / (1+z)^1.5)
 */
export function hubbleDistanceAtMpc(model: Cosmology, z: number): number {
  checkRedshift(z);
  return speedOfLightKmPerS / model.hubbleParameterKmSMpc(z);
}

/**
 * The volume-averaged distance D_V(z) = [z D_M(z)² c/H(z)]^(1/3) (Eisenstein et al. 2005, eq. 2).
 * @param model the cosmology
 * @param z redshift ≥ 0 (0 gives 0)
 * @returns Mpc
 * @example volumeAveragedDistanceMpc(Cosmology.fromSpec("EDS"), 1) // 2120.15 ([1 × 2508.78² × 1514.18]^(1/3))
 */
export function volumeAveragedDistanceMpc(model: Cosmology, z: number): number {
  const dh = hubbleDistanceAtMpc(model, z);
  return Math.cbrt(z * model.transverseComovingDistanceMpc(z) ** 2 * dh);
}
