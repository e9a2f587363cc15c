/**
 * A compiled cosmological model: Friedmann expansion history with matter, dark energy (w0–wa),
 * curvature, photons and neutrinos (massless and massive, exact Fermi–Dirac), and every distance,
 * time and volume of Hogg (1999, astro-ph/9905116) as fast table look-ups.
 *
 * Build once (validation and tables, about a millisecond), evaluate many times (tens of ns a value).
 * Distances are in Mpc, times in Gyr, volumes in Mpc³, unless a name says otherwise.
 */
import {
  boltzmannEvPerK,
  gravitationalConstantSI,
  megaparsecKm,
  megaparsecM,
  neutrinoTemperatureRatio,
  neutrinoToPhotonDensityPerSpecies,
  secondsPerGyr,
  speedOfLightKmPerS,
  speedOfLightMPerS,
  stefanBoltzmannSI,
} from "./constants.js";
import { fermiDiracDensityFactor, fermiDiracDensityFactorLn, fermiDiracDensityFactorLogSlope } from "./fermiDirac.js";
import type { ModelParameters } from "./ModelParameters.js";
import { formatModelSpec, parseModelSpec } from "./modelSpec.js";
import { gaussRule, integrate, kronrod15 } from "./quadrature.js";
import { QuinticTable } from "./QuinticTable.js";
import { checkRedshift } from "./redshift.js";
import { NoSolutionError } from "./NoSolutionError.js";

/** Density components of `densityParameter`: matter (massive ν included), dark energy, curvature, radiation (photons + massless ν), photons, all neutrinos. */
export type DensityComponent = "matter" | "darkenergy" | "curvature" | "radiation" | "photons" | "neutrinos";

/** Quantities that `redshiftAt` can invert, in the units of the matching method. */
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

/** Tables cover 0 ≤ z ≤ tableMaxRedshift; beyond, the exact integrals are evaluated directly. */
const tableMaxRedshift = 1e8;
/** Table panels per unit of ln(1+z); quintic Hermite error ∝ h⁶ (≈ 1e-13 relative, see tests). */
const panelsPerUnit = 48;
/**
 * Below this u = ln(1+z) the distance and look-back integrals are evaluated directly (one 15-point
 * Kronrod panel, exact to rounding there): the table's absolute error ∝ u³ near its first node
 * would be a large relative error of the small value.
 */
const directBelowU = 1 / 16;
const relTolExact = 1e-14;

/** Radiation-like exponents are compared exactly; terms of E² as (coefficient, power of 1+z). */
type Term = { coefficient: number; power: number };

function requireFinite(key: string, value: unknown, unit: string, test: (v: number) => boolean, domain: string): void {
  if (typeof value !== "number" || !Number.isFinite(value) || !test(value)) {
    throw new RangeError(`${key} must be ${domain}${unit}; got ${String(value)}`);
  }
}

/** Throws RangeError naming the first parameter outside its domain. */
function checkParameters(p: ModelParameters): void {
  requireFinite("H0", p.H0, " km/s/Mpc", (v) => v > 0, "a positive number");
  if (p.H0 < 10 || p.H0 > 1000) {
    const hint = p.H0 < 10 ? ` (H0 is in km/s/Mpc: h = ${p.H0} is H0=${Number((100 * p.H0).toPrecision(6))})` : "";
    throw new RangeError(`H0 = ${p.H0} km/s/Mpc is outside 10 … 1000 km/s/Mpc${hint}`);
  }
  requireFinite("Om", p.Om, "", (v) => v >= 0, "≥ 0");
  if (p.OL !== undefined && p.Ok !== undefined) throw new RangeError("give OL or Ok, not both");
  if (p.OL !== undefined) requireFinite("OL", p.OL, "", () => true, "a finite number");
  if (p.Ok !== undefined) requireFinite("Ok", p.Ok, "", () => true, "a finite number");
  if (p.Ob !== undefined) requireFinite("Ob", p.Ob, ` (Om = ${p.Om})`, (v) => v >= 0 && v <= p.Om, "between 0 and Om");
  requireFinite("w0", p.w0, "", () => true, "a finite number");
  requireFinite("wa", p.wa, "", () => true, "a finite number");
  requireFinite("Tcmb", p.Tcmb, " K", (v) => v >= 0, "≥ 0");
  requireFinite("Neff", p.Neff, "", (v) => v >= 0, "≥ 0");
  if (!Array.isArray(p.mnu) || p.mnu.length > 3) throw new RangeError("mnu must list at most three masses (eV)");
  for (const m of p.mnu) requireFinite("mnu", m, " eV", (v) => v >= 0, "≥ 0");
  if (p.Tcmb === 0 && p.mnu.some((m) => m > 0)) {
    throw new RangeError("mnu > 0 needs Tcmb > 0: the neutrino density is set by the CMB temperature");
  }
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

function formatRedshift(z: number): string {
  return Number(z.toPrecision(4)).toString();
}

/**
 * (sinh y − y) for open (sign +1) or (y − sin y) for closed (sign −1) geometry, without cancellation:
 * a Taylor series y³/6 Σ (±y²)ⁿ 6/(2n+3)! for |y| < 0.5.
 */
function hyperbolicRemainder(y: number, sign: 1 | -1): number {
  if (Math.abs(y) >= 0.5) return sign > 0 ? Math.sinh(y) - y : y - Math.sin(y);
  const y2 = sign * y * y;
  let term = (y * y * y) / 6;
  let sum = term;
  for (let n = 1; n < 12; n++) {
    term *= y2 / ((2 * n + 2) * (2 * n + 3));
    sum += term;
  }
  return sum;
}

/**
 * Newton's method safeguarded by bisection on a bracket [lo, hi] with g(lo) ≤ target ≤ g(hi),
 * starting from `start` (default: the midpoint).
 */
function solveBracketed(
  g: (u: number) => number,
  dg: (u: number) => number,
  target: number,
  lo: number,
  hi: number,
  start = 0.5 * (lo + hi),
): number {
  let u = start;
  for (let iteration = 0; iteration < 100; iteration++) {
    const r = g(u) - target;
    if (r === 0) return u;
    if (r < 0) lo = u;
    else hi = u;
    const step = r / dg(u);
    // converged when the Newton step is down to a few ulps (it may then toggle between neighbours)
    const scale = 5e-16 * Math.abs(u) + 1e-300;
    if (Math.abs(step) <= scale) return u - step;
    let next = u - step;
    if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
    if (hi - lo <= scale) return next;
    u = next;
  }
  return u;
}

/**
 * A compiled cosmological model. Construct with validated parameters (see `ModelParameters`);
 * the constructor throws RangeError for an unphysical model (e.g. no big bang).
 */
export class Cosmology {
  /** The parameters as given (normalised). */
  readonly parameters: Readonly<ModelParameters>;
  /** Hubble constant [km s⁻¹ Mpc⁻¹]. */
  readonly H0: number;
  /** Dimensionless Hubble constant h = H0 / (100 km s⁻¹ Mpc⁻¹). */
  readonly h: number;
  /** Total matter density parameter today, massive neutrinos included. */
  readonly Om: number;
  /** Dark-energy density parameter today. */
  readonly OL: number;
  /** Curvature density parameter today, Ok = 1 − Om − OL − Or (0 exactly for a flat model). */
  readonly Ok: number;
  /** Radiation density parameter today: photons plus massless neutrino species. */
  readonly Or: number;
  /** Photon density parameter today, from ρ_γ c² = (4σ_SB/c) T⁴. */
  readonly Ogamma: number;
  /** Density parameter of massive neutrinos today (part of Om). */
  readonly OnuMassive: number;
  /** Baryon density parameter today (informational; NaN when not given). */
  readonly Ob: number;
  /** Dark-energy equation of state today. */
  readonly w0: number;
  /** Dark-energy equation-of-state slope, w(a) = w0 + wa (1 − a). */
  readonly wa: number;
  /** CMB temperature today [K]. */
  readonly Tcmb: number;
  /** Effective number of neutrino species. */
  readonly Neff: number;
  /** Sum of neutrino masses [eV]. */
  readonly mnuTotalEv: number;
  /** Hubble distance D_H = c / H0 [Mpc]. */
  readonly hubbleDistanceMpc: number;
  /** Hubble time t_H = 1 / H0 [Gyr]. */
  readonly hubbleTimeGyr: number;
  /** Age of the universe today [Gyr] (Infinity for a model without a big bang in finite time, e.g. de Sitter). */
  readonly ageTodayGyr: number;
  /**
   * Redshift of matter–radiation equality, 1 + z_eq = (Om − Ων,massive) / (Ωγ (1 + Neff (7/8)(4/11)^{4/3})):
   * cold matter against photons plus all neutrino species counted as relativistic, as in Planck 2018 VI
   * Table 2. Infinity when there is no radiation (Tcmb = 0).
   */
  readonly equalityRedshift: number;

  private readonly coldMatter: number;
  private readonly darkEnergyKind: 0 | 1 | 2;
  private readonly darkEnergyPower: number;
  private readonly masslessNeutrinos: number;
  private readonly neutrinoSpeciesDensity: number;
  private readonly massiveY0: Float64Array;
  /** ln of massiveY0, so that E² needs no logarithm per species. */
  private readonly lnY0: Float64Array;
  private readonly sqrtAbsOk: number;
  /** Sign of the curvature: 1 open, 0 flat, −1 closed (an integer field: cheap to branch on). */
  private readonly geometry: 1 | 0 | -1;
  private readonly uMax: number;
  private readonly chi: QuinticTable;
  private readonly tau: QuinticTable;
  private readonly lnAge: QuinticTable | undefined;
  private readonly terms: Term[];
  private horizonChi: number | undefined;
  private readonly inverters = new Map<string, { values: Float64Array; peakU: number; peakValue: number }>();

  /**
   * @param p model parameters (see `ModelParameters` for domains); normally from `parseModelSpec`
   * @throws RangeError if the model has E²(z) ≤ 0 somewhere at z ≥ 0 (no big bang: a bounce)
   */
  constructor(p: ModelParameters) {
    checkParameters(p);
    this.parameters = Object.freeze({ ...p, mnu: [...p.mnu] });
    this.H0 = p.H0;
    this.h = p.H0 / 100;
    this.Om = p.Om;
    this.w0 = p.w0;
    this.wa = p.wa;
    this.Tcmb = p.Tcmb;
    this.Neff = p.Neff;
    this.Ob = p.Ob ?? Number.NaN;
    this.mnuTotalEv = p.mnu.reduce((s, m) => s + m, 0);
    this.hubbleDistanceMpc = speedOfLightKmPerS / p.H0;
    this.hubbleTimeGyr = megaparsecKm / p.H0 / secondsPerGyr;

    // Radiation: Ωγ = ρ_γ / ρ_crit with ρ_γ = 4σT⁴/c³ and ρ_crit = 3H0²/(8πG).
    const h0PerS = (p.H0 * 1000) / megaparsecM;
    const rhoCrit0 = (3 * h0PerS * h0PerS) / (8 * Math.PI * gravitationalConstantSI);
    this.Ogamma = (4 * stefanBoltzmannSI * p.Tcmb ** 4) / speedOfLightMPerS ** 3 / rhoCrit0;
    this.neutrinoSpeciesDensity = (p.Neff / 3) * neutrinoToPhotonDensityPerSpecies * this.Ogamma;
    const massive = p.Tcmb > 0 ? p.mnu.filter((m) => m > 0) : [];
    const neutrinoTemperatureEv = boltzmannEvPerK * neutrinoTemperatureRatio * p.Tcmb;
    this.massiveY0 = Float64Array.from(massive, (m) => m / neutrinoTemperatureEv);
    this.lnY0 = this.massiveY0.map(Math.log);
    this.masslessNeutrinos = (3 - massive.length) * this.neutrinoSpeciesDensity;
    this.Or = this.Ogamma + this.masslessNeutrinos;
    let onuMassive = 0;
    for (const y0 of this.massiveY0) onuMassive += this.neutrinoSpeciesDensity * fermiDiracDensityFactor(y0);
    this.OnuMassive = onuMassive;
    if (p.Om < onuMassive) {
      throw new RangeError(
        `Om = ${p.Om} is below the massive-neutrino density today (${onuMassive.toPrecision(4)}): Om includes massive neutrinos`,
      );
    }
    this.coldMatter = p.Om - onuMassive;
    if (p.OL !== undefined) {
      this.OL = p.OL;
      this.Ok = 1 - p.Om - p.OL - this.Or;
    } else if (p.Ok !== undefined) {
      this.Ok = p.Ok;
      this.OL = 1 - p.Om - p.Ok - this.Or;
    } else {
      this.OL = 1 - p.Om - this.Or;
      this.Ok = 0;
    }
    this.darkEnergyKind = p.wa !== 0 ? 2 : p.w0 !== -1 ? 1 : 0;
    this.darkEnergyPower = 3 * (1 + p.w0 + p.wa);
    this.sqrtAbsOk = Math.sqrt(Math.abs(this.Ok));
    this.geometry = this.Ok > 0 ? 1 : this.Ok < 0 ? -1 : 0;
    this.equalityRedshift =
      this.Ogamma > 0
        ? this.coldMatter / (this.Ogamma * (1 + p.Neff * neutrinoToPhotonDensityPerSpecies)) - 1
        : Number.POSITIVE_INFINITY;
    this.terms = [
      { coefficient: this.coldMatter, power: 3 },
      { coefficient: this.Or + massive.length * this.neutrinoSpeciesDensity, power: 4 },
      { coefficient: this.Ok, power: 2 },
      { coefficient: this.OL, power: this.darkEnergyPower },
    ];

    // Tables in u = ln(1+z) on [0, uMax]: χ = D_C/D_H, τ = t_lookback/t_H, ln(t_age/t_H).
    const uMax = Math.log1p(tableMaxRedshift);
    const n = Math.ceil(uMax * panelsPerUnit);
    const h = uMax / n;
    this.uMax = uMax;
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
      const e2 = this.e2(zp, u);
      if (!(e2 > 0)) this.noBigBang(i > 0 ? Math.expm1((i - 1) * h) : 0, Math.expm1(u));
      invE[i] = 1 / Math.sqrt(e2);
      logSlope[i] = (0.5 * zp * this.de2dz(zp, u)) / e2;
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
        const e2 = this.e2(zp, u);
        if (!(e2 > 0)) this.noBigBang(Math.expm1(i * h), Math.expm1(u));
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
    this.checkBigBangBeyondTables();
    this.chi = new QuinticTable(0, h, chi, chi1, chi2);
    this.tau = new QuinticTable(0, h, tau, tau1, tau2);

    if (this.leadingPower() > 0) {
      const ageEnd = this.ageBeyond(uMax);
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
      this.lnAge = new QuinticTable(0, h, lnT, lnT1, lnT2);
      this.ageTodayGyr = this.hubbleTimeGyr * Math.exp(lnT[0]);
    } else {
      this.lnAge = undefined;
      this.ageTodayGyr = Number.POSITIVE_INFINITY;
    }
  }

  /**
   * Builds a model from spec text (see `parseModelSpec`).
   * @param spec e.g. "P18-BAO", "P18-BAO; H0=73" or "H0=70; Om=0.3; OL=0.7"
   * @returns the compiled model
   * @throws TypeError for malformed text, RangeError for unphysical parameters
   * @example Cosmology.fromSpec("P18-BAO").ageTodayGyr // 13.7866
   */
  static fromSpec(spec: string): Cosmology {
    return new Cosmology(parseModelSpec(spec));
  }

  /** Canonical spec text of this model (see `formatModelSpec`). @example "P18-BAO; H0=73" */
  get spec(): string {
    return formatModelSpec(this.parameters);
  }

  /** E²(z) = H²/H0² at 1+z = zp (lnZp = ln zp), all components. */
  private e2(zp: number, lnZp: number): number {
    const zp2 = zp * zp;
    let e2 = zp2 * (this.coldMatter * zp + this.Or * zp2 + this.Ok);
    if (this.OL !== 0) e2 += this.OL * this.darkEnergyFactor(zp, lnZp);
    const y0 = this.massiveY0;
    if (y0.length > 0) {
      let nu = 0;
      for (let i = 0; i < y0.length; i++) nu += fermiDiracDensityFactorLn(y0[i] / zp, this.lnY0[i] - lnZp);
      e2 += this.neutrinoSpeciesDensity * zp2 * zp2 * nu;
    }
    return e2;
  }

  /** Dark-energy density relative to today: zp^{3(1+w0+wa)} exp(−3 wa z/(1+z)) (CPL). */
  private darkEnergyFactor(zp: number, lnZp: number): number {
    if (this.darkEnergyKind === 0) return 1;
    if (this.darkEnergyKind === 1) return Math.exp(this.darkEnergyPower * lnZp);
    return Math.exp(this.darkEnergyPower * lnZp - 3 * this.wa * (1 - 1 / zp));
  }

  /** dE²/dz at 1+z = zp. */
  private de2dz(zp: number, lnZp: number): number {
    const zp2 = zp * zp;
    let d = zp * (3 * this.coldMatter * zp + 4 * this.Or * zp2 + 2 * this.Ok);
    if (this.OL !== 0) {
      const w = this.w0 + this.wa * (1 - 1 / zp);
      d += (this.OL * this.darkEnergyFactor(zp, lnZp) * 3 * (1 + w)) / zp;
    }
    const y0 = this.massiveY0;
    for (let i = 0; i < y0.length; i++) {
      const y = y0[i] / zp;
      d += this.neutrinoSpeciesDensity * zp2 * zp * (4 * fermiDiracDensityFactor(y) - fermiDiracDensityFactorLogSlope(y));
    }
    return d;
  }

  /** Highest power of (1+z) in E² with a non-zero coefficient. */
  private leadingPower(): number {
    return this.leadingTerm()?.power ?? Number.NEGATIVE_INFINITY;
  }

  /** The terms of E² of the highest power with non-zero summed coefficient, summed into one. */
  private leadingTerm(): Term | undefined {
    const byPower = new Map<number, number>();
    for (const t of this.terms) if (t.coefficient !== 0) byPower.set(t.power, (byPower.get(t.power) ?? 0) + t.coefficient);
    let best: Term | undefined;
    for (const [power, coefficient] of byPower) {
      if (coefficient !== 0 && (!best || power > best.power)) best = { coefficient, power };
    }
    return best;
  }

  /** Throws RangeError naming the redshift where E² ≤ 0, if anywhere on z ≥ 0. */
  /** Throws the no-big-bang error for a model with E² > 0 at z = lo and E² ≤ 0 at z = hi (bisected). */
  private noBigBang(lo: number, hi: number): never {
    const bad = (z: number) => !(this.e2(1 + z, Math.log1p(z)) > 0);
    let where = "at very high z";
    if (Number.isFinite(hi)) {
      for (let i = 0; i < 200 && hi - lo > 1e-12 * hi; i++) {
        const mid = 0.5 * (lo + hi);
        if (bad(mid)) hi = mid;
        else lo = mid;
      }
      where = `at z = ${formatRedshift(hi)}`;
    }
    throw new RangeError(`no big bang: H²(z) ≤ 0 ${where} (the model bounces); check Om, OL/Ok, w0, wa`);
  }

  /**
   * Rejects a model whose E² ≤ 0 beyond the tables (z = 1e9 … 1e75, and a negative leading term as
   * z → ∞). Inside the tables every node and quadrature point is checked while they are built.
   */
  private checkBigBangBeyondTables(): void {
    let previous = tableMaxRedshift;
    for (let k = 9; k <= 75; k++) {
      const z = 10 ** k; // (1+z)⁴ stays below 1e300
      if (!(this.e2(1 + z, Math.log1p(z)) > 0)) this.noBigBang(previous, z);
      previous = z;
    }
    const leading = this.leadingTerm();
    if (leading && leading.coefficient < 0) this.noBigBang(previous, Number.POSITIVE_INFINITY);
  }

  /** Dimensionless expansion rate E(z) = H(z)/H0. @param z redshift ≥ 0 @example new Cosmology(EdS).expansionRate(3) // 8 */
  expansionRate(z: number): number {
    checkRedshift(z);
    return Math.sqrt(this.e2(1 + z, Math.log1p(z)));
  }

  /**
   * Hubble parameter H(z) = H0 E(z) [km s⁻¹ Mpc⁻¹] (Hogg 1999 eq. 14).
   * @param z redshift ≥ 0
   * @returns H(z) in km/s/Mpc; e.g. P18-BAO at z = 0: 67.66
   */
  hubbleParameterKmSMpc(z: number): number {
    return this.H0 * this.expansionRate(z);
  }

  /**
   * Density parameter Ω_x(z) = ρ_x(z)/ρ_crit(z) of one component. "matter" counts massive neutrinos
   * with matter at every z (the Om convention) and "radiation" is photons plus massless species, so
   * matter + darkenergy + curvature + radiation = 1; "neutrinos" is all neutrinos (massless and
   * massive), "photons" the CMB alone.
   * @param component "matter", "darkenergy", "curvature", "radiation", "photons" or "neutrinos"
   * @param z redshift ≥ 0
   * @returns dimensionless density parameter; e.g. "matter" at z = 0 equals Om
   */
  densityParameter(component: DensityComponent, z: number): number {
    checkRedshift(z);
    const zp = 1 + z;
    const lnZp = Math.log1p(z);
    const e2 = this.e2(zp, lnZp);
    const zp4 = zp ** 4;
    let massive = 0;
    for (const y0 of this.massiveY0) massive += this.neutrinoSpeciesDensity * zp4 * fermiDiracDensityFactor(y0 / zp);
    let density: number;
    switch (component) {
      case "matter":
        density = this.coldMatter * zp ** 3 + massive;
        break;
      case "darkenergy":
        density = this.OL * this.darkEnergyFactor(zp, lnZp);
        break;
      case "curvature":
        density = this.Ok * zp * zp;
        break;
      case "radiation":
        density = this.Or * zp4;
        break;
      case "photons":
        density = this.Ogamma * zp4;
        break;
      case "neutrinos":
        density = this.masslessNeutrinos * zp4 + massive;
        break;
      default:
        throw new TypeError(`unknown component "${String(component)}": use matter, darkenergy, curvature, radiation, photons or neutrinos`);
    }
    return density / e2;
  }

  /** CMB temperature at z, T(z) = Tcmb (1+z) [K]. @param z redshift ≥ 0 @returns K; P18-BAO at z = 1: 5.451 */
  cmbTemperatureK(z: number): number {
    checkRedshift(z);
    return this.Tcmb * (1 + z);
  }

  /**
   * Critical density ρ_crit(z) = 3 H(z)² / (8πG) [kg m⁻³].
   * @param z redshift ≥ 0
   * @returns kg/m³; e.g. H0 = 70 at z = 0: 9.204e-27
   */
  criticalDensityKgM3(z: number): number {
    const hPerS = (this.hubbleParameterKmSMpc(z) * 1000) / megaparsecM;
    return (3 * hPerS * hPerS) / (8 * Math.PI * gravitationalConstantSI);
  }

  /** χ(u) in units of D_H: the table, or the exact integral below directBelowU and beyond uMax. */
  private chiAtU(u: number): number {
    if (u < directBelowU) return this.integrateDirect(this.chiIntegrand, 0, u);
    return u <= this.uMax ? this.chi.value(u) : this.chiBeyond(u);
  }

  /** dχ/du = e^u / E. */
  private readonly chiIntegrand = (v: number): number => Math.exp(v) / Math.sqrt(this.e2(Math.exp(v), v));

  /** dτ/du = 1 / E. */
  private readonly tauIntegrand = (v: number): number => 1 / Math.sqrt(this.e2(Math.exp(v), v));

  /** One 15-point Kronrod panel: exact to rounding on the short interval [0, u < directBelowU]. */
  private integrateDirect(f: (v: number) => number, a: number, b: number): number {
    return kronrod15(f, a, b).value;
  }

  private chiBeyond(u: number): number {
    return this.chi.node(this.chi.panels) + integrate(this.chiIntegrand, this.uMax, u, relTolExact);
  }

  /** τ(u) in units of t_H: the table, or the exact integral below directBelowU and beyond uMax. */
  private tauAtU(u: number): number {
    if (u < directBelowU) return this.integrateDirect(this.tauIntegrand, 0, u);
    if (u <= this.uMax) return this.tau.value(u);
    return this.tau.node(this.tau.panels) + integrate(this.tauIntegrand, this.uMax, u, relTolExact);
  }

  /** Age in units of t_H at u = ln(1+z), from ∫₀^a da/(aE) with a = s² (regular at s = 0). */
  private ageBeyond(u: number): number {
    const sEnd = Math.exp(-0.5 * u);
    return integrate(
      (s) => {
        const lnZp = -2 * Math.log(s);
        return 2 / (s * Math.sqrt(this.e2(1 / (s * s), lnZp)));
      },
      0,
      sEnd,
      relTolExact,
    );
  }

  private ageAtU(u: number): number {
    if (!this.lnAge) return Number.POSITIVE_INFINITY;
    return u <= this.uMax ? Math.exp(this.lnAge.value(u)) : this.ageBeyond(u);
  }

  /** S_k(χ) = sinh(√Ωk χ)/√Ωk, χ, or sin(√−Ωk χ)/√−Ωk (Hogg eq. 16, in units of D_H). */
  private transverse(chi: number): number {
    if (this.geometry === 0) return chi;
    const k = this.sqrtAbsOk;
    return this.geometry > 0 ? Math.sinh(k * chi) / k : Math.sin(k * chi) / k;
  }

  /** dS_k/dχ. */
  private transverseSlope(chi: number): number {
    if (this.Ok > 0) return Math.cosh(this.sqrtAbsOk * chi);
    if (this.Ok < 0) return Math.cos(this.sqrtAbsOk * chi);
    return 1;
  }

  private u(z: number): number {
    if (!(z >= 0 && z <= Number.MAX_VALUE)) checkRedshift(z);
    return Math.log1p(z);
  }

  /**
   * Line-of-sight comoving distance D_C = D_H ∫₀^z dz'/E(z') (Hogg 1999 eq. 15).
   * @param z redshift ≥ 0
   * @returns Mpc; e.g. Einstein–de Sitter, H0 = 70, z = 3: 2 D_H (1 − 1/√(1+z)) = 4282.75 Mpc
   */
  comovingDistanceMpc(z: number): number {
    return this.hubbleDistanceMpc * this.chiAtU(this.u(z));
  }

  /**
   * Transverse comoving distance D_M (Hogg 1999 eq. 16): D_C if flat, D_H/√Ωk sinh(√Ωk D_C/D_H) if open,
   * D_H/√|Ωk| sin(√|Ωk| D_C/D_H) if closed.
   * @param z redshift ≥ 0
   * @returns Mpc; e.g. Milne (Om = OL = 0), H0 = 70, z = 1: D_H z(1 + z/2)/(1+z) = 3211.66 Mpc
   */
  transverseComovingDistanceMpc(z: number): number {
    return this.hubbleDistanceMpc * this.transverse(this.chiAtU(this.u(z)));
  }

  /**
   * Angular-diameter distance D_A = D_M / (1+z) (Hogg 1999 eq. 18).
   * @param z redshift ≥ 0
   * @returns Mpc; e.g. Einstein–de Sitter, H0 = 70, z = 1.25 (its maximum): 1903.44 Mpc
   */
  angularDiameterDistanceMpc(z: number): number {
    const u = this.u(z);
    return this.hubbleDistanceMpc * this.transverse(this.chiAtU(u)) * Math.exp(-u);
  }

  /**
   * Luminosity distance D_L = (1+z) D_M (Hogg 1999 eq. 21).
   * @param z redshift ≥ 0
   * @returns Mpc; e.g. Einstein–de Sitter, H0 = 70, z = 1: 2 D_H (1+z − √(1+z)) = 5027.48 Mpc
   */
  luminosityDistanceMpc(z: number): number {
    const u = this.u(z);
    return this.hubbleDistanceMpc * this.transverse(this.chiAtU(u)) * (1 + z);
  }

  /**
   * Angular-diameter distance of a source at z2 seen from z1 ≤ z2: D_A12 = S_k(D_C2 − D_C1)/(1+z2),
   * valid for every curvature (Hogg's eq. 19 holds only for Ωk ≥ 0).
   * @param z1 redshift of the observer, ≥ 0
   * @param z2 redshift of the source, ≥ z1
   * @returns Mpc; e.g. z1 = 0 gives D_A(z2)
   */
  angularDiameterDistanceBetweenMpc(z1: number, z2: number): number {
    checkRedshift(z1, "z1");
    checkRedshift(z2, "z2");
    if (z2 < z1) throw new RangeError(`z2 = ${z2} is below z1 = ${z1}: the source must lie behind the observer`);
    const chi12 = this.chiAtU(Math.log1p(z2)) - this.chiAtU(Math.log1p(z1));
    return (this.hubbleDistanceMpc * this.transverse(chi12)) / (1 + z2);
  }

  /**
   * Light-travel distance c × t_lookback(z).
   * @param z redshift ≥ 0
   * @returns Mpc; e.g. de Sitter, H0 = 70, z = 1: D_H ln 2 = 2968.57 Mpc
   */
  lightTravelDistanceMpc(z: number): number {
    return this.hubbleDistanceMpc * this.tauAtU(this.u(z));
  }

  /**
   * Distance modulus μ = 5 log10(|D_L| / 10 pc) (Hogg 1999 eq. 25). Past the antipode of a closed
   * model D_L < 0 (the image is inverted) while the flux still falls as 1/(4π D_L²), so |D_L| is used.
   * @param z redshift > 0 (z = 0 gives −Infinity)
   * @returns mag; e.g. D_L = 10 Mpc gives 30
   */
  distanceModulusMag(z: number): number {
    return 5 * Math.log10(Math.abs(this.luminosityDistanceMpc(z))) + 25;
  }

  /**
   * Look-back time t_L = t_H ∫₀^z dz'/((1+z')E(z')) (Hogg 1999 eq. 30).
   * @param z redshift ≥ 0
   * @returns Gyr; e.g. Einstein–de Sitter, H0 = 70, z = 3: (2/3) t_H (1 − (1+z)^{−3/2}) = 8.148 Gyr
   */
  lookbackTimeGyr(z: number): number {
    return this.hubbleTimeGyr * this.tauAtU(this.u(z));
  }

  /**
   * Age of the universe at z: t = t_H ∫₀^{1/(1+z)} da/(a E(a)), integrated in a (not to z = ∞).
   * @param z redshift ≥ 0
   * @returns Gyr (Infinity if the past is infinitely long, e.g. de Sitter); e.g. P18-BAO at z = 0: 13.787
   */
  ageGyr(z: number): number {
    return this.hubbleTimeGyr * this.ageAtU(this.u(z));
  }

  /** Comoving volume in units of D_H³ for line-of-sight χ (units of D_H), Hogg eq. 29 in its χ form. */
  private volumeOfChi(chi: number): number {
    if (this.Ok === 0) return ((4 * Math.PI) / 3) * chi * chi * chi;
    const k = this.sqrtAbsOk;
    return (Math.PI * hyperbolicRemainder(2 * k * chi, this.Ok > 0 ? 1 : -1)) / (k * k * k);
  }

  /**
   * All-sky comoving volume within z: V_C = 4π ∫₀^{D_C} D_M² dD_C (Hogg 1999 eq. 29, written as
   * π (sinh y − y)/k³ with y = 2k D_C, k = √Ωk / D_H, which stays exact for small and closed curvature).
   * @param z redshift ≥ 0
   * @returns Mpc³; e.g. flat: (4π/3) D_M³
   */
  comovingVolumeMpc3(z: number): number {
    const dh = this.hubbleDistanceMpc;
    return dh * dh * dh * this.volumeOfChi(this.chiAtU(this.u(z)));
  }

  /**
   * Comoving volume between z1 and z2 over a sky area: (V_C(z2) − V_C(z1)) Ω/(4π).
   * @param z1 inner redshift ≥ 0
   * @param z2 outer redshift ≥ z1
   * @param areaSr sky area [sr], 0 ≤ area ≤ 4π
   * @returns Mpc³
   */
  comovingVolumeShellMpc3(z1: number, z2: number, areaSr: number = 4 * Math.PI): number {
    checkRedshift(z1, "z1");
    checkRedshift(z2, "z2");
    if (z2 < z1) throw new RangeError(`z2 = ${z2} is below z1 = ${z1}`);
    if (!(areaSr >= 0 && areaSr <= 4 * Math.PI * (1 + 1e-12))) {
      throw new RangeError(`area = ${areaSr} sr is outside 0 … 4π sr (the whole sky)`);
    }
    return ((this.comovingVolumeMpc3(z2) - this.comovingVolumeMpc3(z1)) * areaSr) / (4 * Math.PI);
  }

  /**
   * Comoving volume element dV_C/dz/dΩ = D_H D_M² / E(z) (Hogg 1999 eq. 28).
   * @param z redshift ≥ 0
   * @returns Mpc³ sr⁻¹
   */
  comovingVolumeElementMpc3Sr(z: number): number {
    const u = this.u(z);
    const dm = this.transverse(this.chiAtU(u));
    const dh = this.hubbleDistanceMpc;
    return (dh * dh * dh * dm * dm) / Math.sqrt(this.e2(1 + z, u));
  }

  /**
   * Proper (physical) size subtending an angle at z: ℓ = D_A θ (small-angle, Hogg 1999 §6).
   * @param angleRad angle [rad], 0 ≤ θ ≤ π
   * @param z redshift ≥ 0
   * @returns Mpc
   */
  properSizeMpc(angleRad: number, z: number): number {
    if (!(angleRad >= 0 && angleRad <= Math.PI)) throw new RangeError(`angle = ${angleRad} rad is outside 0 … π rad`);
    return this.angularDiameterDistanceMpc(z) * angleRad;
  }

  /**
   * Angle subtended by a proper size at z: θ = ℓ / D_A (small-angle).
   * @param sizeMpc proper size [Mpc] ≥ 0
   * @param z redshift > 0
   * @returns rad; RangeError when θ would exceed π (size too large for D_A at z)
   */
  angleRad(sizeMpc: number, z: number): number {
    if (!(sizeMpc >= 0 && sizeMpc < Number.POSITIVE_INFINITY)) throw new RangeError(`size = ${sizeMpc} must be ≥ 0 and finite`);
    const da = this.angularDiameterDistanceMpc(z);
    if (sizeMpc === 0) return 0;
    const theta = sizeMpc / da;
    if (!(da > 0) || !(theta <= Math.PI)) {
      throw new RangeError(`size ${sizeMpc} Mpc at z = ${z} would subtend more than 180° (D_A = ${da.toPrecision(4)} Mpc)`);
    }
    return theta;
  }

  /** Line-of-sight χ (units of D_H) whose all-sky volume is v (units of D_H³); inverse of volumeOfChi. */
  private chiOfVolume(v: number): number {
    const flat = Math.cbrt((3 * v) / (4 * Math.PI));
    if (this.Ok === 0) return flat;
    const k = this.sqrtAbsOk;
    const sign: 1 | -1 = this.Ok > 0 ? 1 : -1;
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
    if (this.Ok === 0) return x;
    const k = this.sqrtAbsOk;
    if (this.Ok > 0) return Math.asinh(k * x) / k;
    if (k * x > 1) {
      throw new NoSolutionError(`${w.asked()} exceeds its maximum in this closed model (${w.limit(this.hubbleDistanceMpc / k)})`);
    }
    return Math.asin(k * x) / k;
  }

  /** Largest χ (units of D_H) reached as z → ∞ (the particle horizon), Infinity if unbounded. */
  private horizon(): number {
    if (this.horizonChi === undefined) {
      if (this.leadingPower() <= 2) this.horizonChi = Number.POSITIVE_INFINITY;
      else {
        const sEnd = Math.exp(-0.5 * this.uMax);
        this.horizonChi =
          this.chi.node(this.chi.panels) +
          integrate((s) => 2 / (s * s * s * Math.sqrt(this.e2(1 / (s * s), -2 * Math.log(s)))), 0, sEnd, relTolExact);
      }
    }
    return this.horizonChi;
  }

  /** u with table(u) = target for an increasing table, from node bisection then Newton on the interpolant. */
  private invertTable(table: QuinticTable, target: number, sign: 1 | -1): number {
    let lo = 0;
    let hi = table.panels;
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
    let lo = this.uMax;
    let hi = this.uMax + 1;
    while (g(hi) < target) {
      lo = hi;
      hi = this.uMax + 2 * (hi - this.uMax);
      if (hi > 690) throw new NoSolutionError(`no redshift has ${w.asked()}`);
    }
    for (let i = 0; i < 200 && hi - lo > 1e-15 * hi; i++) {
      const mid = 0.5 * (lo + hi);
      if (g(mid) < target) lo = mid;
      else hi = mid;
    }
    return 0.5 * (lo + hi);
  }

  private uOfChi(chi: number, w: InverseWording): number {
    if (chi <= 0) return 0;
    if (chi <= this.chi.node(this.chi.panels)) return this.invertTable(this.chi, chi, 1);
    if (chi >= this.horizon()) throw new NoSolutionError(`${w.asked()} lies beyond the particle horizon of this model`);
    return this.invertBeyond((u) => this.chiBeyond(u), chi, w);
  }

  /** @param scale the quantity's unit per t_H (t_H in Gyr for look-back, D_H in Mpc for light travel) */
  private uOfTau(tau: number, w: InverseWording, scale: number): number {
    if (tau <= 0) return 0;
    const ageToday = this.ageAtU(0);
    if (tau >= ageToday) {
      throw new NoSolutionError(`${w.asked()} is not below the age of the universe in this model (${w.limit(ageToday * scale)})`);
    }
    if (this.lnAge && tau > 0.5 * ageToday) return this.uOfAge(ageToday - tau, w);
    if (tau <= this.tau.node(this.tau.panels)) return this.invertTable(this.tau, tau, 1);
    return this.invertBeyond((u) => this.tauAtU(u), tau, w);
  }

  private uOfAge(age: number, w: InverseWording): number {
    const table = this.lnAge;
    if (!table) throw new NoSolutionError(`${w.asked()}: this model has an infinite past, so age does not fix z`);
    const ageToday = Math.exp(table.node(0));
    if (age > ageToday) {
      throw new NoSolutionError(`${w.asked()} exceeds the age of the universe today in this model (${w.limit(ageToday * this.hubbleTimeGyr)})`);
    }
    if (!(age > 0)) throw new NoSolutionError(`${w.asked()} must be positive`);
    const lnT = Math.log(age);
    if (lnT >= table.node(table.panels)) return this.invertTable(table, lnT, -1);
    return this.invertBeyond((u) => -this.ageBeyond(u), -age, w);
  }

  /** D_L/D_H = e^u S_k(χ) or D_A/D_H = e^{−u} S_k(χ) and its u-derivative, for the inverse. */
  private readonly curves: Record<"DL" | "DA", { g: (u: number) => number; dg: (u: number) => number }> = {
    DL: {
      g: (u) => Math.exp(u) * this.transverse(this.chiAtU(u)),
      dg: (u) => {
        const chi = this.chiAtU(u);
        return Math.exp(u) * (this.transverse(chi) + this.transverseSlope(chi) * this.chiSlopeAtU(u));
      },
    },
    DA: {
      g: (u) => Math.exp(-u) * this.transverse(this.chiAtU(u)),
      dg: (u) => {
        const chi = this.chiAtU(u);
        return Math.exp(-u) * (this.transverseSlope(chi) * this.chiSlopeAtU(u) - this.transverse(chi));
      },
    },
  };

  /**
   * u solving curve(u) = target on the lower branch of D_L or D_A (units of D_H), which may rise to a
   * maximum and fall again: node values and the maximum are found once per model and kept.
   */
  private uOfCurve(key: "DL" | "DA", target: number, w: InverseWording): number {
    const { g, dg } = this.curves[key];
    let inv = this.inverters.get(key);
    const h = this.chi.h;
    if (!inv) {
      const n = this.chi.panels;
      const values = new Float64Array(n + 1);
      let peak = n;
      for (let i = 0; i <= n; i++) {
        values[i] = g(i * h);
        if (peak === n && i > 0 && values[i] <= values[i - 1]) peak = i - 1;
      }
      let peakU = Number.POSITIVE_INFINITY;
      let peakValue = Number.POSITIVE_INFINITY;
      if (peak < n) {
        let lo = Math.max(0, peak - 1) * h;
        let hi = (peak + 1) * h;
        for (let i = 0; i < 200 && hi - lo > 1e-15; i++) {
          const mid = 0.5 * (lo + hi);
          if (dg(mid) > 0) lo = mid;
          else hi = mid;
        }
        peakU = 0.5 * (lo + hi);
        peakValue = g(peakU);
      }
      inv = { values: values.subarray(0, Math.min(peak, n) + 1), peakU, peakValue };
      this.inverters.set(key, inv);
    }
    if (target <= 0) return 0;
    if (target > inv.peakValue) {
      const dh = this.hubbleDistanceMpc;
      throw new NoSolutionError(
        `${w.asked()} exceeds its maximum in this model (${w.limit(inv.peakValue * dh)} at z = ${formatRedshift(Math.expm1(inv.peakU))})`,
      );
    }
    const values = inv.values;
    const last = values.length - 1;
    if (target > values[last]) {
      if (Number.isFinite(inv.peakU)) return solveBracketed(g, dg, target, last * h, inv.peakU);
      return this.invertBeyond(g, target, w);
    }
    let lo = 0;
    let hi = last;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (values[mid] <= target) lo = mid;
      else hi = mid;
    }
    const start = (lo + (target - values[lo]) / (values[hi] - values[lo])) * h;
    return solveBracketed(g, dg, target, lo * h, hi * h, start);
  }

  private chiSlopeAtU(u: number): number {
    return u <= this.uMax && u >= directBelowU ? this.chi.derivative(u) : this.chiIntegrand(u);
  }

  /**
   * The redshift at which a quantity takes a given value (inverse of the distance, time and volume
   * functions). Monotonic quantities have one solution; D_A (and, in closed models, D_M and D_L) rise
   * to a maximum and fall: the lower branch is returned, and a value above the maximum has no solution.
   *
   * @param quantity which function to invert
   * @param value its value, in that function's unit (Mpc, mag, Gyr or Mpc³)
   * @param wording how an error message names the value asked for and quotes the model's limits
   *   (default: in words and the function's unit, e.g. "look-back time 20 Gyr")
   * @returns redshift z ≥ 0
   * @throws NoSolutionError (a RangeError) when no redshift gives the value
   * @example model.redshiftAt("luminosityDistance", model.luminosityDistanceMpc(1)) // 1
   */
  redshiftAt(quantity: InvertibleQuantity, value: number, wording?: InverseWording): number {
    if (typeof value !== "number" || Number.isNaN(value)) throw new TypeError("value must be a number");
    const dh = this.hubbleDistanceMpc;
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
      case "distanceModulus":
        u = this.uOfCurve("DL", 10 ** ((value - 25) / 5) / dh, { asked: w.asked, limit: (mpc) => w.limit(5 * Math.log10(mpc) + 25) });
        break;
      case "angularDiameterDistance":
        u = this.uOfCurve("DA", value / dh, w);
        break;
      case "lightTravelDistance":
        u = this.uOfTau(value / dh, w, dh);
        break;
      case "lookbackTime":
        u = this.uOfTau(value / this.hubbleTimeGyr, w, this.hubbleTimeGyr);
        break;
      case "age":
        u = this.uOfAge(value / this.hubbleTimeGyr, w);
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
