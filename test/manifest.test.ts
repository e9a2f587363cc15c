/**
 * Offline checks of the add-in manifest (Microsoft's validation service is unreachable here): a strict
 * XML parser (saxes) and, where Debian's libxml2-utils is installed, xmllint accept the source and
 * both builds; elements stand in the schema's order; ids are unique; every resid resolves; a
 * build for a hosting URL rewrites every URL. Mutated manifests show that the check can fail.
 */
import { execFileSync, spawnSync } from "node:child_process";
import { mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, test } from "vitest";
import { toolAvailable } from "./requirements.js";
import { checkManifest, parseStrictXml, type ManifestElement } from "../scripts/checkManifest.js";
import { testBuildDir } from "./testBuild.js";

const root = fileURLToPath(new URL("..", import.meta.url));
const source = readFileSync(`${root}manifest/manifest.xml`, "utf8");
const app = parseStrictXml(source);

/** A build for a web server other than localhost, made once for the tests that need it. */
let hostedBuild: string | undefined;
function hosted(): string {
  if (!hostedBuild) {
    hostedBuild = mkdtempSync(join(tmpdir(), "zcell-build-"));
    execFileSync(process.execPath, [`${root}node_modules/webpack/bin/webpack.js`, "--mode", "production", "--env", "url=https://astro.example.org/zcell", "--output-path", hostedBuild], { cwd: root, stdio: "ignore" });
  }
  return hostedBuild;
}

function find(element: ManifestElement, path: string[]): ManifestElement {
  let current = element;
  for (const name of path) {
    const next = current.children.find((c) => c.name === name);
    if (!next) throw new Error(`missing ${path.join("/")}`);
    current = next;
  }
  return current;
}

function xmllintAvailable(): boolean {
  return toolAvailable(spawnSync("xmllint", ["--version"]).status === 0, "Debian libxml2-utils is not installed: apt-get install -y libxml2-utils to check manifests with xmllint");
}

describe("manifest.xml", () => {
  test.each([
    ["the source manifest", () => `${root}manifest/manifest.xml`],
    ["the localhost build", () => `${testBuildDir}manifest.xml`],
    ["a build for a hosting URL", () => `${hosted()}/manifest.xml`],
  ])("%s is well-formed, in schema order, with every resid defined", (_label, file) => {
    expect(checkManifest(readFileSync(file(), "utf8"))).toEqual([]);
  });

  test.runIf(xmllintAvailable())("xmllint --noout accepts the source and both builds", () => {
    for (const file of [`${root}manifest/manifest.xml`, `${testBuildDir}manifest.xml`, `${hosted()}/manifest.xml`]) {
      const run = spawnSync("xmllint", ["--noout", file], { encoding: "utf8" });
      expect(run.stderr, file).toBe("");
      expect(run.status, file).toBe(0);
    }
  });

  test.each([
    // mutation of the source                                                          what the check must say
    ["two hyphens in a comment", (x: string) => x.replace("<OfficeApp", "<!-- npm run build -- --env url=x -->\n<OfficeApp"), /not well-formed XML/],
    ["Version before Id",        (x: string) => x.replace(/(<Id>[^<]*<\/Id>)(\s*)(<Version>[^<]*<\/Version>)/, "$3$2$1"),     /<Id> stands after <Version>/],
    ["Permissions before Hosts", (x: string) => x.replace("<Permissions>ReadWriteDocument</Permissions>", "").replace("<Hosts>", "<Permissions>ReadWriteDocument</Permissions><Hosts>"), /stands after <Permissions>/],
    ["Resources before Hosts",   (x: string) => x.replace(/(\s*<Hosts>\s*<Host xsi:type[\s\S]*?<\/Hosts>)(\s*<Resources>[\s\S]*<\/Resources>)/, "$2$1"), /<Hosts> stands after <Resources>/],
    ["a resid with no resource", (x: string) => x.replace('resid="Functions.Namespace"', 'resid="Functions.Space"'), /resid "Functions.Space" names no resource/],
    ["an id used twice",         (x: string) => x.replace('id="zcell.TaskpaneButton"', 'id="zcell.Group"'), /id "zcell.Group" is used twice/],
  ])("a manifest with %s fails the check", (_label, mutate, message) => {
    const mutated = mutate(source);
    expect(mutated).not.toBe(source);
    expect(checkManifest(mutated).join("\n")).toMatch(message);
    if (message.source === "not well-formed XML" && spawnSync("xmllint", ["--version"]).status === 0) {
      const file = join(mkdtempSync(join(tmpdir(), "zcell-bad-")), "manifest.xml");
      writeFileSync(file, mutated);
      expect(spawnSync("xmllint", ["--noout", file]).status).not.toBe(0);
    }
  });

  test("is a task-pane add-in of the Workbook host with its own GUID", () => {
    expect(app.attributes["xsi:type"]).toBe("TaskPaneApp");
    expect(find(app, ["Hosts", "Host"]).attributes).toEqual({ Name: "Workbook" });
    expect(find(app, ["Id"]).text).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
  });

  test("declares the shared runtime, custom functions in namespace ZC, and document access", () => {
    const sets = find(app, ["Requirements", "Sets"]).children.map((c) => c.attributes);
    expect(sets).toContainEqual({ Name: "SharedRuntime", MinVersion: "1.1" });
    expect(sets).toContainEqual({ Name: "CustomFunctionsRuntime", MinVersion: "1.3" });
    expect(find(app, ["Permissions"]).text).toBe("ReadWriteDocument");
    expect(find(app, ["VersionOverrides", "Hosts", "Host", "Runtimes", "Runtime"]).attributes).toEqual({ resid: "Taskpane.Url", lifetime: "long" });
    expect(source).toMatch(/<bt:String id="Functions.Namespace" DefaultValue="ZC"\/>/);
    expect(find(app, ["VersionOverrides", "Hosts", "Host", "DesktopFormFactor", "ExtensionPoint", "OfficeTab"]).attributes).toEqual({ id: "TabHome" });
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
    const built = readFileSync(join(hosted(), "manifest.xml"), "utf8");
    const metadata = readFileSync(join(hosted(), "functions.json"), "utf8");
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
  test("every function's help URL points at its own entry, help.html#NAME, which the page holds", () => {
    const help = readFileSync(`${testBuildDir}help.html`, "utf8");
    const metadata = JSON.parse(readFileSync(`${testBuildDir}functions.json`, "utf8")) as { functions: { id: string; helpUrl: string }[] };
    expect(metadata.functions.length).toBeGreaterThan(60);
    for (const f of metadata.functions) {
      expect(f.helpUrl).toBe(`https://localhost:3000/help.html#${f.id}`);
      expect(help, f.id).toMatch(new RegExp(`id="?${f.id}"?[ >]`));
    }
  });

  test("every declaration's @helpurl names its own function", () => {
    const files = JSON.parse(readFileSync(`${root}functions/declarationFiles.json`, "utf8")) as string[];
    let checked = 0;
    for (const file of files) {
      for (const [, id, url] of readFileSync(`${root}${file}`, "utf8").matchAll(/@customfunction (\S+) \S+\n \* @helpurl (\S+)/g)) {
        expect(url, `${file} ${id}`).toBe(`https://localhost:3000/help.html#${id}`);
        checked++;
      }
    }
    expect(checked).toBeGreaterThan(60);
  });
});

describe("help.html", () => {
  test("a hosted build's help page is the local one (it holds no address of its host), its help URLs on the host", () => {
    expect(readFileSync(`${hosted()}/help.html`, "utf8")).toBe(readFileSync(`${testBuildDir}help.html`, "utf8"));
    expect(readFileSync(`${hosted()}/help.css`, "utf8")).toBe(readFileSync(`${testBuildDir}help.css`, "utf8"));
    const metadata = JSON.parse(readFileSync(`${hosted()}/functions.json`, "utf8")) as { functions: { id: string; helpUrl: string }[] };
    for (const f of metadata.functions) expect(f.helpUrl).toBe(`https://astro.example.org/zcell/help.html#${f.id}`);
  });
});
