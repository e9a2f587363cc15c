import { describe, expect, test } from "vitest";
import { caseSlip, nearestUnits, slashForPer } from "../core/units/unitSuggestions.js";
import { conversionFactor, convertUnit, frequencyHz, parseUnit, unitKind } from "../core/units/units.js";
import { expectRelative } from "./helpers.js";

describe("unit conversion", () => {
  test.each([
    // value  from            to           expected                 tol     source
    [1,       "pc",           "lyr",       3.2615637771674337,      1e-15,  "IAU 2015 B2 pc with the Julian-year light year"],
    [1,       "Mpc",          "m",         3.0856775814913673e22,   1e-15,  "IAU 2015 B2 (648000/π au)"],
    [1,       "au",           "m",         149597870700,            0,      "IAU 2012 B2 (exact)"],
    [1,       "Gyr",          "s",         3.15576e16,              1e-15,  "Julian year 365.25 d (IAU)"],
    [1,       "Jy",           "W/m2/Hz",   1e-26,                   1e-15,  "IAU definition of the jansky"],
    [1,       "mJy",          "uJy",       1000,                    1e-15,  "SI prefixes"],
    [1,       "µJy",          "Jy",        1e-6,                    1e-15,  "SI prefixes (micro sign)"],
    [1,       "μJy",          "Jy",        1e-6,                    1e-15,  "SI prefixes (Greek mu)"],
    [1,       "erg/s",        "W",         1e-7,                    1e-15,  "CGS erg = 1e-7 J"],
    [1,       "erg/s/cm2",    "W/m2",      1e-3,                    1e-15,  "CGS to SI"],
    [1,       "erg s-1 cm-2", "W.m**-2",   1e-3,                    1e-15,  "FITS 4.0 §4.3 syntax"],
    [1,       "Lsun",         "W",         3.828e26,                1e-15,  "IAU 2015 B3 nominal L☉"],
    [1,       "solLum",       "erg/s",     3.828e33,                1e-15,  "IAU 2015 B3 nominal L☉"],
    [1,       "deg2",         "sr",        (Math.PI / 180) ** 2,    1e-15,  "definition of the degree"],
    [41252.96124941928, "deg2", "sr",      4 * Math.PI,             1e-14,  "whole sky in deg² (from memory: 41253)"],
    [1,       "kpc/arcsec",   "Mpc/rad",   206.26480624709637,      1e-15,  "648000/π arcsec per rad"],
    [1,       "Gpc3",         "Mpc3",      1e9,                     1e-15,  "SI prefixes"],
    [1,       "Gly",          "Mpc",       306.6013937855506,       1e-14,  "Julian-year light year and IAU pc"],
    [1,       "mas",          "arcsec",    1e-3,                    1e-15,  "milliarcsecond"],
    [1,       "10**-26 W m**(-2) Hz-1", "Jy", 1,                    1e-15,  "FITS 4.0 §4.3 scale factor"],
    [1,       "(erg/s)/(cm2)", "W/m2",     1e-3,                    1e-15,  "FITS 4.0 §4.3 parentheses"],
    [1,       "km/s/Mpc",     "s-1",       1 / 3.0856775814913673e19, 1e-15, "H0 unit to SI"],
    [1,       "solMass/Mpc3", "kg/m3",     1.988409870698051e30 / 3.0856775814913673e22 ** 3, 1e-12, "IAU 2015 B3 GM☉ / CODATA 2018 G"],
  ])("%d %s = %d %s", (value, from, to, expected, tol) => {
    expectRelative(convertUnit(value, from, to), expected, tol, `${from}→${to}`);
  });

  test("a conversion and its reverse multiply to 1", () => {
    for (const [a, b] of [["Mpc", "Gly"], ["erg/s/cm2/Hz", "mJy"], ["kpc/arcsec", "pc/mas"], ["Myr", "d"]]) {
      expectRelative(conversionFactor(a, b) * conversionFactor(b, a), 1, 1e-15, `${a}↔${b}`);
    }
  });

  test.each([
    // from     to       message                                                  (common practice)
    ["Mpc",     "Gyr",   /cannot convert "Mpc" \(a length\) to "Gyr" \(a time\)/],
    ["kpc",     "kpc/arcsec", /\(a length\) to "kpc\/arcsec" \(a length per angle\)/],
    ["parsec",  "m",     /unknown unit "parsec"/],
    ["mag",     "Jy",    /magnitudes are logarithmic/],
    ["Mpc**",   "m",     /whole-number power/],
    ["(Mpc",    "m",     /missing \)/],
    ["",        "m",     /empty unit/],
  ])("%s → %s is rejected", (from, to, message) => {
    expect(() => convertUnit(1, from, to)).toThrow(TypeError);
    expect(() => convertUnit(1, from, to)).toThrow(message);
  });

  test("units are case-sensitive as in FITS; a trade unit in the wrong case that would still parse is refused", () => {
    // "mpc" would be a milliparsec (FITS Standard 4.0 §4.3 prefixes are case-sensitive): 1e9 from Mpc
    expect(() => convertUnit(1, "Mpc", "mpc")).toThrow('"mpc" would be milliparsecs (units are case-sensitive): did you mean Mpc?');
    expect(() => parseUnit("mpc3")).toThrow("did you mean Mpc3?");
    expect(() => parseUnit("myr")).toThrow("did you mean Myr?");
    expect(() => parseUnit("km/s/mpc")).toThrow("did you mean km/s/Mpc?");
    expectRelative(convertUnit(1, "Mpc", "kpc"), 1e3, 1e-15, "Mpc/kpc, SI prefixes (common practice)");
    expect(parseUnit("Mpc").dimensions).toEqual([1, 0, 0, 0, 0]);
  });

  test.each([
    // typed          | suggestion in the message
    ["ergs/s/cm2",    "did you mean erg/s/cm2?"],
    ["L_sun",         "did you mean Lsun or solLum?"],
    ["gpc",           "did you mean Gpc?"],
    ["MPC",           "did you mean Mpc?"],
    ["gyr",           "did you mean Gyr?"],
    ["mjy",           "did you mean mJy?"],
    ["kev",           "did you mean keV?"],
    ["msun",          "did you mean Msun or solMass?"],
  ])("an unknown unit %j names the nearest known spellings (%s)", (typed, suggestion) => {
    expect(() => parseUnit(typed)).toThrow(suggestion);
  });

  test.each([
    // typed          | nearest known spellings (one or two edits; ties in the order of the common list)
    ["arcsek",        ["arcsec"]],
    ["Mpcc",          ["Mpc", "Mpc3"]],
    ["kpc/arcsek",    ["kpc/arcsec"]],
    ["erg/s/cm^2",    ["erg/s/cm2"]],
    ["Lsol",          ["Lsun", "solLum"]],
    ["Ms",            []],          // two letters: one edit would reach too much, so none is offered
    ["",              []],
    ["  ",            []],
    ["x".repeat(41),  []],          // longer than any unit: not searched
  ])("nearestUnits(%j) = %j", (typed, expected) => {
    expect(nearestUnits(typed)).toEqual(expected);
  });

  test("only trade units in the wrong case that would still parse are case slips", () => {
    expect(caseSlip("mpc")).toEqual({ meant: "Mpc", reads: "milliparsecs" });
    expect(caseSlip("myr")?.meant).toBe("Myr");
    expect(caseSlip("ma")?.meant).toBe("Ma");
    for (const fine of ["Mpc", "kpc", "mJy", "MJy", "ms", "mas", "toString", "constructor"]) expect(caseSlip(fine)).toBeUndefined();
  });

  test("a unit nothing is near gets no invented suggestion", () => {
    expect(() => parseUnit("qqqqqq")).toThrow(/^unknown unit "qqqqqq"$/);
    // a spelling one whole unit shorter is not near: "erg/s/cm2" would drop the per-X
    expect(() => parseUnit("erg/s/cm2/X")).toThrow(/^unknown unit "X" in "erg\/s\/cm2\/X"$/);
  });
});

describe("what a wrong unit is told, whole", () => {
  // our own messages: each names the text as typed and what is wrong with it, the kind of each unit
  // in the words of the trade (common practice), and the base dimensions in words for the others
  test.each([
    // from             to             message
    ["Mpc",             "Gyr",         'cannot convert "Mpc" (a length) to "Gyr" (a time)'],
    ["W",               "erg/s/cm2",   'cannot convert "W" (a luminosity or power) to "erg/s/cm2" (a flux)'],
    ["W/Hz/sr",         "W",           'cannot convert "W/Hz/sr" (a spectral luminosity per solid angle) to "W" (a luminosity or power)'],
    ["mJy",             "erg/s/cm2",   'cannot convert "mJy" (a flux density) to "erg/s/cm2" (a flux)'],
    ["erg/s/cm2/arcsec2", "Jy",        'cannot convert "erg/s/cm2/arcsec2" (a flux per solid angle) to "Jy" (a flux density)'],
    ["h3 Mpc-3",        "Mpc3",        'cannot convert "h3 Mpc-3" (a number density) to "Mpc3" (a volume)'],
    ["Msun/pc2",        "kg/m3",       'cannot convert "Msun/pc2" (a surface density) to "kg/m3" (a density)'],
    ["keV",             "GHz",         'cannot convert "keV" (an energy) to "GHz" (a frequency)'],
    ["km/s",            "deg2",        'cannot convert "km/s" (a speed) to "deg2" (a solid angle)'],
    ["kg m2 s-3 K",     "rad",         'cannot convert "kg m2 s-3 K" (a quantity of dimension length²·mass·temperature/time³) to "rad" (an angle)'],
    ["m s-2",           "m",           'cannot convert "m s-2" (an acceleration) to "m" (a length)'],
    ["J/K",             "erg",         'cannot convert "J/K" (a quantity of dimension length²·mass/(time²·temperature)) to "erg" (an energy)'],
    ["arcsec-1",        "m",           'cannot convert "arcsec-1" (a quantity of dimension 1/angle) to "m" (a length)'],
    ["m**(1/2)",        "m",           'cannot convert "m**(1/2)" (a quantity of dimension length^0.5) to "m" (a length)'],
    ["Hz",              "Mpc/arcsec",  'cannot convert "Hz" (a frequency) to "Mpc/arcsec" (a length per angle)'],
  ])("%s → %s", (from, to, message) => {
    expect(() => conversionFactor(from, to)).toThrow(new TypeError(message));
  });

  test.each([
    // text        message
    ["m**(2",      '"m**(2": missing ) after the power'],
    ["m)",         '"m)": unexpected ")"'],
    ["m/",         '"m/": a unit is missing'],
    ["/s",         '"/s": write the reciprocal as a power, "s-1"'],
    ["m^(2/",      '"m^(2/": a whole-number power is expected'],
    ["",           "empty unit"],
  ])("%j", (text, message) => {
    expect(() => parseUnit(text)).toThrow(message);
  });

  test("a unit that is not text is a TypeError", () => {
    expect(() => parseUnit(3 as never)).toThrow(new TypeError("a unit must be text"));
  });

  test.each([
    // text                  SI factor     dimensions [m, kg, s, K, rad]   source
    ["m**(-2)",              1,            [-2, 0, 0, 0, 0],  "FITS 4.0 §4.3 (powers in parentheses)"],
    ["m**(1/2)",             1,            [0.5, 0, 0, 0, 0], "FITS 4.0 §4.3 (a fractional power)"],
    ["m/(s K)",              1,            [1, 0, -1, -1, 0], "FITS 4.0 §4.3 (a parenthesised divisor)"],
    ["m.s-1",                1,            [1, 0, -1, 0, 0],  "FITS 4.0 §4.3 (product with '.')"],
    ["erg s-1 cm-2 Hz-1",    1e-3,         [0, 1, -2, 0, 0],  "1 erg = 1e-7 J, 1 cm² = 1e-4 m² (SI brochure)"],
  ])("%s parses to its SI factor and dimensions", (text, factor, dimensions) => {
    const unit = parseUnit(text);
    expectRelative(unit.factor, factor, 1e-15, text);
    expect(unit.dimensions.map((x) => x + 0)).toEqual(dimensions); // + 0: a power of −0 is 0
  });
});

describe("the FITS unit syntax, piece by piece (FITS Standard 4.0 §4.3)", () => {
  test.each([
    // text          SI factor  dimensions [m, kg, s, K, rad]
    ["m*s-1",        1,         [1, 0, -1, 0, 0]],   // product written with '*'
    ["km s-1",       1000,      [1, 0, -1, 0, 0]],   // product written with a space
    ["(m )/s",       1,         [1, 0, -1, 0, 0]],   // a space before ')' is no product
    ["10^3 m",       1000,      [1, 0, 0, 0, 0]],    // scale factor written with '^'
    ["10**3 m",      1000,      [1, 0, 0, 0, 0]],
  ])("%s parses to its SI factor and dimensions", (text, factor, dimensions) => {
    const unit = parseUnit(text);
    expectRelative(unit.factor, factor, 1e-15, text);
    expect(unit.dimensions.map((x) => x + 0)).toEqual(dimensions);
  });

  test.each([
    // text     whole message (our own)
    ["m2s",     '"m2s": put a space after the power, as in "m2 s"'],  // no space, no '.': not a product
    ["m^x2",    '"m^x2": a whole-number power is expected'],
  ])("%j is refused: %s", (text, message) => {
    expect(() => parseUnit(text)).toThrow(new TypeError(message));
  });

  test("an h-scaled unit without a model is named, trimmed, whichever side it is on", () => {
    const message = '"Mpc/h" is in units of h = H0/100: give a model';
    expect(() => conversionFactor("Mpc", "Mpc/h")).toThrow(new TypeError(message));
    expect(() => conversionFactor(" Mpc/h ", "Mpc")).toThrow(new TypeError(message));
  });

  test("a message quotes the unit trimmed", () => {
    expect(() => conversionFactor(" Mpc ", "Gyr")).toThrow(new TypeError('cannot convert "Mpc" (a length) to "Gyr" (a time)'));
  });

  test("a dimension with no common name is spelled in words of its base dimensions, the angle too", () => {
    expect(() => conversionFactor("m rad2", "m")).toThrow(new TypeError('cannot convert "m rad2" (a quantity of dimension length·angle²) to "m" (a length)'));
  });

  test.each([
    // typed                  whole message: the word "per" read as "/" when that is a unit (FITS has no "per")
    ["kpc per arcsec",        'unknown unit "per" in "kpc per arcsec": did you mean kpc/arcsec?'],
    ["erg per s per cm2",     'unknown unit "per" in "erg per s per cm2": did you mean erg/s/cm2?'],
    ["km/s PER Mpc",          'unknown unit "PER" in "km/s PER Mpc": did you mean km/s/Mpc?'],
    ["kpc per parsec",        'unknown unit "per" in "kpc per parsec"'],      // with "/" still no unit: nothing offered
  ])("%j is refused: %s", (text, message) => {
    expect(() => parseUnit(text)).toThrow(new TypeError(message));
  });

  test("the words of a unit's kind", () => {
    expect(unitKind("W/Hz/sr")).toBe("a spectral luminosity per solid angle");
    expect(unitKind("erg/s/Hz")).toBe("a spectral luminosity");
    expect(unitKind("J")).toBe("an energy");
    expect(unitKind("m/km")).toBe("a pure number");
    expect(slashForPer("Mpc")).toBeUndefined();
    expect(slashForPer(" kpc per arcsec ")).toBe("kpc/arcsec");
    expect(slashForPer("kpc  Per  arcsec")).toBe("kpc/arcsec");
  });

  test("a band value must be > 0 and finite, quoted in the unit as typed (trimmed)", () => {
    expect(() => frequencyHz(Number.POSITIVE_INFINITY, "GHz", "band")).toThrow(new RangeError("band = Infinity GHz must be > 0"));
    expect(() => frequencyHz(-1, " GHz ", "rest")).toThrow(new RangeError("rest = -1 GHz must be > 0"));
  });

  test("at most two suggestions, in the order of the common list", () => {
    // "Xpc" is one edit from Mpc, kpc, Gpc and pc
    expect(nearestUnits("Xpc")).toEqual(["Mpc", "kpc"]);
  });
});
