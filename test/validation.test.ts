/** Every invalid parameter and argument is rejected with a message that names it. */
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { Cosmology } from "../core/distances/Cosmology.js";
import { absoluteMagnitude, fluxWm2, luminosityW } from "../core/observables/photometry.js";
import { NoSolutionError } from "../core/checks/NoSolutionError.js";
import { maxVolumeMpc3 } from "../core/observables/fluxLimit.js";
import { describeModel } from "../functions/describeModel.js";
import { freshModel, relativeError } from "./helpers.js";

const ok = { H0: 70, Om: 0.3, w0: -1, wa: 0, Tcmb: 2.7255, Neff: 3.046, mnu: [] as number[] };

describe("model parameters outside their domain", () => {
  test.each([
    // change                         message
    [{ H0: 0 },                       /H0 must be a positive number km\/s\/Mpc; got 0/],
    [{ H0: Number.NaN },              /H0 must be/],
    [{ Om: -0.1 },                    /Om must be ≥ 0/],
    [{ OL: Number.POSITIVE_INFINITY }, /OL must be a finite number/],
    [{ OL: 0.7, Ok: 0 },              /OL or Ok, not both/],
    [{ Ob: 0.5 },                     /Ob must be between 0 and Om/],
    [{ w0: Number.NaN },              /w0 must be a finite number/],
    [{ wa: Number.NEGATIVE_INFINITY }, /wa must be a finite number/],
    [{ Tcmb: -1 },                    /Tcmb must be ≥ 0 K/],
    [{ Neff: -3 },                    /Neff must be ≥ 0/],
    [{ mnu: [-0.1] },                 /mnu must be ≥ 0 eV/],
    [{ mnu: [0.1, 0.1, 0.1, 0.1] },   /at most three masses/],
    [{ Tcmb: 0, mnu: [0.06] },        /mnu > 0 needs Tcmb > 0/],
    [{ Om: 0.0001, mnu: [1] },        /Om = 0.0001 is below the massive-neutrino density/],
    [{ Om: 0, OL: 2 },                /no big bang: H²\(z\) ≤ 0 at z = 0\.414/],
    [{ Om: 0.3, OL: 0.7, w0: 1, wa: 0, Tcmb: 0, OLneg: true }, /no big bang/],
  ])("%j", (change, message) => {
    const p: Record<string, unknown> = { ...ok, ...change };
    if (p.OLneg) {
      // dark energy with negative density and w = 1 dominates at high z: E² → −∞
      p.OL = -0.5;
      delete p.OLneg;
    }
    expect(() => new Cosmology(p as never)).toThrow(RangeError);
    expect(() => new Cosmology(p as never)).toThrow(message);
  });

  // Each message whole (anchored), so that a wrong value, unit, hint or bound in it fails.
  test.each([
    // change                         whole message
    [{ H0: 0.7 },                     "H0 = 0.7 km/s/Mpc is outside 10 … 1000 km/s/Mpc (H0 is in km/s/Mpc: h = 0.7 is H0=70)"],
    [{ H0: 9.99 },                    "H0 = 9.99 km/s/Mpc is outside 10 … 1000 km/s/Mpc (H0 is in km/s/Mpc: h = 9.99 is H0=999)"],
    [{ H0: 1000.5 },                  "H0 = 1000.5 km/s/Mpc is outside 10 … 1000 km/s/Mpc"],
    [{ Om: 30 },                      "Om = 30: a density parameter is a fraction (30 → 0.3), |Om| ≤ 5"],
    [{ OL: -70 },                     "OL = -70: a density parameter is a fraction (-70 → -0.7), |OL| ≤ 5"],
    [{ Ok: Number.NaN },              "Ok must be a finite number; got NaN"],
    [{ H0: 0 },                       "H0 must be a positive number km/s/Mpc; got 0"],
    [{ H0: Number.NaN },              "H0 must be a positive number km/s/Mpc; got NaN"],
    [{ Om: -0.1 },                    "Om must be ≥ 0; got -0.1"],
    [{ OL: Number.POSITIVE_INFINITY }, "OL must be a finite number; got Infinity"],
    [{ w0: Number.NaN },              "w0 must be a finite number; got NaN"],
    [{ wa: Number.NEGATIVE_INFINITY }, "wa must be a finite number; got -Infinity"],
    [{ Tcmb: -1 },                    "Tcmb must be ≥ 0 K; got -1"],
    [{ Ob: -0.01 },                   "Ob must be between 0 and Om (Om = 0.3); got -0.01"],
    [{ Neff: -0.5 },                  "Neff must be ≥ 0; got -0.5"],
    [{ mnu: [0.1, -0.2] },            "mnu must be ≥ 0 eV; got -0.2"],
  ])("%j: the whole message", (change, message) => {
    expect(() => new Cosmology({ ...ok, ...change } as never)).toThrow(new RangeError(message));
  });

  test.each([
    // parameters at the edge of their domain are models (common practice: the bounds are inclusive)
    { H0: 10 }, { H0: 1000 }, { Ob: 0.3 }, { Ob: 0 }, { Neff: 0 }, { mnu: [0, 0, 0] }, { Tcmb: 0, mnu: [0] }, { Om: 5, OL: -4 },
  ])("%j is accepted", (change) => {
    expect(() => new Cosmology({ ...ok, ...change } as never)).not.toThrow();
  });

  test("a bounce beyond the tables (z > 1e8) is refused as the model is made, naming where", () => {
    // E² ⊃ Or (1+z)⁴ − 1e-9 (1+z)^4.5 (w = 0.5): the negative term wins once (1+z)^½ > Or/1e-9 ≈ 9e4,
    // near z ≈ 7.3e9, past the tables; the check beyond them bisects to where E² = 0
    const call = () => new Cosmology({ ...ok, Om: 0.3, OL: -1e-9, w0: 0.5 });
    expect(call).toThrow(/^no big bang: H²\(z\) ≤ 0 at z = 7\d{9} \(the model bounces\)/);
  });

  test("a negative term that wins only as z → ∞ is refused too ('at very high z')", () => {
    // −1e-6 (1+z)^4.02 against Or (1+z)⁴ ≈ 9e-5 (1+z)⁴: the ratio reaches 1 only at (1+z)^0.02 ≈ 90,
    // z ≈ 1e98, beyond every redshift checked; the leading term of E² is negative
    expect(() => new Cosmology({ ...ok, Om: 0.3, OL: -1e-6, w0: 0.34 })).toThrow(
      "no big bang: H²(z) ≤ 0 at very high z (the model bounces); check Om, OL/Ok, w0, wa",
    );
  });

  test("the closed-Λ bounce redshift in the message is where E² = 0 (Om = 0, OL = 2: (1+z)² = 2)", () => {
    // E² = −(1+z)² + 2 (Ok = −1) vanishes at z = √2 − 1 (closed form)
    expect(() => new Cosmology({ ...ok, Tcmb: 0, Om: 0, OL: 2 })).toThrow(`z = ${Number((Math.SQRT2 - 1).toPrecision(4))}`);
  });
});

describe("an OL the model works out (OL not given) is never negative by the numbers typed", () => {
  // Our rule: without OL, OL = 1 − Om − Ok − Or (Ok = 0 when flat); Om + Ok > 1 is refused as a slip.
  // Or = 8.538e-5 here (H0 = 70, Tcmb = 2.7255 K, Neff = 3.046, massless ν), so OL is 1 − Om − Ok − 8.538e-5.
  test.each([
    // change                     whole message (our own)
    [{ Om: 3 },                   "Om = 3 makes OL = -2 to stay flat: give OL explicitly if you mean it; 0.3?"],
    [{ Om: 1.2 },                 "Om = 1.2 makes OL = -0.2001 to stay flat: give OL explicitly if you mean it; 0.12?"],
    [{ Om: 1.2, Tcmb: 0 },        "Om = 1.2 makes OL = -0.2 to stay flat: give OL explicitly if you mean it; 0.12?"],
    [{ Om: 0.3, Ok: 0.8 },        "Om = 0.3 and Ok = 0.8 make OL = -0.1001 (1 − Om − Ok − Or): give OL explicitly if you mean it"],
    [{ Om: 3, Ok: -1.5 },         "Om = 3 and Ok = -1.5 make OL = -0.5001 (1 − Om − Ok − Or): give OL explicitly if you mean it; Om = 0.3?"],
    [{ Om: 1.2, mnu: [0.06] },    "Om = 1.2 makes OL = -0.2001 to stay flat: give OL explicitly if you mean it; 0.12?"],
  ])("%j: the whole message", (change, message) => {
    expect(() => new Cosmology({ ...ok, ...change })).toThrow(new RangeError(message));
  });

  test.each([
    // the same numbers, or radiation alone below zero, are models
    { Om: 3, OL: -2 }, { Om: 1.2, OL: -0.2 }, { Om: 0.3, OL: -0.1 }, { Om: 1 }, { Om: 0.7, Ok: 0.3 }, { Om: 1, mnu: [0.06] },
  ])("%j is a model", (change) => {
    const m = new Cosmology({ ...ok, ...change });
    if (!("OL" in change)) expect(m.OL).toBeCloseTo(-m.Or, 15); // OL = −Or: radiation alone
  });

  test("refused exactly when Om + Ok > 1 + 1e-12 without OL; never when that same OL is given (500 random models)", () => {
    const ourMessage = /^Om = .* makes? OL = .*: give OL explicitly if you mean it/;
    const why = (make: () => unknown): string | undefined => {
      try {
        make();
        return undefined;
      } catch (e) {
        return (e as Error).message;
      }
    };
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 5, noNaN: true }),
        fc.option(fc.double({ min: -2, max: 2, noNaN: true }), { nil: undefined }),
        fc.constantFrom(0, 2.7255),
        (Om, Ok, Tcmb) => {
          const p = { ...ok, Om, Tcmb, ...(Ok === undefined ? {} : { Ok }) };
          const inferred = why(() => new Cosmology(p));
          expect(ourMessage.test(inferred ?? ""), `${JSON.stringify(p)}: ${inferred}`).toBe(Om + (Ok ?? 0) > 1 + 1e-12);
          const stated = new Cosmology({ ...ok, Om: 0.3, Tcmb }).Or; // Or depends on H0 and Tcmb only
          const given = { ...ok, Om, Tcmb, OL: 1 - Om - (Ok ?? 0) - stated };
          expect(why(() => new Cosmology(given)) ?? "").not.toMatch(ourMessage);
        },
      ),
      { numRuns: 500, seed: 20261203 },
    );
  });
});

describe("an OL or Ok that is only the rounding of the others' sum is 0 (|value| < 1e-12 when worked out)", () => {
  // Om + Ok = 1 read from decimal text is not exactly 1 in binary (2.2 + (−1.2) = 1.0000000000000002):
  // the OL worked out is rounding noise, not a negative dark energy, and the model is matter only.
  // Every thousandth in the full suite; every 16th under the mutation tests (vitest.mutation.config.ts
  // sets ZCELL_MUTATION), where 4,000 models a test, instrumented, outlast the test timeout.
  const step = process.env.ZCELL_MUTATION ? 16 : 1;
  const thousandths = (from: number, to: number) =>
    Array.from({ length: Math.floor((to - from) / step) + 1 }, (_, i) => (from + i * step) / 1000);

  test("every closed matter-only model on a grid of thousandths (Om = 1.001 … 5, Ok = 1 − Om, no radiation) is a model with OL = 0", () => {
    const refused: number[] = [];
    const notMatterOnly: number[] = [];
    const grid = thousandths(1001, 5000);
    for (const Om of grid) {
      const Ok = Number((1 - Om).toFixed(3)); // what a person types, e.g. -1.2
      let m: Cosmology;
      try {
        m = new Cosmology({ ...ok, Tcmb: 0, Om, Ok });
      } catch {
        refused.push(Om);
        continue;
      }
      if (!(m.OL === 0 && m.Ok === Ok)) notMatterOnly.push(Om);
    }
    console.log(`closed matter-only grid: ${refused.length} of ${grid.length} refused, ${notMatterOnly.length} with OL ≠ 0`);
    expect(notMatterOnly).toEqual([]);
    expect(refused).toEqual([]);
  });

  test("every flat model given as Om and OL = 1 − Om on a grid of thousandths (no radiation) has Ok = 0", () => {
    for (const Om of thousandths(0, 5000)) {
      const OL = Number((1 - Om).toFixed(3));
      expect(new Cosmology({ ...ok, Tcmb: 0, Om, OL }).Ok, `Om = ${Om}, OL = ${OL}`).toBe(0);
    }
  });

  test.each([
    // spec                         | geometry and contents in words
    ["H0=70; Om=1.2; Ok=-0.2",        "closed: matter only; H0 = 70 km/s/Mpc; Om = 1.2 (matter); OL = 0; Ok = -0.2;"],
    ["H0=70; Om=2.2; Ok=-1.2",        "closed: matter only; H0 = 70 km/s/Mpc; Om = 2.2 (matter); OL = 0; Ok = -1.2;"],
    ["H0=70; Om=0.7; OL=0.3",         "flat: matter + Λ; H0 = 70 km/s/Mpc; Om = 0.7 (matter); OL = 0.3; Ok = 0;"],
  ])("ZC.DESCRIBE of %s says %s", (spec, words) => {
    expect(describeModel(Cosmology.fromSpec(spec))).toContain(`${spec}: ${words}`);
  });

  test('"H0=70; Om=2.2; Ok=-1.2" has the luminosity distance of the Mattig relation (Λ = 0, no radiation)', () => {
    // D_L = 2 D_H z (s + Om − 1) / (Om (s + 1)), s = √(1 + Om z) (Mattig 1958; Hogg 1999 eq. 16 ff., as test/closedForms.test.ts)
    const m = Cosmology.fromSpec("H0=70; Om=2.2; Ok=-1.2");
    for (const z of [0.1, 1, 3]) {
      const s = Math.sqrt(1 + 2.2 * z);
      expect(relativeError(m.luminosityDistanceMpc(z), (2 * m.hubbleDistanceMpc * z * (s + 2.2 - 1)) / (2.2 * (s + 1))), `z = ${z}`).toBeLessThan(1e-10); // the accuracy zcell states (ZC.VERSION)
    }
  });

  test("just past the tolerance is still refused: Om + Ok = 1 + 1e-9 without radiation", () => {
    expect(() => new Cosmology({ ...ok, Tcmb: 0, Om: 2 + 1e-9, Ok: -1 })).toThrow(/^Om = 2\.000000001 and Ok = -1 make OL = -1e-9 /);
  });
});

describe("arguments outside their domain", () => {
  const m = freshModel(() => new Cosmology(ok));
  test("the edges of each domain are accepted: z2 = z1, area 0 and 4π, angle 0 and π, size 0", () => {
    expect(m.angularDiameterDistanceBetweenMpc(1, 1)).toBe(0);
    expect(m.comovingVolumeShellMpc3(1, 1)).toBe(0);
    expect(m.comovingVolumeShellMpc3(0, 1, 0)).toBe(0);
    expect(m.comovingVolumeShellMpc3(0, 1, 4 * Math.PI)).toBe(m.comovingVolumeMpc3(1));
    expect(m.properSizeMpc(0, 1)).toBe(0);
    expect(m.properSizeMpc(Math.PI, 1)).toBe(Math.PI * m.angularDiameterDistanceMpc(1));
    expect(m.angleRad(0, 1)).toBe(0);
    expect(m.angleRad(0, 0)).toBe(0); // no size subtends no angle, even at D_A = 0
    // θ = π exactly is the largest angle a size can subtend (small-angle relation θ = ℓ/D_A)
    const da = m.angularDiameterDistanceMpc(1);
    expect(m.angleRad(Math.PI * da, 1)).toBe(Math.PI);
    expect(() => m.angleRad(1, 0)).toThrow(new RangeError("z = 0 puts the source at zero distance: give z > 0"));
    expect(() => m.angleRad(4 * da, 1)).toThrow(new RangeError(`size = ${Number((4 * da).toPrecision(6))} Mpc at z = 1 would subtend more than 180°: at most ${Number((Math.PI * da).toPrecision(6))} Mpc (π D_A) there`));
  });

  test.each([
    // call                                                  error       message
    [() => m.luminosityDistanceMpc(-0.5),                   RangeError, /blueshifted source needs a redshift-independent distance/],
    [() => m.comovingDistanceMpc(Number.NaN),               TypeError,  /z must be a number/],
    [() => m.ageGyr(Number.POSITIVE_INFINITY),              RangeError, /z must be finite/],
    [() => m.angularDiameterDistanceBetweenMpc(2, 1),       RangeError, /z2 = 1 is below z1 = 2/],
    [() => m.angularDiameterDistanceBetweenMpc(-1, 2),      RangeError, /^z1 = -1 is negative/],
    [() => m.angularDiameterDistanceBetweenMpc(1, Number.NaN), TypeError, /^z2 must be a number/],
    [() => m.comovingVolumeShellMpc3(-1, 2),                RangeError, /^z1 = -1 is negative/],
    [() => m.comovingVolumeShellMpc3(1, Number.NaN),        TypeError,  /^z2 must be a number/],
    [() => m.comovingVolumeShellMpc3(0, 1, 20),             RangeError, /area = 20 sr/],
    [() => m.comovingVolumeShellMpc3(2, 1),                 RangeError, /^z2 = 1 is below z1 = 2$/],
    [() => m.angleRad(-1, 1),                               RangeError, /^size = -1 must be ≥ 0 and finite$/],
    [() => m.angleRad(Number.POSITIVE_INFINITY, 1),         RangeError, /^size = Infinity must be ≥ 0 and finite$/],
    [() => m.properSizeMpc(4, 1),                           RangeError, /angle = 4 rad/],
    [() => m.angleRad(1e6, 1),                              RangeError, /more than 180°/],
    [() => luminosityW(m, -1, 1),                           RangeError, /flux = -1 W\/m2/],
    [() => fluxWm2(m, 1, 0),                                RangeError, /z = 0 puts the source at zero distance/],
    [() => absoluteMagnitude(m, 20, 0),                     RangeError, /zero distance/],
    [() => m.densityParameter("x" as never, 0),             TypeError,  /unknown component "x"/],
    [() => m.redshiftAt("nope" as never, 1),                TypeError,  /unknown quantity/],
  ])("%#: %s", (call, kind, message) => {
    expect(call).toThrow(kind);
    expect(call).toThrow(message);
  });
});

describe("the inverse: a value no redshift has is refused with the reason", () => {
  // closed Ωm = 0.4, ΩΛ = 0.85, no radiation: Ωk = −0.25, so D_M ≤ D_H/√|Ωk| = (299792.458/70)/0.5 = 8565.5 Mpc (Hogg 1999 eq. 16, sin ≤ 1)
  test.each([
    // model                     | quantity                       | value        | message
    ["H0=70; Om=0.4; OL=0.85",   "transverseComovingDistance",    1e6,           "transverse comoving distance 1000000 Mpc exceeds its maximum in this closed model (8565.5 Mpc)"],
    ["P18-CMB",                  "comovingDistance",              1e6,           "comoving distance 1000000 Mpc lies beyond the particle horizon of this model"],
    ["H0=70; Om=0; OL=0",        "comovingDistance",              2e6,           "comoving distance 2000000 Mpc: this model's integrals do not converge that far back (z > 1e8)"],
    ["P18-CMB",                  "age",                           0,             "age 0 Gyr must be positive"],
    ["P18-CMB",                  "age",                           -1,            "age -1 Gyr is negative: no redshift z ≥ 0 has it"],
    ["P18-CMB",                  "age",                           Number.POSITIVE_INFINITY, "age Infinity Gyr: no finite redshift has it"],
    ["P18-CMB",                  "distanceModulus",               1e5,           "distance modulus 100000 mag: no finite redshift has it"],
    ["EDS",                      "lookbackTime",                  1e4,           "look-back time 10000 Gyr is not below the age of the universe in this model (9.31231 Gyr)"],
  ])("%s: %s = %d", (spec, quantity, value, message) => {
    const call = () => Cosmology.fromSpec(spec).redshiftAt(quantity as never, value);
    expect(call).toThrow(NoSolutionError);
    expect(call).toThrow(message);
  });

  test("a value that is no number is a TypeError", () => {
    expect(() => Cosmology.fromSpec("P18-CMB").redshiftAt("comovingDistance", Number.NaN)).toThrow(new TypeError("value must be a number"));
  });
});

describe("V_max: bounds that cannot be a sample", () => {
  const m = freshModel(() => Cosmology.fromSpec("EDS"));
  test.each([
    // z_max | z_lo | z_hi | area | z_min | message
    [1,       0.5,   0.2,   0.1,   0,      "z_hi = 0.2 is below z_lo = 0.5"],
    [-1,      0.1,   1,     0.1,   0,      "z_max"],
    [1,       -0.1,  1,     0.1,   0,      "z_lo"],
    [1,       0.1,   -1,    0.1,   0,      "z_hi"],
    [1,       0.1,   1,     0.1,   -0.5,   "z_min"],
  ])("VOLUME_MAX(%d, %d, %d, %d, %d) is refused: %s", (zMax, zLo, zHi, area, zMin, message) => {
    expect(() => maxVolumeMpc3(m, zMax, zLo, zHi, area, zMin)).toThrow(RangeError);
    expect(() => maxVolumeMpc3(m, zMax, zLo, zHi, area, zMin)).toThrow(message);
  });

  test("an empty range gives 0, also when it closes exactly (z_min = z_max)", () => {
    expect(maxVolumeMpc3(m, 0.5, 0.1, 1, 0.1, 0.5)).toBe(0);
    expect(maxVolumeMpc3(m, 0.5, 0.5, 1, 0.1)).toBe(0);
  });
});
