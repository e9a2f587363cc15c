/**
 * What the cell inspector reads of a formula a stranger wrote, beyond what the function takes: an
 * argument past the function's last is not read (the value shown is the one the function computes),
 * and a unit or a one-cell text given as a range is shown as that range, never as the cell at the
 * selected cell's place (units and such texts are read once for the whole call, not cell by cell).
 * Texts: the pane's own (taskpane/explainCall.ts), pinned as the interface.
 */
import { describe, expect, test } from "vitest";
import { explainFormula } from "../taskpane/explainCall.js";
import { blanks, p18Cmb, sheet1 } from "./inspectorSheet.js";

describe("the inspector reads only what the function takes", () => {
  test("an argument past the function's last (here one Excel computes) leaves the result as computed", async () => {
    const [plain] = await explainFormula('=ZC.DIST_LUM(0.5,,"Mpc")', blanks, p18Cmb);
    const [extra] = await explainFormula('=ZC.DIST_LUM(0.5,,"Mpc",SUM(C1))', blanks, p18Cmb);
    expect(plain.isError).toBe(false);
    expect(plain.result).toMatch(/ Mpc$/);
    expect(extra.result).toBe(plain.result);
    expect(extra.args.map((a) => a.name)).toEqual(["z", "model", "unit"]);
  });
});

describe("a unit or one-cell text given as a range is shown as the range at every place", () => {
  const cells = sheet1({ "$B$1:$B$2": [["Mpc"], ["Gpc"]] });
  test.each([
    // formula                                                        argument
    ["=ZC.DIST_LUM(SUM(C1),,$B$1:$B$2)",                               "unit"],
    ['=ZC.RESCALE(SUM(C1),0.5,"distance","W9-ALL",,$B$1:$B$2)',         "unit"],
  ])("%s, second cell of its result: %s", async (formula, name) => {
    const [call] = await explainFormula(formula, cells, p18Cmb, undefined, { row: 1, col: 0 });
    const row = call.args.find((a) => a.name === name)!;
    expect(row.value).not.toContain("Gpc");
    expect(row.value).not.toContain("for this cell");
    expect(row.value).toContain('"Mpc"');
  });
});
