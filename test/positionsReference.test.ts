/**
 * Positions against outside references, which start Python (left out of the mutation runs, as
 * test/astropy.test.ts is): the separation against a 40-digit evaluation (python3-mpmath), and
 * Angle parsing and formatting, SkyCoord separations and the sky frames against the reference
 * library (python3-astropy), with the realisation differences that remain stated and bounded.
 */
import { describe, expect, test } from "vitest";
import { angularSeparationDeg, convertSkyFrameDeg, sexagesimalDegrees, sexagesimalText, type SkyFrame } from "../core/index.js";
import { seededRandom } from "./helpers.js";
import { referenceAvailable, runPythonReference } from "./reference/python.js";
import { onFirstUse } from "./requirements.js";

const mas = 1 / 3.6e6; // degrees
const degree = Math.PI / 180;

/** Angular distance between two directions given in degrees, in mas (for comparing positions). */
function offsetMas(lon1: number, lat1: number, lon2: number, lat2: number): number {
  return angularSeparationDeg(lon1, lat1, lon2, lat2) / mas;
}

describe.runIf(referenceAvailable("mpmath", "python3-mpmath"))("separation against 40-digit spherical trigonometry (python3-mpmath)", () => {
  // pairs from 10 µas to 180°: tiny offsets in RA and Dec, near the pole, near antipodes
  const pairs: [number, number, number, number][] = [
    [10, 20, 10 + 1e-8, 20],                 // 0.036 mas in RA
    [10, 20, 10, 20 + 2.8e-9],               // 0.01 mas in Dec
    [250, -70, 250 + 1e-9, -70 + 2e-10],     // 0.001 mas
    [187.7, 12.4, 187.7 + 0.01 / 3600, 12.4 + 0.01 / 3600], // 0.01″
    [0, 89.9999, 180, 89.9999],              // across the pole
    [33, -45, 33 + 1 / 3600, -45 - 1 / 3600], // 1″
    [10, 20, 190, -20 + 1e-7],               // 0.36 mas short of 180°
    [10, 20, 190 + 1e-9, -20],               // antipodes within 4 µas
    [0, 0, 179.9999999, 0],                  // 0.36 mas short of 180° on the equator
    [300, -60, 60, 30],                      // a large angle
  ];
  const reply = onFirstUse(() =>
    runPythonReference<number[]>("mpmath_separation.py", { pairs }),
  );

  test("relative error ≤ 1e-14 at every pair, from 0.001 mas to 180° (across a pole too)", () => {
    let worst = 0;
    pairs.forEach(([ra1, dec1, ra2, dec2], i) => {
      const ours = angularSeparationDeg(ra1, dec1, ra2, dec2);
      const relative = Math.abs(ours / reply()[i] - 1);
      worst = Math.max(worst, relative);
      expect(relative, `pair ${i}: ${ours} vs ${reply()[i]}`).toBeLessThanOrEqual(1e-14);
    });
    console.log(`separation vs mpmath (40 digits): worst relative error ${worst.toExponential(1)}`);
  });
});

describe.runIf(referenceAvailable("astropy", "python3-astropy"))("against the reference library (python3-astropy)", () => {
  // a fixed grid: positions over the sphere (uniform in sin δ), texts and decimals
  const uniform = seededRandom(29);
  const random = Array.from({ length: 400 }, () => [360 * uniform(), Math.asin(2 * uniform() - 1) / degree] as [number, number]);
  const texts: [string, "hourangle" | "deg", "ra" | "dec"][] = [
    ["12:30:49.4", "hourangle", "ra"], ["12h30m49.4s", "hourangle", "ra"], ["12 30 49.4", "hourangle", "ra"], ["00:00:00.001", "hourangle", "ra"],
    ["23:59:59.999", "hourangle", "ra"], ["+12:23:28", "deg", "dec"], ["-05d07m", "deg", "dec"], ["−05°07′", "deg", "dec"], ["-00:30:00", "deg", "dec"],
    ["+89:59:59.99", "deg", "dec"], ["-89:59:59.99", "deg", "dec"], ["187d42m21s", "deg", "ra"], ["+12°23′28″", "deg", "dec"],
    ...random.slice(0, 100).map(([ra]) => [sexagesimalText(ra, "ra", 3), "hourangle", "ra"] as [string, "hourangle", "ra"]),
    ...random.slice(100, 200).map(([, dec]) => [sexagesimalText(dec, "dec", 3), "deg", "dec"] as [string, "deg", "dec"]),
  ];
  // formats: random angles away from the exact halves of the last digit (the two libraries' rounding of a tie is not compared)
  const formats: [number, "ra" | "dec", number][] = random.slice(0, 300).map(([ra, dec], i) => (i % 2 ? [ra, "ra", i % 5] : [dec, "dec", i % 5]));
  const pairs: [number, number, number, number][] = [
    ...random.slice(0, 200).map(([ra, dec], i) => [ra, dec, ...random[399 - i]] as [number, number, number, number]),
    ...random.slice(200, 300).map(([ra, dec], i) => [ra, dec, ra + 10 ** (-(i % 9) - 1), Math.max(-90, Math.min(90, dec + 10 ** (-(i % 7) - 2)))] as [number, number, number, number]),
    ...random.slice(300, 400).map(([ra, dec], i) => [ra, dec, (ra + 180 + 10 ** (-(i % 8) - 1)) % 360, -dec] as [number, number, number, number]),
  ];
  const groups: { from: string; to: string; ours: [SkyFrame, SkyFrame] }[] = [
    { from: "icrs", to: "hipparcos_galactic", ours: ["equatorial", "galactic"] },
    { from: "hipparcos_galactic", to: "icrs", ours: ["galactic", "equatorial"] },
    { from: "galactic", to: "supergalactic", ours: ["galactic", "supergalactic"] },
    { from: "supergalactic", to: "galactic", ours: ["supergalactic", "galactic"] },
    { from: "icrs", to: "hipparcos_supergalactic", ours: ["equatorial", "supergalactic"] },
    { from: "icrs", to: "custom_ecliptic", ours: ["equatorial", "ecliptic"] },
    { from: "custom_ecliptic", to: "icrs", ours: ["ecliptic", "equatorial"] },
    // other realisations, compared to state how far they are
    { from: "icrs", to: "galactic", ours: ["equatorial", "galactic"] },
    { from: "icrs", to: "supergalactic", ours: ["equatorial", "supergalactic"] },
    { from: "icrs", to: "mean_ecliptic", ours: ["equatorial", "ecliptic"] },
    { from: "icrs", to: "true_ecliptic", ours: ["equatorial", "ecliptic"] },
    { from: "icrs", to: "geocentric_mean_ecliptic", ours: ["equatorial", "ecliptic"] },
    { from: "icrs", to: "geocentric_true_ecliptic", ours: ["equatorial", "ecliptic"] },
  ];
  const reply = onFirstUse(() =>
    runPythonReference<{ parse: number[]; format: string[]; separation: number[]; frames: [number, number][][] }>("astropy_positions.py", {
      parse: texts.map(([text, unit]) => [text, unit]),
      format: formats,
      separation: pairs,
      frames: groups.map((g) => ({ from: g.from, to: g.to, points: random })),
    }),
  );
  const worstOf = (name: string) => {
    const group = groups.findIndex((g) => g.to === name.split(">")[1] && g.from === name.split(">")[0]);
    const [from, to] = groups[group].ours;
    return Math.max(...random.map(([lon, lat], i) => {
      const ours = convertSkyFrameDeg(lon, lat, from, to);
      const [l, b] = reply().frames[group][i];
      return offsetMas(ours.lon, ours.lat, l, b);
    }));
  };

  test("Angle parses every text alike within 1e-6 mas (hours and degrees, marks, colons, spaces, Unicode minus and primes)", () => {
    let worst = 0;
    texts.forEach(([text, , part], i) => {
      const difference = Math.abs(sexagesimalDegrees(text, part) - reply().parse[i]) / mas;
      worst = Math.max(worst, difference);
      expect(difference, text).toBeLessThanOrEqual(1e-6);
    });
    console.log(`astropy Angle parsing: ${texts.length} texts, worst ${worst.toExponential(1)} mas`);
  });

  test("Angle.to_string writes the same text for 300 angles (0 to 4 decimals, RA in hours, Dec signed)", () => {
    // astropy 5.2 with precision=0 carries seconds from 59 upwards into the minute (-63:35:00 for
    // −63°34′59.12″): with no decimals, texts whose seconds are 59 are not compared
    const astropyCarry = (text: string, decimals: number) => decimals === 0 && /:59$/.test(text);
    const compared = formats.filter(([deg, part, decimals]) => !astropyCarry(sexagesimalText(deg, part, decimals), decimals));
    const differ = formats.filter(([deg, part, decimals], i) => {
      const ours = sexagesimalText(deg, part, decimals);
      return !astropyCarry(ours, decimals) && ours !== reply().format[i];
    });
    console.log(`astropy Angle formatting: ${compared.length - differ.length} of ${compared.length} texts equal (${formats.length - compared.length} with 59 s and no decimals not compared)`);
    expect(compared.length).toBeGreaterThan(280);
    expect(differ).toEqual([]);
  });

  test("SkyCoord.separation agrees within 1e-6 mas over 400 pairs (random; 3.6 µas to 0.1° apart; near antipodes)", () => {
    let worst = 0;
    pairs.forEach(([ra1, dec1, ra2, dec2], i) => {
      const ours = angularSeparationDeg(ra1, dec1, ra2, dec2);
      const difference = Math.abs(ours - reply().separation[i]) / mas;
      worst = Math.max(worst, difference);
      expect(difference, `pair ${i}`).toBeLessThanOrEqual(1e-6);
    });
    console.log(`astropy separation: worst ${worst.toExponential(1)} mas`);
  });

  test.each([
    ["icrs>hipparcos_galactic", "the Hipparcos galactic frame built in astropy from the same pole and origin"],
    ["hipparcos_galactic>icrs", "and back"],
    ["galactic>supergalactic", "astropy's own supergalactic frame from its galactic one (same pole and origin)"],
    ["supergalactic>galactic", "and back"],
    ["icrs>hipparcos_supergalactic", "equatorial to supergalactic through the Hipparcos galactic frame"],
    ["icrs>custom_ecliptic", "CustomBarycentricEcliptic with the IAU 2006 obliquity (a rotation of the ICRS about x)"],
    ["custom_ecliptic>icrs", "and back"],
  ])("%s agrees within 1 mas over 400 positions: %s", (name) => {
    const worst = worstOf(name);
    console.log(`astropy ${name}: worst ${worst.toExponential(1)} mas`);
    expect(worst).toBeLessThanOrEqual(1);
  });

  test("other realisations differ by what they add: astropy's galactic by the FK5 frame bias and pole precision (≤ 30 mas), the dynamical J2000 ecliptic by the frame bias (≤ 30 mas), the true ecliptic by nutation (≤ 20″), the geocentric ones by annual aberration as well (≤ 45″)", () => {
    const report = [
      ["icrs>galactic", 30],
      ["icrs>supergalactic", 30],
      ["icrs>mean_ecliptic", 30],
      ["icrs>true_ecliptic", 20_000],
      ["icrs>geocentric_mean_ecliptic", 25_000],
      ["icrs>geocentric_true_ecliptic", 45_000],
    ] as const;
    for (const [name, bound] of report) {
      const worst = worstOf(name);
      console.log(`astropy ${name} (another realisation): worst ${worst.toFixed(1)} mas`);
      expect(worst, name).toBeLessThanOrEqual(bound);
      expect(worst, `${name} is a different realisation: it should differ`).toBeGreaterThan(1);
    }
  });
});
