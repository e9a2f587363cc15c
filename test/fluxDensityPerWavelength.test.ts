/**
 * MAG_AB and FLUX_AB with flux densities per wavelength (f_λ): f_ν = f_λ λ²/c at the wavelength
 * given, checked against astropy's spectral_density equivalency (Debian python3-astropy), the AB
 * definition, round trips, and the errors that name the fix.
 */
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { fluxDensityFactorJy } from "../core/index.js";
import { sheetCalls } from "./sheetCalls.js";
import { expectRelative } from "./helpers.js";
import { referenceAvailable, runPythonReference } from "./reference/python.js";
import { onFirstUse } from "./requirements.js";

const { run, one, num, failure } = sheetCalls("P18-CMB");
/** c in Å/s: 299792458 m/s exactly (SI 2019) × 1e10 Å/m. */
const cAngstromPerS = 299_792_458e10;

describe("per wavelength: f_ν = f_λ λ²/c", () => {
  test("m_AB of f_λ [erg/s/cm2/Å] at λ [Å] is −2.5 log10(f_λ λ²/c) − 48.60 (Oke & Gunn 1983 with f_ν = f_λ λ²/c)", () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-22, max: 1e-10, noNaN: true }), fc.double({ min: 900, max: 5e5, noNaN: true }), (flambda, angstrom) => {
        const expected = -2.5 * Math.log10((flambda * angstrom * angstrom) / cAngstromPerS) - 48.6;
        expect(Math.abs(num("MAG_AB", flambda, "erg/s/cm2/Angstrom", angstrom) - expected)).toBeLessThanOrEqual(1e-12);
      }),
    );
  });

  test("FLUX_AB inverts MAG_AB in every unit, per wavelength or per frequency", () => {
    const units = ["erg/s/cm2/Angstrom", "W/m2/um", "W/m2/nm", "erg/s/cm2/Hz", "uJy", "Jy"];
    fc.assert(
      fc.property(fc.double({ min: -5, max: 35, noNaN: true }), fc.constantFrom(...units), fc.double({ min: 1000, max: 1e5, noNaN: true }), (m, unit, angstrom) => {
        const f = num("FLUX_AB", m, unit, angstrom);
        expect(Math.abs(num("MAG_AB", f, unit, angstrom) - m)).toBeLessThanOrEqual(1e-12);
      }),
    );
  });

  test("one flux density in erg/s/cm2/Angstrom and in W/m2/um (1 erg/s/cm2/Å = 10 W/m2/µm) has one magnitude", () => {
    expect(Math.abs(num("MAG_AB", 3e-17, "erg/s/cm2/Angstrom", 6231) - num("MAG_AB", 3e-16, "W/m2/um", 6231))).toBeLessThanOrEqual(1e-12);
  });

  test("a per-frequency unit does not use the wavelength; the old two-argument calls are unchanged", () => {
    expect(one("MAG_AB", 12, "uJy", 5000)).toBe(one("MAG_AB", 12, "uJy"));
    expect(one("FLUX_AB", 21.3, "", 5000)).toBe(one("FLUX_AB", 21.3));
    expectRelative(num("MAG_AB", 1, "uJy"), 23.9, 1e-3, "1 µJy is m_AB 23.90 (Oke & Gunn 1983 zero point 3630.78 Jy)");
  });

  test("the range of an f_λ wavelength, 100 … 1e7 Angstrom, holds its ends; a per-frequency unit does not look at the wavelength", () => {
    for (const angstrom of [100, 1e7]) expect(Number.isFinite(num("MAG_AB", 1e-17, "erg/s/cm2/Angstrom", angstrom)), `${angstrom} Å`).toBe(true);
    expect(one("MAG_AB", 12, "uJy", 0.5)).toBe(one("MAG_AB", 12, "uJy"));
  });

  test("a column of flux densities, each at its own wavelength", () => {
    const out = run("MAG_AB", [[1e-17], [1e-17], [""]], "erg/s/cm2/Angstrom", [[4000], [8000], [6000]]);
    expect(out[0][0]).toBe(one("MAG_AB", 1e-17, "erg/s/cm2/Angstrom", 4000));
    // the same f_λ at twice the wavelength is 4 times the f_ν: 2.5 log10 4 = 1.505 mag brighter
    expect(Math.abs((out[0][0] as number) - (out[1][0] as number) - 2.5 * Math.log10(4))).toBeLessThanOrEqual(1e-12);
    expect(out[2][0]).toBe("");
  });
});

describe("errors that name the fix", () => {
  test.each([
    // function  arguments                                      kind     message
    ["MAG_AB",   [1e-17, "erg/s/cm2/Angstrom"],                 "value", 'ZC.MAG_AB: wavelength is needed with "erg/s/cm2/Angstrom", a flux density per wavelength (f_λ): give it in Angstrom (the last argument) to turn f_λ into f_ν'],
    ["FLUX_AB",  [20, "W/m2/um", ""],                           "value", 'ZC.FLUX_AB: wavelength is needed with "W/m2/um", a flux density per wavelength (f_λ): give it in Angstrom (the last argument) to turn f_λ into f_ν'],
    ["MAG_AB",   [1e-17, "erg/s/cm2/Angstrom", -5],             "num",   "ZC.MAG_AB: wavelength = -5 must be > 0"],
    ["MAG_AB",   [1e-17, "erg/s/cm2"],                          "value", 'ZC.MAG_AB: unit: "erg/s/cm2" is not a flux density: use one per frequency (Jy, mJy, erg/s/cm2/Hz) or per wavelength (erg/s/cm2/Angstrom, W/m2/um)'],
    ["MAG_AB",   [5, "MJy"],                                    "value", 'ZC.MAG_AB: unit: "MJy" is megajansky (10⁹ mJy), not a likely flux density for a source: did you mean mJy? (units are case-sensitive)'],
    ["FLUX_AB",  [20, "furlong"],                               "value", 'ZC.FLUX_AB: unit: unknown unit "furlong" in "furlong"'],
    ["MAG_AB",   [0, "Jy"],                                     "num",   "ZC.MAG_AB: flux_density = 0 must be > 0"],
    // our range for an f_λ wavelength, 100 Å … 1e7 Å (1 mm): a value outside it is almost surely in another unit
    ["MAG_AB",   [1e-17, "erg/s/cm2/Angstrom", 0.5],            "num",   "ZC.MAG_AB: wavelength = 0.5 Angstrom is outside 100 … 1e7 Angstrom (1 mm), where zcell takes the wavelength of a flux density per wavelength: it is read in Angstrom (0.5 um is 5000 Angstrom)"],
    ["FLUX_AB",  [20, "W/m2/um", 2.2],                          "num",   "ZC.FLUX_AB: wavelength = 2.2 Angstrom is outside 100 … 1e7 Angstrom (1 mm), where zcell takes the wavelength of a flux density per wavelength: it is read in Angstrom (2.2 um is 22000 Angstrom)"],
    ["FLUX_AB",  [20, "W/m2/um", 5e14],                         "num",   "ZC.FLUX_AB: wavelength = 500000000000000 Angstrom is outside 100 … 1e7 Angstrom (1 mm), where zcell takes the wavelength of a flux density per wavelength: it is read in Angstrom"],
  ] as const)("%s(%j) is %s", (name, args, kind, message) => {
    expect(failure(name, ...args)).toEqual({ kind, message });
  });
});

describe.runIf(referenceAvailable("astropy", "python3-astropy"))("against astropy's spectral_density equivalency (python3-astropy)", () => {
  // value, our unit, astropy's spelling of it, wavelength [Å]
  const units: [string, string][] = [["erg/s/cm2/Angstrom", "erg/(s cm2 Angstrom)"], ["W/m2/um", "W/(m2 um)"], ["W/m2/nm", "W/(m2 nm)"], ["erg/s/cm2/nm", "erg/(s cm2 nm)"]];
  const cases: [number, string, string, number][] = [];
  for (const value of [1e-20, 3.7e-17, 2e-13]) for (const [ours, theirs] of units) for (const angstrom of [1216, 3551, 6231, 21900, 36000, 1e5]) cases.push([value, ours, theirs, angstrom]);
  const reply = onFirstUse(() => runPythonReference<{ f_nu_jy: number[] }>("astropy_spectral.py", { f_lambda: cases.map(([v, , theirs, a]) => [v, theirs, a]), brightness: [] }));

  test(`${cases.length} f_λ → f_ν conversions agree within 1e-14 relative, and through the sheet (FLUX_AB ∘ MAG_AB in Jy) within 1e-12`, () => {
    let direct = 0;
    let sheet = 0;
    cases.forEach(([value, unit, , angstrom], i) => {
      direct = Math.max(direct, Math.abs((value * fluxDensityFactorJy(unit, angstrom)) / reply().f_nu_jy[i] - 1));
      sheet = Math.max(sheet, Math.abs(num("FLUX_AB", num("MAG_AB", value, unit, angstrom), "Jy") / reply().f_nu_jy[i] - 1));
    });
    console.info(`f_λ → f_ν: worst relative difference against astropy's spectral_density: ${direct.toExponential(2)} (through MAG_AB and back: ${sheet.toExponential(2)})`);
    expect(direct).toBeLessThanOrEqual(1e-14);
    expect(sheet).toBeLessThanOrEqual(1e-12);
  });

  test("FLUX_AB into f_λ agrees with astropy's f_λ → f_ν read backwards within 1e-12 relative", () => {
    let worst = 0;
    cases.forEach(([value, unit, , angstrom], i) => {
      const back = num("FLUX_AB", num("MAG_AB", reply().f_nu_jy[i], "Jy"), unit, angstrom);
      worst = Math.max(worst, Math.abs(back / value - 1));
    });
    expect(worst).toBeLessThanOrEqual(1e-12);
  });
});
