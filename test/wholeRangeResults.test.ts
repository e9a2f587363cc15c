/**
 * What a whole range costs and what reaches Excel (the shared wrapper, functions/evaluate.ts), counted,
 * not timed: a column of redshifts against constant arguments goes through the function's one-number
 * path (FunctionDef.kernel), one call a cell; a call over ranges of models builds each distinct model
 * once, whichever range holds the most of them; and a whole-column result that overflows reaches the
 * host as its #NUM! error value. Expected values: the one-cell call (an identity: a range is its cells),
 * the counts the documented rules give (one build per distinct model; the shared cache keeps 64,
 * functions/modelCache.ts), and the messages zcell shows (functions/messages.ts), pinned as the
 * interface. Model texts are fresh values of H0 no other test names, so the shared cache holds none.
 */
import { afterEach, describe, expect, test, vi } from "vitest";
import { CellError } from "../functions/cellError.js";
import { definitions } from "../functions/definitions.js";
import { evaluate, evaluateLazily, type Args, type Cell, type FunctionDef } from "../functions/evaluate.js";
import { modelBuildCount } from "../functions/modelCache.js";

const active = { spec: "P18-CMB", stored: false };
const shown = (cell: Cell) => (cell instanceof CellError ? [cell.excelText, cell.message] : cell);

/** A copy of a definition that counts its calls: `kernel` (the one-number path) and `compute` (any cell). */
function counting(name: string) {
  const def = definitions[name];
  const calls = { kernel: 0, compute: 0 };
  const counted: FunctionDef = {
    ...def,
    compute: (a: Args) => {
      calls.compute++;
      return def.compute!(a);
    },
    kernel: {
      arg: def.kernel!.arg,
      of: (a: Args, x: number) => {
        calls.kernel++;
        return def.kernel!.of(a, x);
      },
    },
  };
  return { calls, run: (...args: unknown[]) => evaluate(counted, args, active), lazily: (...args: unknown[]) => evaluateLazily(counted, args, active) };
}

describe("a column of numbers against constant arguments: one call of the one-number path a cell", () => {
  test.each([
    // function       the column                          the other arguments        cells computed
    ["DIST_LUM",      [[0.5], [1], [2], [3]],             [null, "Gpc"],             4],
    ["DIST_LUM",      [[0.5], [-1], [""], ["x"], [2]],    ["W9-ALL"],                3],
    ["GROWTH",        [[0], [1], [1e308]],                ["P18-BAO"],               3],
  ])("%s of %j", (name, column, others, computedCells) => {
    const { calls, run } = counting(name);
    const result = run(column, ...others);
    expect(calls).toEqual({ kernel: computedCells, compute: 0 });
    // and each cell is what the cell alone gives
    column.forEach(([x], r) => expect(shown(result[r][0]), `row ${r}`).toEqual(shown(evaluate(definitions[name], [x, ...others], active)[0][0])));
  });

  test("EXTINCTION's column of E(B−V) (its second argument) too, and −0 shows as 0", () => {
    const { calls, run } = counting("EXTINCTION");
    const result = run(5500, [[-0], [0.1], [0.3]]);
    expect(calls).toEqual({ kernel: 3, compute: 0 });
    expect(Object.is(result[0][0], 0)).toBe(true);
  });

  test("a column in h-scaled units, a row, or a second range is computed cell by cell (the general path), the same values", () => {
    const perH = counting("DIST_LUM");
    perH.run([[0.5], [1]], null, "Mpc/h");
    expect(perH.calls).toEqual({ kernel: 0, compute: 2 });
    const row = counting("DIST_LUM");
    row.run([[0.5, 1, 2]]);
    expect(row.calls).toEqual({ kernel: 0, compute: 3 });
    const models = counting("DIST_LUM");
    models.run([[0.5], [1]], [["P18-CMB"], ["W9-ALL"]]);
    expect(models.calls).toEqual({ kernel: 0, compute: 2 });
  });

  test("a column against a model that is a problem: the column's own blanks and errors, then the model's error, nothing computed", () => {
    const { calls, run } = counting("DIST_LUM");
    const result = run([[1], ["x"], [""]], "no such model");
    expect(calls).toEqual({ kernel: 0, compute: 0 });
    expect(result.map((r) => shown(r[0]))).toEqual([
      ["#VALUE!", expect.stringMatching(/^ZC\.DIST_LUM: model: unknown preset "no such model"/)],
      ["#VALUE!", 'ZC.DIST_LUM: z: text "x" where a number belongs'],
      "",
    ]);
  });
});

describe("a block of cells (rows and columns) gives, cell by cell, what each cell gives alone", () => {
  test.each([
    // function     the block                                   the other arguments
    ["DIST_LUM",    [[0.5, 1, 2], [3, "", "x"], [-1, 0.1, 4]],  ["W9-ALL"]],
    ["EXTINCTION",  [[0.1, 0.2], [0.3, 0.4]],                   [5500]],
  ])("%s of %j", (name, block, others) => {
    const args = (x: unknown) => (name === "EXTINCTION" ? [...others, x] : [x, ...others]);
    const result = evaluate(definitions[name], args(block), active);
    expect([result.length, result[0].length]).toEqual([block.length, block[0].length]);
    block.forEach((row, r) =>
      row.forEach((x, c) => expect(shown(result[r][c]), `cell ${r},${c}`).toEqual(shown(evaluate(definitions[name], args(x), active)[0][0]))),
    );
  });
});

describe("the pane's inspector computes only the cell it is asked about", () => {
  test("one cell of a column of 2,000 redshifts: one computation, the number the whole call gives there", () => {
    const z = Array.from({ length: 2000 }, (_, i) => [0.01 + i / 1000]);
    const { calls, lazily } = counting("DIST_LUM");
    const inspector = lazily(z, "W9-ALL");
    expect([inspector.rows, inspector.cols]).toEqual([2000, 1]);
    expect(calls).toEqual({ kernel: 0, compute: 0 });
    const cell = inspector.cell(1234, 0);
    expect(calls.kernel + calls.compute).toBe(1);
    expect(cell).toBe(evaluate(definitions.DIST_LUM, [z[1234][0], "W9-ALL"], active)[0][0]);
  });
});

/** `count` model texts no other test names. */
let next = 0;
function freshSpecs(count: number): string[] {
  const base = 80 + next++;
  return Array.from({ length: count }, (_, i) => `P18-CMB; H0=${(base + i * 1e-3).toFixed(3)}`);
}

function builds<T>(work: () => T): { builds: number; result: T } {
  const before = modelBuildCount();
  const result = work();
  return { builds: modelBuildCount() - before, result };
}

describe("a call over ranges of models builds each distinct model once, grouped by the range that holds the most", () => {
  test.each([
    // from_model             to_model
    ["a column of 100",       "a row of 2"],
    ["a row of 2",            "a column of 100"],
  ])("RESCALE from %s to %s: 102 models built", (fromShape, toShape) => {
    const many = freshSpecs(100);
    const two = freshSpecs(2);
    const asColumn = (s: string[]) => s.map((x) => [x]);
    const from = fromShape.startsWith("a column") ? asColumn(many) : [two];
    const to = toShape.startsWith("a column") ? asColumn(many) : [two];
    const { builds: built, result } = builds(() => evaluate(definitions.RESCALE, [100, 1, "distance", from, to], active));
    expect(built).toBe(102);
    expect([result.length, result[0].length]).toEqual([100, 2]);
    // cell (r, c) is the same call with that cell's two models
    for (const [r, c] of [[0, 0], [37, 1], [99, 1]]) {
      const one = evaluate(definitions.RESCALE, [100, 1, "distance", from.length === 1 ? from[0][c] : from[r][0], to.length === 1 ? to[0][c] : to[r][0]], active);
      expect(shown(result[r][c]), `cell ${r},${c}`).toEqual(shown(one[0][0]));
    }
  });

  test("a column of 70 redshifts against a row of 66 models: 66 models built, not one a cell", () => {
    const models = [freshSpecs(66)];
    const z = Array.from({ length: 70 }, (_, i) => [0.01 + i / 20]);
    const { builds: built, result } = builds(() => evaluate(definitions.DIST_HUBBLE, [z, models], active));
    expect(built).toBe(66);
    expect([result.length, result[0].length]).toEqual([70, 66]);
    const corner = evaluate(definitions.DIST_HUBBLE, [z[69][0], models[0][65]], active)[0][0];
    expect(result[69][65]).toBe(corner);
  });
});

describe("what Excel receives from a function of whole columns", () => {
  class HostError {
    constructor(
      readonly code: string,
      readonly message: string,
    ) {}
  }
  const g = globalThis as { CustomFunctions?: unknown };
  afterEach(() => {
    delete g.CustomFunctions;
  });

  /** The wrapper and its modules loaded afresh under a stub of Excel's runtime, the workbook's settings read. */
  async function freshHost() {
    g.CustomFunctions = { Error: HostError, ErrorCode: { invalidValue: "#VALUE!", notAvailable: "#N/A", invalidNumber: "#NUM!" } };
    vi.resetModules();
    const { callFromSheet } = await import("../functions/evaluate.js");
    const { definitions: fresh } = await import("../functions/definitions.js");
    const { CellError: FreshError } = await import("../functions/cellError.js");
    const { whenSettingsReady } = await import("../functions/activeModel.js");
    await whenSettingsReady();
    return { callFromSheet, fresh, FreshError };
  }

  test("a result that overflows is the host's #NUM! error value, not an object it cannot show", async () => {
    const { callFromSheet, fresh } = await freshHost();
    // errors of 1e-300 mag make χ² = Σ (Δμ/σ)² overflow (CHANGELOG, "Whole-column results that overflow")
    const result = callFromSheet(fresh.CHI2_MODULUS, [[[0.1], [0.5]], [[38.3], [42.3]], [[1e-300], [1e-300]], null, 0]);
    expect(result).toEqual([[new HostError("#NUM!", "ZC.CHI2_MODULUS: the result is not a finite number for these arguments")]]);
  });

  test("a table or a function of whole columns whose cells hold an error and text: the error as the host's value, the text and numbers as they are", async () => {
    const { callFromSheet, FreshError } = await freshHost();
    // FunctionDef (functions/FunctionDef.ts): a table and a function of whole columns return cells (Cell: numbers, text, CellError)
    const cells = () => [["source", 2.5], ["row 3", new FreshError("na", "ZC.TABLE: no value in row 3")]];
    const table: FunctionDef = { name: "TABLE", args: [], table: cells };
    const over: FunctionDef = { name: "TABLE", args: [{ kind: "number", name: "x" }], over: { columns: ["x"], compute: cells } };
    for (const def of [table, over]) {
      expect(callFromSheet(def, [[[1], [2]]]), def.table ? "table" : "over").toEqual([
        ["source", 2.5],
        ["row 3", new HostError("#N/A", "ZC.TABLE: no value in row 3")],
      ]);
    }
  });
});
