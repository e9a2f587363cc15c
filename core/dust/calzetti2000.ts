/**
 * The attenuation curve of starburst galaxies of Calzetti et al. (2000, ApJ 533, 682, eq. 4): a
 * galaxy's own dust, stars and dust mixed, not a screen in front of one star. With λ in µm,
 *
 *   k′(λ) = 2.659 (−2.156 + 1.509/λ − 0.198/λ² + 0.011/λ³) + R′_V   for 0.12 µm ≤ λ < 0.63 µm,
 *   k′(λ) = 2.659 (−1.857 + 1.040/λ) + R′_V                       for 0.63 µm ≤ λ ≤ 2.20 µm,
 *
 * and A_λ = k′(λ) E_s(B−V), E_s the colour excess of the stellar continuum; R′_V = 4.05 ± 0.80
 * (Calzetti et al. 2000 eq. 5). R′_V enters only as the additive constant, so it is A_V/E_s(B−V)
 * only approximately (k′ at 5500 Å is R′_V − 0.002). The two pieces differ by 0.025 at 0.63 µm, as
 * the paper prints them; 0.63 µm itself takes the long-wavelength piece.
 */

/** 1/0.63 µm [µm⁻¹]: below this x the long-wavelength piece applies. */
const joinX = 1 / 0.63;

/**
 * k′(λ) = A_λ/E_s(B−V) of the Calzetti et al. (2000) curve at x = 1/λ.
 * @param x inverse wavelength [µm⁻¹], in [1/2.2, 1/0.12] (not checked here: see extinction.ts)
 * @param rv R′_V, > 0 (4.05 in the paper)
 * @returns k′(λ)
 * @example calzettiAttenuationPerEbv(1 / 0.6563, 4.05) // ≈ 3.33 (Hα; the value commonly quoted, from memory)
 * @example calzettiAttenuationPerEbv(1 / 0.4861, 4.05) // ≈ 4.60 (Hβ; the value commonly quoted, from memory)
 */
export function calzettiAttenuationPerEbv(x: number, rv: number): number {
  if (x > joinX) return 2.659 * (-2.156 + x * (1.509 + x * (-0.198 + x * 0.011))) + rv;
  return 2.659 * (-1.857 + 1.04 * x) + rv;
}
