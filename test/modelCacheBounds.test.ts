/**
 * Models are built once per model text and kept (functions/modelCache.ts): 64 of them, the one used
 * least recently out first, a bad text remembered with its error. Counted (models built, the count the
 * cache keeps for tests), not timed. Each test names model texts no other test names (a fresh H0), so
 * the shared cache holds none of them when it starts. Expected counts: the cache's documented rule
 * (64 kept, least recently used out first), pinned as the interface a big sheet's speed depends on.
 */
import { describe, expect, test } from "vitest";
import { Cosmology } from "../core/index.js";
import { cachedModelCount, modelBuildCount, modelFor } from "../functions/modelCache.js";

/** `count` model texts no other test names. */
let next = 0;
function freshSpecs(count: number): string[] {
  const base = 30 + next++;
  return Array.from({ length: count }, (_, i) => `H0=${(base + i * 1e-3).toFixed(3)}; Om=0.3`);
}

/** `count` model texts that no model can be built from (a matter density below zero), none named by another test. */
function badSpecs(count: number): string[] {
  const base = next++;
  return Array.from({ length: count }, (_, i) => `H0=70; Om=-${(1 + base + i * 1e-3).toFixed(3)}`);
}

/** Models built while `work` runs. */
function builds(work: () => void): number {
  const before = modelBuildCount();
  work();
  return modelBuildCount() - before;
}

const tryModel = (spec: string): Cosmology | Error => {
  try {
    return modelFor(spec);
  } catch (e) {
    return e as Error;
  }
};

describe("each model text is built once while it stays among the 64 used last", () => {
  test("a model named again after 63 others is not built again, and it is the same model", () => {
    const [kept] = freshSpecs(1);
    const model = modelFor(kept);
    const others = freshSpecs(63);
    expect(builds(() => others.forEach((s) => modelFor(s)))).toBe(63);
    expect(builds(() => expect(modelFor(kept)).toBe(model))).toBe(0);
  });

  test("a model named again moves to the back of the queue: 63 new models later it is still kept, the others before it are not", () => {
    const [kept] = freshSpecs(1);
    const first = freshSpecs(63);
    modelFor(kept);
    first.forEach((s) => modelFor(s));
    modelFor(kept); // used again: now the last used
    const second = freshSpecs(63);
    expect(builds(() => second.forEach((s) => modelFor(s)))).toBe(63);
    expect(cachedModelCount()).toBe(64);
    expect(builds(() => modelFor(kept))).toBe(0); // kept: used after every one of `first`
    expect(builds(() => modelFor(first[0]))).toBe(1); // pushed out by `second`
  });

  test("the 65th model pushes out exactly the one used least recently", () => {
    const specs = freshSpecs(65);
    specs.forEach((s) => modelFor(s));
    expect(cachedModelCount()).toBe(64);
    expect(builds(() => modelFor(specs[1]))).toBe(0); // the second one is still kept
    expect(builds(() => modelFor(specs[0]))).toBe(1); // the first one was pushed out
  });

  test("a model named in the call before is returned again even after 64 bad model texts went through the cache", () => {
    const [good] = freshSpecs(1);
    const model = modelFor(good);
    const bad = badSpecs(64);
    expect(builds(() => bad.forEach((s) => expect(tryModel(s)).toBeInstanceOf(Error)))).toBe(64);
    expect(builds(() => expect(modelFor(good)).toBe(model))).toBe(0);
  });
});

describe("a bad model text is remembered with its error", () => {
  test("named again, it is not tried again and gives the core's own error, unwrapped", () => {
    const [bad] = badSpecs(1);
    let core: unknown;
    try {
      Cosmology.fromSpec(bad);
    } catch (e) {
      core = e;
    }
    expect(core).toBeInstanceOf(Error);
    const first = tryModel(bad);
    expect(first).toBeInstanceOf((core as Error).constructor as new () => Error);
    expect((first as Error).message).toBe((core as Error).message);
    expect(builds(() => expect(tryModel(bad)).toBe(first))).toBe(0);
  });

  test("a good model text after a bad one gives its own model, not the bad one's error", () => {
    const [bad] = badSpecs(1);
    const [good] = freshSpecs(1);
    expect(tryModel(bad)).toBeInstanceOf(Error);
    expect(tryModel(good)).toBeInstanceOf(Cosmology);
    expect(tryModel(bad)).toBeInstanceOf(Error);
    expect((tryModel(good) as Cosmology).H0).toBeCloseTo(Number(good.slice(3, good.indexOf(";"))), 12);
  });
});
