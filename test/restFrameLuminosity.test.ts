/**
 * LUMINOSITY_REST: the rest-frame L_ν (or ν L_ν) at another frequency or wavelength, checked against
 * the formula written out independently, and the identity with LUMINOSITY_NU at ν_rest = (1+z) ν_obs.
 */
import { describe, expect, test } from "vitest";
import { Cosmology, megaparsecM } from "../core/index.js";
import { CellError } from "../functions/cellError.js";
import { definitions } from "../functions/definitions.js";
import { evaluate, type Cell } from "../functions/evaluate.js";
import { expectRelative, freshModel } from "./helpers.js";

const active = { spec: "P18-BAO", stored: false };
const one = (name: string, ...args: unknown[]): Cell => evaluate(definitions[name], args, active)[0][0];
const p18 = freshModel(() => Cosmology.fromSpec("P18-BAO"));
const c = 299_792_458; // m/s, exact (SI 2019)
const jansky = 1e-26; // W m⁻² Hz⁻¹ (IAU)

/** L_ν(ν_rest) = 4π D_L² S_ν(ν_obs) (1+z)^−(1+α) (ν_rest/ν_obs)^α (Hogg 1999 eq. 23 with S_ν ∝ ν^α), written out again. */
function restLuminosity(z: number, sJy: number, alpha: number, obsHz: number, restHz: number): number {
  const dl = p18.luminosityDistanceMpc(z) * megaparsecM;
  return 4 * Math.PI * dl * dl * sJy * jansky * (1 + z) ** -(1 + alpha) * (restHz / obsHz) ** alpha;
}

describe("rest-frame luminosity at another band", () => {
  test("L at rest-frame 1.4 GHz from 3 GHz data (GHz, the default band unit)", () => {
    const [s, z, alpha] = [0.0025, 0.9, -0.7];
    expectRelative(one("LUMINOSITY_REST", s, z, alpha, 3, 1.4) as number, restLuminosity(z, s, alpha, 3e9, 1.4e9), 1e-14, "L_1.4GHz");
  });

  test("λL_λ at rest-frame 5100 Å from a flux density observed at 1.2 µm, in W and erg/s", () => {
    const [sJy, z, alpha] = [4e-4, 1.3, -0.5];
    const obsHz = c / 1.2e-6;
    const restHz = c / 5100e-10;
    const expected = restHz * restLuminosity(z, sJy, alpha, obsHz, restHz);
    expectRelative(one("LUMINOSITY_REST", sJy, z, alpha, 12000, 5100, "P18-BAO", "Angstrom", "Jy", "W") as number, expected, 1e-14, "W");
    expectRelative(one("LUMINOSITY_REST", 0.4, z, alpha, 1200, 510, "P18-BAO", "nm", "mJy", "erg/s") as number, expected * 1e7, 1e-14, "erg/s");
  });

  test.each([-1.5, -0.7, 0, 0.8])("with ν_rest = (1+z) ν_obs it is LUMINOSITY_NU × (1+z)^α (α = %d)", (alpha) => {
    const [s, z, obs] = [0.01, 2.5, 1.4];
    const rest = one("LUMINOSITY_REST", s, z, alpha, obs, (1 + z) * obs) as number;
    const nu = one("LUMINOSITY_NU", s, z, alpha) as number;
    expectRelative(rest, nu * (1 + z) ** alpha, 1e-14, `α=${alpha}`);
  });

  test("a photon-energy band (keV) gives the same L_ν as its frequency", () => {
    const hz = 2.417989242084918e17; // 1 keV / h (exact SI 2019 e and h)
    expectRelative(
      one("LUMINOSITY_REST", 1e-6, 0.5, -1, 1, 2, "P18-BAO", "keV") as number,
      restLuminosity(0.5, 1e-6, -1, hz, 2 * hz),
      1e-14,
      "keV",
    );
  });

  test("an output unit that is neither spectral nor a power is #VALUE! naming out_unit", () => {
    const cell = one("LUMINOSITY_REST", 0.01, 1, -0.7, 3, 1.4, "P18-BAO", "GHz", "Jy", "Mpc") as CellError;
    expect(cell.kind).toBe("value");
    expect(cell.message).toMatch(/^ZC\.LUMINOSITY_REST: out_unit: cannot convert .*; use W\/Hz for L_ν or a power/);
  });

  test("a band value ≤ 0 is #NUM! in the user's unit", () => {
    const cell = one("LUMINOSITY_REST", 0.01, 1, -0.7, -3, 1.4) as CellError;
    expect([cell.kind, cell.message]).toEqual(["num", "ZC.LUMINOSITY_REST: observed = -3 GHz must be > 0"]);
  });
});
