/**
 * Compiled models by spec text, least recently used first out (64 kept), so that a column of
 * 100k formulas with the same model builds it once.
 */
import { Cosmology } from "../core/index.js";

const capacity = 64;
const cache = new Map<string, Cosmology | Error>();
let lastSpec: string | undefined;
let lastModel: Cosmology | undefined;
let builds = 0;

/**
 * The compiled model for a spec (built on first use; a failure is remembered too).
 * @param spec model spec text
 * @returns the model
 * @throws the core's TypeError/RangeError for a bad spec
 */
export function modelFor(spec: string): Cosmology {
  if (spec === lastSpec) return lastModel!; // the same model as the call before: no LRU reshuffle
  let entry = cache.get(spec);
  if (entry === undefined) {
    builds++;
    try {
      entry = Cosmology.fromSpec(spec);
    } catch (e) {
      entry = e instanceof Error ? e : new TypeError(String(e));
    }
    if (cache.size >= capacity) cache.delete(cache.keys().next().value as string);
  } else {
    cache.delete(spec);
  }
  cache.set(spec, entry);
  if (entry instanceof Error) throw entry;
  lastSpec = spec;
  lastModel = entry;
  return entry;
}

/** Number of models currently cached (for tests). */
export function cachedModelCount(): number {
  return cache.size;
}

/** Models built (or tried: a bad spec counts) since the add-in loaded: what a call's cost is counted in (for tests). */
export function modelBuildCount(): number {
  return builds;
}
