/**
 * Structure: the distances of BAO measurements, gravitational lensing, halos and clusters.
 * Each function is its JSDoc (read by the metadata plugin into functions.json) plus one line handing
 * the arguments to the shared wrapper; see functions/functions.ts for the conventions of all families.
 */
/* eslint-disable @typescript-eslint/no-explicit-any */
import { definitions as d } from "../definitions.js";
import { callFromSheet } from "../evaluate.js";

/**
 * Hubble distance at z, D_H(z) = c / H(z), the radial BAO distance (D_H/r_d is a ratio of cells); in Mpc unless a unit is given.
 * @customfunction DIST_HUBBLE DIST_HUBBLE
 * @helpurl https://localhost:3000/help.html#DIST_HUBBLE
 * @example =ZC.DIST_HUBBLE(0.51)
 * @param z Redshift, ≥ 0 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [unit] Output unit, default "Mpc" (e.g. "Mpc/h").
 * @returns D_H(z) (Mpc by default).
 */
export function DIST_HUBBLE(z: any[][], model?: any[][], unit?: string): any[][] {
  return callFromSheet(d.DIST_HUBBLE, [z, model, unit]);
}

/**
 * Volume-averaged distance D_V(z) = [z D_M² c/H(z)]^(1/3) (Eisenstein et al. 2005), the isotropic BAO distance; in Mpc unless a unit is given.
 * @customfunction DIST_VOLUME DIST_VOLUME
 * @helpurl https://localhost:3000/help.html#DIST_VOLUME
 * @example =ZC.DIST_VOLUME(0.51)
 * @param z Redshift, ≥ 0 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [unit] Output unit, default "Mpc" (e.g. "Mpc/h").
 * @returns D_V(z) (Mpc by default).
 */
export function DIST_VOLUME(z: any[][], model?: any[][], unit?: string): any[][] {
  return callFromSheet(d.DIST_VOLUME, [z, model, unit]);
}

/**
 * Sound horizon at the drag epoch r_d: the fit of Aubourg et al. 2015 (eq. 16) in ω_b = Ω_b h², ω_cb and ω_ν, made for Neff = 3.046 and Tcmb = 2.7255 K; another Neff (or Tcmb within 2.72–2.73 K) scales it by the direct integral of the sound speed, for another Tcmb to a drag redshift moved as 1/Tcmb (Tcmb = 2.72 K: −0.013%). Needs Ob in the model. r_d follows ω_b and ω_cb, not the fractions: "P18-CMB; H0=73" (same Ωb, Ωm) has r_d 6% smaller. #N/A outside ω_b 0.015–0.03, ω_cb 0.08–0.22, Neff 2–5, Σm_ν ≤ 1 eV. D_M/r_d, D_H/r_d and D_V/r_d are then ratios of cells.
 * @customfunction SOUND_HORIZON SOUND_HORIZON
 * @helpurl https://localhost:3000/help.html#SOUND_HORIZON
 * @example =ZC.SOUND_HORIZON()
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [unit] Output unit, default "Mpc" (e.g. "Mpc/h").
 * @returns r_d (Mpc by default).
 */
export function SOUND_HORIZON(model?: any[][], unit?: string): any[][] {
  return callFromSheet(d.SOUND_HORIZON, [model, unit]);
}

/**
 * Critical surface density of a thin gravitational lens, Σ_cr = c² D_s / (4πG D_l D_ls) (angular-diameter distances; D_ls from lens to source, any curvature): mass per physical area at the lens (the default), or per comoving area, smaller by (1+z_l)² (coordinates "comoving", as weak-lensing ΔΣ profiles in comoving units need); in Msun/pc2 unless a unit is given.
 * @customfunction SIGMA_CRIT SIGMA_CRIT
 * @helpurl https://localhost:3000/help.html#SIGMA_CRIT
 * @example =ZC.SIGMA_CRIT(0.35, 1.2)
 * @param z_lens Lens redshift, > 0 (value or range).
 * @param z_source Source redshift, > z_lens (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [unit] Output unit, default "Msun/pc2" (e.g. "kg/m2", "h Msun/pc2").
 * @param [coordinates] "physical" (blank: per physical pc² at the lens) or "comoving" (per comoving pc², Σ_cr/(1+z_l)²).
 * @returns Σ_cr (Msun/pc2 by default).
 */
export function SIGMA_CRIT(z_lens: any[][], z_source: any[][], model?: any[][], unit?: string, coordinates?: string): any[][] {
  return callFromSheet(d.SIGMA_CRIT, [z_lens, z_source, model, unit, coordinates]);
}

/**
 * Overdensity Δ of a halo definition relative to the critical density at z: "vir" (Bryan & Norman 1998: flat models with Λ, or no dark energy), "200c", "500c", "200m" (200 Ωm(z)), any "<N>c" or "<N>m".
 * @customfunction OVERDENSITY OVERDENSITY
 * @helpurl https://localhost:3000/help.html#OVERDENSITY
 * @example =ZC.OVERDENSITY(0.3, "vir")
 * @param z Redshift, ≥ 0 (value or range).
 * @param definition "vir", "200c", "500c", "200m", or any "<N>c" / "<N>m" (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @returns Δ relative to ρ_crit(z).
 */
export function OVERDENSITY(z: any[][], definition: any[][], model?: any[][]): any[][] {
  return callFromSheet(d.OVERDENSITY, [z, definition, model]);
}

/**
 * Radius within which a halo of mass M has mean density Δ ρ_crit(z): R = (3M / (4π Δ ρ_crit(z)))^(1/3); mass in Msun, radius in kpc unless units are given.
 * @customfunction HALO_RADIUS HALO_RADIUS
 * @helpurl https://localhost:3000/help.html#HALO_RADIUS
 * @example =ZC.HALO_RADIUS(2E14, 0.3, "500c")
 * @param mass Halo mass, ≥ 0, in Msun by default (value or range).
 * @param z Redshift, ≥ 0 (value or range).
 * @param definition "vir", "200c", "500c", "200m", or any "<N>c" / "<N>m" (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [mass_unit] Unit of mass, default "Msun" (e.g. "h-1 Msun").
 * @param [radius_unit] Output unit, default "kpc" (e.g. "Mpc").
 * @returns R_Δ (kpc by default).
 */
export function HALO_RADIUS(mass: any[][], z: any[][], definition: any[][], model?: any[][], mass_unit?: string, radius_unit?: string): any[][] {
  return callFromSheet(d.HALO_RADIUS, [mass, z, definition, model, mass_unit, radius_unit]);
}

/**
 * Mass within a radius at mean density Δ ρ_crit(z): M = (4π/3) Δ ρ_crit(z) R³ (the inverse of ZC.HALO_RADIUS); radius in kpc, mass in Msun unless units are given.
 * @customfunction HALO_MASS HALO_MASS
 * @helpurl https://localhost:3000/help.html#HALO_MASS
 * @example =ZC.HALO_MASS(1200, 0.3, "200m")
 * @param radius Radius, ≥ 0, in kpc by default (value or range).
 * @param z Redshift, ≥ 0 (value or range).
 * @param definition "vir", "200c", "500c", "200m", or any "<N>c" / "<N>m" (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [radius_unit] Unit of radius, default "kpc" (e.g. "Mpc").
 * @param [mass_unit] Output unit, default "Msun" (e.g. "h-1 Msun").
 * @returns M_Δ (Msun by default).
 */
export function HALO_MASS(radius: any[][], z: any[][], definition: any[][], model?: any[][], radius_unit?: string, mass_unit?: string): any[][] {
  return callFromSheet(d.HALO_MASS, [radius, z, definition, model, radius_unit, mass_unit]);
}

/**
 * Linear growth factor D(z)/D(0), sub-horizon and scale-independent, from the growth equation in ln a (any curvature, radiation, w0–wa dark energy). Massive neutrinos: "smooth" (blank) keeps them out of the source, which is then cold matter (CDM + baryons, as ZC.OMEGA("cold")): the growth on scales inside their free-streaming length, where σ8, halos and most fσ8 measurements are; "clustering" adds their ρ − 3P (nothing while relativistic, all of it once slow): the growth on larger scales. Without massive neutrinos both are the same. Baryons count in the source at every z: above z ≈ 1000, before the drag epoch, when they are held by the photons and do not cluster, the value is the formal solution of this equation, not the growth of the coupled baryon–photon universe. #NUM! with the reason when dark energy does not fade into the past fast enough for matter and radiation to dominate early on: w0 + wa above about 0.22 with radiation (P18-CMB's densities), above about −0.07 without (Tcmb = 0).
 * @customfunction GROWTH GROWTH
 * @helpurl https://localhost:3000/help.html#GROWTH
 * @example =ZC.GROWTH(1)
 * @param z Redshift, 0 … 99999 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [neutrinos] "smooth" (blank: massive neutrinos do not cluster, small scales) or "clustering" (they cluster once non-relativistic, large scales).
 * @returns D(z)/D(0).
 */
export function GROWTH(z: any[][], model?: any[][], neutrinos?: string): any[][] {
  return callFromSheet(d.GROWTH, [z, model, neutrinos]);
}

/**
 * Linear growth rate f = d ln D / d ln a (same assumptions, limits and neutrinos argument as ZC.GROWTH: above z ≈ 1000 the formal solution with baryons in the source); fσ8 is f times σ8(z) = σ8 · ZC.GROWTH(z).
 * @customfunction GROWTH_RATE GROWTH_RATE
 * @helpurl https://localhost:3000/help.html#GROWTH_RATE
 * @example =ZC.GROWTH_RATE(0.5)
 * @param z Redshift, 0 … 99999 (value or range).
 * @param [model] Cosmology: preset, spec or key/value block; blank = workbook's active model.
 * @param [neutrinos] "smooth" (blank: massive neutrinos do not cluster, small scales) or "clustering" (they cluster once non-relativistic, large scales).
 * @returns f.
 */
export function GROWTH_RATE(z: any[][], model?: any[][], neutrinos?: string): any[][] {
  return callFromSheet(d.GROWTH_RATE, [z, model, neutrinos]);
}
