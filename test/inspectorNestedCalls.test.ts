/**
 * The cell inspector on formulas with several calls: which calls it explains, and which cell of a
 * call written inside another the selected cell reads (its caller's broadcast, the first cell of a
 * unit, none known for a function of whole columns or a call whose ranges do not fit). The texts are
 * the pane's own (taskpane/explainCall.ts), pinned here as the interface.
 */
import { describe, expect, test } from "vitest";
import { explainFormula } from "../taskpane/explainCall.js";
import { blanks, p18Cmb, sheet1 } from "./inspectorSheet.js";

const cells = sheet1({
  "$A$1:$A$2": [[1], [2]],
  "$B$1:$B$3": [["EDS"], ["EDS"], ["EDS"]],
  "$C$1:$C$2": [[150], [160]],
  "$E$1:$E$2": [[0.1], [0.2]],
});
const unknownCell = "which one this cell shows is not known here";

describe("which calls of a formula the inspector explains", () => {
  test("only the ZC functions zcell defines, outermost first", async () => {
    const calls = await explainFormula("=ZC.NOPE(1)+SUM(ZC.AGE(1),ZC.HUBBLE(0))+ABCAGE(2)", blanks, p18Cmb);
    expect(calls.map((c) => c.name)).toEqual(["ZC.AGE", "ZC.HUBBLE"]);
    expect(calls[1].result).toBe("67.36 km/s/Mpc"); // H(0) = H0 of P18-CMB (Planck 2018 VI Table 2)
  });

  test("a call inside an expression is computed on its own; its caller's argument is left to Excel", async () => {
    const [outer, inner] = await explainFormula("=ZC.DIST_LUM(ZC.CMB_TEMP(0)+1)", blanks, p18Cmb, 12345);
    expect(outer.args[0]).toMatchObject({ text: "ZC.CMB_TEMP(0)+1", value: "computed by Excel" });
    expect(outer.result).toBe("12345 (as Excel shows it; an argument is computed by Excel)");
    expect(inner.result).toBe("2.7255 K");
  });
});

describe("the cell of a call inside another that the selected cell reads", () => {
  test("a chain of calls, each at the cell its caller reads for the selected one", async () => {
    const calls = await explainFormula('=ZC.DIST_LUM(ZC.REDSHIFT(ZC.AGE($A$1:$A$2),"AGE"))', cells, p18Cmb, undefined, { row: 1, col: 0 });
    expect(calls.map((c) => c.result.replace(/^[\d.]+ /, ""))).toEqual([
      "Mpc (row 2 of 2×1 values: this cell)",
      "(row 2 of 2×1 values: this cell)",
      "Gyr (row 2 of 2×1 values: this cell)",
    ]);
    expect(calls[0].args[0].value).toMatch(/^1\.99999999999999\d* \(row 2 of the result of ZC\.REDSHIFT for this cell\)$/);
    expect(calls[2].args[0].value).toBe("2 (Sheet1!A2 for this cell)");
    // REDSHIFT inverts AGE: z = 2 comes back (identity, to the inverse's |Δz| ≤ 1e-9 (1+z))
    expect(Math.abs(Number(calls[1].exact) - 2)).toBeLessThan(3e-9);
  });

  test("ranges that do not fit together: the caller's one cell is an error of the whole call, no cell of the inner calls is named", async () => {
    const calls = await explainFormula('=ZC.DIST_LUM(ZC.REDSHIFT(ZC.AGE($A$1:$A$2),"AGE"),$B$1:$B$3)', cells, p18Cmb, undefined, { row: 1, col: 0 });
    expect(calls[0].result).toBe(
      "#VALUE! — ZC.DIST_LUM: ranges do not fit together: z is 2×1 and model is 3×1 (use equal sizes, a single cell, or a row against a column)",
    );
    expect(calls[0].args[0].value).toMatch(/^range 2×1, first 0\.9999/);
    expect(calls[1].result).toMatch(new RegExp(`^1 \\(the first of 2×1 values; ${unknownCell}\\)$`));
    expect(calls[2].result).toMatch(new RegExp(`^5\\.8423 Gyr \\(the first of 2×1 values; ${unknownCell}\\)$`));
    expect(calls[2].args[0].value).toBe("range 2×1, first 1");
  });

  test("a unit given by a call is read at its first cell, whatever the cell explained", async () => {
    const [convert, text] = await explainFormula('=ZC.CONVERT($A$1:$A$2,"Mpc",ZC.COORD_TEXT($C$1:$C$2,"ra"))', cells, p18Cmb, undefined, { row: 1, col: 0 });
    expect(convert.fault?.argument).toBe("to");
    expect(convert.args[2].value).toBe('range 2×1, first "10:00:00.00"'); // a unit is one cell: the range is not read cell by cell
    // 150° = 10 h of right ascension (15° an hour, common practice)
    expect(text.result).toBe('"10:00:00.00" (row 1 of 2×1 values: this cell)');
    expect(text.args[0].value).toBe("150 (Sheet1!C1 for this cell)");
  });

  test("a column given to a function of whole columns: every cell of it is read, none is the selected one's", async () => {
    const [chi2, modulus] = await explainFormula("=ZC.CHI2_MODULUS($A$1:$A$2,ZC.MODULUS($E$1:$E$2),$A$1:$A$2)", cells, p18Cmb, undefined, { row: 0, col: 0 });
    expect(chi2.isError).toBe(false);
    expect(chi2.args[1].value).toMatch(/^range 2×1, first 38\.39/);
    expect(modulus.result).toMatch(new RegExp(`^38\\.3962 mag \\(the first of 2×1 values; ${unknownCell}\\)$`));
    expect(modulus.args[0].value).toBe("range 2×1, first 0.1");
  });

  test("a formula that is one call, spaces around it, is explained at the selected cell", async () => {
    const [age] = await explainFormula("=  ZC.AGE($A$1:$A$2)  ", cells, p18Cmb, undefined, { row: 1, col: 0 });
    expect(age.result).toMatch(/^3\.27014 Gyr \(row 2 of 2×1 values: this cell\)$/);
  });

  test("the selected cell's place is not known: a call's first cell is shown, and said so", async () => {
    const [age] = await explainFormula("=ZC.AGE($A$1:$A$2)", cells, p18Cmb);
    expect(age.result).toMatch(new RegExp(`^5\\.8423 Gyr \\(the first of 2×1 values; ${unknownCell}\\)$`));
    expect(age.args[0].value).toBe("range 2×1, first 1");
  });

  test("a unit argument given by a call: read at its first cell too", async () => {
    const [, text] = await explainFormula('=ZC.DIST_LUM($A$1:$A$2,,ZC.COORD_TEXT($C$1:$C$2,"ra"))', cells, p18Cmb, undefined, { row: 1, col: 0 });
    expect(text.result).toBe('"10:00:00.00" (row 1 of 2×1 values: this cell)');
  });

  test("a call written after the last argument is read by no argument: its cell is not known", async () => {
    const [, extra] = await explainFormula('=ZC.AGE(1,,"Gyr",ZC.AGE($A$1:$A$2))', cells, p18Cmb, undefined, { row: 0, col: 0 });
    expect(extra.result).toMatch(new RegExp(`^5\\.8423 Gyr \\(the first of 2×1 values; ${unknownCell}\\)$`));
  });

  test("a call whose argument Excel computes is not computed, nor is its caller", async () => {
    const [outer, inner] = await explainFormula("=ZC.DIST_LUM(ZC.AGE(SUM(B1)))", blanks, p18Cmb, 7000);
    expect(inner.result).toBe("7000 (as Excel shows it; an argument is computed by Excel)");
    expect(outer.args[0].value).toBe("computed by Excel");
  });

  test("a call that is not computed still shows the arguments of the selected cell", async () => {
    const [call] = await explainFormula("=ZC.DIST_LUM($A$1:$A$2,SUM(B1))", cells, p18Cmb, undefined, { row: 1, col: 0 });
    expect(call.args[0].value).toBe("2 (Sheet1!A2 for this cell)");
    expect(call.modelNote).toBe("computed by Excel: not known here");
  });
});

describe("calls inside others share one budget of cells computed whole", () => {
  const column = (n: number) => Array.from({ length: n }, (_, i) => [1 + i * 1e-3]);
  const long = sheet1({ "$A$1:$A$600": column(600), "$A$1:$A$1000": column(1_000) });

  test("exactly the limit, 1,000 cells, is computed whole", async () => {
    const [redshift] = await explainFormula('=ZC.REDSHIFT(ZC.AGE($A$1:$A$1000),"AGE")', long, p18Cmb, undefined, { row: 7, col: 0 });
    expect(redshift.args[0].value).toMatch(/^5\.814\d+ \(row 8 of the result of ZC\.AGE for this cell\)$/);
  });

  const row = (n: number) => [Array.from({ length: n }, (_, i) => 1 + i * 1e-3)];
  const rows = sheet1({ "$A$1:$WB$1": row(600), "$A$1:$ATF$1": row(1_200) });

  test("a row of 1,200 cells passes the limit", async () => {
    const [redshift] = await explainFormula('=ZC.REDSHIFT(ZC.AGE($A$1:$ATF$1),"AGE")', rows, p18Cmb, undefined, { row: 0, col: 7 });
    expect(redshift.args[0].value).toBe(
      "the result of ZC.AGE, 1×1,200 cells, not computed here (the inspector computes at most 1,000 cells of calls inside another)",
    );
  });

  test("two rows of 600 cells: the second would pass the limit", async () => {
    const [outer] = await explainFormula('=ZC.DIST_LUM(ZC.REDSHIFT(ZC.AGE($A$1:$WB$1),"AGE"))', rows, p18Cmb, undefined, { row: 0, col: 7 });
    expect(outer.args[0].value).toMatch(/^the result of ZC\.REDSHIFT, 1×600 cells, not computed here/);
  });

  test("a call inside a function Excel computes takes none of the budget", async () => {
    const formula = '=SUM(ZC.AGE($A$1:$A$600))+ZC.REDSHIFT(ZC.AGE($A$1:$A$600),"AGE")';
    const [, redshift] = await explainFormula(formula, long, p18Cmb, undefined, { row: 7, col: 0 });
    expect(redshift.args[0].value).toMatch(/^range 600×1, first 5\.8422/); // computed whole: its first cell is AGE(1)
  });

  test("two calls of 600 cells: the first is computed whole, the second would pass the limit and is not", async () => {
    const [outer, middle, inner] = await explainFormula('=ZC.DIST_LUM(ZC.REDSHIFT(ZC.AGE($A$1:$A$600),"AGE"))', long, p18Cmb, undefined, { row: 7, col: 0 });
    expect(inner.result).toMatch(/^5\.81404 Gyr \(row 8 of 600×1 values: this cell\)$/);
    expect(middle.args[0].value).toMatch(/\(row 8 of the result of ZC\.AGE for this cell\)$/);
    expect(outer.args[0].value).toBe(
      "the result of ZC.REDSHIFT, 600×1 cells, not computed here (the inspector computes at most 1,000 cells of calls inside another)",
    );
    expect(outer.result).toBe("omitted (as Excel shows it; an argument is not read)");
  });
});
