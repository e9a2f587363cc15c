/**
 * The cell inspector's Method row in plain words and the unit on its Result row, for the functions
 * whose unit no unit argument sets. The texts are the pane's own (taskpane/functionAbout.ts), pinned
 * here as the interface a reader meets.
 */
import { describe, expect, test } from "vitest";
import { explainFormula } from "../taskpane/explainCall.js";
import { fixedResultUnit } from "../taskpane/functionAbout.js";
import { blanks, p18Cmb, sheet1 } from "./inspectorSheet.js";

describe("the Method row says in one plain line how the value is computed", () => {
  test.each([
    // formula                         the plain line the pane shows (functionAbout.ts)
    ["=ZC.DIST_LUM(1)",                "From tables of the exact integrals: relative error ≤ 1e-10 for z ≤ 10⁴."],
    ["=ZC.REDSHIFT(1000,\"DIST_LUM\")", "Solved for z on the same tables as the forward function."],
    ["=ZC.DIST_LUM_ERR(1,0.01)",       "First-order error propagation from independent inputs (no covariances)."],
    ["=ZC.REDSHIFT_LIMIT(1e44,1e-15)", "The first redshift at which the source crosses the limit."],
    ["=ZC.GROWTH(1)",                  "Solved from the growth equation: relative error ≤ 1e-7."],
    // a method with no shorter line is shown as it is
    ["=ZC.HUBBLE(1)",                  "closed form, exact to rounding"],
    ["=ZC.INDEX_BETWEEN_ERR(12.4,0.5,1.4,3.1,0.2,5)", "first-order propagation of independent flux-density errors (bands exact)"],
  ])("%s: %s", async (formula, plain) => {
    const [call] = await explainFormula(formula, blanks, p18Cmb);
    expect(call.methodPlain).toBe(plain);
  });

  test("the detail behind the plain line stays in the Method row", async () => {
    const [call] = await explainFormula("=ZC.DIST_LUM_ERR(1,0.01)", blanks, p18Cmb);
    expect(call.method).toBe("first-order propagation of independent errors with the exact derivative dD_C/dz = D_H/E(z) (no covariances)");
    const [limit] = await explainFormula("=ZC.REDSHIFT_LIMIT(1e44,1e-15)", blanks, p18Cmb);
    expect(limit.method).toBe("scan upward in ln(1+z), then Newton with the exact derivative on the first crossing");
  });
});

describe("the Result row's unit where the function decides it", () => {
  test.each([
    // formula                                                                   the unit shown after the value
    ["=ZC.LUMINOSITY_REST_ERR(2.5,0.1,1.1,0.01,-0.7,0.1,3,1.4)",                 "W/Hz"],  // out_unit blank: its default
    ["=ZC.LUMINOSITY_REST_ERR(2.5,0.1,1.1,0.01,-0.7,0.1,3,1.4,,,\"mJy\",\"Lsun\")", "Lsun"],
    ["=ZC.RESCALE(100,0.5,\"distance\",\"W9-ALL\",\"EDS\",\"Mpc\")",             "Mpc"],   // a value keeps the unit it is given
    ["=ZC.RESCALE(100,0.5,\"distance\",\"W9-ALL\",\"EDS\")",                     "(in the value's own unit)"],
    ["=ZC.FLUX_AB(20,\"erg/s/cm2/Angstrom\",5000)",                              "erg/s/cm2/Angstrom"],
    ["=ZC.PARAM(\"Tcmb\",\"EDS\")",                                              "K"],
    ["=ZC.PARAM(\"hubble_distance\")",                                           "Mpc"],
    // the functions read these texts whatever their case, spaces, "_" and "-" (choiceKey): so does the unit
    ["=ZC.PARAM(\"tcmb\")",                                                      "K"],
    ["=ZC.RESCALE(-21,0.5,\"Magnitude\",\"W9-ALL\")",                           "mag"],
    ["=ZC.PARAM(\"hubble distance\")",                                           "Mpc"],
    ["=ZC.PARAM(\"HubbleDistance\")",                                            "Mpc"],
    ["=ZC.PARAM(\"age-today\")",                                                 "Gyr"],
    ["=ZC.RESCALE(-21,0.5,\"MAG NITUDE\",\"W9-ALL\")",                          "mag"],
  ])("%s: %s", async (formula, unit) => {
    const [call] = await explainFormula(formula, blanks, p18Cmb);
    expect(call.isError, call.result).toBe(false);
    expect(call.result.endsWith(` ${unit}`), call.result).toBe(true);
    expect((call.exact ?? call.result).endsWith(` ${unit}`), call.exact).toBe(true); // every digit, with the unit too
  });

  test("a text that chooses the unit is read from the cell of a range that computed the selected cell, without its spaces", async () => {
    const cells = sheet1({ "$A$1:$A$2": [["distance"], ["magnitude"]], B1: [[" magnitude "]], C1: [["Tcmb"]] });
    const rescale = "=ZC.RESCALE(100,0.5,$A$1:$A$2,\"W9-ALL\",\"EDS\")";
    const [first] = await explainFormula(rescale, cells, p18Cmb, undefined, { row: 0, col: 0 });
    expect(first.result).toMatch(/^[\d.]+ \(in the value's own unit\) \(row 1 of 2×1 values: this cell\)$/);
    const [second] = await explainFormula(rescale, cells, p18Cmb, undefined, { row: 1, col: 0 });
    expect(second.result).toMatch(/^[\d.]+ mag \(row 2 of 2×1 values: this cell\)$/);
    const [spaced] = await explainFormula("=ZC.RESCALE(-21,0.5,B1,\"W9-ALL\")", cells, p18Cmb);
    expect(spaced.result).toMatch(/^-[\d.]+ mag$/);
    const [param] = await explainFormula("=ZC.PARAM(C1,\"EDS; Tcmb=2.7255\")", cells, p18Cmb);
    expect(param.result).toBe("2.7255 K"); // the model's Tcmb as given
  });

  test("a value with no unit shows the number alone, every digit only when they differ", async () => {
    const [om] = await explainFormula('=ZC.PARAM("Om","EDS")', blanks, p18Cmb);
    expect([om.result, om.exact]).toEqual(["1", undefined]); // EDS: Ωm = 1 (Einstein & de Sitter 1932)
    const [text] = await explainFormula('=ZC.MODEL("EDS","H0",72)', blanks, p18Cmb);
    expect([text.result, text.exact]).toEqual(['"EDS; H0=72"', undefined]);
  });

  test.each([
    // function          fixed unit (the pane's Result row and the README's default units read it)
    ["MODULUS",          "mag"],
    ["CMB_TEMP",         "K"],
    ["COORD_DEG",        "deg"],
    ["SURFACE_LUM",      "Lsun/pc2"],
    ["DIST_LUM",         undefined], // its unit argument sets it
    ["FLUX_AB",          undefined], // its unit argument decides it
    ["RESCALE",          undefined],
    ["NOT_A_FUNCTION",   undefined],
  ])("fixedResultUnit(%s) is %s", (name, unit) => {
    expect(fixedResultUnit(name)).toBe(unit);
  });
});
