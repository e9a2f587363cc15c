/**
 * What a cell tells a person who typed something almost right: each message whole, in the sheet's
 * language (the ZC function and argument typed, values in the user's unit, the fix), and a stranger's
 * text quoted at most 40 characters with its length. The messages are our own; the unit spellings
 * follow the FITS Standard 4.0 (Pence et al. 2010, A&A 524, A42), §4.3 and Tables 3–5.
 */
import { readFileSync } from "node:fs";
import { describe, expect, test } from "vitest";
import { CellError } from "../functions/cellError.js";
import { definitions } from "../functions/definitions.js";
import { evaluate, type Cell } from "../functions/evaluate.js";
import { choiceKey } from "../functions/readArguments.js";

type Metadata = { functions: { name: string; parameters: { name: string; description: string }[] }[] };
const metadata = JSON.parse(readFileSync(new URL("./fixtures/functions.metadata.json", import.meta.url), "utf8")) as Metadata;

const active = { spec: "P18-CMB", stored: false };
const one = (name: string, ...args: unknown[]): Cell => evaluate(definitions[name], args, active)[0][0];
const errorOf = (cell: Cell) => (cell instanceof CellError ? { kind: cell.kind, message: cell.message } : cell);

/** Calls and the whole error each gives: [call, kind, message]. */
type Row = [call: [string, ...unknown[]], kind: "value" | "num" | "na", message: string];
/** A call as a test's title shows it: long texts cut. */
const label = ([name, ...args]: [string, ...unknown[]]) =>
  `${name}(${args.map((a) => (typeof a === "string" && a.length > 40 ? `"${a.slice(0, 12)}…" (${a.length} characters)` : JSON.stringify(a))).join(", ")})`;
const table = (rows: Row[]) =>
  test.each(rows.map(([call, kind, message]) => [label(call), kind, call, message] as const))("%s gives #%s", (_label, kind, call, message) => {
    const [name, ...args] = call;
    expect(errorOf(one(name, ...args))).toEqual({ kind, message });
  });

const keys = "H0, Om, OL, Ok, Ob, w0, wa, Tcmb, Neff, mnu";

describe("h70 and other powers of h a unit cannot mean", () => {
  // the survey notations of h scaled to H0 = 70 (common practice): the same fix as h70, never "did you mean Mpc/h?"
  const survey = (written: string) => `zcell's h is H0/100 (as in Mpc/h), and ${written} is not a unit zcell reads: give the values in a unit without h (e.g. Mpc) and the model`;
  const h70 = `zcell's h is H0/100 (as in Mpc/h), and "h70" would be h to the power 70; h70 = H0/70 is not a unit zcell reads: give the values in a unit without h (e.g. Mpc) and the model`;
  table([
    [["DIST_LUM", 0.5, null, "Mpc/h70"],   "value", `ZC.DIST_LUM: unit: "Mpc/h70": ${h70}`],
    [["CONVERT", 1, "Mpc/h70", "Mpc"],     "value", `ZC.CONVERT: from: "Mpc/h70": ${h70}`],
    [["DIST_LUM", 0.5, null, "h70-1 Mpc"], "value", `ZC.DIST_LUM: unit: "h70-1 Mpc": ${h70}`],
    [["CONVERT", 1, "Mpc/h_70", "Mpc"],    "value", `ZC.CONVERT: from: "Mpc/h_70": ${survey('"h_70" = H0/70')}`],
    [["CONVERT", 1, "Mpc h_70^-1", "Mpc"], "value", `ZC.CONVERT: from: "Mpc h_70^-1": ${survey('"h_70" = H0/70')}`],
    [["CONVERT", 1, "Mpc/h0.7", "Mpc"],    "value", `ZC.CONVERT: from: "Mpc/h0.7": ${survey('"h0.7" = H0/70')}`],
    [["CONVERT", 1, "Mpc/(h/0.7)", "Mpc"], "value", `ZC.CONVERT: from: "Mpc/(h/0.7)": ${survey('"h/0.7" = H0/70')}`],
    [["DIST_LUM", 0.5, null, "Mpc/h_70"],  "value", `ZC.DIST_LUM: unit: "Mpc/h_70": ${survey('"h_70" = H0/70')}`],
    [["DIST_LUM", 0.5, null, "Mpc/h100"],  "value", 'ZC.DIST_LUM: unit: "Mpc/h100": zcell\'s h is already H0/100, and "h100" would be h to the power 100: write "Mpc/h"'],
    [["DIST_LUM", 0.5, null, "(Mpc/h)4"],  "value", 'ZC.DIST_LUM: unit: "(Mpc/h)4": h to the power -4: h-scaled units carry h to a power from -3 to 3 (h3 Mpc-3)'],
    [["CONVERT", 1, "h-1Msun", "Msun"],    "value", 'ZC.CONVERT: from: "h-1Msun": put a space after the power, as in "h-1 Msun"'],
    // h scaled to H0 = 100 is zcell's own h (review finding): write h alone
    [["CONVERT", 1, "Mpc/h_100", "Mpc"],   "value", 'ZC.CONVERT: from: "Mpc/h_100": zcell\'s h is already H0/100: write h alone, as in Mpc/h ("h_100" is not a unit zcell reads)'],
    [["CONVERT", 1, "Mpc/h1.0", "Mpc"],    "value", 'ZC.CONVERT: from: "Mpc/h1.0": zcell\'s h is already H0/100: write h alone, as in Mpc/h ("h1.0" is not a unit zcell reads)'],
    [["CONVERT", 1, "Mpc/(h/1)", "Mpc"],   "value", 'ZC.CONVERT: from: "Mpc/(h/1)": zcell\'s h is already H0/100: write h alone, as in Mpc/h ("h/1" is not a unit zcell reads)'],
  ]);

  test('"h_" with no number after it is no survey h: "h_sun" is an unknown unit with its suggestions (review finding)', () => {
    const cell = one("CONVERT", 1, "h_sun", "W");
    expect(cell).toBeInstanceOf(CellError);
    expect((cell as CellError).message).not.toContain("zcell's h is H0/100");
  });

  test("h up to the third power still reads (survey units, common practice)", () => {
    expect(one("CONVERT", 1, "h3 Mpc-3", "Mpc-3", "H0=50; Om=0.3")).toBeCloseTo(0.125, 15);
    expect(one("CONVERT", 1, "h-1 Msun", "Msun", "H0=50; Om=0.3")).toBe(2);
  });
});

describe("the trade's spellings FITS does not read get the FITS symbol", () => {
  table([
    [["MAG_AB", 1e-17, "erg/s/cm2/A", 5000],         "value", 'ZC.MAG_AB: unit: "erg/s/cm2/A": "A" is the ampere in FITS, not the ångström: write "erg/s/cm2/Angstrom"'],
    [["CONVERT", 1, "A", "nm"],                      "value", 'ZC.CONVERT: from: "A" is the ampere in FITS, not the ångström: write "Angstrom"'],
    [["CONVERT", 1, "AA", "nm"],                     "value", 'ZC.CONVERT: from: "AA" is not FITS for the ångström: write "Angstrom"'],
    [["CONVERT", 1, "nm", "Å"],                      "value", 'ZC.CONVERT: to: "Å" is not FITS for the ångström: write "Angstrom"'],
    [["CONVERT", 1, "micron", "nm"],                 "value", 'ZC.CONVERT: from: "micron" is not FITS for the micrometre: write "um"'],
    [["CONVERT", 1, "hours", "s"],                   "value", 'ZC.CONVERT: from: "hours" is not a FITS unit: write h for hours of time, or hourangle for hours of right ascension'],
    // square degrees as the trade writes them (common practice); FITS writes deg2 (FITS 4.0 §4.3, a power after the symbol)
    [["VOLUME_SHELL", 0.1, 0.2, 100, null, null, "sqdeg"],  "value", 'ZC.VOLUME_SHELL: area_unit: "sqdeg" is not FITS for the square degree: write "deg2"'],
    [["VOLUME_SHELL", 0.1, 0.2, 100, null, null, "sq.deg"], "value", 'ZC.VOLUME_SHELL: area_unit: "sq.deg" is not FITS for the square degree: write "deg2"'],
    [["CONVERT", 1, "Mpc3/sq deg", "Mpc3/sr"],       "value", 'ZC.CONVERT: from: "Mpc3/sq deg": "sq deg" is not FITS for the square degree: write "Mpc3/deg2"'],
    [["CONVERT", 1, "sqarcmin", "sr"],               "value", 'ZC.CONVERT: from: "sqarcmin" is not FITS for the square arcminute: write "arcmin2"'],
    // km/s and a reciprocal as the trade writes them (common practice); FITS writes km/s and Gyr-1 (FITS 4.0 §4.3)
    [["VELOCITY", 0.1, null, "kms"],                 "value", 'ZC.VELOCITY: unit: "kms" is not FITS for kilometres per second: write "km/s"'],
    [["VELOCITY", 0.1, null, "kms-1"],               "value", 'ZC.VELOCITY: unit: unknown unit "kms" in "kms-1"'], // km s-1 meant: "km/s-1" is not offered
    [["HUBBLE", 0, null, "1/Gyr"],                   "value", 'ZC.HUBBLE: unit: "1/Gyr": write the reciprocal as a power, "Gyr-1"'],
    [["HUBBLE", 0, null, "/Gyr"],                    "value", 'ZC.HUBBLE: unit: "/Gyr": write the reciprocal as a power, "Gyr-1"'],
    [["HUBBLE", 0, null, "/xyz"],                    "value", 'ZC.HUBBLE: unit: "/xyz": unexpected "/"'], // no unit either way: no power offered
    [["REDSHIFT_CMB", 0.01, 12, 30, "hours"],        "value", 'ZC.REDSHIFT_CMB: angle_unit: "hours" is hours of time, not an angle: for a right ascension in hours use "hourangle"'],
    [["REDSHIFT_CMB", 0.01, 12, 30, "h"],            "value", 'ZC.REDSHIFT_CMB: angle_unit: "h" is hours of time, not an angle: for a right ascension in hours use "hourangle"'],
  ]);

  test("deg^2 is the square degree, as deg2 is (FITS 4.0 §4.3: ^ before a power)", () => {
    expect(one("VOLUME_SHELL", 0.1, 0.2, 100, null, null, "deg^2")).toBe(one("VOLUME_SHELL", 0.1, 0.2, 100, null, null, "deg2"));
  });

  test("one hour angle is exactly 15° (360° a day of 24 hours, common practice)", () => {
    expect(one("CONVERT", 1, "hourangle", "deg")).toBe(15);
    expect(one("CONVERT", 1, "hourangle", "arcsec")).toBe(54000);
    expect(one("CONVERT", 2, "deg", "arcmin")).toBe(120);
  });
});

describe("every unit message names the argument it comes from", () => {
  table([
    [["EXTINCTION", 5000, 0.1, null, null, "A"],                     "value", 'ZC.EXTINCTION: wavelength_unit: "A" is the ampere in FITS, not the ångström: write "Angstrom"'],
    [["REDSHIFT", 100, "DIST_LUM", null, "mpc"],                     "value", 'ZC.REDSHIFT: unit: "mpc" would be milliparsecs (units are case-sensitive): did you mean Mpc?'],
    [["LUMINOSITY_REST", 1, 0.1, -0.7, 1.4, 1.4, null, "Ghz"],       "value", 'ZC.LUMINOSITY_REST: band_unit: unknown unit "Ghz": did you mean GHz?'],
    [["LUMINOSITY_REST", 1, 0.1, -0.7, 1.4, 1.4, null, null, null, "Ghz"], "value", 'ZC.LUMINOSITY_REST: out_unit: unknown unit "Ghz": did you mean GHz?'],
    [["BRIGHTNESS_TEMP", 1, 1, 1, 1, null, null, "Ghz"],             "value", 'ZC.BRIGHTNESS_TEMP: band_unit: unknown unit "Ghz": did you mean GHz?'],
    [["INDEX_BETWEEN", 1, 1, 2, 2, "Ghz"],                           "value", 'ZC.INDEX_BETWEEN: band_unit: unknown unit "Ghz": did you mean GHz?'],
    [["REST_FRAME", 7200, 0.1, "wavelength", "Ghz"],                 "value", 'ZC.REST_FRAME: unit: unknown unit "Ghz": did you mean GHz?'],
    [["CONVERT", 1, "Mpc", "furlong"],                               "value", 'ZC.CONVERT: to: unknown unit "furlong"'],
    [["RESCALE", 1000, 0.5, "distance", "CONCORDANCE", null, "Ghz"], "value", 'ZC.RESCALE: unit: unknown unit "Ghz": did you mean GHz?'],
  ]);

  test("a spelling one whole unit shorter is never offered: it would change what the unit measures", () => {
    const cell = errorOf(one("MAG_AB", 1e-17, "erg/s/cm2/X", 5000)) as { message: string };
    expect(cell.message).toBe('ZC.MAG_AB: unit: unknown unit "X" in "erg/s/cm2/X"');
  });
});

describe("model specs: the fix for what was typed", () => {
  table([
    [["DIST_LUM", 1, "H0=70 km/s/Mpc; Om=0.3"], "value", 'ZC.DIST_LUM: model: H0: "70 km/s/Mpc": give the number alone (H0 is in km/s/Mpc)'],
    [["DIST_LUM", 1, "P18-CMB; mnu=0.06 eV"],   "value", 'ZC.DIST_LUM: model: mnu: "0.06 eV": give the number alone (mnu is in eV)'],
    [["DIST_LUM", 1, "P18-CMB; Tcmb=2.7 K"],    "value", 'ZC.DIST_LUM: model: Tcmb: "2.7 K": give the number alone (Tcmb is in K)'],
    [["DIST_LUM", 1, "H0: 70; Om: 0.3"],        "value", 'ZC.DIST_LUM: model: "H0: 70": write each key as key=value, e.g. "H0=70"'],
    [["DIST_LUM", 1, "H0 70; Om 0.3"],          "value", 'ZC.DIST_LUM: model: "H0 70": write each key as key=value, e.g. "H0=70"'],
    [["DIST_LUM", 1, "P18-CMB; om  0.3"],       "value", 'ZC.DIST_LUM: model: "om  0.3": write each key as key=value, e.g. "Om=0.3"'],
    [["DIST_LUM", 1, "Planck 18"],              "value", `ZC.DIST_LUM: model: unknown preset "Planck 18": use one of P18-CMB, P18-BAO, P15-EXT, W9-ALL, W7-BAO, DESI2-CMB, DESI2-CMB-PP, DESI2-CMB-U3, DESI2-CMB-DY5, CONCORDANCE, EDS`], // quoted as typed, not "Planck18"
    [["DIST_LUM", 1, "P18-CMB; x y"],           "value", 'ZC.DIST_LUM: model: "x y" is not key=value (a preset name may only come first)'],
    [["DIST_LUM", 1, "P18-CMB; H0: 73"],        "value", 'ZC.DIST_LUM: model: "H0: 73": write each key as key=value, e.g. "H0=73"'],
    [["DIST_LUM", 1, "P18-CMB; mnu=0,06"],      "value", 'ZC.DIST_LUM: model: mnu: "0,06" reads as two masses, 0 and 06 eV: for one mass write mnu=0.06 (a list is written heaviest first, "0.05,0.01")'],
    [["DIST_LUM", 1, "H0=1e999; Om=0.3"],       "value", 'ZC.DIST_LUM: model: H0: "1e999" is too large a number'],
    [["DIST_LUM", 1, "H0=70; Om=0,3"],          "value", 'ZC.DIST_LUM: model: Om: "0,3" is not a number: use a point for decimals, 0.3'],
    [["DIST_LUM", 1, "H0=70; Om0=0.3"],         "value", `ZC.DIST_LUM: model: unknown key "Om0": did you mean Om? (the keys are ${keys})`],
    [["DIST_LUM", 1, "H0=70; OmegaM=0.3"],      "value", `ZC.DIST_LUM: model: unknown key "OmegaM": did you mean Om? (the keys are ${keys})`],
    [["DIST_LUM", 1, "H0=70; omega_m=0.3"],     "value", `ZC.DIST_LUM: model: unknown key "omega_m": did you mean Om? (the keys are ${keys})`],
    [["DIST_LUM", 1, "H0=70; Om=0.3; Ode=0.7"], "value", `ZC.DIST_LUM: model: unknown key "Ode": did you mean OL? (the keys are ${keys})`],
    [["DIST_LUM", 1, "P18-CMB; w=-0.9"],        "value", `ZC.DIST_LUM: model: unknown key "w": did you mean w0? (the keys are ${keys})`],
    [["DIST_LUM", 1, "P18-CMB; h=0.7"],         "value", `ZC.DIST_LUM: model: unknown key "h": did you mean H0 (in km/s/Mpc: H0 = 100 h)? (the keys are ${keys})`],
    [["DIST_LUM", 1, "P18-CMB; xyz=1"],         "value", `ZC.DIST_LUM: model: unknown key "xyz": use ${keys}`],
    [["MODEL", "P18-CMB", "Om0", 0.3],          "value", `ZC.MODEL: unknown key "Om0": did you mean Om? (the keys are ${keys})`],
  ]);
});

describe("numbers: in the user's unit, with the likely slip named", () => {
  table([
    [["EXTINCTION", 0.55, 0.1],              "na",  `ZC.EXTINCTION: wavelength = 0.55 Angstrom is outside Fitzpatrick 1999's range, 1150 to 35000 Angstrom: the law is not defined there; if 0.55 is in um, give "um" as wavelength_unit (5th argument)`],
    [["EXTINCTION", 500, 0.1],               "na",  `ZC.EXTINCTION: wavelength = 500 Angstrom is outside Fitzpatrick 1999's range, 1150 to 35000 Angstrom: the law is not defined there; if 500 is in nm, give "nm" as wavelength_unit (5th argument)`],
    [["EXTINCTION", 5500, 0.1, null, null, "nm"], "na", `ZC.EXTINCTION: wavelength = 5500 nm is outside Fitzpatrick 1999's range, 115 to 3500 nm: the law is not defined there; if 5500 is in Angstrom, give "Angstrom" as wavelength_unit (5th argument)`],
    [["EXTINCTION", 4000, 0.1, null, null, "nm"], "na", `ZC.EXTINCTION: wavelength = 4000 nm is outside Fitzpatrick 1999's range, 115 to 3500 nm: the law is not defined there`], // 1.14 times the edge: no other unit guessed
    [["EXTINCTION", 1149, 0.1],              "na",  `ZC.EXTINCTION: wavelength = 1149 Angstrom is outside Fitzpatrick 1999's range, 1150 to 35000 Angstrom: the law is not defined there`], // just past the edge: no other unit guessed
    [["ANGLE", 30, 0],                       "num", "ZC.ANGLE: z = 0 puts the source at zero distance: give z > 0"],
    [["ANGLE", 1e9, 0.001, null, "pc"],      "num", "ZC.ANGLE: size = 1000000000 pc at z = 0.001 would subtend more than 180°: at most 13964700 pc (π D_A) there"],
    [["MAG_AB", -0.001],                     "num", "ZC.MAG_AB: flux_density = -0.001 Jy must be > 0 Jy"],
    [["MAG_AB", -0.001, "mJy"],              "num", "ZC.MAG_AB: flux_density = -0.001 mJy must be > 0 mJy"],
    [["EXTINCTION", -5, 0.1, null, null, "nm"], "num", "ZC.EXTINCTION: wavelength = -5 nm must be > 0 nm"],
    [["FLUX_AB", 20, "erg/s/cm2/Angstrom"],  "value", 'ZC.FLUX_AB: wavelength is needed with "erg/s/cm2/Angstrom", a flux density per wavelength (f_λ): give it in Angstrom (the last argument), for f_ν = f_λ λ²/c'],
    [["DIST_LUM", "0,5"],                    "value", 'ZC.DIST_LUM: z: text "0,5" is not a number: use a point for decimals, 0.5'],
    [["LUMINOSITY_NU", 1, 0.5, "-0,7"],      "value", 'ZC.LUMINOSITY_NU: alpha: text "-0,7" is not a number: use a point for decimals, -0.7'],
    [["LUMINOSITY", "1,5e-14", 0.5],         "value", 'ZC.LUMINOSITY: flux: text "1,5e-14" is not a number: use a point for decimals, 1.5e-14'],
    [["DIST_LUM", "1,000e3"],                "value", 'ZC.DIST_LUM: z: text "1,000e3" is not a number: use a point for decimals, 1.000e3'], // an exponent: not a thousands comma
    [["DIST_LUM", "1,234.5"],                "value", 'ZC.DIST_LUM: z: text "1,234.5" where a number belongs'], // a thousands comma and a point: no hint
    // U+2212 MINUS SIGN and U+2013 EN DASH are not U+002D HYPHEN-MINUS (The Unicode Standard, code charts)
    [["DIST_LUM", "\u22120.5"],              "value", 'ZC.DIST_LUM: z: text "\u22120.5" is not a number: write the minus as the hyphen-minus "-", -0.5'],
    [["LUMINOSITY_NU", 1, 0.5, "\u20130,7"], "value", 'ZC.LUMINOSITY_NU: alpha: text "\u20130,7" is not a number: write the minus as the hyphen-minus "-" and use a point for decimals, -0.7'],
    [["DIST_LUM", "5%"],                     "value", 'ZC.DIST_LUM: z: text "5%" is not a number: it is a percentage, write 0.05'],
    [["DIST_LUM", "1,000"],                  "value", 'ZC.DIST_LUM: z: text "1,000" is not a number: write 1000 without the thousands comma, or 1.000 for a decimal comma'],
  ]);

  test("the size limit of ANGLE is π D_A in the size's own unit, h-scaled too (Hogg 1999 §6, θ = ℓ/D_A)", () => {
    const cell = errorOf(one("ANGLE", 1e4, 0.001, "H0=70; Om=0.3", "kpc/h")) as { message: string };
    const da = one("DIST_ANG", 0.001, "H0=70; Om=0.3", "kpc") as number;
    const limit = Number((Math.PI * da * 0.7).toPrecision(6)); // kpc/h = kpc × h
    expect(cell.message).toBe(`ZC.ANGLE: size = 10000 kpc/h at z = 0.001 would subtend more than 180°: at most ${limit} kpc/h (π D_A) there`);
  });
});

describe("positions: a right ascension as a bare number in text, and the pole", () => {
  table([
    [["REDSHIFT_CMB", 0.01, 10, 95],             "num",   "ZC.REDSHIFT_CMB: dec = 95° is beyond ±90°: a declination is −90° … +90°"],
    [["REDSHIFT_CMB", 0.01, 10, "+95:00:00"],    "num",   'ZC.REDSHIFT_CMB: dec: "+95:00:00" is beyond ±90°: a declination is −90° … +90°'],
    [["COORD_DEG", 95, "dec"],                   "num",   "ZC.COORD_DEG: text = 95° is beyond ±90°: a declination is −90° … +90°"],
  ]);

  // The rule kept (and stated in the help): text that is only a number is a number, as Excel's own
  // functions read number text, so a right ascension "12" is 12°, as the number 12 is; "12h" is hours.
  test("text that is only a number is degrees in a right ascension too, as a number is; marked h it is hours (15° an hour, common practice)", () => {
    expect(one("COORD_DEG", "12", "ra")).toBe(12);
    expect(one("COORD_DEG", "187.5", "ra")).toBe(one("COORD_DEG", 187.5, "ra"));
    expect(one("COORD_DEG", "12h", "ra")).toBe(180);
    expect(one("COORD_DEG", "12d", "ra")).toBe(12);
    expect(one("SEPARATION", "12", 0, 0, 0)).toBe(one("SEPARATION", 12, 0, 0, 0));
    expect(one("COORD_DEG", "12", "dec")).toBe(12);
    expect(one("COORD_CONVERT", "120", 10, "galactic", "equatorial", "lon")).toBe(one("COORD_CONVERT", 120, 10, "galactic", "equatorial", "lon"));
  });

  test("the help of every right-ascension argument says so (the metadata Excel shows, test/fixtures/functions.metadata.json)", () => {
    const raArguments: [fn: string, arg: string][] = [["COORD_DEG", "text"], ["SEPARATION", "ra1"], ["REDSHIFT_CMB", "ra"], ["COORD_CONVERT", "lon"]];
    for (const [fn, arg] of raArguments) {
      const help = metadata.functions.find((f) => f.name === fn)?.parameters.find((p) => p.name === arg)?.description ?? "";
      expect(help, `${fn} ${arg}`).toMatch(/text that is only a number/);
      expect(help, `${fn} ${arg}`).toContain('"12h"');
    }
  });

  test("a column of text numbers reads as each cell alone: in the angle unit given", () => {
    const column = evaluate(definitions.REDSHIFT_CMB, [0.01, 10, [["0.5"], ["-0.25"]], "rad"], active);
    expect(column).toEqual([[one("REDSHIFT_CMB", 0.01, 10, "0.5", "rad")], [one("REDSHIFT_CMB", 0.01, 10, "-0.25", "rad")]]);
    expect(column[0][0]).toBe(one("REDSHIFT_CMB", 0.01, 10, 0.5, "rad"));
    expect(column[0][0]).not.toBe(one("REDSHIFT_CMB", 0.01, 10, 0.5)); // 0.5 rad, not 0.5°
    const ra = evaluate(definitions.SEPARATION, [[["12"], ["12:00:00"]], 0, 0, 0], active);
    expect(ra).toEqual([[one("SEPARATION", 12, 0, 0, 0)], [one("SEPARATION", 180, 0, 0, 0)]]);
  });
});

describe("a required argument left out says so, and never shows 'undefined'", () => {
  table([
    [["COORD_DEG", "12:00:00", null],                          "value", "ZC.COORD_DEG: part is required"],
    [["COORD_TEXT", 10, null],                                 "value", "ZC.COORD_TEXT: part is required"],
    [["COORD_CONVERT", 10, 20, "galactic", "equatorial", null], "value", "ZC.COORD_CONVERT: part is required"],
    [["REST_FRAME", 7200, 0.1, null],                          "value", "ZC.REST_FRAME: quantity is required"],
    [["RESCALE", 1000, 0.5, null, "CONCORDANCE"],              "value", "ZC.RESCALE: quantity is required"],
    [["COORD_CONVERT", 10, 20, null, "equatorial", "lon"],     "value", "ZC.COORD_CONVERT: from_frame is required"],
    [["REDSHIFT", 100, null],                                  "value", "ZC.REDSHIFT: quantity is required"],
    [["CONVERT", 1, "Mpc", null],                              "value", "ZC.CONVERT: to is required"],
  ]);

  test("a blank cell inside a range of choices is still a blank result there, as for numbers", () => {
    const out = evaluate(definitions.COORD_DEG, ["12:00:00", [["ra"], [null], ["dec"]]], active);
    expect(out).toEqual([[180], [""], [12]]);
  });
});

describe("choices read alike whatever the case, spaces, '_' or '-'", () => {
  test("OMEGA takes dark energy as darkenergy", () => {
    expect(one("OMEGA", "dark energy", 0)).toBe(one("OMEGA", "darkenergy", 0));
    expect(one("OMEGA", "Dark_Energy", 0)).toBe(one("OMEGA", "darkenergy", 0));
  });

  test("no two choices of any function read alike", () => {
    for (const def of Object.values(definitions)) {
      for (const spec of def.args) {
        if (spec.kind !== "text" || !spec.choices) continue;
        const seen = spec.choices.map(choiceKey);
        expect(new Set(seen).size, `${def.name} ${spec.name}`).toBe(seen.length);
      }
    }
  });
});

describe("a stranger's text is quoted at most 40 characters, with its length", () => {
  const long = (c: string) => c.repeat(32767);
  const quotedLong = (c: string) => `"${c.repeat(39)}…" (32,767 characters)`;
  table([
    [["OMEGA", long("x"), 0],                     "value", `ZC.OMEGA: component: ${quotedLong("x")} is not one of matter, cold, darkenergy, curvature, radiation, photons, neutrinos`],
    [["PARAM", long("y")],                        "value", `ZC.PARAM: name: ${quotedLong("y")} is not one of H0, h, Om, OL, Ok, Or, Ob, w0, wa, Tcmb, Neff, mnu, age_today, hubble_time, hubble_distance, z_eq`],
    [["SPECTRAL_INDEX", 1, long("z")],            "value", `ZC.SPECTRAL_INDEX: convention: ${quotedLong("z")} is not one of photon, lambda, radio`],
    [["GROWTH", 1, null, long("w")],              "value", `ZC.GROWTH: neutrinos: ${quotedLong("w")} is not one of smooth, clustering`],
    [["SIGMA_CRIT", 0.3, 1, null, null, long("v")], "value", `ZC.SIGMA_CRIT: coordinates: ${quotedLong("v")} is not one of physical, comoving`],
    [["COORD_CONVERT", 1, 1, long("u"), "galactic", "lon"], "value", `ZC.COORD_CONVERT: from_frame: ${quotedLong("u")} is not one of equatorial, galactic, supergalactic, ecliptic`],
    [["DIST_LUM", 1, "per ".repeat(8191) + "pe"], "value", `ZC.DIST_LUM: model: unknown preset "${"per ".repeat(9)}per…" (32,766 characters): use one of P18-CMB, P18-BAO, P15-EXT, W9-ALL, W7-BAO, DESI2-CMB, DESI2-CMB-PP, DESI2-CMB-U3, DESI2-CMB-DY5, CONCORDANCE, EDS`],
    [["DIST_LUM", 1, null, long("q")],            "value", `ZC.DIST_LUM: unit: unknown unit ${quotedLong("q")}`],
    [["DIST_LUM", `${"1".repeat(32766)}x`],       "value", `ZC.DIST_LUM: z: text ${quotedLong("1")} where a number belongs`],
    [["DIST_LUM", 1, null, "(".repeat(16383) + "m" + ")".repeat(16383)], "value", `ZC.DIST_LUM: unit: ${quotedLong("(")}: parentheses nested more than 16 deep`],
    [["DIST_LUM", 1, null, `m${"9".repeat(32766)}`], "value", `ZC.DIST_LUM: unit: "m${"9".repeat(38)}…" (32,767 characters): a power has at most 3 digits`],
  ]);
});
