/**
 * What a unit argument does with the text a stranger's cell holds: a number or a model where a unit
 * belongs, spaces around it, megajansky hidden among spaces, a flux or luminosity of the other kind
 * (bolometric or spectral), and the unit as the messages quote it. The messages are zcell's own
 * (functions/messages.ts), pinned as the interface; unit symbols follow the FITS Standard 4.0 (Pence
 * et al. 2010, A&A 524, A42, Tables 3–5).
 */
import { describe, expect, test } from "vitest";
import { sheetCalls } from "./sheetCalls.js";

const { num, failure } = sheetCalls("P18-CMB");
const said = (name: string, ...args: unknown[]) => {
  const e = failure(name, ...args);
  return { kind: e.kind, message: e.message };
};

describe("a unit cell that holds no unit", () => {
  test.each([
    // call                                         message
    [["DIST_LUM", 0.5, null, 5],                   "ZC.DIST_LUM: unit: 5 where text belongs"],
    [["DIST_LUM", 0.5, null, true],                "ZC.DIST_LUM: unit: TRUE where text belongs"],
    [["LUMINOSITY", 1e-13, 0.5, null, 1e-3],       "ZC.LUMINOSITY: flux_unit: 0.001 where text belongs"],
  ] as [unknown[], string][])("%j → #VALUE! %s", ([name, ...args], message) => {
    expect(said(name as string, ...args)).toEqual({ kind: "value", message });
  });
});

describe("spaces around a unit", () => {
  test("a unit with spaces around it converts as the unit, and a message quotes it without them", () => {
    // 1 Gpc = 1000 Mpc (FITS prefix G = 10⁹, M = 10⁶)
    expect(num("DIST_LUM", 0.5, null, " Gpc ")).toBeCloseTo(num("DIST_LUM", 0.5) / 1000, 12);
    expect(said("LUMINOSITY", -1, 0.5, null, " erg/s/cm2 ")).toEqual({ kind: "num", message: "ZC.LUMINOSITY: flux = -1 erg/s/cm2 must be ≥ 0 erg/s/cm2" });
  });
});

describe("megajansky for a source's flux density", () => {
  const mjy = (arg: string, text: string) =>
    `${arg}: "${text}" is megajansky (10⁹ mJy), not a likely flux density for a source: did you mean mJy? (units are case-sensitive)`;
  test.each([
    // function / args                                                text        argument
    [["LUMINOSITY_NU", 1, 0.5, 0, null],                "MJy",      "in_unit"],
    [["LUMINOSITY_NU", 1, 0.5, 0, null],                " MJy",     "in_unit"],
    [["LUMINOSITY_NU", 1, 0.5, 0, null],                "MJy ",     "in_unit"],
    // a limit in W/m2/Hz (the reference unit of REDSHIFT_LIMIT_NU's flux_unit)
    [["REDSHIFT_LIMIT_NU", 1e24, 1, 0, null, null],     "MJy",      "flux_unit"],
    [["REDSHIFT_LIMIT_NU", 1e24, 1, 0, null, null],     " MJy ",    "flux_unit"],
  ] as [unknown[], string, string][])("%j with %j is refused", ([name, ...args], text, arg) => {
    expect(said(name as string, ...args, text)).toEqual({ kind: "value", message: `ZC.${name as string}: ${mjy(arg, text)}` });
  });

  test("mJy, and megajansky where it is no source's flux density (a conversion), are read", () => {
    // 1 mJy = 1e-29 W/m2/Hz (IAU: 1 Jy = 1e-26 W m⁻² Hz⁻¹)
    expect(num("CONVERT", 1, "mJy", "W/m2/Hz")).toBeCloseTo(1e-29, 40);
    expect(num("CONVERT", 1, "MJy", "Jy")).toBe(1e6);
    expect(num("REDSHIFT_LIMIT_NU", 1e24, 1, 0, null, null, "mJy")).toBeGreaterThan(0);
  });
});

describe("a flux or luminosity of the other kind names the function that takes it", () => {
  test.each([
    // call                                                     message
    // a flux density given to a bolometric flux: LUMINOSITY_NU or LUMINOSITY_REST take it
    [["LUMINOSITY", 1e-13, 0.5, null, "Jy"],
      'ZC.LUMINOSITY: flux_unit: cannot convert "Jy" (a flux density) to "erg/s/cm2" (a flux): for a flux density use ZC.LUMINOSITY_NU or ZC.LUMINOSITY_REST'],
    // the result's unit: no other function gives a luminosity in another kind, so no advice
    [["LUMINOSITY", 1e-13, 0.5, null, null, "W/Hz"],
      'ZC.LUMINOSITY: lum_unit: cannot convert "erg/s" (a luminosity or power) to "W/Hz" (a spectral luminosity)'],
    // FLUX has no function of the other kind to name
    [["FLUX", 1e30, 0.5, null, "W/Hz"],
      'ZC.FLUX: lum_unit: cannot convert "W/Hz" (a spectral luminosity) to "erg/s" (a luminosity or power)'],
    // a unit of neither kind: no advice
    [["LUMINOSITY", 1e-13, 0.5, null, "Mpc"],
      'ZC.LUMINOSITY: flux_unit: cannot convert "Mpc" (a length) to "erg/s/cm2" (a flux)'],
  ] as [unknown[], string][])("%j", ([name, ...args], message) => {
    expect(said(name as string, ...args)).toEqual({ kind: "value", message });
  });
});
