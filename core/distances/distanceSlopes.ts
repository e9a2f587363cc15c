/**
 * Exact derivatives of the distances with respect to redshift, for propagating redshift errors:
 * dD_C/dz = D_H / E(z) (Hogg 1999 eq. 15 differentiated), dD_M/dz = dD_C/dz × S_k'(D_C/D_H) with
 * S_k' = cosh(√Ωk χ) (open), 1 (flat) or cos(√|Ωk| χ) (closed) (eq. 16 differentiated), and the
 * products that make D_L = (1+z) D_M and D_A = D_M/(1+z). No finite differences.
 */
import type { Cosmology } from "./Cosmology.js";

/**
 * Derivative of the line-of-sight comoving distance, dD_C/dz = D_H / E(z).
 * @param model the cosmology
 * @param z redshift ≥ 0
 * @returns Mpc per unit redshift
 * @example comovingDistanceSlopeMpc(Cosmology.fromSpec("P18-BAO"), 0) // 4430.87 (D_H = c/H0 at z = 0)
 */
export function comovingDistanceSlopeMpc(model: Cosmology, z: number): number {
  return model.hubbleDistanceMpc / model.expansionRate(z);
}

/** D_M and dD_M/dz from one reading of χ = D_C/D_H. */
function transverseAndSlopeMpc(model: Cosmology, z: number): [dm: number, slope: number] {
  const chi = model.comovingDistanceMpc(z) / model.hubbleDistanceMpc;
  return [model.hubbleDistanceMpc * model.transverse(chi), comovingDistanceSlopeMpc(model, z) * model.transverseSlope(chi)];
}

/**
 * Derivative of the transverse comoving distance, dD_M/dz = (D_H / E(z)) S_k'(D_C/D_H).
 * @param model the cosmology
 * @param z redshift ≥ 0
 * @returns Mpc per unit redshift; equal to dD_C/dz in a flat model
 */
export function transverseComovingDistanceSlopeMpc(model: Cosmology, z: number): number {
  return transverseAndSlopeMpc(model, z)[1];
}

/**
 * Derivative of the luminosity distance, dD_L/dz = D_M + (1+z) dD_M/dz.
 * @param model the cosmology
 * @param z redshift ≥ 0
 * @returns Mpc per unit redshift
 * @example luminosityDistanceSlopeMpc(Cosmology.fromSpec("EDS"), 1) // 5537.14 (Einstein–de Sitter: D_H (2 − 1/√(1+z)))
 */
export function luminosityDistanceSlopeMpc(model: Cosmology, z: number): number {
  const [dm, slope] = transverseAndSlopeMpc(model, z);
  return dm + (1 + z) * slope;
}

/**
 * Derivative of the angular-diameter distance, dD_A/dz = (dD_M/dz)/(1+z) − D_M/(1+z)²; zero where
 * D_A has its maximum.
 * @param model the cosmology
 * @param z redshift ≥ 0
 * @returns Mpc per unit redshift
 * @example angularDiameterDistanceSlopeMpc(Cosmology.fromSpec("EDS"), 1.25) // ≈ 0 (the maximum of D_A in Einstein–de Sitter)
 */
export function angularDiameterDistanceSlopeMpc(model: Cosmology, z: number): number {
  const [dm, slope] = transverseAndSlopeMpc(model, z);
  const zp = 1 + z;
  return slope / zp - dm / (zp * zp);
}

/**
 * Logarithmic derivative of the luminosity distance, d ln|D_L|/dz = 1/(1+z) + (dD_M/dz)/D_M.
 * @param model the cosmology
 * @param z redshift > 0
 * @returns per unit redshift; e.g. ≈ 1/z for z ≪ 1
 */
export function luminosityDistanceLogSlope(model: Cosmology, z: number): number {
  const [dm, slope] = transverseAndSlopeMpc(model, z);
  return 1 / (1 + z) + slope / dm;
}
