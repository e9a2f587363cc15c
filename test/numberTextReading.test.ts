/**
 * Numbers written as text (core/checks/numberText.ts): which text a cell may hold for a number
 * (pasted from a CSV file or an archive), and the hint a message gives for text that is almost one
 * (a decimal comma, a thousands comma, a typographic minus, a percentage). The hints are zcell's own
 * words (the text a message shows after "not a number"), pinned here as the interface.
 */
import fc from "fast-check";
import { describe, expect, test, vi } from "vitest";

/**
 * The module loaded afresh inside the running test: its patterns are built when it loads, and
 * mutation testing (per-test coverage) credits code run while a module loads only to the test that
 * loads it, so each test here loads it to be able to tell a changed pattern.
 */
async function fresh() {
  vi.resetModules();
  return import("../core/checks/numberText.js");
}

describe("what text counts as a number", () => {
  //  text           a number?   why (common practice: a decimal number as a CSV file or an archive writes it)
  const cases: [string, boolean, string][] = [
    ["1",            true,       "digits alone"],
    ["12",           true,       "more than one digit"],
    ["+1",           true,       "an explicit plus"],
    ["-2",           true,       "a minus (the hyphen-minus)"],
    ["1.25",         true,       "digits, a point and digits"],
    ["1.",           true,       "digits and a point"],
    [".25",          true,       "a point and digits"],
    [".5",           true,       "a point and one digit"],
    ["-.5",          true,       "a signed fraction without its 0"],
    ["1e5",          true,       "an exponent"],
    ["1E5",          true,       "an upper-case exponent"],
    ["1e15",         true,       "an exponent of two digits"],
    ["1e-5",         true,       "a negative exponent"],
    ["1.5e+3",       true,       "a positive exponent with its sign"],
    ["1.e5",         true,       "a point, no digits, an exponent"],
    ["",             false,      "nothing"],
    [".",            false,      "a point alone"],
    ["e5",           false,      "an exponent alone"],
    ["1e",           false,      "an exponent without digits"],
    ["1e+",          false,      "an exponent's sign without digits"],
    ["1.2.3",        false,      "two points"],
    ["--1",          false,      "two signs"],
    ["+-1",          false,      "two signs"],
    ["1,5",          false,      "a decimal comma"],
    ["5%",           false,      "a percentage"],
    ["−0.5",         false,      "the minus sign U+2212"],
    ["1 ",           false,      "a trailing space (the reader trims first)"],
    ["abc1",         false,      "letters before"],
    ["1abc",         false,      "letters after"],
    ["0x10",         false,      "hexadecimal"],
    ["Infinity",     false,      "infinity is no cell value"],
  ];
  test.each(cases)("%j: %s (%s)", async (text, expected) => {
    const { isNumberText } = await fresh();
    expect(isNumberText(text)).toBe(expected);
  });

  test("over digits, signs, points and exponents, text is a number exactly when JavaScript's Number() reads it (ECMA-262 §7.1.4.1.1, StringToNumber: StrDecimalLiteral)", async () => {
    const { isNumberText } = await fresh();
    // no space, no "Infinity", no 0x/0o/0b in this alphabet: there the grammar of Number() is the decimal number's
    const text = fc.string({ unit: fc.constantFrom(..."0123456789+-.eE"), maxLength: 12 });
    fc.assert(
      fc.property(text, (t) => isNumberText(t) === (t !== "" && !Number.isNaN(Number(t)))),
      { numRuns: 3000 },
    );
  });
});

describe("the hint for text that is almost a number", () => {
  //  text        the hint a message shows (zcell's words, core/checks/numberText.ts; the number written out by hand)
  const cases: [string, string][] = [
    ["0,5",       "use a point for decimals, 0.5"],
    ["12,5",      "use a point for decimals, 12.5"],
    ["0,25",      "use a point for decimals, 0.25"],
    ["-0,5",      "use a point for decimals, -0.5"],
    ["+1,5",      "use a point for decimals, +1.5"],
    ["1,5e-14",   "use a point for decimals, 1.5e-14"],
    ["1,5E+3",    "use a point for decimals, 1.5E+3"],
    ["1,5e14",    "use a point for decimals, 1.5e14"],
    ["1,000",     "write 1000 without the thousands comma, or 1.000 for a decimal comma"],
    ["-12,345",   "write -12345 without the thousands comma, or -12.345 for a decimal comma"],
    ["1,500e3",   "use a point for decimals, 1.500e3"], // with an exponent three digits are a decimal comma
    ["−0.5",      'write the minus as the hyphen-minus "-", -0.5'],   // U+2212 MINUS SIGN
    ["–0.5",      'write the minus as the hyphen-minus "-", -0.5'],   // U+2013 EN DASH
    ["−0,5",      'write the minus as the hyphen-minus "-" and use a point for decimals, -0.5'],
    ["−5%",       'write the minus as the hyphen-minus "-" and it is a percentage, write -0.05'],
    ["5%",        "it is a percentage, write 0.05"],
    ["12%",       "it is a percentage, write 0.12"],
    ["31.5 %",    "it is a percentage, write 0.315"],
    ["31.25%",    "it is a percentage, write 0.3125"],
    ["5.%",       "it is a percentage, write 0.05"],
    [".25%",      "it is a percentage, write 0.0025"],
    [".5%",       "it is a percentage, write 0.005"],
    ["-5%",       "it is a percentage, write -0.05"],
    ["+5%",       "it is a percentage, write 0.05"],
  ];
  test.each(cases)("%j: %j", async (text, hint) => {
    const { numberTextHint } = await fresh();
    expect(numberTextHint(text)).toBe(hint);
  });

  //  text        why no hint (the almost-number must be the whole text)
  const none: [string, string][] = [
    ["x1,5",      "a letter before a decimal comma"],
    ["1,5x",      "a letter after a decimal comma"],
    ["1,2,3",     "two commas"],
    ["1,",        "a comma without digits after"],
    [",5",        "a comma without digits before"],
    ["1,5e",      "an exponent without digits"],
    ["x5%",       "a letter before a percentage"],
    ["5%x",       "a letter after a percentage"],
    ["5  %",      "two spaces before the percent sign"],
    ["%",         "a percent sign alone"],
    ["−abc",      "a minus sign before what is no number"],
    ["1−5",       "a minus sign inside: only a leading one is read as a minus"],
    ["1e−5",      "a minus sign in the exponent: only a leading one is read as a minus"],
    ["abc",       "letters"],
    ["",          "nothing"],
  ];
  test.each(none)("%j: none (%s)", async (text) => {
    const { numberTextHint } = await fresh();
    expect(numberTextHint(text)).toBeUndefined();
  });

  test("a number written right gets no hint, and a hint's number reads as a number (any decimal comma)", async () => {
    const { isNumberText, numberTextHint } = await fresh();
    const digits = fc.string({ unit: fc.constantFrom(..."0123456789"), minLength: 1, maxLength: 6 });
    fc.assert(
      fc.property(fc.constantFrom("", "-", "+"), digits, digits, fc.constantFrom("", "e3", "E-7"), (sign, whole, after, exponent) => {
        const decimal = `${sign}${whole}.${after}${exponent}`;
        expect(numberTextHint(decimal)).toBeUndefined();
        const hint = numberTextHint(`${sign}${whole},${after}${exponent}`);
        expect(hint?.endsWith(` ${decimal}`) || hint?.endsWith(`or ${decimal} for a decimal comma`)).toBe(true);
        expect(isNumberText(decimal)).toBe(true);
      }),
      { numRuns: 300 },
    );
  });
});
