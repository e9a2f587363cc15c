/**
 * The patterns the formula reader builds when its module loads (taskpane/formulaCalls.ts: cells,
 * whole columns and rows, sheet names, numbers, blanks), each read here by a formula that needs it.
 * The module is loaded afresh inside each test: mutation testing (per-test coverage) credits code run
 * while a module loads only to the test that loads it. Expected tokens follow Excel's formula grammar
 * (A1 references, quoted sheet names, numbers with a decimal point or an exponent: common practice).
 */
import { expect, test, vi } from "vitest";

async function freshTokenize() {
  vi.resetModules();
  return (await import("../taskpane/formulaCalls.js")).tokenize;
}

// formula                 | tokens: kind, text, place in the formula
const cases: [string, string[]][] = [
  ["=A1",                    ["ref A1 @1"]],
  ["=$B$2:C3",               ["ref $B$2:C3 @1"]],
  ["=A:$C",                  ["ref A:$C @1"]],
  ["=1:$3",                  ["ref 1:$3 @1"]],
  ["=Sheet1!A1",             ["ref Sheet1!A1 @1"]],
  ["=Data_2.x!B2",           ["ref Data_2.x!B2 @1"]],
  ["='My sheet'!A1",         ["ref 'My sheet'!A1 @1"]],
  ["='It''s'!A1",            ["ref 'It''s'!A1 @1"]],
  ["=12.5",                  ["number 12.5 @1"]],
  ["=.25",                   ["number .25 @1"]],
  ["=1e-5+2E+3",             ["number 1e-5 @1", "op + @5", "number 2E+3 @6"]],
  ["=1  +\t\t2",             ["number 1 @1", "space    @2", "op + @4", "space \t\t @5", "number 2 @7"]],
];

test.each(cases)("%s reads as %j", async (formula, tokens) => {
  const tokenize = await freshTokenize();
  expect(tokenize(formula).map((t) => `${t.kind} ${t.text} @${t.start}`)).toEqual(tokens);
});
