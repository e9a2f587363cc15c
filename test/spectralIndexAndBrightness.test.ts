/**
 * ZC.INDEX_BETWEEN and its error, and ZC.BRIGHTNESS_TEMP: the sign and the bands in any unit, the
 * first-order error against finite differences, T_b against astropy's brightness-temperature
 * equivalency (Debian python3-astropy) and the published VLBI constant.
 */
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { speedOfLightMPerS } from "../core/index.js";
import { sheetCalls } from "./sheetCalls.js";
import { expectRelative, fivePoint } from "./helpers.js";
import { referenceAvailable, runPythonReference } from "./reference/python.js";
import { onFirstUse } from "./requirements.js";

const { one, num, failure } = sheetCalls("P18-CMB");

describe("INDEX_BETWEEN: α of S_ν ∝ ν^α between two bands", () => {
  test.each([
    // S1     ν1      S2      ν2     unit    α        source
    [10,      1.4,    5,      5.6,   "",     -0.5,    "half the flux at four times the frequency: ln(2)/ln(1/4) (definition)"],
    [1,       1,      1,      8,     "GHz",  0,       "a flat spectrum"],
    [4,       2,      1,      1,     "MHz",  2,       "the Rayleigh–Jeans slope, S ∝ ν²: 4 = 2²"],
    [3,       20,     6,      6,     "cm",   0.5757,  "wavelength bands: ν ∝ 1/λ, so ln(3/6)/ln(6/20), rising to the shorter wavelength (definition)"],
  ])("INDEX_BETWEEN(%d, %d, %d, %d, %j) = %d", (s1, b1, s2, b2, unit, alpha, _source) => {
    expect(Math.abs(num("INDEX_BETWEEN", s1, b1, s2, b2, unit) - alpha)).toBeLessThanOrEqual(unit === "cm" ? 5e-5 : 1e-14);
  });

  test("a power law's index is recovered exactly, and swapping the bands changes nothing", () => {
    fc.assert(
      fc.property(
        fc.double({ min: -3, max: 3, noNaN: true }),
        fc.double({ min: 1e-3, max: 1e3, noNaN: true }),
        fc.double({ min: 0.01, max: 1000, noNaN: true }),
        fc.double({ min: 1.01, max: 1000, noNaN: true }),
        (alpha, s1, nu1, ratio) => {
          const nu2 = nu1 * ratio;
          const s2 = s1 * ratio ** alpha;
          // rounding of S2 and of ln(S1/S2), a few 1e-16 each, over ln(ν2/ν1)
          const rounding = (1e-14 * (1 + Math.abs(alpha))) / Math.log(ratio);
          const forward = num("INDEX_BETWEEN", s1, nu1, s2, nu2);
          expect(Math.abs(forward - alpha)).toBeLessThanOrEqual(rounding);
          expect(Math.abs(num("INDEX_BETWEEN", s2, nu2, s1, nu1) - forward)).toBeLessThanOrEqual(rounding);
        },
      ),
    );
  });

  test("one pair of bands in GHz, MHz, as wavelengths or as photon energies gives the same α", () => {
    const inGHz = num("INDEX_BETWEEN", 2.5, 1.4, 0.9, 8.4);
    expectRelative(num("INDEX_BETWEEN", 2.5, 1400, 0.9, 8400, "MHz"), inGHz, 1e-14, "MHz");
    const cm = (ghz: number) => (speedOfLightMPerS / (ghz * 1e9)) * 100;
    expectRelative(num("INDEX_BETWEEN", 2.5, cm(1.4), 0.9, cm(8.4), "cm"), inGHz, 1e-13, "cm");
    // E = h ν: 1 GHz is 4.135667696e-6 eV (h = 6.62607015e-34 J s, e = 1.602176634e-19 C: SI 2019, exact)
    const ueV = (ghz: number) => (6.62607015e-34 * ghz * 1e9) / 1.602176634e-19 / 1e-6;
    expectRelative(num("INDEX_BETWEEN", 2.5, ueV(1.4), 0.9, ueV(8.4), "ueV"), inGHz, 1e-13, "µeV");
  });

  test.each([
    // arguments                          kind     message
    [[1, 1.4, 2, 1.4],                    "num",   "ZC.INDEX_BETWEEN: band1 and band2 are the same frequency: an index needs two different bands"],
    [[0, 1.4, 2, 5],                      "num",   "ZC.INDEX_BETWEEN: flux_density1 = 0 must be > 0"],
    [[1, 1.4, -2, 5],                     "num",   "ZC.INDEX_BETWEEN: flux_density2 = -2 must be > 0"],
    [[1, 1.4, 2, 5, "Jy"],                "value", 'ZC.INDEX_BETWEEN: band_unit: "Jy" is a flux density; use a frequency (GHz), a wavelength (Angstrom, um) or an energy (eV)'],
  ] as const)("INDEX_BETWEEN(%j) is %s", (args, kind, message) => {
    expect(failure("INDEX_BETWEEN", ...args)).toEqual({ kind, message });
  });

  test("blank in, blank out", () => {
    expect(one("INDEX_BETWEEN", "", 1.4, 2, 5)).toBe("");
    expect(one("INDEX_BETWEEN_ERR", 1, 1.4, 2, 5, "", 0.1)).toBe("");
  });
});

describe("INDEX_BETWEEN_ERR: first-order error from independent flux-density errors", () => {
  test.each([
    // S1    ν1    S2    ν2    σ1     σ2
    [10,     1.4,  5,    5.6,  0.3,   0.2],
    [0.02,   0.15, 0.05, 1.4,  0.004, 0.001],
    [1,      8.4,  3,    1.4,  0,     0.1],
  ])("(%d at %d GHz, %d at %d GHz, σ %d, %d) equals √(Σ(∂α/∂S_i σ_i)²) from five-point differences (rel ≤ 1e-8)", (s1, nu1, s2, nu2, e1, e2) => {
    const alpha = (a: number, b: number) => num("INDEX_BETWEEN", a, nu1, b, nu2);
    const d1 = fivePoint((x) => alpha(x, s2), s1, s1 * 1e-3);
    const d2 = fivePoint((x) => alpha(s1, x), s2, s2 * 1e-3);
    expectRelative(num("INDEX_BETWEEN_ERR", s1, nu1, s2, nu2, e1, e2), Math.hypot(d1 * e1, d2 * e2), 1e-8, "σ_α");
  });

  test("errors are ≥ 0 and the bands must differ", () => {
    expect(failure("INDEX_BETWEEN_ERR", 1, 1.4, 2, 5, -0.1, 0.1)).toEqual({ kind: "num", message: "ZC.INDEX_BETWEEN_ERR: err1 = -0.1 must be ≥ 0" });
    expect(failure("INDEX_BETWEEN_ERR", 1, 1.4, 2, 1.4, 0.1, 0.1).kind).toBe("num");
  });
});

describe("BRIGHTNESS_TEMP: Rayleigh–Jeans T_b of an elliptical Gaussian", () => {
  test("1 Jy at 1 GHz in a 1 × 1 mas Gaussian is 1.22e12 K, the constant of VLBI brightness temperatures (T_b = 1.22e12 S/(ν² θ_maj θ_min) K, S in Jy, ν in GHz, θ in mas; from memory, 3 digits)", () => {
    expect(Math.abs(num("BRIGHTNESS_TEMP", 1, 1, 1, 1, "", "", "", "mas") / 1.22e12 - 1)).toBeLessThanOrEqual(5e-3);
  });

  test("1 Jy in a 15″ Gaussian at 5 GHz is 217.2659 K (astropy's brightness_temperature example, computed with older constants: agrees to 2e-7)", () => {
    expectRelative(num("BRIGHTNESS_TEMP", 1, 5, 15, 15), 217.2658703625732, 2e-7, "VLA beam");
  });

  test("the Rayleigh–Jeans T_b is below the Planck brightness temperature, as the help says with its numbers (1 Jy, 300 GHz, 1″: 13.58 K, Planck 19.9 K)", () => {
    // Planck brightness temperature of the same intensity: I = (2hν³/c²)/(e^{hν/kT} − 1) and T_RJ = I c²/(2kν²) give
    // T = (hν/k)/ln(1 + hν/(k T_RJ)) (Rybicki & Lightman 1979 §1.5, from memory); h, k exact (SI 2019)
    const hOverK = 6.62607015e-34 / 1.380649e-23; // K/Hz
    const planck = (tRJ: number, ghz: number) => (hOverK * ghz * 1e9) / Math.log1p((hOverK * ghz * 1e9) / tRJ);
    const tRJ = num("BRIGHTNESS_TEMP", 1, 300, 1, 1);
    expect(tRJ).toBeCloseTo(13.58, 2);
    expect(hOverK * 300e9).toBeCloseTo(14.4, 1); // hν/k at 300 GHz, the scale where RJ fails
    expect(planck(tRJ, 300)).toBeCloseTo(19.9, 1);
    // while T_b ≫ hν/k the two differ by hν/(2k) = 0.024 K per GHz (the series of ln(1 + u) to u²)
    expect((hOverK * 1e9) / 2).toBeCloseTo(0.024, 3);
    expect(hOverK * 1e9).toBeCloseTo(0.048, 3);
    const hot = num("BRIGHTNESS_TEMP", 1, 5, 0.01, 0.01);
    expect(planck(hot, 5) - hot).toBeCloseTo(5 * 0.024, 3);
    for (const ghz of [1.4, 22, 230, 850]) expect(planck(num("BRIGHTNESS_TEMP", 0.1, ghz, 0.5, 0.5), ghz)).toBeGreaterThan(num("BRIGHTNESS_TEMP", 0.1, ghz, 0.5, 0.5));
  });

  test("the rest frame's T_b is (1+z) times the observed one; the axes may come in either order", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 20, noNaN: true }), fc.double({ min: 1e-3, max: 100, noNaN: true }), fc.double({ min: 1e-3, max: 100, noNaN: true }), (z, major, minor) => {
        const observed = num("BRIGHTNESS_TEMP", 0.01, 1.4, major, minor);
        expectRelative(num("BRIGHTNESS_TEMP", 0.01, 1.4, major, minor, z), (1 + z) * observed, 1e-14, `z = ${z}`);
        expectRelative(num("BRIGHTNESS_TEMP", 0.01, 1.4, minor, major), observed, 1e-14, "axes swapped");
      }),
    );
  });

  test("units: mJy, MHz and mas give the same T_b as Jy, GHz and arcsec; a band given as a wavelength too", () => {
    const reference = num("BRIGHTNESS_TEMP", 0.05, 5, 0.002, 0.001);
    expectRelative(num("BRIGHTNESS_TEMP", 50, 5000, 2, 1, "", "mJy", "MHz", "mas"), reference, 1e-13, "mJy, MHz, mas");
    expectRelative(num("BRIGHTNESS_TEMP", 0.05, (speedOfLightMPerS / 5e9) * 100, 0.002, 0.001, "", "", "cm"), reference, 1e-13, "cm");
  });

  test("blank in, blank out; a blank z is the observed frame", () => {
    expect(one("BRIGHTNESS_TEMP", "", 1.4, 1, 1)).toBe("");
    expect(one("BRIGHTNESS_TEMP", 1, 1.4, 1, "")).toBe("");
    expect(one("BRIGHTNESS_TEMP", 1, 1.4, 1, 1, "")).toBe(one("BRIGHTNESS_TEMP", 1, 1.4, 1, 1, 0));
  });

  test.each([
    // arguments                            kind     message
    [[1, 1.4, 0, 1],                        "num",   "ZC.BRIGHTNESS_TEMP: major = 0 arcsec must be > 0 arcsec"],
    [[1, 1.4, 1, 1, -0.5],                  "num",   "ZC.BRIGHTNESS_TEMP: z = -0.5 is negative: a blueshifted source needs a redshift-independent distance"],
    [[-1, 1.4, 1, 1],                       "num",   "ZC.BRIGHTNESS_TEMP: flux_density = -1 Jy must be ≥ 0 Jy"],
  ] as const)("BRIGHTNESS_TEMP(%j) is %s", (args, kind, message) => {
    expect(failure("BRIGHTNESS_TEMP", ...args)).toEqual({ kind, message });
  });
});

describe.runIf(referenceAvailable("astropy", "python3-astropy"))("BRIGHTNESS_TEMP against astropy's brightness_temperature equivalency (python3-astropy)", () => {
  // flux [Jy]         frequency [GHz]       major, minor [arcsec]
  const cases: [number, number, number, number][] = [];
  for (const flux of [1e-5, 0.01, 3, 250]) for (const ghz of [0.074, 0.15, 1.4, 5, 22, 230]) for (const [major, minor] of [[1e-4, 5e-5], [0.5, 0.2], [15, 15], [120, 30]]) cases.push([flux, ghz, major, minor]);
  const reply = onFirstUse(() => runPythonReference<{ t_b_kelvin: number[] }>("astropy_spectral.py", { f_lambda: [], brightness: cases }));

  test(`${cases.length} cases agree within 1e-12 relative`, () => {
    let worst = 0;
    cases.forEach(([flux, ghz, major, minor], i) => {
      const ours = num("BRIGHTNESS_TEMP", flux, ghz, major, minor);
      worst = Math.max(worst, Math.abs(ours / reply().t_b_kelvin[i] - 1));
    });
    console.info(`brightness temperature: worst relative difference against astropy: ${worst.toExponential(2)}`);
    expect(worst).toBeLessThanOrEqual(1e-12);
  });
});
