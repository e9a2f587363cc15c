/**
 * O'Donnell (1994, ApJ 422, 158): the CCM law (cardelli1989.ts) with new optical/near-IR
 * polynomials for 1.1 ≤ x < 3.3 µm⁻¹ (3030–9091 Å), fitted to narrower-band photometry; the
 * infrared and ultraviolet pieces are CCM's.
 */
import { cardelliExtinctionPerEbv, type OpticalPolynomials } from "./cardelli1989.js";

/** O'Donnell 1994: the revised a(y) and b(y), y = x − 1.82, ascending powers (its eq. 2; the equation number from memory, the coefficients as also printed in the IDL astrolib CCM_UNRED and python3-extinction). */
const odonnellOptical: OpticalPolynomials = {
  a: [1, 0.104, -0.609, 0.701, 1.137, -1.718, -0.827, 1.647, -0.505],
  b: [0, 1.952, 2.908, -3.989, -7.985, 11.102, 5.491, -10.805, 3.347],
};

/**
 * A_λ/E(B−V) of the O'Donnell (1994) law: R_V a(x) + b(x), CCM outside the optical.
 * @param x inverse wavelength [µm⁻¹], in [0.3, 10] (not checked here: see extinction.ts)
 * @param rv R_V = A_V/E(B−V), > 0
 * @returns A_λ/E(B−V)
 * @example odonnellExtinctionPerEbv(1.82, 3.1) // 3.1 (normalised at V as CCM)
 */
export function odonnellExtinctionPerEbv(x: number, rv: number): number {
  return cardelliExtinctionPerEbv(x, rv, odonnellOptical);
}
