/**
 * Benchmark (not a test): ns per value over 1e6 random redshifts in [0, 10] for the main quantities,
 * model build time, and the same workload through astropy where /usr/bin/python3 has it; then the
 * worksheet path through the built bundle (scripts/benchWorksheet.ts), then crafted formulas through
 * the pane's formula readers (scripts/benchTokenizer.ts). Run with `npm run bench`
 * (`npm run bench -- --worksheet` or `-- --tokenizer` for one section alone, `-- --steps` for the
 * catalogue steps (dust, two-band indices, brightness temperature, f_λ) alone, `-- --positions` for the
 * rows of the positions, velocities and rest-frame functions alone).
 */
import { execFileSync, spawnSync } from "node:child_process";
import { fileURLToPath } from "node:url";
import { Cosmology } from "../core/distances/Cosmology.js";
import { fermiDiracDensityFactor } from "../core/model/fermiDirac.js";
import { benchTokenizer } from "./benchTokenizer.js";
import { benchCatalogueSteps, benchPositions, benchWorksheet } from "./benchWorksheet.js";

const n = 1_000_000;

function randomRedshifts(count: number, seed: number): Float64Array {
  let a = seed >>> 0;
  const out = new Float64Array(count);
  for (let i = 0; i < count; i++) {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = Math.imul(a ^ (a >>> 15), a | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    out[i] = (10 * ((t ^ (t >>> 14)) >>> 0)) / 4294967296;
  }
  return out;
}

/**
 * A timing loop of its own for each method (compiled separately so that its call site stays
 * monomorphic, as a loop over one quantity in a caller would be).
 */
function loopOver(method: string, extraArgs = ""): (m: Cosmology, values: Float64Array) => number {
  return new Function(
    "m",
    "values",
    `let sink = 0; for (let i = 0; i < values.length; i++) sink += m.${method}(${extraArgs}values[i]); return sink;`,
  ) as (m: Cosmology, values: Float64Array) => number;
}

/** Best of five timed passes, ns per value (after a warm-up pass for the JIT). */
function nsPerValue(m: Cosmology, values: Float64Array, method: string, extraArgs = ""): number {
  const loop = loopOver(method, extraArgs);
  let sink = loop(m, values.subarray(0, 100_000));
  let best = Number.POSITIVE_INFINITY;
  for (let pass = 0; pass < 5; pass++) {
    const t0 = process.hrtime.bigint();
    sink += loop(m, values);
    best = Math.min(best, Number(process.hrtime.bigint() - t0) / values.length);
  }
  if (Number.isNaN(sink)) console.log("(NaN seen)");
  return best;
}

/** Measures one model in this process: build time, then ns per value for each quantity. */
function measure(spec: string): Record<string, number> {
  const z = randomRedshifts(n, 42);
  const t0 = process.hrtime.bigint();
  fermiDiracDensityFactor(1);
  const fermiTableMs = Number(process.hrtime.bigint() - t0) / 1e6;
  const builds = 200;
  const tb = process.hrtime.bigint();
  for (let i = 0; i < builds; i++) Cosmology.fromSpec(spec);
  const buildMs = Number(process.hrtime.bigint() - tb) / 1e6 / builds;
  const m = Cosmology.fromSpec(spec);
  const dl = Float64Array.from(z.subarray(0, 200_000), (x) => m.luminosityDistanceMpc(x));
  return {
    DL: nsPerValue(m, z, "luminosityDistanceMpc"),
    lookback: nsPerValue(m, z, "lookbackTimeGyr"),
    age: nsPerValue(m, z, "ageGyr"),
    volume: nsPerValue(m, z, "comovingVolumeMpc3"),
    inverseDL: nsPerValue(m, dl, "redshiftAt", '"luminosityDistance", '),
    buildMs,
    fermiTableMs,
  };
}

const only = process.argv.indexOf("--only");
if (only >= 0) {
  // child mode: one model in a fresh process, so each model's timings start from a clean JIT state
  console.log(JSON.stringify(measure(process.argv[only + 1])));
  process.exit(0);
}

if (process.argv.includes("--positions")) {
  benchPositions();
  process.exit(0);
}

if (process.argv.includes("--worksheet")) {
  await benchWorksheet();
  process.exit(0);
}

if (process.argv.includes("--steps")) {
  benchCatalogueSteps();
  process.exit(0);
}

if (process.argv.includes("--tokenizer")) {
  benchTokenizer();
  process.exit(0);
}

const specs = (process.env.ZC_BENCH_SPECS ?? "P18-BAO,CONCORDANCE").split(",");
const rows: Record<string, Record<string, number>> = {};
for (const spec of specs) {
  const out = execFileSync(process.execPath, [...process.execArgv, fileURLToPath(import.meta.url), "--only", spec]);
  rows[spec] = JSON.parse(out.toString().trim().split("\n").pop()!);
}
const fermiTableMs = rows[specs[0]].fermiTableMs;

let reference: Record<string, Record<string, number>> | undefined;
if (spawnSync("/usr/bin/python3", ["-c", "import astropy"], { stdio: "ignore" }).status === 0) {
  const models: Record<string, unknown> = {};
  const counts: Record<string, number> = {};
  for (const spec of specs) {
    const m = Cosmology.fromSpec(spec);
    models[spec] = { H0: m.H0, Om0: m.Om - m.OnuMassive, Tcmb0: m.Tcmb, Neff: m.Neff, m_nu: [0, 1, 2].map((i) => m.parameters.mnu[i] ?? 0) };
    // astropy integrates each value separately when radiation is on: a smaller sample keeps this short
    counts[spec] = m.Tcmb > 0 ? 5_000 : n;
  }
  const script = fileURLToPath(new URL("bench_astropy.py", import.meta.url));
  reference = JSON.parse(execFileSync("/usr/bin/python3", [script], { input: JSON.stringify({ models, n: counts }) }).toString());
}

const pad = (s: string, w: number) => s.padEnd(w);
console.log(`zcell benchmark: ${n.toExponential(0)} redshifts uniform in [0, 10], Node ${process.version}`);
console.log(`shared Fermi–Dirac table, decoded once per process from the bundled nodes: ${fermiTableMs.toFixed(1)} ms`);
console.log(pad("model", 13) + pad("quantity", 11) + pad("zcell ns", 10) + pad("astropy ns", 12) + "ratio");
for (const spec of specs) {
  for (const q of ["DL", "lookback", "age", "volume", "inverseDL"]) {
    const ours = rows[spec][q];
    const theirs = reference?.[spec]?.[q];
    console.log(
      pad(spec, 13) + pad(q, 11) + pad(ours.toFixed(1), 10) +
        pad(theirs === undefined ? "—" : theirs.toFixed(0), 12) + (theirs === undefined ? "—" : `${(theirs / ours).toFixed(0)}×`),
    );
  }
  console.log(pad(spec, 13) + pad("build", 11) + `${rows[spec].buildMs.toFixed(2)} ms`);
}
if (!reference) console.log("(astropy not found at /usr/bin/python3: no reference timings)");
await benchWorksheet();
benchTokenizer();
