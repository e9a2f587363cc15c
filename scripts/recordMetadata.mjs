// Records the build's functions.json, sorted by id, as test/fixtures/functions.metadata.json (the host-simulation
// test compares the two). Run after `npm run build` when a function is added or changed on purpose:
//   node scripts/recordMetadata.mjs [build folder, default dist/]
import { readFileSync, writeFileSync } from "node:fs";

const dir = process.argv[2] ?? "dist/";
const metadata = JSON.parse(readFileSync(`${dir.replace(/\/?$/, "/")}functions.json`, "utf8"));
const sorted = { ...metadata, functions: [...metadata.functions].sort((a, b) => a.id.localeCompare(b.id)) };
/** The value with every object's keys in alphabetical order, as the fixture was first recorded. */
const keysSorted = (v) =>
  Array.isArray(v) ? v.map(keysSorted) : v !== null && typeof v === "object" ? Object.fromEntries(Object.keys(v).sort().map((k) => [k, keysSorted(v[k])])) : v;
writeFileSync(new URL("../test/fixtures/functions.metadata.json", import.meta.url), `${JSON.stringify(keysSorted(sorted), null, 1)}\n`);
console.log(`recorded ${sorted.functions.length} functions`);
