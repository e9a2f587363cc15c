/**
 * What the browser tests share: the tests' build served on a free loopback port (with extra pages
 * where a test needs one), Debian chromium launched headless with the machine's flags, the check
 * that chromium is there at all, and axe-core's accessibility check of a page.
 */
import { existsSync, readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { createServer } from "node:http";
import { extname, join } from "node:path";
import { chromium, type Browser, type Page } from "playwright-core";
import { toolAvailable } from "../requirements.js";
import { testBuildDir } from "../testBuild.js";

const chromiumPath = "/usr/bin/chromium";

/** True when Debian chromium is installed; in CI its absence is an error, elsewhere a skip with a hint. */
export function browserAvailable(): boolean {
  return toolAvailable(existsSync(chromiumPath), "Debian chromium is not installed: apt-get install -y chromium to run the browser tests");
}

/** A running page host: the base URL of the served build, the browser, and how to stop both. */
export interface PageHost {
  base: string;
  browser: Browser;
  close(): Promise<void>;
}

/**
 * Serves the tests' build ("/" is taskpane.html) and launches chromium.
 * @param pages extra pages by path, e.g. { "/runtime-test.html": "<!doctype html>…" }
 */
export async function startPageHost(pages: Record<string, string> = {}): Promise<PageHost> {
  const server = createServer((req, res) => {
    const path = new URL(req.url ?? "/", "http://localhost").pathname;
    if (path in pages) return void res.writeHead(200, { "content-type": "text/html" }).end(pages[path]);
    const file = join(testBuildDir, path === "/" ? "taskpane.html" : path);
    if (!file.startsWith(testBuildDir) || !existsSync(file)) return void res.writeHead(404).end();
    const type = { ".html": "text/html", ".js": "text/javascript", ".css": "text/css", ".png": "image/png" }[extname(file)];
    res.writeHead(200, { "content-type": type ?? "application/octet-stream" }).end(readFileSync(file));
  });
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  const address = server.address();
  const base = `http://127.0.0.1:${typeof address === "object" && address ? address.port : 0}/`;
  const browser = await chromium.launch({
    executablePath: chromiumPath,
    args: ["--headless", "--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run"],
  });
  return {
    base,
    browser,
    close: async () => {
      await browser.close();
      await new Promise((r) => server.close(r));
    },
  };
}

/** axe-core's script, to evaluate in a page before `axeViolations`. */
export const axeSource = readFileSync(fileURLToPath(new URL("../../node_modules/axe-core/axe.min.js", import.meta.url)), "utf8");

/** axe-core's violations of the WCAG 2.0–2.2 A/AA rules and of its best practices, as "rule: targets". */
export async function axeViolations(page: Page): Promise<string[]> {
  return page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run(ctx: Document, opts: object): Promise<{ passes: unknown[]; violations: { id: string; nodes: { target: string[] }[] }[] }> } }).axe;
    const tags = ["wcag2a", "wcag2aa", "wcag21a", "wcag21aa", "wcag22a", "wcag22aa", "best-practice"];
    const result = await axe.run(document, { runOnly: { type: "tag", values: tags } });
    if (result.passes.length < 10) throw new Error(`axe checked too little: ${result.passes.length} rules passed`);
    return result.violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(" ")).join(", ")}`);
  });
}

const fakeOffice = readFileSync(fileURLToPath(new URL("./fakeOffice.js", import.meta.url)), "utf8");

/** What the fake host starts with (test/browser/fakeOffice.js reads it as window.__fakeInit). */
export interface FakeInit {
  theme?: object;
  settings?: Record<string, unknown>;
  sheets?: Record<string, Record<string, { formula?: string; value?: unknown }>>;
  selection?: string;
  excelApi?: string;
  protectedSheets?: string[];
  [option: string]: unknown;
}

/** A page of the pane with the errors it threw collected. */
export type PanePage = Page & { errors: string[] };

/**
 * Opens the built pane at the pane's narrowest width (320 px) with the fake host serving office.js.
 * @param officeAvailable false: the office.js request fails, as outside Office
 * @param beforeLoad a script run in the page before any of its own (e.g. to observe long tasks)
 */
export async function openPane(host: PageHost, init: FakeInit, officeAvailable = true, beforeLoad?: () => void): Promise<PanePage> {
  const page = (await host.browser.newPage({ viewport: { width: 320, height: 900 } })) as PanePage;
  page.errors = [];
  page.on("pageerror", (e) => page.errors.push(String(e)));
  await page.route("https://appsforoffice.microsoft.com/**", (route) =>
    officeAvailable ? route.fulfill({ contentType: "text/javascript", body: fakeOffice }) : route.abort(),
  );
  await page.addInitScript((value) => {
    (window as unknown as { __fakeInit: unknown }).__fakeInit = value;
  }, init);
  if (beforeLoad) await page.addInitScript(beforeLoad);
  await page.goto(`${host.base}taskpane.html`);
  return page;
}

/** A copy of part of the fake host's state, e.g. fakeState(page, "sheets.Sheet1"). */
export function fakeState(page: Page, path: string): Promise<unknown> {
  return page.evaluate(`JSON.parse(JSON.stringify(window.__fake.${path}))`);
}

/** Selects cells as a person would (the pane hears the selection event). */
export function selectCells(page: Page, address: string): Promise<void> {
  return page.evaluate((a) => (window as unknown as { __fake: { select(a: string): void } }).__fake.select(a), address);
}
