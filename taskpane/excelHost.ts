/**
 * Everything the task pane asks of Excel, in one place: the workbook's settings, recalculation,
 * the active cell and selection, reading referenced values, writing tables, freezing with notes and
 * thawing them (the scans of the whole workbook are in workbookScan.ts).
 * Uses only Office.js (the pane's logic never touches Office objects directly), so tests can stand
 * in a mock host.
 */
import { activeModelSettingKey } from "../functions/activeModel.js";
import { storedWorkbookModels, workbookModelsSettingKey } from "../functions/workbookModels.js";
import { qualifiedAddress, splitAddress, topLeft } from "./cellAddress.js";
import type { ReferenceRead } from "./readArgument.js";
import { countZcFormulas, type ScanGap } from "./workbookScan.js";

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
  return writeSetting(activeModelSettingKey, spec);
}

/** Stores the workbook's own models (name → spec text) in the workbook. */
export function writeWorkbookModels(specs: ReadonlyMap<string, string>): Promise<void> {
  return writeSetting(workbookModelsSettingKey, storedWorkbookModels(specs));
}

function writeSetting(key: string, value: unknown): Promise<void> {
  settings().set(key, value);
  return new Promise((resolve, reject) =>
    settings().saveAsync((result) =>
      result.status === Office.AsyncResultStatus.Succeeded ? resolve() : reject(new Error(result.error?.message ?? "saveAsync failed")),
    ),
  );
}

/** A full recalculation asked of Excel, and the ZC formulas counted afterwards. */
export interface Recalculation {
  /** ZC formulas in the cells counted; undefined when counting failed after Excel recalculated. */
  count: number | undefined;
  /** Where the count did not look (a sheet cut at `scanCellLimit` cells): Excel recalculated those cells too. */
  gaps: ScanGap[];
}

/**
 * Asks Excel for a full recalculation, then counts the ZC formulas of every sheet: formulas only, in
 * chunks, at most `scanCellLimit` cells a sheet (`countZcFormulas`), so a sheet whose used range
 * spans A1:XFD1048576 is never read in one request.
 * @throws when Excel refuses the recalculation (the count is not attempted then)
 */
export async function recalculateWorkbook(): Promise<Recalculation> {
  await Excel.run(async (context) => {
    context.workbook.application.calculate(Excel.CalculationType.full);
    await context.sync();
  });
  try {
    return await countZcFormulas();
  } catch {
    return { count: undefined, gaps: [] };
  }
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
 * The active cell as the inspector reads it. `spillAnchor`: for a cell of a spilled result other than
 * its anchor, the anchor's address (`formulas` are then the anchor's). `place`: the cell's row and
 * column in its formula's result (0-based; 0, 0 for a formula's own cell), undefined where this
 * Excel cannot say which cell of a spilled result it is.
 */
export type ActiveCell = RangeSnapshot & { spillAnchor?: string; place?: { row: number; col: number } };

/**
 * The active cell: its address, formula and value; for a cell inside a spilled result, the anchor's
 * formula and the cell's place counted from the anchor (the result's top-left cell). The anchor comes
 * from Range.getSpillParentOrNullObject, ExcelApi 1.12, a null object outside any spill (@types/office-js;
 * learn.microsoft.com/office/dev/add-ins/excel/excel-add-ins-ranges-dynamic-arrays); before 1.12, `place` is undefined.
 */
export async function readActiveCell(): Promise<ActiveCell> {
  const spills = Office.context.requirements.isSetSupported("ExcelApi", "1.12");
  return Excel.run(async (context) => {
    const cell = context.workbook.getActiveCell();
    cell.load("address,formulas,values");
    const parent = spills ? cell.getSpillParentOrNullObject().load("address,formulas") : undefined;
    await context.sync();
    const own = { address: cell.address, rowCount: 1, columnCount: 1, formulas: cell.formulas, values: cell.values };
    if (!parent) return own;
    if (parent.isNullObject || parent.address === cell.address) return { ...own, place: { row: 0, col: 0 } };
    const at = topLeft(splitAddress(cell.address).address);
    const anchor = topLeft(splitAddress(parent.address).address);
    return { ...own, formulas: parent.formulas, spillAnchor: parent.address, place: { row: at.row - anchor.row, col: at.col - anchor.col } };
  });
}

/** The selected range. */
export function readSelection(): Promise<RangeSnapshot> {
  return snapshot((context) => context.workbook.getSelectedRange());
}

/**
 * The range a reference in a formula names (on `defaultSheet` when it names none); Worksheet.getRange
 * takes a name too (@types/office-js). Only the cell part loses its `$` signs: a sheet may be called
 * `Q$1`, and `'Q$1'!A1` is not `Q1!A1`.
 */
function referenceRange(context: Excel.RequestContext, reference: string, defaultSheet: string): Excel.Range {
  const { sheet, address: written } = splitAddress(reference);
  const address = written.replaceAll("$", "");
  if (!sheet && !/\d|:/.test(address)) return context.workbook.names.getItem(address).getRange();
  return context.workbook.worksheets.getItem(sheet ?? defaultSheet).getRange(address);
}

/**
 * Formulas and values of a range the pane chose itself (the area of a table it plans), read whole.
 * A reference written in a cell is a stranger's: read it with `readReferenceBounded`.
 * @param reference e.g. "B2", "$A$2:$A$40", "'My sheet'!B2"
 */
export function readReference(reference: string, defaultSheet: string): Promise<RangeSnapshot> {
  return snapshot((context) => referenceRange(context, reference, defaultSheet));
}

/**
 * The values of a reference, read only when it holds at most `maxCells` cells: its size is asked
 * first, without its values (rowCount × columnCount, ExcelApi 1.1; `load` queues the properties it
 * names; cellCount reads −1 beyond 2^31 − 1 cells: @types/office-js, Excel.Range), so the cells of a
 * name that stands for whole columns are never asked for.
 * @param reference as written in a formula: an address, a sheet-qualified address or name, a defined name
 * @param defaultSheet the sheet of the formula (for a reference that names none)
 */
export async function readReferenceBounded(reference: string, defaultSheet: string, maxCells: number): Promise<ReferenceRead> {
  return Excel.run(async (context) => {
    const range = referenceRange(context, reference, defaultSheet).load("address,rowCount,columnCount");
    await context.sync();
    const cells = range.rowCount * range.columnCount;
    if (cells > maxCells) return { address: range.address, cells };
    range.load("values");
    await context.sync();
    return { address: range.address, cells, values: range.values };
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

/** A chart to insert: lines of values (live ranges of the sheet) against a redshift range, titled. */
export interface ChartRequest {
  /** The redshift column, e.g. "D11:D14". */
  x: string;
  /** One line per model: its name and its column of values. */
  series: { name: string; values: string }[];
  title: string;
  xTitle: string;
  yTitle: string;
  /** The cell the chart's top-left corner goes to. */
  at: string;
}

/** Whether a chart's series can be set from ranges here (ChartSeriesCollection.add, setValues, setXAxisValues: ExcelApi 1.7, @types/office-js). */
export function chartSeriesSupported(): boolean {
  return Office.context.requirements.isSetSupported("ExcelApi", "1.7");
}

/**
 * Inserts an XY chart through Excel's charts API. The series Excel makes from the source range are
 * replaced by ours, each named and given both of its ranges, so what is drawn does not depend on how
 * Excel reads a range; the chart reads the cells, which stay the source of truth.
 */
export async function insertChart(sheet: string | undefined, chart: ChartRequest): Promise<void> {
  await Excel.run(async (context) => {
    const ws = sheet ? context.workbook.worksheets.getItem(sheet) : context.workbook.worksheets.getActiveWorksheet();
    const added = ws.charts.add("XYScatterLinesNoMarkers", ws.getRange(chart.series[0].values), "Columns");
    added.series.load("items");
    await context.sync();
    for (const guessed of added.series.items) guessed.delete();
    for (const s of chart.series) {
      const series = added.series.add(s.name);
      series.setXAxisValues(ws.getRange(chart.x));
      series.setValues(ws.getRange(s.values));
    }
    added.title.text = chart.title;
    added.axes.categoryAxis.title.text = chart.xTitle;
    added.axes.valueAxis.title.text = chart.yTitle;
    added.setPosition(chart.at);
    await context.sync();
  });
}

/** The names of the workbook's sheets, as Excel spells them. */
export async function readSheetNames(): Promise<string[]> {
  return Excel.run(async (context) => {
    const sheets = context.workbook.worksheets.load("items/name");
    await context.sync();
    return sheets.items.map((sheet) => sheet.name);
  });
}

/** Whether ExcelApi 1.18 cell notes exist here (else threaded comments, ExcelApi 1.10, carry the provenance). */
export function notesSupported(): boolean {
  return Office.context.requirements.isSetSupported("ExcelApi", "1.18");
}

/**
 * Whether Excel can record an add-in's changes as one undo step: `Excel.run({ mergeUndoGroup: true })`
 * came with ExcelApi 1.20 (learn.microsoft.com/office/dev/add-ins/excel/excel-add-ins-undo-capabilities).
 */
export function undoGroupSupported(): boolean {
  return Office.context.requirements.isSetSupported("ExcelApi", "1.20");
}

/**
 * Runs a batch as one undo step where the host supports it. An API in the batch that cannot join an
 * undo group makes Excel throw `UndoNotSupported` (same source); the batch then runs again without
 * the group, so the work is done and the caller says that Undo does not cover it.
 * @returns the batch's result and whether it ran as one undo step
 */
async function runAsOneUndoStep<T>(batch: (context: Excel.RequestContext) => Promise<T>): Promise<{ result: T; oneUndoStep: boolean }> {
  if (undoGroupSupported()) {
    try {
      return { result: await Excel.run({ mergeUndoGroup: true }, batch), oneUndoStep: true };
    } catch (e) {
      if ((e as { code?: string }).code !== "UndoNotSupported") throw e;
    }
  }
  return { result: await Excel.run(batch), oneUndoStep: false };
}

/** A frozen cell: its value to keep and the provenance note to attach. */
export interface FreezeCell {
  address: string;
  value: unknown;
  note: string;
}

/**
 * Replaces the given cells' formulas by their values and attaches a note (or comment) to each, as one
 * undo step where the host allows.
 * @param sheet worksheet name
 * @param cells cell address (e.g. "C4"), value to keep and note text
 * @returns which kind of annotation carried the provenance, and whether Excel's Undo reverts it in one step
 */
export async function freezeCells(sheet: string, cells: FreezeCell[]): Promise<{ carrier: "note" | "comment"; oneUndoStep: boolean }> {
  const carrier = notesSupported() ? "note" : "comment";
  const { oneUndoStep } = await runAsOneUndoStep(async (context) => {
    const ws = context.workbook.worksheets.getItem(sheet);
    for (const cell of cells) {
      ws.getRange(cell.address).values = [[cell.value]];
      const qualified = qualifiedAddress(sheet, cell.address);
      if (carrier === "note") ws.notes.add(qualified, cell.note);
      else context.workbook.comments.add(qualified, cell.note);
    }
    await context.sync();
  });
  return { carrier, oneUndoStep };
}

/** Comments of a sheet looked at, at most, where notes are missing (a crafted sheet may hold any number of them). */
export const commentsLookedAtMost = 10_000;
/** Comments read in one request. */
const commentsPerRequest = 500;

/**
 * The comments of a sheet on the given cells, where notes are missing: the sheet's comments are read
 * a page at a time with their cells (`$top` and `$skip`: Excel.Interfaces.CollectionLoadOptions,
 * @types/office-js), until every cell's comment is found or `commentsLookedAtMost` were looked at.
 * @returns address → comment, and whether every comment that could be one of them was looked at
 */
async function commentsOnCells(
  context: Excel.RequestContext,
  ws: Excel.Worksheet,
  addresses: string[],
): Promise<{ comments: Map<string, Excel.Comment>; complete: boolean }> {
  const wanted = new Set(addresses);
  const comments = new Map<string, Excel.Comment>();
  const count = ws.comments.getCount();
  await context.sync();
  const toRead = Math.min(count.value, commentsLookedAtMost);
  for (let skip = 0; skip < toRead && comments.size < wanted.size; skip += commentsPerRequest) {
    const page = ws.comments.load({ content: true, $top: Math.min(commentsPerRequest, toRead - skip), $skip: skip });
    await context.sync();
    const located = page.items.map((comment) => ({ comment, where: comment.getLocation().load("address") }));
    await context.sync();
    for (const { comment, where } of located) {
      const address = splitAddress(where.address).address.replaceAll("$", "");
      if (wanted.has(address)) comments.set(address, comment);
    }
  }
  return { comments, complete: comments.size === wanted.size || count.value <= commentsLookedAtMost };
}

/**
 * The note (or, where notes are missing, the comment) on each given cell of a sheet: one note asked
 * for each cell; comments looked at `commentsLookedAtMost` at most.
 * @param sheet worksheet name
 * @param addresses cell addresses such as "C4"
 * @returns address → annotation text, for the cells that have one, and whether every annotation that
 *   could be one of them was looked at (false only when the sheet has more comments than are looked at)
 */
export async function readAnnotations(sheet: string, addresses: string[]): Promise<{ annotations: Map<string, string>; complete: boolean }> {
  return Excel.run(async (context) => {
    const ws = context.workbook.worksheets.getItem(sheet);
    const annotations = new Map<string, string>();
    if (notesSupported()) {
      const notes = addresses.map((address) => ({ address, note: ws.notes.getItemOrNullObject(qualifiedAddress(sheet, address)).load("content") }));
      await context.sync();
      for (const { address, note } of notes) if (!note.isNullObject) annotations.set(address, note.content);
      return { annotations, complete: true };
    }
    const { comments, complete } = await commentsOnCells(context, ws, addresses);
    for (const [address, comment] of comments) annotations.set(address, comment.content);
    return { annotations, complete };
  });
}

/**
 * Brings frozen cells back to life: writes each formula again and removes the provenance annotation,
 * as one undo step where the host allows.
 * @param sheet worksheet name
 * @param cells cell address and the formula to restore
 * @returns whether Excel's Undo reverts it in one step
 */
export async function thawCells(sheet: string, cells: { address: string; formula: string }[]): Promise<{ oneUndoStep: boolean }> {
  const notes = notesSupported();
  const { oneUndoStep } = await runAsOneUndoStep(async (context) => {
    const ws = context.workbook.worksheets.getItem(sheet);
    for (const cell of cells) ws.getRange(cell.address).formulas = [[cell.formula]];
    if (notes) {
      for (const cell of cells) ws.notes.getItemOrNullObject(qualifiedAddress(sheet, cell.address)).delete();
    } else {
      const { comments } = await commentsOnCells(context, ws, cells.map((c) => c.address));
      for (const comment of comments.values()) comment.delete();
    }
    await context.sync();
  });
  return { oneUndoStep };
}

/** Calls `handler` whenever the user selects other cells. */
export function onSelectionChanged(handler: () => void): void {
  Office.context.document.addHandlerAsync(Office.EventType.DocumentSelectionChanged, handler);
}
