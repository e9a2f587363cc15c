/**
 * What the cell inspector reads an argument of a ZC call as (taskpane/readArgument.ts): a literal of
 * the formula, the values behind a reference (never more than its read limit), a nested call's
 * result; and how it names and shows one of its cells. The expected values are Excel's own reading
 * of a formula's literals ("50%" is 0.5, "" inside a string is one quote: Excel's formula syntax,
 * common practice) and the pane's own words, pinned here as its interface.
 */
import { describe, expect, test } from "vitest";
import { CellError } from "../functions/cellError.js";
import { findCalls } from "../taskpane/formulaCalls.js";
import {
  cellName,
  cut,
  firstOf,
  inspectorReadLimit,
  matrixOf,
  readArgument,
  showValue,
  type ArgumentSource,
  type ReferenceRead,
} from "../taskpane/readArgument.js";

/** The tokens and source text of each argument of the one call in `formula`. */
function argumentsOf(formula: string) {
  const [call] = findCalls(formula);
  return call.args.map((text, i) => ({ text, tokens: call.argTokens[i] }));
}

const noReference = async (reference: string): Promise<ReferenceRead> => {
  throw new Error(`no reference expected, asked for ${reference}`);
};

/** What the inspector reads the first argument of `=ZC.DIST_LUM(<argument>)` as. */
async function readFirst(argument: string, read = noReference, nested = new Map()) {
  const [{ text, tokens }] = argumentsOf(`=ZC.DIST_LUM(${argument})`);
  return readArgument(tokens, text, read, nested);
}

describe("a literal in the formula is read as Excel reads it", () => {
  //  argument written          value read                    why (common practice: Excel's formula syntax)
  const literals: [string, unknown][] = [
    ["2.5",                     2.5],
    ["50%",                     0.5],                         // a percent sign divides by 100
    ["12.5%",                   0.125],
    ["-3",                      -3],                          // unary minus before a number
    ["-2.5%",                   -0.025],
    ['"P18-BAO"',               "P18-BAO"],                   // a string without its quotes
    ['"say ""hi"""',            'say "hi"'],                  // "" inside a string is one quote
    ["TRUE",                    true],                        // logical values, any case
    ["false",                   false],
    ["True",                    true],
    ['{1,2;3,"a"}',             [[1, 2], [3, "a"]]],          // an array constant: "," columns, ";" rows
  ];
  test.each(literals)("%s is known as %j", async (argument, value) => {
    expect(await readFirst(argument)).toMatchObject({ known: true, value });
  });

  test("an omitted argument is known to be omitted", async () => {
    const [, omitted] = argumentsOf("=ZC.DIST_LUM(1,,\"Mpc\")");
    expect(await readArgument(omitted.tokens, omitted.text, noReference, new Map())).toEqual({ known: true, value: undefined });
  });

  test("an array constant is named as the array; a number, a string and a logical have no source", async () => {
    expect((await readFirst("{1,2}")).source).toEqual({ kind: "array" });
    for (const argument of ["1", '"x"', "TRUE"]) expect((await readFirst(argument)).source, argument).toBeUndefined();
  });

  test("what only Excel computes is not claimed: an expression, a signed reference, an error value", async () => {
    for (const argument of ["-1*2", "+5", "-A1", "1+2", "#N/A", "A1&\"x\""]) {
      expect(await readFirst(argument), argument).toEqual({ known: false, value: undefined });
    }
  });
});

describe("a nested ZC call is its result, or why it is not known", () => {
  const nestedCall = "ZC.AGE(1)";
  const result = [[5.9], [3.3]];

  test("a computed nested call is its whole result, named after the call", async () => {
    const got = await readFirst(nestedCall, noReference, new Map([[nestedCall, result]]));
    expect(got).toEqual({ known: true, value: result, source: { kind: "call", name: "ZC.AGE" } });
  });

  test("a nested call not computed says why, and still names the call", async () => {
    const why = "computed at one cell only: its range holds more than the inspector computes";
    const got = await readFirst(nestedCall, noReference, new Map([[nestedCall, why]]));
    expect(got).toEqual({ known: false, value: undefined, note: why, source: { kind: "call", name: "ZC.AGE" } });
  });

  test("a call the inspector has no result for is not known, with no source claimed", async () => {
    expect(await readFirst(nestedCall)).toEqual({ known: false, value: undefined });
    expect(await readFirst("-ZC.AGE(1)", noReference, new Map([[nestedCall, result]]))).toEqual({ known: false, value: undefined });
  });
});

describe("a reference is read through Excel only within the inspector's limit", () => {
  const values = [[1], [2]];
  //  cells in the range       values given by the reader   known   (the limit: inspectorReadLimit = 100,000 cells, readArgument.ts)
  const sizes: [number, boolean, boolean][] = [
    [2,                        true,                        true],
    [100_000,                  true,                        true],   // exactly the limit is read
    [100_001,                  true,                        false],  // one more is not, whatever the reader gave
    [5,                        false,                       false],  // the reader gave its size only
  ];
  test.each(sizes)("a range of %d cells (values given: %s) is known: %s", async (cells, given, known) => {
    const read = async (): Promise<ReferenceRead> => ({ address: "Sheet1!A1:A2", cells, ...(given ? { values } : {}) });
    const got = await readFirst("A1:A2", read);
    expect(got.known).toBe(known);
    expect(got.source).toEqual({ kind: "reference", text: "A1:A2", address: "Sheet1!A1:A2" });
    if (known) expect(got.value).toBe(values);
    else {
      expect(got.value).toBeUndefined();
      expect(got.note).toBe(`a range of ${cells.toLocaleString("en-US")} cells, not read (the inspector reads at most 100,000)`);
    }
  });

  test("the limit the pane states is 100,000 cells", () => {
    expect(inspectorReadLimit).toBe(100_000);
  });

  test("a reference Excel cannot read says Excel's reason, cut to 100 characters", async () => {
    //  what the reader threw            the note the pane shows
    const failures: [unknown, string][] = [
      [new Error("The range is on a sheet that was deleted"), "not read (Excel: The range is on a sheet that was deleted)"],
      [new Error("x".repeat(100)),                             `not read (Excel: ${"x".repeat(100)})`],
      [new Error("x".repeat(101)),                             `not read (Excel: ${"x".repeat(100)}…)`],
      ["a bare text",                                          "not read (Excel: a bare text)"],
      [undefined,                                              "not read (Excel: undefined)"],
      [null,                                                   "not read (Excel: null)"],
    ];
    for (const [thrown, note] of failures) {
      const read = async (): Promise<ReferenceRead> => {
        throw thrown;
      };
      expect(await readFirst("Rates", read)).toEqual({ known: false, value: undefined, note });
    }
  });
});

describe("how the pane shows a value", () => {
  //  value                                 shown
  const shown: [unknown, string][] = [
    [undefined,                             "omitted"],
    ["",                                    "blank"],
    [null,                                  "blank"],
    ["Mpc",                                 '"Mpc"'],
    [0.5,                                   "0.5"],
    [true,                                  "true"],
    [new CellError("num", "ZC.DIST_LUM: z must be ≥ 0"), "#NUM! (ZC.DIST_LUM: z must be ≥ 0)"],
    [[[7]],                                 "7"],                          // a single cell is its value
    [[[""]],                                "blank"],
    [[[1, 2]],                              "range 1×2, first 1"],
    [[[1], [2], [3]],                       "range 3×1, first 1"],
    [[["a", "b"], ["c", "d"]],              'range 2×2, first "a"'],
  ];
  test.each(shown)("%j is shown as %s", (value, text) => {
    expect(showValue(value)).toBe(text);
  });

  test("text is cut to its limit with an ellipsis, and not at the limit itself", () => {
    //  text      max   cut
    const cases: [string, number, string][] = [
      ["abc",     3,    "abc"],
      ["abcd",    3,    "abc…"],
      ["",        0,    ""],
      ["ab",      5,    "ab"],
    ];
    for (const [text, max, expected] of cases) expect(cut(text, max)).toBe(expected);
  });
});

describe("a value as a matrix, and its first cell", () => {
  test("ranges, arrays and results are matrices; a single value, an empty row or a flat list is not", () => {
    expect(matrixOf([[1, 2]])).toEqual([[1, 2]]);
    for (const value of [5, "a", undefined, [], [[]], [1, 2]]) expect(matrixOf(value), JSON.stringify(value)).toBeUndefined();
  });

  test("the first cell of a matrix, or the value itself", () => {
    expect(firstOf([[3, 4], [5, 6]])).toBe(3);
    expect(firstOf(9)).toBe(9);
    expect(firstOf([[]])).toEqual([[]]);
  });
});

describe("the name of one cell of an argument", () => {
  const second = { row: 1, col: 0 };
  //  source                                                                        place            rows cols  name
  const names: [ArgumentSource | undefined, { row: number; col: number }, number, number, string][] = [
    [{ kind: "reference", text: "B2:B9" },                                          second,          8,   1,    "B3"],
    [{ kind: "reference", text: "Rates", address: "Sheet1!$B$2:$B$9" },             second,          8,   1,    "Sheet1!B3"],
    [{ kind: "reference", text: "data", address: "'My sheet'!AB12:AC20" },          { row: 2, col: 1 }, 9, 2,   "'My sheet'!AC14"],
    [{ kind: "reference", text: "XFD1:XFD3" },                                      { row: 2, col: 0 }, 3, 1,   "XFD3"],
    [{ kind: "reference", text: "Rates2024" },                                      second,          8,   1,    "row 2 of Rates2024"],
    [{ kind: "reference", text: "Q1_sales" },                                       second,          8,   1,    "row 2 of Q1_sales"],
    [{ kind: "reference", text: "ABCD1" },                                          second,          8,   1,    "row 2 of ABCD1"],
    [{ kind: "array" },                                                             { row: 0, col: 1 }, 1, 3,   "column 2 of the array"],
    [undefined,                                                                     second,          2,   2,    "row 2, column 1 of the array"],
    [{ kind: "call", name: "ZC.AGE" },                                              second,          4,   1,    "row 2 of the result of ZC.AGE"],
  ];
  test.each(names)("%j at %j of %d×%d is %s", (source, place, rows, cols, name) => {
    expect(cellName(source, place, rows, cols)).toBe(name);
  });
});
