/**
 * The relativistic Fermi–Dirac energy-density factor of a massive neutrino species.
 *
 * F(y) = 120/(7π⁴) ∫₀^∞ x² √(x² + y²) / (eˣ + 1) dx,  y = m c² / (k_B T_ν),
 *
 * the energy density of one species (with its antiparticle) relative to the same species if massless
 * (F(0) = 1; F(y) → 180 ζ(3) y / (7π⁴) for y ≫ 1). This is the exact integral, not a fitting formula:
 * a quintic Hermite table in ln y (shared by all models; its nodes F, dF/dln y and d²F/dln y² come from
 * adaptive Gauss–Kronrod quadrature, computed ahead by scripts/makeFermiDiracTable.ts and stored in
 * fermiDiracTable.ts, so a page never spends the ~80 ms that quadrature takes), with the two-term small-y series
 * F = 1 + 5y²/(7π²) below y = e⁻¹⁰ and the large-y asymptotic series above y = e⁷.
 */
import { fermiDiracNodesBase64 } from "./fermiDiracTable.js";
import { integrate } from "./quadrature.js";
import { QuinticTable } from "./QuinticTable.js";

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
 * The table's nodes by quadrature (slow, ~80 ms): for each grid point, F, dF/ds and d²F/ds² in turn.
 * Used by scripts/makeFermiDiracTable.ts to write fermiDiracTable.ts, and by its test.
 */
export function fermiDiracNodesByQuadrature(): Float64Array {
  const out = new Float64Array(3 * fermiDiracGrid.nodes);
  for (let i = 0; i < fermiDiracGrid.nodes; i++) out.set(exactByQuadrature(Math.exp(sMin + i * step)), 3 * i);
  return out;
}

/**
 * Decodes base64 to doubles (little-endian) by itself: the functions may run where neither Buffer nor
 * atob exists (a bare JavaScript runtime, as the host simulation tests it).
 */
function decodeDoubles(base64: string): Float64Array {
  const alphabet = "ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789+/";
  const sextet = new Uint8Array(128);
  for (let i = 0; i < 64; i++) sextet[alphabet.charCodeAt(i)] = i;
  const bytes = new Uint8Array((base64.length * 3) / 4); // whole doubles: 6552 bytes, no "=" padding
  let bits = 0;
  let value = 0;
  let k = 0;
  for (let i = 0; i < base64.length; i++) {
    value = ((value << 6) | sextet[base64.charCodeAt(i)]) & 0xffffff;
    bits += 6;
    if (bits >= 8) {
      bits -= 8;
      bytes[k++] = (value >> bits) & 0xff;
    }
  }
  const view = new DataView(bytes.buffer);
  return Float64Array.from({ length: bytes.length / 8 }, (_, i) => view.getFloat64(8 * i, true));
}

/** The stored nodes (fermiDiracTable.ts), decoded: F, dF/ds, d²F/ds² for each grid point in turn. */
export function fermiDiracStoredNodes(): Float64Array {
  return decodeDoubles(fermiDiracNodesBase64);
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
  const nodes = fermiDiracStoredNodes();
  const n = fermiDiracGrid.nodes;
  const f = new Float64Array(n);
  const d1 = new Float64Array(n);
  const d2 = new Float64Array(n);
  for (let i = 0; i < n; i++) [f[i], d1[i], d2[i]] = [nodes[3 * i], nodes[3 * i + 1], nodes[3 * i + 2]];
  table = new QuinticTable(sMin, step, f, d1, d2);
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
 * @example fermiDiracDensityFactorLogSlope(1e4) // ≈ 1760 (≈ F: non-relativistic, F ∝ y)
 */
export function fermiDiracDensityFactorLogSlope(y: number): number {
  if (y <= 0) return 0;
  const s = Math.log(y);
  if (s < sMin) return 2 * smallYCoefficient * y * y;
  if (s > sMax) return largeYLogSlope(y);
  return getTable().derivative(s);
}
