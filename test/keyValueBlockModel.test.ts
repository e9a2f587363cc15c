/**
 * Which model a cell is computed under when its model argument is a range: a two-column key/value
 * block (H0 | 70, Om | 0.3, …, with or without a header row) is one model, spelt as a spec; any other
 * range is not a block (its cells are models one by one). The rules are the documented behaviour of
 * `keyValueBlockSpec` (functions/modelArgument.ts; README function reference: "preset, spec or
 * key/value block"); the message for a misspelt key is zcell's (functions/messages.ts), pinned here
 * as the interface.
 */
import { describe, expect, test } from "vitest";
import { CellError } from "../functions/cellError.js";
import { isBlank, isModelText, keyValueBlockSpec } from "../functions/modelArgument.js";
import { sheetCalls } from "./sheetCalls.js";

const keyList = "H0, Om, OL, Ok, Ob, w0, wa, Tcmb, Neff, mnu, preset"; // the keys zcell names in its message (core parameterKeys, then "preset")

describe("a two-column block of keys and values is one model", () => {
  test.each([
    // block                                               | the spec it stands for      | why
    [[["H0", 70], ["Om", 0.3]],                              "H0=70; Om=0.3",              "keys and numbers"],
    [[["H0", "70"], ["Om", "0.3"]],                          "H0=70; Om=0.3",              "numbers typed as text: every key is known"],
    [[["param", "value"], ["H0", 70]],                       "H0=70",                      "a header row (no key, text) is skipped"],
    [[[" H0 ", 70]],                                         "H0=70",                      "a key with spaces around it"],
    [[["H0", " 70 "]],                                       "H0=70",                      "a value with spaces around it"],
    [[["preset", " P18-BAO "]],                              "P18-BAO",                    "a preset alone, spaces trimmed"],
    [[["preset", "W9-ALL"], ["H0", 73]],                     "W9-ALL; H0=73",              "the preset comes first"],
    [[["H0", 73], ["preset", "W9-ALL"]],                     "W9-ALL; H0=73",              "wherever its row is"],
    [[["PRESET", "W9-ALL"], ["h0", 70]],                     "W9-ALL; h0=70",              "keys in any case"],
    [[["preset", " "], ["H0", 70]],                          "H0=70",                      "a preset of spaces names none"],
    [[["H0", 70], ["Om", ""]],                               "H0=70",                      "a blank value is left out"],
    [[["H0", 70], ["Om", null]],                             "H0=70",                      "an empty cell as Excel passes it (null)"],
    [[["", 5], ["H0", 70]],                                  "H0=70",                      "a row with a blank key is skipped"],
    [[[null, "x"], ["H0", 70], [undefined, 3]],              "H0=70",                      "rows with empty keys are skipped"],
    [[["H0", 70], ["Om", 0.3], ["OL", 0.7], ["", ""]],       "H0=70; Om=0.3; OL=0.7",      "a trailing empty row"],
  ])("%j is %s (%s)", (block, spec) => {
    expect(keyValueBlockSpec(block)).toBe(spec);
  });
});

describe("other ranges are not a block: their cells are models one by one", () => {
  test.each([
    // range                                                       | why it is no block
    [[],                                                             "no rows"],
    [[["H0"], ["Om"]],                                               "one column"],
    [[["H0", 70, 1]],                                                "three columns"],
    [[["H0", 70, "x"], ["Om", 0.3, "y"]],                            "three columns, even with keys"],
    [[["param", "value"]],                                           "a header alone"],
    [[["", 5]],                                                      "only blank keys"],
    [[["H0", ""], ["Om", null]],                                     "keys with no value"],
    [[[1, 70], ["H0", 70]],                                          "a number where a key belongs"],
    [[["H0", 70], [1, 2]],                                           "a number where a key belongs, lower down"],
    [[["foo", 1], ["bar", 2]],                                       "no key at all, even with numbers"],
    [[["P18-BAO", "W9-ALL"]],                                        "two model names side by side"],
    [[["H0", "W9-ALL"], ["P18-BAO", "W9-ALL"], ["EDS", "W9-ALL"]],   "text only, and most of the first column is no key"],
  ])("%j (%s)", (range, _why) => {
    expect(keyValueBlockSpec(range as unknown[][])).toBeUndefined();
  });

  test("a first row holding a number where its key belongs is read as a header, so the block below still counts", () => {
    // 42 is no key and "x" is text that is not a number: the header rule, whatever the key cell holds
    expect(keyValueBlockSpec([[42, "x"], ["H0", 70]])).toBe("H0=70");
  });
});

describe("a block with a key that is no key is one #VALUE! naming it", () => {
  test.each([
    // block                                              | the key named | why it is a block
    [[["H0", "70"], ["notakey", "x"]],                      "notakey",       "half its keys are known"],
    [[["H0", "70"], ["Om", "0.3"], ["notakey", "x"]],       "notakey",       "most of its keys are known"],
    [[["H0", 70], ["foo", "x"], ["bar", "y"]],              "foo",           "one key is known and a value is a number"],
    [[["param", "3"], ["H0", 70]],                          "param",         "a first row whose value reads as a number is no header"],
    [[["notes", undefined], ["H0", 70]],                    "notes",         "nor is one whose value is missing"],
  ])("%j names %s (%s)", (block, key) => {
    let error: unknown;
    try {
      keyValueBlockSpec(block);
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(CellError);
    expect((error as CellError).kind).toBe("value");
    expect((error as CellError).message).toBe(`model: unknown key "${key}" in the key/value block: use ${keyList}`);
  });

  test("a misspelt key gets a suggestion, and the sheet shows the message with the function's name", () => {
    const { failure } = sheetCalls("P18-CMB");
    const error = failure("DIST_LUM", 1, [["H0", 70], ["Omm", 0.3]]);
    expect(error.kind).toBe("value");
    expect(error.message).toBe(`ZC.DIST_LUM: model: unknown key "Omm" in the key/value block: did you mean Om? (the keys are ${keyList})`);
  });
});

describe("in a sheet, a block computes the cell under the model it spells", () => {
  const { run } = sheetCalls("P18-CMB");
  test.each([
    // block                                       | the same model as text
    [[["param", "value"], ["H0", 70], ["Om", 0.3], ["OL", 0.7]], "H0=70; Om=0.3; OL=0.7"],
    [[["preset", "W9-ALL"], ["H0", 73]],                        "W9-ALL; H0=73"],
    [[["H0", "70"], ["Om", "1"], ["OL", "0"]],                  "H0=70; Om=1; OL=0"],
  ])("%j computes as %s for every redshift", (block, spec) => {
    const z = [[0.5], [1], [2]];
    const byBlock = run("DIST_LUM", z, block);
    expect(byBlock).toEqual(run("DIST_LUM", z, spec));
    expect(byBlock.every(([cell]) => typeof cell === "number")).toBe(true);
  });
});

describe("what counts as blank and as model text", () => {
  test.each([
    // value      | blank (an empty cell as Excel passes it, or omitted)
    [null,          true],
    [undefined,     true],
    ["",            true],
    [" ",           false],
    [0,             false],
    [false,         false],
  ])("%j is blank: %s", (value, blank) => {
    expect(isBlank(value)).toBe(blank);
  });

  test.each([
    // text                | reads as a model (a preset or a spec)
    ["W9-ALL",               true],
    ["H0=70; Om=0.3",        true],
    ["Mpc",                  false],
    ["NO-SUCH-MODEL",        false],
  ])("%s reads as a model: %s", (text, model) => {
    expect(isModelText(text)).toBe(model);
  });
});
