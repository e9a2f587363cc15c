/**
 * Writes demo/zcell-demo.xlsx: a catalogue of INVENTED sources (names and values made up for the
 * tour; not measurements of any real object) with live ZC formulas, a what-if table and a model kept
 * in cells. Cached results are computed with the same engine, so the file reads sensibly before
 * Excel recalculates; with the add-in loaded, the formulas are live.
 */
import { mkdirSync } from "node:fs";
import { fileURLToPath } from "node:url";
import ExcelJS from "exceljs";
import { Cosmology, convertUnit, kCorrectionPowerLawMag, luminosityW, absoluteMagnitude } from "../core/index.js";
import { definitions } from "../functions/definitions.js";
import { evaluate } from "../functions/evaluate.js";

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

const active = { spec: "PLANCK2018", stored: false };
const cached = (name: string, ...args: unknown[]) => {
  const v = evaluate(definitions[name], args, active)[0][0];
  return typeof v === "number" || typeof v === "string" ? v : undefined;
};

const workbook = new ExcelJS.Workbook();
workbook.creator = "zcell demo (invented data)";
const sheet = workbook.addWorksheet("Catalogue (invented)");
sheet.addRow(["INVENTED demo catalogue: names and values are made up for the zcell tour; they are not measurements."]);
sheet.addRow(["source", "z", "flux [erg/s/cm2]", "m", "angle [arcsec]", "D_L [Mpc]", "look-back [Gyr]", "L [Lsun]", "size [kpc]", "K (α=−0.5)", "M"]);
const p18 = Cosmology.fromSpec("PLANCK2018");
catalogue.forEach(([name, z, flux, m, angle], i) => {
  const r = i + 3;
  const k = kCorrectionPowerLawMag(z, -0.5);
  sheet.addRow([
    name,
    z,
    flux,
    m,
    angle,
    { formula: `ZC.DIST_LUM(B${r})`, result: p18.luminosityDistanceMpc(z) },
    { formula: `ZC.LOOKBACK(B${r})`, result: p18.lookbackTimeGyr(z) },
    { formula: `ZC.LUMINOSITY(C${r},B${r},,"erg/s/cm2","Lsun")`, result: luminosityW(p18, convertUnit(flux, "erg/s/cm2", "W/m2"), z) / 3.828e26 },
    { formula: `ZC.SIZE(E${r},B${r})`, result: cached("SIZE", angle, z) },
    { formula: `ZC.KCORRECTION(B${r},-0.5)`, result: k },
    { formula: `ZC.MAG_ABS(D${r},B${r},J${r})`, result: absoluteMagnitude(p18, m, z, k) },
  ]);
});
sheet.addRow([]);
sheet.addRow(["Model used above: the workbook's active cosmology.", { formula: "ZC.DESCRIBE()", result: cached("DESCRIBE") }]);
sheet.columns.forEach((c) => (c.width = 16));

const whatIf = workbook.addWorksheet("What-if");
whatIf.addRow(["z", "PLANCK2018", "WMAP9", "PLANCK2018; H0=73"]);
const zs = [0.1, 0.25, 0.5, 1, 2, 3, 5, 8];
zs.forEach((z, i) => {
  const row = whatIf.addRow([z]);
  if (i === 0) {
    // one broadcasting formula for the whole table (a dynamic array in current Excel)
    row.getCell(2).value = { formula: `ZC.DIST_LUM(A2:A${zs.length + 1},B1:D1)`, result: cached("DIST_LUM", z, "PLANCK2018") } as never;
  }
});
whatIf.getCell("F1").value = "D_L in Mpc: a column of redshifts against a row of models spills a table.";

const inCells = workbook.addWorksheet("Model in cells");
inCells.addRows([["H0", 70], ["Om", 0.3], ["OL", 0.7], [], ["z", "D_L [Mpc]"], [1, { formula: "ZC.DIST_LUM(A6,$A$1:$B$3)", result: cached("DIST_LUM", 1, "H0=70; Om=0.3; OL=0.7") }]]);
inCells.getCell("D1").value = "A block of keys and values is one model: change H0 and every dependent formula recalculates.";

const out = fileURLToPath(new URL("../demo/", import.meta.url));
mkdirSync(out, { recursive: true });
await workbook.xlsx.writeFile(`${out}zcell-demo.xlsx`);
console.log(`wrote ${out}zcell-demo.xlsx (invented sources; live ZC formulas)`);
