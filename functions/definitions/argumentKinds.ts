/**
 * The kinds of argument the worksheet functions share, as ArgSpec builders (a redshift, a magnitude,
 * a 1σ error, a unit, the model …), and the two accessors every `compute` uses. Each family of
 * definitions in this folder builds its arguments from these, so one kind reads alike everywhere.
 */
import { conversionFactor, sexagesimalDegrees, type AnglePart, type Cosmology } from "../../core/index.js";
import type { Args, ArgSpec, BlankMeaning } from "../FunctionDef.js";
import { messages } from "../messages.js";

type NumberOptions = Omit<Extract<ArgSpec, { kind: "number" }>, "kind" | "name">;
export const num = (name: string, extra: NumberOptions = {}): ArgSpec => ({ kind: "number", name, ...extra });
/** A physical amount that cannot be negative (flux, luminosity, size). */
export const amount = (name: string) => num(name, { min: 0 });
/** A magnitude (catalogue flags of |m| ≥ 50 give #N/A). */
export const mag = (name: string, extra: NumberOptions = {}) => num(name, { magnitude: true, ...extra });
export const model: ArgSpec = { kind: "model", name: "model" };
/** Key/value pairs ZC.MODEL takes after its base model. */
export const modelPairs = 6;
/** A unit argument: `reference` is what compute uses, `shown` the default a person sees. */
export const unit = (name: string, reference: string, shown = reference, applies: string | string[] = "result"): ArgSpec => ({
  kind: "unit",
  name,
  unit: reference,
  default: shown,
  applies,
});
export const z = num("z");
export const zToday = num("z", { default: 0 });
/** A 1σ error: ≥ 0. */
export const err = (name: string, extra: NumberOptions = {}) => num(name, { min: 0, ...extra });
/** A 1σ error of a magnitude: ≥ 0, and ±99 or any |value| ≥ 50 is a catalogue's missing-value flag (#N/A) as for the magnitude. */
export const magErr = (name: string, extra: NumberOptions = {}) => num(name, { min: 0, magnitude: true, ...extra });
/** An optional spectral index whose absence means the bolometric case (NaN stands for "not given"). */
export const optionalAlpha = num("alpha", { default: Number.NaN, blankMeansDefault: true, blank: { words: "bolometric" } });
export const isGiven = (x: number) => !Number.isNaN(x);
/** A sky area argument: all sky when omitted or blank. */
export const area = num("area", { default: 4 * Math.PI, blankMeansDefault: true, min: 0, max: { value: 4 * Math.PI, what: "the whole sky" }, blank: { words: "the whole sky" } });
/** A survey's sky area, required (a blank would silently mean the whole sky). */
export const requiredArea = num("area", { min: 0, max: { value: 4 * Math.PI, what: "the whole sky" } });
export const angle = num("angle", { min: 0, max: { value: Math.PI, what: "180°" } });
/** An optional text with a default value one could type (`typed`): blank means that value. */
export const textWithDefault = (name: string, typed: string, extra: { choices?: readonly string[]; scalar?: boolean }): ArgSpec => ({
  kind: "text",
  name,
  optional: true,
  blank: { typed },
  ...extra,
});
/** A text argument of the cell, or its typed default when blank. */
export function textOr(a: Args, spec: ArgSpec): string {
  const given = a[spec.name];
  if (typeof given === "string" && given !== "") return given;
  if (spec.kind !== "text" || !spec.blank || !("typed" in spec.blank)) throw new Error(`${spec.name} has no default`);
  return spec.blank.typed;
}
/**
 * An optional unit given as text that compute converts itself (its kind depends on other arguments):
 * checked once when the call is read, #VALUE! naming the argument; `blank` is what leaving it out
 * means, `applies` the number arguments given in it (their messages quote them in it).
 */
export const textUnit = (name: string, blank: BlankMeaning, applies: readonly string[] = []): ArgSpec => ({
  kind: "text",
  name,
  scalar: true,
  optional: true,
  blank,
  unit: { applies },
});
/** The same text unit, with the number arguments given in it in this function. */
export function givenIn(spec: ArgSpec, ...applies: string[]): ArgSpec {
  if (spec.kind !== "text" || !spec.unit) throw new Error(`${spec.name} is not a text unit`);
  return { ...spec, unit: { applies } };
}
/** The flux-density unit of MAG_AB and FLUX_AB, the band unit of the two-band and rest-frame functions: text (its kind depends on other arguments), with the default shown. */
export const fluxDensityUnit = textUnit("unit", { typed: "Jy" });
export const bandUnit = textUnit("band_unit", { typed: "GHz" });
/** The unit of a rest-frame spectral luminosity: W/Hz gives L_ν, a power unit ν L_ν. */
export const spectralOutUnit = textUnit("out_unit", { typed: "W/Hz" });
/** A right ascension (or another longitude): a number in degrees, or sexagesimal text (hours for a right ascension). */
export const longitude = (name: string) => num(name, { sexagesimal: "ra" });
/** A declination (or another latitude): a number in degrees within ±90°, or sexagesimal text. */
export const latitude = (name: string, part: "dec" | "lat" = "dec") => num(name, { sexagesimal: part, min: -90, max: { value: 90, what: "the pole, 90°" } });

/** The cell's model. */
export const m = (a: Args) => a.model as Cosmology;
/** A number argument of the cell, in its reference unit. */
export const n = (a: Args, name: string) => a[name] as number;

/**
 * A position argument whose part another argument names (`sexagesimal: "either"`), in degrees: a
 * number as read (number text too), or text read as a sexagesimal angle of the part given ("ra":
 * hours unless marked).
 */
export function degreesOf(a: Args, name: string, part: AnglePart): number {
  const x = a[name];
  return typeof x === "number" ? x : sexagesimalDegrees(x as string, part, name);
}

/** L_ν [W/Hz] at ν [Hz] in the out_unit asked: W/Hz and its kin give L_ν, a power unit (W, erg/s, Lsun) ν L_ν (= λ L_λ). */
export function inSpectralOrPowerUnit(a: Args, lnuWHz: number, nuHz: number): number {
  const out = textOr(a, spectralOutUnit);
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
