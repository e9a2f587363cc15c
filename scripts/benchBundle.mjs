// One figure of the worksheet-path benchmark, measured where users are: the built functions.js run
// in this fresh process's own global scope (vm.runInThisContext: no separate context, so global
// look-ups cost what they cost in a page), with stub CustomFunctions and Office globals. Prints one
// JSON line. Usage: node scripts/benchBundle.mjs <functions.js> <figure>
// The best of several passes is reported: the JIT and V8's allocator settle over the first passes,
// as they do when a sheet recalculates (a forced full GC between passes was tried: it resets V8's
// allocation feedback and makes every pass a first one).
//   single          100k single-cell calls of DIST_LUM, ns a call
//   range:<NAME>    one call over a 100k-row column, ns a cell
//   floor           only building a 100k-row result array (no computing), ns a cell: the floor of range:*
//   cold            the first DIST_LUM(1) after the bundle loads (shared tables + model), ms
//   cold:<NAME>     the first formula of another kind (AGE(1), LOOKBACK(1), REDSHIFT(6791,"DIST_LUM"), DIST_LUM_FAR = DIST_LUM(1000)), ms
//   models          DIST_LUM(1, "P18-BAO; H0=…") with a new model each call, ms a model (mean of 200)
//   degenerate      the slowest single cell among inverses and distances in models at the edge, ms
//   growthTable     the growth table a new model builds at its first GROWTH (GROWTH minus DIST_LUM of a new model), ms
//   specs:<N>       DIST_LUM(1, <column of N distinct specs>): ms a spec and the extra RSS the call took, MiB
//   catalogue:<NAME> one call over a 100k-row column of a catalogue function (arguments below), ns a cell;
//                  NAME@variant times the same function with other arguments (REDSHIFT_CMB@text: positions as
//                  text, EXTINCTION@calzetti-um, MAG_AB@f-lambda)
//   grid:<N>:row     DIST_LUM(1,000 z as a column, N distinct models as a row): ms the call (its models new)
//   grid:<N>:column  the same grid turned: 1,000 z as a row against N models as a column, ms
//   chi2:<N>         CHI2_MODULUS over N rows of z, mu, mu_err (every row filled): ms and extra RSS, MiB
//   lf:<CASE>        LUMINOSITY_FUNCTION over a whole column (1,048,576 cells): "edges" 1,000 sources binned
//                    by 8 edges atop a blank whole column; "full" the same against a whole column of
//                    increasing numbers as edges; "rows" a whole column of sources (every row filled)
//                    against 8 edges: ms, extra RSS (MiB) and what the call returned (rows, or its error)
import { readFileSync } from "node:fs";
import vm from "node:vm";
import { installStubHost } from "./stubHost.mjs";

const [bundle, figure] = process.argv.slice(2);
const n = 100_000;
const preset = process.env.ZC_BENCH_PRESET ?? "P18-BAO"; // another name only to time an older build
const settings = { "zcell.activeModel": preset };
const registered = installStubHost(settings);

/** Redshifts uniform in [0.01, 10] from a fixed seed (mulberry32). */
function redshifts(count) {
  let a = 42;
  return Array.from({ length: count }, () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = Math.imul(a ^ (a >>> 15), a | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return 0.01 + (9.99 * ((t ^ (t >>> 14)) >>> 0)) / 4294967296;
  });
}

const passes = 8;
const settle = (value) => (value && typeof value.then === "function" ? value : Promise.resolve(value));
const now = () => Number(process.hrtime.bigint()) / 1e6; // ms

const source = readFileSync(bundle, "utf8");
const loadStart = now();
vm.runInThisContext(source, { filename: "functions.js" });
const loaded = now();
await Promise.resolve(); // let the bundle's own start-up microtasks run, as a page would

let result;
/** First formulas timed by cold:<NAME> (omitted optional arguments are null, as Excel passes them). */
const coldCalls = {
  DIST_LUM: ["DIST_LUM", [[1]], null, null],
  AGE: ["AGE", [[1]], null, null],
  LOOKBACK: ["LOOKBACK", [[1]], null, null],
  REDSHIFT: ["REDSHIFT", [[6791]], [["DIST_LUM"]], null, null],
  DIST_LUM_FAR: ["DIST_LUM", [[1000]], null, null],
};
if (figure === "cold" || figure.startsWith("cold:")) {
  const [id, ...args] = coldCalls[figure === "cold" ? "DIST_LUM" : figure.slice("cold:".length)];
  const fn = registered.get(id);
  const t0 = now();
  const out = await settle(fn(...args));
  result = { ms: now() - t0, loadMs: loaded - loadStart, check: out[0][0] };
} else if (figure === "single") {
  const fn = registered.get("DIST_LUM");
  const cells = redshifts(n).map((z) => [[z]]);
  let sink = 0;
  for (let i = 0; i < 2000; i++) sink += (await settle(fn(cells[i])))[0][0]; // the model is built here, not timed
  const pass = async () => {
    for (let i = 0; i < n; i++) {
      const out = fn(cells[i]);
      sink += (out && typeof out.then === "function" ? await out : out)[0][0];
    }
  };
  let best = Infinity;
  for (let k = 0; k < passes; k++) {
    const t0 = now();
    await pass();
    best = Math.min(best, now() - t0);
  }
  result = { ns: (best * 1e6) / n, check: sink };
} else if (figure.startsWith("range:")) {
  const fn = registered.get(figure.slice("range:".length));
  const column = redshifts(n).map((z) => [z]);
  await settle(fn(column.slice(0, 1000)));
  let best = Infinity;
  let sink = 0;
  for (let k = 0; k < passes; k++) {
    const t0 = now();
    const out = await settle(fn(column));
    best = Math.min(best, now() - t0);
    sink += out[n - 1][0];
  }
  result = { ns: (best * 1e6) / n, check: sink };
} else if (figure === "floor") {
  // what any range result costs here before a single value is computed: the 100k one-cell rows a
  // custom function hands back (a 2-D array), filled with numbers
  const column = redshifts(n);
  let best = Infinity;
  let sink = 0;
  for (let k = 0; k < passes; k++) {
    const t0 = now();
    const out = new Array(n);
    for (let r = 0; r < n; r++) out[r] = [column[r]];
    best = Math.min(best, now() - t0);
    sink += out[n - 1][0];
  }
  result = { ns: (best * 1e6) / n, check: sink };
} else if (figure.startsWith("catalogue:")) {
  // each function's column against typical constant arguments (a 2e-14 erg/s/cm2 survey over 100 deg²)
  const name = figure.slice("catalogue:".length);
  const zs = redshifts(n).map((z) => [z]);
  const lums = zs.map(([z]) => [1e43 * 10 ** (z / 2.5)]);
  // sexagesimal positions as a catalogue prints them, spread over the sky from the redshifts: "hh:mm:ss.ss", "±dd:mm:ss.s"
  const two = (x) => String(x).padStart(2, "0");
  const raText = (x) => `${two(Math.floor(x / 15))}:${two(Math.floor((x * 4) % 60))}:${((x * 240) % 60).toFixed(2).padStart(5, "0")}`;
  const decText = (x) => `${x < 0 ? "-" : "+"}${two(Math.floor(Math.abs(x)))}:${two(Math.floor((Math.abs(x) * 60) % 60))}:${((Math.abs(x) * 3600) % 60).toFixed(1).padStart(4, "0")}`;
  const raDeg = zs.map(([z]) => (z * 997.3) % 360);
  const decDeg = zs.map(([z]) => ((z * 7919.1) % 179) - 89.5);
  // through JSON, as a host hands cells over (flat strings, not the ropes a template literal makes);
  // made only for the figures that read them, so that no other figure's heap holds them
  const asPassed = (column) => JSON.parse(JSON.stringify(column));
  const text = (make) => {
    let column;
    return (rows) => (column ??= asPassed(make())).slice(0, rows);
  };
  const ras = text(() => raDeg.map((x) => [raText(x)]));
  const decs = text(() => decDeg.map((x) => [decText(x)]));
  const ras2 = text(() => raDeg.map((x) => [raText((x + 0.001) % 360)]));
  const decs2 = text(() => decDeg.map((x) => [decText(x + 0.0005)]));
  const calls = {
    DIST_LUM_ERR: (z) => [z, 0.01],
    LUMINOSITY_ERR: (z) => [1e-13, 1e-14, z, 0.01],
    LUMINOSITY_REST: (z) => [0.01, z, -0.7, 3, 1.4],
    LUMINOSITY_REST_ERR: (z) => [0.01, 0.001, z, 0.01, -0.7, 0.1, 3, 1.4],
    REDSHIFT_LIMIT: (_z, lum) => [lum, 2e-14],
    VOLUME_MAX: (z) => [z, 0.05, 3, 100],
    REDSHIFT_CMB: (z) => [z, 150, 20],
    RESCALE: (z) => [1e44, z, "luminosity", "W9-ALL"],
    DIST_HUBBLE: (z) => [z],
    DIST_VOLUME: (z) => [z],
    SIGMA_CRIT: (z) => [z, 11],
    OVERDENSITY: (z) => [z, "vir"],
    HALO_RADIUS: (z) => [1e14, z, "200c"],
    HALO_MASS: (z) => [1000, z, "500c"],
    SURFACE_LUM: (z) => [24, z, 4.65],
    SURFACE_MAG: (z) => [100, z, 4.65],
    GROWTH: (z) => [z],
    GROWTH_RATE: (z) => [z],
    // the catalogue steps (dust, indices, T_b, f_λ), shaped as a catalogue has them (omitted optional arguments as null,
    // as Excel passes them): a column of E(B−V) at one band, and a column of wavelengths in µm;
    // flux densities and errors in columns; a column of f_λ at one band
    EXTINCTION: (z) => [6231, z.map(([x]) => [0.01 + 0.05 * x]), null, null, null],
    "EXTINCTION@calzetti-um": (z) => [z.map(([x]) => [0.2 + 0.2 * x]), 0.05, "Calzetti 2000", null, "um"],
    INDEX_BETWEEN: (z) => [z.map(([x]) => [1 + x]), 1.4, z.map(([x]) => [0.5 + x / 3]), 5, null],
    INDEX_BETWEEN_ERR: (z) => [z.map(([x]) => [1 + x]), 1.4, z.map(([x]) => [0.5 + x / 3]), 5, z.map(([x]) => [0.05 + x / 100]), z.map(([x]) => [0.02 + x / 200]), null],
    BRIGHTNESS_TEMP: (z) => [z.map(([x]) => [0.01 * (1 + x)]), 5, z.map(([x]) => [1 + x / 5]), z.map(([x]) => [0.5 + x / 10]), z, null, null, "mas"],
    "MAG_AB@f-lambda": (z) => [z.map(([x]) => [1e-17 * (1 + x)]), "erg/s/cm2/Angstrom", 6231],
    // positions: text parsed in every cell
    "REDSHIFT_CMB@text": (z, _lum, rows) => [z, ras(rows), decs(rows)],
    COORD_DEG: (_z, _lum, rows) => [ras(rows), "ra"],
    COORD_TEXT: (_z, _lum, rows) => [raDeg.slice(0, rows).map((x) => [x]), "ra"],
    SEPARATION: (_z, _lum, rows) => [ras(rows), decs(rows), ras2(rows), decs2(rows)],
    COORD_CONVERT: (_z, _lum, rows) => [ras(rows), decs(rows), "equatorial", "galactic", "lat"],
    // velocities and the rest frame
    VELOCITY: (z) => [z],
    Z_FROM_VELOCITY: (z) => [z.map(([x]) => [x * 29979.2458])],
    Z_COMBINE: (z) => [z, 0.001],
    VELOCITY_PECULIAR: (z) => [z, 0.05],
    REST_FRAME: (z, lum) => [lum.map(([x]) => [x / 1e40]), z, "wavelength", "Angstrom"],
    OBSERVED_FRAME: (z, lum) => [lum.map(([x]) => [x / 1e40]), z, "frequency", "GHz"],
  };
  const fn = registered.get(name.split("@")[0]);
  const args = (rows) => calls[name](zs.slice(0, rows), lums.slice(0, rows), rows);
  await settle(fn(...args(1000)));
  const full = args(n);
  let best = Infinity;
  let sink = 0;
  for (let k = 0; k < passes; k++) {
    const t0 = now();
    const out = await settle(fn(...full));
    best = Math.min(best, now() - t0);
    sink += out[n - 1][0];
  }
  result = { ns: (best * 1e6) / n, check: sink };
} else if (figure === "models") {
  const fn = registered.get("DIST_LUM");
  await settle(fn([[1]])); // shared tables and the first model are the cold figure, not this one
  const count = 200;
  let sink = 0;
  const t0 = now();
  for (let i = 0; i < count; i++) sink += (await settle(fn([[1]], [[`${preset}; H0=${60 + i / 20}`]])))[0][0];
  result = { ms: (now() - t0) / count, check: sink };
} else if (figure === "growthTable") {
  // the growth table a model builds at its first GROWTH: a new model's GROWTH minus its DIST_LUM
  const distance = registered.get("DIST_LUM");
  const growth = registered.get("GROWTH");
  await settle(growth([[1]]));
  const count = 100;
  let sink = 0;
  let both = 0;
  let alone = 0;
  for (let i = 0; i < count; i++) {
    const spec = [[`${preset}; H0=${60 + i / 20}`]];
    const other = [[`${preset}; H0=${80 + i / 20}`]];
    let t0 = now();
    sink += (await settle(distance([[1]], other)))[0][0];
    alone += now() - t0;
    t0 = now();
    sink += (await settle(growth([[1]], spec)))[0][0];
    both += now() - t0;
  }
  result = { ms: (both - alone) / count, check: sink };
} else if (figure.startsWith("specs:")) {
  // one DIST_LUM over a column of distinct model specs: time a spec and the memory the call keeps
  const count = Number(figure.slice("specs:".length));
  const fn = registered.get("DIST_LUM");
  await settle(fn([[1]]));
  const column = Array.from({ length: count }, (_, i) => [`${preset}; H0=${(60 + (20 * i) / count).toFixed(9)}`]);
  globalThis.gc?.();
  const before = process.memoryUsage().rss;
  const heapBase = process.memoryUsage().heapUsed;
  let peak = before;
  const watch = setInterval(() => (peak = Math.max(peak, process.memoryUsage().rss)), 5);
  const t0 = now();
  const out = await settle(fn([[1]], column));
  const ms = now() - t0;
  clearInterval(watch);
  peak = Math.max(peak, process.memoryUsage().rss);
  globalThis.gc?.(); // with --expose-gc: what the call still holds once its garbage is collected
  const retained = globalThis.gc ? (process.memoryUsage().heapUsed - heapBase) / 2 ** 20 : undefined;
  result = { msPerSpec: ms / count, ms, extraRssMiB: (peak - before) / 2 ** 20, heapAfterGcMiB: retained, check: out[count - 1][0] };
} else if (figure.startsWith("grid:")) {
  // a what-if table: a column of redshifts against a row of models (or turned), every model new
  const [, count, orientation] = figure.split(":");
  const fn = registered.get("DIST_LUM");
  await settle(fn([[1]])); // shared tables and the workbook's model: the cold figure, not this one
  const specs = Array.from({ length: Number(count) }, (_, i) => `${preset}; H0=${(60 + (20 * i) / Number(count)).toFixed(6)}`);
  const zs = redshifts(1000);
  const [z, models] = orientation === "row" ? [zs.map((x) => [x]), [specs]] : [[zs], specs.map((s) => [s])];
  const t0 = now();
  const out = await settle(fn(z, models));
  result = { ms: now() - t0, cells: out.length * out[0].length, check: out[out.length - 1][out[0].length - 1] };
} else if (figure.startsWith("chi2:") || figure.startsWith("lf:")) {
  // an aggregate over whole columns: the time of one call and the memory it takes (inputs made first)
  const rows = 1_048_576;
  const zs = redshifts(1_000_000);
  let call;
  if (figure.startsWith("chi2:")) {
    const count = Number(figure.slice("chi2:".length));
    const z = zs.slice(0, count).map((x) => [x]);
    const mu = z.map(([x], i) => [5 * Math.log10(x * 4300 * (1 + x)) + 25 + ((i % 7) - 3) * 0.05]);
    const err = z.map(() => [0.1]);
    call = () => registered.get("CHI2_MODULUS")(z, mu, err, null, null);
  } else {
    const kind = figure.slice("lf:".length);
    const logL = (i) => 42 + (3 * ((i * 7919) % 1000)) / 1000;
    const sources = kind === "rows" ? rows : 1000;
    const values = Array.from({ length: rows }, (_, i) => [i < sources ? logL(i) : ""]);
    const vMax = Array.from({ length: rows }, (_, i) => [i < sources ? 1e6 + i : ""]);
    const edges = Array.from({ length: rows }, (_, i) => [kind === "full" ? 41 + i * 1e-5 : i < 8 ? 41.5 + 0.5 * i : ""]);
    call = () => registered.get("LUMINOSITY_FUNCTION")(values, vMax, edges);
  }
  await settle(registered.get("DIST_LUM")([[1]])); // the workbook's model and shared tables: not this figure
  globalThis.gc?.();
  const before = process.memoryUsage().rss;
  let peak = before;
  const watch = setInterval(() => (peak = Math.max(peak, process.memoryUsage().rss)), 5);
  const t0 = now();
  const out = await settle(call());
  const ms = now() - t0;
  clearInterval(watch);
  peak = Math.max(peak, process.memoryUsage().rss);
  const first = out[0][0];
  result = { ms, extraRssMiB: (peak - before) / 2 ** 20, rows: out.length, check: typeof first === "number" ? first : `${first.code}: ${first.message}` };
} else if (figure === "degenerate") {
  // every inverse and some forward functions in models at the edge of what zcell builds, at values
  // from tiny to absurd: the slowest single cell once its model is built, ms
  const models = [
    "H0=70; Om=0; OL=1; w0=-0.9999999", "H0=70; Om=0; OL=1", "H0=70; Om=1e-12; OL=1", "H0=70; Om=0; OL=0",
    "H0=70; Om=0.3; w0=-2; wa=3", "H0=70; Om=0.3; w0=-0.34; wa=0", "H0=70; Om=5; OL=0", "P18-BAO; Ok=-0.05",
  ];
  const quantities = ["DIST_LUM", "DIST_LOS", "DIST_TRANS", "DIST_ANG", "DIST_LIGHT", "MODULUS", "LOOKBACK", "AGE", "VOLUME"];
  const values = [1e-12, 1, 1e3, 1e6, 1e30];
  const redshift = registered.get("REDSHIFT");
  let slowest = { ms: 0, cell: "" };
  for (const model of models) {
    await settle(registered.get("DIST_LUM")([[1]], [[model]])); // build the model first: not timed
    const cells = [
      ...quantities.flatMap((q) => values.map((v) => [`REDSHIFT(${v}, "${q}")`, () => redshift([[v]], [[q]], [[model]], null)])),
      ...[1e-8, 1, 1e4, 1e8, 1e12].flatMap((z) =>
        ["DIST_LUM", "LOOKBACK", "AGE", "VOLUME", "DIST_LIGHT"].map((f) => [`${f}(${z})`, () => registered.get(f)([[z]], [[model]])]),
      ),
    ];
    for (const [cell, run] of cells) {
      const t0 = now();
      await settle(run());
      const ms = now() - t0;
      if (ms > slowest.ms) slowest = { ms, cell: `${cell} in "${model}"` };
    }
  }
  result = slowest;
} else {
  throw new Error(`unknown figure ${figure}`);
}
console.log(JSON.stringify(result));
