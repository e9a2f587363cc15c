/**
 * The inverse of a model's distances, times and volumes: the redshift at which a quantity takes a
 * value. Node bisection, then Newton's method on the same interpolants the forward functions use
 * (so forward and inverse agree to rounding); the lower branch where a quantity has a maximum.
 */
import { hyperbolicRemainder } from "../numerics/hyperbolicRemainder.js";
import { NoSolutionError } from "../checks/NoSolutionError.js";
import { integrate } from "../numerics/quadrature.js";
import type { QuinticTable } from "../numerics/QuinticTable.js";
import { formatRedshift } from "../checks/redshift.js";
import { solveBracketed } from "../numerics/solveBracketed.js";

const relTolExact = 1e-14;
/** Nodes searched first by invertTable before doubling: one unit of ln(1+z) of the distance tables. */
const firstSearchPanels = 48;

/** Quantities that `redshiftAt` can invert, in the units of the matching method of Cosmology. */
export type InvertibleQuantity =
  | "comovingDistance"
  | "transverseComovingDistance"
  | "luminosityDistance"
  | "angularDiameterDistance"
  | "lightTravelDistance"
  | "distanceModulus"
  | "lookbackTime"
  | "age"
  | "comovingVolume";

/**
 * What the inverse reads of a model (Cosmology provides it): its tables in u = ln(1+z) of χ = D_C/D_H,
 * τ = t_L/t_H and ln(t/t_H), the exact integrals beyond them, and the curvature.
 */
export interface TabulatedModel {
  readonly Ok: number;
  readonly sqrtAbsOk: number;
  /** u = ln(1+z) at the top of the tables */
  readonly uMax: number;
  readonly chi: QuinticTable;
  readonly tau: QuinticTable;
  /** undefined for a model with an infinite past, or an age that is not finite numerically */
  readonly lnAge: QuinticTable | undefined;
  readonly hubbleDistanceMpc: number;
  readonly hubbleTimeGyr: number;
  readonly ageTodayGyr: number;
  readonly expansion: { leadingPower(): number; e2(onePlusZ: number, lnOnePlusZ: number): number };
  ageAtU(u: number): number;
  ageBeyond(u: number): number;
  chiAtU(u: number): number;
  chiBeyond(u: number): number;
  chiSlopeAtU(u: number): number;
  tauAtU(u: number): number;
  transverse(chi: number): number;
  transverseSlope(chi: number): number;
}

/** How an inverse's error message names the value asked for and quotes the model's limits. */
export interface InverseWording {
  /** The value asked for, e.g. "look-back time 20 Gyr". */
  asked: () => string;
  /** A limit of the model, given in the quantity's own unit (Mpc, mag, Gyr, Mpc³), as text. */
  limit: (value: number) => string;
}

const quantityWords: Record<InvertibleQuantity, [words: string, unit: string]> = {
  comovingDistance: ["comoving distance", "Mpc"],
  transverseComovingDistance: ["transverse comoving distance", "Mpc"],
  luminosityDistance: ["luminosity distance", "Mpc"],
  distanceModulus: ["distance modulus", "mag"],
  angularDiameterDistance: ["angular-diameter distance", "Mpc"],
  lightTravelDistance: ["light-travel distance", "Mpc"],
  lookbackTime: ["look-back time", "Gyr"],
  age: ["age", "Gyr"],
  comovingVolume: ["comoving volume", "Mpc3"],
};

function defaultWording(quantity: InvertibleQuantity, value: number): InverseWording {
  const [words, unit] = quantityWords[quantity] ?? [String(quantity), ""];
  const text = (v: number) => `${Number(v.toPrecision(6))} ${unit}`;
  return { asked: () => `${words} ${text(value)}`, limit: text };
}

/** The inverse of one model, with what it finds once per model (maxima, the horizon) kept. */
export class RedshiftInverse {
  private horizonChi: number | undefined;
  private readonly inverters = new Map<string, { values: Float64Array; count: number; peakU: number; peakValue: number }>();

  /** @param m the model inverted (its tables and exact integrals) */
  constructor(private readonly m: TabulatedModel) {}

  /** Line-of-sight χ (units of D_H) whose all-sky volume is v (units of D_H³); inverse of volumeOfChi. */
  private chiOfVolume(v: number): number {
    const flat = Math.cbrt((3 * v) / (4 * Math.PI));
    if (this.m.Ok === 0) return flat;
    const k = this.m.sqrtAbsOk;
    const sign: 1 | -1 = this.m.Ok > 0 ? 1 : -1;
    const targetRemainder = (v * k ** 3) / Math.PI;
    // remainder(y) is increasing in y (derivative cosh y − 1 or 1 − cos y ≥ 0); solve for y ≥ 0.
    let hi = 2 * k * flat;
    while (hyperbolicRemainder(hi, sign) < targetRemainder) hi *= 2;
    const y = solveBracketed(
      (x) => hyperbolicRemainder(x, sign),
      (x) => (sign > 0 ? Math.cosh(x) - 1 : 1 - Math.cos(x)) || 1e-300,
      targetRemainder,
      0,
      hi,
    );
    return y / (2 * k);
  }

  /** χ of a transverse comoving distance x (units of D_H) on the lower branch; NoSolutionError past the maximum. */
  private chiOfTransverse(x: number, w: InverseWording): number {
    if (this.m.Ok === 0) return x;
    const k = this.m.sqrtAbsOk;
    if (this.m.Ok > 0) return Math.asinh(k * x) / k;
    if (k * x > 1) {
      throw new NoSolutionError(`${w.asked()} exceeds its maximum in this closed model (${w.limit(this.m.hubbleDistanceMpc / k)})`);
    }
    return Math.asin(k * x) / k;
  }

  /** Largest χ (units of D_H) reached as z → ∞ (the particle horizon), Infinity if unbounded. */
  private horizon(): number {
    if (this.horizonChi === undefined) {
      if (this.m.expansion.leadingPower() <= 2) this.horizonChi = Number.POSITIVE_INFINITY;
      else {
        const sEnd = Math.exp(-0.5 * this.m.uMax);
        this.horizonChi =
          this.m.chi.node(this.m.chi.panels) +
          integrate((s) => 2 / (s * s * s * Math.sqrt(this.m.expansion.e2(1 / (s * s), -2 * Math.log(s)))), 0, sEnd, relTolExact);
      }
    }
    return this.horizonChi;
  }

  /**
   * u with table(u) = target for a table increasing in sign × value (its node 0 at or below the target),
   * or undefined when the target lies beyond its last node. Nodes are searched by doubling from the
   * start (a growing table is built only as far as the target), then bisected, then Newton on the interpolant.
   */
  private invertTable(table: QuinticTable, target: number, sign: 1 | -1): number | undefined {
    let lo = 0;
    let hi = Math.min(table.panels, firstSearchPanels);
    while (hi < table.panels && sign * table.node(hi) <= sign * target) {
      lo = hi;
      hi = Math.min(table.panels, 2 * hi);
    }
    if (sign * table.node(hi) < sign * target) return undefined;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (sign * table.node(mid) <= sign * target) lo = mid;
      else hi = mid;
    }
    const vLo = table.node(lo);
    const vHi = table.node(hi);
    const start = (lo + (vHi !== vLo ? (target - vLo) / (vHi - vLo) : 0.5)) * table.h;
    return solveBracketed(
      (u) => sign * table.value(u),
      (u) => sign * table.derivative(u),
      sign * target,
      lo * table.h,
      hi * table.h,
      start,
    );
  }

  /** u ≥ uMax where an increasing exact function g reaches target (slow path beyond the tables). */
  private invertBeyond(g: (u: number) => number, target: number, w: InverseWording): number {
    // g is an integral beyond the tables: a value that is not a finite number means it no longer converges there
    const below = (u: number) => {
      const v = g(u);
      if (!Number.isFinite(v)) throw new NoSolutionError(`${w.asked()}: this model's integrals do not converge that far back (z > 1e8)`);
      return v < target;
    };
    let lo = this.m.uMax;
    let hi = this.m.uMax + 1;
    while (below(hi)) {
      lo = hi;
      hi = this.m.uMax + 2 * (hi - this.m.uMax);
      if (hi > 690) throw new NoSolutionError(`no redshift has ${w.asked()}`);
    }
    for (let i = 0; i < 200 && hi - lo > 1e-15 * hi; i++) {
      const mid = 0.5 * (lo + hi);
      if (below(mid)) lo = mid;
      else hi = mid;
    }
    return 0.5 * (lo + hi);
  }

  private uOfChi(chi: number, w: InverseWording): number {
    if (chi <= 0) return 0;
    const u = this.invertTable(this.m.chi, chi, 1);
    if (u !== undefined) return u;
    if (chi >= this.horizon()) throw new NoSolutionError(`${w.asked()} lies beyond the particle horizon of this model`);
    return this.invertBeyond((u) => this.m.chiBeyond(u), chi, w);
  }

  /** @param scale the quantity's unit per t_H (t_H in Gyr for look-back, D_H in Mpc for light travel) */
  private uOfTau(tau: number, w: InverseWording, scale: number): number {
    if (tau <= 0) return 0;
    const ageToday = this.m.ageAtU(0);
    if (tau >= ageToday) {
      throw new NoSolutionError(`${w.asked()} is not below the age of the universe in this model (${w.limit(ageToday * scale)})`);
    }
    if (this.m.lnAge && tau > 0.5 * ageToday) return this.uOfAge(ageToday - tau, w);
    return this.invertTable(this.m.tau, tau, 1) ?? this.invertBeyond((u) => this.m.tauAtU(u), tau, w);
  }

  private uOfAge(age: number, w: InverseWording): number {
    const table = this.m.lnAge;
    if (!table) {
      throw new NoSolutionError(
        Number.isNaN(this.m.ageTodayGyr)
          ? `${w.asked()}: the age of this model is not finite to numerical precision (its past is too close to de Sitter), so age does not fix z`
          : `${w.asked()}: this model has an infinite past, so age does not fix z`,
      );
    }
    const ageToday = Math.exp(table.node(0));
    if (age > ageToday) {
      throw new NoSolutionError(`${w.asked()} exceeds the age of the universe today in this model (${w.limit(ageToday * this.m.hubbleTimeGyr)})`);
    }
    if (!(age > 0)) throw new NoSolutionError(`${w.asked()} must be positive`);
    const lnT = Math.log(age);
    return this.invertTable(table, lnT, -1) ?? this.invertBeyond((u) => -this.m.ageBeyond(u), -age, w);
  }

  /** D_L/D_H = e^u S_k(χ) or D_A/D_H = e^{−u} S_k(χ) and its u-derivative, for the inverse. */
  private readonly curves: Record<"DL" | "DA", { g: (u: number) => number; dg: (u: number) => number }> = {
    DL: {
      g: (u) => Math.exp(u) * this.m.transverse(this.m.chiAtU(u)),
      dg: (u) => {
        const chi = this.m.chiAtU(u);
        return Math.exp(u) * (this.m.transverse(chi) + this.m.transverseSlope(chi) * this.m.chiSlopeAtU(u));
      },
    },
    DA: {
      g: (u) => Math.exp(-u) * this.m.transverse(this.m.chiAtU(u)),
      dg: (u) => {
        const chi = this.m.chiAtU(u);
        return Math.exp(-u) * (this.m.transverseSlope(chi) * this.m.chiSlopeAtU(u) - this.m.transverse(chi));
      },
    },
  };

  /**
   * u solving curve(u) = target on the lower branch of D_L or D_A (units of D_H), which may rise to a
   * maximum and fall again. Node values are computed from z = 0 only as far as a target needs (past it,
   * or to the maximum, or to the end of the tables) and kept, with the maximum once found.
   */
  private uOfCurve(key: "DL" | "DA", target: number, w: InverseWording): number {
    const { g, dg } = this.curves[key];
    const h = this.m.chi.h;
    const n = this.m.chi.panels;
    let inv = this.inverters.get(key);
    if (!inv) {
      inv = { values: new Float64Array(n + 1), count: 1, peakU: Number.NaN, peakValue: Number.NaN };
      inv.values[0] = g(0);
      this.inverters.set(key, inv);
    }
    if (target <= 0) return 0;
    const values = inv.values;
    // rising node values 0 … count − 1; the maximum is NaN until the rise is known to stop (∞ if it never does)
    while (Number.isNaN(inv.peakU) && values[inv.count - 1] <= target) {
      const i = inv.count;
      if (i > n) {
        inv.peakU = inv.peakValue = Number.POSITIVE_INFINITY;
        break;
      }
      const v = g(i * h);
      if (v > values[i - 1]) {
        values[i] = v;
        inv.count = i + 1;
        continue;
      }
      const peak = i - 1;
      let lo = Math.max(0, peak - 1) * h;
      let hi = (peak + 1) * h;
      for (let k = 0; k < 200 && hi - lo > 1e-15; k++) {
        const mid = 0.5 * (lo + hi);
        if (dg(mid) > 0) lo = mid;
        else hi = mid;
      }
      inv.peakU = 0.5 * (lo + hi);
      inv.peakValue = g(inv.peakU);
    }
    if (target > inv.peakValue) {
      const dh = this.m.hubbleDistanceMpc;
      throw new NoSolutionError(
        `${w.asked()} exceeds its maximum in this model (${w.limit(inv.peakValue * dh)} at z = ${formatRedshift(Math.expm1(inv.peakU))})`,
      );
    }
    // the last rising node may lie just past the maximum (its value still above the node before):
    // the lower branch ends at peakU, so a bracket never reaches past it
    const last = inv.count - 1;
    const peakU = inv.peakU;
    if (target > values[last]) {
      if (!Number.isFinite(peakU)) return this.invertBeyond(g, target, w);
      const below = last * h <= peakU ? last : last - 1; // values[last − 1] ≤ values[last] < target
      return solveBracketed(g, dg, target, below * h, peakU);
    }
    let lo = 0;
    let hi = last;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (values[mid] <= target) lo = mid;
      else hi = mid;
    }
    const upper = peakU < hi * h ? peakU : hi * h; // NaN (maximum not known yet) compares false
    const start = Math.min((lo + (target - values[lo]) / (values[hi] - values[lo])) * h, upper);
    return solveBracketed(g, dg, target, lo * h, upper, start);
  }

  /**
   * The redshift at which a quantity takes a given value (see Cosmology.redshiftAt). Monotonic quantities have one solution; D_A (and, in closed models, D_M and D_L) rise
   * to a maximum and fall: the lower branch is returned, and a value above the maximum has no solution.
   *
   * @param quantity which function to invert
   * @param value its value, in that function's unit (Mpc, mag, Gyr or Mpc³)
   * @param wording how an error message names the value asked for and quotes the model's limits
   *   (default: in words and the function's unit, e.g. "look-back time 20 Gyr")
   * @returns redshift z ≥ 0
   * @throws NoSolutionError (a RangeError) when no redshift gives the value
   * @example new RedshiftInverse(Cosmology.fromSpec("EDS")).redshiftAt("lookbackTime", 8.148268514) // 3.0000 (EdS: (2/3) t_H (1 − (1+z)^{−3/2}) = 8.148 Gyr at z = 3)
   */
  redshiftAt(quantity: InvertibleQuantity, value: number, wording?: InverseWording): number {
    if (typeof value !== "number" || Number.isNaN(value)) throw new TypeError("value must be a number");
    const dh = this.m.hubbleDistanceMpc;
    const w = wording ?? defaultWording(quantity, value);
    if (quantity === "distanceModulus") {
      if (value === Number.NEGATIVE_INFINITY) return 0;
    } else if (value < 0) {
      throw new NoSolutionError(`${w.asked()} is negative: no redshift z ≥ 0 has it`);
    }
    if (!Number.isFinite(value)) throw new NoSolutionError(`${w.asked()}: no finite redshift has it`);
    let u: number;
    switch (quantity) {
      case "comovingDistance":
        u = this.uOfChi(value / dh, w);
        break;
      case "transverseComovingDistance":
        u = this.uOfChi(this.chiOfTransverse(value / dh, w), w);
        break;
      case "luminosityDistance":
        u = this.uOfCurve("DL", value / dh, w);
        break;
      case "distanceModulus": {
        const distance = 10 ** ((value - 25) / 5);
        if (!Number.isFinite(distance)) throw new NoSolutionError(`${w.asked()}: no finite redshift has it`);
        u = this.uOfCurve("DL", distance / dh, { asked: w.asked, limit: (mpc) => w.limit(5 * Math.log10(mpc) + 25) });
        break;
      }
      case "angularDiameterDistance":
        u = this.uOfCurve("DA", value / dh, w);
        break;
      case "lightTravelDistance":
        u = this.uOfTau(value / dh, w, dh);
        break;
      case "lookbackTime":
        u = this.uOfTau(value / this.m.hubbleTimeGyr, w, this.m.hubbleTimeGyr);
        break;
      case "age":
        u = this.uOfAge(value / this.m.hubbleTimeGyr, w);
        break;
      case "comovingVolume":
        u = this.uOfChi(this.chiOfVolume(value / (dh * dh * dh)), w);
        break;
      default:
        throw new TypeError(`unknown quantity "${String(quantity)}"`);
    }
    return Math.expm1(u);
  }
}
