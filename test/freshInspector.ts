/**
 * The cell inspector, its table of what each function computes (taskpane/functionAbout.ts) and the
 * functions' definitions, loaded afresh inside the running test. The table is built when its module
 * loads, and mutation testing (per-test coverage) credits code run while a module loads only to the
 * test that loads it: a test that reads the table through this can kill a change to it.
 */
import { vi } from "vitest";

export async function freshInspector() {
  vi.resetModules();
  const { explainFormula } = await import("../taskpane/explainCall.js");
  const { about } = await import("../taskpane/functionAbout.js");
  const { definitions } = await import("../functions/definitions.js");
  return { explainFormula, about, definitions };
}
