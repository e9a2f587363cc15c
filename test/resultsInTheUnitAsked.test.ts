/**
 * Results and messages in the unit the user gave, function by function, through the shared wrapper on
 * the sources: a column of flux densities or AB magnitudes in mJy, a rest-frame luminosity in erg/s/Hz,
 * REDSHIFT's limit in the user's time unit, a band value that is not a frequency named by its argument,
 * a rest-frame unit checked against each quantity, a right ascension wrapped into [0°, 360°) and
 * declinations up to the poles. Expected values: the AB system (Oke & Gunn 1983, ApJ 266, 713:
 * m_AB = −2.5 log10(f_ν [erg/s/cm²/Hz]) − 48.60, so 1 Jy = 10⁻²³ erg/s/cm²/Hz gives m = 16.4 − 2.5 log10(f/mJy)), SI (1 W = 10⁷ erg/s), quadrature sums of independent 1σ errors
 * (common practice), and the messages zcell shows (functions/messages.ts and the core's words), pinned
 * as the interface.
 */
import { describe, expect, test } from "vitest";
import { CellError } from "../functions/cellError.js";
import { definitions } from "../functions/definitions.js";
import { evaluate, type Cell } from "../functions/evaluate.js";

const active = { spec: "P18-CMB", stored: false };
const run = (name: string, ...args: unknown[]): Cell[][] => evaluate(definitions[name], args, active);
const one = (name: string, ...args: unknown[]): Cell => run(name, ...args)[0][0];
const shown = (cell: Cell) => (cell instanceof CellError ? [cell.excelText, cell.message] : cell);
const ab = (fJy: number) => -2.5 * Math.log10(fJy * 1e-23) - 48.6; // Oke & Gunn 1983

describe("AB magnitudes and flux densities of a column in mJy", () => {
  test.each([
    // flux density [mJy]   tolerance [mag]
    [1,                     1e-12],
    [10,                    1e-12],
    [0.02,                  1e-12],
  ])("MAG_AB of %f mJy, alone and in a column", (mJy, tol) => {
    const column = run("MAG_AB", [[mJy], [1]], "mJy");
    expect(Math.abs((column[0][0] as number) - ab(mJy / 1000))).toBeLessThan(tol);
    expect(Math.abs((column[1][0] as number) - ab(1e-3))).toBeLessThan(tol);
    expect(Math.abs((one("MAG_AB", mJy, "mJy") as number) - ab(mJy / 1000))).toBeLessThan(tol);
  });

  test("FLUX_AB of a column of magnitudes in mJy: 10^(−(m + 48.6)/2.5) erg/s/cm²/Hz, in mJy", () => {
    const column = run("FLUX_AB", [[20], [16.4], [0]], "mJy");
    [20, 16.4, 0].forEach((m, r) => expect(Math.abs((column[r][0] as number) / (1e26 * 10 ** (-(m + 48.6) / 2.5)) - 1)).toBeLessThan(1e-12));
  });
});

describe("rest-frame spectral luminosities", () => {
  test("LUMINOSITY_REST in erg/s/Hz is 10⁷ times the value in W/Hz", () => {
    const args = [1, 0.5, -0.7, 1.4, 5, null, null, "mJy"];
    const watts = one("LUMINOSITY_REST", ...args, "W/Hz") as number;
    const ergs = one("LUMINOSITY_REST", ...args, "erg/s/Hz") as number;
    expect(Math.abs(ergs / (1e7 * watts) - 1)).toBeLessThan(1e-14);
  });

  test.each([
    // call                                                                          message
    [["LUMINOSITY_REST", 1, 0.5, -0.7, -1.4, 5],                                     "ZC.LUMINOSITY_REST: observed = -1.4 GHz must be > 0"],
    [["LUMINOSITY_REST", 1, 0.5, -0.7, 1.4, 0],                                      "ZC.LUMINOSITY_REST: rest = 0 GHz must be > 0"],
    [["LUMINOSITY_REST_ERR", 1, 0.1, 0.5, 0, -0.7, 0.1, -1.4, 5],                    "ZC.LUMINOSITY_REST_ERR: observed = -1.4 GHz must be > 0"],
    [["LUMINOSITY_REST_ERR", 1, 0.1, 0.5, 0, -0.7, 0.1, 1.4, -5],                    "ZC.LUMINOSITY_REST_ERR: rest = -5 GHz must be > 0"],
  ])("a band that is not a positive frequency is #NUM! naming it: %j", ([name, ...args], message) => {
    expect(shown(one(name as string, ...args))).toEqual(["#NUM!", message]);
  });
});

describe("EXTINCTION's wavelength unit", () => {
  test("a wavelength in nm or um gives A_λ of the same wavelength in Angstrom (1 nm = 10 Å, 1 um = 10⁴ Å: exact factors)", () => {
    const angstrom = one("EXTINCTION", 5500, 0.1);
    expect(one("EXTINCTION", 550, 0.1, null, null, "nm")).toBe(angstrom);
    expect(one("EXTINCTION", 0.55, 0.1, null, null, "um")).toBe(angstrom);
  });
});

describe("errors added in quadrature", () => {
  test("MAG_ABS_ERR with an exact redshift: the magnitude's and the K-correction's errors in quadrature", () => {
    expect(Math.abs((one("MAG_ABS_ERR", 0.1, 0.5, 0, 0.2) as number) - Math.hypot(0.1, 0.2))).toBeLessThan(1e-15);
    expect(Math.abs((one("MAG_ABS_ERR", 0.1, 0.5, 0) as number) - 0.1)).toBeLessThan(1e-15);
  });
});

describe("REDSHIFT speaks in the unit given", () => {
  test("an age beyond the model's is #N/A quoting the limit in that unit (Myr: 1000 times the Gyr figure)", () => {
    const limitOf = (cell: Cell) => Number(/\(([\d.]+) (?:Gyr|Myr)\)$/.exec((cell as CellError).message)![1]);
    const gyr = one("REDSHIFT", 20, "AGE");
    const myr = one("REDSHIFT", 20000, "AGE", null, "Myr");
    expect((myr as CellError).message).toMatch(/^ZC\.REDSHIFT: AGE = 20000 Myr exceeds the age of the universe today in this model \(\d+\.\d Myr\)$/);
    expect(Math.abs(limitOf(myr) - 1000 * limitOf(gyr))).toBeLessThan(0.06); // both shown to 6 significant digits
  });

  test("a distance modulus takes no unit", () => {
    expect(shown(one("REDSHIFT", 40, "MODULUS", null, "Mpc"))).toEqual(["#VALUE!", "ZC.REDSHIFT: unit: MODULUS is in magnitudes and takes no unit"]);
  });
});

describe("REST_FRAME checks the unit against each quantity", () => {
  test("the same unit given first for a frequency, then for a wavelength, is refused the second time", () => {
    expect(one("REST_FRAME", 5, 1, "frequency", "GHz")).toBe(10); // ν_rest = (1 + z) ν_obs
    expect(shown(one("REST_FRAME", 5, 1, "wavelength", "GHz"))).toEqual([
      "#VALUE!",
      'ZC.REST_FRAME: unit: cannot convert "GHz" (a frequency) to "Angstrom" (a length); a wavelength takes a length (Angstrom, nm, um)',
    ]);
    expect(one("REST_FRAME", 5, 1, "frequency", "GHz")).toBe(10);
  });
});

describe("positions", () => {
  test.each([
    // given       right ascension shown [deg]   (x mod 360 into [0, 360))
    [-30,          330],
    [1e-13,        1e-13],
    [720.5,        0.5],
    [-1e-14,       0],
    [359.5,        359.5],
  ])("COORD_DEG(%f, \"ra\") is %f", (x, expected) => {
    expect(one("COORD_DEG", x, "ra")).toBe(expected);
  });

  test("declinations up to the poles are taken; beyond, #NUM!", () => {
    expect(run("COORD_DEG", [[90], [-90]], "dec")).toEqual([[90], [-90]]);
    expect(shown(one("COORD_DEG", 90.5, "dec"))).toEqual(["#NUM!", "ZC.COORD_DEG: text = 90.5° is beyond ±90°: a declination is −90° … +90°"]);
  });
});
