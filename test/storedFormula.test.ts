/**
 * The typed and stored spellings of ZC calls. The stored form `_xldudf_` + namespace + `_` + name is
 * what Excel writes for a JavaScript custom function in a saved workbook (OfficeDev/office-js issues
 * 3558 and 5611 show `_xldudf_` names in saved and reopened files).
 */
import { describe, expect, test } from "vitest";
import { callsZcFunction, storedFormula, typedFormula } from "../functions/storedFormula.js";

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
  ])("%s is stored as %s", (typedText, storedText, readBack) => {
    expect(storedFormula(typedText)).toBe(storedText);
    expect(typedFormula(storedText)).toBe(readBack);
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
  ])("callsZcFunction(%j) is %s", (formula, expected) => {
    expect(callsZcFunction(formula)).toBe(expected);
  });
});
