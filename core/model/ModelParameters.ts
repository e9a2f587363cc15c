/**
 * The parameters that define a cosmological model, as a person states them.
 *
 * Conventions (see DEVELOPERS.md, "Conventions"):
 * - Om is the total matter density today, massive neutrinos included (as in published parameter tables).
 * - Give OL (dark energy today) or Ok (curvature), not both; neither means flat: OL = 1 − Om − Or0.
 * - w(a) = w0 + wa (1 − a) (CPL: Chevallier & Polarski 2001; Linder 2003).
 * - Tcmb = 0 means no radiation at all (no photons, no neutrinos).
 * - mnu lists the masses [eV] of up to three massive neutrino species; the remaining species are massless.
 */
export interface ModelParameters {
  /** Name of the preset the model started from, if any (upper case); used by the spec printer. */
  preset?: string;
  /** Hubble constant [km s⁻¹ Mpc⁻¹], > 0. */
  H0: number;
  /** Total matter density parameter today, massive neutrinos included, ≥ 0. */
  Om: number;
  /** Dark-energy density parameter today; omit (and omit Ok) for a flat model. */
  OL?: number;
  /** Curvature density parameter today, instead of OL. */
  Ok?: number;
  /** Baryon density parameter today, 0 ≤ Ob ≤ Om: used by SOUND_HORIZON only. */
  Ob?: number;
  /** Dark-energy equation of state today. */
  w0: number;
  /** Dark-energy equation-of-state slope, w(a) = w0 + wa (1 − a). */
  wa: number;
  /** CMB temperature today [K], ≥ 0; 0 means no radiation. */
  Tcmb: number;
  /** Effective number of neutrino species, ≥ 0. */
  Neff: number;
  /** Masses of the massive neutrino species [eV], at most three, each > 0, descending. */
  mnu: number[];
}

/** Parameter keys in the order the spec printer writes them. */
export const parameterKeys = ["H0", "Om", "OL", "Ok", "Ob", "w0", "wa", "Tcmb", "Neff", "mnu"] as const;

/** One of the parameter keys of a model spec. */
export type ParameterKey = (typeof parameterKeys)[number];

/** Defaults of a spec that names no preset: no radiation unless Tcmb is given, Neff = 3.046, no massive ν, Λ. */
export const specDefaults: Omit<ModelParameters, "H0" | "Om"> = {
  w0: -1,
  wa: 0,
  Tcmb: 0,
  Neff: 3.046,
  mnu: [],
};
