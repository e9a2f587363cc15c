/** The README's function reference is generated from the code: it fails here when they drift apart. */
import { readFileSync } from "node:fs";
import { describe, expect, test } from "vitest";
import { functionReference, readmePath, withReference } from "../scripts/functionReference.js";

describe("README", () => {
  test("its function reference matches functions/functions.ts (run npm run docs after changing them)", async () => {
    const readme = readFileSync(readmePath, "utf8");
    expect(withReference(readme, await functionReference())).toBe(readme);
  });

  test("states the caution that results depend on the assumed cosmology", () => {
    expect(readFileSync(readmePath, "utf8")).toMatch(/Every number zcell gives depends on the assumed cosmology/);
  });
});
