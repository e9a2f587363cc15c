/**
 * The one shared wrapper behind every worksheet function: coerces arguments, broadcasts ranges,
 * resolves models and units, maps core errors to Excel errors and cleans results (NaN/±Infinity →
 * #NUM!, −0 → 0). Each custom function is a declaration in `definitions.ts` evaluated here.
 *
 * `evaluate` is synchronous and host-free, so the task pane's cell inspector can ask it why a cell
 * holds an error: the CellError it returns carries the explanation.
 */
import { Cosmology, conversionFactor, formatModelSpec, NoSolutionError, parseModelSpec } from "../core/index.js";
import { readActiveModel, whenSettingsReady, type ActiveModelSetting } from "./activeModel.js";
import { CellError, isIncomingError, toHostError } from "./cellError.js";
import { messages } from "./messages.js";
import { isBlank, keyValueBlockSpec } from "./modelArgument.js";
import { modelFor } from "./modelCache.js";

/** What a worksheet cell can hold as a result. */
export type Cell = number | string | CellError;

/** How one argument is read. */
export type ArgSpec =
  | {
      /** A number (or range of numbers). */
      kind: "number";
      name: string;
      /** Value when the argument is omitted; absent means the argument is required. */
      default?: number;
      /** A blank cell inside the argument means the default (instead of a blank result). */
      blankMeansDefault?: boolean;
      /** Smallest allowed value, in the reference unit (checked in the unit the user gave). */
      min?: number;
      /** `min` itself is not allowed. */
      minExclusive?: boolean;
      /** Largest allowed value, in the reference unit, and what it is (e.g. "180°"). */
      max?: { value: number; what: string };
      /** A magnitude: |value| ≥ 50 is a catalogue's missing-value flag (#N/A). */
      magnitude?: boolean;
    }
  | { kind: "model"; name: string }
  | {
      /** Text (or range of text), optionally one of fixed choices (matched case-insensitively). */
      kind: "text";
      name: string;
      choices?: readonly string[];
      /** Scalar: read once, not broadcast. */
      scalar?: boolean;
      /** May be omitted or blank: read as "" when scalar, as absent otherwise (no blank result). */
      optional?: boolean;
    }
  | {
      /** A number or text, passed through (e.g. mnu as "0.05,0.01"). */
      kind: "numberOrText";
      name: string;
      default?: number | string;
    }
  | {
      /**
       * A unit (scalar text, `default` when blank): converts the named number argument from it into
       * the reference unit `unit` the computation uses, or, with applies "result", the result from
       * `unit` into it.
       */
      kind: "unit";
      name: string;
      unit: string;
      default: string;
      applies: string;
    };

/** The resolved arguments of one cell, by name (units already applied). */
export type Args = Record<string, number | string | Cosmology | undefined>;

/** A worksheet function as data: its arguments and what it computes for one cell. */
export interface FunctionDef {
  /** Name as typed after "ZC.", e.g. "DIST_LUM". */
  name: string;
  args: ArgSpec[];
  /** The value for one cell, in the reference units of the unit arguments. */
  compute?: (a: Args) => number | string;
  /** For functions that return a whole table at once (ZC.PRESETS). */
  table?: (active: ActiveModelSetting) => Cell[][];
}

const maxCells = 4_194_304;
const blank = "";

type Prepared = { spec: ArgSpec; matrix: unknown[][] | undefined; rows: number; cols: number };
/** How a number argument is converted into its reference unit: the factor and the unit the user gave. */
type Conversion = { factor: number; unit: string };

/** Text that Excel's own functions would read as a number (CSV and archive pastes). */
const numberText = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

/** Normalises a raw argument to a matrix (undefined when omitted). */
function toMatrix(raw: unknown): unknown[][] | undefined {
  if (raw === undefined || raw === null) return undefined;
  if (Array.isArray(raw)) {
    if (raw.length === 0) return undefined;
    if (!Array.isArray(raw[0])) return [raw as unknown[]];
    return raw[0].length === 0 ? undefined : (raw as unknown[][]);
  }
  return [[raw]];
}

function classify(e: unknown, fn: string): CellError {
  if (e instanceof CellError) return e;
  if (e instanceof NoSolutionError) return new CellError("na", e.message);
  if (e instanceof RangeError) return new CellError("num", e.message);
  if (e instanceof TypeError) return new CellError("value", e.message);
  return new CellError("value", messages.internal(fn, e instanceof Error ? e.message : String(e)));
}

/** The error as the sheet shows it, naming the function (one object per distinct error of a call). */
function inFunction(e: CellError, fn: string, seen: Map<CellError, CellError>): CellError {
  let named = seen.get(e);
  if (!named) {
    const message = messages.inFunction(fn, e.message);
    named = message === e.message ? e : new CellError(e.kind, message);
    seen.set(e, named);
  }
  return named;
}

/**
 * The spec text a model argument stands for: a name defined in the workbook (alone or with changes)
 * becomes the canonical spec of its parameters, so that the model cache never keeps a stale meaning.
 */
function resolvedSpec(text: string, active: ActiveModelSetting): string {
  const models = active.models;
  if (!models || models.specs.size === 0) return text;
  const first = text.split(";", 1)[0].trim().toUpperCase();
  return models.specs.has(first) ? formatModelSpec(parseModelSpec(text, models.named)) : text;
}

function unitConversion(spec: Extract<ArgSpec, { kind: "unit" }>, raw: unknown): Conversion {
  const given = toMatrix(raw)?.[0]?.[0];
  const text = isBlank(given) ? spec.default : given;
  if (typeof text !== "string") throw new CellError("value", messages.notText(spec.name, text));
  try {
    const factor = spec.applies === "result" ? conversionFactor(spec.unit, text) : conversionFactor(text, spec.unit);
    return { factor, unit: text.trim() };
  } catch (e) {
    throw new CellError("value", messages.unitArgument(spec.name, (e as Error).message));
  }
}

/**
 * Evaluates a function over its (possibly range) arguments.
 *
 * @param def the function's declaration
 * @param raw the arguments as Excel passes them (numbers, text, booleans, null, or 2-D arrays)
 * @param active the workbook's active model setting (blank/omitted model arguments use it)
 * @returns the result matrix: numbers, text, "" for blank, CellError for a bad cell
 */
export function evaluate(def: FunctionDef, raw: readonly unknown[], active: ActiveModelSetting): Cell[][] {
  try {
    if (def.table) return def.table(active);
    return evaluateCells(def, raw, active);
  } catch (e) {
    return [[inFunction(classify(e, def.name), def.name, new Map())]];
  }
}

function evaluateCells(def: FunctionDef, raw: readonly unknown[], active: ActiveModelSetting): Cell[][] {
  const compute = def.compute!;
  const inputFactors = new Map<string, Conversion>();
  let resultFactor = 1;
  const prepared: Prepared[] = [];
  const scalars: Args = {};
  def.args.forEach((spec, index) => {
    const value = raw[index];
    if (spec.kind === "unit") {
      const conversion = unitConversion(spec, value);
      if (spec.applies === "result") resultFactor *= conversion.factor;
      else inputFactors.set(spec.applies, conversion);
      return;
    }
    if (spec.kind === "text" && spec.scalar) {
      const text = toMatrix(value)?.[0]?.[0];
      scalars[spec.name] = spec.optional && isBlank(text) ? "" : readText(spec, text);
      return;
    }
    let matrix = toMatrix(value);
    if (spec.kind === "model" && matrix) {
      const block = keyValueBlockSpec(matrix);
      if (block !== undefined) matrix = [[block]];
    }
    if (!matrix && spec.kind === "number" && spec.default === undefined) {
      throw new CellError("value", `${spec.name} is required`);
    }
    prepared.push({ spec, matrix, rows: matrix?.length ?? 1, cols: matrix?.[0]?.length ?? 1 });
  });

  let rows = 1;
  let cols = 1;
  let rowsFrom = prepared[0];
  let colsFrom = prepared[0];
  for (const p of prepared) {
    if (p.rows !== 1) {
      if (rows !== 1 && p.rows !== rows) {
        throw new CellError("value", messages.shapes(rowsFrom.spec.name, rowsFrom.rows, rowsFrom.cols, p.spec.name, p.rows, p.cols));
      }
      rows = p.rows;
      rowsFrom = p;
    }
    if (p.cols !== 1) {
      if (cols !== 1 && p.cols !== cols) {
        throw new CellError("value", messages.shapes(colsFrom.spec.name, colsFrom.rows, colsFrom.cols, p.spec.name, p.rows, p.cols));
      }
      cols = p.cols;
      colsFrom = p;
    }
  }
  if (rows * cols > maxCells) throw new CellError("value", messages.tooLarge(rows * cols));

  const models = new Map<string, Cosmology | CellError>();
  const modelOf = (spec: string): Cosmology | CellError => {
    let m = models.get(spec);
    if (m === undefined) {
      try {
        m = modelFor(resolvedSpec(spec, active));
      } catch (e) {
        const err = classify(e, def.name);
        m = new CellError(err.kind, messages.model(err.message));
      }
      models.set(spec, m);
    }
    return m;
  };

  // One args object of fixed shape for every cell; single-cell arguments are read once, up front.
  const args: Args = { ...scalars };
  for (const p of prepared) args[p.spec.name] = undefined;
  let constantCell: Cell | undefined;
  const varying: Prepared[] = [];
  for (const p of prepared) {
    if (p.rows !== 1 || p.cols !== 1) {
      varying.push(p);
      continue;
    }
    const read = readArg(p, p.matrix?.[0][0], active, modelOf, inputFactors);
    if (read instanceof CellError || read === blank) constantCell ??= read;
    else args[p.spec.name] = read;
  }
  const named = new Map<CellError, CellError>();
  const out: Cell[][] = new Array(rows);
  for (let r = 0; r < rows; r++) {
    const row: Cell[] = new Array(cols);
    for (let c = 0; c < cols; c++) {
      let cell: Cell | undefined = constantCell;
      for (let k = 0; k < varying.length && cell === undefined; k++) {
        const p = varying[k];
        const value = p.matrix![p.rows === 1 ? 0 : r][p.cols === 1 ? 0 : c];
        const read = readArg(p, value, active, modelOf, inputFactors);
        if (read instanceof CellError || read === blank) cell = read;
        else args[p.spec.name] = read;
      }
      if (cell === undefined) {
        try {
          const result = compute(args);
          cell = typeof result === "number" ? cleanNumber(result * resultFactor, def.name) : result;
        } catch (e) {
          cell = classify(e, def.name);
        }
      }
      row[c] = cell instanceof CellError ? inFunction(cell, def.name, named) : cell;
    }
    out[r] = row;
  }
  return out;
}

/** Reads one cell of a broadcast argument: its value, "" for a blank result, or an error. */
function readArg(
  p: Prepared,
  value: unknown,
  active: ActiveModelSetting,
  modelOf: (spec: string) => Cosmology | CellError,
  inputFactors: Map<string, Conversion>,
): number | string | Cosmology | CellError | undefined {
  const spec = p.spec;
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
        if (p.matrix && !spec.blankMeansDefault) return blank;
        if (spec.default === undefined) return blank;
        return spec.default;
      }
      let x = value;
      if (typeof x === "string" && numberText.test(x.trim())) x = Number(x.trim());
      if (typeof x !== "number") return new CellError("value", messages.notANumber(spec.name, value));
      if (!Number.isFinite(x)) return new CellError("num", messages.notFinite(spec.name));
      if (spec.magnitude && Math.abs(x) >= 50) return new CellError("na", messages.missingMagnitude(spec.name, x));
      const conversion = inputFactors.get(spec.name);
      const factor = conversion?.factor ?? 1;
      const reference = x * factor;
      if (spec.min !== undefined && (spec.minExclusive ? !(reference > spec.min) : !(reference >= spec.min))) {
        return new CellError("num", messages.belowMin(spec.name, x, conversion?.unit ?? "", spec.min / factor, spec.minExclusive === true));
      }
      if (spec.max !== undefined && reference > spec.max.value) {
        return new CellError("num", messages.aboveMax(spec.name, x, conversion?.unit ?? "", spec.max.value / factor, spec.max.what));
      }
      return reference;
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

function readText(spec: Extract<ArgSpec, { kind: "text" }>, value: unknown): string {
  if (typeof value !== "string") throw new CellError("value", messages.notText(spec.name, value));
  const text = value.trim();
  if (!spec.choices) return text;
  const match = spec.choices.find((c) => c.toLowerCase() === text.toLowerCase());
  if (!match) throw new CellError("value", messages.choice(spec.name, text, spec.choices));
  return match;
}

function cleanNumber(x: number, fn: string): number | CellError {
  if (!Number.isFinite(x)) return new CellError("num", messages.notFiniteResult(fn));
  return x === 0 ? 0 : x;
}

/**
 * What a custom function returns to Excel: waits for the workbook's settings, evaluates, and turns
 * CellErrors into host error values. Never throws.
 */
export async function callFromSheet(def: FunctionDef, raw: readonly unknown[]): Promise<unknown[][]> {
  try {
    await whenSettingsReady();
    const cells: unknown[][] = evaluate(def, raw, readActiveModel());
    for (const row of cells) {
      for (let c = 0; c < row.length; c++) if (row[c] instanceof CellError) row[c] = toHostError(row[c] as CellError);
    }
    return cells;
  } catch (e) {
    return [[toHostError(classify(e, def.name))]];
  }
}
