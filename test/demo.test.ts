/**
 * npm run demo writes a workbook that Excel can bind: read as raw XML (the form Excel reads), every
 * ZC formula is in the stored spelling `_xldudf_ZC_…` (how Excel saves an add-in function; see
 * ../shared notes and OfficeDev/office-js issue 3558), every formula cell has a cached value, and the
 * README's tour describes the file as it is.
 */
import { execFileSync } from "node:child_process";
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import JSZip from "jszip";
import { beforeAll, describe, expect, test } from "vitest";
import { parseStrictXml, type ManifestElement as XmlElement } from "../scripts/checkManifest.js";
import { publishedModels } from "./fixtures.js";
import { SlowCosmology } from "./reference/slowCosmology.js";
import { storedFormula } from "../functions/storedFormula.js";
import { expectRelative } from "./helpers.js";

const root = fileURLToPath(new URL("..", import.meta.url));

interface SheetCell { formula?: string; formulaType?: string; formulaRef?: string; value?: string; type?: string; numFmtId?: number }
/** Sheet name → cell address → formula, cached value text and cell type, from the raw sheet XML. */
const sheets = new Map<string, Map<string, SheetCell>>();

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
  const formatOfStyle = styles.children.find((c) => c.name === "cellXfs")!.children.map((xf) => Number(xf.attributes.numFmtId ?? 0));
  for (const s of book.children.find((c) => c.name === "sheets")!.children) {
    const target = rels.children.find((r) => r.attributes.Id === s.attributes["r:id"])!.attributes.Target;
    const xml = parseStrictXml(await zip.file(`xl/${target.replace(/^\/xl\//, "")}`)!.async("string"));
    const cells = new Map<string, SheetCell>();
    for (const row of xml.children.find((c) => c.name === "sheetData")!.children) {
      for (const c of row.children) {
        const f = c.children.find((x) => x.name === "f");
        const v = c.children.find((x) => x.name === "v");
        const value = c.attributes.t === "s" ? strings[Number(textOf(v))] : c.attributes.t === "inlineStr" ? textOf(c) : textOf(v);
        cells.set(c.attributes.r, { formula: textOf(f), formulaType: f?.attributes.t, formulaRef: f?.attributes.ref, value, type: c.attributes.t, numFmtId: formatOfStyle[Number(c.attributes.s ?? 0)] });
      }
    }
    sheets.set(s.attributes.name, cells);
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
    expect(all.length).toBe(12 * 6 + 1 + 8 * 3 + 1 + 8 * 15 + 1 + 9 + 5 * 5 + 3);
    for (const c of all) {
      expect(c.formula, `${c.sheet}!${c.address}`).not.toMatch(/(^|[^_\w])ZC\./);
      // the one formula without ZC is the sum of the 1/V_max weights
      if (c.sheet === "Recipes (invented)" && c.address === "AB12") expect(c.formula).toBe("SUM(AB3:AB10)");
      else expect(c.formula, `${c.sheet}!${c.address}`).toMatch(/^(1\/|INDEX\()?_xldudf_ZC_[A-Z0-9_]+\(/);
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
      if (c.type === "str") expect(c.formula).toBe("_xldudf_ZC_DESCRIBE()");
      else expect(Number.isFinite(Number(c.value)), `${c.sheet}!${c.address} = ${c.value}`).toBe(true);
    }
  });

  test("the README's catalogue table names the file's headers (row 2) and formulas (row 3)", () => {
    const readme = readFileSync(`${root}README.md`, "utf8");
    const table = readme.slice(readme.indexOf("<!-- demo-tour:start"), readme.indexOf("<!-- demo-tour:end"));
    const rows = [...table.matchAll(/^\| ([A-Z]) \| ([^|]+) \| `=([^`]+)` \|/gm)];
    expect(rows.length).toBe(6);
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
    const readme = readFileSync(`${root}README.md`, "utf8");
    const whatIf = sheets.get("What-if")!;
    expect(["B1", "C1", "D1"].map((a) => whatIf.get(a)!.value)).toEqual(["P18-CMB", "W9-ALL", "P18-CMB; H0=73"]);
    expect(readme).toContain("the models `P18-CMB`, `W9-ALL` and `P18-CMB; H0=73` in B1:D1");
    const [, typed] = /in B2:D9 one formula per cell, `=([^`]+)`/.exec(readme)!;
    expect(whatIf.get("B2")!.formula).toBe(storedFormula(typed));
    for (const column of ["B", "C", "D"]) for (let r = 2; r <= 9; r++) {
      expect(whatIf.get(`${column}${r}`)!.formula).toBe(storedFormula(`ZC.DIST_LUM($A${r},${column}$1)`));
    }
    expect(whatIf.get("A10")).toBeUndefined();
    expect(readme).toContain("spills the same 8×3 table");
    const [, inCells] = /passed as\n`model` is one model: `=([^`]+)` in B6/.exec(readme)!;
    expect(sheets.get("Model in cells")!.get("B6")!.formula).toBe(storedFormula(inCells));
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
      expectRelative(Number(cells.get(`F${r}`)!.value), p18.luminosityDistanceMpc(Number(cells.get(`B${r}`)!.value)), 1e-9, `F${r}`);
    }
  });
});
