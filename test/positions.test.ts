/**
 * Positions: sexagesimal text read and written (COORD_DEG, COORD_TEXT, and wherever a right ascension
 * or declination is taken), the great-circle separation (SEPARATION) and the rotations between sky
 * frames (COORD_CONVERT, and the CMB dipole's apex in REDSHIFT_CMB). Values from the definitions, the
 * published Hipparcos matrix, and identities over random inputs (fast-check); the outside references
 * (python3-mpmath, python3-astropy) are in positionsReference.test.ts.
 */
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import {
  angularSeparationDeg,
  convertSkyFrameDeg,
  eclipticObliquityJ2000Arcsec,
  sexagesimalDegrees,
  sexagesimalText,
  skyFrameMatrix,
  skyFrames,
  type SkyFrame,
} from "../core/index.js";
import { CellError } from "../functions/cellError.js";
import { formatValue } from "../functions/messages.js";
import { adviseOnError } from "../taskpane/errorAdvice.js";
import { explainFormula } from "../taskpane/explainCall.js";
import { definitions } from "../functions/definitions.js";
import { sheetCalls } from "./sheetCalls.js";

const active = { spec: "P18-BAO", stored: false };
const { run: sheet, one } = sheetCalls(active.spec);
const mas = 1 / 3.6e6; // degrees
const degree = Math.PI / 180;

/** Angular distance between two directions given in degrees, in mas (for comparing positions). */
function offsetMas(lon1: number, lat1: number, lon2: number, lat2: number): number {
  return angularSeparationDeg(lon1, lat1, lon2, lat2) / mas;
}

describe("sexagesimal text is read as the trade writes it", () => {
  test.each([
    // text              part    degrees                          source
    ["12:30:49.4",      "ra",   15 * (12 + 30 / 60 + 49.4 / 3600), "15° an hour of RA (common practice)"],
    ["12h30m49.4s",     "ra",   15 * (12 + 30 / 60 + 49.4 / 3600), "the same with h m s marks"],
    ["12 30 49.4",      "ra",   15 * (12 + 30 / 60 + 49.4 / 3600), "the same with spaces"],
    ["12h 30m 49.4s",   "ra",   15 * (12 + 30 / 60 + 49.4 / 3600), "marks and spaces"],
    ["00:00:00",        "ra",   0,                                 "the equinox"],
    ["23:59:59.999",    "ra",   360 - 0.001 / 240,                 "the last thousandth of a second"],
    ["187d42m21s",      "ra",   187 + 42 / 60 + 21 / 3600,         "an RA marked in degrees stays degrees"],
    ["12.5d",           "ra",   12.5,                              "a single number marked d is degrees"],
    ["12.5h",           "ra",   187.5,                             "a single number marked h is hours"],
    ["12.5",            "ra",   12.5,                              "a single unmarked number is decimal degrees, in a right ascension too"],
    ["12.5",            "dec",  12.5,                              "a single unmarked number is decimal degrees"],
    ["12:30",           "ra",   187.5,                             "hours and minutes"],
    ["+12:23:28",       "dec",  12 + 23 / 60 + 28 / 3600,          "degrees, arcminutes, arcseconds"],
    ["-05d07m",         "dec",  -(5 + 7 / 60),                     "d and m marks"],
    ["−05°07′",         "dec",  -(5 + 7 / 60),                     "Unicode minus (U+2212), degree and prime"],
    ["−05°07′30″",      "dec",  -(5 + 7 / 60 + 30 / 3600),         "and double prime"],
    ["+12°23'28\"",     "dec",  12 + 23 / 60 + 28 / 3600,          "ASCII apostrophe and quote"],
    ["+12°23'28''",     "dec",  12 + 23 / 60 + 28 / 3600,          "two apostrophes for seconds"],
    ["-00:30:00",       "dec",  -0.5,                              "the sign of a declination between 0° and −1° is kept"],
    ["12 23 28",        "dec",  12 + 23 / 60 + 28 / 3600,          "no sign is north"],
    ["-90:00:00",       "dec",  -90,                               "the south pole"],
    ["-10:00:00",       "lon",  350,                               "a negative longitude of another frame wraps"],
  ] as const)("%s (%s) is %d°: %s", (text, part, expected, _source) => {
    expect(Math.abs(sexagesimalDegrees(text, part) - expected)).toBeLessThanOrEqual(1e-12);
  });

  test.each([
    // text             part    the message names
    ["12:75:00",       "ra",   'ra: "12:75:00" has minutes 75: minutes and seconds must be below 60'],
    ["12:30:60",       "ra",   'ra: "12:30:60" has seconds 60: minutes and seconds must be below 60'],
    ["+12:63:28",      "dec",  'dec: "+12:63:28" has arcminutes 63: minutes and seconds must be below 60'],
    ["+-12:30",        "dec",  'dec: "+-12:30" has two signs: give one + or − before the first field'],
    ["−-05°07′",       "dec",  'dec: "−-05°07′" has two signs: give one + or − before the first field'],
    ["12 -30",         "dec",  'dec: "12 -30" has a sign inside it: give one + or − before the first field'],
    ["24:00:00",       "ra",   'ra: "24:00:00" has hours 24: a right ascension is below 24h (mark degrees with d or °)'],
    ["-01:00:00",      "ra",   'ra: "-01:00:00" has a sign: a right ascension is 0h … 24h with no sign'],
    ["12h30m",         "dec",  'dec: "12h30m" is in hours: a declination is in degrees (use d or °, or colons)'],
    ["12.5:30",        "ra",   "has decimals before its last field"],
    ["1:2:3:4",        "ra",   "has more than three fields"],
    ["12:30:",         "ra",   'ends with ":"'],
    ["12::30",         "ra",   'has ":" where a number belongs'],
    ["12h30x",         "ra",   `has "x" where m, ′ or ', ":" or a space belongs; write hours as 12:30:49.4, 12h30m49.4s or 12 30 49.4`],
    ["abc",            "dec",  'has "a" where a number belongs; write degrees as +12:23:28, -05d07m or −05°07′'],
    ["",               "ra",   '"" is not an angle'],
    ["400d",           "ra",   "is 400°: a right ascension is below 360°"],
  ] as const)("%s (%s) is refused: %s", (text, part, message) => {
    expect(() => sexagesimalDegrees(text, part)).toThrow(TypeError);
    expect(() => sexagesimalDegrees(text, part)).toThrow(message);
  });

  test.each([
    // text             part    whole message: a well-written angle beyond the pole is out of the domain (RangeError, #NUM!), as a number there is
    ["+95:00:00",      "dec",  'dec: "+95:00:00" is beyond ±90°: a declination is −90° … +90°'],
    ["90:00:00.1",     "dec",  'dec: "90:00:00.1" is beyond ±90°: a declination is −90° … +90°'],
    ["-95d",           "lat",  'lat: "-95d" is beyond ±90°: a latitude is −90° … +90°'],
  ] as const)("%s (%s) is refused: %s", (text, part, message) => {
    expect(() => sexagesimalDegrees(text, part)).toThrow(new RangeError(message));
  });
});

describe("sexagesimal text is written with one rounding, never 60", () => {
  test.each([
    // degrees                       part    decimals   text              why
    [187.70583333333335,            "ra",   undefined, "12:30:49.40",    "the issue's example (default 2 decimals)"],
    [12 + 23 / 60 + 28 / 3600,      "dec",  undefined, "+12:23:28.0",    "the issue's example (default 1 decimal)"],
    [-5.116666666666666,            "dec",  undefined, "-05:07:00.0",    "south"],
    [-0.5,                          "dec",  0,         "-00:30:00",      "the sign of −0.5° is written"],
    [-1e-9,                         "dec",  1,         "+00:00:00.0",    "rounded to zero: no minus"],
    [360 - 0.001 / 240,             "ra",   2,         "00:00:00.00",    "23:59:59.999 rounds up to 24h, which wraps to 0h"],
    [15 * (1 + 59 / 60 + 59.996 / 3600), "ra", 2,      "02:00:00.00",    "59.996 s carries into the hour"],
    [10 + 59 / 60 + 59.96 / 3600,   "dec",  1,         "+11:00:00.0",    "59.96″ carries into the degree"],
    [-(10 + 59 / 60 + 59.96 / 3600), "dec", 1,         "-11:00:00.0",    "and south"],
    [-10,                           "ra",   0,         "23:20:00",       "a negative RA wraps"],
    [90,                            "dec",  3,         "+90:00:00.000",  "the pole"],
  ] as const)("%d° (%s, %s decimals) is %s: %s", (deg, part, decimals, text, _why) => {
    expect(sexagesimalText(deg, part, decimals)).toBe(text);
  });

  test("no text shows 60 seconds or 60 minutes, for any angle and any number of decimals (fast-check)", () => {
    fc.assert(
      fc.property(fc.double({ min: -90, max: 90, noNaN: true }), fc.integer({ min: 0, max: 9 }), fc.constantFrom("ra", "dec"), (x, decimals, part) => {
        const [, minutes, seconds] = sexagesimalText(part === "ra" ? x * 4 : x, part as "ra" | "dec", decimals).split(":");
        return Number(minutes) < 60 && Number(seconds) < 60;
      }),
      { numRuns: 20_000, seed: 29 },
    );
  });

  test("values at the edge of a carry never show 60 (RA and Dec, 0 to 3 decimals)", () => {
    for (let decimals = 0; decimals <= 3; decimals++) {
      for (let s = 59; s < 60; s += 0.0001) {
        for (const [deg, part] of [[15 * (5 + 59 / 60 + s / 3600), "ra"], [-(5 + 59 / 60 + s / 3600), "dec"]] as const) {
          const text = sexagesimalText(deg, part, decimals);
          expect(text, `${deg} ${part} ${decimals}`).not.toMatch(/:60/);
        }
      }
    }
  });

  test("COORD_TEXT∘COORD_DEG gives back the text it read, at every decimal count (fast-check)", () => {
    const two = (x: number) => String(x).padStart(2, "0");
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 23 }), fc.integer({ min: 0, max: 59 }), fc.integer({ min: 0, max: 59 }),
        fc.integer({ min: 0, max: 10 ** 6 - 1 }), fc.integer({ min: 0, max: 6 }), fc.integer({ min: -89, max: 89 }),
        (h, m, s, f, decimals, d) => {
          const fraction = decimals === 0 ? "" : `.${String(f % 10 ** decimals).padStart(decimals, "0")}`;
          const ra = `${two(h)}:${two(m)}:${two(s)}${fraction}`;
          const dec = `${d < 0 ? "-" : "+"}${two(Math.abs(d))}:${two(m)}:${two(s)}${fraction}`;
          expect(sexagesimalText(sexagesimalDegrees(ra, "ra"), "ra", decimals)).toBe(ra);
          expect(sexagesimalText(sexagesimalDegrees(dec, "dec"), "dec", decimals)).toBe(dec);
        },
      ),
      { numRuns: 5000, seed: 29 },
    );
  });

  test("COORD_DEG∘COORD_TEXT is within half the last digit written (fast-check)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 359.999999, noNaN: true }), fc.double({ min: -90, max: 90, noNaN: true }), fc.integer({ min: 0, max: 6 }), (ra, dec, decimals) => {
        const half = 0.5 * 10 ** -decimals;
        const raBack = sexagesimalDegrees(sexagesimalText(ra, "ra", decimals), "ra");
        const dRa = ((raBack - ra + 540) % 360) - 180;
        expect(Math.abs(dRa) * 240).toBeLessThanOrEqual(half * (1 + 1e-9) + 1e-9); // seconds of time
        expect(Math.abs(sexagesimalDegrees(sexagesimalText(dec, "dec", decimals), "dec") - dec) * 3600).toBeLessThanOrEqual(half * (1 + 1e-9) + 1e-9);
      }),
      { numRuns: 5000, seed: 29 },
    );
  });

  test("decimals outside 0 … 9 or not whole, and a declination beyond ±90°, are refused", () => {
    expect(() => sexagesimalText(10, "ra", 10)).toThrow("decimals = 10 must be a whole number 0 … 9");
    expect(() => sexagesimalText(10, "ra", 1.5)).toThrow(RangeError);
    expect(() => sexagesimalText(90.0001, "dec")).toThrow("degrees = 90.0001 is beyond ±90°");
  });
});

describe("separation: the great circle, accurate at every angle", () => {
  test.each([
    // ra1   dec1    ra2     dec2     degrees   source
    [0,      0,      90,     0,       90,       "a quarter of the equator (geometry)"],
    [0,      0,      180,    0,       180,      "antipodes on the equator"],
    [10,     20,     190,    -20,     180,      "antipodes anywhere"],
    [0,      90,     123,    -90,     180,      "pole to pole"],
    [0,      89,     180,    89,      2,        "across the pole"],
    [45,     0,      45,     30,      30,       "along a meridian"],
    [0,      60,     90,     60,      2 * Math.asin(Math.cos(60 * degree) * Math.sin(45 * degree)) / degree, "the chord on a parallel: 2 asin(cos δ sin(Δα/2)) (geometry)"],
  ])("(%d°, %d°) to (%d°, %d°) is %d°: %s", (ra1, dec1, ra2, dec2, expected, _source) => {
    expect(Math.abs(angularSeparationDeg(ra1, dec1, ra2, dec2) - expected)).toBeLessThanOrEqual(1e-12);
  });

  test("symmetric, between 0° and 180°, |Δδ| on a meridian, and the triangle inequality hold for random positions (fast-check)", () => {
    const position = fc.tuple(fc.double({ min: 0, max: 360, noNaN: true }), fc.double({ min: -90, max: 90, noNaN: true }));
    fc.assert(
      fc.property(position, position, position, ([a1, d1], [a2, d2], [a3, d3]) => {
        const s12 = angularSeparationDeg(a1, d1, a2, d2);
        expect(Math.abs(angularSeparationDeg(a2, d2, a1, d1) - s12)).toBeLessThanOrEqual(1e-13);
        expect(s12).toBeGreaterThanOrEqual(0);
        expect(s12).toBeLessThanOrEqual(180);
        expect(Math.abs(angularSeparationDeg(a1, d1, a1, d2) - Math.abs(d2 - d1))).toBeLessThanOrEqual(1e-13);
        expect(s12).toBeLessThanOrEqual(angularSeparationDeg(a1, d1, a3, d3) + angularSeparationDeg(a3, d3, a2, d2) + 1e-13);
      }),
      { numRuns: 5000, seed: 29 },
    );
  });
});

describe("sky frames", () => {
  test("the galactic rotation is the transpose of the Hipparcos matrix A_G to 1e-10 (ESA 1997, Vol. 1, eq. 1.5.11, 10 digits, from memory)", () => {
    const aG = [
      [-0.0548755604, +0.4941094279, -0.867666149],
      [-0.8734370902, -0.44482963, -0.1980763734],
      [-0.4838350155, +0.7469822445, +0.4559837762],
    ];
    const m = skyFrameMatrix("galactic");
    for (let r = 0; r < 3; r++) for (let c = 0; c < 3; c++) expect(Math.abs(m[3 * r + c] - aG[c][r]), `${r},${c}`).toBeLessThanOrEqual(1e-10);
  });

  test.each([
    // lon        lat        from             to               lon'       lat'      source
    [192.85948,  27.12825,  "equatorial",    "galactic",      NaN,       90,       "the north galactic pole (Hipparcos, ESA 1997 §1.5.3)"],
    [0,          90,        "equatorial",    "galactic",      122.93192, 27.12825, "the north celestial pole: l_NCP and b = δ_NGP by definition"],
    [137.37,     0,         "galactic",      "supergalactic", 0,         0,        "the supergalactic origin (de Vaucouleurs et al. 1991; Lahav et al. 2000)"],
    [47.37,      6.32,      "galactic",      "supergalactic", NaN,       90,       "the north supergalactic pole"],
    [0,          90,        "galactic",      "supergalactic", 90,        6.32,     "the north galactic pole at SGL = 90°, SGB = b of the SG pole (geometry of the definition)"],
    [0,          0,         "equatorial",    "ecliptic",      0,         0,        "the equinox"],
    [90,         0,         "equatorial",    "ecliptic",      90,        -eclipticObliquityJ2000Arcsec / 3600, "the equator's highest point below the ecliptic by ε0"],
    [0,          90,        "equatorial",    "ecliptic",      90,        90 - eclipticObliquityJ2000Arcsec / 3600, "the celestial pole at ecliptic longitude 90°, latitude 90° − ε0"],
    [270,        90 - 84381.406 / 3600, "equatorial", "ecliptic", NaN,  90,       "the north ecliptic pole (ε0 = 84381.406″, IAU 2006)"],
  ] as const)("(%d°, %d°) %s → %s is (%d°, %d°): %s", (lon, lat, from, to, lon2, lat2, _source) => {
    const out = convertSkyFrameDeg(lon, lat, from, to);
    expect(Math.abs(out.lat - lat2)).toBeLessThanOrEqual(1e-9);
    if (!Number.isNaN(lon2)) expect(Math.abs(((out.lon - lon2 + 540) % 360) - 180)).toBeLessThanOrEqual(1e-9);
  });

  test("there and back, and through a third frame, agree within 1 µas for random positions and every pair of frames (fast-check)", () => {
    const frame = fc.constantFrom(...skyFrames);
    fc.assert(
      fc.property(fc.double({ min: 0, max: 359.999, noNaN: true }), fc.double({ min: -89.999, max: 89.999, noNaN: true }), frame, frame, frame, (lon, lat, a, b, c) => {
        const there = convertSkyFrameDeg(lon, lat, a, b);
        const back = convertSkyFrameDeg(there.lon, there.lat, b, a);
        expect(offsetMas(lon, lat, back.lon, back.lat)).toBeLessThanOrEqual(1e-3);
        const via = convertSkyFrameDeg(convertSkyFrameDeg(lon, lat, a, c).lon, convertSkyFrameDeg(lon, lat, a, c).lat, c, b);
        expect(offsetMas(there.lon, there.lat, via.lon, via.lat)).toBeLessThanOrEqual(1e-3);
        expect(there.lon).toBeGreaterThanOrEqual(0);
        expect(there.lon).toBeLessThan(360);
        expect(Math.abs(there.lat)).toBeLessThanOrEqual(90);
      }),
      { numRuns: 3000, seed: 29 },
    );
  });

  test("a rotation keeps separations: two sources are as far apart in every frame (fast-check)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 360, noNaN: true }), fc.double({ min: -90, max: 90, noNaN: true }),
        fc.double({ min: 0, max: 360, noNaN: true }), fc.double({ min: -90, max: 90, noNaN: true }), fc.constantFrom(...skyFrames),
        (l1, b1, l2, b2, to) => {
          const p = convertSkyFrameDeg(l1, b1, "equatorial", to);
          const q = convertSkyFrameDeg(l2, b2, "equatorial", to);
          expect(Math.abs(offsetMas(l1, b1, l2, b2) - offsetMas(p.lon, p.lat, q.lon, q.lat))).toBeLessThanOrEqual(1e-3);
        },
      ),
      { numRuns: 2000, seed: 29 },
    );
  });

  test("an unknown frame and a latitude beyond 90° are refused", () => {
    expect(() => convertSkyFrameDeg(0, 0, "fk4" as SkyFrame, "galactic")).toThrow('unknown frame "fk4"');
    expect(() => convertSkyFrameDeg(0, 0, "galactic", "icrs" as SkyFrame)).toThrow('unknown frame "icrs"');
    expect(() => convertSkyFrameDeg(0, 91, "galactic", "equatorial")).toThrow(RangeError);
  });
});

describe("the sheet: text in every position argument, ranges, blanks and errors", () => {
  test("COORD_DEG reads a row of parts against two columns of text, and blank in is blank out", () => {
    const out = sheet("COORD_DEG", [["12:30:49.4", "+12:23:28"], ["", "−05°07′"], [187.5, -5]], [["ra", "dec"]]);
    // 15 × (12 + 30/60 + 49.4/3600) and 12 + 23/60 + 28/3600; −(5 + 7/60) (sexagesimal, common practice)
    expect(out[0][0]).toBeCloseTo(187.70583333333333, 12);
    expect(out[0][1]).toBeCloseTo(12.391111111111111, 12);
    expect(out[1][0]).toBe("");
    expect(out[1][1]).toBeCloseTo(-5.116666666666667, 12);
    expect(out[2]).toEqual([187.5, -5]);
  });

  test.each([
    // call                                             kind     message
    [["COORD_DEG", "+12:63:28", "dec"],                 "value", 'ZC.COORD_DEG: text: "+12:63:28" has arcminutes 63: minutes and seconds must be below 60'],
    [["COORD_DEG", "+-12:30", "dec"],                   "value", 'ZC.COORD_DEG: text: "+-12:30" has two signs: give one + or − before the first field'],
    [["COORD_DEG", "+95:00:00", "dec"],                 "num",   'ZC.COORD_DEG: text: "+95:00:00" is beyond ±90°: a declination is −90° … +90°'],
    [["COORD_DEG", 95, "dec"],                          "num",   "ZC.COORD_DEG: text = 95° is beyond ±90°: a declination is −90° … +90°"],
    [["COORD_DEG", "12:30", "az"],                      "value", 'ZC.COORD_DEG: part: "az" is not one of ra, dec'],
    [["SEPARATION", "12:30:49.4", "+12:75:00", 0, 0],   "value", 'ZC.SEPARATION: dec1: "+12:75:00" has arcminutes 75: minutes and seconds must be below 60'],
    [["SEPARATION", 0, 95, 0, 0],                       "num",   "ZC.SEPARATION: dec1 = 95° is beyond ±90°: a declination is −90° … +90°"],
    [["SEPARATION", 0, "+95:00:00", 0, 0],              "num",   'ZC.SEPARATION: dec1: "+95:00:00" is beyond ±90°: a declination is −90° … +90°'],
    [["REDSHIFT_CMB", 0.1, 10, 95],                     "num",   "ZC.REDSHIFT_CMB: dec = 95° is beyond ±90°: a declination is −90° … +90°"],
    [["REDSHIFT_CMB", 0.1, 10, -2, "rad"],              "num",   "ZC.REDSHIFT_CMB: dec = -2 rad is beyond ±90°: a declination is −90° … +90°"],
    [["COORD_CONVERT", 10, -91, "galactic", "equatorial", "lon"], "num", "ZC.COORD_CONVERT: lat = -91° is beyond ±90°: a latitude is −90° … +90°"],
    [["REDSHIFT_CMB", 0.1, "25:00:00", 10],             "value", 'ZC.REDSHIFT_CMB: ra: "25:00:00" has hours 25: a right ascension is below 24h (mark degrees with d or °)'],
    [["COORD_CONVERT", 10, 10, "fk5", "galactic", "lon"], "value", 'ZC.COORD_CONVERT: from_frame: "fk5" is not one of equatorial, galactic, supergalactic, ecliptic'],
    [["COORD_TEXT", 10, "dec", 12],                     "num",   "ZC.COORD_TEXT: decimals = 12 is above 9 (nine decimals)"],
    [["COORD_TEXT", true, "dec"],                     "value", "ZC.COORD_TEXT: degrees: TRUE where a number belongs"],
  ] as const)("%j is #%s", (call, kind, message) => {
    const [name, ...args] = call;
    const cell = one(name, ...args) as CellError;
    expect(cell).toBeInstanceOf(CellError);
    expect(cell.kind).toBe(kind);
    expect(cell.message).toBe(message);
  });

  test("a column of positions reads each cell as one cell alone would (text, number text, numbers, blanks, errors)", () => {
    const cells: unknown[] = ["12:30:49.4", "187.5", "-12.5", "+12.5", "1e2", " 12 30 49.4 ", "25:00:00", "", 187.5, "abc", "+12:63:00", "400", "95", "-05d07m", true];
    const calls: [string, (c: unknown) => unknown[]][] = [
      ["SEPARATION", (c) => [c, 10, 0, 0]],
      ["SEPARATION", (c) => [0, c, 0, 0]],
      ["REDSHIFT_CMB", (c) => [0.1, c, 10]],
      ["REDSHIFT_CMB", (c) => [0.1, 10, c, "hourangle"]],
      ["COORD_CONVERT", (c) => [c, 10, "galactic", "equatorial", "lat"]],
      ["COORD_CONVERT", (c) => [c, 10, "equatorial", "galactic", "lat"]],
      ["COORD_CONVERT", (c) => [10, c, "ecliptic", "galactic", "lon"]],
      ["COORD_DEG", (c) => [c, "dec"]],
    ];
    for (const [name, args] of calls) {
      const column = sheet(name, ...args(cells.map((c) => [c])));
      cells.forEach((c, i) => {
        const alone = one(name, ...args(c));
        const label = `${name}(${JSON.stringify(args(c))})`;
        if (typeof alone === "number") expect(Math.abs((column[i][0] as number) - alone), label).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(alone)));
        else expect(column[i][0], label).toEqual(alone);
      });
    }
  });

  test("COORD_TEXT writes a column of degrees, and reads sexagesimal text to write it again", () => {
    expect(sheet("COORD_TEXT", [[187.70583333333333], [0]], "ra")).toEqual([["12:30:49.40"], ["00:00:00.00"]]);
    expect(one("COORD_TEXT", "12h30m49.4s", "ra", 1)).toBe("12:30:49.4");
    expect(one("COORD_TEXT", "−05°07′", "dec", "")).toBe("-05:07:00.0");
  });

  test("SEPARATION takes text or degrees alike, in arcsec by default", () => {
    const text = one("SEPARATION", "12:30:49.4", "+12:23:28", "12:30:49.5", "+12:23:29") as number;
    const numbers = one("SEPARATION", sexagesimalDegrees("12:30:49.4", "ra"), sexagesimalDegrees("+12:23:28", "dec"), sexagesimalDegrees("12:30:49.5", "ra"), sexagesimalDegrees("+12:23:29", "dec")) as number;
    expect(text).toBe(numbers);
    // 0.1 s of RA at δ ≈ 12.39° is 1.5″ cos δ; with 1″ in Dec: √((1.5 cos δ)² + 1) (flat-sky, common practice)
    expect(Math.abs(text - Math.hypot(1.5 * Math.cos(12.3912 * degree), 1))).toBeLessThanOrEqual(1e-5);
    expect(one("SEPARATION", 0, 0, 180, 0, "deg")).toBe(180);
  });

  test("COORD_CONVERT gives both parts with a row {\"lon\",\"lat\"} and reads an equatorial RA in hours", () => {
    const out = sheet("COORD_CONVERT", [["17:45:37.2"], ["12:51:26.28"]], [["-28:56:10"], ["+27:07:42.0"]], "equatorial", "galactic", [["lon", "lat"]]);
    expect(out.length).toBe(2);
    const direct = convertSkyFrameDeg(sexagesimalDegrees("17:45:37.2", "ra"), sexagesimalDegrees("-28:56:10", "dec"), "equatorial", "galactic");
    expect(out[0]).toEqual([direct.lon, direct.lat]);
    expect(out[1][1]).toBeGreaterThan(89.99); // the galactic pole's neighbourhood
    // a galactic longitude given as text is degrees, not hours
    expect(one("COORD_CONVERT", "120:00:00", 0, "galactic", "galactic", "lon")).toBeCloseTo(120, 12);
  });

  test("REDSHIFT_CMB reads sexagesimal RA and Dec, and the angle unit hourangle makes an RA number hours (Dec stays degrees)", () => {
    const ra = sexagesimalDegrees("12:30:49.4", "ra");
    const dec = sexagesimalDegrees("+12:23:28", "dec");
    const expected = one("REDSHIFT_CMB", 0.1, ra, dec) as number;
    expect(one("REDSHIFT_CMB", 0.1, "12:30:49.4", "+12:23:28")).toBe(expected);
    expect(one("REDSHIFT_CMB", 0.1, "12h30m49.4s", "+12°23′28″")).toBe(expected);
    expect(Math.abs((one("REDSHIFT_CMB", 0.1, ra / 15, dec, "hourangle") as number) - expected)).toBeLessThanOrEqual(1e-15);
    expect(Math.abs((one("REDSHIFT_CMB", 0.1, ra * degree, dec * degree, "rad") as number) - expected)).toBeLessThanOrEqual(1e-15);
    // a range of text positions, with a blank row
    const out = sheet("REDSHIFT_CMB", 0.1, [["12:30:49.4"], [""], ["00:00:00"]], [["+12:23:28"], ["+10:00:00"], ["-05d07m"]]);
    expect(out[0][0]).toBe(expected);
    expect(out[1][0]).toBe("");
    expect(typeof out[2][0]).toBe("number");
  });
});

describe("the inspector explains a position call and its errors", () => {
  test("SEPARATION of two texts: the equation, the arguments and the result in arcsec", async () => {
    const [call] = await explainFormula('=ZC.SEPARATION("12:30:49.4","+12:23:28",B2,"+12:23:29")', async () => ({ cells: 1, values: [["12:30:49.5"]] }), active);
    expect(call.summary).toBe("angular separation of two positions (great circle)");
    expect(call.equation).toContain("atan2");
    expect(call.args.map((a) => a.value)).toEqual(['"12:30:49.4"', '"+12:23:28"', '"12:30:49.5"', '"+12:23:29"', 'default "arcsec"']);
    expect(call.result).toBe(`${formatValue(one("SEPARATION", "12:30:49.4", "+12:23:28", "12:30:49.5", "+12:23:29") as number)} arcsec`);
  });

  test("a malformed declination names dec1 and says how to write a position", async () => {
    const [call] = await explainFormula('=ZC.SEPARATION("12:30:49.4","+12:75:00",0,0)', async () => ({ cells: 1, values: [[""]] }), active);
    expect(call.isError).toBe(true);
    expect(call.fault?.argument).toBe("dec1");
    expect(call.fault?.fix).toContain("sexagesimal text: a right ascension in hours (12:30:49.4");
    expect(adviseOnError(definitions.COORD_CONVERT, "value", 'ZC.COORD_CONVERT: lon: "12:75" has minutes 75').argument).toBe("lon");
  });
});

describe("hostile text in a position cell (a workbook is a stranger's)", () => {
  const hostile = [
    "9".repeat(400), `12:30:${"4".repeat(1000)}.5`, "1".repeat(5_000_000), " ".repeat(1000), "\u0000", "12:30:49\u0000", "🙂", "12\n30\n49",
    "=HYPERLINK(\"x\")", "12:30:49.4".repeat(1000), "+".repeat(100_000), "Infinity", "NaN", "-0", "0x1F", "1e400",
  ];

  test.each(hostile.map((t) => [t.length > 30 ? `${t.slice(0, 30)}… (${t.length} characters)` : JSON.stringify(t), t]))("%s gives a number or a short #VALUE!, quickly", (_label, text) => {
    const t0 = performance.now();
    for (const [name, args] of [
      ["COORD_DEG", [text, "dec"]],
      ["SEPARATION", [text, 0, 0, text]],
      ["REDSHIFT_CMB", [0.1, text, text]],
      ["COORD_CONVERT", [text, text, "galactic", "equatorial", "lon"]],
    ] as const) {
      const cell = one(name, ...args);
      if (cell instanceof CellError) {
        expect(["value", "num"]).toContain(cell.kind);
        expect(cell.message.length, cell.message.slice(0, 200)).toBeLessThanOrEqual(300);
      } else {
        expect(typeof cell === "number" && Number.isFinite(cell), `${name}: ${String(cell)}`).toBe(true);
      }
    }
    expect(performance.now() - t0).toBeLessThan(500);
  });
});
