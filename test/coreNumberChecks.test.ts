/**
 * The core's checks of number arguments (core/checks/numberChecks.ts), with their messages (zcell's
 * own words, each naming the argument and its unit, pinned here as the interface): what is not a
 * number (a TypeError), a number outside its domain (a RangeError). A latitude in radians: ±90° turned
 * into radians must pass although π/2 is rounded, so the check allows one relative rounding width
 * (1e-15) beyond π/2, that bound included, and refuses the next number above it.
 */
import { describe, expect, test } from "vitest";
import { requireFiniteNumber, requireLatitudeDeg, requireLatitudeRad, requireNonNegative } from "../core/checks/numberChecks.js";

const notANumber = "1" as unknown as number; // text where a number belongs, as an untyped caller may pass it

describe("a finite number", () => {
  //  value          the error, or undefined when allowed
  const cases: [number, Error | undefined][] = [
    [0,              undefined],
    [-1e308,         undefined],
    [5e-324,         undefined],
    [NaN,            new TypeError("x must be a number")],
    [notANumber,     new TypeError("x must be a number")],
    [Infinity,       new RangeError("x must be finite")],
    [-Infinity,      new RangeError("x must be finite")],
  ];
  test.each(cases)("%d: %s", (value, error) => {
    if (error) expect(() => requireFiniteNumber("x", value)).toThrow(error);
    else expect(() => requireFiniteNumber("x", value)).not.toThrow();
  });
});

describe("a number ≥ 0, or > 0, with its unit in the message", () => {
  //  value        unit     positive   the error, or undefined when allowed
  const cases: [number, string | undefined, boolean | undefined, Error | undefined][] = [
    [0,            undefined, undefined, undefined],                                              // ≥ 0 by default
    [-0,           "",      false,     undefined],
    [2.5,          "Mpc",   false,     undefined],
    [1e-300,       "Mpc",   true,      undefined],
    [-1,           undefined, undefined, new RangeError("d = -1 must be ≥ 0 and finite")],       // no unit by default
    [-1,           "",      false,     new RangeError("d = -1 must be ≥ 0 and finite")],
    [-1,           "Mpc",   false,     new RangeError("d = -1 Mpc must be ≥ 0 and finite")],
    [-1e-300,      "Mpc",   false,     new RangeError("d = -1e-300 Mpc must be ≥ 0 and finite")],
    [0,            "Mpc",   true,      new RangeError("d = 0 Mpc must be > 0 and finite")],
    [-2,           "",      true,      new RangeError("d = -2 must be > 0 and finite")],
    [Infinity,     "Mpc",   false,     new RangeError("d = Infinity Mpc must be ≥ 0 and finite")],
    [Infinity,     "Mpc",   true,      new RangeError("d = Infinity Mpc must be > 0 and finite")],
    [-Infinity,    "Mpc",   false,     new RangeError("d = -Infinity Mpc must be ≥ 0 and finite")],
    [NaN,          "Mpc",   false,     new TypeError("d must be a number")],
    [notANumber,   "Mpc",   true,      new TypeError("d must be a number")],
  ];
  test.each(cases)("%d (unit %j, positive %s): %s", (value, unit, positive, error) => {
    const check = () => requireNonNegative("d", value, unit, positive);
    if (error) expect(check).toThrow(error);
    else expect(check).not.toThrow();
  });
});

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
    expect(() => requireLatitudeRad("dec", NaN)).toThrow(new TypeError("dec must be a number"));
    expect(() => requireLatitudeRad("dec", Infinity)).toThrow(new RangeError("dec must be finite"));
  });
});
