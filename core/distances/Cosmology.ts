/**
 * A compiled cosmological model: Friedmann expansion history with matter, dark energy (w0–wa),
 * curvature, photons and neutrinos (massless and massive, exact Fermi–Dirac), and every distance,
 * time and volume of Hogg (1999, astro-ph/9905116) as fast table look-ups.
 *
 * Build once (validation; the tables grow as values are asked for, about a millisecond a unit of
 * ln(1+z)), evaluate many times (tens of ns a value).
 * Distances are in Mpc, times in Gyr, volumes in Mpc³, unless a name says otherwise.
 */
import { gravitationalConstantSI, megaparsecKm, megaparsecM, secondsPerGyr, speedOfLightKmPerS } from "../units/constants.js";
import { ExpansionRate, type DensityComponent } from "../model/ExpansionRate.js";
import { hyperbolicRemainder } from "../numerics/hyperbolicRemainder.js";
import type { ModelParameters } from "../model/ModelParameters.js";
import { formatModelSpec, parseModelSpec } from "../model/modelSpec.js";
import { ageSinceBigBang, buildDistanceTables, type AgeTable } from "./distanceTables.js";
import { integrate, kronrod15 } from "../numerics/quadrature.js";
import type { QuinticTable } from "../numerics/QuinticTable.js";
import { checkRedshift } from "../checks/redshift.js";
import { RedshiftInverse, type InverseWording, type InvertibleQuantity } from "./redshiftInverse.js";

export type { DensityComponent } from "../model/ExpansionRate.js";
export type { InverseWording, InvertibleQuantity } from "./redshiftInverse.js";

/**
 * Below this u = ln(1+z) the distance and look-back integrals are evaluated directly (one 15-point
 * Kronrod panel, exact to rounding there): the table's absolute error ∝ u³ near its first node
 * would be a large relative error of the small value.
 */
const directBelowU = 1 / 16;
const relTolExact = 1e-14;

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
  /** Baryon density parameter today, used by SOUND_HORIZON only (NaN when not given). */
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
  /**
   * Redshift of matter–radiation equality, 1 + z_eq = (Om − Ων,massive) / (Ωγ (1 + Neff (7/8)(4/11)^{4/3})):
   * cold matter against photons plus all neutrino species counted as relativistic, as in Planck 2018 VI
   * Table 2. Infinity when there is no radiation (Tcmb = 0).
   */
  readonly equalityRedshift: number;

  /** @internal The expansion rate this model's tables integrate. */
  readonly expansion: ExpansionRate;
  /** @internal √|Ωk|. */
  readonly sqrtAbsOk: number;
  /** Sign of the curvature: 1 open, 0 flat, −1 closed (an integer field: cheap to branch on). */
  private readonly geometry: 1 | 0 | -1;
  /** @internal Tables cover 0 ≤ u ≤ uMax, u = ln(1+z). */
  readonly uMax: number;
  /** @internal χ = D_C/D_H against u. */
  readonly chi: QuinticTable;
  /** @internal τ = t_lookback/t_H against u. */
  readonly tau: QuinticTable;
  /** The age table and age today, made at the first age asked for. */
  private readonly ageTable: () => AgeTable;
  private inverse: RedshiftInverse | undefined;

  /**
   * @param p model parameters (see `ModelParameters` for domains); normally from `parseModelSpec`
   * @throws RangeError if the model has E²(z) ≤ 0 somewhere at z ≥ 0 (no big bang: a bounce)
   */
  constructor(p: ModelParameters) {
    const x = new ExpansionRate(p); // validates p
    this.expansion = x;
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

    this.Ogamma = x.Ogamma;
    this.Or = x.Or;
    this.OnuMassive = x.OnuMassive;
    this.OL = x.OL;
    this.Ok = x.Ok;
    this.equalityRedshift = x.equalityRedshift;
    this.sqrtAbsOk = Math.sqrt(Math.abs(this.Ok));
    this.geometry = this.Ok > 0 ? 1 : this.Ok < 0 ? -1 : 0;

    const tables = buildDistanceTables(x);
    this.uMax = tables.uMax;
    this.chi = tables.chi;
    this.tau = tables.tau;
    this.ageTable = tables.age;
  }

  /** Age of the universe today [Gyr] (Infinity for a model without a big bang in finite time, e.g. de Sitter; NaN when its age integral does not converge numerically). */
  get ageTodayGyr(): number {
    return this.ageTable().ageToday * this.hubbleTimeGyr; // +∞ (infinite past) or NaN stay so
  }

  /** @internal ln(t_age/t_H) against u (absent when the past is infinite). */
  get lnAge(): QuinticTable | undefined {
    return this.ageTable().lnAge;
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

  /** Canonical spec text of this model (see `formatModelSpec`). @example Cosmology.fromSpec("p18-bao ; h0 = 73").spec // "P18-BAO; H0=73" */
  get spec(): string {
    return formatModelSpec(this.parameters);
  }

  /** Dimensionless expansion rate E(z) = H(z)/H0. @param z redshift ≥ 0 @example Cosmology.fromSpec("EDS").expansionRate(3) // 8 */
  expansionRate(z: number): number {
    checkRedshift(z);
    return Math.sqrt(this.expansion.e2(1 + z, Math.log1p(z)));
  }

  /**
   * Hubble parameter H(z) = H0 E(z) [km s⁻¹ Mpc⁻¹] (Hogg 1999 eq. 14).
   * @param z redshift ≥ 0
   * @returns H(z) in km/s/Mpc
   * @example Cosmology.fromSpec("P18-BAO").hubbleParameterKmSMpc(0) // 67.66
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
    return this.expansion.densityParameter(component, z);
  }

  /**
   * CMB temperature at z, T(z) = Tcmb (1+z) [K].
   * @param z redshift ≥ 0
   * @returns K
   * @example Cosmology.fromSpec("P18-BAO").cmbTemperatureK(1) // 5.451
   */
  cmbTemperatureK(z: number): number {
    checkRedshift(z);
    return this.Tcmb * (1 + z);
  }

  /**
   * Critical density ρ_crit(z) = 3 H(z)² / (8πG) [kg m⁻³].
   * @param z redshift ≥ 0
   * @returns kg/m³
   * @example Cosmology.fromSpec("H0=70; Om=0.3").criticalDensityKgM3(0) // 9.204e-27 (3 H0²/(8πG))
   */
  criticalDensityKgM3(z: number): number {
    const hPerS = (this.hubbleParameterKmSMpc(z) * 1000) / megaparsecM;
    return (3 * hPerS * hPerS) / (8 * Math.PI * gravitationalConstantSI);
  }

  /** χ(u) in units of D_H: the table, or the exact integral below directBelowU and beyond uMax. */
  /** @internal */
  chiAtU(u: number): number {
    if (u < directBelowU) return this.integrateDirect(this.chiIntegrand, 0, u);
    return u <= this.uMax ? this.chi.value(u) : this.chiBeyond(u);
  }

  /** dχ/du = e^u / E. */
  private readonly chiIntegrand = (v: number): number => Math.exp(v) / Math.sqrt(this.expansion.e2(Math.exp(v), v));

  /** dτ/du = 1 / E. */
  private readonly tauIntegrand = (v: number): number => 1 / Math.sqrt(this.expansion.e2(Math.exp(v), v));

  /** One 15-point Kronrod panel: exact to rounding on the short interval [0, u < directBelowU]. */
  private integrateDirect(f: (v: number) => number, a: number, b: number): number {
    return kronrod15(f, a, b).value;
  }

  /** @internal */
  chiBeyond(u: number): number {
    return this.chi.node(this.chi.panels) + integrate(this.chiIntegrand, this.uMax, u, relTolExact);
  }

  /** τ(u) in units of t_H: the table, or the exact integral below directBelowU and beyond uMax. */
  /** @internal */
  tauAtU(u: number): number {
    if (u < directBelowU) return this.integrateDirect(this.tauIntegrand, 0, u);
    if (u <= this.uMax) return this.tau.value(u);
    return this.tau.node(this.tau.panels) + integrate(this.tauIntegrand, this.uMax, u, relTolExact);
  }

  /** Age in units of t_H at u = ln(1+z), from ∫₀^a da/(aE) with a = s² (regular at s = 0). */
  /** @internal */
  ageBeyond(u: number): number {
    return ageSinceBigBang(this.expansion, u);
  }

  /** @internal */
  ageAtU(u: number): number {
    const { lnAge, ageToday } = this.ageTable();
    if (!lnAge) return ageToday; // +∞ (infinite past) or NaN (no numerical age)
    return u <= this.uMax ? Math.exp(lnAge.value(u)) : this.ageBeyond(u);
  }

  /** S_k(χ) = sinh(√Ωk χ)/√Ωk, χ, or sin(√−Ωk χ)/√−Ωk (Hogg eq. 16, in units of D_H). */
  /** @internal */
  transverse(chi: number): number {
    if (this.geometry === 0) return chi;
    const k = this.sqrtAbsOk;
    return this.geometry > 0 ? Math.sinh(k * chi) / k : Math.sin(k * chi) / k;
  }

  /** dS_k/dχ. */
  /** @internal */
  transverseSlope(chi: number): number {
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
   * @returns Mpc
   * @example Cosmology.fromSpec("EDS").comovingDistanceMpc(3) // 4282.75 (Einstein–de Sitter, H0 = 70: 2 D_H (1 − 1/√(1+z)))
   */
  comovingDistanceMpc(z: number): number {
    return this.hubbleDistanceMpc * this.chiAtU(this.u(z));
  }

  /**
   * Transverse comoving distance D_M (Hogg 1999 eq. 16): D_C if flat, D_H/√Ωk sinh(√Ωk D_C/D_H) if open,
   * D_H/√|Ωk| sin(√|Ωk| D_C/D_H) if closed.
   * @param z redshift ≥ 0
   * @returns Mpc
   * @example Cosmology.fromSpec("H0=70; Om=0; OL=0").transverseComovingDistanceMpc(1) // 3212.06 (Milne: D_H z(1 + z/2)/(1+z))
   */
  transverseComovingDistanceMpc(z: number): number {
    return this.hubbleDistanceMpc * this.transverse(this.chiAtU(this.u(z)));
  }

  /**
   * Angular-diameter distance D_A = D_M / (1+z) (Hogg 1999 eq. 18).
   * @param z redshift ≥ 0
   * @returns Mpc
   * @example Cosmology.fromSpec("EDS").angularDiameterDistanceMpc(1.25) // 1268.96 (its maximum: 2 D_H (1 − 1/√(1+z))/(1+z))
   */
  angularDiameterDistanceMpc(z: number): number {
    const u = this.u(z);
    return this.hubbleDistanceMpc * this.transverse(this.chiAtU(u)) * Math.exp(-u);
  }

  /**
   * Luminosity distance D_L = (1+z) D_M (Hogg 1999 eq. 21).
   * @param z redshift ≥ 0
   * @returns Mpc
   * @example Cosmology.fromSpec("EDS").luminosityDistanceMpc(1) // 5017.55 (2 D_H (1+z − √(1+z)))
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
   * @returns Mpc
   * @example Cosmology.fromSpec("H0=70; Om=0; OL=1").lightTravelDistanceMpc(1) // 2968.58 (de Sitter: D_H ln(1+z))
   */
  lightTravelDistanceMpc(z: number): number {
    return this.hubbleDistanceMpc * this.tauAtU(this.u(z));
  }

  /**
   * Distance modulus μ = 5 log10(|D_L| / 10 pc) (Hogg 1999 eq. 25). Past the antipode of a closed
   * model D_L < 0 (the image is inverted) while the flux still falls as 1/(4π D_L²), so |D_L| is used.
   * @param z redshift > 0 (z = 0 gives −Infinity)
   * @returns mag (D_L = 10 Mpc gives 30)
   * @example Cosmology.fromSpec("EDS").distanceModulusMag(1) // 43.502 (5 log10(5017.55e6 pc / 10 pc))
   */
  distanceModulusMag(z: number): number {
    return 5 * Math.log10(Math.abs(this.luminosityDistanceMpc(z))) + 25;
  }

  /**
   * Look-back time t_L = t_H ∫₀^z dz'/((1+z')E(z')) (Hogg 1999 eq. 30).
   * @param z redshift ≥ 0
   * @returns Gyr
   * @example Cosmology.fromSpec("EDS").lookbackTimeGyr(3) // 8.148 ((2/3) t_H (1 − (1+z)^{−3/2}))
   */
  lookbackTimeGyr(z: number): number {
    return this.hubbleTimeGyr * this.tauAtU(this.u(z));
  }

  /**
   * Age of the universe at z: t = t_H ∫₀^{1/(1+z)} da/(a E(a)), integrated in a (not to z = ∞).
   * @param z redshift ≥ 0
   * @returns Gyr (Infinity if the past is infinitely long, as in de Sitter)
   * @example Cosmology.fromSpec("P18-BAO").ageGyr(0) // 13.787
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
    return (dh * dh * dh * dm * dm) / Math.sqrt(this.expansion.e2(1 + z, u));
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

  /** @internal */
  chiSlopeAtU(u: number): number {
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
   * @example Cosmology.fromSpec("EDS").redshiftAt("luminosityDistance", 5017.553) // 1.0000 (the inverse of D_L(1) above)
   */
  redshiftAt(quantity: InvertibleQuantity, value: number, wording?: InverseWording): number {
    this.inverse ??= new RedshiftInverse(this);
    return this.inverse.redshiftAt(quantity, value, wording);
  }
}
