/**
 * The scans of a whole workbook (taskpane/workbookScan.ts) on a stranger's sheets, against the fake
 * host with Excel's load rule (test/strictExcel.ts): how many requests a scan sends and how many cells
 * each reads (counted, never timed), what it reads (formulas only where values are not needed), where
 * it says it did not look, the cells that name a workbook model, and re-entering formulas in batches.
 */
import { describe, expect, test } from "vitest";
import { recalculateWorkbook } from "../taskpane/excelHost.js";
import { countCellsNaming, countZcFormulas, findUnboundFormulas, gapSentence, reenterFormulas, type UnboundFormula } from "../taskpane/workbookScan.js";
import { installStrictExcel, type FakeCell } from "./strictExcel.js";

describe("where a scan did not look, in the pane's words", () => {
  // gaps                                                                                              | the sentence the banner and the cosmology panel append (taskpane/workbookScan.ts, pinned as the interface)
  test.each([
    [[],                                                                                                 ""],
    [[{ sheet: "Big", what: "not scanned (stopped)" }],                                                  " Not every cell was looked at: Big not scanned (stopped)."],
    [[{ sheet: "Big", what: "scanned rows 1–64 of A1:XFD200 only (the first 1,048,576 cells)" }, { sheet: "Two", what: "not scanned (stopped)" }],
                                                                                                         " Not every cell was looked at: Big scanned rows 1–64 of A1:XFD200 only (the first 1,048,576 cells); Two not scanned (stopped)."],
  ])("%j → %j", (gaps, sentence) => {
    expect(gapSentence(gaps)).toBe(sentence);
  });
});

describe("how much a scan reads", () => {
  test("a sheet 16,384 columns wide is read 3 rows (49,152 cells) a request: 9 rows in exactly 3 requests, nothing left out", async () => {
    const fake = installStrictExcel({ sheets: { Wide: { A1: { value: 0.5 }, XFD9: { formula: "=_xldudf_ZC_AGE()", value: "#NAME?" } } } });
    expect(await findUnboundFormulas()).toEqual({ formulas: [{ sheet: "Wide", address: "XFD9", formula: "=_xldudf_ZC_AGE()" }], protectedSheets: [], gaps: [], sheets: ["Wide"] });
    expect(fake.reads).toEqual([49_152, 49_152, 49_152]); // ⌊50,000 / 16,384⌋ = 3 rows a request
  });

  test("a sheet whose formatting reaches XFD1048576 is scanned as far as its values only: one cell, one request", async () => {
    const fake = installStrictExcel({ sheets: { Styled: { A1: { formula: "=ZC.AGE()", value: "#NAME?" } } } }, { Styled: "XFD1048576" });
    expect(await findUnboundFormulas()).toEqual({ formulas: [{ sheet: "Styled", address: "A1", formula: "=ZC.AGE()" }], protectedSheets: [], gaps: [], sheets: ["Styled"] });
    expect(fake.reads).toEqual([1]);
  });

  test("counting ZC formulas after a recalculation reads the formulas only, never the values", async () => {
    const fake = installStrictExcel({ sheets: { Sheet1: { A1: { formula: "=ZC.AGE()", value: 13.8 }, B1: { formula: "=_xldudf_ZC_AGE()", value: "#NAME?" }, C1: { value: "ZC.AGE()" } } } });
    expect(await countZcFormulas()).toEqual({ count: 2, gaps: [] });
    expect(await recalculateWorkbook()).toEqual({ count: 2, gaps: [] });
    const cellLoads = fake.loads.filter((l) => /formulas|values/.test(l));
    expect(cellLoads).toEqual(["formulas", "formulas"]);
  });

  test("the repair scan reads formulas and values, as it needs both", async () => {
    const fake = installStrictExcel({ sheets: { Sheet1: { A1: { formula: "=ZC.AGE()", value: "#NAME?" } } } });
    await findUnboundFormulas();
    expect(fake.loads.filter((l) => /formulas|values/.test(l))).toEqual(["formulas,values"]);
  });
});

describe("a scan the person stops", () => {
  test("stopped after its first request, it says which rows it read and which sheets it did not look at", async () => {
    const fake = installStrictExcel({
      sheets: {
        Wide: { A1: { value: 0.5 }, XFD9: { formula: "=ZC.AGE()", value: "#NAME?" } },
        Later: { A1: { formula: "=ZC.AGE()", value: "#NAME?" } },
      },
    });
    // the person presses Stop while the first request is answered
    const control = { get cancelled() { return fake.reads.length >= 1; } };
    const scan = await findUnboundFormulas(control);
    expect(scan.formulas).toEqual([]);
    expect(scan.gaps).toEqual([
      { sheet: "Wide", what: "scanned rows 1–3 of A1:XFD9 only (stopped)" },
      { sheet: "Later", what: "not scanned (stopped)" },
    ]);
    expect(fake.reads).toEqual([49_152]);
  });

  test("the page gets a turn between two requests even when Excel answers at once: a Stop it handles then ends the scan", async () => {
    const fake = installStrictExcel({ sheets: { Wide: { A1: { value: 0.5 }, XFD9: { formula: "=ZC.AGE()", value: "#NAME?" } } } });
    const control = { cancelled: false };
    setTimeout(() => (control.cancelled = true), 0); // the Stop button's click, queued as the scan starts
    const scan = await findUnboundFormulas(control);
    expect(fake.reads).toEqual([49_152]);
    expect(scan.gaps).toEqual([{ sheet: "Wide", what: "scanned rows 1–3 of A1:XFD9 only (stopped)" }]);
  });
});

describe("cells that name a workbook model (before it is renamed or deleted)", () => {
  // What a stranger's sheet holds, and whether it names the model TEAM-A: a formula with the name in
  // a string literal ("NAME" or "NAME; …"), or a cell whose text is the name, alone or with changes
  // (the rule of countCellsNaming, taskpane/workbookScan.ts)
  const cells: [cell: FakeCell, names: boolean][] = [
    [{ formula: '=ZC.DIST_LUM(A1,"TEAM-A")', value: 1 },          true],
    [{ formula: '=ZC.DIST_LUM(A1,"team-a; H0=70")', value: 1 },   true],
    [{ formula: '=ZC.DIST_LUM(A1," TEAM-A ")', value: 1 },        true],
    [{ formula: '=ZC.DIST_LUM(A1,"TEAM-AB")', value: 1 },         false],
    [{ formula: "=ZC.DIST_LUM(A1,TEAM_A)", value: 1 },            false],
    [{ formula: '=CONCAT("TEAM","-A")', value: "TEAM-A" },        false], // computes the name, holds no literal of it
    [{ formula: "=SUM(B1:B3)", value: 3 },                        false],
    [{ value: "TEAM-A" },                                         true],
    [{ value: " team-a " },                                       true],
    [{ value: "TEAM-A; H0=70" },                                  true],
    [{ value: "TEAM-AB" },                                        false],
    [{ value: 'see "TEAM-A"' },                                   false],
    [{ value: 42 },                                               false],
    [{ value: true },                                             false],
  ];
  test.each(cells)("%j names TEAM-A: %s", async (cell, names) => {
    installStrictExcel({ sheets: { Sheet1: { C3: cell } } });
    expect(await countCellsNaming("TEAM-A")).toBe(names ? 1 : 0);
  });

  test("all of them on two sheets count once each, the name given in any case", async () => {
    const sheet = Object.fromEntries(cells.map(([cell], i) => [`B${i + 1}`, cell]));
    installStrictExcel({ sheets: { One: sheet, Two: sheet } });
    const expected = 2 * cells.filter(([, names]) => names).length;
    expect(await countCellsNaming("team-a")).toBe(expected);
    expect(await countCellsNaming("TEAM-A")).toBe(expected);
  });
});

describe("re-entering formulas waiting for zcell", () => {
  test("2,500 formulas are written 1,000 a request, then the rest: never more in one request", async () => {
    const waiting: UnboundFormula[] = Array.from({ length: 2500 }, (_, i) => ({ sheet: "Catalogue", address: `A${i + 1}`, formula: "=_xldudf_ZC_AGE()" }));
    const fake = installStrictExcel({ sheets: { Catalogue: {} } });
    const { reentered, leftAlone } = await reenterFormulas(waiting);
    expect([...reentered]).toEqual([["Catalogue", 2500]]);
    expect(leftAlone.size).toBe(0);
    // one request for the sheets' protection, then the formulas
    expect(fake.writesPerSync).toEqual([0, 1000, 1000, 500]);
    expect(fake.sheets.Catalogue.A2500.formula).toBe("=ZC.AGE()");
  });
});
