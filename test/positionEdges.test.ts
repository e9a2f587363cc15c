/**
 * Positions at their edges, called in the core: sexagesimal text a stranger may type (each refusal
 * with its whole message, the core's text pinned as the interface), the forms the reader must accept,
 * the writer's padding and limits, sky frames against astropy values written here, and separations
 * near the poles (closed forms).
 */
import { describe, expect, test } from "vitest";
import { angularSeparationDeg, convertSkyFrameDeg, eclipticObliquityJ2000Arcsec, galacticCoordinatesRad, sexagesimalDegrees, sexagesimalText, skyFrameMatrix, type AnglePart } from "../core/index.js";

const raHint = "write hours as 12:30:49.4, 12h30m49.4s or 12 30 49.4, or give degrees as a number";
const decHint = "write degrees as +12:23:28, -05d07m or −05°07′, or give a number";
const otherHint = "write degrees as 123:45:06 or 123d45m06s, or give a number";
const sign = "has a sign inside it: give one + or − before the first field";
const two = "has two signs: give one + or − before the first field";

describe("sexagesimal forms the reader accepts", () => {
  test.each([
    // text                      part    degrees                              source
    ["12\t30\t49.4",             "ra",   15 * (12 + 30 / 60 + 49.4 / 3600),   "tabs separate fields as spaces do"],
    ["  12 30 49.4  ",           "ra",   15 * (12 + 30 / 60 + 49.4 / 3600),   "spaces around the text"],
    ["12 .5",                    "ra",   15 * (12 + 0.5 / 60),                "a field may start with its point"],
    ["09 09 09",                 "ra",   15 * (9 + 9 / 60 + 9 / 3600),        "fields starting with 0 and 9"],
    ["12 9",                     "dec",  12 + 9 / 60,                         "a second field starting with 9"],
    ["- 05 07",                  "dec",  -(5 + 7 / 60),                       "a space after the sign"],
    ["+ 05 07",                  "dec",  5 + 7 / 60,                          "a plus and a space"],
    ["23:59:59.9",               "ra",   15 * (23 + 59 / 60 + 59.9 / 3600),   "the last tenth of a second of RA"],
    ["24d",                      "ra",   24,                                  "24 marked in degrees is 24°, not 24h"],
    ["359.5d",                   "ra",   359.5,                               "below 360°"],
    ["90",                       "dec",  90,                                  "the north pole, as a number"],
    ["-90",                      "lat",  -90,                                 "the south pole of another frame"],
    ["-0:00:00",                 "lon",  0,                                   "a negative zero longitude is 0, not 360"],
    ["-0",                       "lon",  0,                                   "and as a number"],
    ["-10",                      "lon",  350,                                 "a negative longitude wraps"],
    ["123:45:06",                "lon",  123 + 45 / 60 + 6 / 3600,            "a longitude with colons is degrees"],
    ["12.12345678901234567",     "dec",  12.123456789012346,                  "more than 15 digits: read as JavaScript reads the number (ECMAScript Number)"],
    ["12:30:15.1234567890123456", "dec", 12 + 30 / 60 + 15.123456789012346 / 3600, "and in the seconds field"],
    ["12d30'15''",               "dec",  12 + 30 / 60 + 15 / 3600,            "an apostrophe for arcminutes, two for arcseconds"],
    ["12h30m15s",                "ra",   15 * (12 + 30 / 60 + 15 / 3600),     "h m s"],
  ] as const)("%j (%s) is %d°: %s", (text, part, expected, _source) => {
    expect(Math.abs(sexagesimalDegrees(text, part as AnglePart) - expected)).toBeLessThanOrEqual(1e-12);
  });

  test("a negative longitude comes back as 360° minus it, exactly", () => {
    expect(sexagesimalDegrees("-0:30:00", "lon")).toBe(359.5);
    expect(Object.is(sexagesimalDegrees("-0", "lon"), 0)).toBe(true);
  });
});

describe("sexagesimal text a stranger may type is refused with a message that says how to write it", () => {
  test.each([
    // text            part    the whole message (sexagesimal.ts, pinned as the interface)
    ["12:.",           "ra",   `ra: "12:." ends without a number; ${raHint}`],
    ["12:-30",         "dec",  `dec: "12:-30" ${sign}`],
    ["+12:-30",        "dec",  `dec: "+12:-30" ${two}`],
    ["+12 -30",        "dec",  `dec: "+12 -30" ${two}`],
    ["+ -12",          "dec",  `dec: "+ -12" ${two}`],
    ["12 −30",         "dec",  `dec: "12 −30" ${sign}`],
    ["12 +30",         "dec",  `dec: "12 +30" ${sign}`],
    ["12:+30",         "dec",  `dec: "12:+30" ${sign}`],
    ["12:−30",         "dec",  `dec: "12:−30" ${sign}`],
    ["12''",           "ra",   `ra: "12''" has "'" where h, d, °, ":" or a space belongs; ${raHint}`],
    ["12:30:15'",      "dec",  `dec: "12:30:15'" has "'" where s, ″ or ", ":" or a space belongs; ${decHint}`],
    ["12x",            "ra",   `ra: "12x" has "x" where h, d, °, ":" or a space belongs; ${raHint}`],
    ["12:30:15x",      "ra",   `ra: "12:30:15x" has "x" where s, ″ or ", ":" or a space belongs; ${raHint}`],
    ["12 ;",           "dec",  `dec: "12 ;" has ";" where h, d, °, ":" or a space belongs; ${decHint}`],
    ["12 /",           "dec",  `dec: "12 /" has "/" where h, d, °, ":" or a space belongs; ${decHint}`],
    ["12:😀",          "dec",  `dec: "12:😀" has "😀" where a number belongs; ${decHint}`],
    ["abc",            "lon",  `lon: "abc" has "a" where a number belongs; ${otherHint}`],
    ["abc",            "lat",  `lat: "abc" has "a" where a number belongs; ${otherHint}`],
    ["12h",            "lon",  'lon: "12h" is in hours: a latitude or longitude is in degrees (use d or °, or colons)'],
    ["12h",            "lat",  'lat: "12h" is in hours: a latitude or longitude is in degrees (use d or °, or colons)'],
    ["+12:30:75",      "dec",  'dec: "+12:30:75" has arcseconds 75: minutes and seconds must be below 60'],
    ["12:30:60",       "lon",  'lon: "12:30:60" has arcseconds 60: minutes and seconds must be below 60'],
    ["12:60",          "dec",  'dec: "12:60" has arcminutes 60: minutes and seconds must be below 60'],
    ["12h60m",         "ra",   'ra: "12h60m" has minutes 60: minutes and seconds must be below 60'],
    ["+01:00:00",      "ra",   'ra: "+01:00:00" has a sign: a right ascension is 0h … 24h with no sign'],
    ["24h",            "ra",   'ra: "24h" has hours 24: a right ascension is below 24h (mark degrees with d or °)'],
    ["360d",           "ra",   'ra: "360d" is 360°: a right ascension is below 360°'],
    ["360",            "ra",   'ra: "360" is 360°: a right ascension is below 360°'],
    ["360",            "lon",  'lon: "360" is 360°: a longitude is below 360°'],
    ["   ",            "dec",  `dec: "" is not an angle; ${decHint}`],
    ["+",              "lat",  `lat: "+" is not an angle; ${otherHint}`],
    ["1 2 3 4",        "lon",  `lon: "1 2 3 4" has more than three fields; ${otherHint}`],
    ["1.5 2",          "dec",  `dec: "1.5 2" has decimals before its last field; ${decHint}`],
  ] as const)("%j (%s): %s", (text, part, message) => {
    expect(() => sexagesimalDegrees(text, part as AnglePart)).toThrow(new TypeError(message));
  });

  test("the message names the argument as the caller calls it, and text that is not text is refused", () => {
    expect(() => sexagesimalDegrees("abc", "dec", "dec1")).toThrow(new TypeError(`dec1: "abc" has "a" where a number belongs; ${decHint}`));
    expect(() => sexagesimalDegrees(12 as unknown as string, "dec", "dec2")).toThrow(new TypeError("dec2 must be text"));
    expect(() => sexagesimalDegrees(12 as unknown as string, "ra")).toThrow(new TypeError("ra must be text"));
    expect(() => sexagesimalDegrees("95", "lat", "b")).toThrow(new RangeError('b: "95" is beyond ±90°: a latitude is −90° … +90°'));
  });
});

describe("sexagesimal text written: padding, signs and limits", () => {
  test.each([
    // degrees                          part    decimals   text             why (common practice: two digits a field, the fraction padded)
    [15 * (10 + 10 / 60 + 10.05 / 3600), "ra",  2,         "10:10:10.05",   "10 is written as two digits, and a fraction below .10 keeps its 0"],
    [9 + 9 / 60 + 9 / 3600,             "dec",  0,         "+09:09:09",     "below 10: one leading 0"],
    [0,                                  "dec",  1,         "+00:00:00.0",   "zero is north"],
    [-90,                                "dec",  9,         "-90:00:00.000000000", "the south pole, nine decimals"],
    [360,                                "ra",   1,         "00:00:00.0",    "360° is 0h"],
    [-360,                               "ra",   0,         "00:00:00",      "and −360°"],
    [15 * (1 + 2 / 60 + 3.004 / 3600),   "ra",   3,         "01:02:03.004",  "two leading zeros in the fraction"],
  ] as const)("%d° (%s, %d decimals) is %s: %s", (deg, part, decimals, text, _why) => {
    expect(sexagesimalText(deg, part, decimals)).toBe(text);
  });

  test.each([
    [() => sexagesimalText(Number.NaN, "ra"), TypeError, "degrees must be a number"],
    [() => sexagesimalText(Number.POSITIVE_INFINITY, "ra"), RangeError, "degrees must be finite"],
    [() => sexagesimalText(10, "ra", Number.NaN), TypeError, "decimals must be a number"],
    [() => sexagesimalText(10, "ra", -1), RangeError, "decimals = -1 must be a whole number 0 … 9"],
    [() => sexagesimalText(10, "dec", 9.5), RangeError, "decimals = 9.5 must be a whole number 0 … 9"],
    [() => sexagesimalText(-90.0001, "dec"), RangeError, "degrees = -90.0001 is beyond ±90°: a declination is −90 … 90"],
  ] as const)("refused: %s", (call, kind, message) => {
    expect(call).toThrow(new kind(message));
  });
});

describe("sky frames against astropy and the definitions", () => {
  test.each([
    // ICRS (α, δ)    galactic (l, b)                          supergalactic (SGL, SGB)   source: astropy 5.2.1 (Debian python3-astropy),
    //                SkyCoord(ra, dec, frame="icrs").galactic / .supergalactic; astropy's galactic frame is tied to FK5, ours to the
    //                Hipparcos ICRS realisation: they differ by milliarcseconds, far below the 1e-4° allowed here
    [0,   0,    96.33728336969006,  -60.188551946914465, 292.65873159188334, 13.230842015047623],
    [90,  0,    206.98913107543058, -11.424490966989566, 344.33493621110654, -69.23552778556946],
    [200, -40,  308.8496178181372,  22.543332210423067,  156.55491052330532, -5.3825669517675365],
    [10,  85,   122.66298820603654, 22.134226182094352,  21.260141226960943, 15.974739820237328],
  ])("(%d°, %d°) equatorial is (%d°, %d°) galactic and (%d°, %d°) supergalactic", (ra, dec, l, b, sgl, sgb) => {
    const g = convertSkyFrameDeg(ra, dec, "equatorial", "galactic");
    expect(Math.abs(g.lon - l)).toBeLessThanOrEqual(1e-4);
    expect(Math.abs(g.lat - b)).toBeLessThanOrEqual(1e-4);
    const s = convertSkyFrameDeg(ra, dec, "equatorial", "supergalactic");
    expect(Math.abs(s.lon - sgl)).toBeLessThanOrEqual(1e-4);
    expect(Math.abs(s.lat - sgb)).toBeLessThanOrEqual(1e-4);
    const back = convertSkyFrameDeg(s.lon, s.lat, "supergalactic", "galactic");
    expect(Math.abs(back.lon - g.lon)).toBeLessThanOrEqual(1e-9);
    expect(Math.abs(back.lat - g.lat)).toBeLessThanOrEqual(1e-9);
  });

  test("the ecliptic is the equator turned about the equinox by ε0 = 84381.406″ (IAU 2006): α = 90°, δ = 0 lies at β = −ε0", () => {
    const eps = eclipticObliquityJ2000Arcsec / 3600;
    const e = convertSkyFrameDeg(90, 0, "equatorial", "ecliptic");
    expect(Math.abs(e.lon - 90)).toBeLessThanOrEqual(1e-12);
    expect(Math.abs(e.lat + eps)).toBeLessThanOrEqual(1e-12);
    const m = skyFrameMatrix("ecliptic");
    const c = Math.cos((eps * Math.PI) / 180);
    const s = Math.sin((eps * Math.PI) / 180);
    [1, 0, 0, 0, c, s, 0, -s, c].forEach((v, i) => expect(Math.abs(m[i] - v), `element ${i}`).toBeLessThanOrEqual(1e-15));
    expect(skyFrameMatrix("equatorial")).toEqual([1, 0, 0, 0, 1, 0, 0, 0, 1]);
  });

  test("a longitude comes back in [0°, 360°), a negative input wrapped", () => {
    const g = convertSkyFrameDeg(-10, 20, "equatorial", "equatorial");
    expect(Math.abs(g.lon - 350)).toBeLessThanOrEqual(1e-12);
    expect(Math.abs(g.lat - 20)).toBeLessThanOrEqual(1e-12);
    expect(convertSkyFrameDeg(-1e-300, 0, "equatorial", "equatorial").lon).toBe(0);
  });

  test.each([
    [() => skyFrameMatrix("icrs" as never), TypeError, 'unknown frame "icrs": use equatorial, galactic, supergalactic, ecliptic'],
    [() => convertSkyFrameDeg(0, 0, "equatorial", "fk4" as never), TypeError, 'unknown frame "fk4": use equatorial, galactic, supergalactic, ecliptic'],
    [() => convertSkyFrameDeg(0, 0, "fk5" as never, "galactic"), TypeError, 'unknown frame "fk5": use equatorial, galactic, supergalactic, ecliptic'],
    [() => convertSkyFrameDeg(Number.NaN, 0, "equatorial", "galactic"), TypeError, "lon must be a number"],
    [() => convertSkyFrameDeg(0, 90.5, "equatorial", "galactic"), RangeError, "lat = 90.5° is outside −90° … 90°"],
    [() => galacticCoordinatesRad(Number.NaN, 0), TypeError, "ra must be a number"],
    [() => galacticCoordinatesRad(0, 2), RangeError, `dec = ${2 / (Math.PI / 180)}° is outside −90° … 90°`],
  ] as const)("refused: %s", (call, kind, message) => {
    expect(call).toThrow(new kind(message));
  });

  test("galactic coordinates in radians: the poles are accepted, l lies in [0, 2π)", () => {
    // the north galactic pole (192.85948°, 27.12825°, Hipparcos SP-1200 §1.5.3) has b = π/2
    const ngp = galacticCoordinatesRad((192.85948 * Math.PI) / 180, (27.12825 * Math.PI) / 180);
    expect(Math.abs(ngp.b - Math.PI / 2)).toBeLessThanOrEqual(1e-9);
    // the celestial pole, given a rounding beyond π/2, is at l = 122.93192° (the same source)
    const ncp = galacticCoordinatesRad(0, (Math.PI / 2) * (1 + 5e-16));
    expect(Math.abs(ncp.l - (122.93192 * Math.PI) / 180)).toBeLessThanOrEqual(1e-9);
    const scp = galacticCoordinatesRad(0, (-Math.PI / 2) * (1 + 5e-16));
    expect(Math.abs(scp.b + (27.12825 * Math.PI) / 180)).toBeLessThanOrEqual(1e-9);
    for (let ra = 0; ra < 7; ra += 0.01) {
      const { l } = galacticCoordinatesRad(ra, -0.3);
      expect(l >= 0 && l < 2 * Math.PI).toBe(true);
    }
  });
});

describe("separations near the poles keep their digits", () => {
  test.each([
    // lat          across the pole: (0°, lat) to (180°, lat) is 2 (90° − |lat|) (geometry), 90° − |lat| exact in binary (Sterbenz)
    [90 - 1e-10],
    [-(90 - 1e-10)],
    [89.9999],
    [-89.9999],
  ])("(0°, %d°) to (180°, the same) is twice its distance from the pole, to 1e-9 relative", (lat) => {
    const expected = 2 * (90 - Math.abs(lat));
    expect(Math.abs(angularSeparationDeg(0, lat, 180, lat) - expected) / expected).toBeLessThanOrEqual(1e-9);
    expect(Math.abs(angularSeparationDeg(90, lat, 270, lat) - expected) / expected).toBeLessThanOrEqual(1e-9);
  });

  test("each argument is named when refused", () => {
    expect(() => angularSeparationDeg(Number.NaN, 0, 0, 0)).toThrow(new TypeError("ra1 must be a number"));
    expect(() => angularSeparationDeg(0, Number.NaN, 0, 0)).toThrow(new TypeError("dec1 must be a number"));
    expect(() => angularSeparationDeg(0, 0, Number.NaN, 0)).toThrow(new TypeError("ra2 must be a number"));
    expect(() => angularSeparationDeg(0, 0, 0, -91)).toThrow(new RangeError("dec2 = -91° is outside −90° … 90°"));
  });
});
