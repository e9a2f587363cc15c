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
import { num, mag, model, unit, requiredArea, m, n } from "./argumentKinds.js";


/** Flux limits and survey volumes functions, in the order of their declarations. */
export const limitsAndPopulations: FunctionDef[] = [
  {
    name: "REDSHIFT_LIMIT",
    args: [
      num("lum", { min: 0, minExclusive: true }), num("flux_limit", { min: 0, minExclusive: true }), model,
      unit("lum_unit", "W", "erg/s", "lum"), unit("flux_unit", "W/m2", "erg/s/cm2", "flux_limit"),
    ],
    compute: (a) => limitingRedshift(m(a), n(a, "lum"), n(a, "flux_limit")),
  },
  {
    name: "REDSHIFT_LIMIT_NU",
    args: [
      num("lum_nu", { min: 0, minExclusive: true }), num("flux_density_limit", { min: 0, minExclusive: true }), num("alpha"), model,
      unit("lum_unit", "W/Hz", "W/Hz", "lum_nu"), unit("flux_unit", "W/m2/Hz", "Jy", "flux_density_limit"),
    ],
    compute: (a) => limitingRedshift(m(a), n(a, "lum_nu"), n(a, "flux_density_limit"), n(a, "alpha")),
  },
  {
    name: "REDSHIFT_LIMIT_MAG",
    args: [mag("abs_mag"), mag("mag_limit"), num("alpha", { default: -1, blankMeansDefault: true }), model],
    compute: (a) => limitingRedshiftMag(m(a), n(a, "abs_mag"), n(a, "mag_limit"), n(a, "alpha")),
  },
  {
    name: "VOLUME_MAX",
    args: [
      num("z_max"), num("z_lo"), num("z_hi"), requiredArea, num("z_min", { default: 0, blankMeansDefault: true }), model,
      unit("unit", "Mpc3"), unit("area_unit", "sr", "deg2", "area"),
    ],
    compute: (a) => maxVolumeMpc3(m(a), n(a, "z_max"), n(a, "z_lo"), n(a, "z_hi"), n(a, "area"), n(a, "z_min")),
  },
];
