/** The cell inspector's formula tokenizer against tricky formulas (Excel formula grammar, common practice). */
import { describe, expect, test } from "vitest";
import { findCalls, parseArrayConstant, tokenize } from "../taskpane/formulaCalls.js";

const zc = (formula: string) => findCalls(formula).filter((c) => c.name.startsWith("ZC."));

describe("finding ZC calls", () => {
  test.each([
    // formula                                                        calls: name → args
    ["=ZC.DIST_LUM(A2)",                                               [["ZC.DIST_LUM", ["A2"]]]],
    ["=zc.dist_lum($A$2:$A$40, B1:D1)",                                [["ZC.DIST_LUM", ["$A$2:$A$40", "B1:D1"]]]],
    ["=ZC.LOOKBACK('My sheet (1)'!B2, \"P18-BAO; H0=73\")",         [["ZC.LOOKBACK", ["'My sheet (1)'!B2", '"P18-BAO; H0=73"']]]],
    ["=ZC.DIST_LUM(A2,\"a \"\"quoted\"\" spec, with comma\")",         [["ZC.DIST_LUM", ["A2", '"a ""quoted"" spec, with comma"']]]],
    ["=ZC.MAG_ABS(C2, B2, ZC.KCORRECTION(B2, -0.5))",                  [["ZC.MAG_ABS", ["C2", "B2", "ZC.KCORRECTION(B2, -0.5)"]], ["ZC.KCORRECTION", ["B2", "-0.5"]]]],
    ["=ZC.LUMINOSITY(C2,B2,,\"erg/s/cm2\",\"Lsun\")",                  [["ZC.LUMINOSITY", ["C2", "B2", "", '"erg/s/cm2"', '"Lsun"']]]],
    ["=ZC.DIST_LUM({0.1,0.5;1,2}, \"W9-ALL\")",                         [["ZC.DIST_LUM", ["{0.1,0.5;1,2}", '"W9-ALL"']]]],
    ["=ZC.DIST_LUM(A2;\"W9-ALL\";\"Gpc\")",                             [["ZC.DIST_LUM", ["A2", '"W9-ALL"', '"Gpc"']]]],
    ["=1+ROUND(ZC.AGE(), 2)*2",                                        [["ZC.AGE", []]]],
    ["=IF(A2>0, ZC.DIST_ANG((A2+B2)/2), \"—\")",                       [["ZC.DIST_ANG", ["(A2+B2)/2"]]]],
    ["=ZC.DIST_LUM(Sheet2!A:A, Cosmology)",                            [["ZC.DIST_LUM", ["Sheet2!A:A", "Cosmology"]]]],
    ["=ZC.DIST_LUM(Table1[z])",                                        [["ZC.DIST_LUM", ["Table1[z]"]]]],
    ["=SUM(A1:A3)",                                                    []],
  ])("%s", (formula, expected) => {
    expect(zc(formula).map((c) => [c.name, c.args])).toEqual(expected);
  });

  test("references, strings, errors and names get their own token kinds", () => {
    const kinds = tokenize("='a ''b'''!$A$1:B2+\"x\"\"y\"&#N/A<>TRUE+name1+1.5e3%").filter((t) => t.kind !== "space");
    expect(kinds.map((t) => [t.kind, t.text])).toEqual([
      ["ref", "'a ''b'''!$A$1:B2"], ["op", "+"], ["string", '"x""y"'], ["op", "&"], ["error", "#N/A"],
      ["op", "<>"], ["bool", "TRUE"], ["op", "+"], ["name", "name1"], ["op", "+"], ["number", "1.5e3%"],
    ]);
  });

  test("unterminated strings and array constants are reported", () => {
    expect(() => tokenize('=ZC.DIST_LUM("abc)')).toThrow(SyntaxError);
    expect(() => tokenize("=ZC.DIST_LUM({1,2)")).toThrow(SyntaxError);
  });

  test("array constants parse into rows", () => {
    expect(parseArrayConstant('{1,2;3,"a""b"}')).toEqual([[1, 2], [3, 'a"b']]);
    expect(parseArrayConstant("{TRUE}")).toEqual([[true]]);
  });
});
