/**
 * The shared wrapper for functions of whole columns (FunctionDef.over): the column arguments are
 * read into columns of numbers (readColumnCells: up to the last cell that is not blank, blanks and
 * the first error kept in place, so the function can name the row a problem came from), every
 * other argument as one cell through readCall; the function returns the whole result.
 */
import type { ActiveModelSetting } from "./activeModel.js";
import { CellError, isIncomingError } from "./cellError.js";
import type { Args, Cell, ColumnCells, FunctionDef } from "./FunctionDef.js";
import { messages } from "./messages.js";
import { isBlank } from "./modelArgument.js";
import { isNumberText } from "../core/index.js";
import { readCall, toMatrix } from "./readArguments.js";

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
  const columns: Record<string, ColumnCells> = {};
  const others: FunctionDef = { name: def.name, args: [] };
  const otherRaw: unknown[] = [];
  def.args.forEach((spec, i) => {
    if (over.columns.includes(spec.name)) columns[spec.name] = readColumnCells(spec.name, raw[i]);
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

/** Cells one whole-column argument may hold (a whole column of a sheet, 1,048,576 rows: Microsoft's "Excel specifications and limits"). */
const maxColumnCells = 1_048_576;

/**
 * A whole-column argument (FunctionDef.over), row-major: numbers (text numbers too) up to the last
 * cell that is not blank, NaN for blanks, and the first cell that is not a number with its error, so
 * the function can name the row a problem came from. Cells after that first error are not read.
 * @throws CellError when the argument is omitted or holds more cells than a sheet's column
 */
function readColumnCells(name: string, raw: unknown): ColumnCells {
  const matrix = toMatrix(raw);
  if (!matrix) throw new CellError("value", messages.required(name));
  const cols = matrix[0].length;
  const length = matrix.length * cols;
  if (length > maxColumnCells) throw new CellError("value", messages.columnTooLong(name, length, maxColumnCells));
  // up to the last cell that is not blank, found from the end before anything is stored: a whole column's blank rows keep nothing
  let used = 0;
  for (let r = matrix.length - 1; r >= 0 && used === 0; r--) {
    const row = matrix[r];
    for (let c = cols - 1; c >= 0; c--) {
      if (!isBlank(row[c])) {
        used = r * cols + c + 1;
        break;
      }
    }
  }
  const numbers = new Float64Array(used);
  for (let i = 0, r = 0; i < used; r++) {
    const row = matrix[r];
    for (let c = 0; c < cols && i < used; c++, i++) {
      const value = row[c];
      if (typeof value === "number" && value - value === 0) {
        numbers[i] = value;
        continue;
      }
      const isNumber = typeof value === "number" || (typeof value === "string" && isNumberText(value.trim()));
      const x = isNumber ? Number(value) : Number.NaN; // Number() skips the same white space as trim()
      if (x - x === 0) numbers[i] = x;
      else if (isBlank(value)) numbers[i] = Number.NaN;
      else {
        const error =
          isNumber ? new CellError("num", messages.notFinite(name))
          : isIncomingError(value) ? new CellError("value", messages.inputError(name))
          : new CellError("value", messages.notANumber(name, value));
        numbers[i] = Number.NaN;
        return { length, numbers: numbers.subarray(0, i + 1), error: { index: i, error } };
      }
    }
  }
  return { length, numbers };
}
