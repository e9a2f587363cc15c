/**
 * The tests Stryker runs against each mutant (npm run mutation): the ones that import the sources
 * directly. Left out: tests of the built bundle (they do not see a mutant), of the browser, of the dev
 * server, and those that start Python for their expected values (run once per file they would make
 * every mutant cost seconds; their values are checked in the normal suite).
 */
import { defineConfig } from "vitest/config";

export default defineConfig({
  test: {
    include: ["test/**/*.test.ts"],
    exclude: [
      "test/browser/**",
      "test/astropy.test.ts",
      "test/mpmath.test.ts",
      "test/bundleMemory.test.ts",
      "test/demo.test.ts",
      "test/devServer.test.ts",
      "test/hostSimulation.test.ts",
      "test/manifest.test.ts",
      "test/readme.test.ts",
      "test/sheetLanguage.test.ts",
      "test/skips.test.ts",
    ],
    testTimeout: 60_000,
  },
});
