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
import type { ArgSpec, ColumnCell, FunctionDef } from "../FunctionDef.js";
import { messages } from "../messages.js";
import { num, mag, model, unit, requiredArea, m, n } from "./argumentKinds.js";

const column = (name: string): ArgSpec => ({ kind: "number", name });

/**
 * Rows of equal-length columns as numbers: a row blank in every column is skipped; a row blank in
 * some, or holding an error, is an error naming the column and the row of the range (from 1).
 */
function rowsOf(columns: Record<string, ColumnCell[]>, names: readonly string[]): { values: number[][]; rows: number[] } {
  const [first] = names;
  for (const name of names) {
    if (columns[name].length !== columns[first].length) throw new CellError("value", messages.columnLengths(first, columns[first].length, name, columns[name].length));
  }
  const values: number[][] = names.map(() => []);
  const rows: number[] = [];
  for (let i = 0; i < columns[first].length; i++) {
    const cells = names.map((name) => columns[name][i]);
    if (cells.every((c) => c === "")) continue;
    cells.forEach((c, k) => {
      if (c instanceof CellError) throw new CellError(c.kind, messages.inRow(names[k], i + 1, c.message));
      if (c === "") throw new CellError("value", messages.inRow(names[k], i + 1, "blank where the other columns of the row hold values"));
      values[k].push(c);
    });
    rows.push(i + 1);
  }
  return { values, rows };
}

/** The row of the range a core error's index (among the rows read) points at, in the sheet's words. */
function atRow(e: unknown, rows: number[]): never {
  const message = (e as Error).message;
  const m = /^(\w+) (\d+)( .*)$/.exec(message);
  if (e instanceof RangeError && m) throw new CellError("num", messages.inRow(m[1], rows[Number(m[2])], m[3].trim().replace(/^= /, "")));
  throw e;
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
        const edges = c.edges.filter((e) => e !== "");
        const bad = edges.find((e) => e instanceof CellError);
        if (bad instanceof CellError) throw bad;
        let bins;
        try {
          bins = binnedLuminosityFunction(values[0], values[1], edges as number[]);
        } catch (e) {
          if (/^edge/.test((e as Error).message)) throw new CellError("num", `edges: ${(e as Error).message}`);
          atRow(e, rows);
        }
        return bins.map((b) => [b.low, b.high, b.count, b.phi, b.phiError]);
      },
    },
  },
  {
    name: "CHI2_MODULUS",
    args: [column("z"), column("mu"), column("mu_err"), model, num("offset", { default: Number.NaN, blankMeansDefault: true })],
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
