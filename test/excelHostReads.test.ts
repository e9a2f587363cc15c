/**
 * What the pane reads from and writes to Excel (taskpane/excelHost.ts), against the fake host with
 * Excel's rule that a property is read only after a load names it (test/strictExcel.ts): the active
 * cell inside and outside a spilled result, the selection, references by address and by name, the
 * bound on a stranger's reference, sheet names, charts, settings, Undo groups, comments where notes
 * are missing.
 */
import { describe, expect, test } from "vitest";
import {
  chartSeriesSupported,
  commentsLookedAtMost,
  freezeCells,
  insertChart,
  onSelectionChanged,
  readActiveCell,
  readAnnotations,
  readReference,
  readReferenceBounded,
  readSelection,
  readSheetNames,
  recalculateWorkbook,
  thawCells,
  writeModelSetting,
  writeWorkbookModels,
} from "../taskpane/excelHost.js";
import { installStrictExcel, type FakeCell } from "./strictExcel.js";

type Globals = {
  Office: { context: { document: { settings: { saveAsync(cb: (r: unknown) => void): void } } } };
  Excel: { run: (...a: unknown[]) => Promise<unknown> };
};
const host = globalThis as unknown as Globals;

// A formula whose result spilled over B2:C4 (its anchor B2), as the fake host marks spilled cells
const spilled = (): Record<string, FakeCell> => ({
  B2: { formula: "=ZC.DIST_LUM(A2:A4,{\"P18-CMB\",\"W9-ALL\"})", value: 1 },
  C2: { value: 2, spilledFrom: "B2" },
  B3: { value: 3, spilledFrom: "B2" },
  C3: { value: 4, spilledFrom: "B2" },
  B4: { value: 5, spilledFrom: "B2" },
  C4: { value: 6, spilledFrom: "B2" },
  E7: { formula: "=ZC.AGE()", value: 13.8 },
});

describe("the active cell as the inspector reads it", () => {
  // selected  ExcelApi  formula shown                                   spill anchor  place in the result (row, col from the anchor)
  test.each([
    ["C4",     "1.18",   '=ZC.DIST_LUM(A2:A4,{"P18-CMB","W9-ALL"})',     "Sheet1!B2",  { row: 2, col: 1 }],
    ["B3",     "1.18",   '=ZC.DIST_LUM(A2:A4,{"P18-CMB","W9-ALL"})',     "Sheet1!B2",  { row: 1, col: 0 }],
    ["B2",     "1.18",   '=ZC.DIST_LUM(A2:A4,{"P18-CMB","W9-ALL"})',     undefined,    { row: 0, col: 0 }],
    ["E7",     "1.18",   "=ZC.AGE()",                                    undefined,    { row: 0, col: 0 }],
    ["C4",     "1.11",   6,                                              undefined,    undefined],
    ["E7",     "1.11",   "=ZC.AGE()",                                    undefined,    undefined],
  ])("cell %s on ExcelApi %s shows %j, anchor %s, place %j", async (selected, excelApi, formula, spillAnchor, place) => {
    installStrictExcel({ sheets: { Sheet1: spilled() }, selection: `Sheet1!${selected}`, excelApi });
    const cell = await readActiveCell();
    expect(cell.address).toBe(`Sheet1!${selected}`);
    expect(cell.formulas).toEqual([[formula]]);
    expect(cell.spillAnchor).toBe(spillAnchor);
    expect(cell.place).toEqual(place);
    expect(cell.values).toEqual([[spilled()[selected].value]]);
  });
});

describe("ranges the pane reads", () => {
  test("the selection: its address, size, formulas and values", async () => {
    installStrictExcel({ sheets: { Sheet1: spilled() }, selection: "Sheet1!B2:C3" });
    expect(await readSelection()).toEqual({
      address: "Sheet1!B2:C3",
      rowCount: 2,
      columnCount: 2,
      formulas: [['=ZC.DIST_LUM(A2:A4,{"P18-CMB","W9-ALL"})', 2], [3, 4]],
      values: [[1, 2], [3, 4]],
    });
  });

  test("a reference the pane chose is read whole, on the formula's sheet unless it names one", async () => {
    installStrictExcel({ sheets: { Sheet1: spilled(), "Other sheet": { A1: { value: 7 } } } });
    expect(await readReference("$B$3:$C$4", "Sheet1")).toEqual({ address: "Sheet1!B3:C4", rowCount: 2, columnCount: 2, formulas: [[3, 4], [5, 6]], values: [[3, 4], [5, 6]] });
    expect((await readReference("'Other sheet'!A1", "Sheet1")).values).toEqual([[7]]);
  });

  // A reference written in a cell is a stranger's: its size is asked first, its values only when it holds at most maxCells cells
  // reference      names (the workbook's, a sheet's)                 max cells  address read                 cells      values read   cells' values fetched
  test.each([
    ["B2:C4",        {},                                              6,         "Sheet1!B2:C4",              6,         [[1, 2], [3, 4], [5, 6]], 6],
    ["B2:C4",        {},                                              5,         "Sheet1!B2:C4",              6,         undefined,     0],
    ["A:C",          {},                                              10_000,    "Sheet1!A1:C1048576",        3_145_728, undefined,     0],
    ["BigData",      { BigData: "Sheet1!A:XFD" },                     10_000,    "Sheet1!A1:XFD1048576",      17_179_869_184, undefined, 0],
    ["Catalogue",    { Catalogue: "Sheet1!B3:C3" },                   10,        "Sheet1!B3:C3",              2,         [[3, 4]],      2],
    ["Data!Local",   { "Data!Local": "Data!A1:A2" },                  10,        "Data!A1:A2",                2,         [[0.1], [0.2]], 2],
  ])("%s (names %j), at most %d cells: %s, %d cells", async (reference, names, maxCells, address, cells, values, fetched) => {
    const fake = installStrictExcel({ sheets: { Sheet1: spilled(), Data: { A1: { value: 0.1 }, A2: { value: 0.2 } } }, names });
    expect(await readReferenceBounded(reference, "Sheet1", maxCells)).toEqual({ address, cells, ...(values ? { values } : {}) });
    expect(fake.reads.reduce((a, b) => a + b, 0)).toBe(fetched);
  });

  test("a name the workbook does not define is refused, not read as a column of that name", async () => {
    const fake = installStrictExcel({ sheets: { Sheet1: spilled() } });
    await expect(readReferenceBounded("Nowhere", "Sheet1", 10)).rejects.toMatchObject({ code: "ItemNotFound" });
    expect(fake.reads).toEqual([]);
  });

  test("the sheets' names, as Excel spells them", async () => {
    installStrictExcel({ sheets: { Sheet1: {}, "It's mine": {}, "Q$1": {} } });
    expect(await readSheetNames()).toEqual(["Sheet1", "It's mine", "Q$1"]);
  });
});

describe("charts", () => {
  test.each([
    // host ExcelApi  series from ranges (ChartSeriesCollection.add, setValues: ExcelApi 1.7, @types/office-js)
    ["1.6",           false],
    ["1.7",           true],
    ["1.18",          true],
  ])("on ExcelApi %s, series set from ranges: %s", (excelApi, supported) => {
    installStrictExcel({ excelApi });
    expect(chartSeriesSupported()).toBe(supported);
  });

  test("an XY chart whose series are ours: named, each with its x and y ranges, titled and placed", async () => {
    const fake = installStrictExcel({ sheets: { Sheet1: {}, Plots: {} }, selection: "Sheet1!A1" });
    const request = {
      x: "D11:D14",
      series: [{ name: "P18-CMB", values: "E11:E14" }, { name: "W9-ALL", values: "F11:F14" }],
      title: "Luminosity distance (Mpc)",
      xTitle: "z",
      yTitle: "Mpc",
      at: "H2",
    };
    await insertChart("Plots", request);
    await insertChart(undefined, { ...request, series: [request.series[0]] });
    expect(fake.charts).toEqual([
      {
        sheet: "Plots", type: "XYScatterLinesNoMarkers", source: "Plots!E11:E14", seriesBy: "Columns",
        title: "Luminosity distance (Mpc)", xTitle: "z", yTitle: "Mpc", position: "H2",
        series: [
          { name: "P18-CMB", values: "Plots!E11:E14", xValues: "Plots!D11:D14" },
          { name: "W9-ALL", values: "Plots!F11:F14", xValues: "Plots!D11:D14" },
        ],
      },
      {
        sheet: "Sheet1", type: "XYScatterLinesNoMarkers", source: "Sheet1!E11:E14", seriesBy: "Columns",
        title: "Luminosity distance (Mpc)", xTitle: "z", yTitle: "Mpc", position: "H2",
        series: [{ name: "P18-CMB", values: "Sheet1!E11:E14", xValues: "Sheet1!D11:D14" }],
      },
    ]);
  });
});

describe("settings, recalculation and selection events", () => {
  test("the workbook's own models are stored by name, sorted, under zcell.workbookModels", async () => {
    const fake = installStrictExcel({});
    await writeWorkbookModels(new Map([["TEAM-B", "P18-BAO; H0=73"], ["TEAM-A", "W9-ALL"]]));
    expect(fake.saved).toEqual({ "zcell.workbookModels": { "TEAM-A": "W9-ALL", "TEAM-B": "P18-BAO; H0=73" } });
    expect(Object.keys(fake.settings["zcell.workbookModels"] as object)).toEqual(["TEAM-A", "TEAM-B"]);
  });

  test("a failed save that gives no reason is still reported, in plain words", async () => {
    installStrictExcel({});
    host.Office.context.document.settings.saveAsync = (cb) => cb({ status: "failed" });
    await expect(writeModelSetting("W9-ALL")).rejects.toThrow(/^saveAsync failed$/);
  });

  test("when Excel refuses the recalculation the pane is told, and nothing is counted", async () => {
    const fake = installStrictExcel({ sheets: { Sheet1: spilled() }, calculateFails: true });
    await expect(recalculateWorkbook()).rejects.toMatchObject({ code: "GeneralException" });
    expect(fake.reads).toEqual([]);
  });

  test("when counting fails after Excel recalculated, the count is unknown and no gap is invented", async () => {
    const fake = installStrictExcel({ sheets: { Sheet1: spilled() } });
    const run = host.Excel.run;
    let runs = 0;
    host.Excel.run = (...args: unknown[]) => (++runs === 1 ? run(...args) : Promise.reject(new Error("The request could not be completed (simulated).")));
    expect(await recalculateWorkbook()).toEqual({ count: undefined, gaps: [] });
    expect(fake.calculations).toEqual(["Full"]);
  });

  test("a change of selection calls the handler the pane registered", () => {
    const fake = installStrictExcel({ sheets: { Sheet1: spilled() } });
    const seen: string[] = [];
    onSelectionChanged(() => seen.push(fake.selection));
    fake.select("Sheet1!C3");
    fake.select("Sheet1!E7");
    expect(seen).toEqual(["Sheet1!C3", "Sheet1!E7"]);
  });
});

// ExcelApi 1.20 brought Excel.run({ mergeUndoGroup: true }); only UndoNotSupported makes the pane
// run the batch again without the group (learn.microsoft.com/office/dev/add-ins/excel/excel-add-ins-undo-capabilities)
describe("one undo step where the host allows", () => {
  test("any other failure of the grouped batch is reported, and the batch is not run a second time", async () => {
    const fake = installStrictExcel({ sheets: { Sheet1: spilled() }, excelApi: "1.20", protectedSheets: ["Sheet1"] });
    await expect(freezeCells("Sheet1", [{ address: "E7", value: 13.8, note: "n" }])).rejects.toMatchObject({ code: "AccessDenied" });
    expect(fake.runs).toEqual([{ mergeUndoGroup: true }]);
    expect(fake.notes).toEqual([]);
  });

  test.each([
    // ExcelApi  one undo step
    ["1.20",     true],
    ["1.18",     false],
  ])("thawing on ExcelApi %s says whether Undo reverts it in one step (%s)", async (excelApi, oneUndoStep) => {
    installStrictExcel({ sheets: { Sheet1: { E7: { value: 13.8 } } }, excelApi, notes: [{ address: "'Sheet1'!E7", text: "ours" }] });
    expect(await thawCells("Sheet1", [{ address: "E7", formula: "=ZC.AGE()" }])).toEqual({ oneUndoStep });
  });
});

describe("notes, where the host has them", () => {
  test("the notes on given cells (ExcelApi 1.18): one asked for each cell, the others' notes left unread", async () => {
    const notes = [{ address: "'Sheet1'!B2", text: "ours" }, { address: "'Sheet1'!C3", text: "a person's" }, { address: "'Other'!B2", text: "elsewhere" }];
    installStrictExcel({ sheets: { Sheet1: {}, Other: {} }, notes });
    expect(await readAnnotations("Sheet1", ["B2", "D4"])).toEqual({ annotations: new Map([["B2", "ours"]]), complete: true });
  });
});

describe("comments where notes are missing (ExcelApi 1.17): a stranger's sheet may hold any number", () => {
  const spam = (n: number, from = 1) => Array.from({ length: n }, (_, i) => ({ address: `'Sheet1'!Z${i + from}`, text: "spam" }));

  test("a sheet without comments is not asked for any page of them", async () => {
    const fake = installStrictExcel({ sheets: { Sheet1: {} }, excelApi: "1.17" });
    expect(await readAnnotations("Sheet1", ["B2"])).toEqual({ annotations: new Map(), complete: true });
    expect(fake.commentReads).toEqual([]);
  });

  test("1,000 comments are read in two pages of 500, no third", async () => {
    const fake = installStrictExcel({ sheets: { Sheet1: {} }, excelApi: "1.17", comments: spam(1000) });
    expect((await readAnnotations("Sheet1", ["B2"])).complete).toBe(true);
    expect(fake.commentReads).toEqual([500, 500]);
  });

  test(`with ${commentsLookedAtMost.toLocaleString("en-US")} comments exactly, every one was looked at: the answer is complete`, async () => {
    const fake = installStrictExcel({ sheets: { Sheet1: {} }, excelApi: "1.17", comments: spam(commentsLookedAtMost) });
    expect(await readAnnotations("Sheet1", ["B2"])).toEqual({ annotations: new Map(), complete: true });
    expect(fake.commentReads.reduce((a, b) => a + b, 0)).toBe(commentsLookedAtMost);
  });

  test("with more comments than are looked at, a cell whose comment was found is complete, one not found is not", async () => {
    const comments = [{ address: "'Sheet1'!B2", text: "ours" }, ...spam(commentsLookedAtMost + 1)];
    installStrictExcel({ sheets: { Sheet1: {} }, excelApi: "1.17", comments });
    expect(await readAnnotations("Sheet1", ["B2"])).toEqual({ annotations: new Map([["B2", "ours"]]), complete: true });
    expect((await readAnnotations("Sheet1", ["B2", "C3"])).complete).toBe(false);
  });

  test("a comment whose place Excel gives with $ signs is the cell's", async () => {
    installStrictExcel({ sheets: { Sheet1: {} }, excelApi: "1.17", comments: [{ address: "'Sheet1'!$B$2", text: "ours" }] });
    expect((await readAnnotations("Sheet1", ["B2"])).annotations).toEqual(new Map([["B2", "ours"]]));
  });
});
