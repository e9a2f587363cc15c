// How long a cell holding a stranger's crafted text takes to be refused, measured where users are:
// the built functions.js run in this fresh process's own global scope (vm.runInThisContext, as
// scripts/benchBundle.mjs does), with stub CustomFunctions and Office globals, omitted arguments
// passed as null as Excel passes them. Each text is 32,767 characters (Excel's limit for a cell's
// text): a run of digits or spaces with a character at its end that makes the reader fail.
// Prints one line a case: min and median of 7 calls, ms. Usage: node scripts/benchStrangerText.mjs <functions.js>
import { readFileSync } from "node:fs";
import vm from "node:vm";
import { HostError, installStubHost } from "./stubHost.mjs";

const [bundle] = process.argv.slice(2);
const registered = installStubHost();
vm.runInThisContext(readFileSync(bundle, "utf8"), { filename: "functions.js" });
await Promise.resolve();

const limit = 32767;
// each call gets a text of its own (its first digit or character changes), so no cache of a model
// or unit read before answers it: every call reads the whole text, as a recalculation after an edit does
const digits = (k) => `${k % 9 + 1}${"1".repeat(limit - 2)}x`;
const spaced = (head, fill, tail) => head + fill.repeat(limit - head.length - tail.length) + tail;
const units = ["m", "s", "g", "K", "J", "W", "V"];
const cases = [
  ["DIST_LUM(z: digits)", "DIST_LUM", (k) => [[[digits(k)]], null, null]],
  ["DIST_LUM(z: column of 5 digit texts)", "DIST_LUM", (k) => [Array(5).fill([digits(k)]), null, null]],
  ["CHI2_MODULUS(3 rows of digits)", "CHI2_MODULUS", (k) => [[[digits(k)], [digits(k)], [digits(k)]], [[1], [1], [1]], [[1], [1], [1]], null, null]],
  ["COORD_DEG(digits, \"ra\")", "COORD_DEG", (k) => [[[digits(k)]], [["ra"]]]],
  ["CONVERT(digits, \"Mpc\", \"kpc\")", "CONVERT", (k) => [[[digits(k)]], "Mpc", "kpc", null]],
  ["DIST_LUM(1, \"H0=<digits>x; Om=0.3\")", "DIST_LUM", (k) => [[[1]], [[`H0=${digits(k).slice(0, limit - 12)}x; Om=0.3`]], null]],
  ["MODEL(\"P18-CMB\", \"H0\", digits)", "MODEL", (k) => [[["P18-CMB"]], [["H0"]], [[digits(k)]], null, null, null, null, null, null, null, null, null, null]],
  ["DIST_LUM(1,, \"m<spaces>x\")", "DIST_LUM", (k) => [[[1]], null, spaced(units[k], " ", "x")]],
  ["DIST_LUM(1,, \"m<tabs>x\")", "DIST_LUM", (k) => [[[1]], null, spaced(units[k], "\t", "x")]],
  ["CONVERT(1, \"m<spaces>x\", \"Mpc\")", "CONVERT", (k) => [[[1]], spaced(units[k], " ", "x"), "Mpc", null]],
  ["DIST_LUM(1, \"P18-CMB; H0=7<spaces>0x\")", "DIST_LUM", (k) => [[[1]], [[spaced(`P18-CMB; H0=${k + 1}`, " ", "0x")]], null]],
  ["DIST_LUM(1,, \"(((…m…)))\" nested)", "DIST_LUM", (k) => [[[1]], null, `${"(".repeat(16383)}${units[k]}${")".repeat(16383)}`]],
];

const now = () => Number(process.hrtime.bigint()) / 1e6;
for (const [label, id, argsOf] of cases) {
  const fn = registered.get(id);
  const times = [];
  let out;
  for (let k = 0; k < 7; k++) {
    const args = argsOf(k);
    const t0 = now();
    out = fn(...args);
    if (out && typeof out.then === "function") out = await out;
    times.push(now() - t0);
  }
  times.sort((a, b) => a - b);
  const first = Array.isArray(out) ? out[0]?.[0] : out;
  const shown = first instanceof HostError ? `${first.code} ${first.message}` : JSON.stringify(first);
  console.log(`${label.padEnd(42)} min ${times[0].toFixed(2).padStart(8)} ms  median ${times[3].toFixed(2).padStart(8)} ms  ${String(shown).slice(0, 70)}`);
}
