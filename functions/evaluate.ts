/**
 * The one shared wrapper behind every worksheet function: coerces arguments, broadcasts ranges,
 * resolves models and units, maps core errors to Excel errors and cleans results (NaN/±Infinity →
 * #NUM!, −0 → 0). Each custom function is a declaration in `definitions.ts` evaluated here.
 *
 * `evaluate` is synchronous and host-free, so the task pane's cell inspector can ask it why a cell
 * holds an error: the CellError it returns carries the explanation.
 */
import { Cosmology } from "../core/index.js";
import { readActiveModel, settingsReady, whenSettingsReady, type ActiveModelSetting } from "./activeModel.js";
import { CellError, classify, inFunction, toHostError } from "./cellError.js";
import type { Args, ArgSpec, Cell, FunctionDef } from "./FunctionDef.js";
import { messages } from "./messages.js";
import { isBlank, keyValueBlockSpec } from "./modelArgument.js";
import { modelFor } from "./modelCache.js";
import { resolvedSpec } from "./workbookModels.js";
import { blank, readArg, readText, several, singleCell, toMatrix, unitConversion, type Conversion } from "./readArgument.js";

export type { Args, ArgSpec, Cell, FunctionDef } from "./FunctionDef.js";

const maxCells = 4_194_304;
/** Models one range call keeps at hand besides the shared cache (modelCache.ts): bounds its memory. */
const modelsHeldPerCall = 16;

type Prepared = { spec: ArgSpec; matrix: unknown[][] | undefined; rows: number; cols: number; conversion: Conversion | undefined };

/**
 * Evaluates a function over its (possibly range) arguments.
 *
 * @param def the function's declaration
 * @param raw the arguments as Excel passes them (numbers, text, booleans, null, or 2-D arrays)
 * @param active the workbook's active model setting (blank/omitted model arguments use it)
 * @returns the result matrix: numbers, text, "" for blank, CellError for a bad cell
 */
export function evaluate(def: FunctionDef, raw: readonly unknown[], active: ActiveModelSetting): Cell[][] {
  return evaluateNoting(def, raw, active, { error: false });
}

/** `evaluate`, noting in `seen.error` whether a range produced an error cell (a single cell: always noted). */
function evaluateNoting(def: FunctionDef, raw: readonly unknown[], active: ActiveModelSetting, seen: { error: boolean }): Cell[][] {
  try {
    if (def.table) {
      seen.error = true;
      return def.table(active);
    }
    const one = evaluateSingle(def, raw, active);
    if (one !== undefined) {
      if (one instanceof CellError) seen.error = true;
      return [[one]];
    }
    return evaluateCells(def, raw, active, seen);
  } catch (e) {
    seen.error = true;
    return [[inFunction(classify(e, def.name), def.name, new Map())]];
  }
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

/** Powers of h = H0/100 of the cell's model still to apply for h-scaled units: by argument, and on the result. */
type HScaling = { args: [name: string, power: number][]; result: number };

/**
 * The arguments read once per call whatever the shape of the others: units (their conversions, the
 * factor of the result, and any h-scaling left for the cell's model) and scalar texts (into a fresh
 * args object).
 */
function readFixed(
  def: FunctionDef,
  raw: readonly unknown[],
  plan: Plan,
): { conversions: Record<string, Conversion>; resultFactor: number; args: Args; h: HScaling | undefined } {
  const conversions: Record<string, Conversion> = {};
  let resultFactor = 1;
  let h: HScaling | undefined;
  const args: Args = {};
  for (const i of plan.units) {
    const spec = def.args[i] as Extract<ArgSpec, { kind: "unit" }>;
    const conversion = unitConversion(spec, raw[i]);
    if (conversion.hPower !== 0) h ??= { args: [], result: 0 };
    if (spec.applies === "result") {
      resultFactor *= conversion.factor;
      if (h) h.result += conversion.hPower;
    } else {
      for (const name of typeof spec.applies === "string" ? [spec.applies] : spec.applies) {
        conversions[name] = conversion;
        if (conversion.hPower !== 0) h!.args.push([name, conversion.hPower]);
      }
    }
  }
  for (const i of plan.scalarTexts) {
    const spec = def.args[i] as Extract<ArgSpec, { kind: "text" }>;
    const text = toMatrix(raw[i])?.[0]?.[0];
    args[spec.name] = spec.optional && isBlank(text) ? "" : readText(spec, text);
  }
  return { conversions, resultFactor, args, h };
}

/** The arguments of one cell with h-scaled units applied (h of the cell's model), and the result's h factor. */
function scaledByH(args: Args, h: HScaling): { args: Args; factor: number } {
  const model = args.model;
  if (!(model instanceof Cosmology)) throw new TypeError(messages.hScaledWithoutModel);
  const scaled = { ...args };
  for (const [name, power] of h.args) if (typeof scaled[name] === "number") scaled[name] = (scaled[name] as number) * model.h ** power;
  return { args: scaled, factor: model.h ** h.result };
}

/** compute for one cell, with h-scaled units applied when the call has any. */
function computeCell(def: FunctionDef, args: Args, h: HScaling | undefined): number | string {
  if (!h) return def.compute!(args);
  const scaled = scaledByH(args, h);
  const result = def.compute!(scaled.args);
  return typeof result === "number" ? result * scaled.factor : result;
}

/** Model resolution for single cells, made again only when the settings are read anew. */
let resolverFor: { active: ActiveModelSetting; resolve: (text: string) => Cosmology | CellError } | undefined;

/**
 * One formula per row: every argument a single cell. The same reading as the general path, without
 * its matrices and broadcasting; undefined when some argument is a range (the general path then runs).
 */
function evaluateSingle(def: FunctionDef, raw: readonly unknown[], active: ActiveModelSetting): Cell | undefined {
  const plan = planOf(def);
  const specs = def.args;
  const { conversions, resultFactor, args, h } = readFixed(def, raw, plan);
  if (resolverFor?.active !== active) resolverFor = { active, resolve: (text) => singleModel(text, active) };
  const resolve = resolverFor.resolve;
  let error: Cell | undefined;
  const cells = plan.cells;
  for (let k = 0; k < cells.length; k++) {
    const i = cells[k];
    const spec = specs[i];
    const given = raw[i];
    const value = singleCell(given);
    if (value === several) return undefined;
    if (error !== undefined) continue; // the first bad argument decides; the rest must still be single cells
    if (value === undefined && spec.kind === "number" && spec.default === undefined) throw new CellError("value", `${spec.name} is required`);
    const read = readArg(spec, value, given !== undefined && given !== null, conversions[spec.name], active, resolve);
    if (read instanceof CellError || read === blank) error = read;
    else args[spec.name] = read;
  }
  if (error !== undefined) return error instanceof CellError ? inFunction(error, def.name, new Map()) : error;
  try {
    const result = computeCell(def, args, h);
    const cell = typeof result === "number" ? cleanNumber(result * resultFactor, def.name) : result;
    return cell instanceof CellError ? inFunction(cell, def.name, new Map()) : cell;
  } catch (e) {
    return inFunction(classify(e, def.name), def.name, new Map());
  }
}

function singleModel(text: string, active: ActiveModelSetting): Cosmology | CellError {
  try {
    return modelFor(resolvedSpec(text, active.models));
  } catch (e) {
    const err = classify(e, "model");
    return new CellError(err.kind, messages.model(err.message));
  }
}

function evaluateCells(def: FunctionDef, raw: readonly unknown[], active: ActiveModelSetting, seen: { error: boolean }): Cell[][] {
  const plan = planOf(def);
  const { conversions, resultFactor, args, h } = readFixed(def, raw, plan);
  const prepared: Prepared[] = [];
  const specs = def.args;
  for (const index of plan.cells) {
    const spec = specs[index];
    const value = raw[index];
    let matrix = toMatrix(value);
    if (spec.kind === "model" && matrix) {
      const block = keyValueBlockSpec(matrix);
      if (block !== undefined) matrix = [[block]];
    }
    if (!matrix && spec.kind === "number" && spec.default === undefined) {
      throw new CellError("value", `${spec.name} is required`);
    }
    prepared.push({ spec, matrix, rows: matrix?.length ?? 1, cols: matrix?.[0]?.length ?? 1, conversion: conversions[spec.name] });
  }

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

  // models of this call: the last one asked for is kept at hand, a few others in a map (bounded, so that
  // a column of thousands of distinct specs holds no more models than the shared LRU cache does)
  let lastSpec: string | undefined;
  let lastModel: Cosmology | CellError | undefined;
  let others: Map<string, Cosmology | CellError> | undefined;
  const modelOf = (spec: string): Cosmology | CellError => {
    if (spec === lastSpec) return lastModel!;
    let m = others?.get(spec);
    if (m === undefined) {
      try {
        m = modelFor(resolvedSpec(spec, active.models));
      } catch (e) {
        const err = classify(e, def.name);
        m = new CellError(err.kind, messages.model(err.message));
      }
      others ??= new Map();
      if (others.size >= modelsHeldPerCall) others.delete(others.keys().next().value as string);
      others.set(spec, m);
    }
    lastSpec = spec;
    lastModel = m;
    return m;
  };

  // One args object of fixed shape for every cell; single-cell arguments are read once, up front.
  for (const p of prepared) args[p.spec.name] = undefined;
  let constantCell: Cell | undefined;
  const varying: Prepared[] = [];
  for (const p of prepared) {
    if (p.rows !== 1 || p.cols !== 1) {
      varying.push(p);
      continue;
    }
    const read = readArg(p.spec, p.matrix?.[0][0], p.matrix !== undefined, p.conversion, active, modelOf);
    if (read instanceof CellError || read === blank) constantCell ??= read;
    else args[p.spec.name] = read;
  }
  let named: Map<CellError, CellError> | undefined;
  const shown = (cell: Cell): Cell => {
    if (!(cell instanceof CellError)) return cell;
    seen.error = true;
    return inFunction(cell, def.name, (named ??= new Map()));
  };
  const cellOf = (): Cell => {
    try {
      const result = computeCell(def, args, h);
      return typeof result === "number" ? cleanNumber(result * resultFactor, def.name) : result;
    } catch (e) {
      return classify(e, def.name);
    }
  };

  const out: Cell[][] = new Array(rows);
  const p = varying[0];
  const kernel = def.kernel !== undefined && p !== undefined && def.kernel.arg === p.spec.name ? def.kernel.of : undefined;
  const spec = p?.spec as Extract<ArgSpec, { kind: "number" }> | undefined;
  if (kernel && spec && h === undefined && constantCell === undefined && varying.length === 1 && cols === 1 && !spec.magnitude && spec.min === undefined && spec.max === undefined) {
    // the common range: one column of numbers (a column of redshifts) against constant arguments
    const name = spec.name;
    const matrix = p.matrix!;
    const factor = p.conversion === undefined ? 1 : p.conversion.factor;
    for (let r = 0; r < rows; r++) {
      const value = matrix[r][0];
      if (typeof value === "number" && value - value === 0) {
        let v: number;
        try {
          v = kernel(args, value * factor) * resultFactor;
        } catch (e) {
          out[r] = [shown(classify(e, def.name))];
          continue;
        }
        out[r] = [v - v === 0 ? (v === 0 ? 0 : v) : shown(new CellError("num", messages.notFiniteResult(def.name)))];
        continue;
      }
      const read = readArg(spec, value, true, p.conversion, active, modelOf); // text numbers, blanks, errors, ±∞
      if (read instanceof CellError || read === blank) out[r] = [shown(read)];
      else {
        args[name] = read;
        out[r] = [shown(cellOf())];
      }
    }
    return out;
  }
  for (let r = 0; r < rows; r++) {
    const row: Cell[] = new Array(cols);
    for (let c = 0; c < cols; c++) {
      let cell: Cell | undefined = constantCell;
      for (let k = 0; k < varying.length && cell === undefined; k++) {
        const p = varying[k];
        const value = p.matrix![p.rows === 1 ? 0 : r][p.cols === 1 ? 0 : c];
        const read = readArg(p.spec, value, true, p.conversion, active, modelOf);
        if (read instanceof CellError || read === blank) cell = read;
        else args[p.spec.name] = read;
      }
      row[c] = shown(cell ?? cellOf());
    }
    out[r] = row;
  }
  return out;
}

function cleanNumber(x: number, fn: string): number | CellError {
  if (!Number.isFinite(x)) return new CellError("num", messages.notFiniteResult(fn));
  return x === 0 ? 0 : x;
}

/** Cells as Excel takes them: CellErrors become the host's error values. */
function forHost(cells: unknown[][]): unknown[][] {
  for (const row of cells) {
    for (let c = 0; c < row.length; c++) if (row[c] instanceof CellError) row[c] = toHostError(row[c] as CellError);
  }
  return cells;
}

function evaluateForHost(def: FunctionDef, raw: readonly unknown[]): unknown[][] {
  try {
    const seen = { error: false };
    const cells = evaluateNoting(def, raw, readActiveModel(), seen);
    return seen.error ? forHost(cells) : cells;
  } catch (e) {
    return [[toHostError(classify(e, def.name))]];
  }
}

/**
 * What a custom function returns to Excel: until the workbook's settings are loaded, a Promise that
 * waits for them; from then on the result itself, with no wait and no Promise (a custom function may
 * return a value or a Promise: ../shared/excel-host-notes.md). CellErrors become host error values.
 * Never throws.
 *
 * Typed as the matrix it resolves to because the metadata plugin reads a declaration's return type
 * for the result's dimensionality and cannot read a union (custom-functions-metadata getResults).
 */
export function callFromSheet(def: FunctionDef, raw: readonly unknown[]): unknown[][] {
  if (settingsReady()) return evaluateForHost(def, raw);
  const later: Promise<unknown[][]> = whenSettingsReady().then(
    () => evaluateForHost(def, raw),
    (e) => [[toHostError(classify(e, def.name))]],
  );
  return later as unknown as unknown[][];
}
