/**
 * npm run demo writes a workbook that Excel can bind: read as raw XML (the form Excel reads), every
 * ZC formula is in the stored spelling `_xldudf_ZC_…` (how Excel saves an add-in function; see
 * ../shared notes and OfficeDev/office-js issue 3558), every formula cell has a cached value, and the
 * README's tour describes the file as it is.
 *
 * On paper: every sheet defines print titles (`_xlnm.Print_Titles`: its header row, and column A
 * where it labels the rows), a page header with the sheet's name and "computed under <model> by zcell
 * <version>", headers that give unit and band or convention, no text cut at its column width (by a
 * character-width estimate from the file), and the model of each sheet's results in words beside
 * them. Where LibreOffice (soffice) and poppler-utils are installed, the workbook is also rendered as
 * `npm run render:demo` does and the pages are read back: each page's header, the titles repeated on
 * every page of a sheet that spans pages, every header whole. LibreOffice is not in CI (.ci/run does
 * not install it): there only the checks of the file run, and the rendering check is skipped with a hint.
 */
import { execFileSync } from "node:child_process";
import { mkdtempSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import JSZip from "jszip";
import { beforeAll, describe, expect, test } from "vitest";
import { parseStrictXml, type ManifestElement as XmlElement } from "../scripts/checkManifest.js";
import { publishedModels } from "./fixtures.js";
import { SlowCosmology } from "./reference/slowCosmology.js";
import { storedFormula } from "../functions/storedFormula.js";
import { zcellVersion } from "../functions/describeModel.js";
import { pageTexts, renderPdf, renderToolsMissing, sheetOfPage } from "../scripts/renderDemo.mjs";
import { expectRelative } from "./helpers.js";
import { toolAvailable } from "./requirements.js";
import { referenceAvailable, runPythonReference } from "./reference/python.js";
import { evaluateFormula, sheetRuntime, type SheetValue } from "./sheetFormula.js";

const root = fileURLToPath(new URL("..", import.meta.url));

interface SheetCell {
  formula?: string; formulaType?: string; formulaRef?: string; value?: string; type?: string; numFmtId?: number;
  /** The cell style's alignment. */
  horizontal?: string; wrap?: boolean;
}
/** Sheet name → cell address → formula, cached value text and cell type, from the raw sheet XML. */
const sheets = new Map<string, Map<string, SheetCell>>();
/** How a sheet prints and its column widths (in the default font's digits), from the raw XML. */
interface SheetLayout { widths: Map<number, number>; defaultWidth: number; header: string; footer: string; merged: string[]; printTitles?: string }
const layouts = new Map<string, SheetLayout>();

const textOf = (e: XmlElement | undefined): string | undefined => (e ? e.text + e.children.map((c) => textOf(c)).join("") : undefined);

beforeAll(async () => {
  execFileSync(process.execPath, [`${root}node_modules/tsx/dist/cli.mjs`, "scripts/demo.ts"], { cwd: root, stdio: "ignore" });
  const zip = await JSZip.loadAsync(readFileSync(`${root}demo/zcell-demo.xlsx`));
  const book = parseStrictXml(await zip.file("xl/workbook.xml")!.async("string"));
  const rels = parseStrictXml(await zip.file("xl/_rels/workbook.xml.rels")!.async("string"));
  const strings = zip.file("xl/sharedStrings.xml")
    ? parseStrictXml(await zip.file("xl/sharedStrings.xml")!.async("string")).children.map((si) => textOf(si) ?? "")
    : [];
  // the number format of each cell style (styles.xml cellXfs; numFmtId 0 is General)
  const styles = parseStrictXml(await zip.file("xl/styles.xml")!.async("string"));
  const xfs = styles.children.find((c) => c.name === "cellXfs")!.children;
  const formatOfStyle = xfs.map((xf) => Number(xf.attributes.numFmtId ?? 0));
  const alignmentOfStyle = xfs.map((xf) => xf.children.find((c) => c.name === "alignment")?.attributes ?? {});
  const definedNames = book.children.find((c) => c.name === "definedNames")?.children ?? [];
  const sheetList = book.children.find((c) => c.name === "sheets")!.children;
  for (const [index, s] of sheetList.entries()) {
    const target = rels.children.find((r) => r.attributes.Id === s.attributes["r:id"])!.attributes.Target;
    const xml = parseStrictXml(await zip.file(`xl/${target.replace(/^\/xl\//, "")}`)!.async("string"));
    const cells = new Map<string, SheetCell>();
    for (const row of xml.children.find((c) => c.name === "sheetData")!.children) {
      for (const c of row.children) {
        const f = c.children.find((x) => x.name === "f");
        const v = c.children.find((x) => x.name === "v");
        const value = c.attributes.t === "s" ? strings[Number(textOf(v))] : c.attributes.t === "inlineStr" ? textOf(c) : textOf(v);
        const style = Number(c.attributes.s ?? 0);
        const { horizontal, wrapText } = alignmentOfStyle[style];
        cells.set(c.attributes.r, {
          formula: textOf(f), formulaType: f?.attributes.t, formulaRef: f?.attributes.ref, value, type: c.attributes.t, numFmtId: formatOfStyle[style],
          horizontal, wrap: wrapText === "1",
        });
      }
    }
    sheets.set(s.attributes.name, cells);
    const child = (name: string) => xml.children.find((c) => c.name === name);
    const widths = new Map<number, number>();
    for (const col of child("cols")?.children ?? []) {
      for (let n = Number(col.attributes.min); n <= Number(col.attributes.max); n++) widths.set(n, Number(col.attributes.width));
    }
    const headerFooter = child("headerFooter");
    layouts.set(s.attributes.name, {
      widths,
      // without <sheetFormatPr defaultColWidth>, a column is 8.43 digits wide (Excel's default width, from memory)
      defaultWidth: Number(child("sheetFormatPr")?.attributes.defaultColWidth ?? 8.43),
      header: textOf(headerFooter?.children.find((c) => c.name === "oddHeader")) ?? "",
      footer: textOf(headerFooter?.children.find((c) => c.name === "oddFooter")) ?? "",
      merged: (child("mergeCells")?.children ?? []).map((m) => m.attributes.ref),
      printTitles: textOf(definedNames.find((d) => d.attributes.name === "_xlnm.Print_Titles" && Number(d.attributes.localSheetId) === index)),
    });
  }
});

const formulaCells = () => [...sheets.entries()].flatMap(([sheet, cells]) => [...cells].filter(([, c]) => c.formula !== undefined).map(([address, c]) => ({ sheet, address, ...c })));

describe("demo workbook, read as Excel reads it", () => {
  test("holds the invented catalogue and recipe sample, marked as invented, and six sheets", () => {
    expect([...sheets.keys()]).toEqual(["Catalogue (invented)", "What-if", "Model in cells", "Recipes (invented)", "Structure (invented)", "Populations (invented)"]);
    expect(sheets.get("Populations (invented)")!.get("A1")!.value).toMatch(/^INVENTED/);
    expect(sheets.get("Structure (invented)")!.get("A1")!.value).toMatch(/^INVENTED/);
    expect(sheets.get("Recipes (invented)")!.get("A1")!.value).toMatch(/^INVENTED/);
    expect(sheets.get("Recipes (invented)")!.get("AE1")!.value).toBe("survey (invented)");
    expect(sheets.get("Catalogue (invented)")!.get("A1")!.value).toMatch(/^INVENTED/);
    expect(sheets.get("Catalogue (invented)")!.get("A3")!.value).toBe("INV-01");
  });

  test("every formula calls ZC in the stored spelling, never the bare ZC. name", () => {
    const all = formulaCells();
    expect(all.length).toBe(12 * 9 + 2 + 8 * 3 + 2 + 8 * 15 + 1 + 9 + 5 * 5 + 3);
    for (const c of all) {
      expect(c.formula, `${c.sheet}!${c.address}`).not.toMatch(/(^|[^_\w])ZC\./);
      // the one formula without ZC is the sum of the 1/V_max weights
      if (c.sheet === "Recipes (invented)" && c.address === "AB12") expect(c.formula).toBe("SUM(AB3:AB10)");
      else expect(c.formula, `${c.sheet}!${c.address}`).toMatch(/^(1\/|INDEX\(|[A-Z]+\d+-)?_xldudf_ZC_[A-Z0-9_]+\(/);
    }
  });

  test("the structure sheet's cached r_d is Planck 2018's r_drag within its 1σ (147.09 ± 0.26 Mpc, Planck 2018 VI Table 2)", () => {
    const cells = sheets.get("Structure (invented)")!;
    expect(cells.get("B3")!.formula).toBe("_xldudf_ZC_SOUND_HORIZON()");
    expect(Math.abs(Number(cells.get("B3")!.value) - 147.09)).toBeLessThan(0.26);
    // D_V(0.51)/r_d is the ratio of the two cached values' functions: the formula refers to B3
    expect(cells.get("B4")!.formula).toBe("_xldudf_ZC_DIST_VOLUME(0.51)/B3");
  });

  test("every number a formula gives has a number format (not General, which shows up to 15 digits)", () => {
    const general = formulaCells().filter((c) => c.type !== "str" && !c.numFmtId);
    expect(general.map((c) => `${c.sheet}!${c.address}`)).toEqual([]);
  });

  test("every formula cell carries a cached value: a finite number, or text for DESCRIBE", () => {
    for (const c of formulaCells()) {
      expect(c.value, `${c.sheet}!${c.address}`).toBeDefined();
      if (c.type === "str") expect(c.formula).toMatch(/^_xldudf_ZC_DESCRIBE\((\$A\$1:\$B\$3)?\)$/);
      else expect(Number.isFinite(Number(c.value)), `${c.sheet}!${c.address} = ${c.value}`).toBe(true);
    }
  });

  test("the README's catalogue table names the file's headers (row 2) and formulas (row 3)", () => {
    const readme = readFileSync(`${root}README.md`, "utf8");
    const table = readme.slice(readme.indexOf("<!-- demo-tour:start"), readme.indexOf("<!-- demo-tour:end"));
    const rows = [...table.matchAll(/^\| ([A-Z]) \| ([^|]+) \| `=([^`]+)` \|/gm)];
    expect(rows.length).toBe(9);
    const cells = sheets.get("Catalogue (invented)")!;
    for (const [, column, header, formula] of rows) {
      expect(cells.get(`${column}2`)!.value, column).toBe(header.trim());
      expect(cells.get(`${column}3`)!.formula, column).toBe(storedFormula(formula));
    }
    const [, first, last] = /rows (\d+)–(\d+) the twelve sources/.exec(readme)!;
    expect(cells.get(`A${first}`)!.value).toBe("INV-01");
    expect(cells.get(`A${last}`)!.value).toBe("INV-12");
    expect(cells.get(`A${Number(last) + 1}`)).toBeUndefined();
    const [, describeRow] = /Row (\d+) holds `=ZC.DESCRIBE\(\)`/.exec(readme)!;
    expect(cells.get(`B${describeRow}`)!.formula).toBe("_xldudf_ZC_DESCRIBE()");
  });

  test("the README's what-if and model-in-cells descriptions match the file", () => {
    const readme = readFileSync(`${root}README.md`, "utf8").replace(/\s+/g, " ");
    const whatIf = sheets.get("What-if")!;
    expect(["B2", "C2", "D2"].map((a) => whatIf.get(a)!.value)).toEqual(["P18-CMB", "W9-ALL", "P18-CMB; H0=73"]);
    expect(readme).toContain("the models `P18-CMB`, `W9-ALL` and `P18-CMB; H0=73` in B2:D2 (each in words, with its source, in F3:F5)");
    const [, typed] = /B3:D10 one formula per cell, `=([^`]+)`/.exec(readme)!;
    expect(whatIf.get("B3")!.formula).toBe(storedFormula(typed));
    for (const column of ["B", "C", "D"]) for (let r = 3; r <= 10; r++) {
      expect(whatIf.get(`${column}${r}`)!.formula).toBe(storedFormula(`ZC.DIST_LUM($A${r},${column}$2)`));
    }
    expect(whatIf.get("A11")).toBeUndefined();
    expect(readme).toContain("`=ZC.DIST_LUM(A3:A10,B2:D2)` spills the same 8×3 table");
    const [, inCells] = /passed as `model` is one model: `=([^`]+)` in B6/.exec(readme)!;
    expect(sheets.get("Model in cells")!.get("B6")!.formula).toBe(storedFormula(inCells));
    const [, described] = /`=([^`]+)` in D6 writes the model in words/.exec(readme)!;
    expect(sheets.get("Model in cells")!.get("D6")!.formula).toBe(storedFormula(described));
  });

  test("the README's recipes table names the recipe sheet's headers (row 2) and formulas (row 3)", () => {
    const readme = readFileSync(`${root}README.md`, "utf8");
    const table = readme.slice(readme.indexOf("<!-- recipes:start"), readme.indexOf("<!-- recipes:end"));
    const rows = [...table.matchAll(/^\| ([A-Z]+) \| ([^|]+) \| `=([^`]+)` \|/gm)];
    expect(rows.length).toBe(15);
    const cells = sheets.get("Recipes (invented)")!;
    for (const [, column, header, formula] of rows) {
      expect(cells.get(`${column}2`)!.value, column).toBe(header.trim());
      expect(cells.get(`${column}3`)!.formula, column).toBe(storedFormula(formula));
    }
    // the same formulas on rows 3–10, with the row's own references
    for (let r = 3; r <= 10; r++) expect(cells.get(`O${r}`)!.formula).toBe(storedFormula(`ZC.REDSHIFT_CMB(B${r},D${r},E${r})`));
    expect(cells.get("A10")!.value).toBe("REC-08");
    expect(cells.get("A11")).toBeUndefined();
    expect(readme).toContain("AB12 sums the weights, `=SUM(AB3:AB10)`");
  });

  test("recipe cached values hang together: the flux at z_max is the survey limit, AB12 is the sum of the weights", () => {
    // reference: the flux of L at z, L / (4π D_L²) (Hogg 1999 eq. 22), with D_L of the independent slow
    // path (test/reference/slowCosmology.ts) under P18-CMB as Planck 2018 VI Table 2 gives it
    const p18 = new SlowCosmology(publishedModels["P18-CMB"]);
    const cells = sheets.get("Recipes (invented)")!;
    const num = (a: string) => Number(cells.get(a)!.value);
    const limit = num("AF2"); // erg/s/cm2
    let sum = 0;
    for (let r = 3; r <= 10; r++) {
      const zMax = num(`AA${r}`);
      expect(zMax, `AA${r}`).toBeGreaterThan(num(`B${r}`)); // every source is above the limit at its own z
      const dlCm = p18.luminosityDistanceMpc(zMax) * 3.0856775814913673e24; // Mpc in cm (IAU 2015 B2 pc)
      expectRelative(num(`R${r}`) / (4 * Math.PI * dlCm * dlCm), limit, 1e-9, `flux at z_max, row ${r}`);
      sum += num(`AB${r}`);
    }
    expectRelative(num("AB12"), sum, 1e-12, "Σ 1/V_max");
  });

  test("the luminosity function's table holds the 1/V_max sums of the typed sample, one INDEX formula a cell", () => {
    // one formula per cell, INDEX(ZC.LUMINOSITY_FUNCTION(…), row, column): no dynamic-array support needed
    const cells = sheets.get("Populations (invented)")!;
    const num = (a: string) => Number(cells.get(a)!.value);
    const columns = ["J", "K", "L", "M", "N"];
    for (let i = 0; i < 5; i++) for (let j = 0; j < 5; j++) {
      expect(cells.get(`${columns[j]}${3 + i}`)!.formula).toBe(
        storedFormula(`INDEX(ZC.LUMINOSITY_FUNCTION($C$3:$C$12,$D$3:$D$12,$H$3:$H$8),${i + 1},${j + 1})`),
      );
    }
    const edges = [3, 4, 5, 6, 7, 8].map((r) => num(`H${r}`));
    const sample = [3, 4, 5, 6, 7, 8, 9, 10, 11, 12].map((r) => ({ logL: num(`C${r}`), vMax: num(`D${r}`) }));
    for (let bin = 0; bin < 5; bin++) {
      const r = 3 + bin;
      const [low, high] = [edges[bin], edges[bin + 1]];
      // Schmidt (1968) 1/V_max, binned as Felten (1976): Φ = Σ 1/V_max / Δ, σ_Φ = √Σ 1/V_max² / Δ, per dex
      const inBin = sample.filter((s) => s.logL >= low && s.logL < high);
      const phi = inBin.reduce((sum, s) => sum + 1 / s.vMax, 0) / (high - low);
      const sigma = Math.sqrt(inBin.reduce((sum, s) => sum + 1 / s.vMax ** 2, 0)) / (high - low);
      expect([num(`J${r}`), num(`K${r}`), num(`L${r}`)], `bin ${bin}`).toEqual([low, high, inBin.length]);
      if (inBin.length === 0) expect([num(`M${r}`), num(`N${r}`)]).toEqual([0, 0]);
      else {
        expectRelative(num(`M${r}`), phi, 1e-12, `Φ bin ${bin}`);
        expectRelative(num(`N${r}`), sigma, 1e-12, `σ_Φ bin ${bin}`);
      }
    }
    expect(sample.every((s) => s.logL >= edges[0] && s.logL < edges[5])).toBe(true); // every source counted once
    expect([3, 4, 5, 6, 7].reduce((n, r) => n + num(`L${r}`), 0)).toBe(sample.length);
  });

  test("the Hubble-diagram χ² cached for each model is the offset-minimised sum of the typed moduli", () => {
    // χ²(δ) = Σ ((μ − μ_model − δ)/σ)² is least at δ = B/C, where it is A − B²/C with A = Σ Δ²/σ²,
    // B = Σ Δ/σ², C = Σ 1/σ², Δ = μ − μ_model (derived here; the form of Goliath et al. 2001).
    // μ_model from the independent slow path with the papers' parameters (fixtures.ts), and EdS
    // (Ωm = 1, H0 = 70; its μ is independent of H0 after the offset is minimised).
    const cells = sheets.get("Populations (invented)")!;
    const num = (a: string) => Number(cells.get(a)!.value);
    const rows = [3, 4, 5, 6, 7, 8, 9, 10, 11, 12];
    const models: [string, SlowCosmology][] = [
      ["P18-CMB", new SlowCosmology(publishedModels["P18-CMB"])],
      ["W9-ALL", new SlowCosmology(publishedModels["W9-ALL"])],
      ["EDS", new SlowCosmology({ H0: 70, Om: 1, w0: -1, wa: 0, Tcmb: 0, Neff: 3.046, mnu: [] })],
    ];
    models.forEach(([name, model], i) => {
      const r = 15 + i;
      expect(cells.get(`A${r}`)!.value).toBe(name);
      expect(cells.get(`B${r}`)!.formula).toBe(storedFormula(`ZC.CHI2_MODULUS(B3:B12,E3:E12,F3:F12,A${r})`));
      let [a, b, c] = [0, 0, 0];
      for (const row of rows) {
        const delta = num(`E${row}`) - (5 * Math.log10(model.luminosityDistanceMpc(num(`B${row}`))) + 25);
        const w = 1 / num(`F${row}`) ** 2;
        [a, b, c] = [a + delta * delta * w, b + delta * w, c + w];
      }
      expectRelative(num(`B${r}`), a - (b * b) / c, 1e-8, name);
    });
    expect(num("B15")).toBeLessThan(num("B17")); // the invented moduli were drawn near P18-CMB, far from EdS
  });

  test("cached D_L values are those of P18-CMB, the model of a new workbook", () => {
    // reference: the independent slow path (tanh-sinh quadrature of the same equations, no tables),
    // with the parameters of Planck 2018 VI Table 2 written out; 1e-9 is the two codes' agreement
    const p18 = new SlowCosmology(publishedModels["P18-CMB"]);
    const cells = sheets.get("Catalogue (invented)")!;
    for (let r = 3; r <= 14; r++) {
      expectRelative(Number(cells.get(`L${r}`)!.value), p18.luminosityDistanceMpc(Number(cells.get(`B${r}`)!.value)), 1e-9, `L${r}`);
    }
  });
});

/** A cell's value as the sheet holds it (its cached value for a formula): number, text, boolean, or null when blank. */
const valueIn = (cells: Map<string, SheetCell>) => (address: string): SheetValue => {
  const c = cells.get(address);
  if (c?.value === undefined) return null;
  if (c.type === "s" || c.type === "str" || c.type === "inlineStr") return c.value;
  if (c.type === "b") return c.value === "1";
  return Number(c.value);
};

describe("demo workbook: every cached value is what its formula gives", () => {
  test("each formula cell of every sheet, evaluated through the built bundle on the file's own cells, gives the value cached beside it", async () => {
    // the bundle as Excel's runtime loads it, in a workbook of no settings (the default model, P18-CMB,
    // the model the demo computes its cached values under); cell references read the file's values
    const runtime = await sheetRuntime();
    const differing: string[] = [];
    let checked = 0;
    for (const [sheet, cells] of sheets) {
      for (const [address, c] of cells) {
        if (c.formula === undefined) continue;
        const got = await evaluateFormula(runtime, c.formula, valueIn(cells));
        const cached = valueIn(cells)(address);
        checked++;
        if (got !== cached) differing.push(`${sheet}!${address} ${c.formula}: cached ${String(cached)}, the bundle gives ${String(got)}`);
      }
    }
    expect(checked).toBe(formulaCells().length);
    expect(differing).toEqual([]);
  });

  test("the evaluator sees a cached value that is not the formula's", async () => {
    const runtime = await sheetRuntime();
    const cells = sheets.get("Catalogue (invented)")!;
    const tampered = (address: string) => (address === "H3" ? 0.5 : valueIn(cells)(address)); // another E(B−V)
    expect(await evaluateFormula(runtime, cells.get("K3")!.formula!, tampered)).not.toBe(valueIn(cells)("K3"));
    await expect(evaluateFormula(runtime, "VLOOKUP(A1,B1:C2,2)", tampered)).rejects.toThrow(/the function VLOOKUP/);
  });
});

/** The catalogue's rows 3–14: the typed positions and E(B−V), and the cached values of their formulas. */
function catalogueRows() {
  const cells = sheets.get("Catalogue (invented)")!;
  const at = valueIn(cells);
  return Array.from({ length: 12 }, (_, i) => {
    const r = i + 3;
    return {
      r, z: at(`B${r}`) as number, m: at(`D${r}`) as number, ra: at(`F${r}`) as string, dec: at(`G${r}`) as string, ebv: at(`H${r}`) as number,
      b: at(`I${r}`) as number, cz: at(`J${r}`) as number, dereddened: at(`K${r}`) as number,
    };
  });
}

describe("demo catalogue: positions, dust and velocities", () => {
  test("positions are sexagesimal text (RA hh:mm:ss.s in hours, Dec ±dd:mm:ss), in the Text format, and the row's formulas read them", () => {
    const cells = sheets.get("Catalogue (invented)")!;
    for (const { r, ra, dec } of catalogueRows()) {
      expect(cells.get(`F${r}`)!.type, `F${r}`).toBe("s");
      expect(ra, `F${r}`).toMatch(/^([01]\d|2[0-3]):[0-5]\d:[0-5]\d\.\d$/);
      expect(dec, `G${r}`).toMatch(/^[+-][0-8]\d:[0-5]\d:[0-5]\d$/);
      // number format 49 is the built-in Text format "@" (ECMA-376 Part 1 §18.8.30, from memory; exceljs's
      // lib/xlsx/defaultnumformats.js maps 49 to "@")
      for (const column of ["F", "G"]) expect(cells.get(`${column}${r}`)!.numFmtId, `${column}${r}`).toBe(49);
      expect(cells.get(`I${r}`)!.formula).toBe(storedFormula(`ZC.COORD_CONVERT(F${r},G${r},"equatorial","galactic","lat")`));
      expect(cells.get(`J${r}`)!.formula).toBe(storedFormula(`ZC.VELOCITY(B${r})`));
      expect(cells.get(`K${r}`)!.formula).toBe(storedFormula(`D${r}-ZC.EXTINCTION(6165,H${r})`));
      expect(cells.get(`Q${r}`)!.formula).toBe(storedFormula(`ZC.MAG_ABS(K${r},B${r},P${r})`));
    }
  });

  test("the notes under the table cite the band's effective wavelength and say what cz is", () => {
    const cells = sheets.get("Catalogue (invented)")!;
    expect(cells.get("B18")!.value).toMatch(/^Positions \(F, G\) and E\(B−V\) \(H\) are invented\. I: the Galactic latitude/);
    expect(cells.get("J18")!.value).toMatch(/SDSS r's effective wavelength, 6165 Å \(Schlafly & Finkbeiner 2011, ApJ 737, 103, Table 6\)/);
    expect(cells.get("J18")!.value).toMatch(/^J: cz, the optical convention's velocity: a label for z, not a speed/);
  });

  test("cz is c z (the optical convention), c = 299792.458 km/s", () => {
    // c exact by the SI definition of the metre (BIPM SI Brochure, 9th edition, 2019)
    for (const { r, z, cz } of catalogueRows()) expectRelative(cz, 299792.458 * z, 1e-15, `J${r}`);
  });

  describe.runIf(referenceAvailable("astropy", "python3-astropy"))("against astropy", () => {
    test("the Galactic latitude of each typed position is astropy's, within 1 mas (its Angle reads the text; the galactic frame from the same Hipparcos pole and origin)", () => {
      const rows = catalogueRows();
      // astropy's Angle reads the text (RA in hours, Dec in degrees); test/reference/astropy_positions.py builds the
      // Hipparcos galactic frame (ESA 1997 Vol. 1 §1.5.3) with astropy's own rotation matrices
      const parsed = runPythonReference<{ parse: number[] }>("astropy_positions.py", { parse: rows.flatMap(({ ra, dec }) => [[ra, "hourangle"], [dec, "deg"]]) }).parse;
      const points = rows.map((_, i) => [parsed[2 * i], parsed[2 * i + 1]]);
      const [galactic] = runPythonReference<{ frames: number[][][] }>("astropy_positions.py", { frames: [{ from: "icrs", to: "hipparcos_galactic", points }] }).frames;
      let worstMas = 0;
      rows.forEach(({ b }, i) => (worstMas = Math.max(worstMas, Math.abs(b - galactic[i][1]) * 3.6e6)));
      console.info(`demo catalogue: worst |Δb| against astropy: ${worstMas.toExponential(2)} mas`);
      expect(worstMas).toBeLessThanOrEqual(1);
    });
  });

  describe.runIf(referenceAvailable("extinction", "python3-extinction"))("against python3-extinction", () => {
    test("m − A_r is m less Fitzpatrick 1999 (R_V = 3.1) at 6165 Å, within 6e-4 mag per mag of E(B−V) (the two sets of optical anchors; test/extinction.test.ts)", () => {
      const rows = catalogueRows();
      const [perEbv] = runPythonReference<{ a_per_ebv: number[][] }>("extinction_reference.py", { cases: [{ law: "fitzpatrick99", r_v: 3.1, wavelengths: [6165] }] }).a_per_ebv;
      for (const { r, m, ebv, dereddened } of rows) expect(Math.abs(dereddened - (m - ebv * perEbv[0])), `K${r}`).toBeLessThanOrEqual(6e-4 * ebv);
      expect(rows.some(({ m, dereddened }) => m - dereddened > 0.1)).toBe(true); // the correction is not nothing
    });
  });
});

/** What each sheet's printed pages must say: the model(s) in the page header, the print titles. */
const paper: Record<string, { models: string; headerRow: number; labelColumn: boolean }> = {
  // sheet                    models as the page header gives them                               header row  column A labels every row
  "Catalogue (invented)":   { models: "P18-CMB",                                                  headerRow: 2, labelColumn: true },
  "What-if":                { models: "P18-CMB, W9-ALL and P18-CMB; H0=73 (one a column)",        headerRow: 2, labelColumn: true },
  "Model in cells":         { models: "H0=70; Om=0.3; OL=0.7 (no radiation)",                     headerRow: 5, labelColumn: true },
  "Recipes (invented)":     { models: "P18-CMB",                                                  headerRow: 2, labelColumn: true },
  "Structure (invented)":   { models: "P18-CMB",                                                  headerRow: 2, labelColumn: true },
  "Populations (invented)": { models: "each χ²'s model in column A (none for the luminosity function)", headerRow: 2, labelColumn: false },
};

const columnNumberOf = (letters: string) => [...letters].reduce((n, c) => n * 26 + c.charCodeAt(0) - 64, 0);
const columnLetters = (n: number): string => (n > 26 ? columnLetters(Math.floor((n - 1) / 26)) : "") + String.fromCharCode(65 + ((n - 1) % 26));
const split = (address: string) => {
  const [, letters, row] = /^([A-Z]+)(\d+)$/.exec(address)!;
  return { col: columnNumberOf(letters), row: Number(row) };
};

/**
 * A text's width in digits of the default font (Calibri 11, which the workbook names), by character
 * class, on the wide side: narrow i, l and punctuation, wide m, w, capitals and symbols, plus about one
 * digit of cell padding (proportions from memory of the font; LibreOffice's substitute font, wider
 * still, is checked by the rendering test below).
 */
function estimatedWidth(text: string): number {
  let width = 1;
  for (const ch of text) {
    if (/[ijlI.,:;'|!]/.test(ch)) width += 0.45;
    else if (/[ftr()[\]/\- ]/.test(ch)) width += 0.6;
    else if (/[mwMWΣΦ%@]/.test(ch)) width += 1.5;
    else if (/[A-ZΔ]/.test(ch)) width += 1.2;
    else width += 1.05;
  }
  return width;
}

/** Text cells that cannot spill into the next cell (it holds something), so their column must hold them: sheet → addresses. */
function cellsThatMustFit(): { sheet: string; address: string; text: string; width: number }[] {
  const out: { sheet: string; address: string; text: string; width: number }[] = [];
  for (const [sheet, cells] of sheets) {
    const layout = layouts.get(sheet)!;
    const inMerge = (col: number, row: number) =>
      layout.merged.some((ref) => {
        const [a, b] = ref.split(":").map(split);
        return col >= a.col && col <= b.col && row >= a.row && row <= b.row;
      });
    for (const [address, c] of cells) {
      if (c.formula !== undefined || c.type !== "s" || c.wrap || !c.value) continue;
      const { col, row } = split(address);
      if (inMerge(col, row)) continue;
      // text spills to the right (to the left when right-aligned) while the next cell is empty
      const next = `${columnLetters(c.horizontal === "right" ? col - 1 : col + 1)}${row}`;
      const blocked = c.horizontal === "right" ? col > 1 && cells.has(next) : cells.has(next);
      if (!blocked) continue;
      out.push({ sheet, address, text: c.value, width: layout.widths.get(col) ?? layout.defaultWidth });
    }
  }
  return out;
}

describe("demo workbook on paper", () => {
  test("every sheet prints its header row, and column A where it labels the rows, on every page (print titles)", () => {
    for (const [sheet, want] of Object.entries(paper)) {
      const quoted = `'${sheet}'`;
      const rows = `${quoted}!$${want.headerRow}:$${want.headerRow}`;
      expect(layouts.get(sheet)!.printTitles, sheet).toBe(want.labelColumn ? `${quoted}!$A:$A,${rows}` : rows);
    }
  });

  test("every page's header names the sheet and the model its values were computed under, with zcell's version; the footer numbers the pages", () => {
    // Excel's header codes: &L left, &R right, &A the sheet's name, &P page, &N pages ("&&" is a literal &)
    for (const [sheet, want] of Object.entries(paper)) {
      expect(layouts.get(sheet)!.header, sheet).toBe(`&L&A&Rcomputed under ${want.models} by zcell ${zcellVersion}`);
      expect(layouts.get(sheet)!.footer, sheet).toBe("&RPage &P of &N");
    }
  });

  test.each([
    // sheet                   cell    header: quantity, unit, and band or convention
    ["Catalogue (invented)",   "C2",   "F_bol [erg/s/cm2]"],
    ["Catalogue (invented)",   "D2",   "m (r, AB) [mag]"],
    ["Catalogue (invented)",   "F2",   "RA (ICRS) [hh:mm:ss.s]"],
    ["Catalogue (invented)",   "G2",   "Dec (ICRS) [±dd:mm:ss]"],
    ["Catalogue (invented)",   "H2",   "E(B−V) [mag]"],
    ["Catalogue (invented)",   "I2",   "b (Galactic) [deg]"],
    ["Catalogue (invented)",   "J2",   "cz [km/s], optical"],
    ["Catalogue (invented)",   "K2",   "m − A_r (r, AB) [mag]"],
    ["Catalogue (invented)",   "N2",   "L_bol [Lsun]"],
    ["Catalogue (invented)",   "P2",   "K [mag], α = −0.5"],
    ["Catalogue (invented)",   "Q2",   "M (r, AB) [mag]"],
    ["Recipes (invented)",     "B2",   "z (heliocentric)"],
    ["Recipes (invented)",     "H2",   "α (S_ν ∝ ν^α)"],
    ["Recipes (invented)",     "J2",   "F_bol err [erg/s/cm2]"],
    ["Recipes (invented)",     "K2",   "m (r, AB) [mag]"],
    ["Recipes (invented)",     "L2",   "m err [mag]"],
    ["Recipes (invented)",     "N2",   "angle err [arcsec]"],
    ["Recipes (invented)",     "R2",   "L_bol [erg/s]"],
    ["Recipes (invented)",     "T2",   "M_bol [mag]"],
    ["Recipes (invented)",     "W2",   "M (r, AB) [mag]"],
    ["Recipes (invented)",     "AA2",  "z_max (flux limit)"],
    ["Recipes (invented)",     "AC2",  "z_max (m limit)"],
    ["Recipes (invented)",     "AA12", "Σ 1/V_max [Mpc-3]"],
    ["Populations (invented)", "C2",   "log10 L_bol [erg/s]"],
    ["Populations (invented)", "L2",   "N (sources)"],
  ])("%s!%s reads %s", (sheet, address, header) => {
    expect(sheets.get(sheet)!.get(address)!.value).toBe(header);
  });

  test("every header of a number column has its unit in brackets, or is a dimensionless quantity named as such", () => {
    const dimensionless = /^(z\b|z_|α |N \(sources\)$)/;
    for (const sheet of ["Catalogue (invented)", "Recipes (invented)", "Populations (invented)"]) {
      const cells = sheets.get(sheet)!;
      for (const [address, c] of cells) {
        const { col, row } = split(address);
        if (row !== paper[sheet].headerRow || col === 1 || c.type !== "s") continue;
        const below = cells.get(`${columnLetters(col)}${row + 1}`);
        if (below?.type === "s") continue; // a column of text (labels), not of numbers
        expect(c.value, `${sheet}!${address}`).toMatch(dimensionless.test(c.value!) ? /./ : /\[[^\]]+\]/);
      }
    }
  });

  test("the width estimate finds the header that was cut before (Σ 1/V_max in an 11-digit column), and passes short ones", () => {
    expect(estimatedWidth("Σ 1/V_max [Mpc-3]")).toBeGreaterThan(11);
    expect(estimatedWidth("z_max")).toBeLessThan(11);
  });

  test("no text is cut at its column width: every text cell whose next cell is filled fits its column (by the width estimate)", () => {
    const checked = cellsThatMustFit();
    expect(checked.length).toBeGreaterThan(60); // every header row, and labels beside values
    const cut = checked.filter((c) => estimatedWidth(c.text) > c.width).map((c) => `${c.sheet}!${c.address} "${c.text}": ~${estimatedWidth(c.text).toFixed(1)} > ${c.width}`);
    expect(cut).toEqual([]);
  });

  test("each sheet says beside its results which model(s) they assume, in words", () => {
    const at = (sheet: string, address: string) => sheets.get(sheet)!.get(address)?.value ?? "";
    // the catalogue prints two pages wide (A–I, then J–Q with A repeated): the model in words under each
    expect(at("Catalogue (invented)", "A16")).toBe("Every value above assumes:");
    expect(sheets.get("Catalogue (invented)")!.get("B16")!.formula).toBe("_xldudf_ZC_DESCRIBE()");
    expect(sheets.get("Catalogue (invented)")!.get("J16")!.formula).toBe("_xldudf_ZC_DESCRIBE()");
    expect(layouts.get("Catalogue (invented)")!.merged).toEqual(expect.arrayContaining(["B16:I16", "J16:Q16"]));
    // What-if: each model of row 2 in words with its source, W9-ALL too (Hinshaw et al. 2013, the preset's source)
    expect(at("What-if", "F2")).toBe("The models of row 2, in words:");
    expect(at("What-if", "F3")).toMatch(/^P18-CMB: H0 67\.36, Ωm 0\.3153 .*Planck 2018 VI/);
    expect(at("What-if", "F4")).toMatch(/^W9-ALL: H0 69\.32, Ωm 0\.2865, massless ν, flat — WMAP nine-year, Hinshaw et al\. 2013/);
    expect(at("What-if", "F5")).toBe("P18-CMB with H0 = 73 km/s/Mpc, all else as P18-CMB");
    // Model in cells: radiation is off, said in words and by DESCRIBE of the block beside the result
    expect(at("Model in cells", "E2")).toMatch(/no Tcmb, so radiation is off/);
    expect(sheets.get("Model in cells")!.get("D6")!.formula).toBe("_xldudf_ZC_DESCRIBE($A$1:$B$3)");
    expect(sheets.get("Model in cells")!.get("D6")!.value).toMatch(/no radiation \(Tcmb = 0: no photons, no neutrinos\)/);
    // Recipes: the line sits in the first output column (O), under the outputs, not under the inputs
    expect(at("Recipes (invented)", "O12")).toMatch(/^Columns O–AC: cached values computed under P18-CMB: H0 67\.36/);
    expect([...sheets.get("Recipes (invented)")!.keys()].filter((a) => /^[A-N]1[1-9]$/.test(a))).toEqual([]);
    expect(at("Structure (invented)", "A13")).toMatch(/^Column B: cached values computed under P18-CMB: H0 67\.36/);
    for (const [row, model] of [[15, "P18-CMB"], [16, "W9-ALL"], [17, "EDS"]] as const) {
      expect(at("Populations (invented)", `C${row}`)).toMatch(new RegExp(`^${model}: H0 `));
    }
    // the luminosity function prints on its own page (I–N): a title that says it needs no model, and a label for each row
    expect(at("Populations (invented)", "I1")).toMatch(/^Luminosity function of the INVENTED sample .*no model needed$/);
    expect([3, 4, 5, 6, 7].map((r) => at("Populations (invented)", `I${r}`))).toEqual(["bin 1", "bin 2", "bin 3", "bin 4", "bin 5"]);
    // a sheet printed several pages wide with column A repeated says on every page, in column A, that its data are invented
    for (const sheet of ["Catalogue (invented)", "Recipes (invented)"]) expect(at(sheet, "A1"), sheet).toBe("INVENTED (made up)");
  });

  test("the surface-brightness example names the band and system of M☉, with its source", () => {
    // M☉,V = 4.81 in the Vega system: Willmer 2018 (ApJS 236, 47), abstract ("MV = 4.81 … in the vegamag system")
    const cells = sheets.get("Structure (invented)")!;
    const row = [...cells].find(([, c]) => c.formula?.startsWith("_xldudf_ZC_SURFACE_LUM("))![0].replace(/^B/, "");
    expect(cells.get(`B${row}`)!.formula).toBe("_xldudf_ZC_SURFACE_LUM(24.1,0.6,4.81,0.4)");
    expect(cells.get(`A${row}`)!.value).toMatch(/μ_V = 24\.1 mag\/arcsec² .*\[Lsun\/pc2 in V\]/);
    expect(cells.get(`C${row}`)!.value).toMatch(/^V band, Vega system: M☉,V = 4\.81 \(Willmer 2018, ApJS 236, 47\)/);
  });
});

/** Where LibreOffice renders the workbook (not in CI: .ci/run does not install it). */
const missingRenderTools = renderToolsMissing() as string[][];
// under CI a missing renderer fails the run (.ci/run installs both), elsewhere the check is skipped with a hint
const renderable = toolAvailable(
  missingRenderTools.length === 0,
  `${missingRenderTools.map(([tool, pkg]) => `Debian ${pkg} (${tool})`).join(" and ")} for the demo's rendering check: apt-get install -y ${missingRenderTools.map(([, pkg]) => pkg).join(" ")}`,
);

describe.runIf(renderable)("demo workbook rendered by LibreOffice, as npm run render:demo does", () => {
  /** Text without spaces or line breaks, so that a header reads the same wherever the PDF breaks its words. */
  const squeezed = (text: string) => text.replace(/\s+/g, "");
  let pages: { sheet: string | undefined; text: string }[] = [];

  beforeAll(() => {
    const out = mkdtempSync(join(tmpdir(), "zcell-render-"));
    const names = [...sheets.keys()];
    pages = (pageTexts(renderPdf(`${root}demo/zcell-demo.xlsx`, out)) as string[]).map((text) => ({ sheet: sheetOfPage(text, names) as string | undefined, text }));
  });

  test("every page starts with its header: the sheet's name and the model its values were computed under; every sheet has pages", () => {
    expect(pages.length).toBeGreaterThanOrEqual(Object.keys(paper).length);
    pages.forEach(({ sheet, text }, i) => {
      expect(sheet, `page ${i + 1}: ${text.slice(0, 80)}`).toBeDefined();
      expect(text.split("\n")[0], `page ${i + 1}`).toBe(`${sheet} computed under ${paper[sheet!].models} by zcell ${zcellVersion}`);
      expect(text, `page ${i + 1}`).toContain(`Page ${i + 1} of ${pages.length}`);
    });
    for (const sheet of Object.keys(paper)) expect(pages.some((p) => p.sheet === sheet), sheet).toBe(true);
  });

  test("a sheet printed on several pages repeats its header row, and its row labels where column A labels them, on every page", () => {
    const spanning = Object.keys(paper).filter((sheet) => pages.filter((p) => p.sheet === sheet).length > 1);
    expect(spanning).toContain("Recipes (invented)");
    for (const sheet of spanning) {
      const cells = sheets.get(sheet)!;
      const { headerRow, labelColumn } = paper[sheet];
      const headers = [...cells].filter(([a, c]) => split(a).row === headerRow && c.type === "s").map(([, c]) => squeezed(c.value!));
      const labels = [...cells].filter(([a, c]) => split(a).col === 1 && split(a).row > headerRow && /^[A-Z]{3}-\d\d$/.test(c.value ?? "")).map(([, c]) => c.value!);
      for (const [i, page] of pages.filter((p) => p.sheet === sheet).entries()) {
        const text = squeezed(page.text);
        expect(headers.filter((h) => text.includes(h)).length, `${sheet} page ${i + 1}: a header of row ${headerRow}`).toBeGreaterThan(1);
        if (labelColumn) for (const label of [cells.get(`A${headerRow}`)!.value!, ...labels]) expect(text, `${sheet} page ${i + 1}`).toContain(label);
      }
    }
  });

  test("every header, and every text whose next cell is filled, shows whole (LibreOffice leaves out what a column cuts)", () => {
    const shown = new Map<string, string>();
    for (const p of pages) shown.set(p.sheet!, (shown.get(p.sheet!) ?? "") + squeezed(p.text));
    const headers = [...sheets].flatMap(([sheet, cells]) =>
      [...cells].filter(([a, c]) => split(a).row === paper[sheet].headerRow && c.type === "s" && c.value).map(([address, c]) => ({ sheet, address, text: c.value! })),
    );
    const cut = [...headers, ...cellsThatMustFit()].filter((c) => !shown.get(c.sheet)!.includes(squeezed(c.text))).map((c) => `${c.sheet}!${c.address} "${c.text}"`);
    expect(cut).toEqual([]);
  });

  test("the check sees a cut header: a column too narrow for its header, beside a filled cell, leaves part of it out", async () => {
    const { default: ExcelJS } = await import("exceljs");
    const workbook = new ExcelJS.Workbook();
    const ws = workbook.addWorksheet("Cut");
    ws.addRow(["source", "a header far wider than its column [erg/s/cm2]", "next"]);
    ws.getColumn("B").width = 11;
    const out = mkdtempSync(join(tmpdir(), "zcell-cut-"));
    await workbook.xlsx.writeFile(join(out, "cut.xlsx"));
    const [text] = pageTexts(renderPdf(join(out, "cut.xlsx"), out)) as string[];
    expect(squeezed(text)).toContain("source");
    expect(squeezed(text)).not.toContain(squeezed("a header far wider than its column [erg/s/cm2]"));
  });
});
