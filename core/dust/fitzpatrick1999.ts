/**
 * The R_V-dependent Milky Way extinction curve of Fitzpatrick (1999, PASP 111, 63; F99), the one
 * used to recalibrate the common dust map (Schlafly & Finkbeiner 2011, ApJ 737, 103). Two parts, as
 * the paper builds it (F99 Appendix):
 *
 * - ultraviolet, λ ≤ 2700 Å (x ≥ 1/0.27 µm⁻¹): the Fitzpatrick & Massa (1990, ApJS 72, 163; FM90)
 *   function k(λ−V) = E(λ−V)/E(B−V) = c1 + c2 x + c3 D(x; x0, γ) + c4 F(x), with
 *   D = x²/((x² − x0²)² + x²γ²) and F = 0.5392 (x − 5.9)² + 0.05644 (x − 5.9)³ for x ≥ 5.9, else 0
 *   (FM90); x0 = 4.596 µm⁻¹, γ = 0.99 µm⁻¹, c3 = 3.23, c4 = 0.41 (F99 Table 3, the R = 3.1 curve's,
 *   kept for every R), and the R-dependent linear part c2 = −0.824 + 4.717/R, c1 = 2.030 − 3.007 c2
 *   (F99 Appendix, the R-dependence of the UV curve); the same constants as in the IDL astrolib
 *   FM_UNRED and python3-extinction;
 * - optical and infrared, λ > 2700 Å: a natural cubic spline in x through anchor points of
 *   A_λ/E(B−V) = k + R: A = 0 at x = 0; the infrared anchors at 26500 and 12200 Å, 0.265 R/3.1 and
 *   0.829 R/3.1 (F99 Table 3 values at R = 3.1, "simply scaled by R/3.1"); the optical anchors at
 *   6000, 5470, 4670 and 4110 Å from F99 Table 4; and the ultraviolet function's values at 2700 and
 *   2600 Å, which join the two parts smoothly.
 *
 * F99 Table 4 prints the 4110 Å anchor's constant as −1.208; +1.208 is the value that reproduces
 * the paper's own Table 3 (4.315 at R = 3.1), as the dust_extinction package also notes, and is used.
 * The IDL astrolib FM_UNRED and python3-extinction use later anchor polynomials from E. Fitzpatrick
 * instead of Table 4 (their documentation says so); they differ from the paper's by ≤ 5e-4 mag per
 * mag of E(B−V) at R = 3.1 at the anchors.
 */
import { naturalCubicSpline } from "../numerics/naturalCubicSpline.js";

const x0 = 4.596; // µm⁻¹, bump position (F99 Table 3)
const gamma = 0.99; // µm⁻¹, bump width (F99 Table 3)
const c3 = 3.23; // bump strength (F99 Table 3)
const c4 = 0.41; // far-UV curvature (F99 Table 3)

/** Where the ultraviolet function takes over: 2700 Å [µm⁻¹] (F99 Appendix). */
const uvFromX = 1e4 / 2700;

/** The spline's anchors [µm⁻¹]: x = 0, then 26500, 12200, 6000, 5470, 4670, 4110, 2700 and 2600 Å (F99 Table 3). */
const anchorsX = [0, 1e4 / 26500, 1e4 / 12200, 1e4 / 6000, 1e4 / 5470, 1e4 / 4670, 1e4 / 4110, 1e4 / 2700, 1e4 / 2600];

/** A_λ/E(B−V) of the ultraviolet part, k + R (FM90 with F99's parameters). */
function ultraviolet(x: number, rv: number): number {
  const c2 = -0.824 + 4.717 / rv;
  const c1 = 2.03 - 3.007 * c2;
  const x2 = x * x;
  const d = x2 / ((x2 - x0 * x0) ** 2 + x2 * gamma * gamma);
  let k = c1 + c2 * x + c3 * d;
  if (x >= 5.9) {
    const y = x - 5.9;
    k += c4 * (0.5392 * y * y + 0.05644 * y * y * y);
  }
  return k + rv;
}

/** The anchor values A_λ/E(B−V) for R_V = rv. */
function anchorValues(rv: number): number[] {
  return [
    0,
    (0.265 * rv) / 3.1, // 26500 Å (F99 Table 3, scaled by R/3.1)
    (0.829 * rv) / 3.1, // 12200 Å (F99 Table 3, scaled by R/3.1)
    -0.426 + 1.0044 * rv, // 6000 Å (F99 Table 4)
    -0.05 + 1.0016 * rv, // 5470 Å (F99 Table 4)
    0.701 + 1.0016 * rv, // 4670 Å (F99 Table 4)
    1.208 + 1.0032 * rv - 0.00033 * rv * rv, // 4110 Å (F99 Table 4, with the sign that reproduces Table 3)
    ultraviolet(anchorsX[7], rv), // 2700 Å
    ultraviolet(anchorsX[8], rv), // 2600 Å
  ];
}

/** Splines already built, by R_V (a sheet uses a handful). */
const splines = new Map<number, (x: number) => number>();

/**
 * A_λ/E(B−V) of the F99 curve at x = 1/λ.
 * @param x inverse wavelength [µm⁻¹], in (0, ∞) (the law's range is checked in extinction.ts)
 * @param rv R_V = A_V/E(B−V), > 0
 * @returns A_λ/E(B−V)
 * @example fitzpatrickExtinctionPerEbv(1e4 / 4110, 3.1) // ≈ 4.315 (F99 Table 3)
 * @example fitzpatrickExtinctionPerEbv(1e4 / 2600, 3.1) // ≈ 6.591 (F99 Table 3)
 */
export function fitzpatrickExtinctionPerEbv(x: number, rv: number): number {
  if (x >= uvFromX) return ultraviolet(x, rv);
  let spline = splines.get(rv);
  if (spline === undefined) {
    spline = naturalCubicSpline(anchorsX, anchorValues(rv));
    if (splines.size >= 16) splines.clear();
    splines.set(rv, spline);
  }
  return spline(x);
}
