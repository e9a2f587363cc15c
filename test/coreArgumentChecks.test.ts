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
import { criticalSurfaceDensityMsunPc2 } from "../core/observables/lensing.js";
import { haloMassMsun, haloOverdensity, haloRadiusMpc } from "../core/observables/halos.js";
import { binnedLuminosityFunction } from "../core/observables/luminosityFunction.js";
import { cmbFrameRedshift, cosAngleToCmbApex } from "../core/observables/cmbFrame.js";
import { galacticCoordinatesRad } from "../core/positions/skyFrames.js";
import { rescaledValue, type RescaleQuantity } from "../core/distances/rescale.js";
import { NoSolutionError } from "../core/checks/NoSolutionError.js";
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
    // a value of another type (a text "1" from a careless caller) is not a number, not merely out of range
    [() => kCorrectionPowerLawMag(1, "1" as never),               TypeError,  "alpha must be a number"],
    [() => fluxWm2(eds, "1" as never, 1),                         TypeError,  "luminosity must be a number"],
    [() => fluxWm2(eds, 1, "1" as never),                         TypeError,  "z must be a number"],
    [() => fluxWm2(eds, inf, 1),                                  RangeError, "luminosity = Infinity W must be ≥ 0 and finite"],
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

describe("lensing, halos, the luminosity function, the CMB frame and rescaling name the argument at fault", () => {
  const deg = Math.PI / 180;
  test.each([
    // call                                                            error        whole message
    [() => criticalSurfaceDensityMsunPc2(eds, nan, 1),                  TypeError,  "z_lens must be a number"],
    [() => criticalSurfaceDensityMsunPc2(eds, 0.5, nan),                TypeError,  "z_source must be a number"],
    [() => criticalSurfaceDensityMsunPc2(eds, 0, 1),                    RangeError, "z_lens = 0: a lens needs z > 0"],
    [() => criticalSurfaceDensityMsunPc2(eds, 0.5, 0.5),                RangeError, "z_source = 0.5 must be above z_lens = 0.5: the source lies behind the lens"],
    [() => haloOverdensity(eds, 0, 200 as unknown as string),           TypeError,  "definition must be text"],
    [() => haloOverdensity(eds, 0, "0c"),                               TypeError,  'unknown halo definition "0c": use vir, 200c, 500c, 200m or any <N>c, <N>m'],
    [() => haloOverdensity(eds, 0, "200c, 500c"),                       TypeError,  'unknown halo definition "200c, 500c": use vir, 200c, 500c, 200m or any <N>c, <N>m'],
    [() => haloRadiusMpc(eds, -1, 0, "200c"),                           RangeError, "mass = -1 must be ≥ 0 and finite"],
    [() => haloMassMsun(eds, -1, 0, "200c"),                            RangeError, "radius = -1 must be ≥ 0 and finite"],
    [() => binnedLuminosityFunction([42], [1e6, 2e6], [42, 43]),        RangeError, "values has 1 entries and v_max 2"],
    [() => binnedLuminosityFunction([42], [1e6], [42]),                 RangeError, "edges needs at least two values (one bin)"],
    [() => binnedLuminosityFunction([42], [1e6], [42, inf]),            RangeError, "edge 1 is not a finite number"],
    [() => binnedLuminosityFunction([42], [1e6], [42, 42]),             RangeError, "edges must increase: edge 1 = 42 is not above 42"],
    [() => binnedLuminosityFunction([42], [0], [42, 43]),               RangeError, "v_max 0 = 0 must be > 0 and finite"],
    [() => binnedLuminosityFunction([42], [inf], [42, 43]),             RangeError, "v_max 0 = Infinity must be > 0 and finite"],
    [() => binnedLuminosityFunction([42, nan], [1e6, 1e6], [42, 43]),   RangeError, "value 1 is not a finite number"],
    [() => galacticCoordinatesRad(nan, 0),                              TypeError,  "ra must be a number"],
    [() => galacticCoordinatesRad(0, nan),                              TypeError,  "dec must be a number"],
    [() => cosAngleToCmbApex(0, 91 * deg),                              RangeError, "dec = 91° is outside −90° … 90°"],
    [() => cosAngleToCmbApex(0, -90.001 * deg),                         RangeError, `dec = ${(-90.001 * deg) / deg}° is outside −90° … 90°`],
    [() => cmbFrameRedshift(nan, 0, 0),                                 TypeError,  "z_helio must be a number"],
    [() => cmbFrameRedshift(-1, 0, 0),                                  RangeError, "z_helio = -1 must be > −1"],
    [() => rescaledValue(inf, 1, "distance", eds, eds),                 RangeError, "value must be a finite number"],
    [() => rescaledValue("1" as unknown as number, 1, "distance", eds, eds), RangeError, "value must be a finite number"],
    [() => rescaledValue(1, 1, "mass" as RescaleQuantity, eds, eds),    TypeError,  'unknown quantity "mass": use distance, luminosity, size, magnitude, density'],
  ])("%#: %s", (call, kind, message) => {
    expect(call).toThrow(kind);
    expect(call).toThrow(new kind(message));
  });

  test("the edges of the domains are accepted: the poles, a blueshift just above −1, a halo definition with spaces around it", () => {
    expect(Math.abs(cosAngleToCmbApex(0, 90 * deg))).toBeLessThanOrEqual(1);
    expect(Math.abs(cosAngleToCmbApex(0, -90 * deg))).toBeLessThanOrEqual(1);
    expect(cmbFrameRedshift(-0.999, 0, 0)).toBeGreaterThan(-1);
    expect(haloOverdensity(eds, 0, " 200c ")).toBe(200);
    expect(haloOverdensity(eds, 0, " VIR ")).toBeCloseTo(18 * Math.PI ** 2, 12); // 18π² in EdS (Bryan & Norman 1998 eq. 6)
  });

  test.each(["H0=70; Om=0.3; w0=-0.9", "H0=70; Om=0.3; w0=-1; wa=0.2"])("Δ_vir in flat %s (dark energy other than Λ) is a NoSolutionError: Bryan & Norman 1998 fit Λ only", (spec) => {
    expect(() => haloOverdensity(Cosmology.fromSpec(spec), 0, "vir")).toThrow(NoSolutionError);
  });

  test("a value on the first edge counts in the first bin", () => {
    expect(binnedLuminosityFunction([42], [1e6], [42, 43])[0].count).toBe(1);
  });

  test("a value outside every bin is ignored, below the first edge as above the last", () => {
    const bins = binnedLuminosityFunction([41.9, 42.2, 43.1], [1e6, 2e6, 4e6], [42, 42.5, 43]);
    expect(bins.map((b) => b.count)).toEqual([1, 0]);
    expectRelative(bins[0].phi, 1 / 2e6 / 0.5, 1e-15, "Φ from the one source inside (Schmidt 1968)");
  });

  test("a failed inverse is a NoSolutionError, a RangeError by that name", () => {
    const error = new NoSolutionError("no redshift");
    expect(error).toBeInstanceOf(RangeError);
    expect(error.name).toBe("NoSolutionError");
    expect(String(error)).toBe("NoSolutionError: no redshift");
  });
});
