/**
 * The one shared wrapper behind every worksheet function, in two steps: its arguments are read, all
 * of them, once (`readArguments.ts`: coercion, units, models, the broadcast shape), then each cell is
 * computed here; core errors become Excel errors and results are cleaned (NaN/±Infinity → #NUM!,
 * −0 → 0). Each custom function is a definition (functions/definitions/) evaluated here.
 *
 * `evaluate` is synchronous and host-free, so the task pane's cell inspector can ask it why a cell
 * holds an error: the CellError it returns carries the explanation.
 */
import { Cosmology } from "../core/index.js";
import { readActiveModel, settingsReady, whenSettingsReady, type ActiveModelSetting } from "./activeModel.js";
import { CellError, classify, inFunction, toHostError } from "./cellError.js";
import type { Args, Cell, FunctionDef } from "./FunctionDef.js";
import { evaluateOver } from "./evaluateOver.js";
import { messages } from "./messages.js";
import { blank, cellAt, readCall, type CallArguments, type Column, type HScaling, type ReadCell } from "./readArguments.js";

export type { Args, ArgSpec, Cell, FunctionDef } from "./FunctionDef.js";

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
    if (def.over) {
      seen.error = true;
      return evaluateOver(def, raw, active).map((row) => row.map((cell) => (typeof cell === "number" ? cleanNumber(cell, def.name) : cell)));
    }
    const call = readCall(def, raw, active);
    if (call.ranges.length > 0) return allCells(def, call, seen);
    const one = oneCell(def, call);
    if (one instanceof CellError) seen.error = true;
    return [[one]];
  } catch (e) {
    seen.error = true;
    return [[inFunction(classify(e, def.name), def.name, new Map())]];
  }
}

/** compute for one cell, with h-scaled units applied (h of the cell's model) when the call has any. */
function computeCell(def: FunctionDef, args: Args, h: HScaling | undefined): number | string {
  if (!h) return def.compute!(args);
  const model = args.model;
  if (!(model instanceof Cosmology)) throw new TypeError(messages.hScaledWithoutModel);
  const scaled = { ...args };
  for (const [name, power] of h.args) if (typeof scaled[name] === "number") scaled[name] = (scaled[name] as number) * model.h ** power;
  const result = def.compute!(scaled);
  return typeof result === "number" ? result * model.h ** h.result : result;
}

/** The cell whose arguments are in `call.args`: compute, cleaned; an error before the function's name is added. */
function computed(def: FunctionDef, call: CallArguments): Cell {
  try {
    const result = computeCell(def, call.args, call.h);
    return typeof result === "number" ? cleanNumber(result * call.resultFactor, def.name) : result;
  } catch (e) {
    return classify(e, def.name);
  }
}

/** The one cell of a call whose arguments are single cells. */
function oneCell(def: FunctionDef, call: CallArguments): Cell {
  const cell = call.problem ?? computed(def, call);
  return cell instanceof CellError ? inFunction(cell, def.name, new Map()) : cell;
}

/**
 * How many of a call's ranges a cell reads: all of them, or, when a single-cell argument is an error
 * or blank, those before it in the signature (a range's own error or blank there comes first, as for
 * one cell; after them the single cell's shows).
 */
function rangesRead(call: CallArguments): number {
  return call.problem === undefined ? call.ranges.length : call.rangesBeforeProblem;
}

/**
 * The cell at row `r`, column `c` of a call over ranges, before the function's name is added to an
 * error: each of the first `upTo` ranges' value there (the first error or blank decides), then compute.
 * @param group the range of models being computed model by model, with its model resolved once
 */
function cellAtPosition(def: FunctionDef, call: CallArguments, upTo: number, r: number, c: number, group?: Group): Cell {
  const { ranges, args } = call;
  for (let k = 0; k < upTo; k++) {
    const range = ranges[k];
    let value: ReadCell;
    if (range === group?.range) value = modelOfGroup(group);
    else {
      value = cellAt(range, (range.rows === 1 ? 0 : r) * range.cols + (range.cols === 1 ? 0 : c));
      if (range.model !== undefined && typeof value === "string") value = range.model(value);
    }
    if (value instanceof CellError || value === blank) return value;
    args[range.name] = value;
  }
  return call.problem ?? computed(def, call);
}

/** Every cell of a call over ranges: the single-cell arguments fixed in `args`, the ranges broadcast. */
function allCells(def: FunctionDef, call: CallArguments, seen: { error: boolean }): Cell[][] {
  const { rows, cols, args, problem, ranges, resultFactor, h } = call;
  let named: Map<string, CellError> | undefined;
  const shown = (cell: Cell): Cell => {
    if (!(cell instanceof CellError)) return cell;
    seen.error = true;
    return inFunction(cell, def.name, (named ??= new Map()));
  };

  const out: Cell[][] = new Array(rows);
  const upTo = rangesRead(call);
  if (problem !== undefined && upTo === 0) {
    for (let r = 0; r < rows; r++) out[r] = new Array(cols).fill(shown(problem));
    return out;
  }
  const kernel = def.kernel;
  if (kernel && problem === undefined && h === undefined && ranges.length === 1 && cols === 1 && ranges[0].name === kernel.arg) {
    // the common range: one column of numbers (a column of redshifts) against constant arguments
    const of = kernel.of;
    const column = ranges[0];
    const numbers = column.numbers!;
    let notFinite: CellError | undefined; // one for every cell whose result is not a finite number
    for (let r = 0; r < rows; r++) {
      const x = numbers[r];
      const value = x === x ? x : column.others.get(r);
      if (typeof value === "number") {
        let v: number;
        try {
          v = of(args, value) * resultFactor;
        } catch (e) {
          out[r] = [shown(classify(e, def.name))];
          continue;
        }
        out[r] = [v - v === 0 ? (v === 0 ? 0 : v) : shown((notFinite ??= notFiniteResult(def.name)))];
      } else if (value instanceof CellError || value === blank) {
        out[r] = [shown(value)];
      } else {
        args[kernel.arg] = value;
        out[r] = [shown(computed(def, call))];
      }
    }
    return out;
  }
  // the cell at (r, c): each range's value there (the first error or blank decides), then compute
  const grouping = modelGroups(ranges, upTo);
  if (grouping === undefined) {
    for (let r = 0; r < rows; r++) {
      const row: Cell[] = new Array(cols);
      for (let c = 0; c < cols; c++) row[c] = shown(cellAtPosition(def, call, upTo, r, c));
      out[r] = row;
    }
    return out;
  }
  // a range of models: all the cells of one model, then the next, so that each is built once
  for (let r = 0; r < rows; r++) out[r] = new Array(cols);
  const { range, first, next } = grouping;
  for (const [value, head] of first) {
    const group: Group = { range, value, model: undefined };
    for (let j = head; j >= 0; j = next[j]) {
      const r0 = range.rows === 1 ? 0 : Math.floor(j / range.cols);
      const c0 = range.cols === 1 ? 0 : j - r0 * range.cols;
      // a row of models spans every row of the result, a column every column
      const rTo = range.rows === 1 ? rows : r0 + 1;
      const cTo = range.cols === 1 ? cols : c0 + 1;
      for (let r = r0; r < rTo; r++) {
        const row = out[r];
        for (let c = c0; c < cTo; c++) row[c] = shown(cellAtPosition(def, call, upTo, r, c, group));
      }
    }
  }
  return out;
}

/** A call's result as its shape and any one of its cells, computed alone when asked for. */
export interface CallResult {
  rows: number;
  cols: number;
  /** The cell at row `r`, column `c` (0-based, inside the shape): the one `evaluate` gives there. */
  cell(r: number, c: number): Cell;
}

/**
 * A call's arguments read as the whole call reads them (the same shape, the same errors that spoil
 * the whole call), and its cells computed only when asked for, each as `evaluate` computes it there:
 * for the pane's inspector, which explains one cell of a result that may hold millions. A function
 * of whole columns or a table is computed whole at once.
 */
export function evaluateLazily(def: FunctionDef, raw: readonly unknown[], active: ActiveModelSetting): CallResult {
  const whole = (cells: Cell[][]): CallResult => ({ rows: cells.length, cols: cells[0].length, cell: (r, c) => cells[r][c] });
  if (def.table || def.over) return whole(evaluate(def, raw, active));
  let call: CallArguments;
  try {
    call = readCall(def, raw, active);
  } catch (e) {
    return whole([[inFunction(classify(e, def.name), def.name, new Map())]]);
  }
  if (call.ranges.length === 0) return whole([[oneCell(def, call)]]);
  const upTo = rangesRead(call);
  return {
    rows: call.rows,
    cols: call.cols,
    cell: (r, c) => {
      const cell = cellAtPosition(def, call, upTo, r, c);
      return cell instanceof CellError ? inFunction(cell, def.name, new Map()) : cell;
    },
  };
}

/** The cells of a range of models that hold one model (its spec text, or one error), and that model once resolved. */
type Group = { range: Column; value: ReadCell; model: ReadCell | undefined };

/** The model of a group, resolved at its first cell that needs it (a model whose every cell is blank in z is never built). */
function modelOfGroup(group: Group): ReadCell {
  if (group.model === undefined) group.model = typeof group.value === "string" ? group.range.model!(group.value) : group.value;
  return group.model;
}

/**
 * The cells of the range of models with the most distinct models, grouped by model: `first` maps each
 * distinct cell (spec text, or an error) to its first index (row-major), and `next[i]` is the next
 * index holding the same (−1: none). Another range of models in the same call
 * (RESCALE's from and to) resolves through the call's bounded map and the shared cache as before.
 * Only the first `upTo` ranges are read. Undefined when none of them is a range of models.
 */
function modelGroups(ranges: readonly Column[], upTo: number): { range: Column; first: Map<ReadCell, number>; next: Int32Array } | undefined {
  let best: { range: Column; first: Map<ReadCell, number>; next: Int32Array } | undefined;
  for (const range of ranges.slice(0, upTo)) {
    if (range.model === undefined) continue;
    const n = range.rows * range.cols;
    const next = new Int32Array(n);
    const first = new Map<ReadCell, number>();
    // from the last cell back, so that one map suffices: each cell points to the next cell of its model
    for (let i = n - 1; i >= 0; i--) {
      const value = cellAt(range, i);
      next[i] = first.get(value) ?? -1;
      first.set(value, i);
    }
    if (best === undefined || first.size > best.first.size) best = { range, first, next };
  }
  return best;
}

/** A result that is not a finite number: #NUM!, named once (the message already starts with the ZC name the sheet shows). */
function notFiniteResult(fn: string): CellError {
  return new CellError("num", messages.notFiniteResult(`ZC.${fn}`));
}

function cleanNumber(x: number, fn: string): number | CellError {
  if (!Number.isFinite(x)) return notFiniteResult(fn);
  return x === 0 ? 0 : x;
}

/**
 * Cells as Excel takes them: CellErrors become the host's error values, one for each CellError (the
 * cells that show one error share its value: each still reads that error's code and message).
 */
function forHost(cells: unknown[][]): unknown[][] {
  const converted = new Map<CellError, unknown>();
  for (const row of cells) {
    for (let c = 0; c < row.length; c++) {
      const cell = row[c];
      if (!(cell instanceof CellError)) continue;
      let value = converted.get(cell);
      if (value === undefined) converted.set(cell, (value = toHostError(cell)));
      row[c] = value;
    }
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
