/**
 * Scans of the whole workbook: the ZC formulas that Excel has not bound (#NAME?: saved or typed while
 * zcell was not loaded) and entering them again, for the repair banner; the cells that name a workbook
 * model, for the cosmology panel. Like excelHost.ts, it talks to Excel through Office.js only; a scan
 * reads values-only used ranges in chunks, yields between requests and can be stopped.
 */
import { callsZcFunction, typedFormula } from "../functions/storedFormula.js";
import { columnName, splitAddress, topLeft } from "./cellAddress.js";

/** A ZC formula that Excel shows as #NAME?: saved or typed while zcell was not loaded. */
export interface UnboundFormula {
  sheet: string;
  /** Cell address on the sheet, e.g. "B3". */
  address: string;
  /** The formula as Excel reports it (either spelling). */
  formula: string;
}

/** Cells read in one request while scanning a used range (a large sheet is read in row chunks). */
export const scanChunkCells = 50_000;

/**
 * Cells scanned at most on one sheet (21 requests of `scanChunkCells`): a crafted sheet with values in
 * A1 and XFD1048576 has a used range of 17 billion cells, and a scan must end in seconds.
 */
export const scanCellLimit = 1_048_576;

/** Lets the person stop a scan between two requests. */
export interface ScanControl {
  cancelled: boolean;
}

/** Where a scan did not look: a sheet cut at the cell limit, or the sheets left when it was stopped. */
export interface ScanGap {
  sheet: string;
  /** e.g. "rows 1–63 of A1:XFD1048576 scanned (the first 1,048,576 cells)" or "not scanned (stopped)" */
  what: string;
}

/** " Not every cell was looked at: …." naming each gap, or "" when the scan looked everywhere. */
export function gapSentence(gaps: ScanGap[]): string {
  if (!gaps.length) return "";
  return ` Not every cell was looked at: ${gaps.map((g) => `${g.sheet} ${g.what}`).join("; ")}.`;
}

/** Gives the pane's other work (clicks, other tabs) a turn between two requests of a long scan. */
const yieldToPage = () => new Promise<void>((resolve) => setTimeout(resolve, 0));

/**
 * Visits the cells of the used range (values only: formatting does not widen it) of every sheet,
 * reading at most `scanChunkCells` cells a request and `scanCellLimit` cells a sheet, yielding to
 * the page between requests and stopping when `control.cancelled` is set.
 * @param withValues false: only the formulas are read (`visit` gets undefined for the value)
 * @returns the sheets that are protected, and where the scan did not look
 */
async function scanUsedCells(
  visit: (sheet: string, address: string, formula: unknown, value: unknown) => void,
  control: ScanControl = { cancelled: false },
  withValues = true,
): Promise<{ locked: Set<string>; gaps: ScanGap[]; sheets: string[] }> {
  return Excel.run(async (context) => {
    const sheets = context.workbook.worksheets;
    sheets.load("items/name");
    await context.sync();
    const used = sheets.items.map((sheet) => {
      sheet.protection.load("protected");
      // valuesOnly = true: cells with only formatting do not widen the range (Worksheet.getUsedRangeOrNullObject, @types/office-js)
      return { sheet, range: sheet.getUsedRangeOrNullObject(true).load("address,rowCount,columnCount") };
    });
    await context.sync();
    const locked = new Set<string>();
    const gaps: ScanGap[] = [];
    for (const { sheet, range } of used) {
      if (sheet.protection.protected) locked.add(sheet.name);
      if (range.isNullObject) continue;
      const local = splitAddress(range.address).address;
      const origin = topLeft(local);
      const rowsPerChunk = Math.max(1, Math.floor(scanChunkCells / range.columnCount));
      const rowLimit = Math.max(1, Math.floor(scanCellLimit / range.columnCount));
      const rowsToScan = Math.min(range.rowCount, rowLimit);
      let r0 = 0;
      for (; r0 < rowsToScan && !control.cancelled; r0 += rowsPerChunk) {
        const rows = Math.min(rowsPerChunk, rowsToScan - r0);
        const chunk = range.getCell(r0, 0).getResizedRange(rows - 1, range.columnCount - 1).load(withValues ? "formulas,values" : "formulas");
        await context.sync();
        const values = withValues ? chunk.values : undefined;
        chunk.formulas.forEach((row, i) =>
          row.forEach((formula, j) => visit(sheet.name, `${columnName(origin.col + j)}${origin.row + r0 + i}`, formula, values?.[i][j])),
        );
        await yieldToPage();
      }
      const scanned = Math.min(r0, rowsToScan);
      if (scanned < range.rowCount) {
        const last = origin.row + scanned - 1;
        gaps.push({
          sheet: sheet.name,
          // the loop reads at least one chunk unless stopped (rowsToScan ≥ 1), so nothing read means stopped
          what: scanned === 0
            ? "not scanned (stopped)"
            : `scanned rows ${origin.row}–${last} of ${local} only (${control.cancelled ? "stopped" : `the first ${(scanned * range.columnCount).toLocaleString("en-US")} cells`})`,
        });
      }
    }
    return { locked, gaps, sheets: sheets.items.map((sheet) => sheet.name) };
  });
}

/**
 * Finds, in the used range of every sheet, the cells whose formula calls a ZC function (typed or
 * stored spelling) and whose value is #NAME?.
 * @param control set `cancelled` to stop between two requests
 * @returns the cells, the sheets among theirs that are protected (nothing can be re-entered there),
 *   where the scan did not look, and every sheet of the workbook (as Excel spells its name)
 */
export async function findUnboundFormulas(
  control?: ScanControl,
): Promise<{ formulas: UnboundFormula[]; protectedSheets: string[]; gaps: ScanGap[]; sheets: string[] }> {
  const formulas: UnboundFormula[] = [];
  const { locked, gaps, sheets } = await scanUsedCells((sheet, address, formula, value) => {
    if (value === "#NAME?" && callsZcFunction(formula)) formulas.push({ sheet, address, formula: String(formula) });
  }, control);
  const protectedSheets = [...new Set(formulas.map((f) => f.sheet))].filter((sheet) => locked.has(sheet));
  return { formulas, protectedSheets, gaps, sheets };
}

/**
 * Counts the formulas that call a ZC function (typed or stored spelling) in every sheet, reading the
 * formulas only, in chunks, at most `scanCellLimit` cells a sheet (as the repair scan does).
 * @returns the count, and where the count did not look (a sheet cut at the cell limit)
 */
export async function countZcFormulas(): Promise<{ count: number; gaps: ScanGap[] }> {
  let count = 0;
  const { gaps } = await scanUsedCells(
    (_sheet, _address, formula) => {
      if (callsZcFunction(formula)) count++;
    },
    undefined,
    false,
  );
  return { count, gaps };
}

/**
 * How many cells name a model: a formula with the name in a string literal ("NAME" or "NAME; …"), or
 * a cell whose text is the name (alone or with changes), as a model argument may refer to it.
 * @param name the model's name (case-insensitive)
 */
export async function countCellsNaming(name: string): Promise<number> {
  const upper = name.toUpperCase();
  const inFormula = new RegExp(`"\\s*${upper}\\s*[";]`, "i"); // model names hold only letters, digits, - and _
  const isName = (text: string) => text.split(";", 1)[0].trim().toUpperCase() === upper;
  let count = 0;
  await scanUsedCells((_sheet, _address, formula, value) => {
    if (typeof formula === "string" && formula.startsWith("=")) {
      if (inFormula.test(formula)) count++;
    } else if (typeof value === "string" && isName(value)) count++;
  });
  return count;
}

/** Formulas written between two requests while re-entering. */
const reenterBatch = 1_000;

/**
 * Enters each formula again in the typed spelling (`ZC.NAME(`), which makes Excel bind it to the
 * loaded add-in. The caller passes only formulas `restorableFormula` allowed. Cells on protected
 * sheets are left as they are.
 * @returns the number re-entered and the number left alone, by sheet
 */
export async function reenterFormulas(formulas: UnboundFormula[]): Promise<{ reentered: Map<string, number>; leftAlone: Map<string, number> }> {
  return Excel.run(async (context) => {
    const names = [...new Set(formulas.map((f) => f.sheet))];
    const protection = names.map((name) => context.workbook.worksheets.getItem(name).protection.load("protected"));
    await context.sync();
    const locked = new Set(names.filter((_, i) => protection[i].protected));
    const reentered = new Map<string, number>();
    const leftAlone = new Map<string, number>();
    const tally = (map: Map<string, number>, sheet: string) => map.set(sheet, (map.get(sheet) ?? 0) + 1);
    let pending = 0;
    for (const f of formulas) {
      if (locked.has(f.sheet)) {
        tally(leftAlone, f.sheet);
        continue;
      }
      context.workbook.worksheets.getItem(f.sheet).getRange(f.address).formulas = [[typedFormula(f.formula)]];
      tally(reentered, f.sheet);
      if (++pending === reenterBatch) {
        await context.sync();
        pending = 0;
      }
    }
    await context.sync();
    return { reentered, leftAlone };
  });
}
