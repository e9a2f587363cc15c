/**
 * h-scaled units (Mpc/h, (Mpc/h)3, h-1 Msun: h = H0/100 of the model in the cell) and the band units
 * LUMINOSITY_REST takes (Angstrom, eV), in the core and through the worksheet functions.
 */
import { describe, expect, test } from "vitest";
import { Cosmology } from "../core/index.js";
import { conversionFactor, frequencyHz, parseUnit } from "../core/units/units.js";
import { CellError } from "../functions/cellError.js";
import { definitions } from "../functions/definitions.js";
import { evaluate, type Cell } from "../functions/evaluate.js";
import { expectRelative, freshModel } from "./helpers.js";

const active = { spec: "P18-BAO", stored: false };
const one = (name: string, ...args: unknown[]): Cell => evaluate(definitions[name], args, active)[0][0];
const p18 = freshModel(() => Cosmology.fromSpec("P18-BAO"));

describe("h-scaled units", () => {
  test.each([
    // unit         SI factor (without h)                 power of h  source
    ["Mpc/h",       3.0856775814913673e22,                 -1,        "survey convention: 1 Mpc/h = h⁻¹ Mpc (common practice)"],
    ["h-1 Mpc",     3.0856775814913673e22,                 -1,        "the same, FITS power syntax"],
    ["h^-1 Mpc",    3.0856775814913673e22,                 -1,        "the same, caret power"],
    ["(Mpc/h)3",    3.0856775814913673e22 ** 3,            -3,        "volume in (Mpc/h)³ (common practice)"],
    ["h-3 Mpc3",    3.0856775814913673e22 ** 3,            -3,        "the same written with h⁻³"],
    ["h-1 Msun",    1.988409870698051e30,                  -1,        "halo masses in h⁻¹ M☉ (common practice)"],
    ["h3 Mpc-3",    3.0856775814913673e22 ** -3,           3,         "number density in h³ Mpc⁻³ (common practice)"],
    ["kpc/h",       3.0856775814913673e19,                 -1,        "SI prefix on pc"],
  ] as const)("%s has the SI factor %d and h^%d", (text, factor, power, _source) => {
    const u = parseUnit(text);
    expectRelative(u.factor, factor, 1e-14, text);
    expect(u.hPower).toBe(power);
  });

  test.each([
    // unit     SI factor   dimensions (m, kg, s, K, rad)  source
    ["h",       3600,       [0, 0, 1, 0, 0],               "FITS 4.0 Table 4: h is the hour"],
    ["km/h",    1 / 3.6,    [1, 0, -1, 0, 0],              "the hour with a length that is not a parsec"],
    ["m h-1",   1 / 3600,   [1, 0, -1, 0, 0],              "the hour with a power"],
  ] as const)("%s stays the hour outside parsec and solar units", (text, factor, dims, _source) => {
    const u = parseUnit(text);
    expectRelative(u.factor, factor, 1e-15, text);
    expect([...u.dimensions]).toEqual(dims);
    expect(u.hPower).toBe(0);
  });

  test("conversions scale exactly by powers of h, and need an h", () => {
    expect(conversionFactor("Mpc", "Mpc/h", 0.7)).toBe(0.7);
    expectRelative(conversionFactor("(Mpc/h)3", "Mpc3", 0.5), 8, 1e-15, "(Mpc/h)3 at h = 0.5");
    expect(conversionFactor("Mpc/h", "kpc/h")).toBe(1000); // same power of h: no model needed
    expect(() => conversionFactor("Mpc/h", "Mpc")).toThrow(/"Mpc\/h" is in units of h = H0\/100: give a model/);
  });

  test("a distance in Mpc/h is D × h of the model in the cell, not a model with H0 = 100", () => {
    const z = 0.3;
    expectRelative(one("DIST_LUM", z, "P18-BAO", "Mpc/h") as number, p18.luminosityDistanceMpc(z) * p18.h, 1e-15, "DIST_LUM in Mpc/h");
    const w9 = Cosmology.fromSpec("W9-ALL");
    expectRelative(one("DIST_LOS", z, "W9-ALL", "h-1 Mpc") as number, w9.comovingDistanceMpc(z) * w9.h, 1e-15, "DIST_LOS in h-1 Mpc");
    expectRelative(one("VOLUME", 1, "P18-BAO", "(Mpc/h)3") as number, p18.comovingVolumeMpc3(1) * p18.h ** 3, 1e-15, "VOLUME in (Mpc/h)3");
  });

  test("a column against a row of models scales each cell by its own model's h", () => {
    const table = evaluate(definitions.DIST_LUM, [[[0.1], [1]], [["P18-BAO", "W9-ALL"]], "Mpc/h"], active);
    const models = [p18, Cosmology.fromSpec("W9-ALL")];
    [0.1, 1].forEach((z, r) => models.forEach((m, c) => expectRelative(table[r][c] as number, m.luminosityDistanceMpc(z) * m.h, 1e-15, `z=${z}`)));
  });

  test("an h-scaled input converts with the h of the cell's model (SIZE of an angle, VOLUME_MAX, REDSHIFT)", () => {
    expectRelative(one("ANGLE", 10, 1, "P18-BAO", "kpc/h", "arcsec") as number, one("ANGLE", 10 / p18.h, 1, "P18-BAO", "kpc", "arcsec") as number, 1e-15, "ANGLE of a size in kpc/h");
    const d = p18.luminosityDistanceMpc(0.5) * p18.h;
    expectRelative(one("REDSHIFT", d, "DIST_LUM", "P18-BAO", "Mpc/h") as number, 0.5, 1e-12, "REDSHIFT of a distance in Mpc/h");
  });

  test("ZC.CONVERT takes a model for h, the active model when blank", () => {
    expectRelative(one("CONVERT", 100, "Mpc/h", "Mpc", "H0=50; Om=0.3") as number, 200, 1e-15, "h = 0.5");
    expectRelative(one("CONVERT", 100, "Mpc/h", "Mpc") as number, 100 / p18.h, 1e-15, "active P18-BAO");
    expect(one("CONVERT", 1, "pc", "lyr", "H0=50; Om=0.3")).toBe(one("CONVERT", 1, "pc", "lyr")); // no h: the model plays no part
  });

  test("a function without a model refuses h-scaled units, naming itself", () => {
    const cell = one("MAG_BOL", 1, "h-2 Lsun") as CellError;
    expect(cell).toBeInstanceOf(CellError);
    expect(cell.message).toMatch(/^ZC\.MAG_BOL: .*need a model/);
  });
});

describe("band units: frequencies, wavelengths and photon energies", () => {
  test.each([
    // value  unit        ν [Hz]                         tol    source
    [1.4,     "GHz",      1.4e9,                         1e-15, "SI prefixes"],
    [5100,    "Angstrom", 299792458 / 5100e-10,          1e-15, "ν = c/λ; FITS 4.0 Table 5 Ångström = 1e-10 m"],
    [500,     "nm",       299792458 / 500e-9,            1e-15, "ν = c/λ"],
    [2.2,     "um",       299792458 / 2.2e-6,            1e-15, "ν = c/λ"],
    [1,       "eV",       2.417989242084918e14,          1e-15, "ν = E/h with exact SI 2019 e and h (1.602176634e-19 / 6.62607015e-34)"],
    [2,       "keV",      2 * 2.417989242084918e17,      1e-15, "SI prefix on eV"],
  ] as const)("%d %s is %d Hz", (value, unit, hz, tol, _source) => {
    expectRelative(frequencyHz(value, unit, "band"), hz, tol, `${value} ${unit}`);
  });

  test("other kinds of unit and values ≤ 0 are refused with the argument's name", () => {
    expect(() => frequencyHz(1, "Jy", "observed")).toThrow(/observed: "Jy" is a flux density/);
    expect(() => frequencyHz(0, "GHz", "rest")).toThrow(/rest = 0 GHz must be > 0/);
    expect(parseUnit("angstrom").factor).toBe(1e-10);
  });
});
