/**
 * The cell inspector's Model and Conventions rows: which model computed the cell, where it came from,
 * what it assumes. The texts are the pane's own (taskpane/explainCall.ts), pinned here as the
 * interface; the parameters are the presets' (Planck 2018 VI Table 2 for P18-*, Hinshaw et al. 2013
 * Table 4 for W9-ALL, Einstein–de Sitter for EDS: core's preset list).
 */
import { describe, expect, test } from "vitest";
import { readWorkbookModels } from "../functions/workbookModels.js";
import { explainFormula, type ReferenceReader } from "../taskpane/explainCall.js";
import { blanks, p18Cmb, sheet1 } from "./inspectorSheet.js";

const allMatter = "Om is all matter today, massive neutrinos included.";
const noRadiation = "Radiation off (Tcmb = 0): no photons, no neutrinos.";
const flat = "Flat (Ωk = 0).";

describe("the Conventions row states what the cell's model assumes", () => {
  test.each([
    // model                             the conventions the pane lists
    ["EDS",                              [allMatter, noRadiation, flat]],
    ["W9-ALL",                           [allMatter, "Radiation on: photons at Tcmb = 2.725 K and neutrinos with Neff = 3.04, T_ν = (4/11)^(1/3) Tcmb.", flat]],
    ["P18-BAO",                          [allMatter, "Radiation on: photons at Tcmb = 2.7255 K and neutrinos with Neff = 3.046, T_ν = (4/11)^(1/3) Tcmb.", "Massive neutrinos (0.06 eV) by the exact Fermi–Dirac integral.", flat]],
    ["P18-CMB; mnu=0.05,0.01",           [allMatter, "Radiation on: photons at Tcmb = 2.7255 K and neutrinos with Neff = 3.046, T_ν = (4/11)^(1/3) Tcmb.", "Massive neutrinos (0.05, 0.01 eV) by the exact Fermi–Dirac integral.", flat]],
    // Ωk = 1 − Ωm − ΩΛ (no radiation: a spec without a preset has Tcmb = 0), Hogg 1999 eq. 7
    ["H0=70; Om=0.3; OL=0.6",            [allMatter, noRadiation, "Curvature Ωk = 0.1."]],
    ["H0=70; Om=0.3; OL=0.8",            [allMatter, noRadiation, "Curvature Ωk = -0.1."]],
  ] as const)("%s", async (model, conventions) => {
    const [call] = await explainFormula(`=ZC.DIST_LUM(1,"${model}")`, blanks, p18Cmb);
    expect(call.conventions).toEqual(conventions);
  });

  test("a magnitude with a K-correction adds its sign convention, after the model's", async () => {
    const kcorr = "K-correction sign: M = m − μ − K, with K = −2.5(1+α)log10(1+z) for S_ν ∝ ν^α.";
    const [abs] = await explainFormula('=ZC.MAG_ABS(20,0.5,0,"EDS")', blanks, p18Cmb);
    expect(abs.conventions).toEqual([allMatter, noRadiation, flat, kcorr]);
    const [k] = await explainFormula("=ZC.KCORRECTION(0.5,-0.7)", blanks, p18Cmb); // no model: the convention alone
    expect(k.conventions).toEqual([kcorr]);
    const [distance] = await explainFormula('=ZC.DIST_LUM(0.5,"EDS")', blanks, p18Cmb);
    expect(distance.conventions).not.toContain(kcorr);
  });

  test("a model that does not build has no conventions, and its reason in the Model row", async () => {
    const [call] = await explainFormula('=ZC.DIST_LUM(1,"EDS; Ok=0.1")', blanks, p18Cmb);
    expect(call.conventions).toEqual([]);
    expect(call.model).toEqual({
      spec: "EDS; Ok=0.1",
      source: "given in the formula",
      where: undefined,
      description: "Om = 1 and Ok = 0.1 make OL = -0.1 (1 − Om − Ok − Or): give OL explicitly if you mean it",
    });
  });
});

describe("the Model row names the model and where it came from", () => {
  const team = { spec: "TEAM", stored: true, models: readWorkbookModels({ TEAM: "P18-BAO; H0=70", BROKEN: "P99" }) };

  test("the workbook's model, when it is a model of this workbook, says so and what it stands for", async () => {
    for (const formula of ["=ZC.DIST_LUM(1)", "=ZC.DIST_LUM(1,B2)"]) {
      const [call] = await explainFormula(formula, sheet1({ B2: [[""]] }), team);
      expect(call.model, formula).toMatchObject({ spec: "TEAM", source: "the workbook's model", where: "a model of this workbook" });
      expect(call.model!.description, formula).toMatch(/^P18-BAO; H0=70: flat: matter \+ Λ \+ radiation; H0 = 70 km\/s\/Mpc/);
    }
  });

  test("a model given in the formula by its name in this workbook says so", async () => {
    const [call] = await explainFormula('=ZC.DIST_LUM(1,"team")', blanks, team);
    expect(call.model).toMatchObject({ spec: "team", source: "given in the formula", where: "a model of this workbook" });
  });

  test("a preset's description follows its name without repeating it", async () => {
    const [call] = await explainFormula('=ZC.DIST_LUM(1,"EDS")', blanks, team);
    expect(call.model!.description).toMatch(/^flat: matter only; H0 = 70 km\/s\/Mpc; Om = 1 \(matter\)/);
  });

  test("a model text read from a cell is read without its surrounding spaces", async () => {
    const [call] = await explainFormula("=ZC.DIST_LUM(1,B1)", sheet1({ B1: [["  EDS  "]] }), p18Cmb);
    expect(call.model).toMatchObject({ spec: "EDS", source: "given in the formula", where: undefined });
    expect(call.conventions).toEqual([allMatter, noRadiation, flat]);
  });

  test("a number where a model belongs is named as such, from a cell or from a cell of a range", async () => {
    const notModel = "not a model: a model is text (a preset, a spec, a model of this workbook) or a key/value block";
    const [single] = await explainFormula("=ZC.DIST_LUM(1,B1)", sheet1({ B1: [[42]] }), p18Cmb);
    expect(single.model).toEqual({ spec: "42", source: "given in the formula", where: undefined, description: notModel });
    expect(single.conventions).toEqual([]);
    const [ofRange] = await explainFormula("=ZC.DIST_LUM(1,$A$1:$C$1)", sheet1({ "$A$1:$C$1": [[" EDS ", 7, ""]] }), team, undefined, { row: 0, col: 1 });
    expect(ofRange.model).toEqual({ spec: "7", source: "given in the formula", where: "Sheet1!B1 for this cell", description: notModel });
    expect(ofRange.models).toEqual(["EDS", "7", "TEAM (the workbook's model)"]);
  });

  test("a key/value block that names an unknown key: the block, where it is, and why it is no model", async () => {
    const why = 'model: unknown key "Foo" in the key/value block: use H0, Om, OL, Ok, Ob, w0, wa, Tcmb, Neff, mnu, preset';
    const [inCells] = await explainFormula("=ZC.DIST_LUM(1,$E$1:$F$3)", sheet1({ "$E$1:$F$3": [["H0", 70], ["Om", 0.3], ["Foo", 1]] }), p18Cmb);
    expect(inCells.model).toEqual({ spec: "$E$1:$F$3", source: "given in the formula", where: "the key/value block Sheet1!E1:F3", description: why });
    const constant = '{"H0",70;"Foo",1;"Om",0.3}';
    const [inFormula] = await explainFormula(`=ZC.DIST_LUM(1,${constant})`, blanks, p18Cmb);
    expect(inFormula.model).toEqual({ spec: constant, source: "given in the formula", where: `the key/value block ${constant}`, description: why });
  });

  test("a key/value block whose address Excel does not give is named as written", async () => {
    const noAddress: ReferenceReader = async () => ({ cells: 4, values: [["H0", 70], ["Om", 0.3]] });
    const [call] = await explainFormula("=ZC.DIST_LUM(1,Params)", noAddress, p18Cmb);
    expect(call.model).toMatchObject({ spec: "H0=70; Om=0.3", where: "the key/value block Params" });
  });

  test("a function of two models names each, and only what the pane shows of each", async () => {
    const [call] = await explainFormula('=ZC.RESCALE(100,0.5,"distance","EDS",B1)', sheet1({ B1: [["W9-ALL"]] }), p18Cmb);
    expect([call.model, call.models, call.modelNote]).toEqual([undefined, undefined, undefined]);
    const [from, to] = call.modelArgs!;
    expect(Object.keys(from).sort()).toEqual(["argument", "label", "model", "modelNote", "models"]);
    expect(from).toMatchObject({ label: "From model", argument: "from_model", model: { spec: "EDS", source: "given in the formula", where: undefined } });
    expect(to).toMatchObject({ label: "To model", argument: "to_model", model: { spec: "W9-ALL", source: "given in the formula", where: undefined } });
    // the result is stated under the To model: W9-ALL's radiation (Tcmb = 2.725 K, Neff = 3.04)
    expect(call.conventions[1]).toBe("Radiation on: photons at Tcmb = 2.725 K and neutrinos with Neff = 3.04, T_ν = (4/11)^(1/3) Tcmb.");
  });

  test("a key/value block written in the formula is one model, named by its text", async () => {
    const constant = '{"H0",70;"Om",0.3}';
    const [call] = await explainFormula(`=ZC.DIST_LUM(1,${constant})`, blanks, p18Cmb);
    expect(call.model).toMatchObject({ spec: "H0=70; Om=0.3", source: "given in the formula", where: `the key/value block ${constant}` });
    expect(call.args[1].value).toBe('a key/value block: "H0=70; Om=0.3"');
  });

  test("a model range lists its distinct models, up to eight, then counts the rest", async () => {
    const eight = ["EDS", "W9-ALL", "P18-CMB", "P18-BAO", "CONCORDANCE", "EDS; H0=71", "EDS; H0=72", "EDS; H0=73"];
    const [all] = await explainFormula("=ZC.DIST_LUM(1,$A$1:$H$1)", sheet1({ "$A$1:$H$1": [eight] }), p18Cmb);
    expect(all.models).toEqual(eight);
    const [more] = await explainFormula("=ZC.DIST_LUM(1,$A$1:$J$1)", sheet1({ "$A$1:$J$1": [[...eight, "EDS; H0=74", "EDS"]] }), p18Cmb);
    expect(more.models).toEqual([...eight, "… and 1 more"]); // a repeated model is counted once
  });

  test("a model argument that is not read says why, and claims no model", async () => {
    const [call] = await explainFormula("=ZC.DIST_LUM(1,Nope)", sheet1({}), p18Cmb);
    expect(call.model).toBeUndefined();
    expect(call.modelNote).toBe("not read (Excel: no reference Nope): not known here");
    expect(call.args[1].value).toBe("not read (Excel: no reference Nope)");
  });
});
