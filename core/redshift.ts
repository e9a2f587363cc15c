/**
 * Checks on redshift arguments, shared by every function of the core.
 */

/**
 * Throws unless z is a usable redshift: a finite number ≥ 0.
 *
 * @param z redshift, dimensionless
 * @param name the argument's name for the message
 */
export function checkRedshift(z: number, name = "z"): void {
  if (typeof z !== "number" || Number.isNaN(z)) throw new TypeError(`${name} must be a number`);
  if (z < 0) {
    throw new RangeError(`${name} = ${z} is negative: a blueshifted source needs a redshift-independent distance`);
  }
  if (!Number.isFinite(z)) throw new RangeError(`${name} must be finite`);
}
