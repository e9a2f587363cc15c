/**
 * Our fake Office host (test/browser/fakeOffice.js) may only stand in for APIs that exist: every
 * member each fake object offers must be declared, with that name and kind (method or property), on
 * the matching class or interface of the real type surface (@types/office-js, @types/custom-functions-runtime). The fake's
 * members are read from the objects themselves, so a member added to the fake without a real
 * counterpart fails here.
 */
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { describe, expect, test } from "vitest";

const root = fileURLToPath(new URL("..", import.meta.url));
const officeTypes = readFileSync(`${root}node_modules/@types/office-js/index.d.ts`, "utf8");
const functionTypes = readFileSync(`${root}node_modules/@types/custom-functions-runtime/index.d.ts`, "utf8");

/** The text of every `declare namespace <name> {` block of a declaration file. */
function namespaceText(source: string, name: string): string {
  const parts = source.split(/^declare namespace /m);
  return parts.filter((p) => p.startsWith(`${name} {`)).join("\n");
}

/** The members declared in `class X` / `interface X` / `enum X` / `namespace X` of a namespace, as "name:kind". */
function declaredMembers(namespace: string, name: string): Set<string> {
  const members = new Set<string>();
  const head = new RegExp(`^\\s*(?:export )?(?:class|interface|enum|namespace|const enum) ${name}\\b[^{]*\\{`, "gm");
  for (const match of namespace.matchAll(head)) {
    let depth = 1;
    let i = match.index! + match[0].length;
    const start = i;
    for (; i < namespace.length && depth > 0; i++) {
      if (namespace[i] === "{") depth++;
      else if (namespace[i] === "}") depth--;
    }
    const body = namespace.slice(start, i);
    // members at the top level of the body: "name(", "name?:", "name:", "readonly name:", "get name(", "name =" (enums)
    let level = 0;
    for (const line of body.split("\n")) {
      if (level === 0) {
        const m = /^\s*((?:readonly\s+|static\s+|get\s+|set\s+)*)([A-Za-z_$][\w$]*)\s*(?:\?\s*)?([(:<=,]|$)/.exec(line);
        if (m && !line.trim().startsWith("*") && !line.trim().startsWith("/")) {
          const isMethod = (m[3] === "(" || m[3] === "<") && !/\bget\s/.test(m[1]);
          members.add(`${m[2]}:${isMethod ? "method" : "property"}`);
          if (/\bfunction\b/.test(line)) members.add(`${m[2]}:method`);
        }
      }
      for (const ch of line) level += ch === "{" ? 1 : ch === "}" ? -1 : 0;
    }
  }
  return members;
}

const office = namespaceText(officeTypes, "Office");
const excel = namespaceText(officeTypes, "Excel");
const extension = namespaceText(officeTypes, "OfficeExtension");
const runtime = namespaceText(functionTypes, "CustomFunctions");

/** Members common to every Excel proxy object (OfficeExtension.ClientObject and the request context). */
const clientObject = new Set([...declaredMembers(extension, "ClientObject"), ...declaredMembers(extension, "ClientRequestContext")]);

type Fake = { [key: string]: unknown };
const g = globalThis as unknown as { window: unknown; __fakeInit?: unknown; Office: Fake; Excel: Fake; CustomFunctions: Fake };

function install(): void {
  g.window = globalThis;
  (g.window as { __fakeInit: unknown }).__fakeInit = { sheets: { Sheet1: { A1: { value: 1 } } }, selection: "Sheet1!A1", names: { Data: "Sheet1!A1:A9" } };
  new Function(readFileSync(`${root}test/browser/fakeOffice.js`, "utf8"))();
}

/** Own members of a fake object, getters included, as "name:kind" (a function is a method). */
const membersOf = (o: object) =>
  Object.getOwnPropertyNames(o).map((name) => {
    const d = Object.getOwnPropertyDescriptor(o, name)!;
    return `${name}:${!d.get && typeof d.value === "function" ? "method" : "property"}`;
  });
const namesOf = (o: object) => Object.getOwnPropertyNames(o);

describe("the fake Office host offers only real APIs", () => {
  install();
  const objects: [label: string, object: Fake, declared: Set<string>][] = [];
  const add = (label: string, object: unknown, declared: Set<string>) => objects.push([label, object as Fake, declared]);
  const excelClass = (name: string) => new Set([...declaredMembers(excel, name), ...clientObject]);

  /** Names declared at the top of a namespace (enums, functions, variables, classes). */
  const topLevel = (text: string, names: string[]) =>
    new Set(
      names.flatMap((m) => {
        const found = new RegExp(`^\\s*(?:export )?(enum|function|var|const|let|class|namespace) ${m}\\b`, "m").exec(text);
        if (!found) return [];
        // a class is called with new (a function here); an enum, namespace or variable is an object
        return [`${m}:${found[1] === "function" || found[1] === "class" ? "method" : "property"}`];
      }),
    );
  add("Office", g.Office, topLevel(office, namesOf(g.Office)));
  add("Office.HostType", g.Office.HostType, declaredMembers(office, "HostType"));
  add("Office.EventType", g.Office.EventType, declaredMembers(office, "EventType"));
  add("Office.AsyncResultStatus", g.Office.AsyncResultStatus, declaredMembers(office, "AsyncResultStatus"));
  add("Office.context", g.Office.context, declaredMembers(office, "Context"));
  const context = g.Office.context as Fake;
  add("Office.context.requirements", context.requirements, declaredMembers(office, "RequirementSetSupport"));
  add("Office.context.document", context.document, declaredMembers(office, "Document"));
  add("Office.context.document.settings", (context.document as Fake).settings, declaredMembers(office, "Settings"));
  add("Excel", g.Excel, topLevel(excel, namesOf(g.Excel)));
  add("Excel.CalculationType", g.Excel.CalculationType, declaredMembers(excel, "CalculationType"));
  add("CustomFunctions", g.CustomFunctions, topLevel(runtime, namesOf(g.CustomFunctions)));
  add("CustomFunctions.ErrorCode", g.CustomFunctions.ErrorCode, declaredMembers(runtime, "ErrorCode"));

  // the request context and the objects reached from it
  let requestContext: Fake | undefined;
  void (g.Excel.run as (cb: (c: Fake) => Promise<void>) => Promise<void>)(async (c) => void (requestContext = c));
  const workbook = requestContext!.workbook as Fake;
  add("RequestContext", requestContext, excelClass("RequestContext"));
  add("Workbook", workbook, excelClass("Workbook"));
  const worksheets = workbook.worksheets as Fake & { getItem(n: string): Fake };
  add("WorksheetCollection", worksheets, excelClass("WorksheetCollection"));
  const sheet = worksheets.getItem("Sheet1") as Fake & { getRange(a: string): Fake };
  add("Worksheet", sheet, excelClass("Worksheet"));
  const range = sheet.getRange("A1") as Fake & { getSpillParentOrNullObject(): Fake };
  add("Range", range, excelClass("Range"));
  add("Range (null object)", range.getSpillParentOrNullObject(), excelClass("Range"));
  add("WorksheetProtection", sheet.protection, excelClass("WorksheetProtection"));
  add("NoteCollection", sheet.notes, excelClass("NoteCollection"));
  add("Note", (sheet.notes as { getItemOrNullObject(a: string): Fake }).getItemOrNullObject("A1"), excelClass("Note"));
  add("CommentCollection (worksheet)", sheet.comments, excelClass("CommentCollection"));
  add("CommentCollection (workbook)", workbook.comments, excelClass("CommentCollection"));
  add("Application", workbook.application, excelClass("Application"));
  add("NamedItemCollection", workbook.names, excelClass("NamedItemCollection"));
  add("NamedItem", (workbook.names as Fake & { getItem(n: string): Fake }).getItem("Data"), excelClass("NamedItem"));
  const charts = sheet.charts as Fake & { add(t: string, r: Fake, b: string): Fake };
  add("ChartCollection", charts, excelClass("ChartCollection"));
  const chart = charts.add("XYScatterLinesNoMarkers", range, "Columns") as Fake & { series: Fake & { add(n: string): Fake } };
  add("Chart", chart, excelClass("Chart"));
  add("ChartTitle", chart.title, excelClass("ChartTitle"));
  const axes = chart.axes as Fake & { categoryAxis: Fake & { title: Fake } };
  add("ChartAxes", axes, excelClass("ChartAxes"));
  add("ChartAxis", axes.categoryAxis, excelClass("ChartAxis"));
  add("ChartAxisTitle", axes.categoryAxis.title, excelClass("ChartAxisTitle"));
  add("ChartSeriesCollection", chart.series, excelClass("ChartSeriesCollection"));
  add("ChartSeries", chart.series.add("P18-BAO"), excelClass("ChartSeries"));

  test.each(objects.map(([label, object, declared]) => [label, object, declared] as const))("%s", (label, object, declared) => {
    expect(declared.size, `${label}: no declaration found`).toBeGreaterThan(0);
    const missing = membersOf(object).filter((m) => !declared.has(m));
    // e.g. "getCell:method" must be declared as a method of Excel.Range
    expect(missing, `${label} offers members the real API does not declare`).toEqual([]);
  });
});
