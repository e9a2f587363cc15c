/**
 * Photometry under a cosmology: bolometric luminosity and flux, power-law K-corrections, absolute
 * and apparent magnitudes, AB magnitudes. Fluxes in W m⁻², flux densities in W m⁻² Hz⁻¹ (or Jy where
 * the name says so), luminosities in W and W Hz⁻¹.
 */
import { abMagnitudeOffset, bolometricZeroPointW, megaparsecM } from "../units/constants.js";
import type { Cosmology } from "../distances/Cosmology.js";
import { requireFiniteNumber, requireNonNegative } from "../checks/numberChecks.js";
import { checkRedshift, checkSourceRedshift } from "../checks/redshift.js";

/** 4π D_L² [m²], requiring z > 0 (a source at z = 0 is at zero distance). */
function sphereAreaM2(model: Cosmology, z: number): number {
  checkSourceRedshift(z);
  const dl = model.luminosityDistanceMpc(z) * megaparsecM;
  return 4 * Math.PI * dl * dl;
}

/**
 * Bolometric luminosity from bolometric flux, L = 4π D_L² F (Hogg 1999 eq. 22).
 * @param model the cosmology
 * @param fluxWm2 bolometric flux [W m⁻²], ≥ 0
 * @param z redshift > 0
 * @returns luminosity [W]
 * @example luminosityW(Cosmology.fromSpec("P18-BAO"), 1e-15, 1) // 5.518e38
 */
export function luminosityW(model: Cosmology, fluxWm2: number, z: number): number {
  requireNonNegative("flux", fluxWm2, "W/m2");
  return sphereAreaM2(model, z) * fluxWm2;
}

/**
 * Bolometric flux from luminosity, F = L / (4π D_L²).
 * @param model the cosmology
 * @param luminosity luminosity [W], ≥ 0
 * @param z redshift > 0
 * @returns flux [W m⁻²]
 */
export function fluxWm2(model: Cosmology, luminosity: number, z: number): number {
  requireNonNegative("luminosity", luminosity, "W");
  return luminosity / sphereAreaM2(model, z);
}

/**
 * Rest-frame spectral luminosity at the observed frequency for a power law S_ν ∝ ν^α:
 * L_ν = 4π D_L² S_ν (1+z)^{−(1+α)} (Hogg 1999 eq. 23 with the power-law K-correction).
 * @param model the cosmology
 * @param fluxDensityWm2Hz observed flux density [W m⁻² Hz⁻¹], ≥ 0
 * @param z redshift > 0
 * @param alpha spectral index α of S_ν ∝ ν^α (e.g. −0.7 for optically thin synchrotron)
 * @returns spectral luminosity [W Hz⁻¹]
 */
export function spectralLuminosityWHz(model: Cosmology, fluxDensityWm2Hz: number, z: number, alpha: number): number {
  requireNonNegative("flux density", fluxDensityWm2Hz, "W/m2/Hz");
  requireFiniteNumber("alpha", alpha);
  return sphereAreaM2(model, z) * fluxDensityWm2Hz * (1 + z) ** -(1 + alpha);
}

/**
 * Rest-frame spectral luminosity at another frequency, for a power law S_ν ∝ ν^α through both:
 * L_ν(ν_rest) = 4π D_L² S_ν(ν_obs) (1+z)^−(1+α) (ν_rest/ν_obs)^α (Hogg 1999 eq. 23 with
 * S_ν(ν) = S_ν(ν_obs) (ν/ν_obs)^α).
 * @param model the cosmology
 * @param fluxDensityWm2Hz flux density observed at ν_obs [W m⁻² Hz⁻¹], ≥ 0
 * @param z redshift > 0
 * @param alpha spectral index α
 * @param observedHz observed frequency ν_obs [Hz], > 0
 * @param restHz rest-frame frequency ν_rest [Hz], > 0
 * @returns L_ν at ν_rest [W Hz⁻¹]; ν_rest = (1+z) ν_obs gives 4π D_L² S_ν / (1+z) for every α
 */
export function restFrameSpectralLuminosityWHz(
  model: Cosmology,
  fluxDensityWm2Hz: number,
  z: number,
  alpha: number,
  observedHz: number,
  restHz: number,
): number {
  return spectralLuminosityWHz(model, fluxDensityWm2Hz, z, alpha) * (restHz / observedHz) ** alpha;
}

/**
 * K-correction of a power law S_ν ∝ ν^α: K = −2.5 (1+α) log10(1+z), in the convention M = m − μ − K
 * (Hogg et al. 2002, astro-ph/0210394, eq. 13 for a power law).
 * @param z redshift ≥ 0
 * @param alpha spectral index α
 * @returns K [mag] (α = −1 gives 0 at every z)
 * @example kCorrectionPowerLawMag(1, 0) // -0.75257 (−2.5 log10 2)
 */
export function kCorrectionPowerLawMag(z: number, alpha: number): number {
  checkRedshift(z);
  requireFiniteNumber("alpha", alpha);
  return -2.5 * (1 + alpha) * Math.log10(1 + z);
}

/**
 * Absolute magnitude M = m − μ(z) − K.
 * @param model the cosmology
 * @param apparentMag apparent magnitude m
 * @param z redshift > 0
 * @param kCorrectionMag K-correction K [mag] (0 if none)
 * @returns M [mag]
 */
export function absoluteMagnitude(model: Cosmology, apparentMag: number, z: number, kCorrectionMag = 0): number {
  requireFiniteNumber("m", apparentMag);
  requireFiniteNumber("kcorr", kCorrectionMag);
  checkSourceRedshift(z);
  return apparentMag - model.distanceModulusMag(z) - kCorrectionMag;
}

/**
 * Apparent magnitude m = M + μ(z) + K.
 * @param model the cosmology
 * @param absoluteMag absolute magnitude M
 * @param z redshift > 0
 * @param kCorrectionMag K-correction K [mag] (0 if none)
 * @returns m [mag]
 */
export function apparentMagnitude(model: Cosmology, absoluteMag: number, z: number, kCorrectionMag = 0): number {
  requireFiniteNumber("M", absoluteMag);
  requireFiniteNumber("kcorr", kCorrectionMag);
  checkSourceRedshift(z);
  return absoluteMag + model.distanceModulusMag(z) + kCorrectionMag;
}

/**
 * AB magnitude of a flux density: m_AB = −2.5 log10(f_ν / (erg s⁻¹ cm⁻² Hz⁻¹)) − 48.60
 * (Oke & Gunn 1983); zero point 3630.78 Jy.
 * @param fluxDensityJy flux density [Jy], > 0
 * @returns m_AB [mag]
 * @example abMagnitude(1e-6) // 23.900 (1 µJy)
 * @example abMagnitude(3631) // ≈ -0.0001 (the zero point is 3630.78 Jy)
 */
export function abMagnitude(fluxDensityJy: number): number {
  requireNonNegative("flux density", fluxDensityJy, "Jy");
  if (fluxDensityJy === 0) throw new RangeError("flux density 0 has no magnitude (it would be +∞)");
  return -2.5 * Math.log10(fluxDensityJy * 1e-23) - abMagnitudeOffset;
}

/**
 * Flux density of an AB magnitude, the inverse of `abMagnitude`.
 * @param abMag m_AB [mag]
 * @returns flux density [Jy]
 * @example abFluxDensityJy(23.9) // 1.0000e-6
 */
export function abFluxDensityJy(abMag: number): number {
  requireFiniteNumber("m_ab", abMag);
  return 1e23 * 10 ** (-(abMag + abMagnitudeOffset) / 2.5);
}

/**
 * Absolute bolometric magnitude, M_bol = −2.5 log10(L / L0) with L0 = 3.0128e28 W (IAU 2015 B2).
 * @param luminosity bolometric luminosity [W], > 0
 * @returns M_bol [mag]
 * @example bolometricAbsoluteMagnitude(3.828e26) // 4.74 (the nominal solar luminosity)
 */
export function bolometricAbsoluteMagnitude(luminosity: number): number {
  requireNonNegative("luminosity", luminosity, "W");
  if (luminosity === 0) throw new RangeError("luminosity 0 has no magnitude");
  return -2.5 * Math.log10(luminosity / bolometricZeroPointW);
}

/**
 * Bolometric luminosity of an absolute bolometric magnitude, L = L0 10^(−0.4 M_bol) (IAU 2015 B2).
 * @param absoluteMag M_bol [mag]
 * @returns luminosity [W]
 * @example bolometricLuminosityW(0) // 3.0128e28
 */
export function bolometricLuminosityW(absoluteMag: number): number {
  requireFiniteNumber("M_bol", absoluteMag);
  return bolometricZeroPointW * 10 ** (-0.4 * absoluteMag);
}

/**
 * Tolman dimming of the bolometric surface brightness, Σ_obs = Σ_emit (1+z)⁻⁴, in magnitudes:
 * 10 log10(1+z) (Tolman 1930, PNAS 16, 511; reference from memory).
 * @param z redshift ≥ 0
 * @returns mag
 * @example surfaceBrightnessDimmingMag(1) // 3.0103 (10 log10 2)
 */
export function surfaceBrightnessDimmingMag(z: number): number {
  checkRedshift(z);
  return 10 * Math.log10(1 + z);
}

/**
 * Dimming of the surface brightness per unit frequency at a fixed observed frequency, for a source
 * spectrum S_ν ∝ ν^α: I_ν,obs(ν) = I_ν,emit(ν) (1+z)^(α−3), so 2.5 (3 − α) log10(1+z) mag (the
 * bolometric law at α = −1).
 * @param z redshift ≥ 0
 * @param alpha spectral index α
 * @returns mag
 * @example spectralSurfaceBrightnessDimmingMag(1, 0) // 2.2577 (7.5 log10 2)
 */
export function spectralSurfaceBrightnessDimmingMag(z: number, alpha: number): number {
  checkRedshift(z);
  requireFiniteNumber("alpha", alpha);
  return 2.5 * (3 - alpha) * Math.log10(1 + z);
}
