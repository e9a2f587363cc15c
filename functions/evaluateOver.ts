/**
 * The shared wrapper for functions of whole columns (FunctionDef.over): the column arguments are
 * read into columns of numbers (readColumnCells: up to the last cell that is not blank, blanks and
 * the first error kept in place, so the function can name the row a problem came from), every
 * other argument as one cell through readCall; the function returns the whole result.
 */
import type { ActiveModelSetting } from "./activeModel.js";
import { CellError } from "./cellError.js";
import type { Args, Cell, ColumnCells, FunctionDef } from "./FunctionDef.js";
import { messages } from "./messages.js";
import { readCall, readColumnCells } from "./readArguments.js";

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
