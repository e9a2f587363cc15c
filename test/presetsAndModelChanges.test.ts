/**
 * The model functions as a cell shows them, through the shared wrapper on the sources: ZC.PRESETS'
 * table (its header row, the built-in presets, then the workbook's own models), ZC.MODEL with all six
 * key/value pairs and with a key left without its value, and ZC.PARAM for a parameter a model has.
 * Expected values: the documented behaviour (the table's header and the "defined in this workbook"
 * rows, MODEL's canonical spec text; functions/definitions/modelsAndUtilities.ts), Planck 2018 VI
 * (A&A 641, A6) Table 2 for P18-CMB's baryon density.
 */
import { describe, expect, test } from "vitest";
import type { ActiveModelSetting } from "../functions/activeModel.js";
import { CellError } from "../functions/cellError.js";
import { definitions } from "../functions/definitions.js";
import { evaluate, type Cell } from "../functions/evaluate.js";
import { readWorkbookModels } from "../functions/workbookModels.js";

const active: ActiveModelSetting = { spec: "P18-CMB", stored: false };
const run = (name: string, ...args: unknown[]): Cell[][] => evaluate(definitions[name], args, active);
const shown = (cell: Cell) => (cell instanceof CellError ? [cell.excelText, cell.message] : cell);

describe("ZC.PRESETS", () => {
  test("a header row, then one row a preset, then the workbook's own models marked as such", () => {
    // invented workbook models
    const models = readWorkbookModels({ "TEAM-A": "P18-CMB; H0=70", "Deep_Field": "H0=72; Om=0.28" });
    const table = evaluate(definitions.PRESETS, [], { ...active, models });
    expect(table[0]).toEqual(["preset", "description and source"]);
    expect(table[1][0]).toBe("P18-CMB");
    expect(table.slice(-2)).toEqual([
      ["TEAM-A", "defined in this workbook: P18-CMB; H0=70"],
      ["DEEP_FIELD", "defined in this workbook: H0=72; Om=0.28"],
    ]);
    expect(table.length).toBe(run("PRESETS").length + 2);
    expect(run("PRESETS").at(-1)![0]).not.toBe("DEEP_FIELD");
  });
});

describe("ZC.MODEL", () => {
  test("all six key/value pairs change the base model, in the canonical spec text", () => {
    const call = ["P18-CMB", "H0", 70, "Om", 0.3, "w0", -0.9, "wa", 0.1, "Tcmb", 2.7, "Neff", 3];
    expect(run("MODEL", ...call)).toEqual([["P18-CMB; H0=70; Om=0.3; w0=-0.9; wa=0.1; Tcmb=2.7; Neff=3"]]);
  });

  test.each([
    // pairs given                                              message
    [["H0"],                                                    'ZC.MODEL: key1 "H0" has no value1'],
    [["H0", 70, "Om", 0.3, "w0", -0.9, "wa", 0.1, "Tcmb", 2.7, "Neff"], 'ZC.MODEL: key6 "Neff" has no value6'],
  ])("a key without its value is #VALUE! naming both: %j", (pairs, message) => {
    expect(shown(run("MODEL", "P18-CMB", ...pairs)[0][0])).toEqual(["#VALUE!", message]);
  });
});

describe("ZC.PARAM", () => {
  test("Ob of a model that gives it: P18-CMB's Ωb h² = 0.02237 with H0 = 67.36 (Planck 2018 VI Table 2)", () => {
    const ob = run("PARAM", "Ob", "P18-CMB")[0][0] as number;
    expect(Math.abs(ob / (0.02237 / 0.6736 ** 2) - 1)).toBeLessThan(1e-12);
  });
});
