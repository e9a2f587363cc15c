/**
 * What the cell inspector says each worksheet function computes, for the function's own help example
 * (the `@example` of its declaration in functions/declarations/): the summary, the equation in plain
 * notation, the method (its detail and its plain line), the unit on the Result row and the
 * K-correction convention. The texts are the inspector's (taskpane/functionAbout.ts), pinned here as
 * the interface a reader meets; the units are those the declarations give for each result
 * (`@returns`, or the default of the unit argument that sets it), or the unit the example asks for.
 *
 * Each test loads the inspector and its table afresh (test/freshInspector.ts says why).
 */
import { expect, test } from "vitest";
import { freshInspector } from "./freshInspector.js";
import { blanks, p18Cmb } from "./inspectorSheet.js";

/** The Method row's detail and its plain line, by kind of method (the inspector's texts, taskpane/functionAbout.ts). */
const methods: Record<string, [detail: string, plain: string]> = {
  tables: [
    "quintic Hermite tables in ln(1+z) built once per model from Gauss–Legendre panels of the exact integrals (direct quadrature below z ≈ 0.065 and above z = 1e8); relative error ≤ 1e-10 for z ≤ 1e4, ≤ 1e-8 to 1e7",
    "From tables of the exact integrals: relative error ≤ 1e-10 for z ≤ 10⁴.",
  ],
  closedForm: ["closed form, exact to rounding", "closed form, exact to rounding"], // no shorter line: shown as it is
  growth: [
    "fourth-order Runge–Kutta in ln a from a = 1e-8 (or a power of ten below, while dark energy is above 1e-6 of H²) on the Mészáros growing mode, cubic Hermite between steps; relative error ≤ 1e-7",
    "Solved from the growth equation: relative error ≤ 1e-7.",
  ],
  inverse: ["Newton's method on the same tables, bracketed by bisection; |Δz| ≤ 1e-9 (1+z)", "Solved for z on the same tables as the forward function."],
  errors: [
    "first-order propagation of independent errors with the exact derivative dD_C/dz = D_H/E(z) (no covariances)",
    "First-order error propagation from independent inputs (no covariances).",
  ],
  crossing: [
    "scan upward in ln(1+z), then Newton with the exact derivative on the first crossing",
    "The first redshift at which the source crosses the limit.",
  ],
};
/** Methods of one function each, shown as they are (no shorter line). */
const ownMethods: Record<string, string> = {
  EXTINCTION:
    "the laws' published formulas, exact to rounding (Fitzpatrick 1999: a natural cubic spline through its anchor points); a band's A is the law's value at its effective wavelength",
  INDEX_BETWEEN_ERR: "first-order propagation of independent flux-density errors (bands exact)",
  SOUND_HORIZON: "fit to a Boltzmann code, about 0.02% for the standard Neff; another Neff or Tcmb through the direct integral",
};

/** The convention line the pane adds for a function with a K-correction (taskpane/explainCall.ts). */
const kLine = "K-correction sign: M = m − μ − K, with K = −2.5(1+α)log10(1+z) for S_ν ∝ ν^α.";
/** The functions whose magnitudes carry a K-correction: K itself, M from m and m from M (M = m − μ − K). */
const withK = new Set(["KCORRECTION", "MAG_ABS", "MAG_APP"]);

/**
 * Each function's help example, the unit after the number on the Result row ("" for none; null where
 * the result is text or a table), the kind of its method, its summary and its equation.
 */
type Row = [formula: string, unit: string | null, method: string, summary: string, equation: string];
// prettier-ignore
const rows: Row[] = [
  ["=ZC.DIST_LUM(1)", "Mpc", "tables",
   "luminosity distance",
   "D_L = (1+z)·D_M, D_M = S_k(D_C), D_C = D_H ∫₀^z dz′/E(z′)"],
  ["=ZC.DIST_ANG(1.5)", "Mpc", "tables",
   "angular-diameter distance",
   "D_A = D_M/(1+z)"],
  ['=ZC.DIST_LOS(0.5, , "Mpc/h")', "Mpc/h", "tables",
   "line-of-sight comoving distance",
   "D_C = D_H ∫₀^z dz′/E(z′), D_H = c/H0"],
  ['=ZC.DIST_TRANS(2, "H0=70; Om=0.3; Ok=0.1")', "Mpc", "tables",
   "transverse comoving distance",
   "D_M = D_H/√Ωk · sinh(√Ωk D_C/D_H) (open), D_C (flat), sin form (closed)"],
  ["=ZC.DIST_BETWEEN(0.35, 1.2)", "Mpc", "tables",
   "angular-diameter distance from z1 to z2",
   "D_A12 = S_k(D_C2 − D_C1)/(1+z2)"],
  ['=ZC.DIST_LIGHT(3, , "Gly")', "Gly", "tables",
   "light-travel distance",
   "c·t_L, t_L = t_H ∫₀^z dz′/((1+z′)E(z′))"],
  ["=ZC.MODULUS(0.1)", "mag", "tables",
   "distance modulus",
   "μ = 5·log10(|D_L| / 10 pc)"],
  ["=ZC.LOOKBACK(2)", "Gyr", "tables",
   "look-back time",
   "t_L = t_H ∫₀^z dz′/((1+z′)E(z′)), t_H = 1/H0"],
  ["=ZC.AGE()", "Gyr", "tables",
   "age of the universe at z",
   "t(z) = t_H ∫₀^{1/(1+z)} da/(a·E(a))"],
  ["=ZC.HUBBLE(1)", "km/s/Mpc", "closedForm",
   "Hubble parameter",
   "H(z) = H0·E(z), E² = Ωm-terms + Ωr(1+z)⁴ + Ωk(1+z)² + Ω_DE f_DE(z)"],
  ['=ZC.OMEGA("matter", 1)', "", "closedForm",
   "density parameter of one component",
   "Ω_x(z) = ρ_x(z)/ρ_crit(z)"],
  ["=ZC.CMB_TEMP(1100)", "K", "closedForm",
   "CMB temperature",
   "T(z) = Tcmb·(1+z)"],
  ['=ZC.CRIT_DENSITY(0, , "solMass/Mpc3")', "solMass/Mpc3", "closedForm",
   "critical density",
   "ρ_crit = 3H(z)²/(8πG)"],
  ["=ZC.PROPER_SCALE(0.5)", "kpc/arcsec", "tables",
   "proper size per unit angle",
   "ℓ/θ = D_A"],
  ["=ZC.SIZE(2.5, 0.8)", "kpc", "tables",
   "proper size of an angle",
   "ℓ = D_A·θ (small angle)"],
  ["=ZC.ANGLE(30, 2)", "arcsec", "tables",
   "angle of a proper size",
   "θ = ℓ/D_A (small angle)"],
  ['=ZC.VOLUME(1, , "Gpc3")', "Gpc3", "tables",
   "all-sky comoving volume within z",
   "V_C = 4π ∫₀^{D_C} D_M² dD_C"],
  ["=ZC.VOLUME_SHELL(0.5, 1, 100)", "Mpc3", "tables",
   "comoving volume of a shell over a sky area",
   "(V_C(z2) − V_C(z1))·Ω/(4π)"],
  ["=ZC.VOLUME_ELEMENT(1)", "Mpc3/sr", "tables",
   "comoving volume element",
   "dV/dz/dΩ = D_H·D_M²/E(z)"],
  ['=ZC.REDSHIFT(10, "LOOKBACK")', "", "inverse",
   "redshift at which a quantity takes a value",
   "solves Q(z) = value (lower branch for D_A)"],
  ["=ZC.REDSHIFT_CMB(0.05, 150, 20)", "", "closedForm",
   "redshift in the CMB frame",
   "1+z_cmb = (1+z_helio)/(γ(1 − β·cos θ)), v = 369.82 km/s to (l, b) = (264.021°, 48.253°)"],
  ["=ZC.EXTINCTION(5500, 0.1)", "mag", "own",
   "extinction A_λ of a published law for a colour excess E(B−V)",
   "A_λ = E(B−V)·A_λ/E(B−V) at one wavelength: Fitzpatrick 1999 (FM90 UV, spline in the optical/IR), Cardelli 1989 and O'Donnell 1994 (R_V·a(x) + b(x), x = 1/λ), Calzetti 2000 (k′(λ), a galaxy's own attenuation)"],
  ["=ZC.INDEX_BETWEEN(12.4, 1.4, 3.1, 5)", "", "closedForm",
   "spectral index between two bands",
   "α = ln(S1/S2)/ln(ν1/ν2), S_ν ∝ ν^α"],
  ["=ZC.INDEX_BETWEEN_ERR(12.4, 1.4, 3.1, 5, 0.4, 0.2)", "", "own",
   "1σ error of a two-band spectral index",
   "σ_α = √((σ1/S1)² + (σ2/S2)²)/|ln(ν1/ν2)|"],
  ['=ZC.BRIGHTNESS_TEMP(50, 8.4, 2, 1, , "mJy", , "mas")', "K", "closedForm",
   "brightness temperature of an elliptical Gaussian source (Rayleigh–Jeans)",
   "T_b = (1+z)·S·c²/(2k·ν²·Ω), Ω = π·θ_maj·θ_min/(4 ln 2), FWHM axes"],
  ["=ZC.DIST_LUM_ERR(0.5, 0.002)", "Mpc", "errors",
   "1σ error of the luminosity distance",
   "σ_DL = |dD_L/dz|·σ_z, dD_L/dz = D_M + (1+z)·dD_M/dz"],
  ["=ZC.LUMINOSITY_ERR(1E-13, 5E-15, 0.5, 0.002)", "erg/s", "errors",
   "1σ error of a bolometric luminosity",
   "σ_L/L = √((σ_F/F)² + (2σ_z·dlnD_L/dz)²)"],
  ["=ZC.LUMINOSITY_NU_ERR(0.012, 0.001, 0.8, 0.005, -0.7, 0.1)", "W/Hz", "errors",
   "1σ error of a spectral luminosity",
   "σ_L/L = √((σ_S/S)² + (σ_z(2·dlnD_L/dz − (1+α)/(1+z)))² + (σ_α·ln(1+z))²)"],
  ["=ZC.MAG_ABS_ERR(0.05, 0.3, 0.01)", "mag", "errors",
   "1σ error of an absolute magnitude",
   "σ_M = √(σ_m² + (d(μ + K)/dz·σ_z)² + σ_K²), dK/dz = −2.5(1+α)/((1+z)ln10) when α is given, else 0"],
  ["=ZC.SIZE_ERR(2.5, 0.2, 0.8, 0.01)", "kpc", "errors",
   "1σ error of a proper size",
   "σ_ℓ = √((D_A·σ_θ)² + (θ·dD_A/dz·σ_z)²)"],
  ['=ZC.LUMINOSITY_REST_ERR(2.5, 0.2, 1.1, 0.01, -0.7, 0.1, 3, 1.4, , , "mJy")', "W/Hz", "errors",
   "1σ error of a rest-frame spectral luminosity at another band",
   "σ_L/L = √((σ_S/S)² + (σ_z(2·dlnD_L/dz − (1+α)/(1+z)))² + (σ_α·ln(ν_rest/((1+z)ν_obs)))²)"],
  ["=ZC.REDSHIFT_LIMIT(1E44, 1E-15)", "", "crossing",
   "largest z at which a source stays above a bolometric flux limit",
   "first z with L/(4π·D_L²) = limit"],
  ["=ZC.REDSHIFT_LIMIT_NU(1E24, 0.0001, -0.7)", "", "crossing",
   "largest z at which a power-law source stays above a flux-density limit",
   "first z with L_ν·(1+z)^(1+α)/(4π·D_L²) = limit"],
  ["=ZC.REDSHIFT_LIMIT_MAG(-21, 24.5)", "", "crossing",
   "largest z at which a source stays brighter than a magnitude limit",
   "first z with M + μ(z) + K(z) = m_lim, K = −2.5(1+α)log10(1+z)"],
  ["=ZC.VOLUME_MAX(1.3, 0.05, 3, 50)", "Mpc3", "tables",
   "V_max of the 1/V_max estimator",
   "V_C between max(z_lo, z_min) and min(z_max, z_hi) over the area, 0 if that range is empty"],
  ["=ZC.LUMINOSITY_FUNCTION({42.1;42.4;42.8;43.2}, {3E5;1.2E6;6.8E6;6E7}, {42;42.5;43;43.5})", "(the first of 3×5 values; which one this cell shows is not known here)", "closedForm",
   "binned luminosity function by 1/V_max",
   "Φ = Σ(1/V_max)/Δbin, σ_Φ = √Σ(1/V_max²)/Δbin (Schmidt 1968; Felten 1976)"],
  ["=ZC.CHI2_MODULUS({0.03;0.11;0.27;0.48}, {35.9;38.8;40.9;42.3}, {0.15;0.12;0.13;0.12})", "", "tables",
   "χ² of a Hubble diagram against the model",
   "Σ((μ − μ_model(z) − offset)/σ)²; free offset: Σw(Δ − Δ̄)², Δ̄ the weighted mean of Δ = μ − μ_model (= A − B²/C, Goliath et al. 2001)"],
  ['=ZC.CONVERT(1, "Mpc", "Gly")', "Gly", "closedForm",
   "unit conversion",
   "value × (from / to), FITS unit syntax; h-scaled units with h = H0/100 of the model"],
  ['=ZC.MODEL("P18-BAO", "H0", 73)', null, "closedForm",
   "model spec text: a base model with parameters changed",
   "—"],
  ['=ZC.PARAM("age_today")', "Gyr", "closedForm",
   "a parameter or derived value of the model",
   "—"],
  ["=ZC.PRESETS()", null, "closedForm",
   "the parameter sets: built in, and defined in this workbook",
   "—"],
  ['=ZC.DESCRIBE("W9-ALL")', null, "closedForm",
   "the model in words",
   "—"],
  ["=ZC.VERSION()", null, "closedForm",
   "version and engine conventions",
   "—"],
  ['=ZC.RESCALE(3.2E44, 0.84, "luminosity", "W7-BAO")', "(in the value's own unit)", "tables",
   "a published value restated under another cosmology",
   "× D_M ratio (distance), × D_L² ratio (luminosity), × D_A ratio (size), + 5·log10(D_L,from/D_L,to) (magnitude), × dV/dz ratio (density)"],
  ["=ZC.LUMINOSITY(1E-13, 0.5)", "erg/s", "tables",
   "bolometric luminosity",
   "L = 4π·D_L²·F"],
  ["=ZC.FLUX(1E44, 1)", "erg/s/cm2", "tables",
   "bolometric flux",
   "F = L/(4π·D_L²)"],
  ["=ZC.LUMINOSITY_NU(0.012, 0.8, -0.7)", "W/Hz", "tables",
   "rest-frame spectral luminosity of a power law",
   "L_ν = 4π·D_L²·S_ν·(1+z)^−(1+α), S_ν ∝ ν^α"],
  ["=ZC.KCORRECTION(1, -0.7)", "mag", "closedForm",
   "K-correction of a power law",
   "K = −2.5·(1+α)·log10(1+z)"],
  ["=ZC.MAG_ABS(22.5, 1.2)", "mag", "tables",
   "absolute magnitude",
   "M = m − μ(z) − K"],
  ["=ZC.MAG_APP(-21, 0.3)", "mag", "tables",
   "apparent magnitude",
   "m = M + μ(z) + K"],
  ["=ZC.MAG_AB(0.001)", "mag", "closedForm",
   "AB magnitude",
   "m_AB = −2.5·log10(f_ν / 3630.78 Jy); f_ν = f_λ·λ²/c for a unit per wavelength"],
  ['=ZC.FLUX_AB(20, "uJy")', "uJy", "closedForm",
   "flux density of an AB magnitude",
   "f_ν = 3630.78 Jy · 10^(−m_AB/2.5); f_λ = f_ν·c/λ² for a unit per wavelength"],
  ['=ZC.LUMINOSITY_REST(2.5, 1.1, -0.7, 3, 1.4, , , "mJy")', "W/Hz", "tables",
   "rest-frame spectral luminosity at another band",
   "L_ν(ν_rest) = 4π·D_L²·S_ν(ν_obs)·(1+z)^−(1+α)·(ν_rest/ν_obs)^α; νL_ν in a power unit"],
  ['=ZC.MAG_BOL(1, "Lsun")', "mag", "closedForm",
   "absolute bolometric magnitude",
   "M_bol = −2.5·log10(L / 3.0128e28 W) (IAU 2015 B2)"],
  ['=ZC.LUM_BOL(-21.3, "Lsun")', "Lsun", "closedForm",
   "luminosity of an absolute bolometric magnitude",
   "L = 3.0128e28 W · 10^(−0.4·M_bol) (IAU 2015 B2)"],
  ["=ZC.DIMMING(1)", "mag", "closedForm",
   "surface-brightness dimming",
   "10·log10(1+z) bolometric; 2.5·(3 − α)·log10(1+z) per unit frequency"],
  ['=ZC.SPECTRAL_INDEX(1.9, "photon")', "", "closedForm",
   "a spectral index as α of S_ν ∝ ν^α",
   "photon: α = 1 − Γ; lambda: α = −2 − β (f_λ ∝ λ^β); radio: α = −value"],
  ["=ZC.SURFACE_LUM(24.1, 0.6, 4.81, 0.4)", "Lsun/pc2", "closedForm",
   "intrinsic surface luminosity density",
   "Σ = 10^(−0.4(μ − 10·log10(1+z) − K − M☉ − 21.572)) L☉/pc²"],
  ["=ZC.SURFACE_MAG(100, 0.6, 4.81)", "mag/arcsec2", "closedForm",
   "observed surface brightness of a surface luminosity density",
   "μ = M☉ + 21.572 − 2.5·log10(Σ) + 10·log10(1+z) + K"],
  ['=ZC.COORD_DEG("14:05:12.3", "ra")', "deg", "closedForm",
   "an angle in degrees from sexagesimal text",
   "RA (hours): 15°·(h + m/60 + s/3600); Dec: ±(d + m/60 + s/3600)°; a number stays degrees"],
  ['=ZC.COORD_TEXT(-3.3625, "dec")', null, "closedForm",
   "sexagesimal text of an angle in degrees",
   "RA: (degrees/15) as HH:MM:SS.ss; Dec: ±DD:MM:SS.s; rounded once on the last digit, then carried"],
  ['=ZC.SEPARATION("14:05:12.3", "-03:21:45", "14:05:12.4", "-03:21:46")', "arcsec", "closedForm",
   "angular separation of two positions (great circle)",
   "θ = atan2(√((cos δ2·sin Δα)² + (cos δ1·sin δ2 − sin δ1·cos δ2·cos Δα)²), sin δ1·sin δ2 + cos δ1·cos δ2·cos Δα) (Vincenty)"],
  ['=ZC.COORD_CONVERT("14:05:12.3", "-03:21:45", "equatorial", "galactic", "lat")', "deg", "closedForm",
   "a position turned into another sky frame",
   "r_to = R_to·R_fromᵀ·r_from; galactic: Hipparcos A_G (ESA 1997); supergalactic: pole (l, b) = (47.37°, 6.32°), origin l = 137.37°; ecliptic: R_x(ε0 = 84381.406″, IAU 2006)"],
  ["=ZC.DIST_HUBBLE(0.51)", "Mpc", "closedForm",
   "Hubble distance at z (radial BAO distance)",
   "D_H(z) = c/H(z)"],
  ["=ZC.DIST_VOLUME(0.51)", "Mpc", "tables",
   "volume-averaged distance (isotropic BAO distance)",
   "D_V = [z·D_M²·c/H(z)]^(1/3) (Eisenstein et al. 2005)"],
  ["=ZC.SOUND_HORIZON()", "Mpc", "own",
   "sound horizon at the drag epoch",
   "r_d = 55.154·exp(−72.3(ω_ν + 0.0006)²)/(ω_cb^0.25351·ω_b^0.12807) Mpc (Aubourg et al. 2015 eq. 16), × ∫c_s dz/H of the model over that with Neff = 3.046, Tcmb = 2.7255 K (z_d moved as 1/Tcmb)"],
  ["=ZC.SIGMA_CRIT(0.35, 1.2)", "Msun/pc2", "tables",
   "critical surface density of a thin lens",
   "Σ_cr = c²·D_s/(4πG·D_l·D_ls), angular-diameter distances, per physical area; comoving: Σ_cr/(1+z_l)²"],
  ['=ZC.OVERDENSITY(0.3, "vir")', "", "closedForm",
   "overdensity of a halo definition relative to ρ_crit(z)",
   "Δ = N (Nc), N·Ωm(z) (Nm), 18π² + 82x − 39x², x = Ωm(z) − 1 (vir, Bryan & Norman 1998)"],
  ['=ZC.HALO_RADIUS(2E14, 0.3, "500c")', "kpc", "closedForm",
   "halo radius at mean density Δ·ρ_crit(z)",
   "R = (3M/(4π·Δ·ρ_crit(z)))^(1/3)"],
  ['=ZC.HALO_MASS(1200, 0.3, "200m")', "Msun", "closedForm",
   "halo mass within a radius at mean density Δ·ρ_crit(z)",
   "M = (4π/3)·Δ·ρ_crit(z)·R³"],
  ["=ZC.GROWTH(1)", "", "growth",
   "linear growth factor D(z)/D(0)",
   "D″ + (2 + ½·dlnE²/dlna)·D′ − (3/2)·Ω_s(a)·D = 0 in ln a; Ω_s: CDM + baryons (neutrinos \"smooth\") or + ρ_ν − 3P_ν (\"clustering\")"],
  ["=ZC.GROWTH_RATE(0.5)", "", "growth",
   "linear growth rate f = dlnD/dlna",
   "f = D′/D from the growth equation"],
  ["=ZC.VELOCITY(0.01)", "km/s", "closedForm",
   "the velocity of a redshift in a Doppler convention",
   "optical v = cz; radio v = cz/(1+z); relativistic v = c((1+z)² − 1)/((1+z)² + 1)"],
  ["=ZC.Z_FROM_VELOCITY(4500)", "", "closedForm",
   "the redshift of a velocity in a Doppler convention",
   "optical z = v/c; radio z = v/(c − v); relativistic 1+z = √((c + v)/(c − v))"],
  ["=ZC.Z_COMBINE(0.1, 0.001)", "", "closedForm",
   "two redshifts composed",
   "1+z = (1+z1)(1+z2)"],
  ["=ZC.VELOCITY_PECULIAR(0.101, 0.1)", "km/s", "closedForm",
   "peculiar velocity from observed and cosmological redshifts",
   "v_pec = c(z_obs − z_cosmo)/(1 + z_cosmo) (Davis & Scrimgeour 2014)"],
  ['=ZC.REST_FRAME(7200, 0.1, "wavelength")', "(in the value's own unit)", "closedForm",
   "an observed value in the source's rest frame",
   "λ/(1+z), ν·(1+z), Δt/(1+z), W/(1+z)"],
  ['=ZC.OBSERVED_FRAME(1.4, 0.05, "frequency", "GHz")', "GHz", "closedForm",
   "a rest-frame value as observed",
   "λ·(1+z), ν/(1+z), Δt·(1+z), W·(1+z)"],
];

test("every worksheet function has the inspector's lines, and no line names a function that does not exist", async () => {
  const { about, definitions } = await freshInspector();
  expect(Object.keys(about).sort()).toEqual(Object.keys(definitions).sort());
  // each has its help example here
  expect(rows.map(([formula]) => /^=ZC\.(\w+)\(/.exec(formula)![1]).sort()).toEqual(Object.keys(definitions).sort());
});

test("for each function's help example the pane shows its summary, equation, method, the unit of the result and the K-correction convention", async () => {
  const { explainFormula } = await freshInspector();
  for (const [formula, unit, method, summary, equation] of rows) {
    const [call] = await explainFormula(formula, blanks, p18Cmb);
    const name = call.name.slice(3);
    expect({ formula, summary: call.summary, equation: call.equation }).toEqual({ formula, summary, equation });
    const [detail, plain] = method === "own" ? [ownMethods[name], ownMethods[name]] : methods[method];
    expect({ formula, method: call.method, methodPlain: call.methodPlain }).toEqual({ formula, method: detail, methodPlain: plain });
    expect(call.isError, `${formula}: ${call.result}`).toBe(false);
    if (unit !== null) {
      // the number as the pane shows it (at most 6 significant digits), then the unit
      const shown = /^(-?[\d.]+(?:e[+-]\d+)?)(?: (.+))?$/.exec(call.result);
      expect({ formula, unit: shown?.[2] ?? (shown ? "" : call.result) }).toEqual({ formula, unit });
    }
    expect({ formula, k: call.conventions.includes(kLine) }).toEqual({ formula, k: withK.has(name) });
  }
});
