/**
 * Linear growth of cold matter on sub-horizon scales: D(a) solves
 *   d²D/dln a² + (2 + ½ dln E²/dln a) dD/dln a − (3/2) Ωm(a) D = 0
 * (Peebles 1980, The Large-Scale Structure of the Universe, §10; written in ln a), with Ωm(a) all
 * matter, massive neutrinos included as if they clustered like cold matter (their free streaming is
 * ignored), and the growth scale-independent. It holds for every model zcell builds: any curvature,
 * radiation, massive neutrinos, w0–wa dark energy.
 *
 * The ODE runs by classical Runge–Kutta (fourth order) in ln a from a = 1e-5, where matter and
 * radiation alone matter, started on the growing mode of that era, D ∝ a + (2/3) a_eq (Mészáros 1974,
 * A&A 37, 225: D ∝ 1 + 3y/2, y = a/a_eq; D ∝ a without radiation), to a = 1. D, dD/dln a and their
 * slopes are kept at every step, so a value between steps is a cubic Hermite interpolation; one table
 * a model, built at first use.
 */
import { checkRedshift } from "../checks/redshift.js";
import type { Cosmology } from "../distances/Cosmology.js";

/** ln a where the integration starts (a = 1e-5, z ≈ 1e5) and the number of steps to a = 1. */
const lnAStart = Math.log(1e-5);
const steps = 384;
const step = -lnAStart / steps;

interface GrowthTable {
  /** D, dD/dln a and d²D/dln a² at ln a = lnAStart + i·step, normalised to D(a = 1) = 1. */
  d: Float64Array;
  d1: Float64Array;
  d2: Float64Array;
}

const tables = new WeakMap<Cosmology, GrowthTable>();

function buildTable(model: Cosmology): GrowthTable {
  const expansion = model.expansion;
  // second derivative of D from (D, D′) at ln a
  const accel = (lnA: number, y: number, v: number): number => {
    const lnZp = -lnA;
    const zp = Math.exp(lnZp);
    const e2 = expansion.e2(zp, lnZp);
    const dlnE2 = (-zp * expansion.de2dz(zp, lnZp)) / e2;
    const om = expansion.matterDensity(zp) / e2;
    return -(2 + 0.5 * dlnE2) * v + 1.5 * om * y;
  };
  const d = new Float64Array(steps + 1);
  const d1 = new Float64Array(steps + 1);
  const d2 = new Float64Array(steps + 1);
  const a0 = Math.exp(lnAStart);
  const aEq = Number.isFinite(model.expansion.equalityRedshift) ? 1 / (1 + model.expansion.equalityRedshift) : 0;
  let y = a0 + (2 / 3) * aEq;
  let v = a0;
  for (let i = 0; i <= steps; i++) {
    const x = lnAStart + i * step;
    const acc = accel(x, y, v);
    d[i] = y;
    d1[i] = v;
    d2[i] = acc;
    if (i === steps) break;
    const h = step;
    const k1y = v;
    const k1v = acc;
    const k2y = v + 0.5 * h * k1v;
    const k2v = accel(x + 0.5 * h, y + 0.5 * h * k1y, k2y);
    const k3y = v + 0.5 * h * k2v;
    const k3v = accel(x + 0.5 * h, y + 0.5 * h * k2y, k3y);
    const k4y = v + h * k3v;
    const k4v = accel(x + h, y + h * k3y, k4y);
    y += (h / 6) * (k1y + 2 * k2y + 2 * k3y + k4y);
    v += (h / 6) * (k1v + 2 * k2v + 2 * k3v + k4v);
  }
  const today = d[steps];
  for (let i = 0; i <= steps; i++) {
    d[i] /= today;
    d1[i] /= today;
    d2[i] /= today;
  }
  return { d, d1, d2 };
}

function tableOf(model: Cosmology): GrowthTable {
  let table = tables.get(model);
  if (!table) tables.set(model, (table = buildTable(model)));
  return table;
}

/** Cubic Hermite value of f (slope g = df/dln a) at ln a. */
function hermite(f: Float64Array, g: Float64Array, lnA: number): number {
  const t = (lnA - lnAStart) / step;
  const i = Math.min(steps - 1, Math.max(0, Math.floor(t)));
  const s = t - i;
  const [f0, f1, g0, g1] = [f[i], f[i + 1], g[i] * step, g[i + 1] * step];
  const s2 = s * s;
  const s3 = s2 * s;
  return (2 * s3 - 3 * s2 + 1) * f0 + (s3 - 2 * s2 + s) * g0 + (-2 * s3 + 3 * s2) * f1 + (s3 - s2) * g1;
}

function lnAOf(z: number): number {
  checkRedshift(z);
  const lnA = -Math.log1p(z);
  if (lnA < lnAStart) throw new RangeError(`z = ${z}: linear growth is computed from z = 1e5 on (matter and radiation alone before)`);
  return lnA;
}

/**
 * The linear growth factor D(z)/D(0) of cold matter (sub-horizon, scale-independent).
 * @param model the cosmology
 * @param z redshift, 0 ≤ z ≤ 99999
 * @returns D(z)/D(0), dimensionless
 * @example growthFactor(Cosmology.fromSpec("EDS"), 1) // 0.5 (D ∝ a in Einstein–de Sitter)
 */
export function growthFactor(model: Cosmology, z: number): number {
  const t = tableOf(model);
  return hermite(t.d, t.d1, lnAOf(z));
}

/**
 * The linear growth rate f = d ln D / d ln a (fσ8 is then f × σ8(z)).
 * @param model the cosmology
 * @param z redshift, 0 ≤ z ≤ 99999
 * @returns f, dimensionless
 * @example growthRate(Cosmology.fromSpec("EDS"), 2) // 1 (Einstein–de Sitter)
 */
export function growthRate(model: Cosmology, z: number): number {
  const t = tableOf(model);
  const lnA = lnAOf(z);
  return hermite(t.d1, t.d2, lnA) / hermite(t.d, t.d1, lnA);
}
