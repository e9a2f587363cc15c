/**
 * Runs the outside reference tools (Debian python3-astropy, python3-mpmath) from the test suite.
 * In CI (CI=true) a missing tool is a failure; on a developer machine those tests are skipped with
 * a one-line hint.
 */
import { execFileSync, spawnSync } from "node:child_process";
import { fileURLToPath } from "node:url";

const python = "/usr/bin/python3";

/** True when python3 can import the module. */
export function hasPythonModule(module: string): boolean {
  const r = spawnSync(python, ["-c", `import ${module}`], { stdio: "ignore" });
  return r.status === 0;
}

/**
 * Whether tests that need `module` should run. Outside CI, prints a hint and returns false when it
 * is missing; in CI a missing module throws, failing the suite.
 */
export function referenceAvailable(module: string, debianPackage: string): boolean {
  if (hasPythonModule(module)) return true;
  const hint = `${debianPackage} is not installed: apt-get install -y ${debianPackage} to run these reference checks`;
  if (process.env.CI === "true") throw new Error(`CI needs ${hint}`);
  console.warn(`skipping: ${hint}`);
  return false;
}

/** Runs a script from test/reference with a JSON request on stdin; returns its JSON reply. */
export function runPythonReference<T>(script: string, request: unknown): T {
  const path = fileURLToPath(new URL(script, import.meta.url));
  const out = execFileSync(python, [path], { input: JSON.stringify(request), maxBuffer: 64 * 1024 * 1024 });
  return JSON.parse(out.toString()) as T;
}
