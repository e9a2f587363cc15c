/**
 * Which parts of a formula the two spellings of a ZC call change (functions/storedFormula.ts): only
 * code, never text inside a string literal ("…"), a quoted sheet name ('…') or brackets ([…] of a
 * structured reference or another workbook, nested, where ' escapes the next character: Microsoft's
 * "Using structured references with Excel tables" lists [ ] # ' as the characters escaped with ').
 * Sheet, table and column names are invented. Expected texts: the documented behaviour of
 * storedFormula/typedFormula (the stored form `_xldudf_ZC_NAME(`), written out.
 */
import { describe, expect, test } from "vitest";
import { callsZcFunction, storedFormula, typedFormula } from "../functions/storedFormula.js";

describe("only the code of a formula changes spelling", () => {
  test.each([
    // typed                                     stored                                             why
    ['ZC.AGE(1,"x ZC.AGE(2)")',                  '_xldudf_ZC_AGE(1,"x ZC.AGE(2)")',                 "a call inside a string literal that does not start the string stays text"],
    ["SUM(T[ ZC.AGE(c)])+ZC.AGE(1)",             "SUM(T[ ZC.AGE(c)])+_xldudf_ZC_AGE(1)",            "a column name that looks like a call stays a name"],
    ["SUM(T['[x])+ZC.AGE(1)",                    "SUM(T['[x])+_xldudf_ZC_AGE(1)",                   "an escaped [ inside brackets opens nothing"],
    ["SUM(T[[x] ZC.AGE(c)])+ZC.AGE(1)",          "SUM(T[[x] ZC.AGE(c)])+_xldudf_ZC_AGE(1)",         "nested brackets close with the outer one"],
    ["SUM(T[[x],[y]])+ZC.AGE(1)",                "SUM(T[[x],[y]])+_xldudf_ZC_AGE(1)",               "two inner brackets, then code again"],
    ["ZC.AGE(T[])+ZC.AGE(1)",                    "_xldudf_ZC_AGE(T[])+_xldudf_ZC_AGE(1)",           "empty brackets end where they close"],
    ["ZC.AGE(T[x)+ZC.AGE(1)",                    "_xldudf_ZC_AGE(T[x)+ZC.AGE(1)",                   "brackets left open run to the end of the formula"],
    ['ZC.AGE("x)+ZC.AGE(1)',                     '_xldudf_ZC_AGE("x)+ZC.AGE(1)',                    "a string left open runs to the end of the formula"],
  ])("%s is stored as %s (%s)", (typed, stored) => {
    expect(storedFormula(typed)).toBe(stored);
    expect(typedFormula(stored)).toBe(typed);
  });
});

describe("a cell's formula calls a ZC function in either spelling, in any case", () => {
  test.each([
    // formula                              calls ZC?
    ["=_XLDUDF_zc_AGE()",                   true],
    ["=1+_xldudf_zc_dist_lum(A1)",          true],
    ["=SUM(T[ ZC.AGE(c)])",                 false],
    ['="x ZC.AGE(1)"',                      false],
    ["=T['[x ZC.AGE(c)]",                   false],
  ])("callsZcFunction(%j) is %s", (formula, expected) => {
    expect(callsZcFunction(formula)).toBe(expected);
  });
});
