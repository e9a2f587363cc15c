/**
 * The address the pane hands to Excel (Worksheet.getRange) for a reference written in a formula: the
 * cell part without its `$` signs, the sheet's name as written (a sheet may be called `Q$1`). Dropping
 * the `$` signs is our own normalization (taskpane/excelHost.ts, referenceRange): whether Excel's
 * getRange would take `$A$1` as well is not sourced here, so what we hand it is pinned instead. The
 * fake host of the browser tests (test/browser/fakeOffice.js), loaded into Node as in
 * test/excelHost.test.ts, with each getRange call recorded.
 */
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { expect, test } from "vitest";
import { readReference, readReferenceBounded } from "../taskpane/excelHost.js";

const fakeSource = readFileSync(fileURLToPath(new URL("./browser/fakeOffice.js", import.meta.url)), "utf8");
type Sheet = { getRange(address: string): unknown };
type Context = { workbook: { worksheets: { getItem(name: string): Sheet } } };
type Batch = (context: Context) => Promise<unknown>;
type Host = { window: { __fakeInit?: unknown }; Excel: { run(a: unknown, b?: unknown): Promise<unknown> } };

/** Installs the fake host on `sheets` and returns the addresses getRange is asked for, as "sheet → address". */
function installRecording(sheets: object): string[] {
  const g = globalThis as unknown as Host;
  g.window = globalThis as never;
  g.window.__fakeInit = { settings: {}, sheets };
  new Function(fakeSource)();
  const asked: string[] = [];
  const run = g.Excel.run;
  const recording = (batch: Batch) => (context: Context) => {
    const worksheets = context.workbook.worksheets;
    const getItem = worksheets.getItem.bind(worksheets);
    worksheets.getItem = (name) => {
      const sheet = getItem(name);
      const getRange = sheet.getRange.bind(sheet);
      sheet.getRange = (address) => (asked.push(`${name} → ${address}`), getRange(address));
      return sheet;
    };
    return batch(context);
  };
  // Excel.run(batch) or Excel.run(options, batch) (@types/office-js)
  g.Excel.run = (a, b) => (b === undefined ? run(recording(a as Batch)) : run(a, recording(b as Batch)));
  return asked;
}

// reference as written        | read with        | asked of Excel
const cases: [string, "bounded" | "whole", string][] = [
  ["$A$1",                        "bounded",         "Sheet1 → A1"],
  ["A$1:$B2",                     "bounded",         "Sheet1 → A1:B2"],
  ["'Q$1'!$A$1",                  "bounded",         "Q$1 → A1"],
  ["Q1!A$1",                      "bounded",         "Q1 → A1"],
  ["$A:$A",                       "bounded",         "Sheet1 → A:A"],
  ["$B$2:$B$3",                   "whole",           "Sheet1 → B2:B3"],
];

test.each(cases)("%s (%s read): the address asked of Excel is %s", async (reference, how, asked) => {
  const got = installRecording({ Sheet1: { A1: { value: 1 }, B2: { value: 2 } }, Q1: { A1: { value: 3 } }, "Q$1": { A1: { value: 0.5 } } });
  if (how === "bounded") await readReferenceBounded(reference, "Sheet1", 10);
  else await readReference(reference, "Sheet1");
  expect(got).toEqual([asked]);
});
