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

/**
 * Throws unless z is a usable redshift of a source at a distance: finite and > 0 (at z = 0 the
 * luminosity distance is 0, so fluxes and magnitudes are undefined).
 *
 * @param z redshift, dimensionless
 */
export function checkSourceRedshift(z: number): void {
  checkRedshift(z);
  if (z === 0) throw new RangeError("z = 0 puts the source at zero distance: give z > 0");
}

/** A redshift as a message quotes it: at most 4 significant digits. @example formatRedshift(1234.56) // "1235" */
export function formatRedshift(z: number): string {
  return Number(z.toPrecision(4)).toString();
}
