/**
 * What a spilled range shows (the shared wrapper, functions/evaluate.ts): each cell what the same
 * arguments give in one cell, in the unit asked for; a bad single-cell argument in every cell unless a
 * range before it in the signature has its own error or blank there; results that are not finite as
 * #NUM! and −0 as 0; and the pane's inspector (evaluateLazily) showing, cell by cell, what the sheet
 * shows. Expected values: the one-cell call (an identity: a range is its cells), unit identities
 * (1 Gpc = 1000 Mpc; Mpc/h = Mpc × h with h = H0/100 of the model) and the messages zcell shows
 * (functions/messages.ts), pinned as the interface.
 */
import { describe, expect, test } from "vitest";
import { Cosmology } from "../core/index.js";
import { CellError } from "../functions/cellError.js";
import { definitions } from "../functions/definitions.js";
import { evaluate, evaluateLazily, type Cell } from "../functions/evaluate.js";

const active = { spec: "P18-CMB", stored: false };
const run = (name: string, ...args: unknown[]): Cell[][] => evaluate(definitions[name], args, active);
const lazily = (name: string, ...args: unknown[]) => evaluateLazily(definitions[name], args, active);
const shown = (cell: Cell) => (cell instanceof CellError ? [cell.excelText, cell.message] : cell);

describe("a range gives, cell by cell, what each cell gives alone", () => {
  test.each([
    // function      the range's position  cells                         the other arguments
    ["DIST_LUM",     0,                    [0.5, 1, 2],                   [null, "Gpc"]],
    ["DIST_LUM",     0,                    [0.5, 1, 2],                   [null, "Mpc/h"]],
    ["DIST_LUM",     0,                    [0.5, -1, "", "x", 2],         ["W9-ALL"]],
    ["EXTINCTION",   1,                    [0.1, 0.3, -0.2],              [5500]],
    ["VELOCITY",     0,                    [0.1, 1, 5],                   ["relativistic"]],
    ["GROWTH",       0,                    [0, 1, 3],                     ["P18-BAO"]],
    ["Z_FROM_VELOCITY", 0,                 [1000, -3000, 2e5],            ["optical", "km/s"]],
  ])("%s with its argument %i a column %j", (name, at, cells, others) => {
    const args = (x: unknown) => [...others.slice(0, at), x, ...others.slice(at)];
    const column = run(name, ...args(cells.map((c) => [c])));
    expect(column.length).toBe(cells.length);
    cells.forEach((c, r) => {
      const [[alone]] = run(name, ...args(c));
      expect(column[r].length).toBe(1);
      expect(shown(column[r][0]), `${name} row ${r}`).toEqual(shown(alone));
    });
    const row = run(name, ...args([cells]));
    expect(row.length).toBe(1);
    expect(row[0].map(shown)).toEqual(column.map((r) => shown(r[0])));
  });

  test("a column of redshifts in Gpc is the same column in Mpc over 1000, and in Mpc/h the Mpc times h", () => {
    const z = [[0.5], [1], [2]];
    const h = Cosmology.fromSpec("P18-CMB").h;
    const mpc = run("DIST_LUM", z).map((r) => r[0] as number);
    const gpc = run("DIST_LUM", z, null, "Gpc").map((r) => r[0] as number);
    const perH = run("DIST_LUM", z, null, "Mpc/h").map((r) => r[0] as number);
    mpc.forEach((d, r) => {
      expect(gpc[r]).toBeCloseTo(d / 1000, 12);
      expect(Math.abs(perH[r] / (d * h) - 1)).toBeLessThan(1e-14);
    });
  });

  test("a result of −0 shows as 0, in a range as in one cell (E(B−V) = −0 gives A = −0 before cleaning)", () => {
    const [[first], [second]] = run("EXTINCTION", 5500, [[-0], [0.1]]);
    expect(Object.is(first, 0)).toBe(true);
    expect(second).toBeGreaterThan(0);
    expect(Object.is(run("EXTINCTION", 5500, -0)[0][0], 0)).toBe(true);
  });

  test("a result that is not finite is #NUM! saying so once with the function's name, the cells that give one sharing it", () => {
    // D_L(z = 1e308) overflows: (1 + z) D_C(z) with D_C > 1 Mpc
    const [[a], [b], [c]] = run("DIST_LUM", [[1e308], [1e308], [1]]);
    expect(shown(a)).toEqual(["#NUM!", "ZC.DIST_LUM: the result is not a finite number for these arguments"]);
    expect(b).toBe(a);
    expect(typeof c).toBe("number");
    expect(shown(run("DIST_LUM", 1e308)[0][0])).toEqual(["#NUM!", "ZC.DIST_LUM: the result is not a finite number for these arguments"]);
  });
});

describe("a bad single-cell argument and the ranges beside it", () => {
  const z1Error = ["#VALUE!", 'ZC.DIST_BETWEEN: z1: text "x" where a number belongs'];

  test("a bad single cell before every range fills the whole result, whatever the ranges hold", () => {
    const result = run("DIST_BETWEEN", "x", [[1, "y", 3], [4, "", 6]]);
    expect(result.map((r) => r.map(shown))).toEqual([
      [z1Error, z1Error, z1Error],
      [z1Error, z1Error, z1Error],
    ]);
    expect(result[1][2]).toBe(result[0][0]);
  });

  test("a range before the bad single cell shows its own error or blank first, then the single cell's", () => {
    const modelError = ["#VALUE!", expect.stringMatching(/^ZC\.DIST_LUM: model: unknown preset "no such model": use one of P18-CMB, /)];
    const result = run("DIST_LUM", [[1], ["x"], [""], [2]], "no such model");
    expect(result.map((r) => shown(r[0]))).toEqual([modelError, ["#VALUE!", 'ZC.DIST_LUM: z: text "x" where a number belongs'], "", modelError]);
  });
});

describe("the pane's inspector shows each cell as the sheet does, computing only that cell", () => {
  test("a range of models: a model cell, a number and a logical value where a model belongs", () => {
    const models = [["P18-CMB"], [5], [true], ["W9-ALL"]];
    const sheet = run("DIST_LUM", 1, models);
    const inspector = lazily("DIST_LUM", 1, models);
    expect([inspector.rows, inspector.cols]).toEqual([4, 1]);
    for (let r = 0; r < 4; r++) expect(shown(inspector.cell(r, 0))).toEqual(shown(sheet[r][0]));
    expect(shown(inspector.cell(1, 0))).toEqual(["#VALUE!", "ZC.DIST_LUM: model: 5 where text belongs"]);
    expect(shown(inspector.cell(2, 0))).toEqual(["#VALUE!", "ZC.DIST_LUM: model: TRUE where text belongs"]);
  });

  test("two ranges of models (RESCALE's from and to), each cell read where it is", () => {
    const from = [["P18-CMB"], [5]];
    const to = [["W9-ALL", 7]];
    const sheet = run("RESCALE", 100, 1, "distance", from, to);
    const inspector = lazily("RESCALE", 100, 1, "distance", from, to);
    expect([inspector.rows, inspector.cols]).toEqual([2, 2]);
    for (let r = 0; r < 2; r++) for (let c = 0; c < 2; c++) expect(shown(inspector.cell(r, c))).toEqual(shown(sheet[r][c]));
    expect(typeof sheet[0][0]).toBe("number");
  });

  test("a table and a function of whole columns are shown whole", () => {
    const presets = run("PRESETS");
    const inspector = lazily("PRESETS");
    expect([inspector.rows, inspector.cols]).toEqual([presets.length, presets[0].length]);
    expect(inspector.rows).toBeGreaterThan(1);
    expect(inspector.cell(presets.length - 1, 1)).toEqual(presets[presets.length - 1][1]);
    const chi2 = lazily("CHI2_MODULUS", [[0.1], [0.5]], [[38.3], [42.3]], [[0.1], [0.1]]);
    expect([chi2.rows, chi2.cols]).toEqual([1, 1]);
    expect(chi2.cell(0, 0)).toBe(run("CHI2_MODULUS", [[0.1], [0.5]], [[38.3], [42.3]], [[0.1], [0.1]])[0][0]);
  });

  test("a call whose arguments cannot be read is one cell with the reason", () => {
    const inspector = lazily("DIST_BETWEEN", [[0.5], [1]], [[2], [3], [4]]);
    expect([inspector.rows, inspector.cols]).toEqual([1, 1]);
    expect(shown(inspector.cell(0, 0))).toEqual(["#VALUE!", expect.stringMatching(/^ZC\.DIST_BETWEEN: ranges do not fit together: z1 is 2×1 and z2 is 3×1/)]);
  });
});
