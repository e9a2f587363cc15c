/**
 * The pane's Excel interactions (taskpane/excelHost.ts) against the in-memory fake host that the
 * browser tests use too (test/browser/fakeOffice.js), loaded here into Node: settings read, write
 * and corrupt recovery, recalculation, formula reading, table writing, freezing with notes.
 */
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { beforeEach, describe, expect, test } from "vitest";
import { readActiveModel } from "../functions/activeModel.js";
import {
  freezeCells,
  readActiveCell,
  readModelSetting,
  readReference,
  recalculateWorkbook,
  splitAddress,
  writeBlock,
  writeModelSetting,
} from "../taskpane/excelHost.js";
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
    let fake = install({ settings: { "zcell.activeModel": "WMAP9" }, sheets: sheets() });
    expect(readModelSetting()).toBe("WMAP9");
    expect(readActiveModel()).toEqual({ spec: "WMAP9", stored: true });
    await writeModelSetting("PLANCK2018; H0=73");
    expect(fake.saved).toEqual({ "zcell.activeModel": "PLANCK2018; H0=73" });

    fake = install({ settings: { "zcell.activeModel": 42 }, sheets: sheets() });
    const corrupt = readActiveModel();
    expect(corrupt.spec).toBe("PLANCK2018");
    expect(corrupt.warning).toMatch(/could not be read \(not text\)/);
    install({ settings: { "zcell.activeModel": "PLANCK2018; Om=x" }, sheets: sheets() });
    expect(readActiveModel().warning).toMatch(/Om: "x" is not a number/);
    install({ settings: {}, sheets: sheets() });
    expect(readModelSetting()).toBeUndefined();
    expect(readActiveModel()).toEqual({ spec: "PLANCK2018", stored: false });
  });

  test("a failed save is reported, not swallowed", async () => {
    install({ settings: {}, sheets: sheets() });
    (globalThis as unknown as { Office: { context: { document: { settings: { saveAsync(cb: (r: unknown) => void): void } } } } }).Office.context.document.settings.saveAsync = (cb) =>
      cb({ status: "failed", error: { message: "read-only workbook" } });
    await expect(writeModelSetting("WMAP9")).rejects.toThrow("read-only workbook");
  });
});

describe("Excel interactions", () => {
  let fake: Fake;
  beforeEach(() => {
    fake = install({ settings: {}, sheets: sheets(), selection: "Sheet1!B2" });
  });

  test("recalculation counts the ZC formulas of every sheet and asks for a full recalculation", async () => {
    expect(await recalculateWorkbook()).toBe(2);
    expect(fake.calculations).toEqual(["Full"]);
  });

  test("reads the active cell's formula and the values behind references", async () => {
    const cell = await readActiveCell();
    expect(cell.formulas).toEqual([["=ZC.DIST_LUM(A2)"]]);
    expect(cell.address).toBe("Sheet1!B2");
    expect((await readReference("$A$2", "Sheet1")).values).toEqual([[0.5]]);
    expect((await readReference("'Other sheet'!C4", "Sheet1")).values).toEqual([[13.8]]);
  });

  test("writes a planned table as formulas and values", async () => {
    const plan = planTableWithRedshifts("LOOKBACK", [1, 2], ["PLANCK2018", "WMAP9"], 5, 4);
    await writeBlock("Sheet1!D5:F7", plan.cells);
    const cells = fake.sheets.Sheet1;
    expect(cells.D5.value).toBe("z");
    expect(cells.E6.formula).toBe("=ZC.LOOKBACK($D$6:$D$7,$E$5:$F$5)");
    expect(cells.D7.value).toBe(2);
    expect(cells.F7).toBeUndefined(); // left empty for the spill
  });

  test("freezing writes values and attaches notes (ExcelApi 1.18), or comments where notes are missing", async () => {
    expect(await freezeCells("Sheet1", [{ address: "B2", value: 2919.6, note: "provenance" }])).toBe("note");
    expect(fake.sheets.Sheet1.B2).toEqual({ value: 2919.6 });
    expect(fake.notes).toEqual([{ address: "'Sheet1'!B2", text: "provenance" }]);
    fake = install({ settings: {}, sheets: sheets(), excelApi: 1.17 });
    expect(await freezeCells("Other sheet", [{ address: "C4", value: 13.8, note: "p" }])).toBe("comment");
    expect(fake.comments).toEqual([{ address: "'Other sheet'!C4", text: "p" }]);
  });

  test("splits sheet-qualified addresses", () => {
    expect(splitAddress("'It''s'!A1:B2")).toEqual({ sheet: "It's", address: "A1:B2" });
    expect(splitAddress("B2")).toEqual({ address: "B2" });
  });
});
