/**
 * Reading a crafted formula (test/craftedFormulas.ts) takes time linear in its length: the pane's
 * tokenizer, call finder and formula check. Timed, so it is left out of the mutation runs
 * (vitest.mutation.config.ts): there a mutant shares the machine with others and the ratios are noise.
 */
import { describe, expect, test } from "vitest";
import { callsZcFunction, typedFormula } from "../functions/storedFormula.js";
import { findCalls, tokenize } from "../taskpane/formulaCalls.js";
import { restorableFormula } from "../taskpane/restorableFormula.js";
import { craftedFamilies } from "./craftedFormulas.js";
import { longOverEightShort } from "./linearity.js";

describe("reading a crafted formula takes time linear in its length", () => {
  // A shape test, not a speed target (those are in scripts/benchTokenizer.ts): the same number of
  // characters read as 8 formulas of 1,024 or as 1 of 8,192 takes about the same time when reading is
  // linear, and 8 times longer when it is quadratic. Each side is the best of 9 interleaved samples of
  // at least 5 ms, so a busy machine slows both sides alike; a ratio under 3 leaves room for noise and
  // still fails a quadratic reader by far (about 8).
  const readers: [string, (formula: string) => unknown][] = [
    ["tokenize", tokenize],
    ["findCalls", findCalls],
    ["restorableFormula", (f) => restorableFormula(f, { singleCell: true })],
    ["typedFormula", typedFormula],
    ["callsZcFunction", callsZcFunction],
  ];
  test.each(readers)("%s: 8 × 1,024 characters against 1 × 8,192, every crafted family", (_name, read) => {
    const ratios: string[] = [];
    for (const family of craftedFamilies) {
      const short = family.formula(1024);
      const long = family.formula(8192);
      const lengthRatio = (long.length - 1) / (short.length - 1);
      const ratio = longOverEightShort(read, short, long) / (lengthRatio / 8);
      if (ratio >= 3) ratios.push(`${family.name}: ${ratio.toFixed(1)}`);
    }
    expect(ratios).toEqual([]);
  });
});
