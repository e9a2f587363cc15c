/**
 * The cell inspector on calls written inside another ZC call: which cell of the inner call's result
 * the selected cell reads, as the Result row of the inner call says it ("row 2 of 3×1 values: this
 * cell", or "the first of …; which one this cell shows is not known here"). The texts are the pane's
 * own (taskpane/explainCall.ts), pinned here as the interface; the invented sheet is Sheet1.
 */
import { describe, expect, test } from "vitest";
import { explainFormula } from "../taskpane/explainCall.js";
import { readWorkbookModels } from "../functions/workbookModels.js";
import { p18Cmb, sheet1 } from "./inspectorSheet.js";

const unknownCell = "which one this cell shows is not known here";
const cells = sheet1({
  "$A$1:$A$2": [[1], [2]],
  "$C$1:$C$2": [[150], [160]],
  // an invented catalogue: three absolute magnitudes, their redshift limits, two bins
  "$F$1:$F$3": [[22], [22.5], [23.5]],
  "$G$1:$G$3": [[0.1], [0.2], [0.3]],
  "$H$1:$H$3": [[21], [23], [25]],
});

describe("a call inside an expression of its caller's argument", () => {
  test("is read by no argument of the caller: its first cell is shown, said not to be known", async () => {
    const [outer, inner] = await explainFormula("=ZC.DIST_LUM(ZC.AGE($A$1:$A$2)+1)", cells, p18Cmb, undefined, { row: 1, col: 0 });
    expect(outer.args[0].value).toBe("computed by Excel");
    // AGE(z = 1) under P18-CMB: the value the inspector shows for it elsewhere (test/inspectorNestedCalls.test.ts)
    expect(inner.result).toBe(`5.8423 Gyr (the first of 2×1 values; ${unknownCell})`);
  });
});

describe("a call given to a text argument that is read cell by cell", () => {
  test("PARAM's name from a column of texts: the inner call's cell is the one of the selected cell's row", async () => {
    const [param, text] = await explainFormula('=ZC.PARAM(ZC.COORD_TEXT($C$1:$C$2,"ra"))', cells, p18Cmb, undefined, { row: 1, col: 0 });
    // 160° = 10 h 40 min of right ascension (15° an hour, common practice)
    expect(text.result).toBe('"10:40:00.00" (row 2 of 2×1 values: this cell)');
    expect(param.args[0].value).toBe('"10:40:00.00" (row 2 of the result of ZC.COORD_TEXT for this cell)');
  });
});

describe("a call given to a function of whole columns", () => {
  test("LUMINOSITY_FUNCTION reads every cell of its v_max column: none of the inner call's cells is the selected one's", async () => {
    const formula = "=ZC.LUMINOSITY_FUNCTION($F$1:$F$3,ZC.VOLUME_MAX($G$1:$G$3,0,1,1),$H$1:$H$3)";
    const [lf, vmax] = await explainFormula(formula, cells, p18Cmb, undefined, { row: 1, col: 0 });
    // the table has one row per bin (2 bins from 3 edges) and 5 columns: low, high, count, phi, phi_err
    expect(lf.result).toBe("23 (row 2, column 1 of 2×5 values: this cell)");
    expect(vmax.result).toMatch(new RegExp(`^8320\\.89 Mpc3 \\(the first of 3×1 values; ${unknownCell}\\)$`));
  });
});

describe("a table given as a text argument of a stranger's workbook", () => {
  // an invented workbook whose own models are named after the model's parameters: PRESETS then lists
  // mostly parameter keys in its first column, and reads as a key/value block
  const keys = ["H0", "Om", "OL", "Ok", "Ob", "w0", "wa", "Tcmb", "Neff", "mnu"];
  const active = { spec: "P18-CMB", stored: true, models: readWorkbookModels(Object.fromEntries(keys.map((k) => [k, "P18-CMB"]))) };

  test("PARAM's name is a text read cell by cell, even when its range reads as a key/value block", async () => {
    const [param, presets] = await explainFormula("=ZC.PARAM(ZC.PRESETS())", cells, active, undefined, { row: 1, col: 0 });
    expect(presets.result).toBe('"P18-CMB" (row 2, column 1 of 22×2 values: this cell)');
    expect(param.args[0].value).toBe('"P18-CMB" (row 2, column 1 of the result of ZC.PRESETS for this cell)');
  });
});
