/**
 * The tests Stryker runs against each mutant (npm run mutation): the ones that import the sources
 * directly, including the pane's logic in Node (paneLogic, formulaCalls, hostileWorkbook, and
 * excelHost against the fake host test/browser/fakeOffice.js loaded into Node). Left out: tests of the
 * built bundle (fuzz, rangeShapes, helpPage and the others below: they load test-artifacts/build/,
 * which a mutant never reaches), of the browser, of the dev server, those that start Python for their
 * expected values, the timed linearity checks of the formula and cell-text readers (formulaReadingTime, strangerTextLinear: beside
 * mutants run two at a time its ratios are noise, and it takes 13 s a mutant), and the slow-path
 * accuracy comparison (16 s, and it covers every distance: it alone
 * would make the run last hours; the closed forms, identities and published values below still check
 * the same code). The reference checks inside files that also hold ordinary tests (cmbFrame, growth,
 * extinction, …) skip themselves here: ZCELL_PYTHON names an interpreter that does not exist, as
 * test/skips.test.ts does (test/reference/python.ts). ZCELL_MUTATION thins the two grids of thousandths in
 * validation.test.ts to every 16th point (4,000 models a test outlast the timeout when instrumented).
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
      "test/formulaReadingTime.test.ts",
      "test/strangerTextLinear.test.ts",
      "test/fuzz.test.ts",
      "test/helpPage.test.ts",
      "test/hostSimulation.test.ts",
      "test/manifest.test.ts",
      "test/rangeShapes.test.ts",
      "test/readme.test.ts",
      "test/sheetLanguage.test.ts",
      "test/skips.test.ts",
    ],
    env: { ZCELL_PYTHON: "/nonexistent/python3", ZCELL_MUTATION: "1" },
    testTimeout: 60_000,
  },
});
