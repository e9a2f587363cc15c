/** Bolometric magnitudes on the IAU 2015 B2 scale, and surface-brightness dimming. */
import { describe, expect, test } from "vitest";
import { solarLuminosityW } from "../core/index.js";
import { definitions } from "../functions/definitions.js";
import { evaluate, type Cell } from "../functions/evaluate.js";
import { expectRelative } from "./helpers.js";

const active = { spec: "P18-BAO", stored: false };
const one = (name: string, ...args: unknown[]): Cell => evaluate(definitions[name], args, active)[0][0];

describe("bolometric magnitudes (IAU 2015 Resolution B2)", () => {
  test.each([
    // lum         unit      M_bol    tol     source
    [3.828e26,     "W",      4.74,    5e-3,   "IAU 2015 B2: the nominal solar luminosity has M_bol = 4.74"],
    [1,            "Lsun",   4.74,    5e-3,   "the same in Lsun (IAU 2015 B3 nominal L☉)"],
    [3.0128e28,    "W",      0,       1e-15,  "IAU 2015 B2: the zero point L0 = 3.0128e28 W"],
    [3.0128e35,    "erg/s",  0,       1e-15,  "the zero point in erg/s (CGS erg = 1e-7 J)"],
    [3.0128e30,    "W",      -5,      1e-14,  "100 × L0 is 5 mag brighter (definition of the magnitude)"],
  ] as const)("MAG_BOL(%d %s) = %d", (lum, unit, mag, tol, _source) => {
    expect(Math.abs((one("MAG_BOL", lum, unit) as number) - mag)).toBeLessThanOrEqual(tol);
  });

  test.each([-28, -10, 0, 4.74, 12])("LUM_BOL inverts MAG_BOL at M_bol = %d", (mag) => {
    const lum = one("LUM_BOL", mag, "Lsun") as number;
    expect(Math.abs((one("MAG_BOL", lum, "Lsun") as number) - mag)).toBeLessThanOrEqual(1e-13);
    expectRelative(lum * solarLuminosityW, 3.0128e28 * 10 ** (-0.4 * mag), 1e-14, `M=${mag}`);
  });
});

describe("surface-brightness dimming", () => {
  test.each([0.1, 1, 3, 10])("bolometric: 10^(−0.4 DIMMING(z)) = (1+z)⁻⁴ at z = %d (Tolman 1930)", (z) => {
    expectRelative(10 ** (-0.4 * (one("DIMMING", z) as number)), (1 + z) ** -4, 1e-13, `z=${z}`);
  });

  test.each([0.1, 1, 3, 10])("per unit frequency at α = −1 it is the bolometric law (z = %d)", (z) => {
    expectRelative(one("DIMMING", z, -1) as number, one("DIMMING", z) as number, 1e-15, `z=${z}`);
  });

  test.each([
    // z    α      I_obs / I_emit = (1+z)^(α−3)     source
    [1,     0,     2 ** -3,                         "S_ν ∝ ν^α seen at a fixed observed frequency: (1+z)^(α−3) (common practice)"],
    [2,     -0.7,  3 ** -3.7,                       "the same"],
    [0.5,   2,     1.5 ** -1,                       "the same (Rayleigh–Jeans-like α = 2)"],
  ] as const)("per unit frequency: z = %d, α = %d", (z, alpha, ratio, _source) => {
    expectRelative(10 ** (-0.4 * (one("DIMMING", z, alpha) as number)), ratio, 1e-13, `z=${z}`);
  });

  test("z = 0 dims nothing", () => {
    expect(one("DIMMING", 0)).toBe(0);
    expect(one("DIMMING", 0, 1.5)).toBe(0);
  });
});
