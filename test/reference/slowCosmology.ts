/**
 * Independent slow path for the test suite: the same physics as core/distances/Cosmology.ts written again
 * directly from the equations, with a different quadrature (tanh-sinh, Takahasi & Mori 1974) and no
 * tables. Used only to check the fast path; it shares nothing with it but the constants module
 * (definitions, not code).
 */
import {
  boltzmannEvPerK,
  gravitationalConstantSI,
  megaparsecKm,
  megaparsecM,
  secondsPerGyr,
  speedOfLightKmPerS,
  speedOfLightMPerS,
  stefanBoltzmannSI,
} from "../../core/units/constants.js";

/** ∫_a^b f by tanh-sinh quadrature, halving the step until two levels agree to relTol (the error then is
 * far smaller: it roughly squares with each halving). */
export function tanhSinh(f: (x: number) => number, a: number, b: number, relTol = 1e-11): number {
  const half = 0.5 * (b - a);
  const tMax = 3.5;
  const term = (t: number): number => {
    const s = 0.5 * Math.PI * Math.sinh(t);
    const c = Math.cosh(s);
    const w = (0.5 * Math.PI * Math.cosh(t)) / (c * c);
    // distance from the nearer end, computed without cancellation
    const d = half / (Math.exp(s) * c);
    const x = s > 0 ? b - d : a + half / (Math.exp(-s) * c);
    if (d === 0 || x <= a || x >= b) return 0;
    const v = f(x) * w;
    return Number.isFinite(v) ? v : 0;
  };
  let h = 0.5;
  let sum = term(0);
  for (let k = 1; k * h <= tMax; k++) sum += term(k * h) + term(-k * h);
  let estimate = sum * h * half;
  for (let level = 0; level < 12; level++) {
    h /= 2;
    for (let k = 1; k * h <= tMax; k += 2) sum += term(k * h) + term(-k * h);
    const next = sum * h * half;
    if (Math.abs(next - estimate) <= relTol * Math.abs(next)) return next;
    estimate = next;
  }
  return estimate;
}

/** F(y) = 120/(7π⁴) ∫₀^∞ x²√(x²+y²)/(eˣ+1) dx by direct quadrature. */
export function slowFermiDirac(y: number): number {
  const f = (x: number) => (x * x * Math.sqrt(x * x + y * y)) / (Math.exp(x) + 1);
  const split = Math.max(Math.min(y, 40), 1e-3);
  const value = tanhSinh(f, 0, split) + tanhSinh(f, split, 40) + tanhSinh(f, 40, 120);
  return (120 / (7 * Math.PI ** 4)) * value;
}

export interface SlowParameters {
  H0: number;
  Om: number;
  OL?: number;
  Ok?: number;
  w0: number;
  wa: number;
  Tcmb: number;
  Neff: number;
  mnu: number[];
}

/** A model evaluated by brute-force quadrature, for checking the fast path. */
export class SlowCosmology {
  readonly dh: number;
  readonly th: number;
  readonly ogamma: number;
  readonly onuSpecies: number;
  readonly y0: number[];
  readonly ocold: number;
  readonly or: number;
  readonly ol: number;
  readonly ok: number;

  constructor(readonly p: SlowParameters) {
    this.dh = speedOfLightKmPerS / p.H0;
    this.th = megaparsecKm / p.H0 / secondsPerGyr;
    const h0 = (p.H0 * 1e3) / megaparsecM;
    const rhoCrit = (3 * h0 * h0) / (8 * Math.PI * gravitationalConstantSI);
    this.ogamma = (4 * stefanBoltzmannSI * p.Tcmb ** 4) / speedOfLightMPerS ** 3 / rhoCrit;
    this.onuSpecies = (p.Neff / 3) * (7 / 8) * Math.pow(4 / 11, 4 / 3) * this.ogamma;
    const tnu = boltzmannEvPerK * Math.pow(4 / 11, 1 / 3) * p.Tcmb;
    this.y0 = p.Tcmb > 0 ? p.mnu.filter((m) => m > 0).map((m) => m / tnu) : [];
    this.or = this.ogamma + (3 - this.y0.length) * this.onuSpecies;
    const onuMassive = this.y0.reduce((s, y) => s + this.onuSpecies * slowFermiDirac(y), 0);
    this.ocold = p.Om - onuMassive;
    if (p.OL !== undefined) {
      this.ol = p.OL;
      this.ok = 1 - p.Om - p.OL - this.or;
    } else if (p.Ok !== undefined) {
      this.ok = p.Ok;
      this.ol = 1 - p.Om - p.Ok - this.or;
    } else {
      this.ok = 0;
      this.ol = 1 - p.Om - this.or;
    }
  }

  E(z: number): number {
    const a = 1 + z;
    let e2 = this.ocold * a ** 3 + this.or * a ** 4 + this.ok * a * a;
    e2 += this.ol * Math.pow(a, 3 * (1 + this.p.w0 + this.p.wa)) * Math.exp((-3 * this.p.wa * z) / a);
    for (const y of this.y0) e2 += this.onuSpecies * a ** 4 * slowFermiDirac(y / a);
    return Math.sqrt(e2);
  }

  /** ∫ over u = ln(1+z) in unit-length pieces. */
  private overU(f: (u: number) => number, u1: number, u2: number): number {
    let total = 0;
    const pieces = Math.max(1, Math.ceil(u2 - u1));
    for (let i = 0; i < pieces; i++) {
      total += tanhSinh(f, u1 + ((u2 - u1) * i) / pieces, u1 + ((u2 - u1) * (i + 1)) / pieces);
    }
    return total;
  }

  comovingDistanceMpc(z: number): number {
    return this.dh * this.overU((u) => Math.exp(u) / this.E(Math.expm1(u)), 0, Math.log1p(z));
  }

  transverseComovingDistanceMpc(z: number): number {
    const dc = this.comovingDistanceMpc(z) / this.dh;
    const k = Math.sqrt(Math.abs(this.ok));
    if (this.ok > 0) return (this.dh * Math.sinh(k * dc)) / k;
    if (this.ok < 0) return (this.dh * Math.sin(k * dc)) / k;
    return this.dh * dc;
  }

  luminosityDistanceMpc(z: number): number {
    return (1 + z) * this.transverseComovingDistanceMpc(z);
  }

  angularDiameterDistanceMpc(z: number): number {
    return this.transverseComovingDistanceMpc(z) / (1 + z);
  }

  lookbackTimeGyr(z: number): number {
    return this.th * this.overU((u) => 1 / this.E(Math.expm1(u)), 0, Math.log1p(z));
  }

  /** ∫₀^{1/(1+z)} da/(aE) in pieces of ln a, the first from a = 0 by a = s². */
  ageGyr(z: number): number {
    const uStart = Math.log1p(z);
    const uFar = uStart + 8;
    const tail = tanhSinh((s) => 2 / (s * this.E(1 / (s * s) - 1)), 0, Math.exp(-0.5 * uFar));
    return this.th * (tail + this.overU((u) => 1 / this.E(Math.expm1(u)), uStart, uFar));
  }

  /** 4π ∫₀^{D_C} D_M² dD_C by quadrature (not the closed form). */
  comovingVolumeMpc3(z: number): number {
    const k = Math.sqrt(Math.abs(this.ok));
    const sk = (x: number) => (this.ok > 0 ? Math.sinh(k * x) / k : this.ok < 0 ? Math.sin(k * x) / k : x);
    const chi = this.comovingDistanceMpc(z) / this.dh;
    return 4 * Math.PI * this.dh ** 3 * tanhSinh((x) => sk(x) ** 2, 0, chi);
  }
}
