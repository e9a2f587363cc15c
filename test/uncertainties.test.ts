/**
 * First-order error propagation: the exact redshift derivatives of the distances against finite
 * differences, the propagated errors against Monte Carlo draws, zero errors giving zero, and the
 * worksheet functions against the core.
 */
import { describe, expect, test } from "vitest";
import {
  absoluteMagnitudeErrorMag,
  angularDiameterDistanceSlopeMpc,
  comovingDistanceSlopeMpc,
  Cosmology,
  luminosityDistanceErrorMpc,
  luminosityDistanceSlopeMpc,
  luminosityErrorW,
  luminosityW,
  properSizeErrorMpc,
  restFrameSpectralLuminosityErrorWHz,
  spectralLuminosityErrorWHz,
  spectralLuminosityWHz,
  transverseComovingDistanceSlopeMpc,
} from "../core/index.js";
import type { ModelParameters } from "../core/model/ModelParameters.js";
import { definitions } from "../functions/definitions.js";
import { evaluate, type Cell } from "../functions/evaluate.js";
import { expectRelative, fivePoint, normal, seededRandom, standardDeviation, freshModel } from "./helpers.js";

const lcdm = { w0: -1, wa: 0, Tcmb: 2.7255, Neff: 3.046, mnu: [0.06] };
const geometries: Record<string, ModelParameters> = {
  flat: { ...lcdm, H0: 67.66, Om: 0.3111 },
  open: { ...lcdm, H0: 70, Om: 0.25, OL: 0.55 },
  closed: { ...lcdm, H0: 70, Om: 0.4, OL: 0.85 },
};
const active = { spec: "P18-BAO", stored: false };
const one = (name: string, ...args: unknown[]): Cell => evaluate(definitions[name], args, active)[0][0];

describe("exact redshift derivatives of the distances", () => {
  const redshifts = [0.05, 0.5, 1, 2, 5];
  test.each(Object.keys(geometries))("%s model: D_C, D_M, D_L and D_A slopes match a 5-point finite difference (rel ≤ 1e-7)", (name) => {
    const m = new Cosmology(geometries[name]);
    for (const z of redshifts) {
      const h = 1e-3 * z;
      const pairs: [string, (zz: number) => number, number][] = [
        ["D_C", (zz) => m.comovingDistanceMpc(zz), comovingDistanceSlopeMpc(m, z)],
        ["D_M", (zz) => m.transverseComovingDistanceMpc(zz), transverseComovingDistanceSlopeMpc(m, z)],
        ["D_L", (zz) => m.luminosityDistanceMpc(zz), luminosityDistanceSlopeMpc(m, z)],
      ];
      for (const [label, f, exact] of pairs) expectRelative(exact, fivePoint(f, z, h), 1e-7, `${name} ${label} z=${z}`);
      // D_A has a maximum where its slope is 0: compared against D_H, the scale of the slope
      const fd = fivePoint((zz) => m.angularDiameterDistanceMpc(zz), z, h);
      expect(Math.abs(angularDiameterDistanceSlopeMpc(m, z) - fd) / m.hubbleDistanceMpc, `${name} D_A z=${z}`).toBeLessThanOrEqual(1e-7);
    }
  });

  test.each([
    // z      dD_L/dz / D_H = 2 − 1/√(1+z)      source
    [0.5,     2 - 1 / Math.sqrt(1.5),            "Einstein–de Sitter D_L = 2 D_H (1+z − √(1+z)) (Hogg 1999 eq. 21 with eq. 15 closed form), differentiated"],
    [1,       2 - 1 / Math.sqrt(2),              "the same"],
    [3,       2 - 1 / 2,                         "the same"],
  ] as const)("Einstein–de Sitter at z = %d: dD_L/dz = D_H (2 − 1/√(1+z))", (z, expected, _source) => {
    const eds = Cosmology.fromSpec("EDS");
    expectRelative(luminosityDistanceSlopeMpc(eds, z) / eds.hubbleDistanceMpc, expected, 1e-12, `z=${z}`);
  });

  test("D_A's slope vanishes at its maximum (Einstein–de Sitter: z = 5/4, Hogg 1999 §6)", () => {
    const eds = Cosmology.fromSpec("EDS");
    expect(Math.abs(angularDiameterDistanceSlopeMpc(eds, 1.25)) / eds.hubbleDistanceMpc).toBeLessThanOrEqual(1e-12);
  });
});

describe("propagated errors against Monte Carlo draws (10⁵, σ_z/z = 1%)", () => {
  const draws = 100_000;
  const m = freshModel(() => Cosmology.fromSpec("P18-BAO"));

  test.each([0.1, 1, 3])("DIST_LUM_ERR at z = %d within 2% of the spread of D_L", (z) => {
    const gauss = normal(seededRandom(17));
    const sigma = 0.01 * z;
    const values = Array.from({ length: draws }, () => m.luminosityDistanceMpc(z + sigma * gauss()));
    expectRelative(luminosityDistanceErrorMpc(m, z, sigma), standardDeviation(values), 0.02, `z=${z}`);
  });

  test("LUMINOSITY_ERR with 5% flux and 1% redshift errors within 2%", () => {
    const gauss = normal(seededRandom(23));
    const [flux, z] = [2e-16, 0.8];
    const values = Array.from({ length: draws }, () => luminosityW(m, flux * (1 + 0.05 * gauss()), z * (1 + 0.01 * gauss())));
    expectRelative(luminosityErrorW(m, flux, 0.05 * flux, z, 0.01 * z), standardDeviation(values), 0.02, "L");
  });

  test("LUMINOSITY_NU_ERR with flux-density, redshift and spectral-index errors within 2%", () => {
    const gauss = normal(seededRandom(29));
    const [s, z, alpha] = [3e-28, 1.5, -0.7];
    const values = Array.from({ length: draws }, () =>
      spectralLuminosityWHz(m, s * (1 + 0.05 * gauss()), z * (1 + 0.01 * gauss()), alpha + 0.1 * gauss()),
    );
    expectRelative(spectralLuminosityErrorWHz(m, s, 0.05 * s, z, 0.01 * z, alpha, 0.1), standardDeviation(values), 0.02, "L_ν");
  });

  test("MAG_ABS_ERR with magnitude, redshift and K-correction errors within 2%", () => {
    const gauss = normal(seededRandom(31));
    const z = 0.4;
    const values = Array.from({ length: draws }, () => 0.05 * gauss() - m.distanceModulusMag(z * (1 + 0.01 * gauss())) - 0.03 * gauss());
    expectRelative(absoluteMagnitudeErrorMag(m, 0.05, z, 0.01 * z, 0.03), standardDeviation(values), 0.02, "M");
  });

  test("SIZE_ERR with angle and redshift errors within 2%", () => {
    const gauss = normal(seededRandom(37));
    const [theta, z] = [5e-6, 0.7];
    const values = Array.from({ length: draws }, () => m.properSizeMpc(theta * (1 + 0.03 * gauss()), z * (1 + 0.01 * gauss())));
    expectRelative(properSizeErrorMpc(m, theta, 0.03 * theta, z, 0.01 * z), standardDeviation(values), 0.02, "size");
  });
});

describe("the worksheet error functions", () => {
  const m = freshModel(() => Cosmology.fromSpec("P18-BAO"));

  test.each([
    // function            arguments with zero errors   result unit
    ["DIST_LUM_ERR", [1, 0], "Mpc"],
    ["LUMINOSITY_ERR", [1e-16, 0, 1, 0], "W"],
    ["LUMINOSITY_NU_ERR", [0.01, 0, 1, 0, -0.7, 0], "W/Hz"],
    ["MAG_ABS_ERR", [0, 1, 0, 0], "mag"],
    ["SIZE_ERR", [2, 0, 1, 0], "kpc"],
  ] as const)("%s gives exactly 0 when every error is 0", (name, args, _unit) => {
    expect(one(name, ...args)).toBe(0);
  });

  test("units apply to a value and its error alike, and the results match the core", () => {
    // erg/s/cm2 = 1e-3 W/m2 (CGS to SI); erg/s = 1e-7 W
    const lum = one("LUMINOSITY_ERR", 2e-13, 1e-14, 0.8, 0.008, "P18-BAO", "erg/s/cm2", "erg/s") as number;
    expectRelative(lum, luminosityErrorW(m, 2e-16, 1e-17, 0.8, 0.008) * 1e7, 1e-14, "LUMINOSITY_ERR in CGS");
    const size = one("SIZE_ERR", 2, 0.1, 1, 0.01, "P18-BAO", "arcsec", "kpc") as number;
    const arcsec = Math.PI / 648000;
    expectRelative(size, properSizeErrorMpc(m, 2 * arcsec, 0.1 * arcsec, 1, 0.01) * 1000, 1e-14, "SIZE_ERR");
    const lnu = one("LUMINOSITY_NU_ERR", 10, 1, 1.5, 0.015, -0.7, 0.1, "P18-BAO", "mJy") as number;
    expectRelative(lnu, spectralLuminosityErrorWHz(m, 1e-28, 1e-29, 1.5, 0.015, -0.7, 0.1), 1e-14, "LUMINOSITY_NU_ERR in mJy");
  });

  test("a negative error is #NUM! in the sheet's words", () => {
    const cell = one("DIST_LUM_ERR", 1, -0.1);
    expect(String((cell as { message: string }).message)).toBe("ZC.DIST_LUM_ERR: z_err = -0.1 must be ≥ 0");
  });
});

describe("each error term against a finite difference of its own function (rel ≤ 1e-6)", () => {
  const flat = new Cosmology(geometries.flat);

  test("LUMINOSITY_NU_ERR's redshift term with α ≠ −1: |dL_ν/dz| σ_z, the (1+z)^−(1+α) factor included", () => {
    const [s, z, zErr, alpha] = [1e-28, 1.5, 0.02, 0.5]; // W/m2/Hz; α = 0.5 makes (1+α)/(1+z) matter
    const slope = fivePoint((x) => spectralLuminosityWHz(flat, s, x, alpha), z, 1e-3);
    expectRelative(spectralLuminosityErrorWHz(flat, s, 0, z, zErr, alpha, 0), Math.abs(slope) * zErr, 1e-6, "z term");
  });

  test("SIZE_ERR's redshift term for an angle other than 1 rad: θ |dD_A/dz| σ_z", () => {
    const [angle, z, zErr] = [1e-5, 0.5, 0.01]; // rad
    const slope = fivePoint((x) => flat.properSizeMpc(angle, x), z, 1e-3);
    expectRelative(properSizeErrorMpc(flat, angle, 0, z, zErr), Math.abs(slope) * zErr, 1e-6, "z term");
  });

  test.each([
    // call with one negative error                                                  | the error it names
    [() => luminosityDistanceErrorMpc(flat, 1, -1),                                     /^z_err = -1 must be ≥ 0/],
    [() => luminosityErrorW(flat, 1, -1, 1, 0),                                         /^flux_err = -1 must be ≥ 0/],
    [() => luminosityErrorW(flat, 1, 0, 1, -1),                                         /^z_err = -1 must be ≥ 0/],
    [() => spectralLuminosityErrorWHz(flat, 1, -1, 1, 0, 0, 0),                         /^flux_density_err = -1 must be ≥ 0/],
    [() => spectralLuminosityErrorWHz(flat, 1, 0, 1, -1, 0, 0),                         /^z_err = -1 must be ≥ 0/],
    [() => spectralLuminosityErrorWHz(flat, 1, 0, 1, 0, 0, -1),                         /^alpha_err = -1 must be ≥ 0/],
    [() => restFrameSpectralLuminosityErrorWHz(flat, 1, -1, 1, 0, 0, 0, 1e9, 2e9),      /^flux_density_err = -1 must be ≥ 0/],
    [() => restFrameSpectralLuminosityErrorWHz(flat, 1, 0, 1, -1, 0, 0, 1e9, 2e9),      /^z_err = -1 must be ≥ 0/],
    [() => restFrameSpectralLuminosityErrorWHz(flat, 1, 0, 1, 0, 0, -1, 1e9, 2e9),      /^alpha_err = -1 must be ≥ 0/],
    [() => absoluteMagnitudeErrorMag(flat, -1, 1, 0),                                   /^m_err = -1 must be ≥ 0/],
    [() => absoluteMagnitudeErrorMag(flat, 0, 1, -1),                                   /^z_err = -1 must be ≥ 0/],
    [() => absoluteMagnitudeErrorMag(flat, 0, 1, 0, -1),                                /^kcorr_err = -1 must be ≥ 0/],
    [() => properSizeErrorMpc(flat, 1e-5, -1, 1, 0),                                    /^angle_err = -1 must be ≥ 0/],
    [() => properSizeErrorMpc(flat, 1e-5, 0, 1, -1),                                    /^z_err = -1 must be ≥ 0/],
  ])("a negative error is refused by the core, naming it (%#)", (call, message) => {
    expect(call).toThrow(RangeError);
    expect(call).toThrow(message);
  });
});
