/**
 * The sound horizon r_d and the distances baryon acoustic oscillation measurements are quoted in,
 * each divided by r_d: D_M (the transverse comoving distance), D_H(z) = c / H(z), and the volume-averaged
 * D_V(z) = [z D_M² D_H(z)]^(1/3) (Eisenstein et al. 2005, ApJ 633, 560, eq. 2).
 */
import { cmbTemperatureK, speedOfLightKmPerS, standardNeff } from "../units/constants.js";
import { checkRedshift } from "../checks/redshift.js";
import { NoSolutionError } from "../checks/NoSolutionError.js";
import { ExpansionRate } from "../model/ExpansionRate.js";
import { integrate } from "../numerics/quadrature.js";

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
 * Where SOUND_HORIZON gives r_d: zcell's bounds (the fit's paper states the parameter range of its
 * calibration; it could not be consulted here). They hold the models CMB and BBN analyses explore
 * (ω_b = 0.0224 ± 0.0005, ω_cb ≈ 0.12–0.14, and P18-CMB at fixed fractions with H0 from 55.16 to
 * 78.00, where ω_b = Ob h² reaches 0.015 and 0.03), and exclude what is almost surely a typo (Ob = 0.3
 * in P18-CMB: ω_b = 0.136). Within them the fit's dependence on ω_b and ω_cb agrees to about 1% with a
 * direct integral of the sound speed to the drag redshift of Eisenstein & Hu 1998, eq. 4 (measured
 * when the bounds were chosen; at ω_b = 0.136 they differ by 14%). Tcmb: the measured value. The
 * correction for another Tcmb moves the drag redshift as 1/Tcmb (recombination happens at a fixed
 * photon temperature) but not with the baryon-to-photon ratio, which at fixed ω_b goes as 1/Tcmb³ and
 * shifts that temperature a little: an approximation only near the measured value.
 */
export const soundHorizonRange = {
  omegaB: [0.015, 0.03],
  omegaCb: [0.08, 0.22],
  Neff: [2, 5],
  TcmbK: [2.72, 2.73],
  mnuTotalEv: [0, 1],
} as const;

const soundHorizons = new WeakMap<Cosmology, number>();

/** A parameter outside its range: #N/A with the reason. */
function checkRange(name: string, value: number, [lo, hi]: readonly [number, number], unit: string, why = ""): void {
  if (value >= lo && value <= hi) return;
  throw new NoSolutionError(`${name} = ${Number(value.toPrecision(3))}${unit} is outside ${lo} … ${hi}${unit}, where r_d is given${why}`);
}

/**
 * The drag redshift z_d of Eisenstein & Hu 1998 (ApJ 496, 605, eq. 4; coefficients from memory):
 * z_d = 1291 ω_m^0.251 / (1 + 0.659 ω_m^0.828) (1 + b1 ω_b^b2), b1 = 0.313 ω_m^−0.419 (1 + 0.607 ω_m^0.674),
 * b2 = 0.238 ω_m^0.223. About 1020 for Planck 2018 (the Boltzmann codes' 1060): used only where the
 * radiation content changes r_d (radiationFactor), never for r_d itself.
 */
function dragRedshiftEH98(omegaM: number, omegaB: number): number {
  const b1 = 0.313 * omegaM ** -0.419 * (1 + 0.607 * omegaM ** 0.674);
  const b2 = 0.238 * omegaM ** 0.223;
  return ((1291 * omegaM ** 0.251) / (1 + 0.659 * omegaM ** 0.828)) * (1 + b1 * omegaB ** b2);
}

/**
 * ∫_{z_d}^∞ c_s(z) / E(z) dz in units of c/H0, with c_s = c / √(3 (1 + R)), R = 3ρ_b / (4ρ_γ) =
 * (3 Ω_b / 4 Ω_γ) / (1+z) (Eisenstein & Hu 1998, eq. 6), E from every component of the model. In
 * u = ln(1+z) to z = 1e8, and beyond in radiation domination (E ∝ (1+z)², R → 0).
 */
function soundHorizonIntegral(expansion: ExpansionRate, Ob: number, zDrag: number): number {
  const r0 = (3 * Ob) / (4 * expansion.Ogamma);
  const f = (u: number) => {
    const zp = Math.exp(u);
    return zp / Math.sqrt(3 * (1 + r0 / zp) * expansion.e2(zp, u));
  };
  const uTop = Math.log1p(1e8);
  return integrate(f, Math.log1p(zDrag), uTop, 1e-11) + f(uTop);
}

/**
 * How the model's radiation moves r_d from the fit's: the sound-horizon integral of the model over
 * that of the same model with Neff = 3.046 and Tcmb = 2.7255 K (the fit's), each to its own drag
 * redshift: z_d of Eisenstein & Hu 1998 for the fit's model, and for the model that redshift moved as
 * 1 + z_d ∝ 1/Tcmb (recombination and drag happen at a fixed photon temperature; common practice).
 * 1 for the standard radiation content.
 */
function radiationFactor(model: Cosmology, omegaM: number, omegaB: number): number {
  if (model.Neff === standardNeff && model.Tcmb === cmbTemperatureK) return 1;
  const standard = new ExpansionRate({ ...model.parameters, Neff: standardNeff, Tcmb: cmbTemperatureK });
  const zDrag = dragRedshiftEH98(omegaM, omegaB);
  const zDragModel = ((1 + zDrag) * cmbTemperatureK) / model.Tcmb - 1;
  return soundHorizonIntegral(model.expansion, model.Ob, zDragModel) / soundHorizonIntegral(standard, model.Ob, zDrag);
}

/**
 * The sound horizon at the drag epoch r_d, by the fit of Aubourg et al. 2015 (PRD 92, 123516, eq. 16):
 * r_d = 55.154 exp(−72.3 (ω_ν + 0.0006)²) / (ω_cb^0.25351 ω_b^0.12807) Mpc, ω = Ω h², ω_cb = ω_m − ω_ν,
 * ω_ν = Σm_ν / 93.14 eV, quoted there to about 0.02% against a Boltzmann code for the standard
 * radiation content (coefficients and accuracy from memory). It reproduces Planck 2018 VI Table 2's
 * r_drag (147.09 and 147.21 Mpc) within their 1σ. r_d depends on ω_b = Ω_b h² and ω_cb, not on the
 * fractions alone: "P18-CMB; H0=73" (same fractions) has r_d 5.97% smaller.
 *
 * Another Neff or Tcmb changes the expansion rate and the baryon-to-photon ratio before the drag
 * epoch: r_d is then the fit times the ratio of the direct integrals ∫ c_s/H dz of the model and of
 * the same model with the standard radiation (Neff = 3.046, Tcmb = 2.7255 K), to the drag redshift
 * of Eisenstein & Hu 1998 eq. 4, moved as 1 + z_d ∝ 1/Tcmb for the model. Neff = 4 gives −3.0%;
 * Tcmb = 2.72 K −0.013%, 2.73 K +0.010%.
 * @param model the cosmology; needs Ob
 * @returns r_d [Mpc]
 * @throws NoSolutionError when the model has no baryon density (Ob), or ω_b, ω_cb, Neff, Tcmb or Σm_ν lies
 *   outside `soundHorizonRange`
 * @example soundHorizonDragMpc(Cosmology.fromSpec("P18-CMB")) // 147.05
 */
export function soundHorizonDragMpc(model: Cosmology): number {
  const known = soundHorizons.get(model);
  if (known !== undefined) return known;
  if (!Number.isFinite(model.Ob)) throw new NoSolutionError("the sound horizon needs the baryon density: give Ob in the model (e.g. P18-CMB; Ob=0.049)");
  const h2 = model.h * model.h;
  const omegaNu = model.mnuTotalEv / neutrinoMassPerOmegaH2Ev;
  const omegaCb = model.Om * h2 - omegaNu;
  const omegaB = model.Ob * h2;
  const range = soundHorizonRange;
  if (model.Tcmb === 0) throw new NoSolutionError("the sound horizon needs the CMB photons: give Tcmb=2.7255 in the model (a spec without a preset has no radiation)");
  checkRange("Tcmb", model.Tcmb, range.TcmbK, " K", ": the measured CMB temperature (the drag epoch moves with it)");
  checkRange("ω_b = Ob h²", omegaB, range.omegaB, "", " (Ob is a fraction of the critical density: 0.049 in P18-CMB)");
  checkRange("ω_cb = (Om − Ω_ν) h²", omegaCb, range.omegaCb, "");
  checkRange("Neff", model.Neff, range.Neff, "");
  checkRange("Σm_ν", model.mnuTotalEv, range.mnuTotalEv, " eV");
  const fit = (55.154 * Math.exp(-72.3 * (omegaNu + 0.0006) ** 2)) / (omegaCb ** 0.25351 * omegaB ** 0.12807);
  const rd = fit * radiationFactor(model, model.Om * h2, omegaB);
  soundHorizons.set(model, rd);
  return rd;
}
