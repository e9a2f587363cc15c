/**
 * Distances, times, volumes and the state of the universe at a redshift, and the inverse (ZC.REDSHIFT).
 * Each entry: the arguments in the order of the ZC.* signature (built from argumentKinds.ts) and what one
 * cell computes in reference units; the declaration with its JSDoc is in ../declarations/distancesAndTimes.ts.
 */
import {
  checkSourceRedshift,
  cmbFrameRedshift,
  conversionFactor,
  Cosmology,
  type DensityComponent,
  type InvertibleQuantity,
} from "../../core/index.js";
import { formatValue } from "../messages.js";
import type { FunctionDef } from "../FunctionDef.js";
import { num, amount, model, unit, z, zToday, area, angle, m, n } from "./argumentKinds.js";

/** A function of z and the model only, with an optional output unit. */
function ofRedshift(
  name: string,
  reference: string | undefined,
  f: (model: Cosmology, z: number) => number,
  zArg = z,
  shown = reference,
): FunctionDef {
  return {
    name,
    args: reference ? [zArg, model, unit("unit", reference, shown)] : [zArg, model],
    compute: (a) => f(m(a), n(a, "z")),
    kernel: { arg: "z", of: (a, zz) => f(m(a), zz) },
  };
}

/**
 * ZC.REDSHIFT quantity names → core quantity, the unit the core takes and the unit a value is read in
 * when none is given (the default unit of the function inverted).
 */
const inverses: Record<string, { quantity: InvertibleQuantity; unit?: string; shown?: string }> = {
  DIST_LUM: { quantity: "luminosityDistance", unit: "Mpc", shown: "Mpc" },
  DIST_LOS: { quantity: "comovingDistance", unit: "Mpc", shown: "Mpc" },
  DIST_TRANS: { quantity: "transverseComovingDistance", unit: "Mpc", shown: "Mpc" },
  DIST_ANG: { quantity: "angularDiameterDistance", unit: "Mpc", shown: "Mpc" },
  DIST_LIGHT: { quantity: "lightTravelDistance", unit: "Mpc", shown: "Mpc" },
  MODULUS: { quantity: "distanceModulus" },
  LOOKBACK: { quantity: "lookbackTime", unit: "Gyr", shown: "Gyr" },
  AGE: { quantity: "age", unit: "Gyr", shown: "Gyr" },
  VOLUME: { quantity: "comovingVolume", unit: "Mpc3", shown: "Mpc3" },
};

/** ZC.REDSHIFT: the redshift at which a quantity takes a value given in the user's unit. */
function invert(model: Cosmology, name: string, value: number, given: string): number {
  const inverse = inverses[name];
  if (given !== "" && !inverse.unit) throw new TypeError(`unit: ${name} is in magnitudes and takes no unit`);
  const unit = given || inverse.shown || "mag";
  const toCore = inverse.unit ? conversionFactor(unit, inverse.unit, model.h) : 1;
  const shown = (v: number) => `${formatValue(v)} ${unit}`;
  return model.redshiftAt(inverse.quantity, value * toCore, {
    asked: () => `${name} = ${shown(value)}`,
    limit: (coreValue) => shown(coreValue / toCore),
  });
}

const components: readonly DensityComponent[] = ["matter", "cold", "darkenergy", "curvature", "radiation", "photons", "neutrinos"];

/** Distances, times, volumes and the state of the universe at a redshift, and the inverse (ZC.REDSHIFT). functions, in the order of their declarations. */
export const distancesAndTimes: FunctionDef[] = [
  ofRedshift("DIST_LUM", "Mpc", (x, zz) => x.luminosityDistanceMpc(zz)),
  ofRedshift("DIST_ANG", "Mpc", (x, zz) => x.angularDiameterDistanceMpc(zz)),
  ofRedshift("DIST_LOS", "Mpc", (x, zz) => x.comovingDistanceMpc(zz)),
  ofRedshift("DIST_TRANS", "Mpc", (x, zz) => x.transverseComovingDistanceMpc(zz)),
  {
    name: "DIST_BETWEEN",
    args: [num("z1"), num("z2"), model, unit("unit", "Mpc")],
    compute: (a) => m(a).angularDiameterDistanceBetweenMpc(n(a, "z1"), n(a, "z2")),
  },
  ofRedshift("DIST_LIGHT", "Mpc", (x, zz) => x.lightTravelDistanceMpc(zz)),
  ofRedshift("MODULUS", undefined, (x, zz) => {
    checkSourceRedshift(zz);
    return x.distanceModulusMag(zz);
  }),
  ofRedshift("LOOKBACK", "Gyr", (x, zz) => x.lookbackTimeGyr(zz)),
  ofRedshift("AGE", "Gyr", (x, zz) => x.ageGyr(zz), zToday),
  ofRedshift("HUBBLE", "km/s/Mpc", (x, zz) => x.hubbleParameterKmSMpc(zz), zToday),
  {
    name: "OMEGA",
    args: [{ kind: "text", name: "component", choices: components }, zToday, model],
    compute: (a) => m(a).densityParameter(a.component as DensityComponent, n(a, "z")),
  },
  ofRedshift("CMB_TEMP", undefined, (x, zz) => x.cmbTemperatureK(zz), zToday),
  ofRedshift("CRIT_DENSITY", "kg/m3", (x, zz) => x.criticalDensityKgM3(zz), zToday),
  ofRedshift("PROPER_SCALE", "Mpc/rad", (x, zz) => x.angularDiameterDistanceMpc(zz), z, "kpc/arcsec"),
  {
    name: "SIZE",
    args: [angle, z, model, unit("angle_unit", "rad", "arcsec", "angle"), unit("size_unit", "Mpc", "kpc")],
    compute: (a) => m(a).properSizeMpc(n(a, "angle"), n(a, "z")),
  },
  {
    name: "ANGLE",
    args: [amount("size"), z, model, unit("size_unit", "Mpc", "kpc", "size"), unit("angle_unit", "rad", "arcsec")],
    compute: (a) => m(a).angleRad(n(a, "size"), n(a, "z")),
  },
  ofRedshift("VOLUME", "Mpc3", (x, zz) => x.comovingVolumeMpc3(zz)),
  {
    name: "VOLUME_SHELL",
    args: [num("z1"), num("z2"), area, model, unit("unit", "Mpc3"), unit("area_unit", "sr", "deg2", "area")],
    compute: (a) => m(a).comovingVolumeShellMpc3(n(a, "z1"), n(a, "z2"), n(a, "area")),
  },
  ofRedshift("VOLUME_ELEMENT", "Mpc3/sr", (x, zz) => x.comovingVolumeElementMpc3Sr(zz)),
  {
    name: "REDSHIFT",
    args: [num("value"), { kind: "text", name: "quantity", choices: Object.keys(inverses), scalar: true }, model, { kind: "text", name: "unit", scalar: true, optional: true, blank: { words: "the quantity's default unit (Mpc, Gyr, Mpc3 for VOLUME)" } }],
    compute: (a) => invert(m(a), a.quantity as string, n(a, "value"), a.unit as string),
  },
  {
    name: "REDSHIFT_CMB",
    args: [
      num("z_helio", { min: -1, minExclusive: true }),
      num("ra", { sexagesimal: "ra" }),
      num("dec", { sexagesimal: "dec", min: -90, max: { value: 90, what: "90°" } }),
      unit("angle_unit", "deg", "deg", ["ra", "dec"]),
    ],
    // in degrees, the reference unit of every position (sexagesimal text is read into degrees)
    compute: (a) => cmbFrameRedshift(n(a, "z_helio"), n(a, "ra") * (Math.PI / 180), n(a, "dec") * (Math.PI / 180)),
  },
];
