/** The pane's logic without a host: the model form, table plans, provenance notes, theme contrast. */
import { describe, expect, test } from "vitest";
import { definitions } from "../functions/definitions.js";
import { explainFormula } from "../taskpane/explainCall.js";
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
    expect(modelFromForm({ ...form, H0: "abc" }).errors.H0).toBe('H0: "abc" is not a number (use \'.\' as the decimal point)');
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

describe("cell inspector", () => {
  test("explains every worksheet function: a summary, an equation and a method for each", async () => {
    const active = { spec: "P18-BAO", stored: false };
    for (const name of Object.keys(definitions)) {
      const [call] = await explainFormula(`=ZC.${name}()`, async () => [[""]], active);
      expect(call.summary, name).not.toBe("");
      expect(call.equation, name).not.toBe("");
      expect(call.method, name).not.toBe("");
      // plain words first: one short line, the detail behind it
      expect(call.methodPlain.length, name).toBeLessThanOrEqual(call.method.length);
      expect(call.methodPlain, name).not.toMatch(/Hermite|Gauss–Legendre|bisection/);
    }
  });

  test("a unit that applies to a value and its error is shown beside both", async () => {
    const [call] = await explainFormula('=ZC.SIZE_ERR(2,0.1,1,0.01)', async () => [[""]], { spec: "P18-BAO", stored: false });
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
    ['=ZC.DIST_LUM(1,"H0=70; Om=0; OL=2")',                 "model",   '"H0=70; Om=0; OL=2"', /needs a big bang \(check Om, OL or Ok, w0, wa\)/],
    ['=ZC.DIST_LUM(1,"P99")',                                "model",   '"P99"',       /^Give a preset name \(ZC.PRESETS\(\) lists them\)/],
    ['=ZC.DIST_LUM(1,,"mpc")',                              "unit",    '"mpc"',       /FITS spelling, case as shown \(default "Mpc"\)/],
    ["=ZC.SIZE(-2,1)",                                      "angle",   "-2",          /^Give angle a value from 0 to 180° in the unit of angle_unit \(default arcsec\)/],
    ["=ZC.MAG_ABS(99,0.5)",                                 "m",       "99",          /missing magnitude in a catalogue/],
    ['=ZC.OMEGA("dust",1)',                                  "component", '"dust"',   /^Use one of: matter, cold, darkenergy/],
    ['=ZC.REDSHIFT(1E5,"DIST_ANG")',                         undefined, undefined,    /^No value answers these arguments in this model/],
  ];
  test.each(cases)("%s", async (formula, argument, text, fix) => {
    const [call] = await explainFormula(formula, async () => [[""]], active);
    expect(call.isError).toBe(true);
    expect(call.fault?.argument).toBe(argument);
    expect(call.fault?.text).toBe(text);
    expect(call.fault?.fix).toMatch(fix);
  });

  test("a cell whose arguments only Excel computes gets the advice of its error kind", async () => {
    const [call] = await explainFormula("=ZC.DIST_LUM(SUM(A1:A3))", async () => [[""]], active, "#NUM!");
    expect(call.fault).toEqual({ fix: "A value lies outside its physical domain, or the result does: the message says which." });
  });

  test("a cell's shown value is a stranger's text: only Excel's own error values get advice", async () => {
    // hostile values a workbook can hold in a cell (object-property names, look-alikes, a huge text)
    for (const shown of ["constructor", "__proto__", "toString", "#num!", "#NUM! ", "#N/A".repeat(10_000)]) {
      const [call] = await explainFormula("=ZC.DIST_LUM(SUM(A1:A3))", async () => [[""]], active, shown);
      expect(call.fault, JSON.stringify(shown).slice(0, 20)).toBeUndefined();
    }
  });

  test("a hostile model text in the formula is quoted, cut, and still named as the argument at fault", async () => {
    const hostile = `${"(((((a+)+)+)+".repeat(5_000)}; H0=model:`;
    const [call] = await explainFormula(`=ZC.DIST_LUM(1,"${hostile}")`, async () => [[""]], active);
    expect(call.isError).toBe(true);
    expect(call.fault?.argument).toBe("model");
    expect(call.result.length).toBeLessThan(400); // the message quotes at most 40 characters of it
  });

  test("a value that is not an error has no advice", async () => {
    const [call] = await explainFormula("=ZC.DIST_LUM(1)", async () => [[""]], active);
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
