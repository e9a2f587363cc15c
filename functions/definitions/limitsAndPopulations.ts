/**
 * Flux limits and survey volumes: the redshift at which a source drops out, V_max.
 * Each entry: the arguments in the order of the ZC.* signature (built from argumentKinds.ts) and what one
 * cell computes in reference units; the declaration with its JSDoc is in ../declarations/limitsAndPopulations.ts.
 */
import {
  limitingRedshift,
  limitingRedshiftMag,
  maxVolumeMpc3,
} from "../../core/index.js";
import type { FunctionDef } from "../FunctionDef.js";
import { num, mag, model, unit, optionalAlpha, isGiven, area, optionalText, m, n, textUnitFactor } from "./argumentKinds.js";


/** Flux limits and survey volumes functions, in the order of their declarations. */
export const limitsAndPopulations: FunctionDef[] = [
  {
    name: "REDSHIFT_LIMIT",
    args: [
      num("lum", { min: 0, minExclusive: true }), num("flux_limit", { min: 0, minExclusive: true }), optionalAlpha, model,
      optionalText("lum_unit"), optionalText("flux_unit"),
    ],
    compute: (a) => {
      // with alpha, a spectral luminosity against a flux-density limit; without, bolometric
      const alpha = n(a, "alpha");
      const spectral = isGiven(alpha);
      const lum = n(a, "lum") * textUnitFactor(a, "lum_unit", spectral ? "W/Hz" : "W", spectral ? "W/Hz" : "W");
      const limit = n(a, "flux_limit") * textUnitFactor(a, "flux_unit", spectral ? "Jy" : "W/m2", spectral ? "W/m2/Hz" : "W/m2");
      return limitingRedshift(m(a), lum, limit, spectral ? alpha : -1);
    },
  },
  {
    name: "REDSHIFT_LIMIT_MAG",
    args: [mag("abs_mag"), mag("mag_limit"), num("alpha", { default: -1, blankMeansDefault: true }), model],
    compute: (a) => limitingRedshiftMag(m(a), n(a, "abs_mag"), n(a, "mag_limit"), n(a, "alpha")),
  },
  {
    name: "VOLUME_MAX",
    args: [num("z_max"), num("z_lo"), num("z_hi"), area, model, unit("unit", "Mpc3"), unit("area_unit", "sr", "deg2", "area")],
    compute: (a) => maxVolumeMpc3(m(a), n(a, "z_max"), n(a, "z_lo"), n(a, "z_hi"), n(a, "area")),
  },
];
