/**
 * What LUMINOSITY_FUNCTION and CHI2_MODULUS show for a catalogue with a problem in some row: the
 * error's kind, the row of the range it comes from (counted with the blank rows skipped, beyond row 9
 * too), columns of different lengths, a row whose only value is an error, the bin limit counted over
 * the edges given (not the blanks between them), and the hint when no value falls within the edges at
 * their very ends. The catalogues are INVENTED. Expected texts: the messages zcell shows
 * (functions/messages.ts, core/observables/), pinned as the interface.
 */
import { describe, expect, test } from "vitest";
import { CellError } from "../functions/cellError.js";
import { sheetCalls } from "./sheetCalls.js";

const { run } = sheetCalls("P18-CMB");
const col = (xs: unknown[]) => xs.map((x) => [x]);
const shown = (cells: unknown[][]) => {
  expect(cells.length).toBe(1);
  const cell = cells[0][0];
  expect(cell).toBeInstanceOf(CellError);
  return [(cell as CellError).excelText, (cell as CellError).message];
};

describe("a problem in one row of a catalogue", () => {
  test("CHI2_MODULUS names the sheet's row of a bad redshift past row 9, blank rows counted as rows", () => {
    const z = Array.from({ length: 14 }, (_, i): unknown => 0.05 * (i + 1));
    const mu = Array.from({ length: 14 }, (_, i): unknown => 38 + 0.3 * i);
    const muErr = Array.from({ length: 14 }, (): unknown => 0.1);
    z[12] = 0;
    for (const c of [z, mu, muErr]) c[3] = "";
    expect(shown(run("CHI2_MODULUS", col(z), col(mu), col(muErr)))).toEqual(["#NUM!", "ZC.CHI2_MODULUS: z in row 13 of the range: 0 must be > 0 and finite"]);
  });

  test.each([
    // call                                                                                        shown
    [["CHI2_MODULUS", col([0.1, 0.2]), col([38, 40]), col([0.1])],                                 ["#VALUE!", "ZC.CHI2_MODULUS: z has 2 cells and mu_err has 1: give columns of the same length"]],
    [["LUMINOSITY_FUNCTION", col([42.1, 42.2]), col([1e6]), col([42, 43])],                        ["#VALUE!", "ZC.LUMINOSITY_FUNCTION: values has 2 cells and v_max has 1: give columns of the same length"]],
    [["LUMINOSITY_FUNCTION", col([42.1, "abc"]), col([1e6, ""]), col([42, 43])],                   ["#VALUE!", 'ZC.LUMINOSITY_FUNCTION: values in row 2 of the range: values: text "abc" where a number belongs']],
    [["LUMINOSITY_FUNCTION", col([42.1, 42.6]), col([1e6, ""]), col([42, 43])],                    ["#VALUE!", "ZC.LUMINOSITY_FUNCTION: v_max in row 2 of the range: blank where the other columns of the row hold values"]],
    [["LUMINOSITY_FUNCTION", col([42.1]), col([-1]), col([42, 43])],                               ["#NUM!",   "ZC.LUMINOSITY_FUNCTION: v_max in row 1 of the range: -1 must be > 0 and finite"]],
    [["LUMINOSITY_FUNCTION", col([42.1]), col([1e6]), col([42, 41])],                              ["#NUM!",   "ZC.LUMINOSITY_FUNCTION: edges: edges must increase: edge 1 = 41 is not above 42"]],
  ])("%j", (call, expected) => {
    const [name, ...args] = call as [string, ...unknown[]];
    expect(shown(run(name, ...args))).toEqual(expected);
  });
});

describe("LUMINOSITY_FUNCTION's bins", () => {
  test("the limit of 1,000 bins counts the edges given, not the blank cells between them", () => {
    const edges: unknown[] = Array.from({ length: 1001 }, (_, i) => 40 + i / 100);
    edges.splice(500, 0, "");
    const table = run("LUMINOSITY_FUNCTION", col([42.05]), col([1e6]), col(edges));
    expect(table.length).toBe(1000);
  });

  test.each([
    // values (linear)   edges       the hint                   (a value whose log10 is exactly an end edge)
    [[1e44],             [42, 44],   "the values look linear and the edges log10: bin LOG10 of the values, or give edges in the values' unit"],
    [[1e42],             [42, 44],   "the values look linear and the edges log10: bin LOG10 of the values, or give edges in the values' unit"],
    [[0, 1e43],          [42, 42.5], "the values look like log10 and the edges linear: give the edges as log10 too"],
  ])("no value within the edges: values %j against edges %j", (values, edges, hint) => {
    const [kind, message] = shown(run("LUMINOSITY_FUNCTION", col(values), col(values.map(() => 1e6)), col(edges)));
    expect(kind).toBe("#N/A");
    expect(message.endsWith(`; ${hint}`)).toBe(true);
  });
});

describe("a whole-column result that overflows is #NUM!, as a single cell's is", () => {
  // χ² = Σ ((μ − μ_model − offset)/σ)²: with σ = 1e-300 the squares overflow a double (IEEE 754
  // binary64's largest finite value is about 1.8e308); the same for φ = count/(V_max·Δ) with V_max
  // = 1e-320. Expected text: messages.notFiniteResult (functions/messages.ts), pinned as the interface.
  const notFinite = (fn: string) => ["#NUM!", `ZC.${fn}: the result is not a finite number for these arguments`];

  test("CHI2_MODULUS with errors of 1e-300 mag", () => {
    expect(shown(run("CHI2_MODULUS", col([0.1, 0.2]), col([38, 40]), col([1e-300, 1e-300])))).toEqual(notFinite("CHI2_MODULUS"));
  });

  test("LUMINOSITY_FUNCTION with a V_max of 1e-320 Mpc³: the φ cells, not the bin edges or counts", () => {
    const cells = run("LUMINOSITY_FUNCTION", col([42.5]), col([1e-320]), col([42, 43]));
    expect(cells.length).toBe(1);
    const [low, high, count, phi, phiError] = cells[0];
    expect([low, high, count]).toEqual([42, 43, 1]);
    for (const cell of [phi, phiError]) {
      expect(cell).toBeInstanceOf(CellError);
      expect([(cell as CellError).excelText, (cell as CellError).message]).toEqual(notFinite("LUMINOSITY_FUNCTION"));
    }
  });
});
