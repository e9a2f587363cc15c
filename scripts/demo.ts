/**
 * Writes demo/zcell-demo.xlsx: a catalogue of INVENTED sources (names and values made up for the
 * tour; not measurements of any real object) with live ZC formulas, a what-if table and a model kept
 * in cells.
 *
 * Every formula is written the way Excel itself saves a JavaScript custom function,
 * `_xldudf_ZC_DIST_LUM(B3)` (see functions/storedFormula.ts): a file holding the bare `ZC.` spelling
 * would show #NAME? even after the add-in loads. Every formula cell carries a cached value computed
 * by the same code the worksheet functions run (under P18-BAO, the model of a new workbook), so a
 * reader without the add-in sees the numbers.
 *
 * The what-if table holds one formula per cell, `=ZC.DIST_LUM($A2,B$1)`, rather than one spilling
 * formula: a dynamic array needs Excel's cell-metadata part, which the writer used here (exceljs)
 * does not produce, and a plain cell formula is read the same way by every Excel version.
 */
import { mkdirSync } from "node:fs";
import { fileURLToPath } from "node:url";
import ExcelJS from "exceljs";
import { defaultModelSpec } from "../functions/activeModel.js";
import { definitions } from "../functions/definitions.js";
import { evaluate } from "../functions/evaluate.js";
import { storedFormula } from "../functions/storedFormula.js";

/** The invented catalogue: name, redshift, bolometric flux [erg/s/cm2], apparent mag, angular size [arcsec]. */
const catalogue: [string, number, number, number, number][] = [
  ["INV-01", 0.021, 3.2e-11, 14.8, 42.0],
  ["INV-02", 0.087, 4.1e-12, 16.9, 18.5],
  ["INV-03", 0.154, 9.8e-13, 17.6, 11.2],
  ["INV-04", 0.33, 2.7e-13, 19.1, 6.4],
  ["INV-05", 0.52, 1.1e-13, 20.3, 4.1],
  ["INV-06", 0.78, 5.6e-14, 21.2, 2.9],
  ["INV-07", 1.05, 2.4e-14, 22.0, 2.2],
  ["INV-08", 1.61, 9.0e-15, 23.1, 1.6],
  ["INV-09", 2.3, 4.3e-15, 23.9, 1.3],
  ["INV-10", 3.4, 1.8e-15, 24.6, 0.9],
  ["INV-11", 4.9, 7.5e-16, 25.3, 0.6],
  ["INV-12", 6.2, 3.9e-16, 25.9, 0.45],
];

const active = { spec: defaultModelSpec, stored: false };

/**
 * A formula cell: the formula in Excel's stored spelling and its cached value.
 * @param formula as a person types it, without "=", e.g. "ZC.DIST_LUM(B3)"
 * @param name the ZC function it calls (outermost)
 * @param args the values its arguments refer to, in order (null for an omitted one)
 */
function zc(formula: string, name: string, ...args: unknown[]): ExcelJS.CellFormulaValue {
  const value = evaluate(definitions[name], args, active)[0][0];
  if (typeof value !== "number" && typeof value !== "string") throw new Error(`demo: ${formula} gives ${JSON.stringify(value)}`);
  return { formula: storedFormula(formula), result: value, date1904: false };
}

const workbook = new ExcelJS.Workbook();
workbook.creator = "zcell demo (invented data)";

const sheet = workbook.addWorksheet("Catalogue (invented)");
sheet.addRow(["INVENTED demo catalogue: names and values are made up for the zcell tour; they are not measurements."]);
sheet.addRow(["source", "z", "flux [erg/s/cm2]", "m", "angle [arcsec]", "D_L [Mpc]", "look-back [Gyr]", "L [Lsun]", "size [kpc]", "K (α=−0.5)", "M"]);
catalogue.forEach(([name, z, flux, m, angle], i) => {
  const r = i + 3;
  const k = evaluate(definitions.KCORRECTION, [z, -0.5], active)[0][0];
  sheet.addRow([
    name, z, flux, m, angle,
    zc(`ZC.DIST_LUM(B${r})`, "DIST_LUM", z),
    zc(`ZC.LOOKBACK(B${r})`, "LOOKBACK", z),
    zc(`ZC.LUMINOSITY(C${r},B${r},,"erg/s/cm2","Lsun")`, "LUMINOSITY", flux, z, null, "erg/s/cm2", "Lsun"),
    zc(`ZC.SIZE(E${r},B${r})`, "SIZE", angle, z),
    zc(`ZC.KCORRECTION(B${r},-0.5)`, "KCORRECTION", z, -0.5),
    zc(`ZC.MAG_ABS(D${r},B${r},J${r})`, "MAG_ABS", m, z, k),
  ]);
});
sheet.addRow([]);
sheet.addRow(["Model used above: the workbook's active cosmology.", zc("ZC.DESCRIBE()", "DESCRIBE")]);
sheet.columns.forEach((c) => (c.width = 16));

const whatIf = workbook.addWorksheet("What-if");
const models = [defaultModelSpec, "W9-ALL", `${defaultModelSpec}; H0=73`];
whatIf.addRow(["z", ...models]);
const columns = ["B", "C", "D"];
[0.1, 0.25, 0.5, 1, 2, 3, 5, 8].forEach((z, i) => {
  const r = i + 2;
  whatIf.addRow([z, ...models.map((model, j) => zc(`ZC.DIST_LUM($A${r},${columns[j]}$1)`, "DIST_LUM", z, model))]);
});
whatIf.getCell("F1").value = "D_L in Mpc: one formula per cell, a redshift from column A against a model from row 1.";

const inCells = workbook.addWorksheet("Model in cells");
inCells.addRows([["H0", 70], ["Om", 0.3], ["OL", 0.7], [], ["z", "D_L [Mpc]"], [1, zc("ZC.DIST_LUM(A6,$A$1:$B$3)", "DIST_LUM", 1, [["H0", 70], ["Om", 0.3], ["OL", 0.7]])]]);
inCells.getCell("D1").value = "A block of keys and values is one model: change H0 and every dependent formula recalculates.";

const out = fileURLToPath(new URL("../demo/", import.meta.url));
mkdirSync(out, { recursive: true });
await workbook.xlsx.writeFile(`${out}zcell-demo.xlsx`);
console.log(`wrote ${out}zcell-demo.xlsx (invented sources; ZC formulas in Excel's stored form, with cached values)`);
