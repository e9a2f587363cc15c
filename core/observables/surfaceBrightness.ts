/**
 * Surface brightness and surface luminosity density. An observed surface brightness μ [mag arcsec⁻²]
 * is dimmed by (1+z)⁴ (Tolman 1930; 10 log10(1+z) mag) and shifted by the K-correction K, so the
 * rest-frame value is μ − 10 log10(1+z) − K, and Σ [L☉ pc⁻²] = 10^(−0.4 (μ_rest − M☉ − C)), with
 * C = 5 log10(206264.806 / 10) = 21.572 mag, the μ of 1 L☉ pc⁻² at z = 0 (derived: 1 pc at 10 pc
 * subtends 20626.5 arcsec, so 1 arcsec² at 10 pc is (1/20626.5)² pc²). No cosmology enters.
 */
import { requireFiniteNumber } from "../checks/numberChecks.js";
import { checkRedshift } from "../checks/redshift.js";

/** μ of 1 L☉ pc⁻² at z = 0 minus M☉: 5 log10(648000/π / 10) = 21.5721 mag (derived). */
export const surfaceBrightnessOffsetMag = 5 * Math.log10(648_000 / Math.PI / 10);

function dimmingMag(z: number): number {
  checkRedshift(z);
  return 10 * Math.log10(1 + z);
}

/**
 * Intrinsic surface luminosity density from an observed surface brightness.
 * @param muMagArcsec2 observed μ [mag arcsec⁻²]
 * @param z redshift ≥ 0
 * @param sunAbsMag the Sun's absolute magnitude M☉ in the band [mag]
 * @param kCorrectionMag K-correction of the band [mag], default 0
 * @returns Σ [L☉ pc⁻²]
 * @example surfaceLuminosityLsunPc2(4.87 + surfaceBrightnessOffsetMag, 0, 4.87) // 1 (μ = M☉ + 21.572)
 */
export function surfaceLuminosityLsunPc2(muMagArcsec2: number, z: number, sunAbsMag: number, kCorrectionMag = 0): number {
  requireFiniteNumber("mu", muMagArcsec2);
  requireFiniteNumber("sun_abs_mag", sunAbsMag);
  requireFiniteNumber("kcorr", kCorrectionMag);
  const rest = muMagArcsec2 - dimmingMag(z) - kCorrectionMag;
  return 10 ** (-0.4 * (rest - sunAbsMag - surfaceBrightnessOffsetMag));
}

/**
 * The observed surface brightness of an intrinsic surface luminosity density (the inverse).
 * @param sigmaLsunPc2 Σ [L☉ pc⁻²], > 0
 * @param z redshift ≥ 0
 * @param sunAbsMag the Sun's absolute magnitude M☉ in the band [mag]
 * @param kCorrectionMag K-correction of the band [mag], default 0
 * @returns μ [mag arcsec⁻²]
 * @example surfaceMagnitude(1, 1, 4.87, 0) // 29.4524 (26.4421 + 10 log10 2)
 */
export function surfaceMagnitude(sigmaLsunPc2: number, z: number, sunAbsMag: number, kCorrectionMag = 0): number {
  if (!(sigmaLsunPc2 > 0 && sigmaLsunPc2 < Number.POSITIVE_INFINITY)) throw new RangeError(`sigma = ${sigmaLsunPc2} must be > 0 and finite`);
  requireFiniteNumber("sun_abs_mag", sunAbsMag);
  requireFiniteNumber("kcorr", kCorrectionMag);
  return sunAbsMag + surfaceBrightnessOffsetMag - 2.5 * Math.log10(sigmaLsunPc2) + dimmingMag(z) + kCorrectionMag;
}
