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
import { evaluate, type Cell } from "../functions/evaluate.js";
import { modelFor } from "../functions/modelCache.js";
import { resolvedSpec } from "../functions/workbookModels.js";
import { formatValue } from "../functions/messages.js";
import { columnNumber, splitAddress } from "./cellAddress.js";
import { findCalls, parseArrayConstant, type FormulaCall, type Token } from "./formulaCalls.js";

/** One explained call. */
export interface CallExplanation {
  name: string;
  summary: string;
  equation: string;
  args: { name: string; text: string; value: string; unit?: string }[];
  model?: { spec: string; source: "given in the formula" | "the workbook's model"; description: string };
  conventions: string[];
  method: string;
  /** The method in one plain line; `method` holds the detail. */
  methodPlain: string;
  /** The result as a person reads it: at most 6 significant digits, with the unit. */
  result: string;
  /** The result's full value (every digit Excel holds), when it is a number. */
  exact?: string;
  isError: boolean;
  /** For an error: the argument its message is about (its formula text and value), and how to fix it. */
  fault?: { argument?: string; text?: string; value?: string; fix: string };
}

/** Reads the values behind a reference written in a formula (e.g. "B2", "'Sheet 2'!A1:A9"). */
export type ReferenceReader = (reference: string) => Promise<unknown[][]>;

const tabled =
  "quintic Hermite tables in ln(1+z) built once per model from Gauss–Legendre panels of the exact integrals " +
  "(direct quadrature below z ≈ 0.065 and above z = 1e8); relative error ≤ 1e-10 for z ≤ 1e4, ≤ 1e-8 to 1e7";
const closedForm = "closed form, exact to rounding";
const growthMethod = "fourth-order Runge–Kutta in ln a from a = 1e-5 on the Mészáros growing mode, cubic Hermite between steps; relative error ≤ 1e-7";
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

/** What each function computes, in plain notation, and how. */
const about: Record<string, { summary: string; equation: string; method: string; kcorr?: boolean }> = {
  DIST_LUM: { summary: "luminosity distance", equation: "D_L = (1+z)·D_M, D_M = S_k(D_C), D_C = D_H ∫₀^z dz′/E(z′)", method: tabled },
  DIST_ANG: { summary: "angular-diameter distance", equation: "D_A = D_M/(1+z)", method: tabled },
  DIST_LOS: { summary: "line-of-sight comoving distance", equation: "D_C = D_H ∫₀^z dz′/E(z′), D_H = c/H0", method: tabled },
  DIST_TRANS: { summary: "transverse comoving distance", equation: "D_M = D_H/√Ωk · sinh(√Ωk D_C/D_H) (open), D_C (flat), sin form (closed)", method: tabled },
  DIST_BETWEEN: { summary: "angular-diameter distance from z1 to z2", equation: "D_A12 = S_k(D_C2 − D_C1)/(1+z2)", method: tabled },
  DIST_LIGHT: { summary: "light-travel distance", equation: "c·t_L, t_L = t_H ∫₀^z dz′/((1+z′)E(z′))", method: tabled },
  MODULUS: { summary: "distance modulus", equation: "μ = 5·log10(|D_L| / 10 pc)", method: tabled },
  LOOKBACK: { summary: "look-back time", equation: "t_L = t_H ∫₀^z dz′/((1+z′)E(z′)), t_H = 1/H0", method: tabled },
  AGE: { summary: "age of the universe at z", equation: "t(z) = t_H ∫₀^{1/(1+z)} da/(a·E(a))", method: tabled },
  HUBBLE: { summary: "Hubble parameter", equation: "H(z) = H0·E(z), E² = Ωm-terms + Ωr(1+z)⁴ + Ωk(1+z)² + Ω_DE f_DE(z)", method: closedForm },
  OMEGA: { summary: "density parameter of one component", equation: "Ω_x(z) = ρ_x(z)/ρ_crit(z)", method: closedForm },
  CMB_TEMP: { summary: "CMB temperature", equation: "T(z) = Tcmb·(1+z)", method: closedForm },
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
  KCORRECTION: { summary: "K-correction of a power law", equation: "K = −2.5·(1+α)·log10(1+z)", method: closedForm, kcorr: true },
  MAG_ABS: { summary: "absolute magnitude", equation: "M = m − μ(z) − K", method: tabled, kcorr: true },
  MAG_APP: { summary: "apparent magnitude", equation: "m = M + μ(z) + K", method: tabled, kcorr: true },
  MAG_AB: { summary: "AB magnitude", equation: "m_AB = −2.5·log10(f_ν / 3630.78 Jy)", method: closedForm },
  FLUX_AB: { summary: "flux density of an AB magnitude", equation: "f_ν = 3630.78 Jy · 10^(−m_AB/2.5)", method: closedForm },
  DIST_LUM_ERR: { summary: "1σ error of the luminosity distance", equation: "σ_DL = |dD_L/dz|·σ_z, dD_L/dz = D_M + (1+z)·dD_M/dz", method: firstOrder },
  LUMINOSITY_ERR: { summary: "1σ error of a bolometric luminosity", equation: "σ_L/L = √((σ_F/F)² + (2σ_z·dlnD_L/dz)²)", method: firstOrder },
  LUMINOSITY_NU_ERR: { summary: "1σ error of a spectral luminosity", equation: "σ_L/L = √((σ_S/S)² + (σ_z(2·dlnD_L/dz − (1+α)/(1+z)))² + (σ_α·ln(1+z))²)", method: firstOrder },
  MAG_ABS_ERR: { summary: "1σ error of an absolute magnitude", equation: "σ_M = √(σ_m² + (d(μ + K)/dz·σ_z)² + σ_K²), dK/dz = −2.5(1+α)/((1+z)ln10) when α is given, else 0", method: firstOrder },
  LUMINOSITY_REST_ERR: { summary: "1σ error of a rest-frame spectral luminosity at another band", equation: "σ_L/L = √((σ_S/S)² + (σ_z(2·dlnD_L/dz − (1+α)/(1+z)))² + (σ_α·ln(ν_rest/((1+z)ν_obs)))²)", method: firstOrder },
  SIZE_ERR: { summary: "1σ error of a proper size", equation: "σ_ℓ = √((D_A·σ_θ)² + (θ·dD_A/dz·σ_z)²)", method: firstOrder },
  LUMINOSITY_REST: { summary: "rest-frame spectral luminosity at another band", equation: "L_ν(ν_rest) = 4π·D_L²·S_ν(ν_obs)·(1+z)^−(1+α)·(ν_rest/ν_obs)^α; νL_ν in a power unit", method: tabled },
  MAG_BOL: { summary: "absolute bolometric magnitude", equation: "M_bol = −2.5·log10(L / 3.0128e28 W) (IAU 2015 B2)", method: closedForm },
  LUM_BOL: { summary: "luminosity of an absolute bolometric magnitude", equation: "L = 3.0128e28 W · 10^(−0.4·M_bol) (IAU 2015 B2)", method: closedForm },
  REDSHIFT_LIMIT: { summary: "largest z at which a source stays above a bolometric flux limit", equation: "first z with L/(4π·D_L²) = limit", method: firstCrossing },
  REDSHIFT_LIMIT_NU: { summary: "largest z at which a power-law source stays above a flux-density limit", equation: "first z with L_ν·(1+z)^(1+α)/(4π·D_L²) = limit", method: firstCrossing },
  REDSHIFT_LIMIT_MAG: { summary: "largest z at which a source stays brighter than a magnitude limit", equation: "first z with M + μ(z) + K(z) = m_lim, K = −2.5(1+α)log10(1+z)", method: firstCrossing },
  VOLUME_MAX: { summary: "V_max of the 1/V_max estimator", equation: "V_C between max(z_lo, z_min) and min(z_max, z_hi) over the area, 0 if that range is empty", method: tabled },
  LUMINOSITY_FUNCTION: { summary: "binned luminosity function by 1/V_max", equation: "Φ = Σ(1/V_max)/Δbin, σ_Φ = √Σ(1/V_max²)/Δbin (Schmidt 1968; Felten 1976)", method: closedForm },
  CHI2_MODULUS: { summary: "χ² of a Hubble diagram against the model", equation: "Σ((μ − μ_model(z) − offset)/σ)²; free offset: A − B²/C (Goliath et al. 2001)", method: tabled },
  REDSHIFT_CMB: { summary: "redshift in the CMB frame", equation: "1+z_cmb = (1+z_helio)/(γ(1 − β·cos θ)), v = 369.82 km/s to (l, b) = (264.021°, 48.253°)", method: closedForm },
  SPECTRAL_INDEX: { summary: "a spectral index as α of S_ν ∝ ν^α", equation: "photon: α = 1 − Γ; lambda: α = −2 − β (f_λ ∝ λ^β); radio: α = −value", method: closedForm },
  DIMMING: { summary: "surface-brightness dimming", equation: "10·log10(1+z) bolometric; 2.5·(3 − α)·log10(1+z) per unit frequency", method: closedForm },
  DIST_HUBBLE: { summary: "Hubble distance at z (radial BAO distance)", equation: "D_H(z) = c/H(z)", method: closedForm },
  DIST_VOLUME: { summary: "volume-averaged distance (isotropic BAO distance)", equation: "D_V = [z·D_M²·c/H(z)]^(1/3) (Eisenstein et al. 2005)", method: tabled },
  SOUND_HORIZON: { summary: "sound horizon at the drag epoch", equation: "r_d = 55.154·exp(−72.3(ω_ν + 0.0006)²)/(ω_cb^0.25351·ω_b^0.12807) Mpc (Aubourg et al. 2015 eq. 16)", method: "fit to a Boltzmann code, about 0.02% for the standard Neff" },
  SIGMA_CRIT: { summary: "critical surface density of a thin lens", equation: "Σ_cr = c²·D_s/(4πG·D_l·D_ls), angular-diameter distances", method: tabled },
  OVERDENSITY: { summary: "overdensity of a halo definition relative to ρ_crit(z)", equation: "Δ = N (Nc), N·Ωm(z) (Nm), 18π² + 82x − 39x², x = Ωm(z) − 1 (vir, Bryan & Norman 1998)", method: closedForm },
  HALO_RADIUS: { summary: "halo radius at mean density Δ·ρ_crit(z)", equation: "R = (3M/(4π·Δ·ρ_crit(z)))^(1/3)", method: closedForm },
  HALO_MASS: { summary: "halo mass within a radius at mean density Δ·ρ_crit(z)", equation: "M = (4π/3)·Δ·ρ_crit(z)·R³", method: closedForm },
  GROWTH: { summary: "linear growth factor D(z)/D(0) of cold matter", equation: "D″ + (2 + ½·dlnE²/dlna)·D′ − (3/2)·Ωm(a)·D = 0 in ln a", method: growthMethod },
  GROWTH_RATE: { summary: "linear growth rate f = dlnD/dlna", equation: "f = D′/D from the growth equation", method: growthMethod },
  RESCALE: { summary: "a published value restated under another cosmology", equation: "× D_M ratio (distance), × D_L² ratio (luminosity), × D_A ratio (size), + 5·log10(D_L,from/D_L,to) (magnitude), × dV/dz ratio (density)", method: tabled },
  SURFACE_LUM: { summary: "intrinsic surface luminosity density", equation: "Σ = 10^(−0.4(μ − 10·log10(1+z) − K − M☉ − 21.572)) L☉/pc²", method: closedForm },
  SURFACE_MAG: { summary: "observed surface brightness of a surface luminosity density", equation: "μ = M☉ + 21.572 − 2.5·log10(Σ) + 10·log10(1+z) + K", method: closedForm },
  COORD_DEG: { summary: "an angle in degrees from sexagesimal text", equation: "RA (hours): 15°·(h + m/60 + s/3600); Dec: ±(d + m/60 + s/3600)°; a number stays degrees", method: closedForm },
  COORD_TEXT: { summary: "sexagesimal text of an angle in degrees", equation: "RA: (degrees/15) as HH:MM:SS.ss; Dec: ±DD:MM:SS.s; rounded once on the last digit, then carried", method: closedForm },
  SEPARATION: { summary: "angular separation of two positions (great circle)", equation: "θ = atan2(√((cos δ2·sin Δα)² + (cos δ1·sin δ2 − sin δ1·cos δ2·cos Δα)²), sin δ1·sin δ2 + cos δ1·cos δ2·cos Δα) (Vincenty)", method: closedForm },
  COORD_CONVERT: { summary: "a position turned into another sky frame", equation: "r_to = R_to·R_fromᵀ·r_from; galactic: Hipparcos A_G (ESA 1997); supergalactic: pole (l, b) = (47.37°, 6.32°), origin l = 137.37°; ecliptic: R_x(ε0 = 84381.406″, IAU 2006)", method: closedForm },
  VELOCITY: { summary: "the velocity of a redshift in a Doppler convention", equation: "optical v = cz; radio v = cz/(1+z); relativistic v = c((1+z)² − 1)/((1+z)² + 1)", method: closedForm },
  Z_FROM_VELOCITY: { summary: "the redshift of a velocity in a Doppler convention", equation: "optical z = v/c; radio z = v/(c − v); relativistic 1+z = √((c + v)/(c − v))", method: closedForm },
  Z_COMBINE: { summary: "two redshifts composed", equation: "1+z = (1+z1)(1+z2)", method: closedForm },
  VELOCITY_PECULIAR: { summary: "peculiar velocity from observed and cosmological redshifts", equation: "v_pec = c(z_obs − z_cosmo)/(1 + z_cosmo) (Davis & Scrimgeour 2014)", method: closedForm },
  REST_FRAME: { summary: "an observed value in the source's rest frame", equation: "λ/(1+z), ν·(1+z), Δt/(1+z), W/(1+z)", method: closedForm },
  OBSERVED_FRAME: { summary: "a rest-frame value as observed", equation: "λ·(1+z), ν/(1+z), Δt·(1+z), W·(1+z)", method: closedForm },
  REDSHIFT: { summary: "redshift at which a quantity takes a value", equation: "solves Q(z) = value (lower branch for D_A)", method: inverse },
  CONVERT: { summary: "unit conversion", equation: "value × (from / to), FITS unit syntax; h-scaled units with h = H0/100 of the model", method: closedForm },
  MODEL: { summary: "model spec text: a base model with parameters changed", equation: "—", method: closedForm },
  PARAM: { summary: "a parameter or derived value of the model", equation: "—", method: closedForm },
  PRESETS: { summary: "the parameter sets: built in, and defined in this workbook", equation: "—", method: closedForm },
  DESCRIBE: { summary: "the model in words", equation: "—", method: closedForm },
  VERSION: { summary: "version and engine conventions", equation: "—", method: closedForm },
};

/** Cells the inspector reads from one reference at most (a whole column is 1,048,576: "Excel specifications and limits", from memory). */
export const inspectorReadLimit = 100_000;

/** How many cells a reference names (A1, A1:C9, A:A, 1:3; a name counts as one cell here). */
function referenceCells(reference: string): number {
  const local = splitAddress(reference.replaceAll("$", "")).address;
  const [a, b = a] = local.split(":");
  const cell = /^([A-Za-z]{1,3})?(\d+)?$/;
  const p = cell.exec(a);
  const q = cell.exec(b);
  if (!p || !q) return 1;
  const rows = p[2] && q[2] ? Math.abs(Number(q[2]) - Number(p[2])) + 1 : 1_048_576;
  const cols = p[1] && q[1] ? Math.abs(columnNumber(q[1]) - columnNumber(p[1])) + 1 : 16_384;
  return rows * cols;
}

/** A value from an argument's tokens, or undefined when only Excel can compute it. */
async function argumentValue(
  tokens: Token[],
  text: string,
  read: ReferenceReader,
  nested: Map<string, Cell>,
): Promise<{ known: boolean; value: unknown; note?: string }> {
  if (tokens.length === 0) return { known: true, value: undefined };
  const only = tokens.length === 1 ? tokens[0] : undefined;
  const negative = tokens.length === 2 && tokens[0].text === "-" && tokens[1].kind === "number";
  if (negative) return { known: true, value: -Number(tokens[1].text.replace("%", "")) * (tokens[1].text.endsWith("%") ? 0.01 : 1) };
  if (!only) return nested.has(text) ? { known: true, value: nested.get(text) } : { known: false, value: undefined };
  switch (only.kind) {
    case "number":
      return { known: true, value: Number(only.text.replace("%", "")) * (only.text.endsWith("%") ? 0.01 : 1) };
    case "string":
      return { known: true, value: only.text.slice(1, -1).replaceAll('""', '"') };
    case "bool":
      return { known: true, value: only.text.toUpperCase() === "TRUE" };
    case "array":
      return { known: true, value: parseArrayConstant(only.text) };
    case "ref":
    case "name": {
      const cells = referenceCells(only.text);
      if (cells > inspectorReadLimit) return { known: false, value: undefined, note: `a range of ${cells.toLocaleString("en-US")} cells, not read (the inspector reads at most ${inspectorReadLimit.toLocaleString("en-US")})` };
      return { known: true, value: await read(only.text) };
    }
    default:
      return { known: false, value: undefined };
  }
}

function showValue(value: unknown): string {
  if (value === undefined) return "omitted";
  if (value instanceof CellError) return `${value.excelText} (${value.message})`;
  if (Array.isArray(value)) {
    const rows = value.length;
    const cols = (value[0] as unknown[])?.length ?? 0;
    if (rows === 1 && cols === 1) return showValue((value as unknown[][])[0][0]);
    return `range ${rows}×${cols}, first ${showValue((value as unknown[][])[0][0])}`;
  }
  if (value === "" || value === null) return "blank";
  if (typeof value === "string") return `"${value}"`;
  return String(value);
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

/**
 * Explains every ZC call in a formula.
 * @param formula the cell's formula
 * @param readReference reads the values of a reference
 * @param active the workbook's active model
 * @param cellValue the value Excel shows in the cell (used when an argument only Excel can compute)
 */
export async function explainFormula(
  formula: string,
  readReference: ReferenceReader,
  active: ActiveModelSetting,
  cellValue?: unknown,
): Promise<CallExplanation[]> {
  const calls = findCalls(formula).filter((c) => c.name.startsWith("ZC.") && definitions[c.name.slice(3)]);
  const nested = new Map<string, Cell>();
  const readOnce = new Map<string, Promise<unknown[][]>>(); // a reference named by several calls is read once
  const read: ReferenceReader = (reference) => {
    let values = readOnce.get(reference);
    if (!values) readOnce.set(reference, (values = readReference(reference)));
    return values;
  };
  const explanations: CallExplanation[] = [];
  // innermost first, so that a nested call's value is known to its caller
  for (const call of [...calls].sort((a, b) => b.depth - a.depth)) {
    explanations.push(await explainCall(call, read, active, nested, cellValue));
  }
  return explanations.reverse();
}

async function explainCall(
  call: FormulaCall,
  read: ReferenceReader,
  active: ActiveModelSetting,
  nested: Map<string, Cell>,
  cellValue: unknown,
): Promise<CallExplanation> {
  const short = call.name.slice(3);
  const def = definitions[short];
  const info = about[short];
  const raw: unknown[] = [];
  let allKnown = true;
  const args: CallExplanation["args"] = [];
  for (let i = 0; i < def.args.length; i++) {
    const spec = def.args[i];
    const text = call.args[i] ?? "";
    const { known, value, note } = await argumentValue(call.argTokens[i] ?? [], text, read, nested);
    allKnown &&= known;
    raw.push(value);
    const unitSpec = def.args.find((a) => a.kind === "unit" && (typeof a.applies === "string" ? [a.applies] : a.applies).includes(spec.name));
    const unit = unitSpec?.kind === "unit" ? unitSpec.default : undefined;
    let shown = known ? showValue(value) : (note ?? "computed by Excel");
    if (value === undefined || value === "") {
      if (spec.kind === "unit") shown = `default "${spec.default}"`;
      else if (spec.kind === "model") shown = "the workbook's model";
      else if (spec.kind === "number" && spec.default !== undefined) shown = Number.isNaN(spec.default) ? "not given" : `default ${spec.default}`;
    }
    args.push({ name: spec.name, text: text || "(omitted)", value: shown, unit });
  }
  const modelIndex = def.args.findIndex((a) => a.kind === "model");
  let model: CallExplanation["model"];
  let conventions: string[] = [];
  if (modelIndex >= 0) {
    const given = raw[modelIndex];
    const text = Array.isArray(given) && given.length === 1 && given[0].length === 1 ? given[0][0] : given;
    const explicit = typeof text === "string" && text.trim() !== "";
    const spec = explicit ? (text as string) : active.spec;
    try {
      const m = modelFor(resolvedSpec(spec, active.models)); // the functions' own cache: no model is built twice
      model = { spec: m.spec, source: explicit ? "given in the formula" : "the workbook's model", description: describeModel(m) };
      conventions = modelConventions(m);
    } catch (e) {
      model = { spec, source: explicit ? "given in the formula" : "the workbook's model", description: (e as Error).message };
    }
  }
  if (info.kcorr) conventions.push("K-correction sign: M = m − μ − K, with K = −2.5(1+α)log10(1+z) for S_ν ∝ ν^α.");

  let result: string;
  let exact: string | undefined;
  let isError = false;
  let fault: CallExplanation["fault"];
  if (allKnown) {
    const cells = evaluate(def, raw, active);
    const first = cells[0][0];
    nested.set(call.text, first);
    if (first instanceof CellError) {
      isError = true;
      result = `${first.excelText} — ${first.message}`;
      const advice = adviseOnError(def, first.kind, first.message);
      const at = args.find((a) => a.name === advice.argument);
      fault = { ...advice, text: at?.text, value: at?.value };
    } else {
      const resultUnit = def.args.find((a) => a.kind === "unit" && a.applies === "result");
      const unitIndex = resultUnit ? def.args.indexOf(resultUnit) : -1;
      const unitText = unitIndex >= 0 && typeof raw[unitIndex] === "string" && raw[unitIndex] ? (raw[unitIndex] as string) : resultUnit?.kind === "unit" ? resultUnit.default : "";
      const size = cells.length * cells[0].length;
      const shown = typeof first === "number" ? formatValue(first) : showValue(first);
      result = `${size > 1 ? `${cells.length}×${cells[0].length} values, first ` : ""}${shown}${unitText ? ` ${unitText}` : ""}`;
      if (typeof first === "number" && shown !== String(first)) exact = `${String(first)}${unitText ? ` ${unitText}` : ""}`;
    }
  } else {
    result = `${showValue(cellValue)} (as Excel shows it; an argument is computed by Excel)`;
    isError = typeof cellValue === "string" && cellValue.startsWith("#");
    const kind = shownErrorKind(cellValue);
    if (kind) fault = adviseOnError(def, kind, "");
  }
  return { name: call.name, summary: info.summary, equation: info.equation, args, model, conventions, method: info.method, methodPlain: plainMethod(info.method), result, exact, isError, fault };
}
