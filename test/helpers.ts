/** Shared test helpers: relative-error checks with a readable failure message. */
import { beforeEach, expect } from "vitest";

/** |actual/expected − 1|, or |actual| when expected is 0. */
export function relativeError(actual: number, expected: number): number {
  return expected === 0 ? Math.abs(actual) : Math.abs(actual / expected - 1);
}

/** Asserts |actual/expected − 1| ≤ tol, naming the case in the failure. */
export function expectRelative(actual: number, expected: number, tol: number, label = ""): void {
  const err = relativeError(actual, expected);
  expect(err, `${label}: got ${actual}, expected ${expected} (rel. error ${err.toExponential(2)} > ${tol})`).toBeLessThanOrEqual(tol);
}

/** Log-spaced redshifts from 10^lo to 10^hi, `perDecade` a decade. */
export function logRedshifts(lo: number, hi: number, perDecade: number): number[] {
  const out: number[] = [];
  for (let k = lo * perDecade; k <= hi * perDecade; k++) out.push(10 ** (k / perDecade));
  return out;
}

/** A small seeded generator (mulberry32), so random tests are repeatable. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Five-point central difference f'(x) ≈ (−f(x+2h) + 8f(x+h) − 8f(x−h) + f(x−2h)) / 12h (Abramowitz & Stegun 25.3.6). */
export function fivePoint(f: (x: number) => number, x: number, h: number): number {
  return (-f(x + 2 * h) + 8 * f(x + h) - 8 * f(x - h) + f(x - 2 * h)) / (12 * h);
}

/** A standard normal draw from two uniforms (Box–Muller; Box & Muller 1958). */
export function normal(random: () => number): () => number {
  return () => Math.sqrt(-2 * Math.log(1 - random())) * Math.cos(2 * Math.PI * random());
}

export function standardDeviation(values: number[]): number {
  const mean = values.reduce((s, v) => s + v, 0) / values.length;
  return Math.sqrt(values.reduce((s, v) => s + (v - mean) ** 2, 0) / (values.length - 1));
}

/**
 * A model rebuilt before every test and used like the model itself. Mutation testing runs each test
 * only against the mutants that test reached (StrykerJS per-test coverage): a model built once while
 * the file is collected would hide the mutants of model building from every test that could kill them.
 * @param make builds the model
 * @returns a stand-in that forwards to the model of the running test
 */
export function freshModel<T extends object>(make: () => T): T {
  let current = make();
  beforeEach(() => {
    current = make();
  });
  return new Proxy({} as T, {
    get: (_target, key) => {
      const value = Reflect.get(current, key, current);
      return typeof value === "function" ? value.bind(current) : value;
    },
  });
}
