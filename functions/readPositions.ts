/**
 * How a position argument is read (`sexagesimal` in FunctionDef.ts): text that is not a number is a
 * sexagesimal angle ("12:30:49.4" hours of right ascension, "−05°07′" degrees), read once into
 * degrees — every position argument's reference unit — when its part is known before the cells are
 * read (fixed by the function, or named by a scalar text such as COORD_CONVERT's from_frame), and
 * otherwise passed to compute as text. Reading it here, not in compute, keeps a column of text
 * positions a column of numbers (no text in the per-cell loop).
 */
import { isNumberText, sexagesimalDegrees, type AnglePart } from "../core/index.js";
import { CellError, classify } from "./cellError.js";
import type { Args, ArgSpec, FunctionDef } from "./FunctionDef.js";

type NumberSpec = Extract<ArgSpec, { kind: "number" }>;

/** A declination or other latitude: the angle unit "hourangle" is for right ascensions, so a latitude beside one stays in degrees. */
export function isLatitude(def: FunctionDef, name: string): boolean {
  return def.args.some((a) => a.name === name && a.kind === "number" && (a.sexagesimal === "dec" || a.sexagesimal === "lat"));
}

/** The part of each position argument that a scalar text decides (read once per call), by name. */
export function positionParts(def: FunctionDef, scalars: Args): [name: string, part: AnglePart][] {
  const parts: [string, AnglePart][] = [];
  for (const spec of def.args) {
    if (spec.kind === "number" && typeof spec.sexagesimal === "function") parts.push([spec.name, spec.sexagesimal(scalars)]);
  }
  return parts;
}

/** The part a position argument's text is read as before compute (`decided`: by a scalar text), or undefined (not a position, or "either"). */
export function positionPart(spec: NumberSpec, decided: AnglePart | undefined): AnglePart | undefined {
  const part = decided ?? spec.sexagesimal;
  return part === "either" || typeof part === "function" ? undefined : part;
}

/**
 * A text's degrees when it reads as a position of the part, else NaN: the quick way for a column
 * of positions, where only a cell that does not read goes the long way (an error's words, and number
 * text, which is a number in the argument's angle unit, as one cell alone reads it).
 */
export function positionOrNaN(text: string, part: AnglePart): number {
  if (isNumberText(text.trim())) return Number.NaN;
  try {
    return sexagesimalDegrees(text, part);
  } catch {
    return Number.NaN;
  }
}

/** A position given as text, read for its part into degrees; the text itself when only compute knows its part ("either"). */
export function readPosition(spec: NumberSpec, text: string, decided: AnglePart | undefined): number | string | CellError {
  const part = positionPart(spec, decided);
  if (part === undefined) return text;
  try {
    return sexagesimalDegrees(text, part, spec.name);
  } catch (e) {
    return classify(e, spec.name);
  }
}
