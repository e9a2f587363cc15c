/**
 * The broadcast rule, for every shape, through the built bundle: a call over ranges equals, in each
 * position, the call on the single cells at that position (a single cell applies to every position,
 * a column to every column, a row to every row, a block cell by cell, row by row as Excel passes
 * it), with blanks, errors and text among the cells; and shapes that do not fit together, or a unit
 * given as several cells, are the documented #VALUE!. Random shapes and cells (fast-check) over a
 * sample of functions: distances, two broadcast arguments, the error functions, and model and text
 * arguments given as ranges. README "Function reference" states the rule.
 */
import fc from "fast-check";
import { beforeAll, describe, expect, test } from "vitest";
import { HostError, loadBundle, type Registered } from "./reference/hostBundle.js";

let fns: Map<string, Registered>;
beforeAll(async () => {
  fns = loadBundle({ "zcell.activeModel": "P18-CMB" });
  await fns.get("AGE")!(); // the first call waits for the settings
});

/** What Excel passes for an error cell (the runtime's error value). */
const errorCell = new HostError("#N/A", "from the sheet");

// cells of each kind, weighted towards values that compute; the rest are what a sheet also holds
const blank = fc.constantFrom("", null);
const oddCell = fc.constantFrom<unknown>("abc", errorCell, true, "0.7", -0.5);
const zCell = fc.oneof({ weight: 6, arbitrary: fc.double({ min: 0, max: 4, noNaN: true }) }, { weight: 1, arbitrary: blank }, { weight: 2, arbitrary: oddCell });
const errCell = fc.oneof({ weight: 6, arbitrary: fc.double({ min: 0, max: 0.2, noNaN: true }) }, { weight: 1, arbitrary: blank }, { weight: 2, arbitrary: fc.constantFrom<unknown>(99, -1, "x", errorCell) });
const fluxCell = fc.oneof({ weight: 6, arbitrary: fc.double({ min: 1e-17, max: 1e-12, noNaN: true }) }, { weight: 1, arbitrary: blank }, { weight: 1, arbitrary: oddCell });
const magCell = fc.oneof({ weight: 6, arbitrary: fc.double({ min: 14, max: 26, noNaN: true }) }, { weight: 1, arbitrary: blank }, { weight: 1, arbitrary: fc.constantFrom<unknown>(99, -99, "m", errorCell) });
const alphaCell = fc.oneof({ weight: 4, arbitrary: fc.double({ min: -2, max: 1, noNaN: true }) }, { weight: 1, arbitrary: blank }, { weight: 1, arbitrary: fc.constantFrom<unknown>("a", errorCell) });
const modelCell = fc.constantFrom<unknown>("P18-CMB", "EDS", "W9-ALL", "P18-BAO; H0=70", "CONCORDANCE", "", null, "H0=abc", "Mpc", errorCell, 42);
const quantityCell = fc.constantFrom<unknown>("distance", "luminosity", "SIZE", "magnitude", "density", "bogus", "", errorCell);
const componentCell = fc.constantFrom<unknown>("matter", "darkenergy", "Radiation", "cold", "nothing", "", errorCell);

/** One argument of a sampled function: broadcast (any shape of cells) or one value (a unit, a scalar text). */
type Arg = { name: string; cell: fc.Arbitrary<unknown>; optional?: boolean } | { name: string; scalar: fc.Arbitrary<unknown> };
const units = (...spellings: string[]) => fc.constantFrom<unknown>(null, ...spellings, ...spellings.map((s) => [[s]]));

/** The sample: name → arguments in signature order. */
const sample: Record<string, Arg[]> = {
  DIST_LUM: [{ name: "z", cell: zCell }, { name: "model", cell: modelCell, optional: true }, { name: "unit", scalar: units("Mpc", "Gpc", "Mpc/h") }],
  DIST_ANG: [{ name: "z", cell: zCell }, { name: "model", cell: modelCell, optional: true }, { name: "unit", scalar: units("Mpc", "kpc") }],
  DIST_BETWEEN: [{ name: "z1", cell: zCell }, { name: "z2", cell: zCell }, { name: "model", cell: modelCell, optional: true }, { name: "unit", scalar: units("Mpc") }],
  LUMINOSITY: [{ name: "flux", cell: fluxCell }, { name: "z", cell: zCell }, { name: "model", cell: modelCell, optional: true }, { name: "flux_unit", scalar: units("erg/s/cm2", "W/m2") }, { name: "lum_unit", scalar: units("erg/s", "Lsun") }],
  KCORRECTION: [{ name: "z", cell: zCell }, { name: "alpha", cell: alphaCell }],
  DIST_LUM_ERR: [{ name: "z", cell: zCell }, { name: "z_err", cell: errCell }, { name: "model", cell: modelCell, optional: true }, { name: "unit", scalar: units("Mpc", "Mpc/h") }],
  LUMINOSITY_ERR: [
    { name: "flux", cell: fluxCell }, { name: "flux_err", cell: fluxCell }, { name: "z", cell: zCell }, { name: "z_err", cell: errCell },
    { name: "model", cell: modelCell, optional: true }, { name: "flux_unit", scalar: units("erg/s/cm2") }, { name: "lum_unit", scalar: units("erg/s", "W") },
  ],
  MAG_ABS_ERR: [
    { name: "m_err", cell: errCell }, { name: "z", cell: zCell }, { name: "z_err", cell: errCell }, { name: "kcorr_err", cell: errCell, optional: true },
    { name: "model", cell: modelCell, optional: true }, { name: "alpha", cell: alphaCell, optional: true },
  ],
  MAG_ABS: [{ name: "m", cell: magCell }, { name: "z", cell: zCell }, { name: "kcorr", cell: alphaCell, optional: true }, { name: "model", cell: modelCell, optional: true }],
  RESCALE: [
    { name: "value", cell: fluxCell }, { name: "z", cell: zCell }, { name: "quantity", cell: quantityCell },
    { name: "from_model", cell: modelCell }, { name: "to_model", cell: modelCell, optional: true },
  ],
  OMEGA: [{ name: "component", cell: componentCell }, { name: "z", cell: zCell, optional: true }, { name: "model", cell: modelCell, optional: true }],
  REDSHIFT: [{ name: "value", cell: fc.oneof(fluxCell.map((x) => (typeof x === "number" ? x * 1e15 : x)), zCell) }, { name: "quantity", scalar: fc.constantFrom<unknown>("DIST_LUM", "LOOKBACK", [["AGE"]]) }, { name: "model", cell: modelCell, optional: true }, { name: "unit", scalar: units("Mpc", "Gyr") }],
};

/** A shape a broadcast argument may take within a result of rows × cols; "omitted" only for an optional one. */
type Shape = [rows: number, cols: number] | "omitted";

/** The argument's cells: a matrix of the shape (a single cell as [[v]], as Excel passes a one-cell reference). */
function matrixOf(shape: [number, number], cells: unknown[]): unknown[][] {
  return Array.from({ length: shape[0] }, (_, r) => cells.slice(r * shape[1], (r + 1) * shape[1]));
}

/** A call: for each argument its value as passed (matrix, scalar or null). */
type Call = { name: string; given: unknown[]; shapes: (Shape | "scalar")[] };

/** Random calls of one function: a result shape, each broadcast argument one shape that fits it, its cells. */
function callsOf(name: string): fc.Arbitrary<Call> {
  const args = sample[name];
  return fc
    .tuple(fc.integer({ min: 1, max: 4 }), fc.integer({ min: 1, max: 4 }))
    .chain(([rows, cols]) => {
      const fitting: [number, number][] = [[1, 1], [rows, 1], [1, cols], [rows, cols]];
      return fc.tuple(
        ...args.map((arg): fc.Arbitrary<{ value: unknown; shape: Shape | "scalar" }> => {
          if ("scalar" in arg) return arg.scalar.map((value) => ({ value, shape: "scalar" as const }));
          const shapes: fc.Arbitrary<Shape> = arg.optional ? fc.oneof(fc.constant("omitted" as const), fc.constantFrom(...fitting)) : fc.constantFrom(...fitting);
          return shapes.chain((shape): fc.Arbitrary<{ value: unknown; shape: Shape }> =>
            shape === "omitted"
              ? fc.constant({ value: null, shape })
              : fc.array(arg.cell, { minLength: shape[0] * shape[1], maxLength: shape[0] * shape[1] }).map((cells) => ({ value: matrixOf(shape, cells), shape })),
          );
        }),
      );
    })
    .map((parts) => ({ name, given: parts.map((p) => p.value), shapes: parts.map((p) => p.shape) }));
}

/** A result cell as compared: numbers to the bit, errors by code and message. */
function shown(cell: unknown): unknown {
  if (cell instanceof HostError) return { error: cell.code, message: cell.message };
  if (typeof cell === "number") return Object.is(cell, -0) ? "-0" : cell;
  return cell;
}

async function call(name: string, given: unknown[]): Promise<unknown[][]> {
  return await fns.get(name)!(...given);
}

describe("a call over ranges equals the single-cell calls in the same positions", () => {
  test.each(Object.keys(sample))("%s", async (name) => {
    await fc.assert(
      fc.asyncProperty(callsOf(name), async ({ given, shapes }) => {
        const result = await call(name, given);
        const rows = Math.max(1, ...shapes.map((s) => (Array.isArray(s) ? s[0] : 1)));
        const cols = Math.max(1, ...shapes.map((s) => (Array.isArray(s) ? s[1] : 1)));
        expect([result.length, ...result.map((row) => row.length)]).toEqual([rows, ...Array(rows).fill(cols)]);
        for (let r = 0; r < rows; r++) {
          for (let c = 0; c < cols; c++) {
            // the cell of each argument at (r, c): a row of cells applies to every row, a column to every column
            const single = given.map((value, i) => {
              const shape = shapes[i];
              if (!Array.isArray(shape)) return value;
              return [[(value as unknown[][])[shape[0] === 1 ? 0 : r][shape[1] === 1 ? 0 : c]]];
            });
            const [[expected]] = await call(name, single);
            expect(shown(result[r][c]), `${name} cell (${r}, ${c}) of ${rows}×${cols}`).toEqual(shown(expected));
          }
        }
      }),
      { numRuns: 60 },
    );
  });
});

describe("shapes that cannot broadcast are #VALUE! saying so", () => {
  /** Two sizes of one dimension that do not fit together: both above 1 and different. */
  const clash = fc.tuple(fc.integer({ min: 2, max: 5 }), fc.integer({ min: 2, max: 5 })).filter(([a, b]) => a !== b);

  test.each([
    // function        first broadcast argument, second (the other arguments left out or one cell)
    ["DIST_BETWEEN",   "z1", "z2",      [undefined, undefined, null, null]],
    ["DIST_LUM_ERR",   "z", "z_err",    [undefined, undefined, null, null]],
    ["DIST_LUM",       "z", "model",    [undefined, undefined, null]],
    ["RESCALE",        "z", "to_model", [[[1000]], undefined, "distance", "EDS", undefined]],
  ] as const)("%s: %s against %s", async (name, a, b, template) => {
    const names = sample[name].map((arg) => arg.name);
    const cellFor = (arg: string) => (arg === "z" || arg === "z1" || arg === "z2" ? 0.5 : arg === "z_err" ? 0.01 : "EDS");
    await fc.assert(
      fc.asyncProperty(clash, fc.integer({ min: 1, max: 3 }), fc.boolean(), async ([m, n], other, alongRows) => {
        // alongRows: m rows against n rows (both with `other` columns); else m columns against n columns
        const shapeA: [number, number] = alongRows ? [m, other] : [other, m];
        const shapeB: [number, number] = alongRows ? [n, other] : [other, n];
        const given: unknown[] = [...template];
        given[names.indexOf(a)] = matrixOf(shapeA, Array(shapeA[0] * shapeA[1]).fill(cellFor(a)));
        given[names.indexOf(b)] = matrixOf(shapeB, Array(shapeB[0] * shapeB[1]).fill(cellFor(b)));
        const result = await call(name, given);
        expect(result.length).toBe(1);
        expect(shown(result[0][0])).toEqual({
          error: "#VALUE!",
          message: `ZC.${name}: ranges do not fit together: ${a} is ${shapeA[0]}×${shapeA[1]} and ${b} is ${shapeB[0]}×${shapeB[1]} (use equal sizes, a single cell, or a row against a column)`,
        });
      }),
      { numRuns: 20 },
    );
  });

  test.each([
    // function    arguments                                        the unit given as several cells
    ["DIST_LUM",   [[[0.5], [1]], null, [["Mpc", "Gpc"]]],          "unit"],
    ["LUMINOSITY", [[[1e-15]], [[0.5]], null, [["W/m2"], ["erg/s/cm2"]], null], "flux_unit"],
    ["REDSHIFT",   [[[1000]], [["DIST_LUM", "LOOKBACK"]], null, null], "quantity"],
  ] as const)("%s with %s as several cells", async (name, given, arg) => {
    const [[cell]] = await call(name, [...given]);
    expect(shown(cell)).toEqual({ error: "#VALUE!", message: `ZC.${name}: ${arg} must be one cell: it applies to the whole result (for several, one formula each)` });
  });
});
