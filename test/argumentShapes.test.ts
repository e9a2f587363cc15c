/**
 * Arguments in every shape a caller may pass them: a value, a 1×1 range, a row given as a flat list,
 * empty lists, and a single cell beside ranges. Excel passes a value or a 2-D array (null for an
 * omitted argument: @types/custom-functions-runtime); the pane's inspector and other callers may
 * pass the rest, and each must read as the cells it stands for. Expected values are the same call
 * in its plain shape (identities), and the messages zcell's own (functions/messages.ts).
 */
import { describe, expect, test } from "vitest";
import { CellError } from "../functions/cellError.js";
import type { Cell } from "../functions/evaluate.js";
import { toMatrix } from "../functions/readArguments.js";
import { sheetCalls } from "./sheetCalls.js";

const { run, num } = sheetCalls("P18-CMB");
const shown = (cells: Cell[][]) => cells.map((row) => row.map((c) => (c instanceof CellError ? `#${c.kind} ${c.message}` : c)));

describe("a raw argument as a matrix", () => {
  test.each([
    // raw                  matrix
    [undefined,             undefined],
    [null,                  undefined],
    [[],                    undefined],
    [[[]],                  undefined],
    [0,                     [[0]]],
    ["",                    [[""]]],
    [[1, 2],                [[1, 2]]],
    [[[1], [2]],            [[1], [2]]],
  ])("%j → %j", (raw, matrix) => {
    expect(toMatrix(raw)).toEqual(matrix);
  });
});

describe("one cell, in any shape, is that cell", () => {
  const z = num("DIST_LUM", 0.5);
  const w9 = num("DIST_LUM", 0.5, "W9-ALL");
  test.each([
    // z         model           unit       result
    [[0.5],      null,           null,      z],
    [[[0.5]],    null,           null,      z],
    [[[0.5]],    [[" W9-ALL "]], null,      w9],
    [0.5,        ["W9-ALL"],     null,      w9],
    [0.5,        [],             null,      z],
    [0.5,        [[]],           null,      z],
    [0.5,        null,           [],        z],
    [0.5,        null,           [[]],      z],
    [0.5,        null,           ["Gpc"],   z / 1000],
    [0.5,        null,           [["Gpc"]], z / 1000],
  ])("DIST_LUM(%j, %j, %j)", (zArg, model, unit, expected) => {
    const [[cell]] = run("DIST_LUM", zArg, model, unit);
    expect(cell as number).toBeCloseTo(expected, 9);
  });

  test.each([[[]], [[[]]]])("a required argument given as %j is left out", (zArg) => {
    expect(shown(run("DIST_LUM", zArg))).toEqual([["#value ZC.DIST_LUM: z is required"]]);
  });
});

describe("several cells in a flat list are a row", () => {
  test("a flat list of redshifts is a row of results; a flat list of models beside a column spans both", () => {
    const row = run("DIST_LUM", [0.5, 0.6]);
    expect(row.length).toBe(1);
    expect(row[0]).toEqual([num("DIST_LUM", 0.5), num("DIST_LUM", 0.6)]);
    const grid = run("DIST_LUM", [[0.5], [0.6]], ["W9-ALL", "P18-CMB"]);
    expect(grid).toEqual([
      [num("DIST_LUM", 0.5, "W9-ALL"), num("DIST_LUM", 0.5)],
      [num("DIST_LUM", 0.6, "W9-ALL"), num("DIST_LUM", 0.6)],
    ]);
  });

  test("beside a range, an empty list for the model is the workbook's model, and a flat list of one unit is that unit", () => {
    expect(run("DIST_LUM", [[0.5], [0.6]], [])).toEqual([[num("DIST_LUM", 0.5)], [num("DIST_LUM", 0.6)]]);
    expect(run("DIST_LUM", [[0.5], [0.6]], [[]])).toEqual([[num("DIST_LUM", 0.5)], [num("DIST_LUM", 0.6)]]);
    const [[a, b]] = run("DIST_LUM", [[0.5, 0.6]], null, ["Gpc"]);
    expect(a as number).toBeCloseTo(num("DIST_LUM", 0.5) / 1000, 9);
    expect(b as number).toBeCloseTo(num("DIST_LUM", 0.6) / 1000, 9);
  });

  test("a unit given as a flat list of several is refused as a range of units is", () => {
    expect(shown(run("DIST_LUM", 0.5, null, ["Mpc", "Gpc"]))).toEqual([
      ["#value ZC.DIST_LUM: unit must be one cell: it applies to the whole result (for several, one formula each)"],
    ]);
  });
});
