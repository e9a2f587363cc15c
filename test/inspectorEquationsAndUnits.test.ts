/**
 * The cell inspector's account of a function agrees with what the function computes: the constants
 * its equations quote are the core's (core/units/constants.ts), the unit on the Result row is the one
 * the function returns its value in (fixed, read from the cell's arguments, or the default a blank
 * stands for), and the columns it names are the columns of the function's result. The texts are the
 * inspector's (taskpane/functionAbout.ts), pinned as the interface.
 *
 * Each test loads the inspector and its table afresh (test/freshInspector.ts says why).
 */
import { readdirSync, readFileSync } from "node:fs";
import { describe, expect, test } from "vitest";
import {
  abZeroPointJy,
  bolometricZeroPointW,
  cmbDipoleGalacticDeg,
  cmbDipoleSpeedKmPerS,
  cmbTemperatureK,
  eclipticObliquityJ2000Arcsec,
  megaparsecKm,
  secondsPerGyr,
  speedOfLightKmPerS,
  standardNeff,
  supergalacticFrameDeg,
} from "../core/units/constants.js";
import { surfaceBrightnessOffsetMag } from "../core/observables/surfaceBrightness.js";
import { freshInspector } from "./freshInspector.js";
import { blanks, p18Cmb, sheet1 } from "./inspectorSheet.js";

/** The number and the unit of a Result row, from its every-digit value where it has one ("1.5 Mpc" → [1.5, "Mpc"]). */
function valueAndUnit(call: { result: string; exact?: string }): [number, string] {
  const [, number, unit] = /^(\S+)(?: (.*))?$/.exec(call.exact ?? call.result)!;
  return [Number(number), unit ?? ""];
}

describe("the constants an equation quotes are the core's", () => {
  test.each([
    // function        the text its equation holds                                                        the core's constant (core/units/constants.ts)
    ["MAG_AB",         `−2.5·log10(f_ν / ${abZeroPointJy.toPrecision(6)} Jy)`],                           // AB zero point, 10^(−48.6/2.5) erg/s/cm2/Hz (Oke & Gunn 1983)
    ["FLUX_AB",        `f_ν = ${abZeroPointJy.toPrecision(6)} Jy · 10^(−m_AB/2.5)`],
    ["MAG_BOL",        `−2.5·log10(L / ${bolometricZeroPointW.toExponential().replace("e+", "e")} W) (IAU 2015 B2)`], // L0 = 3.0128e28 W (IAU 2015 Resolution B2)
    ["LUM_BOL",        `L = ${bolometricZeroPointW.toExponential().replace("e+", "e")} W · 10^(−0.4·M_bol) (IAU 2015 B2)`],
    ["REDSHIFT_CMB",   `v = ${cmbDipoleSpeedKmPerS} km/s to (l, b) = (${cmbDipoleGalacticDeg.l}°, ${cmbDipoleGalacticDeg.b}°)`], // Planck 2018 I dipole
    ["COORD_CONVERT",  `pole (l, b) = (${supergalacticFrameDeg.poleL}°, ${supergalacticFrameDeg.poleB}°), origin l = ${supergalacticFrameDeg.originL}°`],
    ["COORD_CONVERT",  `ε0 = ${eclipticObliquityJ2000Arcsec}″, IAU 2006`],                               // IAU 2006 Resolution B1
    ["SOUND_HORIZON",  `Neff = ${standardNeff}, Tcmb = ${cmbTemperatureK} K`],                            // the fit's standard model (Aubourg et al. 2015)
    ["SURFACE_LUM",    `M☉ − ${surfaceBrightnessOffsetMag.toFixed(3)}`],                                 // 5·log10(648000/π / 10) mag (core/observables/surfaceBrightness.ts)
    ["SURFACE_MAG",    `μ = M☉ + ${surfaceBrightnessOffsetMag.toFixed(3)} − 2.5·log10(Σ)`],
  ])("%s quotes %s", async (name, text) => {
    const { about } = await freshInspector();
    expect(about[name].equation).toContain(text);
  });
});

describe("the Result row's unit is the unit the function returns", () => {
  /** The `@returns` line of each worksheet function's declaration (functions/declarations/*.ts), by name. */
  const returns = new Map<string, string>();
  for (const file of readdirSync("functions/declarations")) {
    const source = readFileSync(`functions/declarations/${file}`, "utf8");
    for (const m of source.matchAll(/@returns (.*)\n[^]*?\*\/\s*export (?:async )?function (\w+)/g)) returns.set(m[2], m[1]);
  }

  test("a fixed unit is the one the function's declaration gives for its result; a function with a unit argument for its result has none of its own", async () => {
    const { about, definitions } = await freshInspector();
    const fixed = Object.entries(about).filter(([, info]) => typeof info.unit === "string");
    expect(fixed.length).toBeGreaterThan(10);
    for (const [name, info] of fixed) {
      const unit = info.unit as string;
      // "(mag)", "(K)", "(Lsun/pc2)"; degrees for the angles of COORD_DEG and COORD_CONVERT
      expect({ name, declared: unit === "deg" ? /degrees/i.test(returns.get(name)!) : returns.get(name)!.includes(`(${unit})`) }).toEqual({ name, declared: true });
    }
    for (const [name, def] of Object.entries(definitions)) {
      if (def.args.some((a) => a.kind === "unit" && a.applies === "result")) expect({ name, unit: about[name].unit }).toEqual({ name, unit: undefined });
    }
  });

  test.each([
    // formula                                                               unit shown   where it comes from (the declarations' @returns)
    ['=ZC.FLUX_AB(20)',                                                      "Jy"],       // "Jy by default": a blank unit is its default
    ['=ZC.FLUX_AB(20,"erg/s/cm2/Angstrom",5000)',                            "erg/s/cm2/Angstrom"],
    ['=ZC.LUMINOSITY_REST(2.5,1.1,-0.7,3,1.4,,,"mJy","Lsun")',               "Lsun"],     // ν L_ν in a power unit
    ['=ZC.LUMINOSITY_REST_ERR(2.5,0.2,1.1,0.01,-0.7,0.1,3,1.4,,,"mJy","W")', "W"],
    ['=ZC.REST_FRAME(7200,0.1,"wavelength","Angstrom")',                     "Angstrom"], // "in the unit of value"
    ['=ZC.OBSERVED_FRAME(1.4,0.05,"frequency")',                             "(in the value's own unit)"],
    ['=ZC.RESCALE(100,0.5,"distance","W9-ALL","EDS","Mpc")',                 "Mpc"],      // "in the value's unit"
    ['=ZC.RESCALE(-21,0.5,"magnitude","W9-ALL")',                            "mag"],      // a magnitude is in mag whatever the unit argument
    ['=ZC.RESCALE(100,0.5,{"distance";"luminosity"},"W9-ALL","EDS")',        "(in the value's own unit)"], // the quantity of the cell shown is not known here
    ['=ZC.CONVERT(1,"Mpc","Gly")',                                           "Gly"],      // "the value in the wanted unit"
    ['=ZC.PARAM("Om","EDS")',                                                ""],         // a density parameter has no unit
  ])("%s: %s", async (formula, unit) => {
    const { explainFormula } = await freshInspector();
    const [call] = await explainFormula(formula, blanks, p18Cmb);
    expect(call.isError, call.result).toBe(false);
    expect(valueAndUnit(call)[1]).toBe(unit);
  });

  test("ZC.PARAM's values are shown in the unit the model states them in", async () => {
    const { explainFormula } = await freshInspector();
    const hubbleTimeGyr = megaparsecKm / 70 / secondsPerGyr; // t_H = 1/H0 with H0 = 70 km/s/Mpc (EDS preset)
    //  formula                                                value                         unit         source of the value
    const cases: [string, number, string][] = [
      ['=ZC.PARAM("H0","EDS")',                                70,                           "km/s/Mpc"], // EDS preset: H0 70 (core/model/presets.ts)
      ['=ZC.PARAM("Tcmb","EDS; Tcmb=2.7255")',                 2.7255,                       "K"],        // as given in the spec
      ['=ZC.PARAM("mnu","P18-CMB; mnu=0.1")',                  0.1,                          "eV"],       // the sum of the masses given
      ['=ZC.PARAM("hubble_time","EDS")',                       hubbleTimeGyr,                "Gyr"],      // t_H = 1/H0
      ['=ZC.PARAM("age_today","EDS")',                         (2 / 3) * hubbleTimeGyr,      "Gyr"],      // matter only: t0 = 2/(3H0) (Einstein & de Sitter 1932)
      ['=ZC.PARAM("hubble_distance","EDS")',                   speedOfLightKmPerS / 70,      "Mpc"],      // D_H = c/H0
    ];
    for (const [formula, value, unit] of cases) {
      const [call] = await explainFormula(formula, blanks, p18Cmb);
      const [shown, shownUnit] = valueAndUnit(call);
      expect({ formula, unit: shownUnit }).toEqual({ formula, unit });
      expect(Math.abs(shown / value - 1), formula).toBeLessThan(1e-9); // relative tolerance: the tables' accuracy
    }
  });

  test("a range of parameter names whose cell for the selected one is not known shows the first value, with no unit", async () => {
    const { explainFormula } = await freshInspector();
    const cells = sheet1({ "A1:A2": [["H0"], ["Om"]] });
    const [call] = await explainFormula('=ZC.PARAM(A1:A2,"EDS")', cells, p18Cmb); // the cell explained is not known
    expect(call.result).toBe("70 (the first of 2×1 values; which one this cell shows is not known here)");
  });
});

describe("the columns the pane names are the columns of the function's result", () => {
  test("ZC.LUMINOSITY_FUNCTION: low edge, high edge, count, Φ and its error, per bin", async () => {
    const { explainFormula } = await freshInspector();
    // invented sources: log L of 42.1 and 42.4 in the first bin [42, 42.5), with V_max 3e5 and 1.2e6 Mpc³
    const formula = "=ZC.LUMINOSITY_FUNCTION({42.1;42.4;42.8;43.2},{3E5;1.2E6;6.8E6;6E7},{42;42.5;43;43.5})";
    const width = 0.5;
    //  column   the first bin's value (Schmidt 1968; Felten 1976: Φ = Σ(1/V_max)/Δbin, σ_Φ = √Σ(1/V_max²)/Δbin)
    const expected: [string, number][] = [
      ["low",    42],
      ["high",   42.5],
      ["N",      2],
      ["Φ",      (1 / 3e5 + 1 / 1.2e6) / width],
      ["σ_Φ",    Math.sqrt(1 / 3e5 ** 2 + 1 / 1.2e6 ** 2) / width],
    ];
    for (const [col, [column, value]] of expected.entries()) {
      const [call] = await explainFormula(formula, blanks, p18Cmb, undefined, { row: 0, col });
      expect(call.columns?.[col]).toBe(column);
      expect(call.columns).toHaveLength(expected.length);
      expect(call.result).toContain(`of 3×${expected.length} values: this cell`); // as many columns as it names
      expect(Math.abs(Number((call.exact ?? call.result).split(" ")[0]) / value - 1), column).toBeLessThan(1e-12);
    }
  });
});
