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

describe("the K-correction from its definition", () => {
  // A source with a rest-frame spectrum L_ν(ν) = A ν^α. Its flux density observed at ν_o is
  // S(ν_o) = (1+z) L_ν((1+z) ν_o) / (4π D_L²) (Hogg et al. 2002, astro-ph/0210394, eq. 5 for f_ν);
  // its absolute magnitude in the same band is that of L_ν(ν_o) seen from 10 pc. K is defined by
  // m = M + μ + K (their eq. 1), here computed from those fluxes alone, never from our formula.
  const mpcM = (648000 / Math.PI) * 149597870700 * 1e6; // IAU 2015 B2 pc, IAU 2012 B2 au
  const dlMpc = (z: number) => 2 * (299792.458 / 70) * (1 + z - Math.sqrt(1 + z)); // EdS, H0 = 70 (Hogg 1999 eq. 21)
  const flux = (lumWHz: number, distanceM: number) => lumWHz / (4 * Math.PI * distanceM ** 2);
  const mag = (fluxDensity: number) => -2.5 * Math.log10(fluxDensity / 3.631e-23); // any zero point: it cancels

  test.each([
    // z     alpha   (the sign matters: α > −1 makes K < 0, α < −1 makes K > 0)
    [1.5,    0.7],
    [1.5,    -2.0],
    [0.3,    -0.5],
    [4,      1],
  ])("z = %d, α = %d: MAG_ABS(m, z, KCORRECTION(z, α)) recovers the M of the definition", (z, alpha) => {
    const nuObs = 5e14;
    const lumNu = (nu: number) => 1e22 * (nu / nuObs) ** alpha; // W/Hz, A chosen so L_ν(ν_o) = 1e22
    const observed = mag((1 + z) * flux(lumNu((1 + z) * nuObs), dlMpc(z) * mpcM));
    const absolute = mag(flux(lumNu(nuObs), 10 * (mpcM / 1e6)));
    const mu = 5 * Math.log10((dlMpc(z) * 1e6) / 10);
    const kDefinition = observed - absolute - mu;
    const k = one("KCORRECTION", z, alpha) as number;
    expect(Math.abs(k - kDefinition)).toBeLessThanOrEqual(1e-12);
    expect(Math.sign(k)).toBe(-Math.sign(1 + alpha));
    expect(Math.abs((one("MAG_ABS", observed, z, k, "EDS") as number) - absolute)).toBeLessThanOrEqual(1e-9);
    expect(Math.abs((one("MAG_APP", absolute, z, k, "EDS") as number) - observed)).toBeLessThanOrEqual(1e-9);
  });
});
