/**
 * A what-if table (a column of redshifts against a row of models, or turned, or a block of models)
 * costs one build per distinct model however many models the call names and whichever way they lie:
 * counted (models built per call), not timed. Its time through the built bundle is in `npm run bench`.
 */
import { describe, expect, test } from "vitest";
import { modelBuildCount } from "../functions/modelCache.js";
import { sheetCalls } from "./sheetCalls.js";

const { run } = sheetCalls("P18-CMB");

/** `count` model specs no other test names (a fresh H0 for each, so the shared cache holds none of them). */
let next = 0;
function freshSpecs(count: number): string[] {
  const base = 60 + next++ * 0.5;
  return Array.from({ length: count }, (_, i) => `P18-CMB; H0=${(base + i * 1e-4).toFixed(4)}`);
}

/** Models built while `call` runs, and what it returned. */
function counted<T>(call: () => T): { builds: number; result: T } {
  const before = modelBuildCount();
  const result = call();
  return { builds: modelBuildCount() - before, result };
}

const zColumn = (n: number) => Array.from({ length: n }, (_, i) => [0.05 + (3 * i) / n]);

describe("a what-if grid builds each distinct model once per call", () => {
  test.each([
    // orientation                      models  z rows × cols   models rows × cols   (what the sheet holds)
    ["a column of z against a row",     100,    [40, 1],        [1, 100]],
    ["a row of z against a column",     100,    [1, 40],        [100, 1]],
    ["z column against a block",        200,    [20, 1],        [20, 10]],
    ["one z against a block of models", 120,    [1, 1],         [12, 10]],
    ["a row of z against a block",      150,    [1, 15],        [10, 15]],
  ] as const)("%s (%i distinct models)", (_what, count, [zr, zc], [mr, mc]) => {
    const specs = freshSpecs(count);
    const models = Array.from({ length: mr }, (_, r) => Array.from({ length: mc }, (_, c) => specs[(r * mc + c) % count]));
    const zs = Array.from({ length: zr }, (_, r) => Array.from({ length: zc }, (_, c) => 0.1 + 0.07 * r + 0.3 * c));
    const { builds, result } = counted(() => run("DIST_LUM", zs, models));
    // before: 64 models cached and 16 held by the call, so a row of more than 80 rebuilt one a cell (4,000 for 40 × 100)
    expect(builds).toBe(count);
    const rows = Math.max(zr, mr);
    const cols = Math.max(zc, mc);
    expect([result.length, result[0].length]).toEqual([rows, cols]);
    // each cell as the formula of that one cell computes it: the same bits, in the same place
    for (const [r, c] of [[0, 0], [rows - 1, cols - 1], [rows >> 1, cols >> 1], [rows - 1, 0]]) {
      const z = zs[zr === 1 ? 0 : r][zc === 1 ? 0 : c];
      const model = models[mr === 1 ? 0 : r][mc === 1 ? 0 : c];
      expect(result[r][c], `cell ${r},${c}`).toBe(run("DIST_LUM", z, model)[0][0]);
    }
  });

  test("a row of models that repeat is built once per distinct model", () => {
    const specs = freshSpecs(70);
    const row = [Array.from({ length: 210 }, (_, i) => specs[(i * 37) % 70])];
    const { builds, result } = counted(() => run("DIST_LUM", zColumn(30), row));
    expect(builds).toBe(70);
    expect(result[29][209]).toBe(run("DIST_LUM", zColumn(30)[29][0], specs[(209 * 37) % 70])[0][0]);
  });

  test("bad specs, errors and blanks in the models keep their places, and a bad spec is tried once", () => {
    const specs = freshSpecs(60);
    const row = [["", ...specs, "H0=abc", null, "H0=abc", { errorCode: "#N/A" }]];
    run("DIST_LUM", 1); // the workbook's model, which the blank cells use, built before counting (and kept: 61 new models < 64)
    const { builds, result } = counted(() => run("DIST_LUM", zColumn(3), row));
    expect(builds).toBe(61); // 60 models and the bad spec, once
    for (const r of [0, 2]) {
      const workbookModel = run("DIST_LUM", zColumn(3)[r][0])[0][0];
      expect([result[r][0], result[r][62]]).toEqual([workbookModel, workbookModel]);
      expect(result[r][61]).toMatchObject({ kind: "value", message: `ZC.DIST_LUM: model: H0: "abc" is not a number` });
      expect(result[r][63]).toBe(result[r][61]);
      expect((result[r][64] as { message: string }).message).toBe("ZC.DIST_LUM: model: the input cell holds an error");
      expect(result[r][60]).toBe(run("DIST_LUM", zColumn(3)[r][0], specs[59])[0][0]);
    }
  });

  test("a model whose every cell is blank in z is not built", () => {
    const specs = freshSpecs(100);
    const z = [[0.5], [""]];
    const models = [specs.slice(0, 50), specs.slice(50)];
    const { builds, result } = counted(() => run("DIST_LUM", z, models));
    expect(builds).toBe(50);
    expect(result[1]).toEqual(Array(50).fill(""));
  });

  test("two model arguments as a grid (RESCALE from a column of models to a row): each model built once", () => {
    const from = freshSpecs(6);
    const to = freshSpecs(100);
    const { builds, result } = counted(() => run("RESCALE", 1000, 0.5, "distance", from.map((s) => [s]), [to]));
    expect(builds).toBe(106);
    expect(result[5][99]).toBe(run("RESCALE", 1000, 0.5, "distance", from[5], to[99])[0][0]);
  });

  test("a column of 2,000 distinct models (one a row) builds each once and holds few of them", () => {
    const specs = freshSpecs(2000);
    const { builds, result } = counted(() => run("DIST_LUM", 1, specs.map((s) => [s])));
    expect(builds).toBe(2000);
    expect(result[1999][0]).toBe(run("DIST_LUM", 1, specs[1999])[0][0]);
  });
});
