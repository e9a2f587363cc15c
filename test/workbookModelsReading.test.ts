/**
 * The models a workbook defines (stored in its add-in settings by whoever wrote the file): which
 * entries become models a cell can name, what the pane is told about the others, how a name given in
 * a formula is found, and the spec a cell is then computed under. The sentences are zcell's
 * (functions/workbookModels.ts, shown by the pane's cosmology panel), pinned here as the interface;
 * the caps (100 entries, 500 characters, 5 sentences) are the documented ones of that module.
 */
import { describe, expect, test } from "vitest";
import { Cosmology, formatModelSpec, parseModelSpec } from "../core/index.js";
import { definitions } from "../functions/definitions.js";
import { evaluate } from "../functions/evaluate.js";
import {
  maxSpecLength,
  modelNameProblem,
  noWorkbookModels,
  readWorkbookModels,
  resolvedSpec,
  storedWorkbookModels,
} from "../functions/workbookModels.js";

const presetList = "P18-CMB, P18-BAO, P15-EXT, W9-ALL, W7-BAO, DESI2-CMB, DESI2-CMB-PP, DESI2-CMB-U3, DESI2-CMB-DY5, CONCORDANCE, EDS"; // zcell's presets in its order (core/model/presets.ts)
const notAList = "the workbook's own models could not be read (not a list of names and specs)";

describe("what a stored value that is no list of models gives", () => {
  test.each([
    // stored value            | the pane is told
    [undefined,                  []],         // nothing stored
    [null,                       []],         // what Office's settings return for a missing key
    ["TEAM=W9-ALL",              [notAList]],
    [["W9-ALL", "P18-BAO"],      [notAList]],
    [42,                         [notAList]],
    [true,                       [notAList]],
  ])("%j: no models, and %j", (stored, problems) => {
    const models = readWorkbookModels(stored);
    expect(models.specs.size).toBe(0);
    expect(models.named.names).toEqual([]);
    expect(models.problems).toEqual(problems);
  });

  test("nothing stored is the shared empty set, not a new one each reading", () => {
    expect(readWorkbookModels(undefined)).toBe(noWorkbookModels);
    expect(readWorkbookModels(null)).toBe(noWorkbookModels);
  });

  test("an entry inherited through the object's prototype (not the workbook's own) is no model", () => {
    const stored = Object.create({ INHERITED: "W9-ALL" }, { OWN: { value: "P18-BAO; H0=73", enumerable: true } });
    const models = readWorkbookModels(stored);
    expect([...models.specs]).toEqual([["OWN", "P18-BAO; H0=73"]]);
    expect(models.named.find("INHERITED")).toBeUndefined();
    expect(models.problems).toEqual([]);
  });
});

describe("each entry that cannot be a model is left out with one sentence", () => {
  const exactly500 = `P18-BAO; H0=70.${"0".repeat(maxSpecLength - "P18-BAO; H0=70.".length)}`; // 500 characters, H0 = 70

  test("a bad name, a preset's name, a spec that is no text, too long or does not parse", () => {
    const models = readWorkbookModels({
      "1BAD": "W9-ALL",
      "P18-BAO": "H0=70",
      N: 3,
      L: `${exactly500}0`,
      B: "H0=abc",
      OK: exactly500,
    });
    expect([...models.specs.keys()]).toEqual(["OK"]);
    expect(models.problems).toEqual([
      'workbook model "1BAD" is not a model name: use a letter, then letters, digits, - or _ (at most 32)',
      'workbook model "P18-BAO" is a built-in preset: choose another name',
      "workbook model N: its spec is not text",
      "workbook model L: its spec is longer than 500 characters",
      'workbook model B: H0: "abc" is not a number',
    ]);
  });

  test(`a spec of exactly ${maxSpecLength} characters is read, one more is not`, () => {
    expect(exactly500).toHaveLength(maxSpecLength);
    expect(readWorkbookModels({ T: exactly500 }).named.find("T")?.H0).toBe(70);
    expect(readWorkbookModels({ T: `${exactly500}0` }).specs.size).toBe(0);
  });

  test("a spec naming an unknown preset says which presets there are", () => {
    expect(readWorkbookModels({ E: "NO-SUCH" }).problems).toEqual([`workbook model E: unknown preset "NO-SUCH": use one of ${presetList}`]);
  });

  test.each([
    // entries that cannot be read | sentences (the last counts the rest)
    [5,                              ["A1", "A2", "A3", "A4", "A5"].map((n) => `workbook model ${n}: its spec is not text`)],
    [6,                              [...["A1", "A2", "A3", "A4", "A5"].map((n) => `workbook model ${n}: its spec is not text`), "… and 1 more workbook models that could not be read"]],
    [8,                              [...["A1", "A2", "A3", "A4", "A5"].map((n) => `workbook model ${n}: its spec is not text`), "… and 3 more workbook models that could not be read"]],
  ])("%i unreadable entries: five sentences at most", (count, problems) => {
    const stored = Object.fromEntries(Array.from({ length: count }, (_, i) => [`A${i + 1}`, i + 1]));
    expect(readWorkbookModels(stored).problems).toEqual(problems);
  });
});

describe("a name in a formula finds the workbook's model", () => {
  const models = readWorkbookModels({ Team: "P18-BAO; H0=73", Other: "W9-ALL" });

  test.each([
    // name as typed | found
    ["Team",           true],
    ["TEAM",           true],
    ["team",           true],
    [" team ",         true],   // spaces around it, as a cell's text may have
    ["TEAMS",          false],
    ["P18-BAO",        false],  // a preset is no workbook model
  ])("%j: %s", (name, found) => {
    expect(models.named.find(name) !== undefined).toBe(found);
  });

  test("the parameters found are the stored spec's", () => {
    expect(models.named.find(" team ")).toEqual(parseModelSpec("P18-BAO; H0=73"));
    expect(models.named.names).toEqual(["TEAM", "OTHER"]);
  });

  test.each([
    // model argument          | the spec the cell is computed under
    ["Team",                     "P18-BAO; H0=73"],
    [" team ; Om=0.3",           "P18-BAO; H0=73; Om=0.3"],  // a change on top of the workbook's model
    ["OTHER",                    formatModelSpec(parseModelSpec("W9-ALL"))],
    ["W9-ALL; H0=70",            "W9-ALL; H0=70"],           // a preset: the text itself
    ["TEAMX",                    "TEAMX"],                   // no such model: left for the parser to refuse
  ])("%j → %j", (text, spec) => {
    expect(resolvedSpec(text, models)).toBe(spec);
  });

  test("without workbook models a text is its own spec", () => {
    expect(resolvedSpec("team; H0=70", undefined)).toBe("team; H0=70");
    expect(resolvedSpec("team; H0=70", noWorkbookModels)).toBe("team; H0=70");
  });

  test("a cell naming the workbook's model is computed under its parameters", () => {
    const active = { spec: "P18-CMB", stored: false, models };
    const age = (model: string) => evaluate(definitions.AGE, [0, model], active)[0][0];
    expect(age(" team ; Om=0.3")).toBe(Cosmology.fromSpec("P18-BAO; H0=73; Om=0.3").ageTodayGyr);
    expect(age("Team")).toBe(Cosmology.fromSpec("P18-BAO; H0=73").ageTodayGyr);
    expect(age("Team")).not.toBe(Cosmology.fromSpec("P18-BAO").ageTodayGyr); // H0 = 73 is taken, not the preset's
  });
});

describe("names a team may give a model", () => {
  test.each([
    // name              | the pane says (undefined: a good name)
    ["TEAM-FIDUCIAL",      undefined],
    ["a_1",                undefined],
    ["A".repeat(32),       undefined],
    ["A".repeat(33),       `"${"A".repeat(33)}" is not a model name: use a letter, then letters, digits, - or _ (at most 32)`],
    ["1abc",               '"1abc" is not a model name: use a letter, then letters, digits, - or _ (at most 32)'],
    ["bad name",           '"bad name" is not a model name: use a letter, then letters, digits, - or _ (at most 32)'],
    ["p18-bao",            '"P18-BAO" is a built-in preset: choose another name'],
    ["eds",                '"EDS" is a built-in preset: choose another name'],
  ])("%j: %s", (name, problem) => {
    expect(modelNameProblem(name)).toBe(problem);
  });

  test("the stored form lists the models by name, sorted, so that saving twice writes the same text", () => {
    const stored = storedWorkbookModels(new Map([["ZED", "EDS"], ["ALPHA", "W9-ALL"], ["MID", "P18-BAO; H0=70"]]));
    expect(Object.entries(stored)).toEqual([["ALPHA", "W9-ALL"], ["MID", "P18-BAO; H0=70"], ["ZED", "EDS"]]);
    expect(JSON.stringify(stored)).toBe('{"ALPHA":"W9-ALL","MID":"P18-BAO; H0=70","ZED":"EDS"}');
    expect(readWorkbookModels(stored).specs).toEqual(new Map([["ALPHA", "W9-ALL"], ["MID", "P18-BAO; H0=70"], ["ZED", "EDS"]])); // read back as written
  });
});
