/**
 * Which cell of each argument one cell of a result was computed from, by the broadcasting rule of the
 * worksheet functions (`functions/readArguments.ts`, `functions/evaluate.ts`): ranges of one shape
 * cell by cell, a single cell against every cell, a column against a row, a range's single row (or
 * column) read by every row (or column) of the result. Also, for the calls of one formula, which
 * cell of each call's result the selected cell reads, from the outermost call down.
 */
import type { FormulaCall } from "./formulaCalls.js";

/** A cell of a result or of an argument: its row and column from the top-left cell, 0-based. */
export interface CellPlace {
  row: number;
  col: number;
}

/**
 * The cell of a `rows` × `cols` argument that the result cell at `at` reads: a single row serves
 * every row, a single column every column.
 * @returns the cell, or undefined when `at` lies outside what the argument can broadcast to
 */
export function placeIn(at: CellPlace, rows: number, cols: number): CellPlace | undefined {
  const row = rows === 1 ? 0 : at.row;
  const col = cols === 1 ? 0 : at.col;
  return row < rows && col < cols ? { row, col } : undefined;
}

/** `at` when it is a cell of a `rows` × `cols` result, else undefined. */
export function within(at: CellPlace | undefined, rows: number, cols: number): CellPlace | undefined {
  return at && at.row >= 0 && at.col >= 0 && at.row < rows && at.col < cols ? at : undefined;
}

/**
 * Each call's parent (the call it is written in) by index, -1 for a call at the top of the formula.
 * @param calls the calls of one formula as `findCalls` lists them: each before the calls inside it, with its depth
 */
export function parentsOf(calls: readonly FormulaCall[]): number[] {
  const lastAtDepth: number[] = [];
  return calls.map((call, i) => {
    lastAtDepth[call.depth] = i;
    return call.depth === 0 ? -1 : lastAtDepth[call.depth - 1];
  });
}

/** "row 2, column 3", "row 2" (a column), "column 3" (a row), "the cell" (one cell) of a `rows` × `cols` matrix. */
export function placeWords(p: CellPlace, rows: number, cols: number): string {
  if (rows === 1 && cols === 1) return "the cell";
  if (cols === 1) return `row ${p.row + 1}`;
  if (rows === 1) return `column ${p.col + 1}`;
  return `row ${p.row + 1}, column ${p.col + 1}`;
}
