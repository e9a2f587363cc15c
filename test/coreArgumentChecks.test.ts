/**
 * Every check in the core's catalogue functions names the argument at fault, in the words the
 * worksheet uses (the adapter prefixes the function's name). Our own messages: the expected text is
 * the whole message or its start, so a check that names the wrong argument, or tests the wrong side
 * of a bound, fails.
 */
import { describe, expect, test } from "vitest";
import { Cosmology } from "../core/distances/Cosmology.js";
import {
  abFluxDensityJy,
  abMagnitude,
  absoluteMagnitude,
  apparentMagnitude,
  bolometricAbsoluteMagnitude,
  bolometricLuminosityW,
  fluxWm2,
  kCorrectionPowerLawMag,
  luminosityW,
  spectralLuminosityWHz,
  spectralSurfaceBrightnessDimmingMag,
} from "../core/observables/photometry.js";
import { surfaceLuminosityLsunPc2, surfaceMagnitude } from "../core/observables/surfaceBrightness.js";
import { hubbleDiagramChi2 } from "../core/observables/hubbleDiagram.js";
import { expectRelative, freshModel } from "./helpers.js";

const eds = freshModel(() => Cosmology.fromSpec("EDS"));
const nan = Number.NaN;
const inf = Number.POSITIVE_INFINITY;

describe("photometry names the argument at fault", () => {
  test.each([
    // call                                                       error        message (start)
    [() => luminosityW(eds, -1, 1),                               RangeError, "flux = -1 W/m2 must be ≥ 0 and finite"],
    [() => fluxWm2(eds, -1, 1),                                   RangeError, "luminosity = -1 W must be ≥ 0 and finite"],
    [() => fluxWm2(eds, nan, 1),                                  TypeError,  "luminosity must be a number"],
    [() => spectralLuminosityWHz(eds, -1, 1, -0.7),               RangeError, "flux density = -1 W/m2/Hz must be ≥ 0 and finite"],
    [() => spectralLuminosityWHz(eds, 1e-29, 1, nan),             TypeError,  "alpha must be a number"],
    [() => kCorrectionPowerLawMag(1, inf),                        RangeError, "alpha must be finite"],
    [() => absoluteMagnitude(eds, nan, 1),                        TypeError,  "m must be a number"],
    [() => absoluteMagnitude(eds, 20, 1, inf),                    RangeError, "kcorr must be finite"],
    [() => apparentMagnitude(eds, nan, 1),                        TypeError,  "M must be a number"],
    [() => apparentMagnitude(eds, -20, 1, nan),                   TypeError,  "kcorr must be a number"],
    [() => abMagnitude(-1),                                       RangeError, "flux density = -1 Jy must be ≥ 0 and finite"],
    [() => abMagnitude(0),                                        RangeError, "flux density 0 has no magnitude (it would be +∞)"],
    [() => abFluxDensityJy(nan),                                  TypeError,  "m_ab must be a number"],
    [() => bolometricAbsoluteMagnitude(-1),                       RangeError, "luminosity = -1 W must be ≥ 0 and finite"],
    [() => bolometricAbsoluteMagnitude(0),                        RangeError, "luminosity 0 has no magnitude"],
    [() => bolometricLuminosityW(nan),                            TypeError,  "M_bol must be a number"],
    [() => spectralSurfaceBrightnessDimmingMag(1, nan),           TypeError,  "alpha must be a number"],
  ])("%#: %s", (call, kind, message) => {
    expect(call).toThrow(kind);
    expect(call).toThrow(message);
  });
});

describe("surface brightness names the argument at fault", () => {
  test.each([
    [() => surfaceLuminosityLsunPc2(nan, 1, 4.65),                TypeError,  "mu must be a number"],
    [() => surfaceLuminosityLsunPc2(24, 1, nan),                  TypeError,  "sun_abs_mag must be a number"],
    [() => surfaceLuminosityLsunPc2(24, 1, 4.65, inf),            RangeError, "kcorr must be finite"],
    [() => surfaceMagnitude(0, 1, 4.65),                          RangeError, "sigma = 0 must be > 0 and finite"],
    [() => surfaceMagnitude(inf, 1, 4.65),                        RangeError, "sigma = Infinity must be > 0 and finite"],
    [() => surfaceMagnitude(1, 1, inf),                           RangeError, "sun_abs_mag must be finite"],
    [() => surfaceMagnitude(1, 1, 4.65, nan),                     TypeError,  "kcorr must be a number"],
  ])("%#: %s", (call, kind, message) => {
    expect(call).toThrow(kind);
    expect(call).toThrow(message);
  });

  test("the smallest positive surface density is accepted", () => {
    expect(Number.isFinite(surfaceMagnitude(Number.MIN_VALUE, 1, 4.65))).toBe(true);
  });
});

describe("the Hubble-diagram χ² names the entry at fault, counting from 0", () => {
  test.each([
    [() => hubbleDiagramChi2(eds, [1, 2], [44], [0.1, 0.1]),      "z, mu and mu_err have 2, 1 and 2 entries"],
    [() => hubbleDiagramChi2(eds, [1, 2], [44, 45], [0.1]),       "z, mu and mu_err have 2, 2 and 1 entries"],
    [() => hubbleDiagramChi2(eds, [1, 2], [44, 45], [0.1, 0]),    "mu_err 1 = 0 must be > 0 and finite"],
    [() => hubbleDiagramChi2(eds, [1], [44], [inf]),              "mu_err 0 = Infinity must be > 0 and finite"],
    [() => hubbleDiagramChi2(eds, [1, 2], [44, nan], [0.1, 0.1]), "mu 1 is not a finite number"],
    [() => hubbleDiagramChi2(eds, [0], [44], [0.1]),              "z 0 = 0 must be > 0 and finite"],
    [() => hubbleDiagramChi2(eds, [inf], [44], [0.1]),            "z 0 = Infinity must be > 0 and finite"],
  ])("%#: %s", (call, message) => {
    expect(call).toThrow(new RangeError(message));
  });

  test("with a free offset, χ² = A − B²/C; with none left to fit (no rows) it is 0", () => {
    // EdS μ(z) = 5 log10(2 D_H (1+z)(1 − (1+z)^−½) / 10 pc) (Hogg 1999 eq. 25 with the EdS D_L);
    // moduli made up for the test at two redshifts, offsets 0.2 and −0.1 from the model
    const mu = (z: number) => 5 * Math.log10(2 * eds.hubbleDistanceMpc * (1 + z - Math.sqrt(1 + z))) + 25;
    const [d1, d2, s1, s2] = [0.2, -0.1, 0.1, 0.2];
    const [w1, w2] = [1 / s1 ** 2, 1 / s2 ** 2];
    const a = d1 * d1 * w1 + d2 * d2 * w2;
    const b = d1 * w1 + d2 * w2;
    const c = w1 + w2;
    expectRelative(hubbleDiagramChi2(eds, [0.5, 2], [mu(0.5) + d1, mu(2) + d2], [s1, s2]), a - (b * b) / c, 1e-9, "free offset");
    expectRelative(hubbleDiagramChi2(eds, [0.5, 2], [mu(0.5) + d1, mu(2) + d2], [s1, s2], 0.05), (d1 - 0.05) ** 2 * w1 + (d2 - 0.05) ** 2 * w2, 1e-9, "fixed offset");
    expect(hubbleDiagramChi2(eds, [], [], [])).toBe(0);
  });
});
