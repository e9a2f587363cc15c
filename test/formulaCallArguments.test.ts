/**
 * Which calls the cell inspector finds in a formula, with each call's arguments, depth and own text,
 * for honest formulas and for those a stranger left half-written (unclosed calls, stray parentheses,
 * groups with commas). Expected splits follow Excel's formula grammar: arguments are separated at the
 * call's own level by ',' or ';', a call with nothing between its parentheses has no argument
 * (common practice). Array constants are read as Excel writes them: ',' (or '\' in some locales)
 * between columns, ';' between rows, doubled quotes inside strings (common practice).
 */
import { describe, expect, test } from "vitest";
import { findCalls, parseArrayConstant } from "../taskpane/formulaCalls.js";

/** Each call as [name, arguments, depth, its own text]. */
const calls = (formula: string) => findCalls(formula).map((c) => [c.name, c.args, c.depth, c.text]);

describe("the calls of a formula and their arguments", () => {
  // formula                               | calls: name, arguments, depth, own text
  const cases: [string, [string, string[], number, string][]][] = [
    ["=ZC.AGE()",                            [["ZC.AGE", [], 0, "ZC.AGE()"]]],
    ["=ZC.AGE( )",                           [["ZC.AGE", [""], 0, "ZC.AGE( )"]]],
    ["=ZC.AGE(,)",                           [["ZC.AGE", ["", ""], 0, "ZC.AGE(,)"]]],
    ["=ZC.AGE(1)",                           [["ZC.AGE", ["1"], 0, "ZC.AGE(1)"]]],
    // a group's commas are not the call's separators
    ["=ZC.DIST_LUM((A1,B1), 2)",             [["ZC.DIST_LUM", ["(A1,B1)", "2"], 0, "ZC.DIST_LUM((A1,B1), 2)"]]],
    ["=(ZC.AGE(1))*2",                       [["ZC.AGE", ["1"], 0, "ZC.AGE(1)"]]],
    // a separator outside any call (a union written at the top of the formula) separates no argument
    ["=ZC.AGE(1)+(A1,B1)",                   [["ZC.AGE", ["1"], 0, "ZC.AGE(1)"]]],
    // a stray closing parenthesis outside any call is passed over
    ["=1)+ZC.AGE(2)",                        [["ZC.AGE", ["2"], 0, "ZC.AGE(2)"]]],
    // nested calls: each with its depth and its own text, the outer one first
    ["=zc.mag_abs(C2, B2, zc.kcorrection(B2, -0.5))", [
      ["ZC.MAG_ABS", ["C2", "B2", "zc.kcorrection(B2, -0.5)"], 0, "zc.mag_abs(C2, B2, zc.kcorrection(B2, -0.5))"],
      ["ZC.KCORRECTION", ["B2", "-0.5"], 1, "zc.kcorrection(B2, -0.5)"],
    ]],
    ["=ZC.AGE(ZC.HUBBLE(1))+ZC.AGE(2)", [
      ["ZC.AGE", ["ZC.HUBBLE(1)"], 0, "ZC.AGE(ZC.HUBBLE(1))"],
      ["ZC.HUBBLE", ["1"], 1, "ZC.HUBBLE(1)"],
      ["ZC.AGE", ["2"], 0, "ZC.AGE(2)"],
    ]],
    // calls left open run to the end of the formula
    ["=ZC.AGE(",                             [["ZC.AGE", [""], 0, "ZC.AGE("]]],
    ["=ZC.DIST_LUM(A1,",                     [["ZC.DIST_LUM", ["A1", ""], 0, "ZC.DIST_LUM(A1,"]]],
    ["=ZC.DIST_LUM(ZC.AGE(1 , (2", [
      ["ZC.DIST_LUM", ["ZC.AGE(1 , (2"], 0, "ZC.DIST_LUM(ZC.AGE(1 , (2"],
      ["ZC.AGE", ["1", "(2"], 1, "ZC.AGE(1 , (2"],
    ]],
    ["=1+ZC.AGE(ZC.HUBBLE(2)", [
      ["ZC.AGE", ["ZC.HUBBLE(2)"], 0, "ZC.AGE(ZC.HUBBLE(2)"],
      ["ZC.HUBBLE", ["2"], 1, "ZC.HUBBLE(2)"],
    ]],
    // a name followed by a space is not a call
    ["=ZC.AGE (1)",                          []],
  ];
  test.each(cases)("%j", (formula, expected) => {
    expect(calls(formula)).toEqual(expected);
  });

  test("each argument's tokens are its own, without spaces, the same however often they are read", () => {
    const [outer, inner] = findCalls('=ZC.DIST_LUM( A1 + 1 ;ZC.AGE( 2 ), "x" )');
    const texts = (c: (typeof outer)) => c.argTokens.map((arg) => arg.map((t) => t.text));
    expect(texts(outer)).toEqual([["A1", "+", "1"], ["ZC.AGE", "(", "2", ")"], ['"x"']]);
    expect(texts(inner)).toEqual([["2"]]);
    expect(outer.argTokens).toBe(outer.argTokens);
    // an unclosed call's last argument runs to the end
    const [open] = findCalls("=ZC.AGE(1, A1 *");
    expect(texts(open)).toEqual([["1"], ["A1", "*"]]);
  });
});

describe("array constants as the inspector reads them", () => {
  // array constant                | rows of values
  const cases: [string, (number | string | boolean)[][]][] = [
    ['{"a,b";"c"}',                   [["a,b"], ["c"]]],
    ['{"x""",1}',                     [['x"', 1]]],
    ['{"""a",""}',                    [['"a', ""]]],
    ['{"a""b""c";2}',                 [['a"b"c'], [2]]],
    ['{"a;b"\\2}',                    [["a;b", 2]]],
    ["{1\\2;3\\4}",                   [[1, 2], [3, 4]]],
    ["{true,False, TRUE }",           [[true, false, true]]],
    ["{-1.5e3, .25}",                 [[-1500, 0.25]]],
    // what a stranger may write that is neither: not a number (NaN), never a boolean or text
    ["{TRUEX,XFALSE}",                [[Number.NaN, Number.NaN]]],
    ['{1"x"}',                        [[Number.NaN]]],
  ];
  test.each(cases)("%s", (text, rows) => {
    expect(parseArrayConstant(text)).toEqual(rows);
  });
});
