/**
 * Linear growth of matter perturbations on sub-horizon scales, scale-independent: D(a) solves
 *   d²D/dln a² + (2 + ½ dln E²/dln a) dD/dln a − (3/2) Ω_s(a) D = 0
 * (Peebles 1980, The Large-Scale Structure of the Universe, §10; written in ln a), where E(a) is the
 * model's whole expansion rate and Ω_s(a) = ρ_s/ρ_crit(a) the density that clusters, the source. Massive
 * neutrinos enter the source in one of the two limits of the trade (Lesgourgues & Pastor 2006, Phys.
 * Rep. 429, 307, from memory: on scales well inside their free-streaming length they stay smooth; on
 * scales well outside it they cluster like cold matter once non-relativistic):
 * - "smooth": the source is cold matter alone, CDM + baryons (OMEGA("cold")): the growth on small
 *   scales, where massive neutrinos are a smooth background that only adds to the expansion rate;
 * - "clustering": the source adds the neutrinos' ρ_ν − 3P_ν, the part of their density that gravitates
 *   like matter (0 while relativistic, → ρ_ν once non-relativistic; from the Fermi–Dirac integrals,
 *   ρ − 3P = ρ_massless × dF/dln y): the growth on large scales.
 * Without massive neutrinos the two are the same. Radiation (photons and relativistic neutrinos) never
 * clusters; baryons are counted in the source at every z, also before the drag epoch (z ≈ 1060), when
 * they are held by the photons and do not cluster: far above z ≈ 1000 the result is the formal
 * solution of this equation, not the growth of the coupled baryon–photon universe. It holds for any
 * curvature, radiation, massive neutrinos and w0–wa dark energy, as long as matter and radiation
 * dominate early on (the rule below).
 *
 * The ODE runs by classical Runge–Kutta (fourth order) in ln a from a = 1e-8 (z ≈ 1e8, deep in
 * radiation domination), started on the growing mode of matter and radiation, D ∝ a + (2/3) a_eq with
 * a_eq = Ω_r/Ω_cb counting every neutrino as radiation (Mészáros 1974, A&A 37, 225: D ∝ 1 + 3y/2,
 * y = a/a_eq; D ∝ a without radiation), to a = 1. That mode is exact for matter and radiation alone,
 * and every other term is small at the start: dark energy ~1e-32 of E² in ΛCDM; the neutrinos' mass,
 * ~(m/T_ν)² of their density, leaves a trace that starts from a = 1e-10 and 1e-12 move by at most
 * 9e-11 (f at z = 99999 for 0.3 eV, "clustering"; a start at 1e-6 would move it by 9e-7). A dark energy
 * that is more than 1e-6 of E² at a = 1e-8 but fades into the past (w0 + wa below radiation's 1/3, or
 * matter's 0 without radiation) moves the start to the first power of ten below 1e-8 where it is less,
 * down to a = 1e-30; one still above 1e-6 there is refused with the reason: w0 + wa above about 0.22
 * with radiation (for P18-CMB's densities), above about −0.07 without. Tested against an independent
 * integration and for independence from the start (test/growth.test.ts). D, dD/dln a and their
 * slopes are kept at every step, so a value between steps is a cubic Hermite interpolation; one table
 * a model and convention, built at first use.
 */
import { checkRedshift } from "../checks/redshift.js";
import type { Cosmology } from "../distances/Cosmology.js";
import { fermiDiracDensityFactorLogSlope } from "../model/fermiDirac.js";

/** How massive neutrinos enter the source of the growth equation (see the file's comment). */
export const growthNeutrinoConventions = ["smooth", "clustering"] as const;
export type GrowthNeutrinos = (typeof growthNeutrinoConventions)[number];

/** The step in ln a. */
const targetStep = 0.018;
/** Largest redshift asked of the growth (the tables start far above it). */
const maxRedshift = 99_999;
/**
 * Largest share of E² at the start held by dark energy: the starting mode, matter and radiation's,
 * would not be the growing one. Our choice; in ΛCDM it is ~1e-32 at a = 1e-8.
 */
const largestDarkEnergyShareAtStart = 1e-6;
/** Where the integration starts: a = 1e-8 (z ≈ 1e8), or a power of ten below it down to 1e-30 where dark energy is not yet small there. */
const latestStartPower = 8;
const earliestStartPower = 30;

interface GrowthTable {
  lnAStart: number;
  step: number;
  steps: number;
  /** D, dD/dln a and d²D/dln a² at ln a = lnAStart + i·step, normalised to D(a = 1) = 1. */
  d: Float64Array;
  d1: Float64Array;
  d2: Float64Array;
}

const tables: Record<GrowthNeutrinos, WeakMap<Cosmology, GrowthTable>> = { smooth: new WeakMap(), clustering: new WeakMap() };

/** The clustering source ρ_s / ρ_crit,0 at 1+z = zp: cold matter, plus the neutrinos' ρ − 3P when they cluster. */
function sourceDensity(model: Cosmology, neutrinos: GrowthNeutrinos, zp: number): number {
  const expansion = model.expansion;
  let source = expansion.coldMatter * zp * zp * zp;
  if (neutrinos === "clustering") {
    const y0 = expansion.massiveY0;
    let nu = 0;
    for (let i = 0; i < y0.length; i++) nu += fermiDiracDensityFactorLogSlope(y0[i] / zp);
    source += expansion.neutrinoSpeciesDensity * zp ** 4 * nu;
  }
  return source;
}

/** |Ω_DE(a)|, the share of E² held by dark energy at scale factor a. */
function darkEnergyShare(model: Cosmology, a: number): number {
  return Math.abs(model.expansion.densityParameter("darkenergy", 1 / a - 1));
}

/**
 * ln a where the integration starts: 1e-8, or the first power of ten below it where dark energy is at
 * most 1e-6 of E², or 1e-30 (buildTable then refuses the model with the reason); 1e-8 without matter.
 */
function startLnA(model: Cosmology): number {
  if (model.expansion.coldMatter === 0) return Math.log(Number(`1e-${latestStartPower}`)); // no source: D is constant
  for (let k = latestStartPower; k < earliestStartPower; k++) {
    const a = Number(`1e-${k}`);
    if (darkEnergyShare(model, a) <= largestDarkEnergyShareAtStart) return Math.log(a);
  }
  return Math.log(Number(`1e-${earliestStartPower}`));
}

/**
 * Why a model whose dark energy is still `share` of E² at scale factor a0 has no growing mode to start
 * on, naming what should dominate early on (radiation, or matter in a model without radiation) and
 * its w (1/3, 0) against w0 + wa, dark energy's w in the far past.
 */
function earlyDarkEnergyMessage(model: Cosmology, share: number, a0: number): string {
  const w = model.w0 + model.wa;
  const withRadiation = model.expansion.Or + model.expansion.OnuMassive > 0;
  const [dominant, wDominant, wText] = withRadiation ? ["radiation", 1 / 3, "1/3"] : ["matter", 0, "0"];
  const needs = withRadiation
    ? "linear growth needs matter and radiation to dominate H² early on, but in this model dark energy"
    : "linear growth needs matter to dominate H² early on (this model has no radiation), but its dark energy";
  const ws = `w0 + wa = ${Number(w.toPrecision(6))} (${dominant}: ${wText})`;
  if (w >= wDominant) return `${needs} grows into the past as fast as ${dominant} or faster: ${ws}`;
  return `${needs} fades into the past too slowly: ${ws}, and it is still ${Number((share * 100).toPrecision(3))}% of H² at a = ${Number(a0.toPrecision(3))}`;
}

function buildTable(model: Cosmology, neutrinos: GrowthNeutrinos, lnA0: number): GrowthTable {
  const expansion = model.expansion;
  const steps = Math.ceil(-lnA0 / targetStep);
  const step = -lnA0 / steps;
  // second derivative of D from (D, D′) at ln a
  const accel = (lnA: number, y: number, v: number): number => {
    const lnZp = -lnA;
    const zp = Math.exp(lnZp);
    const e2 = expansion.e2(zp, lnZp);
    const dlnE2 = (-zp * expansion.de2dz(zp, lnZp)) / e2;
    return -(2 + 0.5 * dlnE2) * v + (1.5 * sourceDensity(model, neutrinos, zp) * y) / e2;
  };
  // the growing mode of cold matter and radiation (every neutrino relativistic), scaled by Ω_cb:
  // D = Ω_cb a + (2/3) Ω_r, D′ = Ω_cb a; a model with neither has D constant
  const a0 = Math.exp(lnA0);
  const cold = expansion.coldMatter;
  const radiation = expansion.Ogamma + 3 * expansion.neutrinoSpeciesDensity;
  // dark energy's share (curvature's, Ω_k a/Ω_m at most, only shrinks into the past); a model without
  // matter has no source, and D stays constant whatever dark energy does
  const share = darkEnergyShare(model, a0);
  if (share > largestDarkEnergyShareAtStart && cold > 0) throw new RangeError(earlyDarkEnergyMessage(model, share, a0));
  let y = cold * a0 + (2 / 3) * radiation;
  let v = cold * a0;
  if (y === 0) [y, v] = [1, 0];
  const d = new Float64Array(steps + 1);
  const d1 = new Float64Array(steps + 1);
  const d2 = new Float64Array(steps + 1);
  for (let i = 0; i <= steps; i++) {
    const x = lnA0 + i * step;
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
  return { lnAStart: lnA0, step, steps, d, d1, d2 };
}

function tableOf(model: Cosmology, neutrinos: GrowthNeutrinos): GrowthTable {
  const cache = tables[neutrinos];
  if (!cache) throw new TypeError(`unknown neutrino convention "${String(neutrinos)}": use ${growthNeutrinoConventions.join(" or ")}`);
  let table = cache.get(model);
  if (!table) cache.set(model, (table = buildTable(model, neutrinos, startLnA(model))));
  return table;
}

/** Cubic Hermite value of f (slope g = df/dln a) at ln a. */
function hermite(t: GrowthTable, f: Float64Array, g: Float64Array, lnA: number): number {
  const u = (lnA - t.lnAStart) / t.step;
  const i = Math.min(t.steps - 1, Math.max(0, Math.floor(u)));
  const s = u - i;
  const [f0, f1, g0, g1] = [f[i], f[i + 1], g[i] * t.step, g[i + 1] * t.step];
  const s2 = s * s;
  const s3 = s2 * s;
  return (2 * s3 - 3 * s2 + 1) * f0 + (s3 - 2 * s2 + s) * g0 + (-2 * s3 + 3 * s2) * f1 + (s3 - s2) * g1;
}

function lnAOf(z: number): number {
  checkRedshift(z);
  if (z > maxRedshift) throw new RangeError(`z = ${z}: linear growth is given up to z = 99999`);
  return -Math.log1p(z);
}

/**
 * The linear growth factor D(z)/D(0) (sub-horizon, scale-independent).
 * @param model the cosmology
 * @param z redshift, 0 ≤ z ≤ 99999
 * @param neutrinos "smooth" (source CDM + baryons: small scales; the default) or "clustering"
 *   (source adds the massive neutrinos' ρ − 3P: large scales); the same without massive neutrinos
 * @returns D(z)/D(0), dimensionless
 * @example growthFactor(Cosmology.fromSpec("EDS"), 1) // 0.5 (D ∝ a in Einstein–de Sitter)
 */
export function growthFactor(model: Cosmology, z: number, neutrinos: GrowthNeutrinos = "smooth"): number {
  const lnA = lnAOf(z);
  const t = tableOf(model, neutrinos);
  return hermite(t, t.d, t.d1, lnA);
}

/**
 * The linear growth rate f = d ln D / d ln a (fσ8 is then f × σ8(z)).
 * @param model the cosmology
 * @param z redshift, 0 ≤ z ≤ 99999
 * @param neutrinos "smooth" (the default) or "clustering", as for growthFactor
 * @returns f, dimensionless
 * @example growthRate(Cosmology.fromSpec("EDS"), 2) // 1 (Einstein–de Sitter)
 */
export function growthRate(model: Cosmology, z: number, neutrinos: GrowthNeutrinos = "smooth"): number {
  const lnA = lnAOf(z);
  const t = tableOf(model, neutrinos);
  return hermite(t, t.d1, t.d2, lnA) / hermite(t, t.d, t.d1, lnA);
}

/**
 * D(z)/D(0) and f(z) from an integration started at scale factor `startA` instead of where
 * growthFactor starts (a table built for this call, not kept): shows that the result does not depend
 * on the start.
 * @param model the cosmology
 * @param z redshift, 0 ≤ z < 1/startA − 1
 * @param neutrinos "smooth" or "clustering"
 * @param startA the scale factor where the integration starts, 0 < startA < 1/(1+z)
 * @returns { d: D(z)/D(0), f }
 * @example growthStartedAt(Cosmology.fromSpec("EDS"), 1, "smooth", 1e-6).d // 0.5
 */
export function growthStartedAt(model: Cosmology, z: number, neutrinos: GrowthNeutrinos, startA: number): { d: number; f: number } {
  const lnA = lnAOf(z);
  if (!(startA > 0 && Math.log(startA) < lnA)) throw new RangeError(`the start a = ${startA} must lie before z = ${z}`);
  if (!tables[neutrinos]) throw new TypeError(`unknown neutrino convention "${String(neutrinos)}"`);
  const t = buildTable(model, neutrinos, Math.log(startA));
  const d = hermite(t, t.d, t.d1, lnA);
  return { d, f: hermite(t, t.d1, t.d2, lnA) / d };
}
