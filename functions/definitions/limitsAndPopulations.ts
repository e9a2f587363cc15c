/**
 * Flux limits and survey volumes: the redshift at which a source drops out, V_max.
 * Each entry: the arguments in the order of the ZC.* signature (built from argumentKinds.ts) and what one
 * cell computes in reference units; the declaration with its JSDoc is in ../declarations/limitsAndPopulations.ts.
 */
import {
  binnedLuminosityFunction,
  hubbleDiagramChi2,
  limitingRedshift,
  limitingRedshiftMag,
  maxVolumeMpc3,
} from "../../core/index.js";
import { CellError } from "../cellError.js";
import type { ArgSpec, ColumnCells, FunctionDef } from "../FunctionDef.js";
import { messages } from "../messages.js";
import { num, mag, model, unit, requiredArea, m, n } from "./argumentKinds.js";

const column = (name: string): ArgSpec => ({ kind: "number", name });

/**
 * Rows of equal-length columns as numbers: a row blank in every column is skipped; a row blank in
 * some, or holding an error, is an error naming the column and the row of the range (from 1). The
 * kept rows are packed into the columns' own arrays (no copy of a million-row catalogue), each
 * with its row's number in `rows`.
 */
function rowsOf(columns: Record<string, ColumnCells>, names: readonly string[]): { values: Float64Array[]; rows: Int32Array } {
  const [first] = names;
  for (const name of names) {
    if (columns[name].length !== columns[first].length) throw new CellError("value", messages.columnLengths(first, columns[first].length, name, columns[name].length));
  }
  const cells = names.map((name) => columns[name]);
  // the rows up to the last that is not blank in some column (each column was read up to its own)
  const end = Math.max(...cells.map((c) => c.numbers.length));
  const values = cells.map((c) => (c.numbers.length === end ? c.numbers : Float64Array.from({ length: end }, (_, i) => (i < c.numbers.length ? c.numbers[i] : Number.NaN))));
  const rows = new Int32Array(end);
  let kept = 0;
  for (let i = 0; i < end; i++) {
    let blanks = 0;
    for (let k = 0; k < values.length; k++) if (values[k][i] !== values[k][i] && cells[k].error?.index !== i) blanks++;
    if (blanks === values.length) continue;
    for (let k = 0; k < values.length; k++) {
      const x = values[k][i];
      if (x === x) values[k][kept] = x;
      else {
        const error = cells[k].error;
        if (error?.index === i) throw new CellError(error.error.kind, messages.inRow(names[k], i + 1, error.error.message));
        throw new CellError("value", messages.inRow(names[k], i + 1, "blank where the other columns of the row hold values"));
      }
    }
    rows[kept++] = i + 1;
  }
  return { values: values.map((v) => v.subarray(0, kept)), rows: rows.subarray(0, kept) };
}

/** The row of the range a core error's index (among the rows read) points at, in the sheet's words. */
function atRow(e: unknown, rows: Int32Array): never {
  const message = (e as Error).message;
  const m = /^(\w+) (\d+)( .*)$/.exec(message);
  if (e instanceof RangeError && m) throw new CellError("num", messages.inRow(m[1], rows[Number(m[2])], m[3].trim().replace(/^= /, "")));
  throw e;
}


/** Bins LUMINOSITY_FUNCTION returns at most: a table a person reads (our choice), not a column of data taken for edges. */
const maxBins = 1000;

/**
 * Why no value fell within the edges, in the sheet's words: the ranges of both, and the likely cause
 * when the values' log10 (or 10 to the values) would have fallen within the edges.
 */
function noValueInBins(values: Float64Array, edges: Float64Array): string {
  if (values.length === 0) return messages.noSources;
  let lo = Number.POSITIVE_INFINITY;
  let hi = Number.NEGATIVE_INFINITY;
  for (const x of values) {
    lo = Math.min(lo, x);
    hi = Math.max(hi, x);
  }
  const bottom = edges[0];
  const top = edges[edges.length - 1];
  const overlaps = (a: number, b: number) => a <= top && b >= bottom;
  const scale = lo > 0 && overlaps(Math.log10(lo), Math.log10(hi)) ? "linear" : overlaps(10 ** lo, 10 ** hi) ? "log" : "other";
  return messages.noValueInBins(lo, hi, bottom, top, scale);
}

/** Flux limits and survey volumes functions, in the order of their declarations. */
export const limitsAndPopulations: FunctionDef[] = [
  {
    name: "REDSHIFT_LIMIT",
    args: [
      num("lum", { min: 0, minExclusive: true }), num("flux_limit", { min: 0, minExclusive: true }), model,
      unit("lum_unit", "W", "erg/s", "lum"), unit("flux_unit", "W/m2", "erg/s/cm2", "flux_limit"),
    ],
    compute: (a) => limitingRedshift(m(a), n(a, "lum"), n(a, "flux_limit")),
  },
  {
    name: "REDSHIFT_LIMIT_NU",
    args: [
      num("lum_nu", { min: 0, minExclusive: true }), num("flux_density_limit", { min: 0, minExclusive: true }), num("alpha"), model,
      unit("lum_unit", "W/Hz", "W/Hz", "lum_nu"), unit("flux_unit", "W/m2/Hz", "Jy", "flux_density_limit"),
    ],
    compute: (a) => limitingRedshift(m(a), n(a, "lum_nu"), n(a, "flux_density_limit"), n(a, "alpha")),
  },
  {
    name: "REDSHIFT_LIMIT_MAG",
    args: [mag("abs_mag"), mag("mag_limit"), num("alpha", { default: -1, blankMeansDefault: true }), model],
    compute: (a) => limitingRedshiftMag(m(a), n(a, "abs_mag"), n(a, "mag_limit"), n(a, "alpha")),
  },
  {
    name: "VOLUME_MAX",
    args: [
      num("z_max"), num("z_lo"), num("z_hi"), requiredArea, num("z_min", { default: 0, blankMeansDefault: true }), model,
      unit("unit", "Mpc3"), unit("area_unit", "sr", "deg2", "area"),
    ],
    compute: (a) => maxVolumeMpc3(m(a), n(a, "z_max"), n(a, "z_lo"), n(a, "z_hi"), n(a, "area"), n(a, "z_min")),
  },
  {
    name: "LUMINOSITY_FUNCTION",
    args: [column("values"), column("v_max"), column("edges")],
    over: {
      columns: ["values", "v_max", "edges"],
      compute: (c) => {
        const { values, rows } = rowsOf(c, ["values", "v_max"]);
        if (c.edges.error) throw c.edges.error.error;
        // blank cells among the edges are skipped wherever they are (a whole column's blank rows below them too)
        let count = 0;
        for (const e of c.edges.numbers) if (e === e) count++;
        if (count - 1 > maxBins) throw new CellError("value", messages.tooManyBins(count, maxBins));
        const edges = c.edges.numbers.filter((e) => e === e);
        let bins;
        try {
          bins = binnedLuminosityFunction(values[0], values[1], edges);
        } catch (e) {
          if (/^edge/.test((e as Error).message)) throw new CellError("num", `edges: ${(e as Error).message}`);
          atRow(e, rows);
        }
        if (!bins.some((b) => b.count > 0)) throw new CellError("na", noValueInBins(values[0], edges));
        return bins.map((b) => [b.low, b.high, b.count, b.phi, b.phiError]);
      },
    },
  },
  {
    name: "CHI2_MODULUS",
    args: [column("z"), column("mu"), column("mu_err"), model, num("offset", { default: Number.NaN, blankMeansDefault: true, blank: { words: "the best one (fitted)" } })],
    over: {
      columns: ["z", "mu", "mu_err"],
      compute: (c, a) => {
        const { values, rows } = rowsOf(c, ["z", "mu", "mu_err"]);
        try {
          return [[hubbleDiagramChi2(m(a), values[0], values[1], values[2], n(a, "offset"))]];
        } catch (e) {
          return atRow(e, rows);
        }
      },
    },
  },
];
