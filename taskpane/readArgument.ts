/**
 * What an argument of a ZC call in a formula stands for, as the cell inspector reads it: a literal,
 * the values behind a reference (read through Excel, never more than `inspectorReadLimit` cells), or
 * a nested ZC call's result; and how one of its cells is named and shown.
 */
import { CellError } from "../functions/cellError.js";
import type { Cell } from "../functions/evaluate.js";
import { placeWords, type CellPlace } from "./broadcastPlace.js";
import { columnName, topLeft } from "./cellAddress.js";
import { parseArrayConstant, type Token } from "./formulaCalls.js";

/**
 * What a reader gives for a reference: the address Excel resolved, its size in cells (asked before its
 * values), and its values only when that size is within the bound the reader was given. A snapshot
 * of a range read whole (values loaded without asking the size first) has no `cells`, so TypeScript
 * refuses it here.
 */
export type ReferenceRead = { address?: string; cells: number; values?: unknown[][] };

/**
 * Reads a reference written in a formula (e.g. "B2", "'Sheet 2'!A1:A9", a defined name): its size
 * first, then its values only when it holds at most `maxCells` cells (`readReferenceBounded` in
 * excelHost.ts for Excel).
 */
export type ReferenceReader = (reference: string, maxCells: number) => Promise<ReferenceRead>;

/** Cells the inspector reads from one reference at most (a whole column is 1,048,576: "Excel specifications and limits", from memory). */
export const inspectorReadLimit = 100_000;

/** Where an argument's values came from, to name one of its cells. */
export type ArgumentSource = { kind: "reference"; text: string; address?: string } | { kind: "array" } | { kind: "call"; name: string };

/** An argument as read: its value (undefined when omitted), or not known here (computed by Excel, or not read), with why. */
export interface ReadArgument {
  known: boolean;
  value: unknown;
  note?: string;
  source?: ArgumentSource;
}

const numberOf = (text: string) => Number(text.replace("%", "")) * (text.endsWith("%") ? 0.01 : 1);

/**
 * An argument's value from its tokens: a literal, the values of a reference (read through `read`),
 * or a nested ZC call's whole result; not known when only Excel can compute it, or when its range is
 * too large to read (with why).
 * @param tokens the argument's tokens (spaces dropped)
 * @param text the argument's source text (a nested call's, as its key in `nested`)
 * @param read reads a reference, or gives only its size when it holds more than `inspectorReadLimit` cells
 * @param nested the results of the nested ZC calls already computed, by their source text (or why one is not)
 */
export async function readArgument(
  tokens: Token[],
  text: string,
  read: (reference: string) => Promise<ReferenceRead>,
  nested: Map<string, Cell[][] | string>,
): Promise<ReadArgument> {
  if (tokens.length === 0) return { known: true, value: undefined };
  const only = tokens.length === 1 ? tokens[0] : undefined;
  const negative = tokens.length === 2 && tokens[0].text === "-" && tokens[1].kind === "number";
  if (negative) return { known: true, value: -numberOf(tokens[1].text) };
  if (!only) {
    const cells = nested.get(text);
    const source: ArgumentSource = { kind: "call", name: tokens[0].text.toUpperCase() };
    if (typeof cells === "string") return { known: false, value: undefined, note: cells, source };
    return cells ? { known: true, value: cells, source } : { known: false, value: undefined };
  }
  switch (only.kind) {
    case "number":
      return { known: true, value: numberOf(only.text) };
    case "string":
      return { known: true, value: only.text.slice(1, -1).replaceAll('""', '"') };
    case "bool":
      return { known: true, value: only.text.toUpperCase() === "TRUE" };
    case "array":
      return { known: true, value: parseArrayConstant(only.text), source: { kind: "array" } };
    case "ref":
    case "name": {
      let got: ReferenceRead;
      try {
        got = await read(only.text);
      } catch (e) {
        return { known: false, value: undefined, note: `not read (Excel: ${cut(String((e as Error)?.message ?? e), 100)})` };
      }
      const source: ArgumentSource = { kind: "reference", text: only.text, address: got.address };
      if (got.values === undefined || got.cells > inspectorReadLimit) {
        return { known: false, value: undefined, source, note: `a range of ${got.cells.toLocaleString("en-US")} cells, not read (the inspector reads at most ${inspectorReadLimit.toLocaleString("en-US")})` };
      }
      return { known: true, value: got.values, source };
    }
    default:
      return { known: false, value: undefined };
  }
}

/** `text` cut to `max` characters, with an ellipsis when cut. */
export function cut(text: string, max: number): string {
  return text.length > max ? `${text.slice(0, max)}…` : text;
}

/** A value as the pane shows it: text quoted, a range by its size and first cell, an error with its message. */
export function showValue(value: unknown): string {
  if (value === undefined) return "omitted";
  if (value instanceof CellError) return `${value.excelText} (${value.message})`;
  if (Array.isArray(value)) {
    const rows = value.length;
    const cols = (value[0] as unknown[])?.length ?? 0;
    if (rows === 1 && cols === 1) return showValue((value as unknown[][])[0][0]);
    return `range ${rows}×${cols}, first ${showValue((value as unknown[][])[0][0])}`;
  }
  if (value === "" || value === null) return "blank";
  if (typeof value === "string") return `"${value}"`;
  return String(value);
}

/** A value as a matrix when it is one (a range, an array constant, a nested call's result). */
export function matrixOf(value: unknown): unknown[][] | undefined {
  return Array.isArray(value) && Array.isArray(value[0]) && value[0].length > 0 ? (value as unknown[][]) : undefined;
}

/** The one value of a single cell or a 1×1 matrix; a larger matrix's first cell. */
export function firstOf(value: unknown): unknown {
  const m = matrixOf(value);
  return m ? m[0][0] : value;
}

/** The name of cell `p` of an argument's `rows` × `cols` values: its address for a reference, else its place. */
export function cellName(source: ArgumentSource | undefined, p: CellPlace, rows: number, cols: number): string {
  if (source?.kind === "reference") {
    const reference = source.address ?? source.text; // the address Excel resolved (a name's too)
    const bang = reference.lastIndexOf("!");
    const corner = reference.slice(bang + 1).replaceAll("$", "").split(":")[0];
    if (/^[A-Za-z]{1,3}\d+$/.test(corner)) {
      const { col, row } = topLeft(corner);
      return `${reference.slice(0, bang + 1)}${columnName(col + p.col)}${row + p.row}`;
    }
    return `${placeWords(p, rows, cols)} of ${source.text}`;
  }
  return `${placeWords(p, rows, cols)} of ${source?.kind === "call" ? `the result of ${source.name}` : "the array"}`;
}
