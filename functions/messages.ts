/**
 * Every message the worksheet functions show (Excel shows it with the error value). Core errors keep
 * their own words; these add what only the adapter knows: which argument, which cell, which shape.
 */
import { defaultPresetName, keySuggestion, numberTextHint, quoted, quotedText } from "../core/index.js";

export const messages = {
  /** The message as the sheet shows it: the ZC function first. */
  inFunction: (fn: string, message: string) => (message.startsWith("ZC.") ? message : `ZC.${fn}: ${message}`),
  missingMagnitude: (arg: string, value: number) =>
    `${arg} = ${formatValue(value)} is a catalogue's missing-value flag (|magnitude| ≥ 50), not a magnitude`,
  belowMin: (arg: string, value: number, unit: string, min: number, exclusive: boolean) =>
    `${arg} = ${withUnit(value, unit)} must be ${exclusive ? ">" : "≥"} ${withUnit(min, unit)}`,
  aboveMax: (arg: string, value: number, unit: string, max: number, what: string) =>
    `${arg} = ${withUnit(value, unit)} is above ${withUnit(max, unit)} (${what})`,
  blockKey: (key: string, valid: readonly string[]) =>
    `model: unknown key ${quoted(key)} in the key/value block: ${keySuggestion(key, valid)}`,
  pairWithoutKey: (index: number) => `value${index} is given but key${index} is blank`,
  notANumber: (arg: string, value: unknown) => {
    const hint = typeof value === "string" ? numberTextHint(value.trim()) : undefined;
    return hint ? `${arg}: ${describeValue(value)} is not a number: ${hint}` : `${arg}: ${describeValue(value)} where a number belongs`;
  },
  /** A declination or another latitude beyond the pole, given as a number (in `unit`: degrees when blank). */
  beyondPole: (arg: string, value: number, unit: string, part: "dec" | "lat") =>
    `${arg} = ${unit === "" || unit === "deg" ? `${formatValue(value)}°` : withUnit(value, unit)} is beyond ±90°: a ${part === "dec" ? "declination" : "latitude"} is −90° … +90°`,
  notFinite: (arg: string) => `${arg}: not a finite number`,
  notText: (arg: string, value: unknown) => `${arg}: ${describeValue(value)} where text belongs`,
  inputError: (arg: string) => `${arg}: the input cell holds an error`,
  shapes: (a: string, ra: number, ca: number, b: string, rb: number, cb: number) =>
    `ranges do not fit together: ${a} is ${ra}×${ca} and ${b} is ${rb}×${cb} (use equal sizes, a single cell, or a row against a column)`,
  tooLarge: (cells: number, most: number) => `the result would have ${cells.toLocaleString("en-US")} cells; at most ${most.toLocaleString("en-US")} are allowed`,
  required: (arg: string) => `${arg} is required`,
  columnTooLong: (arg: string, cells: number, most: number) =>
    `${arg} has ${cells.toLocaleString("en-US")} cells; at most ${most.toLocaleString("en-US")} (one whole column) are read`,
  oneValueOnly: (arg: string) => `${arg} must be one cell: it applies to the whole result (for several, one formula each)`,
  oneCellOnly: (arg: string) => `${arg} must be one cell here (the other arguments are whole columns)`,
  columnLengths: (a: string, na: number, b: string, nb: number) => `${a} has ${na} cells and ${b} has ${nb}: give columns of the same length`,
  tooManyBins: (edges: number, most: number) =>
    `edges: ${edges.toLocaleString("en-US")} edges make ${(edges - 1).toLocaleString("en-US")} bins; at most ${most.toLocaleString("en-US")} bins are returned: give only the bin edges (a short range such as H3:H10), not a column of data`,
  noSources: "values: no sources (every row of values and v_max is blank)",
  noValueInBins: (lo: number, hi: number, bottom: number, top: number, scale: "linear" | "log" | "other") =>
    `no value falls within the edges: values run from ${formatValue(lo)} to ${formatValue(hi)}, the edges from ${formatValue(bottom)} to ${formatValue(top)}; ` +
    (scale === "linear"
      ? "the values look linear and the edges log10: bin LOG10 of the values, or give edges in the values' unit"
      : scale === "log"
        ? "the values look like log10 and the edges linear: give the edges as log10 too"
        : "are the values and the edges in the same scale and unit?"),
  inRow: (arg: string, row: number, detail: string) => `${arg} in row ${row} of the range: ${detail}`,
  unitArgument: (arg: string, detail: string) => `${arg}: ${detail}`,
  /** The functions that take the other kind of a flux or luminosity (spectral for a bolometric function, and the reverse), if any. */
  otherKindFunctions: (fn: string): string | undefined => (Object.hasOwn(otherKindFunctions, fn) ? otherKindFunctions[fn] : undefined),
  otherKind: (detail: string, kind: string, use: string) => `${detail}: for ${kind} use ${use}`,
  choice: (arg: string, value: string, choices: readonly string[]) =>
    `${arg}: ${quoted(value)} is not one of ${choices.join(", ")}`,
  /** A wavelength outside an extinction law's range; `likely`: another unit in which the same number falls inside it, and that unit's argument. */
  outsideLawRange: (arg: string, value: number, unit: string, law: string, low: number, high: number, likely?: { unit: string; arg: string }) =>
    `${arg} = ${withUnit(value, unit)} is outside ${law}'s range, ${formatValue(low)} to ${withUnit(high, unit)}: the law is not defined there` +
    (likely ? `; if ${formatValue(value)} is in ${likely.unit}, give "${likely.unit}" as ${likely.arg}` : ""),
  /** ANGLE of a size larger than π D_A: in the size's unit. */
  angleAbove180: (size: number, unit: string, z: number, limit: number) =>
    `size = ${withUnit(size, unit)} at z = ${formatValue(z)} would subtend more than 180°: at most ${withUnit(limit, unit)} (π D_A) there`,
  /** An angle unit given hours of time: the hour angle is what a right ascension in hours needs. */
  hoursForAngle: (text: string) => `${quoted(text)} is hours of time, not an angle: for a right ascension in hours use "hourangle"`,
  notFiniteResult: (fn: string) => `${fn}: the result is not a finite number for these arguments`,
  model: (detail: string) => `model: ${detail}`,
  /** A spec without H0 or Om: the same changes on the workbook's model, as a ZC.MODEL call (when it can take them all). */
  missingParameter: (detail: string, given: readonly (readonly [string, string])[], most: number) =>
    given.length === 0 || given.length > most || given.some(([, value]) => value.length > 40)
      ? detail
      : `${detail}; to change the workbook's model instead, use ZC.MODEL(, ${given.map(([key, value]) => `"${key}", ${formulaValue(value)}`).join(", ")})`,
  unitInModelSlot: (text: string) =>
    `model: ${quoted(text)} is a unit, not a model: units come after the model; leave the model blank for the workbook's model (two commas: …, , ${quoted(text)})`,
  modelInUnitSlot: (arg: string, text: string) =>
    `${arg}: ${quoted(text)} is a model, not a unit: the model comes before the units (check the order of the arguments)`,
  megajansky: (arg: string, text: string) =>
    `${arg}: ${quoted(text)} is megajansky (10⁹ mJy), not a likely flux density for a source: did you mean mJy? (units are case-sensitive)`,
  hScaledWithoutModel: "units in h = H0/100 (such as Mpc/h) need a model, and this function takes none",
  notGiven: (what: string) => `${what} is not given in this model`,
  /** SOUND_HORIZON of a model without Ob: the user's own model with Ob added (0.049, Planck 2018's Ωb), not a preset that has one already. */
  soundHorizonNeedsOb: (spec: string) => `the sound horizon needs the baryon density: add Ob to the model, e.g. "${quotedText(spec)}; Ob=0.049"`,
  noEquality: "z_eq: this model has no radiation (Tcmb = 0), so no matter–radiation equality",
  internal: (fn: string, detail: string) => `ZC.${fn}: unexpected problem (${detail}); please report it`,
  activeModelFallback: (detail: string) =>
    `the workbook's stored cosmology could not be read (${detail}); using ${defaultPresetName} (the default) until one is applied`,
} as const;

/** Functions of the other kind, bolometric or spectral, by function (the same quantity per unit frequency, or integrated). */
const otherKindFunctions: Readonly<Record<string, string>> = {
  LUMINOSITY: "ZC.LUMINOSITY_NU or ZC.LUMINOSITY_REST",
  LUMINOSITY_ERR: "ZC.LUMINOSITY_NU_ERR or ZC.LUMINOSITY_REST_ERR",
  REDSHIFT_LIMIT: "ZC.REDSHIFT_LIMIT_NU",
  LUMINOSITY_NU: "ZC.LUMINOSITY",
  LUMINOSITY_REST: "ZC.LUMINOSITY",
  LUMINOSITY_NU_ERR: "ZC.LUMINOSITY_ERR",
  LUMINOSITY_REST_ERR: "ZC.LUMINOSITY_ERR",
  REDSHIFT_LIMIT_NU: "ZC.REDSHIFT_LIMIT",
};

/** A number as the sheet shows it in a message: at most 6 significant digits. */
export function formatValue(x: number): string {
  return Number.isFinite(x) ? String(Number(x.toPrecision(6))) : String(x);
}

function withUnit(x: number, unit: string): string {
  return unit ? `${formatValue(x)} ${unit}` : formatValue(x);
}

/** A spec's value text (already read as a number, or a list of masses) as a formula argument: a list as text, a number as it is. */
function formulaValue(text: string): string {
  return text.includes(",") ? `"${text}"` : text;
}

function describeValue(value: unknown): string {
  if (typeof value === "string") return `text ${quoted(value)}`;
  if (typeof value === "boolean") return value ? "TRUE" : "FALSE";
  return typeof value === "number" ? formatValue(value) : "a value";
}
