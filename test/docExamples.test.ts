/**
 * Every `@example <expression> // <value>` in core/ and functions/ is run and compared with the value
 * it shows, so a wrong example fails the suite. The expression sees the exports of core/index.ts and
 * of its own file. Numbers must round to the digits shown (`≈ x`: within one unit of the last digit
 * shown); text and objects must be equal. A value shown in prose ("@returns …; e.g. … 1903.44") is
 * not checkable, so it is refused: such a value belongs in an @example.
 */
import { readdirSync, readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { describe, expect, test } from "vitest";
import * as core from "../core/index.js";

const root = fileURLToPath(new URL("..", import.meta.url));
const folders = ["core", "functions"];
const files = folders.flatMap((d) => (readdirSync(`${root}${d}`, { recursive: true }) as string[]).filter((f) => f.endsWith(".ts")).map((f) => `${d}/${f}`));

interface Example {
  file: string;
  line: number;
  expression: string;
  expected: string;
}

const examples: Example[] = files.flatMap((file) =>
  readFileSync(`${root}${file}`, "utf8")
    .split("\n")
    .flatMap((text, i) => [...text.matchAll(/@example (.+?) \/\/ (.+?)(?: \*\/)?$/g)].map((m) => ({ file, line: i + 1, expression: m[1], expected: m[2] }))),
);

/** The value an example shows: its literal, without the parenthesised comment after it. */
function expectedValue(text: string): { value: unknown; approx: boolean; digits?: { unit: number } } {
  const approx = text.startsWith("≈ ");
  const body = (approx ? text.slice(2) : text).replace(/\s+\([^]*\)$/, "").trim();
  const value: unknown = body === "undefined" ? undefined : JSON.parse(body.replace(/([{,]\s*)([A-Za-z_]\w*)\s*:/g, '$1"$2":'));
  if (typeof value !== "number") return { value, approx };
  // one unit of the last digit shown: 5017.55 → 0.01, 1.6675e-4 → 1e-8, 13.787 → 0.001
  const [mantissa, exponent = "0"] = body.toLowerCase().split("e");
  const decimals = mantissa.includes(".") ? mantissa.split(".")[1].length : 0;
  return { value, approx, digits: { unit: 10 ** (Number(exponent) - decimals) } };
}

describe("doc examples", () => {
  test("there are examples to check in every folder", () => {
    expect(examples.length).toBeGreaterThan(40);
    for (const folder of folders) expect(examples.some((e) => e.file.startsWith(folder)), folder).toBe(true);
  });

  test.each(examples.map((e) => [`${e.file}:${e.line}`, e] as const))("%s", async (_where, e) => {
    const own = (await import(`../${e.file.replace(/\.ts$/, ".js")}`)) as Record<string, unknown>;
    const scope = { ...core, ...own };
    const actual = new Function(...Object.keys(scope), `return (${e.expression});`)(...Object.values(scope)) as unknown;
    const { value, approx, digits } = expectedValue(e.expected);
    if (typeof value === "number" && digits) {
      const tolerance = approx ? digits.unit : digits.unit / 2 + Math.abs(value) * 1e-15;
      expect(Math.abs((actual as number) - value), `${e.expression} = ${String(actual)}, shown ${e.expected}`).toBeLessThanOrEqual(tolerance);
    } else {
      expect(actual).toEqual(value);
    }
  });

  test("no value is left in prose where no test reads it", () => {
    const prose = files.flatMap((file) =>
      readFileSync(`${root}${file}`, "utf8")
        .split("\n")
        .map((text, i) => ({ text, where: `${file}:${i + 1}` }))
        .filter(({ text }) => /@returns .*e\.g\..*\d\.\d/.test(text)),
    );
    expect(prose.map((p) => `${p.where}: ${p.text.trim()}`)).toEqual([]);
  });
});
