/**
 * The built help page (help.html, Excel's help link for every function) in chromium, as a person
 * reads it: an entry for every function of functions.json at the anchor its help URL names, an
 * example with its value in each, every link landing on something (or citing Microsoft's documentation), axe-core clean, and the pane's
 * colours in light and dark (the reader's prefers-color-scheme). Screenshots go to
 * test-artifacts/screenshots/help-light.png and help-dark.png (git-ignored).
 */
import { mkdirSync, readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import type { Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { testBuildDir } from "../testBuild.js";
import { axeSource, axeViolations, browserAvailable, startPageHost, type PageHost } from "./pageHost.js";

const root = fileURLToPath(new URL("../../", import.meta.url));
const shots = `${root}test-artifacts/screenshots/`;
const metadata = JSON.parse(readFileSync(`${testBuildDir}functions.json`, "utf8")) as { functions: { id: string; helpUrl: string }[] };

describe.runIf(browserAvailable())("the help page in chromium", () => {
  let host: PageHost;

  beforeAll(async () => {
    host = await startPageHost();
    mkdirSync(shots, { recursive: true });
  });

  afterAll(async () => {
    await host?.close();
  });

  async function open(colorScheme: "light" | "dark"): Promise<{ page: Page; errors: string[] }> {
    const page = await host.browser.newPage({ viewport: { width: 900, height: 1200 }, colorScheme });
    const errors: string[] = [];
    page.on("pageerror", (e) => errors.push(String(e)));
    page.on("console", (m) => m.type() === "error" && errors.push(m.text()));
    await page.route(/^https?:\/\/(?!127\.0\.0\.1)/, (route) => route.abort()); // nothing but the page's own files
    await page.goto(`${host.base}help.html`);
    await page.waitForLoadState("load");
    return { page, errors };
  }

  test("every function has its entry at the anchor its help URL names, with its signature and an example with its value", async () => {
    const { page, errors } = await open("light");
    expect(metadata.functions.length).toBeGreaterThan(60);
    for (const f of metadata.functions) {
      expect(new URL(f.helpUrl).hash, f.id).toBe(`#${f.id}`);
      const entry = page.locator(`article[id="${f.id}"]`);
      expect(await entry.count(), f.id).toBe(1);
      expect(await entry.locator("h4").textContent(), f.id).toMatch(new RegExp(`^ZC\\.${f.id}\\(`));
      const example = await entry.locator(".example").textContent();
      expect(example, f.id).toMatch(new RegExp(`^Example =ZC\\.${f.id}\\(`));
      const value = (await entry.locator(".example output, .example table").first().textContent()) ?? "";
      expect(value.trim(), f.id).not.toBe("");
      expect(value, f.id).not.toMatch(/#VALUE!|#NUM!|#N\/A/);
    }
    expect(await page.locator("article.fn").count()).toBe(metadata.functions.length);
    expect(errors).toEqual([]);
    await page.close();
  });

  test("every link lands on something: an anchor of the page, or a file the build holds", async () => {
    const { page } = await open("light");
    const hrefs = await page.locator("a[href]").evaluateAll((links) => links.map((a) => a.getAttribute("href") ?? ""));
    expect(hrefs.length).toBeGreaterThan(metadata.functions.length);
    const ids = new Set(await page.locator("[id]").evaluateAll((nodes) => nodes.map((n) => n.id)));
    for (const href of new Set(hrefs)) {
      if (href.startsWith("#")) expect(ids.has(decodeURIComponent(href.slice(1))), href).toBe(true);
      // a source cited beside a claim about Excel: Microsoft's documentation (not fetched here: no network)
      else if (/^https:\/\/(?:learn|support)\.microsoft\.com\//.test(href)) continue;
      else {
        expect(href, "a link off the page").not.toMatch(/^[a-z]+:/i);
        expect((await page.request.get(new URL(href, `${host.base}help.html`).href)).status(), href).toBe(200);
      }
    }
    await page.close();
  });

  test.each(["light", "dark"] as const)("%s: the pane's colours, and axe-core finds no WCAG 2.2 A/AA or best-practice violation", async (scheme) => {
    const { page, errors } = await open(scheme);
    // taskpane.css: --bg #ffffff / --fg #242424 light, #1f1f1f / #f0f0f0 dark (the pane's palette)
    const colours = await page.evaluate(() => {
      const style = getComputedStyle(document.body);
      return { bg: style.backgroundColor, fg: style.color };
    });
    expect(colours).toEqual(scheme === "light" ? { bg: "rgb(255, 255, 255)", fg: "rgb(36, 36, 36)" } : { bg: "rgb(31, 31, 31)", fg: "rgb(240, 240, 240)" });
    await page.evaluate(axeSource);
    expect(await axeViolations(page)).toEqual([]);
    await page.screenshot({ path: `${shots}help-${scheme}.png` });
    await page.locator('article[id="LUMINOSITY_FUNCTION"]').screenshot({ path: `${shots}help-entry-${scheme}.png` });
    expect(errors).toEqual([]);
    await page.close();
  });
});
