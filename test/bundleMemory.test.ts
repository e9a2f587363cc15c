/**
 * One formula whose range names thousands of distinct models (a crafted or careless workbook): the
 * memory that call takes, measured where users are, through the built bundle in a fresh process
 * (scripts/benchBundle.mjs, figure specs:N). Excel allows ~100k such rows, so memory must not grow with them.
 */
import { spawnSync } from "node:child_process";
import { fileURLToPath } from "node:url";
import { describe, expect, test } from "vitest";
import { testBuildDir } from "./testBuild.js";

const root = fileURLToPath(new URL("..", import.meta.url));

describe("one formula with thousands of distinct models", () => {
  test("10,000 distinct specs in one call keep memory bounded (measured in a fresh process through the built bundle)", () => {
    const r = spawnSync(process.execPath, ["--expose-gc", `${root}scripts/benchBundle.mjs`, `${testBuildDir}functions.js`, "specs:10000"], { encoding: "utf8", timeout: 120_000 });
    expect(r.status, r.stderr).toBe(0);
    const figure = JSON.parse(r.stdout.trim().split("\n").at(-1)!) as { extraRssMiB: number; heapAfterGcMiB: number; check: number };
    console.log(`10,000 distinct specs: ${JSON.stringify(figure)}`);
    // before the bound, one call kept every model: +1035 MiB for 8,000 specs (the review's measurement)
    expect(figure.extraRssMiB).toBeLessThan(150);
    expect(figure.heapAfterGcMiB).toBeLessThan(10);
    expect(figure.check).toBeGreaterThan(0);
  });
});

