/**
 * Writes demo/zcell-demo.xlsx: a catalogue of INVENTED sources (names and values made up for the
 * tour; not measurements of any real object) with live ZC formulas, a what-if table and a model kept
 * in cells, and a sheet of catalogue recipes (uncertainties, rest-frame luminosities, bolometric
 * magnitudes, flux limits and 1/V_max, CMB-frame redshifts, h-scaled units, dimming).
 *
 * Every formula is written the way Excel itself saves a JavaScript custom function,
 * `_xldudf_ZC_DIST_LUM(B3)` (see functions/storedFormula.ts): a file holding the bare `ZC.` spelling
 * would show #NAME? even after the add-in loads. Every formula cell carries a cached value computed
 * by the same code the worksheet functions run (under P18-CMB, the model of a new workbook), so a
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

/**
 * Number formats a reader without zcell needs (Excel shows up to 15 digits otherwise): each column's
 * format fits its quantity, and its width fits its header.
 * @param ws the sheet
 * @param headerRow the row of the headers
 * @param formats column letter → number format of its data rows
 * @param rows the data rows
 */
function formatColumns(ws: ExcelJS.Worksheet, headerRow: number, formats: Record<string, string>, rows: [number, number]): void {
  for (const [letter, format] of Object.entries(formats)) {
    for (let r = rows[0]; r <= rows[1]; r++) ws.getCell(`${letter}${r}`).numFmt = format;
    const headerCell = ws.getCell(`${letter}${headerRow}`);
    const header = String(headerCell.value ?? "");
    ws.getColumn(letter).width = Math.max(11, header.length + 2);
    if (header) headerCell.alignment = { horizontal: "right" }; // over its numbers, which a sheet aligns right
  }
}
/** Formats by quantity (common practice): redshift, distance, time, luminosity, magnitude, angle, small numbers. */
const fmt = { z: "0.000", zErr: "0.0000", dist: "0.0", time: "0.000", sci: "0.00E+00", mag: "0.00", angle: "0.00", deg: "0.0", ratio: "0.000" };

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
const describeRow = sheet.addRow(["Model used above:", zc("ZC.DESCRIBE()", "DESCRIBE")]);
// the model in words is a paragraph: wrapped over the table's width rather than running off the page
sheet.mergeCells(`B${describeRow.number}:K${describeRow.number}`);
describeRow.getCell(2).alignment = { wrapText: true, vertical: "top" };
describeRow.getCell(1).alignment = { vertical: "top" };
describeRow.height = 48;
formatColumns(sheet, 2, { B: fmt.z, C: fmt.sci, D: fmt.mag, E: fmt.angle, F: fmt.dist, G: fmt.time, H: fmt.sci, I: fmt.dist, J: fmt.ratio, K: fmt.mag }, [3, 14]);
sheet.getColumn("A").width = 18;

const whatIf = workbook.addWorksheet("What-if");
const models = [defaultModelSpec, "W9-ALL", `${defaultModelSpec}; H0=73`];
whatIf.addRow(["z", ...models]);
const columns = ["B", "C", "D"];
[0.1, 0.25, 0.5, 1, 2, 3, 5, 8].forEach((z, i) => {
  const r = i + 2;
  whatIf.addRow([z, ...models.map((model, j) => zc(`ZC.DIST_LUM($A${r},${columns[j]}$1)`, "DIST_LUM", z, model))]);
});
whatIf.getCell("F1").value = "D_L in Mpc: one formula per cell, a redshift from column A against a model from row 1.";
formatColumns(whatIf, 1, { A: fmt.z, B: fmt.dist, C: fmt.dist, D: fmt.dist }, [2, 9]);
whatIf.getColumn("D").width = 17;

const inCells = workbook.addWorksheet("Model in cells");
inCells.addRows([["H0", 70], ["Om", 0.3], ["OL", 0.7], [], ["z", "D_L [Mpc]"], [1, zc("ZC.DIST_LUM(A6,$A$1:$B$3)", "DIST_LUM", 1, [["H0", 70], ["Om", 0.3], ["OL", 0.7]])]]);
inCells.getCell("D1").value = "A block of keys and values is one model: change H0 and every dependent formula recalculates.";
formatColumns(inCells, 5, { A: fmt.z, B: fmt.dist }, [6, 6]);

/**
 * Catalogue recipes on a second invented sample: name, z, σz, RA, Dec [deg], S_3GHz, σS [mJy], α,
 * bolometric flux, σflux [erg/s/cm2], m, σm, angle, σangle [arcsec].
 */
const recipeSources: [string, ...number[]][] = [
  ["REC-01", 0.082, 0.0008, 12.5, -5.2, 48, 2.4, -0.8, 4.6e-13, 2.3e-14, 15.9, 0.03, 28, 1.4],
  ["REC-02", 0.143, 0.0011, 47.9, 22.7, 12.5, 0.7, -0.7, 1.2e-13, 8e-15, 17.2, 0.04, 15.5, 0.9],
  ["REC-03", 0.31, 0.002, 88.1, -33.4, 6.1, 0.4, -0.6, 3.1e-14, 2.5e-15, 18.8, 0.05, 8.2, 0.6],
  ["REC-04", 0.57, 0.004, 131.6, 8.9, 3.3, 0.25, -0.9, 1.1e-14, 1e-15, 20.1, 0.06, 4.9, 0.4],
  ["REC-05", 0.92, 0.006, 176.2, 61, 1.9, 0.18, -0.75, 5.2e-15, 5.5e-16, 21.3, 0.08, 3.1, 0.3],
  ["REC-06", 1.38, 0.009, 219.4, -12.3, 1.2, 0.12, -0.5, 2.6e-15, 3.1e-16, 22.4, 0.1, 2.2, 0.25],
  ["REC-07", 1.94, 0.013, 268.7, 40.6, 0.85, 0.09, -0.65, 1.5e-15, 2e-16, 23.2, 0.12, 1.6, 0.2],
  ["REC-08", 2.47, 0.018, 331, -58.9, 0.6, 0.07, -0.7, 1.05e-15, 1.6e-16, 23.9, 0.15, 1.2, 0.18],
];
/** The invented survey the sample is drawn from: flux limit, redshift range, area, magnitude limit. */
const survey = { fluxLimit: 8e-16, zLo: 0.05, zHi: 3, areaDeg2: 50, magLimit: 24.5 };

const recipes = workbook.addWorksheet("Recipes (invented)");
recipes.addRow(["INVENTED sample and survey for the catalogue recipes: made up, not measurements."]);
recipes.addRow([
  "source", "z", "z_err", "RA [deg]", "Dec [deg]", "S_3GHz [mJy]", "S_err [mJy]", "alpha", "flux [erg/s/cm2]", "flux_err", "m", "m_err",
  "angle [arcsec]", "angle_err", "z_cmb", "D_L err [Mpc]", "D_C [Mpc/h]", "L [erg/s]", "L err [erg/s]", "M_bol", "L_1.4GHz [W/Hz]",
  "L_1.4GHz err [W/Hz]", "M", "M err", "size err [kpc]", "dimming [mag]", "z_max", "1/V_max [Mpc-3]", "z_max (m)",
]);
let weights = 0;
recipeSources.forEach(([name, z, zErr, ra, dec, s, sErr, alpha, flux, fluxErr, m, mErr, angle, angleErr], i) => {
  const r = i + 3;
  const value = (fn: string, ...args: unknown[]) => evaluate(definitions[fn], args, active)[0][0] as number;
  const lum = value("LUMINOSITY", flux, z);
  const absMag = value("MAG_ABS", m, z);
  const zMax = value("REDSHIFT_LIMIT", lum, survey.fluxLimit);
  const vMax = value("VOLUME_MAX", zMax, survey.zLo, survey.zHi, survey.areaDeg2);
  weights += 1 / vMax;
  recipes.addRow([
    name, z, zErr, ra, dec, s, sErr, alpha, flux, fluxErr, m, mErr, angle, angleErr,
    zc(`ZC.REDSHIFT_CMB(B${r},D${r},E${r})`, "REDSHIFT_CMB", z, ra, dec),
    zc(`ZC.DIST_LUM_ERR(B${r},C${r})`, "DIST_LUM_ERR", z, zErr),
    zc(`ZC.DIST_LOS(B${r},,"Mpc/h")`, "DIST_LOS", z, null, "Mpc/h"),
    zc(`ZC.LUMINOSITY(I${r},B${r})`, "LUMINOSITY", flux, z),
    zc(`ZC.LUMINOSITY_ERR(I${r},J${r},B${r},C${r})`, "LUMINOSITY_ERR", flux, fluxErr, z, zErr),
    zc(`ZC.MAG_BOL(R${r})`, "MAG_BOL", lum),
    zc(`ZC.LUMINOSITY_REST(F${r},B${r},H${r},3,1.4,,,"mJy")`, "LUMINOSITY_REST", s, z, alpha, 3, 1.4, null, null, "mJy"),
    zc(`ZC.LUMINOSITY_REST_ERR(F${r},G${r},B${r},C${r},H${r},0.1,3,1.4,,,"mJy")`, "LUMINOSITY_REST_ERR", s, sErr, z, zErr, alpha, 0.1, 3, 1.4, null, null, "mJy"),
    zc(`ZC.MAG_ABS(K${r},B${r})`, "MAG_ABS", m, z),
    zc(`ZC.MAG_ABS_ERR(L${r},B${r},C${r})`, "MAG_ABS_ERR", mErr, z, zErr),
    zc(`ZC.SIZE_ERR(M${r},N${r},B${r},C${r})`, "SIZE_ERR", angle, angleErr, z, zErr),
    zc(`ZC.DIMMING(B${r})`, "DIMMING", z),
    zc(`ZC.REDSHIFT_LIMIT(R${r},$AF$2)`, "REDSHIFT_LIMIT", lum, survey.fluxLimit),
    { formula: storedFormula(`1/ZC.VOLUME_MAX(AA${r},$AF$3,$AF$4,$AF$5)`), result: 1 / vMax, date1904: false },
    zc(`ZC.REDSHIFT_LIMIT_MAG(W${r},$AF$6)`, "REDSHIFT_LIMIT_MAG", absMag, survey.magLimit),
  ]);
});
recipes.addRow([]);
recipes.getCell("AA12").value = "Σ 1/V_max [Mpc-3]";
recipes.getCell("AB12").value = { formula: "SUM(AB3:AB10)", result: weights, date1904: false };
const surveyCells: [string, number][] = [
  ["flux limit [erg/s/cm2]", survey.fluxLimit], ["z_lo", survey.zLo], ["z_hi", survey.zHi], ["area [deg2]", survey.areaDeg2], ["m limit", survey.magLimit],
];
recipes.getCell("AE1").value = "survey (invented)";
surveyCells.forEach(([label, v], i) => {
  recipes.getCell(`AE${i + 2}`).value = label;
  recipes.getCell(`AF${i + 2}`).value = v;
});
recipes.getCell("A13").value = "Cached values computed under P18-CMB; first-order errors assume independent inputs.";
// source, z, z_err, RA, Dec, S, S_err, alpha, flux, flux_err, m, m_err, angle, angle_err, then the recipe columns O … AC
formatColumns(
  recipes,
  2,
  {
    B: fmt.z, C: fmt.zErr, D: fmt.deg, E: fmt.deg, F: fmt.mag, G: fmt.mag, H: fmt.mag, I: fmt.sci, J: fmt.sci, K: fmt.mag, L: fmt.mag,
    M: fmt.angle, N: fmt.angle, O: "0.00000", P: fmt.dist, Q: fmt.dist, R: fmt.sci, S: fmt.sci, T: fmt.mag, U: fmt.sci, V: fmt.sci,
    W: fmt.mag, X: fmt.mag, Y: fmt.angle, Z: fmt.mag, AA: fmt.z, AB: fmt.sci, AC: fmt.z,
  },
  [3, 10],
);
recipes.getCell("AB12").numFmt = fmt.sci;
recipes.getColumn("AE").width = 22;

const structure = workbook.addWorksheet("Structure (invented)");
structure.addRow(["INVENTED inputs for the population and structure recipes: made up, not measurements."]);
structure.addRow(["quantity", "value", "how"]);
const structureValue = (fn: string, ...args: unknown[]) => evaluate(definitions[fn], args, active)[0][0] as number;
const rd = structureValue("SOUND_HORIZON");
const structureRows: [string, ExcelJS.CellFormulaValue, string, string][] = [
  ["r_d [Mpc]", zc("ZC.SOUND_HORIZON()", "SOUND_HORIZON"), "0.00", "sound horizon at the drag epoch (Aubourg et al. 2015 fit)"],
  ["D_V(0.51) / r_d", { formula: storedFormula("ZC.DIST_VOLUME(0.51)/B3"), result: structureValue("DIST_VOLUME", 0.51) / rd, date1904: false }, "0.000", "isotropic BAO distance in units of r_d"],
  ["L from a W7-BAO paper [erg/s]", zc('ZC.RESCALE(3.2E44,0.84,"luminosity","W7-BAO")', "RESCALE", 3.2e44, 0.84, "luminosity", "W7-BAO"), "0.000E+00", "3.2e44 erg/s published under W7-BAO, restated"],
  ["Σ_cr, lens 0.35, sources 1.2 [Msun/pc2]", zc("ZC.SIGMA_CRIT(0.35,1.2)", "SIGMA_CRIT", 0.35, 1.2), "0", "critical surface density"],
  ["R_500c of 2e14 Msun at z = 0.3 [kpc]", zc('ZC.HALO_RADIUS(2E14,0.3,"500c")', "HALO_RADIUS", 2e14, 0.3, "500c"), "0", "radius at 500 ρ_crit(z)"],
  ["Δ_vir at z = 0.3", zc('ZC.OVERDENSITY(0.3,"vir")', "OVERDENSITY", 0.3, "vir"), "0.0", "Bryan & Norman 1998, relative to ρ_crit(z)"],
  ["D(z = 1) / D(0)", zc("ZC.GROWTH(1)", "GROWTH", 1), "0.0000", "linear growth factor"],
  ["f(z = 0.5)", zc("ZC.GROWTH_RATE(0.5)", "GROWTH_RATE", 0.5), "0.0000", "linear growth rate dlnD/dlna"],
  ["Σ of 24.1 mag/arcsec² at z = 0.6 [Lsun/pc2]", zc("ZC.SURFACE_LUM(24.1,0.6,4.65,0.4)", "SURFACE_LUM", 24.1, 0.6, 4.65, 0.4), "0.00", "M☉ = 4.65, K = 0.4; dimming removed"],
];
structureRows.forEach(([label, value, format, how], i) => {
  structure.getCell(`A${i + 3}`).value = label;
  structure.getCell(`B${i + 3}`).value = value;
  structure.getCell(`B${i + 3}`).numFmt = format;
  structure.getCell(`C${i + 3}`).value = how;
});
structure.getCell(`A${structureRows.length + 4}`).value = "Cached values computed under P18-CMB.";
// every label and value shows in full (a value too wide for its column shows as ###)
structure.getColumn("A").width = Math.max(...structureRows.map(([label]) => label.length)) + 2;
structure.getColumn("B").width = 12;
structure.getCell("B2").alignment = { horizontal: "right" };

// Populations: an INVENTED sample (log10 L, V_max, distance moduli made up for the tour) for the binned
// luminosity function and the χ² of a Hubble diagram. LUMINOSITY_FUNCTION returns a table; as on the
// what-if sheet the file holds one formula per cell, INDEX(ZC.LUMINOSITY_FUNCTION(…), row, column):
// INDEX with a non-zero row and column returns one value, no array formula needed (Microsoft support,
// "INDEX function", array form; ../shared/excel-host-notes.md), and the cell keeps its cached value in another reader (an array formula
// over the range showed #NAME? in LibreOffice, scripts/renderDemo.mjs); typed by hand in Excel with
// dynamic arrays, the one formula spills the same table.
const populations = workbook.addWorksheet("Populations (invented)");
populations.addRow(["INVENTED sample for the luminosity-function and Hubble-diagram recipes: made up, not measurements."]);
const populationHeaders = ["source", "z", "log10 L [erg/s]", "V_max [Mpc3]", "μ [mag]", "σ_μ [mag]"];
//   source    z       log10 L  V_max [Mpc3]  μ [mag]  σ_μ [mag]   (all invented)
const sample: [string, number, number, number, number, number][] = [
  ["POP-01",   0.031,  42.12,   3.1e5,        35.88,   0.15],
  ["POP-02",   0.058,  42.41,   1.2e6,        37.09,   0.14],
  ["POP-03",   0.112,  42.77,   6.8e6,        38.76,   0.12],
  ["POP-04",   0.19,   42.95,   2.4e7,        39.94,   0.12],
  ["POP-05",   0.27,   43.18,   6.1e7,        40.94,   0.13],
  ["POP-06",   0.36,   43.36,   1.3e8,        41.47,   0.11],
  ["POP-07",   0.48,   43.52,   2.6e8,        42.31,   0.12],
  ["POP-08",   0.63,   43.71,   5.0e8,        42.90,   0.14],
  ["POP-09",   0.81,   43.88,   8.7e8,        43.75,   0.16],
  ["POP-10",   1.02,   44.17,   1.4e9,        44.23,   0.18],
];
populations.addRow(populationHeaders);
for (const row of sample) populations.addRow(row);
const lastSample = 2 + sample.length; // rows 3 … 12
const edges = [42, 42.5, 43, 43.5, 44, 44.5];
populations.getCell("H2").value = "bin edges (log10 L)";
edges.forEach((edge, i) => (populations.getCell(`H${i + 3}`).value = edge));
const tableHeaders = ["low", "high", "N", "Φ [Mpc-3 dex-1]", "σ_Φ [Mpc-3 dex-1]"];
tableHeaders.forEach((header, i) => (populations.getCell(2, 10 + i).value = header)); // J2:N2
const column = (k: number) => sample.map((row) => [row[k]]);
const lfFormula = `ZC.LUMINOSITY_FUNCTION($C$3:$C$${lastSample},$D$3:$D$${lastSample},$H$3:$H$${2 + edges.length})`;
const lf = evaluate(definitions.LUMINOSITY_FUNCTION, [column(2), column(3), edges.map((e) => [e])], active) as number[][];
lf.forEach((row, i) =>
  row.forEach((value, j) => {
    populations.getCell(3 + i, 10 + j).value = { formula: storedFormula(`INDEX(${lfFormula},${i + 1},${j + 1})`), result: value, date1904: false };
  }),
);
const chiRow = lastSample + 3;
const chi2Models = ["P18-CMB", "W9-ALL", "EDS"];
populations.getCell(`A${chiRow - 1}`).value = "χ² of the Hubble diagram (offset minimised), by model";
chi2Models.forEach((spec, i) => {
  populations.getCell(`A${chiRow + i}`).value = spec;
  const formula = `ZC.CHI2_MODULUS(B3:B${lastSample},E3:E${lastSample},F3:F${lastSample},A${chiRow + i})`;
  populations.getCell(`B${chiRow + i}`).value = zc(formula, "CHI2_MODULUS", column(1), column(4), column(5), spec);
  populations.getCell(`B${chiRow + i}`).numFmt = "0.00";
});
formatColumns(populations, 2, { B: fmt.z, C: fmt.mag, D: fmt.sci, E: fmt.mag, F: fmt.mag }, [3, lastSample]);
formatColumns(populations, 2, { H: "0.0" }, [3, 2 + edges.length]);
formatColumns(populations, 2, { J: "0.0", K: "0.0", L: "0", M: fmt.sci, N: fmt.sci }, [3, 2 + lf.length]);
populations.getColumn("A").width = 12;
populations.getCell(`A${chiRow + chi2Models.length + 1}`).value = "Cached values computed under P18-CMB (the χ² under the model in column A).";

// Printed (or rendered to PDF by another reader), each sheet is one page wide, in landscape: a table
// split across pages by columns is hard to read.
for (const ws of workbook.worksheets) {
  const pagesWide = Math.ceil(ws.columnCount / 12); // about 12 columns a landscape page stay legible
  ws.pageSetup = { ...ws.pageSetup, orientation: "landscape", fitToPage: true, fitToWidth: pagesWide, fitToHeight: 0 };
}

const out = fileURLToPath(new URL("../demo/", import.meta.url));
mkdirSync(out, { recursive: true });
await workbook.xlsx.writeFile(`${out}zcell-demo.xlsx`);
console.log(`wrote ${out}zcell-demo.xlsx (invented sources; ZC formulas in Excel's stored form, with cached values)`);
