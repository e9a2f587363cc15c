/**
 * How often a unit text is worked out into a conversion: once per unit argument and text, however
 * many formulas use it (a column of 50,000 ZC.DIST_LUM formulas in "Gpc" is 1.5–3× slower when each
 * works its unit out again), and at most 64 texts kept per argument, so that a stranger's sheet of
 * endless distinct unit texts holds no more. Counted, not timed: every conversion the unit arguments
 * work out goes through the core's scaledConversion, wrapped here with a counter.
 */
import { describe, expect, test, vi } from "vitest";
import type { ArgSpec } from "../functions/FunctionDef.js";

const counted = vi.hoisted(() => ({ conversions: 0 }));

vi.mock("../core/index.js", async (importOriginal) => {
  const core = await importOriginal<typeof import("../core/index.js")>();
  return {
    ...core,
    scaledConversion: (...args: Parameters<typeof core.scaledConversion>) => {
      counted.conversions++;
      return core.scaledConversion(...args);
    },
  };
});

const { sheetCalls } = await import("./sheetCalls.js");
const { unitConversion } = await import("../functions/unitArgument.js");

/** Conversions worked out while `work` runs. */
function conversionsIn(work: () => void): number {
  const before = counted.conversions;
  work();
  return counted.conversions - before;
}

describe("one unit text in many formulas", () => {
  test("1,000 one-cell ZC.DIST_LUM formulas with the unit \" Gpc\" work it out once, and each gives Gpc", () => {
    const { num } = sheetCalls("P18-CMB");
    const inMpc = num("DIST_LUM", 0.5);
    let results: number[] = [];
    const made = conversionsIn(() => {
      results = Array.from({ length: 1000 }, () => num("DIST_LUM", 0.5, null, " Gpc"));
    });
    expect(made).toBe(1);
    // 1 Gpc = 1000 Mpc (FITS prefixes G = 10⁹, M = 10⁶)
    for (const r of results) expect(Math.abs(r * 1000 / inMpc - 1)).toBeLessThan(1e-12);
  });

  test("a second unit text for the same argument is worked out once more, and the first is still kept", () => {
    const { num } = sheetCalls("P18-CMB");
    const made = conversionsIn(() => {
      for (let i = 0; i < 100; i++) {
        num("DIST_LUM", 0.5, null, "kpc ");
        num("DIST_LUM", 0.5, null, " Gpc");
      }
    });
    expect(made).toBe(1);
  });
});

describe("at most 64 unit texts kept for one argument", () => {
  // an argument of its own (a fresh spec), so that nothing else has filled its conversions
  const spec: Extract<ArgSpec, { kind: "unit" }> = { kind: "unit", name: "unit", unit: "Mpc", default: "Mpc", applies: "result" };
  // 65 texts of one unit, told apart by spaces before it
  const texts = Array.from({ length: 65 }, (_, i) => `${" ".repeat(i)}Gpc`);

  test("the first 64 distinct texts are kept; the 65th is worked out each time it comes", () => {
    expect(conversionsIn(() => texts.slice(0, 64).forEach((t) => unitConversion("DIST_LUM", spec, t)))).toBe(64);
    expect(conversionsIn(() => texts.slice(0, 64).forEach((t) => unitConversion("DIST_LUM", spec, t)))).toBe(0);
    expect(conversionsIn(() => unitConversion("DIST_LUM", spec, texts[64]))).toBe(1);
    expect(conversionsIn(() => unitConversion("DIST_LUM", spec, texts[64]))).toBe(1);
    // kept or not, the same conversion: a result in Mpc is given in Gpc by 1/1000 (FITS prefixes G = 10⁹,
    // M = 10⁶), quoted without the spaces
    const { factor, hPower, unit } = unitConversion("DIST_LUM", spec, texts[64]);
    expect([Math.abs(factor / 1e-3 - 1) < 1e-12, hPower, unit]).toEqual([true, 0, "Gpc"]);
  });
});
