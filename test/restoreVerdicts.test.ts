/**
 * What the pane says when it will not write a stranger's formula back (Thaw, the repair banner), and
 * what it writes when it will: the exact reasons, the 40-character quotes of the stranger's text, the
 * length limit, single cells against ranges, and the batches that give the page a turn. The reasons
 * are the texts the pane shows (taskpane/restorableFormula.ts), pinned as the interface; Excel's formula
 * limit of 8,192 characters is Microsoft's "Excel specifications and limits" (from memory, as the
 * source says).
 */
import { afterEach, describe, expect, test, vi } from "vitest";
import { restorableFormula, restorableFormulas } from "../taskpane/restorableFormula.js";

const one = { singleCell: true };
const any = { singleCell: false };

describe("the reason a formula is not written back", () => {
  const name40 = `N${"x".repeat(39)}`; // 40 characters: quoted whole
  const name41 = `N${"x".repeat(40)}`; // 41 characters: quoted up to the 40th, then "…"
  // formula                                  | the reason the pane shows
  const cases: [string, string][] = [
    [`=ZC.DIST_LUM(${name40})`,                 `it uses the name ${name40}, and a name can stand for any formula`],
    [`=ZC.DIST_LUM(${name41})`,                 `it uses the name ${name40}…, and a name can stand for any formula`],
    ["=ZC.DIST_LUM(Sheet1!Name)",               "it has a reference zcell cannot check (Sheet1!Name)"],
    ["=ZC.DIST_LUM(Table1[z])",                 "it refers to another workbook or a table (Table1[z])"],
    ["=ZC.DIST_LUM('a/b'!A1)",                  "it refers to another workbook or a file ('a/b'!A1)"],
    ["=ZC.DIST_LUM([Book1]Sheet1!A1)",          "it refers to another workbook"],
    ["=ZC.DIST_LUM(A1])",                       "it refers to another workbook"],
    ["=ZC.DIST_LUM(A1#)",                       "it holds a spill reference (#), whose size zcell cannot check"],
    ["=ZC.DIST_LUM(1)|2",                       "it holds a DDE link (|), which can start another program"],
    ['=ZC.DIST_LUM("|")|2',                     "it holds a DDE link (|), which can start another program"],
    ["=ZC.DIST_LUM(1)!",                        'it holds "!", which zcell does not restore'],
    ["=ZC.DIST_LUM({1,A1})",                    "it holds an array constant zcell cannot check ({1,A1})"],
    ["=ZC.AGE(1",                               "its parentheses do not match"],
    ["=ZC.AGE(1))",                             "its parentheses do not match"],
    ["=SUM(1)",                                 "it calls SUM, which is not a zcell function"],
    ["=ZC.NOT_OURS(1)",                         "ZC.NOT_OURS is not a zcell function"],
    ["=ZC.DIſT_LUM(1)",                         "it calls ZC.DIſT_LUM, whose name is not plain ASCII, so it is not a zcell function"],
    ["=1+2",                                    "it calls no zcell function"],
    ['=ZC.AGE("1)',                             "zcell cannot read it (an unterminated string, sheet name or array)"],
    ["=ZC.DIST_LUM(XFE1)",                      "it uses XFE1, which lies outside Excel's sheet (XFD1048576 is the last cell), so it is a name, and a name can stand for any formula"],
  ];
  test.each(cases)("%s: %s", (formula, reason) => {
    expect(restorableFormula(formula, one)).toEqual({ ok: false, reason });
    expect(restorableFormula(formula, any)).toEqual({ ok: false, reason });
  });

  test.each([42, null, undefined, { formula: "=ZC.AGE(1)" }, "ZC.AGE(1)"])("%j is not a formula", (formula) => {
    expect(restorableFormula(formula, any)).toEqual({ ok: false, reason: "it is not a formula" });
  });

  test("a formula of exactly 8,192 characters is written back; one character more is refused", () => {
    const longest = `=ZC.DIST_LUM(${"1+".repeat(4088)}12)`;
    expect(longest.length).toBe(8192);
    expect(restorableFormula(longest, any)).toEqual({ ok: true, formula: longest });
    expect(restorableFormula(`${longest} `, any)).toEqual({ ok: false, reason: "it is longer than Excel allows (8192 characters)" });
  });
});

describe("which references could spill over other cells", () => {
  // reference   | one cell?
  const cases: [string, boolean][] = [
    ["A1:A1",       true],
    ["A1:a1",       true],
    ["$B$7:B7",     true],
    ["A1:B1",       false],
    ["A1:A2",       false],
    ["A:A",         false],
    ["3:3",         false],
  ];
  test.each(cases)("%s written back into one cell: %s", (reference, single) => {
    const formula = `=ZC.DIST_LUM(${reference})`;
    expect(restorableFormula(formula, one).ok).toBe(single);
    expect(restorableFormula(formula, any)).toEqual({ ok: true, formula });
  });

  test("the reason names the reference that could spill", () => {
    expect(restorableFormula("=ZC.DIST_LUM(A1:B1)", one)).toEqual({
      ok: false,
      reason: "it could spill over other cells (A1:B1); enter it yourself where there is room",
    });
  });
});

describe("judging many formulas at once", () => {
  afterEach(() => {
    vi.restoreAllMocks();
  });

  test("gives each formula its own verdict, in order", async () => {
    const formulas = ["=ZC.AGE(1)", "=SUM(1)", 7, "=zc.age(A1:A3)"];
    expect(await restorableFormulas(formulas, one)).toEqual([
      { ok: true, formula: "=ZC.AGE(1)" },
      { ok: false, reason: "it calls SUM, which is not a zcell function" },
      { ok: false, reason: "it is not a formula" },
      { ok: false, reason: "it could spill over other cells (A1:A3); enter it yourself where there is room" },
    ]);
    expect(await restorableFormulas([], one)).toEqual([]);
  });

  // clock step between readings, ms | formulas | turns given to the page (one whenever more than 10 ms have passed)
  const turns: [number, number, number][] = [
    [1,  8, 0],   // 8 ms of work in all: no turn
    [5,  4, 1],   // readings 0 | 5, 10, 15 → turn at 15 (15 > 10), then 20 | 25
    [6,  4, 2],   // readings 0 | 6, 12 → turn, 18 | 24, 30 → turn, 36
    [20, 3, 3],   // every formula after more than 10 ms
  ];
  test.each(turns)("with %i ms between clock readings, %i formulas give %i turns", async (step, count, expected) => {
    let now = -step;
    vi.spyOn(performance, "now").mockImplementation(() => (now += step));
    const timeout = vi.spyOn(globalThis, "setTimeout");
    const verdicts = await restorableFormulas(Array(count).fill("=ZC.AGE(1)"), one);
    expect(verdicts).toHaveLength(count);
    expect(timeout.mock.calls.filter((call) => call[1] === 0)).toHaveLength(expected);
  });
});
