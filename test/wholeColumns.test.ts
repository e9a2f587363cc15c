/**
 * The aggregates (LUMINOSITY_FUNCTION, CHI2_MODULUS) given whole columns, as a person selects A:A:
 * the blank rows below the data cost nothing and change nothing, a column of data taken for the
 * edges is refused with the limit and the fix, and a table that would be all zeros is #N/A with the
 * likely cause. The samples are INVENTED (made up for the tests, not measurements). Their time and
 * memory over 10^6 rows are measured by `npm run bench` (scripts/benchBundle.mjs chi2:*, lf:*).
 */
import { describe, expect, test } from "vitest";
import { CellError } from "../functions/cellError.js";
import { sheetCalls } from "./sheetCalls.js";

const { run } = sheetCalls("P18-CMB");
/**
 * A sheet's whole column (1,048,576 rows, Microsoft's "Excel specifications and limits") holding
 * `cells` at its top; its blank rows share one row array (a million of them take long to make).
 */
const wholeColumn = (cells: unknown[], blank: unknown = "") => {
  const column: unknown[][] = new Array(1_048_576).fill([blank]);
  cells.forEach((x, i) => (column[i] = [x]));
  return column;
};
const col = (xs: unknown[]) => xs.map((x) => [x]);
const failure = (table: unknown[][]) => {
  expect(table[0][0]).toBeInstanceOf(CellError);
  return table[0][0] as CellError;
};

// an INVENTED sample: log10 L [erg/s], V_max [Mpc3]; and an invented Hubble diagram
const logL = [42.05, 42.31, 42.48, 42.52, 42.9, 43.2, 43.45, 44.7];
const vMax = [2.1e6, 3.5e6, 4.2e6, 5e6, 9.8e6, 2.2e7, 3.1e7, 8e7];
const edges = [42, 42.5, 43, 43.5, 44];
const z = [0.02, 0.05, 0.11, 0.3, 0.52, 0.8, 1.1];
const mu = [34.6, 36.7, 38.5, 41.1, 42.5, 43.6, 44.3];
const muErr = [0.15, 0.12, 0.1, 0.1, 0.12, 0.15, 0.2];

describe("whole columns: the blank rows below the data are skipped", () => {
  test("LUMINOSITY_FUNCTION gives the same table with each argument a whole column", () => {
    const short = run("LUMINOSITY_FUNCTION", col(logL), col(vMax), col(edges));
    expect(short.length).toBe(4);
    expect(run("LUMINOSITY_FUNCTION", col(logL), col(vMax), wholeColumn(edges))).toEqual(short);
    // blank cells as "" or as null (omitted), mixed
    expect(run("LUMINOSITY_FUNCTION", wholeColumn(logL, null), wholeColumn(vMax), wholeColumn(edges, null))).toEqual(short);
  });

  test("CHI2_MODULUS gives the same χ² over whole columns, offset free or fixed", () => {
    for (const offset of [null, 0.2]) {
      const short = run("CHI2_MODULUS", col(z), col(mu), col(muErr), "P18-CMB", offset)[0][0];
      expect(typeof short).toBe("number");
      expect(run("CHI2_MODULUS", wholeColumn(z), wholeColumn(mu), wholeColumn(muErr), "P18-CMB", offset)[0][0]).toBe(short);
    }
  });

  test("blank rows between the data are skipped as before, and blank edges between edges too", () => {
    const gappy = [...logL.slice(0, 4), "", "", ...logL.slice(4)];
    const gappyV = [...vMax.slice(0, 4), "", "", ...vMax.slice(4)];
    const gappyEdges = [42, "", 42.5, 43, 43.5, 44];
    expect(run("LUMINOSITY_FUNCTION", wholeColumn(gappy), wholeColumn(gappyV), wholeColumn(gappyEdges))).toEqual(
      run("LUMINOSITY_FUNCTION", col(logL), col(vMax), col(edges)),
    );
  });

  test("a column whose data end earlier: the row where only the other columns hold values is named", () => {
    const e = failure(run("LUMINOSITY_FUNCTION", wholeColumn(logL), wholeColumn(vMax.slice(0, 7)), col(edges)));
    expect(e.message).toBe("ZC.LUMINOSITY_FUNCTION: v_max in row 8 of the range: blank where the other columns of the row hold values");
    const chi2 = failure(run("CHI2_MODULUS", wholeColumn(z), wholeColumn(mu), wholeColumn(muErr.slice(0, 6))));
    expect(chi2.message).toBe("ZC.CHI2_MODULUS: mu_err in row 7 of the range: blank where the other columns of the row hold values");
  });

  test("an error or text far down a whole column is found and its row named; the first problem decides", () => {
    const values = wholeColumn(logL);
    const v = wholeColumn(vMax);
    values[500_000] = [{ errorCode: "#N/A" }];
    v[500_000] = [3e6];
    values[700_000] = [42.3];
    v[700_000] = ["n/a"];
    const e = failure(run("LUMINOSITY_FUNCTION", values, v, col(edges)));
    expect([e.kind, e.message]).toEqual(["value", "ZC.LUMINOSITY_FUNCTION: values in row 500001 of the range: values: the input cell holds an error"]);
    values[500_000] = [42.2];
    const text = failure(run("LUMINOSITY_FUNCTION", values, v, col(edges)));
    expect(text.message).toBe('ZC.LUMINOSITY_FUNCTION: v_max in row 700001 of the range: v_max: text "n/a" where a number belongs');
    const edgeError = wholeColumn(edges);
    edgeError[900_000] = ["1e999"];
    expect(failure(run("LUMINOSITY_FUNCTION", col(logL), col(vMax), edgeError)).message).toBe("ZC.LUMINOSITY_FUNCTION: edges: not a finite number");
  });

  test("more cells than a sheet's column is refused, naming the argument and the limit", () => {
    const e = failure(run("CHI2_MODULUS", [...wholeColumn(z), [1]], wholeColumn(mu), wholeColumn(muErr)));
    expect([e.kind, e.message]).toEqual(["value", "ZC.CHI2_MODULUS: z has 1,048,577 cells; at most 1,048,576 (one whole column) are read"]);
  });
});

describe("LUMINOSITY_FUNCTION returns at most 1,000 bins", () => {
  const edgesOf = (count: number) => Array.from({ length: count }, (_, i) => 40 + i / 100);

  test("1,000 bins (1,001 edges) is a table; 1,001 bins is #VALUE! naming the limit and the fix", () => {
    expect(run("LUMINOSITY_FUNCTION", col(logL), col(vMax), col(edgesOf(1001))).length).toBe(1000);
    const e = failure(run("LUMINOSITY_FUNCTION", col(logL), col(vMax), col(edgesOf(1002))));
    expect([e.kind, e.message]).toEqual([
      "value",
      "ZC.LUMINOSITY_FUNCTION: edges: 1,002 edges make 1,001 bins; at most 1,000 bins are returned: give only the bin edges (a short range such as H3:H10), not a column of data",
    ]);
  });

  test("a whole column of data given as the edges is refused, not binned into a million rows", () => {
    const e = failure(run("LUMINOSITY_FUNCTION", col(logL), col(vMax), wholeColumn(edgesOf(1_048_576))));
    expect(e.message).toMatch(/^ZC\.LUMINOSITY_FUNCTION: edges: 1,048,576 edges make 1,048,575 bins; at most 1,000 bins/);
  });
});

describe("LUMINOSITY_FUNCTION with no value within the edges is #N/A with the likely cause", () => {
  test.each([
    // what the sheet holds                          values                         edges                      message after the function's name
    ["linear luminosities against log10 edges",      [2.5e42, 8e42, 3.1e43],        [42, 42.5, 43, 43.5],      "no value falls within the edges: values run from 2.5e+42 to 3.1e+43, the edges from 42 to 43.5; the values look linear and the edges log10: bin LOG10 of the values, or give edges in the values' unit"],
    ["log10 luminosities against linear edges",      [42.1, 42.7, 43.2],            [1e42, 1e43, 1e44],        "no value falls within the edges: values run from 42.1 to 43.2, the edges from 1e+42 to 1e+44; the values look like log10 and the edges linear: give the edges as log10 too"],
    ["the same scale, another range",                [42.1, 42.7, 43.2],            [44, 44.5, 45],            "no value falls within the edges: values run from 42.1 to 43.2, the edges from 44 to 45; are the values and the edges in the same scale and unit?"],
    ["magnitudes against the wrong band's range",    [-21.5, -20.2, -19.9],         [-18, -17, -16],           "no value falls within the edges: values run from -21.5 to -19.9, the edges from -18 to -16; are the values and the edges in the same scale and unit?"],
  ])("%s", (_what, values, binEdges, message) => {
    const e = failure(run("LUMINOSITY_FUNCTION", col(values), col(values.map(() => 1e6)), col(binEdges)));
    expect([e.kind, e.message]).toEqual(["na", `ZC.LUMINOSITY_FUNCTION: ${message}`]);
  });

  test("no sources at all (every row blank) is #N/A saying so", () => {
    const e = failure(run("LUMINOSITY_FUNCTION", wholeColumn([]), wholeColumn([]), col(edges)));
    expect([e.kind, e.message]).toEqual(["na", "ZC.LUMINOSITY_FUNCTION: values: no sources (every row of values and v_max is blank)"]);
  });

  test("one value within the edges is enough for the table (empty bins stay zeros)", () => {
    const table = run("LUMINOSITY_FUNCTION", col([2.5e42, 42.2]), col([1e6, 1e6]), col(edges));
    expect(table.map((r) => r[2])).toEqual([1, 0, 0, 0]);
  });
});
