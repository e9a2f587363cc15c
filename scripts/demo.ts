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
import { findPreset } from "../core/index.js";
import { defaultModelSpec } from "../functions/activeModel.js";
import { definitions } from "../functions/definitions.js";
import { zcellVersion } from "../functions/describeModel.js";
import { evaluate } from "../functions/evaluate.js";
import { storedFormula } from "../functions/storedFormula.js";

/**
 * The invented catalogue: name, redshift, bolometric flux [erg/s/cm2], apparent mag (r, AB), angular
 * size [arcsec], and the position as a raw catalogue gives it, sexagesimal text (RA in hours, Dec in
 * degrees, ICRS), with a colour excess E(B−V) [mag] as a dust map would give it there (positions and
 * E(B−V) invented too; E(B−V) made larger where the invented position lies nearer the Galactic plane).
 */
const catalogue: [string, number, number, number, number, string, string, number][] = [
  //  name      z      F_bol     m     angle  RA            Dec          E(B−V)
  ["INV-01", 0.021, 3.2e-11,  14.8, 42.0,  "01:17:32.4", "+08:51:07", 0.024],
  ["INV-02", 0.087, 4.1e-12,  16.9, 18.5,  "02:58:14.9", "-21:04:36", 0.019],
  ["INV-03", 0.154, 9.8e-13,  17.6, 11.2,  "04:36:51.2", "-47:29:13", 0.031],
  ["INV-04", 0.33,  2.7e-13,  19.1, 6.4,   "07:22:08.6", "+63:12:44", 0.052],
  ["INV-05", 0.52,  1.1e-13,  20.3, 4.1,   "09:47:26.3", "+31:38:52", 0.027],
  ["INV-06", 0.78,  5.6e-14,  21.2, 2.9,   "11:05:43.7", "-12:17:09", 0.035],
  ["INV-07", 1.05,  2.4e-14,  22.0, 2.2,   "13:21:19.8", "+46:05:28", 0.015],
  ["INV-08", 1.61,  9.0e-15,  23.1, 1.6,   "14:52:37.1", "-03:44:15", 0.041],
  ["INV-09", 2.3,   4.3e-15,  23.9, 1.3,   "16:09:55.4", "+22:57:31", 0.029],
  ["INV-10", 3.4,   1.8e-15,  24.6, 0.9,   "18:33:02.6", "+71:20:48", 0.047],
  ["INV-11", 4.9,   7.5e-16,  25.3, 0.6,   "21:14:48.0", "-35:46:02", 0.022],
  ["INV-12", 6.2,   3.9e-16,  25.9, 0.45,  "23:08:29.5", "+14:02:19", 0.038],
];
/**
 * The effective wavelength of SDSS r [Å] at which the catalogue's A_r is taken: 0.6165 µm, Schlafly &
 * Finkbeiner 2011 (ApJ 737, 103), Table 6, as the IRSA DUST service lists its bandpasses.
 */
const rEffectiveAngstrom = 6165;

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
    fitWidth(ws, letter, header);
    if (header) headerCell.alignment = { horizontal: "right" }; // over its numbers, which a sheet aligns right
  }
}

/**
 * Widens a column to hold a text in full (never narrows it, never below 11): a width is counted in
 * the default font's digits, and a header of capitals, μ or Σ runs wider than its length; another
 * reader's substitute font (LibreOffice without Calibri) wider still, so a tenth is added and two more.
 */
function fitWidth(ws: ExcelJS.Worksheet, letter: string, text: string): void {
  const column = ws.getColumn(letter);
  column.width = Math.max(column.width ?? 0, 11, Math.ceil(text.length * 1.1) + 2);
}

/** A model in words for a reader of the printed sheet: a preset's description and source, a preset with changes as such. */
function modelInWords(spec: string): string {
  const [base, ...changes] = spec.split(";").map((part) => part.trim());
  const preset = findPreset(base);
  if (!preset) return spec;
  const changed = changes.map((c) => c.replace("=", " = ") + (c.startsWith("H0") ? " km/s/Mpc" : ""));
  return changed.length ? `${preset.name} with ${changed.join(", ")}, all else as ${preset.name}` : `${preset.name}: ${preset.description}`;
}

/**
 * How a sheet prints: landscape, as many pages wide as its columns need (about 12 a page stay
 * legible), the header row and the label column on every page (print titles; no label column where
 * column A does not label every row of the sheet's tables), and on every page a header with the
 * sheet's name (&A) and the model(s) the values were computed under, and a footer with the page
 * number (Excel's header and footer codes: &L, &R sections, &A sheet, &P page, &N pages).
 * @param models the model(s) in a few words, e.g. "P18-CMB"
 * @param labelColumn whether column A labels the rows of every table on the sheet
 */
function printSetup(ws: ExcelJS.Worksheet, headerRow: number, models: string, labelColumn = true): void {
  const pagesWide = Math.ceil(ws.columnCount / 12);
  ws.pageSetup = {
    ...ws.pageSetup, orientation: "landscape", fitToPage: true, fitToWidth: pagesWide, fitToHeight: 0,
    printTitlesRow: `${headerRow}:${headerRow}`, ...(labelColumn ? { printTitlesColumn: "A:A" } : {}),
  };
  const text = (t: string) => t.replaceAll("&", "&&");
  ws.headerFooter = { oddHeader: `&L&A&R${text(`computed under ${models} by zcell ${zcellVersion}`)}`, oddFooter: "&RPage &P of &N" };
}
/**
 * Row 1 of a sheet that prints several pages wide with column A repeated: "INVENTED (made up)" in A1,
 * on two lines so that the repeated column shows all of it on every page, and what is invented in B1.
 */
function banner(ws: ExcelJS.Worksheet, what: string): void {
  ws.getCell("A1").value = "INVENTED (made up)";
  ws.getCell("A1").alignment = { wrapText: true, vertical: "top" };
  ws.getCell("B1").value = what;
  ws.getCell("B1").alignment = { vertical: "top" };
  ws.getRow(1).height = 30;
}
/** Formats by quantity (common practice): redshift, distance, time, luminosity, magnitude, angle, small numbers. */
const fmt = { z: "0.000", zErr: "0.0000", dist: "0.0", time: "0.000", sci: "0.00E+00", mag: "0.00", angle: "0.00", deg: "0.0", ratio: "0.000", ebv: "0.000", velocity: "#,##0" };

const workbook = new ExcelJS.Workbook();
workbook.creator = "zcell demo (invented data)";

const sheet = workbook.addWorksheet("Catalogue (invented)");
banner(sheet, "demo catalogue: names, positions and values are made up for the zcell tour; they are not measurements.");
sheet.addRow([
  "source", "z", "F_bol [erg/s/cm2]", "m (r, AB) [mag]", "angle [arcsec]", "RA (ICRS) [hh:mm:ss.s]", "Dec (ICRS) [±dd:mm:ss]", "E(B−V) [mag]",
  "b (Galactic) [deg]", "cz [km/s], optical", "m − A_r (r, AB) [mag]", "D_L [Mpc]", "look-back [Gyr]", "L_bol [Lsun]", "proper size [kpc]",
  "K [mag], α = −0.5", "M (r, AB) [mag]",
]);
catalogue.forEach(([name, z, flux, m, angle, ra, dec, ebv], i) => {
  const r = i + 3;
  const value = (fn: string, ...args: unknown[]) => evaluate(definitions[fn], args, active)[0][0] as number;
  const dereddened = m - value("EXTINCTION", rEffectiveAngstrom, ebv);
  sheet.addRow([
    name, z, flux, m, angle, ra, dec, ebv,
    zc(`ZC.COORD_CONVERT(F${r},G${r},"equatorial","galactic","lat")`, "COORD_CONVERT", ra, dec, "equatorial", "galactic", "lat"),
    zc(`ZC.VELOCITY(B${r})`, "VELOCITY", z),
    { formula: storedFormula(`D${r}-ZC.EXTINCTION(${rEffectiveAngstrom},H${r})`), result: dereddened, date1904: false },
    zc(`ZC.DIST_LUM(B${r})`, "DIST_LUM", z),
    zc(`ZC.LOOKBACK(B${r})`, "LOOKBACK", z),
    zc(`ZC.LUMINOSITY(C${r},B${r},,"erg/s/cm2","Lsun")`, "LUMINOSITY", flux, z, null, "erg/s/cm2", "Lsun"),
    zc(`ZC.SIZE(E${r},B${r})`, "SIZE", angle, z),
    zc(`ZC.KCORRECTION(B${r},-0.5)`, "KCORRECTION", z, -0.5),
    zc(`ZC.MAG_ABS(K${r},B${r},P${r})`, "MAG_ABS", dereddened, z, value("KCORRECTION", z, -0.5)),
  ]);
  // the positions are text, and their cells say so: the Text number format "@" (built-in format 49 of
  // ECMA-376 Part 1 §18.8.30, from memory; exceljs's table of built-in formats maps 49 to "@" too)
  for (const column of ["F", "G"]) sheet.getCell(`${column}${r}`).numFmt = "@";
});
sheet.addRow([]);
const describeRow = sheet.addRow(["Every value above assumes:", zc("ZC.DESCRIBE()", "DESCRIBE")]);
// The sheet prints two pages wide, A–I and (with A repeated) J–Q: each paragraph is wrapped within one
// page's columns, rather than running off it or across the page break, and the model in words stands
// under the results of each page.
describeRow.getCell("J").value = zc("ZC.DESCRIBE()", "DESCRIBE");
for (const [from, to] of [["B", "I"], ["J", "Q"]]) {
  sheet.mergeCells(`${from}${describeRow.number}:${to}${describeRow.number}`);
  describeRow.getCell(from).alignment = { wrapText: true, vertical: "top" };
}
describeRow.getCell(1).alignment = { vertical: "top", wrapText: true };
describeRow.height = 48;
// what the columns of positions, dust and velocity hold, with the sources of their conventions, under them
const notesRow = sheet.getRow(describeRow.number + 2);
notesRow.getCell("B").value =
  "Positions (F, G) and E(B−V) (H) are invented. I: the Galactic latitude of the text positions, ZC.COORD_CONVERT from equatorial (ICRS) to galactic (the IAU 1958 frame as realised in the ICRS by Hipparcos).";
notesRow.getCell("J").value =
  `J: cz, the optical convention's velocity: a label for z, not a speed (above z = 1 it exceeds c). K: m − A_r with A_r = ZC.EXTINCTION(${rEffectiveAngstrom}, H), ` +
  `Fitzpatrick 1999 with R_V = 3.1 at SDSS r's effective wavelength, ${rEffectiveAngstrom} Å (Schlafly & Finkbeiner 2011, ApJ 737, 103, Table 6). Q: M of K's m − A_r.`;
sheet.mergeCells(`B${notesRow.number}:I${notesRow.number}`);
sheet.mergeCells(`J${notesRow.number}:Q${notesRow.number}`);
for (const column of ["B", "J"]) notesRow.getCell(column).alignment = { wrapText: true, vertical: "top" };
notesRow.height = 48;
formatColumns(
  sheet,
  2,
  {
    B: fmt.z, C: fmt.sci, D: fmt.mag, E: fmt.angle, H: fmt.ebv, I: fmt.angle, J: fmt.velocity, K: fmt.mag,
    L: fmt.dist, M: fmt.time, N: fmt.sci, O: fmt.dist, P: fmt.ratio, Q: fmt.mag,
  },
  [3, 14],
);
for (const column of ["F", "G"]) {
  fitWidth(sheet, column, String(sheet.getCell(`${column}2`).value));
  sheet.getCell(`${column}2`).alignment = { horizontal: "right" }; // over the positions, right-aligned as the numbers are
  for (let r = 3; r <= 14; r++) sheet.getCell(`${column}${r}`).alignment = { horizontal: "right" };
}
sheet.getColumn("A").width = 18;
printSetup(sheet, 2, defaultModelSpec);

const whatIf = workbook.addWorksheet("What-if");
const models = [defaultModelSpec, "W9-ALL", `${defaultModelSpec}; H0=73`];
whatIf.addRow(["Luminosity distance D_L [Mpc] of each redshift (column A) under each model (row 2): one formula per cell."]);
whatIf.addRow(["z", ...models]);
const columns = ["B", "C", "D"];
[0.1, 0.25, 0.5, 1, 2, 3, 5, 8].forEach((z, i) => {
  const r = i + 3;
  whatIf.addRow([z, ...models.map((model, j) => zc(`ZC.DIST_LUM($A${r},${columns[j]}$2)`, "DIST_LUM", z, model))]);
});
formatColumns(whatIf, 2, { A: fmt.z, B: fmt.dist, C: fmt.dist, D: fmt.dist }, [3, 10]);
fitWidth(whatIf, "D", models[2]);
// the models in words, beside the table they head
whatIf.getCell("F2").value = "The models of row 2, in words:";
models.forEach((model, i) => (whatIf.getCell(`F${i + 3}`).value = modelInWords(model)));
printSetup(whatIf, 2, `${models.slice(0, -1).join(", ")} and ${models.at(-1)} (one a column)`);

const inCells = workbook.addWorksheet("Model in cells");
const block = [["H0", 70], ["Om", 0.3], ["OL", 0.7]];
inCells.addRows([...block, [], ["z", "D_L [Mpc]"], [1, zc("ZC.DIST_LUM(A6,$A$1:$B$3)", "DIST_LUM", 1, block)]]);
// what each key means, outside the block (A1:B3 is read as the model)
["km/s/Mpc", "matter today", "dark energy (Λ) today"].forEach((meaning, i) => {
  inCells.getCell(`C${i + 1}`).value = meaning;
  inCells.getCell(`C${i + 1}`).alignment = { horizontal: "left", indent: 1 };
});
inCells.getCell("E1").value = "A block of keys and values is one model: change H0 and every dependent formula recalculates.";
inCells.getCell("E2").value = "The block gives no Tcmb, so radiation is off (no photons, no neutrinos): flat, matter + Λ only.";
inCells.getCell("D5").value = "The model of B6, in words:";
inCells.getCell("D6").value = zc("ZC.DESCRIBE($A$1:$B$3)", "DESCRIBE", block);
inCells.mergeCells("D6:L8");
inCells.getCell("D6").alignment = { wrapText: true, vertical: "top" };
formatColumns(inCells, 5, { A: fmt.z, B: fmt.dist }, [6, 6]);
printSetup(inCells, 5, "H0=70; Om=0.3; OL=0.7 (no radiation)");

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
banner(recipes, "sample and survey for the catalogue recipes: made up, not measurements.");
recipes.addRow([
  "source", "z (heliocentric)", "z_err", "RA (ICRS) [deg]", "Dec (ICRS) [deg]", "S_3GHz [mJy]", "S_err [mJy]", "α (S_ν ∝ ν^α)",
  "F_bol [erg/s/cm2]", "F_bol err [erg/s/cm2]", "m (r, AB) [mag]", "m err [mag]", "angle [arcsec]", "angle err [arcsec]",
  "z_cmb (CMB frame)", "D_L err [Mpc]", "D_C [Mpc/h]", "L_bol [erg/s]", "L_bol err [erg/s]", "M_bol [mag]", "L_1.4GHz rest [W/Hz]",
  "L_1.4GHz err [W/Hz]", "M (r, AB) [mag]", "M err [mag]", "size err [kpc]", "dimming [mag]", "z_max (flux limit)", "1/V_max [Mpc-3]",
  "z_max (m limit)",
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
recipes.getCell("AA12").alignment = { horizontal: "right" };
recipes.getCell("AB12").value = { formula: "SUM(AB3:AB10)", result: weights, date1904: false };
const surveyCells: [string, number][] = [
  ["flux limit [erg/s/cm2]", survey.fluxLimit], ["z_lo", survey.zLo], ["z_hi", survey.zHi], ["area [deg2]", survey.areaDeg2], ["m limit (r, AB) [mag]", survey.magLimit],
];
recipes.getCell("AE1").value = "survey (invented)";
surveyCells.forEach(([label, v], i) => {
  recipes.getCell(`AE${i + 2}`).value = label;
  recipes.getCell(`AF${i + 2}`).value = v;
});
// beside the outputs (O … AC), not under the inputs: which model they assume, in words
recipes.getCell("O12").value = `Columns O–AC: cached values computed under ${modelInWords(defaultModelSpec)}.`;
recipes.getCell("O13").value = "First-order errors from independent inputs (no covariances).";
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
fitWidth(recipes, "AA", String(recipes.getCell("AA12").value));
for (const [label] of surveyCells) fitWidth(recipes, "AE", label);
printSetup(recipes, 2, defaultModelSpec);

const structure = workbook.addWorksheet("Structure (invented)");
structure.addRow(["INVENTED inputs for the population and structure recipes: made up, not measurements."]);
structure.addRow(["quantity", "value", "how"]);
const structureValue = (fn: string, ...args: unknown[]) => evaluate(definitions[fn], args, active)[0][0] as number;
const rd = structureValue("SOUND_HORIZON");
const structureRows: [string, ExcelJS.CellFormulaValue, string, string][] = [
  ["r_d [Mpc]", zc("ZC.SOUND_HORIZON()", "SOUND_HORIZON"), "0.00", "sound horizon at the drag epoch (Aubourg et al. 2015 fit)"],
  ["D_V(0.51) / r_d", { formula: storedFormula("ZC.DIST_VOLUME(0.51)/B3"), result: structureValue("DIST_VOLUME", 0.51) / rd, date1904: false }, "0.000", "isotropic BAO distance in units of r_d"],
  ["L from a W7-BAO paper [erg/s]", zc('ZC.RESCALE(3.2E44,0.84,"luminosity","W7-BAO")', "RESCALE", 3.2e44, 0.84, "luminosity", "W7-BAO"), "0.000E+00", "3.2e44 erg/s published under W7-BAO (WMAP seven-year + BAO + H0), restated"],
  ["Σ_cr, lens 0.35, sources 1.2 [Msun/pc2]", zc("ZC.SIGMA_CRIT(0.35,1.2)", "SIGMA_CRIT", 0.35, 1.2), "0", "critical surface density"],
  ["R_500c of 2e14 Msun at z = 0.3 [kpc]", zc('ZC.HALO_RADIUS(2E14,0.3,"500c")', "HALO_RADIUS", 2e14, 0.3, "500c"), "0", "radius at 500 ρ_crit(z)"],
  ["Δ_vir at z = 0.3", zc('ZC.OVERDENSITY(0.3,"vir")', "OVERDENSITY", 0.3, "vir"), "0.0", "Bryan & Norman 1998, relative to ρ_crit(z)"],
  ["D(z = 1) / D(0)", zc("ZC.GROWTH(1)", "GROWTH", 1), "0.0000", "linear growth factor"],
  ["f(z = 0.5)", zc("ZC.GROWTH_RATE(0.5)", "GROWTH_RATE", 0.5), "0.0000", "linear growth rate dlnD/dlna"],
  // the Sun's absolute magnitude in V, Vega system: 4.81 (Willmer 2018, ApJS 236, 47, abstract and Table 3)
  ["Σ_V of μ_V = 24.1 mag/arcsec² at z = 0.6 [Lsun/pc2 in V]", zc("ZC.SURFACE_LUM(24.1,0.6,4.81,0.4)", "SURFACE_LUM", 24.1, 0.6, 4.81, 0.4), "0.00", "V band, Vega system: M☉,V = 4.81 (Willmer 2018, ApJS 236, 47), K = 0.4; dimming removed"],
];
structureRows.forEach(([label, value, format, how], i) => {
  structure.getCell(`A${i + 3}`).value = label;
  structure.getCell(`B${i + 3}`).value = value;
  structure.getCell(`B${i + 3}`).numFmt = format;
  structure.getCell(`C${i + 3}`).value = how;
  structure.getCell(`C${i + 3}`).alignment = { horizontal: "left", indent: 1 }; // apart from the number before it
});
structure.getCell(`A${structureRows.length + 4}`).value = `Column B: cached values computed under ${modelInWords(defaultModelSpec)}.`;
// every label and value shows in full (a value too wide for its column shows as ###)
structure.getColumn("A").width = Math.max(...structureRows.map(([label]) => label.length)) + 2;
structure.getColumn("B").width = 12;
structure.getCell("B2").alignment = { horizontal: "right" };
printSetup(structure, 2, defaultModelSpec);

// Populations: an INVENTED sample (log10 L, V_max, distance moduli made up for the tour) for the binned
// luminosity function and the χ² of a Hubble diagram. LUMINOSITY_FUNCTION returns a table; as on the
// what-if sheet the file holds one formula per cell, INDEX(ZC.LUMINOSITY_FUNCTION(…), row, column):
// INDEX with a non-zero row and column returns one value, no array formula needed (Microsoft support,
// "INDEX function", array form; ../shared/excel-host-notes.md), and the cell keeps its cached value in another reader (an array formula
// over the range showed #NAME? in LibreOffice, scripts/renderDemo.mjs); typed by hand in Excel with
// dynamic arrays, the one formula spills the same table.
const populations = workbook.addWorksheet("Populations (invented)");
populations.addRow(["INVENTED sample for the luminosity-function and Hubble-diagram recipes: made up, not measurements."]);
const populationHeaders = ["source", "z", "log10 L_bol [erg/s]", "V_max [Mpc3]", "μ [mag]", "σ_μ [mag]"];
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
populations.getCell("H2").value = "edges [log10 erg/s]";
edges.forEach((edge, i) => (populations.getCell(`H${i + 3}`).value = edge));
const tableHeaders = ["low [log10 erg/s]", "high [log10 erg/s]", "N (sources)", "Φ [Mpc-3 dex-1]", "σ_Φ [Mpc-3 dex-1]"];
tableHeaders.forEach((header, i) => (populations.getCell(2, 10 + i).value = header)); // J2:N2
// the table prints on a page of its own (columns I–N): a title above it and a label for each row
populations.getCell("I1").value = "Luminosity function of the INVENTED sample by 1/V_max (C and D), binned by the edges in H: no model needed";
populations.getCell("I2").value = "bin";
const column = (k: number) => sample.map((row) => [row[k]]);
const lfFormula = `ZC.LUMINOSITY_FUNCTION($C$3:$C$${lastSample},$D$3:$D$${lastSample},$H$3:$H$${2 + edges.length})`;
const lf = evaluate(definitions.LUMINOSITY_FUNCTION, [column(2), column(3), edges.map((e) => [e])], active) as number[][];
lf.forEach((row, i) => {
  populations.getCell(3 + i, 9).value = `bin ${i + 1}`;
  row.forEach((value, j) => {
    populations.getCell(3 + i, 10 + j).value = { formula: storedFormula(`INDEX(${lfFormula},${i + 1},${j + 1})`), result: value, date1904: false };
  });
});
const chiRow = lastSample + 3;
const chi2Models = ["P18-CMB", "W9-ALL", "EDS"];
populations.getCell(`A${chiRow - 1}`).value = "χ² of the Hubble diagram (offset minimised), by model";
chi2Models.forEach((spec, i) => {
  populations.getCell(`A${chiRow + i}`).value = spec;
  // the model in words, beside its χ², wrapped within the first page's columns (C:H)
  populations.getCell(`C${chiRow + i}`).value = modelInWords(spec);
  populations.mergeCells(`C${chiRow + i}:H${chiRow + i}`);
  populations.getCell(`C${chiRow + i}`).alignment = { horizontal: "left", indent: 1, wrapText: true, vertical: "top" };
  populations.getRow(chiRow + i).height = 30;
  populations.getCell(`A${chiRow + i}`).alignment = { vertical: "top" };
  const formula = `ZC.CHI2_MODULUS(B3:B${lastSample},E3:E${lastSample},F3:F${lastSample},A${chiRow + i})`;
  populations.getCell(`B${chiRow + i}`).value = zc(formula, "CHI2_MODULUS", column(1), column(4), column(5), spec);
  populations.getCell(`B${chiRow + i}`).numFmt = "0.00";
  populations.getCell(`B${chiRow + i}`).alignment = { vertical: "top" };
});
formatColumns(populations, 2, { B: fmt.z, C: fmt.mag, D: fmt.sci, E: fmt.mag, F: fmt.mag }, [3, lastSample]);
formatColumns(populations, 2, { H: "0.0" }, [3, 2 + edges.length]);
formatColumns(populations, 2, { J: "0.0", K: "0.0", L: "0", M: fmt.sci, N: fmt.sci }, [3, 2 + lf.length]);
populations.getColumn("A").width = 12;
populations.getCell(`A${chiRow + chi2Models.length + 1}`).value =
  "Cached values: each χ² under the model in its row; the luminosity function needs no model (V_max is given).";
printSetup(populations, 2, "each χ²'s model in column A (none for the luminosity function)", false);

const out = fileURLToPath(new URL("../demo/", import.meta.url));
mkdirSync(out, { recursive: true });
await workbook.xlsx.writeFile(`${out}zcell-demo.xlsx`);
console.log(`wrote ${out}zcell-demo.xlsx (invented sources; ZC formulas in Excel's stored form, with cached values)`);
