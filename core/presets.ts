/**
 * Published parameter sets. Each entry cites the table its numbers come from; all the Planck and
 * WMAP sets are flat (OL = 1 − Om − Or0). Om includes massive neutrinos, as in those tables.
 * Ob is derived from the quoted Ωb h² where the table gives that (Ob = Ωb h² / h²).
 *
 * The numbers are from memory of the cited tables (the papers could not be consulted here); the test
 * suite checks them against quantities the same tables publish: the Planck 2018 ages (13.787 and
 * 13.797 Gyr) and z_eq (3387 and 3402) are reproduced to 2e-4 and 1e-3.
 */
import type { ModelParameters } from "./ModelParameters.js";

/** A named, cited parameter set. */
export interface Preset {
  /** Upper-case name, as typed in a model spec. */
  name: string;
  /** One line: what the set is and where it comes from. */
  description: string;
  /** The parameters (flat unless OL is present). */
  parameters: ModelParameters;
}

function preset(name: string, description: string, p: Omit<ModelParameters, "preset">): Preset {
  return { name, description, parameters: { preset: name, ...p } };
}

const planckNeff = 3.046;

/** The presets by name. */
export const presets: readonly Preset[] = [
  preset(
    "PLANCK2018",
    "Planck 2018 VI (A&A 641, A6) Table 2, TT,TE,EE+lowE+lensing+BAO; flat, Σmν = 0.06 eV in one species",
    { H0: 67.66, Om: 0.3111, Ob: 0.02242 / 0.6766 ** 2, w0: -1, wa: 0, Tcmb: 2.7255, Neff: planckNeff, mnu: [0.06] },
  ),
  preset(
    "PLANCK2018CMB",
    "Planck 2018 VI (A&A 641, A6) Table 2, TT,TE,EE+lowE+lensing; flat, Σmν = 0.06 eV in one species",
    { H0: 67.36, Om: 0.3153, Ob: 0.02237 / 0.6736 ** 2, w0: -1, wa: 0, Tcmb: 2.7255, Neff: planckNeff, mnu: [0.06] },
  ),
  preset(
    "PLANCK2015",
    "Planck 2015 XIII (A&A 594, A13) Table 4, TT,TE,EE+lowP+lensing+ext; flat, Σmν = 0.06 eV in one species",
    { H0: 67.74, Om: 0.3089, Ob: 0.0486, w0: -1, wa: 0, Tcmb: 2.7255, Neff: planckNeff, mnu: [0.06] },
  ),
  preset(
    "WMAP9",
    "Hinshaw et al. 2013 (ApJS 208, 19) Table 4, WMAP+eCMB+BAO+H0; flat, massless neutrinos",
    { H0: 69.32, Om: 0.2865, Ob: 0.04628, w0: -1, wa: 0, Tcmb: 2.725, Neff: 3.04, mnu: [] },
  ),
  preset(
    "WMAP7",
    "Komatsu et al. 2011 (ApJS 192, 18) Table 1, WMAP+BAO+H0; flat, massless neutrinos",
    { H0: 70.4, Om: 0.272, Ob: 0.0455, w0: -1, wa: 0, Tcmb: 2.725, Neff: 3.04, mnu: [] },
  ),
  preset(
    "CONCORDANCE",
    "Round-number flat ΛCDM (common practice, no source): H0 = 70, Om = 0.3, OL = 0.7, no radiation",
    { H0: 70, Om: 0.3, w0: -1, wa: 0, Tcmb: 0, Neff: planckNeff, mnu: [] },
  ),
  preset(
    "EDS",
    "Einstein–de Sitter: flat, matter only (Om = 1), H0 = 70, no radiation",
    { H0: 70, Om: 1, w0: -1, wa: 0, Tcmb: 0, Neff: planckNeff, mnu: [] },
  ),
];

/** The preset with this name (case-insensitive), or undefined. */
export function findPreset(name: string): Preset | undefined {
  const upper = name.toUpperCase();
  return presets.find((p) => p.name === upper);
}
