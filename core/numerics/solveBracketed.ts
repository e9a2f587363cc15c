/** A safeguarded Newton solver shared by the inverse functions. */
/**
 * Newton's method safeguarded by bisection on a bracket [lo, hi] with g(lo) ≤ target ≤ g(hi),
 * starting from `start` (default: the midpoint). Only interior points are evaluated, so g may be
 * infinite at the ends.
 *
 * @param g the function, increasing across the bracket
 * @param dg its derivative
 * @param target the value sought
 * @param lo lower end of the bracket
 * @param hi upper end of the bracket
 * @param start first point tried
 * @returns x in [lo, hi] with g(x) = target to a few ulps of x
 * @example solveBracketed((x) => x * x, (x) => 2 * x, 2, 0, 2) // 1.4142135623730951
 */
export function solveBracketed(
  g: (u: number) => number,
  dg: (u: number) => number,
  target: number,
  lo: number,
  hi: number,
  start = 0.5 * (lo + hi),
): number {
  let u = start;
  for (let iteration = 0; iteration < 100; iteration++) {
    const r = g(u) - target;
    if (r === 0) return u;
    if (r < 0) lo = u;
    else hi = u;
    const step = r / dg(u);
    // converged when the Newton step is down to a few ulps (it may then toggle between neighbours)
    const scale = 5e-16 * Math.abs(u) + 1e-300;
    if (Math.abs(step) <= scale) return u - step;
    let next = u - step;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (hi - lo <= scale) return next;
    u = next;
  }
  return u;
}
