/**
 * Cell addresses as the pane reads them from the host and from a stranger's formulas (sheet parts,
 * quoted names, top-left cells), and which cell of each argument a result cell reads (the
 * broadcasting rule of functions/readArguments.ts). Addresses follow A1 notation, with a quote in
 * a quoted sheet name doubled (common practice).
 */
import { describe, expect, test } from "vitest";
import { parentsOf, placeIn, placeWords, within } from "../taskpane/broadcastPlace.js";
import { qualifiedAddress, splitAddress, topLeft } from "../taskpane/cellAddress.js";
import { findCalls } from "../taskpane/formulaCalls.js";

describe("splitting a sheet-qualified address", () => {
  // reference                   | sheet          | address
  const cases: [string, string | undefined, string][] = [
    ["A1:B2",                      undefined,       "A1:B2"],
    ["Sheet1!A1:B2",               "Sheet1",        "A1:B2"],
    ["'It''s'!B2",                 "It's",          "B2"],
    ["'a!b'!C3",                   "a!b",           "C3"],
    ["!A1",                        "",              "A1"],      // an empty sheet part is still a sheet part
    ["x'!A1",                      "x'",            "A1"],      // a stranger's unquoted name ending in a quote is kept as written
  ];
  test.each(cases)("%s has sheet %j and address %s", (reference, sheet, address) => {
    expect(splitAddress(reference)).toEqual(sheet === undefined ? { address } : { sheet, address });
  });

  test("a sheet name with a quote is written quoted with the quote doubled, and read back", () => {
    expect(qualifiedAddress("It's", "B2")).toBe("'It''s'!B2");
    expect(qualifiedAddress("Sheet1", "A1")).toBe("'Sheet1'!A1");
    for (const sheet of ["It's", "''", "a'b'c", "My data"]) expect(splitAddress(qualifiedAddress(sheet, "C7"))).toEqual({ sheet, address: "C7" });
  });
});

describe("the top-left cell of a range", () => {
  // address        | column | row
  const cases: [string, number, number][] = [
    ["A1",            1,       1],
    ["$C$4:D9",       3,       4],
    ["AB12:AC30",     28,      12],   // AB = 2 × 26 + 2
    ["xfd1048576",    16384,   1048576],
  ];
  test.each(cases)("%s starts at column %i, row %i", (address, col, row) => {
    expect(topLeft(address)).toEqual({ col, row });
  });

  test.each(["", "1:3", "A:A", "x$C$4"])("%j is not a cell address", (address) => {
    expect(() => topLeft(address)).toThrow(new RangeError(`not a cell address: ${address}`));
  });
});

describe("which cell of an argument a result cell reads", () => {
  // at (row, col) | argument rows × cols | the cell read, or undefined outside what it broadcasts to
  const cases: [number, number, number, number, { row: number; col: number } | undefined][] = [
    [0, 2,           3, 2,                   undefined],
    [2, 0,           2, 3,                   undefined],
    [1, 1,           2, 2,                   { row: 1, col: 1 }],
    [1, 1,           2, 1,                   { row: 1, col: 0 }],
  ];
  test.each(cases)("row %i, column %i of a %i×%i argument", (row, col, rows, cols, expected) => {
    expect(placeIn({ row, col }, rows, cols)).toEqual(expected);
  });

  // at | result rows × cols | `at` when it is a cell of the result
  const inside: [{ row: number; col: number } | undefined, number, number, boolean][] = [
    [{ row: 0, col: 0 },   2, 2,   true],
    [{ row: 1, col: 1 },   2, 2,   true],
    [{ row: -1, col: 0 },  2, 2,   false],
    [{ row: 0, col: -1 },  2, 2,   false],
    [{ row: 2, col: 0 },   2, 2,   false],
    [{ row: 0, col: 2 },   2, 2,   false],
    [undefined,            2, 2,   false],
  ];
  test.each(inside)("%j in a %i×%i result: %s", (at, rows, cols, isInside) => {
    expect(within(at, rows, cols)).toBe(isInside ? at : undefined);
  });

  // place | matrix rows × cols | the words the inspector uses (taskpane/broadcastPlace.ts, pinned as the interface)
  test.each([
    [{ row: 0, col: 0 }, 1, 1,  "the cell"],
    [{ row: 2, col: 0 }, 5, 1,  "row 3"],
    [{ row: 0, col: 3 }, 1, 5,  "column 4"],
    [{ row: 1, col: 2 }, 3, 4,  "row 2, column 3"],
  ])("%j of a %i×%i matrix is %s", (place, rows, cols, words) => {
    expect(placeWords(place, rows, cols)).toBe(words);
  });

  test("a call after a nested one takes the parent of its own depth", () => {
    const calls = findCalls("=ZC.AGE(ZC.HUBBLE(ZC.AGE(1)), ZC.HUBBLE(2))");
    expect(parentsOf(calls)).toEqual([-1, 0, 1, 0]);
  });
});
