/**
 * How the cell inspector and the allow-list of formulas the pane may write back read a formula's text:
 * each token's kind, text and place, on honest formulas and on text a stranger wrote. Expected tokens
 * follow Excel's formula grammar (operators, A1 references, quoted sheet names with doubled quotes,
 * array constants, error literals: common practice); the error messages are those the inspector shows
 * after "Could not read the cell:" (taskpane/cellPanel.ts), pinned as the interface.
 */
import { describe, expect, test } from "vitest";
import { tokenize } from "../taskpane/formulaCalls.js";

/** Each token as "kind text @start", so that a table row reads as the formula does. */
const read = (formula: string) => tokenize(formula).map((t) => `${t.kind} ${t.text} @${t.start}`);

describe("the tokens of a formula", () => {
  // formula                 | tokens: kind, text, place in the formula
  const cases: [string, string[]][] = [
    // without its "=", the formula is read from its first character
    ["A1+1",                   ["ref A1 @0", "op + @2", "number 1 @3"]],
    ["=A1+1",                  ["ref A1 @1", "op + @3", "number 1 @4"]],
    // every kind of blank between tokens is one space token
    ["=1\t+\r\n2",             ["number 1 @1", "space \t @2", "op + @3", "space \r\n @4", "number 2 @6"]],
    // comparisons of two characters are one operator, of one character another
    ["=A1<=B1",                ["ref A1 @1", "op <= @3", "ref B1 @5"]],
    ["=A1>=B1",                ["ref A1 @1", "op >= @3", "ref B1 @5"]],
    ["=A1<>B1",                ["ref A1 @1", "op <> @3", "ref B1 @5"]],
    ["=A1<B1",                 ["ref A1 @1", "op < @3", "ref B1 @4"]],
    ["=1>2",                   ["number 1 @1", "op > @2", "number 2 @3"]],
    ["=A1=<B1",                ["ref A1 @1", "op = @3", "op < @4", "ref B1 @5"]],
    ["=1=2",                   ["number 1 @1", "op = @2", "number 2 @3"]],
    ["=A1>>B1",                ["ref A1 @1", "op > @3", "op > @4", "ref B1 @5"]],
    ["=-A1%^2&\"x\"",          ["op - @1", "ref A1 @2", "op % @4", "op ^ @5", "number 2 @6", "op & @7", "string \"x\" @8"]],
    // a closing brace inside a string of an array constant does not end it
    ["={\"a}b\",1}",           ["array {\"a}b\",1} @1"]],
    ["=\"a\"{1}",              ["string \"a\" @1", "array {1} @4"]],
    // numbers that start with a point
    ["=.5*A1",                 ["number .5 @1", "op * @3", "ref A1 @4"]],
    ["=1+.",                   ["number 1 @1", "op + @2", "op . @3"]],
    // characters that start nothing are operators of their own, and the reading goes on after them
    ["=A$",                    ["name A @1", "op $ @2"]],
    ["=!A1",                   ["op ! @1", "ref A1 @2"]],
    ["=@ZC.AGE(1)",            ["op @ @1", "func ZC.AGE @2", "open ( @8", "number 1 @9", "close ) @10"]],
    // a defined name may start with a backslash (Excel's rules for names, from memory)
    ["=\\x+1",                 ["name \\x @1", "op + @3", "number 1 @4"]],
    // names and sheets that start with a letter beyond ASCII
    ["=Ànorm*2",               ["name Ànorm @1", "op * @6", "number 2 @7"]],
    ["=Été!A1",                ["ref Été!A1 @1"]],
    // a sheet part followed by a name, or by nothing a name can be
    ["=Sheet1!Name",           ["ref Sheet1!Name @1"]],
    ["=Sheet1!+1",             ["ref Sheet1! @1", "op + @8", "number 1 @9"]],
    // TRUE and FALSE in any case are booleans; a longer word or a call is not
    ["=true+FALSE",            ["bool true @1", "op + @5", "bool FALSE @6"]],
    ["=TRUEX+XTRUE",           ["name TRUEX @1", "op + @6", "name XTRUE @7"]],
    ["=TRUE()",                ["func TRUE @1", "open ( @5", "close ) @6"]],
    // a structured reference runs to its closing bracket, or to the end of a formula that has none
    ["=Table1[z]*2",           ["ref Table1[z] @1", "op * @10", "number 2 @11"]],
    ["=Table1[z",              ["ref Table1[z @1"]],
    // an error literal in any case, and a # that starts none (a spill reference)
    ["=#n/a+A1#",              ["error #n/a @1", "op + @5", "ref A1 @6", "error # @8"]],
  ];
  test.each(cases)("%j", (formula, tokens) => {
    expect(read(formula)).toEqual(tokens);
  });
});

describe("text the tokenizer cannot read", () => {
  // formula                        | the message (taskpane/formulaCalls.ts, shown by the inspector)
  const cases: [string, string][] = [
    ['=ZC.DIST_LUM("abc)',            "unterminated string at 13"],
    ['="',                            "unterminated string at 1"],
    ["=ZC.DIST_LUM({1,2)",            "unterminated array constant at 13"],
    ['={"}"',                         "unterminated array constant at 1"],
    ["='My sheet",                    "unterminated sheet name at 1"],
    ["=A1+'x''",                      "unterminated sheet name at 4"],
  ];
  test.each(cases)("%j: %s", (formula, message) => {
    expect(() => tokenize(formula)).toThrow(new SyntaxError(message));
  });
});
