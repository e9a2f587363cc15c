/** Models used across the accuracy tests: one of each kind the engine supports. */
import type { ModelParameters } from "../core/model/ModelParameters.js";

const lcdm = { w0: -1, wa: 0, Tcmb: 0, Neff: 3.046, mnu: [] as number[] };

/** name → parameters; Tcmb = 2.7255 K is the Fixsen (2009, ApJ 707, 916) value. */
export const testModels: Record<string, ModelParameters> = {
  "flat ΛCDM, no radiation": { ...lcdm, H0: 70, Om: 0.3 },
  "flat ΛCDM + radiation + 0.06 eV ν": { ...lcdm, H0: 67.66, Om: 0.3111, Tcmb: 2.7255, mnu: [0.06] },
  "open, radiation, massless ν": { ...lcdm, H0: 70, Om: 0.25, OL: 0.6, Tcmb: 2.7255 },
  "closed, radiation, three massive ν": { ...lcdm, H0: 70, Om: 0.4, OL: 0.8, Tcmb: 2.7255, mnu: [0.1, 0.05, 0.01] },
  "flat w0–wa, radiation, 0.06 eV ν": { ...lcdm, H0: 68, Om: 0.31, w0: -0.8, wa: -0.5, Tcmb: 2.7255, mnu: [0.06] },
  "open w0–wa, no radiation": { ...lcdm, H0: 72, Om: 0.2, OL: 0.7, w0: -1.1, wa: 0.3 },
};

/** The distance, time and volume methods every accuracy comparison checks. */
export const distanceQuantities = [
  "comovingDistanceMpc",
  "transverseComovingDistanceMpc",
  "angularDiameterDistanceMpc",
  "luminosityDistanceMpc",
  "lookbackTimeGyr",
  "ageGyr",
  "comovingVolumeMpc3",
] as const;

/**
 * Two presets with their parameters written out from the papers, for the independent slow path
 * (test/reference/slowCosmology.ts) to give expected values that owe nothing to core/model/presets.ts.
 */
export const publishedModels = {
  /** Planck 2018 VI (A&A 641, A6) Table 2, last column (TT,TE,EE+lowE+lensing+BAO); one 0.06 eV ν, Neff 3.046, Tcmb 2.7255 K (Fixsen 2009). */
  "P18-BAO": { ...lcdm, H0: 67.66, Om: 0.3111, Tcmb: 2.7255, mnu: [0.06] },
  /** Planck 2018 VI (A&A 641, A6) Table 2, TT,TE,EE+lowE+lensing column (the default model); one 0.06 eV ν, Neff 3.046, Tcmb 2.7255 K. */
  "P18-CMB": { ...lcdm, H0: 67.36, Om: 0.3153, Tcmb: 2.7255, mnu: [0.06] },
  /** WMAP nine-year, Hinshaw et al. 2013 (ApJS 208, 19) Table 4 (WMAP+eCMB+BAO+H0); Tcmb 2.725 K, Neff 3.04, massless ν. */
  "W9-ALL": { ...lcdm, H0: 69.32, Om: 0.2865, Tcmb: 2.725, Neff: 3.04 },
} satisfies Record<string, ModelParameters>;
