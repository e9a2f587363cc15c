/**
 * A1-style cell addresses as the pane meets them: column letters ↔ numbers, sheet-qualified
 * addresses split and built, the top-left cell of a range.
 */

/**
 * A worksheet's size: 1,048,576 rows by 16,384 columns, the last column XFD (Microsoft, "Excel
 * specifications and limits"). A reference-shaped name beyond it (XFE1, A1048577) is not a cell
 * (observed by spreadsheet-library authors: only names inside rows 1–1,048,576 and columns A–XFD
 * read as cells; jmcnamara/XlsxWriter issue 1078).
 */
export const sheetRows = 1_048_576;
export const sheetColumns = 16_384;

/** Column letters of a 1-based column number (1 → "A", 27 → "AA"). */
export function columnName(n: number): string {
  let s = "";
  for (let k = n; k > 0; k = Math.floor((k - 1) / 26)) s = String.fromCharCode(65 + ((k - 1) % 26)) + s;
  return s;
}

/** 1-based column number of column letters ("AA" → 27). */
export function columnNumber(name: string): number {
  return [...name.toUpperCase()].reduce((n, ch) => n * 26 + ch.charCodeAt(0) - 64, 0);
}

/** Splits "Sheet 1!A1:B2" or "'My sheet'!A1" into sheet name (or undefined) and address. */
export function splitAddress(reference: string): { sheet?: string; address: string } {
  const bang = reference.lastIndexOf("!");
  if (bang < 0) return { address: reference };
  let sheet = reference.slice(0, bang);
  if (sheet.startsWith("'")) sheet = sheet.slice(1, -1).replaceAll("''", "'");
  return { sheet, address: reference.slice(bang + 1) };
}

/** "'It''s'!B2" from "It's" and "B2": a sheet-qualified address, always quoted. */
export function qualifiedAddress(sheet: string, address: string): string {
  return `'${sheet.replaceAll("'", "''")}'!${address}`;
}

/** 1-based column and row of a range's top-left cell ("$C$4:D9" → { col: 3, row: 4 }). */
export function topLeft(address: string): { col: number; row: number } {
  const m = /^\$?([A-Za-z]+)\$?(\d+)/.exec(address);
  if (!m) throw new RangeError(`not a cell address: ${address}`);
  return { col: columnNumber(m[1]), row: Number(m[2]) };
}
