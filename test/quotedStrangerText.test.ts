/**
 * How a message quotes text read from a workbook (core/checks/quoted.ts): a stranger may fill a cell
 * with 32,767 characters, so a message shows at most 40, cut to 39 and "…" with the whole text's
 * length, and never cuts a character written as a surrogate pair (UTF-16, The Unicode Standard §3.9)
 * in two. The texts are zcell's own words, pinned here as the interface of every such message.
 */
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { quoted, quotedText } from "../core/checks/quoted.js";

const x = (n: number) => "x".repeat(n);

describe("a text of at most 40 characters is quoted whole", () => {
  //  text        as a message quotes it
  const cases: [string, string][] = [
    ["",          '""'],
    ["Mpc",       '"Mpc"'],
    [x(39),       `"${x(39)}"`],
    [x(40),       `"${x(40)}"`],                          // the longest text quoted whole, without its length
  ];
  test.each(cases)("%j → %j", (text, shown) => {
    expect(quoted(text)).toBe(shown);
    expect(quotedText(text)).toBe(text);
  });
});

describe("a longer text: its first 39 characters, then … and its length with a comma between thousands", () => {
  //  length    the length as the message writes it (the sheet's messages write counts with a thousands comma, no locale)
  const cases: [number, string][] = [
    [41,        "41"],
    [100,       "100"],
    [999,       "999"],
    [1000,      "1,000"],
    [32767,     "32,767"],                                  // the most a cell holds
    [123456,    "123,456"],
    [1234567,   "1,234,567"],
  ];
  test.each(cases)("%i characters: (%s characters)", (length, written) => {
    expect(quoted(x(length))).toBe(`"${x(39)}…" (${written} characters)`);
    expect(quotedText(x(length))).toBe(`${x(39)}…`);
  });
});

describe("a cut never splits a surrogate pair", () => {
  //  text                                  cut to (before "…")          the character at the 39th place
  const cases: [string, string, string][] = [
    [`${x(38)}😀yyy`,                        x(38),                       "the first half of U+1F600: the pair is left out whole"],
    [`${x(38)}\u{10000}yy`,                  x(38),                       "U+D800, the lowest first half (U+10000)"],
    [`${x(38)}\u{10FFFF}yy`,                 x(38),                       "U+DBFF, the highest first half (U+10FFFF)"],
    [`${x(37)}😀yy`,                         `${x(37)}😀`,                "the second half of U+1F600: the pair is kept whole"],
    [`${x(38)}\uD7FFyy`,                     `${x(38)}\uD7FF`,            "U+D7FF, just below the surrogates: kept"],
    [`${x(38)}\uE000yy`,                     `${x(38)}\uE000`,            "U+E000, just above them: kept"],
  ];
  test.each(cases)("%j → %j (%s)", (text, cut) => {
    expect(quotedText(text)).toBe(`${cut}…`);
    expect(quoted(text)).toBe(`"${cut}…" (${text.length} characters)`);
  });

  test("any text: whole up to 40 UTF-16 units, else its first 39 (38 before a pair's first half) and …, never a lone first half", () => {
    fc.assert(
      fc.property(fc.string({ unit: "binary", maxLength: 60 }), (text) => {
        const cut = quotedText(text);
        if (text.length <= 40) {
          expect(cut).toBe(text);
          expect(quoted(text)).toBe(`"${text}"`);
          return;
        }
        const head = cut.slice(0, -1);
        expect(cut.endsWith("…")).toBe(true);
        expect(text.startsWith(head)).toBe(true);
        const first = text.charCodeAt(38);
        expect(head.length).toBe(first >= 0xd800 && first <= 0xdbff ? 38 : 39);
        expect(quoted(text)).toBe(`"${cut}" (${text.length} characters)`);
      }),
      { numRuns: 2000 },
    );
  });
});
