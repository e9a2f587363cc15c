/**
 * How a function of whole columns (FunctionDef.over: LUMINOSITY_FUNCTION, CHI2_MODULUS) receives its
 * arguments from the shared wrapper (functions/evaluateOver.ts): each column argument read row by
 * row up to its last cell that is not blank, text numbers as numbers, the first cell that is not a
 * number with its error and where it is; the other arguments as one cell each, and the errors a
 * call shows when they are not. The interface (FunctionDef.ts, ColumnCells) is what every such
 * function relies on: a recording function of whole columns shows what it is given, and the real
 * ones what a cell shows. Expected values: the documented interface (ColumnCells in
 * functions/FunctionDef.ts) and the messages zcell shows (functions/messages.ts), pinned as the interface.
 */
import { describe, expect, test } from "vitest";
import { CellError } from "../functions/cellError.js";
import type { ArgSpec, ColumnCells, FunctionDef } from "../functions/FunctionDef.js";
import { evaluate, type Cell } from "../functions/evaluate.js";
import { sheetCalls } from "./sheetCalls.js";

const active = { spec: "P18-CMB", stored: false };
const number = (name: string): ArgSpec => ({ kind: "number", name });

/** A function of the whole column `x` (and the one-cell numbers a, k) that records what it is given and returns 1. */
function recording() {
  const given: { columns?: Record<string, ColumnCells>; args?: Record<string, unknown> } = {};
  const def: FunctionDef = {
    name: "COLUMNS",
    args: [number("x"), number("a"), number("k")],
    over: {
      columns: ["x"],
      compute: (columns, args) => {
        given.columns = columns;
        given.args = args;
        return [[1]];
      },
    },
  };
  const call = (...raw: unknown[]): Cell[][] => evaluate(def, raw, active);
  return { given, call };
}

/** What the function received for x: its length, its numbers (NaN as null, to compare) and its error. */
function received(raw: unknown) {
  const { given, call } = recording();
  const result = call(raw, 2, 3);
  expect(result).toEqual([[1]]);
  const x = given.columns!.x;
  return {
    length: x.length,
    numbers: Array.from(x.numbers, (v) => (Number.isNaN(v) ? null : v)),
    error: x.error && { index: x.error.index, kind: x.error.error.kind, message: x.error.error.message },
  };
}

describe("a whole-column argument as the function receives it", () => {
  test.each([
    // what the cells hold                       raw                                   length numbers                    (NaN: blank or the error)
    ["numbers, trailing blanks dropped",         [[1], [2], [""], [null]],             4,     [1, 2]],
    ["blanks inside kept in place",              [[1], [null], [""], [4]],             4,     [1, null, null, 4]],
    ["a block, row by row, to its last cell",    [[1, 2], ["", 5], ["", ""]],          6,     [1, 2, null, 5]],
    ["a block whose last row starts filled",     [[1, 2], [3, ""], ["", ""]],          6,     [1, 2, 3]],
    ["one value given as a single cell",         7,                                    1,     [7]],
    ["text numbers, with spaces around",         [[" 2.5 "], ["1e3"], ["-4"]],         3,     [2.5, 1000, -4]],
    ["nothing but blanks",                       [[""], [null], [""]],                 3,     []],
  ])("%s", (_what, raw, length, numbers) => {
    expect(received(raw)).toEqual({ length, numbers, error: undefined });
  });

  test.each([
    // the first cell that is not a number           raw                                                  numbers up to it   index kind     message
    ["an infinite number",                            [[1], [Number.POSITIVE_INFINITY], [2]],             [1, null],         1,    "num",   "x: not a finite number"],
    ["NaN given as a number",                         [[Number.NaN], [2]],                                [null],            0,    "num",   "x: not a finite number"],
    ["text beyond the largest number",                [[1], [2], ["1e999"], ["x"]],                       [1, 2, null],      2,    "num",   "x: not a finite number"],
    ["an error from the sheet",                       [[1], [{ errorCode: "#N/A" }], [3]],               [1, null],         1,    "value", "x: the input cell holds an error"],
    ["text that is not a number",                     [[1, 2], [3, "abc"], [5, 6]],                      [1, 2, 3, null],   3,    "value", 'x: text "abc" where a number belongs'],
    ["a logical value",                               [[true]],                                           [null],            0,    "value", "x: TRUE where a number belongs"],
  ])("%s: the numbers stop there and the error names it", (_what, raw, numbers, index, kind, message) => {
    const got = received(raw);
    expect(got.numbers).toEqual(numbers);
    expect(got.error).toEqual({ index, kind, message });
  });

  test("the one-cell arguments arrive read, in the reference unit", () => {
    const { given, call } = recording();
    call([[1]], "2", [[3]]);
    expect(given.args).toMatchObject({ a: 2, k: 3 });
  });
});

describe("what a call of a function of whole columns shows when an argument is wrong", () => {
  const { run } = sheetCalls("P18-CMB");
  const failure = (cells: Cell[][]) => {
    expect(cells.length).toBe(1);
    expect(cells[0][0]).toBeInstanceOf(CellError);
    const e = cells[0][0] as CellError;
    return [e.kind, e.message];
  };
  const z = [[0.1], [0.5]];
  const mu = [[38.3], [42.3]];
  const muErr = [[0.1], [0.1]];

  test.each([
    // the call                                                      kind     message
    ["a column omitted",         ["CHI2_MODULUS", null, mu, muErr],                       "value", "ZC.CHI2_MODULUS: z is required"],
    ["a column given empty",     ["CHI2_MODULUS", z, [], muErr],                          "value", "ZC.CHI2_MODULUS: mu is required"],
    ["a range of models",        ["CHI2_MODULUS", z, mu, muErr, [["P18-CMB"], ["W9-ALL"]]], "value", "ZC.CHI2_MODULUS: model must be one cell here (the other arguments are whole columns)"],
    ["an offset range",          ["CHI2_MODULUS", z, mu, muErr, null, [[0.1, 0.2]]],      "value", "ZC.CHI2_MODULUS: offset must be one cell here (the other arguments are whole columns)"],
    ["an offset that is text",   ["CHI2_MODULUS", z, mu, muErr, null, "abc"],             "value", 'ZC.CHI2_MODULUS: offset: text "abc" where a number belongs'],
  ])("%s", (_what, [name, ...args], kind, message) => {
    expect(failure(run(name as string, ...args))).toEqual([kind, message]);
  });

  test("an unphysical model is #NUM! with the model's own reason, as for any function", () => {
    const [kind, message] = failure(run("CHI2_MODULUS", z, mu, muErr, "H0=70; Om=-0.5"));
    const [oneKind, oneMessage] = failure(run("DIST_LUM", 1, "H0=70; Om=-0.5"));
    expect(kind).toBe(oneKind);
    expect(message.replace("CHI2_MODULUS", "")).toBe(oneMessage.replace("DIST_LUM", ""));
  });

  test("a blank one-cell argument that has no default is #VALUE!, naming that argument", () => {
    const { call } = recording();
    expect(call([[1]], 2, "").map((r) => r.map((c) => (c as CellError).message))).toEqual([["ZC.COLUMNS: k is required"]]);
    expect(call([[1]], "", 3).map((r) => r.map((c) => (c as CellError).message))).toEqual([["ZC.COLUMNS: a is required"]]);
    expect((call([[1]], "", 3)[0][0] as CellError).kind).toBe("value");
  });
});
