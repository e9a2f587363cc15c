/**
 * The advice a unit argument's message adds: hours of time given for an angle (the hour angle is
 * what a right ascension in hours needs), and for a flux or luminosity of the other kind (bolometric
 * or spectral) the function that takes it, for every function that has one. The messages are
 * zcell's own (functions/messages.ts), pinned as the interface; unit kinds follow the FITS Standard
 * 4.0 (Pence et al. 2010, A&A 524, A42, Tables 3–5).
 */
import { describe, expect, test, vi } from "vitest";
import { sheetCalls } from "./sheetCalls.js";

const { failure } = sheetCalls("P18-CMB");
const said = (name: string, ...args: unknown[]) => failure(name, ...args).message;
const hours = (text: string) => `"${text}" is hours of time, not an angle: for a right ascension in hours use "hourangle"`;

describe("hours of time where an angle is given", () => {
  test.each([
    // call                                                  message
    // an angle unit (reference rad: SIZE's angle_unit; reference deg: REDSHIFT_CMB's) given hours
    [["SIZE", 1, 0.5, null, "h"],                            `ZC.SIZE: angle_unit: ${hours("h")}`],
    [["SIZE", 1, 0.5, null, " h "],                          `ZC.SIZE: angle_unit: ${hours("h")}`],
    [["SIZE", 1, 0.5, null, "Hours"],                        `ZC.SIZE: angle_unit: ${hours("Hours")}`],
    [["REDSHIFT_CMB", 0.01, 10, 10, "hours"],                `ZC.REDSHIFT_CMB: angle_unit: ${hours("hours")}`],
    [["REDSHIFT_CMB", 0.01, 10, 10, "hr"],                   `ZC.REDSHIFT_CMB: angle_unit: ${hours("hr")}`],
    [["REDSHIFT_CMB", 0.01, 10, 10, "HRS"],                  `ZC.REDSHIFT_CMB: angle_unit: ${hours("HRS")}`],
    // other texts for an angle: their own problem (a word that only ends or starts like hours too)
    [["SIZE", 1, 0.5, null, "inch"],                         'ZC.SIZE: angle_unit: unknown unit "inch"'],
    [["SIZE", 1, 0.5, null, "Hz"],                           'ZC.SIZE: angle_unit: cannot convert "Hz" (a frequency) to "arcsec" (an angle)'],
    [["SIZE", 1, 0.5, null, "Mpc"],                          'ZC.SIZE: angle_unit: cannot convert "Mpc" (a length) to "arcsec" (an angle)'],
    [["REDSHIFT_CMB", 0.01, 10, 10, "Mpc"],                  'ZC.REDSHIFT_CMB: angle_unit: cannot convert "Mpc" (a length) to "deg" (an angle)'],
    // an angle the result is given in: hours are a time, not the result's angle; no advice
    [["ANGLE", 1, 0.5, null, null, "h"],                     'ZC.ANGLE: angle_unit: cannot convert "arcsec" (an angle) to "h" (a time)'],
    [["SEPARATION", 1, 2, 3, 4, "h"],                        'ZC.SEPARATION: unit: cannot convert "arcsec" (an angle) to "h" (a time)'],
    [["SEPARATION", 1, 2, 3, 4, "furlong"],                  'ZC.SEPARATION: unit: unknown unit "furlong"'],
    // hours for a unit that is no angle: the plain conversion problem
    [["DIST_LUM", 0.5, null, "h"],                           'ZC.DIST_LUM: unit: cannot convert "Mpc" (a length) to "h" (a time)'],
    [["LUMINOSITY", 1e-13, 0.5, null, "h"],                  'ZC.LUMINOSITY: flux_unit: cannot convert "h" (a time) to "erg/s/cm2" (a flux)'],
  ] as [unknown[], string][])("%j", ([name, ...args], message) => {
    expect(said(name as string, ...args)).toBe(message);
  });
});

describe("a flux or luminosity of the other kind names the function that takes it, for each function that has one", () => {
  // every row: a unit of the other kind (spectral for bolometric, and the reverse) given to an input unit
  const rows: [unknown[], string][] = [
    [["LUMINOSITY", 1e-13, 0.5, null, "Jy"],
      'ZC.LUMINOSITY: flux_unit: cannot convert "Jy" (a flux density) to "erg/s/cm2" (a flux): for a flux density use ZC.LUMINOSITY_NU or ZC.LUMINOSITY_REST'],
    [["LUMINOSITY_ERR", 1e-13, 1e-14, 0.5, 0, null, "Jy"],
      'ZC.LUMINOSITY_ERR: flux_unit: cannot convert "Jy" (a flux density) to "erg/s/cm2" (a flux): for a flux density use ZC.LUMINOSITY_NU_ERR or ZC.LUMINOSITY_REST_ERR'],
    [["REDSHIFT_LIMIT", 1e40, 1e-15, null, "W/Hz"],
      'ZC.REDSHIFT_LIMIT: lum_unit: cannot convert "W/Hz" (a spectral luminosity) to "erg/s" (a luminosity or power): for a spectral luminosity use ZC.REDSHIFT_LIMIT_NU'],
    [["REDSHIFT_LIMIT", 1e40, 1e-15, null, null, "Jy"],
      'ZC.REDSHIFT_LIMIT: flux_unit: cannot convert "Jy" (a flux density) to "erg/s/cm2" (a flux): for a flux density use ZC.REDSHIFT_LIMIT_NU'],
    [["LUMINOSITY_NU", 1, 0.5, 0, null, "erg/s/cm2"],
      'ZC.LUMINOSITY_NU: in_unit: cannot convert "erg/s/cm2" (a flux) to "Jy" (a flux density): for a flux use ZC.LUMINOSITY'],
    [["LUMINOSITY_REST", 1, 0.5, 0, 1.4, 1.4, null, null, "W/m2"],
      'ZC.LUMINOSITY_REST: in_unit: cannot convert "W/m2" (a flux) to "Jy" (a flux density): for a flux use ZC.LUMINOSITY'],
    [["LUMINOSITY_NU_ERR", 1, 0.1, 0.5, 0, 0, 0, null, "W/m2"],
      'ZC.LUMINOSITY_NU_ERR: in_unit: cannot convert "W/m2" (a flux) to "Jy" (a flux density): for a flux use ZC.LUMINOSITY_ERR'],
    [["LUMINOSITY_REST_ERR", 1, 0.1, 0.5, 0, 0, 0, 1.4, 1.4, null, null, "W/m2"],
      'ZC.LUMINOSITY_REST_ERR: in_unit: cannot convert "W/m2" (a flux) to "Jy" (a flux density): for a flux use ZC.LUMINOSITY_ERR'],
    [["REDSHIFT_LIMIT_NU", 1e24, 1e-3, 0, null, null, "W/m2"],
      'ZC.REDSHIFT_LIMIT_NU: flux_unit: cannot convert "W/m2" (a flux) to "Jy" (a flux density): for a flux use ZC.REDSHIFT_LIMIT'],
    [["REDSHIFT_LIMIT_NU", 1e24, 1e-3, 0, null, "erg/s"],
      'ZC.REDSHIFT_LIMIT_NU: lum_unit: cannot convert "erg/s" (a luminosity or power) to "W/Hz" (a spectral luminosity): for a luminosity or power use ZC.REDSHIFT_LIMIT'],
    // functions with no function of the other kind: no advice
    [["MAG_BOL", 1e33, "W/Hz"],
      'ZC.MAG_BOL: unit: cannot convert "W/Hz" (a spectral luminosity) to "erg/s" (a luminosity or power)'],
    [["BRIGHTNESS_TEMP", 1, 1.4, 1, 1, 0, "W/m2"],
      'ZC.BRIGHTNESS_TEMP: flux_unit: cannot convert "W/m2" (a flux) to "Jy" (a flux density)'],
  ];

  test("each message, with the function modules loaded afresh (their tables of other kinds read inside the test)", async () => {
    vi.resetModules();
    const fresh = (await import("./sheetCalls.js")).sheetCalls("P18-CMB");
    const shown = rows.map(([[name, ...args]]) => fresh.failure(name as string, ...args).message);
    expect(shown).toEqual(rows.map(([, message]) => message));
  });
});
