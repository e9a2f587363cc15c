/**
 * Hostile arguments for every registered function of the production bundle: whatever comes in, what
 * comes out is a matrix of numbers, text or typed errors, and nothing is thrown.
 */
import { describe, expect, test } from "vitest";
import { seededRandom } from "./helpers.js";
import { HostError, loadBundle } from "./reference/hostBundle.js";

const hostile: unknown[] = [
  undefined, null, "", " ", "abc", "1.5", "P18-BAO", "H0=70; Om=", "H0=70;Om=0.3;OL=9", "Mpc", "furlong",
  "m**(", "Gpc3", "mpc3", "MJy", "ergs/s/cm2", "erg/s/cm2", "H0=70; Om=30", "photon", "cold", true, false, 0, -0, -1, -1e-300, 1e-300, 0.5, 3, 1e4, 1e7, 1e12, 1e308, -1e308, Number.NaN,
  Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY, Number.MIN_VALUE, -2, {}, [], [[]], [[1, 2], [3]],
  { errorCode: "#DIV/0!" }, new HostError("#REF!"),
];

function randomArg(rnd: () => number): unknown {
  const pick = () => hostile[Math.floor(rnd() * hostile.length)];
  const shape = rnd();
  if (shape < 0.5) return pick();
  const rows = 1 + Math.floor(rnd() * (shape < 0.9 ? 4 : 300));
  const cols = 1 + Math.floor(rnd() * 3);
  return Array.from({ length: rows }, () => Array.from({ length: cols }, pick));
}

function isCleanCell(v: unknown): boolean {
  if (typeof v === "number") return Number.isFinite(v) && !Object.is(v, -0);
  return typeof v === "string" || v instanceof HostError;
}

describe("hostile arguments", () => {
  const fns = loadBundle({ "zcell.activeModel": "P18-BAO" });
  test.each([...fns.keys()])("%s never throws and returns only numbers, text or typed errors", async (id) => {
    const fn = fns.get(id)!;
    const rnd = seededRandom([...id].reduce((h, ch) => (h * 31 + ch.charCodeAt(0)) >>> 0, 7));
    for (let trial = 0; trial < 150; trial++) {
      const args = Array.from({ length: fn.length }, () => randomArg(rnd));
      const out = await fn(...args);
      expect(Array.isArray(out), `${id} ${JSON.stringify(args).slice(0, 200)}`).toBe(true);
      for (const row of out as unknown[][]) {
        expect(Array.isArray(row)).toBe(true);
        for (const cell of row) expect(isCleanCell(cell), `${id}: ${String(cell)}`).toBe(true);
      }
    }
  });

  test("a huge z range against a huge model range is refused with one error, not computed", async () => {
    const col = Array.from({ length: 5000 }, () => [1]);
    const row = [Array.from({ length: 5000 }, () => "P18-BAO")];
    const out = (await fns.get("DIST_LUM")!(col, row)) as unknown[][];
    expect(out.length).toBe(1);
    expect((out[0][0] as HostError).code).toBe("#VALUE!");
  });
});
