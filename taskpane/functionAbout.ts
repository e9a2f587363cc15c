/**
 * What each worksheet function computes, for the cell inspector: its summary, its equation in plain
 * notation, its numerical method (with a one-line plain version) and its result's unit where no
 * unit argument sets it.
 */
import { choiceKey } from "../functions/readArguments.js";

const tabled =
  "quintic Hermite tables in ln(1+z) built once per model from Gauss–Legendre panels of the exact integrals " +
  "(direct quadrature below z ≈ 0.065 and above z = 1e8); relative error ≤ 1e-10 for z ≤ 1e4, ≤ 1e-8 to 1e7";
const closedForm = "closed form, exact to rounding";
const growthMethod = "fourth-order Runge–Kutta in ln a from a = 1e-8 (or a power of ten below, while dark energy is above 1e-6 of H²) on the Mészáros growing mode, cubic Hermite between steps; relative error ≤ 1e-7";
const inverse = "Newton's method on the same tables, bracketed by bisection; |Δz| ≤ 1e-9 (1+z)";
const firstOrder = "first-order propagation of independent errors with the exact derivative dD_C/dz = D_H/E(z) (no covariances)";
const firstCrossing = "scan upward in ln(1+z), then Newton with the exact derivative on the first crossing";

/** The method in one plain line (the detail stays one click away in the pane). */
export function plainMethod(method: string): string {
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
export type ResultUnit = string | ((text: (name: string) => string | undefined) => string | undefined);
/** A value that keeps the unit it was given in (REST_FRAME, RESCALE): that unit, or words saying so. */
const ownUnit = (text: (name: string) => string | undefined) => text("unit") ?? "(in the value's own unit)";
/** ZC.PARAM's values that have a unit. */
const parameterUnits: Record<string, string> = { H0: "km/s/Mpc", Tcmb: "K", mnu: "eV", age_today: "Gyr", hubble_time: "Gyr", hubble_distance: "Mpc" };
/** The unit of ZC.PARAM's value `name`, compared as the function compares it ("tcmb", "Hubble distance" and "hubble-distance" name Tcmb and hubble_distance). */
const parameterUnit = (name: string | undefined) =>
  name === undefined ? undefined : Object.entries(parameterUnits).find(([key]) => choiceKey(key) === choiceKey(name))?.[1];

/** What each function computes, in plain notation, and how. */
export const about: Record<string, { summary: string; equation: string; method: string; kcorr?: boolean; unit?: ResultUnit; columns?: string[] }> = {
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
  RESCALE: { summary: "a published value restated under another cosmology", equation: "× D_M ratio (distance), × D_L² ratio (luminosity), × D_A ratio (size), + 5·log10(D_L,from/D_L,to) (magnitude), × dV/dz ratio (density)", method: tabled, unit: (text) => (choiceKey(text("quantity") ?? "") === "magnitude" ? "mag" : ownUnit(text)) },
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
  PARAM: { summary: "a parameter or derived value of the model", equation: "—", method: closedForm, unit: (text) => parameterUnit(text("name")) },
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
