/**
 * Reading one argument as Excel passes it: a matrix or a single cell, numbers (text numbers too, with
 * the domain checked in the unit the user gave), text, units (conversions cached), models.
 */
import { scaledConversion, type Cosmology } from "../core/index.js";
import type { ActiveModelSetting } from "./activeModel.js";
import { CellError, classify, isIncomingError } from "./cellError.js";
import type { ArgSpec } from "./FunctionDef.js";
import { messages } from "./messages.js";
import { isBlank } from "./modelArgument.js";

/** What a blank input gives: a blank result. */
export const blank = "";

/**
 * How a number argument is converted into its reference unit: the factor, the power of h = H0/100 of
 * the cell's model still to apply (h-scaled units such as Mpc/h; 0 otherwise) and the unit the user gave.
 */
export type Conversion = { factor: number; hPower: number; unit: string };
/** Text that Excel's own functions would read as a number (CSV and archive pastes). */
const numberText = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

/** Normalises a raw argument to a matrix (undefined when omitted). */
export function toMatrix(raw: unknown): unknown[][] | undefined {
  if (raw === undefined || raw === null) return undefined;
  if (Array.isArray(raw)) {
    if (raw.length === 0) return undefined;
    if (!Array.isArray(raw[0])) return [raw as unknown[]];
    return raw[0].length === 0 ? undefined : (raw as unknown[][]);
  }
  return [[raw]];
}

/** Unit conversions already worked out, by argument and unit text (a sheet uses a handful of units). */
const conversionCache = new Map<Extract<ArgSpec, { kind: "unit" }>, Map<string, Conversion>>();

export function unitConversion(spec: Extract<ArgSpec, { kind: "unit" }>, raw: unknown): Conversion {
  const given = Array.isArray(raw) ? toMatrix(raw)?.[0]?.[0] : raw;
  const text = isBlank(given) ? spec.default : given;
  if (typeof text !== "string") throw new CellError("value", messages.notText(spec.name, text));
  let known = conversionCache.get(spec);
  const cached = known?.get(text);
  if (cached) return cached;
  let conversion: Conversion;
  try {
    const { factor, hPower } = spec.applies === "result" ? scaledConversion(spec.unit, text) : scaledConversion(text, spec.unit);
    conversion = { factor, hPower, unit: text.trim() };
  } catch (e) {
    throw new CellError("value", messages.unitArgument(spec.name, (e as Error).message));
  }
  if (!known) conversionCache.set(spec, (known = new Map()));
  if (known.size < 64) known.set(text, conversion);
  return conversion;
}

/** Marks an argument that is a range of more than one cell. */
export const several = Symbol("several cells");

/** The one value of an argument that is a single cell (or omitted: undefined), else `several`. */
export function singleCell(raw: unknown): unknown {
  if (!Array.isArray(raw)) return raw ?? undefined;
  if (raw.length !== 1) return raw.length === 0 ? undefined : several;
  const row = raw[0];
  if (!Array.isArray(row)) return raw.length === 1 ? row : several;
  return row.length === 1 ? row[0] : row.length === 0 ? undefined : several;
}

/** Reads one cell of a broadcast argument: its value, "" for a blank result, or an error. */
export function readArg(
  spec: ArgSpec,
  value: unknown,
  given: boolean,
  conversion: Conversion | undefined,
  active: ActiveModelSetting,
  modelOf: (spec: string) => Cosmology | CellError,
): number | string | Cosmology | CellError | undefined {
  if (spec.kind === "number" && typeof value === "number") return readNumber(spec, value, conversion);
  if (isIncomingError(value)) return new CellError("value", messages.inputError(spec.name));
  switch (spec.kind) {
    case "model": {
      if (isBlank(value)) return modelOf(active.spec);
      if (typeof value !== "string") return new CellError("value", messages.model(messages.notText("model", value)));
      const block = value.trim();
      return modelOf(block === "" ? active.spec : block);
    }
    case "number": {
      if (isBlank(value)) {
        if (given && !spec.blankMeansDefault) return blank;
        if (spec.default === undefined) return blank;
        return spec.default;
      }
      if (typeof value === "string" && numberText.test(value.trim())) return readNumber(spec, Number(value.trim()), conversion);
      return new CellError("value", messages.notANumber(spec.name, value));
    }
    case "numberOrText": {
      if (isBlank(value)) return spec.default;
      if (typeof value === "string" && numberText.test(value.trim())) return Number(value.trim());
      if (typeof value === "number" || typeof value === "string") return value;
      return new CellError("value", messages.notANumber(spec.name, value));
    }
    case "text": {
      if (isBlank(value)) return spec.optional ? undefined : blank;
      try {
        return readText(spec, value);
      } catch (e) {
        return classify(e, spec.name);
      }
    }
    default:
      return undefined;
  }
}

/** A number argument's value in its reference unit, after the checks of its domain in the user's unit. */
export function readNumber(spec: Extract<ArgSpec, { kind: "number" }>, x: number, conversion: Conversion | undefined): number | CellError {
  if (!Number.isFinite(x)) return new CellError("num", messages.notFinite(spec.name));
  if (spec.magnitude && Math.abs(x) >= 50) return new CellError("na", messages.missingMagnitude(spec.name, x));
  const factor = conversion === undefined ? 1 : conversion.factor;
  const reference = x * factor;
  if (spec.min !== undefined && (spec.minExclusive ? !(reference > spec.min) : !(reference >= spec.min))) {
    return new CellError("num", messages.belowMin(spec.name, x, conversion?.unit ?? "", spec.min / factor, spec.minExclusive === true));
  }
  if (spec.max !== undefined && reference > spec.max.value) {
    return new CellError("num", messages.aboveMax(spec.name, x, conversion?.unit ?? "", spec.max.value / factor, spec.max.what));
  }
  return reference;
}

export function readText(spec: Extract<ArgSpec, { kind: "text" }>, value: unknown): string {
  if (typeof value !== "string") throw new CellError("value", messages.notText(spec.name, value));
  const text = value.trim();
  if (!spec.choices) return text;
  const match = spec.choices.find((c) => c.toLowerCase() === text.toLowerCase());
  if (!match) throw new CellError("value", messages.choice(spec.name, text, spec.choices));
  return match;
}

