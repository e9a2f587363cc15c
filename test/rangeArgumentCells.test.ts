/**
 * How the cells of a range argument are read, and how they meet the single-cell arguments beside it:
 * a blank cell against an omitted argument, a default, the first bad argument deciding, an error or
 * blank inside the range before it, units and positions in a range, and the shapes that do not fit.
 * Messages are zcell's own (functions/messages.ts), pinned as the interface; the models' parameters
 * are the presets' (P18-CMB: Planck 2018 VI, A&A 641, A6, Table 2; W9-ALL: Hinshaw et al. 2013, ApJS
 * 208, 19, Table 4).
 */
import { describe, expect, test } from "vitest";
import { CellError } from "../functions/cellError.js";
import type { Cell } from "../functions/evaluate.js";
import { sheetCalls } from "./sheetCalls.js";

const { run } = sheetCalls("P18-CMB");
/** A result as the sheet shows it: numbers, "" for blank, "#KIND message" for an error. */
const shown = (cells: Cell[][]) => cells.map((row) => row.map((c) => (c instanceof CellError ? `#${c.kind} ${c.message}` : c)));
const column = (...values: unknown[]) => values.map((v) => [v]);

describe("an argument left out beside a range", () => {
  test("a required number left out after a range is #VALUE! for the whole call, as for one cell", () => {
    expect(shown(run("DIST_BETWEEN", column(0.1, 0.2), null))).toEqual([["#value ZC.DIST_BETWEEN: z2 is required"]]);
    expect(shown(run("DIST_BETWEEN", column(0.1, 0.2)))).toEqual([["#value ZC.DIST_BETWEEN: z2 is required"]]);
  });

  test("a number with a default: left out it is the default, a blank cell gives blank results (one cell and beside a range)", () => {
    // Ωm today of P18-CMB 0.3153, of W9-ALL 0.2865 (the presets' sources above)
    const models = column("P18-CMB", "W9-ALL");
    expect(shown(run("OMEGA", "matter", null, models))).toEqual([[0.3153], [0.2865]]);
    expect(shown(run("OMEGA", "matter", [[null]], models))).toEqual([[""], [""]]);
    expect(shown(run("OMEGA", "matter", ""))).toEqual([[""]]);
    expect(shown(run("OMEGA", "matter", null))).toEqual([[0.3153]]);
    expect(shown(run("OMEGA", column("matter", "matter"), null))).toEqual([[0.3153], [0.3153]]);
    expect(shown(run("OMEGA", column("matter", "matter"), ""))).toEqual([[""], [""]]);
  });

  test("a blank cell inside a range of such a number gives a blank result there, not the default", () => {
    const [[atHalf], [blankCell], [emptyText]] = shown(run("OMEGA", "matter", column(0.5, null, "")));
    expect(atHalf).toBeGreaterThan(0.3153);
    expect([blankCell, emptyText]).toEqual(["", ""]);
  });

  test("a blank cell inside a range of an argument whose blank means its default is that default (DIMMING's alpha: bolometric)", () => {
    // bolometric dimming 2.5 log10 (1+z)^4 (Tolman 1930) at z = 1: 10 log10 2; spectral with α: 2.5 (3 − α) log10 2
    const cells = run("DIMMING", 1, column(null, 0, -1, "")).map(([c]) => c as number);
    const expected = [10 * Math.log10(2), 7.5 * Math.log10(2), 10 * Math.log10(2), 10 * Math.log10(2)];
    cells.forEach((c, i) => expect(c).toBeCloseTo(expected[i], 12));
  });
});

describe("the first bad single-cell argument decides, except where a range before it is bad itself", () => {
  // LUMINOSITY_ERR(flux, flux_err, z, z_err): flux and z are ranges, flux_err and z_err single cells
  const flux = column(1e-13, "x", 1e-13);
  const z = column(0.5, 0.5, "y");
  const fluxBad = '#value ZC.LUMINOSITY_ERR: flux: text "x" where a number belongs';
  test.each([
    // flux_err  z_err   row 1                                                               row 2     row 3
    [-1,         -2,     "#num ZC.LUMINOSITY_ERR: flux_err = -1 erg/s/cm2 must be ≥ 0 erg/s/cm2", fluxBad, "#num ZC.LUMINOSITY_ERR: flux_err = -1 erg/s/cm2 must be ≥ 0 erg/s/cm2"],
    ["",         -2,     "",                                                                 fluxBad,  ""],
    [1e-14,      -2,     "#num ZC.LUMINOSITY_ERR: z_err = -2 must be ≥ 0",                    fluxBad,  '#value ZC.LUMINOSITY_ERR: z: text "y" where a number belongs'],
  ])("flux_err %j, z_err %j", (fluxErr, zErr, row1, row2, row3) => {
    expect(shown(run("LUMINOSITY_ERR", flux, fluxErr, z, zErr))).toEqual([[row1], [row2], [row3]]);
  });

  test("a bad model beside a column of redshifts: the model's error, except where the redshift is blank or bad", () => {
    expect(shown(run("DIST_LUM", column(0.1, "", "x"), "H0=abc"))).toEqual([
      ['#value ZC.DIST_LUM: model: H0: "abc" is not a number'],
      [""],
      ['#value ZC.DIST_LUM: z: text "x" where a number belongs'],
    ]);
  });
});

describe("the cells of a range of numbers", () => {
  test("each cell is checked in the unit given: below the minimum, a catalogue's flag, a number that is not finite", () => {
    expect(shown(run("LUMINOSITY", column(-1, 0), 0.5))).toEqual([["#num ZC.LUMINOSITY: flux = -1 erg/s/cm2 must be ≥ 0 erg/s/cm2"], [0]]);
    const [[flag], [m], [low]] = shown(run("MAG_ABS", column(99, 20, -60), 0.5));
    expect(flag).toBe("#na ZC.MAG_ABS: m = 99 is a catalogue's missing-value flag (|magnitude| ≥ 50), not a magnitude");
    expect(m).toBeTypeOf("number");
    expect(low).toBe("#na ZC.MAG_ABS: m = -60 is a catalogue's missing-value flag (|magnitude| ≥ 50), not a magnitude");
    expect(shown(run("DIST_LUM", column(Number.POSITIVE_INFINITY, Number.NaN)))).toEqual([
      ["#num ZC.DIST_LUM: z: not a finite number"],
      ["#num ZC.DIST_LUM: z: not a finite number"],
    ]);
  });

  test("a range of plain numbers is converted from the unit given", () => {
    // 3000 m/s = 3 km/s: the same redshift as 3 km/s (FITS: m, km = 10³ m)
    const inMetres = run("Z_FROM_VELOCITY", column(3000, 6000), null, "m/s").map(([c]) => c as number);
    const inKm = run("Z_FROM_VELOCITY", column(3, 6)).map(([c]) => c as number);
    inMetres.forEach((x, i) => expect(x).toBeCloseTo(inKm[i], 15));
    expect(inKm[0]).toBeGreaterThan(0);
  });

  test("a range of right ascensions mixes numbers (in the unit given) and sexagesimal hours, and names the cell that is neither", () => {
    // the separation of two points on the equator is their difference in longitude (common practice); 1h = 15°
    const degrees = run("SEPARATION", column(10, "1h", 20), 0, 0, 0, "deg").map(([c]) => c as number);
    [10, 15, 20].forEach((x, i) => expect(degrees[i]).toBeCloseTo(x, 9));
    const [, , [bad]] = shown(run("SEPARATION", column(10, "1h", "x"), 0, 0, 0, "deg"));
    expect(bad).toBe('#value ZC.SEPARATION: ra1: "x" has "x" where a number belongs; write hours as 12:30:49.4, 12h30m49.4s or 12 30 49.4, or give degrees as a number');
  });

  test("a cell of a range that holds an error value says so; the other cells are computed", () => {
    const [[bad], [ok]] = shown(run("DIST_LUM", column({ errorCode: "#N/A" }, 0.1)));
    expect(bad).toBe("#value ZC.DIST_LUM: z: the input cell holds an error");
    expect(ok).toBeTypeOf("number");
  });
});

describe("ranges of text and of models", () => {
  test("a range of choices is read cell by cell: spaces and case aside, a blank gives a blank result", () => {
    const [[matter], [blankCell], [bad]] = shown(run("OMEGA", column(" Matter ", null, "mater"), 0));
    expect(matter).toBe(0.3153);
    expect(blankCell).toBe("");
    expect(bad).toMatch(/^#value ZC\.OMEGA: component: "mater" is not one of /);
  });

  test("a range of models: blank cells are the workbook's model, spaces around a preset aside, a number is no model", () => {
    expect(shown(run("OMEGA", "matter", 0, column(" W9-ALL ", null, "", 5, { errorCode: "#REF!" })))).toEqual([
      [0.2865],
      [0.3153],
      [0.3153],
      ["#value ZC.OMEGA: model: 5 where text belongs"],
      ["#value ZC.OMEGA: model: the input cell holds an error"],
    ]);
  });
});

describe("ranges that do not fit together", () => {
  test.each([
    // z                     model                                 message
    [[[0.1, 0.2], [0.3, 0.4]], [["P18-CMB", "W9-ALL", "P18-BAO"]], "ranges do not fit together: z is 2×2 and model is 1×3 (use equal sizes, a single cell, or a row against a column)"],
    [[[0.1], [0.2]],           column("P18-CMB", "W9-ALL", "P18-BAO"), "ranges do not fit together: z is 2×1 and model is 3×1 (use equal sizes, a single cell, or a row against a column)"],
    [[[0.1, 0.2, 0.3]],        [["P18-CMB", "W9-ALL"]],             "ranges do not fit together: z is 1×3 and model is 1×2 (use equal sizes, a single cell, or a row against a column)"],
  ])("%j against %j", (z, model, message) => {
    expect(shown(run("DIST_LUM", z, model))).toEqual([[`#value ZC.DIST_LUM: ${message}`]]);
  });

  test("a result of more than four whole columns (4,194,304 cells) is refused before any cell is read", () => {
    // 2049 rows against 2048 columns: 4,196,352 cells
    const rows = Array.from({ length: 2049 }, () => [0.1]);
    const cols = [new Array(2048).fill(0.2)];
    expect(shown(run("Z_COMBINE", rows, cols))).toEqual([["#value ZC.Z_COMBINE: the result would have 4,196,352 cells; at most 4,194,304 are allowed"]]);
  });

  test("a row against a column spans both", () => {
    const cells = run("DIST_LUM", [[0.1, 0.2]], column("P18-CMB", "W9-ALL"));
    expect([cells.length, cells[0].length]).toEqual([2, 2]);
  });
});
