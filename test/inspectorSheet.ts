/** Readers of an invented workbook for the cell inspector's tests (`explainFormula`). */
import type { ReferenceReader } from "../taskpane/explainCall.js";

/** A reader for a formula whose references all hold one blank cell. */
export const blanks: ReferenceReader = async () => ({ cells: 1, values: [[""]] });

/** A reader over an invented Sheet1: each reference's values by its text, with the address Excel would resolve. */
export function sheet1(cells: Record<string, unknown[][]>): ReferenceReader {
  return async (reference) => {
    if (!(reference in cells)) throw new Error(`no reference ${reference}`);
    const values = cells[reference];
    return { address: `Sheet1!${reference.replaceAll("$", "")}`, cells: values.length * values[0].length, values };
  };
}

/** The workbook's model in these tests: P18-CMB (the default model), not stored in the workbook. */
export const p18Cmb = { spec: "P18-CMB", stored: false };
