/**
 * Runs the outside reference tools (Debian python3-astropy, python3-mpmath, python3-extinction) from
 * the test suite.
 * Under CI a missing tool is a failure; on a developer machine the tests that need it are skipped
 * with a one-line hint (test/requirements.ts). ZCELL_PYTHON names another interpreter (a test uses a
 * missing one to check the skips).
 */
import { execFileSync, spawnSync } from "node:child_process";
import { fileURLToPath } from "node:url";
import { toolAvailable } from "../requirements.js";

const python = process.env.ZCELL_PYTHON ?? "/usr/bin/python3";

/** True when python3 can import the module. */
export function hasPythonModule(module: string): boolean {
  const r = spawnSync(python, ["-c", `import ${module}`], { stdio: "ignore" });
  return r.status === 0;
}

/** Whether tests that need `module` should run (a hint and false when it is missing; a failure under CI). */
export function referenceAvailable(module: string, debianPackage: string): boolean {
  return toolAvailable(hasPythonModule(module), `Debian ${debianPackage} is not installed: apt-get install -y ${debianPackage} to run these reference checks`);
}

/** Runs a script from test/reference with a JSON request on stdin; returns its JSON reply. */
export function runPythonReference<T>(script: string, request: unknown): T {
  const path = fileURLToPath(new URL(script, import.meta.url));
  const out = execFileSync(python, [path], { input: JSON.stringify(request), maxBuffer: 64 * 1024 * 1024 });
  return JSON.parse(out.toString()) as T;
}
