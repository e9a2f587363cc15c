/** Every invalid parameter and argument is rejected with a message that names it. */
import { describe, expect, test } from "vitest";
import { Cosmology } from "../core/distances/Cosmology.js";
import { absoluteMagnitude, fluxWm2, luminosityW } from "../core/observables/photometry.js";

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

  test("the closed-Λ bounce redshift in the message is where E² = 0 (Om = 0, OL = 2: (1+z)² = 2)", () => {
    // E² = −(1+z)² + 2 (Ok = −1) vanishes at z = √2 − 1 (closed form)
    expect(() => new Cosmology({ ...ok, Tcmb: 0, Om: 0, OL: 2 })).toThrow(`z = ${Number((Math.SQRT2 - 1).toPrecision(4))}`);
  });
});

describe("arguments outside their domain", () => {
  const m = new Cosmology(ok);
  test.each([
    // call                                                  error       message
    [() => m.luminosityDistanceMpc(-0.5),                   RangeError, /blueshifted source needs a redshift-independent distance/],
    [() => m.comovingDistanceMpc(Number.NaN),               TypeError,  /z must be a number/],
    [() => m.ageGyr(Number.POSITIVE_INFINITY),              RangeError, /z must be finite/],
    [() => m.angularDiameterDistanceBetweenMpc(2, 1),       RangeError, /z2 = 1 is below z1 = 2/],
    [() => m.comovingVolumeShellMpc3(0, 1, 20),             RangeError, /area = 20 sr/],
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
