/**
 * The sound horizon r_d and the distances baryon acoustic oscillation measurements are quoted in,
 * each divided by r_d: D_M (the transverse comoving distance), D_H(z) = c / H(z), and the volume-averaged
 * D_V(z) = [z D_M² D_H(z)]^(1/3) (Eisenstein et al. 2005, ApJ 633, 560, eq. 2).
 */
import { speedOfLightKmPerS } from "../units/constants.js";
import { checkRedshift } from "../checks/redshift.js";
import { NoSolutionError } from "../checks/NoSolutionError.js";

/** Σm_ν [eV] per unit ω_ν = Ω_ν h² of non-relativistic neutrinos today (common practice, for Tν/Tγ = (4/11)^(1/3) and Tcmb = 2.7255 K). */
const neutrinoMassPerOmegaH2Ev = 93.14;
import type { Cosmology } from "./Cosmology.js";

/**
 * The Hubble distance at z, D_H(z) = c / H(z).
 * @param model the cosmology
 * @param z redshift ≥ 0
 * @returns Mpc
 * @example hubbleDistanceAtMpc(Cosmology.fromSpec("EDS"), 3) // 535.34 (c/H0 / (1+z)^1.5)
 */
export function hubbleDistanceAtMpc(model: Cosmology, z: number): number {
  checkRedshift(z);
  return speedOfLightKmPerS / model.hubbleParameterKmSMpc(z);
}

/**
 * The volume-averaged distance D_V(z) = [z D_M(z)² c/H(z)]^(1/3) (Eisenstein et al. 2005, eq. 2).
 * @param model the cosmology
 * @param z redshift ≥ 0 (0 gives 0)
 * @returns Mpc
 * @example volumeAveragedDistanceMpc(Cosmology.fromSpec("EDS"), 1) // 2120.15 ([1 × 2508.78² × 1514.18]^(1/3))
 */
export function volumeAveragedDistanceMpc(model: Cosmology, z: number): number {
  const dh = hubbleDistanceAtMpc(model, z);
  return Math.cbrt(z * model.transverseComovingDistanceMpc(z) ** 2 * dh);
}

/**
 * The sound horizon at the drag epoch r_d, by the fit of Aubourg et al. 2015 (PRD 92, 123516, eq. 16):
 * r_d = 55.154 exp(−72.3 (ω_ν + 0.0006)²) / (ω_cb^0.25351 ω_b^0.12807) Mpc, ω = Ω h², ω_cb = ω_m − ω_ν,
 * ω_ν = Σm_ν / 93.14 eV. The fit is for the standard radiation content (Neff = 3.046) and quoted
 * there to about 0.02% against a Boltzmann code (coefficients and accuracy from memory: check them
 * against the paper before relying on the last digit). It reproduces Planck 2018 VI Table 2's r_drag
 * (147.09 and 147.21 Mpc) within their 1σ.
 * @param model the cosmology; needs Ob
 * @returns r_d [Mpc]
 * @throws NoSolutionError when the model has no baryon density (Ob)
 * @example soundHorizonDragMpc(Cosmology.fromSpec("P18-CMB")) // 147.05
 */
export function soundHorizonDragMpc(model: Cosmology): number {
  if (!Number.isFinite(model.Ob)) throw new NoSolutionError("the sound horizon needs the baryon density: give Ob in the model (e.g. P18-CMB; Ob=0.049)");
  const h2 = model.h * model.h;
  const omegaNu = model.mnuTotalEv / neutrinoMassPerOmegaH2Ev;
  const omegaCb = model.Om * h2 - omegaNu;
  const omegaB = model.Ob * h2;
  return (55.154 * Math.exp(-72.3 * (omegaNu + 0.0006) ** 2)) / (omegaCb ** 0.25351 * omegaB ** 0.12807);
}
