/**
 * The cell inspector's Arguments and Result rows: what each argument stands for (an omitted one's
 * default, a range's cell for the selected cell, one Excel computes) and the result as the cell shows
 * it, with every digit, its error and the advice for it. The texts are the pane's own
 * (taskpane/explainCall.ts, taskpane/errorAdvice.ts), pinned here as the interface.
 */
import { describe, expect, test } from "vitest";
import { explainFormula } from "../taskpane/explainCall.js";
import { blanks, p18Cmb, sheet1 } from "./inspectorSheet.js";

/** The value each argument row shows, by argument name. */
const valuesOf = (call: { args: { name: string; value: string }[] }) => Object.fromEntries(call.args.map((a) => [a.name, a.value]));

describe("an argument left out shows what it stands for, as the help says", () => {
  test.each([
    // formula                              argument     the Arguments row's value
    ["=ZC.DIST_LUM(1)",                     "unit",      'default "Mpc"'],               // a unit argument's default
    ["=ZC.DIST_LUM(1)",                     "model",     "the workbook's model"],
    ["=ZC.MAG_ABS(20,0.5)",                 "kcorr",     "default 0"],                   // a number's default
    ["=ZC.GROWTH(1)",                       "neutrinos", 'default "smooth"'],            // a text's default, as typed
    ["=ZC.EXTINCTION(5500,0.1)",            "r_v",       "left out: 3.1, or 4.05 (R′_V) for Calzetti 2000"], // in words where no one value does
    ['=ZC.CONVERT(1,"Mpc")',                "to",        "omitted"],                     // no default: omitted
    ['=ZC.MODEL("EDS","H0",72)',            "key2",      "left out: no change"],
    ['=ZC.MODEL("EDS","H0",72)',            "value2",    "left out: no change"],
    ["=ZC.PARAM()",                         "name",      "omitted"],
  ])("%s: %s is %s", async (formula, argument, value) => {
    const [call] = await explainFormula(formula, blanks, p18Cmb);
    expect(valuesOf(call)[argument]).toBe(value);
    expect(call.args.find((a) => a.name === argument)!.text).toBe("(omitted)");
  });

  test("an empty text given for an argument reads as one left out; a blank cell is shown as blank", async () => {
    const [call] = await explainFormula('=ZC.DIST_LUM(1,"","")', blanks, p18Cmb);
    expect(valuesOf(call)).toEqual({ z: "1", model: "the workbook's model", unit: 'default "Mpc"' });
    expect(call.args.map((a) => a.text)).toEqual(["1", '""', '""']);
    const [cells] = await explainFormula("=ZC.DIST_LUM(1,B2)", sheet1({ B2: [[""]] }), p18Cmb);
    expect(valuesOf(cells).model).toBe("blank");
    expect(cells.model).toMatchObject({ spec: "P18-CMB", source: "the workbook's model", where: undefined });
    expect(cells.modelArgs).toBeUndefined(); // one model argument: one Model row
  });

  test("an argument given shows its value: text quoted, a number as written", async () => {
    const [call] = await explainFormula('=ZC.DIST_LUM(0.5,"EDS","kpc")', blanks, p18Cmb);
    expect(valuesOf(call)).toEqual({ z: "0.5", model: '"EDS"', unit: '"kpc"' });
  });
});

describe("a number's unit is shown beside it: the default of the unit argument that converts it", () => {
  test.each([
    // formula                                        argument  unit
    ["=ZC.SIZE(2,1)",                                 "angle",  "arcsec"], // applies to one argument
    ["=ZC.ANGLE(30,1)",                               "size",   "kpc"],
    ["=ZC.REDSHIFT_CMB(0.01,150,-30)",                "ra",     "deg"],    // applies to two
    ["=ZC.REDSHIFT_CMB(0.01,150,-30)",                "dec",    "deg"],
  ])("%s: %s in %s", async (formula, argument, unit) => {
    const [call] = await explainFormula(formula, blanks, p18Cmb);
    expect(call.args.find((a) => a.name === argument)!.unit).toBe(unit);
    // a redshift and the model have no unit
    expect(call.args.find((a) => a.name.startsWith("z"))!.unit).toBeUndefined();
    expect(call.args.find((a) => a.name === "model")?.unit).toBeUndefined();
  });
});

describe("the Result row: the value the cell shows, with its unit and every digit", () => {
  test("a value rounded to 6 digits, and every digit beside it", async () => {
    const [call] = await explainFormula('=ZC.DIST_LUM(1,"EDS")', blanks, p18Cmb);
    // EDS: D_L = (1+z)·2D_H(1 − 1/√(1+z)), D_H = c/H0 with H0 = 70 (Hogg 1999 eq. 16, Ωm = 1)
    const closedForm = 2 * 2 * (299_792.458 / 70) * (1 - 1 / Math.SQRT2);
    expect(call.result).toBe("5017.55 Mpc");
    expect(call.exact).toMatch(/^5017\.55\d+ Mpc$/);
    expect(Math.abs(Number(call.exact!.split(" ")[0]) / closedForm - 1)).toBeLessThan(1e-10);
  });

  test("a value with no more digits than it shows has no second line", async () => {
    const [call] = await explainFormula("=ZC.CMB_TEMP(0)", blanks, p18Cmb);
    expect(call.result).toBe("2.7255 K"); // Tcmb of P18-CMB (Fixsen 2009)
    expect(call.exact).toBeUndefined();
  });

  test("a table of whole columns: its columns named, its arguments read whole, not at the selected cell", async () => {
    // three sources of 1/V_max = 1/100, 1/200, 1/300 Mpc⁻³ in the bins [9.5, 10.5) and [10.5, 11.5]
    const ranges = sheet1({ "$V$1:$V$3": [[10], [11], [12]], "$W$1:$W$3": [[100], [200], [300]], "$X$1:$X$3": [[9.5], [10.5], [11.5]] });
    const [call] = await explainFormula("=ZC.LUMINOSITY_FUNCTION($V$1:$V$3,$W$1:$W$3,$X$1:$X$3)", ranges, p18Cmb, undefined, { row: 1, col: 0 });
    expect(call.columns).toEqual(["low", "high", "N", "Φ", "σ_Φ"]);
    expect(call.args.map((a) => a.value)).toEqual(["range 3×1, first 10", "range 3×1, first 100", "range 3×1, first 9.5"]);
    expect(call.result).toBe("10.5 (row 2, column 1 of 2×5 values: this cell)"); // the second bin's low edge
  });

  test("a single cell given beside a range is shown as it is, not as a cell of the range", async () => {
    const [call] = await explainFormula("=ZC.DIST_LUM($A$1:$A$2,B1)", sheet1({ "$A$1:$A$2": [[1], [2]], B1: [["EDS"]] }), p18Cmb, undefined, { row: 1, col: 0 });
    expect(valuesOf(call)).toEqual({ z: "2 (Sheet1!A2 for this cell)", model: '"EDS"', unit: 'default "Mpc"' });
  });

  test("a range of keys and values given where a number belongs is a range, not a model", async () => {
    const [call] = await explainFormula("=ZC.DIST_LUM($E$1:$F$2)", sheet1({ "$E$1:$F$2": [["H0", 70], ["Om", 0.3]] }), p18Cmb);
    expect(call.args[0].value).toBe('range 2×2, first "H0"');
  });

  test("a required number left out is said to be omitted", async () => {
    const [call] = await explainFormula("=ZC.DIST_LUM()", blanks, p18Cmb);
    expect(call.args[0].value).toBe("omitted");
    expect(call.result).toBe("#VALUE! — ZC.DIST_LUM: z is required");
  });

  test("a unit text of spaces reads as left out: the value keeps its own unit", async () => {
    const [call] = await explainFormula('=ZC.REST_FRAME(7200,0.1,"wavelength","  ")', blanks, p18Cmb);
    expect(call.result).toBe("6545.45 (in the value's own unit)"); // λ/(1+z) = 7200/1.1
  });

  test("an array constant is read cell by cell, each cell named in the array", async () => {
    const [call] = await explainFormula("=ZC.DIST_LUM({0.5;1},\"EDS\")", blanks, p18Cmb, undefined, { row: 1, col: 0 });
    expect(call.args[0].value).toBe("1 (row 2 of the array for this cell)");
    expect(call.result).toBe("5017.55 Mpc (row 2 of 2×1 values: this cell)");
  });

  test("an error at one cell of a range: the cell's message, the argument at fault with that cell", async () => {
    const [call] = await explainFormula("=ZC.DIST_LUM($A$1:$A$2)", sheet1({ "$A$1:$A$2": [[0.5], [-1]] }), p18Cmb, undefined, { row: 1, col: 0 });
    expect(call.isError).toBe(true);
    expect(call.result).toBe(
      "#NUM! — ZC.DIST_LUM: z = -1 is negative: a blueshifted source needs a redshift-independent distance (row 2 of 2×1 values: this cell)",
    );
    expect(call.exact).toBeUndefined();
    expect(call.fault).toEqual({
      argument: "z",
      fix: "Give z a redshift ≥ 0 (> 0 where the result needs the source's distance; a blueshifted source needs a distance that does not come from its redshift).",
      text: "$A$1:$A$2",
      value: "-1 (Sheet1!A2 for this cell)",
    });
    const [good] = await explainFormula("=ZC.DIST_LUM($A$1:$A$2)", sheet1({ "$A$1:$A$2": [[0.5], [-1]] }), p18Cmb, undefined, { row: 0, col: 0 });
    expect([good.isError, good.fault]).toEqual([false, undefined]);
  });

  test("a message with no argument at fault has advice and no argument", async () => {
    const [call] = await explainFormula('=ZC.REDSHIFT(1E5,"DIST_ANG")', blanks, p18Cmb);
    expect(call.fault).toEqual({
      fix: "No value answers these arguments in this model: change the value asked for, its unit, or the model.",
      text: undefined,
      value: undefined,
    });
  });
});

describe("a call whose arguments the pane cannot know shows the cell as Excel shows it", () => {
  const byKind: [string, string][] = [
    // the value Excel shows      the advice of its kind (taskpane/errorAdvice.ts)
    ["#VALUE!", "An argument is not of its kind (a number, a unit, a model or one of its words): compare the order of the arguments with the function's help."],
    ["#NUM!",   "A value lies outside its physical domain, or the result does: the message says which."],
    ["#N/A",    "No value answers these arguments in this model: change the value asked for, its unit, or the model."],
  ];
  test.each(byKind)("an argument computed by Excel, the cell showing %s", async (shown, fix) => {
    const [call] = await explainFormula("=ZC.DIST_LUM(SUM(B1))", blanks, p18Cmb, shown);
    expect(call.args[0].value).toBe("computed by Excel");
    expect(call.result).toBe(`"${shown}" (as Excel shows it; an argument is computed by Excel)`);
    expect(call.isError).toBe(true);
    expect(call.fault).toEqual({ fix });
  });

  test("a number the cell shows is no error, and has no advice", async () => {
    const [call] = await explainFormula("=ZC.DIST_LUM(SUM(B1))", blanks, p18Cmb, 6804.82);
    expect(call.result).toBe("6804.82 (as Excel shows it; an argument is computed by Excel)");
    expect([call.isError, call.fault]).toEqual([false, undefined]);
  });

  test("an argument not read is said so, before an argument computed by Excel", async () => {
    const [call] = await explainFormula("=ZC.DIST_LUM(SUM(B1),,Nope)", sheet1({}), p18Cmb, "#NAME?");
    expect(call.args[2].value).toBe("not read (Excel: no reference Nope)");
    expect(call.result).toBe('"#NAME?" (as Excel shows it; an argument is not read)');
    expect(call.isError).toBe(true); // Excel's own error, though not one a ZC function returns
    expect(call.fault).toBeUndefined();
  });

  test("a text the cell shows that starts with no # is not an error", async () => {
    const [call] = await explainFormula("=ZC.DIST_LUM(SUM(B1))", blanks, p18Cmb, "N/A");
    expect([call.isError, call.fault]).toEqual([false, undefined]);
  });
});
