/**
 * The cell inspector on arguments given as ranges: the cell of each range that computed the selected
 * cell (its model, its text), and the Result row's unit when a text argument chooses it, read from
 * that cell — or not claimed when the cell is not known. The texts are the pane's own
 * (taskpane/explainCall.ts), pinned here as the interface; the invented sheet is Sheet1.
 */
import { describe, expect, test } from "vitest";
import { explainFormula } from "../taskpane/explainCall.js";
import { p18Cmb, sheet1 } from "./inspectorSheet.js";

const unknownCell = "which one this cell shows is not known here";
const cells = sheet1({
  "$A$1:$A$2": [[1], [2]],
  "$M$1:$N$2": [["P18-CMB", "W9-ALL"], ["P18-BAO", "P18-CMB"]],
  "$M$1:$M$2": [["P18-CMB"], ["W9-ALL"]],
  "$P$1:$Q$1": [["H0", "Om"]],
  "$P$1:$Q$2": [["H0", "Om"], ["hubble_time", "z_eq"]],
  "$R$1:$S$2": [["Om", "H0"], ["Ob", "h"]],
  "$Q$1:$Q$2": [["distance"], ["luminosity"]],
});

describe("a square range of models", () => {
  test("2×2 models: the model of the selected cell is the one at its place, and the range's models are listed", async () => {
    const [age] = await explainFormula("=ZC.AGE($A$1:$A$2,$M$1:$N$2)", cells, p18Cmb, undefined, { row: 1, col: 1 });
    expect(age.model).toMatchObject({ spec: "P18-CMB", source: "given in the formula", where: "Sheet1!N2 for this cell" });
    expect(age.models).toEqual(["P18-CMB", "W9-ALL", "P18-BAO"]);
    expect(age.args[1].value).toBe('"P18-CMB" (Sheet1!N2 for this cell)');
  });
});

describe("a text argument whose range reads like a key/value block", () => {
  test("PARAM's names in two columns of parameter keys are still read cell by cell (only a model argument is a block)", async () => {
    const [param] = await explainFormula("=ZC.PARAM($R$1:$S$2)", cells, p18Cmb, undefined, { row: 1, col: 1 });
    expect(param.args[0].value).toBe('"h" (Sheet1!S2 for this cell)');
    // h = H0/100 of P18-CMB (Planck 2018 VI Table 2: H0 = 67.36 km/s/Mpc)
    expect(param.result).toBe("0.6736 (row 2, column 2 of 2×2 values: this cell)");
  });
});

describe("the Result row's unit, chosen by a text argument", () => {
  // H0 of P18-CMB: Planck 2018 VI Table 2
  const cases: [string, string, { row: number; col: number } | undefined, string][] = [
    // what                                             formula                                  selected cell         Result row
    ["a row of names, at its first cell", "=ZC.PARAM($P$1:$Q$1)", { row: 0, col: 0 }, "67.36 km/s/Mpc (column 1 of 1×2 values: this cell)"],
    ["one name against a column of models", '=ZC.PARAM("H0",$M$1:$M$2)', { row: 0, col: 0 }, "67.36 km/s/Mpc (row 1 of 2×1 values: this cell)"],
    ["a 2×2 range of names, the cell not known: no unit claimed", "=ZC.PARAM($P$1:$Q$2)", undefined, `67.36 (the first of 2×2 values; ${unknownCell})`],
    ["a unit typed with spaces around it: shown without them", '=ZC.CONVERT(1,"Gpc"," Mpc ")', undefined, "1000 Mpc"], // 1 Gpc = 1000 Mpc (SI prefixes)
  ];
  test.each(cases)("%s: %s", async (_what, formula, at, result) => {
    const [call] = await explainFormula(formula, cells, p18Cmb, undefined, at);
    expect(call.result).toBe(result);
  });

  test("RESCALE's quantity from a column, the cell not known: the value's own unit, since no quantity is known", async () => {
    const [rescale] = await explainFormula('=ZC.RESCALE(100,0.5,$Q$1:$Q$2,"W9-ALL","EDS")', cells, p18Cmb);
    expect(rescale.result).toMatch(new RegExp(`^\\d+(\\.\\d+)? \\(in the value's own unit\\) \\(the first of 2×1 values; ${unknownCell}\\)$`));
    expect(rescale.args[2].value).toBe('range 2×1, first "distance"');
  });
});
