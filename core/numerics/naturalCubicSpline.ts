/**
 * The natural cubic spline through a set of points: cubic on each interval, continuous with its first
 * and second derivatives at the inner knots, second derivative zero at both ends (e.g. Press et al.,
 * Numerical Recipes, 3rd ed., 2007, §3.3, from memory).
 */

/**
 * Builds the natural cubic spline through (xs[i], ys[i]).
 *
 * The second derivatives M_i at the knots solve the tridiagonal system
 * h_{i−1} M_{i−1} + 2(h_{i−1} + h_i) M_i + h_i M_{i+1} = 6((y_{i+1} − y_i)/h_i − (y_i − y_{i−1})/h_{i−1}),
 * with M_0 = M_{n−1} = 0 and h_i = x_{i+1} − x_i (Thomas algorithm).
 *
 * @param xs knot abscissae, strictly increasing, at least 2
 * @param ys knot values, as many as xs
 * @returns the spline S(x), for x in [xs[0], xs[n−1]]; a RangeError outside
 * @throws RangeError for fewer than 2 knots, unequal lengths or abscissae not strictly increasing
 * @example naturalCubicSpline([0, 1, 2], [0, 1, 0])(0.5) // 0.6875
 */
export function naturalCubicSpline(xs: readonly number[], ys: readonly number[]): (x: number) => number {
  const n = xs.length;
  if (n < 2 || ys.length !== n) throw new RangeError("a spline needs at least 2 knots and one value for each");
  for (let i = 1; i < n; i++) if (!(xs[i] > xs[i - 1])) throw new RangeError("spline knots must be strictly increasing");
  const m = new Float64Array(n); // second derivatives; m[0] = m[n−1] = 0
  // forward sweep over the inner knots 1 … n−2, then back substitution (with 2 knots there are none: a straight line)
  const diagonal = new Float64Array(n);
  const right = new Float64Array(n);
  for (let i = 1; i < n - 1; i++) {
    const hl = xs[i] - xs[i - 1];
    const hr = xs[i + 1] - xs[i];
    diagonal[i] = 2 * (hl + hr);
    right[i] = 6 * ((ys[i + 1] - ys[i]) / hr - (ys[i] - ys[i - 1]) / hl);
    if (i > 1) {
      const w = hl / diagonal[i - 1];
      diagonal[i] -= w * hl;
      right[i] -= w * right[i - 1];
    }
  }
  for (let i = n - 2; i >= 1; i--) m[i] = (right[i] - (xs[i + 1] - xs[i]) * m[i + 1]) / diagonal[i];
  const x0 = xs[0];
  const xEnd = xs[n - 1];
  return (x: number) => {
    if (!(x >= x0 && x <= xEnd)) throw new RangeError(`x = ${x} is outside the spline's knots [${x0}, ${xEnd}]`);
    let i = 0;
    while (x > xs[i + 1]) i++; // stops at n − 2 at the latest: x ≤ xs[n − 1] was checked above
    const h = xs[i + 1] - xs[i];
    const a = xs[i + 1] - x;
    const b = x - xs[i];
    return (m[i] * a * a * a + m[i + 1] * b * b * b) / (6 * h) + (ys[i] - (m[i] * h * h) / 6) * (a / h) + (ys[i + 1] - (m[i + 1] * h * h) / 6) * (b / h);
  };
}
