/**
 * The help page is built from the same declarations and definitions as the add-in, so it cannot
 * drift: an entry for every worksheet function with an example, the example's value the one a cell
 * gives (checked for distances and times against the independent slow path), the presets as
 * core/model/presets.ts lists them, and nothing for contributors (no npm, no localhost, no source
 * files). Reads the tests' build (test-artifacts/build/help.html) and the generator itself.
 */
import { readFileSync } from "node:fs";
import { describe, expect, test } from "vitest";
import { presets } from "../core/index.js";
import { definitions } from "../functions/definitions.js";
import { functionEntries, guideSections } from "../scripts/helpPage.js";
import { publishedModels } from "./fixtures.js";
import { expectRelative } from "./helpers.js";
import { SlowCosmology } from "./reference/slowCosmology.js";
import { testBuildDir } from "./testBuild.js";

const page = () => readFileSync(`${testBuildDir}help.html`, "utf8");
/** The built page's text of one function's entry (the minifier may drop quotes around attributes). */
function entryOf(html: string, name: string): string {
  const start = html.search(new RegExp(`<article class="?fn"? id="?${name}"?[ >]`));
  expect(start, name).toBeGreaterThanOrEqual(0);
  return html.slice(start, html.indexOf("</article>", start));
}

/** What contributors read and users of the add-in do not: commands, the local server, source files. */
const contributorText = /localhost|127\.0\.0\.1|\bnpm\b|DEVELOPERS|CHANGELOG|\btest\/|\.test\.ts|\b\w+\.(?:ts|mjs)\b|git clone|For contributors|Stryker|vitest/;

describe("help page", () => {
  test("every worksheet function has an entry with an example from its declaration, and nothing else has one", async () => {
    const entries = await functionEntries();
    expect(entries.map((e) => e.name).sort()).toEqual(Object.keys(definitions).sort());
    const missing = entries.filter((e) => !e.example).map((e) => `${e.name}: add "@example =ZC.${e.name}(…)" to its declaration`);
    expect(missing).toEqual([]);
    for (const e of entries) expect(e.example, e.name).toMatch(new RegExp(`^=ZC\\.${e.name}\\(`));
  });

  test("every example computes: a value, no error, and an entry says what it computes and how", async () => {
    for (const e of await functionEntries()) {
      expect(e.explanation?.isError, `${e.example} gave ${e.explanation?.result}`).toBe(false);
      expect(e.cells!.flat().every((c) => typeof c === "number" || (typeof c === "string" && c !== "")), e.name).toBe(true);
      expect(e.explanation!.summary, e.name).not.toBe("");
      expect(e.explanation!.methodPlain, e.name).not.toBe("");
      for (const p of e.parameters) expect(p.description, `${e.name} ${p.name}`).not.toBe("");
    }
  });

  test.each([
    // example in the page        | expected under P18-CMB from the independent slow path, parameters of Planck 2018 VI Table 2
    ["=ZC.DIST_LUM(1)",            (s: SlowCosmology) => `${s.luminosityDistanceMpc(1)} Mpc`],
    ["=ZC.DIST_ANG(1.5)",          (s: SlowCosmology) => `${s.angularDiameterDistanceMpc(1.5)} Mpc`],
    ["=ZC.LOOKBACK(2)",            (s: SlowCosmology) => `${s.lookbackTimeGyr(2)} Gyr`],
    ["=ZC.AGE()",                  (s: SlowCosmology) => `${s.ageGyr(0)} Gyr`],
  ])("the built page shows %s with the value a cell gives (6 significant digits)", (example, expected) => {
    const slow = new SlowCosmology(publishedModels["P18-CMB"]);
    const name = /ZC\.(\w+)/.exec(example)![1];
    const entry = entryOf(page(), name);
    expect(entry).toContain(`<code>${example}</code>`);
    const [, shown, unit] = /<output>([-\d.E+]+) (\w+)<\/output>/.exec(entry)!;
    const [value, expectedUnit] = expected(slow).split(" ");
    expect(unit).toBe(expectedUnit);
    expectRelative(Number(shown), Number(value), 5e-6, example); // the page shows 6 significant digits
  });

  test("the page says which model every example assumes, and the default model in words", () => {
    const html = page();
    expect(html).toMatch(/P18-CMB: flat: matter \+ Λ \+ radiation; H0 = 67\.36 km\/s\/Mpc/);
    expect(entryOf(html, "DIST_LUM")).toMatch(/under <code>P18-CMB<\/code>, the workbook's model \(the formula names none\)/);
    expect(entryOf(html, "DESCRIBE")).toMatch(/under <code>W9-ALL<\/code>\./);
  });

  test("the presets are listed from core/model/presets.ts with their sources and former names", () => {
    const html = page().replaceAll("&amp;", "&"); // the build's minifier writes a bare & where HTML allows it
    for (const p of presets) {
      expect(html).toContain(`<code>${p.name}</code>`);
      expect(html).toContain(p.description);
    }
    expect(html).toContain("called DR2-CMB before zcell 0.3.0");
  });

  test("the users' sections are there, the contributors' are not, and the page holds no contributor text", () => {
    const html = page();
    for (const heading of [...guideSections.before, ...guideSections.after, "Worksheet functions", "Reporting a problem", "What zcell computes"]) {
      expect(html, heading).toMatch(new RegExp(`<h[23] id="?[a-z-]+"?>${heading}</h[23]>`));
    }
    for (const heading of ["Install and start", "Testing", "For contributors", "A quick tour", "Function reference"]) expect(html, heading).not.toContain(`>${heading}`);
    expect(contributorText.exec(html)?.[0]).toBeUndefined();
  });

  test("the contributor-text check finds what it is there for", () => {
    for (const text of ["npm start", "https://localhost:3000", "see DEVELOPERS.md", "as test/astropy.test.ts does", "scripts/start.mjs"]) expect(contributorText.test(text), text).toBe(true);
    for (const text of ["=ZC.DIST_LUM(1)", "Planck 2018 VI, A&A 641, A6", "erg/s/cm2", "P18-CMB; H0=73"]) expect(contributorText.test(text), text).toBe(false);
  });
});
