/**
 * The expansion rate of a model, E(z) = H(z)/H0, from its parameters: matter, dark energy (w0–wa),
 * curvature, photons and neutrinos (massless and massive, exact Fermi–Dirac), with every density
 * parameter today. Validates the parameters and finds where a model has no big bang. The distances
 * and times built on it are in Cosmology.ts.
 */
import {
  boltzmannEvPerK,
  gravitationalConstantSI,
  megaparsecM,
  neutrinoTemperatureRatio,
  neutrinoToPhotonDensityPerSpecies,
  speedOfLightMPerS,
  stefanBoltzmannSI,
} from "../units/constants.js";
import { fermiDiracDensityFactor, fermiDiracDensityFactorLn, fermiDiracDensityFactorLogSlope, fermiDiracTable } from "./fermiDirac.js";
import type { QuinticTable } from "../numerics/QuinticTable.js";
import type { ModelParameters } from "./ModelParameters.js";
import { checkRedshift, formatRedshift } from "../checks/redshift.js";

/** Density components of `densityParameter`: matter (massive ν included), cold matter (CDM + baryons), dark energy, curvature, radiation (photons + massless ν), photons, all neutrinos. */
export type DensityComponent = "matter" | "cold" | "darkenergy" | "curvature" | "radiation" | "photons" | "neutrinos";

/** Radiation-like exponents are compared exactly; terms of E² as (coefficient, power of 1+z). */
type Term = { coefficient: number; power: number };

function requireFinite(key: string, value: unknown, unit: string, test: (v: number) => boolean, domain: string): void {
  if (typeof value !== "number" || !Number.isFinite(value) || !test(value)) {
    throw new RangeError(`${key} must be ${domain}${unit}; got ${String(value)}`);
  }
}

/** Throws RangeError naming the first parameter outside its domain. */
/**
 * Largest |Ω| read as a density parameter: a larger one is almost surely a percentage (Om=30 for 0.30),
 * which would otherwise give a valid-looking model (age 2.4 Gyr). Our choice; no model in use comes near.
 */
const largestDensityParameter = 5;

function requireFraction(key: string, value: number | undefined): void {
  if (value === undefined || !Number.isFinite(value) || !(Math.abs(value) > largestDensityParameter)) return;
  throw new RangeError(`${key} = ${value}: a density parameter is a fraction (${value} → ${Number((value / 100).toPrecision(6))}), |${key}| ≤ ${largestDensityParameter}`);
}

/**
 * Largest |OL| (or |Ok|) worked out from the other densities that is read as 0: decimal text is not
 * exact in binary, so 1 − Om − Ok for Om = 2.2, Ok = −1.2 is −2.2e-16, not 0. Our choice: far above
 * that rounding, far below any density a model means.
 */
const roundingOfOne = 1e-12;

/** A density parameter worked out as 1 minus the others: 0 when it is only their rounding. */
const workedOut = (x: number): number => (Math.abs(x) < roundingOfOne ? 0 : x);

/**
 * Refuses a negative OL that the model infers rather than states: with OL not given, OL = 1 − Om − Ok − Or
 * (Ok = 0 when flat), so Om + Ok > 1 gives OL < −Or, almost always a slip (Om=3 for 0.3). A model that
 * means it gives OL. OL = −Or from radiation alone (Om = 1, flat, Tcmb > 0) is kept: it is not typed;
 * so is Om + Ok = 1 to rounding (within 1e-12: "Om=2.2; Ok=-1.2" is matter only, OL = 0).
 * Our rule; massive neutrinos are inside Om, so they add nothing here.
 * @param p the parameters as stated
 * @param inferredOL the OL the model would take
 */
function refuseInferredNegativeDarkEnergy(p: ModelParameters, inferredOL: number): void {
  if (p.OL !== undefined || !(p.Om + (p.Ok ?? 0) - 1 > roundingOfOne)) return;
  const OL = Number(inferredOL.toPrecision(4));
  const tenth = Number((p.Om / 10).toPrecision(6));
  if (p.Ok === undefined) throw new RangeError(`Om = ${p.Om} makes OL = ${OL} to stay flat: give OL explicitly if you mean it; ${tenth}?`);
  const hint = p.Om > 1 ? `; Om = ${tenth}?` : "";
  throw new RangeError(`Om = ${p.Om} and Ok = ${p.Ok} make OL = ${OL} (1 − Om − Ok − Or): give OL explicitly if you mean it${hint}`);
}

function checkParameters(p: ModelParameters): void {
  requireFinite("H0", p.H0, " km/s/Mpc", (v) => v > 0, "a positive number");
  if (p.H0 < 10 || p.H0 > 1000) {
    const hint = p.H0 < 10 ? ` (H0 is in km/s/Mpc: h = ${p.H0} is H0=${Number((100 * p.H0).toPrecision(6))})` : "";
    throw new RangeError(`H0 = ${p.H0} km/s/Mpc is outside 10 … 1000 km/s/Mpc${hint}`);
  }
  requireFinite("Om", p.Om, "", (v) => v >= 0, "≥ 0");
  for (const key of ["Om", "OL", "Ok", "Ob"] as const) requireFraction(key, p[key]);
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

/**
 * E²(z) of a model and its components. Construct with normalised parameters; the constructor throws
 * RangeError naming the first parameter outside its domain.
 */
export class ExpansionRate {
  /** Photon density today, from Tcmb. */
  readonly Ogamma: number;
  /** Photons plus massless neutrino species today. */
  readonly Or: number;
  /** Massive neutrinos today (part of Om). */
  readonly OnuMassive: number;
  /** Dark energy today. */
  readonly OL: number;
  /** Curvature today. */
  readonly Ok: number;
  /** Matter–radiation equality redshift (Infinity without radiation). */
  readonly equalityRedshift: number;
  /** Matter without the massive neutrinos. */
  readonly coldMatter: number;
  /** One neutrino species' density today if massless (Neff/3 of (7/8)(4/11)^{4/3} Ωγ). */
  readonly neutrinoSpeciesDensity: number;
  /** Massless neutrinos today. */
  readonly masslessNeutrinos: number;
  /** m c²/(k_B T_ν0) of each massive species. */
  readonly massiveY0: Float64Array;
  private readonly w0: number;
  private readonly wa: number;
  /** ln of massiveY0, so that E² needs no logarithm per species. */
  private readonly lnY0: Float64Array;
  /** The shared Fermi–Dirac table, held here (massive neutrinos only) so that E² reads it directly. */
  private readonly fermiDirac: QuinticTable | undefined;
  private readonly darkEnergyKind: 0 | 1 | 2;
  private readonly darkEnergyPower: number;
  private readonly terms: Term[];

  /** @param p model parameters (H0 in km/s/Mpc, densities today, Tcmb in K, masses in eV) */
  constructor(p: ModelParameters) {
    checkParameters(p);
    this.w0 = p.w0;
    this.wa = p.wa;
    // Radiation: Ωγ = ρ_γ / ρ_crit with ρ_γ = 4σT⁴/c³ and ρ_crit = 3H0²/(8πG).
    const h0PerS = (p.H0 * 1000) / megaparsecM;
    const rhoCrit0 = (3 * h0PerS * h0PerS) / (8 * Math.PI * gravitationalConstantSI);
    this.Ogamma = (4 * stefanBoltzmannSI * p.Tcmb ** 4) / speedOfLightMPerS ** 3 / rhoCrit0;
    this.neutrinoSpeciesDensity = (p.Neff / 3) * neutrinoToPhotonDensityPerSpecies * this.Ogamma;
    const massive = p.Tcmb > 0 ? p.mnu.filter((m) => m > 0) : [];
    const neutrinoTemperatureEv = boltzmannEvPerK * neutrinoTemperatureRatio * p.Tcmb;
    this.massiveY0 = Float64Array.from(massive, (m) => m / neutrinoTemperatureEv);
    this.lnY0 = this.massiveY0.map(Math.log);
    this.fermiDirac = massive.length > 0 ? fermiDiracTable() : undefined;
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
      this.Ok = workedOut(1 - p.Om - p.OL - this.Or);
    } else if (p.Ok !== undefined) {
      this.Ok = p.Ok;
      this.OL = workedOut(1 - p.Om - p.Ok - this.Or);
    } else {
      this.OL = workedOut(1 - p.Om - this.Or);
      this.Ok = 0;
    }
    refuseInferredNegativeDarkEnergy(p, this.OL);
    this.darkEnergyKind = p.wa !== 0 ? 2 : p.w0 !== -1 ? 1 : 0;
    this.darkEnergyPower = 3 * (1 + p.w0 + p.wa);
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

  }

  /** E²(z) = H²/H0² at 1+z = zp (lnZp = ln zp), all components. */
  e2(zp: number, lnZp: number): number {
    const zp2 = zp * zp;
    let e2 = zp2 * (this.coldMatter * zp + this.Or * zp2 + this.Ok);
    if (this.OL !== 0) e2 += this.OL * this.darkEnergyFactor(zp, lnZp);
    const y0 = this.massiveY0;
    if (y0.length > 0) {
      let nu = 0;
      const table = this.fermiDirac!;
      for (let i = 0; i < y0.length; i++) {
        const s = this.lnY0[i] - lnZp;
        nu += s >= table.x0 && s <= table.xEnd ? table.value(s) : fermiDiracDensityFactorLn(y0[i] / zp, s);
      }
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
  de2dz(zp: number, lnZp: number): number {
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

  /**
   * True when E² > 0 at every z ≥ 0 follows from the parameters alone: every term of E² is ≥ 0
   * (cold matter, radiation, curvature, dark energy; massive neutrinos always are) and the terms that
   * do not fall with z (all but dark energy) sum to more than 0 today, so E²(z) is at least that sum.
   * A model for which it is false is checked for a bounce numerically (distanceTables.ts).
   */
  cannotBounce(): boolean {
    if (!(this.coldMatter >= 0 && this.Or >= 0 && this.Ok >= 0 && this.OL >= 0)) return false;
    return this.coldMatter + this.Or + this.Ok + this.OnuMassive > 0;
  }

  /** Highest power of (1+z) in E² with a non-zero coefficient. */
  leadingPower(): number {
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

  /** Throws the no-big-bang error for a model with E² > 0 at z = lo and E² ≤ 0 at z = hi (bisected). */
  noBigBang(lo: number, hi: number): never {
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
   * Rejects a model whose E² ≤ 0 beyond z = fromZ (at z = 1e9 … 1e75, and a negative leading term as
   * z → ∞); below it the caller checks its own sample points (the tables check every node).
   * @param fromZ the redshift up to which E² > 0 is known
   */
  checkBigBangBeyond(fromZ: number): void {
    let previous = fromZ;
    for (let k = 9; k <= 75; k++) {
      const z = 10 ** k; // (1+z)⁴ stays below 1e300
      if (!(this.e2(1 + z, Math.log1p(z)) > 0)) this.noBigBang(previous, z);
      previous = z;
    }
    const leading = this.leadingTerm();
    if (leading && leading.coefficient < 0) this.noBigBang(previous, Number.POSITIVE_INFINITY);
  }

  /** Massive neutrinos' density in units of today's critical density, at 1+z = zp. */
  private massiveNeutrinoDensity(zp: number): number {
    let massive = 0;
    for (const y0 of this.massiveY0) massive += this.neutrinoSpeciesDensity * zp ** 4 * fermiDiracDensityFactor(y0 / zp);
    return massive;
  }

  /** All matter (cold matter and massive neutrinos) in units of today's critical density, Ωm(z) E²(z), at 1+z = zp. */
  matterDensity(zp: number): number {
    return this.coldMatter * zp ** 3 + this.massiveNeutrinoDensity(zp);
  }

  /**
   * Density parameter Ω_x(z) = ρ_x(z)/ρ_crit(z) of one component. "matter" counts massive neutrinos
   * with matter at every z (the Om convention) and "radiation" is photons plus massless species, so
   * matter + darkenergy + curvature + radiation = 1; "cold" is CDM and baryons alone (massive
   * neutrinos left out: the matter of the equality redshift `equalityRedshift`, which counts every
   * neutrino as radiation); "neutrinos" is all neutrinos (massless and massive), "photons" the CMB alone.
   * @param component "matter", "cold", "darkenergy", "curvature", "radiation", "photons" or "neutrinos"
   * @param z redshift ≥ 0
   * @returns dimensionless density parameter; e.g. "matter" at z = 0 equals Om
   */
  densityParameter(component: DensityComponent, z: number): number {
    checkRedshift(z);
    const zp = 1 + z;
    const lnZp = Math.log1p(z);
    const e2 = this.e2(zp, lnZp);
    const zp4 = zp ** 4;
    let density: number;
    switch (component) {
      case "matter":
        density = this.matterDensity(zp);
        break;
      case "cold":
        density = this.coldMatter * zp ** 3;
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
        density = this.masslessNeutrinos * zp4 + this.massiveNeutrinoDensity(zp);
        break;
      default:
        throw new TypeError(`unknown component "${String(component)}": use matter, cold, darkenergy, curvature, radiation, photons or neutrinos`);
    }
    return density / e2;
  }
}
