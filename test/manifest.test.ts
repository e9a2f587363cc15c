/**
 * Offline checks of the add-in manifest (the online validator is unreachable here): it parses, its
 * elements stand in the order the schema requires, ids are unique, every resid resolves, and a
 * production build for another host rewrites every URL.
 */
import { execFileSync } from "node:child_process";
import { mkdtempSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { XMLParser, XMLValidator } from "fast-xml-parser";
import { describe, expect, test } from "vitest";

const root = fileURLToPath(new URL("..", import.meta.url));
const source = readFileSync(`${root}manifest/manifest.xml`, "utf8");

type Node = Record<string, unknown>;
const parser = new XMLParser({ preserveOrder: true, ignoreAttributes: false, attributeNamePrefix: "@" });
const tree = parser.parse(source) as Node[];

const nameOf = (n: Node) => Object.keys(n).find((k) => k !== ":@")!;
const childrenOf = (n: Node) => (n[nameOf(n)] as Node[]) ?? [];
const attrs = (n: Node) => (n[":@"] as Record<string, string>) ?? {};
const elementNames = (n: Node) => childrenOf(n).map(nameOf).filter((k) => k !== "#text" && k !== "#comment");

function find(n: Node, path: string[]): Node {
  let current = n;
  for (const name of path) {
    const next = childrenOf(current).find((c) => nameOf(c) === name);
    if (!next) throw new Error(`missing ${path.join("/")}`);
    current = next;
  }
  return current;
}

function walk(n: Node, visit: (n: Node) => void): void {
  visit(n);
  for (const c of childrenOf(n)) if (typeof c === "object" && !("#text" in c)) walk(c, visit);
}

/** True when `names` appear in the order of `schemaOrder` (each name at most where the schema allows). */
function inSchemaOrder(names: string[], schemaOrder: string[]): boolean {
  let last = -1;
  for (const name of names) {
    const index = schemaOrder.indexOf(name);
    if (index < last || index < 0) return false;
    last = index;
  }
  return true;
}

const app = tree.find((n) => nameOf(n) === "OfficeApp")!;

describe("manifest.xml", () => {
  test("is well-formed XML for a task-pane add-in of the Workbook host", () => {
    expect(XMLValidator.validate(source)).toBe(true);
    expect(attrs(app)["@xsi:type"]).toBe("TaskPaneApp");
    expect(find(app, ["Hosts", "Host"])[":@"]).toEqual({ "@Name": "Workbook" });
    expect(String((find(app, ["Id"]).Id as Node[])[0]["#text"])).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
  });

  // Element order of the OfficeApp (TaskPaneApp) type and of VersionOverrides V1.0 (Office add-in
  // manifest schema, offappmanifest-1.1 and taskpaneappversionoverrides-1.0; from memory).
  test.each([
    // element path                                                        schema order
    [[],
      ["Id", "AlternateId", "Version", "ProviderName", "DefaultLocale", "DisplayName", "Description", "IconUrl",
       "HighResolutionIconUrl", "SupportUrl", "AppDomains", "Hosts", "Requirements", "DefaultSettings", "Permissions",
       "AllowSnapshot", "VersionOverrides"]],
    [["VersionOverrides"], ["Description", "Requirements", "Hosts", "Resources"]],
    [["VersionOverrides", "Hosts", "Host"], ["Runtimes", "AllFormFactors", "DesktopFormFactor", "MobileFormFactor"]],
    [["VersionOverrides", "Hosts", "Host", "AllFormFactors", "ExtensionPoint"], ["Script", "Page", "Metadata", "Namespace"]],
    [["VersionOverrides", "Hosts", "Host", "DesktopFormFactor"], ["GetStarted", "FunctionFile", "ExtensionPoint"]],
    [["VersionOverrides", "Resources"], ["bt:Images", "bt:Urls", "bt:ShortStrings", "bt:LongStrings"]],
    [["VersionOverrides", "Hosts", "Host", "DesktopFormFactor", "ExtensionPoint", "OfficeTab", "Group"], ["Label", "Icon", "Control"]],
    [["VersionOverrides", "Hosts", "Host", "DesktopFormFactor", "ExtensionPoint", "OfficeTab", "Group", "Control"], ["Label", "Supertip", "Icon", "Action"]],
  ])("children of /%j stand in schema order", (path, order) => {
    expect(elementNames(find(app, path as string[]))).toSatisfy((names: string[]) => inSchemaOrder(names, order as string[]));
  });

  test("declares the shared runtime, custom functions in namespace ZC, and document access", () => {
    const sets = childrenOf(find(app, ["Requirements", "Sets"])).map(attrs);
    expect(sets).toContainEqual({ "@Name": "SharedRuntime", "@MinVersion": "1.1" });
    expect(sets).toContainEqual({ "@Name": "CustomFunctionsRuntime", "@MinVersion": "1.3" });
    expect(String((find(app, ["Permissions"]).Permissions as Node[])[0]["#text"])).toBe("ReadWriteDocument");
    expect(attrs(find(app, ["VersionOverrides", "Hosts", "Host", "Runtimes", "Runtime"]))).toEqual({ "@resid": "Taskpane.Url", "@lifetime": "long" });
    expect(source).toMatch(/<bt:String id="Functions.Namespace" DefaultValue="ZC"\/>/);
    expect(attrs(find(app, ["VersionOverrides", "Hosts", "Host", "DesktopFormFactor", "ExtensionPoint", "OfficeTab"]))).toEqual({ "@id": "TabHome" });
  });

  test("ids are unique and every resid resolves to a resource", () => {
    const ids: string[] = [];
    const resids: string[] = [];
    walk(app, (n) => {
      const a = attrs(n);
      if (a["@id"]) ids.push(a["@id"]);
      if (a["@resid"]) resids.push(a["@resid"]);
    });
    expect(new Set(ids).size).toBe(ids.length);
    const resources = new Set<string>();
    walk(find(app, ["VersionOverrides", "Resources"]), (n) => {
      if (attrs(n)["@id"]) resources.add(attrs(n)["@id"]);
    });
    for (const r of resids) expect(resources.has(r), r).toBe(true);
    expect(resids.length).toBeGreaterThan(10);
  });

  test("icons of 16, 32, 64 and 80 px exist as PNG files of those sizes", () => {
    for (const size of [16, 32, 64, 80]) {
      const png = readFileSync(`${root}manifest/assets/icon-${size}.png`);
      expect(png.subarray(1, 4).toString()).toBe("PNG");
      expect(png.readUInt32BE(16)).toBe(size);
      expect(png.readUInt32BE(20)).toBe(size);
    }
  });

  test("a production build for a hosting URL rewrites every URL of the manifest and the metadata", () => {
    const out = mkdtempSync(join(tmpdir(), "zcell-build-"));
    execFileSync(process.execPath, [`${root}node_modules/webpack/bin/webpack.js`, "--mode", "production", "--env", "url=https://astro.example.org/zcell", "--output-path", out], { cwd: root, stdio: "ignore" });
    const built = readFileSync(join(out, "manifest.xml"), "utf8");
    const metadata = readFileSync(join(out, "functions.json"), "utf8");
    expect(built).not.toMatch(/localhost/);
    expect(metadata).not.toMatch(/localhost/);
    expect(built).toMatch(/DefaultValue="https:\/\/astro.example.org\/zcell\/functions.js"/);
    expect(built).toMatch(/<AppDomain>https:\/\/astro.example.org<\/AppDomain>/);
    const urls = [...built.matchAll(/https:\/\/[^"<]+/g)].map((m) => m[0]);
    for (const url of urls) expect(url.startsWith("https://astro.example.org"), url).toBe(true);
    expect(urls.filter((u) => !u.startsWith("https://astro.example.org/zcell/"))).toEqual(["https://astro.example.org"]);
  });
});

describe("help links", () => {
  test("every function's help URL points at a section that exists in help.html", () => {
    const help = readFileSync(`${root}dist/help.html`, "utf8");
    const metadata = JSON.parse(readFileSync(`${root}dist/functions.json`, "utf8")) as { functions: { helpUrl: string }[] };
    const anchors = new Set(metadata.functions.map((f) => new URL(f.helpUrl).hash.slice(1)));
    expect(anchors.size).toBeGreaterThan(3);
    for (const anchor of anchors) expect(help, anchor).toMatch(new RegExp(`id="?${anchor}"?[ >]`));
  });
});
