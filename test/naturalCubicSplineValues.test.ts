/**
 * The natural cubic spline (core/numerics/naturalCubicSpline.ts), used by the Fitzpatrick (1999)
 * extinction curve between its optical anchors: its values against exact hand computations, the
 * conditions that define it (through every knot, first and second derivatives continuous at the
 * inner knots, second derivative zero at both ends: Press et al., Numerical Recipes, 3rd ed., §3.3,
 * from memory), the straight line it keeps, and the messages for knots and abscissae it refuses.
 */
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { naturalCubicSpline } from "../core/numerics/naturalCubicSpline.js";

/**
 * Expected values: the second derivatives solved exactly in fractions by Gaussian elimination of the
 * full tridiagonal system (the equation in the module's doc comment; Python's fractions.Fraction, by
 * hand), then S(x) = (M_i a³ + M_{i+1} b³)/(6h) + (y_i − M_i h²/6) a/h + (y_{i+1} − M_{i+1} h²/6) b/h.
 */
describe("values against the exact solution of the spline's equations", () => {
  //  knots x          values y              x      S(x) exact          second derivatives M (exact)
  const cases: [number[], number[], number, number][] = [
    [[0, 1, 2],       [0, 1, 0],            0.5,   11 / 16],           // M = 0, −3, 0 (the module's doc example, 0.6875)
    [[0, 1, 2],       [0, 1, 0],            1.5,   11 / 16],           // symmetric
    [[0, 1, 2, 3],    [0, 1, 0, 1],         0.25,  13 / 32],           // M = 0, −4, 4, 0
    [[0, 1, 2, 3],    [0, 1, 0, 1],         0.75,  31 / 32],
    [[0, 1, 2, 3],    [0, 1, 0, 1],         1.25,  13 / 16],
    [[0, 1, 2, 3],    [0, 1, 0, 1],         1.5,   1 / 2],
    [[0, 1, 2, 3],    [0, 1, 0, 1],         2.25,  1 / 32],
    [[0, 1, 2, 3],    [0, 1, 0, 1],         2.75,  19 / 32],
    [[0, 1, 3, 4, 6], [1, 2, 0, 3, 2],      0.5,   869 / 496],         // M = 0, −125/31, 189/31, −140/31, 0 (unequal steps)
    [[0, 1, 3, 4, 6], [1, 2, 0, 3, 2],      1.5,   709 / 496],
    [[0, 1, 3, 4, 6], [1, 2, 0, 3, 2],      2,     15 / 31],
    [[0, 1, 3, 4, 6], [1, 2, 0, 3, 2],      2.5,   -101 / 496],
    [[0, 1, 3, 4, 6], [1, 2, 0, 3, 2],      3.5,   695 / 496],
    [[0, 1, 3, 4, 6], [1, 2, 0, 3, 2],      4.5,   927 / 248],
    [[0, 1, 3, 4, 6], [1, 2, 0, 3, 2],      5,     225 / 62],
    [[0, 1, 3, 4, 6], [1, 2, 0, 3, 2],      5.5,   733 / 248],
    [[2, 5],          [1, 7],               3,     3],                 // two knots: the straight line through them
    [[2, 5],          [1, 7],               4.5,   6],
  ];
  test.each(cases)("through %j, %j: S(%d) = %d (within 1e-14)", (xs, ys, x, expected) => {
    expect(Math.abs(naturalCubicSpline(xs, ys)(x) - expected)).toBeLessThanOrEqual(1e-14);
  });

  test("at every knot, the ends included, the knot's own value (within 1e-14)", () => {
    const xs = [0, 1, 3, 4, 6];
    const ys = [1, 2, 0, 3, 2];
    const spline = naturalCubicSpline(xs, ys);
    xs.forEach((x, i) => expect(Math.abs(spline(x) - ys[i]), `x = ${x}`).toBeLessThanOrEqual(1e-14));
  });
});

describe("the knots and abscissae it refuses, with its messages (zcell's own words)", () => {
  //  knots x        values y     the message
  const refused: [number[], number[], string][] = [
    [[],             [],          "a spline needs at least 2 knots and one value for each"],
    [[1],            [1],         "a spline needs at least 2 knots and one value for each"],
    [[1, 2],         [1],         "a spline needs at least 2 knots and one value for each"],
    [[1, 2, 3],      [1, 2],      "a spline needs at least 2 knots and one value for each"],
    [[1, 2],         [1, 2, 3],   "a spline needs at least 2 knots and one value for each"],
    [[0, 0, 1],      [1, 2, 3],   "spline knots must be strictly increasing"],   // a repeated knot
    [[0, 1, 1, 2],   [1, 2, 3, 4], "spline knots must be strictly increasing"],  // repeated inside
    [[0, 2, 1],      [1, 2, 3],   "spline knots must be strictly increasing"],   // decreasing at the end
    [[0, NaN, 1],    [1, 2, 3],   "spline knots must be strictly increasing"],   // not a number
  ];
  test.each(refused)("knots %j, values %j: %s", (xs, ys, message) => {
    expect(() => naturalCubicSpline(xs, ys)).toThrow(new RangeError(message));
  });

  test("an abscissa outside the knots, or not a number, is refused with the knots' range", () => {
    const spline = naturalCubicSpline([1, 2, 4], [0, 1, 0]);
    //  x          the message
    const outside: [number, string][] = [
      [0.999,      "x = 0.999 is outside the spline's knots [1, 4]"],
      [4.001,      "x = 4.001 is outside the spline's knots [1, 4]"],
      [-Infinity,  "x = -Infinity is outside the spline's knots [1, 4]"],
      [NaN,        "x = NaN is outside the spline's knots [1, 4]"],
    ];
    for (const [x, message] of outside) expect(() => spline(x), `x = ${x}`).toThrow(new RangeError(message));
    expect(spline(1)).toBe(0); // both ends are inside
    expect(spline(4)).toBe(0);
  });
});

/** Value, first and second derivative at `at` of the cubic through (t_k, f(t_k)), k = 0 … 3 (Newton's divided differences). */
function cubicThrough(f: (x: number) => number, t: number[], at: number): [number, number, number] {
  const c = t.map(f);
  for (let level = 1; level < 4; level++) for (let k = 3; k >= level; k--) c[k] = (c[k] - c[k - 1]) / (t[k] - t[k - level]);
  let p = c[3], dp = 0, d2p = 0;
  for (let k = 2; k >= 0; k--) {
    d2p = d2p * (at - t[k]) + 2 * dp;
    dp = dp * (at - t[k]) + p;
    p = p * (at - t[k]) + c[k];
  }
  return [p, dp, d2p];
}

/** Knots with steps from 0.5 to 3 and values from −10 to 10: 2 to 9 knots. */
const knotsAndValues = fc
  .array(fc.tuple(fc.double({ min: 0.5, max: 3, noNaN: true }), fc.double({ min: -10, max: 10, noNaN: true })), { minLength: 2, maxLength: 9 })
  .map((points) => {
    const xs: number[] = [];
    points.forEach(([step], i) => xs.push(i === 0 ? -1 : xs[i - 1] + step));
    return { xs, ys: points.map(([, y]) => y) };
  });

describe("the conditions of a natural cubic spline, for any knots and values", () => {
  test("through every knot; on each piece a cubic whose value, slope and curvature meet the next piece's at the inner knots; no curvature at the ends", () => {
    fc.assert(
      fc.property(knotsAndValues, ({ xs, ys }) => {
        const spline = naturalCubicSpline(xs, ys);
        const n = xs.length;
        xs.forEach((x, i) => expect(Math.abs(spline(x) - ys[i])).toBeLessThanOrEqual(1e-12));
        // each piece read from four points strictly inside it, so that only that piece's cubic is seen
        const piece = (i: number, at: number) => {
          const h = xs[i + 1] - xs[i];
          return cubicThrough(spline, [0.1, 0.4, 0.6, 0.9].map((u) => xs[i] + u * h), at);
        };
        for (let i = 0; i < n - 1; i++) {
          const [atLeft] = piece(i, xs[i]);
          const [atRight] = piece(i, xs[i + 1]);
          expect(Math.abs(atLeft - ys[i])).toBeLessThanOrEqual(1e-8);
          expect(Math.abs(atRight - ys[i + 1])).toBeLessThanOrEqual(1e-8);
        }
        for (let i = 1; i < n - 1; i++) {
          const [, slopeBefore, curvatureBefore] = piece(i - 1, xs[i]);
          const [, slopeAfter, curvatureAfter] = piece(i, xs[i]);
          expect(Math.abs(slopeBefore - slopeAfter)).toBeLessThanOrEqual(1e-7);
          expect(Math.abs(curvatureBefore - curvatureAfter)).toBeLessThanOrEqual(1e-6);
        }
        expect(Math.abs(piece(0, xs[0])[2])).toBeLessThanOrEqual(1e-6);
        expect(Math.abs(piece(n - 2, xs[n - 1])[2])).toBeLessThanOrEqual(1e-6);
      }),
      { numRuns: 300 },
    );
  });

  test("points on a straight line give that line everywhere between the ends (its second derivative is zero, the natural ends' own condition)", () => {
    fc.assert(
      fc.property(knotsAndValues, fc.double({ min: -5, max: 5, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), ({ xs }, slope, u) => {
        const line = (x: number) => 2 + slope * x;
        const spline = naturalCubicSpline(xs, xs.map(line));
        const x = xs[0] + u * (xs[xs.length - 1] - xs[0]);
        expect(Math.abs(spline(x) - line(x))).toBeLessThanOrEqual(1e-12 * (1 + Math.abs(slope) * 30));
      }),
      { numRuns: 300 },
    );
  });
});
