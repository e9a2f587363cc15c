/**
 * Velocities, redshifts and the rest frame: VELOCITY and Z_FROM_VELOCITY in the optical, radio and
 * relativistic conventions, Z_COMBINE, VELOCITY_PECULIAR, REST_FRAME and OBSERVED_FRAME. Worked values
 * from the definitions and identities over random inputs (fast-check); the outside references
 * (python3-mpmath, python3-astropy) are in velocitiesReference.test.ts.
 */
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import {
  combinedRedshift,
  dopplerConventions,
  observedFrameValue,
  peculiarVelocityKmPerS,
  redshiftOfVelocity,
  restFrameValue,
  speedOfLightKmPerS,
  velocityKmPerS,
  type DopplerConvention,
} from "../core/index.js";
import { CellError } from "../functions/cellError.js";
import { expectRelative, relativeError } from "./helpers.js";
import { sheetCalls } from "./sheetCalls.js";

const { run: sheet, one } = sheetCalls("P18-BAO");
const c = speedOfLightKmPerS; // 299792.458 km/s, exact (SI 2019)

describe("worked values from the definitions", () => {
  test.each([
    // call                                                       expected           source
    [["VELOCITY", 0.01],                                         2997.92458,        "cz with c = 299792.458 km/s exact (SI)"],
    [["VELOCITY", 0.01, "optical", "m/s"],                       2997924.58,        "the same in m/s"],
    [["VELOCITY", 1, "radio"],                                   c / 2,             "cz/(1+z) at z = 1"],
    [["VELOCITY", 1, "relativistic"],                            0.6 * c,           "β = 0.6 gives 1+z = √(1.6/0.4) = 2 (special-relativistic Doppler, Rybicki & Lightman 1979 eq. 4.12, from memory)"],
    [["VELOCITY", -0.5],                                         -c / 2,            "a blueshift in the optical convention"],
    [["VELOCITY", 3, "relativistic"],                            (15 / 17) * c,     "(1+z)² = 16: v/c = 15/17"],
    [["Z_FROM_VELOCITY", 0.8 * c, "relativistic"],               2,                 "√(1.8/0.2) − 1 = 2"],
    [["Z_FROM_VELOCITY", c / 2, "radio"],                        1,                 "v/(c − v) at v = c/2"],
    [["Z_FROM_VELOCITY", 2997924.58, "", "m/s"],                 0.01,              "v/c, v in m/s, blank convention = optical"],
    [["Z_COMBINE", 0.1, 0.001],                                  0.1011,            "(1.1)(1.001) − 1"],
    [["Z_COMBINE", 1, -0.5],                                     0,                 "a redshift undone by its inverse shift"],
    [["VELOCITY_PECULIAR", 0.101, 0.1],                          (c * 0.001) / 1.1, "c Δz/(1 + z_cosmo) (Davis & Scrimgeour 2014): 272.54, not cΔz = 299.79"],
    [["VELOCITY_PECULIAR", 0.05, 0.05],                          0,                 "on the Hubble flow"],
    [["REST_FRAME", 6563, 0.1, "wavelength", "Angstrom"],        6563 / 1.1,        "λ/(1+z) (common practice)"],
    [["REST_FRAME", 1.4, 2, "frequency", "GHz"],                 4.2,               "ν(1+z): 1.4 GHz observed at z = 2 is 4.2 GHz at rest"],
    [["REST_FRAME", 30, 1, "duration", "d"],                     15,                "a 30-day rise observed at z = 1 took 15 days at the source (time dilation)"],
    [["REST_FRAME", -12, 2, "equivalent_width"],                 -4,                "W/(1+z), sign kept"],
    [["OBSERVED_FRAME", 1.42040575, 0.05, "frequency", "GHz"],   1.42040575 / 1.05, "the 21-cm line (1.42040575 GHz, from memory) at z = 0.05"],
    [["OBSERVED_FRAME", 121.567, 3, "wavelength", "nm"],         486.268,           "Lyman α (121.567 nm, from memory) at z = 3: × 4"],
    [["OBSERVED_FRAME", 10, 0.5, "duration", "s"],               15,                "time dilation, observed"],
    [["REST_FRAME", 6.4, 0.05, "frequency", "keV"],              6.72,              "a photon energy E = hν scales as ν: 6.4 keV observed at z = 0.05 is 6.72 keV at rest"],
    [["OBSERVED_FRAME", 6.4, 0.05, "frequency", "keV"],          6.4 / 1.05,        "Fe Kα (6.4 keV, from memory) at z = 0.05"],
    [["OBSERVED_FRAME", 10.2, 1, "frequency", "eV"],             5.1,               "Lyman α (10.2 eV) at z = 1: halved"],
  ] as const)("%j is %d: %s", (call, expected, _source) => {
    const [name, ...args] = call;
    const got = one(name, ...args);
    expect(typeof got).toBe("number");
    if (expected === 0) expect(Math.abs(got as number)).toBeLessThanOrEqual(1e-15);
    else expectRelative(got as number, expected, 1e-15, JSON.stringify(call)); // a few roundings
  });

  test.each([
    // call                                                 kind     message
    [["Z_FROM_VELOCITY", 3e5, "radio"],                     "num",   "ZC.Z_FROM_VELOCITY: v must be below c (299792.458 km/s) in the radio convention, v = c z/(1 + z)"],
    [["Z_FROM_VELOCITY", -3e5, "relativistic"],             "num",   "ZC.Z_FROM_VELOCITY: v must be between −c and c (±299792.458 km/s) in the relativistic convention"],
    [["Z_FROM_VELOCITY", -3e5],                             "num",   "ZC.Z_FROM_VELOCITY: v must be above −c (−299792.458 km/s): z = v/c > −1"],
    [["Z_FROM_VELOCITY", 100, "doppler"],                   "value", 'ZC.Z_FROM_VELOCITY: convention: "doppler" is not one of optical, radio, relativistic'],
    [["VELOCITY", -1],                                      "num",   "ZC.VELOCITY: z = -1 must be > -1"],
    [["VELOCITY", "0.1x"],                                  "value", 'ZC.VELOCITY: z: text "0.1x" where a number belongs'],
    [["VELOCITY", 0.1, "", "Mpc"],                          "value", 'ZC.VELOCITY: unit: cannot convert "km/s" (a speed) to "Mpc" (a length)'],
    [["Z_COMBINE", 0.1, -2],                                "num",   "ZC.Z_COMBINE: z2 = -2 must be > -1"],
    [["REST_FRAME", -5, 0.1, "wavelength"],                 "num",   "ZC.REST_FRAME: wavelength = -5 must be > 0"],
    [["REST_FRAME", 5, 0.1, "wavelength", "GHz"],           "value", 'ZC.REST_FRAME: unit: cannot convert "GHz" (a frequency) to "Angstrom" (a length); a wavelength takes a length (Angstrom, nm, um)'],
    [["OBSERVED_FRAME", 5, 0.1, "duration", "Angstrom"],    "value", 'ZC.OBSERVED_FRAME: unit: cannot convert "Angstrom" (a length) to "d" (a time); a duration takes a time (d, s, yr)'],
    [["REST_FRAME", 5, 0.1, "flux"],                        "value", 'ZC.REST_FRAME: quantity: "flux" is not one of wavelength, frequency, duration, equivalent_width'],
    [["REST_FRAME", 5, 0.1, "frequency", "Angstrom"],       "value", 'ZC.REST_FRAME: unit: cannot convert "Angstrom" (a length) to "GHz" (a frequency); a frequency takes a frequency (GHz, MHz, Hz) or a photon energy (keV, eV)'],
    [["REST_FRAME", 5, 0.1, "wavelength", "keV"],           "value", 'ZC.REST_FRAME: unit: cannot convert "keV" (an energy) to "Angstrom" (a length); a wavelength takes a length (Angstrom, nm, um); a photon energy scales as a frequency: give quantity "frequency"'],
    [["OBSERVED_FRAME", 150, 0.1, "equivalent_width", "eV"], "value", 'ZC.OBSERVED_FRAME: unit: cannot convert "eV" (an energy) to "Angstrom" (a length); an equivalent width takes a length (Angstrom, nm); an equivalent width in energy scales as a frequency: give quantity "frequency"'],
  ] as const)("%j is #%s naming the fix", (call, kind, message) => {
    const [name, ...args] = call;
    const cell = one(name, ...args) as CellError;
    expect(cell).toBeInstanceOf(CellError);
    expect(cell.kind).toBe(kind);
    expect(cell.message).toBe(message);
  });

  test("ranges in and out: a column of redshifts against a row of conventions, a blank row stays blank", () => {
    const out = sheet("VELOCITY", [[0.01], [""], [1]], [["optical", "radio", "relativistic"]]);
    expect(out[0]).toEqual([0.01 * c, (0.01 * c) / 1.01, velocityKmPerS(0.01, "relativistic")]);
    expect(out[1]).toEqual(["", "", ""]);
    expect(out[2]).toEqual([c, c / 2, 0.6 * c]);
    const rest = sheet("REST_FRAME", [[6563], [4861], [""]], 0.1, "wavelength");
    expect(rest).toEqual([[6563 / 1.1], [4861 / 1.1], [""]]);
  });
});

describe("identities over random inputs (fast-check)", () => {
  const redshift = fc.double({ min: -0.999, max: 1e4, noNaN: true });
  const conventionArb = fc.constantFrom(...dopplerConventions);

  test("Z_FROM_VELOCITY∘VELOCITY gives back z in every convention, within a few roundings times the convention's condition number", () => {
    // the radio velocity holds 1 + z only to 1/(1 + z) of c, the relativistic one to 1/(1 + z)² of c:
    // the round trip can keep no more (condition numbers of the definitions, common practice)
    const condition = { optical: 1, radio: (z: number) => 1 + z + 1 / (1 + z), relativistic: (z: number) => (1 + z) ** 2 + 1 / (1 + z) ** 2 };
    fc.assert(
      fc.property(redshift, conventionArb, (z, convention) => {
        const back = redshiftOfVelocity(velocityKmPerS(z, convention), convention);
        const kappa = convention === "optical" ? 1 : condition[convention](z);
        expect(Math.abs(back - z), `${z} ${convention}`).toBeLessThanOrEqual(8 * Number.EPSILON * kappa * Math.abs(z));
      }),
      { numRuns: 5000, seed: 29 },
    );
  });

  test("VELOCITY∘Z_FROM_VELOCITY gives back v (relative 1e-13) in every convention", () => {
    fc.assert(
      fc.property(fc.double({ min: -0.999 * c, max: 0.999 * c, noNaN: true }), conventionArb, (v, convention) => {
        const back = velocityKmPerS(redshiftOfVelocity(v, convention), convention);
        expect(Math.abs(back - v), `${v} ${convention}`).toBeLessThanOrEqual(1e-13 * Math.max(Math.abs(v), 1e-300) * (convention === "optical" ? 1 : 1 / (1 - Math.abs(v) / c)));
      }),
      { numRuns: 5000, seed: 29 },
    );
  });

  test("the conventions agree to first order, cz, and are ordered radio < relativistic < optical for z > 0", () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-6, max: 100, noNaN: true }), (z) => {
        const [optical, radio, relativistic] = dopplerConventions.map((k) => velocityKmPerS(z, k as DopplerConvention));
        expect(radio).toBeLessThan(relativistic);
        expect(relativistic).toBeLessThan(optical);
        if (z < 1e-3) expect(Math.abs(radio / optical - 1)).toBeLessThanOrEqual(2 * z); // both cz(1 − O(z))
      }),
      { numRuns: 2000, seed: 29 },
    );
  });

  test("Z_COMBINE is commutative and associative, and the peculiar velocity composes back to z_obs", () => {
    fc.assert(
      fc.property(redshift, redshift, fc.double({ min: -0.5, max: 10, noNaN: true }), (z1, z2, z3) => {
        expect(combinedRedshift(z1, z2)).toBe(combinedRedshift(z2, z1));
        const left = combinedRedshift(combinedRedshift(z1, z2), z3);
        const right = combinedRedshift(z1, combinedRedshift(z2, z3));
        expect(Math.abs(left - right)).toBeLessThanOrEqual(1e-12 * (1 + Math.abs(left)));
        // 1 + z_obs = (1 + z_cosmo)(1 + v_pec/c) (Davis & Scrimgeour 2014)
        const zCosmo = Math.abs(z3);
        const zObs = combinedRedshift(zCosmo, z1 / 1e3);
        const vPec = peculiarVelocityKmPerS(zObs, zCosmo);
        expect(Math.abs(combinedRedshift(zCosmo, vPec / c) - zObs)).toBeLessThanOrEqual(1e-14 * (1 + zObs));
      }),
      { numRuns: 3000, seed: 29 },
    );
  });

  test("an equivalent width in energy moves as a frequency: W_E = ∫(1 − F_E/F_c) dE and dE_obs = dE_rest/(1+z), so W_E,rest = (1+z) W_E,obs", () => {
    // the same integral in wavelength gives W_λ,rest = W_λ,obs/(1+z) (common practice); at the line E = hc/λ, so
    // W_E = W_λ E/λ: a 150 eV width of a 6.4 keV line observed at z = 0.05 (invented numbers) is in Angstrom W_λ = 150 λ_obs/E_obs
    const [wEv, lineKeV, z] = [150, 6.4, 0.05];
    const hcKeVAngstrom = (6.62607015e-34 * 299792458) / 1.602176634e-16 / 1e-10; // h c in keV Å (exact constants, SI 2019)
    const lambdaObs = hcKeVAngstrom / (lineKeV / (1 + z));
    const wAngstromObs = (wEv / 1000) * (lambdaObs / (lineKeV / (1 + z)));
    const wAngstromRest = one("REST_FRAME", wAngstromObs, z, "equivalent_width", "Angstrom") as number;
    const viaWavelength = (wAngstromRest * lineKeV * 1000) / (hcKeVAngstrom / lineKeV); // back to eV at the rest-frame line
    expectRelative(one("REST_FRAME", wEv, z, "frequency", "eV") as number, viaWavelength, 1e-14, "eV width at rest");
  });

  test("a photon energy moves as its frequency: REST_FRAME in keV is the frequency's E = hν, in any energy unit", () => {
    // E = h ν with h = 6.62607015e-34 J s and 1 eV = 1.602176634e-19 J (both exact, SI 2019)
    const hzPerKeV = 1.602176634e-16 / 6.62607015e-34;
    for (const [kev, z] of [[6.4, 0.05], [0.5, 3], [2000, 0.001]]) {
      const restGHz = one("REST_FRAME", (kev * hzPerKeV) / 1e9, z, "frequency", "GHz") as number;
      expectRelative(one("REST_FRAME", kev, z, "frequency", "keV") as number, (restGHz * 1e9) / hzPerKeV, 1e-14, `${kev} keV at z = ${z}`);
      expectRelative(one("OBSERVED_FRAME", kev * 1000, z, "frequency", "eV") as number, (1000 * kev) / (1 + z), 1e-15, "eV");
    }
  });

  test("OBSERVED_FRAME∘REST_FRAME is the identity; a frequency and its wavelength shift inversely; durations and widths shift as wavelengths", () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-3, max: 1e9, noNaN: true }), redshift, (x, z) => {
        for (const q of ["wavelength", "frequency", "duration", "equivalent_width"] as const) {
          expect(relativeError(observedFrameValue(restFrameValue(x, z, q), z, q), x)).toBeLessThanOrEqual(3e-16);
        }
        expect(relativeError(restFrameValue(x, z, "frequency") * restFrameValue(1 / x, z, "wavelength"), 1)).toBeLessThanOrEqual(5e-16);
        expect(restFrameValue(x, z, "duration")).toBe(restFrameValue(x, z, "wavelength"));
        expect(restFrameValue(x, z, "equivalent_width")).toBe(restFrameValue(x, z, "wavelength"));
      }),
      { numRuns: 3000, seed: 29 },
    );
  });
});
