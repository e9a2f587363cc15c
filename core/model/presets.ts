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
  /** Names this set had in earlier versions, still read in saved workbooks (a spec then shows `name`). */
  formerNames?: readonly string[];
}

function preset(name: string, description: string, p: Omit<ModelParameters, "preset">, formerNames?: readonly string[]): Preset {
  if (!formerNames) return { name, description, parameters: { preset: name, ...p } };
  return { name, description: `${description}; called ${formerNames.join(", ")} in zcell 0.2`, parameters: { preset: name, ...p }, formerNames };
}

const planckNeff = 3.046;

/** The model of a workbook that has applied none, and of a spec's suggestions: Planck 2018 CMB + lensing. */
export const defaultPresetName = "P18-CMB";

/**
 * The presets by name, the default first. The names say the data combination: P18-CMB (Planck 2018
 * CMB with lensing, the values papers quote as "Planck 2018": the add-in's default), P18-BAO (Planck
 * 2018 CMB with lensing and BAO), P15-EXT (Planck 2015 with external data),
 * W9-ALL (WMAP nine-year with every external set), W7-BAO (WMAP seven-year with BAO and H0), and
 * DESI2-CMB… (the DESI collaboration's second data release, DR2, with the CMB and each supernova set;
 * called DR2-CMB… in 0.2, names still read: "DR2" alone reads as another survey's release).
 */
export const presets: readonly Preset[] = [
  preset(
    "P18-CMB",
    "H0 67.36, Ωm 0.3153 (incl. one 0.06 eV ν), flat — Planck 2018 VI, A&A 641, A6, Table 2, CMB+lensing",
    { H0: 67.36, Om: 0.3153, Ob: 0.02237 / 0.6736 ** 2, w0: -1, wa: 0, Tcmb: 2.7255, Neff: planckNeff, mnu: [0.06] },
  ),
  preset(
    "P18-BAO",
    "H0 67.66, Ωm 0.3111 (incl. one 0.06 eV ν), flat — Planck 2018 VI, A&A 641, A6, Table 2, CMB+lensing+BAO",
    { H0: 67.66, Om: 0.3111, Ob: 0.02242 / 0.6766 ** 2, w0: -1, wa: 0, Tcmb: 2.7255, Neff: planckNeff, mnu: [0.06] },
  ),
  preset(
    "P15-EXT",
    "H0 67.74, Ωm 0.3089 (incl. one 0.06 eV ν), flat — Planck 2015 XIII, A&A 594, A13, Table 4, CMB+lensing+external",
    { H0: 67.74, Om: 0.3089, Ob: 0.0486, w0: -1, wa: 0, Tcmb: 2.7255, Neff: planckNeff, mnu: [0.06] },
  ),
  preset(
    "W9-ALL",
    "H0 69.32, Ωm 0.2865, massless ν, flat — WMAP nine-year, Hinshaw et al. 2013, ApJS 208, 19, Table 4, +eCMB+BAO+H0",
    { H0: 69.32, Om: 0.2865, Ob: 0.04628, w0: -1, wa: 0, Tcmb: 2.725, Neff: 3.04, mnu: [] },
  ),
  preset(
    "W7-BAO",
    "H0 70.4, Ωm 0.272, massless ν, flat — WMAP seven-year, Komatsu et al. 2011, ApJS 192, 18, Table 1, +BAO+H0",
    { H0: 70.4, Om: 0.272, Ob: 0.0455, w0: -1, wa: 0, Tcmb: 2.725, Neff: 3.04, mnu: [] },
  ),
  // DESI DR2 (DESI Collaboration 2025, "DESI DR2 Results II", arXiv:2503.14738), flat. The parameter
  // table of that paper could not be read here: H0, Ωm, w0 and wa below are FROM MEMORY AND UNVERIFIED
  // (as each description says); Ob from Ωb h² = 0.02242 with the preset's h is ASSUMED (Planck 2018's
  // value, not the paper's); neutrinos as in the P18 sets. Check against the paper before publishing.
  preset(
    "DESI2-CMB",
    "H0 68.17, Ωm 0.3027, ΛCDM, flat — DESI DR2 BAO + CMB, DESI Collaboration 2025, arXiv:2503.14738 (not yet checked against the paper's table; Ob assumed)",
    { H0: 68.17, Om: 0.3027, Ob: 0.02242 / 0.6817 ** 2, w0: -1, wa: 0, Tcmb: 2.7255, Neff: planckNeff, mnu: [0.06] },
    ["DR2-CMB"],
  ),
  preset(
    "DESI2-CMB-PP",
    "H0 67.51, Ωm 0.3114, w0 −0.838, wa −0.62, flat — DESI DR2 BAO + CMB + Pantheon+, DESI Collaboration 2025, arXiv:2503.14738 (not yet checked against the paper's table; Ob assumed)",
    { H0: 67.51, Om: 0.3114, Ob: 0.02242 / 0.6751 ** 2, w0: -0.838, wa: -0.62, Tcmb: 2.7255, Neff: planckNeff, mnu: [0.06] },
    ["DR2-CMB-PP"],
  ),
  preset(
    "DESI2-CMB-U3",
    "H0 65.91, Ωm 0.3275, w0 −0.667, wa −1.09, flat — DESI DR2 BAO + CMB + Union3, DESI Collaboration 2025, arXiv:2503.14738 (not yet checked against the paper's table; Ob assumed)",
    { H0: 65.91, Om: 0.3275, Ob: 0.02242 / 0.6591 ** 2, w0: -0.667, wa: -1.09, Tcmb: 2.7255, Neff: planckNeff, mnu: [0.06] },
    ["DR2-CMB-U3"],
  ),
  preset(
    "DESI2-CMB-DY5",
    "H0 66.74, Ωm 0.3191, w0 −0.752, wa −0.86, flat — DESI DR2 BAO + CMB + DES Y5 supernovae, DESI Collaboration 2025, arXiv:2503.14738 (not yet checked against the paper's table; Ob assumed)",
    { H0: 66.74, Om: 0.3191, Ob: 0.02242 / 0.6674 ** 2, w0: -0.752, wa: -0.86, Tcmb: 2.7255, Neff: planckNeff, mnu: [0.06] },
    ["DR2-CMB-DY5"],
  ),
  preset(
    "CONCORDANCE",
    "H0 70, Ωm 0.3, ΩΛ 0.7, no radiation, flat — round numbers, common practice (no source)",
    { H0: 70, Om: 0.3, w0: -1, wa: 0, Tcmb: 0, Neff: planckNeff, mnu: [] },
  ),
  preset(
    "EDS",
    "H0 70, Ωm 1, no dark energy, no radiation, flat — Einstein–de Sitter (matter only)",
    { H0: 70, Om: 1, w0: -1, wa: 0, Tcmb: 0, Neff: planckNeff, mnu: [] },
  ),
];

/**
 * The preset with this name or a former name (case-insensitive), or undefined.
 * @example findPreset("dr2-cmb")?.name // "DESI2-CMB"
 */
export function findPreset(name: string): Preset | undefined {
  const upper = name.toUpperCase();
  return presets.find((p) => p.name === upper || p.formerNames?.includes(upper));
}
