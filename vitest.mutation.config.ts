/**
 * The tests Stryker runs against each mutant (npm run mutation): the ones that import the sources
 * directly. Left out: tests of the built bundle (they do not see a mutant), of the browser, of the dev
 * server, those that start Python for their expected values, and the slow-path accuracy comparison
 * (16 s, and it covers every distance: it alone would make the run last hours; the closed forms,
 * identities and published values below still check the same code).
 */
import { defineConfig } from "vitest/config";

export default defineConfig({
  test: {
    include: ["test/**/*.test.ts"],
    exclude: [
      "test/browser/**",
      "test/accuracy.test.ts",
      "test/astropy.test.ts",
      "test/mpmath.test.ts",
      "test/positionsReference.test.ts",
      "test/velocitiesReference.test.ts",
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
