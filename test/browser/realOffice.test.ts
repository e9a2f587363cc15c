/**
 * The pages and the functions against Microsoft's real libraries (the pinned @microsoft/office-js
 * package served for the CDN URL), not our fake host: office.js loaded outside Office under the
 * pane's Content-Security-Policy, and the custom-functions runtime's own CustomFunctions.Error,
 * ErrorCode and associate taking our bundle.
 */
import { existsSync, readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { testBuildDir } from "../testBuild.js";
import { browserAvailable, startPageHost, type PageHost } from "./pageHost.js";

const root = fileURLToPath(new URL("../../", import.meta.url));
const officeDist = `${root}node_modules/@microsoft/office-js/dist/`;
const cdnPrefix = "https://appsforoffice.microsoft.com/lib/1/hosted/";

/**
 * What the pane's policy blocks when the real office.js loads outside Office (measured here): both
 * come from office.js's telemetry proxy frame (an iframe given style="display:none" and pointed at
 * Microsoft's telemetry service). They stay blocked: zcell sends nothing anywhere, and the pane works
 * without them (this test). What office.js needs inside Office cannot be measured here; the policy
 * follows what Microsoft documents (cited beside it in taskpane/taskpane.html).
 */
const expectedViolations = [
  { directive: "style-src-attr", blocked: "inline", source: `${cdnPrefix}o15apptofilemappingtable.js` },
  { directive: "frame-src", blocked: "https://telemetryservice.firstpartyapps.oaspapps.com", source: "" },
];

describe("the pane's Content-Security-Policy", () => {
  const directives = (html: string) => {
    const policy = /http-equiv="?Content-Security-Policy"?\s+content="([^"]*)"/.exec(html)![1];
    return Object.fromEntries(policy.split(";").map((d) => d.trim().split(/\s+/)).map(([name, ...sources]) => [name, sources.join(" ")]));
  };

  test("is the one decided from Microsoft's documentation, cited beside it: office.js's CDN folder for scripts, the rest our own or blocked", () => {
    const source = readFileSync(`${root}taskpane/taskpane.html`, "utf8");
    expect(directives(source)).toEqual({
      "default-src": "'self'",
      "script-src": "'self' https://appsforoffice.microsoft.com/lib/1/hosted/", // office.js and its host scripts (Microsoft, "Referencing the Office JavaScript API library from its CDN")
      "style-src": "'self'", // no inline style: office.js's telemetry frame stays blocked
      "img-src": "'self' data:",
      "connect-src": "'self'",
      "font-src": "'self'",
      "frame-src": "'none'", // no frame at all, the telemetry page included
      "object-src": "'none'",
      "base-uri": "'self'",
      "form-action": "'none'",
    });
    const comment = source.slice(0, source.indexOf('http-equiv="Content-Security-Policy"'));
    for (const cited of ["learn.microsoft.com/office/dev/add-ins/develop/", "learn.microsoft.com/office/dev/add-ins/concepts/privacy-and-security", "OfficeDev/office-js issue 1005"]) {
      expect(comment).toContain(cited);
    }
    // the built page (and so the dev server's header) carries the same policy
    expect(directives(readFileSync(`${testBuildDir}taskpane.html`, "utf8"))).toEqual(directives(source));
  });
});

describe.runIf(browserAvailable())("against the real office.js and custom-functions runtime", () => {
  let host: PageHost;
  let base = "";
  let browser: Browser;

  beforeAll(async () => {
    // a bare page: the real runtime, a spy on associate, then our bundle (as Excel's runtime loads it)
    const runtimePage = `<!doctype html><html lang="en"><head><title>runtime</title>
<script src="${cdnPrefix}custom-functions-runtime.js"></script>
<script>window.__associated = []; const real = CustomFunctions.associate.bind(CustomFunctions);
CustomFunctions.associate = (id, fn) => { window.__associated.push(id); window.__fns = window.__fns || {}; window.__fns[id] = fn; return real(id, fn); };</script>
<script src="/functions.js"></script></head><body></body></html>`;
    host = await startPageHost({ "/runtime-test.html": runtimePage });
    ({ base, browser } = host);
  });

  afterAll(async () => {
    await host?.close();
  });

  /** A page whose CDN requests are served from the pinned package, recording CSP violations and errors. */
  async function open(path: string): Promise<{ page: Page; violations: () => Promise<unknown[]>; errors: string[]; cdn: string[] }> {
    const page = await browser.newPage();
    const errors: string[] = [];
    const cdn: string[] = [];
    page.on("pageerror", (e) => errors.push(String(e)));
    await page.route(`${cdnPrefix}**`, (route) => {
      const file = officeDist + route.request().url().slice(cdnPrefix.length);
      cdn.push(route.request().url().slice(cdnPrefix.length));
      return existsSync(file) ? route.fulfill({ contentType: "text/javascript", body: readFileSync(file) }) : route.abort();
    });
    await page.route(/^https:\/\/(?!appsforoffice\.microsoft\.com\/lib\/1\/hosted\/)/, (route) => route.abort()); // no other network
    await page.addInitScript(() => {
      const seen: unknown[] = ((window as unknown as { __violations: unknown[] }).__violations = []);
      document.addEventListener("securitypolicyviolation", (e) => seen.push({ directive: e.violatedDirective, blocked: e.blockedURI, source: e.sourceFile }));
    });
    await page.goto(`${base}${path}`);
    return { page, errors, cdn, violations: () => page.evaluate(() => (window as unknown as { __violations: unknown[] }).__violations) };
  }

  test("the pane with the real office.js outside Office: its outside view, no page error, only the known violations", async () => {
    const { page, violations, errors, cdn } = await open("taskpane.html");
    await expect.poll(() => page.locator("#outside-office").isVisible(), { timeout: 15_000 }).toBe(true);
    expect(await page.locator("#reference dt").count()).toBe(78);
    expect(await page.locator("#in-excel").isHidden()).toBe(true);
    await expect.poll(async () => (await violations()).length, { timeout: 10_000 }).toBeGreaterThanOrEqual(expectedViolations.length);
    await page.waitForTimeout(500);
    expect(await violations()).toEqual(expectedViolations);
    expect(errors).toEqual([]);
    expect(cdn).toContain("office.js");
    await page.close();
  });

  test("what the real Office.onReady reports outside Office is what the pane's start-up expects", async () => {
    const { page } = await open("taskpane.html");
    const info = await page.evaluate(async () => {
      const office = (window as unknown as { Office: { onReady(): Promise<{ host: unknown; platform: unknown }>; HostType: { Excel: string } } }).Office;
      const ready = await office.onReady();
      return { host: ready.host, platform: ready.platform, excel: office.HostType.Excel };
    });
    // the pane shows its outside view when onReady's host is not HostType.Excel (taskpane.ts start)
    expect(info).toEqual({ host: null, platform: null, excel: "Excel" });
    await page.close();
  });

  test("help.html loads with no policy violation and no error", async () => {
    const { page, violations, errors } = await open("help.html");
    await page.waitForLoadState("load");
    expect(await violations()).toEqual([]);
    expect(errors).toEqual([]);
    await page.close();
  });

  test("our bundle loads after the real runtime and registers every function through its associate", async () => {
    const { page, errors } = await open("runtime-test.html");
    await page.waitForLoadState("load");
    const metadata = JSON.parse(readFileSync(`${testBuildDir}functions.json`, "utf8")) as { functions: { id: string }[] };
    const associated = await page.evaluate(() => (window as unknown as { __associated: string[] }).__associated);
    expect([...associated].sort()).toEqual(metadata.functions.map((f) => f.id).sort());
    expect(errors).toEqual([]);
    await page.close();
  });

  test("errors are the real runtime's CustomFunctions.Error with its codes, messages carried for #VALUE! and #N/A", async () => {
    const { page } = await open("runtime-test.html");
    await page.waitForLoadState("load");
    const out = await page.evaluate(async () => {
      const cf = (window as unknown as { CustomFunctions: { Error: new (code: string, message?: string) => { code: string; message: string }; ErrorCode: Record<string, string> } }).CustomFunctions;
      const fns = (window as unknown as { __fns: Record<string, (...a: unknown[]) => unknown> }).__fns;
      const cell = async (id: string, ...args: unknown[]) => (await fns[id](...args) as unknown[][])[0][0] as { code: string; message: string };
      const value = await cell("DIST_LUM", [["abc"]]);
      const na = await cell("REDSHIFT", [[20]], "LOOKBACK");
      const num = await cell("DIST_LUM", [[-1]]);
      return {
        codes: { invalidValue: cf.ErrorCode.invalidValue, notAvailable: cf.ErrorCode.notAvailable, invalidNumber: cf.ErrorCode.invalidNumber },
        value: { real: value instanceof cf.Error, code: value.code, message: value.message },
        na: { real: na instanceof cf.Error, code: na.code, message: na.message },
        num: { real: num instanceof cf.Error, code: num.code },
      };
    });
    // the codes zcell uses exist in the runtime (custom-functions-runtime.js of @microsoft/office-js 1.1.110)
    expect(out.codes).toEqual({ invalidValue: "#VALUE!", notAvailable: "#N/A", invalidNumber: "#NUM!" });
    expect(out.value).toEqual({ real: true, code: "#VALUE!", message: 'ZC.DIST_LUM: z: text "abc" where a number belongs' });
    expect(out.na.real).toBe(true);
    expect(out.na.code).toBe("#N/A");
    expect(out.na.message).toMatch(/^ZC.REDSHIFT: LOOKBACK = 20 Gyr is not below the age of the universe/);
    expect(out.num).toEqual({ real: true, code: "#NUM!" });
    await page.close();
  });

  test("the catalogue functions registered with the real runtime give numbers, and #N/A with the reason", async () => {
    const { page } = await open("runtime-test.html");
    await page.waitForLoadState("load");
    const out = await page.evaluate(async () => {
      const fns = (window as unknown as { __fns: Record<string, (...a: unknown[]) => unknown> }).__fns;
      const cell = async (id: string, ...args: unknown[]) => (await fns[id](...args) as unknown[][])[0][0];
      const never = (await cell("REDSHIFT_LIMIT_MAG", [[-30]], [[30]], [[3]])) as { code: string; message: string };
      return { dimming: await cell("DIMMING", [[1]]), mBol: await cell("MAG_BOL", [[1]], "Lsun"), never: { code: never.code, message: never.message } };
    });
    expect(Math.abs((out.dimming as number) - 10 * Math.log10(2))).toBeLessThanOrEqual(1e-14); // Tolman: 10 log10(1+z)
    expect(Math.abs((out.mBol as number) - 4.74)).toBeLessThanOrEqual(5e-3); // IAU 2015 B2: L☉ nominal has M_bol = 4.74
    expect(out.never.code).toBe("#N/A");
    expect(out.never.message).toMatch(/^ZC\.REDSHIFT_LIMIT_MAG: the source stays at or brighter than the magnitude limit/);
    await page.close();
  });
});
