/**
 * Halos and clusters: the overdensity Δ that defines a halo, relative to the critical density at its
 * redshift, and the radius and mass it encloses, M = (4π/3) Δ ρ_crit(z) R³.
 *
 * Definitions: "200c", "500c", any "<N>c" (N times the critical density); "200m", any "<N>m" (N times
 * the mean matter density, Δ = N Ωm(z)); "vir", the virial overdensity of spherical collapse in the
 * fit of Bryan & Norman 1998 (ApJ 495, 80, eq. 6): Δ_c = 18π² + 82x − 39x² for flat models with a
 * cosmological constant, 18π² + 60x − 32x² for models without dark energy, x = Ωm(z) − 1.
 */
import { megaparsecM, solarMassKg } from "../units/constants.js";
import { NoSolutionError } from "../checks/NoSolutionError.js";
import { quoted } from "../checks/quoted.js";
import { requireNonNegative } from "../checks/numberChecks.js";
import type { Cosmology } from "../distances/Cosmology.js";

const halo = /^(\d+(?:\.\d+)?)\s*([cm])$/i;

/**
 * The overdensity Δ of a halo definition, relative to the critical density at z.
 * @param model the cosmology
 * @param z redshift ≥ 0
 * @param definition "vir", "<N>c" (e.g. "200c", "500c") or "<N>m" (e.g. "200m"), in any case
 * @returns Δ (dimensionless)
 * @throws NoSolutionError for "vir" in a model the fit does not cover (curvature with dark energy, w ≠ −1)
 * @example haloOverdensity(Cosmology.fromSpec("EDS"), 0, "vir") // 177.65 (18π²)
 */
export function haloOverdensity(model: Cosmology, z: number, definition: string): number {
  if (typeof definition !== "string") throw new TypeError("definition must be text");
  const text = definition.trim();
  if (text.toLowerCase() === "vir") {
    const x = model.densityParameter("matter", z) - 1;
    if (model.OL === 0) return 18 * Math.PI ** 2 + 60 * x - 32 * x * x;
    const lambda = model.parameters.w0 === -1 && model.parameters.wa === 0;
    if (model.Ok === 0 && lambda) return 18 * Math.PI ** 2 + 82 * x - 39 * x * x;
    throw new NoSolutionError(
      "the virial overdensity of Bryan & Norman 1998 covers flat models with a cosmological constant and models without dark energy; use a fixed one such as 200c",
    );
  }
  const m = halo.exec(text);
  if (!m || !(Number(m[1]) > 0)) throw new TypeError(`unknown halo definition ${quoted(text)}: use vir, 200c, 500c, 200m or any <N>c, <N>m`);
  const n = Number(m[1]);
  return m[2].toLowerCase() === "c" ? n : n * model.densityParameter("matter", z);
}

/** Δ ρ_crit(z) in M☉ per Mpc³. */
function haloDensityMsunMpc3(model: Cosmology, z: number, definition: string): number {
  return (haloOverdensity(model, z, definition) * model.criticalDensityKgM3(z) * megaparsecM ** 3) / solarMassKg;
}

/**
 * The radius enclosing a mean density Δ ρ_crit(z): R = (3M / (4π Δ ρ_crit(z)))^(1/3).
 * @param model the cosmology
 * @param massMsun halo mass [M☉], ≥ 0
 * @param z redshift ≥ 0
 * @param definition as haloOverdensity
 * @returns R [Mpc]
 * @example haloRadiusMpc(Cosmology.fromSpec("EDS"), 1e14, 0, "200c") // 0.95746
 */
export function haloRadiusMpc(model: Cosmology, massMsun: number, z: number, definition: string): number {
  requireNonNegative("mass", massMsun);
  return Math.cbrt((3 * massMsun) / (4 * Math.PI * haloDensityMsunMpc3(model, z, definition)));
}

/**
 * The mass within a radius at mean density Δ ρ_crit(z): M = (4π/3) Δ ρ_crit(z) R³.
 * @param model the cosmology
 * @param radiusMpc radius [Mpc], ≥ 0
 * @param z redshift ≥ 0
 * @param definition as haloOverdensity
 * @returns M [M☉]
 * @example haloMassMsun(Cosmology.fromSpec("EDS"), 0.95746227, 0, "200c") // ≈ 1.0000e14
 */
export function haloMassMsun(model: Cosmology, radiusMpc: number, z: number, definition: string): number {
  requireNonNegative("radius", radiusMpc);
  return ((4 * Math.PI) / 3) * haloDensityMsunMpc3(model, z, definition) * radiusMpc ** 3;
}
