/**
 * The shared wrapper for functions of whole columns (FunctionDef.over): the column arguments are
 * read cell by cell into lists (numbers in the reference unit of their unit argument; blanks and
 * errors kept in place, so the function can name the row a problem came from), every other
 * argument as one cell through readCall; the function returns the whole result.
 */
import type { ActiveModelSetting } from "./activeModel.js";
import { CellError, isIncomingError } from "./cellError.js";
import type { Args, Cell, ColumnCell, FunctionDef } from "./FunctionDef.js";
import { messages } from "./messages.js";
import { readCall } from "./readArguments.js";

/** Text that Excel's own functions would read as a number. */
const numberText = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;
/** Cells one column argument may hold (a whole column of a sheet, 1,048,576 rows: from memory). */
const maxColumnCells = 1_048_576;

/** Reads one column argument into a list of cells. */
function readColumn(name: string, raw: unknown): ColumnCell[] {
  if (raw === undefined || raw === null) throw new CellError("value", messages.required(name));
  const rows = Array.isArray(raw) ? (Array.isArray(raw[0]) ? (raw as unknown[][]) : [raw as unknown[]]) : [[raw]];
  const cells: ColumnCell[] = [];
  for (const row of rows) {
    for (const value of row) {
      if (cells.length >= maxColumnCells) throw new CellError("value", messages.tooLarge(cells.length + 1, maxColumnCells));
      if (typeof value === "number") cells.push(Number.isFinite(value) ? value : new CellError("num", messages.notFinite(name)));
      else if (value === null || value === undefined || value === "") cells.push("");
      else if (typeof value === "string" && numberText.test(value.trim())) cells.push(Number(value.trim()));
      else if (isIncomingError(value)) cells.push(new CellError("value", messages.inputError(name)));
      else cells.push(new CellError("value", messages.notANumber(name, value)));
    }
  }
  return cells;
}

/**
 * Evaluates a function of whole columns.
 * @param def the function's declaration (with `over`)
 * @param raw the arguments as Excel passes them
 * @param active the workbook's active model setting
 * @returns the function's whole result
 * @throws CellError for a problem with the arguments (the caller shows it in the function's words)
 */
export function evaluateOver(def: FunctionDef, raw: readonly unknown[], active: ActiveModelSetting): Cell[][] {
  const over = def.over!;
  const columns: Record<string, ColumnCell[]> = {};
  const others: FunctionDef = { name: def.name, args: [] };
  const otherRaw: unknown[] = [];
  def.args.forEach((spec, i) => {
    if (over.columns.includes(spec.name)) columns[spec.name] = readColumn(spec.name, raw[i]);
    else {
      others.args.push(spec);
      otherRaw.push(raw[i]);
    }
  });
  const call = readCall(others, otherRaw, active);
  if (call.ranges.length > 0) throw new CellError("value", messages.oneCellOnly(call.ranges[0].name));
  if (call.problem !== undefined) {
    if (call.problem instanceof CellError) throw call.problem;
    throw new CellError("value", messages.required(others.args.find((a) => call.args[a.name] === undefined)?.name ?? "an argument"));
  }
  const args: Args = call.args;
  return over.compute(columns, args);
}
