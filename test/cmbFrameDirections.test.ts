/**
 * CMB-frame redshifts without the reference library at run time: the angle to the dipole apex at fixed
 * ICRS positions (values pasted from python3-astropy), the relativistic Doppler factor at the apex and
 * antapex in closed form, and the round trip heliocentric → CMB frame → heliocentric.
 */
import { describe, expect, test } from "vitest";
import { cmbDipoleSpeedKmPerS, cmbFrameRedshift, cosAngleToCmbApex, speedOfLightKmPerS } from "../core/index.js";
import { expectRelative } from "./helpers.js";

const degree = Math.PI / 180;
const beta = cmbDipoleSpeedKmPerS / speedOfLightKmPerS;
const gamma = 1 / Math.sqrt(1 - beta * beta);
// the apex (l, b) = (264.021°, 48.253°) in ICRS: astropy 5.2.1,
// SkyCoord(l=264.021*u.deg, b=48.253*u.deg, frame="galactic").icrs
const apex = { ra: 167.94190332672108, dec: -6.944259977548061 };
const antapex = { ra: apex.ra - 180, dec: -apex.dec };

describe("the angle between a direction and the CMB dipole apex", () => {
  // astropy's galactic frame is tied to FK5, ours (Hipparcos) to ICRS: ≤ 3e-5° apart (see cmbFrame.test.ts),
  // so cos θ agrees within 1e-6
  test.each([
    // ra [deg]  dec [deg]  cos θ                  source: astropy 5.2.1, np.cos(SkyCoord(ra, dec).separation(apex).rad)
    [10.68,      41.27,     -0.7678594323418148],
    [83.82,      -5.39,     0.11256852486042157],
    [201.37,     -43.02,    0.6881837568956227],
    [0,          0,         -0.9707623762555104],
    [300,        60,        -0.4371905121256816],
    [150,        -80,       0.28305855472922087],
  ])("at (%d°, %d°) cos θ = %d", (ra, dec, cos) => {
    expect(Math.abs(cosAngleToCmbApex(ra * degree, dec * degree) - cos)).toBeLessThanOrEqual(1e-6);
  });

  test("is 1 at the apex and −1 at the antapex (within 1e-9: the astropy apex is FK5-based)", () => {
    expect(Math.abs(cosAngleToCmbApex(apex.ra * degree, apex.dec * degree) - 1)).toBeLessThanOrEqual(1e-9);
    expect(Math.abs(cosAngleToCmbApex(antapex.ra * degree, antapex.dec * degree) + 1)).toBeLessThanOrEqual(1e-9);
  });

  test("a right ascension that is not a finite number is refused by its name", () => {
    // the core's messages (core/checks/numberChecks.ts), pinned as the interface
    expect(() => cosAngleToCmbApex(Number.NaN, 0)).toThrow(new TypeError("ra must be a number"));
    expect(() => cosAngleToCmbApex(Number.POSITIVE_INFINITY, 0)).toThrow(new RangeError("ra must be finite"));
    expect(() => cmbFrameRedshift(0.01, Number.NaN, 0)).toThrow(new TypeError("ra must be a number"));
    expect(() => cmbFrameRedshift(0.01, 0, Number.NaN)).toThrow(new TypeError("dec must be a number"));
  });
});

describe("the CMB-frame redshift", () => {
  test.each([
    // z_helio | where    | expected z_cmb: relativistic Doppler shift, Rybicki & Lightman 1979 eq. 4.12 (from memory)
    [0,          "apex",    Math.sqrt((1 + beta) / (1 - beta)) - 1],
    [0.05,       "apex",    1.05 * Math.sqrt((1 + beta) / (1 - beta)) - 1],
    [0,          "antapex", Math.sqrt((1 - beta) / (1 + beta)) - 1],
    [0.05,       "antapex", 1.05 * Math.sqrt((1 - beta) / (1 + beta)) - 1],
    [2,          "antapex", 3 * Math.sqrt((1 - beta) / (1 + beta)) - 1],
  ] as const)("z_helio = %d at the %s gives (1 + z_helio) · √((1 ± β)/(1 ∓ β)) − 1", (zHelio, where, expected) => {
    const { ra, dec } = where === "apex" ? apex : antapex;
    expectRelative(cmbFrameRedshift(zHelio, ra * degree, dec * degree), expected, 1e-7, `${zHelio} at the ${where}`);
  });

  test.each([
    // ra [deg]  dec [deg]  cos θ (astropy 5.2.1, as above)
    [10.68,      41.27,     -0.7678594323418148],
    [201.37,     -43.02,    0.6881837568956227],
    [300,        60,        -0.4371905121256816],
  ])("at (%d°, %d°) 1 + z_cmb = (1 + z_helio) / (γ (1 − β cos θ)) with cos θ = %d, for z_helio from −0.001 to 3", (ra, dec, cos) => {
    for (const zHelio of [-0.001, 0.003, 0.1, 3]) {
      const expected = (1 + zHelio) / (gamma * (1 - beta * cos)) - 1;
      // a cos θ within 1e-6 moves z by β·1e-6 (1 + z) at most
      expect(Math.abs(cmbFrameRedshift(zHelio, ra * degree, dec * degree) - expected), `z_helio = ${zHelio}`).toBeLessThanOrEqual(2e-9 * (1 + zHelio));
    }
  });

  test("the round trip heliocentric → CMB frame → heliocentric returns z_helio (the inverse: 1 + z_helio = (1 + z_cmb) γ (1 − β cos θ))", () => {
    for (const [ra, dec] of [[0, 0], [83.82, -5.39], [150, -80], [apex.ra, apex.dec]]) {
      const cos = cosAngleToCmbApex(ra * degree, dec * degree);
      for (const zHelio of [-0.002, 0, 0.01, 0.5, 7]) {
        const zCmb = cmbFrameRedshift(zHelio, ra * degree, dec * degree);
        expect(Math.abs((1 + zCmb) * gamma * (1 - beta * cos) - 1 - zHelio), `${ra}, ${dec}, ${zHelio}`).toBeLessThanOrEqual(1e-14 * (1 + zHelio));
      }
    }
  });
});
