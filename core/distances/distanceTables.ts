/**
 * The tables behind every distance and time of a model: quintic Hermite tables in u = ln(1+z) on
 * [0, ln(1 + 10⁸)], 48 panels per unit, of χ = D_C/D_H, τ = t_L/t_H and ln(t/t_H). Node values come
 * from 7-point Gauss–Legendre panels of the exact integrands, first and second derivatives from E and
 * dE/dz analytically, so each panel is exact to ~1e-13; E² > 0 is checked at every node and quadrature
 * point (a model without a big bang is rejected, naming the redshift), then beyond the tables.
 */
import type { ExpansionRate } from "../model/ExpansionRate.js";
import { gaussRule, integrate } from "../numerics/quadrature.js";
import { QuinticTable } from "../numerics/QuinticTable.js";

/** Tables cover 0 ≤ z ≤ tableMaxRedshift; beyond, the exact integrals are evaluated directly. */
const tableMaxRedshift = 1e8;
/** Table panels per unit of ln(1+z); quintic Hermite error ∝ h⁶ (≈ 1e-13 relative, see tests). */
const panelsPerUnit = 48;
const relTolExact = 1e-14;

/** A model's tables, and its age today in units of t_H. */
export interface DistanceTables {
  /** u = ln(1+z) at the top of the tables */
  uMax: number;
  /** χ = D_C/D_H against u */
  chi: QuinticTable;
  /** τ = t_lookback/t_H against u */
  tau: QuinticTable;
  /** ln(t_age/t_H) against u; undefined for an infinite past or an age integral that does not converge */
  lnAge: QuinticTable | undefined;
  /** age today / t_H: +∞ for an infinite past, NaN when the age integral does not converge numerically */
  ageToday: number;
}

/**
 * Age in units of t_H at u = ln(1+z), t/t_H = ∫₀^a da/(a E) with a = s² (regular at s = 0 for matter
 * or radiation domination).
 * @param expansion the model's expansion rate
 * @param u ln(1+z) ≥ 0
 * @returns t/t_H, dimensionless
 */
export function ageSinceBigBang(expansion: ExpansionRate, u: number): number {
  const sEnd = Math.exp(-0.5 * u);
  return integrate(
    (s) => {
      const lnZp = -2 * Math.log(s);
      return 2 / (s * Math.sqrt(expansion.e2(1 / (s * s), lnZp)));
    },
    0,
    sEnd,
    relTolExact,
  );
}

/**
 * Builds the tables of a model.
 * @param expansion the model's expansion rate (validated parameters)
 * @returns the tables and the age today in units of t_H
 * @throws RangeError if E²(z) ≤ 0 somewhere at z ≥ 0 (no big bang: a bounce)
 */
export function buildDistanceTables(expansion: ExpansionRate): DistanceTables {
  const uMax = Math.log1p(tableMaxRedshift);
  const n = Math.ceil(uMax * panelsPerUnit);
  const h = uMax / n;
      const chi = new Float64Array(n + 1);
  const chi1 = new Float64Array(n + 1);
  const chi2 = new Float64Array(n + 1);
  const tau = new Float64Array(n + 1);
  const tau1 = new Float64Array(n + 1);
  const tau2 = new Float64Array(n + 1);
  const panelTau = new Float64Array(n);
  const invE = new Float64Array(n + 1);
  const logSlope = new Float64Array(n + 1); // (1+z) E'(z) / E = d ln E / du
  const zpAt = new Float64Array(n + 1);
  // E² > 0 is checked at every node and quadrature point as the tables are built (a model
  // without a big bang is rejected, naming the redshift), then beyond the tables.
  for (let i = 0; i <= n; i++) {
    const u = i * h;
    const zp = (zpAt[i] = Math.exp(u));
    const e2 = expansion.e2(zp, u);
    if (!(e2 > 0)) expansion.noBigBang(i > 0 ? Math.expm1((i - 1) * h) : 0, Math.expm1(u));
    invE[i] = 1 / Math.sqrt(e2);
    logSlope[i] = (0.5 * zp * expansion.de2dz(zp, u)) / e2;
  }
  const { nodes, weights } = gaussRule;
  const offsets = nodes.map((x) => 0.5 * h * x);
  const expOffsets = offsets.map(Math.exp); // 1+z at a quadrature point = e^centre · e^offset: one exp a panel
  for (let i = 0; i < n; i++) {
    const centre = (i + 0.5) * h;
    const expCentre = Math.exp(centre);
    let sumChi = 0;
    let sumTau = 0;
    for (let j = 0; j < 7; j++) {
      const u = centre + offsets[j];
      const zp = expCentre * expOffsets[j];
      const e2 = expansion.e2(zp, u);
      if (!(e2 > 0)) expansion.noBigBang(Math.expm1(i * h), Math.expm1(u));
      const inv = 1 / Math.sqrt(e2);
      sumChi += weights[j] * zp * inv;
      sumTau += weights[j] * inv;
    }
    chi[i + 1] = chi[i] + 0.5 * h * sumChi;
    panelTau[i] = 0.5 * h * sumTau;
    tau[i + 1] = tau[i] + panelTau[i];
  }
  for (let i = 0; i <= n; i++) {
    const zp = zpAt[i];
    chi1[i] = zp * invE[i];
    chi2[i] = chi1[i] * (1 - logSlope[i]);
    tau1[i] = invE[i];
    tau2[i] = -invE[i] * logSlope[i];
  }
  expansion.checkBigBangBeyond(tableMaxRedshift);
  const chiTable = new QuinticTable(0, h, chi, chi1, chi2);
  const tauTable = new QuinticTable(0, h, tau, tau1, tau2);

  const ageEnd = expansion.leadingPower() > 0 ? ageSinceBigBang(expansion, uMax) : Number.POSITIVE_INFINITY;
  if (Number.isFinite(ageEnd) && ageEnd > 0) {
    const lnT = new Float64Array(n + 1);
    const lnT1 = new Float64Array(n + 1);
    const lnT2 = new Float64Array(n + 1);
    let t = ageEnd;
    for (let i = n; i >= 0; i--) {
      if (i < n) t += panelTau[i];
      lnT[i] = Math.log(t);
      const g1 = -invE[i] / t; // d ln T/du = −1/(E T)
      lnT1[i] = g1;
      lnT2[i] = -g1 * logSlope[i] - g1 * g1; // ((1+z)E' T − 1)/(E T)²
    }
    return { uMax, chi: chiTable, tau: tauTable, lnAge: new QuinticTable(0, h, lnT, lnT1, lnT2), ageToday: Math.exp(lnT[0]) };
  }
  // an infinite past, or (NaN) an age integral that does not converge numerically (a past too close to de Sitter)
  return { uMax, chi: chiTable, tau: tauTable, lnAge: undefined, ageToday: ageEnd === Number.POSITIVE_INFINITY ? ageEnd : Number.NaN };
}

