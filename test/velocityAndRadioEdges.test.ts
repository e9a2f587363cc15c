/**
 * Velocities, rest frames, two-band spectral indices, brightness temperatures and flux densities per
 * wavelength, called in the core: values from astropy written here, closed forms, the edges of each
 * domain that must be accepted, and each refusal with the core's whole message (pinned as the interface).
 */
import { describe, expect, test } from "vitest";
import {
  brightnessTemperatureK,
  combinedRedshift,
  fluxDensityFactorJy,
  observedFrameValue,
  peculiarVelocityKmPerS,
  redshiftOfVelocity,
  restFrameValue,
  spectralIndexBetween,
  spectralIndexBetweenError,
  speedOfLightKmPerS,
  velocityKmPerS,
  type DopplerConvention,
  type RestFrameQuantity,
} from "../core/index.js";

const c = speedOfLightKmPerS;
const close = (got: number, want: number, rel: number) => expect(Math.abs(got - want), `${got} vs ${want}`).toBeLessThanOrEqual(rel * Math.abs(want));

describe("the three Doppler conventions against astropy", () => {
  test.each([
    // z      optical              radio                 relativistic [km/s]   source: astropy 5.2.1, (1+z) µm .to(km/s, u.doppler_optical(1 µm)),
    //                                                                          1/(1+z) GHz .to(km/s, u.doppler_radio(1 GHz)) and (…, u.doppler_relativistic(1 GHz))
    [0.01,    2997.9245800000026,  2968.2421584158683,   2982.9356991238337],
    [0.5,     149896.229,          99930.81933333333,    115304.79153846153],
    [2.0,     599584.916,          199861.63866666667,   239833.96639999998],
    [-0.3,    -89937.73740000001,  -128482.48199999999,  -102613.52589261744],
  ])("z = %d", (z, optical, radio, relativistic) => {
    const want: Record<DopplerConvention, number> = { optical, radio, relativistic };
    for (const k of ["optical", "radio", "relativistic"] as const) {
      close(velocityKmPerS(z, k), want[k], 1e-12);
      close(redshiftOfVelocity(want[k], k), z, 1e-11);
    }
  });

  test("at small v the conventions agree with cz to first order, and z of v is v/c (closed forms)", () => {
    for (const k of ["optical", "radio", "relativistic"] as const) {
      close(velocityKmPerS(1e-9, k), c * 1e-9, 2e-9);
      close(redshiftOfVelocity(1e-3, k), 1e-3 / c, 1e-8);
    }
  });

  test("the domain's edges: a radio velocity may be any negative, an optical one any positive", () => {
    close(redshiftOfVelocity(-c, "radio"), -0.5, 1e-15); // v/(c − v) at v = −c
    close(redshiftOfVelocity(5 * c, "optical"), 5, 1e-15);
    close(redshiftOfVelocity(-0.999 * c, "optical"), -0.999, 1e-12);
    close(velocityKmPerS(-0.5, "radio"), -c, 1e-15);
    expect(velocityKmPerS(0, "relativistic")).toBe(0);
  });

  test.each([
    [() => velocityKmPerS(-1, "optical"), RangeError, "z = -1 must be > −1"],
    [() => velocityKmPerS(Number.NaN, "radio"), TypeError, "z must be a number"],
    [() => velocityKmPerS(0.1, "Optical" as never), TypeError, 'unknown convention "Optical": use optical, radio, relativistic'],
    [() => redshiftOfVelocity(100, "doppler" as never), TypeError, 'unknown convention "doppler": use optical, radio, relativistic'],
    [() => redshiftOfVelocity(Number.NaN, "optical"), TypeError, "v must be a number"],
    [() => redshiftOfVelocity(-c, "optical"), RangeError, "v must be above −c (−299792.458 km/s): z = v/c > −1"],
    [() => redshiftOfVelocity(c, "radio"), RangeError, "v must be below c (299792.458 km/s) in the radio convention, v = c z/(1 + z)"],
    [() => redshiftOfVelocity(c, "relativistic"), RangeError, "v must be between −c and c (±299792.458 km/s) in the relativistic convention"],
    [() => redshiftOfVelocity(-c, "relativistic"), RangeError, "v must be between −c and c (±299792.458 km/s) in the relativistic convention"],
  ] as const)("refused: %s", (call, kind, message) => {
    expect(call).toThrow(new kind(message));
  });
});

describe("composed redshifts and peculiar velocities", () => {
  test("(1 + z1)(1 + z2) − 1 and c (z_obs − z_cosmo)/(1 + z_cosmo) (Davis & Scrimgeour 2014)", () => {
    close(combinedRedshift(2, 0.5), 3.5, 1e-15); // 3 × 1.5 − 1
    close(combinedRedshift(-0.5, -0.5), -0.75, 1e-15); // 0.5 × 0.5 − 1
    close(peculiarVelocityKmPerS(2.03, 2), (c * 0.03) / 3, 1e-12);
    close(peculiarVelocityKmPerS(-0.5, -0.6), (c * 0.1) / 0.4, 1e-12);
  });

  test.each([
    [() => combinedRedshift(-1, 0), RangeError, "z1 = -1 must be > −1"],
    [() => combinedRedshift(0, -1.5), RangeError, "z2 = -1.5 must be > −1"],
    [() => combinedRedshift(Number.NaN, 0), TypeError, "z1 must be a number"],
    [() => peculiarVelocityKmPerS(-1, 0.1), RangeError, "z_obs = -1 must be > −1"],
    [() => peculiarVelocityKmPerS(0.1, -2), RangeError, "z_cosmo = -2 must be > −1"],
    [() => peculiarVelocityKmPerS(0.1, Number.POSITIVE_INFINITY), RangeError, "z_cosmo must be finite"],
  ] as const)("refused: %s", (call, kind, message) => {
    expect(call).toThrow(new kind(message));
  });
});

describe("rest frame and observed frame: what each quantity accepts", () => {
  test.each([
    // value  z      quantity             rest value   (common practice: λ, Δt and W over 1 + z, ν times 1 + z)
    [0,       1,     "duration",          0],
    [0,       1,     "equivalent_width",  0],
    [-8,      -0.5,  "equivalent_width",  -16],
    [3,       -0.5,  "frequency",         1.5],
    [3,       -0.5,  "wavelength",        6],
  ] as const)("%d at z = %d (%s) is %d at rest", (value, z, quantity, rest) => {
    expect(restFrameValue(value, z, quantity)).toBe(rest);
    expect(observedFrameValue(rest, z, quantity)).toBe(value);
  });

  test.each([
    [() => restFrameValue(-1, 0.1, "duration"), RangeError, "duration = -1 must be ≥ 0"],
    [() => observedFrameValue(0, 0.1, "wavelength"), RangeError, "wavelength = 0 must be > 0"],
    [() => restFrameValue(0, 0.1, "frequency"), RangeError, "frequency = 0 must be > 0"],
    [() => observedFrameValue(-2, 0.1, "frequency"), RangeError, "frequency = -2 must be > 0"],
    [() => restFrameValue(5, -1, "wavelength"), RangeError, "z = -1 must be > −1"],
    [() => restFrameValue(5, Number.NaN, "wavelength"), TypeError, "z must be a number"],
    [() => restFrameValue(Number.NaN, 0.1, "duration"), TypeError, "duration must be a number"],
    [() => observedFrameValue(5, 0.1, "flux" as RestFrameQuantity), TypeError, 'unknown quantity "flux": use wavelength, frequency, duration, equivalent_width'],
  ] as const)("refused: %s", (call, kind, message) => {
    expect(call).toThrow(new kind(message));
  });
});

describe("spectral index between two bands", () => {
  test("α = ln(S1/S2)/ln(ν1/ν2) and σ_α = √((σ1/S1)² + (σ2/S2)²)/|ln(ν1/ν2)| (closed forms), either band first", () => {
    close(spectralIndexBetween(5, 5.6e9, 10, 1.4e9), -0.5, 1e-14);
    close(spectralIndexBetween(1, 1e9, 8, 4e9), 1.5, 1e-14); // 8 = 4^1.5
    close(spectralIndexBetweenError(10, 1.4e9, 5, 5.6e9, 0.3, 0.2), 0.05 / Math.log(4), 1e-14);
    close(spectralIndexBetweenError(5, 5.6e9, 10, 1.4e9, 0.2, 0.3), 0.05 / Math.log(4), 1e-14);
    close(spectralIndexBetweenError(10, 1e9, 5, 1e10, 0, 0.5), 0.1 / Math.log(10), 1e-14);
    expect(spectralIndexBetweenError(10, 1e9, 5, 1e10, 0, 0)).toBe(0);
  });

  test.each([
    [() => spectralIndexBetween(1, 1e9, 2, 1e9), RangeError, "band1 and band2 are the same frequency: an index needs two different bands"],
    [() => spectralIndexBetweenError(1, 1e9, 2, 1e9, 0.1, 0.1), RangeError, "band1 and band2 are the same frequency: an index needs two different bands"],
    [() => spectralIndexBetween(1, 0, 2, 1e9), RangeError, "band1 = 0 Hz must be > 0 and finite"],
    [() => spectralIndexBetween(1, 1e9, 2, -1), RangeError, "band2 = -1 Hz must be > 0 and finite"],
    [() => spectralIndexBetween(0, 1e9, 2, 2e9), RangeError, "flux_density1 = 0 must be > 0 and finite"],
    [() => spectralIndexBetween(1, 1e9, 0, 2e9), RangeError, "flux_density2 = 0 must be > 0 and finite"],
    [() => spectralIndexBetweenError(0, 1e9, 2, 2e9, 0.1, 0.1), RangeError, "flux_density1 = 0 must be > 0 and finite"],
    [() => spectralIndexBetweenError(1, 1e9, 0, 2e9, 0.1, 0.1), RangeError, "flux_density2 = 0 must be > 0 and finite"],
    [() => spectralIndexBetweenError(1, 1e9, 2, 2e9, -0.1, 0.1), RangeError, "err1 = -0.1 must be ≥ 0 and finite"],
    [() => spectralIndexBetweenError(1, 1e9, 2, 2e9, 0.1, Number.NaN), TypeError, "err2 must be a number"],
  ] as const)("refused: %s", (call, kind, message) => {
    expect(call).toThrow(new kind(message));
  });
});

describe("brightness temperature of a Gaussian source", () => {
  const arcsec = Math.PI / 648000;
  test.each([
    // S [Jy]  ν [GHz]  θ_maj, θ_min [″]  T_b [K]               source: astropy 5.2.1, (S Jy).to(K, u.brightness_temperature(ν GHz, 2π σ_maj σ_min)), σ = FWHM/√(8 ln 2)
    [1,        5,       15,  15,          217.2658388895673],
    [0.25,     1.4,     40,  10,          389.70674226843613],
    [3e-3,     230,     0.5, 0.2,         0.6930739189530146],
  ])("%d Jy at %d GHz in %d″ × %d″ is %d K", (jy, ghz, maj, min, tb) => {
    close(brightnessTemperatureK(jy * 1e-26, ghz * 1e9, maj * arcsec, min * arcsec), tb, 1e-10);
    close(brightnessTemperatureK(jy * 1e-26, ghz * 1e9, min * arcsec, maj * arcsec), tb, 1e-10);
    close(brightnessTemperatureK(jy * 1e-26, ghz * 1e9, maj * arcsec, min * arcsec, 2), 3 * tb, 1e-10); // (1 + z) in the rest frame
  });

  test("no flux is 0 K; a blueshift and zero sizes are refused", () => {
    expect(brightnessTemperatureK(0, 1e9, arcsec, arcsec)).toBe(0);
    expect(() => brightnessTemperatureK(-1e-26, 1e9, arcsec, arcsec)).toThrow(new RangeError("flux_density = -1e-26 W/m2/Hz must be ≥ 0 and finite"));
    expect(() => brightnessTemperatureK(1e-26, 0, arcsec, arcsec)).toThrow(new RangeError("frequency = 0 Hz must be > 0 and finite"));
    expect(() => brightnessTemperatureK(1e-26, 1e9, 0, arcsec)).toThrow(new RangeError("major = 0 rad must be > 0 and finite"));
    expect(() => brightnessTemperatureK(1e-26, 1e9, arcsec, 0)).toThrow(new RangeError("minor = 0 rad must be > 0 and finite"));
    expect(() => brightnessTemperatureK(1e-26, 1e9, arcsec, arcsec, -0.1)).toThrow(RangeError);
  });
});

describe("a flux density's unit into Jy", () => {
  test("per frequency: the unit's factor (1 Jy = 1e-26 W m⁻² Hz⁻¹, 1 erg/s/cm2/Hz = 1e23 Jy: IAU), the wavelength unused", () => {
    close(fluxDensityFactorJy("mJy"), 1e-3, 1e-15);
    close(fluxDensityFactorJy("erg/s/cm2/Hz", 1), 1e23, 1e-15);
    close(fluxDensityFactorJy("W/m2/Hz", 1e9), 1e26, 1e-15);
  });

  test("per wavelength: f_ν = f_λ λ²/c (common practice): 1 erg/s/cm2/Angstrom at 5000 Å is 1e-7·1e4·1e10 W m⁻² m⁻¹ × (5e-7 m)²/c", () => {
    const wm2m = 1e-3 * 1e10; // 1 erg/s/cm2/Å in W m⁻² m⁻¹
    for (const w of [100, 5000, 1e7]) close(fluxDensityFactorJy("erg/s/cm2/Angstrom", w), (wm2m * (w * 1e-10) ** 2) / 299792458 / 1e-26, 1e-14);
  });

  test("more units than the remembered 64 are each read right, first and again", () => {
    // 70 spellings, each a different text (leading spaces), alternating mJy and erg/s/cm2/Hz
    const units = Array.from({ length: 70 }, (_, i) => `${" ".repeat(i)}${i % 2 ? "mJy" : "erg/s/cm2/Hz"}`);
    for (const unit of [...units, ...units]) close(fluxDensityFactorJy(unit), unit.endsWith("mJy") ? 1e-3 : 1e23, 1e-14);
  });

  test.each([
    [() => fluxDensityFactorJy(" erg/s/cm2/Angstrom "), TypeError, 'wavelength is needed with "erg/s/cm2/Angstrom", a flux density per wavelength (f_λ): give it in Angstrom (the last argument), for f_ν = f_λ λ²/c'],
    [() => fluxDensityFactorJy("erg/s/cm2/Angstrom", 0), RangeError, "wavelength = 0 Angstrom must be > 0 and finite"],
    [() => fluxDensityFactorJy("erg/s/cm2/Angstrom", 0.5), RangeError, "wavelength = 0.5 Angstrom is outside 100 … 1e7 Angstrom (1 mm), where zcell takes the wavelength of a flux density per wavelength: it is read in Angstrom (0.5 um is 5000 Angstrom)"],
    [() => fluxDensityFactorJy("erg/s/cm2/Angstrom", 99.9999), RangeError, "wavelength = 99.9999 Angstrom is outside 100 … 1e7 Angstrom (1 mm), where zcell takes the wavelength of a flux density per wavelength: it is read in Angstrom (99.9999 um is 999999 Angstrom)"],
    [() => fluxDensityFactorJy("erg/s/cm2/Angstrom", 1.0000001e7), RangeError, "wavelength = 10000000 Angstrom is outside 100 … 1e7 Angstrom (1 mm), where zcell takes the wavelength of a flux density per wavelength: it is read in Angstrom"],
    [() => fluxDensityFactorJy("erg/s/cm2/Angstrom", 1.23456789e8), RangeError, "wavelength = 123457000 Angstrom is outside 100 … 1e7 Angstrom (1 mm), where zcell takes the wavelength of a flux density per wavelength: it is read in Angstrom"],
    [() => fluxDensityFactorJy("Mpc"), TypeError, '"Mpc" is not a flux density: use one per frequency (Jy, mJy, erg/s/cm2/Hz) or per wavelength (erg/s/cm2/Angstrom, W/m2/um)'],
  ] as const)("refused: %s", (call, kind, message) => {
    expect(call).toThrow(new kind(message));
  });
});
