/**
 * The relativistic Fermi–Dirac energy-density factor of a massive neutrino species.
 *
 * F(y) = 120/(7π⁴) ∫₀^∞ x² √(x² + y²) / (eˣ + 1) dx,  y = m c² / (k_B T_ν),
 *
 * the energy density of one species (with its antiparticle) relative to the same species if massless
 * (F(0) = 1; F(y) → 180 ζ(3) y / (7π⁴) for y ≫ 1). This is the exact integral, not a fitting formula:
 * a quintic Hermite table in ln y (shared by all models), with the two-term small-y series
 * F = 1 + 5y²/(7π²) below y = e⁻¹⁰ and the large-y asymptotic series above y = e⁷.
 *
 * The table's nodes (F, dF/dln y, d²F/dln y²) are computed by one fixed exp-sinh rule
 * (Takahasi & Mori 1974 double-exponential quadrature: x = exp((π/2) sinh t), 105 points, step 1/18,
 * t from −3.8 (x ≈ 6e-16) to 1.98 (x ≈ 290, where 1/(eˣ+1) < 1e-120)) shared by all 273 nodes, so the
 * occupation is evaluated once per point, not once per node (a few ms, against ~80 ms for adaptive
 * quadrature at every node), and stored in fermiDiracNodes.ts (`npm run tables`), so that a page's first
 * formula does not wait for them.
 * test/fermiDiracTable.test.ts checks every node against adaptive Gauss–Kronrod quadrature to 1e-15.
 */
import { integrate } from "../numerics/quadrature.js";
import { QuinticTable } from "../numerics/QuinticTable.js";
import { fermiDiracNodes } from "./fermiDiracNodes.js";

const normalisation = 120 / (7 * Math.PI ** 4);
/** Small-y coefficient: dF/d(y²) at 0 = (K/2)∫x/(eˣ+1)dx = (K/2)(π²/12) = 5/(7π²). */
const smallYCoefficient = 5 / (7 * Math.PI ** 2);
const sMin = -10;
const sMax = 7;
const step = 1 / 16;
const upperLimit = 64; // ∫_64^∞ x³e⁻ˣ dx < 1e-22 relative: negligible

/**
 * Large-y series: √(x²+y²) = y Σ binom(1/2, k) (x/y)^{2k}, with
 * ∫₀^∞ x^{2k+2}/(eˣ+1) dx = (1 − 2^{−(2k+2)}) (2k+2)! ζ(2k+3) (Gradshteyn & Ryzhik 3.411.3).
 * Coefficients a_k = K binom(1/2,k) (1 − 2^{−(2k+2)}) (2k+2)! ζ(2k+3); ζ values from memory
 * (checked by the continuity test against quadrature at y = e⁷).
 */
const zetaOdd = [1.2020569031595942, 1.0369277551433699, 1.0083492773819228, 1.0020083928260822, 1.0004941886041195];
const largeYCoefficients = zetaOdd.map((zeta, k) => {
  let binom = 1;
  for (let j = 0; j < k; j++) binom *= (0.5 - j) / (j + 1);
  let factorial = 1;
  for (let j = 2; j <= 2 * k + 2; j++) factorial *= j;
  return normalisation * binom * (1 - 2 ** -(2 * k + 2)) * factorial * zeta;
});

function occupation(x: number): number {
  const e = Math.exp(-x);
  return e / (1 + e);
}

/** F, dF/ds and d²F/ds² (s = ln y) by direct quadrature. Slow; used to build the table. */
function exactByQuadrature(y: number): [number, number, number] {
  const y2 = y * y;
  const f = integrate((x) => x * x * Math.sqrt(x * x + y2) * occupation(x), 0, upperLimit, 1e-15);
  const d1 = integrate((x) => (x * x * y2 * occupation(x)) / Math.sqrt(x * x + y2), 0, upperLimit, 1e-15);
  const d2 = integrate((x) => {
    const r2 = x * x + y2;
    return (x ** 4 * y2 * occupation(x)) / (r2 * Math.sqrt(r2));
  }, 0, upperLimit, 1e-15);
  return [normalisation * f, normalisation * d1, normalisation * (d1 + d2)];
}

/** The grid of the shared table in s = ln y. */
export const fermiDiracGrid = { sMin, step, nodes: Math.round((sMax - sMin) / step) + 1 } as const;

/**
 * The table's nodes by adaptive quadrature (slow, ~80 ms): for each grid point, F, dF/ds and d²F/ds²
 * in turn. The reference the fixed rule is tested against.
 */
export function fermiDiracNodesByQuadrature(): Float64Array {
  const out = new Float64Array(3 * fermiDiracGrid.nodes);
  for (let i = 0; i < fermiDiracGrid.nodes; i++) out.set(exactByQuadrature(Math.exp(sMin + i * step)), 3 * i);
  return out;
}

/** The fixed exp-sinh rule of the table: x = exp((π/2) sinh t), t = −3.8 … 1.98 in steps of 1/18. */
const rule = { tMin: -3.8, step: 1 / 18, points: 105 } as const;

/**
 * The table's nodes by the fixed exp-sinh rule: for each grid point, F, dF/ds and d²F/ds² in turn
 * (the same integrals as fermiDiracNodesByQuadrature, to ~1e-15).
 */
export function fermiDiracNodesByRule(): Float64Array {
  const x2 = new Float64Array(rule.points);
  const weight = new Float64Array(rule.points); // step × dx/dt × x² / (eˣ + 1) × normalisation
  for (let i = 0; i < rule.points; i++) {
    const t = rule.tMin + i * rule.step;
    const x = Math.exp((Math.PI / 2) * Math.sinh(t));
    x2[i] = x * x;
    weight[i] = rule.step * (Math.PI / 2) * Math.cosh(t) * x * x2[i] * occupation(x) * normalisation;
  }
  const out = new Float64Array(3 * fermiDiracGrid.nodes);
  for (let k = 0; k < fermiDiracGrid.nodes; k++) nodeByRule(x2, weight, Math.exp(2 * (sMin + k * step)), out, 3 * k);
  return out;
}

/** One node: F = Σ w √(x²+y²), dF/ds = Σ w y²/√(x²+y²), d²F/ds² = dF/ds + Σ w x² y²/(x²+y²)^{3/2}. */
function nodeByRule(x2: Float64Array, weight: Float64Array, y2: number, out: Float64Array, at: number): void {
  let f = 0;
  let d1 = 0;
  let d2 = 0;
  for (let i = 0; i < x2.length; i++) {
    const r2 = x2[i] + y2;
    const r = Math.sqrt(r2);
    const w = weight[i];
    f += w * r;
    const q = (w * y2) / r;
    d1 += q;
    d2 += (q * x2[i]) / r2;
  }
  out[at] = f;
  out[at + 1] = d1;
  out[at + 2] = d1 + d2;
}

let table: QuinticTable | undefined;

/**
 * The shared table of F against s = ln y on [fermiDiracGrid.sMin, sMin + (nodes − 1)·step], for a
 * caller that evaluates F many times with ln y at hand (the expansion rate); outside that range the
 * series of fermiDiracDensityFactor apply.
 */
export function fermiDiracTable(): QuinticTable {
  return getTable();
}

function getTable(): QuinticTable {
  if (table) return table;
  const nodes = fermiDiracNodes;
  const n = fermiDiracGrid.nodes;
  const f = new Float64Array(n);
  const d1 = new Float64Array(n);
  const d2 = new Float64Array(n);
  for (let i = 0; i < n; i++) [f[i], d1[i], d2[i]] = [nodes[3 * i], nodes[3 * i + 1], nodes[3 * i + 2]];
  table = QuinticTable.fromNodes(sMin, step, f, d1, d2);
  return table;
}

function largeY(y: number): number {
  const inv2 = 1 / (y * y);
  let sum = 0;
  for (let k = largeYCoefficients.length - 1; k >= 0; k--) sum = sum * inv2 + largeYCoefficients[k];
  return y * sum;
}

function largeYLogSlope(y: number): number {
  const inv2 = 1 / (y * y);
  let sum = 0;
  for (let k = largeYCoefficients.length - 1; k >= 0; k--) sum = sum * inv2 + (1 - 2 * k) * largeYCoefficients[k];
  return y * sum;
}

/**
 * Fermi–Dirac energy-density factor F(y) of a massive neutrino species, relative to massless.
 *
 * @param y m c² / (k_B T_ν), dimensionless, ≥ 0
 * @returns F(y), dimensionless, ≥ 1
 * @example fermiDiracDensityFactor(0) // 1
 * @example fermiDiracDensityFactor(358) // ≈ 113.6 (0.06 eV today, T_ν0 = 1.945 K)
 */
export function fermiDiracDensityFactor(y: number): number {
  if (y <= 0) return 1;
  const s = Math.log(y);
  if (s < sMin) return 1 + smallYCoefficient * y * y;
  if (s > sMax) return largeY(y);
  return getTable().value(s);
}

/**
 * F(y) when ln y is already known (the expansion rate has ln(1+z) at hand: ln y = ln y0 − ln(1+z)),
 * saving the logarithm; the same value as fermiDiracDensityFactor(y) to rounding.
 *
 * @param y m c² / (k_B T_ν), dimensionless, > 0
 * @param lnY ln y
 * @returns F(y), dimensionless, ≥ 1
 */
export function fermiDiracDensityFactorLn(y: number, lnY: number): number {
  if (lnY < sMin) return 1 + smallYCoefficient * y * y;
  if (lnY > sMax) return largeY(y);
  return getTable().value(lnY);
}

/**
 * Logarithmic slope dF/d ln y of the Fermi–Dirac density factor (used for dE/dz).
 *
 * @param y m c² / (k_B T_ν), dimensionless, ≥ 0
 * @returns y F'(y), dimensionless, ≥ 0; 0 at y = 0, → F(y) for y ≫ 1
 * @example fermiDiracDensityFactorLogSlope(1e4) // ≈ 3173.2 (≈ F = 180ζ(3) y/(7π⁴): non-relativistic, F ∝ y)
 */
export function fermiDiracDensityFactorLogSlope(y: number): number {
  if (y <= 0) return 0;
  const s = Math.log(y);
  if (s < sMin) return 2 * smallYCoefficient * y * y;
  if (s > sMax) return largeYLogSlope(y);
  return getTable().derivative(s);
}
