/**
 * The worksheet-path section of `npm run bench`: the four figures a user meets, measured through the
 * built functions.js (the production build `npm run build` makes, and the build `npm start` serves:
 * production with source maps beside it), each figure in 5 fresh processes (scripts/benchBundle.mjs),
 * reported as min and median; with the reference library's scalar and vectorised times from the
 * same run and the ratios.
 */
import { execFileSync, spawnSync } from "node:child_process";
import { existsSync, mkdtempSync, statSync } from "node:fs";
import { tmpdir } from "node:os";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { Cosmology } from "../core/distances/Cosmology.js";
import { paneInteractiveMs } from "./benchPane.js";

const root = fileURLToPath(new URL("..", import.meta.url));
const runs = 5;
const rangeFunctions = ["DIST_LUM", "DIST_ANG", "DIST_LOS", "DIST_TRANS", "DIST_LIGHT", "LOOKBACK", "AGE"];
/** Catalogue functions timed over a 100k-row column (no target: for the record), production build only. */
const catalogueFunctions = ["DIST_LUM_ERR", "LUMINOSITY_ERR", "LUMINOSITY_REST", "REDSHIFT_LIMIT", "VOLUME_MAX", "REDSHIFT_CMB"];
/** The population and structure functions of 0.2.0, each timed against ≤ 1 µs a cell over a 100k-row column. */
const structureFunctions = ["LUMINOSITY_REST_ERR", "RESCALE", "DIST_HUBBLE", "DIST_VOLUME", "SIGMA_CRIT", "OVERDENSITY", "HALO_RADIUS", "HALO_MASS", "SURFACE_LUM", "SURFACE_MAG", "GROWTH", "GROWTH_RATE"];

/** Issue 29's catalogue steps, each timed against ≤ 1 µs a cell over a 100k-row column (EXTINCTION twice: its default law in Angstrom, and Calzetti 2000 in um; MAG_AB with f_λ). */
const catalogueStepFigures = ["EXTINCTION", "EXTINCTION@calzetti-um", "INDEX_BETWEEN", "INDEX_BETWEEN_ERR", "BRIGHTNESS_TEMP", "MAG_AB@f-lambda"];
/** Positions (sexagesimal text read in every cell), velocities and the rest frame (0.3.0), each timed against ≤ 1 µs a cell over a 100k-row column. */
const positionFunctions = [
  "COORD_DEG", "COORD_TEXT", "SEPARATION", "COORD_CONVERT", "REDSHIFT_CMB@text",
  "VELOCITY", "Z_FROM_VELOCITY", "Z_COMBINE", "VELOCITY_PECULIAR", "REST_FRAME", "OBSERVED_FRAME",
];

/** First formulas after the bundle loads (scripts/benchBundle.mjs cold:*): the model and its tables are built for them. */
const coldFormulas: [string, string][] = [
  ["cold", "DIST_LUM(1)"],
  ["cold:LOOKBACK", "LOOKBACK(1)"],
  ["cold:AGE", "AGE(1)"],
  ["cold:REDSHIFT", 'REDSHIFT(6791, "DIST_LUM")'],
  ["cold:DIST_LUM_FAR", "DIST_LUM(1000)"],
];

/** Targets of the worksheet path (issue: one formula per row, whole ranges, first formula, new models). */
const targets = { single: 500, range: 100, cold: 15, models: 1, degenerate: 50, specsMiB: 100, paneMs: 1000, structure: 1000, growthTable: 1, chi2Ms: 1000, chi2MiB: 100 };

const pad = (s: string, w: number) => s.padEnd(w);
const fmt = (x: { min: number; median: number }, digits: number) => `${x.min.toFixed(digits)} / ${x.median.toFixed(digits)}`;

function build(extra: string[]): string {
  const out = mkdtempSync(join(tmpdir(), "zcell-bench-"));
  execFileSync(process.execPath, [`${root}node_modules/webpack/bin/webpack.js`, "--mode", "production", ...extra, "--output-path", out], { cwd: root, stdio: "ignore" });
  return join(out, "functions.js");
}

type Key = "ns" | "ms" | "msPerSpec" | "extraRssMiB";

/** min and median of one figure over `runs` fresh processes. */
function figure(bundle: string, name: string, key: Key): { min: number; median: number } {
  return figures(bundle, name, [key])[key]!;
}

/** min and median of several keys of one figure, from the same `runs` fresh processes. */
function figures(bundle: string, name: string, keys: Key[]): Partial<Record<Key, { min: number; median: number }>> {
  const values: Record<string, number>[] = [];
  for (let i = 0; i < runs; i++) {
    const out = execFileSync(process.execPath, ["--expose-gc", `${root}scripts/benchBundle.mjs`, bundle, name]).toString().trim().split("\n").pop()!;
    values.push(JSON.parse(out) as Record<string, number>);
  }
  const result: Partial<Record<Key, { min: number; median: number }>> = {};
  for (const key of keys) {
    const sorted = values.map((v) => v[key]).sort((a, b) => a - b);
    result[key] = { min: sorted[0], median: sorted[Math.floor(sorted.length / 2)] };
  }
  return result;
}

function reference(): { scalar_ns: number; vector_ns: number } | undefined {
  if (spawnSync("/usr/bin/python3", ["-c", "import astropy"], { stdio: "ignore" }).status !== 0) return undefined;
  const m = Cosmology.fromSpec("P18-BAO");
  const model = { H0: m.H0, Om0: m.Om - m.OnuMassive, Tcmb0: m.Tcmb, Neff: m.Neff, m_nu: [0, 1, 2].map((i) => m.parameters.mnu[i] ?? 0) };
  const script = fileURLToPath(new URL("bench_astropy_calls.py", import.meta.url));
  return JSON.parse(execFileSync("/usr/bin/python3", [script], { input: JSON.stringify({ model, n_scalar: 2000, n_vector: 20_000 }) }).toString());
}

/** Prints the worksheet-path section. */
export async function benchWorksheet(): Promise<void> {
  const ref = reference();
  const bundles: [string, string][] = [
    ["npm run build (production)", build([])],
    ["npm start (production + source maps)", build(["--devtool", "source-map"])],
  ];
  console.log(`\nworksheet path: the built functions.js in a fresh process's global scope, P18-BAO, z uniform in [0.01, 10]; min / median of ${runs} processes (each the best of 8 passes)`);
  if (ref) console.log(`reference library (astropy, same run): scalar call ${ref.scalar_ns.toFixed(0)} ns, vectorised ${ref.vector_ns.toFixed(0)} ns a value`);
  else console.log("(astropy not found at /usr/bin/python3: no reference timings)");
  for (const [label, bundle] of bundles) {
    console.log(`\n${label}: ${bundle} (${(statSync(bundle).size / 1024).toFixed(1)} KiB, no cap: the budgets are the times below)`);
    console.log(pad("figure", 42) + pad("min / median", 20) + pad("target", 12) + "ratio to reference (min)");
    const single = figure(bundle, "single", "ns");
    console.log(pad("one formula a row: 100k DIST_LUM calls", 42) + pad(`${fmt(single, 0)} ns`, 20) + pad(`≤ ${targets.single} ns`, 12) + (ref ? `${(ref.scalar_ns / single.min).toFixed(0)}× the scalar call` : "—"));
    for (const name of rangeFunctions) {
      const r = figure(bundle, `range:${name}`, "ns");
      console.log(pad(`one call over 100k rows: ${name}`, 42) + pad(`${fmt(r, 0)} ns a cell`, 20) + pad(`≤ ${targets.range} ns`, 12) + (ref && name === "DIST_LUM" ? `${(ref.vector_ns / r.min).toFixed(0)}× vectorised` : ""));
    }
    const floor = figure(bundle, "floor", "ns");
    console.log(pad("  floor: the 100k-row result array alone", 42) + pad(`${fmt(floor, 0)} ns a cell`, 20) + pad("", 12) + "(this machine's allocation and GC; no computing)");
    for (const [name, label] of coldFormulas) {
      const cold = figure(bundle, name, "ms");
      console.log(pad(`first formula after load: ${label}`, 42) + pad(`${fmt(cold, 1)} ms`, 20) + `≤ ${targets.cold} ms`);
    }
    if (bundle === bundles[0][1] && existsSync("/usr/bin/chromium")) {
      const pane = await paneInteractiveMs(dirname(bundle));
      console.log(pad("pane interactive (headless chromium)", 42) + pad(`${fmt(pane, 0)} ms`, 20) + `≤ ${targets.paneMs} ms (7 loads, fake host)`);
    }
    const models = figure(bundle, "models", "ms");
    console.log(pad("a new model (mean of 200)", 42) + pad(`${fmt(models, 2)} ms`, 20) + `≤ ${targets.models} ms`);
    if (bundle !== bundles[0][1]) continue;
    const growthTable = figure(bundle, "growthTable", "ms");
    console.log(pad("growth table of a new model (mean of 100)", 42) + pad(`${fmt(growthTable, 2)} ms`, 20) + `≤ ${targets.growthTable} ms`);
    // a crafted workbook: the slowest cell in a model at the edge, and one formula over 10,000 distinct specs
    const degenerate = figure(bundle, "degenerate", "ms");
    console.log(pad("slowest cell, degenerate models (built)", 42) + pad(`${fmt(degenerate, 1)} ms`, 20) + `≤ ${targets.degenerate} ms`);
    const specTime = figure(bundle, "specs:10000", "msPerSpec");
    const specMemory = figure(bundle, "specs:10000", "extraRssMiB");
    console.log(pad("10,000 distinct specs in one call: time", 42) + pad(`${fmt(specTime, 2)} ms a spec`, 20) + "linear");
    console.log(pad("10,000 distinct specs in one call: memory", 42) + pad(`${fmt(specMemory, 0)} MiB`, 20) + `~${targets.specsMiB} MiB (peak RSS over the call)`);
    // a what-if grid: 1,000 redshifts against N distinct models; the cost is ~N builds + the cells, whichever way it lies
    for (const count of [40, 100, 200]) {
      for (const orientation of ["row", "column"]) {
        const grid = figure(bundle, `grid:${count}:${orientation}`, "ms");
        const label = orientation === "row" ? `grid: 1,000 z (column) × ${count} models (row)` : `grid: 1,000 z (row) × ${count} models (column)`;
        console.log(pad(label, 42) + pad(`${fmt(grid, 0)} ms`, 20) + pad("", 12) + `${(grid.min / count).toFixed(2)} ms a model (min), each model new`);
      }
    }
    // aggregates over whole columns (1,048,576 rows): time and the memory the call takes
    const chi2 = figures(bundle, "chi2:1000000", ["ms", "extraRssMiB"]);
    console.log(pad("CHI2_MODULUS, 10^6 rows: time", 42) + pad(`${fmt(chi2.ms!, 0)} ms`, 20) + `≤ ${targets.chi2Ms} ms`);
    console.log(pad("CHI2_MODULUS, 10^6 rows: memory", 42) + pad(`${fmt(chi2.extraRssMiB!, 0)} MiB`, 20) + `≤ ${targets.chi2MiB} MiB (RSS over the call)`);
    for (const [name, label] of [
      ["lf:edges", "edges atop a blank A:A"],
      ["lf:rows", "10^6 sources in A:A"],
      ["lf:full", "A:A of data as edges"],
    ]) {
      const lf = figures(bundle, name, ["ms", "extraRssMiB"]);
      console.log(pad(`LUMINOSITY_FUNCTION, ${label}`, 42) + pad(`${fmt(lf.ms!, 0)} ms`, 20) + pad("", 12) + `${fmt(lf.extraRssMiB!, 0)} MiB RSS over the call`);
    }
    for (const name of catalogueFunctions) {
      const r = figure(bundle, `catalogue:${name}`, "ns");
      console.log(pad(`one call over 100k rows: ${name}`, 42) + pad(`${fmt(r, 0)} ns a cell`, 20) + " (no target)");
    }
    catalogueRows(bundle, [...structureFunctions, ...positionFunctions, ...catalogueStepFigures]);
  }
}

/** One line a function: one call over a 100k-row column, against ≤ 1 µs a cell. */
function catalogueRows(bundle: string, names: string[]): void {
  for (const name of names) {
    const r = figure(bundle, `catalogue:${name}`, "ns");
    console.log(`${pad(`one call over 100k rows: ${name}`, 41)} ${pad(`${fmt(r, 0)} ns a cell`, 19)} ≤ ${targets.structure} ns`);
  }
}

/** The positions, velocities and rest-frame rows alone, through the production build (`npm run bench -- --positions`). */
export function benchPositions(): void {
  const bundle = build([]);
  console.log(`positions, velocities and the rest frame: the built functions.js, 100k rows; min / median of ${runs} processes (each the best of 8 passes)`);
  console.log(pad("figure", 42) + pad("min / median", 20) + "target");
  catalogueRows(bundle, positionFunctions);
  const floor = figure(bundle, "floor", "ns");
  console.log(pad("  floor: the 100k-row result array alone", 42) + pad(`${fmt(floor, 0)} ns a cell`, 20) + "(no computing)");
}

/** Only the catalogue-step rows (dust, two-band indices, brightness temperature, f_λ), through the production build (`npm run bench -- --steps`). */
export function benchCatalogueSteps(): void {
  const bundle = build([]);
  console.log(`catalogue steps through ${bundle} (production build, fresh process each, P18-CMB); min / median of ${runs} processes`);
  catalogueRows(bundle, catalogueStepFigures);
}
