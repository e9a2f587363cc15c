/**
 * How a position argument is read (`sexagesimal` in FunctionDef.ts): text that is not a number is a
 * sexagesimal angle ("12:30:49.4" hours of right ascension, "−05°07′" degrees), read once into the
 * argument's reference unit when its part is known before the cells are read — fixed by the
 * function, or named by a scalar text such as COORD_CONVERT's from_frame — and otherwise passed to
 * compute as text. Reading it here, not in compute, keeps a column of text positions a column of
 * numbers (no text in the per-cell loop).
 */
import { scaledConversion, sexagesimalDegrees, type AnglePart } from "../core/index.js";
import { CellError, classify } from "./cellError.js";
import type { Args, ArgSpec, FunctionDef } from "./FunctionDef.js";

/**
 * How a number argument is converted into its reference unit (readArguments.ts): the factor, the
 * power of h = H0/100 of the cell's model still to apply (h-scaled units such as Mpc/h; 0 otherwise),
 * the unit the user gave, and for a position given as text, a degree in the reference unit and the
 * part it is read as when a scalar text decides it.
 */
export type Conversion = { factor: number; hPower: number; unit: string; perDegree: number; part?: AnglePart };

/** One degree in an angle unit (NaN for a unit that is not an angle). */
export function degreeIn(unit: string): number {
  try {
    return scaledConversion("deg", unit).factor;
  } catch {
    return Number.NaN;
  }
}

/** A declination or other latitude: the angle unit "hourangle" is for right ascensions, so a latitude beside one stays in degrees. */
export function isLatitude(def: FunctionDef, name: string): boolean {
  return def.args.some((a) => a.name === name && a.kind === "number" && (a.sexagesimal === "dec" || a.sexagesimal === "lat"));
}

/** A conversion that changes nothing (a position argument in degrees with no unit argument). */
const inDegrees: Conversion = { factor: 1, hPower: 0, unit: "", perDegree: 1 };

/** Notes in `conversions` the part of each position argument that a scalar text decides, once per call. */
export function positionParts(def: FunctionDef, scalars: Args, conversions: Record<string, Conversion>): void {
  for (const spec of def.args) {
    if (spec.kind === "number" && typeof spec.sexagesimal === "function") {
      conversions[spec.name] = { ...(conversions[spec.name] ?? inDegrees), part: spec.sexagesimal(scalars) };
    }
  }
}

/** The part a position argument's text is read as before compute, or undefined (not a position, or "either"). */
export function positionPart(spec: Extract<ArgSpec, { kind: "number" }>, conversion: Conversion | undefined): AnglePart | undefined {
  const part = conversion?.part ?? spec.sexagesimal;
  return part === "either" || typeof part === "function" ? undefined : part;
}

/**
 * A text's degrees when it reads as a position of the part, else NaN: the quick way for a column
 * of positions, where only a cell that does not read goes the long way (number text, an error's words).
 */
export function positionOrNaN(text: string, part: AnglePart): number {
  try {
    return sexagesimalDegrees(text, part);
  } catch {
    return Number.NaN;
  }
}

/**
 * A position given as text, read for its part into degrees and then into the reference unit; the
 * text itself when only compute knows its part ("either").
 */
export function readPosition(spec: Extract<ArgSpec, { kind: "number" }>, text: string, conversion: Conversion | undefined): number | string | CellError {
  const part = positionPart(spec, conversion);
  if (part === undefined) return text;
  try {
    const degrees = sexagesimalDegrees(text, part, spec.name);
    return conversion === undefined ? degrees : degrees * conversion.perDegree;
  } catch (e) {
    return classify(e, spec.name);
  }
}
