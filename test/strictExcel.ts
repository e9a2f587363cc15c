/**
 * The fake host of the browser tests (test/browser/fakeOffice.js), loaded into Node, with Excel's
 * rule on reading added on top: a property of an Excel object is readable only once a `load` named it
 * ("The property '{0}' is not available. Before reading the property's value, call the load method
 * on the containing object and call "context.sync()" on the associated request context": the
 * PropertyNotLoaded message of office.js, @microsoft/office-js dist/excel-web-16.00.debug.js). A load
 * that names no property (`load()`, `load("")`) is refused outright: the pane names what it reads (an
 * empty load asks for every property of the object, which for a range means all its cells; its
 * maintainers advise never to do one: OfficeDev/office-js issue 179). Also: formatting that widens a
 * sheet's used range unless values-only is asked (Worksheet.getUsedRangeOrNullObject(valuesOnly),
 * @types/office-js). Counted for the tests: each load, and the properties set before each sync.
 */
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";

const fakeSource = readFileSync(fileURLToPath(new URL("./browser/fakeOffice.js", import.meta.url)), "utf8");

export type FakeCell = { formula?: string; value?: unknown; spilledFrom?: string };
export type Fake = {
  sheets: Record<string, Record<string, FakeCell>>;
  settings: Record<string, unknown>;
  saved: unknown;
  calculations: string[];
  notes: { address: string; text: string }[];
  comments: { address: string; text: string }[];
  charts: { sheet: string; type: string; source: string; seriesBy: string; title: string; xTitle: string; yTitle: string; position: string | null; series: { name: string; values: string | null; xValues: string | null }[] }[];
  handlers: ((e: unknown) => void)[];
  selection: string;
  runs: unknown[];
  reads: number[];
  commentReads: number[];
  select(address: string): void;
  /** Added here: each load the pane asked for (its option as text), in order. */
  loads: string[];
  /** Added here: for each context.sync, how many properties the pane had set since the one before. */
  writesPerSync: number[];
};

/** The properties that must be loaded before they are read (the others are navigation or methods). */
const loadable = new Set(["address", "rowCount", "columnCount", "formulas", "values", "name", "protected", "content", "items"]);

export class PropertyNotLoaded extends Error {
  code = "PropertyNotLoaded";
}

/**
 * Installs the fake host with `init` (as fakeOffice.js reads it), Excel.run made strict as above.
 * @param formattedTo sheet → the far corner of cells that hold formatting only (no value)
 */
export function installStrictExcel(init: object, formattedTo: Record<string, string> = {}): Fake {
  const g = globalThis as unknown as { window: { __fakeInit?: unknown; __fake: Fake }; Excel: { run: (...a: unknown[]) => Promise<unknown> } };
  g.window = globalThis as never;
  g.window.__fakeInit = init;
  new Function(fakeSource)();
  const fake = g.window.__fake;
  fake.loads = [];
  fake.writesPerSync = [];
  let writes = 0;
  const loaded = new WeakMap<object, Set<string>>();
  const itemProps = new WeakMap<object, Set<string>>();
  const targets = new WeakMap<object, object>();
  const unwrap = (x: unknown) => (x !== null && typeof x === "object" && targets.has(x) ? targets.get(x) : x);
  const propsOf = (target: object) => loaded.get(target) ?? (loaded.set(target, new Set()), loaded.get(target)!);

  function noteLoad(target: object, option: unknown): void {
    const props = propsOf(target);
    if (typeof option === "string") {
      const names = option.split(",").map((s) => s.trim()).filter(Boolean);
      if (!names.length) throw new Error("a load that names no property asks for every property");
      for (const name of names) {
        const [head, ...rest] = name.split("/");
        props.add(head);
        if (head === "items") {
          const items = itemProps.get(target) ?? new Set<string>();
          items.add(rest.length ? rest.join("/") : "*");
          itemProps.set(target, items);
        }
      }
    } else if (option && typeof option === "object") {
      // a collection's load options: the items' properties set to true, and $top / $skip
      const names = Object.entries(option).filter(([k, v]) => !k.startsWith("$") && v === true).map(([k]) => k);
      if (!names.length) throw new Error("a load that names no property asks for every property");
      props.add("items");
      itemProps.set(target, new Set(names));
    } else {
      throw new Error("a load that names no property asks for every property");
    }
  }

  function wrap<T>(target: T, inherited?: Set<string>): T {
    if (target === null || typeof target !== "object" || Array.isArray(target) || target instanceof Promise) return target;
    const object = target as object;
    if (inherited) for (const p of inherited) propsOf(object).add(p);
    const proxy = new Proxy(object, {
      get(t, prop, receiver) {
        if (prop === "load") {
          return (option: unknown) => {
            fake.loads.push(typeof option === "string" ? option : JSON.stringify(option));
            noteLoad(t, option);
            (t as { load(o: unknown): unknown }).load(option);
            return receiver;
          };
        }
        if (typeof prop === "string" && loadable.has(prop) && !propsOf(t).has(prop) && !propsOf(t).has("*")) {
          throw new PropertyNotLoaded(`The property '${prop}' is not available.`);
        }
        if (prop === "sync") {
          return () => {
            fake.writesPerSync.push(writes);
            writes = 0;
            return (t as { sync(): Promise<void> }).sync();
          };
        }
        if (prop === "getUsedRangeOrNullObject") {
          return (valuesOnly?: boolean) => {
            const sheet = (t as { name: string }).name;
            if (!valuesOnly && formattedTo[sheet]) return wrap((t as { getRange(a: string): unknown }).getRange(`A1:${formattedTo[sheet]}`));
            return wrap((t as { getUsedRangeOrNullObject(v?: boolean): unknown }).getUsedRangeOrNullObject(valuesOnly));
          };
        }
        const value = Reflect.get(t, prop, t);
        if (typeof value === "function") return (...args: unknown[]) => wrap(value.apply(t, args.map(unwrap)));
        if (prop === "items" && Array.isArray(value)) return value.map((item) => wrap(item, itemProps.get(t)));
        return wrap(value);
      },
      set(t, prop, value) {
        writes++;
        return Reflect.set(t, prop, value, t);
      },
    });
    targets.set(proxy, object);
    return proxy as T;
  }

  const run = g.Excel.run;
  g.Excel.run = (...args: unknown[]) => {
    const batch = args[args.length - 1] as (context: unknown) => Promise<unknown>;
    return run(...args.slice(0, -1), (context: unknown) => batch(wrap(context)));
  };
  return fake;
}
