/**
 * Plain-words descriptions for people: one line per model (ZC.DESCRIBE, the task pane) and the
 * engine conventions (ZC.VERSION), so that every number a reader sees states its assumptions.
 */
import { type Cosmology } from "../core/index.js";
import packageJson from "../package.json";

const { version } = packageJson;

/** zcell's version, from package.json. */
export const zcellVersion: string = version;

const fmt = (x: number, digits = 6) => Number(x.toPrecision(digits)).toString();

/**
 * The model that is there, in words: geometry, then its contents ("flat: matter + Λ + radiation",
 * "flat: matter only", "closed: matter + w0–wa dark energy").
 */
function kindOf(m: Cosmology): string {
  const geometry = m.Ok === 0 ? "flat" : m.Ok > 0 ? "open" : "closed";
  const parts = ["matter"];
  if (m.OL !== 0) parts.push(m.wa !== 0 || m.w0 !== -1 ? "w0–wa dark energy" : "Λ");
  if (m.Tcmb > 0) parts.push("radiation");
  return `${geometry}: ${parts.length === 1 ? "matter only" : parts.join(" + ")}`;
}

/**
 * One line describing a model with every parameter shown.
 * @example describeModel(Cosmology.fromSpec("P18-BAO")).slice(0, 79) // "P18-BAO: flat: matter + Λ + radiation; H0 = 67.66 km/s/Mpc; Om = 0.3111 (matter"
 */
export function describeModel(m: Cosmology): string {
  const neutrinos =
    m.Tcmb === 0
      ? "no radiation (Tcmb = 0: no photons, no neutrinos)"
      : `Tcmb = ${fmt(m.Tcmb)} K; Neff = ${fmt(m.Neff)}; ` +
        (m.parameters.mnu.length === 0
          ? "massless neutrinos"
          : `neutrino masses ${m.parameters.mnu.map((x) => fmt(x)).join(", ")} eV (exact Fermi–Dirac; others massless)`);
  const age = Number.isFinite(m.ageTodayGyr)
    ? `${fmt(m.ageTodayGyr, 5)} Gyr`
    : Number.isNaN(m.ageTodayGyr)
      ? "not finite to numerical precision (a past too close to de Sitter)"
      : "infinite (no big bang)";
  return [
    `${m.spec}: ${kindOf(m)}`,
    `H0 = ${fmt(m.H0)} km/s/Mpc`,
    // "incl. massive ν" only where there are some (Tcmb = 0 switches neutrinos off with the photons)
    m.Tcmb > 0 && m.parameters.mnu.some((x) => x > 0) ? `Om = ${fmt(m.Om)} (matter incl. massive ν)` : `Om = ${fmt(m.Om)} (matter)`,
    `OL = ${fmt(m.OL)}`,
    `Ok = ${fmt(m.Ok)}`,
    m.Or === 0 ? "Or = 0 (no radiation)" : `Or = ${m.Or.toPrecision(4)} (photons + massless ν)`,
    ...(Number.isFinite(m.Ob) ? [`Ob = ${fmt(m.Ob)}`] : []),
    `w0 = ${fmt(m.w0)}`,
    `wa = ${fmt(m.wa)}`,
    neutrinos,
    `age today ${age}`,
  ].join("; ");
}

/** zcell's version and the engine's conventions, for provenance in shared workbooks. */
export function versionText(): string {
  return (
    `zcell ${zcellVersion}; distances per Hogg (1999); Om includes massive neutrinos; ` +
    `neutrinos exact Fermi–Dirac with T_ν = (4/11)^(1/3) Tcmb and Neff/3 per species; ` +
    `w(a) = w0 + wa(1 − a); constants CODATA 2018 / IAU 2015; relative accuracy ≤ 1e-10 for z ≤ 1e4`
  );
}
