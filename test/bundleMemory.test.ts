/**
 * One formula whose range names thousands of distinct models (a crafted or careless workbook), and
 * the aggregates over whole columns: the memory each call takes, measured where users are, through
 * the built bundle in a fresh process (scripts/benchBundle.mjs, figures specs:N, chi2:N, lf:*).
 * Excel allows ~100k such rows and whole columns of 1,048,576, so memory must not grow with them.
 */
import { spawnSync } from "node:child_process";
import { fileURLToPath } from "node:url";
import { describe, expect, test } from "vitest";
import { testBuildDir } from "./testBuild.js";

const root = fileURLToPath(new URL("..", import.meta.url));

/** One figure of scripts/benchBundle.mjs in a fresh process, through the tests' build. */
function figure<T>(name: string): T {
  const r = spawnSync(process.execPath, ["--expose-gc", `${root}scripts/benchBundle.mjs`, `${testBuildDir}functions.js`, name], { encoding: "utf8", timeout: 120_000 });
  expect(r.status, r.stderr).toBe(0);
  return JSON.parse(r.stdout.trim().split("\n").at(-1)!) as T;
}

describe("aggregates over whole columns keep memory bounded (fresh process, built bundle)", () => {
  test("CHI2_MODULUS over 10^6 filled rows", () => {
    const chi2 = figure<{ extraRssMiB: number; check: number }>("chi2:1000000");
    console.log(`CHI2_MODULUS over 10^6 rows: ${JSON.stringify(chi2)}`);
    // before the columns were read as numbers: +177 to +185 MiB (scripts/benchBundle.mjs on the previous build)
    expect(chi2.extraRssMiB).toBeLessThan(100);
    expect(chi2.check).toBeGreaterThan(0);
  });

  test("LUMINOSITY_FUNCTION given a whole column of numbers as its edges says so instead of binning it", () => {
    const lf = figure<{ extraRssMiB: number; rows: number; check: string }>("lf:full");
    console.log(`LUMINOSITY_FUNCTION, a whole column as edges: ${JSON.stringify(lf)}`);
    // before: a 1,048,575-row table and +487 to +492 MiB
    expect(lf.rows).toBe(1);
    expect(lf.check).toMatch(/^#VALUE!: ZC\.LUMINOSITY_FUNCTION: edges: 1,048,576 edges make 1,048,575 bins; at most 1,000 bins/);
    expect(lf.extraRssMiB).toBeLessThan(100);
  });
});

describe("one formula with thousands of distinct models", () => {
  test("10,000 distinct specs in one call keep memory bounded (measured in a fresh process through the built bundle)", () => {
    const specs = figure<{ extraRssMiB: number; heapAfterGcMiB: number; check: number }>("specs:10000");
    console.log(`10,000 distinct specs: ${JSON.stringify(specs)}`);
    // before the bound, one call kept every model: +1035 MiB for 8,000 specs (the review's measurement)
    expect(specs.extraRssMiB).toBeLessThan(150);
    expect(specs.heapAfterGcMiB).toBeLessThan(10);
    expect(specs.check).toBeGreaterThan(0);
  });
});

