/**
 * The pane's start as a user feels it (a budget, not a test): the production build served on
 * loopback, opened in Debian's headless chromium with our fake Office host standing in for
 * office.js, in a fresh browser context each time; the time from navigation start until the pane is
 * interactive (the workbook's model shown in the form and Apply enabled), min and median of several
 * loads.
 */
import { readFileSync } from "node:fs";
import { createServer } from "node:http";
import { extname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { chromium } from "playwright-core";

const root = fileURLToPath(new URL("..", import.meta.url));
const types: Record<string, string> = { ".html": "text/html", ".js": "text/javascript", ".css": "text/css", ".png": "image/png", ".json": "application/json" };

/**
 * ms from navigation start to an interactive pane, min and median over `loads` fresh contexts.
 * @param buildDir the built add-in (taskpane.html and its scripts)
 */
export async function paneInteractiveMs(buildDir: string, loads = 7): Promise<{ min: number; median: number }> {
  const fake = readFileSync(`${root}test/browser/fakeOffice.js`, "utf8");
  const server = createServer((req, res) => {
    const path = new URL(req.url ?? "/", "http://localhost").pathname;
    try {
      const body = readFileSync(join(buildDir, path === "/" ? "taskpane.html" : path));
      res.writeHead(200, { "content-type": types[extname(path)] ?? "application/octet-stream" }).end(body);
    } catch {
      res.writeHead(404).end();
    }
  });
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  const port = (server.address() as { port: number }).port;
  const browser = await chromium.launch({
    executablePath: "/usr/bin/chromium",
    args: ["--headless", "--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run"],
  });
  const times: number[] = [];
  try {
    for (let i = 0; i < loads; i++) {
      const context = await browser.newContext({ viewport: { width: 320, height: 900 } });
      const page = await context.newPage();
      await page.route("https://appsforoffice.microsoft.com/**", (route) => route.fulfill({ contentType: "text/javascript", body: fake }));
      await page.addInitScript(() => {
        (window as unknown as { __fakeInit: unknown }).__fakeInit = { settings: { "zcell.activeModel": "W9-ALL" }, sheets: { Sheet1: { A1: { formula: "=ZC.AGE()", value: 13.8 } } } };
      });
      await page.goto(`http://127.0.0.1:${port}/taskpane.html`);
      await page.waitForFunction(() => {
        const apply = document.getElementById("apply") as (HTMLElement & { disabled?: boolean }) | null;
        return document.getElementById("model-badge")?.textContent === "Workbook model: W9-ALL" && apply !== null && !apply.disabled;
      });
      times.push(await page.evaluate(() => performance.now()));
      await context.close();
    }
  } finally {
    await browser.close();
    server.close();
  }
  times.sort((a, b) => a - b);
  return { min: times[0], median: times[Math.floor(times.length / 2)] };
}
