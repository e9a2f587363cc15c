/**
 * Calling worksheet functions the way a sheet does (through the shared wrapper), under a workbook
 * model: the whole result, its one cell, that cell as a number, or as the error it must be.
 */
import { CellError } from "../functions/cellError.js";
import { definitions } from "../functions/definitions.js";
import { evaluate, type Cell } from "../functions/evaluate.js";

export function sheetCalls(workbookModel: string) {
  const active = { spec: workbookModel, stored: false };
  const run = (name: string, ...args: unknown[]): Cell[][] => evaluate(definitions[name], args, active);
  const one = (name: string, ...args: unknown[]): Cell => run(name, ...args)[0][0];
  const num = (name: string, ...args: unknown[]): number => {
    const cell = one(name, ...args);
    if (typeof cell !== "number") throw new Error(`${name}(${args.join(", ")}) gave ${cell instanceof CellError ? cell.message : String(cell)}`);
    return cell;
  };
  const failure = (name: string, ...args: unknown[]): CellError => {
    const cell = one(name, ...args);
    if (!(cell instanceof CellError)) throw new Error(`${name}(${args.join(", ")}) gave ${String(cell)}, not an error`);
    return cell;
  };
  return { run, one, num, failure };
}
