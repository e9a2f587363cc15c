/**
 * Every worksheet function as data: its arguments (in the order of the ZC.* signature) and what one
 * cell computes, in reference units (Mpc, Gyr, W, W/m2, Jy, rad, Mpc3, sr). The shared wrapper in
 * `evaluate.ts` does the rest. To add a function, add an entry here and a declaration in functions.ts.
 */
import {
  abFluxDensityJy,
  abMagnitude,
  absoluteMagnitude,
  absoluteMagnitudeErrorMag,
  apparentMagnitude,
  bolometricAbsoluteMagnitude,
  bolometricLuminosityW,
  checkSourceRedshift,
  cmbFrameRedshift,
  conversionFactor,
  convertUnit,
  Cosmology,
  fluxWm2,
  formatModelSpec,
  frequencyHz,
  janskySI,
  kCorrectionPowerLawMag,
  limitingRedshift,
  limitingRedshiftMag,
  luminosityDistanceErrorMpc,
  luminosityErrorW,
  luminosityW,
  maxVolumeMpc3,
  presets,
  properSizeErrorMpc,
  restFrameSpectralLuminosityWHz,
  spectralLuminosityErrorWHz,
  spectralLuminosityWHz,
  spectralSurfaceBrightnessDimmingMag,
  surfaceBrightnessDimmingMag,
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
const unit = (name: string, reference: string, shown = reference, applies: string | string[] = "result"): ArgSpec => ({
  kind: "unit",
  name,
  unit: reference,
  default: shown,
  applies,
});
const z = num("z");
const zToday = num("z", { default: 0 });
/** A 1σ error: ≥ 0. */
const err = (name: string, extra: NumberOptions = {}) => num(name, { min: 0, ...extra });
/** An optional spectral index whose absence means the bolometric case (NaN stands for "not given"). */
const optionalAlpha = num("alpha", { default: Number.NaN, blankMeansDefault: true });
const isGiven = (x: number) => !Number.isNaN(x);
/** A unit given as text whose meaning depends on other arguments (blank: `shown`), as a factor into `reference`. */
function textUnitFactor(a: Args, name: string, shown: string, reference: string): number {
  const text = (a[name] as string) || shown;
  try {
    return conversionFactor(text, reference, m(a).h);
  } catch (e) {
    throw new TypeError(messages.unitArgument(name, (e as Error).message));
  }
}
/** L_ν [W/Hz] at ν [Hz] in the out_unit asked: W/Hz and its kin give L_ν, a power unit (W, erg/s, Lsun) ν L_ν (= λ L_λ). */
function inSpectralOrPowerUnit(a: Args, lnuWHz: number, nuHz: number): number {
  const out = (a.out_unit as string) || "W/Hz";
  const h = m(a).h;
  try {
    return lnuWHz * conversionFactor("W/Hz", out, h);
  } catch (e) {
    try {
      return lnuWHz * nuHz * conversionFactor("W", out, h);
    } catch {
      throw new TypeError(messages.unitArgument("out_unit", `${(e as Error).message}; use W/Hz for L_ν or a power (W, erg/s, Lsun) for ν L_ν`));
    }
  }
}
/** A sky area argument: all sky when omitted or blank. */
const area = num("area", { default: 4 * Math.PI, blankMeansDefault: true, min: 0, max: { value: 4 * Math.PI, what: "the whole sky" } });
const angle = num("angle", { min: 0, max: { value: Math.PI, what: "180°" } });
const optionalText = (name: string): ArgSpec => ({ kind: "text", name, scalar: true, optional: true });

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
  const toCore = inverse.unit ? conversionFactor(unit, inverse.unit, model.h) : 1;
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
    args: [angle, z, model, unit("angle_unit", "rad", "arcsec", "angle"), unit("size_unit", "Mpc", "kpc")],
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
    args: [num("z1"), num("z2"), area, model, unit("unit", "Mpc3", "Gpc3"), unit("area_unit", "sr", "deg2", "area")],
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
    name: "DIST_LUM_ERR",
    args: [z, err("z_err"), model, unit("unit", "Mpc")],
    compute: (a) => luminosityDistanceErrorMpc(m(a), n(a, "z"), n(a, "z_err")),
  },
  {
    name: "LUMINOSITY_ERR",
    args: [amount("flux"), err("flux_err"), z, err("z_err"), model, unit("flux_unit", "W/m2", "W/m2", ["flux", "flux_err"]), unit("lum_unit", "W")],
    compute: (a) => luminosityErrorW(m(a), n(a, "flux"), n(a, "flux_err"), n(a, "z"), n(a, "z_err")),
  },
  {
    name: "LUMINOSITY_NU_ERR",
    args: [
      amount("flux_density"), err("flux_density_err"), z, err("z_err"), num("alpha"), err("alpha_err", { default: 0, blankMeansDefault: true }),
      model, unit("in_unit", "Jy", "Jy", ["flux_density", "flux_density_err"]), unit("out_unit", "W/Hz"),
    ],
    compute: (a) =>
      spectralLuminosityErrorWHz(
        m(a), n(a, "flux_density") * janskySI, n(a, "flux_density_err") * janskySI, n(a, "z"), n(a, "z_err"), n(a, "alpha"), n(a, "alpha_err"),
      ),
  },
  {
    name: "MAG_ABS_ERR",
    args: [err("m_err"), z, err("z_err"), err("kcorr_err", { default: 0, blankMeansDefault: true }), model],
    compute: (a) => absoluteMagnitudeErrorMag(m(a), n(a, "m_err"), n(a, "z"), n(a, "z_err"), n(a, "kcorr_err")),
  },
  {
    name: "SIZE_ERR",
    args: [angle, err("angle_err"), z, err("z_err"), model, unit("angle_unit", "rad", "arcsec", ["angle", "angle_err"]), unit("size_unit", "Mpc", "kpc")],
    compute: (a) => properSizeErrorMpc(m(a), n(a, "angle"), n(a, "angle_err"), n(a, "z"), n(a, "z_err")),
  },
  {
    name: "LUMINOSITY_REST",
    args: [
      amount("flux_density"), z, num("alpha"), num("observed"), num("rest"), model,
      optionalText("band_unit"), unit("in_unit", "Jy", "Jy", "flux_density"), optionalText("out_unit"),
    ],
    compute: (a) => {
      const band = (a.band_unit as string) || "GHz";
      const restHz = frequencyHz(n(a, "rest"), band, "rest");
      const lnu = restFrameSpectralLuminosityWHz(
        m(a), n(a, "flux_density") * janskySI, n(a, "z"), n(a, "alpha"), frequencyHz(n(a, "observed"), band, "observed"), restHz,
      );
      return inSpectralOrPowerUnit(a, lnu, restHz);
    },
  },
  {
    name: "MAG_BOL",
    args: [num("lum", { min: 0, minExclusive: true }), unit("unit", "W", "W", "lum")],
    compute: (a) => bolometricAbsoluteMagnitude(n(a, "lum")),
  },
  {
    name: "LUM_BOL",
    args: [mag("mag_bol"), unit("unit", "W")],
    compute: (a) => bolometricLuminosityW(n(a, "mag_bol")),
  },
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
  {
    name: "REDSHIFT_CMB",
    args: [
      num("z_helio", { min: -1, minExclusive: true }), num("ra"), num("dec", { min: -Math.PI / 2, max: { value: Math.PI / 2, what: "90°" } }),
      unit("angle_unit", "rad", "deg", ["ra", "dec"]),
    ],
    compute: (a) => cmbFrameRedshift(n(a, "z_helio"), n(a, "ra"), n(a, "dec")),
  },
  {
    name: "DIMMING",
    args: [z, optionalAlpha],
    compute: (a) => (isGiven(n(a, "alpha")) ? spectralSurfaceBrightnessDimmingMag(n(a, "z"), n(a, "alpha")) : surfaceBrightnessDimmingMag(n(a, "z"))),
  },
  {
    name: "REDSHIFT",
    args: [num("value"), { kind: "text", name: "quantity", choices: Object.keys(inverses), scalar: true }, model, { kind: "text", name: "unit", scalar: true, optional: true }],
    compute: (a) => invert(m(a), a.quantity as string, n(a, "value"), a.unit as string),
  },
  {
    name: "CONVERT",
    args: [num("value"), { kind: "text", name: "from", scalar: true }, { kind: "text", name: "to", scalar: true }, model],
    compute: (a) => convertUnit(n(a, "value"), a.from as string, a.to as string, m(a).h),
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
