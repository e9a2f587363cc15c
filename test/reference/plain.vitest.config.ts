/** A vitest configuration without the build step, for a child run of a few test files (test/skips.test.ts). */
import { fileURLToPath } from "node:url";
import { defineConfig } from "vitest/config";

export default defineConfig({
  root: fileURLToPath(new URL("../..", import.meta.url)),
  test: { include: ["test/**/*.test.ts"], testTimeout: 120_000 },
});
