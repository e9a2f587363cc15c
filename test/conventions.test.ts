/**
 * Numbers that cannot silently mislead (0.2.0): complete error propagation, the trade's defaults, and
 * units and arguments that refuse a likely mistake. Expected values are closed forms (Einstein–de
 * Sitter), the independent slow path (test/reference/slowCosmology.ts) with the published parameters,
 * finite differences of the function an error belongs to, and Monte Carlo draws.
 */
import { describe, expect, test } from "vitest";
import { defaultModelSpec } from "../functions/activeModel.js";
import { publishedModels } from "./fixtures.js";
import { sheetCalls } from "./sheetCalls.js";
import { expectRelative, fivePoint, normal, seededRandom, standardDeviation } from "./helpers.js";
import { SlowCosmology } from "./reference/slowCosmology.js";

const { one, num, failure } = sheetCalls(defaultModelSpec);

// Einstein–de Sitter (preset EDS: H0 = 70, Ωm = 1, no radiation): D_M = 2 D_H (1 − 1/√(1+z)) (Hogg 1999 eq. 16 with Ωm = 1, derived)
const dH = 299792.458 / 70; // Mpc, c/H0 (c exact, SI 2019)
const edsDM = (z: number) => 2 * dH * (1 - 1 / Math.sqrt(1 + z));
const edsDL = (z: number) => (1 + z) * edsDM(z);
const mpcCm = 3.0856775814913673e24; // 1 Mpc in cm (IAU 2015 Resolution B2 parsec)
const deg2Sr = (Math.PI / 180) ** 2; // common practice

describe("complete error propagation", () => {
  // a radio source observed at 3 GHz, rest-frame 1.4 GHz: flux density [mJy], z, α and their errors (invented)
  const [s, sErr, z, zErr, alpha, alphaErr] = [2.5, 0.1, 1.2, 0.01, -0.8, 0.05];
  const rest = (ss: number, zz: number, aa: number) => num("LUMINOSITY_REST", ss, zz, aa, 3, 1.4, "", "", "mJy");

  test("LUMINOSITY_REST_ERR: the α term alone is L · σ_α · |ln(ν_rest / ((1+z) ν_obs))| (EdS closed form)", () => {
    // L_ν(1.4 GHz) = 4π D_L² S (1+z)^−1 (1.4 / ((1+z) 3))^α, S in W/m2/Hz (1 mJy = 1e-29), D_L in m
    const lum = 4 * Math.PI * (edsDL(z) * mpcCm * 1e-2) ** 2 * s * 1e-29 / (1 + z) * (1.4 / ((1 + z) * 3)) ** alpha;
    expectRelative(num("LUMINOSITY_REST", s, z, alpha, 3, 1.4, "EDS", "", "mJy"), lum, 1e-12, "L_ν, EdS closed form");
    const err = num("LUMINOSITY_REST_ERR", s, 0, z, 0, alpha, alphaErr, 3, 1.4, "EDS", "", "mJy");
    expectRelative(err, lum * alphaErr * Math.abs(Math.log(1.4 / ((1 + z) * 3))), 1e-12, "α term");
    // at ν_rest = (1+z) ν_obs the α term vanishes
    expect(num("LUMINOSITY_REST_ERR", s, 0, z, 0, alpha, alphaErr, 3, 3 * (1 + z), "EDS", "", "mJy")).toBeLessThan(1e-12 * lum);
  });

  test("LUMINOSITY_REST_ERR equals first-order propagation through finite differences of LUMINOSITY_REST (rel ≤ 1e-6)", () => {
    const dS = fivePoint((x) => rest(x, z, alpha), s, 1e-3 * s);
    const dZ = fivePoint((x) => rest(s, x, alpha), z, 1e-3);
    const dA = fivePoint((x) => rest(s, z, x), alpha, 1e-3);
    const expected = Math.hypot(dS * sErr, dZ * zErr, dA * alphaErr);
    expectRelative(num("LUMINOSITY_REST_ERR", s, sErr, z, zErr, alpha, alphaErr, 3, 1.4, "", "", "mJy"), expected, 1e-6, "five-point differences");
  });

  test("LUMINOSITY_REST_ERR agrees with the spread of 10⁵ Monte Carlo draws (within 2%)", () => {
    const draw = normal(seededRandom(17));
    const values: number[] = [];
    for (let i = 0; i < 100_000; i++) values.push(rest(s + sErr * draw(), z + zErr * draw(), alpha + alphaErr * draw()));
    const err = num("LUMINOSITY_REST_ERR", s, sErr, z, zErr, alpha, alphaErr, 3, 1.4, "", "", "mJy");
    expectRelative(standardDeviation(values), err, 0.02, "Monte Carlo");
  });

  test("the rest-frame error is not the observed-frequency one: LUMINOSITY_NU_ERR misses the band's α term", () => {
    const nu = num("LUMINOSITY_NU_ERR", s, 0, z, 0, alpha, alphaErr, "", "mJy") / num("LUMINOSITY_NU", s, z, alpha, "", "mJy");
    const restErr = num("LUMINOSITY_REST_ERR", s, 0, z, 0, alpha, alphaErr, 3, 1.4, "", "", "mJy") / rest(s, z, alpha);
    expectRelative(nu, alphaErr * Math.log1p(z), 1e-12, "σ_α ln(1+z), the L_ν at ν_obs convention");
    expectRelative(restErr, alphaErr * Math.abs(Math.log(1.4 / (3 * (1 + z)))), 1e-12, "σ_α |ln(ν_rest/((1+z)ν_obs))|");
  });

  // z = 4, α = 1, σ_z = 0.05 (the case the issue reproduced)
  const absMag = (zz: number) => num("MAG_ABS", 24, zz, num("KCORRECTION", zz, 1));

  test("MAG_ABS_ERR with alpha: the z term is |d(μ + K)/dz| σ_z, from finite differences of MAG_ABS with K = KCORRECTION (rel ≤ 1e-6)", () => {
    const expected = Math.abs(fivePoint(absMag, 4, 1e-3)) * 0.05;
    const withAlpha = num("MAG_ABS_ERR", 0, 4, 0.05, "", "", 1);
    expectRelative(withAlpha, expected, 1e-6, "five-point difference of M(z)");
    // without alpha K is fixed: |dμ/dz| σ_z, three times larger here
    const muSlope = Math.abs(fivePoint((zz) => num("MODULUS", zz), 4, 1e-3)) * 0.05;
    expectRelative(num("MAG_ABS_ERR", 0, 4, 0.05), muSlope, 1e-6, "|dμ/dz| σ_z");
    expect(muSlope / withAlpha).toBeGreaterThan(2.5);
  });

  test("MAG_ABS_ERR with alpha agrees with 10⁵ Monte Carlo draws of m and z (within 2%)", () => {
    const draw = normal(seededRandom(5));
    const values: number[] = [];
    for (let i = 0; i < 100_000; i++) values.push(absMag(4 + 0.05 * draw()) - 0.02 * draw());
    expectRelative(standardDeviation(values), num("MAG_ABS_ERR", 0.02, 4, 0.05, "", "", 1), 0.02, "Monte Carlo");
  });

  test.each([
    // arguments of MAG_ABS_ERR              | the flagged argument
    [[99, 1, 0.01],                          "m_err"],
    [[-99, 1, 0.01],                         "m_err"],
    [[50, 1, 0.01],                          "m_err"],
    [[0.05, 1, 0.01, 99],                    "kcorr_err"],
  ])("an error of ±99 (|err| ≥ 50 mag) is the catalogue's missing-value flag, #N/A: %j", (args, arg) => {
    const cell = failure("MAG_ABS_ERR", ...args);
    expect(cell.kind).toBe("na");
    expect(cell.message).toMatch(new RegExp(`^ZC\\.MAG_ABS_ERR: ${arg} = -?\\d+ is a catalogue's missing-value flag`));
  });
});

describe("defaults that follow the trade", () => {
  const p18cmb = new SlowCosmology(publishedModels["P18-CMB"]);
  const p18bao = new SlowCosmology(publishedModels["P18-BAO"]);

  test("=ZC.LUMINOSITY(1e-16, 1.3) reads erg/s/cm2 and gives erg/s (4π D_L² F in cgs, slow path under P18-CMB)", () => {
    const expected = 4 * Math.PI * (p18cmb.luminosityDistanceMpc(1.3) * mpcCm) ** 2 * 1e-16;
    expectRelative(num("LUMINOSITY", 1e-16, 1.3), expected, 1e-9, "erg/s");
    expect(expected).toBeGreaterThan(1e42); // the order of magnitude a user expects, not 1e38 (W from W/m2)
    expectRelative(num("FLUX", expected, 1.3), 1e-16, 1e-12, "FLUX inverts it, erg/s in, erg/s/cm2 out");
  });

  test("MAG_BOL reads erg/s and LUM_BOL gives erg/s: M_bol = −2.5 log10(L / 3.0128e35 erg/s) (IAU 2015 Resolution B2)", () => {
    expect(Math.abs(num("MAG_BOL", 3.0128e35))).toBeLessThan(1e-12);
    expectRelative(num("LUM_BOL", -5), 3.0128e35 * 100, 1e-12, "5 mag = ×100");
  });

  test("every volume is in Mpc3 by default: VOLUME, VOLUME_SHELL, VOLUME_MAX and REDSHIFT(…, \"VOLUME\") (EdS closed form)", () => {
    const v = (zz: number) => (4 * Math.PI / 3) * edsDM(zz) ** 3; // flat: Hogg 1999 eq. 29
    expectRelative(num("VOLUME", 1, "EDS"), v(1), 1e-12, "VOLUME");
    expectRelative(num("VOLUME_SHELL", 0.5, 1, "", "EDS"), v(1) - v(0.5), 1e-12, "VOLUME_SHELL");
    expectRelative(num("VOLUME_MAX", 3, 0.5, 1, 100, "", "EDS"), (v(1) - v(0.5)) * 100 * deg2Sr / (4 * Math.PI), 1e-12, "VOLUME_MAX");
    expectRelative(num("REDSHIFT", v(1), "VOLUME", "EDS"), 1, 1e-10, "REDSHIFT of a volume in Mpc3");
  });

  test("VOLUME_MAX needs the area: left out it is #VALUE!, a blank cell gives a blank, never the whole sky (412× a 100 deg² survey)", () => {
    const cell = failure("VOLUME_MAX", 3, 0.5, 1, null); // Excel passes null for an omitted argument
    expect(cell.kind).toBe("value");
    expect(cell.message).toBe("ZC.VOLUME_MAX: area is required");
    expect(one("VOLUME_MAX", 3, 0.5, 1, "")).toBe(""); // an empty cell: a blank result, as for every value
    // the factor a blank used to hide: 4π sr = 41,252.96 deg² (common practice)
    expectRelative(num("VOLUME_SHELL", 0.5, 1, "") / num("VOLUME_SHELL", 0.5, 1, 100), 41252.96124941928 / 100, 1e-12, "whole sky / 100 deg²");
  });

  test("VOLUME_MAX runs from max(z_lo, z_min) to min(z_max, z_hi): the bright limit z_min (EdS closed form)", () => {
    const v = (zz: number) => (4 * Math.PI / 3) * edsDM(zz) ** 3;
    const sky = 100 * deg2Sr / (4 * Math.PI);
    expectRelative(num("VOLUME_MAX", 2, 0.1, 1, 100, 0.5, "EDS"), (v(1) - v(0.5)) * sky, 1e-12, "z_min inside the sample");
    expectRelative(num("VOLUME_MAX", 0.8, 0.1, 1, 100, 0.05, "EDS"), (v(0.8) - v(0.1)) * sky, 1e-12, "z_min below z_lo changes nothing");
    expect(num("VOLUME_MAX", 0.4, 0.1, 1, 100, 0.5, "EDS")).toBe(0); // z_min above z_max: never in the sample
  });

  test("the default model is P18-CMB (Planck 2018 VI Table 2, CMB + lensing), not P18-BAO: D_L(1) 0.1–0.3% apart", () => {
    const dl = num("DIST_LUM", 1);
    expectRelative(dl, p18cmb.luminosityDistanceMpc(1), 1e-9, "slow path, P18-CMB");
    const apart = Math.abs(dl / p18bao.luminosityDistanceMpc(1) - 1);
    expect(apart).toBeGreaterThan(1e-3);
    expect(apart).toBeLessThan(3e-3);
    expect(num("PARAM", "H0")).toBe(67.36);
    expect(num("OMEGA", "matter", 0)).toBe(0.3153);
  });

  test("OMEGA(\"cold\") is CDM + baryons, the matter of PARAM(\"z_eq\"); OMEGA(\"matter\") counts massive ν at every z", () => {
    // massless ν only: at z_eq cold matter equals radiation (photons + all ν), so each is ½ (dark energy ~1e-11)
    const zEqMassless = num("PARAM", "z_eq", "P18-CMB; mnu=0");
    expectRelative(num("OMEGA", "cold", zEqMassless, "P18-CMB; mnu=0"), 0.5, 1e-9, "½ at equality");
    // one 0.06 eV ν: still ½ for cold matter, while "matter" adds the still-relativistic ν (0.568 in the review)
    const zEq = num("PARAM", "z_eq");
    expectRelative(num("OMEGA", "cold", zEq), 0.5, 1e-4, "½ at equality, massive ν nearly massless there");
    expect(num("OMEGA", "matter", zEq)).toBeGreaterThan(0.56);
    // today: cold = Om − Ω_ν, Ω_ν h² = Σm_ν / 93.14 eV (common practice, to ~1%)
    expectRelative(0.3153 - num("OMEGA", "cold", 0), 0.06 / 93.14 / 0.6736 ** 2, 0.01, "Ω_ν today");
  });
});

describe("units and arguments that refuse a likely mistake", () => {
  test.each([
    // function and arguments                            | message
    [["VOLUME", 1, "", "mpc3"],                            'ZC.VOLUME: unit: "mpc3" would be milliparsecs (units are case-sensitive): did you mean Mpc3?'],
    [["LOOKBACK", 1, "", "myr"],                           'ZC.LOOKBACK: unit: "myr" would be milliyears (units are case-sensitive): did you mean Myr?'],
    [["LUMINOSITY", 1e-16, 1, "", "ergs/s/cm2"],          'ZC.LUMINOSITY: flux_unit: unknown unit "ergs" in "ergs/s/cm2": did you mean erg/s/cm2?'],
    [["LUMINOSITY", 1e-16, 1, "", "erg/s/cm2", "L_sun"],  'ZC.LUMINOSITY: lum_unit: unknown unit "L" in "L_sun": did you mean Lsun or solLum?'],
    [["LUMINOSITY_NU", 5, 1, -0.7, "", "MJy"],             'ZC.LUMINOSITY_NU: in_unit: "MJy" is megajansky (10⁹ mJy), not a likely flux density for a source: did you mean mJy? (units are case-sensitive)'],
    [["LUMINOSITY", 1e-16, 1, "erg/s/cm2", "Lsun"],       'ZC.LUMINOSITY: model: "erg/s/cm2" is a unit, not a model: units come after the model; leave the model blank for the workbook\'s model (two commas: …, , "erg/s/cm2")'],
    [["DIST_LUM", 1, "", "P18-CMB"],                       'ZC.DIST_LUM: unit: "P18-CMB" is a model, not a unit: the model comes before the units (check the order of the arguments)'],
  ])("%j is #VALUE!: %s", (call, message) => {
    const [name, ...args] = call as [string, ...unknown[]];
    const cell = failure(name, ...args);
    expect(cell.kind).toBe("value");
    expect(cell.message).toBe(message);
  });

  test("mJy and MJy/sr still pass where they belong", () => {
    expectRelative(num("LUMINOSITY_NU", 5, 1, -0.7, "", "mJy"), num("LUMINOSITY_NU", 0.005, 1, -0.7), 1e-14, "1 mJy = 1e-3 Jy (common practice)");
    expectRelative(num("CONVERT", 1, "MJy/sr", "Jy/sr"), 1e6, 1e-15, "MJy/sr, an infrared surface brightness");
  });

  test.each([
    // spec           | message fragment
    ["H0=70; Om=30",  "Om = 30: a density parameter is a fraction (30 → 0.3)"],
    ["P18-CMB; OL=70", "OL = 70: a density parameter is a fraction (70 → 0.7)"],
    ["P18-CMB; Ob=5.5", "Ob = 5.5: a density parameter is a fraction"],
  ])("a density parameter typed as a percentage (%s) is #NUM!", (spec, message) => {
    const cell = failure("AGE", 0, spec);
    expect(cell.kind).toBe("num");
    expect(cell.message).toContain(message);
  });

  test.each([
    // value | convention | α of S_ν ∝ ν^α (from the definitions: common practice)
    [1.9,    "photon",    -0.9],   // N(E) ∝ E^−Γ ⇒ E N(E) ∝ E^(1−Γ)
    [2,      "photon",    -1],     // flat in ν S_ν
    [-1,     "lambda",    -1],     // f_λ ∝ λ^−1 ⇒ f_ν ∝ ν^(−2+1)
    [-2,     "lambda",    0],      // f_λ ∝ λ^−2 is flat in f_ν
    [0.7,    "radio",     -0.7],   // S_ν ∝ ν^−0.7
    [0.7,    "RADIO",     -0.7],   // words in any case
    [-0.5,   "radio",     0.5],    // a negative radio index is negated too: S_ν ∝ ν^+0.5, a rising (inverted) spectrum
  ])("SPECTRAL_INDEX(%d, %s) = %d", (value, convention, alpha) => {
    expectRelative(num("SPECTRAL_INDEX", value, convention), alpha, 1e-15, "α");
  });

  test("an X-ray K-correction with the photon index: K = −2.5 (1 + 1 − Γ) log10(1+z) (power-law K, Hogg et al. 2002 eq. 13)", () => {
    const gamma = 1.9;
    expectRelative(num("KCORRECTION", 1, num("SPECTRAL_INDEX", gamma, "photon")), -2.5 * (2 - gamma) * Math.log10(2), 1e-14, "K at z = 1");
    expect(failure("SPECTRAL_INDEX", 1.9, "gamma").message).toBe('ZC.SPECTRAL_INDEX: convention: "gamma" is not one of photon, lambda, radio');
  });
});

describe("spectral-index conventions in the core", () => {
  test("an unknown convention or a value that is no number is refused, naming it", async () => {
    const { spectralIndexAlpha } = await import("../core/index.js");
    expect(() => spectralIndexAlpha(1, "gamma" as never)).toThrow('unknown convention "gamma": use photon, lambda or radio');
    expect(() => spectralIndexAlpha(Number.NaN, "photon")).toThrow(/^value must be a number/);
    expect(() => spectralIndexAlpha(Number.POSITIVE_INFINITY, "radio")).toThrow(/^value must be finite/);
  });
});
