/**
 * The core's check of a latitude (a declination) in radians (core/checks/numberChecks.ts): ±90° turned
 * into radians must pass although π/2 is rounded, so the check allows one relative rounding width
 * (1e-15) beyond π/2, that bound included, and refuses the next number above it.
 */
import { describe, expect, test } from "vitest";
import { requireLatitudeDeg, requireLatitudeRad } from "../core/checks/numberChecks.js";

const bound = (Math.PI / 2) * (1 + 1e-15); // the largest |latitude| allowed [rad], as the check computes it
const above = bound + Number.EPSILON;       // the next double above it (the spacing of doubles in [1, 2) is 2⁻⁵², IEEE 754)

describe("a latitude in radians: ±π/2 and one rounding's width beyond allowed", () => {
  //  latitude [rad]             allowed   what it is
  const cases: [number, boolean, string][] = [
    [90 * (Math.PI / 180),       true,     "90° turned into radians"],
    [-90 * (Math.PI / 180),      true,     "−90° turned into radians"],
    [Math.PI / 2,                true,     "π/2 as a double"],
    [bound,                      true,     "the bound itself"],
    [-bound,                     true,     "minus the bound"],
    [above,                      false,    "the next double above the bound"],
    [-above,                     false,    "the next double below minus the bound"],
    [0,                          true,     "the equator"],
  ];
  test.each(cases)("%d rad: allowed %s (%s)", (rad, allowed) => {
    if (allowed) expect(() => requireLatitudeRad("dec", rad)).not.toThrow();
    else expect(() => requireLatitudeRad("dec", rad)).toThrow(new RangeError(`dec = ${rad / (Math.PI / 180)}° is outside −90° … 90°`));
  });

  test("the message gives the latitude in degrees (zcell's own words)", () => {
    expect(() => requireLatitudeRad("dec", 2)).toThrow(new RangeError(`dec = ${2 / (Math.PI / 180)}° is outside −90° … 90°`));
    expect(() => requireLatitudeDeg("dec", 90.5)).toThrow(new RangeError("dec = 90.5° is outside −90° … 90°"));
    expect(() => requireLatitudeDeg("dec", -90)).not.toThrow();
  });
});
