/**
 * Reading a call's arguments, all of them, once, before anything is computed: units (conversions
 * cached) and scalar texts, then every cell argument, single or range, into a typed form (numbers in
 * their reference unit with the domain checked in the unit the user gave, text numbers too; texts;
 * models resolved; errors and blanks as they will show). `evaluate.ts` then only computes.
 */
import { Cosmology, isNumberText, MissingParameterError, parseUnit } from "../core/index.js";
import type { ActiveModelSetting } from "./activeModel.js";
import { CellError, classify, isIncomingError } from "./cellError.js";
import { modelPairs } from "./definitions/argumentKinds.js";
import type { Args, ArgSpec, FunctionDef } from "./FunctionDef.js";
import { messages } from "./messages.js";
import { isBlank, isModelText, keyValueBlockSpec } from "./modelArgument.js";
import { modelFor } from "./modelCache.js";
import { unitConversion, type Conversion } from "./unitArgument.js";
import { isLatitude, positionOrNaN, positionPart, positionParts, readPosition } from "./readPositions.js";
import { resolvedSpec } from "./workbookModels.js";

/** Cells one call may return (4 × 1,048,576: four whole columns, our choice). */
const maxCells = 4_194_304;
/** Models one range call keeps at hand besides the shared cache (modelCache.ts): bounds its memory. */
const modelsHeldPerCall = 16;

/** One cell of an argument as read: its value in the reference unit, "" (blank result) or an error. */
export type ReadCell = number | string | Cosmology | CellError | undefined;

/**
 * An argument given as a range of more than one cell, every cell read (row-major, rows × cols): see
 * `cellAt`. A column of numbers keeps them in `numbers` (NaN where the cell read as something else,
 * kept in `others`). A range of models holds each cell's spec text, checked, and `model` turns it into
 * the model when its cell is computed: a column of thousands of distinct specs then holds only a few
 * models at a time.
 */
export interface Column {
  name: string;
  rows: number;
  cols: number;
  numbers: Float64Array | undefined;
  others: Map<number, ReadCell>;
  model?: (spec: string) => Cosmology | CellError;
}

/** Cell `i` (row-major) of a range argument, as read. */
export function cellAt(column: Column, i: number): ReadCell {
  const x = column.numbers === undefined ? Number.NaN : column.numbers[i];
  return x === x ? x : column.others.get(i);
}

/** Powers of h = H0/100 of the cell's model still to apply for h-scaled units: by argument, and on the result. */
export type HScaling = { args: [name: string, power: number][]; result: number };

/** A call's arguments, read: what `evaluate.ts` computes from. */
export interface CallArguments {
  /** Shape of the result (1 × 1 when no argument is a range). */
  rows: number;
  cols: number;
  /** Every argument given as one cell (or a unit, or a scalar text), by name, read. */
  args: Args;
  /**
   * The first of those that is an error or blank: every cell of the result shows it, unless one of
   * the ranges before it in the signature (`ranges` up to `rangesBeforeProblem`) is an error or blank there.
   */
  problem: CellError | typeof blank | undefined;
  rangesBeforeProblem: number;
  /** Arguments given as ranges, in the order of the signature. */
  ranges: readonly Column[];
  /** Factor of the result into the output unit the user asked for. */
  resultFactor: number;
  /** h-scaled units still to apply with each cell's model, when any. */
  h: HScaling | undefined;
}

/** What a blank input gives: a blank result. */
export const blank = "";

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

/** Marks an argument that is a range of more than one cell. */
const several = Symbol("several cells");

/** The one value of an argument that is a single cell (or omitted: undefined), else `several`. */
function singleCell(raw: unknown): unknown {
  if (!Array.isArray(raw)) return raw ?? undefined;
  if (raw.length !== 1) return raw.length === 0 ? undefined : several;
  const row = raw[0];
  if (!Array.isArray(row)) return row;
  return row.length === 1 ? row[0] : row.length === 0 ? undefined : several;
}

/** The spec text of one cell of a model argument `name` (blank: the active model's), or an error. */
function modelText(name: string, value: unknown, active: ActiveModelSetting): string | CellError {
  if (isIncomingError(value)) return new CellError("value", messages.inputError(name));
  if (isBlank(value)) return active.spec;
  if (typeof value !== "string") return new CellError("value", messages.notText(name, value));
  const block = value.trim();
  return block === "" ? active.spec : block;
}

/** Reads one cell of an argument: its value, "" for a blank result, or an error. */
function readArg(
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
      const text = modelText(spec.name, value, active);
      return text instanceof CellError ? text : modelOf(text);
    }
    case "number": {
      if (isBlank(value)) {
        // a blank meaning the default, or left out: such an argument has a default (one without is required)
        return given && !spec.blankMeansDefault ? blank : spec.default;
      }
      if (typeof value === "string") {
        // text that reads as a number is one (as Excel's own functions read it), in a position too:
        // degrees, or the angle unit given ("12" in a right ascension is 12°, "12h" is 12 hours)
        const text = value.trim();
        if (isNumberText(text)) return readNumber(spec, Number(text), conversion);
        if (spec.sexagesimal) return readPosition(spec, value, conversion?.part);
      }
      return new CellError("value", messages.notANumber(spec.name, value));
    }
    case "numberOrText": {
      if (isBlank(value)) return spec.default;
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
function readNumber(spec: Extract<ArgSpec, { kind: "number" }>, x: number, conversion: Conversion | undefined): number | CellError {
  if (!Number.isFinite(x)) return new CellError("num", messages.notFinite(spec.name));
  if (spec.magnitude && Math.abs(x) >= 50) return new CellError("na", messages.missingMagnitude(spec.name, x));
  const factor = conversion === undefined ? 1 : conversion.factor;
  const reference = x * factor;
  const pole = spec.sexagesimal === "dec" || spec.sexagesimal === "lat" ? spec.sexagesimal : undefined;
  if (pole && !(reference >= -90 && reference <= 90)) return new CellError("num", messages.beyondPole(spec.name, x, conversion?.unit ?? "", pole));
  if (spec.min !== undefined && (spec.minExclusive ? !(reference > spec.min) : !(reference >= spec.min))) {
    return new CellError("num", messages.belowMin(spec.name, x, conversion?.unit ?? "", spec.min / factor, spec.minExclusive === true));
  }
  if (spec.max !== undefined && reference > spec.max.value) {
    return new CellError("num", messages.aboveMax(spec.name, x, conversion?.unit ?? "", spec.max.value / factor, spec.max.what));
  }
  return reference;
}

/**
 * A choice as compared: case, spaces, "_" and "-" aside ("dark energy" is darkenergy, as model keys
 * ignore spaces). No two choices of a function read alike (test/sheetMessages.test.ts).
 */
export function choiceKey(text: string): string {
  return text.toLowerCase().replace(/[\s_-]/g, "");
}

function readText(spec: Extract<ArgSpec, { kind: "text" }>, value: unknown): string {
  if (typeof value !== "string") throw new CellError("value", messages.notText(spec.name, value));
  const text = value.trim();
  if (!spec.choices) return text;
  const key = choiceKey(text);
  const match = spec.choices.find((c) => choiceKey(c) === key);
  if (!match) throw new CellError("value", messages.choice(spec.name, text, spec.choices));
  return match;
}

/** An argument that may not be left out: a number without a default, text not marked optional, a model marked required. */
function isRequired(spec: ArgSpec): boolean {
  return (
    (spec.kind === "number" && spec.default === undefined) || (spec.kind === "text" && spec.optional !== true) || (spec.kind === "model" && spec.required === true)
  );
}

/** Which arguments of a function are units, scalar texts and cell values: worked out once per function. */
interface Plan {
  units: number[];
  scalarTexts: number[];
  cells: number[];
}
const plans = new WeakMap<FunctionDef, Plan>();

function planOf(def: FunctionDef): Plan {
  let plan = plans.get(def);
  if (!plan) {
    plan = { units: [], scalarTexts: [], cells: [] };
    def.args.forEach((spec, i) => {
      if (spec.kind === "unit") plan!.units.push(i);
      else if (spec.kind === "text" && spec.scalar) plan!.scalarTexts.push(i);
      else plan!.cells.push(i);
    });
    plans.set(def, plan);
  }
  return plan;
}

/**
 * Reads a call's arguments. Units and scalar texts first (one value whatever the shape of the
 * others), then the cell arguments: when each is one cell (one formula a row), straight into `args`;
 * otherwise as matrices broadcast to one shape, single cells into `args` and ranges into columns.
 *
 * @param def the function's declaration
 * @param raw the arguments as Excel passes them (numbers, text, booleans, null, or 2-D arrays)
 * @param active the workbook's active model setting (blank/omitted model arguments use it)
 * @throws CellError for what spoils the whole call: a bad unit or scalar text, a required argument
 *   omitted, ranges of different shapes, a result of more than 4,194,304 cells
 */
export function readCall(def: FunctionDef, raw: readonly unknown[], active: ActiveModelSetting): CallArguments {
  const plan = planOf(def);
  const { conversions, resultFactor, args, h } = readFixed(def, raw, plan);
  const specs = def.args;
  const cells = plan.cells;
  if (resolverFor?.active !== active) resolverFor = { active, resolve: (text) => singleModel(text, active) };
  const resolve = resolverFor.resolve;
  let problem: CellError | typeof blank | undefined;
  for (let k = 0; k < cells.length; k++) {
    const i = cells[k];
    const value = singleCell(raw[i]);
    if (value === several) return readRanges(def, raw, active, { conversions, resultFactor, args, h });
    const spec = specs[i];
    if (value === undefined && isRequired(spec)) throw new CellError("value", messages.required(spec.name));
    if (problem !== undefined) continue; // the first bad argument decides; the rest must still be single cells and given
    const read = readArg(spec, value, raw[i] !== undefined && raw[i] !== null, conversions[spec.name], active, resolve);
    if (read instanceof CellError || read === blank) problem = read;
    else args[spec.name] = read;
  }
  return { rows: 1, cols: 1, args, problem, rangesBeforeProblem: 0, ranges: noRanges, resultFactor, h };
}

/** The ranges of a call with none (shared: one formula a row allocates no list). */
const noRanges: readonly Column[] = [];

type Fixed = { conversions: Record<string, Conversion>; resultFactor: number; args: Args; h: HScaling | undefined };

/**
 * The arguments read once per call whatever the shape of the others: units (their conversions, the
 * factor of the result, and any h-scaling left for the cell's model) and scalar texts (into a fresh
 * args object). Each must be one cell: it applies to every cell of the result.
 */
function readFixed(def: FunctionDef, raw: readonly unknown[], plan: Plan): Fixed {
  const conversions: Record<string, Conversion> = {};
  let resultFactor = 1;
  let h: HScaling | undefined;
  const args: Args = {};
  for (const i of plan.units) {
    const spec = def.args[i] as Extract<ArgSpec, { kind: "unit" }>;
    if (singleCell(raw[i]) === several) throw new CellError("value", messages.oneValueOnly(spec.name));
    let conversion: Conversion;
    try {
      conversion = unitConversion(def.name, spec, Array.isArray(raw[i]) ? toMatrix(raw[i])?.[0][0] : raw[i]);
    } catch (e) {
      throw unitInModelSlot(def, raw) ?? e;
    }
    args[spec.name] = conversion.unit; // the unit as the user gave it, for a message in it
    if (conversion.hPower !== 0) h ??= { args: [], result: 0 };
    if (spec.applies === "result") {
      resultFactor *= conversion.factor;
      if (h) h.result += conversion.hPower;
    } else {
      for (const name of typeof spec.applies === "string" ? [spec.applies] : spec.applies) {
        conversions[name] = conversion.unit === "hourangle" && isLatitude(def, name) ? unitConversion(def.name, spec, "deg") : conversion;
        if (conversion.hPower !== 0) h!.args.push([name, conversion.hPower]);
      }
    }
  }
  for (const i of plan.scalarTexts) {
    const spec = def.args[i] as Extract<ArgSpec, { kind: "text" }>;
    if (singleCell(raw[i]) === several) throw new CellError("value", messages.oneValueOnly(spec.name));
    const text = toMatrix(raw[i])?.[0][0];
    if (isBlank(text) && !spec.optional) throw new CellError("value", messages.required(spec.name));
    const read = isBlank(text) ? "" : readText(spec, text);
    args[spec.name] = read;
    if (spec.unit) {
      if (read !== "") checkTextUnit(spec.name, read, def, raw);
      const shown = read || (spec.blank && "typed" in spec.blank ? spec.blank.typed : undefined);
      if (shown) for (const name of spec.unit.applies ?? []) conversions[name] = { factor: 1, hPower: 0, unit: shown };
    }
  }
  for (const [name, part] of positionParts(def, args)) conversions[name] = { ...(conversions[name] ?? { factor: 1, hPower: 0, unit: "" }), part };
  // a number in a fixed unit (MAG_AB's wavelength in Angstrom): its messages quote it in that unit
  for (const spec of def.args) if (spec.kind === "number" && spec.unit !== undefined) conversions[spec.name] ??= { factor: 1, hPower: 0, unit: spec.unit };
  return { conversions, resultFactor, args, h };
}

/**
 * A unit that compute converts itself (`unit` on a text argument): it must parse, or the call is
 * #VALUE! naming the argument (a model typed one place late, or a unit one place early, said so).
 */
function checkTextUnit(name: string, text: string, def: FunctionDef, raw: readonly unknown[]): void {
  try {
    parseUnit(text);
  } catch (e) {
    throw unitInModelSlot(def, raw) ?? new CellError("value", isModelText(text) ? messages.modelInUnitSlot(name, text) : messages.unitArgument(name, (e as Error).message));
  }
}

/** Model resolution for single cells, made again only when the settings are read anew. */
let resolverFor: { active: ActiveModelSetting; resolve: (text: string) => Cosmology | CellError } | undefined;

function singleModel(text: string, active: ActiveModelSetting): Cosmology | CellError {
  try {
    return modelFor(resolvedSpec(text, active.models));
  } catch (e) {
    return modelProblem(e, text, "model");
  }
}

/**
 * When a call's units do not read because they sit one place early, in the model's slot (the model
 * left out, not left blank: ZC.LUMINOSITY(F2, B2, "erg/s/cm2", "Lsun")), the error that says so.
 */
function unitInModelSlot(def: FunctionDef, raw: readonly unknown[]): CellError | undefined {
  const given = singleCell(raw[def.args.findIndex((a) => a.kind === "model")]); // no model argument: raw[-1], undefined
  try {
    // throws for all but a unit: not text, blank, or a model (no preset or key=value spec reads as one)
    parseUnit(given as string);
  } catch {
    return undefined;
  }
  return new CellError("value", messages.unitInModelSlot((given as string).trim()));
}

/** Why a model argument's text gives no model: a unit typed where the model belongs, or the spec's own problem. */
function modelProblem(e: unknown, text: string, fn: string): CellError {
  try {
    parseUnit(text);
    return new CellError("value", messages.unitInModelSlot(text));
  } catch {
    const err = classify(e, fn);
    const detail = e instanceof MissingParameterError ? messages.missingParameter(err.message, e.given, modelPairs) : err.message;
    return new CellError(err.kind, messages.model(detail));
  }
}

/**
 * Model resolution for one call over ranges: the last model asked for is kept at hand, a few others
 * in a map (bounded, so that a column of thousands of distinct specs holds no more models than the
 * shared LRU cache does).
 */
function modelsOfCall(active: ActiveModelSetting, fn: string): (spec: string) => Cosmology | CellError {
  let lastSpec: string | undefined;
  let lastModel: Cosmology | CellError | undefined;
  let others: Map<string, Cosmology | CellError> | undefined;
  return (spec) => {
    if (spec === lastSpec) return lastModel!;
    let m = others?.get(spec);
    if (m === undefined) {
      try {
        m = modelFor(resolvedSpec(spec, active.models));
      } catch (e) {
        m = modelProblem(e, spec, fn);
      }
      others ??= new Map();
      if (others.size >= modelsHeldPerCall) others.delete(others.keys().next().value as string);
      others.set(spec, m);
    }
    lastSpec = spec;
    lastModel = m;
    return m;
  };
}

/** The cell arguments when some is a range: broadcast to one shape, every cell read. */
function readRanges(def: FunctionDef, raw: readonly unknown[], active: ActiveModelSetting, fixed: Fixed): CallArguments {
  const { conversions, args } = fixed;
  type Given = { spec: ArgSpec; matrix: unknown[][] | undefined; rows: number; cols: number };
  const given: Given[] = [];
  for (const index of planOf(def).cells) {
    const spec = def.args[index];
    let matrix = toMatrix(raw[index]);
    if (spec.kind === "model" && matrix) {
      const block = keyValueBlockSpec(matrix);
      if (block !== undefined) matrix = [[block]];
    }
    if (!matrix && isRequired(spec)) throw new CellError("value", messages.required(spec.name));
    given.push({ spec, matrix, rows: matrix?.length ?? 1, cols: matrix?.[0].length ?? 1 });
  }

  let rows = 1;
  let cols = 1;
  let rowsFrom = given[0];
  let colsFrom = given[0];
  for (const g of given) {
    if (g.rows !== 1) {
      if (rows !== 1 && g.rows !== rows) throw new CellError("value", messages.shapes(rowsFrom.spec.name, rowsFrom.rows, rowsFrom.cols, g.spec.name, g.rows, g.cols));
      rows = g.rows;
      rowsFrom = g;
    }
    if (g.cols !== 1) {
      if (cols !== 1 && g.cols !== cols) throw new CellError("value", messages.shapes(colsFrom.spec.name, colsFrom.rows, colsFrom.cols, g.spec.name, g.rows, g.cols));
      cols = g.cols;
      colsFrom = g;
    }
  }
  if (rows * cols > maxCells) throw new CellError("value", messages.tooLarge(rows * cols, maxCells));

  const modelOf = modelsOfCall(active, def.name);
  // one args object of fixed shape for every cell
  for (const g of given) args[g.spec.name] = undefined;
  let problem: CellError | typeof blank | undefined;
  let rangesBeforeProblem = 0;
  const ranges: Column[] = [];
  for (const g of given) {
    const conversion = conversions[g.spec.name];
    if (g.rows === 1 && g.cols === 1) {
      const read = readArg(g.spec, g.matrix?.[0][0], g.matrix !== undefined, conversion, active, modelOf);
      if (read instanceof CellError || read === blank) {
        if (problem === undefined) rangesBeforeProblem = ranges.length;
        problem ??= read;
      } else args[g.spec.name] = read;
    } else {
      const column: Column = { name: g.spec.name, rows: g.rows, cols: g.cols, numbers: undefined, others: new Map() };
      readColumn(column, g.spec, g.matrix!, conversion, active, modelOf);
      if (g.spec.kind === "model") column.model = modelOf;
      ranges.push(column);
    }
  }
  return { rows, cols, args, problem, rangesBeforeProblem, ranges, resultFactor: fixed.resultFactor, h: fixed.h };
}

/** Reads every cell of a range argument into `column` (row-major). */
function readColumn(
  column: Column,
  spec: ArgSpec,
  matrix: unknown[][],
  conversion: Conversion | undefined,
  active: ActiveModelSetting,
  modelOf: (spec: string) => Cosmology | CellError,
): void {
  const others = column.others;
  let i = 0;
  if (spec.kind !== "number") {
    for (const row of matrix) {
      for (const value of row) others.set(i++, spec.kind === "model" ? modelText(spec.name, value, active) : readArg(spec, value, true, conversion, active, modelOf));
    }
    return;
  }
  const numbers = (column.numbers = new Float64Array(column.rows * column.cols));
  // the common range, plain numbers with no domain to check: only the unit's factor
  const plain = !spec.magnitude && spec.min === undefined && spec.max === undefined;
  const factor = conversion === undefined ? 1 : conversion.factor;
  const part = positionPart(spec, conversion?.part); // positions as text, read straight into degrees (readArg: the rest, and errors' words)
  for (const row of matrix) {
    for (const value of row) {
      const degrees = part !== undefined && typeof value === "string" ? positionOrNaN(value, part) : Number.NaN;
      let read: ReadCell = plain && typeof value === "number" && value - value === 0 ? value * factor : degrees === degrees ? degrees : readArg(spec, value, true, conversion, active, modelOf);
      if (typeof read === "number" && read === read) numbers[i] = read;
      else {
        numbers[i] = Number.NaN;
        others.set(i, read);
      }
      i++;
    }
  }
}
