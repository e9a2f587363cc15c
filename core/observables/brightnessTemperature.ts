/**
 * Brightness temperature of a source resolved as an elliptical Gaussian, in the Rayleigh–Jeans limit
 * (hν ≪ kT): T_b = S_ν c² / (2 k ν² Ω), with the Gaussian's solid angle Ω = π θ_maj θ_min / (4 ln 2)
 * for full widths at half maximum θ (Wilson, Rohlfs & Hüttemeister, Tools of Radio Astronomy, 5th ed.,
 * 2009, eqs. 8.16 and 8.19, as cited by astropy's brightness_temperature; the Gaussian area is common
 * practice). With a redshift, the rest frame's T_b = (1 + z) × the observed one, ν the observed
 * frequency (surface brightness I_ν/ν³ is conserved, so T_b ∝ I_ν/ν² scales by (1 + z)).
 */
import { requireNonNegative } from "../checks/numberChecks.js";
import { checkRedshift } from "../checks/redshift.js";
import { boltzmannJPerK, speedOfLightMPerS } from "../units/constants.js";

/**
 * T_b = (1 + z) S_ν c² / (2 k ν² Ω), Ω = π θ_maj θ_min / (4 ln 2).
 * @param fluxDensityWm2Hz flux density [W m⁻² Hz⁻¹], ≥ 0
 * @param frequencyHz observed frequency [Hz], > 0
 * @param majorRad FWHM of the major axis [rad], > 0
 * @param minorRad FWHM of the minor axis [rad], > 0 (the order of the axes does not matter)
 * @param z redshift ≥ 0: 0 gives the observed frame
 * @returns T_b [K]
 * @example brightnessTemperatureK(1e-26, 5e9, 15 * Math.PI / 648000, 15 * Math.PI / 648000) // ≈ 217.2659 (1 Jy in a 15″ beam at 5 GHz: astropy's brightness_temperature example)
 */
export function brightnessTemperatureK(fluxDensityWm2Hz: number, frequencyHz: number, majorRad: number, minorRad: number, z = 0): number {
  requireNonNegative("flux_density", fluxDensityWm2Hz, "W/m2/Hz");
  requireNonNegative("frequency", frequencyHz, "Hz", true);
  requireNonNegative("major", majorRad, "rad", true);
  requireNonNegative("minor", minorRad, "rad", true);
  checkRedshift(z);
  const solidAngleSr = (Math.PI * majorRad * minorRad) / (4 * Math.LN2);
  return ((1 + z) * fluxDensityWm2Hz * speedOfLightMPerS * speedOfLightMPerS) / (2 * boltzmannJPerK * frequencyHz * frequencyHz * solidAngleSr);
}
