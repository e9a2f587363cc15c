/**
 * What a whole column of one call costs in the per-call work the adapters keep (functions/definitions):
 * the extinction law read from its name, the wavelength or band unit's converter, the flux-density
 * unit's factor, the rest-frame unit's check. Each is worked out once for the column, not once per
 * row, and a formula filled down a column (one call per cell) in a few units works each unit out once:
 * counted in calls of the core functions that do that work (spies around core/index.js, the only way
 * the adapters reach them), never timed. Without these keeps a column of 100k rows costs several
 * times as much (EXTINCTION, MAG_AB: measured with scripts/benchBundle.mjs).
 */
import { afterEach, beforeEach, describe, expect, test, vi } from "vitest";

const calls = { extinctionLawNamed: 0, conversionFactor: 0, frequencyHz: 0, fluxDensityFactorJy: 0 };
vi.mock("../core/index.js", async (importOriginal) => {
  const core = await importOriginal<typeof import("../core/index.js")>();
  return {
    ...core,
    extinctionLawNamed: (...a: Parameters<typeof core.extinctionLawNamed>) => (calls.extinctionLawNamed++, core.extinctionLawNamed(...a)),
    conversionFactor: (...a: Parameters<typeof core.conversionFactor>) => (calls.conversionFactor++, core.conversionFactor(...a)),
    frequencyHz: (...a: Parameters<typeof core.frequencyHz>) => (calls.frequencyHz++, core.frequencyHz(...a)),
    fluxDensityFactorJy: (...a: Parameters<typeof core.fluxDensityFactorJy>) => (calls.fluxDensityFactorJy++, core.fluxDensityFactorJy(...a)),
  };
});

const { sheetCalls } = await import("./sheetCalls.js");
const { run } = sheetCalls("P18-CMB");

beforeEach(() => {
  for (const k of Object.keys(calls) as (keyof typeof calls)[]) calls[k] = 0;
});

const rows = 1000;
/** A column of `rows` cells: x(i) for row i. */
const column = (x: (i: number) => number) => Array.from({ length: rows }, (_, i) => [x(i)]);

/** The numbers of a one-column result; fails on any cell that is not a number. */
function numbers(result: unknown[][]): number[] {
  return result.map(([cell]) => {
    if (typeof cell !== "number") throw new Error(`a cell gave ${String(cell)}`);
    return cell;
  });
}

describe("a whole column of one call reads its law and units once, not once per row", () => {
  test.each([
    // law typed              unit typed
    ["Cardelli 1989",          "nm"],
    ["O'Donnell 1994",         "um"],
    [null,                     null], // blank: Fitzpatrick 1999 in Angstrom
  ])("EXTINCTION over 1000 E(B−V) with law %s in %s reads the law at most once and builds the unit's converter at most once", (law, unitText) => {
    const wavelength = unitText === "nm" ? 550 : unitText === "um" ? 0.55 : 5500;
    const cells = numbers(run("EXTINCTION", wavelength, column((i) => 0.001 * (i + 1)), law, null, unitText));
    expect(cells).toHaveLength(rows);
    // A_λ is proportional to E(B−V) at one wavelength (A_λ = k(λ) E(B−V), Cardelli et al. 1989 eq. 1 and
    // the definition of the laws): row i is (i + 1) times row 0
    expect(Math.abs(cells[rows - 1] / cells[0] - rows)).toBeLessThanOrEqual(1e-9 * rows);
    expect(calls.extinctionLawNamed).toBeLessThanOrEqual(1);
    expect(calls.conversionFactor).toBeLessThanOrEqual(2);
  });

  test("EXTINCTION over 1000 E(B−V) at a wavelength given as a frequency (GHz) works out the band's conversion at most once", () => {
    const cells = numbers(run("EXTINCTION", 545_000, column((i) => 0.01 * (i + 1)), null, null, "GHz"));
    expect(cells).toHaveLength(rows);
    expect(calls.frequencyHz).toBeLessThanOrEqual(2); // a frequency from 1 and 2 in the unit: which way it goes
  });

  test("INDEX_BETWEEN over 1000 flux densities in GHz bands works out the band unit's conversion at most once", () => {
    const cells = numbers(run("INDEX_BETWEEN", column((i) => 1 + i), 1.4, 2, 5, "GHz"));
    expect(cells).toHaveLength(rows);
    // α = ln(S2/S1) / ln(ν2/ν1) (two-point spectral index, common practice): row 0 is ln 2 / ln(5/1.4)
    expect(Math.abs(cells[0] - Math.log(2) / Math.log(5 / 1.4))).toBeLessThanOrEqual(1e-12);
    expect(calls.frequencyHz).toBeLessThanOrEqual(2);
  });

  test.each([
    // function    unit typed   argument column of row i
    ["MAG_AB",     "mJy",       (i: number) => 1 + i],
    ["FLUX_AB",    "uJy",       (i: number) => 16 + i / 1000],
  ])("%s over 1000 rows in %s works out the unit's factor into Jy at most once", (name, unitText, x) => {
    const cells = numbers(run(name, column(x), unitText));
    expect(cells).toHaveLength(rows);
    expect(calls.fluxDensityFactorJy).toBeLessThanOrEqual(1);
  });

  test("MAG_AB over 1000 rows in mJy gives m_AB = 16.40 − 2.5 log10(f / 1 mJy) on every row", () => {
    // m_AB = −2.5 log10 f_ν − 48.60 with f_ν in erg/s/cm²/Hz (Oke & Gunn 1983), i.e. 8.90 − 2.5 log10(f_ν / 1 Jy)
    const cells = numbers(run("MAG_AB", column((i) => 1 + i), "mJy"));
    cells.forEach((m, i) => expect(Math.abs(m - (8.9 - 2.5 * Math.log10((1 + i) * 1e-3)))).toBeLessThanOrEqual(1e-12));
  });

  test("REST_FRAME over 1000 values with a frequency unit checks the unit at most once", () => {
    const cells = numbers(run("REST_FRAME", column((i) => 1 + i), 1, "frequency", "GHz"));
    expect(cells).toHaveLength(rows);
    // ν_rest = (1 + z) ν_obs (common practice): at z = 1 twice the value
    expect(cells[9]).toBeCloseTo(20, 12);
    expect(calls.conversionFactor).toBeLessThanOrEqual(10);
  });
});

describe("a formula filled down a column, one call per cell, in two units alternating row by row", () => {
  const cells = 200;
  /** The cell of each call, one call per row; fails on any cell that is not a number. */
  const calls1 = (call: (i: number) => unknown[][]) => Array.from({ length: cells }, (_, i) => numbers(call(i))[0]);

  test("EXTINCTION in cm and m builds each unit's converter once, not once per cell", () => {
    // two units no test above reads, so their converters are built here
    const a = calls1((i) => run("EXTINCTION", i % 2 ? 5.5e-7 : 5.5e-5, 0.1, null, null, i % 2 ? "m" : "cm"));
    // 5.5e-5 cm and 5.5e-7 m are both 5500 Å: the same A_λ
    expect(Math.abs(a[1] - a[0])).toBeLessThanOrEqual(1e-12);
    expect(calls.conversionFactor).toBeLessThanOrEqual(4);
  });

  test("INDEX_BETWEEN in GHz and MHz works out each band unit once, not once per cell", () => {
    const a = calls1((i) => (i % 2 ? run("INDEX_BETWEEN", 1, 1400, 2, 5000, "MHz") : run("INDEX_BETWEEN", 1, 1.4, 2, 5, "GHz")));
    expect(Math.abs(a[1] - a[0])).toBeLessThanOrEqual(1e-12); // the same bands: the same α
    expect(calls.frequencyHz).toBeLessThanOrEqual(4);
  });
});

describe("columns of a catalogue are read in place, not copied (a million-row column would be copied whole)", () => {
  afterEach(() => {
    vi.restoreAllMocks();
  });

  test("CHI2_MODULUS over three full columns of 1000 rows copies none of them, and gives χ² = Σ ((δ − mean δ)/σ)²", () => {
    const z = column((i) => 0.01 + i / 1000);
    const mu = z.map(([zz], i) => [(run("MODULUS", zz)[0][0] as number) + (i % 2 ? 0.1 : -0.1)]);
    const copies = vi.spyOn(Float64Array, "from");
    const [[chi2]] = run("CHI2_MODULUS", z, mu, column(() => 0.1));
    // residuals ±0.1 mag in equal numbers, σ = 0.1: the fitted offset is 0 and each row adds 1 (χ² definition, common practice)
    expect(Math.abs((chi2 as number) - rows)).toBeLessThanOrEqual(1e-6);
    expect(copies).not.toHaveBeenCalled();
  });

  test("a column shorter than the others (its last rows blank) is the only one padded", () => {
    const copies = vi.spyOn(Float64Array, "from");
    const values = column((i) => 42 + i / rows);
    const cell = run("LUMINOSITY_FUNCTION", values, [...column(() => 1e6).slice(0, rows - 1), [null]], [[42], [43]]);
    // the last row is blank in v_max only (the message zcell shows, functions/messages.ts, pinned as the interface)
    expect(cell[0][0]).toMatchObject({ kind: "value", message: "ZC.LUMINOSITY_FUNCTION: v_max in row 1000 of the range: blank where the other columns of the row hold values" });
    expect(copies).toHaveBeenCalledTimes(1);
  });
});


describe("the kept unit converters are bounded: a sheet of many spellings of a unit cannot grow them without limit", () => {
  // 70 spellings of one unit (u·m^k/m^k reads as u), more than the 64 converters kept per kind
  const spellings = (unit: string) => Array.from({ length: 70 }, (_, k) => `${unit}*m^${k + 1}/m^${k + 1}`);

  test("EXTINCTION: after 69 other wavelength-unit spellings, the first is worked out again (at most 64 kept)", () => {
    const [first, ...others] = spellings("nm");
    const once = run("EXTINCTION", 550, 0.1, null, null, first);
    // every spelling reads as nm, so each gives the value of 550 nm (the same unit, common practice)
    for (const u of others) expect(run("EXTINCTION", 550, 0.1, null, null, u)).toEqual(once);
    calls.conversionFactor = 0;
    expect(run("EXTINCTION", 550, 0.1, null, null, first)).toEqual(once);
    expect(calls.conversionFactor).toBeGreaterThanOrEqual(1);
  });

  test("INDEX_BETWEEN: after 69 other band-unit spellings, the first is worked out again (at most 64 kept)", () => {
    const [first, ...others] = spellings("GHz");
    const once = run("INDEX_BETWEEN", 1, 1.4, 2, 5, first);
    for (const u of others) expect(run("INDEX_BETWEEN", 1, 1.4, 2, 5, u)).toEqual(once);
    calls.frequencyHz = 0;
    expect(run("INDEX_BETWEEN", 1, 1.4, 2, 5, first)).toEqual(once);
    expect(calls.frequencyHz).toBeGreaterThanOrEqual(1);
  });
});
