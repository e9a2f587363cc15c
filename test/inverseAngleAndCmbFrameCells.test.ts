/**
 * Cells at the edges of three distance functions: ZC.REDSHIFT of a distance modulus given with no
 * unit (magnitudes), ZC.ANGLE of a size of 0 and of a size exactly π D_A, and ZC.REDSHIFT_CMB read in
 * degrees at directions other than RA 0.
 */
import { describe, expect, test } from "vitest";
import { cmbDipoleGalacticDeg, cmbDipoleSpeedKmPerS, speedOfLightKmPerS } from "../core/index.js";
import { CellError } from "../functions/cellError.js";
import { expectRelative } from "./helpers.js";
import { sheetCalls } from "./sheetCalls.js";

const { one, num } = sheetCalls("P18-CMB");

/** Einstein–de Sitter (the "EDS" model, h = 0.7): D_L = 2 d_H (1 + z)(1 − 1/√(1 + z)), D_A = D_L / (1 + z)² (Hogg 1999 eqs. 16, 18, 21 with Ω_M = 1). */
const hubbleDistanceMpc = speedOfLightKmPerS / 70;

describe("ZC.REDSHIFT of MODULUS: a distance modulus is in magnitudes, so no unit is given", () => {
  test.each([
    // μ [mag]   (EDS: with x = √(1+z), D_L = 2 d_H (x² − x), so x = (1 + √(1 + 2 D_L/d_H)) / 2, D_L = 10^((μ − 25)/5) Mpc)
    [35],
    [40],
    [45],
  ])("REDSHIFT(%d, \"MODULUS\", \"EDS\") with the unit left out is the closed-form redshift", (mu) => {
    const dl = 10 ** ((mu - 25) / 5);
    const x = (1 + Math.sqrt(1 + (2 * dl) / hubbleDistanceMpc)) / 2;
    expectRelative(num("REDSHIFT", mu, "MODULUS", "EDS"), x * x - 1, 1e-9, `μ = ${mu}`);
    expectRelative(num("REDSHIFT", mu, "MODULUS", "EDS", ""), x * x - 1, 1e-9, `μ = ${mu}, unit ""`);
  });

  test("a modulus no redshift reaches is #N/A quoted in mag (the message zcell shows, functions/messages.ts, pinned as the interface)", () => {
    const cell = one("REDSHIFT", 1e6, "MODULUS");
    expect(cell).toBeInstanceOf(CellError);
    expect([(cell as CellError).kind, (cell as CellError).message]).toEqual(["na", "ZC.REDSHIFT: MODULUS = 1000000 mag: no finite redshift has it"]);
  });
});

describe("ZC.ANGLE at its two edges", () => {
  test.each([
    // z     (θ = ℓ / D_A: a size of 0 subtends 0 wherever it is, Hogg 1999 eq. 19)
    [0],
    [1],
  ])("a size of 0 at z = %d subtends 0 (z = 0 is refused only for a size > 0)", (zz) => {
    expect(num("ANGLE", 0, zz, "EDS", "Mpc", "rad")).toBe(0);
  });

  test("a size of exactly π D_A subtends 180° (π rad), the largest angle given; a size above it is #NUM!", () => {
    const daMpc = num("DIST_ANG", 1, "EDS");
    // closed form for EDS at z = 1: D_A = 2 d_H (1 − 1/√2) / 2 (Hogg 1999, Ω_M = 1)
    expectRelative(daMpc, hubbleDistanceMpc * (1 - Math.SQRT1_2), 1e-9, "D_A(1), EDS");
    expectRelative(num("ANGLE", Math.PI * daMpc, 1, "EDS", "Mpc", "rad"), Math.PI, 1e-15, "θ = π D_A / D_A");
    const above = one("ANGLE", Math.PI * daMpc * (1 + 1e-12), 1, "EDS", "Mpc", "rad") as CellError;
    expect(above.kind).toBe("num");
    expect(above.message).toBe("ZC.ANGLE: size = 3940.78 Mpc at z = 1 would subtend more than 180°: at most 3940.78 Mpc (π D_A) there");
  });
});

describe("ZC.REDSHIFT_CMB reads ra and dec in degrees", () => {
  const beta = cmbDipoleSpeedKmPerS / speedOfLightKmPerS;
  const gamma = 1 / Math.sqrt(1 - beta * beta);

  test("at the dipole apex (its galactic position turned into RA, Dec by COORD_CONVERT) 1 + z_cmb = (1 + z) √((1 + β)/(1 − β))", () => {
    const { l, b } = cmbDipoleGalacticDeg;
    const ra = num("COORD_CONVERT", l, b, "galactic", "equatorial", "lon");
    const dec = num("COORD_CONVERT", l, b, "galactic", "equatorial", "lat");
    // relativistic Doppler shift at θ = 0 (Rybicki & Lightman 1979 eq. 4.12, from memory)
    const zz = 0.05;
    expectRelative(1 + num("REDSHIFT_CMB", zz, ra, dec), (1 + zz) * Math.sqrt((1 + beta) / (1 - beta)), 1e-12, "apex");
    expectRelative(1 + num("REDSHIFT_CMB", zz, ra + 180, -dec), (1 + zz) * Math.sqrt((1 - beta) / (1 + beta)), 1e-12, "antapex");
  });

  test.each([
    // ra [deg]   dec [deg]   (any direction: 1/(1 + z_cmb) = γ (1 − β cos θ)/(1 + z), and cos θ changes sign at the opposite direction)
    [30,          20],
    [95.5,        -41],
    [150,         -10],
    [275,         63],
  ])("at (%d°, %d°) and the opposite direction 1/(1 + z_cmb) adds up to 2γ/(1 + z)", (ra, dec) => {
    const zz = 0.02;
    const sum = 1 / (1 + num("REDSHIFT_CMB", zz, ra, dec)) + 1 / (1 + num("REDSHIFT_CMB", zz, (ra + 180) % 360, -dec));
    expectRelative(sum, (2 * gamma) / (1 + zz), 1e-12, `(${ra}, ${dec})`);
  });
});
