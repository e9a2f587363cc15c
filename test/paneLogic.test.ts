/** The pane's logic without a host: the model form, table plans, provenance notes, theme contrast, the cell inspector. */
import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { definitions } from "../functions/definitions.js";
import { evaluate } from "../functions/evaluate.js";
import { readWorkbookModels } from "../functions/workbookModels.js";
import { parentsOf, placeIn } from "../taskpane/broadcastPlace.js";
import { explainFormula, inspectorNestedCellLimit, inspectorReadLimit, type ReferenceReader } from "../taskpane/explainCall.js";
import { findCalls } from "../taskpane/formulaCalls.js";
import { publishedModels } from "./fixtures.js";
import { expectRelative } from "./helpers.js";
import { SlowCosmology } from "./reference/slowCosmology.js";
import { changedFields, derivedValues, formFromSpec, modelFromForm } from "../taskpane/modelForm.js";
import { parseProvenanceNote, provenanceNote } from "../taskpane/provenanceNote.js";
import { contrast } from "../taskpane/theme.js";
import { columnName, columnNumber } from "../taskpane/cellAddress.js";
import { chartTitle, planTableForColumn, planTableWithRedshifts, redshiftSteps, tableCounts } from "../taskpane/whatIfTable.js";

describe("model form", () => {
  test("shows a preset and gives back its canonical spec; an edit is a change to the preset", () => {
    const form = formFromSpec("P18-BAO");
    expect(form.OL).toBe("flat");
    expect(modelFromForm(form).spec).toBe("P18-BAO");
    expect(modelFromForm({ ...form, H0: "73" }).spec).toBe("P18-BAO; H0=73");
    // without a preset the defaults (w0 = −1, wa = 0, Tcmb = 0, Neff = 3.046, mnu = 0) are left out
    expect(modelFromForm({ ...form, preset: "", OL: "0.7", Tcmb: "0", mnu: "0", Ob: "" }).spec).toBe("H0=67.66; Om=0.3111; OL=0.7");
  });

  test("puts the core's own message on the field that is wrong", () => {
    const form = formFromSpec("P18-BAO");
    expect(modelFromForm({ ...form, H0: "abc" }).errors.H0).toBe('H0: "abc" is not a number');
    expect(modelFromForm({ ...form, H0: "-1" }).errors.H0).toMatch(/^H0 must be a positive number/);
    expect(modelFromForm({ ...form, preset: "", Tcmb: "0", mnu: "0", OL: "2", Om: "0", Ob: "" }).errors.model).toMatch(/^no big bang/);
    expect(modelFromForm({ ...form, Ob: "0.9" }).errors.Ob).toMatch(/^Ob must be between 0 and Om/);
  });

  test("derived values include the age and z_eq, and say when there is no radiation", () => {
    const d = derivedValues(modelFromForm(formFromSpec("P18-BAO")).model!);
    expect(d.find((x) => x.label === "Age today")!.value).toBe("13.787 Gyr"); // Planck 2018 VI Table 2: 13.787
    expect(derivedValues(modelFromForm(formFromSpec("CONCORDANCE")).model!).find((x) => x.label.startsWith("Matter"))!.value).toBe("none (Tcmb = 0)");
  });
});

describe("what-if tables", () => {
  test("column names round-trip (A, Z, AA, XFD: Excel's 16384 columns, common practice)", () => {
    for (const [n, s] of [[1, "A"], [26, "Z"], [27, "AA"], [16384, "XFD"]] as const) {
      expect(columnName(n)).toBe(s);
      expect(columnNumber(s)).toBe(n);
    }
  });

  test("redshift steps are inclusive of stop and refuse nonsense", () => {
    expect(redshiftSteps(0, 1, 0.25)).toEqual([0, 0.25, 0.5, 0.75, 1]);
    expect(redshiftSteps(0.1, 0.3, 0.1)).toEqual([0.1, 0.2, 0.3]);
    // 0.1 to 1 by 0.1 ends at 1 although 0.1 + 9 × 0.1 is 0.9999999999999999 in binary floating point
    expect(redshiftSteps(0.1, 1, 0.1)).toEqual([0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9, 1]);
    expect(() => redshiftSteps(-1, 1, 0.1)).toThrow(/not negative/);
    expect(() => redshiftSteps(0, 1, 0)).toThrow(/step must be > 0/);
    expect(() => redshiftSteps(0, 1e6, 1)).toThrow(/at most 10,000/);
  });

  test("the message after inserting counts redshifts and models, not rows", () => {
    expect(tableCounts(planTableWithRedshifts("DIST_LUM", redshiftSteps(0.1, 1, 0.25), ["P18-CMB", "W9-ALL", "EDS"], 10, 4))).toBe("4 redshifts × 3 models");
    expect(tableCounts(planTableForColumn("AGE", { row: 2, col: 1, rows: 1 }, ["EDS"]))).toBe("1 redshift × 1 model");
  });

  test("a selected column gets the models in the row above and one formula beside it", () => {
    const plan = planTableForColumn("AGE", { row: 2, col: 1, rows: 39 }, ["P18-BAO", "W9-ALL", "EDS"]);
    expect(plan.anchor).toBe("B1");
    expect(plan.cells).toEqual([["P18-BAO", "W9-ALL", "EDS"], ["=ZC.AGE($A$2:$A$40,$B$1:$D$1)", "", ""]]);
    expect(plan.area).toBe("B1:D40");
    expect(() => planTableForColumn("AGE", { row: 1, col: 1, rows: 3 }, ["EDS"])).toThrow(/below a header row/);
    expect(() => planTableForColumn("AGE", { row: 2, col: 1, rows: 3 }, Array(9).fill("EDS"))).toThrow(/at most eight/);
  });
});

describe("provenance and contrast", () => {
  test("the note carries formula, every model and the version", () => {
    const note = provenanceNote("=ZC.DIST_LUM(A2)", ["W9-ALL", "W9-ALL"], "0.3.0", "2026-12-01");
    expect(note).toBe(
      "Replaced with its value by zcell 0.3.0 on 2026-12-01.\nFormula: \"=ZC.DIST_LUM(A2)\"\nModel: W9-ALL\nValue computed under that cosmology; recompute with the add-in if the model changes.",
    );
    expect(parseProvenanceNote(note)).toEqual({ formula: "=ZC.DIST_LUM(A2)", models: ["W9-ALL"] });
  });

  test.each([
    // a note as an earlier version wrote it (its pane called the action Freeze)                                                              | formula read back
    ["0.2.0", 'Frozen by zcell 0.2.0 on 2026-03-02.\nFormula: "=ZC.DIST_LUM(A2, \\"W9-ALL\\")"\nModel: W9-ALL\nValue computed under that cosmology; recompute with the add-in if the model changes.', '=ZC.DIST_LUM(A2, "W9-ALL")'],
    ["0.1.0", "Frozen by zcell 0.1.0 on 2025-11-20.\nFormula: =ZC.AGE(B3)\nModel: P18-BAO\nValue computed under that cosmology; recompute with the add-in if the model changes.",                 "=ZC.AGE(B3)"],
  ])("a note written by zcell %s is still read", (_version, note, formula) => {
    expect(parseProvenanceNote(note)?.formula).toBe(formula);
  });

  test("only our first line makes a note ours: a person's note that mentions zcell is not", () => {
    expect(parseProvenanceNote('Replaced with its value by hand on 2026-01-01.\nFormula: "=ZC.AGE()"\nModel: W9-ALL')).toBeUndefined();
    expect(parseProvenanceNote('Thawed by zcell 0.2.0 on 2026-01-01.\nFormula: "=ZC.AGE()"\nModel: W9-ALL')).toBeUndefined();
  });

  test.each([
    // foreground  background  (the pane's palettes; WCAG 2.1 AA needs ≥ 4.5)
    ["#242424", "#ffffff"], ["#595959", "#ffffff"], ["#ffffff", "#0f6cbd"], ["#b10e1c", "#ffffff"], ["#4d3800", "#fff4ce"],
    ["#f0f0f0", "#1f1f1f"], ["#c8c8c8", "#1f1f1f"], ["#0a0a0a", "#479ef5"], ["#ff99a4", "#1f1f1f"], ["#ffe8a3", "#463100"],
    ["#0f6cbd", "#ffffff"], ["#479ef5", "#1f1f1f"],
  ])("text %s on %s has contrast ≥ 4.5:1", (fg, bg) => {
    expect(contrast(fg, bg)).toBeGreaterThanOrEqual(4.5);
  });

  test("contrast of black on white is 21:1 (WCAG 2.1 definition)", () => {
    expect(contrast("#000000", "#ffffff")).toBeCloseTo(21, 10);
  });
});

/** A reader for which every reference is one blank cell. */
const blanks: ReferenceReader = async () => ({ cells: 1, values: [[""]] });

describe("cell inspector", () => {
  test("explains every worksheet function: a summary, an equation and a method for each", async () => {
    const active = { spec: "P18-BAO", stored: false };
    for (const name of Object.keys(definitions)) {
      const [call] = await explainFormula(`=ZC.${name}()`, blanks, active);
      expect(call.summary, name).not.toBe("");
      expect(call.equation, name).not.toBe("");
      expect(call.method, name).not.toBe("");
      // plain words first: one short line, the detail behind it
      expect(call.methodPlain.length, name).toBeLessThanOrEqual(call.method.length);
      expect(call.methodPlain, name).not.toMatch(/Hermite|Gauss–Legendre|bisection/);
    }
  });

  test("a restatement between two models shows each: From model and To model, and its result is under the To model", async () => {
    const active = { spec: "P18-CMB", stored: false };
    const [call] = await explainFormula('=ZC.RESCALE(3.2E44,0.84,"luminosity","W9-ALL","EDS")', blanks, active);
    expect(call.model).toBeUndefined(); // no one model computed it
    expect(call.modelArgs!.map((m) => [m.label, m.argument, m.model!.spec, m.model!.source])).toEqual([
      ["From model", "from_model", "W9-ALL", "given in the formula"],
      ["To model", "to_model", "EDS", "given in the formula"],
    ]);
    expect(call.modelArgs![1].model!.description).toMatch(/^flat: matter only; H0 = 70 km\/s\/Mpc/);
    expect(call.conventions).toContain("Radiation off (Tcmb = 0): no photons, no neutrinos."); // EDS's, the model the result is under
    // (D_L,EDS / D_L,W9-ALL)² at z = 0.84: EDS from its closed form (Hogg 1999 eq. 16, Ωm = 1), W9-ALL from the independent slow path (Hinshaw et al. 2013 Table 4)
    const eds = (1 + 0.84) * 2 * (299_792.458 / 70) * (1 - 1 / Math.sqrt(1.84));
    const w9 = new SlowCosmology(publishedModels["W9-ALL"]).luminosityDistanceMpc(0.84);
    expectRelative(Number((call.exact ?? call.result).split(" ")[0]), 3.2e44 * (eds / w9) ** 2, 1e-9, "RESCALE luminosity");
    // a blank to_model is the workbook's, said so
    const [blank] = await explainFormula('=ZC.RESCALE(3.2E44,0.84,"luminosity","W9-ALL")', blanks, active);
    expect(blank.modelArgs![1].model).toMatchObject({ spec: "P18-CMB", source: "the workbook's model" });
  });

  test.each([
    // formula                                              the result's unit, as the pane shows it
    ["=ZC.CMB_TEMP(1100)",                                  "K"],
    ["=ZC.MODULUS(0.1)",                                    "mag"],
    ["=ZC.EXTINCTION(5500,0.1)",                            "mag"],
    ["=ZC.COORD_DEG(\"14:05:12.3\",\"ra\")",                "deg"],
    ["=ZC.PARAM(\"age_today\")",                            "Gyr"],
    ["=ZC.PARAM(\"H0\")",                                   "km/s/Mpc"],
    ["=ZC.PARAM(\"Om\")",                                   ""],
    ["=ZC.OBSERVED_FRAME(1.4,0.05,\"frequency\",\"GHz\")",  "GHz"],
    ["=ZC.REST_FRAME(7200,0.1,\"wavelength\")",             "(in the value's own unit)"],
    ["=ZC.LUMINOSITY_REST(2.5,1.1,-0.7,3,1.4,,,\"mJy\")",     "W/Hz"],
    ["=ZC.LUMINOSITY_REST(2.5,1.1,-0.7,3,1.4,,,\"mJy\",\"Lsun\")", "Lsun"],
    ["=ZC.FLUX_AB(20)",                                     "Jy"],
    ["=ZC.CONVERT(1,\"Mpc\",\"Gly\")",                        "Gly"],
    ["=ZC.RESCALE(-21,0.5,\"magnitude\",\"W9-ALL\")",         "mag"],
    ["=ZC.BRIGHTNESS_TEMP(50,8.4,2,1,,\"mJy\",,\"mas\")",     "K"],
    ["=ZC.INDEX_BETWEEN(12.4,1.4,3.1,5)",                   ""],
  ])("%s: the Result row shows the unit %s", async (formula, unit) => {
    const [call] = await explainFormula(formula, blanks, { spec: "P18-CMB", stored: false });
    expect(call.isError, call.result).toBe(false);
    expect(call.result).toMatch(new RegExp(`^-?[\\d.]+(?:e[+-]\\d+)?${unit ? ` ${unit.replace(/[()/]/g, "\\$&")}` : ""}$`));
  });

  test("an omitted text argument shows the default it stands for, as the help does", async () => {
    const [call] = await explainFormula("=ZC.INDEX_BETWEEN(12.4,1.4,3.1,5)", blanks, { spec: "P18-CMB", stored: false });
    expect(call.args.find((a) => a.name === "band_unit")!.value).toBe('default "GHz"');
    const [dimming] = await explainFormula("=ZC.DIMMING(1)", blanks, { spec: "P18-CMB", stored: false });
    expect(dimming.args.find((a) => a.name === "alpha")!.value).toBe("left out: bolometric");
  });

  test("a unit that applies to a value and its error is shown beside both", async () => {
    const [call] = await explainFormula('=ZC.SIZE_ERR(2,0.1,1,0.01)', blanks, { spec: "P18-BAO", stored: false });
    expect(call.args.filter((a) => a.unit === "arcsec").map((a) => a.name)).toEqual(["angle", "angle_err"]);
    expect(call.result).toMatch(/ kpc$/);
  });
});

describe("an error explained: the argument at fault and how to fix it", () => {
  const active = { spec: "P18-CMB", stored: false };
  // The messages are the functions' own (functions/messages.ts and the core's checks); what is
  // expected here is our own advice, so each row names the argument the message is about.
  //   formula                                              argument   formula text   how to fix (part)
  const cases: [string, string | undefined, string | undefined, RegExp][] = [
    ["=ZC.DIST_LUM(-0.5)",                                  "z",       "-0.5",        /^Give z a redshift ≥ 0 \(> 0 where the result needs the source's distance/],
    ["=ZC.DIST_BETWEEN(2,1)",                               "z2",      "1",           /^Give z2 a redshift ≥ 0/],
    ['=ZC.DIST_LUM(1,"H0=70; Om=0; OL=2")',                 "model",   '"H0=70; Om=0; OL=2"', /^Check Om, OL\/Ok, w0, wa\.$/],
    ['=ZC.DIST_LUM(1,"P99")',                                "model",   '"P99"',       /^Use one of P18-CMB, P18-BAO, .*, EDS\.$/],
    ['=ZC.DIST_LUM(1,,"mpc")',                              "unit",    '"mpc"',       /^Did you mean Mpc\?$/],
    ['=ZC.DIST_LUM(1,,"furlong")',                          "unit",    '"furlong"',   /FITS spelling, case as shown \(default "Mpc"\)/],
    ["=ZC.SIZE(-2,1)",                                      "angle",   "-2",          /^Give angle a value from 0 to 180° in the unit of angle_unit \(default arcsec\)/],
    ["=ZC.MAG_ABS(99,0.5)",                                 "m",       "99",          /missing magnitude in a catalogue/],
    ['=ZC.OMEGA("dust",1)',                                  "component", '"dust"',   /^Use one of: matter, cold, darkenergy/],
    ['=ZC.REDSHIFT(1E5,"DIST_ANG")',                         undefined, undefined,    /^No value answers these arguments in this model/],
  ];
  test.each(cases)("%s", async (formula, argument, text, fix) => {
    const [call] = await explainFormula(formula, blanks, active);
    expect(call.isError).toBe(true);
    expect(call.fault?.argument).toBe(argument);
    expect(call.fault?.text).toBe(text);
    expect(call.fault?.fix).toMatch(fix);
  });

  // A message that names its own fix: the pane says the same (the message's words, functions/messages.ts),
  // and a message that names none never gets a domain the value already meets (0.55 is > 0, 1e9 pc ≥ 0).
  //   formula                                       argument       the whole "How to fix" line
  const ownFix: [string, string, string][] = [
    ["=ZC.EXTINCTION(0.55,0.1)",                     "wavelength",  'If 0.55 is in um, give "um" as wavelength_unit (5th argument).'],
    ["=ZC.EXTINCTION(500,0.1)",                      "wavelength",  'If 500 is in nm, give "nm" as wavelength_unit (5th argument).'],
    ["=ZC.EXTINCTION(1149,0.1)",                     "wavelength",  "Change wavelength in the unit of wavelength_unit (default Angstrom): the message says what it must be."],
    ['=ZC.ANGLE(1e9,0.001,,"pc")',                   "size",        "Change size in the unit of size_unit (default kpc): the message says what it must be."],
    ["=ZC.ANGLE(30,0)",                              "z",           "Give z > 0."],
    ['=ZC.MAG_AB(1e-17,"erg/s/cm2/A",5000)',         "unit",        'Write "erg/s/cm2/Angstrom".'],
    ['=ZC.FLUX_AB(20,"erg/s/cm2/Angstrom")',         "wavelength",  "Give wavelength in Angstrom (the last argument), for f_ν = f_λ λ²/c."],
    ['=ZC.CONVERT(1,"((((m))))((((((((((((((((((((m","Mpc")', "from", "Type a unit in its FITS spelling, case as shown; the Units section of the help lists them."],
    ["=ZC.MAG_AB(-0.001)",                           "flux_density", "Give flux_density a value > 0 in the unit of unit (default Jy)."],
    ['=ZC.DIST_LUM(0.5,"H0=70 km/s/Mpc; Om=0.3")',  "model",       "Give the number alone (H0 is in km/s/Mpc)."],
    ['=ZC.REDSHIFT_CMB(0.01,12,10,"hours")',         "angle_unit",  'For a right ascension in hours use "hourangle".'],
  ];
  test.each(ownFix)("%s: the pane's fix agrees with the cell's message", async (formula, argument, fix) => {
    const [call] = await explainFormula(formula, blanks, active);
    expect(call.isError).toBe(true);
    expect(call.fault).toMatchObject({ argument, fix });
  });

  test("a stranger's text quoted in the message is never shown as the fix, typed or read from a cell", async () => {
    const hostile = "x: give your password to the cell Z1; if asked, write it";
    const fromCell: ReferenceReader = async () => ({ cells: 1, values: [[hostile]] });
    for (const [formula, read] of [[`=ZC.DIST_LUM(1,,"${hostile}")`, blanks], ["=ZC.DIST_LUM(1,,A1)", fromCell], ["=ZC.CONVERT(1,A1,\"Mpc\")", fromCell]] as const) {
      const [call] = await explainFormula(formula, read, active);
      expect(call.result).toContain("give your password"); // the message quotes it
      expect(call.fault?.fix, formula).toMatch(/^Type a unit in its FITS spelling/);
    }
  });

  test.each([
    // a model text whose "," the message shows as "; " (review finding): no fix may begin inside it
    ["H0=70,give=yourpasswordtocellZ1; x: separate"],
    ["H0=70,write=yourpasswordtocellZ1; x: separate"],
    ["H0=70,use=the\u2800password\u2800to\u2800Z1; x: separate"],
    ['H0=70,give="yourpassword"; x'],
  ])("a model text %j never puts its words in the pane's fix, typed or read from a cell", async (hostile) => {
    const fromCell: ReferenceReader = async () => ({ cells: 1, values: [[hostile]] });
    for (const [formula, read] of [[`=ZC.DIST_LUM(1,"${hostile.replaceAll('"', '""')}")`, blanks], ["=ZC.DIST_LUM(1,A1)", fromCell]] as const) {
      const [call] = await explainFormula(formula, read, active);
      expect(call.isError, formula).toBe(true);
      expect(call.fault?.fix ?? "", formula).not.toMatch(/password/i);
    }
  });

  test("a cell whose arguments only Excel computes gets the advice of its error kind", async () => {
    const [call] = await explainFormula("=ZC.DIST_LUM(SUM(A1:A3))", blanks, active, "#NUM!");
    expect(call.fault).toEqual({ fix: "A value lies outside its physical domain, or the result does: the message says which." });
  });

  test("a cell's shown value is a stranger's text: only Excel's own error values get advice", async () => {
    // hostile values a workbook can hold in a cell (object-property names, look-alikes, a huge text)
    for (const shown of ["constructor", "__proto__", "toString", "#num!", "#NUM! ", "#N/A".repeat(10_000)]) {
      const [call] = await explainFormula("=ZC.DIST_LUM(SUM(A1:A3))", blanks, active, shown);
      expect(call.fault, JSON.stringify(shown).slice(0, 20)).toBeUndefined();
    }
  });

  test("a hostile model text in the formula is quoted, cut, and still named as the argument at fault", async () => {
    const hostile = `${"(((((a+)+)+)+".repeat(5_000)}; H0=model:`;
    const [call] = await explainFormula(`=ZC.DIST_LUM(1,"${hostile}")`, blanks, active);
    expect(call.isError).toBe(true);
    expect(call.fault?.argument).toBe("model");
    expect(call.result.length).toBeLessThan(400); // the message quotes at most 40 characters of it
  });

  test("a value that is not an error has no advice", async () => {
    const [call] = await explainFormula("=ZC.DIST_LUM(1)", blanks, active);
    expect(call.fault).toBeUndefined();
  });
});

describe("charts of what-if tables", () => {
  test("plot each model's column against the redshift column, titled with quantity, unit and models", () => {
    const own = planTableWithRedshifts("LOOKBACK", [0.5, 1, 2], ["P18-BAO", "EDS"], 4, 2); // table at B4
    expect(own.chart).toEqual({ z: "B5:B7", series: [{ name: "P18-BAO", values: "C5:C7" }, { name: "EDS", values: "D5:D7" }] });
    const selected = planTableForColumn("DIST_LUM", { row: 6, col: 4, rows: 3 }, ["W9-ALL"]); // z in D6:D8
    expect(selected.chart).toEqual({ z: "D6:D8", series: [{ name: "W9-ALL", values: "E6:E8" }] });
    expect(chartTitle("LOOKBACK", ["P18-BAO", "EDS"])).toBe("look-back time (Gyr) against redshift — P18-BAO, EDS");
  });
});

describe("the not-applied mark", () => {
  test("names the entries of the form that differ from the workbook's model, none when they agree", () => {
    const applied = formFromSpec("W9-ALL");
    expect(changedFields(formFromSpec("W9-ALL"), applied)).toEqual([]);
    expect(changedFields({ ...applied, H0: "73" }, applied)).toEqual(["H0"]);
    expect(changedFields({ ...applied, H0: " 69.32 " }, applied)).toEqual([]); // spaces are not a change
    expect(changedFields(formFromSpec("W9-ALL; Om=0.3"), applied)).toEqual(["Om"]);
    expect(changedFields(formFromSpec("P18-CMB"), applied)[0]).toBe("preset");
  });
});

/** A reader over an invented Sheet1: each reference's values by its text, with the address Excel would resolve. */
function sheet1(cells: Record<string, unknown[][]>, reads: [string, number][] = []): ReferenceReader {
  return async (reference, maxCells) => {
    reads.push([reference, maxCells]);
    if (!(reference in cells)) throw new Error(`no reference ${reference}`);
    const values = cells[reference];
    return { address: `Sheet1!${reference.replaceAll("$", "")}`, cells: values.length * values[0].length, values };
  };
}

/** Einstein–de Sitter (Ωm = 1, flat, no radiation) D_L = (1+z)·2D_H(1 − 1/√(1+z)): Hogg (1999) eq. 16 with ΩΛ = 0, Ωm = 1; EDS is H0 = 70. */
const edsLuminosityDistanceMpc = (z: number) => (1 + z) * 2 * (299_792.458 / 70) * (1 - 1 / Math.sqrt(1 + z));

/** The exact value of a call's result (every digit), as a number. */
const exactOf = (call: { exact?: string; result: string }) => Number(/^-?[\d.e+-]+/.exec(call.exact ?? call.result)![0]);

describe("the inspector at one cell of a spilled result: the model and the arguments of that cell", () => {
  const active = { spec: "P18-CMB", stored: false };
  // the what-if table the pane inserts: a column of redshifts against a row of models
  const table = "=ZC.DIST_LUM($A$2:$A$3,$B$1:$C$1)";
  const cells = { "$A$2:$A$3": [[0.5], [1]], "$B$1:$C$1": [["EDS", "W9-ALL"]] };

  test.each([
    // row col  z    model     model cell
    [0,    0,   0.5, "EDS",    "Sheet1!B1"],
    [1,    0,   1,   "EDS",    "Sheet1!B1"],
    [0,    1,   0.5, "W9-ALL", "Sheet1!C1"],
    [1,    1,   1,   "W9-ALL", "Sheet1!C1"],
  ] as const)("a what-if table at row %i, column %i: z = %s under %s", async (row, col, z, model, modelCell) => {
    const [call] = await explainFormula(table, sheet1(cells), active, undefined, { row, col });
    expect(call.model).toMatchObject({ spec: model, source: "given in the formula", where: `${modelCell} for this cell` });
    // the description follows the name the row shows already, without repeating it
    expect(call.model!.description).toMatch(/^flat: matter/);
    expect(call.model!.description.startsWith(model)).toBe(false);
    expect(call.models).toEqual(["EDS", "W9-ALL"]);
    expect(call.args[0].value).toBe(`${z} (Sheet1!A${2 + row} for this cell)`);
    expect(call.args[1].value).toBe(`"${model}" (${modelCell} for this cell)`);
    // the same value as the formula of that one cell, computed on its own
    const [single] = await explainFormula(`=ZC.DIST_LUM(${z},"${model}")`, sheet1({}), active);
    expect(call.result).toBe(`${single.result} (row ${row + 1}, column ${col + 1} of 2×2 values: this cell)`);
    expect(call.exact).toBe(single.exact);
    // and the physics: EDS from its closed form, W9-ALL from the independent slow path (Hinshaw et al. 2013 Table 4)
    const expected = model === "EDS" ? edsLuminosityDistanceMpc(z) : new SlowCosmology(publishedModels["W9-ALL"]).luminosityDistanceMpc(z);
    expectRelative(exactOf(call), expected, 1e-9, `${model} at z = ${z}`);
  });

  test("a key/value block is one model for every cell", async () => {
    const block = { "$A$2:$A$3": [[0.5], [1]], "$E$1:$F$2": [["H0", 70], ["Om", 0.3]] };
    const [call] = await explainFormula("=ZC.DIST_LUM($A$2:$A$3,$E$1:$F$2)", sheet1(block), active, undefined, { row: 1, col: 0 });
    expect(call.model).toMatchObject({ spec: "H0=70; Om=0.3", source: "given in the formula", where: "the key/value block Sheet1!E1:F2" });
    expect(call.models).toBeUndefined();
    expect(call.args[1].value).toBe('a key/value block: "H0=70; Om=0.3"');
    expect(call.args[0].value).toBe("1 (Sheet1!A3 for this cell)");
    // flat, H0 = 70, Ωm = 0.3, no radiation (a spec without a preset has Tcmb = 0): the slow path
    const slow = new SlowCosmology({ H0: 70, Om: 0.3, w0: -1, wa: 0, Tcmb: 0, Neff: 3.046, mnu: [] });
    expectRelative(exactOf(call), slow.luminosityDistanceMpc(1), 1e-9, "D_L(1), H0=70; Om=0.3");
  });

  test("a model cell naming a model of this workbook names it, with what it stands for", async () => {
    const withModels = { ...active, models: readWorkbookModels({ "TEAM-FIDUCIAL": "P18-BAO; H0=70" }) };
    const [call] = await explainFormula(table, sheet1({ ...cells, "$B$1:$C$1": [["team-fiducial", "EDS"]] }), withModels, undefined, { row: 1, col: 0 });
    expect(call.model).toMatchObject({ spec: "team-fiducial", source: "given in the formula", where: "Sheet1!B1 for this cell; a model of this workbook" });
    expect(call.model!.description).toMatch(/^P18-BAO; H0=70: flat/);
    // Planck 2018 VI Table 2 (P18-BAO) with H0 = 70, from the slow path
    expectRelative(exactOf(call), new SlowCosmology({ ...publishedModels["P18-BAO"], H0: 70 }).luminosityDistanceMpc(1), 1e-9, "TEAM-FIDUCIAL");
  });

  test("a blank model cell is the workbook's model, said so", async () => {
    const [call] = await explainFormula(table, sheet1({ ...cells, "$B$1:$C$1": [["", "W9-ALL"]] }), active, undefined, { row: 0, col: 0 });
    expect(call.model).toMatchObject({ spec: "P18-CMB", source: "the workbook's model", where: "Sheet1!B1 for this cell is blank" });
    expect(call.models).toEqual(["P18-CMB (the workbook's model)", "W9-ALL"]);
    expect(call.args[1].value).toBe("the workbook's model (Sheet1!B1 for this cell)");
    expectRelative(exactOf(call), new SlowCosmology(publishedModels["P18-CMB"]).luminosityDistanceMpc(0.5), 1e-9, "P18-CMB (Planck 2018 VI Table 2)");
  });

  test("a nested ZC.MODEL over a row of H0 values: each cell names its own model, the inner call its own cell", async () => {
    const formula = '=ZC.DIST_LUM($A$2:$A$3,ZC.MODEL("P18-CMB","H0",$B$1:$C$1))';
    const [outer, inner] = await explainFormula(formula, sheet1({ ...cells, "$B$1:$C$1": [[60, 75]] }), active, undefined, { row: 1, col: 1 });
    expect(outer.name).toBe("ZC.DIST_LUM");
    expect(outer.model).toMatchObject({ spec: "P18-CMB; H0=75", where: "column 2 of the result of ZC.MODEL for this cell" });
    expect(outer.models).toEqual(["P18-CMB; H0=60", "P18-CMB; H0=75"]);
    expect(inner.args.find((a) => a.name === "value1")!.value).toBe("75 (Sheet1!C1 for this cell)");
    expect(inner.result).toBe('"P18-CMB; H0=75" (column 2 of 1×2 values: this cell)');
    expectRelative(exactOf(outer), new SlowCosmology({ ...publishedModels["P18-CMB"], H0: 75 }).luminosityDistanceMpc(1), 1e-9, "P18-CMB, H0 = 75");
  });

  test("where the cell's place is not known, the models are listed and none is claimed", async () => {
    for (const [formula, at] of [[table, undefined], [`=SUM(${table.slice(1)})`, { row: 0, col: 0 }]] as const) {
      const [call] = await explainFormula(formula, sheet1(cells), active, undefined, at);
      expect(call.model, formula).toBeUndefined();
      expect(call.modelNote).toBe("one per cell of $B$1:$C$1; which of them computed this cell is not known here");
      expect(call.models).toEqual(["EDS", "W9-ALL"]);
      expect(call.result).toMatch(/ \(the first of 2×2 values; which one this cell shows is not known here\)$/);
    }
  });

  test("a place outside the result is not taken for a cell of it", async () => {
    const [call] = await explainFormula(table, sheet1(cells), active, undefined, { row: 2, col: 0 });
    expect(call.model).toBeUndefined();
    expect(call.result).toMatch(/which one this cell shows is not known here/);
  });

  test("ranges that do not broadcast: the error of the whole call, no cell of theirs named", async () => {
    const [call] = await explainFormula("=ZC.DIST_LUM($A$2:$A$3,$B$1:$B$3)", sheet1({ ...cells, "$B$1:$B$3": [["EDS"], ["W9-ALL"], ["EDS"]] }), active, undefined, { row: 0, col: 0 });
    expect(call.isError).toBe(true);
    expect(call.result).toMatch(/^#VALUE! — ZC.DIST_LUM: /);
    expect(call.result).not.toMatch(/this cell/);
    expect(call.args[0].value).toBe("range 2×1, first 0.5");
    expect(call.model).toBeUndefined();
    expect(call.modelNote).toMatch(/which of them computed this cell is not known here/);
  });

  test("a single model given in the formula or omitted is the same for every cell", async () => {
    const [given] = await explainFormula('=ZC.DIST_LUM($A$2:$A$3,"W9-ALL")', sheet1(cells), active, undefined, { row: 1, col: 0 });
    expect(given.model).toMatchObject({ spec: "W9-ALL", source: "given in the formula" });
    expect(given.model!.where).toBeUndefined();
    const [omitted] = await explainFormula("=ZC.DIST_LUM($A$2:$A$3)", sheet1(cells), active, undefined, { row: 1, col: 0 });
    expect(omitted.model).toMatchObject({ spec: "P18-CMB", source: "the workbook's model" });
    expect(omitted.result).toMatch(/ \(row 2 of 2×1 values: this cell\)$/);
  });

  test("a model only Excel computes is not claimed to be the workbook's", async () => {
    const [call] = await explainFormula('=ZC.DIST_LUM(1,IF(TRUE,"EDS"))', sheet1({}), active, undefined, { row: 0, col: 0 });
    expect(call.model).toBeUndefined();
    expect(call.modelNote).toBe("computed by Excel: not known here");
  });

  test("any shapes that broadcast: each cell is explained with the cells of its arguments at its place (fast-check)", async () => {
    const shapes = (rows: number, cols: number) => fc.constantFrom([1, 1], [rows, 1], [1, cols], [rows, cols]);
    const models = ["EDS", "W9-ALL", "P18-CMB", "", "CONCORDANCE; H0=73"];
    await fc.assert(
      fc.asyncProperty(
        fc.integer({ min: 1, max: 4 }).chain((rows) =>
          fc.integer({ min: 1, max: 4 }).chain((cols) =>
            fc.record({
              rows: fc.constant(rows),
              cols: fc.constant(cols),
              zShape: shapes(rows, cols),
              mShape: shapes(rows, cols),
              zs: fc.array(fc.constantFrom(0, 0.25, 0.5, 1, 2, 3), { minLength: 16, maxLength: 16 }),
              ms: fc.array(fc.constantFrom(...models), { minLength: 16, maxLength: 16 }),
              row: fc.integer({ min: 0, max: rows - 1 }),
              col: fc.integer({ min: 0, max: cols - 1 }),
            }),
          ),
        ),
        async ({ zShape, mShape, zs, ms, row: anyRow, col: anyCol }) => {
          const grid = (shape: readonly number[], values: unknown[]) => Array.from({ length: shape[0] }, (_, r) => Array.from({ length: shape[1] }, (_, c) => values[r * 4 + c]));
          const z = grid(zShape, zs);
          const m = grid(mShape, ms);
          const rows = Math.max(zShape[0], mShape[0]);
          const cols = Math.max(zShape[1], mShape[1]);
          const [row, col] = [anyRow % rows, anyCol % cols]; // a cell of the result
          const [call] = await explainFormula("=ZC.DIST_LUM(Z,M)", sheet1({ Z: z, M: m }), active, undefined, { row, col });
          // the documented rule, written out here: a single row (column) serves every row (column)
          const pick = (x: unknown[][]) => x[x.length === 1 ? 0 : row][x[0].length === 1 ? 0 : col];
          const [zHere, mHere] = [pick(z), pick(m)];
          expect(call.model!.spec).toBe(mHere === "" ? "P18-CMB" : mHere);
          const [single] = await explainFormula(`=ZC.DIST_LUM(${zHere},"${mHere}")`, sheet1({}), active);
          const where = rows * cols === 1 ? "" : ` (${rows === 1 ? `column ${col + 1}` : cols === 1 ? `row ${row + 1}` : `row ${row + 1}, column ${col + 1}`} of ${rows}×${cols} values: this cell)`;
          expect(call.result).toBe(`${single.result}${where}`);
          // the wrapper's own broadcast gives that cell the same value
          expect(evaluate(definitions.DIST_LUM, [z, m], active)[row][col]).toBe(evaluate(definitions.DIST_LUM, [zHere, mHere], active)[0][0]);
        },
      ),
      { numRuns: 60 },
    );
  });

  test("placeIn reads a single row or column for every row or column, and nothing outside", () => {
    expect(placeIn({ row: 2, col: 1 }, 1, 3)).toEqual({ row: 0, col: 1 });
    expect(placeIn({ row: 2, col: 1 }, 4, 1)).toEqual({ row: 2, col: 0 });
    expect(placeIn({ row: 2, col: 1 }, 1, 1)).toEqual({ row: 0, col: 0 });
    expect(placeIn({ row: 2, col: 1 }, 2, 2)).toBeUndefined();
  });

  test("each call's parent is the call it is written in", () => {
    const calls = findCalls("=ZC.DIST_LUM(ZC.REDSHIFT(ZC.AGE(1),\"AGE\"), SUM(ZC.AGE(2)), (ZC.HUBBLE(3)))+ZC.AGE(4)");
    expect(calls.map((c) => c.name)).toEqual(["ZC.DIST_LUM", "ZC.REDSHIFT", "ZC.AGE", "SUM", "ZC.AGE", "ZC.HUBBLE", "ZC.AGE"]);
    expect(parentsOf(calls)).toEqual([-1, 0, 1, 0, 3, 0, -1]);
  });
});

describe("the inspector reads no reference larger than its limit", () => {
  const active = { spec: "P18-CMB", stored: false };

  test("every reference, a defined name too, is asked with the limit; one too large is not read, and the pane says so", async () => {
    const reads: [string, number][] = [];
    const reader: ReferenceReader = async (reference, maxCells) => {
      reads.push([reference, maxCells]);
      return { address: "Sheet1!A1:B1048576", cells: 2_097_152 };
    };
    const [call] = await explainFormula("=ZC.DIST_LUM(BigData)", reader, active, 2919.6);
    expect(reads).toEqual([["BigData", inspectorReadLimit]]);
    expect(call.args[0].value).toBe(`a range of 2,097,152 cells, not read (the inspector reads at most ${inspectorReadLimit.toLocaleString("en-US")})`);
    expect(call.result).toBe("2919.6 (as Excel shows it; an argument is not read)");
  });

  test("a reference Excel cannot read leaves the rest of the explanation standing", async () => {
    const reader: ReferenceReader = async () => {
      throw new Error("The requested resource doesn't exist.");
    };
    const [call] = await explainFormula("=ZC.DIST_LUM(Missing)", reader, active, "#NAME?");
    expect(call.args[0].value).toBe("not read (Excel: The requested resource doesn't exist.)");
    expect(call.equation).toMatch(/D_L = \(1\+z\)/);
  });

  test("a stranger's model range: long texts are cut, thousands of distinct ones are counted, not listed", async () => {
    const long = "P".repeat(32_767);
    const many = [[long, ...Array.from({ length: 1_999 }, (_, i) => `crafted ${i}`)]];
    const [call] = await explainFormula("=ZC.DIST_LUM(1,$A$1:$BXX$1)", sheet1({ "$A$1:$BXX$1": many }), active, undefined, { row: 0, col: 0 });
    expect(call.model!.spec.length).toBeLessThanOrEqual(101);
    expect(call.models!.length).toBe(9);
    expect(call.models!.at(-1)).toBe("… and 1,992 more");
    expect(Math.max(...call.models!.map((m) => m.length))).toBeLessThanOrEqual(101);
    expect(call.isError).toBe(true);
  });
});

describe("the inspector computes the cell it explains, not the whole result", () => {
  const active = { spec: "P18-CMB", stored: false };
  const column = (n: number, f: (i: number) => unknown) => Array.from({ length: n }, (_, i) => [f(i)]);

  /** Counts the calls of a definition's compute (and its kernel) while `run` runs. */
  async function computesOf<T>(name: string, run: () => Promise<T>): Promise<{ got: T; computes: number }> {
    const def = definitions[name];
    const { compute, kernel } = def;
    let computes = 0;
    def.compute = (a) => (computes++, compute!(a));
    if (kernel) def.kernel = { arg: kernel.arg, of: (a, x) => (computes++, kernel.of(a, x)) };
    try {
      return { got: await run(), computes };
    } finally {
      def.compute = compute;
      def.kernel = kernel;
    }
  }

  test("20,000 distinct model texts that do not parse: the model of the selected cell is resolved, not 20,000", async () => {
    const models = readWorkbookModels({ TEAM: "P18-BAO; H0=70" }); // a workbook model, so that each resolution asks for its name
    const specs = models.specs as Map<string, string>;
    let resolved = 0;
    const has = specs.has.bind(specs);
    specs.has = (name) => (resolved++, has(name));
    const cells = { "$A$1:$A$20000": column(20_000, (i) => 0.01 + i * 1e-5), "$C$1:$C$20000": column(20_000, (i) => `H0=${i}x; Om=0.3`) };
    const [call] = await explainFormula("=ZC.DIST_LUM($A$1:$A$20000,$C$1:$C$20000)", sheet1(cells), { ...active, models }, undefined, { row: 5, col: 0 });
    expect(call.isError).toBe(true);
    expect(call.result).toMatch(/H0: "5x"/);
    expect(call.result).toMatch(/\(row 6 of 20000×1 values: this cell\)$/);
    expect(resolved).toBeLessThanOrEqual(3); // was 20,000 and more: every cell's model was resolved
  });

  test("a what-if grid of 2,000 redshifts × 40 models that Excel never computes (IF(FALSE, …)): one cell computed, not 80,000", async () => {
    const cells = { "$A$1:$A$2000": column(2_000, (i) => 0.01 + i * 1e-3), "$B$1:$AO$1": [Array.from({ length: 40 }, (_, c) => `P18-CMB; H0=${60 + c / 4}`)] };
    for (const formula of ["=IF(FALSE,ZC.DIST_LUM($A$1:$A$2000,$B$1:$AO$1))", "=ZC.DIST_LUM($A$1:$A$2000,$B$1:$AO$1)"]) {
      const { got, computes } = await computesOf("DIST_LUM", () => explainFormula(formula, sheet1(cells), active, undefined, { row: 1999, col: 39 }));
      const [call] = got;
      // inside IF the selected cell's place in this call is not known: its first cell is shown, as before
      const shown = formula.startsWith("=IF") ? "the first of 2000×40 values" : "row 2000, column 40 of 2000×40 values: this cell";
      expect(call.result, formula).toContain(shown);
      expect(computes, formula).toBeLessThanOrEqual(2); // was 80,000
    }
  });

  test("a call inside another is computed whole only up to the limit; beyond it the caller says so and the call is computed at one cell", async () => {
    const cells = { "$A$1:$A$2000": column(2_000, (i) => 1 + i * 1e-3), "$A$1:$A$500": column(500, (i) => 1 + i * 1e-3) };
    const big = await computesOf("AGE", () => explainFormula("=ZC.DIST_LUM(ZC.REDSHIFT(ZC.AGE($A$1:$A$2000),\"AGE\"))", sheet1(cells), active, undefined, { row: 7, col: 0 }));
    const [, middle, inner] = big.got;
    expect(middle.args[0].value).toBe(`the result of ZC.AGE, 2,000×1 cells, not computed here (the inspector computes at most ${inspectorNestedCellLimit.toLocaleString("en-US")} cells of calls inside another)`);
    // the innermost call is computed at one cell: its first, as its caller's cell is not known
    expect(inner.result).toContain("the first of 2000×1 values");
    expect(exactOf(inner)).toBe(evaluate(definitions.AGE, [1], active)[0][0]);
    expect(big.computes).toBeLessThanOrEqual(2); // was 2,000
    // 500 rows: within the limit, computed whole, and the caller explained at the cell
    const small = await computesOf("AGE", () => explainFormula("=ZC.REDSHIFT(ZC.AGE($A$1:$A$500),\"AGE\")", sheet1(cells), active, undefined, { row: 7, col: 0 }));
    expect(small.got[0].args[0].value).toMatch(/^[\d.]+ \(row 8 of the result of ZC\.AGE for this cell\)$/);
    expectRelative(exactOf(small.got[0]), 1.007, 1e-9, "REDSHIFT of AGE"); // row 8 holds 1 + 7e-3: REDSHIFT inverts AGE (identity)
    expect(small.computes).toBe(500);
  });
});
