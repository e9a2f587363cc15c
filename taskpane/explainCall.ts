/**
 * The cell inspector's explanation of each ZC call in a formula: what it computes (the equation in
 * plain notation), its arguments with their values and units, the model used and its conventions,
 * the numerical method and its accuracy, and the result — or, for an error, the reason. The result
 * is recomputed with the same shared wrapper the worksheet functions use, so the reason given is
 * the one behind the cell's error.
 */
import type { Cosmology } from "../core/index.js";
import type { ActiveModelSetting } from "../functions/activeModel.js";
import { CellError, type ErrorKind } from "../functions/cellError.js";
import { adviseOnError } from "./errorAdvice.js";
import { definitions } from "../functions/definitions.js";
import { describeModel } from "../functions/describeModel.js";
import { evaluateLazily, type ArgSpec, type CallResult, type Cell, type FunctionDef } from "../functions/evaluate.js";
import { isBlank, keyValueBlockSpec } from "../functions/modelArgument.js";
import { modelFor } from "../functions/modelCache.js";
import { resolvedSpec } from "../functions/workbookModels.js";
import { formatValue } from "../functions/messages.js";
import { parentsOf, placeIn, placeWords, within, type CellPlace } from "./broadcastPlace.js";
import { findCalls, type FormulaCall } from "./formulaCalls.js";
import { cellName, cut, firstOf, inspectorReadLimit, matrixOf, readArgument, showValue, type ReadArgument, type ReferenceRead, type ReferenceReader } from "./readArgument.js";

export { inspectorReadLimit } from "./readArgument.js";
export type { ReferenceRead, ReferenceReader } from "./readArgument.js";

/** One explained call, for the selected cell: the arguments' values and the model of that cell. */
export interface CallExplanation {
  name: string;
  summary: string;
  equation: string;
  args: { name: string; text: string; value: string; unit?: string }[];
  /**
   * The model that computed the selected cell: its text as given (or the workbook's), where it came
   * from (`where`: the cell of a model range, a key/value block) and its description.
   */
  model?: { spec: string; source: "given in the formula" | "the workbook's model"; where?: string; description: string };
  /** For a range of models: the distinct models it names, in order (a blank cell as the workbook's model). */
  models?: string[];
  /** When the model of the selected cell is not known here: why. */
  modelNote?: string;
  /**
   * A function of two models (RESCALE): each model argument's model at the selected cell, labelled
   * for its argument ("From model" for from_model, "To model" for to_model); `model`, `models` and
   * `modelNote` are then not set, since no one model computed the cell.
   */
  modelArgs?: ({ label: string; argument: string } & Pick<CallExplanation, "model" | "models" | "modelNote">)[];
  /** The columns of a result that is a table (LUMINOSITY_FUNCTION), when the function names them. */
  columns?: string[];
  conventions: string[];
  method: string;
  /** The method in one plain line; `method` holds the detail. */
  methodPlain: string;
  /** The result of the selected cell as a person reads it: at most 6 significant digits, with the unit. */
  result: string;
  /** The result's full value (every digit Excel holds), when it is a number. */
  exact?: string;
  isError: boolean;
  /** For an error: the argument its message is about (its formula text and value), and how to fix it. */
  fault?: { argument?: string; text?: string; value?: string; fix: string };
}

const tabled =
  "quintic Hermite tables in ln(1+z) built once per model from Gauss–Legendre panels of the exact integrals " +
  "(direct quadrature below z ≈ 0.065 and above z = 1e8); relative error ≤ 1e-10 for z ≤ 1e4, ≤ 1e-8 to 1e7";
const closedForm = "closed form, exact to rounding";
const growthMethod = "fourth-order Runge–Kutta in ln a from a = 1e-8 (or a power of ten below, while dark energy is above 1e-6 of H²) on the Mészáros growing mode, cubic Hermite between steps; relative error ≤ 1e-7";
const inverse = "Newton's method on the same tables, bracketed by bisection; |Δz| ≤ 1e-9 (1+z)";
const firstOrder = "first-order propagation of independent errors with the exact derivative dD_C/dz = D_H/E(z) (no covariances)";
const firstCrossing = "scan upward in ln(1+z), then Newton with the exact derivative on the first crossing";

/** The method in one plain line (the detail stays one click away in the pane). */
function plainMethod(method: string): string {
  if (method === tabled) return "From tables of the exact integrals: relative error ≤ 1e-10 for z ≤ 10⁴.";
  if (method === inverse) return "Solved for z on the same tables as the forward function.";
  if (method === firstOrder) return "First-order error propagation from independent inputs (no covariances).";
  if (method === firstCrossing) return "The first redshift at which the source crosses the limit.";
  if (method === growthMethod) return "Solved from the growth equation: relative error ≤ 1e-7.";
  return method;
}

/**
 * A result's unit when no unit argument of the result sets it: fixed ("mag", "K"), or read from the
 * cell's text arguments (`text(name)`: as given, or the default a blank stands for).
 */
type ResultUnit = string | ((text: (name: string) => string | undefined) => string | undefined);
/** A value that keeps the unit it was given in (REST_FRAME, RESCALE): that unit, or words saying so. */
const ownUnit = (text: (name: string) => string | undefined) => text("unit") ?? "(in the value's own unit)";
/** ZC.PARAM's values that have a unit. */
const parameterUnits: Record<string, string> = { H0: "km/s/Mpc", Tcmb: "K", mnu: "eV", age_today: "Gyr", hubble_time: "Gyr", hubble_distance: "Mpc" };

/** What each function computes, in plain notation, and how. */
const about: Record<string, { summary: string; equation: string; method: string; kcorr?: boolean; unit?: ResultUnit; columns?: string[] }> = {
  DIST_LUM: { summary: "luminosity distance", equation: "D_L = (1+z)·D_M, D_M = S_k(D_C), D_C = D_H ∫₀^z dz′/E(z′)", method: tabled },
  DIST_ANG: { summary: "angular-diameter distance", equation: "D_A = D_M/(1+z)", method: tabled },
  DIST_LOS: { summary: "line-of-sight comoving distance", equation: "D_C = D_H ∫₀^z dz′/E(z′), D_H = c/H0", method: tabled },
  DIST_TRANS: { summary: "transverse comoving distance", equation: "D_M = D_H/√Ωk · sinh(√Ωk D_C/D_H) (open), D_C (flat), sin form (closed)", method: tabled },
  DIST_BETWEEN: { summary: "angular-diameter distance from z1 to z2", equation: "D_A12 = S_k(D_C2 − D_C1)/(1+z2)", method: tabled },
  DIST_LIGHT: { summary: "light-travel distance", equation: "c·t_L, t_L = t_H ∫₀^z dz′/((1+z′)E(z′))", method: tabled },
  MODULUS: { summary: "distance modulus", equation: "μ = 5·log10(|D_L| / 10 pc)", method: tabled, unit: "mag" },
  LOOKBACK: { summary: "look-back time", equation: "t_L = t_H ∫₀^z dz′/((1+z′)E(z′)), t_H = 1/H0", method: tabled },
  AGE: { summary: "age of the universe at z", equation: "t(z) = t_H ∫₀^{1/(1+z)} da/(a·E(a))", method: tabled },
  HUBBLE: { summary: "Hubble parameter", equation: "H(z) = H0·E(z), E² = Ωm-terms + Ωr(1+z)⁴ + Ωk(1+z)² + Ω_DE f_DE(z)", method: closedForm },
  OMEGA: { summary: "density parameter of one component", equation: "Ω_x(z) = ρ_x(z)/ρ_crit(z)", method: closedForm },
  CMB_TEMP: { summary: "CMB temperature", equation: "T(z) = Tcmb·(1+z)", method: closedForm, unit: "K" },
  CRIT_DENSITY: { summary: "critical density", equation: "ρ_crit = 3H(z)²/(8πG)", method: closedForm },
  PROPER_SCALE: { summary: "proper size per unit angle", equation: "ℓ/θ = D_A", method: tabled },
  SIZE: { summary: "proper size of an angle", equation: "ℓ = D_A·θ (small angle)", method: tabled },
  ANGLE: { summary: "angle of a proper size", equation: "θ = ℓ/D_A (small angle)", method: tabled },
  VOLUME: { summary: "all-sky comoving volume within z", equation: "V_C = 4π ∫₀^{D_C} D_M² dD_C", method: tabled },
  VOLUME_SHELL: { summary: "comoving volume of a shell over a sky area", equation: "(V_C(z2) − V_C(z1))·Ω/(4π)", method: tabled },
  VOLUME_ELEMENT: { summary: "comoving volume element", equation: "dV/dz/dΩ = D_H·D_M²/E(z)", method: tabled },
  LUMINOSITY: { summary: "bolometric luminosity", equation: "L = 4π·D_L²·F", method: tabled },
  FLUX: { summary: "bolometric flux", equation: "F = L/(4π·D_L²)", method: tabled },
  LUMINOSITY_NU: { summary: "rest-frame spectral luminosity of a power law", equation: "L_ν = 4π·D_L²·S_ν·(1+z)^−(1+α), S_ν ∝ ν^α", method: tabled },
  KCORRECTION: { summary: "K-correction of a power law", equation: "K = −2.5·(1+α)·log10(1+z)", method: closedForm, kcorr: true, unit: "mag" },
  MAG_ABS: { summary: "absolute magnitude", equation: "M = m − μ(z) − K", method: tabled, kcorr: true, unit: "mag" },
  MAG_APP: { summary: "apparent magnitude", equation: "m = M + μ(z) + K", method: tabled, kcorr: true, unit: "mag" },
  MAG_AB: { summary: "AB magnitude", equation: "m_AB = −2.5·log10(f_ν / 3630.78 Jy); f_ν = f_λ·λ²/c for a unit per wavelength", method: closedForm, unit: "mag" },
  FLUX_AB: { summary: "flux density of an AB magnitude", equation: "f_ν = 3630.78 Jy · 10^(−m_AB/2.5); f_λ = f_ν·c/λ² for a unit per wavelength", method: closedForm, unit: (text) => text("unit") },
  DIST_LUM_ERR: { summary: "1σ error of the luminosity distance", equation: "σ_DL = |dD_L/dz|·σ_z, dD_L/dz = D_M + (1+z)·dD_M/dz", method: firstOrder },
  LUMINOSITY_ERR: { summary: "1σ error of a bolometric luminosity", equation: "σ_L/L = √((σ_F/F)² + (2σ_z·dlnD_L/dz)²)", method: firstOrder },
  LUMINOSITY_NU_ERR: { summary: "1σ error of a spectral luminosity", equation: "σ_L/L = √((σ_S/S)² + (σ_z(2·dlnD_L/dz − (1+α)/(1+z)))² + (σ_α·ln(1+z))²)", method: firstOrder },
  MAG_ABS_ERR: { summary: "1σ error of an absolute magnitude", equation: "σ_M = √(σ_m² + (d(μ + K)/dz·σ_z)² + σ_K²), dK/dz = −2.5(1+α)/((1+z)ln10) when α is given, else 0", method: firstOrder, unit: "mag" },
  LUMINOSITY_REST_ERR: { summary: "1σ error of a rest-frame spectral luminosity at another band", equation: "σ_L/L = √((σ_S/S)² + (σ_z(2·dlnD_L/dz − (1+α)/(1+z)))² + (σ_α·ln(ν_rest/((1+z)ν_obs)))²)", method: firstOrder, unit: (text) => text("out_unit") },
  SIZE_ERR: { summary: "1σ error of a proper size", equation: "σ_ℓ = √((D_A·σ_θ)² + (θ·dD_A/dz·σ_z)²)", method: firstOrder },
  LUMINOSITY_REST: { summary: "rest-frame spectral luminosity at another band", equation: "L_ν(ν_rest) = 4π·D_L²·S_ν(ν_obs)·(1+z)^−(1+α)·(ν_rest/ν_obs)^α; νL_ν in a power unit", method: tabled, unit: (text) => text("out_unit") },
  MAG_BOL: { summary: "absolute bolometric magnitude", equation: "M_bol = −2.5·log10(L / 3.0128e28 W) (IAU 2015 B2)", method: closedForm, unit: "mag" },
  LUM_BOL: { summary: "luminosity of an absolute bolometric magnitude", equation: "L = 3.0128e28 W · 10^(−0.4·M_bol) (IAU 2015 B2)", method: closedForm },
  REDSHIFT_LIMIT: { summary: "largest z at which a source stays above a bolometric flux limit", equation: "first z with L/(4π·D_L²) = limit", method: firstCrossing },
  REDSHIFT_LIMIT_NU: { summary: "largest z at which a power-law source stays above a flux-density limit", equation: "first z with L_ν·(1+z)^(1+α)/(4π·D_L²) = limit", method: firstCrossing },
  REDSHIFT_LIMIT_MAG: { summary: "largest z at which a source stays brighter than a magnitude limit", equation: "first z with M + μ(z) + K(z) = m_lim, K = −2.5(1+α)log10(1+z)", method: firstCrossing },
  VOLUME_MAX: { summary: "V_max of the 1/V_max estimator", equation: "V_C between max(z_lo, z_min) and min(z_max, z_hi) over the area, 0 if that range is empty", method: tabled },
  LUMINOSITY_FUNCTION: {
    summary: "binned luminosity function by 1/V_max",
    equation: "Φ = Σ(1/V_max)/Δbin, σ_Φ = √Σ(1/V_max²)/Δbin (Schmidt 1968; Felten 1976)",
    method: closedForm,
    columns: ["low", "high", "N", "Φ", "σ_Φ"],
  },
  CHI2_MODULUS: { summary: "χ² of a Hubble diagram against the model", equation: "Σ((μ − μ_model(z) − offset)/σ)²; free offset: Σw(Δ − Δ̄)², Δ̄ the weighted mean of Δ = μ − μ_model (= A − B²/C, Goliath et al. 2001)", method: tabled },
  REDSHIFT_CMB: { summary: "redshift in the CMB frame", equation: "1+z_cmb = (1+z_helio)/(γ(1 − β·cos θ)), v = 369.82 km/s to (l, b) = (264.021°, 48.253°)", method: closedForm },
  SPECTRAL_INDEX: { summary: "a spectral index as α of S_ν ∝ ν^α", equation: "photon: α = 1 − Γ; lambda: α = −2 − β (f_λ ∝ λ^β); radio: α = −value", method: closedForm },
  DIMMING: { summary: "surface-brightness dimming", equation: "10·log10(1+z) bolometric; 2.5·(3 − α)·log10(1+z) per unit frequency", method: closedForm, unit: "mag" },
  DIST_HUBBLE: { summary: "Hubble distance at z (radial BAO distance)", equation: "D_H(z) = c/H(z)", method: closedForm },
  DIST_VOLUME: { summary: "volume-averaged distance (isotropic BAO distance)", equation: "D_V = [z·D_M²·c/H(z)]^(1/3) (Eisenstein et al. 2005)", method: tabled },
  SOUND_HORIZON: { summary: "sound horizon at the drag epoch", equation: "r_d = 55.154·exp(−72.3(ω_ν + 0.0006)²)/(ω_cb^0.25351·ω_b^0.12807) Mpc (Aubourg et al. 2015 eq. 16), × ∫c_s dz/H of the model over that with Neff = 3.046, Tcmb = 2.7255 K (z_d moved as 1/Tcmb)", method: "fit to a Boltzmann code, about 0.02% for the standard Neff; another Neff or Tcmb through the direct integral" },
  SIGMA_CRIT: { summary: "critical surface density of a thin lens", equation: "Σ_cr = c²·D_s/(4πG·D_l·D_ls), angular-diameter distances, per physical area; comoving: Σ_cr/(1+z_l)²", method: tabled },
  OVERDENSITY: { summary: "overdensity of a halo definition relative to ρ_crit(z)", equation: "Δ = N (Nc), N·Ωm(z) (Nm), 18π² + 82x − 39x², x = Ωm(z) − 1 (vir, Bryan & Norman 1998)", method: closedForm },
  HALO_RADIUS: { summary: "halo radius at mean density Δ·ρ_crit(z)", equation: "R = (3M/(4π·Δ·ρ_crit(z)))^(1/3)", method: closedForm },
  HALO_MASS: { summary: "halo mass within a radius at mean density Δ·ρ_crit(z)", equation: "M = (4π/3)·Δ·ρ_crit(z)·R³", method: closedForm },
  GROWTH: { summary: "linear growth factor D(z)/D(0)", equation: "D″ + (2 + ½·dlnE²/dlna)·D′ − (3/2)·Ω_s(a)·D = 0 in ln a; Ω_s: CDM + baryons (neutrinos \"smooth\") or + ρ_ν − 3P_ν (\"clustering\")", method: growthMethod },
  GROWTH_RATE: { summary: "linear growth rate f = dlnD/dlna", equation: "f = D′/D from the growth equation", method: growthMethod },
  RESCALE: { summary: "a published value restated under another cosmology", equation: "× D_M ratio (distance), × D_L² ratio (luminosity), × D_A ratio (size), + 5·log10(D_L,from/D_L,to) (magnitude), × dV/dz ratio (density)", method: tabled, unit: (text) => (text("quantity") === "magnitude" ? "mag" : ownUnit(text)) },
  SURFACE_LUM: { summary: "intrinsic surface luminosity density", equation: "Σ = 10^(−0.4(μ − 10·log10(1+z) − K − M☉ − 21.572)) L☉/pc²", method: closedForm, unit: "Lsun/pc2" },
  SURFACE_MAG: { summary: "observed surface brightness of a surface luminosity density", equation: "μ = M☉ + 21.572 − 2.5·log10(Σ) + 10·log10(1+z) + K", method: closedForm, unit: "mag/arcsec2" },
  COORD_DEG: { summary: "an angle in degrees from sexagesimal text", equation: "RA (hours): 15°·(h + m/60 + s/3600); Dec: ±(d + m/60 + s/3600)°; a number stays degrees", method: closedForm, unit: "deg" },
  COORD_TEXT: { summary: "sexagesimal text of an angle in degrees", equation: "RA: (degrees/15) as HH:MM:SS.ss; Dec: ±DD:MM:SS.s; rounded once on the last digit, then carried", method: closedForm },
  SEPARATION: { summary: "angular separation of two positions (great circle)", equation: "θ = atan2(√((cos δ2·sin Δα)² + (cos δ1·sin δ2 − sin δ1·cos δ2·cos Δα)²), sin δ1·sin δ2 + cos δ1·cos δ2·cos Δα) (Vincenty)", method: closedForm },
  COORD_CONVERT: { summary: "a position turned into another sky frame", equation: "r_to = R_to·R_fromᵀ·r_from; galactic: Hipparcos A_G (ESA 1997); supergalactic: pole (l, b) = (47.37°, 6.32°), origin l = 137.37°; ecliptic: R_x(ε0 = 84381.406″, IAU 2006)", method: closedForm, unit: "deg" },
  VELOCITY: { summary: "the velocity of a redshift in a Doppler convention", equation: "optical v = cz; radio v = cz/(1+z); relativistic v = c((1+z)² − 1)/((1+z)² + 1)", method: closedForm },
  Z_FROM_VELOCITY: { summary: "the redshift of a velocity in a Doppler convention", equation: "optical z = v/c; radio z = v/(c − v); relativistic 1+z = √((c + v)/(c − v))", method: closedForm },
  Z_COMBINE: { summary: "two redshifts composed", equation: "1+z = (1+z1)(1+z2)", method: closedForm },
  VELOCITY_PECULIAR: { summary: "peculiar velocity from observed and cosmological redshifts", equation: "v_pec = c(z_obs − z_cosmo)/(1 + z_cosmo) (Davis & Scrimgeour 2014)", method: closedForm },
  REST_FRAME: { summary: "an observed value in the source's rest frame", equation: "λ/(1+z), ν·(1+z), Δt/(1+z), W/(1+z)", method: closedForm, unit: ownUnit },
  OBSERVED_FRAME: { summary: "a rest-frame value as observed", equation: "λ·(1+z), ν/(1+z), Δt·(1+z), W·(1+z)", method: closedForm, unit: ownUnit },
  REDSHIFT: { summary: "redshift at which a quantity takes a value", equation: "solves Q(z) = value (lower branch for D_A)", method: inverse },
  CONVERT: { summary: "unit conversion", equation: "value × (from / to), FITS unit syntax; h-scaled units with h = H0/100 of the model", method: closedForm, unit: (text) => text("to") },
  MODEL: { summary: "model spec text: a base model with parameters changed", equation: "—", method: closedForm },
  PARAM: { summary: "a parameter or derived value of the model", equation: "—", method: closedForm, unit: (text) => parameterUnits[text("name") ?? ""] },
  PRESETS: { summary: "the parameter sets: built in, and defined in this workbook", equation: "—", method: closedForm },
  DESCRIBE: { summary: "the model in words", equation: "—", method: closedForm },
  VERSION: { summary: "version and engine conventions", equation: "—", method: closedForm },
  EXTINCTION: {
    summary: "extinction A_λ of a published law for a colour excess E(B−V)",
    equation: "A_λ = E(B−V)·A_λ/E(B−V) at one wavelength: Fitzpatrick 1999 (FM90 UV, spline in the optical/IR), Cardelli 1989 and O'Donnell 1994 (R_V·a(x) + b(x), x = 1/λ), Calzetti 2000 (k′(λ), a galaxy's own attenuation)",
    method: "the laws' published formulas, exact to rounding (Fitzpatrick 1999: a natural cubic spline through its anchor points); a band's A is the law's value at its effective wavelength",
    unit: "mag",
  },
  INDEX_BETWEEN: { summary: "spectral index between two bands", equation: "α = ln(S1/S2)/ln(ν1/ν2), S_ν ∝ ν^α", method: closedForm },
  INDEX_BETWEEN_ERR: { summary: "1σ error of a two-band spectral index", equation: "σ_α = √((σ1/S1)² + (σ2/S2)²)/|ln(ν1/ν2)|", method: "first-order propagation of independent flux-density errors (bands exact)" },
  BRIGHTNESS_TEMP: { summary: "brightness temperature of an elliptical Gaussian source (Rayleigh–Jeans)", equation: "T_b = (1+z)·S·c²/(2k·ν²·Ω), Ω = π·θ_maj·θ_min/(4 ln 2), FWHM axes", method: closedForm, unit: "K" },
};

/** A function's result unit when it has no unit argument and no argument decides it ("mag", "K"); undefined otherwise. */
export function fixedResultUnit(name: string): string | undefined {
  const unit = about[name]?.unit;
  return typeof unit === "string" ? unit : undefined;
}

/** Models of a range listed at most; the rest are counted. */
const modelsListed = 8;
/** Characters of a model's text shown at most (a cell may hold 32,767: a stranger's text is cut). */
const modelTextShown = 100;

/**
 * Cells of the results of calls written as another ZC call's argument, computed whole at most for
 * one formula (the caller reads such a result whole); the calls themselves are computed only at the
 * cell explained.
 */
export const inspectorNestedCellLimit = 1_000;

/**
 * A call with its arguments read and, when every one is known, its result as the worksheet function
 * returns it: its shape, and its cells computed one at a time when asked for.
 */
interface EvaluatedCall {
  call: FormulaCall;
  def: FunctionDef;
  args: ReadArgument[];
  result?: CallResult;
}

/** A model argument that is a key/value block: the spec it spells, or why it spells none. */
function blockOf(arg: ReadArgument | undefined): { spec: string } | { error: string } | undefined {
  const m = arg?.known ? matrixOf(arg.value) : undefined;
  if (!m || m.length * m[0].length === 1) return undefined;
  try {
    const spec = keyValueBlockSpec(m);
    return spec === undefined ? undefined : { spec };
  } catch (e) {
    return { error: (e as Error).message };
  }
}

/** How an argument's value reads, with what an omitted or blank one stands for. */
function describeArg(spec: ArgSpec, value: unknown): string {
  if (value === undefined || value === "") {
    if (spec.kind === "unit") return `default "${spec.default}"`;
    if (spec.kind === "model") return "the workbook's model";
    const blank = "blank" in spec ? spec.blank : undefined;
    if (blank) return "typed" in blank ? `default "${blank.typed}"` : `left out: ${blank.words}`;
    if (spec.kind === "number" && spec.default !== undefined) return Number.isNaN(spec.default) ? "not given" : `default ${spec.default}`;
  }
  return showValue(value);
}

function modelConventions(m: Cosmology): string[] {
  const out = ["Om is all matter today, massive neutrinos included."];
  if (m.Tcmb === 0) out.push("Radiation off (Tcmb = 0): no photons, no neutrinos.");
  else {
    out.push(`Radiation on: photons at Tcmb = ${m.Tcmb} K and neutrinos with Neff = ${m.Neff}, T_ν = (4/11)^(1/3) Tcmb.`);
    if (m.parameters.mnu.length) out.push(`Massive neutrinos (${m.parameters.mnu.join(", ")} eV) by the exact Fermi–Dirac integral.`);
  }
  out.push(m.Ok === 0 ? "Flat (Ωk = 0)." : `Curvature Ωk = ${Number(m.Ok.toPrecision(5))}.`);
  return out;
}

/** The kind of an error value as Excel shows it in a cell ("#NUM!" → "num", CellError's own spelling); undefined for any other value. */
function shownErrorKind(value: unknown): ErrorKind | undefined {
  return (["value", "num", "na"] as const).find((kind) => new CellError(kind, "").excelText === value);
}

type ModelOfCell = Pick<CallExplanation, "model" | "models" | "modelNote"> & { cosmology?: Cosmology };

/**
 * The model one cell of a model argument names, as the functions read it (`readArguments.ts`: blank →
 * the workbook's model; text → preset, spec or workbook model).
 * @param value the cell's value
 * @param cell where it is, e.g. "Sheet1!C1" (undefined for a single value)
 */
function modelNamed(value: unknown, cell: string | undefined, active: ActiveModelSetting): ModelOfCell {
  const given = typeof value === "string" ? value.trim() : value;
  if (isBlank(given)) {
    return built(active.spec, "the workbook's model", cell && `${cell} for this cell is blank`, active);
  }
  if (typeof given !== "string") {
    const description = "not a model: a model is text (a preset, a spec, a model of this workbook) or a key/value block";
    return { model: { spec: cut(showValue(given), modelTextShown), source: "given in the formula", where: cell && `${cell} for this cell`, description } };
  }
  return built(given, "given in the formula", cell && `${cell} for this cell`, active);
}

function built(spec: string, source: "given in the formula" | "the workbook's model", where: string | undefined, active: ActiveModelSetting): ModelOfCell {
  const shown = cut(spec, modelTextShown);
  try {
    const resolved = resolvedSpec(spec, active.models);
    const m = modelFor(resolved); // the functions' own cache: no model is built twice
    const ours = resolved !== spec ? "a model of this workbook" : undefined;
    const at = [where, ours].filter(Boolean).join("; ") || undefined;
    // the description starts with the model's name, which the row shows already
    const words = describeModel(m);
    const description = words.startsWith(`${shown}: `) ? words.slice(shown.length + 2) : words;
    return { model: { spec: shown, source, where: at, description }, cosmology: m };
  } catch (e) {
    return { model: { spec: shown, source, where, description: (e as Error).message } };
  }
}

/** The distinct models of a range of models, in order, a blank cell as the workbook's; at most `modelsListed`, then a count. */
function modelsIn(m: unknown[][], active: ActiveModelSetting): string[] {
  const seen = new Set<string>();
  for (const row of m) {
    for (const value of row) {
      const text = typeof value === "string" ? value.trim() : value;
      seen.add(isBlank(text) ? `${active.spec} (the workbook's model)` : typeof text === "string" ? cut(text, modelTextShown) : showValue(text));
    }
  }
  const listed = [...seen].slice(0, modelsListed);
  if (seen.size > modelsListed) listed.push(`… and ${(seen.size - modelsListed).toLocaleString("en-US")} more`);
  return listed;
}

/** The model of the selected cell: the one model given, or the cell of a model range at the cell's place in the broadcast. */
function modelOfCell(arg: ReadArgument, text: string, place: CellPlace | undefined, active: ActiveModelSetting): ModelOfCell {
  if (!arg.known) return { modelNote: `${arg.note ?? "computed by Excel"}: not known here` };
  const block = blockOf(arg);
  const where = arg.source?.kind === "reference" ? (arg.source.address ?? arg.source.text) : text;
  if (block && "error" in block) {
    return { model: { spec: cut(text, modelTextShown), source: "given in the formula", where: `the key/value block ${where}`, description: block.error } };
  }
  if (block) return built(block.spec, "given in the formula", `the key/value block ${where}`, active);
  const m = matrixOf(arg.value);
  if (!m || m.length * m[0].length === 1) return modelNamed(firstOf(arg.value), undefined, active);
  const models = modelsIn(m, active);
  const q = place && placeIn(place, m.length, m[0].length);
  if (!q) return { models, modelNote: `one per cell of ${text}; which of them computed this cell is not known here` };
  return { ...modelNamed(m[q.row][q.col], cellName(arg.source, q, m.length, m[0].length), active), models };
}

/**
 * Explains every ZC call in a formula, for the selected cell: a call whose result has several cells
 * is explained at the cell the selected one shows (the arguments' cells and the model at that place
 * in the broadcast), where that is known.
 * @param formula the cell's formula
 * @param readReference reads the values of a reference (at most `inspectorReadLimit` cells)
 * @param active the workbook's active model
 * @param cellValue the value Excel shows in the cell (used when an argument only Excel can compute)
 * @param at the selected cell's row and column in the formula's spilled result (0, 0 for the
 *   formula's own cell); undefined when not known
 * @returns the calls, outermost first, in the order they are written
 */
export async function explainFormula(
  formula: string,
  readReference: ReferenceReader,
  active: ActiveModelSetting,
  cellValue?: unknown,
  at?: CellPlace,
): Promise<CallExplanation[]> {
  const calls = findCalls(formula);
  const parents = parentsOf(calls);
  const ours = calls.flatMap((c, i) => (c.name.startsWith("ZC.") && definitions[c.name.slice(3)] ? [i] : []));
  const readOnce = new Map<string, Promise<ReferenceRead>>(); // a reference named by several calls is read once
  const read = (reference: string) => {
    let got = readOnce.get(reference);
    if (!got) readOnce.set(reference, (got = readReference(reference, inspectorReadLimit)));
    return got;
  };
  const nested = new Map<string, Cell[][] | string>();
  const budget = { cells: inspectorNestedCellLimit };
  const evaluated = new Map<number, EvaluatedCall>();
  // innermost first, so that a nested call's result is known to its caller
  for (const i of [...ours].sort((a, b) => calls[b].depth - calls[a].depth)) {
    const e = await evaluateCall(calls[i], read, active, nested);
    evaluated.set(i, e);
    const caller = parents[i] >= 0 && ours.includes(parents[i]) ? calls[parents[i]] : undefined;
    if (e.result && caller?.args.includes(calls[i].text)) nested.set(calls[i].text, wholeResult(e, budget));
  }
  // outermost first (findCalls lists a call before those inside it): the cell of each result the selected cell reads
  const whole = formula.replace(/^=/, "").trim();
  const places = new Map<number, CellPlace | undefined>();
  for (const i of ours) {
    const { result } = evaluated.get(i)!;
    let place: CellPlace | undefined;
    if (result && result.rows * result.cols === 1) place = { row: 0, col: 0 };
    else if (parents[i] < 0) place = calls[i].text !== whole ? undefined : result ? within(at, result.rows, result.cols) : at;
    else place = placeInCaller(evaluated.get(parents[i]), places.get(parents[i]), calls[i].text, result);
    places.set(i, place);
  }
  return ours.map((i) => explainAt(evaluated.get(i)!, places.get(i), active, cellValue));
}

/**
 * The cell of a nested call's result that its caller reads for the caller's cell `outer`: by the
 * broadcast for a cell argument, the first for a unit or a scalar text (read once), none known for a
 * key/value block or a function of whole columns (every cell is read).
 */
function placeInCaller(caller: EvaluatedCall | undefined, outer: CellPlace | undefined, text: string, result: CallResult | undefined): CellPlace | undefined {
  const k = caller ? caller.call.args.indexOf(text) : -1;
  if (!caller || !outer || !result || k < 0 || k >= caller.def.args.length) return undefined;
  const spec = caller.def.args[k];
  if (spec.kind === "unit" || (spec.kind === "text" && spec.scalar)) return { row: 0, col: 0 };
  if (caller.def.over || caller.def.table || (spec.kind === "model" && blockOf(caller.args[k]))) return undefined;
  if (caller.result && caller.result.rows * caller.result.cols === 1) return undefined; // the caller's one cell is an error of the whole call (shapes that do not broadcast)
  return placeIn(outer, result.rows, result.cols);
}

/**
 * A nested call's whole result, for its caller to read as an argument: every cell computed while
 * the formula's `budget` of cells lasts, else why it is not.
 */
function wholeResult(e: EvaluatedCall, budget: { cells: number }): Cell[][] | string {
  const { rows, cols } = e.result!;
  if (rows * cols > budget.cells) {
    return `the result of ${e.call.name}, ${rows.toLocaleString("en-US")}×${cols.toLocaleString("en-US")} cells, not computed here (the inspector computes at most ${inspectorNestedCellLimit.toLocaleString("en-US")} cells of calls inside another)`;
  }
  budget.cells -= rows * cols;
  const cells = Array.from({ length: rows }, (_, r) => Array.from({ length: cols }, (_, c) => e.result!.cell(r, c)));
  e.result = { rows, cols, cell: (r, c) => cells[r][c] }; // the cell explained is read from these, not computed again
  return cells;
}

async function evaluateCall(
  call: FormulaCall,
  read: (reference: string) => Promise<ReferenceRead>,
  active: ActiveModelSetting,
  nested: Map<string, Cell[][] | string>,
): Promise<EvaluatedCall> {
  const def = definitions[call.name.slice(3)];
  const args: ReadArgument[] = [];
  for (let i = 0; i < def.args.length; i++) args.push(await readArgument(call.argTokens[i] ?? [], call.args[i] ?? "", read, nested));
  if (!args.every((a) => a.known)) return { call, def, args };
  return { call, def, args, result: evaluateLazily(def, args.map((a) => a.value), active) };
}

/** The row label of a model argument of a function of two models: "from_model" → "From model". */
function modelLabel(name: string): string {
  const words = name.replace(/_model$/, "").replaceAll("_", " ");
  return `${words[0].toUpperCase()}${words.slice(1)} model`;
}

/**
 * The unit of the selected cell's result: a unit argument of the result (as given, or its default),
 * else the function's own (`about`), read from the cell's text arguments (a blank one as its default).
 */
function resultUnitOf(
  e: EvaluatedCall,
  own: ResultUnit | undefined,
  place: CellPlace | undefined,
  broadcasts: (spec: ArgSpec, arg: ReadArgument) => boolean,
): string | undefined {
  const { def } = e;
  const text = (name: string): string | undefined => {
    const i = def.args.findIndex((a) => a.name === name);
    const spec = def.args[i];
    const arg = e.args[i];
    if (!spec || !arg?.known) return undefined;
    const m = matrixOf(arg.value);
    const q = m && m.length * m[0].length > 1 && place && broadcasts(spec, arg) ? placeIn(place, m.length, m[0].length) : undefined;
    const value = m ? (q ? m[q.row][q.col] : m.length * m[0].length === 1 ? m[0][0] : undefined) : firstOf(arg.value);
    if (typeof value === "string" && value.trim()) return value.trim();
    if (spec.kind === "unit") return spec.default;
    return "blank" in spec && spec.blank && "typed" in spec.blank ? spec.blank.typed : undefined;
  };
  const resultUnit = def.args.find((a) => a.kind === "unit" && a.applies === "result");
  if (resultUnit) return text(resultUnit.name);
  return typeof own === "function" ? own(text) : own;
}

/** A call explained at one cell of its result (`place`), or as a whole when the place is not known. */
function explainAt(e: EvaluatedCall, at: CellPlace | undefined, active: ActiveModelSetting, cellValue: unknown): CallExplanation {
  const { call, def } = e;
  // a single cell from ranges of several is an error of the whole call (shapes that do not broadcast): no cell of theirs computed it
  const place = !e.result || e.result.rows * e.result.cols > 1 ? at : undefined;
  const info = about[def.name];
  const modelIndexes = def.args.flatMap((a, i) => (a.kind === "model" ? [i] : []));
  // arguments broadcast cell by cell, except units and scalar texts (read once), key/value blocks and whole columns
  const broadcasts = (spec: ArgSpec, arg: ReadArgument) =>
    !def.over && !def.table && spec.kind !== "unit" && !(spec.kind === "text" && spec.scalar) && !(spec.kind === "model" && blockOf(arg));
  const args: CallExplanation["args"] = def.args.map((spec, i) => {
    const arg = e.args[i];
    const text = call.args[i] ?? "";
    const unitSpec = def.args.find((a) => a.kind === "unit" && (typeof a.applies === "string" ? [a.applies] : a.applies).includes(spec.name));
    const unit = unitSpec?.kind === "unit" ? unitSpec.default : undefined;
    const m = arg.known ? matrixOf(arg.value) : undefined;
    const q = m && m.length * m[0].length > 1 && place && broadcasts(spec, arg) ? placeIn(place, m.length, m[0].length) : undefined;
    let value: string;
    if (!arg.known) value = arg.note ?? "computed by Excel";
    else if (q) value = `${describeArg(spec, m![q.row][q.col])} (${cellName(arg.source, q, m!.length, m![0].length)} for this cell)`;
    else {
      const block = spec.kind === "model" ? blockOf(arg) : undefined;
      value = block && "spec" in block ? `a key/value block: "${cut(block.spec, modelTextShown)}"` : describeArg(spec, arg.value);
    }
    return { name: spec.name, text: text || "(omitted)", value, unit };
  });
  const ofModelArg = (i: number) => modelOfCell(e.args[i], call.args[i] ?? "", place, active);
  // one model computes the cell; a function of two (RESCALE) shows each, and the conventions of the one its result is stated under (the last)
  const chosen: ModelOfCell = modelIndexes.length === 1 ? ofModelArg(modelIndexes[0]) : {};
  const modelArgs = modelIndexes.length > 1 ? modelIndexes.map((i) => ({ label: modelLabel(def.args[i].name), argument: def.args[i].name, ...ofModelArg(i) })) : undefined;
  const under = modelArgs ? modelArgs[modelArgs.length - 1].cosmology : chosen.cosmology;
  const conventions = under ? modelConventions(under) : [];
  if (info.kcorr) conventions.push("K-correction sign: M = m − μ − K, with K = −2.5(1+α)log10(1+z) for S_ν ∝ ν^α.");

  let result: string;
  let exact: string | undefined;
  let isError = false;
  let fault: CallExplanation["fault"];
  if (e.result) {
    const { rows, cols } = e.result;
    const several = rows * cols > 1;
    const q = several ? within(at, rows, cols) : { row: 0, col: 0 };
    const cell = q ? e.result.cell(q.row, q.col) : e.result.cell(0, 0);
    const which = !several ? "" : q ? ` (${placeWords(q, rows, cols)} of ${rows}×${cols} values: this cell)` : ` (the first of ${rows}×${cols} values; which one this cell shows is not known here)`;
    if (cell instanceof CellError) {
      isError = true;
      result = `${cell.excelText} — ${cell.message}${which}`;
      const advice = adviseOnError(def, cell.kind, cell.message);
      const named = args.find((a) => a.name === advice.argument);
      fault = { ...advice, text: named?.text, value: named?.value };
    } else {
      const unitText = resultUnitOf(e, info.unit, place, broadcasts) ?? "";
      const shown = typeof cell === "number" ? formatValue(cell) : showValue(cell);
      result = `${shown}${unitText ? ` ${unitText}` : ""}${which}`;
      if (typeof cell === "number" && shown !== String(cell)) exact = `${String(cell)}${unitText ? ` ${unitText}` : ""}`;
    }
  } else {
    const why = e.args.some((a) => a.note) ? "an argument is not read" : "an argument is computed by Excel";
    result = `${showValue(cellValue)} (as Excel shows it; ${why})`;
    isError = typeof cellValue === "string" && cellValue.startsWith("#");
    const kind = shownErrorKind(cellValue);
    if (kind) fault = adviseOnError(def, kind, "");
  }
  const { model, models, modelNote } = chosen;
  return {
    name: call.name, summary: info.summary, equation: info.equation, args, model, models, modelNote,
    modelArgs: modelArgs?.map(({ label, argument, model, models, modelNote }) => ({ label, argument, model, models, modelNote })),
    columns: info.columns, conventions, method: info.method, methodPlain: plainMethod(info.method), result, exact, isError, fault,
  };
}
