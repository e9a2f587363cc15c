/**
 * The mean extinction law of Cardelli, Clayton & Mathis (1989, ApJ 345, 245; CCM):
 * A_λ/A_V = a(x) + b(x)/R_V in x = 1/λ [µm⁻¹], piecewise in four ranges (their eqs. 2–5). The optical
 * and near-infrared piece is a pair of polynomials in y = x − 1.82, which O'Donnell (1994) revised
 * (odonnell1994.ts); the other pieces are shared.
 */

/** The optical/near-IR piece (1.1 ≤ x < 3.3 µm⁻¹): coefficients of a(y) and b(y), y = x − 1.82, ascending powers. */
export interface OpticalPolynomials {
  readonly a: readonly number[];
  readonly b: readonly number[];
}

/** CCM eq. 3a (a) and 3b (b). */
export const cardelliOptical: OpticalPolynomials = {
  a: [1, 0.17699, -0.50447, -0.02427, 0.72085, 0.01979, -0.7753, 0.32999],
  b: [0, 1.41338, 2.28305, 1.07233, -5.38434, -0.62251, 5.3026, -2.09002],
};

/** Σ c_k y^k by Horner's rule. */
function polynomial(c: readonly number[], y: number): number {
  let s = c[c.length - 1];
  for (let k = c.length - 2; k >= 0; k--) s = s * y + c[k];
  return s;
}

/**
 * A_λ/E(B−V) = R_V a(x) + b(x) of the CCM law (= R_V · A_λ/A_V), with the optical piece given.
 * Each piece holds from its lower bound up to the next one's (a point on a boundary takes the piece
 * above it; CCM write ≤ at both ends, and the pieces differ there by < 0.01 in a and b).
 *
 * - infrared, 0.3 ≤ x < 1.1: a = 0.574 x^1.61, b = −0.527 x^1.61 (CCM eq. 2a, 2b)
 * - optical/near-IR, 1.1 ≤ x < 3.3: the polynomials in y = x − 1.82 (CCM eq. 3a, 3b, or another's)
 * - ultraviolet, 3.3 ≤ x < 8: a = 1.752 − 0.316x − 0.104/((x − 4.67)² + 0.341) + F_a,
 *   b = −3.090 + 1.825x + 1.206/((x − 4.62)² + 0.263) + F_b, with F_a = −0.04473 y² − 0.009779 y³ and
 *   F_b = 0.2130 y² + 0.1207 y³, y = x − 5.9, for x > 5.9, else 0 (CCM eq. 4a, 4b)
 * - far ultraviolet, 8 ≤ x ≤ 10: a = −1.073 − 0.628y + 0.137y² − 0.070y³,
 *   b = 13.670 + 4.257y − 0.420y² + 0.374y³, y = x − 8 (CCM eq. 5a, 5b)
 *
 * @param x inverse wavelength [µm⁻¹], in [0.3, 10] (not checked here: see extinction.ts)
 * @param rv R_V = A_V/E(B−V), > 0
 * @param optical the optical/near-IR polynomials (CCM's by default)
 * @returns A_λ/E(B−V) [mag per mag of E(B−V)]
 * @example cardelliExtinctionPerEbv(1.82, 3.1) // 3.1 (at y = 0, a = 1 and b = 0: A_λ = A_V)
 */
export function cardelliExtinctionPerEbv(x: number, rv: number, optical: OpticalPolynomials = cardelliOptical): number {
  let a: number;
  let b: number;
  if (x < 1.1) {
    const p = x ** 1.61;
    a = 0.574 * p;
    b = -0.527 * p;
  } else if (x < 3.3) {
    const y = x - 1.82;
    a = polynomial(optical.a, y);
    b = polynomial(optical.b, y);
  } else if (x < 8) {
    a = 1.752 - 0.316 * x - 0.104 / ((x - 4.67) ** 2 + 0.341);
    b = -3.09 + 1.825 * x + 1.206 / ((x - 4.62) ** 2 + 0.263);
    if (x > 5.9) {
      const y = x - 5.9;
      a += -0.04473 * y * y - 0.009779 * y * y * y;
      b += 0.213 * y * y + 0.1207 * y * y * y;
    }
  } else {
    const y = x - 8;
    a = -1.073 - 0.628 * y + 0.137 * y * y - 0.07 * y * y * y;
    b = 13.67 + 4.257 * y - 0.42 * y * y + 0.374 * y * y * y;
  }
  return a * rv + b;
}
