/**
 * What-if tables: a header row of models and one live broadcasting ZC formula (a column of
 * redshifts against the row of models), never values.
 */
import { columnName } from "./cellAddress.js";

/** Quantities of z the table offers: ZC function name → label with its default unit. */
export const tableQuantities: Record<string, string> = {
  DIST_LUM: "luminosity distance (Mpc)",
  DIST_ANG: "angular-diameter distance (Mpc)",
  DIST_LOS: "line-of-sight comoving distance (Mpc)",
  DIST_TRANS: "transverse comoving distance (Mpc)",
  DIST_LIGHT: "light-travel distance (Mpc)",
  MODULUS: "distance modulus (mag)",
  LOOKBACK: "look-back time (Gyr)",
  AGE: "age at z (Gyr)",
  HUBBLE: "Hubble parameter (km/s/Mpc)",
  PROPER_SCALE: "proper scale (kpc/arcsec)",
  VOLUME: "comoving volume (Mpc3)",
  VOLUME_ELEMENT: "volume element (Mpc3/sr)",
  CMB_TEMP: "CMB temperature (K)",
  CRIT_DENSITY: "critical density (kg/m3)",
};

/** Redshifts start, start+step, … ≤ stop (at most 10,000). */
export function redshiftSteps(start: number, stop: number, step: number): number[] {
  if (![start, stop, step].every(Number.isFinite)) throw new RangeError("start, stop and step must be numbers");
  if (start < 0) throw new RangeError("start must be ≥ 0 (redshifts are not negative)");
  if (!(step > 0)) throw new RangeError("step must be > 0");
  if (stop < start) throw new RangeError("stop must be ≥ start");
  const n = Math.floor((stop - start) / step + 1e-9) + 1;
  if (n > 10_000) throw new RangeError(`that is ${n} rows; at most 10,000`);
  return Array.from({ length: n }, (_, i) => Number((start + i * step).toPrecision(12)));
}

/** A table to write: its top-left cell, the block (formulas start with "="), and the area it will fill. */
export interface TablePlan {
  /** Address of the top-left cell of `cells`, e.g. "C3". */
  anchor: string;
  cells: (string | number)[][];
  /** The whole area the table occupies once the formula spills, e.g. "C3:F12". */
  area: string;
  /** What a chart of the table plots: the redshift column and each model's column of values (addresses). */
  chart: { z: string; series: { name: string; values: string }[] };
  /** How many redshifts and models the table holds (for the message that says what was inserted). */
  counts: { redshifts: number; models: number };
}

/** What a table holds, in words: "4 redshifts × 3 models". */
export function tableCounts(plan: TablePlan): string {
  const { redshifts, models } = plan.counts;
  return `${redshifts} redshift${redshifts === 1 ? "" : "s"} × ${models} model${models === 1 ? "" : "s"}`;
}

/** A chart's title: the quantity with its unit, against z, and the models. */
export function chartTitle(quantity: string, models: string[]): string {
  return `${tableQuantities[quantity] ?? quantity} against redshift — ${models.join(", ")}`;
}

/** The column of rows `first`…`last` of each model (columns from `col` on), as series of a chart. */
function seriesOf(models: string[], col: number, first: number, last: number): { name: string; values: string }[] {
  return models.map((name, j) => ({ name, values: `${columnName(col + j)}${first}:${columnName(col + j)}${last}` }));
}

/**
 * Plans a what-if table with its own redshift column at `anchor` (row, column 1-based):
 * "z" and the models across the first row, the redshifts down the first column, and one formula
 * `=ZC.Q(z-range, model-row)` that spills over the body.
 */
export function planTableWithRedshifts(quantity: string, redshifts: number[], models: string[], row: number, col: number): TablePlan {
  checkModels(models);
  const zCol = columnName(col);
  const first = columnName(col + 1);
  const last = columnName(col + models.length);
  const zRange = `$${zCol}$${row + 1}:$${zCol}$${row + redshifts.length}`;
  const modelRow = `$${first}$${row}:$${last}$${row}`;
  const cells: (string | number)[][] = [["z", ...models]];
  redshifts.forEach((z, i) => cells.push([z, ...models.map((_, j) => (i === 0 && j === 0 ? `=ZC.${quantity}(${zRange},${modelRow})` : ""))]));
  const [top, bottom] = [row + 1, row + redshifts.length];
  return {
    anchor: `${zCol}${row}`,
    cells,
    area: `${zCol}${row}:${last}${bottom}`,
    chart: { z: `${zCol}${top}:${zCol}${bottom}`, series: seriesOf(models, col + 1, top, bottom) },
    counts: { redshifts: redshifts.length, models: models.length },
  };
}

/**
 * Plans a what-if table for redshifts already in a column (`zRange`, e.g. "B5:B40", top cell at
 * `row`, column `col`): the models go in the row above, from the next column on, and the formula in
 * the first body cell.
 */
export function planTableForColumn(quantity: string, zRange: { row: number; col: number; rows: number }, models: string[]): TablePlan {
  checkModels(models);
  if (zRange.row < 2) throw new RangeError("select redshifts below a header row: the model names go in the row above");
  const header = zRange.row - 1;
  const first = columnName(zRange.col + 1);
  const last = columnName(zRange.col + models.length);
  const zCol = columnName(zRange.col);
  const zs = `$${zCol}$${zRange.row}:$${zCol}$${zRange.row + zRange.rows - 1}`;
  const modelRow = `$${first}$${header}:$${last}$${header}`;
  const cells: (string | number)[][] = [models, [`=ZC.${quantity}(${zs},${modelRow})`, ...models.slice(1).map(() => "")]];
  const bottom = zRange.row + zRange.rows - 1;
  return {
    anchor: `${first}${header}`,
    cells,
    area: `${first}${header}:${last}${bottom}`,
    chart: { z: `${zCol}${zRange.row}:${zCol}${bottom}`, series: seriesOf(models, zRange.col + 1, zRange.row, bottom) },
    counts: { redshifts: zRange.rows, models: models.length },
  };
}

function checkModels(models: string[]): void {
  if (models.length === 0) throw new RangeError("give at least one model");
  if (models.length > 8) throw new RangeError("at most eight models");
}
