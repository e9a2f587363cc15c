/**
 * How much work reading a call's arguments does, counted (not timed): a column of plain numbers is
 * read with no check per cell, a column of positions as text without the long reader (kept for an
 * error's words), a range of models resolves each distinct model once per call (at most 16 kept at
 * hand), and a function's plan of arguments is worked out once, not once per formula. What is read is
 * checked too: the same values the long ways give.
 */
import { describe, expect, test, vi } from "vitest";

const counted = vi.hoisted(() => ({ models: 0, longPositions: 0 }));

vi.mock("../functions/modelCache.js", async (importOriginal) => {
  const cache = await importOriginal<typeof import("../functions/modelCache.js")>();
  return {
    ...cache,
    modelFor: (spec: string) => {
      counted.models++;
      return cache.modelFor(spec);
    },
  };
});

vi.mock("../functions/readPositions.js", async (importOriginal) => {
  const positions = await importOriginal<typeof import("../functions/readPositions.js")>();
  return {
    ...positions,
    readPosition: (...args: Parameters<typeof positions.readPosition>) => {
      counted.longPositions++;
      return positions.readPosition(...args);
    },
  };
});

const { CellError } = await import("../functions/cellError.js");
const { definitions } = await import("../functions/definitions.js");
const { cellAt, readCall } = await import("../functions/readArguments.js");
type Column = import("../functions/readArguments.js").Column;

const active = { spec: "P18-CMB", stored: false };
const columnOf = (values: unknown[]) => values.map((v) => [v]);
const rangeNamed = (ranges: readonly Column[], name: string) => ranges.find((r) => r.name === name)!;
const cells = (column: Column) => Array.from({ length: column.rows * column.cols }, (_, i) => cellAt(column, i));

describe("a column of plain numbers", () => {
  test("10,000 velocities in m/s are read into km/s with no check per cell, all kept as numbers", () => {
    const speeds = Array.from({ length: 10_000 }, (_, i) => 1000 * (i + 1));
    const isFinite = vi.spyOn(Number, "isFinite");
    let column: Column;
    try {
      column = rangeNamed(readCall(definitions.Z_FROM_VELOCITY, [columnOf(speeds), null, "m/s"], active).ranges, "v");
      expect(isFinite.mock.calls.length).toBeLessThan(10);
    } finally {
      isFinite.mockRestore();
    }
    // 1 km/s = 1000 m/s (SI prefix k = 10³)
    expect(column.others.size).toBe(0);
    expect(Array.from(column.numbers!)).toEqual(speeds.map((v) => v / 1000));
  });

  test("a cell that is no finite number still goes the long way: its error, the others numbers", () => {
    const column = rangeNamed(readCall(definitions.Z_FROM_VELOCITY, [columnOf([1000, Infinity, "x", 3000]), null, "m/s"], active).ranges, "v");
    const read = cells(column).map((c) => (c instanceof CellError ? c.message : c));
    // the messages zcell shows (functions/messages.ts), pinned as the interface
    expect(read).toEqual([1, "v: not a finite number", 'v: text "x" where a number belongs', 3]);
  });
});

describe("a column of positions as text", () => {
  test("1,000 right ascensions in hours are read into degrees without the long reader; a bad one goes the long way", () => {
    // 12:30:00 h = 187.5° (15° an hour, common practice)
    const texts = [...Array.from({ length: 999 }, () => "12:30:00"), "25:00:00"];
    const before = counted.longPositions;
    const column = rangeNamed(readCall(definitions.REDSHIFT_CMB, [0.01, columnOf(texts), 10], active).ranges, "ra");
    expect(counted.longPositions - before).toBe(1);
    expect(Array.from(column.numbers!.subarray(0, 999)).every((x) => Math.abs(x - 187.5) < 1e-9)).toBe(true);
    // the message zcell shows (functions/messages.ts and the core's sexagesimal reader), pinned as the interface
    expect(cellAt(column, 999)).toEqual(new CellError("value", 'ra: "25:00:00" has hours 25: a right ascension is below 24h (mark degrees with d or °)'));
  });
});

describe("a range of models", () => {
  /** Models resolved while every cell of the call's range of models is turned into its model, as evaluate does. */
  function modelsResolved(specs: string[]): number {
    const column = rangeNamed(readCall(definitions.DIST_LUM, [0.5, columnOf(specs)], active).ranges, "model");
    const before = counted.models;
    for (const spec of cells(column)) column.model!(spec as string);
    return counted.models - before;
  }
  const hubble = (n: number) => Array.from({ length: n }, (_, i) => `H0=${60 + i}`);

  test("1,000 cells alternating between two models resolve each once", () => {
    expect(modelsResolved(Array.from({ length: 1000 }, (_, i) => hubble(2)[i % 2]))).toBe(2);
  });

  test("16 distinct models, twice over, resolve 16 times: all are kept at hand", () => {
    expect(modelsResolved([...hubble(16), ...hubble(16)])).toBe(16);
  });

  test("17 distinct models, twice over, resolve 34 times: at most 16 are kept, the oldest leaves first", () => {
    expect(modelsResolved([...hubble(17), ...hubble(17)])).toBe(34);
  });
});

describe("a function's plan of arguments", () => {
  test("1,000 one-cell formulas of a function work out which arguments are units, scalar texts and cells once", () => {
    const args = [...definitions.DIST_LUM.args];
    const planned = vi.spyOn(args, "forEach");
    const def = { ...definitions.DIST_LUM, args };
    const read = Array.from({ length: 1000 }, () => readCall(def, [0.5, null, "Gpc"], active));
    expect(planned.mock.calls.length).toBe(1);
    // one formula a row keeps no list of ranges of its own: all share one empty list
    expect(new Set(read.map((r) => r.ranges)).size).toBe(1);
    expect(read[0].ranges).toEqual([]);
    expect(read[999].args.z).toBe(0.5);
    // a result in Mpc given in Gpc: 1/1000 (FITS prefixes G = 10⁹, M = 10⁶)
    expect(Math.abs(read[999].resultFactor / 1e-3 - 1)).toBeLessThan(1e-12);
  });
});
