/**
 * First-order propagation of independent errors into distances, luminosities, magnitudes and sizes
 * (σ_f² = Σ (∂f/∂x_i)² σ_i², the law of propagation of uncertainty for uncorrelated inputs, JCGM
 * 100:2008 (GUM) eq. 10), with the exact redshift derivatives of
 * distanceSlopes.ts. Valid while the errors are small enough for f to be linear across them.
 */
import type { Cosmology } from "../distances/Cosmology.js";
import { angularDiameterDistanceSlopeMpc, luminosityDistanceLogSlope, luminosityDistanceSlopeMpc } from "../distances/distanceSlopes.js";
import { luminosityW, restFrameSpectralLuminosityWHz } from "./photometry.js";
import { requireNonNegative } from "../checks/numberChecks.js";
import { checkSourceRedshift } from "../checks/redshift.js";

/**
 * Error of the luminosity distance from a redshift error: σ_DL = |dD_L/dz| σ_z.
 * @param model the cosmology
 * @param z redshift ≥ 0
 * @param zErr 1σ error of z, ≥ 0
 * @returns Mpc
 * @example luminosityDistanceErrorMpc(Cosmology.fromSpec("EDS"), 1, 0.01) // 55.371 (D_H (2 − 1/√2) × 0.01)
 */
export function luminosityDistanceErrorMpc(model: Cosmology, z: number, zErr: number): number {
  requireNonNegative("z_err", zErr);
  return Math.abs(luminosityDistanceSlopeMpc(model, z)) * zErr;
}

/**
 * Error of a bolometric luminosity L = 4π D_L² F: σ_L/L = √((σ_F/F)² + (2 σ_z d ln D_L/dz)²).
 * @param model the cosmology
 * @param fluxWm2 flux [W m⁻²], ≥ 0
 * @param fluxErrWm2 1σ error of the flux [W m⁻²], ≥ 0
 * @param z redshift > 0
 * @param zErr 1σ error of z, ≥ 0
 * @returns W; e.g. a 10% flux error alone gives 10% of L
 */
export function luminosityErrorW(model: Cosmology, fluxWm2: number, fluxErrWm2: number, z: number, zErr: number): number {
  requireNonNegative("flux_err", fluxErrWm2);
  requireNonNegative("z_err", zErr);
  const distanceTerm = 2 * zErr * luminosityDistanceLogSlope(model, z);
  // σ_L = √((4π D_L² σ_F)² + (L · 2σ_z dlnD_L/dz)²): finite also for F = 0
  const area = luminosityW(model, 1, z);
  return Math.hypot(area * fluxErrWm2, area * fluxWm2 * distanceTerm);
}

/**
 * Error of a spectral luminosity L_ν = 4π D_L² S_ν (1+z)^−(1+α):
 * σ_L/L = √((σ_S/S)² + (σ_z (2 d ln D_L/dz − (1+α)/(1+z)))² + (σ_α ln(1+z))²).
 * @param model the cosmology
 * @param fluxDensityWm2Hz flux density [W m⁻² Hz⁻¹], ≥ 0
 * @param fluxDensityErrWm2Hz its 1σ error [W m⁻² Hz⁻¹], ≥ 0
 * @param z redshift > 0
 * @param zErr 1σ error of z, ≥ 0
 * @param alpha spectral index α of S_ν ∝ ν^α
 * @param alphaErr 1σ error of α, ≥ 0
 * @returns W Hz⁻¹; e.g. with σ_z = 0, σ_S = 0: L_ν ln(1+z) σ_α
 */
export function spectralLuminosityErrorWHz(
  model: Cosmology,
  fluxDensityWm2Hz: number,
  fluxDensityErrWm2Hz: number,
  z: number,
  zErr: number,
  alpha: number,
  alphaErr = 0,
): number {
  // L_ν at ν_obs is the rest-frame luminosity at ν_rest = ν_obs: the α term is then ln(1/(1+z)) σ_α
  return restFrameSpectralLuminosityErrorWHz(model, fluxDensityWm2Hz, fluxDensityErrWm2Hz, z, zErr, alpha, alphaErr, 1, 1);
}

/**
 * Error of a rest-frame spectral luminosity at another frequency (restFrameSpectralLuminosityWHz),
 * L = 4π D_L² S_ν (1+z)^−1 (ν_rest / ((1+z) ν_obs))^α:
 * σ_L/L = √((σ_S/S)² + (σ_z (2 d ln D_L/dz − (1+α)/(1+z)))² + (σ_α ln(ν_rest / ((1+z) ν_obs)))²).
 * @param model the cosmology
 * @param fluxDensityWm2Hz flux density observed at ν_obs [W m⁻² Hz⁻¹], ≥ 0
 * @param fluxDensityErrWm2Hz its 1σ error [W m⁻² Hz⁻¹], ≥ 0
 * @param z redshift > 0
 * @param zErr 1σ error of z, ≥ 0
 * @param alpha spectral index α of S_ν ∝ ν^α
 * @param alphaErr 1σ error of α, ≥ 0
 * @param observedHz observed frequency ν_obs [Hz], > 0
 * @param restHz rest-frame frequency ν_rest [Hz], > 0
 * @returns W Hz⁻¹; ν_rest = (1+z) ν_obs makes the α term vanish
 */
export function restFrameSpectralLuminosityErrorWHz(
  model: Cosmology,
  fluxDensityWm2Hz: number,
  fluxDensityErrWm2Hz: number,
  z: number,
  zErr: number,
  alpha: number,
  alphaErr: number,
  observedHz: number,
  restHz: number,
): number {
  requireNonNegative("flux_density_err", fluxDensityErrWm2Hz);
  requireNonNegative("z_err", zErr);
  requireNonNegative("alpha_err", alphaErr);
  const perUnitFlux = restFrameSpectralLuminosityWHz(model, 1, z, alpha, observedHz, restHz);
  const lum = perUnitFlux * fluxDensityWm2Hz;
  const zTerm = zErr * (2 * luminosityDistanceLogSlope(model, z) - (1 + alpha) / (1 + z));
  const alphaTerm = alphaErr * (Math.log(restHz / observedHz) - Math.log1p(z));
  return Math.hypot(perUnitFlux * fluxDensityErrWm2Hz, lum * zTerm, lum * alphaTerm);
}

/**
 * Error of an absolute magnitude M = m − μ(z) − K: σ_M = √(σ_m² + (d(μ + K)/dz σ_z)² + σ_K²), with
 * dμ/dz = (5/ln 10) d ln D_L/dz and, when K is the power-law K-correction of spectral index α
 * (K = −2.5 (1+α) log10(1+z)), dK/dz = −2.5 (1+α) / ((1+z) ln 10); otherwise K is taken as fixed.
 * @param model the cosmology
 * @param mErr 1σ error of the apparent magnitude [mag], ≥ 0
 * @param z redshift > 0
 * @param zErr 1σ error of z, ≥ 0
 * @param kCorrectionErr 1σ error of the K-correction [mag], ≥ 0
 * @param alpha spectral index α of a power-law K-correction; NaN (the default) for a K that does not change with z
 * @returns mag; e.g. σ_z = 0 gives √(σ_m² + σ_K²)
 * @example absoluteMagnitudeErrorMag(Cosmology.fromSpec("EDS"), 0, 1, 0.1) // 0.23963 ((5/ln10) × 0.1 × (1 − 1/(2√2))/(2 − √2), from D_L = 2 D_H (1 + z − √(1+z)))
 */
export function absoluteMagnitudeErrorMag(model: Cosmology, mErr: number, z: number, zErr: number, kCorrectionErr = 0, alpha = Number.NaN): number {
  requireNonNegative("m_err", mErr);
  requireNonNegative("z_err", zErr);
  requireNonNegative("kcorr_err", kCorrectionErr);
  checkSourceRedshift(z);
  const kSlope = Number.isNaN(alpha) ? 0 : (-2.5 * (1 + alpha)) / ((1 + z) * Math.LN10);
  const slope = (5 / Math.LN10) * luminosityDistanceLogSlope(model, z) + kSlope;
  return Math.hypot(mErr, slope * zErr, kCorrectionErr);
}

/**
 * Error of a proper size ℓ = D_A θ: σ_ℓ = √((D_A σ_θ)² + (θ dD_A/dz σ_z)²).
 * @param model the cosmology
 * @param angleRad angle [rad], ≥ 0
 * @param angleErrRad its 1σ error [rad], ≥ 0
 * @param z redshift ≥ 0
 * @param zErr 1σ error of z, ≥ 0
 * @returns Mpc; e.g. at the maximum of D_A the redshift error drops out
 */
export function properSizeErrorMpc(model: Cosmology, angleRad: number, angleErrRad: number, z: number, zErr: number): number {
  requireNonNegative("angle_err", angleErrRad);
  requireNonNegative("z_err", zErr);
  const da = model.angularDiameterDistanceMpc(z);
  return Math.hypot(da * angleErrRad, angleRad * angularDiameterDistanceSlopeMpc(model, z) * zErr);
}
