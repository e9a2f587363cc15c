/**
 * Which units a value to rescale may carry, per quantity, and what the refusal says: a distance and a
 * size take a length, a luminosity a power or a power per Hz, a density a number per volume, a
 * magnitude no unit but "mag". Expected texts: the messages zcell shows (core/distances/rescale.ts),
 * pinned as the interface. Expected numbers: Einstein–de Sitter against itself at half the Hubble
 * constant: every distance ∝ 1/H0 (closed form D = (c/H0) f(z)), so D(H0 = 35)/D(H0 = 70) = 2, a
 * luminosity × 2² = 4, a number density × 2⁻³ = 1/8, an absolute magnitude + 5 log10(1/2).
 *
 * The checks of unit fits read the table of each quantity's dimensions: each test imports the module
 * afresh (vi.resetModules) so that the table is built inside the test.
 */
import { describe, expect, test, vi } from "vitest";
import { Cosmology } from "../core/distances/Cosmology.js";

const eds70 = Cosmology.fromSpec("EDS"); // H0 = 70
const eds35 = Cosmology.fromSpec("EDS; H0=35");
const z = 1;

/** rescaledValue from a module loaded inside the calling test. */
async function freshRescale() {
  vi.resetModules();
  return (await import("../core/distances/rescale.js")).rescaledValue;
}

describe("units each quantity accepts: EDS at H0 = 70 restated at H0 = 35 (distances ∝ 1/H0)", () => {
  test.each([
    // quantity     | unit         | factor (closed form)     | why
    ["distance",     "Mpc",          2,                        "D_M × 2"],
    ["distance",     "km",           2,                        "any length"],
    ["size",         "kpc",          2,                        "D_A × 2"],
    ["luminosity",   "W",            4,                        "a power: D_L² × 4"],
    ["luminosity",   "erg/s",        4,                        "a power in cgs"],
    ["luminosity",   "W/Hz",         4,                        "a power per Hz"],
    ["luminosity",   "Lsun",         4,                        "a solar luminosity"],
    ["density",      "Mpc-3",        1 / 8,                    "dV/dz ∝ H0⁻³"],
  ] as const)("%s in %s: × %d (%s)", async (quantity, unit, factor, _why) => {
    const rescaledValue = await freshRescale();
    expect(rescaledValue(1000, z, quantity, eds70, eds35, unit) / 1000 / factor - 1).toBeCloseTo(0, 12);
  });
});

describe("a unit that does not fit the quantity: TypeError naming what the quantity needs and an example", () => {
  test.each([
    // quantity     | unit      | message (core/distances/rescale.ts)
    ["distance",     "s",        'unit "s" does not measure a length, as a distance needs (e.g. "Mpc/h")'],
    ["distance",     "Mpc-3",    'unit "Mpc-3" does not measure a length, as a distance needs (e.g. "Mpc/h")'],
    ["size",         "s",        'unit "s" does not measure a length, as a size needs (e.g. "h-1 kpc")'],
    ["size",         "W",        'unit "W" does not measure a length, as a size needs (e.g. "h-1 kpc")'],
    ["luminosity",   "Mpc",      'unit "Mpc" does not measure a luminosity (power, or power per Hz), as a luminosity needs (e.g. "h-2 Lsun")'],
    ["luminosity",   "W m-2",    'unit "W m-2" does not measure a luminosity (power, or power per Hz), as a luminosity needs (e.g. "h-2 Lsun")'], // a flux
    ["density",      "Mpc",      'unit "Mpc" does not measure a number per volume, as a density needs (e.g. "h3 Mpc-3")'],
    ["density",      "Mpc3",     'unit "Mpc3" does not measure a number per volume, as a density needs (e.g. "h3 Mpc-3")'],
  ] as const)("%s in %s", async (quantity, unit, message) => {
    const rescaledValue = await freshRescale();
    expect(() => rescaledValue(1000, z, quantity, eds70, eds35, unit)).toThrow(new TypeError(message));
  });

  test.each([
    // unit      | why the h is the hour (no pc or solar unit beside it)
    ["km h-1",    "h after a space"],
    ["km/h",      "h after a slash"],
  ])("%s for a distance: the hint says h is the hour here (%s)", async (unit) => {
    const rescaledValue = await freshRescale();
    expect(() => rescaledValue(1000, z, "distance", eds70, eds35, unit)).toThrow(
      new TypeError(`unit "${unit}" does not measure a length, as a distance needs; h next to units without pc or a solar unit is the hour: write e.g. "Mpc/h"`),
    );
  });
});

describe("blank units and magnitudes", () => {
  test("the unit may be left out: a unit without h (D_M ratio 2)", async () => {
    const rescaledValue = await freshRescale();
    expect(rescaledValue(1000, z, "distance", eds70, eds35)).toBeCloseTo(2000, 9);
  });

  test.each([
    // unit      | message: "unit: " and what the unit reader says (core/units/units.ts)
    ["Mpc**",     'unit: "Mpc**": a whole-number power is expected: did you mean Mpc or Mpc3?'],
    ["furlong",   'unit: unknown unit "furlong"'],
  ])("a unit zcell cannot read (%s) is refused naming the argument", async (unit, message) => {
    const rescaledValue = await freshRescale();
    expect(() => rescaledValue(1000, z, "distance", eds70, eds35, unit)).toThrow(new TypeError(message));
  });

  test('a unit of spaces is no unit: the same as "" (D_M ratio 2)', async () => {
    const rescaledValue = await freshRescale();
    expect(rescaledValue(1000, z, "distance", eds70, eds35, "   ")).toBe(rescaledValue(1000, z, "distance", eds70, eds35, ""));
    expect(rescaledValue(1000, z, "distance", eds70, eds35, "   ")).toBeCloseTo(2000, 9);
  });

  test('a magnitude takes "mag", spaces around it allowed: M + 5 log10(D_L,from/D_L,to) = M − 5 log10 2', async () => {
    const rescaledValue = await freshRescale();
    const expected = -20 - 5 * Math.log10(2); // D_L ∝ 1/H0 (closed form)
    expect(rescaledValue(-20, z, "magnitude", eds70, eds35, " mag ")).toBeCloseTo(expected, 12);
    expect(rescaledValue(-20, z, "magnitude", eds70, eds35, "mag")).toBeCloseTo(expected, 12);
  });

  test("an unknown quantity with a unit is refused by name with the list of quantities, as without one", async () => {
    const rescaledValue = await freshRescale();
    const message = 'unknown quantity "mass": use distance, luminosity, size, magnitude, density';
    // @ts-expect-error: a quantity outside the type, as an untyped caller could pass
    expect(() => rescaledValue(1, z, "mass", eds70, eds35, "Mpc")).toThrow(new TypeError(message));
    // @ts-expect-error: as above
    expect(() => rescaledValue(1, z, "mass", eds70, eds35)).toThrow(new TypeError(message));
  });
});
