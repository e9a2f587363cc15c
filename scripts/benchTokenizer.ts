/**
 * Benchmark (not a test): how long the pane takes to read the formulas a stranger can craft, each
 * family of test/craftedFormulas.ts at Excel's 8,192 characters, through the three readers the pane
 * runs on a workbook's text: `tokenize`, `restorableFormula` (Thaw and the repair banner) and
 * `findCalls` (the inspector). Each family is read in 5 fresh processes: the first call there (cold:
 * the code is not compiled yet, as for the first formula the pane reads), min and median over the
 * processes; then, warm, the min and median of 25 more calls in one process.
 * Target: ≤ 10 ms for any formula. Run with `npm run bench -- --tokenizer` (or `npx tsx scripts/benchTokenizer.ts`).
 */
import { execFileSync } from "node:child_process";
import { fileURLToPath } from "node:url";
import { findCalls, tokenize } from "../taskpane/formulaCalls.js";
import { restorableFormula } from "../taskpane/restorableFormula.js";
import { craftedFamilies } from "../test/craftedFormulas.js";

const length = 8192;
const runs = 25;
const processes = 5;
const targetMs = 10;
const readers: Record<string, (formula: string) => unknown> = {
  tokenize,
  restorableFormula: (formula) => restorableFormula(formula, { singleCell: true }),
  findCalls,
};

/** ms of one read (an unreadable formula is read as far as it goes, then throws). */
function once(read: (formula: string) => unknown, formula: string): number {
  const t0 = performance.now();
  try {
    read(formula);
  } catch {
    // measured all the same
  }
  return performance.now() - t0;
}

type Figures = Record<string, { cold: number; min: number; median: number }>;

/** In a child: one family through every reader, cold first. */
function measureFamily(index: number): Figures {
  const formula = craftedFamilies[index].formula(length);
  const out: Figures = {};
  for (const [name, read] of Object.entries(readers)) {
    const cold = once(read, formula);
    const times = Array.from({ length: runs }, () => once(read, formula)).sort((a, b) => a - b);
    out[name] = { cold, min: times[0], median: times[Math.floor(runs / 2)] };
  }
  return out;
}

const sorted = (xs: number[]) => [...xs].sort((a, b) => a - b);
const median = (xs: number[]) => sorted(xs)[Math.floor(xs.length / 2)];

/** Runs the benchmark and prints its table; returns the slowest read (median of the cold reads) in ms. */
export function benchTokenizer(): number {
  const self = fileURLToPath(import.meta.url);
  const pad = (s: string, w: number) => s.padEnd(w);
  const ms = (x: number) => x.toFixed(2);
  console.log(`\ncrafted formulas of ${length} characters (test/craftedFormulas.ts), ms; target ≤ ${targetMs} ms a formula`);
  console.log(`cold: first read in a fresh process, min / median of ${processes} processes; warm: min / median of ${runs} reads in one`);
  console.log(pad("family", 48) + Object.keys(readers).map((r) => pad(`${r} cold | warm`, 30)).join(""));
  let slowest = { ms: 0, what: "" };
  craftedFamilies.forEach((family, index) => {
    const samples = Array.from({ length: processes }, () =>
      JSON.parse(execFileSync(process.execPath, [...process.execArgv, self, "--family", String(index)]).toString().trim().split("\n").pop()!) as Figures,
    );
    const cells = Object.keys(readers).map((reader) => {
      const cold = samples.map((s) => s[reader].cold);
      if (median(cold) > slowest.ms) slowest = { ms: median(cold), what: `${reader}, ${family.name}` };
      return pad(`${ms(sorted(cold)[0])} / ${ms(median(cold))} | ${ms(samples[0][reader].min)} / ${ms(samples[0][reader].median)}`, 30);
    });
    console.log(pad(family.name, 48) + cells.join(""));
  });
  console.log(`slowest read: ${ms(slowest.ms)} ms (${slowest.what}; median of the cold reads) — target ≤ ${targetMs} ms`);
  return slowest.ms;
}

const family = process.argv.indexOf("--family");
if (family >= 0) {
  console.log(JSON.stringify(measureFamily(Number(process.argv[family + 1]))));
} else if (process.argv[1] === fileURLToPath(import.meta.url)) {
  benchTokenizer();
}
