/**
 * The tables behind every distance and time of a model: quintic Hermite tables in u = ln(1+z) on
 * [0, ln(1 + 10⁸)], 48 panels per unit, of χ = D_C/D_H, τ = t_L/t_H and ln(t/t_H). Node values come
 * from 7-point Gauss–Legendre panels of the exact integrands, first and second derivatives from E and
 * dE/dz analytically, so each panel is exact to ~1e-13.
 *
 * The tables grow as they are read: one unit of u (48 panels) at a time, in order from z = 0, so that
 * a model's first value at z ≈ 1 costs one unit, not the 19 up to z = 1e8 (node values are sums from
 * z = 0, so a value is the same however far the tables have grown). The age table grows likewise:
 * each unit starts from the exact age at its top and adds the look-back panels downwards. A model
 * whose E² could vanish (a negative curvature or dark-energy term, see ExpansionRate.cannotBounce) is
 * built in full at once: E² > 0 is checked at every node and quadrature point (a model without a big
 * bang is rejected, naming the redshift), then beyond the tables.
 */
import type { ExpansionRate } from "../model/ExpansionRate.js";
import { gaussRule, integrate } from "../numerics/quadrature.js";
import { QuinticTable } from "../numerics/QuinticTable.js";

/** Tables cover 0 ≤ z ≤ tableMaxRedshift; beyond, the exact integrals are evaluated directly. */
const tableMaxRedshift = 1e8;
/** Table panels per unit of ln(1+z); quintic Hermite error ∝ h⁶ (≈ 1e-13 relative, see tests). */
const panelsPerUnit = 48;
const relTolExact = 1e-14;

/** A model's tables: χ and τ (growing), and the age table with the age today, made at the first age asked for. */
export interface DistanceTables {
  /** u = ln(1+z) at the top of the tables */
  uMax: number;
  /** χ = D_C/D_H against u */
  chi: QuinticTable;
  /** τ = t_lookback/t_H against u */
  tau: QuinticTable;
  /** The age table and the age today in units of t_H (made once, at the first call). */
  age: () => AgeTable;
}

/** ln(t_age/t_H) against u, and the age today in units of t_H. */
export interface AgeTable {
  /** undefined for an infinite past or an age integral that does not converge */
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
 * The tables of a model (growing; built in full at once, with every check, for a model that might bounce).
 * @param expansion the model's expansion rate (validated parameters)
 * @returns the tables
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
  const { nodes, weights } = gaussRule;
  const offsets = nodes.map((x) => 0.5 * h * x);
  const expOffsets = offsets.map(Math.exp); // 1+z at a quadrature point = e^centre · e^offset: one exp a panel
  let built = 0; // panels of χ and τ built

  /** The nodes of panels from … to − 1 not yet computed: 1/E, its log-slope, checking E² > 0. */
  const nodesUpTo = (from: number, to: number) => {
    for (let i = from === 0 ? 0 : from + 1; i <= to; i++) {
      const u = i * h;
      const zp = Math.exp(u);
      const e2 = expansion.e2(zp, u);
      if (!(e2 > 0)) expansion.noBigBang(i > 0 ? Math.expm1((i - 1) * h) : 0, Math.expm1(u));
      invE[i] = 1 / Math.sqrt(e2);
      logSlope[i] = (0.5 * zp * expansion.de2dz(zp, u)) / e2;
      chi1[i] = zp * invE[i];
      chi2[i] = chi1[i] * (1 - logSlope[i]);
      tau1[i] = invE[i];
      tau2[i] = -invE[i] * logSlope[i];
    }
  };
  /** Builds the χ and τ panels up to the end of the unit holding `panel`. */
  const growChiTau = (panel: number) => {
    while (built <= panel) {
      const from = built;
      const to = Math.min(n, from + panelsPerUnit);
      nodesUpTo(from, to);
      for (let i = from; i < to; i++) {
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
      chiTable.setPanels(from, to, chi, chi1, chi2);
      tauTable.setPanels(from, to, tau, tau1, tau2);
      built = to;
    }
  };
  const chiTable = new QuinticTable(0, h, n, growChiTau);
  const tauTable = new QuinticTable(0, h, n, growChiTau);
  if (!expansion.cannotBounce()) {
    growChiTau(n - 1); // every node and quadrature point checked now, as the model is made
    expansion.checkBigBangBeyond(tableMaxRedshift);
  }

  let age: AgeTable | undefined;
  const makeAge = (): AgeTable => {
    const ageEnd = expansion.leadingPower() > 0 ? ageSinceBigBang(expansion, uMax) : Number.POSITIVE_INFINITY;
    // an infinite past, or (NaN) an age integral that does not converge numerically (a past too close to de Sitter)
    if (!(Number.isFinite(ageEnd) && ageEnd > 0)) return { lnAge: undefined, ageToday: ageEnd === Number.POSITIVE_INFINITY ? ageEnd : Number.NaN };
    const lnT = new Float64Array(n + 1);
    const lnT1 = new Float64Array(n + 1);
    const lnT2 = new Float64Array(n + 1);
    let ageBuilt = 0;
    const growAge = (panel: number) => {
      while (ageBuilt <= panel) {
        const from = ageBuilt;
        const to = Math.min(n, from + panelsPerUnit);
        growChiTau(to - 1);
        let t = to === n ? ageEnd : ageSinceBigBang(expansion, to * h);
        for (let i = to; i >= from; i--) {
          if (i < to) t += panelTau[i];
          lnT[i] = Math.log(t);
          const g1 = -invE[i] / t; // d ln T/du = −1/(E T)
          lnT1[i] = g1;
          lnT2[i] = -g1 * logSlope[i] - g1 * g1; // ((1+z)E' T − 1)/(E T)²
        }
        lnAgeTable.setPanels(from, to, lnT, lnT1, lnT2);
        ageBuilt = to;
      }
    };
    const lnAgeTable = new QuinticTable(0, h, n, growAge);
    return { lnAge: lnAgeTable, ageToday: Math.exp(lnAgeTable.node(0)) };
  };
  return { uMax, chi: chiTable, tau: tauTable, age: () => (age ??= makeAge()) };
}
