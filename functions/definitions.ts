/**
 * Every worksheet function as data: its arguments (in the order of the ZC.* signature) and what one
 * cell computes, in reference units (Mpc, Gyr, W, W/m2, Jy, rad, Mpc3, sr). The shared wrapper in
 * `evaluate.ts` does the rest. To add a function, add an entry here and a declaration in functions.ts.
 */
import {
  abFluxDensityJy,
  abMagnitude,
  checkSourceRedshift,
  conversionFactor,
  absoluteMagnitude,
  apparentMagnitude,
  convertUnit,
  Cosmology,
  fluxWm2,
  formatModelSpec,
  janskySI,
  kCorrectionPowerLawMag,
  luminosityW,
  presets,
  spectralLuminosityWHz,
  type DensityComponent,
  type InvertibleQuantity,
  withChanges,
} from "../core/index.js";
import { describeModel, versionText } from "./describeModel.js";
import type { Args, ArgSpec, Cell, FunctionDef } from "./evaluate.js";
import { formatValue, messages } from "./messages.js";

type NumberOptions = Omit<Extract<ArgSpec, { kind: "number" }>, "kind" | "name">;
const num = (name: string, extra: NumberOptions = {}): ArgSpec => ({ kind: "number", name, ...extra });
/** A physical amount that cannot be negative (flux, luminosity, size). */
const amount = (name: string) => num(name, { min: 0 });
/** A magnitude (catalogue flags of |m| ≥ 50 give #N/A). */
const mag = (name: string, extra: NumberOptions = {}) => num(name, { magnitude: true, ...extra });
const model: ArgSpec = { kind: "model", name: "model" };
/** A unit argument: `reference` is what compute uses, `shown` the default a person sees. */
const unit = (name: string, reference: string, shown = reference, applies = "result"): ArgSpec => ({
  kind: "unit",
  name,
  unit: reference,
  default: shown,
  applies,
});
const z = num("z");
const zToday = num("z", { default: 0 });

const m = (a: Args) => a.model as Cosmology;
const n = (a: Args, name: string) => a[name] as number;

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
  VOLUME: { quantity: "comovingVolume", unit: "Mpc3", shown: "Gpc3" },
};

/** ZC.REDSHIFT: the redshift at which a quantity takes a value given in the user's unit. */
function invert(model: Cosmology, name: string, value: number, given: string): number {
  const inverse = inverses[name];
  if (given !== "" && !inverse.unit) throw new TypeError(`unit: ${name} is in magnitudes and takes no unit`);
  const unit = given || inverse.shown || "mag";
  const toCore = inverse.unit ? conversionFactor(unit, inverse.unit) : 1;
  const shown = (v: number) => `${formatValue(v)} ${unit}`;
  return model.redshiftAt(inverse.quantity, value * toCore, {
    asked: () => `${name} = ${shown(value)}`,
    limit: (coreValue) => shown(coreValue / toCore),
  });
}

/** ZC.PARAM names → value. */
const parameters: Record<string, (model: Cosmology) => number> = {
  H0: (x) => x.H0,
  h: (x) => x.h,
  Om: (x) => x.Om,
  OL: (x) => x.OL,
  Ok: (x) => x.Ok,
  Or: (x) => x.Or,
  Ob: (x) => {
    if (!Number.isFinite(x.Ob)) throw new RangeError(messages.notGiven("Ob"));
    return x.Ob;
  },
  w0: (x) => x.w0,
  wa: (x) => x.wa,
  Tcmb: (x) => x.Tcmb,
  Neff: (x) => x.Neff,
  mnu: (x) => x.mnuTotalEv,
  age_today: (x) => x.ageTodayGyr,
  hubble_time: (x) => x.hubbleTimeGyr,
  hubble_distance: (x) => x.hubbleDistanceMpc,
  z_eq: (x) => {
    if (!Number.isFinite(x.equalityRedshift)) throw new RangeError(messages.noEquality);
    return x.equalityRedshift;
  },
};

const components: readonly DensityComponent[] = ["matter", "darkenergy", "curvature", "radiation", "photons", "neutrinos"];
const fullSkySr = 4 * Math.PI;
/** Key/value pairs ZC.MODEL takes after its base model. */
const modelPairs = 6;

const list: FunctionDef[] = [
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
    args: [num("angle", { min: 0, max: { value: Math.PI, what: "180°" } }), z, model, unit("angle_unit", "rad", "arcsec", "angle"), unit("size_unit", "Mpc", "kpc")],
    compute: (a) => m(a).properSizeMpc(n(a, "angle"), n(a, "z")),
  },
  {
    name: "ANGLE",
    args: [amount("size"), z, model, unit("size_unit", "Mpc", "kpc", "size"), unit("angle_unit", "rad", "arcsec")],
    compute: (a) => m(a).angleRad(n(a, "size"), n(a, "z")),
  },
  ofRedshift("VOLUME", "Mpc3", (x, zz) => x.comovingVolumeMpc3(zz), z, "Gpc3"),
  {
    name: "VOLUME_SHELL",
    args: [
      num("z1"), num("z2"),
      num("area", { default: fullSkySr, blankMeansDefault: true, min: 0, max: { value: fullSkySr, what: "the whole sky" } }),
      model, unit("unit", "Mpc3", "Gpc3"), unit("area_unit", "sr", "deg2", "area"),
    ],
    compute: (a) => m(a).comovingVolumeShellMpc3(n(a, "z1"), n(a, "z2"), n(a, "area")),
  },
  ofRedshift("VOLUME_ELEMENT", "Mpc3/sr", (x, zz) => x.comovingVolumeElementMpc3Sr(zz)),
  {
    name: "LUMINOSITY",
    args: [amount("flux"), z, model, unit("flux_unit", "W/m2", "W/m2", "flux"), unit("lum_unit", "W")],
    compute: (a) => luminosityW(m(a), n(a, "flux"), n(a, "z")),
  },
  {
    name: "FLUX",
    args: [amount("lum"), z, model, unit("lum_unit", "W", "W", "lum"), unit("flux_unit", "W/m2")],
    compute: (a) => fluxWm2(m(a), n(a, "lum"), n(a, "z")),
  },
  {
    name: "LUMINOSITY_NU",
    args: [amount("flux_density"), z, num("alpha"), model, unit("in_unit", "Jy", "Jy", "flux_density"), unit("out_unit", "W/Hz")],
    compute: (a) => spectralLuminosityWHz(m(a), n(a, "flux_density") * janskySI, n(a, "z"), n(a, "alpha")),
  },
  {
    name: "KCORRECTION",
    args: [z, num("alpha")],
    compute: (a) => kCorrectionPowerLawMag(n(a, "z"), n(a, "alpha")),
  },
  {
    name: "MAG_ABS",
    args: [mag("m"), z, num("kcorr", { default: 0, blankMeansDefault: true }), model],
    compute: (a) => absoluteMagnitude(m(a), n(a, "m"), n(a, "z"), n(a, "kcorr")),
  },
  {
    name: "MAG_APP",
    args: [mag("M"), z, num("kcorr", { default: 0, blankMeansDefault: true }), model],
    compute: (a) => apparentMagnitude(m(a), n(a, "M"), n(a, "z"), n(a, "kcorr")),
  },
  {
    name: "MAG_AB",
    args: [num("flux_density", { min: 0, minExclusive: true }), unit("unit", "Jy", "Jy", "flux_density")],
    compute: (a) => abMagnitude(n(a, "flux_density")),
  },
  {
    name: "FLUX_AB",
    args: [mag("m_ab"), unit("unit", "Jy")],
    compute: (a) => abFluxDensityJy(n(a, "m_ab")),
  },
  {
    name: "REDSHIFT",
    args: [num("value"), { kind: "text", name: "quantity", choices: Object.keys(inverses), scalar: true }, model, { kind: "text", name: "unit", scalar: true, optional: true }],
    compute: (a) => invert(m(a), a.quantity as string, n(a, "value"), a.unit as string),
  },
  {
    name: "CONVERT",
    args: [num("value"), { kind: "text", name: "from", scalar: true }, { kind: "text", name: "to", scalar: true }],
    compute: (a) => convertUnit(n(a, "value"), a.from as string, a.to as string),
  },
  {
    name: "MODEL",
    args: [
      model,
      ...Array.from({ length: modelPairs }, (_, i): ArgSpec[] => [
        { kind: "text", name: `key${i + 1}`, optional: true },
        { kind: "numberOrText", name: `value${i + 1}` },
      ]).flat(),
    ],
    compute: (a) => {
      const changes: [string, number | string][] = [];
      for (let i = 1; i <= modelPairs; i++) {
        const key = a[`key${i}`] as string | undefined;
        const value = a[`value${i}`] as number | string | undefined;
        if (!key) {
          if (value !== undefined) throw new TypeError(messages.pairWithoutKey(i));
          continue;
        }
        if (value === undefined) throw new TypeError(`key${i} "${key}" has no value${i}`);
        changes.push([key, value]);
      }
      const p = withChanges(m(a).parameters, changes);
      new Cosmology(p); // validates the physics, so a bad model errors here, not later
      return formatModelSpec(p);
    },
  },
  {
    name: "PARAM",
    args: [{ kind: "text", name: "name", choices: Object.keys(parameters) }, model],
    compute: (a) => parameters[a.name as string](m(a)),
  },
  {
    name: "PRESETS",
    args: [],
    table: (active): Cell[][] => [
      ["preset", "description and source"],
      ...presets.map((p) => [p.name, p.description]),
      ...[...(active.models?.specs ?? [])].map(([name, spec]) => [name, `defined in this workbook: ${spec}`]),
    ],
  },
  {
    name: "DESCRIBE",
    args: [model],
    compute: (a) => describeModel(m(a)),
  },
  {
    name: "VERSION",
    args: [],
    table: (): Cell[][] => [[versionText()]],
  },
];

/** The worksheet functions by name (without the ZC. namespace). */
export const definitions: Readonly<Record<string, FunctionDef>> = Object.fromEntries(list.map((d) => [d.name, d]));
