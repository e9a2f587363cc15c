/**
 * Flux limits and the 1/V_max estimator: round trips (the flux at z_max equals the limit), the
 * Einstein–de Sitter closed form, the first crossing where the flux rises again, and a 1/V_max sum
 * over an invented catalogue in ranges against the same sum cell by cell.
 */
import { describe, expect, test } from "vitest";
import { Cosmology, fluxWm2, limitingRedshift, limitingRedshiftMag, maxVolumeMpc3, megaparsecM, NoSolutionError } from "../core/index.js";
import { CellError } from "../functions/cellError.js";
import { definitions } from "../functions/definitions.js";
import { evaluate, type Cell } from "../functions/evaluate.js";
import { expectRelative, freshModel } from "./helpers.js";

const active = { spec: "P18-BAO", stored: false };
const run = (name: string, ...args: unknown[]): Cell[][] => evaluate(definitions[name], args, active);
const one = (name: string, ...args: unknown[]): Cell => run(name, ...args)[0][0];
const p18 = freshModel(() => Cosmology.fromSpec("P18-BAO"));
const closed = freshModel(() => Cosmology.fromSpec("H0=70; Om=0.4; OL=0.85"));

/** S_ν = L_ν (1+z)^(1+α) / (4π D_L²) (Hogg 1999 eqs. 22–23 with a power law), written out again here. */
const fluxAt = (m: Cosmology, lum: number, z: number, alpha: number) =>
  (lum * (1 + z) ** (1 + alpha)) / (4 * Math.PI * (m.luminosityDistanceMpc(z) * megaparsecM) ** 2);

describe("limiting redshift", () => {
  test.each([
    // model     L [W or W/Hz]  limit [W/m2 or W/m2/Hz]  alpha
    ["P18-BAO",  1e38,          1e-16,                   -1],
    ["P18-BAO",  1e36,          1e-13,                   -1],
    ["P18-BAO",  1e25,          1e-29,                   -0.7],
    ["P18-BAO",  1e24,          1e-30,                   0.5],
    ["closed",   1e38,          1e-17,                   -1],
    ["P18-BAO",  1e30,          1e-16,                   -1],   // z_max ≈ 3e-5: below the tables' direct-integral threshold
    ["P18-BAO",  1e22,          1e-29,                   5],    // a steep spectrum: the K-correction fights the distance
  ] as const)("%s: the flux at z_max of L = %d against %d (α = %d) equals the limit to 1e-10", (name, lum, limit, alpha) => {
    const m = name === "closed" ? closed : p18;
    const z = limitingRedshift(m, lum, limit, alpha);
    expectRelative(fluxAt(m, lum, z, alpha), limit, 1e-10, `z_max = ${z}`);
  });

  test.each([
    // model     L [W or W/Hz]  limit      alpha  | most distance evaluations (measured 5–10)
    ["P18-BAO",  1e38,          1e-16,     -1,      12],
    ["P18-BAO",  1e36,          1e-13,     -1,      12],
    ["P18-BAO",  1e25,          1e-29,     -0.7,    12],
    ["P18-BAO",  1e24,          1e-30,     0.5,     12],
    ["closed",   1e38,          1e-17,     -1,      12],
    ["P18-BAO",  1e30,          1e-16,     -1,      12],
    ["P18-BAO",  1e22,          1e-29,     5,       12],
  ] as const)("%s, L = %d against %d (α = %d): the scan starts near z_max and Newton ends it in at most %d distances", (name, lum, limit, alpha, most) => {
    // a cell's cost: scanning up from z = 1e-9 alone takes 30 doublings, bisection about 50 halvings
    let calls = 0;
    const m = name === "closed" ? closed : p18;
    const counting = new Proxy(m, {
      get(target, key) {
        const value = Reflect.get(target, key, target);
        if (key === "luminosityDistanceMpc") return (z: number) => (calls++, target.luminosityDistanceMpc(z));
        return typeof value === "function" ? value.bind(target) : value;
      },
    });
    const z = limitingRedshift(counting, lum, limit, alpha);
    expect(z).toBe(limitingRedshift(m, lum, limit, alpha));
    expect(calls).toBeLessThanOrEqual(most);
  });

  test("bolometric: matches FLUX of the core at z_max", () => {
    const z = limitingRedshift(p18, 3e37, 2e-17);
    expectRelative(fluxWm2(p18, 3e37, z), 2e-17, 1e-10, "FLUX at z_max");
  });

  test.each([
    // L/(4πF) [Mpc²]   source of the expected z
    [1e6,               "Einstein–de Sitter D_L = 2 D_H (1+z − √(1+z)) (Hogg 1999 eqs. 15, 21): with s = √(1+z), s² − s = D/(2D_H)"],
    [1e7,               "the same"],
    [1e8,               "the same"],
  ] as const)("Einstein–de Sitter closed form for L/(4πF) = %d Mpc²", (area, _source) => {
    const eds = Cosmology.fromSpec("EDS");
    const k = Math.sqrt(area) / (2 * eds.hubbleDistanceMpc);
    const s = (1 + Math.sqrt(1 + 4 * k)) / 2;
    const lum = 4 * Math.PI * area * megaparsecM ** 2;
    expectRelative(limitingRedshift(eds, lum, 1), s * s - 1, 1e-10, `area ${area}`);
  });

  test("where the flux density rises again at high z (α = 2), the first crossing is returned", () => {
    const [lum, alpha] = [1e26, 2];
    // the flux density has a minimum; take a limit a little above it
    let minimum = Number.POSITIVE_INFINITY;
    for (let u = 0.01; u < 5; u += 0.01) minimum = Math.min(minimum, fluxAt(p18, lum, Math.expm1(u), alpha));
    const limit = 1.5 * minimum;
    const z = limitingRedshift(p18, lum, limit, alpha);
    expectRelative(fluxAt(p18, lum, z, alpha), limit, 1e-10, "at z_max");
    for (let zz = 0.001; zz < z; zz *= 1.05) expect(fluxAt(p18, lum, zz, alpha)).toBeGreaterThan(limit);
    // and below its minimum the source is never lost: #N/A with the reason
    expect(() => limitingRedshift(p18, lum, 0.5 * minimum, alpha)).toThrow(NoSolutionError);
    const cell = one("REDSHIFT_LIMIT_NU", lum, (0.5 * minimum) / 1e-26, alpha) as CellError;
    expect(cell.kind).toBe("na");
    expect(cell.message).toMatch(/^ZC\.REDSHIFT_LIMIT_NU: the source stays at or above the flux limit out to z = 1e8/);
  });

  test.each([
    // M      m_lim   α      model
    [-21,     17.77,  -1,    "P18-BAO"],
    [-25,     22,     -0.5,  "P18-BAO"],
    [-19,     24,     0.3,   "closed"],
  ] as const)("magnitudes: m(z_max) = M + μ + K of M = %d reaches %d (α = %d) to 1e-10 mag", (absMag, limit, alpha, name) => {
    const m = name === "closed" ? closed : p18;
    const z = limitingRedshiftMag(m, absMag, limit, alpha);
    const k = -2.5 * (1 + alpha) * Math.log10(1 + z); // power-law K-correction (Hogg et al. 2002 eq. 13)
    expect(Math.abs(absMag + m.distanceModulusMag(z) + k - limit)).toBeLessThanOrEqual(1e-10);
  });

  test("bolometric and spectral limits are two functions, each with its own default units", () => {
    // 1 erg/s = 1e-7 W, 1 erg/s/cm2 = 1e-3 W/m2, 1 mJy = 1e-29 W/m2/Hz (common practice)
    expectRelative(one("REDSHIFT_LIMIT", 1e45, 1e-13, "P18-BAO") as number, limitingRedshift(p18, 1e38, 1e-16), 1e-14, "erg/s and erg/s/cm2 by default");
    expectRelative(one("REDSHIFT_LIMIT", 1e38, 1e-16, "P18-BAO", "W", "W/m2") as number, limitingRedshift(p18, 1e38, 1e-16), 1e-14, "SI given");
    expectRelative(one("REDSHIFT_LIMIT_NU", 1e25, 1, -0.7, "P18-BAO", "", "mJy") as number, limitingRedshift(p18, 1e25, 1e-29, -0.7), 1e-14, "mJy");
    expectRelative(one("REDSHIFT_LIMIT_NU", 1e25, 1e-3, -0.7, "P18-BAO") as number, limitingRedshift(p18, 1e25, 1e-29, -0.7), 1e-14, "W/Hz and Jy by default");
    const wrong = one("REDSHIFT_LIMIT_NU", 1e25, 1, -0.7, "P18-BAO", "W") as CellError;
    expect(wrong.message).toBe('ZC.REDSHIFT_LIMIT_NU: lum_unit: cannot convert "W" (a luminosity or power) to "W/Hz" (a spectral luminosity): for a luminosity or power use ZC.REDSHIFT_LIMIT');
    // alpha = −1 typed into the bolometric function is no longer a silent switch: it is a model argument
    const slot = one("REDSHIFT_LIMIT", 1e45, 1e-13, -1) as CellError;
    expect(slot.kind).toBe("value");
  });
});

describe("V_max", () => {
  test("0 below z_lo, the shell to z_max inside, the whole shell beyond z_hi", () => {
    const area = 0.1; // sr
    expect(maxVolumeMpc3(p18, 0.05, 0.1, 1, area)).toBe(0);
    expect(maxVolumeMpc3(p18, 0.5, 0.1, 1, area)).toBe(p18.comovingVolumeShellMpc3(0.1, 0.5, area));
    expect(maxVolumeMpc3(p18, 3, 0.1, 1, area)).toBe(p18.comovingVolumeShellMpc3(0.1, 1, area));
  });

  test("an empty sample range (z_lo = z_hi) has no volume; z_hi below z_lo is refused, naming both", () => {
    expect(maxVolumeMpc3(p18, 2, 0.5, 0.5, 0.1)).toBe(0);
    expect(() => maxVolumeMpc3(p18, 2, 0.5, 0.4, 0.1)).toThrow(/^z_hi = 0.4 is below z_lo = 0.5$/);
  });

  test("a 1/V_max sum over an invented catalogue: ranges equal the same sum cell by cell", () => {
    // invented sources (not real objects): bolometric luminosity [W] and a 2e-17 W/m2 survey over 100 deg², 0.05 < z < 2
    const lums = [3e37, 8e37, 1.5e38, 4e38, 9e38, 2e39, 5e39, 1.2e40].map((l) => [l]);
    const zMax = run("REDSHIFT_LIMIT", lums, 2e-17, "", "W", "W/m2");
    const vMax = run("VOLUME_MAX", zMax, 0.05, 2, 100);
    let byCells = 0;
    lums.forEach(([lum], r) => {
      const zm = one("REDSHIFT_LIMIT", lum, 2e-17, "", "W", "W/m2") as number;
      expect(zMax[r][0]).toBe(zm);
      const v = one("VOLUME_MAX", zm, 0.05, 2, 100) as number;
      expect(vMax[r][0]).toBe(v);
      byCells += 1 / v;
    });
    const byRanges = vMax.reduce((s, [v]) => s + 1 / (v as number), 0);
    expect(byRanges).toBe(byCells);
    // and against the core: V of a shell over 100 deg² (deg² = (π/180)² sr)
    const sr = 100 * (Math.PI / 180) ** 2;
    expectRelative(vMax[0][0] as number, maxVolumeMpc3(p18, zMax[0][0] as number, 0.05, 2, sr), 1e-14, "first source");
  });
});

test("a source that never fades below a magnitude limit is #N/A with the reason", () => {
  // α = 3: the K-correction brightens as (1+z)⁴ while D_L² grows only as (1+z)² at high z
  const cell = one("REDSHIFT_LIMIT_MAG", -30, 30, 3) as CellError;
  expect([cell.kind, cell.message]).toEqual(["na", "ZC.REDSHIFT_LIMIT_MAG: the source stays at or brighter than the magnitude limit out to z = 1e8, where this model's tables end"]);
});

describe("limits refuse arguments outside their domain, naming them", () => {
  test.each([
    // call                                                     | message starts with
    [() => limitingRedshift(p18, -1, 1e-16),                    /^luminosity = -1 must be > 0/],
    [() => limitingRedshift(p18, 1e38, 0),                      /^flux limit = 0 must be > 0/],
    [() => limitingRedshift(p18, 1e38, 1e-16, Number.NaN),      /^alpha must be a number/],
    [() => limitingRedshiftMag(p18, Number.NaN, 20),            /^abs_mag must be a number/],
    [() => limitingRedshiftMag(p18, -20, Number.POSITIVE_INFINITY), /^mag_limit must be finite/],
    [() => limitingRedshiftMag(p18, -20, 20, Number.NaN),       /^alpha must be a number/],
  ])("%#: %s", (call, message) => {
    expect(call).toThrow(message);
  });
});
