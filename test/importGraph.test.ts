/**
 * No import circles in core/, functions/ or taskpane/: the graph of relative imports is read from the
 * sources and searched for a cycle. A cycle of value imports fails (module start-up order would then
 * depend on who is imported first); type-only imports (`import type`, `export type`, or every name
 * marked `type`) vanish at run time and are checked separately, so that none creeps back either.
 */
import { readdirSync, readFileSync, statSync } from "node:fs";
import { dirname, join, relative, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, test } from "vitest";

const root = fileURLToPath(new URL("..", import.meta.url));
const folders = ["core", "functions", "taskpane"];

function sources(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) return sources(path);
    return path.endsWith(".ts") ? [path] : [];
  });
}

/** Each module's relative imports: the file imported and whether any name comes in as a value. */
function importsOf(file: string): { target: string; value: boolean }[] {
  const text = readFileSync(file, "utf8");
  const found: { target: string; value: boolean }[] = [];
  for (const m of text.matchAll(/^(import|export)\s+(type\s+)?([^;]*?)\s*from\s+"(\.[^"]+)";/gms)) {
    const [, , typeOnly, names, spec] = m;
    const target = relative(root, resolve(dirname(file), spec.replace(/\.js$/, ".ts")));
    const braces = /\{([^}]*)\}/.exec(names);
    const everyNameTyped = braces !== null && !/[^{]*\w[^{]*\{/.test(names) && braces[1].split(",").map((n) => n.trim()).filter(Boolean).every((n) => n.startsWith("type "));
    found.push({ target, value: !typeOnly && !everyNameTyped });
  }
  for (const m of text.matchAll(/^import\s+"(\.[^"]+)";/gm)) found.push({ target: relative(root, resolve(dirname(file), m[1].replace(/\.js$/, ".ts"))), value: true });
  return found;
}

const graph = new Map<string, { target: string; value: boolean }[]>();
for (const folder of folders) for (const file of sources(join(root, folder))) graph.set(relative(root, file), importsOf(file));

/** Every elementary cycle found by depth-first search, through value edges only or through all edges. */
function cycles(valueOnly: boolean): string[] {
  const found = new Set<string>();
  const visit = (node: string, path: string[]) => {
    for (const edge of graph.get(node) ?? []) {
      if (valueOnly && !edge.value) continue;
      const at = path.indexOf(edge.target);
      if (at >= 0) {
        const cycle = path.slice(at);
        const start = cycle.indexOf([...cycle].sort()[0]);
        found.add([...cycle.slice(start), ...cycle.slice(0, start), cycle[start]].join(" → "));
      } else if (graph.has(edge.target) && path.length < 40) visit(edge.target, [...path, edge.target]);
    }
  };
  for (const node of graph.keys()) visit(node, [node]);
  return [...found];
}

describe("import graph of core/, functions/ and taskpane/", () => {
  test("is read from every source file", () => {
    expect(graph.size).toBeGreaterThan(50);
    expect(graph.get("core/distances/Cosmology.ts")!.map((e) => e.target)).toContain("core/distances/redshiftInverse.ts");
  });

  test("has no cycle of value imports", () => {
    expect(cycles(true)).toEqual([]);
  });

  test("has no cycle through type-only imports either", () => {
    expect(cycles(false)).toEqual([]);
  });

  test("the search finds a cycle when there is one (a planted pair of modules)", () => {
    graph.set("planted/a.ts", [{ target: "planted/b.ts", value: true }]);
    graph.set("planted/b.ts", [{ target: "planted/a.ts", value: true }]);
    try {
      expect(cycles(true)).toEqual(["planted/a.ts → planted/b.ts → planted/a.ts"]);
    } finally {
      graph.delete("planted/a.ts");
      graph.delete("planted/b.ts");
    }
  });
});

describe("source files of core/, functions/ and taskpane/", () => {
  test("none is over 500 lines (a longer file usually holds two concepts)", () => {
    const long = folders
      .flatMap((f) => sources(join(root, f)))
      .map((file) => ({ file: relative(root, file), lines: readFileSync(file, "utf8").split("\n").length }))
      .filter(({ lines }) => lines > 500);
    expect(long).toEqual([]);
  });
});
