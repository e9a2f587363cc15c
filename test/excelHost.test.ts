/**
 * The pane's Excel interactions (taskpane/excelHost.ts) against the in-memory fake host that the
 * browser tests use too (test/browser/fakeOffice.js), loaded here into Node: settings read, write
 * and corrupt recovery, recalculation, formula reading, table writing, freezing with notes.
 */
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { beforeEach, describe, expect, test } from "vitest";
import { readActiveModel } from "../functions/activeModel.js";
import { findUnboundFormulas, reenterFormulas, scanCellLimit, scanChunkCells } from "../taskpane/workbookScan.js";
import {
  commentsLookedAtMost,
  freezeCells,
  readAnnotations,
  thawCells,
  readActiveCell,
  readModelSetting,
  readReference,
  readReferenceBounded,
  recalculateWorkbook,
  writeBlock,
  writeModelSetting,
} from "../taskpane/excelHost.js";
import { splitAddress } from "../taskpane/cellAddress.js";
import { planTableWithRedshifts } from "../taskpane/whatIfTable.js";

const fakeSource = readFileSync(fileURLToPath(new URL("./browser/fakeOffice.js", import.meta.url)), "utf8");
type Fake = {
  sheets: Record<string, Record<string, { formula?: string; value?: unknown }>>;
  settings: Record<string, unknown>;
  saved: unknown;
  calculations: string[];
  notes: { address: string; text: string }[];
  comments: { address: string; text: string }[];
  selection: string;
  runs: unknown[];
  reads: number[];
  commentReads: number[];
};
const g = globalThis as unknown as { window: { __fakeInit?: unknown; __fake: Fake } };

function install(init: object): Fake {
  g.window = globalThis as never;
  g.window.__fakeInit = init;
  new Function(fakeSource)();
  return g.window.__fake;
}

const sheets = () => ({
  Sheet1: {
    A2: { value: 0.5 },
    B2: { formula: "=ZC.DIST_LUM(A2)", value: 2919.6 },
    B3: { formula: "=SUM(A1:A2)", value: 0.5 },
  },
  "Other sheet": { C4: { formula: "=zc.age()", value: 13.8 } },
});

describe("workbook settings", () => {
  test("read what the workbook stores, write with saveAsync, and recover from corrupt values", async () => {
    let fake = install({ settings: { "zcell.activeModel": "W9-ALL" }, sheets: sheets() });
    expect(readModelSetting()).toBe("W9-ALL");
    expect(readActiveModel()).toMatchObject({ spec: "W9-ALL", stored: true });
    await writeModelSetting("P18-BAO; H0=73");
    expect(fake.saved).toEqual({ "zcell.activeModel": "P18-BAO; H0=73" });

    fake = install({ settings: { "zcell.activeModel": 42 }, sheets: sheets() });
    const corrupt = readActiveModel();
    expect(corrupt.spec).toBe("P18-CMB");
    expect(corrupt.warning).toMatch(/could not be read \(not text\)/);
    install({ settings: { "zcell.activeModel": "P18-BAO; Om=x" }, sheets: sheets() });
    expect(readActiveModel().warning).toMatch(/Om: "x" is not a number/);
    install({ settings: {}, sheets: sheets() });
    expect(readModelSetting()).toBeUndefined();
    expect(readActiveModel()).toMatchObject({ spec: "P18-CMB", stored: false });
  });

  test("a failed save is reported, not swallowed", async () => {
    install({ settings: {}, sheets: sheets() });
    (globalThis as unknown as { Office: { context: { document: { settings: { saveAsync(cb: (r: unknown) => void): void } } } } }).Office.context.document.settings.saveAsync = (cb) =>
      cb({ status: "failed", error: { message: "read-only workbook" } });
    await expect(writeModelSetting("W9-ALL")).rejects.toThrow("read-only workbook");
  });
});

describe("Excel interactions", () => {
  let fake: Fake;
  beforeEach(() => {
    fake = install({ settings: {}, sheets: sheets(), selection: "Sheet1!B2" });
  });

  test("recalculation asks for a full recalculation and counts the ZC formulas of every sheet", async () => {
    expect(await recalculateWorkbook()).toEqual({ count: 2, gaps: [] });
    expect(fake.calculations).toEqual(["Full"]);
  });

  test("recalculation counts a sheet whose used range spans A1:XFD200 in chunks, never all of it at once, and says where it did not count", async () => {
    // the used range holds 200 × 16,384 = 3,276,800 cells; read in one request before
    fake = install({ settings: {}, sheets: { Big: { A1: { value: 1 }, XFD200: { value: "far" } }, Sheet1: { A1: { formula: "=ZC.AGE()", value: 13.8 } } } });
    const { count, gaps } = await recalculateWorkbook();
    expect(fake.calculations).toEqual(["Full"]);
    expect(count).toBe(1);
    expect(Math.max(...fake.reads)).toBeLessThanOrEqual(scanChunkCells);
    expect(fake.reads.reduce((a, b) => a + b, 0)).toBeLessThanOrEqual(scanCellLimit + 1);
    expect(gaps).toEqual([{ sheet: "Big", what: "scanned rows 1–64 of A1:XFD200 only (the first 1,048,576 cells)" }]);
  });

  test("a sheet whose name holds $ is read as named: 'Q$1'!A1 is not Q1!A1", async () => {
    install({ settings: {}, sheets: { "Q$1": { A1: { value: 0.5 } }, Q1: { A1: { value: 3 } }, Sheet1: {} } });
    expect(await readReferenceBounded("'Q$1'!$A$1", "Sheet1", 10)).toEqual({ address: "'Q$1'!A1", cells: 1, values: [[0.5]] });
    expect(await readReferenceBounded("Q1!A$1", "Sheet1", 10)).toEqual({ address: "Q1!A1", cells: 1, values: [[3]] });
  });

  test("where notes are missing, Restore formulas looks at 10,000 comments of a sheet at most, and stops once each cell's is found", async () => {
    // 20,000 comments a stranger left on a sheet, none of them zcell's
    const comments = Array.from({ length: 20_000 }, (_, i) => ({ address: `'Sheet1'!Z${i + 1}`, text: "spam" }));
    fake = install({ settings: {}, sheets: sheets(), excelApi: "1.17", comments: [{ address: "'Sheet1'!B2", text: "ours" }, ...comments] });
    const found = await readAnnotations("Sheet1", ["B2"]);
    expect([...found.annotations]).toEqual([["B2", "ours"]]);
    expect(fake.commentReads.reduce((a, b) => a + b, 0)).toBeLessThanOrEqual(500); // the first page held it
    fake.commentReads.length = 0;
    const missing = await readAnnotations("Sheet1", ["A1", "B2"]);
    expect(missing.complete).toBe(false);
    expect(fake.commentReads.reduce((a, b) => a + b, 0)).toBe(commentsLookedAtMost);
    expect(Math.max(...fake.commentReads)).toBeLessThanOrEqual(500);
    fake.commentReads.length = 0;
    await thawCells("Sheet1", [{ address: "B2", formula: "=ZC.DIST_LUM(A2)" }]);
    expect(fake.comments.length).toBe(20_000);
    expect(fake.comments.some((c) => c.text === "ours")).toBe(false);
    expect(fake.commentReads.reduce((a, b) => a + b, 0)).toBeLessThanOrEqual(500);
  });

  test("reads the active cell's formula and the values behind references", async () => {
    const cell = await readActiveCell();
    expect(cell.formulas).toEqual([["=ZC.DIST_LUM(A2)"]]);
    expect(cell.address).toBe("Sheet1!B2");
    expect((await readReference("$A$2", "Sheet1")).values).toEqual([[0.5]]);
    expect((await readReference("'Other sheet'!C4", "Sheet1")).values).toEqual([[13.8]]);
  });

  test("writes a planned table as formulas and values", async () => {
    const plan = planTableWithRedshifts("LOOKBACK", [1, 2], ["P18-BAO", "W9-ALL"], 5, 4);
    await writeBlock("Sheet1!D5:F7", plan.cells);
    const cells = fake.sheets.Sheet1;
    expect(cells.D5.value).toBe("z");
    expect(cells.E6.formula).toBe("=ZC.LOOKBACK($D$6:$D$7,$E$5:$F$5)");
    expect(cells.D7.value).toBe(2);
    expect(cells.F7).toBeUndefined(); // left empty for the spill
  });

  test("freezing writes values and attaches notes (ExcelApi 1.18), or comments where notes are missing", async () => {
    expect(await freezeCells("Sheet1", [{ address: "B2", value: 2919.6, note: "provenance" }])).toEqual({ carrier: "note", oneUndoStep: false });
    expect(fake.sheets.Sheet1.B2).toEqual({ value: 2919.6 });
    expect(fake.notes).toEqual([{ address: "'Sheet1'!B2", text: "provenance" }]);
    fake = install({ settings: {}, sheets: sheets(), excelApi: "1.17" });
    expect(await freezeCells("Other sheet", [{ address: "C4", value: 13.8, note: "p" }])).toEqual({ carrier: "comment", oneUndoStep: false });
    expect(fake.comments).toEqual([{ address: "'Other sheet'!C4", text: "p" }]);
  });

  // ExcelApi 1.20 brought Excel.run({ mergeUndoGroup: true }); an API that cannot join throws
  // UndoNotSupported (learn.microsoft.com/office/dev/add-ins/excel/excel-add-ins-undo-capabilities)
  test.each([
    // ExcelApi  host refuses the group   runs asked for                                  one undo step
    ["1.18",     false,                   [null],                                         false],
    ["1.20",     false,                   [{ mergeUndoGroup: true }],                     true],
    ["1.20",     true,                    [{ mergeUndoGroup: true }, null],               false],
  ])("freezing with ExcelApi %s (UndoNotSupported: %s) runs as %j", async (excelApi, undoNotSupported, runs, oneUndoStep) => {
    fake = install({ settings: {}, sheets: sheets(), excelApi, undoNotSupported });
    const result = await freezeCells("Sheet1", [{ address: "B2", value: 2919.6, note: "n" }]);
    expect(fake.runs).toEqual(runs);
    expect(result.oneUndoStep).toBe(oneUndoStep);
    expect(fake.sheets.Sheet1.B2).toEqual({ value: 2919.6 });
    expect(fake.notes.length).toBe(1);
  });

  test.each([
    // ExcelApi  carrier
    ["1.18",     "note"],
    ["1.17",     "comment"],
  ])("thawing (ExcelApi %s) reads the %s, writes the formula back and removes the annotation", async (excelApi, carrier) => {
    fake = install({ settings: {}, sheets: sheets(), excelApi });
    await freezeCells("Other sheet", [{ address: "C4", value: 13.8, note: "Frozen by zcell 0.1.0 on 2026-12-01.\nFormula: =zc.age()\nModel: W9-ALL" }]);
    expect(fake.sheets["Other sheet"].C4).toEqual({ value: 13.8 });
    const { annotations: found, complete } = await readAnnotations("Other sheet", ["C4", "C5"]);
    expect(complete).toBe(true);
    expect([...found.keys()]).toEqual(["C4"]);
    expect(found.get("C4")).toMatch(/^Frozen by zcell/);
    await thawCells("Other sheet", [{ address: "C4", formula: "=zc.age()" }]);
    expect(fake.sheets["Other sheet"].C4.formula).toBe("=zc.age()");
    expect(carrier === "note" ? fake.notes : fake.comments).toEqual([]);
  });
});

describe("formulas waiting for zcell (#NAME?)", () => {
  const stuck = () => ({
    Catalogue: {
      A3: { value: 0.5 },
      B3: { formula: "=_xldudf_ZC_DIST_LUM(A3)", value: "#NAME?" },
      C3: { formula: "=ZC.LOOKBACK(A3)", value: "#NAME?" },
      D3: { formula: "=ZC.AGE(A3)", value: 8.6 },
      E3: { formula: "=NOSUCH(A3)", value: "#NAME?" },
      F3: { formula: '="ZC.AGE(1)"', value: "ZC.AGE(1)" },
    },
    Locked: { B2: { formula: "=ZC.DIST_LUM(1)", value: "#NAME?" } },
    Empty: {},
  });

  test("finds ZC formulas showing #NAME? in either spelling, and names protected sheets", async () => {
    install({ settings: {}, sheets: stuck(), protectedSheets: ["Locked"] });
    const scan = await findUnboundFormulas();
    expect(scan.formulas).toEqual([
      { sheet: "Catalogue", address: "B3", formula: "=_xldudf_ZC_DIST_LUM(A3)" },
      { sheet: "Catalogue", address: "C3", formula: "=ZC.LOOKBACK(A3)" },
      { sheet: "Locked", address: "B2", formula: "=ZC.DIST_LUM(1)" },
    ]);
    expect(scan.protectedSheets).toEqual(["Locked"]);
  });

  test("re-enters them in the typed spelling and leaves protected sheets unchanged", async () => {
    const fake = install({ settings: {}, sheets: stuck(), protectedSheets: ["Locked"] });
    const { reentered, leftAlone } = await reenterFormulas((await findUnboundFormulas()).formulas);
    expect([...reentered]).toEqual([["Catalogue", 2]]);
    expect([...leftAlone]).toEqual([["Locked", 1]]);
    expect(fake.sheets.Catalogue.B3.formula).toBe("=ZC.DIST_LUM(A3)");
    expect(fake.sheets.Catalogue.C3.formula).toBe("=ZC.LOOKBACK(A3)");
    expect(fake.sheets.Locked.B2).toEqual({ formula: "=ZC.DIST_LUM(1)", value: "#NAME?" });
    expect((await findUnboundFormulas()).formulas.map((f) => f.sheet)).toEqual(["Locked"]);
  });

  test("reads a large used range in chunks of at most scanChunkCells cells", async () => {
    const big: Record<string, { formula?: string; value?: unknown }> = {};
    for (let r = 1; r <= 40_000; r++) {
      big[`A${r}`] = { value: r / 1000 };
      big[`B${r}`] = r % 1000 === 0 ? { formula: `=_xldudf_ZC_DIST_LUM(A${r})`, value: "#NAME?" } : { formula: `=ZC.DIST_LUM(A${r})`, value: 1 };
      big[`C${r}`] = { value: "x" };
    }
    const fake = install({ settings: {}, sheets: { Big: big } });
    const scan = await findUnboundFormulas();
    expect(scan.formulas.length).toBe(40);
    expect(scan.formulas[39]).toEqual({ sheet: "Big", address: "B40000", formula: "=_xldudf_ZC_DIST_LUM(A40000)" });
    expect(fake.reads.reduce((a: number, b: number) => a + b, 0)).toBe(120_000);
    expect(Math.max(...fake.reads)).toBeLessThanOrEqual(scanChunkCells);
    expect(fake.reads.length).toBe(Math.ceil(120_000 / scanChunkCells));
  });
});

describe("addresses", () => {
  test("splits sheet-qualified addresses", () => {
    expect(splitAddress("'It''s'!A1:B2")).toEqual({ sheet: "It's", address: "A1:B2" });
    expect(splitAddress("B2")).toEqual({ address: "B2" });
  });
});
