/**
 * Honest skips: without a tool only the tests that need it are skipped, each with a hint naming the
 * Debian package; under CI the same run fails. Checked by running the CMB-frame, mpmath and
 * extinction files in a child vitest with a python3 that does not exist (ZCELL_PYTHON).
 */
import { spawnSync } from "node:child_process";
import { mkdtempSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, test } from "vitest";
import { inCI } from "./requirements.js";

const root = fileURLToPath(new URL("..", import.meta.url));

/** Runs three test files in a child vitest without python3; CI as given (undefined: unset). */
function runWithoutPython(ci: string | undefined) {
  const out = join(mkdtempSync(join(tmpdir(), "zcell-skips-")), "report.json");
  const env: Record<string, string | undefined> = { ...process.env, ZCELL_PYTHON: "/nonexistent/python3", CI: ci };
  if (ci === undefined) delete env.CI;
  const r = spawnSync(
    process.execPath,
    [`${root}node_modules/vitest/vitest.mjs`, "run", "--config", `${root}test/reference/plain.vitest.config.ts`, "--reporter=default", "--reporter=json", `--outputFile.json=${out}`, "test/cmbFrame.test.ts", "test/mpmath.test.ts", "test/extinction.test.ts"],
    { cwd: root, env: env as NodeJS.ProcessEnv, encoding: "utf8", timeout: 120_000 },
  );
  let report: { numPassedTests: number; numPendingTests: number; numFailedTestSuites: number } | undefined;
  try {
    report = JSON.parse(readFileSync(out, "utf8"));
  } catch {
    report = undefined;
  }
  return { status: r.status, output: `${r.stdout}${r.stderr}`, report };
}

describe("a run without python3", () => {
  test("skips only the Python-backed tests, with a hint naming the package", () => {
    const r = runWithoutPython(undefined);
    expect(r.status, r.output).toBe(0);
    expect(r.output).toContain("skipping: Debian python3-astropy is not installed: apt-get install -y python3-astropy");
    expect(r.output).toContain("skipping: Debian python3-mpmath is not installed: apt-get install -y python3-mpmath");
    expect(r.output).toContain("skipping: Debian python3-extinction is not installed: apt-get install -y python3-extinction");
    expect(r.report!.numPassedTests).toBeGreaterThanOrEqual(6); // the CMB-frame tests that need no Python
    expect(r.report!.numPendingTests).toBeGreaterThan(0);
  });

  test.each(["true", "1", "yes"])("fails with CI=%s", (ci) => {
    const r = runWithoutPython(ci);
    expect(r.status).not.toBe(0);
    expect(r.output).toContain("CI needs Debian python3-astropy");
  });
});

test.each([
  // CI value      read as CI   (common practice: CI services set CI=true; "0"/"false" switch it off)
  ["true",         true],
  ["1",            true],
  ["yes",          true],
  ["",             false],
  ["0",            false],
  ["false",        false],
  ["FALSE",        false],
])("CI=%j is read as %s", (value, expected) => {
  const saved = process.env.CI;
  process.env.CI = value;
  try {
    expect(inCI()).toBe(expected);
  } finally {
    if (saved === undefined) delete process.env.CI;
    else process.env.CI = saved;
  }
});
