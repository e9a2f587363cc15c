/**
 * A worksheet function as data: how each argument is read (its kind, default, domain, unit) and what
 * one cell computes. `definitions.ts` lists them; `evaluate.ts` runs them.
 */
import type { AnglePart, Cosmology } from "../core/index.js";
import type { ActiveModelSetting } from "./activeModel.js";
import type { CellError } from "./cellError.js";

/** What a worksheet cell can hold as a result. */
export type Cell = number | string | CellError;

/**
 * What an omitted or blank argument means, as the help page and the pane show it: `typed`, the value
 * that, written out, gives the same result ("GHz", "optical"; test/defaults.test.ts checks each), or
 * `words` where no one value does ("3.1, or 4.05 for Calzetti 2000").
 */
export type BlankMeaning = { typed: string } | { words: string };

/** How one argument is read. */
export type ArgSpec =
  | {
      /** A number (or range of numbers). */
      kind: "number";
      name: string;
      /** Value when the argument is omitted; absent means the argument is required. */
      default?: number;
      /** A blank cell inside the argument means the default (instead of a blank result). */
      blankMeansDefault?: boolean;
      /** Smallest allowed value, in the reference unit (checked in the unit the user gave). */
      min?: number;
      /** `min` itself is not allowed. */
      minExclusive?: boolean;
      /** Largest allowed value, in the reference unit, and what it is (e.g. "180°"). */
      max?: { value: number; what: string };
      /** A magnitude: |value| ≥ 50 is a catalogue's missing-value flag (#N/A). */
      magnitude?: boolean;
      /**
       * A position: text that is not a number is read as a sexagesimal angle of this part ("ra" in
       * hours, "dec", "lon", "lat" in degrees: core/positions/sexagesimal.ts) into the reference unit,
       * or of the part a function of the scalar texts gives (COORD_CONVERT's frame); "either" passes
       * the text to compute, for an argument whose part a cell argument names. A "dec" or "lat" stays
       * in degrees when the angle unit is "hourangle", which is for "ra" alone (readPositions.ts).
       */
      sexagesimal?: AnglePart | "either" | ((scalars: Args) => AnglePart);
      /** Its unit when no unit argument converts it (MAG_AB's wavelength in Angstrom), for the help. */
      unit?: string;
      /** What leaving it out means when `default` is NaN ("not given"): the help and the pane say this. */
      blank?: BlankMeaning;
    }
  | {
      /** A model (or range of models): blank means the workbook's model, unless `required`. */
      kind: "model";
      name: string;
      /** Must be given (a function comparing two models): omitted is #VALUE!. */
      required?: boolean;
    }
  | {
      /** Text (or range of text), optionally one of fixed choices (matched case-insensitively). */
      kind: "text";
      name: string;
      choices?: readonly string[];
      /** Scalar: read once, not broadcast. */
      scalar?: boolean;
      /** May be omitted or blank: read as "" when scalar, as absent otherwise (no blank result). */
      optional?: boolean;
      /** What an omitted or blank one means (an optional text has one: the help and the pane show it). */
      blank?: BlankMeaning;
    }
  | {
      /** A number or text, passed through (e.g. mnu as "0.05,0.01"). */
      kind: "numberOrText";
      name: string;
      default?: number | string;
      /** What an omitted one means. */
      blank?: BlankMeaning;
    }
  | {
      /**
       * A unit (scalar text, `default` when blank): converts the named number arguments from it into
       * the reference unit `unit` the computation uses, or, with applies "result", the result from
       * `unit` into it. An h-scaled unit (Mpc/h) is scaled by the h of the cell's model.
       */
      kind: "unit";
      name: string;
      unit: string;
      default: string;
      applies: string | readonly string[];
    };

/** The resolved arguments of one cell, by name (units already applied). */
export type Args = Record<string, number | string | Cosmology | undefined>;

/** A worksheet function as data: its arguments and what it computes for one cell. */
export interface FunctionDef {
  /** Name as typed after "ZC.", e.g. "DIST_LUM". */
  name: string;
  args: ArgSpec[];
  /** The value for one cell, in the reference units of the unit arguments. */
  compute?: (a: Args) => number | string;
  /**
   * The same computation as a function of one number argument, the others fixed in `a` (a column of
   * redshifts against one model): `of(a, x)` equals `compute` with `a[arg] = x`. Lets a range run a
   * tight loop with no per-cell object writes.
   */
  kernel?: { arg: string; of: (a: Args, x: number) => number };
  /** For functions that return a whole table at once (ZC.PRESETS). */
  table?: (active: ActiveModelSetting) => Cell[][];
  /**
   * For functions of whole columns (a luminosity function, a χ²): the arguments named in `columns`
   * are read as columns of numbers (row-major; blanks and the first error kept in place), the others
   * as one cell each into `args`; the result is the whole output (one cell, or a table that spills).
   */
  over?: { columns: readonly string[]; compute: (columns: Record<string, ColumnCells>, args: Args) => Cell[][] };
}

/**
 * A whole-column argument as read (row-major). Only what can matter is kept: the numbers up to the
 * last cell that is not blank (a whole-column reference's blank rows below the data cost nothing),
 * and the first cell that is not a number (cells after it are not read: the function stops there).
 */
export interface ColumnCells {
  /** Cells the range holds (rows × columns), blank ones at its end included. */
  length: number;
  /** Each cell's number, up to the last cell that is not blank or the first error; NaN for a blank or the error. */
  numbers: Float64Array;
  /** The first cell that holds an error or something other than a number: its index and the error it shows. */
  error?: { index: number; error: CellError };
}

