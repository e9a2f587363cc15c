/**
 * Everything the task pane asks of Excel, in one place: the workbook's settings, recalculation,
 * the active cell and selection, reading referenced values, writing tables, freezing with notes.
 * Uses only Office.js (the pane's logic never touches Office objects directly), so tests can stand
 * in a mock host.
 */
import { activeModelSettingKey } from "../functions/activeModel.js";
import { callsZcFunction } from "../functions/storedFormula.js";

/** A rectangle of cells as the pane sees it. */
export interface RangeSnapshot {
  /** Sheet-qualified address, e.g. "Sheet1!B2:C4". */
  address: string;
  rowCount: number;
  columnCount: number;
  formulas: unknown[][];
  values: unknown[][];
}

function settings(): Office.Settings {
  return Office.context.document.settings;
}

/** Reads the raw stored active-model setting (undefined when absent). */
export function readModelSetting(): unknown {
  const value = settings().get(activeModelSettingKey);
  return value === null ? undefined : value;
}

/** Stores the active model's spec in the workbook (so it travels with the file). */
export function writeModelSetting(spec: string): Promise<void> {
  settings().set(activeModelSettingKey, spec);
  return new Promise((resolve, reject) =>
    settings().saveAsync((result) =>
      result.status === Office.AsyncResultStatus.Succeeded ? resolve() : reject(new Error(result.error?.message ?? "saveAsync failed")),
    ),
  );
}

/** Counts the ZC formulas in every worksheet and asks Excel for a full recalculation; returns the count. */
export async function recalculateWorkbook(): Promise<number> {
  return Excel.run(async (context) => {
    const sheets = context.workbook.worksheets;
    sheets.load("items/name");
    await context.sync();
    const used = sheets.items.map((sheet) => {
      const range = sheet.getUsedRangeOrNullObject(true);
      range.load("formulas");
      return range;
    });
    await context.sync();
    let count = 0;
    for (const range of used) {
      if (range.isNullObject) continue;
      for (const row of range.formulas) for (const f of row) if (callsZcFunction(f)) count++;
    }
    context.workbook.application.calculate(Excel.CalculationType.full);
    await context.sync();
    return count;
  });
}

async function snapshot(get: (context: Excel.RequestContext) => Excel.Range): Promise<RangeSnapshot> {
  return Excel.run(async (context) => {
    const range = get(context);
    range.load("address,rowCount,columnCount,formulas,values");
    await context.sync();
    return {
      address: range.address,
      rowCount: range.rowCount,
      columnCount: range.columnCount,
      formulas: range.formulas,
      values: range.values,
    };
  });
}

/**
 * The active cell: its address, formula and value; for a cell inside a spilled range, the anchor's
 * formula (spillAnchor names the anchor; ExcelApi 1.12).
 */
export async function readActiveCell(): Promise<RangeSnapshot & { spillAnchor?: string }> {
  return Excel.run(async (context) => {
    const cell = context.workbook.getActiveCell();
    cell.load("address,rowCount,columnCount,formulas,values");
    const parent = cell.getSpillParentOrNullObject();
    parent.load("address,formulas,values");
    await context.sync();
    const own = { address: cell.address, rowCount: 1, columnCount: 1, formulas: cell.formulas, values: cell.values };
    if (parent.isNullObject || parent.address === cell.address) return own;
    return { ...own, formulas: parent.formulas, spillAnchor: parent.address };
  });
}

/** The selected range. */
export function readSelection(): Promise<RangeSnapshot> {
  return snapshot((context) => context.workbook.getSelectedRange());
}

/** Splits "Sheet 1!A1:B2" or "'My sheet'!A1" into sheet name (or undefined) and address. */
export function splitAddress(reference: string): { sheet?: string; address: string } {
  const bang = reference.lastIndexOf("!");
  if (bang < 0) return { address: reference };
  let sheet = reference.slice(0, bang);
  if (sheet.startsWith("'")) sheet = sheet.slice(1, -1).replaceAll("''", "'");
  return { sheet, address: reference.slice(bang + 1) };
}

/**
 * Values of a reference as written in a formula (relative to `defaultSheet` when it names none).
 * @param reference e.g. "B2", "$A$2:$A$40", "'My sheet'!B2", or a defined name
 */
export function readReference(reference: string, defaultSheet: string): Promise<RangeSnapshot> {
  const { sheet, address } = splitAddress(reference.replaceAll("$", ""));
  return snapshot((context) => {
    if (!sheet && !/\d|:/.test(address)) return context.workbook.names.getItem(address).getRange();
    return context.workbook.worksheets.getItem(sheet ?? defaultSheet).getRange(address);
  });
}

/** Writes a block of formulas and values (a string starting with "=" is a formula) at `address`. */
export async function writeBlock(address: string, cells: (string | number)[][]): Promise<void> {
  await Excel.run(async (context) => {
    const { sheet, address: local } = splitAddress(address);
    const ws = sheet ? context.workbook.worksheets.getItem(sheet) : context.workbook.worksheets.getActiveWorksheet();
    ws.getRange(local).formulas = cells;
    await context.sync();
  });
}

/** Whether ExcelApi 1.18 cell notes exist here (else threaded comments, ExcelApi 1.10, carry the provenance). */
export function notesSupported(): boolean {
  return Office.context.requirements.isSetSupported("ExcelApi", "1.18");
}

/**
 * Replaces the given cells' formulas by their values and attaches a note (or comment) to each.
 * @param sheet worksheet name
 * @param cells cell address (e.g. "C4") → value to keep and note text
 * @returns "note" or "comment", whichever carried the provenance
 */
export async function freezeCells(sheet: string, cells: { address: string; value: unknown; note: string }[]): Promise<"note" | "comment"> {
  const kind = notesSupported() ? "note" : "comment";
  await Excel.run(async (context) => {
    const ws = context.workbook.worksheets.getItem(sheet);
    for (const cell of cells) {
      ws.getRange(cell.address).values = [[cell.value]];
      const qualified = `'${sheet.replaceAll("'", "''")}'!${cell.address}`;
      if (kind === "note") (ws as unknown as { notes: { add(a: string, t: string): void } }).notes.add(qualified, cell.note);
      else context.workbook.comments.add(qualified, cell.note);
    }
    await context.sync();
  });
  return kind;
}

/** Calls `handler` whenever the user selects other cells. */
export function onSelectionChanged(handler: () => void): void {
  Office.context.document.addHandlerAsync(Office.EventType.DocumentSelectionChanged, handler);
}
