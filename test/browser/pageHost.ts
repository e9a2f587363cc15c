/**
 * What the browser tests share: the tests' build served on a free loopback port (with extra pages
 * where a test needs one), Debian chromium launched headless with the machine's flags, and the
 * check that chromium is there at all.
 */
import { existsSync, readFileSync } from "node:fs";
import { createServer } from "node:http";
import { extname, join } from "node:path";
import { chromium, type Browser } from "playwright-core";
import { testBuildDir } from "../testBuild.js";

const chromiumPath = "/usr/bin/chromium";

/** True when Debian chromium is installed; in CI its absence is an error, elsewhere a skip with a hint. */
export function browserAvailable(): boolean {
  if (existsSync(chromiumPath)) return true;
  const hint = "Debian chromium is not installed: apt-get install -y chromium to run the browser tests";
  if (process.env.CI === "true") throw new Error(`CI needs ${hint}`);
  console.warn(`skipping: ${hint}`);
  return false;
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
