/**
 * Typed worksheet errors. Inside Excel they are CustomFunctions.Error values; elsewhere (unit tests,
 * the task pane's inspector) plain CellError objects with the same code and message. Also how a
 * thrown core error becomes one, and how a message names the function.
 */

import { NoSolutionError } from "../core/index.js";
import { messages } from "./messages.js";

/** The three error values the functions return, by Excel's meaning. */
export type ErrorKind = "value" | "num" | "na";

/** An error value for one cell: #VALUE! (type/parse), #NUM! (physical domain), #N/A (no solution). */
export class CellError {
  constructor(
    readonly kind: ErrorKind,
    readonly message: string,
  ) {}

  /** The error as Excel writes it. */
  get excelText(): string {
    return this.kind === "value" ? "#VALUE!" : this.kind === "num" ? "#NUM!" : "#N/A";
  }
}

const officeCodes: Record<ErrorKind, string> = { value: "invalidValue", num: "invalidNumber", na: "notAvailable" };

/** Converts a CellError to what Excel expects (CustomFunctions.Error when the runtime has it). */
export function toHostError(e: CellError): unknown {
  const runtime = (globalThis as { CustomFunctions?: typeof CustomFunctions }).CustomFunctions;
  if (!runtime?.Error) return e;
  const code = (runtime.ErrorCode as unknown as Record<string, string>)[officeCodes[e.kind]];
  return new runtime.Error(code as CustomFunctions.ErrorCode, e.message);
}

/** True when a value passed in from a cell is an error value (from Excel or from us). */
export function isIncomingError(value: unknown): boolean {
  if (value instanceof CellError) return true;
  if (typeof value !== "object" || value === null) return false;
  const runtime = (globalThis as { CustomFunctions?: typeof CustomFunctions }).CustomFunctions;
  return (runtime?.Error !== undefined && value instanceof runtime.Error) || "errorCode" in value;
}

/** The Excel error a thrown value stands for: NoSolutionError → #N/A, RangeError → #NUM!, TypeError → #VALUE!. */
export function classify(e: unknown, fn: string): CellError {
  if (e instanceof CellError) return e;
  if (e instanceof NoSolutionError) return new CellError("na", e.message);
  if (e instanceof RangeError) return new CellError("num", e.message);
  if (e instanceof TypeError) return new CellError("value", e.message);
  return new CellError("value", messages.internal(fn, e instanceof Error ? e.message : String(e)));
}

/**
 * The error as the sheet shows it, naming the function: one object for each distinct message of a
 * call, however many cells show it (a column of text where numbers belong makes one, not one a cell).
 * @param seen the call's errors so far, by their message before the function's name was added
 */
export function inFunction(e: CellError, fn: string, seen: Map<string, CellError>): CellError {
  const named = seen.get(e.message);
  if (named?.kind === e.kind) return named;
  const message = messages.inFunction(fn, e.message);
  const shown = message === e.message ? e : new CellError(e.kind, message);
  if (!named) seen.set(e.message, shown); // the same words as another kind of error (never seen): not shared
  return shown;
}
