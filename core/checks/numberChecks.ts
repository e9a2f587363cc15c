/**
 * Checks on number arguments shared by the core's functions: a TypeError for what is not a number, a
 * RangeError for a number outside its domain, each naming the argument (and its unit where it has one).
 */

/**
 * Throws unless value is a finite number.
 * @param name the argument's name for the message
 * @param value the number to check
 */
export function requireFiniteNumber(name: string, value: number): void {
  if (typeof value !== "number" || Number.isNaN(value)) throw new TypeError(`${name} must be a number`);
  if (!Number.isFinite(value)) throw new RangeError(`${name} must be finite`);
}

/**
 * Throws unless value is a finite number ≥ 0 (or > 0 when `positive`).
 * @param name the argument's name for the message
 * @param value the number to check
 * @param unit its unit for the message ("" for none)
 * @param positive 0 itself is refused too
 */
export function requireNonNegative(name: string, value: number, unit = "", positive = false): void {
  if (typeof value !== "number" || Number.isNaN(value)) throw new TypeError(`${name} must be a number`);
  if (!(positive ? value > 0 : value >= 0) || value === Number.POSITIVE_INFINITY) {
    throw new RangeError(`${name} = ${value}${unit && ` ${unit}`} must be ${positive ? ">" : "≥"} 0 and finite`);
  }
}

/**
 * Throws unless a latitude (a declination) is a finite number of radians within ±π/2 (one rounding's
 * width beyond allowed, so that ±90° turned into radians passes).
 * @param name the argument's name for the message
 * @param rad the latitude [rad]
 */
export function requireLatitudeRad(name: string, rad: number): void {
  requireFiniteNumber(name, rad);
  if (Math.abs(rad) > (Math.PI / 2) * (1 + 1e-15)) throw new RangeError(`${name} = ${rad / (Math.PI / 180)}° is outside −90° … 90°`);
}

/**
 * Throws unless a latitude (a declination) is a finite number of degrees within ±90°.
 * @param name the argument's name for the message
 * @param deg the latitude [deg]
 */
export function requireLatitudeDeg(name: string, deg: number): void {
  requireFiniteNumber(name, deg);
  if (Math.abs(deg) > 90) throw new RangeError(`${name} = ${deg}° is outside −90° … 90°`);
}
