/**
 * A cell's formula evaluated as a sheet would, with every ZC call going through the built bundle
 * (test-artifacts/build/functions.js, loaded as Excel's runtime loads it: test/reference/hostBundle.ts),
 * so that a value the demo workbook caches or the README shows is checked against what a cell gives.
 *
 * Only the forms our own files write are read: ZC calls (typed `ZC.NAME(…)` or stored
 * `_xldudf_ZC_NAME(…)`), `INDEX(array, row, column)`, `SUM(range)`, references to cells and ranges of
 * the same sheet, numbers, text, omitted arguments, parentheses and the operators + − * /. Anything else
 * throws, naming the formula. Arguments go to the bundle as Excel passes them: a range argument as a
 * matrix (a single value as a 1×1 one), a scalar argument as its value, an omitted one as null.
 */
import { readFileSync } from "node:fs";
import { columnName, columnNumber } from "../taskpane/cellAddress.js";
import { tokenize, type Token } from "../taskpane/formulaCalls.js";
import { loadBundle, type Registered } from "./reference/hostBundle.js";
import { testBuildDir } from "./testBuild.js";

/** A cell's value as a sheet holds it: a number, text, a boolean, or null for a blank cell. */
export type SheetValue = number | string | boolean | null;

/** What a formula evaluates to before the cell takes its first value: one value or a matrix. */
type Value = SheetValue | unknown[][];

type Metadata = { functions: { id: string; parameters: { name: string; dimensionality?: string }[] }[] };

/** The bundle's functions, and which parameters of each are ranges (functions.json of the same build). */
export interface SheetRuntime {
  fns: Map<string, Registered>;
  rangeParameters: Map<string, boolean[]>;
}

/**
 * Loads the tests' build with a workbook of no settings (its model is the default, P18-CMB) and waits
 * for the settings, as Excel's runtime would before the first formula.
 */
export async function sheetRuntime(): Promise<SheetRuntime> {
  const fns = loadBundle({});
  await fns.get("AGE")!(); // the first call waits for the settings
  const metadata = JSON.parse(readFileSync(`${testBuildDir}functions.json`, "utf8")) as Metadata;
  const rangeParameters = new Map(metadata.functions.map((f) => [f.id, f.parameters.map((p) => p.dimensionality === "matrix")]));
  return { fns, rangeParameters };
}

/**
 * The value of a formula, as its cell shows it (the first cell of a matrix).
 * @param formula the formula, with or without "=", e.g. `D3-_xldudf_ZC_EXTINCTION(6165,H3)`
 * @param cell the value of a cell of the same sheet by its address ("B3"; blank → null)
 */
export async function evaluateFormula(runtime: SheetRuntime, formula: string, cell: (address: string) => SheetValue): Promise<unknown> {
  const tokens = tokenize(formula).filter((t) => t.kind !== "space");
  let at = 0;
  const fail = (what: string): never => {
    throw new Error(`cannot evaluate ${formula}: ${what} at ${tokens[at]?.start ?? formula.length}`);
  };
  const peek = (): Token | undefined => tokens[at];
  const take = (kind: Token["kind"], text?: string): Token => {
    const t = tokens[at];
    if (!t || t.kind !== kind || (text !== undefined && t.text !== text)) fail(`expected ${text ?? kind}`);
    at++;
    return t;
  };
  const first = (v: Value): unknown => (Array.isArray(v) ? v[0][0] : v);
  const number = (v: Value): number => {
    const x = first(v);
    return typeof x === "number" ? x : fail(`${JSON.stringify(x)} where a number belongs`);
  };

  const reference = (text: string): Value => {
    if (text.includes("!")) fail("a reference to another sheet");
    const [from, to = from] = text.replaceAll("$", "").split(":");
    const [, c1, r1] = /^([A-Z]+)(\d+)$/i.exec(from) ?? fail(`reference ${text}`);
    const [, c2, r2] = /^([A-Z]+)(\d+)$/i.exec(to) ?? fail(`reference ${text}`);
    if (from === to) return cell(`${c1.toUpperCase()}${r1}`);
    const rows: SheetValue[][] = [];
    for (let r = Number(r1); r <= Number(r2); r++) {
      const row: SheetValue[] = [];
      for (let c = columnNumber(c1); c <= columnNumber(c2); c++) row.push(cell(`${columnName(c)}${r}`));
      rows.push(row);
    }
    return rows;
  };

  const callZc = async (name: string, args: (Value | undefined)[]): Promise<unknown[][]> => {
    const fn = runtime.fns.get(name) ?? fail(`no function ZC.${name}`);
    const ranges = runtime.rangeParameters.get(name)!;
    if (args.length > ranges.length) fail(`ZC.${name} takes ${ranges.length} arguments`);
    const given = ranges.map((isRange, i) => {
      const v = args[i];
      if (v === undefined || v === null) return null; // omitted, as Excel passes it
      if (isRange) return Array.isArray(v) ? v : [[v]];
      return first(v);
    });
    return await fn(...given);
  };

  const call = async (name: string): Promise<Value> => {
    take("open");
    const args: (Value | undefined)[] = [];
    if (peek()?.kind === "close") at++;
    else {
      for (;;) {
        const next = peek();
        args.push(next?.kind === "sep" || next?.kind === "close" ? undefined : await expression());
        const t = tokens[at++];
        if (t?.kind === "close") break;
        if (t?.kind !== "sep") fail("expected , or )");
      }
    }
    const zc = /^(?:_xldudf_ZC_|ZC\.)([A-Z0-9_]+)$/i.exec(name);
    if (zc) return callZc(zc[1].toUpperCase(), args);
    switch (name.toUpperCase()) {
      case "INDEX": {
        const array = args[0];
        if (!Array.isArray(array)) return fail("INDEX of a single value");
        return array[number(args[1]!) - 1][number(args[2]!) - 1] as SheetValue;
      }
      case "SUM":
        return (Array.isArray(args[0]) ? args[0].flat() : [args[0]]).reduce<number>((sum, x) => sum + (typeof x === "number" ? x : 0), 0);
      default:
        return fail(`the function ${name}`);
    }
  };

  const primary = async (): Promise<Value> => {
    const t = tokens[at++] ?? fail("a missing value");
    switch (t.kind) {
      case "number":
        return t.text.endsWith("%") ? Number(t.text.slice(0, -1)) / 100 : Number(t.text);
      case "string":
        return t.text.slice(1, -1).replaceAll('""', '"');
      case "bool":
        return t.text.toUpperCase() === "TRUE";
      case "ref":
        return reference(t.text);
      case "func":
        return call(t.text);
      case "open": {
        const v = await expression();
        take("close");
        return v;
      }
      case "op":
        if (t.text === "-") return -number(await primary());
        if (t.text === "+") return primary();
    }
    return fail(`the token ${t.text}`);
  };
  const term = async (): Promise<Value> => {
    let v = await primary();
    while (peek()?.kind === "op" && (peek()!.text === "*" || peek()!.text === "/")) {
      const op = tokens[at++].text;
      const w = number(await primary());
      v = op === "*" ? number(v) * w : number(v) / w;
    }
    return v;
  };
  const expression = async (): Promise<Value> => {
    let v = await term();
    while (peek()?.kind === "op" && (peek()!.text === "+" || peek()!.text === "-")) {
      const op = tokens[at++].text;
      const w = number(await term());
      v = op === "+" ? number(v) + w : number(v) - w;
    }
    return v;
  };

  const value = await expression();
  if (at < tokens.length) fail("more after the formula");
  return first(value);
}
