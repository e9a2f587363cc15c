/** The curved-space volume term of a transverse distance, without cancellation for small arguments. */

/**
 * (sinh y − y) for open (sign +1) or (y − sin y) for closed (sign −1) geometry, without cancellation:
 * a Taylor series y³/6 Σ (±y²)ⁿ 6/(2n+3)! for |y| < 0.5.
 * @param y argument, dimensionless (2√|Ωk| D_C/D_H in the comoving volume)
 * @param sign +1 for open, −1 for closed geometry
 * @returns sinh y − y or y − sin y, dimensionless
 * @example hyperbolicRemainder(0.1, 1) // 1.6675e-4 (sinh 0.1 − 0.1)
 */
export function hyperbolicRemainder(y: number, sign: 1 | -1): number {
  if (Math.abs(y) >= 0.5) return sign > 0 ? Math.sinh(y) - y : y - Math.sin(y);
  const y2 = sign * y * y;
  let term = (y * y * y) / 6;
  let sum = term;
  for (let n = 1; n < 12; n++) {
    term *= y2 / ((2 * n + 2) * (2 * n + 3));
    sum += term;
  }
  return sum;
}

