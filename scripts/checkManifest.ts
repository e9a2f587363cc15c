/**
 * Offline check of an add-in manifest, as strict as we can be without Microsoft's validation service:
 * a conforming XML parser (saxes: a comment holding "--", an unclosed tag or a bad entity is an
 * error), the element order of the published manifest schema for the elements zcell uses, unique ids,
 * and every resid defined among the resources.
 *
 * Usage: tsx scripts/checkManifest.ts [manifest.xml …]  (default dist/manifest.xml); exits 1 on a problem.
 */
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { SaxesParser } from "saxes";

/** An element of the parsed manifest: its qualified name, attributes and child elements. */
export interface ManifestElement {
  name: string;
  attributes: Record<string, string>;
  children: ManifestElement[];
  text: string;
}

/**
 * Order of child elements, by parent path. Sources: "How to find the proper order of manifest
 * elements" (learn.microsoft.com/office/dev/add-ins/develop/manifest-element-ordering) and the
 * OfficeApp complexType of OfficeAppManifestv1.1.xsd for OfficeApp; MS-OWEMXML (the Office add-in
 * manifest file format) for VersionOverridesV1_0 (Description, Requirements, Hosts, Resources,
 * WebApplicationInfo, EquivalentAddins) and Host (Runtimes, AllFormFactors; Workbook adds
 * DesktopFormFactor); the rest from memory of the same schema.
 */
export const schemaOrder: [path: string, order: string[]][] = [
  ["OfficeApp", ["Id", "AlternateId", "Version", "ProviderName", "DefaultLocale", "DisplayName", "Description", "IconUrl",
    "HighResolutionIconUrl", "SupportUrl", "AppDomains", "Hosts", "Requirements", "DefaultSettings", "Permissions",
    "Dictionary", "VersionOverrides", "ExtendedOverrides"]],
  ["OfficeApp/VersionOverrides", ["Description", "Requirements", "Hosts", "Resources", "WebApplicationInfo", "EquivalentAddins"]],
  ["OfficeApp/VersionOverrides/Hosts/Host", ["Runtimes", "AllFormFactors", "DesktopFormFactor"]],
  ["OfficeApp/VersionOverrides/Hosts/Host/AllFormFactors/ExtensionPoint", ["Script", "Page", "Metadata", "Namespace"]],
  ["OfficeApp/VersionOverrides/Hosts/Host/DesktopFormFactor", ["GetStarted", "FunctionFile", "ExtensionPoint"]],
  ["OfficeApp/VersionOverrides/Hosts/Host/DesktopFormFactor/GetStarted", ["Title", "Description", "LearnMoreUrl"]],
  ["OfficeApp/VersionOverrides/Resources", ["bt:Images", "bt:Urls", "bt:ShortStrings", "bt:LongStrings"]],
  ["OfficeApp/VersionOverrides/Hosts/Host/DesktopFormFactor/ExtensionPoint/OfficeTab/Group", ["Label", "Icon", "Control"]],
  ["OfficeApp/VersionOverrides/Hosts/Host/DesktopFormFactor/ExtensionPoint/OfficeTab/Group/Control", ["Label", "Supertip", "Icon", "Action"]],
];

/** Parses XML strictly; throws an Error naming the line of the first well-formedness error. */
export function parseStrictXml(xml: string): ManifestElement {
  const parser = new SaxesParser({ position: true });
  const stack: ManifestElement[] = [];
  let root: ManifestElement | undefined;
  parser.on("error", (e) => {
    throw new Error(`not well-formed XML: ${e.message}`);
  });
  parser.on("opentag", (tag) => {
    const element: ManifestElement = { name: tag.name, attributes: { ...(tag.attributes as Record<string, string>) }, children: [], text: "" };
    if (stack.length) stack[stack.length - 1].children.push(element);
    else root = element;
    stack.push(element);
  });
  parser.on("text", (text) => {
    if (stack.length) stack[stack.length - 1].text += text;
  });
  parser.on("closetag", () => void stack.pop());
  parser.write(xml).close();
  if (!root) throw new Error("not well-formed XML: no root element");
  return root;
}

function walk(element: ManifestElement, path: string, visit: (e: ManifestElement, path: string) => void): void {
  visit(element, path);
  for (const child of element.children) walk(child, `${path}/${child.name}`, visit);
}

/**
 * Problems found in a manifest (an empty list when it passes).
 * @param xml the manifest's text
 * @returns one sentence a problem
 */
export function checkManifest(xml: string): string[] {
  let root: ManifestElement;
  try {
    root = parseStrictXml(xml);
  } catch (e) {
    return [(e as Error).message];
  }
  const problems: string[] = [];
  if (root.name !== "OfficeApp") problems.push(`the root element is ${root.name}, not OfficeApp`);
  const ids: string[] = [];
  const resids: string[] = [];
  const resources = new Set<string>();
  walk(root, root.name, (element, path) => {
    const order = schemaOrder.find(([p]) => p === path)?.[1];
    if (order) {
      let last = -1;
      for (const child of element.children) {
        const index = order.indexOf(child.name);
        if (index < 0) problems.push(`${path}: <${child.name}> is not an element the schema allows there`);
        else if (index < last) problems.push(`${path}: <${child.name}> stands after <${order[last]}>, against the schema's order`);
        else last = index;
      }
    }
    if (element.attributes.id) ids.push(element.attributes.id);
    if (element.attributes.resid) resids.push(element.attributes.resid);
    if (path.startsWith("OfficeApp/VersionOverrides/Resources/") && element.attributes.id) resources.add(element.attributes.id);
  });
  const seen = new Set<string>();
  for (const id of ids) {
    if (seen.has(id)) problems.push(`id "${id}" is used twice`);
    seen.add(id);
  }
  for (const resid of new Set(resids)) if (!resources.has(resid)) problems.push(`resid "${resid}" names no resource`);
  return problems;
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  const files = process.argv.length > 2 ? process.argv.slice(2) : ["dist/manifest.xml"];
  let failed = false;
  for (const file of files) {
    const problems = checkManifest(readFileSync(file, "utf8"));
    console.log(problems.length ? `${file}:\n${problems.map((p) => `  - ${p}`).join("\n")}` : `${file}: well-formed, in schema order, every resid defined`);
    failed ||= problems.length > 0;
  }
  process.exit(failed ? 1 : 0);
}
