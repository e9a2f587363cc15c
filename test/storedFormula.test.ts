/**
 * The typed and stored spellings of ZC calls. The stored form `_xldudf_` + namespace + `_` + name is
 * what Excel writes for a JavaScript custom function in a saved workbook (OfficeDev/office-js issues
 * 3558 and 5611 show `_xldudf_` names in saved and reopened files).
 */
import { describe, expect, test } from "vitest";
import { callsZcFunction, storedFormula, typedFormula } from "../functions/storedFormula.js";
import { restorableFormula } from "../taskpane/restorableFormula.js";

describe("stored and typed spellings of ZC calls", () => {
  test.each([
    // typed                                         stored                                                         read back
    ["ZC.DIST_LUM(B3)",                              "_xldudf_ZC_DIST_LUM(B3)",                                     "ZC.DIST_LUM(B3)"],
    ["=zc.dist_lum(B3)",                             "=_xldudf_ZC_DIST_LUM(B3)",                                    "=ZC.DIST_LUM(B3)"],
    ["ZC.MAG_ABS(D3,B3,ZC.KCORRECTION(B3,-0.5))",    "_xldudf_ZC_MAG_ABS(D3,B3,_xldudf_ZC_KCORRECTION(B3,-0.5))",   "ZC.MAG_ABS(D3,B3,ZC.KCORRECTION(B3,-0.5))"],
    ['ZC.DIST_LUM(1,"ZC.AGE(1)")',                   '_xldudf_ZC_DIST_LUM(1,"ZC.AGE(1)")',                          'ZC.DIST_LUM(1,"ZC.AGE(1)")'],
    ['ZC.DESCRIBE("say ""ZC.X()""")&ZC.AGE()',       '_xldudf_ZC_DESCRIBE("say ""ZC.X()""")&_xldudf_ZC_AGE()',      'ZC.DESCRIBE("say ""ZC.X()""")&ZC.AGE()'],
    ["SUM(A1:A3)",                                   "SUM(A1:A3)",                                                  "SUM(A1:A3)"],
    ["ABC.ZC.X(1)",                                  "ABC.ZC.X(1)",                                                 "ABC.ZC.X(1)"],
    // a quoted sheet name is not code, and a quote inside it opens no string (sheets x"y, It's, ZC.AGE(s: invented)
    ['ZC.DIST_LUM(\'x"y\'!A1,"ZC.AGE(")',             '_xldudf_ZC_DIST_LUM(\'x"y\'!A1,"ZC.AGE(")',                    'ZC.DIST_LUM(\'x"y\'!A1,"ZC.AGE(")'],
    ["ZC.DIST_LUM('x\"y'!A1)+ZC.AGE(1)",              "_xldudf_ZC_DIST_LUM('x\"y'!A1)+_xldudf_ZC_AGE(1)",             "ZC.DIST_LUM('x\"y'!A1)+ZC.AGE(1)"],
    ["ZC.AGE('It''s'!A1)+ZC.AGE(2)",                 "_xldudf_ZC_AGE('It''s'!A1)+_xldudf_ZC_AGE(2)",                "ZC.AGE('It''s'!A1)+ZC.AGE(2)"],
    ["SUM('ZC.AGE(s'!A1)",                           "SUM('ZC.AGE(s'!A1)",                                          "SUM('ZC.AGE(s'!A1)"],
    // in a structured reference ' escapes the next character (a column named #x, invented)
    ["ZC.AGE(T['#x])+ZC.AGE(2)",                     "_xldudf_ZC_AGE(T['#x])+_xldudf_ZC_AGE(2)",                    "ZC.AGE(T['#x])+ZC.AGE(2)"],
  ])("%s is stored as %s", (typedText, storedText, readBack) => {
    expect(storedFormula(typedText)).toBe(storedText);
    expect(typedFormula(storedText)).toBe(readBack);
  });

  test("a stored formula that names a sheet x\"y is restored with its text unchanged, and not refused", () => {
    const sheets = ['x"y'];
    expect(restorableFormula(`=_xldudf_ZC_DIST_LUM('x"y'!A1,"_xldudf_ZC_AGE(")`, { singleCell: true, sheets })).toEqual({ ok: true, formula: `=ZC.DIST_LUM('x"y'!A1,"_xldudf_ZC_AGE(")` });
    expect(restorableFormula(`=ZC.DIST_LUM('x"y'!A1)+_xldudf_ZC_AGE(1)`, { singleCell: true, sheets })).toEqual({ ok: true, formula: `=ZC.DIST_LUM('x"y'!A1)+ZC.AGE(1)` });
  });

  test.each([
    // formula                          calls ZC?
    ["=ZC.DIST_LUM(A2)",                true],
    ["=1+zc.age ()",                    true],
    ["=_xldudf_ZC_DIST_LUM(B3)",        true],
    ["=[2]!_xldudf_ZC_AGE()",           true],
    ['="ZC.DIST_LUM(A2)"',              false],
    ["=SUM(A1:A3)",                     false],
    ["ZC.DIST_LUM(A2)",                 false],
    [42,                                false],
    ["='_xldudf_ZC_AGE(s'!A1",          false],
    ["='x\"y'!A1+_xldudf_ZC_AGE(1)",    true],
  ])("callsZcFunction(%j) is %s", (formula, expected) => {
    expect(callsZcFunction(formula)).toBe(expected);
  });
});
